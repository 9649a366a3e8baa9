"""The two calls the rest of the engine makes: raw segment -> model tokens, and model output -> final text.

``prepare_segment`` runs check, normalise, tokenize, protect and lowercase, and keeps everything that
``finish_segment`` needs to undo them after decoding. ``model_tokens`` is the same transformation without
the bookkeeping, for training corpora. Model tokens never contain whitespace, so a tokenized corpus can be
written one segment per line with tokens separated by spaces.

Command-line options (``--force``, ``-n``) keep their case in the model tokens: they are case-sensitive
identifiers, and the decoder passes unknown tokens through unchanged.
"""

from __future__ import annotations

from collections.abc import Sequence
from dataclasses import dataclass

from decoder.text.casing import Truecaser, lowercase, restore_casing
from decoder.text.detokenizer import detokenize
from decoder.text.normalize import check_text, normalize
from decoder.text.protection import (
    CLASS_TOKEN_OF_KIND,
    ProtectedSegment,
    ProtectedToken,
    protect,
    restore,
    tag_class_token,
)
from decoder.text.tokenizer import Token, TokenKind, token_pattern, tokenize


@dataclass(frozen=True, slots=True)
class PreparedSegment:
    """One source segment ready for the model, with what is needed to finish its translation."""

    language: str  # the BCP 47 tag it was prepared with
    text: str  # the normalised text; token offsets index this string
    tokens: tuple[Token, ...]
    protected: ProtectedSegment
    model_tokens: tuple[str, ...]  # what the model sees: class tokens for protected tokens, lowercased words

    @property
    def cased_tokens(self) -> tuple[str, ...]:
        """The model tokens before lowercasing (class tokens, original casing): what ``Truecaser.learn`` reads.

        ``lowercase(cased_tokens) == model_tokens``."""
        return self.protected.tokens


@dataclass(frozen=True, slots=True)
class FinishedSegment:
    """A finished translation and what ``restore`` had to repair on the way."""

    text: str
    num_dropped: int  # class tokens in the output without a source original, removed
    missing: tuple[ProtectedToken, ...]  # source originals the output had no class token for, appended


def prepare_segment(text: str, language: str) -> PreparedSegment:
    """Check, normalise, tokenize, protect and lowercase one raw segment.

    Raises InvalidTextError (naming the character position in ``text``) for control characters and line
    breaks."""
    check_text(text)
    normalized = normalize(text)
    tokens = tuple(tokenize(normalized, language))
    protected = protect(tokens)
    model = tuple(lowercase(protected.tokens))
    return PreparedSegment(language, normalized, tokens, protected, model)


def model_tokens(text: str, language: str) -> list[str]:
    """``list(prepare_segment(text, language).model_tokens)``, computed without building Token objects.

    About twice as fast as ``prepare_segment``; use it wherever only the model tokens are needed."""
    check_text(text)
    compiled = token_pattern(language)
    kinds = compiled.kinds
    class_of_kind = CLASS_TOKEN_OF_KIND
    result: list[str] = []
    append = result.append
    for match in compiled.regex.finditer(normalize(text)):
        group = match.lastindex
        kind = kinds[group]  # type: ignore[index]
        token = match.group(group)  # type: ignore[arg-type]
        class_token = class_of_kind.get(kind)  # type: ignore[arg-type]
        if class_token is not None:
            append(class_token)
        elif kind is TokenKind.TAG:
            append(tag_class_token(token))
        elif kind is TokenKind.OPTION:
            append(token)
        else:
            append(token.lower())
    return result


def finish_segment_with_report(
    output_model_tokens: Sequence[str],
    source: PreparedSegment,
    target_language: str,
    truecaser: Truecaser | None = None,
    source_positions: Sequence[int | None] | None = None,
) -> FinishedSegment:
    """Like ``finish_segment``, and also reports dropped class tokens and appended originals."""
    cased = restore_casing(output_model_tokens, source.cased_tokens, truecaser)
    restored = restore(cased, source.protected, source_positions)
    # A placeholder the decoder lost is appended rather than lost: a translated message that misses a %s
    # breaks the program that prints it.
    tokens = list(restored) + [original.text for original in restored.missing]
    return FinishedSegment(detokenize(tokens, target_language), restored.num_dropped, restored.missing)


def finish_segment(
    output_model_tokens: Sequence[str],
    source: PreparedSegment,
    target_language: str,
    truecaser: Truecaser | None = None,
    source_positions: Sequence[int | None] | None = None,
) -> str:
    """The final target text: casing restored, originals put back for class tokens, then detokenized.

    Casing runs before restoring originals, while protected tokens are still class tokens, so a URL or
    placeholder at the start of the output is never capitalised. ``source_positions[i]`` is the source
    token position output token i was translated from (None if unknown), used to put reordered
    placeholders back correctly. Source originals with no class token in the output are appended at the
    end; use ``finish_segment_with_report`` to learn about such repairs."""
    return finish_segment_with_report(output_model_tokens, source, target_language, truecaser, source_positions).text
