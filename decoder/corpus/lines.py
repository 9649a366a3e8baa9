"""UTF-8 text lines of a file, one at a time, with 1-based line numbers (shared by the plain and TSV readers).

Lines are split on LF only, read as bytes and decoded one by one: a lone CR or a Unicode line separator
(U+2028, U+0085) inside a segment therefore never shifts the line alignment of a parallel pair, and invalid
UTF-8 is reported with the line it is on. A trailing CR (CRLF files) and a UTF-8 byte order mark at the start
of the file are removed.
"""

from __future__ import annotations

from collections.abc import Iterator
from pathlib import Path

from decoder.corpus.records import open_binary
from decoder.errors import InputFileError

BYTE_ORDER_MARK = "\ufeff"


def iter_lines(path: Path) -> Iterator[tuple[int, str]]:
    """Yield ``(line_number, text)`` for every line of ``path`` (text without its line ending).

    Raises InputFileError naming the file and line for bytes that are not UTF-8. A final line without a line
    ending counts as a line; an empty file yields nothing."""
    with open_binary(path) as file:
        for line_number, raw in enumerate(file, start=1):
            if raw.endswith(b"\n"):
                raw = raw[:-1]
            if raw.endswith(b"\r"):
                raw = raw[:-1]
            try:
                text = raw.decode("utf-8")
            except UnicodeDecodeError as error:
                raise InputFileError(
                    path, f"invalid UTF-8 at byte {error.start + 1} of the line ({error.reason})", line_number
                ) from error
            if line_number == 1 and text.startswith(BYTE_ORDER_MARK):
                text = text[1:]
            yield line_number, text
