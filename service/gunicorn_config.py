"""gunicorn settings for phrasework: ``gunicorn -c python:service.gunicorn_config "service.wsgi:create_app()"``.

- ``preload_app``: the master builds the app (loads the memory-mapped models, opens the database, builds the
  API document) once before forking, so every worker shares the same pages of model data.
- ``sync`` workers (one request at a time each): decoding is CPU-bound, so threads would only queue on the
  GIL; with PHRASEWORK_THREADS > 1 the ``gthread`` class is used instead (for slow clients without a proxy).
- ``timeout``: a worker silent for longer than the translation time budget plus 30 s is killed and replaced;
  the budget itself (``service.translation``) ends slow requests with 503 long before that.
- ``graceful_timeout``: on SIGTERM, workers finish the requests they have for up to 30 s, then exit.
- gunicorn's own error answers (malformed request line, oversized headers) are JSON like the app's, never
  HTML: ``gunicorn.util.write_error`` is replaced below.
- No API keys and a non-loopback bind address: the master refuses to start.

Environment: PHRASEWORK_BIND (comma-separated, default 127.0.0.1:8080), PHRASEWORK_WORKERS (default 2),
PHRASEWORK_THREADS (default 1), PHRASEWORK_TIMEOUT_SECONDS (default: time budget + 30), PHRASEWORK_LOG_LEVEL.
"""

from __future__ import annotations

import gc
import json
import os
import shutil
import sys

import gunicorn.util

from service.binding import DEFAULT_BIND, METRICS_DIR_IS_TEMPORARY, keys_configured, open_binds


def _int_env(name: str, default: int) -> int:
    text = os.environ.get(name, "").strip()
    return int(text) if text else default


bind = [part.strip() for part in os.environ.get("PHRASEWORK_BIND", DEFAULT_BIND).split(",") if part.strip()]
workers = _int_env("PHRASEWORK_WORKERS", 2)
threads = _int_env("PHRASEWORK_THREADS", 1)
worker_class = "gthread" if threads > 1 else "sync"
preload_app = True
timeout = _int_env(
    "PHRASEWORK_TIMEOUT_SECONDS", int(float(os.environ.get("PHRASEWORK_TIME_BUDGET_SECONDS", "30") or 30)) + 30
)
graceful_timeout = 30
keepalive = 5
accesslog = None  # the app writes one JSON line per request, with its request id
errorlog = "-"
loglevel = os.environ.get("PHRASEWORK_LOG_LEVEL", "info") or "info"
# The heartbeat file in memory rather than on disk: a slow container disk must not look like a hung worker
# (the setting gunicorn's documentation recommends for Docker).
worker_tmp_dir = "/dev/shm" if os.path.isdir("/dev/shm") else None
logconfig_dict = {
    "version": 1,
    "disable_existing_loggers": False,
    "formatters": {"json": {"()": "service.logs.JsonFormatter"}},
    "handlers": {"stderr": {"class": "logging.StreamHandler", "formatter": "json", "stream": "ext://sys.stderr"}},
    "loggers": {
        "gunicorn.error": {"handlers": ["stderr"], "level": loglevel.upper(), "propagate": False},
        "gunicorn.access": {"handlers": [], "level": "WARNING", "propagate": False},
    },
    "root": {"handlers": ["stderr"], "level": "WARNING"},
}


def _json_error(sock, status_int: int, reason: str, mesg: str) -> None:
    """Replacement of ``gunicorn.util.write_error``: the same answer as JSON in the app's error shape."""
    code = "_".join(reason.lower().split()) or "error"
    body = json.dumps({"error": {"code": code, "message": mesg or reason, "fields": {}, "request_id": None}})
    response = (
        f"HTTP/1.1 {status_int} {reason}\r\nConnection: close\r\nContent-Type: application/json\r\n"
        f"Content-Length: {len(body.encode('utf-8'))}\r\n\r\n{body}"
    )
    gunicorn.util.write_nonblock(sock, response.encode("utf-8"))


gunicorn.util.write_error = _json_error


def on_starting(server) -> None:
    """Refuse to listen beyond loopback without API keys (the app would accept every request)."""
    exposed = open_binds(server.cfg.bind)
    if exposed and not keys_configured():
        server.log.error(
            "no API keys configured; refusing to bind to %s (only loopback addresses are allowed "
            "without keys: set PHRASEWORK_API_KEYS or PHRASEWORK_API_KEYS_FILE)",
            ", ".join(exposed),
        )
        _remove_metrics_dir()  # on_exit does not run when the start is refused
        sys.exit(2)
    if not keys_configured():
        server.log.warning("no API keys configured: every request is allowed (loopback only)")


def when_ready(server) -> None:
    # Objects that exist now (models, vocabularies, the API document) are moved out of the garbage collector's
    # reach, so collections in the workers do not write to, and so copy, the pages they share with the master.
    gc.freeze()


def child_exit(server, worker) -> None:
    from service.metrics import mark_worker_dead

    mark_worker_dead(worker.pid)


def _remove_metrics_dir() -> None:
    folder = os.environ.get("PROMETHEUS_MULTIPROC_DIR")
    if folder and os.environ.get(METRICS_DIR_IS_TEMPORARY) == "1":
        shutil.rmtree(folder, ignore_errors=True)


def on_exit(server) -> None:
    _remove_metrics_dir()
