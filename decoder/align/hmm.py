"""HMM word alignment (Vogel, Ney & Tillmann 1996, "HMM-based word alignment in statistical translation") with
the empty-word extension of Och & Ney (2003, "A systematic comparison of various statistical alignment
models", section 2.1.1), trained by EM with forward-backward in numpy.

Hidden states for a source sentence of length I are the I source positions plus I NULL states; NULL state I + i
"remembers" position i so the next jump is measured from there. Transitions:

    word or NULL at i'  -> word i       (1 - p0) * p(i - i' | I)
    word or NULL at i'  -> NULL at i'   p0

with p(d | I) = c(d) / sum_{i''} c(i'' - i') a jump-width distribution shared by all sentence lengths, and the
first target word jumping from a virtual position -1 (the same jump table). p0 is fixed (0.2 by default, common
practice). Emissions are t(e_j | f_i) for word states and t(e_j | NULL) for NULL states. The model starts from
IBM Model 1's lexical table and a flat jump table.

All pairs of one shape (I, J) share one transition matrix, so forward-backward runs for a whole bucket at once:
J small matrix products of shape (B, 2I) x (2I, 2I), with per-step scaling (Rabiner 1989) against underflow.
"""

from __future__ import annotations

import functools
import time
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt
from threadpoolctl import threadpool_limits
from tqdm.auto import tqdm

from decoder.align.ibm1 import (
    ExpectedCounts,
    IterationReport,
    TrainingHistory,
    alignment_array_of,
    concatenate_alignments,
)
from decoder.align.links import AlignmentArray
from decoder.align.workspace import CellWorkspace, ShardJob

MAX_JUMP = 100           # jumps further than this share the last bucket
JUMP_SMOOTHING = 0.1     # added to every jump count before normalising (add-delta smoothing)
NUM_JUMPS = 2 * MAX_JUMP + 1
LOG_FLOOR = 1e-300       # stand-in for zero inside logarithms (Viterbi)


@dataclass(frozen=True, slots=True)
class HmmParameters:
    """The small part of the model that travels with every job (the lexical table goes through a file)."""

    jump_weights: npt.NDArray[np.float64]  # unnormalised c(d) + smoothing, index d + MAX_JUMP
    null_probability: float


@dataclass(frozen=True, slots=True)
class HmmExpectedCounts(ExpectedCounts):
    jump_counts: npt.NDArray[np.float64]


def _jump_index(distance: npt.NDArray[np.int64]) -> npt.NDArray[np.int64]:
    return np.clip(distance, -MAX_JUMP, MAX_JUMP) + MAX_JUMP


def transition_model(source_length: int, parameters: HmmParameters) -> tuple[npt.NDArray[np.float64],
                                                                             npt.NDArray[np.float64]]:
    """(initial distribution over 2I states, 2I x 2I transition matrix) for a source sentence of length I."""
    size, p0 = source_length, parameters.null_probability
    positions = np.arange(size)
    jumps = parameters.jump_weights[_jump_index(positions[None, :] - positions[:, None])]
    jumps /= jumps.sum(axis=1, keepdims=True)
    transitions = np.zeros((2 * size, 2 * size))
    transitions[:size, :size] = (1.0 - p0) * jumps
    transitions[size:, :size] = (1.0 - p0) * jumps
    transitions[positions, size + positions] = p0
    transitions[size + positions, size + positions] = p0
    start = parameters.jump_weights[_jump_index(positions + 1)]
    start = start / start.sum()
    initial = np.concatenate([(1.0 - p0) * start, p0 * start])
    return initial, transitions


def _emissions(probabilities: npt.NDArray[np.float64], bucket_cells: npt.NDArray[np.int32]) -> npt.NDArray[np.float64]:
    """(J, B, 2I) emission probabilities, position-major so that each step reads one contiguous block: word
    states from cell columns 1.., every NULL state from column 0."""
    values = probabilities.take(np.ascontiguousarray(bucket_cells.transpose(1, 0, 2)))
    size = values.shape[2] - 1
    emissions = np.empty(values.shape[:2] + (2 * size,))
    emissions[:, :, :size] = values[:, :, 1:]
    emissions[:, :, size:] = values[:, :, :1]
    return emissions


@functools.lru_cache(maxsize=256)
def _jump_index_matrix(source_length: int) -> npt.NDArray[np.int64]:
    """Jump-table index for every (from state, to word state) pair: d = i - position(from)."""
    from_positions = np.tile(np.arange(source_length), 2)
    return _jump_index(np.arange(source_length)[None, :] - from_positions[:, None])


def hmm_expected_counts(job: ShardJob) -> HmmExpectedCounts:
    """E-step over one shard: expected emission counts per local row, expected jump counts, log-likelihood.

    The matrices are small (2I x 2I): BLAS threads only add synchronisation, so they are limited to one (3x
    faster measured on 2 cores); parallelism comes from running shards in separate processes."""
    with threadpool_limits(limits=1, user_api="blas"):
        return _hmm_expected_counts(job)


def _hmm_expected_counts(job: ShardJob) -> HmmExpectedCounts:
    layout, parameters = job.layout, job.settings
    assert isinstance(parameters, HmmParameters) and layout.num_null == 1
    probabilities = layout.local_parameters(job.parameters_path)  # gathered from at random: keep it in memory
    cells = layout.load_cells()
    posteriors = np.empty(layout.num_cells, dtype=np.float64)
    jump_counts = np.zeros(NUM_JUMPS)
    log_likelihood, num_tokens = 0.0, 0
    for bucket in layout.buckets:
        size, length = bucket.source_length, bucket.target_length
        initial, transitions = transition_model(size, parameters)
        emissions = _emissions(probabilities, layout.bucket_cells(cells, bucket))  # (J, B, 2I)
        forward = np.empty_like(emissions)
        scales = np.empty(emissions.shape[:2])
        np.multiply(initial, emissions[0], out=forward[0])
        for position in range(length):
            if position:
                np.matmul(forward[position - 1], transitions, out=forward[position])
                forward[position] *= emissions[position]
            scales[position] = forward[position].sum(axis=1)
            forward[position] /= scales[position, :, None]
        # scaled_next[j] = e_j * beta_j / c_j: what both the backward step and the expected transitions use
        scaled_next = np.empty_like(emissions)
        backward = np.empty_like(emissions)
        backward[length - 1] = 1.0
        for position in range(length - 1, 0, -1):
            np.multiply(emissions[position], backward[position], out=scaled_next[position])
            scaled_next[position] /= scales[position, :, None]
            np.matmul(scaled_next[position], transitions.T, out=backward[position - 1])
        state_posteriors = forward * backward  # (J, B, 2I), each row sums to 1
        cell_posteriors = np.empty(emissions.shape[:2] + (size + 1,))
        cell_posteriors[:, :, 0] = state_posteriors[:, :, size:].sum(axis=2)
        cell_posteriors[:, :, 1:] = state_posteriors[:, :, :size]
        out = posteriors[bucket.start:bucket.start + cell_posteriors.size].reshape(
            bucket.num_pairs, length, size + 1)
        out[...] = cell_posteriors.transpose(1, 0, 2)
        if length > 1:
            previous = forward[:-1].reshape(-1, 2 * size)
            following = scaled_next[1:].reshape(-1, 2 * size)
            pair_flows = (previous.T @ following) * transitions  # expected transitions, summed over the bucket
            jump_counts += np.bincount(_jump_index_matrix(size).ravel(), weights=pair_flows[:, :size].ravel(),
                                       minlength=NUM_JUMPS)
        start_flows = state_posteriors[0, :, :size].sum(axis=0)
        jump_counts += np.bincount(_jump_index(np.arange(size) + 1), weights=start_flows, minlength=NUM_JUMPS)
        log_likelihood += float(np.log(scales).sum())
        num_tokens += scales.size
    counts = np.bincount(cells, weights=posteriors, minlength=len(probabilities))
    return HmmExpectedCounts(counts, log_likelihood, num_tokens, jump_counts)


def hmm_viterbi(job: ShardJob) -> AlignmentArray:
    """Most probable state sequence per pair; target words in NULL states stay unaligned. Links (source, target)."""
    with threadpool_limits(limits=1, user_api="blas"):
        return _hmm_viterbi(job)


def _hmm_viterbi(job: ShardJob) -> AlignmentArray:
    layout, parameters = job.layout, job.settings
    assert isinstance(parameters, HmmParameters)
    probabilities = layout.local_parameters(job.parameters_path)
    cells = layout.load_cells()
    per_pair: list[npt.NDArray[np.int32]] = [np.zeros((0, 2), np.int32)] * layout.num_pairs
    for bucket in layout.buckets:
        size, length = bucket.source_length, bucket.target_length
        initial, transitions = transition_model(size, parameters)
        log_transitions = np.log(np.maximum(transitions, LOG_FLOOR))
        log_emissions = np.log(np.maximum(_emissions(probabilities, layout.bucket_cells(cells, bucket)), LOG_FLOOR))
        num_pairs = log_emissions.shape[1]
        back_pointers = np.zeros((num_pairs, length, 2 * size), dtype=np.int32)
        best = np.log(np.maximum(initial, LOG_FLOOR))[None, :] + log_emissions[0]
        for position in range(1, length):
            scores = best[:, :, None] + log_transitions[None, :, :]
            back_pointers[:, position] = scores.argmax(axis=1)
            best = scores.max(axis=1) + log_emissions[position]
        states = np.empty((num_pairs, length), dtype=np.int64)
        states[:, -1] = best.argmax(axis=1)
        rows = np.arange(num_pairs)
        for position in range(length - 1, 0, -1):
            states[:, position - 1] = back_pointers[rows, position, states[:, position]]
        for row, pair in enumerate(bucket.pair_indices):
            target_positions = np.flatnonzero(states[row] < size)
            per_pair[pair] = np.stack([states[row][target_positions], target_positions], axis=1).astype(np.int32)
    return alignment_array_of(per_pair)


@dataclass(frozen=True, slots=True)
class HmmTrainer:
    """EM for the HMM alignment model, started from a Model 1 lexical table inside the same workspace."""

    num_iterations: int = 5
    null_probability: float = 0.2
    show_progress: bool = False

    def initial_parameters(self) -> HmmParameters:
        return HmmParameters(np.ones(NUM_JUMPS), self.null_probability)

    def fit_in(
        self, workspace: CellWorkspace, probabilities: npt.NDArray[np.float64], label: str = "HMM",
    ) -> tuple[npt.NDArray[np.float64], HmmParameters, TrainingHistory]:
        if workspace.num_null != 1:
            raise ValueError("the HMM needs a workspace with the NULL word")
        parameters = self.initial_parameters()
        history = TrainingHistory(label)
        progress = tqdm(range(1, self.num_iterations + 1), desc=label, unit="it", disable=not self.show_progress,
                        leave=False)
        for iteration in progress:
            started = time.perf_counter()
            parameters_path = workspace.write_array("hmm-t", probabilities)
            results = workspace.map_shards(hmm_expected_counts, parameters_path, parameters)
            probabilities = workspace.normalise_by_source(workspace.merge_counts(results))
            jump_counts = np.sum([result.jump_counts for result in results], axis=0)
            parameters = HmmParameters(jump_counts + JUMP_SMOOTHING, self.null_probability)
            report = IterationReport.of(iteration, results, time.perf_counter() - started)
            history.iterations.append(report)
            progress.set_postfix(perplexity=f"{report.perplexity:.2f}")
        return probabilities, parameters, history

    @staticmethod
    def viterbi(
        workspace: CellWorkspace, probabilities: npt.NDArray[np.float64], parameters: HmmParameters,
    ) -> AlignmentArray:
        parameters_path = workspace.write_array("hmm-t", probabilities)
        return concatenate_alignments(workspace.map_shards(hmm_viterbi, parameters_path, parameters))
