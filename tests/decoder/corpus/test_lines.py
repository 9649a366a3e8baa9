"""Line splitting and decoding shared by the plain and TSV readers (expected values derived by hand)."""

from __future__ import annotations

import pytest

from decoder.corpus.lines import iter_lines
from decoder.errors import InputFileError


def lines_of(tmp_path, data: bytes) -> list[tuple[int, str]]:
    path = tmp_path / "text.txt"
    path.write_bytes(data)
    return list(iter_lines(path))


def test_lf_crlf_and_missing_final_newline(tmp_path):
    assert lines_of(tmp_path, b"one\ntwo\r\nthree") == [(1, "one"), (2, "two"), (3, "three")]


def test_only_lf_splits_lines(tmp_path):
    # A lone CR, U+2028 LINE SEPARATOR and U+0085 NEXT LINE stay inside the line (str.splitlines would split).
    data = "a\rb\u2028c\u0085d\n".encode()
    assert lines_of(tmp_path, data) == [(1, "a\rb\u2028c\u0085d")]


def test_byte_order_mark_is_removed_from_the_first_line_only(tmp_path):
    assert lines_of(tmp_path, b"\xef\xbb\xbfhead\n\xef\xbb\xbfsecond\n") == [(1, "head"), (2, "\ufeffsecond")]


def test_empty_lines_and_empty_file(tmp_path):
    assert lines_of(tmp_path, b"\n\n") == [(1, ""), (2, "")]
    assert lines_of(tmp_path, b"") == []


def test_invalid_utf8_names_file_line_and_byte(tmp_path):
    path = tmp_path / "text.txt"
    path.write_bytes(b"fine\nb\xc3ad\n")  # 0xC3 starts a two-byte sequence; "a" (0x61) cannot continue it
    with pytest.raises(InputFileError) as caught:
        list(iter_lines(path))
    assert caught.value.location == 2
    assert str(caught.value).startswith(f"{path}:2: invalid UTF-8 at byte 2 of the line")
