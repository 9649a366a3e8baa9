"""Small builders shared by the phrase tests: corpora from token lists and random aligned corpora."""

import numpy as np

from decoder.align.links import AlignmentArray
from decoder.segment_arrays import ParallelArrays, SegmentArray
from decoder.vocabulary import Vocabulary


def corpus_from_tokens(pairs):
    """(ParallelArrays, AlignmentArray, source Vocabulary, target Vocabulary) from (source, target, links)."""
    source_vocabulary = Vocabulary.build(source.split() for source, _, _ in pairs)
    target_vocabulary = Vocabulary.build(target.split() for _, target, _ in pairs)
    corpus = ParallelArrays(
        SegmentArray.from_sequences(source_vocabulary.encode(source.split()) for source, _, _ in pairs),
        SegmentArray.from_sequences(target_vocabulary.encode(target.split()) for _, target, _ in pairs),
    )
    alignments = AlignmentArray.from_link_sets(links for _, _, links in pairs)
    return corpus, alignments, source_vocabulary, target_vocabulary


def random_aligned_corpus(rng, num_segments, max_length=9, vocabulary_size=12):
    """Random segments (ids from a small vocabulary so that phrases repeat) with random sparse alignments."""
    sources, targets, link_sets = [], [], []
    for _ in range(num_segments):
        num_source, num_target = rng.integers(1, max_length + 1, 2)
        density = rng.uniform(0.05, 0.4)
        grid = rng.random((num_source, num_target)) < density
        sources.append(rng.integers(4, 4 + vocabulary_size, num_source))
        targets.append(rng.integers(4, 4 + vocabulary_size, num_target))
        link_sets.append([(int(i), int(j)) for i, j in zip(*np.nonzero(grid), strict=True)])
    corpus = ParallelArrays(SegmentArray.from_sequences(sources), SegmentArray.from_sequences(targets))
    return corpus, AlignmentArray.from_link_sets(link_sets), link_sets
