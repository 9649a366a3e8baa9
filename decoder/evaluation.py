"""`phrasework evaluate`: translate a test set and measure what came out.

BLEU (Papineni et al. 2002) and chrF (Popović 2015) are computed by sacrebleu on the detokenized output, with
sacrebleu's signature so that numbers are comparable elsewhere; placeholder preservation is the share of lines
whose placeholders, tags, URLs, e-mail addresses and paths come out exactly as in the source (as multisets);
speed is segments per second of the whole translation step. With glossaries, term accuracy is the share of
glossary-term occurrences in the source whose target term appears in the output, by exact match, as in the
terminology evaluations of the literature (e.g. Dinu et al. 2019, "Training neural machine translation to
apply terminology constraints").
"""

from __future__ import annotations

import time
from collections import Counter
from collections.abc import Sequence
from dataclasses import asdict, dataclass
from pathlib import Path

from decoder.batch_translation import translate_all, use_translator
from decoder.executor import make_executor
from decoder.search.settings import TranslationOptions
from decoder.search.translator import Translator
from decoder.terminology import term_accuracy
from decoder.text.tokenizer import TokenKind, tokenize
from decoder.translation_model import load_translation_model

PROTECTED_KINDS = frozenset({TokenKind.PRINTF, TokenKind.BRACE, TokenKind.TAG, TokenKind.URL, TokenKind.EMAIL,
                             TokenKind.PATH})


@dataclass(frozen=True, slots=True)
class EvaluationReport:
    num_segments: int
    bleu: float
    bleu_signature: str
    chrf: float
    chrf_signature: str
    placeholder_preservation: float  # share of lines, 0..1
    segments_per_second: float
    seconds: float
    term_accuracy: float | None = None  # share of glossary-term occurrences whose target is in the output
    num_terms: int = 0

    def to_dict(self) -> dict:
        return asdict(self)

    def lines(self) -> list[str]:
        return [f"segments: {self.num_segments}",
                f"BLEU: {self.bleu:.2f} ({self.bleu_signature})",
                f"chrF: {self.chrf:.2f} ({self.chrf_signature})",
                f"placeholders preserved exactly: {100 * self.placeholder_preservation:.1f}% of lines",
                f"speed: {self.segments_per_second:.1f} segments/s ({self.seconds:.1f} s)"] + (
                   [f"term accuracy: {100 * self.term_accuracy:.1f}% of {self.num_terms} term occurrences"]
                   if self.term_accuracy is not None else [])


def protected_multiset(text: str, language: str) -> Counter[str]:
    return Counter(token.text for token in tokenize(text, language) if token.kind in PROTECTED_KINDS)


def placeholder_preservation(sources: Sequence[str], outputs: Sequence[str], source_language: str,
                             target_language: str) -> float:
    """Share of lines whose protected tokens (placeholders, tags, URLs, e-mails, paths) match the source's."""
    if not sources:
        return 1.0
    kept = sum(protected_multiset(source, source_language) == protected_multiset(output, target_language)
               for source, output in zip(sources, outputs, strict=True))
    return kept / len(sources)


def evaluate_model(model_dir: str | Path, sources: Sequence[str], references: Sequence[str], *, workers: int = 1,
                   options: TranslationOptions = TranslationOptions()) -> EvaluationReport:
    import sacrebleu

    if len(sources) != len(references):
        raise ValueError(f"{len(sources)} source lines but {len(references)} reference lines")
    model = load_translation_model(model_dir)
    use_translator(Translator(model))
    executor = make_executor(workers)
    try:
        started = time.perf_counter()
        outputs = [result.translation for result in translate_all(list(sources), options, executor)]
        seconds = time.perf_counter() - started
    finally:
        executor.close()
    terms = None
    if options.glossaries:
        terms = term_accuracy(sources, outputs, options.glossaries, model.source_language, model.target_language,
                              options.inflection_tolerance)
    bleu_metric, chrf_metric = sacrebleu.BLEU(), sacrebleu.CHRF()
    bleu = bleu_metric.corpus_score(outputs, [list(references)])
    chrf = chrf_metric.corpus_score(outputs, [list(references)])
    return EvaluationReport(
        len(sources), bleu.score, str(bleu_metric.get_signature()), chrf.score, str(chrf_metric.get_signature()),
        placeholder_preservation(sources, outputs, model.source_language, model.target_language),
        len(sources) / seconds if seconds > 0 else float("inf"), seconds,
        terms.rate if terms is not None else None, terms.num_terms if terms is not None else 0)
