"""Phrase pairs: extraction from word-aligned corpora, counting, scoring, lexicalized reordering, the table.

Flow: ``extraction.extract_shard`` (map, per shard) -> ``counting.merge_counts`` / ``CountAccumulator``
(reduce, spilling to disk when large) -> ``lexical`` + ``scoring`` + ``reordering`` -> ``table.PhraseTable``.
``build_phrase_table`` runs all of it. Imports only numpy, ``decoder.errors``, ``decoder.vocabulary``,
``decoder.segment_arrays``, ``decoder.executor`` and ``decoder.align`` (links and the lexical table type).
"""

from decoder.phrases.settings import PhraseSettings
from decoder.phrases.table import PhraseTable, PhraseTableStats
from decoder.phrases.training import build_phrase_table

__all__ = ["PhraseSettings", "PhraseTable", "PhraseTableStats", "build_phrase_table"]
