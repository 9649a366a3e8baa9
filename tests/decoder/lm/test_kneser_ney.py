"""Interpolated modified Kneser-Ney: the discount formulas, a hand-worked model, sums to one, and agreement
with the dict-based reference implementation of the paper's formulas (reference_kneser_ney.py).

nltk.lm.KneserNeyInterpolated is not used as a reference: it has one fixed discount instead of three
estimated ones and pads with order-1 start symbols, so no setting makes the two algorithms coincide.
"""

from __future__ import annotations

import math
from fractions import Fraction

import numpy as np
import pytest

from decoder.errors import ConfigurationError
from decoder.lm.counts import count_ngrams
from decoder.lm.kneser_ney import estimate_kneser_ney, modified_discounts, train_kneser_ney
from decoder.lm.query import LanguageModel

from .lm_helpers import HAND_SEGMENTS, PRESS, RESET, START_WORD, STOP, as_segment_array, random_segments
from .reference_kneser_ney import ReferenceKneserNey

UNK, BOS, EOS = 0, 1, 2


@pytest.mark.parametrize(
    ("count_of_counts", "expected"),
    [
        # Chen & Goodman (1998) discount estimates (from memory) by hand, n = (10, 4, 2, 1): Y = 10/18 = 5/9;
        # D1 = 1 - 2(5/9)(4/10) = 5/9, D2 = 2 - 3(5/9)(2/4) = 7/6, D3+ = 3 - 4(5/9)(1/2) = 17/9.
        ((10, 4, 2, 1), (Fraction(5, 9), Fraction(7, 6), Fraction(17, 9))),
        # n = (4, 2, 1, 1): Y = 1/2; D1 = 1 - 2(1/2)(2/4) = 1/2, D2 = 2 - 3(1/2)(1/2) = 5/4, D3+ = 3 - 4(1/2) = 1.
        ((4, 2, 1, 1), (Fraction(1, 2), Fraction(5, 4), Fraction(1))),
        # Fallback: n = (3, 1, 1, 0): Y = 3/5, D1 = 3/5, D2 = 2 - 3(3/5) = 1/5, D3+ = 3 - 0 = 3 is not below 3 -> Y.
        ((3, 1, 1, 0), (Fraction(3, 5), Fraction(1, 5), Fraction(3, 5))),
        # Fallback: n = (6, 1, 0, 1): Y = 3/4, D1 = 1 - 2(3/4)(1/6) = 3/4, D2 = 2 - 0 = 2 is not below 2 -> Y,
        # D3+ divides by n3 = 0 -> Y.
        ((6, 1, 0, 1), (Fraction(3, 4), Fraction(3, 4), Fraction(3, 4))),
        # Fallback: D2 = 2 - 3(1/2)(4/1) = -4 is negative -> Y = 1/2; D3+ = 3 - 4(1/2)(1/4) = 5/2 is valid.
        ((2, 1, 4, 1), (Fraction(1, 2), Fraction(1, 2), Fraction(5, 2))),
        # No doubletons: Y = 1 is degenerate, so the last-resort 1/2 everywhere (documented fallback).
        ((5, 0, 0, 0), (Fraction(1, 2), Fraction(1, 2), Fraction(1, 2))),
        ((0, 0, 0, 0), (Fraction(1, 2), Fraction(1, 2), Fraction(1, 2))),
    ],
)
def test_modified_discounts(count_of_counts, expected):
    assert tuple(modified_discounts(count_of_counts)) == pytest.approx([float(value) for value in expected], abs=1e-12)


# Hand-worked model of HAND_SEGMENTS (lm_helpers.py): "press start" x2, "press start stop", "press stop reset stop";
# ids <unk>=0 <s>=1 </s>=2 press=4 start=5 stop=6 reset=7, vocabulary size 8, so the predicted words are
# {<unk>, </s>, press, start, stop, reset} (|V'| = 6; <s> and <null> are never predicted).
#
# Order 2. Bigram (top-order, raw) counts: <s> press 4, press start 3, start </s> 2, stop </s> 2, press stop 1,
#   start stop 1, stop reset 1, reset stop 1 -> n1..n4 = 4, 2, 1, 1 -> D = 1/2, 5/4, 1 (see above).
# Unigram continuation counts N1+(. w) (distinct left neighbours): press 1 {<s>}, start 1 {press},
#   stop 3 {press, start, reset}, reset 1 {stop}, </s> 2 {start, stop}, <unk> 0; total 8.
#   n1..n4 = 3, 1, 1, 0 -> D = 3/5, 1/5, 3/5 (fallback for D3+, above).
#   gamma() = (3/5 * 3 + 1/5 * 1 + 3/5 * 1) / 8 = 13/40; uniform share 13/40 / 6 = 13/240.
#   p(press) = (1 - 3/5)/8 + 13/240 = 25/240 = 5/48;  p(stop) = (3 - 3/5)/8 + 13/240 = 85/240 = 17/48;
#   p(</s>) = (2 - 1/5)/8 + 13/240 = 67/240;  p(<unk>) = 13/240.   (check: 3*25 + 85 + 67 + 13 = 240)
# Bigrams: context <s> {press: 4}: A = 4, gamma = 1 * 1/4 = 1/4;
#   p(press | <s>) = (4 - 1)/4 + 1/4 * 5/48 = 149/192;  p(stop | <s>) = 1/4 * 17/48 = 17/192 (backed off).
#   context press {start: 3, stop: 1}: A = 4, gamma = (1 + 1/2)/4 = 3/8;
#   p(start | press) = 2/4 + 3/8 * 5/48 = 69/128;  p(stop | press) = (1/2)/4 + 3/8 * 17/48 = 33/128.
#   context start {</s>: 2, stop: 1}: A = 3, gamma = (5/4 + 1/2)/3 = 7/12;
#   p(</s> | start) = (2 - 5/4)/3 + 7/12 * 67/240 = 1189/2880.
#   context stop {</s>: 2, reset: 1}: gamma = 7/12; p(reset | stop) = (1/2)/3 + 7/12 * 5/48 = 131/576.
#   context reset {stop: 1}: A = 1, gamma = 1/2; p(stop | reset) = 1/2 + 1/2 * 17/48 = 65/96.
BIGRAM_HAND_VALUES = [
    ((), PRESS, Fraction(5, 48)),
    ((), STOP, Fraction(17, 48)),
    ((), EOS, Fraction(67, 240)),
    ((), UNK, Fraction(13, 240)),
    ((BOS,), PRESS, Fraction(149, 192)),
    ((BOS,), STOP, Fraction(17, 192)),
    ((PRESS,), START_WORD, Fraction(69, 128)),
    ((PRESS,), STOP, Fraction(33, 128)),
    ((START_WORD,), EOS, Fraction(1189, 2880)),
    ((STOP,), RESET, Fraction(131, 576)),
    ((RESET,), STOP, Fraction(65, 96)),
]
# Order 3 on the same corpus. Trigram counts: <s> press start 3, press start </s> 2, and six singletons
#   (press start stop, start stop </s>, <s> press stop, press stop reset, stop reset stop, reset stop </s>)
#   -> n1..n4 = 6, 1, 1, 0 -> Y = 3/4, D1 = 1 - 2(3/4)(1/6) = 3/4, D2 = 2 - 3(3/4) < 0 -> 3/4, D3+ = 3 -> 3/4.
# Middle (bigram) level, continuation counts except raw counts for <s>-initial bigrams:
#   <s> press 4 (raw), press start 1 {<s>}, press stop 1 {<s>}, start </s> 1 {press}, start stop 1 {press},
#   stop </s> 2 {start, reset}, stop reset 1 {press}, reset stop 1 {stop} -> n1..n4 = 6, 1, 0, 1 -> all 3/4.
# Unigram level: unchanged from order 2 (same continuation counts).
#   p2(start | press): {start: 1, stop: 1}, A = 2, gamma = (3/4 + 3/4)/2 = 3/4;
#     = (1 - 3/4)/2 + 3/4 * 5/48 = 13/64.
#   p2(press | <s>): {press: 4}, gamma = (3/4)/4 = 3/16; = (4 - 3/4)/4 + 3/16 * 5/48 = 213/256.
#   p2(</s> | stop): {</s>: 2, reset: 1}, A = 3, gamma = (3/4 + 3/4)/3 = 1/2; = (5/4)/3 + 1/2 * 67/240 = 89/160.
#   p3(start | <s> press): {start: 3, stop: 1}, A = 4, gamma = 3/8; = (9/4)/4 + 3/8 * 13/64 = 327/512.
#   p3(</s> | reset stop): {</s>: 1}, gamma = 3/4; = 1/4 + 3/4 * 89/160 = 427/640.
TRIGRAM_HAND_VALUES = [
    ((PRESS,), START_WORD, Fraction(13, 64)),
    ((BOS,), PRESS, Fraction(213, 256)),
    ((STOP,), EOS, Fraction(89, 160)),
    ((BOS, PRESS), START_WORD, Fraction(327, 512)),
    ((RESET, STOP), EOS, Fraction(427, 640)),
]


def hand_model(order):
    return estimate_kneser_ney(count_ngrams(as_segment_array(HAND_SEGMENTS), order), 8)


@pytest.mark.parametrize(
    ("order", "history", "word", "expected"),
    [(2, *case) for case in BIGRAM_HAND_VALUES] + [(3, *case) for case in TRIGRAM_HAND_VALUES],
)
def test_hand_worked_probabilities(order, history, word, expected):
    model, _ = hand_model(order)
    log10_prob = model.log10_probabilities(np.array([history], dtype=np.int64).reshape(1, -1), [word])[0]
    assert 10**log10_prob == pytest.approx(float(expected), rel=1e-12)


def test_hand_worked_discounts_and_backoff_weights():
    model, discounts = hand_model(2)
    # Derived in the comment above BIGRAM_HAND_VALUES.
    assert [tuple(level) for level in discounts] == [
        pytest.approx((0.6, 0.2, 0.6), abs=1e-12),
        pytest.approx((0.5, 1.25, 1.0), abs=1e-12),
    ]
    unigram_backoffs = dict(zip(model.ngrams[0][:, 0].tolist(), model.log10_backoffs[0].tolist(), strict=True))
    # gamma(<s>) = 1/4, gamma(press) = 3/8, gamma(start) = gamma(stop) = 7/12, gamma(reset) = 1/2;
    # </s> and <unk> are never contexts: back-off weight 1.
    expected = {BOS: 1 / 4, PRESS: 3 / 8, START_WORD: 7 / 12, STOP: 7 / 12, RESET: 1 / 2, EOS: 1.0, UNK: 1.0}
    for word, gamma in expected.items():
        assert unigram_backoffs[word] == pytest.approx(math.log10(gamma), abs=1e-12)


def predicted_words(vocabulary_size):
    return np.array([word for word in range(vocabulary_size) if word not in (BOS, 3)])


@pytest.mark.parametrize(("seed", "order"), [(seed, order) for seed in range(3) for order in range(1, 6)])
def test_distribution_sums_to_one_after_every_context(seed, order):
    # Defining property of a conditional distribution: sum over the predicted words of p(w | h) = 1.
    vocabulary_size = 14
    segments = random_segments(seed, 30, vocabulary_size, 8)
    model = train_kneser_ney(as_segment_array(segments), vocabulary_size, order=order)
    language_model = LanguageModel.from_ngram_model(model, probability_dtype=np.float64)
    words = predicted_words(vocabulary_size)
    rng = np.random.default_rng(seed)
    histories = [segment[:cut] for segment in segments[:20] for cut in range(len(segment) + 1)]
    histories += [rng.integers(4, vocabulary_size, int(rng.integers(1, 5))).tolist() for _ in range(20)]
    for history in histories:
        for begins_segment in (True, False):
            state = language_model.begin_state() if begins_segment else language_model.null_state()
            for word in history:
                state = language_model.score(state, word)[1]
            log10_probs, _ = language_model.score_many(np.full(len(words), state), words)
            assert np.sum(10.0**log10_probs) == pytest.approx(1.0, abs=1e-9)


@pytest.mark.parametrize(("seed", "order"), [(10, 2), (11, 3), (12, 4), (13, 5), (14, 5)])
def test_matches_reference_implementation(seed, order):
    vocabulary_size = 12
    segments = random_segments(seed, 40, vocabulary_size, 9)
    model = train_kneser_ney(as_segment_array(segments), vocabulary_size, order=order)
    reference = ReferenceKneserNey(segments, vocabulary_size, order)
    rng = np.random.default_rng(seed)
    seen = [[BOS, *segment][: cut + 1] for segment in segments for cut in range(len(segment) + 1)]
    unseen = [rng.integers(4, vocabulary_size, order - 1).tolist() for _ in range(30)]
    histories = [history[-(order - 1) :] if order > 1 else [] for history in seen + unseen]
    words = predicted_words(vocabulary_size).tolist()
    for length in sorted({len(history) for history in histories}):  # one batch per history length
        pairs = [(history, word) for history in histories if len(history) == length for word in words]
        contexts = np.array([history for history, _ in pairs], dtype=np.int64).reshape(len(pairs), length)
        ours = 10 ** model.log10_probabilities(contexts, [word for _, word in pairs])
        expected = [reference.probability(word, history) for history, word in pairs]
        np.testing.assert_allclose(ours, expected, rtol=1e-10)


def test_unknown_word_and_unseen_vocabulary_words_get_the_uniform_share():
    # A vocabulary of 10 adds two words (8, 9) never seen in HAND_SEGMENTS. |V'| = 8 now, so by the
    # derivation above (unigram counts unchanged) p(<unk>) = p(8) = p(9) = (13/40) / 8 = 13/320.
    model, _ = estimate_kneser_ney(count_ngrams(as_segment_array(HAND_SEGMENTS), 2), 10)
    log10_probs = model.log10_probabilities(np.zeros((3, 0), dtype=np.int64), [UNK, 8, 9])
    np.testing.assert_allclose(10**log10_probs, [13 / 320] * 3, rtol=1e-12)


def test_segments_with_boundary_tokens_are_rejected():
    with pytest.raises(ValueError, match="must not contain"):
        train_kneser_ney(as_segment_array([[4, BOS, 5]]), 8, order=2)


def test_word_ids_beyond_the_vocabulary_are_rejected():
    with pytest.raises(ValueError, match="must lie in"):
        train_kneser_ney(as_segment_array([[4, 8]]), 8, order=2)


@pytest.mark.parametrize("order", [0, 6])
def test_order_outside_one_to_five_is_rejected(order):
    with pytest.raises(ConfigurationError, match="between 1 and 5"):
        train_kneser_ney(as_segment_array(HAND_SEGMENTS), 8, order=order)


def test_empty_corpus_gives_the_uniform_distribution():
    # No counts at all: every predicted word gets 1/|V'| = 1/6 (vocabulary size 8).
    model = train_kneser_ney(as_segment_array([]), 8, order=3)
    log10_probs = model.log10_probabilities(np.zeros((6, 0), dtype=np.int64), predicted_words(8))
    np.testing.assert_allclose(10**log10_probs, [1 / 6] * 6, rtol=1e-12)
