/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-curves.c: the curve types' storage. The curves are computed by the design's class
 * (tf-design-curves.c in core/designs).
 */
#include "tf-curves.h"

#include <math.h>

void
tf_density_curves_free (TfDensityCurves *curves)
{
  if (curves == NULL)
    return;
  g_free (curves->x);
  g_free (curves->prior);
  g_free (curves->posterior);
  g_free (curves->likelihood);
  g_free (curves->parameter_markup);
  g_free (curves);
}

void
tf_evidence_curve_free (TfEvidenceCurve *curve)
{
  if (curve == NULL)
    return;
  g_free (curve->x);
  g_free (curve->log_bf01);
  g_free (curve->posterior_null);
  g_free (curve->x_markup);
  g_free (curve);
}

void
tf_null_distribution_allocate (TfNullDistribution *dist, guint n)
{
  g_free (dist->x);
  g_free (dist->mass);
  g_free (dist->in_tail);
  dist->n = n;
  dist->x = g_new0 (double, n);
  dist->mass = g_new0 (double, n);
  dist->in_tail = g_new0 (gboolean, n);
}

void
tf_null_distribution_free (TfNullDistribution *dist)
{
  if (dist == NULL)
    return;
  g_free (dist->x);
  g_free (dist->mass);
  g_free (dist->in_tail);
  g_free (dist->x_markup);
  g_free (dist);
}

void
tf_model_probabilities_allocate (TfModelProbabilities *models, guint n)
{
  if (models->names_markup)
    g_strfreev (models->names_markup);
  g_free (models->prior);
  g_free (models->posterior);
  models->n = n;
  models->names_markup = g_new0 (char *, n + 1);
  models->prior = g_new0 (double, n);
  models->posterior = g_new0 (double, n);
}

void
tf_model_probabilities_free (TfModelProbabilities *models)
{
  if (models == NULL)
    return;
  g_strfreev (models->names_markup);
  g_free (models->prior);
  g_free (models->posterior);
  g_free (models);
}

double
tf_sensitivity_grid (guint i, guint n)
{
  return pow (10.0, TF_SENSITIVITY_LOG10_LOW
                    + (TF_SENSITIVITY_LOG10_HIGH - TF_SENSITIVITY_LOG10_LOW) * i / (n - 1));
}
