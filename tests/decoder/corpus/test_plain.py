"""Line-aligned plain text pairs. Expected pairs are the fixture files' lines, read by hand."""

from __future__ import annotations

import tracemalloc
from pathlib import Path

import pytest

from decoder.corpus.plain import read_plain_pair
from decoder.corpus.records import RawPair
from decoder.errors import InputFileError

DATA = Path(__file__).parent / "data"


def test_fixture_pairs():
    pairs = [
        (pair.source, pair.target, pair.location)
        for pair in read_plain_pair(DATA / "quillory.en", DATA / "quillory.de")
    ]
    assert pairs == [
        ("Create a new notebook.", "Erstellen Sie ein neues Notizbuch.", "quillory.en:1"),
        ("Notes are saved automatically.", "Notizen werden automatisch gespeichert.", "quillory.en:2"),
        (
            "Tap the pen icon to start writing.",
            "Tippen Sie auf das Stiftsymbol, um mit dem Schreiben zu beginnen.",
            "quillory.en:3",
        ),
        (
            "Quillory syncs your notes across devices.",
            "Quillory gleicht Ihre Notizen zwischen Geräten ab.",
            "quillory.en:4",
        ),
    ]


def test_empty_lines_are_pairs_too(tmp_path):
    source, target = tmp_path / "a.en", tmp_path / "a.de"
    source.write_text("Pen\n\nInk\n", encoding="utf-8")
    target.write_text("Stift\r\nLeer\r\n\r\n", encoding="utf-8")  # CRLF on one side only
    pairs = [(pair.source, pair.target) for pair in read_plain_pair(source, target)]
    assert pairs == [("Pen", "Stift"), ("", "Leer"), ("Ink", "")]


@pytest.mark.parametrize("shorter_side", ["source", "target"])
def test_unequal_line_counts_name_the_shorter_file_and_its_last_line(tmp_path, shorter_side):
    short, long = tmp_path / "short.txt", tmp_path / "long.txt"
    short.write_text("1\n2\n3\n", encoding="utf-8")
    long.write_text("1\n2\n3\n4\n5\n", encoding="utf-8")
    arguments = (short, long) if shorter_side == "source" else (long, short)
    reader = read_plain_pair(*arguments)
    assert [pair.source for pair in (next(reader), next(reader), next(reader))] == ["1", "2", "3"]
    with pytest.raises(InputFileError) as caught:
        next(reader)
    assert caught.value.path == str(short)
    assert caught.value.location == 3
    assert str(caught.value) == (
        f"{short}:3: ends after line 3, but {long} has more lines; the two must be line-aligned"
    )


def test_empty_file_against_a_non_empty_one(tmp_path):
    empty, full = tmp_path / "empty.de", tmp_path / "full.en"
    empty.write_bytes(b"")
    full.write_text("Pen\n", encoding="utf-8")
    with pytest.raises(InputFileError, match=r"empty\.de: is empty, but .*full\.en has lines"):
        list(read_plain_pair(full, empty))


def test_invalid_utf8_on_the_target_side(tmp_path):
    source, target = tmp_path / "a.en", tmp_path / "a.de"
    source.write_text("a\nb\nc\n", encoding="utf-8")
    target.write_bytes(b"x\ny\n\xff\n")
    with pytest.raises(InputFileError, match=r"a\.de:3: invalid UTF-8 at byte 1"):
        list(read_plain_pair(source, target))


def test_missing_file(tmp_path):
    with pytest.raises(InputFileError, match=r"absent\.en: cannot be opened"):
        list(read_plain_pair(tmp_path / "absent.en", DATA / "quillory.de"))


def write_numbered_pair(tmp_path: Path, num_lines: int) -> tuple[Path, Path]:
    source, target = tmp_path / "big.en", tmp_path / "big.de"
    source.write_bytes(b"".join(b"Note %d is pinned.\n" % number for number in range(num_lines)))
    target.write_bytes(b"".join(b"Notiz %d ist angeheftet.\n" % number for number in range(num_lines)))
    return source, target


def peak_bytes_while_reading(source: Path, target: Path) -> tuple[int, RawPair | None]:
    """tracemalloc's peak while iterating the whole pair, and the last pair."""
    tracemalloc.start()
    try:
        last = None
        for pair in read_plain_pair(source, target):
            last = pair
        return tracemalloc.get_traced_memory()[1], last
    finally:
        tracemalloc.stop()


def test_streams_in_constant_memory(tmp_path):
    # 20,000 lines per side. Measured with tracemalloc: list(read_plain_pair(...)) holds about 5.4 MB; the
    # streaming pass peaks at about 12 kB (one read buffer and a few lines), the same as for 2,000 lines.
    peak_bytes, last = peak_bytes_while_reading(*write_numbered_pair(tmp_path, 20_000))
    assert last == RawPair("Note 19999 is pinned.", "Notiz 19999 ist angeheftet.", "big.en:20000")
    assert peak_bytes < 200_000


@pytest.mark.slow
def test_streams_200k_lines_in_constant_memory(tmp_path):
    # The same at 200,000 lines (a list would hold about 54 MB); about 8 s under tracemalloc.
    peak_bytes, last = peak_bytes_while_reading(*write_numbered_pair(tmp_path, 200_000))
    assert last == RawPair("Note 199999 is pinned.", "Notiz 199999 ist angeheftet.", "big.en:200000")
    assert peak_bytes < 200_000
