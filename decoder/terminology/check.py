"""``check_glossary``: load a glossary file and describe it, for ``phrasework glossary check FILE``.

Besides the reader's own warnings it reports entries that can never match because their source term
contains a protected token (a number, URL, placeholder or markup tag, which segments hide from matching).
"""

from __future__ import annotations

from dataclasses import dataclass
from pathlib import Path

from decoder.terminology.glossary import GlossaryWarning, WarningKind
from decoder.terminology.matching import index_of
from decoder.terminology.store import read_glossary_file


@dataclass(frozen=True, slots=True)
class GlossaryCheck:
    path: str
    name: str
    num_entries: int
    num_target_alternatives: int  # all target terms of all entries, every status
    num_forbidden_terms: int  # distinct target texts removed from all translations (Glossary.forbidden_targets)
    num_case_sensitive_entries: int
    num_multi_word_entries: int  # source terms of two or more word tokens ("sync hub"; "sign-in" is one word)
    num_unmatchable_entries: int
    warnings: tuple[GlossaryWarning, ...]

    @property
    def is_clean(self) -> bool:
        return not self.warnings


def check_glossary(path: str | Path, source_language: str, target_language: str) -> GlossaryCheck:
    """Statistics and warnings of the glossary file at ``path``; raises the readers' InvalidGlossaryError
    (file and line) if it cannot be loaded at all."""
    glossary = read_glossary_file(path, source_language, target_language)
    index = index_of(glossary)
    unmatchable = [
        GlossaryWarning(
            WarningKind.UNMATCHABLE,
            glossary.entries[entry_index].origin,
            f"{glossary.entries[entry_index].source!r} contains a number, URL, placeholder or tag, which "
            "segments protect from matching; this entry can never match",
        )
        for entry_index in index.unmatchable
    ]
    return GlossaryCheck(
        str(path),
        glossary.name,
        len(glossary.entries),
        sum(len(entry.targets) for entry in glossary.entries),
        len(glossary.forbidden_targets),
        sum(entry.case_sensitive for entry in glossary.entries),
        int((index.num_words >= 2).sum()),
        len(index.unmatchable),
        glossary.warnings + tuple(unmatchable),
    )
