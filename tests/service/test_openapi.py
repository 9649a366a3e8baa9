"""schemathesis against /openapi.json of a live server: generated requests never get a 5xx, and every answer
matches the document (status codes, content types, headers, bodies).

A separate server with tight limits (3 segments of 80 characters, n_best up to 5) runs this, so generated
requests stay cheap to decode and the fuzzed glossaries stay out of the main server's database; the limits
are read from the document, so schemathesis generates within them as any client would."""

from __future__ import annotations

import pytest
import schemathesis
from hypothesis import HealthCheck, given, settings
from schemathesis.checks import not_a_server_error
from schemathesis.specs.openapi.checks import (
    content_type_conformance,
    response_headers_conformance,
    response_schema_conformance,
    status_code_conformance,
)

from tests.service.conftest import bearer, start_server, stop_server, wait_until_ready

MAX_EXAMPLES = 25  # per operation; 13 operations, about a minute at most (a slow test)
FUZZ_LIMITS = {"PHRASEWORK_MAX_SEGMENTS": "3", "PHRASEWORK_MAX_SEGMENT_CHARACTERS": "80", "PHRASEWORK_MAX_N_BEST": "5"}


@pytest.fixture(scope="module")
def fuzz_server(model_dir, api_keys, tmp_path_factory):
    folder = tmp_path_factory.mktemp("fuzz-server")
    process, base_url, log_path = start_server(model_dir, folder, api_keys, FUZZ_LIMITS)
    try:
        wait_until_ready(process, base_url, log_path)
        yield base_url
    finally:
        stop_server(process)


@pytest.mark.slow
def test_generated_requests_get_no_5xx_and_match_the_document(fuzz_server, api_keys):
    # Each operation's strategy driven by hypothesis directly (schemathesis' Python API); the pytest
    # loader (schemathesis.pytest.from_fixture) does not run under this pytest version.
    schema = schemathesis.openapi.from_url(fuzz_server + "/openapi.json")
    checks = [
        not_a_server_error,
        status_code_conformance,
        content_type_conformance,
        response_headers_conformance,
        response_schema_conformance,
    ]
    operations = [result.ok() for result in schema.get_all_operations()]
    labels = {operation.label for operation in operations}
    assert labels >= {
        "POST /v1/translations",
        "PUT /v1/glossaries/{name}",
        "POST /v1/glossaries/{name}/matches",
        "DELETE /v1/glossaries/{name}",
        "GET /v1/models/{model_id}",
    }, labels
    for operation in operations:

        @settings(
            max_examples=MAX_EXAMPLES,
            deadline=None,
            database=None,
            derandomize=True,
            suppress_health_check=list(HealthCheck),
        )
        @given(case=operation.as_strategy())
        def check(case):
            response = case.call(headers=bearer(api_keys.both), timeout=60)
            case.validate_response(response, checks=checks)

        check()
