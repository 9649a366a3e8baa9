"""The reader object shared by all formats: laziness, single pass, early close, skip counts."""

from __future__ import annotations

import dataclasses
from collections import Counter
from collections.abc import Iterator

import pytest

from decoder.corpus.records import CorpusReader, RawPair, SkipReason
from decoder.corpus.tsv import read_tsv
from decoder.errors import InputFileError


def test_raw_pair_is_frozen_and_slotted():
    pair = RawPair("Pen", "Stift", "a.tsv:1")
    with pytest.raises(dataclasses.FrozenInstanceError):
        pair.source = "Ink"  # type: ignore[misc]
    assert not hasattr(pair, "__dict__")


def test_nothing_is_opened_before_the_first_pair(tmp_path):
    reader = read_tsv(tmp_path / "later.tsv")  # does not exist yet: building the reader must not fail
    (tmp_path / "later.tsv").write_text("Pen\tStift\n", encoding="utf-8")
    assert next(reader) == RawPair("Pen", "Stift", "later.tsv:1")


def test_missing_file_fails_on_first_next(tmp_path):
    reader = read_tsv(tmp_path / "absent.tsv")
    with pytest.raises(InputFileError, match="cannot be opened"):
        next(reader)


def test_single_pass_and_close(tmp_path):
    path = tmp_path / "pairs.tsv"
    path.write_text("a\tb\nc\td\ne\tf\n", encoding="utf-8")
    reader = read_tsv(path)
    assert iter(reader) is reader
    assert next(reader).source == "a"
    reader.close()
    assert list(reader) == []  # closed: the remaining lines are not read


def test_skip_counts_grow_during_the_pass():
    def generate(skipped: Counter[SkipReason]) -> Iterator[RawPair]:
        skipped[SkipReason.FUZZY] += 1
        yield RawPair("a", "b", "x:1")
        skipped[SkipReason.FUZZY] += 1
        skipped[SkipReason.HEADER] += 1

    with CorpusReader(generate) as reader:
        assert reader.skipped == {}
        next(reader)
        assert reader.skipped == {SkipReason.FUZZY: 1}
        assert list(reader) == []
        assert reader.skipped == {SkipReason.FUZZY: 2, SkipReason.HEADER: 1}
