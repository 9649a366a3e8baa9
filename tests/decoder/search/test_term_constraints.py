"""Terminology constraints in decoding, on the demo model and the demo glossary (an invented scenario)."""

from __future__ import annotations

import pytest

from decoder.search.settings import TranslationOptions
from decoder.terminology import glossary_from_rows, load_glossary, term_accuracy
from decoder.terminology.report import find_in_output
from tests.conftest import REPO, demo_segments


@pytest.fixture(scope="module")
def demo_glossary():
    return load_glossary("demo", "en", "es", search_dirs=(REPO / "glossaries",))


def test_enforce_reaches_full_term_accuracy_on_the_demo_test_set(demo_translator, demo_glossary):
    # Term accuracy as in the terminology literature: share of source term occurrences whose target term is in
    # the output, exact match (Dinu et al. 2019, ACL). Segments of the test set that contain a glossary term.
    sources = [segment for segment in demo_segments("test")
               if term_accuracy([segment], [""], [demo_glossary], "en", "es").num_terms][:40]
    options = TranslationOptions(glossaries=(demo_glossary,), term_mode="enforce")
    outputs = [result.translation for result in demo_translator.translate(sources, options)]
    accuracy = term_accuracy(sources, outputs, [demo_glossary], "en", "es")
    assert accuracy.num_terms >= 30
    assert accuracy.rate == 1.0


def test_every_n_best_entry_satisfies_enforced_terms_and_never_shows_forbidden_ones(demo_translator, demo_glossary):
    segments = ["Open the sync hub and click Save.", "Brelqua stores the backup in your workspace.",
                "Share link copied.", "Open the dashboard, then the settings."]
    options = TranslationOptions(n_best=10, glossaries=(demo_glossary,), term_mode="enforce")
    forbidden = demo_glossary.forbidden_targets
    for result in demo_translator.translate(segments, options):
        assert result.terms and all(item.reason is None for item in result.terms)
        for entry in result.n_best:
            for item in result.terms:
                assert find_in_output(entry.text, item.target, False), (entry.text, item.target)
            for text in forbidden:
                if text.lower() != "backup":  # "backup" is also the untranslated source word itself
                    assert not find_in_output(entry.text, text, False), (entry.text, text)


def test_glossary_feature_counts_terms_however_they_are_translated(demo_translator, demo_glossary):
    # The glossary feature counts translated terms, not glossary options: a phrase option that already carries
    # the target earns it too. So under enforce every n-best entry, however it segments the source, has one count
    # per applied term, and the weight cannot favour splitting a phrase into word-by-word glossary options.
    segments = ["Open the sync hub and click Save.", "Open the dashboard, then the settings.",
                "Brelqua stores the backup in your workspace."]
    options = TranslationOptions(n_best=10, glossaries=(demo_glossary,), term_mode="enforce", distinct_n_best=False)
    for result in demo_translator.translate(segments, options):
        applied = sum(item.reason is None for item in result.terms)
        assert applied >= 1 and len(result.n_best) > 1
        assert {entry.features["glossary"] for entry in result.n_best} == {float(applied)}
    def translations(weight):
        weighted = TranslationOptions(glossaries=(demo_glossary,), term_mode="enforce", weights={"glossary": weight})
        return [result.translation for result in demo_translator.translate(segments, weighted)]
    for weight in (-5.0, 50.0):
        assert translations(weight) == translations(1.0)  # a constant count: the weight cannot change the choice


def test_prefer_adds_options_that_the_glossary_weight_can_choose(demo_translator):
    # An inline term the model has never seen: under prefer, a large glossary weight makes the model use it,
    # a large negative one makes it avoid it; under enforce it is used whatever the weight.
    glossary = glossary_from_rows("inline", [{"source": "report", "target": "parte"}], "en", "es")
    def translate(mode, weight):
        options = TranslationOptions(glossaries=(glossary,), term_mode=mode, weights={"glossary": weight})
        return demo_translator.translate(["Open the report."], options)[0].translation
    assert "parte" in translate("prefer", 20.0)
    assert "parte" not in translate("prefer", -20.0)
    assert "parte" in translate("enforce", -20.0)
    assert "parte" not in translate("off", 20.0)


def test_term_casing_sentence_start_and_placeholders(demo_translator, demo_glossary):
    options = TranslationOptions(glossaries=(demo_glossary,), term_mode="enforce")
    first, second = demo_translator.translate(["Sync hub settings saved %d files.", "brelqua opened {name}."],
                                              options)
    assert first.translation.startswith("Centro de sincronización")  # a lowercase term starting the sentence
    assert "%d" in first.translation
    # Brelqua is case-sensitive in the glossary: "brelqua" does not match, and the report says nothing of it
    assert not any(item.entry_source == "Brelqua" for item in second.terms)
    assert "{name}" in second.translation


def test_overlapping_terms_keep_the_longest_and_report_the_other(demo_translator):
    rows = [{"source": "sync hub", "target": "centro de sincronización"},
            {"source": "hub settings", "target": "ajustes del centro"}]
    glossary = glossary_from_rows("overlap", rows, "en", "es")
    result = demo_translator.translate(["Open the sync hub settings."],
                                       TranslationOptions(glossaries=(glossary,)))[0]
    applied = [item for item in result.terms if item.reason is None]
    rejected = [item for item in result.terms if item.reason is not None]
    assert [item.entry_source for item in applied] == ["sync hub"]  # equal length: the leftmost wins
    assert [item.entry_source for item in rejected] == ["hub settings"]
    assert "centro de sincronización" in result.translation
