"""Hand-written edit operations for republications and format copies."""
import re

import content_a
import content_b


def _alt_groups():
    groups = [getattr(content_a, n) for n in ("NOTICE_P2", "NOTICE_P3", "NEWS_CLOSE", "GUIDE_CLOSE", "WORKS_NEIGH", "TREAT_COST")]
    groups += [getattr(content_b, n) for n in ("REPAIR_CLOSE", "TT_WHY", "ADVICE_MID")]
    groups += [[content_b.TT_CLOSE, content_b.TT_CLOSE2], [content_b.STATION_NOTE, content_b.STATION_NOTE2]]
    return [g for g in groups if not any("{" in x for x in g)]


ALT_GROUPS = _alt_groups()

PHRASES = [("will be", "is going to be"), ("because of", "due to"), ("as soon as", "the moment"), ("normally", "usually"),
           ("straight away", "immediately"), ("at least", "no less than"), ("every day", "daily"), ("If you", "Should you"),
           ("about", "roughly"), ("a few", "several"), ("need to", "have to"), ("as well as", "and also"), ("close to", "near")]

WORD_SWAPS = [("about", "around"), ("normally", "usually"), ("start", "begin"), ("small", "little"), ("before", "prior to"),
              ("usually", "normally"), ("quickly", "fast"), ("free", "free of charge"), ("large", "big"), ("near", "close to"),
              ("until", "till"), ("ask", "request"), ("shown", "listed"), ("nearest", "closest")]


def _pat(word):
    return r"(?<![\w-])" + re.escape(word) + r"(?![\w-])"


ADD_SENTENCE = {
    "noticeboard": ["This notice was passed to the noticeboard by the organisation named above.",
                    "Please check the original source for any later changes."],
    "same": ["This version corrects an error in the earlier notice.", "Details on this page were checked again this week."],
    "other": ["We are sharing this notice because it affects many of our members.", "Reproduced with permission."],
}
APPEND_PARA = {
    "noticeboard": ["If you know someone who would find this useful, please pass it on. The noticeboard team cannot answer questions about the notice itself, so please contact the organisation directly."],
    "same": ["Update: this page has been revised since it was first published, and the information above replaces the earlier version."],
    "other": ["Members with questions about how this affects them are welcome to get in touch with us in the usual way."],
}
RETITLE = {"noticeboard": "Shared notice: {}", "same": "{} (updated)", "other": "Partner news: {}"}


def _sentences(p):
    return re.split(r"(?<=[.!?]) (?=[A-Z])", p)


SHORT_ALTS = [
    (r"Please allow extra time for your trip\.", "Allow a little longer for your journey."),
    (r"We will remove this notice once normal service resumes\.", "This notice comes down when the road reopens."),
    (r"Tea is served from half past three\.", "Tea is available beforehand."),
    (r"Bike parking is inside\.", "Bikes can be parked indoors."),
    (r"The course may be shortened at any rounding mark\.", "The race officer can shorten at any mark."),
    (r"Posted by a noticeboard volunteer\.", "Added by one of our volunteers."),
    (r"Shared by the organisers\.", "Sent in by the organisers."),
    (r"We are sorry for any inconvenience caused\.", "Apologies for the disruption."),
    (r"Step-free access is available through the west door\.", "Use the west door for step-free access."),
    (r"Please do not leave damaged or very old books\.", "Damaged books cannot be accepted."),
    (r"It is roughly a (\d+) minute walk\.", r"The walk takes about \1 minutes."),
    (r"Existing bookings have been transferred to ([A-Z][\w ]+)\.", r"Your booking now points to \1."),
    (r"A ([\w -]+) wind is forecast\.", r"The forecast says \1 winds."),
    (r"There is no need to book, and everyone is welcome\.", "Just turn up, all are welcome."),
    (r"Children must be accompanied by an adult at all times\.", "Children need an adult with them."),
    (r"We look forward to seeing you at your next visit\.", "See you at your next appointment."),
    (r"The committee thanks everyone who has helped\.", "Thanks to all who helped."),
    (r"Suggestions for speakers are always welcome\.", "Ideas for speakers are welcome."),
    (r"We are sorry for any inconvenience caused\.", "Sorry for the disruption."),
    (r"Thank you for bearing with us while the work is done\.", "Thanks for your patience during the work."),
    (r"Oil the chain and cables\.", "Put a little oil on the chain and cables."),
]


def op_reword_sentence(blocks, seed, ctx):
    """Replace one sentence with a hand-written alternative (shortest candidate first)."""
    cands = []
    for bi, (k, v) in enumerate(blocks):
        if k not in ("p", "li"):
            continue
        for pat, rep in SHORT_ALTS:
            m = re.search(pat, v)
            if m:
                new = re.sub(pat, rep, v, count=1)
                cands.append((len(m.group(0)), bi, v, new, m.group(0)))
        for g in ALT_GROUPS:
            for si, s in enumerate(g):
                if s in v:
                    alt = g[(si + 1 + seed % (len(g) - 1)) % len(g)]
                    if alt != s and alt not in v:
                        cands.append((len(s), bi, v, v.replace(s, alt, 1), s))
    if not cands:
        return None
    cands.sort(key=lambda c: (c[0], c[1]))
    _, bi, v, new, old = cands[0]
    nb = list(blocks)
    nb[bi] = (blocks[bi][0], new)
    return nb, "reword-sentence(block {}: '{}' -> alternative sentence)".format(bi, old[:40])


def op_reword_phrase(blocks, seed, ctx):
    cands = []
    for bi, (k, v) in enumerate(blocks):
        if k in ("p", "li"):
            for a, b in PHRASES:
                if re.search(_pat(a), v):
                    cands.append((bi, a, b))
    if not cands:
        return None
    bi, a, b = cands[seed % len(cands)]
    nb = list(blocks)
    nb[bi] = (blocks[bi][0], re.sub(_pat(a), b, blocks[bi][1], count=1))
    return nb, "reword('{}' -> '{}', block {})".format(a, b, bi)


def op_drop_sentence(blocks, seed, ctx):
    cands = [bi for bi, (k, v) in enumerate(blocks) if k == "p" and len(_sentences(v)) >= 2]
    if not cands:
        return None
    bi = cands[seed % len(cands)]
    ss = _sentences(blocks[bi][1])
    nb = list(blocks)
    nb[bi] = ("p", " ".join(ss[:-1]))
    return nb, "drop-sentence(block {}: '{}...')".format(bi, ss[-1][:30])


def op_add_sentence(blocks, seed, ctx):
    pool = ADD_SENTENCE[ctx]
    s = pool[seed % len(pool)]
    cands = [bi for bi, (k, v) in enumerate(blocks) if k == "p"]
    bi = cands[-1]
    nb = list(blocks)
    nb[bi] = ("p", blocks[bi][1] + " " + s)
    return nb, "add-sentence(block {}: '{}')".format(bi, s)


def op_swap_items(blocks, seed, ctx):
    for bi in range(len(blocks) - 1):
        if blocks[bi][0] == "li" and blocks[bi + 1][0] == "li":
            nb = list(blocks)
            nb[bi], nb[bi + 1] = blocks[bi + 1], blocks[bi]
            return nb, "swap-list-items({},{})".format(bi, bi + 1)
    return None


def op_retitle(blocks, seed, ctx):
    t = blocks[0][1]
    nb = list(blocks)
    nb[0] = ("h1", RETITLE[ctx].format(t))
    return nb, "retitle('{}')".format(nb[0][1])


def op_append_para(blocks, seed, ctx):
    pool = APPEND_PARA[ctx]
    nb = list(blocks) + [("p", pool[seed % len(pool)])]
    return nb, "append-paragraph"


REPUB_OPS = [op_reword_sentence, op_retitle, op_drop_sentence, op_swap_items, op_reword_phrase, op_add_sentence, op_append_para]


def word_edit(blocks, seed, n):
    """~1 % word-level edits for format copies."""
    nb = list(blocks)
    done = []
    cands = []
    for bi, (k, v) in enumerate(nb):
        if k in ("p", "li"):
            for a, b in WORD_SWAPS:
                if re.search(_pat(a), v):
                    cands.append((bi, a, b))
    if not cands:
        return nb, []
    step = max(1, len(cands) // max(1, n))
    i = seed % len(cands)
    used = set()
    while len(done) < n and len(used) < len(cands):
        bi, a, b = cands[i % len(cands)]
        i += step
        if (bi, a) in used:
            i += 1
            used.add((bi, a))
            continue
        used.add((bi, a))
        k, v = nb[bi]
        nv = re.sub(_pat(a), b, v, count=1)
        if nv != v:
            nb[bi] = (k, nv)
            done.append("word('{}' -> '{}', block {})".format(a, b, bi))
    return nb, done
