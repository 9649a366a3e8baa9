"""Which bind addresses are loopback-only, and whether API keys are configured: the rule that a service
without keys may listen on loopback only (checked by ``service.launcher`` and again by gunicorn's start hook)."""

from __future__ import annotations

import ipaddress
import os
from collections.abc import Iterable, Mapping
from pathlib import Path

from service.auth import KeyRing

DEFAULT_BIND = "127.0.0.1:8080"
# Set by the launcher when it created PROMETHEUS_MULTIPROC_DIR itself, so gunicorn removes the folder on exit.
METRICS_DIR_IS_TEMPORARY = "PHRASEWORK_METRICS_DIR_IS_TEMPORARY"


def is_loopback(bind: str) -> bool:
    """True for "127.x.x.x:port", "[::1]:port", "localhost:port" and "unix:/path"; False for anything else,
    including "0.0.0.0", other host names (they may resolve anywhere) and inherited sockets ("fd://3")."""
    if bind.startswith("unix:"):
        return True
    if bind.startswith("fd://"):
        return False
    host = bind
    if bind.startswith("["):
        host = bind[1:].split("]", 1)[0]
    elif bind.count(":") == 1:
        host = bind.split(":", 1)[0]
    if host == "localhost":
        return True
    try:
        return ipaddress.ip_address(host).is_loopback
    except ValueError:
        return False


def keys_configured(environ: Mapping[str, str] | None = None) -> int:
    """How many API keys PHRASEWORK_API_KEYS_FILE and PHRASEWORK_API_KEYS give (InputFileError if malformed)."""
    environ = os.environ if environ is None else environ
    path = environ.get("PHRASEWORK_API_KEYS_FILE", "").strip()
    return len(KeyRing.from_sources(Path(path) if path else None, environ.get("PHRASEWORK_API_KEYS", "")))


def open_binds(binds: Iterable[str]) -> list[str]:
    """The addresses in ``binds`` that are not loopback-only."""
    return [bind for bind in binds if not is_loopback(bind)]
