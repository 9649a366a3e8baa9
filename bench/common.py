"""Shared helpers of the benchmark scripts: the real corpus, machine facts, peak memory, RESULTS.md sections."""

from __future__ import annotations

import os
import platform
import re
import resource
import subprocess
import sys
from pathlib import Path

REPO = Path(__file__).resolve().parent.parent
DATA_DIR = REPO / "bench" / "data"
RESULTS = REPO / "bench" / "RESULTS.md"
DATASET_SCRIPT = REPO.parent / "shared" / "datasets" / "ui_strings.py"


def ui_corpus(language: str = "fr") -> Path:
    """The real English->X UI-string corpus (built from the machine's gettext catalogs on first use)."""
    folder = DATA_DIR / f"ui-en-{language}"
    if not (folder / "train.en").exists():
        if not DATASET_SCRIPT.exists():
            sys.exit(f"missing {folder} and {DATASET_SCRIPT}; see DEVELOPERS.md")
        subprocess.run([sys.executable, str(DATASET_SCRIPT), "--lang", language, "--out", str(folder)], check=True)
    return folder


def commit() -> str:
    try:
        return subprocess.run(["git", "rev-parse", "--short", "HEAD"], cwd=REPO, capture_output=True, text=True,
                              check=True).stdout.strip()
    except (OSError, subprocess.CalledProcessError):
        return "unknown"


def machine() -> str:
    model = platform.processor() or platform.machine()
    try:
        for line in Path("/proc/cpuinfo").read_text().splitlines():
            if line.startswith("model name"):
                model = line.split(":", 1)[1].strip()
                break
    except OSError:
        pass
    return f"{os.cpu_count()} cores, {model}"


def peak_rss_mib(include_children: bool = True) -> float:
    """Peak resident memory of this process (and, separately counted, its largest waited-for child), MiB."""
    own = resource.getrusage(resource.RUSAGE_SELF).ru_maxrss
    children = resource.getrusage(resource.RUSAGE_CHILDREN).ru_maxrss if include_children else 0
    return max(own, children) / 1024.0


def replace_section(name: str, body: str) -> None:
    """Write ``body`` between the markers of section ``name`` in bench/RESULTS.md (appending it if new)."""
    start, end = f"<!-- begin {name} -->", f"<!-- end {name} -->"
    text = RESULTS.read_text(encoding="utf-8") if RESULTS.exists() else "# Benchmark results\n"
    block = f"{start}\n{body.rstrip()}\n{end}"
    pattern = re.compile(re.escape(start) + r".*?" + re.escape(end), re.DOTALL)
    text = pattern.sub(lambda _: block, text) if pattern.search(text) else text.rstrip() + "\n\n" + block + "\n"
    RESULTS.write_text(text, encoding="utf-8")


def replace_readme_rows(name: str, rows: list[str]) -> None:
    """Put ``rows`` (a whole markdown table, header included) between the markers of ``name`` in the README."""
    readme = REPO / "README.md"
    start, end = f"<!-- begin bench {name} -->", f"<!-- end bench {name} -->"
    text = readme.read_text(encoding="utf-8")
    block = start + "\n" + "\n".join(rows) + "\n" + end
    pattern = re.compile(re.escape(start) + r".*?" + re.escape(end), re.DOTALL)
    if not pattern.search(text):
        raise SystemExit(f"README.md has no markers for {name}")
    readme.write_text(pattern.sub(lambda _: block, text), encoding="utf-8")
