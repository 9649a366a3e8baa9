"""Format dispatch and detection. Expected pairs are the fixtures' (see the per-format tests)."""

from __future__ import annotations

from pathlib import Path

import pytest

from decoder.corpus.reader import detect_format, read_parallel
from decoder.corpus.records import SkipReason
from decoder.errors import ConfigurationError

DATA = Path(__file__).parent / "data"


@pytest.mark.parametrize(
    ("name", "expected"),
    [
        ("memory.tmx", "tmx"),
        ("MEMORY.TMX", "tmx"),
        ("app.de.po", "po"),
        ("app.mo", "mo"),
        ("pairs.tsv", "tsv"),
        ("train.en", "plain"),
        ("notes.txt", "plain"),
        ("README", "plain"),
        ("catalog.pot", "plain"),
    ],
)
def test_detect_format_by_extension(name, expected):
    assert detect_format(Path("some/dir") / name) == expected


def first_pair(reader) -> tuple[str, str, str]:
    pair = next(reader)
    return pair.source, pair.target, pair.location


def test_dispatch_to_each_reader():
    assert first_pair(read_parallel(DATA / "quillory.en", DATA / "quillory.de")) == (
        "Create a new notebook.",
        "Erstellen Sie ein neues Notizbuch.",
        "quillory.en:1",
    )
    assert first_pair(read_parallel(DATA / "quillory.tsv", corpus_format="tsv", has_header=True)) == (
        "Search notes",
        "Notizen durchsuchen",
        "quillory.tsv:2",
    )
    assert first_pair(read_parallel(DATA / "quillory.tmx", None, "tmx", "en", "de")) == (
        "Create a new notebook.",
        "Erstellen Sie ein neues Notizbuch.",
        "quillory.tmx:<tu> #1",
    )
    assert first_pair(read_parallel(DATA / "quillory.de.po", corpus_format="po")) == (
        "File",
        "Datei",
        "quillory.de.po:16",
    )
    assert first_pair(read_parallel(DATA / "quillory.de.po", corpus_format="po", strip_accelerators=False)) == (
        "_File",
        "_Datei",
        "quillory.de.po:16",
    )
    # Languages are accepted and ignored where the format does not carry them.
    assert (
        first_pair(read_parallel(DATA / "quillory.en", DATA / "quillory.de", "plain", "en", "de"))[2] == "quillory.en:1"
    )


def test_skip_counts_come_through():
    reader = read_parallel(DATA / "quillory.tmx", None, "tmx", "en", "de")
    list(reader)
    assert reader.skipped == {SkipReason.MISSING_TARGET_LANGUAGE: 1, SkipReason.MISSING_SOURCE_LANGUAGE: 1}


@pytest.mark.parametrize(
    ("arguments", "fragment"),
    [
        ({"source_path": "a.en"}, "needs a target file"),
        ({"source_path": "a.tsv", "target_path": "b.tsv", "corpus_format": "tsv"}, "give no target file"),
        ({"source_path": "a.tmx", "corpus_format": "tmx", "source_language": "en"}, "needs the source and target"),
        ({"source_path": "a.xliff", "corpus_format": "xliff"}, "unknown corpus format 'xliff'"),
    ],
)
def test_argument_mistakes_fail_before_any_file_is_opened(arguments, fragment):
    with pytest.raises(ConfigurationError, match=fragment):
        read_parallel(**arguments)
