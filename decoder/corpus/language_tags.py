"""Matching BCP 47 language tags against a requested language (RFC 4647, section 3.3.1 "Basic Filtering").

A language range matches a tag if, compared case-insensitively, it equals the tag or equals a prefix of the
tag that is followed by "-"; the range "*" matches every tag. So "en" matches "en-US" and "EN-us" but not
"eng", and "de-DE" matches "de-DE-1996" but not "de-Deva" or "de-Latn-DE" (the RFC's example, from memory).
When several tags match, ``match_distance`` ranks them: an exact match first, then the tag with the fewest
subtags beyond the range. Tags found in files may use "_" for "-" (POSIX locale style, common in practice);
it is read as "-".
"""

from __future__ import annotations

import re

from decoder.errors import ConfigurationError

WILDCARD = "*"
# RFC 4647 section 2.1 "basic-language-range": 1*8ALPHA *("-" 1*8alphanum) / "*"
_BASIC_RANGE = re.compile(r"[A-Za-z]{1,8}(?:-[A-Za-z0-9]{1,8})*")


def normalize_tag(tag: str) -> str:
    """Lower-case ``tag`` with "_" read as "-" (matching is case-insensitive, RFC 4647 section 2)."""
    return tag.strip().replace("_", "-").lower()


def check_range(language_range: str) -> str:
    """The normalized range, or ConfigurationError if it is not an RFC 4647 basic language range."""
    if language_range != WILDCARD and not _BASIC_RANGE.fullmatch(language_range.replace("_", "-")):
        raise ConfigurationError(f"{language_range!r} is not a language tag; use a BCP 47 tag such as 'en' or 'pt-BR'")
    return normalize_tag(language_range)


def matches(language_range: str, tag: str) -> bool:
    """True if ``tag`` is selected by ``language_range`` under RFC 4647 Basic Filtering."""
    return match_distance(language_range, tag) is not None


def match_distance(language_range: str, tag: str) -> int | None:
    """None if the range does not match the tag; otherwise how many subtags the tag has beyond the range.

    0 is an exact match; "en" against "en-US" is 1, against "en-US-x-demo" 3. For the wildcard the distance is
    the tag's number of subtags, so more general tags rank first there too."""
    wanted, found = normalize_tag(language_range), normalize_tag(tag)
    if not found:
        return None
    if wanted == WILDCARD:
        return found.count("-") + 1
    if found == wanted:
        return 0
    if found.startswith(wanted + "-"):
        return found[len(wanted) + 1 :].count("-") + 1
    return None


def ranges_overlap(first: str, second: str) -> bool:
    """True if some tag can match both ranges (one of them is "*" or a prefix range of the other)."""
    return matches(first, second) or matches(second, first)
