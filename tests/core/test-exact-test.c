/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-exact-test.c: the minimum-likelihood rule's kernel (tf-exact-test.c) and the
 * binomial, Poisson and hypergeometric two-sided exact tests built on it.
 *
 * Reference values are from scipy 1.10.1 and mpmath 1.2.1 (Debian 12, /usr/bin/python3),
 * the call named beside each; the far ends are the outcomes those calls find by
 * listing every outcome, pmf(j) <= pmf(k) * (1 + 1e-7).
 */
#include <math.h>
#include <glib.h>
#include <gsl/gsl_errno.h>

#include "tf-exact-test.h"
#include "tf-binomial.h"
#include "tf-poisson.h"
#include "tf-hypergeometric.h"
#include "tf-logspace.h"
#include "tf-check.h"

/* param: n, p, q */
static double
log_dbinom (double j, const void *data)
{
  const double *p = data;
  return tf_log_dbinom (j, p[0], p[1], p[2]);
}

static double
log_dpois (double j, const void *mu)
{
  return tf_log_dpois (j, *(const double *) mu);
}

static double
log_flat (double j G_GNUC_UNUSED, const void *data G_GNUC_UNUSED)
{
  return 0.0;
}

static void
test_threshold (void)
{
  /* the tolerance, 1e-7, is common practice (binomtest, fisher_exact) */
  g_assert_cmpfloat (TF_EXACT_TEST_RELATIVE_TOLERANCE, ==, 1e-7);
  assert_rel (tf_exact_test_log_threshold (-3.0), -3.0 + 9.999999500000033e-08, 1e-15);   /* math.log1p(1e-7) */
}

static void
test_far_end (void)
{
  const double b[] = { 12000.0, 0.8, 0.2 };
  double ld = tf_exact_test_log_threshold (tf_log_dbinom (9700.0, 12000.0, 0.8, 0.2));
  /* scipy 1.10.1: max(j for j in range(9601)
   *   if binom.pmf(j, 12000, 0.8) <= binom.pmf(9700, 12000, 0.8) * (1 + 1e-7)) */
  g_assert_cmpfloat (tf_exact_test_far_end (log_dbinom, b, ld, 9600.0, -1.0, 0.0), ==, 9499.0);

  /* a tie counts: scipy 1.10.1: min(j for j in range(10, 21)
   *   if binom.pmf(j, 20, 0.5) <= binom.pmf(7, 20, 0.5) * (1 + 1e-7)) */
  const double s[] = { 20.0, 0.5, 0.5 };
  ld = tf_exact_test_log_threshold (tf_log_dbinom (7.0, 20.0, 0.5, 0.5));
  g_assert_cmpfloat (tf_exact_test_far_end (log_dbinom, s, ld, 10.0, 21.0, 0.0), ==, 13.0);

  /* an unbounded support, bracketed by doubling: scipy 1.10.1: min(j for j in
   *   range(10, 100000) if poisson.pmf(j, 10) <= poisson.pmf(2, 10) * (1 + 1e-7)) */
  double mu = 10.0;
  ld = tf_exact_test_log_threshold (tf_log_dpois (2.0, mu));
  g_assert_cmpfloat (tf_exact_test_far_end (log_dpois, &mu, ld, 10.0, INFINITY, sqrt (mu)), ==, 20.0);

  /* no outcome on the far side qualifies: the end is returned (common practice:
   * Poisson(0.5) at k = 3, every outcome below the mode is more likely) */
  mu = 0.5;
  ld = tf_exact_test_log_threshold (tf_log_dpois (3.0, mu));
  g_assert_cmpfloat (tf_exact_test_far_end (log_dpois, &mu, ld, 0.0, -1.0, 0.0), ==, -1.0);

  /* every loop is bounded: a pmf that never falls below ld ends the search */
  double r = tf_exact_test_far_end (log_flat, NULL, -1.0, 0.0, INFINITY, 1.0);
  g_assert_true (!isnan (r));
}

static void
test_binomial (void)
{
  /* scipy 1.10.1: binomtest(9700, 12000, 0.8).pvalue */
  assert_rel (tf_binom_exact_two_sided (9700.0, 12000.0, 0.8), 0.022473737332123683, 1e-9);
  /* scipy 1.10.1: binomtest(1, 40, 0.2).pvalue */
  assert_rel (tf_binom_exact_two_sided (1.0, 40.0, 0.2), 0.0024531698153493577, 1e-9);
  /* scipy 1.10.1: binomtest(3, 10, 0.3).pvalue (k at the mode) */
  assert_rel (tf_binom_exact_two_sided (3.0, 10.0, 0.3), 1.0, 1e-12);
}

static void
test_poisson (void)
{
  /* scipy 1.10.1: poisson.sf(2, 0.5) (nothing below the mode is as unlikely as 3) */
  assert_rel (exp (tf_pois_log_exact_two_sided (3.0, 0.5)), 0.014387677966970684, 1e-9);
  /* scipy 1.10.1: poisson.cdf(2, 10) + poisson.sf(19, 10) */
  assert_rel (exp (tf_pois_log_exact_two_sided (2.0, 10.0)), 0.0062237376913684105, 1e-9);
  /* scipy 1.10.1: poisson.cdf(1, 10) + poisson.sf(19, 10) */
  assert_rel (exp (tf_pois_log_exact_two_sided (20.0, 10.0)), 0.0039537412032441665, 1e-9);
  /* scipy 1.10.1: poisson.cdf(0, 2.5) + poisson.sf(4, 2.5) */
  assert_rel (exp (tf_pois_log_exact_two_sided (0.0, 2.5)), 0.19090697970974757, 1e-9);
  /* mpmath 1.2.1, mp.dps = 40, μ = 10^12, k = μ + 3·10^6, far end j = 999997000002:
   * gammainc(j + 1, mu, inf, regularized=True) + 1 - gammainc(k, mu, inf, regularized=True) */
  assert_rel (exp (tf_pois_log_exact_two_sided (1e12 + 3e6, 1e12)), 0.0026998093588298000546, 1e-7);
}

static void
test_hypergeometric (void)
{
  /* the table [[kA, nA − kA], [kB, nB − kB]]; TfHyper takes nA, nB and m = kA + kB */
  static const struct {
    double ka, na, kb, nb, p, low, high;
  } cases[] = {
    /* scipy 1.10.1: fisher_exact([[3, 7], [9, 1]]).pvalue; the outcomes counted,
     * hypergeom(20, 12, 10).pmf(x) <= pmf(3) * (1 + 1e-7): x <= 3 and x >= 9 */
    { 3, 10, 9, 10, 0.019766611097880443, 3, 9 },
    /* scipy 1.10.1: fisher_exact([[15, 25], [25, 15]]).pvalue; x <= 15, x >= 25 */
    { 15, 40, 25, 40, 0.043509554194420624, 15, 25 },
    /* scipy 1.10.1: fisher_exact([[0, 20], [5, 15]]).pvalue; x <= 0, x >= 5 */
    { 0, 20, 5, 20, 0.04712404712404713, 0, 5 },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      TfHyper h;
      double low, high;
      tf_hyper_init (&h, cases[i].na, cases[i].nb, cases[i].ka + cases[i].kb);
      tf_hyper_two_sided_bounds (&h, cases[i].ka, &low, &high);
      g_assert_cmpfloat (low, ==, cases[i].low);
      g_assert_cmpfloat (high, ==, cases[i].high);
      assert_rel (exp (tf_hyper_log_exact_two_sided (&h, cases[i].ka)), cases[i].p, 1e-9);
    }
}

int
main (int argc, char **argv)
{
  gsl_set_error_handler_off ();
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/exact-test/threshold", test_threshold);
  g_test_add_func ("/exact-test/far-end", test_far_end);
  g_test_add_func ("/exact-test/binomial", test_binomial);
  g_test_add_func ("/exact-test/poisson", test_poisson);
  g_test_add_func ("/exact-test/hypergeometric", test_hypergeometric);
  return g_test_run ();
}
