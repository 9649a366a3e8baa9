"""A parallel corpus as one tab-separated file: ``source<TAB>target`` on every line (UTF-8).

The format is that of the IANA media type text/tab-separated-values: no quoting and no escapes, so a field can
never contain a tab or a line break. A line with any other number of fields is an error, not a silent skip:
it nearly always means a stray tab or a broken export, and guessing would misalign the corpus. Whether the
first line is a header is the caller's to say (``has_header``); it is never guessed.
"""

from __future__ import annotations

from collections import Counter
from collections.abc import Iterator
from pathlib import Path

from decoder.corpus.lines import iter_lines
from decoder.corpus.records import CorpusReader, RawPair, SkipReason
from decoder.errors import InputFileError

NUM_COLUMNS = 2


def read_tsv(path: str | Path, has_header: bool = False) -> CorpusReader:
    """Pairs (first column, second column) of every line, located as ``"<file name>:<line>"``.

    With ``has_header`` the first line is skipped unread (it is still line 1 in locations)."""
    path = Path(path)

    def generate(skipped: Counter[SkipReason]) -> Iterator[RawPair]:
        name = path.name
        for line_number, text in iter_lines(path):
            if has_header and line_number == 1:
                continue
            fields = text.split("\t")
            if len(fields) != NUM_COLUMNS:
                raise InputFileError(
                    path,
                    f"expected {NUM_COLUMNS} tab-separated columns (source, target), found {len(fields)}",
                    line_number,
                )
            yield RawPair(fields[0], fields[1], f"{name}:{line_number}")

    return CorpusReader(generate)
