"""GET /v1/models and GET /v1/models/{model_id}."""

from __future__ import annotations

from flask import Blueprint, Response, jsonify

from service.auth import SCOPE_GLOSSARIES, SCOPE_TRANSLATE
from service.context import requires, services
from service.models import describe

blueprint = Blueprint("models", __name__)


@blueprint.get("/v1/models")
@requires(SCOPE_TRANSLATE, SCOPE_GLOSSARIES)
def list_models() -> Response:
    return jsonify({"models": [describe(loaded.model) for loaded in services().models]})


@blueprint.get("/v1/models/<model_id>")
@requires(SCOPE_TRANSLATE, SCOPE_GLOSSARIES)
def get_model(model_id: str) -> Response:
    return jsonify(describe(services().models.get(model_id).model))
