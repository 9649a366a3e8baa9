"""The gunicorn command the CLI runs, and the launcher's checks."""

from __future__ import annotations

import os
import signal
import subprocess
import sys
from pathlib import Path

import pytest
import requests

from decoder.errors import ConfigurationError
from service.auth import SCOPE_TRANSLATE, new_key
from service.launcher import gunicorn_command, main
from tests.service.conftest import free_port, wait_until_ready


def test_command_and_environment(tmp_path):
    model, glossaries = tmp_path / "model", tmp_path / "glossaries"
    model.mkdir()
    glossaries.mkdir()
    argv, env = gunicorn_command(
        [model],
        glossaries,
        "g.sqlite3",
        "127.0.0.1:9123",
        workers=3,
        environ={"HOME": "/home/x", "PROMETHEUS_MULTIPROC_DIR": "/stale"},
    )
    assert argv == [
        sys.executable,
        "-m",
        "gunicorn",
        "--config",
        "python:service.gunicorn_config",
        "service.wsgi:create_app()",
    ]
    assert env["HOME"] == "/home/x"
    assert env["PHRASEWORK_MODEL_DIRS"] == str(model.resolve())
    assert env["PHRASEWORK_GLOSSARY_DIR"] == str(glossaries.resolve())
    assert env["PHRASEWORK_DATABASE"] == str(Path("g.sqlite3").resolve())  # absolute: independent of the cwd
    assert (env["PHRASEWORK_BIND"], env["PHRASEWORK_WORKERS"]) == ("127.0.0.1:9123", "3")
    metrics_dir = Path(env["PROMETHEUS_MULTIPROC_DIR"])
    assert metrics_dir != Path("/stale") and metrics_dir.is_dir() and not list(metrics_dir.iterdir())
    metrics_dir.rmdir()
    two_models = gunicorn_command([model, glossaries], environ={})[1]
    assert two_models["PHRASEWORK_MODEL_DIRS"].split(os.pathsep) == [str(model.resolve()), str(glossaries.resolve())]
    Path(two_models["PROMETHEUS_MULTIPROC_DIR"]).rmdir()


def test_public_bind_needs_keys(tmp_path):
    model = tmp_path / "model"
    model.mkdir()
    with pytest.raises(ConfigurationError, match="loopback"):
        gunicorn_command([model], bind="0.0.0.0:8080", environ={})
    _, line = new_key([SCOPE_TRANSLATE])
    _, env = gunicorn_command([model], bind="0.0.0.0:8080", environ={"PHRASEWORK_API_KEYS": line})
    Path(env["PROMETHEUS_MULTIPROC_DIR"]).rmdir()


@pytest.mark.parametrize(
    ("arguments", "message"),
    [([], "at least one model"), (["missing-dir"], "does not exist")],
)
def test_bad_arguments(tmp_path, arguments, message):
    with pytest.raises(ConfigurationError, match=message):
        gunicorn_command([tmp_path / name for name in arguments], environ={})


def test_main_prints_one_line_and_exits_2(tmp_path, capsys):
    assert main(["--model", str(tmp_path / "nope")]) == 2
    assert capsys.readouterr().err.startswith("phrasework: error: model directory")


def test_launcher_execs_gunicorn_which_serves_and_stops_gracefully(model_dir, tmp_path):
    port = free_port()
    environ = {key: value for key, value in os.environ.items() if not key.startswith(("PHRASEWORK_", "PROMETHEUS_"))}
    log_path = tmp_path / "launcher.log"
    with open(log_path, "wb") as log:
        process = subprocess.Popen(
            [
                sys.executable,
                "-m",
                "service.launcher",
                "--model",
                str(model_dir),
                "--bind",
                f"127.0.0.1:{port}",
                "--workers",
                "1",
                "--database",
                str(tmp_path / "g.sqlite3"),
            ],
            env=environ,
            stdout=log,
            stderr=subprocess.STDOUT,
            cwd=tmp_path,
        )
    try:
        wait_until_ready(process, f"http://127.0.0.1:{port}", log_path)
        # Same pid: the launcher replaced itself with gunicorn (exec), so signals reach gunicorn directly.
        command = Path(f"/proc/{process.pid}/cmdline").read_bytes().split(b"\0")
        assert b"gunicorn" in command
        variables = dict(
            item.split(b"=", 1)
            for item in Path(f"/proc/{process.pid}/environ").read_bytes().split(b"\0")
            if b"=" in item
        )
        metrics_dir = Path(variables[b"PROMETHEUS_MULTIPROC_DIR"].decode())
        assert metrics_dir.is_dir()
        assert requests.get(f"http://127.0.0.1:{port}/healthz", timeout=5).status_code == 200
    finally:
        process.send_signal(signal.SIGTERM)
        assert process.wait(timeout=60) == 0  # graceful stop
    assert not metrics_dir.exists()  # the per-start metrics folder is removed on exit
