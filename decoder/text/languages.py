"""Which language-specific rules apply to a BCP 47 tag, and the abbreviation lists those rules read.

Rules are chosen by the primary language subtag (RFC 5646 section 2.2.1): "es-MX" and "es-419" get the
Spanish rules. Tags without rules of their own get the generic rules (no abbreviations, no elision), which
suit most Latin-script languages well enough.
"""

from __future__ import annotations

import functools
from pathlib import Path

from decoder.errors import InputFileError

DATA_DIR = Path(__file__).parent / "data"
GENERIC = ""  # rule set name for languages without their own rules
LANGUAGES_WITH_RULES = frozenset({"en", "es", "fr"})


def primary_subtag(language: str) -> str:
    """The lowercased primary subtag of a BCP 47 tag ("es-MX" -> "es"); "_" is accepted as a separator too."""
    return language.replace("_", "-").split("-", 1)[0].strip().lower()


def rule_set(language: str) -> str:
    """The name of the rule set for ``language``: its primary subtag if it has rules, else GENERIC."""
    subtag = primary_subtag(language)
    return subtag if subtag in LANGUAGES_WITH_RULES else GENERIC


def load_abbreviations(path: str | Path) -> tuple[tuple[str, ...], ...]:
    """The entries of an abbreviation file, each as its space-separated parts ("p. ej." -> ("p.", "ej.")).

    File format: UTF-8, one entry per line; blank lines and lines starting with "#" are ignored. Every part
    must end with a period and hold at least one letter. Raises InputFileError naming the file and line."""
    entries: list[tuple[str, ...]] = []
    try:
        lines = Path(path).read_text(encoding="utf-8").splitlines()
    except (OSError, UnicodeDecodeError) as error:
        raise InputFileError(path, f"cannot read abbreviation list: {error}") from error
    for line_number, line in enumerate(lines, start=1):
        entry = line.strip()
        if not entry or entry.startswith("#"):
            continue
        parts = tuple(entry.split())
        for part in parts:
            if not part.endswith(".") or not any(character.isalpha() for character in part):
                raise InputFileError(
                    path, f"abbreviation part {part!r} must contain a letter and end with a period", line_number
                )
        entries.append(parts)
    return tuple(entries)


def abbreviations(language: str) -> tuple[tuple[str, ...], ...]:
    """Abbreviation entries of the rule set for ``language`` (empty for the generic rules)."""
    return _abbreviations_of_rule_set(rule_set(language))


@functools.cache  # one entry per rule set, so the cache stays small
def _abbreviations_of_rule_set(name: str) -> tuple[tuple[str, ...], ...]:
    if name == GENERIC:
        return ()
    return load_abbreviations(DATA_DIR / f"abbreviations-{name}.txt")
