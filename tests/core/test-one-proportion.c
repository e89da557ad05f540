/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-one-proportion.c: the one-proportion design, from n = 1 to n = 10^12.
 *
 * Reference values: scipy 1.10.1 and mpmath 1.2.1 at mp.dps = 40 (Debian 12), with the
 * call beside each; published examples where named.
 */
#include <math.h>
#include <string.h>
#include <glib.h>
#include <gsl/gsl_errno.h>

#include "tf-analysis.h"
#include "tf-results.h"
#include "tf-curves.h"
#include "tf-one-proportion.h"

static void
assert_rel (double got, double want, double tol)
{
  double err = want == 0.0 ? fabs (got) : fabs (got - want) / fabs (want);
  if (!(err <= tol))
    g_error ("got %.17g, want %.17g (relative error %.3g > %.3g)", got, want, err, tol);
}

static TfAnalysis *
make (double k, double n, double theta0, double a, double b, TfDirection dir)
{
  TfAnalysis *an = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);
  an->successes = k;
  an->trials = n;
  an->null_kind = TF_NULL_POINT;
  an->null_value = theta0;
  an->prior = TF_PRIOR_BETA;
  an->prior_a = a;
  an->prior_b = b;
  an->direction = dir;
  an->prior_null = 0.5;
  an->level = 0.95;
  return an;
}

static TfResults *
compute (const TfAnalysis *an)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  tf_one_proportion_validate (an, problems);
  g_assert_cmpuint (problems->len, ==, 0);
  TfResults *r = tf_results_new (TF_DESIGN_ONE_PROPORTION);
  tf_one_proportion_compute (an, r);
  /* nothing undefined leaves as NaN or inf */
  for (guint i = 0; i < r->numbers->len; i++)
    {
      const TfNumber *num = g_ptr_array_index (r->numbers, i);
      g_assert_true (isfinite (num->value));
    }
  return r;
}

static double
get (const TfResults *r, const char *id)
{
  double v = NAN;
  if (!tf_results_get (r, id, &v))
    g_error ("%s is not defined", id);
  return v;
}

static void
test_jefferys (void)
{
  /* Jefferys (1990), "Bayesian analysis of random event generator data", J. Sci.
   * Explor. 4:153–169: 52,263,471 successes in 104,490,000 trials, θ0 = 0.5, uniform
   * prior: p ≈ 0.0003 and BF01 ≈ 12 (both from memory). Checked with
   * scipy.stats.binomtest(52263471, 104490000, 0.5).pvalue = 0.0003016723533419885
   * and mpmath: n ln ½ − ln B(k + 1, n − k + 1) = 2.4761651881806560 (BF01 11.8956). */
  g_autoptr (TfAnalysis) an = make (52263471, 104490000, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r = compute (an);
  assert_rel (get (r, "p_value"), 0.0003016723533419885, 1e-9);
  assert_rel (get (r, "p_value_exact"), 0.0003016723533419885, 1e-9);
  assert_rel (log (get (r, "bf01")), 2.47616518818065604817, 1e-12);
  assert_rel (get (r, "bf01"), 11.89555960660720094, 1e-11);
  assert_rel (get (r, "bf10") * get (r, "bf01"), 1.0, 1e-14);
  /* Savage–Dickey agrees with bf01 (Dickey 1971) */
  assert_rel (get (r, "savage_dickey_bf01"), get (r, "bf01"), 1e-10);
  /* posterior_null = BF01 / (1 + BF01) at π0 = ½ */
  assert_rel (get (r, "posterior_null"), 11.89555960660720094 / 12.89555960660720094, 1e-11);
  assert_rel (get (r, "posterior_null") + get (r, "posterior_alt"), 1.0, 1e-15);
}

static void
test_small (void)
{
  g_autoptr (TfAnalysis) an = make (7, 20, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r = compute (an);
  assert_rel (get (r, "estimate"), 0.35, 1e-15);
  /* scipy.stats.binomtest(7, 20, 0.5).pvalue */
  assert_rel (get (r, "p_value"), 0.26317596435546875, 1e-13);
  /* mid-p (Lancaster 1961): 0.26317596435546875 − ½ binom.pmf(7, 20, 0.5) (scipy) */
  assert_rel (get (r, "p_value_midp"), 0.26317596435546875 - 0.5 * 0.07392883300781250, 1e-12);
  /* score: z = (7 − 10)/√5; 2 norm.sf(3/√5) (scipy) */
  assert_rel (get (r, "z"), -3.0 / sqrt (5.0), 1e-15);
  assert_rel (get (r, "p_value_score"), 0.17971249487899976, 1e-12);
  /* binomtest(7, 20).proportion_ci(0.95, 'exact') (scipy) */
  assert_rel (get (r, "ci_low"), 0.1539092047845412, 1e-12);
  assert_rel (get (r, "ci_high"), 0.5921885345328283, 1e-12);
  /* mpmath: 20 ln ½ − ln B(8, 14) = 0.43987007308916465 (BF01 = 1.5525054931640625) */
  assert_rel (get (r, "bf01"), 1.5525054931640625, 1e-13);
  assert_rel (get (r, "savage_dickey_bf01"), get (r, "bf01"), 1e-10);
  /* scipy.stats.beta.ppf(0.025, 8, 14), isf(0.025, 8, 14), median(8, 14) */
  assert_rel (get (r, "cri_low"), 0.18107162554017314, 1e-12);
  assert_rel (get (r, "cri_high"), 0.5696754829041243, 1e-12);
  assert_rel (get (r, "posterior_median"), 0.3594342666462473, 1e-12);
  assert_rel (get (r, "posterior_mean"), 8.0 / 22.0, 1e-15);
  /* Sellke, Bayarri & Berger (2001): −e p ln p */
  double p = 0.26317596435546875;
  assert_rel (get (r, "min_bf01"), -exp (1.0) * p * log (p), 1e-12);
  g_assert_cmpfloat (get (r, "min_bf01_lr"), <=, get (r, "bf01"));

  /* one-sided: scipy.stats.binomtest(7, 20, 0.5, alternative='less'/'greater') */
  g_autoptr (TfAnalysis) less = make (7, 20, 0.5, 1, 1, TF_DIRECTION_LESS);
  g_autoptr (TfResults) rl = compute (less);
  assert_rel (get (rl, "p_value"), 0.13158798217773438, 1e-13);
  g_autoptr (TfAnalysis) greater = make (7, 20, 0.5, 1, 1, TF_DIRECTION_GREATER);
  g_autoptr (TfResults) rg = compute (greater);
  assert_rel (get (rg, "p_value"), 0.9423408508300781, 1e-13);
  /* a truncated posterior lies on its side */
  g_assert_cmpfloat (get (rg, "cri_low"), >=, 0.5);
  g_assert_cmpfloat (get (rl, "cri_high"), <=, 0.5);
  /* BF10 of the two halves average to the two-sided BF10 under a symmetric prior
   * (common practice: the prior mass splits ½, ½) */
  assert_rel (0.5 * (get (rl, "bf10") + get (rg, "bf10")), get (r, "bf10"), 1e-12);
}

static void
test_edges (void)
{
  /* n = 1, k = 0, uniform prior: BF01 = ½ / B(1, 2) · ... = 1 exactly (mpmath:
   * ln ½ − ln B(1, 2) = 0); exact p = 1 (scipy binomtest(0, 1, 0.5)); CP hi = 0.975 */
  g_autoptr (TfAnalysis) a1 = make (0, 1, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r1 = compute (a1);
  assert_rel (get (r1, "bf01"), 1.0, 1e-14);
  assert_rel (get (r1, "p_value"), 1.0, 1e-15);
  g_assert_cmpfloat (get (r1, "ci_low"), ==, 0.0);
  assert_rel (get (r1, "ci_high"), 0.975, 1e-14);
  assert_rel (get (r1, "min_bf01"), 1.0, 0.0);

  /* k = n = 10, θ0 = 1e-6, a = b = 0.01: mpmath 10 ln 1e-6 + ln B(.01, .01)
   * − ln B(10.01, .01) = −137.43389692973507 */
  g_autoptr (TfAnalysis) a2 = make (10, 10, 1e-6, 0.01, 0.01, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r2 = compute (a2);
  assert_rel (log (get (r2, "bf01")), -137.43389692973507034, 1e-12);
  /* posterior_null = BF01 / (1 + BF01) ≈ BF01, kept to full relative precision */
  assert_rel (get (r2, "posterior_null"), exp (-137.43389692973507034), 1e-12);
  g_assert_cmpfloat (get (r2, "ci_high"), ==, 1.0);

  /* n = 1e12, k near nθ0: mpmath n ln ½ − ln B(k + 1, n − k + 1) = 5.5897192053069633 */
  g_autoptr (TfAnalysis) a3 = make (5e11 + 2e6, 1e12, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r3 = compute (a3);
  assert_rel (log (get (r3, "bf01")), 5.589719205306963338, 1e-10);
  assert_rel (get (r3, "savage_dickey_bf01"), get (r3, "bf01"), 1e-10);
  /* posterior_alt on its own side: 1 / (1 + BF01) */
  assert_rel (get (r3, "posterior_alt"), 1.0 / (1.0 + exp (5.589719205306963338)), 1e-10);

  /* n = 1e12, k far from nθ0: ln BF01 = −20135513537.078743 (mpmath) underflows; the
   * results say so and never carry NaN or inf */
  g_assert_cmpfloat (fabs (tf_one_proportion_log_bf01 (6e11, 1e12, 0.5, 1, 1)
                           - -20135513537.07874321793), <=, 1e-4);
  g_autoptr (TfAnalysis) a4 = make (6e11, 1e12, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r4 = compute (a4);
  g_assert_cmpfloat (get (r4, "bf01"), ==, 0.0);
  g_assert_cmpfloat (get (r4, "posterior_alt"), ==, 1.0);
  const TfNumber *mb = tf_results_lookup (r4, "min_bf01");
  g_assert_nonnull (mb);
  g_assert_cmpint (mb->status, ==, TF_STATUS_UNDEFINED);

  /* huge priors, θ0 at 1 − 1e-6 */
  g_autoptr (TfAnalysis) a5 = make (3, 5, 1.0 - 1e-6, 1e10, 1e10, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r5 = compute (a5);
  (void) r5;
}

static void
test_validate (void)
{
  g_autoptr (GPtrArray) p = tf_problem_list_new ();
  g_autoptr (TfAnalysis) an = make (12, 10, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  tf_one_proportion_validate (an, p);
  const TfProblem *pr = tf_problem_list_find (p, "Data", "Successes");
  g_assert_nonnull (pr);
  g_assert_nonnull (strstr (pr->message, "cannot exceed"));

  g_ptr_array_set_size (p, 0);
  an->successes = 1;
  an->trials = 2.5;
  an->null_value = 1.0;
  an->prior_a = 0.0;
  an->prior_b = 2e15;
  tf_one_proportion_validate (an, p);
  g_assert_nonnull (tf_problem_list_find (p, "Data", "Trials"));
  g_assert_nonnull (tf_problem_list_find (p, "Null", "Value"));
  g_assert_nonnull (tf_problem_list_find (p, "Alternative", "PriorA"));
  g_assert_nonnull (tf_problem_list_find (p, "Alternative", "PriorB"));

  g_ptr_array_set_size (p, 0);
  g_autoptr (TfAnalysis) iv = make (1, 2, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  iv->null_kind = TF_NULL_INTERVAL;
  iv->prior = TF_PRIOR_NORMAL;
  tf_one_proportion_validate (iv, p);
  g_assert_nonnull (tf_problem_list_find (p, "Null", "Kind"));
  g_assert_nonnull (tf_problem_list_find (p, "Alternative", "Prior"));
}

static void
test_densities (void)
{
  g_autoptr (TfAnalysis) an = make (7, 20, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfDensityCurves) c = tf_density_curves_new (an, 201, NULL);
  g_assert_nonnull (c);
  g_assert_cmpfloat (c->lo, <=, 0.5);
  g_assert_cmpfloat (c->hi, >=, 0.5);
  for (guint i = 0; i < c->n; i++)
    g_assert_true (isfinite (c->prior[i]) && isfinite (c->posterior[i]) && isfinite (c->likelihood[i]));
  /* Savage–Dickey heights give bf01 (mpmath: 1.5525054931640625) */
  assert_rel (c->posterior_at_null / c->prior_at_null, 1.5525054931640625, 1e-12);
  g_assert_false (c->posterior_narrow);
  g_assert_cmpstr (c->parameter_markup, ==, "θ");

  g_autoptr (TfAnalysis) big = make (5e11, 1e12, 0.3, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfDensityCurves) cb = tf_density_curves_new (big, 101, NULL);
  g_assert_nonnull (cb);
  g_assert_true (cb->posterior_narrow);
  for (guint i = 0; i < cb->n; i++)
    g_assert_true (isfinite (cb->posterior[i]) && cb->posterior[i] >= 0.0);
}

int
main (int argc, char **argv)
{
  gsl_set_error_handler_off ();
  g_test_init (&argc, &argv, NULL);
  g_test_add_func ("/one-proportion/jefferys-1990", test_jefferys);
  g_test_add_func ("/one-proportion/small", test_small);
  g_test_add_func ("/one-proportion/edges", test_edges);
  g_test_add_func ("/one-proportion/validate", test_validate);
  g_test_add_func ("/one-proportion/densities", test_densities);
  return g_test_run ();
}
