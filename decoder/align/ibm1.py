"""IBM Model 1 (Brown, Della Pietra, Della Pietra & Mercer 1993, "The mathematics of statistical machine
translation: parameter estimation", section 4.1), trained by EM over integer-id arrays.

p(target | source) = epsilon / (I + 1)^J * prod_j sum_i t(target_j | source_i), with source_0 the NULL word.
The E-step posterior of cell (i, j) is t(e_j | f_i) / sum_i' t(e_j | f_i'); expected counts are summed per table
key and the M-step divides by the per-source total. No Python loop runs over word pairs: the E-step is one
compiled pass over the shard's cells (``decoder.align.kernels``), and ``model1_expected_counts_reference`` is the
same computation as dense numpy operations over the per-shape buckets of ``decoder.align.layout``, kept as the
reference that tests compare the kernel with.
"""

from __future__ import annotations

import time
from dataclasses import dataclass, field

import numpy as np
import numpy.typing as npt
from tqdm.auto import tqdm

from decoder.align.kernels import model1_counts
from decoder.align.lexical_table import LexicalTable
from decoder.align.links import AlignmentArray
from decoder.align.workspace import CellWorkspace, ShardJob
from decoder.executor import Executor
from decoder.segment_arrays import ParallelArrays


@dataclass(frozen=True, slots=True)
class ExpectedCounts:
    """The map result of one E-step over one shard."""

    counts: npt.NDArray[np.float64]  # per local row of the shard (see ``CellWorkspace.merge_counts``)
    log_likelihood: float            # natural log, without the constant epsilon
    num_target_tokens: int


def model1_expected_counts(job: ShardJob) -> ExpectedCounts:
    """E-step of Model 1 over one shard: expected link counts per local row and the shard's log-likelihood."""
    layout = job.layout
    probabilities = np.asarray(np.load(job.parameters_path, mmap_mode="r"))
    runs = layout.width_runs()
    counts, log_likelihood = model1_counts(layout.load_cells(), runs, probabilities, layout.load_table_rows())
    num_tokens = sum(rows for _, _, rows in runs)
    return ExpectedCounts(counts, log_likelihood, num_tokens)


def model1_expected_counts_reference(job: ShardJob) -> ExpectedCounts:
    """``model1_expected_counts`` in plain numpy: gather, row sums and division per run, one ``np.bincount``."""
    layout = job.layout
    probabilities = layout.local_parameters(job.parameters_path)
    cells = layout.load_cells()
    posteriors = np.empty(layout.num_cells, dtype=np.float64)
    log_likelihood, num_tokens = 0.0, 0
    for width, start, rows in layout.width_runs():
        run_cells = cells[start:start + rows * width].reshape(rows, width)
        values = probabilities.take(run_cells)
        totals = values.sum(axis=1)
        np.divide(values, totals[:, None], out=posteriors[start:start + values.size].reshape(values.shape))
        # log p(e | f) = sum_j log sum_i t(e_j | f_i) - J log(I + 1)
        log_likelihood += float(np.log(totals).sum()) - rows * np.log(width)
        num_tokens += rows
    counts = np.bincount(cells, weights=posteriors, minlength=len(probabilities))
    return ExpectedCounts(counts, log_likelihood, num_tokens)


def model1_viterbi(job: ShardJob) -> AlignmentArray:
    """Most probable source word for each target word; a target word whose best source is NULL stays unaligned.

    Links are (source position, target position), pairs in shard order."""
    layout = job.layout
    probabilities = layout.local_parameters(job.parameters_path)
    cells = layout.load_cells()
    per_pair: list[npt.NDArray[np.int32]] = [np.zeros((0, 2), np.int32)] * layout.num_pairs
    for bucket in layout.buckets:
        best = probabilities[layout.bucket_cells(cells, bucket)].argmax(axis=2) - layout.num_null  # (B, J)
        target_positions = np.broadcast_to(np.arange(bucket.target_length), best.shape)
        for row, pair in enumerate(bucket.pair_indices):
            aligned = best[row] >= 0
            per_pair[pair] = np.stack([best[row][aligned], target_positions[row][aligned]], axis=1).astype(np.int32)
    return alignment_array_of(per_pair)


def alignment_array_of(per_pair: list[npt.NDArray[np.int32]]) -> AlignmentArray:
    """Pack per-pair (n, 2) link arrays, each sorted by (source, target), into one AlignmentArray."""
    offsets = np.zeros(len(per_pair) + 1, dtype=np.int64)
    np.cumsum([len(links) for links in per_pair], out=offsets[1:])
    ordered = [links[np.lexsort((links[:, 1], links[:, 0]))] for links in per_pair]
    flat = np.concatenate(ordered).astype(np.int32) if ordered else np.zeros((0, 2), np.int32)
    return AlignmentArray(flat.reshape(-1, 2), offsets)


def concatenate_alignments(parts: list[AlignmentArray]) -> AlignmentArray:
    """Join the shard results of a corpus back into one AlignmentArray (shards are contiguous, in order)."""
    if not parts:
        return AlignmentArray(np.zeros((0, 2), np.int32), np.zeros(1, np.int64))
    links = np.concatenate([part.links for part in parts])
    offsets = [np.zeros(1, np.int64)]
    base = 0
    for part in parts:
        offsets.append(part.offsets[1:] + base)
        base += int(part.offsets[-1])
    return AlignmentArray(links.reshape(-1, 2), np.concatenate(offsets))


@dataclass(frozen=True, slots=True)
class IterationReport:
    iteration: int
    log_likelihood: float
    perplexity: float  # exp(-log_likelihood / target tokens): per-word perplexity of the target side
    seconds: float

    @classmethod
    def of(cls, iteration: int, results: list[ExpectedCounts], seconds: float) -> IterationReport:
        """The report of one EM iteration from its shards' E-step results."""
        log_likelihood = sum(result.log_likelihood for result in results)
        tokens = max(sum(result.num_target_tokens for result in results), 1)
        return cls(iteration, log_likelihood, float(np.exp(-log_likelihood / tokens)), seconds)


@dataclass(slots=True)
class TrainingHistory:
    stage: str
    iterations: list[IterationReport] = field(default_factory=list)


@dataclass(frozen=True, slots=True)
class Ibm1Trainer:
    """EM for IBM Model 1 from a uniform start.

    ``fit`` returns the lexical table t(target | source); ``fit_in`` trains inside an existing workspace (which the
    HMM then reuses) and also returns the raw probabilities aligned with the workspace's keys."""

    num_iterations: int = 5
    include_null: bool = True
    show_progress: bool = False

    def fit(
        self, corpus: ParallelArrays, num_source_words: int | None = None, num_target_words: int | None = None,
        executor: Executor | None = None,
    ) -> LexicalTable:
        num_source_words = num_source_words or int(corpus.source.ids.max(initial=3)) + 1
        num_target_words = num_target_words or int(corpus.target.ids.max(initial=3)) + 1
        with CellWorkspace(corpus, num_source_words, num_target_words, executor=executor,
                           include_null=self.include_null) as workspace:
            probabilities, _ = self.fit_in(workspace)
            return workspace.lexical_table(probabilities)

    def fit_in(
        self, workspace: CellWorkspace, label: str = "Model 1",
    ) -> tuple[npt.NDArray[np.float64], TrainingHistory]:
        probabilities = workspace.uniform_probabilities()
        history = TrainingHistory(label)
        progress = tqdm(range(1, self.num_iterations + 1), desc=label, unit="it", disable=not self.show_progress,
                        leave=False)
        for iteration in progress:
            started = time.perf_counter()
            parameters_path = workspace.write_array("model1-t", probabilities)
            results = workspace.map_shards(model1_expected_counts, parameters_path)
            probabilities = workspace.normalise_by_source(workspace.merge_counts(results))
            report = IterationReport.of(iteration, results, time.perf_counter() - started)
            history.iterations.append(report)
            progress.set_postfix(perplexity=f"{report.perplexity:.2f}")
        return probabilities, history

    @staticmethod
    def viterbi(workspace: CellWorkspace, probabilities: npt.NDArray[np.float64]) -> AlignmentArray:
        parameters_path = workspace.write_array("model1-t", probabilities)
        return concatenate_alignments(workspace.map_shards(model1_viterbi, parameters_path))

