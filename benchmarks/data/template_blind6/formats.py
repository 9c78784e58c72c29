"""Cross-format exports: plain text, Markdown, PDF (fpdf2)."""
import datetime
import re
import zlib

from sitecfg import SITES

REF_PHRASES = ["the app", "member desk", "reception", "the travel shop", "notice board", "planning inspectorate",
               "consultative committee", "home fire safety visits", "open workshop", "the training page", "Lecture Theatre",
               "information desk", "noise line", "this register"]


def _wrap(text, width, seed, indent="", first=""):
    """Hard-wrap with occasional end-of-line hyphenation of long words (deterministic)."""
    lines, cur, empty, k = [], first, True, 0
    for w in text.split():
        sep = "" if empty else " "
        if empty or len(cur) + len(sep) + len(w) <= width:
            cur += sep + w
            empty = False
            continue
        k += 1
        room = width - len(cur) - 2
        if len(w) >= 9 and w.isalpha() and room >= 4 and len(w) - room >= 3 and (seed + k) % 2 == 0:
            lines.append(cur + " " + w[:room] + "-")
            cur = indent + w[room:]
        else:
            lines.append(cur)
            cur = indent + w
    lines.append(cur)
    return lines


def to_txt(doc, seed):
    cfg = SITES[doc["site"]]
    out = ["{} - {}".format(cfg["name"], "text export"), "Source: {}".format(doc["orig_url"]), "Date: {}".format(doc["date"]), ""]
    width = 72 if seed % 2 == 0 else 66
    for kind, val in doc["blocks"]:
        if kind == "h1":
            out += [val, "=" * min(len(val), width), ""]
        elif kind == "h2":
            out += [val, "-" * min(len(val), width), ""]
        elif kind == "p":
            out += _wrap(val, width, seed) + [""]
        elif kind == "li":
            out += _wrap(val, width, seed, indent="    ", first="  * ")
        elif kind == "table":
            widths = [max(len(r[c]) for r in val) for c in range(len(val[0]))]
            for ri, r in enumerate(val):
                out.append("  ".join(c.ljust(widths[j]) for j, c in enumerate(r)).rstrip())
                if ri == 0:
                    out.append("  ".join("-" * w for w in widths))
            out.append("")
    # blank line after list runs
    fixed = []
    for i, line in enumerate(out):
        fixed.append(line)
        if line.startswith(("  * ", "    ")) and i + 1 < len(out) and not out[i + 1].startswith(("  * ", "    ")) and out[i + 1] != "":
            fixed.append("")
    fixed += ["", "-- end of document --", ""]
    text = "\n".join(fixed)
    tmpl_words = len(" ".join(fixed[:4] + ["-- end of document --"]).split())
    return text, tmpl_words


def to_md(doc, seed):
    cfg = SITES[doc["site"]]
    fm = ["---", 'title: "{}"'.format(doc["title"].replace('"', "'")), "date: {}".format(doc["date"]),
          "canonical: {}".format(doc["orig_url"]), "site: {}".format(cfg["name"]), "layout: notice", "---", ""]
    out = []
    refs = []
    for kind, val in doc["blocks"]:
        if kind == "h1":
            out += ["# " + val, ""]
        elif kind == "h2":
            out += ["## " + val, ""]
        elif kind == "p":
            v = val
            for ph in REF_PHRASES:
                pat = r"\b" + re.escape(ph) + r"\b"
                if re.search(pat, v) and len(refs) < 3 and "[" not in v:
                    if ph not in refs:
                        refs.append(ph)
                    v = re.sub(pat, "[{}][{}]".format(ph, refs.index(ph) + 1), v, count=1)
                    break
            out += [v, ""]
        elif kind == "li":
            out.append("- " + val)
        elif kind == "table":
            out.append("| " + " | ".join(val[0]) + " |")
            out.append("|" + "|".join("---" for _ in val[0]) + "|")
            for r in val[1:]:
                out.append("| " + " | ".join(r) + " |")
            out.append("")
    fixed = []
    for i, line in enumerate(out):
        fixed.append(line)
        if line.startswith("- ") and i + 1 < len(out) and not out[i + 1].startswith("- ") and out[i + 1] != "":
            fixed.append("")
    tail = ["", "[Read the original notice][src]", ""]
    for n, ph in enumerate(refs, 1):
        tail.append("[{}]: https://{}/help/{} \"{}\"".format(n, cfg["host"], ph.lower().replace(" ", "-"), ph))
    tail.append("[src]: {}".format(doc["orig_url"]))
    text = "\n".join(fm + fixed + tail) + "\n"
    tmpl_words = len(" ".join(fm[1:6] + ["Read the original notice"]).split())
    return text, tmpl_words


def to_pdf(doc, seed, path):
    import warnings
    warnings.filterwarnings("ignore", category=UserWarning)
    from fpdf import FPDF
    from fpdf.enums import XPos, YPos
    cfg = SITES[doc["site"]]
    nwords = len(" ".join(doc["body_lines"]).split())
    fmt = "A5" if (seed % 2 == 0 or nwords > 160) else "A4"

    class Doc(FPDF):
        def header(self):
            self.set_font("Helvetica", "I", 8)
            self.cell(0, 5, "{}  |  {}".format(cfg["name"], doc["title"][:60]), new_x=XPos.LMARGIN, new_y=YPos.NEXT, align="L")
            self.line(self.l_margin, self.get_y(), self.w - self.r_margin, self.get_y())
            self.ln(3)

        def footer(self):
            self.set_y(-12)
            self.set_font("Helvetica", "", 8)
            self.cell(0, 5, "{}    Page {} of {{nb}}".format(cfg["host"], self.page_no()), align="C")

    pdf = Doc(format=fmt)
    pdf.set_creation_date(datetime.datetime(2026, 6, 1, 12, 0, 0, tzinfo=datetime.timezone.utc))
    pdf.set_producer("corpus-export")
    pdf.set_title(doc["title"])
    pdf.set_author(cfg["org"])
    pdf.set_auto_page_break(True, margin=16)
    lh = 6 if fmt == "A5" else 7
    size = 11 if fmt == "A5" else 12
    if fmt == "A4":
        pdf.set_margins(25, 20, 25)
    else:
        pdf.set_margins(18, 14, 18)
    pdf.add_page()
    in_list = False
    for kind, val in doc["blocks"]:
        if kind == "h1":
            pdf.set_font("Helvetica", "B", size + 4)
            pdf.multi_cell(0, lh + 2, val, new_x=XPos.LMARGIN, new_y=YPos.NEXT)
            pdf.ln(2)
        elif kind == "h2":
            pdf.ln(1)
            pdf.set_font("Helvetica", "B", size + 1)
            pdf.multi_cell(0, lh + 1, val, new_x=XPos.LMARGIN, new_y=YPos.NEXT)
            pdf.ln(1)
        elif kind == "p":
            pdf.set_font("Helvetica", "", size)
            pdf.multi_cell(0, lh, val, align="J", new_x=XPos.LMARGIN, new_y=YPos.NEXT)
            pdf.ln(2)
        elif kind == "li":
            pdf.set_font("Helvetica", "", size)
            pdf.set_x(pdf.l_margin + 4)
            pdf.multi_cell(0, lh, "- " + val, new_x=XPos.LMARGIN, new_y=YPos.NEXT)
        elif kind == "table":
            pdf.set_font("Helvetica", "", size - 1)
            with pdf.table(line_height=lh, first_row_as_headings=True) as t:
                for r in val:
                    row = t.row()
                    for c in r:
                        row.cell(c)
            pdf.ln(2)
    pdf.output(path)
    n = pdf.page_no()
    hdr = len("{}  |  {}".format(cfg["name"], doc["title"][:60]).split())
    ftr = len("{}    Page 1 of 1".format(cfg["host"]).split())
    return n, n * (hdr + ftr)
