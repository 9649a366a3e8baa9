"""Corpora shared by the language model tests."""

from __future__ import annotations

import numpy as np

from decoder.segment_arrays import SegmentArray
from decoder.vocabulary import SPECIAL_TOKENS, Vocabulary

# Console commands of the (fictional) Brindlewood K2 ticket kiosk, one command sequence per segment.
HAND_VOCABULARY = Vocabulary(SPECIAL_TOKENS + ("press", "start", "stop", "reset"))
PRESS, START_WORD, STOP, RESET = 4, 5, 6, 7
HAND_SEGMENTS = [[PRESS, START_WORD], [PRESS, START_WORD], [PRESS, START_WORD, STOP], [PRESS, STOP, RESET, STOP]]


def random_segments(seed: int, num_segments: int, vocabulary_size: int, max_length: int) -> list[list[int]]:
    """Segments of ordinary word ids (4..vocabulary_size-1) drawn with Zipf-like skew, lengths 0..max_length,
    so that some n-grams repeat and many do not, as in real text."""
    rng = np.random.default_rng(seed)
    num_words = vocabulary_size - 4
    weights = 1.0 / np.arange(1, num_words + 1)
    weights /= weights.sum()
    return [
        (4 + rng.choice(num_words, size=int(rng.integers(0, max_length + 1)), p=weights)).tolist()
        for _ in range(num_segments)
    ]


def as_segment_array(segments: list[list[int]]) -> SegmentArray:
    return SegmentArray.from_sequences(segments)
