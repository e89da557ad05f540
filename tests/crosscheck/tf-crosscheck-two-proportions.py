# SPDX-License-Identifier: GPL-3.0-or-later
"""Cross-check of Twofold's two-proportions numerics (tf-fisher, tf-beta-difference,
tf-two-proportions) against mpmath and scipy.

Usage: /usr/bin/python3 tf-crosscheck-two-proportions.py PATH/TO/tf-crosscheck-driver [N [QUANTITY,...]]

Random cases (fixed seed), trials log-uniform from 1 to 10^9 with the edges (k = 0,
k = n, n = 1) drawn on purpose, N cases per quantity (default 10^4). The Bayes factor
with a normal prior on the log odds ratio is checked by tf-crosscheck-logor.py.
References, Debian 12: mpmath 1.2.1 at mp.dps = 40, scipy 1.10.1 (boost 1.x inside), numpy.
  lbf     ln BF01: the four ln B by mpmath.loggamma, 40 digits.      |Δ|/max(1,|r|) 1e-9
  hyper   ln pmf by mpmath.loggamma; ln cdf, ln sf by summing the pmf over a window of
          ±(12 SD + 1.5 |x − mode|) in extended precision (numpy longdouble
          cumulative log ratios from mpmath's value at the mode).      relative 1e-9
  fisher  the same sums: two-sided minimum-likelihood (1e-7 relative, as R's
          fisher.test), greater, less;                                  relative 1e-9
          and scipy.stats.fisher_exact(t).pvalue for tables with N <= 1000.   1e-9
  newc    Newcombe 1998 method 10 in mpmath, 40 digits, the textbook form.    1e-9
  tests   χ², Yates, G: statistics in exact rationals, p by mpmath.erfc.     1e-9
  bdexact P(θA <= θB), P(θA >= θB) (the difference's tails at d = 0) with the beta
          posteriors of beta priors with integer shapes (1, 2 or 3), every n to 10^9:
          the exact finite sums (Cook 2005, Miller 2015), summed from their largest
          term outward (mpmath.loggamma there, longdouble ratios), so exact at any n and
          deep in the tails (no floor).                               relative 1e-7
  bdcdf   P(Δ <= d), P(Δ >= d) at any d about the mean (±2.5 SD ·N(0,1)), prior shapes
          0.5 to 10^4 (log-uniform, or 0.5, 1, 2, 5): adaptive Gauss–Kronrod 7/15 over
          the narrower posterior, in its distance from its nearer end, ends graded
          geometrically where its mass reaches them, with boost's beta pdf/cdf/sf. Boost
          is noisy at huge shapes (about 1e-16 times the largest shape, relative), so
          the tolerance is 1e-7 plus the reference's own error estimate; probabilities
          below 1e-280 (boost underflows) are left to bdexact.        relative 1e-7
  bdq     the returned quantiles (levels 1e-8 to 0.5, both sides, the same shapes): the
          tail at q by the same Gauss–Kronrod against its target, less what one ulp
          of q moves it (the density there, by the same rule, times the ulp).   1e-7
Which reference checks which case, and why: the exact sums are the only reference that
holds at every n and far into the tails, but exist only at d = 0 with integer shapes
(the quantity the analysis reports, P(θA > θB)); quadrature over boost covers any d
and any shapes, with an error estimate of its own; mpmath's incomplete beta does not
converge at shapes above about 10^5, so mpmath serves only through loggamma.
Exit 0 when every case is inside its tolerance, 1 otherwise, 77 without scipy/mpmath.
"""
import math
import sys
import time

from tf_crosscheck_common import references, run_driver

T0 = time.time()

np, scipy, _, mp, st, boost = references('scipy.stats', 'scipy.stats._boost')
_beta_pdf, _beta_cdf, _beta_sf = boost._beta_pdf, boost._beta_cdf, boost._beta_sf
mp.mp.dps = 40
rng = np.random.default_rng(20240611)
N = int(sys.argv[2]) if len(sys.argv) > 2 else 10000


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


# ---- references for the difference of two betas ------------------------------------
# Gauss–Kronrod 7/15 (Kronrod 1965; nodes and weights as QUADPACK's qk15, Piessens et al.
# 1983, from memory: the Gauss part is checked against numpy's leggauss below, and the
# Kronrod rule by integrating x^0..x^22 exactly).
XK = np.array([0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
               0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
               0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
               0.207784955007898467600689403773245, 0.0])
WK = np.array([0.022935322010529224963732008058970, 0.063092092629978553290700663189204,
               0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
               0.169004726639267902826583426598550, 0.190350578064785409913256402421014,
               0.204432940075298892414161999234649, 0.209482141084727828012999174891714])
WG = np.array([0.129484966168869693270611432679082, 0.279705391489276667901467771423780,
               0.381830050505118944950369775488975, 0.417959183673469387755102040816327])
T15 = np.concatenate((-XK[:-1], XK[::-1]))
W15 = np.concatenate((WK[:-1], WK[::-1]))
W7 = np.zeros(15)
W7[[1, 3, 5, 7, 9, 11, 13]] = np.concatenate((WG[:-1], WG[::-1]))
_g = np.polynomial.legendre.leggauss(7)
assert np.allclose(T15[[1, 3, 5, 7, 9, 11, 13]], _g[0], rtol=0, atol=1e-15)
assert np.allclose(W7[[1, 3, 5, 7, 9, 11, 13]], _g[1], rtol=0, atol=1e-15)
assert all(abs(np.dot(W15, T15 ** k) - (2.0 / (k + 1) if k % 2 == 0 else 0)) < 1e-14 for k in range(23))


def gk_integrate(f, edges, tol=1e-10, max_iter=40):
    """∫ f over the union of [edges[i], edges[i+1]] by adaptive Gauss–Kronrod 7/15, f
    vectorised; every interval whose |K15 − G7| is above its share of tol·|total| is
    halved, all at once, until the sum of |K15 − G7| is below tol·|total|. Returns
    (total, error estimate)."""
    a, b = np.asarray(edges[:-1], float), np.asarray(edges[1:], float)
    keep = b > a
    a, b = a[keep], b[keep]
    done, done_err = 0.0, 0.0
    for _ in range(max_iter):
        if a.size == 0:
            break
        mid, half = 0.5 * (a + b), 0.5 * (b - a)
        x = mid[:, None] + half[:, None] * T15[None, :]
        y = f(x.ravel()).reshape(x.shape)
        k = half * (y @ W15)
        e = np.abs(k - half * (y @ W7))
        total = done + k.sum()
        if done_err + e.sum() <= tol * abs(total) or not np.isfinite(total):
            return total, done_err + e.sum()
        bad = e > 0.2 * tol * abs(total) / a.size
        done += k[~bad].sum()
        done_err += e[~bad].sum()
        a, b = np.concatenate((a[bad], mid[bad])), np.concatenate((mid[bad], b[bad]))
    return math.nan, math.inf


def graded(e0, e1, levels=120):
    """Points from e0 towards e1 closing in on e0 geometrically (ratio 1/8), for an end
    where the integrand may be singular."""
    return [e0 + (e1 - e0) * 8.0 ** -k for k in range(1, levels)]


class Diff:
    """Δ = θA − θB for θA ~ Beta(pa, qa), θB ~ Beta(pb, qb): its tails and density by
    gk_integrate over the narrower variable V, in its distance x from its nearer end
    (so that neither V's nor the other's arguments lose digits near 1); boost's beta
    pdf/cdf/sf (the ufuncs behind scipy.stats.beta, called directly: 30 times faster)."""

    def __init__(self, pa, qa, pb, qb):
        sa, sb = math.sqrt(BV(pa, qa)), math.sqrt(BV(pb, qb))
        # boost's beta pdf and tails carry a relative noise of about 5e-17 times the
        # largest shape (2e-8 at 5e8, measured against a degree-16 Chebyshev fit over
        # ±1 SD): the quadrature cannot settle below it
        self.tol = max(1e-11, 1e-16 * max(pa, qa, pb, qb))
        self.over_a = sa <= sb
        self.pv, self.qv, self.po, self.qo = (pa, qa, pb, qb) if self.over_a else (pb, qb, pa, qa)
        self.mv, self.sv = self.pv / (self.pv + self.qv), min(sa, sb)
        self.mo, self.so = self.po / (self.po + self.qo), max(sa, sb)
        self.mirror_v = self.mv > 0.5
        self.mirror_o = self.mo > 0.5

    def _parts(self, d):
        c = d if self.over_a else -d
        lo, hi = max(0.0, c), 1.0 - max(0.0, -c)         # v's range where 0 < w < 1
        if self.mirror_v:                                 # x = 1 − v
            x0, x1 = max(0.0, -c), 1.0 - max(0.0, c)
        else:
            x0, x1 = lo, hi
        pts = {x0, x1}
        for k in (-40, -20, -12, -8, -5, -3, -2, -1, 0, 1, 2, 3, 5, 8, 12, 20, 40):
            for m, s, shift in ((self.mv, self.sv, 0.0), (self.mo, self.so, c)):
                v = m + shift + k * s
                pts.add(1.0 - v if self.mirror_v else v)
        wmin, wmax = (1 - self.mv - 40 * self.sv, 1 - self.mv + 40 * self.sv) if self.mirror_v \
            else (self.mv - 40 * self.sv, self.mv + 40 * self.sv)
        if wmin <= x0 + 1e-3 * (x1 - x0):
            pts.update(graded(x0, x1))
        if wmax >= x1 - 1e-3 * (x1 - x0):
            pts.update(graded(x1, x0))
        edges = sorted(p for p in pts if x0 <= p <= x1)
        return c, x0, x1, edges

    def _args(self, x, c):
        """pdf of V at x, and (w, 1 − w) for the other variable."""
        if self.mirror_v:
            fv = _beta_pdf(x, self.qv, self.pv)
            w, wy = (1.0 - x) - c, x + c
        else:
            fv = _beta_pdf(x, self.pv, self.qv)
            w, wy = x - c, (1.0 - x) + c
        return fv, np.clip(w, 0, 1), np.clip(wy, 0, 1)

    def _tail_o(self, w, wy, lower):
        if self.mirror_o:
            return _beta_sf(wy, self.qo, self.po) if lower else _beta_cdf(wy, self.qo, self.po)
        return _beta_cdf(w, self.po, self.qo) if lower else _beta_sf(w, self.po, self.qo)

    def tails(self, d):
        """(P(Δ <= d), P(Δ >= d)), each with its error estimate."""
        c, x0, x1, edges = self._parts(d)
        out = []
        for lower in (True, False):
            want_lower = lower != self.over_a      # the tail of O in the integrand
            def f(x):
                fv, w, wy = self._args(x, c)
                return fv * self._tail_o(w, wy, want_lower)
            r, e = gk_integrate(f, edges, self.tol)
            # V's mass where the tail factor is 1 (w >= 1 for P(O <= w), w <= 0 for P(O >= w))
            if want_lower and c < 0:
                r += (_beta_cdf(-c, self.qv, self.pv) if self.mirror_v
                      else _beta_sf(1.0 + c, self.pv, self.qv))
            elif not want_lower and c > 0:
                r += (_beta_sf(1.0 - c, self.qv, self.pv) if self.mirror_v
                      else _beta_cdf(c, self.pv, self.qv))
            out.append((r, e))
        return out

    def density(self, d):
        c, x0, x1, edges = self._parts(d)
        def f(x):
            fv, w, wy = self._args(x, c)
            return fv * (_beta_pdf(wy, self.qo, self.po) if self.mirror_o else _beta_pdf(w, self.po, self.qo))
        return gk_integrate(f, edges, self.tol)[0]


def BV(p, q):
    s = p + q
    return p / s * (q / s) / (s + 1)


def p_greater_log(ax, bx, ay, by):
    """ln P(X > Y), X ~ Beta(ax, bx), Y ~ Beta(ay, by), ax a positive integer: the finite
    sum Σ_{i<ax} u_i, u_i = B(ay + i, by + bx) / ((bx + i) B(1 + i, bx) B(ay, by)) (Cook
    2005; Miller 2015). The terms rise to a mode and fall (their ratio, (ay + i)(bx + i) /
    ((ay + by + bx + i)(1 + i)), is decreasing); they are summed from the mode outward
    until they fall below e^−60 of it: u at the mode by mpmath.loggamma at 40 digits, the
    others by cumulative log ratios in numpy longdouble."""
    S = ay + by + bx
    mode = int(min(ax - 1, max(0, math.floor((ay * bx - S) / (by + 1)) + 1)))
    lu = (mp.loggamma(ay + mode) + mp.loggamma(by + bx) - mp.loggamma(ay + mode + by + bx)
          - mp.log(bx + mode) - (mp.loggamma(1 + mode) + mp.loggamma(bx) - mp.loggamma(1 + mode + bx))
          - (mp.loggamma(ay) + mp.loggamma(by) - mp.loggamma(ay + by)))
    L = np.longdouble
    parts = []
    for step in (1, -1):
        start, span = mode, 4096
        acc = L(0)
        while True:
            if step > 0:
                i = np.arange(start, min(ax - 1, start + span), dtype=L)      # ratio i -> i + 1
                lr = np.log(L(ay) + i) + np.log(L(bx) + i) - np.log(L(S) + i) - np.log1p(i)
            else:
                i = np.arange(start - 1, max(-1, start - 1 - span), -1, dtype=L)  # i + 1 -> i
                lr = -(np.log(L(ay) + i) + np.log(L(bx) + i) - np.log(L(S) + i) - np.log1p(i))
            if i.size == 0:
                break
            c = acc + np.cumsum(lr)
            parts.append(c)
            acc = c[-1]
            start += step * i.size
            if acc < -60:
                break
            span *= 2
    c = np.concatenate([np.array([L(0)])] + parts)
    return float(lu) + float(np.log(np.sum(np.exp(c))))


def exact_tails_d0(pa, qa, pb, qb):
    """(ln P(Δ <= 0), ln P(Δ >= 0)) for integer shapes, each by the shorter of its two sums."""
    # P(θB > θA): over θB's a (pb terms) or, mirrored, over 1 − θA (qa terms)
    le = p_greater_log(pb, qb, pa, qa) if pb <= qa else p_greater_log(qa, pa, qb, pb)
    # P(θA > θB): over θA (pa terms) or over 1 − θB (qb terms)
    ge = p_greater_log(pa, qa, pb, qb) if pa <= qb else p_greater_log(qb, pb, qa, pa)
    return le, ge


cases = []
for _ in range(N):
    ka, na, kb, nb = draw_pair()
    a, b = draw_shape(), draw_shape()
    cases.append(('lbf', 'lbf %d %d %d %d %.17g %.17g' % (ka, na, kb, nb, a, b), (ka, na, kb, nb, a, b)))
made = 0
while made < N:
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
    # the reference sums now, so that the windows are not all kept at once
    ix, lx = h.idx(), h.l(ka)
    tails = (h.logsum(ix <= ka), h.logsum(ix >= ka))
    two = h.logsum(h.logp <= lx + np.log1p(np.longdouble(1e-7)))
    cases.append(('hyper', 'hyper %d %d %d %d' % (ka, na, nb, m), (ka, na, nb, m, tails)))
    cases.append(('fisher', 'fisher %d %d %d %d' % (ka, na, kb, nb), (two, tails)))
    made += 1
for _ in range(N):
    ka, na, kb, nb = draw_pair(1000)
    cases.append(('fisher_scipy', 'fisher %d %d %d %d' % (ka, na, kb, nb), (ka, na, kb, nb)))
for _ in range(N):
    ka, na, kb, nb = draw_pair()
    level = [0.9, 0.95, 0.99, 0.999][rng.integers(4)]
    cases.append(('newc', 'newc %d %d %d %d %.17g' % (ka, na, kb, nb, level), (ka, na, kb, nb, level)))
made = 0
while made < N:
    ka, na, kb, nb = draw_pair()
    if ka + kb == 0 or ka + kb == na + nb:
        continue
    cases.append(('tests', 'tests %d %d %d %d' % (ka, na, kb, nb), (ka, na, kb, nb)))
    made += 1
for _ in range(N):
    ka, na, kb, nb = draw_pair()
    a, b = float(rng.integers(1, 4)), float(rng.integers(1, 4))
    pa, qa, pb, qb = ka + a, na - ka + b, kb + a, nb - kb + b
    cases.append(('bdexact', 'bdcdf %.17g %.17g %.17g %.17g 0' % (pa, qa, pb, qb), (pa, qa, pb, qb)))


def draw_bd_shapes():
    ka, na, kb, nb = draw_pair()
    if rng.uniform() < 0.5:
        a, b = float(rng.choice([0.5, 1.0, 2.0, 5.0])), float(rng.choice([0.5, 1.0, 2.0, 5.0]))
    else:
        a, b = (float(math.exp(rng.uniform(math.log(0.5), math.log(1e4)))) for _ in range(2))
    return ka + a, na - ka + b, kb + a, nb - kb + b


for _ in range(N):
    pa, qa, pb, qb = draw_bd_shapes()
    mean = pa / (pa + qa) - pb / (pb + qb)
    sd = math.sqrt(BV(pa, qa) + BV(pb, qb))
    d = float(min(0.999, max(-0.999, mean + rng.normal() * 2.5 * sd)))
    cases.append(('bdcdf', 'bdcdf %.17g %.17g %.17g %.17g %.17g' % (pa, qa, pb, qb, d), (pa, qa, pb, qb, d)))
for _ in range(N):
    pa, qa, pb, qb = draw_bd_shapes()
    lp = float(rng.uniform(math.log(1e-8), math.log(0.5)))
    cases.append(('bdq', 'bdq %.17g %.17g %.17g %.17g %.17g' % (pa, qa, pb, qb, lp), (pa, qa, pb, qb, lp)))
if len(sys.argv) > 3:          # only these quantities, comma-separated
    keep = sys.argv[3].split(',')
    cases = [c for c in cases if c[0] in keep]
outs = run_driver(sys.argv[1], 'two-proportions', [c[1] for c in cases])

TOL = {
    'lbf': ('ln BF01 closed form, abs/rel', 1e-9),
    'hyper': ('hypergeometric ln pmf, cdf, sf', 1e-9),
    'fisher': ('Fisher p (2-sided, >, <), rel.', 1e-9),
    'fisher_scipy': ('Fisher p vs scipy, N <= 1000', 1e-9),
    'newc': ('Newcombe limits, rel.', 1e-9),
    'tests': ('chi2, Yates, G p-values, rel.', 1e-9),
    'bdexact': ('P(diff <= 0), P(diff >= 0) exact sums', 1e-7),
    'bdcdf': ('P(diff <= d), P(diff >= d), rel.', 1e-7),
    'bdq': ('diff quantiles: tail at q, rel.', 1e-7),
}
worst = {q: (0.0, None) for q in TOL}
count = {q: 0 for q in TOL}
ncases = {q: 0 for q in TOL}
failed = 0
ref_failed = 0


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
    """Relative error of e^o against e^r (r a log probability), from |o − r| (a relative
    error of the probability of that size, also where e^r underflows)."""
    if r == -math.inf:
        return 0.0 if o == -math.inf else math.inf
    if not math.isfinite(o):
        return math.inf
    # less 2 ulp of r: beyond |ln p| ~ 10^9 a double cannot hold ln p to 1e-7
    e = max(0.0, abs(o - r) - 2 * math.ulp(r))
    return abs(math.expm1(e)) if e < 1 else math.inf


for (q, line, ref), out in zip(cases, outs):
    ours = [float(v) for v in out.split()]
    ncases[q] += 1
    if q == 'lbf':
        ka, na, kb, nb, a, b = [mp.mpf(v) for v in ref]
        r = (log_beta(ka + kb + a, na + nb - ka - kb + b) + log_beta(a, b)
             - log_beta(ka + a, na - ka + b) - log_beta(kb + a, nb - kb + b))
        record(q, line, abs(mp.mpf(ours[0]) - r) / max(1, abs(r)))
    elif q == 'hyper':
        x, na, nb, m, (le, ge) = ref
        r = lC(na, x) + lC(nb, m - x) - lC(na + nb, m)
        record(q, line, abs(mp.mpf(ours[0]) - r) / max(1, abs(r)))
        record(q, line, rel_log(ours[1], le))
        record(q, line, rel_log(ours[2], ge))
    elif q == 'fisher':
        two, (le, ge) = ref
        record(q, line, rel_log(ours[0], min(0.0, two)))
        record(q, line, rel_log(ours[1], min(0.0, ge)))
        record(q, line, rel_log(ours[2], min(0.0, le)))
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
    elif q == 'bdexact':
        for o, r in zip(ours, exact_tails_d0(*ref)):
            record(q, line, rel_log(o, r))
    elif q == 'bdcdf':
        pa, qa, pb, qb, d = ref
        D = Diff(pa, qa, pb, qb)
        for o, (r, e) in zip(ours, D.tails(d)):
            if not math.isfinite(r):
                ref_failed += 1
            elif r > 1e-280:
                record(q, line, max(0.0, abs(math.exp(o) - r) - e) / r)
    elif q == 'bdq':
        pa, qa, pb, qb, lp = ref
        D = Diff(pa, qa, pb, qb)
        for o, lower in zip(ours, (True, False)):
            if not math.isfinite(o):
                record(q, line, math.inf)
                continue
            r, e = D.tails(o)[0 if lower else 1]
            if not math.isfinite(r):
                ref_failed += 1
                continue
            # the tail at q against the target, less what one ulp of q moves it
            slack = 2.0 * D.density(o) * (abs(o) * 2.3e-16 + 1e-300) + e
            record(q, line, max(0.0, abs(r - math.exp(lp)) - slack) / math.exp(lp))

print('scipy %s, mpmath %s, mp.dps = %d; %.0f s; quadrature references that did not settle: %d'
      % (scipy.__version__, mp.__version__, mp.mp.dps, time.time() - T0, ref_failed))
for q, (label, tol) in TOL.items():
    print('%-38s cases %6d checks %6d  worst %.3g  tolerance %.0e  (%s)'
          % (label, ncases[q], count[q], worst[q][0], tol, worst[q][1]))
sys.exit(1 if failed else 0)
