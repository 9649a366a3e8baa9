"""A back-off n-gram model as sorted arrays: what training produces, what ARPA files hold, what queries compile.

Per order k the model lists n-grams (an (n_k, k) int32 array, rows distinct and sorted lexicographically) with
a log10 probability each and a log10 back-off weight each (zero at the highest order). The meaning is the
usual back-off rule: p(w | h) is the listed probability of ``h w`` when listed, else
backoff(h) * p(w | h minus its first word), with backoff(h) = 1 when ``h`` is not listed. An interpolated
model is stored this way by listing its interpolated probabilities and its interpolation weights as back-off
weights (Chen & Goodman 1998 point out that interpolated models can be written in back-off form).

Rows are found with per-order int64 keys: key(h w) = row(h) * vocabulary_size + w, where row(h) is the row
of the prefix ``h`` in the order k-1 table, and key(w) = w for unigrams. Keys of a sorted table are sorted,
so a whole batch of n-grams is looked up with one ``np.searchsorted`` per order.
"""

from __future__ import annotations

from collections.abc import Sequence
from dataclasses import dataclass, field
from typing import Any

import numpy as np
import numpy.typing as npt

from decoder.lm.counts import sort_rows

NEVER_LOG10 = -99.0  # ARPA convention for log10(0): listed but never predicted, e.g. <s>


@dataclass(frozen=True, slots=True, eq=False)  # eq=False: fields are numpy arrays
class NgramModel:
    """Orders 1..order; ``ngrams[k - 1]``, ``log10_probs[k - 1]`` and ``log10_backoffs[k - 1]`` describe order k.

    Invariant (checked when keys are first needed): every prefix of a listed n-gram is listed. Tables built by
    training are also closed under suffixes; ``complete_ngram_model`` closes any model under both."""

    vocabulary_size: int
    ngrams: tuple[npt.NDArray[np.int32], ...]
    log10_probs: tuple[npt.NDArray[np.float64], ...]
    log10_backoffs: tuple[npt.NDArray[np.float64], ...]
    _cache: dict[str, Any] = field(default_factory=dict, init=False, repr=False, compare=False)

    def __post_init__(self) -> None:
        if not (len(self.ngrams) == len(self.log10_probs) == len(self.log10_backoffs) >= 1):
            raise ValueError("NgramModel needs ngrams, probabilities and back-offs for each order, at least one")
        for k, (grams, probs, backoffs) in enumerate(
            zip(self.ngrams, self.log10_probs, self.log10_backoffs, strict=True), start=1
        ):
            if grams.ndim != 2 or grams.shape[1] != k or not (len(grams) == len(probs) == len(backoffs)):
                raise ValueError(f"order {k}: expected an (n, {k}) n-gram array and n probabilities and back-offs")
            if len(grams) and (grams.min() < 0 or grams.max() >= self.vocabulary_size):
                raise ValueError(f"order {k}: word ids must lie in 0..{self.vocabulary_size - 1}")

    @property
    def order(self) -> int:
        return len(self.ngrams)

    def num_ngrams(self, k: int) -> int:
        return len(self.ngrams[k - 1])

    @property
    def keys(self) -> tuple[npt.NDArray[np.int64], ...]:
        """Per-order sorted lookup keys (see the module docstring); built once, then cached."""
        if "keys" not in self._cache:
            self._cache["keys"] = lexicographic_keys(self.ngrams, self.vocabulary_size)
        return self._cache["keys"]

    def suffix_rows(self, k: int) -> npt.NDArray[np.int64]:
        """For each order-k n-gram (k >= 2), the row of its suffix (first word dropped) in the order k-1
        table, -1 where that suffix is not listed; cached."""
        name = f"suffix_rows_{k}"
        if name not in self._cache:
            self._cache[name] = self.rows_of(self.ngrams[k - 1][:, 1:])
        return self._cache[name]

    def is_closed(self) -> bool:
        """Whether every prefix and every suffix of a listed n-gram is listed (as trained models are)."""
        try:
            _ = self.keys  # building the keys checks prefix closure
        except ValueError:
            return False
        return all(self.num_ngrams(k) == 0 or self.suffix_rows(k).min() >= 0 for k in range(2, self.order + 1))

    def rows_of(self, grams: npt.ArrayLike) -> npt.NDArray[np.int64]:
        """Row of each n-gram (an (m, k) array) in the order-k table, or -1 where it is not listed."""
        return lookup_rows(self.keys, np.asarray(grams, dtype=np.int64), self.vocabulary_size)

    def log10_probabilities(self, contexts: npt.ArrayLike, words: npt.ArrayLike) -> npt.NDArray[np.float64]:
        """log10 p(word | context) per row under the back-off rule, for (m, c) contexts and m words (float64).

        Only the last order-1 context words matter. Every word must be a listed unigram (ValueError if not).
        Slow compared with ``decoder.lm.query``, but exact and independent of state handling."""
        contexts = np.asarray(contexts, dtype=np.int64)
        words = np.asarray(words, dtype=np.int64).reshape(-1)
        contexts = contexts.reshape(len(words), -1)[:, max(0, contexts.shape[-1] - (self.order - 1)) :]
        width = contexts.shape[1]
        result = np.zeros(len(words))
        accumulated = np.zeros(len(words))
        is_done = np.zeros(len(words), dtype=bool)
        for start in range(width + 1):  # longest context first, dropping its first word each round
            context = contexts[:, start:]
            rows = self.rows_of(np.concatenate([context, words[:, None]], axis=1))
            found = (rows >= 0) & ~is_done
            k = width - start + 1
            result[found] = accumulated[found] + self.log10_probs[k - 1][rows[found]]
            is_done |= found
            if start < width:
                context_rows = self.rows_of(context)
                backs_off = ~is_done & (context_rows >= 0)
                accumulated[backs_off] += self.log10_backoffs[k - 2][context_rows[backs_off]]
        if not is_done.all():
            raise ValueError("word ids without a unigram entry: " + str(np.unique(words[~is_done])[:10]))
        return result


def lexicographic_keys(
    ngrams: Sequence[npt.NDArray[np.int32]], vocabulary_size: int
) -> tuple[npt.NDArray[np.int64], ...]:
    """Per-order int64 keys row(prefix) * vocabulary_size + last word; ValueError if a table is not sorted and
    distinct or lists an n-gram whose prefix is missing."""
    keys: list[npt.NDArray[np.int64]] = []
    for k, grams in enumerate(ngrams, start=1):
        grams = np.asarray(grams, dtype=np.int64)
        if k == 1:
            key = grams[:, 0].copy()
        else:
            prefix_rows = lookup_rows(tuple(keys), grams[:, :-1], vocabulary_size)
            if len(prefix_rows) and prefix_rows.min() < 0:
                missing = grams[np.flatnonzero(prefix_rows < 0)[0]]
                raise ValueError(f"order {k}: the prefix of n-gram {missing.tolist()} is not listed")
            key = prefix_rows * vocabulary_size + grams[:, -1]
        if len(key) > 1 and np.any(key[1:] <= key[:-1]):
            raise ValueError(f"order {k}: n-grams are not distinct and sorted lexicographically")
        keys.append(key)
    return tuple(keys)


def lookup_rows(
    keys: Sequence[npt.NDArray[np.int64]], grams: npt.NDArray[np.int64], vocabulary_size: int
) -> npt.NDArray[np.int64]:
    """Row of each (m, k) n-gram in its order's table (via ``keys`` of orders 1..k), -1 where not listed."""
    grams = np.asarray(grams, dtype=np.int64)
    rows = np.full(len(grams), -1, dtype=np.int64)
    if grams.shape[1] > len(keys):
        return rows
    for j in range(grams.shape[1]):
        table = keys[j]
        wanted = grams[:, 0] if j == 0 else rows * vocabulary_size + grams[:, j]
        if len(table) == 0:
            return np.full(len(grams), -1, dtype=np.int64)
        position = np.minimum(np.searchsorted(table, wanted), len(table) - 1)
        is_found = table[position] == wanted
        if j > 0:
            is_found &= rows >= 0
        rows = np.where(is_found, position, -1)
    return rows


def _missing_rows(existing: npt.NDArray[np.int32], candidates: npt.NDArray[np.int32]) -> npt.NDArray[np.int32]:
    """Distinct rows of ``candidates`` that are not rows of ``existing`` (both (n, k) arrays)."""
    if len(candidates) == 0:
        return candidates
    combined = np.concatenate([existing, candidates])
    tags = np.concatenate([np.zeros(len(existing), np.int8), np.ones(len(candidates), np.int8)])
    order = np.lexsort((tags,) + tuple(combined.T[::-1]))  # rows first, existing (tag 0) before candidates
    ordered, ordered_tags = combined[order], tags[order]
    differs_from_previous = np.ones(len(ordered), dtype=bool)
    differs_from_previous[1:] = np.any(ordered[1:] != ordered[:-1], axis=1)
    return ordered[differs_from_previous & (ordered_tags == 1)]


def complete_ngram_model(model: NgramModel) -> NgramModel:
    """The same model with every missing prefix and suffix of a listed n-gram added, so queries can step from
    any n-gram to its context and to its back-off n-gram.

    An added n-gram ``h w`` gets the probability the back-off rule already gave it and back-off weight 1
    (log10 0), which is what the rule assumes for unlisted contexts; so no probability changes. Missing
    unigrams cannot be added this way (their probability is undefined): ValueError."""
    if model.is_closed():
        return model
    grams = [np.asarray(table, dtype=np.int32) for table in model.ngrams]
    probs = [np.asarray(values, dtype=np.float64) for values in model.log10_probs]
    backoffs = [np.asarray(values, dtype=np.float64) for values in model.log10_backoffs]
    for k in range(model.order, 1, -1):  # top down, so n-grams added at order k-1 get their own parts added
        table = grams[k - 1]
        candidates = np.concatenate([table[:, :-1], table[:, 1:]])
        missing = _missing_rows(grams[k - 2], candidates)
        if len(missing) == 0:
            continue
        if k == 2:
            raise ValueError(f"word ids {np.unique(missing).tolist()[:10]} occur in n-grams but not as unigrams")
        merged = np.concatenate([grams[k - 2], missing])
        order = sort_rows(merged)
        grams[k - 2] = merged[order]
        probs[k - 2] = np.concatenate([probs[k - 2], np.full(len(missing), np.nan)])[order]
        backoffs[k - 2] = np.concatenate([backoffs[k - 2], np.zeros(len(missing))])[order]
    for k in range(2, model.order):  # bottom up: an added n-gram's probability needs the lower orders
        is_added = np.isnan(probs[k - 1])
        if not is_added.any():
            continue
        lower = NgramModel(
            model.vocabulary_size, tuple(grams[: k - 1]), tuple(probs[: k - 1]), tuple(backoffs[: k - 1])
        )
        added = grams[k - 1][is_added]
        # Unlisted h w: backoff(h) * p(w | h without its first word); h is listed (prefix closure above).
        context_backoffs = backoffs[k - 2][lower.rows_of(added[:, :-1])]
        probs[k - 1][is_added] = context_backoffs + lower.log10_probabilities(added[:, 1:-1], added[:, -1])
    return NgramModel(model.vocabulary_size, tuple(grams), tuple(probs), tuple(backoffs))
