"""From a corpus file to the id arrays every training stage works on: read -> tokenize -> clean -> encode.

Reading streams (``decoder.corpus``); tokenizing runs as a map over chunks of pairs through an executor (the
step that costs the most Python time); cleaning drops pairs by token counts (``CleaningRules``); vocabularies are
built from the kept pairs, most frequent tokens first. Every input pair keeps its place: ``pair_indices`` maps
each kept pair back to its 0-based position in the input, so outputs can have one line per input pair.
"""

from __future__ import annotations

from collections import Counter
from collections.abc import Iterator
from dataclasses import dataclass, field
from itertools import islice
from pathlib import Path

import numpy as np
import numpy.typing as npt
from tqdm.auto import tqdm

from decoder.corpus.cleaning import CleaningReport, CleaningRules, DropReason
from decoder.corpus.reader import CorpusFormat, read_parallel
from decoder.corpus.records import RawPair
from decoder.errors import DecoderError, InvalidTextError
from decoder.executor import Executor, SerialExecutor
from decoder.segment_arrays import ParallelArrays, SegmentArray
from decoder.text.pipeline import prepare_segment
from decoder.vocabulary import Vocabulary

CHUNK_SIZE = 5000           # pairs per tokenization job
TOKEN_SEPARATOR = "\x1f"    # model tokens never contain it (it is a control character, rejected in text)


@dataclass(frozen=True, slots=True)
class _TokenizeJob:
    pairs: tuple[tuple[str, str, str], ...]  # (source, target, location)
    source_language: str
    target_language: str


@dataclass(frozen=True, slots=True)
class TokenizedChunk:
    """Model tokens of a chunk, one joined string per side and pair (compact to pickle), plus the target side's
    cased tokens (placeholders protected, casing kept) for learning the truecaser."""

    source: tuple[str, ...]
    target: tuple[str, ...]
    cased_target: tuple[str, ...]


INVALID = "\x00"            # marks a side the text layer refused (never a joined token string)
LINE_BREAKS = str.maketrans({"\n": " ", "\r": " ", "\t": " "})


def _tokenize_side(text: str, language: str) -> tuple[str, str]:
    """(model tokens, cased tokens), each joined; INVALID for text with control characters.

    TMX and gettext segments may contain line breaks and tabs; for training they are plain spaces."""
    try:
        prepared = prepare_segment(text.translate(LINE_BREAKS), language)
    except InvalidTextError:
        return INVALID, INVALID
    return TOKEN_SEPARATOR.join(prepared.model_tokens), TOKEN_SEPARATOR.join(prepared.cased_tokens)


def tokenize_chunk(job: _TokenizeJob) -> TokenizedChunk:
    """The map step: model tokens of every pair in the chunk."""
    sources, targets, cased = [], [], []
    for source, target, _location in job.pairs:
        sources.append(_tokenize_side(source, job.source_language)[0])
        target_tokens, target_cased = _tokenize_side(target, job.target_language)
        targets.append(target_tokens)
        cased.append(target_cased)
    return TokenizedChunk(tuple(sources), tuple(targets), tuple(cased))


def split_tokens(joined: str) -> list[str]:
    return joined.split(TOKEN_SEPARATOR) if joined else []


@dataclass(frozen=True, slots=True)
class TrainingData:
    """Kept pairs as ids, their input positions, the vocabularies and what cleaning did."""

    corpus: ParallelArrays
    pair_indices: npt.NDArray[np.int64]
    num_input_pairs: int
    source_vocabulary: Vocabulary
    target_vocabulary: Vocabulary
    cleaning: CleaningReport
    skipped_units: dict[str, int] = field(default_factory=dict)
    cased_target_segments: tuple[str, ...] = ()  # joined with TOKEN_SEPARATOR; for the truecaser

    def summary_lines(self) -> list[str]:
        lines = self.cleaning.summary_lines()
        lines += [f"units skipped by the reader ({reason}): {count}" for reason, count in self.skipped_units.items()]
        lines.append(f"vocabulary: {len(self.source_vocabulary)} source, {len(self.target_vocabulary)} target tokens")
        return lines


def _chunks(pairs: Iterator[RawPair], size: int) -> Iterator[tuple[tuple[str, str, str], ...]]:
    while chunk := tuple((pair.source, pair.target, pair.location) for pair in islice(pairs, size)):
        yield chunk


def _map_in_waves(executor: Executor, jobs: Iterator[_TokenizeJob]) -> Iterator[TokenizedChunk]:
    """Submit a few chunks per worker at a time, so reading stays streaming and memory bounded."""
    wave = max(1, 2 * executor.num_workers)
    while batch := list(islice(jobs, wave)):
        yield from executor.map(tokenize_chunk, batch)


def read_training_data(
    source_path: str | Path, target_path: str | Path | None, source_language: str, target_language: str, *,
    corpus_format: CorpusFormat = "plain", rules: CleaningRules = CleaningRules(), executor: Executor | None = None,
    show_progress: bool = False, keep_cased_target: bool = False,
) -> TrainingData:
    """Read, tokenize, clean and encode a parallel corpus. A malformed file raises InputFileError naming the
    file and line; a pair with text the tokenizer refuses (control characters) is dropped as ``invalid_text``."""
    executor = executor or SerialExecutor()
    reader = read_parallel(source_path, target_path, corpus_format, source_language, target_language)
    jobs = (_TokenizeJob(chunk, source_language, target_language) for chunk in _chunks(reader, CHUNK_SIZE))
    source_counts: Counter[str] = Counter()
    target_counts: Counter[str] = Counter()
    kept_sources: list[str] = []
    kept_targets: list[str] = []
    kept_cased: list[str] = []
    kept_indices: list[int] = []
    report = CleaningReport()
    position = 0
    with tqdm(desc="reading and tokenizing", unit=" pairs", disable=not show_progress, leave=False) as progress:
        for chunk in _map_in_waves(executor, jobs):
            for source, target, cased in zip(chunk.source, chunk.target, chunk.cased_target, strict=True):
                source_tokens, target_tokens = split_tokens(source), split_tokens(target)
                if INVALID in (source, target):
                    reason: DropReason | None = DropReason.INVALID_TEXT
                else:
                    reason = rules.reason(len(source_tokens), len(target_tokens))
                report.record(reason)
                if reason is None:
                    source_counts.update(source_tokens)
                    target_counts.update(target_tokens)
                    kept_sources.append(source)
                    kept_targets.append(target)
                    if keep_cased_target:
                        kept_cased.append(cased)
                    kept_indices.append(position)
                position += 1
            progress.update(len(chunk.source))
    if report.num_kept == 0:
        raise DecoderError(f"{source_path}: no usable sentence pairs ({position} read)")
    source_vocabulary = Vocabulary.from_counts(source_counts)
    target_vocabulary = Vocabulary.from_counts(target_counts)
    corpus = ParallelArrays(
        SegmentArray.from_sequences(source_vocabulary.encode(split_tokens(s)) for s in kept_sources),
        SegmentArray.from_sequences(target_vocabulary.encode(split_tokens(t)) for t in kept_targets))
    return TrainingData(corpus, np.array(kept_indices, dtype=np.int64), position, source_vocabulary,
                        target_vocabulary, report, {str(k): v for k, v in reader.skipped.items()}, tuple(kept_cased))
