/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-actions.c: what the window's actions do: open an analysis, save it, save it
 * under a new name, export the figure shown, and ask whether to save unsaved changes
 * before they would be lost (closing, or opening another analysis over them).
 */
#include <string.h>
#include <glib/gi18n.h>
#include "tf-window-actions.h"
#include "tf-window-report.h"
#include "tf-analysis-file.h"
#include "tf-figure-export.h"

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

static void
on_open_response (GtkNativeDialog *dialog, int response, TfWindow *self)
{
  if (response == GTK_RESPONSE_ACCEPT)
    {
      g_autoptr (GFile) file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (dialog));
      if (file)
        tf_window_open_file (self, file);
    }
  g_clear_object (&self->chooser);
}

static void
show_open_chooser (TfWindow *self)
{
  g_autoptr (GtkFileFilter) filter = twofold_filter_new ();

  if (self->chooser)
    return;
  self->chooser = gtk_file_chooser_native_new (_("Open Analysis"), GTK_WINDOW (self),
                                               GTK_FILE_CHOOSER_ACTION_OPEN,
                                               _("_Open"), _("_Cancel"));
  gtk_native_dialog_set_modal (GTK_NATIVE_DIALOG (self->chooser), TRUE);
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (self->chooser), filter);
  chooser_set_folder (self, GTK_FILE_CHOOSER (self->chooser));
  g_signal_connect (self->chooser, "response", G_CALLBACK (on_open_response), self);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (self->chooser));
}

static void
open_action (GtkWidget *widget, const char *action_name, GVariant *parameter)
{
  TfWindow *self = TF_WINDOW (widget);

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
  tf_window_update_title (self);
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

static char *
suggested_name (TfWindow *self)
{
  if (self->file)
    return g_file_get_basename (self->file);
  if (self->is_demo)
    return g_strdup ("seed-germination" FILE_SUFFIX);
  return g_strconcat (_("analysis"), FILE_SUFFIX, NULL);
}

static void
save_as_action (GtkWidget *widget, const char *action_name, GVariant *parameter)
{
  TfWindow *self = TF_WINDOW (widget);
  g_autoptr (GtkFileFilter) filter = twofold_filter_new ();
  g_autofree char *name = suggested_name (self);

  if (self->chooser)
    {
      self->pending = TF_PENDING_NONE;
      return;
    }
  self->chooser = gtk_file_chooser_native_new (_("Save Analysis"), GTK_WINDOW (self),
                                               GTK_FILE_CHOOSER_ACTION_SAVE,
                                               _("_Save"), _("_Cancel"));
  gtk_native_dialog_set_modal (GTK_NATIVE_DIALOG (self->chooser), TRUE);
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (self->chooser), filter);
  chooser_set_folder (self, GTK_FILE_CHOOSER (self->chooser));
  gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (self->chooser), name);
  g_signal_connect (self->chooser, "response", G_CALLBACK (on_save_response), self);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (self->chooser));
}

static void
save_action (GtkWidget *widget, const char *action_name, GVariant *parameter)
{
  TfWindow *self = TF_WINDOW (widget);

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


/* Export figure */

static GtkFileFilter *
figure_filter_new (void)
{
  GtkFileFilter *filter = gtk_file_filter_new ();

  gtk_file_filter_set_name (filter, _("Figures (PNG, SVG, PDF)"));
  gtk_file_filter_add_suffix (filter, "png");
  gtk_file_filter_add_suffix (filter, "svg");
  gtk_file_filter_add_suffix (filter, "pdf");
  return filter;
}

/* "seed-germination-densities.png": the analysis's file name, then the figure kind. */
static char *
suggested_figure_name (TfWindow *self)
{
  g_autofree char *name = suggested_name (self);
  const char *kind = tf_figure_kind_to_string (tf_plot_view_get_kind (self->plot_view));

  if (g_str_has_suffix (name, FILE_SUFFIX))
    name[strlen (name) - strlen (FILE_SUFFIX)] = '\0';
  return g_strdup_printf ("%s-%s.png", name, kind);
}

gboolean
tf_window_export_figure (TfWindow *self, GFile *file, double width_mm, double height_mm,
                         double dpi, const TfFigureOptions *options)
{
  g_autoptr (GError) error = NULL;
  g_autofree char *path = NULL;
  g_autofree char *name = NULL;
  g_autofree char *heading = NULL;
  const char *kind;

  g_return_val_if_fail (TF_IS_WINDOW (self), FALSE);
  g_return_val_if_fail (G_IS_FILE (file), FALSE);

  path = g_file_get_path (file);
  name = tf_window_file_display_name (file);
  /* TRANSLATORS: heading of the dialog when a figure could not be written; %s a file */
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
  kind = tf_figure_kind_to_string (tf_plot_view_get_kind (self->plot_view));
  if (!tf_figure_export_full (self->analysis, kind, path, width_mm, height_mm, dpi, options,
                              &error))
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

static GtkWidget *
spin_new (double lo, double hi, double step, guint digits, double value)
{
  GtkWidget *spin = gtk_spin_button_new_with_range (lo, hi, step);

  gtk_spin_button_set_digits (GTK_SPIN_BUTTON (spin), digits);
  gtk_spin_button_set_value (GTK_SPIN_BUTTON (spin), value);
  gtk_spin_button_set_numeric (GTK_SPIN_BUTTON (spin), TRUE);
  gtk_widget_set_hexpand (spin, TRUE);
  return spin;
}

static void
grid_attach_row (GtkGrid *grid, int row, const char *mnemonic, GtkWidget *field)
{
  GtkWidget *label = gtk_label_new_with_mnemonic (mnemonic);

  gtk_label_set_mnemonic_widget (GTK_LABEL (label), field);
  gtk_label_set_xalign (GTK_LABEL (label), 0);
  gtk_grid_attach (grid, label, 0, row, 1, 1);
  gtk_grid_attach (grid, field, 1, row, 1, 1);
  gtk_accessible_update_relation (GTK_ACCESSIBLE (field),
                                  GTK_ACCESSIBLE_RELATION_LABELLED_BY, label, NULL, -1);
}

static GtkWidget *
options_dropdown_new (const char *const *labels, guint selected)
{
  GtkWidget *dropdown = gtk_drop_down_new_from_strings (labels);

  gtk_drop_down_set_selected (GTK_DROP_DOWN (dropdown), selected);
  return dropdown;
}

static double
spin_value (AdwMessageDialog *dialog, const char *key)
{
  GtkSpinButton *spin = g_object_get_data (G_OBJECT (dialog), key);

  gtk_spin_button_update (spin);
  return gtk_spin_button_get_value (spin);
}

static guint
dropdown_value (AdwMessageDialog *dialog, const char *key)
{
  return gtk_drop_down_get_selected (g_object_get_data (G_OBJECT (dialog), key));
}

static void
on_export_response (AdwMessageDialog *dialog, const char *response, TfWindow *self)
{
  g_autoptr (GFile) file = g_steal_pointer (&self->export_file);

  self->export_dialog = NULL;
  g_signal_handlers_disconnect_by_func (dialog, on_export_response, self);
  if (g_strcmp0 (response, "export") == 0 && file)
    {
      guint style = dropdown_value (dialog, "style");
      guint scale = dropdown_value (dialog, "evidence-scale");

      self->export_width_mm = spin_value (dialog, "width");
      self->export_height_mm = spin_value (dialog, "height");
      self->export_dpi = spin_value (dialog, "dpi");
      if (style <= TF_FIGURE_STYLE_PRINT)
        self->export_options.style = (TfFigureStyle) style;
      if (scale <= TF_EVIDENCE_SCALE_NONE)
        self->export_options.evidence_scale = (TfEvidenceScale) scale;
    }
  /* clicking closes the dialog already, adw_message_dialog_response() does not */
  gtk_window_set_transient_for (GTK_WINDOW (dialog), NULL);
  gtk_window_destroy (GTK_WINDOW (dialog));
  if (g_strcmp0 (response, "export") == 0 && file)
    tf_window_export_figure (self, file, self->export_width_mm, self->export_height_mm,
                             self->export_dpi, &self->export_options);
}

/* The figure's size, resolution and style, for file, in a dialog. */
void
tf_window_show_export_options (TfWindow *self, GFile *file)
{
  static const char *const styles[] = { N_("Light"), N_("Dark"), N_("Print (greyscale)"), NULL };
  static const char *const scales[] = { N_("Kass and Raftery (1995)"), N_("Jeffreys (1961)"),
                                        N_("None"), NULL };
  const char *style_labels[G_N_ELEMENTS (styles)], *scale_labels[G_N_ELEMENTS (scales)];
  g_autofree char *name = g_file_get_basename (file);
  g_autofree char *heading = NULL;
  TfFigureFormat format = TF_FIGURE_FORMAT_PNG;
  GtkWidget *dialog, *grid, *width, *height, *dpi, *style, *scale;

  g_return_if_fail (TF_IS_WINDOW (self));
  if (self->export_dialog)
    gtk_window_destroy (GTK_WINDOW (g_steal_pointer (&self->export_dialog)));
  for (guint i = 0; i < G_N_ELEMENTS (styles); i++)
    style_labels[i] = styles[i] ? _(styles[i]) : NULL;
  for (guint i = 0; i < G_N_ELEMENTS (scales); i++)
    scale_labels[i] = scales[i] ? _(scales[i]) : NULL;

  /* TRANSLATORS: heading of the figure export dialog; %s is the file name */
  heading = g_strdup_printf (_("Export “%s”"), name);
  dialog = adw_message_dialog_new (GTK_WINDOW (self), heading,
                                   _("The figure shown, at the size it will be printed. Text and lines keep their sizes in points."));
  grid = gtk_grid_new ();
  gtk_grid_set_row_spacing (GTK_GRID (grid), 6);
  gtk_grid_set_column_spacing (GTK_GRID (grid), 12);
  width = spin_new (10, 1000, 1, 1, self->export_width_mm);
  height = spin_new (10, 1000, 1, 1, self->export_height_mm);
  dpi = spin_new (50, 2400, 50, 0, self->export_dpi);
  style = options_dropdown_new (style_labels, self->export_options.style);
  scale = options_dropdown_new (scale_labels, self->export_options.evidence_scale);
  grid_attach_row (GTK_GRID (grid), 0, _("_Width (mm)"), width);
  grid_attach_row (GTK_GRID (grid), 1, _("_Height (mm)"), height);
  grid_attach_row (GTK_GRID (grid), 2, _("_Resolution (dpi)"), dpi);
  grid_attach_row (GTK_GRID (grid), 3, _("_Style"), style);
  grid_attach_row (GTK_GRID (grid), 4, _("_Evidence grades"), scale);
  /* SVG and PDF are drawn in points: a resolution means nothing to them */
  if (tf_figure_format_from_filename (name, &format) && format != TF_FIGURE_FORMAT_PNG)
    gtk_widget_set_sensitive (dpi, FALSE);
  gtk_widget_set_tooltip_text (scale, _("Published grades of a Bayes factor, drawn as quiet lines in the evidence figures"));
  g_object_set_data (G_OBJECT (dialog), "width", width);
  g_object_set_data (G_OBJECT (dialog), "height", height);
  g_object_set_data (G_OBJECT (dialog), "dpi", dpi);
  g_object_set_data (G_OBJECT (dialog), "style", style);
  g_object_set_data (G_OBJECT (dialog), "evidence-scale", scale);
  adw_message_dialog_set_extra_child (ADW_MESSAGE_DIALOG (dialog), grid);

  adw_message_dialog_add_responses (ADW_MESSAGE_DIALOG (dialog),
                                    "cancel", _("_Cancel"),
                                    "export", _("_Export"),
                                    NULL);
  adw_message_dialog_set_response_appearance (ADW_MESSAGE_DIALOG (dialog), "export",
                                              ADW_RESPONSE_SUGGESTED);
  adw_message_dialog_set_default_response (ADW_MESSAGE_DIALOG (dialog), "export");
  adw_message_dialog_set_close_response (ADW_MESSAGE_DIALOG (dialog), "cancel");
  g_signal_connect (dialog, "response", G_CALLBACK (on_export_response), self);
  g_set_object (&self->export_file, file);
  self->export_dialog = ADW_MESSAGE_DIALOG (dialog);
  gtk_window_present (GTK_WINDOW (dialog));
}

AdwMessageDialog *
tf_window_get_export_dialog (TfWindow *self)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), NULL);
  return self->export_dialog;
}

static void
on_export_chooser_response (GtkNativeDialog *dialog, int response, TfWindow *self)
{
  g_autoptr (GFile) file = NULL;

  if (response == GTK_RESPONSE_ACCEPT)
    file = gtk_file_chooser_get_file (GTK_FILE_CHOOSER (dialog));
  g_clear_object (&self->chooser);
  if (file == NULL)
    return;
  {
    g_autofree char *basename = g_file_get_basename (file);

    /* a name with no ending at all is a PNG; any other ending is checked on export */
    if (basename && strchr (basename, '.') == NULL)
      {
        g_autofree char *with_suffix = g_strconcat (basename, ".png", NULL);
        g_autoptr (GFile) parent = g_file_get_parent (file);
        g_autoptr (GFile) renamed = g_file_get_child (parent, with_suffix);
        g_set_object (&file, renamed);
      }
  }
  tf_window_show_export_options (self, file);
}

static void
export_figure_action (GtkWidget *widget, const char *action_name, GVariant *parameter)
{
  TfWindow *self = TF_WINDOW (widget);
  g_autoptr (GtkFileFilter) filter = figure_filter_new ();
  g_autofree char *name = suggested_figure_name (self);

  if (self->chooser)
    return;
  self->chooser = gtk_file_chooser_native_new (_("Export Figure"), GTK_WINDOW (self),
                                               GTK_FILE_CHOOSER_ACTION_SAVE,
                                               _("_Next"), _("_Cancel"));
  gtk_native_dialog_set_modal (GTK_NATIVE_DIALOG (self->chooser), TRUE);
  gtk_file_chooser_add_filter (GTK_FILE_CHOOSER (self->chooser), filter);
  chooser_set_folder (self, GTK_FILE_CHOOSER (self->chooser));
  gtk_file_chooser_set_current_name (GTK_FILE_CHOOSER (self->chooser), name);
  g_signal_connect (self->chooser, "response", G_CALLBACK (on_export_chooser_response), self);
  gtk_native_dialog_show (GTK_NATIVE_DIALOG (self->chooser));
}

void
tf_window_actions_update (TfWindow *self)
{
  self->export_enabled = self->results != NULL
                         && tf_plot_view_get_figure (self->plot_view) != NULL;
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.export-figure", self->export_enabled);
  tf_window_report_update (self);
}

gboolean
tf_window_get_export_enabled (TfWindow *self)
{
  g_return_val_if_fail (TF_IS_WINDOW (self), FALSE);
  return self->export_enabled;
}

static void
on_plot_kind_changed (TfPlotView *view, GParamSpec *pspec, TfWindow *self)
{
  tf_window_actions_update (self);
}

/* GObject */

void
tf_window_actions_class_init (GtkWidgetClass *widget_class)
{
  gtk_widget_class_install_action (widget_class, "win.open", NULL, open_action);
  gtk_widget_class_install_action (widget_class, "win.save", NULL, save_action);
  gtk_widget_class_install_action (widget_class, "win.save-as", NULL, save_as_action);
  gtk_widget_class_install_action (widget_class, "win.export-figure", NULL, export_figure_action);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_e, GDK_CONTROL_MASK,
                                       "win.export-figure", NULL);
  tf_window_report_class_init (widget_class);
}

void
tf_window_actions_init (TfWindow *self)
{
  const TfFigureOptions options = TF_FIGURE_OPTIONS_INIT;

  self->export_width_mm = TF_FIGURE_DEFAULT_WIDTH_MM;
  self->export_height_mm = TF_FIGURE_DEFAULT_HEIGHT_MM;
  self->export_dpi = TF_FIGURE_DEFAULT_DPI;
  self->export_options = options;
  g_signal_connect (self->plot_view, "notify::kind", G_CALLBACK (on_plot_kind_changed), self);
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
  if (self->export_dialog)
    {
      AdwMessageDialog *dialog = g_steal_pointer (&self->export_dialog);

      g_signal_handlers_disconnect_by_func (dialog, on_export_response, self);
      gtk_window_destroy (GTK_WINDOW (dialog));
    }
  if (self->chooser)
    {
      gtk_native_dialog_destroy (GTK_NATIVE_DIALOG (self->chooser));
      g_clear_object (&self->chooser);
    }
}
