/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-proportion-models.c: Bayes factors for a point or interval null against the
 * direction's alternative, and the model set of [Models] Set.
 */
#include "tf-one-proportion.h"
#include "tf-one-proportion-private.h"
#include "tf-incbeta.h"
#include "tf-logspace.h"

#include <math.h>
#include <string.h>
#include <glib/gi18n-lib.h>

void
tf_one_proportion_null_ends (const TfAnalysis *analysis, double *lo, double *hi)
{
  if (analysis->null_kind == TF_NULL_INTERVAL)
    {
      *lo = analysis->null_low;
      *hi = analysis->null_high;
    }
  else
    *lo = *hi = analysis->null_value;
}

/* ln of each model's marginal likelihood over that of the untruncated Beta(pa, pb)
 * prior: a truncated prior's marginal is the full one times posterior mass over prior
 * mass of its part; a point null's is BF01 of the point (Jeffreys 1961, §5.1). */
static void
log_marginals (const TfAnalysis *an, double k, double n, double pa, double pb,
               const TfModel *models, guint n_models, double *log_m)
{
  double L, H;
  double pb_lo, pb_in, pb_hi, qb_lo, qb_in, qb_hi;

  tf_one_proportion_null_ends (an, &L, &H);
  tf_one_proportion_log_masses (k + pa, n - k + pb, L, H, &pb_lo, &pb_in, &pb_hi);
  tf_one_proportion_log_masses (pa, pb, L, H, &qb_lo, &qb_in, &qb_hi);
  for (guint i = 0; i < n_models; i++)
    switch (models[i])
      {
      case TF_MODEL_NULL:
        log_m[i] = an->null_kind == TF_NULL_POINT
                   ? tf_one_proportion_log_bf01 (k, n, L, pa, pb) : pb_in - qb_in;
        break;
      case TF_MODEL_LESS:
        log_m[i] = pb_lo - qb_lo;
        break;
      case TF_MODEL_GREATER:
        log_m[i] = pb_hi - qb_hi;
        break;
      case TF_MODEL_TWO_SIDED:
      case TF_N_MODELS:
      default:
        log_m[i] = an->null_kind == TF_NULL_POINT
                   ? 0.0 : tf_log_add (pb_lo, pb_hi) - tf_log_add (qb_lo, qb_hi);
        break;
      }
}

void
tf_one_proportion_model_log_marginals (const TfAnalysis *an, const TfModel *models,
                                       guint n_models, double *log_m)
{
  log_marginals (an, an->successes, an->trials, an->prior_a, an->prior_b, models,
                 n_models, log_m);
}

double
tf_one_proportion_analysis_log_bf01 (const TfAnalysis *an, double k, double n,
                                     double pa, double pb)
{
  TfModel pair[2] = { TF_MODEL_NULL, TF_MODEL_TWO_SIDED };
  double lm[2];

  /* the common case without the tails it does not need */
  if (an->null_kind == TF_NULL_POINT && an->direction == TF_DIRECTION_TWO_SIDED)
    return tf_one_proportion_log_bf01 (k, n, an->null_value, pa, pb);
  if (an->direction == TF_DIRECTION_GREATER)
    pair[1] = TF_MODEL_GREATER;
  else if (an->direction == TF_DIRECTION_LESS)
    pair[1] = TF_MODEL_LESS;
  log_marginals (an, k, n, pa, pb, pair, 2, lm);
  return lm[0] - lm[1];
}

/* "two-sided" → "two_sided", for result ids. */
static char *
model_id (TfModel model)
{
  return g_strdelimit (g_strdup (tf_model_to_string (model)), "-", '_');
}

void
tf_one_proportion_compute_models (const TfAnalysis *an, TfResults *results)
{
  const guint m = an->n_models;
  double lm[TF_N_MODELS], lpost[TF_N_MODELS];
  double total = -INFINITY;

  if (m == 0)
    return;
  tf_one_proportion_model_log_marginals (an, an->models, m, lm);
  for (guint i = 0; i < m; i++)
    {
      lpost[i] = log (an->model_priors[i]) + lm[i];
      total = tf_log_add (total, lpost[i]);
    }
  for (guint i = 0; i < m; i++)
    {
      g_autofree char *name = model_id (an->models[i]);
      g_autofree char *id = g_strdup_printf ("posterior_model_%s", name);
      g_autofree char *label = g_strdup_printf (_("Posterior probability of the model “%s”"),
                                                tf_model_to_string (an->models[i]));
      if (isfinite (total) && !isnan (lpost[i]))
        tf_results_add (results, id, label, TF_MEASURE_POSTERIOR_PROBABILITY,
                        exp (lpost[i] - total));
      else
        tf_results_add_undefined (results, id, label, TF_MEASURE_POSTERIOR_PROBABILITY,
                                  _("the marginal likelihoods of the models underflow"));
    }
  /* Each pair once, in the order of Set; the reverse is the reciprocal. */
  for (guint i = 0; i < m; i++)
    for (guint j = i + 1; j < m; j++)
      {
        g_autofree char *na = model_id (an->models[i]);
        g_autofree char *nb = model_id (an->models[j]);
        g_autofree char *id = g_strdup_printf ("bf_%s_%s", na, nb);
        g_autofree char *label = g_strdup_printf (_("Bayes factor of “%s” over “%s”"),
                                                  tf_model_to_string (an->models[i]),
                                                  tf_model_to_string (an->models[j]));
        double v = exp (lm[i] - lm[j]);
        if (isfinite (v) && v > 0.0)
          tf_results_add (results, id, label, TF_MEASURE_BAYES_FACTOR, v);
        else
          tf_results_add_undefined (results, id, label, TF_MEASURE_BAYES_FACTOR,
                                    _("the Bayes factor is too large or too small to be represented"));
      }
}

/* Pango markup for a model: "θ = 0.5", "θ < 0.5", "θ ∉ [0.4, 0.6]", ... */
static char *
model_markup (const TfAnalysis *an, TfModel model, const char *prefix)
{
  double L, H;
  gboolean point = an->null_kind == TF_NULL_POINT;

  tf_one_proportion_null_ends (an, &L, &H);
  switch (model)
    {
    case TF_MODEL_NULL:
      return point ? g_strdup_printf ("%sθ = %g", prefix, L)
                   : g_strdup_printf ("%sθ ∈ [%g, %g]", prefix, L, H);
    case TF_MODEL_LESS:
      return g_strdup_printf ("%sθ &lt; %g", prefix, L);
    case TF_MODEL_GREATER:
      return g_strdup_printf ("%sθ &gt; %g", prefix, H);
    case TF_MODEL_TWO_SIDED:
    case TF_N_MODELS:
    default:
      return point ? g_strdup_printf ("%sθ ≠ %g", prefix, L)
                   : g_strdup_printf ("%sθ ∉ [%g, %g]", prefix, L, H);
    }
}

gboolean
tf_one_proportion_model_probabilities (const TfAnalysis *an, TfModelProbabilities *models,
                                       char **why_not G_GNUC_UNUSED)
{
  TfModel set[TF_N_MODELS];
  double priors[TF_N_MODELS], lm[TF_N_MODELS], lpost[TF_N_MODELS];
  guint m;
  double total = -INFINITY;

  if (an->n_models > 0)
    {
      m = an->n_models;
      memcpy (set, an->models, m * sizeof set[0]);
      memcpy (priors, an->model_priors, m * sizeof priors[0]);
    }
  else
    {
      m = 2;
      set[0] = TF_MODEL_NULL;
      set[1] = an->direction == TF_DIRECTION_GREATER ? TF_MODEL_GREATER
               : an->direction == TF_DIRECTION_LESS ? TF_MODEL_LESS : TF_MODEL_TWO_SIDED;
      priors[0] = an->prior_null;
      priors[1] = 1.0 - an->prior_null;
    }
  tf_one_proportion_model_log_marginals (an, set, m, lm);
  for (guint i = 0; i < m; i++)
    {
      lpost[i] = log (priors[i]) + lm[i];
      total = tf_log_add (total, lpost[i]);
    }
  tf_model_probabilities_allocate (models, m);
  for (guint i = 0; i < m; i++)
    {
      const char *prefix = an->n_models > 0 ? "" : i == 0 ? "H₀: " : "H₁: ";
      models->names_markup[i] = model_markup (an, set[i], prefix);
      models->prior[i] = priors[i];
      models->posterior[i] = isfinite (total) && isfinite (lpost[i]) ? exp (lpost[i] - total) : 0.0;
    }
  return TRUE;
}
