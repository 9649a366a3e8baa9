"""Tokenizer for Latin-script languages: one compiled regular expression per rule set, scanned left to right.

The expression is one alternation of token patterns, tried in a fixed order at each token start; the first
pattern that matches wins (Python's ``re`` takes the first matching alternative, not the longest), so the
specific shapes come first: markup tags, URLs, e-mail addresses, file paths, command-line options, printf and
brace placeholders, numbers, then (per language) abbreviations and French elisions, then words, then single
punctuation characters. Two fast paths in front catch plain words and plain punctuation, which are most
tokens, before the other patterns are tried; they accept nothing the full order would cut differently.

Every character that is not whitespace ends up in exactly one token, so the text between two tokens is
always whitespace (``space_before``) and the input can be rebuilt exactly. Tokens never contain whitespace,
except markup tags with attributes (``<a href="x">``), which the protection step replaces by a class token
before the model sees them. Input should be normalised first (``normalize``): multi-part abbreviations such
as "p. ej." are recognised with a single space between their parts.
"""

from __future__ import annotations

import dataclasses
import functools
import re
from dataclasses import dataclass
from enum import StrEnum

from decoder.text.languages import abbreviations, rule_set


class TokenKind(StrEnum):
    """What a token is; the protection step replaces printf, brace, tag, url, email, path and number tokens."""

    WORD = "word"  # also abbreviations ("e.g.") and French elided forms ("l'")
    PUNCTUATION = "punctuation"
    NUMBER = "number"
    URL = "url"
    EMAIL = "email"
    PATH = "path"
    OPTION = "option"
    PRINTF = "printf"
    BRACE = "brace"
    TAG = "tag"


@dataclass(frozen=True, slots=True)
class Token:
    """One token; ``text == source[start:end]`` for the text it was cut from (offsets in characters)."""

    text: str
    start: int
    end: int
    kind: TokenKind
    space_before: bool  # whitespace separated this token from the previous one (False for the first token)


# The generated __init__ of a frozen dataclass calls object.__setattr__ once per field (about 1.8 us per
# token on CPython 3.11, half the tokenizer's time); setting the slots through their descriptors builds the
# same object in half the time. Only tokenize uses this; the check keeps it in step with the fields.
_FIELD_NAMES = ("text", "start", "end", "kind", "space_before")
assert tuple(field.name for field in dataclasses.fields(Token)) == _FIELD_NAMES
_SET_TEXT, _SET_START, _SET_END, _SET_KIND, _SET_SPACE_BEFORE = (getattr(Token, name).__set__ for name in _FIELD_NAMES)


def _make_token(text: str, start: int, end: int, kind: TokenKind, space_before: bool) -> Token:
    token = object.__new__(Token)
    _SET_TEXT(token, text)
    _SET_START(token, start)
    _SET_END(token, end)
    _SET_KIND(token, kind)
    _SET_SPACE_BEFORE(token, space_before)
    return token


# Letters, digits, underscore, plus the combining diacritical mark blocks (which \w does not match) so that a
# letter followed by a combining accent stays one word even in text that NFC could not precompose.
_COMBINING_MARKS = r"\u0300-\u036f\u1ab0-\u1aff\u1dc0-\u1dff\u20d0-\u20ff\ufe20-\ufe2f"
_WORD_CHARACTER = rf"[\w{_COMBINING_MARKS}]"

# Markup tag (XML 1.0 section 3.1 / HTML start and end tags, simplified): name, then attributes that are
# bare or quoted values; "/>" closes an empty element.
_TAG = (
    r"</?[A-Za-z][\w:.\-]*"
    r"(?:\s+[^\s<>\"'=/]+(?:\s*=\s*(?:\"[^\"<>]*\"|'[^'<>]*'|[^\s\"'=<>`]+))?)*+"
    r"\s*/?>"
)

# URL (RFC 3986 section 3: scheme ":" "//" authority path query fragment), simplified: any scheme, or a bare
# "www." host; characters are the RFC's unreserved, reserved (without brackets and parentheses) and "%", plus
# letters beyond ASCII (IRIs, RFC 3987). Parentheses only in balanced pairs, and the last character may not be
# sentence punctuation, so "(see https://x.example/a)." ends the URL before ")." (common practice).
_URL_CHARACTER = r"[\w\-.~:/?#@!$&'*+,;=%]"
_URL_LAST_CHARACTER = r"[\w\-~/#@$&*+=%]"
_URL_PARENTHESES = r"\(" + _URL_CHARACTER + r"*\)"
_URL = (
    r"(?:[A-Za-z][A-Za-z0-9+.\-]*://|www\.)"
    rf"(?:{_URL_CHARACTER}|{_URL_PARENTHESES})*(?:{_URL_LAST_CHARACTER}|{_URL_PARENTHESES})"
)

# E-mail address (RFC 5322 section 3.4.1 addr-spec with a dot-atom local part), simplified: the local part
# starts with a letter or digit and uses atext without "`", "{", "|", "}"; the domain is dot-separated labels
# (letters, digits, inner hyphens) ending in an alphabetic label of two or more letters.
_EMAIL = (
    r"\w[\w!#$%&'*+/=?^~\-]*(?:\.[\w!#$%&'*+/=?^~\-]+)*"
    r"@(?:[^\W_](?:[\w\-]*[^\W_])?\.)+[^\W\d_]{2,}"
)

# File paths: POSIX absolute (/usr/share/x), home-relative (~/.config/x), explicitly relative (./run.sh,
# ../lib, .\run.bat) and Windows drive paths (C:\Users\x). A path cannot end in "." so that a sentence period
# after it splits off. Paths with spaces are not recognised (they are ambiguous in running text).
_PATH_CHARACTER = r"[\w.~+@%=\-]"
_PATH_LAST = r"[\w~+@%=/\-]"
_POSIX_BODY = rf"(?:[\w.~+@%=/\-]*{_PATH_LAST})?"
_WINDOWS_BODY = r"(?:[\w.~+@%=$\\\-]*[\w~+@%=$\\\-])?"
_PATH = (
    rf"(?<![\w/.~\\\-])/{_PATH_CHARACTER}{_POSIX_BODY}"
    rf"|(?<![\w~])~/{_POSIX_BODY}"
    rf"|(?<![\w.])\.\.?/{_POSIX_BODY}"
    rf"|(?<![\w.])\.\.?\\{_WINDOWS_BODY}"
    rf"|(?<!\w)[A-Za-z]:\\{_WINDOWS_BODY}"
)

# Command-line options (POSIX utility syntax guidelines and the common "--name[=value]" long form): a long
# option, or a single dash with letters/digits, not preceded by a word character or hyphen.
_OPTION = (
    r"(?<![\w\-])--[A-Za-z](?:[\w\-]*\w)?(?:=(?:[\w.,:/~+@%\-]*[\w/~+@%\-])?)?"
    r"|(?<![\w\-])-[A-Za-z][A-Za-z0-9]*(?![\w\-])"
)

# printf conversion specification, ISO C11 7.21.6.1 and POSIX printf(3):
# %[argument$][flags][width][.precision][length]conversion, plus Python's %(name)s mapping key and "%%".
# The space flag is left out on purpose: with it "50% of" would read as the conversion "% o".
_PRINTF = (
    r"%%"
    r"|%(?:[1-9]\d*\$|\([^()\s]+\))?[\-+#0']*(?:\d+|\*(?:[1-9]\d*\$)?)?(?:\.(?:\d+|\*(?:[1-9]\d*\$)?)?)?"
    r"(?:hh|h|ll|l|L|q|j|z|Z|t)?[diouxXeEfFgGaAcsSCpnr]"
)

# Brace placeholders, Python "Format String Syntax" (string module docs):
# "{" [field_name] ["!" conversion] [":" format_spec] "}", and the escapes "{{" and "}}".
_BRACE = r"\{\{|\}\}|\{(?:\w+(?:\.\w+|\[[^\]\s{}]*\])*)?(?:![rsa])?(?::[^{}\s]*)?\}"

# Numbers with group/decimal separators or a time separator (1,234.5  1.234,5  10:30), optional sign at the
# start of a token, optional percent sign. A digit run followed by letters ("10px", "2nd") is a word instead.
_NUMBER = r"(?:(?<![\w.,:%)\]}])[\-+\u2212])?(?>\d+(?:[.,:]\d+)*+)(?:%|(?!\w))"

# French elision (Grevisse, Le Bon Usage, from memory): l' d' j' m' n' s' t' c' qu' and the compounds
# jusqu' lorsqu' puisqu' quoiqu', split from the following word: "l'ordinateur" -> "l'" + "ordinateur".
_FRENCH_ELISION = rf"(?<!{_WORD_CHARACTER})(?i:[cdjlmnst]|qu|jusqu|lorsqu|puisqu|quoiqu)['\u2019](?={_WORD_CHARACTER})"

# Words, keeping inner hyphens and apostrophes ("sign-in", "e-mail", "don't", "aujourd'hui").
_WORD = rf"{_WORD_CHARACTER}++(?:[\-\u2010\u2011'\u2019]{_WORD_CHARACTER}++)*+"

# Fast paths, tried first; they only accept what the full alternation would produce anyway, so they change
# speed, not results. A run of letters followed by a character that cannot continue a URL scheme, e-mail
# local part, drive letter, abbreviation, elision or compound word is a plain word; punctuation characters
# that start no other pattern are single punctuation tokens.
_PLAIN_WORD = rf"[^\W\d_]++(?![\w{_COMBINING_MARKS}.:@'\u2019\-\u2010\u2011+!#$%&*/=?^~])"
_PLAIN_PUNCTUATION = r"[,;:!?()\[\]\"\u00ab\u00bb\u00bf\u00a1\u201c\u201d]|\.(?![./\\])"

# Anything else is one punctuation token per character, except runs of periods ("...") and of hyphens ("--").
_PUNCTUATION = r"\.{2,}|-{2,}|[^\w\s]"


@dataclass(frozen=True, slots=True)
class TokenPattern:
    """The compiled tokenizer of one rule set; ``kinds[match.lastindex]`` is the kind of a match."""

    regex: re.Pattern[str]
    kinds: tuple[TokenKind | None, ...]


def _abbreviation_pattern(entries: tuple[tuple[str, ...], ...]) -> str:
    """Alternation of abbreviation parts; a part of a multi-part entry only matches beside its neighbours."""
    alternatives: set[str] = set()
    for parts in entries:
        variants = {parts}
        if parts[0][0].islower():
            variants.add((parts[0][0].upper() + parts[0][1:],) + parts[1:])
        for variant in variants:
            for index, part in enumerate(variant):
                before = "".join(re.escape(previous) + r"\s" for previous in variant[:index])
                after = "".join(r"\s+" + re.escape(following) for following in variant[index + 1 :])
                pattern = re.escape(part)
                if before:
                    pattern = f"(?<={before}){pattern}"
                if after:
                    pattern = f"{pattern}(?={after})"
                alternatives.add(pattern)
    # Longest first, so "Sra." is tried before "Sr." and "pp." before "p.".
    ordered = sorted(alternatives, key=lambda pattern: (-len(pattern), pattern))
    return rf"(?<!{_WORD_CHARACTER})(?:{'|'.join(ordered)})"


@functools.cache
def _compile(name: str, with_fast_paths: bool = True) -> TokenPattern:
    """The tokenizer of rule set ``name``; without fast paths it must tokenize identically (tests check)."""
    parts: list[tuple[TokenKind, str]] = []
    if with_fast_paths:
        parts += [(TokenKind.WORD, _PLAIN_WORD), (TokenKind.PUNCTUATION, _PLAIN_PUNCTUATION)]
    parts += [
        (TokenKind.TAG, _TAG),
        (TokenKind.URL, _URL),
        (TokenKind.EMAIL, _EMAIL),
        (TokenKind.PATH, _PATH),
        (TokenKind.OPTION, _OPTION),
        (TokenKind.PRINTF, _PRINTF),
        (TokenKind.BRACE, _BRACE),
        (TokenKind.NUMBER, _NUMBER),
    ]
    entries = abbreviations(name) if name else ()
    if entries:
        parts.append((TokenKind.WORD, _abbreviation_pattern(entries)))
    if name == "fr":
        parts.append((TokenKind.WORD, _FRENCH_ELISION))
    parts += [(TokenKind.WORD, _WORD), (TokenKind.PUNCTUATION, _PUNCTUATION)]
    # Only the top-level alternatives capture, so match.lastindex names the alternative that matched. Each
    # match starts with the whitespace before its token: scanning whitespace one position at a time, with
    # every alternative failing there, would cost more than the tokens themselves.
    regex = re.compile(r"\s*+(?:" + "|".join(f"({pattern})" for _, pattern in parts) + ")")
    return TokenPattern(regex, (None,) + tuple(kind for kind, _ in parts))


@functools.lru_cache(maxsize=256)  # keyed by the tag as given; bounded because tags come from requests
def token_pattern(language: str) -> TokenPattern:
    """The compiled tokenizer for a BCP 47 tag (cached per rule set), for callers that need raw matches."""
    return _compile(rule_set(language))


def tokenize(text: str, language: str) -> list[Token]:
    """The tokens of ``text`` in order, with character offsets into ``text`` and the whitespace flag.

    ``language`` is a BCP 47 tag; its primary subtag selects abbreviations and elision rules."""
    compiled = token_pattern(language)
    kinds = compiled.kinds
    tokens: list[Token] = []
    append = tokens.append
    make = _make_token
    previous_end = -1
    for match in compiled.regex.finditer(text):
        group = match.lastindex
        start, end = match.span(group)
        append(make(match.group(group), start, end, kinds[group], start > previous_end >= 0))  # type: ignore[arg-type]
        previous_end = end
    return tokens
