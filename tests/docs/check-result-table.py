#!/usr/bin/env python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Keeps DEVELOPERS.md's table "Where each number is computed" true to the code.

Each row names a result id, the designs it is for, a file and a function. The check:
the file exists; the function is defined in it (GNU style: its name at the start of a
line, then " ("); the id is written inside that function's body, as a string literal
("p_value"), as its interval stem ("hdi" for hdi_low and hdi_high), or, for an id with
a placeholder (posterior_model_<m>), as the literal part before it. Then every id that
the golden corpus's analyses report (tests/golden/expected/*.json) has a row.

Usage: check-result-table.py SOURCE_DIR
"""
import glob
import json
import os
import re
import sys

HEADING = "## Where each number is computed"


def table_rows(text):
    part = text.split(HEADING, 1)
    if len(part) < 2:
        sys.exit("DEVELOPERS.md has no section '%s'" % HEADING)
    rows = []
    for line in part[1].split("\n## ", 1)[0].splitlines():
        cells = [c.strip() for c in line.strip().strip("|").split("|")]
        if len(cells) != 4 or not cells[0].startswith("`"):
            continue
        ids = re.findall(r"`([^`]+)`", cells[0])
        path = cells[2].strip("`")
        function = cells[3].strip("`")
        rows.append((ids, cells[1], path, function))
    return rows


def function_body(source, name):
    lines = source.split("\n")
    for i, line in enumerate(lines):
        if re.match(r"^%s \(" % re.escape(name), line):
            for j in range(i + 1, len(lines)):
                if lines[j].startswith("}"):
                    return "\n".join(lines[i:j + 1])
    return None


def literals_for(result_id):
    if "<" in result_id:
        return ['"' + result_id.split("<", 1)[0]]
    out = ['"%s"' % result_id]
    for suffix in ("_low", "_high"):
        if result_id.endswith(suffix):
            out.append('"%s"' % result_id[: -len(suffix)])
    return out


def pattern(result_id):
    return re.compile("^" + re.sub(r"<[^>]+>", "[a-z_]+", re.escape(result_id)) + "$")


def main():
    top = sys.argv[1]
    rows = table_rows(open(os.path.join(top, "DEVELOPERS.md"), encoding="utf-8").read())
    failed = 0
    checked = 0
    for ids, _designs, path, function in rows:
        full = os.path.join(top, path)
        if not os.path.isfile(full):
            print("FAIL %s: no file %s" % (ids, path))
            failed += 1
            continue
        body = function_body(open(full, encoding="utf-8").read(), function)
        if body is None:
            print("FAIL %s: %s defines no %s" % (ids, path, function))
            failed += 1
            continue
        for result_id in ids:
            checked += 1
            if not any(lit in body for lit in literals_for(result_id)):
                print("FAIL %s: %s in %s does not write it" % (result_id, function, path))
                failed += 1
    patterns = [pattern(i) for ids, _d, _p, _f in rows for i in ids]
    reported = set()
    for name in glob.glob(os.path.join(top, "tests", "golden", "expected", "*.json")):
        with open(name, encoding="utf-8") as f:
            reported.update(n["id"] for n in json.load(f)["numbers"])
    for result_id in sorted(reported):
        checked += 1
        if not any(p.match(result_id) for p in patterns):
            print("FAIL %s is reported but has no row in the table" % result_id)
            failed += 1
    if not reported:
        print("FAIL no golden outputs found to check the table's completeness")
        failed += 1
    print("%d passed, %d failed" % (checked - failed, failed))
    return 1 if failed else 0


if __name__ == "__main__":
    sys.exit(main())
