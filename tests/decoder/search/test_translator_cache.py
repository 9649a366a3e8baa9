"""The LM-extension cache that a Translator shares across segments and requests changes no result."""

from __future__ import annotations

from decoder.search.settings import TranslationOptions
from tests.conftest import demo_segments


def entries(result):
    return [(entry.text, entry.score, entry.features) for entry in result.n_best]


def test_cache_warmed_by_other_requests_and_weights_gives_cold_start_results(demo_translator):
    # the cache holds weight-independent LM values only: a cache filled by requests with other weights must give
    # exactly the outputs, scores and features of an empty one
    segments = demo_segments("test", 12)
    options = TranslationOptions(n_best=5)
    demo_translator.clear_caches()
    cold = [entries(demo_translator.translate([segment], options)[0]) for segment in segments]
    other_weights = TranslationOptions(n_best=5, weights={"lm": 1.5, "distortion": 0.1})
    for segment in reversed(segments):
        demo_translator.translate([segment], other_weights)
    warm = [entries(demo_translator.translate([segment], options)[0]) for segment in segments]
    assert warm == cold
