"""Terminology: glossaries (TSV/CSV, TBX, inline rows), term matching in prepared segments, term reports and
term accuracy.

Matching produces the per-segment constraints the decoder applies (``decoder/search``); the glossary store
of the service builds on ``load_glossary`` and ``glossary_from_rows``. This package imports the standard
library, numpy, ``decoder.errors`` and ``decoder.text`` only.
"""

from decoder.terminology.accuracy import TermAccuracy, term_accuracy
from decoder.terminology.check import GlossaryCheck, check_glossary
from decoder.terminology.errors import GlossaryNotFoundError, InvalidGlossaryError
from decoder.terminology.glossary import (
    MAX_ENTRIES,
    MAX_TERM_CHARACTERS,
    Glossary,
    GlossaryEntry,
    GlossaryWarning,
    TargetTerm,
    TermMode,
    TermStatus,
    WarningKind,
)
from decoder.terminology.index import TermIndex, compile_glossary
from decoder.terminology.matching import (
    ConflictReason,
    Span,
    TermConflict,
    TermMatch,
    TermMatchResult,
    find_terms,
    match_terms,
    match_terms_batch,
)
from decoder.terminology.report import (
    SegmentTermReport,
    TermReason,
    TermReportItem,
    build_term_report,
    find_in_output,
    locate_in_output,
)
from decoder.terminology.store import (
    DEFAULT_GLOSSARY_DIR,
    glossary_from_rows,
    load_glossary,
    read_glossary_file,
)

__all__ = [
    "DEFAULT_GLOSSARY_DIR",
    "MAX_ENTRIES",
    "MAX_TERM_CHARACTERS",
    "ConflictReason",
    "Glossary",
    "GlossaryCheck",
    "GlossaryEntry",
    "GlossaryNotFoundError",
    "GlossaryWarning",
    "InvalidGlossaryError",
    "SegmentTermReport",
    "Span",
    "TargetTerm",
    "TermAccuracy",
    "TermConflict",
    "TermIndex",
    "TermMatch",
    "TermMatchResult",
    "TermMode",
    "TermReason",
    "TermReportItem",
    "TermStatus",
    "WarningKind",
    "build_term_report",
    "check_glossary",
    "compile_glossary",
    "find_in_output",
    "find_terms",
    "glossary_from_rows",
    "load_glossary",
    "locate_in_output",
    "match_terms",
    "match_terms_batch",
    "read_glossary_file",
    "term_accuracy",
]
