"""TBX glossaries: the TBX-Basic (ISO 30042:2019) core structure, the 2008 martif form, DCT style, errors.

The fixture files in data/ were written by hand to the TBX-Basic dialect description (structure from memory
of ISO 30042, checked against the element names of the dialect's published example files); their comments
say so. Expected entries below are read off those files by hand.
"""

from pathlib import Path

import pytest

from decoder.errors import ConfigurationError, InputFileError
from decoder.terminology.glossary import TermStatus, WarningKind
from decoder.terminology.tbx import read_tbx_glossary

DATA = Path(__file__).parent / "data"
PREFERRED, ADMITTED, DEPRECATED = TermStatus.PREFERRED, TermStatus.ADMITTED, TermStatus.DEPRECATED


def targets_of(glossary, source):
    entry = next(entry for entry in glossary.entries if entry.source == source)
    return [(target.text, target.status) for target in entry.targets]


@pytest.fixture(scope="module")
def basic():
    return read_tbx_glossary(DATA / "vellorind_basic.tbx", "en", "es")


def test_tbx_basic_concepts_become_entries_for_every_source_term(basic):
    # Six source terms in the four concepts that have both English and Spanish (c-dashboard, c-workspace,
    # c-sync-hub with two English terms, c-admin-console with two).
    assert [entry.source for entry in basic.entries] == [
        "dashboard",
        "workspace",
        "sync hub",
        "sync centre",
        "admin console",
        "AC",
    ]


def test_administrative_status_maps_to_target_status(basic):
    assert targets_of(basic, "dashboard") == [("panel de control", PREFERRED), ("tablero de mandos", DEPRECATED)]
    # c-workspace is en-US / es-ES: primary-language matching reads it for "en" -> "es".
    assert targets_of(basic, "workspace") == [("espacio de trabajo", PREFERRED), ("área de trabajo", ADMITTED)]
    assert basic.forbidden_targets == ("tablero de mandos",)


def test_superseded_source_term_still_gives_the_concepts_target(basic):
    # "sync centre" is supersededTerm-admn-sts in English; it must still say how to translate it.
    assert targets_of(basic, "sync centre") == [("centro de sincronización", PREFERRED)]
    sync_centre = next(entry for entry in basic.entries if entry.source == "sync centre")
    assert sync_centre.note == "Name used before release 3."


def test_acronyms_are_case_sensitive(basic):
    # termType "acronym" (TBX-Basic termType picklist) -> case-sensitive; "fullForm" -> not.
    cases = {entry.source: entry.case_sensitive for entry in basic.entries}
    assert cases["AC"] is True
    assert cases["admin console"] is False


def test_notes_come_from_definitions_and_target_notes(basic):
    dashboard = basic.entries[0]
    assert dashboard.note == "The start page that summarises a workspace."  # the English langSec definition
    assert dashboard.targets[1].note == "Reads as a business scorecard."  # the termSec <note>
    assert dashboard.origin == "vellorind_basic.tbx:<conceptEntry id='c-dashboard'>"


def test_concepts_missing_a_language_are_skipped_with_a_warning_naming_them(basic):
    # c-milestone has English and French only; c-no-lang has an English section without xml:lang.
    assert [(w.kind, w.origin, w.message) for w in basic.warnings] == [
        (
            WarningKind.SKIPPED,
            "vellorind_basic.tbx:<conceptEntry id='c-milestone'>",
            "concept has no 'es' term; skipped",
        ),
        (
            WarningKind.SKIPPED,
            "vellorind_basic.tbx:<conceptEntry id='c-no-lang'>",
            "a <langSec> has no xml:lang; skipped",
        ),
        (WarningKind.SKIPPED, "vellorind_basic.tbx:<conceptEntry id='c-no-lang'>", "concept has no 'en' term; skipped"),
    ]


def test_the_other_direction_reads_the_same_concepts(basic):
    reverse = read_tbx_glossary(DATA / "vellorind_basic.tbx", "es", "en")
    # Spanish -> English: the deprecated Spanish term is a source term too (it still matches).
    assert targets_of(reverse, "tablero de mandos") == [("dashboard", PREFERRED)]
    assert targets_of(reverse, "centro de sincronización") == [
        ("sync hub", PREFERRED),
        ("sync centre", TermStatus.SUPERSEDED),
    ]


def test_legacy_martif_with_tig_and_ntig():
    glossary = read_tbx_glossary(DATA / "vellorind_legacy.tbx", "en", "es")
    assert targets_of(glossary, "trash") == [("papelera", PREFERRED), ("basura", DEPRECATED)]
    # ntig/termGrp, and the short status spellings "preferred"/"deprecated".
    assert targets_of(glossary, "backup") == [("copia de seguridad", PREFERRED), ("respaldo", DEPRECATED)]
    assert glossary.entries[1].note == "A copy of a workspace kept to restore it later."  # termEntry definition
    assert glossary.forbidden_targets == ("basura", "respaldo")


def test_dct_style_data_categories_and_exact_region_preference(tmp_path):
    # DCT style (TBX-Basic dialect, DCT examples): data categories as namespaced elements. The concept has
    # es-ES and es-MX sections; a request for es-MX reads only the exact one.
    path = tmp_path / "dct.tbx"
    path.write_text(
        """<?xml version="1.0" encoding="UTF-8"?>
<tbx type="TBX-Basic" style="dct" xml:lang="en" xmlns="urn:iso:std:iso:30042:ed:3.0"
     xmlns:min="http://www.tbxinfo.net/ns/min" xmlns:basic="http://www.tbxinfo.net/ns/basic">
  <tbxHeader><fileDesc><sourceDesc><p>Vellorind Systems</p></sourceDesc></fileDesc></tbxHeader>
  <text><body>
    <conceptEntry id="c1">
      <langSec xml:lang="en"><termSec><term>share link</term>
        <min:administrativeStatus>preferredTerm-admn-sts</min:administrativeStatus></termSec></langSec>
      <langSec xml:lang="es-ES"><termSec><term>enlace para compartir</term></termSec></langSec>
      <langSec xml:lang="es-MX"><termSec><term>vínculo para compartir</term></termSec>
        <termSec><term>enlace compartido</term>
        <min:administrativeStatus>deprecatedTerm-admn-sts</min:administrativeStatus></termSec></langSec>
    </conceptEntry>
  </body></text>
</tbx>
""",
        encoding="utf-8",
    )
    glossary = read_tbx_glossary(path, "en", "es-MX")
    assert targets_of(glossary, "share link") == [
        ("vínculo para compartir", PREFERRED),
        ("enlace compartido", DEPRECATED),
    ]
    # A request for plain "es" has no exact section, so both regional sections are read.
    both = read_tbx_glossary(path, "en", "es")
    assert [text for text, _ in targets_of(both, "share link")] == [
        "enlace para compartir",
        "vínculo para compartir",
        "enlace compartido",
    ]


def test_malformed_xml_names_the_parser_line(tmp_path):
    path = tmp_path / "broken.tbx"
    # Line 4 closes <term> with </termSec>: a mismatched tag (expat reports the line of the bad end tag).
    path.write_text(
        '<tbx xmlns="urn:iso:std:iso:30042:ed:3.0"><text><body>\n<conceptEntry id="c1">\n'
        '<langSec xml:lang="en"><termSec>\n<term>tag</termSec>\n</langSec></conceptEntry></body></text></tbx>\n',
        encoding="utf-8",
    )
    with pytest.raises(InputFileError, match=r"broken\.tbx:4: malformed XML: mismatched tag"):
        read_tbx_glossary(path, "en", "es")


def test_a_root_other_than_tbx_is_refused(tmp_path):
    path = tmp_path / "memory.tbx"
    path.write_text('<tmx version="1.4"><body/></tmx>', encoding="utf-8")
    with pytest.raises(InputFileError, match=r"memory\.tbx:1: not a TBX file: the root element is <tmx>"):
        read_tbx_glossary(path, "en", "es")


@pytest.mark.parametrize(
    ("spanish_term", "message"),
    [
        (
            "<term>papelera</term><termNote type='administrativeStatus'>forbidden</termNote>",
            "unknown administrative status 'forbidden'",
        ),
        ("<term>  </term>", "empty target term"),
    ],
)
def test_errors_inside_a_concept_name_the_concept(tmp_path, spanish_term, message):
    path = tmp_path / "bad.tbx"
    path.write_text(
        "<martif><text><body><termEntry>"
        "<langSet xml:lang='en'><tig><term>trash</term></tig></langSet>"
        f"<langSet xml:lang='es'><tig>{spanish_term}</tig></langSet>"
        "</termEntry></body></text></martif>",
        encoding="utf-8",
    )
    with pytest.raises(InputFileError) as caught:
        read_tbx_glossary(path, "en", "es")
    # No id attribute: the concept is named by its number.
    assert str(caught.value).startswith(f"{path}:<termEntry> #1: ")
    assert message in str(caught.value)


def test_languages_with_one_primary_subtag_are_refused():
    with pytest.raises(ConfigurationError, match="same primary language"):
        read_tbx_glossary(DATA / "vellorind_basic.tbx", "en-US", "en-GB")
