"""Errors of the terminology layer, subclasses of the library's own so callers can catch either.

``InvalidGlossaryError`` is an ``InputFileError``: a bad glossary file names the file and line (TSV/CSV) or
element (TBX); a bad inline glossary (rows from the HTTP service) names the glossary and the 1-based row.
"""

from __future__ import annotations

from decoder.errors import DecoderError, InputFileError


class InvalidGlossaryError(InputFileError):
    """A glossary file or inline glossary that breaks a rule; ``str(error)`` is ``"<where>:<location>: <what>"``."""

    code = "invalid_glossary"


class GlossaryNotFoundError(DecoderError):
    """No glossary of that name in the search folders (the service answers 404)."""

    code = "glossary_not_found"
