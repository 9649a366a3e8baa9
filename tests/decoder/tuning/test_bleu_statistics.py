"""BLEU statistics and scores against sacrebleu 2.6.0 (the reference library) and against hand derivations."""

from __future__ import annotations

import math

import numpy as np
import pytest
import sacrebleu
from hypothesis import given, settings
from hypothesis import strategies as st

from decoder.errors import ConfigurationError
from decoder.tuning.bleu_statistics import (
    HYPOTHESIS_LENGTH,
    MATCHES,
    REFERENCE_LENGTH,
    TOTALS,
    ReferenceSet,
    bleu,
    corpus_bleu,
    segment_statistics,
    sentence_bleu_plus_one,
)

# A five-word alphabet makes n-gram matches (and repeated n-grams, which exercise clipping) frequent.
TOKENS = st.sampled_from(["a", "b", "c", "d", "e"])
SEQUENCES = st.lists(TOKENS, max_size=12).map(tuple)


@st.composite
def corpora(draw):
    """(hypotheses, references per segment); empty hypotheses and empty references included, 1-3 references."""
    num_segments = draw(st.integers(1, 8))
    hypotheses = [draw(SEQUENCES) for _ in range(num_segments)]
    references = [draw(st.lists(SEQUENCES, min_size=1, max_size=3)) for _ in range(num_segments)]
    return hypotheses, references


def sacrebleu_streams(references):
    """sacrebleu wants one stream per reference position; None marks a segment without that many references."""
    width = max(len(segment_references) for segment_references in references)
    return [[" ".join(r[k]) if k < len(r) else None for r in references] for k in range(width)]


def joined(tokens):
    return " ".join(tokens)


# Reference: sacrebleu.corpus_bleu with tokenize="none" (splits on whitespace, as our tokens are given) and
# smooth_method="none": the unsmoothed BLEU of Papineni et al. (2002), our corpus BLEU. sacrebleu's default
# "exp" smoothing differs only when some order has no match, so it is compared too when every order has one.
@settings(max_examples=60, deadline=None)
@given(corpora())
def test_corpus_bleu_matches_sacrebleu(corpus):
    hypotheses, references = corpus
    statistics = ReferenceSet(references).statistics(np.arange(len(hypotheses)), hypotheses)
    expected = sacrebleu.corpus_bleu(
        [joined(h) for h in hypotheses],
        sacrebleu_streams(references),
        tokenize="none",
        force=True,
        smooth_method="none",
    )
    assert 100 * corpus_bleu(statistics) == pytest.approx(expected.score, abs=1e-9)
    summed = statistics.sum(axis=0)
    assert summed[MATCHES].tolist() == expected.counts
    assert summed[TOTALS].tolist() == expected.totals
    assert (summed[HYPOTHESIS_LENGTH], summed[REFERENCE_LENGTH]) == (expected.sys_len, expected.ref_len)
    if np.all(summed[MATCHES] > 0):
        default = sacrebleu.corpus_bleu(
            [joined(h) for h in hypotheses], sacrebleu_streams(references), tokenize="none", force=True
        )
        assert 100 * corpus_bleu(statistics) == pytest.approx(default.score, abs=1e-9)


# Reference: sacrebleu.sentence_bleu per segment. With smooth_method="none" its counts, totals and lengths are
# the raw statistics of that segment (effective reference length included); with smooth_method="add-k" and
# smooth_value=1 its score is BLEU+1 (Lin & Och 2004), the sentence BLEU that PRO uses.
@settings(max_examples=60, deadline=None)
@given(corpora())
def test_segment_statistics_and_bleu_plus_one_match_sacrebleu(corpus):
    hypotheses, references = corpus
    statistics = ReferenceSet(references).statistics(np.arange(len(hypotheses)), hypotheses)
    smoothed = sentence_bleu_plus_one(statistics)
    for row, hypothesis, segment_references, score in zip(statistics, hypotheses, references, smoothed, strict=True):
        plain = sacrebleu.sentence_bleu(
            joined(hypothesis), [joined(r) for r in segment_references], smooth_method="none", tokenize="none"
        )
        assert row[MATCHES].tolist() == plain.counts
        assert row[TOTALS].tolist() == plain.totals
        assert (row[HYPOTHESIS_LENGTH], row[REFERENCE_LENGTH]) == (plain.sys_len, plain.ref_len)
        plus_one = sacrebleu.sentence_bleu(
            joined(hypothesis),
            [joined(r) for r in segment_references],
            smooth_method="add-k",
            smooth_value=1,
            tokenize="none",
        )
        assert 100 * score == pytest.approx(plus_one.score, abs=1e-9)


# Reference: sacrebleu.corpus_bleu as above, on 50 larger seeded random corpora (cheaper to draw than with
# hypothesis): 30 segments, 0-20 tokens, 1-4 references, a share of empty hypotheses and references.
def test_corpus_bleu_matches_sacrebleu_on_larger_random_corpora():
    generator = np.random.default_rng(11)
    words = np.array(list("abcdefg"))
    for _ in range(50):

        def sequence():
            length = 0 if generator.random() < 0.1 else int(generator.integers(1, 21))
            return tuple(generator.choice(words, length))

        hypotheses = [sequence() for _ in range(30)]
        references = [[sequence() for _ in range(generator.integers(1, 5))] for _ in range(30)]
        statistics = ReferenceSet(references).statistics(np.arange(30), hypotheses)
        expected = sacrebleu.corpus_bleu(
            [joined(h) for h in hypotheses],
            sacrebleu_streams(references),
            tokenize="none",
            force=True,
            smooth_method="none",
        )
        assert 100 * corpus_bleu(statistics) == pytest.approx(expected.score, abs=1e-9)
        assert statistics.sum(axis=0)[MATCHES].tolist() == expected.counts


# Reference: sacrebleu again, on one corpus scored with hypotheses in shuffled order against a ReferenceSet
# whose segment indices say which references each hypothesis belongs to (the pool scores entries that way).
def test_statistics_follow_the_segment_index_not_the_position():
    generator = np.random.default_rng(4)
    words = [f"w{k}" for k in range(6)]
    references = [[tuple(generator.choice(words, generator.integers(3, 9)))] for _ in range(20)]
    hypotheses = [tuple(generator.choice(words, generator.integers(0, 9))) for _ in range(20)]
    order = generator.permutation(20)
    statistics = ReferenceSet(references).statistics(order, [hypotheses[k] for k in order])
    for row, segment in zip(statistics, order, strict=True):
        expected = sacrebleu.sentence_bleu(
            joined(hypotheses[segment]), [joined(references[segment][0])], smooth_method="none", tokenize="none"
        )
        assert row[MATCHES].tolist() == expected.counts


# Papineni et al. (2002), section 2.1, the "the the the ..." example (from memory): candidate "the the the the the
# the the" against "The cat is on the mat" / "There is a cat on the mat": 'the' occurs at most twice in one
# reference, so the modified unigram precision is 2/7.
def test_clipping_matches_the_papers_example():
    row = segment_statistics(
        ("the",) * 7, [tuple("the cat is on the mat".split()), tuple("there is a cat on the mat".split())]
    )
    assert (row[MATCHES.start], row[TOTALS.start]) == (2, 7)


# By hand: hypothesis length 5 against references of lengths 4 and 6 is a tie at distance 1; the usual rule (and
# sacrebleu's _get_closest_ref_len) takes the shorter, 4. Length 6 against 4 and 7 is closest to 7.
@pytest.mark.parametrize(
    ("hypothesis_length", "reference_lengths", "expected"),
    [(5, (4, 6), 4), (5, (6, 4), 4), (6, (4, 7), 7), (0, (3, 2), 2), (3, (3,), 3)],
)
def test_effective_reference_length_ties_to_the_shorter(hypothesis_length, reference_lengths, expected):
    references = [tuple("x" for _ in range(length)) for length in reference_lengths]
    row = segment_statistics(("x",) * hypothesis_length, references)
    assert row[REFERENCE_LENGTH] == expected


# By hand: "a b c d" against "a b c d e f g h" has every precision 1 and length ratio 1/2, so BLEU = BP =
# exp(1 - 8/4) = e^-1 (Papineni et al. 2002, section 2.2.2).
def test_brevity_penalty_by_hand():
    row = segment_statistics(tuple("abcd"), [tuple("abcdefgh")])
    assert bleu(row) == pytest.approx(math.exp(-1.0), abs=1e-15)


# By hand: "a b c d" against "a b x d". Unigrams 3/4; bigrams ab, bc, cd: 1 match, add one -> 2/4; trigrams abc,
# bcd: 0 -> 1/3; the 4-gram: 0 -> 1/2. BLEU+1 = (3/4 * 1/2 * 1/3 * 1/2)^(1/4) = (1/16)^(1/4) = 1/2, BP = 1.
# Unsmoothed BLEU is 0 (no trigram match).
def test_bleu_plus_one_by_hand():
    row = segment_statistics(tuple("abcd"), [tuple("abxd")])
    assert sentence_bleu_plus_one(row) == pytest.approx(0.5, abs=1e-15)
    assert bleu(row) == 0.0


# By hand: no unigram match (and an empty hypothesis) gives BLEU+1 = 0 (only orders n > 1 are smoothed).
@pytest.mark.parametrize("hypothesis", [(), ("q", "r", "s")])
def test_bleu_plus_one_is_zero_without_unigram_matches(hypothesis):
    assert sentence_bleu_plus_one(segment_statistics(hypothesis, [tuple("abcd")])) == 0.0


def test_bleu_keeps_leading_axes():
    # By hand: the perfect "a b c d" scores 1; an empty hypothesis scores 0; a stack of rows scores row by row.
    rows = np.stack([segment_statistics(tuple("abcd"), [tuple("abcd")]), segment_statistics((), [tuple("abcd")])])
    assert np.asarray(bleu(rows)).tolist() == [1.0, 0.0]


def test_segment_without_reference_is_refused():
    with pytest.raises(ConfigurationError, match="segment 1 has no reference"):
        ReferenceSet([[("a",)], []])


def test_segment_index_out_of_range_is_refused():
    with pytest.raises(ConfigurationError, match="out of range"):
        ReferenceSet([[("a",)]]).statistics([1], [("a",)])
