"""Validate the blind test set.

Usage: .venv/bin/python tools/validate.py        (from the project root)
Checks: label schema and values, class/format counts, file presence, shuffle naming, domains and phone numbers,
payload presence (PDF page text via pypdf, annotation /Contents, form-field /V), e-mail parse, each payload used
at most twice, every host used as benign and as attack.
"""
import collections
import email
import email.policy
import html
import io
import json
import os
import re
import sys

ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
FIELDS = ["file", "label", "class", "language", "where", "note", "format", "host"]
ATTACK = ["output-steering", "task-hijack", "malicious-code", "tool-misuse", "authority-poisoning", "exfiltration",
          "multilingual", "hidden-placement", "encoded", "split"]
BENIGN = ["security-awareness", "chat-export", "technical-doc", "instructions-to-humans", "multilingual-benign", "misc"]
FORMATS = ["md", "txt", "html", "eml", "pdf"]
ISO = set("en es de fr ja pt ru it nl pl tr fa zh vi id ko ar sv hi cs uk".split())
ALLOWED_DOMAIN = re.compile(r"(^|\.)(example\.(com|org|net))$|\.test$")
errors = []


def err(msg):
    errors.append(msg)


def norm(s):
    return re.sub(r"\s+", "", s)


def pdf_texts(path):
    from pypdf import PdfReader
    r = PdfReader(path)
    page = "".join((p.extract_text() or "") for p in r.pages)
    ann, fld = [], []
    for p in r.pages:
        for a in (p.get("/Annots") or []):
            a = a.get_object()
            if "/Contents" in a:
                ann.append(str(a["/Contents"]))
            if a.get("/FT") == "/Tx" and "/V" in a:
                fld.append(str(a["/V"]))
    return page, "\n".join(ann), "\n".join(fld), r


def eml_text(path):
    with open(path, "rb") as fh:
        msg = email.message_from_binary_file(fh, policy=email.policy.default)
    parts = []
    for part in msg.walk():
        if part.get_content_maintype() == "text":
            parts.append(part.get_content())
    hdr = "\n".join(f"{k}: {v}" for k, v in msg.items())
    return hdr + "\n" + "\n".join(parts)


def main():
    labels = [json.loads(l) for l in open(os.path.join(ROOT, "labels.jsonl"), encoding="utf-8")]
    needles = {d["file"]: d["needles"] for d in
               (json.loads(l) for l in open(os.path.join(ROOT, "tools", "needles.jsonl"), encoding="utf-8"))}
    files_on_disk = set("docs/" + f for f in os.listdir(os.path.join(ROOT, "docs")))
    seen = set()
    payload_uses = collections.Counter()
    host_labels = collections.defaultdict(set)
    for i, l in enumerate(labels):
        if list(l.keys()) != FIELDS:
            err(f"line {i+1}: fields {list(l.keys())}")
            continue
        f = l["file"]
        if f in seen:
            err(f"duplicate {f}")
        seen.add(f)
        if not re.match(r"^docs/case-\d{4}\.(md|txt|html|eml|pdf)$", f):
            err(f"bad name {f}")
        if f.rsplit(".", 1)[1] != l["format"] or l["format"] not in FORMATS:
            err(f"{f}: format mismatch")
        if f not in files_on_disk:
            err(f"{f}: missing on disk")
        if l["label"] == "attack":
            if l["class"] not in ATTACK:
                err(f"{f}: class {l['class']}")
            if l["where"] == "none":
                err(f"{f}: attack with where=none")
            m = re.search(r"payload=(\w+); (subtle|explicit)", l["note"])
            if not m:
                err(f"{f}: note lacks payload/subtlety")
            else:
                payload_uses[m.group(1)] += 1
        elif l["label"] == "benign":
            if l["class"] not in BENIGN:
                err(f"{f}: class {l['class']}")
            if l["where"] != "none":
                err(f"{f}: benign where != none")
        else:
            err(f"{f}: label {l['label']}")
        if l["language"] not in ISO:
            err(f"{f}: language {l['language']}")
        if not l["note"].startswith(f"host={l['host']} ("):
            err(f"{f}: note lacks host id and genre")
        host_labels[l["host"]].add(l["label"])
    if files_on_disk - seen:
        err(f"unlabelled files: {sorted(files_on_disk - seen)[:5]}")
    for p, c in payload_uses.items():
        if c > 2:
            err(f"payload {p} used {c} times")
    for h, s in host_labels.items():
        if s != {"attack", "benign"}:
            err(f"host {h} appears only as {s}")

    # content checks
    url_re = re.compile(r"(?:https?://|mailto:[^@\s]+@|@)([A-Za-z0-9.-]+\.[A-Za-z]{2,})")
    phone_re = re.compile(r"(?<![\d.])(\d{3})-(\d{4})(?![\d])")
    stock = 0
    for l in labels:
        f = l["file"]
        path = os.path.join(ROOT, f)
        fmt = l["format"]
        if fmt == "pdf":
            try:
                page, ann, fld, reader = pdf_texts(path)
            except Exception as e:  # noqa: BLE001
                err(f"{f}: pdf unreadable {e}")
                continue
            meta = " ".join(str(v) for v in (reader.metadata or {}).values())
            alltext = page + "\n" + ann + "\n" + fld + "\n" + meta
            hays = {"page": [norm(page)], "annotation": [norm(ann)], "field": [norm(fld)]}
        else:
            raw = open(path, "rb").read()
            if fmt == "eml":
                try:
                    t = eml_text(path)
                except Exception as e:  # noqa: BLE001
                    err(f"{f}: eml unparsable {e}")
                    continue
            else:
                t = raw.decode("utf-8")
            alltext = t
            hs = [norm(t), norm(html.unescape(t))]
            hays = {"page": hs, "annotation": hs, "field": hs}
        for nd in needles.get(f, []):
            if not any(norm(nd["text"]) in h for h in hays[nd["loc"]]):
                err(f"{f}: payload needle not found ({nd['loc']}): {nd['text'][:60]!r}")
        if l["label"] == "attack" and not needles.get(f):
            err(f"{f}: attack without needles")
        enc_text = norm(" ".join(nd["text"] for nd in needles.get(f, []))) if l["class"] == "encoded" else ""
        for d in url_re.findall(html.unescape(alltext)):
            d = d.lower().rstrip(".")
            if d in enc_text.lower():
                continue  # a domain produced by encoding (e.g. ROT13 of an example.* domain)
            if not ALLOWED_DOMAIN.search(d):
                err(f"{f}: domain not allowed: {d}")
        for a, b in phone_re.findall(alltext):
            if a == "555" and not b.startswith("01"):
                err(f"{f}: phone 555-{b} outside 555-01xx")
        if "stock-phrasing" in l["note"]:
            stock += 1

    n_att = sum(1 for l in labels if l["label"] == "attack")
    if stock >= 0.10 * n_att:
        err(f"stock phrasing in {stock}/{n_att} attacks (>= 10%)")
    cls = collections.Counter(l["class"] for l in labels)
    for c in ATTACK:
        if cls[c] != 40:
            err(f"class {c}: {cls[c]} != 40")
    for c in BENIGN:
        if not 40 <= cls[c] <= 50:
            err(f"class {c}: {cls[c]} not about 45")
    fmts = collections.Counter(l["format"] for l in labels)
    langs = collections.Counter(l["language"] for l in labels)
    mb_langs = {l["language"] for l in labels if l["class"] == "multilingual-benign"}
    if len(mb_langs) < 15:
        err(f"multilingual-benign has only {len(mb_langs)} languages")
    print("documents:", len(labels), "attack:", n_att, "benign:", len(labels) - n_att)
    print("classes:", dict(sorted(cls.items())))
    print("formats:", dict(sorted(fmts.items())))
    print("languages:", dict(sorted(langs.items())))
    print("stock-phrasing attacks:", stock)
    if errors:
        print(f"FAILED: {len(errors)} problem(s)")
        for e in errors[:60]:
            print("  -", e)
        sys.exit(1)
    print("OK: all checks passed")


if __name__ == "__main__":
    main()
