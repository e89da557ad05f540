/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-proportions-class.c: the class of two proportions: successes in trials in groups A and B, against no difference (or θA − θB = d).
 */
#include "tf-two-proportions.h"
#include "tf-form-field-private.h"

#include <glib/gi18n-lib.h>

#define OFF(field) G_STRUCT_OFFSET (TfAnalysis, field)

static const TfDataNumber numbers[] = {
  { "SuccessesA", OFF (successes_a) },
  { "TrialsA", OFF (trials_a) },
  { "SuccessesB", OFF (successes_b) },
  { "TrialsB", OFF (trials_b) },
};

/* No difference under the null; uniform Beta(1, 1) priors. */
static void
defaults (TfAnalysis *analysis)
{
  analysis->null_value = 0.0;
  analysis->prior = TF_PRIOR_BETA;
}

static char *
data_words (const TfAnalysis *a)
{
  g_autofree char *ka = tf_format_double (a->successes_a), *na = tf_format_double (a->trials_a);
  g_autofree char *kb = tf_format_double (a->successes_b), *nb = tf_format_double (a->trials_b);

  return g_strdup_printf (_("The data: %s successes in %s trials in group A, %s in %s in group B."),
                          ka, na, kb, nb);
}
static const char *const directions[] = {
  N_("Two-sided: θA − θB ≠ Δ₀"), N_("Greater: θA − θB > Δ₀"), N_("Less: θA − θB < Δ₀"), NULL,
};

static const TfFormField fields[] = {
  FORM_DATA ("SuccessesA", N_("_Successes in A"), N_("With the outcome"),
             TF_FIELD_COUNT, TF_SHOWN_ALWAYS, TRUE, successes_a),
  FORM_DATA ("TrialsA", N_("_Trials in A"), N_("All of group A"), TF_FIELD_COUNT,
             TF_SHOWN_ALWAYS, FALSE, trials_a),
  FORM_DATA ("SuccessesB", N_("S_uccesses in B"), N_("With the outcome"),
             TF_FIELD_COUNT, TF_SHOWN_ALWAYS, TRUE, successes_b),
  FORM_DATA ("TrialsB", N_("T_rials in B"), N_("All of group B"), TF_FIELD_COUNT,
             TF_SHOWN_ALWAYS, FALSE, trials_b),
  FORM_NULL_VALUE (N_("_Null difference Δ₀"), N_("θA − θB under the null; 0 is no difference"),
                   TF_FIELD_NUMBER),
  FORM_DIRECTION (directions),
  FORM_BETA_PRIOR (N_("Beta prior of each group’s θ")),
  FORM_ALT ("PriorScale", N_("SD of the log odds ratio _prior"),
            N_("Normal prior on ln OR, for the second Bayes factor"), FALSE, prior_scale),
  FORM_MODELS_AND_OPTIONS,
};

static const TfIntervalMethod intervals[] = {
  { "ci", N_("Newcombe"), NULL },
  { "diff_ci", N_("Newcombe"), NULL },
  { "or_ci", N_("Woolf"), N_("the odds ratio") },
  { "rr_ci", N_("Katz"), N_("the risk ratio") },
};

const TfDesignClass tf_two_proportions_class = {
  .design = TF_DESIGN_TWO_PROPORTIONS,
  .name = "two-proportions",
  .label = N_("Two proportions"),
  .estimand = N_("the difference θA − θB"),
  .symbol = "θA − θB",
  .no_difference = "θA = θB",
  .group_parameters = "θA and θB",
  .data_words = data_words,
  TF_DESIGN_TABLE (numbers, numbers),
  TF_DESIGN_TABLE (fields, fields),
  TF_DESIGN_TABLE (intervals, intervals),
  .beta_with_scale = TRUE,
  .defaults = defaults,
  .validate = tf_two_proportions_validate,
  .compute = tf_two_proportions_compute,
  .densities = tf_two_proportions_densities,
  .sensitivity = tf_two_proportions_sensitivity,
  .sample_size = tf_two_proportions_sample_size,
  .null_distribution = tf_two_proportions_null_distribution,
  .model_probabilities = tf_two_proportions_model_probabilities,
};
