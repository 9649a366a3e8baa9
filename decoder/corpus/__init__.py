"""Streaming readers for parallel corpora (plain pair, TSV, TMX, gettext PO/MO) and corpus cleaning.

Readers yield ``RawPair`` values one at a time (constant memory) and raise ``InputFileError`` naming the file
and line or element for bad input. Cleaning decides from token counts only, so it does not depend on
``decoder.text``. This package imports only the standard library, numpy and ``decoder.errors``.
"""

from decoder.corpus.cleaning import CleaningReport, CleaningRules, DropReason
from decoder.corpus.reader import CORPUS_FORMATS, CorpusFormat, detect_format, read_parallel
from decoder.corpus.records import CorpusReader, RawPair, SkipReason

__all__ = [
    "CORPUS_FORMATS",
    "CleaningReport",
    "CleaningRules",
    "CorpusFormat",
    "CorpusReader",
    "DropReason",
    "RawPair",
    "SkipReason",
    "detect_format",
    "read_parallel",
]
