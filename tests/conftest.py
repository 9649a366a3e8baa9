"""Shared fixtures. Module-specific fixtures live in the test modules that use them.

``demo_model`` trains the demo scenario model (demo_models/corpus, invented data) once per test session, with
the same defaults as ``phrasework train``; the decoder and service tests translate with it."""

from __future__ import annotations

from pathlib import Path

import pytest

from decoder.search.translator import Translator
from decoder.training import TrainingSettings, train_model
from decoder.translation_model import load_translation_model

REPO = Path(__file__).resolve().parent.parent
DEMO_CORPUS = REPO / "demo_models" / "corpus"


@pytest.fixture(scope="session")
def demo_model_dir(tmp_path_factory) -> Path:
    out = tmp_path_factory.mktemp("models") / "demo-en-es"
    train_model(DEMO_CORPUS / "train.en", DEMO_CORPUS / "train.es", "en", "es", out,
                settings=TrainingSettings(workers=2))
    return out


@pytest.fixture(scope="session")
def demo_model(demo_model_dir):
    return load_translation_model(demo_model_dir)


@pytest.fixture(scope="session")
def demo_translator(demo_model) -> Translator:
    return Translator(demo_model)


def demo_segments(split: str, limit: int | None = None) -> list[str]:
    lines = (DEMO_CORPUS / f"{split}.en").read_text(encoding="utf-8").splitlines()
    return lines[:limit] if limit is not None else lines
