/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-numerics.c: log-space helpers, incomplete beta, binomial tails.
 *
 * Reference values are from mpmath 1.2.1 at mp.dps = 40 (calls named beside each)
 * and scipy 1.10.1 (Debian 12), unless stated otherwise.
 */
#include <math.h>
#include <glib.h>
#include <gsl/gsl_errno.h>

#include "tf-logspace.h"
#include "tf-incbeta.h"
#include "tf-binomial.h"
#include "tf-check.h"

static void
test_stirling (void)
{
  /* mp.loggamma(x) - ((x - 0.5)*mp.log(x) - x + mp.log(2*mp.pi)/2) */
  assert_rel (tf_stirling_remainder (0.001), 2.5422704679670945415, 1e-14);
  assert_rel (tf_stirling_remainder (0.5), 0.15342640972002734529, 1e-14);
  assert_rel (tf_stirling_remainder (1.0), 0.08106146679532725822, 1e-14);
  assert_rel (tf_stirling_remainder (9.99), 0.008338896797734330091, 1e-12);
  assert_rel (tf_stirling_remainder (10.0), 0.0083305634333628712565, 1e-14);
  assert_rel (tf_stirling_remainder (15.0), 0.005554733551962801371, 1e-14);
  assert_rel (tf_stirling_remainder (1000.0), 0.000083333330555556349206, 1e-14);
  assert_rel (tf_stirling_remainder (1e12), 8.3333333333333333331e-14, 1e-14);
}

static void
test_bd0 (void)
{
  /* x*mp.log(x/m) + m - x */
  assert_rel (tf_bd0 (5.0, 5.1), 0.00098686351910142790375, 1e-13);
  assert_rel (tf_bd0 (1e12 + 1e6, 1e12), 0.49999983333341666662, 1e-13);
  assert_rel (tf_bd0 (0.0, 3.0), 3.0, 0.0);
  assert_rel (tf_bd0 (3.0, 10.0), 3.3880815870221920221, 1e-14);
  assert_rel (tf_bd0 (1e15, 1e15 - 1.0), 5.0000000000000033468e-16, 1e-13);
}

static void
test_dbinom (void)
{
  /* mp.loggamma(n+1) - mp.loggamma(k+1) - mp.loggamma(n-k+1) + k*mp.log(p) + (n-k)*mp.log1p(-p) */
  assert_rel (tf_log_dbinom (7, 20, 0.5, 0.5), -2.6046523646342583444, 1e-14);
  assert_rel (tf_log_dbinom (0, 10, 0.3, 0.7), -3.5667494393873236305, 1e-14);
  assert_rel (tf_log_dbinom (10, 10, 0.3, 0.7), -12.039728043259360296, 1e-14);
  assert_rel (tf_log_dbinom (1, 1, 0.25, 0.75), -1.3862943611198906188, 1e-14);
  /* scipy.stats.binom.logpmf gives -16.0390014... here: it loses digits at n = 1e12 */
  assert_rel (tf_log_dbinom (5e11 + 1e6, 1e12, 0.5, 0.5), -16.04130191060858487, 1e-12);
  assert_rel (tf_log_dbinom (3, 1e12, 1e-12, 1.0 - 1e-12), -2.791759469228555041, 1e-12);
}

static void
test_beta_functions (void)
{
  /* mp.loggamma(a) + mp.loggamma(b) - mp.loggamma(a+b) */
  assert_rel (tf_log_beta (0.01, 0.01), 5.2981552399856674521, 1e-14);
  assert_rel (tf_log_beta (1e12, 1e12), -1386294361132.4406173, 1e-15);
  assert_rel (tf_log_beta (0.5, 1e13), -14.394438161536584359, 1e-14);
  assert_rel (tf_log_beta (3, 4), -4.0943445622221006848, 1e-14);
  assert_rel (tf_log_beta (1e-3, 1e13), 6.8772452791749311171, 1e-14);
  /* (a-1)*mp.log(x) + (b-1)*mp.log1p(-x) - lbeta(a, b) */
  assert_rel (tf_log_dbeta (0.3, 0.7, 2.5, 7), 0.87939046819295010512, 1e-14);
  assert_rel (tf_log_dbeta (0.5, 0.5, 1e12, 1e12), 13.936292795599394326, 1e-14);
  assert_rel (tf_log_dbeta (1e-6, 1.0 - 1e-6, 0.01, 0.01), 8.3792012023994589532, 1e-14);
  assert_rel (tf_log_dbeta (0.5000005, 0.4999995, 5e11, 5e11), 13.08971920540231331, 1e-9);
}

static void
test_log_helpers (void)
{
  /* identities, common practice */
  assert_rel (tf_log1mexp (-1e-20), log (1e-20), 1e-15);
  assert_rel (tf_log1mexp (-50.0), -exp (-50.0), 1e-15);
  assert_rel (tf_log_add (-1000.0, -1000.0), -1000.0 + G_LN2, 1e-15);
  assert_rel (tf_log_sub (0.0, -1e-20), log (1e-20), 1e-15);
  g_assert_true (tf_log_add (-INFINITY, -3.0) == -3.0);
  assert_rel (tf_logistic (-700.0), exp (-700.0), 1e-14);
  assert_rel (tf_logistic (30.0), 1.0 / (1.0 + exp (-30.0)), 1e-16);
  g_assert_true (tf_logistic (-800.0) >= 0.0 && tf_logistic (800.0) == 1.0);
}

static void
test_incbeta (void)
{
  struct { double a, b, x, ll, lu; double tol; } c[] = {
    /* mp.log(mp.betainc(a, b, 0, x, regularized=True)), and the upper tail */
    { 10, 20, 0.3, -1.0105901996721369198, -0.45256313244238904879, 1e-13 },
    { 0.001, 0.001, 0.5, -0.69314718055994530942, -0.69314718055994530942, 1e-13 },
    { 0.5, 1e6, 1e-7, -1.0634021406639234657, -0.42354627416205947332, 1e-13 },
    { 2.5, 7, 0.999, -1.7781811681992731562e-20, -45.476110833604785853, 1e-13 },
    { 1e3, 1e3, 0.4, -43.943720073971279161, -8.2316113548693078907e-20, 1e-13 },
    { 0.001, 1, 0.3, -0.0012039728043259360547, -6.7227304461239969895, 1e-12 },
    /* a, b >= 5e11: mpmath's betainc does not converge; tanh-sinh quadrature of the
     * beta density at mp.dps = 45 (mp.quad split at the mode +- k sd). scipy's
     * beta.logcdf gives -1.8409998 for the first: Boost loses 5 digits here. */
    { 5e11, 5e11, 0.4999995, -1.8410216450531197841, -0.17275377901517976125, 1e-11 },
    /* upper = 1 − e^−20006: its log, −e^−20006, underflows to 0 (the quadrature's
     * −3.2e-34 there is its own rounding) */
    { 5e11, 5e11, 0.4999, -20006.217680893794844, 0.0, 1e-300 },
    { 1e13, 1e13, 0.5000001, -0.20523816981692146336, -1.6844487580471724129, 1e-10 },
    { 1e12, 3e12, 0.25, -0.69314702700700177807, -0.69314733411291241927, 1e-10 },
  };
  for (guint i = 0; i < G_N_ELEMENTS (c); i++)
    {
      double l, u;
      tf_incbeta_log_both (c[i].x, 1.0 - c[i].x, c[i].a, c[i].b, &l, &u);
      assert_rel (l, c[i].ll, MAX (c[i].tol, 1e-14));
      assert_rel (u, c[i].lu, c[i].tol);
    }
  /* tails below 1e-300 stay finite in log space */
  g_assert_true (isfinite (tf_incbeta_log_lower (1e-5, 1.0 - 1e-5, 100, 100)));
  g_assert_true (tf_incbeta_log_lower (0.0, 1.0, 2, 3) == -INFINITY);
}

static void
test_incbeta_inverse (void)
{
  /* scipy.stats.beta.ppf(0.025, 8, 14), beta.isf(0.025, 8, 14) */
  assert_rel (tf_incbeta_inverse (0.025, 8, 14, TRUE), 0.18107162554017314, 1e-12);
  assert_rel (tf_incbeta_inverse (0.025, 8, 14, FALSE), 0.5696754829041243, 1e-12);
  /* round trips over the range, including shapes 5e11 and p = 1e-300 */
  double shapes[][2] = { { 0.01, 0.01 }, { 0.5, 3 }, { 8, 14 }, { 1e3, 1e6 }, { 5e11, 5e11 + 3 }, { 2, 1e12 } };
  double ps[] = { 1e-300, 1e-20, 0.025, 0.5, 0.975 };
  for (guint i = 0; i < G_N_ELEMENTS (shapes); i++)
    for (guint j = 0; j < G_N_ELEMENTS (ps); j++)
      for (int lower = 0; lower < 2; lower++)
        {
          double a = shapes[i][0], b = shapes[i][1];
          double x = tf_incbeta_inverse (ps[j], a, b, lower);
          if (x == 0.0 || x == 1.0)
            continue;       /* the quantile is not representable */
          double l, u;
          tf_incbeta_log_both (x, 1.0 - x, a, b, &l, &u);
          double got = lower ? l : u;
          /* the probability of the returned x, to within the density times one ulp */
          double slope = exp (tf_log_dbeta (x, 1.0 - x, a, b) - got) * x * 4e-16;
          if (!(fabs (got - log (ps[j])) <= 1e-10 + slope))
            g_error ("a %g b %g p %g lower %d: x %.17g, ln tail %.17g", a, b, ps[j], lower, x, got);
        }
}

/* The inverse at extreme shapes and tails against the root of mpmath 1.2.1's tail:
 * mp.betainc(a, b, 0, x, regularized=True) (or 1 minus it) at the digits given, or
 * for both shapes >= 1e3 tanh-sinh mp.quad of the density at mp.dps = 50, solved for
 * x to 30 digits. With a shape of 0.01 the quantile moves 100 times the tail's
 * relative error, hence 1e-12 there. */
static void
test_incbeta_inverse_extremes (void)
{
  static const struct {
    double a, b, p;
    gboolean lower;
    double want, tol;
  } c[] = {
    { 0.01, 0.01, 0.3, TRUE, 6.4281199357186124242e-23, 1e-12 },          /* dps 60 */
    { 0.01, 5, 0.5, TRUE, 9.8922404241125398696e-32, 1e-12 },             /* dps 60 */
    { 0.01, 1e13, 0.5, TRUE, 4.4655350189105761654e-44, 1e-12 },          /* dps 60 */
    { 0.01, 1e13, 1e-300, FALSE, 6.7971813328061762991e-11, 1e-13 },      /* dps 450 */
    { 2, 1e12, 1e-300, FALSE, 6.9732421113587339469e-10, 1e-13 },         /* dps 450 */
    { 20, 0.02, 1e-300, TRUE, 1.4075573172772482386e-15, 1e-13 },         /* dps 60 */
    { 0.5, 3, 0.999999, TRUE, 0.98529110861986068739, 1e-14 },            /* dps 60 */
    { 3, 1e13, 0.025, TRUE, 6.1867212289552029506e-14, 1e-13 },           /* dps 80 */
    { 0.01, 1e4, 1e-200, FALSE, 0.043991970366486457133, 1e-13 },         /* dps 350 */
    { 1e13, 1e13, 1e-300, TRUE, 0.49999585800871535338, 1e-15 },          /* mp.quad */
    { 1e13, 2e13, 0.5, TRUE, 0.33333333333332962963, 1e-15 },             /* mp.quad */
    { 5e11, 5e11, 1e-20, FALSE, 0.50000463117004480103, 1e-15 },          /* mp.quad */
    { 1e3, 1e6, 0.999999999999, TRUE, 0.0012374798825305140677, 1e-13 }, /* mp.quad */
  };
  for (guint i = 0; i < G_N_ELEMENTS (c); i++)
    assert_rel (tf_incbeta_inverse (c[i].p, c[i].a, c[i].b, c[i].lower), c[i].want, c[i].tol);
  /* ln p = −1000, below the smallest double: mpmath's root at dps 60 (I_x(2, 3) =
   * 6x² − 8x³ + 3x⁴, so x = e^−500 / √6 to double precision) */
  assert_rel (tf_incbeta_inverse_log (-1000.0, 2, 3, TRUE), 2.908596138331301793e-218, 1e-14);
  /* quantiles that no double can hold round to the end: (1e-300 · ½ · π)² (Beta(½, ½),
   * I_x ≈ 2√x / π), 1 − 6.4e-23 (from the first case, by symmetry), 1 − ~1e-21 */
  g_assert_cmpfloat (tf_incbeta_inverse (1e-300, 0.5, 0.5, TRUE), ==, 0.0);
  g_assert_cmpfloat (tf_incbeta_inverse (0.3, 0.01, 0.01, FALSE), ==, 1.0);
  g_assert_cmpfloat (tf_incbeta_inverse (1e-300, 8, 14, FALSE), ==, 1.0);
  /* one prepared shape serves many inversions with the same results */
  TfIncbetaShape sh;
  tf_incbeta_shape_init (&sh, 1e13, 1e13);
  for (int i = 0; i < 3; i++)
    assert_rel (tf_incbeta_shape_inverse_log (&sh, log (1e-300), TRUE), c[9].want, 1e-15);
}

static void
test_binomial (void)
{
  /* scipy.stats.binom.logcdf(7, 20, 0.5), binom.logsf(6, 20, 0.5) */
  assert_rel (tf_binom_log_cdf (7, 20, 0.5, 0.5), log (0.13158798217773438), 1e-13);
  assert_rel (tf_binom_log_sf (7, 20, 0.5, 0.5), log (0.9423408508300781), 1e-13);
  /* scipy.stats.binomtest(7, 20, 0.5).pvalue */
  assert_rel (tf_binom_exact_two_sided (7, 20, 0.5), 0.26317596435546875, 1e-13);
  /* Jefferys (1990), J. Sci. Explor. 4:153: 52,263,471 of 104,490,000, p = 0.0003
   * (from memory); scipy.stats.binomtest(52263471, 104490000, 0.5).pvalue */
  assert_rel (tf_binom_exact_two_sided (52263471, 104490000, 0.5), 0.0003016723533419885, 1e-9);
  /* scipy.stats.binomtest(7, 20).proportion_ci(0.95, 'exact') */
  double lo, hi;
  tf_binom_clopper_pearson (7, 20, 0.95, &lo, &hi);
  assert_rel (lo, 0.1539092047845412, 1e-12);
  assert_rel (hi, 0.5921885345328283, 1e-12);
  /* k = 0: lo = 0, hi = 1 − (α/2)^(1/n) (Clopper & Pearson 1934, closed form) */
  tf_binom_clopper_pearson (0, 1, 0.95, &lo, &hi);
  g_assert_cmpfloat (lo, ==, 0.0);
  assert_rel (hi, 0.975, 1e-14);
  tf_binom_clopper_pearson (0, 57935259, 0.95, &lo, &hi);
  assert_rel (hi, -expm1 (log (0.025) / 57935259), 1e-12);
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
  gsl_set_error_handler_off ();
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/numerics/stirling", test_stirling);
  g_test_add_func ("/numerics/bd0", test_bd0);
  g_test_add_func ("/numerics/dbinom", test_dbinom);
  g_test_add_func ("/numerics/beta-functions", test_beta_functions);
  g_test_add_func ("/numerics/log-helpers", test_log_helpers);
  g_test_add_func ("/numerics/incbeta", test_incbeta);
  g_test_add_func ("/numerics/incbeta-inverse", test_incbeta_inverse);
  g_test_add_func ("/numerics/incbeta-inverse-extremes", test_incbeta_inverse_extremes);
  g_test_add_func ("/numerics/binomial", test_binomial);
  return g_test_run ();
}
