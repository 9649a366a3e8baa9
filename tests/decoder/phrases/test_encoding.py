"""Phrase rows, their exact sort keys and the packed internal alignment."""

import numpy as np
import pytest

from decoder.phrases.encoding import (
    PAD_ID,
    mask_bits,
    pack_mask,
    packed_links,
    phrase_rows,
    row_sort_keys,
    unique_rows,
)


def random_rows(rng, num_rows, width, largest_id):
    rows = rng.integers(4, largest_id + 1, (num_rows, width)).astype(np.int32)
    lengths = rng.integers(1, width + 1, num_rows)
    rows[np.arange(width)[None, :] >= lengths[:, None]] = PAD_ID
    return rows[rng.integers(0, num_rows // 3 + 1, num_rows)]  # many duplicates


@pytest.mark.parametrize(("width", "largest_id"), [(7, 30), (7, 60_000), (8, 2_000_000_000), (1, 9)])
def test_unique_rows_matches_numpy_unique(width, largest_id):
    # Reference: numpy's np.unique(axis=0), which sorts rows lexicographically element by element.
    rng = np.random.default_rng(width + largest_id)
    rows = random_rows(rng, 3000, width, largest_id)
    expected_unique, expected_inverse = np.unique(rows, axis=0, return_inverse=True)
    unique, inverse = unique_rows(rows)
    np.testing.assert_array_equal(unique, expected_unique)
    np.testing.assert_array_equal(inverse, expected_inverse.ravel())


def test_sort_keys_put_a_phrase_before_its_extensions():
    # Hand-ordered: PAD_ID (-1) is below every id, so [5] < [5, 0] < [5, 7] < [5, 7, 2] < [6].
    rows = np.array([[6, -1, -1], [5, 7, 2], [5, -1, -1], [5, 7, -1], [5, 0, -1]], dtype=np.int32)
    keys = row_sort_keys(rows)
    order = np.lexsort(keys[::-1])
    np.testing.assert_array_equal(order, [2, 4, 3, 1, 0])


def test_phrase_rows_pads_short_phrases():
    ids = np.array([10, 11, 12, 13], dtype=np.int32)
    rows = phrase_rows(ids, np.array([1, 3, 0]), np.array([2, 1, 3]), 3)
    np.testing.assert_array_equal(rows, [[11, 12, -1], [13, -1, -1], [10, 11, 12]])


def test_mask_bits_matches_bit_by_bit_unpacking():
    # Reference: numpy.unpackbits over all 64 bits (bit 8 * source + target, little-endian bytes).
    rng = np.random.default_rng(3)
    masks = rng.integers(0, 2**63, 500, dtype=np.uint64) & rng.integers(0, 2**63, 500, dtype=np.uint64)
    masks[:5] = 0
    bits = np.unpackbits(masks.astype("<u8").view(np.uint8).reshape(-1, 8), axis=1, bitorder="little")
    expected_rows, expected_bits = np.nonzero(bits)
    rows, source, target = mask_bits(masks)
    np.testing.assert_array_equal(rows, expected_rows)
    np.testing.assert_array_equal(source, expected_bits // 8)
    np.testing.assert_array_equal(target, expected_bits % 8)


def test_pack_mask_bit_layout_and_round_trip():
    # By hand: links (0, 0), (0, 1), (1, 2) -> bits 0, 1 and 8 * 1 + 2 = 10 -> 1 + 2 + 1024 = 1027.
    assert pack_mask([(0, 0), (0, 1), (1, 2)]) == 1027
    masks = np.array([1027, 0, pack_mask([(7, 7)])], dtype=np.uint64)
    offsets, links = packed_links(masks)
    np.testing.assert_array_equal(offsets, [0, 3, 3, 4])
    np.testing.assert_array_equal(links, [[0, 0], [0, 1], [1, 2], [7, 7]])
    assert links.dtype == np.int8


def test_pack_mask_rejects_links_outside_eight_by_eight():
    with pytest.raises(ValueError, match="outside"):
        pack_mask([(8, 0)])
