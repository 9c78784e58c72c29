"""An invented tuning corpus of thin pages on heavy site templates, with ground truth.

    .venv/bin/python benchmarks/template_corpus.py OUT [--seed 13]

Writes ``OUT/inbox/`` (documents), ``OUT/manifest.jsonl`` (path, source_url and
``x_body``, the id of the page's ground-truth body), ``OUT/bodies/<id>.txt`` (each body
as a reader sees it: title, paragraphs, list items, table cells) and ``OUT/pairs.jsonl``
(``{"a", "b", "relation", "body_jaccard"}``, relation ``near-duplicate``, ``exact-body`` or
``distinct``; body_jaccard is the exact Jaccard of the bodies' word 5-grams).

Every organisation, site and text is invented (example.org / example.net / .test hosts).
The sites differ in what makes them hard: a portal whose mega-menu, two dozen teasers and
long legal footer outweigh a notice of 150-470 words; a news site whose teasers rotate (a
random dozen of a pool per page); a site built of anonymous ``div``s; a documentation site
with a light template; sections with their own asides; a new site with only three pages.
Near-duplicates are edited copies on the same site, and copies of a body as PDF, plain
text or Markdown with a 1 % edit; exact bodies are the same body in another template or
rotation; one byte-identical copy. Used for tuning only: the blind corpus in
``benchmarks/data/template_blind/`` was written by someone who never saw the detector.
"""

from __future__ import annotations

import argparse
import json
from datetime import UTC, datetime
import random
import sys
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import pdf_document  # noqa: E402
from gate.tokens import words  # noqa: E402

WORDS = ("water supply street notice council service residents road closure works repair "
         "bin collection library opening hours permit parking zone school holiday bus "
         "route stop timetable change weekend evening morning crew valve pipe meter "
         "account payment deadline form office desk visit appointment community centre "
         "park tree planting festival market stall licence application review decision "
         "consultation plan district north south east west river bridge footpath cycle "
         "lane lighting winter grit salt snow flood warning pump station energy grant "
         "home insulation survey housing repair tenant rent advice benefit support "
         "volunteer event booking hall room fee refund recycling glass paper garden "
         "waste clinic health check vaccination register election vote polling card "
         "noise complaint pest control food hygiene rating business rates relief").split()
GLUE = "the a of and to in for on at with from by is will be are this that our your".split()


def sentence(rng: random.Random, lo: int = 8, hi: int = 18) -> str:
    n = rng.randint(lo, hi)
    out = [rng.choice(GLUE) if rng.random() < 0.35 else rng.choice(WORDS) for _ in range(n)]
    if rng.random() < 0.3:
        out.insert(rng.randrange(len(out)), str(rng.randint(2, 980)))
    text = " ".join(out)
    return text[0].upper() + text[1:] + "."


def title(rng: random.Random) -> str:
    return " ".join(rng.choice(WORDS) for _ in range(rng.randint(3, 6))).capitalize()


def make_body(rng: random.Random, low: int = 150, high: int = 470) -> dict:
    """A thin page's body: a title, paragraphs, sometimes a list and a table."""
    target = rng.randint(low, high)
    body = {"title": title(rng), "parts": []}
    count = 0
    while count < target:
        kind = rng.random()
        if kind < 0.12 and count > 40:
            items = [sentence(rng, 4, 9) for _ in range(rng.randint(3, 6))]
            body["parts"].append(("list", items))
            count += sum(len(i.split()) for i in items)
        elif kind < 0.2 and count > 40:
            rows = [[title(rng), str(rng.randint(1, 99)), rng.choice(WORDS)]
                    for _ in range(rng.randint(2, 5))]
            body["parts"].append(("table", [["Item", "Number", "Area"]] + rows))
            count += sum(len(" ".join(r).split()) for r in rows) + 3
        elif kind < 0.28 and count > 40:
            body["parts"].append(("heading", title(rng)))
        else:
            para = " ".join(sentence(rng) for _ in range(rng.randint(2, 5)))
            body["parts"].append(("p", para))
            count += len(para.split())
    return body


def body_text(body: dict) -> str:
    lines = [body["title"]]
    for kind, value in body["parts"]:
        if kind in ("p", "heading"):
            lines.append(value)
        elif kind == "list":
            lines.extend(value)
        else:
            lines.extend(" ".join(row) for row in value)
    return "\n".join(lines)


def edit_body(rng: random.Random, body: dict, share: float) -> dict:
    """A copy with ``share`` of its words substituted, inserted or deleted."""
    out = {"title": body["title"], "parts": []}
    for kind, value in body["parts"]:
        if kind == "p":
            tokens = value.split()
            for _ in range(max(0, round(len(tokens) * share))):
                i = rng.randrange(len(tokens))
                action = rng.random()
                if action < 0.5:
                    tokens[i] = rng.choice(WORDS)
                elif action < 0.75:
                    tokens.insert(i, rng.choice(WORDS))
                elif len(tokens) > 5:
                    del tokens[i]
            value = " ".join(tokens)
        out["parts"].append((kind, value))
    return out


def shingles(text: str, w: int = 5) -> set[str]:
    tokens = words(text)
    if len(tokens) < w:
        return {" ".join(tokens)}
    return {" ".join(tokens[i:i + w]) for i in range(len(tokens) - w + 1)}


def jaccard(a: str, b: str) -> float:
    x, y = shingles(a), shingles(b)
    return len(x & y) / len(x | y) if x | y else 1.0


# -- site templates ------------------------------------------------------------------

def body_html(body: dict, tag: str = "article") -> str:
    parts = [f"<{tag}><h1>{body['title']}</h1>"]
    for kind, value in body["parts"]:
        if kind == "p":
            parts.append(f"<p>{value}</p>")
        elif kind == "heading":
            parts.append(f"<h2>{value}</h2>")
        elif kind == "list":
            parts.append("<ul>" + "".join(f"<li>{i}</li>" for i in value) + "</ul>")
        else:
            parts.append("<table>" + "".join(
                "<tr>" + "".join(f"<td>{c}</td>" for c in row) + "</tr>" for row in value)
                + "</table>")
    parts.append(f"</{tag}>")
    return "".join(parts)


def body_br(body: dict) -> str:
    """A notice typed into one box: lines separated by <br>, no paragraph markup."""
    lines = [f"<b>{body['title']}</b>"]
    for kind, value in body["parts"]:
        if kind == "list":
            lines += [f"&bull; {i}" for i in value]
        elif kind == "table":
            lines.append("<table>" + "".join("<tr>" + "".join(f"<td>{c}</td>" for c in row)
                                             + "</tr>" for row in value) + "</table>")
        elif kind == "heading":
            lines.append(f"<b>{value}</b>")
        else:
            lines.append(value)
    return "<div class='notice'>" + "<br>".join(lines) + "</div>"


class Site:
    """An invented site: its host, its template and how its pages vary."""

    def __init__(self, rng: random.Random, host: str, style: str, org: str):
        self.host, self.style, self.org = host, style, org
        self.menu = [[title(rng) for _ in range(8)] for _ in range(8)]
        self.pool = [(title(rng), sentence(rng, 14, 28)) for _ in range(40)]
        self.legal = [" ".join(sentence(rng, 12, 22) for _ in range(4)) for _ in range(5)]
        self.sections = {s: [(title(rng), sentence(rng, 12, 24)) for _ in range(10)]
                         for s in ("news", "services")}

    def teasers(self, rng: random.Random, section: str) -> list[tuple[str, str]]:
        if self.style == "rotating":
            return rng.sample(self.pool, 12)
        if self.style == "sections":
            return self.sections[section]
        return self.pool[:24]

    def page(self, rng: random.Random, body: dict, section: str = "news") -> bytes:
        org = self.org
        if self.style == "light":
            head = ("<header><a href='/'>" + org + "</a></header><nav>" + "".join(
                f"<a href='/doc/{i}'>{t}</a> " for i, t in enumerate(self.menu[0])) + "</nav>")
            foot = f"<footer><p>{self.legal[0]}</p></footer>"
            middle = body_html(body, "main")
        else:
            menu = "".join("<li><span>" + col[0] + "</span><ul>" + "".join(
                f"<li><a href='/m/{i}/{j}'>{t}</a></li>" for j, t in enumerate(col)) +
                "</ul></li>" for i, col in enumerate(self.menu))
            teasers = "".join(
                f"<div class='teaser'><h3><a href='/t/{i}'>{t}</a></h3><p>{blurb}</p>"
                f"<a href='/t/{i}'>Read more</a></div>"
                for i, (t, blurb) in enumerate(self.teasers(rng, section)))
            legal = "".join(f"<p>{p}</p>" for p in self.legal)
            crumbs = f"<div class='crumbs'><a href='/'>Home</a> / {section}</div>"
            if self.style in ("br", "br-main"):
                head = f"<div class='top'><div class='brand'>{org}</div><ul>{menu}</ul></div>"
                side = f"<div class='side'>{teasers}</div>"
                box = f"<div class='box'>{crumbs}{body_br(body)}</div>"
                middle = side + box if self.style == "br" else box + side
                foot = f"<div class='legal'>{legal}</div>"
            elif self.style == "divs":
                head = (f"<div class='top'><div class='brand'>{org}</div><div><ul>{menu}</ul>"
                        "</div></div>")
                middle = (f"<div class='wrap'><div class='col'>{teasers}</div>"
                          f"<div class='col'>{crumbs}{body_html(body, 'div')}</div></div>")
                foot = f"<div class='bottom'>{legal}</div>"
            else:
                head = f"<header><div class='brand'>{org}</div><nav><ul>{menu}</ul></nav></header>"
                middle = f"<aside>{teasers}</aside>{crumbs}{body_html(body, 'article')}"
                foot = f"<footer>{legal}<p>&copy; {org}</p></footer>"
        return ("<!doctype html><html lang='en'><head><meta charset='utf-8'>"
                f"<title>{body['title']} | {org}</title></head><body>{head}{middle}{foot}"
                "</body></html>").encode()


def wrap(text: str, width: int = 90) -> list[str]:
    lines, line = [], ""
    for word in text.split():
        if line and len(line) + 1 + len(word) > width:
            lines.append(line)
            line = word
        else:
            line = f"{line} {word}".strip()
    return lines + ([line] if line else [])


def as_pdf(body: dict, org: str) -> bytes:
    lines = [body["title"], ""]
    for kind, value in body["parts"]:
        if kind in ("p", "heading"):
            lines += wrap(value) + [""]
        elif kind == "list":
            lines += [f"- {i}" for i in value] + [""]
        else:
            lines += ["  ".join(row) for row in value] + [""]
    pages = [lines[i:i + 50] + [f"{org} - page {n + 1}"]
             for n, i in enumerate(range(0, len(lines), 50))]
    return pdf_document(pages)


def as_text(body: dict, markdown: bool) -> bytes:
    out = [("# " if markdown else "") + body["title"], ""]
    for kind, value in body["parts"]:
        if kind == "p":
            out += [value, ""]
        elif kind == "heading":
            out += [("## " if markdown else "") + value, ""]
        elif kind == "list":
            out += [("* " if markdown else "- ") + i for i in value] + [""]
        elif markdown:
            out.append("| " + " | ".join(value[0]) + " |")
            out.append("|" + "---|" * len(value[0]))
            out += ["| " + " | ".join(r) + " |" for r in value[1:]] + [""]
        else:
            out += ["\t".join(r) for r in value] + [""]
    return "\n".join(out).encode("utf-8")


# -- one body in every format (for the cross-format measurement) -----------------------

def as_typeset_pdf(body: dict, org: str) -> bytes:
    """The body typeset with fpdf2 as a word processor would: a bold title and headings,
    wrapped paragraphs, bulleted items, a ruled table with a header row, a running footer
    with the page number on every page."""
    from fpdf import FPDF

    class Notice(FPDF):
        def footer(self) -> None:
            self.set_y(-15)
            self.set_font("helvetica", size=8)
            self.cell(0, 10, f"{org} - page {self.page_no()}", align="C")

    pdf = Notice()
    pdf.set_creation_date(datetime(2026, 11, 2, tzinfo=UTC))  # byte-stable output
    pdf.add_page()
    pdf.set_font("helvetica", style="B", size=16)
    pdf.multi_cell(0, 8, body["title"], new_x="LMARGIN", new_y="NEXT")
    for kind, value in body["parts"]:
        if kind == "heading":
            pdf.set_font("helvetica", style="B", size=13)
            pdf.multi_cell(0, 7, value, new_x="LMARGIN", new_y="NEXT")
        elif kind == "p":
            pdf.set_font("helvetica", size=11)
            pdf.multi_cell(0, 5.5, value, new_x="LMARGIN", new_y="NEXT")
        elif kind == "list":
            pdf.set_font("helvetica", size=11)
            for item in value:
                pdf.set_x(pdf.l_margin + 4)
                pdf.multi_cell(0, 5.5, f"\u00b7 {item}", new_x="LMARGIN", new_y="NEXT")
        else:
            pdf.set_font("helvetica", size=10)
            with pdf.table(first_row_as_headings=True) as table:
                for row in value:
                    line = table.row()
                    for cell in row:
                        line.cell(cell)
        pdf.ln(2)
    return bytes(pdf.output())


def as_plain_export(body: dict, pipes: bool) -> bytes:
    """A plain-text export as older tools write it: underlined headings, wrapped at 72
    columns, ``*`` bullets, tables as ``|``-separated or space-aligned columns."""
    out = [body["title"], "=" * len(body["title"]), ""]
    for kind, value in body["parts"]:
        if kind == "p":
            out += wrap(value, 72) + [""]
        elif kind == "heading":
            out += [value, "-" * len(value), ""]
        elif kind == "list":
            out += [f"  * {i}" for i in value] + [""]
        elif pipes:
            out += [" | ".join(r) for r in value] + [""]
        else:
            widths = [max(len(r[c]) for r in value) + 2 for c in range(len(value[0]))]
            out += ["".join(cell.ljust(w) for cell, w in zip(r, widths)).rstrip()
                    for r in value] + [""]
    return "\n".join(out).encode("utf-8")


def renderings(body: dict, org: str) -> dict[str, bytes]:
    """One body in every format gate reads as text: the same words, different markup."""
    page = ("<html><head><title>{t}</title></head><body>{b}</body></html>")
    return {
        "html": page.format(t=body["title"], b=body_html(body)).encode(),
        "html-br": page.format(t=body["title"], b=f"<div>{body_br(body)}</div>").encode(),
        "md": as_text(body, markdown=True),
        "txt": as_text(body, markdown=False),
        "txt-export": as_plain_export(body, pipes=False),
        "txt-pipes": as_plain_export(body, pipes=True),
        "pdf": as_typeset_pdf(body, org),
        "pdf-lines": as_pdf(body, org),
    }


SITES = (("portal.example.org", "portal", "Invented Borough Council", 36),
         ("news.example.net", "rotating", "Invented Valley News", 30),
         ("city.example.test", "divs", "Invented City Services", 30),
         ("docs.example.org", "light", "Invented Docs Team", 24),
         ("county.example.net", "sections", "Invented County", 30),
         ("hall.example.org", "br", "Invented Town Hall", 30),
         ("parish.example.net", "br-main", "Invented Parish Office", 20),
         ("newcomer.example.test", "br", "Invented Newcomer Trust", 3))


def make(out: Path, seed: int = 13) -> Path:
    rng = random.Random(seed)
    inbox, bodies = out / "inbox", out / "bodies"
    inbox.mkdir(parents=True, exist_ok=True)
    bodies.mkdir(parents=True, exist_ok=True)
    manifest, docs = [], []  # docs: (path, body id, site host)
    texts: dict[str, str] = {}

    def add(path: str, data: bytes, url: str, body_id: str, host: str) -> None:
        (inbox / path).parent.mkdir(parents=True, exist_ok=True)
        (inbox / path).write_bytes(data)
        manifest.append({"path": path, "source_url": url, "x_body": body_id})
        docs.append((path, body_id, host))

    relations: list[tuple[str, str, str]] = []
    counter = 0
    for host, style, org, pages in SITES:
        site = Site(rng, host, style, org)
        for n in range(pages):
            counter += 1
            body = make_body(rng)
            bid = f"b{counter:04d}"
            texts[bid] = body_text(body)
            section = "news" if n % 2 else "services"
            path = f"{host}/{section}/page-{n:03d}.html"
            add(path, site.page(rng, body, section), f"https://{host}/{section}/{n}", bid, host)
            roll = rng.random()
            if roll < 0.06:  # a family: an edited copy, a printed view and a text copy
                vid = f"{bid}e2"
                variant = edit_body(rng, body, 0.02)
                texts[vid] = body_text(variant)
                family = [(f"{host}/{section}/page-{n:03d}-v2.html",
                           site.page(rng, variant, section), vid),
                          (f"{host}/{section}/page-{n:03d}-print.html",
                           site.page(rng, body, section), bid),
                          (f"{host}/files/page-{n:03d}.txt", as_text(body, False), bid)]
                for vpath, data, ref in family:
                    add(vpath, data, f"https://{host}/{vpath}", ref, host)
                    relations.append((path, vpath, "exact" if ref == bid else "near"))
                for i, (one, _d, ref_one) in enumerate(family):
                    for two, _e, ref_two in family[i + 1:]:
                        relations.append((one, two, "exact" if ref_one == ref_two else
                                          "near"))
            elif roll < 0.25:  # an edited copy on the same site
                share = rng.choice((0.01, 0.02, 0.03, 0.05, 0.1, 0.2, 0.4))
                vid = f"{bid}e{int(share * 100)}"
                variant = edit_body(rng, body, share)
                texts[vid] = body_text(variant)
                vpath = f"{host}/{section}/page-{n:03d}-v2.html"
                add(vpath, site.page(rng, variant, section),
                    f"https://{host}/{section}/{n}/v2", vid, host)
                relations.append((path, vpath, "near"))
            elif roll < 0.40:  # the body in another format, 1 % edited
                fmt = rng.choice(("pdf", "txt", "md"))
                vid = f"{bid}f"
                variant = edit_body(rng, body, 0.01)
                texts[vid] = body_text(variant)
                data = as_pdf(variant, org) if fmt == "pdf" else as_text(variant, fmt == "md")
                vpath = f"{host}/files/page-{n:03d}.{fmt}"
                add(vpath, data, f"https://{host}/files/{n}.{fmt}", vid, host)
                relations.append((path, vpath, "near"))
            elif roll < 0.50:  # the same body again: another rotation, or printed view
                vpath = f"{host}/{section}/page-{n:03d}-print.html"
                add(vpath, site.page(rng, body, "news" if section == "services" else
                                     "services"), f"https://{host}/print/{n}", bid, host)
                relations.append((path, vpath, "exact"))
            elif roll < 0.52:  # the same bytes
                vpath = f"mirror/{host}-page-{n:03d}.html"
                add(vpath, (inbox / path).read_bytes(), f"https://{host}/mirror/{n}", bid, host)
                relations.append((path, vpath, "exact"))
    for bid, text in texts.items():
        (bodies / f"{bid}.txt").write_text(text + "\n", encoding="utf-8")
    with open(out / "manifest.jsonl", "w", encoding="utf-8") as fh:
        for record in manifest:
            fh.write(json.dumps(record, sort_keys=True) + "\n")
    body_of = {p: b for p, b, _h in docs}
    pairs = []
    marked = {(a, b) for a, b, _r in relations}
    for a, b, relation in relations:
        j = jaccard(texts[body_of[a]], texts[body_of[b]])
        pairs.append({"a": a, "b": b, "body_jaccard": round(j, 4),
                      "relation": "exact-body" if relation == "exact" else
                      ("near-duplicate" if j >= 0.5 else "distinct")})
    by_host: dict[str, list[str]] = {}
    for path, _bid, host in docs:
        by_host.setdefault(host, []).append(path)
    for paths in by_host.values():  # every other pair on one site is distinct
        for i, a in enumerate(paths):
            for b in paths[i + 1:]:
                if (a, b) in marked or (b, a) in marked or body_of[a] == body_of[b]:
                    continue
                j = jaccard(texts[body_of[a]], texts[body_of[b]])
                pairs.append({"a": a, "b": b, "body_jaccard": round(j, 4),
                              "relation": "near-duplicate" if j >= 0.5 else "distinct"})
    with open(out / "pairs.jsonl", "w", encoding="utf-8") as fh:
        for pair in pairs:
            fh.write(json.dumps(pair, sort_keys=True) + "\n")
    return out


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    parser.add_argument("out", type=Path)
    parser.add_argument("--seed", type=int, default=13)
    args = parser.parse_args()
    make(args.out, args.seed)
    print(f"wrote {args.out}")


if __name__ == "__main__":
    main()
