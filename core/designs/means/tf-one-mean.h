/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-mean.h: one mean against μ0 (t, or z with a known SD), and paired means as
 * one mean of the differences A − B.
 */
#pragma once

#include "tf-means.h"

G_BEGIN_DECLS

void tf_one_mean_validate (const TfAnalysis *analysis, GPtrArray *problems);
void tf_one_mean_summarise (TfAnalysis *analysis);
void tf_paired_means_summarise (TfAnalysis *analysis);

/* The statistics of a valid one-mean or paired-means analysis. */
void tf_one_mean_stats (const TfAnalysis *analysis, TfMeansStats *stats);

G_END_DECLS
