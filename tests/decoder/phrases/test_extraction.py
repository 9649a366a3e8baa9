"""Phrase-pair extraction: the textbook example, nltk on random alignments, orientations, internal links."""

import numpy as np
import pytest
from nltk.translate.phrase_based import phrase_extraction

from decoder.align.links import AlignmentArray
from decoder.phrases.encoding import mask_bits
from decoder.phrases.extraction import DISCONTINUOUS, MONOTONE, SWAP, extract_instances, extract_shard
from decoder.phrases.settings import PhraseSettings
from decoder.segment_arrays import ParallelArrays, SegmentArray

from .helpers import corpus_from_tokens, random_aligned_corpus

# Koehn, "Statistical Machine Translation" (2010), section 5.2.3, the phrase extraction example (from memory;
# the same sentence pair and alignment are the doctest of nltk.translate.phrase_based, sides swapped).
# Source (German) positions 0-9, target (English) positions 0-8; the comma (4) is unaligned:
#   michael-michael 0-0, geht/davon/aus-assumes 1-1 2-1 3-1, dass-that 5-2, er-he 6-3, im-in/the 7-6 7-7,
#   haus-house 8-8, bleibt-will/stay 9-4 9-5.
GERMAN = "michael geht davon aus , dass er im haus bleibt"
ENGLISH = "michael assumes that he will stay in the house"
LINKS = [(0, 0), (1, 1), (2, 1), (3, 1), (5, 2), (6, 3), (7, 6), (7, 7), (8, 8), (9, 4), (9, 5)]

# The book's list of all 24 consistent pairs (from memory), as (German words, English words).
BOOK_PAIRS = {
    ("michael", "michael"),
    ("michael geht davon aus", "michael assumes"),
    ("michael geht davon aus ,", "michael assumes"),
    ("michael geht davon aus , dass", "michael assumes that"),
    ("michael geht davon aus , dass er", "michael assumes that he"),
    ("michael geht davon aus , dass er im haus bleibt", "michael assumes that he will stay in the house"),
    ("geht davon aus", "assumes"),
    ("geht davon aus ,", "assumes"),
    ("geht davon aus , dass", "assumes that"),
    ("geht davon aus , dass er", "assumes that he"),
    ("geht davon aus , dass er im haus bleibt", "assumes that he will stay in the house"),
    ("dass", "that"),
    (", dass", "that"),
    ("dass er", "that he"),
    (", dass er", "that he"),
    ("dass er im haus bleibt", "that he will stay in the house"),
    (", dass er im haus bleibt", "that he will stay in the house"),
    ("er", "he"),
    ("er im haus bleibt", "he will stay in the house"),
    ("bleibt", "will stay"),
    ("im haus bleibt", "will stay in the house"),
    ("im", "in the"),
    ("im haus", "in the house"),
    ("haus", "house"),
}


def textbook_instances(max_phrase_length):
    corpus, alignments, _, _ = corpus_from_tokens([(GERMAN, ENGLISH, LINKS)])
    return extract_instances(corpus, alignments, max_phrase_length)


def as_words(instances, index):
    german, english = GERMAN.split(), ENGLISH.split()
    return (
        " ".join(german[instances.source_start[index] : instances.source_end[index]]),
        " ".join(english[instances.target_start[index] : instances.target_end[index]]),
    )


def test_book_list_agrees_with_nltk():
    # Checks the transcription above against the reference library (nltk, no length limit).
    reference = {(source, target) for _, _, source, target in phrase_extraction(GERMAN, ENGLISH, LINKS)}
    assert reference == BOOK_PAIRS


def test_textbook_example_with_default_limit():
    # With 7 tokens per side, the two pairs with a 9- or 10-word side drop out of the book's 24.
    instances = textbook_instances(7)
    extracted = [as_words(instances, index) for index in range(len(instances))]
    expected = {pair for pair in BOOK_PAIRS if max(len(pair[0].split()), len(pair[1].split())) <= 7}
    assert len(expected) == 22
    assert len(extracted) == len(set(extracted))
    assert set(extracted) == expected
    reference = {(source, target) for _, _, source, target in phrase_extraction(GERMAN, ENGLISH, LINKS, 7)}
    assert set(extracted) == reference  # nltk, max_phrase_length=7 (no quirk triggers on this pair)


# Orientations in the textbook example, checked by hand from the corner links (Koehn et al. 2005):
# "im haus" / "in the house": the word before, "stay", links to "bleibt", just after the source span -> swap;
#   it ends the English sentence but "bleibt" follows the source span -> discontinuous (end point is (10, 9)).
# ", dass" / "that": "assumes" links to "aus", just before the span -> monotone; "he" links to "er" -> mono.
# "dass" / "that": "assumes" does not link to the unaligned comma before "dass" -> discontinuous.
# "bleibt" / "will stay": "he" links to "er" (two words before) -> discontinuous; "in" links to "im" -> disc.
# "im haus bleibt" / "will stay in the house": "he" links to "er" -> monotone; ends both sentences -> mono.
# "michael" / "michael": starts both sentences -> monotone; "assumes" links to "geht" -> monotone.
# "er" / "he": "that" links to "dass" -> monotone; "will" links to "bleibt" -> discontinuous.
@pytest.mark.parametrize(
    ("pair", "previous", "following"),
    [
        (("im haus", "in the house"), SWAP, DISCONTINUOUS),
        ((", dass", "that"), MONOTONE, MONOTONE),
        (("dass", "that"), DISCONTINUOUS, MONOTONE),
        (("bleibt", "will stay"), DISCONTINUOUS, DISCONTINUOUS),
        (("im haus bleibt", "will stay in the house"), MONOTONE, MONOTONE),
        (("michael", "michael"), MONOTONE, MONOTONE),
        (("er", "he"), MONOTONE, DISCONTINUOUS),
    ],
)
def test_textbook_orientations(pair, previous, following):
    instances = textbook_instances(7)
    index = [as_words(instances, row) for row in range(len(instances))].index(pair)
    assert (instances.prev_orientation[index], instances.next_orientation[index]) == (previous, following)


def test_swapped_words_give_swap_orientations():
    # By hand: source "a b", target "B A", links a-A (0, 1) and b-B (1, 0).
    # "a"/"A": the target word before, "B", links to the source word after "a" -> swap; "A" ends the target
    # but "a" does not end the source -> discontinuous.
    # "b"/"B": starts the target but "b" does not start the source -> discontinuous; the next target word,
    # "A", links to the source word before "b" -> swap.
    corpus, alignments, _, _ = corpus_from_tokens([("a b", "B A", [(0, 1), (1, 0)])])
    instances = extract_instances(corpus, alignments, 7)
    found = {
        (
            int(instances.source_start[k]),
            int(instances.prev_orientation[k]),
            int(instances.next_orientation[k]),
        )
        for k in range(len(instances))
        if instances.source_end[k] - instances.source_start[k] == 1
    }
    assert found == {(0, SWAP, DISCONTINUOUS), (1, DISCONTINUOUS, SWAP)}


def test_monotone_wins_when_both_corners_are_linked():
    # By hand: source "a b c", target "X B", links a-X (0, 0), b-B (1, 1), c-X (2, 0). For "b"/"B" the target
    # word before, "X", links both to "a" (before "b": monotone) and to "c" (after "b": swap); the module
    # docstring gives monotone precedence.
    corpus, alignments, _, _ = corpus_from_tokens([("a b c", "X B", [(0, 0), (1, 1), (2, 0)])])
    instances = extract_instances(corpus, alignments, 7)
    (index,) = np.flatnonzero((instances.source_start == 1) & (instances.source_end == 2))
    assert instances.prev_orientation[index] == MONOTONE


def test_textbook_internal_alignment():
    # By hand: "im haus bleibt" / "will stay in the house" has im-in (0, 2), im-the (0, 3), haus-house (1, 4),
    # bleibt-will (2, 0), bleibt-stay (2, 1), positions relative to the pair.
    instances = textbook_instances(7)
    index = [as_words(instances, row) for row in range(len(instances))].index(
        ("im haus bleibt", "will stay in the house")
    )
    _, source, target = mask_bits(instances.alignment_masks[index : index + 1])
    assert set(zip(source.tolist(), target.tolist(), strict=True)) == {(0, 2), (0, 3), (1, 4), (2, 0), (2, 1)}


def nltk_consistent_pairs(num_source, num_target, links, limit):
    """nltk's phrase pairs as ((source start, end), (target start, end)), restricted to the ones that satisfy
    the definition of Koehn et al. 2003 for this limit.

    nltk (3.10, nltk/translate/phrase_based.py) bounds the target length only from the start of the minimal
    target span: while extending over unaligned target words it adds pairs longer than max_phrase_length, and
    when the minimal target span itself is too long it cuts it to max_phrase_length words, which yields pairs
    that leave a link of the source span outside the target span. Both kinds are removed here; nltk is
    otherwise complete, so the remaining set must equal ours exactly."""
    source_text = " ".join(f"s{i}" for i in range(num_source))
    target_text = " ".join(f"t{j}" for j in range(num_target))
    kept = set()
    for source_span, target_span, _, _ in phrase_extraction(source_text, target_text, links, limit):
        inside_target = all(
            target_span[0] <= j < target_span[1] for i, j in links if source_span[0] <= i < source_span[1]
        )
        if target_span[1] - target_span[0] <= limit and inside_target:
            kept.add((source_span, target_span))
    return kept


@pytest.mark.parametrize("limit", [1, 2, 3, 5, 7, 8])
def test_same_pairs_as_nltk_on_random_alignments(limit):
    # Reference: nltk.translate.phrase_based.phrase_extraction, max_phrase_length=limit, filtered as above.
    # All segments are extracted in one call, which also checks that nothing leaks across segment boundaries.
    rng = np.random.default_rng(limit)
    corpus, alignments, link_sets = random_aligned_corpus(rng, 150)
    instances = extract_instances(corpus, alignments, limit)
    for segment, links in enumerate(link_sets):
        rows = np.flatnonzero(instances.segment == segment)
        ours = {
            (
                (int(instances.source_start[k]), int(instances.source_end[k])),
                (int(instances.target_start[k]), int(instances.target_end[k])),
            )
            for k in rows
        }
        assert len(ours) == len(rows)
        expected = nltk_consistent_pairs(
            len(corpus.source[segment]), len(corpus.target[segment]), links, limit
        )
        assert ours == expected, f"segment {segment}"


def test_without_limit_nltk_needs_no_filter():
    # With max_phrase_length at least both lengths, nltk's output is used as is.
    rng = np.random.default_rng(11)
    corpus, alignments, link_sets = random_aligned_corpus(rng, 80, max_length=8)
    instances = extract_instances(corpus, alignments, 8)
    for segment, links in enumerate(link_sets):
        rows = np.flatnonzero(instances.segment == segment)
        ours = {
            (
                (int(instances.source_start[k]), int(instances.source_end[k])),
                (int(instances.target_start[k]), int(instances.target_end[k])),
            )
            for k in rows
        }
        source_text = " ".join(f"s{i}" for i in range(len(corpus.source[segment])))
        target_text = " ".join(f"t{j}" for j in range(len(corpus.target[segment])))
        assert ours == {(s, t) for s, t, _, _ in phrase_extraction(source_text, target_text, links, 8)}


def corner_orientation(links, source_span, target_span, num_source, num_target, previous):
    """Direct transcription of the word-based rule (Koehn et al. 2005) with sentence-boundary points."""
    points = set(links) | {(-1, -1), (num_source, num_target)}
    (first, end), (target_first, target_end) = source_span, target_span
    if previous:
        monotone, swap = (first - 1, target_first - 1), (end, target_first - 1)
    else:
        monotone, swap = (end, target_end), (first - 1, target_end)
    return MONOTONE if monotone in points else SWAP if swap in points else DISCONTINUOUS


def test_orientations_and_internal_links_match_their_definitions_on_random_alignments():
    rng = np.random.default_rng(5)
    corpus, alignments, link_sets = random_aligned_corpus(rng, 120)
    instances = extract_instances(corpus, alignments, 7)
    rows, source, target = mask_bits(instances.alignment_masks)
    internal = {}
    for row, i, j in zip(rows.tolist(), source.tolist(), target.tolist(), strict=True):
        internal.setdefault(row, set()).add((i, j))
    for k in range(len(instances)):
        segment = int(instances.segment[k])
        links = link_sets[segment]
        sizes = (len(corpus.source[segment]), len(corpus.target[segment]))
        source_span = (int(instances.source_start[k]), int(instances.source_end[k]))
        target_span = (int(instances.target_start[k]), int(instances.target_end[k]))
        assert instances.prev_orientation[k] == corner_orientation(
            links, source_span, target_span, *sizes, True
        )
        assert instances.next_orientation[k] == corner_orientation(
            links, source_span, target_span, *sizes, False
        )
        expected = {
            (i - source_span[0], j - target_span[0]) for i, j in links if source_span[0] <= i < source_span[1]
        }
        assert internal.get(k, set()) == expected


def test_counts_of_a_repeated_segment():
    # By hand: the same pair twice gives every phrase pair count 2 and 2 of each of its orientations.
    corpus, alignments, _, _ = corpus_from_tokens([("a b", "B A", [(0, 1), (1, 0)])] * 2)
    counts = extract_shard(corpus, alignments, PhraseSettings())
    # Pairs: a/A, b/B, "a b"/"B A".
    assert counts.pair_counts.tolist() == [2, 2, 2]
    np.testing.assert_array_equal(counts.orientation_counts.sum(axis=1), [4, 4, 4])


def test_links_outside_the_segment_are_rejected():
    corpus = ParallelArrays(SegmentArray.from_sequences([[4, 5]]), SegmentArray.from_sequences([[4]]))
    with pytest.raises(ValueError, match="segment 0: link 0-1"):
        extract_instances(corpus, AlignmentArray.from_link_sets([[(0, 1)]]), 7)


def test_unaligned_corpus_gives_no_pairs():
    corpus = ParallelArrays(SegmentArray.from_sequences([[4, 5]]), SegmentArray.from_sequences([[4]]))
    assert len(extract_instances(corpus, AlignmentArray.from_link_sets([[]]), 7)) == 0
