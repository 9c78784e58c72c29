"""Regenerate the '## Counts' section of README.md from labels.jsonl and meta/manifest.jsonl."""
import collections
import json
import os
import re

ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
L = [json.loads(l) for l in open(os.path.join(ROOT, "labels.jsonl"), encoding="utf-8")]
M = {m["file"]: m for m in (json.loads(l) for l in open(os.path.join(ROOT, "meta", "manifest.jsonl"), encoding="utf-8"))}
fm = ["md", "txt", "html", "eml", "pdf"]
cc = collections.defaultdict(collections.Counter)
for l in L:
    cc[(l["label"], l["class"])][l["format"]] += 1
att = [l for l in L if l["label"] == "attack"]
words = [M[l["file"]]["words"] for l in L]
fc = collections.Counter(l["format"] for l in L)
out = ["## Counts", ""]
out.append("%d documents: %d attack, %d benign. Formats: %s." % (
    len(L), len(att), len(L) - len(att), ", ".join("%s %d" % (f, fc[f]) for f in fm)))
sub = sum("; subtle" in l["note"] for l in att)
stock = sum("stock phrasing" in l["note"] for l in att)
out.append("Attack style: %d subtle, %d explicit. Stock phrasing (\"ignore/disregard previous instructions\", "
           "\"override\" and similar): %d of %d attacks (%.1f %%)." % (sub, len(att) - sub, stock, len(att), 100.0 * stock / len(att)))
nl = sum(2000 <= w <= 4000 for w in words)
out.append("Long documents (2,000-4,000 words): %d (%.1f %%); %d documents have 150-1,500 words; the rest "
           "are shorter (mostly non-English notices)." % (nl, 100.0 * nl / len(L), sum(150 <= w <= 1500 for w in words)))
out += ["", "| label | class | md | txt | html | eml | pdf | total |", "|---|---|---|---|---|---|---|---|"]
for k in sorted(cc):
    out.append("| %s | %s | %s | %d |" % (k[0], k[1], " | ".join(str(cc[k][f]) for f in fm), sum(cc[k].values())))
out += ["", "Languages (`language` field): " + ", ".join("%s %d" % kv for kv in sorted(collections.Counter(l["language"] for l in L).items())) + "."]
out += ["", "Hosts: %d (%d English, %d non-English)." % (len({l["host"] for l in L}), len({l["host"] for l in L if l["host"].startswith("en")}), len({l["host"] for l in L if not l["host"].startswith("en")})), ""]
p = os.path.join(ROOT, "README.md")
s = open(p, encoding="utf-8").read()
s = re.sub(r"## Counts\n.*?(?=## Legitimate hidden)", "\n".join(out) + "\n", s, flags=re.S)
open(p, "w", encoding="utf-8").write(s)
print("\n".join(out))
