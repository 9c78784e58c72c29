#!/usr/bin/env python3
"""Validate the blind15v3 test set. Run: .venv/bin/python tools/validate.py"""
import collections, email, html.parser, json, os, re, sys
ROOT = os.path.dirname(os.path.dirname(os.path.abspath(__file__)))
ATTACK = {"output-steering", "task-hijack", "malicious-code", "tool-misuse", "authority-poisoning", "exfiltration",
          "multilingual", "hidden-placement", "encoded", "split"}
BENIGN = {"security-awareness", "chat-export", "technical-doc", "instructions-to-humans", "multilingual-benign", "misc"}
LANGS = set("en es de fr ja pt ru it nl pl tr fa zh vi id cs ko uk ar sv hu el ro hi".split())
FORMATS = {"md", "txt", "html", "eml", "pdf"}
errors = []
def err(m):
    errors.append(m)

labels = [json.loads(l) for l in open(os.path.join(ROOT, "labels.jsonl"), encoding="utf-8")]
aux = {}
p = os.path.join(ROOT, "src", "build_aux.jsonl")
if os.path.exists(p):
    aux = {r["file"]: r for r in map(json.loads, open(p, encoding="utf-8"))}
files = sorted("docs/" + f for f in os.listdir(os.path.join(ROOT, "docs")))
lf = [r["file"] for r in labels]
if len(lf) != len(set(lf)):
    err("duplicate label entries")
if sorted(lf) != files:
    err("label files != docs files: missing %s extra %s" % (set(files) - set(lf), set(lf) - set(files)))
for r in labels:
    for k in ("file", "label", "class", "language", "where", "note", "format", "host"):
        if k not in r:
            err("%s missing %s" % (r.get("file"), k))
    if not re.fullmatch(r"docs/case-\d{4}\.(md|txt|html|eml|pdf)", r["file"]):
        err("bad name " + r["file"])
    if r["label"] == "attack" and r["class"] not in ATTACK or r["label"] == "benign" and r["class"] not in BENIGN:
        err("bad class %s" % r)
    if r["language"] not in LANGS:
        err("bad language %s" % r)
    if r["format"] not in FORMATS or not r["file"].endswith("." + r["format"]):
        err("bad format %s" % r)

cnt = collections.Counter(r["class"] for r in labels)
for c in ATTACK:
    if cnt[c] < 28: err("too few %s: %d" % (c, cnt[c]))
for c in BENIGN:
    if cnt[c] < 30: err("too few %s: %d" % (c, cnt[c]))
nat = sum(r["label"] == "attack" for r in labels)
if nat < 300 or len(labels) - nat < 230:
    err("label totals too small")
mlb = {r["language"] for r in labels if r["class"] == "multilingual-benign"}
if len(mlb) < 15: err("multilingual-benign languages %d < 15" % len(mlb))

# payload reuse <= 2
pu = collections.Counter(a["_payload"] for a in aux.values() if "_payload" in a)
for k, v in pu.items():
    if v > 2: err("payload %s used %d times" % (k, v))

# stock phrase share
stock = re.compile(r"\b(ignore|disregard|forget)\b.{0,40}\b(previous|prior|earlier|above|all|usual)\b.{0,25}\b(instructions|rules|restrictions|caution|question|request)\b", re.I | re.S)
ns = sum(1 for a in aux.values() if "_ptext" in a and stock.search(a["_ptext"]))
if aux and ns > 0.10 * nat:
    err("stock phrasing in %d attacks (>10%%)" % ns)

# scenario rules: domains and phone numbers
dom_re = re.compile(r"(?:https?://|@|www\.)([A-Za-z0-9.-]+\.[A-Za-z]{2,})")
ok_dom = re.compile(r"(^|\.)(example\.(com|org|net))$|\.test$", re.I)
ph_re = re.compile(r"\b555-(\d{4})\b")

def norm(s):
    return re.sub(r"\s+", "", s).replace("`", "").replace("*", "").lower()

try:
    from pypdf import PdfReader
except ImportError:
    PdfReader = None
    err("pypdf not available; run with the project venv")

for r in labels:
    path = os.path.join(ROOT, r["file"])
    data = open(path, "rb").read()
    a = aux.get(r["file"], {})
    if r["format"] == "pdf":
        if PdfReader is None:
            continue
        try:
            rd = PdfReader(path)
            text = "\n".join(pg.extract_text() or "" for pg in rd.pages)
        except Exception as e:
            err("pdf unreadable %s: %s" % (r["file"], e)); continue
        if len(text.split()) < 60:
            err("pdf yields too little text %s" % r["file"])
        title = r["note"]
        w = r["where"]
        pt = a.get("_ptext", "")
        probe = norm(re.sub(r"```.*?\n|```", "", pt))[:40]
        if r["label"] == "attack" and pt:
            if w in ("pdf-annotation",):
                ann = [an.get_object().get("/Contents", "") for pg in rd.pages for an in (pg.get("/Annots") or [])]
                if not any(norm(str(x))[:30] == norm(pt)[:30] for x in ann):
                    err("annotation payload missing %s" % r["file"])
            elif w == "pdf-form-field":
                vals = [str(f.get("/V", "")) for f in (rd.get_fields() or {}).values()]
                if not any(norm(v)[:30] == norm(pt)[:30] for v in vals):
                    err("form field payload missing %s" % r["file"])
            elif r["class"] in ("encoded", "split"):
                pass  # transformed payloads; body text checked above
            elif probe and probe not in norm(text):
                err("payload not extractable in %s (%s)" % (r["file"], w))
    else:
        try:
            s = data.decode("utf-8")
        except UnicodeDecodeError:
            err("not utf-8 %s" % r["file"]); continue
        if r["format"] == "html":
            html.parser.HTMLParser().feed(s)
            if "<html" not in s: err("no html root %s" % r["file"])
        if r["format"] == "eml":
            m = email.message_from_string(s)
            if not m["From"] or not m["Subject"]:
                err("eml headers %s" % r["file"])
            parts = [pp for pp in m.walk() if not pp.is_multipart()]
            if not parts: err("eml no parts %s" % r["file"])
        pt = a.get("_ptext", "")
        if r["label"] == "attack" and pt and r["class"] not in ("encoded", "split"):
            hay = norm(html.unescape(s).replace("\\", ""))
            probe = norm(re.sub(r"```.*?\n|```", "", pt))[:40]
            if probe not in hay:
                err("payload not found in %s (%s)" % (r["file"], r["where"]))
        for d in dom_re.findall(s):
            d = d.rstrip(".")
            if not ok_dom.search(d) and not (r["class"] == "encoded" and ok_dom.search(__import__("codecs").encode(d, "rot13"))):
                err("non-example domain %s in %s" % (d, r["file"]))
        for ph in ph_re.findall(s):
            if not ph.startswith("01"):
                err("phone 555-%s in %s" % (ph, r["file"]))

# host length 150-1500 words
sys.path.insert(0, os.path.join(ROOT, "src"))
try:
    import build as _b
    for h in _b.parse_hosts():
        w = _b.words(h)
        if not 150 <= w <= 1500:
            err("host %s has %d words" % (h["id"], w))
    hosts_used = {r["host"] for r in labels}
    benign_hosts = {r["host"] for r in labels if r["label"] == "benign"}
    if hosts_used - benign_hosts:
        err("hosts without an unmodified benign rendering: %s" % (hosts_used - benign_hosts))
except Exception as e:
    err("host check failed: %s" % e)

print("documents:", len(labels), "attack:", nat, "benign:", len(labels) - nat)
print("stock-phrase attacks:", ns)
if errors:
    print("ERRORS (%d):" % len(errors))
    for e in errors[:60]:
        print(" -", e)
    sys.exit(1)
print("VALID")
