"""Uploaded glossaries in SQLite: name, version, languages, timestamps and rows, one transaction per change.

Why it is safe with several gunicorn workers and crashes:

- WAL journal mode: readers never block the writer and see the last committed state; every worker opens its
  own connection (per process and thread, never shared across a fork), so a change committed by one worker
  is what the next read in any other worker sees.
- A PUT runs in one ``BEGIN IMMEDIATE`` transaction: new revision, all rows, the glossary's row pointing at
  the new version, old rows removed. SQLite's atomic commit means a process killed at any point inside it
  leaves the previous version intact; ``synchronous=FULL`` makes the commit durable once it returns.
- Versions come from one AUTOINCREMENT sequence, so a version number is never reused, even after a glossary
  is deleted and created again: an ETag can never match a different upload by accident.

Reads run inside an explicit (deferred) transaction, so the metadata and rows come from one snapshot.
"""

from __future__ import annotations

import datetime as dt
import os
import sqlite3
import threading
from collections.abc import Iterable, Iterator
from contextlib import contextmanager
from dataclasses import dataclass
from pathlib import Path
from typing import NamedTuple

SCHEMA = """
CREATE TABLE IF NOT EXISTS revisions (
    version INTEGER PRIMARY KEY AUTOINCREMENT,
    name TEXT NOT NULL,
    created TEXT NOT NULL
);
CREATE TABLE IF NOT EXISTS glossaries (
    name TEXT PRIMARY KEY,
    version INTEGER NOT NULL,
    source_language TEXT NOT NULL,
    target_language TEXT NOT NULL,
    num_entries INTEGER NOT NULL,
    num_rows INTEGER NOT NULL,
    created TEXT NOT NULL,
    updated TEXT NOT NULL
);
CREATE TABLE IF NOT EXISTS glossary_rows (
    version INTEGER NOT NULL,
    position INTEGER NOT NULL,
    source TEXT NOT NULL,
    target TEXT NOT NULL,
    status TEXT NOT NULL,
    case_sensitive INTEGER NOT NULL,
    mode TEXT,
    note TEXT NOT NULL,
    PRIMARY KEY (version, position)
) WITHOUT ROWID;
"""
ABSENT = 0  # expected_version meaning "the glossary must not exist yet" (If-None-Match: *)


class StoreError(Exception):
    """Base of the store's own errors."""


class StoreBusyError(StoreError):
    """Another process held the write lock for longer than the timeout."""


class VersionMismatchError(StoreError):
    """The glossary's current version is not the expected one; ``current`` is ABSENT if it does not exist."""

    def __init__(self, current: int) -> None:
        super().__init__(f"current version is {current}")
        self.current = current


class GlossaryRow(NamedTuple):
    """One (source, target) pair with its attributes, as ``glossary_from_rows`` reads them."""

    source: str
    target: str
    status: str
    case_sensitive: bool
    mode: str | None
    note: str

    def as_mapping(self) -> dict[str, object]:
        row: dict[str, object] = {
            "source": self.source,
            "target": self.target,
            "status": self.status,
            "case_sensitive": bool(self.case_sensitive),
            "note": self.note,
        }
        if self.mode:
            row["mode"] = self.mode
        return row


@dataclass(frozen=True, slots=True)
class StoredGlossary:
    """Metadata of one uploaded glossary; timestamps are ISO 8601 UTC."""

    name: str
    version: int
    source_language: str
    target_language: str
    num_entries: int  # distinct source terms
    num_rows: int  # (source, target) pairs
    created: str
    updated: str


def _now() -> str:
    return dt.datetime.now(dt.UTC).isoformat(timespec="milliseconds")


class GlossaryStore:
    """The SQLite file at ``path``. ``timeout_seconds`` is how long a writer waits for another's lock."""

    def __init__(self, path: str | Path, timeout_seconds: float = 5.0) -> None:
        self.path = Path(path)
        self.timeout_seconds = timeout_seconds
        self._local = threading.local()

    def _connection(self) -> sqlite3.Connection:
        # One connection per (process, thread): a connection must never cross a fork (gunicorn preloads the
        # app in the master) nor be used by two threads at once.
        connection = getattr(self._local, "connection", None)
        if connection is not None and self._local.pid == os.getpid():
            return connection
        connection = sqlite3.connect(
            self.path, timeout=self.timeout_seconds, isolation_level=None, check_same_thread=True
        )
        connection.execute("PRAGMA synchronous=FULL")
        connection.execute("PRAGMA foreign_keys=ON")
        self._local.connection, self._local.pid = connection, os.getpid()
        return connection

    def initialise(self) -> None:
        """Create the file and tables if missing and switch the file to WAL mode (a persistent setting)."""
        self.path.parent.mkdir(parents=True, exist_ok=True)
        connection = self._connection()
        mode = connection.execute("PRAGMA journal_mode=WAL").fetchone()[0]
        if str(mode).lower() != "wal":
            raise StoreError(f"{self.path}: the file system does not support SQLite WAL mode (got {mode})")
        connection.executescript(SCHEMA)

    def close(self) -> None:
        """Close this thread's connection (call before forking, so children start without one)."""
        connection = getattr(self._local, "connection", None)
        if connection is not None and self._local.pid == os.getpid():
            connection.close()
        self._local.connection = None

    @contextmanager
    def _transaction(self, kind: str = "DEFERRED") -> Iterator[sqlite3.Connection]:
        connection = self._connection()
        try:
            connection.execute(f"BEGIN {kind}")
        except sqlite3.OperationalError as error:
            if "locked" in str(error) or "busy" in str(error):
                raise StoreBusyError(f"{self.path}: another writer holds the lock") from error
            raise
        try:
            yield connection
        except BaseException:
            connection.execute("ROLLBACK")
            raise
        connection.execute("COMMIT")

    def ping(self) -> None:
        """Raise sqlite3.Error if the database cannot be read."""
        self._connection().execute("SELECT count(*) FROM glossaries").fetchone()

    @staticmethod
    def _info(row: tuple) -> StoredGlossary:
        return StoredGlossary(*row)

    _INFO_COLUMNS = "name, version, source_language, target_language, num_entries, num_rows, created, updated"

    def list(self) -> list[StoredGlossary]:
        """All uploaded glossaries, by name."""
        rows = self._connection().execute(f"SELECT {self._INFO_COLUMNS} FROM glossaries ORDER BY name").fetchall()
        return [self._info(row) for row in rows]

    def info(self, name: str) -> StoredGlossary | None:
        row = (
            self._connection()
            .execute(f"SELECT {self._INFO_COLUMNS} FROM glossaries WHERE name = ?", (name,))
            .fetchone()
        )
        return None if row is None else self._info(row)

    def current_version(self, name: str) -> int:
        """The glossary's version, or ABSENT. One indexed lookup: cheap enough to run on every request."""
        row = self._connection().execute("SELECT version FROM glossaries WHERE name = ?", (name,)).fetchone()
        return ABSENT if row is None else int(row[0])

    def read(self, name: str) -> tuple[StoredGlossary, list[GlossaryRow]] | None:
        """Metadata and rows (in upload order) from one snapshot, or None if there is no such glossary."""
        with self._transaction() as connection:
            row = connection.execute(f"SELECT {self._INFO_COLUMNS} FROM glossaries WHERE name = ?", (name,)).fetchone()
            if row is None:
                return None
            info = self._info(row)
            rows = connection.execute(
                "SELECT source, target, status, case_sensitive, mode, note FROM glossary_rows "
                "WHERE version = ? ORDER BY position",
                (info.version,),
            ).fetchall()
        return info, [GlossaryRow(s, t, status, bool(case), mode, note) for s, t, status, case, mode, note in rows]

    def put(
        self,
        name: str,
        source_language: str,
        target_language: str,
        rows: Iterable[GlossaryRow],
        num_entries: int,
        expected_version: int | None = None,
    ) -> tuple[StoredGlossary, int]:
        """Replace (or create) glossary ``name`` with ``rows`` in one transaction; returns the new metadata
        and the version replaced (ABSENT for a new glossary).

        ``expected_version`` None writes unconditionally; ABSENT requires that the glossary does not exist;
        any other value requires that it is the current version. Raises VersionMismatchError (nothing
        written) or StoreBusyError (lock not obtained within the timeout). ``rows`` is consumed inside the
        transaction."""
        now = _now()
        with self._transaction("IMMEDIATE") as connection:
            current = connection.execute("SELECT version, created FROM glossaries WHERE name = ?", (name,)).fetchone()
            current_version = ABSENT if current is None else int(current[0])
            if expected_version is not None and expected_version != current_version:
                raise VersionMismatchError(current_version)
            version = connection.execute("INSERT INTO revisions (name, created) VALUES (?, ?)", (name, now)).lastrowid
            counter = iter(range(1 << 62))
            connection.executemany(
                "INSERT INTO glossary_rows (version, position, source, target, status, case_sensitive, mode, note) "
                "VALUES (?, ?, ?, ?, ?, ?, ?, ?)",
                (
                    (
                        version,
                        next(counter),
                        row.source,
                        row.target,
                        row.status,
                        int(row.case_sensitive),
                        row.mode,
                        row.note,
                    )
                    for row in rows
                ),
            )
            num_rows = next(counter)
            created = now if current is None else str(current[1])
            connection.execute(
                "INSERT OR REPLACE INTO glossaries (name, version, source_language, target_language, num_entries, "
                "num_rows, created, updated) VALUES (?, ?, ?, ?, ?, ?, ?, ?)",
                (name, version, source_language, target_language, num_entries, num_rows, created, now),
            )
            if current is not None:
                connection.execute("DELETE FROM glossary_rows WHERE version = ?", (current_version,))
        stored = StoredGlossary(
            name, int(version), source_language, target_language, num_entries, num_rows, created, now
        )
        return stored, current_version

    def delete(self, name: str, expected_version: int | None = None) -> bool:
        """Remove glossary ``name``; False if it did not exist (and ``expected_version`` is None).

        Raises VersionMismatchError or StoreBusyError as ``put`` does."""
        with self._transaction("IMMEDIATE") as connection:
            row = connection.execute("SELECT version FROM glossaries WHERE name = ?", (name,)).fetchone()
            current_version = ABSENT if row is None else int(row[0])
            if expected_version is not None and expected_version != current_version:
                raise VersionMismatchError(current_version)
            if row is None:
                return False
            connection.execute("DELETE FROM glossary_rows WHERE version = ?", (current_version,))
            connection.execute("DELETE FROM glossaries WHERE name = ?", (name,))
        return True
