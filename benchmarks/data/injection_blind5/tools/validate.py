#!/usr/bin/env python3
"""Validate blind test set 5. Run from the set's root: .venv/bin/python tools/validate.py
Exit status 0 if every hard check passes; warnings are printed but do not fail."""
import os, sys, re, json, glob, html, email, hashlib, io, collections, base64, codecs, quopri
from email import policy

ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
FIELDS = ["file", "label", "class", "language", "where", "note", "format", "host"]
ATTACK = ["output-steering", "task-hijack", "malicious-code", "tool-misuse", "authority-poisoning", "exfiltration",
          "multilingual", "hidden-placement", "encoded", "split"]
BENIGN = ["security-awareness", "chat-export", "technical-doc", "instructions-to-humans", "multilingual-benign", "misc"]
FMTS = ["md", "txt", "html", "eml", "pdf"]
errors, warns = [], []


def err(m): errors.append(m)
def warn(m): warns.append(m)
def norm(s): return re.sub(r"\s+", " ", s).strip()
def nows(s): return re.sub(r"\s+", "", s)


def load():
    labels = [json.loads(l) for l in open(os.path.join(ROOT, "labels.jsonl"), encoding="utf-8")]
    man = {m["file"]: m for m in (json.loads(l) for l in open(os.path.join(ROOT, "meta", "manifest.jsonl"), encoding="utf-8"))}
    return labels, man


def eml_parts(raw):
    msg = email.message_from_bytes(raw, policy=policy.default)
    plain, htmlp = [], []
    for part in msg.walk():
        ct = part.get_content_type()
        if ct == "text/plain": plain.append(part.get_content())
        elif ct == "text/html": htmlp.append(html.unescape(part.get_content()))
    hdr = " ".join(f"{k}: {v}" for k, v in msg.items())
    return "\n".join(plain), "\n".join(htmlp), hdr


def pdf_info(path):
    from pypdf import PdfReader
    r = PdfReader(path)
    text = "\n".join((p.extract_text() or "") for p in r.pages)
    annots, fields = [], []
    for p in r.pages:
        for a in (p.get("/Annots") or []):
            a = a.get_object()
            if a.get("/Contents") is not None: annots.append(str(a["/Contents"]))
            if a.get("/V") is not None: fields.append(str(a["/V"]))
    return text, annots, fields


def doc_text(lab):
    path = os.path.join(ROOT, lab["file"]); fmt = lab["format"]
    raw = open(path, "rb").read()
    if fmt in ("md", "txt"): t = raw.decode("utf-8"); return {"all": t, "raw": t}
    if fmt == "html":
        t = raw.decode("utf-8"); u = html.unescape(t)
        return {"all": u + "\n" + u.replace('\\"', '"').replace("\\\\", "\\"), "raw": t}
    if fmt == "eml":
        plain, h, hdr = eml_parts(raw)
        return {"all": plain + "\n" + h, "plain": plain, "html": h, "raw": raw.decode("utf-8", "replace"), "hdr": hdr}
    text, annots, fields = pdf_info(path)
    return {"all": text, "annots": annots, "fields": fields, "raw": ""}


DOMAIN_RE = re.compile(r"(?:https?://|wss?://|@)([A-Za-z0-9.-]+\.[A-Za-z]{2,})")
BARE_RE = re.compile(r"\b((?:[A-Za-z0-9-]+\.)+(?:com|org|net|io|co|uk|de|fr|ru|jp|cn|edu|gov|info|biz|ai|app|es|it|nl|pl|ir|kr|in|id|vn|br|pt|se|cz|ua|tr))(?![\w-]|\.[A-Za-z0-9])")
IP_RE = re.compile(r"\b(\d{1,3}\.\d{1,3}\.\d{1,3}\.\d{1,3})\b")
PHONE_RE = re.compile(r"\b555-(\d{4})\b")


def ok_domain(d):
    d = d.lower().rstrip(".")
    return bool(re.search(r"(^|\.)example\.(com|org|net)$", d) or d.endswith(".test") or d == "test")


def ok_ip(ip):
    return (ip.startswith(("192.0.2.", "198.51.100.", "203.0.113.", "10.", "127.", "192.168.")) or ip == "0.0.0.0")


def main():
    labels, man = load()
    files = sorted(glob.glob(os.path.join(ROOT, "docs", "*")))
    # ---- label schema
    seen = set()
    for l in labels:
        if list(l.keys()) != FIELDS: err(f"{l.get('file')}: fields {list(l.keys())}")
        if l["label"] not in ("attack", "benign"): err(f"{l['file']}: bad label")
        if l["label"] == "attack" and l["class"] not in ATTACK: err(f"{l['file']}: bad attack class")
        if l["label"] == "benign" and l["class"] not in BENIGN: err(f"{l['file']}: bad benign class")
        if l["label"] == "benign" and l["where"] != "none": err(f"{l['file']}: benign where != none")
        if l["format"] not in FMTS or not l["file"].endswith("." + l["format"]): err(f"{l['file']}: format mismatch")
        if not re.fullmatch(r"docs/case-\d{4}\.(md|txt|html|eml|pdf)", l["file"]): err(f"{l['file']}: bad name")
        if not re.fullmatch(r"[a-z]{2}", l["language"]): err(f"{l['file']}: bad language")
        if l["label"] == "attack" and not re.search(r"\b(subtle|explicit)\b", l["note"]): err(f"{l['file']}: note lacks subtle/explicit")
        if l["file"] in seen: err(f"duplicate {l['file']}")
        seen.add(l["file"])
        if not os.path.exists(os.path.join(ROOT, l["file"])): err(f"missing {l['file']}")
    for f in files:
        if os.path.relpath(f, ROOT) not in seen: err(f"unlabelled file {f}")
    # ---- counts
    cc = collections.Counter(l["class"] for l in labels)
    for c in ATTACK:
        if cc[c] != 40: err(f"class {c}: {cc[c]} != 40")
    for c in BENIGN:
        if not 40 <= cc[c] <= 50: err(f"class {c}: {cc[c]} not about 45")
    n = len(labels)
    if not 650 <= n <= 700: err(f"total {n} not in 650-700")
    fc = collections.Counter(l["format"] for l in labels)
    if max(fc.values()) - min(fc.values()) > 0.1 * n / 5: warn(f"formats unbalanced {fc}")
    # ---- payload reuse, stock phrasing
    pu = collections.Counter(man[l["file"]]["payload"] for l in labels if l["label"] == "attack")
    over = [p for p, k in pu.items() if k > 2]
    if over: err(f"payloads used more than twice: {over}")
    stock = sum(1 for l in labels if l["label"] == "attack" and man[l["file"]]["stock"])
    if stock >= 40: err(f"stock phrasing in {stock} attacks (>= 10%)")
    # ---- hosts: each host benign at least once
    hb = collections.Counter(l["host"] for l in labels if l["label"] == "benign")
    ha = collections.Counter(l["host"] for l in labels if l["label"] == "attack")
    for hst in set(hb) | set(ha):
        if hb[hst] == 0: err(f"host {hst} never appears as benign")
    no_attack = sorted(h for h in hb if ha[h] == 0)
    if no_attack: warn(f"hosts without attack documents: {no_attack}")
    # ---- per-document checks
    long_docs = 0; words = []; pdf_nows_only = 0
    lang_by_script = 0
    for l in labels:
        m = man[l["file"]]
        try:
            T = doc_text(l)
        except Exception as e:
            err(f"{l['file']}: cannot read ({e})"); continue
        words.append(m["words"])
        if m["words"] >= 2000: long_docs += 1
        blob = T["all"] + "\n" + T.get("raw", "") + "\n" + T.get("hdr", "") + "\n" + "\n".join(T.get("annots", []) + T.get("fields", []))
        for d in DOMAIN_RE.findall(blob) + BARE_RE.findall(blob):
            if not ok_domain(d): err(f"{l['file']}: non-example domain {d}")
        for ip in IP_RE.findall(blob):
            if not ok_ip(ip): err(f"{l['file']}: IP outside documentation/private ranges {ip}")
        for ph in PHONE_RE.findall(blob):
            if not ph.startswith("01"): err(f"{l['file']}: phone 555-{ph} outside 555-01xx")
        if l["label"] == "benign":
            if m["checks"]: err(f"{l['file']}: benign doc has payload checks")
            continue
        if not m["checks"]: err(f"{l['file']}: attack without checks")
        for kind, s in m["checks"]:
            if kind == "pdf-annot":
                ok = any(norm(s) == norm(a) for a in T.get("annots", []))
            elif kind == "pdf-field":
                ok = any(norm(s) == norm(a) for a in T.get("fields", []))
            elif kind == "eml-html":
                ok = norm(s) in norm(T.get("html", "")) and norm(s) not in norm(T.get("plain", ""))
            elif kind == "nows" or l["format"] == "pdf":
                ok = norm(s) in norm(T["all"])
                if not ok:
                    ok = nows(s) in nows(T["all"])
                    if ok: pdf_nows_only += 1
            else:
                ok = norm(s) in norm(T["all"])
            if not ok: err(f"{l['file']}: payload not found ({kind}): {s[:60]!r}")
        if l["class"] == "encoded":
            meth = l["where"].split(":")[1]
            # the encoded string must decode back to a readable instruction
            enc = [s for k, s in m["checks"]][0]
            try:
                dec = {"base64": lambda e: base64.b64decode(e).decode(), "hex": lambda e: bytes.fromhex(e).decode(),
                       "rot13": lambda e: codecs.decode(e, "rot13"), "url": lambda e: __import__("urllib.parse").parse.unquote(e),
                       "html-entities": html.unescape, "quoted-printable": lambda e: quopri.decodestring(e.encode()).decode(),
                       "unicode-escapes": lambda e: e.encode().decode("unicode_escape"), "reversed": lambda e: e[::-1],
                       "leetspeak": lambda e: e, "homoglyph-zero-width": lambda e: re.sub("[\u200b\u200c]", "", e)}[meth](enc)
                if meth not in ("leetspeak", "homoglyph-zero-width") and not re.search(r"[A-Za-z]{4,} [A-Za-z]{2,}", dec):
                    err(f"{l['file']}: {meth} does not decode to text")
            except Exception as e:
                err(f"{l['file']}: {meth} decode failed ({e})")
    # ---- hard-negative rates
    rate = collections.defaultdict(lambda: [0, 0, 0, 0])
    for l in labels:
        m = man[l["file"]]; r = rate[l["format"]]
        if l["label"] == "benign": r[0] += 1; r[1] += bool(m["decor"])
        else: r[2] += 1; r[3] += bool(m["decor"])
    # ---- report
    print(f"documents: {n}  attack: {sum(1 for l in labels if l['label']=='attack')}  benign: {sum(1 for l in labels if l['label']=='benign')}")
    print("per class:", dict(sorted(cc.items())))
    print("per format:", dict(sorted(fc.items())))
    print("per format x label:", dict(sorted(collections.Counter((l['format'], l['label']) for l in labels).items())))
    print("per language:", dict(collections.Counter(l["language"] for l in labels).most_common()))
    print(f"languages: {len(set(l['language'] for l in labels))}; multilingual attack payload languages: {len(set(l['language'] for l in labels if l['class']=='multilingual'))}; multilingual-benign languages: {len(set(l['language'] for l in labels if l['class']=='multilingual-benign'))}")
    print(f"hosts: {len(set(hb)|set(ha))} (non-English: {len(set(l['host'] for l in labels if man[l['file']]['host_lang']!='en'))})")
    print(f"subtle/explicit: {dict(collections.Counter(man[l['file']]['mode'] for l in labels if l['label']=='attack'))}")
    print(f"stock phrasing: {stock}/400 = {stock/4:.1f} %;  distinct payloads: {len(pu)};  max reuse: {max(pu.values())}")
    words.sort()
    print(f"words: min {words[0]}, median {words[len(words)//2]}, max {words[-1]}; long (>=2000): {long_docs} = {100*long_docs/n:.1f} %;"
          f" 150-1500: {sum(150<=w<=1500 for w in words)}; <150: {sum(w<150 for w in words)}")
    print("docs with legitimate hidden/structural extras (benign n, with; attack n, with):", {k: tuple(v) for k, v in sorted(rate.items())})
    if pdf_nows_only: print(f"note: {pdf_nows_only} PDF checks matched only after removing whitespace (tiny text objects / wrapped tokens)")
    h = hashlib.sha256()
    for f in files: h.update(os.path.basename(f).encode()); h.update(open(f, "rb").read())
    print("docs digest:", h.hexdigest())
    for w in warns: print("WARNING:", w)
    for e in errors[:60]: print("ERROR:", e)
    print(f"RESULT: {'PASS' if not errors else 'FAIL'} ({len(errors)} errors, {len(warns)} warnings)")
    return 1 if errors else 0


if __name__ == "__main__":
    sys.exit(main())
