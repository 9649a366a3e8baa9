"""The in-memory glossary: entries of a source term and its target alternatives, each with a usage status.

A ``Glossary`` is what every reader (TSV/CSV, TBX, inline rows) produces and what matching and reporting read.
Statuses follow the TBX administrative-status picklist (ISO 30042, TBX-Basic dialect): preferred and admitted
target terms are allowed, deprecated and superseded ones are forbidden. ``GlossaryEntry.allowed_targets`` lists
the allowed ones, preferred first, so the first alternative is the one to use by default. Terms are stored as
``decoder.text.normalize`` leaves them (NFC, single spaces), the same form segments are matched in.
"""

from __future__ import annotations

from dataclasses import dataclass, field
from enum import StrEnum

# Size limits: a glossary is loaded into every serving process, so an accidental multi-gigabyte upload or a
# whole document pasted into a term cell must fail early with a clear message rather than exhaust memory.
MAX_ENTRIES = 100_000  # entries (distinct source terms) per glossary
MAX_TERM_CHARACTERS = 1_000  # characters per source or target term, after normalisation
MAX_TARGETS_PER_ENTRY = 50  # target alternatives per entry, all statuses together
MAX_NOTE_CHARACTERS = 10_000  # characters per note
MAX_FILE_BYTES = 256 * 1024 * 1024  # size of a glossary file on disk


class TermStatus(StrEnum):
    """Usage status of a target term (TBX administrativeStatus, ISO 30042 / TBX-Basic)."""

    PREFERRED = "preferred"
    ADMITTED = "admitted"
    DEPRECATED = "deprecated"
    SUPERSEDED = "superseded"

    @property
    def is_allowed(self) -> bool:
        """True for preferred and admitted terms; deprecated and superseded terms must not be output."""
        return self in (TermStatus.PREFERRED, TermStatus.ADMITTED)


class TermMode(StrEnum):
    """How the decoder applies a matched term (DESIGN.md, "Constraints from glossaries")."""

    ENFORCE = "enforce"  # the span is translated by one of the allowed targets only
    PREFER = "prefer"  # the glossary option is added with the ``glossary`` feature; the model may ignore it
    OFF = "off"  # the term is matched and reported, not applied


# Accepted spellings of each status: our names, the TBX picklist values ("preferredTerm-admn-sts", TBX-Basic
# DCA schematron) and the same without the suffix ("preferredTerm"), compared case-insensitively.
_STATUS_SPELLINGS = {
    spelling.lower(): status
    for status in TermStatus
    for spelling in (status.value, f"{status.value}Term", f"{status.value}Term-admn-sts")
}
_TRUE_WORDS = frozenset({"yes", "true", "1"})
_FALSE_WORDS = frozenset({"no", "false", "0"})


def parse_status(text: str) -> TermStatus | None:
    """The status named by ``text`` (any case; empty means preferred), or None if it names no status."""
    cleaned = text.strip().lower()
    if not cleaned:
        return TermStatus.PREFERRED
    return _STATUS_SPELLINGS.get(cleaned)


def parse_boolean(text: str) -> bool | None:
    """yes/no, true/false, 1/0 in any case (empty means False), or None for anything else."""
    cleaned = text.strip().lower()
    if not cleaned or cleaned in _FALSE_WORDS:
        return False
    if cleaned in _TRUE_WORDS:
        return True
    return None


def parse_mode(text: str) -> TermMode | None:
    """The mode named by ``text`` (any case); raises ValueError for an unknown name. Empty gives None."""
    cleaned = text.strip().lower()
    if not cleaned:
        return None
    return TermMode(cleaned)


@dataclass(frozen=True, slots=True)
class TargetTerm:
    """One target-language alternative of an entry."""

    text: str
    status: TermStatus
    note: str = ""


@dataclass(frozen=True, slots=True)
class GlossaryEntry:
    """A source term and its target alternatives in file order.

    ``case_sensitive`` entries match (and are looked for in the output) with their exact casing; all others
    ignore case. ``mode`` overrides the request's mode for this entry when not None. ``origin`` says where the
    entry was first defined: ``"demo.tsv:5"``, ``"terms.tbx:<conceptEntry id='c7'>"`` or ``"inline:row 3"``."""

    source: str
    targets: tuple[TargetTerm, ...]
    case_sensitive: bool = False
    mode: TermMode | None = None
    note: str = ""
    origin: str = ""

    @property
    def allowed_targets(self) -> tuple[TargetTerm, ...]:
        """Preferred targets, then admitted ones, each group in file order: the first is the default choice."""
        preferred = tuple(target for target in self.targets if target.status is TermStatus.PREFERRED)
        admitted = tuple(target for target in self.targets if target.status is TermStatus.ADMITTED)
        return preferred + admitted

    @property
    def forbidden_targets(self) -> tuple[TargetTerm, ...]:
        """Deprecated and superseded targets of this entry, in file order."""
        return tuple(target for target in self.targets if not target.status.is_allowed)


class WarningKind(StrEnum):
    CONFLICT = "conflict"  # two preferred targets for one source, or one target with two statuses
    DUPLICATE = "duplicate"  # the same source, case mode and target given twice; the repeat is ignored
    IGNORED_COLUMN = "ignored_column"  # a TSV/CSV column this reader does not know
    SKIPPED = "skipped"  # a TBX concept or language section that gives no entry
    NO_ALLOWED_TARGET = "no_allowed_target"  # an entry whose targets are all deprecated or superseded
    FORBIDDEN_AND_ALLOWED = "forbidden_and_allowed"  # a target forbidden by one entry and allowed by another
    UNMATCHABLE = "unmatchable"  # a source term that contains a protected token (number, URL, placeholder)


@dataclass(frozen=True, slots=True)
class GlossaryWarning:
    """Something worth telling the glossary's author that does not stop the glossary from loading."""

    kind: WarningKind
    origin: str  # file and line or element, as in GlossaryEntry.origin
    message: str

    def __str__(self) -> str:
        return f"{self.origin}: {self.message}"


def forbidden_target_texts(entries: tuple[GlossaryEntry, ...]) -> tuple[str, ...]:
    """Texts of deprecated or superseded targets that no entry of the glossary allows, sorted.

    A target that one entry forbids and another allows (two concepts that share a word) is left out: removing
    it from every translation option would break the entry that asks for it."""
    forbidden = {target.text for entry in entries for target in entry.forbidden_targets}
    allowed = {target.text for entry in entries for target in entry.allowed_targets}
    return tuple(sorted(forbidden - allowed))


@dataclass(frozen=True, slots=True, weakref_slot=True)
class Glossary:
    """A named, immutable set of entries for one language pair (BCP 47 tags).

    ``forbidden_targets`` is derived once: the target texts the decoder removes from all translation options.
    Weak references are allowed so matching can cache one compiled index per glossary object."""

    name: str
    source_language: str
    target_language: str
    entries: tuple[GlossaryEntry, ...]
    warnings: tuple[GlossaryWarning, ...] = ()
    forbidden_targets: tuple[str, ...] = field(init=False, repr=False, compare=False)

    def __post_init__(self) -> None:
        if len(self.entries) > MAX_ENTRIES:
            raise ValueError(f"glossary {self.name!r} has {len(self.entries)} entries; the limit is {MAX_ENTRIES}")
        object.__setattr__(self, "forbidden_targets", forbidden_target_texts(self.entries))

    def __len__(self) -> int:
        return len(self.entries)
