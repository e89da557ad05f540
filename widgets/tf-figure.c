/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure.c: the densities figure: prior and posterior of the parameter under the
 * alternative, the scaled likelihood, and the null value.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include "tf-figure.h"
#include "tf-axis.h"
#include "tf-legend.h"
#include "tf-curves.h"

#define N_POINTS 401
#define PAD_PT 6.0
#define X_TICK_SPACING_PT 54.0
#define Y_TICK_SPACING_PT 30.0

typedef struct {
  TfPlotArea area;
  TfTicks x_ticks;
  TfTicks y_ticks;
} Layout;

typedef struct {
  double *x;
  double *y;
  guint n;
} Points;

static void
points_clear (Points *p)
{
  g_clear_pointer (&p->x, g_free);
  g_clear_pointer (&p->y, g_free);
  p->n = 0;
}

static void
draw_message (cairo_t *cr, const TfFigureTheme *theme, double width, double height,
              GPtrArray *problems)
{
  g_autoptr (GString) markup = g_string_new (NULL);
  g_autoptr (PangoLayout) layout = NULL;
  double w, h;

  g_string_append_printf (markup, "<b>%s</b>", _("Nothing to draw"));
  if (problems && problems->len > 0)
    {
      const TfProblem *problem = g_ptr_array_index (problems, 0);
      g_autofree char *escaped = g_markup_escape_text (problem->message, -1);
      g_string_append_printf (markup, "\n%s", escaped);
    }
  layout = tf_figure_theme_layout (cr, theme, theme->label_size, markup->str);
  pango_layout_set_alignment (layout, PANGO_ALIGN_CENTER);
  pango_layout_set_width (layout, (int) (width * 0.8 * PANGO_SCALE));
  pango_layout_set_wrap (layout, PANGO_WRAP_WORD_CHAR);
  tf_figure_layout_size (layout, &w, &h);
  tf_figure_theme_set_source (cr, &theme->muted);
  cairo_move_to (cr, width * 0.1, (height - h) / 2);
  pango_cairo_show_layout (cr, layout);
}

static double
array_max (const double *v, guint n, guint *at)
{
  double m = 0;
  guint where = 0;

  for (guint i = 0; i < n; i++)
    if (isfinite (v[i]) && v[i] > m)
      {
        m = v[i];
        where = i;
      }
  if (at)
    *at = where;
  return m;
}

static double
text_height (cairo_t *cr, const TfFigureTheme *theme, double size, const char *markup)
{
  g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, size, markup);
  double h;

  tf_figure_layout_size (layout, NULL, &h);
  return h;
}

/* Margins first, then ticks that fit the space left. */
static void
compute_layout (cairo_t *cr, const TfFigureTheme *theme, double width, double height,
                double top_extra, const char *x_label, const char *y_label,
                double x_lo, double x_hi, double y_max, Layout *out)
{
  double pad = tf_figure_theme_pt (theme, PAD_PT);
  double top, bottom, left, right, plot_h, plot_w;
  g_autofree char *last = NULL;
  g_autoptr (PangoLayout) last_layout = NULL;
  double last_w;

  top = pad + top_extra;
  bottom = pad + tf_axis_bottom_extent (cr, theme, x_label);
  plot_h = MAX (height - top - bottom, 1);
  tf_ticks_compute (&out->y_ticks, 0, y_max * 1.04,
                    tf_ticks_target (theme, plot_h, Y_TICK_SPACING_PT), TRUE);
  left = pad + tf_axis_left_extent (cr, theme, &out->y_ticks, y_label);

  /* room for half of the widest x label at the right end */
  tf_ticks_compute (&out->x_ticks, x_lo, x_hi,
                    tf_ticks_target (theme, width - left - pad, X_TICK_SPACING_PT), FALSE);
  last = g_strdup_printf ("%.*f", out->x_ticks.n_frac, MAX (fabs (x_lo), fabs (x_hi)));
  last_layout = tf_figure_theme_layout (cr, theme, theme->text_size, last);
  tf_figure_layout_size (last_layout, &last_w, NULL);
  right = pad + last_w / 2;
  plot_w = MAX (width - left - right, 1);
  tf_ticks_compute (&out->x_ticks, x_lo, x_hi,
                    tf_ticks_target (theme, plot_w, X_TICK_SPACING_PT), FALSE);

  /* an end tick a hair outside the data widens the axis to it */
  if (out->x_ticks.n > 0)
    {
      x_lo = MIN (x_lo, tf_ticks_value (&out->x_ticks, 0));
      x_hi = MAX (x_hi, tf_ticks_value (&out->x_ticks, out->x_ticks.n - 1));
    }
  out->area = (TfPlotArea) {
    .x = left, .y = top, .width = plot_w, .height = plot_h,
    .x_lo = x_lo, .x_hi = x_hi,
    .y_lo = out->y_ticks.lo, .y_hi = out->y_ticks.hi,
  };
}

/* A density mapped to user units; values off the top are held at the top edge so that
 * the legend keeps clear of them. */
static void
map_density (const TfPlotArea *area, const double *x, const double *y, guint n, Points *out)
{
  out->x = g_new (double, n);
  out->y = g_new (double, n);
  out->n = n;
  for (guint i = 0; i < n; i++)
    {
      out->x[i] = tf_plot_area_map_x (area, x[i]);
      out->y[i] = MAX (tf_plot_area_map_y (area, isfinite (y[i]) ? y[i] : 0), area->y);
    }
}

static void
map_vertical (const TfPlotArea *area, double x, Points *out)
{
  out->x = g_new (double, 2);
  out->y = g_new (double, 2);
  out->n = 2;
  out->x[0] = out->x[1] = tf_plot_area_map_x (area, x);
  out->y[0] = area->y + area->height;
  out->y[1] = area->y;
}

static void
path_polyline (cairo_t *cr, const Points *p)
{
  cairo_new_path (cr);
  for (guint i = 0; i < p->n; i++)
    cairo_line_to (cr, p->x[i], p->y[i]);
}

/* A vertical line to the top of the area ending in an arrow head: the curve goes on up. */
static void
draw_spike (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area, TfSeries series,
            double x_value)
{
  double x = tf_plot_area_map_x (area, x_value);
  double base = area->y + area->height;
  double head = tf_figure_theme_pt (theme, 3.0);

  cairo_save (cr);
  tf_figure_theme_set_series_line (cr, theme, series);
  cairo_move_to (cr, x, base);
  cairo_line_to (cr, x, area->y + head);
  cairo_stroke (cr);
  cairo_set_dash (cr, NULL, 0, 0);
  cairo_move_to (cr, x, area->y);
  cairo_line_to (cr, x - head * 0.6, area->y + head * 1.2);
  cairo_line_to (cr, x + head * 0.6, area->y + head * 1.2);
  cairo_close_path (cr);
  cairo_fill (cr);
  cairo_restore (cr);
}

static void
draw_marker (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area, TfSeries series,
             double x_value, double y_value, gboolean filled)
{
  double x = tf_plot_area_map_x (area, x_value);
  double y = tf_plot_area_map_y (area, y_value);
  double r = tf_figure_theme_pt (theme, 2.2);

  if (y_value > area->y_hi || y_value < area->y_lo)
    return;
  cairo_save (cr);
  cairo_new_path (cr);
  cairo_arc (cr, x, y, r, 0, 2 * G_PI);
  tf_figure_theme_set_source (cr, filled ? &theme->series[series] : &theme->background);
  cairo_fill_preserve (cr);
  tf_figure_theme_set_source (cr, &theme->series[series]);
  cairo_set_dash (cr, NULL, 0, 0);
  cairo_set_line_width (cr, tf_figure_theme_pt (theme, 1.0));
  cairo_stroke (cr);
  cairo_restore (cr);
}

gboolean
tf_figure_draw_densities (cairo_t *cr, double width, double height, double scale,
                          const TfAnalysis *analysis, TfFigureStyle style)
{
  return tf_figure_draw_densities_full (cr, width, height, scale, analysis, style, NULL);
}

gboolean
tf_figure_draw_densities_full (cairo_t *cr, double width, double height, double scale,
                               const TfAnalysis *analysis, TfFigureStyle style,
                               TfPlotArea *area_out)
{
  TfFigureTheme theme;
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (TfDensityCurves) curves = NULL;
  g_autofree char *x_label = NULL;
  g_autofree char *null_label = NULL;
  g_autofree char *null_number = NULL;
  g_autofree char *note = NULL;
  const char *y_label = _("density");
  const char *parameter;
  gboolean spike_posterior, spike_likelihood, interval_null;
  double prior_max, posterior_max, likelihood_max, y_max, null_h, top_extra;
  guint posterior_at, likelihood_at;
  Layout layout;
  TfPlotArea *area;
  Points prior = { 0 }, posterior = { 0 }, likelihood = { 0 }, null_line = { 0 };
  TfLegendEntry entries[3];
  guint n_entries = 0;
  double legend_w, legend_h, legend_x = 0, legend_y = 0;
  guint legend_columns;

  tf_figure_theme_init (&theme, style, scale);
  cairo_save (cr);
  cairo_new_path (cr);
  tf_figure_theme_set_source (cr, &theme.background);
  cairo_rectangle (cr, 0, 0, width, height);
  cairo_fill (cr);

  if (analysis)
    curves = tf_density_curves_new (analysis, N_POINTS, problems);
  else
    g_ptr_array_add (problems, tf_problem_new ("", "", "%s", _("There is no analysis.")));
  if (curves == NULL || curves->n < 2 || !(curves->hi > curves->lo))
    {
      draw_message (cr, &theme, width, height, problems);
      cairo_restore (cr);
      return FALSE;
    }

  /* What sets the height of the axis: curves drawn as spikes do not. */
  prior_max = array_max (curves->prior, curves->n, NULL);
  posterior_max = array_max (curves->posterior, curves->n, &posterior_at);
  likelihood_max = array_max (curves->likelihood, curves->n, &likelihood_at);
  spike_posterior = curves->posterior_narrow;
  spike_likelihood = spike_posterior && likelihood_max > 4 * MAX (prior_max, 1e-300);
  /* A prior that runs off to infinity at an end (Beta with a or b below 1) would flatten
   * everything else: the axis then follows the prior's inside and the ends go off the top. */
  {
    guint prior_at, edge = MAX (curves->n / 33, 1);
    double inside = 0, others = 0;

    array_max (curves->prior, curves->n, &prior_at);
    for (guint i = edge; i + edge < curves->n; i++)
      inside = MAX (inside, curves->prior[i]);
    if (!spike_posterior)
      others = MAX (others, posterior_max);
    if (!spike_likelihood)
      others = MAX (others, likelihood_max);
    if ((prior_at < edge || prior_at + edge >= curves->n)
        && prior_max > 1.5 * MAX (inside, others))
      prior_max = MAX (inside, 1e-300);
  }
  y_max = prior_max;
  if (!spike_posterior)
    y_max = MAX (y_max, posterior_max);
  if (!spike_likelihood)
    y_max = MAX (y_max, likelihood_max);
  if (!(y_max > 0) || !isfinite (y_max))
    y_max = 1;

  parameter = curves->parameter_markup ? curves->parameter_markup : "θ";
  x_label = g_strdup_printf ("<i>%s</i>", parameter);
  interval_null = curves->null_high > curves->null_low;
  null_number = g_strdup_printf ("%g", curves->null_value);
  if (interval_null)
    {
      g_autofree char *lo = g_strdup_printf ("%g", curves->null_low);
      g_autofree char *hi = g_strdup_printf ("%g", curves->null_high);
      /* TRANSLATORS: the null interval in a figure, e.g. "null: 0.45 to 0.55" */
      null_label = g_strdup_printf (_("null: %s to %s"), lo, hi);
    }
  else
    null_label = g_strdup_printf ("<i>%s</i><sub>0</sub> = %s", parameter, null_number);
  null_h = text_height (cr, &theme, theme.text_size, null_label);
  top_extra = null_h + tf_figure_theme_pt (&theme, 2.0);

  if (spike_posterior)
    {
      g_autofree char *mode = g_strdup_printf ("%.4g", curves->x[posterior_at]);
      /* TRANSLATORS: legend of a posterior drawn as a spike; %s is its mode, e.g. 0.8094 */
      note = g_strdup_printf (_("Posterior under H<sub>1</sub>, too narrow\nto draw: a spike at its mode, %s"), mode);
      entries[n_entries++] = (TfLegendEntry) { TF_SERIES_POSTERIOR, note };
    }
  else
    entries[n_entries++] = (TfLegendEntry) { TF_SERIES_POSTERIOR, _("Posterior under H<sub>1</sub>") };
  entries[n_entries++] = (TfLegendEntry) { TF_SERIES_PRIOR, _("Prior under H<sub>1</sub>") };
  entries[n_entries++] = (TfLegendEntry) { TF_SERIES_LIKELIHOOD, _("Likelihood, scaled") };

  /* Lay out with the legend inside; if it would hide data, put it above the plot area in
   * as few rows as fit the width. */
  legend_columns = 1;
  for (int attempt = 0; attempt < 2; attempt++)
    {
      gboolean above = attempt == 1;
      double pad = tf_figure_theme_pt (&theme, PAD_PT);
      TfPolyline lines[4];
      guint n_lines = 0;

      points_clear (&prior);
      points_clear (&posterior);
      points_clear (&likelihood);
      points_clear (&null_line);
      if (above)
        for (legend_columns = n_entries; legend_columns > 1; legend_columns--)
          {
            tf_legend_measure (cr, &theme, entries, n_entries, legend_columns, &legend_w, &legend_h);
            if (legend_w <= width - 2 * pad)
              break;
          }
      tf_legend_measure (cr, &theme, entries, n_entries, legend_columns, &legend_w, &legend_h);
      compute_layout (cr, &theme, width, height,
                      top_extra + (above ? legend_h + tf_figure_theme_pt (&theme, 2.0) : 0),
                      x_label, y_label, curves->lo, curves->hi, y_max, &layout);
      area = &layout.area;

      map_density (area, curves->x, curves->prior, curves->n, &prior);
      if (spike_posterior)
        map_vertical (area, curves->x[posterior_at], &posterior);
      else
        map_density (area, curves->x, curves->posterior, curves->n, &posterior);
      if (spike_likelihood)
        map_vertical (area, curves->x[likelihood_at], &likelihood);
      else
        map_density (area, curves->x, curves->likelihood, curves->n, &likelihood);
      map_vertical (area, curves->null_value, &null_line);

      lines[n_lines++] = (TfPolyline) { prior.x, prior.y, prior.n };
      lines[n_lines++] = (TfPolyline) { posterior.x, posterior.y, posterior.n };
      lines[n_lines++] = (TfPolyline) { likelihood.x, likelihood.y, likelihood.n };
      lines[n_lines++] = (TfPolyline) { null_line.x, null_line.y, null_line.n };

      if (!above)
        {
          if (tf_legend_place (area, legend_w, legend_h, tf_figure_theme_pt (&theme, 4.0),
                               lines, n_lines, &legend_x, &legend_y))
            break;
        }
      else
        {
          /* centred over the plot area, inside the figure */
          legend_x = area->x + (area->width - legend_w) / 2;
          legend_x = MAX (MIN (legend_x, width - pad - legend_w), pad);
          legend_y = pad;
        }
    }
  area = &layout.area;

  /* The data, clipped to the plot area. */
  cairo_save (cr);
  cairo_rectangle (cr, area->x, area->y - tf_figure_theme_pt (&theme, 1.0),
                   area->width, area->height + tf_figure_theme_pt (&theme, 1.0));
  cairo_clip (cr);

  if (interval_null)
    {
      double x0 = tf_plot_area_map_x (area, curves->null_low);
      double x1 = tf_plot_area_map_x (area, curves->null_high);
      tf_figure_theme_set_source_alpha (cr, &theme.series[TF_SERIES_NULL], 0.10);
      cairo_rectangle (cr, x0, area->y, x1 - x0, area->height);
      cairo_fill (cr);
    }

  if (!spike_posterior)
    {
      path_polyline (cr, &posterior);
      cairo_line_to (cr, posterior.x[posterior.n - 1], area->y + area->height);
      cairo_line_to (cr, posterior.x[0], area->y + area->height);
      cairo_close_path (cr);
      tf_figure_theme_set_source_alpha (cr, &theme.series[TF_SERIES_POSTERIOR], 0.10);
      cairo_fill (cr);
    }

  tf_figure_theme_set_series_line (cr, &theme, TF_SERIES_PRIOR);
  path_polyline (cr, &prior);
  cairo_stroke (cr);

  if (spike_posterior)
    draw_spike (cr, &theme, area, TF_SERIES_POSTERIOR, curves->x[posterior_at]);
  else
    {
      tf_figure_theme_set_series_line (cr, &theme, TF_SERIES_POSTERIOR);
      path_polyline (cr, &posterior);
      cairo_stroke (cr);
    }

  /* the likelihood's dashes on top: with a flat prior it lies on the posterior */
  if (spike_likelihood)
    draw_spike (cr, &theme, area, TF_SERIES_LIKELIHOOD, curves->x[likelihood_at]);
  else
    {
      tf_figure_theme_set_series_line (cr, &theme, TF_SERIES_LIKELIHOOD);
      path_polyline (cr, &likelihood);
      cairo_stroke (cr);
    }
  cairo_restore (cr);

  /* The null: a thin line through the whole height, labelled above the area. */
  if (curves->null_value >= area->x_lo && curves->null_value <= area->x_hi)
    {
      double x = tf_plot_area_map_x (area, curves->null_value);
      g_autoptr (PangoLayout) label = tf_figure_theme_layout (cr, &theme, theme.text_size,
                                                              null_label);
      double w, lx;

      if (!interval_null)
        {
          tf_figure_theme_set_series_line (cr, &theme, TF_SERIES_NULL);
          cairo_move_to (cr, x, area->y + area->height);
          cairo_line_to (cr, x, area->y);
          cairo_stroke (cr);

          /* Savage–Dickey heights: both densities at the null value. */
          draw_marker (cr, &theme, area, TF_SERIES_PRIOR, curves->null_value,
                       curves->prior_at_null, FALSE);
          if (!spike_posterior)
            draw_marker (cr, &theme, area, TF_SERIES_POSTERIOR, curves->null_value,
                         curves->posterior_at_null, TRUE);
        }
      else
        x = tf_plot_area_map_x (area, (curves->null_low + curves->null_high) / 2);

      tf_figure_layout_size (label, &w, NULL);
      lx = CLAMP (x - w / 2, tf_figure_theme_pt (&theme, PAD_PT), width - w - tf_figure_theme_pt (&theme, PAD_PT));
      tf_figure_theme_set_source (cr, &theme.foreground);
      cairo_move_to (cr, lx, area->y - null_h - tf_figure_theme_pt (&theme, 1.5));
      pango_cairo_show_layout (cr, label);
    }

  tf_axis_draw_bottom (cr, &theme, area, &layout.x_ticks, x_label);
  tf_axis_draw_left (cr, &theme, area, &layout.y_ticks, y_label);

  tf_legend_draw (cr, &theme, entries, n_entries, legend_columns, legend_x, legend_y);

  if (area_out)
    *area_out = *area;

  points_clear (&prior);
  points_clear (&posterior);
  points_clear (&likelihood);
  points_clear (&null_line);
  cairo_restore (cr);
  return TRUE;
}
