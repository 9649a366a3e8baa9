"""The decoder on the demo model: scores that add up, no search errors on short segments, forced decoding,
distortion limits, n-best lists, placeholders, long segments."""

from __future__ import annotations

import numpy as np
import pytest

from decoder.search.features import FEATURE_NAMES
from decoder.search.settings import SearchAlgorithm, SearchSettings, TranslationOptions
from tests.conftest import demo_segments

# An effectively unpruned search: no histogram limit that short segments can reach, no threshold.
EXHAUSTIVE = SearchSettings(algorithm=SearchAlgorithm.STACK, stack_size=10**9, beam_width=1e9)


def dot(weights, features):
    return float(np.dot(weights, [features[name] for name in FEATURE_NAMES]))


def short_segments(limit=25, max_words=7):
    return [segment for segment in demo_segments("test") if len(segment.split()) <= max_words][:limit]


def test_every_n_best_score_is_the_dot_product_of_its_features(demo_translator):
    # DESIGN.md invariant, checked on every entry of a corpus, both algorithms.
    weights = demo_translator.weights()
    for algorithm in SearchAlgorithm:
        options = TranslationOptions(n_best=20, search=SearchSettings(algorithm=algorithm))
        for result in demo_translator.translate(demo_segments("test", 30), options):
            assert len(result.n_best) >= 1
            for entry in result.n_best:
                assert entry.score == pytest.approx(dot(weights, entry.features), abs=1e-9)
            scores = [entry.score for entry in result.n_best]
            assert scores == sorted(scores, reverse=True)
            texts = [entry.text for entry in result.n_best]
            assert len(set(texts)) == len(texts)  # distinct target strings by default
            assert result.translation == result.n_best[0].text


@pytest.mark.parametrize("algorithm", list(SearchAlgorithm))
def test_default_pruning_finds_the_exhaustive_optimum(demo_translator, algorithm):
    # The search-error test: with the default limits the best score equals that of a search without pruning
    # (recombination is exact, so the unpruned search is optimal; Koehn, Och & Marcu 2003).
    segments = short_segments()
    defaults = demo_translator.translate(segments, TranslationOptions(search=SearchSettings(algorithm=algorithm)))
    exhaustive = demo_translator.translate(segments, TranslationOptions(search=EXHAUSTIVE))
    for fast, slow in zip(defaults, exhaustive):
        assert fast.n_best[0].score == pytest.approx(slow.n_best[0].score, abs=1e-9)


def test_forced_decoding_of_the_best_output_gives_its_score(demo_translator, demo_model):
    # The scores add up independently of the search: the best derivation of the decoder's own output, found by
    # forced decoding without pruning, has exactly the decoder's best score.
    weights = demo_translator.weights()
    builder = demo_translator.builder(weights)
    from decoder.text.pipeline import prepare_segment

    for segment in short_segments(12):
        best = demo_translator.translate([segment], TranslationOptions(search=EXHAUSTIVE))[0].n_best[0]
        prepared = prepare_segment(segment, "en")
        option_set = builder.collect(prepared.model_tokens, 20, 7)
        unconstrained = demo_translator.search_piece(option_set, TranslationOptions(search=EXHAUSTIVE), weights)
        derivation_targets = [option.target_ids for option in _best_options(unconstrained)]
        forced_ids = [token for ids in derivation_targets for token in ids]
        forced = demo_translator.search_piece(option_set, TranslationOptions(search=EXHAUSTIVE), weights,
                                              forced_target=forced_ids)
        assert max(h.score for h in forced.complete) == pytest.approx(best.score, abs=1e-9)


def _best_options(result):
    hypothesis = max(result.complete, key=lambda h: h.score)
    options = []
    while hypothesis.back is not None:
        options.append(hypothesis.option)
        hypothesis = hypothesis.back
    return list(reversed(options))


def test_distortion_limit_zero_is_monotone(demo_translator):
    options = TranslationOptions(search=SearchSettings(distortion_limit=0), include_segmentation=True)
    for result in demo_translator.translate(demo_segments("test", 40), options):
        spans = [phrase.source_tokens for phrase in result.n_best[0].segmentation]
        assert [start for start, _ in spans] == [0] + [end for _, end in spans[:-1]]


def test_segmentation_and_alignment_point_into_the_strings(demo_translator):
    options = TranslationOptions(include_segmentation=True, include_alignment=True)
    for result in demo_translator.translate(demo_segments("test", 20), options):
        entry = result.n_best[0]
        covered = sorted(position for phrase in entry.segmentation
                         for position in range(*phrase.source_tokens))
        assert covered == list(range(len(covered)))  # every source token exactly once
        for link in entry.alignment:
            source_text = result.source[slice(*link.source_characters)]
            target_text = entry.text[slice(*link.target_characters)]
            assert source_text.strip() == source_text and source_text
            assert target_text.strip() == target_text and target_text


def test_placeholders_survive_translation_verbatim(demo_translator):
    segments = ["Saved %d files to the %1$s folder.", "Click <b>Save</b> and open {name}.",
                "Write to help@example.com or see https://example.com/help/a?b=1."]
    for segment, result in zip(segments, demo_translator.translate(segments)):
        for placeholder in ("%d", "%1$s", "<b>", "</b>", "{name}", "help@example.com",
                            "https://example.com/help/a?b=1"):
            assert segment.count(placeholder) == result.translation.count(placeholder)


def test_one_result_per_segment_including_empty_and_long_ones(demo_translator):
    long_segment = " ".join(["Open the report, then click Save."] * 40)  # 280 tokens
    segments = ["", "Open the report.", "   ", long_segment]
    results = demo_translator.translate(segments, TranslationOptions(max_segment_tokens=50))
    assert len(results) == len(segments)
    assert results[0].translation == "" and results[2].translation == ""
    assert results[3].num_pieces >= 6
    assert results[3].translation.count("informe") == 40
