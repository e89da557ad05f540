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

/* Shows every number of results, one row each. */
void tf_result_list_set_results (TfResultList *self, const TfResults *results);
/* Removes every number and shows a placeholder saying why (plain text). */
void tf_result_list_clear (TfResultList *self, const char *title, const char *description);

gboolean tf_result_list_has_results (TfResultList *self);
/* The value shown for a number ("0.0123", "not defined"), or NULL when not shown. */
const char *tf_result_list_get_value_text (TfResultList *self, const char *id);
/* The line under a number's label (the reason when it is not defined), or NULL. */
const char *tf_result_list_get_subtitle (TfResultList *self, const char *id);

TfResultSection tf_result_section_for_number (const TfNumber *number);

G_END_DECLS
