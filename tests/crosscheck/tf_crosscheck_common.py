# SPDX-License-Identifier: GPL-3.0-or-later
"""What Twofold's cross-check scripts share: the reference libraries (or exit 77),
one run of the C driver over all cases, log-uniform draws, the usual error measures,
and the tally of worst errors against stated tolerances.

    from tf_crosscheck_common import references, run_driver, log_uniform, abs_rel, Tally
    np, scipy, special, mp = references()          # exits 77 when one is missing
    np, scipy, special, mp, st = references('scipy.stats')   # and more modules
    outs = run_driver(sys.argv[1], 'rates', lines) # one output line per input line
    tally = Tally({'q': ('label', 1e-9), ...})     # quantity -> (label, tolerance)
    tally.record('q', line, err)                   # NaN counts as a failure
    sys.exit(tally.report())                       # prints the table; 0 or 1
"""
import importlib
import math
import subprocess
import sys
import time
import warnings


def references(*more):
    """numpy, scipy, scipy.special and mpmath, then the modules named in more, or exit 77
    (meson's "skipped") when one is missing."""
    names = ('numpy', 'scipy', 'scipy.special', 'mpmath') + more
    try:
        modules = tuple(importlib.import_module(name) for name in names)
    except ImportError as e:
        print('skipping: %s' % e)
        sys.exit(77)
    warnings.simplefilter('ignore')
    return modules


def run_driver(path, area, lines):
    """Feeds the lines to `path area` (tf-crosscheck-driver and its subcommand:
    one-proportion, means, rates, two-proportions) on stdin; its output lines, one per
    input line."""
    inp = ''.join(line + '\n' for line in lines)
    proc = subprocess.run([path, area], input=inp, capture_output=True, text=True, check=True)
    outs = proc.stdout.splitlines()
    assert len(outs) == len(lines), 'driver printed %d lines for %d cases' % (len(outs), len(lines))
    return outs


def log_uniform(rng, lo, hi):
    """A float log-uniform in [lo, hi]."""
    return float(math.exp(rng.uniform(math.log(lo), math.log(hi))))


def abs_rel(ours, ref):
    """|ours − ref| / max(1, |ref|): absolute below 1, relative above; inf for a
    non-finite ours. ref may be an mpmath number."""
    if not math.isfinite(ours):
        return math.inf
    return float(abs(ours - ref) / max(1, abs(ref)))


def rel_log(ours, ref):
    """Relative error of e^ours against e^ref (ref a log probability); logs that differ
    by 1 or more count as inf."""
    if ref == -math.inf:
        return 0.0 if ours == -math.inf else math.inf
    if not math.isfinite(ours):
        return math.inf
    return abs(math.expm1(ours - ref)) if abs(ours - ref) < 1 else math.inf


class Tally:
    """Worst error and case count per quantity against its tolerance."""

    def __init__(self, tolerances, max_printed=20):
        self.tol = tolerances
        self.worst = {q: (0.0, None) for q in tolerances}
        self.count = {q: 0 for q in tolerances}
        self.failed = 0
        self.max_printed = max_printed
        self.start = time.monotonic()

    def record(self, q, line, err):
        err = float(err)
        if math.isnan(err):
            err = math.inf
        self.count[q] += 1
        if err > self.worst[q][0]:
            self.worst[q] = (err, line)
        if err > self.tol[q][1]:
            self.failed += 1
            if self.failed <= self.max_printed:
                print('FAIL %s: error %.3g' % (line, err))

    def report(self, header=''):
        """Prints one line per quantity; returns the exit code (1 when any failed)."""
        if header:
            print(header)
        for q, (label, tol) in self.tol.items():
            print('%-36s cases %6d  worst %.3g  tolerance %.0e  (%s)'
                  % (label, self.count[q], self.worst[q][0], tol, self.worst[q][1]))
        print('%d cases, %d outside their tolerance, %.0f s'
              % (sum(self.count.values()), self.failed, time.monotonic() - self.start))
        return 1 if self.failed else 0
