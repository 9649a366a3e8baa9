"""The tuning loop: decode the dev set, pool the n-best lists, optimise the weights, repeat.

Iteration t decodes with weights w_t and measures dev BLEU of the 1-best outputs (the first entry of each n-best
list): that is the score of w_t. Its n-best lists join the pool; then, unless the loop stops, MERT or PRO over
the whole pool gives w_{t+1}. The loop stops when a decode adds no new entry to the pool (the optimiser would see
the same data again), when dev BLEU gains less than ``min_gain`` over the previous iteration, or after
``max_iterations`` decodes. The result keeps the weights of the best dev iteration, not the last ones.

The optimiser's weights (L1 norm 1) are decoded in the initial weights' units (``weights.in_initial_units``):
the same 1-best on the pool, but the search's absolute beam margin keeps its meaning, and features the dev set
never exercises (``glossary`` without a glossary) keep their initial weights.

The optimiser of iteration t is seeded with ``SeedSequence([seed, t])``: one seed reproduces the whole run.
"""

from __future__ import annotations

import time
from collections.abc import Sequence
from dataclasses import dataclass
from pathlib import Path

import numpy as np
import numpy.typing as npt
from tqdm import tqdm

from decoder import __version__
from decoder.errors import ConfigurationError
from decoder.tuning.bleu_statistics import ReferenceSet, Tokens, corpus_bleu
from decoder.tuning.mert import MertSettings, optimise_mert
from decoder.tuning.n_best_pool import DecodeFunction, NBestPool
from decoder.tuning.pro import ProSettings, optimise_pro
from decoder.tuning.weights import OptimiserResult, in_initial_units, varying_features

METHODS = ("mert", "pro")
STOP_NO_NEW_HYPOTHESES = "no_new_hypotheses"
STOP_CONVERGED = "converged"
STOP_MAX_ITERATIONS = "max_iterations"


@dataclass(frozen=True, slots=True)
class TuningSettings:
    method: str
    max_iterations: int
    n_best: int
    min_gain: float  # dev BLEU in [0, 1]
    feature_names: tuple[str, ...]
    optimiser: MertSettings | ProSettings


@dataclass(frozen=True, slots=True)
class IterationRecord:
    """One decode. ``weights``: the weights decoded with; ``dev_bleu`` in [0, 1] of their 1-best outputs;
    ``pool_bleu``: the optimiser's pool BLEU for the next weights (None if the loop stopped here)."""

    iteration: int
    dev_bleu: float
    weights: npt.NDArray[np.float64]
    num_pool_entries: int
    num_new_entries: int
    seconds: float  # wall clock of decode + pooling + optimisation
    pool_bleu: float | None = None


@dataclass(frozen=True, slots=True)
class TuningResult:
    history: tuple[IterationRecord, ...]
    best_iteration: int
    seed: int
    settings: TuningSettings
    stop_reason: str
    signature: str = ""

    @property
    def best_weights(self) -> npt.NDArray[np.float64]:
        """The weights of the iteration with the highest dev BLEU (the earliest among ties)."""
        return self.history[self.best_iteration].weights

    @property
    def best_dev_bleu(self) -> float:
        return self.history[self.best_iteration].dev_bleu


def _read_only(weights: npt.ArrayLike) -> npt.NDArray[np.float64]:
    array = np.array(weights, dtype=np.float64)
    array.flags.writeable = False
    return array


def tune(
    decode: DecodeFunction,
    references: Sequence[Sequence[Tokens]],
    feature_names: Sequence[str],
    initial_weights: npt.ArrayLike,
    method: str = "mert",
    max_iterations: int = 10,
    n_best: int = 100,
    seed: int = 0,
    min_gain: float = 1e-4,
    progress: bool = True,
    optimiser_settings: MertSettings | ProSettings | None = None,
) -> TuningResult:
    """Tune the weights of ``decode`` on a dev set; ``references[k]`` lists the reference token tuples of dev
    segment k (one or more), tokenized like the hypotheses the decoder returns.

    Returns the whole history and the best iteration (see the module docstring for the stopping rules)."""
    feature_names = tuple(feature_names)
    weights = initial = _read_only(initial_weights)
    settings = _check_settings(method, max_iterations, n_best, min_gain, feature_names, weights, optimiser_settings)
    reference_set = ReferenceSet(references)
    pool = NBestPool(reference_set, feature_names)
    history: list[IterationRecord] = []
    stop_reason = ""
    bar = tqdm(total=max_iterations, desc=f"tuning ({method})", unit="iteration", disable=not progress)
    try:
        for iteration in range(max_iterations):
            started = time.perf_counter()
            n_best_lists = decode(weights, n_best)
            num_new = pool.add(n_best_lists)  # checks the lists before they are used below
            one_best = [entries[0][0] for entries in n_best_lists]
            dev_bleu = corpus_bleu(reference_set.statistics(np.arange(len(one_best)), one_best))
            if iteration > 0 and num_new == 0:
                stop_reason = STOP_NO_NEW_HYPOTHESES
            elif iteration > 0 and dev_bleu - history[-1].dev_bleu < min_gain:
                stop_reason = STOP_CONVERGED
            elif iteration == max_iterations - 1:
                stop_reason = STOP_MAX_ITERATIONS
            else:
                stop_reason = ""
            optimised = None
            if not stop_reason:
                optimised = _optimise(pool, weights, settings, np.random.SeedSequence([seed, iteration]))
            seconds = time.perf_counter() - started
            pool_bleu = None if optimised is None else optimised.pool_bleu
            history.append(IterationRecord(iteration, dev_bleu, weights, len(pool), num_new, seconds, pool_bleu))
            bar.set_postfix_str(f"dev BLEU {100 * dev_bleu:.2f}, pool {len(pool)}", refresh=False)
            bar.update(1)
            if stop_reason:
                break
            arrays = pool.arrays()
            weights = _read_only(in_initial_units(optimised.weights, initial,
                                                  varying_features(arrays.features, arrays.offsets)))
    finally:
        bar.close()
    best_iteration = int(np.argmax([record.dev_bleu for record in history]))
    signature = (
        f"tune:{method}|iterations:{len(history)}|n_best:{n_best}|seed:{seed}"
        f"|bleu:4-gram,closest-ref,no-smoothing|v:{__version__}"
    )
    return TuningResult(tuple(history), best_iteration, seed, settings, stop_reason, signature)


def _check_settings(
    method: str,
    max_iterations: int,
    n_best: int,
    min_gain: float,
    feature_names: tuple[str, ...],
    weights: npt.NDArray[np.float64],
    optimiser_settings: MertSettings | ProSettings | None,
) -> TuningSettings:
    if method not in METHODS:
        raise ConfigurationError(f"unknown tuning method {method!r}; choose one of {', '.join(METHODS)}")
    if max_iterations < 1 or n_best < 1:
        raise ConfigurationError("max_iterations and n_best must be at least 1")
    if weights.shape != (len(feature_names),):
        raise ConfigurationError(f"{weights.size} initial weights for {len(feature_names)} features")
    if optimiser_settings is None:
        optimiser_settings = MertSettings() if method == "mert" else ProSettings()
    expected = MertSettings if method == "mert" else ProSettings
    if not isinstance(optimiser_settings, expected):
        raise ConfigurationError(
            f"method {method!r} takes {expected.__name__}, not {type(optimiser_settings).__name__}"
        )
    return TuningSettings(method, max_iterations, n_best, min_gain, feature_names, optimiser_settings)


def _optimise(
    pool: NBestPool, weights: npt.NDArray[np.float64], settings: TuningSettings, seed_sequence: np.random.SeedSequence
) -> OptimiserResult:
    seed = int(seed_sequence.generate_state(1)[0])
    if isinstance(settings.optimiser, MertSettings):
        return optimise_mert(pool.arrays(), weights, seed, settings.optimiser)
    return optimise_pro(pool.arrays(), weights, seed, settings.optimiser)


def plot_history(result: TuningResult, path: str | Path) -> Path:
    """Write a PNG of dev BLEU (x100) per iteration, the best iteration marked; returns the path written.

    Needs matplotlib, imported only here (an optional dependency: everything else works without it). Uses the
    object-oriented API, so no global backend is chosen and no window opens."""
    try:
        from matplotlib.figure import Figure
    except ImportError as error:
        raise ConfigurationError("plot_history needs matplotlib; install it to plot tuning runs") from error
    iterations = [record.iteration for record in result.history]
    scores = [100 * record.dev_bleu for record in result.history]
    figure = Figure(figsize=(6, 4))
    axes = figure.subplots()
    axes.plot(iterations, scores, marker="o", label="dev BLEU")
    axes.plot(
        [result.best_iteration],
        [100 * result.best_dev_bleu],
        marker="*",
        markersize=14,
        linestyle="none",
        label=f"best (iteration {result.best_iteration})",
    )
    axes.set_xlabel("iteration")
    axes.set_ylabel("BLEU")
    axes.set_title(f"tuning with {result.settings.method}, seed {result.seed}")
    axes.set_xticks(iterations)
    axes.legend()
    path = Path(path)
    figure.savefig(path, format="png", dpi=100)
    return path
