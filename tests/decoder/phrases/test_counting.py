"""Sharded counting: map + merge and the spill path must give the counts of a single shard."""

from dataclasses import fields

import numpy as np
import pytest

from decoder.executor import LocalProcessExecutor, SerialExecutor
from decoder.phrases.counting import (
    CountAccumulator,
    count_phrase_pairs,
    load_counts,
    merge_counts,
    save_counts,
    slice_alignments,
)
from decoder.phrases.extraction import PhraseCounts, extract_shard
from decoder.phrases.settings import PhraseSettings

from .helpers import corpus_from_tokens, random_aligned_corpus


def assert_same_counts(actual: PhraseCounts, expected: PhraseCounts) -> None:
    for field in fields(PhraseCounts):
        np.testing.assert_array_equal(
            getattr(actual, field.name), getattr(expected, field.name), err_msg=field.name
        )


@pytest.fixture(scope="module")
def corpus_and_alignments():
    corpus, alignments, _ = random_aligned_corpus(np.random.default_rng(21), 200, vocabulary_size=6)
    return corpus, alignments


@pytest.fixture(scope="module")
def single_shard(corpus_and_alignments):
    # The expected value: one extraction over the whole corpus, no merge involved.
    corpus, alignments = corpus_and_alignments
    return extract_shard(corpus, alignments, PhraseSettings())


def test_merge_of_hand_made_parts():
    # By hand: "a b"/"A B" with links 0-0 1-1 gives pairs a/A, b/B, "a b"/"A B"; "a"/"A" alone gives a/A.
    # Merged: a/A twice, the others once; the phrase lists are the union.
    first_corpus, first_links, _, _ = corpus_from_tokens([("a b", "A B", [(0, 0), (1, 1)])])
    second_corpus, second_links, _, _ = corpus_from_tokens([("a", "A", [(0, 0)])])
    merged = merge_counts(
        [
            extract_shard(first_corpus, first_links, PhraseSettings()),
            extract_shard(second_corpus, second_links, PhraseSettings()),
        ]
    )
    # Vocabulary.build gives a and A id 4 (most frequent first), b and B id 5, in both small corpora.
    assert merged.source_phrases[:, :2].tolist() == [[4, -1], [4, 5], [5, -1]]
    pairs = {
        (tuple(merged.source_phrases[s][:2]), tuple(merged.target_phrases[t][:2])): int(count)
        for s, t, count in zip(merged.pair_source, merged.pair_target, merged.pair_counts, strict=True)
    }
    assert pairs == {((4, -1), (4, -1)): 2, ((4, 5), (4, 5)): 1, ((5, -1), (5, -1)): 1}


@pytest.mark.parametrize("segments_per_shard", [1, 7, 64])
def test_sharded_counts_equal_single_shard(corpus_and_alignments, single_shard, segments_per_shard):
    corpus, alignments = corpus_and_alignments
    settings = PhraseSettings(segments_per_shard=segments_per_shard)
    counts, num_spills = count_phrase_pairs(corpus, alignments, settings, SerialExecutor())
    assert num_spills == 0
    assert_same_counts(counts, single_shard)


def test_spill_path_equals_single_shard(corpus_and_alignments, single_shard, tmp_path):
    corpus, alignments = corpus_and_alignments
    settings = PhraseSettings(segments_per_shard=10, max_rows_in_memory=50, spill_dir=str(tmp_path))
    counts, num_spills = count_phrase_pairs(corpus, alignments, settings)
    assert num_spills >= 5  # 20 shards of some hundred rows each: the tiny limit forces many runs
    assert_same_counts(counts, single_shard)
    assert list(tmp_path.iterdir()) == []  # the temporary run directory is removed afterwards


def test_process_pool_equals_single_shard(corpus_and_alignments, single_shard):
    corpus, alignments = corpus_and_alignments
    with LocalProcessExecutor(2) as executor:
        counts, _ = count_phrase_pairs(corpus, alignments, PhraseSettings(segments_per_shard=30), executor)
    assert_same_counts(counts, single_shard)


def test_accumulator_spills_every_add_with_limit_one(corpus_and_alignments, single_shard, tmp_path):
    corpus, alignments = corpus_and_alignments
    with CountAccumulator(7, max_rows_in_memory=1, spill_dir=tmp_path) as accumulator:
        for start in range(0, len(corpus), 50):
            stop = min(start + 50, len(corpus))
            part = slice_alignments(alignments, start, stop)
            accumulator.add(extract_shard(corpus.slice(start, stop), part, PhraseSettings()))
        assert accumulator.num_spills == 4
        result = accumulator.result()
    assert_same_counts(result, single_shard)


def test_save_and_load_round_trip(single_shard, tmp_path):
    save_counts(single_shard, tmp_path / "run")
    assert_same_counts(load_counts(tmp_path / "run"), single_shard)
