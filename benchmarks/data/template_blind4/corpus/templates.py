"""HTML page chrome with per-page rotation, sized so template words land in a target ratio to body words."""
from html import escape
from html.parser import HTMLParser

from .common import FIRST, SURNAME, MONTH
from .sites import SITES


class TextWords(HTMLParser):
    """Counts whitespace-separated words in text nodes inside <body>, skipping script/style."""

    def __init__(self, whole=False):
        super().__init__(convert_charrefs=True)
        self.in_body = whole
        self.skip = 0
        self.chunks = []

    def handle_starttag(self, tag, attrs):
        if tag == "body":
            self.in_body = True
        if tag in ("script", "style"):
            self.skip += 1

    def handle_endtag(self, tag):
        if tag in ("script", "style"):
            self.skip -= 1
        if tag == "body":
            self.in_body = False

    def handle_data(self, data):
        if self.in_body and not self.skip:
            self.chunks.append(data)


def snippet_words(html):
    p = TextWords(whole=True)
    p.feed(html)
    p.close()
    return len(" ".join(p.chunks).split())


def e(t):
    return escape(t, quote=False)


def a(href, text):
    return f'<a href="{escape(href)}">{e(text)}</a>'


def slug(t):
    import re
    return re.sub(r"[^a-z0-9]+", "-", t.lower()).strip("-")


# ---------------------------------------------------------------- body html

def body_html(blocks, site):
    out = []
    for b in blocks:
        kind = b[0]
        if kind == "title":
            out.append(f"<h1>{e(b[1])}</h1>")
        elif kind == "h":
            out.append(f"<h2 id=\"{slug(b[1])}\">{e(b[1])}</h2>")
        elif kind == "p":
            out.append(f"<p>{e(' '.join(b[1]))}</p>")
        elif kind == "ul":
            tag = "ol" if site == "copperpot" and any(x[0].isupper() and x.split()[0] in (
                "Heat", "Warm", "Stir", "Add", "Rub", "Spoon", "Bake", "Rest", "Season") for x in b[1]) else "ul"
            out.append(f"<{tag}>" + "".join(f"<li>{e(x)}</li>" for x in b[1]) + f"</{tag}>")
        elif kind == "table":
            head, rows = b[1][0], b[1][1:]
            out.append("<table><thead><tr>" + "".join(f"<th>{e(c)}</th>" for c in head) + "</tr></thead><tbody>"
                       + "".join("<tr>" + "".join(f"<td>{e(c)}</td>" for c in row) + "</tr>" for row in rows)
                       + "</tbody></table>")
    return "\n".join(out)


# ---------------------------------------------------------------- components
# each returns html; sized components take n

def c_cookie(s, r, page, n=None):
    btns = r.choice([["Accept all cookies", "Reject optional cookies"], ["Accept", "Manage settings"],
                     ["Allow analytics", "Essential only", "Read our cookie policy"]])
    return (f'<div class="cookie-banner" role="region"><p>{e(s["cookie"])}</p>'
            + "".join(f"<button>{e(b)}</button>" for b in btns) + "</div>")


def c_header(s, r, page, n=None):
    nav = "".join(f"<li>{a('/' + slug(x), x)}</li>" for x in s["nav"])
    skip = '<a class="skip" href="#content">Skip to main content</a>' if s["heavy"] else ""
    search = '<form role="search"><label>Search this site</label><input name="q"><button>Search</button></form>' \
        if s["heavy"] else ""
    return (f'<header class="site-header">{skip}<p class="logo">{a("/", s["name"])}</p>'
            f'<p class="tagline">{e(s["tagline"])}</p><ul class="utility">{nav}</ul>{search}</header>')


def c_megamenu(s, r, page, n):
    panels = list(s["menu"])
    start = page["idx"] % len(panels)
    panels = panels[start:] + panels[:start]
    out = ['<nav class="mega-menu" aria-label="Main menu"><ul>']
    for title, links in panels[:n]:
        out.append(f"<li><span>{e(title)}</span><ul>" + "".join(f"<li>{a('/' + slug(title) + '/' + slug(x), x)}</li>"
                                                              for x in links) + "</ul></li>")
    out.append("</ul></nav>")
    return "".join(out)


def c_simple_nav(s, r, page, n=None):
    return '<nav class="top"><ul>' + "".join(f"<li>{a('/' + slug(x), x)}</li>" for x in s["nav"]) + "</ul></nav>"


def c_breadcrumb(s, r, page, n=None):
    trail = ["Home", page["section_label"], page["crumb"]]
    return '<nav class="breadcrumb" aria-label="Breadcrumb"><ol>' + "".join(f"<li>{e(x)}</li>" for x in trail) + "</ol></nav>"


def c_dateline(s, r, page, n=None):
    style = r.randrange(3)
    if style == 0:
        t = f"Published {page['date']}"
    elif style == 1:
        t = f"Last updated {page['date']} by the {s['bio_role']}"
    else:
        t = f"Posted on {page['date']} in {page['section_label']}"
    return f'<p class="dateline">{e(t)}</p>'


def c_toc(s, r, page, n=None):
    heads = [b[1] for b in page["blocks"] if b[0] == "h"]
    if len(heads) < 2:
        return ""
    return ('<nav class="toc"><h2>On this page</h2><ul>' + "".join(f"<li>{a('#' + slug(h), h)}</li>" for h in heads)
            + "</ul></nav>")


def _first_sentence(doc):
    for b in doc["blocks"]:
        if b[0] == "p":
            return b[1][0]
    for b in doc["blocks"]:
        if b[0] == "ul":
            return b[1][0]
    return ""


def c_teasers(s, r, page, n):
    others = page["others"]
    if not others:
        return ""
    start = r.randrange(len(others))
    picks = [others[(start + i * 3) % len(others)] for i in range(min(n, len(others)))]
    head = r.choice(["More from " + s["name"], "Latest", "You may also be interested in", "Elsewhere on the site"])
    out = [f'<aside class="teasers"><h2>{e(head)}</h2>']
    for d in picks:
        out.append(f'<div class="teaser"><h3>{a(d["url"], d["title"])}</h3><p>{e(_first_sentence(d))}</p>'
                   f'<p>{a(d["url"], "Read more")}</p></div>')
    out.append("</aside>")
    return "".join(out)


def c_popular(s, r, page, n):
    others = page["others"]
    if not others:
        return ""
    off = (page["idx"] * 5) % len(others)
    picks = [others[(off + i) % len(others)] for i in range(min(n, len(others)))]
    head = r.choice(["Most read this week", "Popular now", "Trending", "Most viewed"])
    return (f'<aside class="popular"><h2>{e(head)}</h2><ol>' + "".join(f"<li>{a(d['url'], d['title'])}</li>" for d in picks)
            + "</ol></aside>")


def c_related(s, r, page, n):
    rel = list(s["related"])
    r.shuffle(rel)
    return ('<aside class="related"><h2>Related links</h2><ul>' + "".join(f"<li>{a('/' + slug(x), x)}</li>" for x in rel[:n])
            + "</ul></aside>")


def c_tags(s, r, page, n):
    tags = list(s["tags"])
    r.shuffle(tags)
    return '<div class="tags"><span>Tags:</span> ' + " ".join(a("/tag/" + slug(t), t) for t in tags[:n]) + "</div>"


BIO_TPL = ["{name} is a {role} at {site} and has written for the website since it launched.",
           "{name} works as a {role} for {site}, and spends most weekends out and about in the valley.",
           "Written by {name}, {role}. {name} joined {site} after many years working in the district."]


def c_bio(s, r, page, n=None):
    name = page["author"]
    t = r.choice(BIO_TPL).format(name=name, role=s["bio_role"], site=s["name"])
    return f'<div class="author-bio"><h2>About the author</h2><p>{e(t)}</p></div>'


def c_comments(s, r, page, n):
    pool = list(s["comments"])
    if not pool:
        return ""
    r.shuffle(pool)
    out = [f'<section class="comments"><h2>{min(n, len(pool))} comments</h2>']
    for c in pool[:n]:
        who = f"{r.choice(FIRST)} {r.choice(SURNAME)[0]}."
        when = f"{r.randint(1, 28)} {r.choice(MONTH)} 2026"
        out.append(f'<div class="comment"><p class="who">{e(who)} wrote on {e(when)}:</p><p>{e(c)}</p>'
                   f'<p><a href="#reply">Reply</a></p></div>')
    out.append('<form class="comment-form"><label>Leave a comment</label><textarea></textarea>'
               '<button>Post comment</button></form></section>')
    return "".join(out)


def c_promo(s, r, page, n=None):
    if not s["asides"]:
        return ""
    return '<aside class="promo">' + "".join(f"<p>{e(x)}</p>" for x in s["asides"]) + "</aside>"


def c_newsletter(s, r, page, n=None):
    return (f'<aside class="newsletter"><h2>Stay in touch</h2><p>Get news from {e(s["name"])} in your inbox once a '
            f'month. We never share your address and you can unsubscribe at any time.</p><label>Email address</label>'
            f'<input type="email"><button>Sign up</button></aside>')


def c_share(s, r, page, n=None):
    return ('<div class="share"><span>Share this page:</span> <a href="#">Email</a> <a href="#">Print</a> '
            '<a href="#">Copy link</a></div>')


def c_sitemap(s, r, page, n):
    panels = list(s["menu"])
    out = ['<div class="footer-sitemap">']
    for title, links in panels[:n]:
        out.append(f"<div><h3>{e(title)}</h3><ul>" + "".join(f"<li>{a('/' + slug(x), x)}</li>" for x in links[:5])
                   + "</ul></div>")
    out.append("</div>")
    return "".join(out)


def c_legal(s, r, page, n):
    legal = s["legal"]
    return '<div class="legal">' + "".join(f"<p>{e(x)}</p>" for x in legal[:n]) + "</div>"


def c_footer_base(s, r, page, n=None):
    links = ["Privacy", "Accessibility", "Cookies", "Terms of use"] if s["heavy"] else ["Privacy", "Terms"]
    return (f'<p class="copyright">Copyright 2026 {e(s["name"])}. All rights reserved.</p><ul class="footer-links">'
            + "".join(f"<li>{a('/' + slug(x), x)}</li>" for x in links) + "</ul>")


def c_versions(s, r, page, n):
    """Light-site sidebar: list of other page titles."""
    others = page["others"]
    if not others:
        return ""
    off = page["idx"] % len(others)
    picks = [others[(off + i) % len(others)] for i in range(min(n, len(others)))]
    return ('<aside class="sidebar"><h2>Recent</h2><ul>' + "".join(f"<li>{a(d['url'], d['title'])}</li>" for d in picks)
            + "</ul></aside>")


# zone, fn, sizes (None = unsized)
HEAVY_OPTIONAL = [
    ("top", "cookie", c_cookie, [None]),
    ("top", "megamenu", c_megamenu, [5, 4, 3, 2, 1]),
    ("pre", "toc", c_toc, [None]),
    ("side", "teasers", c_teasers, [12, 10, 8, 6, 4, 3, 2, 1]),
    ("side", "popular", c_popular, [10, 8, 6, 4]),
    ("side", "related", c_related, [6, 4, 3]),
    ("art", "tags", c_tags, [12, 8, 5]),
    ("art", "bio", c_bio, [None]),
    ("after", "comments", c_comments, [9, 7, 5, 3, 2, 1]),
    ("side", "promo", c_promo, [None]),
    ("side", "newsletter", c_newsletter, [None]),
    ("art", "share", c_share, [None]),
    ("foot", "sitemap", c_sitemap, [5, 4, 3, 2]),
    ("foot", "legal", c_legal, [5, 4, 3, 2, 1]),
]

LIGHT_OPTIONAL = [
    ("side", "versions", c_versions, [8, 6, 4, 3, 2]),
    ("art", "tags", c_tags, [6, 4, 2]),
    ("foot", "legal", c_legal, [1]),
    ("pre", "toc", c_toc, [None]),
]


def build_page(s, page, r, body_words, lo, hi, fixed_aside=None):
    """Return (html, template_words). page: dict with title, blocks, idx, others, date, author, ..."""
    heavy = s["heavy"]
    target = r.uniform(lo + 0.15, hi - 0.3) * body_words
    cap_words = (hi - 0.08) * body_words
    parts = {"top": [], "pre": [], "art": [], "after": [], "side": [], "foot": []}
    total = 0

    def add(zone, name, html):
        nonlocal total
        if html:
            parts[zone].append((name, html))
            total += snippet_words(html)

    add("top", "header", c_header(s, r, page))
    if not heavy:
        add("top", "nav", c_simple_nav(s, r, page))
    add("top", "breadcrumb", c_breadcrumb(s, r, page))
    add("art", "dateline", c_dateline(s, r, page))
    add("foot", "footer", c_footer_base(s, r, page))
    if fixed_aside:
        add("side", "fixed", fixed_aside)
    opts = list(HEAVY_OPTIONAL if heavy else LIGHT_OPTIONAL)
    r.shuffle(opts)
    for zone, name, fn, sizes in opts:
        if total >= target:
            break
        need = target - total
        chosen = None
        for n in sizes:
            html = fn(s, r, page, n)
            if not html:
                break
            w = snippet_words(html)
            if total + w <= cap_words and w <= need + 60:
                chosen = html
                break
        if chosen:
            add(zone, name, chosen)
    ratio = total / body_words
    if not (lo <= ratio <= hi):
        return None, ratio
    # rotation of layout
    side_first = r.random() < 0.4
    cookie_bottom = r.random() < 0.5
    top = parts["top"]
    if cookie_bottom:
        cookie = [p for p in top if p[0] == "cookie"]
        top = [p for p in top if p[0] != "cookie"]
    else:
        cookie = []
    r.shuffle(parts["art"])
    art_top = [p for p in parts["art"] if p[0] in ("dateline",) or r.random() < 0.3]
    art_bottom = [p for p in parts["art"] if p not in art_top]
    sides = parts["side"]
    r.shuffle(sides)
    main_cls = r.choice(["content", "main-content", "page-body", "primary"])
    html = ['<!DOCTYPE html>', '<html lang="en">', '<head><meta charset="utf-8">',
            f'<title>{e(page["title"])} | {e(s["name"])}</title>',
            f'<meta name="description" content="{escape(page["desc"])}">',
            '<link rel="stylesheet" href="/static/site.css">', '</head>',
            f'<body class="{s["slug"]} layout-{"a" if side_first else "b"}">']
    html += [h for _, h in top]
    side_html = f'<div class="sidebar-column">{"".join(h for _, h in sides)}</div>' if sides else ""
    if side_first:
        html.append(side_html)
    html += [h for _, h in parts["pre"]]
    html.append(f'<main id="content" class="{main_cls}"><article>')
    html += [h for _, h in art_top]
    html.append(f'<div class="entry">{page["body_html"]}</div>')
    html += [h for _, h in art_bottom]
    html.append("</article>")
    html += [h for _, h in parts["after"]]
    html.append("</main>")
    if not side_first:
        html.append(side_html)
    html.append('<footer class="site-footer">' + "".join(h for _, h in parts["foot"]) + "</footer>")
    html += [h for _, h in cookie]
    html.append('<script>window.siteConfig = {"analytics": false};</script>')
    html.append("</body></html>")
    return "\n".join(html) + "\n", ratio
