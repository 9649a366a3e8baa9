"""Weight vectors of the log-linear model: normalisation shared by the optimisers.

The 1-best under ``weights`` is unchanged by any positive scaling, so the optimisers report weights at L1 norm 1
(sum of absolute values); signs are never constrained.

The decoder's search is not scale-free, though: its beam threshold is an absolute score margin, and a feature
that never varies on the dev set (``glossary`` when the dev set is decoded without a glossary) gets no
information from tuning, so PRO shrinks it to 0 and MERT keeps only its share of the L1 norm.
``in_initial_units`` therefore brings the optimiser's weights back to the units the search was set up for:
features that vary in the pool are rescaled to the initial weights' L1 norm over them, and the others keep
their initial weights. Within one segment's entries the inactive features are constant, so the 1-best of every
pool segment, and with it the pool BLEU, is exactly the optimiser's.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt


def normalise_l1(weights: npt.ArrayLike) -> npt.NDArray[np.float64]:
    """``weights / sum(|weights|)`` as a new float64 array; an all-zero vector comes back unchanged (as zeros)."""
    weights = np.array(weights, dtype=np.float64)
    norm = np.abs(weights).sum()
    return weights / norm if norm > 0 else weights


def varying_features(features: npt.ArrayLike, offsets: npt.ArrayLike) -> npt.NDArray[np.bool_]:
    """Which features (columns) differ between the entries of at least one segment (rows offsets[k]:offsets[k+1])."""
    features = np.asarray(features, dtype=np.float64)
    offsets = np.asarray(offsets, dtype=np.int64)
    first_of_segment = np.repeat(offsets[:-1], np.diff(offsets))  # each row's segment's first row
    return (features != features[first_of_segment]).any(axis=0)


def in_initial_units(
    weights: npt.ArrayLike, initial: npt.ArrayLike, varying: npt.ArrayLike,
) -> npt.NDArray[np.float64]:
    """``weights`` on the varying features, scaled to ``initial``'s L1 norm over them; ``initial`` elsewhere.

    If either norm over the varying features is 0 (nothing to scale by), ``weights`` come back unchanged."""
    weights = np.array(weights, dtype=np.float64)
    initial = np.asarray(initial, dtype=np.float64)
    varying = np.asarray(varying, dtype=bool)
    tuned_norm, initial_norm = np.abs(weights[varying]).sum(), np.abs(initial[varying]).sum()
    if tuned_norm == 0 or initial_norm == 0:
        return weights
    result = initial.copy()
    result[varying] = weights[varying] * (initial_norm / tuned_norm)
    return result


@dataclass(frozen=True, slots=True)
class OptimiserResult:
    """What one optimiser run over the n-best pool returns.

    ``weights`` have L1 norm 1 (read-only array); ``pool_bleu`` in [0, 1] is the corpus BLEU of their 1-best
    pool entries; ``seed`` reproduces the run; ``method`` is "mert" or "pro"; ``num_line_searches`` (MERT) and
    ``num_pairs`` (PRO, kept pairs before doubling into two examples) say how much work was done."""

    weights: npt.NDArray[np.float64]
    pool_bleu: float
    seed: int
    method: str
    num_line_searches: int = 0
    num_pairs: int = 0
