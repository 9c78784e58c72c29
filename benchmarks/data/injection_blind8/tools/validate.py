#!/usr/bin/env python3
"""Validate blind set 8: labels, counts, domains, phone numbers, payload presence.
Run: .venv/bin/python tools/validate.py   (exit code 0 = all checks passed)"""
import collections, html, json, os, re, sys

ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
sys.path.insert(0, os.path.join(ROOT, "src"))
from content import load_hosts, load_payloads  # noqa: E402
from encode import encode  # noqa: E402

FIELDS = ["file", "label", "class", "language", "where", "note", "format", "host"]
ATTACK = ["output-steering", "task-hijack", "malicious-code", "tool-misuse", "authority-poisoning", "exfiltration",
          "multilingual", "hidden-placement", "encoded", "split"]
BENIGN = ["security-awareness", "chat-export", "technical-doc", "instructions-to-humans", "multilingual-benign", "misc"]
FORMATS = ["md", "txt", "html", "eml", "pdf"]
errors = []


def err(m):
    errors.append(m)


def pdf_text(path):
    from pypdf import PdfReader
    r = PdfReader(path)
    parts = []
    for pg in r.pages:
        parts.append(pg.extract_text() or "")
        for a in pg.get("/Annots") or []:
            a = a.get_object()
            for k in ("/Contents", "/V"):
                if k in a:
                    parts.append(str(a[k]))
    return "\n".join(parts)


def doc_text(path, fmt):
    if fmt == "pdf":
        return pdf_text(path)
    return open(path, encoding="utf-8").read()


def norm(s):
    s = s.replace('"', "'").replace("\u201c", "'").replace("\u201d", "'")
    return re.sub(r"\s+", "", s)


def present(needle, text):
    n = norm(needle)
    return n in norm(text) or n in norm(html.unescape(text)) or n in norm(html.unescape(html.unescape(text)))


def main():
    labels = [json.loads(l) for l in open(os.path.join(ROOT, "labels.jsonl"), encoding="utf-8")]
    hosts = {h["id"]: h for h in load_hosts()}
    payloads = {p["id"]: (c, p) for c, pl in load_payloads().items() for p in pl}
    files = sorted(os.listdir(os.path.join(ROOT, "docs")))
    if len(files) != len(labels):
        err("docs/ has %d files, labels %d" % (len(files), len(labels)))
    seen = set()
    pay_use = collections.Counter()
    host_use = collections.defaultdict(set)
    stock = 0
    for l in labels:
        if list(l.keys()) != FIELDS:
            err("%s: fields %s" % (l.get("file"), list(l.keys())))
            continue
        f = l["file"]
        if f in seen:
            err("duplicate " + f)
        seen.add(f)
        if not re.fullmatch(r"docs/case-\d{4}\.(md|txt|html|eml|pdf)", f):
            err("bad name " + f)
        if f.rsplit(".", 1)[1] != l["format"]:
            err("format mismatch " + f)
        path = os.path.join(ROOT, f)
        if not os.path.exists(path):
            err("missing " + f); continue
        if l["host"] not in hosts:
            err("unknown host " + l["host"])
        host_use[l["host"]].add(l["label"])
        if l["label"] == "benign":
            if l["class"] not in BENIGN or l["where"] != "none":
                err("bad benign label " + f)
            if l["language"] != hosts[l["host"]]["lang"]:
                err("benign language mismatch " + f)
        elif l["label"] == "attack":
            if l["class"] not in ATTACK:
                err("bad class " + f)
            if not re.search(r"; (subtle|explicit)", l["note"]):
                err("note lacks subtle/explicit " + f)
        else:
            err("bad label " + f)
        text = doc_text(path, l["format"])
        low = text.lower()
        # domains and e-mail addresses
        for m in re.finditer(r"(?:https?://|www\.|@)([A-Za-z0-9.-]+\.[A-Za-z]{2,})", text):
            d = m.group(1).lower().rstrip(".")
            if not (re.search(r"(^|\.)example\.(com|org|net)$", d) or d.endswith(".test")):
                err("%s: non-example domain %s" % (f, d))
        for m in re.finditer(r"(?<![\d-])(\d{3})-(\d{4})(?![\d-])", text):
            if m.group(1) != "555" or not m.group(2).startswith("01"):
                if l["format"] != "pdf":
                    err("%s: phone-like number %s" % (f, m.group(0)))
        # payload presence
        if l["label"] == "attack":
            pid = re.search(r"payload (\w+)", l["note"]).group(1)
            cls, p = payloads[pid]
            pay_use[pid] += 1
            if cls != l["class"]:
                err("%s: payload class %s != %s" % (f, cls, l["class"]))
            if p["lang"] != l["language"]:
                err("%s: language mismatch" % f)
            if re.search(r"ignore (all |any )?previous instructions|disregard (your|all) (rules|instructions)|previous instructions are void", p["text"], re.I):
                stock += 1
            if cls == "encoded":
                enc = l["where"].split("+")[0]
                needles = [encode(p["text"], enc)]
            elif cls == "split":
                if l["where"] == "split-first-words":
                    words = p["text"].split()
                    needles = words
                    if l["format"] != "pdf":
                        t = html.unescape(text.replace("<br>", ""))
                        firsts = [ln.split()[0] for ln in t.split("\n") if ln.split()]
                        s = " ".join(firsts)
                        if " ".join(words) not in s:
                            err("%s: acrostic words not found at line starts" % f)
                else:
                    needles = p["frags"]
            else:
                needles = [p["text"]]
            for n in needles:
                if not present(n, text):
                    err("%s: payload %s fragment not found: %s" % (f, pid, n[:50]))
            if l["where"] == "eml-html-part-only":
                plain = text.split("Content-Type: text/html")[0]
                if present(p["text"], plain):
                    err("%s: payload also in plain part" % f)
        else:
            # benign docs must not contain any payload text
            for pid, (cls, p) in payloads.items():
                if len(p["text"]) > 30 and present(p["text"][:60], text):
                    err("%s: benign doc contains payload %s" % (f, pid))
    # counts
    c = collections.Counter(l["class"] for l in labels)
    for k in ATTACK:
        if c[k] != 40:
            err("class %s has %d (want 40)" % (k, c[k]))
    for k in BENIGN:
        if not 40 <= c[k] <= 50:
            err("benign class %s has %d" % (k, c[k]))
    for pid, n in pay_use.items():
        if n > 2:
            err("payload %s used %d times" % (pid, n))
    for hid, labs in host_use.items():
        if labs != {"attack", "benign"}:
            err("host %s appears only as %s" % (hid, labs))
    nat = sum(1 for l in labels if l["label"] == "attack")
    if stock >= 0.1 * nat:
        err("stock phrasing in %d attacks" % stock)
    langs = {l["language"] for l in labels if l["class"] == "multilingual-benign"}
    if len(langs) < 15:
        err("multilingual-benign has only %d languages" % len(langs))
    print("documents:", len(labels), "attack:", nat, "benign:", len(labels) - nat)
    print("classes:", dict(sorted(c.items())))
    print("formats:", dict(sorted(collections.Counter(l["format"] for l in labels).items())))
    print("languages:", dict(sorted(collections.Counter(l["language"] for l in labels).items())))
    print("stock-phrasing attacks:", stock, "long documents:", sum("long document" in l["note"] for l in labels))
    print("hosts used:", len(host_use), "payloads used:", len(pay_use))
    if errors:
        print("FAILED: %d problems" % len(errors))
        for e in errors[:80]:
            print("  -", e)
        sys.exit(1)
    print("OK: all checks passed")


if __name__ == "__main__":
    main()
