"""Shared helpers (standard library only): body lines, shingles, Jaccard, HTML text extraction."""
import re
from html.parser import HTMLParser

_PUNCT = re.compile(r"[^\w\s]")


def body_lines(blocks):
    """Blocks -> ground-truth body lines (one block per line, table cells tab-separated)."""
    lines = []
    for kind, val in blocks:
        if kind == "table":
            for row in val:
                lines.append("\t".join(row))
        else:
            lines.append(val)
    return lines


def shingles(text, k=5):
    words = _PUNCT.sub("", text.lower()).split()
    return {tuple(words[i:i + k]) for i in range(len(words) - k + 1)}


def jaccard_sets(a, b):
    if not a and not b:
        return 1.0
    return round(len(a & b) / len(a | b), 4)


def body_jaccard(text_a, text_b):
    return jaccard_sets(shingles(text_a), shingles(text_b))


class _TextExtractor(HTMLParser):
    def __init__(self):
        super().__init__(convert_charrefs=True)
        self.parts = []
        self.skip = 0
        self.in_body = False

    def handle_starttag(self, tag, attrs):
        if tag == "body":
            self.in_body = True
        if tag in ("script", "style"):
            self.skip += 1

    def handle_endtag(self, tag):
        if tag in ("script", "style") and self.skip:
            self.skip -= 1
        if tag == "body":
            self.in_body = False

    def handle_data(self, data):
        if self.in_body and not self.skip:
            self.parts.append(data)


def html_visible_text(html):
    p = _TextExtractor()
    p.feed(html)
    p.close()
    return " ".join(p.parts)


def word_count(text):
    return len(text.split())
