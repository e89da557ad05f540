/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-proportions-logor.c: a second Bayes factor for two proportions, from a normal
 * prior on the log odds ratio ψ = ln[θA(1 − θB) / (θB(1 − θA))].
 *
 * Model: given the margins, kA has Fisher's noncentral hypergeometric distribution
 * with odds ratio e^ψ (Fisher 1935; the conditional likelihood). The nuisance
 * parameter, the baseline log odds, is not given a prior: conditioning on the margins
 * removes it from the likelihood. H0: ψ = 0; H1: ψ ~ N(0, σ²), σ = PriorScale. Then
 *   BF10 = ∫ e^{ψ kA} / M(ψ) φ(ψ; 0, σ²) dψ,   M(ψ) = E0[e^{ψ X}],
 * X central hypergeometric. Everything is in log space, relative to a reference
 * outcome u_r near the posterior's mean of X:
 *   ln M(ψ) = ln P0(u_r) + ψ u_r + ln S(ψ),   S(ψ) = Σ_u P0(u)/P0(u_r) e^{ψ(u − u_r)}.
 * S(ψ) is summed outcome by outcome, outward from its largest term, when the tilted
 * distribution's SD is below 30; above, the sum equals the integral over u of the same
 * terms continued by Γ to within e^{−2π²·900} (Poisson summation), and that integral is
 * taken by 40-point Gauss–Hermite quadrature on u standardised at its largest term,
 * each term in Loader's deviance form about that outcome (Loader 2000). The outer
 * integral is centred on the mode of the log integrand, found by safeguarded Newton
 * steps (it is concave), scaled by its curvature there (a Laplace-style substitution),
 * and taken by GSL's QAG (Piessens et al. 1983) over pieces of doubling width outward
 * (16-fold over a flat stretch) until the integrand is below e^{−36} of its peak.
 * A prior so narrow that σ times the support is below 1e-60 takes the second-order
 * expansion in σ; σ above 10^150 is not computed.
 */
#include "tf-two-proportions-private.h"
#include "tf-fisher.h"
#include "tf-logspace.h"

#include <math.h>
#include <float.h>
#include <glib/gi18n-lib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_integration.h>

#define TF_GH_NODES 40
#define TF_GH_MIN_SD 30.0
/* Beyond this 1/σ² underflows beside the curvature of a flat likelihood. */
#define TF_LOGOR_MAX_SD 1e150

typedef struct {
  TfHyper h;
  double ka, sd;
  double ur, lp_ur;             /* reference outcome and ln P0(u_r) */
  double mode, scale, g_mode;   /* the outer substitution ψ = mode + s · scale */
} LogOr;

typedef struct {
  double ls;                    /* ln S(ψ) */
  double mean, var;             /* of X − u_r under the tilted distribution */
} Tilt;

static const gsl_integration_fixed_workspace *
gauss_hermite (void)
{
  static gsize once = 0;
  static gsl_integration_fixed_workspace *w;
  if (g_once_init_enter (&once))
    {
      /* weight e^{−x²/2} */
      w = gsl_integration_fixed_alloc (gsl_integration_fixed_hermite, TF_GH_NODES, 0.0, 0.5,
                                       0.0, 0.0);
      g_once_init_leave (&once, 1);
    }
  return w;
}

/* The cells (kA, nA − kA, m − kA, nB − m + kA) at kA = u, and their signs in u. */
static void
cells_at (const TfHyper *h, double u, double x[4])
{
  x[0] = u;
  x[1] = h->n_a - u;
  x[2] = h->m - u;
  x[3] = h->n_b - h->m + u;
}

static const double sign[4] = { 1.0, -1.0, -1.0, 1.0 };

/* ln P0(u + 1)/P0(u) */
static double
log_ratio (const TfHyper *h, double u)
{
  double x[4];
  cells_at (h, u, x);
  return log ((x[1] * x[2]) / ((x[0] + 1.0) * (x[3] + 1.0)));
}

/* The largest term of the tilted distribution: the smallest u with
 * ln P0(u + 1)/P0(u) + ψ < 0 (the log ratio decreases in u). */
static double
tilted_mode (const TfHyper *h, double psi)
{
  double lo = h->lo, hi = h->hi;
  while (lo < hi)
    {
      double mid = floor (lo + (hi - lo) / 2.0);
      if (log_ratio (h, mid) + psi < 0.0)
        hi = mid;
      else
        lo = mid + 1.0;
    }
  return lo;
}

/* ln Γ(x + t + 1) − ln Γ(x + 1) − t ln x, x >= 1, x + t > 0 (Loader 2000: the
 * deviance and the Stirling remainders). */
static double
lgamma_step_rest (double x, double t)
{
  return tf_bd0_delta (x + t, x, t) + 0.5 * log1p (t / x) + tf_stirling_remainder (x + t)
         - tf_stirling_remainder (x);
}

/* S(ψ) term by term: the terms relative to the largest, by the ratio recurrence,
 * outward until below 1e-17 of the sum. */
static void
tilt_exact (const LogOr *lo, double psi, double u0, Tilt *t)
{
  const TfHyper *h = &lo->h;
  const double w = exp (psi), wi = exp (-psi);
  double s = 1.0, s1 = 0.0, s2 = 0.0, term = 1.0, x[4];

  for (double j = u0; j < h->hi; j += 1.0)
    {
      cells_at (h, j, x);
      term *= (x[1] * x[2]) / ((x[0] + 1.0) * (x[3] + 1.0)) * w;
      double k = j + 1.0 - u0;
      s += term, s1 += k * term, s2 += k * k * term;
      if (term < 1e-17 * s)
        break;
    }
  term = 1.0;
  for (double j = u0; j > h->lo; j -= 1.0)
    {
      cells_at (h, j, x);
      term *= (x[0] * x[3]) / ((x[1] + 1.0) * (x[2] + 1.0)) * wi;
      double k = j - 1.0 - u0;
      s += term, s1 += k * term, s2 += k * k * term;
      if (term < 1e-17 * s)
        break;
    }
  double m1 = s1 / s;
  t->ls = psi * (u0 - lo->ur) + (tf_hyper_log_pmf (h, u0) - lo->lp_ur) + log (s);
  t->mean = (u0 - lo->ur) + m1;
  t->var = MAX (s2 / s - m1 * m1, 0.0);
}

/* S(ψ) as the integral over u, by Gauss–Hermite on u = u0 + σ̂ x; each term's log
 * relative to u0 is η(ψ − ln OR(u0)) − Σ the cells' deviance parts, η = u − u0. */
static void
tilt_integral (const LogOr *lo, double psi, double u0, const double x[4], double sd, Tilt *t)
{
  const gsl_integration_fixed_workspace *gh = gauss_hermite ();
  const double slope = psi - log ((x[0] * x[3]) / (x[1] * x[2]));
  double q[TF_GH_NODES], qmax = -INFINITY;

  for (guint k = 0; k < TF_GH_NODES; k++)
    {
      double eta = sd * gh->x[k];
      double v = eta * slope + 0.5 * gh->x[k] * gh->x[k];
      for (int i = 0; i < 4; i++)
        v -= lgamma_step_rest (x[i], sign[i] * eta);
      q[k] = v;
      qmax = MAX (qmax, v);
    }
  double s = 0.0, s1 = 0.0, s2 = 0.0;
  for (guint k = 0; k < TF_GH_NODES; k++)
    {
      double wk = gh->weights[k] * exp (q[k] - qmax), eta = sd * gh->x[k];
      s += wk, s1 += wk * eta, s2 += wk * eta * eta;
    }
  double m1 = s1 / s;
  t->ls = psi * (u0 - lo->ur) + (tf_hyper_log_pmf (&lo->h, u0) - lo->lp_ur) + log (sd)
          + qmax + log (s);
  t->mean = (u0 - lo->ur) + m1;
  t->var = MAX (s2 / s - m1 * m1, 0.0);
}

static void
tilt (LogOr *lo, double psi, Tilt *t)
{
  double u0 = tilted_mode (&lo->h, psi), x[4], inv = 0.0;

  cells_at (&lo->h, u0, x);
  for (int i = 0; i < 4; i++)
    inv += 1.0 / (x[i] + 0.5);
  double sd = 1.0 / sqrt (inv);
  if (sd < TF_GH_MIN_SD)
    tilt_exact (lo, psi, u0, t);
  else
    tilt_integral (lo, psi, u0, x, sd, t);
}

/* The log integrand G(ψ) = ψ kA − ln M(ψ) + ln φ(ψ; 0, σ²), and G', G''. */
static double
log_integrand (LogOr *lo, double psi, double *d1, double *d2)
{
  Tilt t;
  double z = psi / lo->sd;

  tilt (lo, psi, &t);
  if (d1)
    *d1 = ((lo->ka - lo->ur) - t.mean) - z / lo->sd;
  if (d2)
    *d2 = -t.var - 1.0 / (lo->sd * lo->sd);
  return psi * (lo->ka - lo->ur) - lo->lp_ur - t.ls - 0.5 * z * z - log (lo->sd) - TF_LN_SQRT_2PI;
}

/* The mode of the concave G by Newton steps kept inside the bracket found so far
 * (bisection when a step leaves it). Returns FALSE when it does not settle. */
static gboolean
find_mode (LogOr *lo, double start, double *mode, double *curv)
{
  double psi = start, bl = -INFINITY, bh = INFINITY, d1, d2;

  for (int it = 0; it < 300; it++)
    {
      log_integrand (lo, psi, &d1, &d2);
      if (!isfinite (d1) || !isfinite (d2) || d2 >= 0.0)
        return FALSE;
      if (d1 > 0.0)
        bl = psi;
      else
        bh = psi;
      double step = -d1 / d2, next = psi + step;
      double tol = 1e-4 / sqrt (-d2);
      if (fabs (step) <= tol || bh - bl <= MAX (tol, 4.0 * DBL_EPSILON * fabs (psi)))
        {
          *mode = psi;
          *curv = -d2;
          return TRUE;
        }
      if (!(next > bl && next < bh))
        next = isfinite (bl) && isfinite (bh) ? 0.5 * (bl + bh) : psi + 0.5 * step;
      psi = next;
    }
  return FALSE;
}

static double
integrand (double s, void *data)
{
  LogOr *lo = data;
  return exp (log_integrand (lo, lo->mode + s * lo->scale, NULL, NULL) - lo->g_mode);
}

/* ∫ over s of e^{G(mode + s·scale) − G(mode)} on one side (dir = ±1): pieces
 * [0, b], [b, 2b], ... doubling (16-fold while the integrand stays flat), until the integrand at a piece's end S is below e^{−36}.
 * G is concave, so beyond S the integrand falls at least as fast as along the chord
 * from the mode, and the tail left out is at most e^{−36} of the integral up to S. */
static gboolean
integrate_side (LogOr *lo, gsl_integration_workspace *ws, double dir, double *sum)
{
  gsl_function f = { integrand, lo };
  /* the first piece at most 1 wide in ψ: where the prior is far wider than the
   * likelihood's fall (a zero cell), the fall stays inside a piece of its own size */
  double a = 0.0, b = MIN (1.0, 1.0 / lo->scale), last = 0.0;

  *sum = 0.0;
  for (int piece = 0; piece < 400; piece++)
    {
      double r, e;
      /* each piece to 1e-11 of itself or 1e-12 of the pieces before it */
      int status = gsl_integration_qag (&f, MIN (dir * a, dir * b), MAX (dir * a, dir * b),
                                        1e-12 * *sum, 1e-11, 200, GSL_INTEG_GAUSS21, ws, &r, &e);
      /* where G is huge its rounding, 1e-16 of it, is the floor of the error */
      if (status != GSL_SUCCESS && !(e <= MAX (1e-9, 1e-13 * fabs (lo->g_mode)) * (*sum + r)))
        return FALSE;
      *sum += r;
      double end = log_integrand (lo, lo->mode + dir * b * lo->scale, NULL, NULL) - lo->g_mode;
      if (!(end > -36.0))
        return isfinite (*sum);
      /* over a flat stretch (a likelihood that tends to a constant) grow faster */
      double grow = end > last - 0.1 ? 16.0 : 2.0;
      a = b;
      b *= grow;
      last = end;
    }
  return FALSE;
}

double
tf_two_proportions_log_or_bf01 (double ka, double na, double kb, double nb, double sd,
                                const char **why)
{
  LogOr lo = { 0 };
  double curv;

  if (!(isfinite (sd) && sd > 0.0))
    {
      *why = _("the normal prior on the log odds ratio needs a PriorScale above 0");
      return NAN;
    }
  if (sd > TF_LOGOR_MAX_SD)
    {
      *why = _("the normal prior on the log odds ratio needs a PriorScale of at most 10^150");
      return NAN;
    }
  tf_hyper_init (&lo.h, na, nb, ka + kb);
  if (lo.h.lo == lo.h.hi)
    return 0.0;               /* a margin is 0: the data say nothing about ψ */
  if (sd * (lo.h.hi - lo.h.lo) < 1e-60)
    {
      /* ψ·X stays below 1e-59 where the prior has its mass: the expansion
       * ln BF10 = σ²[(kA − E0 X)² − Var0 X]/2 + O(σ⁴ (hi − lo)⁴) (Taylor, in ψ) */
      double N = na + nb, m = ka + kb;
      double d = ka - na * (m / N), v = lo.h.sd * lo.h.sd;
      return -0.5 * (sd * d) * (sd * d) + 0.5 * (sd * sd) * v;
    }
  lo.ka = ka;
  lo.sd = sd;
  lo.ur = ka;
  lo.lp_ur = tf_hyper_log_pmf (&lo.h, ka);
  /* start from the normal approximation: Woolf's estimate with 0.5 in every cell,
   * shrunk by the prior */
  double c0 = ka + 0.5, c1 = na - ka + 0.5, c2 = kb + 0.5, c3 = nb - kb + 0.5;
  double est = log ((c0 * c3) / (c1 * c2));
  double v = 1.0 / c0 + 1.0 / c1 + 1.0 / c2 + 1.0 / c3;
  double start = est / (1.0 + v / (sd * sd));

  if (!find_mode (&lo, start, &lo.mode, &curv))
    {
      *why = _("the mode of the integrand over the log odds ratio was not found");
      return NAN;
    }
  /* the reference outcome at the posterior mean of X, for the fewest digits lost */
  Tilt t;
  tilt (&lo, lo.mode, &t);
  lo.ur = CLAMP (round (lo.ur + t.mean), lo.h.lo, lo.h.hi);
  lo.lp_ur = tf_hyper_log_pmf (&lo.h, lo.ur);
  lo.scale = 1.0 / sqrt (curv);
  lo.g_mode = log_integrand (&lo, lo.mode, NULL, NULL);

  gsl_integration_workspace *ws = gsl_integration_workspace_alloc (200);
  double left, right;
  gboolean ok = integrate_side (&lo, ws, -1.0, &left) && integrate_side (&lo, ws, 1.0, &right);
  gsl_integration_workspace_free (ws);
  double total = left + right;
  if (!ok || !(total > 0.0) || !isfinite (total) || !isfinite (lo.g_mode))
    {
      *why = _("the integral over the log odds ratio did not converge");
      return NAN;
    }
  return -(lo.g_mode + log (lo.scale) + log (total));
}

void
tf_two_proportions_add_log_or_bf (const TfAnalysis *analysis, TfResults *results)
{
  const char *why = NULL;
  g_autofree char *sd = tf_format_value (analysis->prior_scale, TF_MEASURE_ESTIMATE);
  /* TRANSLATORS: %s is the prior's standard deviation, e.g. 0.7071 */
  g_autofree char *label = g_strdup_printf (_("BF01, normal prior on the log odds ratio (SD %s, two-sided)"), sd);
  double l = tf_two_proportions_log_or_bf01 (analysis->successes_a, analysis->trials_a,
                                             analysis->successes_b, analysis->trials_b,
                                             analysis->prior_scale, &why);
  if (isfinite (l))
    tf_results_add (results, "bf01_log_or_normal", label, TF_MEASURE_BAYES_FACTOR, exp (l));
  else
    tf_results_add_undefined (results, "bf01_log_or_normal", label, TF_MEASURE_BAYES_FACTOR,
                              why ? why : _("the Bayes factor cannot be represented"));
}
