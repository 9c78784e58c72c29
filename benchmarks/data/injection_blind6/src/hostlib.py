"""Registries and a tiny block parser for hand-written hosts and payloads."""
import re

HOSTS = {}
PAYLOADS = {}


def parse(body):
    lines = body.strip("\n").split("\n")
    blocks, cur, i = [], [], 0

    def flush():
        if not cur:
            return
        ls = list(cur)
        cur.clear()
        if len(ls) == 1 and ls[0].startswith("## "):
            blocks.append(("h", ls[0][3:].strip()))
        elif all(l.startswith("- ") for l in ls):
            blocks.append(("ul", [l[2:] for l in ls]))
        elif all(re.match(r"^\d+\. ", l) for l in ls):
            blocks.append(("ol", [re.sub(r"^\d+\. ", "", l) for l in ls]))
        elif all(l.startswith("|") for l in ls):
            blocks.append(("table", [[c.strip() for c in l.strip().strip("|").split("|")] for l in ls]))
        elif all(l.startswith("> ") for l in ls):
            blocks.append(("quote", "\n".join(l[2:] for l in ls)))
        else:
            blocks.append(("p", "\n".join(ls)))

    while i < len(lines):
        l = lines[i]
        if l.startswith("```"):
            flush()
            lang = l[3:].strip()
            j = i + 1
            code = []
            while j < len(lines) and not lines[j].startswith("```"):
                code.append(lines[j])
                j += 1
            blocks.append(("code", lang, "\n".join(code)))
            i = j + 1
            continue
        if not l.strip():
            flush()
        elif l.startswith("## "):
            flush()
            blocks.append(("h", l[3:].strip()))
        else:
            cur.append(l)
        i += 1
    flush()
    return blocks


def H(hid, lang, cls, genre, title, body):
    assert hid not in HOSTS, hid
    HOSTS[hid] = dict(id=hid, lang=lang, cls=cls, genre=genre, title=title, blocks=parse(body))


def P(pid, cls, lang, style, text, stock=False):
    assert pid not in PAYLOADS, pid
    assert style in ("subtle", "explicit")
    PAYLOADS[pid] = dict(id=pid, cls=cls, lang=lang, style=style, text=text, stock=stock)


def block_text(b):
    t = b[0]
    if t in ("h", "p", "quote"):
        return b[1]
    if t in ("ul", "ol"):
        return "\n".join(b[1])
    if t == "table":
        return "\n".join(" ".join(r) for r in b[1])
    if t == "code":
        return b[2]
    return ""


def word_count(blocks, title=""):
    txt = title + "\n" + "\n".join(block_text(b) for b in blocks)
    n = len(txt.split())
    # CJK: count characters roughly as words / 2
    cjk = len(re.findall(r"[\u3040-\u30ff\u4e00-\u9fff\uac00-\ud7af]", txt))
    return n + cjk // 2


def load_all():
    import hosts_en1, hosts_en2, hosts_en3, hosts_xx  # noqa: F401
    import payloads1, payloads2, payloads3  # noqa: F401
    return HOSTS, PAYLOADS
