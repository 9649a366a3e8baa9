"""Turning (source term, target term) rows into a Glossary: validation and merging shared by all readers.

Every reader (TSV/CSV, TBX, inline rows) feeds ``GlossaryBuilder.add`` one row per (source, target) pair with
its location, so the rules are the same whatever the format:

- Terms are checked (no control characters or line breaks) and normalised with ``decoder.text.normalize``,
  the normalisation segments get, so that a term matches however its spaces were typed. An empty term, a term
  longer than ``MAX_TERM_CHARACTERS`` or a glossary past ``MAX_ENTRIES`` raises InvalidGlossaryError naming the
  location.
- Rows with the same source term and case mode merge into one entry whose targets are the alternatives, in
  order of appearance (case-insensitive entries compare sources with ``str.casefold``).
- Warnings, not errors: the same target twice (DUPLICATE, the repeat is dropped), one target with two statuses
  (CONFLICT, the first status is kept), two different preferred targets from different groups (CONFLICT, both
  kept, the first ranks first), two different per-entry modes (CONFLICT, the first is kept), entries without
  an allowed target, and targets that one entry forbids and another allows. A group is one TSV row or one TBX
  concept: synonyms listed inside one TBX concept are not a conflict.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from pathlib import Path

from decoder.errors import InvalidTextError
from decoder.terminology.errors import InvalidGlossaryError
from decoder.terminology.glossary import (
    MAX_ENTRIES,
    MAX_NOTE_CHARACTERS,
    MAX_TARGETS_PER_ENTRY,
    MAX_TERM_CHARACTERS,
    Glossary,
    GlossaryEntry,
    GlossaryWarning,
    TargetTerm,
    TermMode,
    TermStatus,
    WarningKind,
)
from decoder.text.normalize import check_text, normalize


@dataclass(slots=True)
class _PendingTarget:
    term: TargetTerm
    origin: str
    group: str


@dataclass(slots=True)
class _PendingEntry:
    source: str
    case_sensitive: bool
    mode: TermMode | None
    mode_origin: str
    note: str
    origin: str
    targets: list[_PendingTarget] = field(default_factory=list)


class GlossaryBuilder:
    """Collects rows in order and builds one Glossary; errors name ``where`` (a file path or a label)."""

    def __init__(self, where: str | Path) -> None:
        self._where = where
        self._entries: dict[tuple[str, bool], _PendingEntry] = {}
        self._warnings: list[GlossaryWarning] = []

    def fail(self, message: str, location: int | str | None) -> InvalidGlossaryError:
        """The error to raise for a problem at ``location`` (a line number or an element description)."""
        return InvalidGlossaryError(self._where, message, location)

    def warn(self, kind: WarningKind, origin: str, message: str) -> None:
        self._warnings.append(GlossaryWarning(kind, origin, message))

    def clean_term(self, text: str, what: str, location: int | str | None) -> str:
        """``text`` checked and normalised; raises InvalidGlossaryError if it is empty, too long or has control
        characters. ``what`` names the field in messages ("source term")."""
        try:
            check_text(text)
        except InvalidTextError as error:
            raise self.fail(f"{what}: {error}", location) from error
        cleaned = normalize(text)
        if not cleaned:
            raise self.fail(f"empty {what}", location)
        if len(cleaned) > MAX_TERM_CHARACTERS:
            raise self.fail(
                f"{what} has {len(cleaned)} characters; the limit is {MAX_TERM_CHARACTERS}. "
                "A glossary term is a word or a phrase, not a sentence.",
                location,
            )
        return cleaned

    def clean_note(self, text: str, location: int | str | None) -> str:
        # Notes are free text for people; line breaks inside them (TBX definitions span lines) become spaces.
        cleaned = " ".join(text.split())
        if len(cleaned) > MAX_NOTE_CHARACTERS:
            raise self.fail(f"note has {len(cleaned)} characters; the limit is {MAX_NOTE_CHARACTERS}", location)
        return cleaned

    def add(
        self,
        source: str,
        target: str,
        status: TermStatus,
        *,
        case_sensitive: bool = False,
        mode: TermMode | None = None,
        note: str = "",
        target_note: str = "",
        origin: str,
        location: int | str | None,
        group: str | None = None,
    ) -> None:
        """Add one (source, target) row. ``origin`` is how warnings and the entry cite it (``"demo.tsv:5"``);
        ``location`` is what an error names; ``group`` defaults to ``origin`` (one row = one group)."""
        source = self.clean_term(source, "source term", location)
        target = self.clean_term(target, "target term", location)
        note = self.clean_note(note, location)
        target_note = self.clean_note(target_note, location)
        group = origin if group is None else group
        key = (source if case_sensitive else source.casefold(), case_sensitive)
        entry = self._entries.get(key)
        if entry is None:
            if len(self._entries) >= MAX_ENTRIES:
                raise self.fail(
                    f"more than {MAX_ENTRIES} entries; split the glossary into several smaller ones", location
                )
            entry = _PendingEntry(source, case_sensitive, mode, origin if mode else "", note, origin)
            self._entries[key] = entry
        else:
            self._merge_attributes(entry, mode, note, origin)
        self._add_target(entry, TargetTerm(target, status, target_note), origin, group, location)

    def _merge_attributes(self, entry: _PendingEntry, mode: TermMode | None, note: str, origin: str) -> None:
        if mode is not None:
            if entry.mode is None:
                entry.mode, entry.mode_origin = mode, origin
            elif mode is not entry.mode:
                self.warn(
                    WarningKind.CONFLICT,
                    origin,
                    f"mode {mode.value!r} for {entry.source!r} contradicts mode {entry.mode.value!r} "
                    f"given at {entry.mode_origin}; keeping {entry.mode.value!r}",
                )
        if note and not entry.note:
            entry.note = note

    def _add_target(
        self, entry: _PendingEntry, term: TargetTerm, origin: str, group: str, location: int | str | None
    ) -> None:
        for existing in entry.targets:
            if existing.term.text != term.text:
                continue
            if existing.term.status is term.status:
                self.warn(
                    WarningKind.DUPLICATE,
                    origin,
                    f"{entry.source!r} -> {term.text!r} repeats {existing.origin}; ignored",
                )
            else:
                self.warn(
                    WarningKind.CONFLICT,
                    origin,
                    f"{entry.source!r} -> {term.text!r} is {term.status.value} here but "
                    f"{existing.term.status.value} at {existing.origin}; keeping {existing.term.status.value}",
                )
            return
        if term.status is TermStatus.PREFERRED:
            for existing in entry.targets:
                if existing.term.status is TermStatus.PREFERRED and existing.group != group:
                    self.warn(
                        WarningKind.CONFLICT,
                        origin,
                        f"two preferred targets for {entry.source!r}: {existing.term.text!r} "
                        f"({existing.origin}) and {term.text!r}; {existing.term.text!r} is used first",
                    )
                    break
        if len(entry.targets) >= MAX_TARGETS_PER_ENTRY:
            raise self.fail(
                f"{entry.source!r} has more than {MAX_TARGETS_PER_ENTRY} target terms; the limit is "
                f"{MAX_TARGETS_PER_ENTRY}",
                location,
            )
        entry.targets.append(_PendingTarget(term, origin, group))

    def build(self, name: str, source_language: str, target_language: str) -> Glossary:
        """The glossary of every row added so far, entries in order of first appearance, with all warnings."""
        entries = tuple(
            GlossaryEntry(
                pending.source,
                tuple(target.term for target in pending.targets),
                pending.case_sensitive,
                pending.mode,
                pending.note,
                pending.origin,
            )
            for pending in self._entries.values()
        )
        warnings = list(self._warnings)
        allowed_by: dict[str, str] = {}
        for entry in entries:
            if not entry.allowed_targets:
                warnings.append(
                    GlossaryWarning(
                        WarningKind.NO_ALLOWED_TARGET,
                        entry.origin,
                        f"{entry.source!r} has only deprecated or superseded targets; it forbids them but "
                        "cannot be enforced",
                    )
                )
            for target in entry.allowed_targets:
                allowed_by.setdefault(target.text, entry.origin)
        for entry in entries:
            for target in entry.forbidden_targets:
                if target.text in allowed_by:
                    warnings.append(
                        GlossaryWarning(
                            WarningKind.FORBIDDEN_AND_ALLOWED,
                            entry.origin,
                            f"{target.text!r} is {target.status.value} for {entry.source!r} but allowed by the "
                            f"entry at {allowed_by[target.text]}; it is not removed from other translations",
                        )
                    )
        return Glossary(name, source_language, target_language, entries, tuple(warnings))
