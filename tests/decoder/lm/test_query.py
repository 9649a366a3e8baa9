"""The compact query structure: agreement with the dict-based reference (reference_kneser_ney.py), right-state
minimisation, the batch path, and storage as arrays."""

from __future__ import annotations

import math

import numpy as np
import pytest

from decoder.errors import ModelLoadError
from decoder.lm.counts import count_ngrams
from decoder.lm.kneser_ney import estimate_kneser_ney, train_kneser_ney
from decoder.lm.query import ARRAY_NAMES, LanguageModel

from .lm_helpers import HAND_SEGMENTS, PRESS, START_WORD, as_segment_array, random_segments
from .reference_kneser_ney import ReferenceKneserNey

UNK, BOS, EOS, NULL = 0, 1, 2, 3
VOCABULARY_SIZE = 12
FLOAT32_LOG10_TOLERANCE = 1e-5  # float32 keeps ~7 significant digits of log10 values of magnitude < 10


def build(seed, order, probability_dtype=np.float32):
    segments = random_segments(seed, 40, VOCABULARY_SIZE, 9)
    model = train_kneser_ney(as_segment_array(segments), VOCABULARY_SIZE, order=order)
    return segments, model, LanguageModel.from_ngram_model(model, probability_dtype=probability_dtype)


def sample_sequences(segments, seed, count=25):
    """Training segments (seen n-grams) and random ones (mostly unseen n-grams)."""
    rng = np.random.default_rng(seed)
    return segments[:count] + [
        rng.integers(4, VOCABULARY_SIZE, int(rng.integers(1, 10))).tolist() for _ in range(count)
    ]


def state_words(language_model, model, state):
    """The history words a state stands for, decoded from the row numbering (row 0 = empty history)."""
    offsets = language_model.to_arrays()["order_offsets"]
    k = language_model.state_order(state)
    return () if k == 0 else tuple(model.ngrams[k - 1][state - offsets[k]].tolist())


def full_history_state(language_model, model, history):
    """The row of the longest listed suffix of the last order-1 words, without any minimisation."""
    offsets = language_model.to_arrays()["order_offsets"]
    history = list(history)[-(model.order - 1) :] if model.order > 1 else []
    for start in range(len(history)):
        row = model.rows_of(np.array([history[start:]], dtype=np.int64))[0]
        if row >= 0:
            return int(offsets[len(history) - start] + row)
    return language_model.null_state()


@pytest.mark.parametrize(("seed", "order"), [(20, 1), (21, 2), (22, 3), (23, 4), (24, 5)])
@pytest.mark.parametrize("probability_dtype", [np.float32, np.float64])
def test_scores_match_reference_with_full_history(seed, order, probability_dtype):
    segments, _, language_model = build(seed, order, probability_dtype)
    reference = ReferenceKneserNey(segments, VOCABULARY_SIZE, order)
    tolerance = FLOAT32_LOG10_TOLERANCE if probability_dtype == np.float32 else 1e-10
    for sequence in sample_sequences(segments, seed):
        history = [BOS]
        state = language_model.begin_state()
        expected_total = 0.0
        for word in [*sequence, EOS]:
            log10_prob, state = language_model.score(state, word)
            expected = math.log10(reference.probability(word, history))
            assert log10_prob == pytest.approx(expected, abs=tolerance)
            expected_total += expected
            history.append(word)
        assert language_model.score_sentence(sequence) == pytest.approx(expected_total, abs=tolerance * len(history))
        # Context-free estimate: the first word as a unigram, the next with one word of history, ...
        expected_estimate = sum(
            math.log10(reference.probability(word, sequence[:i])) for i, word in enumerate(sequence)
        )
        assert language_model.estimate(sequence) == pytest.approx(expected_estimate, abs=tolerance * len(sequence))


@pytest.mark.parametrize(("seed", "order"), [(30, 2), (31, 3), (32, 4), (33, 5)])
def test_full_history_state_gives_the_same_scores(seed, order):
    segments, model, language_model = build(seed, order)
    rng = np.random.default_rng(seed)
    for sequence in sample_sequences(segments, seed):
        history = [BOS]
        state = language_model.begin_state()
        for word in [*sequence, *rng.integers(4, VOCABULARY_SIZE, 3).tolist(), EOS]:
            full_state = full_history_state(language_model, model, history)
            log10_prob, state = language_model.score(state, word)
            assert language_model.score(full_state, word)[0] == log10_prob  # exactly: only zeros are skipped
            history.append(word)


@pytest.mark.parametrize(("seed", "order"), [(40, 3), (41, 4), (42, 5)])
def test_states_are_the_longest_extendable_suffix(seed, order):
    # Brute force from the reference's tables: a suffix can be extended iff it is the context of a listed
    # n-gram one word longer (reference.extensions[len(suffix)] is keyed by such contexts).
    segments, model, language_model = build(seed, order)
    reference = ReferenceKneserNey(segments, VOCABULARY_SIZE, order)
    num_shortened = 0
    for sequence in sample_sequences(segments, seed):
        history = [BOS]
        state = language_model.begin_state()
        for word in [*sequence, EOS]:
            state = language_model.score(state, word)[1]
            history.append(word)
            window = tuple(history[-(order - 1) :])
            expected = next(
                (
                    window[start:]
                    for start in range(len(window))
                    if window[start:] in reference.extensions[len(window) - start]
                ),
                (),
            )
            assert state_words(language_model, model, state) == expected
            num_shortened += len(expected) < len(window)
    assert num_shortened > 0  # the corpora do exercise minimisation


@pytest.mark.parametrize(("seed", "order"), [(50, 3), (51, 4), (52, 5)])
def test_equal_states_have_equal_futures(seed, order):
    # Histories that end in the same state must get identical probabilities for every continuation, checked
    # with the reference's full-history probabilities, which know nothing about states.
    segments, _, language_model = build(seed, order)
    reference = ReferenceKneserNey(segments, VOCABULARY_SIZE, order)
    rng = np.random.default_rng(seed)
    histories_by_state: dict[int, list[list[int]]] = {}
    for sequence in sample_sequences(segments, seed, count=40):
        history = [BOS]
        state = language_model.begin_state()
        for word in sequence:
            state = language_model.score(state, word)[1]
            history.append(word)
            histories_by_state.setdefault(state, []).append(list(history))
    num_compared = 0
    for state, histories in histories_by_state.items():
        distinct = {tuple(history[-(order - 1) :]) for history in histories}
        if len(distinct) < 2:
            continue
        first, *others = sorted(distinct)
        for _ in range(3):
            continuation = [*rng.integers(4, VOCABULARY_SIZE, 2).tolist(), EOS]
            for other in others:
                for i, word in enumerate(continuation):
                    expected = reference.probability(word, first + tuple(continuation[:i]))
                    assert reference.probability(word, other + tuple(continuation[:i])) == pytest.approx(
                        expected, rel=1e-12
                    )
                num_compared += 1
            assert language_model.score(state, continuation[0])[0] == pytest.approx(
                math.log10(reference.probability(continuation[0], first)), abs=FLOAT32_LOG10_TOLERANCE
            )
    assert num_compared > 0


def test_hand_model_states():
    # Trigram model of HAND_SEGMENTS (derivation in test_kneser_ney.py). Nothing ever follows </s>, so after
    # "press start </s>" no history can matter: the null state. "<s> press" is the context of trigrams.
    model, _ = estimate_kneser_ney(count_ngrams(as_segment_array(HAND_SEGMENTS), 3), 8)
    language_model = LanguageModel.from_ngram_model(model, probability_dtype=np.float64)
    state = language_model.score(language_model.begin_state(), PRESS)[1]
    assert state_words(language_model, model, state) == (BOS, PRESS)
    state = language_model.score(state, START_WORD)[1]
    assert state_words(language_model, model, state) == (PRESS, START_WORD)
    assert language_model.score(state, EOS)[1] == language_model.null_state()
    # p3(start | <s> press) = 327/512 (hand derivation in test_kneser_ney.py).
    start_state = language_model.score(language_model.begin_state(), PRESS)[1]
    assert language_model.score(start_state, START_WORD)[0] == pytest.approx(math.log10(327 / 512), abs=1e-12)


def test_unlisted_word_ids_score_as_unknown():
    _, _, language_model = build(60, 3)
    state = language_model.begin_state()
    for word in (NULL, VOCABULARY_SIZE, VOCABULARY_SIZE + 50, -1):
        assert language_model.score(state, word) == language_model.score(state, UNK)


@pytest.mark.parametrize("order", [1, 3, 5])
def test_score_many_equals_score(order):
    _, _, language_model = build(70 + order, order)
    rng = np.random.default_rng(order)
    states = rng.integers(0, language_model.num_rows, 500)
    words = rng.integers(-2, VOCABULARY_SIZE + 3, 500)
    log10_probs, new_states = language_model.score_many(states, words)
    expected = [language_model.score(int(state), int(word)) for state, word in zip(states, words, strict=True)]
    np.testing.assert_array_equal(log10_probs, [value for value, _ in expected])
    np.testing.assert_array_equal(new_states, [value for _, value in expected])


def test_arrays_saved_and_memory_mapped_give_the_same_scores(tmp_path):
    _, _, language_model = build(80, 4)
    for name, array in language_model.to_arrays().items():
        np.save(tmp_path / f"{name}.npy", array)
    loaded = LanguageModel.from_arrays({name: np.load(tmp_path / f"{name}.npy", mmap_mode="r") for name in ARRAY_NAMES})
    assert not loaded.to_arrays()["keys"].flags.writeable  # still the read-only mapping, not a copy
    rng = np.random.default_rng(0)
    states = rng.integers(0, language_model.num_rows, 300)
    words = rng.integers(0, VOCABULARY_SIZE, 300)
    for left, right in zip(language_model.score_many(states, words), loaded.score_many(states, words), strict=True):
        np.testing.assert_array_equal(left, right)
    assert loaded.begin_state() == language_model.begin_state()
    assert loaded.score_sentence([5, 6, 7]) == language_model.score_sentence([5, 6, 7])


def test_loading_rejects_missing_arrays_and_unknown_versions():
    _, _, language_model = build(81, 2)
    arrays = language_model.to_arrays()
    with pytest.raises(ModelLoadError, match="missing: state_rows"):
        LanguageModel.from_arrays({name: array for name, array in arrays.items() if name != "state_rows"})
    with pytest.raises(ModelLoadError, match="format version"):
        LanguageModel.from_arrays({**arrays, "header": np.array([99, 2, VOCABULARY_SIZE])})
    with pytest.raises(ModelLoadError, match="log10_probs has"):
        LanguageModel.from_arrays({**arrays, "log10_probs": arrays["log10_probs"][:-1]})
