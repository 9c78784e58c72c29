#!/usr/bin/env python3
"""Validate /work/train26/rows/*.jsonl (standard library only) and print counts."""
import json, os, re, sys, collections
HERE = os.path.dirname(os.path.abspath(__file__))
ATTACK = {"output-steering", "task-hijack", "malicious-code", "tool-misuse",
          "authority-poisoning", "exfiltration", "role-override"}
BENIGN = {"security-awareness", "chat-export", "technical-doc", "instructions-to-humans",
          "compliance-notice", "marketing", "ai-product-docs", "misc"}
LANGS = set("en es de fr ja pt ru it nl pl tr fa zh vi id ko ar sv hi cs uk el ro he th da fi hu".split())
KEYS = ["text", "label", "class", "language", "kind"]
URL_RE = re.compile(r"(?:https?://|www\.|@)([A-Za-z0-9.-]+\.[A-Za-z]{2,})")
OK_DOM = re.compile(r"(^|\.)(example\.(com|org|net)|[a-z0-9-]+\.test)$", re.I)
IP_RE = re.compile(r"\b(\d{1,3})\.(\d{1,3})\.(\d{1,3})\.(\d{1,3})\b")
OK_IP = ("192.0.2.", "198.51.100.", "203.0.113.")
PHONE_RE = re.compile(r"\b555-?(\d{4})\b")
STOCK = re.compile(r"ignore (all )?(the )?previous instructions|you are now DAN|system prompt override", re.I)

def main():
    errs = []; seen = {}; counts = collections.Counter(); total = 0; stock = 0; att = 0
    files = sorted(f for f in os.listdir(os.path.join(HERE, "rows")) if f.endswith(".jsonl"))
    for fn in files:
        lang = fn[:-6]
        for i, line in enumerate(open(os.path.join(HERE, "rows", fn), encoding="utf-8"), 1):
            where = f"{fn}:{i}"
            try:
                r = json.loads(line)
            except Exception as e:
                errs.append(f"{where}: bad json {e}"); continue
            if list(r.keys()) != KEYS: errs.append(f"{where}: keys {list(r.keys())}")
            t = r.get("text")
            if not isinstance(t, str) or not t.strip(): errs.append(f"{where}: empty text"); continue
            lab, cl = r.get("label"), r.get("class")
            if lab == "attack" and cl not in ATTACK: errs.append(f"{where}: bad attack class {cl}")
            elif lab == "benign" and cl not in BENIGN: errs.append(f"{where}: bad benign class {cl}")
            elif lab not in ("attack", "benign"): errs.append(f"{where}: bad label {lab}")
            if r.get("language") != lang or lang not in LANGS: errs.append(f"{where}: language {r.get('language')}")
            if r.get("kind") not in ("sentence", "passage"): errs.append(f"{where}: kind {r.get('kind')}")
            for d in URL_RE.findall(t):
                d = d.rstrip(".")
                if not OK_DOM.search(d): errs.append(f"{where}: domain {d}")
            for m in IP_RE.finditer(t):
                ip = m.group(0)
                if not ip.startswith(OK_IP) and not ip.startswith(("0.", "1.", "2.", "3.")) :
                    errs.append(f"{where}: ip {ip}")
            for m in PHONE_RE.finditer(t):
                if not m.group(1).startswith("01"): errs.append(f"{where}: phone {m.group(0)}")
            key = t.strip()
            if key in seen: errs.append(f"{where}: duplicate of {seen[key]}")
            seen[key] = where
            counts[(lang, lab, cl)] += 1; total += 1
            if lab == "attack":
                att += 1; stock += bool(STOCK.search(t))
    langs = sorted({k[0] for k in counts}, key=lambda l: (l != "en", l))
    print(f"{'lang':5}{'total':>7}{'attack':>8}{'benign':>8}  per class")
    for l in langs:
        a = sum(v for k, v in counts.items() if k[0] == l and k[1] == "attack")
        b = sum(v for k, v in counts.items() if k[0] == l and k[1] == "benign")
        per = " ".join(f"{k[2]}={v}" for k, v in sorted(counts.items()) if k[0] == l)
        print(f"{l:5}{a+b:>7}{a:>8}{b:>8}  {per}")
        if l != "en":
            for c in ATTACK:
                if counts[(l, 'attack', c)] < 8: errs.append(f"{l}: attack class {c} < 8")
            for c in BENIGN:
                if counts[(l, 'benign', c)] < 5: errs.append(f"{l}: benign class {c} < 5")
    cc = collections.Counter()
    for k, v in counts.items(): cc[(k[1], k[2])] += v
    print("\nper class (all languages):")
    for k, v in sorted(cc.items()): print(f"  {k[0]:7} {k[1]:22} {v}")
    print(f"\ntotal rows {total}, attack {att}, benign {total-att}; stock-phrase attack rows {stock} ({100*stock/max(att,1):.1f}%)")
    if att and stock / att >= 0.05: errs.append("stock phrasing >= 5% of attack rows")
    for e in errs[:50]: print("ERROR", e)
    print("VALID" if not errs else f"INVALID ({len(errs)} errors)")
    return 1 if errs else 0

if __name__ == "__main__":
    sys.exit(main())
