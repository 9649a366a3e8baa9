"""Word alignments of a whole corpus as one ragged array of (source position, target position) links.

Sentence k's links are ``links[offsets[k]:offsets[k + 1]]``, an (n, 2) int32 array of 0-based token positions,
sorted by (source, target). The text form, one line per sentence pair, is space-separated ``i-j`` pairs.
"""

from __future__ import annotations

from collections.abc import Iterable, Iterator
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt


@dataclass(frozen=True, slots=True)
class AlignmentArray:
    links: npt.NDArray[np.int32]   # shape (num_links, 2): source position, target position
    offsets: npt.NDArray[np.int64]  # shape (num_sentences + 1,)

    @classmethod
    def from_link_sets(cls, link_sets: Iterable[Iterable[tuple[int, int]]]) -> AlignmentArray:
        parts = [np.array(sorted(set(links)), dtype=np.int32).reshape(-1, 2) for links in link_sets]
        offsets = np.zeros(len(parts) + 1, dtype=np.int64)
        if parts:
            np.cumsum([len(part) for part in parts], out=offsets[1:])
        links = np.concatenate(parts) if parts else np.zeros((0, 2), dtype=np.int32)
        return cls(links.astype(np.int32, copy=False), offsets)

    def __len__(self) -> int:
        return len(self.offsets) - 1

    def __getitem__(self, index: int) -> npt.NDArray[np.int32]:
        return self.links[self.offsets[index]:self.offsets[index + 1]]

    def __iter__(self) -> Iterator[npt.NDArray[np.int32]]:
        for index in range(len(self)):
            yield self[index]

    def link_set(self, index: int) -> set[tuple[int, int]]:
        return {(int(i), int(j)) for i, j in self[index]}


def format_links(links: Iterable[tuple[int, int]] | npt.NDArray[np.int32]) -> str:
    """``"0-0 1-2 2-1"``: source-target pairs, sorted, space-separated (empty string for no links)."""
    return " ".join(f"{int(i)}-{int(j)}" for i, j in sorted((int(a), int(b)) for a, b in links))


def parse_links(line: str) -> set[tuple[int, int]]:
    """Inverse of ``format_links``; raises ValueError naming the bad item."""
    links = set()
    for item in line.split():
        source, sep, target = item.partition("-")
        if not sep or not source.isdigit() or not target.isdigit():
            raise ValueError(f"not a link of the form i-j: {item!r}")
        links.add((int(source), int(target)))
    return links
