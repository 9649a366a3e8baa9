"""MERT's exact line search on a hand-built n-best set and against brute force; the optimiser end to end."""

from __future__ import annotations

import numpy as np
import pytest

from decoder.errors import ConfigurationError
from decoder.tuning.bleu_statistics import bleu
from decoder.tuning.mert import MertSettings, line_search, optimise_mert
from decoder.tuning.n_best_pool import PoolArrays

# Statistics rows (matches 1-4, totals 1-4, hypothesis length, reference length) for a 4-token reference:
# PERFECT is the reference itself, WRONG shares no word with it.
PERFECT = [4, 3, 2, 1, 4, 3, 2, 1, 4, 4]
WRONG = [0, 0, 0, 0, 4, 3, 2, 1, 4, 4]

# Three sentences, two features, weights (1, 0), direction (0, 1): hypothesis (f1, f2) scores f1 + gamma * f2.
#   s1: perfect (0, 1) -> gamma;        wrong (1, 0) -> 1.              perfect on top for gamma > 1
#   s2: perfect (0, -1) -> -gamma;      wrong (0.5, 0) -> 0.5;          wrong (-1, 2) -> -1 + 2 gamma
#       perfect while -gamma > 0.5 (gamma < -0.5); then 0.5 until -1 + 2 gamma > 0.5 (gamma > 0.75); the
#       crossing of perfect and (-1, 2) at gamma = 1/3 lies below 0.5, so it is not a bend.
#   s3: perfect (0, 0) -> 0;            wrong (-1, 1) -> -1 + gamma;    wrong (-2, -1) -> -2 - gamma
#       perfect on (-2, 1).
# With k perfect sentences of equal length, every n-gram precision is k/3 and BP = 1, so BLEU = k/3:
#   (-inf, -2): s2 -> 1/3;  (-2, -0.5): s2, s3 -> 2/3;  (-0.5, 0.75) and (0.75, 1): s3 -> 1/3 (equal statistics,
#   merged); (1, inf): s1 -> 1/3 (s1 and s3 both change at gamma = 1: two bends at one point).
# Best: (-2, -0.5), BLEU 2/3, middle gamma = -1.25. At gamma = 0 BLEU is 1/3.
# No weights reach 3/3: s1 perfect needs w2 > w1 and s3 perfect needs -w1 + w2 < 0, i.e. w2 < w1.
HAND_FEATURES = [[0, 1], [1, 0], [0, -1], [0.5, 0], [-1, 2], [0, 0], [-1, 1], [-2, -1]]
HAND_STATISTICS = [PERFECT, WRONG, PERFECT, WRONG, WRONG, PERFECT, WRONG, WRONG]
HAND_OFFSETS = [0, 2, 5, 8]


def hand_pool():
    return PoolArrays(
        np.array(HAND_FEATURES, dtype=np.float64),
        np.array(HAND_STATISTICS, dtype=np.int64),
        np.array(HAND_OFFSETS, dtype=np.int64),
    )


def test_line_search_finds_the_hand_derived_interval():
    result = line_search(hand_pool(), [1.0, 0.0], [0.0, 1.0])
    assert result.interval == (-2.0, -0.5)
    assert result.gamma == -1.25
    assert result.bleu == pytest.approx(2 / 3, abs=1e-15)
    assert result.current_bleu == pytest.approx(1 / 3, abs=1e-15)


# By hand: two sentences whose 1-best flips at the same gamma = 0.5, in opposite ways.
#   s1: perfect (0, 1) -> gamma, wrong (0.5, 0) -> 0.5: perfect for gamma > 0.5.
#   s2: perfect (0.5, 0) -> 0.5, wrong (0, 1) -> gamma: perfect for gamma < 0.5.
# Exactly one sentence is perfect on either side, BLEU 1/2 everywhere (precisions 4/8, 3/6, ...). Applying one
# bend before the other would invent a zero-width interval at 0.5 where both, or neither, are perfect.
def test_bends_at_the_same_gamma_act_together():
    pool = PoolArrays(
        np.array([[0, 1], [0.5, 0], [0.5, 0], [0, 1]], dtype=np.float64),
        np.array([PERFECT, WRONG, PERFECT, WRONG], dtype=np.int64),
        np.array([0, 2, 4]),
    )
    result = line_search(pool, [1.0, 0.0], [0.0, 1.0])
    assert (result.gamma, result.bleu, result.interval) == (0.0, pytest.approx(0.5, abs=1e-15), (-np.inf, np.inf))


def test_mert_reaches_the_hand_derived_optimum():
    # Hand derivation above: 2/3 is the best any weights can do on this pool.
    result = optimise_mert(hand_pool(), [1.0, 0.0], seed=0)
    assert result.pool_bleu == pytest.approx(2 / 3, abs=1e-15)
    assert np.abs(result.weights).sum() == pytest.approx(1.0, abs=1e-15)  # L1 normalisation, as documented
    # Independent check of the claim: decode the pool by hand with the returned weights.
    features, statistics = np.array(HAND_FEATURES), np.array(HAND_STATISTICS)
    one_best = [
        start + int(np.argmax(features[start:stop] @ result.weights))
        for start, stop in zip(HAND_OFFSETS[:-1], HAND_OFFSETS[1:], strict=True)
    ]
    assert sum(statistics[row][0] == 4 for row in one_best) == 2


def random_pool(generator, num_segments=6, max_entries=8, num_features=3):
    sizes = generator.integers(1, max_entries + 1, num_segments)
    offsets = np.concatenate([[0], np.cumsum(sizes)]).astype(np.int64)
    features = generator.normal(size=(offsets[-1], num_features))
    totals = generator.integers(4, 12, offsets[-1])
    matches = np.stack([generator.integers(0, np.maximum(totals - n, 0) + 1) for n in range(4)], axis=1)
    matches = np.minimum.accumulate(matches, axis=1)  # higher orders never match more than lower ones
    statistics = np.column_stack(
        [
            matches,
            np.stack([np.maximum(totals - n, 0) for n in range(4)], axis=1),
            totals,
            generator.integers(4, 12, offsets[-1]),
        ]
    ).astype(np.int64)
    return PoolArrays(features, statistics, offsets)


def brute_force_best(pool, weights, direction):
    """Corpus BLEU at every midpoint between consecutive pairwise crossings of hypothesis lines (and beyond
    the ends), by direct argmax per segment: the exact maximum over gamma."""
    a, b = pool.features @ weights, pool.features @ direction
    crossings = []
    for start, stop in zip(pool.offsets[:-1], pool.offsets[1:], strict=True):
        for i in range(start, stop):
            for j in range(i + 1, stop):
                if b[i] != b[j]:
                    crossings.append((a[i] - a[j]) / (b[j] - b[i]))
    points = np.unique(crossings)
    probes = np.concatenate([[points[0] - 1.0], 0.5 * (points[1:] + points[:-1]), [points[-1] + 1.0]])
    best = -1.0
    for gamma in probes:
        scores = a + gamma * b
        rows = [
            start + int(np.argmax(scores[start:stop]))
            for start, stop in zip(pool.offsets[:-1], pool.offsets[1:], strict=True)
        ]
        best = max(best, float(bleu(pool.statistics[rows].sum(axis=0))))
    return best


# Brute force (above) on random pools: the line search's BLEU is the true maximum, and re-decoding the pool at
# the returned gamma reproduces it.
def test_line_search_equals_brute_force_on_random_pools():
    generator = np.random.default_rng(7)
    for _ in range(25):
        pool = random_pool(generator)
        weights, direction = generator.normal(size=3), generator.normal(size=3)
        result = line_search(pool, weights, direction)
        assert result.bleu == pytest.approx(brute_force_best(pool, weights, direction), abs=1e-12)
        rows = [
            start + int(np.argmax(pool.features[start:stop] @ (weights + result.gamma * direction)))
            for start, stop in zip(pool.offsets[:-1], pool.offsets[1:], strict=True)
        ]
        assert float(bleu(pool.statistics[rows].sum(axis=0))) == pytest.approx(result.bleu, abs=1e-12)


def test_mert_is_reproducible_with_its_seed():
    generator = np.random.default_rng(5)
    pool = random_pool(generator, num_segments=10)
    first = optimise_mert(pool, [1.0, 0.0, 0.0], seed=42)
    second = optimise_mert(pool, [1.0, 0.0, 0.0], seed=42)
    assert first.seed == 42
    assert np.array_equal(first.weights, second.weights)
    # The optimiser starts from the given weights, so it can only gain (brute force check of its claim).
    start_rows = pool.one_best_rows([1.0, 0.0, 0.0])
    assert first.pool_bleu >= float(bleu(pool.statistics[start_rows].sum(axis=0)))
    assert first.pool_bleu == pytest.approx(float(bleu(pool.one_best_statistics(first.weights))), abs=1e-15)


def test_mert_settings_are_checked():
    with pytest.raises(ConfigurationError, match="bounds"):
        MertSettings(bounds=(1.0, -1.0))
    with pytest.raises(ConfigurationError, match="initial weights"):
        optimise_mert(hand_pool(), [1.0, 0.0, 0.0], seed=0)
