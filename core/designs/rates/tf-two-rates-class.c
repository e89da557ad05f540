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

static char *
data_words (const TfAnalysis *a)
{
  g_autofree char *ea = tf_format_double (a->events_a), *ta = tf_format_double (a->exposure_a);
  g_autofree char *eb = tf_format_double (a->events_b), *tb = tf_format_double (a->exposure_b);

  return g_strdup_printf (_("The data: %s events over an exposure of %s in group A, %s over %s in group B."),
                          ea, ta, eb, tb);
}

static const char *
interval_method (const TfAnalysis *analysis)
{
  return _("conditional Clopper–Pearson");
}

const TfDesignClass tf_two_rates_class = {
  .design = TF_DESIGN_TWO_RATES,
  .name = "two-rates",
  .label = N_("Two rates"),
  .estimand = N_("the rate ratio λA/λB"),
  .symbol = "λA/λB",
  .no_difference = "λA = λB",
  .group_parameters = "λA and λB",
  .data_words = data_words,
  .interval_method = interval_method,
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
