/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-diagnostic.h: when the classical and the Bayesian readings disagree, which
 * conditions hold that make them disagree.
 */
#pragma once

#include "tf-design.h"
#include "tf-results.h"

G_BEGIN_DECLS

/* NULL when the readings agree (p < α with P(null | data) < ½, or p >= α with
 * P(null | data) >= ½, α = 1 − level) or a number is missing; otherwise a translated
 * paragraph, ready for a TfExplanation: the disagreement, then each condition that
 * holds (large n, small effect, precise null, diffuse prior, prior odds). Free with
 * g_free(). */
char *tf_diagnostic_text (const TfAnalysis *analysis, const TfResults *results);

G_END_DECLS
