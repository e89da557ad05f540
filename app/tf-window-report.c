/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-report.c: Export Report…: a GtkFileChooserNative save dialog (GTK 4.8 has
 * no GtkFileDialog), then the report of the analysis in the format of the file's ending.
 */
#include <string.h>
#include <glib/gi18n.h>
#include "tf-window-report.h"
#include "tf-window-actions.h"
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

/* "seed-germination-report.pdf": the analysis's file name, then "-report". */
static char *
suggested_report_name (TfWindow *self)
{
  g_autofree char *base = self->file ? g_file_get_basename (self->file)
                          : g_strdup (self->is_demo ? "seed-germination" : _("analysis"));
  char *dot = strrchr (base, '.');

  if (dot && dot != base)
    *dot = '\0';
  /* TRANSLATORS: the suggested file name of a report; %s is the analysis's file name */
  return g_strdup_printf (_("%s-report.pdf"), base);
}

gboolean
tf_window_export_report (TfWindow *self, GFile *file)
{
  g_autoptr (GError) error = NULL;
  g_autoptr (GFile) target = NULL;
  g_autofree char *path = NULL;
  g_autofree char *name = NULL;
  g_autofree char *heading = NULL;
  g_autofree char *basename = NULL;

  g_return_val_if_fail (TF_IS_WINDOW (self), FALSE);
  g_return_val_if_fail (G_IS_FILE (file), FALSE);

  basename = g_file_get_basename (file);
  if (basename && strchr (basename, '.') == NULL)
    {
      g_autofree char *with_suffix = g_strconcat (basename, ".pdf", NULL);
      g_autoptr (GFile) parent = g_file_get_parent (file);

      target = g_file_get_child (parent, with_suffix);
    }
  else
    target = g_object_ref (file);

  path = g_file_get_path (target);
  name = tf_window_file_display_name (target);
  /* TRANSLATORS: heading of the dialog when a report could not be written; %s a file */
  heading = g_strdup_printf (_("Could Not Export “%s”"), name);
  if (path == NULL)
    {
      tf_window_show_error (self, heading, _("Only files on this computer can be written."));
      return FALSE;
    }
  if (self->results == NULL)
    {
      tf_window_show_error (self, heading,
                            _("The analysis has a field that needs fixing, marked in the form. Fix it, then export again."));
      return FALSE;
    }
  if (!tf_report_export (self->analysis, path, NULL, &error))
    {
      tf_window_show_error (self, heading, error->message);
      return FALSE;
    }
  tf_window_remember_folder (self, target);
  {
    g_autofree char *shown = g_file_get_basename (target);
    g_autofree char *message = g_strdup_printf (_("Exported “%s”"), shown);

    adw_toast_overlay_add_toast (self->toast_overlay, adw_toast_new (message));
  }
  return TRUE;
}

static void
on_report_chooser_response (GtkNativeDialog *dialog, int response, TfWindow *self)
{
  g_autoptr (GFile) file = NULL;

  if (response == GTK_RESPONSE_ACCEPT)
    file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (dialog));
  g_clear_object (&self->chooser);
  if (file)
    tf_window_export_report (self, file);
}

static void
export_report_action (GtkWidget *widget, const char *action_name, GVariant *parameter)
{
  TfWindow *self = TF_WINDOW (widget);
  g_autoptr (GtkFileFilter) filter = report_filter_new ();
  g_autofree char *name = suggested_report_name (self);

  if (self->chooser)
    return;
  self->chooser = gtk_file_chooser_native_new (_("Export Report"), GTK_WINDOW (self),
                                               GTK_FILE_CHOOSER_ACTION_SAVE,
                                               _("_Export"), _("_Cancel"));
  gtk_native_dialog_set_modal (GTK_NATIVE_DIALOG (self->chooser), TRUE);
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (self->chooser), filter);
  if (self->file)
    {
      g_autoptr (GFile) parent = g_file_get_parent (self->file);

      if (parent)
        gtk_file_chooser_set_current_folder (GTK_FILE_CHOOSER (self->chooser), parent, NULL);
    }
  gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (self->chooser), name);
  g_signal_connect (self->chooser, "response", G_CALLBACK (on_report_chooser_response), self);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (self->chooser));
}

void
tf_window_report_update (TfWindow *self)
{
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.export-report", self->results != NULL);
}

gboolean
tf_window_get_export_report_enabled (TfWindow *self)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), FALSE);
  return self->results != NULL;
}

void
tf_window_report_class_init (GtkWidgetClass *widget_class)
{
  gtk_widget_class_install_action (widget_class, "win.export-report", NULL, export_report_action);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_e, GDK_CONTROL_MASK | GDK_SHIFT_MASK,
                                       "win.export-report", NULL);
}
