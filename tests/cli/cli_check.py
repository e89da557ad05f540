# SPDX-License-Identifier: GPL-3.0-or-later
"""What the twofold-cli tests share: running the program, counting checks, the summary.

Usage from a test: `from cli_check import check, run, finish`, then `check(...)` and
`run(...)` as often as needed, and `finish()` last (exit 1 when any check failed).
"""

import os
import subprocess
import sys

cli = sys.argv[1]
counts = {"passed": 0, "failed": 0}


def check(name, condition, detail=""):
    if condition:
        counts["passed"] += 1
    else:
        counts["failed"] += 1
        print(f"FAIL {name} {str(detail)[:400]}")


def run(*args):
    """twofold-cli with args, in the C.UTF-8 locale: (exit code, stdout, stderr)."""
    r = subprocess.run([cli, *args], capture_output=True, text=True,
                       env=dict(os.environ, LC_ALL="C.UTF-8"))
    return r.returncode, r.stdout, r.stderr


def finish():
    print(f"{counts['passed']} passed, {counts['failed']} failed")
    sys.exit(1 if counts["failed"] else 0)
