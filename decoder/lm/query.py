"""Compact read-only n-gram language model for decoding: flat numpy arrays, states are row numbers.

All n-grams of all orders share one row numbering: row 0 is the empty history, then the unigrams, then the
bigrams, and so on (``order_offsets[k]`` is the first row of order k). The lookup key of the row for ``h w``
is row(h) * vocabulary_size + w, with row(h) the global row of its context, so the keys of all orders form
one ascending int64 array (order k's contexts have larger rows than order k-1's), row 0 has key -1, and
each lookup is one binary search. This is the "context row * vocabulary size + word" layout of a sorted
trie, with the context numbered globally so that the context row is also the decoder's state.

A state is a row whose n-gram is the history. After a word, the new state is the longest suffix of
history + word that can still matter: one that is the context of a longer listed n-gram, or that carries a
non-zero back-off weight (only ARPA files of pruned models have such rows). Dropping the longer suffixes
changes no later probability: no listed n-gram extends them, so every later lookup backs off past them at
weight 1 (right-state minimisation in the style of Li & Khudanpur 2008, "A scalable decoding algorithm for
large-scale language models"; it lets the search recombine more hypotheses). The minimised state of every
row is precomputed (``state_rows``), so ``score`` does no search beyond the n-gram lookups themselves.

Word ids that are not unigrams of the model (and ids outside 0..vocabulary_size-1) are scored as ``<unk>``.
"""

from __future__ import annotations

import bisect
from collections.abc import Mapping, Sequence

import numpy as np
import numpy.typing as npt

from decoder.errors import ModelLoadError
from decoder.lm.ngram_model import NgramModel, complete_ngram_model
from decoder.vocabulary import SENTENCE_END_ID, SENTENCE_START_ID, UNKNOWN_ID

FORMAT_VERSION = 1
ARRAY_NAMES = (
    "header",
    "order_offsets",
    "keys",
    "log10_probs",
    "log10_backoffs",
    "suffix_rows",
    "state_rows",
    "word_rows",
)
NULL_STATE = 0


class LanguageModel:
    """Scores words given states; built with ``from_ngram_model`` or loaded with ``from_arrays``.

    Immutable after construction (all arrays may be read-only memory maps), so processes can share one copy."""

    __slots__ = (
        "order",
        "vocabulary_size",
        "_arrays",
        "_offsets",
        "_keys",
        "_probs",
        "_backoffs",
        "_suffix",
        "_state",
        "_words",
        "_begin_state",
    )

    def __init__(self, arrays: Mapping[str, npt.NDArray]) -> None:
        missing = [name for name in ARRAY_NAMES if name not in arrays]
        if missing:
            raise ModelLoadError(f"language model arrays missing: {', '.join(missing)}")
        header = np.asarray(arrays["header"])
        if header.shape != (3,) or int(header[0]) != FORMAT_VERSION:
            raise ModelLoadError(f"language model header {header.tolist()} is not format version {FORMAT_VERSION}")
        self.order = int(header[1])
        self.vocabulary_size = int(header[2])
        # Plain ndarray views: memmap subclass wrapping would slow every scalar call.
        self._arrays = {name: np.asarray(arrays[name]).view(np.ndarray) for name in ARRAY_NAMES}
        self._offsets = [int(value) for value in self._arrays["order_offsets"]]
        num_rows = len(self._arrays["keys"])
        if len(self._offsets) != self.order + 2 or self._offsets[-1] != num_rows:
            raise ModelLoadError("language model order_offsets do not match the number of rows")
        for name in ("log10_probs", "log10_backoffs", "suffix_rows", "state_rows"):
            if len(self._arrays[name]) != num_rows:
                raise ModelLoadError(
                    f"language model array {name} has {len(self._arrays[name])} rows, expected {num_rows}"
                )
        if len(self._arrays["word_rows"]) != self.vocabulary_size:
            raise ModelLoadError("language model word_rows does not have one entry per vocabulary id")
        self._keys = self._arrays["keys"]
        self._probs = self._arrays["log10_probs"]
        self._backoffs = self._arrays["log10_backoffs"]
        self._suffix = self._arrays["suffix_rows"]
        self._state = self._arrays["state_rows"]
        self._words = self._arrays["word_rows"]
        self._begin_state = int(self._state[self._words[SENTENCE_START_ID]])

    @classmethod
    def from_ngram_model(cls, model: NgramModel, probability_dtype: npt.DTypeLike = np.float32) -> LanguageModel:
        """Compile a back-off model (trained or read from ARPA). ``probability_dtype`` float32 halves memory;
        float64 keeps the model's values exactly (tests use it to check sums to 1e-9)."""
        return cls(build_arrays(model, probability_dtype))

    @classmethod
    def from_arrays(cls, arrays: Mapping[str, npt.NDArray]) -> LanguageModel:
        """Inverse of ``to_arrays``; the arrays are used as they are (no copy), e.g. ``np.load(..., mmap_mode="r")``."""
        return cls(arrays)

    def to_arrays(self) -> dict[str, npt.NDArray]:
        """Every array the model needs, by name (see ARRAY_NAMES), for saving as .npy files."""
        return dict(self._arrays)

    @property
    def num_rows(self) -> int:
        return self._offsets[-1]

    def begin_state(self) -> int:
        """State after ``<s>``: the start of every segment."""
        return self._begin_state

    def null_state(self) -> int:
        """The empty history, for context-free estimates (future costs, phrase scores out of context)."""
        return NULL_STATE

    def state_order(self, state: int) -> int:
        """Number of history words a state keeps (0 for the null state)."""
        return bisect.bisect_right(self._offsets, state) - 1

    def score(self, state: int, word_id: int) -> tuple[float, int]:
        """(log10 p(word | history of state), state after the word)."""
        word_row = int(self._words[word_id]) if 0 <= word_id < self.vocabulary_size else int(self._words[UNKNOWN_ID])
        word = int(self._keys[word_row])  # a unigram's key is its word id (<unk> for unlisted words)
        keys = self._keys
        vocabulary_size = self.vocabulary_size
        backoff = 0.0
        context = state
        row = word_row
        while context != NULL_STATE:
            key = context * vocabulary_size + word
            position = int(keys.searchsorted(key))
            if position < len(keys) and keys[position] == key:
                row = position
                break
            backoff += float(self._backoffs[context])
            context = int(self._suffix[context])
        return backoff + float(self._probs[row]), int(self._state[row])

    def score_many(
        self, states: npt.ArrayLike, word_ids: npt.ArrayLike
    ) -> tuple[npt.NDArray[np.float64], npt.NDArray[np.int64]]:
        """``score`` for many (state, word) pairs at once: (log10 probabilities, new states)."""
        states = np.asarray(states, dtype=np.int64).reshape(-1)
        word_ids = np.asarray(word_ids, dtype=np.int64).reshape(-1)
        if len(states) != len(word_ids):
            raise ValueError(f"{len(states)} states but {len(word_ids)} words")
        is_listed = (word_ids >= 0) & (word_ids < self.vocabulary_size)
        word_rows = self._words[np.where(is_listed, word_ids, UNKNOWN_ID)].astype(np.int64)
        words = self._keys[word_rows]
        rows = word_rows.copy()
        backoff = np.zeros(len(states))
        context = states.copy()
        active = np.flatnonzero(context != NULL_STATE)
        keys = self._keys
        while len(active):
            wanted = context[active] * self.vocabulary_size + words[active]
            position = np.minimum(np.searchsorted(keys, wanted), len(keys) - 1)
            is_found = keys[position] == wanted
            rows[active[is_found]] = position[is_found]
            backing_off = active[~is_found]
            backoff[backing_off] += self._backoffs[context[backing_off]]
            context[backing_off] = self._suffix[context[backing_off]]
            active = backing_off[context[backing_off] != NULL_STATE]
        return backoff + self._probs[rows], self._state[rows].astype(np.int64)

    def score_sentence(self, ids: Sequence[int] | npt.NDArray[np.integer], add_boundaries: bool = True) -> float:
        """Total log10 probability of a segment; with boundaries it starts after ``<s>`` and includes ``</s>``."""
        state = self._begin_state if add_boundaries else NULL_STATE
        total = 0.0
        for word in ids:
            log10_prob, state = self.score(state, int(word))
            total += log10_prob
        if add_boundaries:
            total += self.score(state, SENTENCE_END_ID)[0]
        return total

    def estimate(self, ids: Sequence[int] | npt.NDArray[np.integer]) -> float:
        """Context-free log10 estimate of a phrase: its first word as a unigram, the next with one word of
        history, and so on (the usual future-cost estimate of the language model part)."""
        return self.score_sentence(ids, add_boundaries=False)


def build_arrays(model: NgramModel, probability_dtype: npt.DTypeLike = np.float32) -> dict[str, npt.NDArray]:
    """The arrays of ``LanguageModel`` for a back-off model (closed under prefixes and suffixes first)."""
    model = complete_ngram_model(model)
    order, vocabulary_size = model.order, model.vocabulary_size
    sizes = [1] + [model.num_ngrams(k) for k in range(1, order + 1)]
    offsets = np.zeros(order + 2, dtype=np.int64)
    np.cumsum(sizes, out=offsets[1:])
    num_rows = int(offsets[-1])
    if num_rows * vocabulary_size >= 2**63:
        raise ValueError("language model too large for int64 keys")
    row_dtype = np.int32 if num_rows < 2**31 else np.int64
    local_keys = model.keys
    keys = [np.array([-1], dtype=np.int64)]
    suffixes = [np.zeros(1, dtype=np.int64)]
    for k in range(1, order + 1):
        grams = model.ngrams[k - 1]
        local_context = local_keys[k - 1] // vocabulary_size if k > 1 else np.zeros(len(grams), dtype=np.int64)
        keys.append((local_context + offsets[k - 1]) * vocabulary_size + grams[:, -1])
        if k == 1:
            suffixes.append(np.zeros(len(grams), dtype=np.int64))
        else:
            suffixes.append(model.suffix_rows(k) + offsets[k - 1])
    all_keys = np.concatenate(keys)
    suffix_rows = np.concatenate(suffixes)
    probs = np.concatenate([[0.0], *model.log10_probs])
    backoffs = np.concatenate([[0.0], *model.log10_backoffs])
    assert np.all(all_keys[1:] > all_keys[:-1]), "keys of a closed model are ascending by construction"

    # A row stays in the state if a longer n-gram extends it, or if its back-off weight is not 1.
    is_context = np.zeros(num_rows, dtype=bool)
    is_context[all_keys[int(offsets[2]) :] // vocabulary_size] = True
    keeps_state = is_context | (backoffs != 0.0)
    keeps_state[int(offsets[order]) :] = False  # highest-order n-grams are never a whole history
    keeps_state[0] = True
    state_rows = np.arange(num_rows, dtype=np.int64)
    for k in range(1, order + 1):  # a row's suffix has lower order, so its state is already final
        rows = slice(int(offsets[k]), int(offsets[k + 1]))
        state_rows[rows] = np.where(keeps_state[rows], state_rows[rows], state_rows[suffix_rows[rows]])

    unigram_words = model.ngrams[0][:, 0]
    unknown = np.searchsorted(unigram_words, UNKNOWN_ID)
    if unknown >= len(unigram_words) or unigram_words[unknown] != UNKNOWN_ID:
        raise ValueError("the model has no <unk> unigram, so unlisted words cannot be scored")
    word_rows = np.full(vocabulary_size, 1 + unknown, dtype=np.int64)
    word_rows[unigram_words] = 1 + np.arange(len(unigram_words))
    if not np.isin([SENTENCE_START_ID, SENTENCE_END_ID], unigram_words).all():
        raise ValueError("the model needs unigrams for <s> and </s>")
    return {
        "header": np.array([FORMAT_VERSION, order, vocabulary_size], dtype=np.int64),
        "order_offsets": offsets,
        "keys": all_keys,
        "log10_probs": probs.astype(probability_dtype),
        "log10_backoffs": backoffs.astype(probability_dtype),
        "suffix_rows": suffix_rows.astype(row_dtype),
        "state_rows": state_rows.astype(row_dtype),
        "word_rows": word_rows.astype(row_dtype),
    }
