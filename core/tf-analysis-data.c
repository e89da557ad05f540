/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-analysis-data.c: the [Data] keys of every design (DESIGN.md), read and written from
 * one description: plain numbers (counts, exposures), and samples of the means designs
 * given either as their values or as size, mean and SD.
 */
#include "tf-analysis-file-private.h"

#include <glib/gi18n-lib.h>

#define OFF(field) G_STRUCT_OFFSET (TfAnalysis, field)
#define NUMBER_AT(a, offset) G_STRUCT_MEMBER (double, (a), (offset))
#define LIST_AT(a, offset) G_STRUCT_MEMBER (GArray *, (a), (offset))

/* A required number of a design. */
typedef struct {
  TfDesign design;
  const char *key;
  glong offset;
} TfNumberKey;

static const TfNumberKey number_keys[] = {
  { TF_DESIGN_ONE_PROPORTION, "Successes", OFF (successes) },
  { TF_DESIGN_ONE_PROPORTION, "Trials", OFF (trials) },
  { TF_DESIGN_TWO_PROPORTIONS, "SuccessesA", OFF (successes_a) },
  { TF_DESIGN_TWO_PROPORTIONS, "TrialsA", OFF (trials_a) },
  { TF_DESIGN_TWO_PROPORTIONS, "SuccessesB", OFF (successes_b) },
  { TF_DESIGN_TWO_PROPORTIONS, "TrialsB", OFF (trials_b) },
  { TF_DESIGN_ONE_RATE, "Events", OFF (events) },
  { TF_DESIGN_ONE_RATE, "Exposure", OFF (exposure) },
  { TF_DESIGN_TWO_RATES, "EventsA", OFF (events_a) },
  { TF_DESIGN_TWO_RATES, "ExposureA", OFF (exposure_a) },
  { TF_DESIGN_TWO_RATES, "EventsB", OFF (events_b) },
  { TF_DESIGN_TWO_RATES, "ExposureB", OFF (exposure_b) },
};

/* A sample given by its values (values_key), or by its size, mean and SD. Paired means
 * give two lists that belong together (values_key and partner_key): both or neither. */
typedef struct {
  TfDesign design;
  const char *values_key;
  glong values_offset;
  const char *partner_key;
  glong partner_offset;
  const char *summary_keys[3];
  glong summary_offsets[3];
} TfSampleKeys;

static const TfSampleKeys sample_keys[] = {
  { TF_DESIGN_ONE_MEAN, "Values", OFF (values), NULL, 0,
    { "N", "Mean", "SD" }, { OFF (n), OFF (mean), OFF (sd) } },
  { TF_DESIGN_PAIRED_MEANS, "ValuesA", OFF (values_a), "ValuesB", OFF (values_b),
    { "N", "MeanDiff", "SDDiff" }, { OFF (n), OFF (mean), OFF (sd) } },
  { TF_DESIGN_TWO_MEANS, "ValuesA", OFF (values_a), NULL, 0,
    { "NA", "MeanA", "SDA" }, { OFF (n_a), OFF (mean_a), OFF (sd_a) } },
  { TF_DESIGN_TWO_MEANS, "ValuesB", OFF (values_b), NULL, 0,
    { "NB", "MeanB", "SDB" }, { OFF (n_b), OFF (mean_b), OFF (sd_b) } },
};

/* Paired lists: each one needs the other. */
static void
read_paired_lists (TfReader *r, TfAnalysis *a, const TfSampleKeys *s)
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
read_sample (TfReader *r, TfAnalysis *a, const TfSampleKeys *s)
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
write_sample (GKeyFile *k, const TfAnalysis *a, const TfSampleKeys *s)
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
  for (guint i = 0; i < G_N_ELEMENTS (number_keys); i++)
    if (number_keys[i].design == a->design)
      NUMBER_AT (a, number_keys[i].offset) =
        tf_reader_number (r, "Data", number_keys[i].key, TRUE, NUMBER_AT (a, number_keys[i].offset));
  for (guint i = 0; i < G_N_ELEMENTS (sample_keys); i++)
    if (sample_keys[i].design == a->design)
      read_sample (r, a, &sample_keys[i]);

  if (a->design == TF_DESIGN_ONE_MEAN && tf_reader_has (r, "Data", "KnownSD"))
    {
      a->has_known_sd = TRUE;
      a->known_sd = tf_reader_number (r, "Data", "KnownSD", TRUE, 1.0);
    }
  if (a->design == TF_DESIGN_TWO_MEANS)
    a->equal_variances = tf_reader_boolean (r, "Data", "EqualVariances", a->equal_variances);
  tf_analysis_summarise_values (a);
}

void
tf_analysis_write_data (GKeyFile *k, const TfAnalysis *a)
{
  for (guint i = 0; i < G_N_ELEMENTS (number_keys); i++)
    if (number_keys[i].design == a->design)
      tf_key_file_set_number (k, "Data", number_keys[i].key, NUMBER_AT (a, number_keys[i].offset));
  for (guint i = 0; i < G_N_ELEMENTS (sample_keys); i++)
    if (sample_keys[i].design == a->design)
      write_sample (k, a, &sample_keys[i]);

  if (a->design == TF_DESIGN_ONE_MEAN && a->has_known_sd)
    tf_key_file_set_number (k, "Data", "KnownSD", a->known_sd);
  if (a->design == TF_DESIGN_TWO_MEANS)
    g_key_file_set_value (k, "Data", "EqualVariances", a->equal_variances ? "true" : "false");
}
