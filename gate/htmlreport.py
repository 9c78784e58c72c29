"""The per-run HTML report: one self-contained page drawn from ``report.json``.

``render(report)`` is pure: the same report gives the same bytes, nothing is read from the
disk, the network or the clock. The page has no scripts, no external resources (no fonts,
no images, no style sheets: CSS is inline, charts are inline SVG drawn here) and a
Content-Security-Policy that forbids scripts and every fetch, so opening it cannot run
anything or reach anything, even if an escaping bug let markup through.

Every string that can come from a document (paths, titles, messages, details, codes, URLs)
goes through :func:`text`: undecodable file names (lone surrogates) and control or bidi
characters become visible backslash escapes, then ``html.escape(quote=True)``. URLs are
shown as text, never as links.
"""

from __future__ import annotations

import html
import json
import math
import re
from collections import Counter
from dataclasses import dataclass
from typing import Any

from gate import checks
from gate.urgency import urgency
from gate.visible import BLANK_LETTERS, visible

CSP = ("default-src 'none'; style-src 'unsafe-inline'; img-src data:; "
       "base-uri 'none'; form-action 'none'")

OUTCOMES = ("pass", "warn", "fail", "n/a", "off")

# what visible() shows or html.escape() replaces, besides non-printable characters
_SPECIAL = re.compile("[&<>\"'" + "".join(chr(c) for c in sorted(BLANK_LETTERS)) + "]")


def text(value: Any) -> str:
    """Any value as HTML-safe text (element content or a quoted attribute value)."""
    if type(value) is str and value.isprintable() and _SPECIAL.search(value) is None:
        return value  # nothing to show or escape: what the lines below return
    if value is None:
        s = ""
    elif isinstance(value, str):
        s = value
    else:
        s = str(value)
    s = visible(s)
    return html.escape(s, quote=True)


def lines(value: Any) -> str:
    """Multi-line text (a diff, commands) for a ``<pre>``: each line as :func:`text`,
    the line breaks kept."""
    return "\n".join(text(line) for line in str(value or "").split("\n"))


def _dict(value: Any) -> dict:
    return value if isinstance(value, dict) else {}


def _list(value: Any) -> list:
    return value if isinstance(value, list) else []


def _int(value: Any) -> int:
    if isinstance(value, bool):
        return int(value)
    if isinstance(value, int):
        return value
    if isinstance(value, float) and math.isfinite(value):
        return int(value)
    return 0


def _number(value: Any) -> float | None:
    """A finite number, or None (bools, strings, NaN and infinities are not measurements)."""
    if isinstance(value, bool) or not isinstance(value, (int, float)):
        return None
    value = float(value)
    return value if math.isfinite(value) else None


def _fmt_num(value: float) -> str:
    return f"{value:g}" if value != int(value) else str(int(value))


def _fmt_bytes(n: float) -> str:
    for unit, size in (("GB", 1e9), ("MB", 1e6), ("kB", 1e3)):
        if n >= size:
            return f"{_fmt_num(round(n / size, 1))} {unit}"
    return f"{_fmt_num(n)} B"


def _fmt_chars(n: float) -> str:
    for unit, size in (("M", 1e6), ("k", 1e3)):
        if n >= size:
            return f"{_fmt_num(round(n / size, 1))}{unit}"
    return _fmt_num(n)


# --- charts ------------------------------------------------------------------------------

def _nice_step(top: int, ticks: int = 5) -> int:
    """The smallest 1-2-5 step that covers ``top`` in at most ``ticks`` steps."""
    step = 1
    while True:
        for m in (1, 2, 5):
            if m * step * ticks >= top:
                return m * step
        step *= 10


def bar_chart(rows: list[tuple[str, int]], *, name: str, label: str,
              kind: str = "held") -> str:
    """Horizontal bars, one per (label, count), with an x axis of document counts."""
    if not rows:
        return '<p class="empty">nothing to show</p>'
    char_w, row_h, width = 7.3, 24, 600
    longest = max(len(name) for name, _ in rows)
    max_chars = 34
    label_w = min(longest, max_chars) * char_w + 16
    plot_x, plot_w = label_w, width - label_w - 48
    top = max(count for _, count in rows) or 1
    step = _nice_step(top)
    axis_max = math.ceil(top / step) * step
    plot_h = row_h * len(rows)
    height = plot_h + 44
    parts = [f'<svg class="chart" data-chart="{text(name)}" viewBox="0 0 {width} {height}" '
             f'width="{width}" height="{height}" role="img" aria-label="{text(label)}">']
    for tick in range(0, axis_max + 1, step):
        x = plot_x + plot_w * tick / axis_max
        parts.append(f'<line class="grid" x1="{x:.1f}" y1="4" x2="{x:.1f}" '
                     f'y2="{plot_h + 4}"/>')
        parts.append(f'<text class="tick" x="{x:.1f}" y="{plot_h + 20}" '
                     f'text-anchor="middle">{tick}</text>')
    for i, (name, count) in enumerate(rows):
        y = 4 + i * row_h
        shown = name if len(name) <= max_chars else name[:max_chars - 1] + "\u2026"
        w = plot_w * count / axis_max
        parts.append(f'<g><title>{text(name)}: {count}</title>'
                     f'<text class="lbl" x="{plot_x - 8:.1f}" y="{y + row_h / 2 + 4:.1f}" '
                     f'text-anchor="end">{text(shown)}</text>'
                     f'<rect class="bar {kind}" x="{plot_x:.1f}" y="{y + 4}" '
                     f'width="{max(w, 1.5):.1f}" height="{row_h - 8}" rx="2"/>'
                     f'<text class="val" x="{plot_x + w + 5:.1f}" '
                     f'y="{y + row_h / 2 + 4:.1f}">{count}</text></g>')
    parts.append(f'<line class="axis" x1="{plot_x:.1f}" y1="{plot_h + 4}" '
                 f'x2="{plot_x + plot_w:.1f}" y2="{plot_h + 4}"/>')
    parts.append(f'<text class="axis-title" x="{plot_x + plot_w / 2:.1f}" y="{height - 4}" '
                 f'text-anchor="middle">{text(label)}</text></svg>')
    return "".join(parts)


@dataclass
class Histogram:
    """Bins [edges[i], edges[i+1]) (the last one closed), counted per decision."""
    edges: list[float]
    accepted: list[int]
    quarantined: list[int]
    left_out: int = 0  # values outside the edges

    @classmethod
    def of(cls, values: list[tuple[float, str]], edges: list[float]) -> Histogram:
        n = len(edges) - 1
        hist = cls(edges, [0] * n, [0] * n)
        for value, decision in values:
            if value < edges[0] or value > edges[-1]:
                hist.left_out += 1
                continue
            i = n - 1
            for j in range(n):
                if value < edges[j + 1]:
                    i = j
                    break
            (hist.accepted if decision == "accepted" else hist.quarantined)[i] += 1
        return hist


def histogram_chart(hist: Histogram, *, name: str, x_label: str, edge_label) -> str:
    """Vertical stacked bars (accepted below, quarantined on top) with both axes labelled
    and the count of each bin above its bar."""
    width, height = 600, 260
    ml, mr, mt, mb = 52, 16, 22, 52
    plot_w, plot_h = width - ml - mr, height - mt - mb
    n = len(hist.accepted)
    totals = [a + q for a, q in zip(hist.accepted, hist.quarantined)]
    top = max(totals) or 1
    step = _nice_step(top, 4)
    axis_max = math.ceil(top / step) * step
    bw = plot_w / n
    base = mt + plot_h
    parts = [f'<svg class="chart" data-chart="{text(name)}" viewBox="0 0 {width} {height}" '
             f'width="{width}" height="{height}" role="img" aria-label="{text(x_label)}">']
    for tick in range(0, axis_max + 1, step):
        y = base - plot_h * tick / axis_max
        parts.append(f'<line class="grid" x1="{ml}" y1="{y:.1f}" x2="{ml + plot_w}" '
                     f'y2="{y:.1f}"/><text class="tick" x="{ml - 6}" y="{y + 4:.1f}" '
                     f'text-anchor="end">{tick}</text>')
    for i in range(n):
        x = ml + i * bw
        lo, hi = edge_label(hist.edges[i]), edge_label(hist.edges[i + 1])
        acc, held = hist.accepted[i], hist.quarantined[i]
        tip = (f"{lo} to {hi}: {totals[i]} documents ({acc} accepted, {held} quarantined)")
        parts.append(f"<g><title>{text(tip)}</title>")
        y = base
        for count, kind in ((acc, "ok"), (held, "held")):
            if count:
                h = plot_h * count / axis_max
                y -= h
                parts.append(f'<rect class="bar {kind}" x="{x + 1.5:.1f}" y="{y:.1f}" '
                             f'width="{bw - 3:.1f}" height="{h:.1f}"/>')
        if totals[i]:
            parts.append(f'<text class="val" x="{x + bw / 2:.1f}" y="{y - 5:.1f}" '
                         f'text-anchor="middle">{totals[i]}</text>')
        parts.append("</g>")
    every = 1 if bw >= 44 else 2 if bw >= 22 else 3
    for i, edge in enumerate(hist.edges):
        if i % every and i != n:
            continue
        x = ml + i * bw
        parts.append(f'<line class="axis" x1="{x:.1f}" y1="{base}" x2="{x:.1f}" '
                     f'y2="{base + 5}"/><text class="tick" x="{x:.1f}" y="{base + 18}" '
                     f'text-anchor="middle">{text(edge_label(edge))}</text>')
    parts.append(f'<line class="axis" x1="{ml}" y1="{base}" x2="{ml + plot_w}" y2="{base}"/>'
                 f'<line class="axis" x1="{ml}" y1="{mt}" x2="{ml}" y2="{base}"/>')
    parts.append(f'<text class="axis-title" x="{ml + plot_w / 2:.1f}" y="{height - 8}" '
                 f'text-anchor="middle">{text(x_label)}</text>'
                 f'<text class="axis-title" x="14" y="{mt + plot_h / 2:.1f}" '
                 f'text-anchor="middle" transform="rotate(-90 14 {mt + plot_h / 2:.1f})">'
                 f'documents</text></svg>')
    return "".join(parts)


def log_edges(values: list[float]) -> list[float]:
    """Bin edges on a 1-2-5 series (decades when that gives too many bins) covering the
    values; a first bin from 0 when some values are below 1 (empty files)."""
    positive = [v for v in values if v >= 1]
    if not positive:
        return [0.0, 1.0]
    lo, hi = min(positive), max(positive)
    for steps in ((1, 2, 5), (1,)):
        k_lo, k_hi = len(str(int(lo))) - 1, len(str(int(hi))) - 1
        series = [m * 10 ** k for k in range(k_lo, k_hi + 2) for m in steps]
        start = max(c for c in series if c <= lo)
        end = min(c for c in series if c > hi)
        edges = [float(c) for c in series if start <= c <= end]
        if len(edges) - 1 <= 14:
            break
    if any(0 <= v < edges[0] for v in values):
        edges = [0.0, *edges]
    return edges


# --- the page ----------------------------------------------------------------------------

STYLE = """
:root{--ink:#1d2530;--muted:#5d6875;--line:#d9dde3;--paper:#f3f4f1;--card:#fff;
--band:#1f3a4d;--ok:#2f7d66;--held:#b4543a;--warn:#a77b16;--accent:#3b6b8f;color-scheme:light}
*{box-sizing:border-box}
body{margin:0;background:var(--paper);color:var(--ink);
font:14px/1.45 system-ui,"Segoe UI","Noto Sans","DejaVu Sans",sans-serif}
.mono,code,.path{font-family:ui-monospace,"DejaVu Sans Mono","Liberation Mono",monospace;
font-size:12.5px}
header.band{background:var(--band);color:#eef3f6;padding:22px 32px 18px}
header.band .kicker{text-transform:uppercase;letter-spacing:.12em;font-size:11px;
color:#a9c1d1;margin:0}
header.band h1{margin:2px 0 12px;font-size:24px;font-weight:600}
header.band dl{display:grid;grid-template-columns:max-content 1fr;gap:3px 16px;margin:0;
max-width:1100px}
header.band dt{color:#a9c1d1}
header.band dd{margin:0;overflow-wrap:anywhere}
nav{background:#e6e9e4;border-bottom:1px solid var(--line);padding:8px 32px;font-size:13px}
nav a{color:var(--accent);margin-right:18px;text-decoration:none}
main{max-width:1240px;margin:0 auto;padding:20px 32px 40px}
section{margin:0 0 26px}
h2{font-size:17px;margin:0 0 10px;font-weight:600}
h3{font-size:14px;margin:0 0 8px;font-weight:600}
.tiles{display:grid;grid-template-columns:repeat(auto-fit,minmax(128px,1fr));gap:12px}
.tile{background:var(--card);border:1px solid var(--line);border-radius:6px;
padding:10px 14px;border-top:4px solid var(--accent)}
.tile .n{font-size:26px;font-weight:650;display:block;line-height:1.2}
.tile .k{color:var(--muted);font-size:12.5px}
.tile.ok{border-top-color:var(--ok)}.tile.held{border-top-color:var(--held)}
.tile.warn{border-top-color:var(--warn)}
.cautions{background:#fbf6e6;border:1px solid #e6d7a8;border-left:5px solid var(--warn);
border-radius:6px;padding:10px 16px}
.cautions h2{font-size:15px;margin-bottom:4px}
.cautions ul{margin:0;padding-left:20px}
.grid2{display:grid;grid-template-columns:repeat(auto-fit,minmax(560px,1fr));gap:16px;
align-items:start}
.stack{display:grid;gap:16px}
.card{background:var(--card);border:1px solid var(--line);border-radius:6px;
padding:12px 16px;overflow-x:auto}
.card p.note{color:var(--muted);font-size:12.5px;margin:6px 0 0}
.empty,.notmeasured{color:var(--muted);font-style:italic;margin:8px 0}
svg.chart{display:block;max-width:100%;height:auto}
svg .grid{stroke:#e7e9ec;stroke-width:1}
svg .axis{stroke:#8a949f;stroke-width:1}
svg .tick{fill:var(--muted);font-size:11px}
svg .lbl{fill:var(--ink);font-size:12px;
font-family:ui-monospace,"DejaVu Sans Mono","Liberation Mono",monospace}
svg .val{fill:var(--ink);font-size:11px;font-weight:600}
svg .axis-title{fill:var(--muted);font-size:12px}
.bar.ok{fill:var(--ok)}.bar.held{fill:var(--held)}.bar.warn{fill:var(--warn)}
.legend{font-size:12.5px;color:var(--muted);margin:0 0 4px}
.swatch{display:inline-block;width:10px;height:10px;border-radius:2px;margin:0 4px 0 10px;
vertical-align:baseline}
.swatch.ok{background:var(--ok)}.swatch.held{background:var(--held)}
table{border-collapse:collapse;width:100%;background:var(--card)}
th,td{text-align:left;vertical-align:top;padding:7px 10px;border-bottom:1px solid var(--line)}
th{background:#eceee9;font-weight:600;font-size:12.5px;color:#38424d;position:sticky;top:0}
td.num,th.num{text-align:right;font-variant-numeric:tabular-nums}
td.zero{color:#b6bcc3}
td.hot{color:var(--held);font-weight:650}
td.warm{color:var(--warn);font-weight:650}
.path{overflow-wrap:anywhere;font-weight:600}
.sub{color:var(--muted);font-size:12.5px;overflow-wrap:anywhere}
.sub .mono{word-break:break-all}
.tablewrap{border:1px solid var(--line);border-radius:6px;overflow:hidden}
ul.reasons{list-style:none;margin:0;padding:0}
ul.reasons li{margin:0 0 6px;overflow-wrap:anywhere}
ul.reasons li:last-child{margin-bottom:0}
.code{display:inline-block;font-family:ui-monospace,"DejaVu Sans Mono",monospace;
font-size:12px;padding:0 6px;border-radius:3px;margin-right:6px;background:#f6e3dc;
color:#7c3420;border:1px solid #ebc7ba}
.code.w{background:#f6eed4;color:#6f5208;border-color:#e5d49c}
details{margin-top:3px}
details summary{cursor:pointer;color:var(--accent);font-size:12px}
details dl{display:grid;grid-template-columns:max-content 1fr;gap:2px 10px;margin:4px 0 0;
font-size:12px}
details dt{color:var(--muted)}details dd{margin:0;overflow-wrap:anywhere}
.more{color:var(--muted);font-style:italic;padding:8px 10px}
header.band .line{margin:0;color:#dbe6ee}
header.band details{margin-top:8px}header.band summary{color:#a9c1d1}
.queue td{padding:9px 10px}
.badge{display:inline-block;font-size:11.5px;font-weight:650;padding:1px 8px;
border-radius:10px;border:1px solid var(--line);text-transform:uppercase;letter-spacing:.04em}
.badge.open{background:#f6e3dc;color:#7c3420;border-color:#ebc7ba}
.badge.rejected{background:#e8e6f3;color:#3d3670;border-color:#cbc6e6}
.badge.released{background:#dcefe8;color:#1f5a48;border-color:#b5dccd}
.badge.purged{background:#e9eaec;color:#454c55;border-color:#cfd3d8}
.badge.unknown{background:#f1f1f1;color:#5d6875}
.rank{color:var(--muted);font-size:12px;margin-top:3px}
blockquote.snippet{margin:4px 0 2px;padding:4px 8px;border-left:3px solid var(--held);
background:#fbf3f0;font-family:ui-monospace,"DejaVu Sans Mono",monospace;font-size:12px;
overflow-wrap:anywhere;white-space:pre-wrap}
.decoded{font-size:12.5px;margin:2px 0}
pre.diff,pre.cmd{margin:4px 0;padding:6px 8px;background:#f5f6f4;border:1px solid var(--line);
border-radius:4px;font-size:11.5px;white-space:pre-wrap;overflow-wrap:anywhere;
max-height:240px;overflow:auto}
pre.cmd{background:#eef3f7;user-select:all}
.reviewnote{font-size:12.5px;margin-top:4px}
tr.flag td{background:#fbf0ec}
footer{color:var(--muted);font-size:12px;border-top:1px solid var(--line);padding-top:10px}
@media print{nav{display:none}th{position:static}.card,.tablewrap{break-inside:avoid}}
"""


def _esc_json(value: Any) -> str:
    if isinstance(value, str):
        return text(value)
    if type(value) is int:  # json.dumps writes an int as int.__repr__
        return int.__repr__(value)
    return text(json.dumps(value, ensure_ascii=False, sort_keys=True))


SHOWN_APART = ("snippet", "decoded")  # drawn beside the message, not among the details


def _details(details: Any, message: Any = "") -> str:
    """A finding's machine-readable details, folded. Values the message already says
    (the pieces it was rendered from, such as "; the versions disagree ...") and empty
    ones are left out, so the fold holds only what the message does not."""
    details = _dict(details)
    said = message if isinstance(message, str) else ""
    kept = {k: v for k, v in details.items()
            if k not in SHOWN_APART and v not in ("", None, [], {})
            and not (isinstance(v, str) and v.strip() in said)}
    if not kept:
        return ""
    rows = "".join(f"<dt>{text(k)}</dt><dd>{_esc_json(v)}</dd>"
                   for k, v in sorted(kept.items(), key=lambda kv: str(kv[0])))
    return f"<details><summary>details</summary><dl>{rows}</dl></details>"


def _evidence(details: Any) -> str:
    """A finding's snippet (invisible characters shown) and decoded hidden message."""
    details = _dict(details)
    out = []
    if isinstance(details.get("snippet"), str) and details["snippet"]:
        out.append(f'<blockquote class="snippet">{text(details["snippet"])}</blockquote>')
    if isinstance(details.get("decoded"), str) and details["decoded"]:
        out.append(f'<div class="decoded">decoded hidden message: '
                   f'<span class="mono">{text(details["decoded"])}</span></div>')
    return "".join(out)


def _findings(items: list, cls: str = "") -> str:
    out = []
    for item in items:
        item = _dict(item)
        out.append(f'<li><span class="code{cls}">{text(item.get("code"))}</span>'
                   f'{text(item.get("message"))}{_evidence(item.get("details"))}'
                   f'{_details(item.get("details"), item.get("message"))}</li>')
    return f'<ul class="reasons">{"".join(out)}</ul>' if out else ""


def _doc_sub(doc: dict) -> str:
    """The small line under a document's path: title, type, size, language, source URL."""
    bits = []
    if doc.get("title"):
        bits.append(f"<div>title: {text(doc.get('title'))}</div>")
    facts = []
    if doc.get("type"):
        facts.append(text(doc.get("type")))
    size = _number(doc.get("size"))
    if size is not None:
        facts.append(text(_fmt_bytes(size)))
    lang = _dict(doc.get("language"))
    if lang.get("code") is not None:
        prob = _number(lang.get("probability"))
        facts.append(f"language {text(lang.get('code'))}"
                     + (f" ({prob:.2f})" if prob is not None else ""))
    score = _number(doc.get("injection_score"))
    if score is not None:
        facts.append(f"injection score {score:.2f}")
    if facts:
        bits.append(f"<div>{' · '.join(facts)}</div>")
    url = _dict(doc.get("source")).get("url")
    if url:
        bits.append(f'<div>source: <span class="mono">{text(url)}</span></div>')
    return f'<div class="sub">{"".join(bits)}</div>' if bits else ""


def _more(count: int, cols: int) -> str:
    return (f'<tr><td class="more" colspan="{cols}">{count} more not shown here; '
            f'report.json lists them all.</td></tr>') if count > 0 else ""


def _ordered_checks(names: set[str]) -> list[str]:
    """The registry's order; ids it does not know (a newer report's) follow, sorted."""
    return sorted(names, key=lambda name: (checks.order_of(name), name))


def _tile(n: int, label: str, cls: str = "") -> str:
    return (f'<div class="tile {cls}"><span class="n">{n}</span>'
            f'<span class="k">{text(label)}</span></div>')

STATUS_WORDS = {"open": "open: to decide", "rejected": "rejected (stays held)",
                "released": "released to accepted/", "purged": "purged (deleted)",
                "unknown": "status not known"}


def queue_from_report(docs: list[dict]) -> list[dict]:
    """The queue when only report.json is at hand (no state): every held document, with
    no review status, ordered as the folder's page orders it."""
    items = []
    for doc in docs:
        if doc.get("decision") != "quarantined":
            continue
        reasons = [_dict(r) for r in _list(doc.get("reasons"))]
        rank, ranked_by = urgency(reasons)
        items.append({"id": doc.get("id"), "path": doc.get("path"), "status": "unknown",
                      "rank": rank, "ranked_by": ranked_by, "reasons": reasons,
                      "diffs": [], "source": _dict(doc.get("source")).get("url"),
                      "location": doc.get("location"), "commands": [], "review": None})
    items.sort(key=lambda i: (i["rank"], str(i["path"])))
    return items


def _queue_row(item: dict) -> str:
    status = str(item.get("status"))
    review = _dict(item.get("review"))
    who = ""
    if review:
        who = (f'<div class="reviewnote">{text(review.get("action"))} by '
               f'{text(review.get("by"))} at {text(review.get("at"))}'
               f'{" (" + text(review.get("id")) + ")" if review.get("id") else ""}: '
               f'&ldquo;{text(review.get("note"))}&rdquo;</div>')
    diffs = "".join(f'<div class="sub">diff against the kept document '
                    f'<span class="mono">{text(_dict(d).get("keeper"))}</span> '
                    f'(- kept, + this one):</div><pre class="diff">'
                    f'{lines(_dict(d).get("diff"))}</pre>' for d in _list(item.get("diffs")))
    cmds = _list(item.get("commands"))
    cmd = f'<pre class="cmd">{lines(chr(10).join(str(c) for c in cmds))}</pre>' if cmds \
        else ""
    source = item.get("source")
    return (f'<tr class="q-{text(status)}" data-status="{text(status)}">'
            f'<td><div class="path">{text(item.get("path"))}</div>'
            f'<div class="rank">{text(item.get("ranked_by"))}</div>'
            + (f'<div class="sub">source: <span class="mono">{text(source)}</span></div>'
               if source else "")
            + f'<div class="sub mono">{text(item.get("location"))}</div></td>'
            f'<td>{_findings(_list(item.get("reasons")))}{diffs}</td>'
            f'<td><span class="badge {text(status)}">{text(status)}</span>'
            f'<div class="sub">{text(STATUS_WORDS.get(status, status))}</div>{who}{cmd}</td>'
            '</tr>')


def queue_section(items: list[dict], run_id: str, max_rows: int) -> str:
    """The review queue: open entries first (by urgency), then what was decided since
    the run, each with its evidence, status and the commands to decide it."""
    items = [_dict(i) for i in items]
    open_items = [i for i in items if i.get("status") in ("open", "unknown")]
    decided = [i for i in items if i.get("status") not in ("open", "unknown")]
    known = not any(i.get("status") == "unknown" for i in items)
    counts = Counter(str(i.get("status")) for i in decided)
    summary = ", ".join(f"{n} {s}" for s, n in sorted(counts.items()))
    head = (f'<section id="queue"><h2>Review queue: {len(open_items)} '
            f'{"entry" if len(open_items) == 1 else "entries"} to decide</h2>')
    if known:
        head += ('<p class="legend">What is still held and unreviewed, most urgent first: '
                 'documents gate could not evaluate, then planted instructions, tampering, '
                 'provenance, format, quality, language, and last stale documents and '
                 'duplicates. Copy a command, replace WHY with your reason, and run it; this '
                 'page is rewritten after every review action. '
                 + (f'Reviewed: {text(summary)}.' if summary else '')
                 + '</p>')
    else:
        head += ('<p class="legend">Drawn from report.json alone: review statuses are not '
                 'known here. <span class="mono">gate report html DIR</span> on the output '
                 'folder draws them from its state.</p>')
    colgroup = ('<colgroup><col style="width:26%"><col><col style="width:30%"></colgroup>'
                '<thead><tr><th>document</th><th>reasons and evidence</th>'
                '<th>status and review commands</th></tr></thead>')
    out = [head]
    groups = Counter(str(i.get("ranked_by")) for i in open_items)
    if groups:
        order = sorted(groups, key=lambda g: min(_int(i.get("rank")) for i in open_items
                                                 if i.get("ranked_by") == g))
        out.append('<p class="legend">To decide, by urgency: '
                   + " &middot; ".join(f"{text(g)} {groups[g]}" for g in order)
                   + '. Entries sharing a check can be decided together: <span class="mono">'
                   'gate review reject DIR --check CHECK --note "WHY"</span> previews them, '
                   'and acts with <span class="mono">--yes</span>.</p>')
    if open_items:
        rows = "".join(_queue_row(i) for i in open_items[:max_rows])
        out.append(f'<div class="tablewrap"><table class="queue">{colgroup}<tbody>{rows}'
                   f'{_more(len(open_items) - max_rows, 3)}</tbody></table></div>')
    else:
        out.append('<p class="empty">nothing left to decide: no open quarantine entry</p>')
    if decided:
        rows = "".join(_queue_row(i) for i in decided[:max_rows])
        out.append(f'<h3 id="decided" style="margin-top:14px">Reviewed ({len(decided)}): '
                   f'rejected entries, and entries released or purged since {text(run_id)}'
                   '</h3><div class="tablewrap"><table class="queue">'
                   f'{colgroup}<tbody>{rows}{_more(len(decided) - max_rows, 3)}</tbody>'
                   '</table></div>')
    out.append('</section>\n')
    return "".join(out)


def _rate(part: int, whole: int) -> float:
    return part / whole if whole else 0.0


def _pct(value: float) -> str:
    return f"{value:.0%}"


FLAGGED = ' class="flag"'
NEW_BADGE = ' <span class="badge open">new</span>'
FLAG_RISE = 0.20  # a rise of the quarantine rate this large marks a source or code


def sources_section(summary: dict, previous: dict | None) -> str:
    """A row per source (documents, quarantine rate, top codes) and the change since the
    previous run of the same output folder, so a broken feed stands out."""
    now = _dict(summary.get("by_source"))
    before = _dict(_dict(_dict(previous).get("summary")).get("by_source")) if previous \
        else {}
    prev_id = _dict(previous).get("id") if previous else None
    out = ['<section id="sources"><h2>Sources</h2>']
    if not now:
        out.append('<p class="empty">this report records no sources</p></section>\n')
        return "".join(out)
    head = ('<th>source</th><th class="num">documents</th><th class="num">quarantined</th>'
            '<th class="num">rate</th>')
    if prev_id:
        head += (f'<th class="num">rate in {text(prev_id)}</th><th class="num">change</th>')
    head += '<th>top reason codes</th>'
    rows = []
    for name in sorted(set(now) | set(before)):
        cur, old = _dict(now.get(name)), _dict(before.get(name))
        docs, held = _int(cur.get("documents")), _int(cur.get("quarantined"))
        rate = _rate(held, docs)
        codes = sorted(_dict(cur.get("codes")).items(), key=lambda kv: (-_int(kv[1]), kv[0]))
        top = ", ".join(f"{k} ({_int(v)})" for k, v in codes[:3]) or "-"
        cells = (f'<td class="mono">{text(name)}</td><td class="num">{docs}</td>'
                 f'<td class="num">{held}</td><td class="num">{_pct(rate)}</td>')
        flag = False
        if prev_id:
            if old:
                old_rate = _rate(_int(old.get("quarantined")), _int(old.get("documents")))
                change = rate - old_rate
                flag = docs > 0 and change >= FLAG_RISE
                shown = f"{change * 100:+.0f} points" if docs else "gone from the inbox"
                cells += f'<td class="num">{_pct(old_rate)}</td><td class="num">{shown}</td>'
            else:
                flag = rate >= 0.5
                cells += '<td class="num">-</td><td class="num">new source</td>'
        rows.append(f'<tr{FLAGGED if flag else ""}>{cells}'
                    f'<td class="mono">{text(top)}</td></tr>')
    out.append(f'<div class="tablewrap"><table><thead><tr>{head}</tr></thead>'
               f'<tbody>{"".join(rows)}</tbody></table></div>')
    if prev_id:
        out.append(f'<p class="legend">Highlighted: a source whose quarantine rate rose by '
                   f'{FLAG_RISE:.0%} points or more since {text(prev_id)}, or a new source '
                   'with half or more of its documents held.</p>')
    else:
        out.append('<p class="legend">The first run of this output folder: there is no '
                   'earlier run to compare with.</p>')
    out.append(_code_changes(summary, previous))
    out.append('</section>\n')
    return "".join(out)


def _code_changes(summary: dict, previous: dict | None) -> str:
    if not previous:
        return ""
    old_summary = _dict(_dict(previous).get("summary"))
    prev_id = _dict(previous).get("id")
    now, old = _dict(summary.get("quarantined_by_code")), _dict(
        old_summary.get("quarantined_by_code"))
    docs, old_docs = _int(summary.get("documents")), _int(old_summary.get("documents"))
    rows = []
    for code in sorted(set(now) | set(old)):
        rate, old_rate = _rate(_int(now.get(code)), docs), _rate(_int(old.get(code)), old_docs)
        new = code not in old
        flag = new or rate - old_rate >= FLAG_RISE
        rows.append(f'<tr{FLAGGED if flag else ""}><td class="mono">{text(code)}'
                    f'{NEW_BADGE if new else ""}</td>'
                    f'<td class="num">{_int(old.get(code))} ({_pct(old_rate)})</td>'
                    f'<td class="num">{_int(now.get(code))} ({_pct(rate)})</td>'
                    f'<td class="num">{(rate - old_rate) * 100:+.0f} points</td></tr>')
    if not rows:
        return ""
    return (f'<h3 style="margin-top:14px">Reason codes since {text(prev_id)}</h3>'
            f'<div class="tablewrap"><table><thead><tr><th>code</th><th class="num">'
            f'{text(prev_id)}</th><th class="num">this run</th><th class="num">change</th>'
            f'</tr></thead><tbody>{"".join(rows)}</tbody></table></div>')



def render(report: dict, *, max_rows: int = 5000, view: dict | None = None) -> str:
    """The HTML page for one report (a ``report.json`` object). Tables list at most
    ``max_rows`` documents each, with a note of how many were left out. ``view`` is what
    the output folder's state adds (:mod:`gate.folderpage`): the review queue with its
    statuses, the previous run and the folder; without it the queue is drawn from the
    report's held documents, with no status."""
    report = _dict(report)
    run = _dict(report.get("run"))
    policy = _dict(run.get("policy"))
    manifest = _dict(run.get("manifest"))
    summary = _dict(report.get("summary"))
    docs = [d for d in _list(report.get("documents")) if isinstance(d, dict)]
    removed = [d for d in _list(report.get("removed")) if isinstance(d, dict)]
    unmatched = _list(report.get("manifest_unmatched"))
    cautions = _list(report.get("cautions"))
    version = _dict(report.get("gate")).get("version")

    accepted = [d for d in docs if d.get("decision") == "accepted"]
    held = [d for d in docs if d.get("decision") == "quarantined"]
    warned = [d for d in accepted if _list(d.get("warnings"))]

    by_code: Counter[str] = Counter()
    by_check: Counter[str] = Counter()
    warn_codes: Counter[str] = Counter()
    for doc in docs:
        reasons = [_dict(r) for r in _list(doc.get("reasons"))]
        by_code.update({str(r.get("code")) for r in reasons})
        by_check.update({str(r.get("check")) for r in reasons})
        warn_codes.update({str(_dict(w).get("code")) for w in _list(doc.get("warnings"))})
    # the report's own summary is the record; the documents are the fallback
    if isinstance(summary.get("quarantined_by_code"), dict):
        by_code = Counter({str(k): _int(v) for k, v in summary["quarantined_by_code"].items()})
    if isinstance(summary.get("quarantined_by_check"), dict):
        by_check = Counter({str(k): _int(v)
                            for k, v in summary["quarantined_by_check"].items()})
    if isinstance(summary.get("warnings_by_code"), dict):
        warn_codes = Counter({str(k): _int(v) for k, v in summary["warnings_by_code"].items()})
    n_docs = _int(summary["documents"]) if "documents" in summary else len(docs)
    n_acc = _int(summary["accepted"]) if "accepted" in summary else len(accepted)
    n_held = _int(summary["quarantined"]) if "quarantined" in summary else len(held)
    changes = _dict(summary.get("changes"))

    run_id = run.get("id") or "(no run id)"
    out: list[str] = [
        '<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n'
        f'<meta http-equiv="Content-Security-Policy" content="{text(CSP)}">\n'
        '<meta name="referrer" content="no-referrer">\n'
        '<meta name="viewport" content="width=device-width, initial-scale=1">\n'
        f'<title>gate report {text(run_id)}</title>\n<style>{STYLE}</style>\n</head>\n<body>\n']

    # header: one line, the run's particulars folded
    view = _dict(view)
    items = _list(view.get("queue")) if view else queue_from_report(held)
    open_count = sum(_dict(i).get("status") in ("open", "unknown") for i in items)
    meta = [("As of", run.get("as_of")), ("Mode", run.get("mode")),
            ("Policy", policy.get("name")), ("Policy file", policy.get("path")),
            ("Policy sha256", policy.get("sha256")), ("Inbox", run.get("inbox"))]
    if view.get("folder"):
        meta.append(("Output folder", view.get("folder")))
    if manifest:
        records = manifest.get("records")
        meta.append(("Manifest", f"{manifest.get('path') or '-'}"
                     + (f" ({_int(records)} records)" if records is not None else "")))
        meta.append(("Manifest sha256", manifest.get("sha256")))
    meta.append(("gate version", version))
    rows = "".join(f'<dt>{text(k)}</dt><dd class="{"mono" if "sha256" in k else ""}">'
                   f'{text(v) if v not in (None, "") else "-"}</dd>' for k, v in meta)
    noun = "document" if n_docs == 1 else "documents"
    line = (f"{n_docs} {noun}: {n_acc} accepted, {n_held} quarantined; {open_count} "
            f"{'entry' if open_count == 1 else 'entries'} to decide. As of "
            f"{run.get('as_of') or '-'}, policy {policy.get('name') or '-'}.")
    out.append(f'<header class="band"><p class="kicker">gate &middot; review page</p>'
               f'<h1>{text(run_id)}</h1><p class="line">{text(line)}</p>'
               f'<details><summary>run particulars</summary><dl>{rows}</dl></details>'
               '</header>\n')
    out.append('<nav><a href="#queue">Review queue</a><a href="#sources">Sources</a>'
               '<a href="#counts">Counts</a><a href="#reasons">Reasons</a>'
               '<a href="#scores">Scores</a><a href="#checks">Check outcomes</a>'
               '<a href="#quarantined">Quarantined</a><a href="#warnings">Warnings</a>'
               '<a href="#accepted">Accepted</a></nav>\n<main>\n')
    out.append(queue_section(items, str(run_id), max_rows))
    out.append(sources_section(summary, _dict(view.get("previous")) or None))

    # counts and cautions
    tiles = [_tile(n_docs, "documents"), _tile(n_acc, "accepted", "ok"),
             _tile(n_held, "quarantined", "held"),
             _tile(len(warned), "accepted with warnings", "warn")]
    for name, count in sorted(changes.items(), key=lambda kv: str(kv[0])):
        tiles.append(_tile(_int(count), f"index change: {name}"))
    tiles.append(_tile(len(removed), "removed from the corpus"))
    tiles.append(_tile(len(unmatched), "manifest lines without a file"))
    out.append(f'<section id="counts"><h2>Counts</h2><div class="tiles">{"".join(tiles)}'
               f'</div></section>\n')
    items = "".join(f"<li>{text(c)}</li>" for c in cautions) or (
        "<li>This report carries no cautions. gate's checks are heuristics: they lower "
        "the risk, they do not remove it.</li>")
    out.append(f'<section class="cautions" id="cautions"><h2>Cautions</h2><ul>{items}</ul>'
               f'</section>\n')

    # why documents were held
    def ranked(counter: Counter[str]) -> list[tuple[str, int]]:
        return sorted(((k, v) for k, v in counter.items() if v > 0),
                      key=lambda kv: (-kv[1], kv[0]))

    check_rows = [(c, by_check[c]) for c in _ordered_checks(set(by_check)) if by_check[c] > 0]
    out.append('<section id="reasons"><h2>Why documents were quarantined</h2>'
               '<div class="grid2"><div class="stack">'
               '<div class="card"><h3>Quarantined documents by check</h3>'
               f'{bar_chart(check_rows, name="by-check", label="documents quarantined")}'
               '<p class="note">A document held by several checks counts once for each.</p>'
               '</div>')
    if warn_codes:
        chart = bar_chart(ranked(warn_codes), name="warnings-by-code", label="documents",
                          kind="warn")
        out.append(f'<div class="card"><h3>Warnings by code (documents accepted)</h3>{chart}'
                   '</div>')
    out.append('</div><div class="card"><h3>Quarantined documents by reason code</h3>'
               f'{bar_chart(ranked(by_code), name="by-code", label="documents quarantined")}'
               '<p class="note">A document with several reasons counts once for each.</p>'
               '</div></div></section>\n')

    # score distributions
    out.append('<section id="scores"><h2>Score distributions</h2>'
               '<p class="legend">Each bar counts documents:<span class="swatch ok"></span>'
               'accepted<span class="swatch held"></span>quarantined</p><div class="grid2">')

    def measured(get) -> list[tuple[float, str]]:
        values = []
        for doc in docs:
            value = _number(get(doc))
            if value is not None:
                values.append((value, str(doc.get("decision"))))
        return values

    def panel(name: str, title: str, values, edges, x_label: str, edge_label,
              absent: str) -> str:
        if not values:
            return (f'<div class="card" id="{name}"><h3>{text(title)}</h3>'
                    '<p class="notmeasured">'
                    f'not measured: {text(absent)}</p></div>')
        hist = Histogram.of(values, edges)
        note = (f'<p class="note">{hist.left_out} values outside {text(edge_label(edges[0]))}'
                f' to {text(edge_label(edges[-1]))} are not drawn.</p>'
                if hist.left_out else "")
        return (f'<div class="card" id="{name}"><h3>{text(title)}</h3>'
                f'{histogram_chart(hist, name=name, x_label=x_label, edge_label=edge_label)}'
                f'<p class="note">{len(values)} of {len(docs)} documents measured.</p>'
                f'{note}</div>')

    unit = [i / 10 for i in range(11)]
    out.append(panel(
        "injection-score", "Injection score", measured(lambda d: d.get("injection_score")),
        unit, "injection score (higher: more likely planted instructions)", _fmt_num,
        "no document in this report carries an injection score (the injection check did "
        "not run in this run)."))
    out.append(panel(
        "language-probability", "Language probability",
        measured(lambda d: _dict(d.get("language")).get("probability")), unit,
        "probability of the detected language", _fmt_num,
        "no document had its language detected (the language check is off, or no text "
        "came out)."))
    sizes = measured(lambda d: d.get("size"))
    out.append(panel(
        "document-size", "Document size", sizes, log_edges([v for v, _ in sizes]),
        "size on disk (bins on a 1-2-5 scale)", _fmt_bytes, "no document size is recorded."))
    lengths = measured(lambda d: d.get("text_chars", d.get("text_length")))
    out.append(panel(
        "text-length", "Extracted text length", lengths, log_edges([v for v, _ in lengths]),
        "characters of extracted text (bins on a 1-2-5 scale)", _fmt_chars,
        "this report does not record text lengths."))
    out.append('</div></section>\n')

    # check outcomes
    outcome_counts: dict[str, Counter[str]] = {}
    for doc in docs:
        for check, outcome in _dict(doc.get("checks")).items():
            outcome_counts.setdefault(str(check), Counter())[str(outcome)] += 1
    extra = sorted({o for c in outcome_counts.values() for o in c} - set(OUTCOMES))
    columns = [*OUTCOMES, *extra]
    head = "".join(f'<th class="num">{text(c)}</th>' for c in columns)
    body = []
    for check in _ordered_checks(set(outcome_counts)):
        cells = []
        for col in columns:
            n = outcome_counts[check][col]
            cls = "zero" if n == 0 else "hot" if col == "fail" else \
                "warm" if col == "warn" else ""
            cells.append(f'<td class="num {cls}">{n}</td>')
        body.append(f'<tr><td class="mono">{text(check)}</td>{"".join(cells)}</tr>')
    out.append('<section id="checks"><h2>Check outcomes</h2>')
    if body:
        out.append(f'<div class="tablewrap"><table><thead><tr><th>check</th>{head}</tr>'
                   f'</thead><tbody>{"".join(body)}</tbody></table></div>'
                   '<p class="legend">off: its policy section is absent; n/a: the check '
                   'could not look at the document (for example, no text came out).</p>')
    else:
        out.append('<p class="empty">no check outcomes recorded</p>')
    out.append('</section>\n')

    # quarantined documents, as the run decided them, with where each is now
    now = {str(_dict(i).get("id")): _dict(i) for i in items}
    out.append(f'<section id="quarantined"><h2>Quarantined documents ({len(held)})</h2>')
    if held:
        rows_html = []
        for doc in held[:max_rows]:
            item = now.get(str(doc.get("id")), {})
            status = str(item.get("status") or ("unknown" if not view else "gone"))
            where = item.get("location") or doc.get("location") if view else \
                doc.get("location")
            rows_html.append(
                f'<tr><td><div class="path">{text(doc.get("path"))}</div>{_doc_sub(doc)}'
                f'</td><td>{_findings(_list(doc.get("reasons")))}</td>'
                f'<td><span class="badge {text(status)}">{text(status)}</span>'
                f'<div class="mono">{text(where)}</div></td></tr>')
        out.append(f'<details class="card"><summary>Every document {text(run_id)} '
                   'quarantined, with its status now</summary><table><colgroup>'
                   '<col style="width:34%"><col><col style="width:17%"></colgroup>'
                   '<thead><tr><th>document</th>'
                   '<th>reasons (code and message)</th><th>status and location</th></tr>'
                   f'</thead><tbody>{"".join(rows_html)}{_more(len(held) - max_rows, 3)}'
                   '</tbody></table></details>')
    else:
        out.append('<p class="empty">no document was quarantined</p>')
    out.append('</section>\n')

    # accepted with warnings
    out.append(f'<section id="warnings"><h2>Accepted with warnings ({len(warned)})</h2>')
    if warned:
        rows_html = [f'<tr><td><div class="path">{text(doc.get("path"))}</div>'
                     f'{_doc_sub(doc)}</td><td>{_findings(_list(doc.get("warnings")), " w")}'
                     f'</td><td class="mono">{text(doc.get("location"))}</td></tr>'
                     for doc in warned[:max_rows]]
        out.append('<div class="tablewrap"><table><colgroup><col style="width:34%">'
                   '<col><col style="width:17%"></colgroup><thead><tr><th>document</th>'
                   '<th>warnings (code and message)</th><th>location</th></tr></thead>'
                   f'<tbody>{"".join(rows_html)}{_more(len(warned) - max_rows, 3)}</tbody>'
                   '</table></div>')
    else:
        out.append('<p class="empty">no accepted document carries a warning</p>')
    out.append('</section>\n')

    # every accepted document, folded
    out.append(f'<section id="accepted"><h2>Accepted documents ({len(accepted)})</h2>')
    if accepted:
        rows_html = []
        for doc in accepted[:max_rows]:
            lang = _dict(doc.get("language"))
            size = _number(doc.get("size"))
            rows_html.append(
                f'<tr><td class="path">{text(doc.get("path"))}</td>'
                f'<td>{text(doc.get("type"))}</td>'
                f'<td class="num">{text(_fmt_bytes(size)) if size is not None else "-"}</td>'
                f'<td>{text(lang.get("code")) if lang.get("code") is not None else "-"}</td>'
                f'<td class="num">{len(_list(doc.get("warnings")))}</td>'
                f'<td>{text(doc.get("change"))}</td>'
                f'<td class="mono">{text(doc.get("location"))}</td></tr>')
        fold = " open" if len(accepted) <= 50 else ""
        out.append(f'<details class="card"{fold}><summary>All {len(accepted)} accepted '
                   'documents</summary><table><thead><tr><th>path</th><th>type</th>'
                   '<th class="num">size</th><th>language</th><th class="num">warnings</th>'
                   '<th>change</th><th>location</th></tr></thead>'
                   f'<tbody>{"".join(rows_html)}{_more(len(accepted) - max_rows, 7)}'
                   '</tbody></table></details>')
    else:
        out.append('<p class="empty">no document was accepted</p>')
    out.append('</section>\n')

    # removed documents and manifest lines without a file
    if removed:
        rows_html = [f'<tr><td class="path">{text(r.get("path"))}</td>'
                     f'<td>{text(r.get("change"))}</td><td>{text(r.get("why"))}</td>'
                     f'<td class="mono">{text(r.get("location") or "-")}</td></tr>'
                     for r in removed[:max_rows]]
        out.append(f'<section id="removed"><h2>Removed from the corpus ({len(removed)})</h2>'
                   '<div class="tablewrap"><table><thead><tr><th>path</th><th>change</th>'
                   '<th>why</th><th>location</th></tr></thead>'
                   f'<tbody>{"".join(rows_html)}{_more(len(removed) - max_rows, 4)}</tbody>'
                   '</table></div></section>\n')
    if unmatched:
        lines = "".join(f'<li class="path">{text(p)}</li>' for p in unmatched[:max_rows])
        rest = len(unmatched) - max_rows
        out.append(f'<section id="unmatched"><h2>Manifest lines without a file '
                   f'({len(unmatched)})</h2><div class="card"><ul>{lines}</ul>'
                   + (f'<p class="note">{rest} more in report.json.</p>' if rest > 0 else "")
                   + '</div></section>\n')

    out.append(f'<footer>Drawn by gate {text(version or "")} from report.json of '
               f'{text(run_id)}. This page runs no scripts and loads nothing; document '
               'paths, titles, messages and URLs are shown as text.</footer>\n'
               '</main>\n</body>\n</html>\n')
    return "".join(out)
