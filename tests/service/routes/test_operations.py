"""Operations endpoints on the live two-worker server: health, readiness, metrics, API document, docs page."""

from __future__ import annotations

import re
from concurrent.futures import ThreadPoolExecutor

from tests.service.conftest import FAST_SEARCH, bearer


def test_health_and_readiness_need_no_key(live_server, http):
    assert http.get(live_server.url("/healthz")).json() == {"status": "ok"}
    ready = http.get(live_server.url("/readyz"))
    assert ready.status_code == 200
    assert ready.json() == {"status": "ready", "models": [live_server.model_id], "database": "ok"}


def _sample(text: str, name: str, labels: dict[str, str]) -> float:
    """The value of one sample in Prometheus text format (exposition format 0.0.4), 0 if absent."""
    for line in text.splitlines():
        if not line.startswith(name + "{"):
            continue
        found = dict(re.findall(r'(\w+)="([^"]*)"', line[len(name) : line.index("}") + 1]))
        if all(found.get(key) == value for key, value in labels.items()):
            return float(line.rsplit(" ", 1)[1])
    return 0.0


def test_metrics_count_requests_segments_and_words_of_all_workers(live_server, http):
    model = {"model": live_server.model_id}
    before = http.get(live_server.url("/metrics")).text
    segments = ["Click Save.", "Open the file."]  # 2 + 3 whitespace-separated words
    body = {"segments": segments, "search": FAST_SEARCH}
    headers = bearer(live_server.keys.translate)
    num_requests = 12
    with ThreadPoolExecutor(6) as pool:  # concurrent, so both workers serve some (checked via the log)
        responses = list(
            pool.map(
                lambda _: http.post(live_server.url("/v1/translations"), json=body, headers=headers),
                range(num_requests),
            )
        )
    assert [response.status_code for response in responses] == [200] * num_requests
    pids = {line["pid"] for response in responses for line in live_server.log_for(response.headers["X-Request-Id"])}
    assert len(pids) == 2
    after = http.get(live_server.url("/metrics")).text
    assert after.startswith("#") and "phrasework_decoder_seconds_bucket" in after

    def delta(name, labels):
        return _sample(after, name, labels) - _sample(before, name, labels)

    # Sums over both workers: a single worker's files would show fewer than all requests sent.
    assert delta("phrasework_segments_translated_total", model) == 2 * num_requests
    assert delta("phrasework_source_words_translated_total", model) == 5 * num_requests
    assert (
        delta("phrasework_http_requests_total", {"route": "/v1/translations", "method": "POST", "status": "200"})
        == num_requests
    )
    assert (
        delta("phrasework_http_request_duration_seconds_count", {"route": "/v1/translations", "method": "POST"})
        == num_requests
    )
    assert delta("phrasework_decoder_seconds_count", model) == num_requests


def test_openapi_document_shows_the_configured_limits_and_the_review_notice(live_server, http):
    document = http.get(live_server.url("/openapi.json")).json()
    assert document["openapi"].startswith("3.")
    request_schema = document["components"]["schemas"]["TranslationRequest"]
    assert request_schema["properties"]["segments"]["maxItems"] == 100
    assert request_schema["properties"]["segments"]["items"]["maxLength"] == 5000
    assert request_schema["additionalProperties"] is False
    assert "qualified translator" in document["info"]["description"]
    assert set(document["paths"]) >= {
        "/v1/translations",
        "/v1/models",
        "/v1/models/{model_id}",
        "/v1/glossaries",
        "/v1/glossaries/{name}",
        "/v1/glossaries/{name}/matches",
        "/healthz",
        "/readyz",
        "/metrics",
        "/openapi.json",
        "/docs",
    }
    put = document["paths"]["/v1/glossaries/{name}"]["put"]["requestBody"]["content"]
    assert set(put) >= {"application/json", "text/tab-separated-values", "application/x-tbx+xml", "application/xml"}


def test_docs_page_is_self_contained_and_says_drafts_need_review(live_server, http):
    page = http.get(live_server.url("/docs"))
    assert page.headers["Content-Type"].startswith("text/html")
    text = page.text
    assert "reviewed by a qualified translator before publication" in text
    assert "safety, medical, legal or regulatory" in text
    assert "/v1/translations" in text and "TranslationRequest" in text
    # Nothing loaded from elsewhere: no scripts, no external stylesheets, images or links.
    assert "<script" not in text and "<link" not in text and "src=" not in text
    assert re.findall(r'href="([^"]*)"', text) == ["/openapi.json"]
