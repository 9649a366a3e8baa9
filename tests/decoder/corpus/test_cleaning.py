"""Cleaning rules and report. Each expected reason follows by hand from the rules in the module docstring
(checked in order: empty source, empty target, more than max_tokens, longer/shorter above max_length_ratio)."""

from __future__ import annotations

import itertools

import numpy as np
import pytest

from decoder.corpus.cleaning import DROP_REASONS, KEEP_CODE, CleaningReport, CleaningRules, DropReason
from decoder.errors import ConfigurationError

RULES = CleaningRules()  # 80 tokens, ratio 9 (common practice)


@pytest.mark.parametrize(
    ("num_source", "num_target", "expected"),
    [
        (0, 0, DropReason.EMPTY_SOURCE),  # both empty: the first rule names it
        (0, 5, DropReason.EMPTY_SOURCE),
        (5, 0, DropReason.EMPTY_TARGET),
        (80, 80, None),  # the limit itself is allowed
        (81, 80, DropReason.TOO_LONG),
        (80, 81, DropReason.TOO_LONG),
        (1, 9, None),  # ratio exactly 9
        (9, 1, None),
        (1, 10, DropReason.LENGTH_RATIO),  # ratio 10 > 9
        (10, 1, DropReason.LENGTH_RATIO),
        (2, 81, DropReason.TOO_LONG),  # too long and too unequal: length is checked first
        (7, 63, None),  # 63 / 7 = 9 exactly
        (7, 64, DropReason.LENGTH_RATIO),  # 64 / 7 = 9.14...
        (12, 15, None),
    ],
)
def test_default_rules(num_source, num_target, expected):
    assert RULES.reason(num_source, num_target) is expected


def test_custom_limits():
    rules = CleaningRules(max_tokens=4, max_length_ratio=1.5)
    assert [rules.reason(*counts) for counts in [(4, 4), (5, 3), (2, 3), (2, 4)]] == [
        None,
        DropReason.TOO_LONG,
        None,
        DropReason.LENGTH_RATIO,
    ]  # 3/2 = 1.5 kept, 4/2 = 2 dropped


def test_classify_agrees_with_reason_on_a_grid():
    # The scalar rule is the one checked by hand above; the array form must give the same answer everywhere.
    rules = CleaningRules(max_tokens=12, max_length_ratio=2.5)
    grid = np.array(list(itertools.product(range(15), repeat=2)))
    codes = rules.classify(grid[:, 0], grid[:, 1])
    expected = [
        KEEP_CODE if (reason := rules.reason(int(s), int(t))) is None else DROP_REASONS.index(reason) for s, t in grid
    ]
    assert codes.tolist() == expected


@pytest.mark.parametrize(
    "arguments", [{"max_tokens": 0}, {"max_length_ratio": 0.5}, {"max_length_ratio": float("nan")}]
)
def test_invalid_rules(arguments):
    with pytest.raises(ConfigurationError):
        CleaningRules(**arguments)


def test_report_counts_merge_and_summary():
    first, second = CleaningReport(), CleaningReport()
    for reason in [None, None, DropReason.TOO_LONG]:
        first.record(reason)
    second.record_codes(np.array([KEEP_CODE, 0, 0, 3], dtype=np.int8))  # keep, empty_source x2, length_ratio
    merged = first.merge(second)
    assert (first.num_read, second.num_read) == (3, 4)  # merge leaves its inputs alone
    assert merged.to_dict() == {
        "num_read": 7,
        "num_kept": 3,
        "empty_source": 2,
        "empty_target": 0,
        "too_long": 1,
        "length_ratio": 1,
        "invalid_text": 0,
    }
    assert CleaningReport.merged([first, second]) == merged
    assert merged.summary_lines() == [
        "pairs read: 7",
        "pairs kept: 3 (42.9%)",  # 3 / 7 = 0.42857
        "dropped (empty_source): 2",
        "dropped (empty_target): 0",
        "dropped (too_long): 1",
        "dropped (length_ratio): 1",
        "dropped (invalid_text): 0",
    ]


def test_empty_report_summary():
    assert CleaningReport().summary_lines()[:2] == ["pairs read: 0", "pairs kept: 0 (0.0%)"]
