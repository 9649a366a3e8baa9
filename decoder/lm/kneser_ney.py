"""Interpolated modified Kneser-Ney estimation (Chen & Goodman 1998, "An empirical study of smoothing
techniques for language modeling", Harvard TR-10-98, the section on modified Kneser-Ney smoothing).

For an n-gram ``h w`` of order k with context h:

    p(w | h) = (a(h w) - D_k(a(h w))) / A(h) + gamma(h) * p(w | h'),    h' = h without its first word
    A(h) = sum over x of a(h x)
    gamma(h) = (D_k1 N1(h) + D_k2 N2(h) + D_k3+ N3+(h)) / A(h),         N_r(h) = #{x : a(h x) = r} (r >= 3 for 3+)

where the adjusted count a is the raw count at the highest order and the continuation count
N1+(. g) = #{x : x g was seen} at lower orders (Kneser & Ney 1995). N-grams starting with ``<s>`` keep their raw
count at every order, since nothing can precede ``<s>`` (common practice; their continuation count would be 0).
The unigram level interpolates with the uniform distribution over the predictable words, so every word,
``<unk>`` included, has non-zero probability; ``<s>`` is never predicted (log10 prob NEVER_LOG10) and
``<null>`` is not part of the model. Contexts never seen as contexts have gamma = 1.

Discounts per order are Chen & Goodman's estimates from the count-of-counts n_r of that order's counts (here the
adjusted counts, as is common practice for the lower orders):
Y = n1 / (n1 + 2 n2), D1 = 1 - 2Y n2/n1, D2 = 2 - 3Y n3/n2, D3+ = 3 - 4Y n4/n3.
"""

from __future__ import annotations

from typing import NamedTuple

import numpy as np
import numpy.typing as npt

from decoder.errors import ConfigurationError
from decoder.executor import Executor
from decoder.lm.counts import NgramCounts, count_ngrams_sharded
from decoder.lm.ngram_model import NEVER_LOG10, NgramModel, lexicographic_keys, lookup_rows
from decoder.segment_arrays import SegmentArray
from decoder.vocabulary import NULL_ID, SENTENCE_END_ID, SENTENCE_START_ID

MAX_ORDER = 5
DEFAULT_ORDER = 5
# Used when even the single discount Y is degenerate (no singletons or no doubletons): a middle value of (0, 1).
LAST_RESORT_DISCOUNT = 0.5


class Discounts(NamedTuple):
    """Modified Kneser-Ney discounts of one order, for adjusted counts 1, 2 and 3 or more."""

    one: float
    two: float
    three_plus: float


def modified_discounts(count_of_counts: npt.ArrayLike) -> Discounts:
    """Chen & Goodman (1998) modified Kneser-Ney discounts from n1..n4 (n_r = number of n-grams with adjusted count r).

    Fallback for tiny corpora, where the formulas break down: a discount whose formula divides by a zero
    count-of-counts, or whose value falls outside (0, r) for count r (a discount must leave a positive count
    and positive back-off mass), is replaced by Y = n1 / (n1 + 2 n2), the single Kneser-Ney discount of
    Ney, Essen & Kneser (1994), when 0 < Y < 1, else by LAST_RESORT_DISCOUNT."""
    n1, n2, n3, n4 = (float(value) for value in np.asarray(count_of_counts)[:4])
    y = n1 / (n1 + 2 * n2) if n1 + 2 * n2 > 0 else 0.0
    fallback = y if 0.0 < y < 1.0 else LAST_RESORT_DISCOUNT
    formulas = (
        (1, n1 > 0, lambda: 1 - 2 * y * n2 / n1),
        (2, n2 > 0, lambda: 2 - 3 * y * n3 / n2),
        (3, n3 > 0, lambda: 3 - 4 * y * n4 / n3),
    )
    values = []
    for count, is_defined, formula in formulas:
        value = formula() if is_defined and 0.0 < y < 1.0 else float("nan")
        values.append(value if 0.0 < value < count else fallback)
    return Discounts(*values)


def count_of_counts(adjusted: npt.NDArray[np.int64], max_count: int = 4) -> npt.NDArray[np.int64]:
    """n_1..n_max_count: how many entries of ``adjusted`` equal 1, 2, ... (index 0 holds n_1)."""
    return np.bincount(np.clip(adjusted, 0, max_count + 1), minlength=max_count + 2)[1 : max_count + 1]


def adjusted_counts(
    ngrams: tuple[npt.NDArray[np.int32], ...],
    raw_counts: tuple[npt.NDArray[np.int64], ...],
    keys: tuple[npt.NDArray[np.int64], ...],
    vocabulary_size: int,
) -> tuple[npt.NDArray[np.int64], ...]:
    """Per order, the count Kneser-Ney discounts: raw counts at the top order and for n-grams starting with
    ``<s>``, continuation counts (number of distinct words seen before the n-gram) elsewhere.

    Relies on the tables being closed under suffixes, as counted tables are."""
    order = len(ngrams)
    adjusted = []
    for k in range(1, order + 1):
        if k == order:
            adjusted.append(np.asarray(raw_counts[k - 1], dtype=np.int64))
            continue
        # Each distinct (k+1)-gram x g adds one to the continuation count of its suffix g.
        suffix_rows = lookup_rows(keys[:k], ngrams[k][:, 1:], vocabulary_size)
        continuation = np.bincount(suffix_rows, minlength=len(ngrams[k - 1])).astype(np.int64)
        starts_sentence = ngrams[k - 1][:, 0] == SENTENCE_START_ID
        adjusted.append(np.where(starts_sentence, raw_counts[k - 1], continuation))
    return tuple(adjusted)


def _discount_of(adjusted: npt.NDArray[np.int64], discounts: Discounts) -> npt.NDArray[np.float64]:
    table = np.array([0.0, discounts.one, discounts.two, discounts.three_plus])
    return table[np.minimum(adjusted, 3)]


def _with_full_unigram_table(counts: NgramCounts, vocabulary_size: int) -> tuple[tuple, tuple]:
    """Counts with the unigram table widened to every id except NULL_ID (unseen words get count 0)."""
    ids = np.array([word for word in range(vocabulary_size) if word != NULL_ID], dtype=np.int32)
    seen = counts.ngrams[0][:, 0]
    unigram_counts = np.zeros(len(ids), dtype=np.int64)
    unigram_counts[np.searchsorted(ids, seen)] = counts.counts[0]
    return (ids[:, None],) + counts.ngrams[1:], (unigram_counts,) + counts.counts[1:]


def estimate_kneser_ney(counts: NgramCounts, vocabulary_size: int) -> tuple[NgramModel, tuple[Discounts, ...]]:
    """Interpolated modified Kneser-Ney model of the counts, in back-off form, and the discounts per order.

    The unigram table lists every id below ``vocabulary_size`` except NULL_ID; higher orders list exactly the
    counted n-grams. Probabilities of the predictable words (all but ``<s>``) after any context sum to 1."""
    if counts.num_ngrams(1) and (counts.ngrams[0].min() < 0 or counts.ngrams[0].max() >= vocabulary_size):
        raise ValueError(f"counted word ids must lie in 0..{vocabulary_size - 1}")
    if counts.num_ngrams(1) and np.isin(counts.ngrams[0][:, 0], [NULL_ID]).any():
        raise ValueError("the language model does not model <null> (NULL_ID); remove it from the segments")
    ngrams, raw_counts = _with_full_unigram_table(counts, vocabulary_size)
    keys = lexicographic_keys(ngrams, vocabulary_size)
    adjusted = adjusted_counts(ngrams, raw_counts, keys, vocabulary_size)
    order = len(ngrams)

    # Unigrams: interpolate with the uniform distribution over the predictable words.
    is_predictable = ngrams[0][:, 0] != SENTENCE_START_ID
    unigram_adjusted = np.where(is_predictable, adjusted[0], 0)
    discounts = [modified_discounts(count_of_counts(unigram_adjusted))]
    total = float(unigram_adjusted.sum())
    num_predictable = int(is_predictable.sum())
    if total > 0:
        discounted = np.maximum(unigram_adjusted - _discount_of(unigram_adjusted, discounts[0]), 0.0)
        gamma_empty = float(_discount_of(unigram_adjusted, discounts[0]).sum()) / total
        probs = discounted / total + gamma_empty / num_predictable
    else:  # no training data at all: uniform
        probs = np.full(len(unigram_adjusted), 1.0 / num_predictable)
    probs = np.where(is_predictable, probs, 0.0)
    linear_probs = [probs]
    backoffs: list[npt.NDArray[np.float64]] = []
    cache = {"keys": keys}  # lookups the query compiler would repeat; same tables, so safe to hand over

    for k in range(2, order + 1):
        grams, counts_k = ngrams[k - 1], adjusted[k - 1]
        discounts.append(modified_discounts(count_of_counts(counts_k)))
        context_rows = keys[k - 1] // vocabulary_size  # key = row(prefix) * vocabulary_size + last word
        suffix_rows = lookup_rows(keys[: k - 1], grams[:, 1:], vocabulary_size)
        cache[f"suffix_rows_{k}"] = suffix_rows
        num_contexts = len(ngrams[k - 2])
        discount = _discount_of(counts_k, discounts[-1])
        context_total = np.bincount(context_rows, weights=counts_k, minlength=num_contexts)
        context_mass = np.bincount(context_rows, weights=discount, minlength=num_contexts)
        has_extension = context_total > 0
        gamma = np.ones(num_contexts)
        gamma[has_extension] = context_mass[has_extension] / context_total[has_extension]
        backoffs.append(np.log10(gamma))
        linear_probs.append(
            (counts_k - discount) / context_total[context_rows] + gamma[context_rows] * linear_probs[-1][suffix_rows]
        )
    backoffs.append(np.zeros(len(ngrams[-1])))

    with np.errstate(divide="ignore"):
        log10_probs = [np.log10(values) for values in linear_probs]
    log10_probs[0][~is_predictable] = NEVER_LOG10
    model = NgramModel(vocabulary_size, tuple(ngrams), tuple(log10_probs), tuple(backoffs))
    model._cache.update(cache)
    return model, tuple(discounts)


def train_kneser_ney(
    segments: SegmentArray,
    vocabulary_size: int,
    order: int = DEFAULT_ORDER,
    executor: Executor | None = None,
) -> NgramModel:
    """Interpolated modified Kneser-Ney model of ``segments`` (token ids below ``vocabulary_size``).

    Counting runs as a map over shards on ``executor`` (serial when None); estimation runs in this process."""
    if not 1 <= order <= MAX_ORDER:
        raise ConfigurationError(f"language model order must be between 1 and {MAX_ORDER}, got {order}")
    if vocabulary_size <= SENTENCE_END_ID:
        raise ConfigurationError("the vocabulary must contain at least <unk>, <s> and </s>")
    ids = segments.ids
    if len(ids) and (ids.min() < 0 or ids.max() >= vocabulary_size):
        raise ValueError(f"segment token ids must lie in 0..{vocabulary_size - 1}")
    if np.isin(ids, [SENTENCE_START_ID, SENTENCE_END_ID, NULL_ID]).any():
        raise ValueError("segments must not contain <s>, </s> or <null>; boundaries are added by the counter")
    counts = count_ngrams_sharded(segments, order, executor)
    return estimate_kneser_ney(counts, vocabulary_size)[0]
