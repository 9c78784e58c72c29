"""Page-family engine: hand-written sentence slots with alternative phrasings, filled with facts.

A family has titles (alternatives), sections (optional heading alternatives, sentence slots,
an optional list or table builder) and an 'extra' pool used by the add-sentence edit.
A plan records which alternative each slot uses and which units are switched on, so that
twins and republications can be derived from it by hand-written edit operations.
"""
import copy
import re

from .common import body_lines, words


class Opt(list):
    """An optional sentence slot (may be dropped to shorten a page)."""


PARA = "/"  # paragraph break marker inside a section's sentence list


class Section:
    def __init__(self, h=None, s=(), items=None, table=None, opt=False, min_items=2):
        self.h = h          # list of heading alternatives or None
        self.s = list(s)    # slots (list / Opt of alternative strings) and PARA markers
        self.items = items  # fn(r, facts) -> list of item strings
        self.table = table  # fn(r, facts) -> rows (first row = header)
        self.opt = opt
        self.min_items = min_items


class Family:
    def __init__(self, site, name, urlpath, facts, titles, sections, extra=(), size=(60, 250)):
        self.site = site
        self.name = name
        self.urlpath = urlpath
        self.facts = facts
        self.titles = titles
        self.sections = sections
        self.extra = list(extra)
        self.size = size

    @property
    def key(self):
        return f"{self.site}/{self.name}"


def fill(tpl, facts):
    t = tpl.format(**facts)
    return t[:1].upper() + t[1:]


def new_plan(fam, r, facts=None):
    facts = facts if facts is not None else fam.facts(r)
    plan = {"fam": fam, "facts": facts, "title": r.randrange(len(fam.titles)),
            "title_override": None, "secs": [], "appended": []}
    for sec in fam.sections:
        sp = {"on": True, "h": r.randrange(len(sec.h)) if sec.h else None, "slots": [],
              "items": None, "table": None, "added": []}
        for slot in sec.s:
            if slot == PARA:
                sp["slots"].append(None)
            else:
                sp["slots"].append({"alt": r.randrange(len(slot)), "on": True,
                                    "opt": isinstance(slot, Opt)})
        if sec.items:
            sp["items"] = list(sec.items(r, facts))
        if sec.table:
            sp["table"] = [list(row) for row in sec.table(r, facts)]
        plan["secs"].append(sp)
    return plan


def clone(plan):
    fam = plan["fam"]
    plan["fam"] = None
    c = copy.deepcopy(plan)
    plan["fam"] = fam
    c["fam"] = fam
    return c


def to_blocks(plan):
    fam, facts = plan["fam"], plan["facts"]
    title = plan["title_override"] or fill(fam.titles[plan["title"]], facts)
    blocks = [("title", title)]
    for sec, sp in zip(fam.sections, plan["secs"]):
        if not sp["on"]:
            continue
        if sec.h:
            blocks.append(("h", fill(sec.h[sp["h"]], facts)))
        para = []
        for slot, st in zip(sec.s, sp["slots"]):
            if st is None:
                if para:
                    blocks.append(("p", para))
                para = []
                continue
            if st["on"]:
                para.append(fill(slot[st["alt"]], facts))
        for pos, text in sp["added"]:
            para.insert(min(pos, len(para)), text)
        if para:
            blocks.append(("p", para))
        if sp["items"]:
            blocks.append(("ul", [x[:1].upper() + x[1:] for x in sp["items"]]))
        if sp["table"]:
            blocks.append(("table", [list(r) for r in sp["table"]]))
    for text in plan["appended"]:
        blocks.append(("p", [text]))
    return blocks


def n_words(blocks):
    return len(words(" ".join(body_lines(blocks))))


def trim_to(plan, r, max_words):
    """Switch off optional units until the body fits under max_words."""
    fam = plan["fam"]
    guard = 0
    while n_words(to_blocks(plan)) > max_words and guard < 200:
        guard += 1
        units = []
        for si, (sec, sp) in enumerate(zip(fam.sections, plan["secs"])):
            if not sp["on"]:
                continue
            if sec.opt:
                units.append(("sec", si, None))
            for ti, st in enumerate(sp["slots"]):
                if st and st["on"] and st["opt"]:
                    units.append(("slot", si, ti))
            if sp["items"] and len(sp["items"]) > sec.min_items:
                units.append(("item", si, None))
            if sp["table"] and len(sp["table"]) > 3:
                units.append(("row", si, None))
        if not units:
            return False
        kind, si, ti = r.choice(units)
        sp = plan["secs"][si]
        if kind == "sec":
            sp["on"] = False
        elif kind == "slot":
            sp["slots"][ti]["on"] = False
        elif kind == "item":
            sp["items"].pop()
        else:
            sp["table"].pop()
    return n_words(to_blocks(plan)) <= max_words


def make_plan(fam, r, lo, hi, tries=40):
    for t in range(tries):
        plan = new_plan(fam, r)
        # randomly drop some optional material first for variety (less when a long page is wanted)
        pdrop = 0.3 if t % 2 == 0 else 0.0
        for sec, sp in zip(fam.sections, plan["secs"]):
            if sec.opt and r.random() < pdrop:
                sp["on"] = False
            for st in sp["slots"]:
                if st and st["opt"] and r.random() < pdrop:
                    st["on"] = False
        target = r.randint(lo, hi)
        trim_to(plan, r, target)
        n = n_words(to_blocks(plan))
        if lo <= n <= hi:
            return plan
    raise RuntimeError(f"cannot size {fam.key} into {lo}-{hi}")


# ---------------------------------------------------------------- edit operations (republication)

def op_reword(plan, r):
    fam = plan["fam"]
    cands = []
    for si, (sec, sp) in enumerate(zip(fam.sections, plan["secs"])):
        if not sp["on"]:
            continue
        for ti, (slot, st) in enumerate(zip(sec.s, sp["slots"])):
            if st and st["on"] and len(slot) > 1:
                cands.append((si, ti, len(slot)))
    if not cands:
        return None
    si, ti, n = r.choice(cands)
    st = plan["secs"][si]["slots"][ti]
    st["alt"] = (st["alt"] + r.randrange(1, n)) % n
    return f"reword(s{si}.{ti})"


def op_drop(plan, r):
    fam = plan["fam"]
    cands = []
    for si, sp in enumerate(plan["secs"]):
        if not sp["on"]:
            continue
        on = [ti for ti, st in enumerate(sp["slots"]) if st and st["on"]]
        if len(on) >= 2:
            cands.extend((si, ti) for ti in on[1:])
    if not cands:
        return None
    si, ti = r.choice(cands)
    plan["secs"][si]["slots"][ti]["on"] = False
    return f"drop-sentence(s{si}.{ti})"


def op_add(plan, r):
    fam = plan["fam"]
    if not fam.extra:
        return None
    used = {t for sp in plan["secs"] for _, t in sp["added"]}
    pool = [fill(e, plan["facts"]) for e in fam.extra]
    pool = [p for p in pool if p not in used]
    if not pool:
        return None
    secs = [si for si, (sec, sp) in enumerate(zip(fam.sections, plan["secs"]))
            if sp["on"] and any(st and st["on"] for st in sp["slots"])]
    if not secs:
        return None
    si = r.choice(secs)
    text = r.choice(pool)
    plan["secs"][si]["added"].append((r.randint(1, 4), text))
    return f"add-sentence(s{si})"


def op_swap(plan, r):
    cands = [si for si, sp in enumerate(plan["secs"]) if sp["on"] and sp["items"] and len(sp["items"]) >= 2]
    if not cands:
        return None
    si = r.choice(cands)
    items = plan["secs"][si]["items"]
    i = r.randrange(len(items) - 1)
    items[i], items[i + 1] = items[i + 1], items[i]
    return f"swap-items(s{si}:{i}<->{i + 1})"


def op_retitle(plan, r):
    fam = plan["fam"]
    if len(fam.titles) < 2 or plan["title_override"]:
        return None
    n = len(fam.titles)
    plan["title"] = (plan["title"] + r.randrange(1, n)) % n
    return "retitle"


def op_append(plan, r, text):
    plan["appended"].append(text)
    return "append-paragraph"


OPS = {"reword": op_reword, "drop": op_drop, "add": op_add, "swap": op_swap, "retitle": op_retitle}


# ---------------------------------------------------------------- word edits (format copies)
SYNONYMS = [
    ("about", "around"), ("begins", "starts"), ("usually", "normally"), ("during", "throughout"),
    ("until", "till"), ("please", "kindly"), ("quickly", "promptly"), ("large", "sizeable"),
    ("small", "modest"), ("often", "frequently"), ("whole", "entire"), ("need", "require"),
    ("needs", "requires"), ("centre", "center"), ("organised", "organized"), ("colour", "color"),
    ("programme", "program"), ("must", "should"), ("start", "begin"), ("finished", "completed"),
    ("near", "close to"), ("enough", "sufficient"), ("buy", "purchase"), ("show", "display"),
    ("also", "additionally"), ("get", "obtain"), ("help", "support"), ("extra", "additional"),
]


def word_edit_blocks(blocks, r, n_edits):
    """Apply n hand-listed word substitutions; returns (new_blocks, ops)."""
    flat = []  # (block index, sub index)
    for bi, b in enumerate(blocks):
        if b[0] == "p":
            for si in range(len(b[1])):
                flat.append((bi, si))
        elif b[0] == "ul":
            for si in range(len(b[1])):
                flat.append((bi, si))
    blocks = [(b[0], list(b[1]) if isinstance(b[1], list) else b[1]) for b in blocks]
    ops = []
    order = list(range(len(flat)))
    r.shuffle(order)
    for idx in order:
        if len(ops) >= n_edits:
            break
        bi, si = flat[idx]
        text = blocks[bi][1][si]
        subs = [(a, b) for a, b in SYNONYMS if re.search(r"\b%s\b" % a, text)]
        if not subs:
            continue
        a, b = r.choice(subs)
        blocks[bi][1][si] = re.sub(r"\b%s\b" % a, b, text, count=1)
        ops.append(f"word:{a}->{b}")
    if len(ops) < n_edits:
        # fall back to a number correction
        for idx in order:
            if len(ops) >= n_edits:
                break
            bi, si = flat[idx]
            text = blocks[bi][1][si]
            m = re.search(r"\b(\d{2,3})\b", text)
            if m:
                v = int(m.group(1)) + 1
                blocks[bi][1][si] = text[:m.start()] + str(v) + text[m.end():]
                ops.append(f"number:{m.group(1)}->{v}")
    return blocks, ops
