/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-design.c: the designs this version of Twofold computes.
 */
#include "tf-design.h"
#include "tf-one-proportion.h"
#include "tf-one-proportion-private.h"
#include "tf-one-rate.h"
#include "tf-two-rates.h"
#include "tf-one-mean.h"
#include "tf-two-means.h"
#include "tf-two-proportions.h"

static const TfDesignClass one_proportion = {
  .design = TF_DESIGN_ONE_PROPORTION,
  .validate = tf_one_proportion_validate,
  .compute = tf_one_proportion_compute,
  .densities = tf_one_proportion_densities,
  .sensitivity = tf_one_proportion_sensitivity,
  .sample_size = tf_one_proportion_sample_size,
  .null_distribution = tf_one_proportion_null_distribution,
  .model_probabilities = tf_one_proportion_model_probabilities,
};

const TfDesignClass *
tf_design_class (TfDesign design)
{
  switch (design)
    {
    case TF_DESIGN_ONE_PROPORTION:
      return &one_proportion;
    case TF_DESIGN_ONE_RATE:
      return &tf_one_rate_class;
    case TF_DESIGN_TWO_RATES:
      return &tf_two_rates_class;
    case TF_DESIGN_ONE_MEAN:
      return tf_one_mean_class ();
    case TF_DESIGN_PAIRED_MEANS:
      return tf_paired_means_class ();
    case TF_DESIGN_TWO_MEANS:
      return tf_two_means_class ();
    case TF_DESIGN_TWO_PROPORTIONS:
      return &tf_two_proportions_class;
    case TF_N_DESIGNS:
    default:
      return NULL;
    }
}
