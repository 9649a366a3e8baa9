"""Tuning the demo model end to end (slow: many decodes of the dev set)."""

from __future__ import annotations

import json
import shutil

import pytest

from decoder.evaluation import evaluate_model
from decoder.tuning.model_tuning import tune_model
from tests.conftest import DEMO_CORPUS


@pytest.mark.slow
def test_tuning_raises_dev_bleu_and_keeps_test_bleu(demo_model_dir, tmp_path):
    model_dir = tmp_path / "model"
    shutil.copytree(demo_model_dir, model_dir)
    dev_sources = (DEMO_CORPUS / "dev.en").read_text(encoding="utf-8").splitlines()[:100]
    dev_references = (DEMO_CORPUS / "dev.es").read_text(encoding="utf-8").splitlines()[:100]
    test_sources = (DEMO_CORPUS / "test.en").read_text(encoding="utf-8").splitlines()[:100]
    test_references = (DEMO_CORPUS / "test.es").read_text(encoding="utf-8").splitlines()[:100]
    before = evaluate_model(model_dir, test_sources, test_references, workers=2).bleu
    result, plot = tune_model(model_dir, dev_sources, dev_references, max_iterations=3, n_best=20, workers=2)
    after = evaluate_model(model_dir, test_sources, test_references, workers=2).bleu
    assert result.best_dev_bleu >= result.history[0].dev_bleu
    assert after >= before - 1.0  # one BLEU point: the noise level of a 100-segment test set (common practice)
    manifest = json.loads((model_dir / "manifest.json").read_text(encoding="utf-8"))
    assert manifest["tuning_history"][-1]["dev_bleu"][0] == pytest.approx(100 * result.history[0].dev_bleu, abs=1e-3)
    assert plot.exists() and plot.stat().st_size > 1000
