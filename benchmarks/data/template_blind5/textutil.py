"""Shared helpers: shingles / Jaccard and visible-text word counting (stdlib only)."""
import re
from html.parser import HTMLParser

_PUNCT = re.compile(r"[^\w\s]")


def shingles(lines):
    text = "\n".join(lines).lower()
    text = _PUNCT.sub("", text)
    w = text.split()
    return set(tuple(w[i:i + 5]) for i in range(len(w) - 4))


def jaccard(a, b):
    if not a and not b:
        return 1.0
    return round(len(a & b) / len(a | b), 4)


class _Vis(HTMLParser):
    def __init__(self):
        super().__init__(convert_charrefs=True)
        self.skip = 0
        self.chunks = []

    def handle_starttag(self, tag, attrs):
        if tag in ("script", "style"):
            self.skip += 1

    def handle_endtag(self, tag):
        if tag in ("script", "style") and self.skip:
            self.skip -= 1

    def handle_data(self, data):
        if not self.skip:
            self.chunks.append(data)


def visible_words(html):
    p = _Vis()
    p.feed(html)
    p.close()
    return " ".join(p.chunks).split()
