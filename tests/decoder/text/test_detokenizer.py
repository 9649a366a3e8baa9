import pytest
from hypothesis import given, settings

from decoder.text.detokenizer import detokenize, detokenize_tokens
from decoder.text.normalize import normalize
from decoder.text.tokenizer import tokenize
from tests.decoder.text.strategies import ARBITRARY_TEXT, canonical_segments

# Expected strings are written by hand from the spacing conventions named in each comment.


@pytest.mark.parametrize(
    ("tokens", "expected"),
    [
        # English typesetting (common practice): closing punctuation and brackets hug the word before them,
        # opening brackets the word after.
        (["Click", "(", "or", "tap", ")", "Save", ",", "then", "wait", "..."], "Click (or tap) Save, then wait..."),
        (["Ready", "?", "Yes", "!", "Done", ":", "100", "%", "."], "Ready? Yes! Done: 100%."),
        (["see", "[", "1", "]", "and", "{", "x", "}", ";", "ok", "…"], "see [1] and {x}; ok…"),
        (["and", "/", "or"], "and/or"),
        # Straight quotes alternate: the first opens, the second closes.
        (["He", "said", '"', "hi", '"', "and", '"', "bye", '"', "."], 'He said "hi" and "bye".'),
        (['"', "Save", ",", '"', "she", "said"], '"Save," she said'),
        (["Click", "'", "Save", "'", "."], "Click 'Save'."),
        (["“", "Save", "”", "or", "‘", "Open", "’"], "“Save” or ‘Open’"),
        # German quotes (Duden, from memory): „ opens and “ closes („so“).
        (["„", "Speichern", "“", "klicken"], "„Speichern“ klicken"),
        # Markup: opening tags attach to the following word, closing tags to the preceding one.
        (["Click", "<b>", "Save", "</b>", "now", "<br/>", "then"], "Click <b>Save</b> now <br/> then"),
        (["Copy", "%s", "to", "{0}", "."], "Copy %s to {0}."),
        ([], ""),
    ],
)
def test_english_spacing(tokens, expected):
    assert detokenize(tokens, "en") == expected


@pytest.mark.parametrize(
    ("tokens", "expected"),
    [
        # French typography (Imprimerie nationale, Lexique des règles typographiques, from memory): a space
        # before ; : ! ? and inside guillemets, none before , . ) ; we write U+0020 for the no-break space.
        (["Voulez-vous", "continuer", "?"], "Voulez-vous continuer ?"),
        (
            ["Attention", ":", "le", "fichier", "«", "config", "»", "existe", ";", "remplacer", "?", "!"],
            "Attention : le fichier « config » existe ; remplacer ?!",
        ),
        (["Enregistrer", "(", "Ctrl+S", ")", ",", "puis", "quitter", "."], "Enregistrer (Ctrl+S), puis quitter."),
        # Elision: the elided form joins the next word.
        (
            ["l'", "ordinateur", "qu'", "il", "voit", "jusqu'", "à", "L’", "écran"],
            "l'ordinateur qu'il voit jusqu'à L’écran",
        ),
        # "%" follows the general rule (attached): the brief lists only ; : ! ? and « » for French.
        (["50", "%"], "50%"),
    ],
)
def test_french_spacing(tokens, expected):
    assert detokenize(tokens, "fr") == expected
    assert detokenize(tokens, "fr-CA") == expected  # rules chosen by the primary subtag


def test_french_rules_do_not_apply_to_english():
    assert detokenize(["Continue", "?", "«", "x", "»"], "en") == "Continue? «x»"


@pytest.mark.parametrize(
    ("tokens", "expected"),
    [
        # Spanish (RAE, Ortografía 2010, from memory): ¿ ¡ open and join the next word; «» without inner space.
        (["¿", "Dónde", "está", "el", "archivo", "?", "¡", "Listo", "!"], "¿Dónde está el archivo? ¡Listo!"),
        (["Pulse", "«", "Guardar", "»", ",", "por", "favor", "."], "Pulse «Guardar», por favor."),
    ],
)
def test_spanish_spacing(tokens, expected):
    assert detokenize(tokens, "es") == expected
    assert detokenize(tokens, "es-MX") == expected


def _round_trip_test(language: str):
    """Segments written with the canonical spacing of ``language`` (see strategies.py) survive
    tokenize -> detokenize unchanged, and tokenize into exactly the tokens they were built from."""

    @settings(max_examples=50, deadline=None)
    @given(canonical_segments(language))
    def check(built):
        tokens = [token.text for token in tokenize(built.text, language)]
        assert tokens == list(built.tokens)
        assert detokenize(tokens, language) == built.text

    return check


test_round_trip_english = _round_trip_test("en")
test_round_trip_spanish = _round_trip_test("es-MX")
test_round_trip_french = _round_trip_test("fr")


@settings(max_examples=100, deadline=None)
@given(ARBITRARY_TEXT)
def test_detokenize_tokens_rebuilds_the_normalized_text(text):
    for language in ("en", "fr"):
        assert detokenize_tokens(tokenize(text, language)) == normalize(text)


def test_detokenize_tokens_keeps_the_recorded_spacing():
    # Spacing that detokenize's rules would change ("a ,b") is kept exactly from the space_before flags.
    assert detokenize_tokens(tokenize("a ,b ( c)\u00a0\u00a0d", "en")) == "a ,b ( c) d"
