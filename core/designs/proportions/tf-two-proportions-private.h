/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-proportions-private.h: pieces of the two-proportions design shared between
 * its files.
 */
#pragma once

#include "tf-analysis.h"
#include "tf-results.h"

G_BEGIN_DECLS

/* ln BF01 for ψ = 0 against ψ ~ N(0, sd²), ψ the log odds ratio, on the conditional
 * likelihood given the margins; NAN with *why set when it is not computed. */
double tf_two_proportions_log_or_bf01 (double ka, double na, double kb, double nb, double sd,
                                       const char **why);
/* Adds bf01_log_or_normal. */
void tf_two_proportions_add_log_or_bf (const TfAnalysis *analysis, TfResults *results);

/* ln BF01 (closed form, the analysis's direction and prior) for the table of the
 * sample-size curve at total trials T: group shares, pooled proportion and pooled z
 * as observed (tf-two-proportions-curves.c). */
double tf_two_proportions_held_log_bf01 (const TfAnalysis *analysis, double total);

G_END_DECLS
