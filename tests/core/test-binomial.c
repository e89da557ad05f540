/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-binomial.c: binomial tails, the exact two-sided p-value by the minimum-likelihood
 * rule and the Clopper–Pearson interval (core/tf-binomial.h), from n = 1 to 10^12.
 *
 * Reference values are from scipy 1.10.1 (Debian 12), calls named beside each, unless
 * stated otherwise.
 */
#include "tf-binomial.h"
#include "tf-check.h"

static void
test_binomial (void)
{
  /* scipy.stats.binom.logcdf(7, 20, 0.5), binom.logsf(6, 20, 0.5) */
  assert_rel (tf_binom_log_cdf (7, 20, 0.5, 0.5), log (0.13158798217773438), TF_TOL_SERIES);
  assert_rel (tf_binom_log_sf (7, 20, 0.5, 0.5), log (0.9423408508300781), TF_TOL_SERIES);
  /* scipy.stats.binomtest(7, 20, 0.5).pvalue */
  assert_rel (tf_binom_exact_two_sided (7, 20, 0.5), 0.26317596435546875, TF_TOL_SERIES);
  /* Jefferys (1990), J. Sci. Explor. 4:153: 52,263,471 of 104,490,000, p = 0.0003
   * (from memory); scipy.stats.binomtest(52263471, 104490000, 0.5).pvalue */
  assert_rel (tf_binom_exact_two_sided (52263471, 104490000, 0.5), 0.0003016723533419885, TF_TOL_CLOSED_FORM);
  /* scipy.stats.binomtest(7, 20).proportion_ci(0.95, 'exact') */
  double lo, hi;
  tf_binom_clopper_pearson (7, 20, 0.95, &lo, &hi);
  assert_rel (lo, 0.1539092047845412, TF_TOL_DOUBLE);
  assert_rel (hi, 0.5921885345328283, TF_TOL_DOUBLE);
  /* k = 0: lo = 0, hi = 1 − (α/2)^(1/n) (Clopper & Pearson 1934, closed form) */
  tf_binom_clopper_pearson (0, 1, 0.95, &lo, &hi);
  g_assert_cmpfloat (lo, ==, 0.0);
  assert_rel (hi, 0.975, TF_TOL_ROUNDING);
  tf_binom_clopper_pearson (0, 57935259, 0.95, &lo, &hi);
  assert_rel (hi, -expm1 (log (0.025) / 57935259), TF_TOL_DOUBLE);
  tf_binom_clopper_pearson (1e12, 1e12, 0.95, &lo, &hi);
  g_assert_cmpfloat (hi, ==, 1.0);
  assert_rel (1.0 - lo, -expm1 (log (0.025) / 1e12), 1e-3);  /* 1 − lo near one ulp */
  /* n = 1e12, k at the expectation: two-sided p = 1 (minimum-likelihood rule) */
  g_assert_cmpfloat (tf_binom_exact_two_sided (5e11, 1e12, 0.5), ==, 1.0);
  /* far from it the log p-value stays finite */
  g_assert_true (isfinite (tf_binom_log_exact_two_sided (6e11, 1e12, 0.5)));
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/binomial/tails-and-intervals", test_binomial);
  return g_test_run ();
}
