"""N-best derivations from the search graph by lazy k-best extraction (Huang & Chiang 2005, "Better k-best
parsing", algorithm 3), here on a graph: each hypothesis's incoming arcs are its back pointer plus the arcs of
the hypotheses recombined into it.

An arc's score gain does not depend on which derivation of its predecessor is used (that is what makes
recombination exact), so the k-th best derivation of a hypothesis is found by a heap over (arc, rank of the
predecessor's derivation), each predecessor's list being extended only as far as it is asked for.
"""

from __future__ import annotations

import heapq
from collections.abc import Callable, Hashable
from dataclasses import dataclass

from decoder.search.hypothesis import Hypothesis
from decoder.search.options import TranslationOption


@dataclass(frozen=True, slots=True)
class Derivation:
    score: float
    options: tuple[TranslationOption, ...]  # in target order


class _Node:
    __slots__ = ("arcs", "derivations", "heap", "started")

    def __init__(self, hypothesis: Hypothesis) -> None:
        back = hypothesis.back
        self.arcs: list[tuple[float, Hypothesis, TranslationOption]] = []
        if back is not None and hypothesis.option is not None:
            self.arcs.append((hypothesis.score - back.score, back, hypothesis.option))
            for score, other_back, option in hypothesis.arcs or ():
                self.arcs.append((score - other_back.score, other_back, option))
        self.derivations: list[tuple[float, int, int]] = []  # (score, arc index, predecessor rank)
        self.heap: list[tuple[float, int, int]] = []
        self.started = False


class LazyKBest:
    """k-best derivations of the hypotheses of one search."""

    def __init__(self) -> None:
        self._nodes: dict[int, _Node] = {}

    def _node(self, hypothesis: Hypothesis) -> _Node:
        node = self._nodes.get(id(hypothesis))
        if node is None:
            node = self._nodes[id(hypothesis)] = _Node(hypothesis)
        return node

    def kth(self, hypothesis: Hypothesis, rank: int) -> tuple[float, int, int] | None:
        """(score, arc, predecessor rank) of the rank-th best derivation of ``hypothesis`` (0 = best)."""
        if hypothesis.back is None:
            return (0.0, -1, -1) if rank == 0 else None
        node = self._node(hypothesis)
        if not node.started:
            node.started = True
            for index, (gain, back, _) in enumerate(node.arcs):
                best = self.kth(back, 0)
                if best is not None:
                    heapq.heappush(node.heap, (-(best[0] + gain), index, 0))
        while len(node.derivations) <= rank and node.heap:
            negative, index, predecessor_rank = heapq.heappop(node.heap)
            node.derivations.append((-negative, index, predecessor_rank))
            gain, back, _ = node.arcs[index]
            following = self.kth(back, predecessor_rank + 1)
            if following is not None:
                heapq.heappush(node.heap, (-(following[0] + gain), index, predecessor_rank + 1))
        return node.derivations[rank] if rank < len(node.derivations) else None

    def options_of(self, hypothesis: Hypothesis, rank: int) -> tuple[TranslationOption, ...]:
        """The options of a derivation, in target order."""
        options: list[TranslationOption] = []
        while hypothesis.back is not None:
            entry = self.kth(hypothesis, rank)
            assert entry is not None
            _, index, rank = entry
            _, hypothesis, option = self._node(hypothesis).arcs[index]
            options.append(option)
        options.reverse()
        return tuple(options)


def best_derivation(complete: list[Hypothesis]) -> Derivation | None:
    """The 1-best, following back pointers only (no arcs needed)."""
    if not complete:
        return None
    best = max(complete, key=lambda hypothesis: hypothesis.score)
    options = []
    hypothesis = best
    while hypothesis.back is not None:
        assert hypothesis.option is not None
        options.append(hypothesis.option)
        hypothesis = hypothesis.back
    return Derivation(best.score, tuple(reversed(options)))


def n_best_derivations(complete: list[Hypothesis], size: int, distinct_key: Callable[[Derivation], Hashable] | None,
                       max_candidates: int | None = None) -> list[Derivation]:
    """Up to ``size`` derivations, best first. With ``distinct_key``, derivations whose key (e.g. the output
    string) was seen already are skipped; at most ``max_candidates`` derivations are examined."""
    extractor = LazyKBest()
    limit = max_candidates if max_candidates is not None else max(10 * size, 100)
    heap: list[tuple[float, int, int]] = []
    for index, hypothesis in enumerate(complete):
        best = extractor.kth(hypothesis, 0)
        if best is not None:
            heapq.heappush(heap, (-best[0], index, 0))
    results: list[Derivation] = []
    seen: set[Hashable] = set()
    examined = 0
    while heap and len(results) < size and examined < limit:
        negative, index, rank = heapq.heappop(heap)
        examined += 1
        derivation = Derivation(-negative, extractor.options_of(complete[index], rank))
        following = extractor.kth(complete[index], rank + 1)
        if following is not None:
            heapq.heappush(heap, (-following[0], index, rank + 1))
        if distinct_key is not None:
            key = distinct_key(derivation)
            if key in seen:
                continue
            seen.add(key)
        results.append(derivation)
    return results
