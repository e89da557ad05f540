/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-logspace.c: the log-space helpers of core/tf-logspace.h: Stirling's remainder,
 * bd0, the binomial and beta log densities (Loader 2000), ln B(a, b), and the log-sum
 * helpers (Mächler 2012).
 *
 * Reference values are from mpmath 1.2.1 at mp.dps = 40 (the expression named above
 * each group) unless stated otherwise.
 */
#include "tf-logspace.h"
#include "tf-check.h"

static void
test_stirling (void)
{
  /* mp.loggamma(x) - ((x - 0.5)*mp.log(x) - x + mp.log(2*mp.pi)/2) */
  assert_rel (tf_stirling_remainder (0.001), 2.5422704679670945415, TF_TOL_ROUNDING);
  assert_rel (tf_stirling_remainder (0.5), 0.15342640972002734529, TF_TOL_ROUNDING);
  assert_rel (tf_stirling_remainder (1.0), 0.08106146679532725822, TF_TOL_ROUNDING);
  /* below 10 the remainder is ln Γ(x) less Stirling's terms, each 1500 times the
   * remainder here: the cancellation costs three digits, hence 1e-12 */
  assert_rel (tf_stirling_remainder (9.99), 0.008338896797734330091, 1e-12);
  assert_rel (tf_stirling_remainder (10.0), 0.0083305634333628712565, TF_TOL_ROUNDING);
  assert_rel (tf_stirling_remainder (15.0), 0.005554733551962801371, TF_TOL_ROUNDING);
  assert_rel (tf_stirling_remainder (1000.0), 0.000083333330555556349206, TF_TOL_ROUNDING);
  assert_rel (tf_stirling_remainder (1e12), 8.3333333333333333331e-14, TF_TOL_ROUNDING);
}

static void
test_bd0 (void)
{
  /* x*mp.log(x/m) + m - x */
  assert_rel (tf_bd0 (5.0, 5.1), 0.00098686351910142790375, TF_TOL_SERIES);
  assert_rel (tf_bd0 (1e12 + 1e6, 1e12), 0.49999983333341666662, TF_TOL_SERIES);
  assert_rel (tf_bd0 (0.0, 3.0), 3.0, TF_TOL_EXACT);
  assert_rel (tf_bd0 (3.0, 10.0), 3.3880815870221920221, TF_TOL_ROUNDING);
  assert_rel (tf_bd0 (1e15, 1e15 - 1.0), 5.0000000000000033468e-16, TF_TOL_SERIES);
}

static void
test_dbinom (void)
{
  /* mp.loggamma(n+1) - mp.loggamma(k+1) - mp.loggamma(n-k+1) + k*mp.log(p) + (n-k)*mp.log1p(-p) */
  assert_rel (tf_log_dbinom (7, 20, 0.5, 0.5), -2.6046523646342583444, TF_TOL_ROUNDING);
  assert_rel (tf_log_dbinom (0, 10, 0.3, 0.7), -3.5667494393873236305, TF_TOL_ROUNDING);
  assert_rel (tf_log_dbinom (10, 10, 0.3, 0.7), -12.039728043259360296, TF_TOL_ROUNDING);
  assert_rel (tf_log_dbinom (1, 1, 0.25, 0.75), -1.3862943611198906188, TF_TOL_ROUNDING);
  /* scipy.stats.binom.logpmf gives -16.0390014... here: it loses digits at n = 1e12 */
  assert_rel (tf_log_dbinom (5e11 + 1e6, 1e12, 0.5, 0.5), -16.04130191060858487, TF_TOL_DOUBLE);
  assert_rel (tf_log_dbinom (3, 1e12, 1e-12, 1.0 - 1e-12), -2.791759469228555041, TF_TOL_DOUBLE);
}

static void
test_beta_functions (void)
{
  /* mp.loggamma(a) + mp.loggamma(b) - mp.loggamma(a+b) */
  assert_rel (tf_log_beta (0.01, 0.01), 5.2981552399856674521, TF_TOL_ROUNDING);
  assert_rel (tf_log_beta (1e12, 1e12), -1386294361132.4406173, TF_TOL_ULPS);
  assert_rel (tf_log_beta (0.5, 1e13), -14.394438161536584359, TF_TOL_ROUNDING);
  assert_rel (tf_log_beta (3, 4), -4.0943445622221006848, TF_TOL_ROUNDING);
  assert_rel (tf_log_beta (1e-3, 1e13), 6.8772452791749311171, TF_TOL_ROUNDING);
  /* (a-1)*mp.log(x) + (b-1)*mp.log1p(-x) - lbeta(a, b) */
  assert_rel (tf_log_dbeta (0.3, 0.7, 2.5, 7), 0.87939046819295010512, TF_TOL_ROUNDING);
  assert_rel (tf_log_dbeta (0.5, 0.5, 1e12, 1e12), 13.936292795599394326, TF_TOL_ROUNDING);
  assert_rel (tf_log_dbeta (1e-6, 1.0 - 1e-6, 0.01, 0.01), 8.3792012023994589532, TF_TOL_ROUNDING);
  assert_rel (tf_log_dbeta (0.5000005, 0.4999995, 5e11, 5e11), 13.08971920540231331, TF_TOL_CLOSED_FORM);
}

static void
test_log_helpers (void)
{
  /* identities, common practice */
  assert_rel (tf_log1mexp (-1e-20), log (1e-20), TF_TOL_ULPS);
  assert_rel (tf_log1mexp (-50.0), -exp (-50.0), TF_TOL_ULPS);
  assert_rel (tf_log_add (-1000.0, -1000.0), -1000.0 + G_LN2, TF_TOL_ULPS);
  assert_rel (tf_log_sub (0.0, -1e-20), log (1e-20), TF_TOL_ULPS);
  g_assert_true (tf_log_add (-INFINITY, -3.0) == -3.0);
  assert_rel (tf_logistic (-700.0), exp (-700.0), TF_TOL_ROUNDING);
  /* 1e-16, below one ulp of 1 from beneath: the same rounding as the formula */
  assert_rel (tf_logistic (30.0), 1.0 / (1.0 + exp (-30.0)), 1e-16);
  g_assert_true (tf_logistic (-800.0) >= 0.0 && tf_logistic (800.0) == 1.0);
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/logspace/stirling", test_stirling);
  g_test_add_func ("/logspace/bd0", test_bd0);
  g_test_add_func ("/logspace/dbinom", test_dbinom);
  g_test_add_func ("/logspace/beta-functions", test_beta_functions);
  g_test_add_func ("/logspace/log-helpers", test_log_helpers);
  return g_test_run ();
}
