#!/usr/bin/env python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""The golden corpus: every case's `twofold-cli analyse FILE --json` against the output
stored when the case was made.

Usage: check-golden.py [--update] TWOFOLD_CLI CASES_DIR EXPECTED_DIR

For each CASES_DIR/<name>.twofold it runs `TWOFOLD_CLI analyse <name>.twofold --json`
(LC_ALL=C.UTF-8) and compares the output with EXPECTED_DIR/<name>.json:

- exit 0, and a case for every expected file and an expected file for every case;
- format, design, title and problems the same;
- the same result ids in the same order, in "results" and in "numbers";
- each number's label, measure, status and reason the same string;
- each value the same number: whole numbers as printed (counts, df, and probabilities
  that are exactly 0 or 1) and ±DBL_MAX (the stand-in for an overflowed factor) exactly;
  every other value to 1e-12 relative, with an absolute floor of 1e-300 for values near 0.

A mismatch prints the case, the id, the expected and the computed value and the relative
error; the last line is `N passed, N failed` (cases), and the exit status is 1 when any
case failed. The CLI prints each number as the shortest of %.15g, %.16g and %.17g that
reads back as the same double, so the stored values are the doubles themselves.

The expected files were made by the code of commit 0dd01a2 (the corpus's commit changes
no code), built with the default debugoptimized build; debug builds with the sanitizers
and release builds gave the same bytes. They are the reference, not checked values: the
core's numbers are checked against published and reference-library values in the
'core' and 'crosscheck' suites; this suite only holds them where they are.

Regenerate them (with --update, which rewrites EXPECTED_DIR from the cases as they are)
only when a change of numbers is intended, and say in that commit which numbers changed
and why. tests/golden/make-corpus.py draws the cases themselves.
"""
import concurrent.futures
import json
import math
import os
import subprocess
import sys
import time

REL = 1e-12
ABS_FLOOR = 1e-300
DBL_MAX = sys.float_info.max


def analyse(cli, path):
    r = subprocess.run([cli, "analyse", path, "--json"], capture_output=True,
                       env=dict(os.environ, LC_ALL="C.UTF-8", LANGUAGE=""))
    return r.returncode, r.stdout, r.stderr.decode("utf-8", "replace")


def is_number(v):
    return isinstance(v, (int, float)) and not isinstance(v, bool)


def compare_value(expected, got):
    """None when they agree, else the relative error (inf when it has none)."""
    if expected is None or got is None:
        return None if expected is None and got is None else math.inf
    if not (is_number(expected) and is_number(got)):
        return math.inf
    if isinstance(expected, int) or abs(expected) == DBL_MAX:
        return None if got == expected else (abs(got - expected) / abs(expected)
                                             if expected else math.inf)
    diff = abs(got - expected)
    if diff <= max(REL * abs(expected), ABS_FLOOR):
        return None
    return diff / abs(expected) if expected else math.inf


def id_difference(e_ids, g_ids):
    """What differs between two lists of ids, briefly."""
    missing = [i for i in e_ids if i not in g_ids]
    extra = [i for i in g_ids if i not in e_ids]
    if missing or extra:
        return f"missing {missing}, new {extra}"
    return f"the same ids in another order: expected {e_ids}, got {g_ids}"


def compare(name, expected, got):
    """A list of lines, one per difference."""
    out = []

    def differ(what, e, g, rel=None):
        line = f"FAIL {name} {what}: expected {e!r}, got {g!r}"
        if rel is not None:
            line += f", relative error {rel:.3g}"
        out.append(line)

    for key in sorted(set(expected) | set(got)):
        if key not in ("results", "numbers") and expected.get(key) != got.get(key):
            differ(key, expected.get(key), got.get(key))

    # "numbers": every field, the value as a number
    e_num, g_num = expected.get("numbers", []), got.get("numbers", [])
    e_ids, g_ids = [n.get("id") for n in e_num], [n.get("id") for n in g_num]
    if e_ids != g_ids:
        out.append(f"FAIL {name} number ids: {id_difference(e_ids, g_ids)}")
    g_by_id = {n.get("id"): n for n in g_num}
    reported = set()
    for e in e_num:
        g = g_by_id.get(e.get("id"))
        if g is None:
            continue
        for field in sorted(set(e) | set(g)):
            if field == "value":
                rel = compare_value(e.get("value"), g.get("value"))
                if rel is not None:
                    differ(e["id"], e.get("value"), g.get("value"), rel)
                    reported.add(e["id"])
            elif e.get(field) != g.get(field):
                differ(f"{e['id']} {field}", e.get(field), g.get(field))

    # "results": the same ids in the same order and the same values (each value is also
    # in "numbers", so a difference already reported there is not repeated)
    e_res, g_res = expected.get("results", {}), got.get("results", {})
    if list(e_res) != list(g_res):
        out.append(f"FAIL {name} result ids: {id_difference(list(e_res), list(g_res))}")
    for rid in e_res:
        if rid in g_res and rid not in reported:
            rel = compare_value(e_res[rid], g_res[rid])
            if rel is not None:
                differ(f"results {rid}", e_res[rid], g_res[rid], rel)
    return out


def check_one(cli, cases, expected_dir, name):
    """(name, lines of failure, count of numbers compared)."""
    code, out, err = analyse(cli, os.path.join(cases, name + ".twofold"))
    if code != 0:
        return name, [f"FAIL {name}: exit {code}: {err.strip()}"], 0
    try:
        got = json.loads(out)
    except ValueError as e:
        return name, [f"FAIL {name}: the output is not JSON ({e})"], 0
    with open(os.path.join(expected_dir, name + ".json"), encoding="utf-8") as f:
        expected = json.load(f)
    return name, compare(name, expected, got), len(expected.get("numbers", []))


def update(cli, cases, expected_dir, names):
    with concurrent.futures.ThreadPoolExecutor(max_workers=max(2, os.cpu_count() or 2)) as pool:
        outs = list(pool.map(lambda n: analyse(cli, os.path.join(cases, n + ".twofold")), names))
    failed = [f"{n}: exit {code}: {err.strip()}" for n, (code, _, err) in zip(names, outs) if code]
    if failed:
        sys.exit("not updated, some cases do not run:\n" + "\n".join(failed))
    os.makedirs(expected_dir, exist_ok=True)
    for name in os.listdir(expected_dir):
        if name.endswith(".json") and name[:-5] not in names:
            os.remove(os.path.join(expected_dir, name))
    for name, (_, out, _) in zip(names, outs):
        with open(os.path.join(expected_dir, name + ".json"), "wb") as f:
            f.write(out)
    print(f"{len(names)} expected files written to {expected_dir}")


def main():
    args = sys.argv[1:]
    do_update = "--update" in args
    args = [a for a in args if a != "--update"]
    if len(args) != 3:
        sys.exit("usage: check-golden.py [--update] TWOFOLD_CLI CASES_DIR EXPECTED_DIR")
    cli, cases, expected_dir = args
    start = time.monotonic()
    names = sorted(n[:-len(".twofold")] for n in os.listdir(cases) if n.endswith(".twofold"))
    if not names:
        sys.exit(f"no cases in {cases}")
    if do_update:
        update(cli, cases, expected_dir, names)
        return

    stored = {n[:-len(".json")] for n in os.listdir(expected_dir) if n.endswith(".json")}
    failed = []
    for name in sorted(stored - set(names)):
        print(f"FAIL {name}: an expected file without its case")
        failed.append(name)
    missing = [n for n in names if n not in stored]
    for name in missing:
        print(f"FAIL {name}: a case without its expected file")
        failed.append(name)

    passed, numbers = 0, 0
    todo = [n for n in names if n in stored]
    with concurrent.futures.ThreadPoolExecutor(max_workers=max(2, os.cpu_count() or 2)) as pool:
        for name, lines, count in pool.map(lambda n: check_one(cli, cases, expected_dir, n), todo):
            numbers += count
            if lines:
                failed.append(name)
                print("\n".join(lines))
            else:
                passed += 1
    print(f"{numbers} numbers (value, label, measure, status) compared in "
          f"{time.monotonic() - start:.1f} s")
    print(f"{passed} passed, {len(failed)} failed")
    sys.exit(1 if failed else 0)


if __name__ == "__main__":
    main()
