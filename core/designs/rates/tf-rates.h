/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-rates.h: what the one-rate and two-rates designs share: the checks of counts,
 * exposures and the gamma prior, the Bayes factor in the analysis's hypotheses from a
 * design's prior and posterior, the p-value and posterior rows, and the sensitivity,
 * sample-size and null-distribution curves around a design's own Bayes factor (given
 * as a callback) and null probabilities. Nothing here calls a design's file.
 */
#pragma once

#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-results.h"

G_BEGIN_DECLS

#define TF_RATES_MAX_COUNT 1e15

/* Adds a problem unless v is a whole number in [0, 10^15] (counts) or finite and
 * above 0 (exposures); key names the [Data] key. */
/* The rates' defaults: a rate (or a rate ratio) of 1 under the null, a Gamma(1, 1)
 * prior. */
void tf_rates_defaults (TfAnalysis *analysis);

void tf_rates_check_count (GPtrArray *problems, const char *key, double v);
void tf_rates_check_exposure (GPtrArray *problems, const char *key, double v);
/* An interval null's Low and High: rates (ratio FALSE) or rate ratios. */
void tf_rates_check_interval_null (const TfAnalysis *analysis, GPtrArray *problems,
                                   gboolean ratio);
/* The gamma prior's PriorShape and PriorRate. */
void tf_rates_check_prior (const TfAnalysis *analysis, GPtrArray *problems);

/* How a design's parameter (λ, or ρ = λA/λB) is distributed under a prior or a
 * posterior with parameters param: both ln tails at c, and the quantile whose lower
 * (lower TRUE) or upper tail has ln probability log_p. */
typedef struct {
  void (*log_tails) (const double *param, double c, double *log_lower, double *log_upper);
  double (*quantile) (const double *param, double log_p, gboolean lower);
} TfRatesFamily;

/* ln P(θ >= c) (upper TRUE) or ln P(θ <= c). */
double tf_rates_log_tail (const TfRatesFamily *family, const double *param, double c,
                          gboolean upper);

/* ln BF01 in the analysis's hypotheses from the prior and posterior of the parameter
 * under the alternative: for a point null c0, log_bf01_point (two-sided) with the
 * prior truncated to the alternative's side; for an interval null, the prior and
 * posterior masses inside it against those on the alternative's side(s). */
double tf_rates_log_bf01 (const TfAnalysis *analysis, const TfRatesFamily *family,
                          const double *prior, const double *post, double log_bf01_point,
                          double c0);

/* The quantile u of the posterior, truncated to above c (greater) or below c (less). */
double tf_rates_posterior_quantile (const TfRatesFamily *family, const double *post,
                                    double u, double c, TfDirection dir);

/* The null value a test in the analysis's direction is made against: the point null
 * (point), or the nearer end of an interval null on the side of the alternative; and
 * whether the estimate num / den lies in the null (compared as num against c den,
 * so that den = 0 needs no division). */
double tf_rates_boundary (const TfAnalysis *analysis, double point, double num, double den,
                          gboolean *inside);

/* The rows p_value, p_value_exact (labelled exact_label), p_value_midp and
 * p_value_score from their ln; inside: the estimate lies in the null, every p is 1. */
void tf_rates_add_p_values (TfResults *results, gboolean inside, double lp_exact,
                            double lp_mid, double lp_score, const char *exact_label);

/* The rows cri_low, cri_high (equal-tailed, the posterior truncated to the side of a
 * one-sided alternative) and prob_greater (above the point null, or above the interval
 * null; labelled point_label or interval_label) of the posterior post. */
void tf_rates_add_posterior (TfResults *results, const TfAnalysis *analysis,
                             const TfRatesFamily *family, const double *post, double point,
                             const char *point_label, const char *interval_label);

/* TRUE when the analysis has a point null; otherwise *why_not = why (copied). */
gboolean tf_rates_point_null (const TfAnalysis *analysis, const char *why, char **why_not);

/* Where a curve evaluates the Bayes factor: a gamma prior, the exposures times f, and
 * counts that hold the normal deviate z of the observed p-value (z NAN: the observed
 * counts, f = 1). */
typedef struct {
  double shape, rate, f, z;
} TfRatesPoint;

typedef double (*TfRatesLogBf01) (const TfAnalysis *analysis, const TfRatesPoint *at);

/* x = prior shape from 1e-2 to 1e4, log-spaced, with the prior mean held: the
 * sensitivity curve of a design whose Bayes factor at a point is log_bf01. */
void tf_rates_sensitivity_of (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                              TfRatesLogBf01 log_bf01);

/* x = x_scale f for f from 1e-2 to 1e6, log-spaced; the counts hold the observed score
 * statistic z (signed), so that at f = 1 they are the observed counts and the curve
 * passes through the analysis's own Bayes factor. The p-value held is the score test's,
 * ln p = lp_score. A point null. */
void tf_rates_sample_size (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                           TfRatesLogBf01 log_bf01, double z, double lp_score,
                           double x_scale, const char *x_markup);

typedef double (*TfRatesLogPmf) (double j, const double *param);

/* The null masses of a count with the given mean and SD over its central outcomes
 * (mean ± 8 SD, and the observed count when near), in [0, top], in_tail marking the
 * outcomes of the exact p-value in the analysis's direction (the minimum-likelihood
 * rule when two-sided). FALSE, with *why_not, when there are too many to draw; the
 * caller sets dist->p_value. */
gboolean tf_rates_null_distribution (const TfAnalysis *analysis, TfNullDistribution *dist,
                                     double mean, double sd, double top, double observed,
                                     TfRatesLogPmf log_pmf, const double *param,
                                     const char *x_markup, char **why_not);

G_END_DECLS
