"""Bijective map between token strings and dense integer ids, frozen once built.

Hot code never sees strings: corpora, tables and models hold ids from a Vocabulary. The first ids are reserved
for the special tokens below, identical in every vocabulary, so code may use the constants directly.
Storage for model directories is two arrays (one UTF-8 blob and int64 offsets), so a vocabulary can be
memory-mapped like every other model array; the string -> id dict is rebuilt once at load.
"""

from __future__ import annotations

from collections import Counter
from collections.abc import Iterable, Mapping, Sequence

import numpy as np
import numpy.typing as npt

UNKNOWN_ID = 0
SENTENCE_START_ID = 1
SENTENCE_END_ID = 2
NULL_ID = 3
SPECIAL_TOKENS = ("<unk>", "<s>", "</s>", "<null>")
NUM_SPECIAL = len(SPECIAL_TOKENS)


class Vocabulary:
    """Token strings <-> ids. Ids 0..3 are ``<unk>``, ``<s>``, ``</s>`` and ``<null>`` (the alignment NULL word)."""

    __slots__ = ("_tokens", "_ids")

    def __init__(self, tokens: Sequence[str]) -> None:
        if tuple(tokens[:NUM_SPECIAL]) != SPECIAL_TOKENS:
            raise ValueError("a vocabulary must start with the special tokens " + " ".join(SPECIAL_TOKENS))
        self._tokens: tuple[str, ...] = tuple(tokens)
        self._ids: dict[str, int] = {token: index for index, token in enumerate(self._tokens)}
        if len(self._ids) != len(self._tokens):
            raise ValueError("vocabulary tokens must be unique")

    @classmethod
    def build(cls, segments: Iterable[Sequence[str]], min_count: int = 1) -> Vocabulary:
        """Vocabulary of all tokens seen at least ``min_count`` times, most frequent first (ties by string)."""
        counts: Counter[str] = Counter()
        for tokens in segments:
            counts.update(tokens)
        return cls.from_counts(counts, min_count)

    @classmethod
    def from_counts(cls, counts: Mapping[str, int], min_count: int = 1) -> Vocabulary:
        """Like ``build``, from token counts already made."""
        kept = sorted((token for token, count in counts.items() if count >= min_count and token not in SPECIAL_TOKENS),
                      key=lambda token: (-counts[token], token))
        return cls(SPECIAL_TOKENS + tuple(kept))

    def __len__(self) -> int:
        return len(self._tokens)

    def __contains__(self, token: str) -> bool:
        return token in self._ids

    def id_of(self, token: str) -> int:
        """The token's id, or UNKNOWN_ID."""
        return self._ids.get(token, UNKNOWN_ID)

    def token_of(self, token_id: int) -> str:
        return self._tokens[token_id]

    def encode(self, tokens: Sequence[str]) -> npt.NDArray[np.int32]:
        """Ids of ``tokens`` (unknown tokens map to UNKNOWN_ID)."""
        get = self._ids.get
        return np.fromiter((get(token, UNKNOWN_ID) for token in tokens), dtype=np.int32, count=len(tokens))

    def decode(self, ids: Iterable[int]) -> list[str]:
        return [self._tokens[int(token_id)] for token_id in ids]

    @property
    def tokens(self) -> tuple[str, ...]:
        return self._tokens

    def to_arrays(self) -> tuple[npt.NDArray[np.uint8], npt.NDArray[np.int64]]:
        """(blob, offsets): token k is ``blob[offsets[k]:offsets[k + 1]]`` decoded as UTF-8."""
        encoded = [token.encode("utf-8") for token in self._tokens]
        offsets = np.zeros(len(encoded) + 1, dtype=np.int64)
        np.cumsum([len(item) for item in encoded], out=offsets[1:])
        blob = np.frombuffer(b"".join(encoded), dtype=np.uint8).copy()
        return blob, offsets

    @classmethod
    def from_arrays(cls, blob: npt.NDArray[np.uint8], offsets: npt.NDArray[np.int64]) -> Vocabulary:
        data = bytes(blob)
        bounds = offsets.tolist()
        return cls([data[start:end].decode("utf-8") for start, end in zip(bounds[:-1], bounds[1:], strict=True)])
