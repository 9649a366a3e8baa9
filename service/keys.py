"""``python -m service.keys --scope translate [--scope glossaries] [--comment TEXT]``: make an API key.

Prints two lines on stdout: the key (give it to the client; it is not stored anywhere) and its hash line (add
it to the file named by PHRASEWORK_API_KEYS_FILE, or to PHRASEWORK_API_KEYS). Explanations go to stderr, so
``key, line = output.splitlines()`` works in scripts.
"""

from __future__ import annotations

import argparse
import sys
from collections.abc import Sequence

from service.auth import SCOPES, new_key


def main(argv: Sequence[str] | None = None) -> int:
    parser = argparse.ArgumentParser(prog="python -m service.keys", description="Make an API key and its hash line.")
    parser.add_argument(
        "--scope",
        action="append",
        choices=SCOPES,
        required=True,
        help="scope the key grants (repeatable): translate, glossaries",
    )
    parser.add_argument("--comment", default="", help="note kept at the end of the hash line (who holds the key)")
    args = parser.parse_args(argv)
    if "#" in args.comment or "\n" in args.comment or ";" in args.comment:
        parser.error("--comment must not contain '#', ';' or line breaks")
    key, line = new_key(args.scope, args.comment)
    print("key for the client (shown once, not stored):", file=sys.stderr)
    print(key)
    print("hash line for PHRASEWORK_API_KEYS_FILE or PHRASEWORK_API_KEYS:", file=sys.stderr)
    print(line)
    return 0


if __name__ == "__main__":
    sys.exit(main())
