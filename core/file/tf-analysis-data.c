/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-analysis-data.c: the [Data] keys of the analysis's design, read and written from the
 * description in its class: plain numbers (counts, exposures), and samples given either
 * as their values or as size, mean and SD.
 */
#include "tf-analysis-file-private.h"

#include <glib/gi18n-lib.h>

#define NUMBER_AT(a, offset) G_STRUCT_MEMBER (double, (a), (offset))
#define LIST_AT(a, offset) G_STRUCT_MEMBER (GArray *, (a), (offset))

/* Paired lists: each one needs the other. */
static void
read_paired_lists (TfReader *r, TfAnalysis *a, const TfDataSample *s)
{
  const char *keys[2] = { s->values_key, s->partner_key };
  glong offsets[2] = { s->values_offset, s->partner_offset };

  for (guint i = 0; i < 2; i++)
    {
      tf_analysis_set_values (&LIST_AT (a, offsets[i]), tf_reader_list (r, "Data", keys[i]));
      if (!tf_reader_has (r, "Data", keys[i]))
        g_ptr_array_add (r->problems,
                         /* TRANSLATORS: two keys of the file, e.g. "ValuesB is given, so ValuesA is needed too." */
                         tf_problem_new ("Data", keys[i], _("%s is given, so %s is needed too."),
                                         keys[1 - i], keys[i]));
    }
}

static void
read_sample (TfReader *r, TfAnalysis *a, const TfDataSample *s)
{
  gboolean has_values = tf_reader_has (r, "Data", s->values_key)
                        || (s->partner_key && tf_reader_has (r, "Data", s->partner_key));

  if (has_values && s->partner_key)
    read_paired_lists (r, a, s);
  else if (has_values)
    tf_analysis_set_values (&LIST_AT (a, s->values_offset),
                            tf_reader_list (r, "Data", s->values_key));
  else
    for (guint i = 0; i < 3; i++)
      NUMBER_AT (a, s->summary_offsets[i]) =
        tf_reader_number (r, "Data", s->summary_keys[i], TRUE, NUMBER_AT (a, s->summary_offsets[i]));
}

static void
write_sample (GKeyFile *k, const TfAnalysis *a, const TfDataSample *s)
{
  GArray *values = LIST_AT (a, s->values_offset);
  GArray *partner = s->partner_key ? LIST_AT (a, s->partner_offset) : NULL;

  if (values && (!s->partner_key || partner))
    {
      tf_key_file_set_list (k, "Data", s->values_key, values);
      if (partner)
        tf_key_file_set_list (k, "Data", s->partner_key, partner);
      return;
    }
  for (guint i = 0; i < 3; i++)
    tf_key_file_set_number (k, "Data", s->summary_keys[i], NUMBER_AT (a, s->summary_offsets[i]));
}

void
tf_analysis_read_data (TfReader *r, TfAnalysis *a)
{
  const TfDesignClass *klass = tf_design_class (a->design);

  for (guint i = 0; i < klass->n_numbers; i++)
    NUMBER_AT (a, klass->numbers[i].offset) =
      tf_reader_number (r, "Data", klass->numbers[i].key, TRUE,
                        NUMBER_AT (a, klass->numbers[i].offset));
  for (guint i = 0; i < klass->n_samples; i++)
    read_sample (r, a, &klass->samples[i]);

  if (klass->known_sd && tf_reader_has (r, "Data", "KnownSD"))
    {
      a->has_known_sd = TRUE;
      a->known_sd = tf_reader_number (r, "Data", "KnownSD", TRUE, 1.0);
    }
  if (klass->equal_variances)
    a->equal_variances = tf_reader_boolean (r, "Data", "EqualVariances", a->equal_variances);
  tf_analysis_summarise_values (a);
}

void
tf_analysis_write_data (GKeyFile *k, const TfAnalysis *a)
{
  const TfDesignClass *klass = tf_design_class (a->design);

  for (guint i = 0; i < klass->n_numbers; i++)
    tf_key_file_set_number (k, "Data", klass->numbers[i].key,
                            NUMBER_AT (a, klass->numbers[i].offset));
  for (guint i = 0; i < klass->n_samples; i++)
    write_sample (k, a, &klass->samples[i]);

  if (klass->known_sd && a->has_known_sd)
    tf_key_file_set_number (k, "Data", "KnownSD", a->known_sd);
  if (klass->equal_variances)
    g_key_file_set_value (k, "Data", "EqualVariances", a->equal_variances ? "true" : "false");
}

/* Whether any design reads this [Data] key. */
static gboolean
class_reads (const TfDesignClass *klass, const char *key)
{
  for (guint i = 0; i < klass->n_numbers; i++)
    if (g_str_equal (klass->numbers[i].key, key))
      return TRUE;
  for (guint i = 0; i < klass->n_samples; i++)
    {
      const TfDataSample *s = &klass->samples[i];

      if (g_strcmp0 (s->values_key, key) == 0 || g_strcmp0 (s->partner_key, key) == 0)
        return TRUE;
      for (guint j = 0; j < G_N_ELEMENTS (s->summary_keys); j++)
        if (g_strcmp0 (s->summary_keys[j], key) == 0)
          return TRUE;
    }
  return (klass->known_sd && g_str_equal (key, "KnownSD"))
         || (klass->equal_variances && g_str_equal (key, "EqualVariances"));
}

gboolean
tf_analysis_data_key_known (const char *key)
{
  for (guint d = 0; d < TF_N_DESIGNS; d++)
    {
      const TfDesignClass *klass = tf_design_class ((TfDesign) d);

      if (klass && class_reads (klass, key))
        return TRUE;
    }
  return FALSE;
}
