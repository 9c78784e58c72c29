"""Parse hand-written hosts (hosts*.txt) and payloads (payloads.txt)."""
import glob, os
HERE = os.path.dirname(os.path.abspath(__file__))


def load_hosts():
    hosts = []
    for fn in sorted(glob.glob(os.path.join(HERE, "hosts*.txt"))):
        for chunk in open(fn, encoding="utf-8").read().split("\n=== ")[1:]:
            head, _, body = chunk.partition("\n")
            hid, lang, genre, bclass, title = [x.strip() for x in head.split("|")]
            blocks = [b.strip("\n") for b in body.strip().split("\n\n") if b.strip()]
            hosts.append(dict(id=hid, lang=lang, genre=genre, bclass=bclass, title=title, blocks=blocks))
    ext = {}
    fn = os.path.join(HERE, "ext_hosts.txt")
    if os.path.exists(fn):
        for chunk in open(fn, encoding="utf-8").read().split("\n=== ")[1:]:
            hid, _, body = chunk.partition("\n")
            ext[hid.strip()] = [b.strip("\n") for b in body.strip().split("\n\n") if b.strip()]
    for h in hosts:
        h["blocks"] += ext.get(h["id"], [])
    return hosts


def load_payloads():
    out = {}
    txt = open(os.path.join(HERE, "payloads.txt"), encoding="utf-8").read()
    for sec in txt.split("\n%% ")[1:]:
        cls, _, body = sec.partition("\n")
        cls = cls.strip()
        lst = []
        for chunk in body.split("\n@@ ")[1:] if not body.startswith("@@ ") else ("\n" + body).split("\n@@ ")[1:]:
            head, _, text = chunk.partition("\n")
            pid, lang, st = [x.strip() for x in head.split("|")]
            text = " ".join(text.strip().split("\n")) if cls != "split" else text.strip()
            p = dict(id=pid, lang=lang, subtle=(st == "subtle"), text=text)
            if cls == "split":
                p["frags"] = [f.strip() for f in text.split("\n") if f.strip()]
                p["text"] = " ".join(p["frags"])
            lst.append(p)
        out[cls] = lst
    return out
