#!/usr/bin/env python3
# SPDX-License-Identifier: GPL-3.0-or-later
"""Writes the golden corpus: analysis files over every design, and what the current
twofold-cli computes for each of them.

Usage: /usr/bin/python3 tests/golden/make-corpus.py TWOFOLD_CLI

    TWOFOLD_CLI   the built program, e.g. _build/app/twofold-cli

It empties tests/golden/cases/, draws the cases (standard library only, fixed seed: the
same files on every run), keeps those that `twofold-cli analyse` accepts (exit 0; the
rest are listed and dropped, and none are expected), names them `<design>-NNNN.twofold`
in the order drawn, and has `check-golden.py --update` write each one's
`twofold-cli analyse FILE --json` output to expected/<design>-NNNN.json, byte for byte.
Each case's title numbers it across the corpus and lists what it covers.

The expected files are the reference that tests/golden/check-golden.py (the meson test
'golden') holds every later build to, to 1e-12 relative. Regenerate them only when a
change of numbers is intended, and say in that commit which numbers changed and why:

    /usr/bin/python3 tests/golden/check-golden.py --update _build/app/twofold-cli \
        tests/golden/cases tests/golden/expected

rewrites expected/ from the cases as they are (no new draw). Running this script again
redraws the cases as well; it gives the same files as long as the drawing code and the
validation in core/ are unchanged.
"""
import concurrent.futures
import math
import os
import random
import subprocess
import sys
import tempfile

HERE = os.path.dirname(os.path.abspath(__file__))
CASES = os.path.join(HERE, "cases")
EXPECTED = os.path.join(HERE, "expected")
SEED = 20240617

DESIGNS = ["one-proportion", "two-proportions", "one-mean", "paired-means", "two-means",
           "one-rate", "two-rates"]
DIRECTIONS = ["two-sided", "greater", "less"]
LEVELS = [0.5, 0.8, 0.9, 0.99, 0.999, 0.9999999]
PRIOR_NULLS = [0.001, 0.1, 0.25, 0.75, 0.9, 0.999]

rng = random.Random(SEED)


def num(x):
    """A number as the file takes it: whole numbers below 2^53 without a point, the
    rest as Python's shortest round trip (which g_ascii_strtod reads back exactly)."""
    if isinstance(x, int):
        return str(x)
    if float(x).is_integer() and abs(x) < 2.0 ** 53:
        return str(int(x))
    return repr(float(x))


def log_uniform(lo, hi):
    return 10.0 ** rng.uniform(math.log10(lo), math.log10(hi))


def log_int(lo, hi):
    """A whole number log-uniform in [lo, hi]."""
    return max(lo, min(hi, int(round(log_uniform(lo, hi)))))


def rounded(x, digits=4):
    """x to a few significant digits, so that files stay readable."""
    return float(f"{x:.{digits}g}")


class Case:
    def __init__(self, design, tags):
        self.design = design
        self.tags = list(tags)
        self.data = []
        self.null = []
        self.alt = []
        self.models = []
        self.options = []

    def text(self, title):
        out = ["# Golden corpus case, written by tests/golden/make-corpus.py (do not edit:",
               "# its expected output is in tests/golden/expected/).",
               "[Analysis]", "Format=1", f"Design={self.design}", f"Title={title}", ""]
        for group, keys in (("Data", self.data), ("Null", self.null),
                            ("Alternative", self.alt), ("Models", self.models),
                            ("Options", self.options)):
            if keys:
                out.append(f"[{group}]")
                out.extend(f"{k}={v if isinstance(v, str) else num(v)}" for k, v in keys)
                out.append("")
        return "\n".join(out)


def common(c, direction=None, level=None, prior_null=None):
    """Direction, PriorNull and Level: given, or drawn. One case in five leaves out those
    that are at their defaults (two-sided, 0.5, 0.95), for the reader to fill in."""
    explicit = rng.random() < 0.8
    if direction is None:
        direction = rng.choice(DIRECTIONS)
    if level is None:
        level = 0.95 if rng.random() < 0.7 else rng.choice(LEVELS)
    if prior_null is None:
        prior_null = 0.5 if rng.random() < 0.7 else rng.choice(PRIOR_NULLS)
    if explicit or direction != "two-sided":
        c.alt.insert(0, ("Direction", direction))
    if explicit or prior_null != 0.5:
        c.models.insert(0, ("PriorNull", prior_null))
    if explicit or level != 0.95:
        c.options.append(("Level", level))
    c.tags.append(direction)
    if level != 0.95:
        c.tags.append(f"level {num(level)}")
    if prior_null != 0.5:
        c.tags.append(f"P(null) {num(prior_null)}")
    return c


# --- priors by size: tiny, typical, huge --------------------------------------------------

def beta_prior(size):
    if size == "tiny":
        a, b = rng.choice([(0.01, 0.01), (0.05, 0.5), (0.5, 0.5), (0.001, 0.2), (0.3, 0.02)])
    elif size == "typical":
        a, b = rng.choice([(1, 1), (2, 2), (1, 19), (5, 3), (0.5, 0.5), (10, 40), (2.5, 1)])
    else:
        a, b = rng.choice([(1e4, 1e4), (1e6, 3e6), (1e9, 1e9), (2e12, 1e12), (1e15, 1e15),
                           (3e3, 7e3), (1e15, 1)])
    return a, b


def add_beta(c, size, write_family=True):
    a, b = beta_prior(size)
    if write_family:
        c.alt.append(("Prior", "beta"))
    c.alt += [("PriorA", a), ("PriorB", b)]
    c.tags.append(f"beta({num(a)}, {num(b)})")


def add_effect_prior(c, family, size):
    r = {"tiny": rng.choice([0.001, 0.01, 0.05, 0.1]),
         "typical": rng.choice([0.5, 0.7071067811865476, 1.0, 0.3]),
         "huge": rng.choice([10.0, 100.0, 1000.0, 5.0])}[size]
    c.alt += [("Prior", family), ("PriorScale", r)]
    c.tags.append(f"{family}({num(r)})")


def gamma_prior(size, scale):
    """(shape, rate) with a prior mean near scale (a typical rate of the data) or not."""
    if size == "tiny":
        shape = rng.choice([0.001, 0.01, 0.1, 0.5])
        rate = rng.choice([0.001, 0.01, shape / scale])
    elif size == "typical":
        shape = rng.choice([1.0, 2.0, 0.5, 5.0])
        rate = rng.choice([1.0, shape / scale, 0.1 * shape / scale])
    else:
        shape = rng.choice([1e4, 1e7, 1e9, 1e12])
        rate = rng.choice([shape / scale, 3.0 * shape / scale, shape])
    return rounded(shape, 6), rounded(rate, 6)


def add_gamma(c, size, scale):
    shape, rate = gamma_prior(size, scale)
    c.alt += [("Prior", "gamma"), ("PriorShape", shape), ("PriorRate", rate)]
    c.tags.append(f"gamma({num(shape)}, {num(rate)})")


SIZES = ["tiny", "typical", "huge"]
REGIMES = ["small", "moderate", "large", "huge"]


# --- one proportion ------------------------------------------------------------------------

def trials(regime):
    return {"small": lambda: rng.randint(1, 20),
            "moderate": lambda: rng.randint(21, 1000),
            "large": lambda: log_int(1000, 10 ** 6),
            "huge": lambda: log_int(10 ** 8, 10 ** 12)}[regime]()


def z_shift():
    """How many standard errors the data lie from where they are centred."""
    return rng.choice([0.0, 0.7, -1.5, 2.2, -3.0, 4.5, rng.gauss(0, 2)])


def successes_near(n, p):
    """A count a few standard errors from n p, sometimes at an end or anywhere."""
    u = rng.random()
    if u < 0.05:
        return 0
    if u < 0.1:
        return n
    if u < 0.15:
        return rng.randint(0, n)
    p = min(1.0, max(0.0, p))
    sd = max(1.0, (n * p * (1 - p)) ** 0.5)
    return max(0, min(n, int(round(n * p + z_shift() * sd))))


def null_proportion():
    return rng.choice([0.5, 0.2, 0.8, 0.05, 0.02, 0.99, 1e-6, 0.999999,
                       rounded(rng.uniform(0.01, 0.99), 3)])


def one_proportion(kind, size, regime, direction=None):
    c = Case("one-proportion", [regime + " counts"])
    n = trials(regime)
    if kind == "interval":
        mid = rounded(rng.uniform(0.05, 0.95), 3)
        se = (mid * (1 - mid) / n) ** 0.5
        h = rng.choice([0.001, 0.01, 0.05, 0.2, se * rng.choice([0.5, 2.0, 5.0])])
        h = min(h, 0.99 * mid, 0.99 * (1 - mid))
        lo, hi = rounded(mid - h, 6), rounded(mid + h, 6)
        if not hi > lo:
            lo, hi = mid - 1e-6, mid + 1e-6
        k = successes_near(n, mid + h * rng.choice([0.0, 0.5, 1.0, -1.0, 1.5]))
        c.null = [("Kind", "interval"), ("Low", lo), ("High", hi)]
        c.tags.append(f"interval null ({num(lo)}, {num(hi)})")
    else:
        p0 = null_proportion()
        k = successes_near(n, p0)
        c.null = [("Kind", "point"), ("Value", p0)]
        c.tags.append(f"point null {num(p0)}")
    c.data = [("Successes", k), ("Trials", n)]
    add_beta(c, size)
    return common(c, direction)


def one_proportion_models(kind, size, regime):
    c = one_proportion(kind, size, regime)
    models = ["null", "less", "greater", "two-sided"]
    m = rng.randint(2, 4)
    chosen = rng.sample(models, m)
    c.models.append(("Set", ";".join(chosen)))
    c.tags.append("models " + ";".join(chosen))
    if rng.random() < 0.7:
        # multiples of 1/64, so that they sum to exactly 1
        cuts = sorted(rng.sample(range(1, 64), m - 1))
        parts = [b - a for a, b in zip([0] + cuts, cuts + [64])]
        priors = [p / 64 for p in parts]
        c.models.append(("Priors", ";".join(num(p) for p in priors)))
        c.tags.append("priors " + ";".join(num(p) for p in priors))
    return c


def edge_one_proportion():
    out = []

    def make(k, n, p0, a=1, b=1, direction="two-sided", tags=(), **kw):
        c = Case("one-proportion", tags)
        c.data = [("Successes", k), ("Trials", n)]
        c.null = [("Kind", "point"), ("Value", p0)]
        c.alt = [("Prior", "beta"), ("PriorA", a), ("PriorB", b)]
        c.tags.append(f"k={k} n={n} point null {num(p0)}")
        out.append(common(c, direction, **kw))

    for d in DIRECTIONS:
        make(0, 1, 0.5, direction=d, tags=["one trial, no success"])
        make(1, 1, 0.5, direction=d, tags=["one trial, one success"])
        make(10 ** 12, 10 ** 12, 0.999999, direction=d, tags=["all of 10^12"])
        make(0, 10 ** 12, 1e-6, direction=d, tags=["none of 10^12"])
        make(500000000123, 10 ** 12, 0.5, direction=d, tags=["10^12 trials near the null"])
    make(0, 50, 0.02, tags=["zero successes"])
    make(50, 50, 0.98, tags=["successes = trials"])
    make(3, 7, 1e-9, tags=["null near 0"])
    make(7, 7, 1 - 1e-9, tags=["null near 1"])
    make(9700, 12000, 0.8, 0.5, 0.5, tags=["Jeffreys prior"])
    make(123456, 1000000, 0.12, 1e15, 1e15, tags=["largest prior shapes"])
    make(40, 100, 0.4, 1e-3, 1e-3, tags=["smallest prior shapes"], level=0.5)
    make(40, 100, 0.4, tags=["very high level"], level=0.9999999)
    make(12, 30, 0.25, tags=["small prior null"], prior_null=0.001)
    make(12, 30, 0.25, tags=["large prior null"], prior_null=0.999)
    # defaults: only the required keys
    c = Case("one-proportion", ["defaults only", "two-sided"])
    c.data = [("Successes", 17), ("Trials", 40)]
    c.null = [("Value", 0.3)]
    out.append(c)
    # interval nulls at the ends of (0, 1)
    for lo, hi, k, n in [(1e-9, 1e-6, 0, 1000), (0.999, 0.9999999, 10 ** 9, 10 ** 9),
                         (0.49, 0.51, 5 * 10 ** 11, 10 ** 12), (0.1, 0.9, 1, 1)]:
        for d in ["two-sided", rng.choice(["greater", "less"])]:
            c = Case("one-proportion", [f"interval null ({num(lo)}, {num(hi)})", f"k={k} n={n}"])
            c.data = [("Successes", k), ("Trials", n)]
            c.null = [("Kind", "interval"), ("Low", lo), ("High", hi)]
            add_beta(c, rng.choice(SIZES))
            out.append(common(c, d))
    return out


def all_one_proportion():
    out = []
    i = 0
    for d in DIRECTIONS:
        for kind in ["point", "interval"]:
            for size in SIZES:
                for _ in range(2):
                    out.append(one_proportion(kind, size, REGIMES[i % 4], d))
                    i += 1
    for j in range(22):
        out.append(one_proportion_models("interval" if j % 3 == 0 else "point",
                                         SIZES[j % 3], REGIMES[(j // 3) % 4]))
    out += edge_one_proportion()
    return out


# --- two proportions -----------------------------------------------------------------------

def two_proportions(size, regime, direction=None):
    c = Case("two-proportions", [regime + " counts"])
    na, nb = trials(regime), trials(rng.choice([regime, regime, rng.choice(REGIMES)]))
    p = rng.uniform(0.01, 0.99)
    shift = rng.choice([0.0, 0.01, 0.05, 0.2])
    ka = successes_near(na, min(0.999, max(0.001, p + shift)))
    kb = successes_near(nb, p)
    c.data = [("SuccessesA", ka), ("TrialsA", na), ("SuccessesB", kb), ("TrialsB", nb)]
    c.null = [("Kind", "point"), ("Value", 0)] if rng.random() < 0.6 else []
    c.tags.append(f"{ka}/{na} against {kb}/{nb}")
    add_beta(c, size, write_family=rng.random() < 0.8)
    return common(c, direction)


def edge_two_proportions():
    out = []
    for ka, na, kb, nb, tags in [
            (0, 10, 0, 10, "no successes in either group"),
            (0, 25, 7, 25, "zero cell in A"),
            (12, 12, 5, 12, "A all successes"),
            (30, 30, 30, 30, "both all successes"),
            (0, 1, 1, 1, "one trial a group"),
            (1, 1, 1, 1, "one success each"),
            (3, 5, 400000000, 1000000000, "tiny A against 10^9 B"),
            (10 ** 12, 10 ** 12, 999999999999, 10 ** 12, "10^12 a group, nearly all"),
            (0, 10 ** 12, 1, 10 ** 12, "10^12 a group, nearly none"),
            (400000123456, 10 ** 12, 400000000000, 10 ** 12, "10^12 a group, close"),
            (5, 8, 1, 9, "small table")]:
        for d in ["two-sided", rng.choice(["greater", "less"])]:
            c = Case("two-proportions", [tags])
            c.data = [("SuccessesA", ka), ("TrialsA", na), ("SuccessesB", kb), ("TrialsB", nb)]
            add_beta(c, rng.choice(SIZES))
            out.append(common(c, d))
    c = Case("two-proportions", ["defaults only", "two-sided"])
    c.data = [("SuccessesA", 18), ("TrialsA", 40), ("SuccessesB", 9), ("TrialsB", 41)]
    out.append(c)
    return out


def all_two_proportions():
    out = []
    i = 0
    for d in DIRECTIONS:
        for size in SIZES:
            for _ in range(3):
                out.append(two_proportions(size, REGIMES[i % 4], d))
                i += 1
    out += edge_two_proportions()
    return out


# --- means ---------------------------------------------------------------------------------

def sample_values(n, mean, sd):
    """n normal draws, to about a hundredth of the SD (so never all equal)."""
    places = 2 - math.floor(math.log10(sd))
    return [round(rng.gauss(mean, sd), places) for _ in range(n)]


def values_text(values):
    return ";".join(num(v) for v in values)


def mean_size(regime):
    return {"small": lambda: rng.randint(2, 12),
            "moderate": lambda: rng.randint(13, 500),
            "large": lambda: log_int(500, 10 ** 6),
            "huge": lambda: log_int(10 ** 8, 10 ** 12)}[regime]()


def mean_effect(n):
    """A standardised effect: none, small, one giving t of a few units, or large."""
    return rng.choice([0.0, 0.05, 2.0 / max(1.0, n) ** 0.5, -2.5 / max(1.0, n) ** 0.5,
                       0.8, -1.2, rounded(rng.gauss(0, 0.5), 3)])


def means_null(c, kind, one_sample):
    if kind == "interval":
        lo = -rng.choice([0.01, 0.1, 0.2, 0.5, 0.0])
        hi = rng.choice([0.01, 0.1, 0.3, 0.5])
        c.null = [("Kind", "interval"), ("Low", lo), ("High", hi)]
        c.tags.append(f"interval null on delta ({num(lo)}, {num(hi)})")
        return 0.0
    if one_sample:
        v = rng.choice([0.0, 100.0, -3.5, 12.25, 1e6])
    else:
        v = rng.choice([0.0, 0.0, 0.0, 1.5, -2.0])
    if one_sample or v != 0.0 or rng.random() < 0.5:
        c.null = [("Kind", "point"), ("Value", v)]
    c.tags.append(f"point null {num(v)}")
    return v


def one_mean(kind, family, size, regime, direction=None, values=False, known=False,
             design="one-mean"):
    paired = design == "paired-means"
    c = Case(design, [regime + " sample"])
    mu0 = means_null(c, kind, not paired)
    if kind == "interval":
        direction = "two-sided"
    sd = rounded(log_uniform(0.01, 1000), 4)
    if values:
        n = rng.randint(1 if known else 2, 40)
        d = mean_effect(n)
        if paired:
            base = sample_values(n, rng.choice([0.0, 50.0, 1e4]), 3 * sd)
            after = [rounded(b + mu0 + d * sd + rng.gauss(0, sd), 6) for b in base]
            c.data = [("ValuesA", values_text(after)), ("ValuesB", values_text(base))]
            c.tags.append(f"{n} pairs of values")
        else:
            c.data = [("Values", values_text(sample_values(n, mu0 + d * sd, sd)))]
            c.tags.append(f"{n} values")
    else:
        n = mean_size(regime) if not known else rng.choice([1, mean_size(regime)])
        d = mean_effect(n)
        m = rounded(mu0 + d * sd + rng.gauss(0, 0.1) * sd / max(1, n) ** 0.5, 8)
        s = rounded(sd * rng.uniform(0.7, 1.3), 6)
        if paired:
            c.data = [("N", n), ("MeanDiff", m), ("SDDiff", s)]
        else:
            c.data = [("N", n), ("Mean", m), ("SD", s)]
        c.tags.append(f"n={n}")
    if known:
        c.data.append(("KnownSD", rounded(sd * rng.uniform(0.8, 1.2), 5)))
        c.tags.append("known SD")
    add_effect_prior(c, family, size)
    return common(c, direction)


def two_means(kind, family, size, regime, direction=None, values=(False, False), equal=None):
    c = Case("two-means", [regime + " samples"])
    diff0 = means_null(c, kind, False)
    if kind == "interval":
        direction = "two-sided"
    sd = rounded(log_uniform(0.01, 1000), 4)
    base = rng.choice([0.0, 10.0, -250.0, 1e5])
    ratio = rng.choice([1.0, 1.0, 0.5, 3.0, 10.0])
    data = []
    for g, use_values in zip("AB", values):
        n = rng.randint(2, 30) if use_values else mean_size(regime)
        s = sd * (ratio if g == "A" else 1.0)
        d = mean_effect(n) if g == "A" else 0.0
        mu = base + (diff0 + d * sd if g == "A" else 0.0)
        if use_values:
            data.append((f"Values{g}", values_text(sample_values(n, mu, s))))
            c.tags.append(f"{n} values in {g}")
        else:
            data += [(f"N{g}", n), (f"Mean{g}", rounded(mu + rng.gauss(0, 0.2) * s / n ** 0.5, 8)),
                     (f"SD{g}", rounded(s * rng.uniform(0.8, 1.2), 6))]
            c.tags.append(f"n{g}={n}")
    c.data = data
    if equal is None:
        equal = rng.random() < 0.5
    if equal or rng.random() < 0.7:
        c.data.append(("EqualVariances", "true" if equal else "false"))
    c.tags.append("equal variances" if equal else "Welch")
    add_effect_prior(c, family, size)
    return common(c, direction)


def edge_means():
    out = []

    def one(design, data, tags, family="cauchy", r=0.7071067811865476, null=None,
            direction="two-sided", **kw):
        c = Case(design, tags)
        c.data = data
        if null is not None:
            c.null = null
        c.alt = [("Prior", family), ("PriorScale", r)]
        c.tags.append(f"{family}({num(r)})")
        out.append(common(c, direction, **kw))

    pv = [("Value", 0)]
    for d in DIRECTIONS:
        one("one-mean", [("N", 10 ** 12), ("Mean", 1e-7), ("SD", 1.0)], ["n=10^12"],
            null=pv, direction=d)
        one("one-mean", [("N", 2), ("Mean", 5.0), ("SD", 0.001)], ["n=2, large t"],
            "normal", 1.0, pv, d)
        one("one-mean", [("N", 1), ("Mean", 0.3), ("SD", 0), ("KnownSD", 1.0)],
            ["n=1 with known SD"], null=pv, direction=d)
        one("paired-means", [("N", 10 ** 12), ("MeanDiff", -2e-7), ("SDDiff", 1.5)], ["n=10^12"],
            "normal", 0.5, direction=d)
        one("paired-means", [("ValuesA", "1;2"), ("ValuesB", "0.5;1.25")], ["two pairs"],
            direction=d)
        one("two-means", [("NA", 10 ** 12), ("MeanA", 1e-6), ("SDA", 1.0), ("NB", 10 ** 12),
                          ("MeanB", 0.0), ("SDB", 1.1), ("EqualVariances", "false")],
            ["10^12 a group", "Welch"], direction=d)
        one("two-means", [("NA", 2), ("MeanA", 3.0), ("SDA", 0.0), ("NB", 2), ("MeanB", 1.0),
                          ("SDB", 0.5), ("EqualVariances", "true")],
            ["SD 0 in A", "equal variances"], "normal", 2.0, direction=d)
    one("one-mean", [("N", 30), ("Mean", 100.0), ("SD", 15.0)], ["t = 0"], null=[("Value", 100)])
    one("one-mean", [("Values", "4.2;4.2;4.2"), ("KnownSD", 0.3)], ["equal values, known SD"],
        null=[("Value", 4)])
    one("one-mean", [("Values", "7.5"), ("KnownSD", 2.0)], ["one value, known SD"],
        null=[("Value", 5)], direction="greater")
    one("one-mean", [("Values", "1000000.1;1000000.3;999999.8;1000000.4")],
        ["values with a large offset"], null=[("Value", 1e6)])
    one("one-mean", [("N", 25), ("Mean", -4.0), ("SD", 2.0)], ["very high level"],
        null=[("Value", -5)], level=0.9999999)
    one("one-mean", [("N", 25), ("Mean", -4.0), ("SD", 2.0)], ["level 0.5, small P(null)"],
        null=[("Value", -5)], level=0.5, prior_null=0.001)
    one("paired-means", [("N", 8), ("MeanDiff", 0.4), ("SDDiff", 1.0)], ["smallest scale"],
        "cauchy", 1e-3, direction="greater")
    one("paired-means", [("N", 8), ("MeanDiff", 0.4), ("SDDiff", 1.0)], ["largest scale"],
        "normal", 1000.0, direction="less")
    one("two-means", [("ValuesA", "5.1;4.9;5.3;5.0"), ("NB", 50), ("MeanB", 4.6), ("SDB", 0.4)],
        ["values in A, summary in B"])
    one("two-means", [("NA", 3), ("MeanA", 1.0), ("SDA", 1.0), ("NB", 10 ** 9), ("MeanB", 0.0),
                      ("SDB", 1.0), ("EqualVariances", "true")], ["3 against 10^9"])
    one("two-means", [("ValuesA", "2;2;2"), ("ValuesB", "1;2;3"), ("EqualVariances", "true")],
        ["equal values in A", "equal variances"])
    # defaults only
    for design, data in [("one-mean", [("N", 20), ("Mean", 1.3), ("SD", 2.0)]),
                         ("paired-means", [("N", 20), ("MeanDiff", 0.5), ("SDDiff", 1.0)]),
                         ("two-means", [("NA", 20), ("MeanA", 1.0), ("SDA", 1.0),
                                        ("NB", 22), ("MeanB", 0.4), ("SDB", 1.2)])]:
        c = Case(design, ["defaults only", "two-sided"])
        c.data = data
        if design == "one-mean":
            c.null = [("Value", 0)]
        out.append(c)
    return out


def all_means():
    out = []
    i = 0
    for design in ["one-mean", "paired-means"]:
        for d in DIRECTIONS:
            for family in ["normal", "cauchy"]:
                for size in SIZES:
                    out.append(one_mean("point", family, size, REGIMES[i % 4], d,
                                        design=design, values=(i % 5 == 4),
                                        known=(design == "one-mean" and i % 7 == 3)))
                    i += 1
        for family in ["normal", "cauchy"]:
            for size in SIZES:
                out.append(one_mean("interval", family, size, REGIMES[i % 4],
                                    design=design, values=(i % 3 == 0),
                                    known=(design == "one-mean" and i % 4 == 1)))
                i += 1
        for j in range(8):
            out.append(one_mean("point", rng.choice(["normal", "cauchy"]), rng.choice(SIZES),
                                rng.choice(REGIMES), design=design, values=True,
                                known=(design == "one-mean" and j % 3 == 0)))
    for d in DIRECTIONS:
        for family in ["normal", "cauchy"]:
            for size in SIZES:
                out.append(two_means("point", family, size, REGIMES[i % 4], d,
                                     values=((i % 4 == 0), (i % 4 == 0 or i % 5 == 0)),
                                     equal=(i % 2 == 0)))
                i += 1
    for family in ["normal", "cauchy"]:
        for size in SIZES:
            for equal in [True, False]:
                out.append(two_means("interval", family, size, REGIMES[i % 4],
                                     values=((i % 3 == 0), (i % 3 == 0)), equal=equal))
                i += 1
    for j in range(10):
        out.append(two_means("point", rng.choice(["normal", "cauchy"]), rng.choice(SIZES),
                             rng.choice(REGIMES), values=(True, j % 2 == 0)))
    out += edge_means()
    return out


# --- rates ---------------------------------------------------------------------------------

def exposure(regime):
    return {"small": lambda: rounded(log_uniform(1e-3, 10), 4),
            "moderate": lambda: rounded(log_uniform(10, 1e4), 5),
            "large": lambda: rounded(log_uniform(1e4, 1e8), 6),
            "huge": lambda: rounded(log_uniform(1e9, 1e12), 7)}[regime]()


def events_near(mean):
    """A count a few standard errors from mean, sometimes none, sometimes far off."""
    u = rng.random()
    if u < 0.07:
        return 0
    if u < 0.14:
        mean *= rng.choice([0.3, 3.0])
    sd = max(1.0, mean ** 0.5)
    return max(0, min(10 ** 15, int(round(mean + z_shift() * sd))))


def one_rate(kind, size, regime, direction=None):
    c = Case("one-rate", [regime + " exposure"])
    e = exposure(regime)
    rate = rounded(log_uniform(1e-3, 1e3) * min(1.0, 1e12 / (e * 1e3)), 4)
    at = rate
    if kind == "interval":
        se = 1.0 / max(1.0, rate * e) ** 0.5
        w = rng.choice([0.01, 0.1, 0.5, min(0.9, se * rng.choice([0.5, 2.0, 5.0]))])
        lo, hi = rounded(rate * (1 - w), 6), rounded(rate * (1 + w), 6)
        at = rate * (1 + w * rng.choice([0.0, 0.5, 1.0, -1.0, 1.5]))
        c.null = [("Kind", "interval"), ("Low", lo), ("High", hi)]
        c.tags.append(f"interval null ({num(lo)}, {num(hi)})")
    else:
        c.null = [("Kind", "point"), ("Value", rate)]
        c.tags.append(f"point null {num(rate)}")
    k = events_near(at * e)
    c.data = [("Events", k), ("Exposure", e)]
    c.tags.append(f"{k} events over {num(e)}")
    add_gamma(c, size, rate)
    return common(c, direction)


def two_rates(kind, size, regime, direction=None):
    c = Case("two-rates", [regime + " exposures"])
    ea = exposure(regime)
    eb = exposure(rng.choice([regime, regime, rng.choice(REGIMES)]))
    rate = rounded(log_uniform(1e-3, 1e3) * min(1.0, 1e12 / (max(ea, eb) * 1e3)), 4)
    ratio = 1.0
    if kind == "interval":
        se = (1.0 / max(1.0, rate * ea) + 1.0 / max(1.0, rate * eb)) ** 0.5
        w = rng.choice([0.01, 0.1, 0.2, 0.5, min(0.9, se * rng.choice([0.5, 2.0, 5.0]))])
        lo, hi = rounded(1 - w, 6), rounded(1 / (1 - w), 6)
        ratio = 1.0 + w * rng.choice([0.0, 0.5, 1.0, -1.0, 1.5])
        c.null = [("Kind", "interval"), ("Low", lo), ("High", hi)]
        c.tags.append(f"interval null on the ratio ({num(lo)}, {num(hi)})")
    else:
        rho0 = rng.choice([0, 0, 1, 2.5, 0.1])
        if rho0 != 0 or rng.random() < 0.5:
            c.null = [("Kind", "point"), ("Value", rho0)]
        c.tags.append(f"point null ratio {num(rho0)}")
        ratio = rho0 or 1.0
    ka = events_near(rate * ratio * ea)
    kb = events_near(rate * eb)
    c.data = [("EventsA", ka), ("ExposureA", ea), ("EventsB", kb), ("ExposureB", eb)]
    c.tags.append(f"{ka} over {num(ea)} against {kb} over {num(eb)}")
    add_gamma(c, size, rate)
    return common(c, direction)


def edge_rates():
    out = []

    def one(design, data, null, shape=1.0, rate=1.0, direction="two-sided", tags=(), **kw):
        c = Case(design, tags)
        c.data = data
        c.null = null
        c.alt = [("Prior", "gamma"), ("PriorShape", shape), ("PriorRate", rate)]
        c.tags.append(f"gamma({num(shape)}, {num(rate)})")
        out.append(common(c, direction, **kw))

    for d in DIRECTIONS:
        one("one-rate", [("Events", 0), ("Exposure", 100.0)], [("Value", 0.01)], direction=d,
            tags=["no events"])
        one("one-rate", [("Events", 10 ** 12), ("Exposure", 1e12)], [("Value", 1.0)], 1e12, 1e12,
            direction=d, tags=["10^12 events over 10^12"])
        one("two-rates", [("EventsA", 0), ("ExposureA", 10.0), ("EventsB", 0),
                          ("ExposureB", 12.0)], [], direction=d, tags=["no events in either group"])
        one("two-rates", [("EventsA", 10 ** 12), ("ExposureA", 1e12), ("EventsB", 999999000000),
                          ("ExposureB", 1e12)], [("Value", 1)], 1e6, 1e6, direction=d,
            tags=["10^12 events a group"])
    one("one-rate", [("Events", 3), ("Exposure", 1e-3)], [("Value", 2000.0)], 0.001, 0.001,
        tags=["tiny exposure"])
    one("one-rate", [("Events", 5), ("Exposure", 1e12)], [("Value", 1e-11)], 2.0, 1e11,
        direction="greater", tags=["rare events over 10^12"])
    one("one-rate", [("Events", 40), ("Exposure", 10.0)], [("Value", 3.0)], 1e13, 1.0,
        tags=["prior mean above 10^12"])
    one("one-rate", [("Events", 40), ("Exposure", 10.0)], [("Kind", "interval"), ("Low", 3.0),
                                                          ("High", 5.0)], direction="less",
        tags=["interval null, one-sided"])
    one("two-rates", [("EventsA", 0), ("ExposureA", 50.0), ("EventsB", 9), ("ExposureB", 50.0)],
        [("Value", 0)], direction="less", tags=["no events in A"])
    one("two-rates", [("EventsA", 7), ("ExposureA", 0.5), ("EventsB", 3), ("ExposureB", 1e9)],
        [], 0.5, 1e-3, tags=["exposures 0.5 and 10^9"])
    one("two-rates", [("EventsA", 40), ("ExposureA", 10.0), ("EventsB", 30), ("ExposureB", 10.0)],
        [], 1e13, 1.0, tags=["prior mean above 10^12"])
    one("two-rates", [("EventsA", 40), ("ExposureA", 10.0), ("EventsB", 30), ("ExposureB", 10.0)],
        [("Kind", "interval"), ("Low", 0.8), ("High", 1.25)], direction="greater",
        tags=["interval null, one-sided"], level=0.99)
    for design, data, null in [
            ("one-rate", [("Events", 12), ("Exposure", 4.5)], [("Value", 2)]),
            ("two-rates", [("EventsA", 12), ("ExposureA", 4.5), ("EventsB", 5),
                           ("ExposureB", 4.0)], [])]:
        c = Case(design, ["defaults only", "two-sided"])
        c.data, c.null = data, null
        out.append(c)
    return out


def all_rates():
    out = []
    i = 0
    for design, make in [("one-rate", one_rate), ("two-rates", two_rates)]:
        for d in DIRECTIONS:
            for kind in ["point", "interval"]:
                for size in SIZES:
                    out.append(make(kind, size, REGIMES[i % 4], d))
                    i += 1
                    if kind == "point" or design == "two-rates":
                        out.append(make(kind, size, REGIMES[i % 4], d))
                        i += 1
    out += edge_rates()
    return out


# --- writing and checking --------------------------------------------------------------------

def analyse(cli, path):
    r = subprocess.run([cli, "analyse", path, "--json"], capture_output=True,
                       env=dict(os.environ, LC_ALL="C.UTF-8", LANGUAGE=""))
    return r.returncode, r.stdout, r.stderr.decode("utf-8", "replace")


def main():
    args = sys.argv[1:]
    if len(args) != 1 or args[0].startswith("-"):
        print(__doc__.strip().split("\n\n")[1], file=sys.stderr)
        sys.exit(2)
    cli = os.path.abspath(args[0])

    drawn = all_one_proportion() + all_two_proportions() + all_means() + all_rates()
    drawn.sort(key=lambda c: DESIGNS.index(c.design))  # stable: keeps the order drawn

    with tempfile.TemporaryDirectory() as tmp:
        paths = []
        for i, c in enumerate(drawn):
            path = os.path.join(tmp, f"candidate-{i:04d}.twofold")
            with open(path, "w", encoding="utf-8") as f:
                f.write(c.text("Golden case"))
            paths.append(path)
        with concurrent.futures.ThreadPoolExecutor(max_workers=os.cpu_count() or 2) as pool:
            checked = list(pool.map(lambda p: analyse(cli, p), paths))

    kept = []
    for c, (code, _, err) in zip(drawn, checked):
        if code == 0:
            kept.append(c)
        else:
            print(f"dropped ({c.design}, exit {code}): {'; '.join(c.tags)}: {err.strip()}",
                  file=sys.stderr)

    os.makedirs(CASES, exist_ok=True)
    for name in os.listdir(CASES):
        if name.endswith(".twofold"):
            os.remove(os.path.join(CASES, name))
    counts = {d: 0 for d in DESIGNS}
    names = []
    for c in kept:
        counts[c.design] += 1
        number = len(names) + 1
        name = f"{c.design}-{counts[c.design]:04d}"
        title = f"Golden case {number}: " + ", ".join(c.tags)
        with open(os.path.join(CASES, name + ".twofold"), "w", encoding="utf-8") as f:
            f.write(c.text(title))
        names.append(name)

    subprocess.run([sys.executable, os.path.join(HERE, "check-golden.py"), "--update",
                    cli, CASES, EXPECTED], check=True)
    print(f"{len(kept)} cases ({len(drawn) - len(kept)} dropped): "
          + ", ".join(f"{d} {n}" for d, n in counts.items()))


if __name__ == "__main__":
    main()
