/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-normal.h: the standard normal's tails in log space, finite far into the tail.
 * Every normal tail in the core comes from here: one call of GSL's log_erfc.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* ln erfc(x) for any x (GSL's log_erfc, Cody 1969); NaN where GSL fails. With
 * x = |z| / √2 it is the two-sided ln P(|Z| >= |z|), and with x = √(G/2) the
 * likelihood-ratio test's ln P(χ²₁ >= G), each in one rounding. */
double tf_log_erfc (double x);

/* ln(½ erfc(z)) = tf_log_erfc (z) − ln 2 for any z; NaN where GSL fails. */
double tf_log_half_erfc (double z);

/* ln P(Z >= z) = ln(½ erfc(z / √2)) for the standard normal Z, any z. */
double tf_log_normal_upper (double z);

G_END_DECLS
