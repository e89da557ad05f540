# SPDX-License-Identifier: GPL-3.0-or-later
"""Cross-check of Twofold's two-proportions numerics (tf-fisher, tf-beta-difference,
tf-two-proportions) against mpmath and scipy.

Usage: /usr/bin/python3 tf-crosscheck-two-proportions.py PATH/TO/driver [N]

Random cases (fixed seed), trials log-uniform from 1 to 10^9 with the edges (k = 0,
k = n, n = 1) drawn on purpose, N per quantity (default 10^4; the normal-prior Bayes
factor, whose reference sums scipy's noncentral hypergeometric, N/5 with margins to
400; the difference's tails and quantiles, whose reference quadratures take ~1 s a
case, N/100 and N/200). References, Debian 12: mpmath 1.2.1 at mp.dps = 40, scipy 1.10.1, numpy.
  lbf     ln BF01: the four ln B by mpmath.loggamma, 40 digits.      |Δ|/max(1,|r|) 1e-9
  hyper   ln pmf by mpmath.loggamma; ln cdf, ln sf by summing the pmf over a window of
          ±(12 SD + 1.5 |x − mode|) in extended precision (numpy longdouble
          cumulative log ratios from mpmath's value at the mode).      relative 1e-9
  fisher  the same sums: two-sided minimum-likelihood (1e-7 relative, as R's
          fisher.test), greater, less;                                  relative 1e-9
          and scipy.stats.fisher_exact(t).pvalue for tables with N <= 1000.   1e-9
  newc    Newcombe 1998 method 10 in mpmath, 40 digits, the textbook form.    1e-9
  tests   χ², Yates, G: statistics in exact rationals, p by mpmath.erfc.     1e-9
  bdcdf   P(Δ <= d), P(Δ >= d): scipy.integrate.quad of beta.pdf · beta.cdf/sf
          (epsrel 1e-13, breakpoints at the means ± k SD).           relative 1e-7
  bdq     the tail at the returned quantile by the same quad.        relative 1e-7
  logor   ∫ nchypergeom_fisher.pmf(kA; N, nA, m, e^ψ)/pmf(ψ = 0) φ(ψ; 0, σ²) dψ by
          scipy.integrate.quad.                                 |Δ ln BF| 1e-7
Exit 0 when every case is inside its tolerance, 1 otherwise, 77 without scipy/mpmath.
"""
import math
import subprocess
import sys
import warnings

try:
    import numpy as np
    import scipy
    import scipy.stats as st
    import scipy.integrate as si
    import mpmath as mp
except ImportError as e:
    print('skipping: %s' % e)
    sys.exit(77)

warnings.simplefilter('ignore')
mp.mp.dps = 40
rng = np.random.default_rng(20240611)
N = int(sys.argv[2]) if len(sys.argv) > 2 else 10000
# scipy's quad over boost's beta tails takes ~1 s a case at shapes of 1e9
N_QUAD = max(20, N // 100)


def draw_n(top=1e9):
    r = rng.uniform()
    if r < 0.05:
        return 1
    return int(round(math.exp(rng.uniform(0, math.log(top)))))


def draw_k(n, theta=None):
    r = rng.uniform()
    if r < 0.05:
        return 0
    if r < 0.1:
        return n
    if theta is None:
        theta = rng.uniform()
    return int(min(n, max(0, round(n * theta + rng.normal() * math.sqrt(n * theta * (1 - theta) + 1)))))


def draw_pair(top=1e9):
    na, nb = draw_n(top), draw_n(top)
    th = rng.uniform()
    ka = draw_k(na, th)
    kb = draw_k(nb, min(1, max(0, th + rng.normal() * 0.2 / math.sqrt(1 + math.sqrt(min(na, nb))))))
    return ka, na, kb, nb


def draw_shape():
    return float(math.exp(rng.uniform(math.log(1e-2), math.log(1e4))))


def lC(n, k):
    return mp.loggamma(n + 1) - mp.loggamma(k + 1) - mp.loggamma(n - k + 1)


def log_beta(a, b):
    return mp.loggamma(a) + mp.loggamma(b) - mp.loggamma(a + b)


class Hyper:
    """The hypergeometric log pmf on a window, in extended precision."""

    def __init__(self, na, nb, m, x):
        self.lo, self.hi = max(0, m - nb), min(na, m)
        Nt = na + nb
        self.mode = min(self.hi, max(self.lo, ((na + 1) * (m + 1)) // (Nt + 2)))
        sd = math.sqrt(na * (m / Nt) * ((Nt - m) / Nt) * (nb / max(1, Nt - 1)))
        half = int(12 * sd + 1.5 * abs(x - self.mode) + 60)
        lx = float(lC(na, x) + lC(nb, m - x) - lC(Nt, m))
        while True:
            # widen until both ends are support ends or 40 below the observed outcome,
            # so that the far tail of a skewed distribution is inside
            self.too_wide = half > 4 * 10 ** 6
            if self.too_wide:
                return
            self.w0, self.w1 = max(self.lo, self.mode - half), min(self.hi, self.mode + half)
            ends = [e for e in (self.w0, self.w1) if e not in (self.lo, self.hi)]
            if all(float(lC(na, e) + lC(nb, m - e) - lC(Nt, m)) < lx - 40 for e in ends):
                break
            half *= 2
        j = np.arange(self.w0, self.w1, dtype=np.longdouble)   # ratios j -> j + 1
        lr = (np.log(np.longdouble(na) - j) + np.log(np.longdouble(m) - j)
              - np.log(j + 1) - np.log(np.longdouble(nb - m) + j + 1))
        c = np.concatenate(([np.longdouble(0)], np.cumsum(lr)))
        lm = mp.mpf(lC(na, self.mode) + lC(nb, m - self.mode) - lC(Nt, m))
        self.logp = c - c[self.mode - self.w0] + np.longdouble(float(lm))
        self.lm = float(lm)

    def l(self, x):
        if x < self.w0 or x > self.w1:
            return -np.inf
        return self.logp[x - self.w0]

    def logsum(self, mask):
        v = self.logp[mask]
        if v.size == 0:
            return -math.inf
        mx = v.max()
        return float(mx + np.log(np.sum(np.exp(v - mx))))

    def idx(self):
        return np.arange(self.w0, self.w1 + 1)


cases = []
for _ in range(N):
    ka, na, kb, nb = draw_pair()
    a, b = draw_shape(), draw_shape()
    cases.append(('lbf', 'lbf %d %d %d %d %.17g %.17g' % (ka, na, kb, nb, a, b), (ka, na, kb, nb, a, b)))
for _ in range(N):
    ka, na, kb, nb = draw_pair()
    m = ka + kb
    if rng.uniform() < 0.5:
        # near the mode, where the tails are long: as far out as the reference window allows
        Nt = na + nb
        mode = ((na + 1) * (m + 1)) // (Nt + 2)
        sd = math.sqrt(na * (m / Nt) * ((Nt - m) / Nt) * (nb / max(1, Nt - 1)))
        ka = int(min(na, m, max(0, m - nb, round(mode + rng.normal() * 4 * sd))))
        kb = m - ka
    h = Hyper(na, nb, m, ka)
    if h.too_wide or not (h.w0 <= ka <= h.w1) or h.lo == h.hi:
        continue
    cases.append(('hyper', 'hyper %d %d %d %d' % (ka, na, nb, m), (ka, na, nb, m, h)))
    cases.append(('fisher', 'fisher %d %d %d %d' % (ka, na, kb, nb), (ka, na, kb, nb, h)))
for _ in range(N):
    ka, na, kb, nb = draw_pair(1000)
    cases.append(('fisher_scipy', 'fisher %d %d %d %d' % (ka, na, kb, nb), (ka, na, kb, nb)))
for _ in range(N):
    ka, na, kb, nb = draw_pair()
    level = [0.9, 0.95, 0.99, 0.999][rng.integers(4)]
    cases.append(('newc', 'newc %d %d %d %d %.17g' % (ka, na, kb, nb, level), (ka, na, kb, nb, level)))
for _ in range(N):
    ka, na, kb, nb = draw_pair()
    if ka + kb == 0 or ka + kb == na + nb:
        continue
    cases.append(('tests', 'tests %d %d %d %d' % (ka, na, kb, nb), (ka, na, kb, nb)))
for _ in range(N_QUAD):
    ka, na, kb, nb = draw_pair()
    a, b = float(rng.choice([0.5, 1.0, 2.0, 5.0])), float(rng.choice([0.5, 1.0, 2.0, 5.0]))
    pa, qa, pb, qb = ka + a, na - ka + b, kb + a, nb - kb + b
    mean = pa / (pa + qa) - pb / (pb + qb)
    sd = math.sqrt(st.beta.var(pa, qa) + st.beta.var(pb, qb))
    d = float(min(0.999, max(-0.999, mean + rng.normal() * 2.5 * sd)))
    cases.append(('bdcdf', 'bdcdf %.17g %.17g %.17g %.17g %.17g' % (pa, qa, pb, qb, d), (pa, qa, pb, qb, d)))
for _ in range(N_QUAD // 2):
    ka, na, kb, nb = draw_pair()
    pa, qa, pb, qb = ka + 1.0, na - ka + 1.0, kb + 1.0, nb - kb + 1.0
    lp = float(rng.uniform(math.log(1e-6), math.log(0.5)))
    cases.append(('bdq', 'bdq %.17g %.17g %.17g %.17g %.17g' % (pa, qa, pb, qb, lp), (pa, qa, pb, qb, lp)))
for _ in range(N // 5):
    ka, na, kb, nb = draw_pair(200)
    if ka + kb == 0 or ka + kb == na + nb:
        continue
    sd = float(rng.choice([0.25, 0.5, 0.7071, 1.0, 2.0]))
    cases.append(('logor', 'logor %d %d %d %d %.17g' % (ka, na, kb, nb, sd), (ka, na, kb, nb, sd)))

if len(sys.argv) > 3:          # only these quantities, comma-separated
    keep = sys.argv[3].split(',')
    cases = [c for c in cases if c[0] in keep]
inp = ''.join(c[1] + '\n' for c in cases)
proc = subprocess.run([sys.argv[1]], input=inp, capture_output=True, text=True, check=True)
outs = proc.stdout.splitlines()
assert len(outs) == len(cases), 'driver printed %d lines for %d cases' % (len(outs), len(cases))

TOL = {
    'lbf': ('ln BF01 closed form, abs/rel', 1e-9),
    'hyper': ('hypergeometric ln pmf, cdf, sf', 1e-9),
    'fisher': ('Fisher p (2-sided, >, <), rel.', 1e-9),
    'fisher_scipy': ('Fisher p vs scipy, N <= 1000', 1e-9),
    'newc': ('Newcombe limits, rel.', 1e-9),
    'tests': ('chi2, Yates, G p-values, rel.', 1e-9),
    'bdcdf': ('P(diff <= d), P(diff >= d), rel.', 1e-7),
    'bdq': ('diff quantiles: tail at q, rel.', 1e-7),
    'logor': ('ln BF01 log-OR normal, abs', 1e-7),
}
worst = {q: (0.0, None) for q in TOL}
count = {q: 0 for q in TOL}
failed = 0


def record(q, line, err):
    global failed
    if isinstance(err, float) and math.isnan(err):
        err = math.inf
    err = float(err)
    count[q] += 1
    if err > worst[q][0]:
        worst[q] = (err, line)
    if err > TOL[q][1]:
        failed += 1
        if failed <= 25:
            print('FAIL %s: error %.3g' % (line, err))


def rel_log(o, r):
    """Relative error of e^o against e^r (r a log probability); logs below −690 compare
    as |o − r| (a relative error of the probability of that size)."""
    if r == -math.inf:
        return 0.0 if o == -math.inf else math.inf
    if not math.isfinite(o):
        return math.inf
    return abs(math.expm1(o - r)) if abs(o - r) < 1 else math.inf


def beta_diff_ref(pa, qa, pb, qb, d):
    """(P(Δ <= d), P(Δ >= d)) by scipy quad over the narrower variable."""
    sa, sb = st.beta.std(pa, qa), st.beta.std(pb, qb)
    if sa <= sb:
        pv, qv, po, qo, sgn = pa, qa, pb, qb, -1.0   # w = z − d
    else:
        pv, qv, po, qo, sgn = pb, qb, pa, qa, 1.0    # w = x + d
    mv, sv = pv / (pv + qv), st.beta.std(pv, qv)
    mo, so = po / (po + qo), st.beta.std(po, qo)
    pts = set()
    for k in (-30, -8, -3, 0, 3, 8, 30):
        pts.add(mv + k * sv)
        pts.add(mo + k * so - sgn * d)
    pts.add(-sgn * d)
    pts.add(1 - sgn * d)
    pts = sorted(p for p in pts if 0 < p < 1)
    over_a = sa <= sb
    mirror = mv > 0.5        # integrate in y = 1 − v, whose density keeps its digits near 1
    if mirror:
        pts = sorted(1 - p for p in pts)
    out = []
    for lower in (True, False):
        want_lower = lower != over_a
        if mirror:
            f = (lambda y: st.beta.pdf(y, qv, pv) * (st.beta.cdf((1 - y) + sgn * d, po, qo) if want_lower
                                                      else st.beta.sf((1 - y) + sgn * d, po, qo)))
        else:
            f = (lambda v: st.beta.pdf(v, pv, qv) * (st.beta.cdf(v + sgn * d, po, qo) if want_lower
                                                      else st.beta.sf(v + sgn * d, po, qo)))
        tot = 0.0
        edges = [0.0] + pts + [1.0]
        for e0, e1 in zip(edges[:-1], edges[1:]):
            if e1 > e0:
                tot += si.quad(f, e0, e1, epsabs=0, epsrel=1e-13, limit=500)[0]
        out.append(tot)
    return out


for (q, line, ref), out in zip(cases, outs):
    ours = [float(v) for v in out.split()]
    if q == 'lbf':
        ka, na, kb, nb, a, b = [mp.mpf(v) for v in ref]
        r = (log_beta(ka + kb + a, na + nb - ka - kb + b) + log_beta(a, b)
             - log_beta(ka + a, na - ka + b) - log_beta(kb + a, nb - kb + b))
        record(q, line, abs(mp.mpf(ours[0]) - r) / max(1, abs(r)))
    elif q == 'hyper':
        x, na, nb, m, h = ref
        r = lC(na, x) + lC(nb, m - x) - lC(na + nb, m)
        record(q, line, abs(mp.mpf(ours[0]) - r) / max(1, abs(r)))
        ix = h.idx()
        record(q, line, rel_log(ours[1], h.logsum(ix <= x)))
        record(q, line, rel_log(ours[2], h.logsum(ix >= x)))
    elif q == 'fisher':
        ka, na, kb, nb, h = ref
        ix = h.idx()
        lx = h.l(ka)
        two = h.logsum(h.logp <= lx + np.log1p(np.longdouble(1e-7)))
        record(q, line, rel_log(ours[0], min(0.0, two)))
        record(q, line, rel_log(ours[1], min(0.0, h.logsum(ix >= ka))))
        record(q, line, rel_log(ours[2], min(0.0, h.logsum(ix <= ka))))
    elif q == 'fisher_scipy':
        ka, na, kb, nb = ref
        t = [[ka, na - ka], [kb, nb - kb]]
        for o, alt in zip(ours, ('two-sided', 'greater', 'less')):
            r = st.fisher_exact(t, alternative=alt)[1]
            record(q, line, abs(math.exp(o) - r) / r if r > 1e-300 else 0.0)
    elif q == 'newc':
        ka, na, kb, nb, level = ref
        z = mp.mpf(st.norm.isf((1 - level) / 2))

        def wilson(k, n):
            k, n = mp.mpf(k), mp.mpf(n)
            c = (2 * k + z * z) / (2 * (n + z * z))
            hw = z * mp.sqrt(z * z + 4 * k * (1 - k / n)) / (2 * (n + z * z))
            return k / n, c - hw, c + hw
        p1, l1, u1 = wilson(ka, na)
        p2, l2, u2 = wilson(kb, nb)
        dd = p1 - p2
        lo = max(-1, dd - mp.sqrt((p1 - l1) ** 2 + (u2 - p2) ** 2))
        hi = min(1, dd + mp.sqrt((u1 - p1) ** 2 + (p2 - l2) ** 2))
        scale = max(abs(hi - lo), mp.mpf(1e-300))
        record(q, line, abs(ours[0] - lo) / max(abs(lo), scale))
        record(q, line, abs(ours[1] - hi) / max(abs(hi), scale))
    elif q == 'tests':
        ka, na, kb, nb = ref
        Nt, m = na + nb, ka + kb
        D = mp.mpf(ka * nb - kb * na)
        den = mp.mpf(m) * (Nt - m) * na * nb
        x2 = Nt * D * D / den
        y2 = Nt * max(0, abs(D) - mp.mpf(Nt) / 2) ** 2 / den
        cells = [(ka, na * mp.mpf(m) / Nt), (na - ka, na * mp.mpf(Nt - m) / Nt),
                 (kb, nb * mp.mpf(m) / Nt), (nb - kb, nb * mp.mpf(Nt - m) / Nt)]
        g = 2 * sum(o * mp.log(o / e) for o, e in cells if o > 0)
        for o, s in zip(ours, (x2, y2, g)):
            r = mp.erfc(mp.sqrt(s / 2))
            record(q, line, float(abs(mp.mpf(o) - r) / r) if r > mp.mpf('1e-300') else
                   (0.0 if o < 1e-290 else math.inf))
    elif q == 'bdcdf':
        pa, qa, pb, qb, d = ref
        rl, ru = beta_diff_ref(pa, qa, pb, qb, d)
        for o, r in zip(ours, (rl, ru)):
            if r > 1e-280:
                record(q, line, abs(math.exp(o) - r) / r)
    elif q == 'bdq':
        pa, qa, pb, qb, lp = ref
        for o, lower in zip(ours, (True, False)):
            if not math.isfinite(o):
                record(q, line, math.inf)
                continue
            rl, ru = beta_diff_ref(pa, qa, pb, qb, o)
            r = rl if lower else ru
            # the tail at q against the target, less what one ulp of q moves it
            ulp = abs(o) * 2.3e-16 + 1e-300
            rl2, ru2 = beta_diff_ref(pa, qa, pb, qb, o + ulp)
            slack = abs((rl2 if lower else ru2) - r)
            record(q, line, max(0.0, abs(r - math.exp(lp)) - slack) / math.exp(lp))
    elif q == 'logor':
        ka, na, kb, nb, sd = ref
        Nt, m = na + nb, ka + kb
        p0 = st.nchypergeom_fisher.pmf(ka, Nt, na, m, 1.0)

        def f(psi):
            return st.nchypergeom_fisher.pmf(ka, Nt, na, m, math.exp(psi)) / p0 * st.norm.pdf(psi, 0, sd)
        bf10 = si.quad(f, -12 * sd, 12 * sd, epsabs=0, epsrel=1e-12, limit=500, points=[0])[0]
        record(q, line, abs(ours[0] + math.log(bf10)))

print('scipy %s, mpmath %s, mp.dps = %d' % (scipy.__version__, mp.__version__, mp.mp.dps))
for q, (label, tol) in TOL.items():
    print('%-36s cases %6d  worst %.3g  tolerance %.0e  (%s)'
          % (label, count[q], worst[q][0], tol, worst[q][1]))
sys.exit(1 if failed else 0)
