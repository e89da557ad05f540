/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means-class.c: the classes of one mean, paired means and two means. Each design
 * gives its statistics (tf-one-mean.c, tf-two-means.c); the numbers and curves that
 * follow from them are the same for all three (tf-means.c, tf-means-curves.c).
 */
#include "tf-means-class.h"
#include "tf-means.h"
#include "tf-one-mean.h"
#include "tf-two-means.h"
#include "tf-form-field-private.h"

#include <glib/gi18n-lib.h>

/* The statistics of the design at hand: two samples, or one (a mean, or the differences
 * within pairs). */
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

static const char *const one_mean_directions[] = {
  N_("Two-sided: μ ≠ μ₀"), N_("Greater: μ > μ₀"), N_("Less: μ < μ₀"), NULL,
};

static const TfFormField one_mean_fields[] = {
  FORM_DATA ("N", N_("Sample size _n"), N_("Number of observations"), TF_FIELD_COUNT,
             TF_SHOWN_SUMMARIES, TRUE, n),
  FORM_DATA ("Mean", N_("_Mean"), N_("Sample mean"), TF_FIELD_NUMBER, TF_SHOWN_SUMMARIES,
             FALSE, mean),
  FORM_DATA ("SD", N_("_SD"), N_("Sample standard deviation s"), TF_FIELD_POSITIVE,
             TF_SHOWN_SUMMARIES, FALSE, sd),
  FORM_DATA ("Values", N_("_Values"), N_("Separated by ‘;’, spaces or new lines"),
             TF_FIELD_LIST, TF_SHOWN_VALUES, FALSE, values),
  { .group = "Data", .key = "KnownSD", .label = N_("_Known SD σ"),
    .hint = N_("On when σ is known: a z test in place of t"), .kind = TF_FIELD_OPTIONAL_NUMBER,
    .section = TF_SECTION_DATA, .offset = OFF (known_sd), .flag_offset = OFF (has_known_sd) },
  FORM_NULL_VALUE (N_("_Null mean μ₀"), N_("The mean the null model states"), TF_FIELD_NUMBER),
  FORM_DIRECTION (one_mean_directions),
  FORM_EFFECT_PRIOR,
  FORM_MODELS_AND_OPTIONS,
};

static const char *const paired_means_directions[] = {
  N_("Two-sided: μ of A − B ≠ Δ₀"), N_("Greater: μ of A − B > Δ₀"),
  N_("Less: μ of A − B < Δ₀"), NULL,
};

static const TfFormField paired_means_fields[] = {
  FORM_DATA ("N", N_("_Pairs n"), N_("Number of pairs"), TF_FIELD_COUNT, TF_SHOWN_SUMMARIES,
             TRUE, n),
  FORM_DATA ("MeanDiff", N_("_Mean difference"), N_("Mean of A − B"), TF_FIELD_NUMBER,
             TF_SHOWN_SUMMARIES, FALSE, mean),
  FORM_DATA ("SDDiff", N_("_SD of the differences"), N_("Standard deviation of A − B"),
             TF_FIELD_POSITIVE, TF_SHOWN_SUMMARIES, FALSE, sd),
  FORM_DATA ("ValuesA", N_("Values _A"), N_("One per pair"), TF_FIELD_LIST, TF_SHOWN_VALUES,
             TRUE, values_a),
  FORM_DATA ("ValuesB", N_("Values _B"), N_("In the same order as A"), TF_FIELD_LIST,
             TF_SHOWN_VALUES, FALSE, values_b),
  FORM_NULL_VALUE (N_("_Null difference Δ₀"),
                   N_("Mean of A − B under the null; 0 is no difference"), TF_FIELD_NUMBER),
  FORM_DIRECTION (paired_means_directions),
  FORM_EFFECT_PRIOR,
  FORM_MODELS_AND_OPTIONS,
};

static const char *const two_means_directions[] = {
  N_("Two-sided: μA − μB ≠ Δ₀"), N_("Greater: μA − μB > Δ₀"), N_("Less: μA − μB < Δ₀"), NULL,
};

static const TfFormField two_means_fields[] = {
  FORM_DATA ("NA", N_("Size of _A"), N_("Observations in A"), TF_FIELD_COUNT,
             TF_SHOWN_SUMMARIES, TRUE, n_a),
  FORM_DATA ("NB", N_("Size of _B"), N_("Observations in B"), TF_FIELD_COUNT,
             TF_SHOWN_SUMMARIES, FALSE, n_b),
  FORM_DATA ("MeanA", N_("_Mean of A"), N_("Sample mean of A"), TF_FIELD_NUMBER,
             TF_SHOWN_SUMMARIES, TRUE, mean_a),
  FORM_DATA ("MeanB", N_("M_ean of B"), N_("Sample mean of B"), TF_FIELD_NUMBER,
             TF_SHOWN_SUMMARIES, FALSE, mean_b),
  FORM_DATA ("SDA", N_("_SD of A"), N_("Sample SD of A"), TF_FIELD_POSITIVE,
             TF_SHOWN_SUMMARIES, TRUE, sd_a),
  FORM_DATA ("SDB", N_("S_D of B"), N_("Sample SD of B"), TF_FIELD_POSITIVE,
             TF_SHOWN_SUMMARIES, FALSE, sd_b),
  FORM_DATA ("ValuesA", N_("Values of _A"), N_("Separated by ‘;’, spaces or new lines"),
             TF_FIELD_LIST, TF_SHOWN_VALUES, TRUE, values_a),
  FORM_DATA ("ValuesB", N_("Values of _B"), N_("Group B, the same way"), TF_FIELD_LIST,
             TF_SHOWN_VALUES, FALSE, values_b),
  FORM_DATA ("EqualVariances", N_("E_qual variances"), N_("On: Student’s t; off: Welch’s t"),
             TF_FIELD_SWITCH, TF_SHOWN_ALWAYS, FALSE, equal_variances),
  FORM_NULL_VALUE (N_("_Null difference Δ₀"), N_("μA − μB under the null; 0 is no difference"),
                   TF_FIELD_NUMBER),
  FORM_DIRECTION (two_means_directions),
  FORM_EFFECT_PRIOR,
  FORM_MODELS_AND_OPTIONS,
};

/* The main confidence interval's method (the statistic it inverts); the others are in
 * the table. */
static const char *
one_mean_method_of (const TfAnalysis *analysis, const char *id)
{
  if (!g_str_has_prefix (id, "ci_"))
    return NULL;
  return analysis->has_known_sd ? _("z") : _("t");
}

static const char *
two_means_method_of (const TfAnalysis *analysis, const char *id)
{
  if (!g_str_has_prefix (id, "ci_"))
    return NULL;
  return analysis->equal_variances ? _("Student") : _("Welch");
}

static const TfIntervalMethod means_intervals[] = {
  { "effect_ci", N_("noncentral t"), N_("Cohen's d") },
};

/* The prior is on the standardised effect δ, so the credible intervals are of δ. */
#define MEANS_INTERVALS                              \
  TF_DESIGN_TABLE (intervals, means_intervals),      \
  .credible_of = N_("δ")

#define MEANS_HOOKS                                  \
  .defaults = means_defaults,                        \
  .compute = class_compute,                          \
  .densities = class_densities,                      \
  .sensitivity = class_sensitivity,                  \
  .sample_size = class_sample_size,                  \
  .null_distribution = class_null_distribution

/* "group A: n = 12, mean 3.1, SD 0.8 (from the 12 values given)"; inputs as the file
 * holds them (shortest round-trip digits). */
static char *
sample_words (const char *name, double n, double mean, double sd, const GArray *values)
{
  g_autofree char *sn = tf_format_double (n), *sm = tf_format_double (mean);
  g_autofree char *ss = tf_format_double (sd);
  g_autofree char *from = values ? g_strdup_printf (_(" (from the %u values given)"), values->len)
                                 : g_strdup ("");

  /* TRANSLATORS: "group A: n = 12, mean 3.1, SD 0.8 (from the 12 values given)" */
  return g_strdup_printf (_("%s: n = %s, mean %s, SD %s%s"), name, sn, sm, ss, from);
}

/* One sample (of values or of differences within pairs), its SD estimated or known. */
static char *
one_sample_data_words (const TfAnalysis *a, const char *name, const GArray *values)
{
  g_autofree char *sample = sample_words (name, a->n, a->mean, a->sd, values);
  g_autofree char *sd = NULL;

  if (!a->has_known_sd)
    return g_strdup_printf (_("The data: %s."), sample);
  sd = tf_format_double (a->known_sd);
  return g_strdup_printf (_("The data: %s; the SD is taken as known, %s (a z test)."), sample, sd);
}

static char *
one_mean_data_words (const TfAnalysis *a)
{
  return one_sample_data_words (a, _("one sample"), a->values);
}

static char *
paired_means_data_words (const TfAnalysis *a)
{
  return one_sample_data_words (a, _("differences A − B within pairs"), a->values_a);
}

static char *
two_means_data_words (const TfAnalysis *a)
{
  g_autofree char *ga = sample_words (_("group A"), a->n_a, a->mean_a, a->sd_a, a->values_a);
  g_autofree char *gb = sample_words (_("group B"), a->n_b, a->mean_b, a->sd_b, a->values_b);

  return g_strdup_printf (a->equal_variances
                          ? _("The data: %s; %s. The variances are taken as equal (Student).")
                          : _("The data: %s; %s. The variances are not taken as equal (Welch)."),
                          ga, gb);
}

/* Under Welch's test the classical numbers do not assume equal SDs, but the Bayes
 * factors, δ and its intervals come from Student's pooled t: the reader is told. */
static const char *
two_means_bayes_factor_note (const TfAnalysis *analysis)
{
  if (analysis->equal_variances)
    return NULL;
  return _("Here the Bayes factor and the standardised effect δ assume that the "
           "two groups share one SD: they use Student's pooled t, while the "
           "p-value and the confidence interval are Welch's and do not assume "
           "it. When the SDs differ much, the two readings can disagree for "
           "that reason alone.");
}

/* The prior, the credible interval and an interval null are on the standardised effect. */
#define MEANS_WORDS                                  \
  .parameter = N_("the standardised effect δ"),      \
  .interval_symbol = "δ"

const TfDesignClass tf_one_mean_class = {
  .design = TF_DESIGN_ONE_MEAN,
  .name = "one-mean",
  .label = N_("One mean"),
  .estimand = N_("the mean μ"),
  .symbol = "μ",
  .data_words = one_mean_data_words,
  MEANS_WORDS,
  TF_DESIGN_TABLE (samples, one_mean_samples),
  TF_DESIGN_TABLE (fields, one_mean_fields),
  .method_of = one_mean_method_of,
  MEANS_INTERVALS,
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
  .estimand = N_("the mean difference within pairs"),
  .symbol = N_("the mean difference"),
  .data_words = paired_means_data_words,
  MEANS_WORDS,
  TF_DESIGN_TABLE (samples, paired_means_samples),
  TF_DESIGN_TABLE (fields, paired_means_fields),
  .method_of = one_mean_method_of,
  MEANS_INTERVALS,
  .summarise = tf_paired_means_summarise,
  .validate = tf_one_mean_validate,
  MEANS_HOOKS,
};

const TfDesignClass tf_two_means_class = {
  .design = TF_DESIGN_TWO_MEANS,
  .name = "two-means",
  .label = N_("Two means"),
  .estimand = N_("the difference of means μA − μB"),
  .symbol = "μA − μB",
  .data_words = two_means_data_words,
  .bayes_factor_note = two_means_bayes_factor_note,
  MEANS_WORDS,
  TF_DESIGN_TABLE (samples, two_means_samples),
  TF_DESIGN_TABLE (fields, two_means_fields),
  .method_of = two_means_method_of,
  MEANS_INTERVALS,
  .equal_variances = TRUE,
  .summarise = tf_two_means_summarise,
  .validate = tf_two_means_validate,
  MEANS_HOOKS,
};
