"""E-mail: RFC 5322 messages with MIME parts (.eml) and mbox files of messages.

Parsed with the standard library's ``email`` package (``compat32`` parsing; RFC 2047
encoded words and charsets decoded as the parts are read). The indexed
text is the subject and what a mail client shows: the ``text/plain`` part of each
``multipart/alternative`` (its HTML sibling when there is no plain one), inline text parts,
and forwarded messages (``message/rfc822``). Set apart as hidden pieces for the injection
screen (:mod:`gate.extract.hidden`): the HTML alternative's text that the plain part does
not carry, elements the HTML hides by inline style or the ``hidden`` attribute, its
comments and ``alt``/``title`` text, and text attachments. Other attachments are listed by
name in the metadata, not read.

The ``Date:`` header feeds freshness (converted to ISO 8601; a date without a zone, or
``-0000``, stays zone-less). Encrypted mail (``multipart/encrypted``, S/MIME enveloped data)
cannot be read; a multipart whose closing boundary never comes is a truncated message; MIME
nesting deeper than :data:`MAX_DEPTH` is refused.

An mbox (a sequence of messages, each starting with a ``From `` line; RFC 4155) is read
message by message; :func:`split_mbox` yields them for callers that treat each as its own
document.
"""

from __future__ import annotations

import email
import email.errors
import email.header
import email.policy
import email.utils
import re
from collections.abc import Iterator
from typing import Any

import lxml.etree
import lxml.html

from gate.extract.hidden import Pieces, markup_pieces, visible_text
from gate.extract.model import DateClaim, Extracted, Extraction, Refused, failed
from gate.extract.text import clean_text

MAX_DEPTH = 12
MAX_PARTS = 1_000
MAX_MESSAGES = 10_000
MAX_TEXT = 5_000_000

# RFC 5322 section 2.2: a header field is a name of printable characters except colon.
_FIELD = re.compile(rb"^([!-9;-~]{1,76}):")
_MAIL_FIELDS = {b"from", b"to", b"cc", b"subject", b"date", b"message-id", b"mime-version",
                b"received", b"return-path", b"reply-to", b"delivered-to", b"content-type",
                b"sender", b"in-reply-to", b"references"}
_ANCHOR_FIELDS = {b"from", b"received", b"return-path", b"message-id"}
_MBOX_FROM = re.compile(rb"^From \S+ ")
_MBOX_SPLIT = re.compile(rb"(?:^|\n)(?=From [^\n]*\n)")
_PARSE_ERRORS = (ValueError, LookupError, IndexError, AttributeError, TypeError, KeyError,
                 email.errors.MessageError, UnicodeError, AssertionError)


def sniff_mail(head: bytes) -> str | None:
    """"email" or "mbox" when the bytes begin like a message or an mbox, else None."""
    lines = head[:65536].split(b"\n")
    kind = "email"
    if lines and _MBOX_FROM.match(lines[0]):
        kind = "mbox"
        lines = lines[1:]
    names: set[bytes] = set()
    for line in lines[:200]:
        line = line.rstrip(b"\r")
        if not line:
            break
        if line[:1] in (b" ", b"\t") and names:
            continue
        m = _FIELD.match(line)
        if not m:
            return None
        names.add(m.group(1).lower())
    else:
        if len(lines) > 200:
            return None
    if len(names & _MAIL_FIELDS) >= 2 and names & _ANCHOR_FIELDS:
        return kind
    return None


def split_mbox(data: bytes) -> Iterator[bytes]:
    """The messages of an mbox, ``From `` lines removed and ``>From`` quoting undone."""
    count = 0
    for chunk in _MBOX_SPLIT.split(data):
        if not chunk.strip():
            continue
        first, _, rest = chunk.partition(b"\n")
        if not first.startswith(b"From "):
            rest = chunk
        count += 1
        if count > MAX_MESSAGES:
            return
        yield re.sub(rb"(?m)^>(>*From )", rb"\1", rest)


class _Reader:
    """One walk over a message's MIME tree."""

    def __init__(self) -> None:
        self.parts: list[str] = []
        self.size = 0
        self.pieces = Pieces()
        self.attachments: list[str] = []
        self.count = 0

    def text(self, value: str) -> None:
        if value.strip() and self.size < MAX_TEXT:
            self.parts.append(value.strip())
            self.size += len(value)

    def message(self, msg: Any, depth: int, where: str) -> None:
        subject = _header(msg, "subject")
        if subject:
            self.text(subject)
        self.part(msg, depth, where)

    def part(self, part: Any, depth: int, where: str) -> None:
        self.count += 1
        if self.count > MAX_PARTS:
            return
        if depth > MAX_DEPTH:
            raise Refused("too-deep", f"the message's MIME parts are nested more than "
                                       f"{MAX_DEPTH} levels deep")
        for defect in getattr(part, "defects", ()):
            if isinstance(defect, (email.errors.CloseBoundaryNotFoundDefect,
                                   email.errors.StartBoundaryNotFoundDefect)):
                raise Refused("broken", f"the message is cut off or malformed: "
                                         f"{type(defect).__name__} in {where}")
        ctype = part.get_content_type()
        if ctype == "multipart/encrypted" or (
                ctype in ("application/pkcs7-mime", "application/x-pkcs7-mime") and
                "enveloped" in (part.get_param("smime-type") or "enveloped")):
            raise Refused("encrypted", f"{where} is encrypted ({ctype}), so its text cannot "
                                        "be read")
        if part.is_multipart():
            children = part.get_payload()
            if ctype == "multipart/alternative":
                self.alternative(children, depth, where)
            else:
                for n, child in enumerate(children, 1):
                    self.part(child, depth + 1, f"part {n} of {where}")
            return
        filename = part.get_filename()
        attached = part.get_content_disposition() == "attachment" or filename
        if ctype == "message/rfc822":
            inner = part.get_payload()
            inner = inner[0] if isinstance(inner, list) and inner else inner
            if hasattr(inner, "get_content_type"):
                self.message(inner, depth + 1, f"a forwarded message in {where}")
            return
        if attached:
            name = (filename or ctype)[:200]
            self.attachments.append(name)
            if part.get_content_maintype() == "text":
                self.pieces.add(_content(part), f"the attachment {name!r} in {where}",
                                "attachment")
            return
        if ctype == "text/plain":
            self.text(_content(part))
        elif ctype == "text/html":
            tree = _html(_content(part))
            markup_pieces(tree, self.pieces, f"the HTML part of {where}")
            self.text(visible_text(tree))
        else:
            self.attachments.append(ctype)

    def alternative(self, children: list[Any], depth: int, where: str) -> None:
        plain = next((c for c in children if c.get_content_type() == "text/plain"), None)
        if plain is None:
            for n, child in enumerate(children[-1:], 1):
                self.part(child, depth + 1, where)
            return
        shown = _content(plain)
        self.text(shown)
        seen = " ".join(shown.split())
        for n, child in enumerate(children, 1):
            if child is plain:
                continue
            if child.get_content_type() == "text/html":
                tree = _html(_content(child))
                markup_pieces(tree, self.pieces, f"the HTML part of {where}")
                extra = [line for line in visible_text(tree).split("\n")
                         if line.strip() and " ".join(line.split()) not in seen]
                self.pieces.add("\n".join(extra), f"the HTML alternative of {where}, not in "
                                                  "its plain-text part", "html-part")
            elif child.is_multipart() or child.get_content_maintype() == "text":
                saved = self.parts, self.size
                self.parts, self.size = [], 0
                self.part(child, depth + 1, f"alternative {n} of {where}")
                self.pieces.add("\n".join(self.parts), f"alternative {n} of {where}",
                                "html-part")
                self.parts, self.size = saved


def _content(part: Any) -> str:
    """A leaf part's text: transfer encoding undone, then its declared charset (else UTF-8)."""
    raw = part.get_payload(decode=True) or b""
    if not isinstance(raw, bytes):
        return str(raw)
    try:
        return raw.decode(part.get_content_charset() or "utf-8", errors="replace")
    except LookupError:  # an unknown charset name
        return raw.decode("utf-8", errors="replace")


def _html(markup: str) -> Any:
    if not markup.strip():
        return None
    try:
        return lxml.html.document_fromstring(markup)
    except (lxml.etree.ParserError, ValueError):
        return None


def _header(msg: Any, name: str) -> str:
    """A header's value with RFC 2047 encoded words decoded."""
    try:
        value = msg.get(name)
        if value is None:
            return ""
        text = str(email.header.make_header(email.header.decode_header(str(value))))
    except _PARSE_ERRORS:
        text = str(msg.get(name, ""))
    return " ".join(text.split())[:2000]


def _date(msg: Any) -> DateClaim | None:
    raw = _header(msg, "date")
    if not raw:
        return None
    try:
        parsed = email.utils.parsedate_to_datetime(raw)
    except (TypeError, ValueError, IndexError):
        return DateClaim("published", "e-mail Date: header", raw[:200])
    return DateClaim("published", "e-mail Date: header", parsed.isoformat())


def _read(data: bytes, reader: _Reader, where: str) -> Any:
    # compat32: the structure and the raw headers, decoded here only where needed; the
    # default policy parses every header through its registry on every access, which
    # was most of the time spent on a message
    msg = email.message_from_bytes(data, policy=email.policy.compat32)
    reader.message(msg, 0, where)
    return msg


def extract_mail(data: bytes, kind: str = "email") -> Extraction:
    """Extract one message (``kind`` "email") or every message of an mbox ("mbox")."""
    reader = _Reader()
    dates: list[DateClaim] = []
    meta: dict[str, str] = {}
    title = None
    try:
        messages = list(split_mbox(data)) if kind == "mbox" else [data]
        for number, raw in enumerate(messages, 1):
            where = "the message" if kind == "email" else f"message {number} of the mbox"
            msg = _read(raw, reader, where)
            if number == 1:
                title = _header(msg, "subject") or None
                for name in ("from", "to", "message-id"):
                    if _header(msg, name):
                        meta[name] = _header(msg, name)[:1000]
            claim = _date(msg)
            if claim is not None and (kind == "email" or not dates):
                dates.append(claim)
            elif claim is not None:  # an mbox: its newest message is its modification
                dates[1:] = [DateClaim("modified", claim.source, claim.text)]
    except Refused as err:
        return failed(kind, err.problem, err.detail, encrypted=err.problem == "encrypted")
    except RecursionError:
        return failed(kind, "too-deep", "the message is nested too deeply to be read")
    except _PARSE_ERRORS as err:
        return failed(kind, "broken", f"the message cannot be parsed: {type(err).__name__}: "
                                      f"{str(err)[:200]}")
    if reader.attachments:
        meta["attachments"] = ", ".join(reader.attachments[:50])[:2000]
    text = clean_text("\n\n".join(reader.parts))
    summary = Extracted(type=kind, text_chars=len(text), title=title, dates=tuple(dates),
                        metadata=meta, pages=len(messages) if kind == "mbox" else None)
    extraction = Extraction(summary=summary, text=text, raw=data)
    extraction.extras["hidden"] = reader.pieces.items
    return extraction
