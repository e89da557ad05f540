/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-result-list.h: the numbers of an analysis, grouped: classical, Bayesian, bounds.
 */
#pragma once

#include <gtk/gtk.h>
#include "tf-results.h"

G_BEGIN_DECLS

typedef enum {
  TF_RESULT_SECTION_CLASSICAL,
  TF_RESULT_SECTION_BAYESIAN,
  TF_RESULT_SECTION_BOUNDS
} TfResultSection;

#define TF_TYPE_RESULT_LIST (tf_result_list_get_type ())
G_DECLARE_FINAL_TYPE (TfResultList, tf_result_list, TF, RESULT_LIST, GtkWidget)

GtkWidget *tf_result_list_new (void);

/* Shows every number of results, one row each, except that the two limits of an
 * interval ("<stem>_low" and "<stem>_high": ci, cri, hdi, wilson, or_ci, ...) share one
 * row, titled with the level of the analysis, what the interval is of and its method;
 * an interval that repeats one already shown (the same limits) reads back that row. */
void tf_result_list_set_results (TfResultList *self, const TfAnalysis *analysis,
                                 const TfResults *results);
/* Removes every number and shows a placeholder saying why (plain text). */
void tf_result_list_clear (TfResultList *self, const char *title, const char *description);

gboolean tf_result_list_has_results (TfResultList *self);
/* The value shown for a number ("0.0123", "not defined"), or NULL when not shown; for
 * a limit of an interval, the interval's ("0.8012 – 0.8153", "0.8012 – not defined"). */
const char *tf_result_list_get_value_text (TfResultList *self, const char *id);
/* The line under a number's label (the reason when it is not defined), or NULL; for a
 * limit of an interval, the interval's ("Upper limit not defined: <reason>"). */
const char *tf_result_list_get_subtitle (TfResultList *self, const char *id);
/* The title of the row that shows a number, or NULL when not shown. */
const char *tf_result_list_get_title (TfResultList *self, const char *id);
/* The accessible description set on the row of an interval limit (both limits, each
 * named: "Lower limit 0.8012, upper limit 0.8153"), or NULL for other numbers. */
const char *tf_result_list_get_description (TfResultList *self, const char *id);

TfResultSection tf_result_section_for_number (const TfNumber *number);

G_END_DECLS
