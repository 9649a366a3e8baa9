"""Loading glossaries by name or path, and inline rows with the TSV rules."""

import pytest

from decoder.errors import InputFileError
from decoder.terminology.errors import GlossaryNotFoundError
from decoder.terminology.glossary import TermMode, TermStatus
from decoder.terminology.store import DEFAULT_GLOSSARY_DIR, glossary_from_rows, load_glossary


def test_demo_loads_by_name_from_the_default_folder():
    glossary = load_glossary("demo", "en", "es")
    assert (glossary.name, len(glossary.entries)) == ("demo", 21)  # 21 source terms, counted in demo.tsv
    assert (DEFAULT_GLOSSARY_DIR / "demo.tsv").is_file()


def test_names_are_found_in_search_folders_in_order(tmp_path):
    first, second = tmp_path / "first", tmp_path / "second"
    first.mkdir()
    second.mkdir()
    (second / "ui.tsv").write_text("source\ttarget\ntag\tetiqueta\n", encoding="utf-8")
    (second / "help.tbx").write_text(
        "<martif><text><body><termEntry><langSet xml:lang='en'><tig><term>milestone</term></tig></langSet>"
        "<langSet xml:lang='es'><tig><term>hito</term></tig></langSet></termEntry></body></text></martif>",
        encoding="utf-8",
    )
    assert load_glossary("ui", "en", "es", search_dirs=[first, second]).entries[0].source == "tag"
    assert load_glossary("help", "en", "es", search_dirs=[first, second]).entries[0].targets[0].text == "hito"
    (first / "ui.csv").write_text("source,target\ntag,marca\n", encoding="utf-8")
    assert load_glossary("ui", "en", "es", search_dirs=[first, second]).entries[0].targets[0].text == "marca"


def test_paths_are_read_directly(tmp_path):
    path = tmp_path / "inline.tsv"
    path.write_text("source\ttarget\ntrash\tpapelera\n", encoding="utf-8")
    assert load_glossary(str(path), "en", "es").entries[0].source == "trash"
    assert load_glossary(path, "en", "es").name == "inline"


def test_unknown_ambiguous_and_unsafe_names(tmp_path):
    with pytest.raises(GlossaryNotFoundError, match="no glossary named 'missing'"):
        load_glossary("missing", "en", "es", search_dirs=[tmp_path])
    (tmp_path / "twice.tsv").write_text("source\ttarget\ntag\tetiqueta\n", encoding="utf-8")
    (tmp_path / "twice.tbx").write_text("<martif/>", encoding="utf-8")
    with pytest.raises(GlossaryNotFoundError, match="ambiguous"):
        load_glossary("twice", "en", "es", search_dirs=[tmp_path])
    # A name from an HTTP request must not climb out of the folder.
    with pytest.raises(GlossaryNotFoundError, match="not a glossary name"):
        load_glossary("..", "en", "es", search_dirs=[tmp_path])


def test_inline_rows_merge_like_tsv_rows():
    glossary = glossary_from_rows(
        "request",
        [
            {"source": "Brelqua", "target": "Brelqua", "case_sensitive": True, "mode": "enforce"},
            {"source": "backup", "target": "copia de seguridad"},
            {"source": "backup", "target": "respaldo", "status": "deprecated", "case_sensitive": "no"},
        ],
        "en",
        "es",
    )
    brelqua, backup = glossary.entries
    assert (brelqua.case_sensitive, brelqua.mode, brelqua.origin) == (True, TermMode.ENFORCE, "request:row 1")
    assert [(t.text, t.status) for t in backup.targets] == [
        ("copia de seguridad", TermStatus.PREFERRED),
        ("respaldo", TermStatus.DEPRECATED),
    ]


@pytest.mark.parametrize(
    ("bad_row", "message"),
    [
        ({"source": "tag"}, "empty target term"),
        ({"source": "tag", "target": "etiqueta", "status": "obsolete"}, "unknown status 'obsolete'"),
        ({"source": "tag", "target": "etiqueta", "case_sensitive": "maybe"}, "case_sensitive must be"),
        ({"source": "tag", "target": "etiqueta", "case_sensitive": 1}, "case_sensitive must be"),
        ({"source": "tag", "target": "etiqueta", "mode": "force"}, "unknown mode 'force'"),
        ({"source": "tag", "target": 7}, "target must be a string"),
        ({"source": "tag", "targets": ["etiqueta"]}, "unknown field(s) 'targets'"),
    ],
)
def test_inline_row_errors_name_glossary_and_row(bad_row, message):
    rows = [{"source": "trash", "target": "papelera"}, bad_row]
    with pytest.raises(InputFileError) as caught:
        glossary_from_rows("request", rows, "en", "es")
    assert str(caught.value).startswith("<inline glossary 'request'>:row 2: ")
    assert message in str(caught.value)
