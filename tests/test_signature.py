"""Signed manifest batches with real OpenSSH signatures made here (keys generated in tmp).

The collectors, hosts and documents are invented (example.org / example.net).
"""

import json
import shutil
import subprocess
from datetime import UTC, datetime
from pathlib import Path

import pytest

from gate import signing
from gate.checks.base import Document, RunContext
from gate.checks.signature import evaluate
from gate.errors import ManifestError, PolicyError
from gate.extract.model import Extracted
from gate.manifest import load, parse
from gate.pipeline import RunOptions, run
from gate.policy import load_policy

from .helpers import policy

pytestmark = pytest.mark.skipif(shutil.which("ssh-keygen") is None,
                                reason="needs OpenSSH's ssh-keygen")
RUN = RunContext(as_of=datetime(2026, 12, 1, tzinfo=UTC))


def keygen(tmp: Path, name: str, kind: str = "ed25519") -> tuple[Path, str]:
    key = tmp / name
    args = ["ssh-keygen", "-q", "-t", kind, "-N", "", "-C", f"{name}@example.org", "-f",
            str(key)]
    if kind == "rsa":
        args[4:4] = ["-b", "2048"]
    subprocess.run(args, check=True)
    return key, (tmp / f"{name}.pub").read_text().strip()


def sign(key: Path, data: bytes, tmp: Path, namespace: str = "gate-manifest") -> str:
    batch = tmp / "batch.jsonl"
    batch.write_bytes(data)
    sig = tmp / "batch.jsonl.sig"
    sig.unlink(missing_ok=True)
    subprocess.run(["ssh-keygen", "-q", "-Y", "sign", "-f", str(key), "-n", namespace,
                    str(batch)], check=True, capture_output=True)
    return sig.read_text()


def lines(*docs: str) -> bytes:
    return "".join(json.dumps({"path": d, "source_url": f"https://docs.example.org/{d}"}) +
                   "\n" for d in docs).encode()


def sealed(key: Path, batch: bytes, tmp: Path, namespace: str = "gate-manifest") -> bytes:
    return batch + signing.signature_line(sign(key, batch, tmp, namespace)).encode() + b"\n"


def doc(manifest, path: str) -> Document:
    return Document(path=path, kind="file", size=10, sha256="0" * 64,
                    manifest=manifest.get(path), extracted=Extracted(type="text"))


def pol(pub: str, *, rule_signers: str = "", scope: str = "all"):
    """signature.signers = [pub], or rule_signers on docs.example.org's allow rule."""
    if not rule_signers:
        return policy(f"signature:\n  scope: {scope}\n  signers: [{json.dumps(pub)}]\n")
    return policy(f"signature:\n  scope: {scope}\nsources:\n  allow:\n"
                  f"    - domain: docs.example.org\n      signers: [{json.dumps(rule_signers)}]\n"
                  "    - domain: feeds.example.net\n")


def codes(findings):
    return [f.code for f in findings]


def test_valid_signature_passes_and_verifies_with_ssh_keygen_too(tmp_path):
    key, pub = keygen(tmp_path, "collector")
    batch = lines("a.html", "b.html")
    manifest = parse(sealed(key, batch, tmp_path).decode(), "m.jsonl")
    assert manifest.get("a.html").signature["valid"] is True
    assert codes(evaluate(doc(manifest, "a.html"), pol(pub), RUN)) == []
    # the same bytes verify with OpenSSH itself against an allowed_signers file
    allowed = tmp_path / "allowed_signers"
    allowed.write_text(f"collector@example.org {pub}\n")
    checked = subprocess.run(["ssh-keygen", "-Y", "verify", "-f", str(allowed), "-I",
                              "collector@example.org", "-n", "gate-manifest", "-s",
                              str(tmp_path / "batch.jsonl.sig")], input=batch,
                             capture_output=True)
    assert checked.returncode == 0


@pytest.mark.parametrize("kind", ["rsa", "ecdsa"])
def test_rsa_and_ecdsa_keys_verify(tmp_path, kind):
    key, pub = keygen(tmp_path, "collector", kind)
    manifest = parse(sealed(key, lines("a.html"), tmp_path).decode(), "m.jsonl")
    assert codes(evaluate(doc(manifest, "a.html"), pol(pub), RUN)) == []


def test_tampered_line_does_not_verify(tmp_path):
    key, pub = keygen(tmp_path, "collector")
    text = sealed(key, lines("a.html", "b.html"), tmp_path).decode()
    text = text.replace("docs.example.org/b.html", "docs.example.org/c.html")
    manifest = parse(text, "m.jsonl")
    found = evaluate(doc(manifest, "a.html"), pol(pub), RUN)
    assert codes(found) == ["signature.invalid"]
    assert "does not match the signed lines" in found[0].message


def test_wrong_key_and_key_trusted_only_for_another_source(tmp_path):
    key, pub = keygen(tmp_path, "collector")
    other_key, other_pub = keygen(tmp_path, "stranger")
    manifest = parse(sealed(other_key, lines("a.html"), tmp_path).decode(), "m.jsonl")
    found = evaluate(doc(manifest, "a.html"), pol(pub), RUN)
    assert codes(found) == ["signature.untrusted"]
    assert "does not trust" in found[0].message
    # the stranger's key is trusted, but for feeds.example.net only
    text = (f"signature: {{}}\nsources:\n  allow:\n    - domain: docs.example.org\n"
            f"      signers: [{json.dumps(pub)}]\n    - domain: feeds.example.net\n"
            f"      signers: [{json.dumps(other_pub)}]\n")
    found = evaluate(doc(manifest, "a.html"), policy(text), RUN)
    assert codes(found) == ["signature.untrusted"]
    assert "trusted only for sources.allow[1] (domain feeds.example.net)" in found[0].message


def test_missing_signature_and_lines_after_the_last_batch(tmp_path):
    key, pub = keygen(tmp_path, "collector")
    text = sealed(key, lines("a.html"), tmp_path) + lines("late.html")
    manifest = parse(text.decode(), "m.jsonl")
    assert codes(evaluate(doc(manifest, "a.html"), pol(pub), RUN)) == []
    found = evaluate(doc(manifest, "late.html"), pol(pub), RUN)
    assert codes(found) == ["signature.unsigned"] and "manifest line 3" in found[0].message
    found = evaluate(doc(manifest, "not-listed.html"), pol(pub), RUN)
    assert codes(found) == ["signature.unsigned"]


def test_batches_concatenate_and_namespace_counts(tmp_path):
    key, pub = keygen(tmp_path, "collector")
    first = sealed(key, lines("a.html"), tmp_path)
    second = sealed(key, lines("b.html", "c.html"), tmp_path, namespace="other-tool")
    manifest = parse((first + second).decode(), "m.jsonl")
    assert manifest.get("c.html").signature["lines"] == [3, 4]
    assert codes(evaluate(doc(manifest, "a.html"), pol(pub), RUN)) == []
    found = evaluate(doc(manifest, "c.html"), pol(pub), RUN)
    assert codes(found) == ["signature.invalid"] and "namespace 'other-tool'" in found[0].message


def test_scope_keyed_only_holds_sources_with_keys(tmp_path):
    key, pub = keygen(tmp_path, "collector")
    text = lines("a.html") + json.dumps({"path": "n.html", "source_url":
                                         "https://feeds.example.net/n.html"}).encode() + b"\n"
    manifest = parse(text.decode(), "m.jsonl")
    keyed = pol("", rule_signers=pub, scope="keyed")
    assert codes(evaluate(doc(manifest, "a.html"), keyed, RUN)) == ["signature.unsigned"]
    assert codes(evaluate(doc(manifest, "n.html"), keyed, RUN)) == []
    every = pol("", rule_signers=pub, scope="all")
    assert codes(evaluate(doc(manifest, "n.html"), every, RUN)) == ["signature.unsigned"]


def test_malformed_signature_lines(tmp_path):
    with pytest.raises(ManifestError, match="unknown key 'signer'"):
        parse('{"path": "a"}\n{"signature": "x", "signer": "y"}\n', "m.jsonl")
    manifest = parse('{"path": "a"}\n{"signature": "not armored"}\n', "m.jsonl")
    assert manifest.get("a").signature["valid"] is False
    assert "BEGIN SSH SIGNATURE" in manifest.get("a").signature["problem"]


def test_allowed_signers_file_relative_to_the_policy_and_bad_keys(tmp_path):
    _, pub = keygen(tmp_path, "collector")
    keys = tmp_path / "keys"
    keys.mkdir()
    (keys / "allowed_signers").write_text(
        f"# collectors of the invented depot archive\n"
        f'collector@example.org namespaces="gate-manifest" {pub}\n')
    path = tmp_path / "policy.yaml"
    path.write_text("version: 1\nname: signed\nsignature:\n  signers: [keys/allowed_signers]\n")
    loaded = load_policy(path)
    assert loaded.policy.signature.signers[0].startswith("collector@example.org")
    assert str(keys / "allowed_signers") in loaded.files
    (keys / "allowed_signers").write_text("collector@example.org ssh-ed25519 AAAA!!\n")
    with pytest.raises(PolicyError, match="line 1.*base64"):
        load_policy(path)
    path.write_text("version: 1\nname: signed\nsignature:\n  signers: [keys/missing]\n")
    with pytest.raises(PolicyError, match=r"line 4: signature.signers\[0\]: cannot read"):
        load_policy(path)


def test_policy_without_the_section_switches_the_check_off(tmp_path):
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    (inbox / "a.txt").write_text("The invented depot opens at six on weekdays.\n")
    path = tmp_path / "policy.yaml"
    path.write_text("version: 1\nname: plain\n")
    run(RunOptions(inbox=inbox, policy=load_policy(path), out=tmp_path / "out",
                   as_of=RUN.as_of, workers=1))
    report = json.loads((tmp_path / "out" / "report.json").read_text())
    assert report["documents"][0]["checks"]["signature"] == "off"
    assert report["documents"][0]["decision"] == "accepted"


def test_end_to_end_signed_and_tampered_batches(tmp_path):
    key, pub = keygen(tmp_path, "collector")
    inbox = tmp_path / "inbox"
    inbox.mkdir()
    for name in ("a.txt", "b.txt", "c.txt"):
        (inbox / name).write_text(f"The invented depot timetable, page {name}.\n")
    good = sealed(key, lines("a.txt"), tmp_path)
    bad = sealed(key, lines("b.txt"), tmp_path).replace(b"b.txt\"}", b"b.txt\", \"x_n\": 1}")
    (inbox / "manifest.jsonl").write_bytes(good + bad + lines("c.txt"))
    path = tmp_path / "policy.yaml"
    path.write_text(f"version: 1\nname: signed\nsignature:\n  signers: [{json.dumps(pub)}]\n")
    run(RunOptions(inbox=inbox, policy=load_policy(path), out=tmp_path / "out",
                   as_of=RUN.as_of, workers=1))
    report = json.loads((tmp_path / "out" / "report.json").read_text())
    got = {d["path"]: [r["code"] for r in d["reasons"]] for d in report["documents"]}
    assert got == {"a.txt": [], "b.txt": ["signature.invalid"], "c.txt": ["signature.unsigned"]}


def test_a_detached_signature_beside_the_manifest_covers_the_whole_file(tmp_path):
    key, pub = keygen(tmp_path, "collector")
    elsewhere = tmp_path / "manifests"
    elsewhere.mkdir()
    manifest_path = elsewhere / "manifest.jsonl"
    manifest_path.write_bytes(lines("a.html", "b.html"))
    subprocess.run(["ssh-keygen", "-q", "-Y", "sign", "-f", str(key), "-n", "gate-manifest",
                    str(manifest_path)], check=True, capture_output=True)  # writes .sig
    manifest = load(manifest_path)
    assert codes(evaluate(doc(manifest, "b.html"), pol(pub), RUN)) == []
    assert manifest.get("a.html").signature["where"] == "manifest.jsonl.sig"
    manifest_path.write_bytes(lines("a.html", "c.html"))  # changed after signing
    found = evaluate(doc(load(manifest_path), "a.html"), pol(pub), RUN)
    assert codes(found) == ["signature.invalid"] and "manifest.jsonl.sig" in found[0].message
