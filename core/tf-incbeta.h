/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-incbeta.h: the regularised incomplete beta function and its inverse, accurate
 * for shape parameters from 1e-3 to 1e13 and tails down to 1e-300.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* ln I_x(a, b) (lower) and ln(1 − I_x(a, b)) (upper). x in [0, 1], y = 1 − x given
 * separately. Returns -inf for a probability of exactly 0. */
double tf_incbeta_log_lower (double x, double y, double a, double b);
double tf_incbeta_log_upper (double x, double y, double a, double b);

/* Both of the above in one call. */
void tf_incbeta_log_both (double x, double y, double a, double b, double *log_lower,
                          double *log_upper);

/* I_x(a, b) and its complement, plain. */
double tf_incbeta_lower (double x, double y, double a, double b);
double tf_incbeta_upper (double x, double y, double a, double b);

/* The x with I_x(a, b) = p (lower TRUE) or 1 − I_x(a, b) = p (lower FALSE), p in (0, 1). */
double tf_incbeta_inverse (double p, double a, double b, gboolean lower);
/* The same given ln p, so that p below the smallest double still has an inverse. */
double tf_incbeta_inverse_log (double log_p, double a, double b, gboolean lower);

G_END_DECLS
