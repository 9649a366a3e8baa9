"""Ragged arrays of token ids: many segments in one flat int32 array plus int64 offsets.

This is the in-memory (and on-disk) form of a tokenized corpus for every training stage. Segment k is
``ids[offsets[k]:offsets[k + 1]]``; a shard is a contiguous range of segments and shares memory with its parent.
"""

from __future__ import annotations

from collections.abc import Iterable, Iterator, Sequence
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt


def unique_sorted(values: npt.ArrayLike) -> npt.NDArray:
    """Sorted distinct values of a 1-D array. Same result as ``np.unique(values)``, which in numpy 2.x hashes
    instead of sorting and is far slower on large integer arrays."""
    ordered = np.sort(np.asarray(values).ravel())
    if len(ordered) == 0:
        return ordered
    keep = np.empty(len(ordered), dtype=bool)
    keep[0] = True
    np.not_equal(ordered[1:], ordered[:-1], out=keep[1:])
    return ordered[keep]


@dataclass(frozen=True, slots=True)
class SegmentArray:
    """Token ids of many segments. Invariant: offsets[0] == 0, offsets non-decreasing, offsets[-1] == len(ids)."""

    ids: npt.NDArray[np.int32]
    offsets: npt.NDArray[np.int64]

    @classmethod
    def from_sequences(cls, sequences: Iterable[Sequence[int] | npt.NDArray[np.integer]]) -> SegmentArray:
        parts = [np.asarray(sequence, dtype=np.int32) for sequence in sequences]
        offsets = np.zeros(len(parts) + 1, dtype=np.int64)
        if parts:
            np.cumsum([len(part) for part in parts], out=offsets[1:])
        ids = np.concatenate(parts) if parts else np.zeros(0, dtype=np.int32)
        return cls(ids.astype(np.int32, copy=False), offsets)

    def __len__(self) -> int:
        return len(self.offsets) - 1

    def __getitem__(self, index: int) -> npt.NDArray[np.int32]:
        return self.ids[self.offsets[index]:self.offsets[index + 1]]

    def __iter__(self) -> Iterator[npt.NDArray[np.int32]]:
        for index in range(len(self)):
            yield self[index]

    @property
    def lengths(self) -> npt.NDArray[np.int64]:
        return np.diff(self.offsets)

    def slice(self, start: int, stop: int) -> SegmentArray:
        """Segments start..stop-1, with offsets rebased to 0 (ids are a view, not a copy)."""
        first, last = self.offsets[start], self.offsets[stop]
        return SegmentArray(self.ids[first:last], self.offsets[start:stop + 1] - first)

    def segment_of_position(self) -> npt.NDArray[np.int64]:
        """For each position in ``ids``, the index of the segment it belongs to."""
        return np.repeat(np.arange(len(self), dtype=np.int64), self.lengths)

    def position_in_segment(self) -> npt.NDArray[np.int64]:
        """For each position in ``ids``, its 0-based index inside its segment."""
        return np.arange(len(self.ids), dtype=np.int64) - np.repeat(self.offsets[:-1], self.lengths)


@dataclass(frozen=True, slots=True)
class ParallelArrays:
    """Line-aligned source and target segments (same number of segments on both sides)."""

    source: SegmentArray
    target: SegmentArray

    def __post_init__(self) -> None:
        if len(self.source) != len(self.target):
            raise ValueError(f"{len(self.source)} source segments but {len(self.target)} target segments")

    def __len__(self) -> int:
        return len(self.source)

    def slice(self, start: int, stop: int) -> ParallelArrays:
        return ParallelArrays(self.source.slice(start, stop), self.target.slice(start, stop))

    def reversed(self) -> ParallelArrays:
        """The same corpus with the roles of source and target swapped (for the other alignment direction)."""
        return ParallelArrays(self.target, self.source)

    def shard_bounds(self, num_shards: int) -> list[tuple[int, int]]:
        """Contiguous (start, stop) ranges of about equal token count; never an empty shard."""
        count = len(self)
        if count == 0:
            return []
        num_shards = max(1, min(num_shards, count))
        work = np.cumsum((self.source.lengths + 1) * (self.target.lengths + 1))
        cuts = np.searchsorted(work, work[-1] * np.arange(1, num_shards) / num_shards)
        bounds = np.unique(np.concatenate([[0], cuts, [count]]))
        return [(int(a), int(b)) for a, b in zip(bounds[:-1], bounds[1:], strict=True) if b > a]
