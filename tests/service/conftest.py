"""Fixtures of the service tests: a small real model, API keys, and a real gunicorn with two workers.

The model is trained once per session on the first 800 pairs of the demo corpus (a few seconds); the server
is started once per session through ``service.launcher.gunicorn_command``, exactly as ``phrasework serve``
starts it, on a free loopback port, and stopped with SIGTERM (graceful) at the end.
"""

from __future__ import annotations

import json
import os
import shutil
import signal
import socket
import subprocess
import time
from dataclasses import dataclass
from pathlib import Path

import pytest
import requests

from decoder.align.aligner import AlignmentSettings
from decoder.training import TrainingSettings, train_model
from service.auth import SCOPE_GLOSSARIES, SCOPE_TRANSLATE, new_key
from service.launcher import gunicorn_command

REPO = Path(__file__).resolve().parents[2]
MODEL_PAIRS = 800
READY_WAIT_SECONDS = 90
# Small search limits keep each test translation in the tens of milliseconds; results stay deterministic.
FAST_SEARCH = {"stack_size": 10, "cube_pop_limit": 20}


@pytest.fixture(scope="session")
def model_dir(tmp_path_factory) -> Path:
    folder = tmp_path_factory.mktemp("service-model")
    for side in ("en", "es"):
        lines = (REPO / "demo_models" / "corpus" / f"train.{side}").read_text(encoding="utf-8").splitlines()
        (folder / f"train.{side}").write_text("\n".join(lines[:MODEL_PAIRS]) + "\n", encoding="utf-8")
    settings = TrainingSettings(alignment=AlignmentSettings(model1_iterations=4, hmm_iterations=3))
    summary = train_model(
        folder / "train.en", folder / "train.es", "en", "es", folder / "demo-en-es", settings=settings
    )
    return summary.model_dir


@dataclass(frozen=True)
class Keys:
    translate: str
    glossaries: str
    both: str
    lines: str  # the hash lines, one per key


@pytest.fixture(scope="session")
def api_keys() -> Keys:
    made = [new_key([SCOPE_TRANSLATE]), new_key([SCOPE_GLOSSARIES]), new_key([SCOPE_TRANSLATE, SCOPE_GLOSSARIES])]
    return Keys(made[0][0], made[1][0], made[2][0], "\n".join(line for _, line in made) + "\n")


def bearer(key: str) -> dict[str, str]:
    return {"Authorization": f"Bearer {key}"}


def free_port() -> int:
    with socket.socket() as probe:
        probe.bind(("127.0.0.1", 0))
        return probe.getsockname()[1]


@dataclass(frozen=True)
class LiveServer:
    base_url: str
    log_path: Path
    database: Path
    glossary_dir: Path
    model_id: str
    keys: Keys
    process: subprocess.Popen

    def url(self, path: str) -> str:
        return self.base_url + path

    def log_lines(self) -> list[dict]:
        """Every JSON line the server has logged so far (gunicorn's own lines included)."""
        lines = []
        for line in self.log_path.read_text(encoding="utf-8").splitlines():
            if line.startswith("{"):
                lines.append(json.loads(line))
        return lines

    def log_for(self, request_id: str) -> list[dict]:
        return [line for line in self.log_lines() if line.get("request_id") == request_id]


# Limits of the test server: small enough to reach cheaply, so the error paths run in milliseconds.
SERVER_LIMITS = {
    "PHRASEWORK_MAX_BODY_BYTES": "200000",
    "PHRASEWORK_MAX_GLOSSARY_BYTES": "300000",
    "PHRASEWORK_DATABASE_TIMEOUT_SECONDS": "0.5",
    "PHRASEWORK_RETRY_AFTER_SECONDS": "7",
}


def start_server(
    model_dir: Path,
    folder: Path,
    keys: Keys | None,
    extra_env: dict[str, str] | None = None,
    bind_host: str = "127.0.0.1",
) -> tuple[subprocess.Popen, str, Path]:
    """Start gunicorn (2 workers) the way the launcher does; returns (process, base url, log path)."""
    port = free_port()
    environ = {key: value for key, value in os.environ.items() if not key.startswith(("PHRASEWORK_", "PROMETHEUS_"))}
    environ |= SERVER_LIMITS | (extra_env or {})
    keys_file = None
    if keys is not None:
        keys_file = folder / "keys.txt"
        keys_file.write_text(keys.lines, encoding="utf-8")
    glossary_dir = folder / "glossaries"
    glossary_dir.mkdir(exist_ok=True)
    shutil.copy(REPO / "glossaries" / "demo.tsv", glossary_dir / "demo.tsv")
    argv, env = gunicorn_command(
        [model_dir],
        glossary_dir,
        folder / "glossaries.sqlite3",
        f"{bind_host}:{port}",
        workers=2,
        api_keys_file=keys_file,
        environ=environ,
    )
    log_path = folder / "server.log"
    with open(log_path, "wb") as log:
        process = subprocess.Popen(
            argv, env=env, stdout=log, stderr=subprocess.STDOUT, cwd=folder, start_new_session=True
        )
    return process, f"http://127.0.0.1:{port}", log_path


def wait_until_ready(process: subprocess.Popen, base_url: str, log_path: Path) -> None:
    deadline = time.monotonic() + READY_WAIT_SECONDS
    while time.monotonic() < deadline:
        if process.poll() is not None:
            raise RuntimeError(f"gunicorn exited with {process.returncode}:\n{log_path.read_text()[-3000:]}")
        try:
            if requests.get(base_url + "/readyz", timeout=2).status_code == 200:
                return
        except requests.ConnectionError:
            pass
        time.sleep(0.1)
    stop_server(process)
    raise RuntimeError(f"gunicorn not ready after {READY_WAIT_SECONDS} s:\n{log_path.read_text()[-3000:]}")


def stop_server(process: subprocess.Popen) -> None:
    if process.poll() is None:
        process.send_signal(signal.SIGTERM)
        try:
            process.wait(timeout=40)
        except subprocess.TimeoutExpired:
            os.killpg(process.pid, signal.SIGKILL)
            process.wait(timeout=10)


@pytest.fixture(scope="session")
def live_server(model_dir, api_keys, tmp_path_factory) -> LiveServer:
    folder = tmp_path_factory.mktemp("live-server")
    process, base_url, log_path = start_server(model_dir, folder, api_keys)
    try:
        wait_until_ready(process, base_url, log_path)
        yield LiveServer(
            base_url, log_path, folder / "glossaries.sqlite3", folder / "glossaries", model_dir.name, api_keys, process
        )
    finally:
        stop_server(process)


@pytest.fixture
def http() -> requests.Session:
    with requests.Session() as session:
        yield session
