"""Term accuracy of a test set: the share of glossary-term occurrences in the sources whose target appears in
the output.

This is the exact-match term usage rate of the terminology-evaluation literature (Dinu et al. 2019, "Training
Neural Machine Translation to Apply Terminology Constraints", ACL: "Term%", the percentage of term
annotations whose target term is generated in the output; definition from memory). Here the annotations are the glossary
matches ``match_terms`` chooses (longest-leftmost, non-overlapping), and counting is one-to-one: each source
occurrence counts once, and one output occurrence satisfies at most one source occurrence, so a source with
"backup" twice needs "copia de seguridad" twice in its output (``report.assign_occurrences``). Any allowed
target (preferred or admitted) counts as correct; matching in the output follows ``report.find_in_output``
(token boundaries; case ignored unless the entry is case-sensitive). Not counted: entries with no allowed
target, and entries whose own mode is ``off``.
"""

from __future__ import annotations

from collections.abc import Sequence
from dataclasses import dataclass

from decoder.errors import ConfigurationError
from decoder.terminology.glossary import Glossary, TermMode
from decoder.terminology.matching import match_terms_batch
from decoder.terminology.report import assign_occurrences
from decoder.text.languages import primary_subtag
from decoder.text.pipeline import prepare_segment


@dataclass(frozen=True, slots=True)
class TermAccuracy:
    num_terms: int  # source term occurrences counted
    num_correct: int  # of those, how many have an allowed target in the output
    rate: float | None  # num_correct / num_terms; None when there is no term to count

    def __str__(self) -> str:
        rate = "n/a" if self.rate is None else f"{100 * self.rate:.1f}%"
        return f"term accuracy {rate} ({self.num_correct}/{self.num_terms})"


def term_accuracy(
    sources: Sequence[str],
    outputs: Sequence[str],
    glossaries: Sequence[Glossary],
    source_language: str,
    target_language: str,
    inflection_tolerance: bool = False,
) -> TermAccuracy:
    """Term accuracy of ``outputs`` (detokenized translations, one per source segment, same order).

    Raises ValueError if the two lists differ in length and ConfigurationError if a glossary is for another
    language pair (compared by primary language subtag)."""
    if len(sources) != len(outputs):
        raise ValueError(f"{len(sources)} source segments but {len(outputs)} outputs; give one output per source")
    for glossary in glossaries:
        if primary_subtag(glossary.target_language) != primary_subtag(target_language):
            raise ConfigurationError(
                f"glossary {glossary.name!r} is for target language {glossary.target_language!r}, "
                f"not {target_language!r}"
            )
    prepared = [prepare_segment(source, source_language) for source in sources]
    results = match_terms_batch(prepared, glossaries, inflection_tolerance)
    num_terms = num_correct = 0
    for result, output in zip(results, outputs):
        counted = [match for match in result.matches if match.allowed_targets and match.entry.mode is not TermMode.OFF]
        given = assign_occurrences(
            [match.allowed_targets for match in counted],
            [match.entry.case_sensitive for match in counted],
            output,
        )
        num_terms += len(counted)
        num_correct += sum(found is not None for found in given)
    return TermAccuracy(num_terms, num_correct, num_correct / num_terms if num_terms else None)
