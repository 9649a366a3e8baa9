"""GET /healthz, /readyz, /metrics, /openapi.json and /docs: no API key needed."""

from __future__ import annotations

import sqlite3

from flask import Blueprint, Response, current_app, jsonify

from service import metrics
from service.context import services

blueprint = Blueprint("operations", __name__)


@blueprint.get("/healthz")
def health() -> Response:
    """The process answers (liveness): no dependency is checked, so a slow database never restarts workers."""
    return jsonify({"status": "ok"})


@blueprint.get("/readyz")
def readiness() -> Response:
    """Models loaded and the glossary database readable (readiness): 503 otherwise."""
    context = services()
    try:
        context.catalog.store.ping()
        database = "ok"
    except sqlite3.Error as error:
        database = f"error: {type(error).__name__}"
    ready = database == "ok" and bool(context.models.ids)
    response = jsonify(
        {"status": "ready" if ready else "not_ready", "models": context.models.ids, "database": database}
    )
    response.status_code = 200 if ready else 503
    return response


@blueprint.get("/metrics")
def prometheus_metrics() -> Response:
    body, content_type = metrics.render()
    return Response(body, content_type=content_type)


@blueprint.get("/openapi.json")
def openapi_document() -> Response:
    return jsonify(current_app.extensions["phrasework.openapi"])


@blueprint.get("/docs")
def documentation() -> Response:
    return Response(current_app.extensions["phrasework.docs"], content_type="text/html; charset=utf-8")
