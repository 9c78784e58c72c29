#!/usr/bin/env python3
"""Re-check the generated corpus (standard library only). Prints VALID or a list of errors.

Usage: python validate.py [--out DIR]
"""
import argparse
import itertools
import json
import os
import re
import sys
from collections import Counter, defaultdict
from html.parser import HTMLParser
from urllib.parse import urlparse

HEAVY_SITES = {"carshare", "airport", "planning", "dental", "bikecoop", "sailing", "firerescue", "bus"}
KINDS = ("republication:", "cross-format:", "syndication:", "twin:", "random:")
RELATIONS = {"near-duplicate", "exact-body", "distinct"}
PUNCT = re.compile(r"[^\w\s]")


def shingles(text):
    w = PUNCT.sub("", text.lower()).split()
    return {tuple(w[i:i + 5]) for i in range(len(w) - 4)}


def jac(a, b):
    if not a and not b:
        return 1.0
    return round(len(a & b) / len(a | b), 4)


class Text(HTMLParser):
    def __init__(self):
        super().__init__(convert_charrefs=True)
        self.parts, self.skip, self.body = [], 0, False

    def handle_starttag(self, tag, attrs):
        if tag == "body":
            self.body = True
        if tag in ("script", "style"):
            self.skip += 1

    def handle_endtag(self, tag):
        if tag in ("script", "style") and self.skip:
            self.skip -= 1
        if tag == "body":
            self.body = False

    def handle_data(self, data):
        if self.body and not self.skip:
            self.parts.append(data)


def visible(html):
    p = Text()
    p.feed(html)
    p.close()
    return " ".join(p.parts)


def squash(s, extra=""):
    return re.sub(r"[\s" + re.escape(extra) + "]", "", s)


def host_ok(url):
    host = urlparse(url).hostname or ""
    return host.endswith((".example.org", ".example.net", ".example.com", ".test")) or host in ("example.org", "example.net", "example.com")


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(os.path.dirname(os.path.abspath(__file__)), "out"))
    out = ap.parse_args().out
    errs = []

    def err(msg):
        if len(errs) < 200:
            errs.append(msg)

    def load(name):
        with open(os.path.join(out, name), encoding="utf-8") as f:
            return [json.loads(line) for line in f if line.strip()]

    manifest, clusters, pairs = load("manifest.jsonl"), load("clusters.jsonl"), load("pairs.jsonl")
    paths = [m["path"] for m in manifest]
    pset = set(paths)
    if len(pset) != len(paths):
        err("duplicate paths in manifest")
    on_disk = set()
    for root, _, files in os.walk(os.path.join(out, "inbox")):
        for fn in files:
            on_disk.add(os.path.relpath(os.path.join(root, fn), os.path.join(out, "inbox")).replace(os.sep, "/"))
    if on_disk != pset:
        err("inbox files and manifest differ: {} / {}".format(sorted(on_disk - pset)[:5], sorted(pset - on_disk)[:5]))
    for m in manifest:
        if not host_ok(m["source_url"]):
            err("bad host " + m["source_url"])
        if not re.fullmatch(r"[a-z0-9-]+/[a-z0-9-]+\.(html|txt|md|pdf)", m["path"]):
            err("bad path " + m["path"])

    # ---- bodies and documents
    body, sh = {}, {}
    for p in paths:
        bp = os.path.join(out, "bodies", p + ".txt")
        if not os.path.exists(bp):
            err("missing body " + p)
            continue
        with open(bp, encoding="utf-8") as f:
            body[p] = f.read().rstrip("\n")
        sh[p] = shingles(body[p])
    cl = {c["path"]: c for c in clusters}
    if set(cl) != pset:
        err("clusters.jsonl does not cover exactly the manifest")
    wc = {p: len(body[p].split()) for p in body}
    if any(not 60 <= w <= 470 for w in wc.values()):
        err("body word counts outside 60-470: {}".format([(p, w) for p, w in wc.items() if not 60 <= w <= 470][:5]))
    if sum(w < 250 for w in wc.values()) <= len(wc) / 2:
        err("most bodies should be under 250 words")
    aside_by_doc = {}
    for p in paths:
        fp = os.path.join(out, "inbox", p)
        lines = body.get(p, "").split("\n")
        c = cl.get(p, {})
        if c.get("body_words") != wc.get(p):
            err("body_words mismatch " + p)
        if "lorem" in body.get(p, "").lower():
            err("lorem ipsum in " + p)
        if p.endswith(".pdf"):
            with open(fp, "rb") as f:
                data = f.read()
            if not data.startswith(b"%PDF-") or b"%%EOF" not in data[-64:]:
                err("not a PDF " + p)
            m = re.search(rb"/Count (\d+)", data)
            if not m or int(m.group(1)) < 1:
                err("PDF without pages " + p)
            continue
        with open(fp, encoding="utf-8") as f:
            raw = f.read()
        if "lorem" in raw.lower():
            err("lorem ipsum in " + p)
        if p.endswith(".html"):
            vis = visible(raw)
            hay = squash(vis)
            for ln in lines:
                if squash(ln) not in hay:
                    err("body line not found in {}: {!r}".format(p, ln[:50]))
                    break
            ratio = (len(vis.split()) - wc[p]) / wc[p]
            if abs(ratio - c.get("template_ratio", -9)) > 0.01:
                err("template_ratio mismatch {} {:.3f} vs {}".format(p, ratio, c.get("template_ratio")))
            if c.get("site") in HEAVY_SITES and c.get("role") != "print-variant" and not 2.5 <= ratio <= 5.0:
                err("heavy-site template ratio out of 2.5-5: {} {:.2f}".format(p, ratio))
            m = re.search(r'<aside id="before-you-fly".*?</aside>', raw, re.S)
            if m:
                aside_by_doc[p] = m.group(0)
        elif p.endswith(".txt"):
            hay = squash(raw, "-=")
            for ln in lines:
                if squash(ln, "-=") not in hay:
                    err("body line not found in {}: {!r}".format(p, ln[:50]))
                    break
            if "-- end of document --" not in raw or not raw.split("\n")[1].startswith("Source:"):
                err("txt export header/end line missing " + p)
            if max(len(x) for x in raw.split("\n")[4:]) > 80:
                err("txt not hard-wrapped " + p)
        elif p.endswith(".md"):
            if not raw.startswith("---\n"):
                err("md front matter missing " + p)
            txt = re.sub(r"\]\[(\d+|src)\]", "", raw)
            hay = squash(txt, "-|#[]*")
            for ln in lines:
                if squash(ln, "-|#[]*") not in hay:
                    err("body line not found in {}: {!r}".format(p, ln[:50]))
                    break

    # ---- pairs
    labelled = {}
    for pr in pairs:
        a, b = pr["a"], pr["b"]
        if a not in pset or b not in pset or a >= b:
            err("bad pair paths {} {}".format(a, b))
            continue
        if (a, b) in labelled:
            err("duplicate pair {} {}".format(a, b))
        labelled[(a, b)] = pr
        j = jac(sh[a], sh[b])
        if abs(j - pr["body_jaccard"]) > 1e-4:
            err("jaccard mismatch {} {} {} vs {}".format(a, b, j, pr["body_jaccard"]))
        rel, note = pr["relation"], pr["note"]
        if rel not in RELATIONS or not note.startswith(KINDS):
            err("bad relation/note {} {}".format(a, b))
        same_cl = cl[a]["cluster"] == cl[b]["cluster"]
        if rel == "exact-body" and (body[a] != body[b] or not same_cl):
            err("exact-body pair with different bodies/clusters {} {}".format(a, b))
        if rel == "near-duplicate" and (body[a] == body[b] or j < 0.80 or not same_cl):
            err("near-duplicate pair invalid {} {} {}".format(a, b, j))
        if rel == "distinct":
            if same_cl:
                err("distinct pair inside a copy group {} {}".format(a, b))
            if note.startswith("twin:") and not (0.10 <= j <= 0.45 and cl[a]["family"] == cl[b]["family"] and cl[a]["site"] == cl[b]["site"]):
                err("twin pair invalid {} {} {}".format(a, b, j))
            if note.startswith("random:") and (cl[a]["site"] != cl[b]["site"] or j >= 0.45):
                err("random pair invalid {} {} {}".format(a, b, j))
        if rel != "distinct" and note.startswith(("twin:", "random:")):
            err("twin/random pair not distinct {} {}".format(a, b))
    groups = defaultdict(list)
    for p in paths:
        groups[cl[p]["cluster"]].append(p)
    for g, mem in groups.items():
        for a, b in itertools.combinations(sorted(mem), 2):
            if (a, b) not in labelled:
                err("unlabelled pair inside copy group {}: {} {}".format(g, a, b))
    # every unlabelled pair must be below 0.45 (inverted index over shingles)
    index = defaultdict(list)
    for i, p in enumerate(paths):
        for s in sh[p]:
            index[s].append(i)
    inter = Counter()
    for lst in index.values():
        if len(lst) > 1:
            for x, y in itertools.combinations(lst, 2):
                inter[(x, y)] += 1
    for (x, y), n in inter.items():
        a, b = sorted((paths[x], paths[y]))
        if (a, b) in labelled:
            continue
        j = n / (len(sh[a]) + len(sh[b]) - n)
        if j >= 0.45:
            err("unlabelled pair with Jaccard >= 0.45: {} {} {:.3f}".format(a, b, j))

    # ---- counts and coverage
    sites = Counter(cl[p]["site"] for p in paths)
    ext = Counter(p.rsplit(".", 1)[1] for p in paths)
    kinds = Counter((pr["note"].split(":")[0], pr["relation"]) for pr in labelled.values())
    n_docs = len(paths)
    xf = [pr for pr in labelled.values() if pr["note"].startswith("cross-format:")]
    xf_pdf = [pr for pr in xf if pr["a"].endswith(".pdf") or pr["b"].endswith(".pdf")]
    checks = [
        ("380-420 documents", 380 <= n_docs <= 420),
        ("10 sites", len(sites) == 10),
        (">= 7 heavy sites present", len(HEAVY_SITES & set(sites)) >= 7),
        ("one small site with 3-6 pages", any(3 <= n <= 6 for n in sites.values())),
        (">= 20 % non-HTML", (n_docs - ext["html"]) / n_docs >= 0.20),
        (">= 60 republication near-duplicates", kinds[("republication", "near-duplicate")] >= 60),
        (">= 80 cross-format pairs", len(xf) >= 80),
        (">= 40 cross-format pairs with a PDF", len(xf_pdf) >= 40),
        (">= 15 exact-body pairs", sum(v for (k, r), v in kinds.items() if r == "exact-body") >= 15),
        (">= 80 twin hard negatives", kinds[("twin", "distinct")] >= 80),
    ]
    for name, ok in checks:
        if not ok:
            err("count check failed: " + name)
    for site, n in sites.items():
        mem = [p for p in paths if cl[p]["site"] == site]
        avail = sum(1 for a, b in itertools.combinations(sorted(mem), 2) if cl[a]["cluster"] != cl[b]["cluster"]
                    and not (labelled.get((a, b)) and labelled[(a, b)]["note"].startswith("twin:")))
        nr = sum(1 for pr in labelled.values() if pr["note"].startswith("random:") and cl[pr["a"]]["site"] == site)
        if nr < min(30, avail):
            err("site {} has only {} random pairs".format(site, nr))
    # hard case: >= 10 distinct notices on one heavy site with a byte-identical aside
    by_aside = defaultdict(list)
    for p, a in aside_by_doc.items():
        by_aside[a].append(p)
    best = max(by_aside.values(), key=len) if by_aside else []
    distinct_clusters = {cl[p]["cluster"] for p in best}
    if len(distinct_clusters) < 10 or len({cl[p]["site"] for p in best}) != 1:
        err("hard case missing: need >= 10 distinct notices sharing one byte-identical aside")
    # template mechanics present somewhere
    htmls = [p for p in paths if p.endswith(".html")]
    blob = {p: open(os.path.join(out, "inbox", p), encoding="utf-8").read() for p in htmls}
    mech = {
        "in-body promo between paragraphs": lambda t: re.search(r'</p>\s*<div class="promo">.*?</div>\s*<(p|h2|ul)>', t, re.S),
        "updated N hours ago": lambda t: re.search(r"Last updated \d+ hours ago", t),
        "page x of y": lambda t: re.search(r"Page \d+ of 12", t),
        "side TOC": lambda t: 'class="toc"' in t,
        "print variant": lambda t: 'class="print"' in t,
        "data table template": lambda t: 'class="hours"' in t or 'class="fares"' in t,
        "comments": lambda t: 'class="comments"' in t,
        "cookie notice at end": lambda t: t.rfind('class="cookie-notice"') > t.rfind("<footer>") > 0,
    }
    for name, fn in mech.items():
        if not any(fn(t) for t in blob.values()):
            err("template mechanic missing: " + name)
    promos = Counter()
    for t in blob.values():
        m = re.search(r'<div class="promo"><strong>(.*?)</strong>', t)
        if m:
            promos[m.group(1)] += 1
    for p in htmls:
        if cl[p]["role"] != "print-variant" and "breadcrumbs" in blob[p]:
            title = body[p].split("\n")[0]
            crumbs = re.search(r'<nav class="breadcrumbs">(.*?)</nav>', blob[p]).group(1)
            if squash(title) not in squash(visible("<body>" + crumbs + "</body>")):
                err("breadcrumb does not name the page " + p)

    if errs:
        print("INVALID ({} errors)".format(len(errs)))
        for e in errs:
            print(" -", e)
        sys.exit(1)
    print("documents {} ({}), sites {}".format(n_docs, dict(ext), dict(sites)))
    print("pairs {}: {}".format(len(labelled), dict(kinds)))
    print("cross-format {} (with PDF {}), hard-case notices sharing aside {}".format(len(xf), len(xf_pdf), len(best)))
    print("VALID")


if __name__ == "__main__":
    main()
