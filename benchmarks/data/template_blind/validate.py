#!/usr/bin/env python3
"""Validate the generated corpus (standard library only)."""
import json, os, re, itertools, collections, sys
HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "out")

def words(t): return re.sub(r"[^\w\s]", "", t.lower()).split()
def sh(t, k=5):
    w = words(t)
    return {tuple(w[i:i+k]) for i in range(len(w)-k+1)} if len(w) >= k else {tuple(w)}
def jac(a, b): return len(a & b) / len(a | b)

ok = True
man = [json.loads(l) for l in open(os.path.join(OUT, "manifest.jsonl"))]
paths = {m["path"] for m in man}
assert len(paths) == len(man), "duplicate manifest paths"
for m in man:
    assert os.path.exists(os.path.join(OUT, "inbox", m["path"])), m
    assert os.path.exists(os.path.join(OUT, "bodies", m["path"] + ".txt")), m
    host = re.match(r"https://([^/]+)/", m["source_url"]).group(1)
    assert re.search(r"(example\.(org|net|com)|\.test)$", host), host
disk = set()
for root, _, files in os.walk(os.path.join(OUT, "inbox")):
    for f in files:
        disk.add(os.path.relpath(os.path.join(root, f), os.path.join(OUT, "inbox")))
assert disk == paths, "inbox and manifest differ"
bodies = {p: open(os.path.join(OUT, "bodies", p + ".txt"), encoding="utf-8").read() for p in paths}
S = {p: sh(t) for p, t in bodies.items()}
persite = collections.Counter(p.split("/")[0] for p in paths)
print("sites:", len(persite), dict(persite), "documents:", len(paths))
bw = collections.defaultdict(list)
for p, t in bodies.items():
    bw[p.split("/")[0]].append(len(words(t)))
for s, l in sorted(bw.items()):
    print("  body words %-12s min %d max %d mean %d  short(150-200): %d" % (s, min(l), max(l), sum(l)//len(l), sum(150 <= x <= 200 for x in l)))
pairs = [json.loads(l) for l in open(os.path.join(OUT, "pairs.jsonl"))]
rel = collections.Counter(p["relation"] for p in pairs)
print("pairs:", len(pairs), dict(rel))
seen = set()
for p in pairs:
    assert p["a"] in paths and p["b"] in paths and p["a"] != p["b"], p
    key = tuple(sorted((p["a"], p["b"])))
    assert key not in seen, ("duplicate pair", key); seen.add(key)
    j = jac(S[p["a"]], S[p["b"]])
    assert abs(j - p["body_jaccard"]) < 1e-3, (p, j)
    if p["relation"] == "exact-body": assert bodies[p["a"]] == bodies[p["b"]], p
    if p["relation"] == "near-duplicate": assert 0.80 <= j < 1.0, p
rng = collections.defaultdict(list)
for p in pairs:
    kind = p["relation"] + (" (hard negative)" if p["note"].startswith("hard") else " (random same-site)" if p["note"].startswith("random") else "")
    if p["note"].startswith("cross-format"): kind += " (cross-format)"
    rng[kind].append(p["body_jaccard"])
for k, l in sorted(rng.items()):
    print("  %-40s n=%3d jaccard min %.3f max %.3f mean %.3f" % (k, len(l), min(l), max(l), sum(l)/len(l)))
rs = collections.Counter(p["a"].split("/")[0] for p in pairs if p["note"].startswith("random"))
print("random same-site distinct pairs per site:", dict(rs))
# unlabelled pairs: nothing outside a planted cluster may look like a duplicate
cl = {json.loads(l)["path"]: json.loads(l)["cluster"] for l in open(os.path.join(OUT, "clusters.jsonl"))}
mx = (0, None)
for a, b in itertools.combinations(sorted(paths), 2):
    if cl[a] != cl[b]:
        j = jac(S[a], S[b])
        if j > mx[0]: mx = (j, (a, b))
print("max body jaccard between different clusters: %.3f %s" % mx)
assert mx[0] < 0.5
size = sum(os.path.getsize(os.path.join(r, f)) for r, _, fs in os.walk(OUT) for f in fs)
print("out/ size: %.1f MB" % (size / 1e6))
print("OK")
