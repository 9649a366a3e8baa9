"""``check_glossary`` statistics on the demo glossary and on a file with unmatchable entries."""

from pathlib import Path

from decoder.terminology.check import check_glossary
from decoder.terminology.glossary import WarningKind

DEMO = Path(__file__).parents[3] / "glossaries" / "demo.tsv"


def test_demo_statistics_counted_by_hand():
    check = check_glossary(DEMO, "en", "es")
    # Counted in glossaries/demo.tsv: 21 sources, 32 target rows, 8 deprecated targets, 3 case-sensitive
    # names, and 12 sources of two or more words (Vellorind Systems, sync hub, timeline view, quick capture,
    # focus mode, activity log, smart folder, share link, guest access, admin console, storage quota,
    # two-step verification).
    assert (
        check.num_entries,
        check.num_target_alternatives,
        check.num_forbidden_terms,
        check.num_case_sensitive_entries,
        check.num_multi_word_entries,
        check.num_unmatchable_entries,
    ) == (21, 32, 8, 3, 12, 0)
    assert check.is_clean


def test_terms_with_numbers_or_placeholders_are_reported_as_unmatchable(tmp_path):
    path = tmp_path / "release.tsv"
    path.write_text(
        "source\ttarget\nZintaroo 2.0\tZintaroo 2.0\n{product} backup\tcopia de {product}\ntag\tetiqueta\n",
        encoding="utf-8",
    )
    check = check_glossary(path, "en", "es")
    assert check.num_unmatchable_entries == 2
    assert [(w.kind, w.origin) for w in check.warnings] == [
        (WarningKind.UNMATCHABLE, "release.tsv:2"),
        (WarningKind.UNMATCHABLE, "release.tsv:3"),
    ]
