"""signature: was the document's manifest line signed by a key trusted for its source?

A checksum in the manifest catches corruption, not tampering: whoever can write into the
inbox can usually rewrite the manifest line beside the file. With a ``signature`` section,
a document is accepted only when its manifest line belongs to a batch signed with an
OpenSSH key (``ssh-keygen -Y sign -n gate-manifest``; the signature travels as a manifest
line ``{"signature": "-----BEGIN SSH SIGNATURE-----..."}`` after the lines it covers, or as a
detached ``<manifest>.sig`` beside a manifest kept outside the inbox; see gate/signing.py
and the README) and that key is trusted for the document's source.

Trusted keys are OpenSSH allowed-signers lines (``collector@example.org ssh-ed25519
AAAA...``) or public-key lines (``ssh-ed25519 AAAA... collector@example.org``), or paths of
allowed_signers files relative to the policy. ``signature.signers`` are trusted for every
source; an allow rule's ``signers`` (under ``sources.allow``) are trusted for the documents
that rule admits. A document is held when its manifest line is unsigned
(``signature.unsigned``), when the signature does not verify or was made for another
namespace (``signature.invalid``, tampered lines land here), or when it verifies but its key
is not trusted for the document's source (``signature.untrusted``, saying whether the key
is unknown or trusted only for other sources). With ``scope: keyed``, only documents of
sources that have trusted keys need a signature. Verification is offline and happens once
per batch when the manifest is read.

Example::

    signature:
      namespace: gate-manifest
      scope: keyed
    sources:
      allow:
        - domain: docs.example.org
          signers: ["collector@example.org ssh-ed25519 AAAAC3NzaC1lZDI1NTE5AAAA..."]
        - url_prefix: https://wiki.example.org/public/
          signers: [keys/wiki_allowed_signers]
"""

from __future__ import annotations

import base64
from functools import lru_cache
from typing import Any, Literal

from pydantic import Field, field_validator

from gate import signing
from gate.checks import source as source_check
from gate.checks.base import Document, DocumentCheck, RunContext
from gate.findings import Finding, define
from gate.settings import Section

UNSIGNED = define("signature.unsigned", "the manifest line is not in a signed batch",
                  "{what} is not covered by a signature line, so who recorded it cannot be "
                  "verified")
INVALID = define("signature.invalid", "the batch signature does not verify",
                 "the signature on manifest lines {first}-{last} ({where}) does not verify: "
                 "{problem}")
UNTRUSTED = define("signature.untrusted", "signed by a key not trusted for the source",
                   "manifest lines {first}-{last} are signed by {signer}, {why}")


class SignatureSettings(Section):
    """Signed manifest batches and the keys trusted per source."""

    namespace: str = Field(signing.NAMESPACE, min_length=1, description="The namespace "
                           "collectors sign with (ssh-keygen -Y sign -n NAMESPACE); a "
                           "signature made for another namespace does not count.",
                           examples=["gate-manifest"])
    signers: tuple[str, ...] = Field((), description="Keys trusted for documents of every "
                                     "source: OpenSSH allowed-signers or public-key lines, or "
                                     "paths of allowed_signers files relative to the policy.",
                                     examples=[["collector@example.org ssh-ed25519 AAAA..."]])
    scope: Literal["all", "keyed"] = Field("all", description="all: every document needs a "
                                           "trusted signature; keyed: only documents whose "
                                           "source has trusted keys (here or on its allow "
                                           "rule).", examples=["keyed"])

    @field_validator("signers")
    @classmethod
    def _signers(cls, value: tuple[str, ...]) -> tuple[str, ...]:
        return signing.validate_signers(value)


@lru_cache(maxsize=256)
def _keys(lines: tuple[str, ...]) -> tuple[signing.TrustedKey, ...]:
    return tuple(signing.parse_signer(line) for line in lines)


def _rule_text(policy: Any, index: int) -> str:
    return source_check.rule_text(policy.sources.allow[index])


def evaluate(document: Document, policy: Any, run: RunContext) -> list[Finding] | None:
    settings: SignatureSettings = policy.signature
    trusted = list(_keys(settings.signers))
    rule_index = None
    if policy.sources is not None:
        rule_index = source_check.match(document, policy.sources).allowed_by
        if rule_index is not None:
            trusted += _keys(policy.sources.allow[rule_index].signers)
    if settings.scope == "keyed" and not trusted:
        return []
    record = document.manifest
    verdict = record.signature if record is not None else None
    if verdict is None:
        what = f"manifest line {record.line}" if record is not None else \
            "the document has no manifest line and"
        return [UNSIGNED(what=what, line=record.line if record else None)]
    first, last = verdict["lines"]
    common = dict(first=first, last=last, line=verdict["signature_line"],
                  where=verdict.get("where") or f"signature line {verdict['signature_line']}",
                  fingerprint=verdict.get("fingerprint") or None)
    if not verdict["valid"]:
        return [INVALID(problem=verdict.get("problem", ""), **common)]
    if verdict["namespace"] != settings.namespace:
        return [INVALID(problem=f"it was made for namespace {verdict['namespace']!r}, not "
                                f"{settings.namespace!r}", **common)]
    blob = base64.b64decode(verdict["key"].split(" ", 1)[1])
    for key in trusted:
        if key.blob == blob and (key.namespaces is None or
                                 settings.namespace in key.namespaces):
            return []
    elsewhere = _trusted_elsewhere(policy, blob)
    signer = verdict["fingerprint"]
    if elsewhere:
        why = (f"a key trusted only for {', '.join(elsewhere)}, not for this document's "
               "source")
    elif not trusted:
        why = "but the policy trusts no key for this document's source"
    else:
        why = "a key the policy does not trust for this document's source"
    return [UNTRUSTED(signer=signer, why=why, trusted_for=elsewhere or None,
                      rule=rule_index, **common)]


def _trusted_elsewhere(policy: Any, blob: bytes) -> list[str]:
    if policy.sources is None:
        return []
    return [f"sources.allow[{index}] ({_rule_text(policy, index)})"
            for index, rule in enumerate(policy.sources.allow)
            if any(key.blob == blob for key in _keys(rule.signers))]


# per_source off: the keys already belong to the allow rules, so overrides add nothing
CHECK = DocumentCheck(id="signature", section="signature", evaluate=evaluate,
                      settings=SignatureSettings, per_source=False, doc=__doc__ or "")
