"""Removing keyboard accelerator markers from user-interface strings ("_File" -> "File", "&Open" -> "Open").

UI catalogs mark the mnemonic letter of a menu item with "_" (GTK convention) or "&" (Qt and Windows). The
marker is not part of the text: left in, it splits words ("_Datei" is not "Datei") and teaches the models a
symbol that ordinary text never has. Rule used here, applied to both sides of a pair:

1. "(&X)" or "(_X)" with X an ASCII letter or digit, with any white space before it, is removed whole. This is
   how Chinese, Japanese and Korean UI text appends the Latin mnemonic ("ファイル(&F)" -> "ファイル"), common
   practice in CJK localisation.
2. Otherwise a marker is removed when it starts a word: it is directly followed by a letter or digit, and not
   directly preceded by a letter, digit, "_" or "&".
3. An "&" that begins an XML/HTML character or entity reference ("&amp;", "&#38;", "&#x26;") is always kept.

So "R&D", "AT&T", "note_id" and "__init__" are unchanged (marker inside a word), "Tom & Jerry" is unchanged
(marker followed by a space), and so are escaped doubles such as "&&" (a marker after a marker is kept). The
price of rule 2 is that a mnemonic placed inside a word ("E&xit", "Op_en") is also kept: it cannot be told
apart from "R&D" or an identifier without knowing the toolkit, and keeping text is the safer mistake.
"""

from __future__ import annotations

import re

# Rule 1: white space, then a parenthesised marker plus one ASCII letter or digit.
_APPENDED_MNEMONIC = re.compile(r"\s*\([&_][A-Za-z0-9]\)")
# Rules 2 and 3: a marker not preceded by a word character or "&", followed by a letter or digit ([^\W_] is
# \w without "_"), and for "&" not the start of a character or entity reference.
_WORD_START_MARKER = re.compile(r"(?<![\w&])(?:_|&(?!(?:[A-Za-z][A-Za-z0-9]*|#[0-9]+|#[xX][0-9A-Fa-f]+);))(?=[^\W_])")


def strip_accelerators(text: str) -> str:
    """``text`` with its accelerator markers removed according to the rule in the module docstring."""
    if "&" not in text and "_" not in text:
        return text
    return _WORD_START_MARKER.sub("", _APPENDED_MNEMONIC.sub("", text))
