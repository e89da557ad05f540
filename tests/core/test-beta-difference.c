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
 *
 * The figure grid's convolution (tf_beta_diff_log_density_grid) is checked against
 * the point-by-point density (tf_beta_diff_log_density at its 1e-10) to 1e-6 relative
 * wherever the density is above 1e-3 of its largest value on the grid, and the
 * two-proportions curves (tf_density_curves_new) the same way; below a shape of 0.1,
 * where the point-by-point rule is not accurate, against "mpmath quad": mpmath 1.2.1
 * mp.dps 30, tanh-sinh over each half of (max(0, d), min(1, 1 + d)), the factor t^(s−1)
 * at each end removed by t = u^(1/s).
 */
#include "tf-design.h"
#include "tf-beta-difference.h"
#include "tf-analysis-file.h"
#include "tf-curves.h"
#include "tf-check.h"

#include <glib.h>
#include <math.h>
#include <string.h>

/* The figure grid against the point-by-point density: what a curve needs (see above). */
#define GRID_TOL 1e-6

static void
check_tails (double pa, double qa, double pb, double qb, double d, double lo, double hi)
{
  TfBetaDiff bd;
  double l, u;
  tf_beta_diff_init (&bd, pa, qa, pb, qb);
  g_assert_true (tf_beta_diff_log_cdf (&bd, d, &l, &u));
  /* of logs, absolutely: the relative error of the probability */
  assert_abs (l, lo, TF_TOL_CONVERGED);
  assert_abs (u, hi, TF_TOL_CONVERGED);
}

static void
test_uniform (void)
{
  /* Beta(1, 1) − Beta(1, 1) is triangular on (−1, 1): P(Δ <= d) = (1 + d)²/2 for d <= 0,
   * density 1 − |d| (closed form, common practice) */
  static const double ds[] = { -0.7, -0.4 };
  TfBetaDiff bd;
  double l, u;

  tf_beta_diff_init (&bd, 1, 1, 1, 1);
  for (guint i = 0; i < G_N_ELEMENTS (ds); i++)
    {
      double d = ds[i], cdf = 0.5 * (1.0 + d) * (1.0 + d);

      g_assert_true (tf_beta_diff_log_cdf (&bd, d, &l, &u));
      assert_rel (exp (l), cdf, TF_TOL_CONVERGED);
      assert_rel (exp (u), 1.0 - cdf, TF_TOL_CONVERGED);
      assert_rel (exp (tf_beta_diff_log_density (&bd, d)), 1.0 + d, TF_TOL_CONVERGED);
      assert_rel (tf_beta_diff_quantile_log (&bd, log (cdf), TRUE), d, TF_TOL_CONVERGED);
      assert_rel (tf_beta_diff_quantile_log (&bd, log (cdf), FALSE), -d, TF_TOL_CONVERGED);
    }
  assert_rel (exp (tf_beta_diff_log_density (&bd, 0.25)), 0.75, TF_TOL_CONVERGED);
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
      assert_abs (lower ? l : u, log_p, TF_TOL_CONVERGED);
    }
  if (!density)
    return;
  double q = tf_beta_diff_quantile_log (&bd, log (0.3), TRUE), h = 1e-4 * bd.sd;
  g_assert_true (tf_beta_diff_log_cdf (&bd, q - h, &l, &u));
  g_assert_true (tf_beta_diff_log_cdf (&bd, q + h, &l1, &u1));
  /* 1e-6: the difference of step 1e-4 sd divides the tails' own error by the mass
   * between them, about 1e-4 */
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

/* The grid d_i = (L + i) / S over [lo, hi], as the curves lay it out. */
static void
grid_of (double lo, double hi, guint n, gint64 *S, gint64 *L)
{
  *S = (gint64) floor ((n - 2) / (hi - lo));
  *L = (gint64) floor (lo * *S);
  if (*L + (gint64) n - 1 > *S)
    *L = MAX (-*S, *S - ((gint64) n - 1));
}

static guint grid_points, grid_cases;
static double grid_worst;

/* Every stride-th point the grid computes, against the point-by-point density. */
static void
check_grid (double pa, double qa, double pb, double qb, double lo, double hi)
{
  const guint n = 400, stride = 3;
  double out[400], ref[400], top = -INFINITY;
  TfBetaDiff bd;
  gint64 S, L;

  tf_beta_diff_init (&bd, pa, qa, pb, qb);
  grid_of (lo, hi, n, &S, &L);
  if (!tf_beta_diff_log_density_grid (&bd, S, L, n, out))
    g_error ("Beta(%g, %g) − Beta(%g, %g) on [%g, %g]: the grid does not apply", pa, qa, pb, qb,
             lo, hi);
  for (guint i = 0; i < n; i += stride)
    {
      ref[i] = tf_beta_diff_log_density (&bd, (double) (L + (gint64) i) / S);
      if (isfinite (ref[i]))
        top = MAX (top, ref[i]);
    }
  for (guint i = 0; i < n; i += stride)
    {
      if (isnan (out[i]) || !(ref[i] > top + log (1e-3)))
        continue;
      double e = fabs (expm1 (out[i] - ref[i]));
      if (!(e <= GRID_TOL))
        g_error ("Beta(%g, %g) − Beta(%g, %g) at %.17g: grid %.17g, point by point %.17g",
                 pa, qa, pb, qb, (double) (L + (gint64) i) / S, out[i], ref[i]);
      grid_worst = MAX (grid_worst, e);
      grid_points++;
    }
  grid_cases++;
}

static void
test_grid (void)
{
  /* posteriors and likelihoods: ordinary, zero cells, k = n, 1 trial, 10^9 a group;
   * priors from 0.1 to 10^4, and posteriors with them */
  static const double cases[][6] = {
    { 57, 15, 49, 33, -0.17, 0.53 },
    { 57, 15, 49, 33, -0.9, 0.9 },
    { 6, 52, 1, 30, -0.31, 0.37 },
    { 1, 71, 1, 81, -0.16, 0.18 },
    { 71, 1, 81, 1, -0.18, 0.16 },
    { 1, 2, 2, 1, -1.0, 1.0 },
    { 2, 1, 1, 2, -1.0, 1.0 },
    { 1, 1, 1, 1, -1.0, 1.0 },
    { 500030001, 499970001, 499990001, 500010001, -7e-5, 1.5e-4 },
    { 1e9 + 1, 1, 1, 1e9 + 1, 1.0 - 3e-8, 1.0 },
    { 1, 1e9 + 1, 5e8 + 1, 5e8 + 1, -0.51, -0.49 },
    { 0.5, 0.5, 0.5, 0.5, -1.0, 1.0 },
    { 0.1, 0.1, 0.1, 0.1, -1.0, 1.0 },
    { 2, 3, 2, 3, -1.0, 1.0 },
    { 1e4, 1e4, 1e4, 1e4, -0.02, 0.02 },
    { 10056, 10014, 10048, 10032, -0.024, 0.025 },
    { 56.5, 14.5, 48.5, 32.5, -0.2, 0.55 },
    { 1.5, 30.5, 0.5, 20.5, -0.3, 0.3 },
    { 0.5, 10.5, 3.5, 7.5, -0.8, 0.5 },
    { 12, 8, 9.5, 14.5, -0.5, 0.8 },
    { 6.5, 9.5, 4.5, 8.5, -0.6, 0.8 },
  };
  for (guint c = 0; c < G_N_ELEMENTS (cases); c++)
    check_grid (cases[c][0], cases[c][1], cases[c][2], cases[c][3], cases[c][4], cases[c][5]);
  /* random tables (seeded): trials 10^U(0, 7) a group, uniform successes, priors */
  g_autoptr (GRand) r = g_rand_new_with_seed (20240917);
  static const double priors[] = { 0.5, 1, 2, 10, 100 };
  for (int c = 0; c < 40; c++)
    {
      double na = floor (pow (10.0, g_rand_double_range (r, 0, 7))), nb = floor (pow (10.0, g_rand_double_range (r, 0, 7)));
      double ka = floor (g_rand_double_range (r, 0, na + 1)), kb = floor (g_rand_double_range (r, 0, nb + 1));
      double a = priors[g_rand_int_range (r, 0, 5)], b = priors[g_rand_int_range (r, 0, 5)];
      TfBetaDiff bd;
      tf_beta_diff_init (&bd, ka + a, na - ka + b, kb + a, nb - kb + b);
      double lo = MAX (-1.0, bd.mean - 6.0 * bd.sd), hi = MIN (1.0, bd.mean + 6.0 * bd.sd);
      check_grid (ka + a, na - ka + b, kb + a, nb - kb + b, MIN (lo, 0.0), MAX (hi, 0.0));
    }
  g_test_message ("grid: %u cases, %u points, worst %.2g relative", grid_cases, grid_points,
                  grid_worst);
}

/* Below a shape of 0.1: mpmath quad (see the top). */
static void
check_grid_at (double pa, double qa, double pb, double qb, gint64 S, gint64 J, double want)
{
  TfBetaDiff bd;
  double out;
  tf_beta_diff_init (&bd, pa, qa, pb, qb);
  g_assert_true (tf_beta_diff_log_density_grid (&bd, S, J, 1, &out));
  assert_rel (exp (out), want, GRID_TOL);
  grid_worst = MAX (grid_worst, fabs (exp (out) - want) / want);
}

static void
test_grid_tiny (void)
{
  grid_worst = 0.0;
  check_grid_at (0.01, 10.01, 3.01, 17.01, 265, -125, 0.023696024698374773467);
  check_grid_at (0.01, 10.01, 3.01, 17.01, 265, -65, 1.9306744140768203695);
  check_grid_at (0.01, 10.01, 3.01, 17.01, 265, -5, 0.80198245086767749915);
  check_grid_at (0.01, 10.01, 3.01, 17.01, 265, 35, 0.0032258966123043392393);
  check_grid_at (0.01, 0.01, 0.01, 0.01, 199, -99, 0.019548493878091629596);
  check_grid_at (0.01, 0.01, 0.01, 0.01, 199, 101, 0.019550879856887297792);
  check_grid_at (0.01, 0.01, 0.01, 0.01, 199, 191, 0.12148599272336569922);
  /* next to 0 on the 8 times finer grid the curves use there */
  check_grid_at (0.01, 0.01, 0.01, 0.01, 8 * 199, 8, 0.90055292064611891449);
  check_grid_at (0.5, 0.5, 0.5, 0.5, 199, -99, 0.4379163488169889142);
  check_grid_at (0.5, 0.5, 0.5, 0.5, 199, 101, 0.43428772809006908627);
  check_grid_at (0.5, 0.5, 0.5, 0.5, 8 * 199, 8, 1.3535770574049568421);
  check_grid_at (0.5, 0.5, 0.5, 0.5, 8 * 199, 8 * 197, 0.31991955198294191979);
  g_test_message ("grid against mpmath: worst %.2g relative", grid_worst);
}

/* One curve against the point-by-point density at every 5th point. */
static void
check_curve (const TfDensityCurves *c, const double *y, TfBetaDiff *bd, const char *what)
{
  double top = 0.0;
  for (guint i = 0; i < c->n; i++)
    top = MAX (top, y[i]);
  for (guint i = 0; i < c->n; i += 5)
    {
      double want = exp (tf_beta_diff_log_density (bd, c->x[i]));
      if (want < 1e-3 * top)
        continue;
      if (!(fabs (y[i] - want) <= GRID_TOL * want))
        g_error ("%s at %.17g: curve %.17g, point by point %.17g", what, c->x[i], y[i], want);
      grid_worst = MAX (grid_worst, fabs (y[i] - want) / want);
      grid_points++;
    }
}

/* The mode of Δ by golden sections on the point-by-point log density. */
static double
mode_of (TfBetaDiff *bd, double lo, double hi)
{
  const double g = (sqrt (5.0) - 1.0) / 2.0;
  double a = lo, b = hi;
  for (int it = 0; it < 200 && b - a > 1e-13 * MAX (1.0, fabs (a)); it++)
    {
      double x1 = b - g * (b - a), x2 = a + g * (b - a);
      if (tf_beta_diff_log_density (bd, x1) > tf_beta_diff_log_density (bd, x2))
        b = x2;
      else
        a = x1;
    }
  return 0.5 * (a + b);
}

/* The two-proportions curves (grid, its finer grid near 0 and ±1, the coarse grid for a
 * curve far wider than the range, the spike) against the point-by-point density, and
 * the drawn mode within a grid step of the mode. */
static void
test_curves (void)
{
  static const char *tables[][6] = {
    { "56", "70", "48", "80", "1", "1" }, { "0", "29", "5", "56", "1", "1" },
    { "0", "70", "0", "80", "1", "1" }, { "70", "70", "80", "80", "1", "1" },
    { "0", "1", "1", "1", "1", "1" }, { "1", "1", "0", "1", "1", "1" },
    { "500030000", "1e9", "499990000", "1e9", "1", "1" },
    { "0", "1e9", "500000000", "1e9", "1", "1" }, { "1e9", "1e9", "0", "1e9", "1", "1" },
    { "56", "70", "48", "80", "0.5", "0.5" }, { "56", "70", "48", "80", "10000", "10000" },
    { "56", "70", "48", "80", "2", "3" }, { "5", "12", "3", "9", "1.5", "2.5" },
    { "0", "29", "5", "56", "0.5", "2" },
  };
  grid_points = 0;
  grid_worst = 0.0;
  for (guint t = 0; t < G_N_ELEMENTS (tables); t++)
    {
      const char **k = tables[t];
      g_autofree char *text = g_strdup_printf ("[Analysis]\nFormat=1\nDesign=two-proportions\n"
                                               "[Data]\nSuccessesA=%s\nTrialsA=%s\n"
                                               "SuccessesB=%s\nTrialsB=%s\n[Alternative]\n"
                                               "PriorA=%s\nPriorB=%s\n",
                                               k[0], k[1], k[2], k[3], k[4], k[5]);
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();
      g_autoptr (TfAnalysis) an = tf_analysis_load_from_data (text, strlen (text), problems);
      g_assert_nonnull (an);
      g_autoptr (TfDensityCurves) c = tf_density_curves_new (an, 400, NULL);
      g_assert_nonnull (c);
      double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
      double a = an->prior_a, b = an->prior_b, step = (c->hi - c->lo) / (c->n - 1);
      TfBetaDiff prior, post, lik;
      tf_beta_diff_init (&prior, a, b, a, b);
      tf_beta_diff_init (&post, ka + a, na - ka + b, kb + a, nb - kb + b);
      tf_beta_diff_init (&lik, ka + 1, na - ka + 1, kb + 1, nb - kb + 1);
      check_curve (c, c->prior, &prior, "prior");
      check_curve (c, c->likelihood, &lik, "likelihood");
      if (!c->posterior_narrow)
        {
          check_curve (c, c->posterior, &post, "posterior");
          double m = mode_of (&post, MAX (c->lo, post.mean - 8 * post.sd),
                              MIN (c->hi, post.mean + 8 * post.sd));
          if (!(fabs (c->posterior_mode - m) <= step))
            g_error ("%s/%s vs %s/%s: drawn mode %.17g, mode %.17g, step %.3g", k[0], k[1],
                     k[2], k[3], c->posterior_mode, m, step);
        }
    }
  g_test_message ("curves: %u tables, %u points, worst %.2g relative",
                  (guint) G_N_ELEMENTS (tables), grid_points, grid_worst);
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/beta-difference/uniform", test_uniform);
  g_test_add_func ("/beta-difference/exact-sums", test_exact_sums);
  g_test_add_func ("/beta-difference/tiny-shape", test_tiny_shape);
  g_test_add_func ("/beta-difference/quantiles", test_quantiles);
  g_test_add_func ("/beta-difference/grid", test_grid);
  g_test_add_func ("/beta-difference/grid-tiny", test_grid_tiny);
  g_test_add_func ("/beta-difference/curves", test_curves);
  return g_test_run ();
}
