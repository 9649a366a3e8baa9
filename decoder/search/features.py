"""The log-linear model's feature names, their order, and the untuned default weights.

A translation's model score is ``sum(weights[f] * features[f])`` (higher is better). Feature values are natural
logarithms of probabilities, or counts:

- ``phrase_fwd``, ``phrase_bwd``: log p(target phrase | source phrase) and log p(source | target), summed;
- ``lex_fwd``, ``lex_bwd``: log lexical weights (Koehn, Och & Marcu 2003), summed;
- ``phrase_count``: number of phrases; ``word_count``: number of output tokens;
- ``distortion``: minus the summed jump distance |start - previous end| (so a positive weight penalises jumps);
- six lexicalized-reordering features (Tillmann 2004; Koehn et al. 2005): the log probability of the
  orientation actually taken, in the feature of that orientation and direction;
- ``lm``: natural-log probability of the output under the n-gram model, sentence boundaries included;
- ``unknown_word``: number of source words passed through untranslated;
- ``glossary``: number of glossary terms translated by an allowed target (terminology in prefer and enforce modes).
"""

from __future__ import annotations

from collections.abc import Mapping

import numpy as np
import numpy.typing as npt

from decoder.errors import ConfigurationError
from decoder.phrases.reordering import REORDERING_FEATURE_NAMES

FEATURE_NAMES: tuple[str, ...] = (
    "phrase_fwd", "phrase_bwd", "lex_fwd", "lex_bwd", "phrase_count", "word_count", "distortion",
    *REORDERING_FEATURE_NAMES, "lm", "unknown_word", "glossary",
)
FEATURE_INDEX = {name: index for index, name in enumerate(FEATURE_NAMES)}
NUM_FEATURES = len(FEATURE_NAMES)

# Untuned starting point (common practice for phrase-based systems, rescaled to natural logs): translation
# model and reordering features share the weight, the LM gets more, a per-word bonus offsets the LM's
# preference for short output, unknown words are costly. The glossary weight (a count of terms translated
# by their glossary target, so it only matters under prefer) was chosen on the en-fr dev sample of
# bench/bench_terms.py: dev BLEU is flat between 1.5 and 2 and term accuracy higher at 2 (bench/RESULTS.md).
# Tuning (MERT, PRO) replaces them.
DEFAULT_WEIGHTS: dict[str, float] = {
    "phrase_fwd": 0.2, "phrase_bwd": 0.2, "lex_fwd": 0.2, "lex_bwd": 0.2, "phrase_count": -0.2,
    "word_count": 0.3, "distortion": 0.1, **dict.fromkeys(REORDERING_FEATURE_NAMES, 0.1),
    "lm": 0.5, "unknown_word": -1.0, "glossary": 2.0,
}


def weight_vector(
    weights: Mapping[str, float], overrides: Mapping[str, float] | None = None,
) -> npt.NDArray[np.float64]:
    """Weights in FEATURE_NAMES order: ``weights`` (a model's) updated by ``overrides`` (one call's)."""
    merged = dict(DEFAULT_WEIGHTS)
    for source in (weights, overrides or {}):
        unknown = set(source) - set(FEATURE_NAMES)
        if unknown:
            raise ConfigurationError(f"unknown feature name(s): {', '.join(sorted(unknown))}; "
                                     f"features are {', '.join(FEATURE_NAMES)}")
        merged.update({name: float(value) for name, value in source.items()})
    for name, value in merged.items():
        if not np.isfinite(value):
            raise ConfigurationError(f"weight of {name} must be a finite number")
    return np.array([merged[name] for name in FEATURE_NAMES], dtype=np.float64)


def feature_dict(values: npt.ArrayLike) -> dict[str, float]:
    return {name: float(value) for name, value in zip(FEATURE_NAMES, np.asarray(values, dtype=np.float64))}
