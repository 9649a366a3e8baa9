"""Lexicalized reordering probabilities against hand computation (add-sigma smoothing, sigma = 0.5)."""

import math

import numpy as np
import pytest

from decoder.phrases.reordering import (
    REORDERING_FEATURE_NAMES,
    orientation_prior,
    reordering_log_probabilities,
)

COUNTS = np.array([[3, 0, 1, 0, 2, 2], [1, 1, 0, 2, 0, 0]], dtype=np.int64)


def test_feature_names_follow_the_orientation_columns():
    assert REORDERING_FEATURE_NAMES == (
        "reorder_prev_monotone",
        "reorder_prev_swap",
        "reorder_prev_discontinuous",
        "reorder_next_monotone",
        "reorder_next_swap",
        "reorder_next_discontinuous",
    )


def test_smoothed_probabilities_with_explicit_prior():
    # By hand, p(o) = (c(o) + 0.5 * prior(o)) / (sum c + 0.5), first pair, both directions total 4:
    #   prev, prior (0.6, 0.1, 0.3): (3 + 0.3) / 4.5, (0 + 0.05) / 4.5, (1 + 0.15) / 4.5
    #   next, prior (0.5, 0.2, 0.3): (0 + 0.25) / 4.5, (2 + 0.1) / 4.5, (2 + 0.15) / 4.5
    prior = np.array([0.6, 0.1, 0.3, 0.5, 0.2, 0.3])
    features = reordering_log_probabilities(COUNTS[:1], prior, smoothing=0.5)
    expected = np.log(np.array([3.3, 0.05, 1.15, 0.25, 2.1, 2.15]) / 4.5)
    np.testing.assert_allclose(features[0], expected, rtol=1e-12)


def test_global_prior_is_lightly_smoothed_towards_uniform():
    # By hand: totals prev (4, 1, 1) and next (2, 2, 2); sigma / 3 = 1/6 added to each, divided by 6 + 0.5.
    prior = orientation_prior(COUNTS, smoothing=0.5)
    expected = [(4 + 1 / 6) / 6.5, (1 + 1 / 6) / 6.5, (1 + 1 / 6) / 6.5, 1 / 3, 1 / 3, 1 / 3]
    np.testing.assert_allclose(prior, expected, rtol=1e-12)


def test_default_prior_comes_from_the_same_counts():
    # Second pair, prev counts (1, 1, 0), total 2; prior from the test above:
    #   p(discontinuous) = (0 + 0.5 * (7/6) / 6.5) / 2.5
    features = reordering_log_probabilities(COUNTS)
    assert features[1, 2] == pytest.approx(math.log(0.5 * (7 / 6) / 6.5 / 2.5), rel=1e-12)
    np.testing.assert_allclose(np.exp(features).reshape(2, 2, 3).sum(axis=2), 1.0)


def test_orientation_never_seen_anywhere_stays_finite():
    counts = np.array([[2, 0, 0, 2, 0, 0]], dtype=np.int64)
    assert np.isfinite(reordering_log_probabilities(counts)).all()


def test_non_positive_smoothing_is_rejected():
    with pytest.raises(ValueError, match="positive"):
        reordering_log_probabilities(COUNTS, smoothing=0.0)
