import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from decoder.errors import InvalidTextError
from decoder.text.casing import Truecaser
from decoder.text.pipeline import finish_segment, finish_segment_with_report, model_tokens, prepare_segment
from decoder.text.protection import CLOSING_TAG, NUMBER, OPENING_TAG, PLACEHOLDER, URL, ProtectedToken
from tests.decoder.text.strategies import ARBITRARY_TEXT, canonical_segments


def test_prepare_segment_keeps_every_stage():
    prepared = prepare_segment("  Click\u00a0<b>Save</b> to copy %d files. ", "en-US")
    assert prepared.text == "Click <b>Save</b> to copy %d files."
    assert [token.text for token in prepared.tokens] == "Click <b> Save </b> to copy %d files .".split()
    assert prepared.model_tokens == ("click", OPENING_TAG, "save", CLOSING_TAG, "to", "copy", PLACEHOLDER, "files", ".")
    assert prepared.cased_tokens == ("Click", OPENING_TAG, "Save", CLOSING_TAG, "to", "copy", PLACEHOLDER, "files", ".")
    assert prepared.protected.originals[2] == ProtectedToken(6, PLACEHOLDER, "%d")


def test_options_keep_their_case_for_the_model():
    # "-N" and "-n" are different options; the decoder passes them through unchanged.
    assert prepare_segment("Use -N or --Dry-Run", "en").model_tokens == ("use", "-N", "or", "--Dry-Run")
    assert model_tokens("Use -N or --Dry-Run", "en") == ["use", "-N", "or", "--Dry-Run"]


def test_prepare_segment_rejects_control_characters_before_normalising():
    # The position refers to the raw input (the leading spaces count), not the normalised text.
    with pytest.raises(InvalidTextError, match="U\\+0007 at character 5"):
        prepare_segment("  Bad\x07", "en")


@pytest.mark.parametrize(
    ("language", "expected"),
    [
        ("es", ["p.", "ej.", ",", "sr.", "pérez"]),
        ("es-MX", ["p.", "ej.", ",", "sr.", "pérez"]),
        ("ES_mx", ["p.", "ej.", ",", "sr.", "pérez"]),  # POSIX-style separator and case are tolerated
        ("de-DE", ["p", ".", "ej", ".", ",", "sr", ".", "pérez"]),  # no German rules: generic
        ("x-unknown", ["p", ".", "ej", ".", ",", "sr", ".", "pérez"]),
    ],
)
def test_languages_match_by_primary_subtag(language, expected):
    assert model_tokens("p. ej., Sr. Pérez", language) == expected


@settings(max_examples=60, deadline=None)
@given(
    st.one_of(ARBITRARY_TEXT, canonical_segments("fr").map(lambda built: built.text)),
    st.sampled_from(["en", "es", "fr", "de"]),
)
def test_fast_model_tokens_equal_the_prepared_ones(text, language):
    assert model_tokens(text, language) == list(prepare_segment(text, language).model_tokens)


def test_model_tokens_never_contain_whitespace():
    tokens = model_tokens('Open <a href="https://x.example" title="Zentrix help">help</a> now', "en")
    assert tokens == ["open", OPENING_TAG, "help", CLOSING_TAG, "now"]


def test_finish_segment_end_to_end_with_reordered_placeholders():
    source = prepare_segment("Move {0} to {1} at 10:30.", "en")
    # A German-like output that swaps the placeholders; positions say where each came from
    # (source tokens: Move0 {0}1 to2 {1}3 at4 10:30 5 .6). The output starts with a number, so no word is
    # capitalised.
    output = ["⟨num⟩", "verschiebe", PLACEHOLDER, "nach", PLACEHOLDER, "."]
    positions = [5, 0, 3, 2, 1, 6]
    assert finish_segment(output, source, "de", source_positions=positions) == "10:30 verschiebe {1} nach {0}."


def test_finish_segment_restores_casing_before_placeholders():
    # A URL at the start of the output must not be capitalised although the source starts with a capital.
    source = prepare_segment("Visit https://zentrix.example now", "en")
    assert finish_segment([URL, "besuchen"], source, "de") == "https://zentrix.example besuchen"


def test_finish_segment_capitalises_after_leading_markup():
    source = prepare_segment("<b>Save</b> the file", "en")
    output = [OPENING_TAG, "guardar", CLOSING_TAG, "el", "archivo"]
    assert finish_segment(output, source, "es") == "<b>Guardar</b> el archivo"


def test_finish_segment_with_truecaser_and_french_spacing():
    truecaser = Truecaser.learn([["Lancez", "Zentrix", "maintenant", "."], ["Ouvrez", "Zentrix", "?"]])
    source = prepare_segment("Do you want to open Zentrix?", "en")
    output = ["voulez-vous", "ouvrir", "zentrix", "?"]
    assert finish_segment(output, source, "fr-FR", truecaser) == "Voulez-vous ouvrir Zentrix ?"


def test_lost_placeholders_are_appended_and_reported():
    source = prepare_segment("Copy %s files to %d", "en")
    report = finish_segment_with_report(["copiar", "archivos", NUMBER], source, "es")
    assert report.text == "Copiar archivos %s %d"
    assert report.num_dropped == 1  # the invented number had no original
    assert report.missing == (ProtectedToken(1, PLACEHOLDER, "%s"), ProtectedToken(4, PLACEHOLDER, "%d"))
