"""Stack decoding for phrase-based translation (Koehn, Och & Marcu 2003; Koehn 2004 "Pharaoh"), with
recombination, histogram and threshold pruning, a distortion limit, and cube pruning (Huang & Chiang 2007).

Stacks hold hypotheses by number of covered source words. ``plain`` expansion takes every surviving hypothesis
of stack k and every option it may append. ``cube`` fills stack k from the earlier stacks instead: hypotheses of
one coverage (best first) and the options of one span (best first) form a grid whose corner goes on a heap; each
pop adds one hypothesis and pushes its two neighbours, until ``cube_pop_limit`` pops, or until the best item
left falls outside the threshold beam, or below the ``stack_size``-th best popped (it could not survive
histogram pruning unless a later neighbour were better, which cube pruning does not wait for either).

Distortion limit d >= 0: a phrase may start at most d words from where the previous one ended, and a phrase may
not leave the first uncovered word more than d words behind its end (so that word stays reachable). d = 0 is
monotone decoding; a negative d means no limit.
"""

from __future__ import annotations

import heapq
from collections.abc import Iterator, Sequence
from dataclasses import dataclass

from decoder.search.future_cost import FutureCosts
from decoder.search.hypothesis import ExpansionScorer, Hypothesis
from decoder.search.options import OptionSet, TranslationOption
from decoder.search.settings import SearchAlgorithm, SearchSettings


@dataclass
class SearchResult:
    """The final stack (complete hypotheses, best first) and search statistics."""

    complete: list[Hypothesis]
    num_expanded: int
    num_recombined: int


# Cube pruning stops early once the stack holds ``stack_size`` hypotheses and the best item left is this much
# (log domain) below the worst of them: neighbours pushed later rarely climb that far.
FULL_STACK_MARGIN = 1.0


class _Stack:
    """Hypotheses covering the same number of words, merged by recombination key."""

    __slots__ = ("by_key", "best_total", "keep_arcs", "num_recombined", "beam_width")

    def __init__(self, keep_arcs: bool, beam_width: float) -> None:
        self.by_key: dict[tuple, Hypothesis] = {}
        self.best_total = float("-inf")
        self.keep_arcs = keep_arcs
        self.num_recombined = 0
        self.beam_width = beam_width

    def add(self, hypothesis: Hypothesis) -> None:
        total = hypothesis.total
        if total < self.best_total - self.beam_width:
            return  # threshold pruning at insertion
        key = hypothesis.recombination_key
        existing = self.by_key.get(key)
        if existing is None:
            self.by_key[key] = hypothesis
        else:
            self.num_recombined += 1
            winner, loser = (hypothesis, existing) if hypothesis.score > existing.score else (existing, hypothesis)
            if self.keep_arcs:
                arcs = winner.arcs or []
                arcs.append((loser.score, loser.back, loser.option))
                if loser.arcs:
                    arcs.extend(loser.arcs)
                winner.arcs = arcs
            self.by_key[key] = winner
        if total > self.best_total:
            self.best_total = total

    def pruned(self, stack_size: int) -> list[Hypothesis]:
        """Survivors, best total first: within the beam of the best, at most ``stack_size``."""
        floor = self.best_total - self.beam_width
        survivors = [hypothesis for hypothesis in self.by_key.values() if hypothesis.total >= floor]
        survivors.sort(key=lambda hypothesis: -hypothesis.total)
        return survivors[:stack_size]


class StackSearch:
    """One segment's search. ``forced_target`` restricts the output to exactly those target ids (forced
    decoding: the best derivation of a given translation)."""

    def __init__(self, option_set: OptionSet, scorer: ExpansionScorer, settings: SearchSettings,
                 keep_arcs: bool = False, forced_target: Sequence[int] | None = None) -> None:
        self.options = option_set
        self.scorer = scorer
        self.settings = settings
        self.num_words = option_set.num_words
        self.future_costs = FutureCosts(option_set)
        self.keep_arcs = keep_arcs
        self.forced_target = tuple(forced_target) if forced_target is not None else None
        self.full_coverage = (1 << self.num_words) - 1
        self.spans_by_start: list[list[tuple[int, list[TranslationOption]]]] = [[] for _ in range(self.num_words)]
        for (start, end), options in sorted(option_set.by_span.items()):
            if options:
                self.spans_by_start[start].append((end, options))
        self.num_expanded = 0

    # -- expansion helpers -------------------------------------------------------------------------------

    def _span_allowed(self, hypothesis: Hypothesis, start: int, end: int) -> bool:
        limit = self.settings.distortion_limit
        if limit < 0:
            return True
        return abs(start - hypothesis.last_end) <= limit and self._gap_reachable(hypothesis.coverage, start, end)

    def _gap_reachable(self, coverage: int, start: int, end: int) -> bool:
        """Whether the first word left uncovered after adding [start, end) stays within the distortion limit."""
        coverage |= (1 << end) - (1 << start)
        if coverage == self.full_coverage:
            return True
        first_gap = (~coverage & (coverage + 1)).bit_length() - 1
        return not (first_gap < start and end - first_gap > self.settings.distortion_limit)

    def _is_free(self, coverage: int, start: int, end: int) -> bool:
        return not coverage & ((1 << end) - (1 << start))

    def _matches_forced(self, hypothesis: Hypothesis, option: TranslationOption) -> bool:
        forced = self.forced_target
        if forced is None:
            return True
        position = hypothesis.num_output
        return forced[position:position + len(option.target_ids)] == option.target_ids and (
            hypothesis.num_covered + option.length < self.num_words
            or position + len(option.target_ids) == len(forced))

    def _extend(self, hypothesis: Hypothesis, option: TranslationOption) -> Hypothesis:
        self.num_expanded += 1
        score, lm_state = self.scorer.expand(hypothesis, option)
        coverage = hypothesis.coverage | ((1 << option.end) - (1 << option.start))
        # The output length only matters (and only enters the recombination key) in forced decoding.
        num_output = hypothesis.num_output + len(option.target_ids) if self.forced_target is not None else 0
        return Hypothesis(coverage, hypothesis.num_covered + option.length, option.start, option.end, lm_state,
                          option, score, self.future_costs.of(coverage), hypothesis, option, num_output)

    def _free_spans(self, hypothesis: Hypothesis, length: int | None = None, check_distortion: bool = True
                    ) -> Iterator[tuple[int, int, list[TranslationOption]]]:
        """(start, end, options) of spans the hypothesis may cover next (of ``length`` words, if given)."""
        coverage = hypothesis.coverage
        for start in range(self.num_words):
            if coverage >> start & 1:
                continue
            for end, options in self.spans_by_start[start]:
                if length is not None and end - start != length:
                    continue
                if self._is_free(coverage, start, end) and (
                        not check_distortion or self._span_allowed(hypothesis, start, end)):
                    yield start, end, options

    # -- the two algorithms -------------------------------------------------------------------------------

    def initial(self) -> Hypothesis:
        return Hypothesis(0, 0, -1, 0, self.scorer.language_model.begin_state(), None, 0.0,
                          self.future_costs.of(0), None, None, 0)

    def run(self) -> SearchResult:
        stacks = [_Stack(self.keep_arcs, self.settings.beam_width) for _ in range(self.num_words + 1)]
        stacks[0].add(self.initial())
        if self.settings.algorithm is SearchAlgorithm.CUBE and self.forced_target is None:
            self._run_cube(stacks)
        else:
            self._run_plain(stacks)
        complete = sorted(stacks[self.num_words].by_key.values(), key=lambda hypothesis: -hypothesis.score)
        return SearchResult(complete, self.num_expanded, sum(stack.num_recombined for stack in stacks))

    def _run_plain(self, stacks: list[_Stack]) -> None:
        for size in range(self.num_words):
            for hypothesis in stacks[size].pruned(self.settings.stack_size):
                for _, _, options in self._free_spans(hypothesis):
                    for option in options:
                        if self._matches_forced(hypothesis, option):
                            new = self._extend(hypothesis, option)
                            stacks[new.num_covered].add(new)

    def _run_cube(self, stacks: list[_Stack]) -> None:
        survivors: list[list[Hypothesis] | None] = [None] * (self.num_words + 1)
        survivors[0] = stacks[0].pruned(self.settings.stack_size)
        max_length = max((end - start for start, end in self.options.by_span), default=1)
        limit = self.settings.distortion_limit
        for size in range(1, self.num_words + 1):
            grids: list[tuple[list[Hypothesis], list[TranslationOption]]] = []
            for length in range(1, min(max_length, size) + 1):
                groups: dict[int, list[Hypothesis]] = {}
                for hypothesis in survivors[size - length] or ():
                    groups.setdefault(hypothesis.coverage, []).append(hypothesis)
                for group in groups.values():
                    group.sort(key=lambda hypothesis: -hypothesis.score)
                    # spans free for the coverage; the distortion limit depends on each hypothesis's last end
                    coverage = group[0].coverage
                    for start, end, options in self._free_spans(group[0], length, check_distortion=False):
                        if limit < 0:
                            grids.append((group, options))
                        elif self._gap_reachable(coverage, start, end):
                            # the rest of the check depends only on each hypothesis's last end
                            allowed = [h for h in group if -limit <= start - h.last_end <= limit]
                            if allowed:
                                grids.append((allowed, options))
            queue = _CubeQueue(self, grids)
            stack, limit = stacks[size], self.settings.stack_size
            kept_totals: list[float] = []  # min-heap of the best ``stack_size`` totals popped so far
            pops = 0
            while pops < self.settings.cube_pop_limit and queue.heap:
                best_left = -queue.heap[0][0]
                if best_left < stack.best_total - stack.beam_width:
                    break  # everything left is outside the threshold beam
                if len(kept_totals) >= limit and best_left < kept_totals[0] - FULL_STACK_MARGIN:
                    break  # the stack is full and nothing left could enter its best ``stack_size``
                popped = queue.pop()
                stack.add(popped)
                if len(kept_totals) < limit:
                    heapq.heappush(kept_totals, popped.total)
                elif popped.total > kept_totals[0]:
                    heapq.heapreplace(kept_totals, popped.total)
                pops += 1
            survivors[size] = stacks[size].pruned(self.settings.stack_size)


class _CubeQueue:
    """The heap of one stack's cube pruning: grids of (hypotheses best first) x (options best first); popping
    the best item pushes its two neighbours (Huang & Chiang 2007, algorithm 2)."""

    def __init__(self, search: StackSearch, grids: list[tuple[list[Hypothesis], list[TranslationOption]]]) -> None:
        self.search = search
        self.grids = grids
        self.heap: list[tuple[float, int, int, int, int, Hypothesis]] = []
        self.seen: set[tuple[int, int, int]] = set()
        self.tie = 0
        for grid in range(len(grids)):
            self.push(grid, 0, 0)

    def push(self, grid: int, row: int, column: int) -> None:
        hypotheses, options = self.grids[grid]
        if row >= len(hypotheses) or column >= len(options) or (grid, row, column) in self.seen:
            return
        self.seen.add((grid, row, column))
        new = self.search._extend(hypotheses[row], options[column])
        self.tie += 1
        heapq.heappush(self.heap, (-new.total, self.tie, grid, row, column, new))

    def pop(self) -> Hypothesis | None:
        if not self.heap:
            return None
        _, _, grid, row, column, new = heapq.heappop(self.heap)
        self.push(grid, row + 1, column)
        self.push(grid, row, column + 1)
        return new
