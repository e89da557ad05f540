/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-normal.h: the standard normal's tails in log space, finite far into the tail.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* ln(½ erfc(z)) for any z (GSL's log_erfc, Cody 1969); NaN where GSL fails. */
double tf_log_half_erfc (double z);

/* ln P(Z >= z) = ln(½ erfc(z / √2)) for the standard normal Z, any z. */
double tf_log_normal_upper (double z);

G_END_DECLS
