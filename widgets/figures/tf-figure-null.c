/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-null.c: the null-distribution figure: the sampling distribution of the test
 * statistic under the null (bars for counts, a curve for a continuous statistic), the
 * observed value, and the tail that makes the p-value shaded and hatched.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include "tf-figure-private.h"

/* Masses below this share of the largest are not worth the width they take. */
#define VISIBLE_SHARE 1e-3
#define NULL_POINTS 401

/* The x range that shows the distribution's bulk and the observed value. */
static void
visible_range (const TfNullDistribution *d, double max, double *lo, double *hi)
{
  guint first = 0, last = d->n - 1;
  double half = d->discrete ? 0.5 : 0;

  while (first < last && !(d->mass[first] >= max * VISIBLE_SHARE))
    first++;
  while (last > first && !(d->mass[last] >= max * VISIBLE_SHARE))
    last--;
  *lo = MIN (d->x[first] - half, isfinite (d->observed) ? d->observed - half : INFINITY);
  *hi = MAX (d->x[last] + half, isfinite (d->observed) ? d->observed + half : -INFINITY);
  if (!(*hi > *lo))
    {
      *lo -= 1;
      *hi += 1;
    }
}

gboolean
tf_figure_draw_null_distribution (cairo_t *cr, double width, double height, double scale,
                                  const TfNullDistribution *d, const TfFigureOptions *options,
                                  TfPlotArea *area_out)
{
  const TfFigureOptions *opt = tf_fig_options (options);
  TfFigureTheme theme;
  g_autofree char *obs_label = NULL;
  g_autofree char *tail_label = NULL;
  g_autofree double *tops_x = NULL;
  g_autofree double *tops_y = NULL;
  const char *x_label, *y_label;
  double pad, max = 0, x_lo, x_hi, obs_h, legend_w, legend_h, legend_x = 0, legend_y = 0;
  double half;
  TfFigLayout layout;
  TfPlotArea *area;
  TfFigPoints line = { 0 };
  TfLegendEntry entries[2];
  guint n_entries = 0, columns = 1;

  tf_figure_theme_init (&theme, opt->style, scale);
  pad = tf_figure_theme_pt (&theme, TF_FIG_PAD_PT);
  cairo_save (cr);
  tf_fig_begin (cr, &theme, width, height);
  if (d == NULL || d->n < 2)
    {
      tf_fig_message (cr, &theme, width, height, NULL, _("There is no distribution to draw."));
      cairo_restore (cr);
      return FALSE;
    }
  for (guint i = 0; i < d->n; i++)
    if (isfinite (d->mass[i]))
      max = MAX (max, d->mass[i]);
  if (!(max > 0))
    max = 1;
  visible_range (d, max, &x_lo, &x_hi);
  half = d->discrete ? 0.4 : 0;

  x_label = d->x_markup ? d->x_markup : _("test statistic");
  y_label = d->discrete ? _("probability under H₀") : _("density under H₀");
  {
    g_autofree char *v = tf_fig_number (d->observed, 6);
    g_autofree char *p = tf_fig_number (d->p_value, 3);
    obs_label = g_strdup_printf (_("observed: %s"), v);
    /* TRANSLATORS: legend of the shaded tail of a null distribution */
    tail_label = g_strdup_printf (_("as or more extreme: <i>p</i> = %s"), p);
  }
  entries[n_entries++] = (TfLegendEntry) { TF_SERIES_NULL, _("Distribution under H₀"),
                                           d->discrete ? TF_SWATCH_OUTLINE : TF_SWATCH_LINE };
  entries[n_entries++] = (TfLegendEntry) { TF_SERIES_TAIL, tail_label, TF_SWATCH_HATCHED };
  obs_h = tf_fig_text_height (cr, &theme, theme.text_size, obs_label);

  tops_x = g_new (double, d->n + 2);
  tops_y = g_new (double, d->n + 2);
  for (int attempt = 0; attempt < 2; attempt++)
    {
      gboolean above = attempt == 1;
      guint n_tops = 0;
      TfPolyline lines[2];

      if (above)
        for (columns = n_entries; columns > 1; columns--)
          {
            tf_legend_measure (cr, &theme, entries, n_entries, columns, &legend_w, &legend_h);
            if (legend_w <= width - 2 * pad)
              break;
          }
      tf_legend_measure (cr, &theme, entries, n_entries, columns, &legend_w, &legend_h);
      if (above && legend_w > width - 2 * pad)
        {
          /* A narrow figure: the tail's entry says only the p-value. */
          g_autofree char *p = tf_fig_number (d->p_value, 3);
          g_free (tail_label);
          tail_label = g_strdup_printf ("<i>p</i> = %s", p);
          entries[1].markup = tail_label;
          tf_legend_measure (cr, &theme, entries, n_entries, columns, &legend_w, &legend_h);
        }
      tf_fig_layout_single (cr, &theme, width, height,
                            obs_h + tf_figure_theme_pt (&theme, 2.0)
                            + (above ? legend_h + tf_figure_theme_pt (&theme, 2.0) : 0),
                            0, x_label, y_label, x_lo, x_hi, FALSE, 0, max * 1.04, &layout);
      area = &layout.area;
      for (guint i = 0; i < d->n; i++)
        if (d->x[i] >= x_lo && d->x[i] <= x_hi && isfinite (d->mass[i]))
          {
            tops_x[n_tops] = tf_plot_area_map_x (area, d->x[i]);
            tops_y[n_tops++] = tf_plot_area_map_y (area, d->mass[i]);
          }
      tops_x[n_tops] = tops_x[n_tops + 1] = tf_plot_area_map_x (area, d->observed);
      lines[0] = (TfPolyline) { tops_x, tops_y, n_tops };
      {
        double obs_y[2];
        obs_y[0] = area->y;
        obs_y[1] = area->y + area->height;
        lines[1] = (TfPolyline) { tops_x + n_tops, obs_y, 2 };
        if (!above)
          {
            if (tf_legend_place (area, legend_w, legend_h, tf_figure_theme_pt (&theme, 4.0),
                                 lines, 2, &legend_x, &legend_y))
              break;
          }
        else
          {
            legend_x = MAX (MIN (area->x + (area->width - legend_w) / 2, width - pad - legend_w), pad);
            legend_y = pad;
          }
      }
    }
  area = &layout.area;

  cairo_save (cr);
  cairo_rectangle (cr, area->x, area->y, area->width, area->height);
  cairo_clip (cr);

  /* The tail's extent, a light band through the whole height: it shows where the tail
   * is even where its masses are too small to see. */
  for (guint i = 0; i < d->n; i++)
    if (d->in_tail[i])
      {
        guint j = i;
        double a, b;

        while (j + 1 < d->n && d->in_tail[j + 1])
          j++;
        a = d->discrete ? d->x[i] - 0.5 : d->x[i];
        b = d->discrete ? d->x[j] + 0.5 : d->x[j];
        tf_figure_theme_set_source_alpha (cr, &theme.series[TF_SERIES_TAIL], 0.07);
        cairo_rectangle (cr, tf_plot_area_map_x (area, a), area->y,
                         tf_plot_area_map_x (area, b) - tf_plot_area_map_x (area, a), area->height);
        cairo_fill (cr);
        if (!d->discrete)
          {
            /* the area under the curve, hatched */
            cairo_new_path (cr);
            cairo_move_to (cr, tf_plot_area_map_x (area, d->x[i]), area->y + area->height);
            for (guint k = i; k <= j; k++)
              cairo_line_to (cr, tf_plot_area_map_x (area, d->x[k]),
                             tf_plot_area_map_y (area, isfinite (d->mass[k]) ? d->mass[k] : 0));
            cairo_line_to (cr, tf_plot_area_map_x (area, d->x[j]), area->y + area->height);
            cairo_close_path (cr);
            tf_figure_theme_fill_hatched (cr, &theme, TF_SERIES_TAIL, 0.30);
          }
        i = j;
      }

  if (d->discrete)
    {
      /* bars: outlined in the tail's colour and hatched when counted in p */
      double px_per_unit = area->width / (area->x_hi - area->x_lo);
      double min_w = tf_figure_theme_pt (&theme, 0.6);

      for (guint i = 0; i < d->n; i++)
        {
          double x0, x1, y;

          if (d->x[i] < area->x_lo - 1 || d->x[i] > area->x_hi + 1 || !(d->mass[i] > 0))
            continue;
          x0 = tf_plot_area_map_x (area, d->x[i] - half);
          x1 = tf_plot_area_map_x (area, d->x[i] + half);
          if (x1 - x0 < min_w)
            {
              double c = (x0 + x1) / 2;
              x0 = c - min_w / 2;
              x1 = c + min_w / 2;
            }
          y = tf_plot_area_map_y (area, d->mass[i]);
          cairo_new_path (cr);
          cairo_rectangle (cr, x0, y, x1 - x0, area->y + area->height - y);
          if (d->in_tail[i])
            {
              cairo_path_t *path = cairo_copy_path (cr);
              tf_figure_theme_fill_hatched (cr, &theme, TF_SERIES_TAIL, 0.45);
              cairo_append_path (cr, path);
              cairo_path_destroy (path);
              tf_figure_theme_set_source (cr, &theme.series[TF_SERIES_TAIL]);
            }
          else
            {
              tf_figure_theme_set_source_alpha (cr, &theme.series[TF_SERIES_NULL], 0.18);
              cairo_fill_preserve (cr);
              tf_figure_theme_set_source (cr, &theme.series[TF_SERIES_NULL]);
            }
          cairo_set_line_width (cr, tf_figure_theme_pt (&theme, px_per_unit > 6 * theme.scale ? 0.6 : 0.25));
          cairo_stroke (cr);
        }
    }
  else
    {
      tf_fig_points_map (area, d->x, d->mass, d->n, TRUE, &line);
      tf_fig_stroke_series (cr, &theme, TF_SERIES_NULL, &line);
    }
  cairo_restore (cr);

  /* The observed value. */
  if (isfinite (d->observed))
    {
      double x = tf_plot_area_map_x (area, d->observed);
      double w = tf_fig_text_width (cr, &theme, theme.text_size, obs_label);

      cairo_save (cr);
      tf_figure_theme_set_source (cr, &theme.foreground);
      cairo_set_line_width (cr, tf_figure_theme_pt (&theme, 1.0));
      cairo_move_to (cr, x, area->y + area->height);
      cairo_line_to (cr, x, area->y);
      cairo_stroke (cr);
      cairo_restore (cr);
      /* centred on the line, right of the y axis's labels, inside the figure */
      tf_fig_text (cr, &theme, &theme.foreground, theme.text_size, obs_label,
                   MAX (MAX (MIN (x - w / 2, width - pad - w), MIN (area->x, width - pad - w)), pad),
                   area->y - obs_h - tf_figure_theme_pt (&theme, 1.5));
    }

  tf_axis_draw_bottom (cr, &theme, area, &layout.x_ticks, x_label);
  tf_axis_draw_left (cr, &theme, area, &layout.y_ticks, y_label);
  tf_legend_draw (cr, &theme, entries, n_entries, columns, legend_x, legend_y);
  if (area_out)
    *area_out = *area;
  tf_fig_points_clear (&line);
  cairo_restore (cr);
  return TRUE;
}

gpointer
tf_fig_null_compute (const TfAnalysis *analysis, const TfResults *results,
                     GPtrArray *problems, char **reason)
{
  return tf_null_distribution_new (analysis, NULL_POINTS, problems, reason);
}

gboolean
tf_fig_null_draw (cairo_t *cr, double width, double height, double scale,
                  gconstpointer curves, const TfFigureOptions *options,
                  TfFigurePanels *panels)
{
  return tf_figure_draw_null_distribution (cr, width, height, scale, curves, options,
                                           &panels->area[0]);
}

gboolean
tf_fig_null_read (gconstpointer curves, const TfPlotArea *area, double x,
                  TfFigureReading *reading)
{
  const TfNullDistribution *d = curves;
  guint i = tf_fig_nearest (d->x, d->n, x);

  reading->x = d->x[i];
  reading->x_markup = d->x_markup ? d->x_markup : "x";
  tf_fig_reading_add (reading, area, d->discrete ? _("probability") : _("density"),
                      d->mass[i], d->mass[i]);
  return TRUE;
}
