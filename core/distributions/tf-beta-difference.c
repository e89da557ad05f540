/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-beta-difference.c: the difference Δ = θA − θB of two independent beta variables,
 * by one-dimensional integration (Pham-Gia, Turkkan & Eng 1993 give its density as a
 * convolution; here it is integrated numerically, not through Appell's F1).
 *
 * P(Δ <= d) = ∫ f_A(z) P(θB >= z − d) dz, P(Δ >= d) = ∫ f_A(z) P(θB <= z − d) dz and
 * the density ∫ f_A(z) f_B(z − d) dz, or the same over θB, whichever is the narrower
 * (the integration variable V; the other is O, at w = v − c with c = d over θA and
 * c = −d over θB). Each is integrated by the fixed rule of tf-beta-difference-line.c
 * (the trapezoidal rule on the whole line after a logistic map, to 1e-10). Where that
 * does not settle over the narrower variable (a shape far below 1 decays slowly on the
 * line) it is tried over the other; where neither does (both shapes at the same end
 * far below 1, mass below the smallest double), the adaptive piecewise integration of
 * tf-beta-difference-pieces.c is used instead. TF_BETA_DIFF_PIECES set in the
 * environment forces the latter (for comparisons).
 *
 * Quantiles are found by Newton's method on the log tail, safeguarded by bisection,
 * from the Cornish–Fisher approximation: each step is one tail and one density.
 */
#include "tf-beta-difference-private.h"
#include "tf-logspace.h"

#include <math.h>
#include <float.h>
#include <gsl/gsl_cdf.h>

void
tf_beta_diff_init (TfBetaDiff *bd, double pa, double qa, double pb, double qb)
{
  double sa = tf_beta_sd (pa, qa), sb = tf_beta_sd (pb, qb);

  bd->pa = pa;
  bd->qa = qa;
  bd->pb = pb;
  bd->qb = qb;
  bd->over_a = sa <= sb;
  bd->mean = pa / (pa + qa) - pb / (pb + qb);
  bd->sd = sqrt (sa * sa + sb * sb);
  bd->epsrel = 1e-10;
  bd->have_cuts = FALSE;
  bd->n_cuts = 0;
  bd->pieces_only = g_getenv ("TF_BETA_DIFF_PIECES") != NULL;
}

/* One tail or the density: the fixed rule over the narrower variable, else over the
 * other (a shape far below 1 of the narrower one decays slowly on the line), else the
 * adaptive rule. */
static double
integrate (TfBetaDiff *bd, double d, TfBdKind kind, gboolean *ok)
{
  double r;
  *ok = TRUE;
  if (!bd->pieces_only
      && (tf_beta_diff_line (bd, bd->over_a, d, kind, &r)
          || tf_beta_diff_line (bd, !bd->over_a, d, kind, &r)))
    return r;
  return tf_beta_diff_pieces (bd, d, kind, ok);
}

gboolean
tf_beta_diff_log_cdf (TfBetaDiff *bd, double d, double *log_lower, double *log_upper)
{
  gboolean ok1 = TRUE, ok2 = TRUE;

  if (d <= -1.0)
    {
      *log_lower = -INFINITY;
      *log_upper = 0.0;
      return TRUE;
    }
  if (d >= 1.0)
    {
      *log_lower = 0.0;
      *log_upper = -INFINITY;
      return TRUE;
    }
  double l = integrate (bd, d, TF_BD_LOWER, &ok1);
  double u = integrate (bd, d, TF_BD_UPPER, &ok2);
  /* each from its own integral; the larger is rounded into [0, 1] */
  *log_lower = MIN (l, 0.0);
  *log_upper = MIN (u, 0.0);
  return ok1 && ok2;
}

/* One tail only, the other not integrated. */
static double
log_tail (TfBetaDiff *bd, double d, gboolean lower, gboolean *ok)
{
  *ok = TRUE;
  if (d <= -1.0)
    return lower ? -INFINITY : 0.0;
  if (d >= 1.0)
    return lower ? 0.0 : -INFINITY;
  double l = integrate (bd, d, lower ? TF_BD_LOWER : TF_BD_UPPER, ok);
  return MIN (l, 0.0);
}

double
tf_beta_diff_log_density (TfBetaDiff *bd, double d)
{
  gboolean ok;
  if (!(d > -1.0 && d < 1.0))
    return -INFINITY;
  double l = integrate (bd, d, TF_BD_DENSITY, &ok);
  return ok ? l : NAN;
}

/* The third central moment of Beta(p, q). */
static double
beta_mu3 (double p, double q)
{
  double s = p + q, sd = tf_beta_sd (p, q);
  return 2.0 * (q - p) * sqrt (s + 1.0) / ((s + 2.0) * sqrt (p * q)) * sd * sd * sd;
}

/* Newton's method on ln P(Δ <= x) − ln p (or the upper tail), whose slope is
 * ± f(x) / P, kept inside a bracket that every step narrows; bisection where a Newton
 * step leaves it. Starts from the Cornish–Fisher approximation with the skewness
 * (Cornish & Fisher 1937), else the normal one. Once the log tail is within 1e-6 of
 * its target, the next Newton step is within about 1e-12 and is returned unchecked.
 * Where the fixed rule cannot give the density, a secant step is taken instead. */
double
tf_beta_diff_quantile_log (TfBetaDiff *bd, double log_p, gboolean lower)
{
  double lo = -1.0, hi = 1.0, x, xp = NAN, ltp = NAN;
  double f_lo = NAN, s_lo = NAN, f_hi = NAN, s_hi = NAN;
  gboolean ok;

  if (!(log_p < 0.0))
    return lower ? 1.0 : -1.0;
  double z = log_p > -700.0 ? gsl_cdf_ugaussian_Pinv (exp (log_p)) : -sqrt (-2.0 * log_p);
  double gamma = (beta_mu3 (bd->pa, bd->qa) - beta_mu3 (bd->pb, bd->qb)) / pow (bd->sd, 3.0);
  if (!lower)
    z = -z;
  x = bd->mean + bd->sd * (z + (z * z - 1.0) * gamma / 6.0);
  if (!(x > lo && x < hi) || !(fabs (gamma) < 1.0))
    x = bd->mean + bd->sd * z;
  /* an approximation beyond ±1: halfway from the mean to that end */
  if (x >= hi)
    x = bd->mean + 0.5 * (hi - bd->mean);
  else if (x <= lo)
    x = bd->mean - 0.5 * (bd->mean - lo);
  if (!(x > lo && x < hi))
    x = 0.5 * (lo + hi);
  for (int it = 0; it < 200; it++)
    {
      double lt = log_tail (bd, x, lower, &ok);
      if (!ok)
        return NAN;
      double f = lt - log_p;            /* decreasing in x for the upper tail */
      if (fabs (f) <= 1e-12)
        return x;
      /* the density by the fixed rule only; where it does not settle, the secant
       * through the previous point stands in for it */
      double ld, slope;
      gboolean exact = tf_beta_diff_line (bd, bd->over_a, x, TF_BD_DENSITY, &ld)
                       || tf_beta_diff_line (bd, !bd->over_a, x, TF_BD_DENSITY, &ld);
      if (exact)
        slope = (lower ? 1.0 : -1.0) * exp (ld - lt);
      else
        slope = isfinite (xp) ? (lt - ltp) / (x - xp) : NAN;
      xp = x;
      ltp = lt;
      if ((f < 0.0) == lower)
        lo = x, f_lo = f, s_lo = slope;
      else
        hi = x, f_hi = f, s_hi = slope;
      double next = x - f / slope;
      if (exact && fabs (next - x) <= 2.0 * DBL_EPSILON * fabs (x))
        return x;               /* within the resolution of a double */
      gboolean newton = next > lo && next < hi;
      /* the log tail is concave: a Newton step from one side overshoots the root, and
       * the step from the bracket's other end (where one was taken) does not */
      double other = (f < 0.0) == lower ? hi - f_hi / s_hi : lo - f_lo / s_lo;
      if (!newton && other > lo && other < hi)
        next = other;
      else if (!newton)
        next = 0.5 * (lo + hi);
      if (newton && exact && fabs (f) <= 1e-6)
        return next;
      if (next == x || hi - lo <= 4.0 * DBL_EPSILON * MAX (fabs (lo), fabs (hi)))
        return next;
      x = next;
    }
  return NAN;
}
