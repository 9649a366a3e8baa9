"""Adapter that lets nltk's StackDecoder (reference implementation, bench only) search with our model.

nltk scores a hypothesis as the sum of phrase log probabilities, an LM change, |jump| * log(distortion factor)
and a word penalty. We give it, per segment, our translation options with their weighted context-free score as
the phrase "log probability", our LM (weighted, natural log) as its language model, and the distortion factor
e^-w so that its distortion cost equals ours. It does not know our lexicalized reordering, the end-of-segment
LM word, or the jump of the first phrase, so its outputs are then scored under our full model by forced
decoding: the comparison is of model scores under one and the same model.
"""

from __future__ import annotations

import math
import time

from decoder.search.features import FEATURE_INDEX
from decoder.search.options import LN10
from decoder.search.settings import SearchAlgorithm, SearchSettings, TranslationOptions
from decoder.search.translator import Translator
from decoder.text.pipeline import prepare_segment

FORCED = TranslationOptions(search=SearchSettings(algorithm=SearchAlgorithm.STACK, stack_size=10**6, beam_width=1e9))


class _LanguageModel:
    """nltk's experimental LM interface: probability(phrase) and probability_change(hypothesis, phrase)."""

    def __init__(self, translator: Translator, weight: float) -> None:
        self.model = translator.model
        self.scale = weight * LN10

    def _log10(self, tokens, state=None):
        language_model = self.model.language_model
        state = language_model.begin_state() if state is None else state
        total = 0.0
        for token in tokens:
            log10_prob, state = language_model.score(state, self.model.target_vocabulary.id_of(token))
            total += log10_prob
        return total

    def probability(self, phrase):
        return self.scale * self.model.language_model.estimate(
            [self.model.target_vocabulary.id_of(token) for token in phrase])

    def probability_change(self, hypothesis, phrase):
        context = hypothesis.translation_so_far()
        return self.scale * (self._log10(list(context) + list(phrase)) - self._log10(context))


def compare_with_nltk(translator: Translator, segments: list[str]) -> dict:
    from nltk.translate import PhraseTable, StackDecoder

    weights = translator.weights()
    builder = translator.builder(weights)
    ours_seconds = nltk_seconds = 0.0
    ours_scores, nltk_scores, at_least_as_good = [], [], 0
    for segment in segments:
        prepared = prepare_segment(segment, translator.model.source_language)
        tokens = prepared.model_tokens
        started = time.perf_counter()
        ours = translator.translate([segment])[0].n_best[0].score
        ours_seconds += time.perf_counter() - started
        option_set = builder.collect(tokens, 20, 7)
        table = PhraseTable()
        for option in option_set.all_options():
            table.add(tuple(tokens[option.start:option.end]), option.output_tokens, option.static_score)
        decoder = StackDecoder(table, _LanguageModel(translator, float(weights[FEATURE_INDEX["lm"]])))
        decoder.distortion_factor = math.exp(-float(weights[FEATURE_INDEX["distortion"]]))
        started = time.perf_counter()
        output = decoder.translate(list(tokens))
        nltk_seconds += time.perf_counter() - started
        if not output:
            continue
        forced_ids = [translator.model.target_vocabulary.id_of(token) for token in output]
        forced = translator.search_piece(option_set, FORCED, weights, forced_target=forced_ids)
        if not forced.complete:
            continue
        theirs = max(hypothesis.score for hypothesis in forced.complete)
        ours_scores.append(ours)
        nltk_scores.append(theirs)
        at_least_as_good += ours >= theirs - 1e-9
    count = len(segments)
    return {"segments": count, "ours_ms": 1000 * ours_seconds / count, "nltk_ms": 1000 * nltk_seconds / count,
            "speed_ratio": nltk_seconds / ours_seconds, "scored": len(ours_scores),
            "ours_score": sum(ours_scores) / max(len(ours_scores), 1),
            "nltk_score": sum(nltk_scores) / max(len(nltk_scores), 1), "at_least_as_good": at_least_as_good}
