/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-binomial.c: binomial tails and exact intervals for n up to 10^12.
 */
#include "tf-binomial.h"
#include "tf-incbeta.h"
#include "tf-logspace.h"

#include <math.h>

/* ln P(X <= k) = ln(1 − I_p(k + 1, n − k)) (Abramowitz & Stegun 1964, 26.5.24). */
double
tf_binom_log_cdf (double k, double n, double p, double q)
{
  k = floor (k);
  if (isnan (k) || isnan (n) || isnan (p) || isnan (q))
    return NAN;
  if (k < 0.0)
    return -INFINITY;
  if (k >= n)
    return 0.0;
  if (p == 0.0)
    return 0.0;
  if (q == 0.0)
    return -INFINITY;
  return tf_incbeta_log_upper (p, q, k + 1.0, n - k);
}

/* ln P(X >= k) = ln I_p(k, n − k + 1) (Abramowitz & Stegun 1964, 26.5.24). */
double
tf_binom_log_sf (double k, double n, double p, double q)
{
  k = ceil (k);
  if (isnan (k) || isnan (n) || isnan (p) || isnan (q))
    return NAN;
  if (k <= 0.0)
    return 0.0;
  if (k > n)
    return -INFINITY;
  if (p == 0.0)
    return -INFINITY;
  if (q == 0.0)
    return 0.0;
  return tf_incbeta_log_lower (p, q, k, n - k + 1.0);
}

/* ln of the two-sided exact p-value by the minimum-likelihood rule (Sterne 1954;
 * relative tolerance 1e-7 as R's binom.test and scipy.stats.binomtest). The outcomes
 * on the other side of the mode are found by bisection on the log probability, which
 * is monotone there, so no outcome is visited one by one. */
static double
log_exact_two_sided (double k, double n, double p0)
{
  double q0 = 1.0 - p0;
  double m = n * p0;
  double ld = tf_log_dbinom (k, n, p0, q0) + log1p (1e-7);

  if (k == m)
    return 0.0;
  if (k < m)
    {
      /* Smallest j in [ceil(m), n] with ln P(X = j) <= ld; the probability decreases
       * there. */
      double lo = ceil (m), hi = n + 1.0;      /* answer in [lo, hi] */
      while (lo < hi)
        {
          double mid = floor (lo + (hi - lo) / 2.0);
          if (tf_log_dbinom (mid, n, p0, q0) <= ld)
            hi = mid;
          else
            lo = mid + 1.0;
        }
      double lp = tf_log_add (tf_binom_log_cdf (k, n, p0, q0),
                              tf_binom_log_sf (lo, n, p0, q0));
      return MIN (lp, 0.0);
    }
  else
    {
      /* Largest j in [0, floor(m)] with ln P(X = j) <= ld; the probability increases
       * there. */
      double lo = -1.0, hi = floor (m);         /* answer in [lo, hi] */
      while (lo < hi)
        {
          double mid = ceil (lo + (hi - lo) / 2.0);
          if (tf_log_dbinom (mid, n, p0, q0) <= ld)
            lo = mid;
          else
            hi = mid - 1.0;
        }
      double lp = tf_log_add (tf_binom_log_cdf (lo, n, p0, q0),
                              tf_binom_log_sf (k, n, p0, q0));
      return MIN (lp, 0.0);
    }
}

double
tf_binom_exact_two_sided (double k, double n, double p0)
{
  return exp (log_exact_two_sided (k, n, p0));
}

double
tf_binom_log_exact_two_sided (double k, double n, double p0)
{
  return log_exact_two_sided (k, n, p0);
}

/* Clopper & Pearson (1934): the beta quantiles α/2 of Beta(k, n − k + 1) and
 * 1 − α/2 of Beta(k + 1, n − k); lo = 0 when k = 0 and hi = 1 when k = n. */
void
tf_binom_clopper_pearson (double k, double n, double level, double *lo, double *hi)
{
  double alpha2 = 0.5 * (1.0 - level);

  *lo = k <= 0.0 ? 0.0 : tf_incbeta_inverse (alpha2, k, n - k + 1.0, TRUE);
  *hi = k >= n ? 1.0 : tf_incbeta_inverse (alpha2, k + 1.0, n - k, FALSE);
}
