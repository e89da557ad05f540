/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-form-page.h: inside TfAnalysisForm: the page of one design, built from the fields
 * of its class (TfDesignClass.fields), filled from an analysis and read back into one.
 */
#pragma once

#include <gtk/gtk.h>
#include "tf-analysis.h"
#include "tf-design.h"

G_BEGIN_DECLS

typedef struct {
  const TfFormField *info;
  GtkWidget *row;               /* the grid holding it, shared with its pair */
  GtkWidget *label;
  GtkWidget *input;             /* GtkEntry, GtkTextView, GtkSwitch or GtkDropDown */
  GtkWidget *frame;             /* the scrolled window round a GtkTextView */
  GtkWidget *toggle;            /* OPTIONAL_NUMBER: the switch that turns it on */
  GtkWidget *hint;
  GtkWidget *message;
} TfFormFieldWidgets;

typedef struct {
  const TfDesignClass *klass;
  GtkWidget *box;
  GtkToggleButton *values_button;       /* NULL when the design has no samples */
  GtkToggleButton *summaries_button;
  TfFormFieldWidgets *fields;           /* klass->n_fields */
  void (*changed) (gpointer data);      /* any edit of the page */
  gpointer data;
} TfFormPage;

void tf_form_page_build (TfFormPage *page, TfDesign design, void (*changed) (gpointer),
                         gpointer data);
void tf_form_page_clear (TfFormPage *page);
void tf_form_page_fill (TfFormPage *page, const TfAnalysis *analysis);
gboolean tf_form_page_apply (TfFormPage *page, TfAnalysis *analysis, GPtrArray *problems);

gboolean tf_form_page_get_raw (const TfFormPage *page);
void tf_form_page_set_raw (TfFormPage *page, gboolean raw);
gboolean tf_form_page_field_shown (const TfFormPage *page, const TfFormFieldWidgets *field);
TfFormFieldWidgets *tf_form_page_find (TfFormPage *page, const char *group, const char *key);
char *tf_form_field_get_text (TfFormFieldWidgets *field);
void tf_form_field_set_text (TfFormFieldWidgets *field, const char *text);

G_END_DECLS
