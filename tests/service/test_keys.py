"""``python -m service.keys``: the printed key verifies against the printed line with the chosen scopes."""

from __future__ import annotations

import pytest

from service.auth import KeyRing, parse_key_line
from service.keys import main


def test_printed_key_and_line_belong_together(capsys):
    assert main(["--scope", "glossaries", "--scope", "translate", "--comment", "content pipeline"]) == 0
    key, line = capsys.readouterr().out.splitlines()
    ring = KeyRing([parse_key_line(line, "stdout", 2)])
    assert ring.verify(key).scopes == frozenset({"translate", "glossaries"})
    assert line.endswith("# content pipeline")


def test_comment_with_separator_is_refused(capsys):
    with pytest.raises(SystemExit):
        main(["--scope", "translate", "--comment", "a;b"])
    assert "must not contain" in capsys.readouterr().err
