/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means.h: what the three means designs share: the statistics of a t (or z) test,
 * the Bayes factors and the posterior of the standardised effect δ, the numbers and
 * the curves. tf-one-mean.c and tf-two-means.c turn an analysis into TfMeansStats; the
 * prior and likelihood of δ are in tf-means-delta.h, its posterior in
 * tf-means-posterior.h.
 */
#pragma once

#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-results.h"
#include "tf-means-delta.h"
#include "tf-means-posterior.h"

G_BEGIN_DECLS

typedef struct {
  gboolean known_sd;            /* z test */
  gboolean two_samples;
  double estimate;              /* mean or difference */
  double se;                    /* standard error of the estimate (main test) */
  double t;                     /* main statistic: t (Welch or Student) or z */
  double df;                    /* its degrees of freedom; INFINITY for z */
  /* The statistic the Bayes factors and the effect size use: one-sample t, Student's
   * pooled t, or z; δ = (mean − null) / σ and t | δ ~ t(df, √n_eff δ). */
  double t_delta;
  double df_delta;
  double n_eff;
  double n_total;               /* observations: the likelihood-ratio bound's exponent */
  double p_student, p_welch;    /* two means */
  /* the sample-size curve: n_eff = n · n_eff_per_n and df = n − df_offset at total n */
  double n_eff_per_n, df_offset;
} TfMeansStats;


/* ln BF01 of the analysis's hypotheses for the statistic t with n_eff and df; the
 * second form takes the posterior under the same prior (an interval null uses it). */
double tf_means_log_bf01 (const TfDeltaPrior *prior, double t, double n_eff, double df);
double tf_means_log_bf01_with (const TfDeltaPrior *prior, double t, double n_eff, double df,
                               TfDeltaPosterior *post);

/* p-value of the statistic in the direction (Student t or normal when df is infinite). */
double tf_means_p_value (double t, double df, TfDirection direction);

/* Checks shared by the means designs: prior, null, direction, KnownSD. */
void tf_means_validate_common (const TfAnalysis *analysis, GPtrArray *problems);
/* A count n (at least min) and an SD (> 0 unless sd_may_be_zero) named by their keys,
 * or by values_key when raw values were given. */
void tf_means_validate_sample (GPtrArray *problems, const char *n_key, const char *mean_key,
                               const char *sd_key, const char *values_key, gboolean from_values,
                               double n, double mean, double sd, double min_n,
                               gboolean sd_may_be_zero);

/* The statistics of a valid one-mean, paired-means or two-means analysis. */
void tf_means_stats (const TfAnalysis *analysis, TfMeansStats *stats);

void tf_means_compute (const TfAnalysis *analysis, const TfMeansStats *stats, TfResults *results);
void tf_means_densities (const TfAnalysis *analysis, const TfMeansStats *stats,
                         TfDensityCurves *curves);
gboolean tf_means_sensitivity (const TfAnalysis *analysis, const TfMeansStats *stats,
                               TfEvidenceCurve *curve, char **why_not);
gboolean tf_means_sample_size (const TfAnalysis *analysis, const TfMeansStats *stats,
                               TfEvidenceCurve *curve, char **why_not);
gboolean tf_means_null_distribution (const TfAnalysis *analysis, const TfMeansStats *stats,
                                     TfNullDistribution *dist, char **why_not);

G_END_DECLS
