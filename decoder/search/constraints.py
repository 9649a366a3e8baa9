"""Terminology constraints applied to a segment's translation options (DESIGN.md, "Constraints from glossaries").

For each term the matcher found (``decoder.terminology``), by its mode (the entry's own, else the request's):

- ``enforce``: every option overlapping the term's span is removed, except phrase options that cover the whole
  span and already produce an allowed target, and one glossary option per allowed target is added, so every
  derivation, and so every n-best entry, translates the span by an allowed target;
- ``prefer``: the glossary options are added beside the model's own, and the model may choose otherwise;
- ``off``: nothing (the term is still reported).

The ``glossary`` feature counts the terms an option translates by an allowed target: a glossary option, and
equally a phrase option that covers the whole span and already produces the target. So the weight rewards the
term, not the way it is reached: a longer phrase that carries the term ("security level" -> "niveau de
sécurité") competes with the word-by-word glossary options on its own merits, and under enforce every
derivation earns the same count.

A glossary option takes its phrase features and orientation probabilities from the phrase table when the pair
is there, neutral values (log 1, uniform orientations) otherwise; the LM scores it in context like any option.
Deprecated and superseded targets are removed from the phrase options of every span; identity options (pass
through, placeholders) are never removed, and a word left without any option gets its pass-through back, so a
segment is always translatable.
"""

from __future__ import annotations

import dataclasses
import functools
from collections.abc import Callable, Sequence
from dataclasses import dataclass

import numpy as np

from decoder.search.features import FEATURE_INDEX
from decoder.search.options import NEUTRAL_REORDERING, OptionBuilder, OptionKind, OptionSet, TranslationOption
from decoder.terminology.glossary import TermMode
from decoder.terminology.matching import TermMatch
from decoder.text.pipeline import prepare_segment


@dataclass(frozen=True, slots=True)
class TermTokens:
    """A target term as the model sees it (lowercased ids) and as the output must show it (glossary casing)."""

    model_tokens: tuple[str, ...]
    output_tokens: tuple[str, ...]


@functools.lru_cache(maxsize=8192)
def term_tokens(text: str, language: str) -> TermTokens:
    """Cached: the same glossary targets are tokenized for every segment they might apply to."""
    prepared = prepare_segment(text, language)
    return TermTokens(tuple(prepared.model_tokens), tuple(prepared.cased_tokens))


def _contains(haystack: Sequence[str], needle: Sequence[str]) -> bool:
    size = len(needle)
    return size > 0 and any(tuple(haystack[start:start + size]) == tuple(needle)
                            for start in range(len(haystack) - size + 1))


class ConstraintApplier:
    """Applies one segment's term matches to the options of one piece of it (token positions offset)."""

    def __init__(self, builder: OptionBuilder, target_language: str) -> None:
        self.builder = builder
        self.target_language = target_language

    def glossary_option(self, start: int, end: int, source_ids: Sequence[int], term: TermTokens,
                        label: str) -> TranslationOption:
        builder = self.builder
        target_ids = [builder.target_vocabulary.id_of(token) for token in term.model_tokens]
        features = builder.base_features(len(target_ids))
        features[FEATURE_INDEX["glossary"]] = 1.0
        reordering: Sequence[float] = NEUTRAL_REORDERING
        reordering_id = -10**6 - start
        table = builder.phrase_table
        for row in table.lookup(source_ids):
            if [int(token) for token in table.target_phrase(row)] == target_ids:
                for name, value in zip(table.SCORE_NAMES, table.scores[row]):
                    features[FEATURE_INDEX[name]] = float(value)
                reordering, reordering_id = table.reordering[row], int(row)
                break
        alignment = [(min(i, end - start - 1), i) for i in range(len(target_ids))] or [(0, 0)]
        return builder.make(start, end, target_ids, term.output_tokens, features, reordering, alignment,
                            OptionKind.GLOSSARY, reordering_id, label)

    def apply(self, option_set: OptionSet, model_tokens: Sequence[str], matches: Sequence[TermMatch],
              default_mode: TermMode, offset: int, forbidden: Sequence[str]) -> None:
        """Constrain ``option_set`` (the piece starting at token ``offset``) in place."""
        forbidden_sequences = [term_tokens(text, self.target_language).model_tokens for text in forbidden]
        if forbidden_sequences:
            option_set.filter(lambda option: option.kind is not OptionKind.PHRASE or not any(
                _contains([token.lower() for token in option.output_tokens], sequence)
                for sequence in forbidden_sequences))
        source_ids = self.builder.source_vocabulary.encode(model_tokens)
        for match in matches:
            mode = match.mode or default_mode
            start, end = match.token_span.start - offset, match.token_span.end - offset
            if mode is TermMode.OFF or start < 0 or end > len(model_tokens) or not match.allowed_targets:
                continue
            terms = [term_tokens(target, self.target_language) for target in match.allowed_targets]
            options = [self.glossary_option(start, end, [int(i) for i in source_ids[start:end]], term,
                                            f"{match.glossary_name}:{match.entry.origin}") for term in terms]
            carries = _carries_term(start, end, terms)
            if mode is TermMode.ENFORCE:
                option_set.remove_covering(start, end, keep=carries)
            self.credit_term(option_set, start, end, carries)
            for option in options:
                option_set.replace_translation(option)
        self.restore_coverage(option_set, model_tokens)

    def credit_term(self, option_set: OptionSet, start: int, end: int,
                    carries: Callable[[TranslationOption], bool]) -> None:
        """Count the term in the ``glossary`` feature of every phrase option that carries it."""
        glossary_weight = float(self.builder.weights[FEATURE_INDEX["glossary"]])
        for span, span_options in option_set.by_span.items():
            if span[0] > start or span[1] < end:
                continue
            credited = []
            for option in span_options:
                if carries(option):
                    features = option.static_features.copy()
                    features[FEATURE_INDEX["glossary"]] += 1.0
                    option = dataclasses.replace(option, static_features=features,
                                                 static_score=option.static_score + glossary_weight,
                                                 estimate=option.estimate + glossary_weight)
                credited.append(option)
            credited.sort(key=lambda item: -item.estimate)
            option_set.by_span[span] = credited

    def restore_coverage(self, option_set: OptionSet, model_tokens: Sequence[str]) -> None:
        """Give every word no remaining option can cover its pass-through option back."""
        for position in option_set.uncovered_positions():
            option_set.add(self.builder.identity_option(position, model_tokens[position], OptionKind.PASS_THROUGH))


def _carries_term(start: int, end: int, terms: Sequence[TermTokens]) -> Callable[[TranslationOption], bool]:
    """Whether a phrase option translates the whole span [start, end) with one of the allowed targets: it covers
    the span and its output holds the target (so "the sync hub" -> "el centro de sincronización" may stay)."""
    def keep(option: TranslationOption) -> bool:
        if option.kind is not OptionKind.PHRASE or option.start > start or option.end < end:
            return False
        output = [token.lower() for token in option.output_tokens]
        return any(_contains(output, term.model_tokens) for term in terms)
    return keep


def glossary_positions(placed: Sequence[tuple[TranslationOption, int]]) -> np.ndarray:
    """Output token positions that come from glossary options (their casing is the glossary's)."""
    positions, cursor = [], 0
    for option, _ in placed:
        count = 1 if option.kind is OptionKind.PASS_THROUGH else len(option.output_tokens)
        if option.kind is OptionKind.GLOSSARY:
            positions.extend(range(cursor, cursor + count))
        cursor += count
    return np.array(positions, dtype=np.int64)
