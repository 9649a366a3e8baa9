"""N-gram counting: hand counts, a Counter-based reference, and shard map + merge equal to one shard."""

from __future__ import annotations

from collections import Counter

import numpy as np
import pytest

from decoder.executor import LocalProcessExecutor, SerialExecutor
from decoder.lm.counts import (
    NgramCounts,
    count_ngrams,
    count_ngrams_sharded,
    merge_counts,
    segment_shard_bounds,
)
from decoder.segment_arrays import SegmentArray

from .lm_helpers import HAND_SEGMENTS, as_segment_array, random_segments


def as_counter(counts: NgramCounts, k: int) -> Counter:
    return Counter(
        {
            tuple(gram): int(count)
            for gram, count in zip(counts.ngrams[k - 1].tolist(), counts.counts[k - 1].tolist(), strict=True)
        }
    )


def reference_counts(segments: list[list[int]], k: int) -> Counter:
    """Every window of k tokens of each segment padded as <s>=1 ... </s>=2, counted with a Counter."""
    counter: Counter = Counter()
    for segment in segments:
        padded = [1, *segment, 2]
        counter.update(tuple(padded[i : i + k]) for i in range(len(padded) - k + 1))
    return counter


def test_hand_corpus_bigram_counts():
    # Hand count over "<s> press start </s>" x2, "<s> press start stop </s>", "<s> press stop reset stop </s>"
    # (press=4, start=5, stop=6, reset=7): <s> press 4, press start 3, press stop 1, start </s> 2,
    # start stop 1, stop </s> 2, stop reset 1, reset stop 1.
    counts = count_ngrams(as_segment_array(HAND_SEGMENTS), 2)
    assert as_counter(counts, 2) == Counter(
        {(1, 4): 4, (4, 5): 3, (4, 6): 1, (5, 2): 2, (5, 6): 1, (6, 2): 2, (6, 7): 1, (7, 6): 1}
    )
    # Unigrams by hand: <s> 4, </s> 4, press 4, start 3, stop 3, reset 1.
    assert as_counter(counts, 1) == Counter({(1,): 4, (2,): 4, (4,): 4, (5,): 3, (6,): 3, (7,): 1})


def test_rows_are_sorted_lexicographically():
    counts = count_ngrams(as_segment_array(random_segments(3, 50, 12, 7)), 4)
    for k in range(1, 5):
        rows = counts.ngrams[k - 1].tolist()
        assert rows == sorted(rows)  # Python's tuple/list order is the lexicographic order we promise
        assert len(set(map(tuple, rows))) == len(rows)


@pytest.mark.parametrize("seed", range(5))
def test_counts_match_counter_reference(seed):
    segments = random_segments(seed, 40, 10, 9) + [[]]  # an empty segment still yields <s> </s>
    counts = count_ngrams(as_segment_array(segments), 5)
    for k in range(1, 6):
        assert as_counter(counts, k) == reference_counts(segments, k)


def test_empty_corpus_has_no_ngrams():
    counts = count_ngrams(SegmentArray.from_sequences([]), 3)
    assert [counts.num_ngrams(k) for k in range(1, 4)] == [0, 0, 0]


@pytest.mark.parametrize("num_shards", [1, 2, 3, 7, 100])
def test_sharded_counts_equal_single_shard(num_shards):
    segments = as_segment_array(random_segments(11, 60, 15, 8))
    whole = count_ngrams(segments, 4)
    sharded = count_ngrams_sharded(segments, 4, SerialExecutor(), num_shards=num_shards)
    for k in range(4):
        np.testing.assert_array_equal(sharded.ngrams[k], whole.ngrams[k])
        np.testing.assert_array_equal(sharded.counts[k], whole.counts[k])


def test_merge_does_not_depend_on_shard_order():
    segments = as_segment_array(random_segments(12, 30, 9, 6))
    parts = [count_ngrams(segments.slice(start, stop), 3) for start, stop in segment_shard_bounds(segments, 4)]
    forward, backward = merge_counts(parts), merge_counts(parts[::-1])
    for k in range(3):
        np.testing.assert_array_equal(forward.ngrams[k], backward.ngrams[k])
        np.testing.assert_array_equal(forward.counts[k], backward.counts[k])


def test_process_pool_counts_equal_serial():
    segments = as_segment_array(random_segments(13, 80, 20, 8))
    with LocalProcessExecutor(2) as executor:
        pooled = count_ngrams_sharded(segments, 3, executor)
    whole = count_ngrams(segments, 3)
    for k in range(3):
        np.testing.assert_array_equal(pooled.counts[k], whole.counts[k])


def test_shard_bounds_cover_every_segment_once_without_empty_shards():
    segments = as_segment_array(random_segments(14, 23, 9, 12))
    bounds = segment_shard_bounds(segments, 5)
    assert bounds[0][0] == 0 and bounds[-1][1] == 23
    assert all(stop > start for start, stop in bounds)
    assert all(previous[1] == current[0] for previous, current in zip(bounds, bounds[1:]))
    # Balance: a cut lands within one segment of each ideal boundary, so every shard's padded token count is
    # within the longest padded segment of total / 5 (derivation: cuts are the first segment ends >= i/5 total).
    padded = segments.lengths + 2
    ideal = padded.sum() / 5
    assert all(abs(padded[start:stop].sum() - ideal) < padded.max() for start, stop in bounds)
    many = segment_shard_bounds(segments, 100)  # more shards than segments: still no empty shard
    assert many[0][0] == 0 and many[-1][1] == 23 and all(stop > start for start, stop in many)
