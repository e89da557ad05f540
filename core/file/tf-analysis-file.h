/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-analysis-file.h: the *.twofold analysis file (a GLib key file, see DEVELOPERS.md).
 */
#pragma once

#include "tf-design.h"

G_BEGIN_DECLS

#define TF_ANALYSIS_FORMAT 1

/* Reads an analysis from a key file. Every key that is missing where required, not a
 * number, or not one of the allowed words is appended to problems (group and key named);
 * then returns NULL. Domain checks (k <= n and so on) are tf_analysis_validate()'s. Keys
 * Twofold does not know are kept in the analysis's source and written back on save. */
TfAnalysis *tf_analysis_from_key_file (GKeyFile *key_file, GPtrArray *problems);

/* Loads a file. A file that cannot be read or is not a key file is one problem with an
 * empty group and key. Returns NULL when anything was wrong, parse or domain. */
TfAnalysis *tf_analysis_load (const char *filename, GPtrArray *problems);
TfAnalysis *tf_analysis_load_from_data (const char *data, gsize length, GPtrArray *problems);

/* The analysis as a key file: the source's unknown keys, then every known key.
 * Numbers use '.' whatever the locale and round-trip exactly. */
GKeyFile *tf_analysis_to_key_file (const TfAnalysis *analysis);
char *tf_analysis_to_data (const TfAnalysis *analysis, gsize *length);

/* Writes atomically: a temporary file in the same folder, then a rename. */
gboolean tf_analysis_save (const TfAnalysis *analysis, const char *filename, GError **error);

G_END_DECLS
