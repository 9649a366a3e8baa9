"""Pairwise ranking optimisation, PRO (Hopkins & May 2011, "Tuning as ranking").

Per segment, sample ``num_samples`` (their Gamma = 5000) pairs of pool entries uniformly with replacement, keep
the pairs whose smoothed sentence BLEU (BLEU+1, Lin & Och 2004) differs by more than ``min_difference`` (0.05),
and of those the ``max_pairs`` (their Xi = 50) with the largest difference. Each kept pair gives two training
examples: the feature difference of better minus worse labelled +1 and its negation labelled -1. A linear
classifier on these differences ranks like the metric; its weight vector is the new model weight vector.

The classifier is L2-regularised logistic regression without intercept (the examples are symmetric, so an
intercept would be 0), fitted by Newton's method with a backtracking line search, in numpy. Optionally the new
weights are interpolated with the previous ones, ``share * new + (1 - share) * old`` with share 0.1, a common
practice in later PRO setups for stability across iterations; the default share is 1 (no interpolation).
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from decoder.errors import ConfigurationError
from decoder.tuning.bleu_statistics import bleu, sentence_bleu_plus_one
from decoder.tuning.n_best_pool import PoolArrays
from decoder.tuning.weights import OptimiserResult, normalise_l1

_SEGMENTS_PER_CHUNK = 256  # bounds the (segments, num_samples) sampling matrices to a few MB
_PURE_NEWTON_DECREMENT = 1e-6  # relative decrement below which full Newton steps are taken


@dataclass(frozen=True, slots=True)
class ProSettings:
    num_samples: int = 5000  # Gamma, pairs sampled per segment (Hopkins & May 2011, section 4)
    max_pairs: int = 50  # Xi, pairs kept per segment
    min_difference: float = 0.05  # sentence BLEU+1 difference in [0, 1] below which a pair is noise
    l2_strength: float = 1.0  # lambda of (lambda / 2) * |w|^2, added to the summed log loss
    new_weight_share: float = 1.0  # 0.1 = interpolate 0.1 new + 0.9 previous (common practice)
    max_newton_steps: int = 100

    def __post_init__(self) -> None:
        if self.num_samples < 1 or self.max_pairs < 1 or self.max_newton_steps < 1:
            raise ConfigurationError("PRO needs num_samples, max_pairs and max_newton_steps of at least 1")
        if self.l2_strength <= 0:
            raise ConfigurationError("PRO's l2_strength must be positive (it keeps separable data bounded)")
        if not 0.0 < self.new_weight_share <= 1.0:
            raise ConfigurationError("PRO's new_weight_share must be in (0, 1]")


def sample_pairs(
    scores: npt.ArrayLike, offsets: npt.ArrayLike, generator: np.random.Generator, settings: ProSettings
) -> tuple[npt.NDArray[np.int64], npt.NDArray[np.int64]]:
    """(better rows, worse rows) of the kept pairs, over all segments; ``scores`` is one metric value per entry.

    Sampling and selection are vectorised over chunks of segments; segments with one entry give no pairs."""
    scores = np.asarray(scores, dtype=np.float64)
    offsets = np.asarray(offsets, dtype=np.int64)
    sizes = np.diff(offsets)
    usable = np.nonzero(sizes >= 2)[0]
    better_parts, worse_parts = [], []
    for chunk_start in range(0, len(usable), _SEGMENTS_PER_CHUNK):
        segments = usable[chunk_start : chunk_start + _SEGMENTS_PER_CHUNK]
        shape = (len(segments), settings.num_samples)
        base, size = offsets[segments][:, None], sizes[segments][:, None]
        first = base + np.minimum((generator.random(shape) * size).astype(np.int64), size - 1)
        second = base + np.minimum((generator.random(shape) * size).astype(np.int64), size - 1)
        difference = scores[first] - scores[second]
        gap = np.where(np.abs(difference) > settings.min_difference, np.abs(difference), -1.0)
        if settings.max_pairs < settings.num_samples:
            top = np.argpartition(-gap, settings.max_pairs - 1, axis=1)[:, : settings.max_pairs]
        else:
            top = np.broadcast_to(np.arange(settings.num_samples), shape)
        rows = np.arange(len(segments))[:, None]
        kept = gap[rows, top] > 0
        pair_first, pair_second = first[rows, top][kept], second[rows, top][kept]
        first_is_better = difference[rows, top][kept] > 0
        better_parts.append(np.where(first_is_better, pair_first, pair_second))
        worse_parts.append(np.where(first_is_better, pair_second, pair_first))
    if not better_parts:
        return np.zeros(0, dtype=np.int64), np.zeros(0, dtype=np.int64)
    return np.concatenate(better_parts), np.concatenate(worse_parts)


def fit_logistic_regression(
    examples: npt.ArrayLike, labels: npt.ArrayLike, l2_strength: float, max_steps: int = 100, tolerance: float = 1e-24
) -> npt.NDArray[np.float64]:
    """Weights w minimising sum_i log(1 + exp(-y_i w.x_i)) + (l2_strength / 2) |w|^2 (labels y in {-1, +1}).

    Newton's method; the objective is strictly convex, so the minimiser is unique. Far from it, steps are halved
    until the objective decreases enough (damped phase); near it, full steps converge quadratically (pure phase),
    where objective differences would drown in rounding (Boyd & Vandenberghe 2004, "Convex Optimization",
    section 9.5). Stops when the Newton decrement g.H^-1.g falls under ``tolerance * (1 + objective)``."""
    examples = np.asarray(examples, dtype=np.float64)
    labels = np.asarray(labels, dtype=np.float64)
    dimension = examples.shape[1]
    signed = examples * labels[:, None]  # the loss depends only on y * x

    def objective(weights: npt.NDArray[np.float64]) -> float:
        return float(np.logaddexp(0.0, -(signed @ weights)).sum() + 0.5 * l2_strength * weights @ weights)

    weights = np.zeros(dimension)
    value = objective(weights)
    for _ in range(max_steps):
        margins = signed @ weights
        # sigma(-m) = probability of the wrong label, written with tanh to stay finite for any margin
        wrong = 0.5 * (1.0 - np.tanh(0.5 * margins))
        gradient = -(signed.T @ wrong) + l2_strength * weights
        curvature = wrong * (1.0 - wrong)
        hessian = (signed.T * curvature) @ signed + l2_strength * np.eye(dimension)
        step = np.linalg.solve(hessian, -gradient)
        decrement = float(-gradient @ step)
        scale = 1.0 + abs(value)
        if decrement <= tolerance * scale:
            break
        size = 1.0
        if decrement > _PURE_NEWTON_DECREMENT * scale:
            while objective(weights + size * step) > value - 0.25 * size * decrement and size > 1e-10:
                size *= 0.5
        weights = weights + size * step
        value = objective(weights)
    return weights


def optimise_pro(
    pool: PoolArrays, previous_weights: npt.ArrayLike, seed: int, settings: ProSettings | None = None
) -> OptimiserResult:
    """PRO weights (L1 norm 1) from the pool, and their pool BLEU in [0, 1]. Without any usable pair (every
    segment's entries within ``min_difference`` of each other) the previous weights come back normalised."""
    settings = settings or ProSettings()
    previous = np.asarray(previous_weights, dtype=np.float64)
    if previous.shape != (pool.features.shape[1],):
        raise ConfigurationError(f"{previous.size} previous weights for {pool.features.shape[1]} features")
    generator = np.random.default_rng(seed)
    scores = np.asarray(sentence_bleu_plus_one(pool.statistics), dtype=np.float64).reshape(-1)
    better, worse = sample_pairs(scores, pool.offsets, generator, settings)
    if len(better) == 0:
        weights = normalise_l1(previous)
    else:
        differences = pool.features[better] - pool.features[worse]
        examples = np.vstack([differences, -differences])
        labels = np.concatenate([np.ones(len(differences)), -np.ones(len(differences))])
        learned = normalise_l1(
            fit_logistic_regression(examples, labels, settings.l2_strength, settings.max_newton_steps)
        )
        share = settings.new_weight_share
        weights = normalise_l1(share * learned + (1.0 - share) * normalise_l1(previous))
    weights.flags.writeable = False
    return OptimiserResult(weights, float(bleu(pool.one_best_statistics(weights))), seed, "pro", num_pairs=len(better))
