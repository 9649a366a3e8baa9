"""The demo model: loading verifies checksums, and the phrase table knows the demo scenario's product terms."""

from __future__ import annotations

import shutil
import subprocess
import sys

import numpy as np
import pytest

from decoder.errors import ModelLoadError
from decoder.translation_model import load_translation_model
from tests.conftest import REPO


def test_loading_names_an_array_file_whose_checksum_is_wrong(demo_model_dir, tmp_path):
    copy = tmp_path / "model"
    shutil.copytree(demo_model_dir, copy)
    victim = copy / "phrases.scores.npy"
    data = bytearray(victim.read_bytes())
    data[-1] ^= 0xFF  # flip the last byte of the array data, not the header
    victim.write_bytes(bytes(data))
    with pytest.raises(ModelLoadError, match="phrases.scores.npy"):
        load_translation_model(copy)
    assert isinstance(load_translation_model(copy, verify=False).phrase_table.scores, np.ndarray)


# The demo glossary (glossaries/demo.tsv) gives the intended Spanish of these invented product terms; the
# corpus uses them consistently, so the best-scored translation of each source phrase must contain it (Spanish
# may add an article: "quick capture" -> "la captura rápida").
@pytest.mark.parametrize(("source", "target"), [("sync hub", "centro de sincronización"),
                                                ("workspace", "espacio de trabajo"),
                                                ("quick capture", "captura rápida")])
def test_phrases_command_shows_the_product_terms(demo_model_dir, source, target):
    completed = subprocess.run([sys.executable, "-m", "decoder.cli", "phrases", str(demo_model_dir), "--source",
                                source, "--limit", "3"], capture_output=True, text=True, cwd=REPO, timeout=120)
    assert completed.returncode == 0, completed.stderr
    header, best, *_ = completed.stdout.splitlines()
    assert header.split("\t")[:3] == ["target", "phrase_fwd", "phrase_bwd"]
    assert target in best.split("\t")[0]
