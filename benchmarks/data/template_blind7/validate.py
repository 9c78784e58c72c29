#!/usr/bin/env python3
"""Re-checks the generated corpus with the standard library only. Prints VALID or a list of errors.
Usage: python validate.py [--out DIR] [--rebuild]   (--rebuild needs fpdf2: rebuilds twice into temp
dirs and compares every byte)."""
import argparse
import hashlib
import json
import os
import re
import shutil
import subprocess
import sys
import tempfile
import zlib
from collections import Counter, defaultdict
from html.parser import HTMLParser

HERE = os.path.dirname(os.path.abspath(__file__))
PUNCT = re.compile(r"[^\w\s]")
KINDS = ("republication:", "cross-format:", "syndication:", "twin:", "random:")
ROLES = {"original", "republication", "syndication", "print-variant", "format-pdf", "format-txt", "format-md",
         "twin", "standalone"}
HOST_OK = re.compile(r"^([a-z0-9-]+\.)*(example\.(org|net|com)|[a-z0-9-]+\.test)$")


def words(t):
    return PUNCT.sub("", t.lower()).split()


def shingles(t):
    w = words(t)
    return {tuple(w[i:i + 5]) for i in range(len(w) - 4)}


def jac(a, b):
    return round(len(a & b) / len(a | b), 4) if (a or b) else 1.0


class Ext(HTMLParser):
    def __init__(self):
        super().__init__(convert_charrefs=True)
        self.skip, self.parts = 0, []

    def handle_starttag(self, tag, a):
        if tag in ("script", "style", "head", "template"):
            self.skip += 1

    def handle_endtag(self, tag):
        if tag in ("script", "style", "head", "template") and self.skip:
            self.skip -= 1

    def handle_data(self, d):
        if not self.skip:
            self.parts.append(d)


def html_text(h):
    p = Ext()
    p.feed(h)
    p.close()
    return " ".join(p.parts)


def pdf_text(data):
    """Very small PDF text pull: inflate content streams, collect literal strings from Tj/TJ."""
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
    ap.add_argument("--out", default=os.path.join(HERE, "out"))
    ap.add_argument("--rebuild", action="store_true")
    args = ap.parse_args()
    out = args.out
    errs = []
    E = errs.append

    # ---------------- manifest and files
    man = [json.loads(l) for l in open(os.path.join(out, "manifest.jsonl"), encoding="utf-8")]
    paths = [m["path"] for m in man]
    if len(set(paths)) != len(paths):
        E("duplicate paths in manifest")
    pset = set(paths)
    on_disk = set()
    for root, _, files in os.walk(os.path.join(out, "inbox")):
        for f in files:
            on_disk.add(os.path.relpath(os.path.join(root, f), os.path.join(out, "inbox")).replace(os.sep, "/"))
    if on_disk != pset:
        E(f"inbox/manifest mismatch: {sorted(on_disk ^ pset)[:5]}")
    for m in man:
        if not re.fullmatch(r"[a-z0-9-]+/[a-z0-9-]+\.(html|txt|md|pdf)", m["path"]):
            E(f"bad path {m['path']}")
        host = re.match(r"https://([^/?]+)", m["source_url"])
        if not host or not HOST_OK.match(host.group(1)):
            E(f"bad source_url {m['source_url']}")
    sites = sorted({p.split("/")[0] for p in paths})

    # ---------------- bodies
    body = {}
    for p in paths:
        bp = os.path.join(out, "bodies", p + ".txt")
        if not os.path.exists(bp):
            E(f"missing body {p}")
            continue
        t = open(bp, encoding="utf-8").read()
        if not t.endswith("\n") or "\n\n" in t or not t.strip():
            E(f"body format {p}")
        body[p] = t.rstrip("\n")
    SH = {p: shingles(t) for p, t in body.items()}
    bw = {p: len(words(t)) for p, t in body.items()}
    for p, n in bw.items():
        if not 60 <= n <= 470:
            E(f"body words {n} out of 60-470: {p}")
    if sum(1 for n in bw.values() if n < 250) < 0.6 * len(bw):
        E("fewer than 60% of bodies under 250 words")

    # ---------------- clusters
    cl = {}
    for l in open(os.path.join(out, "clusters.jsonl"), encoding="utf-8"):
        c = json.loads(l)
        if set(c) != {"path", "cluster", "family", "role", "site", "body_words", "template_ratio"}:
            E(f"cluster fields {c.get('path')}")
        cl[c["path"]] = c
    if set(cl) != pset:
        E("clusters.jsonl does not cover the manifest exactly")
    for p, c in cl.items():
        if c["site"] != p.split("/")[0]:
            E(f"site field {p}")
        if c["role"] not in ROLES:
            E(f"role {c['role']} {p}")
        if p in bw and c["body_words"] != bw[p]:
            E(f"body_words mismatch {p}: {c['body_words']} vs {bw[p]}")

    # ---------------- documents: text presence and template ratio
    text_of = {}
    for p in paths:
        fp = os.path.join(out, "inbox", p)
        ext = p.rsplit(".", 1)[1]
        if ext == "pdf":
            data = open(fp, "rb").read()
            if not data.startswith(b"%PDF-"):
                E(f"not a PDF {p}")
            text_of[p] = pdf_text(data)
        else:
            raw = open(fp, encoding="utf-8").read()
            for u in re.findall(r"https?://([^/\s\"'<>)\]]+)", raw):
                if not HOST_OK.match(u.lower()):
                    E(f"foreign host {u} in {p}")
            if "lorem" in raw.lower():
                E(f"lorem ipsum in {p}")
            if ext == "html":
                text_of[p] = html_text(raw)
            elif ext == "txt":
                t = re.sub(r"([a-z])-\n\s*([a-z])", r"\1\2", raw)
                text_of[p] = t
            else:
                text_of[p] = re.sub(r"\[([^\]]+)\]\[\d+\]", r"\1", raw)
    heavy_sites = []
    for s in sites:
        rs = []
        for p in paths:
            if not p.startswith(s + "/") or p not in body:
                continue
            tw = len(words(text_of[p]))
            if p.endswith(".html") or p.endswith(".txt") or p.endswith(".md"):
                r = round(max(0, tw - bw[p]) / bw[p], 2)
                if abs(r - cl[p]["template_ratio"]) > 0.011:
                    E(f"template_ratio mismatch {p}: {cl[p]['template_ratio']} vs {r}")
            if p.endswith(".html") and cl[p]["role"] != "print-variant":
                rs.append(cl[p]["template_ratio"])
            # body lines present in the document text
            norm_doc = " ".join(words(text_of[p]))
            if p.endswith(".pdf"):
                have = shingles(text_of[p])
                cov = len(SH[p] & have) / max(1, len(SH[p]))
                if cov < 0.9:
                    E(f"pdf body coverage {cov:.2f} {p}")
                continue
            for line in body[p].split("\n"):
                nl = " ".join(words(line))
                if nl and nl not in norm_doc:
                    E(f"body line not found in document {p}: {line[:60]}")
                    break
        rs.sort()
        if rs and rs[len(rs) // 2] >= 2.5:
            heavy_sites.append(s)
            bad = [r for r in rs if not 2.5 <= r <= 5.0]
            if bad:
                E(f"heavy site {s}: {len(bad)} HTML pages with template ratio outside 2.5-5 ({bad[:5]})")
    if len(heavy_sites) < 7:
        E(f"only {len(heavy_sites)} heavy sites")

    # ---------------- pairs
    pairs = [json.loads(l) for l in open(os.path.join(out, "pairs.jsonl"), encoding="utf-8")]
    lab = {}
    cnt = Counter()
    pdf_xf = 0
    rand_site = Counter()
    for q in pairs:
        a, b = q["a"], q["b"]
        if set(q) != {"a", "b", "relation", "body_jaccard", "note"}:
            E(f"pair fields {a} {b}")
        if a not in pset or b not in pset or a == b:
            E(f"pair paths {a} {b}")
            continue
        key = tuple(sorted((a, b)))
        if key in lab:
            E(f"duplicate pair {key}")
        lab[key] = q
        j = jac(SH[a], SH[b])
        if abs(j - q["body_jaccard"]) > 1e-9:
            E(f"jaccard {a} {b}: {q['body_jaccard']} vs {j}")
        kind = q["note"].split(":")[0] + ":"
        if kind not in KINDS:
            E(f"note kind {q['note'][:30]}")
        rel = q["relation"]
        cnt[(kind, rel)] += 1
        same = body[a] == body[b]
        if rel == "near-duplicate":
            if cl[a]["cluster"] != cl[b]["cluster"] or same or j < 0.80:
                E(f"near-duplicate rule broken {a} {b} {j}")
        elif rel == "exact-body":
            if not same or cl[a]["cluster"] != cl[b]["cluster"]:
                E(f"exact-body rule broken {a} {b}")
        elif rel == "distinct":
            if cl[a]["cluster"] == cl[b]["cluster"] or a.split("/")[0] != b.split("/")[0]:
                E(f"distinct pair not same-site/different-cluster {a} {b}")
            if kind == "twin:":
                if cl[a]["family"] != cl[b]["family"] or not 0.10 <= j <= 0.45:
                    E(f"twin rule broken {a} {b} {j}")
            elif kind == "random:":
                rand_site[a.split("/")[0]] += 1
                if j >= 0.45:
                    E(f"random pair too similar {a} {b} {j}")
            else:
                E(f"distinct pair with kind {kind}")
        else:
            E(f"relation {rel}")
        if kind == "cross-format:" and (a.endswith(".pdf") or b.endswith(".pdf")):
            pdf_xf += 1
        if kind in ("republication:", "cross-format:", "syndication:") and rel == "distinct":
            E(f"copy kind with distinct {a} {b}")
    # every pair inside a copy group is labelled; unlabelled pairs below 0.45
    groups = defaultdict(list)
    for p, c in cl.items():
        groups[c["cluster"]].append(p)
    for g, mem in groups.items():
        for i in range(len(mem)):
            for k in range(i + 1, len(mem)):
                if tuple(sorted((mem[i], mem[k]))) not in lab:
                    E(f"unlabelled pair inside copy group {g}: {mem[i]} {mem[k]}")
    hi = 0
    for i in range(len(paths)):
        for k in range(i + 1, len(paths)):
            key = tuple(sorted((paths[i], paths[k])))
            if key not in lab and jac(SH[paths[i]], SH[paths[k]]) >= 0.45:
                hi += 1
                if hi <= 5:
                    E(f"unlabelled pair with Jaccard >= 0.45: {key}")

    # ---------------- size requirements
    n = len(paths)
    nonhtml = sum(1 for p in paths if not p.endswith(".html"))
    rep = cnt[("republication:", "near-duplicate")]
    xf = cnt[("cross-format:", "near-duplicate")] + cnt[("cross-format:", "exact-body")]
    exact = sum(v for (k, r), v in cnt.items() if r == "exact-body")
    twins = cnt[("twin:", "distinct")]
    per_site = Counter(p.split("/")[0] for p in paths)
    checks = [(380 <= n <= 420, f"documents {n} not in 380-420"), (len(sites) == 10, f"{len(sites)} sites, want 10"),
              (nonhtml >= 0.2 * n, f"non-HTML share {nonhtml}/{n} < 20%"), (rep >= 60, f"republication near-dups {rep} < 60"),
              (xf >= 80, f"cross-format pairs {xf} < 80"), (pdf_xf >= 40, f"cross-format pairs with PDF {pdf_xf} < 40"),
              (exact >= 15, f"exact-body pairs {exact} < 15"), (twins >= 80, f"hard negatives {twins} < 80"),
              (any(3 <= v <= 6 for v in per_site.values()), "no small site with 3-6 pages")]
    for ok, msg in checks:
        if not ok:
            E(msg)
    for s in sites:
        mem = [p for p in paths if p.startswith(s + "/")]
        possible = sum(1 for i in range(len(mem)) for k in range(i + 1, len(mem)) if cl[mem[i]]["cluster"] != cl[mem[k]]["cluster"])
        if rand_site[s] < min(30, possible):
            E(f"site {s}: only {rand_site[s]} random pairs")

    # ---------------- template mechanics
    hard = defaultdict(list)
    promo_pool = defaultdict(set)
    for p in paths:
        if not p.endswith(".html"):
            continue
        raw = open(os.path.join(out, "inbox", p), encoding="utf-8").read()
        m = re.search(r"<section class=\"current-notices\">.*?</section>", raw, re.S)
        if m:
            hard[hashlib.sha1(m.group(0).encode()).hexdigest()].append(p)
        for pm in re.findall(r"<aside class=\"promo\"><p>(.*?)</p>", raw):
            promo_pool[p.split("/")[0]].add(pm)
        art = re.search(r"<article>(.*?)</article>", raw, re.S)
        if art and "class=\"promo\"" in raw and "class=\"promo\"" not in art.group(1):
            E(f"promo block outside the body region {p}")
    best = max(hard.values(), key=len) if hard else []
    if len(best) < 10 or len({cl[p]['cluster'] for p in best}) < 10:
        E("hard case: fewer than 10 distinct notices share a byte-identical aside")
    for s, pool in promo_pool.items():
        if not 4 <= len(pool) <= 8:
            E(f"promo pool on {s} has {len(pool)} variants")

    # ---------------- determinism
    if args.rebuild:
        py = sys.executable
        digests = []
        for _ in range(2):
            d = tempfile.mkdtemp(prefix="b13v7-")
            subprocess.run([py, os.path.join(HERE, "make_corpus.py"), "--out", d], check=True, capture_output=True)
            h = hashlib.sha256()
            for root, _, files in sorted(os.walk(d)):
                for f in sorted(files):
                    fp = os.path.join(root, f)
                    h.update(os.path.relpath(fp, d).encode())
                    h.update(open(fp, "rb").read())
            digests.append(h.hexdigest())
            shutil.rmtree(d, ignore_errors=True)
        if digests[0] != digests[1]:
            E("rebuilds are not byte-identical")
        else:
            print("rebuild digest", digests[0])

    print(f"documents {n} (non-HTML {nonhtml}), sites {len(sites)}, heavy {len(heavy_sites)}; pairs {len(pairs)}: "
          f"republication near-dup {rep}, cross-format {xf} (with PDF {pdf_xf}), exact-body {exact}, twins {twins}, "
          f"random {sum(rand_site.values())}; hard-case pages {len(best)}")
    if errs:
        for e in errs[:60]:
            print("ERROR:", e)
        print(f"{len(errs)} errors")
        sys.exit(1)
    print("VALID")


if __name__ == "__main__":
    main()
