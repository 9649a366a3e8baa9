"""Minimum error rate training (Och 2003): coordinate ascent on corpus BLEU with an exact line search.

Along ``weights + gamma * direction`` each segment's 1-best changes only at the bends of its upper envelope
(``envelope.py``). Sorting the bends of all segments and adding up the change of BLEU statistics at each one
gives the corpus BLEU of every gamma interval exactly, in one sweep. The step goes to the middle of the best
interval, as far as possible from the points where the 1-best flips.

Search: from the current weights and from ``num_restarts`` random points (uniform within ``bounds``), repeat
rounds of line searches along every coordinate axis plus ``num_random_directions`` random unit directions, and
take the best step of each round until a round gains less than ``min_gain``. Weights are kept at L1 norm 1 (the
common choice; BLEU depends only on the ranking, which positive scaling keeps). Signs are free: the optimiser may
make any weight negative, the LM weight included.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from decoder.errors import ConfigurationError
from decoder.tuning.bleu_statistics import bleu
from decoder.tuning.envelope import SegmentLayout, upper_envelopes
from decoder.tuning.n_best_pool import PoolArrays
from decoder.tuning.weights import OptimiserResult, normalise_l1

# Step beyond the last bend when the best interval is unbounded. With L1-normalised weights and unit directions a
# step of 1 changes the ranking substantially without the weights running away.
UNBOUNDED_STEP = 1.0


@dataclass(frozen=True, slots=True)
class LineSearchResult:
    """Best step along one direction. ``bleu`` (in [0, 1]) is the pool BLEU at ``gamma``; ``current_bleu`` the
    pool BLEU at gamma = 0; ``interval`` the gamma range of constant 1-best statistics that ``gamma`` lies in."""

    gamma: float
    bleu: float
    current_bleu: float
    interval: tuple[float, float]


@dataclass(frozen=True, slots=True)
class MertSettings:
    num_random_directions: int = 5
    num_restarts: int = 4
    bounds: tuple[float, float] = (-1.0, 1.0)  # range of each weight of a random restart point
    max_rounds: int = 50  # rounds of line searches per starting point
    min_gain: float = 1e-6  # in BLEU [0, 1]; a round gaining less ends the search from that start

    def __post_init__(self) -> None:
        if self.num_random_directions < 0 or self.num_restarts < 0 or self.max_rounds < 1:
            raise ConfigurationError("MERT needs num_random_directions >= 0, num_restarts >= 0, max_rounds >= 1")
        if not self.bounds[0] < self.bounds[1]:
            raise ConfigurationError(f"MERT bounds must be (low, high) with low < high, got {self.bounds}")


def line_search(
    pool: PoolArrays, weights: npt.ArrayLike, direction: npt.ArrayLike, layout: SegmentLayout | None = None
) -> LineSearchResult:
    """Exact line search (Och 2003, section 6): the gamma maximising pool corpus BLEU of the 1-best entries
    under ``weights + gamma * direction``. ``layout`` (of ``pool.offsets``) may be passed to save its cost.

    Intervals whose statistics are equal are merged first. If the interval around gamma = 0 is among the best,
    gamma stays 0 (no drift without gain); otherwise the best interval nearest to 0 wins and gamma is its middle,
    or ``UNBOUNDED_STEP`` beyond its finite end if it is unbounded."""
    weights = np.asarray(weights, dtype=np.float64)
    direction = np.asarray(direction, dtype=np.float64)
    return _search_projected(pool, pool.features @ weights, pool.features @ direction, layout)


def _search_projected(
    pool: PoolArrays, intercepts: npt.NDArray[np.float64], slopes: npt.NDArray[np.float64], layout: SegmentLayout | None
) -> LineSearchResult:
    """``line_search`` given the entries' scores (intercepts) and their derivatives along the direction."""
    envelopes = upper_envelopes(intercepts, slopes, pool.offsets, layout)
    base = pool.statistics[envelopes.lines[:, 0]].sum(axis=0)
    gammas, before, after = envelopes.change_points()
    order = np.argsort(gammas, kind="stable")
    gammas = gammas[order]
    running = base + np.cumsum(pool.statistics[after[order]] - pool.statistics[before[order]], axis=0)
    # Bends at one gamma in several segments act together: keep the statistics after the last of them.
    last_at_gamma = np.ones(len(gammas), dtype=bool)
    last_at_gamma[:-1] = gammas[1:] != gammas[:-1]
    bounds, interval_statistics = gammas[last_at_gamma], np.vstack([base, running[last_at_gamma]])
    changes = np.any(interval_statistics[1:] != interval_statistics[:-1], axis=1)
    bounds = bounds[changes]
    interval_statistics = interval_statistics[np.concatenate([[True], changes])]
    scores = np.asarray(bleu(interval_statistics), dtype=np.float64).reshape(-1)
    lower = np.concatenate([[-np.inf], bounds])
    upper = np.concatenate([bounds, [np.inf]])
    current = int(np.searchsorted(bounds, 0.0, side="right"))
    best_score = scores.max()
    if scores[current] == best_score:
        return LineSearchResult(
            0.0, float(best_score), float(scores[current]), (float(lower[current]), float(upper[current]))
        )
    distance = np.maximum(np.maximum(lower, -upper), 0.0)  # how far the interval is from gamma = 0
    candidates = np.nonzero(scores == best_score)[0]
    best = int(candidates[np.argmin(distance[candidates])])
    low, high = float(lower[best]), float(upper[best])
    if np.isfinite(low) and np.isfinite(high):
        gamma = 0.5 * (low + high)
    elif np.isfinite(high):
        gamma = high - UNBOUNDED_STEP
    else:
        gamma = low + UNBOUNDED_STEP
    return LineSearchResult(gamma, float(best_score), float(scores[current]), (low, high))


def _random_unit_vectors(generator: np.random.Generator, count: int, dimension: int) -> npt.NDArray[np.float64]:
    """Uniform on the unit sphere: normalised standard normal vectors (Muller 1959)."""
    vectors = generator.standard_normal((count, dimension))
    return vectors / np.linalg.norm(vectors, axis=1, keepdims=True)


def _ascend(
    pool: PoolArrays,
    layout: SegmentLayout,
    start: npt.NDArray[np.float64],
    generator: np.random.Generator,
    settings: MertSettings,
) -> tuple[npt.NDArray[np.float64], float, int]:
    """Coordinate ascent from one start; returns (weights, pool BLEU, number of line searches)."""
    dimension = len(start)
    weights = normalise_l1(start)
    current = float(bleu(pool.one_best_statistics(weights)))
    num_searches = 0
    for _ in range(settings.max_rounds):
        random_directions = _random_unit_vectors(generator, settings.num_random_directions, dimension)
        directions = np.vstack([np.eye(dimension), random_directions])
        intercepts = pool.features @ weights  # shared by every direction of the round
        slopes = np.hstack([pool.features, pool.features @ random_directions.T])
        best: tuple[float, npt.NDArray[np.float64]] | None = None
        for index, direction in enumerate(directions):
            result = _search_projected(pool, intercepts, np.ascontiguousarray(slopes[:, index]), layout)
            num_searches += 1
            if result.gamma != 0.0 and (best is None or result.bleu > best[0]):
                best = (result.bleu, weights + result.gamma * direction)
        if best is None or best[0] - current < settings.min_gain:
            break
        weights = normalise_l1(best[1])
        # Re-measure rather than trust the interval arithmetic across the renormalisation (they agree).
        current = float(bleu(pool.one_best_statistics(weights)))
    return weights, current, num_searches


def optimise_mert(
    pool: PoolArrays, initial_weights: npt.ArrayLike, seed: int, settings: MertSettings | None = None
) -> OptimiserResult:
    """MERT over the whole pool from ``initial_weights`` and random restarts; the best end point wins (ties go
    to the earliest start, so the current weights win over random ones)."""
    settings = settings or MertSettings()
    initial = np.asarray(initial_weights, dtype=np.float64)
    if initial.shape != (pool.features.shape[1],):
        raise ConfigurationError(f"{initial.size} initial weights for {pool.features.shape[1]} features")
    generator = np.random.default_rng(seed)
    low, high = settings.bounds
    starts = [initial] + [generator.uniform(low, high, size=initial.shape) for _ in range(settings.num_restarts)]
    layout = SegmentLayout.from_offsets(pool.offsets)
    best_weights, best_bleu, total_searches = normalise_l1(initial), -1.0, 0
    for start in starts:
        weights, score, num_searches = _ascend(pool, layout, start, generator, settings)
        total_searches += num_searches
        if score > best_bleu:
            best_weights, best_bleu = weights, score
    best_weights = best_weights.copy()
    best_weights.flags.writeable = False
    return OptimiserResult(best_weights, best_bleu, seed, "mert", num_line_searches=total_searches)
