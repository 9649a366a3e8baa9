"""Target-side n-gram language model: interpolated modified Kneser-Ney, ARPA input/output, compact queries.

Training counts n-grams per shard (``counts``), estimates the model (``kneser_ney``) into a back-off model of
sorted arrays (``ngram_model``), which ``arpa`` reads and writes and ``query`` compiles into the flat arrays the
decoder scores with. Imports only numpy, ``decoder.errors``, ``decoder.executor``, ``decoder.segment_arrays``
and ``decoder.vocabulary``.
"""

from decoder.lm.arpa import read_arpa, write_arpa
from decoder.lm.counts import (
    NgramCounts,
    count_ngrams,
    count_ngrams_sharded,
    merge_counts,
    segment_shard_bounds,
)
from decoder.lm.kneser_ney import Discounts, estimate_kneser_ney, modified_discounts, train_kneser_ney
from decoder.lm.ngram_model import NEVER_LOG10, NgramModel, complete_ngram_model
from decoder.lm.query import LanguageModel

__all__ = [
    "NEVER_LOG10",
    "Discounts",
    "LanguageModel",
    "NgramCounts",
    "NgramModel",
    "complete_ngram_model",
    "count_ngrams",
    "count_ngrams_sharded",
    "estimate_kneser_ney",
    "merge_counts",
    "modified_discounts",
    "read_arpa",
    "segment_shard_bounds",
    "train_kneser_ney",
    "write_arpa",
]
