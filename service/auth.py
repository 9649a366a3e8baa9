"""API keys: bearer tokens (RFC 6750) checked against salted scrypt hashes, with scopes.

A key looks like ``pwk_<key id>_<secret>``: the key id (12 hex digits) says which hash line to check, so one
request costs one hash, and the secret is 32 random bytes (``secrets.token_urlsafe``). The service stores only
hash lines, one per key, whitespace-separated:

    <key id> <scopes> scrypt$<n>$<r>$<p>$<salt, base64>$<hash, base64>   [# free comment]

``scopes`` is a comma-separated subset of ``translate`` (translations, models, glossary reading and term
matching) and ``glossaries`` (uploading and deleting glossaries). ``pbkdf2_sha256$<iterations>$<salt>$<hash>``
is accepted as the hash too, for machines whose OpenSSL lacks scrypt. ``python -m service.keys`` prints a new
key and its line. Hashing is scrypt (Percival & Josefsson, RFC 7914) through ``hashlib``; digests are compared
with ``hmac.compare_digest`` so the time taken does not depend on how many leading bytes match.
"""

from __future__ import annotations

import base64
import hashlib
import hmac
import re
import secrets
from collections.abc import Iterable
from dataclasses import dataclass
from pathlib import Path

from decoder.errors import InputFileError

SCOPE_TRANSLATE = "translate"
SCOPE_GLOSSARIES = "glossaries"
SCOPES = (SCOPE_TRANSLATE, SCOPE_GLOSSARIES)
KEY_PREFIX = "pwk"
KEY_ID_PATTERN = re.compile(r"[0-9a-f]{12}")
# Token syntax of RFC 6750 section 2.1 (b64token).
BEARER_TOKEN = re.compile(r"[A-Za-z0-9\-._~+/]+=*")

# scrypt cost: N=2^14, r=8, p=1 uses 16 MiB and takes tens of milliseconds (the interactive-login setting
# RFC 7914 section 2 discusses; common practice). Verified keys are cached per process, so this is paid once
# per key and worker, not per request.
SCRYPT_N, SCRYPT_R, SCRYPT_P = 2**14, 8, 1
DIGEST_BYTES = 32
SALT_BYTES = 16
PBKDF2_MIN_ITERATIONS = 100_000
_CACHE_SIZE = 1024


@dataclass(frozen=True, slots=True)
class ApiKey:
    """One configured key: its id, the scopes it grants and how to check a presented secret."""

    key_id: str
    scopes: frozenset[str]
    algorithm: str  # "scrypt" or "pbkdf2_sha256"
    parameters: tuple[int, ...]  # (n, r, p) for scrypt, (iterations,) for PBKDF2
    salt: bytes
    digest: bytes
    comment: str = ""


def _b64(data: bytes) -> str:
    return base64.b64encode(data).decode("ascii")


def scrypt_digest(secret: bytes, salt: bytes, n: int, r: int, p: int, length: int = DIGEST_BYTES) -> bytes:
    """The scrypt derived key of ``secret`` (RFC 7914), ``length`` bytes."""
    return hashlib.scrypt(secret, salt=salt, n=n, r=r, p=p, dklen=length, maxmem=256 * 1024 * 1024)


def compute_digest(key: ApiKey, secret: bytes) -> bytes:
    if key.algorithm == "scrypt":
        n, r, p = key.parameters
        return scrypt_digest(secret, key.salt, n, r, p, len(key.digest))
    (iterations,) = key.parameters
    return hashlib.pbkdf2_hmac("sha256", secret, key.salt, iterations, len(key.digest))


def new_key(scopes: Iterable[str], comment: str = "") -> tuple[str, str]:
    """(key, hash line): a fresh random key to hand to a client and the line the service is configured with."""
    scope_set = _check_scopes(",".join(scopes), "scopes", None)
    key_id = secrets.token_hex(6)
    key = f"{KEY_PREFIX}_{key_id}_{secrets.token_urlsafe(32)}"
    salt = secrets.token_bytes(SALT_BYTES)
    digest = scrypt_digest(key.encode("ascii"), salt, SCRYPT_N, SCRYPT_R, SCRYPT_P)
    scopes_text = ",".join(scope for scope in SCOPES if scope in scope_set)
    line = f"{key_id} {scopes_text} scrypt${SCRYPT_N}${SCRYPT_R}${SCRYPT_P}${_b64(salt)}${_b64(digest)}"
    return key, line + (f" # {comment}" if comment else "")


def _check_scopes(text: str, where: str | Path, location: int | None) -> frozenset[str]:
    scopes = frozenset(part.strip() for part in text.split(",") if part.strip())
    unknown = sorted(scopes - set(SCOPES))
    if unknown or not scopes:
        raise InputFileError(
            where, f"scopes must be a comma-separated subset of {', '.join(SCOPES)}; got {text!r}", location
        )
    return scopes


def _decode(text: str, where: str | Path, location: int) -> bytes:
    try:
        return base64.b64decode(text.encode("ascii"), validate=True)
    except (ValueError, UnicodeEncodeError):
        raise InputFileError(where, f"{text!r} is not base64", location) from None


def parse_key_line(line: str, where: str | Path, location: int) -> ApiKey | None:
    """The key of one hash line, or None for a blank or comment line; InputFileError names ``where:location``."""
    content, _, comment = line.partition("#")
    parts = content.split()
    if not parts:
        return None
    if len(parts) != 3:
        raise InputFileError(where, "expected '<key id> <scopes> <hash>' (three fields separated by spaces)", location)
    key_id, scopes_text, hash_text = parts
    if not KEY_ID_PATTERN.fullmatch(key_id):
        raise InputFileError(where, f"key id {key_id!r} must be 12 lowercase hex digits", location)
    scopes = _check_scopes(scopes_text, where, location)
    fields = hash_text.split("$")
    try:
        if fields[0] == "scrypt" and len(fields) == 6:
            parameters = tuple(int(value) for value in fields[1:4])
            n, r, p = parameters
            if n < 2 or n & (n - 1) or r < 1 or p < 1:
                raise InputFileError(where, "scrypt needs n a power of two > 1 and r, p >= 1", location)
        elif fields[0] == "pbkdf2_sha256" and len(fields) == 4:
            parameters = (int(fields[1]),)
            if parameters[0] < PBKDF2_MIN_ITERATIONS:
                raise InputFileError(
                    where, f"pbkdf2_sha256 needs at least {PBKDF2_MIN_ITERATIONS} iterations", location
                )
        else:
            raise InputFileError(
                where, "hash must be scrypt$n$r$p$salt$hash or pbkdf2_sha256$iterations$salt$hash", location
            )
    except ValueError:
        raise InputFileError(where, "hash parameters must be integers", location) from None
    salt, digest = _decode(fields[-2], where, location), _decode(fields[-1], where, location)
    if len(digest) < 16 or len(salt) < 8:
        raise InputFileError(where, "salt must have at least 8 bytes and the hash at least 16", location)
    return ApiKey(key_id, scopes, fields[0], parameters, salt, digest, comment.strip())


class KeyRing:
    """The configured keys. ``is_open`` (no keys at all) means the service runs without authentication, which
    ``service.launcher`` and ``service.gunicorn_config`` allow on loopback addresses only."""

    def __init__(self, keys: Iterable[ApiKey]) -> None:
        self._keys: dict[str, ApiKey] = {}
        for key in keys:
            if key.key_id in self._keys:
                raise InputFileError("API keys", f"key id {key.key_id} is configured twice")
            self._keys[key.key_id] = key
        self._verified: dict[bytes, ApiKey] = {}

    @classmethod
    def from_sources(cls, path: Path | None = None, text: str = "") -> KeyRing:
        """Keys from a file (one line each) and from inline text (lines separated by newlines or ";")."""
        keys: list[ApiKey] = []
        if path is not None:
            try:
                lines = Path(path).read_text(encoding="utf-8").splitlines()
            except (OSError, UnicodeDecodeError) as error:
                raise InputFileError(path, f"cannot read the API key file: {error}") from error
            keys += [key for number, line in enumerate(lines, 1) if (key := parse_key_line(line, path, number))]
        entries = re.split(r"[;\n]", text)
        keys += [
            key
            for number, line in enumerate(entries, 1)
            if (key := parse_key_line(line, "PHRASEWORK_API_KEYS", number))
        ]
        return cls(keys)

    @property
    def is_open(self) -> bool:
        return not self._keys

    def __len__(self) -> int:
        return len(self._keys)

    def verify(self, token: str) -> ApiKey | None:
        """The key ``token`` proves, or None. Constant-time digest comparison; successes are cached by the
        token's SHA-256 (keys are high-entropy random strings, so the cache does not weaken them)."""
        fingerprint = hashlib.sha256(token.encode("utf-8", "surrogatepass")).digest()
        cached = self._verified.get(fingerprint)
        if cached is not None:
            return cached
        parts = token.split("_", 2)
        if len(parts) != 3 or parts[0] != KEY_PREFIX:
            return None
        key = self._keys.get(parts[1])
        if key is None:
            return None
        if not hmac.compare_digest(compute_digest(key, token.encode("utf-8", "surrogatepass")), key.digest):
            return None
        if len(self._verified) >= _CACHE_SIZE:
            self._verified.clear()
        self._verified[fingerprint] = key
        return key


def bearer_token(authorization: str | None) -> str | None:
    """The token of an ``Authorization: Bearer <token>`` header (scheme case-insensitive, RFC 6750 section
    2.1), or None if the header is missing or not of that form."""
    if not authorization:
        return None
    scheme, _, token = authorization.strip().partition(" ")
    token = token.strip()
    if scheme.lower() != "bearer" or not BEARER_TOKEN.fullmatch(token):
        return None
    return token
