"""A plain-Python, dict-based interpolated modified Kneser-Ney model, written straight from the formulas of
Chen & Goodman (1998), "An empirical study of smoothing techniques for language modeling", the section on
modified Kneser-Ney smoothing (interpolation with three discounts D1, D2, D3+ estimated from count-of-counts;
formulas as recalled from memory), for comparison with the array implementation.

It shares no code with ``decoder.lm``: counts are tuples in Counters, continuation counts are sets of left
neighbours, and p(w | h) is evaluated recursively for the full history instead of through back-off weights.
Conventions it must share with the library (they are part of the specification, not of the code):
segments padded with one <s> and one </s>; n-grams starting with <s> keep raw counts below the top order;
<s> and <null> are not predicted; the unigram level is interpolated with the uniform distribution over the
predicted words; the discount fallback documented in ``decoder.lm.kneser_ney.modified_discounts``.
"""

from __future__ import annotations

from collections import Counter, defaultdict

START, END, NULL = 1, 2, 3


def discounts_from_count_of_counts(n1: int, n2: int, n3: int, n4: int) -> tuple[float, float, float]:
    """Chen & Goodman's discount estimates, with the documented fallback for values outside (0, r) or undefined."""
    y = n1 / (n1 + 2 * n2) if n1 + 2 * n2 else 0.0
    fallback = y if 0 < y < 1 else 0.5
    result = []
    for r, numerator_count, denominator_count in ((1, n2, n1), (2, n3, n2), (3, n4, n3)):
        if denominator_count == 0 or not 0 < y < 1:
            result.append(fallback)
            continue
        value = r - (r + 1) * y * numerator_count / denominator_count
        result.append(value if 0 < value < r else fallback)
    return tuple(result)


class ReferenceKneserNey:
    def __init__(self, segments: list[list[int]], vocabulary_size: int, order: int) -> None:
        self.order = order
        self.predicted_words = [word for word in range(vocabulary_size) if word not in (START, NULL)]
        raw = [Counter() for _ in range(order)]
        for segment in segments:
            padded = [START, *segment, END]
            for k in range(1, order + 1):
                for i in range(len(padded) - k + 1):
                    raw[k - 1][tuple(padded[i : i + k])] += 1
        self.adjusted: list[dict[tuple[int, ...], int]] = []
        for k in range(1, order + 1):
            if k == order:
                adjusted = dict(raw[k - 1])
            else:
                left_neighbours = defaultdict(set)
                for gram in raw[k]:
                    left_neighbours[gram[1:]].add(gram[0])
                adjusted = {
                    gram: (count if gram[0] == START else len(left_neighbours[gram]))
                    for gram, count in raw[k - 1].items()
                }
            if k == 1:
                adjusted.pop((START,), None)
            self.adjusted.append(adjusted)
        self.discounts = []
        self.extensions: list[dict[tuple[int, ...], dict[int, int]]] = []
        for adjusted in self.adjusted:
            values = list(adjusted.values())
            self.discounts.append(discounts_from_count_of_counts(*(values.count(r) for r in (1, 2, 3, 4))))
            by_context: dict[tuple[int, ...], dict[int, int]] = defaultdict(dict)
            for gram, count in adjusted.items():
                by_context[gram[:-1]][gram[-1]] = count
            self.extensions.append(dict(by_context))

    def _discount(self, level: int, count: int) -> float:
        if count == 0:
            return 0.0
        return self.discounts[level][min(count, 3) - 1]

    def probability(self, word: int, history: tuple[int, ...] | list[int]) -> float:
        """p(word | history), interpolated recursively (only the last order-1 history words matter)."""
        history = tuple(history)[-(self.order - 1) :] if self.order > 1 else ()
        level = len(history)
        extensions = self.extensions[level].get(history)
        if level == 0:
            uniform = 1.0 / len(self.predicted_words)
            if not extensions:
                return uniform
        elif not extensions:
            return self.probability(word, history[1:])
        total = sum(extensions.values())
        gamma = sum(self._discount(level, count) for count in extensions.values()) / total
        count = extensions.get(word, 0)
        lower = uniform if level == 0 else self.probability(word, history[1:])
        return (count - self._discount(level, count)) / total + gamma * lower
