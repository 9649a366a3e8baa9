"""Symmetrization: hand-checked examples, set relations that must hold, and agreement with a literal
transcription of the textbook pseudo-code."""

from __future__ import annotations

import random

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

import decoder.align.symmetrize as symmetrize_module
from decoder.align.links import AlignmentArray
from decoder.align.symmetrize import SYMMETRIZATION_METHODS, symmetrize, symmetrize_corpus
from decoder.errors import ConfigurationError
from decoder.executor import LocalProcessExecutor, SerialExecutor

# ---------------------------------------------------------------------------------------------------------------
# Independent reference: the pseudo-code of Koehn, "Statistical Machine Translation" (2010), section 4.5.3,
# reproduced from memory and transcribed literally (whole-matrix sweeps, no shortcuts). The book writes points as
# (English word e, foreign word f); English is our target side, foreign our source side.

TEXTBOOK_NEIGHBOURING = ((-1, 0), (0, -1), (1, 0), (0, 1), (-1, -1), (-1, 1), (1, -1), (1, 1))


def textbook_symmetrize(forward, backward, source_length, target_length, method):
    e2f = {(t, s) for s, t in forward}  # "forward" is the book's first FINAL argument
    f2e = {(t, s) for s, t in backward}
    if method == "intersection":
        return {(s, t) for t, s in e2f & f2e}
    if method == "union":
        return {(s, t) for t, s in e2f | f2e}
    union = e2f | f2e
    alignment = e2f & f2e

    def english_aligned(e):
        return any(point[0] == e for point in alignment)

    def foreign_aligned(f):
        return any(point[1] == f for point in alignment)

    # GROW-DIAG(): iterate until no new points added
    while True:
        added = False
        for e in range(target_length):
            for f in range(source_length):
                if (e, f) in alignment:
                    for de, df in TEXTBOOK_NEIGHBOURING:
                        e_new, f_new = e + de, f + df
                        if (not english_aligned(e_new) or not foreign_aligned(f_new)) and (e_new, f_new) in union:
                            alignment.add((e_new, f_new))
                            added = True
        if not added:
            break
    if method != "grow-diag":
        # FINAL(e2f); FINAL(f2e)  (the "-and" variant requires both words unaligned)
        for direction in (e2f, f2e):
            for e_new in range(target_length):
                for f_new in range(source_length):
                    if method == "grow-diag-final-and":
                        is_unaligned = not english_aligned(e_new) and not foreign_aligned(f_new)
                    else:
                        is_unaligned = not english_aligned(e_new) or not foreign_aligned(f_new)
                    if is_unaligned and (e_new, f_new) in direction:
                        alignment.add((e_new, f_new))
    return {(s, t) for t, s in alignment}


# ---------------------------------------------------------------------------------------------------------------
# Hand-checked example, 5 x 5 words, links written as (source, target).
#
# forward  = {(0,0), (1,1), (4,2), (3,4)}
# backward = {(0,0), (1,1), (2,2), (0,1), (4,4)}
# intersection = {(0,0), (1,1)}; union adds (4,2), (3,4), (2,2), (0,1), (4,4).
# GROW-DIAG, sweep 1 in target-major order, neighbours (dt, ds) in the order (-1,0) (0,-1) (1,0) (0,1) (-1,-1)
# (-1,1) (1,-1) (1,1):
#   visit (0,0): (1,0) -> (s0,t1) is in the union but s0 and t1 are both aligned: not added. Nothing else.
#   visit (1,1): (0,-1) -> (s0,t1) blocked as before; (1,1) -> (s2,t2) in the union, s2 and t2 unaligned: add.
#   visit (2,2): no neighbour in the union ((4,2) is two source words away).
#   sweep 2 adds nothing. grow-diag = {(0,0), (1,1), (2,2)}; aligned: source 0,1,2 and target 0,1,2.
# FINAL(forward), target-major: (s4,t2): s4 unaligned, t2 aligned -> added by "or", not by "and".
#                               (s3,t4): both unaligned -> added by both.
# FINAL(backward): (s0,t1): both aligned -> never.
#                  (s4,t4): "or": s4 (via (4,2)) and t4 (via (3,4)) aligned -> no;
#                           "and": t4 aligned via (3,4) -> no.
HAND_FORWARD = {(0, 0), (1, 1), (4, 2), (3, 4)}
HAND_BACKWARD = {(0, 0), (1, 1), (2, 2), (0, 1), (4, 4)}
HAND_EXPECTED = {
    "intersection": {(0, 0), (1, 1)},
    "union": {(0, 0), (1, 1), (4, 2), (3, 4), (2, 2), (0, 1), (4, 4)},
    "grow-diag": {(0, 0), (1, 1), (2, 2)},
    "grow-diag-final": {(0, 0), (1, 1), (2, 2), (4, 2), (3, 4)},
    "grow-diag-final-and": {(0, 0), (1, 1), (2, 2), (3, 4)},
}


@pytest.mark.parametrize("method", SYMMETRIZATION_METHODS)
def test_symmetrize_matches_hand_derivation(method):
    # Expected sets derived by hand in the comment above, following Koehn et al. (2003) / Koehn (2010).
    assert symmetrize(HAND_FORWARD, HAND_BACKWARD, 5, 5, method) == HAND_EXPECTED[method]


def test_final_step_tries_forward_links_before_backward_links():
    # Hand derivation with the two directions swapped: FINAL(first) now tries (s0,t1) (both aligned, no) and
    # (s4,t4) (both unaligned: added, so t4 is aligned); FINAL(second) then rejects (s4,t2) (t2 aligned) and
    # (s3,t4) (t4 aligned).
    result = symmetrize(HAND_BACKWARD, HAND_FORWARD, 5, 5, "grow-diag-final-and")
    assert result == {(0, 0), (1, 1), (2, 2), (4, 4)}


def test_grow_diag_tries_straight_neighbours_before_diagonal_ones():
    # Hand derivation, 2 x 2: intersection {(0,0)}; the union adds (0,1), (1,0) and (1,1).
    # Visiting (s0,t0): (dt,ds) = (1,0) -> (s0,t1), t1 unaligned: add; (0,1) -> (s1,t0), s1 unaligned: add;
    # (1,1) -> (s1,t1): s1 and t1 are now both aligned: not added. Were diagonals tried first, (1,1) would win.
    forward, backward = {(0, 0), (0, 1), (1, 1)}, {(0, 0), (1, 0)}
    assert symmetrize(forward, backward, 2, 2, "grow-diag") == {(0, 0), (0, 1), (1, 0)}
    assert symmetrize(forward, backward, 2, 2, "grow-diag-final") == {(0, 0), (0, 1), (1, 0)}


def test_link_added_behind_the_sweep_waits_for_the_next_sweep():
    # Hand derivation, 3 source x 2 target words: intersection {(2,0)}; the union adds (0,0), (1,0), (0,1), (1,1).
    # Sweep 1, visit (s2,t0): (0,-1) -> (s1,t0), s1 unaligned: add; it lies *behind* the sweep position (same
    #   target word, smaller source word), so the book's loop reaches it only in sweep 2.
    #   (1,-1) -> (s1,t1), t1 unaligned: add; it lies ahead, so it is visited in this sweep.
    # Visit (s1,t1): (0,-1) -> (s0,t1), s0 unaligned: add (behind again); (-1,-1) -> (s0,t0): s0 and t0 aligned.
    # Sweep 2 adds nothing: (s0,t0) stays blocked. Visiting (s1,t0) at once would have added (s0,t0) instead.
    forward, backward = {(1, 0), (2, 0), (0, 0)}, {(0, 1), (1, 1), (2, 0)}
    assert symmetrize(forward, backward, 3, 2, "grow-diag") == {(2, 0), (1, 0), (1, 1), (0, 1)}


def test_grow_diag_final_and_is_not_always_inside_grow_diag_final():
    # Hand derivation, 3 x 3 (a counter-example to "grow-diag-final-and is a subset of grow-diag-final"):
    # forward = {(0,0), (2,0), (0,2), (2,2)}, backward = {(0,0)}; grow-diag = {(0,0)} (no union link is adjacent).
    # FINAL "or":  (s2,t0) s2 unaligned -> add; (s0,t2) t2 unaligned -> add; (s2,t2) both now aligned -> no.
    # FINAL "and": (s2,t0) t0 aligned -> no; (s0,t2) s0 aligned -> no; (s2,t2) both unaligned -> add.
    forward, backward = {(0, 0), (2, 0), (0, 2), (2, 2)}, {(0, 0)}
    assert symmetrize(forward, backward, 3, 3, "grow-diag-final") == {(0, 0), (2, 0), (0, 2)}
    assert symmetrize(forward, backward, 3, 3, "grow-diag-final-and") == {(0, 0), (2, 2)}


# ---------------------------------------------------------------------------------------------------------------
# Random alignments


@st.composite
def alignment_pairs(draw, max_length=7):
    source_length = draw(st.integers(1, max_length))
    target_length = draw(st.integers(1, max_length))
    cells = st.tuples(st.integers(0, source_length - 1), st.integers(0, target_length - 1))
    forward = draw(st.sets(cells, max_size=source_length * target_length))
    backward = draw(st.sets(cells, max_size=source_length * target_length))
    return forward, backward, source_length, target_length


def _covered(links):
    return {s for s, _ in links}, {t for _, t in links}


@settings(max_examples=100, deadline=None)
@given(alignment_pairs())
def test_symmetrization_set_relations(case):
    # Relations that follow from the definitions (Koehn et al. 2003): every method starts from the intersection
    # and only adds union links; the final steps only add links to grow-diag.
    forward, backward, source_length, target_length = case
    result = {
        method: symmetrize(forward, backward, source_length, target_length, method) for method in SYMMETRIZATION_METHODS
    }
    assert result["intersection"] == forward & backward
    assert result["union"] == forward | backward
    assert result["intersection"] <= result["grow-diag"] <= result["grow-diag-final-and"] <= result["union"]
    assert result["grow-diag"] <= result["grow-diag-final"] <= result["union"]
    # FINAL with "or" visits every union link, so afterwards every word the union covers is covered.
    assert _covered(result["grow-diag-final"]) == _covered(forward | backward)
    # FINAL with "and": a union link whose two words are still unaligned at the end would have been added.
    sources, targets = _covered(result["grow-diag-final-and"])
    assert all(s in sources or t in targets for s, t in forward | backward)
    # grow-diag stops only when no union link next to the alignment has an unaligned word.
    grown = result["grow-diag"]
    sources, targets = _covered(grown)
    for s, t in (forward | backward) - grown:
        has_neighbour = any(abs(s - s2) <= 1 and abs(t - t2) <= 1 for s2, t2 in grown)
        assert not (has_neighbour and (s not in sources or t not in targets))
    # grow-diag depends only on intersection and union, so swapping the directions cannot change it.
    assert symmetrize(backward, forward, source_length, target_length, "grow-diag") == grown


@settings(max_examples=150, deadline=None)
@given(alignment_pairs(), st.sampled_from(SYMMETRIZATION_METHODS))
def test_symmetrize_equals_textbook_transcription(case, method):
    # Reference: literal transcription of Koehn (2010), section 4.5.3, from memory (top of this file).
    forward, backward, source_length, target_length = case
    expected = textbook_symmetrize(forward, backward, source_length, target_length, method)
    assert symmetrize(forward, backward, source_length, target_length, method) == expected


def test_symmetrize_equals_textbook_on_seeded_sparse_matrices():
    # Reference: the textbook transcription (from memory, top of this file). Sparse random link sets make the
    # visiting order matter more often than hypothesis' draws do (about 4% of these cases depend on it).
    rng = random.Random(2024)
    for _ in range(600):
        source_length, target_length = rng.randint(1, 7), rng.randint(1, 7)
        cells = [(s, t) for s in range(source_length) for t in range(target_length)]
        forward = {cell for cell in cells if rng.random() < 0.3}
        backward = {cell for cell in cells if rng.random() < 0.3}
        for method in ("grow-diag", "grow-diag-final", "grow-diag-final-and"):
            expected = textbook_symmetrize(forward, backward, source_length, target_length, method)
            assert symmetrize(forward, backward, source_length, target_length, method) == expected


def _random_corpus(seed, num_pairs, max_length=12):
    """Directional-looking alignments: forward links each target word to one source word near the diagonal,
    backward each source word to one target word; a few empty sentence pairs and empty alignments."""
    rng = random.Random(seed)
    forward_sets, backward_sets, source_lengths, target_lengths = [], [], [], []
    for _ in range(num_pairs):
        source_length, target_length = rng.randint(0, max_length), rng.randint(0, max_length)
        forward, backward = set(), set()
        if source_length and target_length:
            for t in range(target_length):
                if rng.random() < 0.85:
                    s = round(t * (source_length - 1) / max(target_length - 1, 1)) + rng.randint(-1, 1)
                    forward.add((min(max(s, 0), source_length - 1), t))
            for s in range(source_length):
                if rng.random() < 0.85:
                    t = round(s * (target_length - 1) / max(source_length - 1, 1)) + rng.randint(-1, 1)
                    backward.add((s, min(max(t, 0), target_length - 1)))
        forward_sets.append(forward)
        backward_sets.append(backward)
        source_lengths.append(source_length)
        target_lengths.append(target_length)
    return forward_sets, backward_sets, source_lengths, target_lengths


@pytest.mark.parametrize("method", SYMMETRIZATION_METHODS)
def test_symmetrize_corpus_equals_textbook_per_sentence(method):
    # Reference: the textbook transcription above, sentence by sentence; output sorted by (source, target).
    forward_sets, backward_sets, source_lengths, target_lengths = _random_corpus(seed=7, num_pairs=300)
    result = symmetrize_corpus(
        AlignmentArray.from_link_sets(forward_sets),
        AlignmentArray.from_link_sets(backward_sets),
        source_lengths,
        target_lengths,
        method,
    )
    assert len(result) == len(forward_sets)
    for k in range(len(result)):
        expected = textbook_symmetrize(forward_sets[k], backward_sets[k], source_lengths[k], target_lengths[k], method)
        assert result[k].tolist() == sorted([list(link) for link in expected])


def test_symmetrize_corpus_sharded_over_processes_equals_serial(monkeypatch):
    # The sharded run must give exactly the in-process result (shard boundaries must not lose or move links).
    monkeypatch.setattr(symmetrize_module, "MIN_SENTENCES_PER_SHARD", 50)
    forward_sets, backward_sets, source_lengths, target_lengths = _random_corpus(seed=11, num_pairs=1000)
    forward = AlignmentArray.from_link_sets(forward_sets)
    backward = AlignmentArray.from_link_sets(backward_sets)
    serial = symmetrize_corpus(forward, backward, source_lengths, target_lengths, executor=SerialExecutor())
    with LocalProcessExecutor(2) as executor:
        sharded = symmetrize_corpus(forward, backward, source_lengths, target_lengths, executor=executor)
    assert np.array_equal(sharded.offsets, serial.offsets)
    assert np.array_equal(sharded.links, serial.links)
    assert sharded.link_set(999) == textbook_symmetrize(
        forward_sets[999], backward_sets[999], source_lengths[999], target_lengths[999], "grow-diag-final-and"
    )


def test_symmetrize_corpus_of_no_sentences_is_empty():
    empty = AlignmentArray.from_link_sets([])
    result = symmetrize_corpus(empty, empty, [], [])
    assert result.links.shape == (0, 2)
    assert result.offsets.tolist() == [0]


def test_unknown_method_is_a_configuration_error():
    with pytest.raises(ConfigurationError, match="grow-diag-final-and"):
        symmetrize({(0, 0)}, {(0, 0)}, 1, 1, "grow-diagonal")


def test_link_outside_the_sentence_pair_is_rejected():
    with pytest.raises(ValueError, match=r"\(2, 0\) lies outside a 2 x 3"):
        symmetrize({(2, 0)}, set(), 2, 3)
    alignments = AlignmentArray.from_link_sets([{(0, 0)}, {(0, 3)}])
    with pytest.raises(ValueError, match="sentence pair 1"):
        symmetrize_corpus(alignments, alignments, [1, 1], [1, 3])


def test_corpus_inputs_of_different_sizes_are_rejected():
    alignments = AlignmentArray.from_link_sets([{(0, 0)}])
    with pytest.raises(ValueError, match="same sentence pairs"):
        symmetrize_corpus(alignments, alignments, [1, 1], [1, 1])
