"""Finding and loading glossaries: by name from glossary folders, by path, or from inline rows.

A glossary's name is its file stem: ``load_glossary("demo", ...)`` reads ``glossaries/demo.tsv`` (or
``demo.csv``, ``demo.tbx``). Names are restricted to letters, digits, "_", "-" and "." (not leading), so a name
that came over HTTP can never reach outside the search folders. Anything that looks like a path (has a folder
separator or a known suffix, or is a ``Path``) is read as a path instead.
"""

from __future__ import annotations

import re
from collections.abc import Iterable, Mapping, Sequence
from pathlib import Path

from decoder.terminology.building import GlossaryBuilder
from decoder.terminology.errors import GlossaryNotFoundError
from decoder.terminology.glossary import (
    MAX_ENTRIES,
    Glossary,
    TermMode,
    parse_boolean,
    parse_mode,
    parse_status,
)
from decoder.terminology.tbx import read_tbx_glossary
from decoder.terminology.tsv import read_delimited_glossary

# The repository's glossary folder (DESIGN.md: glossaries/ holds the files the service and CLI load by name).
DEFAULT_GLOSSARY_DIR = Path(__file__).resolve().parents[2] / "glossaries"
GLOSSARY_SUFFIXES = (".tsv", ".csv", ".tbx")
TBX_SUFFIXES = frozenset({".tbx", ".xml"})
GLOSSARY_NAME = re.compile(r"[A-Za-z0-9_][A-Za-z0-9_.\-]{0,127}")
ROW_FIELDS = frozenset({"source", "target", "case_sensitive", "status", "note", "mode"})


def load_glossary(
    name_or_path: str | Path,
    source_language: str,
    target_language: str,
    search_dirs: Sequence[str | Path] = (DEFAULT_GLOSSARY_DIR,),
) -> Glossary:
    """The glossary called ``name_or_path`` in the first search folder that has it, or the file at that path.

    Raises GlossaryNotFoundError if the name is not a valid name, if no folder has it (the message lists the
    folders searched) or if one folder holds it in two formats (which one is meant cannot be guessed); and
    the readers' InvalidGlossaryError for a bad file."""
    if isinstance(name_or_path, Path) or _looks_like_path(name_or_path):
        return read_glossary_file(name_or_path, source_language, target_language)
    name = name_or_path
    if not GLOSSARY_NAME.fullmatch(name) or ".." in name:
        raise GlossaryNotFoundError(
            f"{name!r} is not a glossary name; names use letters, digits, '_', '-' and '.' only"
        )
    for folder in search_dirs:
        found = [Path(folder) / f"{name}{suffix}" for suffix in GLOSSARY_SUFFIXES]
        found = [path for path in found if path.is_file()]
        if len(found) > 1:
            raise GlossaryNotFoundError(
                f"glossary {name!r} is ambiguous: {', '.join(str(path) for path in found)} all exist; "
                "keep one file per name"
            )
        if found:
            return read_glossary_file(found[0], source_language, target_language)
    folders = ", ".join(str(folder) for folder in search_dirs) or "(no folders)"
    raise GlossaryNotFoundError(f"no glossary named {name!r} ({'/'.join(GLOSSARY_SUFFIXES)}) in {folders}")


def _looks_like_path(text: str) -> bool:
    return "/" in text or "\\" in text or Path(text).suffix.lower() in GLOSSARY_SUFFIXES + (".xml",)


def read_glossary_file(
    path: str | Path, source_language: str, target_language: str, name: str | None = None
) -> Glossary:
    """The glossary in ``path``: TBX for ``.tbx``/``.xml`` (or any file whose content starts with "<"),
    delimited text (TSV/CSV) otherwise."""
    path = Path(path)
    if path.suffix.lower() in TBX_SUFFIXES or (
        path.suffix.lower() not in GLOSSARY_SUFFIXES and _starts_with_markup(path)
    ):
        return read_tbx_glossary(path, source_language, target_language, name)
    return read_delimited_glossary(path, source_language, target_language, name)


def _starts_with_markup(path: Path) -> bool:
    try:
        with open(path, "rb") as file:
            start = file.read(64)
    except OSError:
        return False  # the delimited reader reports the error with its own message
    return start.lstrip(b"\xef\xbb\xbf \t\r\n").startswith(b"<")


def glossary_from_rows(
    name: str,
    rows: Iterable[Mapping[str, object]],
    source_language: str,
    target_language: str,
) -> Glossary:
    """A glossary from inline rows (the HTTP service's JSON entries), validated like a TSV file.

    Each row is a mapping with the TSV columns as keys: ``source`` and ``target`` (strings, required),
    ``case_sensitive`` (bool or a yes/no string), ``status``, ``note``, ``mode`` (strings). Unknown keys are
    errors, not ignored: a misspelt key would otherwise silently drop an attribute. Errors are
    InvalidGlossaryError located as ``"<inline glossary 'name'>:row k"`` (1-based)."""
    where = f"<inline glossary {name!r}>"
    builder = GlossaryBuilder(where)
    for number, row in enumerate(rows, start=1):
        location = f"row {number}"
        if number > MAX_ENTRIES * 2:
            # Each entry may take several rows; past twice the entry limit the request is not a glossary.
            raise builder.fail(f"more than {MAX_ENTRIES * 2} rows", location)
        unknown = sorted(set(row) - ROW_FIELDS)
        if unknown:
            raise builder.fail(
                f"unknown field(s) {', '.join(map(repr, unknown))}; use {', '.join(sorted(ROW_FIELDS))}",
                location,
            )
        texts = {key: _string_field(builder, row, key, location) for key in ("source", "target", "status", "note")}
        status = parse_status(texts["status"])
        if status is None:
            raise builder.fail(
                f"unknown status {texts['status']!r}; use preferred, admitted, deprecated or superseded",
                location,
            )
        case_value = row.get("case_sensitive", False)
        case_sensitive = case_value if isinstance(case_value, bool) else None
        if isinstance(case_value, str):
            case_sensitive = parse_boolean(case_value)
        if case_sensitive is None:
            raise builder.fail(f"case_sensitive must be true/false or yes/no, not {case_value!r}", location)
        mode_text = _string_field(builder, row, "mode", location)
        try:
            mode = parse_mode(mode_text)
        except ValueError:
            raise builder.fail(
                f"unknown mode {mode_text!r}; use {', '.join(mode.value for mode in TermMode)} or leave it out",
                location,
            ) from None
        builder.add(
            texts["source"],
            texts["target"],
            status,
            case_sensitive=case_sensitive,
            mode=mode,
            note=texts["note"],
            target_note=texts["note"],
            origin=f"{name}:{location}",
            location=location,
        )
    return builder.build(name, source_language, target_language)


def _string_field(builder: GlossaryBuilder, row: Mapping[str, object], key: str, location: str) -> str:
    value = row.get(key, "")
    if value is None:
        return ""
    if not isinstance(value, str):
        raise builder.fail(f"{key} must be a string, not {type(value).__name__}", location)
    return value
