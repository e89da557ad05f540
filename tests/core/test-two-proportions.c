/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-two-proportions.c: the two-proportions design and the numerics under it
 * (Fisher's exact test, Newcombe's interval, the closed-form Bayes factor, the
 * posterior of θA − θB). Every check value names its source; tolerances are relative
 * unless stated.
 */
#include "tf-design.h"
#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-results.h"
#include "tf-fisher.h"
#include "tf-two-proportions.h"
#include "tf-two-proportions-private.h"
#include "tf-check.h"

#include <math.h>

static TfAnalysis *
two_props (double ka, double na, double kb, double nb)
{
  TfAnalysis *a = tf_analysis_new (TF_DESIGN_TWO_PROPORTIONS);
  a->successes_a = ka;
  a->trials_a = na;
  a->successes_b = kb;
  a->trials_b = nb;
  return a;
}

static TfResults *
compute (const TfAnalysis *a)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  TfResults *r = tf_analysis_compute (a, problems);
  if (r == NULL)
    g_error ("not valid: %s", ((TfProblem *) g_ptr_array_index (problems, 0))->message);
  assert_all_finite (r);
  return r;
}

/* Newcombe (1998), Stat. Med. 17:873, Table II, example (a): 56/70 against 48/80. */
static void
test_worked_example (void)
{
  g_autoptr (TfAnalysis) a = two_props (56, 70, 48, 80);
  g_autoptr (TfResults) r = compute (a);

  /* Newcombe 1998, Table II (a), method 10: 0.0524 to 0.3339 (4 decimals; from memory,
   * and the mpmath re-implementation in the cross-check agrees to 1e-15) */
  g_assert_cmpfloat (fabs (get (r, "diff_ci_low") - 0.0524), <, TF_TOL_PUBLISHED_4DP);
  g_assert_cmpfloat (fabs (get (r, "diff_ci_high") - 0.3339), <, TF_TOL_PUBLISHED_4DP);
  assert_rel (get (r, "estimate"), 0.2, TF_TOL_ULPS);
  /* scipy 1.10.1: stats.fisher_exact([[56,14],[48,32]]).pvalue */
  assert_rel (get (r, "p_value"), 0.012521129749209154, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "p_value_fisher"), 0.012521129749209154, TF_TOL_CLOSED_FORM);
  /* scipy 1.10.1: stats.chi2_contingency(t, correction=False)[1], default (Yates),
   * and lambda_='log-likelihood', correction=False */
  assert_rel (get (r, "p_value_chisq"), 0.008045081368196585, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "p_value_chisq_yates"), 0.013409475178668966, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "p_value_z"), 0.008045081368196585, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "p_value_lr"), 0.007355380180036734, TF_TOL_CLOSED_FORM);
  /* odds ratio ad/bc = 56·32/(14·48) = 8/3 (exact) */
  assert_rel (get (r, "odds_ratio"), 8.0 / 3.0, TF_TOL_ROUNDING);
  assert_rel (get (r, "risk_ratio"), (56.0 / 70.0) / (48.0 / 80.0), TF_TOL_ROUNDING);
  /* Woolf interval: exp(ln(8/3) ± 1.959964 √(1/56 + 1/14 + 1/48 + 1/32)) (common practice) */
  double se = sqrt (1.0 / 56 + 1.0 / 14 + 1.0 / 48 + 1.0 / 32);
  assert_rel (get (r, "or_ci_low"), 8.0 / 3.0 * exp (-1.959963984540054 * se), TF_TOL_DOUBLE);
  /* mpmath 1.2.1, mp.dps = 40: exp(lnB(105,47) + lnB(1,1) − lnB(57,15) − lnB(49,33)) */
  assert_rel (get (r, "bf01"), 0.1599608116990654378, TF_TOL_CLOSED_FORM);
  /* mpmath 1.2.1, mp.dps = 40: quad of betainc(49,33,0,x) · dbeta(x; 57, 15) over [0, 1] */
  assert_rel (get (r, "prob_greater"), 0.99592953897685741935, TF_TOL_ITERATIVE);
  /* −e p ln p from the p-value (Sellke, Bayarri & Berger 2001) */
  double p = get (r, "p_value");
  assert_rel (get (r, "min_bf01"), -M_E * p * log (p), TF_TOL_DOUBLE);
  g_assert_cmpfloat (get (r, "cri_low"), <, get (r, "cri_high"));
}

static void
test_one_sided (void)
{
  g_autoptr (TfAnalysis) a = two_props (56, 70, 48, 80);
  a->direction = TF_DIRECTION_GREATER;
  g_autoptr (TfResults) r = compute (a);
  /* scipy 1.10.1: stats.fisher_exact([[56,14],[48,32]], alternative='greater').pvalue */
  assert_rel (get (r, "p_value"), 0.006324711129898369, TF_TOL_CLOSED_FORM);
  /* BF01+ = BF01 · ½ / P(θA > θB | data) (truncated prior) */
  assert_rel (get (r, "bf01"), 0.1599608116990654378 * 0.5 / 0.99592953897685741935, TF_TOL_ITERATIVE);
  g_assert_cmpfloat (get (r, "cri_low"), >, TF_TOL_EXACT);
}

static void
test_zero_cells (void)
{
  /* Newcombe 1998, Table II (d): 5/56 against 0/29 */
  g_autoptr (TfAnalysis) a = two_props (5, 56, 0, 29);
  g_autoptr (TfResults) r = compute (a);
  /* scipy 1.10.1: stats.fisher_exact([[5,51],[0,29]]).pvalue */
  assert_rel (get (r, "p_value_fisher"), 0.1606214432094711, TF_TOL_CLOSED_FORM);
  /* Haldane–Anscombe: (5.5 · 29.5) / (51.5 · 0.5) */
  assert_rel (get (r, "odds_ratio"), 5.5 * 29.5 / (51.5 * 0.5), TF_TOL_ROUNDING);
  g_assert_nonnull (strstr (tf_results_lookup (r, "odds_ratio")->label, "0.5"));

  /* no successes anywhere: Fisher's p is 1, χ² is undefined with a reason */
  g_autoptr (TfAnalysis) b = two_props (0, 10, 0, 20);
  b->prior_a = b->prior_b = 0.5;
  g_autoptr (TfResults) s = compute (b);
  g_assert_cmpfloat (get (s, "p_value"), ==, 1.0);
  g_assert_cmpint (tf_results_lookup (s, "p_value_chisq")->status, ==, TF_STATUS_UNDEFINED);
  /* mpmath 1.2.1, mp.dps = 40: lnB(0.5, 30.5) + lnB(0.5, 0.5) − lnB(0.5, 10.5) − lnB(0.5, 20.5) */
  assert_rel (log (get (s, "bf01")), 1.535502618158382607, TF_TOL_CLOSED_FORM);
}

/* Huge counts: every number finite or undefined, and ln BF01 as mpmath gives it. */
static void
test_extremes (void)
{
  g_autoptr (TfAnalysis) a = two_props (500030000, 1e9, 500000000, 1e9);
  g_autoptr (TfResults) r = compute (a);
  /* mpmath 1.2.1, mp.dps = 40, the four lnB of the closed form */
  assert_rel (log (get (r, "bf01")), 8.889267977078505490, TF_TOL_CLOSED_FORM);
  g_assert_cmpfloat (get (r, "p_value"), >, TF_TOL_EXACT);
  g_assert_cmpfloat (get (r, "p_value"), <, 1.0);

  g_autoptr (TfAnalysis) b = two_props (1, 1, 0, 1);
  g_autoptr (TfResults) s = compute (b);
  g_assert_cmpfloat (get (s, "p_value"), ==, 1.0);

  g_autoptr (TfAnalysis) c = two_props (1e12, 1e12, 0, 1e12);
  g_autoptr (TfResults) t = compute (c);
  g_assert_cmpfloat (get (t, "estimate"), ==, 1.0);
}

static void
test_validation (void)
{
  g_autoptr (TfAnalysis) a = two_props (11, 10, NAN, 0);
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  a->prior_a = -1;
  a->prior_b = 0;
  a->null_value = 0.1;
  g_assert_false (tf_analysis_validate (a, problems));
  g_assert_nonnull (tf_problem_list_find (problems, "Data", "SuccessesA"));
  g_assert_nonnull (tf_problem_list_find (problems, "Data", "SuccessesB"));
  g_assert_nonnull (tf_problem_list_find (problems, "Data", "TrialsB"));
  g_assert_null (tf_problem_list_find (problems, "Data", "TrialsA"));
  g_assert_nonnull (tf_problem_list_find (problems, "Alternative", "PriorA"));
  g_assert_nonnull (tf_problem_list_find (problems, "Alternative", "PriorB"));
  g_assert_nonnull (tf_problem_list_find (problems, "Null", "Value"));
  g_assert_nonnull (strstr (tf_problem_list_find (problems, "Data", "SuccessesA")->message, "SuccessesA"));

  g_autoptr (TfAnalysis) b = two_props (1.5, 10, 2, 1e16);
  g_autoptr (GPtrArray) p2 = tf_problem_list_new ();
  b->prior = TF_PRIOR_NORMAL;
  g_assert_false (tf_analysis_validate (b, p2));
  g_assert_nonnull (tf_problem_list_find (p2, "Data", "SuccessesA"));
  g_assert_nonnull (tf_problem_list_find (p2, "Data", "TrialsB"));
  g_assert_nonnull (tf_problem_list_find (p2, "Alternative", "Prior"));
}

/* The hypergeometric tails against direct summation of the pmf (common practice:
 * Σ P(X = j) over the support sums to 1). */
static void
test_hypergeometric (void)
{
  TfHyper h;
  tf_hyper_init (&h, 37, 52, 40);
  double total = 0.0, lower = 0.0;
  for (double j = h.lo; j <= h.hi; j++)
    {
      total += exp (tf_hyper_log_pmf (&h, j));
      if (j <= 12)
        lower += exp (tf_hyper_log_pmf (&h, j));
    }
  assert_rel (total, 1.0, TF_TOL_SERIES);
  assert_rel (exp (tf_hyper_log_cdf (&h, 12)), lower, TF_TOL_SERIES);
  assert_rel (exp (tf_hyper_log_sf (&h, 13)), 1.0 - lower, TF_TOL_SERIES);
}

static void
test_curves (void)
{
  g_autoptr (TfAnalysis) a = two_props (15, 50, 26, 50);
  g_autoptr (TfDensityCurves) c = tf_density_curves_new (a, 101, NULL);
  g_assert_nonnull (c);
  for (guint i = 0; i < c->n; i++)
    {
      g_assert_true (isfinite (c->posterior[i]) && c->posterior[i] >= 0.0);
      g_assert_true (isfinite (c->prior[i]) && c->prior[i] >= 0.0);
    }
  g_autoptr (TfEvidenceCurve) s = tf_sensitivity_curve_new (a, 21, NULL, NULL);
  g_assert_nonnull (s);
  g_assert_true (s->x_log);
  assert_rel (s->x[0], 1e-2, TF_TOL_DOUBLE);
  assert_rel (s->x[20], 1e4, TF_TOL_DOUBLE);
  g_autoptr (TfNullDistribution) d = tf_null_distribution_new (a, 0, NULL, NULL);
  g_assert_nonnull (d);
  double mass = 0.0, tail = 0.0;
  for (guint i = 0; i < d->n; i++)
    {
      mass += d->mass[i];
      if (d->in_tail[i])
        tail += d->mass[i];
    }
  assert_rel (mass, 1.0, TF_TOL_CLOSED_FORM);
  assert_rel (tail, d->p_value, TF_TOL_CLOSED_FORM);
  g_autoptr (TfModelProbabilities) m = tf_model_probabilities_new (a, NULL, NULL, NULL);
  g_assert_nonnull (m);
  g_assert_cmpuint (m->n, ==, 2);
  assert_rel (m->posterior[0] + m->posterior[1], 1.0, TF_TOL_ROUNDING);
}

/* The Bayes factor from a normal prior on the log odds ratio, to 10^15 trials a group.
 * Absolute tolerances on ln BF01. */
static void
test_log_or_bf (void)
{
  const char *why = NULL;

  /* one success in all: kA is 0 or 1 with probability ½ each, the likelihood ratio is
   * 2/(1 + e^ψ), and its mean under any prior symmetric about 0 is 1 (derivation) */
  g_assert_cmpfloat (fabs (tf_two_proportions_log_or_bf01 (0, 1e12, 1, 1e12, 1.0, &why)), <, TF_TOL_DOUBLE);
  g_assert_cmpfloat (fabs (tf_two_proportions_log_or_bf01 (1, 1, 0, 1, 3.0, &why)), <, TF_TOL_DOUBLE);
  /* 0 of 10^15 against 7 of 10^15, σ = 10^8: kA is Binomial(7, ½) to O(1/N), so
   * BF10 = E[128/(1 + e^ψ)^7] = 64 − 128 H_6 / (σ √2π) + O(σ^−3), H_6 = 49/20
   * (derivation; the integral of σ(−x)^7 − 1[x < 0] is −H_6, checked by mpmath.quad) */
  g_assert_cmpfloat (fabs (tf_two_proportions_log_or_bf01 (0, 1e15, 7, 1e15, 1e8, &why)
                           - -4.1588830638114999), <, TF_TOL_CONVERGED);
  /* mpmath 1.2.1 at mp.dps = 30, the reference of tests/crosscheck/tf-crosscheck-logor.py
   * (the sum over the support as the integral of the Γ-continued terms) */
  g_assert_cmpfloat (fabs (tf_two_proportions_log_or_bf01 (5e11, 1e12, 4e11, 1e12, 1e-12, &why)
                           - -0.0012499999999371347), <, TF_TOL_DOUBLE);
  g_assert_cmpfloat (fabs (tf_two_proportions_log_or_bf01 (4e14, 1e15, 400000100000000, 1e15, 1.0, &why)
                           - 5.792590217549667), <, TF_TOL_CONVERGED);
  g_assert_cmpfloat (fabs (tf_two_proportions_log_or_bf01 (4, 1e12, 3, 10, 1.0, &why)
                           - -4.499999997751918), <, TF_TOL_CONVERGED);
  /* the relative size of the answer where double precision holds no more: ln BF01 of
   * −1.01e10 (mpmath, as above: −10118779826.78396) */
  assert_rel (tf_two_proportions_log_or_bf01 (5e11, 1e12, 4e11, 1e12, 1e8, &why),
              -10118779826.78396, TF_TOL_DOUBLE);
  /* the prior's scale at its extremes: a flat likelihood on one side (0 of 10) gives
   * BF10 → ½ · its plateau as σ grows; elsewhere BF01 grows like σ (Lindley 1957:
   * BF01 ≈ σ √(2π) / ∫ L dψ), so ln BF01 moves by ln of the ratio of the σ's; as
   * σ → 0 the Bayes factor tends to 1 */
  double flat = tf_two_proportions_log_or_bf01 (0, 10, 7, 10, 1e30, &why);
  g_assert_cmpfloat (fabs (tf_two_proportions_log_or_bf01 (0, 10, 7, 10, 1e140, &why) - flat), <, TF_TOL_CONVERGED);
  g_assert_cmpfloat (fabs (tf_two_proportions_log_or_bf01 (3, 10, 7, 10, 1e149, &why)
                           - tf_two_proportions_log_or_bf01 (3, 10, 7, 10, 1e6, &why)
                           - 143 * G_LN10), <, TF_TOL_CONVERGED);
  /* ln BF01 vanishes like σ² (times the data's squared log odds ratio): below 1e-300
   * at σ = 1e-300, and 1e-270 at σ = 1e-150 */
  g_assert_cmpfloat (fabs (tf_two_proportions_log_or_bf01 (3, 10, 7, 10, 1e-300, &why)), <, 1e-300);
  g_assert_cmpfloat (fabs (tf_two_proportions_log_or_bf01 (3e11, 1e12, 7e11, 1e12, 1e-150, &why)), <, 1e-270);
  why = NULL;
  g_assert_true (isnan (tf_two_proportions_log_or_bf01 (3, 10, 7, 10, 1e300, &why)));
  g_assert_nonnull (why);
  /* a PriorScale of 0 is not defined, and says why */
  why = NULL;
  g_assert_true (isnan (tf_two_proportions_log_or_bf01 (3, 10, 5, 10, 0.0, &why)));
  g_assert_nonnull (why);
}

/* The pooled z of a table (common practice: the score test of θA = θB). */
static double
pooled_z (double ka, double na, double kb, double nb)
{
  double N = na + nb, m = ka + kb;
  return (ka * nb - kb * na) / sqrt (m * (N - m) / N * na * nb);
}

/* The sample-size curve: at the observed total it is the analysis's own BF01 and
 * P(null | data); at every total the table has the observed group shares, pooled
 * proportion and pooled z; at fixed z, BF01 grows like √n (Jeffreys 1939, Lindley
 * 1957: ln BF01 = ½ ln n + O(1)), so the log-log slope tends to ½; finite everywhere. */
static void
test_sample_size (void)
{
  static const double tables[][4] = {
    { 15, 50, 26, 50 }, { 56, 70, 48, 80 }, { 0, 10, 5, 10 }, { 10, 10, 3, 12 },
    { 0, 5, 0, 7 }, { 1, 1, 0, 1 }, { 500000000, 1000000000, 500040000, 1000000000 },
    { 3, 40000, 17, 60000 },
  };
  static const TfDirection dirs[] = { TF_DIRECTION_TWO_SIDED, TF_DIRECTION_GREATER,
                                      TF_DIRECTION_LESS };

  for (guint t = 0; t < G_N_ELEMENTS (tables); t++)
    for (guint d = 0; d < G_N_ELEMENTS (dirs); d++)
      {
        const double *x = tables[t];
        g_autoptr (TfAnalysis) a = two_props (x[0], x[1], x[2], x[3]);
        a->direction = dirs[d];
        a->prior_null = 0.3;
        g_autoptr (TfResults) r = compute (a);
        g_autoptr (TfEvidenceCurve) c = tf_sample_size_curve_new (a, 121, NULL, NULL);
        double N = x[1] + x[3];

        g_assert_nonnull (c);
        g_assert_true (c->x_log);
        assert_rel (c->chosen_x, N, TF_TOL_ULPS);
        assert_rel (c->chosen_log_bf01, log (get (r, "bf01")), TF_TOL_DOUBLE);
        assert_rel (c->chosen_posterior_null, get (r, "posterior_null"), TF_TOL_DOUBLE);
        /* the curve itself passes through the observed table */
        assert_rel (tf_two_proportions_held_log_bf01 (a, N), log (get (r, "bf01")), TF_TOL_DOUBLE);
        for (guint i = 0; i < c->n; i++)
          {
            g_assert_true (isfinite (c->x[i]) && isfinite (c->log_bf01[i]));
            g_assert_true (c->posterior_null[i] >= 0.0 && c->posterior_null[i] <= 1.0);
            if (i > 0)
              g_assert_cmpfloat (c->x[i], >, c->x[i - 1]);
          }
        /* no NaN from a total of 2 to 10^9, wherever the curve starts */
        for (int i = 0; i <= 90; i++)
          g_assert_true (isfinite (tf_two_proportions_held_log_bf01 (a, 2.0 * pow (5e8, i / 90.0))));
        if (dirs[d] == TF_DIRECTION_TWO_SIDED && x[0] + x[2] > 0 && x[0] + x[2] < N)
          assert_rel (c->p_value, get (r, "p_value_z"), TF_TOL_DOUBLE);
      }

  /* √n growth and the held z, for 15/50 against 26/50: the table at T = f N is the
   * observed one shifted by t = (f^{−1/2} − 1)(kA nB − kB nA)/N and scaled by f */
  g_autoptr (TfAnalysis) a = two_props (15, 50, 26, 50);
  double z0 = pooled_z (15, 50, 26, 50);
  for (double T = 1e4; T <= 1e12; T *= 100.0)
    {
      double f = T / 100.0, sh = (1.0 / sqrt (f) - 1.0) * (15.0 * 50 - 26.0 * 50) / 100.0;
      double ka = f * (15 + sh), na = 50 * f, kb = f * (26 - sh), nb = 50 * f;
      assert_rel (pooled_z (ka, na, kb, nb), z0, TF_TOL_CLOSED_FORM);
      assert_rel (tf_two_proportions_held_log_bf01 (a, T),
                  tf_two_proportions_log_bf01 (ka, na, kb, nb, 1, 1), TF_TOL_CLOSED_FORM);
    }
  double l8 = tf_two_proportions_held_log_bf01 (a, 1e8), l9 = tf_two_proportions_held_log_bf01 (a, 1e9);
  double slope = (l9 - l8) / G_LN10;
  g_test_message ("slope 1e8..1e9 %.6f, l8 %.6f l9 %.6f", slope, l8, l9);
  /* ½ is the slope's limit (Lindley 1957), an asymptotic law rather than a computed
   * value: held to 1e-3 at 10^8 and 1e-4 at 10^11 */
  g_assert_cmpfloat (fabs (slope - 0.5), <, 1e-3);
  double l11 = tf_two_proportions_held_log_bf01 (a, 1e11), l12 = tf_two_proportions_held_log_bf01 (a, 1e12);
  g_assert_cmpfloat (fabs ((l12 - l11) / G_LN10 - 0.5), <, 1e-4);
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/two-proportions/worked-example", test_worked_example);
  g_test_add_func ("/two-proportions/one-sided", test_one_sided);
  g_test_add_func ("/two-proportions/zero-cells", test_zero_cells);
  g_test_add_func ("/two-proportions/extremes", test_extremes);
  g_test_add_func ("/two-proportions/validation", test_validation);
  g_test_add_func ("/two-proportions/hypergeometric", test_hypergeometric);
  g_test_add_func ("/two-proportions/curves", test_curves);
  g_test_add_func ("/two-proportions/sample-size", test_sample_size);
  g_test_add_func ("/two-proportions/log-odds-ratio", test_log_or_bf);
  return g_test_run ();
}
