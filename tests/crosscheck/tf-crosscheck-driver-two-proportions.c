/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-crosscheck-driver-two-proportions.c: `tf-crosscheck-driver two-proportions`, the
 * two-proportions numerics for tf-crosscheck-two-proportions.py and
 * tf-crosscheck-logor.py.
 *
 *   lbf kA nA kB nB a b            ln BF01, closed form
 *   hyper x nA nB m                ln P(X = x), ln P(X <= x), ln P(X >= x)
 *   fisher kA nA kB nB             ln Fisher p: two-sided, greater, less
 *   newc kA nA kB nB level         Newcombe's hybrid score limits
 *   tests kA nA kB nB              χ², Yates and G p-values (two-sided)
 *   bdcdf pa qa pb qb d            ln P(Δ <= d), ln P(Δ >= d)
 *   bdq pa qa pb qb lp             d with ln P(Δ <= d) = lp, and with ln P(Δ >= d) = lp
 *   logor kA nA kB nB sd           ln BF01, normal prior on the log odds ratio
 */
#include <math.h>

#include "tf-design.h"
#include "tf-crosscheck-driver.h"
#include "tf-fisher.h"
#include "tf-beta-difference.h"
#include "tf-two-proportions.h"
#include "tf-two-proportions-private.h"

static double
result (const TfResults *r, const char *id)
{
  double v = NAN;
  tf_results_get (r, id, &v);
  return v;
}

static void
closed_form_bf (const double *v)
{
  TF_CROSS_PRINT (tf_two_proportions_log_bf01 (v[0], v[1], v[2], v[3], v[4], v[5]));
}

static void
hyper (const double *v)
{
  TfHyper h;

  tf_hyper_init (&h, v[1], v[2], v[3]);
  TF_CROSS_PRINT (tf_hyper_log_pmf (&h, v[0]), tf_hyper_log_cdf (&h, v[0]),
                  tf_hyper_log_sf (&h, v[0]));
}

static void
fisher (const double *v)
{
  TfHyper h;

  tf_hyper_init (&h, v[1], v[3], v[0] + v[2]);
  TF_CROSS_PRINT (tf_fisher_log_p (&h, v[0], TF_DIRECTION_TWO_SIDED),
                  tf_fisher_log_p (&h, v[0], TF_DIRECTION_GREATER),
                  tf_fisher_log_p (&h, v[0], TF_DIRECTION_LESS));
}

static void
newcombe (const double *v)
{
  double lo, hi;

  tf_two_proportions_newcombe (v[0], v[1], v[2], v[3], v[4], &lo, &hi);
  TF_CROSS_PRINT (lo, hi);
}

static void
tests (const double *v)
{
  g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_TWO_PROPORTIONS);
  g_autoptr (TfResults) r = NULL;

  a->successes_a = v[0];
  a->trials_a = v[1];
  a->successes_b = v[2];
  a->trials_b = v[3];
  r = tf_analysis_compute (a, NULL);
  TF_CROSS_PRINT (result (r, "p_value_chisq"), result (r, "p_value_chisq_yates"),
                  result (r, "p_value_lr"));
}

static void
beta_diff_cdf (const double *v)
{
  TfBetaDiff bd;
  double l = NAN, u = NAN;

  tf_beta_diff_init (&bd, v[0], v[1], v[2], v[3]);
  if (!tf_beta_diff_log_cdf (&bd, v[4], &l, &u))
    l = u = NAN;
  TF_CROSS_PRINT (l, u);
}

static void
beta_diff_quantile (const double *v)
{
  TfBetaDiff bd;

  tf_beta_diff_init (&bd, v[0], v[1], v[2], v[3]);
  TF_CROSS_PRINT (tf_beta_diff_quantile_log (&bd, v[4], TRUE),
                  tf_beta_diff_quantile_log (&bd, v[4], FALSE));
}

static void
log_or_bf (const double *v)
{
  const char *why = NULL;

  TF_CROSS_PRINT (tf_two_proportions_log_or_bf01 (v[0], v[1], v[2], v[3], v[4], &why));
}

static const TfCrossCase cases[] = {
  { "lbf", 6, closed_form_bf },
  { "hyper", 4, hyper },
  { "fisher", 4, fisher },
  { "newc", 5, newcombe },
  { "tests", 4, tests },
  { "bdcdf", 5, beta_diff_cdf },
  { "bdq", 5, beta_diff_quantile },
  { "logor", 5, log_or_bf },
};

const TfCrossArea tf_cross_two_proportions = TF_CROSS_AREA ("two-proportions", cases);
