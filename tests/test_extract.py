"""Sniffing and extraction, including hostile and broken files generated here."""

import hashlib
import zlib

import pytest

from gate.discovery import Entry
from gate.extract import extract
from gate.extract.sniff import sniff
from gate.extract.text import clean_text
from gate.intake import read_entry

from .helpers import make_pdf

LIMITS = dict(max_pages=50, max_nesting=250)

# FIPS 180-4 SHA-256 vectors as published in NIST's worked examples ("abc", the 448-bit
# message) and NIST CAVP ShortMsg Len = 0 for the empty string (that attribution from
# memory); all recomputed with hashlib (check-values.md section 5).
SHA256_VECTORS = [
    (b"abc", "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"),
    (b"", "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855"),
    (b"abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq",
     "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1"),
]


@pytest.mark.parametrize("data,digest", SHA256_VECTORS)
def test_intake_sha256_fips_180_4_vectors(tmp_path, data, digest):
    (tmp_path / "f").write_bytes(data)
    entry = Entry(path="f", kind="file", size=len(data))
    assert read_entry(tmp_path, entry, max_bytes=1000).sha256 == digest


def test_intake_streams_large_files_without_reading_them_whole(tmp_path):
    data = b"x" * 3_000_000
    (tmp_path / "big").write_bytes(data)
    intake = read_entry(tmp_path, Entry(path="big", kind="file", size=len(data)), 1_000_000)
    assert intake.problem == "too-large" and intake.data is None
    assert intake.sha256 == hashlib.sha256(data).hexdigest() and intake.size == len(data)


# --- sniffing: WHATWG MIME Sniffing section 7.1 patterns -----------------------------------

@pytest.mark.parametrize("data,kind", [
    (b"%PDF-1.7\n...", "pdf"),
    (b"junk before the header %PDF-1.4", "pdf"),  # within the first 1024 bytes
    (b"  <!DOCTYPE html><html></html>", "html"),
    (b"<HTML>", "html"),
    (b"<paragraph>x", "text"),  # "<P" must be followed by space or ">"
    (b"<p>short", "html"),
    (b"<p >x", "html"),
    (b"<!-- c --><div>x</div>", "html"),
    (b"<?xml version='1.0'?><html xmlns='http://www.w3.org/1999/xhtml'>", "html"),
    (b"<?xml version='1.0'?><feed/>", "xml"),
    (b"\x89PNG\r\n\x1a\n\x00\x00", "binary"),
    (b"PK\x03\x04rest", "binary"),
    (b"plain words", "text"),
    (b"\x00\x01\x02binary", "binary"),
    (b"", "empty"),
    ("Grüße aus dem Depot".encode("utf-16-le"), "text"),  # UTF-16 without BOM
    (b"\xff\xfe" + "<html><body>x</body></html>".encode("utf-16-le"), "html"),
])
def test_sniff(data, kind):
    assert sniff(data).type == kind


def test_utf16_without_bom_is_decoded():
    text = "Das Depot im Norden öffnet um sieben Uhr, die Lieferfenster sind unverändert."
    result = extract(text.encode("utf-16-be"), **LIMITS)
    assert result.summary.ok and result.text == text and result.summary.encoding == "utf-16-be"


def test_latin1_text_is_detected():
    text = "Les horaires du dépôt changent: arrivée à 7 h, départ à 19 h, été comme hiver."
    result = extract(text.encode("latin-1"), **LIMITS)
    assert result.summary.ok and "dépôt" in result.text


def test_nul_bytes_make_a_file_binary():
    result = extract(b"looks like text\x00\x00\x00but has NULs", **LIMITS)
    assert result.summary.problem == "unsupported"


def test_random_bytes_are_unsupported():
    import random
    rng = random.Random(7)
    data = bytes(rng.randrange(256) for _ in range(4096))
    assert extract(data, **LIMITS).summary.problem == "unsupported"


def test_clean_text():
    assert clean_text("a\r\nb\rc\x00d\x07e  \n\n") == "a\nb\ncde"
    # zero-width and bidi characters are kept for the injection screen
    assert clean_text("x\u200by\u202e") == "x\u200by\u202e"


# --- HTML ------------------------------------------------------------------------------------

PAGE = b"""<!doctype html><html lang="en"><head><meta charset="utf-8">
<title>Depot hours</title><link rel="canonical" href="https://docs.example.org/hours">
<meta property="article:published_time" content="2026-03-02T08:00:00Z">
<meta property="article:modified_time" content="2026-10-15">
</head><body><nav><a href="/">Home</a></nav><article><h1>Depot hours</h1>
<p>The northern depot opens at seven and closes at nineteen on weekdays.</p>
<p>On Saturdays the depot is open from eight until noon for parcel pick-up only.</p>
</article></body></html>"""


def test_html_text_title_canonical_and_meta_dates():
    result = extract(PAGE, **LIMITS)
    s = result.summary
    assert s.ok and s.type == "html" and s.title == "Depot hours"
    assert s.canonical_url == "https://docs.example.org/hours" and s.declared_lang == "en"
    assert "opens at seven" in result.text and "Home" not in result.text
    assert {(d.role, d.source, d.text) for d in s.dates} == {
        ("published", "meta article:published_time", "2026-03-02T08:00:00Z"),
        ("modified", "meta article:modified_time", "2026-10-15")}


def test_a_pages_second_pass_is_the_same_with_what_its_first_remembered():
    # a page of a site is extracted for its blocks, then again with that text: what the
    # first pass kept (blocks, metadata) must give exactly what reading the tree again
    # gives (invented page: navigation, headings, a list and a table)
    from gate.extract import html

    page = PAGE.replace(b"</article>", b"<h2>Holidays</h2><ul><li>Closed on 24 December"
                        b"</li><li>Closed on 1 January</li></ul><table><tr><td>Monday</td>"
                        b"<td>7-19</td></tr></table><pre>line one\nline two</pre></article>"
                        b"<footer><a href='/contact'>Contact the depot</a></footer>")
    html._remembered.clear()
    html._remembered_bytes[0] = 0
    first = extract(page, **LIMITS, remember=1 << 20)
    assert len(html._remembered) == 1
    kept = extract(page, **LIMITS, main_text=first.text)
    assert not html._remembered and html._remembered_bytes[0] == 0  # used once, then gone
    again = extract(page, **LIMITS, main_text=first.text)
    assert (kept.summary, kept.text, kept.blocks) == (again.summary, again.text, again.blocks)
    assert (kept.summary, kept.text, kept.blocks) == (first.summary, first.text, first.blocks)
    assert kept.tree is not None  # the tree is parsed again: the injection screen reads it


def test_what_pages_remember_stays_within_its_budget():
    from gate.extract import html

    html._remembered.clear()
    html._remembered_bytes[0] = 0
    pages = [PAGE.replace(b"seven", word) for word in (b"six", b"eight", b"nine")]
    extract(pages[0], **LIMITS, remember=1 << 20)
    one = html._remembered_bytes[0]
    assert one > 0
    for page in pages[1:]:
        extract(page, **LIMITS, remember=one + one // 2)  # room for one page only
    assert len(html._remembered) == 1 and html._remembered_bytes[0] <= one + one // 2
    extract(pages[0], **LIMITS, remember=10)  # a budget smaller than a page: not kept
    assert len(html._remembered) == 1
    html._remembered.clear()
    html._remembered_bytes[0] = 0


def test_html_charset_that_lies_is_detected():
    page = "<html><head><meta charset='utf-8'></head><body><p>Grüße aus Köln, die Lieferung " \
           "kommt später als geplant, voraussichtlich am Donnerstag.</p></body></html>"
    result = extract(page.encode("cp1252"), **LIMITS)
    assert result.summary.charset_mismatch and result.summary.declared_charset == "utf-8"
    assert "Grüße" in result.text


def test_deep_nesting_is_refused():
    page = b"<html><body>" + b"<div>" * 5000 + b"x" + b"</div>" * 5000 + b"</body></html>"
    result = extract(page, **LIMITS)
    assert result.summary.problem == "too-deep" and result.summary.nesting_depth > 250


@pytest.mark.parametrize("page, depth", [
    (b"<p>x", 3),  # html > body > p
    (b"<html><body><div><!-- a comment is a node --></div></body></html>", 4),
    (b"<html><body><div><!-- c --><p><b><!--d--></b></p></div></body></html>", 6),
    (b"<!-- before --><html><body><svg><g><!--z--></g></svg></body></html>", 5),
    (b"<html><body>" + b"<div>" * 600 + b"x" + b"</div>" * 600 + b"</body></html>", 602),
])
def test_nesting_depth_counts_every_node(page, depth):
    # the depth a page reports: elements and comments below the root, the root at 1
    # (the values are counted by hand from the markup)
    import lxml.html

    from gate.extract.html import max_depth
    parser = lxml.html.HTMLParser(huge_tree=True, remove_comments=False, remove_pis=True)
    assert max_depth(lxml.html.document_fromstring(page, parser=parser)) == depth


def test_short_page_uses_fallback_text():
    result = extract(b"<html><body><p>Closed on 24 December.</p></body></html>", **LIMITS)
    assert result.summary.ok and result.text == "Closed on 24 December."


def test_html_without_text_is_empty():
    assert extract(b"<html><body><script>x=1</script></body></html>",
                   **LIMITS).summary.problem == "empty-text"


def test_xml_entity_expansion_is_not_performed():
    # "billion laughs" (XML 1.0 internal entities): the HTML parser must not expand them.
    bomb = b'<?xml version="1.0"?><!DOCTYPE html [<!ENTITY a "aaaaaaaaaa">' + \
        b"".join(b'<!ENTITY %s "&%s;&%s;&%s;&%s;&%s;&%s;&%s;&%s;&%s;&%s;">' %
                 ((chr(98 + i).encode(),) + (chr(97 + i).encode(),) * 10) for i in range(8)) + \
        b']><html><body><p>&i;</p></body></html>'
    result = extract(bomb, **LIMITS)
    assert result.summary.text_chars < 10_000


# --- PDF ---------------------------------------------------------------------------------------

def test_pdf_text_pages_and_info_dates():
    data = make_pdf(["Quarterly freight volumes rose in the northern valley."],
                    title="Q3 volumes", creation="D:20260901120000Z")
    result = extract(data, **LIMITS)
    s = result.summary
    assert s.ok and s.type == "pdf" and s.pages == 1 and s.title == "Q3 volumes"
    assert "freight volumes" in result.text
    assert ("published", "PDF /CreationDate", "D:20260901120000Z") in \
        {(d.role, d.source, d.text) for d in s.dates}


def test_pdf_page_limit_is_checked_before_extraction():
    data = make_pdf([f"page {i}" for i in range(60)])
    result = extract(data, **LIMITS)
    assert result.summary.problem == "too-many-pages" and result.summary.pages == 60


def test_truncated_pdf_is_broken():
    data = make_pdf(["some text on a page"])
    result = extract(data[: len(data) // 2], **LIMITS)
    assert result.summary.problem in ("broken", "empty-text")


def test_pdf_with_broken_xref_and_garbage_is_reported_not_raised():
    data = make_pdf(["text"]).replace(b"xref", b"xxxx").replace(b"startxref", b"startxxxx")
    result = extract(data, **LIMITS)
    assert result.summary.problem in (None, "broken", "empty-text")  # repaired or reported


def test_pdf_with_user_password_is_encrypted():
    data = make_pdf(["secret text"], user_password="letmein")
    result = extract(data, **LIMITS)
    assert result.summary.problem == "encrypted" and result.summary.encrypted


def test_pdf_with_owner_password_only_is_read():
    # an empty user password: readers open it without asking (library-notes.md 3.4)
    data = make_pdf(["printable text"], owner_password="owner-only")
    result = extract(data, **LIMITS)
    assert result.summary.ok and result.summary.encrypted and "printable text" in result.text


def test_flate_bomb_is_stopped():
    from .helpers import flate_bomb_pdf
    result = extract(flate_bomb_pdf(200_000_000), **LIMITS)
    assert result.summary.problem == "bomb"


def test_pdf_with_html_extension_is_still_a_pdf():
    assert sniff(make_pdf(["x"])).type == "pdf"


def test_zlib_helper_roundtrip():  # sanity of the bomb helper itself
    assert len(zlib.decompress(zlib.compress(b" " * 1000))) == 1000


def test_unreadable_file_gets_a_reason(tmp_path, monkeypatch):
    # Running as root, permissions are not enforced, so the refusal is simulated at the
    # system call the intake makes.
    import gate.intake as intake_mod
    (tmp_path / "secret.txt").write_text("x")

    def refuse(path):
        raise PermissionError(13, "Permission denied", path)

    monkeypatch.setattr(intake_mod, "_open", refuse)
    got = read_entry(tmp_path, Entry(path="secret.txt", kind="file", size=1), 100)
    assert got.problem == "unreadable" and got.detail == "Permission denied"


def test_file_swapped_for_a_link_after_discovery_is_not_followed(tmp_path):
    import os
    (tmp_path / "target.txt").write_text("outside")
    os.symlink(tmp_path / "target.txt", tmp_path / "doc.txt")
    # discovery saw a regular file, but it is a link by the time it is read
    got = read_entry(tmp_path, Entry(path="doc.txt", kind="file", size=7), 100)
    assert got.problem == "not-regular" and got.data is None
