"""Prometheus metrics, counted across all gunicorn workers (prometheus_client multiprocess mode).

Multiprocess mode is on when PROMETHEUS_MULTIPROC_DIR names a folder when this module is first imported:
every worker then writes its values to memory-mapped files there, and ``/metrics`` sums the files of all
workers, live and dead. ``service.launcher`` creates a fresh, empty folder for each start (stale files from
an earlier run would be counted again). Without the variable (tests in one process, ``flask run``) the
ordinary in-process registry is used. Only counters and histograms are defined: both add up across
processes without a multiprocess mode of their own.

Labels are bounded: ``route`` is the URL rule ("/v1/glossaries/<name>"), never the raw path, and ``model``
is a loaded model's id.
"""

from __future__ import annotations

import os

from prometheus_client import (
    CONTENT_TYPE_LATEST,
    REGISTRY,
    CollectorRegistry,
    Counter,
    Histogram,
    generate_latest,
    multiprocess,
)

MULTIPROCESS_ENV = "PROMETHEUS_MULTIPROC_DIR"
# Request latencies from 5 ms to 60 s: a short UI string on a warm model takes milliseconds, a 100-segment
# batch can take tens of seconds (the time budget's default is 30 s).
LATENCY_BUCKETS = (0.005, 0.01, 0.025, 0.05, 0.1, 0.25, 0.5, 1.0, 2.5, 5.0, 10.0, 30.0, 60.0)

REQUESTS = Counter(
    "phrasework_http_requests", "HTTP requests answered, by route, method and status.", ["route", "method", "status"]
)
LATENCY = Histogram(
    "phrasework_http_request_duration_seconds",
    "Time from request start to response, seconds.",
    ["route", "method"],
    buckets=LATENCY_BUCKETS,
)
SEGMENTS = Counter("phrasework_segments_translated", "Segments translated, by model.", ["model"])
WORDS = Counter(
    "phrasework_source_words_translated", "Source words translated (whitespace-separated), by model.", ["model"]
)
DECODER_SECONDS = Histogram(
    "phrasework_decoder_seconds", "Decoder time per translation request, seconds.", ["model"], buckets=LATENCY_BUCKETS
)
BUDGET_EXCEEDED = Counter(
    "phrasework_time_budget_exceeded", "Translation requests stopped because their time budget ran out.", ["model"]
)


def is_multiprocess() -> bool:
    return bool(os.environ.get(MULTIPROCESS_ENV))


def render() -> tuple[bytes, str]:
    """(body, content type) of the Prometheus text exposition of all workers' metrics."""
    if is_multiprocess():
        registry = CollectorRegistry()
        multiprocess.MultiProcessCollector(registry)
        return generate_latest(registry), CONTENT_TYPE_LATEST
    return generate_latest(REGISTRY), CONTENT_TYPE_LATEST


def mark_worker_dead(pid: int) -> None:
    """Tell prometheus_client that worker ``pid`` exited (gunicorn's child_exit hook calls this)."""
    if is_multiprocess():
        multiprocess.mark_process_dead(pid)
