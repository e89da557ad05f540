/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-means.c: one mean, paired means and two means: worked examples, identities,
 * validation messages naming their keys, and no NaN at the edges of the domain.
 */
#include <math.h>

#include "tf-design.h"
#include "tf-analysis.h"
#include "tf-results.h"
#include "tf-curves.h"
#include "tf-jzs.h"
#include "tf-noncentral-t.h"
#include "tf-means.h"
#include "tf-check.h"

static GArray *
array_of (const double *v, guint n)
{
  GArray *a = g_array_new (FALSE, FALSE, sizeof (double));
  g_array_append_vals (a, v, n);
  return a;
}

/* Student (1908), the sleep data (Cushny & Peebles 1905): the two drugs' extra hours
 * of sleep in the same ten patients. */
static const double sleep_a[] = { 0.7, -1.6, -0.2, -1.2, -0.1, 3.4, 3.7, 0.8, 0.0, 2.0 };
static const double sleep_b[] = { 1.9, 0.8, 1.1, 0.1, -0.1, 4.4, 5.5, 1.6, 4.6, 3.4 };

static void
test_paired_sleep (void)
{
  g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_PAIRED_MEANS);
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();

  tf_analysis_set_values (&a->values_a, array_of (sleep_b, 10));
  tf_analysis_set_values (&a->values_b, array_of (sleep_a, 10));
  tf_analysis_summarise_values (a);
  g_autoptr (TfResults) r = tf_analysis_compute (a, problems);
  g_assert_nonnull (r);
  /* scipy 1.10.1: scipy.stats.ttest_1samp(b − a, 0) → 4.062127683382037, 0.00283289019738427 */
  assert_rel (get (r, "t"), 4.062127683382037, TF_TOL_DOUBLE);
  g_assert_cmpfloat (get (r, "df"), ==, 9.0);
  assert_rel (get (r, "p_value"), 0.00283289019738427, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "estimate"), 1.58, TF_TOL_DOUBLE);
  /* BF10 17.25888: BayesFactor's ttestBF example on these data (from memory), and
   * scipy.integrate.quad on Rouder et al. (2009) eq. 1, r = √2/2: 17.258880267773957 */
  assert_rel (get (r, "bf10"), 17.258880267773957, TF_TOL_CONVERGED);
  assert_rel (get (r, "bf01") * get (r, "bf10"), 1.0, TF_TOL_DOUBLE);
  /* Cohen's d = t / √n */
  assert_rel (get (r, "effect_size"), 4.062127683382037 / sqrt (10.0), TF_TOL_DOUBLE);
  g_assert_cmpfloat (get (r, "cri_low"), <, get (r, "effect_size"));
  g_assert_cmpfloat (get (r, "hdi_high") - get (r, "hdi_low"), <=,
                     get (r, "cri_high") - get (r, "cri_low") + TF_TOL_CONVERGED);
  g_assert_cmpfloat (get (r, "prob_greater"), >, 0.99);
}

static void
test_two_means (void)
{
  g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_TWO_MEANS);
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();

  a->n_a = 15; a->mean_a = 5.1; a->sd_a = 1.2;
  a->n_b = 18; a->mean_b = 4.2; a->sd_b = 1.9;
  g_autoptr (TfResults) r = tf_analysis_compute (a, problems);
  g_assert_nonnull (r);
  /* scipy 1.10.1: ttest_ind_from_stats(5.1, 1.2, 15, 4.2, 1.9, 18, equal_var=False)
   * → 1.6526826858013437, 0.10915372322994572; equal_var=True → 1.5874115917746896,
   * 0.12256834075662182 */
  assert_rel (get (r, "t"), 1.6526826858013437, TF_TOL_DOUBLE);
  assert_rel (get (r, "p_value"), 0.10915372322994572, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "p_value_welch"), 0.10915372322994572, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "p_value_student"), 0.12256834075662182, TF_TOL_CLOSED_FORM);
  /* scipy.integrate.quad on the two-sample JZS integrand (Rouder et al. 2009), t from
   * Student, N = 15·18/33, ν = 31, r = √2/2: 0.8639933374237501 */
  assert_rel (get (r, "bf10"), 0.8639933374237501, TF_TOL_CONVERGED);
  a->equal_variances = TRUE;
  g_autoptr (TfResults) r2 = tf_analysis_compute (a, problems);
  assert_rel (get (r2, "t"), 1.5874115917746896, TF_TOL_DOUBLE);
  g_assert_cmpfloat (get (r2, "df"), ==, 31.0);
}

static void
test_known_sd (void)
{
  g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_ONE_MEAN);
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();

  a->n = 25; a->mean = 0.4; a->sd = 1.3;
  a->has_known_sd = TRUE; a->known_sd = 1.0;          /* z = 0.4 · 5 / 1 = 2 */
  a->prior = TF_PRIOR_NORMAL;
  g_autoptr (TfResults) r = tf_analysis_compute (a, problems);
  g_assert_nonnull (r);
  assert_rel (get (r, "z"), 2.0, TF_TOL_DOUBLE);
  g_assert_null (tf_results_lookup (r, "t"));
  /* 2 Φ(−2), scipy 1.10.1: 2 * scipy.stats.norm.sf(2.0) = 0.04550026389635839 */
  assert_rel (get (r, "p_value"), 0.04550026389635839, TF_TOL_CLOSED_FORM);
  /* normal–normal closed form (1 + n r²)^(−½) exp(z² n r² / (2 (1 + n r²))), r² = ½:
   * 1.7341320157826192 (evaluated in Python) */
  assert_rel (get (r, "bf10"), 1.7341320157826192, TF_TOL_DOUBLE);
  /* the Cauchy prior next to it: scipy.integrate.quad on Rouder's integrand with ν → ∞:
   * 1.25122490078385 */
  assert_rel (1.0 / get (r, "bf01_jzs"), 1.25122490078385, TF_TOL_CONVERGED);
  /* exp(−z²/2) */
  assert_rel (get (r, "min_bf01_lr"), exp (-2.0), TF_TOL_DOUBLE);
}

static void
test_one_sided_identity (void)
{
  /* BF+0 + BF−0 = 2 BF10 (Morey & Wagenmakers 2014): the two truncations share the prior. */
  const double ts[] = { -3.0, 0.3, 2.5 };
  for (guint i = 0; i < G_N_ELEMENTS (ts); i++)
    {
      TfDeltaPrior p = { .prior = TF_PRIOR_CAUCHY, .r = 0.707, .direction = TF_DIRECTION_TWO_SIDED };
      double two = exp (-tf_means_log_bf01 (&p, ts[i], 30.0, 29.0));
      p.direction = TF_DIRECTION_GREATER;
      double plus = exp (-tf_means_log_bf01 (&p, ts[i], 30.0, 29.0));
      p.direction = TF_DIRECTION_LESS;
      double minus = exp (-tf_means_log_bf01 (&p, ts[i], 30.0, 29.0));
      assert_rel (plus + minus, 2.0 * two, TF_TOL_CONVERGED);
    }
}

static void
test_one_sided_sleep (void)
{
  /* The sleep data's t = 4.062127683382037, n = 10, r = √2/2. scipy 1.10.1: quad of
   * nct.pdf(t, 9, √10 δ) · 2 cauchy.pdf(δ, 0, r) over δ > 0 (δ < 0), over t.pdf(t, 9):
   * BF+0 = 34.41693597129677, BF−0 = 0.10082456425110407 */
  TfDeltaPrior p = { .prior = TF_PRIOR_CAUCHY, .r = M_SQRT1_2, .direction = TF_DIRECTION_GREATER };
  assert_rel (exp (-tf_means_log_bf01 (&p, 4.062127683382037, 10.0, 9.0)), 34.41693597129677, TF_TOL_CONVERGED);
  p.direction = TF_DIRECTION_LESS;
  assert_rel (exp (-tf_means_log_bf01 (&p, 4.062127683382037, 10.0, 9.0)), 0.10082456425110407, TF_TOL_CONVERGED);
}

/* The posterior of δ: its equal-tailed and highest-density limits and P(δ > 0). */
static void
test_posterior (void)
{
  TfDeltaPrior p = { .prior = TF_PRIOR_CAUCHY, .r = M_SQRT1_2 };
  double lo, hi;
  /* The sleep data, t = 4.062127683382037, ν = 9, n = 10, r = √2/2, 95%: the numpy
   * Gauss-Legendre reference of tf-crosscheck-means.py (itself checked against mpmath) */
  g_autoptr (TfDeltaPosterior) post = tf_delta_posterior_new (&p, 4.062127683382037, 10.0, 9.0);
  assert_abs (tf_delta_posterior_quantile (post, 0.025, -INFINITY, INFINITY), 0.28272867423497217, TF_TOL_CONVERGED);
  assert_abs (tf_delta_posterior_quantile (post, 0.975, -INFINITY, INFINITY), 1.9750958462955199, TF_TOL_CONVERGED);
  tf_delta_posterior_hdi (post, 0.95, -INFINITY, INFINITY, &lo, &hi);
  assert_abs (lo, 0.2590498086644123, TF_TOL_CONVERGED);
  assert_abs (hi, 1.9484980091934765, TF_TOL_CONVERGED);
  assert_abs (exp (tf_delta_posterior_log_mass (post, 0.0, INFINITY)), 0.99707905256057172, TF_TOL_DOUBLE);
  /* truncated to δ > 0 */
  assert_abs (tf_delta_posterior_quantile (post, 0.025, 0.0, INFINITY), 0.29999859798418338, TF_TOL_CONVERGED);
  tf_delta_posterior_hdi (post, 0.95, 0.0, INFINITY, &lo, &hi);
  assert_abs (lo, 0.26763276065736119, TF_TOL_CONVERGED);
  assert_abs (hi, 1.9377006238624221, TF_TOL_CONVERGED);

  /* Known SD and a normal prior: the posterior is normal, precision n + 1/r², mean
   * z √n / (n + 1/r²) (the conjugate update); z = 2, n = 30, r = ½. scipy 1.10.1:
   * norm.ppf(0.025 and 0.975, μ, s) = −0.013941310569972165, 0.6583207899878145,
   * norm.sf(0, μ, s) = 0.9698554130046989; truncated to δ > 0, norm.ppf(F(0) + 0.025 and
   * 0.975 (1 − F(0)), μ, s) = 0.04715881863071408, 0.6605606505544122. The HDI of a
   * normal is its equal-tailed interval. */
  TfDeltaPrior q = { .prior = TF_PRIOR_NORMAL, .r = 0.5 };
  g_autoptr (TfDeltaPosterior) z = tf_delta_posterior_new (&q, 2.0, 30.0, INFINITY);
  assert_abs (tf_delta_posterior_quantile (z, 0.025, -INFINITY, INFINITY), -0.013941310569972165, TF_TOL_DOUBLE);
  assert_abs (tf_delta_posterior_quantile (z, 0.975, -INFINITY, INFINITY), 0.6583207899878145, TF_TOL_DOUBLE);
  tf_delta_posterior_hdi (z, 0.95, -INFINITY, INFINITY, &lo, &hi);
  assert_abs (lo, -0.013941310569972165, TF_TOL_DOUBLE);
  assert_abs (hi, 0.6583207899878145, TF_TOL_DOUBLE);
  assert_abs (exp (tf_delta_posterior_log_mass (z, 0.0, INFINITY)), 0.9698554130046989, TF_TOL_DOUBLE);
  assert_abs (tf_delta_posterior_quantile (z, 0.025, 0.0, INFINITY), 0.04715881863071408, TF_TOL_DOUBLE);
  assert_abs (tf_delta_posterior_quantile (z, 0.975, 0.0, INFINITY), 0.6605606505544122, TF_TOL_DOUBLE);
}

/* n = 10^8, t = ±10^3: finite, the two truncations add up (Morey & Wagenmakers 2014),
 * and the side the data point to carries all of the two-sided evidence. */
static void
test_extreme (void)
{
  const double ts[] = { 1e3, -1e3, 1e-3 }, dfs[] = { 1e8 - 1.0, INFINITY };
  for (guint i = 0; i < G_N_ELEMENTS (ts); i++)
    for (guint j = 0; j < G_N_ELEMENTS (dfs); j++)
      {
        double t = ts[i], l10 = tf_jzs_log_bf10 (t, 1e8, dfs[j], M_SQRT1_2);
        double lp = tf_jzs_log_bf_one_sided (t, 1e8, dfs[j], M_SQRT1_2, 1);
        double lm = tf_jzs_log_bf_one_sided (t, 1e8, dfs[j], M_SQRT1_2, -1);
        g_assert_true (isfinite (l10) && isfinite (lp) && isfinite (lm));
        double hi = MAX (lp, lm), sum = hi + log1p (exp (MIN (lp, lm) - hi));
        g_assert_cmpfloat (fabs (sum - (l10 + G_LN2)), <=, TF_TOL_DOUBLE * MAX (1.0, fabs (l10)));
        if (fabs (t) > 1.0)
          g_assert_cmpfloat (fabs ((t > 0 ? lp : lm) - (l10 + G_LN2)), <=, TF_TOL_DOUBLE * fabs (l10));
      }
}

static void
test_noncentral_t (void)
{
  /* scipy 1.10.1: scipy.stats.nct.cdf(1.5, 10, 1) = 0.6695168482153548,
   * nct.cdf(-2, 5, 0.5) = 0.018978976156883057 */
  assert_rel (tf_nct_cdf (1.5, 10.0, 1.0), 0.6695168482153548, TF_TOL_DOUBLE);
  assert_rel (tf_nct_cdf (-2.0, 5.0, 0.5), 0.018978976156883057, TF_TOL_DOUBLE);
  /* mpmath 1.2.1, hyp1f1 form of the density at mp.dps = 60: −1.12471881476431490 */
  assert_rel (tf_nct_log_pdf (1.5, 10.0, 1.0), -1.1247188147643149, TF_TOL_DOUBLE);
  /* inverse round trip */
  double lam = tf_nct_ncp_for_cdf (2.5, 20.0, 0.975);
  assert_rel (tf_nct_cdf (2.5, 20.0, lam), 0.975, TF_TOL_DOUBLE);
}

static void
expect_problem (TfAnalysis *a, const char *key)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_assert_false (tf_analysis_validate (a, problems));
  if (tf_problem_list_find (problems, "Data", key) == NULL
      && tf_problem_list_find (problems, "Alternative", key) == NULL)
    g_error ("no problem names %s", key);
}

static void
test_validation (void)
{
  g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_ONE_MEAN);
  a->n = 1; a->mean = 0.1; a->sd = 1.0;
  expect_problem (a, "N");
  a->n = 10; a->sd = 0.0;
  expect_problem (a, "SD");
  a->sd = 1.0;
  const double one[] = { 3.0 };
  tf_analysis_set_values (&a->values, array_of (one, 1));
  tf_analysis_summarise_values (a);
  expect_problem (a, "Values");
  tf_analysis_set_values (&a->values, NULL);
  a->n = 10; a->sd = 1.0; a->prior_scale = 0.0;
  expect_problem (a, "PriorScale");
  a->prior_scale = 0.7; a->prior = TF_PRIOR_BETA;
  expect_problem (a, "Prior");

  g_autoptr (TfAnalysis) p = tf_analysis_new (TF_DESIGN_PAIRED_MEANS);
  tf_analysis_set_values (&p->values_a, array_of (sleep_a, 10));
  tf_analysis_set_values (&p->values_b, array_of (sleep_b, 9));
  tf_analysis_summarise_values (p);
  expect_problem (p, "ValuesB");

  g_autoptr (TfAnalysis) w = tf_analysis_new (TF_DESIGN_TWO_MEANS);
  w->n_a = 10; w->mean_a = 1; w->sd_a = 0.0; w->n_b = 12; w->mean_b = 2; w->sd_b = 1.0;
  expect_problem (w, "SDA");                 /* Welch with an SD of 0 */
  w->equal_variances = TRUE;
  g_autoptr (GPtrArray) ok = tf_problem_list_new ();
  g_assert_true (tf_analysis_validate (w, ok));
}

/* Every number finite or undefined with a reason, at the edges of the domain. */
static void
test_no_nan (void)
{
  const double ns[] = { 2, 3, 1e4, 1e8 };
  const double ts[] = { 0.0, 1e-3, 3.0, 1e3 };
  for (guint i = 0; i < G_N_ELEMENTS (ns); i++)
    for (guint j = 0; j < G_N_ELEMENTS (ts); j++)
      for (int dir = 0; dir < 3; dir++)
        {
          g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_ONE_MEAN);
          g_autoptr (GPtrArray) problems = tf_problem_list_new ();
          a->n = ns[i]; a->sd = 1.0; a->mean = ts[j] / sqrt (ns[i]);
          a->direction = (TfDirection) dir;
          g_autoptr (TfResults) r = tf_analysis_compute (a, problems);
          g_assert_nonnull (r);
          assert_all_finite (r);
        }
}

static void
test_curves (void)
{
  g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_ONE_MEAN);
  a->n = 20; a->mean = 0.5; a->sd = 1.1;
  g_autoptr (TfDensityCurves) c = tf_density_curves_new (a, 401, NULL);
  g_assert_nonnull (c);
  double sum = 0.0, lsum = 0.0;
  for (guint i = 1; i < c->n; i++)
    {
      sum += 0.5 * (c->posterior[i] + c->posterior[i - 1]) * (c->x[i] - c->x[i - 1]);
      lsum += 0.5 * (c->likelihood[i] + c->likelihood[i - 1]) * (c->x[i] - c->x[i - 1]);
    }
  /* the drawn curves integrate to 1 by the trapezoidal rule on their 401 points: a
   * check of the drawing's scale, to 1e-3 */
  g_assert_cmpfloat (fabs (sum - 1.0), <, 1e-3);
  g_assert_cmpfloat (fabs (lsum - 1.0), <, 1e-3);
  assert_rel (c->prior_at_null, 1.0 / (G_PI * a->prior_scale), TF_TOL_DOUBLE);   /* Cauchy density at 0 */
  g_assert_cmpstr (c->parameter_markup, ==, "δ");

  g_autoptr (TfEvidenceCurve) s = tf_sensitivity_curve_new (a, 64, NULL, NULL);
  g_assert_nonnull (s);
  assert_rel (s->x[0], 1e-2, TF_TOL_DOUBLE);
  assert_rel (s->x[63], 1e2, TF_TOL_DOUBLE);
  g_assert_true (s->x_log);
  g_assert_cmpfloat (s->chosen_x, ==, a->prior_scale);
  g_autoptr (TfEvidenceCurve) n = tf_sample_size_curve_new (a, 32, NULL, NULL);
  g_assert_nonnull (n);
  g_assert_cmpfloat (n->x[31], >=, 0.99e8);
  /* at a fixed p-value the evidence for the null grows with n (Lindley 1957) */
  g_assert_cmpfloat (n->log_bf01[31], >, n->log_bf01[0]);
  g_autoptr (TfNullDistribution) d = tf_null_distribution_new (a, 201, NULL, NULL);
  g_assert_nonnull (d);
  g_assert_false (d->discrete);
  g_assert_true (d->in_tail[0] && d->in_tail[200] && !d->in_tail[100]);
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/means/paired-sleep", test_paired_sleep);
  g_test_add_func ("/means/two-means", test_two_means);
  g_test_add_func ("/means/known-sd", test_known_sd);
  g_test_add_func ("/means/one-sided-identity", test_one_sided_identity);
  g_test_add_func ("/means/one-sided-sleep", test_one_sided_sleep);
  g_test_add_func ("/means/posterior", test_posterior);
  g_test_add_func ("/means/extreme", test_extreme);
  g_test_add_func ("/means/noncentral-t", test_noncentral_t);
  g_test_add_func ("/means/validation", test_validation);
  g_test_add_func ("/means/no-nan", test_no_nan);
  g_test_add_func ("/means/curves", test_curves);
  return g_test_run ();
}
