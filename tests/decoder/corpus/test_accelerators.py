"""Accelerator removal; each expected value follows from the rule written in decoder/corpus/accelerators.py."""

from __future__ import annotations

import pytest

from decoder.corpus.accelerators import strip_accelerators


@pytest.mark.parametrize(
    ("text", "expected"),
    [
        # Rule 2: a marker that starts a word and is followed by a letter or digit goes.
        ("_File", "File"),  # GTK
        ("&Open", "Open"),  # Qt / Windows
        ("Save &As…", "Save As…"),
        ("_Datei öffnen", "Datei öffnen"),
        ("&Öffnen", "Öffnen"),  # any script's letters count
        ("_1 item", "1 item"),
        ("(_Notebook)", "(Notebook)"),  # preceded by punctuation, not a word character
        # Kept: marker inside a word (after a letter, digit or "_") ...
        ("R&D", "R&D"),
        ("Quillory R&D team", "Quillory R&D team"),
        ("note_id", "note_id"),
        ("a_b", "a_b"),
        ("__init__", "__init__"),
        ("E&xit", "E&xit"),  # the documented price of the rule
        ("%(user_name)s", "%(user_name)s"),
        # ... or not followed by a letter or digit ...
        ("Tom & Jerry", "Tom & Jerry"),
        ("_ _", "_ _"),
        ("&&Exit", "&&Exit"),  # second "&" follows a marker
        # ... or (rule 3) starting a character or entity reference.
        ("&amp;", "&amp;"),
        ("x &lt; y", "x &lt; y"),
        ("&#38;", "&#38;"),
        ("&#x26;", "&#x26;"),
        # Rule 1: CJK-style appended mnemonic, removed with the white space before it.
        ("ファイル(&F)", "ファイル"),
        ("文件(_F)", "文件"),
        ("Notiz (&N)", "Notiz"),
        # Nothing to do.
        ("Plain text", "Plain text"),
        ("", ""),
    ],
)
def test_strip_accelerators(text, expected):
    assert strip_accelerators(text) == expected
