/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-incbeta-inverse.c: the inverse of the regularised incomplete beta function.
 *
 * The quantile is sought for the smaller tail (p <= ½), as a lower-tail quantile w of
 * Beta(p, q) (the upper tail of Beta(a, b) at x being the lower tail of Beta(b, a) at
 * 1 − x), in t = ln w or t = ln(1 − w), whichever side is the smaller, so that a
 * quantile at 1e-300 or at 1 − 1e-300 is found with the same relative accuracy. From
 * a published starting value, Halley's method on ln tail(t) uses the density that the
 * same evaluation gives; a bracket keeps every step safe.
 */
#include "tf-incbeta.h"
#include "tf-incbeta-private.h"
#include "tf-logspace.h"

#include <math.h>
#include <float.h>
#include <gsl/gsl_cdf.h>

/* The lowest t tried: e^−744 is a few times the smallest subnormal (e^−744.44); a
 * quantile below it is returned as 0 (or 1). */
#define T_MIN (-744.0)

/* The standard normal z with ln Φ(z) = lp <= −ln 2: GSL's quantile (Wichura 1988,
 * AS 241) while e^lp is a normal double, else the tail ln Φ(z) ≈ −z²/2 − ½ ln(2π z²)
 * (Abramowitz & Stegun 1964, 26.2.12) solved by fixed-point steps. */
static double
normal_quantile_log (double lp)
{
  if (lp > -700.0)
    return gsl_cdf_ugaussian_Pinv (exp (lp));
  double z2 = -2.0 * lp;
  for (int i = 0; i < 4; i++)
    z2 = -2.0 * lp - log (2.0 * G_PI * z2);
  return -sqrt (z2);
}

/* ln(1 + e^l) without overflow. */
static double
softplus (double l)
{
  return l > 0.0 ? l + log1p (exp (-l)) : log1p (exp (l));
}

/* Given ln v of one side's value (side 0: w, side 1: 1 − w), the smaller side and
 * its ln. */
static void
pick_side (double lv, int v_side, int *side, double *t)
{
  if (lv <= -G_LN2)
    {
      *side = v_side;
      *t = lv;
    }
  else
    {
      *side = 1 - v_side;
      *t = tf_log1mexp (lv);
    }
  *t = MAX (*t, T_MIN);
}

/* A starting value for the lower-tail quantile w of Beta(p, q) at ln P = lp <= −ln 2,
 * as a side and t: Carter's (1947) approximation w = p / (p + q e^{2e}) when both
 * shapes exceed 1, else the power-law tails or the χ² approximation, all in log space
 * (Cran, Martin & Thomas 1977, AS 109; Majumder & Bhattacharjee 1973, AS 64), with
 * the exact normal quantile in place of their rational one. */
static void
initial_guess (TfIncbetaShape *sh, double lp, double p, double q, int *side, double *t)
{
  double y = -normal_quantile_log (lp);   /* upper normal quantile, >= 0 */

  if (p > 1.0 && q > 1.0)
    {
      double r = (y * y - 3.0) / 6.0;
      double s = 1.0 / (p + p - 1.0), u = 1.0 / (q + q - 1.0);
      double h = 2.0 / (s + u);
      double e = y * sqrt (h + r) / h - (u - s) * (r + 5.0 / 6.0 - 2.0 / (3.0 * h));
      double l = 2.0 * e + log (q / p);    /* w = 1 / (1 + e^l) */
      if (l >= 0.0)
        pick_side (-softplus (l), 0, side, t);
      else
        pick_side (-softplus (-l), 1, side, t);
      return;
    }
  double lb = tf_incbeta_shape_log_beta (sh);
  double r = q + q, c = 1.0 / (9.0 * q);
  double chi = r * pow (1.0 - c + y * sqrt (c), 3.0);
  if (chi <= 0.0)
    {
      /* 1 − w = (q B (1 − P))^{1/q} */
      pick_side ((tf_log1mexp (lp) + log (q) + lb) / q, 1, side, t);
      return;
    }
  chi = (4.0 * p + r - 2.0) / chi;
  if (chi <= 1.0)
    pick_side ((lp + log (p) + lb) / p, 0, side, t);   /* w = (p B P)^{1/p} */
  else
    pick_side (G_LN2 - log1p (chi), 1, side, t);       /* 1 − w = 2 / (1 + χ) */
}

/* The frame's quantile w (side 0: e^t, side 1: 1 − e^t) as x of the tail asked. */
static double
answer (int side, double t, gboolean lower)
{
  double v = exp (t);
  /* lower: x = w; upper: x = 1 − w */
  return (side == 0) == lower ? v : 1.0 - v;
}

double
tf_incbeta_shape_inverse_log (TfIncbetaShape *sh, double lp, gboolean lower)
{
  const double a = sh->a, b = sh->b;

  if (!(a > 0.0) || !(b > 0.0) || isnan (lp) || lp > 0.0)
    return NAN;
  if (lp == 0.0)
    return lower ? 1.0 : 0.0;
  if (lp == -INFINITY)
    return lower ? 0.0 : 1.0;
  if (lp > -G_LN2)
    {
      lp = tf_log1mexp (lp);
      lower = !lower;
    }

  /* the frame: the lower tail of Beta(p, q) */
  const double p = lower ? a : b, q = lower ? b : a;
  int side;
  double t;
  initial_guess (sh, lp, p, q, &side, &t);

  const double s = p + q, sd = sqrt (p / s * (q / s) / (s + 1.0));
  double lo = -INFINITY, hi = 0.0;   /* the root lies in (lo, hi) */

  for (int iter = 0; iter < 300; iter++)
    {
      if (t > -G_LN2)
        {
          /* the other side is the smaller now: t = ln(1 − e^t), the bracket mapped */
          double l0 = lo;
          side = 1 - side;
          t = tf_log1mexp (t);
          lo = tf_log1mexp (hi);
          hi = tf_log1mexp (l0);
        }
      double v = exp (t), vc = 1.0 - v;
      /* the natural scale of t, sd / (the side's value), at most 1 */
      double scale = MIN (1.0, sd / v);
      double lv = t, lvc = log1p (-v);
      /* w and 1 − w, and x, y = 1 − x of the tail asked */
      double w = side ? vc : v, wc = side ? v : vc;
      double lw = side ? lvc : lv, lwc = side ? lv : lvc;
      double l, u, lpre;
      if (lower)
        tf_incbeta_shape_log_both (sh, w, wc, &l, &u, &lpre);
      else
        tf_incbeta_shape_log_both (sh, wc, w, &u, &l, &lpre);
      double g = l - lp;    /* rises with w */
      if (isnan (g))
        return NAN;
      if (g == 0.0)
        return answer (side, t, lower);
      if ((g > 0.0) == (side == 0))
        hi = t;
      else
        lo = t;

      /* dg/dt and d²g/dt² from the density w^{p−1} (1 − w)^{q−1} / B = e^lpre / (w (1 − w)) */
      double g1, g2;
      if (side == 0)
        {
          g1 = exp (lpre - lwc - l);
          g2 = g1 * (p - (q - 1.0) * (w / wc) - g1);
        }
      else
        {
          g1 = -exp (lpre - lw - l);
          g2 = g1 * (q - (p - 1.0) * (wc / w) - g1);
        }
      double newton = -g / g1;
      double c = 0.5 * newton * g2 / g1;
      gboolean halley = fabs (c) <= 0.5;
      double step = halley ? newton / (1.0 + c) : newton;
      /* Far below a quantile near 1 the tail falls like e^{−p(1 − w)} (the gamma limit,
       * ln Q(q, u) ≈ −u + (q − 1) ln u, u = p(1 − w), slope −u + q − 1 in t): there
       * Newton's step in 1 − w itself, not in its log */
      if (side == 1 && g1 < -2.0 * MAX (q, 1.0) && newton < 0.0 && newton > -1.0)
        {
          step = log1p (newton);
          halley = FALSE;
        }
      double tn = t + step;
      /* After a step δ (in units of the scale σ) what is left is about σ(δ/σ)³ for
       * Halley's method and σ(δ/σ)² for Newton's: stop when that is below 1e-15 σ
       * (the σ of the curvature, |g'/g''|, when it is the smaller). */
      double tol = (halley ? 1e-5 : 1e-8) * MIN (scale, fabs (g1 / g2));
      if (tn == t || (tn > lo && tn < hi && isfinite (tn)))
        {
          if (fabs (step) <= tol || tn == t)
            return answer (side, tn, lower);
        }
      else
        {
          /* outside the bracket: halve it, or walk down while it is open below */
          if (hi <= T_MIN)
            return answer (side, -INFINITY, lower);    /* the quantile underflows */
          tn = isinf (lo) ? MAX (2.0 * hi - 1.0, T_MIN) : 0.5 * (lo + hi);
          if (!(tn > lo && tn < hi))
            return answer (side, t, lower);
        }
      if (hi - lo <= 2.0 * DBL_EPSILON * fabs (tn))
        return answer (side, tn, lower);
      t = tn;
    }
  return answer (side, t, lower);
}

double
tf_incbeta_inverse_log (double log_p, double a, double b, gboolean lower)
{
  TfIncbetaShape sh;
  tf_incbeta_shape_init (&sh, a, b);
  return tf_incbeta_shape_inverse_log (&sh, log_p, lower);
}

double
tf_incbeta_inverse (double p, double a, double b, gboolean lower)
{
  if (!(p >= 0.0 && p <= 1.0))
    return NAN;
  /* the smaller tail, 1 − p being exact for p >= ½ */
  if (p > 0.5)
    return tf_incbeta_inverse_log (log1p (-p), a, b, !lower);
  return tf_incbeta_inverse_log (log (p), a, b, lower);
}
