/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-proportion-curves.c: the evidence against the prior's concentration and the
 * sample size, and the null distribution of the count, for figures.
 */
#include "tf-one-proportion.h"
#include "tf-one-proportion-private.h"
#include "tf-logspace.h"
#include "tf-exact-test.h"

#include <math.h>
#include "tf-evidence.h"

#include <glib/gi18n-lib.h>

static void
set_chosen (const TfAnalysis *an, TfEvidenceCurve *curve)
{
  curve->chosen_log_bf01 = tf_one_proportion_analysis_log_bf01 (an, an->successes, an->trials,
                                                                an->prior_a, an->prior_b);
  curve->chosen_posterior_null = tf_posterior_null_from_log_bf01 (curve->chosen_log_bf01, an->prior_null);
}

/* x = prior concentration a + b from 1e-2 to 1e4, log-spaced, the prior mean
 * a/(a + b) held; ln BF01 in exact deviance form at each point. */
gboolean
tf_one_proportion_sensitivity (const TfAnalysis *an, TfEvidenceCurve *curve,
                               char **why_not G_GNUC_UNUSED)
{
  double mean = an->prior_a / (an->prior_a + an->prior_b);

  for (guint i = 0; i < curve->n; i++)
    {
      double s = tf_sensitivity_grid (i, curve->n);
      curve->x[i] = s;
      curve->log_bf01[i] = tf_one_proportion_analysis_log_bf01 (an, an->successes, an->trials,
                                                                s * mean, s * (1.0 - mean));
      curve->posterior_null[i] = tf_posterior_null_from_log_bf01 (curve->log_bf01[i], an->prior_null);
    }
  curve->x_log = TRUE;
  curve->x_markup = g_strdup (_("prior concentration <i>a</i> + <i>b</i> (prior mean held)"));
  curve->chosen_x = an->prior_a + an->prior_b;
  set_chosen (an, curve);
  return TRUE;
}

/* x = n from 1 to 10^12, log-spaced. The observed score statistic z is held: at n
 * trials the count is k = nθ0 + z √(nθ0(1 − θ0)), a real count (the Bayes factor's
 * formula takes one), kept within [0, n] where n is too small to reach that z. At the
 * observed n this is the observed count, so the curve passes through the analysis's own
 * Bayes factor; the p-value held is the score test's. BF01 grows like √n along it. */
gboolean
tf_one_proportion_sample_size (const TfAnalysis *an, TfEvidenceCurve *curve, char **why_not)
{
  const double t = an->null_value;
  TfOneProportionTests tests;

  if (an->null_kind != TF_NULL_POINT)
    {
      *why_not = g_strdup (_("The sample-size curve holds the p-value against a point null; this analysis has an interval null."));
      return FALSE;
    }
  tf_one_proportion_tests (an->successes, an->trials, t, an->direction, &tests);
  double z = isfinite (tests.z) ? tests.z : 0.0;
  /* The p-value can be held only where k = nθ0 + z·sqrt(nθ0(1 − θ0)) stays inside
   * [0, n], that is from n = z² max(θ0/(1 − θ0), (1 − θ0)/θ0); start at twice that, or
   * at the observed n if it is smaller, so the curve shows no clipping artefacts. */
  double n_min = 2.0 * z * z * MAX (t / (1.0 - t), (1.0 - t) / t);
  double bottom = MAX (1.0, MIN (n_min, an->trials));
  double top = MAX (1e12, an->trials);
  for (guint i = 0; i < curve->n; i++)
    {
      double n = i + 1 == curve->n ? top
                 : bottom * pow (top / bottom, (double) i / (curve->n - 1));
      double k = CLAMP (n * t + z * sqrt (n * t * (1.0 - t)), 0.0, n);
      curve->x[i] = n;
      curve->log_bf01[i] = tf_one_proportion_analysis_log_bf01 (an, k, n, an->prior_a, an->prior_b);
      curve->posterior_null[i] = tf_posterior_null_from_log_bf01 (curve->log_bf01[i], an->prior_null);
    }
  curve->x_log = TRUE;
  curve->x_markup = g_strdup (_("trials <i>n</i> (score <i>z</i> held)"));
  curve->chosen_x = an->trials;
  set_chosen (an, curve);
  curve->p_value = exp (MIN (tests.lp_score, 0.0));
  return TRUE;
}

#define TF_MAX_POINTS 2000

/* Binomial(n, θ0) masses over the outcomes within 8 SD + 10 of the mean (all but far
 * less than 1e-12 of the mass, by Hoeffding 1963), and the observed count when near;
 * beyond 2000 outcomes every m-th is kept (the x label says so). in_tail marks the
 * outcomes counted in the exact p-value: j >= k (greater), j <= k (less), or no more
 * likely than k by the minimum-likelihood rule (two-sided). */
gboolean
tf_one_proportion_null_distribution (const TfAnalysis *an, TfNullDistribution *dist,
                                     char **why_not)
{
  const double k = an->successes, n = an->trials;
  const double t = an->null_value, u = 1.0 - t;
  TfOneProportionTests tests;

  if (an->null_kind != TF_NULL_POINT)
    {
      *why_not = g_strdup (_("The null distribution is drawn for a point null; this analysis has an interval null."));
      return FALSE;
    }
  double m = n * t, sd = sqrt (n * t * u);
  double lo = MAX (0.0, floor (m - 8.0 * sd - 10.0));
  double hi = MIN (n, ceil (m + 8.0 * sd + 10.0));
  if (k < lo && k >= lo - 0.25 * (hi - lo))
    lo = k;
  if (k > hi && k <= hi + 0.25 * (hi - lo))
    hi = k;
  double count = hi - lo + 1.0;
  double step = count > TF_MAX_POINTS ? ceil (count / TF_MAX_POINTS) : 1.0;
  guint np = (guint) floor ((hi - lo) / step) + 1;

  tf_one_proportion_tests (k, n, t, an->direction, &tests);
  double ld = tf_exact_test_log_threshold (tf_log_dbinom (k, n, t, u));
  tf_null_distribution_allocate (dist, np);
  for (guint i = 0; i < np; i++)
    {
      double j = lo + i * step;
      double l = tf_log_dbinom (j, n, t, u);
      dist->x[i] = j;
      dist->mass[i] = exp (l);
      dist->in_tail[i] = an->direction == TF_DIRECTION_GREATER ? j >= k
                         : an->direction == TF_DIRECTION_LESS ? j <= k : l <= ld;
    }
  dist->discrete = TRUE;
  dist->observed = k;
  dist->p_value = exp (MIN (tests.lp_exact, 0.0));
  dist->x_markup = step > 1.0
                   ? g_strdup_printf (_("successes <i>k</i> (every %.0f-th outcome drawn)"), step)
                   : g_strdup (_("successes <i>k</i>"));
  return TRUE;
}
