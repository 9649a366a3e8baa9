"""Glossaries as delimited text with a header row: TSV (tab), CSV (comma) or semicolon-separated, UTF-8.

Columns, named in the first line (any case; spaces and hyphens read as "_", so "Case sensitive" works):

    source          required  the source-language term
    target          required  one target-language term; several rows with one source give alternatives
    case_sensitive  optional  yes/no, true/false, 1/0 (empty: no)
    status          optional  preferred, admitted, deprecated or superseded (empty: preferred); the TBX
                              spellings ("deprecatedTerm-admn-sts") are accepted too
    note            optional  free text for translators and reports
    mode            optional  enforce, prefer or off: overrides the request's mode for this entry (empty: none)

Other columns are ignored with a warning. The delimiter is found from the header: the extension's delimiter
(".tsv"/".tab": tab, ".csv": comma) is tried first, then tab, comma and semicolon; the first one that splits
the header into columns that include both "source" and "target" wins. Tab-separated files are read as IANA
text/tab-separated-values (no quoting, so a term may contain a double quote); comma- and semicolon-separated
files use RFC 4180 quoting. Blank lines are skipped. Errors name the file and the line a row starts on.
"""

from __future__ import annotations

import csv
import io
from pathlib import Path

from decoder.terminology.building import GlossaryBuilder
from decoder.terminology.glossary import (
    MAX_FILE_BYTES,
    Glossary,
    TermMode,
    WarningKind,
    parse_boolean,
    parse_mode,
    parse_status,
)

REQUIRED_COLUMNS = ("source", "target")
OPTIONAL_COLUMNS = ("case_sensitive", "status", "note", "mode")
_DELIMITER_OF_SUFFIX = {".tsv": "\t", ".tab": "\t", ".csv": ","}
_DELIMITERS = ("\t", ",", ";")
_BYTE_ORDER_MARK = "\ufeff"


def read_delimited_glossary(
    path: str | Path, source_language: str, target_language: str, name: str | None = None
) -> Glossary:
    """The glossary in ``path`` (named after the file stem unless ``name`` is given).

    Raises InvalidGlossaryError naming the file and line for: a missing required column, a column named twice,
    an empty source or target term, an unknown status or mode, a bad boolean, a row with more fields than the
    header, invalid UTF-8, and the size limits of ``decoder.terminology.glossary``."""
    path = Path(path)
    builder = GlossaryBuilder(path)
    text = _read_text(path, builder)
    header_line = text.split("\n", 1)[0].rstrip("\r")
    if not header_line.strip():
        raise builder.fail("empty header line; the first line must name the columns (source, target, ...)", 1)
    delimiter = _find_delimiter(path, header_line)
    if delimiter is None:
        raise builder.fail(
            f"missing required column: the header must name the columns {' and '.join(REQUIRED_COLUMNS)} "
            f"(separated by tabs, commas or semicolons); found {header_line.strip()!r}",
            1,
        )
    quoting = csv.QUOTE_NONE if delimiter == "\t" else csv.QUOTE_MINIMAL
    reader = csv.reader(io.StringIO(text, newline=""), delimiter=delimiter, quoting=quoting, strict=True)
    try:
        header = next(reader)
        columns = _columns(header, builder, path.name)
        line_end = reader.line_num
        for fields in reader:
            line_number, line_end = line_end + 1, reader.line_num
            if not any(field.strip() for field in fields):
                continue
            _add_row(builder, fields, columns, len(header), f"{path.name}:{line_number}", line_number)
    except csv.Error as error:
        raise builder.fail(f"cannot be read as delimited text: {error}", reader.line_num) from error
    return builder.build(path.stem if name is None else name, source_language, target_language)


def _read_text(path: Path, builder: GlossaryBuilder) -> str:
    try:
        size = path.stat().st_size
        if size > MAX_FILE_BYTES:
            raise builder.fail(f"file has {size} bytes; the limit is {MAX_FILE_BYTES}", None)
        data = path.read_bytes()
    except OSError as error:
        raise builder.fail(f"cannot be opened: {error.strerror or error}", None) from error
    try:
        text = data.decode("utf-8")
    except UnicodeDecodeError as error:
        line_number = data.count(b"\n", 0, error.start) + 1
        raise builder.fail(f"invalid UTF-8 ({error.reason})", line_number) from error
    return text[1:] if text.startswith(_BYTE_ORDER_MARK) else text


def _column_name(text: str) -> str:
    return "_".join(text.strip().lower().replace("-", " ").split())


def _find_delimiter(path: Path, header_line: str) -> str | None:
    preferred = _DELIMITER_OF_SUFFIX.get(path.suffix.lower())
    candidates = ((preferred,) if preferred else ()) + tuple(d for d in _DELIMITERS if d != preferred)
    for delimiter in candidates:
        quoting = csv.QUOTE_NONE if delimiter == "\t" else csv.QUOTE_MINIMAL
        try:
            header = next(csv.reader([header_line], delimiter=delimiter, quoting=quoting))
        except (csv.Error, StopIteration):
            continue
        names = {_column_name(field) for field in header}
        if all(column in names for column in REQUIRED_COLUMNS):
            return delimiter
    return None


def _columns(header: list[str], builder: GlossaryBuilder, file_name: str) -> dict[str, int]:
    """Known column name -> field index; warns about unknown columns, fails on a known column named twice."""
    columns: dict[str, int] = {}
    for index, raw in enumerate(header):
        name = _column_name(raw)
        if name in REQUIRED_COLUMNS or name in OPTIONAL_COLUMNS:
            if name in columns:
                raise builder.fail(f"column {name!r} appears twice in the header", 1)
            columns[name] = index
        elif name:
            builder.warn(WarningKind.IGNORED_COLUMN, f"{file_name}:1", f"unknown column {raw.strip()!r} ignored")
    return columns


def _add_row(
    builder: GlossaryBuilder,
    fields: list[str],
    columns: dict[str, int],
    num_columns: int,
    origin: str,
    line_number: int,
) -> None:
    if len(fields) > num_columns:
        raise builder.fail(f"{len(fields)} fields but the header names {num_columns} columns", line_number)

    def value(column: str) -> str:
        index = columns.get(column)
        return fields[index].strip() if index is not None and index < len(fields) else ""

    status = parse_status(value("status"))
    if status is None:
        raise builder.fail(
            f"unknown status {value('status')!r}; use preferred, admitted, deprecated or superseded",
            line_number,
        )
    case_sensitive = parse_boolean(value("case_sensitive"))
    if case_sensitive is None:
        raise builder.fail(
            f"case_sensitive must be yes/no, true/false or 1/0, not {value('case_sensitive')!r}", line_number
        )
    try:
        mode = parse_mode(value("mode"))
    except ValueError:
        raise builder.fail(
            f"unknown mode {value('mode')!r}; use {', '.join(mode.value for mode in TermMode)} or leave it empty",
            line_number,
        ) from None
    note = value("note")
    builder.add(
        value("source"),
        value("target"),
        status,
        case_sensitive=case_sensitive,
        mode=mode,
        note=note,
        target_note=note,
        origin=origin,
        location=line_number,
    )
