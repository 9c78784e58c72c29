# -*- coding: utf-8 -*-
"""Body generation from the hand-written families: facts, variant choices,
section selection, edit operations, shingle Jaccard."""
import re
import datetime

from content_a import FAMILIES as _FA
from content_b import FAMILIES as _FB
from content_c import install as _install

FAMILIES = {}
FAMILIES.update(_FA)
FAMILIES.update(_FB)
_install(FAMILIES)

FIRST = ["Marta", "Oskar", "Priya", "Tomasz", "Eleni", "Callum", "Ines", "Rafferty", "Yusra", "Bram", "Delphine", "Kofi", "Agnieszka",
         "Hamish", "Noor", "Lucan", "Saoirse", "Dmitri", "Wren", "Anouk", "Teodor", "Maelle", "Idris", "Fenna", "Gethin", "Ottilie"]
LAST = ["Quillfeather", "Ashdown", "Varga", "Pennick", "Okonedo", "Brightwater", "Lindqvist", "Marchbank", "Halloran", "Tiernan", "Castellane",
        "Drummore", "Whitlock", "Ferreira", "Nakashima", "Oyelaran", "Strand", "Kellaway", "Moravec", "Thistlewood", "Garside", "Pellow"]
MONTHS = ["January", "February", "March", "April", "May", "June", "July", "August", "September", "October", "November", "December"]
WEEKDAYS = ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday"]
WD7 = ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"]

GLOBAL_POOLS = dict(
    pay=["Debit card", "Credit card", "Plume Wallet", "Bracken gift card", "Bank transfer", "Pay in three instalments"],
    note=["Not available for furniture", "Subject to a credit check", "Can be combined with vouchers", "UK billing addresses only", "Refunds go back to the same card"],
    cost=["Coach fare", "Entry to the railway", "Footplate ride", "Lunch in the buffet", "Guided tour"],
    acct=["Current account", "Exhibition fund", "Layout fund", "Library fund"],
    temp=["195", "205", "215", "230", "240", "250"],
    speed=["35", "45", "60", "80", "100"],
    volt=["3.3", "5", "7.5", "9", "12"],
    port=["7443", "8600", "9120", "6380"],
    version=["3.2", "3.4", "4.0", "4.1"],
    room=["Lecture Theatre B", "the Harland Room", "Seminar Room 2.14"],
    fil=["PLA", "PETG"],
)

MORNING = ["7am", "7:30am", "8am", "8:30am", "9am", "9:30am", "10am"]
AFTERNOON = ["3pm", "3:30pm", "4pm", "4:30pm", "5pm", "6pm", "7:30pm"]
BASE_DATE = datetime.date(2026, 1, 5)


def fmt_date(d):
    return "%d %s %d" % (d.day, MONTHS[d.month - 1], d.year)


def tokens(text):
    return re.sub(r"[^\w\s]", "", text.lower()).split()


def shingles(lines):
    t = tokens("\n".join(lines))
    return set(tuple(t[i:i + 5]) for i in range(len(t) - 4))


def jaccard(a, b):
    if not a and not b:
        return 1.0
    return len(a & b) / len(a | b)


def pick_pools(fam):
    pools = dict(GLOBAL_POOLS)
    pools.update(fam["pools"])
    return pools


def draw_scalar(rng):
    f = {}
    d1 = BASE_DATE + datetime.timedelta(days=rng.randint(0, 300))
    d2 = d1 + datetime.timedelta(days=rng.randint(7, 40))
    d3 = d2 + datetime.timedelta(days=rng.randint(5, 30))
    f["date1"], f["date2"], f["date3"] = fmt_date(d1), fmt_date(d2), fmt_date(d3)
    f["month3"] = MONTHS[d3.month - 1]
    f["month_prev"] = MONTHS[(d1.month - 3) % 12]
    f["year_prev"] = str(2026 - rng.randint(1, 7))
    wd = rng.sample(WEEKDAYS, 2)
    f["wd1"], f["wd2"] = wd
    f["time1"], f["time2"] = rng.choice(MORNING), rng.choice(AFTERNOON)
    ns = rng.sample(range(2, 10), 2)
    f["n_small"], f["n_small2"] = str(ns[0]), str(ns[1])
    f["n_mid"] = str(rng.randint(12, 95))
    f["n_big"] = str(rng.randint(130, 980))
    f["money"] = "\u00a3{:,}".format(rng.randint(12, 950) * 100)
    f["price"] = "\u00a3%d.%s" % (rng.randint(3, 40), rng.choice(["00", "50", "95"]))
    f["pct"] = str(rng.randint(10, 70))
    f["phone"] = "01632 960%03d" % rng.randint(0, 999)
    f["ref"] = "RC/%04d" % rng.randint(1000, 9999)
    names = []
    while len(names) < 3:
        n = rng.choice(FIRST) + " " + rng.choice(LAST)
        if n not in names:
            names.append(n)
    f["person"], f["person2"], f["person3"] = names
    f["date_r"] = f["date1"]
    f["wd_r"], f["wd2_r"] = rng.choice(WD7), rng.choice(WD7)
    return f


def make_facts(fam, rng):
    f = draw_scalar(rng)
    for k, vals in sorted(pick_pools(fam).items()):
        v = list(vals)
        rng.shuffle(v)
        f[k] = v[0]
        f[k + "2"] = v[1] if len(v) > 1 else v[0]
    if "comp" in f:
        f["comp_key"] = f["comp"].replace(" ", "_")
    return f


def vary_facts(fam, facts, rng):
    """Twin facts: same item, different dates/numbers/people and the keys listed in fam['vary']."""
    new = make_facts(fam, rng)
    out = dict(facts)
    scalar = ["date1", "date2", "date3", "month3", "month_prev", "year_prev", "wd1", "wd2", "time1", "time2", "n_small", "n_small2",
              "n_mid", "n_big", "money", "price", "pct", "phone", "ref", "person", "person2", "person3"]
    for k in scalar:
        out[k] = new[k]
    for k in fam.get("vary", []):
        out[k] = new[k]
        if k + "2" in new:
            out[k + "2"] = new[k + "2"]
    if "comp" in out:
        out["comp_key"] = out["comp"].replace(" ", "_")
    return out


class SafeDict(dict):
    def __missing__(self, key):
        raise KeyError(key)


def fill(template, facts):
    s = template.format_map(SafeDict(facts))
    if "{" in s:  # pool values may themselves hold placeholders
        s = s.format_map(SafeDict(facts))
    return s[0].upper() + s[1:] if s else s


class Chooser:
    """Variant choices keyed by slot id, so a twin can reuse most of them."""

    def __init__(self, rng, inherited=None, keep=1.0):
        self.rng = rng
        self.c = {}
        self.inh = inherited or {}
        self.keep = keep

    def get(self, key, maker):
        if key in self.c:
            return self.c[key]
        if key in self.inh and self.rng.random() < self.keep:
            v = self.inh[key]
        else:
            v = maker()
        self.c[key] = v
        return v


def slot_variants(slot):
    return [s.strip() for s in slot.split(" || ")]


def render_section(fam_id, si, sec, facts, ch, rng):
    out = []
    for bi, blk in enumerate(sec["blocks"]):
        key = "%s:%d:%d" % (fam_id, si, bi)
        kind = blk[0]
        if kind == "h2":
            vs = slot_variants(blk[1])
            j = ch.get(key, lambda: rng.randrange(len(vs)))
            out.append({"k": "h2", "t": fill(vs[j % len(vs)], facts)})
        elif kind == "p":
            sents = []
            for sj, slot in enumerate(blk[1]):
                vs = slot_variants(slot)
                j = ch.get(key + ":%d" % sj, lambda: rng.randrange(len(vs)))
                rendered = [fill(v, facts) for v in vs]
                sents.append({"t": rendered[j % len(vs)], "alts": [r for i, r in enumerate(rendered) if i != j % len(vs)]})
            out.append({"k": "p", "s": sents})
        elif kind in ("ul", "ol"):
            items, k = blk[1], blk[2]
            n = ch.get(key + ":n", lambda: rng.randint(*k))
            if len(items) == 1 and "_r}" in items[0]:
                rows = row_facts(fam_id, facts, n, rng)
                if kind == "ol":  # numbered steps keep the hand-written order of the pool
                    pk = re.search(r"\{(\w+)_r\}", items[0]).group(1)
                    pool = pick_pools(FAMILIES[fam_id])[pk]
                    rows.sort(key=lambda rf: pool.index(rf[pk + "_r"]))
                lis = [fill(slot_variants(items[0])[0], rf) for rf in rows]
            else:
                idx = ch.get(key + ":idx", lambda: sorted(rng.sample(range(len(items)), min(n, len(items)))))
                lis = []
                for ii in idx:
                    vs = slot_variants(items[ii])
                    j = ch.get(key + ":%d" % ii, lambda: rng.randrange(len(vs)))
                    lis.append(fill(vs[j % len(vs)], facts))
            out.append({"k": kind, "items": lis})
        elif kind == "table":
            header, rowt, k = blk[1], blk[2], blk[3]
            n = ch.get(key + ":n", lambda: rng.randint(*k))
            rows = [header.split("|")]
            for rf in row_facts(fam_id, facts, n, rng):
                rows.append([c.strip() for c in fill(rowt[0], rf).split("|")])
            out.append({"k": "table", "rows": rows})
    return out


def row_facts(fam_id, facts, n, rng):
    fam = FAMILIES[fam_id]
    pools = pick_pools(fam)
    sh = {}
    for k, vals in sorted(pools.items()):
        v = list(vals)
        rng.shuffle(v)
        sh[k] = v
    res = []
    for i in range(n):
        sc = draw_scalar(rng)
        rf = dict(facts)
        for k, v in sc.items():
            rf[k + "_r"] = v
        rf["date_r"] = sc["date1"]
        rf["wd_r"], rf["wd2_r"] = sc["wd1"], sc["wd2"]
        for k, v in sh.items():
            rf[k + "_r"] = v[i % len(v)]
        rf["i"] = str(i + 1)
        res.append(rf)
    return res


def block_lines(b):
    if b["k"] in ("title", "h2"):
        return [b["t"]]
    if b["k"] == "p":
        return [" ".join(s["t"] for s in b["s"])]
    if b["k"] in ("ul", "ol"):
        return list(b["items"])
    if b["k"] == "table":
        return ["\t".join(r) for r in b["rows"]]
    raise ValueError(b["k"])


def body_lines(body):
    out = []
    for b in body:
        out.extend(block_lines(b))
    return out


def nwords(lines):
    return len(tokens("\n".join(lines)))


def generate(fam_id, facts, ch, rng, target):
    """Return body (list of blocks). Section selection is itself a choice."""
    fam = FAMILIES[fam_id]
    tvs = slot_variants(fam["title"][0])
    tj = ch.get(fam_id + ":title", lambda: rng.randrange(len(tvs)))
    title = {"k": "title", "t": fill(tvs[tj % len(tvs)], facts)}
    secs = [render_section(fam_id, si, sec, facts, ch, rng) for si, sec in enumerate(fam["sections"])]
    opt = [i for i, s in enumerate(fam["sections"]) if s["opt"]]

    def choose_sel():
        order = list(opt)
        rng.shuffle(order)
        tot = nwords([title["t"]]) + sum(nwords(body_lines(secs[i])) for i in range(len(secs)) if i not in opt)
        sel = []
        for i in order:
            w = nwords(body_lines(secs[i]))
            if tot + w <= target:
                sel.append(i)
                tot += w
        return sorted(sel)

    sel = ch.get(fam_id + ":sel", choose_sel)
    body = [title]
    for i, s in enumerate(secs):
        if i in opt and i not in sel:
            continue
        for b in s:
            b["sec"] = i
        body.extend(s)
    return body


# ------------------------------------------------------------------ edits
EDIT_NOTES = [
    "This notice was updated to correct the contact details.",
    "An earlier version of this page gave the wrong start date.",
    "Updated with the latest information from the organisers.",
    "This page has been reissued with minor corrections.",
    "The wording of this section was clarified after readers got in touch.",
    "Details were checked again before this version was published.",
    "This version replaces the one circulated last week.",
    "A few details have changed since this was first published.",
]
REPUB_PARAS = [
    "This item first appeared on another site and is republished here with permission.",
    "We are sharing this because several readers asked us about it.",
    "Reproduced with thanks to the original authors, with small changes for our readers.",
    "If you spot anything out of date, please let us know and we will pass it on.",
    "Shared for members who do not follow the original page.",
    "Republished with a few local details added.",
]
SYN = [("about", "around"), ("usually", "normally"), ("large", "big"), ("begin", "start"), ("every", "each"), ("expected", "due"),
       ("buy", "purchase"), ("check", "confirm"), ("shop", "store"), ("small", "little"), ("quickly", "promptly"), ("help", "assist"),
       ("also", "additionally"), ("need", "require"), ("people", "residents"), ("start", "begin"), ("each", "every"), ("around", "about")]


def clone(body):
    out = []
    for b in body:
        nb = dict(b)
        if b["k"] == "p":
            nb["s"] = [dict(s, alts=list(s["alts"])) for s in b["s"]]
        elif b["k"] in ("ul", "ol"):
            nb["items"] = list(b["items"])
        elif b["k"] == "table":
            nb["rows"] = [list(r) for r in b["rows"]]
        out.append(nb)
    return out


def op_reword(body, rng):
    cands = [(bi, si) for bi, b in enumerate(body) if b["k"] == "p" for si, s in enumerate(b["s"]) if s["alts"]]
    if not cands:
        return None
    bi, si = rng.choice(cands)
    s = body[bi]["s"][si]
    new = rng.choice(s["alts"])
    s["alts"] = [a for a in s["alts"] if a != new] + [s["t"]]
    s["t"] = new
    return "reword"


def op_drop_sentence(body, rng):
    cands = [(bi, si) for bi, b in enumerate(body) if b["k"] == "p" and len(b["s"]) > 1 for si in range(1, len(b["s"]))]
    if not cands:
        return None
    bi, si = rng.choice(cands)
    del body[bi]["s"][si]
    return "drop-sentence"


def op_add_note(body, rng, notes=EDIT_NOTES):
    cands = [bi for bi, b in enumerate(body) if b["k"] == "p"]
    if not cands:
        return None
    bi = rng.choice(cands)
    body[bi]["s"].append({"t": rng.choice(notes), "alts": []})
    return "add-sentence"


def op_drop_item(body, rng):
    cands = [bi for bi, b in enumerate(body) if (b["k"] in ("ul", "ol") and len(b["items"]) > 2) or (b["k"] == "table" and len(b["rows"]) > 3)]
    if not cands:
        return None
    bi = rng.choice(cands)
    b = body[bi]
    if b["k"] == "table":
        del b["rows"][rng.randrange(1, len(b["rows"]))]
    else:
        del b["items"][rng.randrange(len(b["items"]))]
    return "drop-item"


def op_swap_items(body, rng):
    cands = [bi for bi, b in enumerate(body) if b["k"] in ("ul", "ol") and len(b["items"]) > 2]
    if not cands:
        return None
    b = body[rng.choice(cands)]
    i = rng.randrange(len(b["items"]) - 1)
    b["items"][i], b["items"][i + 1] = b["items"][i + 1], b["items"][i]
    return "swap-items"


def op_add_para(body, rng):
    body.append({"k": "p", "sec": 99, "s": [{"t": rng.choice(REPUB_PARAS), "alts": []}]})
    return "add-paragraph"


def op_retitle(body, rng):
    t = body[0]["t"]
    if t.startswith("Updated:") or t.endswith("(reissued)"):
        return None
    body[0]["t"] = rng.choice(["Updated: " + t, t + " (reissued)"])
    return "retitle"


REPUB_OPS = [op_reword, op_reword, op_drop_sentence, op_add_note, op_drop_item, op_swap_items, op_add_para, op_retitle]


def op_synonym(body, rng):
    cands = []
    for bi, b in enumerate(body):
        if b["k"] != "p":
            continue
        for si, s in enumerate(b["s"]):
            for a, r in SYN:
                for m in re.finditer(r"\b%s\b" % a, s["t"]):
                    cands.append((bi, si, m.start(), a, r))
    if not cands:
        return None
    bi, si, pos, a, r = rng.choice(cands)
    s = body[bi]["s"][si]
    s["t"] = s["t"][:pos] + r + s["t"][pos + len(a):]
    return "synonym:%s->%s" % (a, r)


def op_typo_fix(body, rng):
    # drop a doubled or filler word: "the" before a noun phrase is removed once
    cands = [(bi, si) for bi, b in enumerate(body) if b["k"] == "p" for si, s in enumerate(b["s"]) if " the " in s["t"]]
    if not cands:
        return None
    bi, si = rng.choice(cands)
    s = body[bi]["s"][si]
    s["t"] = s["t"].replace(" the ", " ", 1)
    return "drop-article"
