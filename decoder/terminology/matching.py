"""Finding glossary terms in prepared source segments: the per-segment constraints the decoder applies.

``find_terms(prepared, glossaries)`` matches on the tokens of ``decoder.text.pipeline.prepare_segment`` (the
normalised text), compares them as match units (``decoder.terminology.units``: hyphenated words split, so
"sign-in" and "sign - in" are the same term) and never matches a protected token (placeholder, URL, e-mail,
path, number, markup tag) or across one. A term is tokenized like a segment, so its punctuation tokens are
part of its sequence and spacing does not matter: "Settings > Focus mode" matches "Settings>Focus mode".
Case is ignored (``str.casefold``) except for case-sensitive entries, which compare the original token text,
so "Brelqua" does not match "brelqua".

Choosing among overlapping candidates, across all glossaries: the longest match (in units) first, then the
leftmost, then the earlier glossary in the given order, then a case-sensitive entry before a case-insensitive
one, then the earlier entry; each chosen match blocks every candidate that shares a token with it. Every
blocked candidate is kept in ``TermMatchResult.conflicts`` with the match that blocked it and why, so a report
can say which term was not applied. Results depend only on the inputs, never on dictionary order.
"""

from __future__ import annotations

import weakref
from collections.abc import Mapping, Sequence
from dataclasses import dataclass
from enum import StrEnum
from typing import NamedTuple

import numpy as np

from decoder.errors import ConfigurationError
from decoder.terminology.glossary import Glossary, GlossaryEntry, TermMode
from decoder.terminology.index import (
    PLURAL_SUFFIXES,
    SEPARATOR_ID,
    CandidateTable,
    TermIndex,
    compile_glossary,
    find_hits,
    find_hits_python,
    inflection_applies,
)
from decoder.terminology.units import units_of
from decoder.text.languages import primary_subtag
from decoder.text.pipeline import PreparedSegment

# From about this many units (roughly tokens, over all segments of a batch) the numpy kernel beats the plain
# one: measured with the demo corpus against the demo glossary and a synthetic 100,000-entry one, where numpy
# was 1.3x slower for one segment and about 2x faster from 50 segments on. A measured rule of thumb.
VECTORISE_MIN_UNITS = 400


class Span(NamedTuple):
    """Half-open range [start, end)."""

    start: int
    end: int


class ConflictReason(StrEnum):
    LONGER_MATCH = "overlaps_longer_match"
    LEFTMOST_MATCH = "overlaps_match_further_left"
    EARLIER_GLOSSARY = "same_span_earlier_glossary"
    CASE_SENSITIVE_ENTRY = "same_span_case_sensitive_entry"
    EARLIER_ENTRY = "same_span_earlier_entry"


@dataclass(frozen=True, slots=True)
class TermMatch:
    """One glossary term found in a segment.

    ``token_span`` indexes ``PreparedSegment.tokens``; ``source_span`` is in characters of
    ``PreparedSegment.text`` (the normalised text the tokens were cut from). ``allowed_targets`` are the
    entry's preferred then admitted target texts; ``forbidden_targets`` its deprecated and superseded ones
    (the glossary-wide list is ``Glossary.forbidden_targets``)."""

    token_span: Span
    source_span: Span
    source_text: str
    glossary_name: str
    glossary_position: int  # index of the glossary in the sequence given to find_terms
    entry_index: int  # index in Glossary.entries
    entry: GlossaryEntry
    allowed_targets: tuple[str, ...]
    forbidden_targets: tuple[str, ...]
    num_units: int  # length of the match in units, the "longest" of longest-first
    is_inflected: bool  # matched only through plural tolerance

    @property
    def mode(self) -> TermMode | None:
        """The entry's own mode, or None to use the request's."""
        return self.entry.mode


@dataclass(frozen=True, slots=True)
class TermConflict:
    """A candidate match that was not used because ``winner`` covers some of its tokens."""

    match: TermMatch
    winner: TermMatch
    reason: ConflictReason


@dataclass(frozen=True, slots=True)
class TermMatchResult:
    matches: tuple[TermMatch, ...]  # non-overlapping, in source order
    conflicts: tuple[TermConflict, ...]  # in the order the candidates were rejected


# One compiled index per live Glossary object, keyed by id(); the weak reference evicts the entry when the
# glossary is collected (and guards against a new object that reuses the id).
_INDEXES: dict[int, tuple[weakref.ref[Glossary], TermIndex]] = {}


def index_of(glossary: Glossary | TermIndex) -> TermIndex:
    """The compiled index of ``glossary``, built on first use and cached for the glossary's lifetime."""
    if isinstance(glossary, TermIndex):
        return glossary
    key = id(glossary)
    cached = _INDEXES.get(key)
    if cached is not None and cached[0]() is glossary:
        return cached[1]
    index = compile_glossary(glossary)

    def evict(reference: weakref.ref[Glossary], key: int = key) -> None:
        if _INDEXES.get(key, (None,))[0] is reference:
            del _INDEXES[key]

    _INDEXES[key] = (weakref.ref(glossary, evict), index)
    return index


def find_terms(
    prepared: PreparedSegment,
    glossaries: Sequence[Glossary | TermIndex],
    inflection_tolerance: bool = False,
) -> list[TermMatch]:
    """The chosen (non-overlapping) matches of ``glossaries`` in ``prepared``, in source order."""
    return list(match_terms(prepared, glossaries, inflection_tolerance).matches)


def match_terms(
    prepared: PreparedSegment,
    glossaries: Sequence[Glossary | TermIndex],
    inflection_tolerance: bool = False,
) -> TermMatchResult:
    """Like ``find_terms``, with the candidates that lost to an overlapping match."""
    return match_terms_batch([prepared], glossaries, inflection_tolerance)[0]


@dataclass(frozen=True, slots=True)
class _BatchUnits:
    """Units of many segments end to end, each segment followed by one separator unit."""

    folded: list[str]  # "" for protected units and separators (no term unit is empty)
    exact: list[str]
    stems: tuple[list[str], ...]  # per plural suffix; "" where the unit cannot be a plural
    starts_token: list[bool]
    ends_token: list[bool]
    segment_of_unit: list[int]
    token_of_unit: list[int]


def _batch_units(segments: Sequence[PreparedSegment], inflection_tolerance: bool) -> _BatchUnits:
    exact: list[str] = []
    starts: list[bool] = []
    ends: list[bool] = []
    segment_of_unit: list[int] = []
    token_of_unit: list[int] = []
    stems: tuple[list[str], ...] = tuple([] for _ in PLURAL_SUFFIXES) if inflection_tolerance else ()
    for number, prepared in enumerate(segments):
        units = units_of(prepared.tokens, {original.position for original in prepared.protected.originals})
        texts = [text or "" for text in units.texts]
        exact += texts
        exact.append("")  # the separator after the segment
        starts += units.starts_token
        starts.append(False)
        ends += units.ends_token
        ends.append(False)
        token_of_unit += units.token_of_unit
        token_of_unit.append(-1)
        segment_of_unit += [number] * (len(texts) + 1)
        if stems:
            inflects = inflection_applies(prepared.language)
            for suffix, stem_list in zip(PLURAL_SUFFIXES, stems):
                for text, ends_token, is_word in zip(texts, units.ends_token, units.is_word):
                    folded = text.casefold()
                    can_inflect = inflects and is_word and ends_token and folded.endswith(suffix)
                    stem_list.append(folded[: -len(suffix)] if can_inflect else "")
                stem_list.append("")
    return _BatchUnits([text.casefold() for text in exact], exact, stems, starts, ends, segment_of_unit, token_of_unit)


def _encode(unit_ids: Mapping[str, int], texts: list[str]) -> list[int]:
    get = unit_ids.get
    return [get(text, SEPARATOR_ID) for text in texts]


def _table_hits(
    table: CandidateTable, keys: list[int], stems: tuple[list[int], ...], batch: _BatchUnits, vectorised: bool
) -> list[tuple[int, int, int, bool]]:
    """(unit position, candidate row, length in units, inflected) of every hit of one table."""
    if not vectorised:
        return find_hits_python(table, keys, stems, batch.starts_token, batch.ends_token)
    hits = find_hits(
        table,
        np.array(keys, dtype=np.int64),
        tuple(np.array(stem, dtype=np.int64) for stem in stems),
        np.array(batch.starts_token, dtype=np.bool_),
        np.array(batch.ends_token, dtype=np.bool_),
    )
    return list(zip(hits.positions.tolist(), hits.candidates.tolist(), hits.lengths.tolist(), hits.inflected.tolist()))


class _Candidate(NamedTuple):
    segment: int
    unit_position: int
    num_units: int
    glossary_position: int
    case_sensitive: bool
    entry_index: int
    is_inflected: bool


def match_terms_batch(
    segments: Sequence[PreparedSegment],
    glossaries: Sequence[Glossary | TermIndex],
    inflection_tolerance: bool = False,
    vectorised: bool | None = None,
) -> list[TermMatchResult]:
    """``match_terms`` for many segments, one pass per glossary over all of them (one result per segment).

    ``vectorised`` picks the numpy kernel (``index.find_hits``) or the candidate-at-a-time one
    (``index.find_hits_python``); None chooses numpy from VECTORISE_MIN_UNITS units on, where its per-call
    overhead is paid back. Both give the same results. Raises ConfigurationError if a glossary's source
    language (primary subtag) differs from a segment's."""
    indexes = [index_of(glossary) for glossary in glossaries]
    languages = {prepared.language for prepared in segments}
    for index in indexes:
        for language in languages:
            if primary_subtag(index.source_language) != primary_subtag(language):
                raise ConfigurationError(
                    f"glossary {index.name!r} is for source language {index.source_language!r} but the segment "
                    f"is {language!r}; pass only glossaries of the segment's language"
                )
    candidates: list[list[_Candidate]] = [[] for _ in segments]
    if not segments or not indexes:
        return [TermMatchResult((), ()) for _ in segments]
    batch = _batch_units(segments, inflection_tolerance)
    if vectorised is None:
        vectorised = len(batch.exact) >= VECTORISE_MIN_UNITS
    for glossary_position, index in enumerate(indexes):
        for case_sensitive, table in ((False, index.case_insensitive), (True, index.case_sensitive)):
            if table.num_candidates == 0:
                continue
            keys = _encode(index.unit_ids, batch.exact if case_sensitive else batch.folded)
            stems = () if case_sensitive else tuple(_encode(index.unit_ids, stem) for stem in batch.stems)
            for position, candidate, length, inflected in _table_hits(table, keys, stems, batch, vectorised):
                segment = batch.segment_of_unit[position]
                candidates[segment].append(
                    _Candidate(
                        segment,
                        position,
                        length,
                        glossary_position,
                        case_sensitive,
                        int(table.entries[candidate]),
                        inflected,
                    )
                )
    return [_choose(segments[number], found, indexes, batch.token_of_unit) for number, found in enumerate(candidates)]


def _to_match(
    candidate: _Candidate, prepared: PreparedSegment, indexes: Sequence[TermIndex], token_of_unit: list[int]
) -> TermMatch:
    first_token = token_of_unit[candidate.unit_position]
    last_token = token_of_unit[candidate.unit_position + candidate.num_units - 1]
    start, end = prepared.tokens[first_token].start, prepared.tokens[last_token].end
    index = indexes[candidate.glossary_position]
    entry = index.entries[candidate.entry_index]
    return TermMatch(
        Span(first_token, last_token + 1),
        Span(start, end),
        prepared.text[start:end],
        index.name,
        candidate.glossary_position,
        candidate.entry_index,
        entry,
        tuple(target.text for target in entry.allowed_targets),
        tuple(target.text for target in entry.forbidden_targets),
        candidate.num_units,
        candidate.is_inflected,
    )


def _conflict_reason(loser: TermMatch, winner: TermMatch) -> ConflictReason:
    if winner.num_units > loser.num_units:
        return ConflictReason.LONGER_MATCH
    if winner.token_span != loser.token_span:
        return ConflictReason.LEFTMOST_MATCH
    if winner.glossary_position != loser.glossary_position:
        return ConflictReason.EARLIER_GLOSSARY
    if winner.entry.case_sensitive and not loser.entry.case_sensitive:
        return ConflictReason.CASE_SENSITIVE_ENTRY
    return ConflictReason.EARLIER_ENTRY


def _choose(
    prepared: PreparedSegment,
    found: list[_Candidate],
    indexes: Sequence[TermIndex],
    token_of_unit: list[int],
) -> TermMatchResult:
    """Greedy longest-first selection (see the module docstring for the order)."""
    ranked = sorted(
        (_to_match(candidate, prepared, indexes, token_of_unit) for candidate in found),
        key=lambda match: (
            -match.num_units,
            match.token_span.start,
            match.glossary_position,
            not match.entry.case_sensitive,
            match.entry_index,
        ),
    )
    owner: dict[int, int] = {}  # token position -> index in ``chosen`` of the match covering it
    chosen: list[TermMatch] = []
    conflicts: list[TermConflict] = []
    for match in ranked:
        covered = range(match.token_span.start, match.token_span.end)
        blockers = [owner[position] for position in covered if position in owner]
        if blockers:
            winner = chosen[min(blockers)]  # the first chosen match it collides with
            conflicts.append(TermConflict(match, winner, _conflict_reason(match, winner)))
            continue
        for position in covered:
            owner[position] = len(chosen)
        chosen.append(match)
    return TermMatchResult(tuple(sorted(chosen, key=lambda match: match.token_span.start)), tuple(conflicts))
