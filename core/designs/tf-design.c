/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-design.c: the designs this version of Twofold computes, and the analysis's life
 * through them: defaults, raw values, validation, computation and the methods of its
 * intervals. Adding a design is one class in its own file and one line in the table
 * below.
 */
#include "tf-design.h"
#include "tf-one-proportion.h"
#include "tf-two-proportions.h"
#include "tf-means-class.h"
#include "tf-one-rate.h"
#include "tf-two-rates.h"

#include <glib/gi18n-lib.h>
#include <string.h>

static const TfDesignClass *const designs[TF_N_DESIGNS] = {
  [TF_DESIGN_ONE_PROPORTION] = &tf_one_proportion_class,
  [TF_DESIGN_TWO_PROPORTIONS] = &tf_two_proportions_class,
  [TF_DESIGN_ONE_MEAN] = &tf_one_mean_class,
  [TF_DESIGN_PAIRED_MEANS] = &tf_paired_means_class,
  [TF_DESIGN_TWO_MEANS] = &tf_two_means_class,
  [TF_DESIGN_ONE_RATE] = &tf_one_rate_class,
  [TF_DESIGN_TWO_RATES] = &tf_two_rates_class,
};

const TfDesignClass *
tf_design_class (TfDesign design)
{
  return (guint) design < TF_N_DESIGNS ? designs[design] : NULL;
}

TfDesign
tf_design_default (void)
{
  for (guint d = 0; d < TF_N_DESIGNS; d++)
    if (designs[d])
      return (TfDesign) d;
  g_return_val_if_reached ((TfDesign) 0);
}

const char *
tf_design_to_string (TfDesign design)
{
  const TfDesignClass *klass = tf_design_class (design);

  g_return_val_if_fail (klass != NULL, NULL);
  return klass->name;
}

gboolean
tf_design_from_string (const char *s, TfDesign *design)
{
  for (guint i = 0; s != NULL && i < TF_N_DESIGNS; i++)
    if (designs[i] && g_strcmp0 (designs[i]->name, s) == 0)
      {
        *design = (TfDesign) i;
        return TRUE;
      }
  return FALSE;
}

char *
tf_design_names_joined (void)
{
  GString *out = g_string_new (NULL);

  for (guint i = 0; i < TF_N_DESIGNS; i++)
    if (designs[i])
      g_string_append_printf (out, "%s%s", out->len ? ", " : "", designs[i]->name);
  return g_string_free (out, FALSE);
}

const char *
tf_design_label (TfDesign design)
{
  const TfDesignClass *klass = tf_design_class (design);

  g_return_val_if_fail (klass != NULL, NULL);
  return _(klass->label);
}

void
tf_analysis_reset (TfAnalysis *analysis, TfDesign design)
{
  const TfDesignClass *klass = tf_design_class (design);

  tf_analysis_reset_shared (analysis, design);
  if (klass && klass->defaults)
    klass->defaults (analysis);
}

TfAnalysis *
tf_analysis_new (TfDesign design)
{
  TfAnalysis *analysis = g_new0 (TfAnalysis, 1);

  tf_analysis_reset (analysis, design);
  return analysis;
}

void
tf_analysis_summarise_values (TfAnalysis *analysis)
{
  const TfDesignClass *klass = tf_design_class (analysis->design);

  if (klass && klass->summarise)
    klass->summarise (analysis);
}

gboolean
tf_analysis_validate (const TfAnalysis *analysis, GPtrArray *problems)
{
  const TfDesignClass *klass = tf_design_class (analysis->design);
  guint before = problems->len;

  if (klass == NULL)
    g_ptr_array_add (problems,
                     tf_problem_new ("Analysis", "Design",
                                     _("The design is not available in this version of Twofold.")));
  else
    klass->validate (analysis, problems);
  tf_analysis_validate_shared (analysis, problems);
  return problems->len == before;
}

/* The intervals of every design that has a prior: equal-tailed and highest density. */
static const TfIntervalMethod credible_intervals[] = {
  { "cri", N_("equal-tailed"), NULL },
  { "hdi", N_("highest density"), NULL },
};

static const TfIntervalMethod *
interval_find (const TfIntervalMethod *table, guint n, const char *stem)
{
  for (guint i = 0; i < n; i++)
    if (strcmp (table[i].stem, stem) == 0)
      return &table[i];
  return NULL;
}

static const char *
translated (const char *text)
{
  return text ? _(text) : NULL;
}

void
tf_analysis_describe_numbers (const TfAnalysis *analysis, TfResults *results)
{
  const TfDesignClass *klass = tf_design_class (analysis->design);

  for (guint i = 0; klass && i < results->numbers->len; i++)
    {
      TfNumber *number = g_ptr_array_index (results->numbers, i);
      const char *suffix = strrchr (number->id, '_');
      g_autofree char *stem = NULL;
      const TfIntervalMethod *entry;
      const char *method = NULL, *of = NULL;

      if (!suffix || (strcmp (suffix, "_low") != 0 && strcmp (suffix, "_high") != 0))
        continue;
      stem = g_strndup (number->id, suffix - number->id);
      if ((entry = interval_find (klass->intervals, klass->n_intervals, stem)))
        of = translated (entry->of);
      else if ((entry = interval_find (credible_intervals, G_N_ELEMENTS (credible_intervals),
                                       stem)))
        of = translated (klass->credible_of);
      if (klass->method_of)
        method = klass->method_of (analysis, number->id);
      if (!method && entry)
        method = translated (entry->method);
      tf_number_set_method (number, method, of);
    }
}

TfResults *
tf_analysis_compute (const TfAnalysis *analysis, GPtrArray *problems)
{
  g_autoptr (GPtrArray) own = NULL;
  TfResults *results;

  if (problems == NULL)
    problems = own = tf_problem_list_new ();
  if (!tf_analysis_validate (analysis, problems))
    return NULL;

  results = tf_results_new (analysis->design);
  tf_design_class (analysis->design)->compute (analysis, results);
  tf_analysis_describe_numbers (analysis, results);
  return results;
}
