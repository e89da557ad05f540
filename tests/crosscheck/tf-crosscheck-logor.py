# SPDX-License-Identifier: GPL-3.0-or-later
"""Cross-check of the two-proportions Bayes factor with a normal prior on the log odds
ratio (core/designs/proportions/tf-two-proportions-logor.c) from 1 to 10^12 trials a group.

Usage: /usr/bin/python3 tf-crosscheck-logor.py PATH/TO/tf-crosscheck-driver [N]

The quantity: ln BF01 = −ln ∫ e^{ψ kA} / E0[e^{ψ X}] φ(ψ; 0, σ²) dψ, X the central
hypergeometric count given the margins (the conditional likelihood, Fisher 1935).
Random cases (fixed seed) in three strata, references from Debian 12's numpy, scipy
1.10.1 and mpmath 1.2.1:
  bulk    N cases (default 10^4): trials 1 to 10^4 a group, log-uniform, with n = 1,
          k = 0 and k = n drawn on purpose; σ log-uniform 1e-6 to 1e6, a usual value, or
          one of 1e-100, 1e-30, 1e30, 1e100.
          Reference: E_ψ[e^{ψ(X − kA)}] summed over the whole support from cumulative
          log ratios (numpy longdouble), the outer integral on ψ = mode + τ s (mode by
          scipy.optimize.brentq, τ from the curvature there) by scipy.integrate.quad
          (epsrel 1e-13, breakpoints 1 apart in ψ), or for supports of up to 400
          outcomes by composite 16-point Gauss–Legendre, halved and quartered, kept
          when the two agree to 1e-14 (else quad).
  large   N/100 cases: 10^4 to 10^8 trials a group, effects to 12 SD, σ 1e-2 to 1e2,
          rare successes; the same exact sums over a window of ±60 SD about the
          central mode and kA.
  mpmath  N/700 cases (at least 7): 10^9 to 10^12 trials a group; near-null,
          moderate, zero-cell (σ 1 to 1e6), k = n, tiny σ (1e-6), huge σ (1e4) and
          rare-success tables. Each term ψu − Σ ln Γ(cell + 1) by mpmath.loggamma at
          mp.dps = 30; the sum over u term by term where the tilted SD is below 15,
          else as the integral of the Γ-continued terms (Poisson summation: the
          difference is below e^{−2π²·225}), 14-point Gauss–Legendre panels of 4 SD to
          ±14 SD; the outer integral by scipy.integrate.quad on the mpmath values.
Tolerance: |Δ ln BF01| <= 1e-7 + 1e-12 |ln BF01| (1e-7 relative on the Bayes factor;
the second term where ln BF is so large that double precision cannot hold 1e-7).
Exit 0 when every case is inside it, 1 otherwise, 77 without numpy/scipy/mpmath.
"""
import math
import sys
import time

from tf_crosscheck_common import references, run_driver

np, scipy, special, mp, si, so = references('scipy.integrate', 'scipy.optimize')
logsumexp = special.logsumexp
mp.mp.dps = 30
rng = np.random.default_rng(20261202)
N = int(sys.argv[2]) if len(sys.argv) > 2 else 10000
N_LARGE = max(8, N // 100)
N_MP = max(7, N // 700)
LN_SQRT_2PI = 0.5 * math.log(2 * math.pi)


def support(ka, na, kb, nb):
    m = ka + kb
    return max(0, m - nb), min(na, m)


def cells(na, nb, m, u):
    return (u, na - u, m - u, nb - m + u)


def tilted_mode(na, nb, m, lo, hi, psi):
    """Smallest u with ln P0(u+1)/P0(u) + ψ < 0 (the term ratio decreases in u)."""
    while lo < hi:
        mid = (lo + hi) // 2
        x = cells(na, nb, m, mid)
        num = x[1] * x[2]
        r = -math.inf if num == 0 else math.log(num / ((x[0] + 1) * (x[3] + 1)))
        if r + psi < 0:
            hi = mid
        else:
            lo = mid + 1
    return lo


def woolf_start(ka, na, kb, nb, sd):
    c = (ka + 0.5, na - ka + 0.5, kb + 0.5, nb - kb + 0.5)
    est = math.log(c[0] * c[3] / (c[1] * c[2]))
    v = sum(1 / x for x in c)
    return est * sd * sd / (sd * sd + v)


EPSREL = 1e-13


def outer(G, dG, d2G, start, sd):
    """ln ∫ e^{G(ψ)} dψ: mode by brentq on G' (a bracket grown from the start), then
    scipy quad (epsrel 1e-13) on ψ = mode + τ s, τ = (−G'')^{-1/2}, each side out to
    e^{−70}."""
    a, b, step = start, start, 1.0
    while dG(a) < 0:
        a -= step
        step *= 2
    step = 1.0
    while dG(b) > 0:
        b += step
        step *= 2
    mode = so.brentq(dG, a, b, xtol=1e-300, rtol=1e-13, maxiter=400) if a < b else a
    tau = 1.0 / math.sqrt(-d2G(mode))
    gm = G(mode)

    def f(s):
        return math.exp(float(G(mode + tau * s) - gm))

    total = 0.0
    for sign in (-1.0, 1.0):
        end = 1.0
        while float(G(mode + sign * tau * end) - gm) > -70 and end < 1e30:
            end *= 2
        # breakpoints 1 apart in ψ near the mode, so that a fall of the likelihood far
        # narrower than τ (a zero cell under a wide prior) is not stepped over
        pts = [sign * k / tau for k in range(1, 60) if k / tau < end] if tau > 1 else None
        r = si.quad(f, min(0, sign * end), max(0, sign * end), epsabs=0, epsrel=EPSREL,
                    limit=400, points=pts)[0]
        total += r
    return float(gm) + math.log(tau) + math.log(total)


class ExactRef:
    """Exact sums over a window of the support [w0, w1] holding the central mass and kA:
    lr(u) = ln P0(u)/P0(kA) by cumulative log ratios; ln P0(kA) = −logsumexp(lr)."""

    def __init__(self, ka, na, kb, nb, sd, w0, w1):
        self.ka, self.na, self.nb, self.m, self.sd = ka, na, nb, ka + kb, sd
        m = self.m
        u = np.arange(w0, w1 + 1, dtype=np.float64)
        r = (np.log((na - u[:-1]) * (m - u[:-1]) / ((u[:-1] + 1) * (nb - m + u[:-1] + 1)))
             if len(u) > 1 else np.zeros(0))
        lr = np.concatenate(([0.0], np.cumsum(r.astype(np.longdouble)))).astype(np.float64)
        self.lr = lr - lr[ka - w0]
        self.off = u - ka
        self.neg_r = -r
        self.w0 = w0
        self.l0 = logsumexp(self.lr)
        self.memo = {}

    def tilt(self, psi):
        if psi in self.memo:
            return self.memo[psi]
        i = int(np.searchsorted(self.neg_r, psi, side='right'))
        u = self.w0 + i
        x = cells(self.na, self.nb, self.m, u)
        sdt = 1.0 / math.sqrt(sum(1.0 / (c + 0.5) for c in x))
        h = int(16 * sdt + 40)
        sl = slice(max(0, i - h), i + h + 1)
        off = self.off[sl]
        e = self.lr[sl] + psi * off
        top = e.max()
        w = np.exp(e - top)
        tot = w.sum()
        dc = off - (u - self.ka)            # offsets from the tilted mode
        m1 = float(np.dot(w, dc)) / tot
        var = max(float(np.dot(w, dc * dc)) / tot - m1 * m1, 0.0)
        self.memo[psi] = (top + math.log(tot), (u - self.ka) + m1, var)
        return self.memo[psi]

    def G(self, psi):
        z = psi / self.sd
        return -(self.tilt(psi)[0] - self.l0) - 0.5 * z * z - math.log(self.sd) - LN_SQRT_2PI

    def dG(self, psi):
        return -self.tilt(psi)[1] - psi / self.sd ** 2

    def d2G(self, psi):
        return -self.tilt(psi)[2] - 1.0 / self.sd ** 2

    def G_vec(self, psis):
        """G at many ψ at once, over the whole window (for small windows)."""
        e = self.lr[None, :] + psis[:, None] * self.off[None, :]
        top = e.max(axis=1)
        lse = top + np.log(np.exp(e - top[:, None]).sum(axis=1))
        z = psis / self.sd
        return -(lse - self.l0) - 0.5 * z * z - math.log(self.sd) - LN_SQRT_2PI

    def log_bf01(self):
        ka, na, kb, nb = self.ka, self.na, self.m - self.ka, self.nb
        start = woolf_start(ka, na, kb, nb, self.sd)
        if len(self.lr) <= 400:
            r = outer_vec(self, start)
            if r is not None:
                return -r
        return -outer(self.G, self.dG, self.d2G, start, self.sd)


GL16_T, GL16_W = np.polynomial.legendre.leggauss(16)


def outer_vec(ref, start):
    """outer() for small windows, vectorised: the same mode and τ, then on each side
    composite 16-point Gauss–Legendre over pieces between the breakpoints (1 apart in ψ
    near the mode, doubling in s), each piece halved and quartered; None unless the two
    agree to 1e-14 (then the caller takes the quad path)."""
    a, b, step = start, start, 1.0
    while ref.dG(a) < 0:
        a -= step
        step *= 2
    step = 1.0
    while ref.dG(b) > 0:
        b += step
        step *= 2
    mode = so.brentq(ref.dG, a, b, xtol=1e-300, rtol=1e-13, maxiter=400) if a < b else a
    tau = 1.0 / math.sqrt(-ref.d2G(mode))
    gm = ref.G(mode)
    total = [0.0, 0.0]
    for sign in (-1.0, 1.0):
        end = 1.0
        while ref.G(mode + sign * tau * end) - gm > -70 and end < 1e30:
            end *= 2
        brk = {0.0, end}
        brk.update(k / tau for k in range(1, 60) if k / tau < end)
        e = 1.0
        while e < end:
            brk.add(e)
            e *= 2
        brk = np.array(sorted(brk))
        for j, sub in enumerate((2, 4)):
            lo = np.repeat(brk[:-1], sub) + np.tile(np.arange(sub), len(brk) - 1) * np.repeat(np.diff(brk), sub) / sub
            h = np.repeat(np.diff(brk), sub) / sub
            nodes = (lo[:, None] + 0.5 * h[:, None] * (1 + GL16_T[None, :])).ravel()
            wts = (0.5 * h[:, None] * GL16_W[None, :]).ravel()
            total[j] += float(np.dot(wts, np.exp(ref.G_vec(mode + sign * tau * nodes) - gm)))
    if not abs(total[0] - total[1]) <= 1e-14 * total[1]:
        return None
    return gm + math.log(tau) + math.log(total[1])


def exact_ref(ka, na, kb, nb, sd, cap=4_000_000):
    lo, hi = support(ka, na, kb, nb)
    if lo == hi:
        return 0.0
    m, N = ka + kb, na + nb
    mean0 = na * m / N
    sd0 = math.sqrt(na * (m / N) * ((N - m) / N) * (nb / max(N - 1, 1)))
    w0 = max(lo, int(min(ka, mean0) - 60 * sd0 - 50))
    w1 = min(hi, int(max(ka, mean0) + 60 * sd0 + 50))
    if w1 - w0 > cap:
        return None
    return ExactRef(ka, na, kb, nb, sd, w0, w1).log_bf01()


GL_T, GL_W = np.polynomial.legendre.leggauss(14)


class MpRef:
    """ψ u − Σ ln Γ(cell + 1) in mpmath at 30 digits; the sum over u term by term or as
    the integral of the Γ-continued terms."""

    def __init__(self, ka, na, kb, nb, sd):
        self.ka, self.na, self.nb, self.m, self.sd = ka, na, nb, ka + kb, sd
        self.lo, self.hi = support(ka, na, kb, nb)
        N, m = na + nb, ka + kb
        lg = mp.loggamma
        self.c0 = lg(na + 1) + lg(nb + 1) + lg(m + 1) + lg(N - m + 1) - lg(N + 1)
        self.memo = {}

    def H(self, psi, u):
        return psi * u - sum(mp.loggamma(c + 1) for c in cells(self.na, self.nb, self.m, u))

    def tilt(self, psi):
        """(ln Σ_u e^{ψu − Σ ln Γ(x+1)} as mpf, E[X] − u0, Var X, u0)."""
        if psi in self.memo:
            return self.memo[psi]
        na, nb, m = self.na, self.nb, self.m
        u0 = tilted_mode(na, nb, m, self.lo, self.hi, psi)
        x = cells(na, nb, m, u0)
        sdt = 1.0 / math.sqrt(sum(1.0 / (c + 0.5) for c in x))
        mpsi = mp.mpf(psi)
        h0 = self.H(mpsi, mp.mpf(u0))
        if sdt < 15:
            w, wi = mp.exp(mpsi), mp.exp(-mpsi)
            s, s1, s2 = mp.mpf(1), mp.mpf(0), mp.mpf(0)
            t, j = mp.mpf(1), u0
            while j < self.hi:
                c = cells(na, nb, m, j)
                t *= mp.mpf(c[1] * c[2]) / ((c[0] + 1) * (c[3] + 1)) * w
                j += 1
                s, s1, s2 = s + t, s1 + (j - u0) * t, s2 + (j - u0) ** 2 * t
                if t < 1e-40 * s:
                    break
            t, j = mp.mpf(1), u0
            while j > self.lo:
                c = cells(na, nb, m, j)
                t *= mp.mpf(c[0] * c[3]) / ((c[1] + 1) * (c[2] + 1)) * wi
                j -= 1
                s, s1, s2 = s + t, s1 + (j - u0) * t, s2 + (j - u0) ** 2 * t
                if t < 1e-40 * s:
                    break
            mean = float(s1 / s)
            res = (h0 + mp.log(s), mean, float(s2 / s) - mean ** 2, u0)
        else:
            half = min(14.0, 0.9 * min(x) / sdt)
            edges = np.linspace(-half, half, int(math.ceil(2 * half / 4.0)) + 1)
            s = s1 = s2 = 0.0
            for a, b in zip(edges[:-1], edges[1:]):
                for t, wt in zip(0.5 * (a + b) + 0.5 * (b - a) * GL_T, 0.5 * (b - a) * GL_W):
                    eta = sdt * t
                    v = wt * float(mp.exp(self.H(mpsi, u0 + mp.mpf(eta)) - h0))
                    s, s1, s2 = s + v, s1 + v * eta, s2 + v * eta * eta
            mean = s1 / s
            res = (h0 + mp.log(sdt * s), mean, s2 / s - mean ** 2, u0)
        self.memo[psi] = res
        return res

    def G(self, psi):
        z = mp.mpf(psi) / self.sd
        return (mp.mpf(psi) * self.ka - (self.c0 + self.tilt(psi)[0]) - z * z / 2
                - mp.log(self.sd) - LN_SQRT_2PI)

    def dG(self, psi):
        _, mean, _, u0 = self.tilt(psi)
        return (self.ka - u0) - mean - psi / self.sd ** 2

    def d2G(self, psi):
        return -self.tilt(psi)[2] - 1.0 / self.sd ** 2

    def log_bf01(self):
        if self.lo == self.hi:
            return 0.0
        ka, na, nb = self.ka, self.na, self.nb
        start = woolf_start(ka, na, self.m - ka, nb, self.sd)
        return -outer(self.G, self.dG, self.d2G, start, self.sd)


def log_uniform(lo, hi):
    return math.exp(rng.uniform(math.log(lo), math.log(hi)))


def draw_k(n, theta):
    r = rng.uniform()
    if r < 0.05:
        return 0
    if r < 0.1:
        return n
    k = round(n * theta + rng.normal() * math.sqrt(n * theta * (1 - theta) + 1))
    return int(min(n, max(0, k)))


def draw_sd():
    r = rng.uniform()
    if r < 0.03:
        return float(rng.choice([1e-100, 1e-30, 1e30, 1e100]))
    if r < 0.3:
        return float(rng.choice([0.25, 0.5, 0.7071, 1.0, 2.0]))
    return log_uniform(1e-6, 1e6)


cases = []                      # (stratum, ka, na, kb, nb, sd)
for _ in range(N):
    na = 1 if rng.uniform() < 0.05 else int(round(log_uniform(1, 1e4)))
    nb = 1 if rng.uniform() < 0.05 else int(round(log_uniform(1, 1e4)))
    th = rng.uniform()
    shift = rng.normal() * (0.3 if rng.uniform() < 0.3 else 3.0) / math.sqrt(min(na, nb) + 1)
    cases.append(('bulk', draw_k(na, th), na, draw_k(nb, min(1, max(0, th + shift))), nb, draw_sd()))
for i in range(N_LARGE):
    na, nb = int(round(log_uniform(1e4, 1e8))), int(round(log_uniform(1e4, 1e8)))
    th = log_uniform(1e-7, 0.5) if i % 4 == 0 else rng.uniform(0.02, 0.98)
    ka = draw_k(na, th)
    p = ka / na
    z = rng.uniform(-12, 12)
    pb = min(1, max(0, p + z * math.sqrt(p * (1 - p) * (1 / na + 1 / nb) + 1e-300)))
    kb = int(round(nb * pb))
    cases.append(('large', ka, na, kb, nb, log_uniform(1e-2, 1e2)))
MP_KINDS = ['near-null', 'moderate', 'zero-cell', 'k=n', 'tiny-sd', 'huge-sd', 'rare']
for i in range(N_MP):
    kind = MP_KINDS[i % len(MP_KINDS)]
    na, nb = int(10 ** rng.uniform(9, 12)), int(10 ** rng.uniform(9, 12))
    th = rng.uniform(0.05, 0.95)
    ka = int(round(na * th))
    sdb = math.sqrt(th * (1 - th) / nb)
    sd = float(rng.choice([0.5, 1.0, 2.0]))
    if kind == 'near-null':
        kb = int(round(nb * (th + rng.uniform(-2, 2) * math.sqrt(th * (1 - th) * (1 / na + 1 / nb)))))
    elif kind == 'moderate':
        kb = int(round(nb * (th + rng.uniform(3, 6) * sdb)))
    elif kind == 'zero-cell':
        ka, kb, sd = 0, int(rng.integers(0, 30)), log_uniform(1, 1e6)
    elif kind == 'k=n':
        ka, kb = na, nb - int(rng.integers(0, 30))
    elif kind == 'tiny-sd':
        kb, sd = int(round(nb * (th + rng.uniform(-3, 3) * 1e-3))), 1e-6
    elif kind == 'huge-sd':
        kb, sd = int(round(nb * (th + rng.uniform(-4, 4) * sdb))), 1e4
    else:
        ka, kb = int(rng.integers(0, 40)), int(rng.integers(0, 40))
    cases.append(('mpmath', ka, na, kb, nb, sd))

t0 = time.time()
outs = run_driver(sys.argv[1], 'two-proportions', ['logor %d %d %d %d %.17g' % c[1:] for c in cases])
t_ours = time.time() - t0

worst = {}
count = {}
skipped = 0
failed = 0
t_ref = {}
for c, o in zip(cases, outs):
    stratum, ka, na, kb, nb, sd = c
    t1 = time.time()
    ref = MpRef(ka, na, kb, nb, sd).log_bf01() if stratum == 'mpmath' \
        else exact_ref(ka, na, kb, nb, sd)
    t_ref[stratum] = t_ref.get(stratum, 0.0) + time.time() - t1
    if ref is None:
        skipped += 1
        continue
    ours = float(o)
    err = abs(ours - ref) if math.isfinite(ours) else math.inf
    tol = 1e-7 + 1e-12 * abs(ref)
    line = 'logor %d %d %d %d %.17g' % c[1:]
    count[stratum] = count.get(stratum, 0) + 1
    if err / tol > worst.get(stratum, (0.0, None, 0.0))[0]:
        worst[stratum] = (err / tol, line, err)
    if not err <= tol:
        failed += 1
        if failed <= 25:
            print('FAIL %s: ours %.17g, reference %.17g, |Δ| %.3g' % (line, ours, ref, err))

print('scipy %s, mpmath %s (mp.dps = %d); Twofold %.2f s for %d cases'
      % (scipy.__version__, mp.__version__, mp.mp.dps, t_ours, len(cases)))
for s in ('bulk', 'large', 'mpmath'):
    w = worst.get(s, (0.0, None, 0.0))
    print('%-7s cases %6d  worst |Δ ln BF01| %.3g = %.3g of its tolerance  reference %.1f s  (%s)'
          % (s, count.get(s, 0), w[2], w[0], t_ref.get(s, 0.0), w[1]))
if skipped:
    print('%d large cases skipped: their window of exact terms was over the cap' % skipped)
sys.exit(1 if failed else 0)
