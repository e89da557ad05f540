/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-logspace.h: log-space helpers that stay exact for huge counts.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* ln 2π. */
#define TF_LN_2PI 1.83787706640934548356065947281
#define TF_LN_SQRT_2PI 0.918938533204672741780329736406     /* ½ ln 2π */

/* ln Γ(x) − [(x − ½) ln x − x + ½ ln 2π], x > 0: the Stirling remainder
 * (Loader 2000, "stirlerr", extended to real x). */
double tf_stirling_remainder (double x);

/* x ln(x / m) + m − x, the deviance term, x >= 0, m > 0, with no cancellation
 * when x is near m (Loader 2000, "bd0"). */
double tf_bd0 (double x, double m);
/* The same given d = x − m, computed by the caller without cancellation. */
double tf_bd0_delta (double x, double m, double d);

/* ln of the binomial probability of k successes in n trials, success probability p
 * (q = 1 − p given separately so that p near 1 stays exact) (Loader 2000). */
double tf_log_dbinom (double k, double n, double p, double q);

/* ln B(a, b) (by Stirling remainders when both are large, so no digits are lost). */
double tf_log_beta (double a, double b);

/* ln of the Beta(a, b) density at x, with 1 − x given as y (Loader-style deviance). */
double tf_log_dbeta (double x, double y, double a, double b);

/* The SD of Beta(p, q): √(pq / (s²(s + 1))), s = p + q, as (p/s)(q/s)/(s + 1) so that
 * huge shapes do not overflow (Johnson, Kotz & Balakrishnan 1995, §25.1). */
double tf_beta_sd (double p, double q);

/* ln of x^a e^−x / Γ(a + 1) for real a >= 0, x >= 0: the Poisson probability of a at
 * mean x, in Loader's saddle-point form. */
double tf_log_dpois (double a, double x);

/* ln of the Gamma(shape, rate) density at x > 0. */
double tf_log_dgamma (double x, double shape, double rate);

/* ln of the negative binomial probability of k (whole) for a Poisson count whose mean
 * is Gamma(shape, rate) times exposure: the Poisson–gamma marginal, p = rate /
 * (rate + exposure), given with q = exposure / (rate + exposure). */
double tf_log_dnbinom (double k, double shape, double p, double q);

/* ln(e^a + e^b), ln(e^a − e^b) for a >= b, ln(1 − e^a) for a <= 0 (Mächler 2012). */
double tf_log_add (double a, double b);
double tf_log_sub (double a, double b);
double tf_log1mexp (double a);

/* 1 / (1 + e^-x) without overflow. */
double tf_logistic (double x);

G_END_DECLS
