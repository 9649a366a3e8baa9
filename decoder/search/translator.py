"""The library's one entry point for translation: ``Translator(model).translate(segments, options)``.

Per segment: prepare the text (normalise, tokenize, protect, lowercase), collect translation options, search,
extract the n-best derivations, recompute each one's feature vector from scratch, and finish the output
(casing, placeholders put back verbatim, detokenization) with optional phrase segmentation and word alignment
as token and character spans. One result per input segment, always; an empty segment gives an empty
translation. A segment longer than ``max_segment_tokens`` is cut at sentence or clause punctuation (or, failing
that, hard) and translated piece by piece; its n-best list then holds the single combined best.

The model is read-only, so one Translator may serve many threads; each call keeps its state on the stack.
"""

from __future__ import annotations

from collections.abc import Mapping, Sequence
from dataclasses import dataclass, replace

import numpy as np

from decoder.search.constraints import ConstraintApplier, glossary_positions
from decoder.search.features import FEATURE_NAMES, feature_dict, weight_vector
from decoder.search.hypothesis import ExpansionScorer, derivation_features
from decoder.search.n_best import Derivation, best_derivation, n_best_derivations
from decoder.search.options import OptionBuilder, OptionKind, OptionSet, TranslationOption
from decoder.search.settings import NBestEntry, PhraseSpan, SegmentTranslation, TranslationOptions, WordLink
from decoder.search.stack_search import SearchResult, StackSearch
from decoder.terminology.glossary import Glossary, TermMode
from decoder.terminology.matching import match_terms
from decoder.terminology.report import build_term_report
from decoder.text.casing import copy_source_capitals, restore_casing
from decoder.text.detokenizer import detokenize
from decoder.text.pipeline import PreparedSegment, prepare_segment
from decoder.text.protection import restore
from decoder.translation_model import TranslationModel

LM_CACHE_ENTRIES = 200_000  # about 40 MB per process at most
SPLIT_TOKENS = frozenset({".", "!", "?", ";", ":", ","})  # sentence first, then clause punctuation


@dataclass(frozen=True, slots=True)
class _PieceResult:
    derivations: list[Derivation]
    num_words: int
    offset: int


def split_points(tokens: Sequence[str], max_tokens: int) -> list[tuple[int, int]]:
    """Token ranges of at most ``max_tokens``, cut after the last punctuation token that fits (else hard)."""
    pieces, start = [], 0
    while len(tokens) - start > max_tokens:
        window = range(start + max_tokens - 1, start, -1)
        cut = next((position + 1 for position in window if tokens[position] in SPLIT_TOKENS), start + max_tokens)
        pieces.append((start, cut))
        start = cut
    pieces.append((start, len(tokens)))
    return pieces


class Translator:
    """Translates with one loaded model; see the module docstring."""

    def __init__(self, model: TranslationModel) -> None:
        self.model = model
        # LM extensions (state, target phrase) -> (log10 sum, state), shared by all segments; emptied when full.
        # A race between threads only recomputes an entry: every value for a key is the same.
        self._lm_cache: dict[tuple[int, tuple[int, ...]], tuple[float, int]] = {}

    def clear_caches(self) -> None:
        """Forget cached LM extensions (e.g. to time settings from the same cold start)."""
        self._lm_cache = {}

    def builder(self, weights: np.ndarray) -> OptionBuilder:
        model = self.model
        return OptionBuilder(model.phrase_table, model.language_model, model.source_vocabulary,
                             model.target_vocabulary, weights)

    def weights(self, overrides: Mapping[str, float] | None = None) -> np.ndarray:
        return weight_vector(self.model.weights, overrides)

    def translate(self, segments: Sequence[str], options: TranslationOptions = TranslationOptions(),
                  glossaries: Sequence[Glossary] | None = None, term_mode: TermMode | str | None = None
                  ) -> list[SegmentTranslation]:
        """One result per segment, in order. ``glossaries`` and ``term_mode`` override those of ``options``."""
        if glossaries is not None or term_mode is not None:
            options = replace(options, glossaries=tuple(glossaries if glossaries is not None else options.glossaries),
                              term_mode=TermMode(term_mode) if term_mode is not None else options.term_mode)
        weights = self.weights(options.weights)
        builder = self.builder(weights)
        return [self.translate_segment(segment, options, weights, builder) for segment in segments]

    # -- one segment ---------------------------------------------------------------------------------

    def search_piece(self, option_set: OptionSet, options: TranslationOptions, weights: np.ndarray,
                     forced_target: Sequence[int] | None = None) -> SearchResult:
        if len(self._lm_cache) > LM_CACHE_ENTRIES:
            self._lm_cache = {}
        scorer = ExpansionScorer(self.model.language_model, weights, option_set.num_words, self._lm_cache)
        search = StackSearch(option_set, scorer, options.search, keep_arcs=options.n_best > 1,
                             forced_target=forced_target)
        return search.run()

    def translate_segment(self, text: str, options: TranslationOptions, weights: np.ndarray,
                          builder: OptionBuilder) -> SegmentTranslation:
        prepared = prepare_segment(text, self.model.source_language)
        tokens = prepared.model_tokens
        if not tokens:
            empty = NBestEntry("", 0.0, dict.fromkeys(FEATURE_NAMES, 0.0))
            return SegmentTranslation(prepared.text, "", (empty,))
        search_settings = options.search
        pieces = split_points(tokens, options.max_segment_tokens)
        terms = match_terms(prepared, options.glossaries, options.inflection_tolerance) if options.glossaries else None
        applier = ConstraintApplier(builder, self.model.target_language)
        forbidden = sorted({text for glossary in options.glossaries for text in glossary.forbidden_targets})
        results = []
        for start, end in pieces:
            option_set = builder.collect(tokens[start:end], search_settings.max_options_per_span,
                                         search_settings.max_phrase_length)
            if terms is not None:
                applier.apply(option_set, tokens[start:end], terms.matches, options.term_mode, start,
                              forbidden if options.term_mode is not TermMode.OFF else ())
            found = self.search_piece(option_set, options, weights)
            size = options.n_best if len(pieces) == 1 else 1
            if size == 1:
                best = best_derivation(found.complete)
                derivations = [best] if best is not None else []
            else:
                derivations = n_best_derivations(
                    found.complete, size,
                    (lambda derivation: _output_key(derivation)) if options.distinct_n_best else None)
            if not derivations:  # every hypothesis pruned away: cannot happen with pass-through options
                raise RuntimeError("the search found no complete translation")
            results.append(_PieceResult(derivations, end - start, start))
        entries = self._entries(prepared, results, options)
        report = build_term_report(terms, entries[0].text, options.term_mode).items if terms is not None else ()
        return SegmentTranslation(prepared.text, entries[0].text, tuple(entries), num_pieces=len(pieces),
                                  terms=report)

    def _entries(self, prepared: PreparedSegment, pieces: list[_PieceResult], options: TranslationOptions
                 ) -> list[NBestEntry]:
        language_model = self.model.language_model
        if len(pieces) == 1:
            combinations = [[(pieces[0], derivation)] for derivation in pieces[0].derivations]
        else:  # a split segment: the pieces' best derivations, joined
            combinations = [[(piece, piece.derivations[0]) for piece in pieces]]
        entries = []
        for combination in combinations:
            features = np.zeros(len(FEATURE_NAMES))
            score = 0.0
            placed: list[tuple[TranslationOption, int]] = []
            for piece, derivation in combination:
                features += derivation_features(list(derivation.options), language_model, piece.num_words)
                score += derivation.score
                placed.extend((option, piece.offset) for option in derivation.options)
            entries.append(self._finish(prepared, placed, score, features, options))
        return entries

    def _finish(self, prepared: PreparedSegment, placed: list[tuple[TranslationOption, int]], score: float,
                features: np.ndarray, options: TranslationOptions) -> NBestEntry:
        output: list[str] = []
        positions: list[int | None] = []
        phrase_bounds: list[tuple[int, int, int, int]] = []  # source start/end, target start/end (tokens)
        links: list[tuple[int, int]] = []
        for option, offset in placed:
            first_target = len(output)
            start = option.start + offset
            if option.kind is OptionKind.PASS_THROUGH:
                output.append(prepared.tokens[start].text)  # the source word as written, casing included
            else:
                output.extend(option.output_tokens)
            aligned: dict[int, int] = {}
            for source_offset, target_offset in option.alignment:
                aligned.setdefault(target_offset, start + source_offset)
                links.append((start + source_offset, first_target + target_offset))
            positions.extend(aligned.get(index) for index in range(len(output) - first_target))
            phrase_bounds.append((start, option.end + offset, first_target, len(output)))
        cased = copy_source_capitals(restore_casing(output, prepared.cased_tokens, self.model.truecaser), positions,
                                     prepared.cased_tokens)
        first_word = next((index for index, token in enumerate(output) if any(c.isalnum() for c in token)), None)
        for index in glossary_positions(placed):  # glossary terms keep the glossary's casing ...
            capitalised = cased[index][:1].isupper() and not output[index][:1].isupper()
            cased[index] = output[index]
            if capitalised and index == first_word:  # ... except a capital at the start of the output
                cased[index] = output[index][:1].upper() + output[index][1:]
        restored = restore(cased, prepared.protected, positions)
        final_tokens = list(restored) + [original.text for original in restored.missing]
        text = detokenize(final_tokens, self.model.target_language)
        segmentation = alignment = None
        if options.include_segmentation or options.include_alignment:
            target_spans = _character_spans(text, final_tokens)
            source_spans = [(token.start, token.end) for token in prepared.tokens]
            if options.include_segmentation:
                segmentation = tuple(
                    PhraseSpan((s0, s1), (t0, t1), (source_spans[s0][0], source_spans[s1 - 1][1]),
                               _join_spans(target_spans[t0:t1]))
                    for s0, s1, t0, t1 in phrase_bounds)
            if options.include_alignment:
                alignment = tuple(WordLink(s, t, source_spans[s], target_spans[t]) for s, t in sorted(set(links)))
        return NBestEntry(text, float(score), feature_dict(features), segmentation, alignment)


def _output_key(derivation: Derivation) -> tuple[str, ...]:
    return tuple(token for option in derivation.options for token in option.output_tokens)


def _character_spans(text: str, tokens: Sequence[str]) -> list[tuple[int, int]]:
    """Where each token stands in the detokenized text (tokens appear in order; spacing is all that changes)."""
    spans, cursor = [], 0
    for token in tokens:
        found = text.find(token, cursor)
        if found < 0:  # a token the detokenizer rewrote: point at the cursor, zero width
            spans.append((cursor, cursor))
            continue
        spans.append((found, found + len(token)))
        cursor = found + len(token)
    return spans


def _join_spans(spans: Sequence[tuple[int, int]]) -> tuple[int, int]:
    if not spans:
        return (0, 0)
    return (spans[0][0], spans[-1][1])
