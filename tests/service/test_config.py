"""Service settings from PHRASEWORK_* variables and from overrides."""

from __future__ import annotations

import os
from pathlib import Path

import pytest

from decoder.errors import ConfigurationError
from service.config import DEFAULT_DATABASE, Limits, settings_from_environ


def test_defaults_are_the_documented_limits():
    settings = settings_from_environ({})
    # The defaults: 100 segments per request, 5,000 characters per segment, n_best up to 100.
    assert (settings.limits.max_segments, settings.limits.max_segment_characters, settings.limits.max_n_best) == (
        100,
        5000,
        100,
    )
    assert settings.model_dirs == () and settings.database == Path(DEFAULT_DATABASE) and not settings.log_content


def test_every_variable_is_read():
    environ = {
        "PHRASEWORK_MODEL_DIRS": os.pathsep.join(["/models/a", "/models/b", ""]),
        "PHRASEWORK_GLOSSARY_DIR": "/glossaries",
        "PHRASEWORK_DATABASE": "/data/g.sqlite3",
        "PHRASEWORK_API_KEYS_FILE": "/etc/keys",
        "PHRASEWORK_API_KEYS": "line1;line2",
        "PHRASEWORK_MAX_SEGMENTS": "7",
        "PHRASEWORK_MAX_SEGMENT_CHARACTERS": "80",
        "PHRASEWORK_MAX_N_BEST": "3",
        "PHRASEWORK_MAX_BODY_BYTES": "1000",
        "PHRASEWORK_MAX_GLOSSARY_BYTES": "2000",
        "PHRASEWORK_TIME_BUDGET_SECONDS": "1.5",
        "PHRASEWORK_RETRY_AFTER_SECONDS": "9",
        "PHRASEWORK_DATABASE_TIMEOUT_SECONDS": "0.25",
        "PHRASEWORK_LOG_CONTENT": "1",
        "PHRASEWORK_LOG_LEVEL": "DEBUG",
        "PHRASEWORK_VERIFY_MODELS": "no",
    }
    settings = settings_from_environ(environ)
    assert settings.model_dirs == (Path("/models/a"), Path("/models/b"))
    assert (settings.glossary_dir, settings.database, settings.api_keys_file) == (
        Path("/glossaries"),
        Path("/data/g.sqlite3"),
        Path("/etc/keys"),
    )
    assert settings.api_keys_text == "line1;line2"
    assert settings.limits == Limits(7, 80, 3, 1000, 2000, 1.5, 9, 0.25)
    assert (settings.log_content, settings.log_level, settings.verify_models) == (True, "debug", False)


@pytest.mark.parametrize(
    ("name", "value"),
    [
        ("PHRASEWORK_MAX_SEGMENTS", "ten"),
        ("PHRASEWORK_MAX_SEGMENTS", "0"),
        ("PHRASEWORK_LOG_CONTENT", "maybe"),
        ("PHRASEWORK_TIME_BUDGET_SECONDS", "-1"),
        ("PHRASEWORK_LOG_LEVEL", "loud"),
    ],
)
def test_bad_values_are_refused(name, value):
    with pytest.raises(ConfigurationError):
        settings_from_environ({name: value})


def test_overrides_replace_fields_and_limits_by_name():
    settings = settings_from_environ({}).with_overrides(
        {"model_dirs": ["/m"], "database": "/tmp/x.sqlite3", "max_segments": 5, "time_budget_seconds": 2.0}
    )
    assert settings.model_dirs == (Path("/m"),) and settings.database == Path("/tmp/x.sqlite3")
    assert (settings.limits.max_segments, settings.limits.time_budget_seconds) == (5, 2.0)
    with pytest.raises(ConfigurationError, match="unknown service setting"):
        settings.with_overrides({"max_segmnets": 5})
