"""Translation options: every way to translate every source span of one segment, with context-free scores.

This is the hook where terminology constraints act (DESIGN.md): an ``OptionSet`` maps each span (start, end) to
its options, best estimate first, and offers ``add``, ``remove_covering`` and ``filter`` so that a constraint
can force, add or forbid options before the search starts.

Kinds of option:
- ``phrase``: a phrase-table pair (at most ``max_options_per_span`` per span, best first);
- ``pass_through``: the source word itself, for a word with no one-word phrase pair (feature ``unknown_word``);
- ``protected``: a placeholder, number, URL, path or tag class token, which only ever translates to itself;
  phrase pairs over a longer span that contains one are kept only if they carry it through;
- ``glossary``: added by the terminology layer.
"""

from __future__ import annotations

import math
from collections.abc import Callable, Iterable, Sequence
from dataclasses import dataclass, field
from enum import StrEnum

import numpy as np
import numpy.typing as npt

from decoder.lm.query import LanguageModel
from decoder.phrases.table import PhraseTable
from decoder.search.features import FEATURE_INDEX, NUM_FEATURES
from decoder.text.protection import CLASS_TOKENS
from decoder.vocabulary import Vocabulary

LN10 = math.log(10.0)
NEUTRAL_REORDERING = (math.log(1.0 / 3.0),) * 6  # uniform orientation distribution for options not in the table
_SCORE_FEATURES = tuple(FEATURE_INDEX[name] for name in PhraseTable.SCORE_NAMES)


class OptionKind(StrEnum):
    PHRASE = "phrase"
    PASS_THROUGH = "pass_through"
    PROTECTED = "protected"
    GLOSSARY = "glossary"


@dataclass(frozen=True, slots=True)
class TranslationOption:
    """A target phrase for source span [start, end).

    ``static_features`` holds the context-free feature values in FEATURE_NAMES order (distortion, reordering and
    lm stay 0: they depend on the context and are added during search); ``static_score`` is their weighted sum,
    ``estimate`` adds the weighted context-free LM estimate (for future costs and cube ordering).
    ``alignment`` links (source offset, target offset) inside the phrase. ``reordering_id`` identifies the
    orientation distribution (the phrase-table row, or a negative id for options outside the table)."""

    start: int
    end: int
    target_ids: tuple[int, ...]
    output_tokens: tuple[str, ...]
    static_features: npt.NDArray[np.float64]
    reordering: tuple[float, ...]
    alignment: tuple[tuple[int, int], ...]
    kind: OptionKind
    reordering_id: int
    static_score: float
    estimate: float
    label: str = ""  # e.g. the glossary entry an option came from

    @property
    def length(self) -> int:
        return self.end - self.start


@dataclass
class OptionSet:
    """All options of one segment by span; each list sorted by ``estimate``, best first."""

    num_words: int
    by_span: dict[tuple[int, int], list[TranslationOption]] = field(default_factory=dict)

    def options(self, start: int, end: int) -> list[TranslationOption]:
        return self.by_span.get((start, end), [])

    def add(self, option: TranslationOption) -> None:
        options = self.by_span.setdefault((option.start, option.end), [])
        options.append(option)
        options.sort(key=lambda item: -item.estimate)

    def replace_translation(self, option: TranslationOption) -> None:
        """Add ``option`` in place of any phrase option with the same span and target (a glossary option that
        the phrase table also has: the glossary's casing wins, and the search sees the pair once)."""
        span = (option.start, option.end)
        self.by_span[span] = [other for other in self.by_span.get(span, [])
                              if other.kind is not OptionKind.PHRASE or other.target_ids != option.target_ids]
        self.add(option)

    def remove_covering(self, start: int, end: int, keep: Callable[[TranslationOption], bool] | None = None) -> None:
        """Remove every option that overlaps [start, end) (unless ``keep`` says otherwise)."""
        for span in list(self.by_span):
            if span[0] < end and start < span[1]:
                kept = [option for option in self.by_span[span] if keep is not None and keep(option)]
                if kept:
                    self.by_span[span] = kept
                else:
                    del self.by_span[span]

    def filter(self, keep: Callable[[TranslationOption], bool]) -> None:
        for span in list(self.by_span):
            kept = [option for option in self.by_span[span] if keep(option)]
            if kept:
                self.by_span[span] = kept
            else:
                del self.by_span[span]

    def all_options(self) -> Iterable[TranslationOption]:
        for options in self.by_span.values():
            yield from options

    def uncovered_positions(self) -> list[int]:
        """Source positions no option can translate (the search needs none of these)."""
        covered = np.zeros(self.num_words, dtype=bool)
        for start, end in self.by_span:
            covered[start:end] = True
        return [int(position) for position in np.flatnonzero(~covered)]


@dataclass(frozen=True, slots=True)
class OptionBuilder:
    """Makes TranslationOptions for one model and one weight vector."""

    phrase_table: PhraseTable
    language_model: LanguageModel
    source_vocabulary: Vocabulary
    target_vocabulary: Vocabulary
    weights: npt.NDArray[np.float64]

    def make(
        self, start: int, end: int, target_ids: Sequence[int], output_tokens: Sequence[str],
        static_features: npt.NDArray[np.float64], reordering: Sequence[float], alignment: Sequence[tuple[int, int]],
        kind: OptionKind, reordering_id: int, label: str = "",
    ) -> TranslationOption:
        static_score = float(self.weights @ static_features)
        lm_estimate = LN10 * self.language_model.estimate(target_ids) if target_ids else 0.0
        estimate = static_score + float(self.weights[FEATURE_INDEX["lm"]]) * lm_estimate
        return TranslationOption(start, end, tuple(int(token) for token in target_ids), tuple(output_tokens),
                                 static_features, tuple(float(value) for value in reordering),
                                 tuple((int(i), int(j)) for i, j in alignment), kind, reordering_id, static_score,
                                 estimate, label)

    def base_features(self, num_target_words: int) -> npt.NDArray[np.float64]:
        features = np.zeros(NUM_FEATURES)
        features[FEATURE_INDEX["phrase_count"]] = 1.0
        features[FEATURE_INDEX["word_count"]] = float(num_target_words)
        return features

    def identity_option(self, position: int, token: str, kind: OptionKind, label: str = "") -> TranslationOption:
        """The source token translated as itself (protected tokens; unknown words with ``unknown_word`` = 1)."""
        features = self.base_features(1)
        if kind is OptionKind.PASS_THROUGH:
            features[FEATURE_INDEX["unknown_word"]] = 1.0
        return self.make(position, position + 1, [self.target_vocabulary.id_of(token)], [token], features,
                         NEUTRAL_REORDERING, [(0, 0)], kind, -1 - position, label)

    def phrase_option(self, start: int, end: int, row: int) -> TranslationOption:
        table = self.phrase_table
        target_ids = table.target_phrase(row).tolist()  # plain ints: element access to a mapped array is slow
        features = self.base_features(len(target_ids))
        features[list(_SCORE_FEATURES)] = table.scores[row]
        return self.make(start, end, target_ids, self.target_vocabulary.decode(target_ids), features,
                         table.reordering[row].tolist(), table.alignment(row).tolist(), OptionKind.PHRASE, int(row))

    def collect(self, model_tokens: Sequence[str], max_options_per_span: int, max_phrase_length: int) -> OptionSet:
        """Options for every span of a segment (model tokens: lowercased, protected as class tokens)."""
        source_ids = self.source_vocabulary.encode(model_tokens)
        option_set = OptionSet(len(model_tokens))
        protected = [position for position, token in enumerate(model_tokens) if token in CLASS_TOKENS]
        table = self.phrase_table
        for start, end, rows in table.spans(source_ids, max_phrase_length):
            inside = [position for position in protected if start <= position < end]
            if inside and end - start == 1:
                continue  # a protected token gets exactly one option, itself (added below)
            candidates = sorted(rows, key=lambda row: -float(table.scores[row, 0] + table.scores[row, 2]))
            options = []
            for row in candidates:
                option = self.phrase_option(start, end, row)
                if inside and not _carries_class_tokens(model_tokens[start:end], option.output_tokens):
                    continue
                options.append(option)
            options.sort(key=lambda item: -item.estimate)
            if options:
                option_set.by_span[(start, end)] = options[:max_options_per_span]
        for position in protected:
            option_set.by_span[(position, position + 1)] = [
                self.identity_option(position, model_tokens[position], OptionKind.PROTECTED)]
        for position, token in enumerate(model_tokens):
            if (position, position + 1) not in option_set.by_span:
                option_set.by_span[(position, position + 1)] = [
                    self.identity_option(position, token, OptionKind.PASS_THROUGH)]
        return option_set


def _carries_class_tokens(source_tokens: Sequence[str], target_tokens: Sequence[str]) -> bool:
    """Whether the target has exactly the class tokens of the source (as a multiset)."""
    def class_tokens(tokens: Sequence[str]) -> list[str]:
        return sorted(token for token in tokens if token in CLASS_TOKENS)

    return class_tokens(source_tokens) == class_tokens(target_tokens)
