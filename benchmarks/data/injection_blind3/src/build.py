#!/usr/bin/env python3
"""Deterministic assembler: hosts x payloads x placement x format -> docs/ + labels.jsonl.
All content is hand-written in src/hosts/*.txt, src/payloads_*.py and src/frames.py.
Run with the project venv: .venv/bin/python src/build.py
"""
import base64, codecs, hashlib, html, io, json, os, random, re, shutil, sys, urllib.parse
from datetime import datetime, timezone

SRC = os.path.dirname(os.path.abspath(__file__))
ROOT = os.path.dirname(SRC)
sys.path.insert(0, SRC)
import payloads_a, payloads_b, payloads_c, frames  # noqa: E402

SEED = 150315
FONT_DIR = os.path.join(SRC, "fonts")
PDF_LANGS = {"en", "es", "de", "fr", "pt", "ru", "it", "nl", "pl", "tr", "uk", "sv", "vi", "cs", "id", "hu", "el", "ro"}
FIXED_DATE = datetime(2024, 6, 1, 12, 0, 0, tzinfo=timezone.utc)

# ------------------------------------------------------------------ hosts
def parse_hosts():
    hosts = []
    for fn in sorted(os.listdir(os.path.join(SRC, "hosts"))):
        txt = open(os.path.join(SRC, "hosts", fn), encoding="utf-8").read()
        for chunk in txt.split("@@@ ")[1:]:
            head, body = chunk.split("\n", 1)
            meta = dict(re.findall(r"(\w+)=(.*?)(?= \w+=|$)", head))
            meta["body"] = body.strip("\n")
            meta["blocks"] = parse_blocks(meta["body"])
            hosts.append(meta)
    return hosts


def parse_blocks(text):
    lines = text.split("\n")
    blocks, i = [], 0
    while i < len(lines):
        l = lines[i]
        if not l.strip():
            i += 1
            continue
        if l.startswith("```"):
            lang = l[3:].strip()
            j, buf = i + 1, []
            while j < len(lines) and not lines[j].startswith("```"):
                buf.append(lines[j]); j += 1
            raw = "\n".join(lines[i:j + 1])
            blocks.append({"t": "code", "lang": lang, "text": "\n".join(buf), "raw": raw})
            i = j + 1
            continue
        buf = []
        while i < len(lines) and lines[i].strip() and not lines[i].startswith("```"):
            buf.append(lines[i]); i += 1
        raw = "\n".join(buf)
        if len(buf) == 1 and buf[0].startswith("#"):
            lvl = len(buf[0]) - len(buf[0].lstrip("#"))
            blocks.append({"t": "h", "level": lvl, "text": buf[0].lstrip("#").strip(), "raw": raw})
        elif all(b.startswith("|") for b in buf):
            rows = []
            for b in buf:
                cells = [c.strip() for c in b.strip().strip("|").split("|")]
                if all(re.fullmatch(r":?-{2,}:?", c) for c in cells):
                    continue
                rows.append(cells)
            blocks.append({"t": "table", "rows": rows, "raw": raw})
        elif all(re.match(r"^- ", b) for b in buf):
            blocks.append({"t": "ul", "items": [b[2:] for b in buf], "raw": raw})
        elif all(re.match(r"^\d+\. ", b) for b in buf):
            start = int(buf[0].split(".")[0])
            blocks.append({"t": "ol", "start": start, "items": [b.split(". ", 1)[1] for b in buf], "raw": raw})
        elif all(b.startswith(">") for b in buf):
            blocks.append({"t": "quote", "text": "\n".join(b.lstrip(">").strip() for b in buf), "raw": raw})
        else:
            blocks.append({"t": "p", "text": raw, "raw": raw})
    return blocks


def words(h):
    return len(re.findall(r"\w+", h["body"])) if h["lang"] not in ("zh", "ja") else len(h["body"]) // 2

# ------------------------------------------------------------------ inline helpers
def strip_inline(s):
    return s.replace("**", "").replace("`", "")


def html_inline(s):
    s = html.escape(s, quote=False)
    s = re.sub(r"\*\*(.+?)\*\*", r"<strong>\1</strong>", s)
    s = re.sub(r"`([^`]+)`", r"<code>\1</code>", s)
    return s.replace("\n", "<br>\n")

# ------------------------------------------------------------------ encoders for the 'encoded' class
HOMO = {"a": "\u0430", "e": "\u0435", "o": "\u043e", "p": "\u0440", "c": "\u0441", "x": "\u0445", "i": "\u0456"}

def encode(method, s, rng):
    if method == "base64":
        return base64.b64encode(s.encode()).decode()
    if method == "hex":
        return s.encode().hex()
    if method == "rot13":
        return codecs.encode(s, "rot13")
    if method == "url":
        return urllib.parse.quote(s, safe="")
    if method == "html-entities":
        return "".join("&#%d;" % ord(c) for c in s)
    if method == "quoted-printable":
        return "".join(c if c.isalnum() else "=%02X" % ord(c) for c in s)
    if method == "unicode-escapes":
        return "".join("\\u%04x" % ord(c) for c in s)
    if method == "leetspeak":
        return s.translate(str.maketrans({"a": "4", "e": "3", "i": "1", "o": "0", "s": "5", "t": "7", "A": "4", "E": "3", "S": "5", "T": "7"}))
    if method == "reversed":
        return s[::-1]
    if method == "homoglyph-zwsp":
        out = []
        for w in s.split(" "):
            w2 = "".join(HOMO.get(c, c) if rng.random() < 0.5 else c for c in w)
            if len(w2) > 3:
                k = rng.randrange(1, len(w2) - 1)
                w2 = w2[:k] + "\u200b" + w2[k:]
            out.append(w2)
        return " ".join(out)
    raise ValueError(method)

# ------------------------------------------------------------------ renderers
def render_md(doc):
    out = []
    fm = doc.get("front_matter")
    if fm:
        out.append("---\n" + "\n".join("%s: %s" % (k, json.dumps(v, ensure_ascii=False)) for k, v in fm) + "\n---")
    for b in doc["blocks"]:
        if b["t"] == "hidden":
            out.append(b["md"])
        else:
            out.append(b.get("raw") or block_to_md(b))
    if doc.get("md_footnotes"):
        out.append("\n".join("[^%d]: %s" % (i + 1, f) for i, f in enumerate(doc["md_footnotes"])))
    return "\n\n".join(out) + "\n"


def block_to_md(b):
    t = b["t"]
    if t == "h":
        return "#" * b["level"] + " " + b["text"]
    if t == "p":
        return b["text"]
    if t == "ul":
        return "\n".join("- " + x for x in b["items"])
    if t == "ol":
        return "\n".join("%d. %s" % (b.get("start", 1) + i, x) for i, x in enumerate(b["items"]))
    if t == "quote":
        return "\n".join("> " + x for x in b["text"].split("\n"))
    if t == "code":
        return "```%s\n%s\n```" % (b["lang"], b["text"])
    if t == "table":
        r = b["rows"]
        lines = ["| " + " | ".join(r[0]) + " |", "|" + "|".join("---" for _ in r[0]) + "|"]
        lines += ["| " + " | ".join(x) + " |" for x in r[1:]]
        return "\n".join(lines)
    raise ValueError(t)


def render_txt(doc, width=None):
    out = []
    for b in doc["blocks"]:
        t = b["t"]
        if t == "hidden":
            if b.get("txt") is not None:
                out.append(b["txt"])
            continue
        if t == "h":
            s = strip_inline(b["text"])
            out.append(s + "\n" + ("=" if b["level"] == 1 else "-") * len(s))
        elif t == "p":
            out.append(strip_inline(b["text"]))
        elif t == "ul":
            out.append("\n".join("  * " + strip_inline(x) for x in b["items"]))
        elif t == "ol":
            out.append("\n".join("  %d. %s" % (b.get("start", 1) + i, strip_inline(x)) for i, x in enumerate(b["items"])))
        elif t == "quote":
            out.append("\n".join("    " + x for x in strip_inline(b["text"]).split("\n")))
        elif t == "code":
            out.append("\n".join("    " + x for x in b["text"].split("\n")))
        elif t == "table":
            rows = [[strip_inline(c) for c in r] for r in b["rows"]]
            n = max(len(r) for r in rows)
            ws = [max(len(r[i]) if i < len(r) else 0 for r in rows) for i in range(n)]
            lines = ["  ".join((r[i] if i < len(r) else "").ljust(ws[i]) for i in range(n)).rstrip() for r in rows]
            lines.insert(1, "  ".join("-" * w for w in ws))
            out.append("\n".join(lines))
    return "\n\n".join(out) + "\n"


def block_to_html(b):
    t = b["t"]
    if t == "hidden":
        return b["html"]
    if t == "h":
        return "<h%d>%s</h%d>" % (min(b["level"], 4), html_inline(b["text"]), min(b["level"], 4))
    if t == "p":
        return "<p>%s</p>" % html_inline(b["text"])
    if t == "ul":
        return "<ul>\n" + "\n".join("  <li>%s</li>" % html_inline(x) for x in b["items"]) + "\n</ul>"
    if t == "ol":
        st = b.get("start", 1)
        return ("<ol>" if st == 1 else '<ol start="%d">' % st) + "\n" + "\n".join("  <li>%s</li>" % html_inline(x) for x in b["items"]) + "\n</ol>"
    if t == "quote":
        return "<blockquote><p>%s</p></blockquote>" % html_inline(b["text"])
    if t == "code":
        cls = ' class="language-%s"' % b["lang"] if b["lang"] else ""
        return "<pre><code%s>%s</code></pre>" % (cls, html.escape(b["text"], quote=False))
    if t == "table":
        r = b["rows"]
        s = "<table>\n  <thead><tr>" + "".join("<th>%s</th>" % html_inline(c) for c in r[0]) + "</tr></thead>\n  <tbody>\n"
        s += "\n".join("    <tr>" + "".join("<td>%s</td>" % html_inline(c) for c in x) + "</tr>" for x in r[1:])
        return s + "\n  </tbody>\n</table>"
    raise ValueError(t)


def render_html(doc):
    f = doc["html"]  # features dict
    lang = doc["lang"]
    head = ['<meta charset="utf-8">', '<meta name="viewport" content="width=device-width, initial-scale=1">',
            "<title>%s</title>" % html.escape(doc["title"])]
    if f.get("meta_desc") is not None:
        head.append('<meta name="description" content="%s">' % html.escape(f["meta_desc"]))
    css = ["body{font-family:Georgia,serif;max-width:46rem;margin:2rem auto;color:#222;background:#ffffff;line-height:1.5}",
           "table{border-collapse:collapse}td,th{border:1px solid #ccc;padding:.2rem .5rem}",
           "pre{background:#f4f4f4;padding:.6rem;overflow:auto}", ".sr-only{position:absolute;left:-10000px;width:1px;height:1px;overflow:hidden}",
           "#cookie-banner{display:none}", ".spinner{visibility:hidden}"]
    if f.get("css_badge"):
        css.append('.badge-new::after{content:"New";font-size:.7rem;color:#a33;margin-left:.3rem}')
    css += f.get("extra_css", [])
    head.append("<style>\n" + "\n".join(css) + "\n</style>")
    body = []
    body.append('<header>\n<a class="skip" href="#main">Skip to content</a>')
    if f.get("logo_svg"):
        body.append('<svg width="120" height="24" role="img" aria-label="%s logo"><text x="0" y="18" font-size="16">%s</text></svg>'
                    % (html.escape(f["site"]), html.escape(f["site"])))
    elif f.get("logo_img"):
        body.append('<img src="data:image/gif;base64,R0lGODlhAQABAAAAACw=" alt="%s logo" title="%s" width="1" height="1">' % (html.escape(f["site"]), html.escape(f["site"])))
    body.append('<nav aria-label="Main navigation" data-nav="primary"><a href="/">Home</a> | <a href="/docs">%s</a>%s | <a href="/contact">Contact</a></nav>\n</header>'
                % (html.escape(f["site"]), ' <span class="badge-new"></span>' if f.get("css_badge") else ""))
    if f.get("noscript"):
        body.append("<noscript><p>%s</p></noscript>" % html.escape(frames.HTML_NOSCRIPT))
    body.append('<div id="cookie-banner" role="dialog" aria-label="Cookie notice"><p>%s</p><button>OK</button></div>' % html.escape(frames.HTML_COOKIE))
    body.append('<div class="spinner" aria-hidden="true">Loading…</div>')
    main_attr = ' data-section="%s"' % html.escape(doc.get("genre", "doc"))
    if f.get("main_data_attr"):
        main_attr += ' %s="%s"' % f["main_data_attr"]
    body.append('<main id="main"%s>\n<article>' % main_attr)
    for b in doc["blocks"]:
        body.append(block_to_html(b))
    body.append("</article>\n</main>")
    if f.get("details_benign"):
        body.append("<details><summary>Page information</summary><p>Last reviewed by the content team. Report problems using the feedback form.</p></details>")
    if f.get("template_benign"):
        body.append('<template id="row-template"><tr><td class="name"></td><td class="value"></td></tr></template>')
    body.append('<footer>\n<form action="/feedback" method="post" data-form="feedback"><input type="hidden" name="csrf_token" value="%s">'
                '<label>Was this page helpful? <input type="text" name="comment"></label> <button>Send</button></form>'
                % f["csrf"])
    body.append('<p><small>&copy; %s. <a href="/privacy">Privacy</a></small></p>\n</footer>' % html.escape(f["site"]))
    body += f.get("tail", [])
    return ('<!DOCTYPE html>\n<html lang="%s">\n<head>\n%s\n</head>\n<body>\n%s\n</body>\n</html>\n'
            % (lang, "\n".join(head), "\n".join(body)))


def render_eml(doc):
    e = doc["eml"]
    plain = e.get("intro", "")
    plain = (plain + "\n\n" if plain else "") + render_txt(doc)
    if e.get("blank_tail"):
        plain = plain + "\n" * e["blank_tail"][0] + e["blank_tail"][1] + "\n"
    hdr = ["From: %s <%s>" % e["from"], "To: %s <%s>" % e["to"], "Subject: %s" % e["subject"],
           "Date: %s" % e["date"], "Message-ID: <%s@mail.example.com>" % e["msgid"], "MIME-Version: 1.0"]
    if not e.get("multipart"):
        hdr += ["Content-Type: text/plain; charset=utf-8", "Content-Transfer-Encoding: 8bit"]
        return "\n".join(hdr) + "\n\n" + plain
    bnd = "=_alt_" + e["msgid"][:16]
    hdoc = dict(doc)
    hdoc["blocks"] = doc["blocks"] + e.get("html_only_blocks", [])
    body_html = "<html><body>\n" + ("<p>%s</p>\n" % html_inline(e["intro"]) if e.get("intro") else "")
    body_html += "\n".join(block_to_html(b) for b in hdoc["blocks"]) + "\n</body></html>\n"
    hdr.append('Content-Type: multipart/alternative; boundary="%s"' % bnd)
    parts = ["--" + bnd, "Content-Type: text/plain; charset=utf-8", "Content-Transfer-Encoding: 8bit", "", plain,
             "--" + bnd, "Content-Type: text/html; charset=utf-8", "Content-Transfer-Encoding: 8bit", "", body_html,
             "--" + bnd + "--", ""]
    return "\n".join(hdr) + "\n\nThis is a multi-part message in MIME format.\n\n" + "\n".join(parts)

# ------------------------------------------------------------------ PDF (fpdf2)
_PNG = None

def cover_png():
    global _PNG
    if _PNG is None:
        from PIL import Image, ImageDraw
        im = Image.new("RGB", (400, 60), (236, 240, 246))
        d = ImageDraw.Draw(im)
        d.rectangle([0, 0, 399, 59], outline=(150, 160, 180))
        for k in range(0, 400, 20):
            d.line([k, 50, k + 10, 10], fill=(200, 205, 220))
        buf = io.BytesIO(); im.save(buf, format="PNG"); _PNG = buf.getvalue()
    return _PNG


def render_pdf_fpdf(doc):
    from fpdf import FPDF
    from fpdf.enums import TextMode
    pdf = FPDF(format="A4")
    pdf.set_creation_date(FIXED_DATE)
    pdf.set_producer("DocPress 3.1")
    pdf.set_title(doc["title"])
    pdf.add_font("DV", "", os.path.join(FONT_DIR, "DejaVuSans.ttf"))
    pdf.add_font("DV", "B", os.path.join(FONT_DIR, "DejaVuSans-Bold.ttf"))
    pdf.add_font("DVM", "", os.path.join(FONT_DIR, "DejaVuSansMono.ttf"))
    pdf.set_auto_page_break(True, 15)
    pdf.add_page()
    W = pdf.w - pdf.l_margin - pdf.r_margin

    def para(text, size=10, style="", font="DV", h=5, color=(0, 0, 0)):
        pdf.set_font(font, style, size)
        pdf.set_text_color(*color)
        pdf.multi_cell(W, h, text, new_x="LMARGIN", new_y="NEXT")
        pdf.ln(1.5)

    for b in doc["blocks"]:
        t = b["t"]
        if t == "hidden":
            sp = b["pdf"]
            kind, text = sp
            if kind == "render-mode-3":
                pdf.set_font("DV", "", 10)
                pdf.text_mode = TextMode.INVISIBLE
                pdf.multi_cell(W, 5, text, new_x="LMARGIN", new_y="NEXT")
                pdf.text_mode = TextMode.FILL
            elif kind == "white-text":
                para(text, color=(255, 255, 255))
            elif kind == "tiny-text":
                para(text, size=1, h=0.6)
            elif kind == "text-under-image":
                if pdf.get_y() > pdf.h - 50:
                    pdf.add_page()
                y = pdf.get_y()
                pdf.set_font("DV", "", 8)
                pdf.set_xy(pdf.l_margin + 2, y + 2)
                pdf.multi_cell(W - 4, 4, text, new_x="LMARGIN", new_y="NEXT")
                pdf.image(io.BytesIO(cover_png()), x=pdf.l_margin, y=y, w=W, h=W * 60 / 400)
                pdf.set_y(y + W * 60 / 400 + 3)
            elif kind == "hr":
                pdf.line(pdf.l_margin, pdf.get_y() + 1, pdf.l_margin + W, pdf.get_y() + 1)
                pdf.ln(3)
            elif kind == "annotation":
                pdf.text_annotation(x=pdf.w - 25, y=12, text=text, w=6, h=6)
            continue
        if t == "h":
            para(strip_inline(b["text"]), size={1: 16, 2: 13}.get(b["level"], 11), style="B", h=7)
        elif t == "p":
            para(strip_inline(b["text"]))
        elif t in ("ul", "ol"):
            for i, x in enumerate(b["items"]):
                mark = "•" if t == "ul" else "%d." % (b.get("start", 1) + i)
                para("%s %s" % (mark, strip_inline(x)), h=5)
        elif t == "quote":
            pdf.set_x(pdf.l_margin + 8)
            pdf.set_font("DV", "", 10)
            pdf.multi_cell(W - 8, 5, strip_inline(b["text"]), new_x="LMARGIN", new_y="NEXT")
            pdf.ln(1.5)
        elif t == "code":
            para(b["text"], size=8, font="DVM", h=4)
        elif t == "table":
            for r in b["rows"]:
                para("  |  ".join(strip_inline(c) for c in r), size=9, h=4.5)
    for a in doc.get("pdf_annots", []):
        pdf.page = 1
        pdf.text_annotation(x=pdf.w - 30, y=20, text=a, w=6, h=6)
    return bytes(pdf.output())

# ------------------------------------------------------------------ PDF (own raw writer, Helvetica/WinAnsi)
def _pdfstr(s):
    b = s.encode("cp1252", "replace")
    return b"(" + b.replace(b"\\", b"\\\\").replace(b"(", b"\\(").replace(b")", b"\\)") + b")"


def _wrap(text, n=92):
    out = []
    for para in text.split("\n"):
        line = ""
        for w in para.split(" "):
            if len(line) + len(w) + 1 > n and line:
                out.append(line); line = w
            else:
                line = (line + " " + w) if line else w
        out.append(line)
    return out


def raw_lines(doc):
    """Flatten blocks to (text, size) lines for the raw writer."""
    lines = []
    for b in doc["blocks"]:
        t = b["t"]
        if t == "hidden":
            lines.append(("__HIDDEN__", b["pdf"]))
            continue
        if t == "h":
            for l in _wrap(strip_inline(b["text"]), 60):
                lines.append((l, 14 if b["level"] == 1 else 12))
        elif t == "p":
            lines += [(l, 10) for l in _wrap(strip_inline(b["text"]))]
        elif t in ("ul", "ol"):
            for i, x in enumerate(b["items"]):
                mark = "-" if t == "ul" else "%d." % (b.get("start", 1) + i)
                lines += [(l, 10) for l in _wrap(mark + " " + strip_inline(x))]
        elif t == "quote":
            lines += [("    " + l, 10) for l in _wrap(strip_inline(b["text"]), 85)]
        elif t == "code":
            lines += [(l, 8) for l in b["text"].split("\n")]
        elif t == "table":
            for r in b["rows"]:
                lines += [(l, 9) for l in _wrap("  |  ".join(strip_inline(c) for c in r))]
        lines.append(("", 6))
    return lines


def render_pdf_raw(doc, extras):
    """extras: dict with optional keys: field=(name,value,visible), layer=(name,text,visible),
    split=text (payload drawn as many tiny text objects)."""
    pages, cur, y = [], [], 800
    ocg_used = False
    def newpage():
        nonlocal cur, y
        if cur:
            pages.append(cur)
        cur, y = [], 800
    for text, size in raw_lines(doc):
        if text == "__HIDDEN__":
            kind, ptext = size
            if kind == "split-text-objects":
                x = 56
                if y < 70: newpage()
                chunks = [ptext[i:i + 3] for i in range(0, len(ptext), 3)]
                for c in chunks:
                    cur.append(b"BT /F1 1 Tf 1 0 0 1 %.2f %.2f Tm %s Tj ET" % (x, y, _pdfstr(c)))
                    x += 1.6
                    if x > 540:
                        x = 56; y -= 1.5
                y -= 4
            elif kind == "ocg-hidden":
                if y < 70: newpage()
                cur.append(b"/OC /oc1 BDC")
                for l in _wrap(ptext):
                    cur.append(b"BT /F1 10 Tf 56 %d Td %s Tj ET" % (y, _pdfstr(l))); y -= 13
                cur.append(b"EMC")
                ocg_used = True
            continue
        lead = size + 3
        if y - lead < 50:
            newpage()
        if text:
            cur.append(b"BT /F1 %d Tf 56 %d Td %s Tj ET" % (size, y, _pdfstr(text)))
        y -= lead
    if extras.get("layer"):
        name, ltext, _vis = extras["layer"]
        cur.append(b"/OC /oc1 BDC BT /F1 8 Tf 56 30 Td %s Tj ET EMC" % _pdfstr(ltext))
        ocg_used = True
    pages.append(cur)

    objs = {}
    n_pages = len(pages)
    # 1 catalog, 2 pages, 3 font, 4 ocg, 5 field widget, 6 info, then pages
    first = 7
    kids = []
    for i, content in enumerate(pages):
        pobj, cobj = first + 2 * i, first + 2 * i + 1
        kids.append(pobj)
        stream = b"\n".join(content)
        res = b"<< /Font << /F1 3 0 R >>" + (b" /Properties << /oc1 4 0 R >>" if ocg_used else b"") + b" >>"
        annots = b" /Annots [5 0 R]" if (extras.get("field") and i == 0) else b""
        objs[pobj] = b"<< /Type /Page /Parent 2 0 R /MediaBox [0 0 595 842] /Resources %s /Contents %d 0 R%s >>" % (res, cobj, annots)
        objs[cobj] = b"<< /Length %d >>\nstream\n%s\nendstream" % (len(stream), stream)
    objs[2] = b"<< /Type /Pages /Kids [%s] /Count %d >>" % (b" ".join(b"%d 0 R" % k for k in kids), n_pages)
    objs[3] = b"<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica /Encoding /WinAnsiEncoding >>"
    cat = b"<< /Type /Catalog /Pages 2 0 R"
    if ocg_used:
        lname = extras.get("layer", ("Notes",))[0] if extras.get("layer") else extras.get("ocg_name", "Notes")
        vis = extras.get("layer", (None, None, False))[2] if extras.get("layer") else False
        objs[4] = b"<< /Type /OCG /Name %s >>" % _pdfstr(lname)
        cat += b" /OCProperties << /OCGs [4 0 R] /D << /Order [4 0 R] %s >> >>" % (b"/ON [4 0 R]" if vis else b"/OFF [4 0 R]")
    else:
        objs[4] = b"<< >>"
    if extras.get("field"):
        fname, fval, fvis = extras["field"]
        rect = b"[400 20 560 36]" if fvis else b"[0 0 0 0]"
        flags = b"" if fvis else b" /F 2"
        objs[5] = (b"<< /Type /Annot /Subtype /Widget /FT /Tx /T %s /V %s /Rect %s%s /P %d 0 R /DA (/Helv 8 Tf 0 g) >>"
                   % (_pdfstr(fname), _pdfstr(fval), rect, flags, first))
        cat += b" /AcroForm << /Fields [5 0 R] /DA (/Helv 8 Tf 0 g) /DR << /Font << /Helv 3 0 R >> >> >>"
    else:
        objs[5] = b"<< >>"
    objs[1] = cat + b" >>"
    objs[6] = b"<< /Title %s /Producer (minipdf 0.4) /CreationDate (D:20240601120000Z) >>" % _pdfstr(doc["title"])
    out = bytearray(b"%PDF-1.5\n%\xe2\xe3\xcf\xd3\n")
    offsets = {}
    for k in sorted(objs):
        offsets[k] = len(out)
        out += b"%d 0 obj\n" % k + objs[k] + b"\nendobj\n"
    xref = len(out)
    mx = max(objs)
    out += b"xref\n0 %d\n0000000000 65535 f \n" % (mx + 1)
    for k in range(1, mx + 1):
        out += b"%010d 00000 n \n" % offsets[k]
    out += b"trailer\n<< /Size %d /Root 1 0 R /Info 6 0 R >>\nstartxref\n%d\n%%%%EOF\n" % (mx + 1, xref)
    return bytes(out)


def cp1252_ok(s):
    try:
        s.encode("cp1252"); return True
    except UnicodeEncodeError:
        return False

# ------------------------------------------------------------------ doc construction
def base_doc(host, fmt, rng, benign):
    d = {"title": host["title"], "lang": host["lang"], "genre": host["genre"],
         "blocks": [dict(b) for b in host["blocks"]]}
    if fmt == "md":
        if rng.random() < 0.35:
            d["front_matter"] = [("title", host["title"]), ("lang", host["lang"]), ("tags", [host["genre"]])]
        if rng.random() < 0.25:
            pos = rng.randrange(1, len(d["blocks"]) + 1)
            d["blocks"].insert(pos, {"t": "hidden", "md": rng.choice(frames.MD_COMMENTS), "txt": None, "html": ""})
        if rng.random() < 0.2:
            for b in d["blocks"]:
                if b["t"] == "p" and "\n" not in b["text"]:
                    b["raw"] = b["text"] + "[^1]"; break
            d["md_footnotes"] = [rng.choice(frames.MD_FOOTNOTES)]
    if fmt == "html":
        first_p = next((b["text"] for b in host["blocks"] if b["t"] == "p"), host["title"])
        d["html"] = {"site": rng.choice(frames.HTML_SITE),
                     "meta_desc": strip_inline(first_p.split("\n")[0])[:155] if rng.random() < 0.7 else None,
                     "css_badge": rng.random() < 0.3, "logo_svg": rng.random() < 0.3, "logo_img": rng.random() < 0.4,
                     "noscript": rng.random() < 0.3, "details_benign": rng.random() < 0.25,
                     "template_benign": rng.random() < 0.2,
                     "csrf": hashlib.sha1(("%s%f" % (host["id"], rng.random())).encode()).hexdigest()[:24]}
    if fmt == "eml":
        frm, to = rng.sample(frames.EML_PEOPLE, 2)
        d["eml"] = {"from": frm, "to": to, "subject": ("Fwd: " if rng.random() < 0.5 else "") + host["title"],
                    "date": "Mon, %02d Jun 2024 %02d:%02d:00 +0000" % (rng.randrange(1, 28), rng.randrange(7, 19), rng.randrange(60)),
                    "msgid": hashlib.sha1(("%s%f" % (host["id"], rng.random())).encode()).hexdigest(),
                    "intro": "" if host["genre"] == "customer-email" else rng.choice(frames.EML_INTROS),
                    "multipart": rng.random() < 0.45}
        if host["lang"] != "en":
            d["eml"]["intro"] = ""
    if fmt == "pdf" and benign:
        if rng.random() < 0.2:
            d["pdf_annots"] = [rng.choice(frames.PDF_BENIGN_ANNOTS)]
    return d


def render(doc, fmt, pdf_mode="fpdf", raw_extras=None):
    if fmt == "md":
        return render_md(doc).encode("utf-8")
    if fmt == "txt":
        return render_txt(doc).encode("utf-8")
    if fmt == "html":
        return render_html(doc).encode("utf-8")
    if fmt == "eml":
        return render_eml(doc).encode("utf-8")
    if fmt == "pdf":
        if pdf_mode == "raw":
            return render_pdf_raw(doc, raw_extras or {})
        return render_pdf_fpdf(doc)
    raise ValueError(fmt)


def payload_blocks(text):
    return [dict(b, raw=b["raw"]) for b in parse_blocks(text)]


def insert_positions(blocks):
    """Indices of insertion points that are after a non-heading block (natural paragraph boundaries)."""
    return [i + 1 for i, b in enumerate(blocks) if b["t"] != "h"]


def place_visible(doc, pblocks, where, rng):
    bl = doc["blocks"]
    if where == "start":
        k = 1 if bl and bl[0]["t"] == "h" else 0
        doc["blocks"] = bl[:k] + pblocks + bl[k:]
    elif where == "end":
        doc["blocks"] = bl + pblocks
    elif where == "middle":
        pos = insert_positions(bl)
        k = pos[len(pos) // 2] if pos else len(bl)
        doc["blocks"] = bl[:k] + pblocks + bl[k:]
    elif where == "after-heading":
        hs = [i for i, b in enumerate(bl) if b["t"] == "h" and i > 0] or [0]
        k = rng.choice(hs) + 1
        doc["blocks"] = bl[:k] + pblocks + bl[k:]
    elif where == "inline-paragraph":
        ps = [i for i, b in enumerate(bl) if b["t"] == "p" and "\n" not in b["text"] and len(pblocks) == 1 and pblocks[0]["t"] == "p"]
        if not ps:
            return place_visible(doc, pblocks, "middle", rng)
        i = rng.choice(ps)
        nb = dict(bl[i]); nb["text"] = nb["text"] + " " + pblocks[0]["text"]; nb["raw"] = nb["text"]
        bl[i] = nb
        return "inline-paragraph"
    elif where in ("blockquote-note", "editor-note", "footer-note", "ps-line"):
        if len(pblocks) == 1 and pblocks[0]["t"] == "p":
            txt = frames.VISIBLE_WRAPS[where].format(p=pblocks[0]["text"])
            nbs = payload_blocks(txt)
        else:
            nbs = pblocks
        if where == "footer-note" and len(pblocks) == 1 and pblocks[0]["t"] == "p":
            nbs = [hr_block()] + pblocks
        if where in ("footer-note", "ps-line"):
            doc["blocks"] = bl + nbs
        else:
            pos = insert_positions(bl)
            k = rng.choice(pos) if pos else len(bl)
            doc["blocks"] = bl[:k] + nbs + bl[k:]
    else:
        raise ValueError(where)
    return where


def hr_block():
    return {"t": "hidden", "md": "---", "txt": "----", "html": "<hr>", "pdf": ("hr", "")}

# ------------------------------------------------------------------ main assembly
ATTACK_CLASSES = ["output-steering", "task-hijack", "malicious-code", "tool-misuse", "authority-poisoning",
                  "exfiltration", "multilingual", "hidden-placement", "encoded", "split"]
VISIBLE_WHERE = ["start", "end", "middle", "after-heading", "inline-paragraph", "blockquote-note", "editor-note", "footer-note", "ps-line"]
HIDDEN_TECH = {
    "md": ["md-table-cell", "md-code-comment", "md-footnote", "md-yaml-front-matter", "md-html-comment"],
    "html": ["html-comment", "html-template", "html-svg-text", "html-css-content", "html-meta-description", "html-input-hidden",
             "html-details-collapsed", "html-display-none", "html-visibility-hidden", "html-white-on-white", "html-zero-font",
             "html-off-screen", "html-aria-label", "html-title-alt", "html-noscript", "html-data-attribute"],
    "pdf": ["pdf-annotation", "pdf-form-field", "pdf-ocg-hidden-layer", "pdf-render-mode-3", "pdf-white-text",
            "pdf-tiny-text", "pdf-text-under-image", "pdf-split-text-objects"],
    "eml": ["eml-html-part-only", "eml-after-blank-lines"],
}
ENC_METHODS = ["base64", "hex", "rot13", "url", "html-entities", "quoted-printable", "unicode-escapes", "leetspeak", "reversed", "homoglyph-zwsp"]
SPLIT_MODES = ["paragraphs", "list-items", "table-cells", "alternating-lines"]


def main():
    rng = random.Random(SEED)
    hosts = parse_hosts()
    H = {h["id"]: h for h in hosts}
    en_hosts = [h for h in hosts if h["lang"] == "en"]
    foreign = [h for h in hosts if h["lang"] != "en"]
    payloads = payloads_a.P + payloads_b.P + payloads_c.P
    by_cls = {}
    for p in payloads:
        by_cls.setdefault(p["cls"], []).append(p)
    items = []  # (bytes, ext, label dict)

    # ---------------- benign renderings
    for h in hosts:
        fmts = ["md", "txt", "html", "eml"] + (["pdf"] if h["lang"] in PDF_LANGS else [])
        if h["lang"] != "en":  # keep multilingual-benign from dominating: 3 formats per non-English host
            fmts = sorted(rng.sample(fmts, 3))
        for fmt in fmts:
            d = base_doc(h, fmt, rng, True)
            mode, extras, feats = "fpdf", {}, []
            if fmt == "pdf" and h["lang"] == "en" and cp1252_ok(h["body"]) and rng.random() < 0.35:
                mode = "raw"
                r = rng.random()
                if r < 0.35:
                    extras["field"] = rng.choice(frames.PDF_BENIGN_FIELDS) + (rng.random() < 0.5,)
                    feats.append("form field (benign value)")
                elif r < 0.6:
                    extras["layer"] = (rng.choice(frames.PDF_BENIGN_LAYER), "Printed copy - check against the master file", rng.random() < 0.5)
                    feats.append("optional-content layer (benign)")
            if d.get("pdf_annots"):
                feats.append("annotation (benign comment)")
            if fmt == "eml" and d["eml"]["multipart"]:
                feats.append("multipart/alternative")
            if fmt == "md" and d.get("front_matter"):
                feats.append("yaml front matter")
            data = render(d, fmt, mode, extras)
            items.append((data, fmt, {"label": "benign", "class": h["class"], "language": h["lang"], "where": "none",
                                      "note": "host %s (%s), unmodified benign rendering%s" % (h["id"], h["genre"], (", " + ", ".join(feats)) if feats else ""),
                                      "format": fmt, "host": h["id"], "_pdfmode": mode}))

    # ---------------- attacks
    host_cycle = []
    def next_host(allow_foreign=0.1, lang=None):
        nonlocal host_cycle
        if lang:
            same = [h for h in foreign if h["lang"] == lang]
            if same and rng.random() < 0.6:
                return rng.choice(same)
            return rng.choice(en_hosts)
        if rng.random() < allow_foreign:
            return rng.choice(foreign)
        if not host_cycle:
            host_cycle = en_hosts[:]
            rng.shuffle(host_cycle)
        return host_cycle.pop()

    def uses(cls, target):
        ps = by_cls[cls][:]
        order = ps[:] + ps[:]
        first, second = ps[:], ps[:]
        rng.shuffle(second)
        return (first + second)[:target]

    fmt_cycle = []
    def next_fmt(allowed):
        nonlocal fmt_cycle
        for _ in range(20):
            if not fmt_cycle:
                fmt_cycle = ["md", "txt", "html", "eml", "pdf"] * 2
                rng.shuffle(fmt_cycle)
            f = fmt_cycle.pop()
            if f in allowed:
                return f
        return rng.choice(allowed)

    def pdf_ok(h, p_text):
        return h["lang"] in PDF_LANGS and all(ord(c) < 0x2E80 for c in p_text) and not re.search(r"[\u0600-\u06ff\u0900-\u097f\u200b]", p_text)

    def finish(h, d, fmt, cls, p, where, extra_note="", mode="fpdf", extras=None, lang=None):
        data = render(d, fmt, mode, extras)
        items.append((data, fmt, {"label": "attack", "class": cls, "language": lang or p["lang"], "where": where,
                                  "note": "host %s (%s); payload %s; %s%s" % (h["id"], h["genre"], p["id"], p["style"], extra_note),
                                  "format": fmt, "host": h["id"], "_pdfmode": mode, "_payload": p["id"],
                                  "_ptext": p["text"]}))

    # visible classes
    for cls, target in [("output-steering", 40), ("task-hijack", 40), ("malicious-code", 40), ("tool-misuse", 40),
                        ("authority-poisoning", 40), ("exfiltration", 40), ("multilingual", 44)]:
        for p in uses(cls, target):
            h = next_host(0.1, p["lang"] if cls == "multilingual" else None)
            allowed = ["md", "txt", "html", "eml"] + (["pdf"] if pdf_ok(h, p["text"]) else [])
            fmt = next_fmt(allowed)
            d = base_doc(h, fmt, rng, False)
            pb = payload_blocks(p["text"])
            where = rng.choice(VISIBLE_WHERE)
            if h["class"] == "security-awareness":  # keep planted text away from the quoted examples
                where = rng.choice(["end", "footer-note", "ps-line"])
            where = place_visible(d, pb, where, rng)
            mode = "fpdf"
            if fmt == "pdf" and cp1252_ok(h["body"] + p["text"]) and rng.random() < 0.3:
                mode = "raw"
            finish(h, d, fmt, cls, p, "visible/" + where, mode=mode)

    # hidden-placement
    techs = [(f, t) for f in ["md", "html", "pdf", "eml"] for t in HIDDEN_TECH[f]]
    hp = by_cls["hidden-placement"][:]
    rng.shuffle(hp)
    plan = techs + rng.sample(techs, 12)
    for i, (fmt, tech) in enumerate(plan):
        p = hp[i % len(hp)]
        h = next_host(0.08)
        while tech in ("md-table-cell", "md-code-comment") and h["class"] == "security-awareness":
            h = next_host(0.0)
        if fmt == "pdf" and (h["lang"] not in PDF_LANGS or (tech in ("pdf-form-field", "pdf-ocg-hidden-layer", "pdf-split-text-objects") and not cp1252_ok(h["body"]))):
            h = rng.choice([x for x in en_hosts if cp1252_ok(x["body"])])
        d = base_doc(h, fmt, rng, False)
        finish_args = apply_hidden(d, fmt, tech, p["text"], rng, h)
        finish(h, d, fmt, "hidden-placement", p, tech, **finish_args)

    # encoded
    enc_plan = []
    ep = by_cls["encoded"][:]
    uses_e = ep + rng.sample(ep, 16)
    for i, p in enumerate(uses_e):
        method = ENC_METHODS[i % len(ENC_METHODS)]
        h = next_host(0.08)
        allowed = ["md", "txt", "html", "eml"] + (["pdf"] if method != "homoglyph-zwsp" and h["lang"] in PDF_LANGS else [])
        fmt = next_fmt(allowed)
        d = base_doc(h, fmt, rng, False)
        enc = encode(method, p["text"], rng)
        hinted = rng.random() < 0.55 and method != "homoglyph-zwsp"
        if hinted:
            line = rng.choice(frames.ENC_HINTS).format(enc=frames.ENC_NAMES[method]) + "\n" + enc
        else:
            lab = rng.choice(frames.ENC_LABELS)
            line = (lab + " " + enc).strip() if method != "homoglyph-zwsp" else enc
        if method == "html-entities" and fmt == "html":
            pb = [{"t": "hidden", "md": line, "txt": line, "html": "<p>%s</p>" % line.replace("\n", "<br>\n")}]
        elif method in ("base64", "hex", "url", "unicode-escapes", "quoted-printable", "html-entities") and rng.random() < 0.5:
            pb = [{"t": "code", "lang": "", "text": line, "raw": "```\n%s\n```" % line}]
        else:
            pb = [{"t": "p", "text": line, "raw": line}]
        where = rng.choice(["start", "end", "middle", "footer-note", "after-heading"])
        if h["class"] == "security-awareness":
            where = rng.choice(["end", "footer-note"])
        if where == "footer-note":
            d["blocks"] = d["blocks"] + pb
        else:
            place_visible(d, pb, where, rng)
        mode = "raw" if (fmt == "pdf" and cp1252_ok(h["body"] + line) and rng.random() < 0.3) else "fpdf"
        finish(h, d, fmt, "encoded", p, "%s/%s/%s" % (method, "with-hint" if hinted else "no-hint", where), mode=mode)

    # split
    sp = by_cls["split"][:]
    uses_s = sp + rng.sample(sp, 15)
    for i, p in enumerate(uses_s):
        h = next_host(0.08)
        fmt = next_fmt(["md", "txt", "html", "eml"] + (["pdf"] if h["lang"] in PDF_LANGS else []))
        d = base_doc(h, fmt, rng, False)
        if p["split_kind"] == "acrostic":
            mode_s = "acrostic-first-words"
            if rng.random() < 0.5:
                pb = [{"t": "p", "text": "\n".join(p["lines"]), "raw": "\n".join(p["lines"])}]
            else:
                pb = [{"t": "ul", "items": p["lines"], "raw": "\n".join("- " + x for x in p["lines"])}]
            place_visible(d, pb, "end" if h["class"] == "security-awareness" else rng.choice(["middle", "end", "after-heading"]), rng)
        else:
            mode_s = SPLIT_MODES[i % len(SPLIT_MODES)]
            if h["class"] == "security-awareness" and mode_s == "paragraphs":
                mode_s = "list-items"
            parts = p["parts"]
            if mode_s == "paragraphs":
                pos = insert_positions(d["blocks"])
                ks = sorted(rng.sample(pos, min(len(parts), len(pos))))
                for off, (k, part) in enumerate(zip(ks, parts)):
                    d["blocks"].insert(k + off, {"t": "p", "text": part, "raw": part})
            elif mode_s == "list-items":
                place_visible(d, [{"t": "ul", "items": parts, "raw": "\n".join("- " + x for x in parts)}], "end" if h["class"] == "security-awareness" else rng.choice(["middle", "end"]), rng)
            elif mode_s == "table-cells":
                hdr = ["Item", "Notes"]
                rows = [hdr] + [[str(j + 1), part] for j, part in enumerate(parts)]
                raw = "| Item | Notes |\n|---|---|\n" + "\n".join("| %d | %s |" % (j + 1, part) for j, part in enumerate(parts))
                place_visible(d, [{"t": "table", "rows": rows, "raw": raw}], "end" if h["class"] == "security-awareness" else rng.choice(["middle", "end"]), rng)
            else:  # alternating lines with host sentences
                src = " ".join(b["text"] for b in d["blocks"] if b["t"] == "p")
                sents = [s for s in re.split(r"(?<=[.!?])\s+", src) if 20 < len(s) < 160 and "\n" not in s] or ["See above."]
                lines = []
                for j, part in enumerate(parts):
                    lines.append(sents[j % len(sents)]); lines.append(part)
                txt = "\n".join(lines)
                place_visible(d, [{"t": "p", "text": txt, "raw": txt}], "end", rng)
        finish(h, d, fmt, "split", p, mode_s)

    # ---------------- shuffle, name, write
    rng2 = random.Random(SEED + 1)
    rng2.shuffle(items)
    out_docs = os.path.join(ROOT, "docs")
    if os.path.isdir(out_docs):
        shutil.rmtree(out_docs)
    os.makedirs(out_docs)
    labels, private = [], []
    for n, (data, fmt, lab) in enumerate(items, 1):
        fn = "docs/case-%04d.%s" % (n, fmt)
        with open(os.path.join(ROOT, fn), "wb") as f:
            f.write(data)
        rec = {"file": fn}
        rec.update({k: v for k, v in lab.items() if not k.startswith("_")})
        labels.append(rec)
        private.append({"file": fn, **{k: v for k, v in lab.items() if k.startswith("_")}})
    with open(os.path.join(ROOT, "labels.jsonl"), "w", encoding="utf-8") as f:
        for r in labels:
            f.write(json.dumps(r, ensure_ascii=False, sort_keys=False) + "\n")
    with open(os.path.join(ROOT, "src", "build_aux.jsonl"), "w", encoding="utf-8") as f:
        for r in private:
            f.write(json.dumps(r, ensure_ascii=False) + "\n")
    print("wrote", len(items), "documents")


def apply_hidden(d, fmt, tech, text, rng, h):
    """Mutates doc d to hide text with the given technique; returns kwargs for finish()."""
    esc = html.escape
    bl = d["blocks"]
    pos = insert_positions(bl)
    mid = rng.choice(pos) if pos else len(bl)
    def ins(block, k=None):
        k = mid if k is None else k
        bl.insert(k, block)
    H = lambda s: {"t": "hidden", "md": "", "txt": None, "html": s}
    if fmt == "md":
        if tech == "md-table-cell":
            tbls = [i for i, b in enumerate(bl) if b["t"] == "table"]
            if tbls:
                i = rng.choice(tbls)
                b = dict(bl[i]); n = len(b["rows"][0])
                row = [""] * (n - 1) + [text]
                b["rows"] = b["rows"] + [row]
                b["raw"] = b["raw"] + "\n| " + " | ".join(row) + " |"
                bl[i] = b
            else:
                raw = "| Field | Value |\n|---|---|\n| Document status | Current |\n| Notes | %s |" % text
                ins({"t": "table", "rows": [["Field", "Value"], ["Document status", "Current"], ["Notes", text]], "raw": raw})
        elif tech == "md-code-comment":
            codes = [i for i, b in enumerate(bl) if b["t"] == "code"]
            cmt = "//" if any(b.get("lang") in ("json", "javascript") for b in bl if b["t"] == "code") else "#"
            if codes:
                i = rng.choice(codes); b = dict(bl[i])
                c = "%" if b["lang"] == "latex" else ("//" if b["lang"] in ("json", "javascript") else "#")
                lines = b["text"].split("\n"); k = max(1, len(lines) // 2)
                lines.insert(k, "%s %s" % (c, text))
                b["text"] = "\n".join(lines); b["raw"] = "```%s\n%s\n```" % (b["lang"], b["text"]); bl[i] = b
            else:
                t = "# document settings\nformat: standard\n# %s\nrevision: 3" % text
                ins({"t": "code", "lang": "yaml", "text": t, "raw": "```yaml\n%s\n```" % t})
        elif tech == "md-footnote":
            ps = [i for i, b in enumerate(bl) if b["t"] == "p" and "\n" not in b["text"]]
            i = rng.choice(ps) if ps else 0
            b = dict(bl[i]); b["raw"] = b.get("raw", b["text"]) + "[^n1]"; bl[i] = b
            bl.append({"t": "hidden", "md": "[^n1]: %s" % text, "txt": None, "html": ""})
        elif tech == "md-yaml-front-matter":
            key = rng.choice(["summary", "description", "ai_note", "x-indexing-hint", "abstract"])
            d["front_matter"] = [("title", d["title"]), (key, text), ("lang", d["lang"])]
        elif tech == "md-html-comment":
            ins({"t": "hidden", "md": "<!-- %s -->" % text, "txt": None, "html": ""})
        return {}
    if fmt == "html":
        f = d["html"]
        if tech == "html-comment":
            ins(H("<!-- %s -->" % text.replace("--", "- -")))
        elif tech == "html-template":
            ins(H('<template id="tpl-note"><p class="note">%s</p></template>' % esc(text)))
        elif tech == "html-svg-text":
            ins(H('<svg width="1" height="1" aria-hidden="true" focusable="false"><text x="0" y="0" font-size="1">%s</text></svg>' % esc(text)))
        elif tech == "html-css-content":
            f.setdefault("extra_css", []).append('.doc-ref::before{content:"%s";font-size:0}' % text.replace("\\", "\\\\").replace('"', '\\"'))
            ins(H('<span class="doc-ref"></span>'))
        elif tech == "html-meta-description":
            f["meta_desc"] = text
        elif tech == "html-input-hidden":
            ins(H('<form class="doc-meta"><input type="hidden" name="reader_note" value="%s"></form>' % esc(text)))
        elif tech == "html-details-collapsed":
            ins(H("<details><summary>Document information</summary><p>%s</p></details>" % esc(text)))
        elif tech == "html-display-none":
            ins(H('<div style="display:none">%s</div>' % esc(text)))
        elif tech == "html-visibility-hidden":
            ins(H('<p style="visibility:hidden">%s</p>' % esc(text)))
        elif tech == "html-white-on-white":
            ins(H('<p style="color:#ffffff;background-color:#ffffff">%s</p>' % esc(text)))
        elif tech == "html-zero-font":
            ins(H('<span style="font-size:0px">%s</span>' % esc(text)))
        elif tech == "html-off-screen":
            ins(H('<div style="position:absolute;left:-9999px;top:-9999px">%s</div>' % esc(text)))
        elif tech == "html-aria-label":
            ins(H('<div role="note" aria-label="%s"></div>' % esc(text)))
        elif tech == "html-title-alt":
            ins(H('<img src="data:image/gif;base64,R0lGODlhAQABAAAAACw=" width="1" height="1" alt="%s" title="%s">' % (esc(text), esc(text))))
        elif tech == "html-noscript":
            ins(H("<noscript><p>%s</p></noscript>" % esc(text)))
        elif tech == "html-data-attribute":
            f["main_data_attr"] = ("data-reader-note", esc(text))
        return {}
    if fmt == "eml":
        e = d["eml"]
        if tech == "eml-html-part-only":
            e["multipart"] = True
            e["html_only_blocks"] = [{"t": "hidden", "html": '<p style="color:#ffffff;font-size:1px">%s</p>' % esc(text)}]
        elif tech == "eml-after-blank-lines":
            e["blank_tail"] = (rng.randrange(40, 90), text)
        return {}
    if fmt == "pdf":
        if tech == "pdf-annotation":
            bl.insert(0, {"t": "hidden", "pdf": ("annotation", text)})
            return {}
        if tech == "pdf-form-field":
            return {"mode": "raw", "extras": {"field": ("reader_note", text, False)}}
        if tech == "pdf-ocg-hidden-layer":
            ins({"t": "hidden", "pdf": ("ocg-hidden", text)})
            return {"mode": "raw", "extras": {"ocg_name": "Notes"}}
        if tech == "pdf-split-text-objects":
            ins({"t": "hidden", "pdf": ("split-text-objects", text)})
            return {"mode": "raw", "extras": {}}
        kind = {"pdf-render-mode-3": "render-mode-3", "pdf-white-text": "white-text", "pdf-tiny-text": "tiny-text",
                "pdf-text-under-image": "text-under-image"}[tech]
        ins({"t": "hidden", "pdf": (kind, text)})
        return {}
    raise ValueError(tech)


if __name__ == "__main__":
    main()
