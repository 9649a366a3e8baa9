"""Build id-array corpora from whitespace-tokenized strings for alignment tests."""

from __future__ import annotations

from decoder.segment_arrays import ParallelArrays, SegmentArray
from decoder.vocabulary import Vocabulary


def encode_pairs(pairs: list[tuple[str, str]]) -> tuple[ParallelArrays, Vocabulary, Vocabulary]:
    source_vocabulary = Vocabulary.build(source.split() for source, _ in pairs)
    target_vocabulary = Vocabulary.build(target.split() for _, target in pairs)
    corpus = ParallelArrays(
        SegmentArray.from_sequences(source_vocabulary.encode(source.split()) for source, _ in pairs),
        SegmentArray.from_sequences(target_vocabulary.encode(target.split()) for _, target in pairs))
    return corpus, source_vocabulary, target_vocabulary
