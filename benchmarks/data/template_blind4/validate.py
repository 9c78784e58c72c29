#!/usr/bin/env python3
"""Re-check the generated corpus (standard library only). Prints VALID or a list of errors.

Usage: python validate.py [--out DIR] [--rebuild PYTHON]
  --rebuild PYTHON  also rebuild with that interpreter (needs fpdf2) into a temp dir and compare byte for byte
"""
import argparse
import collections
import itertools
import json
import os
import re
import subprocess
import sys
import tempfile
import zlib
from html.parser import HTMLParser

HERE = os.path.dirname(os.path.abspath(__file__))
ALLOWED_HOST = re.compile(r"^([a-z0-9-]+\.)*(example\.(org|net|com)|[a-z0-9-]+\.test)$")
KINDS = ("republication:", "cross-format:", "syndication:", "twin:", "random:")

errors = []


def err(msg):
    errors.append(msg)


# ------------------------------------------------------------------ jaccard (spec)
_P = re.compile(r"[^\w\s]")


def shingles(text):
    t = _P.sub("", text.lower()).split()
    return {tuple(t[i:i + 5]) for i in range(len(t) - 4)}


def jac(a, b):
    if not a and not b:
        return 1.0
    return round(len(a & b) / len(a | b), 4)


def alnum_tokens(text):
    return [w for w in text.split() if any(c.isalnum() for c in w)]


# ------------------------------------------------------------------ html
class PageParser(HTMLParser):
    BLOCK = {"h1", "h2", "p", "li", "tr"}

    def __init__(self):
        super().__init__(convert_charrefs=True)
        self.in_body = False
        self.skip = 0
        self.all = []
        self.entry_depth = 0
        self.div_stack = []
        self.lines = []
        self.cur = None
        self.cells = None
        self.cell = None
        self.classes = []

    def handle_starttag(self, tag, attrs):
        attrs = dict(attrs)
        if tag == "body":
            self.in_body = True
        if tag in ("script", "style"):
            self.skip += 1
        if tag in ("aside", "nav", "div", "section", "header", "footer") and attrs.get("class"):
            self.classes.append(attrs["class"])
        if tag == "div":
            is_entry = attrs.get("class") == "entry"
            self.div_stack.append(is_entry)
            if is_entry:
                self.entry_depth += 1
        if self.entry_depth:
            if tag == "tr":
                self.cells = []
            elif tag in ("td", "th"):
                self.cell = []
            elif tag in self.BLOCK:
                self.cur = []

    def handle_endtag(self, tag):
        if tag in ("script", "style"):
            self.skip -= 1
        if tag == "body":
            self.in_body = False
        if self.entry_depth:
            if tag in ("td", "th") and self.cell is not None:
                self.cells.append(" ".join("".join(self.cell).split()))
                self.cell = None
            elif tag == "tr" and self.cells is not None:
                self.lines.append("\t".join(self.cells))
                self.cells = None
            elif tag in self.BLOCK and self.cur is not None:
                self.lines.append(" ".join("".join(self.cur).split()))
                self.cur = None
        if tag == "div" and self.div_stack:
            if self.div_stack.pop():
                self.entry_depth -= 1

    def handle_data(self, data):
        if self.in_body and not self.skip:
            self.all.append(data)
            if self.entry_depth:
                if self.cell is not None:
                    self.cell.append(data)
                elif self.cur is not None:
                    self.cur.append(data)


# ------------------------------------------------------------------ pdf
def pdf_info(data):
    pages = len(re.findall(rb"/Type /Page\b", data))
    texts = []
    streams = []
    for m in re.finditer(rb"stream\r?\n(.*?)\r?\nendstream", data, re.S):
        raw = m.group(1)
        try:
            dec = zlib.decompress(raw)
        except zlib.error:
            dec = raw
        streams.append(dec)
        for bt in re.finditer(rb"BT\b(.*?)\bET\b", dec, re.S):
            parts = []
            for s in re.finditer(rb"\(((?:\\.|[^\\)])*)\)\s*Tj", bt.group(1)):
                t = re.sub(rb"\\([\\()])", rb"\1", s.group(1))
                parts.append(t.decode("latin-1"))
            if parts:
                texts.append("".join(parts))
    return pages, texts, b"\n".join(streams)


def is_subsequence(needle, hay):
    it = iter(hay)
    return all(any(x == y for y in it) for x in needle)


# ------------------------------------------------------------------ main
def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(HERE, "out"))
    ap.add_argument("--rebuild", metavar="PYTHON")
    args = ap.parse_args()
    out = args.out
    inbox = os.path.join(out, "inbox")

    manifest = [json.loads(l) for l in open(os.path.join(out, "manifest.jsonl"), encoding="utf-8")]
    clusters = [json.loads(l) for l in open(os.path.join(out, "clusters.jsonl"), encoding="utf-8")]
    pairs = [json.loads(l) for l in open(os.path.join(out, "pairs.jsonl"), encoding="utf-8")]

    # ---- manifest and files
    paths = [m["path"] for m in manifest]
    if len(set(paths)) != len(paths):
        err("duplicate paths in manifest")
    if len({m["source_url"] for m in manifest}) != len(manifest):
        err("duplicate source_url in manifest")
    on_disk = set()
    for root, _, files in os.walk(inbox):
        for f in files:
            on_disk.add(os.path.relpath(os.path.join(root, f), inbox))
    if on_disk != set(paths):
        err(f"inbox files and manifest differ: {sorted(on_disk ^ set(paths))[:5]}")
    for m in manifest:
        if not re.fullmatch(r"[a-z0-9-]+/[a-z0-9-]+\.(html|txt|md|pdf)", m["path"]):
            err(f"bad path {m['path']}")
        host = re.match(r"https://([^/]+)/", m["source_url"])
        if not host or not ALLOWED_HOST.match(host.group(1)):
            err(f"bad source_url host {m['source_url']}")

    meta = {c["path"]: c for c in clusters}
    if set(meta) != set(paths):
        err("clusters.jsonl paths differ from manifest")
    for c in clusters:
        for k in ("path", "cluster", "family", "role", "site", "body_words", "template_ratio"):
            if k not in c:
                err(f"clusters entry missing {k}: {c.get('path')}")
        if c["path"].split("/")[0] != c["site"]:
            err(f"site mismatch {c['path']}")

    # ---- bodies
    body = {}
    for p in paths:
        bp = os.path.join(out, "bodies", p + ".txt")
        if not os.path.exists(bp):
            err(f"missing body {bp}")
            continue
        text = open(bp, encoding="utf-8").read()
        if not text.endswith("\n") or text.endswith("\n\n"):
            err(f"body file must end with exactly one newline: {p}")
        lines = text[:-1].split("\n")
        if any(not l.strip() or l != l.strip() for l in lines):
            err(f"blank or padded body line in {p}")
        body[p] = "\n".join(lines)
        nw = len(body[p].split())
        if p in meta and meta[p]["body_words"] != nw:
            err(f"body_words mismatch {p}: {meta[p]['body_words']} vs {nw}")
        if not (60 <= nw <= 470):
            err(f"body length {nw} outside 60-470: {p}")
        if "lorem" in text.lower() or "ipsum" in text.lower():
            err(f"filler text in {p}")
    sh = {p: shingles(t) for p, t in body.items()}

    # ---- per-format checks
    site_ratios = collections.defaultdict(list)
    signatures = collections.defaultdict(set)
    aside_re = re.compile(r'<aside class="trust-latest">.*?</aside>', re.S)
    aside_pages = collections.defaultdict(list)
    multipage = 0
    for p in paths:
        fp = os.path.join(inbox, p)
        ext = p.rsplit(".", 1)[1]
        lines = body[p].split("\n")
        nw = len(body[p].split())
        if ext == "html":
            html = open(fp, encoding="utf-8").read()
            pp = PageParser()
            pp.feed(html)
            pp.close()
            if pp.lines != lines:
                err(f"HTML body block text differs from ground truth: {p}")
            total = len(" ".join(pp.all).split())
            ratio = round((total - nw) / nw, 4)
            if abs(ratio - meta[p]["template_ratio"]) > 0.0011:
                err(f"template_ratio mismatch {p}: file {ratio} vs {meta[p]['template_ratio']}")
            site_ratios[meta[p]["site"]].append(ratio)
            signatures[meta[p]["site"]].add(tuple(pp.classes))
            for href in re.findall(r'href="(https?://[^"/]+)', html):
                if not ALLOWED_HOST.match(href.split("//")[1]):
                    err(f"link to disallowed host in {p}: {href}")
            m = aside_re.search(html)
            if m:
                aside_pages[m.group(0)].append(p)
        elif ext == "txt":
            txt = open(fp, encoding="utf-8").read()
            tl = txt.rstrip("\n").split("\n")
            if not (tl[0].endswith("plain text export") and tl[1].startswith("Source: ") and tl[-1] == "-- end of export --"):
                err(f"txt export header/end line missing: {p}")
            content = "\n".join(tl[4:-1])
            if alnum_tokens(content) != alnum_tokens(body[p]):
                err(f"txt content tokens differ from body: {p}")
            if not re.search(r"^=+$", content, re.M):
                err(f"txt title not underlined: {p}")
            if any(len(l) > 76 for l in tl[4:-1] if "\t" not in l and not l.startswith("  ") and "  " not in l):
                err(f"txt paragraph line not wrapped: {p}")
            extra = len(alnum_tokens(txt)) - nw
            if abs(round(extra / nw, 4) - meta[p]["template_ratio"]) > 0.0011:
                err(f"txt template_ratio mismatch {p}")
        elif ext == "md":
            md = open(fp, encoding="utf-8").read()
            mm = re.match(r"---\n(.*?)\n---\n", md, re.S)
            if not mm or "title:" not in mm.group(1) or "source:" not in mm.group(1):
                err(f"md front matter missing: {p}")
                continue
            rest = md[mm.end():]
            if alnum_tokens(rest) != alnum_tokens(body[p]):
                err(f"md content tokens differ from body: {p}")
            if any("\t" in l for l in lines) and not re.search(r"^\|( --- \|)+$", rest, re.M):
                err(f"md table is not a pipe table: {p}")
            extra = len(alnum_tokens(md)) - nw
            if abs(round(extra / nw, 4) - meta[p]["template_ratio"]) > 0.0011:
                err(f"md template_ratio mismatch {p}")
        else:
            data = open(fp, "rb").read()
            if not data.startswith(b"%PDF-"):
                err(f"not a PDF: {p}")
                continue
            pages, texts, content = pdf_info(data)
            if pages < 1:
                err(f"PDF without pages: {p}")
            if len([t for t in texts if " | " in t and t.split(" | ", 1)[1] == lines[0]]) != pages:
                err(f"PDF running header not on every page: {p}")
            if len([t for t in texts if re.search(r" - page \d+ of \d+$", t)]) != pages:
                err(f"PDF running footer not on every page: {p}")
            ptoks = alnum_tokens(" ".join(texts))
            if not is_subsequence(alnum_tokens(body[p].replace("\t", " ")), ptoks):
                err(f"PDF text does not contain the body in order: {p}")
            if any("\t" in l for l in lines) and not re.search(rb"\sre\s", content):
                err(f"PDF table has no drawn cells: {p}")
            if nw >= 300 and pages < 2:
                err(f"long PDF body ({nw} words) should be multi-page: {p}")
            if pages >= 2:
                multipage += 1

    if multipage < 3:
        err(f"only {multipage} multi-page PDFs")

    # ---- heavy templates, rotation
    heavy = [s for s, v in site_ratios.items() if all(2.5 <= x <= 5.0 for x in v)]
    if len(site_ratios) != 10:
        err(f"expected 10 sites, found {len(site_ratios)}")
    if len(heavy) < 7:
        err(f"only {len(heavy)} heavy-template sites (all pages 2.5-5x): {heavy}")
    for s in heavy:
        n = len(site_ratios[s])
        if len(signatures[s]) < n * 0.6:
            err(f"template rotation too weak on {s}: {len(signatures[s])} layouts for {n} pages")

    # ---- shared aside hard case
    best = max(aside_pages.values(), key=len) if aside_pages else []
    if len(best) < 10:
        err(f"shared byte-identical aside on only {len(best)} pages")
    else:
        cl_ids = {meta[p]["cluster"] for p in best}
        if len(cl_ids) != len(best):
            err("pages sharing the aside are not all distinct clusters")
        if len({meta[p]["site"] for p in best}) != 1:
            err("pages sharing the aside span several sites")
        for x, y in itertools.combinations(best, 2):
            if jac(sh[x], sh[y]) >= 0.45:
                err(f"shared-aside notices too similar: {x} {y}")
        if sum(1 for p in best if meta[p]["body_words"] < 150) < 10:
            err("fewer than 10 short notices share the aside")

    # ---- pairs
    seen = set()
    counts = collections.Counter()
    pdf_cross = 0
    rand_site = collections.Counter()
    for pr in pairs:
        a, b, rel = pr["a"], pr["b"], pr["relation"]
        if a not in meta or b not in meta:
            err(f"pair with unknown path {a} {b}")
            continue
        key = tuple(sorted((a, b)))
        if key in seen or a == b:
            err(f"duplicate or self pair {key}")
        seen.add(key)
        j = jac(sh[a], sh[b])
        if abs(j - pr["body_jaccard"]) > 1e-9:
            err(f"body_jaccard mismatch {a} {b}: {pr['body_jaccard']} vs {j}")
        kind = pr["note"].split(":")[0] + ":"
        if kind not in KINDS:
            err(f"bad note prefix: {pr['note'][:30]}")
        ma, mb = meta[a], meta[b]
        same_cl = ma["cluster"] == mb["cluster"]
        if rel == "near-duplicate":
            if not same_cl or body[a] == body[b] or j < 0.80:
                err(f"bad near-duplicate {a} {b} ({j})")
            if kind not in ("republication:", "cross-format:"):
                err(f"near-duplicate with kind {kind}")
        elif rel == "exact-body":
            if not same_cl or body[a] != body[b]:
                err(f"bad exact-body {a} {b}")
            if kind not in ("syndication:", "cross-format:"):
                err(f"exact-body with kind {kind}")
        elif rel == "distinct":
            if same_cl:
                err(f"distinct pair inside one cluster {a} {b}")
            if kind == "twin:":
                if ma["family"] != mb["family"] or ma["site"] != mb["site"] or not (0.10 <= j <= 0.45):
                    err(f"bad twin {a} {b} ({j})")
            elif kind == "random:":
                if ma["site"] != mb["site"] or j >= 0.45:
                    err(f"bad random pair {a} {b} ({j})")
                rand_site[ma["site"]] += 1
            else:
                err(f"distinct with kind {kind}")
        else:
            err(f"bad relation {rel}")
        if kind == "republication:" and "republication" not in (ma["role"], mb["role"]):
            err(f"republication pair without a republication {a} {b}")
        if kind == "cross-format:" and a.rsplit(".", 1)[1] == b.rsplit(".", 1)[1]:
            err(f"cross-format pair with one format {a} {b}")
        if kind == "cross-format:" and (a.endswith(".pdf") or b.endswith(".pdf")):
            pdf_cross += 1
        counts[(kind, rel)] += 1

    by_cluster = collections.defaultdict(list)
    for p in paths:
        by_cluster[meta[p]["cluster"]].append(p)
    for cl, members in by_cluster.items():
        for x, y in itertools.combinations(members, 2):
            if tuple(sorted((x, y))) not in seen:
                err(f"unlabelled pair inside copy group {cl}: {x} {y}")
    # all unlabelled pairs below 0.45 (inverted index over shingles for speed)
    index = collections.defaultdict(set)
    for i, p in enumerate(paths):
        for s in sh[p]:
            index[s].add(i)
    shared = collections.Counter()
    for s, ids in index.items():
        if len(ids) > 1:
            for x, y in itertools.combinations(sorted(ids), 2):
                shared[(x, y)] += 1
    for (x, y), n in shared.items():
        px, py = paths[x], paths[y]
        if tuple(sorted((px, py))) in seen:
            continue
        j = round(n / (len(sh[px]) + len(sh[py]) - n), 4)
        if j >= 0.45:
            err(f"unlabelled pair with Jaccard {j}: {px} {py}")

    # ---- size and variety
    n = len(paths)
    nonhtml = sum(1 for p in paths if not p.endswith(".html"))
    words = [meta[p]["body_words"] for p in paths]
    rep = counts[("republication:", "near-duplicate")]
    cross = counts[("cross-format:", "near-duplicate")] + counts[("cross-format:", "exact-body")]
    exact = sum(v for (k, r), v in counts.items() if r == "exact-body")
    twins = counts[("twin:", "distinct")]
    checks = [
        (380 <= n <= 420, f"documents {n} not in 380-420"),
        (nonhtml >= 0.2 * n, f"non-HTML {nonhtml} < 20%"),
        (sum(w < 250 for w in words) > n / 2, "most bodies should be under 250 words"),
        (rep >= 60, f"republication near-dups {rep} < 60"),
        (cross >= 80, f"cross-format pairs {cross} < 80"),
        (pdf_cross >= 40, f"cross-format pairs with a PDF {pdf_cross} < 40"),
        (exact >= 15, f"exact-body pairs {exact} < 15"),
        (twins >= 80, f"twin pairs {twins} < 80"),
    ]
    for ok, msg in checks:
        if not ok:
            err(msg)
    for s in site_ratios:
        if rand_site[s] < 30:
            err(f"only {rand_site[s]} random pairs on {s}")

    # ---- optional byte-identical rebuild
    if args.rebuild:
        with tempfile.TemporaryDirectory() as tmp:
            dst = os.path.join(tmp, "out")
            subprocess.run([args.rebuild, os.path.join(HERE, "make_corpus.py"), "--out", dst], check=True,
                           stdout=subprocess.DEVNULL)
            for root, _, files in os.walk(out):
                for f in files:
                    p1 = os.path.join(root, f)
                    p2 = os.path.join(dst, os.path.relpath(p1, out))
                    if not os.path.exists(p2) or open(p1, "rb").read() != open(p2, "rb").read():
                        err(f"rebuild differs: {os.path.relpath(p1, out)}")
                        break

    print(f"documents {n} ({nonhtml} non-HTML, {100 * nonhtml / n:.1f}%), sites {len(site_ratios)}, "
          f"heavy sites {len(heavy)}, pairs {len(pairs)}")
    print(f"republication near-dup {rep}, cross-format {cross} (with PDF {pdf_cross}), exact-body {exact}, "
          f"twins {twins}, random {sum(rand_site.values())} (min per site {min(rand_site.values()) if rand_site else 0}), "
          f"shared-aside pages {len(best)}, multi-page PDFs {multipage}")
    if errors:
        for e in errors[:60]:
            print("ERROR:", e)
        print(f"{len(errors)} error(s)")
        sys.exit(1)
    print("VALID")


if __name__ == "__main__":
    main()
