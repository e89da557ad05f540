/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-proportion-intervals.h: confidence intervals for a binomial proportion beside
 * Clopper–Pearson (tf-binomial.h), and the highest-density interval of a beta.
 */
#pragma once

#include "tf-incbeta.h"

#include <glib.h>

G_BEGIN_DECLS

/* Wilson's score interval (Wilson 1927), without (Newcombe 1998, method 3) or with
 * (method 4) continuity correction, two-sided at level. */
void tf_proportion_wilson (double k, double n, double level, gboolean cc,
                           double *lo, double *hi);

/* Jeffreys interval: Beta(k + ½, n − k + ½) quantiles, 0 below at k = 0 and 1 above at
 * k = n (Brown, Cai & DasGupta 2001). */
void tf_proportion_jeffreys (double k, double n, double level, double *lo, double *hi);

/* Agresti–Coull interval (Agresti & Coull 1998), clipped to [0, 1]. */
void tf_proportion_agresti_coull (double k, double n, double level, double *lo, double *hi);

/* The highest-density interval of Beta(P, Q) with mass level: equal density at both
 * ends when the mode is inside, one end at 0 or 1 when the density is monotone.
 * FALSE when the density is flat or U-shaped (no single interval). */
gboolean tf_beta_hdi (double P, double Q, double level, double *lo, double *hi);

/* The same for the shapes of posterior, given its equal-tailed interval [lo0, hi0] at
 * level (the quantiles (1 − level)/2 of each tail) as the starting point. */
gboolean tf_beta_hdi_from (TfIncbetaShape *posterior, double level, double lo0, double hi0,
                           double *lo, double *hi);

G_END_DECLS
