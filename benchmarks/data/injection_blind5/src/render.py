"""Renderers: a tiny Markdown-like block model rendered to md, txt, html, eml and pdf.

Block types (tuples):
  ('h', level, text) ('p', text) ('ul', [items]) ('ol', [items]) ('table', [[cells]])
  ('code', lang, text) ('quote', text) ('hidden', technique, text, extra)
Hidden blocks are rendered by format-specific techniques (attack payloads and benign decor alike).
"""
import html as _html
import io, struct, zlib, os, datetime

HERE = os.path.dirname(os.path.abspath(__file__))
FONTS = os.path.join(HERE, "fonts")


def parse(md):
    blocks, lines, i = [], md.strip("\n").split("\n"), 0
    while i < len(lines):
        ln = lines[i]
        if not ln.strip():
            i += 1; continue
        if ln.startswith("```"):
            lang = ln[3:].strip(); j = i + 1; buf = []
            while j < len(lines) and not lines[j].startswith("```"):
                buf.append(lines[j]); j += 1
            blocks.append(("code", lang, "\n".join(buf))); i = j + 1; continue
        if ln.startswith("#"):
            lvl = len(ln) - len(ln.lstrip("#"))
            blocks.append(("h", lvl, ln[lvl:].strip())); i += 1; continue
        buf = []
        while i < len(lines) and lines[i].strip() and not lines[i].startswith("```") and not lines[i].startswith("#"):
            buf.append(lines[i]); i += 1
        if all(b.startswith("- ") for b in buf):
            blocks.append(("ul", [b[2:] for b in buf]))
        elif all(b[:1].isdigit() and ". " in b[:4] for b in buf):
            blocks.append(("ol", [b.split(". ", 1)[1] for b in buf]))
        elif all(b.startswith("|") for b in buf):
            rows = [[c.strip() for c in b.strip().strip("|").split("|")] for b in buf
                    if not set(b.replace("|", "").strip()) <= set("-: ")]
            blocks.append(("table", rows))
        elif all(b.startswith("> ") for b in buf):
            blocks.append(("quote", "\n".join(b[2:] for b in buf)))
        else:
            blocks.append(("p", "\n".join(buf)))
    return blocks


def words(blocks):
    n = 0
    for b in blocks:
        if b[0] in ("p", "quote"): n += len(b[1].split())
        elif b[0] == "h": n += len(b[2].split())
        elif b[0] in ("ul", "ol"): n += sum(len(x.split()) for x in b[1])
        elif b[0] == "table": n += sum(len(c.split()) for r in b[1] for c in r)
        elif b[0] == "code": n += len(b[2].split())
        elif b[0] == "hidden": n += len(b[2].split())
    return n

# ---------------------------------------------------------------- markdown

def to_md(blocks, meta):
    out, foot = [], []
    fm = meta.get("front_matter")
    if fm:
        out.append("---\n" + "\n".join(f"{k}: {v}" for k, v in fm) + "\n---")
    for b in blocks:
        t = b[0]
        if t == "h": out.append("#" * b[1] + " " + b[2])
        elif t == "p": out.append(b[1].replace("\n", "  \n") if meta.get("hardbreaks") else b[1])
        elif t == "quote": out.append("\n".join("> " + x for x in b[1].split("\n")))
        elif t == "ul": out.append("\n".join("- " + x for x in b[1]))
        elif t == "ol": out.append("\n".join(f"{k+1}. {x}" for k, x in enumerate(b[1])))
        elif t == "table":
            rows = b[1]; s = ["| " + " | ".join(rows[0]) + " |", "|" + "---|" * len(rows[0])]
            s += ["| " + " | ".join(r) + " |" for r in rows[1:]]; out.append("\n".join(s))
        elif t == "code": out.append("```" + b[1] + "\n" + b[2] + "\n```")
        elif t == "hidden":
            tech, text = b[1], b[2]
            if tech == "md-html-comment": out.append("<!-- " + text + " -->")
            elif tech == "md-footnote":
                n = len(foot) + 1
                out[-1] = out[-1] + f"[^{n}]" if out else f"[^{n}]"
                foot.append(f"[^{n}]: {text}")
            elif tech == "md-table-cell":
                rows = b[3]; s = ["| " + " | ".join(rows[0]) + " |", "|" + "---|" * len(rows[0])]
                s += ["| " + " | ".join(r) + " |" for r in rows[1:]]; out.append("\n".join(s))
            elif tech == "md-code-comment":
                out.append("```" + b[3][0] + "\n" + b[3][1] + "\n```")
            elif tech == "md-details":
                out.append("<details>\n<summary>" + b[3] + "</summary>\n\n" + text + "\n\n</details>")
            else:
                out.append(text)
    if foot: out.append("\n".join(foot))
    return "\n\n".join(out) + "\n"

# ---------------------------------------------------------------- text

def to_txt(blocks, meta, width_rule=True):
    out = []
    for b in blocks:
        t = b[0]
        if t == "h":
            out.append(b[2].upper() if b[1] == 1 else b[2])
            if width_rule: out[-1] += "\n" + ("=" if b[1] == 1 else "-") * min(len(b[2]), 72)
        elif t in ("p",): out.append(b[1])
        elif t == "quote": out.append("\n".join("  > " + x for x in b[1].split("\n")))
        elif t == "ul": out.append("\n".join("  * " + x for x in b[1]))
        elif t == "ol": out.append("\n".join(f"  {k+1}) {x}" for k, x in enumerate(b[1])))
        elif t == "table": out.append("\n".join("  " + " | ".join(r) for r in b[1]))
        elif t == "code": out.append("\n".join("    " + x for x in b[2].split("\n")))
        elif t == "hidden":
            tech, text = b[1], b[2]
            if tech == "txt-blank-lines": out.append("\n" * 60 + text)
            elif tech == "html-part-only": continue
            elif tech in ("md-table-cell",): out.append("\n".join("  " + " | ".join(r) for r in b[3]))
            elif tech == "md-code-comment": out.append("\n".join("    " + x for x in b[3][1].split("\n")))
            else: out.append(text)
    return "\n\n".join(out) + "\n"

# ---------------------------------------------------------------- html
E = lambda s: _html.escape(s, quote=True)


def inline_html(s):
    return E(s).replace("\n", "<br>\n")


def html_block(b, head, style):
    t = b[0]
    if t == "h": return f"<h{b[1]}>{E(b[2])}</h{b[1]}>"
    if t == "p": return f"<p>{inline_html(b[1])}</p>"
    if t == "quote": return f"<blockquote>{inline_html(b[1])}</blockquote>"
    if t == "ul": return "<ul>\n" + "\n".join(f"  <li>{E(x)}</li>" for x in b[1]) + "\n</ul>"
    if t == "ol": return "<ol>\n" + "\n".join(f"  <li>{E(x)}</li>" for x in b[1]) + "\n</ol>"
    if t == "table":
        rows = b[1]
        s = "<table>\n  <tr>" + "".join(f"<th>{E(c)}</th>" for c in rows[0]) + "</tr>\n"
        s += "".join("  <tr>" + "".join(f"<td>{E(c)}</td>" for c in r) + "</tr>\n" for r in rows[1:])
        return s + "</table>"
    if t == "code": return f'<pre><code class="language-{E(b[1] or "text")}">{E(b[2])}</code></pre>'
    if t == "hidden":
        tech, text, extra = b[1], b[2], (b[3] if len(b) > 3 else None)
        x = E(text)
        if tech == "html-template": return f'<template id="{extra or "tpl-row"}">\n  <p>{x}</p>\n</template>'
        if tech == "html-svg-text":
            return f'<svg width="24" height="24" viewBox="0 0 24 24" role="img"><circle cx="12" cy="12" r="10" fill="#3a7"/><text x="0" y="30" font-size="1" fill="#fff">{x}</text></svg>'
        if tech == "html-css-content":
            style.append('.%s::after { content: "%s"; font-size: 0; }' % (extra or "nb", text.replace("\\", "\\\\").replace('"', '\\"')))
            return f'<span class="{extra or "nb"}"></span>'
        if tech == "html-meta-description":
            head.append(f'<meta name="description" content="{x}">'); return ""
        if tech == "html-hidden-input":
            return f'<form action="/feedback" method="post">\n  <input type="hidden" name="{extra or "ref"}" value="{x}">\n  <button type="submit">Send feedback</button>\n</form>'
        if tech == "html-details":
            return f"<details>\n  <summary>{E(extra or 'More information')}</summary>\n  <p>{x}</p>\n</details>"
        if tech == "html-display-none": return f'<div class="{extra or "note"}" style="display:none">{x}</div>'
        if tech == "html-visibility-hidden": return f'<p style="visibility:hidden">{x}</p>'
        if tech == "html-white-on-white": return f'<p style="color:#ffffff;background-color:#ffffff">{x}</p>'
        if tech == "html-zero-font": return f'<p style="font-size:0">{x}</p>'
        if tech == "html-off-screen":
            return f'<div style="position:absolute;left:-10000px;top:auto;width:1px;height:1px;overflow:hidden">{x}</div>'
        if tech == "html-aria-label": return f'<a href="#top" class="icon-link" aria-label="{x}">&#8593;</a>'
        if tech == "html-title-alt": return f'<img src="figure-1.png" width="480" height="240" alt="{x}" title="{E(extra or "Figure 1")}">'
        if tech == "html-noscript": return f"<noscript>{x}</noscript>"
        if tech == "html-data-attr":
            return f'<div class="card" data-{extra or "note"}="{x}"><p>{E("See the summary above.")}</p></div>'
        if tech == "html-comment": return f"<!-- {text} -->"
        if tech in ("md-table-cell",): return html_block(("table", extra), head, style)
        if tech == "md-code-comment": return html_block(("code", extra[0], extra[1]), head, style)
        if tech in ("txt-blank-lines", "html-part-only", "md-footnote", "md-html-comment"):
            return f'<p style="font-size:11px;color:#777">{x}</p>'
        if tech == "md-details": return html_block(("hidden", "html-details", text, extra), head, style)
        return f"<p>{x}</p>"
    return ""


def to_html(blocks, meta, fragment=False):
    head, style, body = [], [], []
    for d in meta.get("html_head", []): head.append(d)
    for b in blocks:
        r = html_block(b, head, style)
        if r: body.append(r)
    if fragment:
        return "\n".join(body)
    title = meta.get("title", "Document")
    lang = meta.get("lang", "en")
    pre = meta.get("html_pre", []); post = meta.get("html_post", [])
    css = "body { font-family: sans-serif; max-width: 52em; margin: 2em auto; line-height: 1.5; }\ntable { border-collapse: collapse; } td, th { border: 1px solid #ccc; padding: 4px 8px; }"
    if style: css += "\n" + "\n".join(style)
    dirattr = ' dir="rtl"' if lang in ("ar", "fa") else ""
    s = [f'<!DOCTYPE html>\n<html lang="{lang}"{dirattr}>\n<head>\n<meta charset="utf-8">\n<title>{E(title)}</title>']
    s += head
    s.append(f"<style>\n{css}\n</style>\n</head>\n<body>")
    s += pre
    s.append("<main>")
    s += body
    s.append("</main>")
    s += post
    s.append("</body>\n</html>\n")
    return "\n".join(s)

# ---------------------------------------------------------------- eml

def to_eml(blocks, meta):
    hdr = meta["mail"]
    text = to_txt(blocks, meta, width_rule=False)
    lines = [f"From: {hdr['from']}", f"To: {hdr['to']}"]
    if hdr.get("cc"): lines.append(f"Cc: {hdr['cc']}")
    lines += [f"Subject: {hdr['subject']}", f"Date: {hdr['date']}", f"Message-ID: <{hdr['msgid']}>", "MIME-Version: 1.0"]
    if meta.get("eml_html"):
        bnd = "=_alt_" + hdr["msgid"].split("@")[0].replace(".", "_")
        frag = to_html(blocks, meta, fragment=True)
        extra = "\n".join(meta.get("eml_html_extra", []))
        htmlpart = f'<html><body style="font-family:Arial,sans-serif">\n{frag}\n{extra}\n</body></html>'
        lines.append(f'Content-Type: multipart/alternative; boundary="{bnd}"')
        body = (f"This is a multi-part message in MIME format.\n\n--{bnd}\nContent-Type: text/plain; charset=\"utf-8\"\n"
                f"Content-Transfer-Encoding: 8bit\n\n{text}\n--{bnd}\nContent-Type: text/html; charset=\"utf-8\"\n"
                f"Content-Transfer-Encoding: 8bit\n\n{htmlpart}\n\n--{bnd}--\n")
    else:
        lines += ['Content-Type: text/plain; charset="utf-8"', "Content-Transfer-Encoding: 8bit"]
        body = text
    return "\n".join(lines) + "\n\n" + body

# ---------------------------------------------------------------- pdf

def _png(w, h, rgb=(214, 224, 236)):
    raw = b"".join(b"\x00" + bytes(rgb) * w for _ in range(h))
    def chunk(t, d): return struct.pack(">I", len(d)) + t + d + struct.pack(">I", zlib.crc32(t + d) & 0xffffffff)
    return (b"\x89PNG\r\n\x1a\n" + chunk(b"IHDR", struct.pack(">IIBBBBB", w, h, 8, 2, 0, 0, 0))
            + chunk(b"IDAT", zlib.compress(raw, 9)) + chunk(b"IEND", b""))


def to_pdf(blocks, meta):
    from fpdf import FPDF
    from fpdf.enums import TextMode
    pdf = FPDF(format="A4")
    pdf.set_creation_date(datetime.datetime(2026, 11, 2, 9, 0, 0, tzinfo=datetime.timezone.utc))
    pdf.set_title(meta.get("title", "Document")); pdf.set_author(meta.get("author", "Document Services"))
    pdf.set_producer("docbuild 1.0"); pdf.set_creator("docbuild 1.0")
    pdf.add_font("DV", "", os.path.join(FONTS, "DejaVuSans.ttf"))
    pdf.add_font("DV", "B", os.path.join(FONTS, "DejaVuSans-Bold.ttf"))
    pdf.add_font("DVM", "", os.path.join(FONTS, "DejaVuSansMono.ttf"))
    pdf.set_auto_page_break(True, 18)
    pdf.add_page(); pdf.set_margins(18, 18, 18); pdf.set_x(18)
    post = []  # (kind, text, extra) for pypdf post-processing
    W = pdf.w - 36

    def para(text, size=10.5, style="", h=5.2, font="DV"):
        text = "".join(c for c in text if ord(c) <= 0xFFFF)
        pdf.set_font(font, style, size); pdf.set_x(18)
        pdf.multi_cell(W, h, text, new_x="LMARGIN", new_y="NEXT"); pdf.ln(1.8)

    for b in blocks:
        t = b[0]
        if t == "h": para(b[2], size={1: 16, 2: 13}.get(b[1], 11.5), style="B", h=7)
        elif t == "p": para(b[1])
        elif t == "quote": pdf.set_text_color(80, 80, 80); para(b[1]); pdf.set_text_color(0, 0, 0)
        elif t == "ul":
            for x in b[1]: para("\u2022 " + x, h=5)
        elif t == "ol":
            for k, x in enumerate(b[1]): para(f"{k+1}. " + x, h=5)
        elif t == "table":
            for r in b[1]: para("   |   ".join(r), size=9.5, h=4.8)
        elif t == "code": para(b[2], size=8.5, h=4.2, font="DVM")
        elif t == "hidden":
            tech, text = b[1], b[2]
            extra = b[3] if len(b) > 3 else None
            if tech == "pdf-annotation":
                pdf.text_annotation(pdf.w - 30, pdf.get_y(), text, w=8, h=8, title=extra or "Reviewer")
            elif tech == "pdf-render-mode-3":
                pdf.text_mode = TextMode.INVISIBLE; para(text); pdf.text_mode = TextMode.FILL
            elif tech == "pdf-white-text":
                pdf.set_text_color(255, 255, 255); para(text); pdf.set_text_color(0, 0, 0)
            elif tech == "pdf-tiny-text":
                para(text, size=1, h=0.6)
            elif tech == "pdf-under-image":
                y0 = pdf.get_y(); para(text, size=9); y1 = pdf.get_y()
                pdf.image(io.BytesIO(_png(40, 12)), x=16, y=y0 - 1, w=W + 4, h=max(y1 - y0 + 2, 8))
            elif tech == "pdf-split-objects":
                pdf.set_font("DV", "", 1.2); y = pdf.get_y() + 1; x = 18.0
                for k in range(0, len(text), 3):
                    chunk = text[k:k + 3]
                    pdf.text(x, y, chunk); x += pdf.get_string_width(chunk)
                    if x > pdf.w - 20: x = 18.0; y += 0.8
                pdf.set_y(y + 2)
            elif tech in ("pdf-form-field", "pdf-ocg-hidden"):
                post.append((tech, text, extra, pdf.page))
            elif tech == "pdf-footer-tiny":
                para(text, size=4, h=2)
            else:
                para(text)
    buf = pdf.output()
    if not post:
        return bytes(buf)
    return _pdf_post(bytes(buf), post)


def _pdf_post(data, post):
    from pypdf import PdfReader, PdfWriter
    from pypdf.generic import (NameObject, DictionaryObject, ArrayObject, TextStringObject, NumberObject,
                               FloatObject, DecodedStreamObject, BooleanObject, ByteStringObject)
    r = PdfReader(io.BytesIO(data)); w = PdfWriter(clone_from=r)
    fields = ArrayObject(); ocgs = ArrayObject()
    for k, (tech, text, extra, pno) in enumerate(post):
        page = w.pages[pno - 1]
        if tech == "pdf-form-field":
            fd = DictionaryObject({NameObject("/Type"): NameObject("/Annot"), NameObject("/Subtype"): NameObject("/Widget"),
                                   NameObject("/FT"): NameObject("/Tx"), NameObject("/T"): TextStringObject(extra or f"field{k+1}"),
                                   NameObject("/V"): TextStringObject(text), NameObject("/F"): NumberObject(4),
                                   NameObject("/Rect"): ArrayObject([FloatObject(60), FloatObject(40), FloatObject(300), FloatObject(56)]),
                                   NameObject("/DA"): TextStringObject("/Helv 0 Tf 0 g")})
            ref = w._add_object(fd); fd[NameObject("/P")] = page.indirect_reference
            annots = page.get("/Annots")
            if annots is None:
                page[NameObject("/Annots")] = ArrayObject([ref])
            else:
                annots.get_object().append(ref)
            fields.append(ref)
        else:
            ocg = DictionaryObject({NameObject("/Type"): NameObject("/OCG"), NameObject("/Name"): TextStringObject(extra or "Layer 2")})
            oref = w._add_object(ocg); ocgs.append(oref)
            res = page["/Resources"].get_object()
            props = res.get("/Properties")
            if props is None:
                props = DictionaryObject(); res[NameObject("/Properties")] = props
            props = props.get_object(); props[NameObject(f"/OCX{k}")] = oref
            fonts = res["/Font"].get_object()
            fonts[NameObject("/FHX")] = w._add_object(DictionaryObject({NameObject("/Type"): NameObject("/Font"), NameObject("/Subtype"): NameObject("/Type1"),
                                                                          NameObject("/BaseFont"): NameObject("/Helvetica"), NameObject("/Encoding"): NameObject("/WinAnsiEncoding")}))
            esc = text.encode("cp1252", "replace").replace(b"\\", b"\\\\").replace(b"(", b"\\(").replace(b")", b"\\)")
            # wrap into lines of ~95 chars
            lines, cur = [], b""
            for wd in esc.split(b" "):
                if len(cur) + len(wd) > 95: lines.append(cur); cur = wd
                else: cur = (cur + b" " + wd) if cur else wd
            lines.append(cur)
            ops = b"/OC /OCX%d BDC\nBT\n/FHX 9 Tf\n60 120 Td\n11 TL\n" % k
            ops += b"".join(b"(" + ln + b") Tj T*\n" for ln in lines) + b"ET\nEMC\n"
            st = DecodedStreamObject(); st.set_data(ops)
            sref = w._add_object(st)
            cont = page["/Contents"]
            arr = ArrayObject(list(cont.get_object()) if isinstance(cont.get_object(), ArrayObject) else [cont])
            arr.append(sref); page[NameObject("/Contents")] = arr
    root = w._root_object
    if fields:
        root[NameObject("/AcroForm")] = DictionaryObject({NameObject("/Fields"): fields, NameObject("/NeedAppearances"): BooleanObject(True)})
    if ocgs:
        root[NameObject("/OCProperties")] = DictionaryObject({NameObject("/OCGs"): ocgs,
                                                              NameObject("/D"): DictionaryObject({NameObject("/OFF"): ArrayObject(list(ocgs)), NameObject("/Order"): ArrayObject(list(ocgs))})})
    w._ID = ArrayObject([ByteStringObject(b"0123456789abcdef"), ByteStringObject(b"0123456789abcdef")])
    out = io.BytesIO(); w.write(out)
    return out.getvalue()
