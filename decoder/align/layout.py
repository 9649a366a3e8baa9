"""Array layout shared by the IBM Model 1 and HMM E-steps: every (source word, target word) cell of a shard.

For alignment the *source* side is the conditioning side (it gets the NULL word) and the *target* side is the
generated one; the reverse direction simply swaps the two sides of the corpus.

Sentence pairs of a shard are grouped by their exact shape (source length I, target length J). A bucket of B pairs
of one shape holds the row numbers, in the lexical table, of all B * J * (I + N) cells, where N = 1 when the NULL
word is modelled (column 0) and 0 otherwise. With that layout an E-step is a few dense numpy operations per
bucket and one ``np.bincount`` per shard, and the HMM's forward-backward runs on whole buckets at once.

Cells hold *shard-local* row numbers: the shard's distinct table rows are numbered in the order in which they
first occur in its cell stream, and ``table_rows`` maps them back to rows of the lexical table. An E-step first
gathers the shard's part of the table (one read per distinct word pair), then works on that compact copy, whose
hot entries sit close together: the random reads that dominate the E-step hit the cache far more often (about
1.5x faster measured on the real corpus). Expected counts come back per local row and are merged by
``table_rows`` (the reduce step).

Memory: 4 bytes per cell, i.e. ``4 * J * (I + 1)`` bytes per sentence pair (about 1.3 KB for 16 x 20 tokens), plus 4
bytes per distinct word pair of the shard, kept in ``.npy`` files in a work folder and memory-mapped by whichever
worker runs the shard, so resident memory is bounded by what the operating system caches, not by corpus size.
"""

from __future__ import annotations

from dataclasses import dataclass
from pathlib import Path

import numpy as np
import numpy.typing as npt

from decoder.segment_arrays import ParallelArrays, SegmentArray, unique_sorted
from decoder.vocabulary import NULL_ID


@dataclass(frozen=True, slots=True)
class Bucket:
    """Pairs of one shape. Cells ``cells[start:start + B*J*C]`` reshape to (B, J, C) with C = I + num_null."""

    source_length: int
    target_length: int
    start: int
    pair_indices: npt.NDArray[np.int64]  # positions of the pairs in the shard

    @property
    def num_pairs(self) -> int:
        return len(self.pair_indices)


@dataclass(frozen=True, slots=True)
class ShardLayout:
    """One shard's cells and table rows on disk plus the bucket directory (small, picklable)."""

    cells_path: str
    table_rows_path: str
    num_cells: int
    num_pairs: int
    num_null: int
    buckets: tuple[Bucket, ...]

    def load_cells(self) -> npt.NDArray[np.int32]:
        """The cells (local row numbers), memory-mapped, as a plain ndarray view (slicing an np.memmap subclass
        costs far more)."""
        return np.asarray(np.load(self.cells_path, mmap_mode="r"))

    def load_table_rows(self) -> npt.NDArray[np.int32]:
        """Row of the lexical table of each local row."""
        return np.load(self.table_rows_path)

    def local_parameters(self, parameters_path: str) -> npt.NDArray[np.float64]:
        """The shard's part of a per-table-row parameter file, indexed by local row."""
        return np.load(parameters_path).take(self.load_table_rows())

    def width_runs(self) -> list[tuple[int, int, int]]:
        """(width, start, number of rows) of consecutive buckets with one source length: their cells form one
        (rows, width) matrix, since buckets are sorted by (I, J)."""
        runs: list[tuple[int, int, int]] = []
        for bucket in self.buckets:
            width = bucket.source_length + self.num_null
            rows = bucket.num_pairs * bucket.target_length
            if runs and runs[-1][0] == width and runs[-1][1] + runs[-1][2] * width == bucket.start:
                runs[-1] = (width, runs[-1][1], runs[-1][2] + rows)
            else:
                runs.append((width, bucket.start, rows))
        return runs

    def bucket_cells(self, cells: npt.NDArray[np.int32], bucket: Bucket) -> npt.NDArray[np.int32]:
        width = bucket.source_length + self.num_null
        size = bucket.num_pairs * bucket.target_length * width
        return cells[bucket.start:bucket.start + size].reshape(bucket.num_pairs, bucket.target_length, width)


def _padded_rows(segments: SegmentArray, pair_indices: npt.NDArray[np.int64], length: int) -> npt.NDArray[np.int64]:
    """(B, length) matrix of the ids of the given segments (all of that length)."""
    starts = segments.offsets[pair_indices]
    return segments.ids[starts[:, None] + np.arange(length)].astype(np.int64)


def _shape_groups(corpus: ParallelArrays) -> list[tuple[int, int, npt.NDArray[np.int64]]]:
    """(I, J, pair indices) for every shape present, pairs with an empty side left out."""
    source_lengths, target_lengths = corpus.source.lengths, corpus.target.lengths
    usable = np.flatnonzero((source_lengths > 0) & (target_lengths > 0))
    order = usable[np.lexsort((target_lengths[usable], source_lengths[usable]))]
    if len(order) == 0:
        return []
    shape_keys = source_lengths[order] * (1 << 20) + target_lengths[order]
    cuts = np.flatnonzero(np.diff(shape_keys)) + 1
    groups = []
    for members in np.split(order, cuts):
        groups.append((int(source_lengths[members[0]]), int(target_lengths[members[0]]), members))
    return groups


def bucket_keys(
    source_ids: npt.NDArray[np.int64], target_ids: npt.NDArray[np.int64], num_target_words: int, num_null: int,
) -> npt.NDArray[np.int64]:
    """Table keys ``source * V_target + target`` of one bucket, shape (B, J, I + num_null)."""
    if num_null:
        null_column = np.full((len(source_ids), 1), NULL_ID, dtype=np.int64)
        source_ids = np.concatenate([null_column, source_ids], axis=1)
    return source_ids[:, None, :] * num_target_words + target_ids[:, :, None]


def _iterate_bucket_keys(corpus: ParallelArrays, num_target_words: int, num_null: int):
    for source_length, target_length, members in _shape_groups(corpus):
        source_ids = _padded_rows(corpus.source, members, source_length)
        target_ids = _padded_rows(corpus.target, members, target_length)
        yield source_length, target_length, members, bucket_keys(source_ids, target_ids, num_target_words, num_null)


def cooccurring_keys(corpus: ParallelArrays, num_target_words: int, num_null: int) -> npt.NDArray[np.int64]:
    """Sorted unique table keys of every cell of the shard (the map step of building the table)."""
    parts = [unique_sorted(keys) for *_, keys in _iterate_bucket_keys(corpus, num_target_words, num_null)]
    return unique_sorted(np.concatenate(parts)) if parts else np.zeros(0, dtype=np.int64)


def first_occurrence_numbering(rows: npt.NDArray[np.int64]) -> tuple[npt.NDArray[np.int32], npt.NDArray[np.int32]]:
    """(local, distinct) with ``distinct[local] == rows``, the distinct values numbered by first occurrence."""
    distinct, first, inverse = np.unique(rows, return_index=True, return_inverse=True)
    order = np.argsort(first, kind="stable")
    rank = np.empty(len(distinct), dtype=np.int32)
    rank[order] = np.arange(len(distinct), dtype=np.int32)
    return rank[inverse.ravel()], distinct[order].astype(np.int32)


def build_layout(
    corpus: ParallelArrays, table_keys: npt.NDArray[np.int64], num_target_words: int, num_null: int, cells_path: Path,
) -> ShardLayout:
    """Look every cell of the shard up in the sorted ``table_keys``, number the rows locally and write the cells to
    ``cells_path`` and the local-to-table map beside it."""
    chunks, buckets, start = [], [], 0
    for source_length, target_length, members, keys in _iterate_bucket_keys(corpus, num_target_words, num_null):
        chunks.append(np.searchsorted(table_keys, keys.ravel()))
        buckets.append(Bucket(source_length, target_length, start, members))
        start += len(chunks[-1])
    rows = np.concatenate(chunks) if chunks else np.zeros(0, dtype=np.int64)
    cells, table_rows = first_occurrence_numbering(rows)
    table_rows_path = cells_path.with_name(cells_path.stem + "-rows.npy")
    np.save(cells_path, cells)
    np.save(table_rows_path, table_rows)
    return ShardLayout(str(cells_path), str(table_rows_path), len(cells), len(corpus), num_null, tuple(buckets))
