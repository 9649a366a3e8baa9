"""Word alignment of a parallel corpus in both directions, then symmetrization: the training entry point.

Each direction trains IBM Model 1 and then the HMM model in one workspace (the HMM starts from Model 1's table)
and takes Viterbi alignments; the two directions are combined by ``decoder.align.symmetrize`` (Och & Ney 2003;
Koehn et al. 2003), grow-diag-final-and by default.
"""

from __future__ import annotations

from dataclasses import dataclass
from pathlib import Path

import numpy as np

from decoder.align.hmm import HmmTrainer
from decoder.align.ibm1 import Ibm1Trainer, TrainingHistory
from decoder.align.lexical_table import LexicalTable
from decoder.align.links import AlignmentArray
from decoder.align.symmetrize import symmetrize_corpus
from decoder.align.workspace import CellWorkspace
from decoder.executor import Executor, SerialExecutor
from decoder.segment_arrays import ParallelArrays


@dataclass(frozen=True, slots=True)
class AlignmentSettings:
    model1_iterations: int = 5
    hmm_iterations: int = 5
    null_probability: float = 0.2
    symmetrization: str = "grow-diag-final-and"

    def __post_init__(self) -> None:
        if self.model1_iterations < 1 or self.hmm_iterations < 0:
            raise ValueError("Model 1 needs at least one iteration; the HMM may have zero (Model 1 alignments)")
        if not 0.0 <= self.null_probability < 1.0:
            raise ValueError("null_probability must be in [0, 1)")


@dataclass(frozen=True, slots=True)
class DirectionResult:
    """One direction: t(generated word | conditioning word) and its Viterbi links in corpus orientation."""

    table: LexicalTable
    links: AlignmentArray  # always (source position, target position) of the corpus as given
    histories: tuple[TrainingHistory, ...]


@dataclass(frozen=True, slots=True)
class AlignmentResult:
    forward: DirectionResult     # t(target | source); each target word has at most one source word
    backward: DirectionResult    # t(source | target); each source word has at most one target word
    symmetrized: AlignmentArray


def flip_links(alignments: AlignmentArray) -> AlignmentArray:
    """Swap the two positions of every link and restore the (first, second) sort order per sentence."""
    flipped = alignments.links[:, ::-1]
    sentence = np.repeat(np.arange(len(alignments)), np.diff(alignments.offsets))
    order = np.lexsort((flipped[:, 1], flipped[:, 0], sentence))
    return AlignmentArray(np.ascontiguousarray(flipped[order]), alignments.offsets.copy())


def train_direction(
    corpus: ParallelArrays, num_source_words: int, num_target_words: int, settings: AlignmentSettings,
    executor: Executor, label: str, show_progress: bool, work_dir: str | Path | None,
) -> DirectionResult:
    """Model 1 then HMM for t(target | source) of ``corpus``; links in (source, target) orientation."""
    with CellWorkspace(corpus, num_source_words, num_target_words, executor=executor,
                       parent_dir=work_dir) as workspace:
        model1 = Ibm1Trainer(settings.model1_iterations, show_progress=show_progress)
        probabilities, model1_history = model1.fit_in(workspace, label=f"{label} Model 1")
        histories = [model1_history]
        if settings.hmm_iterations:
            hmm = HmmTrainer(settings.hmm_iterations, settings.null_probability, show_progress=show_progress)
            probabilities, parameters, hmm_history = hmm.fit_in(workspace, probabilities, label=f"{label} HMM")
            histories.append(hmm_history)
            links = HmmTrainer.viterbi(workspace, probabilities, parameters)
        else:
            links = Ibm1Trainer.viterbi(workspace, probabilities)
        return DirectionResult(workspace.lexical_table(probabilities), links, tuple(histories))


def align_corpus(
    corpus: ParallelArrays, num_source_words: int, num_target_words: int,
    settings: AlignmentSettings = AlignmentSettings(), executor: Executor | None = None,
    show_progress: bool = False, work_dir: str | Path | None = None,
) -> AlignmentResult:
    """Align both directions and symmetrize. Pairs with an empty side get no links."""
    executor = executor or SerialExecutor()
    forward = train_direction(corpus, num_source_words, num_target_words, settings, executor,
                              "source->target", show_progress, work_dir)
    backward_raw = train_direction(corpus.reversed(), num_target_words, num_source_words, settings, executor,
                                   "target->source", show_progress, work_dir)
    backward = DirectionResult(backward_raw.table, flip_links(backward_raw.links), backward_raw.histories)
    symmetrized = symmetrize_corpus(forward.links, backward.links, corpus.source.lengths, corpus.target.lengths,
                                    settings.symmetrization, executor=executor)
    return AlignmentResult(forward, backward, symmetrized)
