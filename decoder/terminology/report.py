"""The per-segment term report: for each matched term, which target was used and where it is in the output.

``build_term_report`` is what the decoder and the service call after detokenizing a translation. It looks
for each matched term's allowed targets in the output text, giving every output occurrence to at most one
source term (``assign_occurrences``, a maximum bipartite matching, so two source occurrences of "backup"
need two occurrences of "copia de seguridad"). Terms that lost an overlap (``TermMatchResult.conflicts``)
appear with the conflict as their reason.

Finding a target in the output (``find_in_output``): the target's words in order, separated by any
whitespace, at token boundaries: not preceded by a letter or digit, or by one joined with a hyphen, and not
followed by a letter or digit, or by a hyphen or apostrophe joined to one. So "enlace" is not found inside
"enlaces" or "enlace-compartido", and a French elision before a term ("l'espace") does not hide it. Case is
ignored unless the entry is case-sensitive, since output casing is restored by the truecaser and a term may
start the sentence.
"""

from __future__ import annotations

import functools
import re
from collections.abc import Sequence
from dataclasses import dataclass
from enum import StrEnum

from decoder.terminology.glossary import TermMode
from decoder.terminology.matching import ConflictReason, Span, TermMatch, TermMatchResult

_JOINERS = "\\-\u2010\u2011"
_AFTER_JOINERS = _JOINERS + "'\u2019"


class TermReason(StrEnum):
    """Why a matched term is not in the output (conflict reasons come from ``ConflictReason``)."""

    MODE_OFF = "mode_off"  # the term's mode is off: matched and reported, not applied
    NO_ALLOWED_TARGET = "no_allowed_target"  # the entry has only deprecated or superseded targets
    NOT_IN_OUTPUT = "not_in_output"  # no allowed target (or not the one the decoder used) is in the output


@dataclass(frozen=True, slots=True)
class TermReportItem:
    """One source term occurrence. Source spans are characters of the normalised source text
    (``PreparedSegment.text``); output spans are characters of the output string."""

    source_span: Span
    source_text: str
    entry_source: str  # the glossary's spelling of the source term
    glossary_name: str
    origin: str  # where the entry is defined (file:line or TBX element)
    mode: TermMode
    target: str | None  # the target found in (or, if the decoder said so, used for) the output
    in_output: bool
    output_span: Span | None
    reason: TermReason | ConflictReason | None  # None exactly when the term was applied
    forbidden_in_output: tuple[tuple[str, Span], ...] = ()  # deprecated targets of this entry in the output


@dataclass(frozen=True, slots=True)
class SegmentTermReport:
    items: tuple[TermReportItem, ...]  # in source order

    @property
    def num_applied(self) -> int:
        return sum(item.reason is None for item in self.items)


@functools.lru_cache(maxsize=4096)
def _pattern(term: str, case_sensitive: bool) -> re.Pattern[str]:
    words = term.split()
    body = r"\s+".join(re.escape(word) for word in words)
    before = rf"(?<!\w)(?<!\w[{_JOINERS}])" if re.match(r"\w", words[0]) else ""
    after = rf"(?!\w)(?![{_AFTER_JOINERS}]\w)" if re.search(r"\w$", words[-1]) else ""
    return re.compile(before + body + after, 0 if case_sensitive else re.IGNORECASE)


def find_in_output(output_text: str, target_term: str, case_sensitive: bool) -> list[Span]:
    """Every non-overlapping occurrence of ``target_term`` in ``output_text`` on token boundaries, left to
    right, as character spans of ``output_text``; [] for an empty term."""
    if not target_term.strip():
        return []
    return [Span(*found.span()) for found in _pattern(target_term, case_sensitive).finditer(output_text)]


def locate_in_output(output_text: str, target_term: str, case_sensitive: bool) -> Span | None:
    """The first occurrence of ``target_term`` in ``output_text`` on token boundaries, or None."""
    spans = find_in_output(output_text, target_term, case_sensitive)
    return spans[0] if spans else None


def assign_occurrences(
    wanted: Sequence[Sequence[str]], case_sensitive: Sequence[bool], output_text: str
) -> list[tuple[str, Span] | None]:
    """For each source occurrence k (its acceptable targets ``wanted[k]``, in order of preference), the
    target and output span given to it, or None; each output span is given to at most one occurrence.

    The assignment has the largest possible number of satisfied occurrences (Kuhn's augmenting-path
    algorithm for maximum bipartite matching); among those, earlier occurrences and preferred targets are
    tried first, so the result is deterministic. A target occurrence nested inside a longer one found for
    another term ("copia" inside "copia de seguridad") is not counted separately; occurrences that overlap
    only partly (rare: the end of one target is the start of another) both count."""
    options: list[list[tuple[str, Span]]] = []
    for targets, is_case_sensitive in zip(wanted, case_sensitive, strict=True):
        options.append(
            [(target, span) for target in targets for span in find_in_output(output_text, target, is_case_sensitive)]
        )
    all_spans = {span for choices in options for _target, span in choices}
    nested = {
        span
        for span in all_spans
        for other in all_spans
        if other != span and other.start <= span.start and span.end <= other.end
    }
    options = [[choice for choice in choices if choice[1] not in nested] for choices in options]
    holder: dict[Span, int] = {}  # output span -> the occurrence it is given to

    def augment(occurrence: int, visited: set[Span]) -> bool:
        for _target, span in options[occurrence]:
            if span in visited:
                continue
            visited.add(span)
            if span not in holder or augment(holder[span], visited):
                holder[span] = occurrence
                return True
        return False

    for occurrence in range(len(options)):
        augment(occurrence, set())
    given: list[tuple[str, Span] | None] = [None] * len(options)
    for span, occurrence in holder.items():
        given[occurrence] = next(choice for choice in options[occurrence] if choice[1] == span)
    return given


def build_term_report(
    result: TermMatchResult,
    output_text: str,
    default_mode: TermMode,
    targets_used: Sequence[str | None] | None = None,
) -> SegmentTermReport:
    """The report for one translated segment.

    ``default_mode`` is the request's mode (an entry's own mode wins). ``targets_used[k]``, if given, is the
    target the decoder used for ``result.matches[k]`` (None if it used none); only that target is then looked
    for. Without it, any allowed target counts. A term under mode off is still looked for (any allowed target),
    so the report shows where the model produced it on its own; its reason stays ``mode_off``: not applied."""
    matches = result.matches
    if targets_used is not None and len(targets_used) != len(matches):
        raise ValueError(f"{len(targets_used)} targets_used for {len(matches)} matches; give one per match")
    modes = [match.mode or default_mode for match in matches]
    wanted: list[tuple[str, ...]] = []
    for number, (match, mode) in enumerate(zip(matches, modes)):
        if targets_used is not None and mode is not TermMode.OFF:
            used = targets_used[number]
            wanted.append((used,) if used is not None else ())
        else:
            wanted.append(match.allowed_targets)
    given = assign_occurrences(wanted, [match.entry.case_sensitive for match in matches], output_text)
    items = [
        _item(match, mode, found, output_text, targets_used[number] if targets_used is not None else None)
        for number, (match, mode, found) in enumerate(zip(matches, modes, given))
    ]
    for conflict in result.conflicts:
        loser = conflict.match
        items.append(_base_item(loser, loser.mode or default_mode, conflict.reason))
    items.sort(key=lambda item: (item.source_span.start, item.reason is not None))
    return SegmentTermReport(tuple(items))


def _base_item(match: TermMatch, mode: TermMode, reason: TermReason | ConflictReason | None) -> TermReportItem:
    return TermReportItem(
        match.source_span,
        match.source_text,
        match.entry.source,
        match.glossary_name,
        match.entry.origin,
        mode,
        None,
        False,
        None,
        reason,
    )


def _item(
    match: TermMatch, mode: TermMode, found: tuple[str, Span] | None, output_text: str, used: str | None
) -> TermReportItem:
    forbidden = tuple(
        (text, span)
        for text in match.forbidden_targets
        for span in find_in_output(output_text, text, match.entry.case_sensitive)
    )
    if mode is TermMode.OFF:
        reason: TermReason | None = TermReason.MODE_OFF
    elif not match.allowed_targets:
        reason = TermReason.NO_ALLOWED_TARGET
    elif found is None:
        reason = TermReason.NOT_IN_OUTPUT
    else:
        reason = None
    base = _base_item(match, mode, reason)
    target = found[0] if found is not None else used
    return TermReportItem(
        base.source_span,
        base.source_text,
        base.entry_source,
        base.glossary_name,
        base.origin,
        mode,
        target,
        found is not None,
        found[1] if found is not None else None,
        reason,
        forbidden,
    )
