"""Site templates and the one token stream (invented fixture pages and sites)."""

from __future__ import annotations

import json
import random
from datetime import UTC, datetime

import numpy as np

from gate import templates
from gate.checks import duplicate as dup
from gate.extract import extract
from gate.extract.html import complete_main
from gate.extract.model import Block
from gate.pipeline import RunOptions, run
from gate.policy import load_policy
from gate.tokens import block_hash, words

from .helpers import policy

AS_OF = datetime(2026, 12, 1, tzinfo=UTC)
_VOCAB = ("valve meter street closure crew notice supply bin permit parking zone library "
          "hours festival market stall grant lighting footpath bridge river hall fee "
          "refund glass paper garden clinic survey tenant advice ledger").split()


def prose(seed: int, count: int) -> str:
    rng = random.Random(seed)
    return " ".join(rng.choice(_VOCAB) for _ in range(count)) + "."


# -- the token stream --------------------------------------------------------------------

def test_markdown_html_and_plain_text_give_the_same_words():
    # CommonMark syntax for headings, emphasis, bullet lists, links and a GFM table
    # (from memory); the HTML is what a renderer makes of it
    markdown = ("# Water notice\n\nThe *supply* stops at [nine](https://x.example.org/a).\n\n"
                "* Fill a kettle\n\n| Street | Time |\n|---|---|\n| Elm | 9-12 |\n")
    html = ("<h1>Water notice</h1><p>The <em>supply</em> stops at <a href='/a'>nine</a>.</p>"
            "<ul><li>Fill a kettle</li></ul><table><tr><th>Street</th><th>Time</th></tr>"
            "<tr><td>Elm</td><td>9-12</td></tr></table>")
    plain = "Water notice\nThe supply stops at nine.\n- Fill a kettle\nStreet Time\nElm 9-12"
    expected = "water notice the supply stops at nine fill a kettle street time elm 9 12"
    assert " ".join(words(markdown)) == expected
    assert " ".join(words(html)) == expected
    assert " ".join(words(plain)) == expected


def test_block_hash_ignores_markup_case_and_spacing_only():
    assert block_hash("## Opening  Hours") == block_hash("opening hours")
    assert block_hash("Opening hours") != block_hash("Opening hour")
    assert block_hash(" -- | --- ") is None


# -- blocks of an HTML page --------------------------------------------------------------

PAGE = ("<html><body><nav><ul><li><a href='/a'>Home</a></li><li><a href='/b'>Bins</a></li>"
        "</ul></nav><main><h1>Elm Street water notice</h1><p>{body}</p><ul><li>Fill a "
        "kettle before nine.</li></ul><table><tr><td>Elm</td><td>9-12</td></tr></table>"
        "</main><footer><p>Invented Borough Council, all rights reserved.</p></footer>"
        "</body></html>")


def test_page_blocks_cover_the_whole_page_with_kinds_and_link_shares():
    extraction = extract(PAGE.format(body=prose(1, 60)).encode(), max_pages=10,
                         max_nesting=100)
    kinds = {b.text: (b.kind, b.links) for b in extraction.blocks}
    assert kinds["Home"] == ("item", 1.0)
    assert kinds["Elm Street water notice"] == ("heading", 0.0)
    assert kinds["Fill a kettle before nine."] == ("item", 0.0)
    assert kinds["Elm"] == ("cell", 0.0)
    assert kinds["Invented Borough Council, all rights reserved."][0] == "text"


def test_complete_main_adds_the_headings_and_items_trafilatura_dropped():
    blocks = (Block("Home", block_hash("Home"), main=False, links=1.0, kind="item"),
              Block("Notice title", block_hash("Notice title"), main=False, kind="heading"),
              Block("First paragraph here.", block_hash("First paragraph here."), main=True),
              Block("A list item", block_hash("A list item"), main=False, kind="item"),
              Block("Second paragraph here.", block_hash("Second paragraph here."),
                    main=True),
              Block("Footer text", block_hash("Footer text"), main=False))
    text, kept = complete_main("First paragraph here.\nSecond paragraph here.", blocks)
    assert text.split("\n") == ["Notice title", "First paragraph here.", "A list item",
                                "Second paragraph here."]
    assert [b.main for b in kept] == [False, True, True, True, True, False]
    # a line trafilatura wrote that is no block of the page: its text is kept as it is
    assert complete_main("Something else", blocks)[0] == "Something else"


# -- learning ----------------------------------------------------------------------------

def page(site: str, main: list[int], other: list[int]) -> templates.Page:
    return templates.Page(site, np.array(sorted(set(main)), dtype=np.uint64),
                          np.array(sorted(set(other) - set(main)), dtype=np.uint64))


def test_blocks_on_most_pages_of_a_host_are_template():
    menu, footer = [1, 2, 3], [4]
    pages = [page("a.example.org", [100 + i, 200 + i], menu + footer) for i in range(6)]
    learnt = templates.learn(pages)
    assert set(learnt["a.example.org"][0].tolist()) == {1, 2, 3, 4}
    assert templates.removal(pages[0], learnt) == ((1, 2, 3, 4), ())


def test_a_new_site_with_few_pages_learns_only_what_is_on_every_page():
    pages = [page("new.example.org", [100 + i], [1, 2, 3]) for i in range(2)]
    assert templates.learn(pages) == {}
    pages.append(page("new.example.org", [102], [1, 2, 4]))
    assert set(templates.learn(pages)["new.example.org"][0].tolist()) == {1, 2}
    # identical pages count once: five copies of one page are one page
    copies = [page("copy.example.org", [7], [1, 2])] * 5
    assert templates.learn(copies) == {}


def test_a_version_cluster_in_the_main_text_is_not_template():
    # six versions of one notice on a site of twenty pages: its paragraphs are in the main
    # text on 6 of 20 pages, below SHARE_ANY; an aside outside it on 6 of 20 is template
    pages = [page("b.example.org", [50, 51, 60 + i], [1, 90]) for i in range(6)]
    pages += [page("b.example.org", [300 + i], [1, 91]) for i in range(14)]
    everywhere, aside = templates.learn(pages)["b.example.org"][:2]
    assert everywhere.tolist() == [1] and aside.tolist() == [90, 91]  # not 50, 51


def test_compose_uses_the_pages_own_blocks_when_the_main_text_was_template():
    teaser = [Block(f"Teaser {i} " + prose(i, 20), block_hash(f"Teaser {i} " + prose(i, 20)))
              for i in range(5)]
    notice = [Block(prose(50 + i, 30), block_hash(prose(50 + i, 30)), main=False)
              for i in range(3)]
    menu = Block("Home Bins Roads", block_hash("Home Bins Roads"), main=False, links=1.0)
    blocks = [menu] + teaser + notice
    text = "\n".join(b.text for b in teaser)
    cleaned, info = templates.compose(text, blocks, ((menu.hash,), tuple(b.hash for b in teaser)))
    assert cleaned == "\n".join(b.text for b in notice)
    assert info["kept"] == "page" and info["template_blocks"] == 6
    # nothing learnt: the text as extracted
    assert templates.compose(text, blocks, ()) == (text, {})
    # a block named by the aside rule only, with no link or everywhere-template block
    # beside it, is a paragraph the page shares with others: it stays
    stock = ((), (notice[1].hash,))
    assert templates.compose(text, blocks, stock) == (text, {})


# -- duplicate claims --------------------------------------------------------------------

def test_same_text_other_bytes_is_exact_with_a_template_caveat():
    text = prose(3, 200)
    measured = [dup.measure(type("E", (), {"text": text})()) for _ in range(2)]
    items = [dup.Item(key=k, path=f"{k}.html", sha256=f"sha-{k}",
                      text_sha256=m["text_sha256"], minhash=m["minhash"], trust=1,
                      date=None, seen=(1, i), words=m["words"])
             for i, (k, m) in enumerate(zip("ab", measured))]
    found = dup.evaluate(items, policy("duplicates: {threshold: 0.8}").duplicates,
                         text_of=lambda key: text).findings["b"][0]
    assert found.code == "duplicate.exact"
    assert found.details["identical"] == "extracted text"
    assert found.details["words"] == 200  # prose(3, 200) is 200 words
    assert "may be a site template" in found.message
    # the same bytes: an exact copy, no caveat
    same = [dup.Item(key=k, path=f"{k}.html", sha256="sha-same", text_sha256=measured[0][
        "text_sha256"], minhash=measured[0]["minhash"], trust=1, date=None, seen=(1, i),
        words=200) for i, k in enumerate("ab")]
    copy = dup.evaluate(same, policy("duplicates: {threshold: 0.8}").duplicates,
                        text_of=lambda key: text).findings["b"][0]
    assert copy.code == "duplicate.exact" and copy.details["identical"] == "bytes"
    assert "same bytes" in copy.message and "template" not in copy.message
    # one edited word: a near-duplicate with its estimated Jaccard, never "exact"
    edited = text.replace(text.split()[100], "hydrant", 1)
    m2 = dup.measure(type("E", (), {"text": edited})())
    near = [items[0], dup.Item(key="c", path="c.html", sha256="sha-c",
                               text_sha256=m2["text_sha256"], minhash=m2["minhash"], trust=1,
                               date=None, seen=(1, 2), words=m2["words"])]
    found = dup.evaluate(near, policy("duplicates: {threshold: 0.8}").duplicates,
                         text_of=lambda key: text).findings["c"][0]
    assert found.code == "duplicate.near" and 0.8 <= found.details["similarity"] < 1.0
    assert "estimated Jaccard" in found.message


# -- a run -------------------------------------------------------------------------------

TEASERS = "".join(f"<div class='t'><h3>Teaser {i}</h3><p>{prose(5000 + i, 26)}</p></div>"
                  for i in range(24))


def portal_page(n: int) -> bytes:
    """A thin notice typed into a box beside two dozen teasers (invented portal); on
    such pages trafilatura takes the teasers for the main text."""
    notice = "<br>".join(prose(100 * n + k, 40) for k in range(4))
    return (f"<html><head><title>Notice {n}</title></head><body><div class='top'><ul>"
            + "".join(f"<li><a href='/m{i}'>Menu {i}</a></li>" for i in range(30))
            + f"</ul></div><div class='side'>{TEASERS}</div><div class='box'>"
            f"<b>Notice {n}</b><br>{notice}</div><div class='legal'><p>{prose(7, 80)}</p>"
            "</div></body></html>").encode()


def make_portal(root, pages: int):
    inbox = root / "inbox"
    inbox.mkdir(parents=True)
    lines = []
    for n in range(pages):
        (inbox / f"notice-{n}.html").write_bytes(portal_page(n))
        lines.append(json.dumps({"path": f"notice-{n}.html",
                                 "source_url": f"https://portal.example.org/n/{n}"}))
    (inbox / "manifest.jsonl").write_text("\n".join(lines) + "\n")
    policy_file = root / "policy.yaml"
    policy_file.write_text("version: 1\nname: portal\nduplicates:\n  threshold: 0.8\n")
    return inbox, load_policy(policy_file)


def test_thin_pages_on_a_heavy_template_are_told_apart(tmp_path):
    inbox, loaded = make_portal(tmp_path, 6)
    result = run(RunOptions(inbox=inbox, policy=loaded, out=tmp_path / "out", as_of=AS_OF,
                            workers=2))
    report = json.loads(result.report_path.read_text())
    assert [d["decision"] for d in report["documents"]] == ["accepted"] * 6
    text = (tmp_path / "out" / report["documents"][0]["location"] / "text.txt").read_text()
    assert prose(0, 40) in text and "Teaser" not in text and "Menu" not in text
    # the same inbox with one worker: the same report
    again = run(RunOptions(inbox=inbox, policy=loaded, out=tmp_path / "one", as_of=AS_OF,
                           workers=1))
    assert again.report_path.read_bytes() == result.report_path.read_bytes()


def test_a_new_site_of_two_pages_keeps_trafilaturas_text_and_says_so(tmp_path):
    inbox, loaded = make_portal(tmp_path, 2)
    result = run(RunOptions(inbox=inbox, policy=loaded, out=tmp_path / "out", as_of=AS_OF))
    report = json.loads(result.report_path.read_text())
    held = [r for d in report["documents"] for r in d["reasons"]]
    # two pages teach no template: the teasers are each page's text, and the claim says
    # that only the extracted text is the same and that it may be a template
    assert {r["code"] for r in held} == {"duplicate.exact"}
    assert all(r["details"]["identical"] == "extracted text" for r in held)


def test_a_new_site_of_three_pages_learns_what_is_on_every_page(tmp_path):
    # the first run of a site with three pages: the menu, teasers and legal text are on
    # all three, so they are template, and the three notices are told apart
    inbox, loaded = make_portal(tmp_path, 3)
    result = run(RunOptions(inbox=inbox, policy=loaded, out=tmp_path / "out", as_of=AS_OF))
    report = json.loads(result.report_path.read_text())
    assert [d["decision"] for d in report["documents"]] == ["accepted"] * 3
    for n, doc in enumerate(report["documents"]):
        text = (tmp_path / "out" / doc["location"] / "text.txt").read_text()
        assert prose(100 * n, 40) in text and "Teaser" not in text


def test_an_incremental_run_learns_from_the_stored_corpus(tmp_path):
    inbox, loaded = make_portal(tmp_path, 6)
    out = tmp_path / "out"
    run(RunOptions(inbox=inbox, policy=loaded, out=out, as_of=AS_OF))
    later = tmp_path / "later"
    later.mkdir()
    (later / "notice-9.html").write_bytes(portal_page(9))
    (later / "manifest.jsonl").write_text(json.dumps(
        {"path": "notice-9.html", "source_url": "https://portal.example.org/n/9"}) + "\n")
    result = run(RunOptions(inbox=later, policy=loaded, out=out, as_of=AS_OF,
                            incremental=True))
    report = json.loads(result.report_path.read_text())
    assert report["documents"][0]["decision"] == "accepted"
    text = (out / report["documents"][0]["location"] / "text.txt").read_text()
    assert prose(5000, 26) not in text and prose(900, 40) in text


def test_a_layout_cell_written_as_one_line_gives_way_to_the_pages_own_blocks():
    # trafilatura writes a layout table's cell (template and body together) as one row
    # line; it cannot be laid onto the page's blocks, so the page's own blocks are used
    notice = [Block(prose(70 + i, 20), block_hash(prose(70 + i, 20)), main=False)
              for i in range(3)]
    teaser = Block("Teaser " + prose(80, 40), block_hash("Teaser " + prose(80, 40)),
                   main=False)
    blocks = [teaser] + notice
    text = "| " + " ".join(b.text for b in blocks) + " |"
    cleaned, info = templates.compose(text, blocks, ((teaser.hash,), ()))
    assert cleaned == "\n".join(b.text for b in notice) and info["kept"] == "page"
    # so it is when the template is a small part of such a text (here 3 of 63 words):
    # the cell holds several whole blocks, whose structure (items, rows) it has lost
    small = Block("Home and contact", block_hash("Home and contact"), main=False)
    text = "| " + " ".join(b.text for b in [small] + notice) + " |"
    cleaned, info = templates.compose(text, [small] + notice, ((small.hash,), ()))
    assert cleaned == "\n".join(b.text for b in notice) and info["kept"] == "page"
    # a text whose lines are pieces of the page's paragraphs (a source that wraps its
    # lines, as a real manual's pages do) is kept when little of it is template
    wrapped = "\n".join(" ".join(b.text.split()[:10]) + "\n" + " ".join(b.text.split()[10:])
                        for b in notice)
    assert templates.compose(wrapped, [small] + notice, ((small.hash,), ()))[0] == wrapped


def test_preformatted_text_is_a_block_per_line():
    page = (b"<html><body><p>Run these two commands in the shell of the invented depot:</p>"
            b"<pre>make demo\nmake test</pre></body></html>")
    texts = [b.text for b in extract(page, max_pages=10, max_nesting=100).blocks]
    assert texts[-2:] == ["make demo", "make test"]


# -- explain learns as a run does --------------------------------------------------------

def test_explain_removes_the_template_a_run_removes(tmp_path):
    from gate import manifest as manifest_mod
    from gate.explain import explain

    inbox, loaded = make_portal(tmp_path, 6)
    result = run(RunOptions(inbox=inbox, policy=loaded, out=tmp_path / "out", as_of=AS_OF))
    report = json.loads(result.report_path.read_text())
    manifest = manifest_mod.load(inbox / "manifest.jsonl")
    for doc in report["documents"][:2]:
        found = explain(inbox / doc["path"], loaded, record=manifest.get(doc["path"]),
                        as_of=AS_OF, inbox_path=doc["path"], batch=inbox,
                        batch_manifest=manifest)
        assert found.document.extracted.text_chars == doc["text_chars"]
        assert found.decision == doc["decision"] == "accepted"
        assert found.site_template == {"site": "portal.example.org", "pages": 6,
                                       "removed": found.site_template["removed"]}
        assert found.site_template["removed"] > 24  # the teasers, menu and legal text
        assert found.document.extracted.template["kept"] == "page"
    # without the batch, one page teaches nothing: trafilatura's text, the teasers
    alone = explain(inbox / "notice-0.html", loaded, record=manifest.get("notice-0.html"),
                    as_of=AS_OF, inbox_path="notice-0.html")
    assert alone.site_template is None and alone.document.extracted.template == {}
    assert alone.document.extracted.text_chars != report["documents"][0]["text_chars"]


def test_explain_against_a_folder_learns_from_its_stored_pages(tmp_path):
    from gate.explain import explain
    from gate.manifest import ManifestRecord

    inbox, loaded = make_portal(tmp_path, 6)
    out = tmp_path / "out"
    run(RunOptions(inbox=inbox, policy=loaded, out=out, as_of=AS_OF))
    later = tmp_path / "later"
    later.mkdir()
    (later / "notice-9.html").write_bytes(portal_page(9))
    (later / "manifest.jsonl").write_text(json.dumps(
        {"path": "notice-9.html", "source_url": "https://portal.example.org/n/9"}) + "\n")
    record = ManifestRecord(path="notice-9.html", line=1,
                            source_url="https://portal.example.org/n/9")
    found = explain(later / "notice-9.html", loaded, record=record, as_of=AS_OF,
                    inbox_path="notice-9.html", against=out)
    # the incremental run into that folder measures the same text
    result = run(RunOptions(inbox=later, policy=loaded, out=out, as_of=AS_OF,
                            incremental=True))
    [doc] = json.loads(result.report_path.read_text())["documents"]
    assert found.site_template["pages"] == 7 and found.site_template["removed"] > 24
    assert found.document.extracted.text_chars == doc["text_chars"]
    assert found.decision == doc["decision"] == "accepted"


def test_explain_command_names_the_batch_and_its_template(tmp_path):
    from typer.testing import CliRunner

    from gate.cli import app

    inbox, _loaded = make_portal(tmp_path, 4)
    runner = CliRunner()
    done = runner.invoke(app, ["explain", str(inbox / "notice-1.html"), "--policy",
                               str(tmp_path / "policy.yaml"), "--batch", str(inbox),
                               "--as-of", "2026-12-01"])
    assert done.exit_code == 0, done.output
    # the manifest line of the batch gave its site; four pages teach the template
    assert "site template of portal.example.org (learnt from 4 distinct pages)" in done.output
    assert "checked: the page's own blocks" in done.output
    missing = runner.invoke(app, ["explain", str(inbox / "notice-1.html"), "--policy",
                                  str(tmp_path / "policy.yaml"), "--batch",
                                  str(tmp_path / "nowhere")])
    assert missing.exit_code != 0 and "--batch" in missing.output


# -- cross-format agreement ----------------------------------------------------------------

def test_one_body_gives_one_token_stream_in_html_pdf_text_and_markdown():
    # invented bodies with a heading, a list and a table, rendered by the tuning corpus's
    # own writers: HTML (paragraph markup and a <br> box), Markdown, three plain-text
    # exports (tab, pipe and space-aligned tables, underlined headings, 72 columns) and
    # two PDFs (fpdf2, typeset with a running footer, and one line per text line)
    import random as _random

    from benchmarks.template_corpus import make_body, renderings, title

    rng = _random.Random(7)
    for _ in range(3):
        body = make_body(rng, 500, 900)  # long enough to run over a page break in a PDF
        body["parts"][1:1] = [("heading", title(rng)), ("list", ["one item", "two items"]),
                              ("table", [["Street", "From"], ["Elm Row", "9:00"]])]
        streams = {name: words(extract(data, max_pages=50, max_nesting=100).text)
                   for name, data in renderings(body, "Invented Records Office").items()}
        assert len({tuple(s) for s in streams.values()}) == 1, {
            name: len(s) for name, s in streams.items()}


def test_a_pdfs_running_header_footer_and_page_numbers_are_not_its_text():
    from gate.extract.pdf import without_furniture

    pages = ["Invented Depot annual notice\nFirst page body line.\nMore text here.\n- 1 -",
             "Invented Depot annual notice\nSecond page body.\nPage 2 of 3",
             "Invented Depot annual notice\nThird page body.\nSee the table on page 2\n3"]
    assert without_furniture(pages) == [
        "First page body line.\nMore text here.", "Second page body.",
        # a body line that names a page stays: only a page's very last line can be a
        # page number
        "Third page body.\nSee the table on page 2"]
    # one page: only a line that is, or ends in, a page number goes
    assert without_furniture(["Invented Office\nThe notice text.\nInvented Office - page 1"]) \
        == ["Invented Office\nThe notice text."]
    # a line in the middle of a page is never furniture, whatever it says
    middle = ["Title\nPage 4\nBody one.\nBody two.\nBody three.\nEnd"]
    assert without_furniture(middle) == middle


def test_a_breadcrumb_trail_ending_in_the_pages_title_is_navigation():
    title = Block("Route N62 timetable change", block_hash("Route N62 timetable change"),
                  kind="heading")
    crumb = "Home > Routes > Service changes > Route N62 timetable change"
    trail = Block(crumb, block_hash(crumb))
    notice = [Block(prose(90 + i, 30), block_hash(prose(90 + i, 30)), main=True)
              for i in range(3)]
    menu = Block("Home Bins Roads", block_hash("Home Bins Roads"), links=1.0)
    blocks = [menu, trail, title] + notice
    text = "\n".join([crumb, title.text] + [b.text for b in notice])
    cleaned, _info = templates.compose(text, blocks, ((menu.hash,), ()))
    assert cleaned == "\n".join([title.text] + [b.text for b in notice])
    # operators and arrows in a manual's examples are no trail: one separator, short
    # parts, and a last part of two words or more that is another block of the page
    for line in ("Object > Array > Boolean > null", "f('[1, 2]', '$ ? (@ > 1)') → 3",
                 "a > b > c > Route N62 timetable change and more"):
        assert templates._crumb_trails([Block(line, block_hash(line)), title,
                                        Block("null", block_hash("null"))]) == set()



def test_a_template_heading_kept_without_what_it_heads_is_not_text():
    """Invented data: trafilatura kept "Most viewed" and "About the author" in its main
    text but not the list or the bio under them, and "On this page" over a list of links
    to the page's sections; the page's own headings, followed by its own text, stay."""
    def b(text: str, **kw) -> Block:
        return Block(text, block_hash(text), **kw)

    menu = b("Home Clinics Contact", main=False, links=1.0)
    viewed = b("Most viewed", kind="heading")
    teaser = b("Eye clinic moves on 2 May", main=False, links=1.0, kind="item")
    author = b("About the author", kind="heading")
    bio = b("A. N. Writer works for the invented trust.", main=False)
    contents = b("On this page", kind="heading")
    toc = b("Your first visit", kind="item", links=1.0)
    title = b("Falls clinic", kind="heading", title=True)
    section = b("Your first visit", kind="heading")
    own = [b(prose(300 + i, 25)) for i in range(3)]
    blocks = [menu, viewed, teaser, author, bio, contents, toc, title, own[0], section,
              own[1], own[2]]
    text = "\n".join([viewed.text, author.text, contents.text, title.text, own[0].text,
                      section.text, own[1].text, own[2].text])
    assert templates._orphan_headings(blocks) == {viewed.hash, author.hash, contents.hash}
    # a table trafilatura dropped from the main text keeps its heading
    hours = b("Opening hours", kind="heading")
    assert templates._orphan_headings([hours, b("Season", main=False, kind="cell")]) == set()
    cleaned, _info = templates.compose(text, blocks, ((menu.hash,), ()))
    assert cleaned == "\n".join([title.text, own[0].text, section.text, own[1].text,
                                 own[2].text])


# -- teaser lists, titles, export headers, stock template inside a notice (invented) --------

TEASERS = ("<div class='rel'><div>Related articles</div>" + "".join(
    f"<div><a href='/n/{i}'><strong>Other notice {i} title</strong></a><p>{prose(200 + i, 14)}"
    " ...</p></div>" for i in range(4)) + "</div>")
NOTICE = ("<html><body><nav><a href='/'>Home</a> <a href='/b'>Bins</a></nav><main>"
          "<h1>Lamp repairs on Elm Street</h1><p>{body}</p><p>{more}</p></main>{aside}"
          "<footer>Invented Borough Council</footer></body></html>")


def test_a_teaser_list_is_navigation_and_leaves_the_text():
    body, more = prose(1, 40), prose(2, 30)
    page = NOTICE.format(body=body, more=more, aside=TEASERS).encode()
    got = extract(page, max_pages=10, max_nesting=100)
    assert body in got.text and more in got.text
    assert "Other notice" not in got.text and prose(200, 14) not in got.text
    nav = [b.text for b in got.blocks if b.nav]
    assert nav[0] == "Related articles" and len(nav) == 9  # heading, 4 titles, 4 snippets
    # nor is it counted when a site's template is learnt
    summary = templates.block_summary(got.blocks)
    assert block_hash("Other notice 1 title") not in summary["main"] + summary["other"]
    # one card under a heading of its own counts too; a single linked line in a notice
    # followed by its own paragraphs does not
    one = ("<div><div>Trending questions</div><div><a href='/q'>Where is my refund?</a>"
           "</div><p>Refunds usually reach your account within five working days.</p></div>")
    got = extract(NOTICE.format(body=body, more=more, aside=one).encode(), max_pages=10,
                  max_nesting=100)
    assert "Where is my refund" not in got.text and "Refunds usually" not in got.text
    inline = NOTICE.format(body=body, more=more, aside="").replace(
        f"<p>{more}</p>", f"<p><a href='/x'>Read the bin rules</a></p><p>{more}</p>")
    got = extract(inline.encode(), max_pages=10, max_nesting=100)
    assert more in got.text and not any(b.nav for b in got.blocks)


def test_title_kept_item_teasers_and_fragment_links():
    # a thread title in a header apart from the text trafilatura takes comes back on top
    posts = "".join(f"<p>{prose(5 + i, 60)}</p>" for i in range(3))
    head = ("<html><body><div class='thread'><h1>Kettle lid does not close</h1>"
            f"<div>1849 views</div></div><div class='post'>{posts}</div></body></html>")
    got = extract(head.encode(), max_pages=10, max_nesting=100)
    assert got.text.split("\n")[0] == "Kettle lid does not close"
    # "Title - snippet" list items, the title a link: a teaser list
    items = "".join(f"<li><a href='/n/{i}'>Notice {i}</a> - {prose(300 + i, 12)}</li>"
                    for i in range(3))
    got = extract(NOTICE.format(body=prose(1, 40), more=prose(2, 30),
                                aside=f"<ul>{items}</ul>").encode(),
                  max_pages=10, max_nesting=100)
    assert prose(300, 12) not in got.text and prose(1, 40) in got.text
    # a link to a place on the same page is not a link to another page
    blocks = extract(b"<html><body><h2><a href='#s1'>Section one</a></h2><p>x y z</p>"
                     b"</body></html>", max_pages=10, max_nesting=100).blocks
    assert blocks[0].lead == 0.0 and blocks[0].links == 1.0


def test_export_headers_front_matter_and_end_markers_are_not_text():
    from gate.extract.text import without_export_header

    body = "Lamp repairs\n\nThe lamps on Elm Street are repaired on Monday."
    front = '---\ntitle: "Lamp repairs"\nsource: https://x.example.org/a\ntags:\n  - lamps\n---\n'
    assert without_export_header(front + body) == body
    header = "Invented Records export\nSource: https://x.example.org/a\nExported: 2026-03-01\n\n"
    assert without_export_header(header + body + "\n\n-- end of export --\n") == body
    ruled = "Source: https://x.example.org/a\nExported: 2026-03-01\n==========\n"
    assert without_export_header(ruled + body) == body
    # one "Key: value" line is a document's own first line, not a header
    own = "Date: Monday 3 March.\n\nThe lamps are repaired."
    assert without_export_header(own) == own
    # a rule line in Markdown, or an unclosed fence, is not front matter
    assert without_export_header("---\nNot front matter here.\n---\nText") == \
        "---\nNot front matter here.\n---\nText"
    got = extract((front + body).encode(), max_pages=10, max_nesting=100)
    assert words(got.text) == words(body)


def test_an_export_banner_naming_the_organisation_goes_when_the_text_has_its_own_title():
    """Invented data: an exporter's banner longer than a short one ("<organisation> -
    plain text export") over ``Key: value`` lines is the exporter's when the text goes on
    with an underlined or a "#" title; without such a title the first line may be the
    document's own title over a memo's header, and it all stays (from memory: plain-text
    exports underline their title with "=" as setext headings do)."""
    from gate.extract.text import without_export_header

    header = ("Invented Valley Netball League - plain text export\n"
              "Source: https://www.league.example.org/export/a.txt\nExported: 6 June 2026\n\n")
    body = ("Tigers v Kestrels moved to 17 June\n==================================\n\n"
            "Because of a power cut the game will not go ahead.")
    assert without_export_header(header + body + "\n\n-- end of export --\n") == body
    atx = "# Tigers v Kestrels moved\n\nThe game will not go ahead."
    assert without_export_header(header + atx) == atx
    memo = ("Minutes of the invented parish council's June meeting\n"
            "Chair: A. N. Other\nDate: 6 June 2026\n\nThe council met at seven.")
    assert without_export_header(memo) == memo
    # a banner far longer than a name is a sentence of the document
    long = ("The invented league's committee met on Monday and agreed the following "
            "changes to the fixtures list\n" + header.split("\n", 1)[1] + body)
    assert without_export_header(long) == long
    # a PDF footer of a page number beside the page's address (single page: no repetition)
    from gate.extract.pdf import without_furniture
    assert without_furniture(["Notice\nBody line.\nPage 1 of 1  |  https://x.example.org/a"]) \
        == ["Notice\nBody line."]
    # ordered-list numbers are markup: HTML's <ol> does not write them (CommonMark, from
    # memory: "1." and "1)" both start an ordered item)
    assert words("1. Check the card\n2) Approve it") == words("Check the card\nApprove it")
    assert words("In 2024 we said 3. things") == ["in", "2024", "we", "said", "3", "things"]


def test_stock_template_inside_a_notice_stays_where_it_stands():
    # "Closed" and a table header row are on every page of a clinic's site (template by
    # the counts) but stand between the notice's own cells
    def b(text, **kw):
        return Block(text, block_hash(text), **kw)

    menu = b("Home Notices Contact", links=1.0)
    head = [b("Day", kind="cell"), b("Hours", kind="cell")]
    own = [b("Opening hours over Easter", kind="heading"), b(prose(11, 20)),
           b("Good Friday", kind="cell"), b("Closed", kind="cell"), b("Easter Monday", kind="cell"),
           b("9:00 to 12:00", kind="cell")]
    footer = b("Invented Clinic Partnership, Harbour Road")
    blocks = [menu, own[0], own[1], *head, own[2], own[3], own[4], own[5], footer]
    strong = tuple(x.hash for x in (menu, *head, own[3], footer))
    text = "\n".join(x.text for x in blocks[1:-1])
    cleaned, _info = templates.compose(text, blocks, (strong, ()))
    assert cleaned == text  # nothing of the notice lost, menu and footer never in it
    cleaned, _info = templates.compose(text + "\n" + footer.text, blocks, (strong, ()))
    assert cleaned == text


def test_short_lines_whose_numbers_change_from_page_to_page_are_template():
    # invented help-centre pages: "Updated N days ago" and "N out of M found this
    # helpful" on every page with other numbers; the notices' own numbered lines differ
    def page(i):
        blocks = [Block(f"Updated {3 + i} days ago", block_hash(f"Updated {3 + i} days ago")),
                  Block(prose(i, 40), block_hash(prose(i, 40)), main=True),
                  Block(f"Call 0100 555 {1000 + 7 * i} before {i % 9 + 1} pm today",
                        block_hash(f"Call 0100 555 {1000 + 7 * i} before {i % 9 + 1} pm today"),
                        main=True) if i % 3 == 0 else
                  Block(prose(100 + i, 12), block_hash(prose(100 + i, 12)), main=True),
                  Block(f"{i + 2} out of {i + 9} found this helpful",
                        block_hash(f"{i + 2} out of {i + 9} found this helpful"))]
        return blocks, templates.Page.of("help.example.org html", templates.block_summary(blocks))
    pages = [page(i) for i in range(10)]
    learnt = templates.learn([p for _b, p in pages])
    assert len(learnt["help.example.org html"][2]) == 2  # the two lines, not the "Call" one
    blocks, mine = pages[4]
    drop = templates.removal(mine, learnt)
    # they go wherever they stand (with the blocks that quote titles or are stock comments)
    assert set(drop[3]) == {blocks[0].hash, blocks[3].hash} and not drop[0]
    text = "\n".join(b.text for b in blocks)
    cleaned, _info = templates.compose(text, blocks, drop)
    assert cleaned == "\n".join(b.text for b in blocks[1:3])
    # a line of one wording on every page is the exact rule's, not a shape
    assert templates.shape_hash("Open 9 to 5") is not None
    assert templates.shape_hash("2024") is None and templates.shape_hash("Opening hours") is None
    assert templates.shape_hash("Notice 2") is None  # a numbered title is too short


def test_glossaries_in_page_contents_and_sentences_that_begin_with_a_link_are_text():
    # shapes seen in a real HTML manual (DocBook output, from memory): a glossary whose
    # terms link elsewhere, a section's contents linking to #fragments above its first
    # paragraph, a paragraph that begins with a cross-reference
    glossary = "<dl>" + "".join(
        f"<dt><a href='/g{i}.html'>Term{i}</a></dt><dd>{prose(400 + i, 12)}</dd>"
        for i in range(4)) + "</dl>"
    contents = ("<h2>Custom plans</h2><dl><dt><a href='p.html#cb'>Plan callbacks</a></dt>"
                f"</dl><p>{prose(410, 30)}</p><h3>Plan callbacks</h3>")
    xref = (f"<h3>Operators</h3><p><a href='other.html'>Table 9</a> {prose(420, 20)}</p>"
            "<p>Table 9. Match operators</p>")
    for part in (glossary, contents, xref):
        page = f"<html><body><main><h1>Manual page</h1><p>{prose(430, 40)}</p>{part}</main>" \
               "</body></html>"
        got = extract(page.encode(), max_pages=10, max_nesting=100)
        assert not any(b.nav for b in got.blocks), part
    # a page that is only a list of teasers keeps them (an index page)
    index = "<html><body>" + TEASERS + "</body></html>"
    got = extract(index.encode(), max_pages=10, max_nesting=100)
    assert prose(201, 14) in got.text and not any(b.nav for b in got.blocks)


def test_an_export_line_with_the_pages_address_and_date_is_learnt_as_template():
    # invented text exports of one host: the first line names each page's own address
    # and export date; written-out addresses are not words, so the line's shape recurs
    def page(i):
        text = (f"Exported from https://exports.example.net/n/notice-{i}.htm on "
                f"2026-0{1 + i % 9}-1{i % 10}\n\nNotice {i}\n{prose(500 + i, 40)}")
        blocks = extract(text.encode(), max_pages=10, max_nesting=100).blocks
        return text, blocks, templates.Page.of("exports.example.net text",
                                               templates.block_summary(blocks))
    pages = [page(i) for i in range(5)]
    learnt = templates.learn([p for _t, _b, p in pages])
    text, blocks, mine = pages[2]
    cleaned, _info = templates.compose(text, blocks, templates.removal(mine, learnt))
    assert cleaned.split("\n")[0] == "Notice 2"
    assert words("Source: https://x.example.org/a-2.htm") == ["source"]


# -- teasers quoting titles, rotating blocks, signed comments, bylines (invented) -----------

def _blocks(*specs: tuple) -> list[Block]:
    """Blocks from (text, keyword arguments) pairs or plain texts."""
    out = []
    for spec in specs:
        text, more = (spec, {}) if isinstance(spec, str) else spec
        out.append(Block(text, block_hash(text), **more))
    return out


def test_lists_quoting_other_pages_titles_are_teasers():
    # an invented school site: each page's <h1> is its title; an unlinked "Upcoming
    # events" list quotes other pages' titles with a date, a "More events" list quotes
    # them with their first words
    titles = [f"Seminar on {w} and {v} in estuaries" for w, v in
              zip(_VOCAB[:8], _VOCAB[8:16])]
    def blocks_of(i: int) -> list[Block]:
        others = [t for j, t in enumerate(titles) if j != i][:3]
        return _blocks(
            ("Invented School home", {"links": 1.0, "main": False}),
            (titles[i], {"kind": "heading", "title": True}),
            prose(300 + i, 40),
            # a story's update begins with the story's own words: it stays
            f"{titles[(i + 1) % 8]} was moved to the main hall, as {prose(400 + i, 12)}",
            prose(310 + i, 30),
            ("Upcoming events", {"kind": "heading"}),
            *[(f"{t} {3 + k} March 2026", {"kind": "item"}) for k, t in enumerate(others)],
            ("More events", {"kind": "heading"}),
            *[(f"{t} {prose(500 + k, 10)}", {"kind": "item"}) for k, t in enumerate(others)],
            ("Invented School, all rights reserved.", {"main": False}))
    pages = [(b := blocks_of(i), templates.Page.of("school.example.org html",
                                                   templates.block_summary(b)))
             for i in range(8)]
    assert pages[0][1].title == " ".join(words(titles[0]))
    learnt = templates.learn([p for _b, p in pages])
    blocks, mine = pages[2]
    drop = templates.removal(mine, learnt)
    assert " ".join(words(titles[2])) not in drop[2]  # its own title is not a teaser
    text = "\n".join(b.text for b in blocks[1:-1])
    cleaned, info = templates.compose(text, blocks, drop)
    assert cleaned.split("\n") == [b.text for b in blocks[1:5]], info
    # quoting needs a title of three words or more, and the quoting block must begin
    # with it: "was moved" in the middle of a sentence quotes nothing
    assert templates._quoting(_blocks("Notice two", "The Notice two text"), ["notice two"]) \
        == set()


def test_rotating_answers_and_bylines_under_a_template_heading_go():
    # an invented forum: each thread shows three of six stock answers, each followed by a
    # byline ("answered by ..."), under an "Other answers" heading on every page
    stock = [prose(600 + k, 18) for k in range(6)]
    def blocks_of(i: int) -> list[Block]:
        answers = [stock[(i + k) % 6] for k in range(3)]
        return _blocks(("Invented Forum", {"links": 1.0}),
                       (f"Thread {i} " + prose(700 + i, 6), {"kind": "heading", "title": True}),
                       prose(710 + i, 40), prose(720 + i, 30),
                       ("Other answers", {"kind": "heading"}),
                       *[part for k, a in enumerate(answers)
                         for part in (a, f"answered by Reader {chr(65 + (i + k) % 26)}.")],
                       ("Related threads", {"kind": "heading", "main": False}))
    pages = [(b := blocks_of(i), templates.Page.of("forum.example.org html",
                                                   templates.block_summary(b)))
             for i in range(12)]
    learnt = templates.learn([p for _b, p in pages])
    strong, weak = learnt["forum.example.org html"][:2]
    assert block_hash(stock[0]) in weak.tolist()  # on 6 of 12 pages, in the main text
    blocks, mine = pages[3]
    text = "\n".join(b.text for b in blocks[1:-1])
    cleaned, _info = templates.compose(text, blocks, templates.removal(mine, learnt))
    assert cleaned.split("\n") == [b.text for b in blocks[1:4]]


def test_signed_comments_that_recur_under_other_names_are_template():
    assert templates.signed_hash("Can you post a photo? - Ann B.") == \
        templates.signed_hash("Can you post a photo? - Tomas K.")
    assert templates.signed_hash("Can you post a photo?") is None
    assert templates.signed_hash("Monday - Closed all day") is None  # no signature
    # a row of opening hours is no signed sentence
    assert templates.signed_hash("Opening hours on Saturday - Closed") is None
    questions = ["Does it happen every time or only sometimes?",
                 "Did this start after an update?", "Which firmware version is it?"]
    def blocks_of(i: int) -> list[Block]:
        return _blocks((f"Thread {i} title words", {"kind": "heading", "title": True}),
                       prose(800 + i, 40),
                       *[(f"{q} - Reader {chr(65 + (i * 3 + k) % 26)}.", {"kind": "item"})
                         for k, q in enumerate(questions)],
                       prose(810 + i, 30))
    pages = [(b := blocks_of(i), templates.Page.of("qa.example.org html",
                                                   templates.block_summary(b)))
             for i in range(6)]
    learnt = templates.learn([p for _b, p in pages])
    blocks, mine = pages[1]
    drop = templates.removal(mine, learnt)
    assert set(drop[3]) == {b.hash for b in blocks[2:5]}
    text = "\n".join(b.text for b in blocks)
    cleaned, _info = templates.compose(text, blocks, drop)
    # between the page's own paragraphs, and still gone: they are no stock sentence
    assert cleaned.split("\n") == [blocks[0].text, blocks[1].text, blocks[5].text]


def test_dates_with_month_names_make_one_shape():
    assert templates.shape_hash("Last reviewed 3 May 2026") == \
        templates.shape_hash("Last reviewed 29 November 2025")
    long_line = ("Page last updated 9 April 2026. Best viewed at 800 x 600. Webmaster: "
                 "webmaster at club.example.net. You are visitor number 25065.")
    assert templates.shape_hash(long_line) is not None  # up to 30 words
    assert templates.shape_hash("May 2026") is None  # only a date


def test_trafilaturas_text_stays_when_most_of_it_is_the_pages_own():
    # the page's own blocks (a notice plus readers' comments and an author's note) hold
    # far more words than trafilatura's text once the template is out; the text was
    # mostly the notice, so it is kept and the comments do not come in
    menu = _blocks(("Home Bins Roads", {"links": 1.0, "main": False}))
    notice = _blocks(prose(900, 40), prose(901, 30))
    comments = _blocks(*[(prose(910 + i, 25), {"main": False}) for i in range(6)])
    blocks = menu + notice + comments
    text = "\n".join(b.text for b in menu + notice)
    cleaned, info = templates.compose(text, blocks, ((menu[0].hash,), ()))
    assert cleaned == "\n".join(b.text for b in notice) and info["kept"] == "main"
    # a text that was mostly template gives way to the page's own blocks
    text = "\n".join(b.text for b in menu * 40 + notice[:1])
    cleaned, info = templates.compose(text, blocks, ((menu[0].hash,), ()))
    assert info["kept"] == "page"


def test_completion_stops_at_a_heading_after_the_text():
    blocks = tuple(_blocks(("Notice title", {"kind": "heading"}), "First paragraph here.",
                           ("A closing item", {"kind": "item", "main": False}),
                           ("Trending", {"kind": "heading", "main": False}),
                           ("Other story title", {"kind": "item", "main": False})))
    text, _kept = complete_main("Notice title\nFirst paragraph here.", blocks)
    assert text.split("\n") == ["Notice title", "First paragraph here.", "A closing item"]


def test_teaser_cards_between_site_map_links_are_a_teaser_list():
    from gate.extract.html import teaser_lists

    links = [("Parks", {"links": 1.0, "lead": 1.0, "kind": "item"}),
             ("Licensing", {"links": 1.0, "lead": 1.0, "kind": "item"})]
    blocks = _blocks(prose(950, 40), ("Explore the site", {"kind": "heading", "main": False}),
                     *[part for k in range(3) for part in (
                         (f"Other notice {k} title", {"links": 1.0, "lead": 1.0}),
                         prose(960 + k, 14), *links)])
    # the heading, three cards and the links between them (the links after the last
    # card are the site map's own)
    assert teaser_lists(blocks) == set(range(1, 12))


def test_a_printed_pages_title_header_and_address_footer_are_furniture():
    from gate.extract.pdf import without_furniture

    page = ("Invented Club - Minutes - Committee meeting held on 6 May\n"
            "Committee meeting held on 6 May\nThe meeting opened at 7pm.\n"
            "Page 1 of 1 - https://club.example.net/files/minutes.pdf")
    assert without_furniture([page]) == [
        "Committee meeting held on 6 May\nThe meeting opened at 7pm."]
    # a first line whose last part is not what the page goes on with stays
    other = "Budget - Summary\nThe council set its budget.\nMore text."
    assert without_furniture([other]) == [other]


def test_a_pages_title_stays_though_every_page_links_to_it():
    # an invented docs site whose sidebar on every page links to every guide: the link
    # texts are the guides' titles, so each title is on every page
    titles = [f"Guide to the {w} {v} setup" for w, v in zip(_VOCAB[:6], _VOCAB[6:12])]
    def blocks_of(i: int) -> list[Block]:
        return _blocks(*[(t, {"links": 1.0, "lead": 1.0, "kind": "item", "main": False})
                         for t in titles],
                       (titles[i], {"kind": "heading", "title": True}),
                       prose(1000 + i, 40))
    pages = [(b := blocks_of(i), templates.Page.of("docs.example.net html",
                                                   templates.block_summary(b)))
             for i in range(6)]
    learnt = templates.learn([p for _b, p in pages])
    assert block_hash(titles[2]) in learnt["docs.example.net html"][0].tolist()
    blocks, mine = pages[2]
    text = "\n".join(b.text for b in blocks[-2:])
    cleaned, _info = templates.compose(text, blocks, templates.removal(mine, learnt))
    assert cleaned == text


# -- blocks that recur on a few distinct documents, whatever their share -------------------
# (invented data: a clinic's notices with a promotion the template rotates through a pool
# of variants, each on a few pages, and a stock closing sentence that some notices share)

PROMOS = ("Register online in five minutes and choose your nearest invented clinic.",
          "Ask about the monthly care plan that spreads the cost of your visits.",
          "Our hygienists can now be booked directly from the invented app.",
          "Missed appointments cost everyone, so please give a day's notice.")
STOCK = "This notice will be updated as soon as we know more about the change."


def clinic_page(n: int, promo: str | None, stock: bool) -> bytes:
    own = [prose(700 + 10 * n + k, 30) for k in range(3)]
    box = f"<div class='promo'><strong>{promo}</strong></div>" if promo else ""
    return (f"<html><head><title>Clinic notice {n}</title></head><body>"
            "<nav><a href='/'>Home</a> <a href='/n'>Notices</a> <a href='/c'>Contact</a></nav>"
            f"<main><h1>Clinic notice {n} {prose(n, 3)}</h1><p>{own[0]}</p>{box}"
            f"<p>{own[1]}</p><p>{own[2]}</p>" + (f"<p>{STOCK}</p>" if stock else "") +
            f"</main><footer><p>{prose(9, 30)}</p></footer></body></html>").encode()


def make_clinic(inbox, numbers, pool=PROMOS):
    inbox.mkdir(parents=True)
    lines = []
    for n in numbers:
        (inbox / f"notice-{n}.html").write_bytes(
            clinic_page(n, pool[n % len(pool)] if pool else None, stock=n % 3 == 0))
        lines.append(json.dumps({"path": f"notice-{n}.html",
                                 "source_url": f"https://clinic.example.org/n/{n}"}))
    (inbox / "manifest.jsonl").write_text("\n".join(lines) + "\n")


def clinic_texts(out, report) -> dict[str, str]:
    return {d["path"]: (out / d["location"] / "text.txt").read_text()
            for d in report["documents"]}


def test_a_rotating_promotion_goes_and_a_stock_sentence_stays(tmp_path):
    # twelve notices, four promotions each on three of them (a quarter of the pages, below
    # every share rule), a stock sentence closing four notices as a paragraph of theirs
    make_clinic(tmp_path / "inbox", range(12))
    (tmp_path / "p.yaml").write_text("version: 1\nname: clinic\n")
    result = run(RunOptions(inbox=tmp_path / "inbox", policy=load_policy(tmp_path / "p.yaml"),
                            out=tmp_path / "out", as_of=AS_OF))
    report = json.loads(result.report_path.read_text())
    assert [d["decision"] for d in report["documents"]] == ["accepted"] * 12
    for path, text in clinic_texts(tmp_path / "out", report).items():
        n = int(path.split("-")[1].split(".")[0])
        assert not any(promo in text for promo in PROMOS), path
        assert all(prose(700 + 10 * n + k, 30) in text for k in range(3)), path
        assert (STOCK in text) == (n % 3 == 0), path


def test_a_first_run_of_few_pages_keeps_a_promotion_a_later_run_learns_it(tmp_path):
    # four pages, two promotions each on two: too few documents to call either template,
    # and nothing of the pages' own goes; a later run adds four pages, and the stored
    # pages' blocks (from the cache) give each promotion its third document
    pool = PROMOS[:2]
    make_clinic(tmp_path / "first", range(4), pool)
    (tmp_path / "p.yaml").write_text("version: 1\nname: clinic\n")
    loaded, out = load_policy(tmp_path / "p.yaml"), tmp_path / "out"
    result = run(RunOptions(inbox=tmp_path / "first", policy=loaded, out=out, as_of=AS_OF))
    report = json.loads(result.report_path.read_text())
    for path, text in clinic_texts(out, report).items():
        n = int(path.split("-")[1].split(".")[0])
        assert pool[n % 2] in text and prose(700 + 10 * n, 30) in text
    make_clinic(tmp_path / "later", range(4, 8), pool)
    result = run(RunOptions(inbox=tmp_path / "later", policy=loaded, out=out, as_of=AS_OF,
                            incremental=True))
    report = json.loads(result.report_path.read_text())
    texts = clinic_texts(out, report)
    assert len(texts) == 4
    for path, text in texts.items():
        n = int(path.split("-")[1].split(".")[0])
        assert not any(promo in text for promo in pool), path
        assert prose(700 + 10 * n + 1, 30) in text


def test_a_block_on_versions_of_one_document_is_not_recurring_template():
    # a notice republished three times (updated, printable) shares its paragraphs with its
    # versions: one document, not three, and its blocks stay; a line on three different
    # notices (own blocks 10.., 20.., 30..) is recurring
    pages = [page("v.example.org", [50, 51, 52, 53, 60 + i], [1]) for i in range(3)]
    pages += [page("v.example.org", [100 * k + j for j in range(4)] + [77], [1])
              for k in range(1, 4)]
    pages += [page("v.example.org", [1000 + k], [1]) for k in range(4)]
    recurring = templates.learn(pages)["v.example.org"][7].tolist()
    assert recurring == [77]


def test_a_recurring_block_goes_only_out_of_line_with_the_pages_text():
    own = [(prose(40 + k, 25), {"markup": "p"}) for k in range(3)]
    promo = ("Ask about the monthly plan for your visits.", {"markup": "div.promo"})
    stock = (STOCK, {"markup": "p"})
    head = ("How to comment", {"kind": "heading", "markup": "h2"})
    advice = ("Fill a kettle before the work begins.", {"kind": "item", "markup": "li"})
    blocks = _blocks(own[0], promo, own[1], head, stock, advice, own[2])
    # the promotion, the heading, the stock sentence and the stock list item recur
    recurring = (blocks[1].hash, blocks[3].hash, blocks[4].hash, blocks[5].hash)
    text = "\n".join(b.text for b in blocks)
    cleaned, info = templates.compose(text, blocks, ((), (), (), (), (), recurring))
    assert promo[0] not in cleaned and info["kept"] == "main"
    # the stock paragraph is marked up as the notice's paragraphs, its heading heads it, and
    # a list item is the page's structure, not a box put into it
    assert cleaned == "\n".join(b.text for b in blocks if b is not blocks[1])


def test_a_header_naming_the_source_above_the_texts_own_title_is_not_text():
    """Invented data: an exporter's header in free wording (the organisation, "Text export
    of <address>", the export date) over a blank line and the text's own underlined
    title goes; short lines above a title that name no address stay (they may be the
    document's own), and so does a header with no title of the text's own after it."""
    from gate.extract.text import without_export_header

    body = ("Lamp repairs on Elm Street\n==========================\n\n"
            "The lamps on Elm Street are repaired on Monday.")
    header = ("INVENTED LAMP TRUST\nText export of https://lamps.example.org/news/elm\n"
              "Exported 6 June 2026 (plain text version)\n\n")
    assert without_export_header(header + body) == body
    atx = "# Lamp repairs on Elm Street\n\nThe lamps are repaired on Monday."
    assert without_export_header(header + atx) == atx
    no_address = "INVENTED LAMP TRUST\nNotice to residents\n\n" + body
    assert without_export_header(no_address) == no_address
    untitled = header + "The lamps on Elm Street are repaired on Monday."
    assert without_export_header(untitled) == untitled
    longer = "".join(f"Line {i} of www.lamps.example.org/{i}\n" for i in range(5))
    assert without_export_header(longer + "\n" + body) == longer + "\n" + body


def test_a_pdf_header_of_the_sites_name_and_the_title_without_a_mark_between_is_furniture():
    # invented data: the header sets the site's name and the title side by side, and
    # the page goes on with the title alone
    from gate.extract.pdf import without_furniture

    page = ("Invented Records Office Road closures this week\nRoad closures this week\n"
            "Elm Street is closed on Monday.")
    assert without_furniture([page]) == [
        "Road closures this week\nElm Street is closed on Monday."]
    # a two-word title at a first line's end is too little to call the line a header
    short = "Report of the Annual Meeting\nAnnual Meeting\nThe meeting opened at 7pm."
    assert without_furniture([short]) == [short]


def test_a_table_of_the_pages_own_is_not_anchored_by_a_box_beside_it():
    # invented data: a newsletter box (weak, beside a link) stands just above a table
    # whose header row recurs on many notices of the site (weak too); the run of weak
    # blocks stops at the table, whose cells do not anchor nor get anchored by the box
    box = "Subscribe to daily alerts for a court of your choice."
    head = ["Type of hearing", "Where it will be heard"]
    blocks = _blocks(("Closure of the invented court", {"kind": "heading", "title": True}),
                     prose(1, 30),
                     ("Find out more", {"links": 1.0, "main": False}),
                     (box, {"main": False}),
                     *[(cell, {"kind": "cell", "main": False}) for cell in head],
                     ("Urgent applications", {"kind": "cell", "main": False}))
    weak = {block_hash(box)} | {block_hash(cell) for cell in head}
    drop = templates._dropped(blocks, set(), weak)
    assert block_hash(box) in drop
    assert not drop & {block_hash(cell) for cell in head}


def test_a_weak_paragraph_marked_up_as_the_pages_opening_stays_beside_a_box():
    # invented data: a stock paragraph of a site's notices (weak: on a fifth of the pages)
    # in the main text with the markup of the page's opening paragraph stays beside a
    # promotion box on most pages; an answer marked up otherwise goes with the box
    stock = "Sessions are free for members and cost five pounds for everyone else."
    answer = "Have you tried a completely fresh profile? Old settings linger."
    promo = "Members get ten per cent off parts this month."
    title = ("Brake tuning evening", {"kind": "heading", "title": True, "markup": "h1"})
    opening = (prose(2, 30), {"markup": "article>p"})
    for text, markup, kept in ((stock, "article>p", True), (answer, "div.answer>p", False)):
        blocks = _blocks(title, ("Published 2 April 2026", {"markup": "p.dateline"}),
                         opening, (promo, {"main": False, "markup": "div.promo"}),
                         (text, {"markup": markup}))
        drop = templates._dropped(blocks, {block_hash(promo)}, {block_hash(text)})
        assert (block_hash(text) not in drop) is kept


def test_a_closing_markdown_link_back_and_a_header_title_cut_without_an_ellipsis_go():
    # invented data: a Markdown export closes with one reference-style link back to the
    # original (an HTML page's link-dominated block, no text in the HTML copy); a PDF's
    # header cuts the title at a set width with no ellipsis, and the title then wraps
    from gate.extract.pdf import without_furniture
    from gate.extract.text import without_export_header

    body = "# Lamp repairs\n\nThe lamps on Elm Street are repaired on Monday."
    closing = "\n\n[Read the original notice][src]\n\n[src]: https://lamps.example.org/a\n"
    assert without_export_header(body + closing) == body
    # a link inside the text's last paragraph, or a link line with no reference after it,
    # stays (from memory: CommonMark reference-style links)
    inline = body + "\n\n[Apply for a permit](https://lamps.example.org/permit)"
    assert without_export_header(inline) == inline
    sentence = body + "\n\nSee [the map][m] for the streets.\n\n[m]: https://lamps.example.org/m"
    assert without_export_header(sentence) == sentence
    page = ("Invented Planning Register  |  AL/26/0412/FUL: Single storey rear extension "
            "with roof lante\nAL/26/0412/FUL: Single storey rear\nextension with roof "
            "lantern\nReceived 3 March")
    assert without_furniture([page]) == [page.split("\n", 1)[1]]
