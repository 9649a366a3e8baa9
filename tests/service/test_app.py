"""The application in-process (Flask test client): unexpected errors, the time budget, open mode, logging.

These paths need control the live server does not give (a library call that fails, a tiny time budget), so
they run against ``build_app`` directly with the session's real model."""

from __future__ import annotations

import io
import json
import logging
import time

import pytest

from service.app import build_app
from service.config import Limits, ServiceSettings
from service.logs import JsonFormatter
from service.store import GlossaryRow, GlossaryStore
from tests.service.conftest import FAST_SEARCH

SECRET_TEXT = "Quarterly numbers of Project Tallowmere"  # must never reach a log unless content logging is on


@pytest.fixture
def make_app(model_dir, tmp_path):
    def make(**limits):
        log_content = limits.pop("log_content", False)
        settings = ServiceSettings(
            model_dirs=(model_dir,), database=tmp_path / "g.sqlite3", limits=Limits(**limits), log_content=log_content
        )
        return build_app(settings)

    return make


@pytest.fixture
def log_lines():
    """The JSON lines the phrasework loggers write during the test."""
    stream = io.StringIO()
    handler = logging.StreamHandler(stream)
    handler.setFormatter(JsonFormatter())
    logger = logging.getLogger("phrasework")
    logger.addHandler(handler)
    yield lambda: [json.loads(line) for line in stream.getvalue().splitlines()]
    logger.removeHandler(handler)


def test_unexpected_error_is_500_with_the_request_id_that_the_log_has(make_app, log_lines, monkeypatch):
    app = make_app()
    loaded = next(iter(app.extensions["phrasework"].models))

    def broken(*args, **kwargs):
        raise RuntimeError(f"internal detail {SECRET_TEXT}")

    monkeypatch.setattr(loaded.translator, "translate", broken)
    response = app.test_client().post(
        "/v1/translations", json={"segments": ["Click Save."]}, headers={"X-Request-Id": "req-500-check"}
    )
    assert response.status_code == 500 and response.is_json
    error = response.get_json()["error"]
    assert (error["code"], error["request_id"]) == ("internal_error", "req-500-check")
    assert SECRET_TEXT not in response.get_data(as_text=True) and "Traceback" not in response.get_data(as_text=True)
    logged = [line for line in log_lines() if line.get("request_id") == "req-500-check"]
    assert [line["message"] for line in logged] == ["unexpected error", "request"]
    assert "RuntimeError" in logged[0]["exception"] and logged[1]["status"] == 500


def test_time_budget_gives_503_with_retry_after_instead_of_finishing(make_app):
    budget = 0.3
    app = make_app(time_budget_seconds=budget, retry_after_seconds=11)
    client = app.test_client()
    one = client.post("/v1/translations", json={"segments": ["Open the file, then click Continue."]})
    assert one.status_code == 200
    started = time.monotonic()
    segments = ["Open the file, then click Continue."] * 100  # at default search settings, far over 0.3 s
    response = client.post("/v1/translations", json={"segments": segments})
    elapsed = time.monotonic() - started
    assert response.status_code == 503 and response.headers["Retry-After"] == "11"
    assert response.get_json()["error"]["code"] == "time_budget_exceeded"
    # Stopped after the segment that crossed the budget, not after all 100 (each takes well under 2 s).
    assert elapsed < budget + 2.0
    assert client.post("/v1/translations", json={"segments": ["Click Save."]}).status_code == 200


def test_open_mode_needs_no_key_and_logs_no_segment_text(make_app, log_lines):
    app = make_app()
    assert app.extensions["phrasework"].keys.is_open
    warnings = [line["message"] for line in log_lines() if line["level"] == "warning"]
    assert any("no API keys configured" in message for message in warnings)
    response = app.test_client().post("/v1/translations", json={"segments": [SECRET_TEXT], "search": FAST_SEARCH})
    assert response.status_code == 200
    text = json.dumps(log_lines())
    assert SECRET_TEXT not in text and response.get_json()["results"][0]["translation"] not in text
    request_line = [line for line in log_lines() if line["message"] == "request"][-1]
    assert (request_line["num_segments"], request_line["num_words"], request_line["status"]) == (1, 5, 200)


def test_content_logging_is_opt_in(make_app, log_lines):
    app = make_app(log_content=True)
    response = app.test_client().post("/v1/translations", json={"segments": [SECRET_TEXT], "search": FAST_SEARCH})
    request_line = [line for line in log_lines() if line["message"] == "request"][-1]
    assert request_line["segments"] == [SECRET_TEXT]
    assert request_line["translations"] == [response.get_json()["results"][0]["translation"]]


def test_change_landing_while_an_upload_is_parsed_gives_409(make_app, monkeypatch):
    app = make_app()
    client = app.test_client()
    body = {"source_language": "en", "target_language": "es", "entries": [{"source": "trash", "target": "papelera"}]}
    etag = client.put("/v1/glossaries/raced", json=body).headers["ETag"]
    catalog = app.extensions["phrasework"].catalog
    parse = catalog.parse_rows
    other_worker = GlossaryStore(catalog.store.path)

    def parse_while_another_worker_writes(*args, **kwargs):
        glossary = parse(*args, **kwargs)
        other_worker.put("raced", "en", "es", [GlossaryRow("trash", "basura", "preferred", False, None, "")], 1)
        return glossary

    monkeypatch.setattr(catalog, "parse_rows", parse_while_another_worker_writes)
    response = client.put("/v1/glossaries/raced", json=body, headers={"If-Match": etag})
    assert response.status_code == 409 and response.get_json()["error"]["code"] == "concurrent_modification"
    monkeypatch.undo()
    # The other worker's version stands; the raced upload wrote nothing.
    entries = client.get("/v1/glossaries/raced").get_json()["entries"]
    assert [entry["target"] for entry in entries] == ["basura"]
    other_worker.close()
