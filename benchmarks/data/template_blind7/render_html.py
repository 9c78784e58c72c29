"""HTML page templates. Template text is assembled from units whose word counts are measured,
so each heavy page lands inside its template/body ratio band."""
import html as _h
from corpus_core import html_text, norm_words

E = _h.escape


def words_of(fragment):
    return len(norm_words(html_text(fragment)))


def body_html(flat, inserts):
    """flat blocks -> list of HTML strings; inserts: {block_index: html} placed after that block."""
    out = []
    for i, b in enumerate(flat):
        t = b["t"]
        if t == "h1":
            out.append(f"<h1>{E(b['text'])}</h1>")
        elif t == "h2":
            out.append(f"<h2 id=\"s{i}\">{E(b['text'])}</h2>")
        elif t == "p":
            out.append(f"<p>{E(b['text'])}</p>")
        elif t == "ul":
            out.append("<ul>\n" + "\n".join(f"  <li>{E(x)}</li>" for x in b["items"]) + "\n</ul>")
        elif t == "table":
            rows = b["rows"]
            head = "".join(f"<th>{E(c)}</th>" for c in rows[0])
            body = "\n".join("<tr>" + "".join(f"<td>{E(c)}</td>" for c in r) + "</tr>" for r in rows[1:])
            out.append(f"<table class=\"content-table\">\n<thead><tr>{head}</tr></thead>\n<tbody>\n{body}\n</tbody>\n</table>")
        if i in inserts:
            out.append(inserts[i])
    return out


def first_sentence(text):
    for sep in (". ", "? ", "! "):
        if sep in text:
            return text.split(sep)[0] + sep.strip()
    return text


def _ul(items, cls):
    return f"<ul class=\"{cls}\">" + "".join(f"<li>{x}</li>" for x in items) + "</ul>"


class Page:
    """Collects template units around a body and picks optional ones to hit a ratio target."""

    def __init__(self, site, doc, ctx, rng):
        self.site, self.doc, self.ctx, self.rng = site, doc, ctx, rng

    # ---- units -----------------------------------------------------------------
    def u_header(self):
        s = self.site
        return (f"<header class=\"masthead\"><a class=\"skip\" href=\"#main\">Skip to main content</a>"
                f"<p class=\"brand\"><a href=\"/\">{E(s['name'])}</a></p><p class=\"tagline\">{E(s['tagline'])}</p>"
                f"<form class=\"search\" role=\"search\"><label>Search this site</label><input name=\"q\"><button>Search</button></form></header>")

    def u_nav(self):
        s, sec = self.site, self.doc["section"]
        items = []
        for key, (label, sub) in s["sections"].items():
            if key == sec:
                items.append(f"<li class=\"current\"><a href=\"/{key}/\">{E(label)}</a>" + _ul([f"<a href=\"#\">{E(x)}</a>" for x in sub], "sub") + "</li>")
            else:
                items.append(f"<li><a href=\"/{key}/\">{E(label)}</a></li>")
        return "<nav class=\"primary\"><ul>" + "".join(items) + "</ul></nav>"

    def u_megamenu(self):
        cols = []
        for key, (label, sub) in self.site["sections"].items():
            cols.append(f"<div class=\"col\"><p class=\"col-title\">{E(label)}</p>" + _ul([E(x) for x in sub], "mega") + "</div>")
        return "<div class=\"mega-menu\" aria-label=\"All sections\">" + "".join(cols) + "</div>"

    def u_breadcrumbs(self):
        label = self.site["sections"][self.doc["section"]][0]
        return (f"<nav class=\"breadcrumbs\"><a href=\"/\">Home</a> &rsaquo; <a href=\"/{self.doc['section']}/\">{E(label)}</a>"
                f" &rsaquo; <span>{E(self.doc['title'])}</span></nav>")

    def u_meta(self):
        d, r = self.doc, self.rng
        style = d["page_no"] % 3
        if style == 0:
            return f"<p class=\"meta\">Published {E(d['pub_date'])}. Updated {r.randint(2, 23)} hours ago. Viewed {r.randint(120, 9800):,} times.</p>"
        if style == 1:
            return f"<p class=\"meta\">Page {d['page_no'] % 12 + 1} of 12 in {E(self.site['sections'][d['section']][0])}. Last updated {E(d['pub_date'])}: {E(d['title'])}.</p>"
        return f"<p class=\"meta\">Posted {E(d['pub_date'])} by the {E(self.site['sections'][d['section']][0])} team. {r.randint(3, 140)} people found this useful.</p>"

    def u_share(self):
        return "<div class=\"share\"><button>Print this page</button> <button>Share by email</button> <button>Copy link</button> <button>Download PDF</button></div>"

    def u_footer(self):
        s = self.site
        if self.doc.get("generation") == "old" and s.get("footer_old"):
            return f"<div id=\"footer-legacy\"><table><tr><td>{E(s['footer_old'])}</td></tr></table></div>"
        return f"<footer class=\"site-footer\"><p>{E(s['footer_new'])}</p><p>&copy; 2026 {E(s['name'])}</p></footer>"

    def u_cookie(self):
        c = self.site.get("cookie")
        return f"<div class=\"cookie-consent\" role=\"dialog\"><p>{E(c)}</p><button>Accept</button><button>Reject</button></div>" if c else ""

    def u_localised(self):
        s = self.site
        return "<p class=\"section-note\">" + E(s["localised"].format(section=s["sections"][self.doc["section"]][0], date=self.doc["pub_date"])) + "</p>"

    def u_data_table(self):
        t = self.site.get("data_table")
        if not t:
            return ""
        head = "".join(f"<th>{E(c)}</th>" for c in t[0])
        rows = "".join("<tr>" + "".join(f"<td>{E(c)}</td>" for c in r) + "</tr>" for r in t[1:])
        return f"<section class=\"hours\"><h3>{E(self.site['data_caption'])}</h3><table><tr>{head}</tr>{rows}</table></section>"

    def u_toc(self):
        heads = [b["text"] for b in self.doc["flat"] if b["t"] == "h2"]
        if not heads:
            return ""
        return "<nav class=\"toc\"><p>On this page</p>" + _ul([E(h) for h in heads], "toc") + "</nav>"

    def u_teaser(self, other):
        return f"<div class=\"teaser\"><a href=\"#\">{E(other['title'])}</a><p>{E(first_sentence(other['first_para']))}</p></div>"

    def u_related_para(self, other):
        return f"<section class=\"related-quote\"><h3>Related: {E(other['title'])}</h3><blockquote>{E(other['first_para'])}</blockquote></section>"

    def u_popular(self):
        pool = self.ctx["titles"]
        off = (self.doc["page_no"] * 3) % max(1, len(pool))
        items = [pool[(off + i) % len(pool)] for i in range(5)]
        return "<section class=\"popular\"><h3>Popular this week</h3>" + _ul([E(x) for x in items], "pop") + "</section>"

    def u_tags(self):
        tags = self.site.get("tags") or []
        if not tags:
            return ""
        return "<div class=\"tag-cloud\"><p>Browse by tag</p>" + " ".join(f"<a class=\"tag\">{E(t)}</a>" for t in tags) + "</div>"

    def u_bio(self):
        who = self.doc["author"]
        return (f"<div class=\"author-bio\"><p>About the author: {E(who)} is a volunteer contributor to {E(self.site['name'])} "
                f"and has written {self.rng.randint(3, 60)} pieces for the site.</p></div>")

    def u_comment(self, i):
        s = self.site
        text = s["comments"][(self.doc["page_no"] + i) % len(s["comments"])]
        who = self.ctx["commenters"][(self.doc["page_no"] * 5 + i) % len(self.ctx["commenters"])]
        return f"<li class=\"comment\"><p class=\"by\">{E(who)} wrote {i + 1} day{'s' if i else ''} ago</p><p>{E(text)}</p><button>Reply</button></li>"

    def u_more(self, title):
        return f"<li><a href=\"#\">{E(title)}</a></li>"

    def u_promo(self, k):
        pool = self.site["promos"]
        return f"<aside class=\"promo\"><p>{E(pool[k % len(pool)])}</p><a href=\"#\">Find out more</a></aside>"

    def u_newsletter(self):
        n = self.site.get("newsletter")
        return f"<aside class=\"newsletter\"><p>{E(n)}</p><label>Email address</label><input><button>Sign up</button></aside>" if n else ""

    def u_credit(self):
        o = self.doc.get("credit")
        return f"<p class=\"credit\">This article first appeared on {E(o)} and is republished with permission.</p>" if o else ""

    # ---- assembly ----------------------------------------------------------------
    def build(self):
        d, s, r = self.doc, self.site, self.rng
        B = d["body_words"]
        heavy = s["heavy"] and d["layout"] != "print"
        if d["layout"] == "print":
            return self.build_print()
        core = {"header": self.u_header(), "nav": self.u_nav(), "crumbs": self.u_breadcrumbs(), "meta": self.u_meta(),
                "share": self.u_share(), "footer": self.u_footer(), "cookie": self.u_cookie(), "credit": self.u_credit(),
                "data": self.u_data_table()}
        if d.get("fixed_aside"):
            core["fixed_aside"] = d["fixed_aside"]
        used = sum(words_of(v) for v in core.values())
        opt = {}
        inserts = {}
        if heavy:
            lo, hi = d["ratio_target"] * B, 4.9 * B
            fixed = [("mega", self.u_megamenu()), ("local", self.u_localised()), ("toc", self.u_toc()),
                     ("popular", self.u_popular()), ("tags", self.u_tags())]
            if s["comments"]:
                fixed.append(("bio", self.u_bio()))
            if s["promos"]:
                fixed.append(("promo", self.u_promo(d["page_no"] + r.randrange(8))))
            if s.get("newsletter"):
                fixed.append(("newsletter", self.u_newsletter()))
            r.shuffle(fixed)
            if d.get("fixed_aside"):
                fixed = [f for f in fixed if f[0] not in ("popular",)]
            for name, frag in fixed:
                w = words_of(frag)
                if frag and used + w <= hi and used < lo:
                    opt[name] = frag
                    used += w
            # expandable lists
            lists = {"teaser": [], "related": [], "comment": [], "more": []}
            teaser_pool = [o for o in self.ctx["others"] if o["path"] != d["path"]]
            r.shuffle(teaser_pool)
            if d.get("fixed_aside"):
                teaser_pool = []
            if r.random() < 0.25 and not d.get("fixed_aside"):
                teaser_pool.insert(r.randrange(3), {"title": d["title"], "first_para": d["first_para"], "path": d["path"]})
            more_pool = [t for t in self.ctx["titles"] if t != d["title"]]
            r.shuffle(more_pool)
            gens = {"teaser": iter([self.u_teaser(o) for o in teaser_pool[:14]]),
                    "related": iter([self.u_related_para(o) for o in teaser_pool[14:17]]),
                    "comment": iter([self.u_comment(i) for i in range(len(s["comments"]))]) if s["comments"] else iter([]),
                    "more": iter([self.u_more(t) for t in more_pool[:18]])}
            order = ["teaser", "related", "comment", "more"]
            r.shuffle(order)
            live = list(order)
            while used < lo and live:
                for name in list(live):
                    frag = next(gens[name], None)
                    if frag is None:
                        live.remove(name)
                        continue
                    w = words_of(frag)
                    if used + w > hi:
                        live.remove(name)
                        continue
                    lists[name].append(frag)
                    used += w
                    if used >= lo:
                        break
            opt["lists"] = lists
            # in-body placement of promo / newsletter between paragraphs
            paras = [i for i, b in enumerate(d["flat"]) if b["t"] == "p"]
            slots = [i for i in paras if i != paras[-1]] or paras
            for name in ("promo", "newsletter"):
                if name in opt and slots:
                    k = slots[r.randrange(len(slots))]
                    inserts[k] = inserts.get(k, "") + opt.pop(name)
        return self.compose(core, opt, inserts)

    def compose(self, core, opt, inserts):
        d, s = self.doc, self.site
        lists = opt.get("lists", {"teaser": [], "related": [], "comment": [], "more": []})
        main = "\n".join(body_html(d["flat"], inserts))
        aside_parts = []
        if d.get("fixed_aside"):
            aside_parts.append(core["fixed_aside"])
        if lists["teaser"]:
            head = self.ctx["teaser_heads"][d["page_no"] % len(self.ctx["teaser_heads"])]
            aside_parts.append(f"<section class=\"teasers\"><h3>{E(head)}</h3>" + "\n".join(lists["teaser"]) + "</section>")
        aside_parts += lists["related"]
        if "popular" in opt:
            aside_parts.append(opt["popular"])
        if lists["more"]:
            aside_parts.append(f"<section class=\"more\"><h3>More in {E(s['sections'][d['section']][0])}</h3><ul>" + "".join(lists["more"]) + "</ul></section>")
        if "tags" in opt:
            aside_parts.append(opt["tags"])
        aside = "<aside class=\"sidebar\">\n" + "\n".join(aside_parts) + "\n</aside>"
        before = [opt.get("toc", "")]
        after_main = [core["share"], core["credit"], opt.get("bio", "")]
        if lists["comment"]:
            after_main.append(f"<section class=\"comments\"><h3>{len(lists['comment'])} comments</h3><ol>" + "\n".join(lists["comment"]) + "</ol><p>Comments are moderated.</p></section>")
        layout = d["layout"]
        top = [core["header"], opt.get("mega", ""), core["nav"], core["crumbs"]]
        if s["key"] in ("westmere-courts", "marlbrook-homes"):
            top.insert(0, core["cookie"])
            tail = []
        else:
            tail = [core["cookie"]]
        article = (f"<main id=\"main\">\n<article>\n{core['meta']}\n{main}\n</article>\n" + "\n".join(x for x in after_main if x) + "\n</main>")
        if layout == "sidebar-first":
            middle = [aside, "\n".join(x for x in before if x), article]
        elif layout == "toc-first":
            middle = ["\n".join(x for x in before if x), article, aside]
        else:
            middle = [article, "\n".join(x for x in before if x), aside]
        bottom = [core["data"], opt.get("local", ""), core["footer"]] + tail
        parts = [x for x in top + middle + bottom if x]
        cls = "legacy" if d.get("generation") == "old" else "v2"
        title = f"{d['title']} | {s['name']}"
        return ("<!DOCTYPE html>\n<html lang=\"en-GB\">\n<head>\n<meta charset=\"utf-8\">\n"
                f"<title>{E(title)}</title>\n<link rel=\"canonical\" href=\"{E(d['source_url'])}\">\n"
                f"<style>body{{font-family:sans-serif}} .{cls} aside{{float:right;width:30%}}</style>\n"
                f"<script>window.dataLayer=window.dataLayer||[];</script>\n</head>\n<body class=\"{cls} section-{d['section']}\">\n"
                + "\n".join(parts) + "\n</body>\n</html>\n")

    def build_print(self):
        d, s = self.doc, self.site
        main = "\n".join(body_html(d["flat"], {}))
        return ("<!DOCTYPE html>\n<html lang=\"en-GB\">\n<head>\n<meta charset=\"utf-8\">\n"
                f"<title>{E(d['title'])} (print version)</title>\n<style>@media print{{.noprint{{display:none}}}}</style>\n</head>\n<body class=\"print\">\n"
                f"<p class=\"noprint\"><button onclick=\"window.print()\">Print</button> <a href=\"#\">Back to full page</a></p>\n"
                f"<p class=\"print-head\">{E(s['name'])}</p>\n<main>\n{main}\n</main>\n"
                f"<p class=\"print-foot\">Printed from {E(d['source_url'].split('?')[0])} on {E(d['pub_date'])}</p>\n</body>\n</html>\n")


def light_page(site, doc):
    """Small sites: a plain template (nav, short footer)."""
    s = site
    main = "\n".join(body_html(doc["flat"], {}))
    nav = " | ".join(f"<a href=\"/{k}/\">{E(v[0])}</a>" for k, v in s["sections"].items())
    return ("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n"
            f"<title>{E(doc['title'])} - {E(s['name'])}</title>\n</head>\n<body>\n"
            f"<div id=\"top\"><b>{E(s['name'])}</b> - {E(s['tagline'])}</div>\n<div id=\"nav\">{nav}</div>\n"
            f"<div id=\"content\">\n{main}\n</div>\n<div id=\"foot\">{E(s['footer_new'])}</div>\n</body>\n</html>\n")
