"""`phrasework align` end to end on small files: one output line per input pair, always; clear errors."""

from __future__ import annotations

from decoder.align.links import parse_links
from decoder.cli import main

# A tiny corpus in the demo scenario's style (invented); line 3 is empty on the target side and must give an
# empty output line, line 4 is over the length limit given below.
SOURCE = ["Open the blue folder .", "Close the folder .", "Open the report .", "one two three four five six",
          "Close the blue report ."]
TARGET = ["Abra la carpeta azul .", "Cierre la carpeta .", "", "uno dos tres cuatro cinco seis",
          "Cierre el informe azul ."]


def write_corpus(tmp_path, source=SOURCE, target=TARGET):
    source_file, target_file = tmp_path / "train.en", tmp_path / "train.es"
    source_file.write_text("\n".join(source) + "\n", encoding="utf-8")
    target_file.write_text("\n".join(target) + "\n", encoding="utf-8")
    return source_file, target_file


def run_align(tmp_path, *extra):
    source_file, target_file = write_corpus(tmp_path)
    out = tmp_path / "train.align"
    status = main(["align", "--source-file", str(source_file), "--target-file", str(target_file),
                   "--source-lang", "en", "--target-lang", "es", "--out", str(out), "--workers", "1",
                   "--max-tokens", "5", *extra])
    return status, out


def test_align_writes_one_line_per_input_pair(tmp_path):
    status, out = run_align(tmp_path)
    assert status == 0
    lines = out.read_text(encoding="utf-8").split("\n")
    assert lines[-1] == "" and len(lines) - 1 == len(SOURCE)
    assert lines[2] == "" and lines[3] == ""  # dropped: empty target; too long
    for line, source, target in zip(lines, SOURCE, TARGET):
        for i, j in parse_links(line):
            assert i < len(source.split()) and j < len(target.split())
    # The final full stop of every kept pair is the last token on both sides and must align to itself.
    for number in (0, 1, 4):
        last_source, last_target = len(SOURCE[number].split()) - 1, len(TARGET[number].split()) - 1
        assert (last_source, last_target) in parse_links(lines[number])


def test_align_reports_a_file_that_ends_early(tmp_path, capsys):
    source_file, target_file = write_corpus(tmp_path, SOURCE, TARGET[:3])
    status = main(["align", "--source-file", str(source_file), "--target-file", str(target_file),
                   "--out", str(tmp_path / "out.align"), "--workers", "1"])
    assert status == 2
    error = capsys.readouterr().err
    assert "train.es" in error and "line 3" in error and "Traceback" not in error
    assert not (tmp_path / "out.align").exists()


def test_align_summary_counts_dropped_pairs_by_reason(tmp_path, capsys):
    status, _ = run_align(tmp_path)
    assert status == 0
    summary = capsys.readouterr().err
    assert "pairs read: 5" in summary
    assert "empty_target): 1" in summary and "too_long): 1" in summary
