/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-design.h: what a design provides. Each design file (tf-one-proportion.c, ...)
 * fills one TfDesignClass; tf-design.c lists them. Adding a design is one file and one
 * line there. A NULL member means "this design does not provide it"; callers say so.
 */
#pragma once

#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-results.h"

G_BEGIN_DECLS

typedef struct {
  TfDesign design;
  /* Appends a problem per field that is wrong (design fields only; the fields every
   * design shares are checked by tf_analysis_validate()). */
  void (*validate) (const TfAnalysis *analysis, GPtrArray *problems);
  /* The analysis is valid. Adds every number, in reporting order. */
  void (*compute) (const TfAnalysis *analysis, TfResults *results);
  /* The analysis is valid; the arrays are allocated with curves->n points. */
  void (*densities) (const TfAnalysis *analysis, TfDensityCurves *curves);
  /* The analysis is valid; the arrays are allocated with curve->n points. Return FALSE
   * and set *why_not (translated, one sentence) when the curve does not apply. */
  gboolean (*sensitivity) (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not);
  gboolean (*sample_size) (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not);
  gboolean (*null_distribution) (const TfAnalysis *analysis, TfNullDistribution *dist,
                                 char **why_not);
  gboolean (*model_probabilities) (const TfAnalysis *analysis, TfModelProbabilities *models,
                                   char **why_not);
} TfDesignClass;

/* NULL when the design is not available in this version. */
const TfDesignClass *tf_design_class (TfDesign design);

G_END_DECLS
