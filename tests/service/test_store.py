"""The SQLite glossary store: versions, preconditions, WAL visibility across connections, busy writers, and a
writer killed in the middle of a transaction."""

from __future__ import annotations

import signal
import sqlite3
import subprocess
import sys
import textwrap
import threading
from contextlib import closing

import pytest

from service.store import ABSENT, GlossaryRow, GlossaryStore, StoreBusyError, VersionMismatchError


def query(path, sql: str) -> object:
    with closing(sqlite3.connect(path)) as connection:
        return connection.execute(sql).fetchone()[0]


def rows(*pairs: tuple[str, str]) -> list[GlossaryRow]:
    return [GlossaryRow(source, target, "preferred", False, None, "") for source, target in pairs]


@pytest.fixture
def store(tmp_path):
    opened = GlossaryStore(tmp_path / "glossaries.sqlite3", timeout_seconds=0.2)
    opened.initialise()
    yield opened
    opened.close()


def test_put_read_round_trip_keeps_row_order(store):
    written = rows(("trash", "papelera"), ("backup", "copia de seguridad"), ("backup", "respaldo"))
    stored, previous = store.put("ui", "en", "es", written, num_entries=2)
    assert previous == ABSENT
    info, read = store.read("ui")
    assert read == written
    assert (info.version, info.num_entries, info.num_rows, info.source_language) == (stored.version, 2, 3, "en")


def test_versions_increase_and_are_never_reused_after_delete(store):
    # AUTOINCREMENT never hands out a rowid twice, even after the row is deleted (SQLite documentation,
    # "The AUTOINCREMENT Keyword"), so every PUT gets a version no earlier upload had.
    first, _ = store.put("ui", "en", "es", rows(("a", "b")), 1)
    second, previous = store.put("ui", "en", "es", rows(("a", "c")), 1)
    assert previous == first.version and second.version > first.version and second.created == first.created
    assert store.delete("ui")
    third, previous = store.put("ui", "en", "es", rows(("a", "d")), 1)
    assert previous == ABSENT and third.version > second.version


def test_expected_version_mismatch_writes_nothing(store):
    first, _ = store.put("ui", "en", "es", rows(("a", "b")), 1)
    with pytest.raises(VersionMismatchError) as caught:
        store.put("ui", "en", "es", rows(("a", "zzz")), 1, expected_version=first.version + 100)
    assert caught.value.current == first.version
    with pytest.raises(VersionMismatchError):
        store.put("ui", "en", "es", rows(("a", "zzz")), 1, expected_version=ABSENT)  # create-only, but it exists
    with pytest.raises(VersionMismatchError):
        store.delete("ui", expected_version=first.version + 1)
    assert store.read("ui")[1] == rows(("a", "b"))
    store.put("ui", "en", "es", rows(("a", "ok")), 1, expected_version=first.version)
    assert store.read("ui")[1] == rows(("a", "ok"))


def test_file_is_in_wal_mode_and_a_second_connection_sees_commits_at_once(store):
    assert query(store.path, "PRAGMA journal_mode") == "wal"
    other = GlossaryStore(store.path)  # stands for another gunicorn worker
    assert other.current_version("ui") == ABSENT
    stored, _ = store.put("ui", "en", "es", rows(("a", "b")), 1)
    assert other.current_version("ui") == stored.version
    store.delete("ui")
    assert other.read("ui") is None


def test_writer_waiting_longer_than_the_timeout_gets_busy(store):
    holder = sqlite3.connect(store.path, isolation_level=None)
    holder.execute("BEGIN IMMEDIATE")  # another process holds the write lock
    try:
        with pytest.raises(StoreBusyError):
            store.put("ui", "en", "es", rows(("a", "b")), 1)
        assert store.list() == []  # readers are not blocked by the writer in WAL mode
    finally:
        holder.execute("ROLLBACK")
        holder.close()
    store.put("ui", "en", "es", rows(("a", "b")), 1)


def test_one_connection_per_thread(store):
    store.put("ui", "en", "es", rows(("a", "b")), 1)
    seen = []
    thread = threading.Thread(target=lambda: seen.append(store.current_version("ui")))
    thread.start()
    thread.join()
    assert seen == [store.current_version("ui")]


KILLED_WRITER = textwrap.dedent("""
    import sys, time
    from service.store import GlossaryRow, GlossaryStore

    def rows():
        for number in range(100_000):
            if number == 5_000:  # well inside the transaction: 5,000 rows already inserted
                print("mid-write", flush=True)
                time.sleep(120)
            yield GlossaryRow(f"term {number}", f"término {number}", "preferred", False, None, "")

    GlossaryStore(sys.argv[1]).put("ui", "en", "es", rows(), 100_000)
""")


def test_writer_killed_mid_transaction_leaves_previous_version(store):
    before, _ = store.put("ui", "en", "es", rows(("trash", "papelera"), ("backup", "copia de seguridad")), 2)
    writer = subprocess.Popen([sys.executable, "-c", KILLED_WRITER, str(store.path)], stdout=subprocess.PIPE, text=True)
    try:
        assert writer.stdout.readline().strip() == "mid-write"
        assert store.read("ui")[0].version == before.version  # uncommitted rows are invisible meanwhile
    finally:
        writer.send_signal(signal.SIGKILL)
        writer.wait(timeout=30)
        writer.stdout.close()
    assert writer.returncode == -signal.SIGKILL
    reopened = GlossaryStore(store.path, timeout_seconds=2.0)
    info, read = reopened.read("ui")
    assert (info.version, read) == (before.version, rows(("trash", "papelera"), ("backup", "copia de seguridad")))
    assert query(store.path, "PRAGMA integrity_check") == "ok"
    # The dead writer's lock went with its process: the next write succeeds.
    after, previous = reopened.put("ui", "en", "es", rows(("trash", "papelera")), 1)
    assert previous == before.version and after.version > before.version
    assert query(store.path, "SELECT count(*) FROM glossary_rows") == 1
    reopened.close()
