"""Exports of a page body: hard-wrapped plain text, Markdown with front matter, PDF via fpdf2."""
import datetime
from corpus_core import norm_words


# ------------------------------------------------------------------ plain text
def _wrap(text, width, rng, indent="", first=""):
    words = text.split()
    lines, cur = [], first
    for w in words:
        cand = (cur + " " + w) if (cur.strip() and not cur.endswith(" ")) else cur + w
        if len(cand) <= width:
            cur = cand
            continue
        room = width - len(cur) - 2
        if (len(w) >= 8 and w.isalpha() and room >= 4 and len(w) - room >= 3 and rng.random() < 0.6):
            cut = room
            lines.append(cur + " " + w[:cut] + "-")
            cur = indent + w[cut:]
        else:
            lines.append(cur)
            cur = indent + w
    if cur.strip():
        lines.append(cur)
    return lines


def to_txt(site, doc, rng):
    width = 72 if doc["page_no"] % 2 else 66
    out = [site["name"].upper(), f"Text export of {doc['orig_url']}", f"Exported {doc['pub_date']} (plain text version)", ""]
    for b in doc["flat"]:
        t = b["t"]
        if t == "h1":
            out += [b["text"], "=" * min(len(b["text"]), width), ""]
        elif t == "h2":
            out += [b["text"], "-" * len(b["text"]), ""]
        elif t == "p":
            out += _wrap(b["text"], width, rng) + [""]
        elif t == "ul":
            for it in b["items"]:
                out += _wrap(it, width, rng, indent="    ", first="  * ")
            out.append("")
        elif t == "table":
            rows = b["rows"]
            ws = [max(len(r[i]) for r in rows) for i in range(len(rows[0]))]
            fmt = lambda r: "  ".join(c.ljust(ws[i]) for i, c in enumerate(r)).rstrip()
            out.append(fmt(rows[0]))
            out.append("  ".join("-" * w for w in ws))
            out += [fmt(r) for r in rows[1:]] + [""]
    out.append("-- end of exported document --")
    text = "\n".join(out) + "\n"
    return text


# ------------------------------------------------------------------ markdown
def to_md(site, doc, rng):
    fm = ["---", f"title: \"{doc['title']}\"", f"site: \"{site['name']}\"", f"source: {doc['orig_url']}",
          f"date: {doc['iso_date']}", f"section: {doc['section']}", "layout: page", "---", ""]
    out = list(fm)
    refs = []
    for b in doc["flat"]:
        t = b["t"]
        if t == "h1":
            out += [f"# {b['text']}", ""]
        elif t == "h2":
            out += [f"## {b['text']}", ""]
        elif t == "p":
            text = b["text"]
            if len(refs) < 3 and rng.random() < 0.6:
                cands = [w for w in text.split() if w.isalpha() and len(w) >= 7]
                if cands:
                    w = cands[rng.randrange(len(cands))]
                    refs.append(w)
                    text = text.replace(w, f"[{w}][{len(refs)}]", 1)
            out += [text, ""]
        elif t == "ul":
            out += [f"- {it}" for it in b["items"]] + [""]
        elif t == "table":
            rows = b["rows"]
            out.append("| " + " | ".join(rows[0]) + " |")
            out.append("|" + "|".join("---" for _ in rows[0]) + "|")
            out += ["| " + " | ".join(r) + " |" for r in rows[1:]] + [""]
    for i, w in enumerate(refs):
        out.append(f"[{i + 1}]: https://{site['host']}/glossary/{w.lower()}")
    return "\n".join(out).rstrip() + "\n"


# ------------------------------------------------------------------ pdf
def to_pdf(site, doc, path):
    import warnings
    warnings.filterwarnings("ignore", message="Dimensions for page format")
    from fpdf import FPDF

    long_doc = doc["body_words"] > 230
    short_title = doc["title"] if len(doc["title"]) <= 58 else doc["title"][:55].rsplit(" ", 1)[0] + " ..."
    run_words = {"n": 0}

    class Doc(FPDF):
        def header(self):
            self.set_font("Helvetica", "I", 8)
            self.cell(0, 5, site["name"], align="L")
            self.set_x(self.l_margin)
            self.cell(0, 5, short_title, align="R", new_x="LMARGIN", new_y="NEXT")
            self.line(self.l_margin, self.get_y(), self.w - self.r_margin, self.get_y())
            self.ln(4)
            run_words["n"] += len(norm_words(site["name"] + " " + short_title))

        def footer(self):
            self.set_y(-12)
            self.set_font("Helvetica", "", 8)
            self.cell(0, 5, f"{site['host']}  -  Page {self.page_no()} of {{nb}}", align="C")
            run_words["n"] += len(norm_words(f"{site['host']} Page 1 of 1"))

    pdf = Doc(format="A5" if long_doc else "A4")
    pdf.set_creation_date(datetime.datetime(2026, 11, 30, 9, 0, 0, tzinfo=datetime.timezone.utc))
    pdf.set_title(doc["title"])
    pdf.set_author(site["name"])
    pdf.set_creator("export service")
    pdf.set_producer("export service")
    pdf.set_auto_page_break(True, margin=16)
    pdf.set_margins(15, 12, 15)
    pdf.add_page()
    size = 11 if long_doc else 10.5
    for b in doc["flat"]:
        t = b["t"]
        if t == "h1":
            pdf.set_font("Helvetica", "B", 15)
            pdf.multi_cell(0, 7, b["text"], align="L", new_x="LMARGIN", new_y="NEXT")
            pdf.ln(3)
        elif t == "h2":
            pdf.ln(1)
            pdf.set_font("Helvetica", "B", 12)
            pdf.multi_cell(0, 6, b["text"], align="L", new_x="LMARGIN", new_y="NEXT")
            pdf.ln(1)
        elif t == "p":
            pdf.set_font("Helvetica", "", size)
            pdf.multi_cell(0, 5.2, b["text"], align="J", new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2.5)
        elif t == "ul":
            pdf.set_font("Helvetica", "", size)
            for it in b["items"]:
                pdf.set_x(pdf.l_margin + 4)
                pdf.multi_cell(0, 5.2, "- " + it, align="L", new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif t == "table":
            pdf.set_font("Helvetica", "", size - 1.5)
            with pdf.table(text_align="LEFT", line_height=5) as table:
                for r in b["rows"]:
                    row = table.row()
                    for c in r:
                        row.cell(c)
            pdf.ln(3)
    pdf.output(path)
    return run_words["n"], pdf.page_no()
