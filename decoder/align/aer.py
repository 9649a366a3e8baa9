"""Alignment error rate, precision and recall against a hand-made reference (Och & Ney 2003, section 5).

Annotators mark each reference link as *sure* (S, unambiguous) or *possible* (P, acceptable), with S a subset of
P; we enforce that by using P = P | S. For a predicted alignment A, summed over the corpus:

    precision = |A & P| / |A|        recall = |A & S| / |S|        AER = 1 - (|A & S| + |A & P|) / (|A| + |S|)

Links are (source position, target position) pairs; every argument is one link collection per sentence pair
(a list of sets, or an AlignmentArray). Counts are summed before dividing, so long sentences weigh more.
"""

from __future__ import annotations

from collections.abc import Iterable, Sequence
from dataclasses import dataclass

import numpy as np

from decoder.align.links import AlignmentArray

Links = Iterable[tuple[int, int]] | np.ndarray
Corpus = Sequence[Links] | AlignmentArray


@dataclass(frozen=True, slots=True)
class AlignmentScores:
    """Corpus-level link counts and the three scores computed from them (all scores are fractions in [0, 1]).

    Conventions for empty denominators: no predicted links gives precision 1.0 (nothing wrong was proposed),
    no sure links gives recall 1.0 (nothing was missed), and both empty gives AER 0.0."""

    num_predicted: int  # |A|
    num_sure: int  # |S|
    num_possible: int  # |P| after P := P | S
    num_predicted_sure: int  # |A & S|
    num_predicted_possible: int  # |A & P|

    @property
    def precision(self) -> float:
        return self.num_predicted_possible / self.num_predicted if self.num_predicted else 1.0

    @property
    def recall(self) -> float:
        return self.num_predicted_sure / self.num_sure if self.num_sure else 1.0

    @property
    def alignment_error_rate(self) -> float:
        denominator = self.num_predicted + self.num_sure
        if denominator == 0:
            return 0.0
        return 1.0 - (self.num_predicted_sure + self.num_predicted_possible) / denominator


def _as_set(links: Links) -> set[tuple[int, int]]:
    if isinstance(links, np.ndarray):
        return {(int(i), int(j)) for i, j in links.reshape(-1, 2).tolist()}
    return {(int(i), int(j)) for i, j in links}


def alignment_scores(predicted: Corpus, sure: Corpus, possible: Corpus | None = None) -> AlignmentScores:
    """Counts of predicted, sure and possible links and their overlaps, summed over all sentence pairs.

    ``possible`` defaults to no extra links (P = S). Raises ValueError when the three corpora differ in length."""
    possible_corpus: Corpus = [()] * len(sure) if possible is None else possible
    if not (len(predicted) == len(sure) == len(possible_corpus)):
        raise ValueError(
            f"predicted ({len(predicted)}), sure ({len(sure)}) and possible ({len(possible_corpus)}) alignments "
            "must cover the same sentence pairs"
        )
    totals = [0, 0, 0, 0, 0]
    for predicted_links, sure_links, possible_links in zip(predicted, sure, possible_corpus, strict=True):
        a, s = _as_set(predicted_links), _as_set(sure_links)
        p = _as_set(possible_links) | s
        totals[0] += len(a)
        totals[1] += len(s)
        totals[2] += len(p)
        totals[3] += len(a & s)
        totals[4] += len(a & p)
    return AlignmentScores(*totals)


def alignment_error_rate(predicted: Corpus, sure: Corpus, possible: Corpus | None = None) -> float:
    """AER of ``predicted`` (0 = perfect, 1 = no overlap), Och & Ney (2003), equation in section 5."""
    return alignment_scores(predicted, sure, possible).alignment_error_rate


def alignment_precision(predicted: Corpus, sure: Corpus, possible: Corpus | None = None) -> float:
    """Share of predicted links that are possible (or sure) reference links."""
    return alignment_scores(predicted, sure, possible).precision


def alignment_recall(predicted: Corpus, sure: Corpus, possible: Corpus | None = None) -> float:
    """Share of sure reference links that were predicted."""
    return alignment_scores(predicted, sure, possible).recall
