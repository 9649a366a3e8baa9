"""TMX reader. Expected pairs are read by hand from tests/decoder/corpus/data/quillory.tmx; the markup rules are
those of TMX 1.4b (LISA/GALA): <bpt>, <ept>, <it>, <ph> and <ut> hold native code, <hi> holds text."""

from __future__ import annotations

import tracemalloc
from pathlib import Path

import pytest

from decoder.corpus.records import SkipReason
from decoder.corpus.tmx import read_tmx
from decoder.errors import ConfigurationError, InputFileError

FIXTURE = Path(__file__).parent / "data" / "quillory.tmx"

# By hand from the fixture, requesting "en" and "de":
# tu 2 has tags "EN-us"/"de-de" (case-insensitive match); native code of bpt/ept/ph/it/ut (and the <sub> inside a
# bpt in tu 8) is dropped, so "<ph>{count}</ph>" leaves two spaces; <hi> keeps "Quillory R&D" (entity decoded);
# tu 4 has no German (fr-FR only) and tu 7 no English; tu 5 uses the TMX 1.1-1.3 "lang" attribute; in tu 6
# "en" matches en-GB and en-US equally (one extra subtag each) so the first, en-GB, wins, while "de" matches
# the "de" variant exactly, preferred over the de-CH variant before it.
EXPECTED_EN_DE = [
    ("Create a new notebook.", "Erstellen Sie ein neues Notizbuch.", "quillory.tmx:<tu> #1"),
    (
        "Press Save to keep your changes.",
        "Drücken Sie Speichern, um Ihre Änderungen zu behalten.",
        "quillory.tmx:<tu> #2",
    ),
    ("You have  notes in Quillory R&D.", "Sie haben  Notizen in Quillory F&E.", "quillory.tmx:<tu> #3"),
    ("Draft saved", "Entwurf gespeichert", "quillory.tmx:<tu> #5"),
    (
        "Close the notebook and choose a colour.",
        "Schließen Sie das Notizbuch und wählen Sie eine Farbe.",
        "quillory.tmx:<tu> #6",
    ),
    ("Open the help.", "Öffnen Sie die Hilfe.", "quillory.tmx:<tu> #8"),
]


def pair_tuples(reader) -> list[tuple[str, str, str]]:
    return [(pair.source, pair.target, pair.location) for pair in reader]


def test_fixture_en_de_pairs_and_skip_counts():
    reader = read_tmx(FIXTURE, "en", "de")
    assert pair_tuples(reader) == EXPECTED_EN_DE
    assert reader.skipped == {SkipReason.MISSING_TARGET_LANGUAGE: 1, SkipReason.MISSING_SOURCE_LANGUAGE: 1}


@pytest.mark.parametrize(("source", "target"), [("en-US", "de-CH"), ("EN-us", "DE-ch"), ("en_US", "de_CH")])
def test_region_requests_select_exact_variants(source, target):
    # RFC 4647 Basic Filtering: "de-CH" matches only tu 6's de-CH variant, and "en-US" matches no bare "en"
    # (tu 5), so six of the eight units are skipped: tus 1-4 and 8 lack de-CH, tus 5 and 7 lack en-US.
    reader = read_tmx(FIXTURE, source, target)
    assert pair_tuples(reader) == [
        (
            "Close the notebook and choose a color.",
            "Schliessen Sie das Notizbuch und wählen Sie eine Farbe.",
            "quillory.tmx:<tu> #6",
        ),
    ]
    assert reader.skipped == {SkipReason.MISSING_TARGET_LANGUAGE: 5, SkipReason.MISSING_SOURCE_LANGUAGE: 2}


def test_reverse_direction_swaps_the_sides():
    pairs = pair_tuples(read_tmx(FIXTURE, "de", "en"))
    assert pairs == [(target, source, location) for source, target, location in EXPECTED_EN_DE]


@pytest.mark.parametrize(("source", "target"), [("en", "en-GB"), ("*", "de"), ("de-CH", "de")])
def test_overlapping_language_requests_are_refused(source, target):
    # Some tag (e.g. "en-GB") matches both ranges, so a unit's pair would be ambiguous.
    with pytest.raises(ConfigurationError, match="overlap"):
        read_tmx(FIXTURE, source, target)


@pytest.mark.parametrize("bad", ["", "en US", "englishlanguage", "12", "en-"])
def test_malformed_language_ranges_are_refused(bad):
    # RFC 4647 section 2.1: 1*8ALPHA *("-" 1*8alphanum), or "*".
    with pytest.raises(ConfigurationError, match="is not a language tag"):
        read_tmx(FIXTURE, bad, "de")


def write(tmp_path: Path, text: str) -> Path:
    path = tmp_path / "memory.tmx"
    path.write_text(text, encoding="utf-8")
    return path


def tmx_document(units: str) -> str:
    header = '<?xml version="1.0" encoding="UTF-8"?>\n<tmx version="1.4">\n<header srclang="en"/>\n<body>\n'
    return f"{header}{units}</body>\n</tmx>\n"


def test_segment_markup_rules_on_nested_markup(tmp_path):
    # <hi> inside <hi> keeps both texts; a <ph> inside <hi> is dropped; tails after every element are kept.
    path = write(
        tmp_path,
        tmx_document(
            '<tu><tuv xml:lang="en"><seg>A <hi>b <hi>c</hi> <ph>&lt;br/&gt;</ph>d</hi> e</seg></tuv>'
            '<tuv xml:lang="de"><seg>F<it pos="end">&lt;/i&gt;</it></seg></tuv></tu>\n'
        ),
    )
    assert pair_tuples(read_tmx(path, "en", "de")) == [("A b c d e", "F", "memory.tmx:<tu> #1")]


def test_malformed_xml_names_the_parser_line(tmp_path):
    # Line 6 closes <seg> with </tuv>: expat reports "mismatched tag" at line 6.
    text = tmx_document(
        '<tu><tuv xml:lang="en"><seg>ok</seg></tuv><tuv xml:lang="de"><seg>gut</seg></tuv></tu>\n'
        '<tu><tuv xml:lang="en"><seg>broken</tuv></tu>\n'
    )
    path = write(tmp_path, text)
    reader = read_tmx(path, "en", "de")
    assert next(reader).source == "ok"  # streaming: the good unit before the damage is still delivered
    with pytest.raises(InputFileError) as caught:
        next(reader)
    assert caught.value.location == 6
    assert str(caught.value).startswith(f"{path}:6: malformed XML: mismatched tag")


def test_invalid_utf8_is_reported_with_its_line(tmp_path):
    path = tmp_path / "memory.tmx"
    path.write_bytes(tmx_document('<tu><tuv xml:lang="en"><seg>\xff</seg></tuv></tu>\n').encode("latin-1"))
    with pytest.raises(InputFileError, match=r"memory\.tmx:5: malformed XML"):
        list(read_tmx(path, "en", "de"))


def test_wrong_root_element(tmp_path):
    path = write(tmp_path, '<?xml version="1.0"?>\n<xliff version="1.2"></xliff>\n')
    with pytest.raises(InputFileError, match=r"memory\.tmx:1: not a TMX file: the root element is <xliff>"):
        list(read_tmx(path, "en", "de"))


@pytest.mark.parametrize(
    ("unit", "fragment"),
    [
        ("<tuv><seg>no language</seg></tuv>", "a <tuv> has no xml:lang attribute"),
        ('<tuv xml:lang="en"><note>no seg</note></tuv>', "has no <seg>"),
    ],
)
def test_structural_errors_name_the_unit(tmp_path, unit, fragment):
    ok = '<tu><tuv xml:lang="en"><seg>a</seg></tuv><tuv xml:lang="de"><seg>b</seg></tuv></tu>\n'
    path = write(tmp_path, tmx_document(ok + f"<tu>{unit}</tu>\n"))
    with pytest.raises(InputFileError) as caught:
        list(read_tmx(path, "en", "de"))
    assert caught.value.location == "<tu> #2"
    assert str(caught.value).startswith(f"{path}:<tu> #2: ")
    assert fragment in str(caught.value)


def test_missing_file_is_an_input_file_error(tmp_path):
    with pytest.raises(InputFileError, match=r"absent\.tmx: cannot be opened"):
        list(read_tmx(tmp_path / "absent.tmx", "en", "de"))


def peak_bytes_reading_units(tmp_path: Path, num_units: int) -> int:
    """tracemalloc's peak while streaming a generated memory of ``num_units`` units (all must come out)."""
    path = tmp_path / f"large-{num_units}.tmx"
    unit = (
        '<tu><tuv xml:lang="en-US"><seg>Note number {0} was archived.</seg></tuv>'
        '<tuv xml:lang="de-DE"><seg>Notiz Nummer {0} wurde archiviert.</seg></tuv></tu>\n'
    )
    with open(path, "w", encoding="utf-8") as file:
        file.write('<?xml version="1.0" encoding="UTF-8"?>\n<tmx version="1.4"><header srclang="en-US"/><body>\n')
        for number in range(num_units):
            file.write(unit.format(number))
        file.write("</body></tmx>\n")
    tracemalloc.start()
    try:
        count = sum(1 for _ in read_tmx(path, "en", "de"))
        peak_bytes = tracemalloc.get_traced_memory()[1]
    finally:
        tracemalloc.stop()
    assert count == num_units
    return peak_bytes


def test_memory_does_not_grow_with_the_number_of_units(tmp_path):
    # Measured with tracemalloc: streaming peaks at about 198 kB for 1,000, 2,500 and 5,000 units alike (growth
    # about 5 kB). With finished units left in the tree (cleared but not detached from <body>) the peak grows by
    # about 80 kB per 1,000 units (268 kB at 1,000, 388 kB at 2,500, 594 kB at 5,000 units).
    peak_bytes_reading_units(tmp_path, 100)  # warm-up: first-use allocations (imports, caches) are not growth
    growth_bytes = peak_bytes_reading_units(tmp_path, 3_000) - peak_bytes_reading_units(tmp_path, 1_000)
    assert growth_bytes < 50_000
