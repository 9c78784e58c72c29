"""PDF documents: text, page count, Info and XMP metadata, annotations, with pypdf.

pypdf has had denial-of-service bugs on crafted files, so this runs only inside a worker
process that the parent kills on a deadline (see :mod:`gate.extract.pool`); here its own
decompression caps are lowered as a first line of defence and the external ``jbig2dec``
binary is switched off, so a PDF never makes pypdf run another program.
"""

from __future__ import annotations

import io
import logging
import re
from typing import Any

import pypdf
from pypdf.errors import DependencyError, FileNotDecryptedError, LimitReachedError, PyPdfError

from gate.extract.model import DateClaim, Extracted, Extraction, failed
from gate.extract.text import clean_text, joined_hyphens
from gate.tokens import words

logging.getLogger("pypdf").setLevel(logging.ERROR)

# Output cap for any one decoded stream. pypdf's own default is 75 MB; a text document's
# content streams are far smaller, and a lower cap makes a decompression bomb fail fast.
STREAM_CAP = 32_000_000
META_KEYS = ("/Title", "/Author", "/Subject", "/Keywords", "/Creator", "/Producer",
             "/CreationDate", "/ModDate")
_XMP_DATE = re.compile(
    r"(xmp|xap):(CreateDate|ModifyDate)\s*(?:=\s*[\"']([^\"']{1,80})[\"']|>\s*([^<]{1,80})<)")
_TAGS = re.compile(r"<[^>]{0,2000}>")
MAX_META_CHARS = 65_536


def _config() -> dict[str, Any]:
    return dict(zlib_maximum_output_length=STREAM_CAP, lzw_maximum_output_length=STREAM_CAP,
                run_length_maximum_output_length=STREAM_CAP,
                brotli_maximum_output_length=STREAM_CAP,
                jbig2_maximum_output_length=STREAM_CAP,
                array_based_stream_maximum_output_length=STREAM_CAP,
                maximum_declared_stream_length=STREAM_CAP,
                jbig2dec_binary=None)


def _text(value: Any) -> str:
    try:
        return str(value)[:MAX_META_CHARS]
    except Exception:  # noqa: BLE001 - a hostile object must not stop extraction
        return ""


def _metadata(reader: pypdf.PdfReader) -> dict[str, str]:
    info = reader.trailer.get("/Info")
    if info is None:
        return {}
    try:
        info = info.get_object()
    except PyPdfError:
        return {}
    if not hasattr(info, "get"):
        return {}
    out: dict[str, str] = {}
    for key in META_KEYS:
        value = info.get(key)
        if value is not None:
            out[key[1:]] = _text(value)
    return out


def _xmp(reader: pypdf.PdfReader) -> str:
    try:
        root = reader.trailer["/Root"].get_object()
        meta = root.get("/Metadata")
        if meta is None:
            return ""
        data = meta.get_object().get_data()
    except (PyPdfError, KeyError, AttributeError, TypeError, ValueError):
        return ""
    return data[:5_000_000].decode("utf-8", errors="replace")


def _annotations(reader: pypdf.PdfReader, pages: int) -> list[dict[str, Any]]:
    found: list[dict[str, Any]] = []
    for number in range(pages):
        try:
            annots = reader.pages[number].get("/Annots")
            annots = annots.get_object() if annots is not None else []
            for ref in annots or []:
                annot = ref.get_object()
                for key in ("/Contents", "/T", "/TU", "/Alt"):
                    value = annot.get(key)
                    if value:
                        found.append({"page": number + 1, "key": key[1:],
                                      "subtype": _text(annot.get("/Subtype", "")),
                                      "text": _text(value)})
        except (PyPdfError, KeyError, AttributeError, TypeError, ValueError):
            continue
        if len(found) > 10_000:
            break
    return found


def _dates(meta: dict[str, str], xmp: str) -> tuple[DateClaim, ...]:
    claims: list[DateClaim] = []
    if meta.get("ModDate"):
        claims.append(DateClaim("modified", "PDF /ModDate", meta["ModDate"][:200]))
    if meta.get("CreationDate"):
        claims.append(DateClaim("published", "PDF /CreationDate", meta["CreationDate"][:200]))
    for m in _XMP_DATE.finditer(xmp):
        value = (m.group(3) or m.group(4) or "").strip()
        if not value:
            continue
        role = "modified" if m.group(2) == "ModifyDate" else "published"
        source = f"XMP {m.group(1)}:{m.group(2)}"
        if not any(c.source == source for c in claims):
            claims.append(DateClaim(role, source, value))
    return tuple(claims)


def extract_pdf(data: bytes, max_pages: int, main_text: str | None = None) -> Extraction:
    """Extract a PDF: check encryption and page count first, then pull the text.

    ``main_text`` is this PDF's text from an earlier extraction of the same bytes: the same
    result, without pulling the text out of every page again (the reader, metadata and
    annotations are still read, for the checks)."""
    try:
        with pypdf.apply_configuration(**_config()):
            return _extract(data, max_pages, main_text)
    except LimitReachedError as err:
        return failed("pdf", "bomb", "a stream of the PDF decompresses past the "
                                     f"{STREAM_CAP:,}-byte cap ({_why(err)})")


def _extract(data: bytes, max_pages: int, main_text: str | None = None) -> Extraction:
    try:
        reader = pypdf.PdfReader(io.BytesIO(data), strict=False)
    except DependencyError as err:
        return failed("pdf", "encrypted", f"the PDF uses encryption gate cannot open ({err})")
    except LimitReachedError:
        raise
    except (PyPdfError, ValueError, KeyError, TypeError, AttributeError, IndexError,
            RecursionError, AssertionError) as err:
        return failed("pdf", "broken", f"the PDF cannot be read: {_why(err)}")
    encrypted = False
    try:
        if reader.is_encrypted:
            encrypted = True
            if reader.decrypt("") == pypdf.PasswordType.NOT_DECRYPTED:
                return failed("pdf", "encrypted",
                              "the PDF is encrypted with a user password, so its text "
                              "cannot be read", encrypted=True)
        pages = len(reader.pages)
    except (FileNotDecryptedError, DependencyError) as err:
        return failed("pdf", "encrypted", f"the PDF is encrypted ({err})", encrypted=True)
    except LimitReachedError:
        raise
    except (PyPdfError, ValueError, KeyError, TypeError, AttributeError, IndexError,
            RecursionError, AssertionError) as err:
        return failed("pdf", "broken", f"the PDF's page tree cannot be read: {_why(err)}")
    try:
        meta = _metadata(reader)
        xmp = _xmp(reader)
    except LimitReachedError:
        raise
    except (PyPdfError, ValueError, KeyError, TypeError, AttributeError, RecursionError):
        meta, xmp = {}, ""
    common = dict(pages=pages, encrypted=encrypted, metadata=meta, dates=_dates(meta, xmp),
                  title=meta.get("Title") or None)
    if pages > max_pages:
        return failed("pdf", "too-many-pages",
                      f"the PDF has {pages} pages (limit {max_pages})", **common)
    if main_text is not None:
        summary = Extracted(type="pdf", text_chars=len(main_text), **common)
        extraction = Extraction(summary=summary, text=main_text, raw=data, reader=reader)
        extraction.extras["xmp"] = _TAGS.sub(" ", xmp)[:MAX_META_CHARS]
        extraction.extras["annotations"] = _annotations(reader, pages)
        return extraction
    texts: list[str] = []
    try:
        for page in reader.pages:
            # decode the content streams first: extract_text swallows the decompression
            # limit and would return "" for a bomb instead of saying what happened
            page.get_contents()
            texts.append(page.extract_text() or "")
    except LimitReachedError:
        raise
    except (PyPdfError, ValueError, KeyError, TypeError, AttributeError, IndexError,
            RecursionError, AssertionError, ZeroDivisionError, OverflowError) as err:
        return failed("pdf", "broken", f"text extraction failed on page {len(texts) + 1}: "
                                       f"{_why(err)}", **common)
    text = joined_hyphens(clean_text("\n\n".join(without_furniture(texts))))
    summary = Extracted(type="pdf", text_chars=len(text), **common)
    extraction = Extraction(summary=summary, text=text, raw=data, reader=reader)
    extraction.extras["xmp"] = _TAGS.sub(" ", xmp)[:MAX_META_CHARS]
    extraction.extras["annotations"] = _annotations(reader, pages)
    extraction.extras["page_texts"] = texts
    return extraction


_DIGITS = re.compile(r"\d+")
# a page number alone ("3", "- 3 -", "Page 3 of 7", "3/7"), or a short line ending in one
# ("Invented Records Office - page 3"): common practice in typesetting
_PAGE_NUMBER = re.compile(r"^\W*(?:page\s+)?\d{1,4}(?:\s*(?:of|/)\s*\d{1,4})?\W*$"
                          r"|\bpage\s+\d{1,4}(?:\s+of\s+\d{1,4})?\W*$", re.IGNORECASE)
# the parts of a footer line such as "Page 3 of 7 | https://example.org/a" or "Invented
# Office  ·  Page 3": split at a bar, a middle dot or a run of spaces
_FOOTER_PARTS = re.compile(r"\s+[|·•\-–—]\s+|\s{2,}")
# the parts of a printed page's header ("Invented Office - Notices - <the title>")
_HEADER_PARTS = re.compile(r"\s+[|·•\-–—:]\s+")
_ADDRESS = re.compile(r"^(?:[a-z][a-z0-9+.-]*://|www\.)\S+$|^\S+@\S+\.\S+$", re.IGNORECASE)
FURNITURE_LINES = 2  # lines at the top and at the bottom of a page that may be furniture
FURNITURE_MAX_WORDS = 8
TITLE_MIN_WORDS = 3  # a title this long repeated at a header's end makes it a header


def without_furniture(texts: list[str]) -> list[str]:
    """Each page's text without its running header and footer: of the first and last
    ``FURNITURE_LINES`` lines of each page, those that recur (digits aside) at the edges
    of at least half the pages (two at least); and a page's very first or last line when
    it is short and is, or ends in, a page number. The same body then gives the same
    words as a PDF and as HTML or text."""
    def edges(lines: list[str]) -> list[int]:
        filled = [i for i, line in enumerate(lines) if line.strip()]
        return sorted(set(filled[:FURNITURE_LINES] + filled[-FURNITURE_LINES:]))

    def key(line: str) -> str:
        return " ".join(_DIGITS.sub("#", line.casefold()).split())

    split = [text.split("\n") for text in texts]
    seen: dict[str, int] = {}
    for lines in split:
        for k in {key(lines[i]) for i in edges(lines)}:
            seen[k] = seen.get(k, 0) + 1
    recurring = max(2, (len(texts) + 1) // 2)
    out = []
    for lines in split:
        ends = edges(lines)
        drop = {i for i in ends if len(texts) >= 2 and seen[key(lines[i])] >= recurring}
        drop |= {i for i in ends[:1] + ends[-1:]  # the very first and last line only
                 if _page_number_line(lines[i])}
        if not out and _title_header(lines, drop):
            drop.add(next(i for i, line in enumerate(lines) if line.strip()))
        out.append("\n".join(line for i, line in enumerate(lines) if i not in drop))
    return out


def _title_header(lines: list[str], drop: set[int]) -> bool:
    """Whether the first page's first line is a printed page's header: parts split by a
    dash or a bar ("Invented Office - Notices - Road closures this week") whose last
    parts are the title the page then starts with, so the header is the site's name
    before the title; a title the header cut short ends in an ellipsis, its last word
    perhaps cut in two ("Invented Office  |  Restoring a narrowboat en...")."""
    filled = [i for i, line in enumerate(lines) if line.strip() and i not in drop]
    if len(filled) < 2 or filled[0] != next(i for i, line in enumerate(lines) if line.strip()):
        return False
    first = lines[filled[0]].strip()
    after = words(" ".join(lines[i] for i in filled[1:4]))
    # the site's name and the title set side by side with no mark between them
    # ("Invented Records Office Road closures this week"), the next line that title alone
    title = words(lines[filled[1]])
    head = words(first)
    if len(title) >= TITLE_MIN_WORDS and len(head) > len(title) and \
            head[len(head) - len(title):] == title:
        return True
    for m in _HEADER_PARTS.finditer(first):
        part = first[m.end():].rstrip()
        cut = part.endswith(("...", "\u2026"))  # a title cut short: "Restoring a narrowb..."
        title = words(part.rstrip(".\u2026"))
        if len(title) < 2 or not words(first[:m.start()]) or len(after) < len(title):
            continue
        # a title cut short at a set width without an ellipsis ("... with roof lante"):
        # three words or more, its last a part of the title's word
        cut = cut or len(title) >= TITLE_MIN_WORDS
        if after[:len(title)] == title or (cut and after[:len(title) - 1] == title[:-1] and
                                           after[len(title) - 1].startswith(title[-1])):
            return True
    return False


def _page_number_line(line: str) -> bool:
    """Whether a line is a page number, ends in one, or is one beside addresses ("Page 1
    of 1 | https://..."), and is short apart from the addresses."""
    parts = [part for part in _FOOTER_PARTS.split(line.strip()) if part]
    rest = [part for part in parts if not _ADDRESS.match(part)]
    if not rest or len(" ".join(rest).split()) > FURNITURE_MAX_WORDS:
        return False
    return any(_PAGE_NUMBER.search(part) for part in rest) if len(rest) < len(parts) \
        else bool(_PAGE_NUMBER.search(line.strip()))


def _why(err: BaseException) -> str:
    text = str(err).strip() or type(err).__name__
    return text[:300]
