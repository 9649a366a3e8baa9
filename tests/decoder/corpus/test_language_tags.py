"""BCP 47 matching, RFC 4647 section 3.3.1 "Basic Filtering"."""

from __future__ import annotations

import pytest

from decoder.corpus.language_tags import check_range, match_distance, matches, ranges_overlap
from decoder.errors import ConfigurationError


@pytest.mark.parametrize(
    ("language_range", "tag", "expected"),
    [
        # RFC 4647 section 3.3.1, its own example (from memory): "de-de" matches "de-DE-1996" but not
        # "de-Deva" or "de-Latn-DE".
        ("de-de", "de-DE-1996", True),
        ("de-de", "de-Deva", False),
        ("de-de", "de-Latn-DE", False),
        # Section 3.3.1: the range equals the tag, case-insensitively ...
        ("en", "en", True),
        ("EN-us", "en-US", True),
        # ... or a prefix of it followed by "-" ...
        ("en", "en-US", True),
        ("en", "EN-us", True),
        # ... so a prefix that ends inside a subtag does not match, and a longer range never matches a shorter tag.
        ("en", "eng", False),
        ("en-US", "en", False),
        ("de", "en-DE", False),
        # Section 2.1 / 3.3.1: "*" matches any tag.
        ("*", "pt-BR", True),
        # Our leniency for tags in files (POSIX locale style, common in practice): "_" reads as "-".
        ("en-us", "en_US", True),
    ],
)
def test_basic_filtering(language_range, tag, expected):
    assert matches(language_range, tag) is expected


@pytest.mark.parametrize(
    ("language_range", "tag", "distance"),
    # Hand-derived: 0 for equal tags, else the number of subtags after the range.
    [
        ("en", "en", 0),
        ("en", "en-US", 1),
        ("en", "en-Latn-US", 2),
        ("en-US", "en-us-x-demo", 2),
        ("en", "fr", None),
        ("*", "de-CH", 2),
    ],
)
def test_match_distance_ranks_exact_first(language_range, tag, distance):
    assert match_distance(language_range, tag) == distance


def test_empty_tag_in_a_file_matches_nothing():
    assert match_distance("*", "") is None


@pytest.mark.parametrize(
    ("first", "second", "expected"),
    [("en", "de", False), ("en-US", "en-GB", False), ("en", "en-GB", True), ("de-CH", "de", True), ("*", "fr", True)],
)
def test_ranges_overlap(first, second, expected):
    assert ranges_overlap(first, second) is expected


@pytest.mark.parametrize("bad", ["", "e n", "toolongtag", "-en", "en--US", "de-", "12"])
def test_check_range_rejects_non_ranges(bad):
    # RFC 4647 section 2.1 basic-language-range: 1*8ALPHA *("-" 1*8alphanum) / "*"
    with pytest.raises(ConfigurationError, match="is not a language tag"):
        check_range(bad)


def test_check_range_normalizes():
    assert [check_range("pt_BR"), check_range("EN-us"), check_range("*")] == ["pt-br", "en-us", "*"]
