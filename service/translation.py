"""POST /v1/translations without the HTTP: validated request -> library call -> JSON-ready response.

The time budget. The library call cannot be interrupted from outside without killing the worker, so the
segments are translated one call at a time and the deadline is checked before each: when it has passed, the
request stops with 503 and Retry-After, and the worker is free for the next request. A request can overrun
its budget by at most the time of one segment; gunicorn's worker timeout (``service.gunicorn_config``,
longer than the budget) is the last resort for a segment that never ends.
"""

from __future__ import annotations

import time
from collections.abc import Mapping, Sequence

from decoder.errors import ConfigurationError, InvalidTextError
from decoder.search.features import FEATURE_NAMES, weight_vector
from decoder.search.settings import NBestEntry, SegmentTranslation, TermMode, TranslationOptions
from decoder.terminology.glossary import Glossary
from decoder.text.normalize import check_text
from service import metrics
from service.errors import ApiError
from service.models import LoadedModel

NOTICE = (
    "Machine translation draft: have it reviewed by a qualified translator before publication, above all "
    "for safety, medical, legal or regulatory text."
)


def translation_options(
    loaded: LoadedModel, request: Mapping[str, object], glossaries: Sequence[Glossary] = ()
) -> TranslationOptions:
    """The library options for a validated request and its glossaries (request terms first); the library's
    ConfigurationError becomes 400 on the field at fault."""
    include = set(request["include"])  # type: ignore[arg-type]
    try:
        search = loaded.model.search_defaults.with_overrides(**request["search"])  # type: ignore[arg-type]
    except ConfigurationError as error:
        raise ApiError(400, "invalid_request", str(error), {"search": [str(error)]}) from error
    weights = dict(request["weights"]) or None  # type: ignore[call-overload]
    return TranslationOptions(
        n_best=int(request["n_best"]),
        search=search,
        weights=weights,  # type: ignore[arg-type]
        include_segmentation="segmentation" in include,
        include_alignment="alignment" in include,
        glossaries=tuple(glossaries),
        term_mode=TermMode(str(request["term_mode"])),
    )


def check_segments(segments: Sequence[str]) -> None:
    """400 naming every segment the library would refuse (control characters, line breaks), before any work."""
    problems: dict[str, list[str]] = {}
    for index, segment in enumerate(segments):
        try:
            check_text(segment)
        except InvalidTextError as error:
            problems[f"segments.{index}"] = [str(error)]
    if problems:
        raise ApiError(400, "invalid_text", "Some segments cannot be translated; see fields.", problems)


def _pair(values: Sequence[int] | None) -> list[int] | None:
    return None if values is None else [int(value) for value in values]


def term_items(translation: SegmentTranslation) -> list[dict[str, object]]:
    """The segment's term report (``decoder.terminology.report.TermReportItem`` records) as JSON."""
    terms = translation.terms
    items = getattr(terms, "items", terms)  # a SegmentTermReport or a plain tuple of items
    result = []
    for item in items or ():
        reason = getattr(item, "reason", None)
        result.append(
            {
                "source_span": _pair(item.source_span),
                "source_text": item.source_text,
                "entry_source": item.entry_source,
                "glossary": item.glossary_name,
                "origin": item.origin,
                "mode": str(item.mode),
                "target": item.target,
                "in_output": bool(item.in_output),
                "output_span": _pair(item.output_span),
                "reason": None if reason is None else str(reason),
                "forbidden_in_output": [
                    {"target": target, "output_span": _pair(span)} for target, span in item.forbidden_in_output
                ],
            }
        )
    return result


def _entry(entry: NBestEntry, with_features: bool) -> dict[str, object]:
    body: dict[str, object] = {"text": entry.text, "score": float(entry.score)}
    if with_features:
        body["features"] = {name: float(entry.features[name]) for name in FEATURE_NAMES}
    return body


def segment_result(translation: SegmentTranslation, include: set[str]) -> dict[str, object]:
    best = translation.n_best[0]
    result: dict[str, object] = {
        "source": translation.source,
        "translation": translation.translation,
        "n_best": [_entry(entry, "features" in include) for entry in translation.n_best],
        "terms": term_items(translation),
        "num_pieces": int(translation.num_pieces),
    }
    if "segmentation" in include:
        result["segmentation"] = [
            {
                "source_tokens": list(span.source_tokens),
                "target_tokens": list(span.target_tokens),
                "source_characters": list(span.source_characters),
                "target_characters": list(span.target_characters),
            }
            for span in best.segmentation or ()
        ]
    if "alignment" in include:
        result["alignment"] = [
            {
                "source_token": link.source_token,
                "target_token": link.target_token,
                "source_characters": list(link.source_characters),
                "target_characters": list(link.target_characters),
            }
            for link in best.alignment or ()
        ]
    return result


def translate_request(
    loaded: LoadedModel,
    request: Mapping[str, object],
    glossaries: Sequence[Glossary],
    deadline: float,
    retry_after_seconds: int,
) -> tuple[dict[str, object], list[SegmentTranslation]]:
    """(response body, library results) for a validated request; ``deadline`` is a ``time.monotonic()`` value.

    Raises ApiError 503 (with Retry-After) when the deadline passes before every segment is translated."""
    segments: list[str] = list(request["segments"])  # type: ignore[call-overload]
    check_segments(segments)
    options = translation_options(loaded, request, glossaries)
    try:
        weights = weight_vector(loaded.model.weights, options.weights)
    except ConfigurationError as error:
        raise ApiError(400, "invalid_request", str(error), {"weights": [str(error)]}) from error
    include = set(request["include"])  # type: ignore[arg-type]
    model_id = loaded.model_id
    started = time.perf_counter()
    translations: list[SegmentTranslation] = []
    try:
        for index, segment in enumerate(segments):
            if time.monotonic() >= deadline:
                metrics.BUDGET_EXCEEDED.labels(model_id).inc()
                raise ApiError(
                    503,
                    "time_budget_exceeded",
                    f"The request's time budget ran out after {index} of {len(segments)} segments. "
                    "Retry later or send fewer or shorter segments per request.",
                    headers={"Retry-After": str(retry_after_seconds)},
                )
            translations.extend(loaded.translator.translate([segment], options))
            metrics.SEGMENTS.labels(model_id).inc()
            metrics.WORDS.labels(model_id).inc(len(segment.split()))
    finally:
        metrics.DECODER_SECONDS.labels(model_id).observe(time.perf_counter() - started)
    if len(translations) != len(segments):  # the library's contract: one result per segment
        raise RuntimeError(f"{len(translations)} results for {len(segments)} segments")
    body = {
        "model": model_id,
        "weights": {name: float(value) for name, value in zip(FEATURE_NAMES, weights)},
        "results": [segment_result(translation, include) for translation in translations],
        "notice": NOTICE,
    }
    return body, translations
