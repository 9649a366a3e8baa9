"""N-gram counting over target-language segments as a sharded map (``count_ngrams``) and a reduce (``merge_counts``).

Each segment is padded with one ``<s>`` in front and one ``</s>`` at the end, and every window of k consecutive
padded tokens (k = 1..order) is an n-gram; windows never cross segment boundaries, so every prefix and every
suffix of a counted n-gram is counted too (the Kneser-Ney estimator and the query structure rely on that).
Tables of one order are (n, k) int32 arrays of distinct rows in lexicographic order, with int64 counts beside.
Sorting and summing is done with ``np.lexsort`` and ``np.add.reduceat``; there is no dict of n-grams.
"""

from __future__ import annotations

import functools
from collections.abc import Sequence
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from decoder.executor import Executor, SerialExecutor
from decoder.segment_arrays import SegmentArray
from decoder.vocabulary import SENTENCE_END_ID, SENTENCE_START_ID

SHARDS_PER_WORKER = 4  # a few shards per worker evens out shards that happen to run slower


@dataclass(frozen=True, slots=True, eq=False)  # eq=False: fields are numpy arrays
class NgramCounts:
    """Counts of every n-gram of orders 1..order.

    ``ngrams[k - 1]`` is an (n_k, k) int32 array of distinct n-grams sorted lexicographically (first word most
    significant) and ``counts[k - 1]`` the matching (n_k,) int64 occurrence counts."""

    ngrams: tuple[npt.NDArray[np.int32], ...]
    counts: tuple[npt.NDArray[np.int64], ...]

    def __post_init__(self) -> None:
        if len(self.ngrams) != len(self.counts) or not self.ngrams:
            raise ValueError("NgramCounts needs one (ngrams, counts) pair per order, at least one order")
        for k, (grams, counts) in enumerate(zip(self.ngrams, self.counts, strict=True), start=1):
            if grams.ndim != 2 or grams.shape[1] != k or len(counts) != len(grams):
                raise ValueError(f"order {k}: expected an (n, {k}) array and n counts")

    @property
    def order(self) -> int:
        return len(self.ngrams)

    def num_ngrams(self, k: int) -> int:
        return len(self.ngrams[k - 1])


def sort_rows(rows: npt.NDArray[np.integer]) -> npt.NDArray[np.int64]:
    """Permutation that sorts the rows of a 2-D array lexicographically (column 0 most significant)."""
    if rows.shape[1] == 1:
        return np.argsort(rows[:, 0], kind="stable")
    # np.lexsort treats its last key as the primary one, hence the reversed columns.
    return np.lexsort(rows.T[::-1])


def sort_and_sum(
    rows: npt.NDArray[np.int32], weights: npt.NDArray[np.int64]
) -> tuple[npt.NDArray[np.int32], npt.NDArray[np.int64]]:
    """Distinct rows in lexicographic order and, for each, the sum of the weights of its copies."""
    if len(rows) == 0:
        return rows.astype(np.int32).reshape(0, rows.shape[1]), np.zeros(0, dtype=np.int64)
    order = sort_rows(rows)
    ordered = rows[order]
    is_new = np.ones(len(ordered), dtype=bool)
    is_new[1:] = np.any(ordered[1:] != ordered[:-1], axis=1)
    starts = np.flatnonzero(is_new)
    sums = np.add.reduceat(np.asarray(weights, dtype=np.int64)[order], starts)
    return np.ascontiguousarray(ordered[starts], dtype=np.int32), sums


def pad_segments(segments: SegmentArray) -> tuple[npt.NDArray[np.int32], npt.NDArray[np.int64]]:
    """(tokens, remaining): all segments wrapped in ``<s> ... </s>`` back to back, and for each position the
    number of tokens from it to the end of its padded segment (so a window of k fits where remaining >= k)."""
    lengths = segments.lengths
    padded_lengths = lengths + 2
    starts = np.zeros(len(segments) + 1, dtype=np.int64)
    np.cumsum(padded_lengths, out=starts[1:])
    tokens = np.empty(int(starts[-1]), dtype=np.int32)
    tokens[starts[:-1]] = SENTENCE_START_ID
    tokens[starts[1:] - 1] = SENTENCE_END_ID
    # Word j of segment s moves right by 2s + 1: one <s> of its own and two padding tokens per earlier segment.
    tokens[np.arange(len(segments.ids)) + 2 * segments.segment_of_position() + 1] = segments.ids
    remaining = np.repeat(starts[1:], padded_lengths) - np.arange(len(tokens), dtype=np.int64)
    return tokens, remaining


def count_ngrams(shard: SegmentArray, order: int) -> NgramCounts:
    """Counts of all n-grams of orders 1..``order`` in ``shard`` (segments padded with ``<s>`` and ``</s>``).

    A pure function of its arguments, so an executor may run it on shards in other processes."""
    if order < 1:
        raise ValueError(f"order must be at least 1, got {order}")
    tokens, remaining = pad_segments(shard)
    all_ngrams, all_counts = [], []
    for k in range(1, order + 1):
        starts = np.flatnonzero(remaining >= k)
        rows = np.stack([tokens[starts + j] for j in range(k)], axis=1)
        grams, counts = sort_and_sum(rows, np.ones(len(rows), dtype=np.int64))
        all_ngrams.append(grams)
        all_counts.append(counts)
    return NgramCounts(tuple(all_ngrams), tuple(all_counts))


def merge_counts(parts: Sequence[NgramCounts]) -> NgramCounts:
    """Sum of per-shard counts: rows of all parts concatenated, sorted and summed per distinct n-gram."""
    if not parts:
        raise ValueError("merge_counts needs at least one NgramCounts")
    order = parts[0].order
    if any(part.order != order for part in parts):
        raise ValueError("cannot merge counts of different orders")
    if len(parts) == 1:
        return parts[0]
    merged_ngrams, merged_counts = [], []
    for k in range(order):
        rows = np.concatenate([part.ngrams[k] for part in parts])
        weights = np.concatenate([part.counts[k] for part in parts])
        grams, counts = sort_and_sum(rows, weights)
        merged_ngrams.append(grams)
        merged_counts.append(counts)
    return NgramCounts(tuple(merged_ngrams), tuple(merged_counts))


def segment_shard_bounds(segments: SegmentArray, num_shards: int) -> list[tuple[int, int]]:
    """Contiguous (start, stop) segment ranges with about equal padded token counts; never an empty range."""
    count = len(segments)
    if count == 0:
        return []
    num_shards = max(1, min(num_shards, count))
    work = np.cumsum(segments.lengths + 2)
    cuts = np.searchsorted(work, work[-1] * np.arange(1, num_shards) / num_shards)
    bounds = np.unique(np.concatenate([[0], cuts, [count]]))
    return [(int(a), int(b)) for a, b in zip(bounds[:-1], bounds[1:], strict=True) if b > a]


def count_ngrams_sharded(
    segments: SegmentArray, order: int, executor: Executor | None = None, num_shards: int | None = None
) -> NgramCounts:
    """``count_ngrams`` mapped over shards by ``executor`` (serial when None), then ``merge_counts``.

    The result equals ``count_ngrams(segments, order)`` whatever the sharding."""
    executor = executor if executor is not None else SerialExecutor()
    if num_shards is None:
        num_shards = SHARDS_PER_WORKER * executor.num_workers if executor.num_workers > 1 else 1
    bounds = segment_shard_bounds(segments, num_shards)
    if not bounds:
        return count_ngrams(segments, order)
    shards = [segments.slice(start, stop) for start, stop in bounds]
    return merge_counts(executor.map(functools.partial(count_ngrams, order=order), shards))
