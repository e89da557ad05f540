/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-jzs.h: Bayes factors for a t (or z) statistic against δ = 0, with a Cauchy (JZS)
 * or a normal prior on the standardised effect δ.
 *
 * t is the statistic, n_eff the effective sample size (n for one sample, nA nB / (nA + nB)
 * for two), df its degrees of freedom; df = INFINITY means the SD is known (a z statistic).
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* ln BF10, δ ~ Cauchy(0, r) (Rouder et al. 2009, eq. 1 and its two-sample form).
 * Relative accuracy 1e-10 or better; NAN only if every quadrature failed. */
double tf_jzs_log_bf10 (double t, double n_eff, double df, double r);

/* ln BF10, δ ~ N(0, r²) (Gönen et al. 2005 with prior mean 0; with df = INFINITY the
 * normal–normal closed form). */
double tf_normal_prior_log_bf10 (double t, double n_eff, double df, double r);

/* ln BF±0 of δ > 0 (side = +1) or δ < 0 (side = −1) against δ = 0, the prior truncated
 * to the side (Morey & Wagenmakers 2014), without the posterior of δ: one integral
 * over g (Cauchy) or a closed form (normal). */
double tf_jzs_log_bf_one_sided (double t, double n_eff, double df, double r, int side);
double tf_normal_prior_log_bf_one_sided (double t, double n_eff, double df, double r,
                                         int side);

/* Counts of the fast path and of its adaptive fallback, for tests and benchmarks. */
void tf_jzs_get_counts (guint64 *fast, guint64 *fallback);

G_END_DECLS
