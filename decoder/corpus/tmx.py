"""Translation memories in TMX 1.4 (LISA/GALA TMX 1.4b, an open standard), read as a stream of pairs.

Structure used: ``<tmx><header .../><body><tu><tuv xml:lang="en-US"><seg>text</seg></tuv>...</tu>...``. Each
``<tu>`` (translation unit) holds one ``<tuv>`` (variant) per language. The language of a variant is its
``xml:lang`` attribute, or ``lang`` in files written to TMX 1.1-1.3.

Choosing the pair. The requested source and target languages are RFC 4647 basic language ranges (see
``language_tags``): "en" selects "en-US" and "EN-us". If several variants of a unit match one side, the exact
match wins, then the tag with the fewest extra subtags, then the first in the file. A unit that has no variant
for one of the sides is skipped and counted (``SkipReason.MISSING_SOURCE_LANGUAGE`` when the source is
missing, whether or not the target is; otherwise ``MISSING_TARGET_LANGUAGE``).

Inline markup in ``<seg>``. TMX marks formatting codes of the original document with ``<bpt>``/``<ept>``
(paired begin/end), ``<it>`` (isolated), ``<ph>`` (placeholder) and ``<ut>`` (unknown); their content is the
native code (for example ``<b>`` or an RTF control word), not text, so it is dropped, including any ``<sub>``
sub-flow inside it (a sub-flow is separate text, such as a tooltip, that would not read as part of this
sentence). ``<hi>`` (highlight) wraps real text, so its text is kept and only the tag is removed. Elements TMX
does not define are treated like ``<hi>`` (text kept) rather than failing a memory on a vendor extension.
Text outside markup, including character entities (``&amp;`` -> "&"), is kept exactly; whitespace is not
normalised here.

Memory. ``xml.etree.ElementTree.iterparse`` delivers each ``<tu>`` when it is complete; it is removed from the
tree right after, so memory stays constant however long the file. Malformed XML raises InputFileError with the
parser's line number; a structural problem inside a unit names the unit (``<tu> #7``, 1-based), since
ElementTree records no line numbers for elements. Entity expansion is bounded by expat (2.4.1 and later refuse
"billion laughs" documents) and ElementTree never fetches external entities.
"""

from __future__ import annotations

import xml.etree.ElementTree as ElementTree
from collections import Counter
from collections.abc import Iterator
from pathlib import Path

from decoder.corpus.language_tags import check_range, match_distance, ranges_overlap
from decoder.corpus.records import CorpusReader, RawPair, SkipReason, open_binary
from decoder.errors import ConfigurationError, InputFileError

XML_LANG = "{http://www.w3.org/XML/1998/namespace}lang"
LEGACY_LANG = "lang"  # TMX 1.1-1.3 attribute name, replaced by xml:lang in 1.4
NATIVE_CODE_TAGS = frozenset({"bpt", "ept", "it", "ph", "ut"})


def read_tmx(path: str | Path, source_language: str, target_language: str) -> CorpusReader:
    """Pairs (source segment, target segment) of every unit that has both languages, located as
    ``"<file name>:<tu> #k"``.

    Raises ConfigurationError at once if a language is not a BCP 47 range or if the two ranges could select
    the same variant (for example "en" and "en-GB"), because then a unit's pair would be ambiguous."""
    path = Path(path)
    source_range, target_range = check_range(source_language), check_range(target_language)
    if ranges_overlap(source_range, target_range):
        raise ConfigurationError(
            f"source language {source_language!r} and target language {target_language!r} overlap; "
            "give two languages that no single tag can match, such as 'en' and 'de'"
        )

    def generate(skipped: Counter[SkipReason]) -> Iterator[RawPair]:
        for number, unit in _iter_units(path):
            variants = _variants(path, number, unit)
            source = _best_variant(variants, source_range)
            target = _best_variant(variants, target_range)
            if source is None:
                skipped[SkipReason.MISSING_SOURCE_LANGUAGE] += 1
            elif target is None:
                skipped[SkipReason.MISSING_TARGET_LANGUAGE] += 1
            else:
                yield RawPair(source, target, f"{path.name}:<tu> #{number}")

    return CorpusReader(generate)


def _iter_units(path: Path) -> Iterator[tuple[int, ElementTree.Element]]:
    """Each complete ``<tu>`` with its 1-based number; the element is detached from the tree afterwards."""
    with open_binary(path) as file:
        events = ElementTree.iterparse(file, events=("start", "end"))
        open_elements: list[ElementTree.Element] = []  # path from the root to the element being parsed
        number = 0
        try:
            for event, element in events:
                if event == "start":
                    if not open_elements and element.tag != "tmx":
                        raise InputFileError(path, f"not a TMX file: the root element is <{element.tag}>", 1)
                    open_elements.append(element)
                    continue
                open_elements.pop()
                if element.tag == "tu":
                    number += 1
                    yield number, element
                    # Detach the finished unit from its parent (<body>) so the tree never grows. remove() is
                    # cheap: the parent holds at most this unit and the next one the parser has started.
                    element.clear()
                    open_elements[-1].remove(element)
        except ElementTree.ParseError as error:
            line, _column = error.position
            raise InputFileError(path, f"malformed XML: {error.msg}", line) from error


def _variants(path: Path, number: int, unit: ElementTree.Element) -> list[tuple[str, str]]:
    """(language tag, segment text) of each ``<tuv>`` of a unit, in file order."""
    variants = []
    for variant in unit.iterfind("tuv"):
        tag = variant.get(XML_LANG) or variant.get(LEGACY_LANG)
        if not tag:
            raise InputFileError(path, "a <tuv> has no xml:lang attribute", f"<tu> #{number}")
        segment = variant.find("seg")
        if segment is None:
            raise InputFileError(path, f"the <tuv xml:lang={tag!r}> has no <seg>", f"<tu> #{number}")
        variants.append((tag, segment_text(segment)))
    return variants


def _best_variant(variants: list[tuple[str, str]], language_range: str) -> str | None:
    """Text of the variant the range selects (exact, then fewest extra subtags, then first), or None."""
    best_text, best_distance = None, None
    for tag, text in variants:
        distance = match_distance(language_range, tag)
        if distance is not None and (best_distance is None or distance < best_distance):
            best_text, best_distance = text, distance
    return best_text


def segment_text(segment: ElementTree.Element) -> str:
    """The text of a ``<seg>``: character data and ``<hi>`` text kept, native-code elements dropped."""
    parts = [segment.text or ""]
    for child in segment:
        _append_inline(child, parts)
    return "".join(parts)


def _append_inline(element: ElementTree.Element, parts: list[str]) -> None:
    if element.tag not in NATIVE_CODE_TAGS:
        parts.append(element.text or "")
        for child in element:
            _append_inline(child, parts)
    parts.append(element.tail or "")  # the text after the element belongs to the segment either way
