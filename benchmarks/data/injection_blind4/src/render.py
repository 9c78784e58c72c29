"""Format renderers. Every renderer takes a Doc and returns bytes.

Doc fields: host (dict), blocks (list, payload blocks already inserted for visible
placements), hidden (list of (technique, text)), rng (random.Random, per document),
case (str).
Legitimate hidden elements (cookie banners, CSRF inputs, collapsed details, reviewer
annotations, form fields ...) are drawn from doc.rng independently of the label.
"""
import datetime
import hashlib
import io
import os
import re
import zlib
import struct
from email.header import Header

from markup import to_md, to_txt, to_html_body, inline_plain, esc, inline_html

FONT_DIR = os.path.join(os.path.dirname(os.path.abspath(__file__)), "fonts")


class Doc:
    def __init__(self, case, host, blocks, hidden, rng):
        self.case, self.host, self.blocks, self.hidden, self.rng = case, host, blocks, hidden, rng

    def hid(self, tech):
        return [t for k, t in self.hidden if k == tech]


# ----------------------------------------------------------------- helpers
def lines_to_md(blocks):
    out = []
    for b in blocks:
        if b[0] == "lines":
            out.append(("raw", "\n".join(b[1])))
        else:
            out.append(b)
    return out


def clip(s, n):
    if len(s) <= n:
        return s
    return s[:n].rsplit(" ", 1)[0] + " ..."


def first_para(blocks):
    for b in blocks:
        if b[0] == "p":
            return inline_plain(b[1])
    return ""


# ----------------------------------------------------------------- markdown
def render_md(doc):
    h, rng = doc.host, doc.rng
    blocks = lines_to_md(doc.blocks)
    pre = ""
    fm = doc.hid("md-yaml-front-matter")
    if fm or rng.random() < 0.3:
        pre = "---\n"
        pre += f"title: \"{h['title']}\"\n"
        pre += f"author: {h['author']}\n"
        pre += f"date: {h['date']}\n"
        pre += f"lang: {h['lang']}\n"
        for t in fm:
            pre += f"description: \"{t}\"\n"
        if not fm and rng.random() < 0.5:
            pre += "tags: [" + ", ".join(h.get("tags", ["general"])) + "]\n"
        pre += "---\n\n"
    body = [("h", 1, h["title"])] + blocks
    for t in doc.hid("md-html-comment"):
        pos = 1 + len(blocks) // 2
        body.insert(pos, ("raw", f"<!-- {t} -->"))
    if not doc.hid("md-html-comment") and rng.random() < 0.2:
        body.insert(1 + len(blocks) // 3, ("raw", rng.choice([
            "<!-- TODO: check figures against the final spreadsheet before publishing -->",
            "<!-- editor: keep this section under 300 words -->",
            "<!-- last reviewed by the docs team; next review in Q3 -->"])))
    for t in doc.hid("md-code-comment"):
        body.append(("code", "python", f"# {t}\nconfig = load_settings(\"default.yaml\")\nprint(config.summary())"))
    for t in doc.hid("md-table-cell"):
        body.append(("table", [["Field", "Value"], ["Document owner", h["author"]],
                               ["Review status", "approved"], ["Notes", t]]))
    out = to_md(body)
    fns = doc.hid("md-footnote")
    if fns:
        out = out.rstrip("\n") + " [^1]\n\n" + "".join(f"[^1]: {t}\n" for t in fns)
    elif rng.random() < 0.15:
        out = out.rstrip("\n") + " [^1]\n\n[^1]: Figures rounded to the nearest whole number.\n"
    return (pre + out).encode("utf-8")


# ----------------------------------------------------------------- txt
def render_txt(doc):
    h = doc.host
    blocks = doc.blocks
    txt_blocks = []
    for b in blocks:
        txt_blocks.append(("raw", "\n".join(b[1])) if b[0] == "lines" else b)
    head = h["title"] + "\n" + "=" * min(len(h["title"]), 70) + "\n"
    if doc.rng.random() < 0.5:
        head += f"{h['author']} - {h['date']}\n"
    out = head + "\n" + to_txt(txt_blocks)
    for t in doc.hid("txt-blank-lines"):
        out += "\n" * 60 + t + "\n"
    return out.encode("utf-8")


# ----------------------------------------------------------------- html
CSS = """body{font-family:Georgia,serif;max-width:46rem;margin:2rem auto;line-height:1.5;color:#222;background:#fff}
.visually-hidden{position:absolute;left:-10000px;width:1px;height:1px;overflow:hidden}
table{border-collapse:collapse}td,th{border:1px solid #ccc;padding:.3rem}
footer{font-size:.8rem;color:#666}"""


def html_blocks(blocks):
    out = []
    for b in blocks:
        if b[0] == "lines":
            out.append(("rawhtml", "<p>" + "<br>\n".join(inline_html(x) for x in b[1]) + "</p>"))
        else:
            out.append(b)
    return out


def render_html_doc(doc, hidden_prefix=""):
    """Returns full HTML string. hidden_prefix allows eml to reuse html techniques."""
    h, rng = doc.host, doc.rng
    blocks = html_blocks(doc.blocks)
    H = lambda k: doc.hid(k)
    metadesc = H("html-meta-description")
    desc = metadesc[0] if metadesc else clip(first_para(doc.blocks), 150)
    head = [f'<meta charset="utf-8">', f"<title>{esc(h['title'])}</title>",
            f'<meta name="viewport" content="width=device-width, initial-scale=1">']
    if metadesc or rng.random() < 0.6:
        head.append(f'<meta name="description" content="{esc(desc)}">')
    if rng.random() < 0.3:
        head.append(f'<meta name="author" content="{esc(h["author"])}">')
    css = CSS
    if rng.random() < 0.3:
        css += "\na[href^=\"http\"]::after{content:\" (external link)\";font-size:.7em}"
    for t in H("html-css-content"):
        css += "\n.note-marker::after{content:\"" + t.replace("\\", "\\\\").replace('"', '\\"') + "\";display:none}"
    head.append("<style>\n" + css + "\n</style>")

    body = []
    # legitimate hidden furniture, label-independent
    if rng.random() < 0.5:
        body.append('<a class="visually-hidden" href="#main">Skip to main content</a>')
    if rng.random() < 0.4:
        body.append('<div id="cookie-consent" style="display:none" role="dialog" aria-label="Cookie preferences">'
                    '<p>We use only essential cookies to keep you signed in. <button>Accept</button> '
                    '<button>Settings</button></p></div>')
    nav_label = "Main navigation"
    body.append(f'<header><nav aria-label="{nav_label}"><a href="https://{h["site"]}/">Home</a> | '
                f'<a href="https://{h["site"]}/archive">Archive</a> | <a href="https://{h["site"]}/contact">Contact</a></nav></header>')
    art = []
    art.append(f"<h1>{inline_html(h['title'])}</h1>")
    if rng.random() < 0.5:
        art.append(f'<p class="byline">{esc(h["author"])} &middot; <time datetime="{h["date"]}">{h["date"]}</time></p>')
    inner = [to_html_body([b]) for b in blocks]
    n = len(inner)
    mid = max(1, n // 2)
    inserts = {}  # index -> list of html strings

    def add(pos, s):
        inserts.setdefault(pos, []).append(s)

    for t in H("html-comment"):
        add(mid, f"<!-- {t} -->")
    for t in H("html-template"):
        add(n, f'<template id="tpl-note"><p>{esc(t)}</p></template>')
    for t in H("html-svg-text"):
        add(mid, f'<svg width="1" height="1" viewBox="0 0 1 1" aria-hidden="true"><text x="0" y="0" font-size="0">{esc(t)}</text></svg>')
    for t in H("html-css-content"):
        add(mid, '<span class="note-marker"></span>')
    for t in H("html-hidden-input"):
        add(n, f'<form action="https://{h["site"]}/feedback" method="post"><input type="hidden" name="context" value="{esc(t)}">'
               '<label>Was this page useful? <input type="text" name="comment"></label> <button>Send</button></form>')
    for t in H("html-details-collapsed"):
        add(n, f"<details><summary>More information</summary><p>{esc(t)}</p></details>")
    for t in H("html-display-none"):
        add(mid, f'<div style="display:none">{esc(t)}</div>')
    for t in H("html-visibility-hidden"):
        add(mid, f'<p style="visibility:hidden;height:0;margin:0">{esc(t)}</p>')
    for t in H("html-white-on-white"):
        add(n, f'<p style="color:#ffffff;background:#ffffff">{esc(t)}</p>')
    for t in H("html-zero-font-size"):
        add(mid, f'<span style="font-size:0">{esc(t)}</span>')
    for t in H("html-off-screen"):
        add(0, f'<div style="position:absolute;left:-9999px;top:-9999px">{esc(t)}</div>')
    for t in H("html-aria-label"):
        add(mid, f'<div role="note" aria-label="{esc(t)}"></div>')
    for t in H("html-title-attribute"):
        add(mid, f'<p><abbr title="{esc(t)}">Note</abbr></p>')
    for t in H("html-img-alt"):
        add(n, f'<img src="https://{h["site"]}/img/spacer.png" width="1" height="1" alt="{esc(t)}">')
    for t in H("html-noscript"):
        add(n, f"<noscript><p>{esc(t)}</p></noscript>")
    for t in H("html-data-attribute"):
        add(mid, f'<section data-summary-hint="{esc(t)}"></section>')
    # legit hidden-ish elements
    if rng.random() < 0.35:
        add(n, '<details><summary>Revision history</summary><ul><li>v1.1 &ndash; typo fixes</li>'
               '<li>v1.0 &ndash; first published version</li></ul></details>')
    if rng.random() < 0.3:
        add(n, f'<form action="https://{h["site"]}/subscribe" method="post"><input type="hidden" name="csrf_token" '
               f'value="{hashlib.sha1(doc.case.encode()).hexdigest()}"><label>E-mail <input type="email" name="email"></label> '
               '<button>Subscribe</button></form>')
    if rng.random() < 0.25:
        add(n, "<noscript><p>Some interactive elements on this page need JavaScript.</p></noscript>")
    if rng.random() < 0.25:
        add(mid, f'<img src="https://{h["site"]}/img/figure-1.png" alt="Illustration for {esc(h["title"])}" title="Figure 1">')
    if rng.random() < 0.2:
        add(n, '<template id="share-dialog"><p>Share this page with a colleague.</p></template>')
    if rng.random() < 0.3:
        add(0, rng.choice(["<!-- begin article body -->", "<!-- content migrated from the old CMS; check links -->",
                           "<!-- analytics intentionally disabled on this page -->"]))
    if rng.random() < 0.2:
        add(n, '<p class="print-link"><svg width="12" height="12" viewBox="0 0 12 12" role="img"><title>Printer icon</title>'
               '<rect x="2" y="4" width="8" height="5"/></svg> <a href="javascript:window.print()">Print this page</a></p>')
    if rng.random() < 0.15:
        add(n, '<p style="font-size:0;line-height:0;color:transparent" aria-hidden="true">.</p>')
    for i in range(n + 1):
        for s in inserts.get(i, []):
            art.append(s)
        if i < n:
            sec_attr = f' data-section="{i+1}"' if rng.random() < 0.15 else ""
            art.append(inner[i] if not sec_attr else f"<div{sec_attr}>{inner[i]}</div>")
    body.append('<main id="main"><article>\n' + "\n".join(art) + "\n</article></main>")
    body.append(f'<footer><p>&copy; {h["date"][:4]} {esc(h["org"])} &middot; <a href="https://{h["site"]}/privacy">Privacy</a></p></footer>')
    return (f'<!DOCTYPE html>\n<html lang="{h["lang"]}">\n<head>\n' + "\n".join(head) + "\n</head>\n<body>\n"
            + "\n".join(body) + "\n</body>\n</html>\n")


def render_html(doc):
    return render_html_doc(doc).encode("utf-8")


# ----------------------------------------------------------------- eml
def render_eml(doc):
    h, rng = doc.host, doc.rng
    only_html = doc.hid("eml-html-part-only")
    blank = doc.hid("eml-blank-lines")
    html_techs = [k for k, _ in doc.hidden if k.startswith("html-")]
    want_html = bool(only_html or html_techs or rng.random() < 0.65)
    txt_blocks = [("raw", "\n".join(b[1])) if b[0] == "lines" else b for b in doc.blocks]
    text = to_txt(txt_blocks)
    text += "\n-- \n" + h["author"] + "\n" + h["org"] + "\n"
    for t in blank:
        text += "\n" * 60 + t + "\n"
    sub = doc.host.get("subject", h["title"])
    try:
        sub.encode("ascii")
        subj = sub
    except UnicodeEncodeError:
        subj = Header(sub, "utf-8").encode()
    frm = h.get("from", f"{h['author']} <{h['email']}>")
    try:
        frm.encode("ascii")
    except UnicodeEncodeError:
        nm, addr = h["author"], h["email"]
        frm = Header(nm, "utf-8").encode() + f" <{addr}>"
    seed = hashlib.sha1(doc.case.encode()).hexdigest()
    hdr = [f"From: {frm}", f"To: {h.get('to', 'team@' + h['site'])}", f"Subject: {subj}",
           f"Date: {h.get('maildate', 'Tue, 14 Apr 2026 09:30:00 +0000')}",
           f"Message-ID: <{seed[:20]}@{h['site']}>", "MIME-Version: 1.0"]
    if rng.random() < 0.3:
        hdr.append("X-Mailer: Postbox Lite 3.2 (example)")
    if not want_html:
        hdr += ["Content-Type: text/plain; charset=utf-8", "Content-Transfer-Encoding: 8bit"]
        return ("\r\n".join(hdr) + "\r\n\r\n" + text.replace("\n", "\r\n")).encode("utf-8")
    bnd = "=_bnd_" + seed[:16]
    html = render_html_doc(doc)
    if rng.random() < 0.4 and not only_html:
        # newsletter-style preheader (a common legitimate hidden element)
        pre = f'<span style="display:none;max-height:0;overflow:hidden">{esc(clip(first_para(doc.blocks), 90))}</span>'
        html = html.replace("<body>\n", "<body>\n" + pre + "\n", 1)
    for t in only_html:
        html = html.replace("</article>", f"<p>{esc(t)}</p>\n</article>", 1)
    if rng.random() < 0.3:
        html = html.replace("</footer>", f'<p>Trouble reading this message? <a href="https://{h["site"]}/view">View it in '
                            f'your browser</a> or <a href="https://{h["site"]}/unsubscribe">unsubscribe</a>.</p></footer>', 1)
    parts = [f"--{bnd}", "Content-Type: text/plain; charset=utf-8", "Content-Transfer-Encoding: 8bit", "", text,
             f"--{bnd}", "Content-Type: text/html; charset=utf-8", "Content-Transfer-Encoding: 8bit", "", html,
             f"--{bnd}--", ""]
    hdr.append(f'Content-Type: multipart/alternative; boundary="{bnd}"')
    raw = "\r\n".join(hdr) + "\r\n\r\nThis is a multi-part message in MIME format.\r\n\r\n" + "\n".join(parts)
    raw = raw.replace("\r\n", "\n").replace("\n", "\r\n")
    return raw.encode("utf-8")


# ----------------------------------------------------------------- pdf
def _png_bytes(w=60, h=20, rgb=(90, 120, 160)):
    raw = b"".join(b"\x00" + bytes(rgb) * w for _ in range(h))

    def chunk(t, d):
        c = struct.pack(">I", len(d)) + t + d
        return c + struct.pack(">I", zlib.crc32(t + d) & 0xFFFFFFFF)
    return (b"\x89PNG\r\n\x1a\n" + chunk(b"IHDR", struct.pack(">IIBBBBB", w, h, 8, 2, 0, 0, 0))
            + chunk(b"IDAT", zlib.compress(raw, 9)) + chunk(b"IEND", b""))


def render_pdf(doc):
    from fpdf import FPDF
    from fpdf.enums import TextMode, XPos, YPos
    h, rng = doc.host, doc.rng
    pdf = FPDF(format="A4")
    pdf.set_creation_date(datetime.datetime(2026, 4, 14, 9, 30, tzinfo=datetime.timezone.utc))
    pdf.set_producer("case-builder")
    pdf.set_title(h["title"])
    pdf.set_author(h["author"])
    pdf.add_font("DV", "", os.path.join(FONT_DIR, "DejaVuSans.ttf"))
    pdf.add_font("DV", "B", os.path.join(FONT_DIR, "DejaVuSans-Bold.ttf"))
    pdf.add_font("DVM", "", os.path.join(FONT_DIR, "DejaVuSansMono.ttf"))
    pdf.set_margins(20, 20, 20)
    pdf.set_auto_page_break(True, 20)
    pdf.add_page()
    W = pdf.w - 40

    def para(text, size=10.5, style="", font="DV", indent=0):
        pdf.set_font(font, style, size)
        pdf.set_x(20 + indent)
        pdf.multi_cell(W - indent, size * 0.5, text, new_x=XPos.LMARGIN, new_y=YPos.NEXT)
        pdf.ln(2)

    H = doc.hid
    blocks = doc.blocks
    n = len(blocks)
    mid = max(1, n // 2)
    pdf.set_font("DV", "B", 16)
    pdf.multi_cell(W, 8, h["title"], new_x=XPos.LMARGIN, new_y=YPos.NEXT)
    pdf.ln(2)
    if rng.random() < 0.5:
        para(f"{h['author']} · {h['org']} · {h['date']}", size=9)

    def hidden_at(i):
        if i == mid:
            for t in H("pdf-render-mode-3"):
                pdf.set_font("DV", "", 10)
                pdf.text_mode = TextMode.INVISIBLE
                pdf.multi_cell(W, 5, t, new_x=XPos.LMARGIN, new_y=YPos.NEXT)
                pdf.text_mode = TextMode.FILL
            for t in H("pdf-white-text"):
                pdf.set_text_color(255, 255, 255)
                para(t, size=9)
                pdf.set_text_color(0, 0, 0)
            for t in H("pdf-tiny-text"):
                pdf.set_font("DV", "", 1)
                pdf.multi_cell(W, 0.6, t, new_x=XPos.LMARGIN, new_y=YPos.NEXT)
            for t in H("pdf-text-under-image"):
                if pdf.get_y() > 200:
                    pdf.add_page()
                y0 = pdf.get_y()
                pdf.set_font("DV", "", 7)
                pdf.multi_cell(W, 3.5, t, new_x=XPos.LMARGIN, new_y=YPos.NEXT)
                y1 = pdf.get_y()
                pdf.image(io.BytesIO(_png_bytes()), x=20, y=y0 - 1, w=W, h=(y1 - y0) + 2)
                pdf.ln(3)
            for t in H("pdf-many-text-objects"):
                if pdf.get_y() > 250:
                    pdf.add_page()
                pdf.set_font("DV", "", 2)
                x, y = 20, pdf.get_y() + 2
                k = 0
                while k < len(t):
                    piece = t[k:k + 3]
                    pdf.text(x, y, piece)
                    x += pdf.get_string_width(piece)
                    if x > 185:
                        x, y = 20, y + 1.2
                    k += 3
                pdf.set_y(y + 3)
            for t in H("pdf-annotation"):
                pdf.text_annotation(x=185, y=pdf.get_y(), text=t)
            for t in H("pdf-markup-annotation"):
                pdf.add_text_markup_annotation("Highlight", t, quad_points=[20, 800, 60, 800, 20, 790, 60, 790],
                                               title="Reviewer")

    for i, b in enumerate(blocks):
        hidden_at(i)
        t = b[0]
        if t == "h":
            para(inline_plain(b[2]), size=13 if b[1] <= 2 else 11.5, style="B")
        elif t == "p":
            para(inline_plain(b[1]))
        elif t == "quote":
            para(inline_plain(b[1]), indent=8)
        elif t in ("ul", "ol"):
            for k, it in enumerate(b[1]):
                mark = "•" if t == "ul" else f"{k + (b[2] if len(b) > 2 else 1)}."
                para(f"{mark} {inline_plain(it)}", indent=4)
        elif t == "code":
            para(b[2], size=8.5, font="DVM", indent=4)
        elif t == "table":
            for r in b[1]:
                para(" | ".join(inline_plain(c) for c in r), size=9.5, indent=2)
        elif t == "lines":
            for ln in b[1]:
                para(inline_plain(ln))
    hidden_at(n) if mid >= n else None
    # legitimate annotations (label-independent)
    if rng.random() < 0.35:
        pdf.text_annotation(x=185, y=30, text=rng.choice([
            "Checked figures against the source table. OK to circulate. - R.", "Please confirm the date with the venue.",
            "Layout approved; minor wording changes only.", "Reviewer: consider adding a contact line at the end."]))
    if rng.random() < 0.2:
        pdf.set_font("DV", "", 4)
        pdf.set_text_color(200, 200, 200)
        pdf.text(20, 290, f"Ref. {doc.case[-4:]}-{h['id']} / printed 2026-04-14 / internal distribution")
        pdf.set_text_color(0, 0, 0)
    pdf_bytes = bytes(pdf.output())
    fields = [("reviewer_note", t) for t in H("pdf-form-field")]
    if not fields and rng.random() < 0.25:
        fields = [("approved_by", rng.choice(["K. Varga", "M. Osei", "L. Brandt", "S. Ilunga"]))]
    ocg = H("pdf-ocg-hidden-layer")
    if not ocg and rng.random() < 0.1:
        ocg = ["DRAFT - for internal review only - watermark layer"]
    if fields or ocg:
        pdf_bytes = _postprocess(pdf_bytes, fields, ocg)
    return pdf_bytes


def _postprocess(data, fields, ocg_texts):
    from pypdf import PdfReader, PdfWriter
    from pypdf.generic import (NameObject, DictionaryObject, ArrayObject, TextStringObject, NumberObject,
                               FloatObject, DecodedStreamObject, ByteStringObject)
    r = PdfReader(io.BytesIO(data))
    w = PdfWriter(clone_from=r)
    page = w.pages[0]
    if fields:
        annots = page.get("/Annots")
        if annots is None:
            annots = ArrayObject()
            page[NameObject("/Annots")] = annots
        else:
            annots = annots.get_object()
        farr = ArrayObject()
        for k, (name, val) in enumerate(fields):
            f = DictionaryObject({
                NameObject("/Type"): NameObject("/Annot"), NameObject("/Subtype"): NameObject("/Widget"),
                NameObject("/FT"): NameObject("/Tx"), NameObject("/T"): TextStringObject(name),
                NameObject("/V"): TextStringObject(val), NameObject("/F"): NumberObject(4),
                NameObject("/Rect"): ArrayObject([FloatObject(430), FloatObject(40 + 20 * k), FloatObject(560), FloatObject(55 + 20 * k)]),
                NameObject("/DA"): TextStringObject("/Helv 0 Tf 0 g")})
            ref = w._add_object(f)
            annots.append(ref)
            farr.append(ref)
        w._root_object[NameObject("/AcroForm")] = DictionaryObject({NameObject("/Fields"): farr})
    if ocg_texts:
        ocg = DictionaryObject({NameObject("/Type"): NameObject("/OCG"), NameObject("/Name"): TextStringObject("Layer 2")})
        oref = w._add_object(ocg)
        w._root_object[NameObject("/OCProperties")] = DictionaryObject({
            NameObject("/OCGs"): ArrayObject([oref]),
            NameObject("/D"): DictionaryObject({NameObject("/OFF"): ArrayObject([oref]), NameObject("/Order"): ArrayObject([oref])})})
        res = page["/Resources"]
        props = DictionaryObject({NameObject("/oc1"): oref})
        res[NameObject("/Properties")] = props
        fonts = res["/Font"].get_object()
        fonts[NameObject("/FHX")] = w._add_object(DictionaryObject({
            NameObject("/Type"): NameObject("/Font"), NameObject("/Subtype"): NameObject("/Type1"),
            NameObject("/BaseFont"): NameObject("/Helvetica"), NameObject("/Encoding"): NameObject("/WinAnsiEncoding")}))
        ops = ["/OC /oc1 BDC", "BT", "/FHX 9 Tf", "60 120 Td", "11 TL"]
        for t in ocg_texts:
            words, line = t.split(), ""
            lines = []
            for wd in words:
                if len(line) + len(wd) > 90:
                    lines.append(line)
                    line = wd
                else:
                    line = (line + " " + wd).strip()
            lines.append(line)
            for ln in lines:
                s = ln.replace("\\", "\\\\").replace("(", "\\(").replace(")", "\\)")
                ops.append(f"({s}) Tj T*")
        ops += ["ET", "EMC"]
        st = DecodedStreamObject()
        st.set_data(("\n".join(ops) + "\n").encode("latin-1"))
        sref = w._add_object(st)
        cont = page["/Contents"]
        if isinstance(cont.get_object(), ArrayObject):
            arr = cont.get_object()
            arr.append(sref)
        else:
            page[NameObject("/Contents")] = ArrayObject([cont, sref])
    w._ID = None
    out = io.BytesIO()
    w.write(out)
    return out.getvalue()


RENDER = {"md": render_md, "txt": render_txt, "html": render_html, "eml": render_eml, "pdf": render_pdf}
