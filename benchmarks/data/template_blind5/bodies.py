"""Body construction, twins and edit operations."""
import copy
import hashlib
import random

import content
from textutil import shingles, jaccard


def rng_for(*parts):
    h = hashlib.sha256("|".join(str(p) for p in parts).encode()).hexdigest()
    return random.Random(int(h[:16], 16))


def fmt(s, f):
    return s.format(**f)


def make_plan(fam, rng, long=False):
    spec = content.FAMILIES[fam]
    plan = {"title": rng.randrange(len(spec["titles"])), "secs": []}
    for sec in spec["sections"]:
        inc = long or rng.random() < sec.get("opt", 1.0)
        sp = {"inc": inc, "h": rng.randrange(len(sec["heading"])) if sec.get("heading") else None}
        if sec["kind"] in ("para", "list"):
            lo, hi = sec["n"]
            if long:
                lo, hi = hi, hi + 1
            n = min(rng.randint(lo, hi), len(sec["pool"]))
            idx = rng.sample(range(len(sec["pool"])), n)
            if sec["kind"] == "para":
                idx = sorted(idx)
            sp["idx"] = idx
            sp["var"] = [rng.randrange(len(sec["pool"][i])) for i in idx]
        plan["secs"].append(sp)
    return plan


def build(fam, facts, plan, trng):
    """Return list of blocks.  trng drives table contents."""
    spec = content.FAMILIES[fam]
    blocks = [{"t": "h1", "text": fmt(spec["titles"][plan["title"]], facts),
               "alts": [fmt(t, facts) for i, t in enumerate(spec["titles"]) if i != plan["title"]]}]
    for si, (sec, sp) in enumerate(zip(spec["sections"], plan["secs"])):
        if not sp["inc"]:
            continue
        if sp["h"] is not None:
            blocks.append({"t": "h2", "text": fmt(sec["heading"][sp["h"]], facts)})
        if sec["kind"] == "para":
            sents = []
            for i, v in zip(sp["idx"], sp["var"]):
                alts = [fmt(a, facts) for a in sec["pool"][i]]
                sents.append({"text": alts[v], "alts": [a for j, a in enumerate(alts) if j != v]})
            spare = [fmt(sec["pool"][i][0], facts) for i in range(len(sec["pool"])) if i not in sp["idx"]]
            blocks.append({"t": "p", "sents": sents, "spare": spare})
        elif sec["kind"] == "list":
            items = [fmt(sec["pool"][i][0], facts) for i in sp["idx"]]
            blocks.append({"t": "ul", "items": items})
        else:
            blocks.append({"t": "table", "rows": content.table(sec["builder"], facts, trng)})
    # split long paragraphs (> 3 sentences) so that renderers get natural paragraphs
    return blocks


def lines(blocks):
    out = []
    for b in blocks:
        if b["t"] in ("h1", "h2"):
            out.append(b["text"])
        elif b["t"] == "p":
            out.append(" ".join(s["text"] for s in b["sents"]))
        elif b["t"] == "ul":
            out.extend(b["items"])
        elif b["t"] == "table":
            out.extend("\t".join(r) for r in b["rows"])
    return out


def nwords(blocks):
    return sum(len(l.split()) for l in lines(blocks))


def first_sentence(blocks):
    for b in blocks:
        if b["t"] == "p" and b["sents"]:
            return b["sents"][0]["text"]
    return ""


def headings(blocks):
    return [b["text"] for b in blocks if b["t"] == "h2"]


def mutate_plan(fam, plan, rng, strength):
    spec = content.FAMILIES[fam]
    p = copy.deepcopy(plan)
    if rng.random() < strength:
        p["title"] = rng.randrange(len(spec["titles"]))
    for sec, sp in zip(spec["sections"], p["secs"]):
        if sec["kind"] == "table":
            continue
        if "opt" in sec and rng.random() < strength * 0.4:
            sp["inc"] = not sp["inc"]
        pool = len(sec["pool"])
        for k in range(len(sp["idx"])):
            if rng.random() < strength:
                unused = [i for i in range(pool) if i not in sp["idx"]]
                if unused:
                    sp["idx"][k] = rng.choice(unused)
                    sp["var"][k] = rng.randrange(len(sec["pool"][sp["idx"][k]]))
            elif rng.random() < strength * 0.6:
                sp["var"][k] = rng.randrange(len(sec["pool"][sp["idx"][k]]))
    return p


# ---------------------------------------------------------------------------
# edit operations for republications
# ---------------------------------------------------------------------------
def _sent_refs(blocks):
    return [(bi, si) for bi, b in enumerate(blocks) if b["t"] == "p" for si in range(len(b["sents"]))]


def op_reword(blocks, rng, facts):
    refs = [(bi, si) for bi, si in _sent_refs(blocks) if blocks[bi]["sents"][si]["alts"]]
    if not refs:
        return None
    bi, si = rng.choice(refs)
    s = blocks[bi]["sents"][si]
    new = rng.choice(s["alts"])
    s["alts"] = [a for a in s["alts"] if a != new] + [s["text"]]
    s["text"] = new
    return "reword sentence %d of block %d" % (si + 1, bi + 1)


def op_drop(blocks, rng, facts):
    refs = [(bi, si) for bi, si in _sent_refs(blocks) if len(blocks[bi]["sents"]) >= 2]
    if not refs:
        return None
    bi, si = rng.choice(refs)
    del blocks[bi]["sents"][si]
    return "drop sentence %d of block %d" % (si + 1, bi + 1)


def op_add(blocks, rng, facts):
    cands = [bi for bi, b in enumerate(blocks) if b["t"] == "p" and b["spare"]]
    if not cands:
        return None
    bi = rng.choice(cands)
    b = blocks[bi]
    text = b["spare"].pop(rng.randrange(len(b["spare"])))
    pos = rng.randint(0, len(b["sents"]))
    b["sents"].insert(pos, {"text": text, "alts": []})
    return "add sentence at position %d of block %d" % (pos + 1, bi + 1)


def op_swap(blocks, rng, facts):
    cands = [bi for bi, b in enumerate(blocks) if b["t"] == "ul" and len(b["items"]) >= 2]
    if not cands:
        return None
    bi = rng.choice(cands)
    it = blocks[bi]["items"]
    k = rng.randrange(len(it) - 1)
    it[k], it[k + 1] = it[k + 1], it[k]
    return "swap list items %d and %d of block %d" % (k + 1, k + 2, bi + 1)


def op_retitle(blocks, rng, facts):
    h = blocks[0]
    if not h["alts"]:
        return None
    new = rng.choice(h["alts"])
    h["alts"] = [a for a in h["alts"] if a != new] + [h["text"]]
    h["text"] = new
    return "retitle"


def op_append(blocks, rng, facts):
    text = fmt(rng.choice(content.APPEND), facts)
    blocks.append({"t": "p", "sents": [{"text": text, "alts": []}], "spare": []})
    return "append paragraph"


OPS = [op_reword, op_drop, op_add, op_swap, op_retitle, op_append]


SYN = {"about": "around", "around": "about", "nearly": "almost", "usually": "normally", "normally": "usually",
       "please": "kindly", "start": "begin", "starts": "begins", "help": "assist", "each": "every",
       "every": "each", "large": "big", "quickly": "promptly", "roughly": "approximately", "most": "many",
       "short": "brief", "also": "too", "first": "initial", "extra": "additional", "free": "complimentary"}


def word_edits(blocks, rng, k):
    """~1 % word substitutions inside paragraphs; returns list of op strings."""
    ops = []
    done = set()
    for _ in range(k):
        cands = []
        for bi, b in enumerate(blocks):
            if b["t"] != "p":
                continue
            for si, s in enumerate(b["sents"]):
                ws = s["text"].split(" ")
                for wi, w in enumerate(ws):
                    if w in SYN and (bi, si, wi) not in done:
                        cands.append((bi, si, wi))
        if not cands:
            break
        bi, si, wi = rng.choice(cands)
        s = blocks[bi]["sents"][si]
        ws = s["text"].split(" ")
        old = ws[wi]
        ws[wi] = SYN[old]
        done.add((bi, si, wi))
        s["text"] = " ".join(ws)
        s["alts"] = []
        ops.append("word %s->%s" % (old, ws[wi]))
    return ops
