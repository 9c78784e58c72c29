#!/usr/bin/env python3
"""Deterministic generator for the blind near-duplicate benchmark corpus, set 5.

Usage: python make_corpus.py [--out DIR]      (default: ./out beside this file)
Needs fpdf2 for the PDF exports; everything else is standard library.
"""
import argparse
import copy
import json
import os
import shutil
import sys
import warnings

warnings.filterwarnings("ignore", message="Dimensions for page format")

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)

import content  # noqa: E402
import bodies  # noqa: E402
import render  # noqa: E402
from sites import SITES, LENGTH, LONG  # noqa: E402
from textutil import shingles, jaccard  # noqa: E402

SEED = "blind13v5"
MAX_UNRELATED = 0.40       # generation-time cap for unrelated pairs (the contract is < 0.45)
TWIN_RANGE = (0.12, 0.43)
NEAR_MIN = 0.80


class Ctx:
    def __init__(self):
        self.docs = []          # every document
        self.byfam = {}         # family -> list of (doc, shingles) of independent bodies
        self.titles = {}        # site -> titles of independent pages

    def too_close(self, fam, sh, ignore=()):
        for d, s in self.byfam.get(fam, []):
            if d["id"] in ignore:
                continue
            if jaccard(sh, s) >= MAX_UNRELATED:
                return True
        return False

    def register(self, d):
        self.byfam.setdefault(d["fam"], []).append((d, d["sh"]))


def finalize(d):
    d["lines"] = bodies.lines(d["blocks"])
    d["words"] = sum(len(l.split()) for l in d["lines"])
    d["sh"] = shingles(d["lines"])
    return d


_ids = [0]


def new_doc(**kw):
    _ids[0] += 1
    d = dict(id=_ids[0], edits=[], fmt="html")
    d.update(kw)
    return d


def gen_original(ctx, site, fam, k):
    long = fam in LONG and k % 3 == 1
    lo, hi = LONG[fam] if long else LENGTH[fam]
    for attempt in range(400):
        rng = bodies.rng_for(SEED, "orig", site, fam, k, attempt)
        facts = content.FACTS[fam](rng, site)
        plan = bodies.make_plan(fam, rng, long)
        blocks = bodies.build(fam, facts, plan, bodies.rng_for(SEED, "tab", site, fam, k, attempt))
        d = finalize(new_doc(site=site, fam=fam, facts=facts, plan=plan, blocks=blocks, role="standalone"))
        if not (lo <= d["words"] <= hi):
            continue
        if ctx.too_close(fam, d["sh"]):
            continue
        if d["lines"][0] in ctx.titles.get(site, set()):
            continue
        ctx.titles.setdefault(site, set()).add(d["lines"][0])
        return d
    raise RuntimeError("could not generate %s/%s/%d" % (site, fam, k))


def gen_twin(ctx, base, k):
    fam, site = base["fam"], base["site"]
    lo, hi = LENGTH[fam]
    if fam in LONG and base["words"] > hi:
        lo, hi = LONG[fam]
    for attempt in range(600):
        rng = bodies.rng_for(SEED, "twin", site, k, attempt)
        keep_p = [0.75, 0.6, 0.45, 0.3][attempt % 4]
        strength = [0.25, 0.4, 0.55, 0.7][(attempt // 4) % 4]
        fresh = content.FACTS[fam](rng, site)
        facts = {}
        kept = 0
        for key in sorted(base["facts"]):
            if rng.random() < keep_p:
                facts[key] = base["facts"][key]
                kept += 1
            else:
                facts[key] = fresh[key]
        # keep dependent facts consistent
        for a, b in (("condition", "condition_cap"), ("crop", "crop_cap"), ("task", "task_cap"),
                     ("topic", "topic_cap"), ("ptype", "ptype_cap"), ("employer", "employer_cap"),
                     ("employer", "employer_short"), ("season", "season_cap"), ("works", "works_short"),
                     ("name1", "host"), ("name2", "guest"), ("first2", "guest_first")):
            if a in facts and b in facts:
                src = base["facts"] if facts[a] == base["facts"].get(a) else fresh
                facts[b] = src[b]
        plan = bodies.mutate_plan(fam, base["plan"], rng, strength)
        blocks = bodies.build(fam, facts, plan, bodies.rng_for(SEED, "twintab", site, k, attempt))
        d = finalize(new_doc(site=site, fam=fam, facts=facts, plan=plan, blocks=blocks, role="twin"))
        if d["lines"][0] == base["lines"][0]:
            continue
        if not (max(60, lo - 15) <= d["words"] <= min(470, hi + 30)):
            continue
        j = jaccard(d["sh"], base["sh"])
        if not (TWIN_RANGE[0] <= j <= TWIN_RANGE[1]):
            continue
        if ctx.too_close(fam, d["sh"], ignore=(base["id"],)):
            continue
        if d["lines"][0] in ctx.titles.get(site, set()):
            continue
        ctx.titles.setdefault(site, set()).add(d["lines"][0])
        d["twin_of"] = base["id"]
        d["twin_note"] = "kept %d of %d facts, plan mutation strength %.2f" % (kept, len(base["facts"]), strength)
        return d
    return None


def edited_copy(base, rng, nops, allowed):
    blocks = copy.deepcopy(base["blocks"])
    ops = []
    pool = [o for o in bodies.OPS if o.__name__[3:] in allowed]
    rng.shuffle(pool)
    for op in pool:
        if len(ops) >= nops:
            break
        r = op(blocks, rng, base["facts"])
        if r:
            ops.append(r)
    return blocks, ops


def group_ok(members, cand):
    for m in members:
        if m["lines"] == cand["lines"]:
            continue
        if jaccard(m["sh"], cand["sh"]) < NEAR_MIN:
            return False
    return True


def make_rep(ctx, head, members, tag, site, role):
    allowed = ["reword", "drop", "add", "swap", "retitle", "append"]
    for attempt in range(120):
        rng = bodies.rng_for(SEED, "rep", head["id"], tag, attempt)
        nops = [3, 2, 2, 1][min(attempt // 30, 3)]
        blocks, ops = edited_copy(head, rng, nops, allowed)
        if not ops:
            continue
        d = finalize(new_doc(site=site, fam=head["fam"], facts=head["facts"], plan=head["plan"], blocks=blocks,
                             role=role, edits=ops, base=head["id"]))
        if any(m["lines"] == d["lines"] for m in members):
            continue
        if not group_ok(members, d):
            continue
        if ctx.too_close(head["fam"], d["sh"], ignore=tuple(m["id"] for m in members)):
            continue
        return d
    return None


def make_format(head, members, fmt, tag, with_edits):
    rng = bodies.rng_for(SEED, "fmt", head["id"], tag)
    blocks = copy.deepcopy(head["blocks"])
    ops = []
    if with_edits:
        k = max(1, round(head["words"] * 0.01))
        ops = bodies.word_edits(blocks, rng, k)
    d = finalize(new_doc(site=head["site"], fam=head["fam"], facts=head["facts"], plan=head["plan"],
                         blocks=blocks, role="export-" + fmt if fmt != "print" else "print", edits=ops,
                         base=head["id"], fmt=fmt if fmt != "print" else "html"))
    d["is_print"] = fmt == "print"
    if not group_ok(members, d):
        return None
    return d


def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(HERE, "out"))
    args = ap.parse_args()
    out = os.path.abspath(args.out)

    ctx = Ctx()
    site_keys = list(SITES)
    originals = {s: [] for s in site_keys}
    # 1. independent originals -------------------------------------------------
    for s in site_keys:
        for fam, n in SITES[s]["families"].items():
            for k in range(n):
                d = gen_original(ctx, s, fam, k)
                ctx.register(d)
                originals[s].append(d)
                ctx.docs.append(d)

    groups = []   # list of member lists (first = head)
    twins = []
    # 2. copy groups ------------------------------------------------------------
    for s in site_keys:
        rng = bodies.rng_for(SEED, "plan", s)
        origs = originals[s]
        vac = [d for d in origs if d["fam"] == "vacancy"] if s != "jobs" else []
        rest = [d for d in origs if d not in vac and d["words"] >= 110]
        rng.shuffle(rest)
        n_groups = 4 if s != "jobs" else 3
        heads = vac + rest[:n_groups]
        for gi, head in enumerate(heads):
            head["role"] = "original"
            members = [head]
            grng = bodies.rng_for(SEED, "group", head["id"])
            if head in vac:
                # job board copy: exact syndication or edited republication
                if gi % 2 == 0:
                    d = finalize(new_doc(site="jobs", fam=head["fam"], facts=head["facts"], plan=head["plan"],
                                         blocks=copy.deepcopy(head["blocks"]), role="syndication", base=head["id"]))
                    members.append(d)
                else:
                    d = make_rep(ctx, head, members, "jobs", "jobs", "republication")
                    if d:
                        members.append(d)
                for f_, prob in (("pdf", 0.75), ("txt", 0.2)):
                    if grng.random() < prob:
                        f = make_format(head, members, f_, f_, grng.random() < 0.4)
                        if f:
                            members.append(f)
            else:
                fmts = []
                if grng.random() < 0.9:
                    fmts.append("pdf")
                if grng.random() < 0.65:
                    fmts.append("txt")
                if grng.random() < 0.6:
                    fmts.append("md")
                if not fmts:
                    fmts.append(grng.choice(["txt", "md"]))
                for f in fmts:
                    m = make_format(head, members, f, f, grng.random() < 0.45)
                    if m:
                        members.append(m)
                if grng.random() < 0.28:
                    m = make_format(head, members, "print", "print", False)
                    if m:
                        members.append(m)
                nrep = 1 if grng.random() < 0.8 else 0
                if nrep and grng.random() < 0.15:
                    nrep = 2
                for r in range(nrep):
                    m = make_rep(ctx, head, members, "same%d" % r, s, "republication")
                    if m:
                        members.append(m)
            groups.append(members)
            for m in members[1:]:
                ctx.docs.append(m)
        # 3. twins ----------------------------------------------------------------
        cand = [d for d in origs if d["role"] == "standalone"]
        rng.shuffle(cand)
        made = 0
        for k, base in enumerate(cand):
            if made >= 9:
                break
            t = gen_twin(ctx, base, "%s-%d" % (s, k))
            if t is None:
                continue
            ctx.register(t)
            ctx.docs.append(t)
            twins.append((base, t))
            made += 1

    # 4. slugs, paths, URLs ------------------------------------------------------------
    used = {}
    ext = {"html": "html", "txt": "txt", "md": "md", "pdf": "pdf"}
    byid = {d["id"]: d for d in ctx.docs}
    order = sorted(ctx.docs, key=lambda d: d["id"])
    # pages first (html non-print), exports later so that they reuse the head slug
    for d in order:
        if d["fmt"] != "html" or d.get("is_print"):
            continue
        base = render.slugify(d["lines"][0])
        if len(base) > 60:
            base = base[:61].rsplit("-", 1)[0]
        slug = base
        n = 2
        while (d["site"], slug) in used:
            if d["role"] == "republication" and n == 2:
                slug = base + ("-updated" if d["site"] == byid[d["base"]]["site"] else "")
                if (d["site"], slug) not in used:
                    break
            slug = "%s-%d" % (base, n)
            n += 1
        used[(d["site"], slug)] = d["id"]
        d["slug"] = slug
        cfg = SITES[d["site"]]
        d["url"] = "https://%s/%s" % (cfg["host"], cfg["url"][d["fam"]].format(slug=slug))
        d["orig_url"] = d["url"]
    for d in order:
        if "slug" in d:
            continue
        head = byid[d["base"]]
        cfg = SITES[d["site"]]
        if d.get("is_print"):
            d["slug"] = head["slug"] + "-print"
            d["url"] = head["url"] + "?print=1"
        else:
            d["slug"] = head["slug"]
            folder = "downloads" if d["fmt"] == "pdf" else "exports"
            d["url"] = "https://%s/%s/%s.%s" % (cfg["host"], folder, head["slug"], d["fmt"])
        d["orig_url"] = head["url"]
    for d in order:
        d["path"] = "%s/%s.%s" % (d["site"], d["slug"], ext[d["fmt"]])

    # 5. render -------------------------------------------------------------------------
    if os.path.exists(out):
        shutil.rmtree(out)
    os.makedirs(os.path.join(out, "inbox"))
    site_pages = {s: [d for d in order if d["site"] == s and d["fmt"] == "html" and not d.get("is_print")]
                  for s in site_keys}
    fixed = ""
    pw = [d for d in site_pages["water"] if d["fam"] == "planned_works"][:4]
    fixed = ('<aside class="network-news"><p class="box-title">Across our network this week</p>%s'
             '<p>Check the live incident map for your postcode, or call the 24-hour line if you see water running in '
             'the road, sewage flooding near your home, or damage to one of our hydrants.</p>'
             '<a href="/incidents">See all incidents and planned work</a></aside>'
             % "".join(render.teaser_unit(d) for d in pw))
    problems = []
    for d in order:
        p = os.path.join(out, "inbox", d["path"])
        os.makedirs(os.path.dirname(p), exist_ok=True)
        rng = bodies.rng_for(SEED, "render", d["id"])
        heavy = SITES[d["site"]]["heavy"]
        if d["fmt"] == "html" and not d.get("is_print"):
            for attempt in range(12):
                target = rng.uniform(2.9, 4.3) if heavy else rng.uniform(0.5, 1.2)
                html, ratio = render.render_site_page(
                    d, {"docs": site_pages[d["site"]], "fixed_aside": fixed if d["site"] == "water" else ""},
                    rng, target)
                if not heavy or 2.5 <= ratio <= 5.0:
                    break
            else:
                problems.append("ratio %s %.2f" % (d["path"], ratio))
            data = html.encode("utf-8")
        elif d["fmt"] == "html":
            html, ratio = render.render_print(d)
            data = html.encode("utf-8")
        elif d["fmt"] == "txt":
            text, ratio = render.render_txt(d, rng)
            data = text.encode("utf-8")
        elif d["fmt"] == "md":
            text, ratio = render.render_md(d, rng)
            data = text.encode("utf-8")
        else:
            data, pages, ratio = render.render_pdf(d, rng)
            d["pages"] = pages
        d["ratio"] = ratio
        with open(p, "wb") as fh:
            fh.write(data)
        bp = os.path.join(out, "bodies", d["path"] + ".txt")
        os.makedirs(os.path.dirname(bp), exist_ok=True)
        with open(bp, "w", encoding="utf-8") as fh:
            fh.write("\n".join(d["lines"]) + "\n")

    # 6. clusters, pairs, manifest ----------------------------------------------------------
    cluster_of = {}
    for gi, members in enumerate(groups):
        for m in members:
            cluster_of[m["id"]] = "g%03d" % (gi + 1)
    n = 0
    for d in order:
        if d["id"] not in cluster_of:
            n += 1
            cluster_of[d["id"]] = "s%03d" % n
    with open(os.path.join(out, "manifest.jsonl"), "w") as fh:
        for d in order:
            fh.write(json.dumps({"path": d["path"], "source_url": d["url"]}) + "\n")
    with open(os.path.join(out, "clusters.jsonl"), "w") as fh:
        for d in order:
            fh.write(json.dumps({"path": d["path"], "cluster": cluster_of[d["id"]], "family": d["fam"],
                                 "role": d["role"], "site": d["site"], "body_words": d["words"],
                                 "template_ratio": d["ratio"]}) + "\n")

    pairs = []

    def desc(d):
        if d["role"] in ("original",):
            return "%s is the original" % d["path"]
        if d["edits"]:
            return "%s (%s): %s" % (d["path"], d["role"], "; ".join(d["edits"]))
        return "%s (%s): no edits" % (d["path"], d["role"])

    for members in groups:
        for i in range(len(members)):
            for j in range(i + 1, len(members)):
                a, b = members[i], members[j]
                roles = {a["role"], b["role"]}
                if "syndication" in roles:
                    kind = "syndication"
                elif "republication" in roles:
                    kind = "republication"
                else:
                    kind = "cross-format"
                jj = jaccard(a["sh"], b["sh"])
                rel = "exact-body" if a["lines"] == b["lines"] else "near-duplicate"
                pairs.append({"a": a["path"], "b": b["path"], "relation": rel, "body_jaccard": jj,
                              "note": "%s: %s | %s" % (kind, desc(a), desc(b))})
    for base, t in twins:
        pairs.append({"a": base["path"], "b": t["path"], "relation": "distinct",
                      "body_jaccard": jaccard(base["sh"], t["sh"]),
                      "note": "twin: same family %s and template; different facts; %s" % (base["fam"], t["twin_note"])})
    labelled = set((p["a"], p["b"]) for p in pairs) | set((p["b"], p["a"]) for p in pairs)
    for s in site_keys:
        rng = bodies.rng_for(SEED, "random", s)
        ds = [d for d in order if d["site"] == s]
        got = 0
        tries = 0
        while got < 32 and tries < 5000:
            tries += 1
            a, b = rng.sample(ds, 2)
            if cluster_of[a["id"]] == cluster_of[b["id"]] or (a["path"], b["path"]) in labelled:
                continue
            jj = jaccard(a["sh"], b["sh"])
            pairs.append({"a": a["path"], "b": b["path"], "relation": "distinct", "body_jaccard": jj,
                          "note": "random: unrelated pages on %s (%s vs %s); no edits" % (s, a["fam"], b["fam"])})
            labelled.add((a["path"], b["path"]))
            labelled.add((b["path"], a["path"]))
            got += 1
    with open(os.path.join(out, "pairs.jsonl"), "w") as fh:
        for p in pairs:
            fh.write(json.dumps(p) + "\n")

    # summary
    from collections import Counter
    print("documents:", len(order))
    print("by format:", dict(Counter(d["fmt"] for d in order)))
    print("by site:", dict(Counter(d["site"] for d in order)))
    print("pairs:", dict(Counter((p["relation"], p["note"].split(":")[0]) for p in pairs)))
    if problems:
        print("PROBLEMS:", len(problems))
        for x in problems[:20]:
            print("  ", x)
        sys.exit(1)


if __name__ == "__main__":
    main()
