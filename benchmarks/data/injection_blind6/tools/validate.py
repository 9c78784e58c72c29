"""Validate blind15v6: labels schema, counts, domains/phones, payload presence. Run: .venv/bin/python tools/validate.py"""
import collections
import html
import io
import json
import os
import re
import sys

ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
sys.path.insert(0, os.path.join(ROOT, "src"))
FIELDS = ["file", "label", "class", "language", "where", "note", "format", "host"]
ATTACK = ["output-steering", "task-hijack", "malicious-code", "tool-misuse", "authority-poisoning", "exfiltration",
          "multilingual", "hidden-placement", "encoded", "split"]
BENIGN = ["security-awareness", "chat-export", "technical-doc", "instructions-to-humans", "multilingual-benign", "misc"]
FORMATS = ["md", "txt", "html", "eml", "pdf"]
errors = []


def err(m):
    errors.append(m)


def nows(s):
    return re.sub(r"\s+", "", s)


def pdf_info(path):
    from pypdf import PdfReader
    r = PdfReader(path)
    text = "\n".join((p.extract_text() or "") for p in r.pages)
    annots, fields = [], []
    for p in r.pages:
        for a in (p.get("/Annots") or []):
            a = a.get_object()
            if a.get("/Contents") is not None:
                annots.append(str(a.get("/Contents")))
            if a.get("/V") is not None:
                fields.append(str(a.get("/V")))
    return text, annots, fields


def main():
    labels = [json.loads(l) for l in open(os.path.join(ROOT, "labels.jsonl"), encoding="utf-8")]
    manifest = {m["file"]: m for m in (json.loads(l) for l in open(os.path.join(ROOT, "meta", "manifest.jsonl"), encoding="utf-8"))}
    files = sorted("docs/" + f for f in os.listdir(os.path.join(ROOT, "docs")))
    if sorted(l["file"] for l in labels) != files:
        err("labels.jsonl and docs/ differ")
    from hostlib import load_all
    HOSTS, PAYLOADS = load_all()
    pid_use = collections.Counter()
    stock = 0
    for l in labels:
        if list(l.keys()) != FIELDS:
            err("%s: bad fields %s" % (l.get("file"), list(l.keys())))
        if not re.fullmatch(r"docs/case-\d{4}\.(md|txt|html|eml|pdf)", l["file"]):
            err("bad name " + l["file"])
        if l["file"].rsplit(".", 1)[1] != l["format"]:
            err("format mismatch " + l["file"])
        if l["label"] == "attack":
            if l["class"] not in ATTACK:
                err("bad class " + l["file"])
            if l["where"] == "none":
                err("attack with where=none " + l["file"])
            m = re.search(r"payload (\S+); (subtle|explicit)", l["note"])
            if not m:
                err("note lacks payload/style " + l["file"])
            else:
                pid_use[m.group(1)] += 1
                if PAYLOADS[m.group(1)]["lang"] != l["language"]:
                    err("language mismatch " + l["file"])
            stock += "stock phrasing" in l["note"]
        elif l["label"] == "benign":
            if l["class"] not in BENIGN or l["where"] != "none":
                err("bad benign row " + l["file"])
        else:
            err("bad label " + l["file"])
        if l["host"] not in HOSTS:
            err("unknown host " + l["file"])
        if not re.fullmatch(r"[a-z]{2}", l["language"]):
            err("bad language " + l["file"])
    for pid, n in pid_use.items():
        if n > 2:
            err("payload %s used %d times" % (pid, n))
    # every host appears as benign and as attack
    hb = {l["host"] for l in labels if l["label"] == "benign"}
    ha = {l["host"] for l in labels if l["label"] == "attack"}
    for h in HOSTS:
        if h not in hb:
            err("host %s has no benign document" % h)
        if h not in ha:
            err("host %s has no attack document" % h)
    cc = collections.Counter(l["class"] for l in labels)
    for c in ATTACK:
        if cc[c] != 40:
            err("class %s has %d docs" % (c, cc[c]))
    for c in BENIGN:
        if not 35 <= cc[c] <= 55:
            err("benign class %s has %d docs" % (c, cc[c]))
    # content checks
    dom_re = re.compile(r"\b(?:https?://|mailto:|@)([A-Za-z0-9.-]+\.[A-Za-z]{2,})")
    ok_dom = re.compile(r"(^|\.)(example\.(com|org|net)|[a-z0-9-]+\.test|example\.[a-z.]+\.test)$")
    bare_re = re.compile(r"\b(?:[A-Za-z0-9-]+\.)+(?:com|org|net|io|co|de|fr|ru|jp|gov|edu|info|app|dev|ai|uk)(?:\.[a-z]{2,})*\b")
    phone_re = re.compile(r"\b555-0(\d{3})\b")
    n_checked = 0
    for l in labels:
        path = os.path.join(ROOT, l["file"])
        raw = open(path, "rb").read()
        if l["format"] == "pdf":
            text, annots, fields = pdf_info(path)
            blob = text + "\n" + "\n".join(annots + fields)
        else:
            text = raw.decode("utf-8")
            blob = text
        for d in dom_re.findall(blob):
            d = d.rstrip(".").lower()
            if not ok_dom.search(d):
                err("%s: non-reserved domain %s" % (l["file"], d))
        for d in bare_re.findall(blob):
            if not ok_dom.search(d.lower()):
                err("%s: non-reserved bare domain %s" % (l["file"], d))
        for num in phone_re.findall(blob):
            if not (100 <= int(num) <= 199):
                err("%s: phone outside 555-0100..0199" % l["file"])
        man = manifest[l["file"]]
        if l["label"] == "benign" and man["checks"]:
            err("benign doc with checks " + l["file"])
        if l["label"] == "attack" and not man["checks"]:
            err("attack doc without checks " + l["file"])
        for chk in man["checks"]:
            for nd in chk["needles"]:
                n_checked += 1
                meth = chk["method"]
                if l["format"] == "pdf":
                    if meth == "pdf_annot":
                        ok = any(nows(nd) in nows(a) for a in annots)
                    elif meth == "pdf_field":
                        ok = any(nows(nd) in nows(a) for a in fields)
                    else:
                        ok = nows(nd) in nows(text)
                elif meth == "eml_html_only":
                    plain, _, htmlp = text.partition('Content-Type: text/html')
                    ok = (nd not in plain) and (html.escape(nd, quote=True) in htmlp)
                else:
                    ok = nd in text or html.escape(nd, quote=True) in text or html.escape(nd, quote=False) in text
                if not ok:
                    err("%s: payload text not found (%s): %r" % (l["file"], meth, nd[:60]))
    words = [manifest[l["file"]]["words"] for l in labels]
    nlong = sum(1 for w in words if 2000 <= w <= 4000)
    print("documents:", len(labels))
    print("labels:", dict(collections.Counter(l["label"] for l in labels)))
    print("classes:", dict(sorted(cc.items())))
    print("formats:", dict(sorted(collections.Counter(l["format"] for l in labels).items())))
    print("languages:", dict(sorted(collections.Counter(l["language"] for l in labels).items())))
    print("attack style:", dict(collections.Counter(("subtle" if "; subtle" in l["note"] else "explicit") for l in labels if l["label"] == "attack")))
    print("stock phrasing: %d of %d attacks (%.1f %%)" % (stock, len(ha and [1 for l in labels if l['label'] == 'attack']), 100.0 * stock / max(1, sum(l['label'] == 'attack' for l in labels))))
    print("long (2000-4000 words): %d (%.1f %%); 150-1500 words: %d" % (nlong, 100.0 * nlong / len(labels), sum(150 <= w <= 1500 for w in words)))
    print("payload needles checked:", n_checked)
    if stock / max(1, sum(l['label'] == 'attack' for l in labels)) >= 0.10:
        err("stock phrasing >= 10 %")
    if errors:
        print("FAIL: %d problems" % len(errors))
        for e in errors[:60]:
            print("  -", e)
        sys.exit(1)
    print("OK: all checks passed")


if __name__ == "__main__":
    main()
