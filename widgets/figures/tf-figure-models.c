/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-models.c: the model-probabilities figure: for each hypothesis of the model
 * set, its probability before the data (an open bar) and after them (a filled bar),
 * the numbers written at the bars' ends.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include "tf-figure-private.h"

#define ROW_GAP_SHARE 0.35      /* of a row's height, between hypotheses */

gboolean
tf_figure_draw_model_probabilities (cairo_t *cr, double width, double height, double scale,
                                    const TfModelProbabilities *models,
                                    const TfFigureOptions *options, TfPlotArea *area_out)
{
  const TfFigureOptions *opt = tf_fig_options (options);
  TfFigureTheme theme;
  const char *x_label = _("probability");
  TfLegendEntry entries[] = {
    { TF_SERIES_PRIOR, _("before the data (prior)"), TF_SWATCH_OUTLINE },
    { TF_SERIES_POSTERIOR, _("after the data (posterior)"), TF_SWATCH_FILLED },
  };
  double pad, gap, names_w = 0, number_w, legend_w, legend_h, top, bottom, left, right;
  double row_h, bar_h;
  guint columns;
  TfTicks x_ticks;
  TfPlotArea area;

  tf_figure_theme_init (&theme, opt->style, scale);
  pad = tf_figure_theme_pt (&theme, TF_FIG_PAD_PT);
  gap = tf_figure_theme_pt (&theme, 3.0);
  cairo_save (cr);
  tf_fig_begin (cr, &theme, width, height);
  if (models == NULL || models->n == 0 || models->names_markup == NULL)
    {
      tf_fig_message (cr, &theme, width, height, NULL, _("There are no models to draw."));
      cairo_restore (cr);
      return FALSE;
    }

  for (guint i = 0; i < models->n; i++)
    names_w = MAX (names_w, tf_fig_text_width (cr, &theme, theme.label_size,
                                               models->names_markup[i] ? models->names_markup[i] : "?"));
  number_w = tf_fig_text_width (cr, &theme, theme.text_size, "0.0000");
  for (columns = G_N_ELEMENTS (entries); columns > 1; columns--)
    {
      tf_legend_measure (cr, &theme, entries, G_N_ELEMENTS (entries), columns, &legend_w, &legend_h);
      if (legend_w <= width - 2 * pad)
        break;
    }
  tf_legend_measure (cr, &theme, entries, G_N_ELEMENTS (entries), columns, &legend_w, &legend_h);

  tf_ticks_compute (&x_ticks, 0, 1, 6, FALSE);
  top = pad + legend_h + gap;
  bottom = pad + tf_axis_bottom_extent_ticks (cr, &theme, &x_ticks, x_label);
  left = pad + names_w + gap * 2;
  right = pad + number_w + gap;
  area = (TfPlotArea) {
    .x = left, .y = top, .width = MAX (width - left - right, 1),
    .height = MAX (height - top - bottom, 1),
    .x_lo = 0, .x_hi = 1, .y_lo = 0, .y_hi = models->n,
  };
  tf_ticks_compute (&x_ticks, 0, 1, tf_ticks_target (&theme, area.width, TF_FIG_X_TICK_SPACING_PT), FALSE);

  /* quiet lines at the ticks, under the bars */
  cairo_save (cr);
  tf_figure_theme_set_source (cr, &theme.reference);
  cairo_set_line_width (cr, tf_figure_theme_pt (&theme, 0.4));
  for (guint i = 1; i < x_ticks.n; i++)
    {
      double x = tf_plot_area_map_x (&area, tf_ticks_value (&x_ticks, i));
      cairo_move_to (cr, x, area.y);
      cairo_line_to (cr, x, area.y + area.height);
    }
  cairo_stroke (cr);
  cairo_restore (cr);

  row_h = area.height / models->n;
  bar_h = MIN (row_h * (1 - ROW_GAP_SHARE) / 2, tf_figure_theme_pt (&theme, 14.0));
  for (guint i = 0; i < models->n; i++)
    {
      double centre = area.y + (i + 0.5) * row_h;
      const char *name = models->names_markup[i] ? models->names_markup[i] : "?";
      double nw = tf_fig_text_width (cr, &theme, theme.label_size, name);
      double nh = tf_fig_text_height (cr, &theme, theme.label_size, name);
      double values[2] = { models->prior[i], models->posterior[i] };

      tf_fig_text (cr, &theme, &theme.foreground, theme.label_size, name,
                        area.x - gap * 2 - nw, centre - nh / 2);
      for (int b = 0; b < 2; b++)
        {
          double v = isfinite (values[b]) ? CLAMP (values[b], 0, 1) : 0;
          double y = b == 0 ? centre - bar_h : centre;
          double x1 = tf_plot_area_map_x (&area, v);
          TfSeries series = b == 0 ? TF_SERIES_PRIOR : TF_SERIES_POSTERIOR;
          g_autofree char *text = isfinite (values[b]) ? g_strdup_printf ("%.3g", values[b])
                                                       : g_strdup ("—");
          double th = tf_fig_text_height (cr, &theme, theme.text_size, text);

          cairo_save (cr);
          cairo_new_path (cr);
          cairo_rectangle (cr, area.x, y + bar_h * 0.08, x1 - area.x, bar_h * 0.84);
          if (b == 0)
            {
              tf_figure_theme_set_source_alpha (cr, &theme.series[series], 0.12);
              cairo_fill_preserve (cr);
              tf_figure_theme_set_source (cr, &theme.series[series]);
              cairo_set_line_width (cr, tf_figure_theme_pt (&theme, 1.2));
              cairo_stroke (cr);
            }
          else
            {
              tf_figure_theme_set_source (cr, &theme.series[series]);
              cairo_fill (cr);
            }
          cairo_restore (cr);
          tf_fig_text_halo (cr, &theme, &theme.foreground, theme.text_size, text, x1 + gap,
                            y + (bar_h - th) / 2);
        }
    }

  tf_axis_draw_bottom (cr, &theme, &area, &x_ticks, x_label);
  /* a spine on the left, no ticks: the names label the rows */
  cairo_save (cr);
  tf_figure_theme_set_source (cr, &theme.foreground);
  cairo_set_line_width (cr, tf_figure_theme_pt (&theme, theme.axis_width));
  cairo_move_to (cr, area.x, area.y);
  cairo_line_to (cr, area.x, area.y + area.height);
  cairo_stroke (cr);
  cairo_restore (cr);
  tf_legend_draw (cr, &theme, entries, G_N_ELEMENTS (entries), columns,
                  MAX (MIN (area.x + (area.width - legend_w) / 2, width - pad - legend_w), pad), pad);
  if (area_out)
    *area_out = area;
  cairo_restore (cr);
  return TRUE;
}

gpointer
tf_fig_models_compute (const TfAnalysis *analysis, const TfResults *results,
                       GPtrArray *problems, char **reason)
{
  return tf_model_probabilities_new (analysis, problems, reason);
}

gboolean
tf_fig_models_draw (cairo_t *cr, double width, double height, double scale,
                    gconstpointer curves, const TfFigureOptions *options,
                    TfFigurePanels *panels)
{
  return tf_figure_draw_model_probabilities (cr, width, height, scale, curves, options,
                                             &panels->area[0]);
}
