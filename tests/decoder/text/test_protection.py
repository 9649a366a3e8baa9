from collections import Counter

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from decoder.text.protection import (
    CLASS_TOKENS,
    CLOSING_TAG,
    EMAIL,
    EMPTY_TAG,
    NUMBER,
    OPENING_TAG,
    PATH,
    PLACEHOLDER,
    URL,
    ProtectedToken,
    protect,
    restore,
)
from decoder.text.tokenizer import tokenize


def protected(text: str, language: str = "en"):
    return protect(tokenize(text, language))


def test_every_protected_kind_gets_its_class_token():
    segment = protected(
        'Copy %d files ({0}) from /opt/zentrix to <a href="https://x.example">https://x.example/b</a>, '
        "mail ana@zentrix.example<br/> with --force"
    )
    assert segment.tokens == (
        "Copy", PLACEHOLDER, "files", "(", PLACEHOLDER, ")", "from", PATH, "to", OPENING_TAG, URL, CLOSING_TAG,
        ",", "mail", EMAIL, EMPTY_TAG, "with", "--force",
    )  # fmt: skip
    # Positions counted by hand in the token list above.
    assert segment.originals == (
        ProtectedToken(1, PLACEHOLDER, "%d"),
        ProtectedToken(4, PLACEHOLDER, "{0}"),
        ProtectedToken(7, PATH, "/opt/zentrix"),
        ProtectedToken(9, OPENING_TAG, '<a href="https://x.example">'),
        ProtectedToken(10, URL, "https://x.example/b"),
        ProtectedToken(11, CLOSING_TAG, "</a>"),
        ProtectedToken(14, EMAIL, "ana@zentrix.example"),
        ProtectedToken(15, EMPTY_TAG, "<br/>"),
    )


def test_numbers_are_protected_and_words_with_digits_are_not():
    assert protected("Version 10px has 1,234.5 MB").tokens == ("Version", "10px", "has", NUMBER, "MB")


def test_restore_without_positions_assigns_in_order_per_class():
    segment = protected("Copy %s to %d in {0}")
    # A model output that kept the order of the placeholders.
    output = ["copiar", PLACEHOLDER, "a", PLACEHOLDER, "en", PLACEHOLDER]
    restored = restore(output, segment)
    assert restored == ["copiar", "%s", "a", "%d", "en", "{0}"]
    assert (restored.num_dropped, restored.missing) == (0, ())


def test_restore_follows_source_positions_when_the_output_reorders():
    segment = protected("Move {0} to {1}")  # tokens: Move {0} to {1} -> {0} at 1, {1} at 3
    output = [PLACEHOLDER, "nach", PLACEHOLDER, "verschieben"]
    # The decoder says output 0 came from source position 3 and output 2 from position 1.
    assert restore(output, segment, source_positions=[3, 0, 1, 0]) == ["{1}", "nach", "{0}", "verschieben"]
    # Without positions, the k-th placeholder gets the k-th original instead.
    assert restore(output, segment) == ["{0}", "nach", "{1}", "verschieben"]


def test_positions_pointing_at_another_class_fall_back_to_order():
    segment = protected("See https://x.example for %s")  # URL at 1, %s at 3
    # Output 0 claims to come from the URL's position, but is a placeholder: it takes the next placeholder.
    assert restore([PLACEHOLDER, URL], segment, source_positions=[1, None]) == ["%s", "https://x.example"]


def test_position_used_twice_does_not_duplicate_the_original():
    segment = protected("Between %s and %s")  # %s at 1 and 3
    restored = restore([PLACEHOLDER, PLACEHOLDER], segment, source_positions=[1, 1])
    assert restored == ["%s", "%s"]
    assert restored.num_dropped == 0 and restored.missing == ()


def test_surplus_class_tokens_are_dropped_and_counted():
    segment = protected("Delete %s")
    restored = restore(["borrar", PLACEHOLDER, PLACEHOLDER, NUMBER], segment)
    assert restored == ["borrar", "%s"]
    assert restored.num_dropped == 2
    assert restored.missing == ()


def test_originals_left_over_are_reported_missing():
    segment = protected("Copy %s to %d at 10:30")
    restored = restore(["copiar", PLACEHOLDER], segment)
    assert restored == ["copiar", "%s"]
    assert restored.missing == (ProtectedToken(3, PLACEHOLDER, "%d"), ProtectedToken(5, NUMBER, "10:30"))


def test_closing_tag_never_takes_the_place_of_an_opening_tag():
    segment = protected("<b>Save</b> now")
    # Even with the closing class first in the output, each class keeps its own originals.
    assert restore([CLOSING_TAG, "x", OPENING_TAG], segment) == ["</b>", "x", "<b>"]


def test_positions_must_match_the_output_length():
    with pytest.raises(ValueError, match="2 source positions for 3 output tokens"):
        restore(["a", "b", "c"], protected("a b c"), source_positions=[0, 1])


SOURCE_TEXTS = st.lists(
    st.sampled_from(["%s", "%1$d", "{0}", "{name}", "12", "3.5%", "<b>", "</b>", "<br/>", "/tmp/x", "word", "the"]),
    min_size=1,
    max_size=10,
)


@settings(max_examples=60, deadline=None)
@given(SOURCE_TEXTS, st.randoms(use_true_random=False))
def test_any_reordering_with_positions_restores_the_permuted_originals(texts, random):
    segment = protected(" ".join(texts))
    order = list(range(len(segment.tokens)))
    random.shuffle(order)
    output = [segment.tokens[index] for index in order]
    # Expected: the input texts in the shuffled order, straight from the construction.
    assert restore(output, segment, source_positions=order) == [texts[index] for index in order]


@settings(max_examples=60, deadline=None)
@given(SOURCE_TEXTS, st.lists(st.sampled_from(sorted(CLASS_TOKENS) + ["x"]), max_size=12))
def test_nothing_is_lost_or_duplicated_silently(texts, output):
    segment = protected(" ".join(texts))
    restored = restore(output, segment)
    originals = Counter(original.text for original in segment.originals)
    placed = Counter(restored) - Counter(token for token in output if token not in CLASS_TOKENS)
    missing = Counter(original.text for original in restored.missing)
    # Every original is either placed once or reported missing; every class token is placed or counted.
    assert placed + missing == originals
    assert sum(placed.values()) + restored.num_dropped == sum(token in CLASS_TOKENS for token in output)
