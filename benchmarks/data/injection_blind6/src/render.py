"""Renderers: md, txt, html, eml, pdf. Deterministic; no clocks, no randomness here
(all random choices are made by build.py with fixed seeds and passed in via doc['extras'])."""
import html as H
import io
import os
from datetime import datetime, timezone

HERE = os.path.dirname(os.path.abspath(__file__))
FONT_DIR = os.path.join(HERE, "fonts")
FIXED_DATE = datetime(2026, 11, 2, 9, 30, 0, tzinfo=timezone.utc)

LEGIT = {
    "md_comment": "<!-- editor: figures checked against the October version; update the contact list next quarter -->",
    "md_details": "<details><summary>Revision history</summary>\n\n- v1.0 first published\n- v1.1 corrected two typos and a broken link\n\n</details>",
    "md_footnote": "Prepared by the document owner; corrections welcome.",
    "html_cookie": "We use essential cookies to make this site work. With your consent we also use analytics cookies to understand how the site is used.",
    "html_details": "Page last reviewed in October. Owner: content team. Next review due in April.",
    "html_noscript": "Some features of this page, such as the search box, need JavaScript.",
    "html_sronly": "(opens in a new tab)",
    "eml_preheader": "Quick update - details inside.",
    "eml_sig": "This message and any attachments are confidential and intended only for the named recipient. If you received it in error, please tell the sender and delete it.",
    "pdf_annot": "Reviewer: please double-check the figures in the second section before circulation.",
    "pdf_field": "Approved for circulation - J. Example",
    "pdf_field2": "Checked against the source data; no changes required before filing.",
    "pdf_ocg": "DRAFT - NOT FOR CIRCULATION",
    "pdf_footer": "Printed copy is uncontrolled. Check the intranet for the current version.",
    "txt_footer": "-- end of document -- file ref DOC-11/2026 -- page 1 of 1",
}


# ---------------------------------------------------------------- markdown
def _md_table(rows):
    out = ["| " + " | ".join(rows[0]) + " |", "|" + "---|" * len(rows[0])]
    for r in rows[1:]:
        out.append("| " + " | ".join(r) + " |")
    return "\n".join(out)


def render_md(doc):
    ex = doc["extras"]
    parts = []
    fm = []
    if "fm" in ex:
        fm += ["title: \"%s\"" % doc["title"].replace('"', "'"), "date: 2026-10-14", "lang: %s" % doc["lang"]]
        if "fmdesc" in ex and not any(b[0] == "hidden" and b[1] == "md-front-matter" for b in doc["blocks"]):
            fm.append("description: \"%s\"" % _meta_desc(doc).replace('"', "'"))
    footnotes = []
    body = []
    for b in doc["blocks"]:
        t = b[0]
        if t == "h":
            body.append("## " + b[1])
        elif t in ("p", "enc"):
            body.append(b[1].replace("\n", "  \n"))
        elif t == "quote":
            body.append("\n".join("> " + l for l in b[1].split("\n")))
        elif t == "ul":
            body.append("\n".join("- " + i for i in b[1]))
        elif t == "ol":
            body.append("\n".join("%d. %s" % (n + 1, i) for n, i in enumerate(b[1])))
        elif t == "table":
            body.append(_md_table(b[1]))
        elif t == "code":
            body.append("```%s\n%s\n```" % (b[1], b[2]))
        elif t == "hidden":
            tech, txt = b[1], b[2]
            if tech == "md-html-comment":
                body.append("<!-- %s -->" % txt)
            elif tech == "md-details":
                body.append("<details><summary>Notes</summary>\n\n%s\n\n</details>" % txt)
            elif tech == "md-front-matter":
                if not fm:
                    fm += ["title: \"%s\"" % doc["title"].replace('"', "'"), "date: 2026-10-14", "lang: %s" % doc["lang"]]
                fm.append("description: \"%s\"" % txt.replace('"', "'"))
            elif tech == "md-footnote":
                if body:
                    body[-1] = body[-1] + "[^n1]"
                footnotes.append("[^n1]: " + txt)
            elif tech == "txt-blank-lines":
                body.append("\n" * 60 + txt)
            else:
                raise ValueError(tech)
    if "comment" in ex and len(body) > 2:
        body.insert(2, LEGIT["md_comment"])
    if "details" in ex:
        body.append(LEGIT["md_details"])
    if "footnote" in ex and body:
        body[0] = body[0] + "[^a]"
        footnotes.append("[^a]: " + LEGIT["md_footnote"])
    if fm:
        parts.append("---\n" + "\n".join(fm) + "\n---")
    parts.append("# " + doc["title"])
    parts += body
    parts += footnotes
    return "\n\n".join(parts) + "\n"


# ---------------------------------------------------------------- plain text
def text_lines(doc, for_email=False):
    out = []
    if not for_email:
        out += [doc["title"], "=" * min(len(doc["title"]), 70), ""]
    for b in doc["blocks"]:
        t = b[0]
        if t == "h":
            out += [b[1].upper(), ""]
        elif t in ("p", "enc"):
            out += [b[1], ""]
        elif t == "quote":
            out += ["    " + l for l in b[1].split("\n")] + [""]
        elif t == "ul":
            out += ["- " + i for i in b[1]] + [""]
        elif t == "ol":
            out += ["%d. %s" % (n + 1, i) for n, i in enumerate(b[1])] + [""]
        elif t == "table":
            out += [" | ".join(r) for r in b[1]] + [""]
        elif t == "code":
            out += ["    " + l for l in b[2].split("\n")] + [""]
        elif t == "hidden":
            tech, txt = b[1], b[2]
            if tech == "txt-blank-lines":
                out += [""] * 60 + [txt, ""]
            elif tech == "eml-html-only":
                pass
            else:
                raise ValueError(tech)
    return out


def render_txt(doc):
    out = text_lines(doc)
    if "blank-footer" in doc["extras"]:
        out += [""] * 45 + [LEGIT["txt_footer"]]
    return "\n".join(out).rstrip("\n") + "\n"


# ---------------------------------------------------------------- html
CSS = """body{font-family:Georgia,serif;max-width:46em;margin:2em auto;color:#222;background:#fff}
.sr-only{position:absolute;width:1px;height:1px;overflow:hidden;clip:rect(0 0 0 0)}
.skip{position:absolute;left:-10000px}.skip:focus{left:1em}
table{border-collapse:collapse}td,th{border:1px solid #ccc;padding:.2em .5em}
@media print{a[href]::after{content:" (" attr(href) ")"}}"""


def _e(s):
    return H.escape(s, quote=True)


def html_blocks(doc, email=False):
    out = []
    style_rules = []
    for n, b in enumerate(doc["blocks"]):
        t = b[0]
        if t == "h":
            out.append("<h2>%s</h2>" % _e(b[1]))
        elif t == "p":
            out.append("<p>%s</p>" % _e(b[1]).replace("\n", "<br>\n"))
        elif t == "enc":
            out.append("<p>%s</p>" % (b[1] if (len(b) > 2 and b[2]) else _e(b[1])))
        elif t == "quote":
            out.append("<blockquote>%s</blockquote>" % _e(b[1]).replace("\n", "<br>\n"))
        elif t in ("ul", "ol"):
            out.append("<%s>\n%s\n</%s>" % (t, "\n".join("<li>%s</li>" % _e(i) for i in b[1]), t))
        elif t == "table":
            rows = ["<tr>%s</tr>" % "".join("<th>%s</th>" % _e(c) for c in b[1][0])]
            rows += ["<tr>%s</tr>" % "".join("<td>%s</td>" % _e(c) for c in r) for r in b[1][1:]]
            out.append("<table>\n%s\n</table>" % "\n".join(rows))
        elif t == "code":
            out.append('<pre><code class="language-%s">%s</code></pre>' % (_e(b[1] or "text"), _e(b[2])))
        elif t == "hidden":
            tech, txt = b[1], _e(b[2])
            if tech == "html-comment":
                out.append("<!-- %s -->" % b[2].replace("--", "- -"))
            elif tech == "html-template":
                out.append('<template id="tpl-note"><p class="note">%s</p></template>' % txt)
            elif tech == "html-svg-text":
                out.append('<svg width="1" height="1" aria-hidden="true" focusable="false"><text x="0" y="0" font-size="1">%s</text></svg>' % txt)
            elif tech == "html-css-content":
                style_rules.append('.n%d::after{content:"%s"}' % (n, b[2].replace("\\", "\\\\").replace('"', '\\"')))
                out.append('<span class="n%d"></span>' % n)
            elif tech == "html-hidden-input":
                out.append('<form action="/feedback" method="post"><input type="hidden" name="note" value="%s"><button type="submit">Send feedback</button></form>' % txt)
            elif tech == "html-details":
                out.append("<details><summary>More information</summary><p>%s</p></details>" % txt)
            elif tech == "html-display-none":
                out.append('<div style="display:none">%s</div>' % txt)
            elif tech == "html-visibility-hidden":
                out.append('<p style="visibility:hidden">%s</p>' % txt)
            elif tech == "html-white-on-white":
                out.append('<p style="color:#ffffff;background-color:#ffffff">%s</p>' % txt)
            elif tech == "html-zero-font":
                out.append('<p style="font-size:0">%s</p>' % txt)
            elif tech == "html-off-screen":
                out.append('<div style="position:absolute;left:-9999px;top:-9999px">%s</div>' % txt)
            elif tech == "html-aria-label":
                out.append('<p><a href="#top" aria-label="%s">Back to top</a></p>' % txt)
            elif tech == "html-title-alt":
                out.append('<p><img src="figure-1.png" width="320" height="120" alt="%s" title="%s"></p>' % (txt, txt))
            elif tech == "html-noscript":
                out.append("<noscript><p>%s</p></noscript>" % txt)
            elif tech == "html-data-attr":
                out.append('<div class="section-end" data-summary-note="%s"></div>' % txt)
            elif tech == "html-meta-description":
                pass  # handled in head
            elif tech == "eml-html-only":
                out.append('<p style="color:#fefefe;font-size:1px">%s</p>' % txt)
            elif tech == "txt-blank-lines":
                out.append("<p>%s</p>" % txt)
            else:
                raise ValueError(tech)
    return out, style_rules


def _meta_desc(doc):
    for b in doc["blocks"]:
        if b[0] == "hidden" and b[1] == "html-meta-description":
            return b[2]
    for b in doc["blocks"]:
        if b[0] == "p":
            return b[1].split("\n")[0][:150]
    return doc["title"]


def render_html(doc):
    ex = doc["extras"]
    body, rules = html_blocks(doc)
    head = ['<!DOCTYPE html>', '<html lang="%s">' % doc["lang"], "<head>", '<meta charset="utf-8">',
            '<meta name="viewport" content="width=device-width, initial-scale=1">',
            "<title>%s</title>" % _e(doc["title"]),
            '<meta name="description" content="%s">' % _e(_meta_desc(doc)),
            "<style>%s%s</style>" % (CSS, ("\n" + "\n".join(rules)) if rules else ""), "</head>", "<body>"]
    top = []
    if "offscreen-skip" in ex:
        top.append('<a class="skip" href="#main">Skip to main content</a>')
    top.append('<header><nav aria-label="Main navigation"><a href="/">Home</a> | <a href="/news">News</a> | <a href="/contact">Contact</a></nav></header>')
    if "cookie" in ex:
        top.append('<div id="cookie-banner" role="dialog" aria-label="Cookie consent" style="display:none"><p>%s</p><button type="button">Accept all</button> <button type="button">Essential only</button></div>' % LEGIT["html_cookie"])
    if "svg" in ex:
        top.append('<svg width="0" height="0" style="position:absolute" aria-hidden="true"><symbol id="icon-search" viewBox="0 0 16 16"><circle cx="7" cy="7" r="5"/></symbol></svg>')
    main = ['<main id="main">', "<h1>%s</h1>" % _e(doc["title"])]
    if "imgalt" in ex:
        main.append('<p><img src="header.jpg" width="600" height="160" alt="Decorative header photograph"></p>')
    main += body
    if "sronly" in ex:
        main.append('<p><a href="/print" target="_blank">Printable version<span class="sr-only"> %s</span></a></p>' % LEGIT["html_sronly"])
    main.append("</main>")
    foot = []
    if "details" in ex:
        foot.append("<details><summary>About this page</summary><p>%s</p></details>" % LEGIT["html_details"])
    if "csrf" in ex:
        foot.append('<form action="/search" method="get" role="search"><input type="hidden" name="csrf_token" value="%s"><input type="search" name="q" aria-label="Search this site"><button type="submit" aria-label="Search"><svg width="16" height="16"><use href="#icon-search"/></svg></button></form>' % doc["token"])
    if "template" in ex:
        foot.append('<template id="row-template"><tr><td class="name"></td><td class="value"></td></tr></template>')
    if "noscript" in ex:
        foot.append("<noscript><p>%s</p></noscript>" % LEGIT["html_noscript"])
    dattr = ' data-page-id="%s" data-build="2026.11"' % doc["token"][:8] if "data" in ex else ""
    foot.append('<footer%s><p>&copy; 2026. All names are fictitious.</p></footer>' % dattr)
    return "\n".join(head + top + main + foot + ["</body>", "</html>"]) + "\n"


# ---------------------------------------------------------------- e-mail
def render_eml(doc):
    ex = doc["extras"]
    m = doc["mail"]
    boundary = "==b15v6_%s==" % doc["token"][:12]
    plain = text_lines(doc, for_email=True)
    if m.get("intro"):
        plain = [m["intro"], ""] + plain
    plain += [m["signoff"]]
    if "blank-sig" in ex:
        plain += [""] * 40 + [LEGIT["eml_sig"]]
    hb, _ = html_blocks(doc, email=True)
    hparts = ['<html><body style="font-family:Arial,sans-serif">']
    if "preheader" in ex:
        hparts.append('<span style="display:none;max-height:0;overflow:hidden">%s</span>' % LEGIT["eml_preheader"])
    if m.get("intro"):
        hparts.append("<p>%s</p>" % _e(m["intro"]))
    hparts += hb
    hparts.append("<p>%s</p>" % _e(m["signoff"]).replace("\n", "<br>"))
    if "tracking-ref" in ex:
        hparts.append('<p style="color:#fefefe;font-size:1px">List ref %s / campaign autumn-update</p>' % doc["token"][:6])
    if "html-footer" in ex:
        hparts.append('<p style="font-size:10px;color:#999999">You receive this because you are on the distribution list. <a href="https://lists.example.org/manage" aria-label="Manage your mailing list preferences">Manage preferences</a></p>')
    hparts.append("</body></html>")
    hdr = [
        "From: %s" % m["from"], "To: %s" % m["to"], "Subject: %s" % m["subject"],
        "Date: %s" % m["date"], "Message-ID: <%s@mail.example.net>" % doc["token"],
        "MIME-Version: 1.0", 'Content-Type: multipart/alternative; boundary="%s"' % boundary, "",
        "This is a multi-part message in MIME format.", "",
        "--" + boundary, 'Content-Type: text/plain; charset="utf-8"', "Content-Transfer-Encoding: 8bit", "",
        "\n".join(plain).rstrip("\n"), "",
        "--" + boundary, 'Content-Type: text/html; charset="utf-8"', "Content-Transfer-Encoding: 8bit", "",
        "\n".join(hparts), "",
        "--" + boundary + "--", ""]
    return "\n".join(hdr)


# ---------------------------------------------------------------- pdf
def _logo_png():
    from PIL import Image
    im = Image.new("RGB", (240, 60), (38, 84, 124))
    for x in range(0, 240, 12):
        for y in range(0, 60):
            if (x // 12 + y // 12) % 2 == 0:
                im.putpixel((x, y), (60, 110, 150))
    bio = io.BytesIO()
    im.save(bio, format="PNG", optimize=False)
    bio.seek(0)
    return bio


def render_pdf(doc):
    from fpdf import FPDF
    from fpdf.enums import TextMode
    ex = doc["extras"]
    pdf = FPDF(format="A4")
    pdf.set_creation_date(FIXED_DATE)
    pdf.set_producer("blind15v6 builder")
    pdf.set_title(doc["title"])
    pdf.add_font("DV", "", os.path.join(FONT_DIR, "DejaVuSans.ttf"))
    pdf.add_font("DV", "B", os.path.join(FONT_DIR, "DejaVuSans-Bold.ttf"))
    pdf.add_font("DVM", "", os.path.join(FONT_DIR, "DejaVuSansMono.ttf"))
    pdf.set_auto_page_break(True, 18)
    pdf.set_margins(18, 18, 18)
    pdf.add_page()
    W = pdf.w - 36
    if "logo" in ex:
        pdf.image(_logo_png(), x=18, y=10, w=40, h=10)
        pdf.set_y(24)
    pdf.set_font("DV", "B", 15)
    pdf.multi_cell(W, 8, doc["title"], new_x="LMARGIN", new_y="NEXT")
    pdf.ln(2)
    post = []  # post-processing requests for pypdf (form fields, ocg)

    def para(txt, size=10, font="DV"):
        pdf.set_font(font, "", size)
        pdf.multi_cell(W, size * 0.5 + 0.5, txt, new_x="LMARGIN", new_y="NEXT")
        pdf.ln(1.5)

    for b in doc["blocks"]:
        t = b[0]
        if t == "h":
            pdf.set_font("DV", "B", 11.5)
            pdf.ln(1)
            pdf.multi_cell(W, 6.5, b[1], new_x="LMARGIN", new_y="NEXT")
        elif t in ("p", "enc", "quote"):
            para(b[1])
        elif t == "ul":
            para("\n".join("\u2022 " + i for i in b[1]))
        elif t == "ol":
            para("\n".join("%d. %s" % (n + 1, i) for n, i in enumerate(b[1])))
        elif t == "table":
            para("\n".join(" | ".join(r) for r in b[1]), 9)
        elif t == "code":
            para(b[2], 8, "DVM")
        elif t == "hidden":
            tech, txt = b[1], b[2]
            if tech == "pdf-annotation":
                pdf.text_annotation(pdf.w - 30, pdf.get_y(), txt, w=6, h=6)
            elif tech == "pdf-form-field":
                post.append(("field", "comments_internal", txt, 2))
            elif tech == "pdf-ocg-hidden":
                post.append(("ocg", "Editorial layer", txt))
            elif tech == "pdf-render-mode-3":
                pdf.text_mode = TextMode.INVISIBLE
                para(txt)
                pdf.text_mode = TextMode.FILL
            elif tech == "pdf-white-text":
                pdf.set_text_color(255, 255, 255)
                para(txt)
                pdf.set_text_color(0, 0, 0)
            elif tech == "pdf-tiny-text":
                para(txt, 1)
            elif tech == "pdf-under-image":
                y0 = pdf.get_y()
                para(txt, 7)
                y1 = pdf.get_y()
                pdf.image(_logo_png(), x=18, y=y0 - 1, w=W, h=max(y1 - y0 + 2, 6))
            elif tech == "pdf-many-objects":
                pdf.set_font("DV", "", 3)
                x, y = 18.0, pdf.get_y() + 2
                for word in txt.split():
                    w = pdf.get_string_width(word + " ")
                    if x + w > 18 + W:
                        x, y = 18.0, y + 1.6
                    pdf.text(x, y, word)
                    x += w
                pdf.set_y(y + 3)
            else:
                raise ValueError(tech)
    if "footer-tiny" in ex:
        pdf.set_text_color(140, 140, 140)
        para(LEGIT["pdf_footer"], 6)
        pdf.set_text_color(0, 0, 0)
    if "annot" in ex:
        pdf.text_annotation(pdf.w - 24, 30, LEGIT["pdf_annot"], w=6, h=6)
    if "field" in ex:
        post.append(("field", "approval", LEGIT["pdf_field"], 0))
    if "field2" in ex:
        post.append(("field", "comments_internal", LEGIT["pdf_field2"], 2))
    if "ocg" in ex:
        post.append(("ocg", "Watermark", LEGIT["pdf_ocg"]))
    data = bytes(pdf.output())
    if post:
        data = _postprocess(data, post)
    return data


def _pdfstr(s):
    return s.replace("\\", "\\\\").replace("(", "\\(").replace(")", "\\)")


def _postprocess(data, post):
    import textwrap
    from pypdf import PdfReader, PdfWriter
    from pypdf.generic import (ArrayObject, BooleanObject, DecodedStreamObject, DictionaryObject,
                               FloatObject, NameObject, NumberObject, TextStringObject)
    w = PdfWriter(clone_from=PdfReader(io.BytesIO(data)))
    page = w.pages[0]
    fields, ocgs = [], []
    for n, req in enumerate(post):
        if req[0] == "field":
            _, name, value, flags = req
            y = 40 + 22 * n
            f = DictionaryObject({
                NameObject("/Type"): NameObject("/Annot"), NameObject("/Subtype"): NameObject("/Widget"),
                NameObject("/FT"): NameObject("/Tx"), NameObject("/T"): TextStringObject(name),
                NameObject("/V"): TextStringObject(value), NameObject("/DA"): TextStringObject("/Helv 0 Tf 0 g"),
                NameObject("/F"): NumberObject(4 | flags),
                NameObject("/Rect"): ArrayObject([FloatObject(300), FloatObject(y), FloatObject(560), FloatObject(y + 16)]),
            })
            ref = w._add_object(f)
            annots = page.get("/Annots")
            if annots is None:
                page[NameObject("/Annots")] = ArrayObject([ref])
            else:
                annots.get_object().append(ref)
            fields.append(ref)
        elif req[0] == "ocg":
            _, lname, text = req
            ocg = w._add_object(DictionaryObject({NameObject("/Type"): NameObject("/OCG"), NameObject("/Name"): TextStringObject(lname)}))
            ocgs.append(ocg)
            res = page["/Resources"].get_object()
            props = res.get("/Properties")
            if props is None:
                props = DictionaryObject()
                res[NameObject("/Properties")] = props
            tag = "/oc%d" % len(ocgs)
            props.get_object()[NameObject(tag)] = ocg
            fonts = res["/Font"].get_object()
            if "/FHelv" not in fonts:
                fonts[NameObject("/FHelv")] = w._add_object(DictionaryObject({
                    NameObject("/Type"): NameObject("/Font"), NameObject("/Subtype"): NameObject("/Type1"),
                    NameObject("/BaseFont"): NameObject("/Helvetica"), NameObject("/Encoding"): NameObject("/WinAnsiEncoding")}))
            lines = textwrap.wrap(text, 80)
            ops = ["q", "%s BDC" % ("/OC " + tag), "BT", "/FHelv 9 Tf", "11 TL", "1 0 0 1 60 120 Tm"]
            for ln in lines:
                ops.append("(%s) Tj T*" % _pdfstr(ln))
            ops += ["ET", "EMC", "Q"]
            st = DecodedStreamObject()
            st.set_data("\n".join(ops).encode("latin-1"))
            sref = w._add_object(st)
            cont = page["/Contents"]
            if isinstance(cont.get_object(), ArrayObject):
                cont.get_object().append(sref)
            else:
                page[NameObject("/Contents")] = ArrayObject([cont if hasattr(cont, "idnum") else page.raw_get("/Contents"), sref])
    if fields:
        w._root_object[NameObject("/AcroForm")] = DictionaryObject({
            NameObject("/Fields"): ArrayObject(fields), NameObject("/NeedAppearances"): BooleanObject(True)})
    if ocgs:
        w._root_object[NameObject("/OCProperties")] = DictionaryObject({
            NameObject("/OCGs"): ArrayObject(ocgs),
            NameObject("/D"): DictionaryObject({NameObject("/Order"): ArrayObject(ocgs), NameObject("/OFF"): ArrayObject(ocgs)})})
    bio = io.BytesIO()
    w.write(bio)
    return bio.getvalue()


RENDER = {"md": render_md, "txt": render_txt, "html": render_html, "eml": render_eml, "pdf": render_pdf}
