"""The WSGI entry point gunicorn loads: ``service.wsgi:create_app()``.

Configuration comes from ``PHRASEWORK_*`` environment variables (``service.config``); ``overrides`` (by field
name, Limits fields included) replace them, which is how tests and embedding programs configure an app.
"""

from __future__ import annotations

import logging
from collections.abc import Mapping

from flask import Flask

from decoder.errors import DecoderError
from service.app import build_app
from service.config import settings_from_environ
from service.logs import configure_logging

log = logging.getLogger("phrasework.service")


def create_app(overrides: Mapping[str, object] | None = None) -> Flask:
    """The application configured from the environment (plus ``overrides``).

    A configuration problem (no models, a corrupt model file, a bad key line) is logged as one JSON line and
    ends the process with SystemExit and the same message, instead of a traceback."""
    try:
        settings = settings_from_environ()
        if overrides:
            settings = settings.with_overrides(overrides)
        return build_app(settings)
    except DecoderError as error:
        configure_logging()
        log.error("cannot start", extra={"event": {"error_code": error.code, "detail": str(error)}})
        raise SystemExit(f"phrasework: cannot start the service: {error}") from error
