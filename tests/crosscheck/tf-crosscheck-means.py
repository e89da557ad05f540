# SPDX-License-Identifier: GPL-3.0-or-later
"""Cross-check of Twofold's means numerics against scipy and mpmath.

Usage: /usr/bin/python3 tf-crosscheck-means.py PATH/TO/tf-crosscheck-driver [N]

Random cases over the whole valid domain (fixed seed; n from 2 to 1e8, |t| from 1e-3
to 1e3, r from 1e-2 to 1e2) go through one run of the C driver; each quantity is
compared with a reference and its worst error printed. Exit 0 when every case is inside
its tolerance, 1 otherwise, 77 when scipy or mpmath is missing. References: scipy 1.10.1
(Debian 12) and mpmath 1.2.1.

Errors: for ln BF, |got − ref| / max(1, |ref|) (the relative error of BF while |ln BF| < 1,
of ln BF beyond); for probabilities, the absolute error and the relative error where the
reference is above 1e-300; for the posterior's limits, the error over the width of the
equal-tailed interval (at most 1). N/200 posterior cases and the corners of the domain.
"""
import math
import sys

from tf_crosscheck_common import references, run_driver

np, _, _, mp, st, integrate, optimize = references('scipy.stats', 'scipy.integrate',
                                                   'scipy.optimize')
quad, brentq = integrate.quad, optimize.brentq
rng = np.random.default_rng(20240604)
N_CASES = int(sys.argv[2]) if len(sys.argv) > 2 else 10000
DRIVER = sys.argv[1]
failures = 0


def log_uniform(lo, hi):
    return float(math.exp(rng.uniform(math.log(lo), math.log(hi))))


def draw_design():
    """t, n_eff, df for one sample, two samples or a known SD."""
    n = float(round(log_uniform(2, 1e8)))
    u = rng.uniform()
    if u < 0.3:
        nb = float(round(log_uniform(2, 1e8)))
        n_eff, df = n * nb / (n + nb), n + nb - 2
    else:
        n_eff, df = n, n - 1
    if u > 0.9:
        df = math.inf
    t = log_uniform(1e-3, 1e3) * (1 if rng.uniform() < 0.5 else -1)
    return t, n_eff, df


def run(lines):
    """The driver's numbers for the lines, in order (each line ends in a newline)."""
    outs = run_driver(DRIVER, 'means', [line.rstrip('\n') for line in lines])
    return [float(x) for out in outs for x in out.split()]


def report(name, cases, got, ref, err_fn, tol, source):
    global failures
    worst, worst_case, bad = 0.0, None, 0
    for c, g, r in zip(cases, got, ref):
        e = err_fn(g, r)
        if not e <= tol:
            bad += 1
            if bad <= 3:
                print('  FAIL %s %r: got %r, ref %r' % (name, c, g, r))
        if not e <= worst:
            worst, worst_case = e, c
    print('%-10s %6d cases  worst %.3g (tolerance %g) at %r  [%s]'
          % (name, len(cases), worst, tol, worst_case, source))
    failures += bad


def lbf_err(g, r):
    return abs(g - r) / max(1.0, abs(r))


# --- references ---------------------------------------------------------------------

def jzs_log_integrand_u(u, t, n, df, r):
    """ln of the published integrand (Rouder et al. 2009, eq. 1 with scale r) times g,
    in u = ln g."""
    if u > 700 or u < -700:
        return -1e300
    g = math.exp(u)
    if df == math.inf:
        ll = -0.5 * math.log1p(n * g) + t * t / 2 * (n * g / (1 + n * g))
    else:
        ll = -0.5 * math.log1p(n * g) - (df + 1) / 2 * (
            math.log1p(t * t / ((1 + n * g) * df)) - math.log1p(t * t / df))
    return ll + math.log(r) - 0.5 * math.log(2 * math.pi) - u / 2 - r * r / (2 * g)


def jzs_scipy(t, n, df, r):
    """scipy.integrate.quad on the published integrand in ln g, split at its mode."""
    us = np.linspace(-60, 60, 481)
    v = [jzs_log_integrand_u(u, t, n, df, r) for u in us]
    i = int(np.argmax(v))
    um, m = us[i], v[i]
    f = lambda u: math.exp(jzs_log_integrand_u(u, t, n, df, r) - m)
    tot = 0.0
    for a, b in [(-np.inf, um - 5), (um - 5, um), (um, um + 5), (um + 5, um + 40), (um + 40, np.inf)]:
        tot += quad(f, a, b, epsabs=0, epsrel=1e-13, limit=200)[0]
    return m + math.log(tot)


def mp_log_quad(lf):
    """ln ∫ e^lf(u) du over ln g, by mpmath.quad split around the maximum on a grid."""
    us = [mp.mpf(x) / 2 for x in range(-100, 100)]
    vals = [lf(u) for u in us]
    i = max(range(len(us)), key=lambda k: vals[k])
    um, m = us[i], vals[i]
    val = mp.quad(lambda u: mp.e ** (lf(u) - m), [um - 30, um - 5, um, um + 5, um + 40, um + 80])
    return float(m + mp.log(val))


def jzs_mpmath(t, n, df, r):
    """mpmath.quad at 30 digits on the same published integrand."""
    mp.mp.dps = 30
    t, n, r = mp.mpf(t), mp.mpf(n), mp.mpf(r)
    inf = df == math.inf
    dfm = None if inf else mp.mpf(df)

    def lf(u):
        g = mp.e ** u
        if inf:
            ll = -mp.log1p(n * g) / 2 + t * t / 2 * (n * g / (1 + n * g))
        else:
            ll = -mp.log1p(n * g) / 2 - (dfm + 1) / 2 * (
                mp.log1p(t * t / ((1 + n * g) * dfm)) - mp.log1p(t * t / dfm))
        return ll + mp.log(r) - mp.log(2 * mp.pi) / 2 - u / 2 - r * r / (2 * g)
    return mp_log_quad(lf)


def normal_mpmath(t, n, df, r):
    """Gönen et al. (2005) with prior mean 0: the JZS integrand at g = r², in mpmath."""
    mp.mp.dps = 40
    t, n, g = mp.mpf(t), mp.mpf(n), mp.mpf(r) ** 2
    if df == math.inf:
        return float(-mp.log1p(n * g) / 2 + t * t / 2 * n * g / (1 + n * g))
    df = mp.mpf(df)
    return float(-mp.log1p(n * g) / 2 - (df + 1) / 2 * (mp.log1p(t * t / ((1 + n * g) * df))
                                                       - mp.log1p(t * t / df)))


def fmt(x):
    return 'inf' if x == math.inf else repr(x)


# --- Bayes factors ------------------------------------------------------------------

def extreme_designs():
    """The corners of the domain: t = ±10^3, 10^-3, 3; n = 2, 10^4, 10^8 as one sample,
    two equal samples and a known SD."""
    out = []
    for t in (1e3, -1e3, 1e-3, 3.0):
        for n in (2.0, 1e4, 1e8):
            out += [(t, n, n - 1), (t, n / 2, 2 * n - 2), (t, n, math.inf)]
    return out


EXTREME = [(t, n, df, r) for t, n, df in extreme_designs() for r in (1e-2, math.sqrt(0.5), 1e2)]
cases = []
for _ in range(N_CASES):
    t, n, df = draw_design()
    cases.append((t, n, df, log_uniform(1e-2, 1e2)))
got = run(['jzs %r %r %s %r\n' % (t, n, fmt(df), r) for t, n, df, r in cases + EXTREME])
report('jzs', cases, got, [jzs_scipy(*c) for c in cases], lbf_err, 1e-7,
       'scipy.integrate.quad(published integrand in ln g, epsrel=1e-13)')
report('jzs-x', EXTREME, got[len(cases):], [jzs_scipy(*c) for c in EXTREME], lbf_err, 1e-7,
       'the same scipy reference at the corners of the domain')
big = [i for i, c in enumerate(EXTREME) if c[1] >= 5e7 and c[3] == math.sqrt(0.5)]
report('jzs-x-mp', [EXTREME[i] for i in big], [got[len(cases) + i] for i in big],
       [jzs_mpmath(*EXTREME[i]) for i in big], lbf_err, 1e-9,
       'mpmath.quad, mp.dps = 30, n = 10^8, r = √2/2')
sub = list(range(0, len(cases), max(1, len(cases) // 100)))
report('jzs-mp', [cases[i] for i in sub], [got[i] for i in sub],
       [jzs_mpmath(*cases[i]) for i in sub], lbf_err, 1e-9, 'mpmath.quad, mp.dps = 30')

got = run(['normal %r %r %s %r\n' % (t, n, fmt(df), r) for t, n, df, r in cases])
report('normal', cases, got, [normal_mpmath(*c) for c in cases], lbf_err, 1e-9,
       'closed form in mpmath, mp.dps = 40')

# --- t tests ------------------------------------------------------------------------

pcases = []
for _ in range(N_CASES):
    t, n, df = draw_design()
    pcases.append((t * log_uniform(1e-2, 1), df if df != math.inf else math.inf, int(rng.integers(0, 3))))


def p_ref(t, df, d):
    dist = st.norm if df == math.inf else st.t(df)
    if d == 1:
        return dist.sf(t)
    if d == 2:
        return dist.cdf(t)
    return 2 * dist.sf(abs(t))


def p_err(g, r):
    if r < 1e-300:
        return abs(g - r)
    return abs(g - r) / r


got = run(['pval %r %s %d\n' % (t, fmt(df), d) for t, df, d in pcases])
report('p-value', pcases, got, [p_ref(*c) for c in pcases], p_err, 1e-9,
       'scipy.stats.t(df).sf / .cdf, scipy.stats.norm')

wcases = [(float(round(log_uniform(2, 1e8))), log_uniform(1e-3, 1e3),
           float(round(log_uniform(2, 1e8))), log_uniform(1e-3, 1e3)) for _ in range(N_CASES)]


def welch_ref(na, sa, nb, sb):
    va, vb = mp.mpf(sa) ** 2 / na, mp.mpf(sb) ** 2 / nb
    return float((va + vb) ** 2 / (va ** 2 / (na - 1) + vb ** 2 / (nb - 1)))


got = run(['welch %r %r %r %r\n' % c for c in wcases])
report('welch-df', wcases, got, [welch_ref(*c) for c in wcases], lambda g, r: abs(g - r) / r,
       1e-12, 'Welch 1947 formula in mpmath')

# --- noncentral t -------------------------------------------------------------------

ncases = []
for _ in range(N_CASES):
    df = log_uniform(1, 1e5)
    ncp = log_uniform(1e-3, 40) * (1 if rng.uniform() < 0.7 else -1)
    t = ncp + rng.normal() * 3 * math.sqrt(1 + ncp * ncp / (2 * df))
    ncases.append((t, df, ncp))
got = run(['nctcdf %r %r %r\n' % c for c in ncases])
ref = [st.nct.cdf(*c) for c in ncases]
report('nct-cdf', ncases, got, ref, lambda g, r: abs(g - r), 1e-9,
       'scipy.stats.nct.cdf (cdflib cdftnc), absolute error')

def nct_lpdf_mpmath(x, nu, mu):
    """The noncentral t density in confluent hypergeometric form (Johnson, Kotz &
    Balakrishnan 1995, §31.5), in mpmath with the digits raised until the two terms'
    cancellation (t and λ of opposite signs) leaves 15 digits."""
    for dps in (40, 120, 400):
        mp.mp.dps = dps
        xm, num, mum = mp.mpf(x), mp.mpf(nu), mp.mpf(mu)
        s = num + xm * xm
        z = mum * mum * xm * xm / (2 * s)
        A = mp.sqrt(2) * mum * xm * mp.hyp1f1(num / 2 + 1, mp.mpf(3) / 2, z) / (s * mp.gamma((num + 1) / 2))
        B = mp.hyp1f1((num + 1) / 2, mp.mpf(1) / 2, z) / (mp.sqrt(s) * mp.gamma(num / 2 + 1))
        tot = A + B
        if tot > 0 and abs(tot) > abs(B) * mp.mpf(10) ** (15 - dps):
            pre = (num / 2 * mp.log(num) + mp.loggamma(num + 1) - mum * mum / 2 - num * mp.log(2)
                   - num / 2 * mp.log(s) - mp.loggamma(num / 2))
            return float(pre + mp.log(tot))
    return math.nan


lcases = ncases[: N_CASES // 5]
got = run(['nctlpdf %r %r %r\n' % c for c in lcases])
report('nct-lpdf', lcases, got, [nct_lpdf_mpmath(*c) for c in lcases],
       lambda g, r: abs(g - r) / max(1.0, abs(r)), 1e-7,
       'mpmath.hyp1f1 closed form, mp.dps 40 to 400')

icases = []
for _ in range(N_CASES // 5):
    t, df, ncp = ncases[int(rng.integers(0, len(ncases)))]
    icases.append((t, df, float(rng.choice([0.005, 0.025, 0.05, 0.5, 0.95, 0.975, 0.995]))))
got = run(['ncpinv %r %r %r\n' % c for c in icases])


def ncp_ref(t, df, p):
    f = lambda lam: st.nct.cdf(t, df, lam) - p
    s = 1 + abs(t) / math.sqrt(2 * df)
    lo, hi = t - 12 * s, t + 12 * s
    return brentq(f, lo, hi, xtol=1e-13, rtol=1e-13)


report('ncp-inv', icases, got, [ncp_ref(*c) for c in icases],
       lambda g, r: abs(g - r) / max(1.0, abs(r)), 1e-7,
       'scipy.optimize.brentq on scipy.stats.nct.cdf')

# --- posterior mass of δ > 0 ---------------------------------------------------------

scases = []
for _ in range(N_CASES // 50):
    n = float(round(log_uniform(2, 1e4)))
    t = rng.normal() * 3
    scases.append((t, n, n - 1, log_uniform(0.1, 2)))
got = run(['side %r %r %r %r\n' % c for c in scases])


def nct_pdf_jkb(t, df, lam):
    """Johnson, Kotz & Balakrishnan (1995) eq. 31.15 by scipy.integrate.quad."""
    s = t * t + df
    a = lam * t / math.sqrt(s)
    y0 = 0.5 * (a + math.sqrt(a * a + 4 * df))
    lmax = df * math.log(y0) - 0.5 * (y0 - a) ** 2 if y0 > 0 else 0.0
    f = lambda y: math.exp(df * math.log(y) - 0.5 * (y - a) ** 2 - lmax) if y > 0 else 0.0
    w = 1.0 / math.sqrt(1 + df / max(y0, 1e-300) ** 2)
    I = (quad(f, 0, max(y0 - 10 * w, 0)), quad(f, max(y0 - 10 * w, 0), y0 + 10 * w),
         quad(f, y0 + 10 * w, np.inf))
    I = sum(v[0] for v in I)
    lc = (0.5 * df * math.log(df) - 0.5 * df * lam * lam / s - 0.5 * math.log(math.pi)
          - math.lgamma(df / 2) - (df - 1) / 2 * math.log(2) - (df + 1) / 2 * math.log(s))
    return math.exp(lc + lmax) * I


def side_ref(t, n, df, r):
    lik = lambda d: nct_pdf_jkb(t, df, math.sqrt(n) * d) * st.cauchy.pdf(d, 0, r)
    c = t / math.sqrt(n)
    w = math.sqrt((1 + t * t / (2 * df)) / n)
    pts = sorted({0.0, c - 10 * w, c, c + 10 * w})
    tot = quad(lik, -np.inf, pts[0], epsabs=0, epsrel=1e-12, limit=200)[0]
    pos = 0.0
    for a, b in zip(pts, pts[1:] + [np.inf]):
        v = quad(lik, a, b, epsabs=0, epsrel=1e-12, limit=200)[0]
        tot += v
        if a >= 0:
            pos += v
    return math.log(pos / tot)


sref = [side_ref(*c) for c in scases]
report('P(d>0)', scases, got, sref,
       lambda g, r: abs(math.exp(g) - math.exp(r)), 1e-7,
       'scipy.integrate.quad of the JKB 31.15 density (itself by quad) x scipy.stats.cauchy.pdf, absolute')

# --- the posterior of δ: credible limits, HDI, P(δ > 0) --------------------------------
# The reference tabulates the posterior on 160 Gauss–Legendre panels of 16 points graded
# toward the mode (and toward 0 on the scale of r), the likelihood by its own Gauss–Legendre
# rule in numpy; quantiles and the HDI by brentq. On a bimodal case (t = −28, n = 5,
# r = 0.01) Twofold's P(δ > 0) agreed with mpmath.quad of the hypergeometric form to 1e-13.

GL_X, GL_W = np.polynomial.legendre.leggauss(16)


def post_log_lik(t, df, lam):
    """ln ∫_0^∞ u^ν e^(−νu²/2 − (tu − λ)²/2) du for each λ (the noncentral t density of t
    at λ as a mixture over u = √(V/ν), Johnson, Kotz & Balakrishnan 1995, §31.5, up to a
    λ-free factor), by Gauss–Legendre on 40 panels of 16 points over ±40 sd of u about
    its mode, in numpy; the normal density when df = inf."""
    lam = np.atleast_1d(np.asarray(lam, dtype=float))
    if df == math.inf:
        return -0.5 * (t - lam) ** 2
    nu = df
    A = nu + t * t
    us = (t * lam + np.sqrt(t * t * lam * lam + 4 * nu * A)) / (2 * A)
    su = 1 / np.sqrt(nu / us ** 2 + A)
    lo = np.maximum(us - 40 * su, 0.0)
    hi = us + 40 * su
    edges = np.linspace(0, 1, 41)
    a, b = edges[:-1], edges[1:]
    x01 = (a[:, None] + (b - a)[:, None] * (GL_X[None, :] + 1) / 2).ravel()
    w01 = ((b - a)[:, None] / 2 * GL_W[None, :]).ravel()
    u = lo[:, None] + (hi - lo)[:, None] * x01[None, :]
    w = (hi - lo)[:, None] * w01[None, :]
    # exponent relative to u = u*: ν ln(u/u*) − ν(u² − u*²)/2 − ((tu − λ)² − (tu* − λ)²)/2
    v = (u - us[:, None]) / us[:, None]
    with np.errstate(divide='ignore', invalid='ignore'):
        e = (nu * np.log1p(v) - nu * (u - us[:, None]) * (u + us[:, None]) / 2
             - t * (u - us[:, None]) * (t * (u + us[:, None]) - 2 * lam[:, None]) / 2)
    e = np.where(u > 0, e, -np.inf)
    m = np.max(e, axis=1)
    s = np.sum(w * np.exp(e - m[:, None]), axis=1)
    e0 = nu * np.log(us) - nu * us * us / 2 - (t * us - lam) ** 2 / 2
    return e0 + m + np.log(s)


class PosteriorRef:
    def __init__(self, t, n, df, r, normal, lo=-math.inf, hi=math.inf):
        self.t, self.n, self.df, self.r, self.normal = t, n, df, r, normal
        self.lo, self.hi = lo, hi
        d = t / math.sqrt(n)
        wl = math.sqrt((1 + (0 if df == math.inf else t * t / (2 * df))) / n)
        a = max(min(0, d) - 10 * wl, lo)
        b = min(max(0, d) + 10 * wl, hi)
        xs = np.linspace(a, b, 401)
        ls = self.logu(xs)
        i = int(np.argmax(ls))
        for _ in range(3):
            step = xs[1] - xs[0]
            xs = np.linspace(max(xs[i] - step, lo), min(xs[i] + step, hi), 41)
            ls = self.logu(xs)
            i = int(np.argmax(ls))
        self.mode, self.shift = xs[i], ls[i]
        hh = min(wl, r) * 1e-3
        m = min(max(self.mode, lo + hh), hi - hh)
        g = self.logu(np.array([m - hh, m, m + hh])) - self.shift
        c = (g[0] - 2 * g[1] + g[2]) / hh ** 2
        sl = abs(g[2] - g[0]) / (2 * hh)
        wp = 1 / math.sqrt(-c) if c < 0 else min(wl, r)
        if sl * wp > 1:
            wp = 1 / sl
        # range: out to where the density is below e^-45 of the mode's
        L = max(self.mode - 40 * wp, lo)
        while L > lo and self.logu(np.array([L]))[0] - self.shift > -45:
            L = max(self.mode - 2 * (self.mode - L), lo)
        R = min(self.mode + 40 * wp, hi)
        while R < hi and self.logu(np.array([R]))[0] - self.shift > -45:
            R = min(self.mode + 2 * (R - self.mode), hi)
        # panels: 160 between L and R, graded toward the mode
        k = 80
        left = self.mode - (self.mode - L) * np.linspace(1, 0, k + 1) ** 2
        right = self.mode + (R - self.mode) * np.linspace(0, 1, k + 1) ** 2
        # and geometric toward 0, the prior's centre, on the scale of r (a spike there
        # under a narrow prior)
        if lo <= 0 <= hi and self.logu(np.array([0.0]))[0] - self.shift > -45:
            L, R = min(L, 0.0), max(R, 0.0)
            g = r * np.geomspace(1e-3, 1e4, 71)
            near0 = np.concatenate([-g, [0.0], g])
            near0 = near0[(near0 >= L) & (near0 <= R)]
        else:
            near0 = np.array([])
        self.edges = np.unique(np.concatenate([left, right, near0, [L, R]]))
        a, b = self.edges[:-1], self.edges[1:]
        x = (a[:, None] + (b - a)[:, None] * (GL_X[None, :] + 1) / 2)
        f = np.exp(self.logu(x.ravel()) - self.shift).reshape(x.shape)
        masses = np.sum((b - a)[:, None] / 2 * GL_W[None, :] * f, axis=1)
        self.cum = np.concatenate([[0.0], np.cumsum(masses)])
        self.total = self.cum[-1]

    def logu(self, x):
        x = np.asarray(x, dtype=float)
        lp = (-0.5 * (x / self.r) ** 2 if self.normal else -np.log1p((x / self.r) ** 2))
        return post_log_lik(self.t, self.df, math.sqrt(self.n) * x) + lp

    def cdf(self, x):
        x = min(max(x, self.edges[0]), self.edges[-1])
        i = int(np.searchsorted(self.edges, x, side='right')) - 1
        i = min(max(i, 0), len(self.edges) - 2)
        a = self.edges[i]
        if x == a:
            return self.cum[i]
        nodes = a + (x - a) * (GL_X + 1) / 2
        f = np.exp(self.logu(nodes) - self.shift)
        return self.cum[i] + (x - a) / 2 * np.sum(GL_W * f)

    def mass(self, a, b):
        return self.cdf(b) - self.cdf(a)

    def quantile(self, target):
        if target <= 0:
            return self.edges[0]
        if target >= self.total:
            return self.edges[-1]
        i = int(np.searchsorted(self.cum, target, side='right')) - 1
        i = min(max(i, 0), len(self.edges) - 2)
        a, b = self.edges[max(i - 1, 0)], self.edges[min(i + 2, len(self.edges) - 1)]
        return brentq(lambda x: self.cdf(x) - target, a, b, xtol=1e-15 * (abs(a) + abs(b - a)),
                      rtol=1e-15, maxiter=200)

    def hdi(self, level):
        gap = lambda p: (self.logu(np.array([self.quantile(p * self.total)]))[0]
                         - self.logu(np.array([self.quantile((p + level) * self.total)]))[0])
        # the root of the gap nearest the shortest of 201 intervals on a grid of p
        # (the grid's quantiles interpolated in the panels' cumulative masses)
        ps = np.linspace(0, 1 - level, 201)
        qa = lambda q: np.interp(q * self.total, self.cum, self.edges)
        i = int(np.argmin(qa(ps + level) - qa(ps)))
        x0, x1 = ps[max(i - 3, 0)], ps[min(i + 3, 200)]
        g0, g1 = gap(x0), gap(x1)
        if not (g0 < 0 < g1):
            x0, x1 = 0.0, 1 - level
            g0, g1 = gap(x0), gap(x1)
        if g0 >= 0:
            p = x0
        elif g1 <= 0:
            p = x1
        else:
            p = brentq(gap, x0, x1, xtol=1e-15, rtol=1e-15, maxiter=200)
        return self.quantile(p * self.total), self.quantile((p + level) * self.total)


def post_ref(t, n, df, r, normal, direction, level):
    full = PosteriorRef(t, n, df, r, normal)
    pplus = full.mass(0.0, math.inf) / full.total
    if direction == 0:
        p = full
    else:
        lo, hi = (0.0, math.inf) if direction == 1 else (-math.inf, 0.0)
        p = PosteriorRef(t, n, df, r, normal, lo, hi)
    q1 = p.quantile((1 - level) / 2 * p.total)
    q2 = p.quantile((1 + level) / 2 * p.total)
    h1, h2 = p.hdi(level)
    return q1, q2, h1, h2, pplus


def post_err(g, r):
    """credible limits: the error over the equal-tailed interval's width (at most 1);
    P(δ > 0): absolute"""
    scale = min(1.0, r[1] - r[0]) if r[1] > r[0] else 1.0
    return max([abs(g[i] - r[i]) / scale for i in range(4)] + [abs(g[4] - r[4])])


pcases_post = []
for _ in range(max(1, N_CASES // 200)):
    t, n, df = draw_design()
    pcases_post.append((t, n, df, log_uniform(1e-2, 1e2), int(rng.integers(0, 2)),
                        int(rng.integers(0, 3)), float(rng.choice([0.5, 0.8, 0.9, 0.95, 0.99]))))
pcases_post += [(t, n, df, math.sqrt(0.5), i % 2, i % 3, 0.95)
                for i, (t, n, df) in enumerate(extreme_designs())]
out = run(['post %r %r %s %r %d %d %r\n' % (t, n, fmt(df), r, k, d, lv)
           for t, n, df, r, k, d, lv in pcases_post])
got = [out[5 * i: 5 * i + 5] for i in range(len(pcases_post))]
report('posterior', pcases_post, got, [post_ref(*c) for c in pcases_post], post_err, 1e-7,
       'numpy Gauss-Legendre tables of the posterior, scipy brentq; equal-tailed and '
       'highest-density limits, P(d>0); (t, n, df, r, normal, side, level)')


# --- one-sided Bayes factors ----------------------------------------------------------
# BF+0 = BF10 P(δ > 0 | data) / ½ (Morey & Wagenmakers 2014), both factors from the
# references above; Twofold computes it as one integral over g instead.
got = run(['jzsside %r %r %r %r 1\n' % c for c in scases])
report('jzs-side', scases, got, [jzs_scipy(*c) + s + math.log(2) for c, s in zip(scases, sref)],
       lbf_err, 1e-7, 'scipy jzs reference + ln P(d>0) reference + ln 2')


def log_incbeta_cf(a, b, x):
    """ln I_x(a, b) in mpmath by the continued fraction (Abramowitz & Stegun 1964,
    26.5.8; modified Lentz), by I_x(a, b) = 1 − I_(1−x)(b, a) past its range of fast
    convergence (mpmath's own betainc does not converge for a near 10^8)."""
    if x > (a + 1) / (a + b + 2):
        return mp.log1p(-mp.e ** log_incbeta_cf(b, a, 1 - x))
    tiny = mp.mpf(10) ** (-2 * mp.mp.dps)
    c, d = mp.mpf(1), 1 - (a + b) * x / (a + 1)
    d = 1 / (d if abs(d) > tiny else tiny)
    f = d
    for m in range(1, 100000):
        for num in (m * (b - m) * x / ((a + 2 * m - 1) * (a + 2 * m)),
                    -(a + m) * (a + b + m) * x / ((a + 2 * m) * (a + 2 * m + 1))):
            d = 1 + num * d
            d = 1 / (d if abs(d) > tiny else tiny)
            c = 1 + num / c
            c = c if abs(c) > tiny else tiny
            f *= c * d
        if abs(c * d - 1) < mp.mpf(10) ** (3 - mp.mp.dps):
            break
    return (a * mp.log(x) + b * mp.log1p(-x) - mp.log(a) - mp.loggamma(a) - mp.loggamma(b)
            + mp.loggamma(a + b) + mp.log(f))


def log_t_cdf_mp(x, nu):
    """ln P(T <= x), T ~ t(nu) (nu = inf: the normal), in mpmath."""
    if nu == math.inf:
        return mp.log(mp.ncdf(x))
    tail = log_incbeta_cf(nu / 2, mp.mpf(1) / 2, nu / (nu + x * x)) - mp.log(2)
    return tail if x <= 0 else mp.log1p(-mp.e ** tail)


def side_mixture_mpmath(t, n, df, r, side):
    """ln BF±0 as the JZS mixture over g of BF10(g) · 2 P(±δ > 0 | data, g), with
    P(δ > 0 | g) = T_(ν+1)(t √(N g (ν + 1) / ((1 + N g) ν + t²))) (the conjugate update
    with σ integrated out; Φ(t √(N g / (1 + N g))) for a known SD), at mp.dps = 30."""
    mp.mp.dps = 30
    inf = df == math.inf
    t, n, r = mp.mpf(t), mp.mpf(n), mp.mpf(r)
    dfm = None if inf else mp.mpf(df)

    def lf(u):
        g = mp.e ** u
        if inf:
            ll = -mp.log1p(n * g) / 2 + t * t / 2 * (n * g / (1 + n * g))
            lp = log_t_cdf_mp(side * t * mp.sqrt(n * g / (1 + n * g)), math.inf)
        else:
            ll = -mp.log1p(n * g) / 2 - (dfm + 1) / 2 * (
                mp.log1p(t * t / ((1 + n * g) * dfm)) - mp.log1p(t * t / dfm))
            lp = log_t_cdf_mp(side * t * mp.sqrt(n * g * (dfm + 1) / ((1 + n * g) * dfm + t * t)),
                              dfm + 1)
        return ll + lp + mp.log(2 * r) - mp.log(2 * mp.pi) / 2 - u / 2 - r * r / (2 * g)
    return mp_log_quad(lf)


xside = [(t, n, df, math.sqrt(0.5), s) for t, n, df in extreme_designs()
         if abs(t) > 100 and n >= 5e7 for s in (1, -1)]
got = run(['jzsside %r %r %s %r %d\n' % (t, n, fmt(df), r, s) for t, n, df, r, s in xside])
report('jzs-side-x', xside, got, [side_mixture_mpmath(*c) for c in xside], lbf_err, 1e-9,
       'mpmath.quad of the mixture, T by continued fraction, mp.dps = 30, n = 10^8')


def normal_side_mpmath(t, n, df, r, side):
    """ln BF±0 with δ ~ N(0, r²): BF10 at g = r² times 2 P(±δ > 0 | data, g = r²)."""
    mp.mp.dps = 40
    g = mp.mpf(r) ** 2
    tm, nm = mp.mpf(t), mp.mpf(n)
    if df == math.inf:
        x = tm * mp.sqrt(nm * g / (1 + nm * g))
    else:
        x = tm * mp.sqrt(nm * g * (df + 1) / ((1 + nm * g) * df + tm * tm))
    return normal_mpmath(t, n, df, r) + float(mp.log(2) + log_t_cdf_mp(side * x, df + 1))


nside = [c + ((1 if rng.uniform() < 0.5 else -1),) for c in cases[: N_CASES // 10]]
got = run(['normalside %r %r %s %r %d\n' % (t, n, fmt(df), r, s) for t, n, df, r, s in nside])
report('normal-side', nside, got, [normal_side_mpmath(*c) for c in nside], lbf_err, 1e-9,
       'closed form with the T tail by continued fraction in mpmath, mp.dps = 40')

print('failures: %d' % failures)
sys.exit(1 if failures else 0)
