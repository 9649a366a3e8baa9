"""Lexical translation tables and lexical weights against hand computation (Koehn, Och & Marcu 2003, 3.3)."""

import math

import numpy as np
import pytest

from decoder.phrases import lexical
from decoder.phrases.encoding import PAD_ID, pack_mask
from decoder.phrases.lexical import estimate_lexical_tables, phrase_lexical_weights

from .helpers import corpus_from_tokens
from .lamp_corpus import SEGMENTS


@pytest.fixture(scope="module")
def lamp():
    corpus, alignments, source_vocabulary, target_vocabulary = corpus_from_tokens(SEGMENTS)
    return estimate_lexical_tables(corpus, alignments), source_vocabulary, target_vocabulary


# w(e|f) = c(f, e) / c(f) and w(f|e) = c(f, e) / c(e), from the counts in lamp_corpus.py.
@pytest.mark.parametrize(
    ("source", "target", "target_given_source", "source_given_target"),
    [
        ("enciende", "switch", 1 / 2, 1 / 2),
        ("enciende", "on", 1 / 2, 1),
        ("la", "the", 3 / 4, 1),
        ("la", "a", 1 / 4, 1),
        ("lámpara", "lamp", 1, 1),
        ("ya", "<null>", 1, 1 / 2),
        ("el", "<null>", 1, 1 / 2),
        ("<null>", ".", 1, 1),
    ],
)
def test_relative_frequencies_with_null(lamp, source, target, target_given_source, source_given_target):
    tables, source_vocabulary, target_vocabulary = lamp
    source_id, target_id = source_vocabulary.id_of(source), target_vocabulary.id_of(target)
    assert tables.target_given_source.probability(source_id, target_id) == pytest.approx(target_given_source)
    assert tables.source_given_target.probability(target_id, source_id) == pytest.approx(source_given_target)


def test_each_conditional_distribution_sums_to_one(lamp):
    tables, _, _ = lamp
    for table in (tables.target_given_source, tables.source_given_target):
        given = table.keys // table.num_target_words
        sums = np.bincount(given, weights=table.probabilities)
        np.testing.assert_allclose(sums[np.unique(given)], 1.0)


def encode_pair(source_vocabulary, target_vocabulary, source, target, links, width=7):
    def row(vocabulary, text):
        ids = list(vocabulary.encode(text.split()))
        return ids + [PAD_ID] * (width - len(ids))

    return (
        np.array([row(source_vocabulary, source)], dtype=np.int32),
        np.array([row(target_vocabulary, target)], dtype=np.int32),
        np.array([pack_mask(links)], dtype=np.uint64),
    )


# Worked by hand with the formula of Koehn et al. 2003, section 3.3 (the shape of their Figure 1 example):
# S2 "apaga la lámpara ya" / "switch off the lamp", a = {0-0, 0-1, 1-2, 2-3}:
#   lex(e|f,a) = w(switch|apaga) * w(off|apaga) * w(the|la) * w(lamp|lámpara) = 1/2 * 1/2 * 3/4 * 1 = 3/16
#   lex(f|e,a) = 1/2 (w(apaga|switch) + w(apaga|off)) * w(la|the) * w(lámpara|lamp) * w(ya|NULL)
#              = 1/2 (1/2 + 1) * 1 * 1 * 1/2 = 3/8      ("apaga" has two links, "ya" none)
# S3 "la luz" / "the light .", a = {0-0, 1-1}:
#   lex(e|f,a) = w(the|la) * w(light|luz) * w(.|NULL) = 3/4 * 1 * 1 = 3/4;  lex(f|e,a) = 1 * 1 = 1
@pytest.mark.parametrize(
    ("source", "target", "links", "forward", "backward"),
    [
        ("apaga la lámpara ya", "switch off the lamp", [(0, 0), (0, 1), (1, 2), (2, 3)], 3 / 16, 3 / 8),
        ("la luz", "the light .", [(0, 0), (1, 1)], 3 / 4, 1.0),
    ],
)
def test_lexical_weight_worked_examples(lamp, source, target, links, forward, backward):
    tables, source_vocabulary, target_vocabulary = lamp
    rows = encode_pair(source_vocabulary, target_vocabulary, source, target, links)
    log_forward, log_backward = phrase_lexical_weights(*rows, tables)
    assert log_forward[0] == pytest.approx(math.log(forward), abs=1e-12)
    assert log_backward[0] == pytest.approx(math.log(backward), abs=1e-12)


def test_vectorised_over_many_rows_equals_row_by_row(lamp, monkeypatch):
    # The block-wise vectorised path must not mix rows: 600 rows alternate the two worked examples above, in
    # blocks of 7 rows so that block boundaries fall inside the batch.
    monkeypatch.setattr(lexical, "_CHUNK_ROWS", 7)
    tables, source_vocabulary, target_vocabulary = lamp
    first = encode_pair(
        source_vocabulary,
        target_vocabulary,
        "apaga la lámpara ya",
        "switch off the lamp",
        [(0, 0), (0, 1), (1, 2), (2, 3)],
    )
    second = encode_pair(source_vocabulary, target_vocabulary, "la luz", "the light .", [(0, 0), (1, 1)])
    stacked = [np.concatenate([a, b] * 300) for a, b in zip(first, second, strict=True)]
    log_forward, log_backward = phrase_lexical_weights(*stacked, tables)
    np.testing.assert_allclose(log_forward, [math.log(3 / 16), math.log(3 / 4)] * 300)
    np.testing.assert_allclose(log_backward, [math.log(3 / 8), 0.0] * 300, atol=1e-12)
