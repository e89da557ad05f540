/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-poisson.h: Poisson samples, Poisson tails, the exact two-sided Poisson test and the
 * Garwood interval, accurate for counts and shapes up to 10^12 and tails down to 1e-300 and below.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* x events over exposure m, each an unevaluated sum hi + lo (Dekker 1971), so that
 * a count or an exposure made of sums and products keeps every digit in the
 * deviances below. */
typedef struct {
  double x, x_lo, m, m_lo;
} TfPoisSample;

/* x events over exposure m. */
TfPoisSample tf_pois_sample (double x, double m);
/* Pools k more events over c · e more exposure into s (c = 1 for plain e). */
void tf_pois_sample_add (TfPoisSample *s, double k, double e, double c);

/* bd0(x, λ m) of Loader (2000) for the sample s at the rate λ > 0. */
double tf_pois_sample_bd0 (const TfPoisSample *s, double lambda);

/* Half the likelihood-ratio statistic for one rate behind the samples s and t:
 * bd0(x, m r) + bd0(k, e r) at their pooled rate r = (x + k) / (m + e) (Loader 2000's
 * deviance terms; G / 2 of Woolf 1957, from memory). Unchanged when both exposures
 * are scaled together. */
double tf_pois_log_heterogeneity (const TfPoisSample *s, const TfPoisSample *t);

/* H(p, t) − H(q, t), computed so as to lose the fewest digits; *cost is the size of
 * its largest term. */
double tf_pois_log_heterogeneity_change (const TfPoisSample *p, const TfPoisSample *q,
                                         const TfPoisSample *t, double *cost);

/* ln P(X <= k) and ln P(X >= k) for X ~ Poisson(mu), mu >= 0. */
double tf_pois_log_cdf (double k, double mu);
double tf_pois_log_sf (double k, double mu);

/* ln of the two-sided exact p-value by the minimum-likelihood rule, with
 * TF_EXACT_TEST_RELATIVE_TOLERANCE. */
double tf_pois_log_exact_two_sided (double k, double mu);

/* Garwood (1936) exact interval for the Poisson mean at level, two-sided. */
void tf_pois_garwood (double k, double level, double *lo, double *hi);

G_END_DECLS
