"""Term reports: finding targets in the output on token boundaries, one-to-one assignment, report items.

Character spans are counted by hand on the strings shown.
"""

import pytest

from decoder.terminology.glossary import TermMode
from decoder.terminology.matching import ConflictReason, Span, match_terms
from decoder.terminology.report import (
    TermReason,
    assign_occurrences,
    build_term_report,
    find_in_output,
    locate_in_output,
)
from decoder.terminology.store import glossary_from_rows, load_glossary
from decoder.text.pipeline import prepare_segment


@pytest.fixture(scope="module")
def demo():
    return load_glossary("demo", "en", "es")


@pytest.mark.parametrize(
    ("output", "term", "case_sensitive", "expected"),
    [
        ("Abra el panel de control.", "panel de control", False, Span(8, 24)),
        ("Panel de control: abra la vista.", "panel de control", False, Span(0, 16)),  # sentence start
        ("Abra el panel  de\u00a0control.", "panel de control", False, Span(8, 25)),  # any whitespace inside
        ("Copie los enlaces.", "enlace", False, None),  # not inside a longer word
        ("Use el enlace-compartido.", "enlace", False, None),  # not part of a hyphenated word
        ("Use el pre-enlace.", "enlace", False, None),
        ("Ouvrez l'espace de travail.", "espace de travail", False, Span(9, 26)),  # after a French elision
        ("Abra brelqua y Brelqua.", "Brelqua", True, Span(15, 22)),  # case-sensitive skips "brelqua"
        ("Abra brelqua.", "Brelqua", False, Span(5, 12)),
        ("Pulse (Configuración).", "Configuración", False, Span(7, 20)),  # punctuation is a boundary
        ("Abra el panel.", "", False, None),
    ],
)
def test_locate_in_output_on_token_boundaries(output, term, case_sensitive, expected):
    assert locate_in_output(output, term, case_sensitive) == expected


def test_find_in_output_lists_every_occurrence_left_to_right():
    output = "La etiqueta y la etiqueta verde."
    assert find_in_output(output, "etiqueta", False) == [Span(3, 11), Span(17, 25)]


def test_two_source_occurrences_need_two_target_occurrences():
    output = "Cada copia de seguridad reemplaza la anterior."
    given = assign_occurrences([("copia de seguridad",), ("copia de seguridad",)], [False, False], output)
    assert given == [("copia de seguridad", Span(5, 23)), None]


def test_assignment_is_a_maximum_matching_not_greedy():
    # Occurrence 0 accepts "espacio de trabajo" or "área de trabajo"; occurrence 1 only the first. Greedy
    # in order would give occurrence 0 the first target and leave occurrence 1 without; the maximum matching
    # (hand-derived: 0 -> área, 1 -> espacio) satisfies both.
    output = "Abra el espacio de trabajo y el área de trabajo."
    given = assign_occurrences(
        [("espacio de trabajo", "área de trabajo"), ("espacio de trabajo",)], [False, False], output
    )
    assert given == [("área de trabajo", Span(32, 47)), ("espacio de trabajo", Span(8, 26))]


def test_a_target_nested_in_a_longer_found_target_does_not_count_again():
    output = "Restaure la copia de seguridad."
    given = assign_occurrences([("copia de seguridad",), ("copia",)], [False, False], output)
    assert given == [("copia de seguridad", Span(12, 30)), None]


def test_report_of_an_applied_term_and_a_missed_one_with_a_forbidden_target(demo):
    result = match_terms(prepare_segment("Open the dashboard and the trash.", "en"), [demo])
    output = "Abra el panel de control y la basura."
    report = build_term_report(result, output, TermMode.ENFORCE)
    dashboard, trash = report.items
    assert (dashboard.source_span, dashboard.target, dashboard.in_output, dashboard.output_span) == (
        Span(9, 18),
        "panel de control",
        True,
        Span(8, 24),
    )
    assert (dashboard.reason, dashboard.origin, dashboard.glossary_name) == (
        None,
        "demo.tsv:8",
        "demo",
    )  # demo.tsv line 8
    # "papelera" is missing; the deprecated "basura" sits at 30-36.
    assert (trash.target, trash.in_output, trash.reason) == (None, False, TermReason.NOT_IN_OUTPUT)
    assert trash.forbidden_in_output == (("basura", Span(30, 36)),)
    assert report.num_applied == 1


def test_mode_off_and_entry_modes(demo):
    terms = glossary_from_rows(
        "g",
        [
            {"source": "dashboard", "target": "panel de control", "mode": "off"},
            {"source": "trash", "target": "papelera"},
        ],
        "en",
        "es",
    )
    result = match_terms(prepare_segment("Open the dashboard and the trash.", "en"), [terms])
    report = build_term_report(result, "Abra el panel de control y la papelera.", TermMode.PREFER)
    assert [(item.mode, item.reason, item.target) for item in report.items] == [
        # the entry's own mode wins over the request's; under off the term is not applied, but the report
        # still says where the model produced it on its own
        (TermMode.OFF, TermReason.MODE_OFF, "panel de control"),
        (TermMode.PREFER, None, "papelera"),
    ]
    assert [(item.in_output, item.output_span) for item in report.items] == [(True, Span(8, 24)), (True, Span(30, 38))]
    missing = build_term_report(result, "Abra el tablero y la papelera.", TermMode.PREFER).items[0]
    assert (missing.reason, missing.target, missing.in_output, missing.output_span) == (
        TermReason.MODE_OFF, None, False, None)


def test_conflicts_appear_in_source_order_with_their_reason():
    terms = glossary_from_rows(
        "g",
        [{"source": "timeline view", "target": "vista de cronograma"}, {"source": "view", "target": "vista"}],
        "en",
        "es",
    )
    result = match_terms(prepare_segment("Open the timeline view.", "en"), [terms])
    report = build_term_report(result, "Abra la vista de cronograma.", TermMode.ENFORCE)
    assert [(item.source_text, item.reason) for item in report.items] == [
        ("timeline view", None),
        ("view", ConflictReason.LONGER_MATCH),
    ]


def test_targets_used_restricts_the_search(demo):
    result = match_terms(prepare_segment("Open the workspace.", "en"), [demo])
    output = "Abra el área de trabajo."
    # The decoder says it used the preferred target, which is not in the output; the admitted one is.
    (item,) = build_term_report(result, output, TermMode.ENFORCE, targets_used=["espacio de trabajo"]).items
    assert (item.target, item.in_output, item.reason) == ("espacio de trabajo", False, TermReason.NOT_IN_OUTPUT)
    (item,) = build_term_report(result, output, TermMode.ENFORCE).items
    assert (item.target, item.output_span) == ("área de trabajo", Span(8, 23))
    with pytest.raises(ValueError, match="one per match"):
        build_term_report(result, output, TermMode.ENFORCE, targets_used=[])
