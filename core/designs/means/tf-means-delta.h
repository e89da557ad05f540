/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means-delta.h: the standardised effect δ of the means designs: its prior, the
 * likelihood of the observed t (or z), and masses of their product by quadrature.
 * The posterior's table (tf-means-posterior.c) and the Bayes factors (tf-means.c)
 * both build on it.
 */
#pragma once

#include "tf-analysis.h"

G_BEGIN_DECLS

/* Prior on δ and the evidence against the null, for one (t, n_eff, df). */
typedef struct {
  TfPriorFamily prior;          /* cauchy or normal */
  double r;
  TfDirection direction;
  gboolean interval;
  double low, high;             /* interval null on δ */
} TfDeltaPrior;

void tf_delta_prior_from_analysis (const TfAnalysis *analysis, TfDeltaPrior *prior);

/* ln prior density of δ and ln likelihood of δ (up to a constant). */
double tf_delta_log_prior (const TfDeltaPrior *prior, double delta);
double tf_delta_log_likelihood (double t, double n_eff, double df, double delta);

/* The unnormalised posterior of δ under the prior, for the statistic t with n_eff and
 * df, scaled by e^−shift. */
typedef struct {
  const TfDeltaPrior *prior;
  double t, n_eff, df;
  double shift;
} TfDeltaTarget;

/* ln prior + ln likelihood − shift at δ, −∞ where it is not a number. */
double tf_delta_log_target (const TfDeltaTarget *target, double delta);

/* ln ∫_a^b of the unnormalised posterior (either end may be infinite) by adaptive
 * quadrature, for masses a table does not hold; mode and width locate its bulk. */
double tf_delta_quadrature_log_mass (const TfDeltaTarget *target, double mode, double width,
                                     double a, double b);

G_END_DECLS
