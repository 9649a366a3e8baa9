"""What every route needs: the app's services, the scope a route requires, and strict JSON body reading."""

from __future__ import annotations

import json
from collections.abc import Callable
from dataclasses import dataclass
from typing import Any, TypeVar

from flask import current_app, request
from marshmallow import Schema

from service.auth import KeyRing
from service.catalog import GlossaryCatalog
from service.config import ServiceSettings
from service.errors import ApiError
from service.models import ModelRegistry

View = TypeVar("View", bound=Callable[..., Any])
EXTENSION = "phrasework"


@dataclass(frozen=True, slots=True)
class Services:
    settings: ServiceSettings
    models: ModelRegistry
    catalog: GlossaryCatalog
    keys: KeyRing
    translation_schema: Schema


def services() -> Services:
    return current_app.extensions[EXTENSION]


def requires(*scopes: str) -> Callable[[View], View]:
    """Mark a view as needing a key with any one of ``scopes`` (checked in ``service.app``'s before_request)."""

    def mark(view: View) -> View:
        view.required_scopes = scopes  # type: ignore[attr-defined]
        return view

    return mark


def _refuse_constant(name: str) -> None:
    raise ValueError(f"{name} is not valid JSON (RFC 8259 has no NaN or Infinity)")


def media_type() -> tuple[str, dict[str, str]]:
    """(lowercased media type, parameters) of the request's Content-Type."""
    return request.mimetype.lower(), {key.lower(): value for key, value in request.mimetype_params.items()}


def check_charset(parameters: dict[str, str]) -> None:
    charset = parameters.get("charset")
    if charset is not None and charset.lower().replace("_", "-") not in ("utf-8", "utf8"):
        raise ApiError(415, "unsupported_media_type", f"charset={charset} is not supported; send UTF-8.")


def json_body(schema: Schema) -> dict[str, Any]:
    """The body parsed as strict JSON (RFC 8259: UTF-8, no NaN) and loaded through ``schema``.

    415 unless the Content-Type is application/json; 400 for malformed JSON or a body that is not an object;
    413 (raised by Werkzeug while reading) past the size limit; marshmallow's ValidationError for the rest."""
    mimetype, parameters = media_type()
    if mimetype != "application/json":
        raise ApiError(
            415, "unsupported_media_type", f"Send the body as application/json (got {mimetype or 'no Content-Type'})."
        )
    check_charset(parameters)
    raw = request.get_data(cache=False)
    try:
        data = json.loads(raw.decode("utf-8"), parse_constant=_refuse_constant)
    except UnicodeDecodeError as error:
        raise ApiError(400, "malformed_json", f"The body is not UTF-8: {error.reason} at byte {error.start}.") from None
    except RecursionError:
        raise ApiError(400, "malformed_json", "The body's JSON is nested too deeply.") from None
    except ValueError as error:
        raise ApiError(400, "malformed_json", f"The body is not valid JSON: {error}.") from None
    if not isinstance(data, dict):
        raise ApiError(400, "invalid_request", "The body must be a JSON object.")
    return schema.load(data)
