"""The Flask application: services wired together, per-request hooks (request id, body limit, API key,
metrics, the JSON log line) and the blueprints.

``build_app`` does all start-up work (loading models, opening the database, building the API document), so
that with gunicorn's preload it happens once in the master and the workers inherit it.
"""

from __future__ import annotations

import logging
import time

from flask import Flask, Response, current_app, g, request
from flask.json.provider import DefaultJSONProvider

from decoder.errors import ConfigurationError
from service import metrics
from service.auth import KeyRing, bearer_token
from service.catalog import GlossaryCatalog
from service.config import ServiceSettings
from service.context import EXTENSION, Services, services
from service.docs_page import render_docs
from service.errors import ApiError, register_error_handlers
from service.logs import REQUEST_ID, configure_logging, request_id_from
from service.models import ModelRegistry
from service.openapi import build_openapi
from service.routes import glossaries, models, operations, translations
from service.schemas import translation_request_schema
from service.store import GlossaryStore
from service.translation import NOTICE

log = logging.getLogger("phrasework.service")
REALM = "phrasework"
UPLOAD_ENDPOINTS = frozenset({"glossaries.put_glossary"})


class _JsonProvider(DefaultJSONProvider):
    sort_keys = False  # keep schema order (features in FEATURE_NAMES order)
    ensure_ascii = False  # UTF-8 out: smaller bodies for non-English text
    compact = True


def _challenge(error: str | None = None, description: str | None = None, scope: str | None = None) -> str:
    """A WWW-Authenticate value as RFC 6750 section 3 writes it."""
    parts = [f'Bearer realm="{REALM}"']
    if error:
        parts.append(f'error="{error}"')
    if description:
        parts.append(f'error_description="{description}"')
    if scope:
        parts.append(f'scope="{scope}"')
    return ", ".join(parts)


def _authenticate() -> None:
    """401 without a valid key, 403 without the scope the endpoint needs; open when no keys are configured."""
    view = current_app.view_functions.get(request.endpoint or "")
    scopes = getattr(view, "required_scopes", ())
    keys = services().keys
    if not scopes or keys.is_open:
        return
    token = bearer_token(request.headers.get("Authorization"))
    if token is None:
        raise ApiError(
            401,
            "unauthorized",
            "Send an API key as 'Authorization: Bearer <key>'.",
            headers={"WWW-Authenticate": _challenge()},
        )
    key = keys.verify(token)
    if key is None:
        raise ApiError(
            401,
            "invalid_key",
            "The API key is not valid.",
            headers={"WWW-Authenticate": _challenge("invalid_token", "the key is not valid")},
        )
    g.key_id = key.key_id
    if not key.scopes.intersection(scopes):
        needed = " ".join(scopes)
        raise ApiError(
            403,
            "insufficient_scope",
            f"This key lacks the scope this operation needs ({needed}).",
            headers={"WWW-Authenticate": _challenge("insufficient_scope", None, needed)},
        )


def _before_request() -> None:
    g.started_monotonic = time.monotonic()
    g.request_id = request_id_from(request.headers.get("X-Request-Id"))
    g.request_id_token = REQUEST_ID.set(g.request_id)
    g.log_event = {}
    limits = services().settings.limits
    request.max_content_length = (
        limits.max_glossary_bytes if request.endpoint in UPLOAD_ENDPOINTS else limits.max_body_bytes
    )
    _authenticate()


def _after_request(response: Response) -> Response:
    response.headers["X-Request-Id"] = getattr(g, "request_id", "")
    if request.path.startswith("/v1/"):
        response.headers["Cache-Control"] = "no-store"  # translations and glossaries are often confidential
    route = request.url_rule.rule if request.url_rule is not None else "unmatched"
    seconds = time.monotonic() - getattr(g, "started_monotonic", time.monotonic())
    metrics.REQUESTS.labels(route, request.method, str(response.status_code)).inc()
    metrics.LATENCY.labels(route, request.method).observe(seconds)
    event = {
        "method": request.method,
        "route": route,
        "status": response.status_code,
        "duration_ms": round(seconds * 1000.0, 3),
        "key_id": getattr(g, "key_id", None),
        **getattr(g, "log_event", {}),
    }
    if response.status_code >= 400 and response.is_json:
        event["error_code"] = (response.get_json(silent=True) or {}).get("error", {}).get("code")
    log.info("request", extra={"event": event})
    return response


def _teardown_request(_error: BaseException | None) -> None:
    token = g.pop("request_id_token", None)
    if token is not None:
        REQUEST_ID.reset(token)


def build_app(settings: ServiceSettings) -> Flask:
    """The application for ``settings``. Raises DecoderError subclasses (ModelLoadError, ConfigurationError,
    InputFileError for a bad key file) with a message saying what to fix."""
    configure_logging(settings.log_level)
    keys = KeyRing.from_sources(settings.api_keys_file, settings.api_keys_text)
    if keys.is_open:
        log.warning(
            "no API keys configured: every request is allowed; serve on loopback addresses only",
            extra={"event": {"keys": 0}},
        )
    if settings.glossary_dir is not None and not settings.glossary_dir.is_dir():
        raise ConfigurationError(f"glossary folder {settings.glossary_dir} does not exist")
    registry = ModelRegistry.load(settings.model_dirs, verify=settings.verify_models)
    store = GlossaryStore(settings.database, settings.limits.database_timeout_seconds)
    store.initialise()
    store.close()  # each worker opens its own connection after the fork
    request_schema = translation_request_schema(settings.limits, registry.ids)
    app = Flask("phrasework", static_folder=None)
    app.json = _JsonProvider(app)
    app.extensions[EXTENSION] = Services(
        settings, registry, GlossaryCatalog(store, settings.glossary_dir), keys, request_schema()
    )
    document = build_openapi(settings.limits, request_schema, registry.ids)
    app.extensions["phrasework.openapi"] = document
    app.extensions["phrasework.docs"] = render_docs(document, NOTICE)
    register_error_handlers(app)
    app.before_request(_before_request)
    app.after_request(_after_request)
    app.teardown_request(_teardown_request)
    for module in (translations, models, glossaries, operations):
        app.register_blueprint(module.blueprint)
    log.info(
        "service ready",
        extra={"event": {"models": registry.ids, "keys": len(keys), "database": str(settings.database)}},
    )
    return app
