"""Term matching: longest-leftmost choice, conflicts, case, protected tokens, hyphens, plural tolerance.

Expected spans are counted by hand on the sentences shown. Every test runs twice, once per matching kernel
(the plain one and the numpy one); test_matching_reference.py compares both with a brute-force matcher.
"""

import pytest

from decoder.errors import ConfigurationError
from decoder.terminology import matching
from decoder.terminology.matching import ConflictReason, Span, find_terms, match_terms, match_terms_batch
from decoder.terminology.store import glossary_from_rows, load_glossary
from decoder.text.pipeline import prepare_segment


def glossary(*sources, name="g", language="en", case_sensitive=()):
    rows = [
        {"source": source, "target": f"<{source}>", "case_sensitive": source in case_sensitive} for source in sources
    ]
    return glossary_from_rows(name, rows, language, "es")


def found(text, glossaries, language="en", **options):
    return [m.source_text for m in find_terms(prepare_segment(text, language), glossaries, **options)]


@pytest.fixture(autouse=True, params=["plain", "numpy"])
def kernel(request, monkeypatch):
    # The kernel is chosen by batch size; a threshold of 0 units always takes numpy, a huge one never does.
    monkeypatch.setattr(matching, "VECTORISE_MIN_UNITS", 0 if request.param == "numpy" else 10**9)
    return request.param


@pytest.fixture(scope="module")
def demo():
    return load_glossary("demo", "en", "es")


def test_nested_terms_longest_wins_and_the_losers_are_reported():
    terms = glossary("timeline", "timeline view", "view")
    result = match_terms(prepare_segment("Open the timeline view now.", "en"), [terms])
    # Tokens: Open(0) the(1) timeline(2) view(3) now(4) .(5); "timeline view" covers tokens 2-3.
    assert [(m.source_text, m.token_span) for m in result.matches] == [("timeline view", Span(2, 4))]
    assert [(c.match.source_text, c.reason) for c in result.conflicts] == [
        ("timeline", ConflictReason.LONGER_MATCH),
        ("view", ConflictReason.LONGER_MATCH),
    ]
    assert {c.winner.source_text for c in result.conflicts} == {"timeline view"}


def test_overlapping_terms_of_equal_length_leftmost_wins():
    terms = glossary("capture mode", "quick capture")  # file order must not matter
    result = match_terms(prepare_segment("Turn on quick capture mode.", "en"), [terms])
    assert [m.source_text for m in result.matches] == ["quick capture"]
    assert [(c.match.source_text, c.reason) for c in result.conflicts] == [
        ("capture mode", ConflictReason.LEFTMOST_MATCH)
    ]


def test_non_overlapping_terms_all_match_in_source_order(demo):
    assert found("Open the sync hub, then the dashboard of your workspace.", [demo]) == [
        "sync hub",
        "dashboard",
        "workspace",
    ]


def test_case_is_ignored_by_default_also_at_sentence_start(demo):
    # demo.tsv: "dashboard" and "Settings" are case_sensitive=no.
    assert found("Dashboard widgets live in SETTINGS.", [demo]) == ["Dashboard", "SETTINGS"]


def test_case_sensitive_product_names_need_their_exact_casing(demo):
    # demo.tsv: Brelqua is case_sensitive=yes.
    assert found("Brelqua syncs with Zintaroo.", [demo]) == ["Brelqua", "Zintaroo"]
    assert found("brelqua and BRELQUA are typos.", [demo]) == []


def test_character_spans_index_the_normalised_text():
    terms = glossary("dashboard")
    prepared = prepare_segment("Open  the\u00a0dashboard", "en")
    (match,) = find_terms(prepared, [terms])
    # Normalised text "Open the dashboard": "dashboard" starts at 9 (4 + 1 + 3 + 1) and ends at 18.
    assert prepared.text == "Open the dashboard"
    assert (match.source_span, match.token_span) == (Span(9, 18), Span(2, 3))


def test_never_inside_urls_placeholders_or_tags(demo):
    text = "See https://brelqua.example/dashboard, {dashboard} and <dashboard/> before the dashboard."
    (match,) = find_terms(prepare_segment(text, "en"), [demo])
    # Only the last, plain "dashboard" is a word token; it ends just before the final period.
    assert match.source_span == Span(len(text) - len("dashboard."), len(text) - 1)


def test_terms_with_a_protected_token_never_match():
    terms = glossary("Zintaroo 2", "share link")
    # "2" is a number token, protected in segments: the term could only match across it.
    assert found("Install Zintaroo 2 today.", [terms]) == []
    # A placeholder between the words splits the term.
    assert found("Open the share %s link.", [terms]) == []


def test_hyphenated_terms_match_with_or_without_spaces_around_the_hyphen():
    terms = glossary("sign-in page", "two - step verification")
    assert found("Open the sign-in page.", [terms]) == ["sign-in page"]
    assert found("Open the sign - in page.", [terms]) == ["sign - in page"]
    assert found("Turn on two-step verification.", [terms]) == ["two-step verification"]
    # U+2011 non-breaking hyphen reads as "-".
    assert found("Open the sign\u2011in page.", [terms]) == ["sign\u2011in page"]
    # No hyphen at all is a different term.
    assert found("Open the sign in page.", [terms]) == []


def test_punctuation_inside_a_term_is_compared_token_by_token():
    terms = glossary("Settings > Focus mode")
    # Both spellings tokenize to Settings, >, Focus, mode (decoder.text.tokenizer splits ">" off).
    assert found("Open Settings>Focus mode now.", [terms]) == ["Settings>Focus mode"]
    assert found("Open Settings > Focus mode now.", [terms]) == ["Settings > Focus mode"]
    assert found("Open Settings Focus mode now.", [terms]) == []


def test_a_term_never_matches_part_of_a_hyphenated_word():
    terms = glossary("sign", "in")
    assert found("Use sign-in today.", [terms]) == []


def test_plural_tolerance_is_off_by_default_and_adds_s_and_es_when_on():
    terms = glossary("workspace", "share link", "inbox", "tag", "Brelqua", case_sensitive=("Brelqua",))
    text = "Shared workspaces, share links, two inboxes, tags and Brelquas."
    assert found(text, [terms]) == []
    assert found(text, [terms], inflection_tolerance=True) == ["workspaces", "share links", "inboxes", "tags"]
    matches = find_terms(prepare_segment("One workspace, many workspaces.", "en"), [terms], inflection_tolerance=True)
    assert [m.is_inflected for m in matches] == [False, True]


def test_plural_tolerance_for_spanish_and_not_for_german():
    spanish = glossary("carpeta inteligente", "papel", language="es")
    # Spanish plurals: both words take -s; "papeles" is "papel" + "es".
    assert found("Dos carpetas inteligentes y papeles.", [spanish], language="es", inflection_tolerance=True) == [
        "carpetas inteligentes",
        "papeles",
    ]
    german = glossary("Arbeitsbereich", language="de")
    assert found("Zwei Arbeitsbereiches.", [german], language="de", inflection_tolerance=True) == []


def test_plural_tolerance_keeps_short_words_exact():
    # MIN_STEM_CHARACTERS = 3: "us" must not read as a plural of "u".
    assert found("Tell us.", [glossary("u")], inflection_tolerance=True) == []


def test_same_span_in_two_glossaries_the_earlier_glossary_wins():
    product, general = glossary("dashboard", name="product"), glossary("dashboard", name="general")
    result = match_terms(prepare_segment("Open the dashboard.", "en"), [general, product])
    assert [m.glossary_name for m in result.matches] == ["general"]
    assert [(c.match.glossary_name, c.reason) for c in result.conflicts] == [
        ("product", ConflictReason.EARLIER_GLOSSARY)
    ]


def test_a_longer_term_of_a_later_glossary_beats_a_shorter_earlier_one():
    first, second = glossary("sync", name="first"), glossary("sync hub", name="second")
    result = match_terms(prepare_segment("Open the sync hub.", "en"), [first, second])
    assert [(m.glossary_name, m.source_text) for m in result.matches] == [("second", "sync hub")]
    assert result.conflicts[0].reason is ConflictReason.LONGER_MATCH


def test_case_sensitive_entry_beats_case_insensitive_one_on_the_same_span():
    terms = glossary_from_rows(
        "g",
        [
            {"source": "settings", "target": "ajustes"},
            {"source": "Settings", "target": "Configuración", "case_sensitive": True},
        ],
        "en",
        "es",
    )
    result = match_terms(prepare_segment("Open Settings.", "en"), [terms])
    assert [m.allowed_targets for m in result.matches] == [("Configuración",)]
    assert [c.reason for c in result.conflicts] == [ConflictReason.CASE_SENSITIVE_ENTRY]
    assert [m.allowed_targets for m in find_terms(prepare_segment("Open settings.", "en"), [terms])] == [("ajustes",)]


def test_matches_carry_allowed_and_forbidden_targets(demo):
    (match,) = find_terms(prepare_segment("Empty the trash.", "en"), [demo])
    # demo.tsv: trash -> papelera (preferred), basura (deprecated).
    assert (match.allowed_targets, match.forbidden_targets) == (("papelera",), ("basura",))
    assert (match.glossary_name, match.entry.origin) == ("demo", "demo.tsv:20")


def test_a_glossary_of_another_source_language_is_refused(demo):
    with pytest.raises(ConfigurationError, match="source language 'en'"):
        find_terms(prepare_segment("Abra el panel.", "es"), [demo])


def test_no_glossaries_or_no_tokens_give_no_matches(demo):
    assert find_terms(prepare_segment("Open the dashboard.", "en"), []) == []
    assert find_terms(prepare_segment("", "en"), [demo]) == []


def test_batch_matching_equals_one_segment_at_a_time(demo, kernel):
    texts = ["Open the dashboard.", "", "Brelqua backups", "Share links in the sync hub.", "{0} trash"]
    prepared = [prepare_segment(text, "en") for text in texts]
    # The batch takes the other kernel than the single-segment calls, so the two are compared directly.
    batch = match_terms_batch(prepared, [demo], inflection_tolerance=True, vectorised=kernel == "plain")
    assert batch == [match_terms(p, [demo], inflection_tolerance=True) for p in prepared]
    assert [len(result.matches) for result in batch] == [1, 0, 2, 2, 1]  # counted by hand
