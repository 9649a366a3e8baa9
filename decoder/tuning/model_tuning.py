"""`phrasework tune`: tune a model's weights on a dev set and store them in its manifest.

The decode step translates the dev set with the current weights (n-best lists, in parallel over the executor's
workers); the n-best texts are tokenized with the model's target-language tokenizer, as are the references, so
BLEU counts the same tokens on both sides. At the end the best weights go into manifest.json with the previous
weights and a history entry (date, method, seed, settings, dev BLEU per iteration); a PNG of dev BLEU per
iteration is written next to it. Until that single atomic manifest update, the model is untouched.
"""

from __future__ import annotations

import datetime as dt
from collections.abc import Sequence
from dataclasses import asdict
from pathlib import Path

import numpy as np

from decoder.batch_translation import translate_all, use_translator
from decoder.executor import make_executor
from decoder.search.features import FEATURE_NAMES, feature_dict
from decoder.search.settings import TranslationOptions
from decoder.search.translator import Translator
from decoder.text.tokenizer import tokenize
from decoder.translation_model import load_translation_model, update_manifest
from decoder.tuning.loop import TuningResult, plot_history, tune


def bleu_tokens(text: str, language: str) -> tuple[str, ...]:
    return tuple(token.text for token in tokenize(text, language))


def tune_model(
    model_dir: str | Path, dev_sources: Sequence[str], dev_references: Sequence[str], *, method: str = "mert",
    max_iterations: int = 10, n_best: int = 100, workers: int = 1, seed: int = 0, show_progress: bool = False,
) -> tuple[TuningResult, Path]:
    """Tune, write the best weights into the manifest, and return the result and the plot's path."""
    if len(dev_sources) != len(dev_references):
        raise ValueError(f"{len(dev_sources)} dev sources but {len(dev_references)} references")
    model = load_translation_model(model_dir)
    translator = Translator(model)
    language = model.target_language
    references = [[bleu_tokens(reference, language)] for reference in dev_references]
    use_translator(translator)
    executor = make_executor(workers)

    def decode(weights: np.ndarray, size: int):
        options = TranslationOptions(n_best=size, weights=feature_dict(weights))
        results = translate_all(list(dev_sources), options, executor)
        return [[(bleu_tokens(entry.text, language), np.array([entry.features[name] for name in FEATURE_NAMES]))
                 for entry in result.n_best] for result in results]

    initial = translator.weights()
    try:
        result = tune(decode, references, FEATURE_NAMES, initial, method=method, max_iterations=max_iterations,
                      n_best=n_best, seed=seed, progress=show_progress)
    finally:
        executor.close()
    plot_path = plot_history(result, Path(model_dir) / "tuning.png")
    history = list(model.manifest.get("tuning_history", []))
    history.append({
        "date": dt.datetime.now(dt.UTC).isoformat(timespec="seconds"), "method": method, "seed": seed,
        "n_best": n_best, "max_iterations": max_iterations, "num_dev_segments": len(dev_sources),
        "stop_reason": result.stop_reason, "best_iteration": result.best_iteration + 1,
        "dev_bleu": [round(100 * record.dev_bleu, 4) for record in result.history],
        "previous_weights": model.weights, "signature": result.signature,
        "optimiser": {key: value for key, value in asdict(result.settings.optimiser).items()},
    })
    update_manifest(model_dir, {"weights": feature_dict(result.best_weights), "tuning_history": history})
    return result, plot_path
