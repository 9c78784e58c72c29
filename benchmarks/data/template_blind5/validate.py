#!/usr/bin/env python3
"""Re-check the generated corpus (standard library only).  Usage: python validate.py [--out DIR]
Prints VALID or a list of errors (exit status 1)."""
import argparse
import itertools
import json
import os
import re
import sys
import zlib
from collections import Counter, defaultdict
from html.parser import HTMLParser

KINDS = ("republication", "cross-format", "syndication", "twin", "random")
HEAVY_MIN_SITES = 7
errors = []


def err(msg):
    errors.append(msg)


# --- the brief's body_jaccard ---------------------------------------------------
def shingles(lines):
    text = re.sub(r"[^\w\s]", "", "\n".join(lines).lower())
    w = text.split()
    return set(tuple(w[i:i + 5]) for i in range(len(w) - 4))


def jac(a, b):
    if not a and not b:
        return 1.0
    return round(len(a & b) / len(a | b), 4)


# --- visible text of HTML ------------------------------------------------------------
class Vis(HTMLParser):
    def __init__(self):
        super().__init__(convert_charrefs=True)
        self.skip = 0
        self.chunks = []

    def handle_starttag(self, tag, attrs):
        if tag in ("script", "style"):
            self.skip += 1

    def handle_endtag(self, tag):
        if tag in ("script", "style") and self.skip:
            self.skip -= 1

    def handle_data(self, data):
        if not self.skip:
            self.chunks.append(data)


def visible(html):
    p = Vis()
    p.feed(html)
    p.close()
    return " ".join(p.chunks).split()


def norm(s):
    return " ".join(s.split())


def pdf_text(data):
    """Very small PDF text extractor: inflate streams, collect literal strings of text operators."""
    out = []
    for m in re.finditer(rb"stream\r?\n(.*?)\r?\nendstream", data, re.S):
        raw = m.group(1)
        try:
            raw = zlib.decompress(raw)
        except zlib.error:
            pass
        if b"BT" not in raw:
            continue
        for s in re.finditer(rb"\((?:\\.|[^\\)])*\)", raw):
            t = s.group(0)[1:-1]
            t = re.sub(rb"\\([()\\])", rb"\1", t)
            out.append(t.decode("latin-1"))
    return " ".join(out)


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(os.path.dirname(os.path.abspath(__file__)), "out"))
    args = ap.parse_args()
    out = args.out
    inbox = os.path.join(out, "inbox")

    man = [json.loads(l) for l in open(os.path.join(out, "manifest.jsonl"))]
    clus = [json.loads(l) for l in open(os.path.join(out, "clusters.jsonl"))]
    pairs = [json.loads(l) for l in open(os.path.join(out, "pairs.jsonl"))]
    paths = [m["path"] for m in man]
    if len(set(paths)) != len(paths):
        err("duplicate manifest paths")
    on_disk = set()
    for root, _, files in os.walk(inbox):
        for f in files:
            on_disk.add(os.path.relpath(os.path.join(root, f), inbox))
    if on_disk != set(paths):
        err("inbox files and manifest differ: %d vs %d" % (len(on_disk), len(paths)))
    host_re = re.compile(r"^https://([a-z0-9.-]+\.)?(example\.(org|net|com)|[a-z0-9-]+\.test)(/|$)")
    for m in man:
        if not host_re.match(m["source_url"]):
            err("bad host %s" % m["source_url"])
        if not re.match(r"^[a-z0-9-]+/[a-z0-9-]+\.(html|txt|md|pdf)$", m["path"]):
            err("bad path %s" % m["path"])
    cinfo = {c["path"]: c for c in clus}
    if set(cinfo) != set(paths):
        err("clusters.jsonl does not cover the manifest")
    for c in clus:
        for k in ("path", "cluster", "family", "role", "site", "body_words", "template_ratio"):
            if k not in c:
                err("cluster row missing %s: %s" % (k, c.get("path")))

    # bodies -------------------------------------------------------------------------
    body, sh = {}, {}
    for p in paths:
        bp = os.path.join(out, "bodies", p + ".txt")
        if not os.path.exists(bp):
            err("missing body %s" % bp)
            continue
        lines = open(bp, encoding="utf-8").read().rstrip("\n").split("\n")
        body[p] = lines
        sh[p] = shingles(lines)
        n = sum(len(l.split()) for l in lines)
        if n != cinfo[p]["body_words"]:
            err("body_words mismatch %s" % p)
        if not 60 <= n <= 470:
            err("body length %d out of 60-470: %s" % (n, p))
        if "lorem" in " ".join(lines).lower():
            err("lorem ipsum in %s" % p)
    words = [cinfo[p]["body_words"] for p in paths]
    if sum(1 for w in words if w < 250) <= len(words) / 2:
        err("most bodies should be under 250 words")

    # documents contain their bodies ----------------------------------------------------
    ratios = {}
    pdf_count = 0
    for p in paths:
        data = open(os.path.join(inbox, p), "rb").read()
        lines = body.get(p, [])
        ext = p.rsplit(".", 1)[1]
        if ext == "html":
            vis = visible(data.decode("utf-8"))
            hay = " ".join(vis)
            ratios[p] = round((len(vis) - cinfo[p]["body_words"]) / cinfo[p]["body_words"], 3)
            if abs(ratios[p] - cinfo[p]["template_ratio"]) > 0.002:
                err("template_ratio mismatch %s: %s vs %s" % (p, ratios[p], cinfo[p]["template_ratio"]))
        elif ext == "txt":
            t = data.decode("utf-8")
            t = re.sub(r"(\w)-\n\s*(\w)", r"\1\2", t)
            hay = norm(t)
        elif ext == "md":
            t = data.decode("utf-8")
            if not t.startswith("---\n"):
                err("md without front matter %s" % p)
            t = re.sub(r"\[([^\]]+)\]\[\d+\]", r"\1", t).replace("|", " ")
            hay = norm(t)
        else:
            pdf_count += 1
            if not data.startswith(b"%PDF-") or b"%%EOF" not in data[-64:]:
                err("bad pdf %s" % p)
            txt = pdf_text(data)
            toks = set(re.sub(r"[^\w\s]", " ", txt.lower()).split())
            bw = set(re.sub(r"[^\w\s]", " ", " ".join(lines).lower()).split())
            cov = len(bw & toks) / max(1, len(bw))
            if cov < 0.97:
                err("pdf text coverage %.2f %s" % (cov, p))
            if "Page 1 of" not in txt:
                err("pdf without page footer %s" % p)
            continue
        for l in lines:
            if norm(l) not in hay:
                err("body line not found in %s: %r" % (p, l[:60]))
                break

    # heavy sites ----------------------------------------------------------------------
    by_site = defaultdict(list)
    for p in paths:
        by_site[cinfo[p]["site"]].append(p)
    if len(by_site) != 10:
        err("expected 10 sites, got %d" % len(by_site))
    heavy = []
    for s, ps in sorted(by_site.items()):
        pages = [p for p in ps if p.endswith(".html") and not p.endswith("-print.html")]
        rs = [ratios[p] for p in pages]
        if rs and all(2.5 <= r <= 5.0 for r in rs):
            heavy.append(s)
    if len(heavy) < HEAVY_MIN_SITES:
        err("only %d heavy sites: %s" % (len(heavy), heavy))

    # hard case: byte-identical aside on >= 10 distinct pages of one heavy site ------------
    best = 0
    for s in heavy:
        cnt = defaultdict(set)
        for p in by_site[s]:
            if not p.endswith(".html"):
                continue
            html = open(os.path.join(inbox, p), encoding="utf-8").read()
            for a in set(re.findall(r"<aside[^>]*>.*?</aside>", html, re.S)):
                if len(visible(a)) >= 100:
                    cnt[a].add(cinfo[p]["cluster"])
        if cnt:
            best = max(best, max(len(v) for v in cnt.values()))
    if best < 10:
        err("hard case missing: largest identical aside on %d distinct clusters" % best)

    # pairs ----------------------------------------------------------------------------------
    labelled = {}
    kinds = Counter()
    for pr in pairs:
        a, b = pr["a"], pr["b"]
        if a not in sh or b not in sh:
            err("pair with unknown path %s %s" % (a, b))
            continue
        key = tuple(sorted((a, b)))
        if key in labelled:
            err("pair labelled twice %s" % (key,))
        labelled[key] = pr
        j = jac(sh[a], sh[b])
        if abs(j - pr["body_jaccard"]) > 1e-9:
            err("body_jaccard mismatch %s %s: %s vs %s" % (a, b, j, pr["body_jaccard"]))
        kind = pr["note"].split(":", 1)[0]
        if kind not in KINDS:
            err("bad note kind %r" % pr["note"][:30])
        rel = pr["relation"]
        same_c = cinfo[a]["cluster"] == cinfo[b]["cluster"]
        if rel == "exact-body":
            if body[a] != body[b] or not same_c:
                err("exact-body pair with different bodies/clusters %s %s" % (a, b))
        elif rel == "near-duplicate":
            if body[a] == body[b] or j < 0.80 or not same_c:
                err("near-duplicate violation %s %s j=%s" % (a, b, j))
        elif rel == "distinct":
            if same_c:
                err("distinct pair inside one cluster %s %s" % (a, b))
            if kind == "twin":
                if not (0.10 <= j <= 0.45) or cinfo[a]["site"] != cinfo[b]["site"] or \
                        cinfo[a]["family"] != cinfo[b]["family"]:
                    err("twin violation %s %s j=%s" % (a, b, j))
            elif j >= 0.45:
                err("distinct pair too similar %s %s" % (a, b))
            if kind == "random" and cinfo[a]["site"] != cinfo[b]["site"]:
                err("random pair across sites")
        else:
            err("bad relation %s" % rel)
        if rel in ("exact-body", "near-duplicate") and kind not in ("republication", "cross-format", "syndication"):
            err("copy pair with kind %s" % kind)
        kinds[(rel, kind)] += 1
        if kind == "cross-format":
            kinds["xf_pdf"] += int(a.endswith(".pdf") or b.endswith(".pdf"))

    # every pair inside a copy group labelled; every unlabelled pair < 0.45 -----------------------
    members = defaultdict(list)
    for p in paths:
        members[cinfo[p]["cluster"]].append(p)
    for c, ms in members.items():
        for a, b in itertools.combinations(sorted(ms), 2):
            if (a, b) not in labelled:
                err("unlabelled pair inside cluster %s: %s %s" % (c, a, b))
    worst = 0.0
    sp = sorted(paths)
    for i in range(len(sp)):
        si = sh[sp[i]]
        for j in range(i + 1, len(sp)):
            key = (sp[i], sp[j])
            if key in labelled:
                continue
            sj = sh[sp[j]]
            inter = len(si & sj)
            if not inter:
                continue
            v = inter / len(si | sj)
            worst = max(worst, v)
            if v >= 0.45:
                err("unlabelled pair with jaccard %.3f: %s %s" % (v, sp[i], sp[j]))

    # counts -------------------------------------------------------------------------------------
    n = len(paths)
    nonhtml = sum(1 for p in paths if not p.endswith(".html"))
    rep = sum(v for k, v in kinds.items() if isinstance(k, tuple) and k[1] == "republication" and k[0] == "near-duplicate")
    xf = sum(v for k, v in kinds.items() if isinstance(k, tuple) and k[1] == "cross-format")
    exact = sum(v for k, v in kinds.items() if isinstance(k, tuple) and k[0] == "exact-body")
    twins = kinds[("distinct", "twin")]
    rnd = Counter(cinfo[pr["a"]]["site"] for pr in pairs if pr["note"].startswith("random:"))
    checks = [(380 <= n <= 420, "documents %d not in 380-420" % n),
              (nonhtml >= 0.2 * n, "non-HTML %d < 20%%" % nonhtml),
              (rep >= 60, "republication near-dups %d < 60" % rep),
              (xf >= 80, "cross-format pairs %d < 80" % xf),
              (kinds["xf_pdf"] >= 40, "cross-format pairs with PDF %d < 40" % kinds["xf_pdf"]),
              (exact >= 15, "exact-body pairs %d < 15" % exact),
              (twins >= 80, "twin pairs %d < 80" % twins),
              (all(rnd[s] >= 30 for s in by_site), "random pairs per site < 30: %s" % dict(rnd))]
    for ok, msg in checks:
        if not ok:
            err(msg)

    print("documents %d (non-HTML %d = %.1f%%, pdf %d); sites %d, heavy %d: %s" %
          (n, nonhtml, 100.0 * nonhtml / n, pdf_count, len(by_site), len(heavy), ",".join(heavy)))
    print("pairs: republication near-dup %d, cross-format %d (with PDF %d), exact-body %d, twins %d, random %d" %
          (rep, xf, kinds["xf_pdf"], exact, twins, sum(rnd.values())))
    print("hard case: identical aside on %d distinct pages; max unlabelled jaccard %.3f" % (best, worst))
    if errors:
        for e in errors[:60]:
            print("ERROR:", e)
        print("%d errors" % len(errors))
        sys.exit(1)
    print("VALID")


if __name__ == "__main__":
    main()
