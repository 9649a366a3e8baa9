import pytest

from decoder.errors import InputFileError
from decoder.text.languages import DATA_DIR, GENERIC, abbreviations, load_abbreviations, primary_subtag, rule_set


@pytest.mark.parametrize(
    ("tag", "subtag"),
    # RFC 5646 section 2.2.1: the primary language subtag is the first subtag, case-insensitive.
    [("es", "es"), ("es-MX", "es"), ("es-419", "es"), ("FR-ca", "fr"), ("zh-Hant-TW", "zh"), ("pt_BR", "pt")],
)
def test_primary_subtag(tag, subtag):
    assert primary_subtag(tag) == subtag


@pytest.mark.parametrize(("tag", "expected"), [("en-GB", "en"), ("fr-CH", "fr"), ("es-AR", "es"), ("de", GENERIC)])
def test_rule_set_falls_back_to_generic(tag, expected):
    assert rule_set(tag) == expected


def test_shipped_lists_hold_the_brief_examples():
    assert {("e.g.",), ("Dr.",), ("etc.",)} <= set(abbreviations("en"))
    assert {("p.", "ej."), ("Sr.",)} <= set(abbreviations("es"))
    assert ("M.",) in abbreviations("fr")
    assert abbreviations("de") == ()


@pytest.mark.parametrize("name", ["en", "es", "fr"])
def test_shipped_lists_load_without_errors(name):
    # load_abbreviations raises InputFileError on the first malformed line.
    assert len(load_abbreviations(DATA_DIR / f"abbreviations-{name}.txt")) > 10


@pytest.mark.parametrize(
    ("content", "line", "bad_part"),
    [
        ("# comment\ne.g.\n\nfoo\n", 4, "foo"),  # no period
        ("etc.\np. ej\n", 2, "ej"),  # a part of a multi-part entry without its period
        ("...\n", 1, "..."),  # no letter
    ],
)
def test_malformed_abbreviation_file_names_file_and_line(tmp_path, content, line, bad_part):
    path = tmp_path / "abbreviations-xx.txt"
    path.write_text(content, encoding="utf-8")
    with pytest.raises(
        InputFileError, match=rf"abbreviations-xx\.txt:{line}: abbreviation part '{bad_part}'"
    ) as caught:
        load_abbreviations(path)
    assert (caught.value.path, caught.value.location) == (str(path), line)


def test_unreadable_abbreviation_file_names_the_file(tmp_path):
    path = tmp_path / "latin1.txt"
    path.write_bytes("caf\u00e9.\n".encode("latin-1"))  # 0xE9 alone is not valid UTF-8
    with pytest.raises(InputFileError, match="latin1.txt: cannot read abbreviation list"):
        load_abbreviations(path)
