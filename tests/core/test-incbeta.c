/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-incbeta.c: the regularised incomplete beta in log space and its inverse
 * (core/tf-incbeta.h), from tiny shapes to 10^13 and tails down to 1e-300 and below.
 *
 * Reference values are from mpmath 1.2.1 at mp.dps = 40 (calls named beside each)
 * and scipy 1.10.1 (Debian 12), unless stated otherwise.
 */
#include "tf-logspace.h"
#include "tf-incbeta.h"
#include "tf-check.h"

static void
test_incbeta (void)
{
  struct { double a, b, x, ll, lu; double tol; } c[] = {
    /* mp.log(mp.betainc(a, b, 0, x, regularized=True)), and the upper tail */
    { 10, 20, 0.3, -1.0105901996721369198, -0.45256313244238904879, TF_TOL_SERIES },
    { 0.001, 0.001, 0.5, -0.69314718055994530942, -0.69314718055994530942, TF_TOL_SERIES },
    { 0.5, 1e6, 1e-7, -1.0634021406639234657, -0.42354627416205947332, TF_TOL_SERIES },
    { 2.5, 7, 0.999, -1.7781811681992731562e-20, -45.476110833604785853, TF_TOL_SERIES },
    { 1e3, 1e3, 0.4, -43.943720073971279161, -8.2316113548693078907e-20, TF_TOL_SERIES },
    { 0.001, 1, 0.3, -0.0012039728043259360547, -6.7227304461239969895, TF_TOL_DOUBLE },
    /* a, b >= 5e11: mpmath's betainc does not converge; tanh-sinh quadrature of the
     * beta density at mp.dps = 45 (mp.quad split at the mode +- k sd). scipy's
     * beta.logcdf gives -1.8409998 for the first: Boost loses 5 digits here. Tails at
     * such shapes change by their density (10^6 and more) times any change of x: the
     * last bits of x and of the expansion's variables cost digits, hence 1e-11 at 5e11
     * and 1e-10 at 1e12 and 1e13. */
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
      assert_rel (l, c[i].ll, MAX (c[i].tol, TF_TOL_ROUNDING));
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
  assert_rel (tf_incbeta_inverse (0.025, 8, 14, TRUE), 0.18107162554017314, TF_TOL_DOUBLE);
  assert_rel (tf_incbeta_inverse (0.025, 8, 14, FALSE), 0.5696754829041243, TF_TOL_DOUBLE);
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
          /* the probability of the returned x, to within the density times one ulp, and
           * 1e-10 in ln p: the tails' own accuracy at shapes of 5e11 (test_incbeta) */
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
    { 0.01, 0.01, 0.3, TRUE, 6.4281199357186124242e-23, TF_TOL_DOUBLE },         /* dps 60 */
    { 0.01, 5, 0.5, TRUE, 9.8922404241125398696e-32, TF_TOL_DOUBLE },            /* dps 60 */
    { 0.01, 1e13, 0.5, TRUE, 4.4655350189105761654e-44, TF_TOL_DOUBLE },         /* dps 60 */
    { 0.01, 1e13, 1e-300, FALSE, 6.7971813328061762991e-11, TF_TOL_SERIES },     /* dps 450 */
    { 2, 1e12, 1e-300, FALSE, 6.9732421113587339469e-10, TF_TOL_SERIES },        /* dps 450 */
    { 20, 0.02, 1e-300, TRUE, 1.4075573172772482386e-15, TF_TOL_SERIES },        /* dps 60 */
    { 0.5, 3, 0.999999, TRUE, 0.98529110861986068739, TF_TOL_ROUNDING },         /* dps 60 */
    { 3, 1e13, 0.025, TRUE, 6.1867212289552029506e-14, TF_TOL_SERIES },          /* dps 80 */
    { 0.01, 1e4, 1e-200, FALSE, 0.043991970366486457133, TF_TOL_SERIES },        /* dps 350 */
    { 1e13, 1e13, 1e-300, TRUE, 0.49999585800871535338, TF_TOL_ULPS },           /* mp.quad */
    { 1e13, 2e13, 0.5, TRUE, 0.33333333333332962963, TF_TOL_ULPS },              /* mp.quad */
    { 5e11, 5e11, 1e-20, FALSE, 0.50000463117004480103, TF_TOL_ULPS },           /* mp.quad */
    { 1e3, 1e6, 0.999999999999, TRUE, 0.0012374798825305140677, TF_TOL_SERIES }, /* mp.quad */
  };
  for (guint i = 0; i < G_N_ELEMENTS (c); i++)
    assert_rel (tf_incbeta_inverse (c[i].p, c[i].a, c[i].b, c[i].lower), c[i].want, c[i].tol);
  /* ln p = −1000, below the smallest double: mpmath's root at dps 60 (I_x(2, 3) =
   * 6x² − 8x³ + 3x⁴, so x = e^−500 / √6 to double precision) */
  assert_rel (tf_incbeta_inverse_log (-1000.0, 2, 3, TRUE), 2.908596138331301793e-218, TF_TOL_ROUNDING);
  /* quantiles that no double can hold round to the end: (1e-300 · ½ · π)² (Beta(½, ½),
   * I_x ≈ 2√x / π), 1 − 6.4e-23 (from the first case, by symmetry), 1 − ~1e-21 */
  g_assert_cmpfloat (tf_incbeta_inverse (1e-300, 0.5, 0.5, TRUE), ==, 0.0);
  g_assert_cmpfloat (tf_incbeta_inverse (0.3, 0.01, 0.01, FALSE), ==, 1.0);
  g_assert_cmpfloat (tf_incbeta_inverse (1e-300, 8, 14, FALSE), ==, 1.0);
  /* one prepared shape serves many inversions with the same results */
  TfIncbetaShape sh;
  tf_incbeta_shape_init (&sh, 1e13, 1e13);
  for (int i = 0; i < 3; i++)
    assert_rel (tf_incbeta_shape_inverse_log (&sh, log (1e-300), TRUE), c[9].want, TF_TOL_ULPS);
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/incbeta/log-tails", test_incbeta);
  g_test_add_func ("/incbeta/inverse", test_incbeta_inverse);
  g_test_add_func ("/incbeta/inverse-extremes", test_incbeta_inverse_extremes);
  return g_test_run ();
}
