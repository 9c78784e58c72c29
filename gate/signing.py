"""Signed manifest batches: OpenSSH signatures (SSHSIG), verified offline.

A collector signs a batch of manifest lines with ``ssh-keygen -Y sign -n gate-manifest``
and appends the signature as one more line, ``{"signature": "-----BEGIN SSH SIGNATURE-----
..."}``. A signature line covers the exact bytes of the lines before it, back to the
previous signature line or the start of the file, so signed batches can be concatenated
into one manifest and each stays verifiable. Lines after the last signature line are
unsigned, unless a detached signature ``<manifest>.sig`` over the whole file (what
``ssh-keygen -Y sign manifest.jsonl`` writes) lies beside the manifest: it covers every
line no signature line covers.

The format is OpenSSH's PROTOCOL.sshsig: the armored blob holds the magic ``SSHSIG``,
version 1, the signer's public key, the namespace, a reserved string, the hash algorithm
(sha256 or sha512) and the signature over ``"SSHSIG" || namespace || reserved || hash_alg ||
H(message)``. Signatures are checked here with the ``cryptography`` package for the key
types ``ssh-ed25519`` (RFC 8709), ``ssh-rsa`` with ``rsa-sha2-256``/``rsa-sha2-512``
(RFC 8332) and ``ecdsa-sha2-nistp256/384/521`` (RFC 5656); security-key (``sk-``) types
and certificates are reported as unsupported. No network, no agent, no other program.

Trusted keys are written as OpenSSH "allowed signers" lines (ssh-keygen(1), ALLOWED
SIGNERS): ``principal[,principal] [namespaces="..."] keytype base64``, or in the
``keytype base64 comment`` form of a public key file, whose comment is then the principal.
"""

from __future__ import annotations

import base64
import binascii
import hashlib
import json
import os
import re
import shlex
from dataclasses import dataclass, replace
from pathlib import Path
from typing import Any

from cryptography.exceptions import InvalidSignature
from cryptography.hazmat.primitives import hashes
from cryptography.hazmat.primitives.asymmetric import ec, ed25519, padding, rsa
from cryptography.hazmat.primitives.asymmetric.utils import encode_dss_signature

from gate.bounded import InputFileProblem, open_regular, read_regular

NAMESPACE = "gate-manifest"
MAX_SIGNERS_FILE = 1 << 20
ARMOR_BEGIN = "-----BEGIN SSH SIGNATURE-----"
ARMOR_END = "-----END SSH SIGNATURE-----"
MAX_SIGNATURE_CHARS = 20_000
KEY_TYPES = ("ssh-ed25519", "ssh-rsa", "ecdsa-sha2-nistp256", "ecdsa-sha2-nistp384",
             "ecdsa-sha2-nistp521")
_SK_TYPES = ("sk-ssh-ed25519@openssh.com", "sk-ecdsa-sha2-nistp256@openssh.com")
_CURVES = {"nistp256": (ec.SECP256R1, hashes.SHA256), "nistp384": (ec.SECP384R1, hashes.SHA384),
           "nistp521": (ec.SECP521R1, hashes.SHA512)}
_HASHES = {"sha256": hashlib.sha256, "sha512": hashlib.sha512}


class SignatureProblem(ValueError):
    """A signature that cannot be read or does not verify; the message says why."""


class SignerLineError(ValueError):
    """A trusted-key line that is not an OpenSSH public key or allowed-signers entry."""


# -- wire format (RFC 4251 section 5) --------------------------------------------------------

class _Reader:
    def __init__(self, data: bytes):
        self.data, self.at = data, 0

    def take(self, n: int) -> bytes:
        if n < 0 or self.at + n > len(self.data):
            raise SignatureProblem("the signature blob is truncated")
        out = self.data[self.at:self.at + n]
        self.at += n
        return out

    def uint32(self) -> int:
        return int.from_bytes(self.take(4), "big")

    def string(self) -> bytes:
        return self.take(self.uint32())

    def mpint(self) -> int:
        return int.from_bytes(self.string(), "big", signed=True)

    def done(self) -> bool:
        return self.at == len(self.data)


def _string(value: bytes) -> bytes:
    return len(value).to_bytes(4, "big") + value


def fingerprint(blob: bytes) -> str:
    """The key's fingerprint as ``ssh-keygen -l`` prints it: SHA256:<base64, no padding>."""
    return "SHA256:" + base64.b64encode(hashlib.sha256(blob).digest()).decode().rstrip("=")


def key_type(blob: bytes) -> str:
    try:
        return _Reader(blob).string().decode("ascii")
    except (SignatureProblem, UnicodeDecodeError):
        return "?"


# -- SSHSIG ----------------------------------------------------------------------------------

@dataclass(frozen=True)
class SshSig:
    """A parsed SSHSIG blob."""

    public_key: bytes
    namespace: str
    hash_algorithm: str
    signature: bytes


def parse_armored(text: str) -> SshSig:
    """Parse an armored SSH signature (what ``ssh-keygen -Y sign`` writes)."""
    if not isinstance(text, str) or len(text) > MAX_SIGNATURE_CHARS:
        raise SignatureProblem("the signature is not an armored SSH signature of sensible size")
    body = text.strip()
    if not body.startswith(ARMOR_BEGIN) or not body.endswith(ARMOR_END):
        raise SignatureProblem(f"the signature does not start with {ARMOR_BEGIN} and end "
                               f"with {ARMOR_END}")
    inner = "".join(body[len(ARMOR_BEGIN):-len(ARMOR_END)].split())
    try:
        blob = base64.b64decode(inner, validate=True)
    except (binascii.Error, ValueError):
        raise SignatureProblem("the signature's base64 is damaged") from None
    r = _Reader(blob)
    if r.take(6) != b"SSHSIG":
        raise SignatureProblem("the blob is not an SSHSIG signature (no SSHSIG magic)")
    if r.uint32() != 1:
        raise SignatureProblem("the SSHSIG version is not 1")
    public_key, namespace, _reserved = r.string(), r.string(), r.string()
    hash_algorithm, signature = r.string(), r.string()
    if not r.done():
        raise SignatureProblem("the signature blob has trailing bytes")
    try:
        return SshSig(public_key, namespace.decode("utf-8"), hash_algorithm.decode("ascii"),
                      signature)
    except UnicodeDecodeError:
        raise SignatureProblem("the signature's namespace or hash name is not text") from None


def verify(sig: SshSig, message: bytes | _Hashes) -> None:
    """Raise :class:`SignatureProblem` unless ``sig`` is a valid signature of ``message``
    (the bytes, or their running hashes)."""
    if isinstance(message, bytes):
        digest = _HASHES.get(sig.hash_algorithm)
        hashed = digest(message).digest() if digest is not None else None
    else:
        hashed = message.digest(sig.hash_algorithm)
    if hashed is None:
        raise SignatureProblem(f"unknown hash algorithm {sig.hash_algorithm!r}")
    signed = b"SSHSIG" + _string(sig.namespace.encode("utf-8")) + _string(b"") + \
        _string(sig.hash_algorithm.encode("ascii")) + _string(hashed)
    key = _Reader(sig.public_key)
    kind = key.string().decode("ascii", errors="replace")
    outer = _Reader(sig.signature)
    sig_kind = outer.string().decode("ascii", errors="replace")
    raw = outer.string()
    try:
        if kind == "ssh-ed25519" and sig_kind == "ssh-ed25519":
            ed25519.Ed25519PublicKey.from_public_bytes(key.string()).verify(raw, signed)
        elif kind == "ssh-rsa" and sig_kind in ("rsa-sha2-256", "rsa-sha2-512"):
            e, n = key.mpint(), key.mpint()
            algorithm = hashes.SHA256() if sig_kind == "rsa-sha2-256" else hashes.SHA512()
            rsa.RSAPublicNumbers(e, n).public_key().verify(raw, signed, padding.PKCS1v15(),
                                                           algorithm)
        elif kind.startswith("ecdsa-sha2-") and sig_kind == kind:
            curve_name = key.string().decode("ascii", errors="replace")
            if curve_name not in _CURVES or kind != f"ecdsa-sha2-{curve_name}":
                raise SignatureProblem(f"unsupported ECDSA curve {curve_name!r}")
            curve, algorithm = _CURVES[curve_name]
            public = ec.EllipticCurvePublicKey.from_encoded_point(curve(), key.string())
            rs = _Reader(raw)
            der = encode_dss_signature(rs.mpint(), rs.mpint())
            public.verify(der, signed, ec.ECDSA(algorithm()))
        elif kind in _SK_TYPES:
            raise SignatureProblem(f"security-key signatures ({kind}) are not supported")
        else:
            raise SignatureProblem(f"unsupported key or signature type {kind}/{sig_kind}")
    except InvalidSignature:
        raise SignatureProblem("the signature does not match the signed lines (they were "
                               "changed after signing, or signed by another key)") from None
    except (ValueError, TypeError) as err:
        if isinstance(err, SignatureProblem):
            raise
        raise SignatureProblem(f"the signer's public key is malformed ({err})") from None


# -- trusted keys ----------------------------------------------------------------------------

@dataclass(frozen=True)
class TrustedKey:
    """One trusted signer: the key blob, who it is, the namespaces it may sign."""

    blob: bytes
    principal: str
    namespaces: tuple[str, ...] | None = None  # None: any namespace

    @property
    def fingerprint(self) -> str:
        return fingerprint(self.blob)


def parse_signer(line: str) -> TrustedKey:
    """Parse one allowed-signers or public-key line (see the module docstring)."""
    try:
        tokens = shlex.split(line, comments=False, posix=True)
    except ValueError as err:
        raise SignerLineError(f"cannot split the line ({err})") from None
    for index, token in enumerate(tokens):
        if token in KEY_TYPES or token in _SK_TYPES:
            break
    else:
        raise SignerLineError("no SSH key type (such as ssh-ed25519) in the line")
    if index + 1 >= len(tokens):
        raise SignerLineError(f"the {token} key has no base64 data after it")
    try:
        blob = base64.b64decode(tokens[index + 1], validate=True)
    except (binascii.Error, ValueError):
        raise SignerLineError("the key's base64 data is damaged") from None
    if key_type(blob) != token:
        raise SignerLineError(f"the key data is not a {token} key")
    namespaces = None
    if index >= 2:
        for option in tokens[1:index]:
            for item in _split_options(option):
                name, _, value = item.partition("=")
                if name.lower() == "namespaces":
                    namespaces = tuple(v.strip() for v in value.split(",") if v.strip())
                else:
                    raise SignerLineError(f"the option {name!r} is not supported by gate "
                                          "(only namespaces=\"...\")")
    # allowed-signers form: the principal comes first; public-key form: it is the comment
    principal = tokens[0] if index >= 1 else " ".join(tokens[index + 2:]) or fingerprint(blob)
    return TrustedKey(blob=blob, principal=principal, namespaces=namespaces)


def _split_options(text: str) -> list[str]:
    return [part for part in re.split(r",(?=[A-Za-z-]+(?:=|,|$))", text) if part]


def is_key_line(entry: str) -> bool:
    return any(f"{kind} " in entry or entry.startswith(kind) for kind in KEY_TYPES + _SK_TYPES)


def _signer_lines(text: str) -> list[str]:
    """The key lines of an allowed_signers file (comments and blank lines left out)."""
    return [line.strip() for line in text.splitlines()
            if line.strip() and not line.lstrip().startswith("#")]


def expand_signer_files(data: dict[str, Any], base: Path) -> tuple[
        list[tuple[str, bytes]], list[tuple[tuple[Any, ...], str]]]:
    """Replace signer entries naming allowed_signers files with the lines they hold.

    Paths are relative to the policy file's folder (``base``). Returns the files read, as
    (name, bytes) for the policy digest, and problems as (key path, message).
    """
    files: list[tuple[str, bytes]] = []
    problems: list[tuple[tuple[Any, ...], str]] = []
    places: list[tuple[tuple[Any, ...], Any]] = []
    section = data.get("signature")
    if isinstance(section, dict):
        places.append((("signature", "signers"), section))
    sources = data.get("sources")
    if isinstance(sources, dict) and isinstance(sources.get("allow"), list):
        for index, rule in enumerate(sources["allow"]):
            if isinstance(rule, dict):
                places.append((("sources", "allow", index, "signers"), rule))
    for where, holder in places:
        entries = holder.get("signers")
        if not isinstance(entries, list):
            continue
        out: list[Any] = []
        for number, entry in enumerate(entries):
            if not isinstance(entry, str) or is_key_line(entry):
                out.append(entry)
                continue
            path = (base / entry).resolve()
            try:
                raw = read_regular(path, MAX_SIGNERS_FILE)  # no links or FIFOs, size capped
                lines = _signer_lines(raw.decode("utf-8"))
            except (InputFileProblem, OSError, UnicodeDecodeError) as err:
                problems.append((where + (number,), "cannot read the allowed_signers file "
                                 f"{entry!r} ({getattr(err, 'strerror', None) or err})"))
                continue
            files.append((str(path), raw))
            for line_number, line in enumerate(lines, 1):
                try:
                    parse_signer(line)
                except SignerLineError as err:
                    problems.append((where + (number,), f"{path} line {line_number}: {err}"))
            out.extend(lines)
        holder["signers"] = out
    return files, problems


def validate_signers(value: tuple[str, ...]) -> tuple[str, ...]:
    """Pydantic validator body: every entry must be a key line gate can read."""
    for number, entry in enumerate(value):
        try:
            parse_signer(entry)
        except SignerLineError as err:
            hint = "" if is_key_line(entry) else (" (a path to an allowed_signers file is "
                                                  "read only when the policy is loaded from "
                                                  "a file)")
            raise ValueError(f"entry {number}: {err}{hint}") from None
    return value


# -- batches of manifest lines ---------------------------------------------------------------

@dataclass(frozen=True)
class Verdict:
    """What one signature line says about the lines it covers (JSON-able via to_json)."""

    batch: int
    lines: tuple[int, int]  # first and last manifest line covered
    signature_line: int  # 0: a detached signature file (``where`` names it)
    valid: bool
    problem: str = ""
    namespace: str = ""
    key: str = ""  # "keytype base64" of the signer, when the blob could be read
    fingerprint: str = ""
    where: str = ""  # "signature line N" or the detached signature file's name

    def to_json(self) -> dict[str, Any]:
        out = {"batch": self.batch, "lines": list(self.lines),
               "signature_line": self.signature_line, "valid": self.valid,
               "namespace": self.namespace, "key": self.key, "fingerprint": self.fingerprint,
               "where": self.where or f"signature line {self.signature_line}"}
        if self.problem:
            out["problem"] = self.problem
        return out


class Batches:
    """Tracks manifest lines into signed batches while the manifest is read line by line.

    Only running hashes are kept (SHA-256 and SHA-512, the two hash algorithms SSHSIG
    allows), so memory does not grow with the manifest: a batch's hashes cover the exact
    bytes of its lines, each with the newline that ended it; the whole file's cover every
    byte, for a detached signature.
    """

    def __init__(self) -> None:
        self.start = 1
        self.members: list[str] = []
        self.everyone: list[str] = []
        self.verdicts: dict[str, Verdict] = {}
        self.count = 0
        self.batch = _Hashes()
        self.whole = _Hashes()
        self.last = 0

    def take(self, raw: bytes, number: int) -> None:
        """Every line of the file, as read (without its newline)."""
        if number > 1:
            self.whole.update(b"\n")
        self.whole.update(raw)
        self.last = number

    def add(self, raw: bytes) -> None:
        """A line that belongs to the current batch (everything but signature lines)."""
        self.batch.update(raw + b"\n")

    def member(self, path: str) -> None:
        self.members.append(path)
        self.everyone.append(path)

    def seal(self, line: str, number: int) -> str | None:
        """A line mentioning "signature": "" when it closed a batch, None when it is not a
        signature line after all, else the structural problem to report."""
        try:
            obj = json.loads(line)
        except (json.JSONDecodeError, RecursionError):
            return None
        if not isinstance(obj, dict) or "signature" not in obj:
            return None
        unknown = sorted(k for k in obj if k != "signature" and not k.startswith("x_"))
        if unknown:
            return (f"unknown key {unknown[0]!r} on a signature line (a signature line holds "
                    "'signature' and optional 'x_' keys)")
        if not isinstance(obj["signature"], str):
            return "'signature' must be a string (the armored SSH signature)"
        self.count += 1
        verdict = _judge(obj["signature"], self.batch, self.count, (self.start, number - 1),
                         number)
        for path in self.members:
            self.verdicts[path] = verdict
        self.members = []
        self.start = number + 1
        self.batch = _Hashes()
        return ""

    def detached(self, text: str, name: str, hashes: _Hashes | None = None) -> None:
        """A detached signature file over the whole manifest (``ssh-keygen -Y sign
        manifest.jsonl`` writes ``manifest.jsonl.sig``): it vouches for every line that no
        signature line covers."""
        self.count += 1
        verdict = replace(_judge(text, hashes or self.whole, self.count, (1, self.last), 0),
                          where=name)
        for path in self.everyone:
            self.verdicts.setdefault(path, verdict)

    def apply(self, records: dict[str, Any]) -> dict[str, Any]:
        """The records with each signed one's verdict attached (``signature`` field)."""
        return {path: replace(record, signature=self.verdicts[path].to_json())
                if path in self.verdicts else record for path, record in records.items()}


class _Hashes:
    """Running SHA-256 and SHA-512 of a message."""

    def __init__(self) -> None:
        self.hashes = {"sha256": hashlib.sha256(), "sha512": hashlib.sha512()}

    def update(self, data: bytes) -> None:
        for h in self.hashes.values():
            h.update(data)

    def digest(self, algorithm: str) -> bytes | None:
        h = self.hashes.get(algorithm)
        return h.digest() if h is not None else None


def _judge(text: str, message: bytes | _Hashes, batch: int, lines: tuple[int, int],
           number: int) -> Verdict:
    base = dict(batch=batch, lines=lines, signature_line=number)
    try:
        sig = parse_armored(text)
    except SignatureProblem as err:
        return Verdict(valid=False, problem=str(err), **base)
    signer = dict(namespace=sig.namespace, fingerprint=fingerprint(sig.public_key),
                  key=f"{key_type(sig.public_key)} "
                      f"{base64.b64encode(sig.public_key).decode('ascii')}")
    try:
        verify(sig, message)
    except SignatureProblem as err:
        return Verdict(valid=False, problem=str(err), **base, **signer)
    return Verdict(valid=True, **base, **signer)


def detached_signature(manifest: Path) -> tuple[str, str, _Hashes] | None:
    """(text, name) of ``<manifest>.sig`` when it exists beside the manifest, and the hashes
    of the manifest file's bytes (read again, in chunks); else None."""
    sig = manifest.with_name(manifest.name + ".sig")
    hashes = _Hashes()
    try:
        data = read_regular(sig, MAX_SIGNATURE_CHARS)
        fd = open_regular(manifest)
        try:
            while chunk := os.read(fd, 1 << 20):
                hashes.update(chunk)
        finally:
            os.close(fd)
    except (InputFileProblem, OSError):
        return None
    return data.decode("utf-8", errors="replace"), sig.name, hashes


def signature_line(armored: str) -> str:
    """The manifest line that carries an armored signature (what a collector appends)."""
    return json.dumps({"signature": armored}, ensure_ascii=True)
