# SPDX-License-Identifier: GPL-3.0-or-later
"""Cross-check of Twofold's one-proportion numerics against scipy and mpmath.

Usage: /usr/bin/python3 tf-crosscheck.py PATH/TO/tf-crosscheck-driver

Random cases over the whole valid domain (fixed seed) go through one run of the C
driver; each quantity is compared with a reference and its worst error printed.
Exit 0 when every case is inside its tolerance, 1 otherwise, 77 when scipy or mpmath
is missing. References: scipy 1.10.1 (Debian 12) and mpmath 1.2.1 at mp.dps = 40.
"""
import math
import sys

from tf_crosscheck_common import references, run_driver

np, scipy, sp, mp, st = references('scipy.stats')
mp.mp.dps = 40
rng = np.random.default_rng(20240601)
N_CLOSED = int(sys.argv[2]) if len(sys.argv) > 2 else 10000
N_ITER = int(sys.argv[3]) if len(sys.argv) > 3 else 1000
N_QUAD = 20       # cases with both shapes >= 1e3 checked by quadrature (0.15 s each)


def log_uniform(lo, hi):
    return float(math.exp(rng.uniform(math.log(lo), math.log(hi))))


def draw_n():
    r = rng.uniform()
    if r < 0.05:
        return 1.0
    return float(max(1, round(log_uniform(1, 1e12))))


def draw_theta():
    t = log_uniform(1e-6, 0.5)
    return t if rng.uniform() < 0.5 else 1.0 - t


def draw_k(n, t):
    r = rng.uniform()
    if r < 0.12:
        return 0.0
    if r < 0.24:
        return n
    if r < 0.6:
        sd = math.sqrt(n * t * (1 - t))
        return float(min(n, max(0, round(n * t + rng.normal() * 3 * sd))))
    return float(rng.integers(0, int(n) + 1))


def draw_shape():
    if rng.uniform() < 0.02:
        return 1e10
    return log_uniform(1e-2, 1e6)


def draw_x(a, b):
    """A point in (0, 1): half near the bulk of Beta(a, b), half anywhere (log-uniform
    distance from the nearer end)."""
    if rng.uniform() < 0.5:
        s = a + b
        x = a / s + rng.normal() * 6 * math.sqrt(a * b / (s * s * (s + 1)))
        if 0 < x < 1:
            return float(x)
    t = log_uniform(1e-300, 0.5)
    return t if rng.uniform() < 0.5 or 1.0 - t == 1.0 else 1.0 - t


# --- references --------------------------------------------------------------------

def mpf(x):
    return mp.mpf(float(x))


def ref_lbf01(k, n, t, a, b):
    k, n, t, a, b = map(mpf, (k, n, t, a, b))
    lg = mp.loggamma
    lb_ab = lg(a) + lg(b) - lg(a + b)
    lb_post = lg(k + a) + lg(n - k + b) - lg(n + a + b)
    return k * mp.log(t) + (n - k) * mp.log1p(-t) + lb_ab - lb_post


def ref_lbeta(a, b):
    a, b = mpf(a), mpf(b)
    return mp.loggamma(a) + mp.loggamma(b) - mp.loggamma(a + b)


def ref_ldbinom(k, n, p):
    k, n, p = mpf(k), mpf(n), mpf(p)
    lg = mp.loggamma
    r = lg(n + 1) - lg(k + 1) - lg(n - k + 1)
    if k > 0:
        r += k * mp.log(p)
    if n - k > 0:
        r += (n - k) * mp.log1p(-p)
    return r


def ref_ldbeta(x, a, b):
    x, a, b = mpf(x), mpf(a), mpf(b)
    return (a - 1) * mp.log(x) + (b - 1) * mp.log1p(-x) - ref_lbeta(a, b)


def ref_log_ibeta(a, b, x):
    """ln I_x(a, b) and ln(1 - I_x(a, b)) at 40 digits, or None. The smaller tail is
    computed as a lower tail (with 1 - x carried to enough digits); the larger one as
    1 minus it."""
    try:
        x = mpf(x)
        extra = int(max(0, -mp.log10(min(x, 1 - x)))) + 5
        with mp.workdps(40 + extra):
            lo = mp.betainc(mpf(a), mpf(b), 0, x, regularized=True)
            if lo <= 0.5:
                hi = 1 - lo
            else:
                hi = mp.betainc(mpf(b), mpf(a), 0, 1 - x, regularized=True)
                lo = 1 - hi
            if lo <= 0 or hi <= 0:
                return None
            return mp.log(lo), mp.log(hi)
    except Exception:
        return None


def log_betainc_quad(a, b, x, lower=True):
    """ln of ∫_0^x (lower) or ∫_x^1 Beta(a,b) density, a, b >= 1e3 (log-concave), by tanh-sinh quadrature on pieces."""
    a = mp.mpf(a); b = mp.mpf(b); x = mp.mpf(x)
    lnB = mp.loggamma(a) + mp.loggamma(b) - mp.loggamma(a + b)
    def lg(t):
        return (a - 1) * mp.log(t) + (b - 1) * mp.log1p(-t) - lnB
    mode = (a - 1) / (a + b - 2)
    sd = mp.sqrt(a * b / ((a + b) ** 2 * (a + b + 1)))
    if not lower:
        # upper tail of Beta(a,b) at x = lower tail of Beta(b,a) at 1-x
        return log_betainc_quad(b, a, 1 - x, True)
    if x <= mode - 8 * sd:
        # integrand rises towards x; log-concave so it decays at least like exp(-L (x - t))
        L = (a - 1) / x - (b - 1) / (1 - x)
        g0 = lg(x)
        f = lambda t: mp.exp(lg(t) - g0)
        pts = [x - mp.mpf(j) / L for j in (120, 64, 32, 16, 8, 4, 2, 1, 0.5, 0.25)] + [x]
        pts = [p for p in pts if p > 0]
        if pts[0] > 0 and x - 120 / L <= 0:
            pts = [mp.mpf(0)] + pts
        v = mp.quad(f, pts)
        return g0 + mp.log(v)
    g0 = lg(mode)
    f = lambda t: mp.exp(lg(t) - g0)
    ks = [-60, -40, -30, -20, -14, -10, -7, -5, -3.5, -2.5, -1.5, -0.75, 0, 0.75, 1.5, 2.5, 3.5, 5, 7, 10, 14, 20, 30, 40, 60]
    pts = [mode + k * sd for k in ks]
    pts = [p for p in pts if 0 < p < x]
    pts = pts + [x]
    v = mp.quad(f, pts)
    return g0 + mp.log(v)


def ref_x_error(lp, x, a, b):
    """Relative error in x of a quantile x whose tail has ln = lp by mpmath: the
    Newton step (tail - p) / density over min(x, 1 - x)."""
    if not (0 < x < 1):
        return math.inf
    r = ref_log_ibeta(a, b, x)
    if r is None:
        return 0.0
    return r, mp.exp(ref_ldbeta(x, a, b))


# --- the run -----------------------------------------------------------------------

cases = []          # (quantity, inputs, reference, tolerance kind)


def add(q, line, ref):
    cases.append((q, line, ref))


for _ in range(N_CLOSED):
    n = draw_n(); t = draw_theta(); k = draw_k(n, t); a = draw_shape(); b = draw_shape()
    add('lbf01', 'lbf01 %r %r %r %r %r' % (k, n, t, a, b), (ref_lbf01(k, n, t, a, b),))
for _ in range(N_CLOSED):
    a = draw_shape() if rng.uniform() < 0.8 else log_uniform(1e-3, 1e13)
    b = draw_shape() if rng.uniform() < 0.8 else log_uniform(1e-3, 1e13)
    add('lbeta', 'lbeta %r %r' % (a, b), (ref_lbeta(a, b),))
for _ in range(N_CLOSED):
    n = draw_n(); t = draw_theta(); k = draw_k(n, t)
    add('ldbinom', 'ldbinom %r %r %r' % (k, n, t), (ref_ldbinom(k, n, t),))
for _ in range(N_CLOSED):
    a = draw_shape(); b = draw_shape()
    x = draw_x(a, b)
    add('ldbeta', 'ldbeta %r %r %r' % (x, a, b), (ref_ldbeta(x, a, b),))

# Incomplete beta: shapes 1e-2..1e4 by mpmath's hypergeometric series, and shapes
# 1e3..1e13 by quadrature, at points in the bulk and anywhere in (0, 1).
n_ib = 0
while n_ib < N_ITER // 2:
    a = log_uniform(1e-2, 1e4); b = log_uniform(1e-2, 1e4)
    x = draw_x(a, b)
    r = ref_log_ibeta(a, b, x)
    if r is None:
        continue
    add('ibeta', 'ibeta %r %r %r' % (a, b, x), r)
    n_ib += 1
for _ in range(N_QUAD):
    a = log_uniform(1e3, 1e13); b = log_uniform(1e3, 1e13)
    s_ = a + b
    x = a / s_ + rng.normal() * 4 * math.sqrt(a * b / (s_ * s_ * (s_ + 1)))
    if not (0 < x < 1):
        continue
    add('ibeta', 'ibeta %r %r %r' % (a, b, x),
        (log_betainc_quad(a, b, x, True), log_betainc_quad(a, b, x, False)))

# Binomial tails, n up to 1e12: P(X >= k) = I_p(k, n - k + 1) by mpmath (its
# hypergeometric series, or tanh-sinh quadrature of the beta density when both shapes
# are >= 1e3); scipy's Boost binom loses digits beyond n ~ 1e7, so it is not used here.
n_bt = n_quad = 0
while n_bt < N_ITER // 4:
    n = draw_n(); t = draw_theta(); k = draw_k(n, t)
    if k == 0 or k == n:
        continue
    a_, b_ = k, n - k + 1
    if min(a_, b_) >= 1e3:
        if n_quad >= N_QUAD:      # quadrature is slow: a fixed number of these
            continue
        n_quad += 1
        ls = log_betainc_quad(a_, b_, t, True)
        lc = log_betainc_quad(a_ + 1, b_ - 1, t, False)
    else:
        r1 = ref_log_ibeta(a_, b_, t); r2 = ref_log_ibeta(a_ + 1, b_ - 1, t)
        if r1 is None or r2 is None:
            continue
        ls, lc = r1[0], r2[1]
    add('binom', 'binom %r %r %r' % (k, n, t), (lc, ls))
    n_bt += 1

# The exact test against scipy.stats.binomtest for n up to 1e6 (where scipy's pmf and
# tails are exact to ~1e-14); p-values below 1e-280 are left out, as scipy's pmf
# underflows there.
n_bt = 0
while n_bt < N_ITER:
    n = float(max(1, round(log_uniform(1, 1e6)))); t = draw_theta(); k = draw_k(n, t)
    pv = st.binomtest(int(k), int(n), t).pvalue
    if pv < 1e-280:
        continue
    add('btest', 'btest %r %r %r' % (k, n, t), (float(pv),))
    n_bt += 1

# Beta quantiles: the probability of our quantile, by mpmath, against the target p
# (scipy's Boost beta.ppf aborts on some of these inputs, so it is not used).
for _ in range(N_ITER // 4):
    a = log_uniform(1e-2, 1e4); b = log_uniform(1e-2, 1e4)
    p = math.exp(-log_uniform(1e-2, 600))
    add('ppf', 'ppf %r %r %r' % (p, a, b), ('roundtrip', p, a, b))

# Clopper–Pearson limits, n up to 1e12: beta quantiles, checked like the quantiles
# above (scipy's exact proportion_ci loses up to 4e-7 at n ~ 6e7, so it is not used).
n_quad = 0
for _ in range(N_ITER // 4):
    n = draw_n(); k = draw_k(n, draw_theta())
    if min(k, n - k) >= 1e3:
        if n_quad >= N_QUAD:
            continue
        n_quad += 1
    level = float(rng.choice([0.8, 0.9, 0.95, 0.99, 0.999]))
    add('cp', 'cp %r %r %r' % (k, n, level), ('cp', k, n, level))

# --- the one-proportion numbers of the design (issue 3) -----------------------------

def mp_z(k, n, t):
    k, n, t = mpf(k), mpf(n), mpf(t)
    return (k - n * t) / mp.sqrt(n * t * (1 - t))


def mp_log_q(z):
    """ln P(Z >= z) at 40 digits."""
    return mp.log(mp.erfc(mp.mpf(z) / mp.sqrt(2)) / 2)


def ref_tests(k, n, t, d):
    """ln p of exact, central, mid-p (scipy 1.10.1 binom and binomtest, n <= 1e6 and p
    above 1e-280, else None), score, score cc and LR (closed forms in mpmath)."""
    K, N, T = mpf(k), mpf(n), mpf(t)
    sd = mp.sqrt(N * T * (1 - T))
    dd = K - N * T
    z = dd / sd
    dev = (K * mp.log(K / (N * T)) if k > 0 else 0) + \
          ((N - K) * mp.log((N - K) / (N * (1 - T))) if n - k > 0 else 0)
    r = mp.sign(dd) * mp.sqrt(2 * dev)
    if d == 0:
        zc = max(mp.mpf(0), abs(dd) - mp.mpf(0.5)) / sd
        ls = min(0, mp.log(2) + mp_log_q(abs(z)))
        lc = min(0, mp.log(2) + mp_log_q(zc))
        ll = mp.log(mp.erfc(mp.sqrt(dev))) if dev > 0 else mp.mpf(0)
    elif d == 1:
        ls, lc, ll = mp_log_q(z), mp_log_q((dd - 0.5) / sd), mp_log_q(r)
    else:
        ls, lc, ll = mp_log_q(-z), mp_log_q(-(dd + 0.5) / sd), mp_log_q(-r)
    ex = ce = mi = None
    if n <= 1e6:
        ki, ni = int(k), int(n)
        lcdf = st.binom.logcdf(ki, ni, t); lsf = st.binom.logsf(ki - 1, ni, t)
        lpmf = st.binom.logpmf(ki, ni, t)
        if d == 0:
            pv = st.binomtest(ki, ni, t).pvalue
            if pv > 1e-280:
                ex = math.log(pv)
                mi = math.log(pv - 0.5 * math.exp(lpmf)) if pv > math.exp(lpmf) * 0.5 else None
            if min(lcdf, lsf) > -640:
                ce = min(0.0, math.log(2) + min(lcdf, lsf))
        elif d == 1:
            if lsf > -640:
                ex = ce = lsf
                mi = math.log(st.binom.sf(ki, ni, t) + 0.5 * math.exp(lpmf))
        else:
            if lcdf > -640:
                ex = ce = lcdf
                mi = math.log(st.binom.cdf(ki - 1, ni, t) + 0.5 * math.exp(lpmf))
    return (ex, ce, mi, ls, lc, ll)


def mp_wilson(k, n, level):
    """Newcombe (1998) methods 3 and 4 at 40 digits: the roots of
    (n + z²) θ² − (2c + z²) θ + c²/n = 0, c = k, k ∓ ½."""
    K, N = mpf(k), mpf(n)
    z = mp.sqrt(2) * mp.erfinv(mpf(level)); z2 = z * z
    def roots(c):
        s = z * mp.sqrt(z2 + 4 * c * (1 - c / N))
        return ((2 * c + z2) - s) / (2 * (N + z2)), ((2 * c + z2) + s) / (2 * (N + z2))
    lo = roots(K)[0] if k > 0 else 0
    hi = roots(K)[1] if k < n else 1
    lc = roots(K - mp.mpf(0.5))[0] if k > 0 else 0
    hc = roots(K + mp.mpf(0.5))[1] if k < n else 1
    return tuple(min(mp.mpf(1), max(mp.mpf(0), v)) for v in (lo, hi, lc, hc))


def mp_ac(k, n, level):
    K, N = mpf(k), mpf(n)
    z = mp.sqrt(2) * mp.erfinv(mpf(level)); z2 = z * z
    nt = N + z2; pt = (K + z2 / 2) / nt
    h = z * mp.sqrt(pt * (1 - pt) / nt)
    return max(mp.mpf(0), pt - h), min(mp.mpf(1), pt + h)


def ref_hdi(P, Q, level):
    """scipy 1.10.1: brentq on the split v of the tails, lower α σ(v) and upper
    α σ(−v) (each kept to full relative precision), of
    beta.logpdf(ppf(lower)) = beta.logpdf(isf(upper))."""
    import scipy.optimize as so
    al = 1 - level
    ends = lambda v: (st.beta.ppf(al * sp.expit(v), P, Q), st.beta.isf(al * sp.expit(-v), P, Q))
    def f(v):
        lo, hi = ends(v)
        return st.beta.logpdf(lo, P, Q) - st.beta.logpdf(hi, P, Q)
    v = so.brentq(f, -300, 300, xtol=1e-13, rtol=1e-15, maxiter=400)
    return ends(v)


def ref_ibf(k, n, lo, hi, a, b, d):
    """ln BF01 of [lo, hi] from mpmath's incomplete beta at 40 digits (ref_log_ibeta
    at both ends, shapes up to 1e4), or None."""
    def masses(P, Q):
        r_lo = ref_log_ibeta(P, Q, lo); r_hi = ref_log_ibeta(P, Q, hi)
        if r_lo is None or r_hi is None:
            return None
        with mp.workdps(60):
            below, above = mp.exp(r_lo[0]), mp.exp(r_hi[1])
            if r_hi[0] < -1:
                inside = mp.exp(r_hi[0]) - below
            elif r_lo[1] < -1:
                inside = mp.exp(r_lo[1]) - above
            else:
                inside = 1 - below - above
        return below, inside, above
    try:
        m1 = masses(k + a, n - k + b); m2 = masses(a, b)
    except Exception:
        return None
    if m1 is None or m2 is None:
        return None
    (pb, pi, pa), (qb, qi, qa) = m1, m2
    po, qo = (pb + pa, qb + qa) if d == 0 else (pa, qa) if d == 1 else (pb, qb)
    if min(pb, pi, pa, qb, qi, qa) <= 0:
        return None
    return (mp.log(pi) - mp.log(qi) - mp.log(po) + mp.log(qo),)


LEVELS = [0.8, 0.9, 0.95, 0.99, 0.999]
for _ in range(N_CLOSED):
    n = draw_n() if rng.uniform() < 0.7 else float(max(1, round(log_uniform(1, 1e6))))
    t = draw_theta(); k = draw_k(n, t); d = int(rng.integers(0, 3))
    add('tests', 'tests %r %r %r %d' % (k, n, t, d), ref_tests(k, n, t, d))
for _ in range(N_CLOSED):
    n = draw_n(); k = draw_k(n, draw_theta()); level = float(rng.choice(LEVELS))
    add('wilson', 'wilson %r %r %r' % (k, n, level), mp_wilson(k, n, level))
    add('ac', 'ac %r %r %r' % (k, n, level), mp_ac(k, n, level))
# scipy's own Wilson limits where its textbook form keeps its digits (n <= 1e3, both
# limits above 1e-2 from the ends)
n_w = 0
while n_w < N_ITER:
    n = float(rng.integers(1, 1001)); k = float(rng.integers(0, int(n) + 1))
    level = float(rng.choice(LEVELS))
    r = st.binomtest(int(k), int(n)).proportion_ci(confidence_level=level, method='wilson')
    rc = st.binomtest(int(k), int(n)).proportion_ci(confidence_level=level, method='wilsoncc')
    if min(r.low, 1 - r.high, rc.low, 1 - rc.high) < 1e-2 and 0 < k < n:
        continue
    add('wilson_scipy', 'wilson %r %r %r' % (k, n, level), (r.low, r.high, rc.low, rc.high))
    n_w += 1
# Jeffreys: the tail at our limits by mpmath (as for Clopper–Pearson), and scipy's
# beta.ppf for n <= 1e4
n_quad = 0
for _ in range(N_ITER):
    n = draw_n(); k = draw_k(n, draw_theta())
    if min(k, n - k) >= 1e3:
        if n_quad >= N_QUAD // 2:
            continue
        n_quad += 1
    level = float(rng.choice(LEVELS))
    add('jeffreys', 'jeffreys %r %r %r' % (k, n, level), ('jeff', k, n, level))
for _ in range(N_ITER):
    n = float(rng.integers(1, 10001)); k = float(rng.integers(0, int(n) + 1))
    level = float(rng.choice(LEVELS)); al = (1 - level) / 2
    lo = st.beta.ppf(al, k + 0.5, n - k + 0.5) if k > 0 else 0.0
    hi = st.beta.isf(al, k + 0.5, n - k + 0.5) if k < n else 1.0
    add('jeffreys_scipy', 'jeffreys %r %r %r' % (k, n, level), (lo, hi))
n_h = 0
while n_h < N_ITER:
    P = 1.0 + log_uniform(1e-2, 1e4); Q = 1.0 + log_uniform(1e-2, 1e4)
    level = float(rng.choice(LEVELS))
    try:
        ref = ref_hdi(P, Q, level)
    except (ValueError, RuntimeError):
        continue
    if not all(0 < x < 1 for x in ref):
        continue
    add('hdi', 'hdi %r %r %r' % (P, Q, level), ref)
    n_h += 1
n_i = 0
while n_i < N_ITER:
    n = float(max(1, round(log_uniform(1, 1e4)))); t = draw_theta(); k = draw_k(n, t)
    w = log_uniform(1e-4, 0.5)
    lo = max(1e-6, t - w * rng.uniform()); hi = min(1 - 1e-6, lo + w)
    if not lo < hi:
        continue
    a = log_uniform(1e-1, 1e3); b = log_uniform(1e-1, 1e3); d = int(rng.integers(0, 3))
    ref = ref_ibf(k, n, lo, hi, a, b, d)
    if ref is None:
        continue
    add('ibf', 'ibf %r %r %r %r %r %r %d' % (k, n, lo, hi, a, b, d), ref)
    n_i += 1

outs = run_driver(sys.argv[1], 'one-proportion', [c[1] for c in cases])

# Tolerances: 'abs' compares logarithms in absolute error (= relative error of the
# probability), scaled by max(1, |ref|) for logs beyond -1 so that a tail of 1e-300
# is held to 1e-9 relative of its log; 'rel' compares values in relative error.
TOL = {
    'lbf01': ('log BF01, abs. error (rel. >1e4)', 1e-9),
    'lbeta': ('ln B(a,b), abs/rel error', 1e-9),
    'ldbinom': ('ln binomial pmf, abs/rel error', 1e-9),
    'ldbeta': ('ln beta density, abs/rel error', 1e-9),
    'ibeta': ('ln I_x(a,b) both tails, abs/rel', 1e-9),
    'binom': ('binom logcdf/logsf, abs/rel', 1e-7),
    'btest': ('exact two-sided p, rel. error', 1e-7),
    'ppf': ('beta ppf/isf, rel. error in x', 1e-7),
    'cp': ('Clopper-Pearson limits, rel. in x', 1e-7),
    'tests': ('ln p, six tests x 3 directions', 1e-9),
    'wilson': ('Wilson, Wilson-cc (mpmath), rel.', 1e-9),
    'wilson_scipy': ('Wilson, Wilson-cc (scipy), rel.', 1e-9),
    'ac': ('Agresti-Coull limits, rel.', 1e-9),
    'jeffreys': ('Jeffreys limits, rel. in x (mpmath)', 1e-7),
    'jeffreys_scipy': ('Jeffreys limits (scipy beta.ppf)', 1e-7),
    'hdi': ('beta HDI limits, rel.', 1e-7),
    'ibf': ('interval-null ln BF01, abs/rel', 1e-9),
}
LOGS = {'lbf01', 'lbeta', 'ldbinom', 'ldbeta', 'ibeta', 'binom', 'tests', 'ibf'}



def x_error(x, a, b, log_tail, target):
    """The error in x of a quantile x of Beta(a, b) whose tail (log_tail, the
    reference's log at x) should be target: |tail − target| / density, less one ulp of x
    (the best a double can do), relative to the nearer end."""
    dx = abs(mp.exp(log_tail) - target) / mp.exp(ref_ldbeta(x, a, b))
    return float(max(0, dx - mpf(x) * 2.3e-16) / min(mpf(x), 1 - mpf(x)))


worst = {q: (0.0, None) for q in TOL}
count = {q: 0 for q in TOL}
failed = 0
for (q, line, ref), out in zip(cases, outs):
    ours = [float(v) for v in out.split()]
    tol = TOL[q][1]
    if ref[0] in ('cp', 'jeff'):
        kind, k, n, level = ref
        al = (1 - level) / 2
        errs = []
        shapes = ((k, n - k + 1, 0), (k + 1, n - k, 1)) if kind == 'cp' else \
            ((k + 0.5, n - k + 0.5, 0), (k + 0.5, n - k + 0.5, 1))
        for x, (a, b, side) in zip(ours, shapes):
            if (side == 0 and k == 0) or (side == 1 and k == n):
                errs.append(0.0 if x == (0.0 if side == 0 else 1.0) else math.inf)
                continue
            if min(a, b) >= 1e3:
                r = (log_betainc_quad(a, b, x, True), log_betainc_quad(a, b, x, False))
            else:
                r = ref_log_ibeta(a, b, x)
            if r is not None:
                errs.append(x_error(x, a, b, r[side], al))
        ref = ('roundtrip-done', errs)
    if ref[0] == 'roundtrip':
        # the x error of our quantiles: (tail at x - p) / density, relative to x
        _, p, a, b = ref
        errs = []
        for x, side in ((ours[0], 0), (ours[1], 1)):
            r = ref_log_ibeta(a, b, x) if 0 < x < 1 else None
            if r is not None:
                errs.append(x_error(x, a, b, r[side], p))
        ref = ('roundtrip-done', errs)
    if ref[0] == 'roundtrip-done':
        errs = ref[1]
        for e in errs:
            count[q] += 1
            if e > worst[q][0]:
                worst[q] = (e, line)
            if e > tol:
                failed += 1
                print('FAIL %s: x error %.3g' % (line, e))
        continue
    for o, r in zip(ours, ref):
        if r is None:
            continue
        r = float(r)
        if math.isinf(r) and r < 0:
            if q in ('binom',) and o < -700:      # scipy underflowed; ours is finite
                continue
            err = 0.0 if o == r else math.inf
        elif q == 'lbf01':
            # absolute up to |ln BF01| = 1e4 (BF01 itself is representable only up to
            # |ln BF01| ~ 709), relative 1e-13 beyond, where the deviance terms that
            # cancel reach 1e7 and their ulps add up to 1e-9
            err = abs(o - r) / max(1.0, abs(r) * 1e-4)
        elif q in LOGS:
            if q == 'binom' and r < -700:          # scipy's log of an underflowed value
                continue
            err = abs(o - r) / max(1.0, abs(r))
        else:
            if r == 0 or not math.isfinite(r):
                err = 0.0 if o == r else abs(o - r)
            else:
                err = abs(o - r) / abs(r)
        if math.isnan(err):
            err = math.inf
        count[q] += 1
        if err > worst[q][0]:
            worst[q] = (err, line)
        if err > tol:
            failed += 1
            if failed <= 20:
                print('FAIL %s: ours %r, reference %r, error %.3g' % (line, o, r, err))

print('scipy %s, mpmath %s, mp.dps = %d' % (scipy.__version__, mp.__version__, mp.mp.dps))
for q, (label, tol) in TOL.items():
    print('%-34s cases %6d  worst %.3g  tolerance %.0e  (%s)'
          % (label, count[q], worst[q][0], tol, worst[q][1]))
sys.exit(1 if failed else 0)
