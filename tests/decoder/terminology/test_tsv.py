"""TSV/CSV glossaries: the demo glossary, delimiters and quoting, every error path with file:line, warnings."""

from pathlib import Path

import pytest

from decoder.errors import InputFileError
from decoder.terminology.glossary import MAX_TERM_CHARACTERS, TermMode, TermStatus, WarningKind
from decoder.terminology.tsv import read_delimited_glossary

DEMO = Path(__file__).parents[3] / "glossaries" / "demo.tsv"


def write(tmp_path: Path, name: str, text: str) -> Path:
    path = tmp_path / name
    path.write_text(text, encoding="utf-8", newline="")
    return path


def test_demo_glossary_loads_with_the_counts_read_off_the_file():
    glossary = read_delimited_glossary(DEMO, "en", "es-ES")
    # Counted by hand in glossaries/demo.tsv: 32 data rows, 21 distinct source terms, three case-sensitive
    # names, eight deprecated targets, no conflicts or duplicates.
    assert glossary.name == "demo"
    assert len(glossary.entries) == 21
    assert sum(len(entry.targets) for entry in glossary.entries) == 32
    assert [entry.source for entry in glossary.entries if entry.case_sensitive] == [
        "Brelqua",
        "Zintaroo",
        "Vellorind Systems",
    ]
    assert glossary.forbidden_targets == (
        "Ajustes",
        "backup",
        "basura",
        "enlace compartido",
        "modo enfoque",
        "respaldo",
        "tablero de mandos",
        "vista de línea de tiempo",
    )
    assert glossary.warnings == ()


def test_demo_rows_with_one_source_merge_into_alternatives():
    glossary = read_delimited_glossary(DEMO, "en", "es")
    workspace = next(entry for entry in glossary.entries if entry.source == "workspace")
    # demo.tsv lines 6 and 7: preferred "espacio de trabajo", admitted "área de trabajo".
    assert [(t.text, t.status) for t in workspace.targets] == [
        ("espacio de trabajo", TermStatus.PREFERRED),
        ("área de trabajo", TermStatus.ADMITTED),
    ]
    assert workspace.origin == "demo.tsv:6"
    assert workspace.note == "Masculine; plural espacios de trabajo."


def test_csv_with_quoted_comma_and_optional_columns(tmp_path):
    path = write(
        tmp_path,
        "vellorind.csv",
        'Source,Target,Case sensitive,Mode\n"Vellorind Systems, Ltd.","Vellorind Systems, Ltd.",yes,enforce\n'
        "focus mode,modo de concentración,no,prefer\n",
    )
    glossary = read_delimited_glossary(path, "en", "es")
    first, second = glossary.entries
    # RFC 4180: a quoted field may contain the delimiter.
    assert (first.source, first.case_sensitive, first.mode) == ("Vellorind Systems, Ltd.", True, TermMode.ENFORCE)
    assert (second.source, second.mode) == ("focus mode", TermMode.PREFER)


def test_semicolon_delimiter_is_found_from_the_header_and_bom_and_crlf_are_removed(tmp_path):
    path = write(tmp_path, "terms.txt", "\ufeffsource;target;status\r\ntrash;papelera;\r\ntrash;basura;deprecated\r\n")
    (entry,) = read_delimited_glossary(path, "en", "es").entries
    assert [(t.text, t.status) for t in entry.targets] == [
        ("papelera", TermStatus.PREFERRED),
        ("basura", TermStatus.DEPRECATED),
    ]


def test_tab_separated_files_take_quotes_literally(tmp_path):
    # IANA text/tab-separated-values has no quoting: the quote characters are part of the term.
    path = write(tmp_path, "quotes.tsv", 'source\ttarget\n"Quick capture" button\tbotón "Captura rápida"\n')
    (entry,) = read_delimited_glossary(path, "en", "es").entries
    assert (entry.source, entry.targets[0].text) == ('"Quick capture" button', 'botón "Captura rápida"')


def test_terms_are_normalised_like_segments(tmp_path):
    # decoder.text.normalize: whitespace runs (here a no-break space followed by a space) -> one space,
    # and a decomposed "a" + U+0301 composes to "á" (NFC).
    path = write(tmp_path, "spaces.tsv", "source\ttarget\nsync\u00a0 hub\ta\u0301rea de trabajo\n")
    (entry,) = read_delimited_glossary(path, "en", "es").entries
    assert (entry.source, entry.targets[0].text) == ("sync hub", "área de trabajo")


def test_blank_lines_are_skipped_and_line_numbers_still_count_them(tmp_path):
    path = write(tmp_path, "blank.tsv", "source\ttarget\n\ntag\tetiqueta\n\n\nmilestone\t\n")
    with pytest.raises(InputFileError) as caught:
        read_delimited_glossary(path, "en", "es")
    # The empty target is on physical line 6 (header 1, blank 2, tag 3, blank 4 and 5).
    assert str(caught.value).startswith(f"{path}:6: ")
    assert "empty target term" in str(caught.value)


# Each bad file with the line its error must name, counted by hand (the header is line 1).
@pytest.mark.parametrize(
    ("text", "line", "message"),
    [
        ("source\tnote\ntag\tx\n", 1, "missing required column"),
        ("target\tstatus\netiqueta\tpreferred\n", 1, "missing required column"),
        ("source\ttarget\tsource\ntag\tetiqueta\ttag\n", 1, "column 'source' appears twice"),
        ("source\ttarget\ntag\tetiqueta\n\tetiqueta\n", 3, "empty source term"),
        ("source\ttarget\ntag\tetiqueta\nmilestone\t  \n", 3, "empty target term"),
        ("source\ttarget\nmilestone\n", 2, "empty target term"),
        ("source\ttarget\tstatus\ntag\tetiqueta\tpreferred\ntag\tmarca\tforbidden\n", 3, "unknown status 'forbidden'"),
        ("source\ttarget\tcase_sensitive\nBrelqua\tBrelqua\tsi\n", 2, "case_sensitive must be yes/no"),
        ("source\ttarget\tmode\ntag\tetiqueta\talways\n", 2, "unknown mode 'always'"),
        ("source\ttarget\ntag\tetiqueta\textra\n", 2, "3 fields but the header names 2 columns"),
        ("source\ttarget\ntag\tetiqueta\ntrash\tpape\x07lera\n", 3, "U+0007"),
        ("source\ttarget\ntag\tetiqueta\n" + "x" * (MAX_TERM_CHARACTERS + 1) + "\ty\n", 3, "the limit is 1000"),
        ("\n", 1, "empty header line"),
    ],
)
def test_errors_name_file_and_line(tmp_path, text, line, message):
    path = write(tmp_path, "bad.tsv", text)
    with pytest.raises(InputFileError) as caught:
        read_delimited_glossary(path, "en", "es")
    assert str(caught.value).startswith(f"{path}:{line}: ")
    assert message in str(caught.value)
    assert caught.value.location == line


def test_invalid_utf8_names_its_line(tmp_path):
    path = tmp_path / "latin1.tsv"
    path.write_bytes(b"source\ttarget\ntag\tetiqueta\nstorage quota\tcuota de almacenamiento\n" + b"\xe1rea\tx\n")
    with pytest.raises(InputFileError, match=r"latin1\.tsv:4: invalid UTF-8"):
        read_delimited_glossary(path, "en", "es")


def test_missing_file_names_the_file(tmp_path):
    with pytest.raises(InputFileError, match="nowhere.tsv: cannot be opened"):
        read_delimited_glossary(tmp_path / "nowhere.tsv", "en", "es")


def test_two_preferred_targets_for_one_source_warn_and_keep_both(tmp_path):
    path = write(
        tmp_path,
        "conflict.tsv",
        "source\ttarget\tstatus\ndashboard\tpanel de control\tpreferred\ndashboard\tpanel\tpreferred\n",
    )
    glossary = read_delimited_glossary(path, "en", "es")
    (warning,) = glossary.warnings
    assert warning.kind is WarningKind.CONFLICT
    assert warning.origin == "conflict.tsv:3"
    assert "two preferred targets for 'dashboard'" in warning.message and "conflict.tsv:2" in warning.message
    # Both stay allowed; the first one in the file ranks first.
    assert glossary.entries[0].allowed_targets[0].text == "panel de control"
    assert len(glossary.entries[0].allowed_targets) == 2


def test_one_preferred_target_per_case_mode_is_no_conflict(tmp_path):
    # "Settings" (the page name, case-sensitive) and "settings" (running text) are two entries: no conflict.
    path = write(
        tmp_path,
        "modes.tsv",
        "source\ttarget\tcase_sensitive\nSettings\tConfiguración\tyes\nsettings\tajustes\tno\n",
    )
    glossary = read_delimited_glossary(path, "en", "es")
    assert [(e.source, e.case_sensitive) for e in glossary.entries] == [("Settings", True), ("settings", False)]
    assert glossary.warnings == ()


def test_duplicates_and_status_clashes_warn_and_keep_the_first(tmp_path):
    path = write(
        tmp_path,
        "repeats.tsv",
        "source\ttarget\tstatus\ntrash\tpapelera\tpreferred\nTrash\tpapelera\tpreferred\ntrash\tpapelera\tdeprecated\n",
    )
    glossary = read_delimited_glossary(path, "en", "es")
    assert [(w.kind, w.origin) for w in glossary.warnings] == [
        (WarningKind.DUPLICATE, "repeats.tsv:3"),
        (WarningKind.CONFLICT, "repeats.tsv:4"),
    ]
    (entry,) = glossary.entries  # case-insensitive sources "trash" and "Trash" are one entry
    assert [(t.text, t.status) for t in entry.targets] == [("papelera", TermStatus.PREFERRED)]


def test_unknown_columns_are_ignored_with_a_warning(tmp_path):
    path = write(tmp_path, "extra.tsv", "source\ttarget\treviewer\ntag\tetiqueta\tIlse\n")
    glossary = read_delimited_glossary(path, "en", "es")
    assert [(w.kind, w.origin) for w in glossary.warnings] == [(WarningKind.IGNORED_COLUMN, "extra.tsv:1")]
    assert glossary.entries[0].targets[0].text == "etiqueta"


def test_only_deprecated_targets_warn(tmp_path):
    path = write(tmp_path, "only.tsv", "source\ttarget\tstatus\nbackup\trespaldo\tdeprecated\n")
    glossary = read_delimited_glossary(path, "en", "es")
    assert [w.kind for w in glossary.warnings] == [WarningKind.NO_ALLOWED_TARGET]
    assert glossary.forbidden_targets == ("respaldo",)
