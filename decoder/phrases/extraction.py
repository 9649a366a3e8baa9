"""Extraction of phrase pairs consistent with a word alignment, with orientations and internal links.

A phrase pair (source span, target span) is consistent with the alignment A when no word inside either span is
linked to a word outside the other span and at least one link lies inside (Koehn, Och & Marcu 2003,
"Statistical phrase-based translation", section 3.1; Och & Ney 2004). Every source span of at most
``max_phrase_length`` tokens is tried, so spans that start or end with unaligned source words come out by
themselves; the minimal target span of each consistent source span is then extended over unaligned target
words on either side, again up to ``max_phrase_length`` tokens.

Orientation is word-based (Tillmann 2004; Koehn et al. 2005, "Edinburgh system description for IWSLT 2005",
section on lexicalized reordering): looking at the target word just before the pair, the previous orientation
is monotone if that word is linked to the source word just before the source span, swap if it is linked to the
source word just after it, and discontinuous otherwise; the next orientation looks at the target word just
after the pair (linked to the source word after the span: monotone; before it: swap). Sentence start and end
act as links at (-1, -1) and (I, J). Monotone wins when both corners are linked.

All work is vectorised over the whole shard: positions are global indices into the shard's flat id arrays.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
import numpy.typing as npt

from decoder.align.links import AlignmentArray
from decoder.phrases.encoding import (
    MAX_SUPPORTED_PHRASE_LENGTH,
    group_starts,
    lexicographic_order,
    phrase_rows,
    unique_rows,
)
from decoder.phrases.settings import PhraseSettings
from decoder.segment_arrays import ParallelArrays

MONOTONE, SWAP, DISCONTINUOUS = 0, 1, 2
NUM_ORIENTATIONS = 3
ORIENTATION_COLUMNS = (
    "prev_monotone",
    "prev_swap",
    "prev_discontinuous",
    "next_monotone",
    "next_swap",
    "next_discontinuous",
)


@dataclass(frozen=True, slots=True)
class PhraseInstances:
    """Every extracted occurrence of a phrase pair in a shard, one entry per occurrence.

    Spans are half-open and relative to their segment: source words ``source_start:source_end`` of segment
    ``segment`` with target words ``target_start:target_end``. Orientations are MONOTONE / SWAP /
    DISCONTINUOUS; ``alignment_masks`` holds the links inside the pair packed as in
    ``decoder.phrases.encoding``."""

    segment: npt.NDArray[np.int64]
    source_start: npt.NDArray[np.int64]
    source_end: npt.NDArray[np.int64]
    target_start: npt.NDArray[np.int64]
    target_end: npt.NDArray[np.int64]
    prev_orientation: npt.NDArray[np.int8]
    next_orientation: npt.NDArray[np.int8]
    alignment_masks: npt.NDArray[np.uint64]

    def __len__(self) -> int:
        return len(self.segment)


@dataclass(frozen=True, slots=True)
class PhraseCounts:
    """Counts of (source phrase, target phrase, internal alignment), the output of the map and of every merge.

    ``source_phrases`` and ``target_phrases`` are unique padded rows in lexicographic order, so a phrase's row
    index is its dense id. Rows of the pair arrays are unique and sorted by (pair_source, pair_target,
    alignment_masks). ``orientation_counts`` has the six ORIENTATION_COLUMNS; each half sums to
    pair_counts."""

    source_phrases: npt.NDArray[np.int32]
    target_phrases: npt.NDArray[np.int32]
    pair_source: npt.NDArray[np.int32]
    pair_target: npt.NDArray[np.int32]
    alignment_masks: npt.NDArray[np.uint64]
    pair_counts: npt.NDArray[np.int64]
    orientation_counts: npt.NDArray[np.int64]

    def __len__(self) -> int:
        return len(self.pair_counts)


def check_alignments(corpus: ParallelArrays, alignments: AlignmentArray) -> None:
    """Raise ValueError naming the first segment whose links point outside its source or target words."""
    if len(alignments) != len(corpus):
        raise ValueError(f"{len(corpus)} segment pairs but {len(alignments)} alignments")
    segment = np.repeat(np.arange(len(alignments)), np.diff(alignments.offsets))
    links = alignments.links
    bad = (
        (links[:, 0] < 0)
        | (links[:, 1] < 0)
        | (links[:, 0] >= corpus.source.lengths[segment])
        | (links[:, 1] >= corpus.target.lengths[segment])
    )
    if bad.any():
        first = int(np.argmax(bad))
        raise ValueError(
            f"segment {int(segment[first])}: link {int(links[first, 0])}-{int(links[first, 1])} is outside "
            f"its {int(corpus.source.lengths[segment[first]])} source and "
            f"{int(corpus.target.lengths[segment[first]])} target words"
        )


def _empty_instances() -> PhraseInstances:
    empty = np.zeros(0, dtype=np.int64)
    orientation = np.zeros(0, dtype=np.int8)
    return PhraseInstances(
        empty, empty, empty, empty, empty, orientation, orientation, np.zeros(0, np.uint64)
    )


def _orientation(monotone: npt.NDArray[np.bool_], swap: npt.NDArray[np.bool_]) -> npt.NDArray[np.int8]:
    """MONOTONE where ``monotone`` (even if ``swap`` holds too), else SWAP where ``swap``, else DISCONTINUOUS.

    Monotone takes precedence when the target word next to the pair links to both sides of the source span."""
    return np.where(monotone, MONOTONE, np.where(swap, SWAP, DISCONTINUOUS)).astype(np.int8)


def _span_extremes(
    values: npt.NDArray[np.int64], limit: int, function: np.ufunc, fill: int
) -> npt.NDArray[np.int64]:
    """[length - 1, start] = ``function`` over values[start:start + length], lengths 1..limit.

    Entries whose span runs past the end hold ``fill``."""
    table = np.full((limit, len(values)), fill, dtype=np.int64)
    table[0] = values
    for length in range(2, limit + 1):
        count = max(len(values) - length + 1, 0)
        table[length - 1, :count] = function(
            table[length - 2, :count], values[length - 1 : length - 1 + count]
        )
    return table


def extract_instances(
    corpus: ParallelArrays, alignments: AlignmentArray, max_phrase_length: int
) -> PhraseInstances:
    """All consistent phrase pairs of every segment pair, both sides at most ``max_phrase_length`` tokens.

    Within a segment pair each (source span, target span) appears once; the order of occurrences is
    deterministic but otherwise unspecified."""
    check_alignments(corpus, alignments)
    limit = max_phrase_length
    source_offsets, target_offsets = corpus.source.offsets, corpus.target.offsets
    num_source, num_target = len(corpus.source.ids), len(corpus.target.ids)
    if len(alignments.links) == 0:
        return _empty_instances()
    link_segment = np.repeat(np.arange(len(alignments)), np.diff(alignments.offsets))
    link_source = alignments.links[:, 0].astype(np.int64) + source_offsets[link_segment]
    link_target = alignments.links[:, 1].astype(np.int64) + target_offsets[link_segment]

    # Per word: the extreme positions it is linked to (none: min = far, max = -1, neutral for min and max).
    far = max(num_source, num_target) + 1
    source_min_target = np.full(num_source, far, dtype=np.int64)
    source_max_target = np.full(num_source, -1, dtype=np.int64)
    target_min_source = np.full(num_target, far, dtype=np.int64)
    target_max_source = np.full(num_target, -1, dtype=np.int64)
    np.minimum.at(source_min_target, link_source, link_target)
    np.maximum.at(source_max_target, link_source, link_target)
    np.minimum.at(target_min_source, link_target, link_source)
    np.maximum.at(target_max_source, link_target, link_source)
    span_min_source = _span_extremes(target_min_source, limit, np.minimum, far)
    span_max_source = _span_extremes(target_max_source, limit, np.maximum, -1)
    span_min_target = _span_extremes(source_min_target, limit, np.minimum, far)
    span_max_target = _span_extremes(source_max_target, limit, np.maximum, -1)

    # Step 1: every source span with a link whose minimal target span links back only into it ("cores").
    source_segment_end = np.repeat(source_offsets[1:], corpus.source.lengths)
    positions = np.arange(num_source, dtype=np.int64)
    core_parts = []
    for length in range(1, limit + 1):
        low, high = span_min_target[length - 1], span_max_target[length - 1]
        span = high - low + 1
        start = np.flatnonzero((positions + length <= source_segment_end) & (high >= 0) & (span <= limit))
        low, high, span = low[start], high[start], span[start]
        consistent = (span_min_source[span - 1, low] >= start) & (
            span_max_source[span - 1, low] < start + length
        )
        core_parts.append(
            (start[consistent], start[consistent] + length - 1, low[consistent], high[consistent])
        )
    core_start, core_end, core_low, core_high = (
        np.concatenate(part) for part in zip(*core_parts, strict=True)
    )

    # Step 2: extend each core over the unaligned target words next to it, within segment and length limit.
    target_aligned = target_max_source >= 0
    target_positions = np.arange(num_target, dtype=np.int64)
    target_segment = np.repeat(np.arange(len(corpus)), corpus.target.lengths)
    last_aligned = np.maximum.accumulate(np.where(target_aligned, target_positions, -1))
    next_aligned = np.minimum.accumulate(np.where(target_aligned, target_positions, far)[::-1])[::-1]
    barrier_before = np.maximum(np.concatenate([[-1], last_aligned[:-1]]), target_offsets[target_segment] - 1)
    barrier_after = np.minimum(np.concatenate([next_aligned[1:], [far]]), target_offsets[target_segment + 1])
    room_left = core_low - barrier_before[core_low] - 1
    room_right = barrier_after[core_high] - core_high - 1
    core_length = core_high - core_low + 1
    parts = []
    for left in range(limit):
        for right in range(limit - left):
            keep = (core_length + left + right <= limit) & (room_left >= left) & (room_right >= right)
            parts.append((core_start[keep], core_end[keep], core_low[keep] - left, core_high[keep] + right))
    source_first, source_last, target_first, target_last = (
        np.concatenate(part) for part in zip(*parts, strict=True)
    )

    # Step 3: orientations from the corner links. A global (source, target) position pair can only be a link
    # when both words are in the same segment, so corners that fall into a neighbouring segment never match.
    # np.sort, not np.unique: duplicates are harmless here, and numpy 2's hash-based unique is far slower.
    link_keys = np.sort(link_source * num_target + link_target)

    def is_link(source: npt.NDArray[np.int64], target: npt.NDArray[np.int64]) -> npt.NDArray[np.bool_]:
        wanted = source * num_target + target
        return link_keys[np.minimum(np.searchsorted(link_keys, wanted), len(link_keys) - 1)] == wanted

    segment = np.repeat(np.arange(len(corpus)), corpus.source.lengths)[source_first]
    at_source_start = source_first == source_offsets[segment]
    at_source_end = source_last == source_offsets[segment + 1] - 1
    at_target_start = target_first == target_offsets[segment]
    at_target_end = target_last == target_offsets[segment + 1] - 1
    prev_monotone = np.where(at_target_start, at_source_start, is_link(source_first - 1, target_first - 1))
    prev_swap = ~at_target_start & is_link(source_last + 1, target_first - 1)
    next_monotone = np.where(at_target_end, at_source_end, is_link(source_last + 1, target_last + 1))
    next_swap = ~at_target_end & is_link(source_first - 1, target_last + 1)

    # Step 4: internal links. Each source word's links as bits relative to its first linked target word, then
    # shifted into row (word - source_first) and column (target - target_first) of the 8 x 8 matrix.
    word_bits = np.zeros(num_source, dtype=np.uint64)
    relative = link_target - source_min_target[link_source]
    fits = relative < MAX_SUPPORTED_PHRASE_LENGTH  # a word whose links spread wider is in no pair
    np.bitwise_or.at(word_bits, link_source[fits], np.uint64(1) << relative[fits].astype(np.uint64))
    masks = np.zeros(len(source_first), dtype=np.uint64)
    for offset in range(limit):
        word = np.minimum(source_first + offset, num_source - 1)
        aligned = (source_first + offset <= source_last) & (source_max_target[word] >= 0)
        shift = source_min_target[word] - target_first + MAX_SUPPORTED_PHRASE_LENGTH * offset
        masks |= np.where(
            aligned, word_bits[word] << np.where(aligned, shift, 0).astype(np.uint64), np.uint64(0)
        )

    return PhraseInstances(
        segment=segment,
        source_start=source_first - source_offsets[segment],
        source_end=source_last + 1 - source_offsets[segment],
        target_start=target_first - target_offsets[segment],
        target_end=target_last + 1 - target_offsets[segment],
        prev_orientation=_orientation(prev_monotone, prev_swap),
        next_orientation=_orientation(next_monotone, next_swap),
        alignment_masks=masks,
    )


def count_instances(corpus: ParallelArrays, instances: PhraseInstances, width: int) -> PhraseCounts:
    """Sum the occurrences in ``instances`` into PhraseCounts with phrases padded to ``width`` tokens."""
    segment = instances.segment
    source_rows = phrase_rows(
        corpus.source.ids,
        corpus.source.offsets[segment] + instances.source_start,
        instances.source_end - instances.source_start,
        width,
    )
    target_rows = phrase_rows(
        corpus.target.ids,
        corpus.target.offsets[segment] + instances.target_start,
        instances.target_end - instances.target_start,
        width,
    )
    source_phrases, source_index = unique_rows(source_rows)
    target_phrases, target_index = unique_rows(target_rows)
    pair_key = source_index * max(len(target_phrases), 1) + target_index
    order = lexicographic_order([pair_key, instances.alignment_masks])
    starts = group_starts([pair_key[order], instances.alignment_masks[order]])
    group = np.empty(len(order), dtype=np.int64)
    group[order] = np.cumsum(starts) - 1
    num_groups = int(starts.sum())
    orientation_counts = np.concatenate(
        [
            np.bincount(
                group * NUM_ORIENTATIONS + instances.prev_orientation, minlength=num_groups * 3
            ).reshape(num_groups, NUM_ORIENTATIONS),
            np.bincount(
                group * NUM_ORIENTATIONS + instances.next_orientation, minlength=num_groups * 3
            ).reshape(num_groups, NUM_ORIENTATIONS),
        ],
        axis=1,
    ).astype(np.int64)
    first = order[starts]
    return PhraseCounts(
        source_phrases=source_phrases,
        target_phrases=target_phrases,
        pair_source=source_index[first].astype(np.int32),
        pair_target=target_index[first].astype(np.int32),
        alignment_masks=instances.alignment_masks[first],
        pair_counts=np.bincount(group, minlength=num_groups).astype(np.int64),
        orientation_counts=orientation_counts,
    )


def extract_shard(
    shard: ParallelArrays, alignments: AlignmentArray, settings: PhraseSettings
) -> PhraseCounts:
    """The map step: counts of every consistent phrase pair in one shard. Pure; safe to run in any process."""
    instances = extract_instances(shard, alignments, settings.max_phrase_length)
    return count_instances(shard, instances, settings.max_phrase_length)
