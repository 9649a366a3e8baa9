"""Weight vectors of the log-linear model: normalisation shared by the optimisers.

The 1-best under ``weights`` is unchanged by any positive scaling, so the optimisers report weights at L1 norm 1
(sum of absolute values); signs are never constrained.
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
