"""Pluggable executors for the map step of training stages.

A training stage is a pure top-level function applied to independent shards (the map) followed by a merge (the
reduce) in the caller. Executors only run the map. The local process pool is the default; ``SerialExecutor``
runs in-process (tests, one worker). A distributed engine plugs in by implementing ``map`` with the same
contract: the function and its arguments are picklable, results come back in input order.
"""

from __future__ import annotations

import multiprocessing
from collections.abc import Callable, Iterable
from concurrent.futures import ProcessPoolExecutor
from typing import Protocol, TypeVar

Item = TypeVar("Item")
Result = TypeVar("Result")


class Executor(Protocol):
    num_workers: int

    def map(self, function: Callable[[Item], Result], items: Iterable[Item]) -> list[Result]:
        """Apply ``function`` to every item; results in input order."""
        ...

    def close(self) -> None: ...


class SerialExecutor:
    """Runs every call in the calling process."""

    num_workers = 1

    def map(self, function: Callable[[Item], Result], items: Iterable[Item]) -> list[Result]:
        return [function(item) for item in items]

    def close(self) -> None:
        return None


class LocalProcessExecutor:
    """A pool of worker processes, kept alive across calls so repeated EM iterations do not pay start-up again.

    Uses the ``fork`` start method where available (cheap, copy-on-write sharing of read-only arrays) and
    ``spawn`` elsewhere."""

    def __init__(self, num_workers: int) -> None:
        if num_workers < 1:
            raise ValueError("num_workers must be at least 1")
        self.num_workers = num_workers
        methods = multiprocessing.get_all_start_methods()
        context = multiprocessing.get_context("fork" if "fork" in methods else "spawn")
        self._pool = ProcessPoolExecutor(max_workers=num_workers, mp_context=context)

    def map(self, function: Callable[[Item], Result], items: Iterable[Item]) -> list[Result]:
        return list(self._pool.map(function, items))

    def close(self) -> None:
        self._pool.shutdown(wait=True, cancel_futures=True)

    def __enter__(self) -> LocalProcessExecutor:
        return self

    def __exit__(self, *exc_info: object) -> None:
        self.close()


def make_executor(num_workers: int) -> SerialExecutor | LocalProcessExecutor:
    """Serial for one worker (no process start-up), a local process pool otherwise."""
    return SerialExecutor() if num_workers <= 1 else LocalProcessExecutor(num_workers)

