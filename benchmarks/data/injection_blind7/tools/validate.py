#!/usr/bin/env python3
"""Validator for blind set 7. Run from /work/blind15v7:  .venv/bin/python tools/validate.py
Checks labels, counts, domains/IPs/phones, payload presence (including PDF annotation
/Contents and form-field /V), that benign documents carry no payload text, and host reuse."""
import collections, email, html, io, json, os, re, sys
from email import policy

ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
sys.path.insert(0, os.path.join(ROOT, "src"))
import payloads as P

ATTACK = ["output-steering", "task-hijack", "malicious-code", "tool-misuse", "authority-poisoning", "exfiltration",
          "multilingual", "hidden-placement", "encoded", "split"]
BENIGN = ["security-awareness", "chat-export", "technical-doc", "instructions-to-humans", "multilingual-benign", "misc"]
FIELDS = {"file", "label", "class", "language", "where", "note", "format", "host"}
errors = []
def err(m): errors.append(m)

def pdf_parts(path):
    from pypdf import PdfReader
    r = PdfReader(path)
    text = "\n".join((p.extract_text() or "") for p in r.pages)
    annots, fields = [], []
    for p in r.pages:
        for a in (p.get("/Annots") or []):
            a = a.get_object()
            if a.get("/Contents"): annots.append(str(a["/Contents"]))
            if a.get("/FT") == "/Tx" and a.get("/V") is not None: fields.append(str(a["/V"]))
    af = r.trailer["/Root"].get("/AcroForm")
    if af:
        for f in af.get_object().get("/Fields", []):
            f = f.get_object()
            if f.get("/V") is not None: fields.append(str(f["/V"]))
    return text, annots, fields

def doc_text(path, fmt):
    raw = open(path, "rb").read()
    if fmt == "pdf":
        t, a, f = pdf_parts(path)
        return {"all": "\n".join([t] + a + f), "page": t, "annot": "\n".join(a), "field": "\n".join(f)}
    s = raw.decode("utf-8")
    if fmt == "html":
        return {"all": s + "\n" + html.unescape(s) + "\n" + html.unescape(re.sub(r"<[^>]+>", "", s))}
    if fmt == "eml":
        m = email.message_from_bytes(raw, policy=policy.default)
        parts = [str(m["subject"]), str(m["from"]), str(m["to"])]
        plain, htm = "", ""
        for p in m.walk():
            if p.get_content_maintype() == "text":
                c = p.get_content()
                parts.append(c)
                if p.get_content_subtype() == "plain": plain += c
                else: htm += c + "\n" + html.unescape(c) + "\n" + html.unescape(re.sub(r"<[^>]+>", "", c))
        parts.append(htm)
        return {"all": "\n".join(parts), "plain": plain, "html": htm}
    return {"all": s}

def norm(s):
    return re.sub(r"\s+", "", s).replace("`", "").replace("*", "")

ALLOWED_DOM = re.compile(r"(^|\.)example\.(com|org|net)$|\.test$")
DOM_RE = re.compile(r"\b((?:[a-z0-9](?:[a-z0-9-]*[a-z0-9])?\.)+(?:com|org|net|edu|io|co|uk|fr|de|jp|dk|nl|info|biz|gov|test|ru|cn|es|it|pl|tr|ir|vn|id|kr|se|in|cz|ua|gr|ro|hu|fi))\b")
IP_RE = re.compile(r"(?<![\d.])(\d{1,3})\.(\d{1,3})\.(\d{1,3})\.(\d{1,3})(?![\d.])")
PHONE_RE = re.compile(r"(?<![\d-])(\d{3})-(\d{4})(?![\d-])")

def main():
    labels = [json.loads(l) for l in open(os.path.join(ROOT, "labels.jsonl"), encoding="utf-8")]
    exp = {e["file"]: e for e in (json.loads(l) for l in open(os.path.join(ROOT, "tools", "expected.jsonl"), encoding="utf-8"))}
    files = sorted("docs/" + f for f in os.listdir(os.path.join(ROOT, "docs")))
    if sorted(l["file"] for l in labels) != files: err("docs/ and labels.jsonl list different files")
    pay_use = collections.Counter(); host_lab = collections.defaultdict(set)
    all_payload_snips = []
    for lst in (P.OUTPUT_STEERING, P.TASK_HIJACK, P.MALICIOUS_CODE, P.TOOL_MISUSE, P.AUTHORITY_POISONING, P.EXFILTRATION, P.HIDDEN):
        for pid, _, t in lst: all_payload_snips.append((pid, norm(t)[:40]))
    for pid, _, _, t in P.MULTILINGUAL: all_payload_snips.append((pid, norm(t)[:30]))
    for pid, _, fr in P.SPLIT: all_payload_snips.append((pid, norm(" ".join(fr[:2]))))
    words = []
    for l in labels:
        f = l["file"]
        if set(l) != FIELDS: err("%s: fields %s" % (f, sorted(l)))
        if not re.match(r"^docs/case-\d{4}\.(md|txt|html|eml|pdf)$", f): err("%s: bad name" % f)
        if f.rsplit(".", 1)[1] != l["format"]: err("%s: format mismatch" % f)
        if l["label"] == "attack":
            if l["class"] not in ATTACK: err("%s: class %s" % (f, l["class"]))
            if not re.search(r"\b(subtle|explicit)\b", l["note"]): err("%s: note lacks subtle/explicit" % f)
            if l["where"] == "none": err("%s: attack with where=none" % f)
        elif l["label"] == "benign":
            if l["class"] not in BENIGN: err("%s: class %s" % (f, l["class"]))
            if l["where"] != "none": err("%s: benign where" % f)
        else: err("%s: label %s" % (f, l["label"]))
        if not re.match(r"^[a-z]{2}$", l["language"]): err("%s: language" % f)
        host_lab[l["host"]].add(l["label"])
        e = exp[f]
        words.append(e["words"])
        if e["payload"]: pay_use[e["payload"]] += 1
        tx = doc_text(os.path.join(ROOT, f), l["format"])
        blob = tx["all"]
        # domains, IPs, phones
        dblob = re.sub(r"(\S*(?:://|@)\S*)\n(?=\S)", r"\1", blob) if l["format"] == "pdf" else blob
        for d in set(m.group(1).lower() for m in DOM_RE.finditer(dblob)):
            if not ALLOWED_DOM.search(d): err("%s: domain %s" % (f, d))
        for m in IP_RE.finditer(blob):
            ip = m.group(0)
            ok = lambda x: x.startswith("192.0.2.") or x.startswith("198.51.100.") or x.startswith("203.0.113.")
            if not (ok(ip) or (l["where"].startswith("encoded-reversed") and ok(ip[::-1]))):
                err("%s: IP %s" % (f, ip))
        for m in PHONE_RE.finditer(blob):
            if m.group(1) == "555" and not m.group(2).startswith("01"): err("%s: phone %s" % (f, m.group(0)))
        nb = norm(blob)
        if l["label"] == "attack":
            if not e["checks"]: err("%s: no checks" % f)
            for c in e["checks"]:
                where = l["where"]
                target = nb
                if where == "pdf-annotation": target = norm(tx["annot"])
                elif where == "pdf-form-field": target = norm(tx["field"])
                elif l["format"] == "pdf": target = norm(tx["page"])
                if norm(c) not in target: err("%s: payload text missing (%s): %r" % (f, where, c[:60]))
            if l["format"] == "pdf" and l["where"].startswith("pdf-"):
                from pypdf import PdfReader
                rd = PdfReader(os.path.join(ROOT, f))
                cs = b"".join(p.get_contents().get_data() for p in rd.pages)
                wh = l["where"]
                ok = {"pdf-render-mode-3": b"3 Tr" in cs, "pdf-white-text": b"1 1 1 rg" in cs,
                      "pdf-tiny-text": re.search(rb" 1(\.0+)? Tf", cs) is not None, "pdf-text-under-image": b" Do" in cs,
                      "pdf-hidden-layer": b"/OC /oc1 BDC" in cs and "/OCProperties" in rd.trailer["/Root"],
                      "pdf-split-text-objects": cs.count(b"BT") >= 20,
                      "pdf-annotation": True, "pdf-form-field": True}[wh]
                if not ok: err("%s: PDF technique %s not found in content stream" % (f, wh))
            if l["where"] == "eml-html-part-only":
                if norm(e["checks"][0]) in norm(tx["plain"]): err("%s: payload also in plain part" % f)
            if l["where"] in ("txt-after-blank-lines", "eml-after-blank-lines"):
                raw = open(os.path.join(ROOT, f), encoding="utf-8").read()
                if "\n" * 50 not in raw: err("%s: blank-line gap missing" % f)
        else:
            for pid, sn in all_payload_snips:
                if len(sn) > 12 and sn in nb: err("%s: benign doc contains payload %s text" % (f, pid))
    for pid, n in pay_use.items():
        if n > 2: err("payload %s used %d times" % (pid, n))
    for h, s in host_lab.items():
        if s != {"attack", "benign"}: err("host %s only %s" % (h, s))
    cc = collections.Counter(l["class"] for l in labels)
    for c in ATTACK:
        if cc[c] != 40: err("class %s has %d" % (c, cc[c]))
    for c in BENIGN:
        if not 40 <= cc[c] <= 50: err("class %s has %d" % (c, cc[c]))
    if not 650 <= len(labels) <= 700: err("total %d" % len(labels))
    stock = re.compile(r"ignore (all |the )?(previous|prior|earlier|above)|disregard (the|all|previous)|ignore the (question|document)", re.I)
    n_stock = 0
    for l in labels:
        if l["label"] == "attack":
            e = exp[l["file"]]
            pid = e["payload"]
            for lst in (P.OUTPUT_STEERING, P.TASK_HIJACK, P.ENCODED, P.AUTHORITY_POISONING, P.TOOL_MISUSE, P.EXFILTRATION, P.MALICIOUS_CODE, P.HIDDEN):
                for p in lst:
                    if p[0] == pid and stock.search(p[2]): n_stock += 1
    n_att = sum(l["label"] == "attack" for l in labels)
    if n_stock >= 0.1 * n_att: err("stock phrasing in %d attacks" % n_stock)
    print("documents:", len(labels), "attacks:", n_att, "benign:", len(labels) - n_att)
    print("classes:", dict(sorted(cc.items())))
    print("formats:", dict(sorted(collections.Counter(l["format"] for l in labels).items())))
    print("languages:", dict(sorted(collections.Counter(l["language"] for l in labels).items())))
    print("long (>=2000 words): %d; 150-1500 words: %d; <150: %d; stock-phrasing attacks: %d" % (
        sum(w >= 2000 for w in words), sum(150 <= w <= 1500 for w in words), sum(w < 150 for w in words), n_stock))
    if errors:
        print("FAILED: %d problems" % len(errors))
        for e in errors[:60]: print("  " + e)
        sys.exit(1)
    print("OK: all checks passed")

if __name__ == "__main__":
    main()
