/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-models.c: the model-probabilities figure: for each hypothesis of the model
 * set, its probability before the data (an open bar) and after them (a filled bar),
 * the numbers written at the bars' ends.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include "tf-design.h"
#include "tf-figure-private.h"

#define ROW_GAP_SHARE 0.35      /* of a row's height, between hypotheses */

/* One drawing of the figure: what its phases share. */
typedef struct {
  cairo_t *cr;
  TfFigureTheme theme;
  const TfModelProbabilities *models;
  double width, height, pad, gap;
  TfLegendEntry entries[2];
  guint columns;
  double legend_w, legend_h;
  TfTicks x_ticks;
  TfPlotArea area;
} Draw;

static const char *
model_name (const TfModelProbabilities *models, guint i)
{
  return models->names_markup[i] ? models->names_markup[i] : "?";
}

/* The margins: the models' names on the left, the numbers at the bars' ends on the
 * right, the legend above; the plot area and its ticks. */
static void
models_margins (Draw *d)
{
  const TfFigureTheme *theme = &d->theme;
  double names_w = 0, number_w, top, bottom, left, right;

  for (guint i = 0; i < d->models->n; i++)
    names_w = MAX (names_w, tf_fig_text_width (d->cr, theme, theme->label_size,
                                               model_name (d->models, i)));
  number_w = tf_fig_text_width (d->cr, theme, theme->text_size, "0.0000");
  d->columns = tf_legend_fit_columns (d->cr, theme, d->entries, G_N_ELEMENTS (d->entries),
                                      d->width - 2 * d->pad);
  tf_legend_measure (d->cr, theme, d->entries, G_N_ELEMENTS (d->entries), d->columns,
                     &d->legend_w, &d->legend_h);

  tf_ticks_compute (&d->x_ticks, 0, 1, 6, FALSE);
  top = d->pad + d->legend_h + d->gap;
  bottom = d->pad + tf_axis_bottom_extent_ticks (d->cr, theme, &d->x_ticks, _("probability"));
  left = d->pad + names_w + d->gap * 2;
  right = d->pad + number_w + d->gap;
  d->area = (TfPlotArea) {
    .x = left, .y = top, .width = MAX (d->width - left - right, 1),
    .height = MAX (d->height - top - bottom, 1),
    .x_lo = 0, .x_hi = 1, .y_lo = 0, .y_hi = d->models->n,
  };
  tf_ticks_compute (&d->x_ticks, 0, 1,
                    tf_ticks_target (theme, d->area.width, TF_FIG_X_TICK_SPACING_PT), FALSE);
}

/* Quiet lines at the ticks, under the bars. */
static void
models_reference_lines (Draw *d)
{
  cairo_t *cr = d->cr;

  cairo_save (cr);
  tf_figure_theme_set_source (cr, &d->theme.reference);
  cairo_set_line_width (cr, tf_figure_theme_pt (&d->theme, 0.4));
  for (guint i = 1; i < d->x_ticks.n; i++)
    {
      double x = tf_plot_area_map_x (&d->area, tf_ticks_value (&d->x_ticks, i));
      cairo_move_to (cr, x, d->area.y);
      cairo_line_to (cr, x, d->area.y + d->area.height);
    }
  cairo_stroke (cr);
  cairo_restore (cr);
}

/* One bar from the axis to value, its top at y, bar_h high: before the data an open bar,
 * after them a filled one; the number at its end. */
static void
models_bar (Draw *d, double value, gboolean after, double y, double bar_h)
{
  cairo_t *cr = d->cr;
  const TfFigureTheme *theme = &d->theme;
  double v = isfinite (value) ? CLAMP (value, 0, 1) : 0;
  double x1 = tf_plot_area_map_x (&d->area, v);
  TfSeries series = after ? TF_SERIES_POSTERIOR : TF_SERIES_PRIOR;
  g_autofree char *text = isfinite (value) ? g_strdup_printf ("%.3g", value) : g_strdup ("—");
  double th = tf_fig_text_height (cr, theme, theme->text_size, text);

  cairo_save (cr);
  cairo_new_path (cr);
  cairo_rectangle (cr, d->area.x, y + bar_h * 0.08, x1 - d->area.x, bar_h * 0.84);
  if (!after)
    {
      tf_figure_theme_set_source_alpha (cr, &theme->series[series], 0.12);
      cairo_fill_preserve (cr);
      tf_figure_theme_set_source (cr, &theme->series[series]);
      cairo_set_line_width (cr, tf_figure_theme_pt (theme, 1.2));
      cairo_stroke (cr);
    }
  else
    {
      tf_figure_theme_set_source (cr, &theme->series[series]);
      cairo_fill (cr);
    }
  cairo_restore (cr);
  tf_fig_text_halo (cr, theme, &theme->foreground, theme->text_size, text, x1 + d->gap,
                    y + (bar_h - th) / 2);
}

/* A row a model: its name, then its probability before and after the data. */
static void
models_rows (Draw *d)
{
  const TfFigureTheme *theme = &d->theme;
  double row_h = d->area.height / d->models->n;
  double bar_h = MIN (row_h * (1 - ROW_GAP_SHARE) / 2, tf_figure_theme_pt (theme, 14.0));

  for (guint i = 0; i < d->models->n; i++)
    {
      double centre = d->area.y + (i + 0.5) * row_h;
      const char *name = model_name (d->models, i);
      double nw = tf_fig_text_width (d->cr, theme, theme->label_size, name);
      double nh = tf_fig_text_height (d->cr, theme, theme->label_size, name);

      tf_fig_text (d->cr, theme, &theme->foreground, theme->label_size, name,
                   d->area.x - d->gap * 2 - nw, centre - nh / 2);
      models_bar (d, d->models->prior[i], FALSE, centre - bar_h, bar_h);
      models_bar (d, d->models->posterior[i], TRUE, centre, bar_h);
    }
}

/* The probability axis, a spine on the left with no ticks (the names label the rows),
 * the legend centred above. */
static void
models_axes (Draw *d)
{
  cairo_t *cr = d->cr;

  tf_axis_draw_bottom (cr, &d->theme, &d->area, &d->x_ticks, _("probability"));
  cairo_save (cr);
  tf_figure_theme_set_source (cr, &d->theme.foreground);
  cairo_set_line_width (cr, tf_figure_theme_pt (&d->theme, d->theme.axis_width));
  cairo_move_to (cr, d->area.x, d->area.y);
  cairo_line_to (cr, d->area.x, d->area.y + d->area.height);
  cairo_stroke (cr);
  cairo_restore (cr);
  tf_legend_draw (cr, &d->theme, d->entries, G_N_ELEMENTS (d->entries), d->columns,
                  tf_fig_centred_over (&d->area, d->legend_w, d->width, d->pad), d->pad);
}

gboolean
tf_figure_draw_model_probabilities (cairo_t *cr, double width, double height, double scale,
                                    const TfModelProbabilities *models,
                                    const TfFigureOptions *options, TfPlotArea *area_out)
{
  Draw d = {
    .cr = cr, .models = models, .width = width, .height = height,
    .entries = {
      { TF_SERIES_PRIOR, _("before the data (prior)"), TF_SWATCH_OUTLINE },
      { TF_SERIES_POSTERIOR, _("after the data (posterior)"), TF_SWATCH_FILLED },
    },
  };

  tf_fig_start (cr, &d.theme, tf_fig_options (options)->style, scale, width, height);
  if (models == NULL || models->n == 0 || models->names_markup == NULL)
    return tf_fig_nothing (cr, &d.theme, width, height, _("There are no models to draw."));
  d.pad = tf_figure_theme_pt (&d.theme, TF_FIG_PAD_PT);
  d.gap = tf_figure_theme_pt (&d.theme, 3.0);

  models_margins (&d);
  models_reference_lines (&d);
  models_rows (&d);
  models_axes (&d);
  if (area_out)
    *area_out = d.area;
  cairo_restore (cr);
  return TRUE;
}

gpointer
tf_fig_models_compute (const TfAnalysis *analysis, const TfResults *results,
                       GPtrArray *problems, char **reason)
{
  return tf_model_probabilities_new (analysis, results, problems, reason);
}

gboolean
tf_fig_models_draw (cairo_t *cr, double width, double height, double scale,
                    gconstpointer curves, const TfFigureOptions *options,
                    TfFigurePanels *panels)
{
  return tf_figure_draw_model_probabilities (cr, width, height, scale, curves, options,
                                             &panels->area[0]);
}
