#!/usr/bin/env python3
"""Deterministic generator for blind near-duplicate benchmark corpus, set 8.

Usage: python make_corpus.py [--out DIR]   (default: out/ beside this file; needs fpdf2)
"""
import argparse
import copy
import itertools
import json
import os
import random
import shutil
import sys

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from content import SITES  # noqa: E402
from bodies import make_facts, gen_body, body_text, body_lines, shingles, jacc, OPS, word_edit  # noqa: E402
from render import render_html, render_txt, render_md, render_pdf, slugify, first_sentence, first_para, html_text, nwords  # noqa: E402

SEED = 8013
SITE = {s["key"]: s for s in SITES}
HEAVY_BAND = (2.5, 5.0)
LIGHT_BAND = (0.3, 2.0)

SYND_TARGET = {"canal": ["parish"], "energy": ["parish", "seeds"], "folk": ["vineyard", "parish"], "lifeboat": ["rescue"],
               "rescue": ["lifeboat", "parish"], "vineyard": ["folk"], "bootcamp": ["energy"], "seeds": ["parish"], "parish": ["seeds"], "photo": ["folk"]}


class Doc:
    def __init__(self, **kw):
        self.__dict__.update(kw)

    def __getitem__(self, k):
        return self.__dict__[k]


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(os.path.dirname(os.path.abspath(__file__)), "out"))
    args = ap.parse_args()
    out = args.out
    if os.path.exists(out):
        shutil.rmtree(out)
    os.makedirs(os.path.join(out, "inbox"))
    os.makedirs(os.path.join(out, "bodies"))

    R = random.Random(SEED)
    docs = []
    groups = {}
    all_sh = []  # (doc, shingles) for rejection checks

    def body_ok(site, blocks, fam):
        bw = nwords(body_text(blocks))
        if site["heavy"]:
            lo = 82 if site["key"] == "lifeboat" else 64
            return lo <= bw <= 255
        if fam["name"] == "minutes":
            return 220 <= bw <= 465
        return 60 <= bw <= 250

    # ------------------------------------------------------------ base originals
    base = {k: [] for k in SITE}
    gid = 0
    for site in SITES:
        n_twin = int(round(site["n_orig"] * 0.36)) if site["key"] != "photo" else 0
        n_base = site["n_orig"] - n_twin
        site["_n_twin"] = n_twin
        fams = site["families"]
        for i in range(n_base):
            fam = fams[i % len(fams)]
            for attempt in range(3000):
                seed = R.randrange(10 ** 9)
                rr = random.Random(seed)
                facts = make_facts(site, rr)
                bl = gen_body(site, fam, facts, rr)
                if not body_ok(site, bl, fam):
                    continue
                sh = shingles(body_text(bl))
                mx = max([jacc(sh, o) for _, o in all_sh] or [0])
                if mx < (0.25 if attempt < 300 else 0.35):
                    break
            else:
                raise SystemExit("could not generate a body for %s" % site["key"])
            gid += 1
            g = "%s-g%03d" % (site["key"], gid)
            d = Doc(site=site["key"], group=g, family=fam["name"], role="original", fmt="html", blocks=bl, ops=[], section=fam["section"],
                    facts=facts, fam=fam, seed=seed, home=site["key"])
            groups[g] = [d]
            docs.append(d)
            all_sh.append((d, sh))
            base[site["key"]].append(d)

    # ------------------------------------------------------------ derived copies
    def group_ok(g, bl):
        sh = shingles(body_text(bl))
        txt = body_text(bl)
        for m in groups[g]:
            if body_text(m.blocks) == txt:
                return False
            if jacc(sh, shingles(body_text(m.blocks))) < 0.80:
                return False
        return True

    def add_doc(src, **kw):
        d = Doc(**{**src.__dict__, **kw})
        groups[d.group].append(d)
        docs.append(d)
        return d

    def republish(src, rng, nops, chain=False):
        site = SITE[src.home]
        bl = copy.deepcopy(src.blocks)
        ops = []
        ctx = {"fam": src.fam, "facts": src.facts}
        order = list(OPS)
        rng.shuffle(order)
        tries = 0
        while len(ops) < nops and tries < 12:
            op = order[tries % len(order)]
            tries += 1
            cand = copy.deepcopy(bl)
            name = op(cand, rng, ctx)
            if not name:
                continue
            if site["heavy"] and not (62 <= nwords(body_text(cand)) <= 255):
                continue
            if site["key"] == "lifeboat" and nwords(body_text(cand)) < 82:
                continue
            if nwords(body_text(cand)) < 60:
                continue
            if not group_ok(src.group, cand):
                continue
            bl = cand
            ops.append(name)
        return bl, ops

    fmt_pool = ["pdf", "pdf", "pdf", "txt", "txt", "txt", "md", "md"]
    for site in SITES:
        for d in list(base[site["key"]]):
            rng = random.Random(d.seed + 7)
            # republications and chains
            if rng.random() < 0.42 or (site["key"] == "photo" and rng.random() < 0.5):
                host = d.site if (rng.random() < 0.65 or site["key"] == "photo") else rng.choice(SYND_TARGET[d.site])
                longb = nwords(body_text(d.blocks)) >= 100
                bl, ops = republish(d, rng, 1 if longb else rng.choice([1, 2, 2, 3]))
                if ops:
                    b = add_doc(d, blocks=bl, ops=ops, role="republication", site=host,
                                section=d.section if host == d.site else list(SITE[host]["sections"])[0])
                    if rng.random() < (0.75 if longb else 0.2):
                        bl2, ops2 = republish(b, rng, 4, chain=True)
                        if ops2:
                            add_doc(b, blocks=bl2, ops=b.ops + ops2, role="republication-chain")
            # format copies of the original
            k = rng.choice([0, 0, 0, 1, 1, 1, 1, 2]) if site["key"] != "photo" else 2
            fmts = []
            if d.family == "minutes":
                fmts.append("pdf")
                k = max(k, 1)
            while len(fmts) < k:
                f = rng.choice(fmt_pool)
                if f not in fmts:
                    fmts.append(f)
            if site["key"] == "photo":
                fmts = ["pdf", "txt"] if d.seed % 2 else ["pdf", "md"]
            for f in fmts:
                bl = copy.deepcopy(d.blocks)
                ops = []
                if rng.random() < 0.5:
                    e = word_edit(bl, rng)
                    if e and group_ok(d.group, bl):
                        ops = [e]
                    else:
                        bl = copy.deepcopy(d.blocks)
                add_doc(d, blocks=bl, ops=ops, role="format-" + f, fmt=f)

    # syndication (exact body on another site's template)
    cands = [d for k in ("canal", "energy", "folk", "lifeboat", "rescue", "vineyard", "bootcamp", "seeds") for d in base[k]]
    R2 = random.Random(SEED + 1)
    for d in R2.sample(cands, 17):
        host = R2.choice(SYND_TARGET[d.site])
        add_doc(d, role="syndication", site=host, ops=[], section=list(SITE[host]["sections"])[min(1, len(SITE[host]["sections"]) - 1)])
    # re-posts: same notice under 2-3 extra URLs/sections on the same site, each with another template variant
    rep_src = [base["lifeboat"][1], base["canal"][0], base["parish"][1], base["energy"][1], base["rescue"][2]]
    for d in rep_src:
        secs = [s for s in SITE[d.site]["sections"] if s != d.section]
        for s in secs[:R2.choice([2, 3])]:
            add_doc(d, role="repost", ops=[], section=s)
    # print-friendly variants
    for d in [base["vineyard"][0], base["rescue"][0], base["canal"][3], base["folk"][2], base["bootcamp"][0], base["rescue"][4]]:
        add_doc(d, role="print", ops=[])

    # ------------------------------------------------------------ twins (hard negatives)
    twin_of = {}
    for site in SITES:
        bases = base[site["key"]]
        for i in range(site["_n_twin"]):
            src = bases[i % len(bases)]
            fam = src.fam
            ok = None
            for attempt in range(300):
                tr = random.Random(src.seed * 31 + attempt * 7 + i)
                nf = make_facts(site, tr)
                facts = dict(src.facts)
                keys = sorted(facts)
                frac = 0.35 + 0.4 * tr.random()
                for key in keys:
                    if tr.random() < frac:
                        facts[key] = nf[key]
                bl = gen_body(site, fam, facts, random.Random(src.seed), flip_p=0.5)
                fl = 0.2 + 0.5 * tr.random()
                for b in bl:
                    if b["t"] == "p":
                        for s in b["s"]:
                            if tr.random() < fl:
                                s[0], s[1] = s[1], s[0]
                if not body_ok(site, bl, fam):
                    continue
                sh = shingles(body_text(bl))
                js = [jacc(sh, shingles(body_text(m.blocks))) for m in groups[src.group]]
                if not all(0.12 <= j <= 0.42 for j in js):
                    continue
                others = [jacc(sh, o) for dd, o in all_sh if dd.group != src.group]
                if max(others or [0]) >= 0.35:
                    continue
                ok = (bl, facts)
                break
            if not ok:
                continue
            gid += 1
            g = "%s-g%03d" % (site["key"], gid)
            d = Doc(site=site["key"], group=g, family=fam["name"], role="twin", fmt="html", blocks=ok[0], ops=[], section=fam["section"],
                    facts=ok[1], fam=fam, seed=src.seed + 1000 + i, home=site["key"])
            groups[g] = [d]
            docs.append(d)
            all_sh.append((d, shingles(body_text(d.blocks))))
            twin_of[id(d)] = src.group

    # ------------------------------------------------------------ paths, urls
    used = set()
    for d in docs:
        title = d.blocks[0]["s"][0]
        sl = slugify(title)
        if d.role == "repost":
            sl = slugify(d.section) + "-" + sl
        if d.role == "print":
            sl = sl + "-print"
        base_sl = sl
        n = 2
        while (d.site, sl, d.fmt) in used or (d.fmt == "html" and (d.site, sl, "html") in used):
            sl = "%s-%d" % (base_sl, n)
            n += 1
        used.add((d.site, sl, d.fmt))
        d.slug = sl
        d.path = "%s/%s.%s" % (d.site, sl, d.fmt)
        host = SITE[d.site]["host"]
        if d.fmt == "html":
            d.url = "https://%s/%s/%s%s" % (host, slugify(d.section), sl, "?print=1" if d.role == "print" else "")
        else:
            d.url = "https://%s/exports/%s.%s" % (host, sl, d.fmt)
    for g, ms in groups.items():
        orig = ms[0]
        for m in ms:
            m.orig_url = "https://%s/%s/%s" % (SITE[orig.site]["host"], slugify(orig.section), orig.slug)
            m.export_date = "2026-11-%02d" % (1 + (orig.seed % 28))

    # ------------------------------------------------------------ render
    html_by_site = {}
    for d in docs:
        if d.fmt == "html" and d.role != "print":
            html_by_site.setdefault(d.site, []).append(d)
    heads = ["You may also like", "Related pages", "More from this section", "Latest", "Other readers also viewed", "Recently updated"]
    manifest, clusters = [], []
    for idx, d in enumerate(docs):
        site = SITE[d.site]
        fp = os.path.join(out, "inbox", d.path)
        os.makedirs(os.path.dirname(fp), exist_ok=True)
        rng = random.Random(SEED * 7 + idx)
        bw = nwords(body_text(d.blocks))
        if d.fmt == "html":
            pool = [x for x in html_by_site.get(d.site, []) if x.group != d.group]
            pool = rng.sample(pool, min(len(pool), 16))
            items = []
            for x in pool:
                q = first_para(x.blocks) if rng.random() < 0.25 else first_sentence(x.blocks)
                items.append((x.url, x.blocks[0]["s"][0], q))
            if rng.random() < 0.35 and len(items) > 2:
                items.insert(rng.randrange(1, 3), (d.url, d.blocks[0]["s"][0], first_sentence(d.blocks)))
            d.teaser_heading = rng.choice(heads)
            if site.get("fixed_aside"):
                items = items[:3]  # the fixed station-news aside is the large shared block; teasers only if still needed
            band = HEAVY_BAND if site["heavy"] else LIGHT_BAND
            if site["heavy"]:
                sub = rng.choice([(2.6, 3.3), (3.1, 3.9), (3.7, 4.8)])
            else:
                sub = (0.4, 1.9)
            h, r = render_html(site, d, items, rng, footer_gen=(idx % 3 != 0), target=sub, print_variant=(d.role == "print"))
            if not (band[0] <= r <= band[1]) and d.role != "print":
                h, r = render_html(site, d, items, random.Random(idx), footer_gen=True, target=(band[0] + 0.05, band[1] - 0.05))
            with open(fp, "w", encoding="utf-8") as f:
                f.write(h)
            tw = nwords(html_text(h)) - bw
        elif d.fmt == "txt":
            t = render_txt(site, d, rng)
            with open(fp, "w", encoding="utf-8") as f:
                f.write(t)
            tw = max(0, nwords(t) - bw)
        elif d.fmt == "md":
            t = render_md(site, d, rng)
            with open(fp, "w", encoding="utf-8") as f:
                f.write(t)
            tw = max(0, nwords(t) - bw)
        else:
            pages = render_pdf(site, d, fp)
            d.pages = pages
            tw = pages * (nwords(site["name"]) + nwords(d.blocks[0]["s"][0][:60]) + 5)
        d.tratio = round(tw / bw, 3)
        bp = os.path.join(out, "bodies", d.path + ".txt")
        os.makedirs(os.path.dirname(bp), exist_ok=True)
        with open(bp, "w", encoding="utf-8") as f:
            f.write(body_text(d.blocks) + "\n")
        manifest.append({"path": d.path, "source_url": d.url})
        clusters.append({"path": d.path, "cluster": d.group, "family": d.family, "role": d.role, "site": d.site,
                         "body_words": bw, "template_ratio": d.tratio})

    # ------------------------------------------------------------ pairs
    SH = {id(d): shingles(body_text(d.blocks)) for d in docs}
    pairs = []
    labelled = set()

    def desc(d):
        return "%s[%s/%s]%s" % (d.role, d.site, d.fmt, (": " + ", ".join(d.ops)) if d.ops else ": no edits")

    for g, ms in groups.items():
        for a, b in itertools.combinations(ms, 2):
            j = round(jacc(SH[id(a)], SH[id(b)]), 4)
            same = body_text(a.blocks) == body_text(b.blocks)
            rel = "exact-body" if same else "near-duplicate"
            roles = {a.role, b.role}
            if roles & {"republication", "republication-chain"}:
                kind = "republication"
            elif a.fmt != b.fmt:
                kind = "cross-format"
            elif a.site != b.site:
                kind = "syndication"
            else:
                kind = "republication"
            extra = " (re-post under another section URL)" if "repost" in roles else (" (print-friendly variant)" if "print" in roles else "")
            pairs.append({"a": a.path, "b": b.path, "relation": rel, "body_jaccard": j,
                          "note": "%s a=%s; b=%s%s" % (kind + ":", desc(a), desc(b), extra)})
            labelled.add(frozenset((a.path, b.path)))
    for d in docs:
        if d.role == "twin":
            for m in [m for m in groups[twin_of[id(d)]] if m.site == d.site]:
                j = round(jacc(SH[id(d)], SH[id(m)]), 4)
                pairs.append({"a": m.path, "b": d.path, "relation": "distinct", "body_jaccard": j,
                              "note": "twin: same family '%s' and template, different facts; sentence variants partly changed; no shared edits" % d.family})
                labelled.add(frozenset((m.path, d.path)))
    gr = {id(d): d.group for d in docs}
    RP = random.Random(SEED + 5)
    for site in SITES:
        sd = [d for d in docs if d.site == site["key"]]
        cand = [(a, b) for a, b in itertools.combinations(sd, 2) if gr[id(a)] != gr[id(b)] and frozenset((a.path, b.path)) not in labelled]
        for a, b in RP.sample(cand, min(34, len(cand))):
            j = round(jacc(SH[id(a)], SH[id(b)]), 4)
            pairs.append({"a": a.path, "b": b.path, "relation": "distinct", "body_jaccard": j,
                          "note": "random: unrelated pages from the same site (%s); no edit operations" % site["key"]})
            labelled.add(frozenset((a.path, b.path)))
    # safety: unlabelled pairs must be < 0.45
    worst = 0
    for a, b in itertools.combinations(docs, 2):
        if frozenset((a.path, b.path)) in labelled:
            continue
        worst = max(worst, jacc(SH[id(a)], SH[id(b)]))
    with open(os.path.join(out, "manifest.jsonl"), "w") as f:
        f.writelines(json.dumps(m) + "\n" for m in manifest)
    with open(os.path.join(out, "pairs.jsonl"), "w") as f:
        f.writelines(json.dumps(p) + "\n" for p in pairs)
    with open(os.path.join(out, "clusters.jsonl"), "w") as f:
        f.writelines(json.dumps(c) + "\n" for c in clusters)
    nonhtml = sum(1 for d in docs if d.fmt != "html")
    print("documents %d (non-HTML %d = %.1f%%), pairs %d, max unlabelled jaccard %.3f" % (len(docs), nonhtml, 100.0 * nonhtml / len(docs), len(pairs), worst))


if __name__ == "__main__":
    main()
