#!/usr/bin/env python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""twofold-cli as a user runs it: good files, bad files, bad usage.

Usage: test-cli.py TWOFOLD_CLI SOURCE_DIR
Reference values: scipy 1.10.1 (Debian 12), named beside each check.
"""
import json
import math
import os
import subprocess
import sys
import tempfile

from cli_check import check, cli, finish, run

source_dir = sys.argv[2]
demo = os.path.join(source_dir, "data", "demo", "seed-germination.twofold")




def close(a, b, rel):
    return abs(a - b) <= rel * abs(b)


# --- the demo, as JSON -------------------------------------------------------------
code, out, err = run("analyse", demo, "--json")
check("demo exit 0", code == 0, err)
doc = json.loads(out)
check("format", doc["format"] == 1)
check("design", doc["design"] == "one-proportion")
res = doc["results"]
for rid in ["p_value", "bf10", "bf01", "posterior_null", "ci_low", "ci_high",
            "cri_low", "cri_high", "min_bf01", "estimate",
            "p_value_exact", "p_value_midp", "p_value_score", "p_value_lr"]:
    check(f"id {rid} present", rid in res, str(sorted(res)))
# scipy 1.10.1: stats.binomtest(9700, 12000, 0.8).pvalue
check("p_value", close(res["p_value"], 0.0224737373321237, 1e-9), res["p_value"])
# scipy 1.10.1: binomtest(...).proportion_ci(0.95, 'exact') (Clopper-Pearson)
check("ci_low", close(res["ci_low"], 0.801174726388625, 1e-9), res["ci_low"])
check("ci_high", close(res["ci_high"], 0.815342058897227, 1e-9), res["ci_high"])
# mpmath 1.2.1 at 40 digits: exp(k ln θ0 + (n-k) ln(1-θ0) + ln B(1,1) - ln B(k+1, n-k+1))
check("bf01", close(res["bf01"], 7.98772466619784, 1e-9), res["bf01"])
check("bf10", close(res["bf10"], 1 / 7.98772466619784, 1e-9), res["bf10"])
check("posterior_null", close(res["posterior_null"], 0.888737134576349, 1e-9), res["posterior_null"])
# scipy 1.10.1: stats.beta.ppf(0.025 / 0.975, 9701, 2301)
check("cri_low", close(res["cri_low"], 0.801191220263589, 1e-9), res["cri_low"])
check("cri_high", close(res["cri_high"], 0.815275372873405, 1e-9), res["cri_high"])
p = res["p_value"]
check("min_bf01", close(res["min_bf01"], -math.e * p * math.log(p), 1e-12), res["min_bf01"])
check("estimate", res["estimate"] == 9700 / 12000)
for n in doc["numbers"]:
    check(f"number {n['id']} fields", set(["id", "label", "value", "measure", "status"]) <= set(n))
    if n["status"] == "ok":
        check(f"number {n['id']} finite", isinstance(n["value"], (int, float)) and math.isfinite(n["value"]))
check("no problems", doc["problems"] == [])
check("no NaN in JSON", "nan" not in out.lower() and "inf" not in out.lower())

# --- the demo, as text ----------------------------------------------------------------
code, out, err = run("analyse", demo)
check("text exit 0", code == 0, err)
check("text has caution", "qualified statistician" in out)
check("text has p-value", "p_value" in out and "0.02247" in out, out)
check("text has no nan", "nan" not in out.lower() and "inf " not in out.lower())

# --- bad files: exit 2, message names file, group and key, nothing on stdout -----------
GOOD = open(demo, encoding="utf-8").read()


def variant(old, new):
    assert old in GOOD, old
    return GOOD.replace(old, new)


bad_cases = [
    ("k > n", variant("Successes=9700", "Successes=12001"), "[Data] Successes"),
    ("k < 0", variant("Successes=9700", "Successes=-1"), "[Data] Successes"),
    ("k not whole", variant("Successes=9700", "Successes=9700.5"), "[Data] Successes"),
    ("n = 0", variant("Trials=12000", "Trials=0"), "[Data] Trials"),
    ("n not a number", variant("Trials=12000", "Trials=twelve"), "[Data] Trials"),
    ("n comma decimal", variant("Trials=12000", "Trials=12000,0"), "[Data] Trials"),
    ("n NaN", variant("Trials=12000", "Trials=nan"), "[Data] Trials"),
    ("n inf", variant("Trials=12000", "Trials=inf"), "[Data] Trials"),
    ("n overflow", variant("Trials=12000", "Trials=1e999"), "[Data] Trials"),
    ("n empty", variant("Trials=12000", "Trials="), "[Data] Trials"),
    ("n missing", variant("Trials=12000\n", ""), "[Data] Trials"),
    ("theta0 = 0", variant("Value=0.8", "Value=0"), "[Null] Value"),
    ("theta0 = 1", variant("Value=0.8", "Value=1"), "[Null] Value"),
    ("theta0 > 1", variant("Value=0.8", "Value=1.5"), "[Null] Value"),
    ("a = 0", variant("PriorA=1", "PriorA=0"), "[Alternative] PriorA"),
    ("b < 0", variant("PriorB=1", "PriorB=-2"), "[Alternative] PriorB"),
    ("pi0 = 0", variant("PriorNull=0.5", "PriorNull=0"), "[Models] PriorNull"),
    ("pi0 = 1", variant("PriorNull=0.5", "PriorNull=1"), "[Models] PriorNull"),
    ("pi0 NaN", variant("PriorNull=0.5", "PriorNull=NaN"), "[Models] PriorNull"),
    ("level 1", variant("Level=0.95", "Level=1"), "[Options] Level"),
    ("unknown design", variant("Design=one-proportion", "Design=three-proportions"), "[Analysis] Design"),
    ("unknown direction", variant("Direction=two-sided", "Direction=sideways"), "[Alternative] Direction"),
    ("newer format", variant("Format=1", "Format=7"), "[Analysis] Format"),
    ("models sum", variant("PriorNull=0.5", "PriorNull=0.5\nSet=null;less;greater\nPriors=0.5;0.3;0.3"),
     "[Models] Priors"),
    ("models word", variant("PriorNull=0.5", "PriorNull=0.5\nSet=null;sideways"), "[Models] Set"),
    ("models count", variant("PriorNull=0.5", "PriorNull=0.5\nSet=null;less\nPriors=1"), "[Models] Priors"),
    ("interval low", variant("Kind=point\nValue=0.8", "Kind=interval\nLow=0\nHigh=0.9"), "[Null] Low"),
    ("interval order", variant("Kind=point\nValue=0.8", "Kind=interval\nLow=0.9\nHigh=0.8"), "[Null] High"),
    ("not a key file", "this is not a key file\n", "not a Twofold analysis"),
    ("no Analysis group", "[Data]\nTrials=3\n", "[Analysis]"),
    ("not UTF-8", None, "UTF-8"),
]
with tempfile.TemporaryDirectory() as tmp:
    for name, text, expect in bad_cases:
        path = os.path.join(tmp, "bad.twofold")
        with open(path, "wb") as f:
            f.write(b"[Analysis]\nTitle=\xff\xfe\n" if text is None else text.encode("utf-8"))
        for args in (("analyse", path), ("analyse", path, "--json")):
            code, out, err = run(*args)
            check(f"{name}: exit 2", code == 2, f"got {code}: {err}")
            check(f"{name}: stdout empty", out == "", out)
            check(f"{name}: names file", path in err, err)
            check(f"{name}: names {expect}", expect in err, err)
            check(f"{name}: no nan", "nan\n" not in err.lower())

    code, out, err = run("analyse", os.path.join(tmp, "missing.twofold"))
    check("missing file: exit 2", code == 2)
    check("missing file: message", "missing.twofold" in err and out == "", err)

    # Edge values that are valid: exit 0, every number finite or undefined with a reason.
    for name, old, new in [
        ("n = 1, k = 0", "Successes=9700\nTrials=12000", "Successes=0\nTrials=1"),
        ("n = 1, k = 1", "Successes=9700\nTrials=12000", "Successes=1\nTrials=1"),
        ("k = 0", "Successes=9700", "Successes=0"),
        ("k = n", "Successes=9700", "Successes=12000"),
        ("n = 1e12", "Successes=9700\nTrials=12000", "Successes=800000400000\nTrials=1000000000000"),
        ("n = 1e12 far", "Successes=9700\nTrials=12000", "Successes=900000000000\nTrials=1000000000000"),
        ("tiny prior", "PriorA=1\nPriorB=1", "PriorA=0.01\nPriorB=0.01"),
        ("huge prior", "PriorA=1\nPriorB=1", "PriorA=8e10\nPriorB=2e10"),
        ("greater", "Direction=two-sided", "Direction=greater"),
        ("less", "Direction=two-sided", "Direction=less"),
    ]:
        path = os.path.join(tmp, "edge.twofold")
        with open(path, "w", encoding="utf-8") as f:
            f.write(variant(old, new))
        code, out, err = run("analyse", path, "--json")
        check(f"{name}: exit 0", code == 0, err)
        if code == 0:
            doc = json.loads(out)
            for n in doc["numbers"]:
                ok = (n["status"] == "ok" and math.isfinite(n["value"])) or \
                     (n["status"] == "undefined" and n["value"] is None and n.get("reason"))
                check(f"{name}: {n['id']} finite or explained", ok, str(n))
            for rid in ("p_value", "bf01", "posterior_null"):
                check(f"{name}: {rid} defined", rid in doc["results"], str(doc["numbers"]))
            if "posterior_null" in doc["results"]:
                v = doc["results"]["posterior_null"]
                check(f"{name}: posterior_null in [0,1]", 0 <= v <= 1, v)

# --- figures: sizes exact, files well formed, nothing written on error ----------------
import shutil
import struct
import xml.etree.ElementTree as ET

with tempfile.TemporaryDirectory() as tmp:
    png = os.path.join(tmp, "d.png")
    code, out, err = run("figure", demo, "--kind", "densities", "--output", png)
    check("png default exit 0", code == 0, err)
    with open(png, "rb") as f:
        head = f.read(80)
    check("png signature", head[:8] == b"\x89PNG\r\n\x1a\n")
    w, h = struct.unpack(">II", head[16:24])
    # 120 x 80 mm at 300 dpi: round(120 / 25.4 * 300) = 1417, round(80 / 25.4 * 300) = 945
    check("png default size", (w, h) == (1417, 945), (w, h))
    check("png has pHYs 300 dpi", b"pHYs" in head and
          struct.unpack(">I", head[head.index(b"pHYs") + 4:][:4])[0] == round(300 / 0.0254))
    code, out, err = run("figure", demo, "--kind", "densities", "--output", png,
                         "--width-mm", "85", "--height-mm", "60", "--dpi", "600")
    with open(png, "rb") as f:
        w, h = struct.unpack(">II", f.read(24)[16:24])
    check("png 85 x 60 mm at 600 dpi", (w, h) == (round(85 / 25.4 * 600), round(60 / 25.4 * 600)), (w, h))

    svg = os.path.join(tmp, "d.svg")
    code, out, err = run("figure", demo, "--kind", "densities", "--output", svg, "--width-mm", "85")
    check("svg exit 0", code == 0, err)
    root = ET.parse(svg).getroot()
    # 85 mm = 85 / 25.4 * 72 pt = 240.944882 pt; cairo writes 6 decimals
    wattr, hattr = root.get("width"), root.get("height")
    check("svg width 85 mm", wattr.endswith("pt") and abs(float(wattr[:-2]) - 85 / 25.4 * 72) < 1e-5, wattr)
    check("svg height 80 mm", hattr.endswith("pt") and abs(float(hattr[:-2]) - 80 / 25.4 * 72) < 1e-5, hattr)

    pdf = os.path.join(tmp, "d.pdf")
    code, out, err = run("figure", demo, "--kind", "densities", "--output", pdf,
                         "--width-mm", "174", "--height-mm", "100")
    check("pdf exit 0", code == 0, err)
    if shutil.which("pdfinfo"):
        info = subprocess.run(["pdfinfo", pdf], capture_output=True, text=True).stdout
        size = [l for l in info.splitlines() if l.startswith("Page size:")][0].split()
        wpt, hpt = float(size[2]), float(size[4])
        # 174 mm = 493.228 pt, 100 mm = 283.465 pt (1 in = 25.4 mm = 72 pt)
        check("pdf page 174 x 100 mm", abs(wpt - 174 / 25.4 * 72) < 0.01 and abs(hpt - 100 / 25.4 * 72) < 0.01,
              size)

    # every kind: drawn (exit 0, a PNG of the asked size) or not applicable (exit 1,
    # a reason on stderr, nothing written); each style is accepted
    for kind in ["densities", "sensitivity", "sample-size", "null-distribution",
                 "model-probabilities"]:
        for style in ["light", "dark", "print"]:
            out_png = os.path.join(tmp, f"{kind}-{style}.png")
            code, out, err = run("figure", demo, "--kind", kind, "--output", out_png,
                                 "--style", style, "--dpi", "100")
            check(f"figure {kind} --style {style}: exit 0 or 1", code in (0, 1), f"{code} {err}")
            if code == 0:
                with open(out_png, "rb") as f:
                    w, h = struct.unpack(">II", f.read(24)[16:24])
                check(f"figure {kind} {style}: size", (w, h) == (round(120 / 25.4 * 100), round(80 / 25.4 * 100)), (w, h))
            else:
                check(f"figure {kind} {style}: reason given", err.strip() != "", err)
                check(f"figure {kind} {style}: nothing written", not os.path.exists(out_png))

    for args, want in [
        (("--kind", "densities", "--output", os.path.join(tmp, "x.png"), "--style", "neon"), 2),
        (("--kind", "pie", "--output", os.path.join(tmp, "x.png")), 2),
        (("--kind", "densities", "--output", os.path.join(tmp, "x.gif")), 2),
        (("--kind", "densities", "--output", os.path.join(tmp, "x.png"), "--width-mm", "0"), 2),
        (("--kind", "densities", "--output", os.path.join(tmp, "x.png"), "--dpi", "1e6"), 2),
        (("--kind", "densities", "--output", "/nonexistent-dir/x.png"), 1),
        (("--output", os.path.join(tmp, "x.png")), 2),
    ]:
        code, out, err = run("figure", demo, *args)
        check(f"figure {args}: exit {want}", code == want, f"{code} {err}")
        check(f"figure {args}: message", err.strip() != "")
    check("nothing written on error", not os.path.exists(os.path.join(tmp, "x.png"))
          and not os.path.exists(os.path.join(tmp, "x.gif")))

# --- evidence grades on the Bayes factor axes -------------------------------------------
with tempfile.TemporaryDirectory() as tmp:
    for grades in ("kass-raftery", "jeffreys", "none"):
        out_png = os.path.join(tmp, f"s-{grades}.png")
        code, out, err = run("figure", demo, "--kind", "sensitivity", "--output", out_png,
                             "--grades", grades, "--dpi", "100")
        check(f"grades {grades}: exit 0", code == 0, err)
    # Jeffreys' and Kass & Raftery's grades sit at different heights: the files differ.
    a = open(os.path.join(tmp, "s-kass-raftery.png"), "rb").read()
    b = open(os.path.join(tmp, "s-jeffreys.png"), "rb").read()
    check("grades change the figure", a != b)
    code, out, err = run("figure", demo, "--kind", "sensitivity", "--output",
                         os.path.join(tmp, "x.png"), "--grades", "loud")
    check("grades loud: exit 2", code == 2, f"{code} {err}")

# --- bad usage ------------------------------------------------------------------------
for args in [(), ("frobnicate",), ("analyse",), ("analyse", demo, "--colour")]:
    code, out, err = run(*args)
    check(f"usage {args}: exit 2", code == 2, f"{code} {err}")
    check(f"usage {args}: says usage", "Usage" in err or "usage" in err, err)

finish()
