"""POST /v1/translations."""

from __future__ import annotations

import time

from flask import Blueprint, Response, g, jsonify

from decoder.terminology.glossary import Glossary
from service.auth import SCOPE_TRANSLATE
from service.context import json_body, requires, services
from service.translation import translate_request

blueprint = Blueprint("translations", __name__)
INLINE_GLOSSARY_NAME = "request-terms"


@blueprint.post("/v1/translations")
@requires(SCOPE_TRANSLATE)
def create_translations() -> Response:
    context = services()
    body = json_body(context.translation_schema)
    loaded = context.models.resolve(body.get("model"))
    source_language, target_language = loaded.model.source_language, loaded.model.target_language
    glossaries: list[Glossary] = []
    if body["terms"]:
        # The request's own terms come first: they win overlaps against the named glossaries.
        glossaries.append(
            context.catalog.parse_rows(
                INLINE_GLOSSARY_NAME, body["terms"], source_language, target_language, label="terms"
            )
        )
    for name in dict.fromkeys(body["glossaries"]):
        glossaries.append(context.catalog.get(name, source_language, target_language)[0])
    limits = context.settings.limits
    deadline = g.started_monotonic + limits.time_budget_seconds
    response, translations = translate_request(loaded, body, glossaries, deadline, limits.retry_after_seconds)
    response["elapsed_ms"] = round((time.monotonic() - g.started_monotonic) * 1000.0, 3)
    g.log_event.update(
        model=loaded.model_id,
        num_segments=len(body["segments"]),
        num_words=sum(len(segment.split()) for segment in body["segments"]),
        n_best=body["n_best"],
        glossaries=list(body["glossaries"]),
        num_inline_terms=len(body["terms"]),
    )
    if context.settings.log_content:
        g.log_event.update(
            segments=list(body["segments"]), translations=[translation.translation for translation in translations]
        )
    return jsonify(response)
