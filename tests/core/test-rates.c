/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-rates.c: the one-rate and two-rates designs and the Poisson numerics under them.
 * Every check value names its source; tolerances are relative unless stated.
 */
#include "tf-design.h"
#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-poisson.h"
#include "tf-results.h"
#include "tf-one-rate.h"
#include "tf-two-rates.h"
#include "tf-check.h"

#include <math.h>

static TfAnalysis *
one_rate (double k, double e, double l0)
{
  TfAnalysis *a = tf_analysis_new (TF_DESIGN_ONE_RATE);
  a->events = k;
  a->exposure = e;
  a->null_value = l0;
  return a;
}

static TfAnalysis *
two_rates (double ka, double ea, double kb, double eb)
{
  TfAnalysis *a = tf_analysis_new (TF_DESIGN_TWO_RATES);
  a->events_a = ka;
  a->exposure_a = ea;
  a->events_b = kb;
  a->exposure_b = eb;
  return a;
}

static void
test_garwood (void)
{
  double lo, hi;

  /* 10 events, 95%: 4.7954, 18.3904 (from memory, the classic table value; verified
   * with scipy 1.10.1 chi2.ppf(0.025, 20)/2 = 4.7953886961324335, chi2.ppf(0.975, 22)/2 =
   * 18.39035604201778) */
  tf_pois_garwood (10, 0.95, &lo, &hi);
  assert_rel (lo, 4.7953886961324335, TF_TOL_CONVERGED);
  assert_rel (hi, 18.39035604201778, TF_TOL_CONVERGED);
  /* 0 events: lower 0, upper −ln(0.025) = 3.6888794541 (common practice, closed form) */
  tf_pois_garwood (0, 0.95, &lo, &hi);
  g_assert_cmpfloat (lo, ==, TF_TOL_EXACT);
  assert_rel (hi, -log (0.025), TF_TOL_DOUBLE);
}

static void
test_one_rate_example (void)
{
  g_autoptr (TfAnalysis) a = one_rate (15, 4, 2);   /* μ0 = 8 */
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (TfResults) r = tf_analysis_compute (a, problems);

  g_assert_nonnull (r);
  /* Σ of pmf(j; 8) over pmf(j) <= pmf(15)(1 + 1e-7), with scipy 1.10.1
   * stats.poisson.pmf: 0.020276154049088967 */
  assert_rel (get (r, "p_value"), 0.020276154049088967, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "p_value_exact"), 0.020276154049088967, TF_TOL_CLOSED_FORM);
  /* Garwood / E with scipy 1.10.1 chi2.ppf(0.025, 30)/8, chi2.ppf(0.975, 32)/8 */
  assert_rel (get (r, "ci_low"), 2.098846533195829, TF_TOL_CONVERGED);
  assert_rel (get (r, "ci_high"), 6.185054717871461, TF_TOL_CONVERGED);
  /* BF01 = Poisson(15; 8) / NB marginal, Gamma(1, 1) prior, mpmath 1.2.1 at 30 digits
   * from loggamma: 1.28266882073852746 */
  assert_rel (get (r, "bf01"), 1.28266882073852746, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "estimate"), 3.75, TF_TOL_ULPS);
  assert_all_finite (r);

  /* greater: P(X >= 15; 8), scipy 1.10.1 stats.poisson.sf(14, 8) */
  a->direction = TF_DIRECTION_GREATER;
  g_autoptr (TfResults) g = tf_analysis_compute (a, problems);
  assert_rel (get (g, "p_value"), 0.017256990397966385, TF_TOL_CLOSED_FORM);
  /* min_bf01 = −e p ln p (Sellke, Bayarri & Berger 2001) */
  double p = get (g, "p_value");
  assert_rel (get (g, "min_bf01"), -exp (1.0) * p * log (p), TF_TOL_DOUBLE);
}

static void
test_two_rates_example (void)
{
  g_autoptr (TfAnalysis) a = two_rates (11, 800, 23, 3011);
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (TfResults) r = tf_analysis_compute (a, problems);

  g_assert_nonnull (r);
  /* null_value 0 is read as ratio 1: conditional binomial against π0 = 800/3811,
   * scipy 1.10.1 stats.binomtest(11, 34, 800/3811).pvalue */
  assert_rel (get (r, "p_value"), 0.13663444706428232, TF_TOL_CLOSED_FORM);
  /* Clopper–Pearson carried to the ratio, scipy 1.10.1
   * binomtest(11, 34, ...).proportion_ci(0.95, 'exact'), ρ = (3011/800) π/(1 − π) */
  assert_rel (get (r, "ci_low"), 0.7922050858333567, TF_TOL_CONVERGED);
  assert_rel (get (r, "ci_high"), 3.8438627403949517, TF_TOL_CONVERGED);
  assert_rel (get (r, "estimate"), (11.0 / 800) / (23.0 / 3011), TF_TOL_ULPS);
  /* ratio 1 given explicitly gives the same */
  a->null_value = 1.0;
  g_autoptr (TfResults) r1 = tf_analysis_compute (a, problems);
  assert_rel (get (r1, "bf01"), get (r, "bf01"), TF_TOL_ULPS);
  assert_all_finite (r);
}

static void
test_extremes (void)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  const double ks[] = { 0, 1, 1e12 };
  const double es[] = { 1e-3, 1, 1e12 };

  for (guint i = 0; i < G_N_ELEMENTS (ks); i++)
    for (guint j = 0; j < G_N_ELEMENTS (es); j++)
      for (int d = 0; d < 3; d++)
        {
          g_autoptr (TfAnalysis) a = one_rate (ks[i], es[j], 1.0);
          a->direction = d;
          g_autoptr (TfResults) r = tf_analysis_compute (a, problems);
          g_assert_nonnull (r);
          assert_all_finite (r);
          g_autoptr (TfAnalysis) b = two_rates (ks[i], es[j], ks[G_N_ELEMENTS (ks) - 1 - i], 1.0);
          b->direction = d;
          g_autoptr (TfResults) s = tf_analysis_compute (b, problems);
          g_assert_nonnull (s);
          assert_all_finite (s);
        }
  /* 1e12 events against their own mean: the exact p stays near 1, the BF finite */
  g_autoptr (TfAnalysis) a = one_rate (1e12, 1e12, 1.0);
  g_autoptr (TfResults) r = tf_analysis_compute (a, problems);
  g_assert_cmpfloat (get (r, "p_value"), >, 0.99);
  g_assert_cmpuint (problems->len, ==, 0);
}

/* ln BF01 where the log marginals are ~1e12 and cancel: strong priors placed away from
 * the data or the null. Check values from mpmath 1.2.1 at 50 digits from loggamma (the
 * closed forms in tests/crosscheck/tf-crosscheck-rates.py), |error| <= 1e-9 absolute
 * or relative above 1. */
static void
test_bf_cancellation (void)
{
  struct { double ka, ea, kb, eb, rho0, shape, rate, want; } two[] = {
    /* the old four-marginal form was 1.8e-4 off here */
    { 337591536845, 336115766.21973705, 0, 0.016734247088335128, 1, 227122669358.58163,
      11929588903.190395, -0.45184968904345482216 },
    { 3e11, 1e9, 2e11, 5e8, 1.5, 1e12, 1e10, 78946878192.240361235 },
    /* both groups far from a tight prior, their ratio the null's: terms of 1e13 in
     * every pooling but that of group B into the prior on B's scale (was 1.4e-4 off) */
    { 1e12, 1e12, 1, 1e12, 1e12, 1e12, 1, -25.937873935371102899 },
  };
  for (guint i = 0; i < G_N_ELEMENTS (two); i++)
    {
      double got = tf_two_rates_log_bf01 (two[i].ka, two[i].ea, two[i].kb, two[i].eb,
                                          two[i].rho0, two[i].shape, two[i].rate);
      assert_rel (got, two[i].want, TF_TOL_CLOSED_FORM / MIN (1.0, fabs (two[i].want)));
    }
  /* Gamma(1e12, 1e12), far from λ0 = 2 and 4: prior and posterior densities at λ0
   * near e^−3e11, their ratio moderate */
  assert_rel (tf_one_rate_log_bf01 (10, 1, 2, 1e12, 1e12), 5.9314718055639530942, TF_TOL_CLOSED_FORM);
  assert_rel (tf_one_rate_log_bf01 (2e10, 9.2e9, 4, 1e12, 1e12), 68303920.765347498561, TF_TOL_CLOSED_FORM);
}

static void
test_interval_null (void)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (TfAnalysis) a = one_rate (15, 4, 2);
  a->null_kind = TF_NULL_INTERVAL;
  a->null_low = 3;
  a->null_high = 4;
  g_autoptr (TfResults) r = tf_analysis_compute (a, problems);
  /* the estimate 3.75 lies in the null: every p-value is 1 (common practice) */
  assert_rel (get (r, "p_value"), 1.0, TF_TOL_EXACT);
  g_assert_cmpfloat (get (r, "bf01"), >, 1.0);
  assert_all_finite (r);
}

static void
test_validation (void)
{
  struct { TfDesign d; const char *key; } cases[] = {
    { TF_DESIGN_ONE_RATE, "Events" }, { TF_DESIGN_ONE_RATE, "Exposure" },
    { TF_DESIGN_ONE_RATE, "Value" }, { TF_DESIGN_TWO_RATES, "EventsA" },
    { TF_DESIGN_TWO_RATES, "ExposureA" }, { TF_DESIGN_TWO_RATES, "EventsB" },
    { TF_DESIGN_TWO_RATES, "ExposureB" },
  };
  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autoptr (TfAnalysis) a = cases[i].d == TF_DESIGN_ONE_RATE ? one_rate (3, 2, 1)
                                                                  : two_rates (3, 2, 4, 5);
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();
      const char *k = cases[i].key;
      if (g_str_equal (k, "Events")) a->events = -1;
      else if (g_str_equal (k, "Exposure")) a->exposure = 0;
      else if (g_str_equal (k, "Value")) a->null_value = -2;
      else if (g_str_equal (k, "EventsA")) a->events_a = 2.5;
      else if (g_str_equal (k, "ExposureA")) a->exposure_a = -1;
      else if (g_str_equal (k, "EventsB")) a->events_b = -3;
      else if (g_str_equal (k, "ExposureB")) a->exposure_b = INFINITY;
      g_assert_null (tf_analysis_compute (a, problems));
      g_assert_nonnull (tf_problem_list_find (problems,
                                              g_str_equal (k, "Value") ? "Null" : "Data", k));
    }
  g_autoptr (TfAnalysis) a = one_rate (3, 2, 1);
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  a->prior_shape = 0;
  a->prior_rate = -1;
  a->prior = TF_PRIOR_BETA;
  g_assert_false (tf_analysis_validate (a, problems));
  g_assert_nonnull (tf_problem_list_find (problems, "Alternative", "PriorShape"));
  g_assert_nonnull (tf_problem_list_find (problems, "Alternative", "PriorRate"));
  g_assert_nonnull (tf_problem_list_find (problems, "Alternative", "Prior"));
}

static void
test_curves (void)
{
  g_autoptr (TfAnalysis) a = one_rate (15, 4, 2);
  g_autoptr (TfAnalysis) b = two_rates (11, 800, 23, 3011);
  TfAnalysis *both[] = { a, b };

  for (guint i = 0; i < 2; i++)
    {
      g_autoptr (TfDensityCurves) c = tf_density_curves_new (both[i], 200, NULL);
      g_assert_nonnull (c);
      for (guint j = 0; j < c->n; j++)
        g_assert_true (isfinite (c->prior[j]) && isfinite (c->posterior[j])
                       && isfinite (c->likelihood[j]) && c->posterior[j] >= 0.0);
      g_assert_true (c->lo <= c->null_value && c->null_value <= c->hi);
      g_autoptr (TfEvidenceCurve) s = tf_sensitivity_curve_new (both[i], 50, NULL, NULL);
      g_assert_nonnull (s);
      g_assert_true (s->x_log);
      assert_rel (s->x[0], 1e-2, TF_TOL_DOUBLE);
      assert_rel (s->x[49], 1e4, TF_TOL_DOUBLE);
      g_autoptr (TfEvidenceCurve) n = tf_sample_size_curve_new (both[i], 50, NULL, NULL);
      g_assert_nonnull (n);
      for (guint j = 0; j < n->n; j++)
        g_assert_true (isfinite (n->log_bf01[j]));
      /* 41 points put the observed exposure at the 11th (10^(−2 + 8·10/40) = 1): there
       * the counts that hold the score statistic are the observed ones, so the curve
       * passes through the analysis's own BF01 and P(null | data); the p-value held is
       * the score test's */
      {
        g_autoptr (TfEvidenceCurve) n41 = tf_sample_size_curve_new (both[i], 41, NULL, NULL);
        g_autoptr (GPtrArray) problems = tf_problem_list_new ();
        g_autoptr (TfResults) r = tf_analysis_compute (both[i], problems);

        g_assert_nonnull (n41);
        g_assert_nonnull (r);
        assert_rel (n41->x[10], n41->chosen_x, TF_TOL_DOUBLE);
        /* 1e-10: x[10] is the observed exposure only to the grid's rounding (above), and
         * the Bayes factor moves with the exposure */
        assert_rel (exp (n41->log_bf01[10]), get (r, "bf01"), 1e-10);
        assert_rel (n41->posterior_null[10], get (r, "posterior_null"), 1e-10);
        assert_rel (n41->p_value, get (r, "p_value_score"), TF_TOL_DOUBLE);
      }
      g_autoptr (TfNullDistribution) d = tf_null_distribution_new (both[i], 100, NULL, NULL);
      g_assert_nonnull (d);
      g_assert_true (d->discrete);
      /* the masses in the tail add up to the exact p-value (Poisson tails beyond the
       * range shown are below 1e-10 here) */
      double tail = 0.0, total = 0.0;
      for (guint j = 0; j < d->n; j++)
        {
          total += d->mass[j];
          if (d->in_tail[j])
            tail += d->mass[j];
        }
      assert_rel (total, 1.0, TF_TOL_CLOSED_FORM);
      assert_rel (tail, d->p_value, TF_TOL_ITERATIVE);
    }
}

/* Beyond a prior mean rate of 10^12 the two-rate Bayes factor is not given (the
 * cross-check's range; its rounding grows past 1e-9 there): not defined, with the reason,
 * and the curves built on it say so; the classical numbers stay. */
static void
test_two_rates_prior_range (void)
{
  g_autoptr (TfAnalysis) a = two_rates (30, 10, 18, 12);
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (TfResults) r = NULL;
  g_autofree char *why = NULL;
  const TfNumber *bf;

  a->prior_shape = 1e12;
  a->prior_rate = 1e-6;
  r = tf_analysis_compute (a, problems);
  g_assert_nonnull (r);
  bf = tf_results_lookup (r, "bf01");
  g_assert_nonnull (bf);
  g_assert_cmpint (bf->status, !=, TF_STATUS_OK);
  g_assert_nonnull (strstr (bf->reason, "10^12"));
  g_assert_true (isfinite (get (r, "p_value")));
  g_assert_null (tf_sensitivity_curve_new (a, 50, NULL, &why));
  g_assert_nonnull (why);
  g_assert_nonnull (strstr (why, "10^12"));
  /* below, at a prior mean of 10^11 about counts of that size, it is given */
  {
    g_autoptr (TfAnalysis) b = two_rates (1e11, 1, 1.00001e11, 1);
    g_autoptr (TfResults) rb = NULL;

    b->prior_shape = 10;
    b->prior_rate = 1e-10;
    rb = tf_analysis_compute (b, problems);
    g_assert_nonnull (rb);
    g_assert_true (isfinite (get (rb, "bf01")));
  }
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/rates/garwood", test_garwood);
  g_test_add_func ("/rates/one-rate-example", test_one_rate_example);
  g_test_add_func ("/rates/two-rates-example", test_two_rates_example);
  g_test_add_func ("/rates/extremes", test_extremes);
  g_test_add_func ("/rates/bf-cancellation", test_bf_cancellation);
  g_test_add_func ("/rates/interval-null", test_interval_null);
  g_test_add_func ("/rates/validation", test_validation);
  g_test_add_func ("/rates/curves", test_curves);
  g_test_add_func ("/rates/two-rates-prior-range", test_two_rates_prior_range);
  return g_test_run ();
}
