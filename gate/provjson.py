"""The provenance record of an accepted document as W3C PROV-JSON.

``accepted/<id>/provenance.prov.json`` states the facts of ``provenance.json`` in the
PROV data model (W3C Recommendation PROV-DM, 2013) serialised as PROV-JSON (W3C Member
Submission, 24 April 2013), so provenance tools can read them:

* entities: the document's bytes (named by their SHA-256 as an RFC 6920 ``ni`` URI), the
  resource at its source URL, the indexed text gate extracted, the manifest and the policy
  (a ``prov:Plan``);
* activities: the retrieval (ending at the manifest's ``retrieved_at``) and the gate run
  (its ``--as-of`` clock and mode);
* agents: the source (the host the document came from), the collector whose key signed
  the manifest batch (when it was signed), and gate itself (a ``prov:SoftwareAgent``);
* relations: the document ``wasGeneratedBy`` the retrieval, which ``used`` the source and
  ``wasAssociatedWith`` the collector; the document ``wasDerivedFrom`` the source (typed
  ``prov:PrimarySource``) and ``wasAttributedTo`` its host; the run ``used`` the document,
  the manifest and the policy and ``wasAssociatedWith`` gate with the policy as plan; the
  text ``wasGeneratedBy`` the run and ``wasDerivedFrom`` the document.

Nothing here is read from the wall clock: times are the manifest's and the run's ``as_of``.
"""

from __future__ import annotations

import base64
from typing import Any
from urllib.parse import urlsplit

from gate import dates

FILE_NAME = "provenance.prov.json"
PREFIXES = {
    "gate": "urn:gate:",  # an invented namespace for gate's own terms and identifiers
    "ni": "ni:///sha-256;",  # RFC 6920 named information: the SHA-256 of the bytes
    "xsd": "http://www.w3.org/2001/XMLSchema#",
}


def _ni(sha256_hex: str) -> str:
    raw = bytes.fromhex(sha256_hex)
    return "ni:" + base64.urlsafe_b64encode(raw).decode("ascii").rstrip("=")


def _time(text: str | None) -> dict[str, str] | None:
    """An exact ISO 8601 instant as a typed xsd:dateTime literal, else None."""
    if not text:
        return None
    try:
        stamp = dates.parse_iso8601(text)
    except dates.DateProblem:
        return None
    if not stamp.exact:
        return None
    return {"$": stamp.iso(), "type": "xsd:dateTime"}


def _clean(attrs: dict[str, Any]) -> dict[str, Any]:
    return {k: v for k, v in attrs.items() if v not in (None, "", [], {})}


class _Doc:
    def __init__(self) -> None:
        self.out: dict[str, Any] = {"prefix": dict(PREFIXES)}
        self.counter = 0

    def node(self, kind: str, ident: str, attrs: dict[str, Any]) -> str:
        self.out.setdefault(kind, {})[ident] = _clean(attrs)
        return ident

    def relation(self, kind: str, attrs: dict[str, Any]) -> None:
        self.counter += 1
        self.out.setdefault(kind, {})[f"_:{kind}{self.counter}"] = _clean(attrs)


def from_record(record: dict[str, Any]) -> dict[str, Any]:
    """PROV-JSON for one accepted document's provenance record (see gate.pipeline)."""
    doc = _Doc()
    run = record.get("run") or {}
    policy = record.get("policy") or {}
    document = record.get("document") or {}
    manifest = record.get("manifest") or {}
    extraction = record.get("extraction") or {}
    gate_version = (record.get("gate") or {}).get("version", "")
    run_id = run.get("id") or "run"
    sha = document.get("sha256") or "0" * 64
    doc_id = document.get("id") or "document"

    bytes_id = doc.node("entity", _ni(sha), {
        "prov:type": "gate:Document", "prov:label": extraction.get("title"),
        "gate:path": document.get("path"), "gate:sha256": sha, "gate:size": document.get("size"),
        "gate:media": extraction.get("type"), "gate:decision": record.get("decision")})
    text_id = doc.node("entity", f"gate:{run_id}/text/{doc_id}", {
        "prov:type": "gate:IndexedText", "gate:file": f"accepted/{doc_id}/text.txt",
        "gate:chars": extraction.get("text_chars")})
    policy_id = doc.node("entity", f"gate:policy/{policy.get('sha256', 'unknown')}", {
        "prov:type": "prov:Plan", "prov:label": policy.get("name"),
        "gate:sha256": policy.get("sha256"), "gate:overrides_from": policy.get("overrides_from")})
    gate_id = doc.node("agent", f"gate:software/gate-{gate_version}", {
        "prov:type": "prov:SoftwareAgent", "prov:label": f"gate {gate_version}".strip()})
    run_act = doc.node("activity", f"gate:{run_id}", {
        "prov:type": "gate:Run", "gate:as_of": _time(run.get("as_of")) or run.get("as_of"),
        "gate:mode": run.get("mode")})
    doc.relation("used", {"prov:activity": run_act, "prov:entity": bytes_id})
    doc.relation("used", {"prov:activity": run_act, "prov:entity": policy_id})
    doc.relation("wasAssociatedWith", {"prov:activity": run_act, "prov:agent": gate_id,
                                       "prov:plan": policy_id})
    doc.relation("wasGeneratedBy", {"prov:entity": text_id, "prov:activity": run_act})
    doc.relation("wasDerivedFrom", {"prov:generatedEntity": text_id, "prov:usedEntity": bytes_id,
                                    "prov:activity": run_act})
    run_manifest = run.get("manifest") or {}
    if run_manifest.get("sha256"):
        manifest_id = doc.node("entity", f"gate:manifest/{run_manifest['sha256']}", {
            "prov:type": "gate:Manifest", "gate:sha256": run_manifest["sha256"],
            "gate:line": manifest.get("line")})
        doc.relation("used", {"prov:activity": run_act, "prov:entity": manifest_id})
    _retrieval(doc, record, manifest, bytes_id, doc_id)
    return doc.out


def _retrieval(doc: _Doc, record: dict[str, Any], manifest: dict[str, Any], bytes_id: str,
               doc_id: str) -> None:
    """The source, the retrieval and the collector, from the manifest line."""
    url = (record.get("source") or {}).get("url") or manifest.get("source_url")
    retrieved = manifest.get("retrieved_at")
    signature = manifest.get("signature") or {}
    if not url and not retrieved and not signature:
        return
    retrieval = doc.node("activity", f"gate:retrieval/{doc_id}", {
        "prov:type": "gate:Retrieval", "prov:endTime": _time(retrieved),
        "gate:retrieved_at": retrieved if _time(retrieved) is None else None})
    doc.relation("wasGeneratedBy", {"prov:entity": bytes_id, "prov:activity": retrieval,
                                    "prov:time": _time(retrieved)})
    if url:
        host = urlsplit(url).hostname or "unknown"
        source = doc.node("entity", f"gate:source/{doc_id}", {
            "prov:type": "gate:SourceResource", "prov:location": url,
            "gate:published_at": manifest.get("published_at")})
        publisher = doc.node("agent", f"gate:host/{host}", {
            "prov:type": "prov:Organization", "gate:host": host})
        doc.relation("used", {"prov:activity": retrieval, "prov:entity": source})
        doc.relation("wasDerivedFrom", {"prov:generatedEntity": bytes_id,
                                        "prov:usedEntity": source, "prov:activity": retrieval,
                                        "prov:type": "prov:PrimarySource"})
        doc.relation("wasAttributedTo", {"prov:entity": bytes_id, "prov:agent": publisher})
    if signature.get("valid") and signature.get("fingerprint"):
        key_name = signature["fingerprint"].replace("SHA256:", "sha256-").replace("+", "-") \
            .replace("/", "_")
        collector = doc.node("agent", f"gate:key/{key_name}", {
            "prov:type": "prov:Agent", "gate:key_fingerprint": signature["fingerprint"],
            "gate:signed_lines": f"{signature['lines'][0]}-{signature['lines'][1]}"})
        doc.relation("wasAssociatedWith", {"prov:activity": retrieval, "prov:agent": collector})
