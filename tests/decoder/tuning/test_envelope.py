"""Upper envelopes against brute force: every line evaluated at every gamma of a grid, and an exact O(K^2)
enumeration of all pairwise intersections."""

from __future__ import annotations

import numpy as np
import pytest

import decoder.tuning.envelope as envelope_module
from decoder.tuning.envelope import upper_envelopes


def random_lines(generator, num_segments, max_lines, rounded=False):
    sizes = generator.integers(1, max_lines + 1, num_segments)
    offsets = np.concatenate([[0], np.cumsum(sizes)])
    intercepts = generator.normal(size=offsets[-1])
    slopes = generator.normal(size=offsets[-1])
    if rounded:  # coarse values: many parallel lines, exact duplicates and lines meeting in one point
        intercepts, slopes = np.round(intercepts, 0), np.round(slopes, 0)
    return intercepts, slopes, offsets


def exact_envelope(intercepts, slopes):
    """Brute force: between consecutive pairwise intersections the top line is constant, so the argmax at the
    midpoints (and beyond both ends) lists the envelope's lines in order. Only for lines in general position."""
    crossings = []
    for i in range(len(slopes)):
        for j in range(i + 1, len(slopes)):
            if slopes[i] != slopes[j]:
                crossings.append((intercepts[i] - intercepts[j]) / (slopes[j] - slopes[i]))
    points = np.unique(crossings) if crossings else np.zeros(0)
    if len(points):
        probes = np.concatenate([[points[0] - 1.0], 0.5 * (points[1:] + points[:-1]), [points[-1] + 1.0]])
    else:
        probes = np.zeros(1)
    tops = [int(np.argmax(intercepts + gamma * slopes)) for gamma in probes]
    lines = [tops[0]] + [top for previous, top in zip(tops, tops[1:], strict=False) if top != previous]
    starts = [-np.inf] + [
        (intercepts[a] - intercepts[b]) / (slopes[b] - slopes[a]) for a, b in zip(lines, lines[1:], strict=False)
    ]
    return lines, starts


# Brute force (exact enumeration above) on random lines in general position. max_lines 40 takes the prefilter
# path (segments of 16 lines or more), max_lines 10 the plain sweep.
@pytest.mark.parametrize("max_lines", [10, 40])
def test_envelope_equals_exact_enumeration(max_lines):
    generator = np.random.default_rng(max_lines)
    for _ in range(20):
        intercepts, slopes, offsets = random_lines(generator, 6, max_lines)
        envelopes = upper_envelopes(intercepts, slopes, offsets)
        for segment in range(6):
            start, stop = offsets[segment], offsets[segment + 1]
            lines, starts = exact_envelope(intercepts[start:stop], slopes[start:stop])
            size = envelopes.sizes[segment]
            assert (envelopes.lines[segment, :size] - start).tolist() == lines
            assert envelopes.starts[segment, :size] == pytest.approx(starts, rel=1e-9, abs=1e-12)


# Brute force on a grid: with ties (parallel lines, duplicates, three lines through one point) the top line may
# be any of several equal ones, so compare the top value at each gamma, and that envelope pieces have width > 0.
@pytest.mark.parametrize("max_lines", [10, 40])
def test_envelope_value_equals_grid_maximum_with_ties(max_lines):
    generator = np.random.default_rng(100 + max_lines)
    grid = np.linspace(-12.0, 12.0, 4801)
    for _ in range(10):
        intercepts, slopes, offsets = random_lines(generator, 5, max_lines, rounded=True)
        envelopes = upper_envelopes(intercepts, slopes, offsets)
        for segment in range(5):
            start, stop = offsets[segment], offsets[segment + 1]
            best = (intercepts[start:stop, None] + grid[None, :] * slopes[start:stop, None]).max(axis=0)
            size = envelopes.sizes[segment]
            pieces = np.searchsorted(envelopes.starts[segment, :size], grid, side="right") - 1
            tops = envelopes.lines[segment, pieces]
            assert np.max(np.abs(intercepts[tops] + grid * slopes[tops] - best)) <= 1e-12
            assert np.all(np.diff(envelopes.starts[segment, :size]) > 0)


# Consistency of the two envelope paths on large segments (the exact enumeration in test_envelope covers both
# on small ones): with the prefilter disabled the sweep sees all 300 lines and must return the same envelope.
def test_prefilter_does_not_change_large_envelopes(monkeypatch):
    generator = np.random.default_rng(3)
    offsets = np.arange(41) * 300
    features = generator.normal(size=(offsets[-1], 5)) + np.repeat(generator.normal(size=(40, 5)), 300, axis=0)
    a, b = features @ generator.normal(size=5), features @ generator.normal(size=5)
    filtered = upper_envelopes(a, b, offsets)
    # the prefilter really ran and dropped most lines (else this test would compare the plain path with itself)
    kept = envelope_module._maybe_on_top(a.reshape(40, 300), b.reshape(40, 300), np.ones((40, 300), bool), True)
    assert kept.sum(axis=1).max() < 60
    monkeypatch.setattr(envelope_module, "_MIN_WIDTH_TO_FILTER", 10**9)
    plain = upper_envelopes(a, b, offsets)
    assert filtered.sizes.tolist() == plain.sizes.tolist()
    assert np.array_equal(filtered.lines, plain.lines)
    assert np.array_equal(filtered.starts, plain.starts, equal_nan=True)


# By hand: lines 0 (a=1, b=0), 1 (a=0, b=1), 2 (a=0.5, b=0, parallel to 0 and lower), 3 = copy of 1. Line 2 is
# never on top; of the duplicates the lower row (1) is kept; 0 and 1 cross at gamma = 1.
def test_parallel_and_duplicate_lines_by_hand():
    envelopes = upper_envelopes([1.0, 0.0, 0.5, 0.0], [0.0, 1.0, 0.0, 1.0], [0, 4])
    assert envelopes.lines[0, : envelopes.sizes[0]].tolist() == [0, 1]
    assert envelopes.starts[0, : envelopes.sizes[0]].tolist() == [-np.inf, 1.0]
    assert [envelopes.line_at(0, gamma) for gamma in (-5.0, 0.99, 1.0, 7.0)] == [0, 0, 1, 1]


# By hand: three lines through (0, 0) with slopes -1, 0, 1: the middle one is on top only at gamma = 0 itself,
# a piece of width 0, so the envelope is the outer two with one bend at 0.
def test_three_lines_through_one_point_keep_the_outer_two():
    envelopes = upper_envelopes([0.0, 0.0, 0.0], [-1.0, 0.0, 1.0], [0, 3])
    assert envelopes.lines[0, : envelopes.sizes[0]].tolist() == [0, 2]
    gammas, before, after = envelopes.change_points()
    assert (gammas.tolist(), before.tolist(), after.tolist()) == ([0.0], [0], [2])


def test_segment_without_lines_is_refused():
    with pytest.raises(ValueError, match="at least one line"):
        upper_envelopes([0.0], [1.0], [0, 1, 1])
