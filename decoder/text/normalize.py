"""Input checking and normalisation of one segment, the first step before tokenization.

``check_text`` refuses text the engine cannot handle as one segment; ``normalize`` maps equivalent spellings
of the same text onto one string, so that training and translation see identical tokens.
"""

from __future__ import annotations

import re
import unicodedata

from decoder.errors import InvalidTextError

# C0 controls except tab, DEL, C1 controls (U+0080-U+009F, which includes NEL U+0085), the Unicode line and
# paragraph separators (U+2028, U+2029) and lone surrogates (text decoded with errors="surrogateescape" holds
# these for invalid UTF-8 bytes; they cannot be written back as UTF-8).
_REFUSED = re.compile("[\x00-\x08\x0a-\x1f\x7f-\x9f\u2028\u2029\ud800-\udfff]")

# Python's \s on str patterns is the same set as str.isspace(): for text that passed check_text that is the
# tab plus the Unicode space separators (category Zs: U+0020, no-break space U+00A0, U+1680, U+2000-U+200A,
# narrow no-break space U+202F, U+205F, ideographic space U+3000). The tokenizer splits on the same set.
_WHITESPACE_RUN = re.compile(r"\s+")

_CONTROL_NAMES = {
    0x00: "NULL",
    0x09: "CHARACTER TABULATION",
    0x0A: "LINE FEED",
    0x0B: "LINE TABULATION",
    0x0C: "FORM FEED",
    0x0D: "CARRIAGE RETURN",
    0x1B: "ESCAPE",
    0x7F: "DELETE",
    0x85: "NEXT LINE",
}
_LINE_BREAKS = frozenset("\n\r\x0b\x0c\x85\u2028\u2029")


def check_text(text: str) -> None:
    """Raise InvalidTextError if ``text`` cannot be one segment; return None if it can.

    Refused: control characters (C0 except tab, DEL, C1), line breaks of any kind (a segment is one line, so
    the caller must split at line breaks first) and lone surrogates. The message names the first offending
    character and its position as a 0-based character offset into ``text``, the same offsets tokens use."""
    found = _REFUSED.search(text)
    if found is None:
        return
    character = found.group()
    code_point = ord(character)
    position = found.start()
    if 0xD800 <= code_point <= 0xDFFF:
        raise InvalidTextError(
            f"Lone surrogate U+{code_point:04X} at character {position}: the text was not valid UTF-8. "
            "Re-encode the input as UTF-8."
        )
    name = _CONTROL_NAMES.get(code_point) or unicodedata.name(character, "")
    described = f"U+{code_point:04X} ({name})" if name else f"U+{code_point:04X}"
    if character in _LINE_BREAKS:
        raise InvalidTextError(
            f"Line break {described} at character {position}: a segment is one line. "
            "Split the text at line breaks first."
        )
    raise InvalidTextError(
        f"Control character {described} at character {position}. Remove control characters from the input."
    )


def normalize(text: str) -> str:
    """``text`` in Unicode NFC with every whitespace run (tabs, no-break and other Unicode spaces) replaced by
    one ASCII space and no space at either end.

    NFC (Unicode Standard Annex #15) makes precomposed and decomposed spellings of the same letter identical.
    Compatibility characters (ligatures, full-width forms) are kept: NFKC would change their meaning in
    product text. Does not check the text; call ``check_text`` first."""
    if not text.isascii():
        text = unicodedata.normalize("NFC", text)
    return _WHITESPACE_RUN.sub(" ", text).strip(" ")
