/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-evidence.h: the numbers every design reports the same way once it has ln BF01,
 * ln p and the likelihood ratio at the maximum: Bayes factors, posterior model
 * probabilities, and the bounds on what any prior could conclude.
 */
#pragma once

#include "tf-results.h"

G_BEGIN_DECLS

/* P(null | data) = logistic(logit π0 + ln BF01), and its complement computed from its
 * own argument, so that 1e-300 stays 1e-300 and 1 − 1e-12 stays exact. */
double tf_posterior_null_from_log_bf01 (double log_bf01, double prior_null);
double tf_posterior_alt_from_log_bf01 (double log_bf01, double prior_null);

/* Adds bf10, bf01, posterior_null and posterior_alt from ln BF01. A ln BF01 that is not
 * finite makes the Bayes factors undefined with why_not as the reason (NULL: a general
 * one); the posterior probabilities stay defined where the sign of ln BF01 is known. */
void tf_results_add_bayes_factors (TfResults *results, double log_bf01, double prior_null,
                                   const char *why_not);

/* Adds min_bf01, −e·p·ln p for p < 1/e and 1 otherwise (Sellke, Bayarri & Berger
 * 2001), from ln p; and min_bf01_lr, the likelihood ratio of the null to the best
 * alternative, L(null) / L(max) (Edwards, Lindman & Savage 1963), from its log
 * (≤ 0; pass 0 when the estimate lies in the null or on its side). */
void tf_results_add_bounds (TfResults *results, double log_p, double log_lr);

/* e^x, with overflow clamped to the largest double (for densities on a grid). */
double tf_finite_exp (double x);

G_END_DECLS
