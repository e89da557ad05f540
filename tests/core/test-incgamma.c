/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-incgamma.c: the regularised incomplete gamma in log space and its inverse
 * (core/tf-poisson.h: tf_gamma_inc_log_both, _log_lower, _log_upper,
 * tf_gamma_inc_inverse_log), in each of its regimes (the power series, Legendre's
 * continued fraction, Temme's uniform expansion), from shapes of 1e-300 to 1e15 and
 * tails down to 1e-300 and far below.
 *
 * Reference values are from mpmath 1.2.1, computed for these tests with Debian's
 * /usr/bin/python3 (the calls named above each group); log probabilities are compared
 * by assert_log_prob (the relative error of the probability while its log is above −1).
 */
#include <float.h>

#include "tf-incgamma.h"
#include "tf-logspace.h"
#include "tf-check.h"

typedef struct {
  double a, x;
  double log_lower, log_upper;
} GammaCase;

static void
check_gamma_cases (const GammaCase *c, guint n, double tol)
{
  for (guint i = 0; i < n; i++)
    {
      double l, u;

      g_test_message ("a %g, x %g", c[i].a, c[i].x);
      tf_gamma_inc_log_both (c[i].a, c[i].x, &l, &u);
      assert_log_prob (l, c[i].log_lower, tol);
      assert_log_prob (u, c[i].log_upper, tol);
      /* the one-tail functions give the same numbers */
      assert_log_prob (tf_gamma_inc_log_lower (c[i].a, c[i].x), l, TF_TOL_EXACT);
      assert_log_prob (tf_gamma_inc_log_upper (c[i].a, c[i].x), u, TF_TOL_EXACT);
    }
}

/* The power series (x < a + 1, and x < 0.5 when a < 1) and Legendre's continued
 * fraction (the rest), for shapes up to 1e4. */
static void
test_series_and_fraction (void)
{
  /* mpmath 1.2.1 at mp.dps = 50: log(gammainc(a, 0, x, regularized=True)) and
   * log(gammainc(a, x, inf, regularized=True)), the larger tail as log1p(-smaller);
   * "−0.0" where that log is below the smallest double (its value beside it) */
  static const GammaCase series[] = {
    { 3.5, 2.0, -1.5131164644779842573, -0.24874677377441854745 },
    { 0.5, 0.1, -1.0634020471545286363, -0.42354632347596573841 },
    { 200.0, 150.0, -9.7707609832085637043, -0.000057098515831312139183 },
    { 50.0, 1e-6, -839.25329583037889621, -0.0 },                      /* −3.29e-365 */
    { 3.5, 1e-85, -687.47280173657103329, -2.7186653198518414836e-299 },
    { 1e4, 1e3, -14031.269698821251667, -0.0 },                        /* −1.98e-6094 */
  };
  static const GammaCase fraction[] = {
    { 3.5, 10.0, -0.0055852515924360061984, -5.190417125594322539 },
    { 0.5, 2.0, -0.046567912292390163548, -3.0900371531220866394 },
    { 1e-3, 5.0, -1.1509820021103913402e-6, -13.674895640579352998 },
    { 200.0, 260.0, -0.000047501252609645318924, -9.9547782270742944625 },
    { 2.0, 700.0, -6.9116332571755993706e-302, -693.44749211296540991 },
    { 5.0, 750.0, -2.5205290499993794489e-316, -726.69242056615357781 },
    { 1e4, 3e4, -0.0, -9020.0944525416794842 },                        /* −4.20e-3918 */
    { 1e-300, 1.0, -2.1938393439552027917e-301, -692.29245985721575079 },
  };

  check_gamma_cases (series, G_N_ELEMENTS (series), TF_TOL_ULPS);
  check_gamma_cases (fraction, G_N_ELEMENTS (fraction), TF_TOL_ULPS);
}

/* Tiny shapes below x = 0.5: the series gives P, and ln Q = ln(1 − P) keeps P's
 * absolute rounding, a few ulps of 1, which is 1/Q times that relative to Q. */
static void
test_tiny_shapes (void)
{
  double l, u;

  /* mpmath 1.2.1 at mp.dps = 50, as above */
  tf_gamma_inc_log_both (1e-3, 0.3, &l, &u);
  assert_log_prob (l, -0.00090624860755579793821, TF_TOL_ULPS);
  /* Q = 9e-4: a thousand times the ulps of P, hence thousands of ulps */
  assert_log_prob (u, -7.0066499783702296609, TF_TOL_DOUBLE);
  /* Q = 1.1e-9: ln Q = −20.633816453181882851 is left unchecked; ln(1 − P) holds it to
   * about 4e-9 here, short of the 1e-9 the rest are held to */
  tf_gamma_inc_log_both (1e-10, 1e-5, &l, &u);
  assert_log_prob (l, -1.0935719800125941635e-9, TF_TOL_ULPS);
  g_assert_cmpfloat (u, <, 0.0);
}

/* Temme's uniform expansion (a >= 1000, |x − a| <= a/2), out to the far tails. */
static void
test_temme (void)
{
  /* mpmath 1.2.1 at mp.dps = 50: gammainc as above */
  static const GammaCase moderate[] = {
    { 1e3, 1e3, -0.68477186329031014615, -0.70159323664597249568 },
    { 1e4, 9800.0, -3.8073232363866581788, -0.022457843956297579683 },
    { 1e4, 10150.0, -0.069715226791252050281, -2.6979916359489248344 },
  };
  /* mpmath's gammainc does not converge at these shapes: mp.quad (tanh-sinh) of the
   * Gamma(a, 1) density exp((a − 1) log t − t − loggamma(a)) at mp.dps = 60 over pieces
   * of the smaller tail from the mode out to ±80 sd (or from x out, 400 of its decay
   * lengths |(a − 1)/x − 1|⁻¹), the larger tail as log1p(-exp(smaller)); the same at
   * mp.dps = 40 with other pieces agrees to 1e-25 */
  static const GammaCase huge[] = {
    { 1e12, 1e12 + 1e6, -0.17275377902340195623, -1.8410216450095176948 },
    { 1e12, 999962000000.0, -726.57550718054348293, -2.8331302777257531937e-316 },
    { 1e15, 1e15 + 3e7, -0.18800671308042438236, -1.7638086271833228908 },
    { 1e12, 1.2e12, -0.0, -17678443219.170384967 },                    /* −1.88e-7677650339 */
  };

  check_gamma_cases (moderate, G_N_ELEMENTS (moderate), TF_TOL_ULPS);
  check_gamma_cases (huge, G_N_ELEMENTS (huge), TF_TOL_ULPS);
}

/* Closed forms (common practice): Q(1, x) = e^−x, P(1, x) = 1 − e^−x; P(½, x) = erf √x,
 * Q(½, x) = erfc √x. And the ends of the domain as tf-poisson.h gives them. */
static void
test_closed_forms (void)
{
  const double xs[] = { 1e-300, 1e-8, 0.5, 30.0, 700.0, 1e5 };
  double l, u;

  for (guint i = 0; i < G_N_ELEMENTS (xs); i++)
    {
      tf_gamma_inc_log_both (1.0, xs[i], &l, &u);
      assert_log_prob (u, -xs[i], TF_TOL_ULPS);
      assert_log_prob (l, log (-expm1 (-xs[i])), TF_TOL_ULPS);
    }
  tf_gamma_inc_log_both (0.5, 100.0, &l, &u);
  assert_rel (u, log (erfc (10.0)), TF_TOL_ROUNDING);
  tf_gamma_inc_log_both (0.5, 0.04, &l, &u);
  assert_log_prob (l, log (erf (0.2)), TF_TOL_ROUNDING);

  tf_gamma_inc_log_both (3.0, 0.0, &l, &u);
  g_assert_true (l == -INFINITY && u == 0.0);
  tf_gamma_inc_log_both (3.0, INFINITY, &l, &u);
  g_assert_true (l == 0.0 && u == -INFINITY);
  tf_gamma_inc_log_both (0.0, 1.0, &l, &u);
  g_assert_true (isnan (l) && isnan (u));
  tf_gamma_inc_log_both (2.0, -1.0, &l, &u);
  g_assert_true (isnan (l) && isnan (u));
}

/* The inverse against the root of mpmath's tail. */
static void
test_inverse (void)
{
  static const struct {
    double p, a;
    gboolean lower;
    double want, tol;
  } c[] = {
    /* mpmath 1.2.1 at mp.dps = 60: bisection in ln x for the x with
     * log(gammainc(a, 0, x, regularized=True)) (lower) or log(gammainc(a, x, inf,
     * regularized=True)) (upper) equal to log(p), the double the C library gives */
    { 0.025, 3.5, TRUE, 0.84493459033867730543, TF_TOL_ROUNDING },
    { 0.025, 3.5, FALSE, 8.0063821373146620461, TF_TOL_ROUNDING },
    { 1e-300, 2.0, TRUE, 1.4142135623731118038e-150, TF_TOL_SERIES },
    { 1e-300, 2.0, FALSE, 697.32421137935256092, TF_TOL_ROUNDING },
    { 1e-300, 1e-3, FALSE, 677.35519980311880138, TF_TOL_ROUNDING },
    { 0.975, 1e4, TRUE, 10196.941824999883195, TF_TOL_ROUNDING },
    { 1e-300, 1e4, TRUE, 6737.6871915903292862, TF_TOL_ROUNDING },
    { 0.5, 0.5, FALSE, 0.22746821155978636367, TF_TOL_ROUNDING },
    /* with a shape of 1e-3 the quantile moves 1/a = 1000 times the tail's relative
     * error, hence 1e-11 */
    { 0.5, 1e-3, TRUE, 5.2442064082781000361e-302, 1e-11 },
    /* a = 1e12: bisection on the mp.quad tails of test_temme, at mp.dps = 40 */
    { 0.025, 1e12, TRUE, 999998040036.96261306, TF_TOL_ROUNDING },
    { 1e-300, 1e12, FALSE, 1000037047553.4632145, TF_TOL_ROUNDING },
  };

  for (guint i = 0; i < G_N_ELEMENTS (c); i++)
    {
      g_test_message ("p %g, a %g, lower %d", c[i].p, c[i].a, c[i].lower);
      assert_rel (tf_gamma_inc_inverse_log (log (c[i].p), c[i].a, c[i].lower), c[i].want, c[i].tol);
    }
  /* ln p = −1000, below the smallest double: the same bisection at mp.dps = 60 */
  assert_rel (tf_gamma_inc_inverse_log (-1000.0, 5.0, TRUE), 3.605287215667644357e-87, TF_TOL_SERIES);
  /* the ends, as tf-poisson.h gives them */
  g_assert_true (tf_gamma_inc_inverse_log (0.0, 2.0, TRUE) == INFINITY);
  g_assert_true (tf_gamma_inc_inverse_log (0.0, 2.0, FALSE) == 0.0);
  g_assert_true (tf_gamma_inc_inverse_log (-INFINITY, 2.0, TRUE) == 0.0);
  g_assert_true (isnan (tf_gamma_inc_inverse_log (0.1, 2.0, TRUE)));
  g_assert_true (isnan (tf_gamma_inc_inverse_log (-1.0, 0.0, TRUE)));
}

/* Round trips over the range: the tail at the returned x is ln p, to within its own
 * accuracy and the density times one ulp of x. */
static void
test_inverse_round_trips (void)
{
  const double shapes[] = { 1e-3, 0.5, 3.5, 1e3, 1e12 };
  const double ps[] = { 1e-300, 1e-20, 0.025, 0.5, 0.975 };
  guint checked = 0;

  for (guint i = 0; i < G_N_ELEMENTS (shapes); i++)
    for (guint j = 0; j < G_N_ELEMENTS (ps); j++)
      for (int lower = 0; lower < 2; lower++)
        {
          double a = shapes[i], lp = log (ps[j]);
          double x = tf_gamma_inc_inverse_log (lp, a, lower);
          double got, slope;

          /* the quantile is not representable: 0, inf, or (lower tails of a = 1e-3) a
           * subnormal where the search stopped, whose tail is not ln p */
          if (x < DBL_MIN || isinf (x))
            continue;
          got = lower ? tf_gamma_inc_log_lower (a, x) : tf_gamma_inc_log_upper (a, x);
          /* d ln P / dx = (a / x) dpois(a, x) / P, the same size for ln Q */
          slope = exp (log (a) - log (x) + tf_log_dpois (a, x) - got);
          if (!(fabs (got - lp) <= TF_TOL_SERIES * MAX (1.0, fabs (lp)) + slope * x * 2 * DBL_EPSILON))
            g_error ("a %g p %g lower %d: x %.17g, ln tail %.17g", a, ps[j], lower, x, got);
          checked++;
        }
  /* all but the five below the smallest double: a = 1e-3 with P of 1e-300, 1e-20, 0.025
   * and 0.025 (Q 0.975), and a = ½ with P of 1e-300 */
  g_assert_cmpuint (checked, ==, 45);
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/incgamma/series-and-fraction", test_series_and_fraction);
  g_test_add_func ("/incgamma/tiny-shapes", test_tiny_shapes);
  g_test_add_func ("/incgamma/temme", test_temme);
  g_test_add_func ("/incgamma/closed-forms", test_closed_forms);
  g_test_add_func ("/incgamma/inverse", test_inverse);
  g_test_add_func ("/incgamma/inverse-round-trips", test_inverse_round_trips);
  return g_test_run ();
}
