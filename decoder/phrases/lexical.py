"""Lexical translation tables from a symmetrized word alignment, and the lexical weight of phrase pairs.

Koehn, Och & Marcu 2003 ("Statistical phrase-based translation", section 3.3): w(e|f) is the relative
frequency of target word e among the links of source word f in the word-aligned corpus; an unaligned word is
counted as linked to NULL (id NULL_ID in both vocabularies). Joint counts c(f, e) therefore include c(f, NULL)
for unaligned source words and c(NULL, e) for unaligned target words, and

    w(e|f) = c(f, e) / sum_e' c(f, e')        w(f|e) = c(f, e) / sum_f' c(f', e)     (e', f' include NULL).

The lexical weight of a phrase pair with internal alignment a (same paper, same section) is

    lex(e|f, a) = prod_i  1 / |{j : (i, j) in a}|  sum_{(i, j) in a} w(e_i|f_j),

with w(e_i|NULL) for a target word e_i that has no link in a; lex(f|e, a) swaps the roles.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from decoder.align.lexical_table import LexicalTable
from decoder.align.links import AlignmentArray
from decoder.phrases.encoding import PAD_ID, mask_bits
from decoder.segment_arrays import ParallelArrays
from decoder.vocabulary import NULL_ID, NUM_SPECIAL

_CHUNK_ROWS = 1 << 18  # pairs per vectorised block, bounds temporary memory to some tens of MiB


@dataclass(frozen=True, slots=True)
class LexicalTables:
    """Both directions: ``target_given_source`` holds w(target|source) (its source side is the source
    vocabulary), ``source_given_target`` holds w(source|target) (its source side is the target vocabulary)."""

    target_given_source: LexicalTable
    source_given_target: LexicalTable


def _normalised(
    keys: npt.NDArray[np.int64], counts: npt.NDArray[np.int64], num_given: int, num_generated: int
) -> LexicalTable:
    """LexicalTable from joint counts keyed ``given * num_generated + generated``, normalised per given."""
    given = keys // num_generated
    totals = np.bincount(given, weights=counts, minlength=num_given)
    return LexicalTable(num_given, num_generated, keys, counts / totals[given])


def estimate_lexical_tables(
    corpus: ParallelArrays,
    alignments: AlignmentArray,
    num_source_words: int | None = None,
    num_target_words: int | None = None,
) -> LexicalTables:
    """w(target|source) and w(source|target) by relative frequency of links (unaligned words -> NULL).

    Vocabulary sizes default to one more than the largest id in the corpus (at least the special ids)."""
    if len(alignments) != len(corpus):
        raise ValueError(f"{len(corpus)} segment pairs but {len(alignments)} alignments")
    source_ids, target_ids = corpus.source.ids, corpus.target.ids
    num_source = max(NUM_SPECIAL, int(source_ids.max(initial=0)) + 1)
    num_target = max(NUM_SPECIAL, int(target_ids.max(initial=0)) + 1)
    for given, needed, side in (
        (num_source_words, num_source, "source"),
        (num_target_words, num_target, "target"),
    ):
        if given is not None and given < needed:
            raise ValueError(f"num_{side}_words is {given} but the corpus has {side} id {needed - 1}")
    num_source = num_source_words if num_source_words is not None else num_source
    num_target = num_target_words if num_target_words is not None else num_target
    link_segment = np.repeat(np.arange(len(alignments)), np.diff(alignments.offsets))
    source_position = alignments.links[:, 0].astype(np.int64) + corpus.source.offsets[link_segment]
    target_position = alignments.links[:, 1].astype(np.int64) + corpus.target.offsets[link_segment]
    source_aligned = np.zeros(len(source_ids), dtype=bool)
    target_aligned = np.zeros(len(target_ids), dtype=bool)
    source_aligned[source_position] = True
    target_aligned[target_position] = True
    pair_source = np.concatenate(
        [
            source_ids[source_position],
            source_ids[~source_aligned],
            np.full(np.count_nonzero(~target_aligned), NULL_ID),
        ]
    ).astype(np.int64)
    pair_target = np.concatenate(
        [
            target_ids[target_position],
            np.full(np.count_nonzero(~source_aligned), NULL_ID),
            target_ids[~target_aligned],
        ]
    ).astype(np.int64)
    forward_keys, forward_counts = np.unique(pair_source * num_target + pair_target, return_counts=True)
    backward_keys, backward_counts = np.unique(pair_target * num_source + pair_source, return_counts=True)
    return LexicalTables(
        target_given_source=_normalised(forward_keys, forward_counts, num_source, num_target),
        source_given_target=_normalised(backward_keys, backward_counts, num_target, num_source),
    )


def log_lexical_weights(
    given_phrases: npt.NDArray[np.int32],
    generated_phrases: npt.NDArray[np.int32],
    links: tuple[npt.NDArray[np.int64], npt.NDArray[np.int64], npt.NDArray[np.int64]],
    table: LexicalTable,
) -> npt.NDArray[np.float64]:
    """Natural log of lex(generated | given, a) for each row (padded phrase rows of equal width).

    ``links`` = (row, given position, generated position) for every link of every row, and ``table`` gives
    w(generated | given). Words of the generated phrase without a link use w(word | NULL)."""
    num_rows, width = generated_phrases.shape
    rows, given_position, generated_position = links
    probabilities = table.lookup(
        given_phrases[rows, given_position], generated_phrases[rows, generated_position]
    )
    cell = rows * width + generated_position
    sums = np.bincount(cell, weights=probabilities, minlength=num_rows * width).reshape(num_rows, width)
    num_links = np.bincount(cell, minlength=num_rows * width).reshape(num_rows, width)
    present = generated_phrases != PAD_ID
    unaligned = present & (num_links == 0)
    null_probability = np.ones((num_rows, width))
    null_probability[unaligned] = table.lookup(
        np.full(np.count_nonzero(unaligned), NULL_ID), generated_phrases[unaligned]
    )
    factors = np.where(num_links > 0, sums / np.maximum(num_links, 1), null_probability)
    return np.log(np.where(present, factors, 1.0)).sum(axis=1)


def phrase_lexical_weights(
    source_phrases: npt.NDArray[np.int32],
    target_phrases: npt.NDArray[np.int32],
    alignment_masks: npt.NDArray[np.uint64],
    tables: LexicalTables,
    pair_source: npt.NDArray[np.integer] | None = None,
    pair_target: npt.NDArray[np.integer] | None = None,
) -> tuple[npt.NDArray[np.float64], npt.NDArray[np.float64]]:
    """(log lex(target|source, a), log lex(source|target, a)) for each alignment mask.

    Row k pairs source phrase row ``pair_source[k]`` with target phrase row ``pair_target[k]`` (default: row k
    of each, when the phrase arrays are already aligned with the masks). Works in blocks of _CHUNK_ROWS rows,
    gathering phrase rows per block, so that memory stays bounded for millions of pairs."""
    num_rows = len(alignment_masks)
    source_index = np.arange(num_rows) if pair_source is None else np.asarray(pair_source)
    target_index = np.arange(num_rows) if pair_target is None else np.asarray(pair_target)
    forward = np.empty(num_rows)
    backward = np.empty(num_rows)
    for first in range(0, num_rows, _CHUNK_ROWS):
        block = slice(first, first + _CHUNK_ROWS)
        rows, source_position, target_position = mask_bits(np.asarray(alignment_masks[block]))
        sources, targets = source_phrases[source_index[block]], target_phrases[target_index[block]]
        forward[block] = log_lexical_weights(
            sources, targets, (rows, source_position, target_position), tables.target_given_source
        )
        backward[block] = log_lexical_weights(
            targets, sources, (rows, target_position, source_position), tables.source_given_target
        )
    return forward, backward
