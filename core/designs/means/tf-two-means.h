/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-means.h: two independent means, by Student's pooled t or Welch's t.
 */
#pragma once

#include "tf-means.h"

G_BEGIN_DECLS

void tf_two_means_validate (const TfAnalysis *analysis, GPtrArray *problems);
void tf_two_means_summarise (TfAnalysis *analysis);

/* The statistics of a valid two-means analysis. */
void tf_two_means_stats (const TfAnalysis *analysis, TfMeansStats *stats);

/* Welch–Satterthwaite degrees of freedom (Welch 1947; Satterthwaite 1946). */
double tf_welch_df (double n_a, double sd_a, double n_b, double sd_b);

G_END_DECLS
