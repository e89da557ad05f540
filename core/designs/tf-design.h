/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-design.h: the design registry, the one place that knows which designs there are.
 * Callers above core/designs ask it for a design's class and go through it to make,
 * check and compute an analysis and its curves.
 */
#pragma once

#include "tf-design-class.h"

G_BEGIN_DECLS

/* NULL when the design is not available in this version. */
const TfDesignClass *tf_design_class (TfDesign design);

const char *tf_design_to_string (TfDesign design);           /* file name: "one-proportion" */
gboolean tf_design_from_string (const char *s, TfDesign *design);
const char *tf_design_label (TfDesign design);              /* translated, for people */
/* The file's words for every design, separated by ", " (newly allocated). */
char *tf_design_names_joined (void);

/* The design a new analysis starts from when none is chosen: the registry's first. */
TfDesign tf_design_default (void);

/* A new analysis of this design with Twofold's neutral defaults. */
TfAnalysis *tf_analysis_new (TfDesign design);
/* Sets every field of an analysis to the defaults of this design (keeps the source). */
void tf_analysis_reset (TfAnalysis *analysis, TfDesign design);

/* When raw values are present, computes the summaries from them (Welford 1962): Values
 * → n, mean, sd; paired ValuesA + ValuesB → those of the differences A − B; two means
 * ValuesA, ValuesB → n_a, mean_a, sd_a, n_b, ... Lists of unequal length for paired
 * means are left to validation. */
void tf_analysis_summarise_values (TfAnalysis *analysis);

/* Appends one TfProblem per thing wrong with the analysis to problems (a GPtrArray
 * freeing with tf_problem_free). Returns TRUE when nothing was wrong. */
gboolean tf_analysis_validate (const TfAnalysis *analysis, GPtrArray *problems);

/* Validates, then computes. Returns NULL and fills problems when the analysis is not
 * valid. A valid analysis always gives results, some numbers possibly undefined. */
TfResults *tf_analysis_compute (const TfAnalysis *analysis, GPtrArray *problems);

/* Sets the method of each interval's limits in results, and what the interval is of,
 * from the design's class (TfNumber.method, .of). tf_analysis_compute() calls it; call
 * it for results made by hand. */
void tf_analysis_describe_numbers (const TfAnalysis *analysis, TfResults *results);

/* Each returns NULL when the analysis is not valid (problems filled) or the curve does
 * not apply to it (*why_not set, translated, when why_not is not NULL). */
TfDensityCurves *tf_density_curves_new (const TfAnalysis *analysis, guint n_points,
                                        GPtrArray *problems);
TfEvidenceCurve *tf_sensitivity_curve_new (const TfAnalysis *analysis, guint n_points,
                                           GPtrArray *problems, char **why_not);
TfEvidenceCurve *tf_sample_size_curve_new (const TfAnalysis *analysis, guint n_points,
                                           GPtrArray *problems, char **why_not);
/* n_points: the grid of a continuous distribution; a discrete one sets its own n. */
TfNullDistribution *tf_null_distribution_new (const TfAnalysis *analysis, guint n_points,
                                              GPtrArray *problems, char **why_not);
/* results: the analysis's numbers when the caller has them already, else NULL. */
TfModelProbabilities *tf_model_probabilities_new (const TfAnalysis *analysis,
                                                  const TfResults *results,
                                                  GPtrArray *problems, char **why_not);

G_END_DECLS
