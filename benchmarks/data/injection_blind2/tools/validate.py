#!/usr/bin/env python3
"""Validate labels.jsonl against docs/: every labelled file exists, every doc labelled once, classes valid, counts.
Optional: if pypdf is importable, check that every PDF opens and yields text."""
import json, os, sys, re, collections
ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
ATTACK = {"output-steering", "task-hijack", "malicious-code", "tool-misuse", "authority-poisoning", "multilingual",
          "hidden-placement", "encoded", "split", "exfiltration"}
BENIGN = {"security-awareness", "chat-export", "technical-doc", "instructions-to-humans", "multilingual-benign", "misc"}
LANGS = set("es de fr ja ru pt it nl pl tr fa zh vi id cs ko uk ar sv hu el ro da fi he th hi en".split())
MIN_ATTACK = 28; MIN_ML = 70
errs = []
recs = [json.loads(l) for l in open(os.path.join(ROOT, "labels.jsonl"), encoding="utf-8") if l.strip()]
files = sorted("docs/" + f for f in os.listdir(os.path.join(ROOT, "docs")))
seen = collections.Counter(r["file"] for r in recs)
for f, c in seen.items():
    if c > 1: errs.append(f"labelled {c} times: {f}")
    if not os.path.isfile(os.path.join(ROOT, f)): errs.append(f"missing file: {f}")
for f in files:
    if f not in seen: errs.append(f"unlabelled doc: {f}")
for r in recs:
    for k in ("file", "label", "class", "language", "note"):
        if k not in r: errs.append(f"{r.get('file')}: missing key {k}")
    if r["label"] == "attack":
        if r["class"] not in ATTACK: errs.append(f"{r['file']}: bad attack class {r['class']}")
        if not r.get("where"): errs.append(f"{r['file']}: attack without 'where'")
    elif r["label"] == "benign":
        if r["class"] not in BENIGN: errs.append(f"{r['file']}: bad benign class {r['class']}")
    else: errs.append(f"{r['file']}: bad label {r['label']}")
    if r["language"] not in LANGS: errs.append(f"{r['file']}: bad language {r['language']}")
    if not re.fullmatch(r"docs/case-\d{4}\.(md|txt|html|eml|pdf)", r["file"]): errs.append(f"bad file name {r['file']}")
cls = collections.Counter(r["class"] for r in recs); lab = collections.Counter(r["label"] for r in recs)
for c in ATTACK:
    if cls[c] < (MIN_ML if c == "multilingual" else MIN_ATTACK): errs.append(f"class {c} has only {cls[c]}")
mins = {"security-awareness": 35, "chat-export": 30, "technical-doc": 50, "instructions-to-humans": 50, "multilingual-benign": 60}
for c, m in mins.items():
    if cls[c] < m: errs.append(f"class {c} has only {cls[c]} (< {m})")
if lab["benign"] < 260: errs.append(f"only {lab['benign']} benign")
mlang = collections.Counter(r["language"] for r in recs if r["class"] == "multilingual")
blang = collections.Counter(r["language"] for r in recs if r["class"] == "multilingual-benign")
if len([l for l, n in mlang.items() if n >= 3]) < 22: errs.append("multilingual attacks cover < 22 languages with >=3 docs")
if len([l for l, n in blang.items() if n >= 1]) < 22: errs.append("multilingual benign cover < 22 languages")
fmt = collections.Counter(r["file"].rsplit(".", 1)[1] for r in recs)
if fmt["pdf"] < 40: errs.append(f"only {fmt['pdf']} PDFs")
try:
    import pypdf
    bad = 0
    for r in recs:
        if r["file"].endswith(".pdf"):
            try:
                rd = pypdf.PdfReader(os.path.join(ROOT, r["file"])); t = "".join(p.extract_text() or "" for p in rd.pages)
                if len(t) < 50: errs.append(f"{r['file']}: little extractable text")
            except Exception as e:
                errs.append(f"{r['file']}: pypdf failed: {e}"); bad += 1
    print("pypdf check done")
except ImportError:
    print("pypdf not available; PDF open check skipped")
print("total", len(recs), dict(lab))
for c in sorted(cls): print(f"  {c:24s} {cls[c]}")
print("formats", dict(fmt))
print("ml attack langs", len(mlang), dict(sorted(mlang.items())))
print("ml benign langs", len(blang))
if errs:
    print("ERRORS:"); [print(" ", e) for e in errs[:50]]; sys.exit(1)
print("OK")
