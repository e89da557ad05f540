/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-proportion.h: k successes in n trials against θ = θ0.
 */
#pragma once

#include "tf-analysis.h"
#include "tf-results.h"
#include "tf-curves.h"

G_BEGIN_DECLS

void tf_one_proportion_validate (const TfAnalysis *analysis, GPtrArray *problems);
/* The analysis is valid. */
void tf_one_proportion_compute (const TfAnalysis *analysis, TfResults *results);
void tf_one_proportion_densities (const TfAnalysis *analysis, TfDensityCurves *curves);

/* ln BF01 for a point null θ0 against Beta(a, b), in deviance form so that it holds
 * to n = 10^12 and to huge a + b. */
double tf_one_proportion_log_bf01 (double k, double n, double theta0, double a, double b);

#include "tf-design-class.h"

extern const TfDesignClass tf_one_proportion_class;

G_END_DECLS
