/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window.c: one analysis in a window: the GObject, its template and settings, and the
 * functions of tf-window.h and tf-window-private.h, which check their arguments and pass
 * on to the window's parts (tf-window-fields.h names them). Closing the window with
 * unsaved changes first asks whether to save them, so nothing is lost.
 */
#include <glib/gi18n.h>
#include "tf-window.h"
#include "tf-window-private.h"
#include "tf-window-fields.h"
#include "tf-window-actions.h"
#include "tf-window-document.h"
#include "tf-window-figure.h"
#include "tf-window-report.h"
#include "tf-window-files.h"
#include "tf-results.h"

G_DEFINE_FINAL_TYPE (TfWindow, tf_window, ADW_TYPE_APPLICATION_WINDOW)

void
tf_window_set_analysis (TfWindow *self, const TfAnalysis *analysis, GFile *file)
{
  g_return_if_fail (TF_IS_WINDOW (self));
  g_return_if_fail (analysis != NULL);
  tf_window_document_set (self, analysis, file);
}

gboolean
tf_window_open_file (TfWindow *self, GFile *file)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), FALSE);
  return tf_window_document_open (self, file);
}

void
tf_window_open_demo (TfWindow *self)
{
  g_return_if_fail (TF_IS_WINDOW (self));
  tf_window_document_open_demo (self);
}

/* Window state */

static gboolean
tf_window_close_request (GtkWindow *window)
{
  TfWindow *self = TF_WINDOW (window);

  if (self->modified && !self->close_confirmed)
    {
      /* also while a file chooser is open: the question comes first */
      tf_window_ask_save_changes (self, TF_PENDING_CLOSE);
      return TRUE;
    }
  self->close_confirmed = FALSE;

  if (self->settings)
    {
      int width, height;

      gtk_window_get_default_size (window, &width, &height);
      g_settings_set_int (self->settings, "window-width", width);
      g_settings_set_int (self->settings, "window-height", height);
      g_settings_set_boolean (self->settings, "window-maximized", gtk_window_is_maximized (window));
    }
  return GTK_WINDOW_CLASS (tf_window_parent_class)->close_request (window);
}

static void
load_settings (TfWindow *self)
{
  GSettingsSchemaSource *source = g_settings_schema_source_get_default ();
  g_autoptr (GSettingsSchema) schema = source ? g_settings_schema_source_lookup (source, TF_APP_ID, TRUE)
                                              : NULL;

  if (schema == NULL)
    return;
  self->settings = g_settings_new (TF_APP_ID);
  gtk_window_set_default_size (GTK_WINDOW (self),
                               g_settings_get_int (self->settings, "window-width"),
                               g_settings_get_int (self->settings, "window-height"));
  if (g_settings_get_boolean (self->settings, "window-maximized"))
    gtk_window_maximize (GTK_WINDOW (self));
  g_settings_bind (self->settings, "show-explanations", self->flap, "reveal-flap",
                   G_SETTINGS_BIND_DEFAULT);
}

/* Accessors for the tests */

TfAnalysisForm *
tf_window_get_form (TfWindow *self)
{
  return self->form;
}

TfPlotView *
tf_window_get_plot_view (TfWindow *self)
{
  return self->plot_view;
}

TfResultList *
tf_window_get_result_list (TfWindow *self)
{
  return self->result_list;
}

TfExplanationPane *
tf_window_get_explanation_pane (TfWindow *self)
{
  return self->explanation_pane;
}

const TfAnalysis *
tf_window_get_analysis (TfWindow *self)
{
  return self->analysis;
}

const char *
tf_window_get_visible_page (TfWindow *self)
{
  return gtk_stack_get_visible_child_name (self->center_stack);
}

gboolean
tf_window_get_modified (TfWindow *self)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), FALSE);
  return self->modified;
}

const char *
tf_window_get_subtitle (TfWindow *self)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), NULL);
  return adw_window_title_get_subtitle (self->window_title);
}

AdwMessageDialog *
tf_window_get_save_changes_dialog (TfWindow *self)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), NULL);
  return self->save_changes_dialog;
}

void
tf_window_show_export_options (TfWindow *self, GFile *file)
{
  g_return_if_fail (TF_IS_WINDOW (self));
  tf_window_figure_show_options (self, file);
}

AdwMessageDialog *
tf_window_get_export_dialog (TfWindow *self)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), NULL);
  return self->export_dialog;
}

gboolean
tf_window_get_export_enabled (TfWindow *self)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), FALSE);
  return self->export_enabled;
}

gboolean
tf_window_export_figure (TfWindow *self, GFile *file, double width_mm, double height_mm,
                         double dpi, const TfFigureOptions *options)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), FALSE);
  return tf_window_figure_export (self, file, width_mm, height_mm, dpi, options);
}

gboolean
tf_window_export_report (TfWindow *self, GFile *file)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), FALSE);
  return tf_window_report_export (self, file);
}

gboolean
tf_window_get_export_report_enabled (TfWindow *self)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), FALSE);
  return self->results != NULL;
}

/* GObject */

static void
tf_window_dispose (GObject *object)
{
  TfWindow *self = TF_WINDOW (object);

  tf_window_actions_dispose (self);
  tf_window_figure_dispose (self);
  tf_window_chooser_dispose (self);
  g_clear_object (&self->settings);
  gtk_widget_dispose_template (GTK_WIDGET (self), TF_TYPE_WINDOW);
  G_OBJECT_CLASS (tf_window_parent_class)->dispose (object);
}

static void
tf_window_finalize (GObject *object)
{
  TfWindow *self = TF_WINDOW (object);

  g_clear_pointer (&self->analysis, tf_analysis_free);
  g_clear_pointer (&self->results, tf_results_free);
  g_clear_object (&self->file);
  g_clear_object (&self->export_file);
  G_OBJECT_CLASS (tf_window_parent_class)->finalize (object);
}

static void
tf_window_class_init (TfWindowClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);
  GtkWindowClass *window_class = GTK_WINDOW_CLASS (klass);

  object_class->dispose = tf_window_dispose;
  object_class->finalize = tf_window_finalize;
  window_class->close_request = tf_window_close_request;

  g_type_ensure (TF_TYPE_ANALYSIS_FORM);
  g_type_ensure (TF_TYPE_PLOT_VIEW);
  g_type_ensure (TF_TYPE_RESULT_LIST);
  g_type_ensure (TF_TYPE_EXPLANATION_PANE);

  gtk_widget_class_set_template_from_resource (widget_class, "/org/twofold/Twofold/ui/tf-window.ui");
  gtk_widget_class_bind_template_child (widget_class, TfWindow, window_title);
  gtk_widget_class_bind_template_child (widget_class, TfWindow, toast_overlay);
  gtk_widget_class_bind_template_child (widget_class, TfWindow, flap);
  gtk_widget_class_bind_template_child (widget_class, TfWindow, explanations_button);
  gtk_widget_class_bind_template_child (widget_class, TfWindow, form);
  gtk_widget_class_bind_template_child (widget_class, TfWindow, center_stack);
  gtk_widget_class_bind_template_child (widget_class, TfWindow, paned);
  gtk_widget_class_bind_template_child (widget_class, TfWindow, plot_view);
  gtk_widget_class_bind_template_child (widget_class, TfWindow, result_list);
  gtk_widget_class_bind_template_child (widget_class, TfWindow, invalid_page);
  gtk_widget_class_bind_template_child (widget_class, TfWindow, explanation_pane);

  tf_window_actions_class_init (widget_class);
  tf_window_figure_class_init (widget_class);
  tf_window_report_class_init (widget_class);
}

static void
tf_window_init (TfWindow *self)
{
  g_autoptr (GPropertyAction) show_explanations = NULL;

  gtk_widget_init_template (GTK_WIDGET (self));

  show_explanations = g_property_action_new ("show-explanations", self->flap, "reveal-flap");
  g_action_map_add_action (G_ACTION_MAP (self), G_ACTION (show_explanations));

  load_settings (self);
  tf_window_figure_init (self);
  tf_window_document_init (self);
}

TfWindow *
tf_window_new (GtkApplication *application)
{
  return g_object_new (TF_TYPE_WINDOW, "application", application, NULL);
}
