/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-figure.c: Export Figure…: a save dialog, then the figure's size, resolution,
 * style and evidence grades in a second dialog, then the figure shown, written in the
 * format of the file's ending.
 */
#include <string.h>
#include <glib/gi18n.h>
#include "tf-window-figure.h"
#include "tf-window-files.h"
#include "tf-figure-export.h"

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
  const char *kind = tf_figure_kind_to_string (tf_plot_view_get_kind (self->plot_view));
  g_autofree char *tail = g_strdup_printf ("-%s.png", kind);

  return tf_window_suggested_name (self, tail);
}

typedef struct {
  double width_mm, height_mm, dpi;
  const TfFigureOptions *options;
} TfFigureSize;

static gboolean
write_figure (TfWindow *self, const char *path, gconstpointer data, GError **error)
{
  const TfFigureSize *size = data;
  const char *kind = tf_figure_kind_to_string (tf_plot_view_get_kind (self->plot_view));

  return tf_figure_export_full (self->analysis, kind, path, size->width_mm, size->height_mm,
                                size->dpi, size->options, error);
}

gboolean
tf_window_figure_export (TfWindow *self, GFile *file, double width_mm, double height_mm,
                         double dpi, const TfFigureOptions *options)
{
  TfFigureSize size = { width_mm, height_mm, dpi, options };

  return tf_window_export_to (self, file, write_figure, &size);
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
    tf_window_figure_export (self, file, self->export_width_mm, self->export_height_mm,
                             self->export_dpi, &self->export_options);
}

/* The figure's size, resolution and style, for file, in a dialog. */
void
tf_window_figure_show_options (TfWindow *self, GFile *file)
{
  static const char *const styles[] = { N_("Light"), N_("Dark"), N_("Print (greyscale)"), NULL };
  static const char *const scales[] = { N_("Kass and Raftery (1995)"), N_("Jeffreys (1961)"),
                                        N_("None"), NULL };
  const char *style_labels[G_N_ELEMENTS (styles)], *scale_labels[G_N_ELEMENTS (scales)];
  g_autofree char *name = g_file_get_basename (file);
  g_autofree char *heading = NULL;
  TfFigureFormat format = TF_FIGURE_FORMAT_PNG;
  GtkWidget *dialog, *grid, *width, *height, *dpi, *style, *scale;

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
    /* a name with no ending at all is a PNG; any other ending is checked on export */
    g_autoptr (GFile) named = tf_window_file_with_suffix (file, ".png");

    tf_window_figure_show_options (self, named);
  }
}

static void
export_figure_action (GtkWidget *widget, const char *action_name, GVariant *parameter)
{
  TfWindow *self = (TfWindow *) widget;    /* the action is the window class's */
  g_autoptr (GtkFileFilter) filter = figure_filter_new ();
  g_autofree char *name = suggested_figure_name (self);

  tf_window_chooser_show (self, GTK_FILE_CHOOSER_ACTION_SAVE, _("Export Figure"), _("_Next"),
                          filter, name, G_CALLBACK (on_export_chooser_response));
}

void
tf_window_figure_update (TfWindow *self)
{
  self->export_enabled = self->results != NULL
                         && tf_plot_view_get_figure (self->plot_view) != NULL;
  gtk_widget_action_set_enabled (GTK_WIDGET (self), "win.export-figure", self->export_enabled);
}

void
tf_window_figure_class_init (GtkWidgetClass *widget_class)
{
  gtk_widget_class_install_action (widget_class, "win.export-figure", NULL, export_figure_action);
  gtk_widget_class_add_binding_action (widget_class, GDK_KEY_e, GDK_CONTROL_MASK,
                                       "win.export-figure", NULL);
}

static void
on_plot_kind_changed (TfPlotView *view, GParamSpec *pspec, TfWindow *self)
{
  tf_window_figure_update (self);
}

void
tf_window_figure_init (TfWindow *self)
{
  const TfFigureOptions options = TF_FIGURE_OPTIONS_INIT;

  self->export_width_mm = TF_FIGURE_DEFAULT_WIDTH_MM;
  self->export_height_mm = TF_FIGURE_DEFAULT_HEIGHT_MM;
  self->export_dpi = TF_FIGURE_DEFAULT_DPI;
  self->export_options = options;
  g_signal_connect (self->plot_view, "notify::kind", G_CALLBACK (on_plot_kind_changed), self);
}

void
tf_window_figure_dispose (TfWindow *self)
{
  if (self->export_dialog)
    {
      AdwMessageDialog *dialog = g_steal_pointer (&self->export_dialog);

      g_signal_handlers_disconnect_by_func (dialog, on_export_response, self);
      gtk_window_destroy (GTK_WINDOW (dialog));
    }
}
