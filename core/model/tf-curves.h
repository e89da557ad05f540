/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-curves.h: curves computed on demand for figures, from a valid analysis: densities
 * of the parameter, the evidence against the prior's scale and against the sample size,
 * the null distribution of the test statistic, and the model probabilities.
 */
#pragma once

#include <glib.h>
#include "tf-analysis.h"

G_BEGIN_DECLS

/* Prior and posterior of the parameter under the alternative, and the likelihood scaled
 * to integrate to 1 over the parameter, on n points from lo to hi. lo and hi are chosen
 * to show what matters: the posterior's bulk and the null value, and the prior's bulk
 * as far as that leaves the posterior resolved. Values are densities (finite, >= 0).
 * When the posterior is far narrower than the range (the null far from the data),
 * posterior_narrow is TRUE: a figure draws it as a spike at posterior_mode and says so
 * rather than pretend to resolve it. */
typedef struct {
  guint n;
  double lo, hi;
  double *x;
  double *prior;
  double *posterior;
  double *likelihood;
  double null_value;            /* point null */
  double null_low, null_high;   /* interval null (both equal to null_value for a point) */
  double prior_at_null;         /* densities at the null: Savage–Dickey heights */
  double posterior_at_null;
  double posterior_mode;
  gboolean posterior_narrow;
  char *parameter_markup;       /* Pango markup of the parameter's name: "θ" */
} TfDensityCurves;

/* The evidence as one setting moves: the prior's scale (sensitivity) or the sample size
 * with the p-value held at the observed one (sample-size). x increases. */
typedef struct {
  guint n;
  double *x;
  double *log_bf01;             /* ln BF01 at each x */
  double *posterior_null;       /* P(null | data) at each x, from PriorNull */
  gboolean x_log;               /* draw x on a log axis */
  char *x_markup;               /* axis label, Pango markup */
  double chosen_x;              /* the analysis's own setting, marked on the figure */
  double chosen_log_bf01;
  double chosen_posterior_null;
  double p_value;               /* sample-size: the p-value held fixed */
} TfEvidenceCurve;

/* The sampling distribution of the test statistic under the null. Discrete (counts:
 * probability masses at whole x) or continuous (densities on a grid). in_tail marks
 * the outcomes, or grid points, counted in the p-value. */
typedef struct {
  guint n;
  gboolean discrete;
  double *x;
  double *mass;                 /* probability mass (discrete) or density */
  gboolean *in_tail;
  double observed;
  double p_value;
  char *x_markup;               /* "successes <i>k</i>", "<i>t</i>" */
} TfNullDistribution;

/* Prior and posterior probability of each hypothesis in the model set. */
typedef struct {
  guint n;
  char **names_markup;          /* "H<sub>0</sub>: θ = 0.8" */
  double *prior;
  double *posterior;
} TfModelProbabilities;

void tf_density_curves_free (TfDensityCurves *curves);
void tf_evidence_curve_free (TfEvidenceCurve *curve);
void tf_null_distribution_free (TfNullDistribution *dist);
void tf_model_probabilities_free (TfModelProbabilities *models);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfDensityCurves, tf_density_curves_free)
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfEvidenceCurve, tf_evidence_curve_free)
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfNullDistribution, tf_null_distribution_free)
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfModelProbabilities, tf_model_probabilities_free)

/* The grid of the sensitivity curves of the proportions and rates: the prior's
 * concentration (a + b) or shape from 10^-2 to 10^4, log-spaced; point i of n. */
#define TF_SENSITIVITY_LOG10_LOW -2.0
#define TF_SENSITIVITY_LOG10_HIGH 4.0
double tf_sensitivity_grid (guint i, guint n);

/* For a design's null-distribution hook: allocates x, mass and in_tail for n points. */
void tf_null_distribution_allocate (TfNullDistribution *dist, guint n);
/* For a design's model-probabilities hook: allocates the arrays for n models. */
void tf_model_probabilities_allocate (TfModelProbabilities *models, guint n);

G_END_DECLS
