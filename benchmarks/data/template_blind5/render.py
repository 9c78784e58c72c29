"""Renderers: site HTML (heavy/light templates), print HTML, TXT export, Markdown export, PDF export."""
import datetime
import html as H
import textwrap

from sites import SITES, COMMON_COMMENTS, LEGAL_BASE, COOKIE_VARIANTS
from textutil import visible_words
import bodies

E = H.escape


# ---------------------------------------------------------------------------
# body HTML
# ---------------------------------------------------------------------------
def body_html_parts(blocks):
    """list of html strings, one per block (h1 excluded)"""
    parts = []
    for b in blocks[1:]:
        if b["t"] == "h2":
            parts.append('<h2 id="%s">%s</h2>' % (slugify(b["text"])[:40], E(b["text"])))
        elif b["t"] == "p":
            parts.append("<p>%s</p>" % E(" ".join(s["text"] for s in b["sents"])))
        elif b["t"] == "ul":
            parts.append("<ul>\n%s\n</ul>" % "\n".join("  <li>%s</li>" % E(i) for i in b["items"]))
        elif b["t"] == "table":
            head = "".join("<th>%s</th>" % E(c) for c in b["rows"][0])
            rows = "\n".join("<tr>%s</tr>" % "".join("<td>%s</td>" % E(c) for c in r) for r in b["rows"][1:])
            parts.append('<table class="data">\n<thead><tr>%s</tr></thead>\n<tbody>\n%s\n</tbody>\n</table>'
                         % (head, rows))
    return parts


def slugify(s):
    out = []
    for ch in s.lower():
        out.append(ch if ch.isalnum() else "-")
    s = "".join(out)
    while "--" in s:
        s = s.replace("--", "-")
    return s.strip("-")


def wc(fragment):
    return len(visible_words(fragment))


# ---------------------------------------------------------------------------
# template blocks
# ---------------------------------------------------------------------------
def nav_html(cfg, section, rng, style):
    items = "".join('<li%s><a href="/%s">%s</a></li>' % (' class="active"' if t == section else "", slugify(t), E(t))
                    for t in cfg["topnav"])
    mega = ""
    if cfg["mega"]:
        secs = [section] if section in cfg["mega"] else []
        others = [s for s in cfg["mega"] if s != section]
        # menus differ by section: the current section is expanded, plus one rotating neighbour
        if others and rng.random() < 0.7:
            secs.append(rng.choice(others))
        cols = []
        for s in secs:
            cols.append('<div class="mega-col"><p class="mega-title">%s</p><ul>%s</ul></div>'
                        % (E(s), "".join('<li><a href="/%s/%s">%s</a></li>' % (slugify(s), slugify(x), E(x))
                                         for x in cfg["mega"][s])))
        mega = '<div class="mega-menu">%s</div>' % "".join(cols)
    brand = '<a class="brand" href="/">%s</a>' % E(cfg["name"])
    util = '<ul class="util"><li><a href="/search">Search</a></li><li><a href="/account">Sign in</a></li></ul>' \
        if style not in ("light", "wiki") else ""
    return '<header class="site-%s">%s%s<nav><ul class="topnav">%s</ul>%s</nav></header>' % (style, brand, util,
                                                                                              items, mega)


def crumbs_html(cfg, section, title):
    return ('<ol class="breadcrumbs"><li><a href="/">Home</a></li><li><a href="/%s">%s</a></li><li>%s</li></ol>'
            % (slugify(section), E(section), E(title)))


def footer_html(cfg, rng, heavy):
    links = "".join('<li><a href="/%s">%s</a></li>' % (slugify(l), E(l)) for l in cfg["footer_links"])
    legal = E(cfg["legal"])
    extra = ("<p class=\"legal\">%s</p>" % E(LEGAL_BASE)) if heavy else ""
    return ('<footer><ul class="footer-links">%s</ul><p class="legal">%s</p>%s<p class="copy">Copyright 2026 %s. '
            'All rights reserved.</p></footer>' % (links, legal, extra, E(cfg["name"])))


def cookie_html(rng):
    return '<div class="cookie-notice" role="dialog"><p>%s</p></div>' % E(rng.choice(COOKIE_VARIANTS))


def teaser_unit(d):
    return ('<div class="teaser"><a href="%s"><span class="t-title">%s</span></a><p>%s</p>'
            '<a class="more" href="%s">Read more</a></div>' % (E(d["url"]), E(d["blocks"][0]["text"]),
                                                               E(bodies.first_sentence(d["blocks"])), E(d["url"])))


def comment_unit(c, rng):
    name, text = c
    dt, _ = _date(rng)
    return ('<div class="comment"><p class="c-meta">%s wrote on %s</p><p>%s</p><a class="reply" href="#">Reply</a>'
            '</div>' % (E(name), E(dt), E(text)))


def _date(rng):
    from content import date_text
    return date_text(rng)


# ---------------------------------------------------------------------------
# page assembly
# ---------------------------------------------------------------------------
TEASER_HEADS = ["You may also like", "Related pages", "More from this section", "Other people read",
                "Latest updates", "Also on the site"]
NEWSLETTER = ["Get updates by email. Sign up to our fortnightly newsletter and never miss a notice. Email address. "
              "Subscribe. You can unsubscribe at any time.",
              "Stay in the loop: join {n} subscribers who get our news every Friday. Your email. Sign me up.",
              "Advertisement. Support local journalism and local services: become a supporter from two pounds a "
              "month. Find out more."]


def render_site_page(doc, ctx, rng, target):
    """Returns (html, template_ratio).  ctx: dict with site docs, hard-case aside."""
    site = doc["site"]
    cfg = SITES[site]
    heavy = cfg["heavy"]
    style = cfg["style"]
    section = cfg["section"][doc["fam"]]
    title = doc["blocks"][0]["text"]
    B = doc["words"]

    head = ('<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n<title>%s | %s</title>\n'
            '<meta name="viewport" content="width=device-width, initial-scale=1">\n'
            '<link rel="stylesheet" href="/static/%s.css">\n<script>window.siteConfig={section:"%s"};</script>\n'
            '</head>\n<body class="%s">\n' % (E(title), E(cfg["name"]), style, E(section), style))
    nav = nav_html(cfg, section, rng, style)
    crumbs = crumbs_html(cfg, section, title) if style != "wiki" else ""
    dt, _ = _date(rng)
    hours = rng.randint(1, 23)
    views = "{:,}".format(rng.randint(40, 9000))
    dateline_opts = ["Published %s. Updated %d hours ago." % (dt, hours),
                     "Posted %s | %s views" % (dt, views),
                     "Last updated %d hours ago" % hours,
                     "%s. Viewed %s times." % (dt, views)]
    if style == "wiki":
        dateline = '<p class="dateline">From Quernstone project wiki</p>'
    else:
        dateline = '<p class="dateline">%s</p>' % E(rng.choice(dateline_opts))
    footer = footer_html(cfg, rng, heavy)
    cookie = cookie_html(rng) if style != "wiki" else ""
    hs = bodies.headings(doc["blocks"])
    toc = ""
    if hs and (heavy or style == "wiki") and rng.random() < 0.75:
        toc = ('<aside class="toc"><p class="toc-title">%s</p><ol>%s</ol><a href="#top">Back to top</a></aside>'
               % ("Contents" if style == "wiki" else "On this page",
                  "".join('<li><a href="#%s">%s</a></li>' % (slugify(h)[:40], E(h)) for h in hs)))
    fixed_aside = ctx.get("fixed_aside", "") if doc["fam"] == "outage_notice" else ""

    # fill units -------------------------------------------------------------
    others = [d for d in ctx["docs"] if d["url"] != doc["url"]]
    rng.shuffle(others)
    teasers = [teaser_unit(d) for d in others[:30]]
    if rng.random() < 0.35:  # sometimes the current page is quoted in its own teaser box
        teasers.insert(rng.randint(0, 3), teaser_unit(doc))
    comments = COMMON_COMMENTS[:]
    rng.shuffle(comments)
    comments = [comment_unit(c, rng) for c in comments]
    popular = ['<li><a href="%s">%s</a> <span class="views">%s views</span></li>'
               % (E(d["url"]), E(d["blocks"][0]["text"]), "{:,}".format(rng.randint(100, 20000)))
               for d in others[30:45]]
    related = ['<li><a href="%s">%s</a></li>' % (E(d["url"]), E(d["blocks"][0]["text"])) for d in others[45:60]]
    tags = ['<li><a href="/tag/%s">%s</a></li>' % (slugify(t), E(t)) for t in cfg["tags"]]
    bio = []
    if cfg["bios"]:
        from content import FIRST, LAST
        fn, ln = rng.choice(FIRST), rng.choice(LAST)
        bio = ['<p>%s</p>' % E(rng.choice(cfg["bios"]).format(author=fn + " " + ln, author_first=fn))]
    nl = NEWSLETTER[rng.randrange(len(NEWSLETTER))].format(n="{:,}".format(rng.randint(900, 12000)))
    pageno = rng.randint(2, 14)
    blocks = {
        "teasers": ('<aside class="teasers"><p class="box-title">%s</p>' % rng.choice(TEASER_HEADS), teasers,
                    "</aside>"),
        "comments": ('<section class="comments"><p class="box-title">Comments</p>', comments,
                     '<p class="c-note">Comments are moderated and may take a day to appear.</p></section>'),
        "popular": ('<aside class="popular"><p class="box-title">Most read this week</p><ol>', popular, "</ol></aside>"),
        "related": ('<nav class="related"><p class="box-title">Related links</p><ul>', related,
                    '</ul><p class="pager">Page %d of %d</p></nav>' % (rng.randint(1, pageno), pageno)),
        "tags": ('<div class="tags"><p class="box-title">Tags</p><ul>', tags, "</ul></div>"),
        "bio": ('<div class="author-bio"><p class="box-title">About the author</p>', bio, "</div>"),
        "newsletter": ('<aside class="newsletter">', ["<p>%s</p>" % E(nl)], "</aside>"),
    }
    if not heavy:
        for k in ("comments", "bio", "newsletter", "popular", "tags"):
            blocks[k] = (blocks[k][0], [], blocks[k][2])
    order = [k for k in blocks if blocks[k][1]]
    rng.shuffle(order)
    counts = {k: 0 for k in blocks}
    core = [head, nav, crumbs, dateline, footer, cookie, toc, fixed_aside,
            '<h1>%s</h1>' % E(title)]
    tw = sum(wc(x) for x in core) - len(title.split())
    unit_w = {k: [wc(u) for u in blocks[k][1]] for k in blocks}
    wrap_w = {k: wc(blocks[k][0] + blocks[k][2]) for k in blocks}
    goal = target * B
    progress = True
    while tw < goal and progress:
        progress = False
        for k in order:
            if counts[k] < len(blocks[k][1]):
                add = unit_w[k][counts[k]] + (wrap_w[k] if counts[k] == 0 else 0)
                if heavy and tw + add > 4.9 * B:
                    continue
                counts[k] += 1
                tw += add
                progress = True
                if tw >= goal:
                    break

    def blk(k):
        if not counts[k]:
            return ""
        a, units, z = blocks[k]
        return a + "\n".join(units[:counts[k]]) + z

    parts = body_html_parts(doc["blocks"])
    # newsletter / ad box between body paragraphs
    nlbox = blk("newsletter")
    if nlbox:
        pidx = [i for i, p in enumerate(parts) if p.startswith("<p>")]
        at = pidx[min(1, len(pidx) - 1)] + 1 if pidx else len(parts)
        parts.insert(at, nlbox)
    article = ('<main id="content"><article>\n<h1>%s</h1>\n%s\n%s\n</article></main>'
               % (E(title), dateline, "\n".join(parts)))
    side = [blk(k) for k in order if k in ("teasers", "popular", "tags")]
    post = [blk(k) for k in order if k in ("comments", "bio", "related")]
    pre = [toc] if toc else []
    if fixed_aside:
        # hard case: identical aside, always in the same slot
        side_html = fixed_aside
    else:
        side_html = ""
    if rng.random() < 0.5:
        layout = [nav, crumbs] + pre + [article, side_html] + post + ['<div class="sidebar">'] + side + ["</div>"]
    else:
        layout = [nav, crumbs, '<div class="sidebar">'] + side + ["</div>"] + pre + [article, side_html] + post
    html = head + "\n".join(x for x in layout if x) + "\n" + footer + "\n" + cookie + "\n</body>\n</html>\n"
    total = len(visible_words(html))
    ratio = round((total - B) / B, 3)
    return html, ratio


def render_print(doc):
    cfg = SITES[doc["site"]]
    title = doc["blocks"][0]["text"]
    html = ('<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n<title>%s</title>\n'
            '<style>body{font-family:serif;max-width:40em}</style>\n</head>\n<body class="print">\n'
            '<p class="print-head">%s</p>\n<article>\n<h1>%s</h1>\n%s\n</article>\n'
            '<p class="print-foot">Printed from %s</p>\n</body>\n</html>\n'
            % (E(title), E(cfg["name"]), E(title), "\n".join(body_html_parts(doc["blocks"])), E(doc["orig_url"])))
    total = len(visible_words(html))
    return html, round((total - doc["words"]) / doc["words"], 3)


# ---------------------------------------------------------------------------
# TXT export
# ---------------------------------------------------------------------------
def wrap_hyph(text, width, rng):
    words = text.split(" ")
    out, cur = [], ""
    for w in words:
        cand = (cur + " " + w) if cur else w
        if len(cand) <= width:
            cur = cand
            continue
        room = width - len(cur) - 2
        if cur and len(w) >= 9 and w.isalpha() and room >= 4 and rng.random() < 0.6:
            cut = min(room, len(w) - 3)
            out.append(cur + " " + w[:cut] + "-")
            cur = w[cut:]
            continue
        if cur:
            out.append(cur)
        cur = w
    if cur:
        out.append(cur)
    return out


def render_txt(doc, rng):
    cfg = SITES[doc["site"]]
    width = rng.choice([64, 68, 72, 76])
    title = doc["blocks"][0]["text"]
    hdr = ["%s - text export" % cfg["name"], "Source: %s" % doc["orig_url"],
           "Exported: 2026-%02d-%02d" % (rng.randint(1, 11), rng.randint(1, 28)), ""]
    out = list(hdr)
    out += [title, "=" * len(title), ""]
    for b in doc["blocks"][1:]:
        if b["t"] == "h2":
            out += [b["text"], "-" * len(b["text"]), ""]
        elif b["t"] == "p":
            out += wrap_hyph(" ".join(s["text"] for s in b["sents"]), width, rng) + [""]
        elif b["t"] == "ul":
            for it in b["items"]:
                wl = wrap_hyph(it, width - 4, rng)
                out.append("  * " + wl[0])
                out += ["    " + x for x in wl[1:]]
            out.append("")
        elif b["t"] == "table":
            n = len(b["rows"][0])
            widths = [max(len(r[i]) for r in b["rows"]) for i in range(n)]
            for ri, r in enumerate(b["rows"]):
                out.append("  ".join(r[i].ljust(widths[i]) for i in range(n)).rstrip())
                if ri == 0:
                    out.append("  ".join("-" * widths[i] for i in range(n)))
            out.append("")
    out += ["-- end of export --", ""]
    text = "\n".join(out)
    tmpl = sum(len(x.split()) for x in hdr) + 4
    return text, round(tmpl / doc["words"], 3)


# ---------------------------------------------------------------------------
# Markdown export
# ---------------------------------------------------------------------------
def render_md(doc, rng):
    cfg = SITES[doc["site"]]
    title = doc["blocks"][0]["text"]
    fm = ["---", 'title: "%s"' % title.replace('"', "'"), "source: %s" % doc["orig_url"],
          "publisher: %s" % cfg["name"], "date: 2026-%02d-%02d" % (rng.randint(1, 11), rng.randint(1, 28)),
          "section: %s" % cfg["section"][doc["fam"]], "---", ""]
    out = list(fm) + ["# " + title, ""]
    refs = []
    for b in doc["blocks"][1:]:
        if b["t"] == "h2":
            out += ["## " + b["text"], ""]
        elif b["t"] == "p":
            text = " ".join(s["text"] for s in b["sents"])
            ws = text.split(" ")
            # reference-style link on a capitalised word (not the first) now and then
            cand = [i for i, w in enumerate(ws) if i > 0 and w[:1].isupper() and w.isalpha()
                    and not ws[i - 1].endswith((".", ";", ":", "?"))]
            if cand and rng.random() < 0.6:
                i = rng.choice(cand)
                refs.append("https://%s/search?q=%s" % (cfg["host"], ws[i].lower()))
                ws[i] = "[%s][%d]" % (ws[i], len(refs))
            out += [" ".join(ws), ""]
        elif b["t"] == "ul":
            out += ["- " + it for it in b["items"]] + [""]
        elif b["t"] == "table":
            r0 = b["rows"][0]
            out.append("| " + " | ".join(r0) + " |")
            out.append("|" + "|".join("---" for _ in r0) + "|")
            for r in b["rows"][1:]:
                out.append("| " + " | ".join(r) + " |")
            out.append("")
    if refs:
        out += ["[%d]: %s" % (i + 1, u) for i, u in enumerate(refs)] + [""]
    text = "\n".join(out)
    tmpl = sum(len(x.split()) for x in fm) + 2 * len(refs)
    return text, round(tmpl / doc["words"], 3)


# ---------------------------------------------------------------------------
# PDF export (fpdf2)
# ---------------------------------------------------------------------------
def render_pdf(doc, rng):
    from fpdf import FPDF
    from fpdf.enums import Align

    cfg = SITES[doc["site"]]
    title = doc["blocks"][0]["text"]
    run_head = "%s  |  %s" % (cfg["name"], title if len(title) < 48 else title[:45] + "...")
    run_foot = "%s" % doc["orig_url"]

    class P(FPDF):
        def header(self):
            self.set_font("Helvetica", "I", 8)
            self.cell(0, 6, run_head, align="L", new_x="LMARGIN", new_y="NEXT")
            self.ln(8)

        def footer(self):
            self.set_y(-12)
            self.set_font("Helvetica", "I", 8)
            self.cell(0, 6, "%s    Page %d of {nb}" % (run_foot, self.page_no()), align="C")

    fmt_ = "A5" if doc["words"] > 220 else rng.choice(["A5", "A4", "A4"])
    pdf = P(format=fmt_)
    pdf.set_creation_date(datetime.datetime(2026, 11, 1, 9, 0, 0, tzinfo=datetime.timezone.utc))
    pdf.set_title(title)
    pdf.set_author(cfg["name"])
    pdf.set_auto_page_break(True, margin=16)
    pdf.alias_nb_pages()
    pdf.add_page()
    pdf.set_font("Helvetica", "B", 15)
    pdf.multi_cell(0, 7, title, align="L", new_x="LMARGIN", new_y="NEXT")
    pdf.ln(2)
    for b in doc["blocks"][1:]:
        if b["t"] == "h2":
            pdf.ln(1)
            pdf.set_font("Helvetica", "B", 11.5)
            pdf.multi_cell(0, 6, b["text"], align="L", new_x="LMARGIN", new_y="NEXT")
        elif b["t"] == "p":
            pdf.set_font("Helvetica", "", 10)
            pdf.multi_cell(0, 5, " ".join(s["text"] for s in b["sents"]), align="J", new_x="LMARGIN", new_y="NEXT")
            pdf.ln(1.5)
        elif b["t"] == "ul":
            pdf.set_font("Helvetica", "", 10)
            for it in b["items"]:
                pdf.set_x(pdf.l_margin + 4)
                pdf.multi_cell(0, 5, "- " + it, align="L", new_x="LMARGIN", new_y="NEXT")
            pdf.ln(1.5)
        elif b["t"] == "table":
            pdf.set_font("Helvetica", "", 9)
            with pdf.table(first_row_as_headings=True, line_height=5.5) as t:
                for r in b["rows"]:
                    row = t.row()
                    for c in r:
                        row.cell(c)
            pdf.ln(2)
    data = bytes(pdf.output())
    pages = pdf.pages_count
    tmpl = pages * (len(run_head.split()) + len(run_foot.split()) + 4)
    return data, pages, round(tmpl / doc["words"], 3)
