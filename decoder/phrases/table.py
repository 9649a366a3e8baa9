"""The phrase table as flat arrays that can be memory-mapped and shared by every worker process.

Layout (CSR-style, see DESIGN.md): source phrases sorted lexicographically (padding PAD_ID sorts first, so a
phrase directly precedes its extensions); the pairs of source phrase p are rows
``target_offsets[p]:target_offsets[p + 1]`` of the per-pair arrays, sorted by target phrase id. Source phrases
are stored position-major, ``source_phrase_tokens[k, p]`` = token k of phrase p, so that all phrases sharing a
prefix form one contiguous range in which column k is sorted: a lookup narrows that range one token at a time
with two binary searches (O(length * log n), no dict, nothing built per process), and ``spans`` stops
extending a span as soon as the range is empty, i.e. no stored phrase has that prefix."""

from __future__ import annotations

from collections.abc import Iterator, Sequence
from dataclasses import astuple, dataclass, fields
from pathlib import Path
from typing import ClassVar

import numpy as np
import numpy.typing as npt

from decoder.errors import ModelLoadError
from decoder.phrases.encoding import PAD_ID, packed_links
from decoder.phrases.reordering import REORDERING_FEATURE_NAMES
from decoder.phrases.scoring import SCORE_NAMES, ScoredPhrasePairs
from decoder.vocabulary import Vocabulary


@dataclass(frozen=True, slots=True)
class PhraseTableStats:
    """Sizes at each training step; occurrences are extracted phrase-pair instances summed over the corpus."""

    num_segments: int
    num_occurrences: int
    num_pairs_before_pruning: int
    num_pairs_after_pruning: int
    num_source_phrases: int
    num_target_phrases: int
    num_spilled_runs: int


@dataclass(frozen=True, slots=True)
class PhraseTable:
    """Phrase pairs with their scores; see the module docstring for the layout. Never mutated after building.

    Shapes: W = max phrase length, S source phrases, T target phrases, N pairs, K internal links in total.
    ``scores`` columns are SCORE_NAMES, ``reordering`` columns REORDERING_FEATURE_NAMES (natural logs,
    float32); pair r's internal links are ``alignment_links[alignment_offsets[r]:alignment_offsets[r + 1]]``
    as (source position, target position) within the pair."""

    source_phrase_tokens: npt.NDArray[np.int32]  # (W, S)
    target_offsets: npt.NDArray[np.int64]  # (S + 1,)
    target_phrases: npt.NDArray[np.int32]  # (T, W), padded rows
    pair_target: npt.NDArray[np.int32]  # (N,) row of target_phrases
    scores: npt.NDArray[np.float32]  # (N, 4)
    reordering: npt.NDArray[np.float32]  # (N, 6)
    alignment_offsets: npt.NDArray[np.int64]  # (N + 1,)
    alignment_links: npt.NDArray[np.int8]  # (K, 2)
    pair_counts: npt.NDArray[np.int64]  # (N,)
    stats: PhraseTableStats | None = None

    SCORE_NAMES: ClassVar[tuple[str, ...]] = SCORE_NAMES
    REORDERING_NAMES: ClassVar[tuple[str, ...]] = REORDERING_FEATURE_NAMES
    _ARRAY_NAMES: ClassVar[tuple[str, ...]] = (
        "source_phrase_tokens",
        "target_offsets",
        "target_phrases",
        "pair_target",
        "scores",
        "reordering",
        "alignment_offsets",
        "alignment_links",
        "pair_counts",
    )

    @classmethod
    def from_scored(
        cls,
        pairs: ScoredPhrasePairs,
        reordering: npt.NDArray[np.float64],
        stats: PhraseTableStats | None = None,
    ) -> PhraseTable:
        """Table of scored pairs that are sorted by (source, target) and reference every source phrase."""
        offsets = np.zeros(len(pairs.source_phrases) + 1, dtype=np.int64)
        np.cumsum(np.bincount(pairs.pair_source, minlength=len(pairs.source_phrases)), out=offsets[1:])
        alignment_offsets, alignment_links = packed_links(pairs.alignment_masks)
        return cls(
            source_phrase_tokens=np.ascontiguousarray(pairs.source_phrases.T, dtype=np.int32),
            target_offsets=offsets,
            target_phrases=np.ascontiguousarray(pairs.target_phrases, dtype=np.int32),
            pair_target=pairs.pair_target.astype(np.int32),
            scores=pairs.scores.astype(np.float32),
            reordering=np.asarray(reordering, dtype=np.float32),
            alignment_offsets=alignment_offsets,
            alignment_links=alignment_links,
            pair_counts=pairs.pair_counts.astype(np.int64),
            stats=stats,
        )

    def __len__(self) -> int:
        return len(self.pair_target)

    @property
    def max_phrase_length(self) -> int:
        return int(self.source_phrase_tokens.shape[0])

    @property
    def num_source_phrases(self) -> int:
        return int(self.source_phrase_tokens.shape[1])

    def source_phrase(self, index: int) -> npt.NDArray[np.int32]:
        column = self.source_phrase_tokens[:, index]
        return np.asarray(column[column != PAD_ID])

    def target_phrase(self, row: int) -> npt.NDArray[np.int32]:
        """Token ids of the target side of pair ``row``."""
        tokens = self.target_phrases[self.pair_target[row]]
        return np.asarray(tokens[tokens != PAD_ID])

    def alignment(self, row: int) -> npt.NDArray[np.int8]:
        """(k, 2) links (source position, target position) inside pair ``row``."""
        return np.asarray(self.alignment_links[self.alignment_offsets[row] : self.alignment_offsets[row + 1]])

    def _narrow(self, low: int, high: int, position: int, token: int) -> tuple[int, int]:
        """Sub-range of phrases low..high-1 (all sharing ``position`` first tokens) with ``token`` next."""
        column = self.source_phrase_tokens[position, low:high]
        if not 0 <= token < np.iinfo(column.dtype).max:
            return low, low  # PAD_ID or an id no vocabulary hands out: never a stored token
        # Search keys of the column's own dtype: a Python int would make numpy cast (copy) the whole column.
        bounds = column.searchsorted(np.array([token, token + 1], dtype=column.dtype))
        return low + int(bounds[0]), low + int(bounds[1])

    def _is_exact(self, low: int, length: int) -> bool:
        """Whether phrase ``low`` (the first of a range sharing ``length`` tokens) has exactly that length."""
        return length == self.max_phrase_length or int(self.source_phrase_tokens[length, low]) == PAD_ID

    def find_source_phrase(self, source_ids: Sequence[int] | npt.NDArray[np.integer]) -> int:
        """Index of the source phrase equal to ``source_ids``, or -1."""
        if not 0 < len(source_ids) <= self.max_phrase_length:
            return -1
        low, high = 0, self.num_source_phrases
        for position, token in enumerate(source_ids):
            low, high = self._narrow(low, high, position, int(token))
            if low == high:
                return -1
        return low if self._is_exact(low, len(source_ids)) else -1

    def lookup(self, source_ids: Sequence[int] | npt.NDArray[np.integer]) -> range:
        """Pair rows whose source side is ``source_ids`` (an empty range when it is not in the table)."""
        index = self.find_source_phrase(source_ids)
        if index < 0:
            return range(0, 0)
        return range(int(self.target_offsets[index]), int(self.target_offsets[index + 1]))

    def spans(
        self, source_ids: Sequence[int] | npt.NDArray[np.integer], max_length: int | None = None
    ) -> Iterator[tuple[int, int, range]]:
        """(start, end, pair rows) for every span source_ids[start:end] that is a stored source phrase.

        Spans come by start, then by length; extension from a start stops as soon as no stored phrase begins
        with the span, so a segment costs about (number of matching spans + its length) narrowing steps."""
        tokens = [int(token) for token in source_ids]
        limit = self.max_phrase_length if max_length is None else min(max_length, self.max_phrase_length)
        for start in range(len(tokens)):
            low, high = 0, self.num_source_phrases
            for end in range(start + 1, min(len(tokens), start + limit) + 1):
                low, high = self._narrow(low, high, end - start - 1, tokens[end - 1])
                if low == high:
                    break
                exact = self._is_exact(low, end - start)
                if exact:
                    yield start, end, range(int(self.target_offsets[low]), int(self.target_offsets[low + 1]))
                if high - low == int(exact):
                    break  # the phrase found has no stored extension

    def to_arrays(self) -> dict[str, npt.NDArray[np.generic]]:
        """Every array by name (stats, when present, as an int64 array ``stats`` in PhraseTableStats
        order)."""
        arrays: dict[str, npt.NDArray[np.generic]] = {name: getattr(self, name) for name in self._ARRAY_NAMES}
        if self.stats is not None:
            arrays["stats"] = np.array(astuple(self.stats), dtype=np.int64)
        return arrays

    @classmethod
    def from_arrays(cls, arrays: dict[str, npt.NDArray[np.generic]]) -> PhraseTable:
        """Inverse of ``to_arrays``; arrays may be memory-mapped. Raises ModelLoadError naming a missing or
        inconsistent array."""
        missing = [name for name in cls._ARRAY_NAMES if name not in arrays]
        if missing:
            raise ModelLoadError(f"phrase table array {missing[0]!r} is missing")
        stats = None
        if "stats" in arrays:
            values = [int(value) for value in arrays["stats"]]
            if len(values) != len(fields(PhraseTableStats)):
                raise ModelLoadError("phrase table array 'stats' has the wrong length")
            stats = PhraseTableStats(*values)
        table = cls(**{name: arrays[name] for name in cls._ARRAY_NAMES}, stats=stats)
        table._check_shapes()
        return table

    def _check_shapes(self) -> None:
        width, num_sources = self.source_phrase_tokens.shape
        num_pairs = len(self.pair_target)
        expected = {
            "target_offsets": (num_sources + 1,),
            "target_phrases": (len(self.target_phrases), width),
            "scores": (num_pairs, len(SCORE_NAMES)),
            "reordering": (num_pairs, len(REORDERING_FEATURE_NAMES)),
            "alignment_offsets": (num_pairs + 1,),
            "alignment_links": (len(self.alignment_links), 2),
            "pair_counts": (num_pairs,),
        }
        for name, shape in expected.items():
            if getattr(self, name).shape != shape:
                raise ModelLoadError(
                    f"phrase table array {name!r} has shape {getattr(self, name).shape}, expected {shape}"
                )
        if int(self.target_offsets[-1]) != num_pairs or int(self.alignment_offsets[-1]) != len(
            self.alignment_links
        ):
            raise ModelLoadError("phrase table offsets do not end at the number of rows they index")

    def export_tsv(
        self, path: str | Path, source_vocabulary: Vocabulary, target_vocabulary: Vocabulary
    ) -> None:
        """Readable dump for inspection, one pair per line: source, target, the four scores, the six
        reordering features, internal links as ``i-j`` and the count, under a header line. Not a storage
        format."""
        header = ["source", "target", *SCORE_NAMES, *REORDERING_FEATURE_NAMES, "alignment", "count"]
        with open(path, "w", encoding="utf-8") as out:
            out.write("\t".join(header) + "\n")
            for index in range(self.num_source_phrases):
                source = " ".join(source_vocabulary.decode(self.source_phrase(index)))
                for row in range(int(self.target_offsets[index]), int(self.target_offsets[index + 1])):
                    values = [f"{float(value):.6g}" for value in (*self.scores[row], *self.reordering[row])]
                    links = " ".join(f"{int(i)}-{int(j)}" for i, j in self.alignment(row))
                    target = " ".join(target_vocabulary.decode(self.target_phrase(row)))
                    out.write(
                        "\t".join([source, target, *values, links, str(int(self.pair_counts[row]))]) + "\n"
                    )
