/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-rates-curves.h: the curve hooks of the rates designs that pick the design's own
 * Bayes factor; what both designs share is in tf-rates.h.
 */
#pragma once

#include "tf-rates.h"

G_BEGIN_DECLS

/* The sensitivity curve of either design (tf_rates_sensitivity_of with the design's
 * Bayes factor); FALSE, with *why_not, when two rates' prior is out of range. */
gboolean tf_rates_sensitivity (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                               char **why_not);

G_END_DECLS
