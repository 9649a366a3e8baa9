"""GET /v1/models and /v1/models/{id}: what the manifest of the served model says."""

from __future__ import annotations

import json

from decoder.search.features import FEATURE_NAMES
from tests.service.conftest import MODEL_PAIRS, bearer


def test_model_description_comes_from_the_manifest(live_server, model_dir, http):
    manifest = json.loads((model_dir / "manifest.json").read_text(encoding="utf-8"))
    headers = bearer(live_server.keys.translate)
    listed = http.get(live_server.url("/v1/models"), headers=headers).json()["models"]
    one = http.get(live_server.url(f"/v1/models/{live_server.model_id}"), headers=headers).json()
    assert listed == [one]
    assert (one["id"], one["source_language"], one["target_language"]) == (model_dir.name, "en", "es")
    assert one["feature_names"] == list(FEATURE_NAMES)
    assert one["weights"] == manifest["weights"]
    assert one["search_defaults"] == manifest["search_defaults"]
    assert one["statistics"]["pairs_read"] == MODEL_PAIRS  # the fixture trained on this many pairs
    assert one["created"] == manifest["created"]


def test_unknown_model_is_404_and_models_need_a_key(live_server, http):
    missing = http.get(live_server.url("/v1/models/no-such-model"), headers=bearer(live_server.keys.glossaries))
    assert missing.status_code == 404 and missing.json()["error"]["code"] == "model_not_found"
    assert http.get(live_server.url("/v1/models")).status_code == 401
