/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-report.c: Export Report…: a GtkFileChooserNative save dialog (GTK 4.8 has
 * no GtkFileDialog), then the report of the analysis in the format of the file's ending.
 */
#include <string.h>
#include <glib/gi18n.h>
#include "tf-window-report.h"
#include "tf-window-files.h"
#include "tf-report-render.h"

static GtkFileFilter *
report_filter_new (void)
{
  GtkFileFilter *filter = gtk_file_filter_new ();

  gtk_file_filter_set_name (filter, _("Reports (PDF, HTML, Markdown)"));
  gtk_file_filter_add_suffix (filter, "pdf");
  gtk_file_filter_add_suffix (filter, "html");
  gtk_file_filter_add_suffix (filter, "htm");
  gtk_file_filter_add_suffix (filter, "md");
  return filter;
}

static gboolean
write_report (TfWindow *self, const char *path, gconstpointer data, GError **error)
{
  return tf_report_export (self->analysis, path, NULL, error);
}

gboolean
tf_window_report_export (TfWindow *self, GFile *file)
{
  g_autoptr (GFile) target = NULL;

  g_return_val_if_fail (G_IS_FILE (file), FALSE);
  target = tf_window_file_with_suffix (file, ".pdf");
  return tf_window_export_to (self, target, write_report, NULL);
}

static void
on_report_chooser_response (GtkNativeDialog *dialog, int response, TfWindow *self)
{
  g_autoptr (GFile) file = NULL;

  if (response == GTK_RESPONSE_ACCEPT)
    file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (dialog));
  g_clear_object (&self->chooser);
  if (file)
    tf_window_report_export (self, file);
}

static void
export_report_action (GtkWidget *widget, const char *action_name, GVariant *parameter)
{
  TfWindow *self = (TfWindow *) widget;    /* the action is the window class's */
  g_autoptr (GtkFileFilter) filter = report_filter_new ();
  /* TRANSLATORS: the end of a report's suggested file name, after the analysis's name */
  g_autofree char *name = tf_window_suggested_name (self, _("-report.pdf"));

  tf_window_chooser_show (self, GTK_FILE_CHOOSER_ACTION_SAVE, _("Export Report"), _("_Export"),
                          filter, name, G_CALLBACK (on_report_chooser_response));
}

void
tf_window_report_update (TfWindow *self)
{
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.export-report", self->results != NULL);
}

void
tf_window_report_class_init (GtkWidgetClass *widget_class)
{
  gtk_widget_class_install_action (widget_class, "win.export-report", NULL, export_report_action);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_e, GDK_CONTROL_MASK | GDK_SHIFT_MASK,
                                       "win.export-report", NULL);
}
