"""The n-best pool: deduplication rules, cached statistics (checked against sacrebleu), contract errors."""

from __future__ import annotations

import numpy as np
import pytest
import sacrebleu

from decoder.tuning.bleu_statistics import HYPOTHESIS_LENGTH, MATCHES, REFERENCE_LENGTH, TOTALS, ReferenceSet
from decoder.tuning.n_best_pool import NBestFormatError, NBestPool

# An invented dev set of the fictional "Lumenrail" ticket kiosk's interface strings.
REFERENCES = [
    [tuple("press the green button to print".split())],
    [tuple("your ticket is ready".split()), tuple("the ticket is ready".split())],
]
FEATURES = ("phrase_fwd", "lm")


def entry(text, *features):
    return tuple(text.split()), np.array(features, dtype=np.float64)


def new_pool():
    return NBestPool(ReferenceSet(REFERENCES), FEATURES)


def test_distinct_token_feature_pairs_are_kept_and_counted():
    pool = new_pool()
    first = [
        [entry("press the green button", -1.0, -2.0), entry("press green button", -1.5, -2.5)],
        [entry("your ticket is ready", -0.5, -1.0)],
    ]
    assert pool.add(first) == 3
    # By the documented rule: the same tokens with the same features (also -0.0 against 0.0) are one entry;
    # the same tokens from another derivation (other features) are a second entry.
    second = [
        [entry("press the green button", -1.0, -2.0), entry("press the green button", -1.2, -1.9)],
        [
            entry("your ticket is ready", -0.5, -1.0),
            entry("ticket is ready", 0.0, -3.0),
            entry("ticket is ready", -0.0, -3.0),
        ],
    ]
    assert pool.add(second) == 2
    assert pool.add(second) == 0
    assert len(pool) == 5
    assert pool.segment_sizes().tolist() == [3, 2]
    assert pool.segment_tokens(0) == [
        tuple("press the green button".split()),
        tuple("press green button".split()),
        tuple("press the green button".split()),
    ]
    arrays = pool.arrays()
    assert arrays.offsets.tolist() == [0, 3, 5]
    assert arrays.features[2].tolist() == [-1.2, -1.9]


# Reference: sacrebleu.sentence_bleu (smooth_method="none") gives each entry's raw statistics; the pool's cached
# rows must match for every entry, including entries that share a token sequence.
def test_pool_statistics_match_sacrebleu():
    pool = new_pool()
    pool.add(
        [
            [
                entry("press the green button to print", 0.0, 0.0),
                entry("print the the the", 1.0, 0.0),
                entry("print the the the", 2.0, 0.0),
            ],
            [entry("ticket is ready", 0.0, 0.0), entry("", 0.0, 1.0)],
        ]
    )
    arrays = pool.arrays()
    for segment in range(2):
        rows = arrays.statistics[arrays.offsets[segment] : arrays.offsets[segment + 1]]
        for tokens, row in zip(pool.segment_tokens(segment), rows, strict=True):
            expected = sacrebleu.sentence_bleu(
                " ".join(tokens), [" ".join(r) for r in REFERENCES[segment]], smooth_method="none", tokenize="none"
            )
            assert row[MATCHES].tolist() == expected.counts
            assert row[TOTALS].tolist() == expected.totals
            assert (row[HYPOTHESIS_LENGTH], row[REFERENCE_LENGTH]) == (expected.sys_len, expected.ref_len)


def test_one_best_rows_follow_the_weights():
    # By hand: with weights (1, 0) segment 0's scores are -1, -1.5 (row 0 wins); with (0, -1) they are 2, 2.5
    # (row 1 wins). Segment 1 has one entry (row 2). Exact ties go to the lower row.
    pool = new_pool()
    pool.add(
        [
            [entry("press the green button", -1.0, -2.0), entry("press green button", -1.5, -2.5)],
            [entry("your ticket is ready", -0.5, -1.0)],
        ]
    )
    arrays = pool.arrays()
    assert arrays.one_best_rows([1.0, 0.0]).tolist() == [0, 2]
    assert arrays.one_best_rows([0.0, -1.0]).tolist() == [1, 2]
    assert arrays.one_best_rows([0.0, 0.0]).tolist() == [0, 2]


@pytest.mark.parametrize(
    ("n_best_lists", "message"),
    [
        ([[entry("press", 0.0, 0.0)]], "1 n-best lists for 2 dev segments"),
        ([[entry("press", 0.0, 0.0)], []], "segment 1: empty n-best list"),
        ([[entry("press", 0.0)], [entry("ready", 0.0, 0.0)]], "segment 0, entry 0: 1 feature values, expected 2"),
        ([[entry("press", 0.0, 0.0)], [entry("ready", np.nan, 0.0)]], "segment 1, entry 0: non-finite"),
    ],
)
def test_contract_violations_raise_and_leave_the_pool_unchanged(n_best_lists, message):
    pool = new_pool()
    pool.add([[entry("press", 1.0, 1.0)], [entry("ready", 1.0, 1.0)]])
    with pytest.raises(NBestFormatError, match=message):
        pool.add(n_best_lists)
    assert len(pool) == 2
