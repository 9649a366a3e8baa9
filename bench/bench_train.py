"""Training benchmark: `phrasework train` on the real English->French UI-string corpus (~57k pairs).

Reports time and peak RSS per stage, phrase pairs, model size on disk, the time to load the model (memory-mapped,
checksums verified), and the memory a second process adds when it loads the same model and translates with
it while the first holds it: its RSS growth and, since mapped model pages are shared, its private growth
(Private_Clean + Private_Dirty from /proc/self/smaps_rollup).

    python bench/bench_train.py [--language fr] [--workers 2]

Writes the "train" sections of bench/RESULTS.md and the README's performance table. The model stays in
bench/work/ui-en-<lang>-model for the decoding and service benchmarks.
"""

from __future__ import annotations

import argparse
import json
import subprocess
import sys
import time
from pathlib import Path

sys.path.insert(0, str(Path(__file__).resolve().parent.parent))

from bench.common import REPO, commit, machine, replace_readme_rows, replace_section, ui_corpus  # noqa: E402
from decoder.training import TrainingSettings, train_model  # noqa: E402

LOAD_PROBE = r"""
import json, sys, time
def memory():
    values = {}
    for line in open("/proc/self/smaps_rollup"):
        parts = line.split()
        if parts[0] in ("Rss:", "Private_Clean:", "Private_Dirty:"):
            values[parts[0][:-1]] = int(parts[1]) / 1024
    return values["Rss"], values["Private_Clean"] + values["Private_Dirty"]
from decoder.search.translator import Translator
from decoder.translation_model import load_translation_model
rss0, private0 = memory()
started = time.perf_counter()
model = load_translation_model(sys.argv[1])
load_seconds = time.perf_counter() - started
translator = Translator(model)
translator.translate(["Save the file", "Could not open %s: permission denied"])
rss1, private1 = memory()
print(json.dumps({"load_seconds": load_seconds, "rss_added_mib": rss1 - rss0,
                  "private_added_mib": private1 - private0}))
sys.stdout.flush()
time.sleep(float(sys.argv[2]) if len(sys.argv) > 2 else 0)  # hold the model mapped
"""


def model_dir_for(language: str) -> Path:
    return REPO / "bench" / "work" / f"ui-en-{language}-model"


def probe(model_dir: Path) -> dict:
    completed = subprocess.run([sys.executable, "-c", LOAD_PROBE, str(model_dir)], capture_output=True, text=True,
                               check=True, cwd=REPO)
    return json.loads(completed.stdout.strip().splitlines()[-1])


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.splitlines()[0])
    parser.add_argument("--language", default="fr")
    parser.add_argument("--workers", type=int, default=2)
    args = parser.parse_args()
    folder = ui_corpus(args.language)
    out = model_dir_for(args.language)
    started = time.perf_counter()
    summary = train_model(folder / "train.en", folder / f"train.{args.language}", "en", args.language, out,
                          settings=TrainingSettings(workers=args.workers), force=True, show_progress=True)
    total = time.perf_counter() - started
    first = probe(out)   # a cold-ish first load (page cache may hold the files from training)
    holder = subprocess.Popen([sys.executable, "-c", LOAD_PROBE, str(out), "60"], cwd=REPO, text=True,
                              stdout=subprocess.PIPE, stderr=subprocess.DEVNULL)
    holder.stdout.readline()  # the holder has loaded and translated
    second = probe(out)  # while another process holds the same model
    holder.terminate()
    holder.wait(timeout=60)

    statistics = summary.statistics
    command = f"python bench/bench_train.py --language {args.language} --workers {args.workers}"
    lines = ["## Training (English->French UI strings)", "",
             f"Commit {commit()}, {machine()}. Command: `{command}`.", "",
             "| stage | seconds | peak RSS MiB |", "|---|---|---|"]
    lines += [f"| {stage.name} | {stage.seconds:.1f} | {stage.peak_rss_mib:.0f} |" for stage in summary.stages]
    lines += [f"| **total** | **{total:.0f}** (target: under 600) | |", "",
              f"Pairs read {statistics['pairs_read']}, used {statistics['pairs_used']}; phrase pairs "
              f"{statistics['phrase_pairs_before_pruning']:,} before pruning, {statistics['phrase_pairs']:,} after; "
              f"LM n-grams per order {statistics['lm_ngrams_per_order']}; model on disk "
              f"{statistics['model_bytes'] / 2**20:.0f} MiB.", "",
              f"Loading the model (memory-mapped, checksums verified): {first['load_seconds']:.2f} s (target: under "
              f"1 s). A second process loading and translating while another holds the model adds "
              f"{second['rss_added_mib']:.0f} MiB RSS, of which {second['private_added_mib']:.0f} MiB private "
              f"(target: under 50 MB); the rest are shared pages of the mapped model."]
    replace_section("train", "\n".join(lines))
    peak = max(stage.peak_rss_mib for stage in summary.stages)
    replace_readme_rows("train", [
        "| stage | pairs | workers | time | result | peak RSS MiB | machine | commit |",
        "|---|---|---|---|---|---|---|---|",
        f"| phrasework train (align, phrases, 5-gram LM) | {statistics['pairs_used']} | {args.workers} | {total:.0f} s "
        f"| {statistics['phrase_pairs']:,} phrase pairs, {statistics['model_bytes'] / 2**20:.0f} MiB | {peak:.0f} "
        f"| {machine()} | {commit()} |",
        f"| model load + second process | | 1 | {first['load_seconds']:.2f} s | +{second['private_added_mib']:.0f} MiB "
        f"private | | {machine()} | {commit()} |",
    ])
    print("\n".join(lines))


if __name__ == "__main__":
    main()
