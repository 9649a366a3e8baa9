"""Future-cost estimates (Koehn, Och & Marcu 2003): the best score still to be earned on the uncovered words.

``span_estimates[i][j]`` (end exclusive) is the best over all ways to cover words i..j-1 with options on
sub-spans, ignoring reordering and LM context: the best option estimate on the span itself, or the best split
into two adjacent parts (dynamic programming over span lengths). A hypothesis's future cost is the sum over its
maximal uncovered runs; hypotheses on one stack that covered different words then compare fairly.
"""

from __future__ import annotations

from decoder.search.options import OptionSet

UNREACHABLE = float("-inf")


class FutureCosts:
    """Span table for one segment, plus a per-coverage cache (coverage: bit i set = word i translated)."""

    def __init__(self, option_set: OptionSet) -> None:
        size = option_set.num_words
        table = [[UNREACHABLE] * (size + 1) for _ in range(size + 1)]
        for (start, end), options in option_set.by_span.items():
            if options:
                table[start][end] = max(table[start][end], options[0].estimate)
        for length in range(2, size + 1):
            for start in range(0, size - length + 1):
                end = start + length
                best = table[start][end]
                for middle in range(start + 1, end):
                    combined = table[start][middle] + table[middle][end]
                    if combined > best:
                        best = combined
                table[start][end] = best
        self.span_estimates = table
        self.num_words = size
        self._cache: dict[int, float] = {}

    def of(self, coverage: int) -> float:
        """Estimated best score for the words not in ``coverage`` (0 when all are covered)."""
        cached = self._cache.get(coverage)
        if cached is not None:
            return cached
        total, position, size = 0.0, 0, self.num_words
        while position < size:
            if coverage >> position & 1:
                position += 1
                continue
            gap_end = position
            while gap_end < size and not coverage >> gap_end & 1:
                gap_end += 1
            total += self.span_estimates[position][gap_end]
            position = gap_end
        self._cache[coverage] = total
        return total
