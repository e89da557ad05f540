/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-null.c: the null-distribution figure: the sampling distribution of the test
 * statistic under the null (bars for counts, a curve for a continuous statistic), the
 * observed value, and the tail that makes the p-value shaded and hatched.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include "tf-design.h"
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

/* One drawing of the figure: what its phases share. */
typedef struct {
  cairo_t *cr;
  TfFigureTheme theme;
  const TfNullDistribution *dist;
  double width, height, pad;
  /* the ranges */
  double max, x_lo, x_hi;
  double half;                  /* half a bar's width, in units of the statistic */
  /* the words and the legend, inside the plot area or above it */
  const char *x_label, *y_label;
  char *obs_label, *tail_label;
  double obs_h;
  TfLegendEntry entries[2];
  guint n_entries, columns;
  double legend_w, legend_h, legend_x, legend_y;
  /* the plot area, and the tops of the masses in it, then the observed value's column */
  TfFigLayout layout;
  double *tops_x, *tops_y;
} Draw;

static void
null_ranges (Draw *d)
{
  const TfNullDistribution *dist = d->dist;

  for (guint i = 0; i < dist->n; i++)
    if (isfinite (dist->mass[i]))
      d->max = MAX (d->max, dist->mass[i]);
  if (!(d->max > 0))
    d->max = 1;
  visible_range (dist, d->max, &d->x_lo, &d->x_hi);
  d->half = dist->discrete ? 0.4 : 0;
}

static void
null_words (Draw *d)
{
  const TfNullDistribution *dist = d->dist;
  g_autofree char *v = tf_fig_number (dist->observed, 6);
  g_autofree char *p = tf_fig_number (dist->p_value, 3);

  d->x_label = dist->x_markup ? dist->x_markup : _("test statistic");
  d->y_label = dist->discrete ? _("probability under H₀") : _("density under H₀");
  d->obs_label = g_strdup_printf (_("observed: %s"), v);
  /* TRANSLATORS: legend of the shaded tail of a null distribution */
  d->tail_label = g_strdup_printf (_("as or more extreme: <i>p</i> = %s"), p);
  d->entries[d->n_entries++] = (TfLegendEntry) { TF_SERIES_NULL, _("Distribution under H₀"),
                                                 dist->discrete ? TF_SWATCH_OUTLINE
                                                                : TF_SWATCH_LINE };
  d->entries[d->n_entries++] = (TfLegendEntry) { TF_SERIES_TAIL, d->tail_label, TF_SWATCH_HATCHED };
  d->obs_h = tf_fig_text_height (d->cr, &d->theme, d->theme.text_size, d->obs_label);
}

/* Above the plot area: as few rows as fit the width; in a narrow figure the tail's
 * entry says only the p-value. */
static void
fit_legend_above (Draw *d)
{
  double max_w = d->width - 2 * d->pad;

  d->columns = tf_legend_fit_columns (d->cr, &d->theme, d->entries, d->n_entries, max_w);
  tf_legend_measure (d->cr, &d->theme, d->entries, d->n_entries, d->columns, &d->legend_w,
                     &d->legend_h);
  if (d->legend_w > max_w)
    {
      g_autofree char *p = tf_fig_number (d->dist->p_value, 3);
      g_free (d->tail_label);
      d->tail_label = g_strdup_printf ("<i>p</i> = %s", p);
      d->entries[1].markup = d->tail_label;
      tf_legend_measure (d->cr, &d->theme, d->entries, d->n_entries, d->columns, &d->legend_w,
                         &d->legend_h);
    }
}

/* A place in the plot area for the legend that hides no mass and not the observed
 * value's line. */
static gboolean
place_legend_inside (Draw *d)
{
  const TfNullDistribution *dist = d->dist;
  const TfPlotArea *area = &d->layout.area;
  double obs_y[2] = { area->y, area->y + area->height };
  guint n_tops = 0;
  TfPolyline lines[2];

  for (guint i = 0; i < dist->n; i++)
    if (dist->x[i] >= d->x_lo && dist->x[i] <= d->x_hi && isfinite (dist->mass[i]))
      {
        d->tops_x[n_tops] = tf_plot_area_map_x (area, dist->x[i]);
        d->tops_y[n_tops++] = tf_plot_area_map_y (area, dist->mass[i]);
      }
  d->tops_x[n_tops] = d->tops_x[n_tops + 1] = tf_plot_area_map_x (area, dist->observed);
  lines[0] = (TfPolyline) { d->tops_x, d->tops_y, n_tops };
  lines[1] = (TfPolyline) { d->tops_x + n_tops, obs_y, 2 };
  return tf_legend_place (area, d->legend_w, d->legend_h, tf_figure_theme_pt (&d->theme, 4.0),
                          lines, 2, &d->legend_x, &d->legend_y);
}

/* The margins and the plot area, with the legend inside; if it would hide data, with
 * the legend above the plot area. */
static void
null_layout (Draw *d)
{
  d->tops_x = g_new (double, d->dist->n + 2);
  d->tops_y = g_new (double, d->dist->n + 2);
  d->columns = 1;
  for (int attempt = 0; attempt < 2; attempt++)
    {
      gboolean above = attempt == 1;

      if (above)
        fit_legend_above (d);
      else
        tf_legend_measure (d->cr, &d->theme, d->entries, d->n_entries, d->columns,
                           &d->legend_w, &d->legend_h);
      tf_fig_layout_single (d->cr, &d->theme, d->width, d->height,
                            d->obs_h + tf_figure_theme_pt (&d->theme, 2.0)
                            + (above ? d->legend_h + tf_figure_theme_pt (&d->theme, 2.0) : 0),
                            0, d->x_label, d->y_label, d->x_lo, d->x_hi, FALSE, 0,
                            d->max * 1.04, &d->layout);
      if (above)
        {
          d->legend_x = tf_fig_centred_over (&d->layout.area, d->legend_w, d->width, d->pad);
          d->legend_y = d->pad;
        }
      else if (place_legend_inside (d))
        break;
    }
}

/* The tail's extent, a light band through the whole height: it shows where the tail is
 * even where its masses are too small to see; under a continuous curve, the area under
 * it hatched. */
static void
null_tail (Draw *d)
{
  cairo_t *cr = d->cr;
  const TfNullDistribution *dist = d->dist;
  const TfPlotArea *area = &d->layout.area;

  for (guint i = 0; i < dist->n; i++)
    if (dist->in_tail[i])
      {
        guint j = i;
        double a, b;

        while (j + 1 < dist->n && dist->in_tail[j + 1])
          j++;
        a = dist->discrete ? dist->x[i] - 0.5 : dist->x[i];
        b = dist->discrete ? dist->x[j] + 0.5 : dist->x[j];
        tf_figure_theme_set_source_alpha (cr, &d->theme.series[TF_SERIES_TAIL], 0.07);
        cairo_rectangle (cr, tf_plot_area_map_x (area, a), area->y,
                         tf_plot_area_map_x (area, b) - tf_plot_area_map_x (area, a), area->height);
        cairo_fill (cr);
        if (!dist->discrete)
          {
            cairo_new_path (cr);
            cairo_move_to (cr, tf_plot_area_map_x (area, dist->x[i]), area->y + area->height);
            for (guint k = i; k <= j; k++)
              cairo_line_to (cr, tf_plot_area_map_x (area, dist->x[k]),
                             tf_plot_area_map_y (area, isfinite (dist->mass[k]) ? dist->mass[k] : 0));
            cairo_line_to (cr, tf_plot_area_map_x (area, dist->x[j]), area->y + area->height);
            cairo_close_path (cr);
            tf_figure_theme_fill_hatched (cr, &d->theme, TF_SERIES_TAIL, 0.30);
          }
        i = j;
      }
}

/* One bar: outlined in the tail's colour and hatched when counted in p. */
static void
null_bar (Draw *d, guint i, double line_width, double min_w)
{
  cairo_t *cr = d->cr;
  const TfNullDistribution *dist = d->dist;
  const TfPlotArea *area = &d->layout.area;
  double x0 = tf_plot_area_map_x (area, dist->x[i] - d->half);
  double x1 = tf_plot_area_map_x (area, dist->x[i] + d->half);
  double y = tf_plot_area_map_y (area, dist->mass[i]);

  if (x1 - x0 < min_w)
    {
      double c = (x0 + x1) / 2;
      x0 = c - min_w / 2;
      x1 = c + min_w / 2;
    }
  cairo_new_path (cr);
  cairo_rectangle (cr, x0, y, x1 - x0, area->y + area->height - y);
  if (dist->in_tail[i])
    {
      cairo_path_t *path = cairo_copy_path (cr);
      tf_figure_theme_fill_hatched (cr, &d->theme, TF_SERIES_TAIL, 0.45);
      cairo_append_path (cr, path);
      cairo_path_destroy (path);
      tf_figure_theme_set_source (cr, &d->theme.series[TF_SERIES_TAIL]);
    }
  else
    {
      tf_figure_theme_set_source_alpha (cr, &d->theme.series[TF_SERIES_NULL], 0.18);
      cairo_fill_preserve (cr);
      tf_figure_theme_set_source (cr, &d->theme.series[TF_SERIES_NULL]);
    }
  cairo_set_line_width (cr, line_width);
  cairo_stroke (cr);
}

/* The distribution, clipped to the plot area: bars for counts, else a curve. */
static void
null_masses (Draw *d)
{
  cairo_t *cr = d->cr;
  const TfNullDistribution *dist = d->dist;
  const TfPlotArea *area = &d->layout.area;

  cairo_save (cr);
  cairo_rectangle (cr, area->x, area->y, area->width, area->height);
  cairo_clip (cr);
  null_tail (d);
  if (dist->discrete)
    {
      double px_per_unit = area->width / (area->x_hi - area->x_lo);
      double line_width = tf_figure_theme_pt (&d->theme, px_per_unit > 6 * d->theme.scale ? 0.6 : 0.25);
      double min_w = tf_figure_theme_pt (&d->theme, 0.6);

      for (guint i = 0; i < dist->n; i++)
        if (dist->x[i] >= area->x_lo - 1 && dist->x[i] <= area->x_hi + 1 && dist->mass[i] > 0)
          null_bar (d, i, line_width, min_w);
    }
  else
    {
      TfFigPoints line = { 0 };

      tf_fig_points_map (area, dist->x, dist->mass, dist->n, TRUE, &line);
      tf_fig_stroke_series (cr, &d->theme, TF_SERIES_NULL, &line);
      tf_fig_points_clear (&line);
    }
  cairo_restore (cr);
}

/* The observed value: a line through the area, its value above it. */
static void
null_observed (Draw *d)
{
  cairo_t *cr = d->cr;
  const TfFigureTheme *theme = &d->theme;
  const TfPlotArea *area = &d->layout.area;
  double x, w;

  if (!isfinite (d->dist->observed))
    return;
  x = tf_plot_area_map_x (area, d->dist->observed);
  w = tf_fig_text_width (cr, theme, theme->text_size, d->obs_label);
  cairo_save (cr);
  tf_figure_theme_set_source (cr, &theme->foreground);
  cairo_set_line_width (cr, tf_figure_theme_pt (theme, 1.0));
  cairo_move_to (cr, x, area->y + area->height);
  cairo_line_to (cr, x, area->y);
  cairo_stroke (cr);
  cairo_restore (cr);
  tf_fig_text (cr, theme, &theme->foreground, theme->text_size, d->obs_label,
               tf_fig_label_x (x, w, area, d->width, d->pad),
               area->y - d->obs_h - tf_figure_theme_pt (theme, 1.5));
}

gboolean
tf_figure_draw_null_distribution (cairo_t *cr, double width, double height, double scale,
                                  const TfNullDistribution *dist,
                                  const TfFigureOptions *options, TfPlotArea *area_out)
{
  Draw d = { .cr = cr, .dist = dist, .width = width, .height = height };

  tf_fig_start (cr, &d.theme, tf_fig_options (options)->style, scale, width, height);
  if (dist == NULL || dist->n < 2)
    return tf_fig_nothing (cr, &d.theme, width, height, _("There is no distribution to draw."));
  d.pad = tf_figure_theme_pt (&d.theme, TF_FIG_PAD_PT);

  null_ranges (&d);
  null_words (&d);
  null_layout (&d);
  null_masses (&d);
  null_observed (&d);
  tf_axis_draw_bottom (cr, &d.theme, &d.layout.area, &d.layout.x_ticks, d.x_label);
  tf_axis_draw_left (cr, &d.theme, &d.layout.area, &d.layout.y_ticks, d.y_label);
  tf_legend_draw (cr, &d.theme, d.entries, d.n_entries, d.columns, d.legend_x, d.legend_y);
  if (area_out)
    *area_out = d.layout.area;

  g_free (d.obs_label);
  g_free (d.tail_label);
  g_free (d.tops_x);
  g_free (d.tops_y);
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
