/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-poisson.h: the regularised incomplete gamma function in log space, its inverse,
 * Poisson tails, the exact two-sided Poisson test and the Garwood interval, accurate
 * for counts and shapes up to 10^12 and tails down to 1e-300 and below.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* ln P(a, x) (lower) and ln Q(a, x) = ln(1 − P(a, x)) (upper), a > 0, x >= 0. */
void tf_gamma_inc_log_both (double a, double x, double *log_lower, double *log_upper);
double tf_gamma_inc_log_lower (double a, double x);
double tf_gamma_inc_log_upper (double a, double x);

/* The x with ln P(a, x) = log_p (lower TRUE) or ln Q(a, x) = log_p (lower FALSE). */
double tf_gamma_inc_inverse_log (double log_p, double a, gboolean lower);

/* ln of x^a e^−x / Γ(a + 1) for real a >= 0, x >= 0: the Poisson probability of a at
 * mean x, in Loader's saddle-point form. */
double tf_log_dpois (double a, double x);

/* ln of the Gamma(shape, rate) density at x > 0. */
double tf_log_dgamma (double x, double shape, double rate);

/* ln of the negative binomial probability of k (whole) for a Poisson count whose mean
 * is Gamma(shape, rate) times exposure: the Poisson–gamma marginal, p = rate /
 * (rate + exposure), given with q = exposure / (rate + exposure). */
double tf_log_dnbinom (double k, double shape, double p, double q);

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

/* ln of the two-sided exact p-value by the minimum-likelihood rule, relative
 * tolerance 1e-7 (common practice). */
double tf_pois_log_exact_two_sided (double k, double mu);

/* Garwood (1936) exact interval for the Poisson mean at level, two-sided. */
void tf_pois_garwood (double k, double level, double *lo, double *hi);

G_END_DECLS
