/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-curves.h: curves computed on demand for figures: densities of the parameter.
 */
#pragma once

#include <glib.h>
#include "tf-analysis.h"

G_BEGIN_DECLS

/* Prior and posterior of the parameter under the alternative, and the likelihood scaled
 * to integrate to 1 over the parameter, on n points from lo to hi. lo and hi are chosen
 * to show what matters: the posterior's bulk, the null value, and the prior as far as
 * the range allows. Values are densities (finite, >= 0). When the posterior is far
 * narrower than the range, posterior_narrow is TRUE: a figure should draw it as a
 * spike and say so rather than pretend to resolve it. */
typedef struct {
  guint n;
  double lo, hi;
  double *x;
  double *prior;
  double *posterior;
  double *likelihood;
  double null_value;            /* point null, or NAN-free 0 when interval */
  double null_low, null_high;   /* interval null (equal to null_value for a point) */
  double prior_at_null;         /* densities at the null: Savage–Dickey heights */
  double posterior_at_null;
  gboolean posterior_narrow;
  char *parameter_markup;       /* Pango markup of the parameter's name: "θ" */
} TfDensityCurves;

/* NULL (and problems filled) when the analysis is not valid. */
TfDensityCurves *tf_density_curves_new (const TfAnalysis *analysis, guint n_points,
                                        GPtrArray *problems);
void tf_density_curves_free (TfDensityCurves *curves);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfDensityCurves, tf_density_curves_free)

G_END_DECLS
