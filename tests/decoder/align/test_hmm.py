"""HMM alignment: forward-backward against brute-force enumeration of the model's definition, EM behaviour,
and Viterbi against exhaustive search."""

from __future__ import annotations

import itertools

import numpy as np
import pytest

from decoder.align.hmm import MAX_JUMP, HmmParameters, HmmTrainer, hmm_expected_counts, transition_model
from decoder.align.ibm1 import Ibm1Trainer
from decoder.align.workspace import CellWorkspace, ShardJob
from decoder.segment_arrays import ParallelArrays, SegmentArray
from decoder.vocabulary import NULL_ID

NUM_WORDS = 9


def one_pair_workspace(source, target):
    corpus = ParallelArrays(SegmentArray.from_sequences([source]), SegmentArray.from_sequences([target]))
    return CellWorkspace(corpus, NUM_WORDS, NUM_WORDS)


def random_parameters(generator):
    return HmmParameters(generator.uniform(0.1, 2.0, size=2 * MAX_JUMP + 1), null_probability=0.3)


def sequence_probability(sequence, target, source, table, initial, transitions):
    """p(e, a | f) for one state sequence, straight from the definition (states >= I are NULL states)."""
    size = len(source)
    def emission(state, word):
        return table[(source[state] if state < size else NULL_ID, word)]
    probability = initial[sequence[0]] * emission(sequence[0], target[0])
    for previous, state, word in zip(sequence, sequence[1:], target[1:]):
        probability *= transitions[previous, state] * emission(state, word)
    return probability


@pytest.mark.parametrize("seed", range(6))
def test_forward_backward_matches_brute_force_enumeration(seed):
    generator = np.random.default_rng(seed)
    source = list(generator.integers(4, NUM_WORDS, size=generator.integers(1, 4)))
    target = list(generator.integers(4, NUM_WORDS, size=generator.integers(1, 4)))
    parameters = random_parameters(generator)
    with one_pair_workspace(source, target) as workspace:
        probabilities = generator.uniform(0.05, 1.0, size=len(workspace.table_keys))
        path = workspace.write_array("t", probabilities)
        result = hmm_expected_counts(ShardJob(workspace.layouts[0], path, parameters))
        keys = workspace.table_keys
        counts = workspace.merge_counts([result])
    table = {(int(key // NUM_WORDS), int(key % NUM_WORDS)): value for key, value in zip(keys, probabilities)}
    initial, transitions = transition_model(len(source), parameters)
    size = len(source)
    total = 0.0
    expected_counts = dict.fromkeys(table, 0.0)
    for sequence in itertools.product(range(2 * size), repeat=len(target)):
        weight = sequence_probability(sequence, target, source, table, initial, transitions)
        total += weight
        for state, word in zip(sequence, target):
            expected_counts[(source[state] if state < size else NULL_ID, word)] += weight
    assert result.log_likelihood == pytest.approx(np.log(total), abs=1e-10)
    for row, key in enumerate(keys):
        pair = (int(key // NUM_WORDS), int(key % NUM_WORDS))
        assert counts[row] == pytest.approx(expected_counts[pair] / total, abs=1e-10)


def test_transition_model_follows_the_definition():
    parameters = HmmParameters(np.arange(1, 2 * MAX_JUMP + 2, dtype=float), null_probability=0.25)
    initial, transitions = transition_model(3, parameters)
    assert transitions.sum(axis=1) == pytest.approx(np.ones(6))
    assert initial.sum() == pytest.approx(1.0)
    # word 0 -> word 2 is a jump of +2: (1 - p0) * c(2) / (c(0) + c(1) + c(2))
    weight = parameters.jump_weights
    assert transitions[0, 2] == pytest.approx(0.75 * weight[MAX_JUMP + 2] / weight[MAX_JUMP:MAX_JUMP + 3].sum())
    # NULL state of position 1 jumps like word 1, and only stays in its own NULL state
    assert transitions[4, :3] == pytest.approx(transitions[1, :3])
    assert transitions[1, 3:] == pytest.approx([0.0, 0.25, 0.0])


def synthetic_swapped_corpus(num_pairs=3000, seed=0):
    """Target = word-by-word image of the source with every other adjacent pair swapped: the true links are known."""
    generator = np.random.default_rng(seed)
    sources, targets, gold = [], [], []
    for _ in range(num_pairs):
        length = int(generator.integers(3, 10))
        source = generator.zipf(1.5, size=length) % 300 + 4
        order = np.arange(length)
        for start in range(0, length - 1, 4):
            order[start], order[start + 1] = order[start + 1], order[start]
        sources.append(source)
        targets.append(((source * 7) % 300 + 4)[order])
        gold.append({(int(order[j]), j) for j in range(length)})
    corpus = ParallelArrays(SegmentArray.from_sequences(sources), SegmentArray.from_sequences(targets))
    return corpus, gold


def recall(alignments, gold):
    return np.mean([len(alignments.link_set(k) & links) / len(links) for k, links in enumerate(gold)])


def test_hmm_improves_likelihood_and_alignments_over_model1():
    corpus, gold = synthetic_swapped_corpus()
    with CellWorkspace(corpus, 310, 310) as workspace:
        model1_probabilities, _ = Ibm1Trainer(5).fit_in(workspace)
        model1_links = Ibm1Trainer.viterbi(workspace, model1_probabilities)
        probabilities, parameters, history = HmmTrainer(5).fit_in(workspace, model1_probabilities)
        hmm_links = HmmTrainer.viterbi(workspace, probabilities, parameters)
    values = [report.log_likelihood for report in history.iterations]
    # EM never lowers the likelihood (Dempster, Laird & Rubin 1977).
    assert all(later >= earlier - 1e-6 for earlier, later in zip(values, values[1:]))
    # Vogel et al. (1996): the first-order dependence on the previous position is what Model 1 lacks; with
    # local swaps only, short jumps +1 and -1 and +2 must carry most of the jump mass.
    weights = parameters.jump_weights / parameters.jump_weights.sum()
    assert weights[MAX_JUMP + 1] + weights[MAX_JUMP - 1] + weights[MAX_JUMP + 2] > 0.9
    # Measured when written: Model 1 0.73, HMM 0.92 (repeated Zipfian words leave some links ambiguous).
    assert recall(hmm_links, gold) > recall(model1_links, gold) + 0.1
    assert recall(hmm_links, gold) > 0.9


def test_viterbi_finds_the_most_probable_state_sequence():
    generator = np.random.default_rng(5)
    source, target = [4, 5, 6], [7, 8, 4]
    parameters = random_parameters(generator)
    with one_pair_workspace(source, target) as workspace:
        probabilities = generator.uniform(0.05, 1.0, size=len(workspace.table_keys))
        links = HmmTrainer.viterbi(workspace, probabilities, parameters)
        keys = workspace.table_keys
    table = {(int(key // NUM_WORDS), int(key % NUM_WORDS)): value for key, value in zip(keys, probabilities)}
    initial, transitions = transition_model(3, parameters)
    best = max(itertools.product(range(6), repeat=3),
               key=lambda sequence: sequence_probability(sequence, target, source, table, initial, transitions))
    assert links.link_set(0) == {(state, position) for position, state in enumerate(best) if state < 3}
