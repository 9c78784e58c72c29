#!/usr/bin/env python3
"""Re-check the generated corpus (standard library only). Usage: python validate.py [OUT_DIR]"""
import collections
import html
import itertools
import json
import os
import re
import sys
import zlib

OUT = sys.argv[1] if len(sys.argv) > 1 else os.path.join(os.path.dirname(os.path.abspath(__file__)), "out")
errors = []


def err(m):
    if len(errors) < 200:
        errors.append(m)


def shingles(text):
    t = re.sub(r"[^\w\s]", "", text.lower()).split()
    return frozenset(tuple(t[i:i + 5]) for i in range(len(t) - 4))


def jacc(a, b):
    if not a and not b:
        return 1.0
    return len(a & b) / len(a | b)


def html_text(s):
    s = re.sub(r"(?is)<(script|style)\b.*?</\1>", " ", s)
    s = re.sub(r"(?s)<!--.*?-->", " ", s)
    s = re.sub(r"<[^>]+>", " ", s)
    return html.unescape(s)


def toks(s):
    return " " + " ".join(re.findall(r"\w+", s.lower())) + " "


def pdf_text(raw):
    out = []
    for m in re.finditer(rb"stream\r?\n(.*?)\r?\nendstream", raw, re.S):
        data = m.group(1)
        try:
            data = zlib.decompress(data)
        except Exception:
            pass
        for s in re.findall(rb"\(((?:\\.|[^\\)])*)\)\s*Tj", data):
            s = re.sub(rb"\\(.)", rb"\1", s)
            out.append(s.decode("latin-1"))
        for arr in re.findall(rb"\[(.*?)\]\s*TJ", data, re.S):
            parts = re.findall(rb"\(((?:\\.|[^\\)])*)\)", arr)
            out.append(b"".join(re.sub(rb"\\(.)", rb"\1", p) for p in parts).decode("latin-1"))
    # drop running header (first string, repeated on every page) and running footer (url - page N of M)
    if out:
        head = out[0]
        out = [x for x in out if x != head]
    return re.sub(r"https://\S+\s+-\s+page \d+ of\s+\d+", " ", " ".join(out))


def load(name):
    with open(os.path.join(OUT, name), encoding="utf-8") as f:
        return [json.loads(l) for l in f if l.strip()]


HEAVY_MIN_SITES = 7
try:
    manifest, pairs, clusters = load("manifest.jsonl"), load("pairs.jsonl"), load("clusters.jsonl")
except Exception as e:
    print("ERROR: cannot read outputs: %s" % e)
    sys.exit(1)

paths = [m["path"] for m in manifest]
if len(set(paths)) != len(paths):
    err("duplicate paths in manifest")
P = set(paths)
host_ok = re.compile(r"^https://[a-z0-9.-]+\.(example\.(org|net|com)|test)/")
for m in manifest:
    if set(m) != {"path", "source_url"}:
        err("manifest keys %s" % m)
    if not host_ok.match(m["source_url"]):
        err("bad host %s" % m["source_url"])
    if not os.path.isfile(os.path.join(OUT, "inbox", m["path"])):
        err("missing document %s" % m["path"])
    if not re.match(r"^[a-z0-9-]+/[a-z0-9-]+\.(html|txt|md|pdf)$", m["path"]):
        err("bad path %s" % m["path"])
if len(set(m["source_url"] for m in manifest)) != len(manifest):
    err("duplicate source_url")
for root, _, files in os.walk(os.path.join(OUT, "inbox")):
    for f in files:
        rel = os.path.relpath(os.path.join(root, f), os.path.join(OUT, "inbox"))
        if rel not in P:
            err("unlisted document %s" % rel)

body, SH = {}, {}
for p in paths:
    bp = os.path.join(OUT, "bodies", p + ".txt")
    if not os.path.isfile(bp):
        err("missing body %s" % p)
        continue
    with open(bp, encoding="utf-8") as f:
        t = f.read()
    lines = t.rstrip("\n").split("\n")
    if any(not l.strip() for l in lines):
        err("empty body line in %s" % p)
    body[p] = "\n".join(lines)
    SH[p] = shingles(body[p])

C = {c["path"]: c for c in clusters}
if set(C) != P:
    err("clusters.jsonl does not cover exactly the manifest")
for c in clusters:
    if set(c) != {"path", "cluster", "family", "role", "site", "body_words", "template_ratio"}:
        err("cluster keys %s" % c["path"])
    if c["path"] in body:
        bw = len(body[c["path"]].split())
        if bw != c["body_words"]:
            err("body_words mismatch %s" % c["path"])
        if not 60 <= bw <= 470:
            err("body length %d out of 60-470: %s" % (bw, c["path"]))
    if c["path"].split("/")[0] != c["site"]:
        err("site mismatch %s" % c["path"])

# ---------------------------------------------------------------- documents contain their bodies
multipage = 0
ratios = collections.defaultdict(list)
for p in paths:
    if p not in body:
        continue
    fp = os.path.join(OUT, "inbox", p)
    ext = p.rsplit(".", 1)[1]
    raw = open(fp, "rb").read()
    if ext == "pdf":
        if not raw.startswith(b"%PDF-") or b"%%EOF" not in raw[-64:]:
            err("not a PDF %s" % p)
        npg = len(re.findall(rb"/Type\s*/Page\b", raw))
        multipage += npg > 1
        text = pdf_text(raw)
    else:
        text = raw.decode("utf-8")
    if ext == "html":
        text = html_text(text)
        bw = len(body[p].split())
        r = (len(text.split()) - bw) / bw
        if abs(r - C[p]["template_ratio"]) > 0.01:
            err("template_ratio mismatch %s (%.3f vs %.3f)" % (p, r, C[p]["template_ratio"]))
        if C[p]["role"] != "print":
            ratios[p.split("/")[0]].append(r)
    elif ext == "txt":
        lines = raw.decode("utf-8").split("\n")
        if not lines[-2].startswith("-- end of export"):
            err("txt without end line %s" % p)
        title = body[p].split("\n")[0]
        if title not in lines or lines[lines.index(title) + 1] != "=" * len(title):
            err("txt title not underlined %s" % p)
        text = re.sub(r"(\w)-\n\s*(\w)", r"\1\2", text)
    elif ext == "md":
        if not text.startswith("---\n") or "\n---\n" not in text[4:]:
            err("md without front matter %s" % p)
        if not re.search(r"^\[\d+\]: https://", text, re.M):
            err("md without reference links %s" % p)
        if "\t" in body[p] and "|---|" not in text:
            err("md table not a pipe table %s" % p)
        text = re.sub(r"\]\[\d+\]", "]", text)
    T = toks(text)
    missing = [l for l in body[p].split("\n") if toks(l) not in T]
    if missing:
        err("%d body lines not found in %s, e.g. %r" % (len(missing), p, missing[0][:60]))

# ---------------------------------------------------------------- pairs
kinds = ("republication:", "cross-format:", "syndication:", "twin:", "random:")
lab = {}
cnt = collections.Counter()
for q in pairs:
    a, b = q["a"], q["b"]
    if set(q) != {"a", "b", "relation", "body_jaccard", "note"}:
        err("pair keys %s" % q)
    if a not in P or b not in P or a == b:
        err("pair refers to unknown path %s %s" % (a, b))
        continue
    key = frozenset((a, b))
    if key in lab:
        err("duplicate pair %s %s" % (a, b))
    lab[key] = q
    j = round(jacc(SH[a], SH[b]), 4)
    if abs(j - q["body_jaccard"]) > 1e-9:
        err("jaccard mismatch %s %s: %s vs %s" % (a, b, j, q["body_jaccard"]))
    kind = q["note"].split(" ")[0]
    if kind not in kinds:
        err("bad note prefix %s" % q["note"][:30])
    rel = q["relation"]
    same = body[a] == body[b]
    ca, cb = C[a], C[b]
    if rel == "exact-body":
        if not same or ca["cluster"] != cb["cluster"]:
            err("exact-body pair not identical/same cluster %s %s" % (a, b))
    elif rel == "near-duplicate":
        if same or j < 0.80 or ca["cluster"] != cb["cluster"]:
            err("near-duplicate pair invalid %s %s (%.4f)" % (a, b, j))
    elif rel == "distinct":
        if ca["cluster"] == cb["cluster"]:
            err("distinct pair in same cluster %s %s" % (a, b))
        if kind == "twin:" and not (0.10 <= j <= 0.45 and ca["family"] == cb["family"] and ca["site"] == cb["site"]):
            err("twin pair out of spec %s %s (%.4f)" % (a, b, j))
        if kind == "random:" and (ca["site"] != cb["site"] or j >= 0.45):
            err("random pair out of spec %s %s" % (a, b))
    else:
        err("bad relation %s" % rel)
    cnt[(kind, rel)] += 1
    if kind == "cross-format:":
        cnt["xf"] += 1
        if a.endswith(".pdf") or b.endswith(".pdf"):
            cnt["xfpdf"] += 1
    if kind == "random:":
        cnt["random:" + ca["site"]] += 1

byc = collections.defaultdict(list)
for p in paths:
    byc[C[p]["cluster"]].append(p)
for cl, ms in byc.items():
    for a, b in itertools.combinations(ms, 2):
        if frozenset((a, b)) not in lab:
            err("unlabelled pair inside copy group %s: %s %s" % (cl, a, b))
worst = (0, None)
for a, b in itertools.combinations(paths, 2):
    if frozenset((a, b)) in lab:
        continue
    if len(SH[a]) * 0.45 > len(SH[b]) or len(SH[b]) * 0.45 > len(SH[a]):
        continue
    j = jacc(SH[a], SH[b])
    if j > worst[0]:
        worst = (j, (a, b))
    if j >= 0.45:
        err("unlabelled pair with jaccard %.3f: %s %s" % (j, a, b))

# ---------------------------------------------------------------- counts
n = len(paths)
sites = sorted(set(p.split("/")[0] for p in paths))
nonhtml = sum(1 for p in paths if not p.endswith(".html"))
heavy = [s for s in sites if ratios[s] and min(ratios[s]) >= 2.5 and max(ratios[s]) <= 5.0]
bws = [len(body[p].split()) for p in paths if p in body]
checks = [
    ("documents 380-420", 380 <= n <= 420, n),
    ("10 sites", len(sites) == 10, len(sites)),
    ("non-HTML >= 20%", nonhtml >= 0.2 * n, "%d (%.1f%%)" % (nonhtml, 100.0 * nonhtml / n)),
    ("heavy-template sites >= 7 (all HTML pages ratio 2.5-5)", len(heavy) >= HEAVY_MIN_SITES, ",".join(heavy)),
    ("most bodies under 250 words", sum(b < 250 for b in bws) > 0.5 * len(bws), sum(b < 250 for b in bws)),
    ("republication near-duplicates >= 60", cnt[("republication:", "near-duplicate")] >= 60, cnt[("republication:", "near-duplicate")]),
    ("cross-format pairs >= 80", cnt["xf"] >= 80, cnt["xf"]),
    ("cross-format pairs with a PDF >= 40", cnt["xfpdf"] >= 40, cnt["xfpdf"]),
    ("exact-body pairs >= 15", sum(v for k, v in cnt.items() if isinstance(k, tuple) and k[1] == "exact-body") >= 15,
     sum(v for k, v in cnt.items() if isinstance(k, tuple) and k[1] == "exact-body")),
    ("hard negatives (twin) >= 80", cnt[("twin:", "distinct")] >= 80, cnt[("twin:", "distinct")]),
    ("random pairs >= 30 per site", all(cnt["random:" + s] >= 30 for s in sites), min(cnt["random:" + s] for s in sites)),
    ("multi-page PDFs present", multipage >= 5, multipage),
]
# hard case: one large aside byte-identical on >= 10 short distinct notices of a heavy site
best = 0
asides = collections.defaultdict(set)
for p in paths:
    if p.endswith(".html"):
        h = open(os.path.join(OUT, "inbox", p), encoding="utf-8").read()
        for a in re.findall(r"(?s)<aside\b.*?</aside>", h):
            if len(html_text(a).split()) >= 100 and len(body[p].split()) < 250:
                asides[a].add(C[p]["cluster"])
if asides:
    best = max(len(v) for v in asides.values())
checks.append(("identical large aside on >= 10 distinct short pages", best >= 10, best))
for name, ok, val in checks:
    print("%-58s %-5s %s" % (name, "ok" if ok else "FAIL", val))
    if not ok:
        err("count check failed: %s (%s)" % (name, val))
print("pair counts:", dict((("%s %s" % k) if isinstance(k, tuple) else k, v) for k, v in sorted(cnt.items(), key=str) if isinstance(k, tuple)))
print("max unlabelled jaccard: %.4f" % worst[0])
if errors:
    for e in errors:
        print("ERROR:", e)
    print("INVALID (%d errors)" % len(errors))
    sys.exit(1)
print("VALID")
