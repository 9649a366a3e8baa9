"""Write and load a model directory: ``manifest.json`` plus one ``.npy`` file per array (DESIGN.md, "Model
directory").

The manifest is the caller's dictionary (languages, feature names, weights, settings, statistics) with two keys
added here: ``format_version`` and ``arrays``, which maps every array name to its file, SHA-256, shape and dtype.

Writing never exposes a half-written model: everything goes into a hidden sibling directory, each file is
flushed to disk, ``manifest.json`` is written last, and only then is the directory renamed into place. A write
that dies part-way leaves at most a hidden ``.<name>.partial-*`` directory without a manifest, which does not
load. Replacing an existing model (``force=True``) swaps the two directories in one step where the kernel offers
that (Linux ``renameat2`` with ``RENAME_EXCHANGE``); elsewhere the old directory is moved aside first, leaving a
moment in which the path does not exist, but never one in which it holds a mixture. Processes that have the old
model memory-mapped keep reading it after it is deleted (POSIX keeps unlinked files alive until unmapped).

Loading memory-maps every array read-only (``np.load(mmap_mode="r")``), so worker processes share one copy in the
page cache, after checking the format version, the files, their shapes and dtypes and (unless ``verify=False``)
their checksums. Every failure is a ModelLoadError whose message starts with the offending file.
"""

from __future__ import annotations

import ctypes
import errno
import hashlib
import json
import os
import re
import secrets
import shutil
import sys
from collections.abc import Callable, Mapping
from dataclasses import dataclass
from pathlib import Path
from types import MappingProxyType
from typing import Any

import numpy as np
import numpy.typing as npt

from decoder.errors import DecoderError, ModelLoadError
from decoder.model.checksums import sha256_of_file, sha256_of_files

MODEL_FORMAT_VERSION = 1
MANIFEST_NAME = "manifest.json"
ARRAY_SUFFIX = ".npy"
RESERVED_KEYS = ("format_version", "arrays")  # written by write_model; values given by the caller are replaced
_ARRAY_NAME = re.compile(r"[A-Za-z0-9][A-Za-z0-9_.-]*")
_SHA256 = re.compile(r"[0-9a-f]{64}")


class ModelExistsError(DecoderError, FileExistsError):
    """The output directory exists and may not be replaced (no ``force``, or it does not hold a model)."""

    code = "model_exists"


@dataclass(frozen=True, slots=True)
class LoadedModel:
    """A model directory opened for reading.

    ``arrays`` are read-only ``np.memmap`` views of the files (nothing is read until used); ``manifest`` is the
    parsed manifest.json and must be treated as read-only. ``manifest_sha256`` identifies the exact model, for
    signatures such as ``model:es-en@<sha>``."""

    path: Path
    manifest: dict[str, Any]
    arrays: Mapping[str, npt.NDArray[Any]]
    manifest_sha256: str

    def __getitem__(self, name: str) -> npt.NDArray[Any]:
        return self.arrays[name]

    def __contains__(self, name: object) -> bool:
        return name in self.arrays


# ---------------------------------------------------------------------------------------------------------------
# Writing


def _check_arrays(arrays: Mapping[str, npt.NDArray[Any]]) -> dict[str, np.ndarray]:
    checked: dict[str, np.ndarray] = {}
    seen: dict[str, str] = {}
    for name, value in arrays.items():
        if not isinstance(name, str) or not _ARRAY_NAME.fullmatch(name):
            raise ValueError(f"array name {name!r} is not a plain file name (letters, digits, '_', '.', '-')")
        # Two names that differ only in case would share one file on case-insensitive file systems.
        if name.casefold() in seen:
            raise ValueError(f"array names {seen[name.casefold()]!r} and {name!r} differ only in case")
        seen[name.casefold()] = name
        array = np.asarray(value)
        if array.dtype.hasobject or array.dtype.fields is not None:
            raise ValueError(
                f"array {name!r} has dtype {array.dtype}; only plain numeric or fixed-width "
                "string dtypes can be memory-mapped"
            )
        checked[name] = array
    return checked


def _fsync_directory(path: Path) -> None:
    """Make a rename inside ``path`` durable (POSIX only; Windows cannot open directories)."""
    if os.name != "posix":
        return
    descriptor = os.open(path, os.O_RDONLY)
    try:
        os.fsync(descriptor)
    finally:
        os.close(descriptor)


def _make_hidden_sibling(out_dir: Path, kind: str) -> Path:
    """A new empty directory next to ``out_dir`` (same file system, so renames are atomic).

    os.mkdir honours the umask, unlike tempfile.mkdtemp (0700), so the finished model stays readable by service
    workers running as another user."""
    while True:
        candidate = out_dir.parent / f".{out_dir.name}.{kind}-{secrets.token_hex(4)}"
        try:
            candidate.mkdir()
            return candidate
        except FileExistsError:
            continue


_RENAME_EXCHANGE = 2  # linux/fs.h
_AT_FDCWD = -100


def _exchange(first: Path, second: Path) -> bool:
    """Atomically swap two directories (Linux renameat2). False where the kernel or file system cannot."""
    if not sys.platform.startswith("linux"):
        return False
    try:
        renameat2 = ctypes.CDLL(None, use_errno=True).renameat2
    except (AttributeError, OSError):
        return False
    renameat2.argtypes = [ctypes.c_int, ctypes.c_char_p, ctypes.c_int, ctypes.c_char_p, ctypes.c_uint]
    result = renameat2(_AT_FDCWD, os.fsencode(first), _AT_FDCWD, os.fsencode(second), _RENAME_EXCHANGE)
    if result == 0:
        return True
    error = ctypes.get_errno()
    if error in (errno.EINVAL, errno.ENOSYS, errno.ENOTSUP, errno.EPERM):
        return False
    raise OSError(error, os.strerror(error), str(second))


def _is_replaceable(path: Path) -> bool:
    """Only an empty directory or one holding a manifest may be replaced: ``force`` must not wipe, say, a home
    directory given as ``--out`` by mistake."""
    return path.is_dir() and ((path / MANIFEST_NAME).is_file() or not any(path.iterdir()))


def _check_destination(out_dir: Path, force: bool) -> None:
    if not os.path.lexists(out_dir):
        return
    if out_dir.is_symlink():
        raise ModelExistsError(f"{out_dir}: is a symbolic link; write the model to a real path and re-point the link")
    if not _is_replaceable(out_dir):
        raise ModelExistsError(f"{out_dir}: exists and is not a model directory; choose another output path")
    if not force and any(out_dir.iterdir()):
        raise ModelExistsError(f"{out_dir}: a model already exists here; pass force=True (--force) to replace it")


def _move_into_place(staging: Path, out_dir: Path, force: bool) -> None:
    _check_destination(out_dir, force)
    if not out_dir.exists():
        os.rename(staging, out_dir)  # also fails, instead of merging, if another writer got there first
        return
    if _exchange(staging, out_dir):
        shutil.rmtree(staging)  # now holds the old model
        return
    old = _make_hidden_sibling(out_dir, "old")
    os.rename(out_dir, old / "model")
    try:
        os.rename(staging, out_dir)
    except BaseException:
        os.rename(old / "model", out_dir)
        raise
    shutil.rmtree(old)


def write_model(
    out_dir: str | Path,
    manifest: Mapping[str, Any],
    arrays: Mapping[str, npt.NDArray[Any]],
    force: bool = False,
    on_array_written: Callable[[str], None] | None = None,
) -> Path:
    """Write a model directory and return its path; readable by ``load_model`` once this returns, never before.

    ``manifest`` must be JSON-serialisable (no NaN); its ``format_version`` and ``arrays`` keys are replaced.
    ``arrays`` maps names (plain file names) to arrays, written as ``<name>.npy``. An existing model at
    ``out_dir`` raises ModelExistsError unless ``force``; a non-empty directory without a manifest is never
    replaced. ``on_array_written(name)`` is called after each array is on disk (progress reporting); if it
    raises, the write is abandoned and any previous model at ``out_dir`` is left as it was."""
    out_dir = Path(out_dir).absolute()
    checked = _check_arrays(arrays)
    manifest_out: dict[str, Any] = {"format_version": MODEL_FORMAT_VERSION}
    manifest_out.update((key, value) for key, value in manifest.items() if key not in RESERVED_KEYS)
    json.dumps(manifest_out, allow_nan=False)  # fail before any file is written
    _check_destination(out_dir, force)
    out_dir.parent.mkdir(parents=True, exist_ok=True)

    staging = _make_hidden_sibling(out_dir, "partial")
    try:
        entries: dict[str, dict[str, Any]] = {}
        for name, array in checked.items():
            file_name = name + ARRAY_SUFFIX
            with open(staging / file_name, "wb") as handle:
                np.lib.format.write_array(handle, array, allow_pickle=False)
                handle.flush()
                os.fsync(handle.fileno())
            entries[name] = {
                "file": file_name,
                "sha256": sha256_of_file(staging / file_name),
                "shape": list(array.shape),
                "dtype": array.dtype.str,
            }
            if on_array_written is not None:
                on_array_written(name)
        manifest_out["arrays"] = entries
        text = json.dumps(manifest_out, indent=2, ensure_ascii=False, allow_nan=False) + "\n"
        with open(staging / MANIFEST_NAME, "w", encoding="utf-8") as handle:
            handle.write(text)
            handle.flush()
            os.fsync(handle.fileno())
        _fsync_directory(staging)
        _move_into_place(staging, out_dir, force)
        _fsync_directory(out_dir.parent)
    except BaseException:
        shutil.rmtree(staging, ignore_errors=True)
        raise
    return out_dir


# ---------------------------------------------------------------------------------------------------------------
# Loading


def _error(path: Path, message: str) -> ModelLoadError:
    error = ModelLoadError(f"{path}: {message}")
    error.path = str(path)  # type: ignore[attr-defined]  # lets callers and tests tell which file failed
    return error


def _read_manifest(model_dir: Path) -> tuple[dict[str, Any], str]:
    manifest_path = model_dir / MANIFEST_NAME
    if not model_dir.is_dir():
        raise _error(model_dir, "no such model directory")
    try:
        raw = manifest_path.read_bytes()
    except FileNotFoundError:
        raise _error(
            manifest_path,
            "missing; this is not a complete model directory "
            "(an interrupted write leaves no manifest). Rebuild the model.",
        ) from None
    except OSError as exc:
        raise _error(manifest_path, f"cannot be read ({exc.strerror})") from None
    try:
        manifest = json.loads(raw.decode("utf-8"))
    except UnicodeDecodeError as exc:
        raise _error(manifest_path, f"not UTF-8 text ({exc.reason} at byte {exc.start})") from None
    except json.JSONDecodeError as exc:
        raise _error(manifest_path, f"line {exc.lineno}: not valid JSON ({exc.msg})") from None
    if not isinstance(manifest, dict):
        raise _error(manifest_path, "must hold a JSON object")
    version = manifest.get("format_version")
    if isinstance(version, bool) or not isinstance(version, int):
        raise _error(manifest_path, "has no integer format_version; it was not written by phrasework")
    if version > MODEL_FORMAT_VERSION:
        raise _error(
            manifest_path,
            f"format version {version} is newer than this phrasework reads "
            f"({MODEL_FORMAT_VERSION}); upgrade phrasework",
        )
    if version < MODEL_FORMAT_VERSION:
        raise _error(
            manifest_path,
            f"format version {version} is older than this phrasework reads ({MODEL_FORMAT_VERSION}); rebuild the model",
        )
    if not isinstance(manifest.get("arrays"), dict):
        raise _error(manifest_path, "has no 'arrays' object")
    return manifest, hashlib.sha256(raw).hexdigest()


def _check_entry(manifest_path: Path, name: str, entry: Any) -> tuple[str, str, tuple[int, ...], str]:
    where = f"arrays.{name}"
    if not isinstance(entry, dict):
        raise _error(manifest_path, f"{where} must be an object")
    file_name, digest, shape, dtype = (entry.get(key) for key in ("file", "sha256", "shape", "dtype"))
    if not isinstance(file_name, str) or not _ARRAY_NAME.fullmatch(file_name):
        raise _error(manifest_path, f"{where}.file must be a plain file name inside the model directory")
    if not isinstance(digest, str) or not _SHA256.fullmatch(digest):
        raise _error(manifest_path, f"{where}.sha256 must be 64 lower-case hex digits")
    if not isinstance(shape, list) or not all(isinstance(n, int) and not isinstance(n, bool) and n >= 0 for n in shape):
        raise _error(manifest_path, f"{where}.shape must be a list of non-negative integers")
    if not isinstance(dtype, str):
        raise _error(manifest_path, f"{where}.dtype must be a string")
    return file_name, digest, tuple(shape), dtype


def load_model(path: str | Path, verify: bool = True) -> LoadedModel:
    """Open the model directory at ``path`` with every array memory-mapped read-only.

    Checks the format version, that every listed file exists and is a .npy file of the recorded shape and dtype,
    and (``verify=True``) each file's SHA-256, hashing files concurrently. ``verify=False`` skips only the
    checksums, for quick starts on trusted files. Raises ModelLoadError naming the file that is missing,
    corrupt or inconsistent; its ``path`` attribute holds that file's path."""
    model_dir = Path(path)
    manifest, manifest_sha256 = _read_manifest(model_dir)
    manifest_path = model_dir / MANIFEST_NAME
    entries = {name: _check_entry(manifest_path, name, entry) for name, entry in manifest["arrays"].items()}
    for file_name, *_ in entries.values():
        if not (model_dir / file_name).is_file():
            raise _error(
                model_dir / file_name,
                f"missing (listed in {MANIFEST_NAME}); the model directory is incomplete. Rebuild the model.",
            )
    if verify:
        files = [model_dir / file_name for file_name, *_ in entries.values()]
        try:
            digests = sha256_of_files(files)
        except OSError as exc:
            raise _error(Path(exc.filename or model_dir), f"cannot be read ({exc.strerror})") from None
        for file_path, (_, expected, _, _), found in zip(files, entries.values(), digests, strict=True):
            if found != expected:
                raise _error(
                    file_path,
                    f"checksum mismatch (manifest {expected[:12]}..., file {found[:12]}...); "
                    "the file is corrupt or was changed after the model was written. "
                    "Rebuild the model.",
                )
    arrays: dict[str, npt.NDArray[Any]] = {}
    for name, (file_name, _, shape, dtype) in entries.items():
        file_path = model_dir / file_name
        try:
            array = np.load(file_path, mmap_mode="r", allow_pickle=False)
        except (ValueError, OSError, EOFError) as exc:
            raise _error(file_path, f"not a readable .npy array ({exc})") from None
        if array.shape != shape or array.dtype.str != dtype:
            raise _error(
                file_path,
                f"holds shape {list(array.shape)} dtype {array.dtype.str} but the manifest "
                f"says shape {list(shape)} dtype {dtype}",
            )
        arrays[name] = array
    return LoadedModel(model_dir, manifest, MappingProxyType(arrays), manifest_sha256)
