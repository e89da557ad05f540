/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-incbeta-inverse.c: the inverse of the regularised incomplete beta function.
 */
#include "tf-incbeta.h"
#include "tf-logspace.h"

#include <math.h>
#include <float.h>
#include <gsl/gsl_cdf.h>

/* ln of the requested tail at x. */
static double
log_tail (double x, double a, double b, gboolean lower)
{
  double l, u;
  tf_incbeta_log_both (x, 1.0 - x, a, b, &l, &u);
  return lower ? l : u;
}

/* Starting value: the normal approximation to Beta(a, b) with its skewness
 * correction (Cornish & Fisher 1937, first term), clipped into (0, 1). */
static double
initial_guess (double lp, double a, double b, gboolean lower)
{
  double s = a + b;
  double mean = a / s;
  double sd = sqrt (a * b / (s * s * (s + 1.0)));
  double z;

  if (lp < -700.0)
    z = -sqrt (-2.0 * lp);
  else
    z = gsl_cdf_ugaussian_Pinv (exp (lp));
  if (!lower)
    z = -z;
  double skew = 2.0 * (b - a) * sqrt (s + 1.0) / ((s + 2.0) * sqrt (a * b));
  z += skew / 6.0 * (z * z - 1.0);
  double x = mean + z * sd;
  if (!(x > 0.0 && x < 1.0))
    x = mean;
  return x;
}

/* The x with ln(tail) = lp: safeguarded Newton's method on ln I_x, which is concave
 * in x for the lower tail of a log-concave density, with bisection (geometric when the
 * bracket spans decades) whenever a step would leave the bracket
 * (Press et al. 2007, "rtsafe"). */
double
tf_incbeta_inverse_log (double lp, double a, double b, gboolean lower)
{
  if (!(a > 0.0) || !(b > 0.0) || isnan (lp) || lp > 0.0)
    return NAN;
  if (lp == 0.0)
    return lower ? 1.0 : 0.0;
  if (lp == -INFINITY)
    return lower ? 0.0 : 1.0;

  double lo = 0.0, hi = 1.0;    /* the root lies in [lo, hi] */
  double x = initial_guess (lp, a, b, lower);

  for (int iter = 0; iter < 400; iter++)
    {
      double g = log_tail (x, a, b, lower) - lp;   /* increasing in x when lower */
      if (isnan (g))
        return NAN;
      if (g == 0.0)
        return x;
      gboolean x_too_big = lower ? g > 0.0 : g < 0.0;
      if (x_too_big)
        hi = x;
      else
        lo = x;

      /* d/dx ln(tail) = ± density / tail */
      double ld = tf_log_dbeta (x, 1.0 - x, a, b);
      double lt = g + lp;
      double slope = exp (ld - lt);
      if (!lower)
        slope = -slope;
      double xn = x - g / slope;
      if (!(xn > lo && xn < hi) || !isfinite (xn))
        {
          if (lo == 0.0 && hi <= DBL_MIN)
            return 0.0;         /* the quantile underflows */
          if (lo > 0.0 && hi / lo > 4.0)
            xn = sqrt (lo * hi);
          else if (lo == 0.0 && hi < 1e-3)
            xn = hi * 1e-3;
          else if (hi == 1.0 && lo > 1.0 - 1e-3)
            xn = 1.0 - (1.0 - lo) * 1e-3;
          else
            xn = 0.5 * (lo + hi);
          if (xn <= lo || xn >= hi)
            xn = 0.5 * (lo + hi);
          if (xn <= lo || xn >= hi)
            {
              /* No double lies strictly inside the bracket: the quantile rounds to
               * one of its ends. */
              if (hi == 1.0)
                return 1.0;
              return lo == 0.0 ? 0.0 : x;
            }
        }
      if (fabs (xn - x) <= 0.5 * DBL_EPSILON * MIN (x, 1.0 - x) || fabs (xn - x) < DBL_MIN)
        return xn;
      if (hi - lo <= 0.5 * DBL_EPSILON * MIN (lo, 1.0 - hi) && lo > 0.0)
        return xn;
      x = xn;
    }
  return x;
}

double
tf_incbeta_inverse (double p, double a, double b, gboolean lower)
{
  if (!(p >= 0.0 && p <= 1.0))
    return NAN;
  return tf_incbeta_inverse_log (log (p), a, b, lower);
}
