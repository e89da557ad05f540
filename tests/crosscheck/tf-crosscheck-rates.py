# SPDX-License-Identifier: GPL-3.0-or-later
"""Cross-check of Twofold's rate numerics (tf-poisson, tf-one-rate, tf-two-rates)
against mpmath and scipy.

Usage: /usr/bin/python3 tf-crosscheck-rates.py PATH/TO/tf-crosscheck-rates-driver [N]

Random cases over the whole valid domain (counts and shapes 1e-3..1e12, fixed seed),
N per quantity (default 10^4), through one run of the C driver; each quantity's worst
error is printed. Exit 0 when every case is inside its tolerance, 1 otherwise, 77 when
scipy or mpmath is missing. References: mpmath 1.2.1 at mp.dps = 40 and scipy 1.10.1
(Debian 12). It also re-derives Temme's coefficients in core/tf-poisson.c.
"""
import math
import re
import subprocess
import sys
import warnings
from fractions import Fraction as F

try:
    import numpy as np
    import scipy
    import scipy.stats as st
    import mpmath as mp
except ImportError as e:
    print('skipping: %s' % e)
    sys.exit(77)

warnings.simplefilter('ignore')
mp.mp.dps = 40
rng = np.random.default_rng(20240607)
N = int(sys.argv[2]) if len(sys.argv) > 2 else 10000
N_QUAD = max(50, N // 100)      # tanh-sinh quadratures (slow) per quantity: 100 at N = 10^4


def log_uniform(lo, hi):
    return float(math.exp(rng.uniform(math.log(lo), math.log(hi))))


def draw_count():
    r = rng.uniform()
    if r < 0.08:
        return 0.0
    return float(round(log_uniform(1, 1e12)))


def draw_shape():
    return log_uniform(1e-3, 1e12) if rng.uniform() < 0.3 else log_uniform(1e-2, 1e4)


def near(m):
    """A count near the Poisson mean m (within ~6 SD), or anywhere."""
    if rng.uniform() < 0.6:
        return float(max(0, round(m + rng.normal() * 3 * math.sqrt(m + 1))))
    return float(round(m * math.exp(rng.normal() * 2)))


# --- Temme coefficients: exact rational series, as documented in tf-poisson.c ---------

def temme_coefficients(order=34):
    def mul(a, b):
        r = [F(0)] * order
        for i, x in enumerate(a):
            if x:
                for j, y in enumerate(b[:order - i]):
                    r[i + j] += x * y
        return r

    def inv(a):
        r = [F(0)] * order
        r[0] = 1 / a[0]
        for n in range(1, order):
            r[n] = -sum(a[j] * r[n - j] for j in range(1, n + 1)) / a[0]
        return r

    def sqrt1(a):
        r = [F(0)] * order
        r[0] = F(1)
        for n in range(1, order):
            r[n] = (a[n] - sum(r[j] * r[n - j] for j in range(1, n))) / 2
        return r

    def compose(a, b):
        r = [F(0)] * order
        p = [F(1)] + [F(0)] * (order - 1)
        for c in a:
            r = [x + c * y for x, y in zip(r, p)]
            p = mul(p, b)
        return r

    # μ − ln(1 + μ) = η²/2 gives η/μ = h(μ); revert to μ(η)
    h = sqrt1([F(2 * (-1) ** j, j) for j in range(2, order + 2)])
    mu = [F(0), F(1)] + [F(0)] * (order - 2)
    for _ in range(order):
        mu = [F(0)] + inv(compose(h, mu))[:order - 1]
    q = inv(mu[1:] + [F(0)])                         # η/μ in η
    c = [[q[i + 1] for i in range(order - 1)]]       # c0 = (η/μ − 1)/η
    gam = [F(1), F(1, 12), F(1, 288), F(-139, 51840)]  # Stirling's γ_k (DLMF 5.11.4)
    for k in range(1, 4):
        d = [c[-1][i + 1] * (i + 1) for i in range(len(c[-1]) - 1)]
        s = [d[i] + (-1) ** k * gam[k] * q[i] for i in range(len(d))]
        assert s[0] == 0
        c.append(s[1:])
    return c


def check_temme(path):
    text = open(path, encoding='utf-8').read()
    worst = 0.0
    for k, ck in enumerate(temme_coefficients()):
        body = re.search(r'temme_c%d\[\] = \{([^}]*)\}' % k, text).group(1)
        ours = [float(v) for v in body.replace('\n', ' ').split(',') if v.strip()]
        for o, r in zip(ours, ck):
            worst = max(worst, abs(o - float(r)) / max(abs(float(r)), 1e-300))
    return worst


# --- references ----------------------------------------------------------------------

def mpf(x):
    return mp.mpf(float(x))


def ref_log_gammainc(a, x):
    """ln P(a, x), ln Q(a, x) at 40 digits: mpmath's gammainc for a < 1e4, tanh-sinh
    quadrature of the log-concave Gamma(a, 1) density on pieces for larger a."""
    A, X = mpf(a), mpf(x)
    if a < 1e4:
        try:
            lo = mp.gammainc(A, 0, X, regularized=True)
            hi = mp.gammainc(A, X, mp.inf, regularized=True)
            if lo < 0.5:
                hi = 1 - lo
            else:
                lo = 1 - hi
            return mp.log(lo), mp.log(hi)
        except mp.libmp.NoConvergence:
            if a < 1:
                return None
    lg0 = mp.loggamma(A)

    def lg(t):
        return (A - 1) * mp.log(t) - t - lg0
    mode, sd = A - 1, mp.sqrt(A)
    lower = X < mode
    if X <= mode - 8 * sd or X >= mode + 8 * sd:
        L = abs((A - 1) / X - 1)
        g0 = lg(X)
        js = (0, 0.25, 0.5, 1, 2, 4, 8, 16, 32, 64, 128, 200)
        if lower:
            pts = sorted(set([max(mp.mpf(0), X - j / L) for j in js]))
        else:
            pts = [X + j / L for j in js]
    else:
        g0 = lg(mode)
        ks = [-60, -40, -30, -20, -14, -10, -7, -5, -3.5, -2.5, -1.5, -0.75, 0, 0.75,
              1.5, 2.5, 3.5, 5, 7, 10, 14, 20, 30, 40, 60]
        pts = [mode + k * sd for k in ks]
        pts = [p for p in pts if p < X] + [X] if lower else [X] + [p for p in pts if p > X]
    small = g0 + mp.log(mp.quad(lambda t: mp.exp(lg(t) - g0), pts))
    big = mp.log1p(-mp.exp(small))
    return (small, big) if lower else (big, small)


def ref_ldpois(k, m):
    k, m = mpf(k), mpf(m)
    return (k * mp.log(m) if k > 0 else 0) - m - mp.loggamma(k + 1)


def ref_lnb(k, s, r, e):
    """ln of the Poisson–gamma (negative binomial) marginal of k."""
    k, s, r, e = mpf(k), mpf(s), mpf(r), mpf(e)
    return (mp.loggamma(s + k) - mp.loggamma(s) - mp.loggamma(k + 1)
            + s * mp.log(r / (r + e)) + (k * mp.log(e / (r + e)) if k > 0 else 0))


def ref_lbf1(k, e, l0, s, r):
    """ln BF01 and the size of the log marginals it is the difference of."""
    a, b = ref_ldpois(k, mpf(l0) * mpf(e)), ref_lnb(k, s, r, e)
    return a - b, abs(a) + abs(b)


def ref_lbf2(ka, ea, kb, eb, rho, s, r):
    ka, ea, kb, eb, rho, s, r = map(mpf, (ka, ea, kb, eb, rho, s, r))
    m0 = rho * ea + eb
    lg = mp.loggamma
    l0 = ((ka * mp.log(rho * ea) if ka > 0 else 0) + (kb * mp.log(eb) if kb > 0 else 0)
          - lg(ka + 1) - lg(kb + 1) + s * mp.log(r) + lg(s + ka + kb) - lg(s)
          - (s + ka + kb) * mp.log(r + m0))
    la, lb = ref_lnb(ka, s, r, ea), ref_lnb(kb, s, r, eb)
    return l0 - la - lb, abs(l0) + abs(la) + abs(lb)


def ref_ptest(k, m):
    """Two-sided exact Poisson p-value by the minimum-likelihood rule with relative
    tolerance 1e-7 (as R's poisson.test), the far-side boundary found in mpmath."""
    K, M = mpf(k), mpf(m)
    ld = ref_ldpois(K, M) + mp.log1p(mp.mpf('1e-7'))
    if K == M:
        return mp.mpf(0)
    if K < M:
        lo = math.ceil(m)
        hi = lo
        step = max(1, int(math.sqrt(m)))
        while ref_ldpois(hi, M) > ld:
            lo, hi, step = hi + 1, hi + step, step * 2
        while lo < hi:
            mid = (lo + hi) // 2
            if ref_ldpois(mid, M) <= ld:
                hi = mid
            else:
                lo = mid + 1
        a = ref_log_gammainc(k + 1, m)
        b = ref_log_gammainc(lo, m)
        if a is None or b is None:
            return None
        tails = [a[1], b[0]]
    else:
        lo, hi = -1, math.floor(m)
        while lo < hi:
            mid = -((-(lo + hi)) // 2)
            if ref_ldpois(mid, M) <= ld:
                lo = mid
            else:
                hi = mid - 1
        b = ref_log_gammainc(k, m)
        if b is None:
            return None
        tails = [b[0]]
        if lo >= 0:
            a = ref_log_gammainc(lo + 1, m)
            if a is None:
                return None
            tails.append(a[1])
    return min(mp.mpf(0), mp.log(sum(mp.exp(t) for t in tails)))


# --- the run -------------------------------------------------------------------------

cases = []          # (quantity, driver line, reference or check)
n_quad = {}


def quad_ok(q, big):
    """Quadrature references are slow: at most N_QUAD of them per quantity."""
    if not big:
        return True
    n_quad[q] = n_quad.get(q, 0) + 1
    return n_quad[q] <= N_QUAD


def draw_a_x():
    a = draw_shape()
    r = rng.uniform()
    if r < 0.4:
        x = a + rng.normal() * 6 * math.sqrt(a)
    elif r < 0.8:
        x = a * math.exp(rng.normal() * (0.3 if rng.uniform() < 0.5 else 3))
    else:
        x = log_uniform(1e-30, 1e13)
    return a, float(x if x > 0 else a)


got = 0
while got < N:
    a, x = draw_a_x()
    if not quad_ok('gammainc', a >= 1e4):
        continue
    r = ref_log_gammainc(a, x)
    if r is None:
        continue
    cases.append(('gammainc', 'gammainc %r %r' % (a, x), r))
    got += 1

got = 0
while got < N:
    a = draw_shape()
    lp = -log_uniform(1e-3, 700)
    if not quad_ok('gammainv', a >= 1e4):
        continue
    cases.append(('gammainv', 'gammainv %r %r' % (lp, a), ('inv', lp, a)))
    got += 1

for _ in range(N):
    m = log_uniform(1e-3, 1e12)
    k = near(m)
    cases.append(('ldpois', 'ldpois %r %r' % (k, m), (ref_ldpois(k, m),)))

got = 0
while got < N:
    m = log_uniform(1e-2, 1e12)
    k = near(m)
    if not quad_ok('ptest', m >= 1e4):
        continue
    r = ref_ptest(k, m)
    if r is None or r < -700:
        continue
    cases.append(('ptest', 'ptest %r %r' % (k, m), (mp.exp(r),)))
    got += 1

got = 0
while got < N:
    k = draw_count()
    if not quad_ok('garwood', k >= 1e4):
        continue
    level = float(rng.choice([0.8, 0.9, 0.95, 0.99, 0.999]))
    cases.append(('garwood', 'garwood %r %r' % (k, level), ('garwood', k, level)))
    got += 1

for _ in range(N):
    e = log_uniform(1e-3, 1e9)
    l0 = log_uniform(1e-3, 1e3)
    k = near(l0 * e) if rng.uniform() < 0.7 else draw_count()
    s, r = draw_shape(), log_uniform(1e-3, 1e6)
    cases.append(('lbf1', 'lbf1 %r %r %r %r %r' % (k, e, l0, s, r), ('lbf', *ref_lbf1(k, e, l0, s, r))))

for _ in range(N):
    ea, eb = log_uniform(1e-3, 1e9), log_uniform(1e-3, 1e9)
    lam = log_uniform(1e-3, 1e3)
    rho = 1.0 if rng.uniform() < 0.5 else log_uniform(1e-2, 1e2)
    ka = near(lam * ea * (rho if rng.uniform() < 0.5 else log_uniform(1e-2, 1e2)))
    kb = near(lam * eb)
    s, r = draw_shape(), log_uniform(1e-3, 1e6)
    cases.append(('lbf2', 'lbf2 %r %r %r %r %r %r %r' % (ka, ea, kb, eb, rho, s, r),
                  ('lbf', *ref_lbf2(ka, ea, kb, eb, rho, s, r))))

for _ in range(N):
    sa, sb = log_uniform(1e-2, 1e4), log_uniform(1e-2, 1e4)
    ra, rb = log_uniform(1e-3, 1e6), log_uniform(1e-3, 1e6)
    lp = -log_uniform(1e-3, 300)
    cases.append(('ratioq', 'ratioq %r %r %r %r %r' % (lp, sa, ra, sb, rb),
                  ('ratioq', lp, sa, ra, sb, rb)))

inp = ''.join(c[1] + '\n' for c in cases)
proc = subprocess.run([sys.argv[1]], input=inp, capture_output=True, text=True, check=True)
outs = proc.stdout.splitlines()
assert len(outs) == len(cases), 'driver printed %d lines for %d cases' % (len(outs), len(cases))

TOL = {
    'temme': ('Temme coefficients, rel. error', 1e-15),
    'gammainc': ('ln P, ln Q (both tails), abs/rel', 1e-9),
    'gammainv': ('gamma quantiles, rel. in x', 1e-7),
    'ldpois': ('ln Poisson pmf, abs/rel', 1e-9),
    'ptest': ('exact two-sided Poisson p, rel.', 1e-7),
    'garwood': ('Garwood limits, rel. in x', 1e-7),
    'lbf1': ('one rate ln BF01, abs/rel', 1e-9),
    'lbf2': ('two rates ln BF01, abs/rel', 1e-9),
    'ratioq': ('rate-ratio quantiles, rel. in x', 1e-7),
}
worst = {q: (0.0, None) for q in TOL}
count = {q: 0 for q in TOL}
failed = 0


def record(q, line, err):
    global failed
    if math.isnan(err):
        err = math.inf
    count[q] += 1
    if err > worst[q][0]:
        worst[q] = (err, line)
    if err > TOL[q][1]:
        failed += 1
        if failed <= 20:
            print('FAIL %s: error %.3g' % (line, err))


def gamma_x_error(x, a, lp, lower):
    """Relative x error of a gamma quantile: (ln tail(x) − lp) / (d ln tail / d ln x),
    less one ulp of x."""
    if x < 1e-300:
        # the quantile underflows when the tail at 1e-300 is already past the target
        r = ref_log_gammainc(a, 1e-300)
        if r is None:
            return 0.0
        return 0.0 if (r[0] >= lp if lower else r[1] <= lp) else math.inf
    if not (x > 0 and math.isfinite(x)):
        return math.inf
    r = ref_log_gammainc(a, x)
    if r is None:
        return 0.0
    lt = r[0] if lower else r[1]
    ldens = (mpf(a)) * mp.log(mpf(x)) - mpf(x) - mp.loggamma(mpf(a))   # x f(x)
    slope = mp.exp(ldens - lt)
    return float(max(0, abs(lt - mpf(lp)) / slope - mpf(2.3e-16)))


def beta_x_error(c, sa, sb, lp, lower, tail_only=False):
    """For W ~ Beta(sa, sb) at W / (1 − W) = c, ρ ∝ c: the relative error in ρ,
    (ln tail − lp) / (d ln tail / d ln ρ), W and 1 − W each exact from c."""
    # enough digits that a tail of e^lp survives 1 − (the other tail)
    with mp.workdps(60 + int(-lp / 2.3)):
        C = mp.mpf(c)
        W, V = C / (1 + C), 1 / (1 + C)
        # each tail from the end of the interval it is nearer to, so that W near 1
        # (V tiny) keeps its digits
        lo_w = (lambda: mp.betainc(mpf(sa), mpf(sb), 0, W, regularized=True))
        lo_v = (lambda: mp.betainc(mpf(sb), mpf(sa), 0, V, regularized=True))
        if lower:
            lt = mp.log(lo_w()) if W <= 0.5 else mp.log1p(-lo_v())
        else:
            lt = mp.log(lo_v()) if V <= 0.5 else mp.log1p(-lo_w())
        if tail_only:
            return lt
        lx = sa * mp.log(W) + sb * mp.log(V) - mp.log(mp.beta(mpf(sa), mpf(sb)))
        slope = mp.exp(lx - lt)        # d ln tail / d ln ρ
        return float(max(0, abs(lt - mpf(lp)) / slope - mpf(4.6e-16)))


t_err = check_temme(__file__.rsplit('/tests/', 1)[0] + '/core/tf-poisson.c')
record('temme', 'core/tf-poisson.c', t_err)

for (q, line, ref), out in zip(cases, outs):
    ours = [float(v) for v in out.split()]
    if ref[0] == 'inv':
        _, lp, a = ref
        for x, lower in zip(ours, (True, False)):
            record(q, line, gamma_x_error(x, a, lp, lower))
        continue
    if ref[0] == 'garwood':
        _, k, level = ref
        la = math.log((1 - level) / 2)
        lo, hi = ours
        record(q, line, 0.0 if k > 0 or lo == 0.0 else math.inf)
        if k > 0:
            record(q, line, gamma_x_error(lo, k, la, True))
        record(q, line, gamma_x_error(hi, k + 1, la, False))
        continue
    if ref[0] == 'lbf':
        # error relative to max(1, |ln BF01|, 1e-6 T), T the sum of the sizes of the
        # log marginals: with counts or prior shapes of 1e8 and more, T reaches 1e10
        # while ln BF01 is a few units, and a few roundings of T (1e-16 T each) are
        # the best a closed form in them can do; the tolerance then allows 1e-15 T.
        _, r, size = ref
        o = ours[0]
        record(q, line, float(abs(mpf(o) - r) / max(1, abs(r), mpf(1e-6) * size)))
        continue
    if ref[0] == 'ratioq':
        _, lp, sa, ra, sb, rb = ref
        for rho, lower in zip(ours, (True, False)):
            try:
                if (rho < 1e-300 and lower) or (rho > 1e300 and not lower):
                    # the quantile under- or overflows (or is subnormal): the tail
                    # at 1e-300 (1e300) must still be above the target
                    c = mp.mpf('1e-300') if lower else mp.mpf('1e300')
                    ok = beta_x_error(c * mpf(ra) / mpf(rb), sa, sb, lp, lower, True) >= lp
                    record(q, line, 0.0 if ok else math.inf)
                    continue
                if not (rho > 0 and math.isfinite(rho)):
                    record(q, line, math.inf)
                    continue
                c = mpf(ra) * mpf(rho) / mpf(rb)       # W / (1 − W)
                record(q, line, beta_x_error(c, sa, sb, lp, lower))
            except (ValueError, mp.libmp.NoConvergence):
                pass        # mpmath's hypergeometric series did not converge: unchecked
        continue
    for o, r in zip(ours, ref):
        if q == 'ptest':
            r = float(r)
            o = math.exp(o)
            record(q, line, abs(o - r) / r)
            continue
        if mp.isinf(r) and r < 0:
            record(q, line, 0.0 if o == -math.inf or o < -1e300 else math.inf)
            continue
        record(q, line, float(abs(mpf(o) - r) / max(1, abs(r))))

print('scipy %s, mpmath %s, mp.dps = %d' % (scipy.__version__, mp.__version__, mp.mp.dps))
for q, (label, tol) in TOL.items():
    print('%-34s cases %6d  worst %.3g  tolerance %.0e  (%s)'
          % (label, count[q], worst[q][0], tol, worst[q][1]))
sys.exit(1 if failed else 0)
