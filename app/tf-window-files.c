/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-files.c: what opening, saving and both exports share: the window's one file
 * chooser (a GtkFileChooserNative: GTK 4.8 has no GtkFileDialog) opening in the
 * analysis's folder or the last one used, the names it suggests, the error dialog, and
 * an export's checks, writing and toast. Calls no other file of the window.
 */
#include <string.h>
#include <glib/gi18n.h>
#include "tf-window-files.h"

void
tf_window_show_error (TfWindow *self, const char *heading, const char *body)
{
  GtkWidget *dialog = adw_message_dialog_new (GTK_WINDOW (self), heading, body);

  adw_message_dialog_add_response (ADW_MESSAGE_DIALOG (dialog), "close", _("_Close"));
  adw_message_dialog_set_default_response (ADW_MESSAGE_DIALOG (dialog), "close");
  gtk_window_present (GTK_WINDOW (dialog));
}

char *
tf_window_file_display_name (GFile *file)
{
  g_autofree char *path = g_file_get_path (file);
  return path ? g_filename_display_name (path) : g_file_get_parse_name (file);
}

void
tf_window_remember_folder (TfWindow *self, GFile *file)
{
  g_autoptr (GFile) parent = NULL;
  g_autofree char *folder = NULL;

  if (self->settings == NULL)
    return;
  parent = g_file_get_parent (file);
  folder = parent ? g_file_get_path (parent) : NULL;
  if (folder)
    g_settings_set_string (self->settings, "last-folder", folder);
}

static void
chooser_set_folder (TfWindow *self, GtkFileChooser *chooser)
{
  g_autofree char *folder = NULL;

  if (self->file)
    {
      g_autoptr (GFile) parent = g_file_get_parent (self->file);
      if (parent)
        gtk_file_chooser_set_current_folder (chooser, parent, NULL);
      return;
    }
  if (self->settings)
    folder = g_settings_get_string (self->settings, "last-folder");
  if (folder && *folder)
    {
      g_autoptr (GFile) dir = g_file_new_for_path (folder);
      gtk_file_chooser_set_current_folder (chooser, dir, NULL);
    }
}

/* A file chooser of the window (one at a time: FALSE when one is already shown), opening
 * in the analysis's folder or the last one used, with the filter and, for a save, the
 * suggested name; response gets the window. */
gboolean
tf_window_chooser_show (TfWindow *self, GtkFileChooserAction action, const char *title,
                        const char *accept, GtkFileFilter *filter, const char *name,
                        GCallback response)
{
  if (self->chooser)
    return FALSE;
  self->chooser = gtk_file_chooser_native_new (title, GTK_WINDOW (self), action, accept,
                                               _("_Cancel"));
  gtk_native_dialog_set_modal (GTK_NATIVE_DIALOG (self->chooser), TRUE);
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (self->chooser), filter);
  chooser_set_folder (self, GTK_FILE_CHOOSER (self->chooser));
  if (name)
    gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (self->chooser), name);
  g_signal_connect (self->chooser, "response", response, self);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (self->chooser));
  return TRUE;
}

void
tf_window_chooser_dispose (TfWindow *self)
{
  if (self->chooser)
    {
      gtk_native_dialog_destroy (GTK_NATIVE_DIALOG (self->chooser));
      g_clear_object (&self->chooser);
    }
}

/* The name a save dialog suggests: the analysis's file name without its ending (or the
 * demo's, or "analysis"), then tail: ".twofold", "-densities.png", "-report.pdf". */
char *
tf_window_suggested_name (TfWindow *self, const char *tail)
{
  g_autofree char *stem = NULL;

  if (self->file)
    {
      char *dot;

      stem = g_file_get_basename (self->file);
      dot = strrchr (stem, '.');
      if (dot && dot != stem)
        *dot = '\0';
    }
  else
    stem = g_strdup (self->is_demo ? "seed-germination" : _("analysis"));
  return g_strconcat (stem, tail, NULL);
}

/* file, or when its name has no ending at all, the same name with suffix added. */
GFile *
tf_window_file_with_suffix (GFile *file, const char *suffix)
{
  g_autofree char *basename = g_file_get_basename (file);

  if (basename && strchr (basename, '.') == NULL)
    {
      g_autofree char *with_suffix = g_strconcat (basename, suffix, NULL);
      g_autoptr (GFile) parent = g_file_get_parent (file);

      return g_file_get_child (parent, with_suffix);
    }
  return g_object_ref (file);
}

/* What Export Figure… and Export Report… share: a file on this computer and an analysis
 * that computes, else a dialog that names the file and says why; then write, then a
 * toast, or the writer's error in the dialog. */
gboolean
tf_window_export_to (TfWindow *self, GFile *file, TfWindowWriter write, gconstpointer data)
{
  g_autoptr (GError) error = NULL;
  g_autofree char *path = NULL;
  g_autofree char *name = NULL;
  g_autofree char *heading = NULL;

  g_return_val_if_fail (G_IS_FILE (file), FALSE);

  path = g_file_get_path (file);
  name = tf_window_file_display_name (file);
  /* TRANSLATORS: heading of the dialog when a figure or report could not be written */
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
  if (!write (self, path, data, &error))
    {
      tf_window_show_error (self, heading, error->message);
      return FALSE;
    }
  tf_window_remember_folder (self, file);
  {
    g_autofree char *basename = g_file_get_basename (file);
    g_autofree char *message = g_strdup_printf (_("Exported “%s”"), basename);

    adw_toast_overlay_add_toast (self->toast_overlay, adw_toast_new (message));
  }
  return TRUE;
}
