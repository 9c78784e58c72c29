#!/usr/bin/env python3
"""Deterministic generator for the near-duplicate benchmark corpus (set 6).

Usage: python make_corpus.py [--out DIR]      (default: out/ beside this file)
Requires fpdf2 for the PDF exports; everything else is standard library.
"""
import argparse
import itertools
import json
import os
import random
import shutil
import sys
import zlib

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)

from common import body_lines, shingles, jaccard_sets, word_count  # noqa: E402
from content_a import pages_a  # noqa: E402
from content_b import pages_b  # noqa: E402
import edits  # noqa: E402
import formats  # noqa: E402
import templates  # noqa: E402
from sitecfg import SITES  # noqa: E402

PARTNER = {"bus": "carshare", "airport": "bus", "carshare": "bus", "planning": "noticeboard", "dental": "noticeboard",
           "bikecoop": "carshare", "sailing": "noticeboard", "firerescue": "sailing", "noticeboard": "noticeboard"}
NEAR_MIN = 0.80
SAFETY = 0.81


def crc(s):
    return zlib.crc32(s.encode("utf-8"))


def btext(blocks):
    return "\n".join(body_lines(blocks))


def make_doc(base, site, slug, blocks, ext, role, cluster, ops, section=None):
    cfg = SITES[site]
    sec = section or base["section"]
    if sec not in cfg["menus"]:
        sec = list(cfg["menus"])[0]
    d = dict(base)
    d.update(site=site, slug=slug, blocks=blocks, title=blocks[0][1], ext=ext, role=role, cluster=cluster, ops=ops, section=sec)
    d["body_lines"] = body_lines(blocks)
    d["path"] = "{}/{}.{}".format(site, slug, ext)
    if ext == "html":
        d["url"] = "https://{}/{}/{}".format(cfg["host"], sec, slug)
    else:
        d["url"] = "https://{}/exports/{}.{}".format(cfg["host"], slug, ext)
    d["orig_site"] = base["site"]
    d["orig_url"] = "https://{}/{}/{}".format(SITES[base["site"]]["host"], base["section"], base["slug"])
    return d


def build(out):
    originals = pages_a() + pages_b()
    docs = []
    groups = {}
    for k, p in enumerate(originals):
        cl = "c{:03d}".format(k)
        d = make_doc(p, p["site"], p["slug"], p["blocks"], "html", "original", cl, [])
        d["family"] = p["family"]
        docs.append(d)
        groups[cl] = [d]

    def fits(cl, blocks):
        s = shingles(btext(blocks))
        return all(jaccard_sets(s, shingles(btext(m["blocks"]))) >= SAFETY for m in groups[cl])

    def add(d):
        docs.append(d)
        groups[d["cluster"]].append(d)

    for k, p in enumerate(originals):
        cl = "c{:03d}".format(k)
        orig = groups[cl][0]
        site = p["site"]
        seed = crc(p["slug"])
        if site == "seminars":
            if k % 2 == 0:
                add(make_doc(p, site, p["slug"], p["blocks"], "pdf", "pdf-export", cl, ["unedited export"]))
            continue
        # republication (edited, same or other site)
        if k % 3 == 0 or k % 11 == 5:
            mode = (k // 3) % 3
            if mode == 0 and site != "noticeboard":
                tsite, ctx, slug = "noticeboard", "noticeboard", "shared-{}-{}".format(site, p["slug"])
            elif mode == 1 and PARTNER[site] != site:
                tsite, ctx, slug = PARTNER[site], "other", "partner-{}-{}".format(site, p["slug"])
            else:
                tsite, ctx, slug = site, "same", p["slug"] + "-updated"
            blocks, ops = list(p["blocks"]), []
            r0 = seed % len(edits.REPUB_OPS)
            order = edits.REPUB_OPS[r0:] + edits.REPUB_OPS[:r0]
            if word_count(btext(p["blocks"])) >= 105:
                order = [edits.op_reword_sentence] + [o for o in order if o is not edits.op_reword_sentence]
            if k % 2 == 0 and sum(1 for b in p["blocks"] if b[0] == "li") >= 3:
                order = [edits.op_swap_items] + [o for o in order if o is not edits.op_swap_items]
            for op in order:
                if len(ops) >= 1 + seed % 3:
                    break
                r = op(blocks, seed + len(ops), ctx)
                if r and fits(cl, r[0]) and btext(r[0]) != btext(blocks):
                    blocks, desc = r
                    ops.append(desc)
            if ops:
                add(make_doc(p, tsite, slug, blocks, "html", "republication", cl, ops))
        # syndication: identical body on another site's template
        if k % 11 == 2:
            tsite = PARTNER[site] if PARTNER[site] != site else "carshare"
            add(make_doc(p, tsite, "from-{}-{}".format(site, p["slug"]), p["blocks"], "html", "syndication", cl, ["identical body"]))
        # print-friendly variant
        if site in ("planning", "dental") and k % 5 == 4:
            add(make_doc(p, site, p["slug"] + "-print", p["blocks"], "html", "print-variant", cl, ["printer-friendly template"]))
        # format exports
        for ext, cond, code in (("pdf", k % 4 == 1 or k % 9 == 7 or word_count(btext(p["blocks"])) >= 190, 0), ("txt", k % 5 == 2, 1), ("md", k % 6 == 3, 2)):
            if not cond:
                continue
            if (k + code) % 3 == 0:
                blocks, ops = p["blocks"], ["unedited export"]
            else:
                n = max(1, round(word_count(btext(p["blocks"])) / 110))
                blocks, wops = edits.word_edit(p["blocks"], seed + code, n)
                while wops and not fits(cl, blocks):
                    n -= 1
                    blocks, wops = edits.word_edit(p["blocks"], seed + code, n)
                ops = wops or ["unedited export"]
                if not wops:
                    blocks = p["blocks"]
            add(make_doc(p, site, p["slug"], blocks, ext, ext + "-export", cl, ops))

    # ---- write files
    if os.path.exists(out):
        shutil.rmtree(out)
    os.makedirs(os.path.join(out, "inbox"))
    by_site = {}
    for d in docs:
        if d["ext"] == "html":
            by_site.setdefault(d["site"], []).append(d)
    paths = set()
    for d in docs:
        assert d["path"] not in paths, d["path"]
        paths.add(d["path"])
        fp = os.path.join(out, "inbox", d["path"])
        os.makedirs(os.path.dirname(fp), exist_ok=True)
        seed = crc(d["path"])
        bw = word_count("\n".join(d["body_lines"]))
        if d["ext"] == "html":
            if d["role"] == "print-variant":
                text, tw, bw = templates.render_print(d)
            else:
                site_docs = [x for x in by_site[d["site"]] if x["role"] != "print-variant"]
                text, tw, bw = templates.render_page(d, site_docs, site_docs.index(d))
            with open(fp, "w", encoding="utf-8", newline="\n") as f:
                f.write(text)
        elif d["ext"] == "txt":
            text, tw = formats.to_txt(d, seed)
            with open(fp, "w", encoding="utf-8", newline="\n") as f:
                f.write(text)
        elif d["ext"] == "md":
            text, tw = formats.to_md(d, seed)
            with open(fp, "w", encoding="utf-8", newline="\n") as f:
                f.write(text)
        else:
            d["pdf_pages"], tw = formats.to_pdf(d, seed, fp)
        d["template_ratio"] = round(tw / bw, 3)
        d["body_words"] = bw
        bp = os.path.join(out, "bodies", d["path"] + ".txt")
        os.makedirs(os.path.dirname(bp), exist_ok=True)
        with open(bp, "w", encoding="utf-8", newline="\n") as f:
            f.write("\n".join(d["body_lines"]) + "\n")

    docs.sort(key=lambda d: d["path"])
    with open(os.path.join(out, "manifest.jsonl"), "w", encoding="utf-8", newline="\n") as f:
        for d in docs:
            f.write(json.dumps({"path": d["path"], "source_url": d["url"]}) + "\n")
    with open(os.path.join(out, "clusters.jsonl"), "w", encoding="utf-8", newline="\n") as f:
        for d in docs:
            f.write(json.dumps({"path": d["path"], "cluster": d["cluster"], "family": d["orig_site"] + "/" + d["family"],
                                "role": d["role"], "site": d["site"], "body_words": d["body_words"],
                                "template_ratio": d["template_ratio"]}) + "\n")

    # ---- pairs
    sh = {d["path"]: shingles("\n".join(d["body_lines"])) for d in docs}
    txt = {d["path"]: "\n".join(d["body_lines"]) for d in docs}
    pairs, labelled = [], set()

    def kind_of(a, b):
        roles = {a["role"], b["role"]}
        if "republication" in roles:
            return "republication"
        if "syndication" in roles:
            return "syndication"
        return "cross-format"

    for cl in sorted(groups):
        mem = sorted(groups[cl], key=lambda d: d["path"])
        for a, b in itertools.combinations(mem, 2):
            j = jaccard_sets(sh[a["path"]], sh[b["path"]])
            same = txt[a["path"]] == txt[b["path"]]
            rel = "exact-body" if same else "near-duplicate"
            assert same or j >= NEAR_MIN, (a["path"], b["path"], j)
            kind = kind_of(a, b)
            note = "{}: {} ({}, {}) vs {} ({}, {}); edits a: {}; edits b: {}".format(
                kind, a["path"], a["role"], a["site"], b["path"], b["role"], b["site"],
                "; ".join(a["ops"]) or "none (original)", "; ".join(b["ops"]) or "none (original)")
            pairs.append({"a": a["path"], "b": b["path"], "relation": rel, "body_jaccard": j, "note": note})
            labelled.add((a["path"], b["path"]))

    # twins: same family, same site, originals only
    fam = {}
    for d in docs:
        if d["role"] == "original":
            fam.setdefault((d["site"], d["family"]), []).append(d)
    for key in sorted(fam):
        mem = fam[key]
        cands = []
        for a, b in itertools.combinations(mem, 2):
            j = jaccard_sets(sh[a["path"]], sh[b["path"]])
            if 0.12 <= j <= 0.43:
                cands.append((abs(j - 0.25), a["path"], b["path"], j))
        cands.sort()
        used = {}
        n = 0
        for _, pa, pb, j in cands:
            if n >= 8 or used.get(pa, 0) >= 3 or used.get(pb, 0) >= 3:
                continue
            used[pa] = used.get(pa, 0) + 1
            used[pb] = used.get(pb, 0) + 1
            n += 1
            a, b = sorted((pa, pb))
            pairs.append({"a": a, "b": b, "relation": "distinct", "body_jaccard": j,
                          "note": "twin: same family {}/{} on the same template; different facts (names, dates, places), shared boilerplate sentences only".format(*key)})
            labelled.add((a, b))

    # random same-site pairs
    site_docs = {}
    for d in docs:
        site_docs.setdefault(d["site"], []).append(d)
    for site in sorted(site_docs):
        mem = sorted(site_docs[site], key=lambda d: d["path"])
        allp = [(a, b) for a, b in itertools.combinations(mem, 2)
                if a["cluster"] != b["cluster"] and (a["path"], b["path"]) not in labelled]
        rng = random.Random(crc("random-" + site))
        rng.shuffle(allp)
        for a, b in allp[:30]:
            j = jaccard_sets(sh[a["path"]], sh[b["path"]])
            pairs.append({"a": a["path"], "b": b["path"], "relation": "distinct", "body_jaccard": j,
                          "note": "random: two unrelated {} pages on {}; no shared source".format(a["role"], site)})
            labelled.add((a["path"], b["path"]))

    # all unlabelled pairs must be < 0.45
    paths_sorted = [d["path"] for d in docs]
    for a, b in itertools.combinations(paths_sorted, 2):
        if (a, b) in labelled:
            continue
        sa, sb = sh[a], sh[b]
        if len(sa) * 0.45 > len(sb) * 1.0 / 0.45 and False:
            continue
        if sa & sb:
            j = jaccard_sets(sa, sb)
            assert j < 0.45, (a, b, j)
    pairs.sort(key=lambda p: (p["a"], p["b"]))
    with open(os.path.join(out, "pairs.jsonl"), "w", encoding="utf-8", newline="\n") as f:
        for p in pairs:
            f.write(json.dumps(p) + "\n")
    return docs, pairs


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(HERE, "out"))
    args = ap.parse_args()
    docs, pairs = build(args.out)
    from collections import Counter
    print("documents:", len(docs), dict(Counter(d["ext"] for d in docs)))
    print("pairs:", len(pairs), dict(Counter(p["relation"] for p in pairs)))
    print("pair kinds:", dict(Counter(p["note"].split(":")[0] for p in pairs)))


if __name__ == "__main__":
    main()
