/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-proportion.c: k successes in n trials against θ = θ0, classical and Bayesian.
 */
#include "tf-one-proportion.h"
#include "tf-curves.h"
#include "tf-binomial.h"
#include "tf-incbeta.h"
#include "tf-incbeta-private.h"
#include "tf-evidence.h"
#include "tf-logspace.h"
#include "tf-one-proportion-private.h"
#include "tf-proportion-intervals.h"

#include <math.h>
#include <float.h>
#include <glib/gi18n-lib.h>

static gboolean
is_whole (double v)
{
  return isfinite (v) && v == floor (v);
}

/* [Models] Set and Priors: distinct models, priors in (0, 1) summing to 1. */
static void
validate_models (const TfAnalysis *an, GPtrArray *problems)
{
  double sum = 0.0;
  gboolean each_ok = TRUE;

  if (an->n_models == 0)
    return;
  for (guint i = 0; i < an->n_models; i++)
    for (guint j = 0; j < i; j++)
      if (an->models[i] == an->models[j])
        {
          g_ptr_array_add (problems,
                           tf_problem_new ("Models", "Set",
                                           _("The model “%s” is listed twice in Set."),
                                           tf_model_to_string (an->models[i])));
          return;
        }
  if (an->n_models < 2)
    g_ptr_array_add (problems,
                     tf_problem_new ("Models", "Set",
                                     _("A model set needs at least two models (it has %u)."),
                                     an->n_models));
  for (guint i = 0; i < an->n_models; i++)
    {
      double p = an->model_priors[i];
      sum += p;
      if (!(p > 0.0 && p < 1.0) && each_ok)
        {
          g_ptr_array_add (problems,
                           tf_problem_new ("Models", "Priors",
                                           _("Each prior model probability in Priors must lie strictly between 0 and 1 (item %u is %g)."),
                                           i + 1, p));
          each_ok = FALSE;
        }
    }
  if (each_ok && fabs (sum - 1.0) > 1e-9)
    g_ptr_array_add (problems,
                     tf_problem_new ("Models", "Priors",
                                     _("The prior model probabilities in Priors must sum to 1 (they sum to %.12g); Twofold does not rescale them."),
                                     sum));
}

void
tf_one_proportion_validate (const TfAnalysis *analysis, GPtrArray *problems)
{
  double n = analysis->trials, k = analysis->successes;
  gboolean n_ok = is_whole (n) && n >= 1.0 && n <= TF_ANALYSIS_MAX_TRIALS;

  if (!n_ok)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", "Trials",
                                     _("Trials (N) must be a whole number from 1 to 10^15 (it is %g)."),
                                     n));
  if (!is_whole (k) || k < 0.0)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", "Successes",
                                     _("Successes (K) must be a whole number of at least 0 (it is %g)."),
                                     k));
  else if (n_ok && k > n)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", "Successes",
                                     _("Successes (K) cannot exceed Trials (N): K is %.17g and N is %.17g."),
                                     k, n));

  if (analysis->null_kind == TF_NULL_INTERVAL)
    {
      gboolean lo_ok = analysis->null_low > 0.0 && analysis->null_low < 1.0;
      gboolean hi_ok = analysis->null_high > 0.0 && analysis->null_high < 1.0;
      if (!lo_ok)
        g_ptr_array_add (problems,
                         tf_problem_new ("Null", "Low",
                                         _("The lower end of the null interval (Low) must lie strictly between 0 and 1 (it is %g)."),
                                         analysis->null_low));
      if (!hi_ok)
        g_ptr_array_add (problems,
                         tf_problem_new ("Null", "High",
                                         _("The upper end of the null interval (High) must lie strictly between 0 and 1 (it is %g)."),
                                         analysis->null_high));
      else if (lo_ok && !(analysis->null_low < analysis->null_high))
        g_ptr_array_add (problems,
                         tf_problem_new ("Null", "High",
                                         _("The upper end of the null interval (High, %g) must be above its lower end (Low, %g)."),
                                         analysis->null_high, analysis->null_low));
    }
  else if (!(analysis->null_value > 0.0 && analysis->null_value < 1.0))
    g_ptr_array_add (problems,
                     tf_problem_new ("Null", "Value",
                                     _("The null proportion (Value) must lie strictly between 0 and 1 (it is %g)."),
                                     analysis->null_value));

  tf_analysis_validate_beta_prior (analysis, _("one proportion"), problems);
  validate_models (analysis, problems);
}

/* A quantile u of the posterior Beta(P, Q) truncated to θ > θ0 (greater), θ < θ0
 * (less), or not truncated (two-sided), through the log-space inverse. */
static double
posterior_quantile (TfIncbetaShape *post, double u, double theta0, TfDirection direction)
{
  double l0, u0;

  switch (direction)
    {
    case TF_DIRECTION_GREATER:
      tf_incbeta_shape_log_both (post, theta0, 1.0 - theta0, &l0, &u0, NULL);
      return tf_incbeta_shape_inverse_log (post, log1p (-u) + u0, FALSE);
    case TF_DIRECTION_LESS:
      tf_incbeta_shape_log_both (post, theta0, 1.0 - theta0, &l0, &u0, NULL);
      return tf_incbeta_shape_inverse_log (post, log (u) + l0, TRUE);
    case TF_DIRECTION_TWO_SIDED:
    default:
      return u <= 0.5 ? tf_incbeta_shape_inverse_log (post, log (u), TRUE)
                      : tf_incbeta_shape_inverse_log (post, log1p (-u), FALSE);
    }
}

/* Mean of Beta(P, Q), truncated as above: P/S · (tail of Beta(P + 1, Q)) / (tail of
 * Beta(P, Q)) at θ0 (Johnson, Kotz & Balakrishnan 1995, §25.7). */
static double
posterior_mean (double P, double Q, double theta0, TfDirection direction)
{
  double mean = P / (P + Q);
  double l1, u1, l0, u0;

  if (direction == TF_DIRECTION_TWO_SIDED)
    return mean;
  tf_incbeta_log_both (theta0, 1.0 - theta0, P + 1.0, Q, &l1, &u1);
  tf_incbeta_log_both (theta0, 1.0 - theta0, P, Q, &l0, &u0);
  if (direction == TF_DIRECTION_GREATER)
    return mean * exp (u1 - u0);
  return mean * exp (l1 - l0);
}

/* The tests of the analysis's null in its direction. A point null: the tests of
 * θ = θ0. An interval null [L, H]: against θ > H the one-sided tests at H, against
 * θ < L those at L (the ends are the least favourable points of the null, the
 * binomial having a monotone likelihood ratio, Lehmann & Romano 2005, §3.4); against
 * both sides, each one-sided test at each end at half the level: twice the smaller
 * one-sided p-value, at most 1 (Bonferroni's union of the two one-sided tests). */
static void
null_tests (const TfAnalysis *an, TfOneProportionTests *t)
{
  const double k = an->successes, n = an->trials;
  double L, H;

  tf_one_proportion_null_ends (an, &L, &H);
  if (an->null_kind == TF_NULL_POINT)
    {
      tf_one_proportion_tests (k, n, L, an->direction, t);
      return;
    }
  if (an->direction == TF_DIRECTION_GREATER)
    {
      tf_one_proportion_tests (k, n, H, TF_DIRECTION_GREATER, t);
      return;
    }
  if (an->direction == TF_DIRECTION_LESS)
    {
      tf_one_proportion_tests (k, n, L, TF_DIRECTION_LESS, t);
      return;
    }
  TfOneProportionTests up, down;
  tf_one_proportion_tests (k, n, H, TF_DIRECTION_GREATER, &up);
  tf_one_proportion_tests (k, n, L, TF_DIRECTION_LESS, &down);
  /* the statistics at the end nearer the data */
  *t = up.d > -down.d ? up : down;
#define TWICE_MIN(f) t->f = MIN (0.0, G_LN2 + MIN (up.f, down.f))
  TWICE_MIN (lp_exact);
  TWICE_MIN (lp_central);
  TWICE_MIN (lp_mid);
  TWICE_MIN (lp_score);
  TWICE_MIN (lp_score_cc);
  TWICE_MIN (lp_lr);
#undef TWICE_MIN
}

static void
add_p (TfResults *results, const char *id, const char *label, double lp)
{
  tf_results_add (results, id, label, TF_MEASURE_TAIL_PROBABILITY, MIN (exp (lp), 1.0));
}

static void
add_interval (TfResults *results, const char *id_lo, const char *label_lo,
              const char *id_hi, const char *label_hi, double lo, double hi)
{
  tf_results_add (results, id_lo, label_lo, TF_MEASURE_CONFIDENCE_LIMIT, lo);
  tf_results_add (results, id_hi, label_hi, TF_MEASURE_CONFIDENCE_LIMIT, hi);
}

/* Mode of Beta(P, Q) (Johnson, Kotz & Balakrishnan 1995, §25.1), moved to the side's
 * end when truncated; FALSE when flat or U-shaped. */
static gboolean
posterior_mode (double P, double Q, double cut, TfDirection side, double *mode)
{
  if (P > 1.0 && Q > 1.0)
    *mode = (P - 1.0) / (P + Q - 2.0);
  else if (P <= 1.0 && Q > 1.0)
    *mode = 0.0;
  else if (Q <= 1.0 && P > 1.0)
    *mode = 1.0;
  else if (P == 1.0 && Q < 1.0)
    *mode = 1.0;
  else if (Q == 1.0 && P < 1.0)
    *mode = 0.0;
  else
    return FALSE;
  if (side == TF_DIRECTION_GREATER)
    *mode = MAX (*mode, cut);
  else if (side == TF_DIRECTION_LESS)
    *mode = MIN (*mode, cut);
  return TRUE;
}

/* The classical tests of the null in its direction (t: their p-values and statistics),
 * and for an interval null the equivalence test. */
static void
add_tests (const TfAnalysis *analysis, double L, double H, TfOneProportionTests *tests,
           TfResults *results)
{
  const double k = analysis->successes, n = analysis->trials;
  const gboolean point = analysis->null_kind == TF_NULL_POINT;
  TfOneProportionTests t;

  null_tests (analysis, &t);
  add_p (results, "p_value", _("p-value (exact)"), t.lp_exact);
  add_p (results, "p_value_exact", _("Exact binomial p-value"), t.lp_exact);
  add_p (results, "p_value_central", _("Exact p-value, twice the smaller tail"), t.lp_central);
  add_p (results, "p_value_midp", _("Mid-p-value"), t.lp_mid);
  add_p (results, "p_value_score", _("Score test p-value"), t.lp_score);
  add_p (results, "p_value_score_cc", _("Score test p-value, continuity-corrected"), t.lp_score_cc);
  add_p (results, "p_value_lr", _("Likelihood-ratio test p-value"), t.lp_lr);
  tf_results_add (results, "z", _("Score statistic z"), TF_MEASURE_STATISTIC, t.z);
  if (!point)
    {
      /* The reverse question, θ inside [L, H] as the alternative: the larger of the
       * two one-sided exact p-values at the ends (two one-sided tests, an
       * intersection–union test, Berger & Hsu 1996). */
      double lp_up = tf_binom_log_sf (k, n, L, 1.0 - L);
      double lp_down = tf_binom_log_cdf (k, n, H, 1.0 - H);
      add_p (results, "p_value_equivalence", _("Equivalence p-value (θ inside the interval)"),
             MAX (lp_up, lp_down));
    }
  *tests = t;
}

/* Intervals, always two-sided at level, whatever the direction of the test. */
static void
add_intervals (double k, double n, double level, TfResults *results)
{
  double lo, hi;
  tf_binom_clopper_pearson (k, n, level, &lo, &hi);
  add_interval (results, "ci_low", _("Confidence interval, lower"),
                "ci_high", _("Confidence interval, upper"), lo, hi);
  tf_proportion_wilson (k, n, level, FALSE, &lo, &hi);
  add_interval (results, "wilson_low", _("Wilson interval, lower"),
                "wilson_high", _("Wilson interval, upper"), lo, hi);
  tf_proportion_wilson (k, n, level, TRUE, &lo, &hi);
  add_interval (results, "wilson_cc_low", _("Wilson interval with continuity correction, lower"),
                "wilson_cc_high", _("Wilson interval with continuity correction, upper"), lo, hi);
  tf_proportion_jeffreys (k, n, level, &lo, &hi);
  add_interval (results, "jeffreys_low", _("Jeffreys interval, lower"),
                "jeffreys_high", _("Jeffreys interval, upper"), lo, hi);
  tf_proportion_agresti_coull (k, n, level, &lo, &hi);
  add_interval (results, "agresti_coull_low", _("Agresti–Coull interval, lower"),
                "agresti_coull_high", _("Agresti–Coull interval, upper"), lo, hi);

}

/* The posterior under the alternative, truncated to its side when one-sided (above H,
 * below L); for an interval null against both sides, the whole Beta posterior. */
static void
add_posterior (const TfAnalysis *analysis, double L, double H, TfResults *results)
{
  const double k = analysis->successes, n = analysis->trials;
  const double a = analysis->prior_a, b = analysis->prior_b;
  const double level = analysis->level;
  const TfDirection dir = analysis->direction;
  const gboolean point = analysis->null_kind == TF_NULL_POINT;
  const double P = k + a, Q = n - k + b;
  double lo, hi;
  TfIncbetaShape post;
  tf_incbeta_shape_init (&post, P, Q);
  double cut = dir == TF_DIRECTION_LESS ? L : H;
  double alpha2 = 0.5 * (1.0 - level);
  double cri_lo = posterior_quantile (&post, alpha2, cut, dir);
  double cri_hi = posterior_quantile (&post, 1.0 - alpha2, cut, dir);
  tf_results_add (results, "cri_low", _("Credible interval, lower"), TF_MEASURE_CREDIBLE_LIMIT,
                  cri_lo);
  tf_results_add (results, "cri_high", _("Credible interval, upper"), TF_MEASURE_CREDIBLE_LIMIT,
                  cri_hi);
  /* two-sided, the credible interval is the equal-tailed one, the HDI's starting point */
  if (dir == TF_DIRECTION_TWO_SIDED && tf_beta_hdi_from (&post, level, cri_lo, cri_hi, &lo, &hi))
    {
      tf_results_add (results, "hdi_low", _("Highest-density interval, lower"),
                      TF_MEASURE_CREDIBLE_LIMIT, lo);
      tf_results_add (results, "hdi_high", _("Highest-density interval, upper"),
                      TF_MEASURE_CREDIBLE_LIMIT, hi);
    }
  else
    {
      const char *why = dir != TF_DIRECTION_TWO_SIDED
                        ? _("the highest-density interval is reported for the two-sided alternative only")
                        : _("the posterior density is flat or U-shaped, so no single interval has the highest density");
      tf_results_add_undefined (results, "hdi_low", _("Highest-density interval, lower"),
                                TF_MEASURE_CREDIBLE_LIMIT, why);
      tf_results_add_undefined (results, "hdi_high", _("Highest-density interval, upper"),
                                TF_MEASURE_CREDIBLE_LIMIT, why);
    }
  tf_results_add (results, "posterior_mean", _("Posterior mean"), TF_MEASURE_ESTIMATE,
                  posterior_mean (P, Q, cut, dir));
  tf_results_add (results, "posterior_median", _("Posterior median"), TF_MEASURE_ESTIMATE,
                  posterior_quantile (&post, 0.5, cut, dir));
  double mode;
  if (posterior_mode (P, Q, cut, dir, &mode))
    tf_results_add (results, "posterior_mode", _("Posterior mode"), TF_MEASURE_ESTIMATE, mode);
  else
    tf_results_add_undefined (results, "posterior_mode", _("Posterior mode"), TF_MEASURE_ESTIMATE,
                              _("the posterior density is flat or U-shaped, so it has no single mode"));
  /* Under the untruncated Beta(k + a, n − k + b) posterior, whatever the direction. */
  double lower_at_h, upper_at_h;
  tf_incbeta_shape_log_both (&post, H, 1.0 - H, &lower_at_h, &upper_at_h, NULL);
  tf_results_add (results, "prob_greater",
                  point ? _("Posterior probability that θ > θ0")
                        : _("Posterior probability that θ lies above the null interval"),
                  TF_MEASURE_POSTERIOR_PROBABILITY, exp (upper_at_h));

}

/* The bounds on the evidence and the Savage–Dickey check of bf01. */
static void
add_bounds (const TfAnalysis *analysis, double L, double H, const TfOneProportionTests *tests,
            TfResults *results)
{
  const double k = analysis->successes, n = analysis->trials;
  const double a = analysis->prior_a, b = analysis->prior_b;
  const TfDirection dir = analysis->direction;
  const gboolean point = analysis->null_kind == TF_NULL_POINT;
  const double P = k + a, Q = n - k + b;
  const TfOneProportionTests t = *tests;

  /* Bounds: −e p ln p (Sellke, Bayarri & Berger 2001) from ln p, and
   * L(θ0) / L(k/n) = exp(−G/2) (Edwards, Lindman & Savage 1963) at the null's end
   * nearer the data, 1 when k/n lies in the null or on its side of a one-sided test. */
  gboolean null_side = (dir == TF_DIRECTION_GREATER && t.d <= 0.0)
                       || (dir == TF_DIRECTION_LESS && t.d >= 0.0)
                       || (!point && k >= n * L && k <= n * H);
  tf_results_add_bounds (results, t.lp_exact, null_side ? 0.0 : -t.dev);

  /* Savage–Dickey density ratio (Dickey 1971), a check of bf01. */
  if (dir == TF_DIRECTION_TWO_SIDED && point)
    tf_results_add (results, "savage_dickey_bf01", _("Savage–Dickey BF01"), TF_MEASURE_BAYES_FACTOR,
                    exp (tf_log_dbeta (L, 1.0 - L, P, Q) - tf_log_dbeta (L, 1.0 - L, a, b)));
  else
    tf_results_add_undefined (results, "savage_dickey_bf01", _("Savage–Dickey BF01"),
                              TF_MEASURE_BAYES_FACTOR,
                              _("the density ratio is reported for a point null against the two-sided alternative only"));
}

void
tf_one_proportion_compute (const TfAnalysis *analysis, TfResults *results)
{
  const double k = analysis->successes, n = analysis->trials;
  const double a = analysis->prior_a, b = analysis->prior_b;
  double L, H;
  TfOneProportionTests t;

  tf_one_proportion_null_ends (analysis, &L, &H);
  tf_results_add (results, "estimate", _("Observed proportion"), TF_MEASURE_ESTIMATE, k / n);
  add_tests (analysis, L, H, &t, results);
  add_intervals (k, n, analysis->level, results);
  /* Bayes factors: the null (point or interval) against Beta(a, b) on the rest, or
   * truncated to the side for a one-sided alternative. */
  double lbf01 = tf_one_proportion_analysis_log_bf01 (analysis, k, n, a, b);
  tf_results_add_bayes_factors (results, lbf01, analysis->prior_null,
                                _("the posterior or prior mass of a hypothesis underflows, so the Bayes factor cannot be represented"));
  add_posterior (analysis, L, H, results);
  add_bounds (analysis, L, H, &t, results);
  tf_one_proportion_compute_models (analysis, results);
}

void
tf_one_proportion_densities (const TfAnalysis *analysis, TfDensityCurves *curves)
{
  const double k = analysis->successes, n = analysis->trials;
  const double a = analysis->prior_a, b = analysis->prior_b;
  const double P = k + a, Q = n - k + b, S = P + Q;
  const guint np = curves->n;
  double nl, nh;

  tf_one_proportion_null_ends (analysis, &nl, &nh);
  const double t = 0.5 * (nl + nh);

  /* The posterior's central 1 − 1e-6 and the null value, with a margin. */
  double qlo = tf_incbeta_inverse (0.5e-6, P, Q, TRUE);
  double qhi = tf_incbeta_inverse (0.5e-6, P, Q, FALSE);
  double lo = MIN (qlo, nl), hi = MAX (qhi, nh);
  double post_sd = sqrt (P * Q / (S * S * (S + 1.0)));
  double margin = 0.05 * (hi - lo);
  lo = MAX (0.0, lo - margin);
  hi = MIN (1.0, hi + margin);
  /* Widen to the prior's central 99% only while the posterior's central 99.9%
   * (about 6.6 sd) still spans a seventh of the range: a posterior drawn as a sliver
   * says less than the prior's shape adds. */
  double plo = MIN (lo, tf_incbeta_inverse (0.005, a, b, TRUE));
  double phi = MAX (hi, tf_incbeta_inverse (0.005, a, b, FALSE));
  if (6.6 * post_sd >= (phi - plo) / 7.0)
    {
      lo = plo;
      hi = phi;
    }
  if (!(hi > lo))
    {
      lo = MAX (0.0, lo - 1e-9);
      hi = MIN (1.0, hi + 1e-9);
    }
  curves->lo = lo;
  curves->hi = hi;
  double step = (hi - lo) / (np - 1);
  curves->posterior_narrow = post_sd < 2.0 * step;
  /* Mode of Beta(P, Q): (P − 1)/(S − 2) inside; at an end when a shape is at most 1;
   * U-shaped posteriors (both below 1) have no single mode: the mean stands in. */
  if (P > 1.0 && Q > 1.0)
    curves->posterior_mode = (k + (a - 1.0)) / (n + (a + b - 2.0));
  else if (P <= 1.0 && Q > 1.0)
    curves->posterior_mode = 0.0;
  else if (P > 1.0 && Q <= 1.0)
    curves->posterior_mode = 1.0;
  else
    curves->posterior_mode = P / S;

  for (guint i = 0; i < np; i++)
    {
      double x = i + 1 == np ? hi : lo + i * step;
      curves->x[i] = x;
      curves->prior[i] = tf_finite_exp (tf_log_dbeta (x, 1.0 - x, a, b));
      curves->posterior[i] = tf_finite_exp (tf_log_dbeta (x, 1.0 - x, P, Q));
      curves->likelihood[i] = tf_finite_exp (tf_log_dbeta (x, 1.0 - x, k + 1.0, n - k + 1.0));
    }
  curves->null_value = t;
  curves->null_low = nl;
  curves->null_high = nh;
  curves->prior_at_null = tf_finite_exp (tf_log_dbeta (t, 1.0 - t, a, b));
  curves->posterior_at_null = tf_finite_exp (tf_log_dbeta (t, 1.0 - t, P, Q));
  curves->parameter_markup = g_strdup ("θ");
}
