"""Lexicalized reordering: orientation probabilities given both phrases of a pair, in both directions.

For a phrase pair (f, e) and direction d (the previous or the next phrase in target order), with orientation
counts c_d(o) of o in {monotone, swap, discontinuous} (Tillmann 2004; Koehn et al. 2005, "Edinburgh system
description for IWSLT 2005", section on lexicalized reordering), the estimate is smoothed towards the global
orientation distribution p_d(o) of that direction:

    p_d(o | f, e) = (c_d(o) + sigma * p_d(o)) / (sum_o' c_d(o') + sigma)

Add-sigma smoothing with sigma = 0.5 is common practice. The features are the natural logs, named
REORDERING_FEATURE_NAMES, in the column order of the orientation counts. The global distribution itself is
smoothed lightly towards uniform (see ``orientation_prior``) so that no feature is ever log 0.
"""

from __future__ import annotations

import numpy as np
import numpy.typing as npt

from decoder.phrases.extraction import NUM_ORIENTATIONS

REORDERING_FEATURE_NAMES = (
    "reorder_prev_monotone",
    "reorder_prev_swap",
    "reorder_prev_discontinuous",
    "reorder_next_monotone",
    "reorder_next_swap",
    "reorder_next_discontinuous",
)
DEFAULT_SMOOTHING = 0.5  # common practice


def orientation_prior(
    orientation_counts: npt.NDArray[np.int64], smoothing: float = DEFAULT_SMOOTHING
) -> npt.NDArray[np.float64]:
    """Global orientation distribution per direction, shape (6,): each half sums to 1.

    The totals over all pairs get the same add-sigma smoothing towards uniform, so an orientation never seen
    in the corpus keeps a small positive probability (and every feature stays finite); with millions of
    occurrences this changes the distribution only in far decimals. No counts at all give the uniform
    prior."""
    totals = np.asarray(orientation_counts, dtype=np.float64).sum(axis=0).reshape(2, NUM_ORIENTATIONS)
    smoothed = totals + smoothing / NUM_ORIENTATIONS
    return (smoothed / smoothed.sum(axis=1, keepdims=True)).reshape(-1)


def reordering_log_probabilities(
    orientation_counts: npt.NDArray[np.int64],
    prior: npt.NDArray[np.float64] | None = None,
    smoothing: float = DEFAULT_SMOOTHING,
) -> npt.NDArray[np.float64]:
    """(n, 6) natural-log orientation probabilities per pair; ``prior`` defaults to ``orientation_prior`` of
    the same counts (pass the prior of the unpruned table when scoring a pruned one)."""
    if not smoothing > 0:
        raise ValueError("smoothing must be positive")
    counts = np.asarray(orientation_counts, dtype=np.float64).reshape(
        len(orientation_counts), 2, NUM_ORIENTATIONS
    )
    prior = (
        orientation_prior(orientation_counts, smoothing)
        if prior is None
        else np.asarray(prior, dtype=np.float64)
    )
    smoothed = counts + smoothing * prior.reshape(1, 2, NUM_ORIENTATIONS)
    probabilities = smoothed / (counts.sum(axis=2, keepdims=True) + smoothing)
    return np.log(probabilities).reshape(len(orientation_counts), 2 * NUM_ORIENTATIONS)
