/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means-class.c: the classes of one mean, paired means and two means. Each design
 * gives its statistics (tf-one-mean.c, tf-two-means.c); the numbers and curves that
 * follow from them are the same for all three (tf-means.c, tf-means-curves.c).
 */
#include "tf-means-class.h"
#include "tf-means.h"
#include "tf-one-mean.h"
#include "tf-two-means.h"

#include <glib/gi18n-lib.h>

static void
means_stats (const TfAnalysis *analysis, TfMeansStats *stats)
{
  if (analysis->design == TF_DESIGN_TWO_MEANS)
    tf_two_means_stats (analysis, stats);
  else
    tf_one_mean_stats (analysis, stats);
}

static void
class_compute (const TfAnalysis *analysis, TfResults *results)
{
  TfMeansStats s;
  means_stats (analysis, &s);
  tf_means_compute (analysis, &s, results);
}

static void
class_densities (const TfAnalysis *analysis, TfDensityCurves *curves)
{
  TfMeansStats s;
  means_stats (analysis, &s);
  tf_means_densities (analysis, &s, curves);
}

static gboolean
class_sensitivity (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not)
{
  TfMeansStats s;
  means_stats (analysis, &s);
  return tf_means_sensitivity (analysis, &s, curve, why_not);
}

static gboolean
class_sample_size (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not)
{
  TfMeansStats s;
  means_stats (analysis, &s);
  return tf_means_sample_size (analysis, &s, curve, why_not);
}

static gboolean
class_null_distribution (const TfAnalysis *analysis, TfNullDistribution *dist,
                                  char **why_not)
{
  TfMeansStats s;
  means_stats (analysis, &s);
  return tf_means_null_distribution (analysis, &s, dist, why_not);
}

#define OFF(field) G_STRUCT_OFFSET (TfAnalysis, field)

static const TfDataSample one_mean_samples[] = {
  { "Values", OFF (values), NULL, 0,
    { "N", "Mean", "SD" }, { OFF (n), OFF (mean), OFF (sd) } },
};

static const TfDataSample paired_means_samples[] = {
  { "ValuesA", OFF (values_a), "ValuesB", OFF (values_b),
    { "N", "MeanDiff", "SDDiff" }, { OFF (n), OFF (mean), OFF (sd) } },
};

static const TfDataSample two_means_samples[] = {
  { "ValuesA", OFF (values_a), NULL, 0,
    { "NA", "MeanA", "SDA" }, { OFF (n_a), OFF (mean_a), OFF (sd_a) } },
  { "ValuesB", OFF (values_b), NULL, 0,
    { "NB", "MeanB", "SDB" }, { OFF (n_b), OFF (mean_b), OFF (sd_b) } },
};

/* The prior on the standardised effect δ: a Cauchy of scale √2/2 (Rouder et al. 2009's
 * "medium" JZS prior, from memory); no difference under the null. */
static void
means_defaults (TfAnalysis *analysis)
{
  analysis->prior = TF_PRIOR_CAUCHY;
  analysis->null_value = 0.0;
}

#define MEANS_HOOKS                                  \
  .defaults = means_defaults,                        \
  .compute = class_compute,                          \
  .densities = class_densities,                      \
  .sensitivity = class_sensitivity,                  \
  .sample_size = class_sample_size,                  \
  .null_distribution = class_null_distribution

const TfDesignClass tf_one_mean_class = {
  .design = TF_DESIGN_ONE_MEAN,
  .name = "one-mean",
  .label = N_("One mean"),
  .samples = one_mean_samples,
  .n_samples = G_N_ELEMENTS (one_mean_samples),
  .known_sd = TRUE,
  .null_value_required = TRUE,
  .summarise = tf_one_mean_summarise,
  .validate = tf_one_mean_validate,
  MEANS_HOOKS,
};

const TfDesignClass tf_paired_means_class = {
  .design = TF_DESIGN_PAIRED_MEANS,
  .name = "paired-means",
  .label = N_("Paired means"),
  .samples = paired_means_samples,
  .n_samples = G_N_ELEMENTS (paired_means_samples),
  .summarise = tf_paired_means_summarise,
  .validate = tf_one_mean_validate,
  MEANS_HOOKS,
};

const TfDesignClass tf_two_means_class = {
  .design = TF_DESIGN_TWO_MEANS,
  .name = "two-means",
  .label = N_("Two means"),
  .samples = two_means_samples,
  .n_samples = G_N_ELEMENTS (two_means_samples),
  .equal_variances = TRUE,
  .summarise = tf_two_means_summarise,
  .validate = tf_two_means_validate,
  MEANS_HOOKS,
};
