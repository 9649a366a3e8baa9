"""POST /v1/translations on the live server: n-best scores, order, optional parts, and every error path."""

from __future__ import annotations

import math

import pytest

from decoder.search.features import FEATURE_NAMES
from tests.service.conftest import FAST_SEARCH, bearer

SEGMENTS = ["Click Save.", "Open the file, then click Continue.", "Delete the backup?"]


@pytest.fixture
def translate(live_server, http):
    def post(body: dict, key: str | None = None, **kwargs):
        headers = bearer(key or live_server.keys.translate) | kwargs.pop("headers", {})
        return http.post(live_server.url("/v1/translations"), json=body, headers=headers, **kwargs)

    return post


def test_every_n_best_score_is_the_dot_product_of_features_and_reported_weights(live_server, translate, http):
    response = translate({"segments": SEGMENTS, "n_best": 5, "search": FAST_SEARCH, "weights": {"lm": 0.7}})
    assert response.status_code == 200
    body = response.json()
    model = http.get(
        live_server.url(f"/v1/models/{live_server.model_id}"), headers=bearer(live_server.keys.translate)
    ).json()
    # The reported weights are the model's with this request's override (the log-linear model's weights).
    assert body["weights"] == model["weights"] | {"lm": 0.7}
    weights = body["weights"]
    for result in body["results"]:
        entries = result["n_best"]
        assert 2 <= len(entries) <= 5
        for entry in entries:
            # Log-linear model (Och & Ney 2002): score = sum_f weight_f * feature_f; DESIGN.md asks 1e-9.
            assert list(entry["features"]) == list(FEATURE_NAMES)
            dot = math.fsum(weights[name] * value for name, value in entry["features"].items())
            assert entry["score"] == pytest.approx(dot, abs=1e-9)
        scores = [entry["score"] for entry in entries]
        assert scores == sorted(scores, reverse=True)  # an n-best list is ranked best first
        assert len({entry["text"] for entry in entries}) == len(entries)  # distinct outputs
        assert result["translation"] == entries[0]["text"]
    assert body["model"] == live_server.model_id and body["elapsed_ms"] > 0
    assert "qualified translator" in body["notice"]


def test_one_result_per_segment_in_order(translate):
    # Normalisation by hand: whitespace runs become one space and the ends are trimmed (decoder.text.normalize).
    segments = ["Delete the backup?", "", "  Click   Save. ", "Click Save.", "Delete the backup?", "%d files"]
    expected_sources = ["Delete the backup?", "", "Click Save.", "Click Save.", "Delete the backup?", "%d files"]
    body = translate({"segments": segments, "search": FAST_SEARCH}).json()
    assert [result["source"] for result in body["results"]] == expected_sources
    translations = [result["translation"] for result in body["results"]]
    assert translations[1] == ""  # an empty segment gives an empty translation, never a dropped result
    assert translations[0] == translations[4] and translations[2] == translations[3]
    assert "%d" in translations[5]  # placeholders come back verbatim


def test_optional_parts_only_when_asked(translate):
    plain = translate({"segments": ["Click Save."], "include": [], "search": FAST_SEARCH}).json()["results"][0]
    assert set(plain) == {"source", "translation", "n_best", "terms", "num_pieces"}
    assert set(plain["n_best"][0]) == {"text", "score"}
    full = translate(
        {
            "segments": ["Open the file, then click Continue."],
            "search": FAST_SEARCH,
            "include": ["segmentation", "alignment"],
        }
    ).json()["results"][0]
    source, translation = full["source"], full["translation"]
    phrases = full["segmentation"]
    # A phrase segmentation covers every source token exactly once (Koehn et al. 2003, section 2).
    covered = sorted(position for phrase in phrases for position in range(*phrase["source_tokens"]))
    assert covered == list(range(len(covered))) and len(covered) >= 7
    for phrase in phrases:
        start, end = phrase["source_characters"]
        assert source[start:end].strip() == source[start:end] and start < end
    for link in full["alignment"]:
        start, end = link["target_characters"]
        assert 0 <= start <= end <= len(translation)


def error_of(response, status: int) -> dict:
    assert response.status_code == status, response.text
    assert response.headers["Content-Type"].startswith("application/json")
    error = response.json()["error"]
    assert set(error) == {"code", "message", "fields", "request_id"}
    assert error["request_id"] == response.headers["X-Request-Id"]
    return error


@pytest.mark.parametrize(
    ("body", "field"),
    [
        ({"segments": ["a"], "colour": "red"}, "colour"),  # unknown field
        ({"segments": "Click Save."}, "segments"),  # wrong type
        ({"segments": []}, "segments"),  # empty list
        ({"segments": ["a"] * 101}, "segments"),  # more than the 100-segment limit
        ({"segments": ["x" * 5001]}, "segments.0"),  # longer than the 5,000-character limit
        ({"segments": ["a"], "n_best": 101}, "n_best"),
        ({"segments": ["a"], "n_best": 0}, "n_best"),
        ({"segments": ["a"], "n_best": 2.0}, "n_best"),  # integers are not accepted as floats
        ({"segments": ["a"], "n_best": "2"}, "n_best"),
        ({"segments": ["a"], "term_mode": "always"}, "term_mode"),
        ({"segments": ["a"], "include": ["scores"]}, "include.0"),
        ({"segments": ["a"], "weights": {"loudness": 1.0}}, "weights.loudness"),
        ({"segments": ["a"], "search": {"stack_size": 0}}, "search.stack_size"),
        ({"segments": ["a"], "search": {"beam": 5}}, "search.beam"),
        ({"segments": ["a"], "terms": [{"source": "trash"}]}, "terms.0.target"),
        ({"segments": ["a"], "glossaries": ["../etc/passwd"]}, "glossaries.0"),
        ({"segments": [7]}, "segments.0"),
    ],
)
def test_invalid_bodies_get_400_naming_the_field(translate, body, field):
    error = error_of(translate(body), 400)
    assert error["code"] == "invalid_request"
    assert field in error["fields"] and error["fields"][field]


def test_limit_messages_say_what_to_do(translate):
    too_many = error_of(translate({"segments": ["a"] * 101}), 400)
    assert "100" in too_many["fields"]["segments"][0] and "split" in too_many["fields"]["segments"][0].lower()
    too_long = error_of(translate({"segments": ["ok", "x" * 5001]}), 400)
    assert "5000" in too_long["fields"]["segments.1"][0]


def test_segment_with_a_control_character_is_named(translate):
    error = error_of(translate({"segments": ["fine", "bad\x07bell", "line\nbreak"]}), 400)
    assert error["code"] == "invalid_text" and set(error["fields"]) == {"segments.1", "segments.2"}


@pytest.mark.parametrize(
    ("data", "code"),
    [
        (b'{"segments": ["a"', "malformed_json"),
        (b'{"segments": [NaN]}', "malformed_json"),
        (b"\xff\xfe{}", "malformed_json"),
        (b'["a"]', "invalid_request"),
        (b"[" * 5000 + b"]" * 5000, None),
    ],
)
def test_malformed_json_gets_400(live_server, http, data, code):
    response = http.post(
        live_server.url("/v1/translations"),
        data=data,
        headers=bearer(live_server.keys.translate) | {"Content-Type": "application/json"},
    )
    error = error_of(response, 400)
    assert code is None or error["code"] == code


@pytest.mark.parametrize(
    "content_type", ["text/plain", "application/x-www-form-urlencoded", None, "application/json; charset=latin-1"]
)
def test_wrong_media_type_gets_415(live_server, http, content_type):
    headers = bearer(live_server.keys.translate) | ({"Content-Type": content_type} if content_type else {})
    response = http.post(live_server.url("/v1/translations"), data=b'{"segments": ["a"]}', headers=headers)
    assert error_of(response, 415)["code"] == "unsupported_media_type"


def test_oversized_body_gets_413(translate):
    # The test server's limit is 200,000 bytes (SERVER_LIMITS); this body is about 250,000.
    response = translate({"segments": ["word " * 1000] * 50})
    assert error_of(response, 413)["code"] == "body_too_large"


def test_unknown_model_and_glossary_get_404(translate):
    assert error_of(translate({"segments": ["a"], "model": "nope"}), 404)["code"] == "model_not_found"
    assert error_of(translate({"segments": ["a"], "glossaries": ["nope"]}), 404)["code"] == "glossary_not_found"


def test_auth_401_without_or_with_a_bad_key_and_403_without_the_scope(live_server, http):
    url = live_server.url("/v1/translations")
    body = {"segments": ["Click Save."], "search": FAST_SEARCH}
    missing = http.post(url, json=body)
    assert error_of(missing, 401)["code"] == "unauthorized"
    assert missing.headers["WWW-Authenticate"].startswith("Bearer realm=")  # RFC 6750 section 3
    wrong = http.post(url, json=body, headers=bearer(live_server.keys.translate[:-2] + "zz"))
    assert error_of(wrong, 401)["code"] == "invalid_key"
    assert 'error="invalid_token"' in wrong.headers["WWW-Authenticate"]
    basic = http.post(url, json=body, headers={"Authorization": "Basic dXNlcjpwYXNz"})
    assert error_of(basic, 401)["code"] == "unauthorized"
    no_scope = http.post(url, json=body, headers=bearer(live_server.keys.glossaries))
    assert error_of(no_scope, 403)["code"] == "insufficient_scope"
    assert 'error="insufficient_scope"' in no_scope.headers["WWW-Authenticate"]
    assert http.post(url, json=body, headers=bearer(live_server.keys.both)).status_code == 200
