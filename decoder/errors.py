"""Every error the library raises on purpose is a DecoderError with a stable machine-readable ``code``.

The service maps these codes to HTTP statuses; the CLI prints ``str(error)`` and exits non-zero. Errors about
input files always name the file and, where there is one, the line (or XML element) that is wrong.
"""

from __future__ import annotations

from pathlib import Path


class DecoderError(Exception):
    """Base class; ``code`` is a short snake_case identifier that callers may switch on."""

    code = "decoder_error"


class InputFileError(DecoderError):
    """A corpus, glossary or model file that cannot be read as what it claims to be.

    ``location`` is a line number (1-based) or an element description such as ``<tu> #12``."""

    code = "invalid_input_file"

    def __init__(self, path: str | Path, message: str, location: int | str | None = None) -> None:
        self.path = str(path)
        self.location = location
        self.detail = message
        where = self.path if location is None else f"{self.path}:{location}"
        super().__init__(f"{where}: {message}")


class InvalidTextError(DecoderError):
    """Input text that the library refuses (for example control characters or invalid UTF-8)."""

    code = "invalid_text"


class ConfigurationError(DecoderError):
    """Settings that contradict each other or are out of range."""

    code = "invalid_configuration"


class ModelLoadError(DecoderError):
    """A model directory that is missing a file, has a wrong checksum or an unsupported format version."""

    code = "model_load_failed"
