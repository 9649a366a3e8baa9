"""Request ids and JSON-lines logs of the live server."""

from __future__ import annotations

import re

from tests.service.conftest import FAST_SEARCH, bearer

MARKER = "Vexillum audit draft 7781"  # segment text that must not appear in the server log


def test_request_id_is_echoed_generated_or_replaced(live_server, http):
    given = http.get(live_server.url("/healthz"), headers={"X-Request-Id": "pipeline-42.a:b"})
    assert given.headers["X-Request-Id"] == "pipeline-42.a:b"
    generated = http.get(live_server.url("/healthz")).headers["X-Request-Id"]
    assert re.fullmatch(r"[0-9a-f]{32}", generated)
    # Spaces and quotes could forge log structure: such an id is replaced by a fresh one.
    forged = http.get(live_server.url("/healthz"), headers={"X-Request-Id": 'x" level="error'})
    assert re.fullmatch(r"[0-9a-f]{32}", forged.headers["X-Request-Id"])


def test_log_is_json_lines_with_request_id_and_without_segment_text(live_server, http):
    response = http.post(
        live_server.url("/v1/translations"),
        json={"segments": [MARKER], "search": FAST_SEARCH},
        headers=bearer(live_server.keys.translate) | {"X-Request-Id": "log-check-1"},
    )
    assert response.status_code == 200
    [line] = live_server.log_for("log-check-1")
    assert (line["message"], line["route"], line["status"], line["method"]) == (
        "request",
        "/v1/translations",
        200,
        "POST",
    )
    assert line["num_segments"] == 1 and line["key_id"] == live_server.keys.translate.split("_")[1]
    text = live_server.log_path.read_text(encoding="utf-8")
    assert MARKER not in text and response.json()["results"][0]["translation"] not in text
    # Every line the server wrote is JSON, gunicorn's own lines included.
    assert all(raw.startswith("{") for raw in text.splitlines() if raw.strip())
