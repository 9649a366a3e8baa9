"""Hypothesis strategies for the text tests: segments built together with their expected tokens.

``canonical_segments(language)`` draws a segment as a list of tokens and writes the text *by construction*
from the typographic spacing rules stated below, independently of the detokenizer under test:

- all languages: one space between tokens; no space before , . ; : ! ? ) or a closing quote and none after
  ( or an opening quote (common practice in English, Spanish and French typesetting);
- French (Imprimerie nationale, Lexique des règles typographiques, from memory): a space before ; : ! ? and
  inside « »; elided articles (l', d', qu') join the next word without a space;
- Spanish (RAE, Ortografía 2010, from memory): questions and exclamations open with ¿ / ¡ joined to the
  first word and close with ? / ! joined to the last.

Words avoid the stems of the abbreviation lists, so "Dr" + "." stays two tokens.
"""

from __future__ import annotations

from dataclasses import dataclass

from hypothesis import strategies as st

from decoder.text.languages import abbreviations


@dataclass(frozen=True)
class Built:
    text: str
    tokens: tuple[str, ...]


def _joined(*parts: Built, separator: str = " ") -> Built:
    return Built(separator.join(part.text for part in parts), tuple(token for part in parts for token in part.tokens))


def _abbreviation_stems() -> frozenset[str]:
    stems = set()
    for language in ("en", "es", "fr"):
        for entry in abbreviations(language):
            for part in entry:
                for piece in part.split("."):
                    stems.update({piece, piece.lower(), piece.capitalize()})
    return frozenset(stems | {"www", "http", "https"})


_STEMS = _abbreviation_stems()

# Invented words from syllables (sampling a fixed pool is much cheaper for hypothesis than drawing text).
_SYLLABLES = ["ka", "lo", "mi", "zen", "tri", "vo", "ñu", "çe", "dé", "rast", "pli", "ouv"]
_WORD_POOL = sorted({a + b + c for a in _SYLLABLES for b in _SYLLABLES for c in ("", "s", "ra", "ten")} - _STEMS)
WORDS = st.sampled_from(_WORD_POOL)
CAPITALISED_WORDS = st.sampled_from([word.capitalize() for word in _WORD_POOL])
COMPOUND_WORDS = st.tuples(WORDS, WORDS).map(lambda pair: f"{pair[0]}-{pair[1]}")  # "sign-in"

# Number shapes from the tokenizer brief: grouping and decimal separators both ways, percent, sign, time.
NUMBERS = st.one_of(
    st.integers(0, 10**7).map(str),
    st.integers(1000, 10**7).map(lambda n: f"{n:,}"),
    st.tuples(st.integers(1000, 10**6), st.integers(0, 99)).map(lambda p: f"{p[0]:,}.{p[1]}"),
    st.tuples(st.integers(1000, 10**6), st.integers(0, 99)).map(lambda p: f"{p[0]:,}".replace(",", ".") + f",{p[1]}"),
    st.tuples(st.integers(0, 100), st.integers(0, 9)).map(lambda p: f"{p[0]}.{p[1]}%"),
    st.integers(1, 10**4).map(lambda n: f"-{n}"),
    st.tuples(st.integers(0, 23), st.integers(0, 59)).map(lambda p: f"{p[0]}:{p[1]:02d}"),
)
PLACEHOLDERS = st.sampled_from(["%s", "%d", "%1$s", "%-10s", "%lu", "%.2f", "%(name)s", "{0}", "{name}", "{count:d}"])
PROTECTED_OTHERS = st.sampled_from(
    [
        "https://help.zentrix.example/docs/install",
        "www.zentrix.example",
        "soporte@zentrix.example",
        "/opt/zentrix/bin",
        "~/.config/zentrix",
        "./run.sh",
        "C:\\Zentrix\\zentrix.ini",
        "--force",
        "--Dry-Run",
        "-n",
        "-N",
    ]
)


def _atoms(language: str) -> st.SearchStrategy[Built]:
    single = st.one_of(
        WORDS, WORDS, WORDS, CAPITALISED_WORDS, COMPOUND_WORDS, NUMBERS, PLACEHOLDERS, PROTECTED_OTHERS
    ).map(lambda token: Built(token, (token,)))
    if language.startswith("fr"):
        elided = st.tuples(st.sampled_from(["l'", "d'", "qu'", "L'", "jusqu'"]), WORDS).map(
            lambda pair: Built(pair[0] + pair[1], pair)
        )
        return st.one_of(single, single, elided)
    return single


def _phrases(language: str) -> st.SearchStrategy[Built]:
    return st.lists(_atoms(language), min_size=1, max_size=3).map(lambda atoms: _joined(*atoms))


def _wrapped(phrase: Built, opening: str, closing: str, inner_space: bool) -> Built:
    space = " " if inner_space else ""
    return Built(f"{opening}{space}{phrase.text}{space}{closing}", (opening, *phrase.tokens, closing))


def _clauses(language: str) -> st.SearchStrategy[Built]:
    phrases = _phrases(language)
    is_french = language.startswith("fr")
    options = [
        phrases,
        phrases.map(lambda p: _wrapped(p, "(", ")", False)),
        phrases.map(lambda p: _wrapped(p, '"', '"', False)),
        phrases.map(lambda p: _wrapped(p, "“", "”", False)),
    ]
    if is_french:
        options.append(phrases.map(lambda p: _wrapped(p, "«", "»", True)))
    elif language.startswith("es"):
        options.append(phrases.map(lambda p: _wrapped(p, "«", "»", False)))
    return st.one_of(*options)


def _attach(clause: Built, mark: str, spaced: bool) -> Built:
    return Built(clause.text + (" " if spaced else "") + mark, (*clause.tokens, mark))


@st.composite
def canonical_segments(draw: st.DrawFn, language: str) -> Built:
    """A segment of one to three clauses, with its expected tokens, in ``language``'s canonical spacing."""
    is_french = language.startswith("fr")
    clauses = draw(st.lists(_clauses(language), min_size=1, max_size=3))
    parts = []
    for clause in clauses[:-1]:
        mark = draw(st.sampled_from([",", ";", ":", ""]))
        parts.append(_attach(clause, mark, spaced=is_french and mark in {";", ":"}) if mark else clause)
    last = clauses[-1]
    if language.startswith("es") and draw(st.booleans()):
        opening, closing = draw(st.sampled_from([("¿", "?"), ("¡", "!")]))
        last = Built(f"{opening}{last.text}{closing}", (opening, *last.tokens, closing))
    else:
        mark = draw(st.sampled_from([".", "!", "?", ""]))
        if mark:
            last = _attach(last, mark, spaced=is_french and mark in {"!", "?"})
    parts.append(last)
    return _joined(*parts)


# Text the tokenizer must survive: any characters check_text accepts (no controls other than tab, no line
# breaks, no surrogates), with extra weight on whitespace variants and on the characters patterns start with.
ACCEPTED_CHARACTERS = st.characters(exclude_categories=["Cc", "Cs", "Zl", "Zp"])
ARBITRARY_TEXT = st.one_of(
    st.text(st.one_of(ACCEPTED_CHARACTERS, st.sampled_from(list("\t \u00a0\u202f\u3000"))), max_size=40),
    st.lists(
        st.one_of(
            st.sampled_from(list(" \t\u00a0.,;:!?'\"()[]{}<>/\\%$@#~-+=*&«»¿¡’é\u0301")),
            st.text("abcXYZ019", min_size=1, max_size=4),
            PLACEHOLDERS,
            PROTECTED_OTHERS,
        ),
        max_size=15,
    ).map("".join),
)
