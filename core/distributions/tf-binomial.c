/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-binomial.c: binomial tails and exact intervals for n up to 10^12.
 */
#include "tf-binomial.h"
#include "tf-exact-test.h"
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

/* param: n, p, q = 1 − p */
static double
log_pmf (double j, const void *data)
{
  const double *param = data;
  return tf_log_dbinom (j, param[0], param[1], param[2]);
}

/* ln of the two-sided exact p-value by the minimum-likelihood rule (Sterne 1954): the
 * outcomes on the other side of the mode by tf_exact_test_far_end(). */
static double
log_exact_two_sided (double k, double n, double p0)
{
  double q0 = 1.0 - p0;
  double m = n * p0;
  const double param[] = { n, p0, q0 };
  double ld = tf_exact_test_log_threshold (tf_log_dbinom (k, n, p0, q0));

  if (k == m)
    return 0.0;
  if (k < m)
    {
      /* the smallest j in [ceil(m), n] no more likely than k, n + 1 when none is */
      double j = tf_exact_test_far_end (log_pmf, param, ld, ceil (m), n + 1.0, 0.0);
      double lp = tf_log_add (tf_binom_log_cdf (k, n, p0, q0),
                              tf_binom_log_sf (j, n, p0, q0));
      return MIN (lp, 0.0);
    }
  else
    {
      /* the largest j in [0, floor(m)] no more likely than k, −1 when none is */
      double j = tf_exact_test_far_end (log_pmf, param, ld, floor (m), -1.0, 0.0);
      double lp = tf_log_add (tf_binom_log_cdf (j, n, p0, q0),
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
