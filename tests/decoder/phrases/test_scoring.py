"""Phrase scores: relative frequencies, lexical weights, the stored alignment, pruning."""

import math

import numpy as np
import pytest

from decoder.phrases.encoding import PAD_ID, mask_bits, pack_mask
from decoder.phrases.extraction import extract_shard
from decoder.phrases.lexical import estimate_lexical_tables
from decoder.phrases.scoring import (
    LEX_BWD,
    LEX_FWD,
    PHRASE_BWD,
    PHRASE_FWD,
    ScoredPhrasePairs,
    prune_phrase_pairs,
)
from decoder.phrases.scoring import score_phrase_pairs as score
from decoder.phrases.settings import PhraseSettings

from .helpers import corpus_from_tokens
from .lamp_corpus import SEGMENTS


def scored_by_words(segments):
    corpus, alignments, source_vocabulary, target_vocabulary = corpus_from_tokens(segments)
    scored = score(
        extract_shard(corpus, alignments, PhraseSettings()), estimate_lexical_tables(corpus, alignments)
    )

    def words(vocabulary, row):
        return " ".join(vocabulary.decode(row[row != PAD_ID]))

    return scored, {
        (
            words(source_vocabulary, scored.source_phrases[s]),
            words(target_vocabulary, scored.target_phrases[t]),
        ): row
        for row, (s, t) in enumerate(zip(scored.pair_source, scored.pair_target, strict=True))
    }


# Relative frequencies counted by hand over the consistent pairs of lamp_corpus.py:
#   source "la": with "the" in S1, S2, S3 and with "a" in S4 -> p(the|la) = 3/4; "the" only ever with "la".
#   source "luz": "light" in S3 and S4, "light ." in S3 (extended over the unaligned ".") -> 2/3 and 1/3.
#   source "lámpara ya" (extended over unaligned "ya"): only "lamp"; target "lamp": "lámpara" twice,
#   "lámpara ya" once -> p(lámpara ya|lamp) = 1/3.
#   source "la luz": "the light" and "the light ." in S3 (S4's "a red light" is not consistent) -> 1/2 each.
# Lexical scores from the w tables in lamp_corpus.py: lex("light ."|luz) = w(light|luz) w(.|NULL) = 1;
#   lex(lámpara ya|lamp) = w(lámpara|lamp) w(ya|NULL) = 1/2; lex(a|la) = w(a|la) = 1/4, lex(la|a) = 1.
@pytest.mark.parametrize(
    ("source", "target", "count", "phrase_fwd", "phrase_bwd", "lex_fwd", "lex_bwd"),
    [
        ("la", "the", 3, 3 / 4, 1, 3 / 4, 1),
        ("la", "a", 1, 1 / 4, 1, 1 / 4, 1),
        ("luz", "light", 2, 2 / 3, 1, 1, 1),
        ("luz", "light .", 1, 1 / 3, 1, 1, 1),
        ("lámpara ya", "lamp", 1, 1, 1 / 3, 1, 1 / 2),
        ("la luz", "the light .", 1, 1 / 2, 1, 3 / 4, 1),
    ],
)
def test_lamp_corpus_scores(source, target, count, phrase_fwd, phrase_bwd, lex_fwd, lex_bwd):
    scored, rows = scored_by_words(SEGMENTS)
    row = rows[(source, target)]
    assert scored.pair_counts[row] == count
    expected = [math.log(phrase_fwd), math.log(phrase_bwd), math.log(lex_fwd), math.log(lex_bwd)]
    np.testing.assert_allclose(scored.scores[row], expected, atol=1e-12)


def test_pairs_that_are_not_consistent_are_absent():
    # By hand: "la luz" / "a red light" would leave "red" (linked to "roja") inside; "ya" alone has no link.
    _, rows = scored_by_words(SEGMENTS)
    assert ("la luz", "a red light") not in rows
    assert not any(source == "ya" for source, _ in rows)


# One pair seen with two internal alignments: a1 = {0-0, 1-1} once, a2 = {0-0, 0-1, 1-1} twice.
# Links: x-X 3, x-Y 2, y-Y 3, so w(X|x) = 3/5, w(Y|x) = 2/5, w(Y|y) = 1; w(x|X) = 1, w(x|Y) = 2/5,
# w(y|Y) = 3/5.
#   lex(e|f,a1) = 3/5 * 1 = 3/5;  lex(e|f,a2) = 3/5 * 1/2 (2/5 + 1) = 21/50
#   lex(f|e,a1) = 1 * 3/5 = 3/5;  lex(f|e,a2) = 1/2 (1 + 2/5) * 3/5 = 21/50
# Koehn et al. 2003 (section 3.3) take the maximum over alignments: 3/5 both ways, from the rarer a1; the
# stored alignment is the most frequent one, a2.
TWO_ALIGNMENTS = [
    ("x y", "X Y", [(0, 0), (1, 1)]),
    ("x y", "X Y", [(0, 0), (0, 1), (1, 1)]),
    ("x y", "X Y", [(0, 0), (0, 1), (1, 1)]),
]


def test_lexical_score_is_maximum_over_alignments_and_stored_alignment_most_frequent():
    scored, rows = scored_by_words(TWO_ALIGNMENTS)
    row = rows[("x y", "X Y")]
    assert scored.pair_counts[row] == 3
    assert scored.scores[row, LEX_FWD] == pytest.approx(math.log(3 / 5), abs=1e-12)
    assert scored.scores[row, LEX_BWD] == pytest.approx(math.log(3 / 5), abs=1e-12)
    assert scored.alignment_masks[row] == pack_mask([(0, 0), (0, 1), (1, 1)])
    assert scored.orientation_counts[row].tolist() == [3, 0, 0, 3, 0, 0]  # whole segments: monotone both ways


def test_alignment_tie_goes_to_smallest_mask():
    # {0-0, 1-1} packs to 1 + 512 = 513 and {0-1, 1-0} to 2 + 256 = 258; each seen once -> 258 wins.
    scored, rows = scored_by_words([("p q", "P Q", [(0, 0), (1, 1)]), ("p q", "P Q", [(0, 1), (1, 0)])])
    _, source, target = mask_bits(scored.alignment_masks[[rows[("p q", "P Q")]]])
    assert list(zip(source.tolist(), target.tolist(), strict=True)) == [(0, 1), (1, 0)]


def hand_scored(pair_source, pair_target, phrase_fwd, lex_fwd, pair_counts):
    num = len(pair_source)
    scores = np.zeros((num, 4))
    scores[:, PHRASE_FWD], scores[:, LEX_FWD] = phrase_fwd, lex_fwd
    scores[:, PHRASE_BWD] = np.arange(num)  # marks rows so the test can see which survived
    return ScoredPhrasePairs(
        source_phrases=np.array([[10 + k, PAD_ID] for k in range(max(pair_source) + 1)], dtype=np.int32),
        target_phrases=np.array([[20 + k, PAD_ID] for k in range(max(pair_target) + 1)], dtype=np.int32),
        pair_source=np.array(pair_source, dtype=np.int32),
        pair_target=np.array(pair_target, dtype=np.int32),
        scores=scores,
        alignment_masks=np.ones(num, dtype=np.uint64),
        pair_counts=np.array(pair_counts, dtype=np.int64),
        orientation_counts=np.zeros((num, 6), dtype=np.int64),
    )


def test_pruning_keeps_best_targets_by_phrase_fwd_plus_lex_fwd():
    # Source 0 has targets 0..3 with phrase_fwd + lex_fwd = -1.0, -0.5, -3.0, -0.5 (ties: smaller target id
    # first) -> keep the best two: targets 1 and 3. Source 1 has a single target, kept.
    scored = hand_scored(
        [0, 0, 0, 0, 1],
        [0, 1, 2, 3, 2],
        [-0.5, -0.25, -1.0, -0.4, 0.0],
        [-0.5, -0.25, -2.0, -0.1, 0.0],
        [1, 1, 1, 1, 1],
    )
    pruned = prune_phrase_pairs(scored, max_targets_per_source=2)
    assert pruned.scores[:, PHRASE_BWD].tolist() == [1, 3, 4]
    # Target 0 is no longer used: the phrase list shrinks and the ids are renumbered (1 -> 0, 2 -> 1, 3 -> 2).
    assert pruned.target_phrases[:, 0].tolist() == [21, 22, 23]
    assert pruned.pair_target.tolist() == [0, 2, 1]


def test_pruning_ties_keep_the_smaller_target_id():
    scored = hand_scored([0, 0, 0], [0, 1, 2], [-1.0, -1.0, -1.0], [0.0, 0.0, 0.0], [1, 1, 1])
    assert prune_phrase_pairs(scored, max_targets_per_source=2).scores[:, PHRASE_BWD].tolist() == [0, 1]


def test_dropping_singletons_removes_pairs_seen_once_and_orphaned_sources():
    scored = hand_scored([0, 0, 1], [0, 1, 1], [-0.1, -2.0, 0.0], [0.0, 0.0, 0.0], [4, 1, 1])
    pruned = prune_phrase_pairs(scored, max_targets_per_source=None, drop_singletons=True)
    assert pruned.scores[:, PHRASE_BWD].tolist() == [0]
    assert pruned.source_phrases[:, 0].tolist() == [10]
