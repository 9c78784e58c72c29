"""Stress test for site-template learning: one template mechanic perturbed at a time.

    .venv/bin/python benchmarks/template_stress.py [--only NAME ...] [--seed 24]
        [--pages 16] [--verbose] [--list]

Everything here is invented (organisations, hosts under example.org / example.net /
.test, words drawn from benchmarks/template_corpus.py's vocabulary). Each perturbation
writes a small corpus of its own (two sites of ``--pages`` pages each, edited copies of
half the pages on the same site, or in another format for the cross-format ones)
in the blind sets' format, runs it through ``gate run`` with only the duplicate check on
(benchmarks/templates.py's runner and scoring) and prints one row: near-duplicate
recall, false-duplicate rate, exact-claim precision, body kept and template left (share
of text.txt words that are not the body's). The base template is a heavy one: a
mega-menu, a column of teasers and a legal footer around a notice of 150-470 words.

Perturbations (one at a time on top of the base): menus and asides that differ by site
section; template lines that vary per page (view counters, "updated N hours ago",
dates, "page 3 of 12", a reader's name); "you may also like" boxes quoting the first
sentences of other pages and sometimes of the page itself; newsletter and advert boxes
between body paragraphs; a side table of contents repeating the page's own headings;
cookie and consent text at the end; template blocks in a rotated order; markup without
semantic tags or class names (div soup), layout tables; print-friendly variants; and
copies of bodies as hard-wrapped, hyphenated text, Markdown with reference links and
pipe tables, PDF with running headers and footers, page numbers, justified and
hyphenated lines and a table; and sites of only 3, 5 or 10 pages.
"""

from __future__ import annotations

import argparse
import json
import random
import shutil
import sys
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from benchmarks.corpus import pdf_document  # noqa: E402
from benchmarks.template_corpus import (  # noqa: E402
    body_text, edit_body, jaccard, make_body, sentence, title)

PERTURBATIONS = {
    "base": "heavy template, nothing perturbed",
    "section-menus": "menu and teaser column differ by site section (three sections)",
    "varying-lines": "template lines with per-page numbers, dates, reader names",
    "related-quotes": "'you may also like' quoting other pages' first sentences (and, "
                      "on a third of the pages, the page's own)",
    "inserted-boxes": "newsletter and advert boxes between body paragraphs",
    "side-toc": "a side table of contents repeating the page's own headings",
    "cookie-end": "cookie and consent text at the end of the page",
    "rotated": "template blocks in a different order on every page",
    "div-soup": "no semantic tags, no class names",
    "layout-table": "the page laid out in a table (menu row, aside and body cells)",
    "print": "print-friendly variants (body and a printed-from line) of the pages",
    "txt-hyphen": "copies as text hard-wrapped at 62 columns with end-of-line hyphens",
    "md-ref": "copies as Markdown with reference links and pipe tables",
    "pdf-running": "copies as PDF: running header and footer, 'Page n of m', justified "
                   "and hyphenated lines, a table",
    "share-title": "template lines that name the page's own title ('Share <title>', "
                   "'You are reading: <title>')",
    "rotating-line": "one template line listing four trending titles drawn from a pool",
    "mixed": "all of the HTML perturbations above at once (semantic markup)",
    "mixed-soup": "all of them at once in div soup",
    "mixed-few": "all of them at once on sites of 5 pages",
    "few-3": "sites of 3 pages",
    "few-5": "sites of 5 pages",
    "few-10": "sites of 10 pages",
}
_ALL = {"section-menus", "varying-lines", "related-quotes", "inserted-boxes", "side-toc",
        "cookie-end", "rotated", "share-title", "rotating-line"}
MIXED = {"mixed": _ALL, "mixed-soup": _ALL | {"div-soup"}, "mixed-few": _ALL}
CROSS = {"txt-hyphen": "txt", "md-ref": "md", "pdf-running": "pdf"}
NAMES = ("Ada Quill", "Bo Marrin", "Cleo Tarrant", "Dov Elsby", "Ena Rook", "Fitz Oddie")
MONTHS = ("January February March April May June July August September October "
          "November December").split()


def date(rng: random.Random) -> str:
    return f"{rng.randint(1, 28)} {rng.choice(MONTHS)} 2026"


class Site:
    """An invented site with a heavy template; ``mode`` is the perturbation."""

    def __init__(self, rng: random.Random, host: str, org: str, mode: str):
        self.host, self.org = host, org
        self.modes = MIXED.get(mode, {mode})
        self.sections = ("services", "news", "events")
        self.menus = {s: [[title(rng) for _ in range(7)] for _ in range(6)]
                      for s in self.sections}
        self.pool = [(title(rng), sentence(rng, 14, 26)) for _ in range(30)]
        self.section_pool = {s: [(title(rng), sentence(rng, 14, 26)) for _ in range(12)]
                             for s in self.sections}
        self.legal = [" ".join(sentence(rng, 12, 22) for _ in range(3)) for _ in range(4)]
        self.adverts = [sentence(rng, 10, 18) for _ in range(6)]
        self.newsletter = sentence(rng, 12, 20)
        self.cookie = " ".join(sentence(rng, 14, 24) for _ in range(3))
        self.firsts: list[tuple[str, str]] = []  # (title, first sentence) of its pages

    # -- the template's parts, as (role, html) -----------------------------------------
    def menu(self, section: str) -> list[str]:
        menus = self.menus[section if "section-menus" in self.modes else "services"]
        return [f"<li><span>{col[0]}</span><ul>" + "".join(
            f"<li><a href='/{section}/m/{i}/{j}'>{t}</a></li>" for j, t in enumerate(col))
            + "</ul></li>" for i, col in enumerate(menus)]

    def teasers(self, rng: random.Random, section: str, body: dict) -> list[str]:
        chosen = self.section_pool[section] if "section-menus" in self.modes else \
            self.pool[:16]
        out = [f"<div class='teaser'><h3><a href='/t/{i}'>{t}</a></h3><p>{blurb}</p></div>"
               for i, (t, blurb) in enumerate(chosen)]
        if "related-quotes" in self.modes and self.firsts:
            quoted = rng.sample(self.firsts, min(4, len(self.firsts)))
            if rng.random() < 0.34:
                quoted[0] = (body["title"], first_sentence(body))
            out.insert(0, "<div class='related'><h3>You may also like</h3><ul>" + "".join(
                f"<li><a href='/r/{k}'>{t}</a> {s}</li>" for k, (t, s) in enumerate(quoted))
                + "</ul></div>")
        if "side-toc" in self.modes:
            heads = [v for k, v in body["parts"] if k == "heading"]
            out.insert(0, "<div class='toc'><h3>On this page</h3><ul>" + "".join(
                f"<li><a href='#s{k}'>{h}</a></li>" for k, h in enumerate(heads)) + "</ul></div>")
        if "varying-lines" in self.modes:
            out.insert(0, f"<p>Updated {rng.randint(2, 23)} hours ago</p>"
                          f"<p>{rng.randint(40, 9000):,} views this week</p>")
        return out

    def body(self, rng: random.Random, body: dict) -> list[str]:
        parts = [f"<h1>{body['title']}</h1>"]
        if "varying-lines" in self.modes:
            parts.append(f"<p>Last reviewed {date(rng)} by {rng.choice(NAMES)}</p>")
        paragraphs = 0
        for kind, value in body["parts"]:
            if kind == "p":
                parts.append(f"<p>{value}</p>")
                paragraphs += 1
                if "inserted-boxes" in self.modes and paragraphs in (1, 3):
                    parts.append(
                        "<div class='box'><h4>Get our newsletter</h4>"
                        f"<p>{self.newsletter}</p><a href='/signup'>Sign up</a></div>"
                        if paragraphs == 1 else
                        f"<div class='ad'><p>Advertisement: {rng.choice(self.adverts)}</p>"
                        "<a href='/ads'>Find out more</a></div>")
            elif kind == "heading":
                parts.append(f"<h2>{value}</h2>")
            elif kind == "list":
                parts.append("<ul>" + "".join(f"<li>{i}</li>" for i in value) + "</ul>")
            else:
                parts.append("<table>" + "".join(
                    "<tr>" + "".join(f"<td>{c}</td>" for c in row) + "</tr>" for row in value)
                    + "</table>")
        return parts

    def page(self, rng: random.Random, body: dict, section: str, number: int) -> bytes:
        org = self.org
        menu = self.menu(section)
        teasers = self.teasers(rng, section, body)
        legal = [f"<p>{p}</p>" for p in self.legal]
        own = self.body(rng, body)
        top = [f"<div class='brand'>{org}</div>"]
        if "share-title" in self.modes:
            top.append(f"<p>You are reading: {body['title']}</p>")
            legal.insert(0, f"<p><a href='/share'>Share</a> {body['title']} with a friend "
                            f"or <a href='/print'>print</a> it</p>")
        if "rotating-line" in self.modes:
            trending = rng.sample(self.pool, 4)
            top.append("<p>Trending: " + " | ".join(
                f"<a href='/t/{k}'>{t}</a>" for k, (t, _s) in enumerate(trending)) + "</p>")
        if "varying-lines" in self.modes:
            top.append(f"<p>Signed in as {rng.choice(NAMES)} - page {number + 1} of "
                       f"{rng.randint(number + 2, 60)}</p>")
            legal.append(f"<p>Page generated {date(rng)} at {rng.randint(0, 23)}:"
                         f"{rng.randint(10, 59)} for {org}</p>")
        if "rotated" in self.modes:
            k = rng.randrange(len(menu))
            menu = menu[k:] + menu[:k]
            rng.shuffle(teasers)
            rng.shuffle(legal)
        if "div-soup" in self.modes:
            def soup(html: str) -> str:
                for tag in ("ul", "li", "h1", "h2", "h3", "h4", "p", "span"):
                    html = html.replace(f"<{tag}>", "<div>").replace(f"</{tag}>", "</div>")
                return html.replace(" class='teaser'", "").replace(" class='brand'", "") \
                    .replace(" class='box'", "").replace(" class='ad'", "")
            html = (f"<div><div>{''.join(top)}</div><div>{''.join(menu)}</div></div>"
                    f"<div><div>{''.join(teasers)}</div><div>{''.join(own)}</div></div>"
                    f"<div>{''.join(legal)}</div>")
            html = soup(html)
        elif "layout-table" in self.modes:
            html = (f"<table><tr><td colspan='2'>{''.join(top)}<ul>{''.join(menu)}</ul></td>"
                    f"</tr><tr><td>{''.join(teasers)}</td><td>{''.join(own)}</td></tr>"
                    f"<tr><td colspan='2'>{''.join(legal)}</td></tr></table>")
        else:
            aside = f"<aside>{''.join(teasers)}</aside>"
            main = f"<article>{''.join(own)}</article>"
            swap = "rotated" in self.modes and rng.random() < 0.5
            middle = main + aside if swap else aside + main
            html = (f"<header>{''.join(top)}<nav><ul>{''.join(menu)}</ul></nav></header>"
                    f"<main>{middle}</main><footer>{''.join(legal)}<p>&copy; {org}</p>"
                    "</footer>")
        if "cookie-end" in self.modes:
            html += (f"<div class='consent'><p>{self.cookie}</p><button>Accept all"
                     "</button><button>Reject</button><a href='/privacy'>Privacy notice</a>"
                     "</div>")
        return ("<!doctype html><html lang='en'><head><meta charset='utf-8'>"
                f"<title>{body['title']} | {org}</title></head><body>{html}</body></html>"
                ).encode()

    def print_page(self, rng: random.Random, body: dict, number: int) -> bytes:
        own = "".join(Site.body(self, rng, body))
        return ("<!doctype html><html lang='en'><head><meta charset='utf-8'>"
                f"<title>{body['title']}</title></head><body><div>{own}</div>"
                f"<p>Printed from https://{self.host}/p/{number} on {date(rng)}</p>"
                "</body></html>").encode()


def first_sentence(body: dict) -> str:
    for kind, value in body["parts"]:
        if kind == "p":
            return value.split(". ")[0].rstrip(".") + "."
    return body["title"]


def hyphen_wrap(text: str, width: int) -> list[str]:
    """Lines of at most ``width`` characters, a long word split with a hyphen at the end
    of a line as typesetters do."""
    lines, line = [], ""
    for word in text.split():
        room = width - len(line) - (1 if line else 0)
        if len(word) <= room:
            line = f"{line} {word}".strip()
            continue
        if room >= 4 and len(word) >= 7 and word.isalpha():
            cut = max(2, min(room - 1, len(word) - 3))
            lines.append(f"{line} {word[:cut]}-".strip())
            line = word[cut:]
        else:
            lines.append(line)
            line = word
    return lines + ([line] if line else [])


def justify(line: str, width: int) -> str:
    words_ = line.split(" ")
    gaps = len(words_) - 1
    if gaps <= 0:
        return line
    extra = width - len(line)
    out = []
    for i, w in enumerate(words_):
        out.append(w)
        if i < gaps:
            out.append(" " * (1 + extra // gaps + (1 if i < extra % gaps else 0)))
    return "".join(out)


def as_hyphen_text(body: dict) -> bytes:
    out = [body["title"], ""]
    for kind, value in body["parts"]:
        if kind in ("p", "heading"):
            out += hyphen_wrap(value, 62) + [""]
        elif kind == "list":
            out += [f"  - {i}" for i in value] + [""]
        else:
            out += ["  ".join(r) for r in value] + [""]
    return "\n".join(out).encode("utf-8")


def as_ref_markdown(body: dict, host: str) -> bytes:
    out = [f"# {body['title']}", ""]
    refs = []
    for kind, value in body["parts"]:
        if kind == "p":
            tokens = value.split()
            if len(tokens) > 6:  # two words of the paragraph become a reference link
                k = len(refs) + 1
                tokens[2] = f"[{tokens[2]} {tokens[3]}][{k}]"
                del tokens[3]
                refs.append(f"[{k}]: https://{host}/ref/{k} \"Reference {k}\"")
            out += [" ".join(tokens), ""]
        elif kind == "heading":
            out += [f"## {value}", ""]
        elif kind == "list":
            out += [f"1. {i}" for i in value] + [""]
        else:
            out.append("| " + " | ".join(value[0]) + " |")
            out.append("|" + " --- |" * len(value[0]))
            out += ["| " + " | ".join(r) + " |" for r in value[1:]] + [""]
    return "\n".join(out + refs).encode("utf-8")


def as_running_pdf(body: dict, org: str) -> bytes:
    lines = [body["title"], ""]
    for kind, value in body["parts"]:
        if kind == "p":
            wrapped = hyphen_wrap(value, 80)
            lines += [justify(line, 80) for line in wrapped[:-1]] + wrapped[-1:] + [""]
        elif kind == "heading":
            lines += [value, ""]
        elif kind == "list":
            lines += [f"- {i}" for i in value] + [""]
        else:
            lines += ["   ".join(row) for row in value] + [""]
    chunks = [lines[i:i + 40] for i in range(0, len(lines), 40)]
    pages = [[f"{org} - {body['title']}", ""] + chunk + ["", f"Page {n + 1} of {len(chunks)}"]
             for n, chunk in enumerate(chunks)]
    return pdf_document(pages)


HOSTS = (("civic.example.org", "Invented Civic Trust"),
         ("harbour.example.net", "Invented Harbour Board"),
         ("guild.example.test", "Invented Weavers Guild"),
         ("moor.example.org", "Invented Moor Rangers"),
         ("canal.example.net", "Invented Canal Society"),
         ("vale.example.test", "Invented Vale Clinic"))


def make(out: Path, mode: str, seed: int = 24, pages: int = 16) -> Path:
    """One perturbation's corpus in the blind sets' format."""
    rng = random.Random(f"{seed}-{mode}")
    shutil.rmtree(out, ignore_errors=True)
    inbox, bodies = out / "inbox", out / "bodies"
    inbox.mkdir(parents=True)
    bodies.mkdir()
    if mode.startswith("few-"):
        pages, hosts = int(mode.split("-")[1]), HOSTS
    elif mode == "mixed-few":
        pages, hosts = 5, HOSTS
    else:
        hosts = HOSTS[:2]
    manifest, texts, docs, relations = [], {}, [], []

    def add(path: str, data: bytes, body: dict, host: str) -> None:
        (inbox / path).parent.mkdir(parents=True, exist_ok=True)
        (inbox / path).write_bytes(data)
        texts[path] = body_text(body)
        manifest.append({"path": path, "source_url": f"https://{host}/{path}"})
        docs.append((path, host))

    for host, org in hosts:
        site = Site(rng, host, org, mode)
        for n in range(pages):
            body = make_body(rng)
            if "side-toc" in site.modes and not any(k == "heading" for k, _ in body["parts"]):
                body["parts"].insert(2, ("heading", title(rng)))
            section = site.sections[n % 3]
            path = f"{host}/{section}/page-{n:03d}.html"
            add(path, site.page(rng, body, section, n), body, host)
            site.firsts.append((body["title"], first_sentence(body)))
            if mode == "print":
                copy = f"{host}/print/page-{n:03d}.html"
                add(copy, site.print_page(rng, body, n), body, host)
                relations.append((path, copy))
            elif mode in CROSS and n % 2 == 0:
                variant = edit_body(rng, body, 0.01)
                fmt = CROSS[mode]
                data = as_hyphen_text(variant) if fmt == "txt" else \
                    as_ref_markdown(variant, host) if fmt == "md" else \
                    as_running_pdf(variant, org)
                copy = f"{host}/files/page-{n:03d}.{fmt}"
                add(copy, data, variant, host)
                relations.append((path, copy))
            elif n % 2 == 1:
                variant = edit_body(rng, body, rng.choice((0.005, 0.01, 0.02)))
                copy = f"{host}/{section}/page-{n:03d}-v2.html"
                add(copy, site.page(rng, variant, section, n), variant, host)
                relations.append((path, copy))
    for path, text in texts.items():
        target = bodies / f"{path}.txt"
        target.parent.mkdir(parents=True, exist_ok=True)
        target.write_text(text + "\n", encoding="utf-8")
    (out / "manifest.jsonl").write_text(
        "".join(json.dumps(r, sort_keys=True) + "\n" for r in manifest), encoding="utf-8")
    pairs = []
    marked = {frozenset(r) for r in relations}
    for i, (a, host_a) in enumerate(docs):
        for b, host_b in docs[i + 1:]:
            if host_a != host_b:
                continue
            j = jaccard(texts[a], texts[b])
            related = frozenset((a, b)) in marked
            pairs.append({"a": a, "b": b, "body_jaccard": round(j, 4),
                          "relation": ("exact-body" if texts[a] == texts[b] else
                                       "near-duplicate") if related or j >= 0.5
                          else "distinct"})
    (out / "pairs.jsonl").write_text(
        "".join(json.dumps(p, sort_keys=True) + "\n" for p in pairs), encoding="utf-8")
    return out


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    parser.add_argument("--only", nargs="*", default=[], choices=sorted(PERTURBATIONS),
                        metavar="NAME", help="perturbations to run (default: all)")
    parser.add_argument("--seed", type=int, default=24)
    parser.add_argument("--pages", type=int, default=16, help="pages per site")
    parser.add_argument("--workers", type=int, default=2)
    parser.add_argument("--verbose", action="store_true")
    parser.add_argument("--list", action="store_true", help="list the perturbations")
    parser.add_argument("--work", type=Path, default=ROOT / "bench-out" / "template-stress")
    args = parser.parse_args()
    if args.list:
        for name, text in PERTURBATIONS.items():
            print(f"{name:<15} {text}")
        return
    from benchmarks.templates import load_truth, run_gate, score, show

    print(f"{'perturbation':<15} {'docs':>4} {'near':>4} {'recall':>6} {'false':>7} "
          f"{'exact-p':>7} {'kept':>5} {'tmpl-left':>9} {'cpu s':>6}", flush=True)
    rows = []
    for name in args.only or list(PERTURBATIONS):
        corpus = make(args.work / name, name, args.seed, args.pages)
        pairs, bodies = load_truth(corpus)
        cpu = time.process_time()
        report, seconds, timings = run_gate(corpus, args.work / f"{name}-out",
                                            args.workers, True)
        cpu = time.process_time() - cpu + sum(timings.values())
        s = score(report, args.work / f"{name}-out", pairs, bodies)
        rows.append((name, s))
        print(f"{name:<15} {len(report['documents']):>4} {s['pairs_near']:>4} "
              f"{s['recall']:>6.3f} {s['false_rate']:>7.4f} {s['exact_precision']:>7.3f} "
              f"{s['body_kept']:>5.3f} {s['template_left']:>9.3f} {cpu:>6.1f}", flush=True)
        if args.verbose:
            show(name, s, seconds, timings, len(report["documents"]), True)
    worst = min(rows, key=lambda r: r[1]["recall"])
    print(f"mean recall {sum(s['recall'] for _n, s in rows) / len(rows):.3f}, lowest "
          f"{worst[1]['recall']:.3f} ({worst[0]}); mean template left "
          f"{sum(s['template_left'] for _n, s in rows) / len(rows):.3f}")


if __name__ == "__main__":
    main()
