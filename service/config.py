"""Service settings: one frozen record built from ``PHRASEWORK_*`` environment variables (plus overrides).

Every variable, its default and its unit:

    PHRASEWORK_MODEL_DIRS                 model directories, separated by os.pathsep (":" on POSIX); required
    PHRASEWORK_GLOSSARY_DIR               folder of built-in (read-only) glossary files; default: none
    PHRASEWORK_DATABASE                   SQLite file of uploaded glossaries; default phrasework-glossaries.sqlite3
    PHRASEWORK_API_KEYS_FILE              file of API key hash lines (see service.auth); default: none
    PHRASEWORK_API_KEYS                   the same lines inline, separated by newlines or ";"; default: none
    PHRASEWORK_MAX_SEGMENTS               segments per translation request; default 100
    PHRASEWORK_MAX_SEGMENT_CHARACTERS     characters per segment (and per matched text); default 5000
    PHRASEWORK_MAX_N_BEST                 largest n_best a request may ask for; default 100
    PHRASEWORK_MAX_BODY_BYTES             request body limit, glossary uploads excepted; default 4 MiB
    PHRASEWORK_MAX_GLOSSARY_BYTES         glossary upload limit; default 64 MiB
    PHRASEWORK_TIME_BUDGET_SECONDS        decoding time one translation request may use; default 30
    PHRASEWORK_RETRY_AFTER_SECONDS        Retry-After sent with 503 answers; default 5
    PHRASEWORK_DATABASE_TIMEOUT_SECONDS   wait for another writer's lock before answering 409; default 5
    PHRASEWORK_LOG_CONTENT                1: log segment text and translations (debugging only); default 0
    PHRASEWORK_LOG_LEVEL                  debug, info, warning or error; default info
    PHRASEWORK_VERIFY_MODELS              0: skip the array checksums at start-up; default 1

The gunicorn settings (PHRASEWORK_BIND, PHRASEWORK_WORKERS, PHRASEWORK_THREADS, PHRASEWORK_TIMEOUT_SECONDS) are
read by ``service.gunicorn_config``; they do not concern the application itself.
"""

from __future__ import annotations

import dataclasses
import os
from collections.abc import Mapping
from dataclasses import dataclass, field
from pathlib import Path

from decoder.errors import ConfigurationError

ENV_PREFIX = "PHRASEWORK_"
DEFAULT_DATABASE = "phrasework-glossaries.sqlite3"
MIB = 1024 * 1024


@dataclass(frozen=True, slots=True)
class Limits:
    """What one request may ask for. Sizes in characters or bytes as named; times in seconds."""

    max_segments: int = 100
    max_segment_characters: int = 5000
    max_n_best: int = 100
    # 100 segments x 5000 characters x up to 4 UTF-8 bytes is 2 MB of text; twice that leaves room for JSON
    # escapes and the other fields.
    max_body_bytes: int = 4 * MIB
    max_glossary_bytes: int = 64 * MIB
    time_budget_seconds: float = 30.0
    retry_after_seconds: int = 5
    database_timeout_seconds: float = 5.0

    def __post_init__(self) -> None:
        for name in ("max_segments", "max_segment_characters", "max_n_best", "max_body_bytes", "max_glossary_bytes"):
            if getattr(self, name) < 1:
                raise ConfigurationError(f"{name} must be at least 1")
        if not self.time_budget_seconds > 0 or not self.database_timeout_seconds >= 0:
            raise ConfigurationError("time_budget_seconds must be positive and database_timeout_seconds >= 0")
        if self.retry_after_seconds < 0:
            raise ConfigurationError("retry_after_seconds must not be negative")


@dataclass(frozen=True, slots=True)
class ServiceSettings:
    """Everything ``service.app.build_app`` needs; paths are not checked here (the app does, at start-up)."""

    model_dirs: tuple[Path, ...]
    glossary_dir: Path | None = None
    database: Path = Path(DEFAULT_DATABASE)
    api_keys_file: Path | None = None
    api_keys_text: str = ""
    limits: Limits = field(default_factory=Limits)
    log_content: bool = False
    log_level: str = "info"
    verify_models: bool = True

    def with_overrides(self, overrides: Mapping[str, object]) -> ServiceSettings:
        """A copy with fields replaced by name; names of ``Limits`` fields are accepted at top level too."""
        limit_names = {item.name for item in dataclasses.fields(Limits)}
        own_names = {item.name for item in dataclasses.fields(ServiceSettings)}
        unknown = set(overrides) - limit_names - own_names
        if unknown:
            raise ConfigurationError(f"unknown service setting(s): {', '.join(sorted(unknown))}")
        limits = dataclasses.replace(self.limits, **{k: v for k, v in overrides.items() if k in limit_names})
        values: dict[str, object] = {k: v for k, v in overrides.items() if k in own_names}
        values.setdefault("limits", limits)
        if "model_dirs" in values:
            values["model_dirs"] = tuple(Path(path) for path in values["model_dirs"])  # type: ignore[union-attr]
        for name in ("glossary_dir", "database", "api_keys_file"):
            if values.get(name) is not None:
                values[name] = Path(values[name])  # type: ignore[arg-type]
        return dataclasses.replace(self, **values)  # type: ignore[arg-type]


def _number(environ: Mapping[str, str], name: str, default: float, kind: type) -> float:
    text = environ.get(ENV_PREFIX + name, "").strip()
    if not text:
        return default
    try:
        return kind(text)
    except ValueError:
        raise ConfigurationError(
            f"{ENV_PREFIX}{name} must be {'an integer' if kind is int else 'a number'}, not {text!r}"
        ) from None


def _flag(environ: Mapping[str, str], name: str, default: bool) -> bool:
    text = environ.get(ENV_PREFIX + name, "").strip().lower()
    if not text:
        return default
    if text in ("1", "true", "yes", "on"):
        return True
    if text in ("0", "false", "no", "off"):
        return False
    raise ConfigurationError(f"{ENV_PREFIX}{name} must be 1 or 0, not {text!r}")


def _optional_path(environ: Mapping[str, str], name: str) -> Path | None:
    text = environ.get(ENV_PREFIX + name, "").strip()
    return Path(text) if text else None


def settings_from_environ(environ: Mapping[str, str] | None = None) -> ServiceSettings:
    """The settings described in this module's docstring, read from ``environ`` (default ``os.environ``).

    Raises ConfigurationError naming the variable that is malformed. A missing PHRASEWORK_MODEL_DIRS gives an
    empty model list, which the app refuses with its own message."""
    environ = os.environ if environ is None else environ
    model_dirs = tuple(
        Path(part) for part in environ.get(ENV_PREFIX + "MODEL_DIRS", "").split(os.pathsep) if part.strip()
    )
    defaults = Limits()
    limits = Limits(
        max_segments=int(_number(environ, "MAX_SEGMENTS", defaults.max_segments, int)),
        max_segment_characters=int(_number(environ, "MAX_SEGMENT_CHARACTERS", defaults.max_segment_characters, int)),
        max_n_best=int(_number(environ, "MAX_N_BEST", defaults.max_n_best, int)),
        max_body_bytes=int(_number(environ, "MAX_BODY_BYTES", defaults.max_body_bytes, int)),
        max_glossary_bytes=int(_number(environ, "MAX_GLOSSARY_BYTES", defaults.max_glossary_bytes, int)),
        time_budget_seconds=_number(environ, "TIME_BUDGET_SECONDS", defaults.time_budget_seconds, float),
        retry_after_seconds=int(_number(environ, "RETRY_AFTER_SECONDS", defaults.retry_after_seconds, int)),
        database_timeout_seconds=_number(environ, "DATABASE_TIMEOUT_SECONDS", defaults.database_timeout_seconds, float),
    )
    log_level = environ.get(ENV_PREFIX + "LOG_LEVEL", "info").strip().lower() or "info"
    if log_level not in ("debug", "info", "warning", "error"):
        raise ConfigurationError(f"{ENV_PREFIX}LOG_LEVEL must be debug, info, warning or error, not {log_level!r}")
    return ServiceSettings(
        model_dirs=model_dirs,
        glossary_dir=_optional_path(environ, "GLOSSARY_DIR"),
        database=_optional_path(environ, "DATABASE") or Path(DEFAULT_DATABASE),
        api_keys_file=_optional_path(environ, "API_KEYS_FILE"),
        api_keys_text=environ.get(ENV_PREFIX + "API_KEYS", ""),
        limits=limits,
        log_content=_flag(environ, "LOG_CONTENT", False),
        log_level=log_level,
        verify_models=_flag(environ, "VERIFY_MODELS", True),
    )
