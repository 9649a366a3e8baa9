"""The data contract between decoder and tuner, and the pool of n-best entries gathered over tuning iterations.

A feature vector is a float64 array in the fixed order of ``feature_names``; the model score of a hypothesis is
``weights @ features``. An n-best entry is ``(target tokens, feature vector)`` with the tokens as BLEU should see
them (tokenized, cased as the references). The decoder is any callable ``decode(weights, n_best)`` returning one
n-best list per dev segment, best first.

The pool keeps, per segment, every distinct ``(tokens, feature vector)`` pair seen so far. The same tokens can
come with different feature vectors from different derivations (segmentations, reorderings); each such pair is
a different line for MERT and a different point for PRO, and the model may choose either, so all are kept.
Feature vectors compare exactly (bitwise, after turning -0.0 into 0.0). BLEU statistics are computed once per
distinct token sequence of a segment and cached.
"""

from __future__ import annotations

from collections.abc import Callable, Sequence
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from decoder.errors import DecoderError
from decoder.tuning.bleu_statistics import NUM_STATISTICS, ReferenceSet, Tokens

FeatureVector = npt.NDArray[np.float64]
NBestEntry = tuple[Tokens, FeatureVector]
NBestList = list[NBestEntry]
DecodeFunction = Callable[[npt.NDArray[np.float64], int], list[NBestList]]


class NBestFormatError(DecoderError):
    """The decoder callable returned something that breaks the n-best contract (wrong number of segments, an
    empty list, a feature vector of the wrong length or with non-finite values)."""

    code = "invalid_n_best"


@dataclass(frozen=True, slots=True)
class PoolArrays:
    """All pool entries as flat arrays; segment k owns rows ``offsets[k]:offsets[k + 1]``.

    ``features``: (num_entries, num_features) float64; ``statistics``: (num_entries, NUM_STATISTICS) int64."""

    features: npt.NDArray[np.float64]
    statistics: npt.NDArray[np.int64]
    offsets: npt.NDArray[np.int64]

    @property
    def num_segments(self) -> int:
        return len(self.offsets) - 1

    def segment_of_entry(self) -> npt.NDArray[np.int64]:
        return np.repeat(np.arange(self.num_segments, dtype=np.int64), np.diff(self.offsets))

    def one_best_rows(self, weights: npt.ArrayLike) -> npt.NDArray[np.int64]:
        """Per segment, the row of the entry with the highest model score (the lowest row among exact ties)."""
        scores = self.features @ np.asarray(weights, dtype=np.float64)
        order = np.lexsort((-scores, self.segment_of_entry()))
        return order[self.offsets[:-1]]

    def one_best_statistics(self, weights: npt.ArrayLike) -> npt.NDArray[np.int64]:
        """Summed BLEU statistics of the 1-best entries under ``weights``."""
        return self.statistics[self.one_best_rows(weights)].sum(axis=0)


class NBestPool:
    """Distinct n-best entries per dev segment, accumulated across tuning iterations."""

    __slots__ = (
        "references",
        "feature_names",
        "_features",
        "_statistics",
        "_tokens",
        "_seen",
        "_statistics_cache",
        "_arrays",
    )

    def __init__(self, references: ReferenceSet, feature_names: Sequence[str]) -> None:
        self.references = references
        self.feature_names = tuple(feature_names)
        num_segments, num_features = references.num_segments, len(self.feature_names)
        self._features = [np.zeros((0, num_features)) for _ in range(num_segments)]
        self._statistics = [np.zeros((0, NUM_STATISTICS), dtype=np.int64) for _ in range(num_segments)]
        self._tokens: list[list[Tokens]] = [[] for _ in range(num_segments)]
        self._seen: list[set[tuple[Tokens, bytes]]] = [set() for _ in range(num_segments)]
        self._statistics_cache: list[dict[Tokens, npt.NDArray[np.int64]]] = [{} for _ in range(num_segments)]
        self._arrays: PoolArrays | None = None

    @property
    def num_segments(self) -> int:
        return len(self._features)

    def __len__(self) -> int:
        return sum(len(features) for features in self._features)

    def segment_sizes(self) -> npt.NDArray[np.int64]:
        return np.array([len(features) for features in self._features], dtype=np.int64)

    def add(self, n_best_lists: Sequence[Sequence[NBestEntry]]) -> int:
        """Merge one decode's n-best lists (one per segment) into the pool; returns how many entries were new.

        Raises NBestFormatError if the lists break the contract; the pool is unchanged then."""
        segments, tokens, features = self._check(n_best_lists)
        new_rows: list[list[int]] = [[] for _ in range(self.num_segments)]
        to_score: dict[tuple[int, Tokens], None] = {}
        batch_keys: set[tuple[int, Tokens, bytes]] = set()
        keys = []
        for row, (segment, entry_tokens) in enumerate(zip(segments, tokens, strict=True)):
            key = (entry_tokens, features[row].tobytes())
            keys.append(key)
            if key in self._seen[segment] or (segment, *key) in batch_keys:
                continue
            batch_keys.add((segment, *key))
            new_rows[segment].append(row)
            if entry_tokens not in self._statistics_cache[segment]:
                to_score[(segment, entry_tokens)] = None
        if to_score:
            pending = list(to_score)
            rows = self.references.statistics([segment for segment, _ in pending], [tokens for _, tokens in pending])
            for (segment, entry_tokens), statistics_row in zip(pending, rows, strict=True):
                self._statistics_cache[segment][entry_tokens] = statistics_row
        num_new = 0
        for segment, rows_of_segment in enumerate(new_rows):
            if not rows_of_segment:
                continue
            num_new += len(rows_of_segment)
            cache = self._statistics_cache[segment]
            self._features[segment] = np.vstack([self._features[segment], features[rows_of_segment]])
            self._statistics[segment] = np.vstack(
                [self._statistics[segment], [cache[tokens[row]] for row in rows_of_segment]]
            )
            self._tokens[segment].extend(tokens[row] for row in rows_of_segment)
            self._seen[segment].update(keys[row] for row in rows_of_segment)
        if num_new:
            self._arrays = None
        return num_new

    def _check(
        self, n_best_lists: Sequence[Sequence[NBestEntry]]
    ) -> tuple[list[int], list[Tokens], npt.NDArray[np.float64]]:
        """All entries flat: (segment of each, tokens of each, features matrix), after checking the contract."""
        if len(n_best_lists) != self.num_segments:
            raise NBestFormatError(
                f"the decoder returned {len(n_best_lists)} n-best lists for {self.num_segments} dev segments"
            )
        num_features = len(self.feature_names)
        segments, tokens, vectors = [], [], []
        for segment, entries in enumerate(n_best_lists):
            if len(entries) == 0:
                raise NBestFormatError(
                    f"segment {segment}: empty n-best list; an empty translation is the entry ((), features)"
                )
            for rank, (entry_tokens, entry_features) in enumerate(entries):
                vector = np.asarray(entry_features, dtype=np.float64).reshape(-1)
                if vector.shape != (num_features,):
                    raise NBestFormatError(
                        f"segment {segment}, entry {rank}: {vector.size} feature values, "
                        f"expected {num_features} ({', '.join(self.feature_names)})"
                    )
                segments.append(segment)
                tokens.append(tuple(entry_tokens))
                vectors.append(vector)
        features = np.vstack(vectors) + 0.0  # + 0.0 turns -0.0 into 0.0, so equal vectors have equal bytes
        bad = np.nonzero(~np.all(np.isfinite(features), axis=1))[0]
        if len(bad):
            segment = segments[bad[0]]
            rank = int(bad[0]) - segments.index(segment)
            raise NBestFormatError(f"segment {segment}, entry {rank}: non-finite feature value")
        return segments, tokens, features

    def segment_tokens(self, segment: int) -> list[Tokens]:
        return list(self._tokens[segment])

    def segment_features(self, segment: int) -> npt.NDArray[np.float64]:
        return self._features[segment]

    def segment_statistics(self, segment: int) -> npt.NDArray[np.int64]:
        return self._statistics[segment]

    def arrays(self) -> PoolArrays:
        """The whole pool as flat arrays (built once per change of the pool, then shared)."""
        if self._arrays is None:
            offsets = np.zeros(self.num_segments + 1, dtype=np.int64)
            np.cumsum(self.segment_sizes(), out=offsets[1:])
            features = np.vstack(self._features)
            statistics = np.vstack(self._statistics)
            features.flags.writeable = False
            statistics.flags.writeable = False
            self._arrays = PoolArrays(features, statistics, offsets)
        return self._arrays
