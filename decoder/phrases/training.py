"""The one training entry point for phrase tables: aligned corpus in, pruned and scored PhraseTable out."""

from __future__ import annotations

from decoder.align.links import AlignmentArray
from decoder.executor import Executor
from decoder.phrases.counting import count_phrase_pairs
from decoder.phrases.lexical import estimate_lexical_tables
from decoder.phrases.reordering import orientation_prior, reordering_log_probabilities
from decoder.phrases.scoring import prune_phrase_pairs, score_phrase_pairs
from decoder.phrases.settings import PhraseSettings
from decoder.phrases.table import PhraseTable, PhraseTableStats
from decoder.segment_arrays import ParallelArrays


def build_phrase_table(
    corpus: ParallelArrays,
    alignments: AlignmentArray,
    settings: PhraseSettings | None = None,
    executor: Executor | None = None,
) -> PhraseTable:
    """Extract, count (sharded map over ``executor``, serial when None), score, prune and lay out the table.

    Relative frequencies, lexical weights and the global orientation prior use all extracted pairs; pruning
    comes last, so pruned pairs keep the scores they had. ``table.stats`` reports sizes before and after."""
    settings = settings if settings is not None else PhraseSettings()
    counts, num_spilled_runs = count_phrase_pairs(corpus, alignments, settings, executor)
    scored = score_phrase_pairs(counts, estimate_lexical_tables(corpus, alignments))
    prior = orientation_prior(scored.orientation_counts, settings.reordering_smoothing)
    pruned = prune_phrase_pairs(scored, settings.max_targets_per_source, settings.drop_singletons)
    reordering = reordering_log_probabilities(pruned.orientation_counts, prior, settings.reordering_smoothing)
    stats = PhraseTableStats(
        num_segments=len(corpus),
        num_occurrences=int(scored.pair_counts.sum()),
        num_pairs_before_pruning=len(scored),
        num_pairs_after_pruning=len(pruned),
        num_source_phrases=len(pruned.source_phrases),
        num_target_phrases=len(pruned.target_phrases),
        num_spilled_runs=num_spilled_runs,
    )
    return PhraseTable.from_scored(pruned, reordering, stats)
