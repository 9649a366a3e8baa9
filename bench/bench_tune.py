"""Tuning benchmark on the English->French UI-string model (from bench/bench_train.py).

Tunes copies of the model on the first ``--dev-size`` dev segments with MERT (Och 2003) and PRO (Hopkins & May
2011), exactly as `phrasework tune` does, then evaluates the untuned model and both tuned copies on the whole
test set as `phrasework evaluate` does: BLEU and chrF from sacrebleu (with its signatures), plus tuning wall
time, iterations and why each run stopped. Writes the "tune" sections of bench/RESULTS.md and the README's
performance table, and a plot of dev BLEU per iteration for both methods (bench/tune_curves.png).

    python bench/bench_tune.py [--language fr] [--dev-size 1000] [--iterations 10] [--n-best 100] [--workers 2]

Targets (issue): tuned test BLEU at least 1 point above the untuned default; a 1,000-segment dev set tuned in
under 30 minutes on 2 cores.
"""

from __future__ import annotations

import argparse
import shutil
import sys
import time
from pathlib import Path

from matplotlib.figure import Figure
from matplotlib.ticker import MaxNLocator

sys.path.insert(0, str(Path(__file__).resolve().parent.parent))

from bench.bench_train import model_dir_for  # noqa: E402
from bench.common import REPO, commit, machine, replace_readme_rows, replace_section, ui_corpus  # noqa: E402
from decoder.evaluation import EvaluationReport, evaluate_model  # noqa: E402
from decoder.tuning.loop import TuningResult  # noqa: E402
from decoder.tuning.model_tuning import tune_model  # noqa: E402

PLOT = REPO / "bench" / "tune_curves.png"
TARGET_GAIN = 1.0  # BLEU points over the untuned default
TARGET_MINUTES = 30.0


def read_lines(path: Path, limit: int | None = None) -> list[str]:
    lines = path.read_text(encoding="utf-8").splitlines()
    return lines[:limit] if limit is not None else lines


def tuned_copy(model_dir: Path, method: str) -> Path:
    """A fresh copy of the model for one tuning run (tuning rewrites the manifest of the model it is given)."""
    copy = model_dir.with_name(f"{model_dir.name}-tuned-{method}")
    shutil.rmtree(copy, ignore_errors=True)
    shutil.copytree(model_dir, copy)
    return copy


def plot_curves(runs: dict[str, TuningResult], default_test: float, tested: dict[str, float]) -> None:
    figure = Figure(figsize=(7, 4.2))
    axis = figure.subplots()
    for method, result in runs.items():
        iterations = [record.iteration + 1 for record in result.history]
        line, = axis.plot(iterations, [100 * record.dev_bleu for record in result.history], marker="o",
                          label=f"{method.upper()} dev BLEU (tokenized)")
        axis.axhline(tested[method], color=line.get_color(), linestyle="--", linewidth=1,
                     label=f"{method.upper()} test BLEU (sacrebleu), best dev iteration")
    axis.axhline(default_test, color="grey", linestyle=":", label="untuned test BLEU (sacrebleu)")
    axis.xaxis.set_major_locator(MaxNLocator(integer=True))
    axis.set_xlabel("iteration (decode of the dev set)")
    axis.set_ylabel("BLEU")
    axis.set_title("Tuning the en-fr UI-string model")
    axis.grid(alpha=0.3)
    axis.legend(fontsize=8, loc="lower right")
    figure.tight_layout()
    figure.savefig(PLOT, format="png", dpi=110)


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--language", default="fr")
    parser.add_argument("--dev-size", type=int, default=1000)
    parser.add_argument("--iterations", type=int, default=10)
    parser.add_argument("--n-best", type=int, default=100)
    parser.add_argument("--workers", type=int, default=2)
    parser.add_argument("--seed", type=int, default=0)
    parser.add_argument("--test-size", type=int, help="only the first N test segments (for a quick look)")
    parser.add_argument("--methods", nargs="+", default=["mert", "pro"], choices=["mert", "pro"])
    args = parser.parse_args()
    folder = ui_corpus(args.language)
    model_dir = model_dir_for(args.language)
    if not (model_dir / "manifest.json").exists():
        raise SystemExit(f"{model_dir} is missing: run bench/bench_train.py first")
    dev_sources = read_lines(folder / "dev.en", args.dev_size)
    dev_references = read_lines(folder / f"dev.{args.language}", args.dev_size)
    test_sources = read_lines(folder / "test.en", args.test_size)
    test_references = read_lines(folder / f"test.{args.language}", args.test_size)

    reports: dict[str, EvaluationReport] = {
        "default": evaluate_model(model_dir, test_sources, test_references, workers=args.workers)}
    print("untuned", reports["default"].lines(), file=sys.stderr)
    runs: dict[str, TuningResult] = {}
    minutes: dict[str, float] = {}
    for method in args.methods:
        copy = tuned_copy(model_dir, method)
        started = time.perf_counter()
        result, _ = tune_model(copy, dev_sources, dev_references, method=method, max_iterations=args.iterations,
                               n_best=args.n_best, workers=args.workers, seed=args.seed, show_progress=True)
        minutes[method] = (time.perf_counter() - started) / 60
        runs[method] = result
        reports[method] = evaluate_model(copy, test_sources, test_references, workers=args.workers)
        print(method, f"{minutes[method]:.1f} min", reports[method].lines(), file=sys.stderr)
    plot_curves(runs, reports["default"].bleu, {method: reports[method].bleu for method in runs})

    default = reports["default"]
    command = (f"python bench/bench_tune.py --language {args.language} --dev-size {len(dev_sources)} "
               f"--iterations {args.iterations} --n-best {args.n_best} --workers {args.workers} --seed {args.seed}"
               + (f" --test-size {args.test_size}" if args.test_size else ""))
    lines = [
        "## Tuning (English->French UI strings)", "",
        f"Commit {commit()}, {machine()}. Command: `{command}`.", "",
        f"Dev: the first {len(dev_sources)} dev segments; test: all {len(test_sources)} test segments. Each method "
        f"tunes a fresh copy of the bench model (n-best {args.n_best}, at most {args.iterations} iterations, "
        f"{args.workers} workers, seed {args.seed}); test scores are sacrebleu's on detokenized output "
        f"({default.bleu_signature}; {default.chrf_signature}).", "",
        "| weights | dev BLEU, best iteration (tokenized) | test BLEU | test chrF | gain over default | "
        "tuning wall time | iterations | stopped because |",
        "|---|---|---|---|---|---|---|---|",
        f"| untuned default | | {default.bleu:.2f} | {default.chrf:.2f} | | | | |",
    ]
    for method, result in runs.items():
        report = reports[method]
        lines.append(
            f"| {method.upper()} | {100 * result.best_dev_bleu:.2f} (iteration {result.best_iteration + 1}, "
            f"from {100 * result.history[0].dev_bleu:.2f}) | {report.bleu:.2f} | {report.chrf:.2f} | "
            f"{report.bleu - default.bleu:+.2f} | {minutes[method]:.1f} min | {len(result.history)} | "
            f"{result.stop_reason} |")
    lines += ["", "Test decoding speed with each set of weights (2 workers, same run): " + ", ".join(
        f"{name} {report.segments_per_second:.1f} segments/s" for name, report in reports.items()) + ".",
        "", f"Targets: test BLEU gain at least +{TARGET_GAIN:.0f} over the untuned default; tuning of a "
              f"1,000-segment dev set under {TARGET_MINUTES:.0f} minutes on 2 cores. Dev BLEU per iteration: "
              f"`bench/{PLOT.name}`."]
    replace_section("tune", "\n".join(lines))
    rows = ["| weights | dev segments | test BLEU | test chrF | tuning time | iterations | workers | machine "
            "| commit |", "|---|---|---|---|---|---|---|---|---|",
            f"| untuned default | | {default.bleu:.2f} | {default.chrf:.2f} | | | {args.workers} | {machine()} "
            f"| {commit()} |"]
    rows += [f"| {method.upper()} | {len(dev_sources)} | {reports[method].bleu:.2f} | {reports[method].chrf:.2f} | "
             f"{minutes[method]:.1f} min | {len(result.history)} | {args.workers} | {machine()} | {commit()} |"
             for method, result in runs.items()]
    replace_readme_rows("tune", rows)
    print("\n".join(lines))


if __name__ == "__main__":
    main()
