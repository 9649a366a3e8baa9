"""Weight tuning on n-best lists: BLEU sufficient statistics, the n-best pool, MERT, PRO and the tuning loop.

The decoder is not imported: ``tune`` drives any callable ``decode(weights, n_best)`` that returns, per dev
segment, a list of ``(target tokens, feature vector)`` entries, best first. Imports only numpy, tqdm,
``decoder.errors`` (and matplotlib, lazily, in ``plot_history``).
"""

from decoder.tuning.bleu_statistics import (
    MAX_NGRAM_ORDER,
    NUM_STATISTICS,
    ReferenceSet,
    bleu,
    corpus_bleu,
    segment_statistics,
    sentence_bleu_plus_one,
)
from decoder.tuning.envelope import Envelopes, upper_envelopes
from decoder.tuning.loop import IterationRecord, TuningResult, TuningSettings, plot_history, tune
from decoder.tuning.mert import LineSearchResult, MertSettings, line_search, optimise_mert
from decoder.tuning.n_best_pool import DecodeFunction, NBestEntry, NBestFormatError, NBestList, NBestPool, PoolArrays
from decoder.tuning.pro import ProSettings, fit_logistic_regression, optimise_pro, sample_pairs
from decoder.tuning.weights import OptimiserResult, normalise_l1

__all__ = [
    "MAX_NGRAM_ORDER",
    "NUM_STATISTICS",
    "DecodeFunction",
    "Envelopes",
    "IterationRecord",
    "LineSearchResult",
    "MertSettings",
    "NBestEntry",
    "NBestFormatError",
    "NBestList",
    "NBestPool",
    "OptimiserResult",
    "PoolArrays",
    "ProSettings",
    "ReferenceSet",
    "TuningResult",
    "TuningSettings",
    "bleu",
    "corpus_bleu",
    "fit_logistic_regression",
    "line_search",
    "normalise_l1",
    "optimise_mert",
    "optimise_pro",
    "plot_history",
    "sample_pairs",
    "segment_statistics",
    "sentence_bleu_plus_one",
    "tune",
    "upper_envelopes",
]
