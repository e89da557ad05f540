/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-proportions.h: successes and trials in groups A and B against θA = θB.
 */
#pragma once

#include "tf-analysis.h"
#include "tf-results.h"
#include "tf-curves.h"
#include "tf-design-class.h"

G_BEGIN_DECLS

void tf_two_proportions_validate (const TfAnalysis *analysis, GPtrArray *problems);
/* The analysis is valid. */
void tf_two_proportions_compute (const TfAnalysis *analysis, TfResults *results);

/* ln BF01, two-sided: H0 θA = θB = θ, θ ~ Beta(a, b), against θA, θB independent
 * Beta(a, b). Closed form in Loader's deviance form, so that it holds for n to 10^12. */
double tf_two_proportions_log_bf01 (double ka, double na, double kb, double nb,
                                    double a, double b);

/* ln BF01 in the chosen direction: for greater (less), H1 is the alternative's prior
 * truncated to θA > θB (θA < θB). NAN when the posterior integral fails. */
double tf_two_proportions_log_bf01_directed (double ka, double na, double kb, double nb,
                                             double a, double b, TfDirection direction);

/* Newcombe's hybrid score interval for θA − θB (Newcombe 1998, method 10). */
void tf_two_proportions_newcombe (double ka, double na, double kb, double nb, double level,
                                  double *lo, double *hi);

/* kA nB − kB nA, without the rounding of the products (Ogita, Rump & Oishi 2005). */
double tf_two_proportions_cross (double ka, double na, double kb, double nb);

/* Curves (tf-two-proportions-curves.c). */
void tf_two_proportions_densities (const TfAnalysis *analysis, TfDensityCurves *curves);
gboolean tf_two_proportions_sensitivity (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                                         char **why_not);
gboolean tf_two_proportions_sample_size (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                                         char **why_not);
gboolean tf_two_proportions_null_distribution (const TfAnalysis *analysis,
                                               TfNullDistribution *dist, char **why_not);
gboolean tf_two_proportions_model_probabilities (const TfAnalysis *analysis,
                                                 TfModelProbabilities *models, char **why_not);

/* The design's entry for tf_design_class(). */
extern const TfDesignClass tf_two_proportions_class;

G_END_DECLS
