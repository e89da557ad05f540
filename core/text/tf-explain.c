/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-explain.c: what each number measures, and what it does not, in plain words with
 * the live numbers. The side pane and the reports read the same text.
 */
#include "tf-explain.h"
#include "tf-design.h"
#include "tf-diagnostic.h"

#include <glib/gi18n-lib.h>
#include <math.h>

const char *
tf_caution_text (void)
{
  return _("Results depend on the model and the priors chosen. They do not replace review "
           "by a qualified statistician, and regulated work follows its own guidelines.");
}

void
tf_explanation_free (TfExplanation *explanation)
{
  if (explanation == NULL)
    return;
  g_free (explanation->title);
  g_free (explanation->measures);
  g_free (explanation->does_not);
  g_free (explanation);
}

static void
add (GPtrArray *list, const char *title, char *measures, char *does_not)
{
  TfExplanation *e = g_new (TfExplanation, 1);

  e->title = g_strdup (title);
  e->measures = measures;
  e->does_not = does_not;
  g_ptr_array_add (list, e);
}

/* The formatted value of a number, or "not defined". */
static char *
value_of (const TfResults *results, const char *id)
{
  const TfNumber *number = tf_results_lookup (results, id);

  return number ? tf_number_format (number) : g_strdup (_("not defined"));
}

static const char *
direction_words (TfDirection direction)
{
  switch (direction)
    {
    case TF_DIRECTION_GREATER: return _("data at least as far above the null value as those observed");
    case TF_DIRECTION_LESS: return _("data at least as far below the null value as those observed");
    case TF_DIRECTION_TWO_SIDED: break;
    }
  return _("data no more probable under it than those observed");
}

/* The quantity the estimate and the confidence interval are about, in words. */
static const char *
estimand_words (const TfAnalysis *a)
{
  return _(tf_design_class (a->design)->estimand);
}

/* The parameter the Bayesian numbers are about, when the design puts its prior on
 * another (the standardised effect δ). */
static const char *
parameter_words (const TfAnalysis *a)
{
  const TfDesignClass *klass = tf_design_class (a->design);

  return klass->parameter ? _(klass->parameter) : _(klass->estimand);
}

/* The null model in words, e.g. "θ = 0.5", "δ between -0.1 and 0.1", "θA = θB". */
static char *
null_words (const TfAnalysis *a)
{
  const TfDesignClass *klass = tf_design_class (a->design);
  g_autofree char *value = tf_format_value (a->null_value, TF_MEASURE_ESTIMATE);
  g_autofree char *low = tf_format_value (a->null_low, TF_MEASURE_ESTIMATE);
  g_autofree char *high = tf_format_value (a->null_high, TF_MEASURE_ESTIMATE);

  if (a->null_kind == TF_NULL_INTERVAL)
    return g_strdup_printf (_("%s between %s and %s"),
                            _(klass->interval_symbol ? klass->interval_symbol : klass->symbol),
                            low, high);
  if (klass->no_difference && a->null_value == 0.0)
    return g_strdup (klass->no_difference);
  return g_strdup_printf ("%s = %s", _(klass->symbol), value);
}

/* The prior under the alternative, e.g. "Beta(1, 1)" or "Cauchy(0, 0.7071)". */
static char *
prior_words (const TfAnalysis *a)
{
  g_autofree char *p1 = NULL, *p2 = NULL;

  switch (a->prior)
    {
    case TF_PRIOR_BETA:
      p1 = tf_format_value (a->prior_a, TF_MEASURE_ESTIMATE);
      p2 = tf_format_value (a->prior_b, TF_MEASURE_ESTIMATE);
      return g_strdup_printf ("Beta(%s, %s)", p1, p2);
    case TF_PRIOR_NORMAL:
      p1 = tf_format_value (a->prior_scale, TF_MEASURE_ESTIMATE);
      return g_strdup_printf (_("a normal distribution centred on 0 with SD %s"), p1);
    case TF_PRIOR_CAUCHY:
      p1 = tf_format_value (a->prior_scale, TF_MEASURE_ESTIMATE);
      return g_strdup_printf (_("a Cauchy distribution centred on 0 with scale %s"), p1);
    case TF_PRIOR_GAMMA:
      p1 = tf_format_value (a->prior_shape, TF_MEASURE_ESTIMATE);
      p2 = tf_format_value (a->prior_rate, TF_MEASURE_ESTIMATE);
      return g_strdup_printf (_("Gamma(shape %s, rate %s)"), p1, p2);
    }
  return g_strdup ("?");
}

static char *
alternative_words (const TfAnalysis *a)
{
  g_autofree char *prior = prior_words (a);
  const char *what = parameter_words (a);
  /* A design may put one prior on each group's parameter, not on the difference or
   * ratio: "θA and θB each spread as Beta(1, 1), independently". */
  const char *groups = tf_design_class (a->design)->group_parameters;

  if (groups)
    {
      g_autofree char *spread = g_strdup_printf (_("%s each spread as %s, independently"), groups, prior);

      switch (a->direction)
        {
        case TF_DIRECTION_GREATER:
          /* TRANSLATORS: %s is e.g. "θA and θB each spread as Beta(1, 1), independently" */
          return g_strdup_printf (_("%s, cut to where %s lies above the null value"), spread, what);
        case TF_DIRECTION_LESS:
          return g_strdup_printf (_("%s, cut to where %s lies below the null value"), spread, what);
        case TF_DIRECTION_TWO_SIDED:
          break;
        }
      return g_steal_pointer (&spread);
    }

  switch (a->direction)
    {
    case TF_DIRECTION_GREATER:
      return g_strdup_printf (_("%s above the null value, spread as %s cut to that side"), what, prior);
    case TF_DIRECTION_LESS:
      return g_strdup_printf (_("%s below the null value, spread as %s cut to that side"), what, prior);
    case TF_DIRECTION_TWO_SIDED:
      break;
    }
  return g_strdup_printf (_("%s spread as %s"), what, prior);
}

static void
explain_p_value (GPtrArray *list, const TfAnalysis *a, const TfResults *r)
{
  g_autofree char *p = value_of (r, "p_value");
  g_autofree char *h0 = null_words (a);

  add (list, _("The p-value"),
       g_strdup_printf (_("p = %s. It speaks of the null model alone: if %s were exactly true, "
                          "%s would turn up with probability %s. "
                          "A small p says the data fit the null model poorly."),
                        p, h0, direction_words (a->direction), p),
       g_strdup (_("It is not the probability that the null is true, nor that the result arose "
                   "by chance. No alternative enters it, so with many observations even a tiny, "
                   "unimportant departure from the null gives a small p. It says nothing of how "
                   "large the effect is: read the interval for that.")));
}

static void
explain_confidence (GPtrArray *list, const TfAnalysis *a, const TfResults *r)
{
  g_autofree char *lo = value_of (r, "ci_low");
  g_autofree char *hi = value_of (r, "ci_high");
  g_autofree char *est = value_of (r, "estimate");
  double percent = 100.0 * a->level;

  add (list, _("The confidence interval"),
       g_strdup_printf (_("The estimate of %s is %s; the %g%% confidence interval runs from %s "
                          "to %s. It holds the values that a test at that level would not "
                          "reject; the procedure covers the true value in %g%% of repeated "
                          "samples."),
                        estimand_words (a), est, percent, lo, hi, percent),
       g_strdup_printf (_("It does not say that the true value lies in this interval with probability %g%%: "
                          "that reading belongs to the credible interval, under a prior. Nor does "
                          "it weigh the null against an alternative."),
                        percent));
}

/* What the Bayes factor does not say, and the design's note on it when it has one. */
static char *
bayes_factor_does_not (const TfAnalysis *a)
{
  const TfDesignClass *klass = tf_design_class (a->design);
  const char *text = _("It is not a probability of either model, and it depends on the prior under "
                       "the alternative: a wider prior spreads its predictions thinner and so favours "
                       "the null more. It says nothing of models that were not compared.");
  const char *note = klass->bayes_factor_note ? klass->bayes_factor_note (a) : NULL;

  return note ? g_strdup_printf ("%s %s", text, note) : g_strdup (text);
}

static void
explain_bayes_factor (GPtrArray *list, const TfAnalysis *a, const TfResults *r)
{
  g_autofree char *bf01 = value_of (r, "bf01");
  g_autofree char *bf10 = value_of (r, "bf10");
  g_autofree char *h0 = null_words (a);
  g_autofree char *h1 = alternative_words (a);
  double v;
  const char *leaning = "";

  if (tf_results_get (r, "bf01", &v))
    leaning = v > 1.0 ? _("The data favour the null model.")
              : v < 1.0 ? _("The data favour the alternative model.")
              : _("The data favour neither model.");

  add (list, _("The Bayes factor"),
       g_strdup_printf (_("BF₀₁ = %s (BF₁₀ = %s). It compares how well two models predicted these "
                          "data: the null, %s, and the alternative, %s. The data were BF₀₁ times "
                          "as probable under the null as under the alternative. %s"),
                        bf01, bf10, h0, h1, leaning),
       bayes_factor_does_not (a));
}

static void
explain_posterior (GPtrArray *list, const TfAnalysis *a, const TfResults *r)
{
  g_autofree char *post = value_of (r, "posterior_null");
  g_autofree char *prior = tf_format_value (a->prior_null, TF_MEASURE_POSTERIOR_PROBABILITY);

  add (list, _("The posterior probability of the null"),
       g_strdup_printf (_("P(null | data) = %s. Starting from a prior probability of %s for the "
                          "null, the Bayes factor updates the odds: posterior odds = prior odds × "
                          "BF₀₁."),
                        post, prior),
       g_strdup (_("It assumes that one of the two models compared is true, and it takes the "
                   "prior probability and the prior under the alternative as given. A reader "
                   "with other prior odds reaches other posterior odds from the same Bayes "
                   "factor.")));
}

static void
explain_credible (GPtrArray *list, const TfAnalysis *a, const TfResults *r)
{
  g_autofree char *lo = value_of (r, "cri_low");
  g_autofree char *hi = value_of (r, "cri_high");
  double percent = 100.0 * a->level;

  add (list, _("The credible interval"),
       g_strdup_printf (_("If the alternative model holds, %s lies between %s and %s with "
                          "probability %g%%, given its prior and the data (equal tails)."),
                        parameter_words (a), lo, hi, percent),
       g_strdup (_("It is conditional on the alternative: it gives the null value no special "
                   "weight and is no test of it. Whether the null value falls inside says "
                   "little about the null model; the Bayes factor speaks to that.")));
}

static void
explain_bounds (GPtrArray *list, const TfAnalysis *a, const TfResults *r)
{
  g_autofree char *sbb = value_of (r, "min_bf01");
  g_autofree char *lr = value_of (r, "min_bf01_lr");

  add (list, _("Bounds on what any prior could say"),
       g_strdup_printf (_("From the p-value alone, −e·p·ln p = %s is the smallest Bayes factor for "
                          "the null that a broad class of priors can give (Sellke, Bayarri & "
                          "Berger 2001). No prior at all, even one placed on the best-fitting "
                          "value, brings it below %s, the likelihood ratio at the maximum "
                          "(Edwards, Lindman & Savage 1963)."),
                        sbb, lr),
       g_strdup (_("They are bounds, not estimates: the Bayes factor of any reasonable prior is "
                   "larger, that is, kinder to the null. A p-value that looks decisive can have "
                   "a bound near 1.")));
}

/* When the two readings point different ways: which conditions make them (the
 * diagnostic's own words), and what to do about it. */
static void
explain_disagreement (GPtrArray *list, const TfAnalysis *a, const TfResults *r)
{
  char *text = tf_diagnostic_text (a, r);

  if (text == NULL)
    return;
  add (list, _("The two readings disagree"), text,
       g_strdup (_("Neither number is wrong; they answer different questions. Report both, "
                   "with the prior, and show how the conclusion moves with the prior's width "
                   "and with the sample size.")));
}

GPtrArray *
tf_explain (const TfAnalysis *analysis, const TfResults *results)
{
  GPtrArray *list = g_ptr_array_new_with_free_func ((GDestroyNotify) tf_explanation_free);

  /* When the readings disagree, that comes first: it is what the reader must see. */
  explain_disagreement (list, analysis, results);
  explain_p_value (list, analysis, results);
  explain_confidence (list, analysis, results);
  explain_bayes_factor (list, analysis, results);
  explain_posterior (list, analysis, results);
  explain_credible (list, analysis, results);
  explain_bounds (list, analysis, results);
  return list;
}
