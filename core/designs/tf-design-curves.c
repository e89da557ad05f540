/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-design-curves.c: curves for figures, computed on demand from a valid analysis by
 * its design's class.
 */
#include "tf-design.h"

#include <glib/gi18n-lib.h>

/* The design's class when the analysis is valid, else NULL with problems filled. */
static const TfDesignClass *
valid_class (const TfAnalysis *analysis, GPtrArray *problems)
{
  g_autoptr (GPtrArray) own = NULL;

  if (problems == NULL)
    problems = own = tf_problem_list_new ();
  if (!tf_analysis_validate (analysis, problems))
    return NULL;
  return tf_design_class (analysis->design);
}

static void
set_why_not (char **why_not, char *text)
{
  if (why_not)
    *why_not = text;
  else
    g_free (text);
}

/* format: a sentence with one %s for the design's name */
static char *
not_provided (const TfAnalysis *analysis, const char *format)
{
  return g_strdup_printf (format, tf_design_label (analysis->design));
}

TfDensityCurves *
tf_density_curves_new (const TfAnalysis *analysis, guint n_points, GPtrArray *problems)
{
  const TfDesignClass *klass = valid_class (analysis, problems);
  TfDensityCurves *curves;

  g_return_val_if_fail (n_points >= 2, NULL);
  if (klass == NULL || klass->densities == NULL)
    return NULL;
  curves = g_new0 (TfDensityCurves, 1);
  curves->n = n_points;
  curves->x = g_new0 (double, n_points);
  curves->prior = g_new0 (double, n_points);
  curves->posterior = g_new0 (double, n_points);
  curves->likelihood = g_new0 (double, n_points);
  klass->densities (analysis, curves);
  return curves;
}

static TfEvidenceCurve *
evidence_curve_new (guint n_points)
{
  TfEvidenceCurve *curve = g_new0 (TfEvidenceCurve, 1);

  curve->n = n_points;
  curve->x = g_new0 (double, n_points);
  curve->log_bf01 = g_new0 (double, n_points);
  curve->posterior_null = g_new0 (double, n_points);
  return curve;
}

typedef gboolean (*EvidenceHook) (const TfAnalysis *, TfEvidenceCurve *, char **);

static TfEvidenceCurve *
evidence_curve_run (const TfAnalysis *analysis, guint n_points, GPtrArray *problems,
                    char **why_not, gboolean sensitivity)
{
  const TfDesignClass *klass = valid_class (analysis, problems);
  EvidenceHook hook;
  TfEvidenceCurve *curve;
  char *reason = NULL;

  g_return_val_if_fail (n_points >= 2, NULL);
  if (klass == NULL)
    return NULL;
  hook = sensitivity ? klass->sensitivity : klass->sample_size;
  if (hook == NULL)
    {
      set_why_not (why_not,
                   not_provided (analysis,
                                 sensitivity
                                 ? _("The sensitivity curve is not available for the design “%s” in this version.")
                                 : _("The sample-size curve is not available for the design “%s” in this version.")));
      return NULL;
    }
  curve = evidence_curve_new (n_points);
  if (!hook (analysis, curve, &reason))
    {
      tf_evidence_curve_free (curve);
      set_why_not (why_not, reason);
      return NULL;
    }
  return curve;
}

TfEvidenceCurve *
tf_sensitivity_curve_new (const TfAnalysis *analysis, guint n_points, GPtrArray *problems,
                          char **why_not)
{
  return evidence_curve_run (analysis, n_points, problems, why_not, TRUE);
}

TfEvidenceCurve *
tf_sample_size_curve_new (const TfAnalysis *analysis, guint n_points, GPtrArray *problems,
                          char **why_not)
{
  return evidence_curve_run (analysis, n_points, problems, why_not, FALSE);
}

TfNullDistribution *
tf_null_distribution_new (const TfAnalysis *analysis, guint n_points, GPtrArray *problems,
                          char **why_not)
{
  const TfDesignClass *klass = valid_class (analysis, problems);
  TfNullDistribution *dist;
  char *reason = NULL;

  if (klass == NULL)
    return NULL;
  if (klass->null_distribution == NULL)
    {
      set_why_not (why_not, not_provided (analysis, _("The null distribution is not available for the design “%s” in this version.")));
      return NULL;
    }
  dist = g_new0 (TfNullDistribution, 1);
  tf_null_distribution_allocate (dist, MAX (n_points, 2));
  if (!klass->null_distribution (analysis, dist, &reason))
    {
      tf_null_distribution_free (dist);
      set_why_not (why_not, reason);
      return NULL;
    }
  return dist;
}

static gboolean
two_models_from_results (const TfAnalysis *analysis, const TfResults *given,
                         TfModelProbabilities *models, char **why_not)
{
  g_autoptr (TfResults) computed = given ? NULL : tf_analysis_compute (analysis, NULL);
  const TfResults *results = given ? given : computed;
  double post_null, post_alt;

  if (results == NULL || !tf_results_get (results, "posterior_null", &post_null)
      || !tf_results_get (results, "posterior_alt", &post_alt))
    {
      *why_not = g_strdup (_("The posterior probabilities of the models are not defined for these data."));
      return FALSE;
    }
  tf_model_probabilities_allocate (models, 2);
  models->names_markup[0] = g_strdup (_("H₀, the null"));
  models->names_markup[1] = g_strdup (_("H₁, the alternative"));
  models->prior[0] = analysis->prior_null;
  models->prior[1] = 1.0 - analysis->prior_null;
  models->posterior[0] = post_null;
  models->posterior[1] = post_alt;
  return TRUE;
}

TfModelProbabilities *
tf_model_probabilities_new (const TfAnalysis *analysis, const TfResults *results,
                            GPtrArray *problems, char **why_not)
{
  const TfDesignClass *klass = valid_class (analysis, problems);
  TfModelProbabilities *models;
  char *reason = NULL;

  if (klass == NULL)
    return NULL;
  models = g_new0 (TfModelProbabilities, 1);
  if (klass->model_probabilities == NULL)
    {
      /* The two models every design compares, from its own numbers. */
      if (two_models_from_results (analysis, results, models, &reason))
        return models;
      tf_model_probabilities_free (models);
      set_why_not (why_not, reason);
      return NULL;
    }
  if (!klass->model_probabilities (analysis, models, &reason))
    {
      tf_model_probabilities_free (models);
      set_why_not (why_not, reason);
      return NULL;
    }
  return models;
}
