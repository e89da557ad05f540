/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-mean.h: one mean against μ0 (t, or z with a known SD), and paired means as
 * one mean of the differences A − B.
 */
#pragma once

#include "tf-design.h"
#include "tf-means.h"

G_BEGIN_DECLS

const TfDesignClass *tf_one_mean_class (void);
const TfDesignClass *tf_paired_means_class (void);

/* The statistics of a valid one-mean or paired-means analysis. */
void tf_one_mean_stats (const TfAnalysis *analysis, TfMeansStats *stats);

G_END_DECLS
