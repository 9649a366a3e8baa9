"""Which bind addresses count as loopback (the only ones allowed without API keys)."""

from __future__ import annotations

import pytest

from service.auth import SCOPE_TRANSLATE, new_key
from service.binding import is_loopback, keys_configured, open_binds


# Loopback per RFC 1122 section 3.2.1.3 (127.0.0.0/8) and RFC 4291 section 2.5.3 (::1).
@pytest.mark.parametrize(
    ("bind", "loopback"),
    [
        ("127.0.0.1:8080", True),
        ("127.8.9.10:80", True),
        ("[::1]:8080", True),
        ("localhost:8080", True),
        ("unix:/run/phrasework.sock", True),
        ("0.0.0.0:8080", False),
        ("[::]:8080", False),
        ("10.0.0.5:8080", False),
        ("example.com:8080", False),
        ("fd://3", False),
        ("127.0.0.1", True),
        ("::1", True),
    ],
)
def test_is_loopback(bind, loopback):
    assert is_loopback(bind) is loopback


def test_open_binds_and_key_count(tmp_path):
    assert open_binds(["127.0.0.1:1", "0.0.0.0:2"]) == ["0.0.0.0:2"]
    _, line = new_key([SCOPE_TRANSLATE])
    path = tmp_path / "keys"
    path.write_text(line + "\n")
    assert keys_configured({}) == 0
    assert keys_configured({"PHRASEWORK_API_KEYS_FILE": str(path)}) == 1
    assert keys_configured({"PHRASEWORK_API_KEYS_FILE": str(path), "PHRASEWORK_API_KEYS": "#none"}) == 1
