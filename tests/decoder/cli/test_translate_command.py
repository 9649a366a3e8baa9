"""`phrasework translate`: one output line per input line, always, also for bad lines; clear errors."""

from __future__ import annotations

import json
import subprocess
import sys

from tests.conftest import REPO

LINES = [b"Open the blue report.", b"", b"Saved %d files to {folder}.", b"\xff\xfe not UTF-8",
         b"Click Save.\x07", b"Click <b>Save</b>."]


ALL_LINES = b"\n".join(LINES) + b"\n"


def run_translate(model_dir, *extra, stdin=ALL_LINES):
    return subprocess.run([sys.executable, "-m", "decoder.cli", "translate", "--model", str(model_dir), *extra],
                          input=stdin, capture_output=True, cwd=REPO, timeout=300)


def test_translate_keeps_one_line_per_input_line(demo_model_dir):
    completed = run_translate(demo_model_dir, "--workers", "2")
    lines = completed.stdout.decode("utf-8").split("\n")
    assert lines[-1] == "" and len(lines) - 1 == len(LINES)
    assert lines[1] == ""                               # an empty line gives an empty line
    assert lines[3] == "" and lines[4] == ""            # bad lines: empty output, error on stderr
    assert "%d" in lines[2] and "{folder}" in lines[2]  # placeholders verbatim
    assert "<b>" in lines[5] and "</b>" in lines[5]
    errors = completed.stderr.decode("utf-8")
    assert "line 4: invalid UTF-8" in errors and "line 5: Control character U+0007" in errors
    assert "Traceback" not in errors
    assert completed.returncode == 1


def test_translate_jsonl_carries_n_best_features_and_alignment(demo_model_dir):
    completed = run_translate(demo_model_dir, "--format", "jsonl", "--n-best", "3", "--include", "alignment",
                              stdin=b"Open the report.\nClose the folder.\n")
    assert completed.returncode == 0, completed.stderr
    records = [json.loads(line) for line in completed.stdout.decode("utf-8").splitlines()]
    assert len(records) == 2
    for record in records:
        assert 1 <= len(record["n_best"]) <= 3
        assert record["translation"] == record["n_best"][0]["text"]
        assert {"lm", "phrase_fwd", "distortion"} <= set(record["n_best"][0]["features"])
        assert record["n_best"][0]["alignment"]


def test_translate_names_a_model_that_does_not_load(tmp_path):
    completed = run_translate(tmp_path / "missing-model", stdin=b"x\n")
    assert completed.returncode == 2
    assert "missing-model" in completed.stderr.decode("utf-8")
    assert "Traceback" not in completed.stderr.decode("utf-8")
