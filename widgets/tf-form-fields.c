/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-form-fields.c: the field table of every design. The form reads it and builds the
 * same kind of row for each field, so a design is a list here rather than a widget file.
 */
#include <glib/gi18n-lib.h>
#include "tf-form-fields.h"

#define OFF(member) G_STRUCT_OFFSET (TfAnalysis, member)

#define NUM(grp, k, lab, hnt, kd, sec, shw, pr, member) \
  { .group = grp, .key = k, .label = lab, .hint = hnt, .kind = kd, .section = sec, \
    .shown = shw, .pair = pr, .offset = OFF (member) }
#define DATA(k, lab, hnt, kd, shw, pr, member) \
  NUM ("Data", k, lab, hnt, kd, TF_SECTION_DATA, shw, pr, member)
#define NULL_VALUE(lab, hnt, kd) \
  NUM ("Null", "Value", lab, hnt, kd, TF_SECTION_NULL, TF_SHOWN_ALWAYS, FALSE, null_value)
#define DIRECTION(labels) \
  { .group = "Alternative", .key = "Direction", .label = N_("_Direction"), \
    .hint = N_("Where the alternative puts the effect"), .kind = TF_FIELD_CHOICE, \
    .section = TF_SECTION_ALTERNATIVE, .choices = labels, .choice_values = direction_values }
#define ALT(k, lab, hnt, pr, member) \
  NUM ("Alternative", k, lab, hnt, TF_FIELD_POSITIVE, TF_SECTION_ALTERNATIVE, \
       TF_SHOWN_ALWAYS, pr, member)
#define MODELS_AND_OPTIONS \
  NUM ("Models", "PriorNull", N_("_Prior probability of the null"), \
       N_("Before the data; 0.5 gives both models equal odds"), TF_FIELD_PROBABILITY, \
       TF_SECTION_MODELS, TF_SHOWN_ALWAYS, FALSE, prior_null), \
  NUM ("Options", "Level", N_("_Level"), N_("Of the confidence and credible intervals"), \
       TF_FIELD_PROBABILITY, TF_SECTION_OPTIONS, TF_SHOWN_ALWAYS, FALSE, level)
#define BETA_PRIOR(hnt) \
  ALT ("PriorA", N_("Prior shape _a"), hnt, TRUE, prior_a), \
  ALT ("PriorB", N_("Prior shape _b"), N_("a = b = 1 is uniform"), FALSE, prior_b)
#define GAMMA_PRIOR(hnt) \
  ALT ("PriorShape", N_("Prior _shape"), hnt, TRUE, prior_shape), \
  ALT ("PriorRate", N_("Prior _rate"), N_("Its mean is shape ÷ rate"), FALSE, prior_rate)
#define EFFECT_PRIOR \
  { .group = "Alternative", .key = "Prior", .label = N_("Effect _prior"), \
    .hint = N_("Of the standardised effect δ under H₁"), .kind = TF_FIELD_CHOICE, \
    .section = TF_SECTION_ALTERNATIVE, .choices = effect_prior_labels, \
    .choice_values = effect_prior_values }, \
  ALT ("PriorScale", N_("Prior _scale r"), N_("A larger r expects larger effects"), FALSE, \
       prior_scale)

static const int direction_values[] = {
  TF_DIRECTION_TWO_SIDED, TF_DIRECTION_GREATER, TF_DIRECTION_LESS,
};

static const char *const effect_prior_labels[] = { N_("Cauchy (JZS)"), N_("Normal"), NULL };
static const int effect_prior_values[] = { TF_PRIOR_CAUCHY, TF_PRIOR_NORMAL };

static const char *const one_proportion_directions[] = {
  N_("Two-sided: θ ≠ θ₀"), N_("Greater: θ > θ₀"), N_("Less: θ < θ₀"), NULL,
};
static const char *const two_proportions_directions[] = {
  N_("Two-sided: θA − θB ≠ Δ₀"), N_("Greater: θA − θB > Δ₀"), N_("Less: θA − θB < Δ₀"), NULL,
};
static const char *const one_mean_directions[] = {
  N_("Two-sided: μ ≠ μ₀"), N_("Greater: μ > μ₀"), N_("Less: μ < μ₀"), NULL,
};
static const char *const paired_directions[] = {
  N_("Two-sided: μ of A − B ≠ Δ₀"), N_("Greater: μ of A − B > Δ₀"),
  N_("Less: μ of A − B < Δ₀"), NULL,
};
static const char *const two_means_directions[] = {
  N_("Two-sided: μA − μB ≠ Δ₀"), N_("Greater: μA − μB > Δ₀"), N_("Less: μA − μB < Δ₀"), NULL,
};
static const char *const one_rate_directions[] = {
  N_("Two-sided: λ ≠ λ₀"), N_("Greater: λ > λ₀"), N_("Less: λ < λ₀"), NULL,
};
static const char *const two_rates_directions[] = {
  N_("Two-sided: λA ÷ λB ≠ ρ₀"), N_("Greater: λA ÷ λB > ρ₀"), N_("Less: λA ÷ λB < ρ₀"), NULL,
};

static const TfFormField one_proportion[] = {
  DATA ("Successes", N_("_Successes"), N_("Trials with the outcome"), TF_FIELD_COUNT,
        TF_SHOWN_ALWAYS, TRUE, successes),
  DATA ("Trials", N_("_Trials"), N_("All trials, n"), TF_FIELD_COUNT, TF_SHOWN_ALWAYS, FALSE,
        trials),
  NULL_VALUE (N_("_Null value θ₀"), N_("The proportion the null model states"),
              TF_FIELD_PROBABILITY),
  DIRECTION (one_proportion_directions),
  BETA_PRIOR (N_("Beta prior of θ")),
  MODELS_AND_OPTIONS,
};

static const TfFormField two_proportions[] = {
  DATA ("SuccessesA", N_("_Successes in A"), N_("With the outcome"),
        TF_FIELD_COUNT, TF_SHOWN_ALWAYS, TRUE, successes_a),
  DATA ("TrialsA", N_("_Trials in A"), N_("All of group A"), TF_FIELD_COUNT,
        TF_SHOWN_ALWAYS, FALSE, trials_a),
  DATA ("SuccessesB", N_("S_uccesses in B"), N_("With the outcome"),
        TF_FIELD_COUNT, TF_SHOWN_ALWAYS, TRUE, successes_b),
  DATA ("TrialsB", N_("T_rials in B"), N_("All of group B"), TF_FIELD_COUNT,
        TF_SHOWN_ALWAYS, FALSE, trials_b),
  NULL_VALUE (N_("_Null difference Δ₀"), N_("θA − θB under the null; 0 is no difference"),
              TF_FIELD_NUMBER),
  DIRECTION (two_proportions_directions),
  BETA_PRIOR (N_("Beta prior of each group’s θ")),
  ALT ("PriorScale", N_("SD of the log odds ratio _prior"),
       N_("Normal prior on ln OR, for the second Bayes factor"), FALSE, prior_scale),
  MODELS_AND_OPTIONS,
};

static const TfFormField one_mean[] = {
  DATA ("N", N_("Sample size _n"), N_("Number of observations"), TF_FIELD_COUNT,
        TF_SHOWN_SUMMARIES, TRUE, n),
  DATA ("Mean", N_("_Mean"), N_("Sample mean"), TF_FIELD_NUMBER, TF_SHOWN_SUMMARIES, FALSE,
        mean),
  DATA ("SD", N_("_SD"), N_("Sample standard deviation s"), TF_FIELD_POSITIVE,
        TF_SHOWN_SUMMARIES, FALSE, sd),
  DATA ("Values", N_("_Values"), N_("Separated by ‘;’, spaces or new lines"), TF_FIELD_LIST,
        TF_SHOWN_VALUES, FALSE, values),
  { .group = "Data", .key = "KnownSD", .label = N_("_Known SD σ"),
    .hint = N_("On when σ is known: a z test in place of t"), .kind = TF_FIELD_OPTIONAL_NUMBER,
    .section = TF_SECTION_DATA, .offset = OFF (known_sd), .flag_offset = OFF (has_known_sd) },
  NULL_VALUE (N_("_Null mean μ₀"), N_("The mean the null model states"), TF_FIELD_NUMBER),
  DIRECTION (one_mean_directions),
  EFFECT_PRIOR,
  MODELS_AND_OPTIONS,
};

static const TfFormField paired_means[] = {
  DATA ("N", N_("_Pairs n"), N_("Number of pairs"), TF_FIELD_COUNT, TF_SHOWN_SUMMARIES, TRUE, n),
  DATA ("MeanDiff", N_("_Mean difference"), N_("Mean of A − B"), TF_FIELD_NUMBER,
        TF_SHOWN_SUMMARIES, FALSE, mean),
  DATA ("SDDiff", N_("_SD of the differences"), N_("Standard deviation of A − B"),
        TF_FIELD_POSITIVE, TF_SHOWN_SUMMARIES, FALSE, sd),
  DATA ("ValuesA", N_("Values _A"), N_("One per pair"), TF_FIELD_LIST, TF_SHOWN_VALUES, TRUE,
        values_a),
  DATA ("ValuesB", N_("Values _B"), N_("In the same order as A"), TF_FIELD_LIST,
        TF_SHOWN_VALUES, FALSE, values_b),
  NULL_VALUE (N_("_Null difference Δ₀"), N_("Mean of A − B under the null; 0 is no difference"),
              TF_FIELD_NUMBER),
  DIRECTION (paired_directions),
  EFFECT_PRIOR,
  MODELS_AND_OPTIONS,
};

static const TfFormField two_means[] = {
  DATA ("NA", N_("Size of _A"), N_("Observations in A"), TF_FIELD_COUNT,
        TF_SHOWN_SUMMARIES, TRUE, n_a),
  DATA ("NB", N_("Size of _B"), N_("Observations in B"), TF_FIELD_COUNT,
        TF_SHOWN_SUMMARIES, FALSE, n_b),
  DATA ("MeanA", N_("_Mean of A"), N_("Sample mean of A"), TF_FIELD_NUMBER,
        TF_SHOWN_SUMMARIES, TRUE, mean_a),
  DATA ("MeanB", N_("M_ean of B"), N_("Sample mean of B"), TF_FIELD_NUMBER,
        TF_SHOWN_SUMMARIES, FALSE, mean_b),
  DATA ("SDA", N_("_SD of A"), N_("Sample SD of A"), TF_FIELD_POSITIVE,
        TF_SHOWN_SUMMARIES, TRUE, sd_a),
  DATA ("SDB", N_("S_D of B"), N_("Sample SD of B"), TF_FIELD_POSITIVE,
        TF_SHOWN_SUMMARIES, FALSE, sd_b),
  DATA ("ValuesA", N_("Values of _A"), N_("Separated by ‘;’, spaces or new lines"),
        TF_FIELD_LIST, TF_SHOWN_VALUES, TRUE, values_a),
  DATA ("ValuesB", N_("Values of _B"), N_("Group B, the same way"), TF_FIELD_LIST,
        TF_SHOWN_VALUES, FALSE, values_b),
  DATA ("EqualVariances", N_("E_qual variances"), N_("On: Student’s t; off: Welch’s t"),
        TF_FIELD_SWITCH, TF_SHOWN_ALWAYS, FALSE, equal_variances),
  NULL_VALUE (N_("_Null difference Δ₀"), N_("μA − μB under the null; 0 is no difference"),
              TF_FIELD_NUMBER),
  DIRECTION (two_means_directions),
  EFFECT_PRIOR,
  MODELS_AND_OPTIONS,
};

static const TfFormField one_rate[] = {
  DATA ("Events", N_("_Events"), N_("Events counted"), TF_FIELD_COUNT, TF_SHOWN_ALWAYS, TRUE,
        events),
  DATA ("Exposure", N_("E_xposure"), N_("Time, area or volume observed"), TF_FIELD_POSITIVE,
        TF_SHOWN_ALWAYS, FALSE, exposure),
  NULL_VALUE (N_("_Null rate λ₀"), N_("Events per unit of exposure under the null"),
              TF_FIELD_POSITIVE),
  DIRECTION (one_rate_directions),
  GAMMA_PRIOR (N_("Gamma prior of λ")),
  MODELS_AND_OPTIONS,
};

static const TfFormField two_rates[] = {
  DATA ("EventsA", N_("_Events in A"), N_("Counted in group A"), TF_FIELD_COUNT,
        TF_SHOWN_ALWAYS, TRUE, events_a),
  DATA ("ExposureA", N_("E_xposure of A"), N_("Observed in group A"), TF_FIELD_POSITIVE,
        TF_SHOWN_ALWAYS, FALSE, exposure_a),
  DATA ("EventsB", N_("E_vents in B"), N_("Counted in group B"), TF_FIELD_COUNT,
        TF_SHOWN_ALWAYS, TRUE, events_b),
  DATA ("ExposureB", N_("Ex_posure of B"), N_("Observed in group B"), TF_FIELD_POSITIVE,
        TF_SHOWN_ALWAYS, FALSE, exposure_b),
  NULL_VALUE (N_("_Null rate ratio ρ₀"), N_("λA ÷ λB under the null; 1 is no difference"),
              TF_FIELD_POSITIVE),
  DIRECTION (two_rates_directions),
  GAMMA_PRIOR (N_("Gamma prior of each group’s λ")),
  MODELS_AND_OPTIONS,
};

#define DESIGN(d, modes, table, family) \
  [d] = { .design = d, .has_modes = modes, .fields = table, .n_fields = G_N_ELEMENTS (table), \
          .prior = family }

static const TfFormDesign designs[TF_N_DESIGNS] = {
  DESIGN (TF_DESIGN_ONE_PROPORTION, FALSE, one_proportion, TF_PRIOR_BETA),
  DESIGN (TF_DESIGN_TWO_PROPORTIONS, FALSE, two_proportions, TF_PRIOR_BETA),
  DESIGN (TF_DESIGN_ONE_MEAN, TRUE, one_mean, TF_PRIOR_CAUCHY),
  DESIGN (TF_DESIGN_PAIRED_MEANS, TRUE, paired_means, TF_PRIOR_CAUCHY),
  DESIGN (TF_DESIGN_TWO_MEANS, TRUE, two_means, TF_PRIOR_CAUCHY),
  DESIGN (TF_DESIGN_ONE_RATE, FALSE, one_rate, TF_PRIOR_GAMMA),
  DESIGN (TF_DESIGN_TWO_RATES, FALSE, two_rates, TF_PRIOR_GAMMA),
};

const TfFormDesign *
tf_form_design (TfDesign design)
{
  g_return_val_if_fail ((guint) design < TF_N_DESIGNS, NULL);
  return &designs[design];
}

char *
tf_form_field_name (const TfFormField *field)
{
  const char *label = _(field->label);
  GString *name = g_string_new (NULL);

  for (const char *p = label; *p; p++)
    if (*p != '_')
      g_string_append_c (name, *p);
  return g_string_free (name, FALSE);
}
