#!/usr/bin/env python3
"""Count tables for labels.jsonl. Run: python3 tools/stats.py"""
import collections, json, os
ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
L = [json.loads(l) for l in open(os.path.join(ROOT, "labels.jsonl"), encoding="utf-8")]
def table(title, key):
    c = collections.Counter(key(r) for r in L)
    print("\n## " + title)
    for k, v in sorted(c.items(), key=lambda kv: (-kv[1], str(kv[0]))):
        print("%-45s %4d" % (" / ".join(k) if isinstance(k, tuple) else k, v))
print("total", len(L))
table("label", lambda r: r["label"])
table("label x class", lambda r: (r["label"], r["class"]))
table("format", lambda r: r["format"])
table("label x format", lambda r: (r["label"], r["format"]))
table("language (all)", lambda r: r["language"])
table("attack language", lambda r: r["language"] if r["label"] == "attack" else "(benign)")
table("hidden-placement technique", lambda r: r["where"] if r["class"] == "hidden-placement" else "-")
table("encoded method", lambda r: r["where"].split("/")[0] if r["class"] == "encoded" else "-")
table("split mode", lambda r: r["where"] if r["class"] == "split" else "-")
table("visible placement", lambda r: r["where"] if r["where"].startswith("visible/") else "-")
