"""JSON-lines logging: one object per line with time, level, logger, message, pid and the request id.

The request id of the request being handled lives in a context variable (set by the app for each request),
so every line logged while handling it carries the id, whichever module logs. Structured details go in
``extra={"event": {...}}`` and are merged into the object. Segment text never reaches the log unless the
operator sets PHRASEWORK_LOG_CONTENT=1 (translation content is often confidential); that decision is made
where the events are built (``service.app``), not here.
"""

from __future__ import annotations

import contextvars
import datetime as dt
import json
import logging
import os
import re
import sys
import uuid

REQUEST_ID: contextvars.ContextVar[str | None] = contextvars.ContextVar("phrasework_request_id", default=None)
# A client-sent X-Request-Id is kept only if it is short and plain, so it can neither forge log structure
# nor blow up log lines; otherwise a fresh one is generated.
_CLIENT_REQUEST_ID = re.compile(r"[A-Za-z0-9._:\-]{1,128}")


def request_id_from(header_value: str | None) -> str:
    """The client's X-Request-Id if acceptable, else a new random id (32 hex digits)."""
    if header_value and _CLIENT_REQUEST_ID.fullmatch(header_value):
        return header_value
    return uuid.uuid4().hex


class JsonFormatter(logging.Formatter):
    """Formats a record as one JSON object (keys: time, level, logger, message, pid, request_id, ...)."""

    def format(self, record: logging.LogRecord) -> str:
        payload: dict[str, object] = {
            "time": dt.datetime.fromtimestamp(record.created, dt.UTC).isoformat(timespec="milliseconds"),
            "level": record.levelname.lower(),
            "logger": record.name,
            "message": record.getMessage(),
            "pid": os.getpid(),
        }
        request_id = getattr(record, "request_id", None) or REQUEST_ID.get()
        if request_id:
            payload["request_id"] = request_id
        event = getattr(record, "event", None)
        if isinstance(event, dict):
            payload.update({key: value for key, value in event.items() if key not in payload})
        if record.exc_info:
            payload["exception"] = self.formatException(record.exc_info)
        return json.dumps(payload, ensure_ascii=False, default=str)


def configure_logging(level: str = "info") -> None:
    """Send the ``phrasework`` loggers to stderr as JSON lines (idempotent: one handler however often called)."""
    logger = logging.getLogger("phrasework")
    logger.setLevel(level.upper())
    if not any(getattr(handler, "_phrasework", False) for handler in logger.handlers):
        handler = logging.StreamHandler(sys.stderr)
        handler.setFormatter(JsonFormatter())
        handler._phrasework = True  # type: ignore[attr-defined]
        logger.addHandler(handler)
    logger.propagate = False
