#!/usr/bin/env python3
# -*- coding: utf-8 -*-
"""Blind near-duplicate benchmark corpus generator (blind13v3).

Usage: make_corpus.py [--out DIR]      (default: out/ beside this script)
Needs only the files in this folder and fpdf2. Fully deterministic.
"""
import argparse
import datetime
import html
import itertools
import json
import os
import random
import re
import shutil
import sys
import textwrap
import warnings

warnings.filterwarnings("ignore", message="Dimensions for page format")

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
sys.dont_write_bytecode = True

import bodygen as B  # noqa: E402
import templates as TP  # noqa: E402

SEED = "blind13v3"
PDF_DATE = datetime.datetime(2026, 6, 1, 12, 0, 0, tzinfo=datetime.timezone.utc)
EXPORT_DATE = "2026-06-01"
ANSWER_FROM = {"tk_printer": 1, "tk_electronics": 3}
DISTINCT_MAX = 0.45
SAFE_MAX = 0.40          # margin used while generating unique bodies

# ------------------------------------------------------------------ plan
REPUB = [
    ("rv_roadworks", "riverton", ["riverton", "herald"]), ("rv_roadworks", "riverton", ["herald"]),
    ("rv_bins", "riverton", ["riverton", "wire"]), ("rv_bins", "riverton", ["riverton"]),
    ("rv_consult", "riverton", ["herald", "wire"]), ("rv_consult", "riverton", ["riverton"]),
    ("hd_council", "herald", ["wire", "mirelle"]), ("hd_council", "herald", ["wire", "herald"]),
    ("hd_event", "herald", ["wire", "mirelle"]), ("hd_event", "herald", ["herald"]),
    ("hd_business", "herald", ["wire", "herald"]), ("hd_business", "herald", ["mirelle"]),
    ("qs_config", "quill", ["quill", "mirelle"]), ("qs_config", "quill", ["quill"]),
    ("qs_howto", "quill", ["quill", "mirelle"]), ("qs_howto", "quill", ["quill", "quill"]),
    ("qs_release", "quill", ["mirelle", "quill"]),
    ("hm_seminar", "hollowmere", ["herald", "hollowmere"]), ("hm_seminar", "hollowmere", ["hollowmere"]),
    ("hm_studentship", "hollowmere", ["hollowmere", "mirelle"]),
    ("bk_returns", "bracken", ["bracken", "bracken"]), ("bk_returns", "bracken", ["bracken"]),
    ("bk_payment", "bracken", ["bracken", "bracken"]),
    ("tk_printer", "tinkerers", ["tinkerers", "mirelle"]), ("tk_electronics", "tinkerers", ["tinkerers", "tinkerers"]),
    ("rc_excursion", "railclub", ["railclub", "herald"]), ("rc_minutes", "railclub", ["railclub"]),
    ("mn_garden", "mirelle", ["mirelle", "wire"]),
]
FULL = ["txt", "md", "pdf"]
FORMAT = [
    ("rv_roadworks", FULL), ("rv_bins", FULL), ("rv_consult", FULL), ("rv_consult", FULL),
    ("hd_council", FULL), ("hd_event", FULL),
    ("qs_config", FULL), ("qs_config", FULL), ("qs_howto", FULL), ("qs_howto", FULL), ("qs_release", FULL), ("qs_release", FULL),
    ("hm_seminar", FULL), ("hm_studentship", FULL), ("hm_studentship", FULL),
    ("bk_returns", FULL), ("bk_payment", FULL), ("rc_minutes", FULL), ("rc_excursion", FULL), ("tk_electronics", FULL),
    ("rv_roadworks", ["pdf"]), ("hd_business", ["txt"]), ("qs_howto", ["md"]), ("hm_seminar", ["pdf"]),
    ("bk_payment", ["pdf"]), ("mn_garden", ["md"]), ("rc_minutes", ["pdf"]), ("tk_printer", ["md"]),
]
SYND = [
    ("hd_council", ["wire"]), ("hd_council", ["wire", "mirelle"]), ("hd_event", ["wire"]), ("hd_event", ["wire", "mirelle"]),
    ("hd_business", ["wire"]), ("rv_consult", ["herald"]), ("rv_roadworks", ["wire"]), ("hm_seminar", ["herald", "wire"]),
    ("qs_release", ["mirelle"]), ("rc_excursion", ["mirelle"]), ("tk_printer", ["mirelle", "wire"]), ("bk_returns", ["mirelle"]),
]
TWIN_SIZES = [2, 2, 3]            # per family
SINGLES = [  # (family, site, count, fmt, variant)
    ("rv_roadworks", "riverton", 3, "html", "notices"), ("rv_bins", "riverton", 3, "html", "notices"), ("rv_consult", "riverton", 3, "html", "notices"),
    ("rv_bins", "riverton", 1, "html", "landing"), ("rv_consult", "riverton", 1, "html", "landing"), ("rv_roadworks", "riverton", 1, "html", ""),
    ("hd_council", "herald", 2, "html", ""), ("hd_event", "herald", 2, "html", ""), ("hd_business", "herald", 2, "html", ""),
    ("qs_config", "quill", 2, "html", ""), ("qs_howto", "quill", 1, "html", ""), ("qs_release", "quill", 1, "pdf", ""),
    ("hm_seminar", "hollowmere", 2, "html", ""), ("hm_studentship", "hollowmere", 1, "html", ""),
    ("bk_returns", "bracken", 2, "html", ""), ("bk_payment", "bracken", 2, "html", ""),
    ("tk_printer", "tinkerers", 2, "html", ""), ("tk_electronics", "tinkerers", 2, "html", ""),
    ("rc_excursion", "railclub", 1, "html", ""), ("rc_minutes", "railclub", 1, "txt", ""),
    ("hd_council", "wire", 2, "html", ""), ("hd_event", "wire", 2, "html", ""), ("hd_business", "wire", 1, "html", ""),
    ("mn_garden", "mirelle", 5, "md", ""), ("mn_garden", "mirelle", 2, "html", ""),
]
NOTICE_RANGE = (150, 470)


class Gen:
    def __init__(self):
        self.unique = []        # (key, shingle set) of accepted unique bodies
        self.n = 0

    def rng(self, *parts):
        return random.Random("%s|%s" % (SEED, "|".join(str(p) for p in parts)))

    def ok_vs_unique(self, sh, exclude=()):
        for key, s in self.unique:
            if key in exclude:
                continue
            if B.jaccard(sh, s) >= SAFE_MAX:
                return False
        return True

    def new_item(self, fam, uid, wrange=None):
        for attempt in range(200):
            rng = self.rng("item", uid, attempt)
            if wrange:
                target = rng.randint(wrange[0] + 20, wrange[1])
            elif rng.random() < 0.48:
                target = rng.randint(75, 190)
            else:
                target = rng.randint(215, 480)
            facts = B.make_facts(B.FAMILIES[fam], rng)
            ch = B.Chooser(rng)
            body = B.generate(fam, facts, ch, rng, target)
            lines = B.body_lines(body)
            w = B.nwords(lines)
            lo, hi = wrange or (60, 500)
            if not (lo <= w <= hi):
                continue
            sh = B.shingles(lines)
            if not self.ok_vs_unique(sh):
                continue
            self.unique.append((uid, sh))
            return dict(body=body, facts=facts, choices=ch.c, target=target)
        raise RuntimeError("could not generate unique item %s %s" % (fam, uid))

    def twin(self, fam, base, uid, mates, wrange=None):
        for attempt in range(300):
            rng = self.rng("twin", uid, attempt)
            keep = [0.85, 0.7, 0.55, 0.4][attempt % 4]
            facts = B.vary_facts(B.FAMILIES[fam], base["facts"], rng)
            ch = B.Chooser(rng, inherited=base["choices"], keep=keep)
            body = B.generate(fam, facts, ch, rng, base["target"])
            lines = B.body_lines(body)
            w = B.nwords(lines)
            lo, hi = wrange or (60, 500)
            if not (lo <= w <= hi):
                continue
            sh = B.shingles(lines)
            js = [B.jaccard(sh, s) for k, s in self.unique if k in mates]
            if not all(0.12 <= j <= 0.42 for j in js):
                continue
            if not self.ok_vs_unique(sh, exclude=mates):
                continue
            self.unique.append((uid, sh))
            return dict(body=body, facts=facts, choices=ch.c, target=base["target"])
        raise RuntimeError("could not generate twin %s %s" % (fam, uid))


def near_dup(orig, rng, others=(), src=None, multi=False):
    """Edit `src` (default: orig) with hand-written edit operations until the
    Jaccard against orig falls into a drawn target; every result must stay
    >= 0.80 against orig and against the other copies of the group."""
    src0 = src or orig
    checks = [B.shingles(B.body_lines(orig))] + [B.shingles(B.body_lines(o)) for o in others]
    for attempt in range(80):
        target = rng.uniform(0.90, 0.97) if others else (rng.uniform(0.86, 0.96) if multi else rng.uniform(0.82, 0.96))
        src = src0 if attempt % 2 == 0 else orig
        osh = B.shingles(B.body_lines(src))
        body = B.clone(src)
        ops = []
        for _ in range(40):
            cand = B.clone(body)
            op = rng.choice(B.REPUB_OPS)
            name = op(cand, rng)
            if not name:
                continue
            csh = B.shingles(B.body_lines(cand))
            if min(B.jaccard(csh, c) for c in checks) < (0.87 if multi and not others else 0.80):
                continue
            body = cand
            ops.append(name)
            if B.jaccard(osh, csh) <= target:
                break
        sh = B.shingles(B.body_lines(body))
        j = B.jaccard(checks[0], sh)
        if not (0.80 <= j <= 0.98) or not ops:
            continue
        if all(B.jaccard(sh, c) >= 0.80 for c in checks):
            if all(B.body_lines(o) != B.body_lines(body) for o in [orig] + list(others)):
                return body, ops
    raise RuntimeError("near-dup failed")


def format_edits(orig, rng, n):
    body = B.clone(orig)
    ops = []
    for _ in range(n):
        op = B.op_synonym if rng.random() < 0.7 else B.op_typo_fix
        name = op(body, rng) or B.op_synonym(body, rng) or B.op_typo_fix(body, rng)
        if name:
            ops.append(name)
    return body, ops


# ------------------------------------------------------------------ plan -> documents
SITE_AUTHORS = {
    "riverton": ["Communications team", "Highways team", "Waste services", "Policy team"],
    "herald": ["Gethin Pellow", "Ottilie Garside", "Hamish Tiernan", "Noor Varga"],
    "quill": ["Dmitri Strand", "Anouk Pennick", "Lucan Ashdown"],
    "hollowmere": ["School office", "Postgraduate office"],
    "bracken": ["Bracken customer team"],
    "tinkerers": ["spoolwrangler", "ohms_law_fan", "garage_maker", "bramblebot", "solderpaste", "kestrel_k"],
    "railclub": ["The Secretary", "Webmaster"],
    "wire": ["Southvale Newswire"],
    "mirelle": ["Mirelle"],
}


def slugify(t):
    s = re.sub(r"[^a-z0-9]+", "-", t.lower()).strip("-")
    return s[:64].rstrip("-")


def build(out):
    G = Gen()
    docs = []           # dict per document
    groups = []         # copy groups: dict(id, kind, members=[doc idx])
    twinsets = []       # lists of doc idx

    def add_doc(site, fam, body, fmt="html", role="singleton", cluster=None, variant="", ops=(), srcdoc=None):
        rng = G.rng("doc", len(docs))
        famd = B.FAMILIES[fam]
        d = dict(site=site, family=fam, body=body, fmt=fmt, role=role, cluster=cluster, variant=variant, ops=list(ops),
                 section=famd["section"], idx=len(docs))
        d["title"] = body[0]["t"]
        d["lines"] = B.body_lines(body)
        d["date"] = B.fmt_date(B.BASE_DATE + datetime.timedelta(days=rng.randint(0, 330)))
        d["author"] = rng.choice(SITE_AUTHORS[site])
        d["author2"] = rng.choice(SITE_AUTHORS[site])
        d["views"] = rng.randint(120, 48000)
        d["votes"] = rng.randint(2, 140)
        d["headings"] = [b["t"] for b in body if b["k"] == "h2"]
        first_p = next((b for b in body if b["k"] == "p"), None)
        d["first"] = first_p["s"][0]["t"] if first_p else d["title"]
        if srcdoc is not None:
            d["slug"] = srcdoc["slug"]
        else:
            base = slugify(d["title"])
            slug, k = base, 2
            while any(x["site"] == site and x["slug"] == slug for x in docs):
                slug = "%s-%d" % (base, k)
                k += 1
            d["slug"] = slug
        d["path"] = "%s/%s.%s" % (site, d["slug"], fmt)
        d["url"] = make_url(d, rng)
        docs.append(d)
        return d

    uid = itertools.count()
    # republication groups
    for gi, (fam, site, copies) in enumerate(REPUB):
        gid = "rep%02d" % gi
        it = G.new_item(fam, next(uid))
        o = add_doc(site, fam, it["body"], role="original", cluster=gid)
        members = [o["idx"]]
        made = []
        for ci, cs in enumerate(copies):
            # a second copy is republished from the first one (chain), as happens with re-syndicated notices
            body, ops = near_dup(it["body"], G.rng("nd", gi, ci), others=made, src=made[0] if made else None, multi=len(copies) > 1)
            made.append(body)
            members.append(add_doc(cs, fam, body, role="near-duplicate", cluster=gid, ops=ops)["idx"])
        groups.append(dict(id=gid, kind="republication", members=members))
    # cross-format groups
    for gi, (fam, fmts) in enumerate(FORMAT):
        gid = "fmt%02d" % gi
        site = B.FAMILIES[fam]["site"]
        it = G.new_item(fam, next(uid), wrange=(110, 500))
        o = add_doc(site, fam, it["body"], role="original", cluster=gid)
        w = B.nwords(o["lines"])
        for attempt in range(100):
            rng = G.rng("fmt", gi, attempt)
            bodies = []
            for f in fmts:
                n = 0 if rng.random() < 0.3 else max(1, round(w / 100.0))
                if attempt > 50:
                    n = min(n, 1)
                bodies.append(format_edits(it["body"], rng, n))
            shs = [B.shingles(o["lines"])] + [B.shingles(B.body_lines(b)) for b, _ in bodies]
            if all(B.jaccard(a, b) >= 0.80 for a, b in itertools.combinations(shs, 2)):
                break
        else:
            raise RuntimeError("format group failed")
        members = [o["idx"]]
        for f, (b, ops) in zip(fmts, bodies):
            members.append(add_doc(site, fam, b, fmt=f, role="format-copy", cluster=gid, ops=ops, srcdoc=o)["idx"])
        groups.append(dict(id=gid, kind="cross-format", members=members))
    # syndication groups
    for gi, (fam, copies) in enumerate(SYND):
        gid = "syn%02d" % gi
        site = B.FAMILIES[fam]["site"]
        it = G.new_item(fam, next(uid))
        o = add_doc(site, fam, it["body"], role="original", cluster=gid)
        members = [o["idx"]]
        for cs in copies:
            members.append(add_doc(cs, fam, B.clone(it["body"]), role="exact-copy", cluster=gid)["idx"])
        groups.append(dict(id=gid, kind="syndication", members=members))
    # twins
    ti = 0
    for fam in sorted(B.FAMILIES):
        site = B.FAMILIES[fam]["site"]
        for size in TWIN_SIZES:
            u0 = next(uid)
            base = G.new_item(fam, u0)
            ids = [u0]
            items = [base]
            for k in range(size - 1):
                u = next(uid)
                items.append(G.twin(fam, base, u, mates=list(ids)))
                ids.append(u)
            idxs = []
            for k, it in enumerate(items):
                d = add_doc(site, fam, it["body"], role="twin", cluster="tw%02d%s" % (ti, "abc"[k]))
                idxs.append(d["idx"])
            twinsets.append(idxs)
            ti += 1
    # singletons
    si = 0
    for fam, site, count, fmt, variant in SINGLES:
        for _ in range(count):
            wr = NOTICE_RANGE if variant == "notices" else None
            it = G.new_item(fam, next(uid), wrange=wr)
            add_doc(site, fam, it["body"], fmt=fmt, role="singleton", cluster="s%03d" % si, variant=variant)
            si += 1
    # twins on the notices portal: one set rendered with the notices layout (identical teaser aside)
    for idxs in twinsets:
        if docs[idxs[0]]["site"] == "riverton" and len(idxs) == 3:
            if all(NOTICE_RANGE[0] <= B.nwords(docs[i]["lines"]) <= NOTICE_RANGE[1] for i in idxs):
                for i in idxs:
                    docs[i]["variant"] = "notices"
    return docs, groups, twinsets


URL_PAT = {
    "riverton": lambda d, r: "/%s/%s" % ("notices" if d["variant"] == "notices" else d["section"], d["slug"]),
    "herald": lambda d, r: "/news/2026/%02d/%s" % (r.randint(1, 11), d["slug"]),
    "quill": lambda d, r: "/v4/%s/%s/" % (d["section"], d["slug"]),
    "hollowmere": lambda d, r: "/%s/%s.html" % (d["section"], d["slug"]),
    "bracken": lambda d, r: "/hc/en-gb/articles/%d-%s" % (r.randint(360000, 369999), d["slug"]),
    "tinkerers": lambda d, r: "/q/%d/%s" % (r.randint(10000, 99999), d["slug"]),
    "railclub": lambda d, r: "/pages/%s.htm" % d["slug"].replace("-", "_"),
    "wire": lambda d, r: "/story/%d/%s" % (r.randint(200000, 299999), d["slug"]),
    "mirelle": lambda d, r: "/posts/%s/" % d["slug"],
}
FMT_DIR = {"txt": "print", "md": "export", "pdf": "downloads"}


def make_url(d, rng):
    host = TP.SITES[d["site"]]["host"]
    if d["fmt"] != "html" and d["role"] == "format-copy":
        return "https://%s/%s/%s.%s" % (host, FMT_DIR[d["fmt"]], d["slug"], d["fmt"])
    p = URL_PAT[d["site"]](d, rng)
    if d["fmt"] != "html":
        p = "/files/%s.%s" % (d["slug"], d["fmt"])
    return "https://%s%s" % (host, p)


# ------------------------------------------------------------------ renderers
def body_html(blocks, site):
    out = []
    for b in blocks:
        k = b["k"]
        if k == "title":
            out.append('<font size="+1"><b>%s</b></font><br>' % html.escape(b["t"]) if site == "railclub" else "<h1>%s</h1>" % html.escape(b["t"]))
        elif k == "h2":
            out.append("<p><b>%s</b></p>" % html.escape(b["t"]) if site == "railclub" else "<h2>%s</h2>" % html.escape(b["t"]))
        elif k == "p":
            out.append("<p>%s</p>" % html.escape(B.block_lines(b)[0]))
        elif k in ("ul", "ol"):
            out.append("<%s>%s</%s>" % (k, "".join("<li>%s</li>" % html.escape(x) for x in b["items"]), k))
        elif k == "table":
            rows = b["rows"]
            head = "<tr>%s</tr>" % "".join("<th>%s</th>" % html.escape(c) for c in rows[0])
            rest = "".join("<tr>%s</tr>" % "".join("<td>%s</td>" % html.escape(c) for c in r) for r in rows[1:])
            out.append('<table class="data"><thead>%s</thead><tbody>%s</tbody></table>' % (head, rest))
    return "\n".join(out)


def render_html(d, ctx):
    site = d["site"]
    rng = random.Random("%s|tpl|%s" % (SEED, d["path"]))
    base, extras = TP.PARTS[site](d, ctx, rng)
    bw = B.nwords(d["lines"])
    ratio = rng.uniform(2.4, 5.2) if TP.SITES[site]["heavy"] else 0
    target = ratio * bw
    parts = dict(base)
    tw = sum(TP.wc(v) for v in base.values())
    queues = [(slot, list(frags)) for slot, frags in extras]
    if TP.SITES[site]["heavy"] and d.get("variant") != "notices":
        queues.append(("fat", TP.fat_footer(site, d, ctx, rng)))
    while tw < target and any(q for _, q in queues):
        for slot, q in queues:
            if not q or tw >= target:
                continue
            frag = q.pop(0)
            parts[slot] = parts.get(slot, "") + frag
            tw += TP.wc(frag)
    if site == "tinkerers":
        af = ANSWER_FROM.get(d["family"], 99)
        qb = [b for b in d["body"] if b.get("sec", -1) < af]
        ab = [b for b in d["body"] if b.get("sec", -1) >= af]
        inner = TP.tk_layout(d, parts, None, body_html(qb, site), body_html(ab, site))
    else:
        inner = TP.LAYOUT[site](d, parts, body_html(d["body"], site))
    if parts.get("fat"):
        inner += '<div class="site-more"><h3>Explore the site</h3>%s</div>' % parts["fat"]
    sitename = TP.SITES[site]["name"]
    head = ('<!DOCTYPE html>\n<html lang="en">\n<head>\n<meta charset="utf-8">\n<title>%s | %s</title>\n<link rel="canonical" href="%s">\n'
            '<style>body{font-family:sans-serif}</style>\n</head>\n' % (html.escape(d["title"]), html.escape(sitename), html.escape(d["url"])))
    if site == "railclub":
        head = ('<HTML>\n<HEAD>\n<TITLE>%s</TITLE>\n<META NAME="generator" CONTENT="FrontPage 4.0">\n</HEAD>\n' % html.escape(d["title"]))
    script = '<script>window.analyticsQueue=window.analyticsQueue||[];</script>' if TP.SITES[site]["heavy"] else ""
    return head + "<body>\n" + inner.replace("><", ">\n<") + "\n" + script + "\n</body>\n</html>\n"


def wrap(text, width=72, indent=""):
    return textwrap.fill(text, width=width, initial_indent=indent, subsequent_indent=" " * len(indent),
                         break_long_words=False, break_on_hyphens=False)


def render_txt(d):
    sitename = TP.SITES[d["site"]]["name"]
    out = ["Exported from %s on %s | %s" % (sitename, EXPORT_DATE, d["url"]) if d["role"] == "format-copy"
           else "%s - plain text edition" % sitename, ""]
    for b in d["body"]:
        k = b["k"]
        if k == "title":
            t = wrap(b["t"])
            out += [t, "=" * min(72, max(len(x) for x in t.split("\n"))), ""]
        elif k == "h2":
            out += [b["t"], "-" * len(b["t"]), ""]
        elif k == "p":
            out += [wrap(B.block_lines(b)[0]), ""]
        elif k in ("ul", "ol"):
            for n, x in enumerate(b["items"], 1):
                out.append(wrap(x, indent="- " if k == "ul" else "%d. " % n))
            out.append("")
        elif k == "table":
            rows = b["rows"]
            wd = [max(len(r[c]) for r in rows) for c in range(len(rows[0]))]
            fmtrow = lambda r: "  ".join(c.ljust(wd[i]) for i, c in enumerate(r)).rstrip()
            out.append(fmtrow(rows[0]))
            out.append("  ".join("-" * x for x in wd))
            out += [fmtrow(r) for r in rows[1:]]
            out.append("")
    out.append("-- end of document --")
    return "\n".join(out) + "\n"


def render_md(d):
    sitename = TP.SITES[d["site"]]["name"]
    fm = ["---", 'title: "%s"' % d["title"].replace('"', '\\"'), "source: %s" % d["url"], 'site: "%s"' % sitename,
          "date: %s" % d["date"], "tags: [%s]" % d["section"], "---", ""]
    out = list(fm)
    for b in d["body"]:
        k = b["k"]
        if k == "title":
            out += ["# " + b["t"], ""]
        elif k == "h2":
            out += ["## " + b["t"], ""]
        elif k == "p":
            out += [B.block_lines(b)[0], ""]
        elif k in ("ul", "ol"):
            for n, x in enumerate(b["items"], 1):
                out.append(("- " if k == "ul" else "%d. " % n) + x)
            out.append("")
        elif k == "table":
            rows = b["rows"]
            out.append("| " + " | ".join(rows[0]) + " |")
            out.append("|" + "|".join(" --- " for _ in rows[0]) + "|")
            out += ["| " + " | ".join(r) + " |" for r in rows[1:]]
            out.append("")
    return "\n".join(out).rstrip("\n") + "\n"


def render_pdf(d, path):
    from fpdf import FPDF
    sitename = TP.SITES[d["site"]]["name"]
    short = d["title"] if len(d["title"]) < 60 else d["title"][:57] + "..."

    class Doc(FPDF):
        def header(self):
            self.set_font("Helvetica", "I", 8)
            self.cell(0, 5, "%s - %s" % (sitename, short), new_x="LMARGIN", new_y="NEXT")
            self.ln(3)

        def footer(self):
            self.set_y(-12)
            self.set_font("Helvetica", "I", 8)
            self.cell(0, 5, "Page %d of {nb} - %s" % (self.page_no(), d["url"]), align="C")

    pdf = Doc(format="A5")
    pdf.set_creation_date(PDF_DATE)
    pdf.set_title(d["title"])
    pdf.set_author(sitename)
    pdf.set_margins(14, 14, 14)
    pdf.set_auto_page_break(True, 16)
    pdf.add_page()
    for b in d["body"]:
        k = b["k"]
        if k == "title":
            pdf.set_font("Helvetica", "B", 15)
            pdf.multi_cell(0, 7, b["t"], new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif k == "h2":
            pdf.ln(1)
            pdf.set_font("Helvetica", "B", 12)
            pdf.multi_cell(0, 6, b["t"], new_x="LMARGIN", new_y="NEXT")
        elif k == "p":
            pdf.set_font("Helvetica", "", 10)
            pdf.multi_cell(0, 5, B.block_lines(b)[0], new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif k in ("ul", "ol"):
            pdf.set_font("Helvetica", "", 10)
            for n, x in enumerate(b["items"], 1):
                pdf.set_x(18)
                pdf.multi_cell(0, 5, ("- " if k == "ul" else "%d. " % n) + x, new_x="LMARGIN", new_y="NEXT")
            pdf.ln(2)
        elif k == "table":
            pdf.set_font("Helvetica", "", 9)
            with pdf.table(text_align="LEFT", line_height=5) as table:
                for r in b["rows"]:
                    row = table.row()
                    for c in r:
                        row.cell(c)
            pdf.ln(2)
    pdf.output(path)
    return pdf.pages_count, len(B.tokens("%s - %s" % (sitename, short))) + len(B.tokens("Page 1 of 1 - " + d["url"]))


def visible_words_html(text):
    t = re.sub(r"(?is)<(script|style)[^>]*>.*?</\1>", " ", text)
    t = re.sub(r"<[^>]+>", " ", t)
    return len(B.tokens(html.unescape(t)))


# ------------------------------------------------------------------ main
def main():
    ap = argparse.ArgumentParser()
    ap.add_argument("--out", default=os.path.join(HERE, "out"))
    a = ap.parse_args()
    out = os.path.abspath(a.out)
    if os.path.isdir(out):
        shutil.rmtree(out)
    docs, groups, twinsets = build(out)

    paths = [d["path"] for d in docs]
    assert len(set(paths)) == len(paths), "duplicate paths"
    html_docs = [d for d in docs if d["fmt"] == "html"]

    def others(doc, site, n, rng, same_section=False):
        pool = [x for x in html_docs if x["site"] == site and x["idx"] != doc["idx"] and x["title"] != doc["title"]]
        if same_section:
            pool = [x for x in pool if x["section"] == doc["section"]] or pool
        return rng.sample(pool, min(n, len(pool)))

    def names(rng, n):
        return [rng.choice(B.FIRST) + " " + rng.choice(B.LAST)[0] + "." for _ in range(n)]

    rv_fixed = [(x["title"], x["first"]) for x in html_docs if x["site"] == "riverton" and x["variant"] != "notices"][:12]
    ctx = dict(others=others, names=names, rv_fixed_teasers=rv_fixed)

    inbox = os.path.join(out, "inbox")
    for d in docs:
        p = os.path.join(inbox, d["path"])
        os.makedirs(os.path.dirname(p), exist_ok=True)
        bw = B.nwords(d["lines"])
        if d["fmt"] == "html":
            text = render_html(d, ctx)
            tw = visible_words_html(text) - bw
        elif d["fmt"] == "txt":
            text = render_txt(d)
            tw = len(B.tokens(text)) - bw
        elif d["fmt"] == "md":
            text = render_md(d)
            tw = len(B.tokens(text)) - bw
        if d["fmt"] == "pdf":
            pages, hw = render_pdf(d, p)
            tw = pages * hw
            d["pages"] = pages
        else:
            with open(p, "w", encoding="utf-8", newline="\n") as f:
                f.write(text)
        d["template_ratio"] = round(max(tw, 0) / float(bw), 3)
        bp = os.path.join(out, "bodies", d["path"] + ".txt")
        os.makedirs(os.path.dirname(bp), exist_ok=True)
        with open(bp, "w", encoding="utf-8", newline="\n") as f:
            f.write("\n".join(d["lines"]) + "\n")

    # ---------------- pairs
    sh = [B.shingles(d["lines"]) for d in docs]
    J = lambda i, j: round(B.jaccard(sh[i], sh[j]), 4)
    pairs = []
    labelled = set()
    group_of = {}
    for g in groups:
        for m in g["members"]:
            group_of[m] = g["id"]
        for i, j in itertools.combinations(g["members"], 2):
            jj = J(i, j)
            same = docs[i]["lines"] == docs[j]["lines"]
            rel = "exact-body" if same else "near-duplicate"
            if not same:
                assert 0.80 <= jj < 1.0, (g["id"], jj)
            a, b = docs[i], docs[j]
            if g["kind"] == "republication":
                note = "republication: %s (%s) -> %s (%s); edits %s | %s" % (
                    a["site"], a["role"], b["site"], b["role"], "+".join(a["ops"]) or "none", "+".join(b["ops"]) or "none")
            elif g["kind"] == "cross-format":
                note = "cross-format: %s -> %s; edits %s | %s" % (a["fmt"], b["fmt"], "+".join(a["ops"]) or "none", "+".join(b["ops"]) or "none")
            else:
                note = "syndication: identical body, %s template -> %s template" % (a["site"], b["site"])
            pairs.append(dict(a=a["path"], b=b["path"], relation=rel, body_jaccard=jj, note=note))
            labelled.add((i, j))
    for ts in twinsets:
        for i, j in itertools.combinations(ts, 2):
            jj = J(i, j)
            assert 0.10 <= jj < 0.45, ("twin", jj)
            pairs.append(dict(a=docs[i]["path"], b=docs[j]["path"], relation="distinct", body_jaccard=jj,
                              note="twin: hard negative, family %s regenerated with different facts and sentence variants" % docs[i]["family"]))
            labelled.add((i, j))
    rng = random.Random(SEED + "|random-pairs")
    for site in sorted(TP.SITES):
        idx = [d["idx"] for d in docs if d["site"] == site]
        cand = [(i, j) for i, j in itertools.combinations(idx, 2)
                if (i, j) not in labelled and not (i in group_of and group_of.get(i) == group_of.get(j))]
        for i, j in sorted(rng.sample(cand, min(32, len(cand)))):
            jj = J(i, j)
            pairs.append(dict(a=docs[i]["path"], b=docs[j]["path"], relation="distinct", body_jaccard=jj,
                              note="random: same-site distinct pair (%s)" % site))
            labelled.add((i, j))
    # global check: every pair outside a copy group is below the distinct threshold
    worst = 0.0
    for i in range(len(docs)):
        for j in range(i + 1, len(docs)):
            if i in group_of and group_of.get(i) == group_of.get(j):
                continue
            if not (sh[i] & sh[j]):
                continue
            jj = B.jaccard(sh[i], sh[j])
            worst = max(worst, jj)
            assert jj < DISTINCT_MAX, (docs[i]["path"], docs[j]["path"], jj)

    with open(os.path.join(out, "manifest.jsonl"), "w", encoding="utf-8", newline="\n") as f:
        for d in sorted(docs, key=lambda x: x["path"]):
            f.write(json.dumps({"path": d["path"], "source_url": d["url"]}) + "\n")
    with open(os.path.join(out, "pairs.jsonl"), "w", encoding="utf-8", newline="\n") as f:
        for p in pairs:
            f.write(json.dumps(p) + "\n")
    with open(os.path.join(out, "clusters.jsonl"), "w", encoding="utf-8", newline="\n") as f:
        for d in sorted(docs, key=lambda x: x["path"]):
            f.write(json.dumps({"path": d["path"], "cluster": d["cluster"], "family": d["family"], "role": d["role"], "site": d["site"],
                                "body_words": B.nwords(d["lines"]), "template_ratio": d["template_ratio"]}) + "\n")
    rel = {}
    for p in pairs:
        rel[p["relation"]] = rel.get(p["relation"], 0) + 1
    print("documents: %d (non-HTML %d), pairs: %d %s, max unlabelled-group Jaccard %.4f" % (
        len(docs), sum(1 for d in docs if d["fmt"] != "html"), len(pairs), json.dumps(rel, sort_keys=True), worst))


if __name__ == "__main__":
    main()
