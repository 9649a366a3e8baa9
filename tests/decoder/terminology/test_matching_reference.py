"""Both matching kernels against a brute-force matcher written here from the rules in the module docstrings
(units.py: hyphen splitting and token boundaries; index.py: plural tolerance; matching.py: longest, then
leftmost, then case-sensitive, then entry order), on random segments and glossaries.
"""

import re

from hypothesis import given, settings
from hypothesis import strategies as st

from decoder.terminology.matching import match_terms_batch
from decoder.terminology.store import glossary_from_rows
from decoder.text.pipeline import prepare_segment

# Few words, so that terms overlap and nest often; "u" is shorter than MIN_STEM_CHARACTERS, "42" is a number
# (protected in segments, unmatchable in terms), "time-line" exercises hyphen splitting.
TERM_WORDS = ["sync", "hub", "Sync", "view", "box", "u", "time-line", "time", "line", "-", "42"]
OTHER_WORDS = [",", "{0}", "views", "boxes", "us", "Hub"]


def reference_units(token_texts, protected_positions):
    """(unit, token index, starts token, ends token, is word) for each unit, by the rules of units.py."""
    out = []
    for position, text in enumerate(token_texts):
        if position in protected_positions:
            out.append((None, position, True, True, False))
            continue
        parts = [p for p in re.split(r"(-)", text) if p] if re.search(r"\w-\w", text) else [text]
        for k, part in enumerate(parts):
            out.append((part, position, k == 0, k == len(parts) - 1, part != "-" and part[0].isalnum()))
    return out


def reference_unit_matches(segment_unit, term_unit, case_sensitive, inflection):
    if segment_unit[0] is None:
        return False
    if case_sensitive:
        a, b = segment_unit[0], term_unit[0]
    else:
        a, b = segment_unit[0].casefold(), term_unit[0].casefold()
    if a == b:
        return True
    # Plural tolerance: case-insensitive, a word piece ending its token on both sides, stem of 3+ characters.
    plural_ok = inflection and not case_sensitive and term_unit[3] and term_unit[4] and len(b) >= 3
    return plural_ok and segment_unit[3] and a in (b + "s", b + "es")


def reference_matches(tokens, protected, terms, inflection):
    """Brute force from the documented rules: every entry at every unit, units compared one by one."""
    segment = reference_units([t.text for t in tokens], protected)
    candidates = []
    for entry_index, (source, case_sensitive) in enumerate(terms):
        term_tokens = prepare_segment(source, "en").tokens
        numbers = {position for position, token in enumerate(term_tokens) if token.kind.value == "number"}
        term = reference_units([t.text for t in term_tokens], numbers)
        if any(unit[0] is None for unit in term):
            continue
        for start in range(len(segment)):
            window = segment[start : start + len(term)]
            if len(window) < len(term) or not window[0][2] or not window[-1][3]:
                continue
            if all(reference_unit_matches(s, t, case_sensitive, inflection) for s, t in zip(window, term)):
                candidates.append((-len(term), window[0][1], not case_sensitive, entry_index, window[-1][1] + 1))
    chosen, covered = [], set()
    for _length, first, _case_insensitive, entry_index, end in sorted(candidates):  # longest, leftmost, ...
        if covered.isdisjoint(range(first, end)):
            covered.update(range(first, end))
            chosen.append((first, end, entry_index))
    return sorted(chosen)


@settings(max_examples=200, deadline=None)
@given(
    data=st.data(),
    terms=st.lists(
        st.tuples(st.lists(st.sampled_from(TERM_WORDS), min_size=1, max_size=3), st.booleans()),
        min_size=1,
        max_size=6,
    ),
    inflection=st.booleans(),
)
def test_both_matchers_agree_with_brute_force(data, terms, inflection):
    sources = []
    for words, case_sensitive in terms:
        source = " ".join(words)
        if (source if case_sensitive else source.casefold(), case_sensitive) not in {
            (s if c else s.casefold(), c) for s, c in sources
        }:
            sources.append((source, case_sensitive))
    # Segments are built from the terms themselves (also with a plural ending, in capitals, or with the
    # spacing around hyphens changed) and other words, so most examples hold matches, overlaps and near misses.
    pieces = [source + ending for source, _ in sources for ending in ("", "s", "es")]
    pieces += [source.upper() for source, _ in sources]
    pieces += [source.replace("-", " - ") for source, _ in sources if "-" in source]
    pieces += TERM_WORDS + OTHER_WORDS + ["time - line"]
    segment = data.draw(st.lists(st.sampled_from(pieces), max_size=8))
    rows = [{"source": s, "target": "x", "case_sensitive": c} for s, c in sources]
    terms_glossary = glossary_from_rows("g", rows, "en", "es")
    prepared = prepare_segment(" ".join(segment), "en")
    protected = {original.position for original in prepared.protected.originals}
    expected = reference_matches(prepared.tokens, protected, sources, inflection)
    for vectorised in (False, True):  # the plain and the numpy kernel
        (result,) = match_terms_batch([prepared], [terms_glossary], inflection, vectorised=vectorised)
        got = sorted((m.token_span.start, m.token_span.end, m.entry_index) for m in result.matches)
        assert got == expected, f"vectorised={vectorised}"
