"""BLEU (Papineni et al. 2002) as sufficient statistics: one small integer vector per hypothesis.

A statistics row is ``NUM_STATISTICS`` int64 values in this column order:

    matches_1 .. matches_4   clipped n-gram matches (each n-gram counted at most as often as it occurs in the
                             reference that has most of it)
    totals_1 .. totals_4     n-grams in the hypothesis, max(length - n + 1, 0)
    hypothesis_length        tokens
    reference_length         the effective reference length: the reference length closest to the hypothesis
                             length, ties going to the shorter reference (the usual rule, and sacrebleu's)

Rows add: the corpus statistics are the column sums, and corpus BLEU is a function of that sum. Tuning computes a
row once per n-best entry and then scores thousands of weight vectors by summing rows, never by re-reading text.

Counting is vectorised over many hypotheses at once. Tokens are mapped to integer ids once per ``ReferenceSet``
(tokens found in no reference share id 0 and can never match); n-grams get dense ids order by order, an n-gram
being (id of its (n-1)-gram prefix, last token), so keys stay small for any vocabulary size.
"""

from __future__ import annotations

from collections.abc import Sequence
from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from decoder.errors import ConfigurationError

MAX_NGRAM_ORDER = 4  # BLEU-4, as in Papineni et al. (2002)
MATCHES = slice(0, MAX_NGRAM_ORDER)
TOTALS = slice(MAX_NGRAM_ORDER, 2 * MAX_NGRAM_ORDER)
HYPOTHESIS_LENGTH = 2 * MAX_NGRAM_ORDER
REFERENCE_LENGTH = 2 * MAX_NGRAM_ORDER + 1
NUM_STATISTICS = 2 * MAX_NGRAM_ORDER + 2

Tokens = tuple[str, ...]
_NO_REFERENCE = 2**40  # padding length for segments with fewer references: never the closest one


@dataclass(frozen=True, slots=True)
class _OrderTable:
    """Reference n-grams of one order.

    ``keys``: sorted unique (prefix dense id * key_base + last token id) of every reference n-gram; an n-gram's
    dense id is its row in ``keys``. ``segment_keys``/``max_counts``: sorted (segment * len(keys) + dense id) and
    the largest count of that n-gram in any one reference of the segment (the clipping limit)."""

    keys: npt.NDArray[np.int64]
    segment_keys: npt.NDArray[np.int64]
    max_counts: npt.NDArray[np.int64]


def _positions(lengths: npt.NDArray[np.int64]) -> npt.NDArray[np.int64]:
    """For a flat concatenation of sequences of these lengths, each element's 0-based position in its sequence."""
    starts = np.cumsum(lengths) - lengths
    return np.arange(int(lengths.sum()), dtype=np.int64) - np.repeat(starts, lengths)


def _lookup(sorted_keys: npt.NDArray[np.int64], wanted: npt.NDArray[np.int64]) -> npt.NDArray[np.int64]:
    """Row of each wanted key in ``sorted_keys``, or -1 where it is absent."""
    if len(sorted_keys) == 0:
        return np.full(wanted.shape, -1, dtype=np.int64)
    rows = np.minimum(np.searchsorted(sorted_keys, wanted), len(sorted_keys) - 1)
    return np.where(sorted_keys[rows] == wanted, rows, -1)


class ReferenceSet:
    """The references of a dev set, indexed once so that statistics of any number of hypotheses are cheap.

    ``references[k]`` lists the references of segment k (at least one each; an empty reference has length 0).
    Tokens are compared as given: tokenize and lowercase both sides the way the score should see them."""

    __slots__ = ("_token_ids", "_key_base", "_tables", "_reference_lengths", "num_segments")

    def __init__(self, references: Sequence[Sequence[Sequence[str]]]) -> None:
        self.num_segments = len(references)
        for segment, segment_references in enumerate(references):
            if len(segment_references) == 0:
                raise ConfigurationError(f"segment {segment} has no reference; BLEU needs at least one")
        self._token_ids: dict[str, int] = {}
        for segment_references in references:
            for reference in segment_references:
                for token in reference:
                    self._token_ids.setdefault(token, len(self._token_ids) + 1)
        self._key_base = len(self._token_ids) + 1
        flat_references = [reference for segment_references in references for reference in segment_references]
        reference_segments = np.repeat(
            np.arange(self.num_segments, dtype=np.int64), [len(segment_references) for segment_references in references]
        )
        max_references = max((len(segment_references) for segment_references in references), default=0)
        self._reference_lengths = np.full((self.num_segments, max_references), _NO_REFERENCE, dtype=np.int64)
        for segment, segment_references in enumerate(references):
            self._reference_lengths[segment, : len(segment_references)] = [len(r) for r in segment_references]
        self._tables = self._index(flat_references, reference_segments)

    def _encode(self, sequences: Sequence[Sequence[str]]) -> tuple[npt.NDArray[np.int64], npt.NDArray[np.int64]]:
        """(flat token ids, lengths) of many token sequences; one Python pass, the only per-token loop."""
        get = self._token_ids.get
        ids = np.array([get(token, 0) for sequence in sequences for token in sequence], dtype=np.int64)
        lengths = np.array([len(sequence) for sequence in sequences], dtype=np.int64)
        return ids, lengths

    def _index(
        self, flat_references: Sequence[Sequence[str]], reference_segments: npt.NDArray[np.int64]
    ) -> tuple[_OrderTable, ...]:
        ids, lengths = self._encode(flat_references)
        positions = _positions(lengths)
        owner = np.repeat(np.arange(len(flat_references), dtype=np.int64), lengths)
        tables = []
        prefix = np.zeros(len(ids), dtype=np.int64)  # dense id of the (n-1)-gram starting at each position
        for order in range(1, MAX_NGRAM_ORDER + 1):
            starts = np.nonzero(positions + order <= lengths[owner])[0]
            keys_at = prefix[starts] * self._key_base + ids[starts + order - 1]
            keys = np.unique(keys_at)
            num_keys = max(len(keys), 1)
            dense = np.searchsorted(keys, keys_at)
            # count per (reference, n-gram), then the maximum over the references of each segment
            per_reference, counts = np.unique(owner[starts] * num_keys + dense, return_counts=True)
            reference_of, gram = np.divmod(per_reference, num_keys)
            segment_gram = reference_segments[reference_of] * num_keys + gram
            order_by = np.argsort(segment_gram, kind="stable")
            segment_gram, counts = segment_gram[order_by], counts[order_by]
            segment_keys, first = np.unique(segment_gram, return_index=True)
            max_counts = np.maximum.reduceat(counts, first) if len(counts) else counts
            tables.append(_OrderTable(keys, segment_keys, max_counts.astype(np.int64)))
            prefix = np.full(len(ids), -1, dtype=np.int64)
            prefix[starts] = dense
        return tuple(tables)

    def statistics(self, segments: npt.ArrayLike, hypotheses: Sequence[Sequence[str]]) -> npt.NDArray[np.int64]:
        """Statistics rows, shape (len(hypotheses), NUM_STATISTICS); hypothesis k is scored against the
        references of segment ``segments[k]``."""
        segments = np.asarray(segments, dtype=np.int64).reshape(-1)
        if len(segments) != len(hypotheses):
            raise ConfigurationError(f"{len(segments)} segment indices for {len(hypotheses)} hypotheses")
        if len(segments) and (segments.min() < 0 or segments.max() >= self.num_segments):
            raise ConfigurationError(f"segment index out of range 0..{self.num_segments - 1}")
        num_hypotheses = len(hypotheses)
        ids, lengths = self._encode(hypotheses)
        positions = _positions(lengths)
        owner = np.repeat(np.arange(num_hypotheses, dtype=np.int64), lengths)
        result = np.zeros((num_hypotheses, NUM_STATISTICS), dtype=np.int64)
        prefix = np.zeros(len(ids), dtype=np.int64)
        for order, table in enumerate(self._tables, start=1):
            result[:, TOTALS.start + order - 1] = np.maximum(lengths - order + 1, 0)
            starts = np.nonzero(positions + order <= lengths[owner])[0]
            last = ids[starts + order - 1]
            usable = (prefix[starts] >= 0) & (last > 0)
            dense = np.full(len(starts), -1, dtype=np.int64)
            dense[usable] = _lookup(table.keys, prefix[starts][usable] * self._key_base + last[usable])
            known = dense >= 0
            num_keys = max(len(table.keys), 1)
            per_hypothesis, counts = np.unique(owner[starts][known] * num_keys + dense[known], return_counts=True)
            hypothesis_of, gram = np.divmod(per_hypothesis, num_keys)
            row = _lookup(table.segment_keys, segments[hypothesis_of] * num_keys + gram)
            limit = np.where(row >= 0, table.max_counts[np.maximum(row, 0)], 0) if len(row) else row
            clipped = np.minimum(counts, limit)
            result[:, MATCHES.start + order - 1] = np.bincount(hypothesis_of, clipped, minlength=num_hypotheses)
            prefix = np.full(len(ids), -1, dtype=np.int64)
            prefix[starts] = dense
        result[:, HYPOTHESIS_LENGTH] = lengths
        result[:, REFERENCE_LENGTH] = self.effective_reference_lengths(segments, lengths)
        return result

    def effective_reference_lengths(
        self, segments: npt.NDArray[np.int64], hypothesis_lengths: npt.NDArray[np.int64]
    ) -> npt.NDArray[np.int64]:
        """Per hypothesis, the length of its segment's reference closest in length; ties to the shorter."""
        candidates = self._reference_lengths[segments]
        distance = np.abs(candidates - hypothesis_lengths[:, None])
        closest = distance == distance.min(axis=1, keepdims=True)
        return np.where(closest, candidates, _NO_REFERENCE).min(axis=1)


def segment_statistics(hypothesis: Sequence[str], references: Sequence[Sequence[str]]) -> npt.NDArray[np.int64]:
    """The statistics row of one hypothesis against its references (convenience; index many at once with
    ``ReferenceSet`` instead)."""
    return ReferenceSet([references]).statistics([0], [hypothesis])[0]


def _log_precisions(matches: npt.NDArray[np.float64], totals: npt.NDArray[np.float64]) -> npt.NDArray[np.float64]:
    positive = (matches > 0) & (totals > 0)
    return np.where(
        positive, np.log(np.where(positive, matches, 1.0)) - np.log(np.where(positive, totals, 1.0)), -np.inf
    )


def _brevity_penalty(statistics: npt.NDArray[np.int64]) -> npt.NDArray[np.float64]:
    """exp(1 - r/c) when the hypothesis length c is below the reference length r, else 1 (Papineni et al.
    2002, section 2.2.2); 0 for an empty hypothesis against a non-empty reference."""
    hypothesis_length = statistics[..., HYPOTHESIS_LENGTH].astype(np.float64)
    reference_length = statistics[..., REFERENCE_LENGTH].astype(np.float64)
    ratio = reference_length / np.where(hypothesis_length > 0, hypothesis_length, 1.0)
    penalty = np.where(hypothesis_length < reference_length, np.exp(np.minimum(1.0 - ratio, 0.0)), 1.0)
    return np.where((hypothesis_length == 0) & (reference_length > 0), 0.0, penalty)


def bleu(statistics: npt.ArrayLike) -> npt.NDArray[np.float64] | float:
    """BLEU in [0, 1] of summed statistics; any leading axes are kept (one score per row of a (..., 10) array).

    No smoothing: the geometric mean of the four modified precisions times the brevity penalty, hence 0 as soon
    as one order has no match (sacrebleu's ``smooth_method="none"``; its default "exp" differs only then)."""
    statistics = np.asarray(statistics, dtype=np.int64)
    matches = statistics[..., MATCHES].astype(np.float64)
    totals = statistics[..., TOTALS].astype(np.float64)
    log_precisions = _log_precisions(matches, totals)
    has_all = np.all(np.isfinite(log_precisions), axis=-1)
    mean = np.where(has_all, np.where(np.isfinite(log_precisions), log_precisions, 0.0).mean(axis=-1), 0.0)
    score = np.where(has_all, _brevity_penalty(statistics) * np.exp(mean), 0.0)
    return float(score) if score.ndim == 0 else score


def corpus_bleu(statistics: npt.ArrayLike) -> float:
    """BLEU in [0, 1] of a corpus given one statistics row per segment, shape (num_segments, NUM_STATISTICS)."""
    return float(bleu(np.asarray(statistics, dtype=np.int64).reshape(-1, NUM_STATISTICS).sum(axis=0)))


def sentence_bleu_plus_one(statistics: npt.ArrayLike) -> npt.NDArray[np.float64] | float:
    """Smoothed sentence-level BLEU in [0, 1] per row: "BLEU+1" of Lin & Och (2004, "ORANGE"), which adds one to
    the matches and the totals of every order n > 1 and leaves unigram precision and the brevity penalty
    unsmoothed. So a hypothesis without a unigram match (or an empty one) scores 0, and every other hypothesis
    scores above 0. Equals sacrebleu's ``smooth_method="add-k", smooth_value=1``. Used by PRO."""
    statistics = np.asarray(statistics, dtype=np.int64)
    matches = statistics[..., MATCHES].astype(np.float64)
    totals = statistics[..., TOTALS].astype(np.float64)
    matches[..., 1:] += 1.0
    totals[..., 1:] += 1.0
    has_unigram = statistics[..., MATCHES.start] > 0
    log_precisions = _log_precisions(matches, totals)
    mean = np.where(has_unigram, np.where(np.isfinite(log_precisions), log_precisions, 0.0).mean(axis=-1), 0.0)
    score = np.where(has_unigram, _brevity_penalty(statistics) * np.exp(mean), 0.0)
    return float(score) if score.ndim == 0 else score
