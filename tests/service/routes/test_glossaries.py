"""Glossary endpoints on the live server: uploads in three formats, versions as ETags, preconditions, built-in
files, the database lock, term matching, and glossaries used by translations on both workers."""

from __future__ import annotations

import sqlite3
from concurrent.futures import ThreadPoolExecutor

import pytest

from tests.service.conftest import FAST_SEARCH, bearer

ROWS = [{"source": "trash", "target": "papelera"}, {"source": "backup", "target": "copia de seguridad"}]
# What GET returns for ROWS: the defaults of every optional column filled in (status preferred, not
# case-sensitive, empty note, no mode), as decoder/terminology documents them.
ROWS_OUT = [row | {"status": "preferred", "case_sensitive": False, "note": ""} for row in ROWS]

TSV = (
    "source\ttarget\tstatus\tnote\n"
    "sync hub\tcentro de sincronización\tpreferred\tFeature name\n"
    "dashboard\ttablero de mandos\tdeprecated\t\n"
)
TBX = """<?xml version="1.0" encoding="UTF-8"?>
<tbx type="TBX-Basic" style="dca" xml:lang="en" xmlns="urn:iso:std:iso:30042:ed-2">
  <tbxHeader><fileDesc><sourceDesc><p>Invented terms of the Brelqua demo</p></sourceDesc></fileDesc></tbxHeader>
  <text><body>
    <conceptEntry id="c1">
      <langSec xml:lang="en"><termSec><term>sync hub</term></termSec></langSec>
      <langSec xml:lang="es">
        <termSec><term>centro de sincronización</term>
          <termNote type="administrativeStatus">preferredTerm-admn-sts</termNote></termSec>
        <termSec><term>hub de sincronización</term>
          <termNote type="administrativeStatus">deprecatedTerm-admn-sts</termNote></termSec>
      </langSec>
    </conceptEntry>
  </body></text>
</tbx>
"""


@pytest.fixture
def api(live_server, http):
    """Call the API with the all-scopes key unless told otherwise."""

    def call(method: str, path: str, key: str | None = None, **kwargs):
        headers = bearer(key or live_server.keys.both) | kwargs.pop("headers", {})
        return http.request(method, live_server.url(path), headers=headers, **kwargs)

    return call


def error_code(response, status: int) -> str:
    assert response.status_code == status, response.text
    return response.json()["error"]["code"]


def test_versions_etags_and_preconditions(api):
    path = "/v1/glossaries/etag-flow"
    created = api("PUT", path, json={"source_language": "en", "target_language": "es", "entries": ROWS})
    assert created.status_code == 201 and created.headers["Location"] == path
    first = created.headers["ETag"]
    assert first == f'"{created.json()["version"]}"' and created.json()["num_entries"] == 2
    got = api("GET", path)
    assert got.headers["ETag"] == first and got.json()["entries"] == ROWS_OUT and got.json()["kind"] == "uploaded"
    replaced = api("PUT", path, json={"source_language": "en", "target_language": "es", "entries": ROWS[:1]})
    second = replaced.headers["ETag"]
    assert replaced.status_code == 200 and second != first
    # If-Match with the old version: 412 and nothing changes (RFC 9110 section 13.1.1).
    stale = api(
        "PUT",
        path,
        headers={"If-Match": first},
        json={"source_language": "en", "target_language": "es", "entries": ROWS},
    )
    assert error_code(stale, 412) == "precondition_failed" and stale.headers["ETag"] == second
    assert api("GET", path).json()["entries"] == ROWS_OUT[:1]
    current = api(
        "PUT",
        path,
        headers={"If-Match": second},
        json={"source_language": "en", "target_language": "es", "entries": ROWS},
    )
    assert current.status_code == 200
    third = current.headers["ETag"]
    assert error_code(
        api(
            "PUT",
            path,
            headers={"If-None-Match": "*"},
            json={"source_language": "en", "target_language": "es", "entries": ROWS},
        ),
        412,
    )
    assert error_code(api("DELETE", path, headers={"If-Match": second}), 412) == "precondition_failed"
    assert api("DELETE", path, headers={"If-Match": third}).status_code == 204
    assert error_code(api("GET", path), 404) == "glossary_not_found"
    assert error_code(api("DELETE", path), 404) == "glossary_not_found"
    assert error_code(
        api(
            "PUT",
            path,
            headers={"If-Match": third},
            json={"source_language": "en", "target_language": "es", "entries": ROWS},
        ),
        412,
    )
    recreated = api(
        "PUT",
        path,
        headers={"If-None-Match": "*"},
        json={"source_language": "en", "target_language": "es", "entries": ROWS},
    )
    assert recreated.status_code == 201 and recreated.headers["ETag"] not in (first, second, third)
    api("DELETE", path)


@pytest.mark.parametrize(
    ("content_type", "data"),
    [
        ("text/tab-separated-values", TSV),
        ("text/tab-separated-values; charset=utf-8", TSV),
        ("application/x-tbx+xml", TBX),
        ("application/xml", TBX),
    ],
)
def test_tsv_and_tbx_uploads(api, content_type, data):
    path = "/v1/glossaries/file-upload"
    response = api(
        "PUT",
        path + "?source_language=en&target_language=es",
        data=data.encode("utf-8"),
        headers={"Content-Type": content_type},
    )
    assert response.status_code in (200, 201), response.text
    entries = api("GET", path).json()["entries"]
    if "xml" in content_type:  # TBX: one concept, preferred and deprecated Spanish terms
        assert [(e["source"], e["target"], e["status"]) for e in entries] == [
            ("sync hub", "centro de sincronización", "preferred"),
            ("sync hub", "hub de sincronización", "deprecated"),
        ]
    else:
        assert [(e["source"], e["target"], e["status"], e["note"]) for e in entries] == [
            ("sync hub", "centro de sincronización", "preferred", "Feature name"),
            ("dashboard", "tablero de mandos", "deprecated", ""),
        ]
    api("DELETE", path)


def test_upload_errors_name_the_line_and_never_a_server_path(api):
    bad_tsv = "source\ttarget\tstatus\ntrash\tpapelera\tpreferred\nbackup\trespaldo\tmaybe\n"
    response = api(
        "PUT",
        "/v1/glossaries/bad?source_language=en&target_language=es",
        data=bad_tsv.encode(),
        headers={"Content-Type": "text/tab-separated-values"},
    )
    assert error_code(response, 400) == "invalid_glossary"
    message = response.json()["error"]["message"]
    assert message.startswith("upload line 3:") and "maybe" in message and "/tmp" not in message
    broken_xml = api(
        "PUT",
        "/v1/glossaries/bad?source_language=en&target_language=es",
        data=b"<tbx><text>",
        headers={"Content-Type": "application/x-tbx+xml"},
    )
    assert error_code(broken_xml, 400) == "invalid_glossary" and "/tmp" not in broken_xml.text
    no_languages = api(
        "PUT", "/v1/glossaries/bad", data=TSV.encode(), headers={"Content-Type": "text/tab-separated-values"}
    )
    assert error_code(no_languages, 400) == "invalid_request"
    assert set(no_languages.json()["error"]["fields"]) == {"source_language", "target_language"}
    json_status = api(
        "PUT",
        "/v1/glossaries/bad",
        json={
            "source_language": "en",
            "target_language": "es",
            "entries": [{"source": "a", "target": "b", "status": "x"}],
        },
    )
    assert "entries.0.status" in json_status.json()["error"]["fields"]
    bad_language = api(
        "PUT", "/v1/glossaries/bad", json={"source_language": "english", "target_language": "es", "entries": ROWS}
    )
    assert "source_language" in bad_language.json()["error"]["fields"]
    assert error_code(api("GET", "/v1/glossaries/bad"), 404) == "glossary_not_found"


def test_media_type_name_and_size_limits(api):
    assert (
        error_code(api("PUT", "/v1/glossaries/x", data=b"a", headers={"Content-Type": "text/plain"}), 415)
        == "unsupported_media_type"
    )
    assert error_code(
        api(
            "PUT",
            "/v1/glossaries/x?source_language=en&target_language=es",
            data=TSV.encode("latin-1"),
            headers={"Content-Type": "text/tab-separated-values; charset=latin-1"},
        ),
        415,
    )
    assert error_code(api("PUT", "/v1/glossaries/bad%20name", json={}), 400) == "invalid_glossary_name"
    assert error_code(api("PUT", "/v1/glossaries/" + "n" * 200, json={}), 400) == "invalid_glossary_name"
    # The test server accepts glossary uploads up to 300,000 bytes (SERVER_LIMITS); this one has about 420,000.
    big = "source\ttarget\n" + "".join(f"term {number}\ttérmino {number}\n" for number in range(20_000))
    assert (
        error_code(
            api(
                "PUT",
                "/v1/glossaries/big?source_language=en&target_language=es",
                data=big.encode(),
                headers={"Content-Type": "text/tab-separated-values"},
            ),
            413,
        )
        == "body_too_large"
    )


def test_built_in_glossaries_are_listed_readable_and_read_only(api, live_server):
    listed = {item["name"]: item for item in api("GET", "/v1/glossaries").json()["glossaries"]}
    assert listed["demo"]["kind"] == "built_in" and listed["demo"]["source_language"] is None
    demo = api("GET", "/v1/glossaries/demo")  # languages default to the one model's, en -> es
    entries = demo.json()["entries"]
    expected_lines = (live_server.glossary_dir / "demo.tsv").read_text(encoding="utf-8").splitlines()[1:]
    assert len(entries) == len(expected_lines)  # one row per file line: every line is one (source, target)
    assert entries[0] == {
        "source": "Brelqua",
        "target": "Brelqua",
        "status": "preferred",
        "case_sensitive": True,
        "note": "Product name (web and mobile app); never translated.",
    }
    assert demo.headers["ETag"] == f'"{listed["demo"]["version"]}"'
    assert (
        error_code(
            api("PUT", "/v1/glossaries/demo", json={"source_language": "en", "target_language": "es", "entries": ROWS}),
            409,
        )
        == "glossary_read_only"
    )
    assert error_code(api("DELETE", "/v1/glossaries/demo"), 409) == "glossary_read_only"


def test_write_while_another_process_holds_the_lock_gets_409(api, live_server):
    holder = sqlite3.connect(live_server.database, isolation_level=None)
    holder.execute("BEGIN IMMEDIATE")
    try:
        # The test server waits 0.5 s for the lock (SERVER_LIMITS), then answers 409 with Retry-After.
        response = api(
            "PUT", "/v1/glossaries/locked", json={"source_language": "en", "target_language": "es", "entries": ROWS}
        )
        assert error_code(response, 409) == "glossary_busy" and response.headers["Retry-After"] == "7"
        assert api("GET", "/v1/glossaries").status_code == 200  # readers go on (WAL)
    finally:
        holder.execute("ROLLBACK")
        holder.close()
    assert error_code(api("GET", "/v1/glossaries/locked"), 404) == "glossary_not_found"


def test_scopes_of_glossary_endpoints(api, live_server, http):
    body = {"source_language": "en", "target_language": "es", "entries": ROWS}
    assert (
        error_code(api("PUT", "/v1/glossaries/scoped", key=live_server.keys.translate, json=body), 403)
        == "insufficient_scope"
    )
    assert api("PUT", "/v1/glossaries/scoped", key=live_server.keys.glossaries, json=body).status_code == 201
    assert api("GET", "/v1/glossaries/scoped", key=live_server.keys.translate).status_code == 200
    assert error_code(api("DELETE", "/v1/glossaries/scoped", key=live_server.keys.translate), 403)
    assert http.get(live_server.url("/v1/glossaries")).status_code == 401
    assert api("DELETE", "/v1/glossaries/scoped", key=live_server.keys.glossaries).status_code == 204


def test_matches_report_terms_by_line_and_character(api):
    text = "Open the dashboard.\nMove the old backup to the trash.\n\nNothing here."
    response = api("POST", "/v1/glossaries/demo/matches", key=None, json={"text": text})
    assert response.status_code == 200
    found = [
        (m["line"], m["start"], m["end"], m["text"], m["targets"], m["forbidden_targets"])
        for m in response.json()["matches"]
    ]
    # Offsets counted by hand on each line: "Open the " is 9 characters, "Move the old " 13, "backup to the " 14.
    assert found == [
        (1, 9, 18, "dashboard", ["panel de control"], ["tablero de mandos"]),
        (2, 13, 19, "backup", ["copia de seguridad"], ["respaldo", "backup"]),
        (2, 27, 32, "trash", ["papelera"], ["basura"]),
    ]
    assert error_code(api("POST", "/v1/glossaries/none/matches", json={"text": "a"}), 404) == "glossary_not_found"
    assert error_code(api("POST", "/v1/glossaries/demo/matches", json={"text": "a\x07b"}), 400) == "invalid_text"
    assert error_code(api("POST", "/v1/glossaries/demo/matches", json={"txt": "a"}), 400) == "invalid_request"


def test_a_put_on_one_worker_is_used_by_every_worker_next_request(api, live_server):
    path = "/v1/glossaries/shared-terms"
    body = {"source_language": "en", "target_language": "es", "entries": [{"source": "dashboard", "target": "zorbix"}]}
    assert api("PUT", path, json=body).status_code in (200, 201)
    for expected in ("zorbix", "quillon"):
        if expected == "quillon":  # replace the glossary, then check that no worker answers from the old one
            body["entries"][0]["target"] = "quillon"
            assert api("PUT", path, json=body).status_code == 200
        with ThreadPoolExecutor(6) as pool:
            responses = list(
                pool.map(lambda _: api("POST", path + "/matches", json={"text": "Open the dashboard."}), range(12))
            )
        assert {tuple(response.json()["matches"][0]["targets"]) for response in responses} == {(expected,)}
        pids = {line["pid"] for response in responses for line in live_server.log_for(response.headers["X-Request-Id"])}
        assert len(pids) == 2  # both workers answered
    api("DELETE", path)


def translate_many(api, body: dict, count: int) -> list:
    """``count`` concurrent identical translation requests, so that both workers serve some of them."""
    with ThreadPoolExecutor(6) as pool:
        return list(pool.map(lambda _: api("POST", "/v1/translations", json=body), range(count)))


def test_uploaded_glossary_is_enforced_by_every_worker_and_replaced_at_once(api, live_server):
    path = "/v1/glossaries/invented-terms"
    # Target words no model output could contain by chance, so finding them proves the glossary was applied.
    first = api(
        "PUT",
        path,
        json={
            "source_language": "en",
            "target_language": "es",
            "entries": [{"source": "dashboard", "target": "zorbix"}],
        },
    )
    assert first.status_code in (200, 201)
    body = {
        "segments": ["Open the dashboard.", "The dashboard shows your files."],
        "glossaries": ["invented-terms"],
        "term_mode": "enforce",
        "search": FAST_SEARCH,
    }
    responses = translate_many(api, body, 10)
    pids = {line["pid"] for response in responses for line in live_server.log_for(response.headers["X-Request-Id"])}
    assert len(pids) == 2  # both workers served the glossary the first worker stored
    for response in responses:
        for result in response.json()["results"]:
            assert "zorbix" in result["translation"].lower()
            assert [(term["entry_source"], term["target"], term["in_output"]) for term in result["terms"]] == [
                ("dashboard", "zorbix", True)
            ]
    second = api(
        "PUT",
        path,
        headers={"If-Match": first.headers["ETag"]},
        json={
            "source_language": "en",
            "target_language": "es",
            "entries": [{"source": "dashboard", "target": "quillon"}],
        },
    )
    assert second.status_code == 200
    for response in translate_many(api, body, 10):  # the next request of each worker sees the new version
        translations = [result["translation"].lower() for result in response.json()["results"]]
        assert all("quillon" in text and "zorbix" not in text for text in translations)
    api("DELETE", path)


def test_inline_terms_and_built_in_glossary_in_enforce_and_off_modes(api):
    body = {"segments": ["Open the sync hub."], "glossaries": ["demo"], "search": FAST_SEARCH}
    enforced = api("POST", "/v1/translations", json=body | {"term_mode": "enforce"}).json()["results"][0]
    assert "centro de sincronización" in enforced["translation"].lower()
    assert [(term["glossary"], term["target"], term["in_output"], term["reason"]) for term in enforced["terms"]] == [
        ("demo", "centro de sincronización", True, None)
    ]
    inline = api("POST", "/v1/translations", json=body | {"terms": [{"source": "sync hub", "target": "vexmora"}]})
    assert "vexmora" in inline.json()["results"][0]["translation"].lower()  # request terms win over glossaries
    off = api(
        "POST",
        "/v1/translations",
        json=body | {"term_mode": "off", "terms": [{"source": "sync hub", "target": "vexmora"}]},
    )
    result = off.json()["results"][0]
    assert "vexmora" not in result["translation"].lower()
    assert [term["reason"] for term in result["terms"] if term["target"] == "vexmora"] in ([], ["mode_off"])
