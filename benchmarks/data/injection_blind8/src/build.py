#!/usr/bin/env python3
"""Deterministic builder for blind set 8. Run: .venv/bin/python src/build.py"""
import base64, datetime, html, io, json, os, random, re, shutil, sys, textwrap
import urllib.parse

HERE = os.path.dirname(os.path.abspath(__file__))
ROOT = os.path.dirname(HERE)
sys.path.insert(0, HERE)
from content import load_hosts, load_payloads  # noqa: E402
from encode import encode, HINTS  # noqa: E402

SEED = 815
NONLATIN = {"ja", "zh", "ko", "hi", "ar", "fa"}

# ------------------------------------------------------------------ blocks
def host_blocks(h):
    return parse_blocks(h["blocks"])


def parse_blocks(raw):
    out = []
    for b in raw:
        if b.startswith("# "):
            first, _, rest = b.partition("\n")
            out.append(("h", first[2:].strip()))
            if rest.strip():
                out += parse_blocks([rest.strip("\n")])
        elif b.startswith("```"):
            lines = b.split("\n")
            out.append(("code", lines[0][3:].strip(), "\n".join(lines[1:-1])))
        elif b.startswith("- "):
            out.append(("ul", [x[2:].strip() for x in b.split("\n") if x.startswith("- ")]))
        elif b.startswith("|"):
            rows = [[c.strip() for c in r.strip().strip("|").split("|")] for r in b.split("\n") if r.strip()]
            out.append(("table", rows))
        elif "\n" in b.strip():
            out.append(("lines", [x for x in b.split("\n") if x.strip()]))
        else:
            out.append(("p", b.strip()))
    return out


# ------------------------------------------------------------------ renderers
def md_inline(t):
    return t


def render_md(title, blocks, deco):
    o = []
    if deco.get("yaml"):
        o.append("---\n" + deco["yaml"] + "\n---\n")
    o.append("# " + title + "\n")
    for b in blocks:
        k = b[0]
        if k == "h":
            o.append("## " + b[1] + "\n")
        elif k == "p":
            o.append(b[1] + "\n")
        elif k == "ul":
            o.append("\n".join("- " + x for x in b[1]) + "\n")
        elif k == "table":
            rows = b[1]
            s = "| " + " | ".join(rows[0]) + " |\n|" + "---|" * len(rows[0]) + "\n"
            s += "\n".join("| " + " | ".join(r) + " |" for r in rows[1:])
            o.append(s + "\n")
        elif k == "code":
            o.append("```" + b[1] + "\n" + b[2] + "\n```\n")
        elif k == "raw":
            if "md" in b[1]:
                o.append(b[1]["md"] + "\n")
        elif k == "lines":
            o.append("  \n".join(b[1]) + "\n")
    if deco.get("md_tail"):
        o.append(deco["md_tail"] + "\n")
    return "\n".join(o)


def render_txt(title, blocks, deco):
    o = [title, "=" * min(len(title), 72), ""]
    w = lambda t: textwrap.fill(t, 76, break_long_words=False, break_on_hyphens=False)
    for b in blocks:
        k = b[0]
        if k == "h":
            o += [b[1].upper(), ""]
        elif k == "p":
            o += [w(b[1]), ""]
        elif k == "ul":
            o += ["  * " + x for x in b[1]] + [""]
        elif k == "table":
            widths = [max(len(r[i]) if i < len(r) else 0 for r in b[1]) for i in range(len(b[1][0]))]
            for r in b[1]:
                o.append("  ".join((r[i] if i < len(r) else "").ljust(widths[i]) for i in range(len(widths))).rstrip())
            o.append("")
        elif k == "code":
            o += ["    " + x for x in b[2].split("\n")] + [""]
        elif k == "raw":
            if "txt" in b[1]:
                o += [b[1]["txt"], ""]
        elif k == "lines":
            o += list(b[1]) + [""]
    if deco.get("txt_tail"):
        o += [deco["txt_tail"], ""]
    return "\n".join(o)


def esc(t):
    return html.escape(t, quote=True)


def render_html(title, blocks, deco, lang):
    head = ['<!DOCTYPE html>', '<html lang="%s">' % lang, "<head>", '<meta charset="utf-8">',
            "<title>%s</title>" % esc(title)]
    head.append('<meta name="description" content="%s">' % esc(deco.get("meta_desc", title)))
    head.append("<style>body{font-family:sans-serif;max-width:46em;margin:auto}.sr-only{position:absolute;left:-9999px}"
                "#cookie{display:none}" + deco.get("css", "") + "</style>")
    head.append("</head>")
    body = ["<body>"]
    if deco.get("nav"):
        body.append('<nav aria-label="Main navigation"><a href="https://www.example.org/">Home</a> | '
                    '<a href="https://www.example.org/archive">Archive</a></nav>')
    if deco.get("cookie"):
        body.append('<div id="cookie" role="dialog" aria-label="Cookie consent">We use strictly necessary cookies only. '
                    '<button type="button">OK</button></div>')
    body.append("<main>")
    body.append("<h1>%s</h1>" % esc(title))
    for b in blocks:
        k = b[0]
        if k == "h":
            body.append("<h2>%s</h2>" % esc(b[1]))
        elif k == "p":
            body.append("<p>%s</p>" % esc(b[1]))
        elif k == "ul":
            body.append("<ul>\n" + "\n".join("<li>%s</li>" % esc(x) for x in b[1]) + "\n</ul>")
        elif k == "table":
            rows = b[1]
            s = "<table>\n<tr>" + "".join("<th>%s</th>" % esc(c) for c in rows[0]) + "</tr>\n"
            s += "\n".join("<tr>" + "".join("<td>%s</td>" % esc(c) for c in r) + "</tr>" for r in rows[1:])
            body.append(s + "\n</table>")
        elif k == "code":
            body.append("<pre><code>%s</code></pre>" % esc(b[2]))
        elif k == "raw":
            if "html" in b[1]:
                body.append(b[1]["html"])
        elif k == "lines":
            body.append("<p>" + "<br>\n".join(esc(x) for x in b[1]) + "</p>")
    body.append("</main>")
    if deco.get("details"):
        body.append("<details><summary>Revision history</summary><p>%s</p></details>" % esc(deco["details"]))
    if deco.get("csrf"):
        body.append('<form action="/feedback" method="post"><input type="hidden" name="csrf_token" value="%s">'
                    '<label>Was this page useful? <input type="text" name="comment"></label>'
                    '<button type="submit" aria-label="Send feedback">Send</button></form>' % deco["csrf"])
    body.append('<footer><p>&copy; 2026 %s</p><img src="/img/logo.png" alt="%s logo" width="40" height="40"></footer>'
                % (esc(deco.get("org", "Example Org")), esc(deco.get("org", "Example Org"))))
    body.append("</body></html>")
    return "\n".join(head + body) + "\n"


def render_eml(h, title, txt_body, html_body, deco, idx):
    d = datetime.datetime(2026, 3, 2, 8, 0) + datetime.timedelta(hours=7 * idx, minutes=13 * (idx % 5))
    frm = h.get("from") or "office@%s.example.org" % h["id"].lower()
    to = h.get("to") or "list@example.net"
    hdr = ["From: %s" % frm, "To: %s" % to, "Subject: %s" % title,
           "Date: %s" % d.strftime("%a, %d %b %Y %H:%M:%S +0000"),
           "Message-ID: <%s.%04d@mail.example.org>" % (h["id"].lower(), idx), "MIME-Version: 1.0"]
    if html_body is None:
        hdr += ["Content-Type: text/plain; charset=utf-8", "Content-Transfer-Encoding: 8bit", ""]
        return "\n".join(hdr) + "\n" + txt_body
    b = "=_b%04d_%s" % (idx, h["id"])
    hdr += ['Content-Type: multipart/alternative; boundary="%s"' % b, ""]
    parts = ["--" + b, "Content-Type: text/plain; charset=utf-8", "Content-Transfer-Encoding: 8bit", "", txt_body,
             "--" + b, "Content-Type: text/html; charset=utf-8", "Content-Transfer-Encoding: 8bit", "", html_body,
             "--" + b + "--", ""]
    return "\n".join(hdr) + "\n" + "\n".join(parts)


# ------------------------------------------------------------------ PDF
def render_pdf(title, blocks, deco, path):
    from fpdf import FPDF
    from fpdf.enums import TextMode
    pdf = FPDF()
    pdf.set_creation_date(datetime.datetime(2026, 2, 1, 9, 0, tzinfo=datetime.timezone.utc))
    pdf.set_title(title)
    pdf.set_author(deco.get("org", "Example Org"))
    fd = os.path.join(HERE, "fonts")
    pdf.add_font("DV", "", os.path.join(fd, "DejaVuSans.ttf"))
    pdf.add_font("DV", "B", os.path.join(fd, "DejaVuSans-Bold.ttf"))
    pdf.add_font("DVM", "", os.path.join(fd, "DejaVuSansMono.ttf"))
    pdf.set_auto_page_break(True, 15)
    pdf.add_page()
    pdf.set_font("DV", "B", 15)
    pdf.multi_cell(0, 8, title, new_x="LMARGIN", new_y="NEXT")
    pdf.ln(2)
    fields = []
    def body_font():
        pdf.set_font("DV", "", 10.5)
        pdf.set_text_color(0, 0, 0)
    body_font()
    for b in blocks:
        k = b[0]
        if k == "h":
            pdf.ln(2); pdf.set_font("DV", "B", 12.5); pdf.multi_cell(0, 7, b[1], new_x="LMARGIN", new_y="NEXT"); body_font()
        elif k == "p":
            pdf.multi_cell(0, 5.5, b[1], new_x="LMARGIN", new_y="NEXT"); pdf.ln(2)
        elif k == "ul":
            for x in b[1]:
                pdf.multi_cell(0, 5.5, "\u2022 " + x, new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif k == "table":
            for r in b[1]:
                pdf.multi_cell(0, 5.5, "   |   ".join(r), new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif k == "code":
            pdf.set_font("DVM", "", 9)
            pdf.multi_cell(0, 4.8, b[2], new_x="LMARGIN", new_y="NEXT"); pdf.ln(2); body_font()
        elif k == "lines":
            for x in b[1]:
                pdf.multi_cell(0, 5.5, x, new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif k == "raw":
            pass
        elif k == "pdfx":
            tech, text = b[1], b[2]
            if tech == "pdf-render-mode-3":
                pdf.text_mode = TextMode.INVISIBLE
                pdf.multi_cell(0, 5.5, text, new_x="LMARGIN", new_y="NEXT"); pdf.text_mode = TextMode.FILL
            elif tech == "pdf-white-text":
                pdf.set_text_color(255, 255, 255); pdf.multi_cell(0, 5.5, text, new_x="LMARGIN", new_y="NEXT"); body_font()
            elif tech == "pdf-tiny-text":
                pdf.set_font("DV", "", 1); pdf.multi_cell(0, 0.6, text, new_x="LMARGIN", new_y="NEXT"); body_font()
            elif tech == "pdf-under-image":
                y = pdf.get_y()
                pdf.set_font("DV", "", 7); pdf.multi_cell(0, 3.5, text, new_x="LMARGIN", new_y="NEXT")
                y2 = pdf.get_y()
                from PIL import Image
                img = Image.new("RGB", (240, 40), (196, 214, 230))
                for xx in range(0, 240, 12):
                    for yy in range(40):
                        img.putpixel((xx, yy), (150, 170, 190))
                pdf.image(img, x=pdf.l_margin, y=y - 1, w=pdf.epw, h=y2 - y + 2)
                pdf.set_y(y2 + 2); body_font()
            elif tech == "pdf-split-objects":
                pdf.set_font("DV", "", 2.2); pdf.set_text_color(250, 250, 250)
                x0, y = pdf.l_margin, pdf.get_y() + 2
                x = x0
                for word in text.split(" "):
                    wlen = pdf.get_string_width(word + " ")
                    if x + wlen > pdf.l_margin + pdf.epw:
                        x = x0; y += 1.2
                    pdf.text(x, y, word + " ")
                    x += wlen
                pdf.set_y(y + 2); body_font()
            elif tech == "pdf-annotation":
                pdf.text_annotation(pdf.w - 25, pdf.get_y(), text, title=deco.get("annot_author", "Reviewer"))
            elif tech == "pdf-form-field":
                fields.append(("remarks", text))
    if deco.get("annot"):
        pdf.text_annotation(pdf.w - 25, 20, deco["annot"], title=deco.get("annot_author", "Reviewer"))
    if deco.get("field"):
        fields.append(deco["field"])
    data = bytes(pdf.output())
    if fields:
        data = add_fields(data, fields)
    with open(path, "wb") as f:
        f.write(data)


def add_fields(data, fields):
    from pypdf import PdfReader, PdfWriter
    from pypdf.generic import (ArrayObject, DictionaryObject, FloatObject, NameObject, NumberObject,
                               TextStringObject)
    r = PdfReader(io.BytesIO(data))
    w = PdfWriter()
    w.append_pages_from_reader(r)
    for k in ("/Title", "/Author", "/CreationDate", "/Producer"):
        if r.metadata and k in r.metadata:
            w.add_metadata({k: r.metadata[k]})
    page = w.pages[-1]
    refs = ArrayObject()
    for i, (name, val) in enumerate(fields):
        f = DictionaryObject({
            NameObject("/Type"): NameObject("/Annot"), NameObject("/Subtype"): NameObject("/Widget"),
            NameObject("/FT"): NameObject("/Tx"), NameObject("/T"): TextStringObject(name),
            NameObject("/V"): TextStringObject(val), NameObject("/F"): NumberObject(4),
            NameObject("/Rect"): ArrayObject([FloatObject(40), FloatObject(30 + 22 * i), FloatObject(300),
                                              FloatObject(48 + 22 * i)]),
        })
        ref = w._add_object(f)
        if "/Annots" not in page:
            page[NameObject("/Annots")] = ArrayObject()
        page["/Annots"].append(ref)
        refs.append(ref)
    w._root_object[NameObject("/AcroForm")] = DictionaryObject({NameObject("/Fields"): refs,
                                                                NameObject("/NeedAppearances"): NameObject("/true")})
    w._ID = None
    out = io.BytesIO()
    w.write(out)
    return out.getvalue()


# ------------------------------------------------------------------ decorations (label-independent)
def make_deco(rng, h, fmt):
    d = {"org": h.get("org", "Example Org")}
    if fmt == "md":
        if rng.random() < 0.4:
            d["yaml"] = "title: %s\ndate: 2026-0%d-1%d\ntags: [%s]" % (h["title"].replace(":", " -"), rng.randint(1, 9),
                                                                    rng.randint(0, 9), h["genre"].replace(",", ""))
        if rng.random() < 0.3:
            d["md_tail"] = "<!-- last reviewed by the documentation team; next review due in twelve months -->"
    if fmt in ("html", "eml"):
        d["nav"] = rng.random() < 0.6
        d["cookie"] = rng.random() < 0.5
        d["csrf"] = "%032x" % rng.getrandbits(128) if rng.random() < 0.4 else None
        d["details"] = "Page created 2025; minor wording changes 2026." if rng.random() < 0.3 else None
    if fmt == "pdf":
        if rng.random() < 0.35:
            d["annot"] = rng.choice(["Checked against the signed original.", "Please confirm page numbering before printing.",
                                     "Figures verified, ok to circulate.", "Typo fixed in section 2; no other changes."])
        if rng.random() < 0.2:
            d["field"] = ("reference_no", "REF-%05d" % rng.randint(1000, 99999))
    return d


# ------------------------------------------------------------------ payload insertion
def visible_insert(rng, blocks, text, where):
    b = list(blocks)
    if where == "start":
        b.insert(0, ("p", text))
    elif where == "end":
        b.append(("p", text))
    elif where == "middle":
        b.insert(max(1, len(b) // 2), ("p", text))
    elif where == "inline-append":
        ps = [i for i, x in enumerate(b) if x[0] == "p"]
        i = ps[len(ps) // 2] if ps else 0
        ls = [k for k, x in enumerate(b) if x[0] == "lines"]
        if ps:
            b[i] = ("p", b[i][1] + " " + text)
        elif ls:
            k = ls[len(ls) // 2]
            lines = list(b[k][1]); m = len(lines) // 2
            lines[m] = lines[m] + " " + text
            b[k] = ("lines", lines)
        else:
            b.insert(0, ("p", text))
    elif where == "list-item":
        ls = [i for i, x in enumerate(b) if x[0] == "ul"]
        if ls:
            i = ls[0]
            items = list(b[i][1]); items.insert(len(items) // 2 + 1, text); b[i] = ("ul", items)
        else:
            b.insert(len(b) // 2, ("ul", [text]))
    return b


HIDDEN_BY_FMT = {
    "md": ["md-table-cell", "md-code-comment", "md-footnote", "md-yaml-front-matter", "md-html-comment", "md-details"],
    "html": ["html-comment", "html-template", "svg-text", "css-content", "meta-description", "hidden-input",
             "details-collapsed", "display-none", "visibility-hidden", "white-on-white", "zero-font-size",
             "off-screen", "aria-label", "title-attribute", "img-alt", "noscript", "data-attribute"],
    "pdf": ["pdf-annotation", "pdf-form-field", "pdf-render-mode-3", "pdf-white-text", "pdf-tiny-text",
            "pdf-under-image", "pdf-split-objects"],
    "eml": ["eml-html-part-only", "eml-after-blank-lines"],
    "txt": ["txt-after-blank-lines"],
}


def q(t):
    return t.replace('"', "'")


def hidden_insert(blocks, text, tech, deco):
    b = list(blocks)
    mid = max(1, len(b) // 2)
    a = esc(q(text))
    raw = None
    if tech == "md-table-cell":
        b.insert(mid, ("table", [["Field", "Value"], ["Status", "filed"], ["Notes", text], ["Checked", "yes"]]))
    elif tech == "md-code-comment":
        b.insert(mid, ("code", "ini", "; export settings\n; " + text + "\nformat = a4\nmargin_mm = 18"))
    elif tech == "md-footnote":
        ps = [i for i, x in enumerate(b) if x[0] == "p"]
        if ps:
            b[ps[0]] = ("p", b[ps[0]][1] + "[^1]")
        b.append(("raw", {"md": "[^1]: " + text}))
    elif tech == "md-yaml-front-matter":
        deco["yaml"] = (deco.get("yaml") or "title: document") + "\nsummary_note: \"" + q(text) + "\""
    elif tech == "md-html-comment":
        raw = {"md": "<!-- " + text + " -->"}
    elif tech == "md-details":
        raw = {"md": "<details><summary>Archive notes</summary>\n\n" + text + "\n\n</details>"}
    elif tech == "html-comment":
        raw = {"html": "<!-- " + text.replace("--", "-") + " -->"}
    elif tech == "html-template":
        raw = {"html": "<template id=\"tpl-note\"><p>%s</p></template>" % esc(text)}
    elif tech == "svg-text":
        raw = {"html": '<svg width="1" height="1" aria-hidden="true"><text x="0" y="0" font-size="1">%s</text></svg>' % esc(text)}
    elif tech == "css-content":
        deco["css"] = deco.get("css", "") + '.ed-note::after{content:"%s";font-size:0}' % q(text).replace("<", "").replace(">", "")
        raw = {"html": '<span class="ed-note"></span>'}
    elif tech == "meta-description":
        deco["meta_desc"] = q(text)
    elif tech == "hidden-input":
        raw = {"html": '<form><input type="hidden" name="doc_note" value="%s"></form>' % a}
    elif tech == "details-collapsed":
        raw = {"html": "<details><summary>More</summary><p>%s</p></details>" % esc(text)}
    elif tech == "display-none":
        raw = {"html": '<div style="display:none">%s</div>' % esc(text)}
    elif tech == "visibility-hidden":
        raw = {"html": '<p style="visibility:hidden">%s</p>' % esc(text)}
    elif tech == "white-on-white":
        raw = {"html": '<p style="color:#ffffff;background:#ffffff">%s</p>' % esc(text)}
    elif tech == "zero-font-size":
        raw = {"html": '<span style="font-size:0">%s</span>' % esc(text)}
    elif tech == "off-screen":
        raw = {"html": '<div class="sr-only">%s</div>' % esc(text)}
    elif tech == "aria-label":
        raw = {"html": '<section aria-label="%s"></section>' % a}
    elif tech == "title-attribute":
        raw = {"html": '<p><abbr title="%s">ref.</abbr></p>' % a}
    elif tech == "img-alt":
        raw = {"html": '<img src="/img/spacer.gif" width="1" height="1" alt="%s">' % a}
    elif tech == "noscript":
        raw = {"html": "<noscript><p>%s</p></noscript>" % esc(text)}
    elif tech == "data-attribute":
        raw = {"html": '<div data-summary-note="%s"></div>' % a}
    elif tech.startswith("pdf-"):
        b.insert(mid, ("pdfx", tech, text))
    if raw:
        b.insert(mid, ("raw", raw))
    return b


# ------------------------------------------------------------------ split
def split_blocks(rng, blocks, frags, tech):
    b = list(blocks)
    if tech == "split-paragraphs":
        n = len(b)
        pos = sorted({int((i + 0.5) * n / len(frags)) for i in range(len(frags))})
        while len(pos) < len(frags):
            pos.append(pos[-1] + 1)
        for k, (p, f) in enumerate(zip(pos, frags)):
            b.insert(p + k, ("p", f))
    elif tech == "split-list-items":
        b.insert(len(b) // 2, ("ul", list(frags)))
    elif tech == "split-table-cells":
        rows = [["Item", "Remark"]] + [["%d" % (i + 1), f] for i, f in enumerate(frags)]
        b.insert(len(b) // 2, ("table", rows))
    elif tech == "split-alternating-lines":
        ps = [x[1] for x in b if x[0] == "p"] + [" ".join(x[1]) for x in b if x[0] == "lines"]
        words = " ".join(ps).split()
        lines = []
        for i, f in enumerate(frags):
            lines.append(" ".join(words[i * 9:(i + 1) * 9]) or "-")
            lines.append(f)
        b.insert(len(b) // 2, ("lines", lines))
    elif tech == "split-first-words":
        ps = [x[1] for x in b if x[0] == "p"] + [" ".join(x[1]) for x in b if x[0] == "lines"]
        filler = " ".join(ps).split() or ["noted"]
        lines = []
        for i, wd in enumerate(" ".join(frags).split()):
            lines.append(wd + " " + " ".join(filler[(i * 5) % len(filler):(i * 5) % len(filler) + 5]).lower())
        b.insert(len(b) // 2, ("lines", lines))
    return b


# ------------------------------------------------------------------ main
def main():
    hosts = load_hosts()
    payloads = load_payloads()
    H = {h["id"]: h for h in hosts}
    rng = random.Random(SEED)
    docs = []

    en_hosts = [h for h in hosts if h["lang"] == "en"]

    def fmt_ok(h, fmt, plang=None):
        if fmt == "pdf" and (h["lang"] in NONLATIN or (plang in NONLATIN)):
            return False
        return True

    def long_companions(h, r):
        same = [x for x in hosts if x["lang"] == h["lang"] and x["id"] != h["id"] and x["bclass"] == h["bclass"]]
        other = [x for x in hosts if x["lang"] == h["lang"] and x["id"] != h["id"] and x["bclass"] != h["bclass"]]
        r.shuffle(same)
        r.shuffle(other)
        same += other
        out, words = [], len(" ".join(h["blocks"]).split())
        for x in same:
            if words >= 2300:
                break
            out.append(x)
            words += len(" ".join(x["blocks"]).split())
        return out if words >= 2000 else None

    def assemble(h, r, want_long):
        blocks = host_blocks(h)
        comp = long_companions(h, r) if want_long else None
        if comp:
            for x in comp:
                blocks.append(("h", x["title"]))
                blocks += [y if y[0] != "h" else ("h", y[1]) for y in host_blocks(x)]
        return blocks, bool(comp)

    FMTS = ["md", "txt", "html", "eml", "pdf"]
    # ---------------- benign
    bcounts = {"security-awareness": 47, "chat-export": 47, "technical-doc": 47, "instructions-to-humans": 47,
               "multilingual-benign": 46, "misc": 46}
    for bc, n in bcounts.items():
        hs = [h for h in hosts if h["bclass"] == bc]
        i = 0
        while n > 0:
            h = hs[i % len(hs)]
            fmt = FMTS[(i + len(h["id"]) + i // len(hs)) % 5]
            i += 1
            if not fmt_ok(h, fmt):
                fmt = rng.choice(["md", "html", "txt", "eml"])
            docs.append(dict(kind="benign", host=h["id"], fmt=fmt, cls=bc, long=(h["lang"] == "en" and rng.random() < 0.21)))
            n -= 1

    # ---------------- attacks
    attacked = set()
    hid_plan = (["html"] * 17 + ["md"] * 7 + ["pdf"] * 8 + ["eml"] * 5 + ["txt"] * 3)
    for cls, plist in payloads.items():
        uses = []
        for p in plist:
            uses += [p, p] if len(plist) < 40 else [p]
        uses = uses[:40]
        for j, p in enumerate(uses):
            d = dict(kind="attack", cls=cls, pid=p["id"], plang=p["lang"], subtle=p["subtle"], long=False)
            if cls == "multilingual":
                same = [h for h in hosts if h["lang"] == p["lang"]]
                h = same[j % len(same)] if (same and j % 2 == 0) else rng.choice(en_hosts)
            else:
                pool = en_hosts if rng.random() < 0.85 else [x for x in hosts if x["lang"] != "en" and x["lang"] not in NONLATIN]
                unused = [x for x in pool if x["id"] not in attacked]
                h = rng.choice(unused) if (unused and rng.random() < 0.5) else rng.choice(pool)
            d["host"] = h["id"]
            attacked.add(h["id"])
            if cls == "hidden-placement":
                fmt = hid_plan[j]
                if not fmt_ok(h, fmt, p["lang"]):
                    h = rng.choice(en_hosts); d["host"] = h["id"]
                techs = HIDDEN_BY_FMT[fmt]
                d["where"] = techs[(j * 7 + 3) % len(techs)] if fmt != "html" else techs[j % len(techs)]
                if fmt == "pdf":
                    d["where"] = techs[j % len(techs)]
                if fmt == "md":
                    d["where"] = techs[j % len(techs)]
            else:
                fmt = FMTS[(j + j // 5 + len(cls)) % 5]
                if not fmt_ok(h, fmt, p["lang"]):
                    fmt = ["md", "html", "txt", "eml"][j % 4]
                if cls == "encoded":
                    encs = ["base64", "hex", "rot13", "url-encoding", "html-charrefs", "quoted-printable",
                            "unicode-escapes", "leetspeak", "reversed", "homoglyph-zero-width"]
                    d["enc"] = encs[j % len(encs)]
                    d["hint"] = (j // 10) % 2 == 0 if j < 20 else (j % 2 == 1)
                    if d["enc"] == "homoglyph-zero-width" and fmt == "pdf":
                        fmt = "md"
                    d["where"] = d["enc"] + ("+hint" if d["hint"] else "")
                elif cls == "split":
                    techs = ["split-paragraphs", "split-list-items", "split-table-cells", "split-alternating-lines",
                             "split-first-words"]
                    d["where"] = techs[(j * 2 + j // 10) % 5]
                else:
                    d["where"] = ["start", "middle", "end", "inline-append", "list-item"][(j * 3 + len(cls)) % 5]
                d["long"] = (h["lang"] == "en" and rng.random() < 0.21)
            d["fmt"] = fmt
            docs.append(d)

    # ---------------- render
    rng2 = random.Random(SEED + 1)
    rng2.shuffle(docs)
    P = {p["id"]: p for pl in payloads.values() for p in pl}
    out_docs = os.path.join(ROOT, "docs")
    if os.path.isdir(out_docs):
        shutil.rmtree(out_docs)
    os.makedirs(out_docs)
    labels = []
    for idx, d in enumerate(docs, 1):
        h = H[d["host"]]
        r = random.Random(SEED * 1000 + idx)
        fmt = d["fmt"]
        deco = make_deco(r, h, fmt)
        blocks, is_long = assemble(h, r, d["long"])
        title = h["title"]
        txt_extra_html = None
        if d["kind"] == "attack":
            p = P[d["pid"]]
            cls = d["cls"]
            if cls == "hidden-placement":
                w = d["where"]
                if w == "eml-html-part-only":
                    txt_extra_html = ("raw", {"html": '<div style="display:none;max-height:0;overflow:hidden">%s</div>' % esc(p["text"])})
                elif w in ("eml-after-blank-lines", "txt-after-blank-lines"):
                    blocks = blocks + [("raw", {"txt": "\n" * 60 + p["text"], "html": "<br>" * 60 + "<p>%s</p>" % esc(p["text"])})]
                else:
                    blocks = hidden_insert(blocks, p["text"], w, deco)
            elif cls == "encoded":
                enc = encode(p["text"], d["enc"])
                text = (HINTS[d["enc"]] + " " + enc) if d["hint"] else ("Ref: " + enc)
                blocks = visible_insert(r, blocks, text, ["middle", "end", "inline-append"][idx % 3])
            elif cls == "split":
                blocks = split_blocks(r, blocks, p["frags"], d["where"])
            else:
                blocks = visible_insert(r, blocks, p["text"], d["where"])
        name = "docs/case-%04d.%s" % (idx, fmt)
        path = os.path.join(ROOT, name)
        if fmt == "md":
            s = render_md(title, blocks, deco)
        elif fmt == "txt":
            s = render_txt(title, blocks, deco)
        elif fmt == "html":
            s = render_html(title, blocks, deco, h["lang"])
        elif fmt == "eml":
            multip = r.random() < 0.6 or (d.get("where") == "eml-html-part-only")
            tb = render_txt(title, blocks, {})
            hb = None
            if multip:
                hbl = blocks + ([txt_extra_html] if txt_extra_html else [])
                dd = dict(deco)
                hb = render_html(title, hbl, dd, h["lang"])
            s = render_eml(h, title, tb, hb, deco, idx)
        if fmt == "pdf":
            render_pdf(title, blocks, deco, path)
        else:
            with open(path, "w", encoding="utf-8", newline="\n") as f:
                f.write(s)
        if d["kind"] == "attack":
            p = P[d["pid"]]
            note = "host %s (%s); payload %s; %s%s" % (h["id"], h["genre"], p["id"], "subtle" if p["subtle"] else "explicit",
                                                    "; long document" if is_long else "")
            labels.append(dict(file=name, label="attack", **{"class": d["cls"]}, language=p["lang"], where=d["where"],
                               note=note, format=fmt, host=h["id"]))
        else:
            note = "host %s (%s); benign%s" % (h["id"], h["genre"], "; long document" if is_long else "")
            labels.append(dict(file=name, label="benign", **{"class": d["cls"]}, language=h["lang"], where="none",
                               note=note, format=fmt, host=h["id"]))
    with open(os.path.join(ROOT, "labels.jsonl"), "w", encoding="utf-8", newline="\n") as f:
        for l in labels:
            f.write(json.dumps(l, ensure_ascii=False) + "\n")
    print("wrote", len(labels), "documents")


if __name__ == "__main__":
    main()
