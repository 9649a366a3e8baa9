"""Placeholder protection: tokens the model must copy, not translate, are swapped for class tokens and back.

Before training and translation, printf and brace placeholders, markup tags, URLs, e-mail addresses, file
paths and numbers become one class token each (``⟨ph⟩``, ``⟨url⟩``, ...), so the model learns where such
things go without learning every value. After decoding, ``restore`` puts each original back verbatim. The
class tokens are written with U+27E8/U+27E9 mathematical angle brackets: the tokenizer always splits those
from neighbouring letters, so no real text can ever tokenize into a class token.
"""

from __future__ import annotations

from collections import defaultdict, deque
from collections.abc import Sequence
from dataclasses import dataclass

from decoder.text.tokenizer import Token, TokenKind

PLACEHOLDER = "⟨ph⟩"  # printf (%s, %1$d) and brace ({0}, {name}) placeholders
OPENING_TAG = "⟨tag⟩"  # <b>, <a href="...">
CLOSING_TAG = "⟨/tag⟩"  # </b>
EMPTY_TAG = "⟨tag/⟩"  # <br/>
URL = "⟨url⟩"
EMAIL = "⟨email⟩"
PATH = "⟨path⟩"
NUMBER = "⟨num⟩"
CLASS_TOKENS = frozenset({PLACEHOLDER, OPENING_TAG, CLOSING_TAG, EMPTY_TAG, URL, EMAIL, PATH, NUMBER})

# Opening and closing tags get different classes so that, when no alignment is available, the k-th-to-k-th
# fallback of ``restore`` can never put a closing tag where an opening one was.
CLASS_TOKEN_OF_KIND: dict[TokenKind, str] = {
    TokenKind.PRINTF: PLACEHOLDER,
    TokenKind.BRACE: PLACEHOLDER,
    TokenKind.URL: URL,
    TokenKind.EMAIL: EMAIL,
    TokenKind.PATH: PATH,
    TokenKind.NUMBER: NUMBER,
}


def tag_class_token(tag: str) -> str:
    """The class token of a markup tag's text: closing ``</x>``, empty ``<x/>`` or opening ``<x>``."""
    if tag.startswith("</"):
        return CLOSING_TAG
    if tag.endswith("/>"):
        return EMPTY_TAG
    return OPENING_TAG


def class_token_of(kind: TokenKind, text: str) -> str | None:
    """The class token that replaces a token of this kind and text, or None if it is not protected."""
    if kind is TokenKind.TAG:
        return tag_class_token(text)
    return CLASS_TOKEN_OF_KIND.get(kind)


@dataclass(frozen=True, slots=True)
class ProtectedToken:
    """One protected source token: where it was, what replaced it, and its original text."""

    position: int  # index in the segment's token list
    class_token: str
    text: str


@dataclass(frozen=True, slots=True)
class ProtectedSegment:
    """The token texts with protected tokens replaced (same length and order as the input tokens), and the
    originals in source order."""

    tokens: tuple[str, ...]
    originals: tuple[ProtectedToken, ...]


class RestoredTokens(list[str]):
    """The output tokens with originals put back; a plain list of strings carrying two reports.

    ``num_dropped`` counts class tokens in the output that had no source original left (they are removed);
    ``missing`` lists the source originals that no output class token took (the caller decides whether to
    append or report them)."""

    __slots__ = ("num_dropped", "missing")

    def __init__(self, tokens: Sequence[str], num_dropped: int, missing: tuple[ProtectedToken, ...]) -> None:
        super().__init__(tokens)
        self.num_dropped = num_dropped
        self.missing = missing


def protect(tokens: Sequence[Token]) -> ProtectedSegment:
    """Replace every printf, brace, tag, URL, e-mail, path and number token by its class token."""
    texts: list[str] = []
    originals: list[ProtectedToken] = []
    class_token_of_kind = CLASS_TOKEN_OF_KIND.get
    for position, token in enumerate(tokens):
        kind = token.kind
        class_token = tag_class_token(token.text) if kind is TokenKind.TAG else class_token_of_kind(kind)
        if class_token is None:
            texts.append(token.text)
        else:
            texts.append(class_token)
            originals.append(ProtectedToken(position, class_token, token.text))
    return ProtectedSegment(tuple(texts), tuple(originals))


def restore(
    output_tokens: Sequence[str],
    protected: ProtectedSegment,
    source_positions: Sequence[int | None] | None = None,
) -> RestoredTokens:
    """``output_tokens`` with each class token replaced by a source original of the same class, verbatim.

    Each original is used at most once. First, where ``source_positions[i]`` (the source token position that
    output token i came from, or None) points at a protected source token of the same class, that original
    is used. Every other output class token takes the earliest unused original of its class, so without
    positions the k-th output occurrence of a class gets the k-th source occurrence. Output class tokens
    with no original left are dropped and counted; unused originals are reported in ``missing``."""
    if source_positions is not None and len(source_positions) != len(output_tokens):
        raise ValueError(
            f"{len(source_positions)} source positions for {len(output_tokens)} output tokens; "
            "give one position (or None) per output token"
        )
    by_position = {original.position: original for original in protected.originals}
    used: set[int] = set()
    assigned: dict[int, ProtectedToken] = {}
    if source_positions is not None:
        for index, (token, position) in enumerate(zip(output_tokens, source_positions, strict=True)):
            if token not in CLASS_TOKENS or position is None:
                continue
            original = by_position.get(position)
            if original is not None and original.class_token == token and original.position not in used:
                assigned[index] = original
                used.add(original.position)
    unused_by_class: defaultdict[str, deque[ProtectedToken]] = defaultdict(deque)
    for original in protected.originals:
        if original.position not in used:
            unused_by_class[original.class_token].append(original)
    restored: list[str] = []
    num_dropped = 0
    for index, token in enumerate(output_tokens):
        if token not in CLASS_TOKENS:
            restored.append(token)
            continue
        original = assigned.get(index)
        if original is None:
            queue = unused_by_class.get(token)
            if not queue:
                num_dropped += 1
                continue
            original = queue.popleft()
        restored.append(original.text)
    missing = tuple(sorted((o for queue in unused_by_class.values() for o in queue), key=lambda o: o.position))
    return RestoredTokens(restored, num_dropped, missing)
