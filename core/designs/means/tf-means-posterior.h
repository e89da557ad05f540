/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means-posterior.h: the posterior of the standardised effect δ under the
 * alternative, as one table: masses, quantiles, the HDI and the density.
 */
#pragma once

#include "tf-means-delta.h"

G_BEGIN_DECLS

typedef struct TfDeltaPosterior TfDeltaPosterior;

/* The posterior of δ under the alternative (untruncated prior). */
TfDeltaPosterior *tf_delta_posterior_new (const TfDeltaPrior *prior, double t, double n_eff,
                                          double df);
void tf_delta_posterior_free (TfDeltaPosterior *post);
/* ln of the untruncated posterior mass on [a, b] (either may be infinite), and outside it. */
double tf_delta_posterior_log_mass (TfDeltaPosterior *post, double a, double b);
double tf_delta_posterior_log_mass_outside (TfDeltaPosterior *post, double a, double b);
/* Posterior density at δ (normalised; from the table inside it) and its ln, and its mode. */
double tf_delta_posterior_density (TfDeltaPosterior *post, double delta);
double tf_delta_posterior_log_density (TfDeltaPosterior *post, double delta);
double tf_delta_posterior_mode (TfDeltaPosterior *post);
double tf_delta_posterior_width (TfDeltaPosterior *post);
/* Quantile u of the posterior truncated to [a, b] (bulk-tabulated, ~1e-9), and the
 * highest-density interval of mass level on [a, b]. */
double tf_delta_posterior_quantile (TfDeltaPosterior *post, double u, double a, double b);
void tf_delta_posterior_hdi (TfDeltaPosterior *post, double level, double a, double b,
                             double *lo, double *hi);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfDeltaPosterior, tf_delta_posterior_free)

G_END_DECLS
