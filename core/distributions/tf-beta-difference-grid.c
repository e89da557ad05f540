/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-beta-difference-grid.c: the density of Δ = θA − θB on a whole figure grid at
 * once, as a discrete convolution.
 *
 * f(d) = ∫ f_V(v) f_O(v − c) dv over the narrower variable V (c = d over θA, −d over
 * θB), for v in (max(0, c), min(1, 1 + c)). With the output points d_i = (L + i) / S
 * (integers S, L) and the nodes v_j = j h, h = 1 / (S m), every v_j − c_i is itself a
 * node: each beta's log density is computed once on the nodes where it has mass (above
 * e^−34 of its largest value) and each f(d_i) is one sum of products, the trapezoidal
 * rule. Both ends of every integral, 0, 1, c_i and 1 + c_i, are nodes. The integrand is
 * t^β φ(t) at an end, t the distance from it, β the sum of the exponents of the factors
 * that vanish there, φ smooth; the end node is left out and Navot's expansion of the
 * rule's error (Navot 1961: the error is Σ_k ζ(−β − k) φ^(k)(0) h^(β+k+1) / k!, plus
 * nothing from an end where the integrand is negligible) is subtracted to k = 4, with
 * φ's derivatives from the logs of its linear factors. Inside, the rule converges
 * geometrically; h is at most a tenth of V's standard deviation. The expansion needs
 * φ smooth on the scale of h: where another factor vanishes within a few nodes of an end (d within a
 * few nodes of 0 or ±1), or a factor's log changes by more than ½ over one node there,
 * the point is left to the caller (NAN), as are all points where V would need more
 * than MAX_V_NODES nodes or O more than MAX_O_NODES.
 *
 * At d = 0 the density is infinite where both lower (or both upper) shapes add up to
 * 1 or less; that point is +inf.
 *
 * Where V is more than 1000 times narrower than O, f_O is expanded about V's mean
 * instead (see spike()).
 *
 * Accuracy: 1e-6 relative wherever the density is above 1e-3 of its largest value on
 * the grid (the aim; measured in tests/core/test-beta-difference.c against the
 * point-by-point integral, worst 7e-8 over 61 cases, and below a shape of 0.1 against
 * mpmath).
 */
#include "tf-beta-difference.h"
#include "tf-logspace.h"

#include <math.h>
#include <float.h>
#include <gsl/gsl_sf_zeta.h>

#define MAX_V_NODES 4000        /* nodes over V's mass */
#define MAX_O_NODES 60000       /* nodes of O's density */
#define LOG_NEGLIGIBLE 34.0     /* e^−34 ≈ 2e-15 of a beta's largest value */
#define END_TERMS 5             /* k = 0 .. 4 in Navot's expansion */
#define SPIKE 1e-3              /* V this much narrower than O: Taylor's theorem instead */

/* A beta's log density: for shapes adding up to less than 10^6 directly from ln x and
 * ln(1 − x) (the rounding of (p − 1) ln x is then below 1e-10 of it), else relative to
 * the mean r (exact for huge shapes: the log density at r by Loader's deviance, the
 * rest by log1p of the relative distance). */
typedef struct {
  double p, q, r, log_at_r, log_beta;
  gboolean direct;
} Dens;

static void
dens_init (Dens *ds, double p, double q)
{
  ds->p = p;
  ds->q = q;
  ds->r = p / (p + q);
  ds->log_at_r = tf_log_dbeta (ds->r, q / (p + q), p, q);
  ds->log_beta = tf_log_beta (p, q);
  ds->direct = p + q < 1e6;
}

/* ln f(x); −inf outside [0, 1] and at an end where the density is 0 or infinite (the
 * rule never uses an end node) */
static double
dens_log (const Dens *ds, double x)
{
  double t = x - ds->r, l = ds->log_at_r;
  if (!(x > 0.0 && x < 1.0))
    return -INFINITY;
  if (ds->direct)
    {
      /* 1 − x is exact for x >= ½ (Sterbenz), and x = k / K is within half an ulp */
      l = -ds->log_beta;
      if (ds->p != 1.0)
        l += (ds->p - 1.0) * log (x);
      if (ds->q != 1.0)
        l += (ds->q - 1.0) * (x < 0.5 ? log1p (-x) : log (1.0 - x));
      return l;
    }
  if (ds->p != 1.0)
    l += (ds->p - 1.0) * log1p (t / ds->r);
  if (ds->q != 1.0)
    l += (ds->q - 1.0) * log1p (-t / (1.0 - ds->r));
  return isnan (l) ? -INFINITY : l;
}

/* The nodes k h, k in [k0, k1] within [lim0, lim1] ∩ [0, K], where the density has
 * mass, scanned out from the mode (from the window's end nearest it; over the whole
 * window when both shapes are below 1). Fills vals[k − k0] with e^(ln f − max) and
 * returns the max (at the mode), or NAN when more than cap nodes would be needed. */
static double
mass_nodes (const Dens *ds, gint64 K, gint64 lim0, gint64 lim1, guint cap,
            gint64 *k0, gint64 *k1, double **vals)
{
  const double p = ds->p, q = ds->q;
  gboolean u_shaped = p < 1.0 && q < 1.0;
  double mode = p <= 1.0 ? 0.0 : q <= 1.0 ? 1.0 : (p - 1.0) / (p + q - 2.0);
  double lmax = dens_log (ds, CLAMP (mode, 1.0 / K, 1.0 - 1.0 / K));
  gint64 lo = MAX (lim0, 0), hi = MIN (lim1, K);

  *k0 = 1;
  *k1 = 0;
  *vals = NULL;
  if (hi < lo)
    return 0.0;
  /* more nodes in the window than allowed, and a mass wider than that: give up early
   * (a log-concave density falls by e^−34 within 36 standard deviations of its mode:
   * the exponential is the slowest) */
  if ((guint64) (hi - lo) > cap && p >= 1.0 && q >= 1.0 && 72.0 * tf_beta_sd (p, q) * K > cap)
    return NAN;
  gint64 start = CLAMP ((gint64) llround (mode * K), lo, hi);
  gint64 a = start, b = start;
  if (!u_shaped)
    {
      /* unimodal: out from the mode until the density is negligible, 16 nodes at a
       * time (up to 16 negligible ones are kept) */
      while (a > lo && dens_log (ds, (double) MAX (a - 16, lo) / K) >= lmax - LOG_NEGLIGIBLE)
        if ((guint64) (b - (a = MAX (a - 16, lo))) > cap)
          return NAN;
      a = MAX (a - 16, lo);
      while (b < hi && dens_log (ds, (double) MIN (b + 16, hi) / K) >= lmax - LOG_NEGLIGIBLE)
        if ((guint64) ((b = MIN (b + 16, hi)) - a) > cap)
          return NAN;
      b = MIN (b + 16, hi);
      /* the support's ends within a few nodes are taken in: the end corrections use them */
      if (a - lo <= 2)
        a = lo;
      if (hi - b <= 2)
        b = hi;
    }
  else
    {
      a = lo;
      b = hi;
    }
  if ((guint64) (b - a + 1) > cap)
    return NAN;
  double *v = g_new (double, b - a + 1);
  for (gint64 k = a; k <= b; k++)
    {
      double l = dens_log (ds, (double) k / K);
      v[k - a] = l;
      if (u_shaped && l > lmax)
        lmax = l;
    }
  for (gint64 k = a; k <= b; k++)
    v[k - a] = exp (v[k - a] - lmax);
  *k0 = a;
  *k1 = b;
  *vals = v;
  return lmax;
}

/* The four linear factors of the integrand: (v), (1 − v), (v − c), (1 − v + c), with
 * exponents pV − 1, qV − 1, pO − 1, qO − 1. */
typedef struct {
  double expo[4];
  double zeta[3][END_TERMS];    /* ζ(−β − k) for β from V's, O's or both shapes at an end */
} Ends;

/* ln φ(0) + ln Σ_k ζ(−β − k) φ^(k)(0)/φ(0) h^(β+k+1) / k! for the end at v = e, lower
 * (t = v − e) or upper (t = e − v); *ok FALSE when φ is not smooth on the scale of h
 * there. The sum is returned with its sign in *sign. */
static double
end_correction (const Ends *en, const Dens *dv, const Dens *dn, double c, double e,
                gboolean lower, double h, double log_negligible, double *sign, gboolean *ok)
{
  /* the value of each factor at the end and its slope in t */
  double lam[4] = { e, 1.0 - e, e - c, 1.0 - e + c };
  const double mu[4] = { 1.0, -1.0, 1.0, -1.0 };
  gboolean zero[4];
  double beta = 0.0, lphi = 0.0, psi[END_TERMS] = { 0 };
  int which = 0;

  /* v = 0 and v = 1 are exact; v = c, 1 + c are exact nodes too: a factor within
   * half a node of 0 is the vanishing one */
  for (int t = 0; t < 4; t++)
    {
      zero[t] = fabs (lam[t]) < 0.5 * h;
      if (zero[t])
        {
          beta += en->expo[t];
          which |= t < 2 ? 1 : 2;
        }
    }
  /* ln φ(0): the density of each beta without its vanishing factor */
  for (int s = 0; s < 2; s++)
    {
      const Dens *ds = s == 0 ? dv : dn;
      if (zero[2 * s] || zero[2 * s + 1])
        {
          int o = zero[2 * s] ? 2 * s + 1 : 2 * s;
          lphi += -ds->log_beta + (zero[o] ? 0.0 : en->expo[o] * log (lam[o]));
        }
      else
        lphi += dens_log (ds, s == 0 ? e : e - c);
    }
  /* a bound on the correction: where it is negligible, none is needed */
  double growth = 1.0, zmax = 0.0;
  for (int t = 0; t < 4; t++)
    if (!zero[t])
      growth += (fabs (en->expo[t]) + 4.0) * h / fabs (lam[t]);
  for (int k = 0; k < END_TERMS; k++)
    zmax = MAX (zmax, fabs (en->zeta[which - 1][k]));
  if (lphi + (beta + 1.0) * log (h) + 4.0 * log (growth) + log (zmax) < log_negligible)
    {
      *sign = 1.0;
      *ok = TRUE;
      return -INFINITY;
    }
  for (int t = 0; t < 4; t++)
    {
      if (zero[t] || en->expo[t] == 0.0)
        continue;
      double r = (lower ? mu[t] : -mu[t]) / lam[t], rk = r, fact = 1.0;
      if (!(fabs (r) * h < 1.0 / 6.0 && fabs (en->expo[t] * r) * h < 0.5))
        {
          *ok = FALSE;
          return 0.0;
        }
      for (int k = 1; k < END_TERMS; k++)
        {
          psi[k] += en->expo[t] * ((k & 1) ? 1.0 : -1.0) * fact * rk;
          fact *= k;
          rk *= r;
        }
    }
  /* φ^(k)/φ: complete Bell polynomials in ψ' .. ψ'''' */
  double p1 = psi[1] * h, p2 = psi[2] * h * h, p3 = psi[3] * h * h * h;
  double p4 = psi[4] * h * h * h * h;
  double bell[END_TERMS] = {
    1.0, p1, p2 + p1 * p1, p3 + 3.0 * p2 * p1 + p1 * p1 * p1,
    p4 + 4.0 * p3 * p1 + 3.0 * p2 * p2 + 6.0 * p2 * p1 * p1 + p1 * p1 * p1 * p1
  };
  double sum = 0.0, kf = 1.0;
  for (int k = 0; k < END_TERMS; k++)
    {
      if (k > 0)
        kf *= k;
      sum += en->zeta[which - 1][k] * bell[k] / kf;
    }
  *sign = sum < 0.0 ? -1.0 : 1.0;
  *ok = isfinite (lphi) && isfinite (sum) && beta > -1.0;
  return lphi + (beta + 1.0) * log (h) + log (fabs (sum));
}

static void
ends_init (Ends *en, const Dens *dv, const Dens *dn, gboolean lower_end)
{
  en->expo[0] = dv->p - 1.0;
  en->expo[1] = dv->q - 1.0;
  en->expo[2] = dn->p - 1.0;
  en->expo[3] = dn->q - 1.0;
  /* at a lower end the vanishing factors are V's (v) and O's (v − c); at an upper
   * end (1 − v) and (1 − v + c) */
  int iv = lower_end ? 0 : 1, io = lower_end ? 2 : 3;
  double betas[3] = { en->expo[iv], en->expo[io], en->expo[iv] + en->expo[io] };
  for (int w = 0; w < 3; w++)
    for (int k = 0; k < END_TERMS; k++)
      en->zeta[w][k] = betas[w] + k > -1.0 + 1e-9 || betas[w] + k < -1.0 - 1e-9
                       ? gsl_sf_zeta (-betas[w] - k) : NAN;
}

/* the end corrections of one side; FALSE when the point is left to the caller */
static gboolean
side (const Ends *en, const Dens *dv, const Dens *dn, double c, double e, gboolean lower,
      double h, double scale, double floor_, double *sum)
{
  double sign = 1.0;
  gboolean ok = TRUE;
  double negligible = floor_ > 0.0 ? log (h * floor_) + scale : -INFINITY;
  double l = end_correction (en, dv, dn, c, e, lower, h, negligible, &sign, &ok);
  if (!ok)
    return FALSE;
  /* the rule's sum is h Σ; its error is this, to be taken off */
  *sum -= sign * exp (l - scale) / h;
  return TRUE;
}

/* V far narrower than O: E f_O(μ_V − c + (V − μ_V)) by Taylor's theorem about w0 = μ_V − c,
 * f_O(w0) (1 + μ2 B2 / 2 + μ3 B3 / 6), B_k the complete Bell polynomials in the
 * derivatives of ln f_O at w0 and μ_k V's central moments; the next term is below
 * 1e-8 where |ψ'| σ_V < 0.01 and |ψ''| σ_V² < 1e-4 (checked), and f_O is smooth over
 * V's mass (w0 at least 40 σ_V inside (0, 1), else the point is left to the caller). */
static gboolean
spike (double pv, double qv, double po, double qo, gint64 sign, gint64 S, gint64 L, guint n,
       double *out)
{
  Dens dn;
  double s = pv + qv, mean = pv / s, sd = tf_beta_sd (pv, qv);
  double mu3 = 2.0 * (qv - pv) * sqrt (s + 1.0) / ((s + 2.0) * sqrt (pv * qv)) * sd * sd * sd;

  dens_init (&dn, po, qo);
  double mode = po <= 1.0 ? 0.0 : qo <= 1.0 ? 1.0 : (po - 1.0) / (po + qo - 2.0);
  double top = dens_log (&dn, CLAMP (mode, 1e-300, 1.0 - DBL_EPSILON));
  for (guint i = 0; i < n; i++)
    {
      double c = (double) (sign * (L + (gint64) i)) / S, w = mean - c, y = 1.0 - w;
      if (w <= 0.0 || y <= 0.0)
        {
          out[i] = -INFINITY;
          continue;
        }
      if (w < 40.0 * sd || y < 40.0 * sd)
        continue;
      double a = po - 1.0, b = qo - 1.0;
      double p1 = a / w - b / y, p2 = -a / (w * w) - b / (y * y);
      double p3 = 2.0 * a / (w * w * w) - 2.0 * b / (y * y * y);
      double l = dens_log (&dn, w);
      if (!(fabs (p1) * sd < 0.01 && fabs (p2) * sd * sd < 1e-4))
        {
          /* far in O's tail (below e^−40 of its top) the figure needs no digits */
          if (l < top - 40.0)
            out[i] = l;
          continue;
        }
      double b2 = p2 + p1 * p1, b3 = p3 + 3.0 * p2 * p1 + p1 * p1 * p1;
      double corr = 1.0 + 0.5 * sd * sd * b2 + mu3 * b3 / 6.0;
      out[i] = corr > 0.0 ? l + log (corr) : NAN;
    }
  return TRUE;
}

/* The convolution on one grid: the frame (sign 1 over θA, −1 over θB), the nodes
 * k h, h = 1 / K, K = S m, each beta's log density and the end expansions, and each
 * beta's mass nodes (V's fv[j − jv0] for j in [jv0, jv1], O's fo[k − ko0] for k in
 * [ko0, ko1], each relative to its largest, e^lv and e^ln_). */
typedef struct {
  gint64 sign, L, m, K;
  double h;
  Dens dv, dn;
  Ends lower, upper;
  gint64 jv0, jv1, ko0, ko1;
  double *fv, *fo;
  double lv, ln_;
} Grid;

/* Point i's integral: c = J / K, its ends Li, Ui (both nodes) and the nodes [a, b]
 * within them where both densities have mass. */
typedef struct {
  gint64 J, Li, Ui, a, b;
} Span;

/* Each beta's mass nodes: V's over its support, O's as far as some point of the grid
 * needs them; FALSE when either needs too many. */
static gboolean
grid_nodes (Grid *gr, guint n)
{
  gr->lv = mass_nodes (&gr->dv, gr->K, 0, gr->K, MAX_V_NODES, &gr->jv0, &gr->jv1, &gr->fv);
  if (isnan (gr->lv))
    return FALSE;
  gint64 J0 = gr->sign * gr->L * gr->m, J1 = gr->sign * (gr->L + (gint64) n - 1) * gr->m;
  gint64 Jmin = MIN (J0, J1), Jmax = MAX (J0, J1);
  gr->ln_ = mass_nodes (&gr->dn, gr->K, gr->jv0 - Jmax, gr->jv1 - Jmin, MAX_O_NODES, &gr->ko0,
                        &gr->ko1, &gr->fo);
  return !isnan (gr->ln_);
}

static void
point_span (const Grid *gr, guint i, Span *sp)
{
  sp->J = gr->sign * (gr->L + (gint64) i) * gr->m;
  sp->Li = MAX (0, sp->J);
  sp->Ui = MIN (gr->K, gr->K + sp->J);
  sp->a = MAX (sp->Li, MAX (gr->jv0, sp->J + gr->ko0));
  sp->b = MIN (sp->Ui, MIN (gr->jv1, sp->J + gr->ko1));
}

/* The rule's sum for point i over its nodes, end nodes left out, in *sum; FALSE when
 * the point is not the rule's: out[i] then +inf where the density is infinite (d = 0),
 * −inf for d outside (−1, 1) or no mass, left NAN where an end has too few nodes. */
static gboolean
point_sum (const Grid *gr, guint i, double *sum, double *out)
{
  Span sp;
  point_span (gr, i, &sp);
  gboolean true_a = sp.a == sp.Li, true_b = sp.b == sp.Ui;
  if (sp.J == 0 && gr->lower.expo[0] + gr->lower.expo[2] <= -1.0)
    {
      out[i] = INFINITY;      /* both lower shapes add up to 1 or less: f(0) = ∞ */
      return FALSE;
    }
  if (sp.J == 0 && gr->upper.expo[1] + gr->upper.expo[3] <= -1.0)
    {
      out[i] = INFINITY;
      return FALSE;
    }
  if (!(sp.J > -gr->K && sp.J < gr->K) || sp.b < sp.a)
    {
      out[i] = -INFINITY;     /* d outside (−1, 1), or no mass */
      return FALSE;
    }
  if ((true_a || true_b) && sp.b - sp.a < 4)
    return FALSE;           /* too few nodes for an end: left to the caller */
  const double *x = gr->fv - gr->jv0, *y = gr->fo - (sp.J + gr->ko0);
  /* four sums, which the processor can run side by side */
  double s4[4] = { 0.0, 0.0, 0.0, 0.0 };
  gint64 j = sp.a + true_a, end = sp.b - true_b;
  for (; j + 3 <= end; j += 4)
    for (int q = 0; q < 4; q++)
      s4[q] += x[j + q] * y[j + q];
  for (; j <= end; j++)
    s4[0] += x[j] * y[j];
  *sum = (s4[0] + s4[1]) + (s4[2] + s4[3]);
  return TRUE;
}

/* Point i's log density from its sum, Navot's corrections taken off at each end of the
 * integral that is an end of the rule; left NAN where a correction cannot be made. */
static void
point_finish (const Grid *gr, guint i, double sum, double top, double *out)
{
  Span sp;
  point_span (gr, i, &sp);
  double c = (double) sp.J / gr->K;
  double floor_ = MAX (1e-13 * sum, 1e-12 * top);
  const double scale = gr->lv + gr->ln_;
  if (isnan (sum))
    return;
  if (sp.a == sp.Li && !side (&gr->lower, &gr->dv, &gr->dn, c, (double) sp.Li / gr->K, TRUE,
                              gr->h, scale, floor_, &sum))
    return;
  if (sp.b == sp.Ui && !side (&gr->upper, &gr->dv, &gr->dn, c, (double) sp.Ui / gr->K, FALSE,
                              gr->h, scale, floor_, &sum))
    return;
  if (sum > 0.0)
    out[i] = log (gr->h * sum) + gr->lv + gr->ln_;
  else if (sp.a != sp.Li && sp.b != sp.Ui)
    out[i] = -INFINITY;
}

/* The sums first; the end corrections then, where they are not negligible next to the
 * point's sum (1e-13) or the largest (1e-12: far in a tail, the expansion is not needed
 * to draw 0). */
static void
convolve (const Grid *gr, guint n, double *out)
{
  g_autofree double *sums = g_new (double, n);
  double top = 0.0;
  for (guint i = 0; i < n; i++)
    {
      sums[i] = NAN;
      if (point_sum (gr, i, &sums[i], out))
        top = MAX (top, sums[i]);
    }
  for (guint i = 0; i < n; i++)
    point_finish (gr, i, sums[i], top, out);
}

gboolean
tf_beta_diff_log_density_grid (const TfBetaDiff *bd, gint64 S, gint64 L, guint n,
                               double *out)
{
  const double pv = bd->over_a ? bd->pa : bd->pb, qv = bd->over_a ? bd->qa : bd->qb;
  const double po = bd->over_a ? bd->pb : bd->pa, qo = bd->over_a ? bd->qb : bd->qa;
  const gint64 sign = bd->over_a ? 1 : -1;
  Grid gr = { .sign = sign, .L = L, .fv = NULL, .fo = NULL };

  for (guint i = 0; i < n; i++)
    out[i] = NAN;
  if (S < 1)
    return FALSE;
  if (tf_beta_sd (pv, qv) < SPIKE * tf_beta_sd (po, qo))
    return spike (pv, qv, po, qo, sign, S, L, n, out);
  double m_real = MAX (1.0, ceil (10.0 / ((double) S * tf_beta_sd (pv, qv))));
  if (!(m_real * S < 1e15))
    return FALSE;
  gr.m = (gint64) m_real;
  gr.K = S * gr.m;
  gr.h = 1.0 / (double) gr.K;
  dens_init (&gr.dv, pv, qv);
  dens_init (&gr.dn, po, qo);
  ends_init (&gr.lower, &gr.dv, &gr.dn, TRUE);
  ends_init (&gr.upper, &gr.dv, &gr.dn, FALSE);

  gboolean done = grid_nodes (&gr, n);
  if (done)
    convolve (&gr, n, out);
  g_free (gr.fv);
  g_free (gr.fo);
  return done;
}
