/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-noncentral-t.h: the noncentral t distribution (GSL has none).
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* P(T <= t) for T ~ t(ν, λ), ν > 0 (Lenth 1989, AS 243, summed both ways from the
 * Poisson mode as in Benton & Krishnamoorthy 2003). Absolute accuracy about 1e-12. */
double tf_nct_cdf (double t, double df, double ncp);

/* ln of the density of t(ν, λ) at t (Johnson, Kotz & Balakrishnan 1995, eq. 31.15,
 * its Hermite-function integral in closed form or by the trapezoidal rule, 0.1-2 µs). */
double tf_nct_log_pdf (double t, double df, double ncp);

/* λ with P(T <= t) = p for T ~ t(ν, λ): the noncentral-t confidence limit
 * (Steiger & Fouladi 1997). NAN when not found. */
double tf_nct_ncp_for_cdf (double t, double df, double p);

G_END_DECLS
