"""All glossaries the service knows: built-in files (read-only) and uploads (the SQLite store), with caches.

Built-in glossaries are the files of the glossary folder (name = file stem, read by ``decoder.terminology``);
they carry no languages of their own and are read with the languages of the model they are used with. An
upload may not take a built-in name. Parsed ``Glossary`` objects are cached per worker: uploads by
(name, version), files by (name, languages, modification time, size). Every lookup first asks the store for
the current version (one indexed query), so a PUT in one worker is used by every other worker's next
request, and a stale cache entry is simply never hit again.
"""

from __future__ import annotations

import logging
import os
import tempfile
import threading
from collections import OrderedDict
from dataclasses import dataclass
from pathlib import Path

from decoder.errors import DecoderError, InputFileError
from decoder.terminology.errors import GlossaryNotFoundError, InvalidGlossaryError
from decoder.terminology.glossary import Glossary
from decoder.terminology.store import GLOSSARY_NAME, GLOSSARY_SUFFIXES, glossary_from_rows, read_glossary_file
from decoder.text.languages import primary_subtag
from service.errors import ApiError
from service.store import ABSENT, GlossaryRow, GlossaryStore, StoredGlossary

log = logging.getLogger("phrasework.service")
CACHE_SIZE = 32  # parsed glossaries kept per worker; a 100k-entry glossary takes tens of MB


@dataclass(frozen=True, slots=True)
class GlossaryInfo:
    """What GET /v1/glossaries lists. ``version`` is the ETag value (without quotes)."""

    name: str
    kind: str  # "built_in" or "uploaded"
    version: str
    source_language: str | None
    target_language: str | None
    num_entries: int | None
    created: str | None
    updated: str | None

    def as_dict(self) -> dict[str, object]:
        return {
            "name": self.name,
            "kind": self.kind,
            "version": self.version,
            "source_language": self.source_language,
            "target_language": self.target_language,
            "num_entries": self.num_entries,
            "created": self.created,
            "updated": self.updated,
        }


def rows_of(glossary: Glossary) -> list[GlossaryRow]:
    """The glossary as (source, target) rows in entry order, the form the store keeps and exports."""
    return [
        GlossaryRow(
            entry.source,
            target.text,
            target.status.value,
            entry.case_sensitive,
            entry.mode.value if entry.mode else None,
            target.note or entry.note,
        )
        for entry in glossary.entries
        for target in entry.targets
    ]


def not_found(name: str) -> ApiError:
    return ApiError(404, "glossary_not_found", f"No glossary named {name!r}. GET /v1/glossaries lists them.")


def is_valid_name(name: str) -> bool:
    """Names as ``decoder.terminology.store`` accepts them: letters, digits, "_", "-", "." (not first), no ".."."""
    return bool(GLOSSARY_NAME.fullmatch(name)) and ".." not in name


def check_name(name: str) -> None:
    if not is_valid_name(name):
        raise ApiError(
            400,
            "invalid_glossary_name",
            "Glossary names use letters, digits, '_', '-' and '.' (not first), at most 128 characters.",
            {"name": ["not a valid glossary name"]},
        )


def client_glossary_error(error: InputFileError, label: str) -> ApiError:
    """An upload's parse error, located in the client's terms ("upload line 5") rather than a temp path."""
    where = label if error.location is None else f"{label} {_location_word(error.location)}"
    return ApiError(400, "invalid_glossary", f"{where}: {error.detail}")


def _location_word(location: int | str) -> str:
    return f"line {location}" if isinstance(location, int) else str(location)


class GlossaryCatalog:
    def __init__(self, store: GlossaryStore, glossary_dir: Path | None) -> None:
        self.store = store
        self.glossary_dir = glossary_dir
        self._cache: OrderedDict[tuple, tuple[Glossary, GlossaryInfo]] = OrderedDict()
        self._cache_lock = threading.Lock()  # gthread workers share one catalog between threads

    # -- lookup -----------------------------------------------------------------------------------------

    def built_in_path(self, name: str) -> Path | None:
        if self.glossary_dir is None or not is_valid_name(name):
            return None
        found = [self.glossary_dir / f"{name}{suffix}" for suffix in GLOSSARY_SUFFIXES]
        found = [path for path in found if path.is_file()]
        return found[0] if found else None

    def _built_in_version(self, path: Path) -> str:
        status = path.stat()
        return f"file-{status.st_mtime_ns:x}-{status.st_size:x}"

    def list(self) -> list[GlossaryInfo]:
        infos: dict[str, GlossaryInfo] = {}
        if self.glossary_dir is not None and self.glossary_dir.is_dir():
            for path in sorted(self.glossary_dir.iterdir()):
                if path.suffix in GLOSSARY_SUFFIXES and path.is_file() and GLOSSARY_NAME.fullmatch(path.stem):
                    infos.setdefault(
                        path.stem,
                        GlossaryInfo(path.stem, "built_in", self._built_in_version(path), None, None, None, None, None),
                    )
        for stored in self.store.list():
            infos.setdefault(stored.name, stored_info(stored))
        return [infos[name] for name in sorted(infos)]

    def _remember(self, key: tuple, value: tuple[Glossary, GlossaryInfo]) -> tuple[Glossary, GlossaryInfo]:
        with self._cache_lock:
            self._cache[key] = value
            self._cache.move_to_end(key)
            while len(self._cache) > CACHE_SIZE:
                self._cache.popitem(last=False)
        return value

    def _cached(self, key: tuple) -> tuple[Glossary, GlossaryInfo] | None:
        with self._cache_lock:
            value = self._cache.get(key)
            if value is not None:
                self._cache.move_to_end(key)
            return value

    def get(self, name: str, source_language: str, target_language: str) -> tuple[Glossary, GlossaryInfo]:
        """The glossary ``name`` and its info; built-in files are read with the given languages.

        Raises ApiError 404 for an unknown name, 400 if an upload's languages do not match, 500 if a built-in
        file cannot be read (the operator's problem, logged)."""
        path = self.built_in_path(name)
        if path is not None:
            version = self._built_in_version(path)
            key = ("file", name, source_language, target_language, version)
            cached = self._cached(key)
            if cached is not None:
                return cached
            try:
                glossary = read_glossary_file(path, source_language, target_language, name)
            except DecoderError as error:
                log.error("built-in glossary unreadable", extra={"event": {"glossary": name, "detail": str(error)}})
                raise ApiError(
                    500,
                    "glossary_unavailable",
                    f"The built-in glossary {name!r} cannot be read; the operator has been told (see the server log).",
                ) from error
            info = GlossaryInfo(name, "built_in", version, None, None, len(glossary), None, None)
            return self._remember(key, (glossary, info))
        version_number = self.store.current_version(name) if is_valid_name(name) else ABSENT
        if version_number == ABSENT:
            raise not_found(name)
        cached = self._cached(("stored", name, version_number))
        if cached is None:
            found = self.store.read(name)
            if found is None:  # deleted between the two queries
                raise not_found(name)
            stored, rows = found
            try:
                glossary = glossary_from_rows(
                    name, [row.as_mapping() for row in rows], stored.source_language, stored.target_language
                )
            except InvalidGlossaryError as error:  # rows were validated on upload; this is a corrupt store
                log.error("stored glossary invalid", extra={"event": {"glossary": name, "detail": str(error)}})
                raise ApiError(500, "glossary_unavailable", f"The stored glossary {name!r} cannot be read.") from error
            cached = self._remember(("stored", name, stored.version), (glossary, stored_info(stored)))
        glossary, info = cached
        if primary_subtag(glossary.source_language) != primary_subtag(source_language) or primary_subtag(
            glossary.target_language
        ) != primary_subtag(target_language):
            raise ApiError(
                400,
                "glossary_language_mismatch",
                f"Glossary {name!r} is {glossary.source_language}->{glossary.target_language}; "
                f"it cannot be used for {source_language}->{target_language}.",
                {"glossaries": [f"{name}: wrong language pair"]},
            )
        return glossary, info

    def get_stored(self, name: str) -> tuple[StoredGlossary, list[GlossaryRow]]:
        found = self.store.read(name)
        if found is None:
            raise not_found(name)
        return found

    # -- parsing uploads --------------------------------------------------------------------------------

    @staticmethod
    def parse_file_upload(name: str, data: bytes, suffix: str, source_language: str, target_language: str) -> Glossary:
        """A TSV/CSV or TBX upload parsed by ``decoder.terminology`` (through a temporary file, since its
        readers take paths); errors name the upload's line or element, never the temporary path."""
        handle, temporary = tempfile.mkstemp(prefix="phrasework-upload-", suffix=suffix)
        try:
            with os.fdopen(handle, "wb") as file:
                file.write(data)
            return read_glossary_file(temporary, source_language, target_language, name)
        except InputFileError as error:
            raise client_glossary_error(error, "upload") from error
        except GlossaryNotFoundError as error:  # pragma: no cover - a path is never looked up by name
            raise ApiError(400, "invalid_glossary", str(error)) from error
        finally:
            os.unlink(temporary)

    @staticmethod
    def parse_rows(
        name: str, rows: list[dict], source_language: str, target_language: str, label: str = "entries"
    ) -> Glossary:
        """Rows of a JSON upload (or a request's inline terms) as a Glossary; errors say "<label> row k"."""
        try:
            return glossary_from_rows(name, rows, source_language, target_language)
        except InvalidGlossaryError as error:
            raise client_glossary_error(error, label) from error


def stored_info(stored: StoredGlossary) -> GlossaryInfo:
    """The API description of an uploaded glossary."""
    return GlossaryInfo(
        stored.name,
        "uploaded",
        str(stored.version),
        stored.source_language,
        stored.target_language,
        stored.num_entries,
        stored.created,
        stored.updated,
    )
