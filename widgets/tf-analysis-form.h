/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-analysis-form.h: the form of every design: a design chooser, then the fields of the
 * chosen design (its data, null value, direction, prior, prior probability of the null
 * and level), built from the fields of its class in the registry (TfDesignClass.fields);
 * the chooser lists the registry's designs. Each design keeps its own fields,
 * so switching to another design and back finds what was typed there.
 */
#pragma once

#include <gtk/gtk.h>
#include "tf-analysis.h"

G_BEGIN_DECLS

#define TF_TYPE_ANALYSIS_FORM (tf_analysis_form_get_type ())
G_DECLARE_FINAL_TYPE (TfAnalysisForm, tf_analysis_form, TF, ANALYSIS_FORM, GtkWidget)

GtkWidget *tf_analysis_form_new (void);

/* Shows analysis: selects its design and fills that design's fields; the other designs'
 * fields go back to their defaults. Emits no "changed". */
void tf_analysis_form_set_analysis (TfAnalysisForm *self, const TfAnalysis *analysis);

/* The chosen design; choosing one as a user would (emits "changed" when it differs). */
TfDesign tf_analysis_form_get_design (TfAnalysisForm *self);
void tf_analysis_form_set_design (TfAnalysisForm *self, TfDesign design);

/* Writes the chosen design's fields into analysis (and its design). A field whose text
 * is not a number (or a list item that is not) leaves its value alone and appends a
 * problem named after the field (group and key as in the file). Returns TRUE when every
 * field parsed. */
gboolean tf_analysis_form_apply (TfAnalysisForm *self, TfAnalysis *analysis,
                                 GPtrArray *problems);

/* Marks each shown field named by a problem (css class "error") and shows the message
 * below it; problems of no shown field (the design, a hidden field) show under the
 * design chooser. Clears the marks of the others. */
void tf_analysis_form_show_problems (TfAnalysisForm *self, GPtrArray *problems);

/* Raw values (TRUE) or summaries (FALSE), for the designs of means. */
gboolean tf_analysis_form_get_raw_values (TfAnalysisForm *self);
void tf_analysis_form_set_raw_values (TfAnalysisForm *self, gboolean raw);

/* The chosen design's field by group and key as in the file ("Data"/"TrialsA"): its
 * widget (GtkEntry, GtkTextView, GtkSwitch or GtkDropDown), or NULL when the design has
 * no such field. */
GtkWidget *tf_analysis_form_get_field (TfAnalysisForm *self, const char *group, const char *key);
/* The entry of a number field, else NULL. */
GtkEditable *tf_analysis_form_get_entry (TfAnalysisForm *self, const char *group, const char *key);
/* The text of an entry or list field (newly allocated), and setting it as typing would. */
char *tf_analysis_form_get_text (TfAnalysisForm *self, const char *group, const char *key);
void tf_analysis_form_set_text (TfAnalysisForm *self, const char *group, const char *key,
                                const char *text);
/* The message shown for a field, NULL when none; "Analysis"/"Design" gives what shows
 * under the design chooser. */
const char *tf_analysis_form_get_message (TfAnalysisForm *self, const char *group,
                                          const char *key);

G_END_DECLS
