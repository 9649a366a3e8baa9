"""The reduce step of phrase counting: merge PhraseCounts by sorting and summing, spilling to disk when large.

Counting runs as a map over shards (``extraction.extract_shard``, in any executor) and a merge in the caller.
The merge never holds more than ``max_rows_in_memory`` counted rows from finished shards: past that, the rows
held are merged into one sorted run and written as .npy files to a temporary directory; the final merge reads
the runs back memory-mapped. Every merge gives the same result whatever the shard boundaries, because phrases
are compared by their exact padded token rows, never by shard-local ids.
"""

from __future__ import annotations

import math
import shutil
import tempfile
from collections.abc import Sequence
from dataclasses import fields
from pathlib import Path

import numpy as np

from decoder.align.links import AlignmentArray
from decoder.executor import Executor, SerialExecutor
from decoder.phrases.encoding import group_starts, lexicographic_order, unique_rows
from decoder.phrases.extraction import ORIENTATION_COLUMNS, PhraseCounts, check_alignments, extract_shard
from decoder.phrases.settings import PhraseSettings
from decoder.segment_arrays import ParallelArrays


def empty_counts(width: int) -> PhraseCounts:
    """PhraseCounts with no rows, phrases ``width`` tokens wide."""
    return PhraseCounts(
        source_phrases=np.zeros((0, width), dtype=np.int32),
        target_phrases=np.zeros((0, width), dtype=np.int32),
        pair_source=np.zeros(0, dtype=np.int32),
        pair_target=np.zeros(0, dtype=np.int32),
        alignment_masks=np.zeros(0, dtype=np.uint64),
        pair_counts=np.zeros(0, dtype=np.int64),
        orientation_counts=np.zeros((0, len(ORIENTATION_COLUMNS)), dtype=np.int64),
    )


def merge_counts(parts: Sequence[PhraseCounts]) -> PhraseCounts:
    """One PhraseCounts whose counts are the sums over ``parts`` (rows keyed by source, target, alignment)."""
    if not parts:
        raise ValueError("merge_counts needs at least one part")
    if len(parts) == 1:
        return parts[0]
    source_phrases, source_inverse = unique_rows(np.concatenate([part.source_phrases for part in parts]))
    target_phrases, target_inverse = unique_rows(np.concatenate([part.target_phrases for part in parts]))
    pair_source, pair_target = [], []
    source_base = target_base = 0
    for part in parts:
        pair_source.append(source_inverse[source_base + np.asarray(part.pair_source, dtype=np.int64)])
        pair_target.append(target_inverse[target_base + np.asarray(part.pair_target, dtype=np.int64)])
        source_base += len(part.source_phrases)
        target_base += len(part.target_phrases)
    sources, targets = np.concatenate(pair_source), np.concatenate(pair_target)
    masks = np.concatenate([part.alignment_masks for part in parts])
    # One int64 key for (source, target) saves a sort pass; it fits for any table below 2**31 phrases a side.
    pair_key = sources * len(target_phrases) + targets
    order = lexicographic_order([pair_key, masks])
    starts = group_starts([pair_key[order], masks[order]])
    first = np.flatnonzero(starts)
    pair_counts = (
        np.add.reduceat(np.concatenate([part.pair_counts for part in parts])[order], first)
        if len(first)
        else np.zeros(0, dtype=np.int64)
    )
    orientation = np.concatenate([part.orientation_counts for part in parts])[order]
    orientation_counts = np.add.reduceat(orientation, first, axis=0) if len(first) else orientation[:0]
    return PhraseCounts(
        source_phrases=source_phrases,
        target_phrases=target_phrases,
        pair_source=sources[order][first].astype(np.int32),
        pair_target=targets[order][first].astype(np.int32),
        alignment_masks=masks[order][first],
        pair_counts=pair_counts.astype(np.int64),
        orientation_counts=orientation_counts.astype(np.int64),
    )


def save_counts(counts: PhraseCounts, directory: str | Path) -> None:
    """Write each array of ``counts`` to ``directory/<field>.npy`` (directory created if needed)."""
    directory = Path(directory)
    directory.mkdir(parents=True, exist_ok=True)
    for field in fields(PhraseCounts):
        np.save(directory / f"{field.name}.npy", getattr(counts, field.name))


def load_counts(directory: str | Path, mmap: bool = True) -> PhraseCounts:
    """Read what ``save_counts`` wrote; memory-mapped read-only by default."""
    directory = Path(directory)
    mode = "r" if mmap else None
    return PhraseCounts(
        **{
            field.name: np.load(directory / f"{field.name}.npy", mmap_mode=mode)
            for field in fields(PhraseCounts)
        }
    )


class CountAccumulator:
    """Collects PhraseCounts of finished shards; spills merged sorted runs once too many rows are held.

    Use as a context manager so that the temporary spill directory is removed even on error."""

    def __init__(self, width: int, max_rows_in_memory: int, spill_dir: str | Path | None = None) -> None:
        self.width = width
        self.max_rows_in_memory = max_rows_in_memory
        self._spill_parent = spill_dir
        self._spill_root: Path | None = None
        self._held: list[PhraseCounts] = []
        self._held_rows = 0
        self.num_spills = 0

    def add(self, counts: PhraseCounts) -> None:
        self._held.append(counts)
        self._held_rows += len(counts)
        if self._held_rows > self.max_rows_in_memory:
            self._spill()

    def _spill(self) -> None:
        if self._spill_root is None:
            self._spill_root = Path(tempfile.mkdtemp(prefix="phrase-counts-", dir=self._spill_parent))
        save_counts(merge_counts(self._held), self._spill_root / f"run-{self.num_spills:05d}")
        self.num_spills += 1
        self._held, self._held_rows = [], 0

    def result(self) -> PhraseCounts:
        """The merge of everything added so far, spilled runs included, as arrays in memory."""
        runs = [load_counts(self._spill_root / f"run-{index:05d}") for index in range(self.num_spills)]
        parts = runs + self._held
        if not parts:
            return empty_counts(self.width)
        merged = merge_counts(parts)
        # A single spilled run comes back memory-mapped; copy so the result outlives the temporary directory.
        return PhraseCounts(
            **{field.name: np.array(getattr(merged, field.name)) for field in fields(PhraseCounts)}
        )

    def close(self) -> None:
        if self._spill_root is not None:
            shutil.rmtree(self._spill_root, ignore_errors=True)
            self._spill_root = None

    def __enter__(self) -> CountAccumulator:
        return self

    def __exit__(self, *exc_info: object) -> None:
        self.close()


def slice_alignments(alignments: AlignmentArray, start: int, stop: int) -> AlignmentArray:
    """Alignments of segments start..stop-1 with offsets rebased to 0 (links are a view)."""
    first, last = alignments.offsets[start], alignments.offsets[stop]
    return AlignmentArray(alignments.links[first:last], alignments.offsets[start : stop + 1] - first)


def _extract_task(task: tuple[ParallelArrays, AlignmentArray, PhraseSettings]) -> PhraseCounts:
    return extract_shard(*task)


def count_phrase_pairs(
    corpus: ParallelArrays,
    alignments: AlignmentArray,
    settings: PhraseSettings,
    executor: Executor | None = None,
) -> tuple[PhraseCounts, int]:
    """(counts of all phrase pairs of the corpus, number of spilled runs): map over shards, then merge.

    Shards are handed to the executor a batch of ``num_workers`` at a time, so finished results are merged
    (and spilled) while the corpus is still being processed."""
    check_alignments(corpus, alignments)
    executor = executor if executor is not None else SerialExecutor()
    num_shards = max(1, math.ceil(len(corpus) / settings.segments_per_shard))
    tasks = [
        (corpus.slice(start, stop), slice_alignments(alignments, start, stop), settings)
        for start, stop in corpus.shard_bounds(num_shards)
    ]
    batch = max(1, executor.num_workers)
    with CountAccumulator(
        settings.max_phrase_length, settings.max_rows_in_memory, settings.spill_dir
    ) as sums:
        for first in range(0, len(tasks), batch):
            for counts in executor.map(_extract_task, tasks[first : first + batch]):
                sums.add(counts)
        return sums.result(), sums.num_spills
