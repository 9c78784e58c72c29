"""Template mechanics the stress benchmark (benchmarks/template_stress.py) perturbs: one
body in other formats must give the words HTML gives. Texts are invented for the tests."""

from __future__ import annotations

from benchmarks.corpus import pdf_document
from gate.extract import extract
from gate.extract.text import joined_hyphens
from gate.tokens import words


def test_markdown_reference_links_give_their_text_only():
    # CommonMark 0.31, "Link reference definitions" and full/collapsed reference links
    markdown = ("Road [works begin][1] on Monday and ![the map][] shows the [detour][route].\n"
                "\n[1]: https://works.example.org/a \"Works\"\n[route]: /detour\n")
    assert words(markdown) == words("Road works begin on Monday and the map shows the detour.")


def test_a_word_broken_at_a_lines_end_is_made_whole():
    text = ("The residents of the north district will see the\n"
            "works start soon. The resi-\ndents asked for a survey.")
    assert joined_hyphens(text).split("\n") == [
        "The residents of the north district will see the",
        "works start soon. The residents", "asked for a survey."]


def test_a_broken_word_seen_nowhere_else_is_joined_when_a_piece_is_no_word():
    # "vaccina" and "tion" occur nowhere as words: the pieces of one word (from memory)
    assert joined_hyphens("the vaccina-\ntion clinic") == "the vaccination\nclinic"


def test_a_compound_whose_parts_occur_alone_keeps_its_hyphen():
    # "well" and "known" both occur alone and "wellknown" never: a compound, as HTML
    # writes "well-known" (two words); invented text
    text = "a well-\nknown route, well lit and known to all"
    assert joined_hyphens(text) == text
    assert words(joined_hyphens(text))[:3] == ["a", "well", "known"]


def test_hyphens_that_break_no_word_stay():
    for text in ("a list --\nnext", "call 555-\n0100", "x-\nray", "Part A-\nPart B"):
        assert joined_hyphens(text) == text


def test_hyphenated_text_and_pdf_give_the_words_of_the_unbroken_body():
    body = ("Residents of the harbour district will find the community centre closed for "
            "insulation works during the winter holiday; the vaccination clinic moves to "
            "the library for those weeks.")
    wrapped = ["Residents of the harbour district will find the commu-",
               "nity centre closed for insulation works during the win-",
               "ter holiday; the vaccination clinic moves to the lib-",
               "rary for those weeks."]
    text = extract("\n".join(wrapped).encode(), max_pages=5, max_nesting=50).text
    pdf = extract(pdf_document([wrapped]), max_pages=5, max_nesting=50).text
    assert words(text) == words(body)
    assert words(pdf) == words(body)


def _page(i: int, lines: list[str], title: str):
    from gate import templates
    from gate.extract.model import Block
    from gate.tokens import block_hash
    body = [f"{title} paragraph {k} " + " ".join(f"w{i}x{k}y{j}" for j in range(40))
            for k in range(2)]
    texts = [(title, "heading", True), (lines[0], "text", False), (body[0], "text", False),
             (lines[1], "text", False), (body[1], "text", False)]
    blocks = [Block(t, block_hash(t), kind=kind, main=True, title=is_title)
              for t, kind, is_title in texts]
    return blocks, templates.Page.of("reviews.example.net html", templates.block_summary(blocks))


def test_lines_that_differ_by_names_dates_or_the_pages_title_are_template():
    # invented pages (stress benchmark's 'varying-lines' and 'share-title'): a reviewer's
    # name and date, and a line naming the page's own title, between the page's own
    # paragraphs; every page has them in a wording of its own
    from gate import templates
    names = ("Ada Quill", "Bo Marrin", "Cleo Tarrant", "Dov Elsby", "Ena Rook")
    months = ("March", "May", "June", "October", "December")
    pages = [_page(i, [f"Last reviewed {i + 3} {months[i % 5]} 2026 by {names[i % 5]}",
                       f"Share Notice number {'abcdefgh'[i]} with a friend"],
                   f"Notice number {'abcdefgh'[i]}") for i in range(8)]
    learnt = templates.learn([p for _b, p in pages])
    blocks, mine = pages[2]
    drop = templates.removal(mine, learnt)
    text = "\n".join(b.text for b in blocks)
    cleaned, _info = templates.compose(text, blocks, drop)
    # the title and the two paragraphs stay; the two lines go although they stand
    # between paragraphs of the page's own
    assert cleaned.split("\n") == [blocks[0].text, blocks[2].text, blocks[4].text]
    signed_in = templates.shape_hash("Signed in as Ada Quill - page 3 of 40")
    assert signed_in is not None and \
        signed_in == templates.shape_hash("Signed in as Bo Marrin - page 7 of 12")
    assert templates.shape_hash("Opening hours today") is None  # no number, no name
    # names without a number are content: a cast table's row in a text copy
    assert templates.shape_hash("Narrator      Delphine Nettleford") is None
    # a weekday is a date's word like a month
    assert templates.shape_hash("Published Thursday 10 September. Updated 2 hours ago.") == \
        templates.shape_hash("Published Monday 3 March. Updated 20 hours ago.")


def test_a_name_line_in_one_wording_is_left_to_the_exact_rule():
    # the same reviewer everywhere: one wording, so no shape is learnt (invented)
    from gate import templates
    pages = [_page(i, ["Reviewed by Ada Quill of the board", f"Page note {'abcdefgh'[i]} x y"],
                   f"Notice number {'abcdefgh'[i]}") for i in range(6)]
    learnt = templates.learn([p for _b, p in pages])
    assert not learnt["reviews.example.net html"][2]


def test_teaser_snippets_told_elsewhere_go_where_the_list_was_broken_up():
    # invented pages (stress benchmark's 'mixed-soup'): a section's teasers (a linked
    # title, an unlinked snippet) are a teaser list on most pages; on one page other boxes
    # stand between them, the list is not told, and its snippets were counted as text
    from gate import templates
    from gate.extract.model import Block
    from gate.tokens import block_hash

    def b(text, **kw):
        return Block(text, block_hash(text), **kw)

    snippet = "Street works on the north route close the footpath for three weeks in May."
    own = "Our notice number {} explains the new rates " + " ".join(f"w{j}" for j in range(40))
    pages = []
    for i in range(8):
        told = i != 3
        blocks = [b(f"Notice {'abcdefgh'[i]} of the harbour office", kind="heading",
                    title=True, main=True),
                  b(own.format(i), main=True),
                  b("North route works", links=1.0, lead=1.0, nav=told),
                  b(snippet, nav=told, main=not told),
                  b("Rates for moorings", links=1.0, lead=1.0, nav=told),
                  b(f"Mooring rates change in spring {'abcdefgh'[i]} for every berth here.",
                    nav=told)]
        pages.append((blocks, templates.Page.of("harbour.example.net html",
                                                templates.block_summary(blocks))))
    learnt = templates.learn([p for _b, p in pages])
    blocks, mine = pages[3]
    drop = templates.removal(mine, learnt)
    text = "\n".join(x.text for x in blocks[:2] + blocks[3:4])
    cleaned, _info = templates.compose(text, blocks, drop)
    assert cleaned.split("\n") == [blocks[0].text, blocks[1].text]
    # the linked titles are never learnt so: another page's title stays on that page
    assert block_hash("North route works") not in {int(h) for h in learnt[
        "harbour.example.net html"][1]}


def _dated(i: int, lines: list[tuple[str, str]]):
    """An invented notice: its title, then ``lines`` (text, kind), then two paragraphs."""
    from gate import templates
    from gate.extract.model import Block
    from gate.tokens import block_hash
    title = f"Notice number {'abcdefghijkl'[i]}"
    body = [f"{title} paragraph {k} " + " ".join(f"w{i}x{k}y{j}" for j in range(40))
            for k in range(2)]
    texts = [(title, "heading", True)] + [(t, k, False) for t, k in lines] + \
        [(body[0], "text", False), (body[1], "text", False)]
    blocks = [Block(t, block_hash(t), kind=kind, main=True, title=is_title)
              for t, kind, is_title in texts]
    return blocks, templates.Page.of("news.example.org html", templates.block_summary(blocks))


def test_a_dateline_in_wordings_the_site_rotates_goes_under_the_title_only():
    # invented: a site writes its dateline four ways, each on a quarter of its pages
    # (too few for a shape on most pages); a stock sentence with a date the notices
    # share stays where it stands among their text
    from gate import templates
    wordings = ("Last updated {} hours ago", "Friday {} March. Viewed 2,{}06 times.",
                "Published Monday {} June. Updated 4 hours ago.", "Posted Sunday {} May | 12 views")
    pages = []
    for i in range(12):
        pages.append(_dated(i, [(wordings[i % 4].format(i + 2, i), "text")]))
    learnt = templates.learn([p for _b, p in pages])
    assert learnt["news.example.org html"][6]  # a dateline on most pages
    for blocks, mine in pages[:4]:
        cleaned, _info = templates.compose("\n".join(b.text for b in blocks), blocks,
                                           templates.removal(mine, learnt))
        assert cleaned.split("\n") == [blocks[0].text, blocks[2].text, blocks[3].text]
    # the same line between two paragraphs is the page's own
    blocks, _page = pages[1]
    moved = [blocks[0], blocks[2], blocks[1], blocks[3]]
    mine = templates.Page.of("news.example.org html", templates.block_summary(moved))
    text = "\n".join(b.text for b in moved)
    assert templates.compose(text, moved, templates.removal(mine, learnt))[0] == text
    # a number that is another of the page's facts makes no dateline
    from gate.extract.model import Block
    from gate.tokens import block_hash

    def line(t: str) -> Block:
        return Block(t, block_hash(t))
    assert not templates._dateline(line("Salary 24,000 pounds a year, part time"))
    assert templates._dateline(line("Posted 2026-03-06 by the desk"))
    assert templates._dateline(line("Last updated 4 hours ago"))


def test_lines_with_numbers_among_rows_stay_where_a_lone_one_goes():
    # invented: a line in the shape of the site's template line ("Posted 9 days ago by
    # the desk") among the rows of a running order ("06:44 Introductions") is the page's
    # own; alone between two paragraphs it goes
    from gate import templates
    from gate.extract.model import Block
    from gate.tokens import block_hash
    pages = [_dated(i, [(f"Posted {i + 1} days ago by the desk", "text")])
             for i in range(6)]
    learnt = templates.learn([p for _b, p in pages])
    line = "Posted 9 days ago by the desk"
    first = "Running order " + " ".join(f"r{j}" for j in range(30))
    last = "Thanks to all " + " ".join(f"t{j}" for j in range(30))

    def cleaned(texts: list[str]) -> list[str]:
        blocks = [Block(t, block_hash(t), main=True) for t in texts]
        mine = templates.Page.of("news.example.org html", templates.block_summary(blocks))
        drop = templates.removal(mine, learnt)
        assert drop and block_hash(line) in drop[3]  # learnt as a line of the template
        return templates.compose("\n".join(texts), blocks, drop)[0].split("\n")

    rows = [first, "06:44 Introductions and news", line, "16:38 A walk at night", last]
    assert cleaned(rows) == rows
    assert cleaned([first, line, last]) == [first, last]


def test_a_run_of_stock_list_items_in_the_main_text_stays_among_the_pages_own():
    # invented: eight stock duties a jobs site's ads share, between two lines of the ad's
    # own, all in the main text: they stay; the same run outside the main text goes
    from gate import templates
    from gate.extract.model import Block
    from gate.tokens import block_hash
    stock = [f"Stock duty {w} for every post" for w in "abcdefgh"]

    def blocks(main: bool):
        return [Block(t, block_hash(t), kind="item" if t in stock else "text",
                      main=main or t not in stock)
                for t in ["Our own opening " + " ".join(f"o{j}" for j in range(30))] +
                stock + ["Our own closing " + " ".join(f"c{j}" for j in range(30))]]

    strong = tuple(block_hash(t) for t in stock)
    inside = blocks(True)
    text = "\n".join(b.text for b in inside)
    assert templates.compose(text, inside, (strong, ()))[0] == text
    outside = blocks(False)
    cleaned = templates.compose(text, outside, (strong, ()))[0]
    assert cleaned.split("\n") == [outside[0].text, outside[-1].text]


def test_text_lines_with_a_bullet_are_list_items():
    from gate.extract import line_blocks
    kinds = [b.kind for b in line_blocks(
        "Duties\n- Keep daily records\n\u2022 Greet visitors\n2. Check stock\n-5 degrees")]
    assert kinds == ["text", "item", "item", "item", "text"]


def test_a_pdf_header_naming_a_title_it_cut_short_is_furniture():
    # invented: the page's first line names the site and the title, cut with an ellipsis
    title = "Restoring a narrowboat engine on the canal"
    lines = ["Invented Audio  |  Restoring a narrowboat en...", title,
             "Our guest has spent forty years working on boats and tells some stories."]
    text = extract(pdf_document([lines]), max_pages=5, max_nesting=50).text
    assert words(text) == words(" ".join(lines[1:]))


def test_the_title_said_twice_once_the_template_between_went_is_said_once():
    # invented: a breadcrumb trail ending in the page's title, then the title itself
    from gate import templates
    from gate.extract.model import Block
    from gate.tokens import block_hash
    title = "Low pressure on Gravel Pits Road"
    own = "Since Sunday homes on the road " + " ".join(f"w{j}" for j in range(40))
    blocks = [Block("Home", block_hash("Home"), kind="item"),
              Block("Incidents", block_hash("Incidents"), kind="item"),
              Block(title, block_hash(title), kind="item"),
              Block(title, block_hash(title), kind="heading", title=True),
              Block(own, block_hash(own))]
    text = "\n".join(b.text for b in blocks)
    cleaned = templates.compose(text, blocks, ((block_hash("Home"), block_hash("Incidents")),
                                               ()))[0]
    assert cleaned.split("\n") == [title, own]
