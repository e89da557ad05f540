/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-rate-class.c: the class of one Poisson rate: events over an exposure against λ = λ0.
 */
#include "tf-one-rate.h"
#include "tf-rates.h"
#include "tf-form-field-private.h"

#include <glib/gi18n-lib.h>

#define OFF(field) G_STRUCT_OFFSET (TfAnalysis, field)

static const TfDataNumber numbers[] = {
  { "Events", OFF (events) },
  { "Exposure", OFF (exposure) },
};

static char *
data_words (const TfAnalysis *a)
{
  g_autofree char *events = tf_format_double (a->events), *exposure = tf_format_double (a->exposure);

  return g_strdup_printf (_("The data: %s events over an exposure of %s."), events, exposure);
}
static const char *const directions[] = {
  N_("Two-sided: λ ≠ λ₀"), N_("Greater: λ > λ₀"), N_("Less: λ < λ₀"), NULL,
};

static const TfFormField fields[] = {
  FORM_DATA ("Events", N_("_Events"), N_("Events counted"), TF_FIELD_COUNT, TF_SHOWN_ALWAYS,
             TRUE, events),
  FORM_DATA ("Exposure", N_("E_xposure"), N_("Time, area or volume observed"),
             TF_FIELD_POSITIVE, TF_SHOWN_ALWAYS, FALSE, exposure),
  FORM_NULL_VALUE (N_("_Null rate λ₀"), N_("Events per unit of exposure under the null"),
                   TF_FIELD_POSITIVE),
  FORM_DIRECTION (directions),
  FORM_GAMMA_PRIOR (N_("Gamma prior of λ")),
  FORM_MODELS_AND_OPTIONS,
};

static const TfIntervalMethod intervals[] = {
  { "ci", N_("Garwood"), NULL },
};

const TfDesignClass tf_one_rate_class = {
  .design = TF_DESIGN_ONE_RATE,
  .name = "one-rate",
  .label = N_("One rate"),
  .estimand = N_("the rate λ"),
  .symbol = "λ",
  .data_words = data_words,
  TF_DESIGN_TABLE (numbers, numbers),
  TF_DESIGN_TABLE (fields, fields),
  TF_DESIGN_TABLE (intervals, intervals),
  .null_value_required = TRUE,
  .defaults = tf_rates_defaults,
  .validate = tf_one_rate_validate,
  .compute = tf_one_rate_compute,
  .densities = tf_one_rate_densities,
  .sensitivity = tf_one_rate_sensitivity,
  .sample_size = tf_one_rate_sample_size,
  .null_distribution = tf_one_rate_null_distribution,
};
