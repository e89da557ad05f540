/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-analysis-file.c: reading and writing *.twofold analysis files (DEVELOPERS.md).
 */
#include "tf-analysis-file-private.h"

#include <errno.h>
#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdlib.h>

/* Every key Twofold reads outside [Data] (whose keys come from the designs' classes):
 * these are rewritten on save, and all other keys in the source file are kept as they
 * were. */
static const char *const known_keys[][2] = {
  { "Analysis", "Format" }, { "Analysis", "Design" }, { "Analysis", "Title" },
  { "Null", "Kind" }, { "Null", "Value" }, { "Null", "Low" }, { "Null", "High" },
  { "Alternative", "Direction" }, { "Alternative", "Prior" }, { "Alternative", "PriorA" },
  { "Alternative", "PriorB" }, { "Alternative", "PriorScale" }, { "Alternative", "PriorShape" },
  { "Alternative", "PriorRate" },
  { "Models", "PriorNull" }, { "Models", "Set" }, { "Models", "Priors" },
  { "Options", "Level" },
};

/* One of a list of words. */
static void
reader_word (TfReader *r, const char *group, const char *key, gboolean required,
             gboolean (*parse) (const char *, int *), int *out, const char *allowed)
{
  g_autofree char *text = tf_reader_string (r, group, key);

  if (text == NULL)
    {
      if (required)
        g_ptr_array_add (r->problems,
                         tf_problem_new (group, key, _("This key is required and missing.")));
      return;
    }
  if (!parse (text, out))
    g_ptr_array_add (r->problems,
                     tf_problem_new (group, key, _("“%s” is not allowed here; use one of: %s."),
                                     text, allowed));
}

#define WORD_PARSER(name, type, fn) \
  static gboolean name (const char *s, int *out) { type v; if (!fn (s, &v)) return FALSE; *out = (int) v; return TRUE; }
WORD_PARSER (parse_design, TfDesign, tf_design_from_string)
WORD_PARSER (parse_direction, TfDirection, tf_direction_from_string)
WORD_PARSER (parse_prior, TfPriorFamily, tf_prior_family_from_string)
WORD_PARSER (parse_null_kind, TfNullKind, tf_null_kind_from_string)

/* [Models] Set (words separated by ';') and Priors (one prior probability per model;
 * equal priors when absent). The ranges and the sum are checked by the design's
 * validation, so that an analysis made in code is held to them too. */
static void
read_models (TfReader *r, TfAnalysis *a)
{
  g_autofree char *text = tf_reader_string (r, "Models", "Set");
  g_auto (GStrv) words = NULL;
  g_autoptr (GArray) priors = NULL;
  guint n = 0;

  if (text == NULL)
    {
      if (tf_reader_has (r, "Models", "Priors"))
        g_ptr_array_add (r->problems,
                         tf_problem_new ("Models", "Priors",
                                         _("Priors gives the prior probabilities of a model set; name the models in Set.")));
      return;
    }
  if (!tf_design_class (a->design)->model_set)
    {
      g_ptr_array_add (r->problems,
                       tf_problem_new ("Models", "Set",
                                       /* TRANSLATORS: %s is a design, "One proportion" */
                                       _("A model set is not available for the design “%s” in this version."),
                                       tf_design_label (a->design)));
      return;
    }
  words = g_strsplit (text, ";", -1);
  for (guint i = 0; words[i]; i++)
    {
      char *word = g_strstrip (words[i]);
      TfModel model;

      if (*word == '\0' && words[i + 1] == NULL && i > 0)
        break;  /* a trailing ';' */
      if (!tf_model_from_string (word, &model))
        {
          g_ptr_array_add (r->problems,
                           tf_problem_new ("Models", "Set",
                                           _("“%s” is not a model; use null, less, greater or two-sided, separated by ';'."),
                                           word));
          return;
        }
      if (n == TF_N_MODELS)
        {
          g_ptr_array_add (r->problems,
                           tf_problem_new ("Models", "Set",
                                           _("Set lists more than the %d models there are (null, less, greater, two-sided)."),
                                           TF_N_MODELS));
          return;
        }
      a->models[n++] = model;
    }
  priors = tf_reader_list (r, "Models", "Priors");
  if (priors == NULL && tf_reader_has (r, "Models", "Priors"))
    return;  /* the list's problem is already reported */
  if (priors != NULL && priors->len != n)
    {
      g_ptr_array_add (r->problems,
                       tf_problem_new ("Models", "Priors",
                                       _("Priors has %u values for the %u models in Set."),
                                       priors->len, n));
      return;
    }
  for (guint i = 0; i < n; i++)
    a->model_priors[i] = priors ? g_array_index (priors, double, i) : 1.0 / n;
  a->n_models = n;
}

static void
write_models (GKeyFile *key_file, const TfAnalysis *a)
{
  g_autoptr (GString) set = g_string_new (NULL);
  g_autoptr (GString) priors = g_string_new (NULL);

  if (a->n_models == 0)
    return;
  for (guint i = 0; i < a->n_models; i++)
    {
      g_autofree char *p = tf_format_double (a->model_priors[i]);
      g_string_append_printf (set, "%s%s", i ? ";" : "", tf_model_to_string (a->models[i]));
      g_string_append_printf (priors, "%s%s", i ? ";" : "", p);
    }
  g_key_file_set_value (key_file, "Models", "Set", set->str);
  g_key_file_set_value (key_file, "Models", "Priors", priors->str);
}

TfAnalysis *
tf_analysis_from_key_file (GKeyFile *key_file, GPtrArray *problems)
{
  TfReader r = { key_file, problems, problems->len };
  g_autoptr (TfAnalysis) a = NULL;
  int design = 0, word;
  double format;
  g_autofree char *design_words = tf_design_names_joined ();

  format = tf_reader_number (&r, "Analysis", "Format", TRUE, TF_ANALYSIS_FORMAT);
  if (problems->len == r.n_before && format != TF_ANALYSIS_FORMAT)
    g_ptr_array_add (problems,
                     tf_problem_new ("Analysis", "Format",
                                     _("Format %g is not known to this version of Twofold, which reads format %d."),
                                     format, TF_ANALYSIS_FORMAT));
  reader_word (&r, "Analysis", "Design", TRUE, parse_design, &design, design_words);
  if (problems->len != r.n_before)
    return NULL;  /* without a design, the rest cannot be read */

  a = tf_analysis_new ((TfDesign) design);
  {
    g_autofree char *title = g_key_file_get_string (key_file, "Analysis", "Title", NULL);
    tf_analysis_set_title (a, title ? g_strstrip (title) : NULL);
  }

  tf_analysis_read_data (&r, a);

  word = a->null_kind;
  reader_word (&r, "Null", "Kind", FALSE, parse_null_kind, &word, "point, interval");
  a->null_kind = (TfNullKind) word;
  if (a->null_kind == TF_NULL_POINT)
    a->null_value = tf_reader_number (&r, "Null", "Value",
                                   tf_design_class (a->design)->null_value_required,
                                   a->null_value);
  else
    {
      a->null_low = tf_reader_number (&r, "Null", "Low", TRUE, a->null_low);
      a->null_high = tf_reader_number (&r, "Null", "High", TRUE, a->null_high);
    }

  word = a->direction;
  reader_word (&r, "Alternative", "Direction", FALSE, parse_direction, &word,
               "two-sided, greater, less");
  a->direction = (TfDirection) word;
  word = a->prior;
  reader_word (&r, "Alternative", "Prior", FALSE, parse_prior, &word,
               "beta, normal, cauchy, gamma");
  a->prior = (TfPriorFamily) word;
  a->prior_a = tf_reader_number (&r, "Alternative", "PriorA", FALSE, a->prior_a);
  a->prior_b = tf_reader_number (&r, "Alternative", "PriorB", FALSE, a->prior_b);
  a->prior_scale = tf_reader_number (&r, "Alternative", "PriorScale", FALSE, a->prior_scale);
  a->prior_shape = tf_reader_number (&r, "Alternative", "PriorShape", FALSE, a->prior_shape);
  a->prior_rate = tf_reader_number (&r, "Alternative", "PriorRate", FALSE, a->prior_rate);

  a->prior_null = tf_reader_number (&r, "Models", "PriorNull", FALSE, a->prior_null);
  read_models (&r, a);
  a->level = tf_reader_number (&r, "Options", "Level", FALSE, a->level);

  if (problems->len != r.n_before)
    return NULL;
  a->source = g_key_file_ref (key_file);
  return g_steal_pointer (&a);
}

static TfAnalysis *
load_key_file (GKeyFile *key_file, const char *data, gsize length, GPtrArray *problems)
{
  g_autoptr (GError) error = NULL;
  TfAnalysis *analysis;

  if (!g_utf8_validate (data, (gssize) length, NULL))
    {
      g_ptr_array_add (problems, tf_problem_new ("", "", _("The file is not UTF-8 text.")));
      return NULL;
    }
  if (!g_key_file_load_from_data (key_file, data, length, G_KEY_FILE_KEEP_COMMENTS, &error))
    {
      g_ptr_array_add (problems,
                       tf_problem_new ("", "", _("The file is not a Twofold analysis (a key file): %s."),
                                       error->message));
      return NULL;
    }
  if (!g_key_file_has_group (key_file, "Analysis"))
    {
      g_ptr_array_add (problems,
                       tf_problem_new ("Analysis", "",
                                       _("The group [Analysis] is missing: this is not a Twofold analysis.")));
      return NULL;
    }
  analysis = tf_analysis_from_key_file (key_file, problems);
  if (analysis && !tf_analysis_validate (analysis, problems))
    g_clear_pointer (&analysis, tf_analysis_free);
  return analysis;
}

TfAnalysis *
tf_analysis_load_from_data (const char *data, gsize length, GPtrArray *problems)
{
  g_autoptr (GKeyFile) key_file = g_key_file_new ();

  return load_key_file (key_file, data, length, problems);
}

TfAnalysis *
tf_analysis_load (const char *filename, GPtrArray *problems)
{
  g_autoptr (GError) error = NULL;
  g_autofree char *data = NULL;
  gsize length = 0;

  if (!g_file_get_contents (filename, &data, &length, &error))
    {
      g_ptr_array_add (problems, tf_problem_new ("", "", _("The file cannot be read: %s."),
                                                 error->message));
      return NULL;
    }
  return tf_analysis_load_from_data (data, length, problems);
}

GKeyFile *
tf_analysis_to_key_file (const TfAnalysis *a)
{
  GKeyFile *key_file = g_key_file_new ();

  /* The groups come first in the order of DEVELOPERS.md, then whatever else the source had. */
  g_key_file_set_integer (key_file, "Analysis", "Format", TF_ANALYSIS_FORMAT);
  g_key_file_set_value (key_file, "Analysis", "Design", tf_design_to_string (a->design));
  if (a->title)
    g_key_file_set_string (key_file, "Analysis", "Title", a->title);

  tf_analysis_write_data (key_file, a);

  g_key_file_set_value (key_file, "Null", "Kind", tf_null_kind_to_string (a->null_kind));
  if (a->null_kind == TF_NULL_POINT)
    tf_key_file_set_number (key_file, "Null", "Value", a->null_value);
  else
    {
      tf_key_file_set_number (key_file, "Null", "Low", a->null_low);
      tf_key_file_set_number (key_file, "Null", "High", a->null_high);
    }

  g_key_file_set_value (key_file, "Alternative", "Direction", tf_direction_to_string (a->direction));
  g_key_file_set_value (key_file, "Alternative", "Prior", tf_prior_family_to_string (a->prior));
  switch (a->prior)
    {
    case TF_PRIOR_BETA:
      tf_key_file_set_number (key_file, "Alternative", "PriorA", a->prior_a);
      tf_key_file_set_number (key_file, "Alternative", "PriorB", a->prior_b);
      /* a design with a second Bayes factor beside the beta prior's (a normal prior of
       * scale PriorScale) says so in its class */
      if (tf_design_class (a->design)->beta_with_scale)
        tf_key_file_set_number (key_file, "Alternative", "PriorScale", a->prior_scale);
      break;
    case TF_PRIOR_NORMAL:
    case TF_PRIOR_CAUCHY:
      tf_key_file_set_number (key_file, "Alternative", "PriorScale", a->prior_scale);
      break;
    case TF_PRIOR_GAMMA:
      tf_key_file_set_number (key_file, "Alternative", "PriorShape", a->prior_shape);
      tf_key_file_set_number (key_file, "Alternative", "PriorRate", a->prior_rate);
      break;
    }
  tf_key_file_set_number (key_file, "Models", "PriorNull", a->prior_null);
  write_models (key_file, a);
  tf_key_file_set_number (key_file, "Options", "Level", a->level);

  /* Keep what Twofold does not know. */
  if (a->source)
    {
      g_auto (GStrv) groups = g_key_file_get_groups (a->source, NULL);

      for (guint g = 0; groups[g]; g++)
        {
          g_auto (GStrv) keys = g_key_file_get_keys (a->source, groups[g], NULL, NULL);

          for (guint k = 0; keys && keys[k]; k++)
            {
              gboolean known = g_str_equal (groups[g], "Data")
                               && tf_analysis_data_key_known (keys[k]);

              for (guint i = 0; i < G_N_ELEMENTS (known_keys) && !known; i++)
                known = g_str_equal (known_keys[i][0], groups[g])
                        && g_str_equal (known_keys[i][1], keys[k]);
              if (!known)
                {
                  g_autofree char *value = g_key_file_get_value (a->source, groups[g], keys[k], NULL);
                  g_autofree char *comment = g_key_file_get_comment (a->source, groups[g], keys[k], NULL);

                  g_key_file_set_value (key_file, groups[g], keys[k], value);
                  if (comment)
                    g_key_file_set_comment (key_file, groups[g], keys[k], comment, NULL);
                }
            }
        }
    }
  return key_file;
}

char *
tf_analysis_to_data (const TfAnalysis *analysis, gsize *length)
{
  g_autoptr (GKeyFile) key_file = tf_analysis_to_key_file (analysis);

  return g_key_file_to_data (key_file, length, NULL);
}

gboolean
tf_analysis_save (const TfAnalysis *analysis, const char *filename, GError **error)
{
  gsize length = 0;
  g_autofree char *data = tf_analysis_to_data (analysis, &length);

  /* CONSISTENT: written to a temporary file in the same folder and renamed over the
   * target, so a crash leaves either the old file or the new one, never half of one. */
  return g_file_set_contents_full (filename, data, (gssize) length,
                                   G_FILE_SET_CONTENTS_CONSISTENT | G_FILE_SET_CONTENTS_DURABLE,
                                   0666, error);
}
