"""The OpenAPI 3 document of the API, generated with apispec from the marshmallow schemas in ``service.schemas``.

Operations are written out here (paths, parameters, statuses); every body schema comes from the classes the
routes validate with, so a field added to a schema appears in the document without further work.
"""

from __future__ import annotations

from collections.abc import Sequence
from typing import Any

from apispec import APISpec
from apispec.ext.marshmallow import MarshmallowPlugin
from marshmallow import Schema

from service import schemas
from service.config import Limits
from service.routes.glossaries import FILE_MEDIA_TYPES
from service.translation import NOTICE

API_VERSION = "1.0.0"
OPENAPI_VERSION = "3.0.3"
DESCRIPTION = f"""Statistical phrase-based machine translation with glossary constraints.

**{NOTICE}**

Authentication: `Authorization: Bearer <key>` (RFC 6750). Keys carry the scopes `translate` (translations,
models, reading glossaries, matching terms) and `glossaries` (uploading and deleting glossaries). Every response
carries `X-Request-Id` (the client's, if it sent a plain one, else a new one); error bodies repeat it, and it is
what to quote when reporting a problem. Errors always have the body
`{{"error": {{"code", "message", "fields", "request_id"}}}}`."""


def _json(schema: type[Schema] | Schema | dict, description: str, headers: dict | None = None) -> dict:
    response: dict[str, Any] = {"description": description, "content": {"application/json": {"schema": schema}}}
    if headers:
        response["headers"] = headers
    return response


def _errors(*statuses: int) -> dict[str, dict]:
    texts = {
        400: "invalid request: malformed JSON, unknown or wrong fields, values out of range",
        401: "no valid API key (see WWW-Authenticate)",
        403: "the key lacks the scope this operation needs",
        404: "unknown model or glossary",
        409: "built-in glossary (read-only), concurrent change or database busy (Retry-After)",
        412: "If-Match / If-None-Match precondition failed",
        413: "request body too large",
        415: "unsupported Content-Type",
        503: "time budget exceeded or not ready (Retry-After)",
    }
    retry = {"Retry-After": {"schema": {"type": "integer"}, "description": "seconds to wait before retrying"}}
    return {
        str(status): _json(schemas.ErrorSchema, texts[status], retry if status in (409, 503) else None)
        for status in statuses
    }


_ETAG_HEADER = {"ETag": {"schema": {"type": "string"}, "description": "the glossary's version, quoted"}}
_NAME = {
    "name": "name",
    "in": "path",
    "required": True,
    "schema": {"type": "string", "pattern": schemas.GLOSSARY_NAME_PATTERN},
}
_LANGUAGES = [
    {
        "name": name,
        "in": "query",
        "required": False,
        "schema": {"type": "string", "pattern": schemas.BCP47_TAG},
        "description": "BCP 47 tag; required for TSV/TBX uploads and for built-in glossaries when the "
        "loaded models do not share one language pair",
    }
    for name in ("source_language", "target_language")
]
_IF_MATCH = {
    "name": "If-Match",
    "in": "header",
    "required": False,
    "schema": {"type": "string"},
    "description": "the ETag last seen; the change is made only if it is still current (else 412)",
}
_IF_NONE_MATCH = {
    "name": "If-None-Match",
    "in": "header",
    "required": False,
    "schema": {"type": "string", "enum": ["*"]},
    "description": "'*': create only (412 if it exists)",
}
_SECURED = [{"bearerAuth": []}]


def build_openapi(limits: Limits, translation_request: type[Schema], model_ids: Sequence[str] = ()) -> dict[str, Any]:
    """The whole document as a dict (what GET /openapi.json returns); ``model_ids`` are listed as the values
    of the model path parameter, so clients (and schemathesis) see which models this server has."""
    spec = APISpec(
        title="phrasework",
        version=API_VERSION,
        openapi_version=OPENAPI_VERSION,
        plugins=[MarshmallowPlugin()],
        info={"description": DESCRIPTION},
    )
    spec.components.security_scheme(
        "bearerAuth", {"type": "http", "scheme": "bearer", "description": "an API key made with python -m service.keys"}
    )
    for name, schema in (
        ("TranslationRequest", translation_request),
        ("TranslationResponse", schemas.TranslationResponseSchema),
        ("Model", schemas.ModelSchema),
        ("ModelList", schemas.ModelListSchema),
        ("GlossaryUpload", schemas.GlossaryUploadSchema),
        ("GlossaryList", schemas.GlossaryListSchema),
        ("GlossaryDetail", schemas.GlossaryDetailSchema),
        ("GlossaryPutResult", schemas.GlossaryPutResultSchema),
        ("MatchRequest", schemas.MatchRequestSchema),
        ("MatchResponse", schemas.MatchResponseSchema),
        ("Error", schemas.ErrorSchema),
        ("Health", schemas.HealthSchema),
        ("Readiness", schemas.ReadinessSchema),
    ):
        spec.components.schema(name, schema=schema)

    spec.path(
        "/v1/translations",
        operations={
            "post": {
                "summary": "Translate segments",
                "security": _SECURED,
                "tags": ["translation"],
                "description": f"One result per segment, in order. At most {limits.max_segments} segments of "
                f"{limits.max_segment_characters} characters; n_best at most {limits.max_n_best}; the "
                f"request stops with 503 after {limits.time_budget_seconds:g} s of decoding. {NOTICE}",
                "requestBody": {"required": True, "content": {"application/json": {"schema": translation_request}}},
                "responses": {
                    "200": _json(schemas.TranslationResponseSchema, "translations"),
                    **_errors(400, 401, 403, 404, 413, 415, 503),
                },
            }
        },
    )
    spec.path(
        "/v1/models",
        operations={
            "get": {
                "summary": "List the loaded models",
                "security": _SECURED,
                "tags": ["models"],
                "responses": {"200": _json(schemas.ModelListSchema, "models"), **_errors(401, 403)},
            }
        },
    )
    spec.path(
        "/v1/models/{model_id}",
        operations={
            "get": {
                "summary": "One model: languages, features, weights, search defaults, training statistics",
                "security": _SECURED,
                "tags": ["models"],
                "parameters": [
                    {
                        "name": "model_id",
                        "in": "path",
                        "required": True,
                        "schema": {"type": "string", **({"enum": list(model_ids)} if model_ids else {})},
                    }
                ],
                "responses": {"200": _json(schemas.ModelSchema, "the model"), **_errors(401, 403, 404)},
            }
        },
    )
    spec.path(
        "/v1/glossaries",
        operations={
            "get": {
                "summary": "List built-in and uploaded glossaries",
                "security": _SECURED,
                "tags": ["glossaries"],
                "responses": {"200": _json(schemas.GlossaryListSchema, "glossaries"), **_errors(401, 403)},
            }
        },
    )
    upload_content: dict[str, Any] = {"application/json": {"schema": schemas.GlossaryUploadSchema}}
    upload_content |= {media: {"schema": {"type": "string"}} for media in FILE_MEDIA_TYPES}
    spec.path(
        "/v1/glossaries/{name}",
        operations={
            "get": {
                "summary": "A glossary's entries",
                "security": _SECURED,
                "tags": ["glossaries"],
                "parameters": [_NAME, *_LANGUAGES],
                "responses": {
                    "200": _json(schemas.GlossaryDetailSchema, "the glossary", _ETAG_HEADER),
                    **_errors(400, 401, 403, 404),
                },
            },
            "put": {
                "summary": "Create or replace an uploaded glossary",
                "security": _SECURED,
                "tags": ["glossaries"],
                "description": "JSON rows, TSV/CSV with a header (source, target, case_sensitive, status, note, mode) "
                "or TBX, chosen by Content-Type. The new version is returned as the ETag.",
                "parameters": [_NAME, *_LANGUAGES, _IF_MATCH, _IF_NONE_MATCH],
                "requestBody": {"required": True, "content": upload_content},
                "responses": {
                    "200": _json(schemas.GlossaryPutResultSchema, "replaced", _ETAG_HEADER),
                    "201": _json(schemas.GlossaryPutResultSchema, "created", _ETAG_HEADER),
                    **_errors(400, 401, 403, 409, 412, 413, 415),
                },
            },
            "delete": {
                "summary": "Delete an uploaded glossary",
                "security": _SECURED,
                "tags": ["glossaries"],
                "parameters": [_NAME, _IF_MATCH],
                "responses": {"204": {"description": "deleted"}, **_errors(401, 403, 404, 409, 412)},
            },
        },
    )
    spec.path(
        "/v1/glossaries/{name}/matches",
        operations={
            "post": {
                "summary": "Find the glossary's terms in a text",
                "security": _SECURED,
                "tags": ["glossaries"],
                "parameters": [_NAME],
                "requestBody": {
                    "required": True,
                    "content": {"application/json": {"schema": schemas.MatchRequestSchema}},
                },
                "responses": {
                    "200": _json(schemas.MatchResponseSchema, "matches in text order"),
                    **_errors(400, 401, 403, 404, 413, 415),
                },
            }
        },
    )
    spec.path(
        "/healthz",
        operations={
            "get": {
                "summary": "Liveness",
                "tags": ["operations"],
                "responses": {"200": _json(schemas.HealthSchema, "alive")},
            }
        },
    )
    spec.path(
        "/readyz",
        operations={
            "get": {
                "summary": "Readiness: models loaded, database reachable",
                "tags": ["operations"],
                "responses": {
                    "200": _json(schemas.ReadinessSchema, "ready"),
                    "503": _json(schemas.ReadinessSchema, "not ready"),
                },
            }
        },
    )
    spec.path(
        "/metrics",
        operations={
            "get": {
                "summary": "Prometheus metrics of all workers",
                "tags": ["operations"],
                "responses": {
                    "200": {
                        "description": "Prometheus text format",
                        "content": {"text/plain": {"schema": {"type": "string"}}},
                    }
                },
            }
        },
    )
    spec.path(
        "/openapi.json",
        operations={
            "get": {
                "summary": "This document",
                "tags": ["operations"],
                "responses": {
                    "200": {"description": "OpenAPI 3", "content": {"application/json": {"schema": {"type": "object"}}}}
                },
            }
        },
    )
    spec.path(
        "/docs",
        operations={
            "get": {
                "summary": "This document as a page",
                "tags": ["operations"],
                "responses": {"200": {"description": "HTML", "content": {"text/html": {"schema": {"type": "string"}}}}},
            }
        },
    )
    return spec.to_dict()
