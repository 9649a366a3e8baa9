"""The records every corpus reader yields, and the single-pass reader object that carries their skip counts.

A reader turns one corpus file (or a line-aligned pair of files) into ``RawPair`` values, one at a time, so a
corpus of any size is read in constant memory. Units the format itself marks as unusable (a gettext header or
fuzzy entry, a TMX unit without one of the languages) are not errors: the reader skips them and counts them
by ``SkipReason`` so the training summary can say how much of the file was used.
"""

from __future__ import annotations

from collections import Counter
from collections.abc import Callable, Iterator
from dataclasses import dataclass
from enum import StrEnum
from pathlib import Path
from typing import BinaryIO

from decoder.errors import InputFileError


@dataclass(frozen=True, slots=True)
class RawPair:
    """One untokenized segment pair, exactly as the file gave it (after format-level unescaping).

    ``location`` says where the pair came from, for error messages and reports: ``"train.en:12"`` (file name
    and 1-based line), ``"memory.tmx:<tu> #7"`` (1-based unit number) or ``"app.mo:string #3"``. Segments from
    TMX and gettext files may contain line breaks; normalising whitespace is the job of ``decoder.text``."""

    source: str
    target: str
    location: str


class SkipReason(StrEnum):
    """Why a reader passed over a unit of its file without yielding a pair."""

    HEADER = "header"  # gettext header entry (empty msgid): metadata, not a translation
    FUZZY = "fuzzy"  # gettext "#, fuzzy" entry: a guess the translator has not confirmed
    UNTRANSLATED = "untranslated"  # gettext entry whose msgstr is empty
    OBSOLETE = "obsolete"  # gettext "#~" entry: no longer used by the program
    MISSING_SOURCE_LANGUAGE = "missing_source_language"  # TMX unit without a variant in the source language
    MISSING_TARGET_LANGUAGE = "missing_target_language"  # TMX unit with the source but not the target language


PairGenerator = Callable[[Counter[SkipReason]], Iterator[RawPair]]


class CorpusReader(Iterator[RawPair]):
    """A single pass over a corpus: iterate it for ``RawPair`` values, then read ``skipped``.

    Nothing is opened until the first pair is requested, so a reader can be built early and handed around.
    ``skipped`` grows while the pass runs and is complete once iteration has finished. To read the corpus
    again, create a new reader."""

    __slots__ = ("_pairs", "_skipped")

    def __init__(self, generate: PairGenerator) -> None:
        self._skipped: Counter[SkipReason] = Counter()
        self._pairs = generate(self._skipped)

    def __iter__(self) -> CorpusReader:
        return self

    def __next__(self) -> RawPair:
        return next(self._pairs)

    @property
    def skipped(self) -> dict[SkipReason, int]:
        """Units skipped so far, by reason (reasons that never occurred are absent)."""
        return dict(self._skipped)

    def close(self) -> None:
        """Stop early and release the open file(s); later ``next`` calls raise StopIteration."""
        close = getattr(self._pairs, "close", None)
        if close is not None:
            close()

    def __enter__(self) -> CorpusReader:
        return self

    def __exit__(self, *exc_info: object) -> None:
        self.close()


def open_binary(path: Path) -> BinaryIO:
    """Open ``path`` for reading bytes, turning OSError (missing file, permissions) into InputFileError.

    The caller closes the file (use it in a ``with`` block)."""
    try:
        return open(path, "rb")
    except OSError as error:
        raise InputFileError(path, f"cannot be opened: {error.strerror or error}") from error
