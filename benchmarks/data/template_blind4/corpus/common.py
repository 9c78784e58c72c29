"""Shared helpers: deterministic RNG, body blocks, Jaccard, invented name pools."""
import random
import re
import zlib

# ---------------------------------------------------------------- rng

def rng_for(*parts):
    """A Random seeded from a stable hash of the parts (never Python's hash())."""
    key = "|".join(str(p) for p in parts).encode("utf-8")
    return random.Random(zlib.crc32(key) * 7919 + len(key))


# ---------------------------------------------------------------- body model
# A body is a list of blocks:
#   ("title", text) ("h", text) ("p", [sentence, ...]) ("ul", [item, ...]) ("table", [[cell, ...], ...])

def body_lines(blocks):
    lines = []
    for b in blocks:
        kind = b[0]
        if kind in ("title", "h"):
            lines.append(b[1])
        elif kind == "p":
            lines.append(" ".join(s.text if hasattr(s, "text") else s for s in b[1]))
        elif kind == "ul":
            lines.extend(b[1])
        elif kind == "table":
            lines.extend("\t".join(row) for row in b[1])
    return lines


def body_text(blocks):
    return "\n".join(body_lines(blocks))


def words(text):
    return text.split()


_PUNCT = re.compile(r"[^\w\s]")


def shingles(text, k=5):
    toks = _PUNCT.sub("", text.lower()).split()
    return {tuple(toks[i:i + k]) for i in range(len(toks) - k + 1)}


def jaccard(a, b):
    if not a and not b:
        return 1.0
    return round(len(a & b) / len(a | b), 4)


def slugify(text, maxlen=48):
    s = re.sub(r"[^a-z0-9]+", "-", text.lower()).strip("-")
    if len(s) > maxlen:
        s = s[:maxlen].rsplit("-", 1)[0]
    return s


# ---------------------------------------------------------------- invented pools
FIRST = ["Ada", "Bram", "Celia", "Dorian", "Elspeth", "Fintan", "Greer", "Hollis", "Ines", "Jory",
         "Kestrel", "Linnea", "Marek", "Nell", "Osric", "Petra", "Quilla", "Rosalind", "Saul", "Tamsin",
         "Ulla", "Vaughn", "Wren", "Yara", "Zeb", "Anouk", "Bertil", "Cosima", "Dafydd", "Edda",
         "Florian", "Gwenna", "Hamish", "Isaura", "Joaquin", "Kalinda", "Lorcan", "Mirren", "Noor", "Orla"]
SURNAME = ["Abernethy", "Brightling", "Carrowby", "Dunmoore", "Elphicke", "Fairwether", "Goslingham",
           "Hallamby", "Ingledew", "Jessamine", "Ketterby", "Lindqvale", "Marchbanks", "Nettlefold",
           "Oakenshaw", "Pengellow", "Quarrington", "Rushbrook", "Sallowfield", "Thackwell", "Underhay",
           "Varleigh", "Wetherden", "Yellander", "Ashcombe", "Blackadine", "Colquist", "Drummellan",
           "Estcourt", "Ferrowby", "Gilchrest", "Hartsell", "Illingby", "Kinnaird", "Loveridge", "Mossop"]
TOWN = ["Brindlecombe", "Dunmerrow", "Elvenstead", "Fallowmere", "Gorsethwaite", "Hatherwick",
        "Kelderby", "Marrowby", "Netherwold", "Oxcombe Vale", "Pellowick", "Quarnby Wells",
        "Saltreach", "Thornaby Cross", "Wickhollow", "Ashgrove", "Cardale", "Lanternfield",
        "Brackwater", "Coldharbour Reach", "Emberley", "Harrowdene", "Sedgemoor Tarn", "Tollbridge"]
STREET = ["Tanner Row", "Quayside Walk", "Mill Lane", "Chantry Street", "Beacon Road", "Orchard Terrace",
          "Weavers Yard", "Sluice Lane", "Market Steps", "Ropewalk", "Glebe Road", "Foundry Close",
          "Cooper Street", "Lantern Hill", "Pinfold Lane", "Wharf Road"]
WEEKDAY = ["Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday", "Sunday"]
MONTH = ["January", "February", "March", "April", "May", "June", "July", "August", "September",
         "October", "November", "December"]


def person(r):
    return f"{r.choice(FIRST)} {r.choice(SURNAME)}"


def date_str(r, year=2026, months=None):
    m = r.choice(months or MONTH)
    return f"{r.randint(1, 28)} {m} {year}"


def time_str(r, lo=8, hi=19):
    h = r.randint(lo, hi)
    mm = r.choice(["00", "15", "30", "45"])
    suffix = "am" if h < 12 else "pm"
    h12 = h if h <= 12 else h - 12
    return f"{h12}.{mm}{suffix}" if mm != "00" else f"{h12}{suffix}"


def money(r, lo, hi, step=5):
    v = r.randrange(lo, hi, step)
    return f"{v:,}"


def date_pair(r, year=2026, min_gap=7, max_gap=90):
    """Two dates in order, min_gap..max_gap days apart (months treated as 28 days for simplicity)."""
    start = r.randrange(0, 12 * 28 - max_gap)
    end = start + r.randint(min_gap, max_gap)

    def fmt(n):
        m, d = divmod(n, 28)
        if m >= 12:
            m, d = 11, 27
        return f"{d + 1} {MONTH[m]} {year}"
    return fmt(start), fmt(end)
