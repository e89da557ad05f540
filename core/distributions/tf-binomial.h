/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-binomial.h: binomial tails and exact intervals for n up to 10^12.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* ln P(X <= k) and ln P(X >= k) for X ~ Binomial(n, p), q = 1 − p. */
double tf_binom_log_cdf (double k, double n, double p, double q);
double tf_binom_log_sf (double k, double n, double p, double q);

/* Two-sided exact p-value by the minimum-likelihood rule: the probability of every
 * outcome no more likely than k, with TF_EXACT_TEST_RELATIVE_TOLERANCE. */
double tf_binom_exact_two_sided (double k, double n, double p0);
/* Its logarithm, finite where the p-value itself underflows. */
double tf_binom_log_exact_two_sided (double k, double n, double p0);

/* Clopper–Pearson interval (Clopper & Pearson 1934) at level, two-sided. */
void tf_binom_clopper_pearson (double k, double n, double level, double *lo, double *hi);

G_END_DECLS
