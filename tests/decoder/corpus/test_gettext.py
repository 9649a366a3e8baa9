"""gettext PO and MO readers.

Expected pairs come from reading the fixture by hand (tests/decoder/corpus/data/quillory.de.po; the line numbers
are those of its msgid / msgid_plural keywords) and from two outside references: GNU msgfmt, which compiles the
PO fixture (its MO output must read as the same pairs) and rejects the malformed PO inputs below, and Python's
stdlib ``gettext.GNUTranslations``, an independent MO reader that checks the MO files built here from the spec.
"""

from __future__ import annotations

import gettext as stdlib_gettext
import io
import shutil
import struct
import subprocess
from pathlib import Path

import pytest

from decoder.corpus.gettext import read_mo, read_po
from decoder.corpus.records import SkipReason
from decoder.errors import InputFileError

DATA = Path(__file__).parent / "data"
PO_FIXTURE = DATA / "quillory.de.po"
MSGFMT = shutil.which("msgfmt")
needs_msgfmt = pytest.mark.skipif(MSGFMT is None, reason="GNU msgfmt (gettext) is not installed")

# Hand-read from quillory.de.po: header, two fuzzy entries, "Export as PDF" (empty msgstr) and the "#~" entry
# are skipped; "_File"/"&Open"/"&öffnen" lose their accelerator, "R&D", "F&E", "&amp;" and "note_id" keep theirs;
# the second plural form of "%d notebook" is empty, so only its singular pair remains.
EXPECTED_PO_PAIRS = [
    ("File", "Datei", "quillory.de.po:16"),
    ("Open notebook", "Notizbuch öffnen", "quillory.de.po:20"),
    ("Made by the Quillory R&D team", "Erstellt vom F&E-Team von Quillory", "quillory.de.po:25"),
    ("Note", "Notiz", "quillory.de.po:29"),
    ("Note", "Notieren", "quillory.de.po:33"),
    ("%d note", "%d Notiz", "quillory.de.po:37"),
    ("%d notes", "%d Notizen", "quillory.de.po:38"),
    (
        'Your notebook "Ideas" was saved.\nPress\tTab to continue.',
        'Ihr Notizbuch "Ideen" wurde gespeichert.\nDrücken Sie\tTab, um fortzufahren.',
        "quillory.de.po:53",
    ),
    ("Use &amp; to write an ampersand", "Mit &amp; schreiben Sie ein kaufmännisches Und", "quillory.de.po:60"),
    ("Set note_id to 0", "note_id auf 0 setzen", "quillory.de.po:63"),
    ("Path: C:\\Quillory\\notes AB", "Pfad: C:\\Quillory\\Notizen AB", "quillory.de.po:66"),  # \101 = A, \x42 = B
    ("Delete notes", "Notizen löschen", "quillory.de.po:70"),
    ("%d notebook", "%d Notizbuch", "quillory.de.po:73"),
]
EXPECTED_PO_SKIPPED = {
    SkipReason.HEADER: 1,
    SkipReason.FUZZY: 2,  # "#, fuzzy" and "#, c-format, fuzzy"
    SkipReason.UNTRANSLATED: 1,
    SkipReason.OBSOLETE: 1,
}


def pair_tuples(reader) -> list[tuple[str, str, str]]:
    return [(pair.source, pair.target, pair.location) for pair in reader]


def write(tmp_path: Path, name: str, content: str | bytes) -> Path:
    path = tmp_path / name
    path.write_bytes(content.encode("utf-8") if isinstance(content, str) else content)
    return path


# ---------------------------------------------------------------------------------------------- PO files


def test_po_fixture_yields_the_hand_read_pairs_and_skip_counts():
    reader = read_po(PO_FIXTURE)
    assert pair_tuples(reader) == EXPECTED_PO_PAIRS
    assert reader.skipped == EXPECTED_PO_SKIPPED


def test_po_accelerators_are_kept_when_asked():
    pairs = pair_tuples(read_po(PO_FIXTURE, strip_accelerators=False))
    assert pairs[:2] == [
        ("_File", "_Datei", "quillory.de.po:16"),
        ("&Open notebook", "Notizbuch &öffnen", "quillory.de.po:20"),
    ]


@needs_msgfmt
def test_po_reader_agrees_with_gnu_msgfmt(tmp_path):
    # Reference: GNU msgfmt parses the same PO file; the MO it writes (translated, non-fuzzy entries only)
    # must hold exactly the pairs our PO reader found.
    mo_path = tmp_path / "quillory.de.mo"
    subprocess.run([MSGFMT, "--check", "-o", str(mo_path), str(PO_FIXTURE)], check=True, capture_output=True)
    from_po = sorted((source, target) for source, target, _ in pair_tuples(read_po(PO_FIXTURE)))
    from_mo = sorted((pair.source, pair.target) for pair in read_mo(mo_path))
    assert from_mo == from_po


@needs_msgfmt
def test_po_octal_escapes_are_bytes_of_the_declared_charset(tmp_path):
    # "\366" is byte 0xF6, which is "ö" in ISO-8859-1; the raw byte 0xF6 in the file means the same.
    content = (
        b'msgid ""\nmsgstr "Content-Type: text/plain; charset=ISO-8859-1\\n"\n\n'
        b'msgid "Tags"\nmsgstr "Schlagw\\366rter"\n\n'
        b'msgid "Colour"\nmsgstr "Farbt\xf6ne"\n'
    )
    po_path = write(tmp_path, "latin1.po", content)
    assert pair_tuples(read_po(po_path)) == [
        ("Tags", "Schlagwörter", "latin1.po:4"),
        ("Colour", "Farbtöne", "latin1.po:7"),
    ]
    # Reference: msgfmt + the stdlib reader decode the same file the same way.
    mo_path = tmp_path / "latin1.mo"
    subprocess.run([MSGFMT, "-o", str(mo_path), str(po_path)], check=True, capture_output=True)
    with open(mo_path, "rb") as file:
        catalog = stdlib_gettext.GNUTranslations(file)
    assert [catalog.gettext("Tags"), catalog.gettext("Colour")] == ["Schlagwörter", "Farbtöne"]


@pytest.mark.parametrize(
    ("escape", "expected"),
    # Simple escape sequences of ISO C (C11 6.4.4.4), plus octal and hexadecimal ones.
    [
        ("\\n", "\n"),
        ("\\t", "\t"),
        ("\\r", "\r"),
        ("\\a", "\a"),
        ("\\b", "\b"),
        ("\\f", "\f"),
        ("\\v", "\v"),
        ('\\"', '"'),
        ("\\\\", "\\"),
        ("\\'", "'"),
        ("\\?", "?"),
        ("\\101", "A"),
        ("\\0", "\0"),
        ("\\x41", "A"),
    ],
)
def test_po_c_escape_sequences(tmp_path, escape, expected):
    path = write(tmp_path, "escape.po", f'msgid "x{escape}y"\nmsgstr "z"\n')
    assert pair_tuples(read_po(path)) == [(f"x{expected}y", "z", "escape.po:1")]


def test_po_adjacent_strings_crlf_and_keyword_without_space(tmp_path):
    path = write(tmp_path, "forms.po", 'msgid "Quill" "ory"\r\nmsgstr"Quill"\r\n"ory"\r\n')
    assert pair_tuples(read_po(path)) == [("Quillory", "Quillory", "forms.po:1")]
    if MSGFMT is not None:  # reference: GNU msgfmt accepts all three forms as well
        assert subprocess.run([MSGFMT, "-o", "/dev/null", str(path)], capture_output=True).returncode == 0


def test_po_plural_forms_beyond_the_second_are_not_paired(tmp_path):
    # Russian-style catalog with three forms: msgstr[2] has no source string to pair with (module docstring).
    path = write(
        tmp_path,
        "ru.po",
        'msgid "%d note"\nmsgid_plural "%d notes"\n'
        'msgstr[0] "%d заметка"\nmsgstr[1] "%d заметки"\nmsgstr[2] "%d заметок"\n',
    )
    assert pair_tuples(read_po(path)) == [("%d note", "%d заметка", "ru.po:1"), ("%d notes", "%d заметки", "ru.po:2")]


def test_po_fuzzy_header_counts_as_header_and_charset_placeholder_means_utf8(tmp_path):
    # A fresh template's header is fuzzy and says "charset=CHARSET".
    path = write(
        tmp_path,
        "template.po",
        '#, fuzzy\nmsgid ""\nmsgstr "Content-Type: text/plain; charset=CHARSET\\n"\n\n'
        'msgid "Pen"\nmsgstr "Füller"\n\n#~ msgctxt "old"\n#~ msgid "Ink"\n#~ msgstr "Tinte"\n',
    )
    reader = read_po(path)
    assert pair_tuples(reader) == [("Pen", "Füller", "template.po:5")]
    assert reader.skipped == {SkipReason.HEADER: 1, SkipReason.OBSOLETE: 1}


# (case, PO text, line the error must name, part of the message). GNU msgfmt rejects every one of these too.
PO_SYNTAX_ERRORS = [
    ("second msgid", 'msgid "a"\nmsgid "b"\nmsgstr "c"\n', 2, "a second msgid"),
    ("msgstr first", 'msgstr "x"\n', 1, "msgstr without a msgid"),
    ("unterminated string", 'msgid "a"\nmsgstr "b"\n"c\n', 3, "malformed string"),
    ("unknown escape", 'msgid "a\\q"\nmsgstr ""\n', 1, "unknown escape sequence \\q"),
    ("orphan continuation", '"orphan"\n', 1, "continuation line"),
    ("plain msgstr in plural", 'msgid "a"\nmsgid_plural "as"\nmsgstr "b"\n', 3, "needs msgstr[0]"),
    ("index without plural", 'msgid "a"\nmsgstr[0] "b"\n', 2, "without msgid_plural"),
    ("plural index order", 'msgid "a"\nmsgid_plural "as"\nmsgstr[1] "b"\n', 3, "expected msgstr[0]"),
    ("comment inside entry", 'msgid "a"\n# note\nmsgstr "b"\n', 2, "comment cannot come between"),
    ("unknown keyword", 'msgid "a"\nmsgstr "b"\nmsgtxt "c"\n', 3, "found 'msgtxt'"),
    ("file ends in entry", '\nmsgid "a"\n\n', 3, "ends inside an entry"),
    ("junk after string", 'msgid "a" junk\nmsgstr ""\n', 1, "malformed string"),
    ("msgctxt twice", 'msgctxt "c"\nmsgctxt "d"\nmsgid "a"\nmsgstr "b"\n', 2, "msgctxt must come first"),
    ("index on msgid", 'msgid[0] "a"\nmsgstr "b"\n', 1, "only msgstr takes an index"),
]


@pytest.mark.parametrize(
    ("text", "line", "fragment"), [case[1:] for case in PO_SYNTAX_ERRORS], ids=[case[0] for case in PO_SYNTAX_ERRORS]
)
def test_po_syntax_errors_name_file_and_line(tmp_path, text, line, fragment):
    path = write(tmp_path, "broken.po", text)
    with pytest.raises(InputFileError) as caught:
        list(read_po(path))
    assert caught.value.location == line
    assert str(caught.value).startswith(f"{path}:{line}: ")
    assert fragment in str(caught.value)
    if MSGFMT is not None:  # the reference implementation agrees that the file is broken
        assert subprocess.run([MSGFMT, "-o", "/dev/null", str(path)], capture_output=True).returncode != 0


def test_po_octal_escape_above_255_is_an_error(tmp_path):
    # ISO C: an octal escape must fit the character type (here a byte); "\777" is 511.
    path = write(tmp_path, "big.po", 'msgid "a"\nmsgstr "\\777"\n')
    with pytest.raises(InputFileError, match=r"big\.po:2: .*does not fit in a byte"):
        list(read_po(path))


@pytest.mark.parametrize(
    ("header_charset", "fragment"),
    [("NO-SUCH-CHARSET", "unknown charset 'NO-SUCH-CHARSET'"), ("UTF-16", "not ASCII-compatible")],
)
def test_po_bad_charset_names_the_header_line(tmp_path, header_charset, fragment):
    path = write(
        tmp_path, "charset.po", f'\nmsgid ""\nmsgstr "Content-Type: text/plain; charset={header_charset}\\n"\n'
    )
    with pytest.raises(InputFileError) as caught:
        list(read_po(path))
    assert caught.value.location == 2  # the header's msgid line
    assert fragment in str(caught.value)


def test_po_invalid_utf8_names_the_entry_line(tmp_path):
    path = write(tmp_path, "bad.po", b'msgid "a"\nmsgstr "ok"\n\nmsgid "b"\nmsgstr "\xff"\n')
    with pytest.raises(InputFileError, match=r"bad\.po:4: a string is not valid utf-8"):
        list(read_po(path))


def test_po_missing_file_is_an_input_file_error(tmp_path):
    with pytest.raises(InputFileError, match=r"absent\.po: cannot be opened"):
        list(read_po(tmp_path / "absent.po"))


# ---------------------------------------------------------------------------------------------- MO files

MO_MAGIC = 0x950412DE


def build_mo(messages: dict[bytes, bytes], byte_order: str = "<", revision: int = 0) -> bytes:
    """A MO file written from the GNU gettext manual, "The Format of GNU MO Files" (not from our reader).

    Layout per the manual: seven 32-bit words (magic 0x950412de, file format revision, number of strings N,
    offset O of the table of original strings, offset T of the table of translations, hash table size S,
    hash table offset H); at O, N pairs (length, offset) for the originals, sorted by string; at T the same for
    the translations; then the strings, each followed by a NUL that the length does not count. S = 0 leaves the
    hash table out (allowed by the manual, from memory; the stdlib reader never uses it)."""
    originals = sorted(messages)
    count = len(originals)
    originals_offset = 7 * 4
    translations_offset = originals_offset + 8 * count
    strings_offset = translations_offset + 8 * count
    strings = bytearray()
    tables: list[list[tuple[int, int]]] = [[], []]
    for table, values in ((tables[0], originals), (tables[1], [messages[key] for key in originals])):
        for value in values:
            table.append((len(value), strings_offset + len(strings)))
            strings += value + b"\x00"
    header = struct.pack(
        byte_order + "7I", MO_MAGIC, revision, count, originals_offset, translations_offset, 0, strings_offset
    )
    rows = b"".join(struct.pack(byte_order + "2I", *row) for table in tables for row in table)
    return header + rows + bytes(strings)


MO_HEADER = "Content-Type: text/plain; charset={charset}\nPlural-Forms: nplurals=2; plural=(n != 1);\n"


def quillory_messages(charset: str = "UTF-8") -> dict[bytes, bytes]:
    encoding = "latin-1" if charset == "ISO-8859-1" else "utf-8"
    return {
        key.encode(encoding): value.encode(encoding)
        for key, value in {
            "": MO_HEADER.format(charset=charset),
            "_Export": "_Exportieren",
            "menu\x04Note": "Notiz",
            "%d tag\x00%d tags": "%d Schlagwort\x00%d Schlagwörter",
            "Trash": "",
        }.items()
    }


# Sorted originals: "" (1), "%d tag..." (2), "Trash" (3), "_Export" (4), "menu\x04Note" (5). Hand-derived.
EXPECTED_MO_PAIRS = [
    ("%d tag", "%d Schlagwort", "quillory.mo:string #2"),
    ("%d tags", "%d Schlagwörter", "quillory.mo:string #2"),
    ("Export", "Exportieren", "quillory.mo:string #4"),
    ("Note", "Notiz", "quillory.mo:string #5"),
]


@pytest.mark.parametrize("byte_order", ["<", ">"])
@pytest.mark.parametrize("charset", ["UTF-8", "ISO-8859-1"])
def test_mo_builder_agrees_with_stdlib_reader(byte_order, charset):
    # Checks the test's own builder against the reference reader, so the read_mo tests below rest on it.
    catalog = stdlib_gettext.GNUTranslations(io.BytesIO(build_mo(quillory_messages(charset), byte_order)))
    assert catalog.gettext("_Export") == "_Exportieren"
    assert catalog.pgettext("menu", "Note") == "Notiz"
    assert [catalog.ngettext("%d tag", "%d tags", n) for n in (1, 5)] == ["%d Schlagwort", "%d Schlagwörter"]


@pytest.mark.parametrize("byte_order", ["<", ">"])
@pytest.mark.parametrize("charset", ["UTF-8", "ISO-8859-1"])
def test_mo_reader_on_spec_built_files(tmp_path, byte_order, charset):
    path = write(tmp_path, "quillory.mo", build_mo(quillory_messages(charset), byte_order))
    reader = read_mo(path)
    assert pair_tuples(reader) == EXPECTED_MO_PAIRS
    assert reader.skipped == {SkipReason.HEADER: 1, SkipReason.UNTRANSLATED: 1}


def test_mo_accelerators_are_kept_when_asked(tmp_path):
    path = write(tmp_path, "quillory.mo", build_mo(quillory_messages()))
    assert ("_Export", "_Exportieren", "quillory.mo:string #4") in pair_tuples(read_mo(path, strip_accelerators=False))


@pytest.mark.parametrize("revision", [0x0000_0001, 0x0001_0000])
def test_mo_known_major_revisions_are_read(tmp_path, revision):
    # The manual: an unknown minor revision still reads; major revisions 0 and 1 exist. The stdlib agrees.
    data = build_mo(quillory_messages(), revision=revision)
    assert stdlib_gettext.GNUTranslations(io.BytesIO(data)).gettext("_Export") == "_Exportieren"
    assert pair_tuples(read_mo(write(tmp_path, "quillory.mo", data))) == EXPECTED_MO_PAIRS


def corrupt(data: bytes, offset: int, replacement: bytes) -> bytes:
    return data[:offset] + replacement + data[offset + len(replacement) :]


GOOD_MO = build_mo(quillory_messages())
# Offsets into GOOD_MO, by hand from build_mo's layout with N = 5: originals table at 28, translations at 68,
# strings from 108; the original "" ends at 108 (its NUL), "%d tag\0%d tags" (14 bytes) at 109..122, NUL 123.
MO_ERRORS = [
    ("too short", GOOD_MO[:20], "header", "too short for a MO file"),
    ("bad magic", corrupt(GOOD_MO, 0, b"\x00\x00\x00\x00"), "header", "not a MO file"),
    ("major revision 2", corrupt(GOOD_MO, 4, struct.pack("<I", 2 << 16)), "header", "revision 2.0"),
    ("table past the end", corrupt(GOOD_MO, 8, struct.pack("<I", 1000)), "header", "runs past the end"),
    ("string past the end", corrupt(GOOD_MO, 28 + 8 + 4, struct.pack("<I", 10_000)), "string #2", "past the end"),
    ("no NUL after string", corrupt(GOOD_MO, 123, b"X"), "string #2", "not NUL-terminated"),
    ("invalid UTF-8", corrupt(GOOD_MO, 109, b"\xff"), "string #2", "not valid utf-8"),
]


@pytest.mark.parametrize(
    ("data", "element", "fragment"), [case[1:] for case in MO_ERRORS], ids=[case[0] for case in MO_ERRORS]
)
def test_mo_errors_name_file_and_element(tmp_path, data, element, fragment):
    path = write(tmp_path, "broken.mo", data)
    with pytest.raises(InputFileError) as caught:
        list(read_mo(path))
    assert caught.value.location == element
    assert str(caught.value).startswith(f"{path}:{element}: ")
    assert fragment in str(caught.value)


def test_stdlib_reader_also_rejects_major_revision_2():
    # Reference for the "major revision 2" case above: the stdlib refuses the file as well.
    with pytest.raises(OSError, match="Bad version number"):
        stdlib_gettext.GNUTranslations(io.BytesIO(MO_ERRORS[2][1]))
