"""Encoded payloads: base64, hex, percent-encoding, escape sequences, HTML character
references, quoted-printable and ROT13, decoded and bounded.

Percent-encoding, ``\\uXXXX``/``\\xXX`` escapes, HTML character references and
quoted-printable are found as *runs*: at least :data:`MIN_ESCAPES` escapes, each followed by
at most a few plain characters, so text that is partly encoded ("Ignore%20all%20...") is
decoded whole.

A candidate is decoded only when it could be an encoding of text, and kept only when the
result *is* readable text (valid UTF-8, mostly letters and spaces). Data URIs
(``data:image/png;base64,...``) and armoured blocks (``-----BEGIN PGP ...``, certificates,
keys) are skipped: they are binary by design. The caller scans what is kept with the
wording and exfiltration detectors again, to a fixed depth.

Bounds: at most :data:`MAX_CANDIDATES` candidates per text, :data:`MAX_RUN` characters per
candidate and :data:`MAX_DECODED` decoded characters per document.
"""

from __future__ import annotations

import base64
import binascii
import codecs
import functools
import html
import quopri
import re
from urllib.parse import unquote_to_bytes
from dataclasses import dataclass

MAX_CANDIDATES = 40
MAX_RUN = 16_384
MAX_DECODED = 65_536
MIN_TEXT = 12

_B64 = re.compile(r"(?<![A-Za-z0-9+/=_-])[A-Za-z0-9+/]{20,}={0,2}(?![A-Za-z0-9+/=])|"
                  r"(?<![A-Za-z0-9+/=_-])[A-Za-z0-9_-]{20,}={0,2}(?![A-Za-z0-9_=-])")
_HEX = re.compile(r"(?<![0-9A-Fa-f])(?:[0-9A-Fa-f]{2}){12,}(?![0-9A-Fa-f])|"
                  r"(?<![0-9A-Fa-f])(?:[0-9A-Fa-f]{2}[ :]){11,}[0-9A-Fa-f]{2}(?![0-9A-Fa-f])")
MIN_ESCAPES = 6
_PERCENT = re.compile(r"(?:%[0-9A-Fa-f]{2}[A-Za-z0-9._~+\-]{0,16}){6,}")
_ESCAPES = re.compile(r"(?:\\x[0-9A-Fa-f]{2}){8,}|"
                      r"(?:\\u[0-9A-Fa-f]{4}[^\\\n]{0,12}){6,}")
_ENTITIES = re.compile(r"(?:&#(?:[xX][0-9A-Fa-f]{1,6}|\d{1,7});[^&<\n]{0,12}){6,}")
_QP = re.compile(r"(?:=[0-9A-F]{2}[^=\n]{0,20}|=\r?\n){6,}")
_UESC = re.compile(r"\\u([0-9A-Fa-f]{4})")
_ARMOUR = re.compile(r"-----BEGIN [A-Z0-9 ]{3,40}-----.{0,200000}?-----END [A-Z0-9 ]{3,40}-----",
                     re.S)
MAX_ARMOUR = 20
_ROT13_HINT = re.compile(r"\brot[\s-]?13\b", re.I)


class _Span:
    """A match-like view of a run found inside one whitespace-separated token."""

    __slots__ = ("_text", "_start", "_end")

    def __init__(self, text: str, start: int, end: int):
        self._text, self._start, self._end = text, start, end

    def group(self) -> str:
        return self._text[self._start:self._end]

    def start(self) -> int:
        return self._start

    def end(self) -> int:
        return self._end


# Bytes of the base64 alphabets (standard and URL-safe) -> "a", any other byte -> "x": a
# text holds a run of 20 such characters exactly when its translation holds "a" * 20
# (characters beyond ASCII encode to bytes of 0x80 and over, never in the alphabet).
_B64_CLASSES = bytes(97 if chr(c) in "ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz"
                     "0123456789+/_-" else 120 for c in range(256))


def _long_runs(text: str, pattern: re.Pattern[str]):
    """Matches of ``pattern`` inside tokens of 20 characters or more (cheap on prose).

    Only for a pattern that needs 20 characters of the base64 alphabets in a row (as
    :data:`_B64` does): a text without such a run is passed over without splitting it."""
    if b"a" * 20 not in text.encode("utf-8", "surrogatepass").translate(_B64_CLASSES):
        return
    tokens = text.split()
    if not tokens or max(map(len, tokens)) < 20:
        return
    pos = 0
    n = 0
    for token in tokens:
        if len(token) < 20:
            continue
        at = text.find(token, pos)
        pos = at + len(token)
        for m in pattern.finditer(token):
            n += 1
            if n > 4 * MAX_CANDIDATES:
                return
            yield _Span(text, at + m.start(), at + m.end())


_HEX_CLASSES = bytes(104 if chr(c) in "0123456789abcdefABCDEF" else 115 if c in b" :" else 120
                     for c in range(256))  # hex digit -> "h", separator -> "s", other -> "x"


def _maybe_hex(text: str) -> bool:
    """A run of 24 hex digits, or four pairs with separators (bytes.translate: fast)."""
    data = text.encode("utf-8", "ignore")
    if len(data) - len(data.translate(None, b"0123456789")) < 12:
        return False  # fewer than 12 decimal digits
    classes = data.translate(_HEX_CLASSES)
    return b"h" * 24 in classes or b"hhshhshhshhs" in classes


@dataclass
class Payload:
    encoding: str
    start: int  # span of the encoded run in the text it was found in
    end: int
    text: str  # the decoded text


def readable(data: bytes) -> str | None:
    """The text ``data`` decodes to, if it is readable prose-like text."""
    try:
        text = data.decode("utf-8")
    except UnicodeDecodeError:
        return None
    if len(text) < MIN_TEXT:
        return None
    printable = sum(1 for c in text if c.isprintable() or c in "\n\r\t")
    letters = sum(1 for c in text if c.isalpha() or c == " ")
    spaces = text.count(" ")
    if printable < 0.95 * len(text) or letters < 0.6 * len(text) or spaces < 1:
        return None
    return text


def _skip_ranges(text: str) -> list[tuple[int, int]]:
    ranges: list[tuple[int, int]] = []
    pos = text.find("-----BEGIN ")
    attempts = 0
    while pos >= 0 and attempts < MAX_ARMOUR:
        attempts += 1
        m = _ARMOUR.match(text, pos)
        if m is None:
            pos = text.find("-----BEGIN ", pos + 1)
            continue
        ranges.append((m.start(), m.end()))
        pos = text.find("-----BEGIN ", m.end())
    return ranges


def _inside(pos: int, ranges: list[tuple[int, int]]) -> bool:
    return any(a <= pos < b for a, b in ranges)


# A run hard-wrapped over lines (a PDF's text lines, a mail body at 76 columns): two or more
# consecutive lines that are each one token of an encoding's alphabet, joined before decoding.
_WRAPPED = re.compile(r"^[ \t]*[A-Za-z0-9+/=%\\&#;:,_~.\-]{16,}[ \t]*\r?\n"
                      r"(?:[ \t]*[A-Za-z0-9+/=%\\&#;:,_~.\-]{16,}[ \t]*\r?\n){0,400}"
                      r"[ \t]*[A-Za-z0-9+/=%\\&#;:,_~.\-]{1,}[ \t]*$", re.M)
_WRAP_MARKS = re.compile(r"[0-9A-Za-z+/]{16}|%[0-9A-Fa-f]{2}|=[0-9A-F]{2}|\\[ux]|&#")
MAX_WRAPPED = 20


# What every match of _WRAPPED holds: a line of 16 or more characters of its alphabet and
# the start of the next line. "\n" leads it, so the engine skips to each newline fast; a
# text is searched with "\n" before it, so its first line is a line like the others.
_WRAPPED_GATE = re.compile(r"\n[ \t]*[A-Za-z0-9+/=%\\&#;:,_~.\-]{16,}[ \t]*\r?\n"
                           r"[ \t]*[A-Za-z0-9+/=%\\&#;:,_~.\-]")


def _wrapped(text: str) -> list[tuple[int, int, str]]:
    """(start, end, joined) for each hard-wrapped run of two or more lines."""
    if "\n" not in text or not _WRAPPED_GATE.search("\n" + text):
        return []
    out = []
    for m in _WRAPPED.finditer(text):
        if not _WRAP_MARKS.search(m.group()):
            continue
        lines = [line.strip() for line in m.group().splitlines()]
        # "=" closing a line is a quoted-printable soft break (RFC 2045 §6.7 rule 5); base64
        # pads only its last line
        joined = "".join(line[:-1] if line.endswith("=") else line for line in lines[:-1]) + \
            lines[-1]
        out.append((m.start(), m.end(), joined))
        if len(out) >= MAX_WRAPPED:
            break
    return out


def _may_hold(cue: str, words: set[bytes] | None) -> bool:
    """False when ``words`` (the word tokens of the text's fold) rule out the cue."""
    return words is None or not _CUE_TOKENS[cue].isdisjoint(words)


def find(text: str, budget: list[int], _joined: bool = False,
         words: set[bytes] | None = None) -> list[Payload]:
    """Decoded payloads in ``text``. ``budget`` is ``[decoded characters left]``, shared.

    ``words``, when given, are the word tokens of the fold of ``text``
    (``wording.tokens_of``): the caller has them already, and they let the ROT13 and
    reversed-text readers pass over a text that holds none of their cue words."""
    found: list[Payload] = []
    if budget[0] <= 0:
        return found
    skip = _skip_ranges(text)
    tried = 0
    if not _joined:
        for start, end, joined in _wrapped(text):
            inner = find(joined, budget, _joined=True)
            for p in inner:
                found.append(Payload(p.encoding + " (wrapped over lines)", start, end, p.text))
            if inner:
                skip.append((start, end))  # its lines read one by one decode only pieces

    def keep(encoding: str, start: int, end: int, decoded: str | None) -> None:
        if decoded is None or budget[0] <= 0:
            return
        decoded = decoded[:budget[0]]
        budget[0] -= len(decoded)
        found.append(Payload(encoding, start, end, decoded))

    for m in _long_runs(text, _B64):
        run = m.group()
        start = m.start()
        if tried >= MAX_CANDIDATES:
            break
        if text[max(0, start - 8):start].lower().endswith("base64,") or _inside(start, skip):
            continue
        if not (any(c.isupper() for c in run) and any(c.islower() for c in run)):
            continue
        tried += 1
        body = run[:MAX_RUN].rstrip("=")
        body = body[:len(body) - len(body) % 4] if len(body) % 4 == 1 else body
        padded = body + "=" * (-len(body) % 4)
        try:
            if "-" in body or "_" in body:
                data = base64.urlsafe_b64decode(padded)
            else:
                data = base64.b64decode(padded, validate=True)
        except (binascii.Error, ValueError):
            continue
        keep("base64", start, m.end(), readable(data))
    for m in (_HEX.finditer(text) if _maybe_hex(text) else ()):
        if tried >= MAX_CANDIDATES:
            break
        if _inside(m.start(), skip):
            continue
        tried += 1
        digits = re.sub(r"[ :]", "", m.group()[:MAX_RUN])
        try:
            data = bytes.fromhex(digits)
        except ValueError:
            continue
        keep("hex", m.start(), m.end(), readable(data))
    for pattern, encoding, marker in ((_PERCENT, "percent-encoding", "%"),
                                      (_ESCAPES, "escape sequences", "\\"),
                                      (_ENTITIES, "HTML character references", "&#"),
                                      (_QP, "quoted-printable", "=")):
        if marker not in text:
            continue
        for m in pattern.finditer(text):
            if tried >= MAX_CANDIDATES:
                break
            if _inside(m.start(), skip):
                continue
            tried += 1
            start = m.start()
            if encoding in ("percent-encoding", "quoted-printable"):
                while start > 0 and m.start() - start < 16 and not text[start - 1].isspace() \
                        and text[start - 1] not in "=?&/\"'(":
                    start -= 1  # the plain letters before the first escape
            line_end = text.find("\n", m.end())
            end = min(m.end() + 300, len(text) if line_end < 0 else line_end)
            if m.group().startswith("\\x"):
                end = m.end()
            keep(encoding, start, end, _decode(encoding, text[start:end][:MAX_RUN]))
    if _may_hold("reversed", words) and _REVERSED_CUE.search(text, 0, 200_000):
        for start, end in _reversed_lines(text[:200_000]):
            if tried >= MAX_CANDIDATES:
                break
            tried += 1
            keep("reversed text", start, end, text[start:end][::-1])
    for start, end in (_rot13_lines(text[:200_000]) if _may_hold("rot13", words) else ()):
        if tried >= MAX_CANDIDATES:
            break
        tried += 1
        keep("rot13", start, end, codecs.decode(text[start:end], "rot13"))
    for start, end, plain in _leet_lines(text[:200_000]):
        if tried >= MAX_CANDIDATES:
            break
        tried += 1
        keep("leetspeak", start, end, plain)
    if "rot" in text[:200_000].lower() and _ROT13_HINT.search(text[:200_000]) and \
            not any(p.encoding == "rot13" for p in found):
        for m in _ROT13_HINT.finditer(text[:200_000]):
            if tried >= MAX_CANDIDATES:
                break
            tried += 1
            start = m.end()
            chunk = text[start:start + 2000]
            rotated, plain, _ = _rot13_votes(chunk.lower())
            if rotated > plain:
                # only when the rotated text reads better: plain text after a mention of
                # ROT13 (a lesson, a codec's manual) turns into gibberish and is left
                keep("rot13", start, start + len(chunk), codecs.decode(chunk, "rot13"))
            break
    return found


def markup_references(markup: str, limit: int = 20) -> list[Payload]:
    """Runs of numeric character references in HTML markup that spell readable text in
    plain ASCII letters. A page never needs "&#x54;&#x65;..." for letters it could write
    as they are: the parser decodes them before anyone reads the text, so the indexed text
    shows the words while a filter reading the markup sees none. E-mail addresses written
    this way against harvesters read as no sentence and are not kept."""
    out: list[Payload] = []
    if "&#" not in markup:
        return out
    for n, m in enumerate(_ENTITIES.finditer(markup)):
        if n >= MAX_CANDIDATES or len(out) >= limit:
            break
        run = m.group()[:MAX_RUN]
        decoded = html.unescape(run)
        letters = sum(c.isascii() and c.isalpha() for c in decoded)
        if letters < 0.5 * len(decoded) or " " not in decoded.strip() or "@" in decoded:
            continue
        text = readable(decoded.encode("utf-8", "surrogatepass"))
        if text:
            out.append(Payload("HTML character references", m.start(), m.end(), text))
    return out


# A decoded text that opens by calling an automated reader ("Assistant: ...", "AI helper,
# ..."): encoding hides it from people, so it can only be meant for the model.
_READER_OPENING = re.compile(
    r"\s*(?:(?:dear|note\s+(?:to|for)|attention|for\s+the)\s+)?(?:the\s+)?(?:ai|assistant|"
    r"(?:ai\s+|language\s+)?(?:model|helper|system|agent|assistant)s?|llm|bot|chatbot|"
    r"copilot|summari[sz]er)\s*[:,\u2014-]\s", re.I)
ADDRESSED_WORDS = 6  # words the rest of the decoded text needs


def addressed(decoded: str) -> tuple[int, str] | None:
    """(end of its first sentence, the address) when a decoded payload opens by calling
    an automated reader and goes on for :data:`ADDRESSED_WORDS` words or more."""
    m = _READER_OPENING.match(decoded[:200])
    if not m or len(decoded[m.end():].split()) < ADDRESSED_WORDS:
        return None
    end = decoded.find(".", m.end())
    return (len(decoded) if end < 0 else end + 1), m.group().strip()


# English written backwards: its commonest words reversed ("eht", "dna", "ot", "fo" ...).
_REVERSED = frozenset("eht dna ot fo ni si uoy ruoy rof taht htiw eb siht no sa ta ro yb ti era "
                      "resu eseht lla ton od nehw".split())
_FORWARD = frozenset("the and to of in is you your for that with be this on as at or by it are "
                     "user these all not do when".split())
_REVERSED_CUE_WORDS = ("eht", "dna", "ot", "fo", "uoy", "ruoy", "ni", "si", "lla", "siht", "yas",
                       "htiw", "rof", "taht", "dluohs", "tsum", "nehw", "ton")
_REVERSED_CUE = re.compile(r" (?:" + "|".join(_REVERSED_CUE_WORDS) + ") ")
_LETTERS = re.compile(r"[a-z]+")


# Common English words (from memory: the commonest words of English prose, and the words
# an instruction to a reader uses), and the same words in ROT13 ("gur" = "the", "lbh" = "you").
COMMON = frozenset(_FORWARD | set(
    "a an if any every all from into about before after than instead always never must "
    "should will would can could may might tell say says ask asked answer answering reply "
    "user users reader readers assistant ai model document page pages other my me our us "
    "them they their its include add mention write only now when where what which who how "
    "why there here then so no yes but also just more most some such each first last next "
    "new old one two three ten list show give make take send use using get see know need "
    "needed keep find call like time day people way year good well very much many same "
    "anything everything something nothing else still again over under out up down off "
    "was were been being have has had does did done go going come made said was his her "
    "him she he we i an link links number text words reply summary summarise summarize "
    "recommend describe begin start end answers question questions information instead "
    "before without within while because please free only safe".split()))
_ROT13_COMMON = frozenset(codecs.encode(w, "rot13") for w in COMMON if len(w) > 1) - COMMON
_ROT13_CUE = re.compile(r"\b(?:" + "|".join(sorted(w for w in _ROT13_COMMON if len(w) > 2))
                        + r"|gb|va|vf|bs|ab|vg|jr|ur|zr)\b")
ROT13_MIN = 3  # ROT13 words of common English in one line, at least
# ROT13 English holds one of these almost always ("the", "to", "and", "a", "you" ...).
_ROT13_GATE_WORDS = ("gur", "gb", "naq", "n", "lbh", "lbhe", "bs", "vf", "va", "sbe", "nobhg",
                     "jvgu", "guvf", "nyy")
_ROT13_GATE = re.compile(r" (?:" + "|".join(_ROT13_GATE_WORDS) + ") ")
# The cue words as the word tokens of a folded text (wording.tokens_of): a cue " eht "
# in a text makes "eht" one of the tokens of its fold, so a caller that has the tokens
# lets a text without them pass without searching it.
_CUE_TOKENS = {"reversed": frozenset(w.encode("ascii") for w in _REVERSED_CUE_WORDS),
               "rot13": frozenset(w.encode("ascii") for w in _ROT13_GATE_WORDS)}
_LABEL = re.compile(r"[:\u2014\u2013]\s")  # "Build id: <rot13>", "For the assistant — <rot13>"


def _rot13_votes(lowered: str) -> tuple[int, int, int]:
    """(words of common English once rotated, words of it as they stand, words) of a
    lower-cased text."""
    words = _LETTERS.findall(lowered)
    return (sum(w in _ROT13_COMMON for w in words), sum(w in COMMON for w in words),
            len(words))


def _line_end(text: str, line: int) -> int:
    """Where the line starting at ``line`` ends (its newline, or the end of ``text``)."""
    end = text.find("\n", line)
    return len(text) if end < 0 else end


def _rot13_text(segment: str) -> bool:
    """Does ``segment`` read as common English once rotated, and not as it stands?"""
    rotated, plain, n = _rot13_votes(segment.lower())
    return rotated >= ROT13_MIN and rotated >= 0.25 * n and rotated > 2 * plain


def _rot13_lines(text: str) -> list[tuple[int, int]]:
    """Lines (or the part of a line after a label) written in ROT13 without a hint: at
    least three common English words once rotated, a quarter of its words, and more than
    twice as many as it has as it stands."""
    if not _ROT13_GATE.search(text):
        return []
    lowered = text.lower()
    cues: dict[int, set[str]] = {}
    for n, m in enumerate(_ROT13_CUE.finditer(lowered)):
        if n > 4000:
            break
        line = lowered.rfind("\n", 0, m.start()) + 1
        cues.setdefault(line, set()).add(m.group())
    out: list[tuple[int, int]] = []
    for line, seen in cues.items():
        if len(seen) < 2:
            continue
        end = lowered.find("\n", line)
        end = len(text) if end < 0 else end
        at = -1
        for label in list(_LABEL.finditer(lowered, line, end))[:4]:
            rotated, plain, _ = _rot13_votes(lowered[line:label.start()])
            if _rot13_text(lowered[label.end():end]) and rotated <= plain:
                at = label.end()  # a plain label ("Build id:") before the rotated text
                break
        if at < 0 and _rot13_text(lowered[line:end]):
            at = line
        if at < 0:
            continue
        body = text[at:end]
        lead = len(body) - len(body.lstrip())
        out.append((at + lead, at + len(body.rstrip())))
        if len(out) >= 5:
            break
    return out


# Leetspeak: letters written as digits or symbols ("7h15 d0cum3n7 5up3r53d35 4ll ...").
_LEET_I = str.maketrans({"0": "o", "1": "i", "3": "e", "4": "a", "5": "s", "7": "t",
                         "8": "b", "@": "a", "$": "s", "|": "l", "!": "i", "+": "t"})
_LEET_L = str.maketrans({"1": "l", "!": "l", "|": "l"})
_LEET_WORD = re.compile(r"[A-Za-z0-9@$|!+]*[0-9@$|!+][A-Za-z0-9@$|!+']*")
_LEET_CUE = re.compile(r"(?<![\w.,:/-])(?=[a-z0-9@$]*[a-z])(?=[a-z@$]*[013457])"
                       r"[a-z0-9@$]{2,20}(?![\w/-])", re.I)
LEET_MIN = 3  # leet words in one line, at least
# A digit read as a letter before a letter ("7h", "0c", "3n"): every leet word of two
# letters or more has one; a pattern that opens with digits is cheap to search.
_LEET_PAIR = re.compile(r"[013457][A-Za-z]")


def _leet_word(token: str) -> str:
    """A token read with digits as letters; "1" as "l" when that makes a common word."""
    plain = token.lower().translate(_LEET_I)
    if plain not in COMMON:
        other = token.lower().translate(_LEET_L).translate(_LEET_I)
        if other in COMMON:
            return other
    return plain


# _LEET_PAIR by bytes: its digits -> "d", ASCII letters -> "l", any other byte -> "x"; a
# text holds a pair exactly when its translation holds "dl" (bytes.find is far quicker
# than a regular-expression scan of a long text).
_LEET_PAIR_CLASSES = bytes(100 if c in b"013457" else 108 if chr(c).isascii() and
                           chr(c).isalpha() else 120 for c in range(256))


def _leet_lines(text: str) -> list[tuple[int, int, str]]:
    """Lines in leetspeak: at least three tokens mixing letters with digits read as letters,
    making up at least a third of the line's words, at least three of them reading as words
    and two of those common English words (a part number or a version list reads as none)."""
    if b"dl" not in text.encode("utf-8", "surrogatepass").translate(_LEET_PAIR_CLASSES):
        return []
    pairs: dict[int, int] = {}
    for n, m in enumerate(_LEET_PAIR.finditer(text)):
        if n > 4000:
            break
        line = text.rfind("\n", 0, m.start()) + 1
        pairs[line] = pairs.get(line, 0) + 1
    lines: dict[int, int] = {}
    for line, count in pairs.items():
        if count >= 2:
            lines[line] = len(_LEET_CUE.findall(text, line, _line_end(text, line)))
    out: list[tuple[int, int, str]] = []
    for line, count in lines.items():
        if count < 2:
            continue
        end = _line_end(text, line)
        body = text[line:end]
        tokens = re.findall(r"[\w@$|!+']+", body)
        leet = [t for t in tokens if _LEET_WORD.fullmatch(t) and not t.isdigit() or
                t in ("4", "1")]
        if len(leet) < LEET_MIN or len(leet) < len(tokens) / 3:
            continue
        read = [_leet_word(t) for t in leet]
        words = [w for w in read if len(w) > 1 and w.replace("'", "").isalpha()]
        if sum(len(w) > 2 for w in words) < LEET_MIN or sum(w in COMMON for w in words) < 2:
            continue  # digits that read as no words: part numbers, versions, hashes
        label = _LABEL.search(body[:60])
        if label and not _LEET_CUE.search(body, 0, label.start()):
            line, body = line + label.end(), body[label.end():]  # a plain label ("Ref: ")
        plain = _LEET_WORD.sub(lambda m: m.group() if m.group().isdigit() and
                               len(m.group()) > 2 else _leet_word(m.group()), body)
        lead = len(body) - len(body.lstrip())
        out.append((line + lead, line + len(body.rstrip()), plain.strip()))
        if len(out) >= 5:
            break
    return out


@functools.lru_cache(maxsize=1)
def _reversed_words() -> frozenset[str]:
    """The common words (:data:`COMMON`) written backwards, less those that read as a
    common word either way ("on"/"no", "saw"/"was")."""
    return _REVERSED | (frozenset(w[::-1] for w in COMMON if len(w) > 2) - COMMON)


def _reversed_lines(text: str) -> list[tuple[int, int]]:
    """Lines (or the part of a line after a label, "Ref: .ylno hctuD ...") of English
    written backwards: at least three reversed common words (or one, when the line starts
    with a full stop and ends with a capital), more than forwards, and at least 15 % of
    the line's words."""
    out: list[tuple[int, int]] = []
    at = 0
    backwards = _reversed_words()
    for line in text.split("\n"):
        start, at = at, at + len(line) + 1
        if not 20 <= len(line) <= 2000 or " " not in line:
            continue
        label = _LABEL.search(line[:60])
        if label and line[label.end():].lstrip()[:1] in ".!?":
            start, line = start + label.end(), line[label.end():]
        words = _LETTERS.findall(line.lower())
        # two-letter words ("si", "ni", "on") are Spanish, French or Italian as often
        back = sum(len(w) > 2 and w in backwards or w.startswith("gni") for w in words)
        body = line.strip()
        # A sentence turned round starts with its full stop and ends with its capital.
        turned = body[:1] in ".!?" and body[-1:].isupper() and body[-2:-1].islower()
        if (back >= 3 or turned and back >= 1) and back >= 0.15 * len(words) and \
                back > sum(w in COMMON for w in words):
            lead = len(line) - len(line.lstrip())
            out.append((start + lead, start + len(line.rstrip())))
            if len(out) >= 5:
                break
    return out


def _decode(encoding: str, run: str) -> str | None:
    """The readable text an escaped run stands for, or None."""
    try:
        if encoding == "percent-encoding":
            return readable(unquote_to_bytes(run.replace("+", " ")))
        if encoding == "HTML character references":
            return readable(html.unescape(run).encode("utf-8", "surrogatepass"))
        if encoding == "quoted-printable":
            return readable(quopri.decodestring(run.encode("ascii", "ignore")))
        if run.startswith("\\x"):
            return readable(bytes.fromhex(re.sub(r"\\x", "", run)))
        text = _UESC.sub(lambda m: chr(int(m.group(1), 16)), run)
        return readable(text.encode("utf-16", "surrogatepass").decode("utf-16", "replace")
                        .encode("utf-8", "replace"))
    except (ValueError, UnicodeError):
        return None
