"""Evaluation: placeholder preservation by its definition, and `phrasework evaluate` end to end."""

from __future__ import annotations

import json
import subprocess
import sys

import pytest

from decoder.evaluation import placeholder_preservation
from tests.conftest import DEMO_CORPUS, REPO


@pytest.mark.parametrize(("source", "output", "kept"), [
    ("Saved %d files to %s.", "Se guardaron %d archivos en %s.", True),
    ("Saved %d files to %s.", "Se guardaron %s archivos en %d.", True),   # a multiset: order may change
    ("Saved %d files.", "Se guardaron archivos.", False),                 # one lost
    ("Open <b>{name}</b>", "Abra <b>{name}</b> <b>", False),              # one extra
    ("See https://example.com/a", "Vea https://example.com/b", False),     # not verbatim
])
def test_placeholder_preservation_counts_exact_multisets(source, output, kept):
    assert placeholder_preservation([source], [output], "en", "es") == (1.0 if kept else 0.0)


def test_evaluate_reports_scores_with_sacrebleu_signatures(demo_model_dir, tmp_path):
    sources = (DEMO_CORPUS / "test.en").read_text(encoding="utf-8").splitlines()[:20]
    references = (DEMO_CORPUS / "test.es").read_text(encoding="utf-8").splitlines()[:20]
    (tmp_path / "src").write_text("\n".join(sources) + "\n", encoding="utf-8")
    (tmp_path / "ref").write_text("\n".join(references) + "\n", encoding="utf-8")
    completed = subprocess.run([sys.executable, "-m", "decoder.cli", "evaluate", "--model", str(demo_model_dir),
                                "--source", str(tmp_path / "src"), "--reference", str(tmp_path / "ref"), "--json"],
                               capture_output=True, text=True, cwd=REPO, timeout=600)
    assert completed.returncode == 0, completed.stderr
    report = json.loads(completed.stdout)
    assert report["num_segments"] == 20
    assert report["bleu_signature"].startswith("nrefs:1|case:mixed") and "tok:13a" in report["bleu_signature"]
    assert "nc:6" in report["chrf_signature"]
    # the demo test set comes from the same invented grammar as its training data: high scores expected
    assert report["bleu"] > 50 and report["chrf"] > 70
    assert report["placeholder_preservation"] == 1.0
