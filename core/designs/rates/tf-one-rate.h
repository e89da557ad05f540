/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-rate.h: k events over an exposure E against the rate λ = λ0 (events per unit
 * exposure), or an interval of rates.
 */
#pragma once

#include "tf-analysis.h"
#include "tf-results.h"
#include "tf-curves.h"
#include "tf-design-class.h"
#include "tf-rates.h"

G_BEGIN_DECLS

void tf_one_rate_validate (const TfAnalysis *analysis, GPtrArray *problems);
/* The analysis is valid. */
void tf_one_rate_compute (const TfAnalysis *analysis, TfResults *results);
void tf_one_rate_densities (const TfAnalysis *analysis, TfDensityCurves *curves);
gboolean tf_one_rate_sample_size (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                                  char **why_not);
gboolean tf_one_rate_null_distribution (const TfAnalysis *analysis, TfNullDistribution *dist,
                                        char **why_not);

/* ln BF01 for the point null λ0 against λ ~ Gamma(shape, rate), two-sided: the
 * posterior over the prior density at λ0, in Loader's deviance terms pooled so that no
 * term is much larger than the result; within 1e-9 (relative above 1) of mpmath for k,
 * shape up to 10^12 and E, rate from 1e-6 to 10^12. k may be real. */
double tf_one_rate_log_bf01 (double k, double exposure, double lambda0, double shape,
                             double rate);

/* ln BF01 in the analysis's hypotheses at a curve's point (TfRatesLogBf01). */
double tf_one_rate_log_bf01_at (const TfAnalysis *analysis, const TfRatesPoint *at);
gboolean tf_one_rate_sensitivity (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                                  char **why_not);

/* The design's entry for tf_design_class(). */
extern const TfDesignClass tf_one_rate_class;

G_END_DECLS
