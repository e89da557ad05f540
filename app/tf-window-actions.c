/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-actions.c: what the window's actions do: open an analysis, save it, save it
 * under a new name, and ask whether to save unsaved changes before they would be lost
 * (closing, or opening another analysis over them). Export Figure… is in
 * tf-window-figure.c, Export Report… in tf-window-report.c.
 */
#include <glib/gi18n.h>
#include "tf-window-actions.h"
#include "tf-window-document.h"
#include "tf-window-files.h"
#include "tf-analysis-file.h"

#define FILE_SUFFIX ".twofold"

static GtkFileFilter *
twofold_filter_new (void)
{
  GtkFileFilter *filter = gtk_file_filter_new ();

  gtk_file_filter_set_name (filter, _("Twofold analyses"));
  gtk_file_filter_add_mime_type (filter, "application/x-twofold");
  gtk_file_filter_add_suffix (filter, "twofold");
  return filter;
}

static void
on_open_response (GtkNativeDialog *dialog, int response, TfWindow *self)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr (GFile) file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (dialog));
      if (file)
        tf_window_document_open (self, file);
    }
  g_clear_object (&self->chooser);
}

static void
show_open_chooser (TfWindow *self)
{
  g_autoptr (GtkFileFilter) filter = twofold_filter_new ();

  tf_window_chooser_show (self, GTK_FILE_CHOOSER_ACTION_OPEN, _("Open Analysis"), _("_Open"),
                          filter, NULL, G_CALLBACK (on_open_response));
}

static void
open_action (GtkWidget *widget, const char *action_name, GVariant *parameter)
{
  TfWindow *self = (TfWindow *) widget;    /* the action is the window class's */

  if (self->chooser)
    return;
  if (self->modified)
    tf_window_ask_save_changes (self, TF_PENDING_OPEN);
  else
    show_open_chooser (self);
}

static gboolean
save_to (TfWindow *self, GFile *file)
{
  g_autoptr (GError) error = NULL;
  g_autofree char *path = g_file_get_path (file);
  g_autofree char *name = tf_window_file_display_name (file);
  g_autofree char *basename = g_file_get_basename (file);

  if (!self->savable)
    {
      g_autofree char *heading = g_strdup_printf (_("Could Not Save “%s”"), name);
      tf_window_show_error (self, heading,
                  _("The analysis has a field that needs fixing, marked in the form. Fix it, then save again."));
      return FALSE;
    }
  if (path == NULL || !tf_analysis_save (self->analysis, path, &error))
    {
      g_autofree char *heading = g_strdup_printf (_("Could Not Save “%s”"), name);
      tf_window_show_error (self, heading, error ? error->message : _("Only files on this computer can be written."));
      return FALSE;
    }
  g_set_object (&self->file, file);
  self->is_demo = FALSE;
  self->modified = FALSE;
  tf_window_document_update_title (self);
  {
    g_autofree char *message = g_strdup_printf (_("Saved “%s”"), basename);
    adw_toast_overlay_add_toast (self->toast_overlay, adw_toast_new (message));
  }
  tf_window_remember_folder (self, file);
  return TRUE;
}

/* After the analysis was saved (saved TRUE) or not, go on with what waited for it. */
static void
continue_pending (TfWindow *self, gboolean saved)
{
  TfPendingAction pending = self->pending;

  self->pending = TF_PENDING_NONE;
  if (!saved)
    return;
  switch (pending)
    {
    case TF_PENDING_CLOSE:
      self->close_confirmed = TRUE;
      gtk_window_close (GTK_WINDOW (self));
      break;
    case TF_PENDING_OPEN:
      show_open_chooser (self);
      break;
    case TF_PENDING_NONE:
    default:
      break;
    }
}

static void
on_save_response (GtkNativeDialog *dialog, int response, TfWindow *self)
{
  gboolean saved = FALSE;

  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr (GFile) file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (dialog));
      g_autofree char *basename = file ? g_file_get_basename (file) : NULL;

      if (file && basename && !g_str_has_suffix (basename, FILE_SUFFIX))
        {
          g_autofree char *with_suffix = g_strconcat (basename, FILE_SUFFIX, NULL);
          g_autoptr (GFile) parent = g_file_get_parent (file);
          g_autoptr (GFile) renamed = g_file_get_child (parent, with_suffix);
          g_set_object (&file, renamed);
        }
      if (file)
        saved = save_to (self, file);
    }
  g_clear_object (&self->chooser);
  continue_pending (self, saved);
}

static void
save_as_action (GtkWidget *widget, const char *action_name, GVariant *parameter)
{
  TfWindow *self = (TfWindow *) widget;    /* the action is the window class's */
  g_autoptr (GtkFileFilter) filter = twofold_filter_new ();
  g_autofree char *name = tf_window_suggested_name (self, FILE_SUFFIX);

  if (!tf_window_chooser_show (self, GTK_FILE_CHOOSER_ACTION_SAVE, _("Save Analysis"),
                               _("_Save"), filter, name, G_CALLBACK (on_save_response)))
    self->pending = TF_PENDING_NONE;
}

static void
save_action (GtkWidget *widget, const char *action_name, GVariant *parameter)
{
  TfWindow *self = (TfWindow *) widget;    /* the action is the window class's */

  if (self->file == NULL)
    save_as_action (widget, "win.save-as", NULL);
  else
    save_to (self, self->file);
}

/* Unsaved changes */

static void
on_save_changes_response (AdwMessageDialog *dialog, const char *response, TfWindow *self)
{
  TfPendingAction pending = self->pending;

  /* clicking a response closes the dialog already; a response emitted any other way
   * (adw_message_dialog_response) does not */
  self->save_changes_dialog = NULL;
  g_signal_handlers_disconnect_by_func (dialog, on_save_changes_response, self);
  /* the dialog outlives this handler (the emission holds it) and may outlive the
   * window, which closes below: a transient parent is not kept alive, so drop it now */
  gtk_window_set_transient_for (GTK_WINDOW (dialog), NULL);
  gtk_window_destroy (GTK_WINDOW (dialog));

  if (g_strcmp0 (response, "discard") == 0)
    continue_pending (self, TRUE);
  else if (g_strcmp0 (response, "save") == 0)
    {
      if (self->file && !self->is_demo)
        continue_pending (self, save_to (self, self->file));
      else
        {
          /* continue_pending runs when the file chooser answers */
          self->pending = pending;
          save_as_action (GTK_WIDGET (self), "win.save-as", NULL);
        }
    }
  else
    continue_pending (self, FALSE);
}

void
tf_window_ask_save_changes (TfWindow *self, TfPendingAction then)
{
  g_autofree char *name = tf_window_document_name (self);
  g_autofree char *heading = NULL;
  GtkWidget *dialog;

  if (self->save_changes_dialog)
    {
      self->pending = then;
      gtk_window_present (GTK_WINDOW (self->save_changes_dialog));
      return;
    }

  /* TRANSLATORS: heading of the dialog shown before closing or replacing an analysis
   * that has unsaved changes; %s is its title or file name */
  heading = g_strdup_printf (_("Save changes to “%s”?"), name);
  dialog = adw_message_dialog_new (GTK_WINDOW (self), heading,
                                   _("The analysis was changed since it was last saved. If you discard the changes, they are lost."));
  adw_message_dialog_add_responses (ADW_MESSAGE_DIALOG (dialog),
                                    "cancel", _("_Cancel"),
                                    "discard", _("_Discard"),
                                    "save", _("_Save"),
                                    NULL);
  adw_message_dialog_set_response_appearance (ADW_MESSAGE_DIALOG (dialog), "discard",
                                              ADW_RESPONSE_DESTRUCTIVE);
  adw_message_dialog_set_response_appearance (ADW_MESSAGE_DIALOG (dialog), "save",
                                              ADW_RESPONSE_SUGGESTED);
  adw_message_dialog_set_default_response (ADW_MESSAGE_DIALOG (dialog), "cancel");
  adw_message_dialog_set_close_response (ADW_MESSAGE_DIALOG (dialog), "cancel");
  g_signal_connect (dialog, "response", G_CALLBACK (on_save_changes_response), self);

  self->pending = then;
  self->save_changes_dialog = ADW_MESSAGE_DIALOG (dialog);
  gtk_window_present (GTK_WINDOW (dialog));
}

/* GObject */

void
tf_window_actions_class_init (GtkWidgetClass *widget_class)
{
  gtk_widget_class_install_action (widget_class, "win.open", NULL, open_action);
  gtk_widget_class_install_action (widget_class, "win.save", NULL, save_action);
  gtk_widget_class_install_action (widget_class, "win.save-as", NULL, save_as_action);
}

void
tf_window_actions_dispose (TfWindow *self)
{
  if (self->save_changes_dialog)
    {
      AdwMessageDialog *dialog = g_steal_pointer (&self->save_changes_dialog);

      g_signal_handlers_disconnect_by_func (dialog, on_save_changes_response, self);
      gtk_window_destroy (GTK_WINDOW (dialog));
    }
}
