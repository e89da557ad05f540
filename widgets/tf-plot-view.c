/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-plot-view.c: one figure kind of an analysis at the widget's size, in the light or
 * dark figure style as libadwaita's style manager says, with a chooser of the kind above
 * it and a crosshair readout under the pointer.
 *
 * The curves (a TfFigure) are computed when the analysis or the kind changes, never on a
 * redraw. The figure is drawn in its own drawing area, whose rendering GTK keeps until
 * it is queued again; the crosshair line is a second, transparent drawing area over it,
 * so that moving the pointer redraws one line and not the figure. The readout label
 * takes no pointer events (it cannot make the pointer "leave" the plot and flicker) and
 * sits beside the line just above the plot area, never over the data under the pointer.
 * In a figure of two panels the readout is of the panel under the pointer, on its axes
 * (tf_figure_read_at_point()), and a dot marks each value read on its curve.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include <adwaita.h>
#include "tf-plot-view.h"
#include "tf-figure.h"
#include "tf-figure-theme.h"
#include "tf-axis.h"

/* Logical screen pixels per point. Paper is 72 points an inch and a screen 96 pixels, but
 * a screen is read from further away: 1.5 gives the figure's 8-9 pt text the size of the
 * interface's own. GTK scales the drawing to the device's pixels. */
#define PIXELS_PER_POINT 1.5

/* The readout's distance from the crosshair and above the plot area, logical pixels. */
#define READOUT_GAP_X 10
#define READOUT_GAP_Y 4
/* How often to ask where the pointer is after a leave that did not leave. */
#define LEAVE_CHECK_MS 120

struct _TfPlotView
{
  GtkWidget parent_instance;

  /* template */
  GtkDropDown *kind_dropdown;
  GtkOverlay *overlay;
  GtkDrawingArea *canvas;
  GtkDrawingArea *crosshair;
  GtkLabel *readout;

  TfAnalysis *analysis;
  TfFigureKind kind;
  const TfResults *results;     /* the analysis's, borrowed until the next set_analysis, or NULL */
  TfFigure *figure;             /* NULL without an analysis or when the kind does not apply */
  char *why_not;                /* why the kind does not apply, or NULL */
  guint n_computed;

  TfFigurePanels panels;        /* where the last drawing put its data, top to bottom */
  gboolean area_valid;          /* drawn since the figure or the size changed */
  TfFigureReading reading;      /* what the readout shows, while it does */

  gboolean pointer_in;
  double pointer_x, pointer_y;
  char *readout_markup;         /* NULL while the readout is hidden */
  char *description;            /* the canvas's accessible description, or NULL */
  guint leave_check;            /* source asking whether the pointer left, or 0 */

  AdwStyleManager *style_manager;
};

G_DEFINE_FINAL_TYPE (TfPlotView, tf_plot_view, GTK_TYPE_WIDGET)

enum {
  PROP_0,
  PROP_KIND,
  N_PROPS
};

static GParamSpec *properties[N_PROPS];

static TfFigureStyle
current_style (TfPlotView *self)
{
  return adw_style_manager_get_dark (self->style_manager) ? TF_FIGURE_STYLE_DARK
                                                          : TF_FIGURE_STYLE_LIGHT;
}

static void
set_description (TfPlotView *self, const char *text)
{
  if (g_strcmp0 (text, self->description) == 0)
    return;
  g_free (self->description);
  self->description = g_strdup (text);
  if (text)
    gtk_accessible_update_property (GTK_ACCESSIBLE (self->canvas),
                                    GTK_ACCESSIBLE_PROPERTY_DESCRIPTION, text, -1);
  else
    gtk_accessible_reset_property (GTK_ACCESSIBLE (self->canvas),
                                   GTK_ACCESSIBLE_PROPERTY_DESCRIPTION);
}

static void
hide_readout (TfPlotView *self)
{
  g_clear_pointer (&self->readout_markup, g_free);
  gtk_widget_set_visible (GTK_WIDGET (self->readout), FALSE);
  gtk_widget_set_visible (GTK_WIDGET (self->crosshair), FALSE);
  /* without a readout the description says why nothing is drawn, if anything */
  set_description (self, self->figure ? NULL : self->why_not);
}

/* Shows what the curves hold at the pointer's column, or hides the readout when there
 * is nothing to read there. */
static void
update_readout (TfPlotView *self)
{
  TfFigureReading reading;
  g_autofree char *markup = NULL;
  g_autofree char *text = NULL;

  /* the panel under the pointer, read on its own axes */
  if (!self->pointer_in || self->figure == NULL || !self->area_valid
      || !tf_figure_read_at_point (self->figure, &self->panels, self->pointer_x,
                                   self->pointer_y, &reading))
    {
      hide_readout (self);
      return;
    }
  markup = tf_figure_reading_markup (&reading);
  if (g_strcmp0 (markup, self->readout_markup) != 0)
    {
      if (!pango_parse_markup (markup, -1, 0, NULL, &text, NULL, NULL))
        text = g_strdup (markup);
      gtk_label_set_markup (self->readout, markup);
      set_description (self, text);
      g_free (self->readout_markup);
      self->readout_markup = g_steal_pointer (&markup);
    }
  self->reading = reading;
  gtk_widget_set_visible (GTK_WIDGET (self->readout), TRUE);
  gtk_widget_set_visible (GTK_WIDGET (self->crosshair), TRUE);
  /* the line and the label follow the pointer even within one grid step */
  gtk_widget_queue_draw (GTK_WIDGET (self->crosshair));
  gtk_widget_queue_allocate (GTK_WIDGET (self->overlay));
}

static void
update_accessible_label (TfPlotView *self)
{
  /* TRANSLATORS: the plot's accessible name; %s is a figure kind, "Model probabilities" */
  g_autofree char *label = g_strdup_printf (_("Figure: %s"), tf_figure_kind_label (self->kind));

  gtk_accessible_update_property (GTK_ACCESSIBLE (self->canvas),
                                  GTK_ACCESSIBLE_PROPERTY_LABEL, label, -1);
}

/* The curves of the current kind for the current analysis: the one place they are made. */
static void
recompute (TfPlotView *self)
{
  g_clear_pointer (&self->figure, tf_figure_free);
  g_clear_pointer (&self->why_not, g_free);
  if (self->analysis)
    {
      self->figure = tf_figure_new_with_results (self->analysis, self->results, self->kind,
                                                 &self->why_not);
      self->n_computed++;
    }
  self->area_valid = FALSE;
  hide_readout (self);
  update_accessible_label (self);
  gtk_widget_queue_draw (GTK_WIDGET (self->canvas));
}

static void
draw_figure (GtkDrawingArea *area, cairo_t *cr, int width, int height, gpointer user_data)
{
  TfPlotView *self = TF_PLOT_VIEW (user_data);
  TfFigureOptions options = TF_FIGURE_OPTIONS_INIT;

  if (self->analysis == NULL || width <= 0 || height <= 0)
    return;
  options.style = current_style (self);
  if (self->figure)
    self->area_valid = tf_figure_draw_panels (self->figure, cr, width, height,
                                              PIXELS_PER_POINT, &options, &self->panels);
  else
    tf_figure_draw_message (cr, width, height, PIXELS_PER_POINT, options.style,
                            _("Nothing to draw"), self->why_not);
}

/* A thin line through every panel (they share x), on the pixel grid so that it stays
 * one sharp pixel wide, and a dot on each curve read in the panel under the pointer. */
static void
draw_crosshair (GtkDrawingArea *area, cairo_t *cr, int width, int height, gpointer user_data)
{
  TfPlotView *self = TF_PLOT_VIEW (user_data);
  const TfPlotArea *top = &self->panels.area[0];
  const TfPlotArea *bottom = &self->panels.area[MAX (self->panels.n, 1) - 1];
  TfFigureTheme theme;
  double x;

  if (self->readout_markup == NULL || !self->area_valid)
    return;
  tf_figure_theme_init (&theme, current_style (self), PIXELS_PER_POINT);
  x = floor (CLAMP (self->pointer_x, top->x, top->x + top->width)) + 0.5;
  tf_figure_theme_set_source_alpha (cr, &theme.foreground, 0.55);
  cairo_set_line_width (cr, 1.0);
  cairo_move_to (cr, x, top->y);
  cairo_line_to (cr, x, bottom->y + bottom->height);
  cairo_stroke (cr);
  for (guint i = 0; i < self->reading.n; i++)
    if (isfinite (self->reading.y[i]))
      {
        cairo_arc (cr, x, self->reading.y[i], 3.0, 0, 2 * G_PI);
        tf_figure_theme_set_source (cr, &theme.background);
        cairo_fill_preserve (cr);
        tf_figure_theme_set_source (cr, &theme.foreground);
        cairo_stroke (cr);
      }
}

/* The readout beside the crosshair, on the side with room, and just above the plot area
 * (over the legend, never over the curves): it follows the pointer across but does not
 * jump up and down with it. */
static gboolean
on_get_child_position (GtkOverlay *overlay, GtkWidget *child, GdkRectangle *allocation,
                       TfPlotView *self)
{
  int width = gtk_widget_get_width (GTK_WIDGET (overlay));
  int height = gtk_widget_get_height (GTK_WIDGET (overlay));
  int w, h, x, y, line = (int) self->pointer_x;

  if (child != GTK_WIDGET (self->readout))
    return FALSE;
  gtk_widget_measure (child, GTK_ORIENTATION_HORIZONTAL, -1, NULL, &w, NULL, NULL);
  gtk_widget_measure (child, GTK_ORIENTATION_VERTICAL, w, NULL, &h, NULL, NULL);
  w = MIN (w, width);
  if (line + READOUT_GAP_X + w <= width)
    x = line + READOUT_GAP_X;
  else if (line - READOUT_GAP_X - w >= 0)
    x = line - READOUT_GAP_X - w;
  else
    x = CLAMP (line - w / 2, 0, width - w);
  y = (int) floor (self->panels.area[0].y) - h - READOUT_GAP_Y;
  y = CLAMP (y, 0, MAX (height - h, 0));
  *allocation = (GdkRectangle) { x, y, w, h };
  return TRUE;
}

static void
pointer_at (TfPlotView *self, double x, double y)
{
  self->pointer_in = isfinite (x) && isfinite (y);
  self->pointer_x = x;
  self->pointer_y = y;
  update_readout (self);
}

static void
on_motion (GtkEventControllerMotion *controller, double x, double y, TfPlotView *self)
{
  pointer_at (self, x, y);
}

/* Whether the pointer is over the canvas now, as the window system says. */
static gboolean
pointer_still_inside (TfPlotView *self)
{
  GtkWidget *canvas = GTK_WIDGET (self->canvas);
  GtkNative *native = gtk_widget_get_native (canvas);
  GdkSurface *surface = native ? gtk_native_get_surface (native) : NULL;
  GdkSeat *seat = gdk_display_get_default_seat (gtk_widget_get_display (canvas));
  GdkDevice *pointer = seat ? gdk_seat_get_pointer (seat) : NULL;
  graphene_point_t point;
  double x, y, dx, dy;

  if (!gtk_widget_get_mapped (canvas) || surface == NULL || pointer == NULL
      || !gdk_surface_get_device_position (surface, pointer, &x, &y, NULL))
    return FALSE;
  gtk_native_get_surface_transform (native, &dx, &dy);
  if (!gtk_widget_compute_point (GTK_WIDGET (native), canvas,
                                 &GRAPHENE_POINT_INIT ((float) (x - dx), (float) (y - dy)),
                                 &point))
    return FALSE;
  return gtk_widget_contains (canvas, point.x, point.y);
}

static gboolean
check_pointer (gpointer user_data)
{
  TfPlotView *self = TF_PLOT_VIEW (user_data);

  if (self->readout_markup && pointer_still_inside (self))
    return G_SOURCE_CONTINUE;
  self->leave_check = 0;
  pointer_at (self, NAN, NAN);
  return G_SOURCE_REMOVE;
}

static void
on_leave (GtkEventControllerMotion *controller, TfPlotView *self)
{
  /* GTK 4.8 also sends a leave with no event behind it when the readout's text changes
   * under a two-panel figure, and then none when the pointer really leaves. Hiding at
   * once would make the readout blink at every move: while the pointer is still over the
   * plot the readout stays, and the window system is asked until it is not. */
  if (self->readout_markup && pointer_still_inside (self))
    {
      if (self->leave_check == 0)
        self->leave_check = g_timeout_add (LEAVE_CHECK_MS, check_pointer, self);
      return;
    }
  pointer_at (self, NAN, NAN);
}

static void
on_canvas_resize (GtkDrawingArea *area, int width, int height, TfPlotView *self)
{
  /* the plot area moves with the size: read again once it is drawn */
  self->area_valid = FALSE;
  hide_readout (self);
}

static void
on_style_changed (TfPlotView *self)
{
  gtk_widget_queue_draw (GTK_WIDGET (self->canvas));
  gtk_widget_queue_draw (GTK_WIDGET (self->crosshair));
}

static void
on_dark_changed (AdwStyleManager *manager, GParamSpec *pspec, TfPlotView *self)
{
  on_style_changed (self);
}

static void
on_scale_factor_changed (GObject *object, GParamSpec *pspec, TfPlotView *self)
{
  on_style_changed (self);
}

static void
on_kind_selected (GtkDropDown *dropdown, GParamSpec *pspec, TfPlotView *self)
{
  guint selected = gtk_drop_down_get_selected (dropdown);

  if (selected < TF_N_FIGURE_KINDS)
    tf_plot_view_set_kind (self, (TfFigureKind) selected);
}

static void
tf_plot_view_get_property (GObject *object, guint prop_id, GValue *value, GParamSpec *pspec)
{
  TfPlotView *self = TF_PLOT_VIEW (object);

  switch (prop_id)
    {
    case PROP_KIND:
      g_value_set_uint (value, self->kind);
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
tf_plot_view_set_property (GObject *object, guint prop_id, const GValue *value,
                           GParamSpec *pspec)
{
  TfPlotView *self = TF_PLOT_VIEW (object);

  switch (prop_id)
    {
    case PROP_KIND:
      tf_plot_view_set_kind (self, (TfFigureKind) g_value_get_uint (value));
      break;
    default:
      G_OBJECT_WARN_INVALID_PROPERTY_ID (object, prop_id, pspec);
    }
}

static void
tf_plot_view_dispose (GObject *object)
{
  TfPlotView *self = TF_PLOT_VIEW (object);
  GtkWidget *child;

  g_clear_handle_id (&self->leave_check, g_source_remove);
  if (self->style_manager)
    g_signal_handlers_disconnect_by_data (self->style_manager, self);
  self->style_manager = NULL;
  gtk_widget_dispose_template (GTK_WIDGET (object), TF_TYPE_PLOT_VIEW);
  /* the template's root box is not bound to a field: unparent it too */
  while ((child = gtk_widget_get_first_child (GTK_WIDGET (object))))
    gtk_widget_unparent (child);
  G_OBJECT_CLASS (tf_plot_view_parent_class)->dispose (object);
}

static void
tf_plot_view_finalize (GObject *object)
{
  TfPlotView *self = TF_PLOT_VIEW (object);

  g_clear_pointer (&self->analysis, tf_analysis_free);
  g_clear_pointer (&self->figure, tf_figure_free);
  g_clear_pointer (&self->why_not, g_free);
  g_clear_pointer (&self->readout_markup, g_free);
  g_clear_pointer (&self->description, g_free);
  G_OBJECT_CLASS (tf_plot_view_parent_class)->finalize (object);
}

static void
tf_plot_view_class_init (TfPlotViewClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->get_property = tf_plot_view_get_property;
  object_class->set_property = tf_plot_view_set_property;
  object_class->dispose = tf_plot_view_dispose;
  object_class->finalize = tf_plot_view_finalize;

  properties[PROP_KIND] = g_param_spec_uint ("kind", NULL, NULL, 0, TF_N_FIGURE_KINDS - 1,
                                             TF_FIGURE_DENSITIES,
                                             G_PARAM_READWRITE | G_PARAM_EXPLICIT_NOTIFY
                                             | G_PARAM_STATIC_STRINGS);
  g_object_class_install_properties (object_class, N_PROPS, properties);

  gtk_widget_class_set_template_from_resource (widget_class,
                                               "/org/twofold/Twofold/ui/tf-plot-view.ui");
  gtk_widget_class_bind_template_child (widget_class, TfPlotView, kind_dropdown);
  gtk_widget_class_bind_template_child (widget_class, TfPlotView, overlay);
  gtk_widget_class_bind_template_child (widget_class, TfPlotView, canvas);
  gtk_widget_class_bind_template_child (widget_class, TfPlotView, crosshair);
  gtk_widget_class_bind_template_child (widget_class, TfPlotView, readout);
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "tf-plot-view");
}

static void
tf_plot_view_init (TfPlotView *self)
{
  g_autoptr (GtkStringList) kinds = gtk_string_list_new (NULL);
  GtkEventController *motion;

  gtk_widget_init_template (GTK_WIDGET (self));
  self->kind = TF_FIGURE_DENSITIES;

  for (guint i = 0; i < TF_N_FIGURE_KINDS; i++)
    gtk_string_list_append (kinds, tf_figure_kind_label ((TfFigureKind) i));
  gtk_drop_down_set_model (self->kind_dropdown, G_LIST_MODEL (kinds));
  gtk_drop_down_set_selected (self->kind_dropdown, self->kind);
  g_signal_connect (self->kind_dropdown, "notify::selected", G_CALLBACK (on_kind_selected), self);

  gtk_drawing_area_set_draw_func (self->canvas, draw_figure, self, NULL);
  gtk_drawing_area_set_draw_func (self->crosshair, draw_crosshair, self, NULL);
  g_signal_connect (self->canvas, "resize", G_CALLBACK (on_canvas_resize), self);
  g_signal_connect (self->overlay, "get-child-position", G_CALLBACK (on_get_child_position), self);

  motion = gtk_event_controller_motion_new ();
  g_signal_connect (motion, "enter", G_CALLBACK (on_motion), self);
  g_signal_connect (motion, "motion", G_CALLBACK (on_motion), self);
  g_signal_connect (motion, "leave", G_CALLBACK (on_leave), self);
  /* on the overlay, not the canvas: crossings between the canvas and the line or label
   * over it (GTK synthesises some when the label's size changes) are not leaves */
  gtk_widget_add_controller (GTK_WIDGET (self->overlay), motion);

  self->style_manager = adw_style_manager_get_default ();
  g_signal_connect (self->style_manager, "notify::dark", G_CALLBACK (on_dark_changed), self);
  g_signal_connect (self, "notify::scale-factor", G_CALLBACK (on_scale_factor_changed), self);
  gtk_widget_set_hexpand (GTK_WIDGET (self), TRUE);
  gtk_widget_set_vexpand (GTK_WIDGET (self), TRUE);
  update_accessible_label (self);
}

GtkWidget *
tf_plot_view_new (void)
{
  return g_object_new (TF_TYPE_PLOT_VIEW, NULL);
}

void
tf_plot_view_set_analysis (TfPlotView *self, const TfAnalysis *analysis,
                           const TfResults *results)
{
  TfAnalysis *copy;

  g_return_if_fail (TF_IS_PLOT_VIEW (self));

  /* copied first: analysis may be the view's own */
  copy = analysis ? tf_analysis_copy (analysis) : NULL;
  g_clear_pointer (&self->analysis, tf_analysis_free);
  self->analysis = copy;
  self->results = copy ? results : NULL;
  recompute (self);
}

const TfAnalysis *
tf_plot_view_get_analysis (TfPlotView *self)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), NULL);
  return self->analysis;
}

void
tf_plot_view_set_kind (TfPlotView *self, TfFigureKind kind)
{
  g_return_if_fail (TF_IS_PLOT_VIEW (self));
  g_return_if_fail (kind < TF_N_FIGURE_KINDS);

  if (kind == self->kind)
    return;
  self->kind = kind;
  gtk_drop_down_set_selected (self->kind_dropdown, kind);
  recompute (self);
  g_object_notify_by_pspec (G_OBJECT (self), properties[PROP_KIND]);
}

TfFigureKind
tf_plot_view_get_kind (TfPlotView *self)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), TF_FIGURE_DENSITIES);
  return self->kind;
}

const TfFigure *
tf_plot_view_get_figure (TfPlotView *self)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), NULL);
  return self->figure;
}

const char *
tf_plot_view_get_why_not (TfPlotView *self)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), NULL);
  return self->why_not;
}

const char *
tf_plot_view_get_readout_markup (TfPlotView *self)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), NULL);
  return self->readout_markup;
}

const char *
tf_plot_view_get_description (TfPlotView *self)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), NULL);
  return self->description;
}

void
tf_plot_view_set_pointer_for_test (TfPlotView *self, double x, double y)
{
  g_return_if_fail (TF_IS_PLOT_VIEW (self));
  pointer_at (self, x, y);
}

gboolean
tf_plot_view_get_plot_area_for_test (TfPlotView *self, TfPlotArea *area)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), FALSE);
  if (self->area_valid && area)
    *area = self->panels.area[0];
  return self->area_valid;
}

gboolean
tf_plot_view_get_panels_for_test (TfPlotView *self, TfFigurePanels *panels)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), FALSE);
  if (self->area_valid && panels)
    *panels = self->panels;
  return self->area_valid;
}

guint
tf_plot_view_get_n_computed_for_test (TfPlotView *self)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), 0);
  return self->n_computed;
}

GtkWidget *
tf_plot_view_get_kind_chooser_for_test (TfPlotView *self)
{
  g_return_val_if_fail (TF_IS_PLOT_VIEW (self), NULL);
  return GTK_WIDGET (self->kind_dropdown);
}
