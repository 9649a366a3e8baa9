"""PRO: pair sampling rules, the logistic regression fit, and recovery of known separating weights."""

from __future__ import annotations

import math

import numpy as np
import pytest

from decoder.errors import ConfigurationError
from decoder.tuning.bleu_statistics import ReferenceSet, sentence_bleu_plus_one
from decoder.tuning.n_best_pool import PoolArrays
from decoder.tuning.pro import ProSettings, fit_logistic_regression, optimise_pro, sample_pairs
from decoder.tuning.weights import normalise_l1


def synthetic_pool(generator, true_weights, num_segments=40, reference_length=20):
    """Hypotheses whose sentence BLEU+1 is a monotone function of true_weights . features.

    Per segment, reference_length + 1 hypotheses get random features; the one ranked m-th by the true score keeps
    the first m reference words and replaces the rest by a word found in no reference. BLEU+1 strictly grows
    with m (every n-gram match count grows, lengths are fixed), so the true weights rank every pair exactly."""
    num_features = len(true_weights)
    num_hypotheses = reference_length + 1
    references, hypotheses, features = [], [], []
    for segment in range(num_segments):
        reference = tuple(f"s{segment}w{k}" for k in range(reference_length))
        references.append([reference])
        segment_features = generator.normal(size=(num_hypotheses, num_features))
        ranks = np.argsort(np.argsort(segment_features @ true_weights))
        hypotheses += [reference[:m] + ("zzz",) * (reference_length - m) for m in ranks]
        features.append(segment_features)
    segments = np.repeat(np.arange(num_segments), num_hypotheses)
    statistics = ReferenceSet(references).statistics(segments, hypotheses)
    offsets = np.arange(num_segments + 1, dtype=np.int64) * num_hypotheses
    return PoolArrays(np.vstack(features), statistics, offsets)


# Hopkins & May (2011), section 3: if the metric orders hypotheses like w* . features, the pairwise classifier
# should recover the direction of w*. Threshold 0.95 on the cosine, as the task specifies.
@pytest.mark.parametrize("seed", [0, 1])
def test_pro_recovers_known_separating_weights(seed):
    generator = np.random.default_rng(seed)
    true_weights = generator.normal(size=5)
    pool = synthetic_pool(generator, true_weights)
    scores = np.asarray(sentence_bleu_plus_one(pool.statistics))
    # the construction above really is monotone (guards the test itself)
    for start in pool.offsets[:-1]:
        order = np.argsort(pool.features[start : start + 21] @ true_weights)
        assert np.all(np.diff(scores[start : start + 21][order]) > 0)
    result = optimise_pro(pool, np.ones(5), seed=seed)
    cosine = result.weights @ true_weights / (np.linalg.norm(result.weights) * np.linalg.norm(true_weights))
    assert cosine > 0.95
    assert result.seed == seed and result.method == "pro"


def test_pair_selection_by_hand():
    # By hand: one segment with entries scoring 0.0 and 1.0. A sampled pair is (0, 1), (1, 0) or a repeat
    # (difference 0, dropped by the 0.05 threshold); out of 5000 samples far more than 50 are unequal, so
    # exactly Xi = 50 pairs are kept, each with entry 1 better than entry 0. A second segment whose two entries
    # differ by only 0.04 gives none; a one-entry segment gives none.
    scores = np.array([0.0, 1.0, 0.5, 0.54, 0.3])
    offsets = np.array([0, 2, 4, 5])
    better, worse = sample_pairs(scores, offsets, np.random.default_rng(0), ProSettings())
    assert len(better) == 50
    assert set(better.tolist()) == {1} and set(worse.tolist()) == {0}


def test_kept_pairs_are_the_largest_differences():
    # By the rule of Hopkins & May (2011): of the sampled pairs above the threshold the Xi = 50 largest are kept.
    # By hand: ten entries score 0, 0.1, ..., 0.9; a sample is an ordered pair of entries, each of the 100 with
    # chance 1/100, and only (0, 9) and (9, 0) differ by 0.9. Of 5000 samples, about 5000 * 2/100 = 100 (standard
    # deviation 10; fewer than 50 has a chance near 3e-7) differ by 0.9, so all 50 kept pairs do. Keeping any 50
    # pairs above the threshold instead would keep smaller differences.
    scores = np.arange(10) / 10.0
    better, worse = sample_pairs(scores, np.array([0, 10]), np.random.default_rng(1), ProSettings())
    assert len(better) == 50
    assert np.min(scores[better] - scores[worse]) == pytest.approx(0.9, abs=1e-12)


def test_scalar_logistic_regression_matches_its_stationarity_equation():
    # By hand: examples x = 1 (label +1) and x = -1 (label -1) are the same signed example twice, so the
    # objective is 2 log(1 + e^-w) + w^2 / 2 and its minimum solves w = 2 / (1 + e^w); bisection finds that root.
    low, high = 0.0, 2.0
    for _ in range(200):
        middle = 0.5 * (low + high)
        low, high = (middle, high) if middle < 2.0 / (1.0 + math.exp(middle)) else (low, middle)
    weights = fit_logistic_regression([[1.0], [-1.0]], [1.0, -1.0], l2_strength=1.0)
    assert weights[0] == pytest.approx(low, abs=1e-10)


def test_logistic_regression_satisfies_first_order_optimality():
    # The objective is strictly convex, so its minimiser is where the gradient (written out here independently)
    # vanishes: sum_i -y_i x_i sigma(-y_i w.x_i) + lambda w = 0.
    generator = np.random.default_rng(2)
    examples = generator.normal(size=(300, 4))
    labels = np.where(examples @ np.array([1.0, -2.0, 0.5, 0.0]) + generator.normal(size=300) > 0, 1.0, -1.0)
    weights = fit_logistic_regression(examples, labels, l2_strength=0.5)
    margins = labels * (examples @ weights)
    gradient = -(examples * (labels / (1.0 + np.exp(margins)))[:, None]).sum(axis=0) + 0.5 * weights
    assert np.max(np.abs(gradient)) < 1e-8


def test_interpolation_with_previous_weights():
    # As documented (common practice): share * learned + (1 - share) * previous, both at L1 norm 1, renormalised.
    generator = np.random.default_rng(3)
    pool = synthetic_pool(generator, generator.normal(size=4), num_segments=10)
    previous = np.array([1.0, 1.0, -1.0, 2.0])
    learned = optimise_pro(pool, previous, seed=5).weights
    mixed = optimise_pro(pool, previous, seed=5, settings=ProSettings(new_weight_share=0.1)).weights
    assert mixed == pytest.approx(normalise_l1(0.1 * learned + 0.9 * normalise_l1(previous)), abs=1e-15)


def test_without_usable_pairs_the_previous_weights_come_back():
    # By hand: every entry of the segment scores the same, so no pair passes the threshold.
    statistics = np.tile(np.array([[2, 1, 0, 0, 4, 3, 2, 1, 4, 4]]), (3, 1))
    pool = PoolArrays(np.eye(3), statistics, np.array([0, 3]))
    result = optimise_pro(pool, [2.0, -1.0, 1.0], seed=0)
    assert result.weights.tolist() == [0.5, -0.25, 0.25]
    assert result.num_pairs == 0


def test_pro_settings_are_checked():
    with pytest.raises(ConfigurationError, match="new_weight_share"):
        ProSettings(new_weight_share=0.0)
    with pytest.raises(ConfigurationError, match="l2_strength"):
        ProSettings(l2_strength=0.0)
