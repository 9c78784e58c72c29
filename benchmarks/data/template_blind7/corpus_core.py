"""Shared helpers: normalisation, shingles, body lines, HTML text extraction, deterministic rng sources."""
import re
import random
from html.parser import HTMLParser

_PUNCT = re.compile(r"[^\w\s]")


def norm_words(text):
    return _PUNCT.sub("", text.lower()).split()


def shingles(text, k=5):
    w = norm_words(text)
    return {tuple(w[i:i + k]) for i in range(len(w) - k + 1)}


def jaccard(a, b):
    if not a and not b:
        return 1.0
    return round(len(a & b) / len(a | b), 4)


def body_lines(flat):
    """flat blocks -> list of body lines (the ground-truth format)."""
    out = []
    for b in flat:
        t = b["t"]
        if t in ("h1", "h2", "p"):
            out.append(b["text"])
        elif t == "ul":
            out.extend(b["items"])
        elif t == "table":
            out.extend("\t".join(r) for r in b["rows"])
    return out


class _Extract(HTMLParser):
    SKIP = {"script", "style", "head", "template"}

    def __init__(self):
        super().__init__(convert_charrefs=True)
        self.depth = 0
        self.parts = []

    def handle_starttag(self, tag, attrs):
        if tag in self.SKIP:
            self.depth += 1

    def handle_endtag(self, tag):
        if tag in self.SKIP and self.depth:
            self.depth -= 1

    def handle_data(self, data):
        if not self.depth:
            self.parts.append(data)


def html_text(html):
    p = _Extract()
    p.feed(html)
    p.close()
    return " ".join(p.parts)


class RecSource:
    """Random source that records every randrange result (so a twin can replay it)."""
    def __init__(self, seed):
        self.rng = random.Random(seed)
        self.log = []

    def randrange(self, n):
        v = self.rng.randrange(n)
        self.log.append(v)
        return v

    def randint(self, a, b):
        return a + self.randrange(b - a + 1)

    def random(self):
        return self.randrange(10000) / 10000.0

    def sample(self, seq, k):
        seq = list(seq)
        out = []
        for _ in range(min(k, len(seq))):
            out.append(seq.pop(self.randrange(len(seq))))
        return out


class ReplaySource(RecSource):
    """Replays a partner's recorded values with probability p, otherwise draws fresh ones."""
    def __init__(self, seed, recorded, p):
        super().__init__(seed)
        self.rec, self.p, self.i = recorded, p, 0
        self.coin = random.Random(seed * 7 + 1)

    def randrange(self, n):
        if self.i < len(self.rec) and self.coin.random() < self.p:
            v = self.rec[self.i] % n
        else:
            v = self.rng.randrange(n)
        self.i += 1
        self.log.append(v)
        return v
