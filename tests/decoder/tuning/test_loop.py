"""The tuning loop, driven by a small stand-in decoder that picks from fixed candidate lists by the weights.

The stand-in is a legitimate decoder for the loop's contract (weights in, ranked n-best lists with feature vectors
out); dev BLEU values are checked against sacrebleu on the stand-in's own 1-best outputs."""

from __future__ import annotations

import numpy as np
import pytest
import sacrebleu

from decoder.errors import ConfigurationError
from decoder.tuning.loop import STOP_CONVERGED, STOP_NO_NEW_HYPOTHESES, plot_history, tune
from decoder.tuning.mert import MertSettings
from decoder.tuning.n_best_pool import NBestFormatError

FEATURE_NAMES = ("quality_hint", "noise", "misleading", "length")
# Quality is rewarded by feature 0 and punished by feature 2; the initial weights trust the wrong two features.
BAD_WEIGHTS = np.array([0.0, 1.0, 1.0, 0.0])
FAST_MERT = MertSettings(num_random_directions=2, num_restarts=1)


class CandidateDecoder:
    """Per segment a fixed list of (tokens, features); decoding ranks it by weights @ features (stable ties).

    The vocabulary is that of the fictional "Lumenrail" ticket kiosk; references are random strings of it."""

    def __init__(self, seed=3, num_segments=25, num_candidates=12):
        generator = np.random.default_rng(seed)
        words = [f"kiosk{k}" for k in range(40)]
        self.references, self.candidates = [], []
        for _ in range(num_segments):
            reference = tuple(generator.choice(words, generator.integers(8, 16)))
            self.references.append([reference])
            segment = []
            for _ in range(num_candidates):
                error_rate = generator.uniform(0.0, 0.8)
                tokens = tuple(
                    w if generator.random() > error_rate else str(generator.choice(words)) for w in reference
                )
                features = np.array(
                    [
                        -error_rate + generator.normal(0, 0.1),
                        generator.normal(),
                        error_rate + generator.normal(0, 0.3),
                        generator.normal(),
                    ]
                )
                segment.append((tokens, features))
            self.candidates.append(segment)
        self.calls = []  # (weights, 1-best token tuples) per call

    def ranked(self, weights):
        out = []
        for segment in self.candidates:
            scores = np.array([features @ weights for _, features in segment])
            out.append([segment[k] for k in np.argsort(-scores, kind="stable")])
        return out

    def __call__(self, weights, n_best):
        lists = [ranked[:n_best] for ranked in self.ranked(weights)]
        self.calls.append((np.array(weights), [entries[0][0] for entries in lists]))
        return lists

    def reference_bleu(self, one_best):
        """Dev BLEU in [0, 1] by sacrebleu (reference library), unsmoothed like the tuner's."""
        streams = [[" ".join(references[0]) for references in self.references]]
        score = sacrebleu.corpus_bleu(
            [" ".join(tokens) for tokens in one_best], streams, tokenize="none", force=True, smooth_method="none"
        )
        return score.score / 100


@pytest.mark.parametrize("method", ["mert", "pro"])
def test_tuning_raises_dev_bleu_over_the_initial_weights(method):
    decoder = CandidateDecoder()
    settings = FAST_MERT if method == "mert" else None
    result = tune(
        decoder,
        decoder.references,
        FEATURE_NAMES,
        BAD_WEIGHTS,
        method=method,
        n_best=3,
        progress=False,
        min_gain=-1.0,
        optimiser_settings=settings,
    )
    initial = decoder.reference_bleu(decoder.calls[0][1])
    assert result.history[0].dev_bleu == pytest.approx(initial, abs=1e-12)  # sacrebleu on the same outputs
    # Common practice, not a published number: on this easy toy set tuning should gain well over 20 BLEU points.
    assert result.best_dev_bleu > initial + 0.2
    best_one_best = [ranked[0][0] for ranked in decoder.ranked(result.best_weights)]
    assert result.best_dev_bleu == pytest.approx(decoder.reference_bleu(best_one_best), abs=1e-12)


def test_tuning_stops_when_no_new_hypotheses_arrive():
    # By hand: n_best = 12 returns every candidate on the first decode, so the second decode adds nothing.
    decoder = CandidateDecoder()
    result = tune(
        decoder,
        decoder.references,
        FEATURE_NAMES,
        BAD_WEIGHTS,
        n_best=12,
        progress=False,
        min_gain=-1.0,
        optimiser_settings=FAST_MERT,
    )
    assert result.stop_reason == STOP_NO_NEW_HYPOTHESES
    assert [record.num_new_entries for record in result.history] == [25 * 12, 0]
    assert result.history[-1].num_pool_entries == 25 * 12


def test_tuning_stops_when_the_gain_is_too_small():
    # By hand: a gain of at least 1.0 in BLEU [0, 1] is impossible after the first iteration's nonzero BLEU.
    decoder = CandidateDecoder()
    result = tune(
        decoder,
        decoder.references,
        FEATURE_NAMES,
        BAD_WEIGHTS,
        n_best=3,
        progress=False,
        min_gain=1.0,
        optimiser_settings=FAST_MERT,
    )
    assert result.stop_reason == STOP_CONVERGED
    assert len(result.history) == 2


class DecoderWithSearchErrorOnThirdCall(CandidateDecoder):
    """Like CandidateDecoder, but its third decode returns the worst candidates first (a search error)."""

    def __call__(self, weights, n_best):
        if len(self.calls) != 2:
            return super().__call__(weights, n_best)
        lists = [ranked[::-1][:n_best] for ranked in self.ranked(weights)]
        self.calls.append((np.array(weights), [entries[0][0] for entries in lists]))
        return lists


def test_tuning_keeps_the_best_iteration_not_the_last():
    decoder = DecoderWithSearchErrorOnThirdCall()
    result = tune(
        decoder,
        decoder.references,
        FEATURE_NAMES,
        BAD_WEIGHTS,
        n_best=3,
        max_iterations=3,
        progress=False,
        min_gain=-1.0,
        optimiser_settings=FAST_MERT,
    )
    scores = [decoder.reference_bleu(one_best) for _, one_best in decoder.calls]  # sacrebleu, per decode
    assert len(scores) == len(result.history) == 3
    assert scores[2] < max(scores)  # the search error on the last decode did cost BLEU (guards the test)
    assert result.best_iteration == int(np.argmax(scores))
    assert np.array_equal(result.best_weights, decoder.calls[result.best_iteration][0])
    assert [record.dev_bleu for record in result.history] == pytest.approx(scores, abs=1e-12)


@pytest.mark.parametrize("method", ["mert", "pro"])
def test_tuning_is_reproducible_with_the_same_seed(method):
    runs = []
    for _ in range(2):
        decoder = CandidateDecoder()
        settings = FAST_MERT if method == "mert" else None
        runs.append(
            tune(
                decoder,
                decoder.references,
                FEATURE_NAMES,
                BAD_WEIGHTS,
                method=method,
                n_best=3,
                seed=17,
                progress=False,
                min_gain=-1.0,
                max_iterations=3,
                optimiser_settings=settings,
            )
        )
    first, second = runs
    assert first.seed == second.seed == 17
    for one, other in zip(first.history, second.history, strict=True):
        assert np.array_equal(one.weights, other.weights)
        assert one.dev_bleu == other.dev_bleu


def test_progress_bar_reports_dev_bleu(capsys):
    decoder = CandidateDecoder(num_segments=5)
    tune(
        decoder,
        decoder.references,
        FEATURE_NAMES,
        BAD_WEIGHTS,
        n_best=3,
        max_iterations=2,
        progress=True,
        optimiser_settings=FAST_MERT,
    )
    assert "dev BLEU" in capsys.readouterr().err


def test_plot_history_writes_a_png(tmp_path):
    pytest.importorskip("matplotlib")
    decoder = CandidateDecoder(num_segments=5)
    result = tune(
        decoder,
        decoder.references,
        FEATURE_NAMES,
        BAD_WEIGHTS,
        n_best=3,
        max_iterations=2,
        progress=False,
        optimiser_settings=FAST_MERT,
    )
    path = plot_history(result, tmp_path / "history.png")
    assert path.read_bytes()[:8] == b"\x89PNG\r\n\x1a\n"  # the PNG signature (PNG specification, section 5.2)


def test_bad_settings_and_bad_decoder_output_are_refused():
    decoder = CandidateDecoder(num_segments=3)
    with pytest.raises(ConfigurationError, match="unknown tuning method 'powell'"):
        tune(decoder, decoder.references, FEATURE_NAMES, BAD_WEIGHTS, method="powell", progress=False)
    with pytest.raises(ConfigurationError, match="3 initial weights for 4 features"):
        tune(decoder, decoder.references, FEATURE_NAMES, BAD_WEIGHTS[:3], progress=False)

    def short_decoder(weights, n_best):
        return decoder(weights, n_best)[:2]

    with pytest.raises(NBestFormatError, match="2 n-best lists for 3 dev segments"):
        tune(short_decoder, decoder.references, FEATURE_NAMES, BAD_WEIGHTS, progress=False)


class DecoderWithIdleFeature(CandidateDecoder):
    """Like CandidateDecoder, with a fifth feature that is 0 on every entry (``glossary`` on a dev set decoded
    without a glossary): tuning can learn nothing about it."""

    def __init__(self):
        super().__init__()
        self.candidates = [[(tokens, np.append(features, 0.0)) for tokens, features in segment]
                           for segment in self.candidates]


@pytest.mark.parametrize("method", ["mert", "pro"])
def test_tuned_weights_stay_in_the_initial_units(method):
    # The search's beam margin is absolute, so weights are decoded at the initial scale (the 1-best on the pool is
    # scale-free: any positive factor gives the same ranking), and an idle feature keeps its initial weight
    # instead of PRO's shrinkage to 0 or a share of MERT's L1 norm.
    decoder = DecoderWithIdleFeature()
    initial = np.append(BAD_WEIGHTS, 0.7)
    result = tune(decoder, decoder.references, (*FEATURE_NAMES, "idle"), initial, method=method, n_best=3,
                  max_iterations=3, progress=False, min_gain=-1.0,
                  optimiser_settings=FAST_MERT if method == "mert" else None)
    assert len(result.history) == 3
    for record in result.history[1:]:
        assert record.weights[4] == 0.7
        assert np.abs(record.weights[:4]).sum() == pytest.approx(np.abs(BAD_WEIGHTS).sum(), abs=1e-12)
    assert not np.array_equal(result.history[1].weights[:4], BAD_WEIGHTS)  # tuning did move the others
    # The optimiser's pool BLEU after the first decode (top 3 per segment under the initial weights) is exactly
    # the sacrebleu BLEU of the rescaled weights' 1-best among those pool entries: rescaling lost nothing.
    weights = result.history[1].weights
    pool = [ranked[:3] for ranked in decoder.ranked(initial)]
    one_best = [max(entries, key=lambda entry: entry[1] @ weights)[0] for entries in pool]
    assert result.history[0].pool_bleu == pytest.approx(decoder.reference_bleu(one_best), abs=1e-12)
