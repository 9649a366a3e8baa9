"""Two-column TSV. Expected pairs are the fixture's lines, read by hand."""

from __future__ import annotations

from pathlib import Path

import pytest

from decoder.corpus.tsv import read_tsv
from decoder.errors import InputFileError

FIXTURE = Path(__file__).parent / "data" / "quillory.tsv"
FIXTURE_BODY = [
    ("Search notes", "Notizen durchsuchen", "quillory.tsv:2"),
    ("Move to trash", "In den Papierkorb verschieben", "quillory.tsv:3"),
    ("Pin this note", "Diese Notiz anheften", "quillory.tsv:4"),
    ("Quillory Pro — 30 days free", "Quillory Pro – 30 Tage kostenlos", "quillory.tsv:5"),
]


def pair_tuples(reader) -> list[tuple[str, str, str]]:
    return [(pair.source, pair.target, pair.location) for pair in reader]


def test_fixture_with_header_skips_line_one_and_keeps_numbering():
    assert pair_tuples(read_tsv(FIXTURE, has_header=True)) == FIXTURE_BODY


def test_header_is_data_unless_declared():
    assert pair_tuples(read_tsv(FIXTURE)) == [("source", "target", "quillory.tsv:1"), *FIXTURE_BODY]


def test_empty_fields_and_spaces_are_kept_verbatim(tmp_path):
    path = tmp_path / "pairs.tsv"
    path.write_text("\tStift\n Pen \t\r\n", encoding="utf-8")
    assert pair_tuples(read_tsv(path)) == [("", "Stift", "pairs.tsv:1"), (" Pen ", "", "pairs.tsv:2")]


@pytest.mark.parametrize(("third_line", "found"), [("only one column", 1), ("a\tb\tc", 3), ("", 1), ("a\tb\t", 3)])
def test_wrong_column_count_names_file_and_line(tmp_path, third_line, found):
    path = tmp_path / "pairs.tsv"
    path.write_text(f"a\tb\nc\td\n{third_line}\ne\tf\n", encoding="utf-8")
    reader = read_tsv(path)
    with pytest.raises(InputFileError) as caught:
        list(reader)
    assert caught.value.location == 3
    assert str(caught.value) == f"{path}:3: expected 2 tab-separated columns (source, target), found {found}"
