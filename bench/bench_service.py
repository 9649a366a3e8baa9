"""HTTP service benchmark on loopback: gunicorn with 2 workers, single-segment requests, fixed duration.

Segments: the 5-15 word lines of the real English->French test set (bench/data/ui-en-fr/test.en), in file
order, cycled. The model is an en->fr model trained by ``phrasework train`` on bench/data/ui-en-fr (trained
into bench/work/ if missing). Measured in one run:

- the library's own throughput on the same segments and the same cores: ``Translator.translate`` one segment
  per call, in as many processes as the load level keeps workers busy, for the same duration, measured just
  before each level (the machine's load drifts; adjacent runs see the same);
- the service at concurrency 1, 4 and 16 (a thread pool, one requests.Session per thread, a fixed duration
  per level): requests per second, p50/p95/p99 latency, errors (non-200 answers and failed connections);
- memory of each worker from /proc after the load: RSS, PSS and private bytes (what one more worker adds;
  shared pages of the memory-mapped model are not private).

The load generator runs on the same machine and competes for its cores, which lowers the HTTP numbers
somewhat; the ratio to the library is therefore conservative.

    python bench/bench_service.py [--duration 15] [--workers 2] [--concurrency 1 4 16]

Writes the "service" section of bench/RESULTS.md and the README rows between the markers
<!-- begin bench service --> and <!-- end bench service -->.
"""

from __future__ import annotations

import argparse
import math
import multiprocessing
import os
import statistics
import subprocess
import sys
import threading
import time
from pathlib import Path

import requests

sys.path.insert(0, str(Path(__file__).resolve().parent.parent))

from bench.common import REPO, commit, machine, replace_readme_rows, replace_section, ui_corpus  # noqa: E402
from decoder.search.settings import TranslationOptions  # noqa: E402
from decoder.search.translator import Translator  # noqa: E402
from decoder.translation_model import load_translation_model  # noqa: E402
from service.launcher import gunicorn_command  # noqa: E402

WORK_DIR = REPO / "bench" / "work"
MODEL_DIR = WORK_DIR / "ui-en-fr-model"
MIN_WORDS, MAX_WORDS = 5, 15
READY_WAIT_SECONDS = 300


def bench_segments(folder: Path) -> list[str]:
    lines = (folder / "test.en").read_text(encoding="utf-8").splitlines()
    return [line for line in lines if MIN_WORDS <= len(line.split()) <= MAX_WORDS]


def ensure_model(folder: Path) -> Path:
    if (MODEL_DIR / "manifest.json").exists():
        return MODEL_DIR
    WORK_DIR.mkdir(parents=True, exist_ok=True)
    print(f"training {MODEL_DIR} (once) ...", file=sys.stderr)
    subprocess.run(
        [
            sys.executable,
            "-m",
            "decoder.cli",
            "train",
            "--source-file",
            str(folder / "train.en"),
            "--target-file",
            str(folder / "train.fr"),
            "--source-lang",
            "en",
            "--target-lang",
            "fr",
            "--out",
            str(MODEL_DIR),
        ],
        check=True,
    )
    return MODEL_DIR


# -- library ------------------------------------------------------------------------------------------------

_LIBRARY: dict[str, object] = {}


def _library_loop(arguments: tuple[list[str], float, int]) -> int:
    segments, seconds, offset = arguments
    translator: Translator = _LIBRARY["translator"]  # type: ignore[assignment]
    options: TranslationOptions = _LIBRARY["options"]  # type: ignore[assignment]
    done, deadline = 0, time.monotonic() + seconds
    while time.monotonic() < deadline:
        translator.translate([segments[(offset + done) % len(segments)]], options)
        done += 1
    return done


def library_throughput(model_dir: Path, segments: list[str], seconds: float, processes: int) -> float:
    """Segments per second of ``processes`` forked processes translating one segment per call."""
    model = load_translation_model(model_dir)
    _LIBRARY["translator"] = Translator(model)
    _LIBRARY["options"] = TranslationOptions(search=model.search_defaults)
    _library_loop((segments, 1.0, 0))  # warm caches and page in the model before timing
    started = time.monotonic()
    if processes == 1:
        counts = [_library_loop((segments, seconds, 0))]
    else:
        with multiprocessing.get_context("fork").Pool(processes) as pool:
            counts = pool.map(_library_loop, [(segments, seconds, k * 97) for k in range(processes)])
    return sum(counts) / (time.monotonic() - started)


# -- HTTP ---------------------------------------------------------------------------------------------------


def free_port() -> int:
    import socket

    with socket.socket() as probe:
        probe.bind(("127.0.0.1", 0))
        return probe.getsockname()[1]


def start_server(model_dir: Path, workers: int, folder: Path) -> tuple[subprocess.Popen, str]:
    port = free_port()
    environ = {key: value for key, value in os.environ.items() if not key.startswith(("PHRASEWORK_", "PROMETHEUS_"))}
    argv, env = gunicorn_command(
        [model_dir],
        None,
        folder / "glossaries.sqlite3",
        f"127.0.0.1:{port}",
        workers=workers,
        environ=environ | {"PHRASEWORK_LOG_LEVEL": "warning"},
    )
    log = open(folder / "server.log", "wb")  # noqa: SIM115 - kept open for the server's lifetime
    process = subprocess.Popen(argv, env=env, stdout=log, stderr=subprocess.STDOUT, start_new_session=True)
    base_url = f"http://127.0.0.1:{port}"
    deadline = time.monotonic() + READY_WAIT_SECONDS
    while time.monotonic() < deadline:
        if process.poll() is not None:
            sys.exit(f"server exited: {(folder / 'server.log').read_text()[-2000:]}")
        try:
            if requests.get(base_url + "/readyz", timeout=2).status_code == 200:
                return process, base_url
        except requests.ConnectionError:
            pass
        time.sleep(0.2)
    process.terminate()
    sys.exit("server did not become ready")


def load_level(base_url: str, segments: list[str], concurrency: int, seconds: float) -> dict:
    latencies: list[float] = []
    errors = [0]
    lock = threading.Lock()
    deadline = time.monotonic() + seconds

    def client(offset: int) -> None:
        with requests.Session() as session:
            done = 0
            while time.monotonic() < deadline:
                segment = segments[(offset + done) % len(segments)]
                started = time.perf_counter()
                try:
                    ok = (
                        session.post(
                            base_url + "/v1/translations", json={"segments": [segment]}, timeout=120
                        ).status_code
                        == 200
                    )
                except requests.RequestException:
                    ok = False
                elapsed = time.perf_counter() - started
                with lock:
                    if ok:
                        latencies.append(elapsed)
                    else:
                        errors[0] += 1
                done += 1

    started = time.monotonic()
    threads = [threading.Thread(target=client, args=(k * 31,)) for k in range(concurrency)]
    for thread in threads:
        thread.start()
    for thread in threads:
        thread.join()
    wall = time.monotonic() - started
    ordered = sorted(latencies)

    def percentile(fraction: float) -> float:
        # Nearest-rank percentile (the smallest value with at least this fraction of samples at or below it).
        if not ordered:
            return float("nan")
        rank = max(1, math.ceil(fraction * len(ordered)))
        return ordered[rank - 1] * 1000.0

    return {
        "concurrency": concurrency,
        "requests": len(ordered),
        "errors": errors[0],
        "requests_per_second": len(ordered) / wall,
        "p50_ms": percentile(0.50),
        "p95_ms": percentile(0.95),
        "p99_ms": percentile(0.99),
        "mean_ms": statistics.fmean(ordered) * 1000.0 if ordered else float("nan"),
    }


def worker_memory(master_pid: int) -> list[dict]:
    """RSS, PSS and private memory (MiB) of each gunicorn worker, from /proc/<pid>/smaps_rollup."""
    workers = []
    for entry in Path("/proc").iterdir():
        if not entry.name.isdigit():
            continue
        try:
            fields = (entry / "stat").read_text().rsplit(")", 1)[1].split()
        except OSError:
            continue
        if int(fields[1]) != master_pid:
            continue
        values: dict[str, float] = {}
        for line in (entry / "smaps_rollup").read_text().splitlines()[1:]:
            name, _, rest = line.partition(":")
            values[name.strip()] = int(rest.split()[0]) / 1024.0
        workers.append(
            {
                "pid": int(entry.name),
                "rss_mib": values.get("Rss", 0.0),
                "pss_mib": values.get("Pss", 0.0),
                "private_mib": values.get("Private_Clean", 0.0) + values.get("Private_Dirty", 0.0),
            }
        )
    return sorted(workers, key=lambda worker: worker["pid"])


def main() -> None:
    parser = argparse.ArgumentParser(description=__doc__.split("\n\n")[0])
    parser.add_argument("--duration", type=float, default=15.0, help="seconds per load level and library run")
    parser.add_argument("--workers", type=int, default=2)
    parser.add_argument("--concurrency", type=int, nargs="+", default=[1, 4, 16])
    args = parser.parse_args()
    folder = ui_corpus("fr")
    model_dir = ensure_model(folder)
    segments = bench_segments(folder)
    print(f"{len(segments)} test segments of {MIN_WORDS}-{MAX_WORDS} words", file=sys.stderr)
    run_dir = WORK_DIR / "service-run"
    run_dir.mkdir(parents=True, exist_ok=True)
    load_before = os.getloadavg()[0]
    process, base_url = start_server(model_dir, args.workers, run_dir)
    try:
        load_level(base_url, segments, args.workers, 3.0)  # warm-up: every worker pages in the model
        levels = []
        for concurrency in args.concurrency:
            # The library on the same cores, measured right before the level so that both see the same
            # machine load: as many processes as the level keeps workers busy.
            processes = min(concurrency, args.workers)
            level = {
                "library": library_throughput(model_dir, segments, args.duration, processes),
                "library_processes": processes,
            }
            level |= load_level(base_url, segments, concurrency, args.duration)
            print(f"concurrency {concurrency}: {level}", file=sys.stderr)
            levels.append(level)
        memory = worker_memory(process.pid)
    finally:
        process.terminate()
        process.wait(timeout=60)
    report(args, segments, levels, memory, (load_before, os.getloadavg()[0]))


def report(args, segments, levels, memory, load_average) -> None:
    where = f"{machine()}, commit {commit()}"
    rss = " / ".join(f"{worker['rss_mib']:.0f}" for worker in memory)
    private = " / ".join(f"{worker['private_mib']:.0f}" for worker in memory)
    lines = [
        "## HTTP service (bench/bench_service.py)",
        "",
        f"`python bench/bench_service.py --duration {args.duration:g} --workers {args.workers}` on {where}; "
        f"1-minute load average {load_average[0]:.1f} before and {load_average[1]:.1f} after. {len(segments)} "
        f"single-segment requests of {MIN_WORDS}-{MAX_WORDS} words from bench/data/ui-en-fr/test.en, cycled; model "
        f"`phrasework train` on bench/data/ui-en-fr; default search settings; {args.workers} sync workers; the load "
        "generator runs on the same machine. The library column is `Translator.translate` on the same segments, "
        "one per call, in as many processes as the level keeps workers busy, measured just before the level.",
        "",
        "| concurrency | requests/s | library segments/s (processes) | HTTP / library | p50 ms | p95 ms | p99 ms "
        "| p99 / p50 | errors |",
        "|---|---|---|---|---|---|---|---|---|",
    ]
    for level in levels:
        lines.append(
            f"| {level['concurrency']} | {level['requests_per_second']:.2f} | {level['library']:.2f} "
            f"({level['library_processes']}) | {level['requests_per_second'] / level['library']:.0%} | "
            f"{level['p50_ms']:.0f} | {level['p95_ms']:.0f} | {level['p99_ms']:.0f} | "
            f"{level['p99_ms'] / level['p50_ms']:.2f} | {level['errors']} |"
        )
    lines += [
        "",
        f"Workers after the load (MiB): RSS {rss}; private (what each extra worker adds) {private}; PSS "
        + " / ".join(f"{worker['pss_mib']:.0f}" for worker in memory)
        + ".",
        "",
        "Targets (issue 6): no errors; HTTP throughput at least 80% of the library's on the same cores; "
        "p99 under 3x p50 at concurrency 16; each extra worker adds under 100 MB.",
    ]
    replace_section("service", "\n".join(lines))
    rows = [
        "| concurrency | requests/s | HTTP / library | p50 / p95 / p99 ms | errors | private MiB per worker | "
        "workers | machine | commit |",
        "|---|---|---|---|---|---|---|---|---|",
    ]
    for level in levels:
        rows.append(
            f"| {level['concurrency']} | {level['requests_per_second']:.2f} | "
            f"{level['requests_per_second'] / level['library']:.0%} | {level['p50_ms']:.0f} / "
            f"{level['p95_ms']:.0f} / {level['p99_ms']:.0f} | {level['errors']} | {private} | "
            f"{args.workers} | {machine()} | {commit()} |"
        )
    try:
        replace_readme_rows("service", rows)
    except SystemExit as missing:
        print(f"note: {missing} (add <!-- begin bench service --> / <!-- end bench service -->)", file=sys.stderr)
    print("\n".join(lines))


if __name__ == "__main__":
    main()
