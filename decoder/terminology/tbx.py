"""Glossaries in TBX, TermBase eXchange (ISO 30042:2019; and the 2008 edition's ``martif`` form), streamed.

Structure read (element names from memory of ISO 30042 and the TBX-Basic dialect description; checked against
the dialect's published examples):

    <tbx> / <text> / <body> / <conceptEntry id=...> / <langSec xml:lang=...> / <termSec> / <term>
    legacy: <martif> / <text> / <body> / <termEntry> / <langSet xml:lang=...> / <tig> or <ntig><termGrp> / <term>

A term's data categories are read in either TBX style: DCA, ``<termNote type="administrativeStatus">``, or DCT,
a namespaced element such as ``<min:administrativeStatus>``; namespaces are ignored throughout, so TBX v2
(``urn:iso:std:iso:30042:ed-2``), v3 (``ed:3.0``) and files without a namespace all read alike.

Mapping to entries. Language sections are chosen by primary language subtag (RFC 5646 section 2.2.1), so a
request for "en" reads ``xml:lang="en-US"``; if a concept has a section whose whole tag equals the requested
tag, only such sections are read. Every source-language term of a concept becomes an entry, whatever its own
status (a deprecated source term still says which target to use), with all target-language terms of the
concept as alternatives. The administrative status (preferredTerm-admn-sts, admittedTerm-admn-sts,
deprecatedTerm-admn-sts, supersededTerm-admn-sts; also "preferred", "admitted", "deprecated", "superseded")
becomes the target's status; a term without one is preferred. TBX has no case-sensitivity data category: a
source term is case-sensitive if its termType is acronym or abbreviation (their casing is what distinguishes
them, as "IT" from "it"; common practice) or its partOfSpeech is properNoun (a value of the full TBX data
category set, not of TBX-Basic, from memory). The note is the source term's ``<note>``, else the definition
of its language section, else the concept's definition.

Skipped with a warning naming the concept: concepts without a term in the source or target language, and
language sections without ``xml:lang``. Malformed XML raises InvalidGlossaryError with the parser's line;
problems inside a concept name the concept (``<conceptEntry id='c7'>``, or ``<conceptEntry> #7`` without an
id), since ElementTree records no line numbers for elements. Each concept is removed from the tree once read,
so memory stays flat however large the file.
"""

from __future__ import annotations

import xml.etree.ElementTree as ElementTree
from collections.abc import Iterator
from dataclasses import dataclass
from pathlib import Path

from decoder.errors import ConfigurationError
from decoder.terminology.building import GlossaryBuilder
from decoder.terminology.glossary import MAX_FILE_BYTES, Glossary, TermStatus, WarningKind, parse_status
from decoder.text.languages import primary_subtag

XML_LANG = "{http://www.w3.org/XML/1998/namespace}lang"
ROOT_ELEMENTS = frozenset({"tbx", "martif"})
CONCEPT_ELEMENTS = frozenset({"conceptEntry", "termEntry"})
LANGUAGE_ELEMENTS = frozenset({"langSec", "langSet"})
TERM_ELEMENTS = frozenset({"termSec", "tig", "ntig"})
CASE_SENSITIVE_TERM_TYPES = frozenset({"acronym", "abbreviation"})
CASE_SENSITIVE_PARTS_OF_SPEECH = frozenset({"properNoun"})


@dataclass(frozen=True, slots=True)
class _Term:
    text: str
    status: str  # raw administrativeStatus value, "" if none
    term_type: str
    part_of_speech: str
    note: str


def _local(tag: str) -> str:
    """Element name without its namespace: "{urn:iso:std:iso:30042:ed:3.0}termSec" -> "termSec"."""
    return tag.rsplit("}", 1)[-1]


def _text(element: ElementTree.Element) -> str:
    return "".join(element.itertext())


def read_tbx_glossary(
    path: str | Path, source_language: str, target_language: str, name: str | None = None
) -> Glossary:
    """The glossary of every concept of ``path`` that has terms in both languages (file stem as name).

    Raises ConfigurationError if the two languages share a primary subtag (the sections could not be told
    apart) and InvalidGlossaryError for malformed XML, a root other than <tbx>/<martif>, an empty term, an
    unknown administrative status and the size limits."""
    path = Path(path)
    source_primary, target_primary = primary_subtag(source_language), primary_subtag(target_language)
    if source_primary == target_primary:
        raise ConfigurationError(
            f"source language {source_language!r} and target language {target_language!r} have the same "
            "primary language; TBX language sections are chosen by primary language"
        )
    builder = GlossaryBuilder(path)
    for number, concept in _iter_concepts(path, builder):
        label = _concept_label(concept, number)
        origin = f"{path.name}:{label}"
        sections = _language_sections(concept, builder, origin)
        source_terms = _terms_of(sections, source_language)
        target_terms = _terms_of(sections, target_language)
        if not source_terms or not target_terms:
            missing = source_language if not source_terms else target_language
            builder.warn(WarningKind.SKIPPED, origin, f"concept has no {missing!r} term; skipped")
            continue
        targets = [(term, _status(term, builder, label)) for term in target_terms]
        concept_definition = _definition(concept)
        for source in source_terms:
            case_sensitive = (
                source.term_type in CASE_SENSITIVE_TERM_TYPES or source.part_of_speech in CASE_SENSITIVE_PARTS_OF_SPEECH
            )
            _status(source, builder, label)  # validated, not used: a deprecated source term still matches
            note = source.note or _section_definition(sections, source_language) or concept_definition
            for target, status in targets:
                builder.add(
                    source.text,
                    target.text,
                    status,
                    case_sensitive=case_sensitive,
                    note=note,
                    target_note=target.note,
                    origin=origin,
                    location=label,
                    group=origin,
                )
    return builder.build(path.stem if name is None else name, source_language, target_language)


def _iter_concepts(path: Path, builder: GlossaryBuilder) -> Iterator[tuple[int, ElementTree.Element]]:
    """Each complete concept element with its 1-based number; detached from the tree after the caller's turn."""
    try:
        size = path.stat().st_size
    except OSError as error:
        raise builder.fail(f"cannot be opened: {error.strerror or error}", None) from error
    if size > MAX_FILE_BYTES:
        raise builder.fail(f"file has {size} bytes; the limit is {MAX_FILE_BYTES}", None)
    try:
        file = open(path, "rb")
    except OSError as error:
        raise builder.fail(f"cannot be opened: {error.strerror or error}", None) from error
    with file:
        open_elements: list[ElementTree.Element] = []
        number = 0
        try:
            for event, element in ElementTree.iterparse(file, events=("start", "end")):
                if event == "start":
                    if not open_elements and _local(element.tag) not in ROOT_ELEMENTS:
                        raise builder.fail(f"not a TBX file: the root element is <{_local(element.tag)}>", 1)
                    open_elements.append(element)
                    continue
                open_elements.pop()
                if _local(element.tag) in CONCEPT_ELEMENTS:
                    number += 1
                    yield number, element
                    element.clear()
                    if open_elements:
                        open_elements[-1].remove(element)
        except ElementTree.ParseError as error:
            line, _column = error.position
            raise builder.fail(f"malformed XML: {error.msg}", line) from error


def _concept_label(concept: ElementTree.Element, number: int) -> str:
    identifier = concept.get("id")
    name = _local(concept.tag)
    return f"<{name} id={identifier!r}>" if identifier else f"<{name}> #{number}"


def _language_sections(
    concept: ElementTree.Element, builder: GlossaryBuilder, origin: str
) -> list[tuple[str, ElementTree.Element]]:
    sections = []
    for child in concept:
        if _local(child.tag) not in LANGUAGE_ELEMENTS:
            continue
        tag = child.get(XML_LANG) or child.get("lang")
        if not tag:
            builder.warn(WarningKind.SKIPPED, origin, f"a <{_local(child.tag)}> has no xml:lang; skipped")
            continue
        sections.append((tag, child))
    return sections


def _chosen_sections(sections: list[tuple[str, ElementTree.Element]], language: str) -> list[ElementTree.Element]:
    """Sections of ``language``'s primary subtag; only exact tag matches if the concept has any."""
    wanted = language.strip().replace("_", "-").lower()
    primary = primary_subtag(language)
    same_language = [(tag, section) for tag, section in sections if primary_subtag(tag) == primary]
    exact = [section for tag, section in same_language if tag.strip().replace("_", "-").lower() == wanted]
    return exact or [section for _tag, section in same_language]


def _terms_of(sections: list[tuple[str, ElementTree.Element]], language: str) -> list[_Term]:
    terms = []
    for section in _chosen_sections(sections, language):
        for child in section:
            if _local(child.tag) in TERM_ELEMENTS:
                terms.append(_read_term(child))
    return terms


def _read_term(term_section: ElementTree.Element) -> _Term:
    text = ""
    categories: dict[str, str] = {}
    for element in term_section.iter():
        name = _local(element.tag)
        if name == "term" and not text:
            text = _text(element)
        elif name == "termNote" and element.get("type"):  # DCA style
            categories.setdefault(element.get("type", ""), _text(element).strip())
        elif name in ("administrativeStatus", "termType", "partOfSpeech"):  # DCT style
            categories.setdefault(name, _text(element).strip())
    notes = [_text(child).strip() for child in term_section if _local(child.tag) == "note"]
    return _Term(
        text,
        categories.get("administrativeStatus", ""),
        categories.get("termType", ""),
        categories.get("partOfSpeech", ""),
        " ".join(note for note in notes if note),
    )


def _status(term: _Term, builder: GlossaryBuilder, label: str) -> TermStatus:
    status = parse_status(term.status)
    if status is None:
        raise builder.fail(
            f"unknown administrative status {term.status!r} for term {term.text!r}; use preferredTerm-admn-sts, "
            "admittedTerm-admn-sts, deprecatedTerm-admn-sts or supersededTerm-admn-sts",
            label,
        )
    return status


def _definition(element: ElementTree.Element) -> str:
    """The first definition directly under ``element`` or in one of its <descripGrp> children, or ""."""
    for child in element:
        name = _local(child.tag)
        candidates = list(child) if name == "descripGrp" else [child]
        for candidate in candidates:
            candidate_name = _local(candidate.tag)
            if (candidate_name == "descrip" and candidate.get("type") == "definition") or (
                candidate_name == "definition"
            ):
                return _text(candidate).strip()
    return ""


def _section_definition(sections: list[tuple[str, ElementTree.Element]], language: str) -> str:
    """The definition given in the first section of ``language`` that has one, or ""."""
    for section in _chosen_sections(sections, language):
        definition = _definition(section)
        if definition:
            return definition
    return ""
