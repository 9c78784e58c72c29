#!/usr/bin/env python3
"""Deterministic generator for the blind near-duplicate benchmark corpus (set 4).

Usage: python make_corpus.py [--out DIR]      (default: out/ beside this file; needs fpdf2)
"""
import argparse
import itertools
import json
import os
import shutil
import sys
import time

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))

from corpus.common import rng_for, body_lines, body_text, shingles, jaccard, slugify, person, date_str, words
from corpus.engine import make_plan, to_blocks, clone, n_words, trim_to, OPS, op_append, word_edit_blocks, new_plan
from corpus.content_a import FAMILIES_A
from corpus.content_b import FAMILIES_B
from corpus.sites import SITES
from corpus.templates import build_page, body_html, e, a as link, snippet_words
from corpus.render import render_txt, render_md, render_pdf

SITE_ORDER = ["ashgrove", "fenwick", "tallowby", "copperpot", "marram", "tenders", "museum", "insurance", "travel", "stats"]
FAMS = {f.key: f for f in FAMILIES_A + FAMILIES_B}
SITE_FAMS = {s: [f for f in FAMILIES_A + FAMILIES_B if f.site == s] for s in SITE_ORDER}
# first family listed per site with the larger size range is the "long" family
LONG = {s: max(SITE_FAMS[s], key=lambda f: f.size[1]) for s in SITE_ORDER}
SHORT = {s: min(SITE_FAMS[s], key=lambda f: f.size[1]) for s in SITE_ORDER}
PARTNER = {"ashgrove": "fenwick", "fenwick": "museum", "tallowby": "tallowby", "copperpot": "fenwick",
           "marram": "fenwick", "tenders": "tenders", "museum": "travel", "travel": "museum",
           "insurance": "travel", "stats": "fenwick"}
SYND = {"ashgrove": "fenwick", "fenwick": "museum", "copperpot": "fenwick", "marram": "fenwick",
        "museum": "travel", "travel": "museum", "insurance": "travel", "stats": "fenwick"}
DOCS_PER_SITE = 40
HEAVY_RANGE = (2.5, 5.0)
LIGHT_RANGE = (0.3, 1.6)

APPEND_SAME = [
    "Update: this page was reviewed on {date} and a few details were corrected; the rest of the information is unchanged.",
    "This is a reposted version of an earlier item, brought back to the top of the page on {date} because readers asked about it again.",
    "Editor's note: since this item first appeared, we have checked the details with the team concerned, most recently on {date}.",
]
APPEND_PARTNER = {
    "fenwick": ["This item was first published by {origin} and is shared on the consortium website so that library users at every branch can see it.",
                "Shared with permission from {origin}; library staff cannot answer questions about it, so please contact {origin} directly."],
    "museum": ["The museum is sharing this item from {origin} for visitors planning a trip to the area; please contact {origin} with any questions.",
               "Reproduced by the museum with the kind permission of {origin}."],
    "travel": ["Reproduced with permission from {origin} for guests who will be travelling in the area this season.",
               "We share this item from {origin} because several of our routes pass nearby; the original is on their website."],
}


class Corpus:
    def __init__(self):
        self.docs = []
        self.nclusters = {}

    def cluster_id(self, site, kind):
        n = self.nclusters.get((site, kind), 0) + 1
        self.nclusters[(site, kind)] = n
        return f"{site}-{kind}{n:02d}"

    def add(self, **d):
        d["id"] = len(self.docs)
        d["text"] = body_text(d["blocks"])
        d["sh"] = shingles(d["text"])
        d["words"] = len(d["text"].split())
        self.docs.append(d)
        return d

    def clash(self, sh, exclude=(), limit=0.40):
        for d in self.docs:
            if d["cluster"] in exclude:
                continue
            if jaccard(sh, d["sh"]) >= limit:
                return True
        return False


def fresh_plan(C, fam, r, lo, hi, exclude=()):
    lo = max(lo, fam.size[0])
    hi = min(hi, fam.size[1])
    lo = max(fam.size[0], min(lo, hi - 60))
    for _ in range(40):
        while True:
            try:
                plan = make_plan(fam, r, lo, hi)
                break
            except RuntimeError:
                if lo <= fam.size[0]:
                    raise
                lo = max(fam.size[0], lo - 40)
        sh = shingles(body_text(to_blocks(plan)))
        if not C.clash(sh, exclude):
            return plan
    raise RuntimeError(f"no fresh plan for {fam.key}")


# ---------------------------------------------------------------- republications

def make_rep(plan, r, partner_site, origin_name, date, others_sh):
    """Apply 1-3 hand-written edit operations; keep Jaccard >= 0.82 to the original and >= 0.80 to other copies."""
    base_sh = shingles(body_text(to_blocks(plan)))
    names = ["reword", "drop", "add", "swap", "retitle"]
    for attempt in range(100):
        k = 3 if attempt < 20 else (2 if attempt < 40 else 1)
        allow_append = attempt < 60
        p = clone(plan)
        ops = []
        for name in r.sample(names, min(k, len(names))):
            op = OPS[name](p, r)
            if op:
                ops.append(op)
        if partner_site is not None and allow_append and r.random() < 0.7:
            text = r.choice(APPEND_PARTNER[partner_site]).format(origin=origin_name)
            ops.append(op_append(p, r, text))
        elif partner_site is None and allow_append and r.random() < 0.3:
            ops.append(op_append(p, r, r.choice(APPEND_SAME).format(date=date)))
        if not ops:
            continue
        sh = shingles(body_text(to_blocks(p)))
        if sh == base_sh:
            continue
        if jaccard(base_sh, sh) < 0.82:
            continue
        if any(jaccard(sh, o) < 0.80 for o in others_sh):
            continue
        return p, ops
    raise RuntimeError(f"could not make republication of {plan['fam'].key} ({n_words(to_blocks(plan))} words)")


# ---------------------------------------------------------------- twins
LINKS = {
    "marram/match-report": [("home", "away", "hs", "as_", "win", "lose", "hq", "aq", "q1", "q2")],
    "tenders/tender": [("price", "social", "quality"), ("subj", "kind"), ("q_deadline", "deadline")],
    "tenders/award": [("subj",)],
    "copperpot/recipe": [("dish", "kind")],
    "copperpot/technique": [("tech", "topic")],
    "fenwick/event": [("event", "about")],
    "stats/bulletin": [("topic", "measure", "unit"), ("hi", "lo")],
    "museum/exhibition": [("show", "about")],
    "museum/object": [("obj", "mat")],
    "travel/itinerary": [("region", "act"), ("t1", "t2", "t3", "t4", "t5", "station"), ("inn1", "inn2", "inn3", "inn4")],
    "insurance/faq": [("q", "qy", "line")],
    "ashgrove/service": [("lead", "lead_last")],
    "ashgrove/notice": [("building", "newbuilding")],
    "fenwick/branch-news": [("branch", "alt_branch"), ("date", "date2")],
    "tallowby/release": [("c1", "c2", "c3", "c4", "c5", "c6"), ("ver", "prev")],
    "tallowby/advisory": [("ver", "fixed")],
    "marram/fixture-notice": [("home", "away"), ("date", "date2")],
    "travel/travel-update": [("date", "date2")],
    "stats/revision": [("topic", "measure"), ("old", "new")],
}


def fact_groups(fam, keys):
    """Keys that must be kept or replaced together so a twin stays coherent."""
    parent = {k: k for k in keys}

    def find(k):
        while parent[k] != k:
            k = parent[k]
        return k

    def union(x, y):
        parent[find(x)] = find(y)

    for k in keys:
        if k[0].isupper() and k.lower() in parent:
            union(k, k.lower())
    for group in LINKS.get(fam.key, []):
        for k in group[1:]:
            union(group[0], k)
    out = {}
    for k in keys:
        out.setdefault(find(k), []).append(k)
    return [out[k] for k in sorted(out)]


def make_twin(C, plan, r, set_sh, exclude):
    fam = plan["fam"]
    keys = sorted(plan["facts"])
    for attempt in range(120):
        keep_f = [0.35, 0.5, 0.65, 0.8][attempt % 4]
        keep_alt = [0.5, 0.7, 0.85][(attempt // 4) % 3]
        facts = fam.facts(r)
        for group in fact_groups(fam, keys):
            if r.random() < keep_f:
                for k in group:
                    facts[k] = plan["facts"][k]
        changed = [k for k in keys if facts[k] != plan["facts"][k]]
        if len(changed) < max(2, len(keys) // 4):
            continue
        p = new_plan(fam, r, facts)
        nalt = 0
        for sp_new, sp_old in zip(p["secs"], plan["secs"]):
            sp_new["on"] = sp_old["on"] if r.random() < 0.8 else sp_new["on"]
            for sn, so in zip(sp_new["slots"], sp_old["slots"]):
                if sn is None:
                    continue
                if r.random() < keep_alt:
                    sn["alt"] = so["alt"]
                    sn["on"] = so["on"]
                elif sn["alt"] != so["alt"]:
                    nalt += 1
        p["title"] = plan["title"] if r.random() < 0.5 else p["title"]
        lo, hi = fam.size[0], min(fam.size[1], 250)
        trim_to(p, r, hi)
        bl = to_blocks(p)
        if not (lo <= n_words(bl) <= hi):
            continue
        sh = shingles(body_text(bl))
        js = [jaccard(sh, o) for o in set_sh]
        if not all(0.15 <= j <= 0.40 for j in js):
            continue
        if C.clash(sh, exclude):
            continue
        return p, len(changed), len(keys), nalt
    raise RuntimeError(f"could not make twin for {fam.key}")


# ---------------------------------------------------------------- build

def generate(C):
    for si, s in enumerate(SITE_ORDER):
        r = rng_for("plan", s)
        long_f, short_f = LONG[s], SHORT[s]
        # --- format groups
        fg_specs = [(long_f, 300, 460, ["txt", "md", "pdf"]), (short_f, 60, 200, ["txt", "md", "pdf"]),
                    (r.choice([long_f, short_f]), 100, 250, r.choice([["txt", "pdf"], ["md", "pdf"], ["txt", "md"]]))]
        for gi, (fam, lo, hi, fmts) in enumerate(fg_specs):
            cl = C.cluster_id(s, "fg")
            plan = fresh_plan(C, fam, r, lo, hi)
            orig = C.add(site=s, fam=fam.key, cluster=cl, role="original", ext="html", blocks=to_blocks(plan),
                         plan=plan, ops=[], kind="fg", home=s)
            group = [orig]
            for fmt in fmts:
                blocks = orig["blocks"]
                ops = []
                if r.random() < 0.55:
                    nb, ops = word_edit_blocks(blocks, r, max(1, round(orig["words"] / 100)))
                    test_sh = shingles(body_text(nb))
                    if all(jaccard(test_sh, g["sh"]) >= 0.80 for g in group) and test_sh != orig["sh"]:
                        blocks = nb
                    else:
                        ops = []
                C.add(site=s, fam=fam.key, cluster=cl, role=f"format-{fmt}", ext=fmt, blocks=blocks, plan=None,
                      ops=ops, kind="fg", home=s, parent=orig["id"])
                group.append(C.docs[-1])
            if gi == 1 and s in SYND:
                C.add(site=SYND[s], fam=fam.key, cluster=cl, role="syndication", ext="html", blocks=orig["blocks"],
                      plan=None, ops=[], kind="fg", home=s, parent=orig["id"])
        # --- republication groups
        for gi in range(3):
            cl = C.cluster_id(s, "rg")
            plan = fresh_plan(C, long_f, r, 240, 440)
            orig = C.add(site=s, fam=long_f.key, cluster=cl, role="original", ext="html", blocks=to_blocks(plan),
                         plan=plan, ops=[], kind="rg", home=s)
            targets = [s, PARTNER[s]] if gi < 2 else [r.choice([s, PARTNER[s]])]
            made = []
            for tgt in targets:
                partner = tgt if tgt != s else None
                p2, ops = make_rep(plan, r, partner, SITES[s]["name"], date_str(r), [m["sh"] for m in made])
                ops = ([f"other-site({tgt})"] if partner else ["same-site"]) + ops
                d = C.add(site=tgt, fam=long_f.key, cluster=cl, role="republication", ext="html", blocks=to_blocks(p2),
                          plan=p2, ops=ops, kind="rg", home=s, parent=orig["id"])
                made.append(d)
            if gi == 0 and s in SYND and si % 2 == 0:
                C.add(site=SYND[s], fam=long_f.key, cluster=cl, role="syndication", ext="html", blocks=orig["blocks"],
                      plan=None, ops=[], kind="rg", home=s, parent=orig["id"])
        # --- twin sets (base + 2 twins, all distinct clusters)
        for ti in range(3):
            fam = short_f if ti != 1 else long_f
            if s == "ashgrove":
                fam = short_f if ti < 2 else long_f
            base_plan = fresh_plan(C, fam, r, fam.size[0], 250)
            set_id = f"{s}-tw{ti + 1:02d}"
            cl = C.cluster_id(s, "t")
            base = C.add(site=s, fam=fam.key, cluster=cl, role="twin-base", ext="html", blocks=to_blocks(base_plan),
                         plan=base_plan, ops=[], kind="twin", home=s, twinset=set_id)
            members = [base]
            for _ in range(2):
                p, nchg, nkeys, nalt = make_twin(C, base_plan, r, [m["sh"] for m in members],
                                                 exclude={m["cluster"] for m in members})
                cl = C.cluster_id(s, "t")
                d = C.add(site=s, fam=fam.key, cluster=cl, role="twin", ext="html", blocks=to_blocks(p), plan=p,
                          ops=[f"facts-changed {nchg}/{nkeys}", f"alternatives-changed {nalt}"], kind="twin", home=s,
                          twinset=set_id, parent=base["id"])
                members.append(d)
        # --- standalone non-HTML documents
        if s in ("tallowby", "stats"):
            for k in range(3):
                fam = long_f if k < 2 else short_f
                plan = fresh_plan(C, fam, r, fam.size[0], 240)
                C.add(site=s, fam=fam.key, cluster=C.cluster_id(s, "s"), role="single",
                      ext="md" if s == "tallowby" else "pdf", blocks=to_blocks(plan), plan=plan, ops=[], kind="single",
                      home=s)
    # --- singles to fill each site
    for s in SITE_ORDER:
        r = rng_for("singles", s)
        have = sum(1 for d in C.docs if d["site"] == s)
        k = 0
        while have < DOCS_PER_SITE:
            if s == "ashgrove":
                fam, role = SHORT[s], "notice"
            else:
                fam, role = (SHORT[s] if r.random() < 0.6 else LONG[s]), "single"
            plan = fresh_plan(C, fam, r, fam.size[0], 240)
            C.add(site=s, fam=fam.key, cluster=C.cluster_id(s, "s"), role=role, ext="html", blocks=to_blocks(plan),
                  plan=plan, ops=[], kind="single", home=s)
            have += 1
            k += 1


def section_label(fam, site, home):
    if site != home:
        return "From our partners"
    return fam.urlpath.split("/")[-1].replace("-", " ").title()


def assign_paths(C):
    used = set()
    for d in C.docs:
        fam = FAMS[d["fam"]]
        s = SITES[d["site"]]
        if d.get("parent") is not None and d["role"].startswith("format-"):
            base = slugify(C.docs[d["parent"]]["blocks"][0][1])
            stem = C.docs[d["parent"]]["stem"]
        else:
            stem = slugify(d["blocks"][0][1])
            if d["role"] == "republication" and d["site"] == d["home"]:
                stem += "-updated"
            n = 2
            cand = stem
            while (d["site"], cand) in used:
                cand = f"{stem}-{n}"
                n += 1
            stem = cand
            used.add((d["site"], stem))
        d["stem"] = stem
        d["path"] = f"{d['site']}/{stem}.{d['ext']}"
        if d["site"] != d["home"]:
            sect = "community/shared"
        else:
            sect = fam.urlpath
        if d["ext"] == "html":
            d["url"] = f"https://{s['host']}/{sect}/{stem}"
        elif d["ext"] == "pdf":
            d["url"] = f"https://{s['host']}/documents/{stem}.pdf"
        else:
            d["url"] = f"https://{s['host']}/export/{stem}.{d['ext']}"
        d["title"] = d["blocks"][0][1]
        r = rng_for("meta", d["path"])
        d["date"] = date_str(r)
        d["author"] = person(r)
        d["section_label"] = section_label(fam, d["site"], d["home"])


def fixed_ashgrove_aside(C):
    svc = sorted([d for d in C.docs if d["site"] == "ashgrove" and d["fam"] == "ashgrove/service" and d["ext"] == "html"
                  and d["role"] in ("original", "twin-base", "single")], key=lambda d: d["path"])[:6]
    out = ['<aside class="trust-latest"><h2>Latest from the Trust</h2>']
    for d in svc:
        first = next(b[1][0] for b in d["blocks"] if b[0] == "p")
        out.append(f'<div class="teaser"><h3>{link(d["url"], d["title"])}</h3><p>{e(first)}</p>'
                   f'<p>{link(d["url"], "Read more")}</p></div>')
    out.append("<p>Our hospitals are smoke-free sites. Please use the shelters marked near each car park.</p>")
    out.append("</aside>")
    return "".join(out)


def render_all(C, out):
    inbox = os.path.join(out, "inbox")
    aside = fixed_ashgrove_aside(C)
    by_site = {s: [d for d in C.docs if d["site"] == s and d["ext"] == "html"] for s in SITE_ORDER}
    for idx, d in enumerate(C.docs):
        s = SITES[d["site"]]
        fpath = os.path.join(inbox, d["path"])
        os.makedirs(os.path.dirname(fpath), exist_ok=True)
        if d["ext"] == "html":
            others = [o for o in by_site[d["site"]] if o["cluster"] != d["cluster"]]
            page = dict(title=d["title"], blocks=d["blocks"], idx=idx, others=others, date=d["date"],
                        author=d["author"], section_label=d["section_label"], crumb=d["title"],
                        desc=d["text"].split("\n")[1][:150] if "\n" in d["text"] else d["title"],
                        body_html=body_html(d["blocks"], d["site"]))
            fixed = aside if d["fam"] == "ashgrove/notice" and d["site"] == "ashgrove" else None
            lo, hi = HEAVY_RANGE if s["heavy"] else LIGHT_RANGE
            for t in range(60):
                r = rng_for("page", d["path"], t)
                html, ratio = build_page(s, page, r, d["words"], lo, hi, fixed)
                if html:
                    break
            else:
                raise RuntimeError(f"template sizing failed for {d['path']} ({d['words']} words, last {ratio:.2f})")
            d["template_ratio"] = round(ratio, 4)
            d["shared_aside"] = bool(fixed)
            with open(fpath, "w", encoding="utf-8") as f:
                f.write(html)
        elif d["ext"] == "txt":
            txt = render_txt(d["blocks"], s, d["url"], d["date"])
            extra = len([w for w in txt.split() if any(c.isalnum() for c in w)]) - d["words"]
            d["template_ratio"] = round(extra / d["words"], 4)
            with open(fpath, "w", encoding="utf-8") as f:
                f.write(txt)
        elif d["ext"] == "md":
            tags = rng_for("tags", d["path"]).sample(s["tags"], 3)
            md = render_md(d["blocks"], s, d["url"], d["date"], tags)
            extra = len([w for w in md.split() if any(c.isalnum() for c in w)]) - d["words"]
            d["template_ratio"] = round(extra / d["words"], 4)
            with open(fpath, "w", encoding="utf-8") as f:
                f.write(md)
        else:
            data, pages, hf = render_pdf(d["blocks"], s, d["url"], d["date"])
            d["pages"] = pages
            d["template_ratio"] = round(hf / d["words"], 4)
            with open(fpath, "wb") as f:
                f.write(data)


def pair_kind(x, y):
    if "republication" in (x["role"], y["role"]):
        return "republication"
    if x["ext"] != y["ext"]:
        return "cross-format"
    return "syndication"


def describe(d):
    where = d["site"] + ("" if d["site"] == d["home"] else f" (from {d['home']})")
    ops = ", ".join(d["ops"]) if d["ops"] else "no edits"
    return f"{d['role']} {d['ext']} on {where}: {ops}"


def make_pairs(C):
    pairs = []
    labelled = set()
    clusters = {}
    for d in C.docs:
        clusters.setdefault(d["cluster"], []).append(d)
    for cl, members in clusters.items():
        for x, y in itertools.combinations(members, 2):
            j = jaccard(x["sh"], y["sh"])
            if x["text"] == y["text"]:
                rel = "exact-body"
            else:
                rel = "near-duplicate"
                assert j >= 0.80, (x["path"], y["path"], j)
            kind = pair_kind(x, y)
            pairs.append(dict(a=x["path"], b=y["path"], relation=rel, body_jaccard=j,
                              note=f"{kind}: {describe(x)}; {describe(y)}"))
            labelled.add((x["id"], y["id"]))
    sets = {}
    for d in C.docs:
        if d.get("twinset"):
            sets.setdefault(d["twinset"], []).append(d)
    for sid, members in sets.items():
        for x, y in itertools.combinations(members, 2):
            j = jaccard(x["sh"], y["sh"])
            assert 0.10 <= j <= 0.45, (x["path"], y["path"], j)
            how = "; ".join(f"{d['role']} {d['path'].split('/')[1]}: " + (", ".join(d["ops"]) or "base page")
                            for d in (x, y))
            rel_txt = "sibling twins derived from one base" if x["role"] == y["role"] == "twin" else "twin of its base"
            pairs.append(dict(a=x["path"], b=y["path"], relation="distinct", body_jaccard=j,
                              note=f"twin: hard negative in {x['fam']} on the same site template ({sid}), {rel_txt}; "
                                   f"different facts and partly different sentences; {how}"))
            labelled.add((x["id"], y["id"]))
    for s in SITE_ORDER:
        r = rng_for("random-pairs", s)
        docs = [d for d in C.docs if d["site"] == s]
        cands = [(x, y) for x, y in itertools.combinations(docs, 2)
                 if x["cluster"] != y["cluster"] and (x["id"], y["id"]) not in labelled]
        same_fam = [c for c in cands if c[0]["fam"] == c[1]["fam"]]
        other = [c for c in cands if c[0]["fam"] != c[1]["fam"]]
        r.shuffle(same_fam)
        r.shuffle(other)
        chosen = same_fam[:22] + other[:12]
        rest = same_fam[22:] + other[12:]
        chosen += rest[:max(0, 34 - len(chosen))]
        for x, y in chosen:
            j = jaccard(x["sh"], y["sh"])
            assert j < 0.45
            how = "same family" if x["fam"] == y["fam"] else "different families"
            pairs.append(dict(a=x["path"], b=y["path"], relation="distinct", body_jaccard=j,
                              note=f"random: same-site pair on {s}, {how} ({x['fam']} / {y['fam']}); no shared body"))
            labelled.add((x["id"], y["id"]))
    # global guard: every unlabelled pair must be below 0.45
    for x, y in itertools.combinations(C.docs, 2):
        if (x["id"], y["id"]) in labelled:
            continue
        if jaccard(x["sh"], y["sh"]) >= 0.45:
            raise RuntimeError(f"unlabelled pair too similar: {x['path']} {y['path']}")
    return pairs


def write_outputs(C, out, pairs):
    with open(os.path.join(out, "manifest.jsonl"), "w", encoding="utf-8") as f:
        for d in C.docs:
            f.write(json.dumps({"path": d["path"], "source_url": d["url"]}) + "\n")
    for d in C.docs:
        bp = os.path.join(out, "bodies", d["path"] + ".txt")
        os.makedirs(os.path.dirname(bp), exist_ok=True)
        with open(bp, "w", encoding="utf-8") as f:
            f.write(d["text"] + "\n")
    with open(os.path.join(out, "pairs.jsonl"), "w", encoding="utf-8") as f:
        for p in pairs:
            f.write(json.dumps(p) + "\n")
    with open(os.path.join(out, "clusters.jsonl"), "w", encoding="utf-8") as f:
        for d in C.docs:
            f.write(json.dumps({"path": d["path"], "cluster": d["cluster"], "family": d["fam"], "role": d["role"],
                                "site": d["site"], "body_words": d["words"],
                                "template_ratio": d["template_ratio"]}) + "\n")


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(os.path.dirname(os.path.abspath(__file__)), "out"))
    args = ap.parse_args()
    t0 = time.time()
    final = os.path.abspath(args.out)
    out = final + ".building"
    if os.path.exists(out):
        shutil.rmtree(out)
    os.makedirs(out)
    C = Corpus()
    generate(C)
    assign_paths(C)
    render_all(C, out)
    pairs = make_pairs(C)
    write_outputs(C, out, pairs)
    if os.path.exists(final):
        shutil.rmtree(final)
    os.rename(out, final)
    out = final
    kinds = {}
    for p in pairs:
        k = p["note"].split(":")[0] + "/" + p["relation"]
        kinds[k] = kinds.get(k, 0) + 1
    nonhtml = sum(1 for d in C.docs if d["ext"] != "html")
    print(f"documents: {len(C.docs)} (non-HTML {nonhtml}), pairs: {len(pairs)}")
    for k in sorted(kinds):
        print(f"  {k}: {kinds[k]}")
    print(f"built in {time.time() - t0:.1f}s -> {out}")


if __name__ == "__main__":
    main()
