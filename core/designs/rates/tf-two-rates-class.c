/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-rates-class.c: the class of two Poisson rates: events over exposures in groups A and B, against a rate ratio.
 */
#include "tf-two-rates.h"
#include "tf-rates-curves.h"

#include <glib/gi18n-lib.h>

#define OFF(field) G_STRUCT_OFFSET (TfAnalysis, field)

static const TfDataNumber numbers[] = {
  { "EventsA", OFF (events_a) },
  { "ExposureA", OFF (exposure_a) },
  { "EventsB", OFF (events_b) },
  { "ExposureB", OFF (exposure_b) },
};

const TfDesignClass tf_two_rates_class = {
  .design = TF_DESIGN_TWO_RATES,
  .name = "two-rates",
  .label = N_("Two rates"),
  .numbers = numbers,
  .n_numbers = G_N_ELEMENTS (numbers),
  .defaults = tf_rates_defaults,
  .validate = tf_two_rates_validate,
  .compute = tf_two_rates_compute,
  .densities = tf_two_rates_densities,
  .sensitivity = tf_rates_sensitivity,
  .sample_size = tf_two_rates_sample_size,
  .null_distribution = tf_two_rates_null_distribution,
};
