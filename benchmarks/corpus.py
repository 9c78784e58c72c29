"""A generated, invented corpus for the benchmarks (no real organisations or people).

``make_corpus(root, n)`` writes ``n`` documents into ``root`` (about 80 % HTML pages of 10 to
100 KB with navigation, cookie banner and footer boilerplate, 10 % multi-page PDFs, 10 %
plain text) plus a manifest, deterministically from a seed. A share of the documents are
near-duplicates or exact copies of others, so the duplicate check has work to do. The PDFs
are written directly (a minimal PDF 1.4 writer with the standard Helvetica font), which is
hundreds of times faster than a layout library.
"""

from __future__ import annotations

import hashlib
import json
import random
import zlib
from pathlib import Path

VOCAB = ("depot route window driver pallet invoice customer harbour siding crane gate "
         "ledger barge schedule weekday morning evening north south river bridge yard "
         "permit tariff season cargo shift relay station canal freight wagon platform "
         "timetable quarter volume contract shipment warehouse dispatch container loading "
         "crew signal junction terminal").split()
FUNCTION = "the of and to in with that for on at by from is was be has have are".split()


def sentence(rng: random.Random, words: int) -> str:
    out = []
    for i in range(words):
        out.append(rng.choice(FUNCTION) if i % 3 == 1 else rng.choice(VOCAB))
    text = " ".join(out)
    return text[0].upper() + text[1:] + f" {rng.randrange(1, 900)}."


def paragraph(rng: random.Random, sentences: int = 5) -> str:
    return " ".join(sentence(rng, rng.randint(8, 16)) for _ in range(sentences))


BOILERPLATE = (
    "<header><div class='logo'>Quillby Freight</div><form class='search'><input name='q'>"
    "</form></header><div class='cookie-banner'>We use cookies to remember your depot "
    "preferences. <button>Accept</button></div><nav><ul>" +
    "".join(f"<li><a href='/section/{i}'>Section {i}</a></li>" for i in range(12)) +
    "</ul></nav><aside class='related'>" +
    "".join(f"<a href='/related/{i}'>Related notice {i}</a>" for i in range(8)) +
    "<div class='ad'>Book your pallet slot online.</div></aside>")
FOOTER = ("<footer>" + "".join(f"<a href='/f/{i}'>Footer link {i}</a>" for i in range(5)) +
          "<p>Quillby Freight is an invented company for tests.</p></footer>")


def html_page(rng: random.Random, target: int, title: str, body: list[str]) -> bytes:
    parts = [f"<!doctype html><html lang='en'><head><meta charset='utf-8'><title>{title}"
             "</title><style>.x{color:#333}</style><script>var t=1;</script></head><body>",
             BOILERPLATE, f"<article><h1>{title}</h1>"]
    size = sum(len(p) for p in parts)
    for para in body:
        parts.append(f"<p>{para}</p>")
        size += len(para) + 7
    while size < target:
        para = paragraph(rng)
        chunk = f"<h2>{sentence(rng, 4)}</h2><p>{para}</p>"
        parts.append(chunk)
        size += len(chunk)
    parts += ["</article>", FOOTER, "</body></html>"]
    return "".join(parts).encode("utf-8")


def _pdf_escape(text: str) -> str:
    return text.replace("\\", "\\\\").replace("(", "\\(").replace(")", "\\)")


def pdf_document(pages: list[list[str]]) -> bytes:
    """A minimal PDF: one Flate-compressed content stream of text lines per page."""
    objects: list[bytes] = []
    font = 3
    kids = []
    page_objects: list[tuple[int, bytes]] = []
    next_id = 4
    for lines in pages:
        ops = ["BT", "/F1 10 Tf", "12 TL", "50 780 Td"]
        ops += [f"({_pdf_escape(line)}) Tj T*" for line in lines]
        ops.append("ET")
        stream = zlib.compress("\n".join(ops).encode("latin-1", "replace"))
        page_id, content_id = next_id, next_id + 1
        next_id += 2
        kids.append(page_id)
        page_objects.append((page_id, b"<< /Type /Page /Parent 2 0 R /MediaBox [0 0 612 792] "
                             b"/Resources << /Font << /F1 3 0 R >> >> /Contents %d 0 R >>"
                             % content_id))
        page_objects.append((content_id, b"<< /Length %d /Filter /FlateDecode >>\nstream\n"
                             % len(stream) + stream + b"\nendstream"))
    objects = [(1, b"<< /Type /Catalog /Pages 2 0 R >>"),
               (2, b"<< /Type /Pages /Kids [" + b" ".join(b"%d 0 R" % k for k in kids) +
                b"] /Count %d >>" % len(kids)),
               (font, b"<< /Type /Font /Subtype /Type1 /BaseFont /Helvetica "
                      b"/Encoding /WinAnsiEncoding >>")] + page_objects
    out = bytearray(b"%PDF-1.4\n")
    offsets = {}
    for number, body in sorted(objects):
        offsets[number] = len(out)
        out += b"%d 0 obj\n" % number + body + b"\nendobj\n"
    xref = len(out)
    count = max(offsets) + 1
    out += b"xref\n0 %d\n0000000000 65535 f \n" % count
    for number in range(1, count):
        out += b"%010d 00000 n \n" % offsets[number]
    out += b"trailer\n<< /Size %d /Root 1 0 R >>\nstartxref\n%d\n%%%%EOF\n" % (count, xref)
    return bytes(out)


def make_corpus(root: Path, n: int, seed: int = 7, dup_share: float = 0.05) -> Path:
    """Write ``n`` documents and a manifest into ``root``; reuse an existing complete copy."""
    marker = root.parent / f"{root.name}.complete"
    if marker.exists() and marker.read_text() == f"{n}:{seed}":
        return root
    rng = random.Random(seed)
    root.mkdir(parents=True, exist_ok=True)
    lines = []
    originals: list[tuple[str, list[str]]] = []
    for i in range(n):
        roll = rng.random()
        folder = f"part{i // 1000:03d}"
        (root / folder).mkdir(exist_ok=True)
        if originals and rng.random() < dup_share:
            base_name, body = rng.choice(originals)
            body = list(body)
            body[rng.randrange(len(body))] = paragraph(rng)  # a near-duplicate
        else:
            body = [paragraph(rng) for _ in range(rng.randint(3, 8))]
        if roll < 0.8:
            name = f"{folder}/page-{i:06d}.html"
            data = html_page(rng, rng.randint(10_000, 100_000), f"Notice {i}", body)
        elif roll < 0.9:
            name = f"{folder}/report-{i:06d}.pdf"
            pages = []
            for _ in range(rng.randint(2, 8)):
                text = " ".join(body) + " " + paragraph(rng, 12)
                words = text.split()
                pages.append([" ".join(words[j:j + 12]) for j in range(0, len(words), 12)])
            data = pdf_document(pages)
        else:
            name = f"{folder}/note-{i:06d}.txt"
            data = "\n\n".join(body + [paragraph(rng)]).encode("utf-8")
        originals.append((name, body))
        (root / name).write_bytes(data)
        lines.append({"path": name, "source_url": f"https://docs.example.org/{name}",
                      "sha256": hashlib.sha256(data).hexdigest(),
                      "published_at": f"2026-{rng.randint(1, 11):02d}-{rng.randint(1, 28):02d}"})
    with open(root / "manifest.jsonl", "w", encoding="utf-8") as fh:
        for line in lines:
            fh.write(json.dumps(line) + "\n")
    marker.write_text(f"{n}:{seed}")
    return root


BENCH_POLICY = """version: 1
name: benchmark
sources:
  allow:
    - domain: docs.example.org
integrity:
  require_checksum: true
freshness:
  max_age_days: 365
language:
  allowed: [en]
duplicates:
  threshold: 0.8
quality: {}
limits:
  timeout_s: 60
"""
