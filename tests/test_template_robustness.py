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
