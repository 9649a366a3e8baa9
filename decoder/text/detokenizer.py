"""Detokenization: token strings back to running text, with each language's spacing around punctuation.

``detokenize`` decides, for each pair of neighbouring tokens, whether a space goes between them. Default: a
space. None before closing punctuation (, . ; : ! ? ) ] } % … and closing quotes) and none after opening
punctuation (( [ { ¿ ¡ and opening quotes); "/" joins its neighbours ("and/or"). Straight quotes (" and ')
alternate: the first of each kind opens, the next closes. Markup tags hug their content ("<b>Save</b>").

French (Imprimerie nationale, Lexique des règles typographiques, from memory) puts a space before ; : ! ?
and inside « » guillemets. The printed rule asks for a (narrow) no-break space there; we write a plain
U+0020 space, because ``normalize`` maps every no-break space to U+0020 anyway, so this is the only spacing
a round trip through the engine can keep. Render no-break spaces downstream if the target medium needs them.
Elided forms (l' qu' jusqu') join the next word. Spanish ¿ and ¡ join the next word (Real Academia
Española, Ortografía 2010, from memory), which the general rule already does.

``detokenize_tokens`` needs no rules: tokens from ``tokenize`` carry their own ``space_before`` flags.
"""

from __future__ import annotations

from collections.abc import Sequence

from decoder.text.languages import rule_set
from decoder.text.normalize import normalize
from decoder.text.tokenizer import Token

_NO_SPACE_BEFORE = frozenset({",", ".", ";", ":", "!", "?", ")", "]", "}", "%", "…", "”", "’", "»", "›", "/"})
_NO_SPACE_AFTER = frozenset({"(", "[", "{", "¿", "¡", "“", "‘", "«", "‹", "„", "‚", "/"})
_FRENCH_SPACE_BEFORE = frozenset({";", ":", "!", "?", "»", "›"})  # plus "« " after the opening guillemets
_FRENCH_SPACE_AFTER = frozenset({"«", "‹"})
_FRENCH_DOUBLE_MARKS = frozenset({"!", "?"})  # "?!" stays together: one space before the pair, none inside
_STRAIGHT_QUOTES = frozenset({'"', "'"})
# German-style low opening quotes are closed by the high quote that opens elsewhere („so“, ‚so‘).
_LOW_QUOTE_CLOSERS = {"„": "“", "‚": "‘"}
_APOSTROPHES = ("'", "’")

_OPEN, _CLOSE, _OTHER = 0, 1, 2


def _is_elision(token: str) -> bool:
    """An elided form such as l' or qu': letters followed by a final apostrophe; it joins the next word."""
    return len(token) >= 2 and token.endswith(_APOSTROPHES) and token[-2].isalpha()


def _quote_roles(tokens: Sequence[str]) -> list[int]:
    """Per token: _OPEN or _CLOSE for quotes whose role depends on what came before, _OTHER otherwise."""
    roles = [_OTHER] * len(tokens)
    is_open = {quote: False for quote in _STRAIGHT_QUOTES}
    open_low_quotes: list[str] = []
    for index, token in enumerate(tokens):
        if token in _STRAIGHT_QUOTES:
            roles[index] = _CLOSE if is_open[token] else _OPEN
            is_open[token] = not is_open[token]
        elif token in _LOW_QUOTE_CLOSERS:
            open_low_quotes.append(_LOW_QUOTE_CLOSERS[token])
        elif open_low_quotes and token == open_low_quotes[-1]:
            open_low_quotes.pop()
            roles[index] = _CLOSE
    return roles


def _is_tag(token: str) -> bool:
    return len(token) >= 3 and token[0] == "<" and token[-1] == ">"


def detokenize(tokens: Sequence[str], language: str) -> str:
    """The tokens joined into text with the spacing rules of ``language`` (a BCP 47 tag)."""
    if not tokens:
        return ""
    is_french = rule_set(language) == "fr"
    roles = _quote_roles(tokens)
    pieces = [tokens[0]]
    previous = tokens[0]
    previous_role = roles[0]
    for token, role in zip(tokens[1:], roles[1:], strict=True):
        pieces.append(" " if _needs_space(previous, previous_role, token, role, is_french) else "")
        pieces.append(token)
        previous, previous_role = token, role
    return "".join(pieces)


def _needs_space(previous: str, previous_role: int, token: str, role: int, is_french: bool) -> bool:
    if is_french:
        if previous in _FRENCH_SPACE_AFTER:
            return True
        if token in _FRENCH_SPACE_BEFORE:
            return not (token in _FRENCH_DOUBLE_MARKS and previous in _FRENCH_DOUBLE_MARKS) and (
                previous not in _NO_SPACE_AFTER
            )
    # After something that opens: no space.
    if previous_role == _OPEN or (previous_role == _OTHER and previous in _NO_SPACE_AFTER):
        return False
    if _is_elision(previous):
        return False
    if _is_tag(previous) and not previous.startswith("</") and not previous.endswith("/>"):
        return False
    # Before something that closes: no space.
    if role == _CLOSE or (role == _OTHER and token in _NO_SPACE_BEFORE):
        return False
    if token.startswith("..") and token.strip(".") == "":
        return False
    if _is_tag(token) and token.startswith("</"):
        return False
    return True


def detokenize_tokens(tokens: Sequence[Token]) -> str:
    """The text the tokens were cut from, normalised: tokens joined with one space where ``space_before``.

    Equals ``normalize(text)`` for ``tokens = tokenize(text, language)``, for any text and language: only
    whitespace lies between tokens, and normalisation (NFC, whitespace runs to one space) commutes with
    that joining."""
    return normalize("".join(" " + token.text if token.space_before else token.text for token in tokens))
