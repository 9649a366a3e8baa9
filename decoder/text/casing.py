"""Casing: the model sees lowercased tokens; output casing comes back from a truecaser and the source.

The truecaser is a table from each lowercased word to the surface form seen most often where casing carries
information, i.e. not at the start of a sentence (the usual frequency truecaser; compare Lita et al. 2003,
"tRuEcasIng", who model the same statistic with a language model). ``restore_casing`` then applies the
sentence-start rule: the first word of the output follows the first word of the source.
"""

from __future__ import annotations

from collections import Counter, defaultdict
from collections.abc import Iterable, Sequence

import numpy as np
import numpy.typing as npt

from decoder.text.protection import CLASS_TOKENS, CLOSING_TAG, EMPTY_TAG, OPENING_TAG

# Tokens after which a new sentence starts, so the next word is in sentence-initial position.
SENTENCE_END_TOKENS = frozenset({".", "!", "?", "...", "…"})
TAG_CLASS_TOKENS = frozenset({OPENING_TAG, CLOSING_TAG, EMPTY_TAG})


def is_option(token: str) -> bool:
    """True for a command-line option token ("-n", "--Dry-Run"): a dash (or two) followed by a letter.

    No other token the tokenizer makes starts that way (words never start with a dash), so the shape is
    enough to recognise options among plain strings."""
    return token[:1] == "-" and (token[1:2].isalpha() or (token[1:2] == "-" and token[2:3].isalpha()))


def lowercase(tokens: Sequence[str]) -> list[str]:
    """The tokens lowercased with str.lower (not casefold: "ß" stays "ß") for the model.

    Class tokens are left untouched, and so are command-line options, which are case-sensitive identifiers
    ("-n" and "-N" differ) that the decoder passes through."""
    return [token if token in CLASS_TOKENS or is_option(token) else token.lower() for token in tokens]


def _is_punctuation(token: str) -> bool:
    """True for tokens without any letter or digit (and not class tokens): skipped when finding a first word."""
    return token not in CLASS_TOKENS and not any(character.isalnum() for character in token)


def _is_markup(token: str) -> bool:
    """A tag class token, or a tag's own text ("<b>"): markup, not the first word of a sentence."""
    return token in TAG_CLASS_TOKENS or (len(token) >= 3 and token[0] == "<" and token[-1] == ">")


def _first_content_index(tokens: Sequence[str]) -> int | None:
    """Index of the first token that is neither punctuation (quotes, "¿", "(" ...) nor markup, or None."""
    for index, token in enumerate(tokens):
        if not _is_punctuation(token) and not _is_markup(token):
            return index
    return None


def _capitalise(word: str) -> str:
    # Title case of the first character is the right form for digraph letters ("ǆ" -> "ǅ").
    return word[:1].title() + word[1:]


class Truecaser:
    """Lowercased word -> its most frequent surface form in non-sentence-initial positions.

    Stored as the surface forms alone: the key of each is its own lowercase form."""

    __slots__ = ("_forms",)

    def __init__(self, surface_forms: Iterable[str]) -> None:
        self._forms: dict[str, str] = {}
        for form in surface_forms:
            key = form.lower()
            if key in self._forms:
                raise ValueError(f"two surface forms for {key!r}: {self._forms[key]!r} and {form!r}")
            self._forms[key] = form

    @classmethod
    def learn(cls, segments: Iterable[Sequence[str]]) -> Truecaser:
        """Count surface forms of every cased token outside sentence-initial positions.

        A position is sentence-initial if it holds the first non-punctuation token of the segment or the
        first one after a sentence end (". ! ? ..."). Words seen only sentence-initially are not learned
        (they stay unknown), nor are class tokens and options, whose casing is not a matter of style. Ties go
        to the all-lowercase form, then to the smallest string, so the result does not depend on corpus
        order."""
        counts: defaultdict[str, Counter[str]] = defaultdict(Counter)
        for tokens in segments:
            at_sentence_start = True
            for token in tokens:
                if token in SENTENCE_END_TOKENS:
                    at_sentence_start = True
                    continue
                if _is_punctuation(token):
                    continue
                initial, at_sentence_start = at_sentence_start, False
                if initial or token in CLASS_TOKENS or is_option(token):
                    continue
                key = token.lower()
                if key != token.upper():  # only tokens with cased letters carry casing information
                    counts[key][token] += 1
        forms = []
        for key, form_counts in counts.items():
            forms.append(min(form_counts, key=lambda form: (-form_counts[form], form != key, form)))
        return cls(sorted(forms))

    def __len__(self) -> int:
        return len(self._forms)

    def surface_form(self, word: str) -> str | None:
        """The learned form of ``word`` (any casing), or None if the word is unknown."""
        return self._forms.get(word.lower())

    def apply(self, tokens: Sequence[str]) -> list[str]:
        """Every known token replaced by its learned surface form; unknown tokens unchanged (options and class
        tokens are never learned, so they stay as they are)."""
        forms = self._forms
        return [forms.get(token.lower(), token) for token in tokens]

    @property
    def surface_forms(self) -> tuple[str, ...]:
        """All learned forms, sorted; ``Truecaser(t.surface_forms)`` rebuilds ``t``."""
        return tuple(sorted(self._forms.values()))

    def to_arrays(self) -> tuple[npt.NDArray[np.uint8], npt.NDArray[np.int64]]:
        """(blob, offsets) for a model directory: form k is ``blob[offsets[k]:offsets[k + 1]]`` in UTF-8."""
        encoded = [form.encode("utf-8") for form in self.surface_forms]
        offsets = np.zeros(len(encoded) + 1, dtype=np.int64)
        np.cumsum([len(item) for item in encoded], out=offsets[1:])
        return np.frombuffer(b"".join(encoded), dtype=np.uint8).copy(), offsets

    @classmethod
    def from_arrays(cls, blob: npt.NDArray[np.uint8], offsets: npt.NDArray[np.int64]) -> Truecaser:
        data = bytes(blob)
        bounds = [int(offset) for offset in offsets]
        return cls(data[start:end].decode("utf-8") for start, end in zip(bounds[:-1], bounds[1:], strict=True))


def restore_casing(
    output_tokens: Sequence[str], source_tokens_original: Sequence[str], truecaser: Truecaser | None
) -> list[str]:
    """The output tokens truecased, with the first word's capital taken from the source.

    ``source_tokens_original`` are the source tokens in their original casing, either as text or with class
    tokens (``PreparedSegment.cased_tokens``). Leading punctuation and markup are skipped on both sides. If
    the source's first remaining token starts with a capital letter, the output's first remaining token is
    capitalised when it is a word (starts with a letter; class tokens, numbers and options are left alone).
    Otherwise that word keeps its truecased form: lowercase, unless the truecaser learned a capitalised
    form (a product name). Without a truecaser only the first-word rule applies."""
    tokens = truecaser.apply(output_tokens) if truecaser is not None else list(output_tokens)
    source_index = _first_content_index(source_tokens_original)
    if source_index is None or not source_tokens_original[source_index][:1].isupper():
        return tokens
    index = _first_content_index(tokens)
    if index is not None and tokens[index] not in CLASS_TOKENS and tokens[index][:1].isalpha():
        tokens[index] = _capitalise(tokens[index])
    return tokens


def copy_source_capitals(
    output_tokens: Sequence[str], source_positions: Sequence[int | None], source_tokens_original: Sequence[str]
) -> list[str]:
    """Capitalise output words aligned to a capitalised source word inside the sentence.

    UI text capitalises names of buttons and menus ("click Save" -> "haga clic en Guardar"): a word that is
    capitalised in the source although it does not start a sentence carries that capital to the word it
    translates to, if that word is lowercase. Sentence-initial source words are left to ``restore_casing``."""
    tokens = list(output_tokens)
    sentence_starts = {index for index, token in enumerate(source_tokens_original)
                       if index == _first_content_index(source_tokens_original)
                       or (index > 0 and source_tokens_original[index - 1] in SENTENCE_END_TOKENS)}
    for index, (token, position) in enumerate(zip(tokens, source_positions, strict=True)):
        if position is None or position in sentence_starts or token in CLASS_TOKENS:
            continue
        source = source_tokens_original[position]
        if source[:1].isupper() and not source.isupper() and token[:1].isalpha() and token[:1].islower():
            tokens[index] = _capitalise(token)
    return tokens
