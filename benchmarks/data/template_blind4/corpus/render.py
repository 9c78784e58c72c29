"""Non-HTML renderers: plain-text export, Markdown with front matter, PDF with running header/footer."""
import datetime
import textwrap

from fpdf import FPDF

from .common import words


def _wrap(text, width=72, indent=""):
    return textwrap.wrap(text, width=width, initial_indent=indent, subsequent_indent=" " * len(indent),
                         break_long_words=False, break_on_hyphens=False)


def render_txt(blocks, site, url, date):
    out = [f"{site['name']} - plain text export", f"Source: {url}", f"Exported: {date}", ""]
    for b in blocks:
        kind = b[0]
        if kind == "title":
            out += [b[1], "=" * len(b[1]), ""]
        elif kind == "h":
            out += [b[1], "-" * len(b[1]), ""]
        elif kind == "p":
            out += _wrap(" ".join(b[1])) + [""]
        elif kind == "ul":
            for item in b[1]:
                out += _wrap(item, indent="  * ")
            out.append("")
        elif kind == "table":
            rows = b[1]
            widths = [max(len(row[i]) for row in rows) for i in range(len(rows[0]))]
            for j, row in enumerate(rows):
                out.append("  ".join(c.ljust(widths[i]) for i, c in enumerate(row)).rstrip())
                if j == 0:
                    out.append("  ".join("~" * w for w in widths))
            out.append("")
    out.append("-- end of export --")
    return "\n".join(out) + "\n"


def render_md(blocks, site, url, date, tags):
    title = blocks[0][1]
    out = ["---", f'title: "{title}"', f"source: {url}", f"site: {site['name']}", f"date: {date}",
           "tags: [" + ", ".join(tags) + "]", "---", ""]
    for b in blocks:
        kind = b[0]
        if kind == "title":
            out += [f"# {b[1]}", ""]
        elif kind == "h":
            out += [f"## {b[1]}", ""]
        elif kind == "p":
            out += [" ".join(b[1]), ""]
        elif kind == "ul":
            out += [f"- {x}" for x in b[1]] + [""]
        elif kind == "table":
            rows = b[1]
            out.append("| " + " | ".join(rows[0]) + " |")
            out.append("|" + "|".join(" --- " for _ in rows[0]) + "|")
            for row in rows[1:]:
                out.append("| " + " | ".join(row) + " |")
            out.append("")
    return "\n".join(out).rstrip("\n") + "\n"


class _Doc(FPDF):
    def __init__(self, head, foot):
        super().__init__(format="A4")
        self._head = head
        self._foot = foot

    def header(self):
        self.set_font("Helvetica", "I", 8)
        self.cell(0, 6, self._head, new_x="LMARGIN", new_y="NEXT")
        self.ln(4)

    def footer(self):
        self.set_y(-15)
        self.set_font("Helvetica", "I", 8)
        self.cell(0, 6, f"{self._foot} - page {self.page_no()} of {{nb}}", align="C")


def render_pdf(blocks, site, url, date):
    """Returns (bytes, pages, header_footer_words)."""
    title = blocks[0][1]
    head = f"{site['name']} | {title}"
    foot = f"{site['host']}"
    pdf = _Doc(head, foot)
    pdf.set_creation_date(datetime.datetime(2026, 3, 1, 12, 0, 0, tzinfo=datetime.timezone.utc))
    pdf.set_producer("corpus generator")
    pdf.set_title(title)
    pdf.set_margins(25, 20, 25)
    pdf.set_auto_page_break(True, margin=22)
    pdf.add_page()
    w = pdf.epw
    for b in blocks:
        kind = b[0]
        if kind == "title":
            pdf.set_font("Helvetica", "B", 18)
            pdf.multi_cell(w, 9, b[1], new_x="LMARGIN", new_y="NEXT")
            pdf.ln(4)
        elif kind == "h":
            pdf.ln(2)
            pdf.set_font("Helvetica", "B", 14)
            pdf.multi_cell(w, 8, b[1], new_x="LMARGIN", new_y="NEXT")
            pdf.ln(1)
        elif kind == "p":
            pdf.set_font("Helvetica", "", 12)
            pdf.multi_cell(w, 7, " ".join(b[1]), new_x="LMARGIN", new_y="NEXT")
            pdf.ln(3)
        elif kind == "ul":
            pdf.set_font("Helvetica", "", 12)
            for item in b[1]:
                pdf.set_x(pdf.l_margin + 4)
                pdf.multi_cell(w - 4, 7, "- " + item, new_x="LMARGIN", new_y="NEXT")
            pdf.ln(3)
        elif kind == "table":
            pdf.set_font("Helvetica", "", 10)
            with pdf.table(line_height=6, text_align="LEFT") as table:
                for row in b[1]:
                    tr = table.row()
                    for c in row:
                        tr.cell(c)
            pdf.ln(3)
    pages = pdf.page_no()
    data = bytes(pdf.output())
    hf_words = pages * (len(words(head)) + len(words(foot)) + 5)
    return data, pages, hf_words
