"""A parallel corpus as two line-aligned plain text files: line k of one translates line k of the other.

Both files are read in lockstep, one line at a time. If one file ends first, the pair is broken from there, so
the reader raises InputFileError naming the shorter file and its last line; the pairs before that point
have already been yielded (the check cannot come earlier without reading the files twice).
"""

from __future__ import annotations

from collections import Counter
from collections.abc import Iterator
from itertools import zip_longest
from pathlib import Path

from decoder.corpus.lines import iter_lines
from decoder.corpus.records import CorpusReader, RawPair, SkipReason
from decoder.errors import InputFileError


def read_plain_pair(source_path: str | Path, target_path: str | Path) -> CorpusReader:
    """Pairs of line k of ``source_path`` and line k of ``target_path`` (UTF-8), located as ``"<name>:k"``.

    Every line becomes a pair, empty lines included (cleaning decides what to drop), so line numbers in
    reports match the files. ``<name>`` is the source file's name without its folder."""
    source_path, target_path = Path(source_path), Path(target_path)

    def generate(skipped: Counter[SkipReason]) -> Iterator[RawPair]:
        source_name = source_path.name
        for source_line, target_line in zip_longest(iter_lines(source_path), iter_lines(target_path)):
            if source_line is None or target_line is None:
                # ``number`` is the last line both files had; the shorter file ended right after it.
                longer_line = target_line if source_line is None else source_line
                number = longer_line[0] - 1
                shorter, longer = (source_path, target_path) if source_line is None else (target_path, source_path)
                if number == 0:
                    raise InputFileError(shorter, f"is empty, but {longer} has lines; the two must be line-aligned")
                raise InputFileError(
                    shorter,
                    f"ends after line {number}, but {longer} has more lines; the two must be line-aligned",
                    number,
                )
            yield RawPair(source_line[1], target_line[1], f"{source_name}:{source_line[0]}")

    return CorpusReader(generate)
