"""Phrase translation scores from merged counts, and pruning of the targets of each source phrase.

Per phrase pair (f, e), all natural logs (Koehn, Och & Marcu 2003, sections 3.1 and 3.3):

    phrase_fwd = log c(f, e) / c(f)          phrase_bwd = log c(f, e) / c(e)
    lex_fwd    = log max_a lex(e|f, a)       lex_bwd    = log max_a lex(f|e, a)

c counts extracted occurrences; the max runs over the internal alignments a seen with the pair, as the paper
prescribes when a pair was extracted with several alignments. The alignment stored with the pair is its most
frequent one; ties go to the smallest packed mask (the order of the merged counts), so the choice does not
depend on shard order. Scores are computed on all counts; pruning happens afterwards.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from decoder.phrases.encoding import group_starts
from decoder.phrases.extraction import PhraseCounts
from decoder.phrases.lexical import LexicalTables, phrase_lexical_weights

SCORE_NAMES = ("phrase_fwd", "phrase_bwd", "lex_fwd", "lex_bwd")
PHRASE_FWD, PHRASE_BWD, LEX_FWD, LEX_BWD = range(4)


@dataclass(frozen=True, slots=True)
class ScoredPhrasePairs:
    """One row per distinct (source phrase, target phrase), sorted by (pair_source, pair_target).

    ``scores`` has the SCORE_NAMES columns (natural logs); ``alignment_masks`` is the most frequent internal
    alignment; ``orientation_counts`` sums the six orientation columns over all alignments of the pair."""

    source_phrases: npt.NDArray[np.int32]
    target_phrases: npt.NDArray[np.int32]
    pair_source: npt.NDArray[np.int32]
    pair_target: npt.NDArray[np.int32]
    scores: npt.NDArray[np.float64]
    alignment_masks: npt.NDArray[np.uint64]
    pair_counts: npt.NDArray[np.int64]
    orientation_counts: npt.NDArray[np.int64]

    def __len__(self) -> int:
        return len(self.pair_counts)

    def select(self, rows: npt.NDArray[np.int64]) -> ScoredPhrasePairs:
        """The given pair rows (ascending), dropping phrases no longer used and renumbering the rest."""
        used_source, pair_source = np.unique(self.pair_source[rows], return_inverse=True)
        used_target, pair_target = np.unique(self.pair_target[rows], return_inverse=True)
        return ScoredPhrasePairs(
            source_phrases=self.source_phrases[used_source],
            target_phrases=self.target_phrases[used_target],
            pair_source=pair_source.astype(np.int32),
            pair_target=pair_target.astype(np.int32),
            scores=self.scores[rows],
            alignment_masks=self.alignment_masks[rows],
            pair_counts=self.pair_counts[rows],
            orientation_counts=self.orientation_counts[rows],
        )


def score_phrase_pairs(counts: PhraseCounts, tables: LexicalTables) -> ScoredPhrasePairs:
    """Relative-frequency and lexical scores of every counted pair (see module docstring)."""
    sources = np.asarray(counts.pair_source, dtype=np.int64)
    targets = np.asarray(counts.pair_target, dtype=np.int64)
    starts = group_starts([sources, targets])
    first = np.flatnonzero(starts)
    group = np.cumsum(starts) - 1
    num_pairs = len(first)

    # Most frequent alignment per pair: stable sort by descending count keeps ascending masks among ties.
    by_count = np.lexsort((-np.asarray(counts.pair_counts), group))
    best_row = by_count[group_starts([group[by_count]])] if num_pairs else first

    lex_forward, lex_backward = phrase_lexical_weights(
        counts.source_phrases, counts.target_phrases, counts.alignment_masks, tables, sources, targets
    )
    pair_counts = np.add.reduceat(counts.pair_counts, first) if num_pairs else np.zeros(0, dtype=np.int64)
    pair_source, pair_target = sources[first], targets[first]
    source_totals = np.bincount(pair_source, weights=pair_counts, minlength=len(counts.source_phrases))
    target_totals = np.bincount(pair_target, weights=pair_counts, minlength=len(counts.target_phrases))
    scores = np.empty((num_pairs, len(SCORE_NAMES)))
    scores[:, PHRASE_FWD] = np.log(pair_counts) - np.log(source_totals[pair_source])
    scores[:, PHRASE_BWD] = np.log(pair_counts) - np.log(target_totals[pair_target])
    if num_pairs:
        scores[:, LEX_FWD] = np.maximum.reduceat(lex_forward, first)
        scores[:, LEX_BWD] = np.maximum.reduceat(lex_backward, first)
        orientation_counts = np.add.reduceat(counts.orientation_counts, first, axis=0)
    else:
        orientation_counts = np.zeros((0, counts.orientation_counts.shape[1]), dtype=np.int64)
    return ScoredPhrasePairs(
        source_phrases=np.asarray(counts.source_phrases),
        target_phrases=np.asarray(counts.target_phrases),
        pair_source=pair_source.astype(np.int32),
        pair_target=pair_target.astype(np.int32),
        scores=scores,
        alignment_masks=np.asarray(counts.alignment_masks)[best_row],
        pair_counts=pair_counts.astype(np.int64),
        orientation_counts=orientation_counts.astype(np.int64),
    )


def prune_phrase_pairs(
    scored: ScoredPhrasePairs, max_targets_per_source: int | None, drop_singletons: bool = False
) -> ScoredPhrasePairs:
    """Drop pairs seen once (optional), then keep the ``max_targets_per_source`` best targets per source.

    Ranking by phrase_fwd + lex_fwd is common practice (both estimate how likely the target is given the
    source); ties keep the smaller target phrase id. Phrases that lose all their pairs disappear from the
    phrase lists."""
    rows = np.arange(len(scored), dtype=np.int64)
    if drop_singletons:
        rows = rows[scored.pair_counts[rows] > 1]
    if max_targets_per_source is not None and len(rows):
        # Only sources with too many targets need ranking; the others keep all their rows.
        num_targets = np.bincount(scored.pair_source[rows], minlength=len(scored.source_phrases))
        crowded = num_targets[scored.pair_source[rows]] > max_targets_per_source
        ranked = rows[crowded]
        sources = scored.pair_source[ranked]
        quality = scored.scores[ranked, PHRASE_FWD] + scored.scores[ranked, LEX_FWD]
        order = np.lexsort((scored.pair_target[ranked], -quality, sources))
        starts = np.flatnonzero(group_starts([sources[order]]))
        rank = np.arange(len(order)) - np.repeat(starts, np.diff(np.append(starts, len(order))))
        rows = np.sort(np.concatenate([rows[~crowded], ranked[order[rank < max_targets_per_source]]]))
    return scored.select(rows)
