/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-form-field.h: a field of a design's form. Each design's class lists its fields
 * (TfDesignClass.fields); the form widget builds the same kind of row for each. A field
 * is named by its group and key in the analysis file (DEVELOPERS.md), so that a TfProblem
 * finds the field it is about.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

typedef enum {
  TF_FIELD_COUNT,               /* a whole number: an entry */
  TF_FIELD_NUMBER,              /* any finite number */
  TF_FIELD_POSITIVE,            /* a number above 0 */
  TF_FIELD_PROBABILITY,         /* a number between 0 and 1 */
  TF_FIELD_LIST,                /* raw values: a multi-line text, ';' or blanks between */
  TF_FIELD_CHOICE,              /* one of a few: a drop-down */
  TF_FIELD_SWITCH,              /* on or off */
  TF_FIELD_OPTIONAL_NUMBER,     /* a switch that turns a number on */
} TfFieldKind;

typedef enum {
  TF_SECTION_DATA,
  TF_SECTION_NULL,
  TF_SECTION_ALTERNATIVE,
  TF_SECTION_MODELS,
  TF_SECTION_OPTIONS,
  TF_N_SECTIONS
} TfFormSection;

/* When a field shows: always, or with one of the two ways of giving a sample. */
typedef enum {
  TF_SHOWN_ALWAYS,
  TF_SHOWN_SUMMARIES,
  TF_SHOWN_VALUES,
} TfFieldShown;

typedef struct {
  const char *group;
  const char *key;
  const char *label;            /* N_(), with a mnemonic */
  const char *hint;             /* N_(), one line under the field */
  TfFieldKind kind;
  TfFormSection section;
  TfFieldShown shown;
  gboolean pair;                /* shares its row with the next field */
  gsize offset;                 /* in TfAnalysis: a double, a GArray * (lists) or a gboolean */
  gsize flag_offset;            /* OPTIONAL_NUMBER: the gboolean that turns it on */
  const char *const *choices;   /* CHOICE: N_() labels, NULL-terminated */
  const int *choice_values;     /* CHOICE: the enum value of each label */
} TfFormField;

G_END_DECLS
