#!/usr/bin/env python3
"""Validate the blind13v2 corpus: paths, labels, Jaccard values, coverage rules.

    python3 validate.py [--out DIR]
Exit status 0 when every check passes.
"""
import argparse
import html
import itertools
import json
import os
import re
import sys
import zlib
from collections import Counter, defaultdict

_P = re.compile(r"[^\w\s]")


def toks(t):
    return _P.sub("", t.lower()).split()


def shingles(t):
    x = toks(t)
    return set(tuple(x[i:i + 5]) for i in range(len(x) - 4))


def jacc(a, b):
    if not a and not b:
        return 1.0
    return len(a & b) / len(a | b)


HOST_OK = re.compile(r"^https://([a-z0-9-]+\.)*(example\.(org|net|com)|[a-z0-9-]+\.test)/\S+$")
ERR = []


def check(cond, msg):
    if not cond:
        ERR.append(msg)
    return cond


def load(path):
    with open(path) as f:
        return [json.loads(l) for l in f if l.strip()]


def pdf_text(path):
    data = open(path, "rb").read()
    out = []
    for m in re.finditer(rb"stream\r?\n(.*?)\r?\nendstream", data, re.S):
        s = m.group(1)
        try:
            s = zlib.decompress(s)
        except Exception:
            pass
        for t in re.findall(rb"\((.*?)(?<!\\)\)\s*Tj", s, re.S):
            out.append(t.replace(b"\\(", b"(").replace(b"\\)", b")").replace(b"\\\\", b"\\").decode("latin-1"))
    return " ".join(out)


def html_text(s):
    s = re.sub(r"(?is)<(script|style|head)\b.*?</\1>", " ", s)
    s = re.sub(r"(?s)<[^>]+>", " ", s)
    return html.unescape(s)


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(os.path.dirname(os.path.abspath(__file__)), "out"))
    out = ap.parse_args().out
    inbox = os.path.join(out, "inbox")
    man = load(os.path.join(out, "manifest.jsonl"))
    pairs = load(os.path.join(out, "pairs.jsonl"))
    clus = {c["path"]: c for c in load(os.path.join(out, "clusters.jsonl"))}
    paths = [m["path"] for m in man]
    check(len(paths) == len(set(paths)), "duplicate manifest paths")
    on_disk = set()
    for root, _, files in os.walk(inbox):
        for fn in files:
            on_disk.add(os.path.relpath(os.path.join(root, fn), inbox))
    check(on_disk == set(paths), "inbox files and manifest differ: %s" % sorted(on_disk ^ set(paths))[:5])
    check(300 <= len(paths) <= 420, "document count %d outside 300-420" % len(paths))
    sites = Counter(p.split("/")[0] for p in paths)
    check(6 <= len(sites) <= 8, "site count %d" % len(sites))
    body, sh = {}, {}
    for m in man:
        p = m["path"]
        check(re.match(r"^[a-z0-9-]+/[a-z0-9-]+\.(html|txt|md|pdf)$", p) is not None, "bad path %s" % p)
        check(HOST_OK.match(m["source_url"]) is not None, "bad source_url %s" % m["source_url"])
        bp = os.path.join(out, "bodies", p + ".txt")
        if not check(os.path.exists(bp), "missing body %s" % p):
            continue
        body[p] = open(bp).read()
        sh[p] = shingles(body[p])
        check(p in clus, "no cluster row for %s" % p)
        n = len(toks(body[p]))
        check(80 <= n <= 450, "body words %d for %s" % (n, p))
        check(clus.get(p, {}).get("body_words") == n, "body_words mismatch %s" % p)
        # the ground-truth body must actually be in the document
        fp = os.path.join(inbox, p)
        if p.endswith(".pdf"):
            raw = open(fp, "rb").read()
            check(raw.startswith(b"%PDF"), "not a PDF %s" % p)
            got = shingles(pdf_text(fp))
            cov = len(sh[p] & got) / max(1, len(sh[p]))
            check(cov >= 0.85, "PDF text covers only %.2f of body shingles: %s" % (cov, p))
        else:
            doc = open(fp).read()
            doc = html_text(doc) if p.endswith(".html") else doc
            dn = " " + " ".join(toks(doc)) + " "
            for line in body[p].splitlines():
                lt = " ".join(toks(line))
                if lt:
                    check(" " + lt + " " in dn, "body line not found in %s: %r" % (p, line[:60]))
    words = [len(toks(b)) for b in body.values()]
    check(sum(w < 200 for w in words) * 3 >= len(words), "fewer than a third of bodies under 200 words")

    # ---- labels -----------------------------------------------------------
    seen = {}
    rel = Counter()
    cat = Counter()
    rand_site = Counter()
    for q in pairs:
        a, b = q["a"], q["b"]
        if not (check(a in body and b in body and a != b, "bad pair %s %s" % (a, b))):
            continue
        key = tuple(sorted((a, b)))
        check(key not in seen, "duplicate pair %s" % (key,))
        seen[key] = q
        j = jacc(sh[a], sh[b])
        check(abs(round(j, 4) - q["body_jaccard"]) < 1e-9, "jaccard %s vs %.4f for %s" % (q["body_jaccard"], j, key))
        same = clus[a]["cluster"] == clus[b]["cluster"]
        r = q["relation"]
        rel[r] += 1
        check(r in ("near-duplicate", "exact-body", "distinct"), "bad relation %s" % r)
        fmt = not (a.endswith(".html") and b.endswith(".html"))
        if r == "near-duplicate":
            check(same and j >= 0.80 and body[a] != body[b], "near-duplicate rule broken %s (%.4f)" % (key, j))
            if fmt:
                cat["cross-format"] += 1
                cat["cross-format with PDF"] += a.endswith(".pdf") or b.endswith(".pdf")
            else:
                cat["republication"] += 1
                check(0.80 <= j <= 0.98, "republication outside 0.80-0.98: %s %.4f" % (key, j))
                cat["republication cross-site"] += a.split("/")[0] != b.split("/")[0]
        elif r == "exact-body":
            check(same and body[a] == body[b], "exact-body rule broken %s" % (key,))
            check(open(os.path.join(inbox, a), "rb").read() != open(os.path.join(inbox, b), "rb").read(),
                  "exact-body pages are byte-identical %s" % (key,))
            if fmt:
                cat["cross-format"] += 1
                cat["cross-format with PDF"] += a.endswith(".pdf") or b.endswith(".pdf")
            else:
                cat["exact-body syndication"] += 1
        else:
            check(not same and j < 0.80, "distinct rule broken %s" % (key,))
            if "hard negative" in q["note"]:
                check(clus[a]["family"] == clus[b]["family"] and 0.10 <= j <= 0.45,
                      "hard negative outside 0.10-0.45 or families differ: %s %.4f" % (key, j))
                cat["hard negative"] += 1
                cat["hard negative same site"] += a.split("/")[0] == b.split("/")[0]
            if "random same-site" in q["note"]:
                check(a.split("/")[0] == b.split("/")[0], "random same-site pair crosses sites %s" % (key,))
                rand_site[a.split("/")[0]] += 1
    # ---- every unlabelled pair: different groups and Jaccard < 0.45 ------
    unl = 0
    for a, b in itertools.combinations(sorted(body), 2):
        if (a, b) in seen:
            continue
        unl += 1
        check(clus[a]["cluster"] != clus[b]["cluster"], "unlabelled same-cluster pair %s %s" % (a, b))
        j = jacc(sh[a], sh[b])
        check(j < 0.45, "unlabelled pair with Jaccard %.4f: %s %s" % (j, a, b))
    # ---- minimum counts -----------------------------------------------------
    check(cat["republication"] >= 50, "too few republication near-duplicates")
    check(cat["cross-format"] >= 60 and cat["cross-format with PDF"] >= 20, "too few cross-format pairs")
    check(cat["exact-body syndication"] >= 12, "too few exact-body syndication pairs")
    check(cat["hard negative"] >= 60, "too few hard negatives")
    for s in sites:
        check(rand_site[s] >= 30, "fewer than 30 random same-site pairs on %s" % s)
    # ---- template weight of heavy sites -----------------------------------
    ratios = defaultdict(list)
    for p in paths:
        if p.endswith(".html"):
            tw = len(toks(html_text(open(os.path.join(inbox, p)).read()))) - len(toks(body[p]))
            ratios[p.split("/")[0]].append(tw / len(toks(body[p])))
    heavy = 0
    for s, v in sorted(ratios.items()):
        v.sort()
        med = v[len(v) // 2]
        heavy += 2 <= med <= 8
        print("template/body ratio %-20s n=%3d min %.2f median %.2f max %.2f" % (s, len(v), v[0], med, v[-1]))
    check(heavy >= 4, "fewer than 4 heavy-template sites")
    print("documents", len(paths), "sites", len(sites), dict(sites))
    print("formats", dict(Counter(os.path.splitext(p)[1] for p in paths)))
    print("pairs by relation", dict(rel), "unlabelled", unl)
    print("pairs by kind", dict(cat))
    print("random same-site pairs", dict(rand_site))
    print("body words min %d max %d, under 200: %d of %d" % (min(words), max(words),
                                                            sum(w < 200 for w in words), len(words)))
    if ERR:
        print("\nFAILED: %d problem(s)" % len(ERR))
        for e in ERR[:40]:
            print("  -", e)
        sys.exit(1)
    print("\nOK: all checks passed")


if __name__ == "__main__":
    main()
