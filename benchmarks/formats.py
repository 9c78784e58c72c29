"""Throughput of the office, e-book, mail and web-archive readers (one process, no pool).

    .venv/bin/python benchmarks/formats.py [--docs 200] [--paragraphs 60] [--records 500]

For each format, generates ``--docs`` documents of about ``--paragraphs`` paragraphs of
invented prose each (DOCX, PPTX with one slide per 6 paragraphs, XLSX with one row per
paragraph, ODT, EPUB with 3 chapters, e-mail with a plain and an HTML part), then prints
documents/s, input MB/s and milliseconds per document of extraction alone (sniff + read,
the part that runs in a worker), and the same with the injection screen's measure added.
For WARC it writes one archive of ``--records`` HTML responses and prints records/s of
the parent-side expansion (discovery + reading each record and checking its digest).
Figures vary by about ±20 % on shared VMs: run it more than once.
"""

from __future__ import annotations

import argparse
import io
import random
import sys
import tempfile
import time
from pathlib import Path

ROOT = Path(__file__).resolve().parent.parent
sys.path.insert(0, str(ROOT))

from gate.checks.injection.screen import measure  # noqa: E402
from gate.containers import Member, expand, read  # noqa: E402
from gate.discovery import walk  # noqa: E402
from gate.extract import extract  # noqa: E402
from gate.manifest import EMPTY  # noqa: E402
from tests import officegen as g  # noqa: E402

WORDS = ("depot route window driver pallet invoice customer harbour siding crane gate ledger "
         "barge schedule weekday morning evening north south river bridge yard permit tariff "
         "season cargo shift relay station canal timetable platform").split()


def prose(rng: random.Random, n: int) -> list[str]:
    return [" ".join(rng.choice(WORDS) for _ in range(rng.randint(25, 45))).capitalize() + "."
            for _ in range(n)]


def make(kind: str, rng: random.Random, paragraphs: int) -> bytes:
    paras = prose(rng, paragraphs)
    if kind == "docx":
        return g.docx(*(g.para(g.run(p)) for p in paras),
                      core_xml=g.core("Depot notes", "2026-11-01T10:00:00Z"))
    if kind == "pptx":
        return g.pptx([g.slide_xml(paras[i:i + 6]) for i in range(0, len(paras), 6)])
    if kind == "xlsx":
        return g.xlsx([("Notes", "visible", g.sheet_xml([[str(n), p] for n, p in
                                                         enumerate(paras)]))])
    if kind == "odt":
        return g.odt("".join(f"<text:p>{p}</text:p>" for p in paras))
    if kind == "epub":
        third = max(1, len(paras) // 3)
        return g.epub(["".join(f"<p>{p}</p>" for p in paras[i:i + third])
                       for i in range(0, len(paras), third)])
    if kind == "email":
        return g.eml("Depot notes", "\n\n".join(paras),
                     "".join(f"<p>{p}</p>" for p in paras))
    raise ValueError(kind)


def bench_format(kind: str, docs: int, paragraphs: int) -> None:
    rng = random.Random(7)
    corpus = [make(kind, rng, paragraphs) for _ in range(docs)]
    size = sum(len(d) for d in corpus)
    started = time.perf_counter()
    results = [extract(d, max_pages=500, max_nesting=250) for d in corpus]
    extract_s = time.perf_counter() - started
    assert all(r.summary.ok for r in results), [r.summary.problem_detail for r in results
                                                if not r.summary.ok][:1]
    started = time.perf_counter()
    for result in results:
        measure(result)
    screen_s = time.perf_counter() - started
    print(f"{kind:6} {docs:5d} docs {size / docs / 1024:7.1f} KiB/doc  extract "
          f"{docs / extract_s:7.1f} docs/s {size / extract_s / 1e6:6.2f} MB/s "
          f"{1000 * extract_s / docs:6.2f} ms/doc  + injection screen "
          f"{1000 * screen_s / docs:6.2f} ms/doc")


def bench_warc(records: int, paragraphs: int) -> None:
    from warcio.statusandheaders import StatusAndHeaders
    from warcio.warcwriter import WARCWriter

    rng = random.Random(11)
    out = io.BytesIO()
    writer = WARCWriter(out, gzip=True)
    for n in range(records):
        body = ("<html><body>" + "".join(f"<p>{p}</p>" for p in prose(rng, paragraphs)) +
                "</body></html>").encode()
        headers = StatusAndHeaders("200 OK", [("Content-Type", "text/html"),
                                              ("Content-Length", str(len(body)))],
                                   protocol="HTTP/1.1")
        writer.write_record(writer.create_warc_record(
            f"https://docs.example.org/page-{n}.html", "response", payload=io.BytesIO(body),
            http_headers=headers))
    with tempfile.TemporaryDirectory() as tmp:
        inbox = Path(tmp)
        (inbox / "crawl.warc.gz").write_bytes(out.getvalue())
        started = time.perf_counter()
        members = [m for m in expand(inbox, walk(inbox), EMPTY) if isinstance(m, Member)]
        listed_s = time.perf_counter() - started
        started = time.perf_counter()
        valid = 0
        for member in members:
            intake, record = read(inbox, member, 20_000_000, EMPTY)
            valid += bool(record and record.digests and record.digests[0]["valid"])
        read_s = time.perf_counter() - started
    assert valid == records
    size = len(out.getvalue())
    print(f"warc   {records:5d} records in one {size / 1e6:.1f} MB .warc.gz: listing "
          f"{records / listed_s:7.1f} records/s, reading + digest check "
          f"{records / read_s:7.1f} records/s ({1000 * read_s / records:.2f} ms/record)")


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--docs", type=int, default=200)
    parser.add_argument("--paragraphs", type=int, default=60)
    parser.add_argument("--records", type=int, default=500)
    args = parser.parse_args()
    for kind in ("docx", "pptx", "xlsx", "odt", "epub", "email"):
        bench_format(kind, args.docs, args.paragraphs)
    bench_warc(args.records, args.paragraphs)


if __name__ == "__main__":
    main()
