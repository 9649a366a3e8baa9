"""Starting the service: the gunicorn command line and environment, and ``python -m service.launcher``.

``phrasework serve`` runs ``python -m service.launcher ARGS`` (the CLI does not import this package); the
launcher checks the arguments, builds the command with ``gunicorn_command`` and replaces itself with gunicorn
(``os.execvpe``), so signals (SIGTERM for a graceful stop, SIGHUP for a reload) reach gunicorn directly.

    python -m service.launcher --model MODEL_DIR [--model ...] [--glossary-dir DIR] [--database FILE]
        [--bind 127.0.0.1:8080] [--workers N] [--threads N] [--api-keys-file FILE]
"""

from __future__ import annotations

import argparse
import os
import sys
import tempfile
from collections.abc import Mapping, Sequence
from pathlib import Path

from decoder.errors import ConfigurationError, DecoderError
from service.binding import DEFAULT_BIND, METRICS_DIR_IS_TEMPORARY, keys_configured, open_binds

APP_TARGET = "service.wsgi:create_app()"
CONFIG_MODULE = "python:service.gunicorn_config"


def gunicorn_command(
    model_dirs: Sequence[str | Path],
    glossary_dir: str | Path | None = None,
    database: str | Path | None = None,
    bind: str = DEFAULT_BIND,
    workers: int = 2,
    *,
    threads: int = 1,
    api_keys_file: str | Path | None = None,
    environ: Mapping[str, str] | None = None,
) -> tuple[list[str], dict[str, str]]:
    """(argv, env) that run gunicorn with our config module on ``model_dirs``.

    ``env`` is ``environ`` (default ``os.environ``) plus the PHRASEWORK_* variables for the arguments and
    PROMETHEUS_MULTIPROC_DIR set to a new empty folder (created here; gunicorn removes it on exit). Paths are
    made absolute, so the service does not depend on the directory it is started from. Raises
    ConfigurationError for a missing model folder, fewer than one worker, or a non-loopback ``bind`` without
    API keys (in ``environ`` or ``api_keys_file``)."""
    if not model_dirs:
        raise ConfigurationError("give at least one model directory (--model MODEL_DIR)")
    for path in model_dirs:
        if not Path(path).is_dir():
            raise ConfigurationError(f"model directory {path} does not exist")
    if glossary_dir is not None and not Path(glossary_dir).is_dir():
        raise ConfigurationError(f"glossary folder {glossary_dir} does not exist")
    if workers < 1 or threads < 1:
        raise ConfigurationError("--workers and --threads must be at least 1")
    env = dict(os.environ if environ is None else environ)
    env["PHRASEWORK_MODEL_DIRS"] = os.pathsep.join(str(Path(path).resolve()) for path in model_dirs)
    if glossary_dir is not None:
        env["PHRASEWORK_GLOSSARY_DIR"] = str(Path(glossary_dir).resolve())
    if database is not None:
        env["PHRASEWORK_DATABASE"] = str(Path(database).resolve())
    if api_keys_file is not None:
        env["PHRASEWORK_API_KEYS_FILE"] = str(Path(api_keys_file).resolve())
    env["PHRASEWORK_BIND"] = bind
    env["PHRASEWORK_WORKERS"] = str(workers)
    env["PHRASEWORK_THREADS"] = str(threads)
    exposed = open_binds(part.strip() for part in bind.split(","))
    if exposed and not keys_configured(env):
        raise ConfigurationError(
            f"no API keys configured, so the service may listen on loopback addresses only, not {', '.join(exposed)}."
            " Make a key with 'python -m service.keys --scope translate' and set PHRASEWORK_API_KEYS or "
            "--api-keys-file, or bind to 127.0.0.1."
        )
    env["PROMETHEUS_MULTIPROC_DIR"] = tempfile.mkdtemp(prefix="phrasework-metrics-")
    env[METRICS_DIR_IS_TEMPORARY] = "1"
    argv = [sys.executable, "-m", "gunicorn", "--config", CONFIG_MODULE, APP_TARGET]
    return argv, env


def build_parser() -> argparse.ArgumentParser:
    parser = argparse.ArgumentParser(prog="phrasework serve", description="Serve models over HTTP with gunicorn.")
    parser.add_argument(
        "--model",
        action="append",
        required=True,
        type=Path,
        metavar="MODEL_DIR",
        help="model directory to serve (repeatable)",
    )
    parser.add_argument("--glossary-dir", type=Path, help="folder of built-in, read-only glossary files")
    parser.add_argument(
        "--database",
        type=Path,
        help="SQLite file for uploaded glossaries (default: PHRASEWORK_DATABASE or phrasework-glossaries.sqlite3)",
    )
    parser.add_argument(
        "--bind",
        default=os.environ.get("PHRASEWORK_BIND", DEFAULT_BIND),
        help=f"address:port, comma-separated for several (default {DEFAULT_BIND})",
    )
    parser.add_argument(
        "--workers",
        type=int,
        default=int(os.environ.get("PHRASEWORK_WORKERS") or 2),
        help="worker processes (default 2; about one per core)",
    )
    parser.add_argument(
        "--threads",
        type=int,
        default=int(os.environ.get("PHRASEWORK_THREADS") or 1),
        help="threads per worker (default 1)",
    )
    parser.add_argument("--api-keys-file", type=Path, help="file of API key hash lines (python -m service.keys)")
    return parser


def main(argv: Sequence[str] | None = None) -> int:
    args = build_parser().parse_args(argv)
    try:
        command, env = gunicorn_command(
            args.model,
            args.glossary_dir,
            args.database,
            args.bind,
            args.workers,
            threads=args.threads,
            api_keys_file=args.api_keys_file,
        )
    except DecoderError as error:
        print(f"phrasework: error: {error}", file=sys.stderr)
        return 2
    os.execvpe(command[0], command, env)
    return 0  # pragma: no cover - execvpe does not return


if __name__ == "__main__":
    sys.exit(main())
