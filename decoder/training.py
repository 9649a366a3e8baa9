"""`phrasework train`: a parallel corpus in, a complete memory-mappable model directory out.

Stages: read + tokenize + clean, word alignment (both directions, symmetrized), phrase extraction and scoring
with lexicalized reordering, the target-side language model (interpolated modified Kneser-Ney over the
target side plus any extra monolingual text), the truecaser, and the atomic write of the model directory.
Each stage reports its wall time and the peak RSS so far.
"""

from __future__ import annotations

import datetime as dt
import resource
import time
from collections.abc import Callable, Sequence
from dataclasses import asdict, dataclass, field
from pathlib import Path
from typing import Any, TypeVar

from tqdm.auto import tqdm

from decoder.align.aligner import AlignmentSettings, align_corpus
from decoder.corpus.cleaning import CleaningRules
from decoder.corpus.lines import iter_lines
from decoder.corpus.reader import CorpusFormat
from decoder.errors import DecoderError, InvalidTextError
from decoder.executor import make_executor
from decoder.lm.kneser_ney import train_kneser_ney
from decoder.lm.query import LanguageModel
from decoder.model.model_directory import MANIFEST_NAME
from decoder.phrases.settings import PhraseSettings
from decoder.phrases.training import build_phrase_table
from decoder.search.settings import SearchSettings
from decoder.segment_arrays import SegmentArray
from decoder.text.casing import Truecaser
from decoder.text.pipeline import prepare_segment
from decoder.training_data import TrainingData, read_training_data, split_tokens
from decoder.translation_model import save_translation_model
from decoder.vocabulary import Vocabulary

Result = TypeVar("Result")


@dataclass(frozen=True, slots=True)
class TrainingSettings:
    cleaning: CleaningRules = field(default_factory=CleaningRules)
    alignment: AlignmentSettings = field(default_factory=AlignmentSettings)
    phrases: PhraseSettings = field(default_factory=PhraseSettings)
    lm_order: int = 5
    workers: int = 1


@dataclass(frozen=True, slots=True)
class StageReport:
    name: str
    seconds: float
    peak_rss_mib: float
    details: dict[str, Any]


@dataclass(frozen=True, slots=True)
class TrainingSummary:
    model_dir: Path
    stages: tuple[StageReport, ...]
    statistics: dict[str, Any]

    def lines(self) -> list[str]:
        lines = [f"{stage.name}: {stage.seconds:.1f} s, peak RSS {stage.peak_rss_mib:.0f} MiB"
                 + "".join(f"\n  {key}: {value}" for key, value in stage.details.items()) for stage in self.stages]
        lines.append(f"model written to {self.model_dir} ({self.statistics['model_bytes'] / 2**20:.1f} MiB on disk)")
        return lines


def _peak_rss_mib() -> float:
    own = resource.getrusage(resource.RUSAGE_SELF).ru_maxrss
    return max(own, resource.getrusage(resource.RUSAGE_CHILDREN).ru_maxrss) / 1024.0


class _StageClock:
    def __init__(self, show_progress: bool, num_stages: int) -> None:
        self.reports: list[StageReport] = []
        self.progress = tqdm(total=num_stages, desc="training", unit="stage", disable=not show_progress)

    def run(self, name: str, function: Callable[[], Result], details: Callable[[Result], dict[str, Any]]) -> Result:
        self.progress.set_postfix_str(name)
        started = time.perf_counter()
        result = function()
        self.reports.append(StageReport(name, time.perf_counter() - started, _peak_rss_mib(), details(result)))
        self.progress.update(1)
        return result

    def close(self) -> None:
        self.progress.close()


def read_monolingual(paths: Sequence[Path], language: str) -> list[list[str]]:
    """Model tokens of every non-empty line of extra target-language text (lines with control characters and
    empty lines are skipped: they carry nothing for the LM)."""
    segments = []
    for path in paths:
        for _, line in iter_lines(Path(path)):
            try:
                tokens = prepare_segment(" ".join(line.split()), language).model_tokens
            except InvalidTextError:
                continue
            if tokens:
                segments.append(list(tokens))
    return segments


def extend_vocabulary(vocabulary: Vocabulary, segments: Sequence[Sequence[str]]) -> Vocabulary:
    """``vocabulary`` with the new tokens of ``segments`` appended (existing ids unchanged)."""
    new_tokens: dict[str, None] = {}
    for tokens in segments:
        for token in tokens:
            if token not in vocabulary:
                new_tokens[token] = None
    return Vocabulary(vocabulary.tokens + tuple(new_tokens)) if new_tokens else vocabulary


def _check_destination(out_dir: Path, force: bool) -> None:
    if out_dir.exists() and not force:
        kind = "a model" if (out_dir / MANIFEST_NAME).exists() else "a folder"
        raise DecoderError(f"{out_dir} already exists ({kind}); pass --force to replace it")


def train_model(
    source_path: str | Path, target_path: str | Path | None, source_language: str, target_language: str,
    out_dir: str | Path, *, corpus_format: CorpusFormat = "plain", lm_files: Sequence[Path] = (),
    settings: TrainingSettings = TrainingSettings(), force: bool = False, show_progress: bool = False,
) -> TrainingSummary:
    out_dir = Path(out_dir)
    _check_destination(out_dir, force)
    clock = _StageClock(show_progress, 6)
    executor = make_executor(settings.workers)
    try:
        data: TrainingData = clock.run("read and tokenize", lambda: read_training_data(
            source_path, target_path, source_language, target_language, corpus_format=corpus_format,
            rules=settings.cleaning, executor=executor, keep_cased_target=True),
            lambda data: {"pairs": data.num_input_pairs, "kept": data.cleaning.num_kept,
                          "dropped": {str(k): v for k, v in data.cleaning.num_dropped.items() if v},
                          "source vocabulary": len(data.source_vocabulary),
                          "target vocabulary": len(data.target_vocabulary)})
        alignment = clock.run("word alignment", lambda: align_corpus(
            data.corpus, len(data.source_vocabulary), len(data.target_vocabulary), settings.alignment,
            executor=executor, show_progress=show_progress),
            lambda result: {"links": int(len(result.symmetrized.links)),
                            "final perplexity": {
                                direction: round(result_direction.histories[-1].iterations[-1].perplexity, 3)
                                for direction, result_direction in (("source->target", result.forward),
                                                                    ("target->source", result.backward))}})
        phrase_table = clock.run("phrase pairs", lambda: build_phrase_table(
            data.corpus, alignment.symmetrized, settings.phrases, executor),
            lambda table: {"before pruning": table.stats.num_pairs_before_pruning,
                           "after pruning": table.stats.num_pairs_after_pruning,
                           "source phrases": table.stats.num_source_phrases})
        monolingual = read_monolingual(lm_files, target_language)
        target_vocabulary = extend_vocabulary(data.target_vocabulary, monolingual)
        lm_segments = SegmentArray.from_sequences(
            [data.corpus.target[k] for k in range(len(data.corpus))]
            + [target_vocabulary.encode(tokens) for tokens in monolingual])

        def build_language_model():
            ngram_model = train_kneser_ney(lm_segments, len(target_vocabulary), order=settings.lm_order,
                                           executor=executor)
            return ngram_model, LanguageModel.from_ngram_model(ngram_model)

        ngram_model, language_model = clock.run(
            "language model", build_language_model,
            lambda models: {"order": settings.lm_order, "segments": len(lm_segments),
                            "n-grams per order": [len(grams) for grams in models[0].ngrams]})
        truecaser = clock.run("truecaser", lambda: Truecaser.learn(
            split_tokens(segment) for segment in data.cased_target_segments),
            lambda table: {"surface forms": len(table)})
        statistics = {
            "pairs_read": data.num_input_pairs, "pairs_used": data.cleaning.num_kept,
            "pairs_dropped": {str(k): v for k, v in data.cleaning.num_dropped.items()},
            "source_vocabulary": len(data.source_vocabulary), "target_vocabulary": len(target_vocabulary),
            "phrase_pairs_before_pruning": phrase_table.stats.num_pairs_before_pruning,
            "phrase_pairs": len(phrase_table), "lm_segments": len(lm_segments),
            "lm_ngrams_per_order": [len(grams) for grams in ngram_model.ngrams],
        }
        manifest = {
            "model_id": out_dir.name, "source_language": source_language, "target_language": target_language,
            "created": dt.datetime.now(dt.UTC).isoformat(timespec="seconds"),
            "tokenizer": {"source_rules": source_language, "target_rules": target_language, "lowercase": True},
            "search_defaults": {key: (str(value) if key == "algorithm" else value)
                                for key, value in asdict(SearchSettings()).items()},
            "training": {"lm_order": settings.lm_order, "alignment": asdict(settings.alignment),
                         "phrases": {key: value for key, value in asdict(settings.phrases).items()
                                     if key != "spill_dir"},
                         "cleaning": asdict(settings.cleaning), "lm_files": [str(path) for path in lm_files]},
            "statistics": statistics,
        }
        written = clock.run("write model", lambda: save_translation_model(
            out_dir, manifest=manifest, source_vocabulary=data.source_vocabulary,
            target_vocabulary=target_vocabulary, phrase_table=phrase_table, language_model=language_model,
            truecaser=truecaser, force=force),
            lambda path: {"files": len(list(path.iterdir()))})
    finally:
        executor.close()
        clock.close()
    statistics["model_bytes"] = sum(path.stat().st_size for path in written.iterdir())
    return TrainingSummary(written, tuple(clock.reports), statistics)
