"""WARC archives and mbox files in the inbox: one document per record (invented content).

Archives are written here with warcio's WARCWriter, which computes WARC-Payload-Digest
itself (sha1, base32), so the digests checked are a second implementation's.
"""

import gzip
import hashlib
import io
import json
from datetime import UTC, datetime

import pytest
from warcio.statusandheaders import StatusAndHeaders
from warcio.warcwriter import WARCWriter

from gate.containers import _payload_digest, container_of, kind_of
from gate.pipeline import RunOptions, run
from gate.policy import load_policy

from . import officegen as g

AS_OF = datetime(2026, 12, 1, tzinfo=UTC)
PAGE = ("<html><head><title>{t}</title><meta property='article:published_time' "
        "content='2026-11-0{n}'></head><body><article><p>The invented Quillby Freight depot "
        "publishes its barge timetable for the {t} route every month, with departures at "
        "seven, nine and eleven in the morning and a late run at six.</p></article></body>"
        "</html>")


def warc(pages: list[tuple[str, bytes, str]], *, gz: bool = True) -> bytes:
    """(url, body, status) responses, after a warcinfo and with a request before each."""
    out = io.BytesIO()
    writer = WARCWriter(out, gzip=gz)
    writer.write_record(writer.create_warcinfo_record("crawl.warc", {"software": "test"}))
    for url, body, status in pages:
        request = io.BytesIO(b"GET / HTTP/1.1\r\n\r\n")
        writer.write_record(writer.create_warc_record(url, "request", payload=request))
        headers = StatusAndHeaders(status, [("Content-Type", "text/html; charset=utf-8"),
                                            ("Content-Length", str(len(body)))],
                                   protocol="HTTP/1.1")
        writer.write_record(writer.create_warc_record(url, "response",
                                                      payload=io.BytesIO(body),
                                                      http_headers=headers))
    return out.getvalue()


def page(t: str, n: int = 1) -> bytes:
    return PAGE.format(t=t, n=n).encode()


def go(tmp_path, files: dict[str, bytes], manifest: list[dict] | None = None,
       extra: str = "") -> dict:
    inbox = tmp_path / "inbox"
    for name, data in files.items():
        (inbox / name).parent.mkdir(parents=True, exist_ok=True)
        (inbox / name).write_bytes(data)
    if manifest:
        (inbox / "manifest.jsonl").write_text("".join(json.dumps(m) + "\n" for m in manifest))
    path = tmp_path / "policy.yaml"
    path.write_text("version: 1\nname: crawl\nsources:\n  allow:\n    - domain: docs.example.org"
                    "\n    - path: local/\nintegrity:\n  require_checksum: true\n" + extra)
    run(RunOptions(inbox=inbox, policy=load_policy(path), out=tmp_path / "out", as_of=AS_OF,
                   workers=2))
    return json.loads((tmp_path / "out" / "report.json").read_text())


def outcomes(report: dict) -> dict:
    return {d["path"]: (d["decision"], sorted({r["code"] for r in d["reasons"]}))
            for d in report["documents"]}


def test_kind_of_reads_content_not_names():
    assert kind_of(warc([], gz=True)[:8192]) == "warc"  # sniffing reads 8 KB of a gzip
    assert kind_of(warc([], gz=False)[:64]) == "warc"
    assert kind_of(gzip.compress(b"plain text")) is None
    assert container_of("crawl/a.warc.gz#record-00004") == "crawl/a.warc.gz"
    assert container_of("notes#1.txt") == "notes#1.txt"


def test_payload_digest_sha1_base32_as_crawlers_write_it():
    body = b"hello"
    sha1 = hashlib.sha1(body).digest()  # the digest WARC uses
    # sha1("hello") = aaf4c61ddcc5e8a2dabede0f3b482cd9aea9434d (FIPS 180-4 tooling, common
    # knowledge); base32 of it, RFC 4648 alphabet
    assert sha1.hex() == "aaf4c61ddcc5e8a2dabede0f3b482cd9aea9434d"
    verdict = _payload_digest("sha1:VL2MMHO4YXUKFWV63YHTWSBM3GXKSQ2N", sha1,
                              hashlib.sha256(body).digest())
    assert verdict["valid"] is True
    assert _payload_digest("sha1:AAAA", sha1, b"")["valid"] is False


def test_each_response_record_is_a_document_with_header_provenance(tmp_path):
    data = warc([("https://docs.example.org/line-1.html", page("line one"), "200 OK"),
                 ("https://docs.example.org/gone.html", b"<html>not here</html>",
                  "404 Not Found"),
                 ("https://paste.example.net/x.html", page("pasted", 2), "200 OK")])
    report = go(tmp_path, {"crawl/site.warc.gz": data})
    got = outcomes(report)
    # records: 1 warcinfo, 2 request, 3 response, 4 request, 5 response, 6, 7 response
    assert got == {
        "crawl/site.warc.gz#record-00003": ("accepted", []),
        "crawl/site.warc.gz#record-00005": ("quarantined", ["format.unsupported"]),
        "crawl/site.warc.gz#record-00007": ("quarantined", ["source.unlisted"]),
    }
    entry = tmp_path / "out" / next(d["location"] for d in report["documents"]
                                    if d["path"].endswith("00003"))
    prov = json.loads((entry / "provenance.json").read_text())
    assert prov["manifest"]["source_url"] == "https://docs.example.org/line-1.html"
    assert prov["manifest"]["digests"][0]["valid"] is True
    assert (entry / "original").read_bytes() == page("line one")
    assert report["manifest_unmatched"] == []


def test_tampered_payload_fails_integrity(tmp_path):
    body = page("line one")
    data = warc([("https://docs.example.org/a.html", body, "200 OK")], gz=False)
    tampered = data.replace(b"seven, nine", b"eight, nine")  # same length, digest now wrong
    assert tampered != data
    got = outcomes(go(tmp_path, {"crawl/site.warc": tampered}))
    assert got == {"crawl/site.warc#record-00003": ("quarantined",
                                                    ["integrity.digest-mismatch"])}


def test_truncated_archive_keeps_earlier_records_and_holds_the_rest(tmp_path):
    data = warc([("https://docs.example.org/a.html", page("line one"), "200 OK"),
                 ("https://docs.example.org/b.html", page("line two"), "200 OK")])
    got = outcomes(go(tmp_path, {"crawl/site.warc.gz": data[:-40], "local/ok.txt":
                                 b"The invented depot opens at six on weekdays.\n"}))
    assert got["crawl/site.warc.gz#record-00003"] == ("accepted", [])
    broken = [p for p, v in got.items() if "format.broken" in v[1]]
    assert broken == ["crawl/site.warc.gz#record-00005"]
    assert "local/ok.txt" in got  # the run went on


def test_garbage_after_a_warc_header_and_an_archive_without_documents(tmp_path):
    junk = b"WARC/1.1\r\nWARC-Type: response\r\nContent-Length: nonsense\r\n\r\n" + b"x" * 50
    only_info = warc([])
    got = outcomes(go(tmp_path, {"crawl/junk.warc": junk, "crawl/info.warc.gz": only_info}))
    assert "format.unsupported" in got["crawl/info.warc.gz"][1]
    assert "format.broken" in got["crawl/junk.warc#record-00001"][1]
    assert len(got) == 2


def test_container_manifest_line_checks_the_archive_digest(tmp_path):
    data = warc([("https://docs.example.org/a.html", page("line one"), "200 OK")])
    wrong = {"path": "crawl/site.warc.gz", "sha256": "0" * 64}
    got = outcomes(go(tmp_path, {"crawl/site.warc.gz": data}, [wrong]))
    assert got == {"crawl/site.warc.gz#record-00003": ("quarantined",
                                                       ["integrity.digest-mismatch"])}


def test_mbox_messages_become_documents(tmp_path):
    one = g.eml("Barge times", "The invented depot moves the Tuesday barge to seven, and the "
                "Thursday barge to nine, from the first of next month onwards.",
                date="Mon, 23 Nov 2026 10:00:00 +0100")
    two = g.eml("Old note", "An invented note from long ago about the depot's opening hours "
                "on public holidays and the ferry that no longer runs.",
                date="Mon, 03 Nov 2014 10:00:00 +0100")
    mbox = (b"From desk@example.org Mon Nov 23 10:00:00 2026\n" + one + b"\n" +
            b"From desk@example.org Mon Nov  3 10:00:00 2014\n" + two)
    got = outcomes(go(tmp_path, {"local/list.mbox": mbox}, extra="freshness:\n"
                                                               "  max_age_days: 365\n"))
    assert got == {"local/list.mbox#message-00001": ("quarantined", ["integrity.missing"]),
                   "local/list.mbox#message-00002": ("quarantined", ["freshness.stale",
                                                                     "integrity.missing"])}


@pytest.mark.parametrize("gz", [True, False])
def test_many_records_stream(tmp_path, gz):
    pages = [(f"https://docs.example.org/p{n}.html", page(f"route {n}", 1 + n % 8), "200 OK")
             for n in range(60)]
    got = outcomes(go(tmp_path, {"crawl/big.warc" + (".gz" if gz else ""): warc(pages, gz=gz)},
                      extra="duplicates:\n  threshold: 0.99\n"))
    assert len(got) == 60


def test_a_gzip_warc_whose_first_record_is_large_is_still_recognised():
    body = " ".join(f"word{n} depot{n % 7} barge{n % 13}" for n in range(3000)).encode()
    out = io.BytesIO()
    writer = WARCWriter(out, gzip=True)  # no warcinfo: the first record is the large one
    writer.write_record(writer.create_warc_record("https://docs.example.org/a.html",
                                                  "resource", payload=io.BytesIO(body)))
    data = out.getvalue()
    assert kind_of(data[:64]) is None  # 64 bytes do not get past the Huffman tables
    assert kind_of(data[:8192]) == "warc"


def test_an_endless_header_line_is_cut_off_not_read_into_memory(tmp_path):
    endless = b"WARC/1.1\r\nWARC-Type: response\r\nX-Padding: " + b"a" * 400_000
    good = warc([("https://docs.example.org/a.html", page("line one"), "200 OK")])
    got = outcomes(go(tmp_path, {"crawl/endless.warc": endless, "crawl/good.warc.gz": good}))
    assert "format.broken" in got["crawl/endless.warc#record-00001"][1]
    assert got["crawl/good.warc.gz#record-00003"] == ("accepted", [])
    report = json.loads((tmp_path / "out" / "report.json").read_text())
    reason = next(r for d in report["documents"] if d["path"].startswith("crawl/endless")
                  for r in d["reasons"] if r["code"] == "format.broken")
    assert "headers run past" in reason["message"]
