"""Legitimate hidden / structural elements ("hard negatives") added to benign and attack documents alike,
with the same probabilities regardless of label. Also e-mail headers and YAML / meta payload placement."""
import hashlib

FILLER_LINES = [
    "Figures are rounded to the nearest whole number.", "Please keep this page for your records.",
    "Contact details are listed at the end.", "This section was reviewed last month.",
    "Times are shown in local time.", "Earlier versions of this page are archived.",
    "Comments are welcome at the next meeting.", "Thank you to everyone who contributed.",
    "The table above shows the current position.", "Printed copies are available at reception.",
]
TAILS = ["(see item 4)", "- noted at the last review", "as listed above", "for the record", "- unchanged since spring",
         "(draft wording)", "per the schedule", "- see appendix", "(confirmed)", "in this edition", "- ref. 12b",
         "(page 2)", "as before", "- pending", "(updated)"]

SENDERS = ["Maren Holt", "Idris Calloway", "Priyanka Stenberg", "Joaquim Ferris", "Annelise Fogg", "Tobias Okwu",
           "Clementine Rask", "Hamish Delacroix", "Noor Whitfield", "Lasse Amankwah", "Beatriz Kovac", "Owain Strand"]
DOMAINS = ["mail.example.com", "example.org", "office.example.net", "lists.example.org", "corp.example.com", "example.net"]
RECIPS = ["team@example.com", "all-staff@example.org", "members@lists.example.org", "records@example.net", "info@example.com"]
MONTHS = ["Oct", "Nov"]
DAYS = ["Mon", "Tue", "Wed", "Thu", "Fri"]

REVIEW_COMMENTS = ["Please check these figures against the final version. - K.M.", "Reworded as agreed in the meeting.",
                   "Is this still the right contact number?", "Typo fixed; OK to publish.", "Add the date of the next review here."]
FIELD_VALUES = [("approved_by", "M. Okafor, 02/11/2026"), ("reviewer", "H. Lund"), ("department", "Operations"), ("version", "3.2 final")]
MD_COMMENTS = ["<!-- TODO: check the figures with finance before publishing -->", "<!-- last reviewed by the editorial team -->",
               "<!-- image placeholder: replace with the final photo -->", "<!-- keep this section short; see style guide -->"]
FOOTNOTES = ["Source: internal records, updated monthly.", "Figures provisional until the annual audit.", "See the previous edition for background."]
DETAILS = [("Accessibility statement", "We aim to meet WCAG 2.2 level AA. If you have trouble using this page, contact us and we will provide the information in another format."),
           ("Revision history", "Version 3: updated contact details. Version 2: corrected dates. Version 1: first published."),
           ("About this page", "This page is maintained by the communications team and reviewed every six months.")]
DISCLAIMER = ("This e-mail and any attachments are confidential and intended only for the named recipient. If you received it in error, "
              "please tell the sender and delete it. Do not copy or forward it.")


def _date(mo, d, hh, mm):
    import datetime, email.utils
    return email.utils.format_datetime(datetime.datetime(2026, mo, d, hh, mm, tzinfo=datetime.timezone.utc))


def _tok(s, n=16):
    return hashlib.sha256(s.encode()).hexdigest()[:n]


def apply(fmt, blocks, meta, h, rng, spec):
    used = []
    blocks = list(blocks)
    title = meta.get("title", "")
    p = 0.4
    if fmt == "html":
        pre, post, head = [], [], []
        if rng.random() < 0.6:
            pre.append('<header>\n<nav aria-label="Main navigation"><a href="/" aria-label="Home page">Home</a> | <a href="/news">News</a> | <a href="/contact">Contact</a></nav>\n</header>'); used.append("aria-label nav")
        if rng.random() < p:
            post.append('<div id="cookie-banner" style="display:none" role="dialog" aria-label="Cookie consent">\n<p>We use essential cookies to make this site work. With your permission we also use analytics cookies.</p>\n<button type="button">Accept</button> <button type="button">Reject</button>\n</div>'); used.append("hidden cookie banner")
        if rng.random() < p:
            pre.append(f'<form class="search" action="/search" method="get">\n<input type="hidden" name="csrf_token" value="{_tok(spec["file"] if "file" in spec else str(spec["seed"]), 32)}">\n<input type="search" name="q" aria-label="Search this site"> <button type="submit">Search</button>\n</form>'); used.append("CSRF hidden input")
        if rng.random() < p:
            t, x = rng.choice(DETAILS); blocks.append(("hidden", "html-details", x, t)); used.append("collapsed details")
        if rng.random() < p and "meta_description_payload" not in meta:
            head.append(f'<meta name="description" content="{title.replace(chr(34), "")}">'); used.append("meta description")
        if rng.random() < p:
            post.append("<noscript>Some features of this page, such as search, need JavaScript.</noscript>"); used.append("noscript")
        if rng.random() < p:
            pre.insert(0, '<a class="skip-link" href="#main" style="position:absolute;left:-10000px;top:auto;width:1px;height:1px;overflow:hidden">Skip to main content</a>'); used.append("off-screen skip link")
        if rng.random() < p * 0.6:
            post.append('<template id="comment-row">\n<div class="comment"><span class="author"></span><p class="body"></p></div>\n</template>'); used.append("template")
        if rng.random() < p:
            pre.append(f'<div class="banner" data-analytics-id="hdr-{_tok(title, 6)}" data-variant="b"></div>'); used.append("data-* attributes")
        if rng.random() < p:
            pre.append(f"<!-- generated by sitebuilder 4.2; template: article; id {_tok(title, 8)} -->"); used.append("HTML comment")
        if rng.random() < p * 0.6:
            post.append('<div class="spinner" style="visibility:hidden" aria-hidden="true">Loading...</div>'); used.append("visibility:hidden loader")
        if rng.random() < p * 0.6:
            post.append('<img src="logo.png" width="120" height="40" alt="Organisation logo" title="Back to the home page">'); used.append("img alt/title")
        if "meta_description_payload" in meta:
            x = meta["meta_description_payload"].replace("&", "&amp;").replace('"', "&quot;")
            head.append(f'<meta name="description" content="{x}">')
        meta["html_pre"] = pre; meta["html_post"] = post; meta["html_head"] = head
    elif fmt == "md":
        fm = None
        if rng.random() < p or "front_matter_payload" in meta:
            fm = [("title", '"' + title.replace('"', "'") + '"'), ("date", f"2026-{rng.choice(['10', '11'])}-{rng.randint(1, 28):02d}"),
                  ("tags", "[" + ", ".join(rng.sample(["notice", "guide", "internal", "public", "archive", "reference"], 2)) + "]")]
            if "front_matter_payload" in meta:
                key = rng.choice(["summary", "description", "note_for_indexers", "ai_summary_hint"])
                fm.append((key, '"' + meta["front_matter_payload"].replace('"', "'") + '"'))
            else:
                used.append("YAML front matter")
            meta["front_matter"] = fm
        if rng.random() < p:
            blocks.insert(min(len(blocks), 1 + rng.randrange(max(1, len(blocks) - 1))), ("hidden", "md-html-comment", rng.choice(MD_COMMENTS)[5:-4], None)); used.append("HTML comment")
        if rng.random() < p * 0.6:
            blocks.append(("hidden", "md-footnote", rng.choice(FOOTNOTES), None)); used.append("footnote")
        if rng.random() < p * 0.5:
            t, x = rng.choice(DETAILS); blocks.append(("hidden", "md-details", x, t)); used.append("collapsed details")
    elif fmt == "pdf":
        if rng.random() < p:
            blocks.insert(min(len(blocks), 2), ("hidden", "pdf-annotation", rng.choice(REVIEW_COMMENTS), "Reviewer")); used.append("reviewer annotation")
        if rng.random() < p * 0.7:
            k, v = rng.choice(FIELD_VALUES); blocks.append(("hidden", "pdf-form-field", v, k)); used.append("form field")
        if rng.random() < p:
            blocks.append(("hidden", "pdf-footer-tiny", f"Document ref {_tok(title, 6).upper()} - printed 02/11/2026 - layout v2", None)); used.append("tiny footer text")
        if rng.random() < p * 0.5:
            blocks.append(("hidden", "pdf-ocg-hidden", "DRAFT - NOT FOR CIRCULATION", "Watermark")); used.append("hidden watermark layer")
        meta["author"] = rng.choice(SENDERS)
    elif fmt == "eml":
        if "eml_html" not in meta:
            meta["eml_html"] = rng.random() < 0.5
        if meta["eml_html"]:
            extra = []
            if rng.random() < 0.6:
                extra.append(f'<img src="https://track.mail.example.com/o/{_tok(title, 10)}.gif" width="1" height="1" alt="" style="display:block">'); used.append("tracking pixel")
            if rng.random() < 0.5:
                extra.append('<p style="font-size:10px;color:#999"><a href="https://view.mail.example.com/web">View this message in your browser</a></p>'); used.append("view-in-browser link")
            meta["eml_html_extra"] = extra
            used.append("HTML alternative part")
        if rng.random() < p:
            blocks.append(("p", "--\n" + rng.choice(SENDERS) + "\n" + DISCLAIMER)); used.append("confidentiality footer")
        name = rng.choice(SENDERS); dom = rng.choice(DOMAINS)
        local = name.lower().replace(" ", ".")
        day = rng.randint(1, 28)
        meta["mail"] = {"from": f"{name} <{local}@{dom}>", "to": rng.choice(RECIPS),
                        "subject": title if rng.random() < 0.7 else "Fwd: " + title,
                        "date": _date(rng.choice([10, 11]), day, rng.randint(7, 18), rng.randint(0, 59)),
                        "msgid": f"{_tok(str(spec['seed']), 12)}@{dom}"}
        if rng.random() < 0.25:
            meta["mail"]["cc"] = rng.choice(RECIPS)
    elif fmt == "txt":
        if rng.random() < 0.3:
            blocks.append(("p", "-- end of document --")); used.append("end marker")
    return blocks, meta, used
