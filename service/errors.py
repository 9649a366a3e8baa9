"""One JSON shape for every failure: ``{"error": {"code", "message", "fields", "request_id"}}``.

``fields`` maps a field path ("segments.3", "search.stack_size") to its messages, empty when the problem is
not about one field. No handler ever returns HTML or a traceback: Werkzeug's HTTP errors (404, 405, 413 ...)
are rewritten into this shape, and any other exception becomes a 500 whose body says only the request id,
while the log line with the same request id carries the traceback.
"""

from __future__ import annotations

import logging
from collections.abc import Mapping

from flask import Flask, Response, g, jsonify
from marshmallow import ValidationError
from werkzeug.exceptions import HTTPException

from decoder.errors import ConfigurationError, DecoderError, InputFileError, InvalidTextError
from decoder.terminology.errors import GlossaryNotFoundError

log = logging.getLogger("phrasework.service")

# Werkzeug's exception names turned into our stable codes (the rest become their snake_case name).
_HTTP_CODES = {
    400: "bad_request",
    404: "not_found",
    405: "method_not_allowed",
    413: "body_too_large",
    415: "unsupported_media_type",
    411: "length_required",
}
_HTTP_MESSAGES = {
    404: "No such endpoint. See /openapi.json or /docs for the API.",
    413: "The request body is larger than this endpoint accepts.",
}


class ApiError(Exception):
    """An error with an HTTP status that the client is meant to see; ``message`` says what to do."""

    def __init__(
        self,
        status: int,
        code: str,
        message: str,
        fields: Mapping[str, list[str]] | None = None,
        headers: Mapping[str, str] | None = None,
    ) -> None:
        super().__init__(message)
        self.status = status
        self.code = code
        self.message = message
        self.fields = dict(fields or {})
        self.headers = dict(headers or {})


def flatten_messages(messages: object, prefix: str = "") -> dict[str, list[str]]:
    """marshmallow's nested messages as {"a.b.3": [message, ...]}; schema-level messages go under "_schema"."""
    flat: dict[str, list[str]] = {}
    if isinstance(messages, Mapping):
        for key, value in messages.items():
            path = f"{prefix}.{key}" if prefix else str(key)
            for name, items in flatten_messages(value, path).items():
                flat.setdefault(name, []).extend(items)
    elif isinstance(messages, list | tuple) and all(isinstance(item, str) for item in messages):
        flat[prefix or "_schema"] = [str(item) for item in messages]
    elif isinstance(messages, list | tuple):
        for item in messages:
            for name, items in flatten_messages(item, prefix).items():
                flat.setdefault(name, []).extend(items)
    else:
        flat[prefix or "_schema"] = [str(messages)]
    return flat


def error_response(
    status: int,
    code: str,
    message: str,
    fields: Mapping[str, list[str]] | None = None,
    headers: Mapping[str, str] | None = None,
) -> Response:
    body = {
        "error": {
            "code": code,
            "message": message,
            "fields": dict(fields or {}),
            "request_id": getattr(g, "request_id", None),
        }
    }
    response = jsonify(body)
    response.status_code = status
    for name, value in (headers or {}).items():
        response.headers[name] = value
    return response


def decoder_error_status(error: DecoderError) -> int:
    """HTTP status of a library error: the client's fault (4xx) or ours (500)."""
    if isinstance(error, GlossaryNotFoundError):
        return 404
    if isinstance(error, InvalidTextError | ConfigurationError | InputFileError):
        return 400
    return 500


def register_error_handlers(app: Flask) -> None:
    @app.errorhandler(ApiError)
    def api_error(error: ApiError) -> Response:
        return error_response(error.status, error.code, error.message, error.fields, error.headers)

    @app.errorhandler(ValidationError)
    def invalid_request(error: ValidationError) -> Response:
        return error_response(
            400,
            "invalid_request",
            "The request is invalid; see fields for each problem.",
            flatten_messages(error.messages),
        )

    @app.errorhandler(DecoderError)
    def decoder_error(error: DecoderError) -> Response:
        status = decoder_error_status(error)
        if status >= 500:
            log.error("decoder failure", exc_info=error, extra={"event": {"error_code": error.code}})
            return error_response(500, "internal_error", "Internal error; quote the request id when reporting it.")
        return error_response(status, error.code, str(error))

    @app.errorhandler(HTTPException)
    def http_error(error: HTTPException) -> Response:
        status = error.code or 500
        code = _HTTP_CODES.get(status) or "_".join((error.name or "error").lower().split())
        headers = {}
        if status == 405:
            headers["Allow"] = ", ".join(sorted(getattr(error, "valid_methods", None) or []))
        message = _HTTP_MESSAGES.get(status) or error.description or error.name
        return error_response(status, code, message, headers=headers)

    @app.errorhandler(Exception)
    def unexpected(error: Exception) -> Response:
        log.error("unexpected error", exc_info=error, extra={"event": {"error_type": type(error).__name__}})
        return error_response(500, "internal_error", "Internal error; quote the request id when reporting it.")
