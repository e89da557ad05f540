/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-beta-difference.c: the tails, density and quantiles of Δ = θA − θB for two
 * independent betas (core/tf-beta-difference.c), at small, zero-cell, huge and
 * tiny-shape inputs. Reference values, where not closed forms:
 *   "exact sum": P(X > Y) = Σ_{i<ax} B(ay + i, by + bx) / ((bx + i) B(1 + i, bx) B(ay, by))
 *   for integer ax (Cook 2005), summed term by term in mpmath 1.2.1 at mp.dps = 40; at
 *   10^9 trials from the largest term outward (mpmath.loggamma there, numpy longdouble
 *   ratios), as tests/crosscheck/tf-crosscheck-two-proportions.py does.
 * Tolerance 1e-9 relative on the probabilities (1e-7 is the project's tolerance for
 * quadrature; the rule here is accurate to about 1e-12).
 */
#include "tf-beta-difference.h"
#include "tf-check.h"

#include <glib.h>
#include <gsl/gsl_errno.h>
#include <math.h>

/* |ln got − ln want| <= tol: the relative error of the probability. */
static void
assert_log (double got, double want, double tol)
{
  if (!(fabs (got - want) <= tol))
    g_error ("ln p: got %.17g, want %.17g (difference %.3g > %.3g)", got, want,
             fabs (got - want), tol);
}

static void
check_tails (double pa, double qa, double pb, double qb, double d, double lo, double hi)
{
  TfBetaDiff bd;
  double l, u;
  tf_beta_diff_init (&bd, pa, qa, pb, qb);
  g_assert_true (tf_beta_diff_log_cdf (&bd, d, &l, &u));
  assert_log (l, lo, 1e-9);
  assert_log (u, hi, 1e-9);
}

static void
test_uniform (void)
{
  TfBetaDiff bd;
  double l, u;
  /* Beta(1, 1) − Beta(1, 1) is triangular on (−1, 1): P(Δ <= d) = (1 + d)²/2 for d <= 0,
   * density 1 − |d| (closed form, common practice) */
  tf_beta_diff_init (&bd, 1, 1, 1, 1);
  g_assert_true (tf_beta_diff_log_cdf (&bd, -0.7, &l, &u));
  assert_rel (exp (l), 0.045, 1e-9);
  assert_rel (exp (u), 0.955, 1e-9);
  assert_rel (exp (tf_beta_diff_log_density (&bd, -0.7)), 0.3, 1e-9);
  assert_rel (tf_beta_diff_quantile_log (&bd, log (0.045), TRUE), -0.7, 1e-9);
  assert_rel (tf_beta_diff_quantile_log (&bd, log (0.045), FALSE), 0.7, 1e-9);
}

static void
test_exact_sums (void)
{
  /* 56/70 against 48/80, uniform priors: exact sum */
  check_tails (57, 15, 49, 33, 0.0, -5.5039990124431862742, -0.0040787678991526867263);
  /* zero cell, 5/56 against 0/29: exact sum */
  check_tails (6, 52, 1, 30, 0.0, -2.6330275028025786824, -0.074573314471210169543);
  /* far tail, P(θA >= θB) = e^−6999.29: exact sum */
  check_tails (2, 647878, 1049, 349, 0.0, 0.0, -6999.2898040417406947);
  /* 10^9 trials a group: exact sum from its largest term */
  check_tails (500030001, 499970001, 500000001, 500000001, 0.0, -2.409544136248524,
               -0.09415272210444492);
}

static void
test_tiny_shape (void)
{
  /* a shape of 0.14 in the narrower variable: mpmath.quad (mp.dps 25) of
   * f_A(d + w) P(θB >= w) in w = (1 − d) t^(1/pb), and of f_B(x) P(θA >= x + d) in
   * x = (1 − d) t^(1/pb), plus the beta tails outside */
  check_tails (34.138608748222339, 6.929331347069648, 0.13860874822233971, 9.9293313470696489,
               0.76902611848466351, -1.5732437652086453, -0.23240054787535811);
}

/* The tail at the returned quantile is the level asked for, and the density is the
 * derivative of the tail (a central difference, internal consistency). */
static void
check_quantile (double pa, double qa, double pb, double qb, double log_p, gboolean density)
{
  TfBetaDiff bd;
  double l, u, l1, u1;
  tf_beta_diff_init (&bd, pa, qa, pb, qb);
  for (int lower = 0; lower <= 1; lower++)
    {
      double q = tf_beta_diff_quantile_log (&bd, log_p, lower);
      g_assert_true (isfinite (q));
      g_assert_true (tf_beta_diff_log_cdf (&bd, q, &l, &u));
      assert_log (lower ? l : u, log_p, 1e-9);
    }
  if (!density)
    return;
  double q = tf_beta_diff_quantile_log (&bd, log (0.3), TRUE), h = 1e-4 * bd.sd;
  g_assert_true (tf_beta_diff_log_cdf (&bd, q - h, &l, &u));
  g_assert_true (tf_beta_diff_log_cdf (&bd, q + h, &l1, &u1));
  assert_rel (exp (tf_beta_diff_log_density (&bd, q)), (exp (l1) - exp (l)) / (2.0 * h), 1e-6);
}

static void
test_quantiles (void)
{
  check_quantile (57, 15, 49, 33, log (0.025), TRUE);
  check_quantile (6, 52, 1, 30, log (0.025), TRUE);
  check_quantile (300501, 699501, 300001, 700001, log (1e-6), TRUE);
  check_quantile (500030001, 499970001, 500000001, 500000001, log (0.025), TRUE);
  check_quantile (1.5, 5, 8290759.5, 798168, -11.09922459321729, TRUE);
  check_quantile (57, 15, 49, 33, -700.0, TRUE);
  /* a prior shape of 0.01 and no successes in A: the quantiles by secant steps (the
   * density there is left to the adaptive rule, which is not accurate for it yet) */
  check_quantile (0.01, 10.01, 3.01, 17.01, log (0.025), FALSE);
}

int
main (int argc, char **argv)
{
  gsl_set_error_handler_off ();
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/beta-difference/uniform", test_uniform);
  g_test_add_func ("/beta-difference/exact-sums", test_exact_sums);
  g_test_add_func ("/beta-difference/tiny-shape", test_tiny_shape);
  g_test_add_func ("/beta-difference/quantiles", test_quantiles);
  return g_test_run ();
}
