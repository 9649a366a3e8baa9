import numpy as np
import pytest

from decoder.text.casing import Truecaser, copy_source_capitals, lowercase, restore_casing
from decoder.text.protection import CLOSING_TAG, NUMBER, OPENING_TAG, PLACEHOLDER, URL

# A small target-side corpus (tokenized, original casing) about the invented Zentrix app.
CORPUS = [
    ["The", "Zentrix", "app", "opens", "the", "file", "."],
    ["Open", "Zentrix", "and", "click", "Save", "."],
    ["Zentrix", "saves", "the", "file", ".", "Then", "it", "closes", "."],
    ["¿", "Dónde", "está", "Zentrix", "?"],
    ["Click", "save", "or", "Save", "to", "keep", "⟨num⟩", "files", "."],
    ["The", "ZenBox", "and", "the", "Zenbox", "differ", "."],
]
# Hand counts over non-sentence-initial positions (initial = the first non-punctuation token of a segment
# or the first after . ! ? ...): zentrix: "Zentrix" in segments 1, 2 and 4 (it opens segment 3, so that one
# is initial) -> Zentrix. the: "the" in segments 1, 3 and 6 ("The" only ever initial) -> the. save: "Save"
# twice, "save" once -> Save. file: "file" twice. zenbox: "ZenBox" once, "Zenbox" once, a tie and neither is
# all-lowercase, so the smaller string: "ZenBox" < "Zenbox" (B = U+0042 sorts before b = U+0062).
EXPECTED_FORMS = {"zentrix": "Zentrix", "the": "the", "save": "Save", "file": "file", "zenbox": "ZenBox"}


@pytest.fixture(scope="module")
def truecaser() -> Truecaser:
    return Truecaser.learn(CORPUS)


@pytest.mark.parametrize(("word", "expected"), sorted(EXPECTED_FORMS.items()))
def test_truecaser_learns_the_most_frequent_non_initial_form(truecaser, word, expected):
    assert truecaser.surface_form(word) == expected
    assert truecaser.surface_form(word.upper()) == expected  # looked up by lowercase form


@pytest.mark.parametrize("word", ["open", "then", "dónde", "⟨num⟩", "."])
def test_words_seen_only_sentence_initially_and_non_words_are_not_learned(truecaser, word):
    # "Open" starts segment 2, "Then" follows a ".", "Dónde" follows the opening "¿".
    assert truecaser.surface_form(word) is None


def test_ties_prefer_the_lowercase_form():
    # "Beta" and "beta" once each outside the initial position: the lowercase form wins the tie.
    assert Truecaser.learn([["x", "Beta", "beta"]]).surface_form("beta") == "beta"


def test_apply_replaces_known_words_and_keeps_the_rest(truecaser):
    assert truecaser.apply(["zentrix", "SAVE", "unknownword", PLACEHOLDER, "3"]) == [
        "Zentrix", "Save", "unknownword", PLACEHOLDER, "3",
    ]  # fmt: skip


def test_arrays_round_trip_and_layout(truecaser):
    blob, offsets = Truecaser(["Save", "Zentrix", "the"]).to_arrays()
    # Forms sorted by code point, UTF-8 bytes concatenated; offsets by hand: 0, 4, 4 + 7, 11 + 3.
    assert bytes(blob) == b"SaveZentrixthe"
    assert offsets.tolist() == [0, 4, 11, 14]
    assert (blob.dtype, offsets.dtype) == (np.uint8, np.int64)
    rebuilt = Truecaser.from_arrays(*truecaser.to_arrays())
    assert rebuilt.surface_forms == truecaser.surface_forms
    assert rebuilt.surface_form("zentrix") == "Zentrix"


def test_non_ascii_forms_survive_the_arrays():
    blob, offsets = Truecaser(["Élan", "ñandú"]).to_arrays()
    assert offsets.tolist() == [0, 5, 12]  # "É" is 2 UTF-8 bytes, "ñ" and "ú" 2 each (RFC 3629)
    assert Truecaser.from_arrays(blob, offsets).surface_form("ÉLAN") == "Élan"


def test_two_forms_for_one_word_are_refused():
    with pytest.raises(ValueError, match="two surface forms for 'save'"):
        Truecaser(["Save", "save"])


def test_lowercase_leaves_class_tokens_alone():
    # Unicode default case mapping (Unicode Standard section 3.13): "ß" has no lowercase change.
    assert lowercase(["Save", URL, "ÉTÉ", "Straße", NUMBER]) == ["save", URL, "été", "straße", NUMBER]


def test_lowercase_leaves_options_alone():
    # "-N" and "-n" are different options; a lone dash, a dash run and a negative number are no options.
    assert lowercase(["-N", "--Dry-Run", "-", "--", "-2", "Sign-In"]) == ["-N", "--Dry-Run", "-", "--", "-2", "sign-in"]


def test_truecaser_never_learns_or_changes_options():
    truecaser = Truecaser.learn([["Run", "with", "-N", "or", "-N", "and", "-n", "."]])
    assert truecaser.surface_form("-n") is None
    assert truecaser.apply(["-n", "-N"]) == ["-n", "-N"]


@pytest.mark.parametrize(
    ("output", "source", "expected"),
    [
        # Source starts with a capital: the output's first word is capitalised.
        (["haga", "clic", "en", "save", "."], ["Click", "Save", "."], ["Haga", "clic", "en", "Save", "."]),
        # Source starts lowercase: the first word keeps its truecased form.
        (["haga", "clic"], ["click", "here"], ["haga", "clic"]),
        # ... which is capitalised when the truecaser knows it so (a product name).
        (["zentrix", "abre"], ["zentrix", "opens"], ["Zentrix", "abre"]),
        # Leading punctuation is skipped on both sides.
        (["¿", "dónde", "está", "?"], ["«", "Where", "is", "it", "?"], ["¿", "Dónde", "está", "?"]),
        # Elided French article: its first letter is capitalised.
        (["l'", "ordinateur"], ["The", "computer"], ["L'", "ordinateur"]),
        # A class token or number first: nothing to capitalise.
        ([PLACEHOLDER, "archivos"], ["Files", "%s"], [PLACEHOLDER, "archivos"]),
        (["3", "archivos"], ["Three", "files"], ["3", "archivos"]),
        (["--force", "ahora"], ["Force", "now"], ["--force", "ahora"]),
        # Source starting with a number is not "capitalised".
        (["archivos"], ["3", "Files"], ["archivos"]),
        # Markup is skipped like punctuation, as a tag's text or as its class token.
        (["<b>", "guardar", "</b>"], ["<b>", "Save", "</b>"], ["<b>", "Guardar", "</b>"]),
        (
            [OPENING_TAG, "guardar", CLOSING_TAG],
            [OPENING_TAG, "Save", CLOSING_TAG],
            [OPENING_TAG, "Guardar", CLOSING_TAG],
        ),
    ],
)
def test_restore_casing(truecaser, output, source, expected):
    assert restore_casing(output, source, truecaser) == expected


def test_restore_casing_without_truecaser_only_capitalises_the_first_word():
    assert restore_casing(["zentrix", "abre", "save"], ["Zentrix", "opens"], None) == ["Zentrix", "abre", "save"]
    assert restore_casing(["zentrix"], ["zentrix"], None) == ["zentrix"]


# Hand-made cases of the UI-text rule in copy_source_capitals: a capitalised source word that does not start a
# sentence passes its capital to the (lowercase) word aligned to it.
@pytest.mark.parametrize(("output", "positions", "source", "expected"), [
    (["haga", "clic", "en", "guardar"], [0, 0, 0, 1], ["Click", "Save"], ["haga", "clic", "en", "Guardar"]),
    (["abra", "el", "menú"], [0, None, 2], ["Open", "the", "menu"], ["abra", "el", "menú"]),
    (["pulse", "ok"], [0, 1], ["Press", "OK"], ["pulse", "ok"]),                        # all capitals: left alone
    (["listo", ".", "abra"], [0, 1, 2], ["Done", ".", "Open"], ["listo", ".", "abra"]),  # a new sentence
])
def test_copy_source_capitals(output, positions, source, expected):
    assert copy_source_capitals(output, positions, source) == expected
