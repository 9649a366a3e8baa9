"""Reordering decisions on a toy model whose answer is known, and a comparison with nltk's stack decoder."""

from __future__ import annotations

import pytest

from bench.nltk_adapter import compare_with_nltk
from decoder.phrases.settings import PhraseSettings
from decoder.search.settings import SearchSettings, TranslationOptions
from decoder.search.translator import Translator
from decoder.training import TrainingSettings, train_model
from decoder.translation_model import load_translation_model
from tests.conftest import demo_segments

# Toy corpus in the demo scenario's vocabulary (invented): English adjective-noun, Spanish noun-adjective.
# With one-word phrases only, the decoder must reorder to produce the order the LM has seen; with distortion
# limit 0 it cannot, and must output the English order word by word.
TOY = [("the blue folder", "la carpeta azul"), ("the red folder", "la carpeta roja"),
       ("the blue report", "el informe azul"), ("the red report", "el informe rojo"),
       ("open the folder", "abra la carpeta"), ("open the report", "abra el informe"),
       ("the folder", "la carpeta"), ("the report", "el informe"), ("blue", "azul"), ("red", "rojo")] * 5


@pytest.fixture(scope="module")
def toy_translator(tmp_path_factory):
    folder = tmp_path_factory.mktemp("toy")
    (folder / "train.en").write_text("\n".join(s for s, _ in TOY) + "\n", encoding="utf-8")
    (folder / "train.es").write_text("\n".join(t for _, t in TOY) + "\n", encoding="utf-8")
    settings = TrainingSettings(phrases=PhraseSettings(max_phrase_length=1), lm_order=3)
    train_model(folder / "train.en", folder / "train.es", "en", "es", folder / "model", settings=settings)
    return Translator(load_translation_model(folder / "model"))


def test_the_best_reordering_is_found_when_the_distortion_limit_allows_it(toy_translator):
    reordered = toy_translator.translate(["Open the blue report"],
                                         TranslationOptions(include_segmentation=True))[0]
    assert reordered.translation == "Abra el informe azul"
    monotone = toy_translator.translate(["Open the blue report"],
                                        TranslationOptions(search=SearchSettings(distortion_limit=0)))[0]
    assert monotone.translation == "Abra el azul informe"
    # the reordered translation has the higher score under the model, so only the limit prevented it
    assert reordered.n_best[0].score > monotone.n_best[0].score
    spans = [phrase.source_tokens for phrase in reordered.n_best[0].segmentation]
    assert spans == [(0, 1), (1, 2), (3, 4), (2, 3)]


def test_our_best_score_is_at_least_nltks_under_the_same_model(demo_translator, capsys):
    # Reference library: nltk.translate.StackDecoder (nltk >= 3.8) searching with our options and LM (see
    # bench/nltk_adapter.py); its output is scored under our full model by forced decoding.
    segments = [segment for segment in demo_segments("test") if len(segment.split()) <= 6][:8]
    comparison = compare_with_nltk(demo_translator, segments)
    with capsys.disabled():
        print(f"\nmean model score: ours {comparison['ours_score']:.4f}, nltk {comparison['nltk_score']:.4f} "
              f"({comparison['scored']} segments)")
    assert comparison["scored"] >= 6
    assert comparison["at_least_as_good"] == comparison["scored"]
