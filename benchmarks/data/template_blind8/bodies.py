"""Body generation and edit operations (deterministic; all randomness from passed-in random.Random)."""
import re
import copy
from content import FIRST, LAST, MONTHS, DAYS, SYN

STOCK_APPEND = [
    "Update on {date}: this page was checked by {name} and the details above are still correct.",
    "Added {date}: thank you to everyone who got in touch about this; {name} has answered each message.",
    "Editor's note: a shorter version of this item was read out at the meeting in {place} on {day}.",
    "Update: the arrangements described here were confirmed again on {date} after a call with {name}.",
]


ALL_NAMES = [a + " " + b for a in FIRST for b in LAST]


MINUTE_FOLLOW = [
    "Action: the clerk to write to {name2} by {date} and report back.",
    "Resolved unanimously on a proposal from Councillor {name3}.",
    "Councillor {name4} asked that the matter return to the agenda in {month}.",
    "It was noted that {n2} residents had written to the council about this.",
    "The vote was {n1} in favour with one abstention.",
    "Councillor {name3} will circulate a short report before the next meeting.",
]


def make_facts(site, rng):
    f = {}
    names = rng.sample(ALL_NAMES, 6)
    for i, n in enumerate(names):
        f["name" if i == 0 else "name%d" % (i + 1)] = n
    vocab = dict(site["vocab"])
    vocab.update(site.get("vocab_extra", {}))
    for k, v in vocab.items():
        if len(v) >= 2:
            a, b = rng.sample(v, 2)
        else:
            a = b = v[0]
        f.setdefault(k, a)
        f.setdefault(k + "2", b)
    if "place" not in f:
        a, b = rng.sample(["Ashgrove", "Little Ashgrove", "Fernhill", "Coldharbour", "Wending", "Stapleford Cross"], 2)
        f["place"], f["place2"] = a, b
    f["n1"] = str(rng.randint(2, 9))
    f["n2"] = str(rng.randint(11, 95))
    f["n3"] = str(rng.randint(101, 989))
    f["n4"] = str(rng.randint(1100, 9800))
    m = rng.sample(MONTHS, 2)
    f["month"], f["month2"] = m
    f["day"] = rng.choice(DAYS)
    f["date"] = "%d %s" % (rng.randint(1, 28), rng.choice(MONTHS))
    f["time"] = "%02d:%02d" % (rng.randint(6, 13), rng.choice([0, 15, 30, 45]))
    f["time2"] = "%02d:%02d" % (rng.randint(14, 22), rng.choice([0, 10, 20, 40, 50]))
    return f


def fill(t, f):
    return t.format_map(f)


def gen_body(site, fam, facts, rng, flip_p=0.5):
    """Return a body: list of blocks. p blocks hold sentences as [shown, alternative]."""
    blocks = []
    t = rng.choice(fam["titles"])
    a, b = fill(t[0], facts), fill(t[1], facts)
    a, b = a[0].upper() + a[1:], b[0].upper() + b[1:]
    if rng.random() < flip_p * 0.4:
        a, b = b, a
    blocks.append({"t": "h1", "s": [a, b]})
    for bl in fam["blocks"]:
        kind = bl[0]
        if kind == "p":
            sents = []
            for i, (x, y) in enumerate(bl[1]):
                if i > 0 and rng.random() < 0.2:
                    continue
                x, y = fill(x, facts), fill(y, facts)
                if rng.random() < flip_p:
                    x, y = y, x
                sents.append([x, y])
            blocks.append({"t": "p", "s": sents})
        elif kind == "h2":
            blocks.append({"t": "h2", "text": rng.choice(bl[1])})
        elif kind == "ul":
            k = rng.randint(bl[2], bl[3])
            items = rng.sample(bl[1], k)
            blocks.append({"t": "ul", "items": [fill(x, facts) for x in items]})
        elif kind == "table":
            k = rng.randint(bl[3], bl[4])
            rows = [list(bl[1])]
            for i in range(k):
                rt = bl[2][i % len(bl[2])]
                rf = dict(facts)
                rf.update({kk: vv for kk, vv in make_facts(site, rng).items() if kk not in ("date",) or i > 0})
                if i == 0:
                    rf = facts
                rows.append([fill(c, rf) for c in rt])
            blocks.append({"t": "table", "rows": rows})
        elif kind == "loop":
            items = fam["items"]
            k = rng.randint(bl[2], bl[3])
            idx = sorted(rng.sample(range(1, len(items) - 1), k - 2)) + [len(items) - 1]
            idx = [0] + idx
            for n, i in enumerate(idx):
                sf = make_facts(site, rng)
                sf["n1"] = str(rng.randint(3, 12))
                blocks.append({"t": "h2", "text": "%d. %s" % (n + 1, items[i][0])})
                ss = [[fill(items[i][1], sf), fill(items[i][1], sf)]]
                if rng.random() < 0.6:
                    x = fill(rng.choice(MINUTE_FOLLOW), sf)
                    ss.append([x, x])
                blocks.append({"t": "p", "s": ss})
    # links for reference-style markdown / html anchors
    for bi, bl in enumerate(blocks):
        if bl["t"] == "p" and rng.random() < 0.35:
            s = bl["s"][-1][0]
            w = re.findall(r"[A-Za-z]+", s)
            if len(w) >= 3:
                phrase = " ".join(w[-2:])
                if phrase in s:
                    bl["link"] = (phrase, "https://%s/info/%s" % (site["host"], phrase.lower().replace(" ", "-")))
    return blocks


def body_lines(blocks):
    out = []
    for b in blocks:
        t = b["t"]
        if t == "h1":
            out.append(b["s"][0])
        elif t == "h2":
            out.append(b["text"])
        elif t == "p":
            txt = " ".join(s[0] for s in b["s"]).strip()
            if txt:
                out.append(txt)
        elif t in ("ul", "ol"):
            out.extend(b["items"])
        elif t == "table":
            out.extend("\t".join(r) for r in b["rows"])
    return out


def body_text(blocks):
    return "\n".join(body_lines(blocks))


def shingles(text):
    t = re.sub(r"[^\w\s]", "", text.lower()).split()
    return frozenset(tuple(t[i:i + 5]) for i in range(len(t) - 4))


def jacc(a, b):
    if not a and not b:
        return 1.0
    return len(a & b) / len(a | b)


# ------------------------------------------------------------------ edit operations
def op_reword(bl, rng, ctx):
    cand = [(i, j) for i, b in enumerate(bl) if b["t"] == "p" for j, s in enumerate(b["s"]) if s[0] != s[1]]
    if not cand:
        return None
    i, j = rng.choice(cand)
    s = bl[i]["s"][j]
    s[0], s[1] = s[1], s[0]
    return "reword(sentence %d of block %d)" % (j + 1, i + 1)


def op_drop(bl, rng, ctx):
    cand = [(i, j) for i, b in enumerate(bl) if b["t"] == "p" and len(b["s"]) >= 2 for j in range(1, len(b["s"]))]
    if not cand:
        return None
    i, j = rng.choice(cand)
    del bl[i]["s"][j]
    return "drop-sentence(block %d)" % (i + 1)


def op_add(bl, rng, ctx):
    ex = ctx["fam"].get("extras") or []
    ps = [i for i, b in enumerate(bl) if b["t"] == "p"]
    if not ex or not ps:
        return None
    s = fill(rng.choice(ex), ctx["facts"])
    if any(s == x[0] for b in bl if b["t"] == "p" for x in b["s"]):
        return None
    i = rng.choice(ps)
    bl[i]["s"].append([s, s])
    return "add-sentence(block %d)" % (i + 1)


def op_swap(bl, rng, ctx):
    cand = [i for i, b in enumerate(bl) if b["t"] in ("ul",) and len(b["items"]) >= 2]
    cand2 = [i for i, b in enumerate(bl) if b["t"] == "table" and len(b["rows"]) >= 3]
    if cand:
        i = rng.choice(cand)
        it = bl[i]["items"]
        k = rng.randrange(len(it) - 1)
        it[k], it[k + 1] = it[k + 1], it[k]
        return "swap-list-items(%d,%d)" % (k + 1, k + 2)
    if cand2:
        i = rng.choice(cand2)
        r = bl[i]["rows"]
        k = rng.randrange(1, len(r) - 1)
        r[k], r[k + 1] = r[k + 1], r[k]
        return "swap-table-rows(%d,%d)" % (k, k + 1)
    return None


def op_retitle(bl, rng, ctx):
    h = bl[0]
    if h["s"][0] == h["s"][1]:
        return None
    h["s"] = [h["s"][1], h["s"][0]]
    return "retitle"


def op_append(bl, rng, ctx):
    s = fill(rng.choice(STOCK_APPEND), ctx["facts"])
    bl.append({"t": "p", "s": [[s, s]]})
    return "append-paragraph"


OPS = [op_reword, op_drop, op_add, op_swap, op_retitle, op_append]


def word_edit(bl, rng):
    """~1 % word edit: swap one common word for a synonym."""
    cand = []
    for i, b in enumerate(bl):
        if b["t"] == "p":
            for j, s in enumerate(b["s"]):
                for w in SYN:
                    if re.search(r"\b%s\b" % w, s[0]):
                        cand.append((i, j, w))
    if not cand:
        return None
    i, j, w = rng.choice(cand)
    s = bl[i]["s"][j]
    s[0] = re.sub(r"\b%s\b" % w, SYN[w], s[0], count=1)
    s[1] = s[0]
    return "word-edit(%s->%s)" % (w, SYN[w])
