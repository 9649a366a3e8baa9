"""Translating a stream of lines: one output line per input line, always, in order, optionally in parallel.

Lines are read as bytes and decoded one by one, so a line that is not UTF-8 (or has control characters) gives
an error for that line only: its output line is empty (text) or carries an ``error`` field (JSON lines), and the
caller reports it. Batches of lines go through an executor; worker processes find the translator in a module
global set before the pool forks, so the memory-mapped model is shared, not copied.
"""

from __future__ import annotations

import json
from collections.abc import Iterable, Iterator, Sequence
from dataclasses import asdict, dataclass
from itertools import islice

from decoder.errors import DecoderError
from decoder.executor import Executor, SerialExecutor
from decoder.search.settings import SegmentTranslation, TranslationOptions
from decoder.search.translator import Translator

BATCH_SIZE = 32
_worker_translator: Translator | None = None  # set by ``use_translator`` before worker processes start


def use_translator(translator: Translator) -> None:
    global _worker_translator
    _worker_translator = translator


@dataclass(frozen=True, slots=True)
class LineResult:
    line_number: int
    text: str            # the output line, without its newline
    error: str | None    # why the line could not be translated


@dataclass(frozen=True, slots=True)
class _Batch:
    first_line: int
    lines: tuple[bytes, ...]
    options: TranslationOptions
    output_format: str


def result_json(result: SegmentTranslation) -> dict:
    """The JSON-lines record of one segment (also what tools reading our output rely on)."""
    record = {"source": result.source, "translation": result.translation, "num_pieces": result.num_pieces,
              "n_best": [{"text": entry.text, "score": entry.score, "features": dict(entry.features)}
                         for entry in result.n_best]}
    for entry, out in zip(result.n_best, record["n_best"]):
        if entry.segmentation is not None:
            out["segmentation"] = [asdict(span) for span in entry.segmentation]
        if entry.alignment is not None:
            out["alignment"] = [asdict(link) for link in entry.alignment]
    return record


def translate_batch(batch: _Batch) -> list[LineResult]:
    """The map step: translate one batch of raw lines with the process's translator."""
    translator = _worker_translator
    if translator is None:
        raise RuntimeError("use_translator() was not called before translating")
    results = []
    for offset, raw in enumerate(batch.lines):
        number = batch.first_line + offset
        try:
            segment = raw.decode("utf-8")
            translated = translator.translate([segment], batch.options)[0]
        except UnicodeDecodeError as error:
            results.append(_failed(number, f"invalid UTF-8 at byte {error.start + 1}", batch.output_format))
            continue
        except DecoderError as error:
            results.append(_failed(number, str(error), batch.output_format))
            continue
        if batch.output_format == "jsonl":
            results.append(LineResult(number, json.dumps(result_json(translated), ensure_ascii=False), None))
        else:
            results.append(LineResult(number, translated.translation, None))
    return results


def _failed(number: int, message: str, output_format: str) -> LineResult:
    text = json.dumps({"error": message, "line": number}, ensure_ascii=False) if output_format == "jsonl" else ""
    return LineResult(number, text, message)


def _strip_newline(line: bytes) -> bytes:
    if line.endswith(b"\n"):
        line = line[:-1]
    return line[:-1] if line.endswith(b"\r") else line


def translate_lines(
    lines: Iterable[bytes], options: TranslationOptions, output_format: str = "text",
    executor: Executor | None = None, batch_size: int = BATCH_SIZE,
) -> Iterator[LineResult]:
    """Results in input order, one per line, streaming (a few batches per worker in flight at a time)."""
    executor = executor or SerialExecutor()
    iterator = iter(lines)
    first_line = 1
    wave = max(1, 2 * executor.num_workers)
    while True:
        batches = []
        for _ in range(wave):
            chunk = tuple(_strip_newline(line) for line in islice(iterator, batch_size))
            if not chunk:
                break
            batches.append(_Batch(first_line, chunk, options, output_format))
            first_line += len(chunk)
        if not batches:
            return
        for results in executor.map(translate_batch, batches):
            yield from results


@dataclass(frozen=True, slots=True)
class NBestJob:
    segments: tuple[str, ...]
    options: TranslationOptions


def n_best_batch(job: NBestJob) -> list[SegmentTranslation]:
    """The map step of tuning and evaluation: full results for a batch of segments."""
    translator = _worker_translator
    if translator is None:
        raise RuntimeError("use_translator() was not called before translating")
    return translator.translate(job.segments, job.options)


def translate_all(segments: Sequence[str], options: TranslationOptions, executor: Executor | None = None,
                  batch_size: int = BATCH_SIZE) -> list[SegmentTranslation]:
    """Results for every segment, in order, batches spread over the executor's workers."""
    executor = executor or SerialExecutor()
    jobs = [NBestJob(tuple(segments[start:start + batch_size]), options)
            for start in range(0, len(segments), batch_size)]
    return [result for batch in executor.map(n_best_batch, jobs) for result in batch]
