"""`phrasework train` end to end on a toy corpus: extra LM text, the summary, refusing to overwrite."""

from __future__ import annotations

import pytest

from decoder.errors import DecoderError
from decoder.training import TrainingSettings, train_model
from decoder.translation_model import load_translation_model

# Invented toy data in the demo scenario's style.
PAIRS = [("open the folder", "abra la carpeta"), ("close the folder", "cierre la carpeta"),
         ("open the report", "abra el informe"), ("close the report", "cierre el informe")] * 3
EXTRA_TEXT = ["abra el panel", "cierre el panel de control", "abra la papelera"]


def write_toy(folder):
    (folder / "train.en").write_text("\n".join(s for s, _ in PAIRS) + "\n", encoding="utf-8")
    (folder / "train.es").write_text("\n".join(t for _, t in PAIRS) + "\n", encoding="utf-8")
    (folder / "extra.es").write_text("\n".join(EXTRA_TEXT) + "\n", encoding="utf-8")


def test_extra_lm_text_extends_the_language_model_but_not_the_phrase_table(tmp_path):
    write_toy(tmp_path)
    summary = train_model(tmp_path / "train.en", tmp_path / "train.es", "en", "es", tmp_path / "model",
                          lm_files=[tmp_path / "extra.es"], settings=TrainingSettings(lm_order=3))
    assert summary.statistics["lm_segments"] == len(PAIRS) + len(EXTRA_TEXT)
    assert [stage.name for stage in summary.stages] == ["read and tokenize", "word alignment", "phrase pairs",
                                                         "language model", "truecaser", "write model"]
    model = load_translation_model(tmp_path / "model")
    assert "papelera" in model.target_vocabulary  # only in the extra text
    word = model.target_vocabulary.id_of("papelera")
    log10_seen, _ = model.language_model.score(model.language_model.null_state(), word)
    log10_unseen, _ = model.language_model.score(model.language_model.null_state(), 0)
    assert log10_seen > log10_unseen  # a word of the extra text is more likely than <unk>
    assert not any(word in model.phrase_table.target_phrase(row) for row in range(len(model.phrase_table)))


def test_train_refuses_an_existing_directory_without_force(tmp_path):
    write_toy(tmp_path)
    (tmp_path / "model").mkdir()
    with pytest.raises(DecoderError, match="already exists"):
        train_model(tmp_path / "train.en", tmp_path / "train.es", "en", "es", tmp_path / "model")
