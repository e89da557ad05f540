/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-rates.h: events over exposure in groups A and B against the rate ratio
 * ρ = λA/λB = ρ0 (1 unless [Null] Value says otherwise), or an interval of ratios.
 */
#pragma once

#include "tf-analysis.h"
#include "tf-results.h"
#include "tf-curves.h"
#include "tf-design-class.h"
#include "tf-rates.h"

G_BEGIN_DECLS

void tf_two_rates_validate (const TfAnalysis *analysis, GPtrArray *problems);
/* The analysis is valid. */
void tf_two_rates_compute (const TfAnalysis *analysis, TfResults *results);
void tf_two_rates_densities (const TfAnalysis *analysis, TfDensityCurves *curves);
gboolean tf_two_rates_sample_size (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                                   char **why_not);
gboolean tf_two_rates_null_distribution (const TfAnalysis *analysis, TfNullDistribution *dist,
                                         char **why_not);

/* The null ratio of the analysis: [Null] Value, with 0 (the default) read as 1, "no
 * difference". */
double tf_two_rates_null_ratio (const TfAnalysis *analysis);
/* FALSE, with the reason in why_not, when the prior's mean rate is beyond the range in
 * which the Bayes factor is computed to full accuracy (10^12). */
gboolean tf_two_rates_prior_in_range (const TfAnalysis *analysis, char **why_not);

/* ln BF01, two-sided: H0 λA = ρ0 λ, λB = λ, λ ~ Gamma(shape, rate), against λA, λB
 * independent Gamma(shape, rate). Closed form, as a change of heterogeneities of
 * Poisson samples in Loader's deviance terms; within 1e-9 (relative above 1) of mpmath
 * for counts and shape up to 10^12, exposures and rate from 1e-6 to 10^12 and prior
 * means up to 10^12. Counts may be real. */
double tf_two_rates_log_bf01 (double ka, double ea, double kb, double eb, double rho0,
                              double shape, double rate);

/* The ρ = λA/λB whose lower (lower TRUE) or upper tail has ln probability log_p when
 * λA ~ Gamma(sa, ra) and λB ~ Gamma(sb, rb) independently: ra ρ / rb is beta-prime
 * (sa, sb) (Johnson, Kotz & Balakrishnan 1995, §25.8). */
double tf_two_rates_ratio_quantile_log (double log_p, double sa, double ra, double sb,
                                        double rb, gboolean lower);

/* ln BF01 in the analysis's hypotheses at a curve's point (TfRatesLogBf01). */
double tf_two_rates_log_bf01_at (const TfAnalysis *analysis, const TfRatesPoint *at);
gboolean tf_two_rates_sensitivity (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                                   char **why_not);

/* The design's entry for tf_design_class(). */
extern const TfDesignClass tf_two_rates_class;

G_END_DECLS
