import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from decoder.text.protection import CLASS_TOKENS
from decoder.text.tokenizer import Token, TokenKind, _compile, tokenize
from tests.decoder.text.strategies import ARBITRARY_TEXT, canonical_segments

W, P, N = TokenKind.WORD, TokenKind.PUNCTUATION, TokenKind.NUMBER
U, E, F, OPT = TokenKind.URL, TokenKind.EMAIL, TokenKind.PATH, TokenKind.OPTION
S, B, T = TokenKind.PRINTF, TokenKind.BRACE, TokenKind.TAG


def kinds_and_texts(text: str, language: str = "en") -> list[tuple[str, TokenKind]]:
    return [(token.text, token.kind) for token in tokenize(text, language)]


# printf conversion specifications, ISO C11 7.21.6.1 / POSIX printf(3):
# %[argument$][flags][width][.precision][length]conversion. Each row names the parts it exercises.
PRINTF_CASES = [
    ("%s", "conversion only"),
    ("%d", "conversion only"),
    ("%1$s", "argument 1$ (POSIX positional)"),
    ("%2$-8.3lf", "argument, flag -, width 8, precision .3, length l"),
    ("%-10s", "flag -, width 10"),
    ("%+d", "flag +"),
    ("%#x", "flag #"),
    ("%05d", "flag 0, width 5"),
    ("%'d", "POSIX thousands-grouping flag '"),
    ("%*d", "width from an argument"),
    ("%.*s", "precision from an argument"),
    ("%.2f", "precision .2"),
    ("%.f", "precision '.' alone means 0 (C11 7.21.6.1p4)"),
    ("%lu", "length l, conversion u"),
    ("%lld", "length ll"),
    ("%hhd", "length hh"),
    ("%zu", "length z"),
    ("%jd", "length j"),
    ("%td", "length t"),
    ("%Lf", "length L"),
    ("%X", "conversion X"),
    ("%e", "conversion e"),
    ("%G", "conversion G"),
    ("%a", "conversion a (C99 hexadecimal float)"),
    ("%c", "conversion c"),
    ("%p", "conversion p"),
    ("%n", "conversion n"),
    ("%%", "a literal percent sign (C11 7.21.6.1p8)"),
    ("%(name)s", "Python printf-style mapping key (Python docs, printf-style String Formatting)"),
    ("%(count)05d", "mapping key with flag and width"),
]


@pytest.mark.parametrize(("placeholder", "parts"), PRINTF_CASES, ids=[case[0] for case in PRINTF_CASES])
def test_printf_conversion_specifications_are_one_token(placeholder, parts):
    assert kinds_and_texts(f"Deleted {placeholder} files") == [("Deleted", W), (placeholder, S), ("files", W)]


@pytest.mark.parametrize(
    ("text", "expected"),
    [
        # The space flag is deliberately not recognised: "50% of" must not read as "% o".
        ("50% of", [("50%", N), ("of", W)]),
        ("50 % de", [("50", N), ("%", P), ("de", W)]),
        # "y" is not a C conversion specifier, so "%y" is punctuation then a word.
        ("%y", [("%", P), ("y", W)]),
        ("%d%%", [("%d", S), ("%%", S)]),
    ],
)
def test_percent_signs_that_are_not_conversions(text, expected):
    assert kinds_and_texts(text) == expected


# Brace placeholders per the Python docs, string module, "Format String Syntax":
# replacement_field ::= "{" [field_name] ["!" conversion] [":" format_spec] "}", and "{{" / "}}" escapes.
@pytest.mark.parametrize(
    "placeholder", ["{0}", "{name}", "{}", "{count:d}", "{0:>10}", "{price:,.2f}", "{0.size}", "{0[key]}", "{!r}"]
)
def test_brace_replacement_fields_are_one_token(placeholder):
    assert kinds_and_texts(f"Size {placeholder} now") == [("Size", W), (placeholder, B), ("now", W)]


def test_doubled_braces_are_escape_tokens():
    assert kinds_and_texts("{{0}} and {{") == [("{{", B), ("0", N), ("}}", B), ("and", W), ("{{", B)]


# Tags, XML 1.0 section 3.1 start-tag / end-tag / empty-element tag, simplified (HTML attributes without
# quotes allowed).
@pytest.mark.parametrize(
    "tag", ["<b>", "</b>", "<br/>", "<br />", '<a href="https://zentrix.example/a?b=1">', "<img src='x.png' alt=logo/>"]
)
def test_markup_tags_are_one_token(tag):
    assert kinds_and_texts(f"Click{tag}here") == [("Click", W), (tag, T), ("here", W)]


def test_less_than_that_starts_no_tag_is_punctuation():
    assert kinds_and_texts("a < 3 <3") == [("a", W), ("<", P), ("3", N), ("<", P), ("3", N)]


# URLs, RFC 3986 section 3 (scheme "://" authority path ["?" query] ["#" fragment]), simplified; sentence
# punctuation after a URL is not part of it (common practice, the brief's example).
@pytest.mark.parametrize(
    ("text", "expected"),
    [
        ("see https://x.example/a.", [("see", W), ("https://x.example/a", U), (".", P)]),
        (
            "https://help.zentrix.example/docs/install?lang=es&v=2#step-3",
            [("https://help.zentrix.example/docs/install?lang=es&v=2#step-3", U)],
        ),
        ("http://zentrix.example:8080/", [("http://zentrix.example:8080/", U)]),
        ("ftp://files.zentrix.example/a%20b.zip", [("ftp://files.zentrix.example/a%20b.zip", U)]),
        ("www.zentrix.example/docs, then", [("www.zentrix.example/docs", U), (",", P), ("then", W)]),
        ("(https://x.example/wiki/Zen_(app))", [("(", P), ("https://x.example/wiki/Zen_(app)", U), (")", P)]),
        ("https://x.example/?", [("https://x.example/", U), ("?", P)]),
        ("https://x.example/path:", [("https://x.example/path", U), (":", P)]),
        ("https://zentrix.example/caf\u00e9", [("https://zentrix.example/caf\u00e9", U)]),  # IRI, RFC 3987
    ],
)
def test_urls(text, expected):
    assert kinds_and_texts(text) == expected


# E-mail addresses, RFC 5322 section 3.4.1 addr-spec with dot-atom local part, simplified.
@pytest.mark.parametrize(
    ("text", "expected"),
    [
        ("ana.perez+news@mail.zentrix.example", [("ana.perez+news@mail.zentrix.example", E)]),
        ("Write to support@zentrix.example.", [("Write", W), ("to", W), ("support@zentrix.example", E), (".", P)]),
        ("(o'neil@zentrix.co.example)", [("(", P), ("o'neil@zentrix.co.example", E), (")", P)]),
        ("at @zentrix", [("at", W), ("@", P), ("zentrix", W)]),
    ],
)
def test_email_addresses(text, expected):
    assert kinds_and_texts(text) == expected


@pytest.mark.parametrize(
    ("text", "expected"),
    [
        ("/usr/share/zentrix", [("/usr/share/zentrix", F)]),
        ("C:\\Users\\ana\\zentrix.ini", [("C:\\Users\\ana\\zentrix.ini", F)]),
        ("~/.config/zentrix/settings.json", [("~/.config/zentrix/settings.json", F)]),
        ("./run.sh", [("./run.sh", F)]),
        ("../lib/", [("../lib/", F)]),
        (".\\run.bat", [(".\\run.bat", F)]),
        ("Edit /etc/zentrix.conf.", [("Edit", W), ("/etc/zentrix.conf", F), (".", P)]),
        ("(in ~/zentrix)", [("(", P), ("in", W), ("~/zentrix", F), (")", P)]),
        # A slash between words is not a path.
        ("and/or", [("and", W), ("/", P), ("or", W)]),
        ("km/h", [("km", W), ("/", P), ("h", W)]),
    ],
)
def test_file_paths(text, expected):
    assert kinds_and_texts(text) == expected


@pytest.mark.parametrize(
    ("text", "expected"),
    [
        ("--force", [("--force", OPT)]),
        ("-n", [("-n", OPT)]),
        ("--log-level=debug", [("--log-level=debug", OPT)]),
        ("ls -la ~/", [("ls", W), ("-la", OPT), ("~/", F)]),
        ("--output=/tmp/x.", [("--output=/tmp/x", OPT), (".", P)]),
        # A hyphen inside a word or between spaces is no option.
        ("sign-in", [("sign-in", W)]),
        ("a - b -- c", [("a", W), ("-", P), ("b", W), ("--", P), ("c", W)]),
    ],
)
def test_command_line_options(text, expected):
    assert kinds_and_texts(text) == expected


@pytest.mark.parametrize(
    ("text", "expected"),
    [
        ("1,234.5", [("1,234.5", N)]),
        ("1.234,5", [("1.234,5", N)]),
        ("3.5%", [("3.5%", N)]),
        ("-2", [("-2", N)]),
        ("(-2)", [("(", P), ("-2", N), (")", P)]),
        ("10:30", [("10:30", N)]),
        ("It costs 1,234.50.", [("It", W), ("costs", W), ("1,234.50", N), (".", P)]),
        ("2-3", [("2", N), ("-", P), ("3", N)]),
        # Digits followed by letters are a word, not a number and a word.
        ("10px 2nd", [("10px", W), ("2nd", W)]),
    ],
)
def test_numbers(text, expected):
    assert kinds_and_texts(text) == expected


@pytest.mark.parametrize(
    ("text", "language", "expected"),
    [
        ("Dr. Smith, e.g. etc.", "en", ["Dr.", "Smith", ",", "e.g.", "etc."]),
        ("E.g. at 9 a.m. on Jan. 3.", "en", ["E.g.", "at", "9", "a.m.", "on", "Jan.", "3", "."]),
        ("el Sr. Pérez, p. ej. en EE. UU.", "es", ["el", "Sr.", "Pérez", ",", "p.", "ej.", "en", "EE.", "UU."]),
        ("la Sra. García", "es-MX", ["la", "Sra.", "García"]),
        ("M. Dupont, c.-à-d. p. ex. demain", "fr", ["M.", "Dupont", ",", "c.-à-d.", "p.", "ex.", "demain"]),
        # Abbreviations of one language are not those of another, and unknown languages have none.
        ("the Sr. manager", "fr", ["the", "Sr", ".", "manager"]),
        ("z.B. Dr. Weber", "de", ["z", ".", "B", ".", "Dr", ".", "Weber"]),
        # "ex." only keeps its period after "p." (a multi-part entry); "EE." only before "UU.".
        ("mon ex.", "fr", ["mon", "ex", "."]),
        ("EE.", "es", ["EE", "."]),
    ],
)
def test_abbreviations_keep_their_period(text, language, expected):
    assert [token.text for token in tokenize(text, language)] == expected


@pytest.mark.parametrize(
    ("text", "language", "expected"),
    [
        # French elision (Grevisse, Le Bon Usage, from memory): the elided word is its own token.
        ("l'ordinateur", "fr", ["l'", "ordinateur"]),
        ("L’écran qu’il voit", "fr-CA", ["L’", "écran", "qu’", "il", "voit"]),
        ("jusqu'au bout, c'est-à-dire", "fr", ["jusqu'", "au", "bout", ",", "c'", "est-à-dire"]),
        # Words with an inner apostrophe that is no elision stay whole.
        ("aujourd'hui presqu'île", "fr", ["aujourd'hui", "presqu'île"]),
        # Other languages keep inner apostrophes and hyphens.
        ("Don't sign-in via e-mail", "en", ["Don't", "sign-in", "via", "e-mail"]),
        ("l'ordinateur", "en", ["l'ordinateur"]),
        ("'Save'", "en", ["'", "Save", "'"]),
    ],
)
def test_apostrophes_and_elision(text, language, expected):
    assert [token.text for token in tokenize(text, language)] == expected


def test_decomposed_accents_stay_in_the_word():
    # "q" + U+0303 COMBINING TILDE has no precomposed form, so NFC cannot join it; it is still one word.
    assert kinds_and_texts("q\u0303x stop") == [("q\u0303x", W), ("stop", W)]


def test_offsets_and_space_flags_on_a_hand_checked_segment():
    text = "Save \u00a0(now)!"
    # Offsets counted by hand: S0 a1 v2 e3, spaces 4-5, "(" 6, n7 o8 w9, ")" 10, "!" 11.
    assert tokenize(text, "en") == [
        Token("Save", 0, 4, W, False),
        Token("(", 6, 7, P, True),
        Token("now", 7, 10, W, False),
        Token(")", 10, 11, P, False),
        Token("!", 11, 12, P, False),
    ]


@settings(max_examples=100, deadline=None)
@given(ARBITRARY_TEXT)
def test_tokens_tile_the_text_with_only_whitespace_between(text):
    for language in ("en", "es", "fr", "de"):
        tokens = tokenize(text, language)
        previous_end = 0
        for index, token in enumerate(tokens):
            assert text[token.start : token.end] == token.text
            gap = text[previous_end : token.start]
            assert gap.strip() == ""  # str.strip removes exactly the Unicode whitespace the tokenizer skips
            assert token.space_before == (index > 0 and gap != "")
            previous_end = token.end
        assert text[previous_end:].strip() == ""


@settings(max_examples=100, deadline=None)
@given(ARBITRARY_TEXT)
def test_real_text_never_tokenizes_into_a_class_token(text):
    for language in ("en", "fr"):
        assert not any(token.text in CLASS_TOKENS for token in tokenize(text, language))


def test_class_token_spellings_split_when_typed_as_text():
    # The brackets are punctuation; "/tag" after a non-word character reads as a path.
    assert [token.text for token in tokenize("⟨ph⟩ ⟨/tag⟩", "en")] == ["⟨", "ph", "⟩", "⟨", "/tag", "⟩"]


@settings(max_examples=80, deadline=None)
@given(st.one_of(ARBITRARY_TEXT, canonical_segments("fr").map(lambda built: built.text)))
def test_fast_paths_change_nothing_but_speed(text):
    # The plain-word and plain-punctuation alternatives claim to accept only what the full alternation
    # would produce; the full alternation alone is the reference.
    for name in ("en", "es", "fr", ""):
        fast = _compile(name)
        full = _compile(name, with_fast_paths=False)
        assert [(m.group(m.lastindex), fast.kinds[m.lastindex]) for m in fast.regex.finditer(text)] == [
            (m.group(m.lastindex), full.kinds[m.lastindex]) for m in full.regex.finditer(text)
        ]
