/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-results.h: the numbers an analysis reports, each {id, value, status, measure}, an
 * interval's limits also with their method.
 */
#pragma once

#include <glib.h>
#include "tf-analysis.h"

G_BEGIN_DECLS

typedef enum {
  TF_STATUS_OK,
  TF_STATUS_UNDEFINED           /* not defined for this input; reason says why */
} TfStatus;

/* What kind of evidence a number is: the explanation pane and reports say what each
 * kind measures and what it does not. */
typedef enum {
  TF_MEASURE_TAIL_PROBABILITY,    /* p-value: the null model alone */
  TF_MEASURE_BAYES_FACTOR,        /* how much better one model predicted the data */
  TF_MEASURE_POSTERIOR_PROBABILITY, /* needs prior odds and a closed model set */
  TF_MEASURE_CONFIDENCE_LIMIT,
  TF_MEASURE_CREDIBLE_LIMIT,
  TF_MEASURE_BOUND,               /* the most any prior could say */
  TF_MEASURE_ESTIMATE,
  TF_MEASURE_STATISTIC
} TfMeasure;

typedef struct {
  char *id;                     /* as in DEVELOPERS.md: "p_value", "bf01", ... */
  char *label;                  /* translated, short */
  double value;                 /* finite when status is OK; 0 otherwise */
  TfStatus status;
  char *reason;                 /* why undefined; NULL when OK */
  TfMeasure measure;
  /* An interval's limit: its published method and, when it is not of the design's own
   * parameter, what it is of; translated, NULL when none. Set by the design's class
   * (tf_analysis_describe_numbers()); not in the JSON. */
  char *method;                 /* "Clopper–Pearson", "Woolf", "equal-tailed" */
  char *of;                     /* "the odds ratio", "δ" */
} TfNumber;

typedef struct {
  TfDesign design;
  GPtrArray *numbers;           /* TfNumber*, in reporting order */
} TfResults;

TfResults *tf_results_new (TfDesign design);
void tf_results_free (TfResults *results);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfResults, tf_results_free)

/* Adds a number. A value that is not finite is stored as undefined, with the reason
 * "the computation did not give a finite value", so NaN never leaves the core. */
void tf_results_add (TfResults *results, const char *id, const char *label,
                     TfMeasure measure, double value);
void tf_results_add_undefined (TfResults *results, const char *id, const char *label,
                               TfMeasure measure, const char *reason);

/* Sets a number's method and what it is of (copied; either may be NULL). */
void tf_number_set_method (TfNumber *number, const char *method, const char *of);

const TfNumber *tf_results_lookup (const TfResults *results, const char *id);
/* TRUE and the value when the number exists and is defined. */
gboolean tf_results_get (const TfResults *results, const char *id, double *value);

const char *tf_measure_to_string (TfMeasure measure);  /* "tail-probability", ... */
const char *tf_status_to_string (TfStatus status);     /* "ok", "undefined" */

/* A number for people: 4 significant digits, p-values below 1e-4 in scientific form,
 * never "nan" or "inf". Returns a newly allocated string. */
char *tf_number_format (const TfNumber *number);
char *tf_format_value (double value, TfMeasure measure);

/* Locale-independent shortest round-trip form of a double ("0.5", "1e+12"). */
char *tf_format_double (double value);

/* JSON of DEVELOPERS.md: {"format":1,"design":...,"results":{...},"numbers":[...],"problems":[...]};
 * design_name is the file's word for the design, title may be NULL. */
char *tf_results_to_json (const char *design_name, const char *title, const TfResults *results,
                          GPtrArray *problems);

G_END_DECLS
