"""format: can the document be read as what it claims to be, within the limits?

Always on. Holds entries that are not regular files (links are never followed), files that
cannot be read, empty files, content gate does not read (images, archives, executables,
other XML), text in no detectable encoding, broken or encrypted PDFs, PDFs over
``limits.max_pages``, files over ``limits.max_bytes``, HTML nested deeper than
``limits.max_nesting`` (or office, e-book and mail documents nested beyond their parsers'
bounds), decompression bombs (a PDF stream or a ZIP container inflating past its caps),
documents whose extraction ran out of CPU time (``limits.timeout_s``; CPU time, so the load
of the machine does not matter) or memory (``limits.memory_mb``) or crashed its worker, and
documents with no text after extraction. Those mean the document could not be evaluated,
so they always quarantine, whatever ``format.action`` says.

Two findings are softer and follow ``format.action``: the file name's extension promising
another type than the content (``report.pdf`` that is HTML), and an HTML page whose declared
charset does not decode it. ``format.allowed_types`` narrows the accepted types.

Example::

    limits:
      max_bytes: 20000000
      max_pages: 500
      timeout_s: 30
    format:
      allowed_types: [html, pdf]
      action: warn
"""

from __future__ import annotations

from typing import Any, Literal

from pydantic import Field

from gate.checks.base import Document, DocumentCheck, RunContext
from gate.extract import TYPES
from gate.extract.sniff import expected_type
from gate.findings import Finding, define
from gate.settings import Section, Strict

NOT_REGULAR = define("format.not-regular", "not a regular file (link, FIFO, device...)",
                     "the entry is {what}; only regular files are documents, and links are "
                     "never followed", fail_closed=True)
UNREADABLE = define("format.unreadable", "the file cannot be read",
                    "the file cannot be read: {error}", fail_closed=True)
EMPTY_FILE = define("format.empty-file", "the file is empty",
                    "the file is empty (0 bytes)", fail_closed=True)
UNSUPPORTED = define("format.unsupported", "content of a type gate does not read",
                     "{detail}", fail_closed=True)
UNDECODABLE = define("format.undecodable", "text in no detectable character encoding",
                     "{detail}", fail_closed=True)
BROKEN = define("format.broken", "the file is damaged or malformed", "{detail}",
                fail_closed=True)
ENCRYPTED = define("format.encrypted", "an encrypted document that cannot be opened",
                   "{detail}",
                   fail_closed=True)
TOO_LARGE = define("format.too-large", "larger than limits.max_bytes",
                   "the file has {size} bytes, more than limits.max_bytes {max_bytes}",
                   fail_closed=True)
TOO_MANY_PAGES = define("format.too-many-pages", "more pages than limits.max_pages",
                        "{detail}", fail_closed=True)
TOO_DEEP = define("format.too-deep", "HTML nested deeper than limits.max_nesting",
                  "{detail}", fail_closed=True)
BOMB = define("format.bomb", "a stream decompresses past the safety cap", "{detail}",
              fail_closed=True)
TIMEOUT = define("format.timeout", "processing used more than limits.timeout_s of CPU time",
                 "processing the document used more than limits.timeout_s ({timeout_s} s) of "
                 "CPU time, or hung, and was stopped", fail_closed=True)
MEMORY = define("format.memory", "processing needed more than limits.memory_mb",
                "processing the document needed more memory than limits.memory_mb "
                "({memory_mb} MiB) and was stopped", fail_closed=True)
CRASHED = define("format.crashed", "the parser crashed on the document",
                 "processing the document crashed its worker process ({detail})",
                 fail_closed=True)
EMPTY_TEXT = define("format.empty-text", "no text after extraction", "{detail}",
                    fail_closed=True)
TYPE_MISMATCH = define("format.type-mismatch", "the extension promises another type",
                       "the name promises {expected} but the content is {actual}")
TYPE_NOT_ALLOWED = define("format.type-not-allowed", "a type format.allowed_types leaves out",
                          "the document is {type}; format.allowed_types is {allowed}")
CHARSET_MISMATCH = define("format.charset-mismatch", "the declared charset is wrong",
                          "the page declares charset {declared} but is not valid {declared}; "
                          "it was decoded as {used}, so check the text for garbling")

_BY_PROBLEM = {"empty-file": EMPTY_FILE, "unsupported": UNSUPPORTED,
               "undecodable": UNDECODABLE, "broken": BROKEN, "encrypted": ENCRYPTED,
               "too-many-pages": TOO_MANY_PAGES, "too-deep": TOO_DEEP, "bomb": BOMB,
               "empty-text": EMPTY_TEXT}
_KIND_WORDS = {"symlink": "a symbolic link", "fifo": "a named pipe (FIFO)",
               "socket": "a socket", "block-device": "a block device",
               "char-device": "a character device", "unreadable-dir":
               "a directory that cannot be listed", "other": "not a regular file"}


class LimitsSettings(Strict):
    """Resource limits per document; they always apply."""

    max_bytes: int = Field(20_000_000, ge=1, le=1 << 30, description="Largest file size on "
                           "disk, bytes (at most 1 GiB: the file is held in memory).")
    max_pages: int = Field(500, ge=1, le=100_000, description="Most pages a PDF may have.")
    timeout_s: float = Field(30, gt=0, le=3600, description="CPU time allowed to extract "
                             "and measure one document, seconds (elapsed time may be 4 times "
                             "this plus 5 s, so a busy machine does not change decisions).")
    memory_mb: int = Field(1024, ge=64, le=1 << 20, description="Memory one document may "
                           "use while it is extracted, MiB (on top of the worker's baseline).")
    max_nesting: int = Field(250, ge=16, le=2000, description="Deepest HTML element "
                             "nesting read; deeper pages are held.")


class FormatSettings(Section):
    """Which document types are accepted; the action for the softer findings."""

    allowed_types: tuple[Literal[TYPES], ...] = Field(  # type: ignore[valid-type]
        TYPES, min_length=1, description="Document types accepted.")


def evaluate(document: Document, policy: Any, run: RunContext) -> list[Finding]:
    limits: LimitsSettings = policy.limits
    settings: FormatSettings = policy.format or FormatSettings()
    ex = document.extracted
    if document.kind != "file":
        what = _KIND_WORDS.get(document.kind, document.kind)
        if document.link_target is not None:
            what += f" to {document.link_target!r}"
        if document.kind == "unreadable-dir":
            return [UNREADABLE(error=f"it is {what}")]
        return [NOT_REGULAR(what=what, kind=document.kind, target=document.link_target)]
    findings: list[Finding] = []
    if document.size is not None and document.size > limits.max_bytes:
        findings.append(TOO_LARGE(size=document.size, max_bytes=limits.max_bytes))
    problem = ex.problem
    if problem == "unreadable" or problem == "not-regular":
        findings.append(UNREADABLE(error=ex.problem_detail))
    elif problem == "timeout":
        findings.append(TIMEOUT(timeout_s=limits.timeout_s))
    elif problem == "memory":
        findings.append(MEMORY(memory_mb=limits.memory_mb))
    elif problem == "crashed":
        findings.append(CRASHED(detail=ex.problem_detail))
    elif problem in _BY_PROBLEM:
        findings.append(_BY_PROBLEM[problem](detail=ex.problem_detail))
    if ex.type is not None:
        promised = expected_type(document.path)
        if promised is not None and promised != ex.type:
            findings.append(TYPE_MISMATCH(expected=promised, actual=ex.type))
        if ex.type not in settings.allowed_types:
            findings.append(TYPE_NOT_ALLOWED(type=ex.type,
                                             allowed=", ".join(settings.allowed_types)))
    if ex.charset_mismatch:
        findings.append(CHARSET_MISMATCH(declared=ex.declared_charset, used=ex.encoding))
    return findings


CHECK = DocumentCheck(id="format", section="format", always_on=True, evaluate=evaluate,
                      settings=FormatSettings, doc=__doc__ or "")
