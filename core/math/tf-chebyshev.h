/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-chebyshev.h: Chebyshev interpolation on the TF_CHEB_N Chebyshev–Lobatto points
 * of [−1, 1]: coefficients, evaluation, integral and the derivatives at the ends.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

#define TF_CHEB_N 24

/* Node j: ξ_j = cos(π j / (N − 1)), from ξ = 1 (j = 0) to −1 (j = N − 1). */
double tf_cheb_node (guint j);

/* c[0..N−1] of the interpolant Σ c_k T_k through the values v_j at the nodes. */
void tf_cheb_fit (const double *v, double *c);

/* Σ_k c_k T_k(ξ), k < n (Clenshaw 1955). */
double tf_cheb_eval (const double *c, guint n, double xi);

/* ci[0..N] of the integral from −1 of Σ c_k T_k, k < N. */
void tf_cheb_integral (const double *c, double *ci);

/* First and second derivatives of Σ c_k T_k at ξ = end (1 or −1). */
void tf_cheb_end_derivatives (const double *c, int end, double *d1, double *d2);

G_END_DECLS
