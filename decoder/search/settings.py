"""Settings of one translation call and the records a translation returns (plain frozen dataclasses).

These are the library's public contract: the CLI and the HTTP service build ``TranslationOptions`` and read
``SegmentTranslation``; nothing else of the search leaks out.
"""

from __future__ import annotations

from collections.abc import Mapping
from dataclasses import dataclass, field
from enum import StrEnum

from decoder.errors import ConfigurationError
from decoder.terminology.glossary import Glossary, TermMode
from decoder.terminology.report import TermReportItem

__all__ = ["NBestEntry", "PhraseSpan", "SearchAlgorithm", "SearchSettings", "SegmentTranslation", "TermMode",
           "TranslationOptions", "WordLink"]


class SearchAlgorithm(StrEnum):
    STACK = "stack"  # expand every hypothesis with every option (then prune)
    CUBE = "cube"    # cube pruning (Huang & Chiang 2007): at most ``cube_pop_limit`` pops per stack


@dataclass(frozen=True, slots=True)
class SearchSettings:
    """Search limits. ``beam_width`` is in the log domain of the model score: a hypothesis whose score plus
    future cost falls more than this below the best of its stack is dropped (threshold pruning)."""

    algorithm: SearchAlgorithm = SearchAlgorithm.CUBE
    stack_size: int = 200
    beam_width: float = 10.0
    distortion_limit: int = 6          # 0: monotone; negative: unlimited
    cube_pop_limit: int = 1000
    max_options_per_span: int = 20
    max_phrase_length: int = 7

    def __post_init__(self) -> None:
        object.__setattr__(self, "algorithm", SearchAlgorithm(self.algorithm))
        if self.stack_size < 1 or self.cube_pop_limit < 1 or self.max_options_per_span < 1:
            raise ConfigurationError("stack_size, cube_pop_limit and max_options_per_span must be at least 1")
        if not self.beam_width > 0:
            raise ConfigurationError("beam_width must be positive")
        if self.max_phrase_length < 1:
            raise ConfigurationError("max_phrase_length must be at least 1")

    def with_overrides(self, **values: object) -> SearchSettings:
        """A copy with the given fields replaced (unknown names raise ConfigurationError)."""
        known = set(self.__dataclass_fields__)
        unknown = set(values) - known
        if unknown:
            raise ConfigurationError(f"unknown search setting(s): {', '.join(sorted(unknown))}")
        merged = {name: getattr(self, name) for name in known}
        merged.update(values)
        return SearchSettings(**merged)


@dataclass(frozen=True, slots=True)
class TranslationOptions:
    """What one call asks for. ``weights`` override the model's weights by feature name."""

    n_best: int = 1
    search: SearchSettings = field(default_factory=SearchSettings)
    weights: Mapping[str, float] | None = None
    distinct_n_best: bool = True
    include_segmentation: bool = False
    include_alignment: bool = False
    max_segment_tokens: int = 150  # longer segments are split at sentence or clause punctuation
    glossaries: tuple[Glossary, ...] = ()
    term_mode: TermMode = TermMode.ENFORCE  # for entries without a mode of their own
    inflection_tolerance: bool = False       # match plural -s/-es forms of source terms too

    def __post_init__(self) -> None:
        if not 1 <= self.n_best <= 1000:
            raise ConfigurationError("n_best must be between 1 and 1000")
        object.__setattr__(self, "term_mode", TermMode(self.term_mode))
        object.__setattr__(self, "glossaries", tuple(self.glossaries))


@dataclass(frozen=True, slots=True)
class PhraseSpan:
    """One phrase of a derivation: token spans (end exclusive) and character spans of the output/source text."""

    source_tokens: tuple[int, int]
    target_tokens: tuple[int, int]
    source_characters: tuple[int, int]
    target_characters: tuple[int, int]


@dataclass(frozen=True, slots=True)
class WordLink:
    source_token: int
    target_token: int
    source_characters: tuple[int, int]
    target_characters: tuple[int, int]


@dataclass(frozen=True, slots=True)
class NBestEntry:
    """One translation of a segment. Invariant: ``score == sum(weights[f] * features[f])`` to 1e-9."""

    text: str
    score: float
    features: Mapping[str, float]
    segmentation: tuple[PhraseSpan, ...] | None = None
    alignment: tuple[WordLink, ...] | None = None


@dataclass(frozen=True, slots=True)
class SegmentTranslation:
    source: str
    translation: str
    n_best: tuple[NBestEntry, ...]
    num_pieces: int = 1  # >1 when a long segment was split and translated piece by piece
    terms: tuple[TermReportItem, ...] = ()  # one per matched term (decoder.terminology.report), source order
