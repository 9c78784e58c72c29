"""Tiny Markdown-subset parser used for hand-written hosts and payloads.

Blocks: ("h", level, text) ("p", text) ("ul", [items]) ("ol", [items])
        ("code", lang, text) ("table", [[cells]]) ("quote", text)
Inline: **bold**, `code`, [text](url), ![alt](url) -- kept verbatim in md/txt.
"""
import re
import html as _html


def parse(src):
    lines = src.strip("\n").split("\n")
    blocks, i = [], 0
    while i < len(lines):
        ln = lines[i]
        s = ln.strip()
        if not s:
            i += 1
            continue
        if s.startswith("```"):
            lang = s[3:].strip()
            j = i + 1
            buf = []
            while j < len(lines) and not lines[j].strip().startswith("```"):
                buf.append(lines[j])
                j += 1
            blocks.append(("code", lang, "\n".join(buf)))
            i = j + 1
            continue
        m = re.match(r"^(#{1,4})\s+(.*)$", s)
        if m:
            blocks.append(("h", len(m.group(1)), m.group(2)))
            i += 1
            continue
        if s.startswith("|"):
            rows = []
            while i < len(lines) and lines[i].strip().startswith("|"):
                r = lines[i].strip()
                if not re.match(r"^\|[\s\-:|]+\|$", r):
                    rows.append([c.strip() for c in r.strip("|").split("|")])
                i += 1
            blocks.append(("table", rows))
            continue
        if re.match(r"^[-*]\s+", s):
            items = []
            while i < len(lines) and (re.match(r"^\s*[-*]\s+", lines[i]) or
                                      (items and re.match(r"^\s{2,}\S", lines[i]))):
                if re.match(r"^\s*[-*]\s+", lines[i]):
                    items.append(re.sub(r"^\s*[-*]\s+", "", lines[i]).strip())
                else:
                    items[-1] += " " + lines[i].strip()
                i += 1
            blocks.append(("ul", items))
            continue
        if re.match(r"^\d+[.)]\s+", s):
            start = int(re.match(r"^(\d+)", s).group(1))
            items = []
            while i < len(lines) and (re.match(r"^\s*\d+[.)]\s+", lines[i]) or
                                      (items and re.match(r"^\s{2,}\S", lines[i]))):
                if re.match(r"^\s*\d+[.)]\s+", lines[i]):
                    items.append(re.sub(r"^\s*\d+[.)]\s+", "", lines[i]).strip())
                else:
                    items[-1] += " " + lines[i].strip()
                i += 1
            blocks.append(("ol", items, start))
            continue
        if s.startswith(">"):
            buf = []
            while i < len(lines) and lines[i].strip().startswith(">"):
                buf.append(lines[i].strip()[1:].strip())
                i += 1
            blocks.append(("quote", " ".join(buf)))
            continue
        buf = []
        while i < len(lines) and lines[i].strip() and not re.match(
                r"^(```|#{1,4}\s|\||[-*]\s|\d+[.)]\s|>)", lines[i].strip()):
            buf.append(lines[i].strip())
            i += 1
        tag = re.compile(r"^(\[[^\]]{1,30}\]|\d{1,2}:\d{2}\b|[A-Za-z.][\w .()'-]{0,34}:\s|\*\*[^*]+\*\*\s)")
        if sum(1 for x in buf if tag.match(x)) >= 2:
            merged = []
            for x in buf:
                if tag.match(x) or not merged:
                    merged.append(x)
                else:
                    merged[-1] += " " + x
            blocks.append(("lines", merged))
        else:
            blocks.append(("p", " ".join(buf)))
    return blocks


def ol_start(b):
    return b[2] if len(b) > 2 else 1


def to_md(blocks):
    out = []
    for b in blocks:
        t = b[0]
        if t == "h":
            out.append("#" * b[1] + " " + b[2])
        elif t == "p":
            out.append(b[1])
        elif t == "quote":
            out.append("> " + b[1])
        elif t == "ul":
            out.append("\n".join("- " + x for x in b[1]))
        elif t == "ol":
            out.append("\n".join(f"{k+ol_start(b)}. {x}" for k, x in enumerate(b[1])))
        elif t == "code":
            out.append("```" + b[1] + "\n" + b[2] + "\n```")
        elif t == "table":
            rows = b[1]
            o = ["| " + " | ".join(rows[0]) + " |", "|" + "|".join("---" for _ in rows[0]) + "|"]
            o += ["| " + " | ".join(r) + " |" for r in rows[1:]]
            out.append("\n".join(o))
        elif t == "raw":
            out.append(b[1])
    return "\n\n".join(out) + "\n"


def inline_plain(s):
    s = re.sub(r"!\[([^\]]*)\]\(([^)]*)\)", r"[image: \1] (\2)", s)
    s = re.sub(r"\[([^\]]+)\]\(([^)]*)\)", r"\1 (\2)", s)
    s = s.replace("**", "").replace("`", "")
    return s


def to_txt(blocks, width=None):
    out = []
    for b in blocks:
        t = b[0]
        if t == "h":
            txt = inline_plain(b[2])
            out.append(txt.upper() if b[1] == 1 else txt + "\n" + ("-" * len(txt)))
        elif t == "p":
            out.append(inline_plain(b[1]))
        elif t == "quote":
            out.append("    " + inline_plain(b[1]))
        elif t == "ul":
            out.append("\n".join("  * " + inline_plain(x) for x in b[1]))
        elif t == "ol":
            out.append("\n".join(f"  {k+ol_start(b)}. " + inline_plain(x) for k, x in enumerate(b[1])))
        elif t == "code":
            out.append("\n".join("    " + x for x in b[2].split("\n")))
        elif t == "table":
            out.append("\n".join("  " + " | ".join(inline_plain(c) for c in r) for r in b[1]))
        elif t == "raw":
            out.append(b[1])
    return "\n\n".join(out) + "\n"


def esc(s):
    return _html.escape(s, quote=True)


def inline_html(s):
    parts = re.split(r"(!\[[^\]]*\]\([^)]*\)|\[[^\]]+\]\([^)]*\)|\*\*[^*]+\*\*|`[^`]+`)", s)
    o = []
    for p in parts:
        m = re.match(r"^!\[([^\]]*)\]\(([^)]*)\)$", p)
        if m:
            o.append(f'<img src="{esc(m.group(2))}" alt="{esc(m.group(1))}">')
            continue
        m = re.match(r"^\[([^\]]+)\]\(([^)]*)\)$", p)
        if m:
            o.append(f'<a href="{esc(m.group(2))}">{esc(m.group(1))}</a>')
            continue
        if p.startswith("**") and p.endswith("**") and len(p) > 4:
            o.append("<strong>" + esc(p[2:-2]) + "</strong>")
            continue
        if p.startswith("`") and p.endswith("`") and len(p) > 2:
            o.append("<code>" + esc(p[1:-1]) + "</code>")
            continue
        o.append(esc(p))
    return "".join(o)


def to_html_body(blocks):
    out = []
    for b in blocks:
        t = b[0]
        if t == "h":
            out.append(f"<h{b[1]}>{inline_html(b[2])}</h{b[1]}>")
        elif t == "p":
            out.append(f"<p>{inline_html(b[1])}</p>")
        elif t == "quote":
            out.append(f"<blockquote>{inline_html(b[1])}</blockquote>")
        elif t == "ul":
            out.append("<ul>\n" + "\n".join(f"  <li>{inline_html(x)}</li>" for x in b[1]) + "\n</ul>")
        elif t == "ol":
            out.append(("<ol>\n" if ol_start(b) == 1 else f'<ol start="{ol_start(b)}">\n') + "\n".join(f"  <li>{inline_html(x)}</li>" for x in b[1]) + "\n</ol>")
        elif t == "code":
            cls = f' class="language-{esc(b[1])}"' if b[1] else ""
            out.append(f"<pre><code{cls}>{esc(b[2])}</code></pre>")
        elif t == "table":
            rows = b[1]
            o = ["<table>", "  <tr>" + "".join(f"<th>{inline_html(c)}</th>" for c in rows[0]) + "</tr>"]
            o += ["  <tr>" + "".join(f"<td>{inline_html(c)}</td>" for c in r) + "</tr>" for r in rows[1:]]
            o.append("</table>")
            out.append("\n".join(o))
        elif t == "rawhtml":
            out.append(b[1])
    return "\n".join(out)
