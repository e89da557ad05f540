/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-proportion-class.c: the class of one proportion: k successes in n trials
 * against θ = θ0 (a point or an interval), or a model set of hypotheses about θ.
 */
#include "tf-one-proportion.h"
#include "tf-one-proportion-private.h"

#include <glib/gi18n-lib.h>

#define OFF(field) G_STRUCT_OFFSET (TfAnalysis, field)

static const TfDataNumber numbers[] = {
  { "Successes", OFF (successes) },
  { "Trials", OFF (trials) },
};

/* θ0 = 0.5 and a uniform Beta(1, 1) prior; 12 successes in 20 trials to start from. */
static void
defaults (TfAnalysis *analysis)
{
  analysis->null_value = 0.5;
  analysis->prior = TF_PRIOR_BETA;
  analysis->successes = 12;
  analysis->trials = 20;
}

const TfDesignClass tf_one_proportion_class = {
  .design = TF_DESIGN_ONE_PROPORTION,
  .name = "one-proportion",
  .label = N_("One proportion"),
  .numbers = numbers,
  .n_numbers = G_N_ELEMENTS (numbers),
  .null_value_required = TRUE,
  .model_set = TRUE,
  .defaults = defaults,
  .validate = tf_one_proportion_validate,
  .compute = tf_one_proportion_compute,
  .densities = tf_one_proportion_densities,
  .sensitivity = tf_one_proportion_sensitivity,
  .sample_size = tf_one_proportion_sample_size,
  .null_distribution = tf_one_proportion_null_distribution,
  .model_probabilities = tf_one_proportion_model_probabilities,
};
