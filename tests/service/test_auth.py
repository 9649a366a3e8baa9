"""API keys: scrypt hashing against the RFC 7914 test vectors, hash lines, verification, bearer parsing."""

from __future__ import annotations

import pytest

from decoder.errors import InputFileError
from service.auth import (
    SCOPE_GLOSSARIES,
    SCOPE_TRANSLATE,
    ApiKey,
    KeyRing,
    bearer_token,
    compute_digest,
    new_key,
    parse_key_line,
    scrypt_digest,
)

# RFC 7914 section 12, second test vector (from memory): scrypt(P="password", S="NaCl", N=1024, r=8, p=16,
# dkLen=64).
RFC7914_SCRYPT = bytes.fromhex(
    "fdbabe1c9d3472007856e7190d01e9fe7c6ad7cbc8237830e77376634b373162"
    "2eaf30d92e22a3886ff109279d9830dac727afb94a83ee6d8360cbdfa2cc0640"
)
# RFC 7914 section 11, first test vector (from memory): PBKDF2-HMAC-SHA256(P="passwd", S="salt", c=1, dkLen=64).
RFC7914_PBKDF2 = bytes.fromhex(
    "55ac046e56e3089fec1691c22544b605f94185216dde0465e68b9d57c20dacbc"
    "49ca9cccf179b645991664b39d77ef317c71b845b1e30bd509112041d3a19783"
)


def test_scrypt_digest_matches_rfc7914_vector():
    assert scrypt_digest(b"password", b"NaCl", 1024, 8, 16, 64) == RFC7914_SCRYPT


def test_pbkdf2_key_digest_matches_rfc7914_vector():
    key = ApiKey("0" * 12, frozenset({SCOPE_TRANSLATE}), "pbkdf2_sha256", (1,), b"salt", RFC7914_PBKDF2)
    assert compute_digest(key, b"passwd") == RFC7914_PBKDF2


def test_new_key_verifies_with_its_own_line_only():
    key, line = new_key([SCOPE_TRANSLATE], comment="pipeline A")
    other_key, other_line = new_key([SCOPE_GLOSSARIES, SCOPE_TRANSLATE])
    ring = KeyRing([parse_key_line(line, "keys", 1), parse_key_line(other_line, "keys", 2)])
    found = ring.verify(key)
    assert (found.key_id, found.scopes, found.comment) == (key.split("_")[1], frozenset({"translate"}), "pipeline A")
    assert ring.verify(other_key).scopes == frozenset({"translate", "glossaries"})
    # One changed character of the secret, a key id that is not configured, and no prefix: all refused.
    tampered = key[:-1] + ("A" if key[-1] != "A" else "B")
    assert ring.verify(tampered) is None
    assert ring.verify("pwk_000000000000_" + key.split("_", 2)[2]) is None
    assert ring.verify(key.split("_", 1)[1]) is None


def test_verified_key_is_cached_and_still_rejects_others():
    key, line = new_key([SCOPE_TRANSLATE])
    ring = KeyRing([parse_key_line(line, "keys", 1)])
    assert ring.verify(key) is ring.verify(key)
    assert ring.verify(key + "x") is None


def test_key_file_errors_name_file_and_line(tmp_path):
    _, good = new_key([SCOPE_TRANSLATE])
    path = tmp_path / "keys.txt"
    path.write_text(f"# comment line\n{good}\n0123456789ab translate,admin scrypt$16384$8$1$c2FsdHNhbHQ=$aGFzaA==\n")
    with pytest.raises(InputFileError) as caught:
        KeyRing.from_sources(path)
    assert (caught.value.path, caught.value.location) == (str(path), 3)
    assert "admin" in str(caught.value)


@pytest.mark.parametrize(
    ("line", "complaint"),
    [
        ("0123456789ab translate", "three fields"),
        ("0123456789AB translate scrypt$16384$8$1$c2FsdHNhbHQ=$aGFzaGhhc2hoYXNoaGFzaA==", "hex"),
        ("0123456789ab translate scrypt$1000$8$1$c2FsdHNhbHQ=$aGFzaGhhc2hoYXNoaGFzaA==", "power of two"),
        ("0123456789ab translate pbkdf2_sha256$1000$c2FsdHNhbHQ=$aGFzaGhhc2hoYXNoaGFzaA==", "iterations"),
        ("0123456789ab translate scrypt$16384$8$1$not-base64!$aGFzaGhhc2hoYXNoaGFzaA==", "base64"),
        ("0123456789ab translate md5$abc", "hash must be"),
    ],
)
def test_malformed_key_lines_are_refused(line, complaint):
    with pytest.raises(InputFileError, match=complaint):
        parse_key_line(line, "PHRASEWORK_API_KEYS", 1)


def test_inline_keys_split_on_semicolons_and_duplicates_are_refused():
    _, first = new_key([SCOPE_TRANSLATE])
    _, second = new_key([SCOPE_GLOSSARIES])
    assert len(KeyRing.from_sources(None, f"{first};{second}")) == 2
    assert KeyRing.from_sources(None, " ; # nothing\n").is_open
    with pytest.raises(InputFileError, match="twice"):
        KeyRing.from_sources(None, f"{first}\n{first}")


@pytest.mark.parametrize(
    ("header", "token"),
    [
        ("Bearer abc.DEF-123_~+/=", "abc.DEF-123_~+/="),  # RFC 6750 section 2.1 b64token characters
        ("bearer abc", "abc"),  # the auth scheme is case-insensitive (RFC 7235 section 2.1)
        ("Basic abc", None),
        ("Bearer", None),
        ("Bearer a b", None),
        ("Bearer ab;c", None),
        (None, None),
    ],
)
def test_bearer_token(header, token):
    assert bearer_token(header) == token
