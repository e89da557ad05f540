/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-analysis-form.c: one form for every design. A drop-down chooses the design; each
 * design has a page of its own in a stack (tf-form-page.c), so what was typed in one
 * design stays there while another is shown.
 */
#include <glib/gi18n-lib.h>
#include "tf-design.h"
#include "tf-analysis-form.h"
#include "tf-widget-template.h"
#include "tf-form-page.h"

struct _TfAnalysisForm
{
  GtkWidget parent_instance;

  GtkDropDown *design_dropdown;
  GtkLabel *design_message;
  GtkStack *pages;

  TfFormPage page[TF_N_DESIGNS];
  gboolean updating;
};

G_DEFINE_FINAL_TYPE (TfAnalysisForm, tf_analysis_form, GTK_TYPE_WIDGET)

enum { SIGNAL_CHANGED, N_SIGNALS };
static guint signals[N_SIGNALS];

static TfFormPage *
current_page (TfAnalysisForm *self)
{
  return &self->page[tf_analysis_form_get_design (self)];
}

static void
emit_changed (gpointer data)
{
  TfAnalysisForm *self = data;

  if (!self->updating)
    g_signal_emit (self, signals[SIGNAL_CHANGED], 0);
}

static void
show_page (TfAnalysisForm *self)
{
  gtk_stack_set_visible_child (self->pages, current_page (self)->box);
}

static void
on_design_selected (TfAnalysisForm *self)
{
  show_page (self);
  emit_changed (self);
}

TfDesign
tf_analysis_form_get_design (TfAnalysisForm *self)
{
  guint selected;

  g_return_val_if_fail (TF_IS_ANALYSIS_FORM (self), tf_design_default ());
  selected = gtk_drop_down_get_selected (self->design_dropdown);
  return selected < TF_N_DESIGNS ? (TfDesign) selected : tf_design_default ();
}

void
tf_analysis_form_set_design (TfAnalysisForm *self, TfDesign design)
{
  g_return_if_fail (TF_IS_ANALYSIS_FORM (self));
  g_return_if_fail ((guint) design < TF_N_DESIGNS);
  gtk_drop_down_set_selected (self->design_dropdown, (guint) design);
}

void
tf_analysis_form_set_analysis (TfAnalysisForm *self, const TfAnalysis *analysis)
{
  g_return_if_fail (TF_IS_ANALYSIS_FORM (self));
  g_return_if_fail (analysis != NULL && (guint) analysis->design < TF_N_DESIGNS);

  self->updating = TRUE;
  for (guint d = 0; d < TF_N_DESIGNS; d++)
    {
      if (d == (guint) analysis->design)
        tf_form_page_fill (&self->page[d], analysis);
      else
        {
          g_autoptr (TfAnalysis) defaults = tf_analysis_new ((TfDesign) d);
          tf_form_page_fill (&self->page[d], defaults);
        }
    }
  gtk_drop_down_set_selected (self->design_dropdown, (guint) analysis->design);
  show_page (self);
  self->updating = FALSE;
}

gboolean
tf_analysis_form_apply (TfAnalysisForm *self, TfAnalysis *analysis, GPtrArray *problems)
{
  g_return_val_if_fail (TF_IS_ANALYSIS_FORM (self), FALSE);
  g_return_val_if_fail (analysis != NULL, FALSE);
  return tf_form_page_apply (current_page (self), analysis, problems);
}

static void
mark_field (TfFormFieldWidgets *field, const TfProblem *problem)
{
  GtkWidget *input = field->input;

  /* the message takes the hint's place */
  gtk_widget_set_visible (field->hint, problem == NULL);
  gtk_widget_set_visible (field->message, problem != NULL);
  gtk_label_set_text (GTK_LABEL (field->message), problem ? problem->message : "");
  if (problem)
    {
      gtk_widget_add_css_class (input, "error");
      if (field->frame)
        gtk_widget_add_css_class (field->frame, "error");
      if (GTK_IS_ENTRY (input))
        {
          gtk_entry_set_icon_from_icon_name (GTK_ENTRY (input), GTK_ENTRY_ICON_SECONDARY,
                                             "dialog-error-symbolic");
          gtk_entry_set_icon_tooltip_text (GTK_ENTRY (input), GTK_ENTRY_ICON_SECONDARY,
                                           problem->message);
        }
      gtk_accessible_update_state (GTK_ACCESSIBLE (input), GTK_ACCESSIBLE_STATE_INVALID,
                                   GTK_ACCESSIBLE_INVALID_TRUE, -1);
    }
  else
    {
      gtk_widget_remove_css_class (input, "error");
      if (field->frame)
        gtk_widget_remove_css_class (field->frame, "error");
      if (GTK_IS_ENTRY (input))
        gtk_entry_set_icon_from_icon_name (GTK_ENTRY (input), GTK_ENTRY_ICON_SECONDARY, NULL);
      gtk_accessible_reset_state (GTK_ACCESSIBLE (input), GTK_ACCESSIBLE_STATE_INVALID);
    }
}

void
tf_analysis_form_show_problems (TfAnalysisForm *self, GPtrArray *problems)
{
  g_autoptr (GString) other = g_string_new (NULL);

  g_return_if_fail (TF_IS_ANALYSIS_FORM (self));

  for (guint d = 0; d < TF_N_DESIGNS; d++)
    {
      TfFormPage *page = &self->page[d];
      gboolean current = page == current_page (self);

      for (guint i = 0; i < page->klass->n_fields; i++)
        {
          TfFormFieldWidgets *field = &page->fields[i];
          const TfProblem *problem = NULL;

          if (current && problems && tf_form_page_field_shown (page, field))
            problem = tf_problem_list_find (problems, field->info->group, field->info->key);
          mark_field (field, problem);
        }
    }

  /* what no shown field can show: the design itself, a field of the other way of
   * giving the data, a problem of the whole analysis */
  for (guint i = 0; problems && i < problems->len; i++)
    {
      const TfProblem *problem = g_ptr_array_index (problems, i);
      TfFormFieldWidgets *field = tf_form_page_find (current_page (self), problem->group,
                                                     problem->key);

      if (field && tf_form_page_field_shown (current_page (self), field))
        continue;   /* shown under its field (the first problem of a field shows) */
      if (other->len > 0)
        g_string_append_c (other, '\n');
      g_string_append (other, problem->message);
    }
  gtk_label_set_text (self->design_message, other->str);
  gtk_widget_set_visible (GTK_WIDGET (self->design_message), other->len > 0);
}

gboolean
tf_analysis_form_get_raw_values (TfAnalysisForm *self)
{
  g_return_val_if_fail (TF_IS_ANALYSIS_FORM (self), FALSE);
  return tf_form_page_get_raw (current_page (self));
}

void
tf_analysis_form_set_raw_values (TfAnalysisForm *self, gboolean raw)
{
  g_return_if_fail (TF_IS_ANALYSIS_FORM (self));
  tf_form_page_set_raw (current_page (self), raw);
}

GtkWidget *
tf_analysis_form_get_field (TfAnalysisForm *self, const char *group, const char *key)
{
  TfFormFieldWidgets *field;

  g_return_val_if_fail (TF_IS_ANALYSIS_FORM (self), NULL);
  if (g_strcmp0 (group, "Analysis") == 0 && g_strcmp0 (key, "Design") == 0)
    return GTK_WIDGET (self->design_dropdown);
  field = tf_form_page_find (current_page (self), group, key);
  return field ? field->input : NULL;
}

GtkEditable *
tf_analysis_form_get_entry (TfAnalysisForm *self, const char *group, const char *key)
{
  GtkWidget *input = tf_analysis_form_get_field (self, group, key);

  return input && GTK_IS_ENTRY (input) ? GTK_EDITABLE (input) : NULL;
}

char *
tf_analysis_form_get_text (TfAnalysisForm *self, const char *group, const char *key)
{
  TfFormFieldWidgets *field;

  g_return_val_if_fail (TF_IS_ANALYSIS_FORM (self), NULL);
  field = tf_form_page_find (current_page (self), group, key);
  return field ? tf_form_field_get_text (field) : NULL;
}

void
tf_analysis_form_set_text (TfAnalysisForm *self, const char *group, const char *key,
                           const char *text)
{
  TfFormFieldWidgets *field;

  g_return_if_fail (TF_IS_ANALYSIS_FORM (self));
  field = tf_form_page_find (current_page (self), group, key);
  g_return_if_fail (field != NULL);
  tf_form_field_set_text (field, text);
}

const char *
tf_analysis_form_get_message (TfAnalysisForm *self, const char *group, const char *key)
{
  TfFormFieldWidgets *field;

  g_return_val_if_fail (TF_IS_ANALYSIS_FORM (self), NULL);
  if (g_strcmp0 (group, "Analysis") == 0 && g_strcmp0 (key, "Design") == 0)
    return gtk_widget_get_visible (GTK_WIDGET (self->design_message))
           ? gtk_label_get_text (self->design_message) : NULL;
  field = tf_form_page_find (current_page (self), group, key);
  if (field == NULL || !gtk_widget_get_visible (field->message))
    return NULL;
  return gtk_label_get_text (GTK_LABEL (field->message));
}

/* GObject */

static void
tf_analysis_form_dispose (GObject *object)
{
  tf_widget_dispose_template (GTK_WIDGET (object), TF_TYPE_ANALYSIS_FORM);
  G_OBJECT_CLASS (tf_analysis_form_parent_class)->dispose (object);
}

static void
tf_analysis_form_finalize (GObject *object)
{
  TfAnalysisForm *self = TF_ANALYSIS_FORM (object);

  for (guint d = 0; d < TF_N_DESIGNS; d++)
    tf_form_page_clear (&self->page[d]);
  G_OBJECT_CLASS (tf_analysis_form_parent_class)->finalize (object);
}

static void
tf_analysis_form_class_init (TfAnalysisFormClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = tf_analysis_form_dispose;
  object_class->finalize = tf_analysis_form_finalize;

  /* Emitted when the user edits any field or chooses another design. */
  signals[SIGNAL_CHANGED] = g_signal_new ("changed", G_TYPE_FROM_CLASS (klass),
                                          G_SIGNAL_RUN_LAST, 0, NULL, NULL, NULL,
                                          G_TYPE_NONE, 0);

  gtk_widget_class_set_template_from_resource (widget_class,
                                               "/org/twofold/Twofold/ui/tf-analysis-form.ui");
  gtk_widget_class_bind_template_child (widget_class, TfAnalysisForm, design_dropdown);
  gtk_widget_class_bind_template_child (widget_class, TfAnalysisForm, design_message);
  gtk_widget_class_bind_template_child (widget_class, TfAnalysisForm, pages);
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "tf-analysis-form");
}

static void
tf_analysis_form_init (TfAnalysisForm *self)
{
  g_autoptr (GtkStringList) designs = gtk_string_list_new (NULL);

  gtk_widget_init_template (GTK_WIDGET (self));

  self->updating = TRUE;
  for (guint d = 0; d < TF_N_DESIGNS; d++)
    {
      g_autoptr (TfAnalysis) defaults = tf_analysis_new ((TfDesign) d);

      gtk_string_list_append (designs, tf_design_label ((TfDesign) d));
      tf_form_page_build (&self->page[d], (TfDesign) d, emit_changed, self);
      gtk_stack_add_named (self->pages, self->page[d].box, tf_design_to_string ((TfDesign) d));
      tf_form_page_fill (&self->page[d], defaults);
    }
  gtk_drop_down_set_model (self->design_dropdown, G_LIST_MODEL (designs));
  gtk_drop_down_set_selected (self->design_dropdown, (guint) tf_design_default ());
  show_page (self);
  self->updating = FALSE;
  g_signal_connect_swapped (self->design_dropdown, "notify::selected",
                            G_CALLBACK (on_design_selected), self);
}

GtkWidget *
tf_analysis_form_new (void)
{
  return g_object_new (TF_TYPE_ANALYSIS_FORM, NULL);
}
