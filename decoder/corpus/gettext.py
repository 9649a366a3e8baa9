"""gettext catalogs as parallel corpora: PO (text) and MO (binary), per the GNU gettext manual.

Sections followed: "The Format of PO Files" and "The Format of GNU MO Files". The untranslated string (msgid)
is the source, the translation (msgstr) the target; ``msgctxt`` only disambiguates and is not in the pair.

What becomes a pair:
- the header entry (empty msgid, no context) carries metadata, not text: skipped, but its ``charset`` is used
  to decode the strings that follow (UTF-8 until then, and for the template placeholder "CHARSET");
- entries flagged ``#, fuzzy`` are unconfirmed guesses and entries with an empty msgstr are untranslated:
  both skipped (MO files normally contain neither; msgfmt leaves them out);
- obsolete entries (``#~`` lines) are comments to a reader and skipped, and counted;
- a plural entry yields up to two pairs, (msgid, msgstr[0]) and (msgid_plural, msgstr[1]): in the usual
  English msgid/msgid_plural, these are the singular and the first plural form of the target language. Further
  forms (msgstr[2], ... for languages with more plural categories) are not paired because the source has no
  matching string; a form that is empty is left out, and so is the plural pair of a one-form language.

Strings are unescaped to bytes first (octal escapes such as ``\\303\\251`` are bytes of the charset, as in C)
and then decoded, so any ASCII-compatible charset works. Accelerator markers ("_File", "&Open") are removed
from both sides by default; see ``accelerators`` for the exact rule. Locations are ``"app.po:<line of the
msgid or msgid_plural keyword>"`` and ``"app.mo:string #k"`` (k counts the MO string table from 1, the header
included). A PO syntax error raises InputFileError with the file and line; a broken MO file names the part.
"""

from __future__ import annotations

import codecs
import os
import re
import struct
from collections import Counter
from collections.abc import Iterator
from dataclasses import dataclass, field
from pathlib import Path
from typing import BinaryIO

import numpy as np
import numpy.typing as npt

from decoder.corpus.accelerators import strip_accelerators as remove_accelerators
from decoder.corpus.records import CorpusReader, RawPair, SkipReason, open_binary
from decoder.errors import InputFileError

DEFAULT_CHARSET = "utf-8"
TEMPLATE_CHARSET = "charset"  # the literal placeholder in .pot templates, compared after lower-casing
CONTEXT_SEPARATOR = b"\x04"  # MO: "msgctxt EOT msgid"
PLURAL_SEPARATOR = b"\x00"  # MO: "msgid NUL msgid_plural", "msgstr[0] NUL msgstr[1] ..."
MO_MAGIC = 0x950412DE
MO_HEADER_SIZE = 28  # seven 32-bit words: magic, revision, N, O, T, S, H
MO_MAJOR_REVISIONS = (0, 1)  # the manual: an unknown major revision means the file cannot be read

_KEYWORD = re.compile(rb"(msgctxt|msgid_plural|msgid|msgstr)(?:\[([0-9]+)\])?\s*(\".*)")
_STRINGS = re.compile(rb'(?:"(?:[^"\\]|\\.)*"\s*)+')
_STRING = re.compile(rb'"((?:[^"\\]|\\.)*)"')
_ESCAPE = re.compile(rb"\\(?:([0-7]{1,3})|x([0-9A-Fa-f]+)|(.))")
_SIMPLE_ESCAPES = {
    b"n": b"\n", b"t": b"\t", b"r": b"\r", b"a": b"\a", b"b": b"\b", b"f": b"\f", b"v": b"\v",
    b"\\": b"\\", b'"': b'"', b"'": b"'", b"?": b"?",
}  # fmt: skip
_CHARSET = re.compile(r"charset\s*=\s*([^\s;]+)", re.IGNORECASE)


class _SyntaxError(Exception):
    """A PO problem found while parsing one line; the parse loop adds the file and line number."""


@dataclass(slots=True)
class _Entry:
    """A PO entry while it is being read; the ``bytearray`` fields grow with continuation lines."""

    context: bytearray | None = None
    msgid: bytearray | None = None
    msgid_plural: bytearray | None = None
    msgstrs: list[bytearray] = field(default_factory=list)
    is_fuzzy: bool = False
    msgid_line: int = 0
    plural_line: int = 0
    current: bytearray | None = None  # the string a continuation line extends

    @property
    def is_started(self) -> bool:
        return self.context is not None or self.msgid is not None


def read_po(path: str | Path, strip_accelerators: bool = True) -> CorpusReader:
    """Pairs (msgid, msgstr) of a PO file's translated, non-fuzzy entries, streamed line by line."""
    path = Path(path)

    def generate(skipped: Counter[SkipReason]) -> Iterator[RawPair]:
        charset = DEFAULT_CHARSET
        entry = _Entry()
        line_number = 0
        with open_binary(path) as file:
            for line_number, raw in enumerate(file, start=1):
                line = raw.strip()
                if not line:
                    continue
                try:
                    if entry.msgstrs and (line.startswith(b"#") or _starts_entry(line)):
                        charset = yield from _po_pairs(path, entry, charset, strip_accelerators, skipped)
                        entry = _Entry()
                    _parse_line(line, line_number, entry, skipped)
                except _SyntaxError as error:
                    raise InputFileError(path, str(error), line_number) from None
        if entry.msgstrs:
            yield from _po_pairs(path, entry, charset, strip_accelerators, skipped)
        elif entry.is_started:
            raise InputFileError(path, "the file ends inside an entry that has no msgstr", line_number)

    return CorpusReader(generate)


def _is_msgid_line(line: bytes) -> bool:
    return line.startswith(b"msgid") and not line.startswith(b"msgid_plural")


def _starts_entry(line: bytes) -> bool:
    """True for the keyword lines that open an entry (msgctxt, msgid), which also close the one before."""
    return line.startswith(b"msgctxt") or _is_msgid_line(line)


def _parse_line(line: bytes, line_number: int, entry: _Entry, skipped: Counter[SkipReason]) -> None:
    """Apply one non-blank line to the entry being read (a new, empty one if the previous was complete)."""
    if line.startswith(b"#"):
        if entry.is_started:
            raise _SyntaxError("a comment cannot come between msgid and msgstr")
        if line.startswith(b"#,"):
            entry.is_fuzzy |= b"fuzzy" in {flag.strip() for flag in line[2:].split(b",")}
        elif line.startswith(b"#~") and _is_msgid_line(line[2:].lstrip()):
            skipped[SkipReason.OBSOLETE] += 1  # every entry has exactly one msgid line
        return
    if line.startswith(b'"'):
        if entry.current is None:
            raise _SyntaxError("a string continuation line must follow a msgid, msgstr or msgctxt line")
        entry.current.extend(_parse_strings(line))
        return
    match = _KEYWORD.fullmatch(line)
    if match is None:
        word = line.split()[0].decode("ascii", "replace")
        raise _SyntaxError(f"expected msgctxt, msgid, msgid_plural, msgstr or a quoted string, found {word!r}")
    keyword, index, rest = match.groups()
    value = bytearray(_parse_strings(rest))
    if index is not None and keyword != b"msgstr":
        raise _SyntaxError(f"only msgstr takes an index, not {keyword.decode()}")
    if keyword == b"msgctxt":
        if entry.is_started:
            raise _SyntaxError("msgctxt must come first in an entry, before msgid")
        entry.context = value
    elif keyword == b"msgid":
        if entry.msgid is not None:
            raise _SyntaxError("a second msgid before the msgstr of the first")
        entry.msgid, entry.msgid_line = value, line_number
    elif keyword == b"msgid_plural":
        if entry.msgid is None or entry.msgid_plural is not None or entry.msgstrs:
            raise _SyntaxError("msgid_plural must follow msgid, once, before the msgstr[n] lines")
        entry.msgid_plural, entry.plural_line = value, line_number
    else:
        _add_msgstr(entry, None if index is None else int(index), value)
    entry.current = value


def _add_msgstr(entry: _Entry, index: int | None, value: bytearray) -> None:
    if entry.msgid is None:
        raise _SyntaxError("msgstr without a msgid before it")
    if index is None:
        if entry.msgid_plural is not None:
            raise _SyntaxError("an entry with msgid_plural needs msgstr[0], msgstr[1], ... instead of msgstr")
        if entry.msgstrs:
            raise _SyntaxError("a second msgstr in one entry")
    else:
        if entry.msgid_plural is None:
            raise _SyntaxError(f"msgstr[{index}] in an entry without msgid_plural")
        if index != len(entry.msgstrs):
            raise _SyntaxError(f"expected msgstr[{len(entry.msgstrs)}], found msgstr[{index}]")
    entry.msgstrs.append(value)


def _parse_strings(text: bytes) -> bytes:
    """The concatenated, unescaped value of one or more adjacent C string literals (the rest of a line)."""
    if not _STRINGS.fullmatch(text):
        raise _SyntaxError('malformed string: expected text in double quotes, with \\" for a quote')
    return b"".join(_ESCAPE.sub(_unescape, literal) for literal in _STRING.findall(text))


def _unescape(match: re.Match[bytes]) -> bytes:
    octal, hexadecimal, simple = match.groups()
    if simple is not None:
        if simple not in _SIMPLE_ESCAPES:
            raise _SyntaxError(f"unknown escape sequence \\{simple.decode('latin-1')}")
        return _SIMPLE_ESCAPES[simple]
    value = int(octal, 8) if octal is not None else int(hexadecimal, 16)
    if value > 0xFF:
        raise _SyntaxError(f"escape sequence {match.group().decode()} does not fit in a byte")
    return bytes([value])


def _po_pairs(path: Path, entry: _Entry, charset: str, strip: bool, skipped: Counter[SkipReason]) -> Iterator[RawPair]:
    """Pairs of one complete PO entry; returns the charset to use from now on (the header may set it)."""
    assert entry.msgid is not None  # _add_msgstr guarantees a msgid before any msgstr
    if not entry.msgid and entry.context is None:
        skipped[SkipReason.HEADER] += 1
        return _header_charset(path, bytes(entry.msgstrs[0]), entry.msgid_line)
    if entry.is_fuzzy:
        skipped[SkipReason.FUZZY] += 1
        return charset
    sources, locations = [bytes(entry.msgid)], [f"{path.name}:{entry.msgid_line}"]
    if entry.msgid_plural is not None:
        sources.append(bytes(entry.msgid_plural))
        locations.append(f"{path.name}:{entry.plural_line}")
    translations = [bytes(value) for value in entry.msgstrs]
    yield from _catalog_pairs(path, sources, translations, locations, charset, strip, skipped, entry.msgid_line)
    return charset


def _catalog_pairs(
    path: Path,
    sources: list[bytes],
    translations: list[bytes],
    locations: list[str],
    charset: str,
    strip: bool,
    skipped: Counter[SkipReason],
    error_location: int | str,
) -> Iterator[RawPair]:
    """The pairs of one message (PO and MO): [msgid, msgid_plural] against [msgstr[0], msgstr[1], ...].

    zip() pairs form 0 with msgid and form 1 with msgid_plural, ignoring forms 2 and up (module docstring)."""
    if not any(translations):
        skipped[SkipReason.UNTRANSLATED] += 1
        return
    try:
        decoded = [
            (source.decode(charset), translation.decode(charset))
            for source, translation in zip(sources, translations, strict=False)
        ]
    except UnicodeDecodeError as error:
        raise InputFileError(path, f"a string is not valid {charset} ({error.reason})", error_location) from None
    for (source, translation), location in zip(decoded, locations, strict=False):
        if translation:
            if strip:
                source, translation = remove_accelerators(source), remove_accelerators(translation)
            yield RawPair(source, translation, location)


def _header_charset(path: Path, header: bytes, location: int | str) -> str:
    """The Python codec for the header's ``Content-Type: ...; charset=X``; UTF-8 if absent or placeholder."""
    match = _CHARSET.search(header.decode("ascii", "replace"))
    if match is None or match.group(1).lower() == TEMPLATE_CHARSET:
        return DEFAULT_CHARSET
    name = match.group(1)
    try:
        codec = codecs.lookup(name).name
    except LookupError:
        raise InputFileError(path, f"the header names an unknown charset {name!r}", location) from None
    probe = '"msgid\\#\n'  # keywords, quotes and escapes must read the same as ASCII (excludes UTF-16/32)
    if probe.encode(codec, "replace") != probe.encode("ascii"):
        raise InputFileError(path, f"charset {name!r} is not ASCII-compatible; convert the file to UTF-8", location)
    return codec


def read_mo(path: str | Path, strip_accelerators: bool = True) -> CorpusReader:
    """Pairs (msgid, msgstr) of a compiled MO catalog, either byte order; strings are read one at a time."""
    path = Path(path)

    def generate(skipped: Counter[SkipReason]) -> Iterator[RawPair]:
        with open_binary(path) as file:
            size = os.fstat(file.fileno()).st_size
            order, count, originals_offset, translations_offset = _mo_header(path, file.read(MO_HEADER_SIZE))
            originals = _mo_table(path, file, order, originals_offset, count, size, "original")
            translations = _mo_table(path, file, order, translations_offset, count, size, "translated")
            charset = DEFAULT_CHARSET
            for index in range(count):
                element = f"string #{index + 1}"
                original = _mo_string(path, file, originals[index], element)
                translation = _mo_string(path, file, translations[index], element)
                if not original:  # empty msgid without context: the header entry
                    skipped[SkipReason.HEADER] += 1
                    charset = _header_charset(path, translation, element)
                    continue
                _context, _, message = original.rpartition(CONTEXT_SEPARATOR)
                sources = message.split(PLURAL_SEPARATOR)  # [msgid] or [msgid, msgid_plural]
                location = f"{path.name}:{element}"
                yield from _catalog_pairs(
                    path,
                    sources,
                    translation.split(PLURAL_SEPARATOR),
                    [location] * len(sources),
                    charset,
                    strip_accelerators,
                    skipped,
                    element,
                )

    return CorpusReader(generate)


def _mo_header(path: Path, header: bytes) -> tuple[str, int, int, int]:
    """(struct byte order, number of strings N, offset O of the originals table, offset T of translations)."""
    if len(header) < MO_HEADER_SIZE:
        raise InputFileError(path, f"too short for a MO file ({len(header)} bytes)", "header")
    for order in ("<", ">"):
        if struct.unpack(order + "I", header[:4])[0] == MO_MAGIC:
            break
    else:
        raise InputFileError(path, f"not a MO file: magic number {header[:4].hex()}", "header")
    revision, count, originals_offset, translations_offset = struct.unpack(order + "4I", header[4:20])
    if revision >> 16 not in MO_MAJOR_REVISIONS:
        raise InputFileError(path, f"unsupported MO format revision {revision >> 16}.{revision & 0xFFFF}", "header")
    return order, count, originals_offset, translations_offset


def _mo_table(
    path: Path, file: BinaryIO, order: str, offset: int, count: int, size: int, kind: str
) -> npt.NDArray[np.int64]:
    """The (length, offset) rows of one string table, checked to lie inside the file (with their NUL)."""
    if offset + 8 * count > size:
        raise InputFileError(path, f"the table of {kind} strings runs past the end of the file", "header")
    file.seek(offset)
    table = np.frombuffer(file.read(8 * count), dtype=np.dtype(np.uint32).newbyteorder(order)).reshape(count, 2)
    table = table.astype(np.int64)
    outside = np.flatnonzero(table[:, 0] + table[:, 1] + 1 > size)
    if outside.size:
        raise InputFileError(path, f"the {kind} string runs past the end of the file", f"string #{outside[0] + 1}")
    return table


def _mo_string(path: Path, file: BinaryIO, row: npt.NDArray[np.int64], element: str) -> bytes:
    length, offset = int(row[0]), int(row[1])
    file.seek(offset)
    data = file.read(length + 1)
    if data[-1:] != b"\x00":
        raise InputFileError(path, "a string is not NUL-terminated", element)
    return data[:-1]
