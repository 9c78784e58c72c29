"""Renderers: site HTML templates (heavy and light), TXT, Markdown and PDF exports."""
import html
import re
from bodies import body_lines

E = html.escape


def html_text(s):
    s = re.sub(r"(?is)<(script|style)\b.*?</\1>", " ", s)
    s = re.sub(r"(?s)<!--.*?-->", " ", s)
    s = re.sub(r"<[^>]+>", " ", s)
    return html.unescape(s)


def nwords(s):
    return len(s.split())


def slugify(s):
    return re.sub(r"[^a-z0-9]+", "-", s.lower()).strip("-")[:60].strip("-")


def first_sentence(blocks):
    for b in blocks:
        if b["t"] == "p" and b["s"]:
            return b["s"][0][0]
    return ""


def first_para(blocks):
    for b in blocks:
        if b["t"] == "p" and b["s"]:
            return " ".join(s[0] for s in b["s"])
    return ""


def p_html(b):
    txt = " ".join(s[0] for s in b["s"])
    out = E(txt)
    if b.get("link") and b["link"][0] in txt:
        ph, url = b["link"]
        out = out.replace(E(ph), '<a href="%s">%s</a>' % (E(url), E(ph)), 1)
    return out


def body_html(blocks, tag_p="p", promo=None, promo_after=1, same=False):
    out = []
    np_ = 0
    for b in blocks:
        t = b["t"]
        if t == "h1":
            out.append("<h1>%s</h1>" % E(b["s"][0]))
        elif t == "h2":
            out.append("<h2>%s</h2>" % E(b["text"]))
        elif t == "p":
            if not b["s"]:
                continue
            out.append("<p>%s</p>" % p_html(b))
            np_ += 1
            if promo and np_ == promo_after:
                if same:
                    out.append("<p>%s</p>" % E(promo))
                else:
                    out.append('<div class="promo-inline" role="complementary"><p>%s</p></div>' % E(promo))
        elif t == "ul":
            out.append("<ul>%s</ul>" % "".join("<li>%s</li>" % E(i) for i in b["items"]))
        elif t == "table":
            r = b["rows"]
            out.append("<table><thead><tr>%s</tr></thead><tbody>%s</tbody></table>" % (
                "".join("<th>%s</th>" % E(c) for c in r[0]),
                "".join("<tr>%s</tr>" % "".join("<td>%s</td>" % E(c) for c in row) for row in r[1:])))
    return "\n".join(out)


# ------------------------------------------------------------------ template blocks
def blk_menu(site, section, compact):
    parts = []
    for sec, items in site["sections"].items():
        if sec == section and not compact:
            parts.append('<li class="open"><a href="/%s/">%s</a><ul>%s</ul></li>' % (
                slugify(sec), E(sec), "".join('<li><a href="/%s/%s">%s</a></li>' % (slugify(sec), slugify(i), E(i)) for i in items)))
        elif sec == section:
            parts.append('<li class="open"><a href="/%s/">%s</a><ul>%s</ul></li>' % (
                slugify(sec), E(sec), "".join('<li><a href="/%s/%s">%s</a></li>' % (slugify(sec), slugify(i), E(i)) for i in items[:2])))
        else:
            parts.append('<li><a href="/%s/">%s</a></li>' % (slugify(sec), E(sec)))
    return '<nav class="mega-menu"><ul>%s</ul></nav>' % "".join(parts)


def blk_crumbs(site, section, title):
    return '<nav class="breadcrumbs"><a href="/">Home</a> &rsaquo; <a href="/%s/">%s</a> &rsaquo; <span>%s</span></nav>' % (slugify(section), E(section), E(title))


def blk_updated(title, rng, style):
    if style == 0:
        return '<p class="updated">%s - updated %d hours ago</p>' % (E(title), rng.randint(2, 23))
    if style == 1:
        return '<p class="updated">Last updated on %d %s at %02d:%02d. Page: %s</p>' % (rng.randint(1, 28), rng.choice(["Nov", "Dec", "Oct"]), rng.randint(7, 19), rng.randint(0, 59), E(title))
    return '<p class="updated">This page (%s) has been viewed %s times</p>' % (E(title), "{:,}".format(rng.randint(120, 9800)))


def blk_teasers(items, heading):
    li = "".join('<li><a href="%s">%s</a><p>%s</p></li>' % (E(u), E(t), E(s)) for (u, t, s) in items)
    return '<aside class="teasers"><h3>%s</h3><ul>%s</ul></aside>' % (E(heading), li)


def blk_popular(site, rng):
    pool = site["popular"]
    k = rng.randrange(len(pool))
    picks = [pool[(k + i) % len(pool)] for i in range(5)]
    return '<aside class="popular"><h3>Popular this week</h3><ol>%s</ol></aside>' % "".join(
        '<li><a href="/popular/%s">%s</a> <span>%d reads</span></li>' % (slugify(p), E(p), rng.randint(40, 900)) for p in picks)


def blk_comments(site, rng):
    n = rng.randint(2, min(4, len(site["comments"])))
    cs = rng.sample(site["comments"], n)
    names = ["boater_jen", "Ruth M", "anon", "KeithW", "seaside_sal", "Tom from the hill", "grapefan", "coder42", "Pat", "Hazel"]
    return '<section class="comments"><h3>%d comments</h3>%s<p>Leave a comment. Your email address will not be published. Comments are moderated before they appear.</p></section>' % (
        n, "".join('<div class="comment"><b>%s</b> <i>%d days ago</i><p>%s</p></div>' % (E(rng.choice(names)), rng.randint(1, 40), E(c)) for c in cs))


def blk_bio(site):
    return '<div class="author-bio"><h3>About this page</h3><p>%s</p></div>' % E(site["bio"])


def blk_share(rng):
    return '<div class="share">%s</div>' % rng.choice(["Share this page: Email | Print | Copy link", "Print this page | Share by email | Share on social media", "Share: Copy link - Email - Print-friendly version"])


def blk_toc(blocks):
    hs = [b["text"] for b in blocks if b["t"] == "h2"]
    if not hs:
        return ""
    return '<nav class="toc"><h3>On this page</h3><ol>%s</ol></nav>' % "".join("<li>%s</li>" % E(h) for h in hs)


def blk_table(site):
    h, rows = site["data_table"]
    return '<aside class="datatable"><table><tr>%s</tr>%s</table></aside>' % ("".join("<th>%s</th>" % E(c) for c in h),
                                                                             "".join("<tr>%s</tr>" % "".join("<td>%s</td>" % E(c) for c in r) for r in rows))


def blk_fixed_aside(site):
    h, items = site["fixed_aside"]
    return '<aside class="station-news"><h3>%s</h3>%s</aside>' % (E(h), "".join("<p>%s</p>" % E(i) for i in items))


def blk_pager(rng):
    n = rng.randint(4, 14)
    return '<div class="pager">Page %d of %d in this section - Previous | Next</div>' % (rng.randint(1, n), n)


def render_html(site, doc, teaser_items, rng, footer_gen, target, print_variant=False):
    """Build the page; adjust optional blocks so template/body ratio falls in the requested band."""
    blocks = doc["blocks"]
    title = blocks[0]["s"][0]
    section = doc["section"]
    bw = nwords("\n".join(body_lines(blocks)))
    lo, hi = target
    same = site["layout"] == "samemarkup"
    promo = rng.choice(site["promos"]) if site["promos"] and not print_variant and rng.random() < 0.7 else None
    promo_after = 1 if rng.random() < 0.6 else 2
    footer = site["footer_new"] if footer_gen else site["footer_old"]

    def page(opt, compact, nteas):
        head = ['<header class="masthead"><a class="logo" href="/">%s</a><p class="tagline">%s</p></header>' % (E(site["name"]), E(site["tagline"]))]
        if site["layout"] != "plain" and not print_variant:
            head.append(blk_menu(site, section, compact))
        head.append(blk_crumbs(site, section, title) if site["layout"] != "plain" else '<p><a href="/">Home</a> / %s</p>' % E(section))
        pre, post, side = [], [], []
        for name in opt:
            h = opt_html[name]
            if name in ("toc", "datatable", "updated_top") and site["layout"] in ("sidebar", "tocfirst"):
                pre.append(h)
            elif name in ("updated_top", "pager"):
                pre.append(h)
            elif name in ("comments", "bio", "share"):
                post.append(h)
            else:
                side.append(h)
        if teaser_items and nteas:
            side.insert(0, blk_teasers(teaser_items[:nteas], doc["teaser_heading"]))
        if site.get("fixed_aside") and not print_variant:
            side.insert(0, blk_fixed_aside(site))
        if same:
            inner = "\n".join(pre) + "\n" + body_html(blocks, promo=promo, promo_after=promo_after, same=True) + "\n" + "\n".join(
                "<p>%s</p>" % E(html_text(x).strip()) for x in post + side)
            main = '<div class="content">\n%s\n</div>' % inner
        else:
            main = "\n".join(pre) + '\n<main><article>\n%s\n</article>\n%s\n</main>\n%s' % (
                body_html(blocks, promo=promo, promo_after=promo_after), "\n".join(post), "\n".join(side))
        foot = '<footer><p>%s</p><p><a href="/privacy">Privacy</a> | <a href="/accessibility">Accessibility</a> | <a href="/cookies">Cookie settings</a> | <a href="/contact">Contact us</a></p></footer>' % E(footer)
        cookie = '<div class="cookie-consent"><p>%s</p><button>Accept all</button><button>Essential only</button></div>' % E(site["cookie"]) if site["cookie"] and not print_variant else ""
        if print_variant:
            head.insert(0, '<p class="print-note">Printer-friendly version. Printed from %s</p>' % E(doc["url"]))
        body = "\n".join(head) + "\n" + main + "\n" + foot + "\n" + cookie
        return ('<!DOCTYPE html>\n<html lang="en"><head><meta charset="utf-8"><title>%s | %s</title><link rel="stylesheet" href="/static/site.css">'
                '<script>window.dataLayer=window.dataLayer||[];</script></head>\n<body class="%s">\n%s\n</body></html>\n') % (
            E(title), E(site["name"]), site["layout"] + (" print" if print_variant else ""), body)

    opt_html = {}
    names = []
    if not print_variant and site["layout"] != "plain":
        style = rng.randrange(3)
        opt_html["updated_top"] = blk_updated(title, rng, style)
        opt_html["share"] = blk_share(rng)
        if site["popular"]:
            opt_html["popular"] = blk_popular(site, rng)
        if site["comments"] and rng.random() < 0.6:
            opt_html["comments"] = blk_comments(site, rng)
        if site["bio"]:
            opt_html["bio"] = blk_bio(site)
        t = blk_toc(blocks)
        if t and (site["layout"] == "tocfirst" or rng.random() < 0.3):
            opt_html["toc"] = t
        if site["data_table"]:
            opt_html["datatable"] = blk_table(site)
        if site["section_block"] and site["section_block"][0] == section:
            opt_html["section"] = '<aside class="section-note"><p>%s</p></aside>' % E(site["section_block"][1])
        if rng.random() < 0.4:
            opt_html["pager"] = blk_pager(rng)
        mandatory = [n for n in ("updated_top", "share", "datatable", "section", "toc") if n in opt_html and (n != "toc" or site["layout"] == "tocfirst")]
        rest = [n for n in opt_html if n not in mandatory]
        rng.shuffle(rest)
        names = mandatory + rest
    elif site["layout"] == "plain" and not print_variant:
        opt_html["updated_top"] = '<p class="updated">Posted %d %s</p>' % (rng.randint(1, 28), rng.choice(["October", "November", "December"]))
        names = ["updated_top"]

    def ratio(h):
        return (nwords(html_text(h)) - bw) / bw

    best = None
    for compact in (False, True):
        for k in range(len(names), -1, -1):
            for nteas in range(0, len(teaser_items) + 1):
                h = page(names[:k] if k == len(names) or compact or True else names, compact, nteas)
                r = ratio(h)
                if lo <= r <= hi:
                    return h, r
                if best is None or abs(r - (lo + hi) / 2) < abs(best[1] - (lo + hi) / 2):
                    best = (h, r)
                if r > hi:
                    break
    return best


# ------------------------------------------------------------------ TXT export
def wrap(text, width, rng, indent=""):
    words = text.split()
    lines, cur = [], indent
    for w in words:
        room = width - len(cur) - (1 if cur.strip() else 0)
        if len(w) <= room:
            cur = (cur + " " + w) if cur.strip() else cur + w
            continue
        if len(w) >= 7 and room >= 4 and w.isalpha() and rng.random() < 0.75:
            cut = min(room - 1, len(w) - 3)
            if cut >= 3:
                head, tail = w[:cut], w[cut:]
                cur = (cur + " " + head + "-") if cur.strip() else cur + head + "-"
                lines.append(cur)
                cur = indent + tail
                continue
        lines.append(cur)
        cur = indent + w
    if cur.strip():
        lines.append(cur)
    return lines


def render_txt(site, doc, rng):
    out = ["%s - plain text export" % site["name"], "Source: %s" % doc["orig_url"], "Exported: %s" % doc["export_date"], ""]
    width = rng.choice([68, 72, 76])
    for b in doc["blocks"]:
        t = b["t"]
        if t == "h1":
            out += [b["s"][0], "=" * len(b["s"][0]), ""]
        elif t == "h2":
            out += [b["text"], "-" * len(b["text"]), ""]
        elif t == "p":
            if b["s"]:
                out += wrap(" ".join(s[0] for s in b["s"]), width, rng) + [""]
        elif t == "ul":
            for i in b["items"]:
                ls = wrap(i, width, rng, "    ")
                ls[0] = "  * " + ls[0][4:]
                out += ls
            out.append("")
        elif t == "table":
            rows = b["rows"]
            w = [max(len(r[c]) for r in rows) for c in range(len(rows[0]))]
            fmt = lambda r: "  ".join(c.ljust(w[i]) for i, c in enumerate(r)).rstrip()
            out.append(fmt(rows[0]))
            out.append("  ".join("-" * x for x in w))
            out += [fmt(r) for r in rows[1:]]
            out.append("")
    out.append("-- end of export --")
    return "\n".join(out) + "\n"


# ------------------------------------------------------------------ Markdown export
def render_md(site, doc, rng):
    fm = ["---", 'title: "%s"' % doc["blocks"][0]["s"][0].replace('"', "'"), "site: %s" % site["name"], "source_url: %s" % doc["orig_url"],
          "exported: %s" % doc["export_date"], "section: %s" % doc["section"], "---", ""]
    out = []
    refs = []
    for b in doc["blocks"]:
        t = b["t"]
        if t == "h1":
            out += ["# " + b["s"][0], ""]
        elif t == "h2":
            out += ["## " + b["text"], ""]
        elif t == "p":
            if not b["s"]:
                continue
            txt = " ".join(s[0] for s in b["s"])
            if b.get("link") and b["link"][0] in txt:
                refs.append(b["link"][1])
                txt = txt.replace(b["link"][0], "[%s][%d]" % (b["link"][0], len(refs)), 1)
            out += [txt, ""]
        elif t == "ul":
            out += ["- " + i for i in b["items"]] + [""]
        elif t == "table":
            rows = b["rows"]
            out.append("| " + " | ".join(rows[0]) + " |")
            out.append("|" + "|".join("---" for _ in rows[0]) + "|")
            out += ["| " + " | ".join(r) + " |" for r in rows[1:]]
            out.append("")
    refs.append("https://%s/" % site["host"])
    out.append("[Back to %s][%d]" % (site["name"], len(refs)))
    out.append("")
    out += ["[%d]: %s" % (i + 1, u) for i, u in enumerate(refs)]
    return "\n".join(fm + out) + "\n"


# ------------------------------------------------------------------ PDF export
def render_pdf(site, doc, path):
    from fpdf import FPDF
    import datetime
    title = doc["blocks"][0]["s"][0]
    sname = site["name"]

    class P(FPDF):
        def header(self):
            self.set_font("helvetica", "I", 7)
            self.cell(0, 4, "%s  |  %s" % (sname, title[:60]), align="L", new_x="LMARGIN", new_y="NEXT")
            self.line(self.l_margin, self.get_y() + 1, self.w - self.r_margin, self.get_y() + 1)
            self.ln(4)

        def footer(self):
            self.set_y(-11)
            self.set_font("helvetica", "", 7)
            self.cell(0, 4, "%s  -  page %d of {nb}" % (doc["orig_url"], self.page_no()), align="C")

    pdf = P(format=(148, 210))
    pdf.set_creation_date(datetime.datetime(2026, 11, 30, 9, 0, 0, tzinfo=datetime.timezone.utc))
    pdf.set_title(title)
    pdf.set_author(sname)
    pdf.set_auto_page_break(True, 16)
    pdf.set_margins(14, 12, 14)
    pdf.add_page()
    for b in doc["blocks"]:
        t = b["t"]
        if t == "h1":
            pdf.set_font("helvetica", "B", 14)
            pdf.multi_cell(0, 6.5, b["s"][0], new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif t == "h2":
            pdf.set_font("helvetica", "B", 11)
            pdf.ln(1)
            pdf.multi_cell(0, 5.5, b["text"], new_x="LMARGIN", new_y="NEXT")
        elif t == "p":
            if not b["s"]:
                continue
            pdf.set_font("helvetica", "", 10)
            pdf.multi_cell(0, 5, " ".join(s[0] for s in b["s"]), align="J", new_x="LMARGIN", new_y="NEXT")
            pdf.ln(1.5)
        elif t == "ul":
            pdf.set_font("helvetica", "", 10)
            for i in b["items"]:
                pdf.multi_cell(0, 5, "-  " + i, new_x="LMARGIN", new_y="NEXT")
            pdf.ln(1.5)
        elif t == "table":
            pdf.set_font("helvetica", "", 8.5)
            with pdf.table(line_height=4.5, first_row_as_headings=True) as tb:
                for r in b["rows"]:
                    row = tb.row()
                    for c in r:
                        row.cell(c)
            pdf.ln(2)
    pdf.output(path)
    return pdf.page_no()
