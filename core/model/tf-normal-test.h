/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-normal-test.h: the p-value of a normal (z) test in the analysis's direction, for
 * every design that reports one.
 */
#pragma once

#include "tf-analysis.h"

G_BEGIN_DECLS

/* ln p of the deviate z: ln P(Z >= z) (greater), ln P(Z <= z) (less), or
 * ln 2 + ln P(Z >= |z|) (two-sided), Z standard normal; NaN where GSL fails. Not
 * rounded into [0, 1]: two-sided it may exceed 0 by up to ln 2. */
double tf_normal_test_log_p (double z, TfDirection direction);

G_END_DECLS
