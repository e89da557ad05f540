/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-plot-view.c: draws tf_figure_draw_densities() at the widget's size, in the light or
 * dark figure style as libadwaita's style manager says.
 */
#include <glib/gi18n-lib.h>
#include <adwaita.h>
#include "tf-plot-view.h"
#include "tf-figure.h"

/* Logical screen pixels per point. Paper is 72 points an inch and a screen 96 pixels, but
 * a screen is read from further away: 1.5 gives the figure's 8-9 pt text the size of the
 * interface's own. GTK scales the drawing to the device's pixels. */
#define PIXELS_PER_POINT 1.5

struct _TfPlotView
{
  GtkWidget parent_instance;

  TfAnalysis *analysis;
  AdwStyleManager *style_manager;
};

G_DEFINE_FINAL_TYPE (TfPlotView, tf_plot_view, GTK_TYPE_WIDGET)

static void
on_dark_changed (AdwStyleManager *manager, GParamSpec *pspec, TfPlotView *self)
{
  gtk_widget_queue_draw (GTK_WIDGET (self));
}

static void
tf_plot_view_snapshot (GtkWidget *widget, GtkSnapshot *snapshot)
{
  TfPlotView *self = TF_PLOT_VIEW (widget);
  int width = gtk_widget_get_width (widget);
  int height = gtk_widget_get_height (widget);
  TfFigureStyle style;
  cairo_t *cr;

  if (self->analysis == NULL || width <= 0 || height <= 0)
    return;
  style = adw_style_manager_get_dark (self->style_manager) ? TF_FIGURE_STYLE_DARK
                                                           : TF_FIGURE_STYLE_LIGHT;
  cr = gtk_snapshot_append_cairo (snapshot, &GRAPHENE_RECT_INIT (0, 0, width, height));
  tf_figure_draw_densities (cr, width, height, PIXELS_PER_POINT, self->analysis, style);
  cairo_destroy (cr);
}

static void
tf_plot_view_measure (GtkWidget *widget, GtkOrientation orientation, int for_size,
                      int *minimum, int *natural, int *minimum_baseline, int *natural_baseline)
{
  if (orientation == GTK_ORIENTATION_HORIZONTAL)
    {
      *minimum = 280;
      *natural = 560;
    }
  else
    {
      *minimum = 200;
      *natural = 320;
    }
}

static void
tf_plot_view_dispose (GObject *object)
{
  TfPlotView *self = TF_PLOT_VIEW (object);

  if (self->style_manager)
    g_signal_handlers_disconnect_by_data (self->style_manager, self);
  self->style_manager = NULL;
  G_OBJECT_CLASS (tf_plot_view_parent_class)->dispose (object);
}

static void
tf_plot_view_finalize (GObject *object)
{
  TfPlotView *self = TF_PLOT_VIEW (object);

  g_clear_pointer (&self->analysis, tf_analysis_free);
  G_OBJECT_CLASS (tf_plot_view_parent_class)->finalize (object);
}

static void
tf_plot_view_class_init (TfPlotViewClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = tf_plot_view_dispose;
  object_class->finalize = tf_plot_view_finalize;
  widget_class->snapshot = tf_plot_view_snapshot;
  widget_class->measure = tf_plot_view_measure;
  gtk_widget_class_set_css_name (widget_class, "tf-plot-view");
  gtk_widget_class_set_accessible_role (widget_class, GTK_ACCESSIBLE_ROLE_IMG);
}

static void
tf_plot_view_init (TfPlotView *self)
{
  self->style_manager = adw_style_manager_get_default ();
  g_signal_connect (self->style_manager, "notify::dark", G_CALLBACK (on_dark_changed), self);
  gtk_widget_set_hexpand (GTK_WIDGET (self), TRUE);
  gtk_widget_set_vexpand (GTK_WIDGET (self), TRUE);
  gtk_widget_set_overflow (GTK_WIDGET (self), GTK_OVERFLOW_HIDDEN);
  gtk_accessible_update_property (GTK_ACCESSIBLE (self),
                                  GTK_ACCESSIBLE_PROPERTY_LABEL,
                                  _("Densities of θ: prior and posterior under the alternative, scaled likelihood and null value"),
                                  -1);
}

GtkWidget *
tf_plot_view_new (void)
{
  return g_object_new (TF_TYPE_PLOT_VIEW, NULL);
}

void
tf_plot_view_set_analysis (TfPlotView *self, const TfAnalysis *analysis)
{
  g_return_if_fail (TF_IS_PLOT_VIEW (self));

  g_clear_pointer (&self->analysis, tf_analysis_free);
  if (analysis)
    self->analysis = tf_analysis_copy (analysis);
  gtk_widget_queue_draw (GTK_WIDGET (self));
}

const TfAnalysis *
tf_plot_view_get_analysis (TfPlotView *self)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), NULL);
  return self->analysis;
}
