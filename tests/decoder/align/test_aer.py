"""Alignment error rate, precision and recall (Och & Ney 2003, section 5), checked against hand arithmetic."""

from __future__ import annotations

from fractions import Fraction

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from decoder.align.aer import (
    alignment_error_rate,
    alignment_precision,
    alignment_recall,
    alignment_scores,
)
from decoder.align.links import AlignmentArray

# Two sentence pairs, links (source, target).
# Pair 1: S = {(0,0), (1,1)}, P as given = {(1,2), (2,2)}, so P | S = {(0,0), (1,1), (1,2), (2,2)};
#         A = {(0,0), (1,2), (2,1)}: |A| = 3, |S| = 2, |A & S| = |{(0,0)}| = 1, |A & P| = |{(0,0), (1,2)}| = 2.
# Pair 2: S = {(0,1)}, P as given = {} (so P | S = {(0,1)}); A = {(0,1), (1,1)}:
#         |A| = 2, |S| = 1, |A & S| = 1, |A & P| = 1 (only because S is added to P).
# Corpus: |A| = 5, |S| = 3, |A & S| = 2, |A & P| = 3.
#   precision = 3/5, recall = 2/3, AER = 1 - (2 + 3) / (5 + 3) = 3/8.
# Had P not been extended by S, |A & P| would be 2 and AER 1 - 4/8 = 1/2; averaging the per-pair AERs
# (1 - 3/5 = 2/5 and 1 - 2/3 = 1/3) would give 11/30. Neither is the corpus-level value.
PREDICTED = [{(0, 0), (1, 2), (2, 1)}, {(0, 1), (1, 1)}]
SURE = [{(0, 0), (1, 1)}, {(0, 1)}]
POSSIBLE = [{(1, 2), (2, 2)}, set()]


def test_scores_match_hand_arithmetic():
    # Expected values: hand arithmetic in the comment above, formulas of Och & Ney (2003), section 5.
    scores = alignment_scores(PREDICTED, SURE, POSSIBLE)
    assert (scores.num_predicted, scores.num_sure, scores.num_possible) == (5, 3, 5)
    assert (scores.num_predicted_sure, scores.num_predicted_possible) == (2, 3)
    assert scores.precision == pytest.approx(float(Fraction(3, 5)), abs=1e-15)
    assert scores.recall == pytest.approx(float(Fraction(2, 3)), abs=1e-15)
    assert scores.alignment_error_rate == pytest.approx(float(Fraction(3, 8)), abs=1e-15)
    assert alignment_error_rate(PREDICTED, SURE, POSSIBLE) == pytest.approx(0.375, abs=1e-15)
    assert alignment_precision(PREDICTED, SURE, POSSIBLE) == pytest.approx(0.6, abs=1e-15)
    assert alignment_recall(PREDICTED, SURE, POSSIBLE) == pytest.approx(2 / 3, abs=1e-15)


def test_alignment_arrays_are_accepted():
    # Same hand example as above, given as ragged link arrays instead of sets.
    as_arrays = [AlignmentArray.from_link_sets(corpus) for corpus in (PREDICTED, SURE, POSSIBLE)]
    assert alignment_error_rate(*as_arrays) == pytest.approx(0.375, abs=1e-15)


def test_perfect_alignments_score_zero():
    # By the definition: A = S gives (|S| + |S|) / (|S| + |S|) = 1, so AER = 0; predicting every possible link
    # (A = P | S) gives |A & S| = |S| and |A & P| = |A|, so again AER = 0 with precision and recall 1.
    assert alignment_error_rate(SURE, SURE, POSSIBLE) == 0.0
    everything = [possible | sure for possible, sure in zip(POSSIBLE, SURE, strict=True)]
    scores = alignment_scores(everything, SURE, POSSIBLE)
    assert (scores.alignment_error_rate, scores.precision, scores.recall) == (0.0, 1.0, 1.0)


def test_disjoint_prediction_scores_one():
    # No predicted link is sure or possible: numerator 0, AER = 1 - 0 = 1, precision 0, recall 0.
    scores = alignment_scores([{(5, 5)}, {(4, 4)}], SURE, POSSIBLE)
    assert (scores.alignment_error_rate, scores.precision, scores.recall) == (1.0, 0.0, 0.0)


def test_empty_denominators_follow_the_documented_conventions():
    scores = alignment_scores([set()], [set()], [set()])
    assert (scores.precision, scores.recall, scores.alignment_error_rate) == (1.0, 1.0, 0.0)
    # No prediction against one sure link: recall 0/1, AER = 1 - 0 / (0 + 1) = 1.
    scores = alignment_scores([set()], [{(0, 0)}])
    assert (scores.precision, scores.recall, scores.alignment_error_rate) == (1.0, 0.0, 1.0)


link_sets = st.sets(st.tuples(st.integers(0, 4), st.integers(0, 4)), max_size=12)


@settings(max_examples=50, deadline=None)
@given(st.lists(st.tuples(link_sets, link_sets), min_size=1, max_size=4))
def test_without_possible_links_aer_is_one_minus_f_measure(pairs):
    # Derivation: with P = S, AER = 1 - 2|A & S| / (|A| + |S|), and with precision p = |A & S| / |A| and
    # recall r = |A & S| / |S| this is 1 - 2pr / (p + r), one minus the balanced F-measure.
    predicted = [a for a, _ in pairs]
    sure = [s for _, s in pairs]
    hits = sum(len(a & s) for a, s in pairs)
    num_predicted, num_sure = sum(len(a) for a in predicted), sum(len(s) for s in sure)
    scores = alignment_scores(predicted, sure)
    if hits:
        p, r = hits / num_predicted, hits / num_sure
        assert scores.alignment_error_rate == pytest.approx(1 - 2 * p * r / (p + r), abs=1e-12)
    elif num_predicted + num_sure:
        assert scores.alignment_error_rate == 1.0


def test_corpora_of_different_lengths_are_rejected():
    with pytest.raises(ValueError, match="same sentence pairs"):
        alignment_error_rate(PREDICTED, SURE[:1], POSSIBLE)
