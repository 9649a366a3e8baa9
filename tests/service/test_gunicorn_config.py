"""gunicorn with our config: its own error answers are JSON, and without keys it listens on loopback only."""

from __future__ import annotations

import json
import socket
import subprocess

from tests.service.conftest import start_server, stop_server


def raw_request(base_url: str, data: bytes) -> bytes:
    host, port = base_url.removeprefix("http://").split(":")
    with socket.create_connection((host, int(port)), timeout=10) as connection:
        connection.sendall(data)
        chunks = []
        while chunk := connection.recv(65536):
            chunks.append(chunk)
    return b"".join(chunks)


def test_gunicorn_level_errors_are_json(live_server):
    # A request line that is not HTTP never reaches the app; gunicorn answers it (RFC 9112 section 3).
    answer = raw_request(live_server.base_url, b"NOT A REQUEST LINE AT ALL\r\n\r\n")
    head, _, body = answer.partition(b"\r\n\r\n")
    assert head.startswith(b"HTTP/1.1 400 ") and b"Content-Type: application/json" in head
    error = json.loads(body)["error"]
    assert error["code"] == "bad_request" and set(error) == {"code", "message", "fields", "request_id"}
    assert b"<html" not in answer


def test_without_keys_a_public_bind_address_is_refused(model_dir, tmp_path, monkeypatch):
    # The launcher's own check is switched off here (it refuses first; see test_launcher), because gunicorn's
    # start hook must refuse too, for anyone who runs gunicorn with our config directly.
    monkeypatch.setattr("service.launcher.open_binds", lambda binds: [])
    process, _, log_path = start_server(model_dir, tmp_path, keys=None, bind_host="0.0.0.0")
    monkeypatch.undo()
    try:
        assert process.wait(timeout=60) != 0
    except subprocess.TimeoutExpired:
        stop_server(process)
        raise
    log = log_path.read_text()
    assert "refusing to bind to 0.0.0.0" in log and "PHRASEWORK_API_KEYS" in log
