#!/usr/bin/env python3
"""Validate /work/train27/rows/*.jsonl (standard library only)."""
import json, os, re, sys, collections
ATTACK = {"output-steering","task-hijack","malicious-code","tool-misuse","authority-poisoning","exfiltration","role-override"}
BENIGN = {"security-awareness","chat-export","technical-doc","instructions-to-humans","compliance-notice","marketing","ai-product-docs","misc"}
KEYS = ["text","label","class","language","kind"]
DOM = re.compile(r"\b((?:[a-z0-9-]+\.)+[a-z]{2,})(?=[/:\s\"'`)\]>,;]|$)", re.I)
OKDOM = re.compile(r"(^|\.)(example\.(com|org|net)|[a-z0-9-]+\.test)$", re.I)
FILE_EXT = {"py","js","sh","ps1","txt","json","md","csv","log","zip","pdf","exe","yaml","yml","html","png","jpg","dll","ini","tmp","bak","db","key","pem","env","gz","tar"}
IP = re.compile(r"\b(\d{1,3})\.(\d{1,3})\.(\d{1,3})\.(\d{1,3})\b")
def main():
    d = os.path.join(os.path.dirname(os.path.abspath(__file__)), "rows")
    errs = []; seen = set(); cnt = collections.Counter(); per = collections.defaultdict(collections.Counter)
    for fn in sorted(os.listdir(d)):
        if not fn.endswith(".jsonl"): continue
        lang = fn[:-6]
        for i, line in enumerate(open(os.path.join(d, fn), encoding="utf-8"), 1):
            try: r = json.loads(line)
            except Exception as e: errs.append(f"{fn}:{i} bad json {e}"); continue
            if list(r.keys()) != KEYS: errs.append(f"{fn}:{i} keys {list(r.keys())}")
            if r.get("language") != lang: errs.append(f"{fn}:{i} language mismatch")
            if r.get("kind") not in ("sentence","passage"): errs.append(f"{fn}:{i} kind")
            lab, c = r.get("label"), r.get("class")
            if not ((lab == "attack" and c in ATTACK) or (lab == "benign" and c in BENIGN)): errs.append(f"{fn}:{i} label/class {lab}/{c}")
            t = r.get("text", "")
            if not isinstance(t, str) or not t.strip(): errs.append(f"{fn}:{i} empty text")
            if t in seen: errs.append(f"{fn}:{i} duplicate")
            seen.add(t)
            for m in DOM.finditer(t):
                dm = m.group(1).lower()
                if dm.rsplit(".",1)[-1] in FILE_EXT or re.match(r"^[\d.]+$", dm): continue
                if not OKDOM.search(dm) and re.search(r"\.(com|org|net|io|ai|dev|co|app|ru|cn|de|fr|info|biz|xyz|me)$", dm):
                    errs.append(f"{fn}:{i} domain {dm}")
            for m in IP.finditer(t):
                ip = m.group(0)
                if not (ip.startswith("192.0.2.") or ip.startswith("198.51.100.") or ip.startswith("203.0.113.") or ip.startswith("127.0.0.") or ip.startswith("0.0.0.")):
                    errs.append(f"{fn}:{i} ip {ip}")
            cnt[(lang, lab)] += 1; per[lang][c] += 1
    tot = sum(cnt.values())
    print(f"total rows: {tot}")
    for lang in sorted(per):
        a, b = cnt[(lang,"attack")], cnt[(lang,"benign")]
        print(f"{lang}: {a+b} rows, attack {a} ({100*a/max(1,a+b):.0f}%), benign {b}; " + ", ".join(f"{k}={v}" for k,v in sorted(per[lang].items())))
    for e in errs[:50]: print("ERROR", e)
    print(f"errors: {len(errs)}")
    return 1 if errs else 0
if __name__ == "__main__": sys.exit(main())
