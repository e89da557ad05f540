/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-analysis-file-private.h: the key readers and writers (tf-key-file.c) that
 * tf-analysis-file.c and tf-analysis-data.c share. Each reader appends a problem naming the group and key.
 */
#pragma once

#include "tf-analysis-file.h"
#include "tf-design.h"

G_BEGIN_DECLS

typedef struct {
  GKeyFile *key_file;
  GPtrArray *problems;
  guint n_before;
} TfReader;

gboolean tf_reader_has (TfReader *r, const char *group, const char *key);
char *tf_reader_string (TfReader *r, const char *group, const char *key);
/* A number in C notation; a missing key takes the fallback (a problem when required). */
double tf_reader_number (TfReader *r, const char *group, const char *key, gboolean required,
                         double fallback);
/* Numbers separated by ';', each checked like a number; NULL when absent or wrong. */
GArray *tf_reader_list (TfReader *r, const char *group, const char *key);
gboolean tf_reader_boolean (TfReader *r, const char *group, const char *key, gboolean fallback);

void tf_key_file_set_number (GKeyFile *key_file, const char *group, const char *key, double value);
void tf_key_file_set_list (GKeyFile *key_file, const char *group, const char *key,
                           const GArray *values);

/* The [Data] keys of the analysis's design (tf-analysis-data.c). */
void tf_analysis_read_data (TfReader *r, TfAnalysis *analysis);
void tf_analysis_write_data (GKeyFile *key_file, const TfAnalysis *analysis);
/* Whether some design reads this [Data] key (a key no design reads is kept on save). */
gboolean tf_analysis_data_key_known (const char *key);

G_END_DECLS
