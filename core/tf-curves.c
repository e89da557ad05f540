/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-curves.c: curves for figures, computed on demand from a valid analysis.
 */
#include "tf-curves.h"
#include "tf-one-proportion.h"

#include <math.h>

TfDensityCurves *
tf_density_curves_new (const TfAnalysis *analysis, guint n_points, GPtrArray *problems)
{
  g_autoptr (GPtrArray) own = NULL;
  TfDensityCurves *curves;

  g_return_val_if_fail (n_points >= 2, NULL);
  if (problems == NULL)
    problems = own = tf_problem_list_new ();
  if (!tf_analysis_validate (analysis, problems))
    return NULL;

  curves = g_new0 (TfDensityCurves, 1);
  curves->n = n_points;
  curves->x = g_new0 (double, n_points);
  curves->prior = g_new0 (double, n_points);
  curves->posterior = g_new0 (double, n_points);
  curves->likelihood = g_new0 (double, n_points);
  switch (analysis->design)
    {
    case TF_DESIGN_ONE_PROPORTION:
      tf_one_proportion_densities (analysis, curves);
      break;
    default:
      g_assert_not_reached ();  /* validation refuses the others */
    }
  return curves;
}

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
