"""source: is the document from a place the policy trusts?

The manifest's ``source_url`` is parsed and normalised (RFC 3986 section 6, IDNA hosts; see
:mod:`gate.urls`) and compared with the policy's rules:

* ``sources.deny`` first: a deny rule names a domain (the host and every name below it),
  a URL prefix or an inbox path prefix. Deny beats allow.
* then ``sources.allow``, first matching rule wins: ``domain`` matches the exact host
  (``subdomains: true`` admits any depth of names below it) for the listed ``schemes``;
  ``url_prefix`` matches on path-segment boundaries after normalisation; ``path`` matches
  the inbox path of documents that have no ``source_url``.
* with ``require_provenance: true`` (the default) a document matching no allow rule is held.

Hosts are compared on whole labels, never as strings, so ``docs.example.org.evil.test`` and
``docs-example.org`` do not pass for ``docs.example.org``. A URL with user information
(``https://docs.example.org@evil.test/``) is held: RFC 3986 section 7.6 describes exactly this
trick for making one host look like another. The document's own claims (canonical URL,
``og:url``) are never used for provenance: a page can claim anything.

Example::

    sources:
      allow:
        - domain: docs.example.org
          subdomains: true
          trust: 3
        - url_prefix: https://wiki.example.org/public/
        - path: local/
      deny:
        - domain: paste.example.net
      require_provenance: true
"""

from __future__ import annotations

from dataclasses import dataclass
from functools import lru_cache
from typing import Annotated, Any, Union

from pydantic import Discriminator, Field, Tag, field_validator

from gate import redact, signing, urls
from gate.checks.base import Document, DocumentCheck, RunContext, once_per_document
from gate.findings import Finding, define
from gate.manifest import normalize_path
from gate.settings import Section, Strict

DENIED = define("source.denied", "the source is on the deny list",
                "{what} is denied by sources.deny[{rule}] ({rule_text})")
UNLISTED = define("source.unlisted", "the source URL matches no allow rule",
                  "source {url} matches no sources.allow rule")
NO_SOURCE = define("source.missing", "no source URL and no allowed inbox path",
                   "the document has no source_url in the manifest and its path matches no "
                   "sources.allow path rule")
BAD_URL = define("source.bad-url", "the source URL is malformed",
                 "source_url {url!r} cannot be used: {problem}")
USERINFO = define("source.userinfo", "the source URL carries user information",
                  "source_url {url!r} has user information before '@'; the host is really "
                  "{host!r} (a classic way to make one host look like another)")

UNMATCHED_TRUST = 0


def _domain(value: str) -> str:
    if not isinstance(value, str) or not value or "/" in value or ":" in value or \
            "@" in value:
        raise ValueError(f"{value!r} is not a domain name (write just the host, such as "
                         "docs.example.org)")
    try:
        return urls.normalize_host(value)
    except urls.URLProblem as err:
        raise ValueError(str(err)) from None


def _prefix(value: str) -> str:
    shown = redact.text(value)
    try:
        parsed = urls.parse(value)
    except urls.URLProblem as err:
        raise ValueError(f"{shown!r} is not a usable URL prefix: {err}") from None
    if parsed.host is None:
        raise ValueError(f"{shown!r} has no host")
    if parsed.query is not None or parsed.fragment is not None:
        raise ValueError(f"{shown!r}: a URL prefix must not have a query or fragment")
    if parsed.userinfo is not None:
        raise ValueError(f"{shown!r}: a URL prefix must not have user information")
    return str(parsed)


def _path(value: str) -> str:
    norm = normalize_path(value)
    if norm is None:
        raise ValueError(f"{value!r} is not a path relative to the inbox")
    return norm + "/" if value.endswith("/") else norm


class _Rule(Strict):
    note: str | None = Field(None, description="Free text: why this rule exists.")


class _AllowRule(_Rule):
    trust: int = Field(1, ge=1, le=100, description="Higher wins when near-duplicates "
                                                    "conflict.", examples=[3])
    max_age_days: int | None = Field(None, ge=0, le=100_000, description="Overrides freshness."
                                     "max_age_days for documents this rule admits.")
    overrides: dict[str, Any] | None = Field(
        None, description="Policy sections of the per-document checks (every one but "
        "sources) that apply differently to the documents this rule admits; merged onto "
        "the policy.", examples=[{"language": {"allowed": ["en", "fr"]}}])
    signers: tuple[str, ...] = Field(
        (), description="Keys trusted to sign the manifest lines of the documents this rule "
        "admits (the signature check): OpenSSH allowed-signers or public-key lines, or "
        "paths of allowed_signers files relative to the policy file.",
        examples=[["collector@example.org ssh-ed25519 AAAAC3NzaC1lZDI1NTE5AAAA..."]])

    @field_validator("signers")
    @classmethod
    def _signers(cls, value: tuple[str, ...]) -> tuple[str, ...]:
        return signing.validate_signers(value)


class DomainAllow(_AllowRule):
    domain: str = Field(description="Exact host name (IDNs may be written in Unicode).",
                        examples=["docs.example.org"])
    subdomains: bool = Field(False, description="Also admit any depth of names below it.")
    schemes: tuple[str, ...] = Field(("http", "https"), description="URL schemes admitted.")

    @field_validator("domain")
    @classmethod
    def _normalise(cls, value: str) -> str:
        return _domain(value)

    @field_validator("schemes")
    @classmethod
    def _schemes(cls, value: tuple[str, ...]) -> tuple[str, ...]:
        if not value:
            raise ValueError("list at least one scheme")
        return tuple(s.lower() for s in value)


class PrefixAllow(_AllowRule):
    url_prefix: str = Field(description="URL prefix, matched on path-segment boundaries "
                                        "after RFC 3986 normalisation.",
                            examples=["https://wiki.example.org/public/"])

    @field_validator("url_prefix")
    @classmethod
    def _normalise(cls, value: str) -> str:
        return _prefix(value)


class PathAllow(_AllowRule):
    path: str = Field(description="Inbox-relative path prefix, for documents with no "
                                  "source_url.", examples=["local/"])

    @field_validator("path")
    @classmethod
    def _normalise(cls, value: str) -> str:
        return _path(value)


class DomainDeny(_Rule):
    domain: str = Field(description="Denies this host and every name below it.",
                        examples=["paste.example.net"])

    @field_validator("domain")
    @classmethod
    def _normalise(cls, value: str) -> str:
        return _domain(value)


class PrefixDeny(_Rule):
    url_prefix: str = Field(description="Denies URLs under this prefix.")

    @field_validator("url_prefix")
    @classmethod
    def _normalise(cls, value: str) -> str:
        return _prefix(value)


class PathDeny(_Rule):
    path: str = Field(description="Denies inbox paths under this prefix, whatever their URL.")

    @field_validator("path")
    @classmethod
    def _normalise(cls, value: str) -> str:
        return _path(value)


_KINDS = ("domain", "url_prefix", "path")


def _rule_kind(value: Any) -> str | None:
    if isinstance(value, dict):
        kinds = [k for k in _KINDS if k in value]
        return kinds[0] if len(kinds) == 1 else None
    for kind in _KINDS:
        if getattr(value, kind, None) is not None:
            return kind
    return None


_RULE_ERROR = dict(custom_error_type="rule_kind",
                   custom_error_message="a rule needs exactly one of domain, url_prefix, path")
AllowRule = Annotated[Union[Annotated[DomainAllow, Tag("domain")],  # noqa: UP007
                            Annotated[PrefixAllow, Tag("url_prefix")],
                            Annotated[PathAllow, Tag("path")]],
                      Discriminator(_rule_kind, **_RULE_ERROR)]
DenyRule = Annotated[Union[Annotated[DomainDeny, Tag("domain")],  # noqa: UP007
                           Annotated[PrefixDeny, Tag("url_prefix")],
                           Annotated[PathDeny, Tag("path")]],
                     Discriminator(_rule_kind, **_RULE_ERROR)]


class SourcesSettings(Section):
    """Allowed and denied sources."""

    allow: tuple[AllowRule, ...] = Field((), description="Rules that admit a document; the "
                                                         "first match wins.")
    deny: tuple[DenyRule, ...] = Field((), description="Rules that hold a document; deny "
                                                       "beats allow.")
    require_provenance: bool = Field(True, description="Hold documents that match no allow "
                                                       "rule.")


def rule_text(rule: Any) -> str:
    for kind in _KINDS:
        value = getattr(rule, kind, None)
        if value is not None:
            extra = " and subdomains" if getattr(rule, "subdomains", False) else ""
            return f"{kind} {value}{extra}"
    return "?"


@lru_cache(maxsize=4096)
def _parsed_prefix(prefix: str) -> urls.URL:
    return urls.parse(prefix)


def _path_under(path: str, prefix: str) -> bool:
    want = prefix.rstrip("/").split("/")
    return path.split("/")[:len(want)] == want


@dataclass(frozen=True)
class SourceMatch:
    """How a document relates to the source rules."""

    url: str | None = None  # normalised source URL
    problem: Finding | None = None
    denied_by: int | None = None
    allowed_by: int | None = None
    trust: int = UNMATCHED_TRUST
    max_age_days: int | None = None


@once_per_document
def match(document: Document, settings: SourcesSettings) -> SourceMatch:
    """Match one document against the source rules (pure)."""
    raw = document.manifest.source_url if document.manifest else None
    parsed: urls.URL | None = None
    if raw is not None:
        try:
            parsed = urls.parse(raw)
        except urls.URLProblem as err:
            return SourceMatch(problem=BAD_URL(url=redact.text(raw),
                                               problem=redact.text(str(err))))
        if parsed.host is None:
            return SourceMatch(problem=BAD_URL(url=redact.text(raw),
                                               problem="the URL has no host"))
        if parsed.userinfo is not None:  # never repeated: it may be a password
            return SourceMatch(url=redact.text(str(parsed)),
                               problem=USERINFO(url=redact.text(raw), host=parsed.host))
    for index, rule in enumerate(settings.deny):
        if isinstance(rule, PathDeny):
            hit = _path_under(document.path, rule.path)
        elif parsed is None:
            hit = False
        elif isinstance(rule, DomainDeny):
            hit = urls.host_matches(parsed.host, rule.domain, subdomains=True)
        else:
            hit = urls.prefix_matches(parsed, _parsed_prefix(rule.url_prefix))
        if hit:
            return SourceMatch(url=str(parsed) if parsed else None, denied_by=index)
    for index, rule in enumerate(settings.allow):
        if isinstance(rule, PathAllow):
            hit = parsed is None and _path_under(document.path, rule.path)
        elif parsed is None:
            hit = False
        elif isinstance(rule, DomainAllow):
            hit = parsed.scheme in rule.schemes and \
                urls.host_matches(parsed.host, rule.domain, rule.subdomains)
        else:
            hit = urls.prefix_matches(parsed, _parsed_prefix(rule.url_prefix))
        if hit:
            return SourceMatch(url=str(parsed) if parsed else None, allowed_by=index,
                               trust=rule.trust, max_age_days=rule.max_age_days)
    return SourceMatch(url=str(parsed) if parsed else None)


def evaluate(document: Document, policy: Any, run: RunContext) -> list[Finding]:
    settings: SourcesSettings = policy.sources
    result = match(document, settings)
    if result.problem is not None:
        return [result.problem]
    if result.denied_by is not None:
        what = f"source {result.url}" if result.url else f"inbox path {document.path}"
        return [DENIED(what=what, rule=result.denied_by, url=result.url,
                       rule_text=rule_text(settings.deny[result.denied_by]))]
    if result.allowed_by is None and settings.require_provenance:
        if result.url is None:
            return [NO_SOURCE(path=document.path)]
        return [UNLISTED(url=result.url)]
    return []


CHECK = DocumentCheck(id="source", section="sources", evaluate=evaluate, per_source=False,
                      settings=SourcesSettings, doc=__doc__ or "")
