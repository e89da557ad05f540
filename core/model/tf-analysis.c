/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-analysis.c: the analysis as the user set it: the words of its enumerations, the
 * defaults every design shares, copies, raw values, the checks every design shares, and
 * problems. What a particular design adds is in its class (core/designs/).
 */
#include "tf-analysis.h"

#include <glib/gi18n-lib.h>
#include <math.h>

static const char *const direction_names[] = { "two-sided", "greater", "less" };
static const char *const prior_names[] = { "beta", "normal", "cauchy", "gamma" };
static const char *const null_kind_names[] = { "point", "interval" };

static gboolean
lookup_name (const char *const *names, guint n_names, const char *s, int *out)
{
  if (s == NULL)
    return FALSE;
  for (guint i = 0; i < n_names; i++)
    if (g_strcmp0 (names[i], s) == 0)
      {
        *out = (int) i;
        return TRUE;
      }
  return FALSE;
}

#define DEFINE_NAMES(type, prefix, table)                                     \
  const char *prefix##_to_string (type value)                                 \
  {                                                                           \
    g_return_val_if_fail ((guint) value < G_N_ELEMENTS (table), NULL);        \
    return table[value];                                                      \
  }                                                                           \
  gboolean prefix##_from_string (const char *s, type *value)                  \
  {                                                                           \
    int i;                                                                    \
    if (!lookup_name (table, G_N_ELEMENTS (table), s, &i))                    \
      return FALSE;                                                           \
    *value = (type) i;                                                        \
    return TRUE;                                                              \
  }

DEFINE_NAMES (TfDirection, tf_direction, direction_names)
DEFINE_NAMES (TfPriorFamily, tf_prior_family, prior_names)
DEFINE_NAMES (TfNullKind, tf_null_kind, null_kind_names)

void
tf_analysis_reset_shared (TfAnalysis *analysis, TfDesign design)
{
  GKeyFile *source = analysis->source;

  g_free (analysis->title);
  g_clear_pointer (&analysis->values, g_array_unref);
  g_clear_pointer (&analysis->values_a, g_array_unref);
  g_clear_pointer (&analysis->values_b, g_array_unref);
  *analysis = (TfAnalysis) {
    .design = design,
    .null_kind = TF_NULL_POINT,
    .direction = TF_DIRECTION_TWO_SIDED,
    .prior_a = 1.0,
    .prior_b = 1.0,
    .prior_scale = M_SQRT1_2,
    .prior_shape = 1.0,
    .prior_rate = 1.0,
    .prior_null = 0.5,
    .level = 0.95,
    .equal_variances = FALSE,
    .source = source,
  };
}

static GArray *
values_copy (const GArray *values)
{
  GArray *copy;

  if (values == NULL)
    return NULL;
  copy = g_array_sized_new (FALSE, FALSE, sizeof (double), values->len);
  g_array_append_vals (copy, values->data, values->len);
  return copy;
}

void
tf_analysis_set_values (GArray **slot, GArray *values)
{
  g_clear_pointer (slot, g_array_unref);
  *slot = values;
}

/* Welford 1962: running mean and sum of squared deviations, one pass. */
void
tf_sample_summarise (const double *x, guint n, double *count, double *mean, double *sd)
{
  double m = 0.0, s = 0.0;

  for (guint i = 0; i < n; i++)
    {
      double d = x[i] - m;

      m += d / (double) (i + 1);
      s += d * (x[i] - m);
    }
  *count = n;
  *mean = m;
  *sd = n > 1 ? sqrt (s / (double) (n - 1)) : 0.0;
}

static GKeyFile *
key_file_copy (GKeyFile *key_file)
{
  g_autofree char *data = NULL;
  gsize length = 0;
  GKeyFile *copy = g_key_file_new ();

  data = g_key_file_to_data (key_file, &length, NULL);
  if (!g_key_file_load_from_data (copy, data, length,
                                  G_KEY_FILE_KEEP_COMMENTS, NULL))
    g_warn_if_reached ();
  return copy;
}

TfAnalysis *
tf_analysis_copy (const TfAnalysis *analysis)
{
  TfAnalysis *copy = g_new (TfAnalysis, 1);

  *copy = *analysis;
  copy->title = g_strdup (analysis->title);
  copy->source = analysis->source ? key_file_copy (analysis->source) : NULL;
  copy->values = values_copy (analysis->values);
  copy->values_a = values_copy (analysis->values_a);
  copy->values_b = values_copy (analysis->values_b);
  return copy;
}

void
tf_analysis_free (TfAnalysis *analysis)
{
  if (analysis == NULL)
    return;
  g_free (analysis->title);
  g_clear_pointer (&analysis->source, g_key_file_unref);
  g_clear_pointer (&analysis->values, g_array_unref);
  g_clear_pointer (&analysis->values_a, g_array_unref);
  g_clear_pointer (&analysis->values_b, g_array_unref);
  g_free (analysis);
}

void
tf_analysis_set_title (TfAnalysis *analysis, const char *title)
{
  g_free (analysis->title);
  analysis->title = title && *title ? g_strdup (title) : NULL;
}

void
tf_analysis_validate_beta_prior (const TfAnalysis *analysis, const char *design_words,
                                 GPtrArray *problems)
{
  if (analysis->prior != TF_PRIOR_BETA)
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "Prior",
                                     /* TRANSLATORS: the first %s is a design, "one proportion" */
                                     _("The prior for %s must be beta (it is %s)."),
                                     design_words, tf_prior_family_to_string (analysis->prior)));
  if (!(analysis->prior_a > 0.0 && analysis->prior_a <= TF_ANALYSIS_MAX_BETA_SHAPE))
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "PriorA",
                                     _("The beta shape PriorA must be above 0 and at most 10^15 (it is %g)."),
                                     analysis->prior_a));
  if (!(analysis->prior_b > 0.0 && analysis->prior_b <= TF_ANALYSIS_MAX_BETA_SHAPE))
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "PriorB",
                                     _("The beta shape PriorB must be above 0 and at most 10^15 (it is %g)."),
                                     analysis->prior_b));
}

/* Checks shared by every design: the prior model probability and the level. */
void
tf_analysis_validate_shared (const TfAnalysis *analysis, GPtrArray *problems)
{
  if (!(analysis->prior_null > 0.0 && analysis->prior_null < 1.0))
    g_ptr_array_add (problems,
                     tf_problem_new ("Models", "PriorNull",
                                     _("The prior probability of the null must lie strictly between 0 and 1 (it is %g)."),
                                     analysis->prior_null));
  if (!(analysis->level >= 0.5 && analysis->level < 1.0))
    g_ptr_array_add (problems,
                     tf_problem_new ("Options", "Level",
                                     _("The level must be at least 0.5 and below 1, for example 0.95 (it is %g)."),
                                     analysis->level));
}

TfProblem *
tf_problem_new (const char *group, const char *key, const char *format, ...)
{
  TfProblem *problem = g_new (TfProblem, 1);
  va_list args;

  problem->group = g_strdup (group ? group : "");
  problem->key = g_strdup (key ? key : "");
  va_start (args, format);
  problem->message = g_strdup_vprintf (format, args);
  va_end (args);
  return problem;
}

void
tf_problem_free (TfProblem *problem)
{
  if (problem == NULL)
    return;
  g_free (problem->group);
  g_free (problem->key);
  g_free (problem->message);
  g_free (problem);
}

GPtrArray *
tf_problem_list_new (void)
{
  return g_ptr_array_new_with_free_func ((GDestroyNotify) tf_problem_free);
}

const TfProblem *
tf_problem_list_find (GPtrArray *problems, const char *group, const char *key)
{
  for (guint i = 0; i < problems->len; i++)
    {
      const TfProblem *problem = g_ptr_array_index (problems, i);

      if (g_strcmp0 (problem->group, group) == 0 && g_strcmp0 (problem->key, key) == 0)
        return problem;
    }
  return NULL;
}
