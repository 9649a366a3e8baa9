"""The work folder of one alignment direction: shard layouts on disk, the table's keys, and the EM map step.

Building it is itself map + reduce: each shard lists the word pairs it contains (map), the sorted union of
those lists is the lexical table's key set (reduce), then each shard writes its cells (map). An E-step job names
files only (shard cells, current probabilities), so it can run in any process, or on any machine that sees the
folder.
"""

from __future__ import annotations

import shutil
import tempfile
from collections.abc import Callable
from dataclasses import dataclass
from pathlib import Path
from typing import TypeVar

import numpy as np
import numpy.typing as npt

from decoder.align.layout import ShardLayout, build_layout, cooccurring_keys
from decoder.align.lexical_table import LexicalTable
from decoder.executor import Executor, SerialExecutor
from decoder.segment_arrays import ParallelArrays, unique_sorted

Result = TypeVar("Result")
# Bounds one E-step job's memory: 4 bytes of cell and 8 of posterior per cell, i.e. about 190 MB per shard.
MAX_CELLS_PER_SHARD = 16_000_000


@dataclass(frozen=True, slots=True)
class _KeysJob:
    corpus: ParallelArrays
    num_target_words: int
    num_null: int


@dataclass(frozen=True, slots=True)
class _LayoutJob:
    corpus: ParallelArrays
    keys_path: str
    num_target_words: int
    num_null: int
    cells_path: str


def _shard_keys(job: _KeysJob) -> npt.NDArray[np.int64]:
    return cooccurring_keys(job.corpus, job.num_target_words, job.num_null)


def _shard_layout(job: _LayoutJob) -> ShardLayout:
    keys = np.load(job.keys_path, mmap_mode="r")
    return build_layout(job.corpus, keys, job.num_target_words, job.num_null, Path(job.cells_path))


@dataclass(frozen=True, slots=True)
class ShardJob:
    """What an E-step or Viterbi job gets: its shard's layout and the file of current model parameters."""

    layout: ShardLayout
    parameters_path: str
    settings: object = None  # small picklable extras, e.g. the HMM's jump distribution


class CellWorkspace:
    """Layouts of all shards of one direction, plus the lexical table's sorted keys.

    ``include_null`` adds the NULL source word (Brown et al. 1993). Use as a context manager, or call
    ``close()``, to remove the folder."""

    def __init__(
        self, corpus: ParallelArrays, num_source_words: int, num_target_words: int, *,
        executor: Executor | None = None, include_null: bool = True, parent_dir: str | Path | None = None,
        num_shards: int | None = None,
    ) -> None:
        self.executor: Executor = executor or SerialExecutor()
        self.num_source_words = num_source_words
        self.num_target_words = num_target_words
        self.num_null = 1 if include_null else 0
        self.num_pairs = len(corpus)
        self.directory = Path(tempfile.mkdtemp(prefix="phrasework-align-", dir=parent_dir))
        self._version = 0
        self._merged_rows: npt.NDArray[np.int32] | None = None
        if num_shards is None:
            workers = self.executor.num_workers
            total_cells = int(((corpus.source.lengths + self.num_null) * corpus.target.lengths).sum())
            num_shards = max(1 if workers == 1 else 2 * workers, -(-total_cells // MAX_CELLS_PER_SHARD))
        bounds = corpus.shard_bounds(num_shards)
        self.shard_bounds = bounds
        shards = [corpus.slice(start, stop) for start, stop in bounds]
        key_lists = self.executor.map(_shard_keys, [_KeysJob(s, num_target_words, self.num_null) for s in shards])
        self.table_keys = unique_sorted(np.concatenate(key_lists)) if key_lists else np.zeros(0, np.int64)
        keys_path = self.write_array("table_keys", self.table_keys)
        jobs = [_LayoutJob(shard, keys_path, num_target_words, self.num_null, str(self.directory / f"cells-{k}.npy"))
                for k, shard in enumerate(shards)]
        self.layouts: list[ShardLayout] = self.executor.map(_shard_layout, jobs)

    @property
    def num_cells(self) -> int:
        return sum(layout.num_cells for layout in self.layouts)

    @property
    def source_of_key(self) -> npt.NDArray[np.int64]:
        return self.table_keys // self.num_target_words

    def write_array(self, name: str, array: npt.NDArray) -> str:
        """Save ``array`` under a fresh file name (never overwriting one a running job may still read)."""
        self._version += 1
        path = self.directory / f"{name}-{self._version}.npy"
        np.save(path, array)
        return str(path)

    def jobs(self, parameters_path: str, settings: object = None) -> list[ShardJob]:
        return [ShardJob(layout, parameters_path, settings) for layout in self.layouts]

    def map_shards(
        self, function: Callable[[ShardJob], Result], parameters_path: str, settings: object = None,
    ) -> list[Result]:
        return self.executor.map(function, self.jobs(parameters_path, settings))

    def merge_counts(self, results: list) -> npt.NDArray[np.float64]:
        """The reduce step of an E-step: per-shard counts over local rows (``results[k].counts``, shards in order)
        summed into one array over the table's rows."""
        if self._merged_rows is None:  # the same every iteration: read the shards' maps once
            self._merged_rows = np.concatenate([layout.load_table_rows() for layout in self.layouts])
        counts = np.concatenate([result.counts for result in results])
        return np.bincount(self._merged_rows, weights=counts, minlength=len(self.table_keys))

    def normalise_by_source(self, counts: npt.NDArray[np.float64]) -> npt.NDArray[np.float64]:
        """M-step of the lexical table: t(target | source) = count(source, target) / count(source)."""
        source = self.source_of_key
        totals = np.bincount(source, weights=counts, minlength=self.num_source_words)
        return counts / np.maximum(totals[source], np.finfo(np.float64).tiny)

    def uniform_probabilities(self) -> npt.NDArray[np.float64]:
        """Any constant start gives the same first E-step; 1 / V_target is the textbook choice."""
        return np.full(len(self.table_keys), 1.0 / max(self.num_target_words, 1))

    def lexical_table(self, probabilities: npt.NDArray[np.float64]) -> LexicalTable:
        return LexicalTable(self.num_source_words, self.num_target_words, self.table_keys.copy(),
                            np.asarray(probabilities, dtype=np.float64).copy())

    def close(self) -> None:
        shutil.rmtree(self.directory, ignore_errors=True)

    def __enter__(self) -> CellWorkspace:
        return self

    def __exit__(self, *exc_info: object) -> None:
        self.close()
