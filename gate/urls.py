"""URL parsing and normalisation per RFC 3986 (with RFC 3987 IRIs and IDNA hosts).

The source check compares URLs only after normalising them the way RFC 3986 section 6
describes, so that spelling tricks (``HTTP://Docs.Example.ORG:443/a/./b/../c``,
``%7E``-style escapes, full-width dots) neither slip past a deny rule nor fall out of an
allow rule. Anything the grammar does not allow (spaces, backslashes, control characters,
broken percent escapes, bad ports) is rejected with a named problem rather than guessed at,
because the gate never fetches and must not second-guess what a crawler meant.
"""

from __future__ import annotations

import functools
import ipaddress
import re
from dataclasses import dataclass

import idna

# RFC 3986 Appendix B: the regular expression that splits any URI reference.
_SPLIT = re.compile(r"^(([^:/?#]+):)?(//([^/?#]*))?([^?#]*)(\?([^#]*))?(#(.*))?\Z", re.S)
_SCHEME = re.compile(r"^[A-Za-z][A-Za-z0-9+.-]*\Z")
_UNRESERVED = frozenset("ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-._~")
# RFC 3986 section 2: unreserved, reserved (gen-delims and sub-delims) and "%".
_ALLOWED_ASCII = _UNRESERVED | frozenset(":/?#[]@!$&'()*+,;=%")
_HEX = frozenset("0123456789abcdefABCDEF")
MAX_HOST = 253  # characters of a DNS name in text form, RFC 1035 section 2.3.4 (255 octets)
MAX_LABEL = 63  # octets of one label, RFC 1035 section 2.3.4
MAX_HOST_INPUT = 4 * MAX_HOST * 3  # raw host text, room for percent-escaped Unicode
_LABEL = re.compile(r"^[a-z0-9_](?:[a-z0-9_-]{0,61}[a-z0-9_])?\Z")

DEFAULT_PORTS = {"http": 80, "https": 443, "ftp": 21, "ws": 80, "wss": 443}


class URLProblem(ValueError):
    """A URL that cannot be normalised; ``kind`` names what is wrong."""

    def __init__(self, kind: str, message: str):
        super().__init__(message)
        self.kind = kind


@dataclass(frozen=True)
class URL:
    """A normalised absolute URL. ``host`` is lower-case ASCII (A-labels for IDNs)."""

    scheme: str
    userinfo: str | None
    host: str | None
    port: int | None
    path: str
    query: str | None
    fragment: str | None

    def __str__(self) -> str:
        # RFC 3986 section 5.3, component recomposition.
        out = [self.scheme, ":"]
        if self.host is not None:
            out.append("//")
            if self.userinfo is not None:
                out.append(self.userinfo + "@")
            out.append(self.host)
            if self.port is not None:
                out.append(f":{self.port}")
        out.append(self.path)
        if self.query is not None:
            out.append("?" + self.query)
        if self.fragment is not None:
            out.append("#" + self.fragment)
        return "".join(out)

    def segments(self) -> list[str]:
        """Path segments after the leading slash (``/a/b/`` gives ``['a', 'b', '']``)."""
        return self.path[1:].split("/") if self.path.startswith("/") else self.path.split("/")


def _is_ipv4(host: str) -> bool:
    try:
        ipaddress.IPv4Address(host)
    except ValueError:
        return False
    return True


def remove_dot_segments(path: str) -> str:
    """RFC 3986 section 5.2.4, step by step as the RFC writes it."""
    inp = path
    out: list[str] = []
    while inp:
        if inp.startswith("../"):  # A
            inp = inp[3:]
        elif inp.startswith("./"):
            inp = inp[2:]
        elif inp.startswith("/./"):  # B
            inp = "/" + inp[3:]
        elif inp == "/.":
            inp = "/"
        elif inp.startswith("/../"):  # C
            inp = "/" + inp[4:]
            if out:
                out.pop()
        elif inp == "/..":
            inp = "/"
            if out:
                out.pop()
        elif inp in (".", ".."):  # D
            inp = ""
        else:  # E: move the first segment (with its leading "/", if any) to the output
            start = 1 if inp.startswith("/") else 0
            cut = inp.find("/", start)
            if cut == -1:
                cut = len(inp)
            out.append(inp[:cut])
            inp = inp[cut:]
    return "".join(out)


def _split(ref: str) -> tuple[str | None, str | None, str, str | None, str | None]:
    m = _SPLIT.match(ref)
    assert m is not None  # the Appendix B expression matches every string
    return m.group(2), m.group(4) if m.group(3) else None, m.group(5), \
        m.group(7) if m.group(6) else None, m.group(9) if m.group(8) else None


def _iri_to_uri(text: str) -> str:
    """RFC 3987 section 3.1: percent-encode the UTF-8 of non-ASCII characters."""
    return "".join(ch if ord(ch) < 128 else "".join(f"%{b:02X}" for b in ch.encode("utf-8"))
                   for ch in text)


def _check_chars(text: str, part: str) -> None:
    for ch in text:
        if ord(ch) >= 128:
            continue  # IRI characters are converted, not rejected
        if ch not in _ALLOWED_ASCII:
            shown = {" ": "a space", "\\": "a backslash"}.get(ch, f"U+{ord(ch):04X}")
            raise URLProblem("syntax", f"the {part} contains {shown}, which RFC 3986 "
                                       "does not allow in a URL")


def normalize_percent(text: str) -> str:
    """RFC 3986 sections 6.2.2.1 and 6.2.2.2: upper-case escapes, decode unreserved ones."""
    out: list[str] = []
    i = 0
    while i < len(text):
        ch = text[i]
        if ch == "%":
            hexpart = text[i + 1:i + 3]
            if len(hexpart) != 2 or not set(hexpart) <= _HEX:
                raise URLProblem("syntax", f"broken percent-escape {text[i:i + 3]!r}")
            decoded = chr(int(hexpart, 16))
            out.append(decoded if decoded in _UNRESERVED else "%" + hexpart.upper())
            i += 3
        else:
            out.append(ch)
            i += 1
    return "".join(out)


def _percent_decode_utf8(text: str) -> str:
    raw = bytearray()
    i = 0
    while i < len(text):
        if text[i] == "%":
            raw.append(int(text[i + 1:i + 3], 16))
            i += 3
        else:
            raw.extend(text[i].encode("utf-8"))
            i += 1
    try:
        return raw.decode("utf-8")
    except UnicodeDecodeError as err:
        raise URLProblem("host", "the host contains percent-escapes that are not UTF-8") from err


@functools.lru_cache(maxsize=4096)  # a batch's documents come from a few hosts
def normalize_host(host: str) -> str:
    """Lower-case ASCII host: IDNA 2008 (UTS 46 mapping) for names, canonical IP literals."""
    if host.startswith("["):
        if not host.endswith("]"):
            raise URLProblem("host", f"unterminated IP literal {host!r}")
        inner = host[1:-1]
        try:
            return "[" + ipaddress.IPv6Address(inner).compressed + "]"
        except ValueError as err:
            raise URLProblem("host", f"invalid IPv6 literal {host!r}") from err
    if len(host) > MAX_HOST_INPUT:  # refuse early: no decoding or IDNA work on it
        raise URLProblem("host", f"the host is {len(host):,} characters long; a DNS name "
                                 f"has at most {MAX_HOST} (RFC 1035)")
    name = _percent_decode_utf8(host) if "%" in host else host
    if name.endswith("."):
        name = name[:-1]  # the DNS root: "example.org." names the same host
    if not name:
        raise URLProblem("host", "the URL has an empty host")
    if name.isascii():
        name = name.lower()
        if _is_ipv4(name):
            return name
        labels = name.split(".")
        for label in labels:
            if label.startswith("xn--"):
                _idna(label)  # validates the A-label
            elif not _LABEL.match(label):
                raise URLProblem("host", f"{_short(host)!r} is not a valid host name "
                                         f"(label {_short(label)!r})")
        return _dns_length(name)
    return _dns_length(_idna(name))


def _short(text: str, keep: int = 80) -> str:
    """A hostile value cut for a message (a finding must not carry 96 KB)."""
    return text if len(text) <= keep else f"{text[:keep]}... ({len(text):,} characters)"


def _dns_length(name: str) -> str:
    """``name`` (ASCII, no trailing dot) if it fits RFC 1035 section 2.3.4: at most 63
    octets a label and 253 characters in all (255 octets on the wire)."""
    if len(name) > MAX_HOST:
        raise URLProblem("host", f"the host is {len(name):,} characters long; a DNS name "
                                 f"has at most {MAX_HOST} (RFC 1035)")
    for label in name.split("."):
        if len(label) > MAX_LABEL:
            raise URLProblem("host", f"the host label {_short(label)!r} is {len(label)} "
                                     f"characters long; a DNS label has at most {MAX_LABEL} "
                                     "(RFC 1035)")
    return name


def _idna(name: str) -> str:
    try:
        return idna.encode(name, uts46=True).decode("ascii")
    except (idna.IDNAError, UnicodeError) as err:
        raise URLProblem("host", f"{_short(name)!r} is not a valid internationalised host "
                                 f"name ({err})") from err


def parse(text: str) -> URL:
    """Parse and normalise an absolute URL (RFC 3986 section 6.2.2 and 6.2.3).

    Raises :class:`URLProblem` for anything that is not a well-formed absolute URL.
    """
    if not isinstance(text, str) or not text:
        raise URLProblem("syntax", "the URL is empty")
    if text != text.strip():
        raise URLProblem("syntax", "the URL has leading or trailing white space")
    scheme, authority, path, query, fragment = _split(text)
    if scheme is None:
        raise URLProblem("syntax", "the URL has no scheme (it is not absolute)")
    if not _SCHEME.match(scheme):
        raise URLProblem("scheme", f"{scheme!r} is not a valid URL scheme")
    scheme = scheme.lower()
    for part, value in (("path", path), ("query", query), ("fragment", fragment),
                        ("authority", authority)):
        if value is not None:
            _check_chars(value, part)

    userinfo = host = None
    port: int | None = None
    if authority is not None:
        rest = authority
        if "@" in rest:
            userinfo, _, rest = rest.rpartition("@")
            userinfo = normalize_percent(_iri_to_uri(userinfo))
        hostpart, portpart = rest, None
        if rest.startswith("["):
            close = rest.find("]")
            if close == -1:
                raise URLProblem("host", "unterminated IP literal")
            hostpart, tail = rest[:close + 1], rest[close + 1:]
            if tail:
                if not tail.startswith(":"):
                    raise URLProblem("host", f"unexpected {tail!r} after the IP literal")
                portpart = tail[1:]
        elif ":" in rest:
            hostpart, _, portpart = rest.rpartition(":")
        if portpart:
            if not portpart.isdigit() or not portpart.isascii():
                raise URLProblem("port", f"port {portpart!r} is not a number")
            port = int(portpart)
            if port > 65535:
                raise URLProblem("port", f"port {port} is out of range")
        if ":" in hostpart and not hostpart.startswith("["):
            raise URLProblem("host", f"host {hostpart!r} contains a colon")
        host = normalize_host(hostpart) if hostpart else None
        if host is None and scheme in DEFAULT_PORTS:
            raise URLProblem("host", f"a {scheme} URL needs a host")
        if port is not None and DEFAULT_PORTS.get(scheme) == port:
            port = None  # 6.2.3: the default port is the same as none
    elif scheme in DEFAULT_PORTS:
        raise URLProblem("host", f"a {scheme} URL needs '//' and a host")

    path = normalize_percent(_iri_to_uri(path))
    if authority is not None or path.startswith("/"):
        path = remove_dot_segments(path)
    if authority is not None and path == "" and scheme in DEFAULT_PORTS:
        path = "/"  # 6.2.3: an empty path is "/" for http(s)
    if query is not None:
        query = normalize_percent(_iri_to_uri(query))
    if fragment is not None:
        fragment = normalize_percent(_iri_to_uri(fragment))
    return URL(scheme, userinfo, host, port, path, query, fragment)


def host_matches(host: str, domain: str, subdomains: bool) -> bool:
    """True when ``host`` is ``domain`` or, with ``subdomains``, a name below it.

    Both are normalised names. Matching is on whole labels, never on string prefixes or
    suffixes: ``docs.example.org.evil.test`` and ``docs-example.org`` do not match
    ``docs.example.org``.
    """
    if host == domain:
        return True
    return subdomains and host.endswith("." + domain)


def prefix_matches(url: URL, prefix: URL) -> bool:
    """True when ``url`` lies under ``prefix`` on path-segment boundaries.

    Scheme, host and port must be equal; the prefix's path segments must be the first
    segments of the URL's path (``/public`` covers ``/public`` and ``/public/x`` but not
    ``/publicity``). Query and fragment are not compared.
    """
    if (url.scheme, url.host, url.port) != (prefix.scheme, prefix.host, prefix.port):
        return False
    want = prefix.segments()
    if want and want[-1] == "":
        want = want[:-1]  # a trailing slash in the prefix adds no segment
    have = url.segments()
    return have[:len(want)] == want
