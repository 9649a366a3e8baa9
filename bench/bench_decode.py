"""Decoding benchmark on the English->French UI-string model (from bench/bench_train.py) and its test set.

In one run:
- the default settings over the whole test set with 1 and 2 workers: segments per second, per-segment latency
  percentiles (p50, p95, p99), peak RSS, BLEU and chrF (sacrebleu, with its signature);
- a speed/quality grid on a sample: stack sizes for both algorithms and cube-pruning pop limits, each with its
  search error rate against a very wide beam (the share of segments whose best model score is below the wide
  beam's), BLEU on the sample, and segments per second; written as a table and a PNG plot;
- nltk's stack decoder side by side on a smaller sample with the same phrase options, LM and distortion
  (bench/nltk_adapter.py): time per segment and model score under our model (by forced decoding of nltk's
  output), as ratios.

    python bench/bench_decode.py [--language fr] [--sample 150] [--nltk-sample 30]
"""

from __future__ import annotations

import argparse
import resource
import sys
import time
from pathlib import Path

import numpy as np

sys.path.insert(0, str(Path(__file__).resolve().parent.parent))

from bench.bench_train import model_dir_for  # noqa: E402
from bench.common import REPO, commit, machine, replace_readme_rows, replace_section, ui_corpus  # noqa: E402
from decoder.batch_translation import translate_lines, use_translator  # noqa: E402
from decoder.executor import make_executor  # noqa: E402
from decoder.search.settings import SearchAlgorithm, SearchSettings, TranslationOptions  # noqa: E402
from decoder.search.translator import Translator  # noqa: E402
from decoder.translation_model import load_translation_model  # noqa: E402

WIDE = SearchSettings(algorithm=SearchAlgorithm.STACK, stack_size=2000, beam_width=1e9)


def percentile(values: list[float], share: float) -> float:
    return float(np.percentile(np.array(values), share))


def timed_translations(translator: Translator, segments: list[str], search: SearchSettings):
    """Per-segment outputs, best scores and latencies, from an empty LM-extension cache (fair across settings)."""
    translator.clear_caches()
    options = TranslationOptions(search=search)
    outputs, scores, latencies = [], [], []
    for segment in segments:
        started = time.perf_counter()
        result = translator.translate([segment], options)[0]
        latencies.append(time.perf_counter() - started)
        outputs.append(result.translation)
        scores.append(result.n_best[0].score)
    return outputs, scores, latencies


def throughput(translator: Translator, segments: list[str], workers: int) -> tuple[float, list[str]]:
    translator.clear_caches()  # the workers fork from this process: none starts with a warm cache
    use_translator(translator)
    executor = make_executor(workers)
    try:
        started = time.perf_counter()
        outputs = [result.text for result in translate_lines((s.encode() for s in segments), TranslationOptions(),
                                                              executor=executor)]
        return len(segments) / (time.perf_counter() - started), outputs
    finally:
        executor.close()


def main() -> None:
    import sacrebleu

    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--language", default="fr")
    parser.add_argument("--sample", type=int, default=150)
    parser.add_argument("--nltk-sample", type=int, default=30)
    args = parser.parse_args()
    folder = ui_corpus(args.language)
    model_dir = model_dir_for(args.language)
    if not (model_dir / "manifest.json").exists():
        sys.exit(f"no model at {model_dir}: run bench/bench_train.py first")
    translator = Translator(load_translation_model(model_dir))
    sources = (folder / "test.en").read_text(encoding="utf-8").splitlines()
    references = (folder / f"test.{args.language}").read_text(encoding="utf-8").splitlines()

    outputs, _, latencies = timed_translations(translator, sources, SearchSettings())
    per_worker = {1: len(sources) / sum(latencies)}
    per_worker[2], parallel_outputs = throughput(translator, sources, 2)
    assert parallel_outputs == outputs, "parallel decoding must give the same output"
    bleu_metric, chrf_metric = sacrebleu.BLEU(), sacrebleu.CHRF()
    bleu = bleu_metric.corpus_score(outputs, [references])
    chrf = chrf_metric.corpus_score(outputs, [references])
    peak = max(resource.getrusage(resource.RUSAGE_SELF).ru_maxrss,
               resource.getrusage(resource.RUSAGE_CHILDREN).ru_maxrss) / 1024

    step = max(1, len(sources) // args.sample)
    sample_sources, sample_references = sources[::step][:args.sample], references[::step][:args.sample]
    wide_outputs, wide_scores, _ = timed_translations(translator, sample_sources, WIDE)
    grid = []
    configurations = [("stack", size, 0) for size in (10, 50, 200)] + \
                     [("cube", size, limit) for size in (50, 200) for limit in (100, 300, 1000)]
    for algorithm, size, limit in configurations:
        search = SearchSettings(algorithm=algorithm, stack_size=size, cube_pop_limit=max(limit, 1))
        grid_outputs, grid_scores, grid_latencies = timed_translations(translator, sample_sources, search)
        errors = sum(score < wide - 1e-6 for score, wide in zip(grid_scores, wide_scores))
        grid.append({"algorithm": algorithm, "stack_size": size, "pop_limit": limit,
                     "segments_per_second": len(sample_sources) / sum(grid_latencies),
                     "search_error_rate": errors / len(sample_sources),
                     "bleu": sacrebleu.corpus_bleu(grid_outputs, [sample_references]).score})
    wide_bleu = sacrebleu.corpus_bleu(wide_outputs, [sample_references]).score
    plot_path = REPO / "bench" / "decode_speed_quality.png"
    write_plot(grid, plot_path)

    from bench.nltk_adapter import compare_with_nltk
    comparison = compare_with_nltk(translator, sample_sources[:args.nltk_sample])

    command = f"python bench/bench_decode.py --language {args.language} --sample {args.sample} " \
              f"--nltk-sample {args.nltk_sample}"
    lines = ["## Decoding (English->French UI strings)", "", f"Commit {commit()}, {machine()}. Command: `{command}`.",
             "", f"Test set: {len(sources)} segments. Default search: {SearchSettings()}.", "",
             "| workers | segments/s | p50 ms | p95 ms | p99 ms |", "|---|---|---|---|---|",
             f"| 1 | {per_worker[1]:.1f} | {percentile(latencies, 50) * 1000:.1f} | "
             f"{percentile(latencies, 95) * 1000:.1f} | {percentile(latencies, 99) * 1000:.1f} |",
             f"| 2 | {per_worker[2]:.1f} | | | |", "",
             f"Target: at least 20 segments/s per core. Peak RSS {peak:.0f} MiB.", "",
             f"Quality: {bleu.format(signature=str(bleu_metric.get_signature()))}; "
             f"{chrf.format(signature=str(chrf_metric.get_signature()))}.", "",
             f"Speed/quality on a sample of {len(sample_sources)} segments (wide beam: stack search, stack 2000, no "
             f"threshold; BLEU {wide_bleu:.2f}). Plot: `bench/decode_speed_quality.png`.", "",
             "| algorithm | stack | pop limit | segments/s | search errors | BLEU |", "|---|---|---|---|---|---|"]
    lines += [f"| {row['algorithm']} | {row['stack_size']} | {row['pop_limit'] or '-'} | "
              f"{row['segments_per_second']:.1f} | {row['search_error_rate'] * 100:.1f}% | {row['bleu']:.2f} |"
              for row in grid]
    lines += ["", f"Against nltk's StackDecoder on {comparison['segments']} segments (same options as phrase table, "
              "same LM, distortion factor e^-w; our decoder with default settings): time per segment ours "
              f"{comparison['ours_ms']:.1f} ms, nltk {comparison['nltk_ms']:.1f} ms = "
              f"**{comparison['speed_ratio']:.1f}x** (target: 30x); mean model score (ours, higher is better) of "
              f"our output {comparison['ours_score']:.3f}, of nltk's output {comparison['nltk_score']:.3f}; ours at "
              f"least as good on {comparison['at_least_as_good']} of {comparison['scored']} segments nltk translated."]
    replace_section("decode", "\n".join(lines))
    replace_readme_rows("decode", [
        "| model | test set | BLEU (signature) | segments/s | p50 / p95 ms | RSS MiB | workers | machine | commit |",
        "|---|---|---|---|---|---|---|---|---|",
        f"| ui-en-{args.language} | ui-strings test ({len(sources)}) | {bleu.score:.2f} "
        f"({str(bleu_metric.get_signature()).replace('|', '&#124;')}) | "
        f"{per_worker[1]:.1f} | {percentile(latencies, 50) * 1000:.0f} / {percentile(latencies, 95) * 1000:.0f} | "
        f"{peak:.0f} | 1 | {machine()} | {commit()} |",
        f"| ui-en-{args.language} | ui-strings test ({len(sources)}) | | {per_worker[2]:.1f} | | | 2 | {machine()} "
        f"| {commit()} |"])
    print("\n".join(lines))


def write_plot(grid: list[dict], path: Path) -> None:
    import matplotlib

    matplotlib.use("Agg")
    import matplotlib.pyplot as plt

    figure, axis = plt.subplots(figsize=(7, 4.5))
    for algorithm, marker in (("stack", "o"), ("cube", "s")):
        rows = [row for row in grid if row["algorithm"] == algorithm]
        axis.scatter([row["segments_per_second"] for row in rows], [row["bleu"] for row in rows], marker=marker,
                     label=algorithm)
        for row in rows:
            label = f"{row['stack_size']}" + (f"/{row['pop_limit']}" if row["pop_limit"] else "")
            axis.annotate(label, (row["segments_per_second"], row["bleu"]), fontsize=8,
                          xytext=(3, 3), textcoords="offset points")
    axis.set_xlabel("segments per second (one core)")
    axis.set_ylabel("BLEU on the sample")
    axis.set_title("Decoding speed vs quality (labels: stack size / cube pop limit)")
    axis.legend()
    figure.tight_layout()
    figure.savefig(path, dpi=120)
    plt.close(figure)


if __name__ == "__main__":
    main()
