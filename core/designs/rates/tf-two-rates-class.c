/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-rates-class.c: the class of two Poisson rates: events over exposures in groups A and B, against a rate ratio.
 */
#include "tf-two-rates.h"
#include "tf-rates.h"
#include "tf-form-field-private.h"

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
static const char *const directions[] = {
  N_("Two-sided: λA ÷ λB ≠ ρ₀"), N_("Greater: λA ÷ λB > ρ₀"), N_("Less: λA ÷ λB < ρ₀"), NULL,
};

static const TfFormField fields[] = {
  FORM_DATA ("EventsA", N_("_Events in A"), N_("Counted in group A"), TF_FIELD_COUNT,
             TF_SHOWN_ALWAYS, TRUE, events_a),
  FORM_DATA ("ExposureA", N_("E_xposure of A"), N_("Observed in group A"), TF_FIELD_POSITIVE,
             TF_SHOWN_ALWAYS, FALSE, exposure_a),
  FORM_DATA ("EventsB", N_("E_vents in B"), N_("Counted in group B"), TF_FIELD_COUNT,
             TF_SHOWN_ALWAYS, TRUE, events_b),
  FORM_DATA ("ExposureB", N_("Ex_posure of B"), N_("Observed in group B"), TF_FIELD_POSITIVE,
             TF_SHOWN_ALWAYS, FALSE, exposure_b),
  FORM_NULL_VALUE (N_("_Null rate ratio ρ₀"), N_("λA ÷ λB under the null; 1 is no difference"),
                   TF_FIELD_POSITIVE),
  FORM_DIRECTION (directions),
  FORM_GAMMA_PRIOR (N_("Gamma prior of each group’s λ")),
  FORM_MODELS_AND_OPTIONS,
};

static const TfIntervalMethod intervals[] = {
  { "ci", N_("conditional Clopper–Pearson"), NULL },
};

const TfDesignClass tf_two_rates_class = {
  .design = TF_DESIGN_TWO_RATES,
  .name = "two-rates",
  .label = N_("Two rates"),
  .estimand = N_("the rate ratio λA/λB"),
  .symbol = "λA/λB",
  .no_difference = "λA = λB",
  .group_parameters = "λA and λB",
  .data_words = data_words,
  TF_DESIGN_TABLE (numbers, numbers),
  TF_DESIGN_TABLE (fields, fields),
  TF_DESIGN_TABLE (intervals, intervals),
  .defaults = tf_rates_defaults,
  .validate = tf_two_rates_validate,
  .compute = tf_two_rates_compute,
  .densities = tf_two_rates_densities,
  .sensitivity = tf_two_rates_sensitivity,
  .sample_size = tf_two_rates_sample_size,
  .null_distribution = tf_two_rates_null_distribution,
};
