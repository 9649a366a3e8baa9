"""Upper envelopes of many sets of lines at once: the geometric core of MERT's exact line search (Och 2003).

Along a search line ``weights + gamma * direction`` each hypothesis scores ``a + gamma * b`` with
``a = features @ weights`` and ``b = features @ direction``. The decoder's 1-best at gamma is the line on top, so
as gamma grows from -inf to +inf the 1-best of a segment changes only where its upper envelope bends.

The envelope of one segment is the usual stack sweep over lines sorted by slope (a convex-hull construction):
a new, steeper line removes the lines on top of the stack that it overtakes before they begin. Segments are swept
in lockstep, one slope rank per step across all segments in numpy, so the Python loop runs once per slope rank
(the largest n-best pool size), not once per hypothesis.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt


@dataclass(frozen=True, slots=True)
class Envelopes:
    """Per segment, the lines on the upper envelope from gamma = -inf upwards.

    ``lines[k, :sizes[k]]`` are entry rows (indices into the flat ``a``/``b`` arrays) and ``starts[k, j]`` the
    gamma from which line j is on top (``starts[k, 0] = -inf``; strictly increasing). Padding is -1 / nan."""

    lines: npt.NDArray[np.int64]
    starts: npt.NDArray[np.float64]
    sizes: npt.NDArray[np.int64]

    def line_at(self, segment: int, gamma: float) -> int:
        """Entry row on top of segment's envelope at gamma (the later line at an exact change point)."""
        size = int(self.sizes[segment])
        position = int(np.searchsorted(self.starts[segment, :size], gamma, side="right")) - 1
        return int(self.lines[segment, position])

    def change_points(self) -> tuple[npt.NDArray[np.float64], npt.NDArray[np.int64], npt.NDArray[np.int64]]:
        """(gamma, row before, row after) for every bend of every segment's envelope, in no particular order."""
        width = self.lines.shape[1]
        inner = (np.arange(width)[None, :] >= 1) & (np.arange(width)[None, :] < self.sizes[:, None])
        segment, position = np.nonzero(inner)
        return (self.starts[segment, position], self.lines[segment, position - 1], self.lines[segment, position])


# Sample points of the prefilter, in units of each segment's (intercept range / slope range), the typical
# distance of a bend from gamma = 0. Where they fall only changes speed, never the envelope.
_FILTER_SAMPLES = np.array([-4.0, -1.0, -0.25, 0.0, 0.25, 1.0, 4.0])
_MIN_WIDTH_TO_FILTER = 16
_FILTER_TOLERANCE = 1e-9  # relative; a line is dropped only if clearly below, so rounding never drops a bend


@dataclass(frozen=True, slots=True)
class SegmentLayout:
    """Flat entries (segment k owns ``offsets[k]:offsets[k + 1]``) as a (segments, widest) matrix.

    ``rows[k, j]`` is the flat row of segment k's j-th entry, -1 past its end. Computed once per pool and reused
    by every line search."""

    offsets: npt.NDArray[np.int64]
    rows: npt.NDArray[np.int64]
    valid: npt.NDArray[np.bool_]
    is_full: bool  # every segment has the same number of entries: padding is a free reshape

    @classmethod
    def from_offsets(cls, offsets: npt.ArrayLike) -> SegmentLayout:
        offsets = np.asarray(offsets, dtype=np.int64)
        counts = np.diff(offsets)
        if len(counts) == 0 or np.any(counts <= 0):
            raise ValueError("every segment needs at least one line")
        width = int(counts.max())
        valid = np.arange(width)[None, :] < counts[:, None]
        rows = np.full(valid.shape, -1, dtype=np.int64)
        rows[valid] = np.arange(offsets[-1], dtype=np.int64)  # row-major order of valid = flat order
        return cls(offsets, rows, valid, bool(np.all(counts == width)))

    def pad(self, values: npt.NDArray[np.float64], fill: float) -> npt.NDArray[np.float64]:
        if self.is_full:
            return values.reshape(self.valid.shape)
        matrix = np.full(self.valid.shape, fill)
        matrix[self.valid] = values
        return matrix


def _maybe_on_top(
    intercepts: npt.NDArray[np.float64], slopes: npt.NDArray[np.float64], valid: npt.NDArray[np.bool_], is_full: bool
) -> npt.NDArray[np.bool_]:
    """(segments, width) mask of the lines that may lie on the envelope; a cheap superset of the true set.
    ``intercepts`` is padded with -inf and ``slopes`` with 0 where ``valid`` is False.

    Lines on top at a few sample gammas plus one line of the smallest and one of the largest slope span a
    partial envelope, never above the true one, bending where consecutive ones (by slope) cross. A line whose
    slope lies strictly between the extremes and that is clearly below the partial envelope at each of its bends
    is below it everywhere (the difference of a line and a convex piecewise-linear function peaks at a bend or
    at infinity, where it is -inf), hence never on top. Lines of extreme slope are always kept. In the dual plane
    this is the convex-hull prefilter of Akl & Toussaint (1978). Loops run over the few samples and bends, each
    step one pass over the (segments, width) matrices."""
    rows = np.arange(len(intercepts))
    b_low = (slopes if is_full else np.where(valid, slopes, np.inf)).min(axis=1)
    b_high = (slopes if is_full else np.where(valid, slopes, -np.inf)).max(axis=1)
    a_high = intercepts.max(axis=1)
    a_low = (intercepts if is_full else np.where(valid, intercepts, np.inf)).min(axis=1)
    slope_range = b_high - b_low
    scale = np.where(slope_range > 0, (a_high - a_low) / np.where(slope_range > 0, slope_range, 1.0), 1.0)
    scale = np.where(scale > 0, scale, 1.0)
    chain = [(slopes if is_full else np.where(valid, slopes, np.inf)).argmin(axis=1)]
    value = np.empty(intercepts.shape)
    for sample in _FILTER_SAMPLES:
        np.multiply(slopes, (scale * sample)[:, None], out=value)
        value += intercepts
        chain.append(np.argmax(value, axis=1))
    chain.append((slopes if is_full else np.where(valid, slopes, -np.inf)).argmax(axis=1))
    chain_columns = np.stack(chain, axis=1)
    chain_b, chain_a = slopes[rows[:, None], chain_columns], intercepts[rows[:, None], chain_columns]
    by_slope = np.lexsort((chain_a, chain_b), axis=1)
    chain_b = np.take_along_axis(chain_b, by_slope, axis=1)
    chain_a = np.take_along_axis(chain_a, by_slope, axis=1)
    # One margin per segment bounds the rounding of every value a + bend * b compared below.
    magnitude = 1.0 + np.maximum(np.abs(a_high), np.abs(a_low))
    largest_slope = np.maximum(np.abs(b_low), np.abs(b_high))
    below = np.ones(intercepts.shape, dtype=bool)
    is_below = np.empty(intercepts.shape, dtype=bool)
    for edge in range(chain_columns.shape[1] - 1):
        left_a, left_b = chain_a[:, edge], chain_b[:, edge]
        run = chain_b[:, edge + 1] - left_b
        has_bend = run > 0
        bend = np.where(has_bend, (left_a - chain_a[:, edge + 1]) / np.where(has_bend, run, 1.0), 0.0)
        level = left_a + bend * left_b
        margin = _FILTER_TOLERANCE * (magnitude + np.abs(level) + np.abs(bend) * largest_slope)
        threshold = np.where(has_bend, level - margin, np.inf)  # no bend: no evidence, keep "below" as is
        np.multiply(slopes, bend[:, None], out=value)
        value += intercepts
        np.less(value, threshold[:, None], out=is_below)
        below &= is_below
    keep = ~below | (slopes == b_low[:, None]) | (slopes == b_high[:, None])
    keep[rows[:, None], chain_columns] = True
    return keep & valid


def upper_envelopes(
    intercepts: npt.ArrayLike, slopes: npt.ArrayLike, offsets: npt.ArrayLike, layout: SegmentLayout | None = None
) -> Envelopes:
    """Upper envelope of each segment's lines ``intercepts + gamma * slopes``; segment k owns the flat entries
    ``offsets[k]:offsets[k + 1]`` (at least one each). Pass ``layout`` (of the same offsets) to save its cost.

    Of lines with equal slope only the highest can ever be on top (the lowest row among exact duplicates). Three
    or more lines meeting in one point keep only the outer two, so every envelope segment has positive width."""
    intercepts = np.asarray(intercepts, dtype=np.float64)
    slopes = np.asarray(slopes, dtype=np.float64)
    layout = layout or SegmentLayout.from_offsets(offsets)
    num_segments = len(layout.rows)
    slope_matrix = layout.pad(slopes, 0.0)
    if layout.rows.shape[1] >= _MIN_WIDTH_TO_FILTER:
        keep = _maybe_on_top(layout.pad(intercepts, -np.inf), slope_matrix, layout.valid, layout.is_full)
    else:
        keep = layout.valid
    # Compact the kept lines to the left of a narrow matrix, then sort each row by slope (stable: equal slopes
    # keep row order), padding last.
    counts = keep.sum(axis=1)
    width = int(counts.max())
    segment, column = np.nonzero(keep)
    rank = np.arange(len(segment)) - (np.cumsum(counts) - counts)[segment]
    kept_rows = np.full((num_segments, width), -1, dtype=np.int64)
    kept_rows[segment, rank] = layout.rows[segment, column]
    kept_slopes = np.full((num_segments, width), np.inf)
    kept_slopes[segment, rank] = slope_matrix[segment, column]
    by_slope = np.argsort(kept_slopes, axis=1, kind="stable")
    # Rows of the lockstep matrices: segments with most lines first, so the active rows are always a prefix.
    segment_of_row = np.argsort(-counts, kind="stable")
    row_of_segment = np.empty(num_segments, dtype=np.int64)
    row_of_segment[segment_of_row] = np.arange(num_segments)
    candidate = np.take_along_axis(kept_rows, by_slope, axis=1)[segment_of_row]
    active_rows = num_segments - np.searchsorted(np.sort(counts), np.arange(width), side="right")
    stack, starts, sizes = _sweep(intercepts, slopes, candidate, active_rows)
    return Envelopes(stack[row_of_segment], starts[row_of_segment], sizes[row_of_segment])


def _sweep(
    intercepts: npt.NDArray[np.float64],
    slopes: npt.NDArray[np.float64],
    candidate: npt.NDArray[np.int64],
    active_rows: npt.NDArray[np.int64],
) -> tuple[npt.NDArray[np.int64], npt.NDArray[np.float64], npt.NDArray[np.int64]]:
    """The stack sweep in lockstep: step j pushes the j-th slowest line of every segment that has one."""
    num_rows, width = candidate.shape
    stack = np.full((num_rows, width), -1, dtype=np.int64)
    stack_a = np.zeros((num_rows, width))
    stack_b = np.zeros((num_rows, width))
    starts = np.full((num_rows, width), np.nan)
    sizes = np.zeros(num_rows, dtype=np.int64)
    for step in range(width):
        num_active = int(active_rows[step])
        new_line = candidate[:num_active, step]
        new_a, new_b = intercepts[new_line], slopes[new_line]
        start = np.full(num_active, -np.inf)
        pending = np.nonzero(sizes[:num_active] > 0)[0]
        while pending.size:
            top = sizes[pending] - 1
            top_a, top_b = stack_a[pending, top], stack_b[pending, top]
            rise = new_b[pending] - top_b  # >= 0: sorted by slope
            parallel = rise == 0
            # Equal slopes: the higher line wins everywhere (-inf: pop the top); a line not higher never
            # shows (+inf: it is not pushed). Otherwise the gamma where the new line overtakes the top.
            meet = np.where(
                parallel,
                np.where(new_a[pending] > top_a, -np.inf, np.inf),
                (top_a - new_a[pending]) / np.where(parallel, 1.0, rise),
            )
            overtaken = meet <= starts[pending, top]
            settled = pending[~overtaken]
            start[settled] = meet[~overtaken]
            popped = pending[overtaken]
            sizes[popped] -= 1
            pending = popped[sizes[popped] > 0]
        pushed = np.nonzero(start < np.inf)[0]
        position = sizes[pushed]
        stack[pushed, position] = new_line[pushed]
        stack_a[pushed, position] = new_a[pushed]
        stack_b[pushed, position] = new_b[pushed]
        starts[pushed, position] = start[pushed]
        sizes[pushed] += 1
    beyond = np.arange(width)[None, :] >= sizes[:, None]  # stale entries of popped lines
    stack[beyond] = -1
    starts[beyond] = np.nan
    longest = int(sizes.max())
    return stack[:, :longest], starts[:, :longest], sizes
