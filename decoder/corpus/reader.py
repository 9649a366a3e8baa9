"""One entry point for all corpus formats: ``read_parallel`` picks the reader, ``detect_format`` the format.

Formats: ``plain`` (two line-aligned files), ``tsv`` (one file, source<TAB>target), ``tmx`` (one file, the two
languages chosen by BCP 47 tag), ``po`` and ``mo`` (one gettext catalog: msgid is the source, msgstr the
target). Argument mistakes raise ConfigurationError before any file is opened; file problems raise
InputFileError while reading.
"""

from __future__ import annotations

from pathlib import Path
from typing import Literal, get_args

from decoder.corpus.gettext import read_mo, read_po
from decoder.corpus.plain import read_plain_pair
from decoder.corpus.records import CorpusReader
from decoder.corpus.tmx import read_tmx
from decoder.corpus.tsv import read_tsv
from decoder.errors import ConfigurationError

CorpusFormat = Literal["plain", "tsv", "tmx", "po", "mo"]
CORPUS_FORMATS: tuple[str, ...] = get_args(CorpusFormat)
FORMAT_OF_SUFFIX: dict[str, CorpusFormat] = {".tmx": "tmx", ".po": "po", ".mo": "mo", ".tsv": "tsv"}


def detect_format(path: str | Path) -> CorpusFormat:
    """The format implied by the file name's extension (case-insensitive); ``"plain"`` for any other name.

    Only a convenience for command lines: nothing in the file is looked at."""
    return FORMAT_OF_SUFFIX.get(Path(path).suffix.lower(), "plain")


def read_parallel(
    source_path: str | Path,
    target_path: str | Path | None = None,
    corpus_format: CorpusFormat = "plain",
    source_language: str | None = None,
    target_language: str | None = None,
    *,
    has_header: bool = False,
    strip_accelerators: bool = True,
) -> CorpusReader:
    """A single-pass iterator of ``RawPair`` over the corpus; ``skipped`` counts units the format excludes.

    ``target_path`` is needed for ``plain`` only, the languages for ``tmx`` only (for the other formats the
    languages are not in the data, or not reliably, and are ignored). ``has_header`` applies to ``tsv``,
    ``strip_accelerators`` to ``po`` and ``mo``."""
    if corpus_format not in CORPUS_FORMATS:
        raise ConfigurationError(f"unknown corpus format {corpus_format!r}; choose one of {', '.join(CORPUS_FORMATS)}")
    if corpus_format == "plain":
        if target_path is None:
            raise ConfigurationError("the plain format needs a target file (one segment per line)")
        return read_plain_pair(source_path, target_path)
    if target_path is not None:
        raise ConfigurationError(f"the {corpus_format} format holds both languages in one file; give no target file")
    if corpus_format == "tsv":
        return read_tsv(source_path, has_header=has_header)
    if corpus_format == "tmx":
        if source_language is None or target_language is None:
            raise ConfigurationError("reading TMX needs the source and target language (BCP 47 tags)")
        return read_tmx(source_path, source_language, target_language)
    if corpus_format == "po":
        return read_po(source_path, strip_accelerators=strip_accelerators)
    return read_mo(source_path, strip_accelerators=strip_accelerators)
