/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-one-proportion.c: the one-proportion design, from n = 1 to n = 10^12.
 *
 * Reference values: scipy 1.10.1 and mpmath 1.2.1 at mp.dps = 40 (Debian 12), with the
 * call beside each; published examples where named.
 */
#include <math.h>
#include <string.h>
#include <glib.h>

#include "tf-design.h"
#include "tf-analysis.h"
#include "tf-results.h"
#include "tf-curves.h"
#include "tf-one-proportion.h"
#include "tf-one-proportion-private.h"
#include "tf-analysis-file.h"
#include "tf-diagnostic.h"
#include "tf-proportion-intervals.h"
#include "tf-check.h"

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
  assert_all_finite (r);
  return r;
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
  assert_rel (get (r, "p_value"), 0.0003016723533419885, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "p_value_exact"), 0.0003016723533419885, TF_TOL_CLOSED_FORM);
  assert_rel (log (get (r, "bf01")), 2.47616518818065604817, TF_TOL_DOUBLE);
  /* BF01 is e^2.48 of that log: its error, and P(null)'s, 2.5 times the log's: 1e-11 */
  assert_rel (get (r, "bf01"), 11.89555960660720094, 1e-11);
  assert_rel (get (r, "bf10") * get (r, "bf01"), 1.0, TF_TOL_ROUNDING);
  /* Savage–Dickey agrees with bf01 (Dickey 1971); 1e-10: the two come by different
   * routes (the two densities at θ0, against a ratio of beta functions) */
  assert_rel (get (r, "savage_dickey_bf01"), get (r, "bf01"), 1e-10);
  /* posterior_null = BF01 / (1 + BF01) at π0 = ½ */
  assert_rel (get (r, "posterior_null"), 11.89555960660720094 / 12.89555960660720094, 1e-11);  /* as BF01 */
  assert_rel (get (r, "posterior_null") + get (r, "posterior_alt"), 1.0, TF_TOL_ULPS);
}

static void
test_small (void)
{
  g_autoptr (TfAnalysis) an = make (7, 20, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r = compute (an);
  assert_rel (get (r, "estimate"), 0.35, TF_TOL_ULPS);
  /* scipy.stats.binomtest(7, 20, 0.5).pvalue */
  assert_rel (get (r, "p_value"), 0.26317596435546875, TF_TOL_SERIES);
  /* mid-p (Lancaster 1961): 0.26317596435546875 − ½ binom.pmf(7, 20, 0.5) (scipy) */
  assert_rel (get (r, "p_value_midp"), 0.26317596435546875 - 0.5 * 0.07392883300781250, TF_TOL_DOUBLE);
  /* score: z = (7 − 10)/√5; 2 norm.sf(3/√5) (scipy) */
  assert_rel (get (r, "z"), -3.0 / sqrt (5.0), TF_TOL_ULPS);
  assert_rel (get (r, "p_value_score"), 0.17971249487899976, TF_TOL_DOUBLE);
  /* binomtest(7, 20).proportion_ci(0.95, 'exact') (scipy) */
  assert_rel (get (r, "ci_low"), 0.1539092047845412, TF_TOL_DOUBLE);
  assert_rel (get (r, "ci_high"), 0.5921885345328283, TF_TOL_DOUBLE);
  /* mpmath: 20 ln ½ − ln B(8, 14) = 0.43987007308916465 (BF01 = 1.5525054931640625) */
  assert_rel (get (r, "bf01"), 1.5525054931640625, TF_TOL_SERIES);
  assert_rel (get (r, "savage_dickey_bf01"), get (r, "bf01"), 1e-10);    /* as above */
  /* scipy.stats.beta.ppf(0.025, 8, 14), isf(0.025, 8, 14), median(8, 14) */
  assert_rel (get (r, "cri_low"), 0.18107162554017314, TF_TOL_DOUBLE);
  assert_rel (get (r, "cri_high"), 0.5696754829041243, TF_TOL_DOUBLE);
  assert_rel (get (r, "posterior_median"), 0.3594342666462473, TF_TOL_DOUBLE);
  assert_rel (get (r, "posterior_mean"), 8.0 / 22.0, TF_TOL_ULPS);
  /* Sellke, Bayarri & Berger (2001): −e p ln p */
  double p = 0.26317596435546875;
  assert_rel (get (r, "min_bf01"), -exp (1.0) * p * log (p), TF_TOL_DOUBLE);
  g_assert_cmpfloat (get (r, "min_bf01_lr"), <=, get (r, "bf01"));

  /* one-sided: scipy.stats.binomtest(7, 20, 0.5, alternative='less'/'greater') */
  g_autoptr (TfAnalysis) less = make (7, 20, 0.5, 1, 1, TF_DIRECTION_LESS);
  g_autoptr (TfResults) rl = compute (less);
  assert_rel (get (rl, "p_value"), 0.13158798217773438, TF_TOL_SERIES);
  g_autoptr (TfAnalysis) greater = make (7, 20, 0.5, 1, 1, TF_DIRECTION_GREATER);
  g_autoptr (TfResults) rg = compute (greater);
  assert_rel (get (rg, "p_value"), 0.9423408508300781, TF_TOL_SERIES);
  /* a truncated posterior lies on its side */
  g_assert_cmpfloat (get (rg, "cri_low"), >=, 0.5);
  g_assert_cmpfloat (get (rl, "cri_high"), <=, 0.5);
  /* BF10 of the two halves average to the two-sided BF10 under a symmetric prior
   * (common practice: the prior mass splits ½, ½) */
  assert_rel (0.5 * (get (rl, "bf10") + get (rg, "bf10")), get (r, "bf10"), TF_TOL_DOUBLE);
}

static void
test_edges (void)
{
  /* n = 1, k = 0, uniform prior: BF01 = ½ / B(1, 2) · ... = 1 exactly (mpmath:
   * ln ½ − ln B(1, 2) = 0); exact p = 1 (scipy binomtest(0, 1, 0.5)); CP hi = 0.975 */
  g_autoptr (TfAnalysis) a1 = make (0, 1, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r1 = compute (a1);
  assert_rel (get (r1, "bf01"), 1.0, TF_TOL_ROUNDING);
  assert_rel (get (r1, "p_value"), 1.0, TF_TOL_ULPS);
  g_assert_cmpfloat (get (r1, "ci_low"), ==, TF_TOL_EXACT);
  assert_rel (get (r1, "ci_high"), 0.975, TF_TOL_ROUNDING);
  assert_rel (get (r1, "min_bf01"), 1.0, TF_TOL_EXACT);

  /* k = n = 10, θ0 = 1e-6, a = b = 0.01: mpmath 10 ln 1e-6 + ln B(.01, .01)
   * − ln B(10.01, .01) = −137.43389692973507 */
  g_autoptr (TfAnalysis) a2 = make (10, 10, 1e-6, 0.01, 0.01, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r2 = compute (a2);
  assert_rel (log (get (r2, "bf01")), -137.43389692973507034, TF_TOL_DOUBLE);
  /* posterior_null = BF01 / (1 + BF01) ≈ BF01, kept to full relative precision */
  assert_rel (get (r2, "posterior_null"), exp (-137.43389692973507034), TF_TOL_DOUBLE);
  g_assert_cmpfloat (get (r2, "ci_high"), ==, 1.0);

  /* n = 1e12, k near nθ0: mpmath n ln ½ − ln B(k + 1, n − k + 1) = 5.5897192053069633;
   * 1e-10: a difference of terms of 7e11 (kept in Loader's form, Savage–Dickey's too),
   * and P(alt) from it */
  g_autoptr (TfAnalysis) a3 = make (5e11 + 2e6, 1e12, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r3 = compute (a3);
  assert_rel (log (get (r3, "bf01")), 5.589719205306963338, 1e-10);
  assert_rel (get (r3, "savage_dickey_bf01"), get (r3, "bf01"), 1e-10);
  /* posterior_alt on its own side: 1 / (1 + BF01) */
  assert_rel (get (r3, "posterior_alt"), 1.0 / (1.0 + exp (5.589719205306963338)), 1e-10);

  /* n = 1e12, k far from nθ0: ln BF01 = −20135513537.078743 (mpmath) underflows; the
   * results say so and never carry NaN or inf */
  g_assert_cmpfloat (fabs (tf_one_proportion_log_bf01 (6e11, 1e12, 0.5, 1, 1)
                           - -20135513537.07874321793), <=, 1e-4);   /* 5e-15 relative */
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
  iv->null_low = 0.0;
  iv->null_high = 1.0;
  tf_one_proportion_validate (iv, p);
  g_assert_null (tf_problem_list_find (p, "Null", "Kind"));
  g_assert_nonnull (tf_problem_list_find (p, "Null", "Low"));
  g_assert_nonnull (tf_problem_list_find (p, "Null", "High"));
  g_assert_nonnull (tf_problem_list_find (p, "Alternative", "Prior"));

  /* Low must be below High */
  g_ptr_array_set_size (p, 0);
  iv->prior = TF_PRIOR_BETA;
  iv->null_low = 0.6;
  iv->null_high = 0.4;
  tf_one_proportion_validate (iv, p);
  g_assert_cmpuint (p->len, ==, 1);
  g_assert_nonnull (strstr (((TfProblem *) p->pdata[0])->message, "above its lower end"));
  g_ptr_array_set_size (p, 0);
  iv->null_low = 0.4;
  iv->null_high = 0.6;
  tf_one_proportion_validate (iv, p);
  g_assert_cmpuint (p->len, ==, 0);
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
  assert_rel (c->posterior_at_null / c->prior_at_null, 1.5525054931640625, TF_TOL_DOUBLE);
  g_assert_false (c->posterior_narrow);
  g_assert_cmpstr (c->parameter_markup, ==, "θ");

  g_autoptr (TfAnalysis) big = make (5e11, 1e12, 0.3, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfDensityCurves) cb = tf_density_curves_new (big, 101, NULL);
  g_assert_nonnull (cb);
  g_assert_true (cb->posterior_narrow);
  for (guint i = 0; i < cb->n; i++)
    g_assert_true (isfinite (cb->posterior[i]) && cb->posterior[i] >= 0.0);
}

/* The tests in every direction at k = 7, n = 20, θ0 = 0.5 (references: scipy 1.10.1,
 * the calls beside each; tolerance 1e-9 relative, closed forms and exact sums). */
static void
test_p_values (void)
{
  g_autoptr (TfAnalysis) an = make (7, 20, 0.5, 2, 3, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r = compute (an);
  assert_rel (get (r, "p_value_central"), 0.26317596435546875, TF_TOL_DOUBLE); /* 2*binom.cdf(7,20,.5) */
  assert_rel (get (r, "p_value_exact"), 0.26317596435546875, TF_TOL_DOUBLE);   /* binomtest(7,20).pvalue */
  assert_rel (get (r, "p_value_score_cc"), 0.2635524772829727, TF_TOL_CLOSED_FORM);  /* 2*norm.sf(2.5/sqrt(5)) */
  assert_rel (get (r, "p_value_lr"), 0.1763613958394882, TF_TOL_CLOSED_FORM);        /* chi2.sf(G, 1) */
  an->direction = TF_DIRECTION_GREATER;
  g_autoptr (TfResults) g = compute (an);
  assert_rel (get (g, "p_value_exact"), 0.9423408508300781, TF_TOL_DOUBLE);    /* binom.sf(6,20,.5) */
  assert_rel (get (g, "p_value_central"), 0.9423408508300781, TF_TOL_DOUBLE);
  assert_rel (get (g, "p_value_midp"), 0.9053764343261719, TF_TOL_DOUBLE);     /* sf(7) + pmf(7)/2 */
  assert_rel (get (g, "p_value_score"), 0.9101437525605001, TF_TOL_CLOSED_FORM);     /* norm.sf(-3/sqrt(5)) */
  assert_rel (get (g, "p_value_score_cc"), 0.9412375659516804, TF_TOL_CLOSED_FORM);  /* norm.sf(-3.5/sqrt(5)) */
  an->direction = TF_DIRECTION_LESS;
  g_autoptr (TfResults) l = compute (an);
  assert_rel (get (l, "p_value_exact"), 0.13158798217773438, TF_TOL_DOUBLE);   /* binom.cdf(7,20,.5) */
  assert_rel (get (l, "p_value_score_cc"), 0.13177623864148635, TF_TOL_CLOSED_FORM); /* norm.cdf(-2.5/sqrt(5)) */
  assert_rel (get (l, "p_value_lr"), 0.08818069791974609, TF_TOL_CLOSED_FORM);       /* norm.cdf(-sqrt(G)) */
  g_assert_false (tf_results_get (l, "hdi_low", NULL));
}

/* Intervals at 95%: k = 7, n = 20 against scipy 1.10.1
 * binomtest(7, 20).proportion_ci(method=...) and beta.ppf; k = 3, n = 10^12 against
 * the closed forms at mp.dps = 40 (mpmath 1.2.1); tolerance 1e-9 (1e-7 for quantiles). */
static void
test_intervals (void)
{
  g_autoptr (TfAnalysis) an = make (7, 20, 0.5, 2, 3, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r = compute (an);
  assert_rel (get (r, "wilson_low"), 0.1811918241010821, TF_TOL_CLOSED_FORM);        /* method='wilson' */
  assert_rel (get (r, "wilson_high"), 0.5671457233147637, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "wilson_cc_low"), 0.1630866797163093, TF_TOL_CLOSED_FORM);     /* method='wilsoncc' */
  assert_rel (get (r, "wilson_cc_high"), 0.5905104338485733, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "jeffreys_low"), 0.17227621363191212, TF_TOL_ITERATIVE);     /* beta.ppf(.025, 7.5, 13.5) */
  assert_rel (get (r, "jeffreys_high"), 0.5677660938414961, TF_TOL_ITERATIVE);
  assert_rel (get (r, "agresti_coull_low"), 0.17992636143822802, TF_TOL_CLOSED_FORM); /* closed form, numpy */
  assert_rel (get (r, "agresti_coull_high"), 0.5684111859776177, TF_TOL_CLOSED_FORM);
  /* HDI of Beta(9, 16): brentq on u of logpdf(ppf(u)) = logpdf(ppf(u + .95)), scipy */
  assert_rel (get (r, "hdi_low"), 0.18103990144251977, TF_TOL_CONVERGED);
  assert_rel (get (r, "hdi_high"), 0.5450261102591977, TF_TOL_CONVERGED);
  assert_rel (get (r, "posterior_mode"), 8.0 / 23.0, TF_TOL_ULPS);           /* (P − 1)/(S − 2) */
  /* P just above 1: the lower end below 1e-300 is 0, the upper one the upper 5% point,
   * scipy 1.10.1 beta.isf(0.05, 1.000001, 2); and the mirror image */
  double hl, hh;
  g_assert_true (tf_beta_hdi (1.000001, 2, 0.95, &hl, &hh));
  g_assert_cmpfloat (hl, ==, 0.0);
  assert_rel (hh, 0.7763933516965706, TF_TOL_CONVERGED);
  g_assert_true (tf_beta_hdi (2, 1.000001, 0.95, &hl, &hh));
  assert_rel (hl, 1.0 - 0.7763933516965706, TF_TOL_CONVERGED);
  g_assert_false (tf_beta_hdi (0.5, 0.5, 0.95, &hl, &hh));               /* U-shaped */
  /* HDI of Beta(413, 589) and Beta(400001000001, 599999000001) (the benchmark's data,
   * uniform prior): mpmath 1.2.1 at mp.dps = 40, findroot on the lower end of the
   * mp.quad mass between it and its equal-density mirror; 1e-15 (a thousandth of the
   * interval's width at n = 1e12 would be 5e-9 relative) */
  static const double hdi_want[2][4] = {
    { 412, 1000, 0.38177009233053723269, 0.44267945322531773485 },
    { 400001000000, 1e12, 0.40000003981752075135, 0.40000196018299143803 },
  };
  for (guint i = 0; i < 2; i++)
    {
      g_autoptr (TfAnalysis) h = make (hdi_want[i][0], hdi_want[i][1], 0.4, 1, 1,
                                       TF_DIRECTION_TWO_SIDED);
      g_autoptr (TfResults) hr = compute (h);
      assert_rel (get (hr, "hdi_low"), hdi_want[i][2], TF_TOL_ULPS);
      assert_rel (get (hr, "hdi_high"), hdi_want[i][3], TF_TOL_ULPS);
    }

  g_autoptr (TfAnalysis) big = make (3, 1e12, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) b = compute (big);
  assert_rel (get (b, "wilson_low"), 1.0202707283648331e-12, TF_TOL_CLOSED_FORM);
  assert_rel (get (b, "wilson_high"), 8.8211880922914858e-12, TF_TOL_CLOSED_FORM);
  assert_rel (get (b, "wilson_cc_low"), 7.747935195907288e-13, TF_TOL_CLOSED_FORM);
  assert_rel (get (b, "wilson_cc_high"), 9.5600901508298868e-12, TF_TOL_CLOSED_FORM);
  assert_rel (get (b, "agresti_coull_low"), 5.7299673715372931e-13, TF_TOL_CLOSED_FORM);
  assert_rel (get (b, "agresti_coull_high"), 9.2684620835025896e-12, TF_TOL_CLOSED_FORM);
  assert_rel (get (b, "jeffreys_low"), 8.449345903393768e-13, TF_TOL_ITERATIVE);   /* beta.ppf(.025, 3.5, 1e12 - 2.5) */
  assert_rel (get (b, "jeffreys_high"), 8.00638213729262e-12, TF_TOL_ITERATIVE);
  big->successes = 1e12 - 3e5;
  g_autoptr (TfResults) c = compute (big);
  assert_rel (get (c, "agresti_coull_low"), 0.99999969892455951, TF_TOL_DOUBLE);
  assert_rel (get (c, "agresti_coull_high"), 0.99999970107159903, TF_TOL_DOUBLE);
  /* the boundary rules at k = 0 and k = n */
  big->successes = 0;
  g_autoptr (TfResults) z = compute (big);
  g_assert_cmpfloat (get (z, "jeffreys_low"), ==, 0.0);
  g_assert_cmpfloat (get (z, "wilson_cc_low"), ==, 0.0);
  g_assert_cmpfloat (get (z, "hdi_low"), ==, 0.0);                      /* density falls from 0 */
  big->successes = 1e12;
  g_autoptr (TfResults) f = compute (big);
  g_assert_cmpfloat (get (f, "jeffreys_high"), ==, 1.0);
  g_assert_cmpfloat (get (f, "wilson_high"), ==, 1.0);
}

/* Interval null [0.4, 0.6], k = 7, n = 20, Beta(2, 3): BF01 from mpmath 1.2.1
 * betainc at mp.dps = 40; p-values from scipy 1.10.1 binom; tolerance 1e-9. */
static void
test_interval_null (void)
{
  g_autoptr (TfAnalysis) an = make (7, 20, 0.5, 2, 3, TF_DIRECTION_TWO_SIDED);
  an->null_kind = TF_NULL_INTERVAL;
  an->null_low = 0.4;
  an->null_high = 0.6;
  g_autoptr (TfResults) r = compute (an);
  assert_rel (get (r, "bf01"), 1.1213598844919479, TF_TOL_CLOSED_FORM);
  /* min(1, 2 min(binom.sf(6, 20, .6), binom.cdf(7, 20, .4))) */
  assert_rel (get (r, "p_value"), 0.8317858751150711, TF_TOL_CLOSED_FORM);
  /* max(binom.sf(6, 20, .4), binom.cdf(7, 20, .6)) */
  assert_rel (get (r, "p_value_equivalence"), 0.7499893280621777, TF_TOL_CLOSED_FORM);
  g_assert_false (tf_results_get (r, "savage_dickey_bf01", NULL));
  an->direction = TF_DIRECTION_GREATER;
  g_autoptr (TfResults) g = compute (an);
  assert_rel (get (g, "bf01"), 25.830331485055838, TF_TOL_CLOSED_FORM);
  assert_rel (get (g, "p_value"), 0.993534124647965, TF_TOL_CLOSED_FORM);           /* binom.sf(6, 20, .6) */
}

/* Set = null;less;greater, Priors = 0.5;0.25;0.25, k = 7, n = 20, θ0 = 0.5, Beta(2, 3):
 * the marginal likelihoods by mpmath 1.2.1 quad at mp.dps = 40; tolerance 1e-9. */
static void
test_models (void)
{
  static const char file[] =
    "[Analysis]\nFormat=1\nDesign=one-proportion\n[Data]\nSuccesses=7\nTrials=20\n"
    "[Null]\nValue=0.5\n[Alternative]\nPriorA=2\nPriorB=3\n"
    "[Models]\nSet=null;less;greater\nPriors=0.5;0.25;0.25\n";
  g_autoptr (GPtrArray) p = tf_problem_list_new ();
  g_autoptr (TfAnalysis) an = tf_analysis_load_from_data (file, sizeof file - 1, p);
  g_assert_nonnull (an);
  g_assert_cmpuint (an->n_models, ==, 3);
  g_autoptr (TfResults) r = compute (an);
  assert_rel (get (r, "posterior_model_null"), 0.54100923060799644, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "posterior_model_less"), 0.38883558272783283, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "posterior_model_greater"), 0.070155186664170724, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "bf_null_less"), 0.69567865524626925, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "bf_null_greater"), 3.8558035145553803, TF_TOL_CLOSED_FORM);
  assert_rel (get (r, "bf_less_greater"), 5.5425065660386423, TF_TOL_CLOSED_FORM);
  g_autoptr (TfModelProbabilities) m = tf_model_probabilities_new (an, NULL, NULL, NULL);
  g_assert_cmpuint (m->n, ==, 3);
  assert_rel (m->posterior[0], 0.54100923060799644, TF_TOL_CLOSED_FORM);
  g_assert_cmpstr (m->names_markup[1], ==, "θ &lt; 0.5");

  /* round trip */
  g_autofree char *text = tf_analysis_to_data (an, NULL);
  g_assert_nonnull (strstr (text, "Set=null;less;greater"));
  g_assert_nonnull (strstr (text, "Priors=0.5;0.25;0.25"));

  /* bad keys: each a problem naming its key, nothing renormalised */
  static const char *const bad[][3] = {
    { "Set=null;less;greater\nPriors=0.5;0.3;0.3\n", "Priors", "sum to 1 (they sum to 1.1)" },
    { "Set=null;lower\n", "Set", "“lower” is not a model" },
    { "Set=null;less\nPriors=0.5\n", "Priors", "1 values for the 2" },
    { "Set=null;null\n", "Set", "listed twice" },
    { "Set=null;less\nPriors=1;0\n", "Priors", "strictly between 0 and 1" },
    { "Priors=0.5;0.5\n", "Priors", "name the models in Set" },
  };
  for (guint i = 0; i < G_N_ELEMENTS (bad); i++)
    {
      g_autofree char *data = g_strconcat ("[Analysis]\nFormat=1\nDesign=one-proportion\n[Data]\n"
                                           "Successes=7\nTrials=20\n[Null]\nValue=0.5\n[Models]\n",
                                           bad[i][0], NULL);
      g_autoptr (GPtrArray) q = tf_problem_list_new ();
      g_autoptr (TfAnalysis) b = tf_analysis_load_from_data (data, strlen (data), q);
      g_assert_null (b);
      const TfProblem *pr = tf_problem_list_find (q, "Models", bad[i][1]);
      g_assert_nonnull (pr);
      if (strstr (pr->message, bad[i][2]) == NULL)
        g_error ("case %u: %s", i, pr->message);
    }

  /* without Set, the two models of the null and the alternative */
  g_autoptr (TfAnalysis) two = make (7, 20, 0.5, 2, 3, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) t = compute (two);
  g_assert_null (tf_results_lookup (t, "posterior_model_null"));
  g_autoptr (TfModelProbabilities) m2 = tf_model_probabilities_new (two, NULL, NULL, NULL);
  g_assert_cmpuint (m2->n, ==, 2);
  assert_rel (m2->posterior[0], get (t, "posterior_null"), TF_TOL_DOUBLE);
}

/* The hook itself (tf-design.c does not register it yet: see tf-design.c). */
static TfNullDistribution *
null_distribution (const TfAnalysis *an)
{
  TfNullDistribution *d = g_new0 (TfNullDistribution, 1);
  char *why = NULL;
  g_assert_true (tf_one_proportion_null_distribution (an, d, &why));
  g_assert_null (why);
  return d;
}

static void
test_curves (void)
{
  g_autoptr (TfAnalysis) an = make (7, 20, 0.5, 2, 3, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r = compute (an);

  /* sensitivity: x = a + b with a/(a + b) = 0.4 held, against the exact function */
  g_autoptr (TfEvidenceCurve) s = tf_sensitivity_curve_new (an, 256, NULL, NULL);
  g_assert_nonnull (s);
  g_assert_true (s->x_log);
  assert_rel (s->x[0], 1e-2, TF_TOL_DOUBLE);
  assert_rel (s->x[255], 1e4, TF_TOL_DOUBLE);
  assert_rel (s->chosen_x, 5.0, TF_TOL_EXACT);
  assert_rel (exp (s->chosen_log_bf01), get (r, "bf01"), TF_TOL_DOUBLE);
  for (guint i = 0; i < 256; i += 51)
    assert_rel (s->log_bf01[i],
                tf_one_proportion_log_bf01 (7, 20, 0.5, 0.4 * s->x[i], 0.6 * s->x[i]), TF_TOL_DOUBLE);
  /* a + b = 100: mpmath 1.2.1 at dps 40, ln[θ0^7 (1−θ0)^13 B(40, 60) / B(47, 73)] */
  assert_rel (tf_one_proportion_log_bf01 (7, 20, 0.5, 40, 60), -0.73762821763585317, TF_TOL_CLOSED_FORM);

  /* sample size: the p-value held, BF01 grows like √n (ln BF01 by ½ ln 100 per two
   * decades, within 1e-3 at n = 10^10..10^12) */
  g_autoptr (TfEvidenceCurve) n = tf_sample_size_curve_new (an, 241, NULL, NULL);
  g_assert_nonnull (n);
  assert_rel (n->p_value, get (r, "p_value_score"), TF_TOL_DOUBLE);
  /* through the observed point: the score statistic held, the counts at the observed
   * n are the observed ones, so the curve, interpolated in ln n through three of its
   * grid points (0.05 decades apart; quadratic), meets the analysis's own ln BF01 there
   * (within 1e-4: the quadratic's own error at n = 20 is about 1e-5) */
  assert_rel (exp (n->chosen_log_bf01), get (r, "bf01"), TF_TOL_DOUBLE);
  for (guint i = 1; i + 1 < n->n; i++)
    if (n->x[i] <= 20.0 && n->x[i + 1] > 20.0)
      {
        double u = log (20.0), x0 = log (n->x[i - 1]), x1 = log (n->x[i]), x2 = log (n->x[i + 1]);
        double at = n->log_bf01[i - 1] * (u - x1) * (u - x2) / ((x0 - x1) * (x0 - x2))
                    + n->log_bf01[i] * (u - x0) * (u - x2) / ((x1 - x0) * (x1 - x2))
                    + n->log_bf01[i + 1] * (u - x0) * (u - x1) / ((x2 - x0) * (x2 - x1));
        g_assert_cmpfloat (fabs (at - log (get (r, "bf01"))), <, 1e-4);
      }
  assert_rel (n->x[240], 1e12, TF_TOL_DOUBLE);
  {
    guint j = 0;  /* the grid point nearest 10^10 (the grid starts where p can be held) */
    for (guint i = 0; i < n->n; i++)
      if (fabs (log (n->x[i] / 1e10)) < fabs (log (n->x[j] / 1e10)))
        j = i;
    g_assert_cmpfloat (fabs (n->log_bf01[240] - n->log_bf01[j] - 0.5 * log (1e12 / n->x[j])), <, 1e-3);
  }
  g_assert_cmpfloat (n->x[0], >=, 1.0);
  g_assert_cmpfloat (n->chosen_x, ==, 20.0);

  /* null distribution: the masses sum to 1 and the tail to the p-value (n = 20) */
  g_autoptr (TfNullDistribution) d = null_distribution (an);
  double sum = 0.0, tail = 0.0;
  for (guint i = 0; i < d->n; i++)
    {
      sum += d->mass[i];
      tail += d->in_tail[i] ? d->mass[i] : 0.0;
    }
  assert_rel (sum, 1.0, TF_TOL_DOUBLE);
  assert_rel (tail, get (r, "p_value"), TF_TOL_DOUBLE);
  g_assert_cmpfloat (d->observed, ==, 7.0);
  /* n = 10^12: thinned to at most 2000 points */
  g_autoptr (TfAnalysis) big = make (5e11 + 2e6, 1e12, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfNullDistribution) db = null_distribution (big);
  g_assert_cmpuint (db->n, <=, 2001);
  g_assert_nonnull (strstr (db->x_markup, "every"));
  /* interval nulls have no sample-size curve, with a reason */
  an->null_kind = TF_NULL_INTERVAL;
  an->null_low = 0.4;
  an->null_high = 0.6;
  g_autofree char *why = NULL;
  g_assert_null (tf_sample_size_curve_new (an, 16, NULL, &why));
  g_assert_nonnull (why);
}

/* Lindley's paradox (Lindley 1957): n = 10^6, k − nθ0 = 2.6 SD: p ≈ 0.009 while
 * P(null | data) > ½ under Beta(1, 1). */
static void
test_diagnostic (void)
{
  g_autoptr (TfAnalysis) an = make (501300, 1e6, 0.5, 1, 1, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r = compute (an);
  g_assert_cmpfloat (get (r, "p_value"), <, 0.05);
  g_assert_cmpfloat (get (r, "posterior_null"), >, 0.5);
  g_autofree char *text = tf_diagnostic_text (an, r);
  g_assert_nonnull (text);
  g_assert_nonnull (strstr (text, "The sample is large"));
  g_assert_nonnull (strstr (text, "The effect is small"));
  g_assert_nonnull (strstr (text, "The null is precise"));
  g_assert_nonnull (strstr (text, "The prior is diffuse"));
  g_assert_nonnull (strstr (text, "near 1"));
  g_autoptr (TfAnalysis) ok = make (10, 20, 0.5, 2, 3, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r2 = compute (ok);
  g_assert_null (tf_diagnostic_text (ok, r2));
  /* the reverse: p >= α, yet P(null | data) < ½ (k = 7, n = 20, Beta(2, 3)) */
  g_autoptr (TfAnalysis) rev = make (7, 20, 0.5, 2, 3, TF_DIRECTION_TWO_SIDED);
  g_autoptr (TfResults) r3 = compute (rev);
  g_autofree char *text3 = tf_diagnostic_text (rev, r3);
  g_assert_nonnull (strstr (text3, "is not below"));
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/one-proportion/jefferys-1990", test_jefferys);
  g_test_add_func ("/one-proportion/small", test_small);
  g_test_add_func ("/one-proportion/edges", test_edges);
  g_test_add_func ("/one-proportion/validate", test_validate);
  g_test_add_func ("/one-proportion/densities", test_densities);
  g_test_add_func ("/one-proportion/p-values", test_p_values);
  g_test_add_func ("/one-proportion/intervals", test_intervals);
  g_test_add_func ("/one-proportion/interval-null", test_interval_null);
  g_test_add_func ("/one-proportion/models", test_models);
  g_test_add_func ("/one-proportion/curves", test_curves);
  g_test_add_func ("/one-proportion/diagnostic", test_diagnostic);
  return g_test_run ();
}
