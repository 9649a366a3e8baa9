"""Exact integer encodings for phrases and for the word alignment inside a phrase pair.

A phrase is a row of ``width`` int32 token ids padded on the right with PAD_ID (-1). Because PAD_ID is smaller
than every token id, sorting rows lexicographically puts a phrase directly before all of its extensions, which
is what prefix search in the phrase table relies on. Dense phrase ids are ranks in that order
(``unique_rows``).

The internal alignment of a phrase pair is an 8 x 8 bit matrix in one uint64: bit ``8 * i + j`` is set when
source word i of the pair is linked to target word j (positions relative to the phrase starts). Hence phrase
lengths are limited to MAX_SUPPORTED_PHRASE_LENGTH = 8 tokens.
"""

from __future__ import annotations

import numpy as np
import numpy.typing as npt

PAD_ID = -1
MAX_SUPPORTED_PHRASE_LENGTH = 8
_BITS_PER_WORD = 64


def phrase_rows(
    ids: npt.NDArray[np.int32], starts: npt.NDArray[np.integer], lengths: npt.NDArray[np.integer], width: int
) -> npt.NDArray[np.int32]:
    """Rows ``ids[start:start + length]`` padded with PAD_ID to ``width`` columns, one per start."""
    columns = np.arange(width, dtype=np.int64)
    inside = columns[None, :] < np.asarray(lengths, dtype=np.int64)[:, None]
    if len(ids) == 0:
        return np.full(inside.shape, PAD_ID, dtype=np.int32)
    positions = np.minimum(np.asarray(starts, dtype=np.int64)[:, None] + columns[None, :], len(ids) - 1)
    return np.where(inside, ids[positions], PAD_ID).astype(np.int32, copy=False)


def row_sort_keys(rows: npt.NDArray[np.int32]) -> list[npt.NDArray[np.uint64]]:
    """uint64 words whose lexicographic order (first word most significant) equals that of ``rows``.

    Each token id plus one (so PAD_ID becomes 0) takes ``b`` bits, b just large enough for the largest value,
    and as many tokens as fit are packed into one word, the earliest token in the highest bits. The packing is
    exact: equal words mean equal rows. For vocabularies below 65,535 words a row of 7 tokens needs two
    words."""
    num_rows, width = rows.shape
    values = rows.astype(np.int64) + 1
    largest = int(values.max()) if values.size else 0
    bits = max(1, largest.bit_length())
    tokens_per_word = _BITS_PER_WORD // bits
    words = []
    for first in range(0, width, tokens_per_word):
        word = np.zeros(num_rows, dtype=np.uint64)
        for slot, column in enumerate(range(first, min(width, first + tokens_per_word))):
            shift = np.uint64(bits * (tokens_per_word - 1 - slot))
            word |= values[:, column].astype(np.uint64) << shift
        words.append(word)
    return words


def lexicographic_order(
    keys: list[npt.NDArray[np.unsignedinteger | np.signedinteger]],
) -> npt.NDArray[np.int64]:
    """Stable permutation sorting by ``keys[0]``, then ``keys[1]``, ... (np.lexsort wants the reverse)."""
    if len(keys) == 1:
        return np.argsort(keys[0], kind="stable")
    return np.lexsort(keys[::-1])


def group_starts(sorted_keys: list[npt.NDArray[np.generic]]) -> npt.NDArray[np.bool_]:
    """True where a run of equal key tuples begins, for keys already in lexicographic order."""
    length = len(sorted_keys[0]) if sorted_keys else 0
    starts = np.zeros(length, dtype=bool)
    if length:
        starts[0] = True
        for key in sorted_keys:
            starts[1:] |= key[1:] != key[:-1]
    return starts


def unique_rows(rows: npt.NDArray[np.int32]) -> tuple[npt.NDArray[np.int32], npt.NDArray[np.int64]]:
    """(unique rows in lexicographic order, inverse) with ``unique[inverse] == rows``.

    Same result as ``np.unique(rows, axis=0, return_inverse=True)`` but several times faster, because it sorts
    packed uint64 words instead of comparing rows element by element."""
    if len(rows) == 0:
        return rows.copy(), np.zeros(0, dtype=np.int64)
    keys = row_sort_keys(rows)
    order = lexicographic_order(keys)
    starts = group_starts([key[order] for key in keys])
    inverse = np.empty(len(rows), dtype=np.int64)
    inverse[order] = np.cumsum(starts) - 1
    return rows[order[starts]], inverse


def phrase_lengths(rows: npt.NDArray[np.int32]) -> npt.NDArray[np.int64]:
    """Number of tokens in each padded row."""
    return np.count_nonzero(rows != PAD_ID, axis=1).astype(np.int64)


# For each byte value: how many bits are set, and where its list of set bit positions starts in _BYTE_BITS.
_BYTE_POPCOUNT = np.unpackbits(np.arange(256, dtype=np.uint8)[:, None], axis=1).sum(axis=1).astype(np.int64)
_BYTE_BITS_START = np.concatenate([[0], np.cumsum(_BYTE_POPCOUNT)[:-1]])
_BYTE_BITS = np.concatenate(
    [np.flatnonzero([(value >> bit) & 1 for bit in range(8)]) for value in range(256)]
)


def mask_bits(
    masks: npt.NDArray[np.uint64],
) -> tuple[npt.NDArray[np.int64], npt.NDArray[np.int64], npt.NDArray[np.int64]]:
    """Every link in packed alignment masks as (row index, source position, target position), row-major order.

    Within a row, links come sorted by (source position, target position). Byte b of a mask is source row b
    of the bit matrix, so only non-zero bytes are expanded (via per-byte tables), not all 64 bits."""
    as_bytes = np.ascontiguousarray(masks, dtype="<u8").view(np.uint8).reshape(len(masks), 8)
    rows, source = np.nonzero(as_bytes)
    values = as_bytes[rows, source].astype(np.int64)
    repeats = _BYTE_POPCOUNT[values]
    first = np.repeat(_BYTE_BITS_START[values] - (np.cumsum(repeats) - repeats), repeats)
    target = _BYTE_BITS[first + np.arange(len(first))]
    return np.repeat(rows.astype(np.int64), repeats), np.repeat(source.astype(np.int64), repeats), target


def pack_mask(links: list[tuple[int, int]] | npt.NDArray[np.integer]) -> int:
    """The packed uint64 value (as a Python int) of one pair's links (source position, target position)."""
    value = 0
    for source, target in links:
        if not (0 <= source < MAX_SUPPORTED_PHRASE_LENGTH and 0 <= target < MAX_SUPPORTED_PHRASE_LENGTH):
            raise ValueError(f"link ({source}, {target}) is outside an 8 x 8 phrase pair")
        value |= 1 << (MAX_SUPPORTED_PHRASE_LENGTH * int(source) + int(target))
    return value


def packed_links(masks: npt.NDArray[np.uint64]) -> tuple[npt.NDArray[np.int64], npt.NDArray[np.int8]]:
    """(offsets, links): row k's links are ``links[offsets[k]:offsets[k + 1]]``, (source, target) int8."""
    rows, source, target = mask_bits(masks)
    offsets = np.zeros(len(masks) + 1, dtype=np.int64)
    np.cumsum(np.bincount(rows, minlength=len(masks)), out=offsets[1:])
    return offsets, np.stack([source, target], axis=1).astype(np.int8).reshape(-1, 2)
