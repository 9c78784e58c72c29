"""HTML site templates with rotation and per-page variation."""
import html
import zlib

from common import html_visible_text, word_count
from sitecfg import SITES, LEGAL_GENERIC

E = html.escape
SECTION_LABEL = {
    "cars-and-bays": "Cars and bays", "members": "Members", "at-the-airport": "At the airport", "community": "Community",
    "applications": "Applications", "decisions": "Decisions", "treatments": "Treatments", "news": "News",
    "workshops": "Workshops", "guides": "Repair guides", "racing": "Racing", "club": "Club", "safety": "Safety advice",
    "timetable-changes": "Timetable changes", "service-updates": "Service updates", "posts": "Posts", "seminars": "Seminars",
}


def h(seed_text):
    return zlib.crc32(seed_text.encode("utf-8"))


def twc(fragment):
    return word_count(html_visible_text("<body>" + fragment + "</body>"))


def first_sentence(doc):
    for kind, val in doc["blocks"]:
        if kind == "p":
            s = val.split(". ")[0]
            return s if s.endswith(".") else s + "."
    return doc["title"] + "."


def render_body(blocks, promo_html=None, promo_after=2):
    out, i, n_p, in_list = [], 0, 0, False
    for kind, val in blocks:
        if kind != "li" and in_list:
            out.append("</ul>")
            in_list = False
        if kind == "h1":
            out.append("<h1>{}</h1>".format(E(val)))
        elif kind == "h2":
            out.append("<h2>{}</h2>".format(E(val)))
        elif kind == "p":
            out.append("<p>{}</p>".format(E(val)))
            n_p += 1
            if promo_html and n_p == promo_after:
                out.append(promo_html)
                promo_html = None
        elif kind == "li":
            if not in_list:
                out.append("<ul>")
                in_list = True
            out.append("<li>{}</li>".format(E(val)))
        elif kind == "table":
            rows = val
            t = ["<table>", "<thead><tr>" + "".join("<th>{}</th>".format(E(c)) for c in rows[0]) + "</tr></thead>", "<tbody>"]
            for r in rows[1:]:
                t.append("<tr>" + "".join("<td>{}</td>".format(E(c)) for c in r) + "</tr>")
            t.append("</tbody></table>")
            out.append("\n".join(t))
    if in_list:
        out.append("</ul>")
    if promo_html:
        out.append(promo_html)
    return "\n".join(out)


def data_table(caption, rows, cls):
    t = ['<section class="{}"><h3>{}</h3><table>'.format(cls, E(caption))]
    t.append("<tr>" + "".join("<th>{}</th>".format(E(c)) for c in rows[0]) + "</tr>")
    for r in rows[1:]:
        t.append("<tr>" + "".join("<td>{}</td>".format(E(c)) for c in r) + "</tr>")
    t.append("</table></section>")
    return "\n".join(t)


def render_page(doc, site_docs, pos):
    """doc: dict with site (host site), title, blocks, section, slug, date, url. site_docs: docs on the same site
    (for teasers). pos: ordinal of doc on its site. Returns (html_text, template_words, body_words)."""
    cfg = SITES[doc["site"]]
    seed = h(doc["site"] + "/" + doc["slug"])
    body_words = word_count("\n".join(doc["body_lines"]))
    section = doc["section"] if doc["section"] in cfg["menus"] else list(cfg["menus"])[0]
    sec_label = SECTION_LABEL.get(section, section)
    headings = [v for k, v in doc["blocks"] if k == "h2"]
    n_docs = max(1, len(site_docs))

    req, opt = {}, []
    # header: menu differs by section
    menu = cfg["menus"][section]
    other_secs = [SECTION_LABEL.get(s, s) for s in cfg["menus"] if s != section]
    req["header"] = ('<header><a class="skip" href="#content">Skip to content</a><div class="brand">{}</div><p class="tagline">{}</p>'
                     '<nav class="primary"><ul>{}</ul></nav><nav class="section"><h4>{}</h4><ul>{}</ul></nav></header>').format(
        E(cfg["name"]), E(cfg["tagline"]),
        "".join("<li>{}</li>".format(E(x)) for x in cfg["menu_common"] + other_secs),
        E(sec_label), "".join("<li>{}</li>".format(E(x)) for x in menu))
    req["crumbs"] = '<nav class="breadcrumbs">Home &gt; {} &gt; {}</nav>'.format(E(sec_label), E(doc["title"]))
    hours_ago = 1 + seed % 23
    views = 40 + seed % 2900
    req["dateline"] = '<p class="dateline">Published {}. Last updated {} hours ago. {} views.</p>'.format(E(doc["date"]), hours_ago, views)
    legal = LEGAL_GENERIC.format(name=cfg["name"], org=cfg["org"], addr=cfg["addr"]) + (" " + cfg["legal_extra"] if cfg.get("legal_extra") else "")
    req["footer_short"] = '<div class="footer-links"><a>Accessibility</a> <a>Privacy</a> <a>Cookies</a> <a>Contact us</a> <a>Site map</a></div><p class="copy">Copyright 2026 {}</p>'.format(E(cfg["org"]))
    if cfg["cookie"]:
        req["cookie"] = '<div class="cookie-notice"><p>{}</p><button>Accept all</button> <button>Reject optional</button></div>'.format(E(cfg["cookie"]))
    if cfg.get("hours"):
        req["hours"] = data_table("Opening hours at our practices", cfg["hours"], "hours")
    if cfg.get("fares"):
        req["fares"] = data_table("Fares at a glance", cfg["fares"], "fares")
    if cfg.get("tides"):
        req["tides"] = data_table("Tides at Saltcote this weekend", cfg["tides"], "tides")
    if doc.get("hardcase") and cfg.get("hardcase_teasers"):
        # byte-identical teaser aside on every short passenger notice (quotes fixed notices, sometimes the page itself)
        fixed = [d for s in cfg["hardcase_teasers"] for d in site_docs if d["slug"] == s and d["role"] == "original"]
        req["byf"] = ('<aside id="before-you-fly" class="travel-advice"><h3>Latest passenger notices</h3><ul>{}</ul>'
                      '<p>{}</p></aside>').format("".join('<li class="teaser"><a>{}</a><p>{}</p></li>'.format(E(d["title"]), E(first_sentence(d))) for d in fixed),
                                                  E(cfg["before_you_fly"]))

    # optional parts
    if cfg["kind"] != "light":
        opt.append(("legal", '<div class="legal"><p>{}</p></div>'.format(E(legal))))
    if headings and cfg["kind"] == "heavy":
        opt.append(("toc", '<nav class="toc"><h4>On this page</h4><ol>{}</ol></nav>'.format("".join("<li>{}</li>".format(E(x)) for x in headings))))
    if cfg["promos"]:
        opt.append(("promo", '<div class="promo"><strong>{}</strong></div>'.format(E(cfg["promos"][(pos + seed % 3) % len(cfg["promos"])]))))
    if cfg["share"]:
        opt.append(("share", '<div class="share">{}</div>'.format(" ".join("<button>{}</button>".format(E(s)) for s in cfg["share"]))))
    if cfg["popular"]:
        k = len(cfg["popular"])
        pops = [cfg["popular"][(pos + j) % k] for j in range(3)]
        opt.append(("popular", '<div class="popular"><h4>Popular right now</h4><ol>{}</ol></div>'.format("".join("<li>{}</li>".format(E(x)) for x in pops))))
    if cfg["tags"]:
        k = len(cfg["tags"])
        tg = [cfg["tags"][(seed // 7 + j * 3) % k] for j in range(5)]
        seen = []
        for t in tg:
            if t not in seen:
                seen.append(t)
        opt.append(("tags", '<div class="tags">Tags: {}</div>'.format(", ".join(E(t) for t in seen))))
    if cfg["bio"]:
        opt.append(("bio", '<div class="author">{}</div>'.format(E(cfg["bio"]))))
    if cfg.get("faq"):
        opt.append(("faq", '<section class="faq"><h3>Questions people ask</h3>{}</section>'.format("".join(
            "<details><summary>{}</summary><p>{}</p></details>".format(E(q), E(a)) for q, a in cfg["faq"]))))
    if cfg.get("departures"):
        opt.append(("departures", data_table("Today's departures", cfg["departures"], "departures")))
    others = [d for d in site_docs if d["slug"] != doc["slug"]]
    if cfg["kind"] == "heavy" and others:
        sect = [d["title"] for d in others if d["section"] == doc["section"]][:6]
        if sect:
            opt.append(("sectionlist", '<nav class="in-section"><h4>Also in {}</h4><ul>{}</ul></nav>'.format(E(sec_label), "".join("<li>{}</li>".format(E(t)) for t in sect))))
    if cfg["commenters"]:
        k = len(cfg["commenters"])
        cm = [cfg["commenters"][(pos + j) % k] for j in range(2 + seed % 3)]
        opt.append(("comments", '<section class="comments"><h3>{} comments</h3>{}</section>'.format(len(cm), "".join(
            '<div class="comment"><span class="who">{}</span> <span class="when">{} days ago</span><p>{}</p></div>'.format(E(a), 1 + (seed + j) % 9, E(b)) for j, (a, b) in enumerate(cm)))))
    # teasers: first sentences of OTHER pages, sometimes of the current page
    rot = (seed % 97)
    order = others[rot % len(others):] + others[:rot % len(others)] if others else []
    order = order[::2] + order[1::2]
    uniq = []
    for d in order:
        if d not in uniq:
            uniq.append(d)
    teaser_src = uniq
    if pos % 4 == 0:
        teaser_src = [doc] + teaser_src

    def teaser(d):
        return '<li class="teaser"><a>{}</a><p>{}</p></li>'.format(E(d["title"]), E(first_sentence(d)))

    # rotate optional order per page so structure varies
    r = seed % max(1, len(opt))
    opt = opt[r:] + opt[:r]

    lo, hi = cfg["ratio"]
    target = lo + (hi - lo) * (0.25 + 0.45 * ((seed >> 8) % 100) / 100.0)
    chosen = dict(req)
    total = sum(twc(v) for v in chosen.values())
    for name, frag in opt:
        w = twc(frag)
        if total + w <= target * body_words:
            chosen[name] = frag
            total += w
    teasers = []
    n_t = 1
    for d in teaser_src:
        if cfg["kind"] == "light":
            break
        w = twc(teaser(d))
        if len(teasers) < n_t or total + w <= target * body_words:
            teasers.append(teaser(d))
            total += w
    # trim if the mandatory blocks pushed the page over the upper bound
    for name, frag in reversed(opt):
        if total <= (hi - 0.15) * body_words:
            break
        if name in chosen and name not in req:
            del chosen[name]
            total -= twc(frag)
    # long pages: add a footer site index of other page titles until the page carries its usual template load
    index_items = []
    for d in uniq:
        if cfg["kind"] == "light" or total >= (lo + 0.1) * body_words:
            break
        item = "<li>{}</li>".format(E(d["title"]))
        index_items.append(item)
        total += twc(item)
    if index_items:
        chosen["siteindex"] = '<nav class="site-index"><h4>More from {}</h4><ul>{}</ul></nav>'.format(E(cfg["name"]), "".join(index_items))
    # page x of y counter inside teaser box
    page_of = '<p class="pager">Page {} of {}</p>'.format(1 + pos % 12, 12) if teasers else ""

    # assemble
    parts = []
    for slot in cfg["layout"]:
        if slot == "cookie_top" and "cookie" in chosen:
            parts.append(chosen["cookie"])
        elif slot == "cookie_end" and "cookie" in chosen:
            parts.append(chosen["cookie"])
        elif slot == "header":
            parts.append(chosen["header"])
        elif slot == "crumbs":
            parts.append(chosen["crumbs"])
        elif slot in ("hours", "fares", "tides") and slot in chosen:
            parts.append(chosen[slot])
        elif slot == "left_sidebar":
            side = [chosen[k] for k in ("toc", "sectionlist") if k in chosen]
            if side:
                parts.append('<aside class="sidebar">{}</aside>'.format("\n".join(side)))
        elif slot == "main":
            promo = chosen.get("promo")
            body_html = render_body(doc["blocks"], promo_html=promo, promo_after=1 + pos % 2)
            # insert dateline after the h1
            body_html = body_html.replace("</h1>", "</h1>\n" + chosen["dateline"], 1)
            extra = [chosen[k] for k in ("share", "bio", "tags", "faq", "departures") if k in chosen]
            pre = chosen.get("byf", "")
            toc_inline = ""
            if "left_sidebar" not in cfg["layout"]:
                toc_inline = "\n".join(chosen[k] for k in ("toc", "sectionlist") if k in chosen)
            parts.append('<main id="content">{}{}<article>\n{}\n</article>{}</main>'.format(
                toc_inline, pre, body_html, "\n".join(extra)))
        elif slot == "right_teasers":
            box = []
            if teasers:
                box.append('<section class="also-like"><h3>You may also like</h3><ul>{}</ul>{}</section>'.format("".join(teasers), page_of))
            if "popular" in chosen:
                box.append(chosen["popular"])
            if box:
                parts.append('<aside class="rail">{}</aside>'.format("\n".join(box)))
        elif slot == "comments" and "comments" in chosen:
            parts.append(chosen["comments"])
        elif slot == "footer":
            parts.append('<footer>{}{}{}</footer>'.format(chosen.get("siteindex", ""), chosen["footer_short"], chosen.get("legal", "")))
    # sites without a comments slot in the layout still show comments at the end of main content
    if "comments" in chosen and "comments" not in cfg["layout"]:
        parts.insert(len(parts) - 1, chosen["comments"])
    page_html = ('<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n<title>{} | {}</title>\n'
                 '<link rel="canonical" href="{}">\n<style>body{{font-family:sans-serif}} .cookie-notice{{background:#eee}}</style>\n</head>\n<body>\n{}\n'
                 '<script>var pageViews = {};</script>\n</body>\n</html>\n').format(E(doc["title"]), E(cfg["name"]), E(doc["url"]), "\n".join(parts), views)
    total_words = word_count(html_visible_text(page_html))
    return page_html, total_words - body_words, body_words


def render_print(doc):
    cfg = SITES[doc["site"]]
    body_html = render_body(doc["blocks"])
    page_html = ('<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n<title>{} (print version)</title>\n</head>\n<body class="print">\n'
                 '<p class="print-head">{} - printer-friendly version</p>\n<article>\n{}\n</article>\n<p class="print-foot">Printed from {}</p>\n</body>\n</html>\n').format(
        E(doc["title"]), E(cfg["name"]), body_html, E(doc["url"]))
    body_words = word_count("\n".join(doc["body_lines"]))
    return page_html, word_count(html_visible_text(page_html)) - body_words, body_words
