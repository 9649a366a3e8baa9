import re

import pytest

from decoder.errors import InvalidTextError
from decoder.text.normalize import check_text, normalize


@pytest.mark.parametrize(
    ("text", "expected"),
    [
        # Canonical decompositions from UnicodeData.txt: U+00E9 = 0065 0301, U+00C5 = 0041 030A; NFC composes
        # them (Unicode Standard Annex #15, section 1.2).
        ("cafe\u0301", "caf\u00e9"),
        ("A\u030angstr\u00f6m", "\u00c5ngstr\u00f6m"),
        # U+212B ANGSTROM SIGN has the singleton canonical decomposition U+00C5, so NFC replaces it (UAX #15,
        # figure 3 "Singletons", from memory).
        ("\u212b", "\u00c5"),
        # U+FB01 LATIN SMALL LIGATURE FI has only a compatibility decomposition (<compat> 0066 0069 in
        # UnicodeData.txt): NFC keeps it, only NFKC would split it.
        ("\ufb01le", "\ufb01le"),
    ],
)
def test_normalize_composes_to_nfc(text, expected):
    assert normalize(text) == expected


@pytest.mark.parametrize(
    ("text", "expected"),
    [
        ("  Save \t  file  ", "Save file"),
        # U+00A0 NO-BREAK SPACE, U+202F NARROW NO-BREAK SPACE, U+2009 THIN SPACE and U+3000 IDEOGRAPHIC SPACE
        # are all category Zs (UnicodeData.txt), so all become one ASCII space.
        ("50\u00a0%", "50 %"),
        ("Attention\u202f:", "Attention :"),
        ("1\u2009234", "1 234"),
        ("a\u3000\u00a0 \tb", "a b"),
        ("\u00a0\u00a0", ""),
        ("", ""),
    ],
)
def test_normalize_maps_whitespace_to_one_ascii_space(text, expected):
    assert normalize(text) == expected


def test_check_text_accepts_tab_and_unicode_spaces():
    # Raises if the text is refused; tab is the one C0 control that is allowed.
    check_text("Name:\tZentrix\u00a0Cloud \u202f\u3000caf\u00e9")


@pytest.mark.parametrize(
    ("text", "code_point", "position"),
    [
        ("abc\x07def", "U+0007", 3),  # BEL, C0
        ("\x00", "U+0000", 0),
        ("Save\x1b[0m", "U+001B", 4),  # ESC
        ("ok\x7f", "U+007F", 2),  # DEL
        ("caf\u00e9\x85", "U+0085", 4),  # NEL, C1; the position counts characters, not UTF-8 bytes
        ("x\x9fy", "U+009F", 1),  # last C1 control
    ],
)
def test_check_text_rejects_control_characters_naming_the_position(text, code_point, position):
    with pytest.raises(InvalidTextError, match=rf"{re.escape(code_point)}\b.* at character {position}\b"):
        check_text(text)


@pytest.mark.parametrize(
    ("text", "code_point", "position"),
    [
        ("first line\nsecond", "U+000A", 10),
        ("line\r", "U+000D", 4),
        ("a\u2028b", "U+2028", 1),  # LINE SEPARATOR, category Zl
        ("a\u2029b", "U+2029", 1),  # PARAGRAPH SEPARATOR, category Zp
    ],
)
def test_check_text_rejects_line_breaks_inside_a_segment(text, code_point, position):
    with pytest.raises(
        InvalidTextError, match=rf"Line break {re.escape(code_point)}.* at character {position}: a segment is one"
    ):
        check_text(text)


def test_check_text_rejects_lone_surrogates_from_invalid_utf8():
    # b"\xff" is never valid UTF-8; surrogateescape decodes it to the lone surrogate U+DCFF (PEP 383).
    text = b"ok\xff".decode("utf-8", errors="surrogateescape")
    with pytest.raises(InvalidTextError, match=r"U\+DCFF at character 2"):
        check_text(text)


def test_invalid_text_error_has_the_stable_code():
    with pytest.raises(InvalidTextError) as caught:
        check_text("\x01")
    assert caught.value.code == "invalid_text"
