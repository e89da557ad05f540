# SPDX-License-Identifier: GPL-3.0-or-later
"""The one-proportion quantities of bench-one-proportion.c through scipy (1.10.1 on
Debian 12), timed the same way: median µs of one full set of numbers at n = 10^3 and
n = 10^12, and of a 256-point sensitivity curve. Prints "name microseconds" lines;
exit 77 without scipy. Run by bench-one-proportion with /usr/bin/python3."""
import math
import sys
import time

try:
    import numpy as np
    import scipy.special as sp
    import scipy.stats as st
except ImportError:
    sys.exit(77)


def lbf01(k, n, t, a, b):
    return (k * math.log(t) + (n - k) * math.log1p(-t) + sp.betaln(a, b)
            - sp.betaln(k + a, n - k + b))


def full(k, n, t, a, b, level):
    """Every number of a two-sided one-proportion analysis, as scipy offers them."""
    test = st.binomtest(k, n, t)
    out = [test.pvalue]
    for m in ('exact', 'wilson', 'wilsoncc'):
        ci = test.proportion_ci(confidence_level=level, method=m)
        out += [ci.low, ci.high]
    lo, hi = st.binom.cdf(k, n, t), st.binom.sf(k - 1, n, t)
    out.append(min(1.0, 2 * min(lo, hi)))                     # central
    out.append(test.pvalue - 0.5 * st.binom.pmf(k, n, t))      # mid-p
    sd = math.sqrt(n * t * (1 - t)); d = k - n * t
    out.append(2 * st.norm.sf(abs(d) / sd))                    # score
    out.append(2 * st.norm.sf(max(0.0, abs(d) - 0.5) / sd))   # score, cc
    g = 2 * (sp.xlogy(k, k / (n * t)) + sp.xlogy(n - k, (n - k) / (n * (1 - t))))
    out.append(st.chi2.sf(g, 1))                               # LR
    al = (1 - level) / 2
    out += list(st.beta.ppf([al, 1 - al], k + 0.5, n - k + 0.5))   # Jeffreys
    z = st.norm.isf(al); nt = n + z * z; pt = (k + z * z / 2) / nt
    h = z * math.sqrt(pt * (1 - pt) / nt); out += [pt - h, pt + h]  # Agresti–Coull
    P, Q = k + a, n - k + b
    l = lbf01(k, n, t, a, b); out += [math.exp(l), 1 / (1 + math.exp(-l))]
    out += list(st.beta.ppf([al, 0.5, 1 - al], P, Q))          # credible, median
    out.append(st.beta.sf(t, P, Q))                            # P(θ > θ0)
    out.append(st.beta.pdf(t, P, Q) / st.beta.pdf(t, a, b))    # Savage–Dickey
    return out


def curve(k, n, t, a, b):
    m = a / (a + b)
    return [lbf01(k, n, t, s * m, s * (1 - m)) for s in np.logspace(-2, 4, 256)]


def median_us(f, repeats, batch):
    times = []
    for _ in range(repeats):
        start = time.perf_counter()
        for _ in range(batch):
            f()
        times.append((time.perf_counter() - start) / batch * 1e6)
    times.sort()
    return times[len(times) // 2]


print('full_1e3 %.3f' % median_us(lambda: full(412, 1000, 0.4, 1, 1, 0.95), 21, 20))
print('full_1e12 %.3f' % median_us(lambda: full(400001000000, 10**12, 0.4, 1, 1, 0.95), 11, 5))
print('curve %.3f' % median_us(lambda: curve(412, 1000, 0.4, 1, 1), 21, 5))
