"""Host constructor. Body is written in the Markdown subset understood by markup.parse."""
import re
from markup import parse

NON_PDF_LANGS = {"ja", "zh", "ko", "ar", "fa", "hi"}  # no system font for these scripts (DejaVu only)


def H(hid, lang, bclass, title, author, org, site, date, body, **kw):
    local = re.sub(r"[^a-z]+", ".", author.lower()).strip(".") or "editor"
    try:
        local.encode("ascii")
    except UnicodeEncodeError:
        local = "office"
    if not local or not re.match(r"^[a-z.]+$", local):
        local = "office"
    h = dict(id=hid, lang=lang, bclass=bclass, title=title, author=author, org=org, site=site, date=date,
             email=kw.pop("email", f"{local}@{site}"), body=body, blocks=parse(body))
    h.update(kw)
    h["formats"] = ["md", "txt", "html", "eml"] + ([] if lang in NON_PDF_LANGS else ["pdf"])
    return h
