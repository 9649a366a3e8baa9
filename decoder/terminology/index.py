"""A glossary compiled for matching: its source terms as integer unit sequences, grouped by first unit.

``compile_glossary`` tokenizes every source term once (with the glossary's source language), interns its
units (``decoder.terminology.units``) as integer ids and stores the candidates CSR-style, sorted by first unit,
then longest first: the candidates starting with unit id ``v`` are rows ``first_offsets[v]:first_offsets[v+1]``.
Case-insensitive entries are keyed by ``str.casefold`` of their units, case-sensitive ones by the units as
written; the two groups are separate tables over one id space.

``find_hits`` then checks every (segment position, candidate with that first unit) pair at once with numpy,
so matching costs O(units x candidates per first unit), independent of the glossary size. Work arrays are the
units of many segments laid end to end, each followed by a separator id (-1) that no candidate contains, so a
window can never run from one segment into the next. ``find_hits_python`` gives the same hits one candidate
at a time: for a single short segment numpy's per-call overhead costs more than the work itself.

Plural tolerance (optional, for English and the Romance languages with -s plurals: Spanish, French,
Portuguese, Catalan, Galician): a unit of a case-insensitive term that is the last piece of a word of at least
``MIN_STEM_CHARACTERS`` characters also matches the same unit followed by "s" or "es" ("workspace" matches
"workspaces", "box" matches "boxes", "carpeta inteligente" matches "carpetas inteligentes"). It is a surface
rule, not a lemmatizer: irregular plurals ("luz"/"luces", "-x" plurals in French) are not covered, and
case-sensitive entries (names, codes) never inflect.
"""

from __future__ import annotations

from collections.abc import Mapping
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from decoder.terminology.glossary import Glossary, GlossaryEntry
from decoder.terminology.units import protected_positions_of, units_of
from decoder.text.languages import primary_subtag
from decoder.text.tokenizer import TokenKind, tokenize

SEPARATOR_ID = -1  # separator, protected token or a unit no term contains
MIN_STEM_CHARACTERS = 3  # shorter words ("us", "is") would turn into false plurals of two-letter terms
PLURAL_SUFFIXES = ("s", "es")
INFLECTION_LANGUAGES = frozenset({"en", "es", "fr", "pt", "ca", "gl"})


@dataclass(frozen=True, slots=True)
class CandidateTable:
    """Source terms of one case mode. Candidate c has units ``units[offsets[c]:offsets[c + 1]]`` and belongs to
    entry ``entries[c]``; ``inflectable[k]`` says whether unit k may carry a plural suffix."""

    first_offsets: npt.NDArray[np.int64]  # (num_unit_ids + 1,)
    units: npt.NDArray[np.int32]
    offsets: npt.NDArray[np.int64]  # (num_candidates + 1,)
    lengths: npt.NDArray[np.int64]  # (num_candidates,): units per candidate
    entries: npt.NDArray[np.int64]
    inflectable: npt.NDArray[np.bool_]

    @property
    def num_candidates(self) -> int:
        return len(self.entries)


@dataclass(frozen=True, slots=True)
class TermIndex:
    """One glossary compiled for matching (it refers to the entries, not to the Glossary object)."""

    name: str
    source_language: str
    entries: tuple[GlossaryEntry, ...]
    unit_ids: Mapping[str, int]
    case_insensitive: CandidateTable
    case_sensitive: CandidateTable
    unmatchable: tuple[int, ...]  # entries whose source term contains a protected token: they never match
    num_words: npt.NDArray[np.int32]  # word tokens in each entry's source term (0 for unmatchable entries)


def compile_glossary(glossary: Glossary) -> TermIndex:
    """The match index of ``glossary``; built once per glossary (matching caches it). Costs about 40 us per
    entry on the development machine, most of it tokenizing the source term."""
    unit_ids: dict[str, int] = {}
    rows: dict[bool, list[tuple[int, list[int], list[bool]]]] = {False: [], True: []}
    unmatchable: list[int] = []
    num_words = np.zeros(len(glossary.entries), dtype=np.int32)
    for entry_index, entry in enumerate(glossary.entries):
        tokens = tokenize(entry.source, glossary.source_language)
        units = units_of(tokens, protected_positions_of(tokens))
        if any(text is None for text in units.texts):
            unmatchable.append(entry_index)
            continue
        num_words[entry_index] = sum(token.kind is TokenKind.WORD for token in tokens)
        ids, inflectable = [], []
        for text, ends, is_word in zip(units.texts, units.ends_token, units.is_word):
            assert text is not None  # protected units were excluded above
            key = text if entry.case_sensitive else text.casefold()
            ids.append(unit_ids.setdefault(key, len(unit_ids)))
            inflectable.append(not entry.case_sensitive and ends and is_word and len(key) >= MIN_STEM_CHARACTERS)
        rows[entry.case_sensitive].append((entry_index, ids, inflectable))
    return TermIndex(
        glossary.name,
        glossary.source_language,
        glossary.entries,
        unit_ids,
        _table(rows[False], len(unit_ids)),
        _table(rows[True], len(unit_ids)),
        tuple(unmatchable),
        num_words,
    )


def _table(rows: list[tuple[int, list[int], list[bool]]], num_ids: int) -> CandidateTable:
    entries = np.array([row[0] for row in rows], dtype=np.int64)
    lengths = np.array([len(row[1]) for row in rows], dtype=np.int64)
    firsts = np.array([row[1][0] for row in rows], dtype=np.int64)
    # Sorted by first unit, then longest first, then entry order: the order ties are broken in downstream.
    order = np.lexsort((entries, -lengths, firsts))
    units = np.array([unit for index in order for unit in rows[index][1]], dtype=np.int32)
    inflectable = np.array([flag for index in order for flag in rows[index][2]], dtype=np.bool_)
    offsets = np.zeros(len(rows) + 1, dtype=np.int64)
    np.cumsum(lengths[order], out=offsets[1:])
    first_offsets = np.searchsorted(firsts[order], np.arange(num_ids + 1), side="left").astype(np.int64)
    return CandidateTable(first_offsets, units, offsets, lengths[order], entries[order], inflectable)


def inflection_applies(language: str) -> bool:
    """True if plural tolerance is defined for ``language`` (a BCP 47 tag)."""
    return primary_subtag(language) in INFLECTION_LANGUAGES


@dataclass(frozen=True, slots=True)
class Hits:
    """Verified matches of one table: unit position, candidate row, length in units, matched via a plural."""

    positions: npt.NDArray[np.int64]
    candidates: npt.NDArray[np.int64]
    lengths: npt.NDArray[np.int64]
    inflected: npt.NDArray[np.bool_]


_NO_HITS = Hits(*(np.zeros(0, dtype=np.int64),) * 3, np.zeros(0, dtype=np.bool_))


def _ragged_arange(starts: npt.NDArray[np.int64], counts: npt.NDArray[np.int64]) -> npt.NDArray[np.int64]:
    """``concatenate([arange(s, s + c) for s, c in zip(starts, counts)])`` without a Python loop."""
    total = int(counts.sum())
    group_starts = np.cumsum(counts) - counts
    return np.repeat(starts - group_starts, counts) + np.arange(total, dtype=np.int64)


def find_hits(
    table: CandidateTable,
    keys: npt.NDArray[np.int64],
    stems: tuple[npt.NDArray[np.int64], ...],
    starts_token: npt.NDArray[np.bool_],
    ends_token: npt.NDArray[np.bool_],
) -> Hits:
    """Every candidate of ``table`` that matches at some position of the unit id array ``keys``.

    ``keys`` ends with a separator; ``stems`` (empty unless plural tolerance is on) hold, per suffix, the id of
    each unit without that suffix or SEPARATOR_ID. A hit starts on a token start, ends on a token end, and
    each of its units equals the key, or (for inflectable candidate units at a token end) one of the stems."""
    if table.num_candidates == 0:
        return _NO_HITS
    last_index = len(keys) - 1  # the final separator: windows running past the end compare against it
    first_offsets = table.first_offsets
    pair_positions, pair_candidates = [], []
    for lookup in (keys, *stems):
        positions = np.flatnonzero(starts_token & (lookup >= 0))
        first = lookup[positions]
        low = first_offsets[first]
        counts = first_offsets[first + 1] - low
        pair_positions.append(np.repeat(positions, counts))
        pair_candidates.append(_ragged_arange(low, counts))
    positions = np.concatenate(pair_positions) if stems else pair_positions[0]
    candidates = np.concatenate(pair_candidates) if stems else pair_candidates[0]
    if len(positions) == 0:
        return _NO_HITS
    lengths = table.lengths[candidates]
    pair_starts = np.cumsum(lengths) - lengths
    step = np.arange(int(pair_starts[-1] + lengths[-1]), dtype=np.int64) - np.repeat(pair_starts, lengths)
    segment_index = np.minimum(np.repeat(positions, lengths) + step, last_index)
    unit_index = np.repeat(table.offsets[candidates], lengths) + step
    expected = table.units[unit_index]
    exact = keys[segment_index] == expected
    if not stems:
        matched = np.logical_and.reduceat(exact, pair_starts)
        matched &= ends_token[np.minimum(positions + lengths - 1, last_index)]
        return Hits(positions[matched], candidates[matched], lengths[matched], np.zeros(int(matched.sum()), np.bool_))
    via_stem = np.zeros(len(exact), dtype=np.bool_)
    for stem in stems:
        via_stem |= stem[segment_index] == expected
    unit_matches = exact | (via_stem & table.inflectable[unit_index] & ends_token[segment_index])
    matched = np.logical_and.reduceat(unit_matches, pair_starts)
    matched &= ends_token[np.minimum(positions + lengths - 1, last_index)]
    inflected = ~np.logical_and.reduceat(exact, pair_starts)
    return Hits(positions[matched], candidates[matched], lengths[matched], inflected[matched])


def find_hits_python(
    table: CandidateTable,
    keys: list[int],
    stems: tuple[list[int], ...],
    starts_token: list[bool],
    ends_token: list[bool],
) -> list[tuple[int, int, int, bool]]:
    """The hits of ``find_hits`` as (position, candidate, length, inflected), one candidate at a time.

    Same contract on plain lists. For one short segment this is several times faster than the vectorised
    version, whose cost there is numpy's per-call overhead; tests check that both give the same hits."""
    if table.num_candidates == 0:
        return []
    first_offsets, offsets, lengths, units = table.first_offsets, table.offsets, table.lengths, table.units
    hits = []
    num_keys = len(keys)
    for position in range(num_keys):
        if not starts_token[position]:
            continue
        for lookup in (keys, *stems):
            first = lookup[position]
            if first < 0:
                continue
            for candidate in range(int(first_offsets[first]), int(first_offsets[first + 1])):
                length = int(lengths[candidate])
                end = position + length
                if end >= num_keys or not ends_token[end - 1]:
                    continue  # runs into the final separator, or does not end on a token end
                start_unit = int(offsets[candidate])
                expected = units[start_unit : start_unit + length].tolist()
                window = keys[position:end]
                if window == expected:
                    hits.append((position, candidate, length, False))
                elif stems and _matches_with_plurals(
                    window,
                    expected,
                    table.inflectable[start_unit : start_unit + length].tolist(),
                    [[stem[index] for stem in stems] for index in range(position, end)],
                    ends_token[position:end],
                ):
                    hits.append((position, candidate, length, True))
    return hits


def _matches_with_plurals(
    window: list[int],
    expected: list[int],
    inflectable: list[bool],
    stems: list[list[int]],
    ends_token: list[bool],
) -> bool:
    for key, wanted, can_inflect, unit_stems, at_token_end in zip(window, expected, inflectable, stems, ends_token):
        if key != wanted and not (can_inflect and at_token_end and wanted in unit_stems):
            return False
    return True
