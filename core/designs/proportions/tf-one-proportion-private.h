/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-proportion-private.h: pieces of the one-proportion design shared by its files
 * (tf-one-proportion.c, -tests.c, -models.c, -curves.c) and their tests.
 */
#pragma once

#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-results.h"

G_BEGIN_DECLS

/* ln p of every test of θ = θ0 in one direction, and the statistics. */
typedef struct {
  double lp_exact;      /* exact, minimum likelihood when two-sided */
  double lp_central;    /* exact, twice the smaller tail when two-sided, at most 1 */
  double lp_mid;        /* mid-p (Lancaster 1961) */
  double lp_score;      /* score z */
  double lp_score_cc;   /* score z with continuity correction */
  double lp_lr;         /* likelihood ratio G */
  double z, z_cc;       /* score statistics (z_cc signed, 0 when |k − nθ0| <= ½ two-sided) */
  double d;             /* k − nθ0, exactly */
  double dev;           /* G / 2 */
} TfOneProportionTests;

void tf_one_proportion_tests (double k, double n, double theta0, TfDirection direction,
                              TfOneProportionTests *tests);

/* ln of the Beta(P, Q) mass on each part of (0, 1) cut at lo <= hi: below lo, inside
 * [lo, hi], above hi, each from its own tails so that none cancels. */
void tf_one_proportion_log_masses (double P, double Q, double lo, double hi,
                                   double *below, double *inside, double *above);

/* ln BF01 of the analysis's hypotheses (point or interval null, the direction's
 * alternative) for data k of n (k may be real) and a Beta(pa, pb) prior. */
double tf_one_proportion_analysis_log_bf01 (const TfAnalysis *analysis, double k, double n,
                                            double pa, double pb);

/* The interval's ends: θ0 twice for a point null. */
void tf_one_proportion_null_ends (const TfAnalysis *analysis, double *lo, double *hi);

/* Results of the model set ([Models] Set), when there is one. */
void tf_one_proportion_compute_models (const TfAnalysis *analysis, TfResults *results);

/* ln of each model's marginal likelihood relative to the untruncated Beta prior's
 * (NAN where a model's prior mass is 0), for n_models of models. */
void tf_one_proportion_model_log_marginals (const TfAnalysis *analysis, const TfModel *models,
                                            guint n_models, double *log_m);

gboolean tf_one_proportion_sensitivity (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                                        char **why_not);
gboolean tf_one_proportion_sample_size (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                                        char **why_not);
gboolean tf_one_proportion_null_distribution (const TfAnalysis *analysis,
                                              TfNullDistribution *dist, char **why_not);
gboolean tf_one_proportion_model_probabilities (const TfAnalysis *analysis,
                                                TfModelProbabilities *models, char **why_not);

G_END_DECLS
