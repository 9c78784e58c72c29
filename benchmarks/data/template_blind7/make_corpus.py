#!/usr/bin/env python3
"""Deterministic generator for the blind near-duplicate benchmark corpus (set 7).
Usage: python make_corpus.py [--out DIR]   (default: out/ beside this file)"""
import argparse
import copy
import datetime
import json
import os
import random
import re
import shutil
import sys
import time

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)

from corpus_core import norm_words, shingles, jaccard, body_lines, html_text, RecSource, ReplaySource  # noqa: E402
from corpus_facts import G, Sent, P, FIRST, SUR, fmt_date  # noqa: E402
from sites import SITES, SITE_BY_KEY  # noqa: E402
from render_html import Page, light_page, first_sentence, E  # noqa: E402
from render_export import to_txt, to_md, to_pdf  # noqa: E402
from content_ext import EXT  # noqa: E402

SEED = 13007
BIG = [s["key"] for s in SITES if s["heavy"]]
HARD_SITE = "westmere-courts"


# ---------------------------------------------------------------- bodies
def gen_struct(site, fam_i, size, seed, rec=None, p=None, q=None):
    fam, fn, section = site["families"][fam_i]
    if rec:
        f, c = ReplaySource(seed, rec[0], q), ReplaySource(seed + 1, rec[1], p)
    else:
        f, c = RecSource(seed), RecSource(seed + 1)
    g = G(f, c)
    title, blocks = fn(g, "long" if size == "xl" else size)
    if size == "xl" and site["key"] in EXT:
        extra = EXT[site["key"]](g)
        blocks = blocks[:-1] + extra + blocks[-1:] if blocks[-1]["t"] == "p" and len(blocks[-1]["sents"]) == 1 else blocks + extra
    return {"title": title, "blocks": blocks, "fam": fam, "section": section}, (f.log, c.log)


def flatten(st):
    out = [{"t": "h1", "text": st["title"].text}]
    for b in st["blocks"]:
        if b["t"] == "p":
            out.append({"t": "p", "text": " ".join(s.text for s in b["sents"])})
        else:
            out.append(copy.deepcopy(b))
    return out


def words_n(flat):
    return len(norm_words("\n".join(body_lines(flat))))


def sh(flat):
    return shingles("\n".join(body_lines(flat)))


def make_body(site, fam_i, sizes, lo, hi, seed):
    for k in range(200):
        size = sizes[k % len(sizes)]
        st, rec = gen_struct(site, fam_i, size, seed * 1000 + k)
        w = words_n(flatten(st))
        if lo <= w <= hi:
            return st, rec
    raise RuntimeError(f"no body in range for {site['key']} fam {fam_i} {sizes} {lo}-{hi}")


# ---------------------------------------------------------------- edits
def rep_edit(st, site, rng, nops):
    st = {"title": st["title"].copy(), "blocks": copy.deepcopy(st["blocks"]), "fam": st["fam"], "section": st["section"]}
    ops = []
    kinds = ["reword", "drop-sentence", "add-sentence", "swap-list-items", "retitle", "append-paragraph"]
    rng.shuffle(kinds)
    for kind in kinds:
        if len(ops) >= nops:
            break
        paras = [i for i, b in enumerate(st["blocks"]) if b["t"] == "p"]
        if kind == "reword":
            c = [(bi, si) for bi in paras for si, s in enumerate(st["blocks"][bi]["sents"]) if len(s.alts) > 1]
            if c:
                bi, si = c[rng.randrange(len(c))]
                s = st["blocks"][bi]["sents"][si]
                s.idx = (s.idx + 1) % len(s.alts)
                ops.append(f"reword(para{paras.index(bi) + 1}.sent{si + 1})")
        elif kind == "drop-sentence":
            c = [(bi, si) for bi in paras for si in range(1, len(st["blocks"][bi]["sents"])) if len(st["blocks"][bi]["sents"]) >= 2]
            if c:
                bi, si = c[rng.randrange(len(c))]
                del st["blocks"][bi]["sents"][si]
                ops.append(f"drop-sentence(para{paras.index(bi) + 1}.sent{si + 1})")
        elif kind == "add-sentence":
            bi = paras[rng.randrange(len(paras))]
            st["blocks"][bi]["sents"].append(Sent([site["extra"][rng.randrange(len(site["extra"]))]], 0))
            ops.append(f"add-sentence(para{paras.index(bi) + 1})")
        elif kind == "swap-list-items":
            c = [bi for bi, b in enumerate(st["blocks"]) if b["t"] == "ul" and len(b["items"]) >= 2]
            if c:
                bi = c[rng.randrange(len(c))]
                items = st["blocks"][bi]["items"]
                i = rng.randrange(len(items) - 1)
                items[i], items[i + 1] = items[i + 1], items[i]
                ops.append(f"swap-list-items(item{i + 1}<->item{i + 2})")
        elif kind == "retitle":
            if len(st["title"].alts) > 1:
                st["title"].idx = (st["title"].idx + 1) % len(st["title"].alts)
                ops.append("retitle")
        elif kind == "append-paragraph":
            st["blocks"].append(P(Sent([site["append"][rng.randrange(len(site["append"]))]], 0)))
            ops.append("append-paragraph")
    return st, ops


SUBS = [(r"\band\b", "&"), (r"\bper cent\b", "%"), (r"\btowards\b", "toward"), (r"\buntil\b", "till"),
        (r"\bprogramme\b", "program"), (r"\bwhile\b", "whilst"), (r"\bamong\b", "amongst"), (r"\bpounds\b", "GBP"),
        (r"\bcannot\b", "can not"), (r"\bfree\b", "free of charge"), (r"\bplease\b", "kindly"), (r"\bPlease\b", "Kindly"),
        (r"\babout\b", "around"), (r"\bsmall\b", "little")]


def word_edit(flat, rng, n):
    flat = copy.deepcopy(flat)
    ops = []
    for _ in range(n):
        cands = []
        for bi, b in enumerate(flat):
            if b["t"] == "p":
                for pat, rep in SUBS:
                    for m in re.finditer(pat, b["text"]):
                        cands.append((bi, None, m.start(), m.end(), rep, m.group(0)))
            elif b["t"] == "ul":
                for ii, it in enumerate(b["items"]):
                    for pat, rep in SUBS:
                        for m in re.finditer(pat, it):
                            cands.append((bi, ii, m.start(), m.end(), rep, m.group(0)))
        if not cands:
            break
        bi, ii, a, z, rep, old = cands[rng.randrange(len(cands))]
        if ii is None:
            flat[bi]["text"] = flat[bi]["text"][:a] + rep + flat[bi]["text"][z:]
        else:
            it = flat[bi]["items"][ii]
            flat[bi]["items"][ii] = it[:a] + rep + it[z:]
        ops.append(f"word('{old}'->'{rep}')")
    return flat, ops


# ---------------------------------------------------------------- helpers
def slugify(t):
    s = re.sub(r"[^a-z0-9]+", "-", t.lower()).strip("-")
    return s if len(s) <= 64 else s[:65].rsplit("-", 1)[0]


class Registry:
    def __init__(self):
        self.docs = []
        self.slugs = {}
        self.page_no = {}

    def new(self, site_key, title, ext, **kw):
        base = slugify(title)
        used = self.slugs.setdefault(site_key, set())
        slug, n = base, 2
        while (slug, ext) in used:
            slug = f"{base}-{n}"
            n += 1
        used.add((slug, ext))
        pn = self.page_no.get(site_key, 0)
        self.page_no[site_key] = pn + 1
        d = {"site": site_key, "slug": slug, "ext": ext, "path": f"{site_key}/{slug}.{ext}", "page_no": pn, "title": title}
        d.update(kw)
        self.docs.append(d)
        return d


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(HERE, "out"))
    args = ap.parse_args()
    t0 = time.time()
    out = os.path.abspath(args.out)
    if os.path.exists(out):
        shutil.rmtree(out)
    os.makedirs(os.path.join(out, "inbox"))
    rng = random.Random(SEED)
    reg = Registry()
    groups = []      # list of lists of docs (copy groups)
    twin_sets = []   # list of lists of docs
    hard = []
    singles_seed = [0]

    def date_for(r):
        d = datetime.date(2025, 3, 1) + datetime.timedelta(days=r.randrange(600))
        return fmt_date(d, False), d.isoformat()

    def base_doc(site_key, st, flat, role, ext="html", section=None, **kw):
        site = SITE_BY_KEY[site_key]
        r = random.Random(f"{SEED}-{site_key}-{len(reg.docs)}")
        pub, iso = date_for(r)
        title = flat[0]["text"]
        sec = section or (st["section"] if st["section"] in site["sections"] else list(site["sections"])[0])
        d = reg.new(site_key, title, ext, flat=flat, role=role, section=sec, pub_date=pub, iso_date=iso,
                    ratio_target=round(r.uniform(2.8, 4.5), 2), author=f"{FIRST[r.randrange(len(FIRST))]} {SUR[r.randrange(len(SUR))]}",
                    body_words=words_n(flat), ops=[], **kw)
        d["layout"] = kw.get("layout") or ["sidebar-first", "toc-first", "main-first"][(d["page_no"] + BIG.index(site_key) if site_key in BIG else 0) % 3]
        d["generation"] = "old" if (site_key == "westmere-archives" and d["page_no"] % 3 == 0) else "new"
        host = site["host"]
        url = f"https://{host}/{sec}/{d['slug']}"
        d["source_url"] = {"html": url, "pdf": f"https://{host}/downloads/{d['slug']}.pdf",
                           "txt": f"https://{host}/export/{d['slug']}.txt", "md": f"https://{host}/source/{d['slug']}.md"}[ext]
        if d["layout"] == "print":
            d["source_url"] = url.replace(d["slug"], d["slug"][:-6]) + "?print=1"
        d["orig_url"] = url
        return d

    # ---------------- copy groups
    partners = {"westmere-archives": ["westmere-courts", "tarnside-walkers", "harwick-sinfonia"],
                "harwick-sinfonia": ["vale-growers", "westmere-archives"],
                "marlbrook-homes": ["vale-growers", "westmere-courts"],
                "vale-growers": ["marlbrook-homes", "harwick-sinfonia"],
                "quillpine-advisories": [],
                "fenmoor-birdcount": ["tarnside-walkers", "vale-growers"],
                "tarnside-walkers": ["fenmoor-birdcount", "westmere-archives"],
                "westmere-courts": ["westmere-archives", "marlbrook-homes"]}
    for si, sk in enumerate(BIG):
        site = SITE_BY_KEY[sk]
        for gi in range(8):
            fam_i = gi % len(site["families"])
            for fk in range(len(site["families"])):
                try:
                    st, _ = make_body(site, (fam_i + fk) % len(site["families"]), ["xl", "long"], 150, 470, hash_seed(sk, "orig", gi))
                    break
                except RuntimeError:
                    continue
            gr = random.Random(f"group-{sk}-{gi}")
            flat0 = flatten(st)
            orig = base_doc(sk, st, flat0, "original")
            orig["family"] = f"{sk}/{st['fam']}"
            members = [orig]
            fmts = [e for e, p in (("pdf", 0.68), ("txt", 0.48), ("md", 0.42)) if gr.random() < p]
            for e in fmts:
                flat = flat0
                ops = []
                if gr.random() < 0.5:
                    n_ed = max(1, round(words_n(flat0) * 0.01))
                    for attempt in range(30):
                        flat, ops = word_edit(flat0, gr, max(1, n_ed - attempt // 10))
                        s1 = sh(flat)
                        if jaccard(s1, sh(flat0)) >= 0.86 and all(jaccard(s1, sh(m["flat"])) >= 0.82 for m in members):
                            break
                    else:
                        flat, ops = flat0, []
                d = base_doc(sk, st, flat, f"format-{e}", ext=e)
                d["ops"] = ops
                d["orig_url"] = orig["source_url"]
                members.append(d)
            nrep = gr.choices([0, 1, 2], [0.3, 0.5, 0.2])[0]
            for ri in range(nrep):
                tgt = sk if (gr.random() < 0.4 or not partners[sk]) else gr.choice(partners[sk])
                for attempt in range(40):
                    nops = max(1, 3 - attempt // 8)
                    st2, ops = rep_edit(st, SITE_BY_KEY[sk], gr, nops)
                    flat2 = flatten(st2)
                    s2 = sh(flat2)
                    if all(jaccard(s2, sh(m["flat"])) >= 0.80 for m in members) and jaccard(s2, sh(flat0)) >= 0.83 and flat2 != flat0:
                        break
                else:
                    raise RuntimeError("republication edits failed")
                d = base_doc(tgt, st2, flat2, "republication", section=None if tgt == sk else list(SITE_BY_KEY[tgt]["sections"])[0],
                             credit=None if tgt == sk else site["name"])
                d["ops"] = ops
                members.append(d)
            if gr.random() < 0.36 and partners[sk]:
                tgt = gr.choice(partners[sk])
                d = base_doc(tgt, st, flat0, "syndication", section=list(SITE_BY_KEY[tgt]["sections"])[0], credit=site["name"])
                members.append(d)
            if gr.random() < 0.15:
                d = reg.new(sk, orig["title"] + " print", "html", flat=flat0, role="print-variant", section=orig["section"],
                            pub_date=orig["pub_date"], iso_date=orig["iso_date"], ratio_target=0, author=orig["author"],
                            body_words=orig["body_words"], ops=[], layout="print", generation="new")
                d["source_url"] = orig["source_url"] + "?print=1"
                d["orig_url"] = orig["source_url"]
                members.append(d)
            for i in range(len(members)):
                for j in range(i + 1, len(members)):
                    jj = jaccard(sh(members[i]["flat"]), sh(members[j]["flat"]))
                    assert jj >= 0.80 or members[i]["flat"] == members[j]["flat"], (members[i]["path"], members[j]["path"], jj)
            for m in members:
                m["family"] = orig["family"]
                m["cluster"] = f"cg-{sk}-{gi + 1:02d}"
            groups.append(members)

    # ---------------- twins
    for sk in BIG:
        site = SITE_BY_KEY[sk]
        for ti in range(4):
            fam_i = (ti + 1) % len(site["families"])
            for outer in range(60):
                stA, recA = make_body(site, fam_i, ["medium", "short"], 60, 300, hash_seed(sk, "twin", ti * 100 + outer))
                members = [(stA, sh(flatten(stA)))]
                grid = [(0.8, 0.5), (0.6, 0.3), (0.7, 0.4), (0.5, 0.2), (0.9, 0.6), (0.85, 0.3), (0.4, 0.4), (0.6, 0.5), (1.0, 0.5), (0.7, 0.1)]
                for k in range(400):
                    if len(members) == 3:
                        break
                    p, q = grid[k % len(grid)]
                    stB, _ = gen_struct(site, fam_i, ["medium", "short"][(k // len(grid)) % 2],
                                        hash_seed(sk, "tw", ti * 10000 + outer * 500 + k), rec=recA, p=p, q=q)
                    fB = flatten(stB)
                    if not (60 <= words_n(fB) <= 300):
                        continue
                    sB = sh(fB)
                    if all(0.12 <= jaccard(sB, s) <= 0.40 for _, s in members) and fB[0]["text"] not in [flatten(x)[0]["text"] for x, _ in members]:
                        members.append((stB, sB))
                if len(members) == 3:
                    break
            else:
                raise RuntimeError(f"twins failed {sk} {ti}")
            ds = []
            for j, (st, _) in enumerate(members):
                d = base_doc(sk, st, flatten(st), "twin")
                d["family"] = f"{sk}/{st['fam']}"
                d["cluster"] = f"tw-{sk}-{ti + 1}{'abc'[j]}"
                d["twin_set"] = f"{sk}-{ti + 1}"
                ds.append(d)
            twin_sets.append(ds)

    # ---------------- hard case: short notices sharing one identical aside
    site = SITE_BY_KEY[HARD_SITE]
    for hi in range(12):
        st, _ = make_body(site, 0, ["medium"], 72, 115, hash_seed(HARD_SITE, "hard", hi))
        d = base_doc(HARD_SITE, st, flatten(st), "standalone")
        d["family"] = f"{HARD_SITE}/{st['fam']}"
        d["cluster"] = f"hc-{hi + 1:02d}"
        d["hard_case"] = True
        hard.append(d)

    # ---------------- standalone fill
    counts = {}
    for d in reg.docs:
        counts[d["site"]] = counts.get(d["site"], 0) + 1
    targets = {k: 48 for k in BIG}
    targets["corrie-ridge-ski"] = 5
    targets["hollin-hill-observatory"] = 4
    for s in SITES:
        sk = s["key"]
        n = 0
        while counts.get(sk, 0) < targets[sk]:
            fam_i = n % len(s["families"])
            sizes = ["short", "medium"] if n % 3 else ["medium", "short"]
            st, _ = make_body(s, fam_i, sizes, 60, 260, hash_seed(sk, "single", n))
            d = base_doc(sk, st, flatten(st), "standalone")
            d["family"] = f"{sk}/{st['fam']}"
            d["cluster"] = f"sa-{sk}-{n + 1:02d}"
            counts[sk] = counts.get(sk, 0) + 1
            n += 1

    docs = reg.docs
    for d in docs:
        d["first_para"] = next(b["text"] for b in d["flat"] if b["t"] == "p")
        d["title"] = d["flat"][0]["text"]

    # ---------------- render
    ctx = {}
    for s in SITES:
        sk = s["key"]
        mine = [d for d in docs if d["site"] == sk and d["ext"] == "html" and d["layout"] != "print"]
        r = random.Random(f"ctx-{sk}")
        ctx[sk] = {"others": [{"title": d["title"], "first_para": d["first_para"], "path": d["path"]} for d in mine if not d.get("hard_case")],
                   "titles": [d["title"] for d in mine],
                   "commenters": [f"{FIRST[r.randrange(len(FIRST))]} {SUR[r.randrange(len(SUR))][0]}." for _ in range(14)],
                   "teaser_heads": {"westmere-archives": ["From the strongrooms", "Also in the archives"],
                                    "harwick-sinfonia": ["You may also like", "More programme notes"],
                                    "marlbrook-homes": ["Other notices", "Recently issued"],
                                    "vale-growers": ["You may also like", "From the stalls"],
                                    "quillpine-advisories": ["Recent advisories", "Related advisories"],
                                    "fenmoor-birdcount": ["More from the count", "You may also like"],
                                    "tarnside-walkers": ["Recent reports", "You may also like"],
                                    "westmere-courts": ["Other notices", "Latest notices"]}.get(sk, ["More"])}
    fixed = "<section class=\"current-notices\"><h3>Current notices across the county</h3>" + "\n".join(
        f"<div class=\"teaser\"><a href=\"#\">{E(d['title'])}</a><p>{E(first_sentence(d['first_para']))}</p></div>" for d in hard[:6]) + \
        "<p>All notices are also posted at the public counter of each court.</p></section>"
    for d in hard:
        d["fixed_aside"] = fixed
    inbox = os.path.join(out, "inbox")
    for s in SITES:
        os.makedirs(os.path.join(inbox, s["key"]), exist_ok=True)
    for d in docs:
        site = SITE_BY_KEY[d["site"]]
        fp = os.path.join(inbox, d["path"])
        r = random.Random(f"render-{d['path']}")
        if d["ext"] == "html":
            html = Page(site, d, ctx[d["site"]], r).build() if site["heavy"] else light_page(site, d)
            with open(fp, "w", encoding="utf-8", newline="\n") as fh:
                fh.write(html)
            total = len(norm_words(html_text(html)))
        elif d["ext"] == "txt":
            text = to_txt(site, d, r)
            with open(fp, "w", encoding="utf-8", newline="\n") as fh:
                fh.write(text)
            total = len(norm_words(text))
        elif d["ext"] == "md":
            text = to_md(site, d, r)
            with open(fp, "w", encoding="utf-8", newline="\n") as fh:
                fh.write(text)
            total = len(norm_words(text))
        else:
            run, pages = to_pdf(site, d, fp)
            d["pdf_pages"] = pages
            total = d["body_words"] + run
        d["template_ratio"] = round(max(0, total - d["body_words"]) / d["body_words"], 2)

    # ---------------- bodies, manifest
    for d in docs:
        bp = os.path.join(out, "bodies", d["path"] + ".txt")
        os.makedirs(os.path.dirname(bp), exist_ok=True)
        with open(bp, "w", encoding="utf-8", newline="\n") as fh:
            fh.write("\n".join(body_lines(d["flat"])) + "\n")
    with open(os.path.join(out, "manifest.jsonl"), "w", encoding="utf-8", newline="\n") as fh:
        for d in docs:
            fh.write(json.dumps({"path": d["path"], "source_url": d["source_url"]}) + "\n")

    # ---------------- pairs
    S = {d["path"]: sh(d["flat"]) for d in docs}
    text_of = {d["path"]: "\n".join(body_lines(d["flat"])) for d in docs}
    pairs, labelled = [], set()

    def add(a, b, rel, note):
        key = tuple(sorted((a["path"], b["path"])))
        assert key not in labelled, key
        labelled.add(key)
        pairs.append({"a": a["path"], "b": b["path"], "relation": rel, "body_jaccard": jaccard(S[a["path"]], S[b["path"]]), "note": note})

    def edesc(d):
        return ",".join(d["ops"]) if d["ops"] else "none"

    for members in groups:
        for i in range(len(members)):
            for j in range(i + 1, len(members)):
                a, b = members[i], members[j]
                ra, rb = a["role"], b["role"]
                roles = {ra, rb}
                if "republication" in roles:
                    kind = "republication"
                elif "syndication" in roles and a["ext"] == b["ext"] == "html":
                    kind = "syndication"
                else:
                    kind = "cross-format"
                same = text_of[a["path"]] == text_of[b["path"]]
                rel = "exact-body" if same else "near-duplicate"
                where = "same site" if a["site"] == b["site"] else f"{a['site']} -> {b['site']}"
                note = f"{kind}: {ra} ({a['ext']}) vs {rb} ({b['ext']}), {where}; edits a={edesc(a)}; edits b={edesc(b)}"
                add(a, b, rel, note)
    for ts in twin_sets:
        for i in range(len(ts)):
            for j in range(i + 1, len(ts)):
                add(ts[i], ts[j], "distinct", f"twin: same family {ts[i]['family']} and template, different facts and partly different sentences; edits=n/a")
    for i in range(len(hard)):
        for j in range(i + 1, len(hard)):
            add(hard[i], hard[j], "distinct", "random: hard case - distinct short notices sharing a byte-identical teaser aside; edits=n/a")
    for s in SITES:
        sk = s["key"]
        mine = [d for d in docs if d["site"] == sk]
        r = random.Random(f"random-{sk}")
        cands = [(a, b) for i, a in enumerate(mine) for b in mine[i + 1:]
                 if a["cluster"] != b["cluster"] and tuple(sorted((a["path"], b["path"]))) not in labelled
                 and not (a.get("twin_set") and a.get("twin_set") == b.get("twin_set"))]
        r.shuffle(cands)
        for a, b in cands[:32]:
            add(a, b, "distinct", f"random: unrelated pages on {sk} ({a['family'].split('/')[1]} vs {b['family'].split('/')[1]}); edits=n/a")
    # global checks
    paths = [d["path"] for d in docs]
    bad = []
    for i in range(len(paths)):
        for j in range(i + 1, len(paths)):
            key = tuple(sorted((paths[i], paths[j])))
            if key not in labelled:
                jj = jaccard(S[paths[i]], S[paths[j]])
                if jj >= 0.45:
                    bad.append((key, jj))
    if bad:
        for b in bad[:20]:
            print("UNLABELLED HIGH", b)
        raise SystemExit("unlabelled pairs with Jaccard >= 0.45")
    with open(os.path.join(out, "pairs.jsonl"), "w", encoding="utf-8", newline="\n") as fh:
        for p in pairs:
            fh.write(json.dumps(p) + "\n")
    with open(os.path.join(out, "clusters.jsonl"), "w", encoding="utf-8", newline="\n") as fh:
        for d in docs:
            fh.write(json.dumps({"path": d["path"], "cluster": d["cluster"], "family": d["family"], "role": d["role"],
                                 "site": d["site"], "body_words": d["body_words"], "template_ratio": d["template_ratio"]}) + "\n")
    # summary to stdout
    from collections import Counter
    ext = Counter(d["ext"] for d in docs)
    kinds = Counter(p["note"].split(":")[0] + "/" + p["relation"] for p in pairs)
    print(f"documents: {len(docs)}  by ext: {dict(ext)}")
    print("pairs:", dict(sorted(kinds.items())))
    print("per site:", dict(Counter(d["site"] for d in docs)))
    print(f"build time {time.time() - t0:.1f}s")


def hash_seed(*parts):
    h = 0
    for ch in "|".join(str(p) for p in parts):
        h = (h * 131 + ord(ch)) % 1000003
    return h


if __name__ == "__main__":
    main()
