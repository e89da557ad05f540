/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-proportion-class.c: the class of one proportion: k successes in n trials
 * against θ = θ0 (a point or an interval), or a model set of hypotheses about θ.
 */
#include "tf-one-proportion.h"
#include "tf-one-proportion-private.h"
#include "tf-logspace.h"
#include "tf-form-field-private.h"

#include <glib/gi18n-lib.h>
#include <math.h>

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

static char *
data_words (const TfAnalysis *a)
{
  g_autofree char *k = tf_format_double (a->successes), *n = tf_format_double (a->trials);

  return g_strdup_printf (_("The data: %s successes in %s trials."), k, n);
}

/* Thresholds of the disagreement's conditions, common practice: a sample is large from
 * 10^4, an effect is small when it is under half the prior's SD, a null is precise when
 * it is a point or narrower than a tenth of the prior's SD, and a prior is diffuse when
 * its SD exceeds ten posterior SDs. */
#define LARGE_N 1e4
#define SMALL_EFFECT 0.5
#define PRECISE_NULL 0.1
#define DIFFUSE_PRIOR 10.0

/* Lindley's paradox (Lindley 1957) and its kin: large n, small effect, precise null,
 * diffuse prior. */
static guint
disagreement_conditions (const TfAnalysis *an, GString *text)
{
  const double k = an->successes, n = an->trials;
  double L = an->null_kind == TF_NULL_POINT ? an->null_value : an->null_low;
  double H = an->null_kind == TF_NULL_POINT ? an->null_value : an->null_high;
  double est = k / n;
  double effect = est < L ? L - est : est > H ? est - H : 0.0;
  double prior_sd = tf_beta_sd (an->prior_a, an->prior_b);
  double post_sd = tf_beta_sd (k + an->prior_a, n - k + an->prior_b);
  guint held = 0;

  if (n >= LARGE_N)
    {
      g_string_append_printf (text,
                              _(" The sample is large (n = %.0f): at a fixed p-value the Bayes factor for a point null grows like √n."),
                              n);
      held++;
    }
  if (effect < SMALL_EFFECT * prior_sd)
    {
      g_string_append_printf (text,
                              _(" The effect is small: the estimate lies %.3g from the null, under half the prior's SD (%.3g), so the alternative spent most of its prior on values the data rule out."),
                              effect, prior_sd);
      held++;
    }
  if (H - L < PRECISE_NULL * prior_sd)
    {
      g_string_append (text, an->null_kind == TF_NULL_POINT
                       ? _(" The null is precise: a single value, which takes all its prior probability to one point.")
                       : _(" The null is precise: its interval is narrower than a tenth of the prior's SD."));
      held++;
    }
  if (prior_sd > DIFFUSE_PRIOR * post_sd)
    {
      g_string_append_printf (text,
                              _(" The prior is diffuse: its SD (%.3g) is more than ten times the posterior's (%.3g), which penalises the alternative for its spread."),
                              prior_sd, post_sd);
      held++;
    }
  return held;
}
static const char *const directions[] = {
  N_("Two-sided: θ ≠ θ₀"), N_("Greater: θ > θ₀"), N_("Less: θ < θ₀"), NULL,
};

static const TfFormField fields[] = {
  FORM_DATA ("Successes", N_("_Successes"), N_("Trials with the outcome"), TF_FIELD_COUNT,
             TF_SHOWN_ALWAYS, TRUE, successes),
  FORM_DATA ("Trials", N_("_Trials"), N_("All trials, n"), TF_FIELD_COUNT, TF_SHOWN_ALWAYS,
             FALSE, trials),
  FORM_NULL_VALUE (N_("_Null value θ₀"), N_("The proportion the null model states"),
                   TF_FIELD_PROBABILITY),
  FORM_DIRECTION (directions),
  FORM_BETA_PRIOR (N_("Beta prior of θ")),
  FORM_MODELS_AND_OPTIONS,
};

static const TfIntervalMethod intervals[] = {
  { "ci", N_("Clopper–Pearson"), NULL },
  { "wilson", N_("Wilson"), NULL },
  { "wilson_cc", N_("Wilson, continuity-corrected"), NULL },
  { "jeffreys", N_("Jeffreys"), NULL },
  { "agresti_coull", N_("Agresti–Coull"), NULL },
};

const TfDesignClass tf_one_proportion_class = {
  .design = TF_DESIGN_ONE_PROPORTION,
  .name = "one-proportion",
  .label = N_("One proportion"),
  .estimand = N_("the proportion θ"),
  .symbol = "θ",
  .data_words = data_words,
  .disagreement_conditions = disagreement_conditions,
  .no_condition_words = N_(" None of large n, small effect, precise null or diffuse prior holds here."),
  TF_DESIGN_TABLE (numbers, numbers),
  TF_DESIGN_TABLE (fields, fields),
  TF_DESIGN_TABLE (intervals, intervals),
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
