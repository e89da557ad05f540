/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-incgamma.h: the regularised incomplete gamma function in log space and its inverse,
 * accurate for shapes up to 10^15 and tails down to 1e-300 and below.
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

G_END_DECLS
