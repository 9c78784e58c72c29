#!/usr/bin/env python3
"""Validate a corpus written by make_corpus.py (standard library only).

Usage: validate.py [OUT_DIR]   (default: out/ beside this script)
Exit status 0 when every check passes; prints counts and failures.
"""
import html
import itertools
import json
import os
import re
import sys
from urllib.parse import urlparse

HERE = os.path.dirname(os.path.abspath(__file__))
ROLES = {"original", "near-duplicate", "exact-copy", "format-copy", "twin", "singleton"}
RELATIONS = {"near-duplicate", "exact-body", "distinct"}
EXTS = {"html", "txt", "md", "pdf"}
MINIMUMS = {"republication near-duplicate pairs": 60, "cross-format pairs": 80, "cross-format pairs with a PDF": 40,
            "exact-body pairs": 15, "hard-negative (twin) pairs": 80}

errors = []


def err(msg):
    errors.append(msg)


def tokens(text):
    return re.sub(r"[^\w\s]", "", text.lower()).split()


def shingles(text):
    t = tokens(text)
    return set(tuple(t[i:i + 5]) for i in range(len(t) - 4))


def jaccard(a, b):
    if not a and not b:
        return 1.0
    return len(a & b) / len(a | b)


def norm(s):
    return " ".join(s.split())


def doc_text(path, ext):
    with open(path, encoding="utf-8") as f:
        t = f.read()
    if ext == "html":
        t = re.sub(r"(?is)<(script|style)[^>]*>.*?</\1>", " ", t)
        t = re.sub(r"<[^>]+>", " ", t)
        t = html.unescape(t)
    elif ext == "md":
        t = "\n".join(re.sub(r"^#+\s+", "", ln) for ln in t.split("\n") if not re.match(r"^\|(\s*-+\s*\|)+\s*$", ln))
        t = t.replace("|", " ")
    return norm(t)


def host_ok(url):
    h = urlparse(url).hostname or ""
    return url.startswith("https://") and (h.endswith(".test") or any(h == d or h.endswith("." + d) for d in ("example.org", "example.net", "example.com")))


def load_jsonl(p):
    with open(p, encoding="utf-8") as f:
        return [json.loads(l) for l in f if l.strip()]


def main():
    out = os.path.abspath(sys.argv[1] if len(sys.argv) > 1 else os.path.join(HERE, "out"))
    inbox = os.path.join(out, "inbox")
    manifest = load_jsonl(os.path.join(out, "manifest.jsonl"))
    pairs = load_jsonl(os.path.join(out, "pairs.jsonl"))
    clusters = load_jsonl(os.path.join(out, "clusters.jsonl"))

    # ---- manifest <-> inbox
    mpaths = [m["path"] for m in manifest]
    if len(set(mpaths)) != len(mpaths):
        err("duplicate manifest paths")
    files = set()
    for root, _, fs in os.walk(inbox):
        for fn in fs:
            files.add(os.path.relpath(os.path.join(root, fn), inbox).replace(os.sep, "/"))
    if files != set(mpaths):
        err("manifest/inbox mismatch: %d only in inbox, %d only in manifest" % (len(files - set(mpaths)), len(set(mpaths) - files)))
    for m in manifest:
        if set(m) != {"path", "source_url"}:
            err("manifest keys %s" % sorted(m))
        p = m["path"]
        if not re.match(r"^[a-z0-9-]+/[a-z0-9-]+\.(html|txt|md|pdf)$", p):
            err("bad path %s" % p)
        if not host_ok(m["source_url"]):
            err("bad host %s" % m["source_url"])
    urls = [m["source_url"] for m in manifest]
    if len(set(urls)) != len(urls):
        err("duplicate source_url")

    # ---- bodies
    bodies, sh = {}, {}
    for p in mpaths:
        bp = os.path.join(out, "bodies", p + ".txt")
        if not os.path.isfile(bp):
            err("missing body %s" % p)
            continue
        with open(bp, encoding="utf-8") as f:
            lines = f.read().split("\n")
        if lines and lines[-1] == "":
            lines = lines[:-1]
        if not lines or any(not l.strip() for l in lines):
            err("empty body line in %s" % p)
        bodies[p] = lines
        sh[p] = shingles("\n".join(lines))
        ext = p.rsplit(".", 1)[1]
        if ext == "pdf":
            with open(os.path.join(inbox, p), "rb") as f:
                head = f.read(8)
            if not head.startswith(b"%PDF-"):
                err("not a PDF %s" % p)
            continue
        text = doc_text(os.path.join(inbox, p), ext)
        for l in lines:
            if norm(l.replace("\t", " ")) not in text:
                err("body line not found in %s: %r" % (p, l[:60]))
                break

    # ---- clusters
    cl = {c["path"]: c for c in clusters}
    if set(cl) != set(mpaths):
        err("clusters do not cover manifest")
    for c in clusters:
        if set(c) != {"path", "cluster", "family", "role", "site", "body_words", "template_ratio"}:
            err("cluster keys %s" % sorted(c))
        if c["role"] not in ROLES:
            err("bad role %s" % c["role"])
        if c["path"].split("/")[0] != c["site"]:
            err("site mismatch %s" % c["path"])
        if c["path"] in bodies and c["body_words"] != len(tokens("\n".join(bodies[c["path"]]))):
            err("body_words mismatch %s" % c["path"])
    groups = {}
    for c in clusters:
        groups.setdefault(c["cluster"], []).append(c["path"])
    copy_groups = {g: ps for g, ps in groups.items() if len(ps) > 1}
    group_of = {p: g for g, ps in copy_groups.items() for p in ps}
    for g, ps in copy_groups.items():
        roles = sorted(cl[p]["role"] for p in ps)
        if roles.count("original") != 1 or any(r in ("twin", "singleton") for r in roles):
            err("group %s roles %s" % (g, roles))
    for g, ps in groups.items():
        if len(ps) == 1 and cl[ps[0]]["role"] not in ("twin", "singleton"):
            err("single-member cluster %s with role %s" % (g, cl[ps[0]]["role"]))

    # ---- pairs
    labelled = {}
    counts = dict.fromkeys(MINIMUMS, 0)
    for q in pairs:
        if set(q) != {"a", "b", "relation", "body_jaccard", "note"}:
            err("pair keys %s" % sorted(q))
            continue
        a, b = q["a"], q["b"]
        if a not in bodies or b not in bodies or a == b:
            err("pair with unknown path %s %s" % (a, b))
            continue
        key = tuple(sorted((a, b)))
        if key in labelled:
            err("pair labelled twice %s" % (key,))
        labelled[key] = q
        j = round(jaccard(sh[a], sh[b]), 4)
        if abs(j - q["body_jaccard"]) > 1e-9:
            err("jaccard mismatch %s %s: %s vs %s" % (a, b, j, q["body_jaccard"]))
        rel = q["relation"]
        if rel not in RELATIONS:
            err("bad relation %s" % rel)
        same = group_of.get(a) is not None and group_of.get(a) == group_of.get(b)
        kind = q["note"].split(":", 1)[0]
        if rel == "exact-body":
            if bodies[a] != bodies[b] or not same:
                err("exact-body but bodies differ or not same group: %s %s" % (a, b))
        elif rel == "near-duplicate":
            if not (0.80 <= j < 1.0) or not same or bodies[a] == bodies[b]:
                err("near-duplicate out of range %s %s %s" % (a, b, j))
            if kind == "republication" and j > 0.98 and not (cl[a]["role"] == "near-duplicate" and cl[b]["role"] == "near-duplicate"):
                err("republication vs original above 0.98: %s %s %s" % (a, b, j))
        else:
            if same or j >= 0.45:
                err("distinct pair inside a group or >= 0.45: %s %s %s" % (a, b, j))
            if kind == "twin":
                if not (0.10 <= j < 0.45) or cl[a]["family"] != cl[b]["family"] or cl[a]["role"] != "twin" or cl[b]["role"] != "twin":
                    err("bad twin pair %s %s %s" % (a, b, j))
        if kind == "republication" and rel == "near-duplicate":
            counts["republication near-duplicate pairs"] += 1
        if kind == "cross-format":
            counts["cross-format pairs"] += 1
            if a.endswith(".pdf") or b.endswith(".pdf"):
                counts["cross-format pairs with a PDF"] += 1
        if rel == "exact-body":
            counts["exact-body pairs"] += 1
        if kind == "twin":
            counts["hard-negative (twin) pairs"] += 1
    for g, ps in copy_groups.items():
        for a, b in itertools.combinations(sorted(ps), 2):
            if (a, b) not in labelled:
                err("unlabelled same-group pair %s %s" % (a, b))
    # every unlabelled pair must be below 0.45
    worst = 0.0
    plist = sorted(mpaths)
    for i in range(len(plist)):
        for k in range(i + 1, len(plist)):
            a, b = plist[i], plist[k]
            if (a, b) in labelled or not (sh[a] & sh[b]):
                continue
            j = jaccard(sh[a], sh[b])
            worst = max(worst, j)
            if j >= 0.45:
                err("unlabelled pair >= 0.45: %s %s %.4f" % (a, b, j))
    # random same-site distinct pairs per site
    per_site = {}
    for q in pairs:
        if q["note"].startswith("random") and q["a"].split("/")[0] == q["b"].split("/")[0]:
            per_site[q["a"].split("/")[0]] = per_site.get(q["a"].split("/")[0], 0) + 1
    sites = sorted(set(p.split("/")[0] for p in mpaths))
    for s in sites:
        if per_site.get(s, 0) < 30:
            err("site %s has only %d random distinct pairs" % (s, per_site.get(s, 0)))
    for k, v in MINIMUMS.items():
        if counts[k] < v:
            err("%s: %d < %d" % (k, counts[k], v))

    # ---- summary
    n = len(mpaths)
    nonhtml = sum(1 for p in mpaths if not p.endswith(".html"))
    thin = sum(1 for c in clusters if c["body_words"] < 200)
    print("documents %d, sites %d, non-HTML %d (%.1f%%), bodies under 200 words %.1f%%, body words %d-%d" % (
        n, len(sites), nonhtml, 100.0 * nonhtml / n, 100.0 * thin / n, min(c["body_words"] for c in clusters), max(c["body_words"] for c in clusters)))
    rel = {}
    for q in pairs:
        rel[q["relation"]] = rel.get(q["relation"], 0) + 1
    print("pairs %d %s" % (len(pairs), json.dumps(rel, sort_keys=True)))
    for k in MINIMUMS:
        print("  %-34s %4d (min %d)" % (k, counts[k], MINIMUMS[k]))
    for s in sites:
        cs = [c for c in clusters if c["site"] == s and c["path"].endswith(".html")]
        rs = sorted(c["template_ratio"] for c in cs)
        allc = [c for c in clusters if c["site"] == s]
        print("  site %-11s docs %3d  html %3d  template_ratio median %.2f (min %.2f, max %.2f)" % (
            s, len(allc), len(cs), rs[len(rs) // 2] if rs else 0, rs[0] if rs else 0, rs[-1] if rs else 0))
    print("max Jaccard of unlabelled pairs: %.4f" % worst)
    if errors:
        print("FAILED: %d problem(s)" % len(errors))
        for e in errors[:40]:
            print("  " + e)
        sys.exit(1)
    print("OK")


if __name__ == "__main__":
    main()
