"""Match units: the token pieces glossary terms and segments are compared on.

Terms and segments are both cut by ``decoder.text.tokenizer.tokenize``; each token then gives one or more
units. A word token with inner hyphens is split at them ("sign-in" -> "sign", "-", "in"), so a term written
"sign-in" matches a segment that spells it "sign - in" and the other way round; the hyphen itself stays a
unit, so "sign in" (no hyphen) is a different term. The hyphen characters U+2010 and U+2011 read as "-", and
the typographic apostrophe U+2019 as "'", since writers and keyboards mix them freely. Every other token is
one unit. A match must start on a unit that starts a token and end on a unit that ends one, so "sign" never
matches inside "sign-in".
"""

from __future__ import annotations

import re
from collections.abc import Sequence
from dataclasses import dataclass

from decoder.text.protection import class_token_of
from decoder.text.tokenizer import Token, TokenKind

_HYPHEN = re.compile(r"(-)")
_UNIT_CHARACTERS = str.maketrans({"\u2010": "-", "\u2011": "-", "\u2019": "'"})
_NEEDS_SPLITTING = frozenset("-\u2010\u2011\u2019")  # tokens without these characters are one unit as they are


@dataclass(frozen=True, slots=True)
class TokenUnits:
    """The units of a token sequence, with for each unit the token it came from.

    ``texts[k]`` is None for a protected token (placeholder, URL, number, tag ...): it can be part of no match."""

    texts: list[str | None]
    token_of_unit: list[int]
    starts_token: list[bool]
    ends_token: list[bool]
    is_word: list[bool]  # the unit is a piece of a word token (plural tolerance only applies to words)


def split_token(text: str, kind: TokenKind) -> list[str]:
    """The units of one unprotected token: hyphenated words split, hyphen and apostrophe variants unified."""
    unified = text.translate(_UNIT_CHARACTERS)
    if kind is TokenKind.WORD and "-" in unified:
        return [part for part in _HYPHEN.split(unified) if part]
    return [unified]


def protected_positions_of(tokens: Sequence[Token]) -> frozenset[int]:
    """Positions of the tokens ``decoder.text.protection.protect`` would replace by a class token."""
    return frozenset(position for position, token in enumerate(tokens) if class_token_of(token.kind, token.text))


def units_of(tokens: Sequence[Token], protected_positions: frozenset[int] | set[int]) -> TokenUnits:
    """Units of ``tokens``; each token at ``protected_positions`` becomes one None unit."""
    texts: list[str | None] = []
    token_of_unit: list[int] = []
    starts: list[bool] = []
    ends: list[bool] = []
    words: list[bool] = []
    plain = _NEEDS_SPLITTING.isdisjoint
    for position, token in enumerate(tokens):
        text: str | None = token.text
        is_word = token.kind is TokenKind.WORD
        if position in protected_positions:
            text, is_word = None, False
        elif not plain(token.text):
            parts = split_token(token.text, token.kind)
            last = len(parts) - 1
            for index, part in enumerate(parts):
                texts.append(part)
                token_of_unit.append(position)
                starts.append(index == 0)
                ends.append(index == last)
                words.append(is_word and part != "-")
            continue
        # The common case: the token is one unit.
        texts.append(text)
        token_of_unit.append(position)
        starts.append(True)
        ends.append(True)
        words.append(is_word)
    return TokenUnits(texts, token_of_unit, starts, ends, words)
