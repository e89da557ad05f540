/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-proportion-form.h: the form for one proportion: successes, trials, null value,
 * direction, beta prior, prior probability of the null and level.
 */
#pragma once

#include <gtk/gtk.h>
#include "tf-analysis.h"

G_BEGIN_DECLS

#define TF_TYPE_PROPORTION_FORM (tf_proportion_form_get_type ())
G_DECLARE_FINAL_TYPE (TfProportionForm, tf_proportion_form, TF, PROPORTION_FORM, GtkWidget)

GtkWidget *tf_proportion_form_new (void);

/* Fills the fields from analysis; emits no "changed". */
void tf_proportion_form_set_analysis (TfProportionForm *self, const TfAnalysis *analysis);

/* Writes the fields into analysis. A field whose text is not a number leaves its value
 * alone and appends a problem named after the field (group and key as in the file).
 * Returns TRUE when every field parsed. */
gboolean tf_proportion_form_apply (TfProportionForm *self, TfAnalysis *analysis,
                                   GPtrArray *problems);

/* Marks each field named by a problem (css class "error") and shows the problem's
 * message below it; clears the marks of the others. */
void tf_proportion_form_show_problems (TfProportionForm *self, GPtrArray *problems);

/* Whether the form has a field for this group and key. */
gboolean tf_proportion_form_has_field (TfProportionForm *self, const char *group, const char *key);

/* The entry of a field, and the message shown below it (NULL when none), by group and
 * key as in the file: "Data"/"Successes", "Data"/"Trials", "Null"/"Value",
 * "Alternative"/"PriorA", "Alternative"/"PriorB", "Models"/"PriorNull", "Options"/"Level". */
GtkEditable *tf_proportion_form_get_entry (TfProportionForm *self, const char *group,
                                           const char *key);
const char *tf_proportion_form_get_message (TfProportionForm *self, const char *group,
                                            const char *key);

G_END_DECLS
