"""Hypotheses and the incremental scoring of one expansion (one option appended to a partial translation).

A hypothesis is a partial translation: which source words are covered, where its last source phrase started
and ended (distortion and orientation of the next phrase), its LM state, which orientation distribution its
last phrase uses, and its model score. Hypotheses with equal ``recombination_key`` have the same future, so
only the best survives on a stack; the others become ``arcs`` of it, kept for n-best extraction.

Orientation (Tillmann 2004; Koehn et al. 2005), from the source positions of two consecutive phrases A then B:
monotone if B starts where A ends, swap if B ends where A starts, discontinuous otherwise. B's ``prev``
feature and A's ``next`` feature score the same orientation. The segment start is a phrase ending at 0 (and
starting at -1); the segment end is a phrase starting at the last position + 1.
"""

from __future__ import annotations

import numpy as np

from decoder.lm.query import LanguageModel
from decoder.search.features import FEATURE_INDEX
from decoder.search.options import LN10, NEUTRAL_REORDERING, TranslationOption
from decoder.vocabulary import SENTENCE_END_ID

MONOTONE, SWAP, DISCONTINUOUS = 0, 1, 2
_PREV = tuple(FEATURE_INDEX[f"reorder_prev_{name}"] for name in ("monotone", "swap", "discontinuous"))
_NEXT = tuple(FEATURE_INDEX[f"reorder_next_{name}"] for name in ("monotone", "swap", "discontinuous"))


def orientation(previous_start: int, previous_end: int, start: int, end: int) -> int:
    if start == previous_end:
        return MONOTONE
    if end == previous_start:
        return SWAP
    return DISCONTINUOUS


class Hypothesis:
    __slots__ = ("coverage", "num_covered", "last_start", "last_end", "lm_state", "last_option", "score",
                 "future_cost", "back", "option", "arcs", "num_output")

    def __init__(self, coverage: int, num_covered: int, last_start: int, last_end: int, lm_state: int,
                 last_option: TranslationOption | None, score: float, future_cost: float,
                 back: Hypothesis | None, option: TranslationOption | None, num_output: int) -> None:
        self.coverage = coverage
        self.num_covered = num_covered
        self.last_start = last_start
        self.last_end = last_end
        self.lm_state = lm_state
        self.last_option = last_option
        self.score = score
        self.future_cost = future_cost
        self.back = back
        self.option = option
        self.arcs: list[tuple[float, Hypothesis, TranslationOption]] | None = None
        self.num_output = num_output

    @property
    def total(self) -> float:
        return self.score + self.future_cost

    @property
    def recombination_key(self) -> tuple:
        reordering_id = self.last_option.reordering_id if self.last_option is not None else None
        return (self.coverage, self.lm_state, self.last_start, self.last_end, reordering_id, self.num_output)


class ExpansionScorer:
    """Scores appending an option to a hypothesis; the only place the search adds context-dependent features.

    Uses a cache of LM extensions (state, target phrase) -> (log10 sum, new state): weight-independent, so one
    cache may serve many segments and requests (``lm_cache``; a fresh one per scorer by default)."""

    __slots__ = ("language_model", "num_words", "_lm_weight", "_distortion_weight", "_prev_weights",
                 "_next_weights", "_lm_cache")

    def __init__(self, language_model: LanguageModel, weights: np.ndarray, num_words: int,
                 lm_cache: dict[tuple[int, tuple[int, ...]], tuple[float, int]] | None = None) -> None:
        self.language_model = language_model
        self.num_words = num_words
        self._lm_weight = float(weights[FEATURE_INDEX["lm"]]) * LN10
        self._distortion_weight = float(weights[FEATURE_INDEX["distortion"]])
        self._prev_weights = tuple(float(weights[index]) for index in _PREV)
        self._next_weights = tuple(float(weights[index]) for index in _NEXT)
        self._lm_cache = lm_cache if lm_cache is not None else {}

    def lm_extend(self, state: int, target_ids: tuple[int, ...]) -> tuple[float, int]:
        """(summed log10 probability of the words after ``state``, new state), through the scorer's cache."""
        key = (state, target_ids)
        cached = self._lm_cache.get(key)
        if cached is None:
            total = 0.0
            for word in target_ids:
                log10_prob, state = self.language_model.score(state, word)
                total += log10_prob
            cached = (total, state)
            self._lm_cache[key] = cached
        return cached

    def expand(self, hypothesis: Hypothesis, option: TranslationOption) -> tuple[float, int]:
        """(score of the new hypothesis, its LM state). Adds the end-of-segment scores when it completes."""
        start, last_end = option.start, hypothesis.last_end
        score = hypothesis.score + option.static_score - self._distortion_weight * abs(start - last_end)
        # orientation(), inlined: this is the decoder's innermost call
        kind = MONOTONE if start == last_end else SWAP if option.end == hypothesis.last_start else DISCONTINUOUS
        score += self._prev_weights[kind] * option.reordering[kind]
        last_option = hypothesis.last_option
        if last_option is not None:
            score += self._next_weights[kind] * last_option.reordering[3 + kind]
        cached = self._lm_cache.get((hypothesis.lm_state, option.target_ids))
        log10_total, state = cached if cached is not None else self.lm_extend(hypothesis.lm_state, option.target_ids)
        score += self._lm_weight * log10_total
        if hypothesis.num_covered + option.length == self.num_words:
            score += self._lm_weight * self.lm_extend(state, (SENTENCE_END_ID,))[0]
            end_kind = orientation(option.start, option.end, self.num_words, self.num_words + 1)
            score += self._next_weights[end_kind] * option.reordering[3 + end_kind]
        return score, state


def derivation_features(options: list[TranslationOption], language_model: LanguageModel,
                        num_words: int) -> np.ndarray:
    """The full feature vector of a complete derivation (options in target order), computed from scratch.

    Independent of the search's incremental sums: the decoder's score must equal ``weights @ features``."""
    features = np.zeros_like(options[0].static_features) if options else None
    if features is None:
        raise ValueError("a derivation has at least one option")
    previous_start, previous_end, previous_option = -1, 0, None
    target_ids: list[int] = []
    distortion = FEATURE_INDEX["distortion"]
    for option in options:
        features += option.static_features
        features[distortion] -= abs(option.start - previous_end)
        kind = orientation(previous_start, previous_end, option.start, option.end)
        features[_PREV[kind]] += option.reordering[kind]
        if previous_option is not None:
            features[_NEXT[kind]] += previous_option.reordering[3 + kind]
        target_ids.extend(option.target_ids)
        previous_start, previous_end, previous_option = option.start, option.end, option
    end_kind = orientation(previous_start, previous_end, num_words, num_words + 1)
    reordering = previous_option.reordering if previous_option is not None else NEUTRAL_REORDERING
    features[_NEXT[end_kind]] += reordering[3 + end_kind]
    features[FEATURE_INDEX["lm"]] = LN10 * language_model.score_sentence(target_ids)
    return features
