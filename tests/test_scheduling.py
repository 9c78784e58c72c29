"""The order tasks go to the workers, and the timeline figures of benchmarks/breakdown.py.

Spans and sizes here are invented; the expected figures are worked out by hand."""

from __future__ import annotations

import pytest

from benchmarks.breakdown import _occupancy
from gate.documents import largest_first


def test_largest_first_keeps_ties_and_puts_unknown_sizes_last():
    sizes = [10, None, 300, 10, 0, 300, 5]
    assert largest_first(sizes, lambda size: size) == [2, 5, 0, 3, 6, 1, 4]
    assert largest_first([], lambda size: size) == []


def test_occupancy_of_two_workers_by_hand():
    # worker A busy 0-4, worker B busy 1-3 and 5-6, in the window 0-8:
    # both busy 1-3 (2 s); one busy 0-1, 3-4, 5-6 (3 s); none 4-5, 6-8 (3 s); the last
    # moment both were busy is 3, so the tail is 8 - 3 = 5 s
    busy, tail = _occupancy([(0.0, 4.0), (1.0, 3.0), (5.0, 6.0)], 0.0, 8.0, 2)
    assert busy[2] == pytest.approx(2.0)
    assert busy[1] == pytest.approx(3.0)
    assert busy[0] == pytest.approx(3.0)
    assert tail == pytest.approx(5.0)


def test_occupancy_clips_spans_to_the_window_and_a_window_never_full_has_all_tail():
    busy, tail = _occupancy([(-1.0, 2.0), (9.0, 12.0)], 0.0, 10.0, 2)
    assert busy.get(2, 0.0) == 0.0
    assert busy[1] == pytest.approx(3.0)  # 0-2 and 9-10
    assert busy[0] == pytest.approx(7.0)
    assert tail == pytest.approx(10.0)


def test_calls_per_document_and_pass_by_hand(capsys):
    # invented counts: 4 pages in pass 1 parsed 12 times in all (3 a page), 2 of them
    # measured in pass 2 and parsed once each; a probe no page called is left out
    from benchmarks.breakdown import show_calls
    now = {"counts": {"html|blocks": 4.0, "html|measure": 2.0},
           "calls": {"html|blocks|extract html: lxml parse": 12.0,
                     "html|measure|extract html: lxml parse": 2.0,
                     "html|blocks|blocks: page blocks (html walk)": 4.0}}
    show_calls(now)
    lines = {line.split("  ")[2].strip(): line.split()[-2:]
             for line in capsys.readouterr().out.splitlines()[2:]}
    assert lines == {"extract html: lxml parse": ["3.00", "1.00"],
                     "blocks: page blocks (html walk)": ["1.00", "0.00"]}
