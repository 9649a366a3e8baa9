"""Sparse word translation table t(target word | source word), the output of IBM Model 1 and the HMM.

Only co-occurring pairs are stored: ``keys`` holds ``source_id * num_target_words + target_id`` sorted ascending
(int64) and ``probabilities`` the matching values (float64). Source id NULL_ID stands for the empty word.
Lexical weighting (Koehn et al. 2003) and the HMM emission step read it through ``lookup``.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

MIN_PROBABILITY = 1e-12  # floor for pairs never seen together, so log probabilities stay finite


@dataclass(frozen=True, slots=True)
class LexicalTable:
    num_source_words: int
    num_target_words: int
    keys: npt.NDArray[np.int64]
    probabilities: npt.NDArray[np.float64]

    def key_of(self, source_ids: npt.ArrayLike, target_ids: npt.ArrayLike) -> npt.NDArray[np.int64]:
        return np.asarray(source_ids, dtype=np.int64) * self.num_target_words + np.asarray(target_ids, np.int64)

    def index_of(self, source_ids: npt.ArrayLike, target_ids: npt.ArrayLike) -> npt.NDArray[np.int64]:
        """Row of each (source, target) pair in ``keys``, or -1 where the pair is not stored."""
        wanted = self.key_of(source_ids, target_ids)
        rows = np.searchsorted(self.keys, wanted)
        rows = np.minimum(rows, max(len(self.keys) - 1, 0))
        found = (len(self.keys) > 0) & (self.keys[rows] == wanted) if len(self.keys) else np.zeros(wanted.shape, bool)
        return np.where(found, rows, -1)

    def lookup(self, source_ids: npt.ArrayLike, target_ids: npt.ArrayLike) -> npt.NDArray[np.float64]:
        """t(target | source) elementwise; MIN_PROBABILITY for pairs not in the table."""
        rows = self.index_of(source_ids, target_ids)
        values = self.probabilities[np.maximum(rows, 0)] if len(self.keys) else np.zeros(rows.shape)
        return np.where(rows >= 0, values, MIN_PROBABILITY)

    def probability(self, source_id: int, target_id: int) -> float:
        return float(self.lookup([source_id], [target_id])[0])

    def __len__(self) -> int:
        return len(self.keys)
