"""Glossaries: list, read, replace (JSON rows, TSV/CSV or TBX), delete, and find terms in a text.

Concurrency follows RFC 9110 section 13: the version is the ETag; ``If-Match`` makes a PUT or DELETE
conditional on the version the client last saw (412 if it is not the current one when the request arrives),
``If-None-Match: *`` makes a PUT create-only. A conditional PUT whose version changes while the upload is
being parsed (another client's write landed in between) gets 409, and so does any write that cannot get the
database's write lock within the configured time (with Retry-After). Built-in glossaries are read-only: 409.
"""

from __future__ import annotations

from flask import Blueprint, Response, g, jsonify, request
from marshmallow import fields, validate

from decoder.errors import InvalidTextError
from decoder.terminology.matching import find_terms
from decoder.text.pipeline import prepare_segment
from service.auth import SCOPE_GLOSSARIES, SCOPE_TRANSLATE
from service.catalog import check_name, is_valid_name, not_found, rows_of, stored_info
from service.context import check_charset, json_body, media_type, requires, services
from service.errors import ApiError
from service.schemas import BCP47_TAG, GlossaryUploadSchema, MatchRequestSchema, StrictSchema
from service.store import ABSENT, StoreBusyError, VersionMismatchError

blueprint = Blueprint("glossaries", __name__)
FILE_MEDIA_TYPES = {
    "text/tab-separated-values": ".tsv",
    "text/csv": ".csv",
    "application/x-tbx+xml": ".tbx",
    "application/xml": ".tbx",
    "text/xml": ".tbx",
}
UPLOAD_MEDIA_TYPES = ("application/json", *FILE_MEDIA_TYPES)


class LanguagesQuerySchema(StrictSchema):
    source_language = fields.String(validate=validate.Regexp(BCP47_TAG))
    target_language = fields.String(validate=validate.Regexp(BCP47_TAG))


def etag(version: str) -> str:
    return f'"{version}"'


def _query_languages(required: bool) -> tuple[str, str] | None:
    """(source, target) from the query string; the loaded models' pair if absent and all models share one."""
    query = LanguagesQuerySchema().load(request.args.to_dict())
    if "source_language" in query and "target_language" in query:
        return query["source_language"], query["target_language"]
    if "source_language" in query or "target_language" in query:
        raise ApiError(
            400,
            "invalid_request",
            "Give both source_language and target_language or neither.",
            {"target_language" if "source_language" in query else "source_language": ["missing"]},
        )
    if required:
        raise ApiError(
            400,
            "invalid_request",
            "TSV and TBX uploads need the query parameters source_language and target_language (BCP 47 tags).",
            {"source_language": ["required"], "target_language": ["required"]},
        )
    return services().models.default_languages()


def _read_only(name: str) -> ApiError:
    return ApiError(
        409,
        "glossary_read_only",
        f"{name!r} is a built-in glossary (a file on the server) and cannot "
        "be changed over HTTP; upload under another name.",
    )


def _expected_version(name: str) -> int | None:
    """The version a conditional request requires (ABSENT for create-only), None if unconditional; 412 now if
    the precondition already fails."""
    current = services().catalog.store.current_version(name)
    headers = {"ETag": etag(str(current))} if current != ABSENT else {}
    if "If-None-Match" in request.headers:
        if not request.if_none_match.star_tag:
            raise ApiError(400, "invalid_request", "Only 'If-None-Match: *' (create only) is supported here.")
        if current != ABSENT:
            raise ApiError(
                412, "precondition_failed", f"Glossary {name!r} already exists (If-None-Match: *).", headers=headers
            )
        return ABSENT
    if "If-Match" in request.headers:
        if_match = request.if_match
        if current == ABSENT or not (if_match.star_tag or if_match.contains(str(current))):
            state = "does not exist" if current == ABSENT else f"is at version {current}"
            raise ApiError(
                412, "precondition_failed", f"Glossary {name!r} {state}; GET it again and retry.", headers=headers
            )
        return current
    return None


def _warnings(glossary) -> list[dict[str, str]]:
    return [
        {"kind": str(warning.kind), "origin": warning.origin, "message": warning.message}
        for warning in glossary.warnings
    ]


@blueprint.get("/v1/glossaries")
@requires(SCOPE_TRANSLATE, SCOPE_GLOSSARIES)
def list_glossaries() -> Response:
    return jsonify({"glossaries": [info.as_dict() for info in services().catalog.list()]})


def _lookup(name: str, languages: tuple[str, str] | None):
    """(glossary, info): uploads with their own languages, built-in files with ``languages`` (400 if None)."""
    catalog = services().catalog
    if catalog.built_in_path(name) is None:
        stored = catalog.store.info(name) if is_valid_name(name) else None
        if stored is None:
            raise not_found(name)
        return catalog.get(name, *(languages or (stored.source_language, stored.target_language)))
    if languages is None:
        raise ApiError(
            400,
            "invalid_request",
            f"{name!r} is a built-in glossary file without languages of its "
            "own; give source_language and target_language.",
            {"source_language": ["required"], "target_language": ["required"]},
        )
    return catalog.get(name, *languages)


@blueprint.get("/v1/glossaries/<name>")
@requires(SCOPE_TRANSLATE, SCOPE_GLOSSARIES)
def get_glossary(name: str) -> Response:
    glossary, info = _lookup(name, _query_languages(required=False))
    body = info.as_dict() | {
        "entries": [row.as_mapping() for row in rows_of(glossary)],
        "warnings": _warnings(glossary),
    }
    response = jsonify(body)
    response.headers["ETag"] = etag(info.version)
    return response


def _parse_upload(name: str):
    catalog = services().catalog
    mimetype, parameters = media_type()
    if mimetype == "application/json":
        body = json_body(GlossaryUploadSchema())
        return catalog.parse_rows(name, body["entries"], body["source_language"], body["target_language"])
    suffix = FILE_MEDIA_TYPES.get(mimetype)
    if suffix is None:
        raise ApiError(
            415,
            "unsupported_media_type",
            f"Upload a glossary as one of {', '.join(UPLOAD_MEDIA_TYPES)} (got {mimetype or 'no Content-Type'}).",
        )
    check_charset(parameters)
    source_language, target_language = _query_languages(required=True)  # type: ignore[misc]
    return catalog.parse_file_upload(name, request.get_data(cache=False), suffix, source_language, target_language)


@blueprint.put("/v1/glossaries/<name>")
@requires(SCOPE_GLOSSARIES)
def put_glossary(name: str) -> Response:
    check_name(name)
    catalog = services().catalog
    if catalog.built_in_path(name) is not None:
        raise _read_only(name)
    expected = _expected_version(name)
    glossary = _parse_upload(name)
    try:
        stored, previous = catalog.store.put(
            name,
            glossary.source_language,
            glossary.target_language,
            rows_of(glossary),
            len(glossary),
            expected_version=expected,
        )
    except VersionMismatchError as error:
        raise ApiError(
            409,
            "concurrent_modification",
            f"Glossary {name!r} changed while this upload was being "
            f"processed (now version {error.current}); GET it and decide again.",
        ) from error
    except StoreBusyError as error:
        raise _busy() from error
    info = stored_info(stored)
    g.log_event.update(glossary=name, version=stored.version, num_rows=stored.num_rows)
    response = jsonify(info.as_dict() | {"warnings": _warnings(glossary)})
    response.status_code = 201 if previous == ABSENT else 200
    response.headers["ETag"] = etag(info.version)
    if response.status_code == 201:
        response.headers["Location"] = f"/v1/glossaries/{name}"
    return response


@blueprint.delete("/v1/glossaries/<name>")
@requires(SCOPE_GLOSSARIES)
def delete_glossary(name: str) -> Response:
    catalog = services().catalog
    if catalog.built_in_path(name) is not None:
        raise _read_only(name)
    if not is_valid_name(name):
        raise not_found(name)
    expected = _expected_version(name)
    try:
        deleted = catalog.store.delete(name, expected_version=expected)
    except VersionMismatchError as error:
        raise ApiError(412, "precondition_failed", f"Glossary {name!r} changed; GET it again and retry.") from error
    except StoreBusyError as error:
        raise _busy() from error
    if not deleted:
        raise not_found(name)
    g.log_event.update(glossary=name)
    return Response(status=204)


@blueprint.post("/v1/glossaries/<name>/matches")
@requires(SCOPE_TRANSLATE, SCOPE_GLOSSARIES)
def match_glossary(name: str) -> Response:
    body = json_body(MatchRequestSchema())
    if ("source_language" in body) != ("target_language" in body):
        raise ApiError(
            400,
            "invalid_request",
            "Give both source_language and target_language or neither.",
            {"target_language" if "source_language" in body else "source_language": ["missing"]},
        )
    given = (body["source_language"], body["target_language"]) if "source_language" in body else None
    if given is None and services().catalog.built_in_path(name) is not None:
        given = services().models.default_languages()
    glossary, info = _lookup(name, given)
    matches = []
    for line_number, line in enumerate(body["text"].splitlines(), start=1):
        try:
            prepared = prepare_segment(line, glossary.source_language)
        except InvalidTextError as error:
            raise ApiError(
                400, "invalid_text", f"line {line_number}: {error}", {"text": [f"line {line_number}: {error}"]}
            ) from error
        for match in find_terms(prepared, [glossary], body["inflection_tolerance"]):
            entry = match.entry
            matches.append(
                {
                    "line": line_number,
                    "start": match.source_span.start,
                    "end": match.source_span.end,
                    "text": match.source_text,
                    "entry_source": entry.source,
                    "targets": list(match.allowed_targets),
                    "forbidden_targets": list(match.forbidden_targets),
                    "case_sensitive": entry.case_sensitive,
                    "mode": entry.mode.value if entry.mode else None,
                    "note": entry.note,
                    "origin": entry.origin,
                    "is_inflected": match.is_inflected,
                }
            )
    g.log_event.update(glossary=name, num_matches=len(matches))
    return jsonify({"glossary": name, "version": info.version, "matches": matches})


def _busy() -> ApiError:
    """409 for a write that could not get the database lock in time; the client may retry."""
    return ApiError(
        409,
        "glossary_busy",
        "Another write to the glossary database is in progress; retry shortly.",
        headers={"Retry-After": str(services().settings.limits.retry_after_seconds)},
    )
