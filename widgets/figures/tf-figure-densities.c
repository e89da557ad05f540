/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-densities.c: the densities figure: prior and posterior of the parameter under the
 * alternative, the scaled likelihood, and the null as a spike (a point null, its
 * probability beside it) or a band (an interval null), with the Savage–Dickey heights.
 */
#include <math.h>
#include <string.h>
#include <glib/gi18n-lib.h>
#include "tf-figure-private.h"

/* A prior lower than this share of the axis reads as a line on the floor: say its height. */
#define LOW_PRIOR_SHARE 0.08
#define DENSITY_POINTS 401

/* The kind's curves: the densities, and the null's probability given the data. */
typedef struct {
  TfDensityCurves *curves;
  double null_mass;             /* P(null | data) beside a point null's spike, or NAN */
  char *x_markup;               /* the parameter's name for the readout */
} Densities;

gpointer
tf_fig_densities_compute (const TfAnalysis *analysis, const TfResults *results,
                          GPtrArray *problems, char **reason)
{
  TfDensityCurves *curves = tf_density_curves_new (analysis, DENSITY_POINTS, problems);
  Densities *d;

  if (curves == NULL)
    {
      if (problems->len == 0)
        /* TRANSLATORS: %s is a design, "one proportion" */
        *reason = g_strdup_printf (_("The densities figure is not available for the %s design in this version."),
                                   tf_design_label (analysis->design));
      return NULL;
    }
  d = g_new0 (Densities, 1);
  d->curves = curves;
  d->null_mass = NAN;
  if (analysis->null_kind == TF_NULL_POINT)
    {
      g_autoptr (TfResults) computed = results ? NULL : tf_analysis_compute (analysis, NULL);
      const TfResults *r = results ? results : computed;
      double p;

      if (r && tf_results_get (r, "posterior_null", &p) && isfinite (p))
        d->null_mass = p;
    }
  d->x_markup = g_strdup_printf ("<i>%s</i>", curves->parameter_markup
                                              ? curves->parameter_markup : "θ");
  return d;
}

void
tf_fig_densities_free (gpointer curves)
{
  Densities *d = curves;

  tf_density_curves_free (d->curves);
  g_free (d->x_markup);
  g_free (d);
}

gboolean
tf_fig_densities_draw (cairo_t *cr, double width, double height, double scale,
                       gconstpointer curves, const TfFigureOptions *options,
                       TfFigurePanels *panels)
{
  const Densities *d = curves;

  return tf_figure_draw_density_curves (cr, width, height, scale, d->curves, d->null_mass,
                                        options, &panels->area[0]);
}

gboolean
tf_fig_densities_read (gconstpointer curves, const TfPlotArea *area, double x,
                       TfFigureReading *reading)
{
  const Densities *d = curves;
  const TfDensityCurves *c = d->curves;
  guint i = tf_fig_nearest (c->x, c->n, x);

  reading->x_markup = d->x_markup;
  tf_fig_reading_add (reading, area, _("posterior"), c->posterior[i], c->posterior[i]);
  tf_fig_reading_add (reading, area, _("prior"), c->prior[i], c->prior[i]);
  tf_fig_reading_add (reading, area, _("likelihood, scaled"), c->likelihood[i],
                      c->likelihood[i]);
  return TRUE;
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
array_min (const double *v, guint n)
{
  double m = INFINITY;

  for (guint i = 0; i < n; i++)
    if (isfinite (v[i]))
      m = MIN (m, v[i]);
  return isfinite (m) ? m : 0;
}

static void
map_vertical (const TfPlotArea *area, double x, TfFigPoints *out)
{
  out->x = g_new (double, 2);
  out->y = g_new (double, 2);
  out->n = 2;
  out->x[0] = out->x[1] = tf_plot_area_map_x (area, x);
  out->y[0] = area->y + area->height;
  out->y[1] = area->y;
}

/* Where the null's probability goes beside its spike: right of it, else left (then
 * perhaps left of the area too: it does not fit beside). */
static double
mass_label_x (const TfFigureTheme *theme, const TfPlotArea *area, double null_value,
              double label_width)
{
  double x = tf_plot_area_map_x (area, null_value);
  double gap = tf_figure_theme_pt (theme, 3.0);

  return x + gap + label_width > area->x + area->width ? x - gap - label_width : x + gap;
}

/* The posterior's mode for the legend: the core's, else (0: not filled in) the grid's
 * argmax, which is also right for a true mode at 0 on a grid starting there. */
static double
posterior_mode (const TfDensityCurves *curves, guint argmax)
{
  if (curves->posterior_mode != 0 && isfinite (curves->posterior_mode))
    return curves->posterior_mode;
  return curves->x[argmax];
}

gboolean
tf_figure_draw_density_curves (cairo_t *cr, double width, double height, double scale,
                               const TfDensityCurves *curves, double null_mass,
                               const TfFigureOptions *options, TfPlotArea *area_out)
{
  const TfFigureOptions *opt = tf_fig_options (options);
  TfFigureTheme theme;
  g_autofree char *x_label = NULL;
  g_autofree char *null_label = NULL;
  g_autofree char *mass_label = NULL;
  g_autofree char *note = NULL;
  g_autofree char *prior_note = NULL;
  const char *y_label = _("density");
  const char *parameter;
  gboolean spike_posterior, spike_likelihood, interval_null, low_prior, mass_beside = FALSE;
  double prior_max, posterior_max, likelihood_max, y_max, null_h, top_extra, mode;
  double pad;
  guint posterior_at, likelihood_at;
  TfFigLayout layout;
  TfPlotArea *area;
  TfFigPoints prior = { 0 }, posterior = { 0 }, likelihood = { 0 }, null_line = { 0 };
  TfLegendEntry entries[3];
  guint n_entries = 0;
  double legend_w, legend_h, legend_x = 0, legend_y = 0;
  guint legend_columns;

  tf_figure_theme_init (&theme, opt->style, scale);
  pad = tf_figure_theme_pt (&theme, TF_FIG_PAD_PT);
  cairo_save (cr);
  tf_fig_begin (cr, &theme, width, height);
  if (curves == NULL || curves->n < 2 || !(curves->hi > curves->lo))
    {
      tf_fig_message (cr, &theme, width, height, NULL, _("There are no curves to draw."));
      cairo_restore (cr);
      return FALSE;
    }

  /* What sets the height of the axis: curves drawn as spikes do not. */
  prior_max = array_max (curves->prior, curves->n, NULL);
  posterior_max = array_max (curves->posterior, curves->n, &posterior_at);
  likelihood_max = array_max (curves->likelihood, curves->n, &likelihood_at);
  spike_posterior = curves->posterior_narrow;
  spike_likelihood = spike_posterior && likelihood_max > 4 * MAX (prior_max, 1e-300);
  mode = posterior_mode (curves, posterior_at);
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
  /* On a range zoomed to the posterior's bulk the prior is a line along the floor: keep
   * it drawn at its true height and write that height beside it. */
  low_prior = prior_max < LOW_PRIOR_SHARE * y_max;
  if (low_prior)
    {
      double lo = array_min (curves->prior, curves->n);
      g_autofree char *a = tf_fig_number (lo, 2);
      g_autofree char *b = tf_fig_number (prior_max, 2);

      if (g_str_equal (a, b))
        /* TRANSLATORS: beside a prior density too low to read off the axis; %s its height */
        prior_note = g_strdup_printf (_("prior: %s"), a);
      else
        /* TRANSLATORS: the prior density's lowest and highest height on the range shown */
        prior_note = g_strdup_printf (_("prior: %s to %s"), a, b);
    }

  parameter = curves->parameter_markup ? curves->parameter_markup : "θ";
  x_label = g_strdup_printf ("<i>%s</i>", parameter);
  interval_null = curves->null_high > curves->null_low;
  if (interval_null)
    {
      g_autofree char *lo = tf_fig_number (curves->null_low, 4);
      g_autofree char *hi = tf_fig_number (curves->null_high, 4);
      /* TRANSLATORS: the null interval in a figure, e.g. "null: 0.45 to 0.55" */
      null_label = g_strdup_printf (_("null: %s to %s"), lo, hi);
    }
  else
    {
      g_autofree char *value = tf_fig_number (curves->null_value, 6);
      /* "θ₀ = 0.8" for a single parameter; a compound one (θA − θB, ln(λA/λB))
       * takes no subscript: "θA − θB = 0" */
      if (strchr (parameter, '<') || strchr (parameter, ' ') || strchr (parameter, '('))
        null_label = g_strdup_printf ("<i>%s</i> = %s", parameter, value);
      else
        null_label = g_strdup_printf ("<i>%s</i>₀ = %s", parameter, value);
    }
  if (isfinite (null_mass))
    {
      g_autofree char *p = tf_fig_number (null_mass, 3);
      /* TRANSLATORS: beside the spike of the null: its probability given the data */
      mass_label = g_strdup_printf (_("P(H₀ | data) = %s"), p);
    }
  null_h = tf_fig_text_height (cr, &theme, theme.text_size, null_label);
  top_extra = null_h + tf_figure_theme_pt (&theme, 2.0);

  if (spike_posterior)
    {
      g_autofree char *m = g_strdup_printf ("%.4g", mode);
      /* TRANSLATORS: legend of a posterior drawn as a spike; %s is its mode, e.g. 0.8094 */
      note = g_strdup_printf (_("Posterior under H₁, too narrow\nto draw: a spike at its mode, %s"), m);
      entries[n_entries++] = (TfLegendEntry) { TF_SERIES_POSTERIOR, note, TF_SWATCH_LINE };
    }
  else
    entries[n_entries++] = (TfLegendEntry) { TF_SERIES_POSTERIOR, _("Posterior under H₁"), TF_SWATCH_LINE };
  entries[n_entries++] = (TfLegendEntry) { TF_SERIES_PRIOR, _("Prior under H₁"), TF_SWATCH_LINE };
  entries[n_entries++] = (TfLegendEntry) { TF_SERIES_LIKELIHOOD, _("Likelihood, scaled"), TF_SWATCH_LINE };

  /* Lay out with the legend inside; if it would hide data, put it above the plot area in
   * as few rows as fit the width. */
  legend_columns = 1;
  for (int attempt = 0; attempt < 2; attempt++)
    {
      gboolean above = attempt == 1;
      TfPolyline lines[6];
      guint n_lines = 0;
      double box_x[5], box_y[5];

      tf_fig_points_clear (&prior);
      tf_fig_points_clear (&posterior);
      tf_fig_points_clear (&likelihood);
      tf_fig_points_clear (&null_line);
      if (above)
        {
          for (legend_columns = n_entries; legend_columns > 1; legend_columns--)
            {
              tf_legend_measure (cr, &theme, entries, n_entries, legend_columns, &legend_w, &legend_h);
              if (legend_w <= width - 2 * pad)
                break;
            }
          /* a narrow figure: shorter names, in fewer rows */
          if (legend_columns < n_entries)
            {
              if (!spike_posterior)
                entries[0].markup = _("Posterior (H₁)");
              entries[1].markup = _("Prior (H₁)");
              entries[2].markup = _("Likelihood");
              for (legend_columns = n_entries; legend_columns > 1; legend_columns--)
                {
                  tf_legend_measure (cr, &theme, entries, n_entries, legend_columns, &legend_w, &legend_h);
                  if (legend_w <= width - 2 * pad)
                    break;
                }
            }
        }
      tf_legend_measure (cr, &theme, entries, n_entries, legend_columns, &legend_w, &legend_h);
      tf_fig_layout_single (cr, &theme, width, height,
                            top_extra + (above ? legend_h + tf_figure_theme_pt (&theme, 2.0) : 0),
                            0, x_label, y_label, curves->lo, curves->hi, FALSE, 0, y_max * 1.04,
                            &layout);
      area = &layout.area;

      tf_fig_points_map (area, curves->x, curves->prior, curves->n, TRUE, &prior);
      if (spike_posterior)
        map_vertical (area, mode, &posterior);
      else
        tf_fig_points_map (area, curves->x, curves->posterior, curves->n, TRUE, &posterior);
      if (spike_likelihood)
        map_vertical (area, curves->x[likelihood_at], &likelihood);
      else
        tf_fig_points_map (area, curves->x, curves->likelihood, curves->n, TRUE, &likelihood);
      map_vertical (area, curves->null_value, &null_line);

      lines[n_lines++] = (TfPolyline) { prior.x, prior.y, prior.n };
      lines[n_lines++] = (TfPolyline) { posterior.x, posterior.y, posterior.n };
      lines[n_lines++] = (TfPolyline) { likelihood.x, likelihood.y, likelihood.n };
      lines[n_lines++] = (TfPolyline) { null_line.x, null_line.y, null_line.n };
      /* the point null's probability, written beside its spike where it fits inside the
       * area (else beside the null's name above it): the legend keeps off it */
      if (mass_label && !interval_null)
        {
          double mw = tf_fig_text_width (cr, &theme, theme.text_size, mass_label);
          double mh = tf_fig_text_height (cr, &theme, theme.text_size, mass_label);
          double mx = mass_label_x (&theme, area, curves->null_value, mw);
          double my = area->y + tf_figure_theme_pt (&theme, 1.0);

          mass_beside = mx >= area->x;
          box_x[0] = box_x[3] = box_x[4] = mx;
          box_x[1] = box_x[2] = mx + mw;
          box_y[0] = box_y[1] = box_y[4] = my;
          box_y[2] = box_y[3] = my + mh;
          if (mass_beside)
            lines[n_lines++] = (TfPolyline) { box_x, box_y, 5 };
        }

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
      cairo_rectangle (cr, x0, area->y, x1 - x0, area->height);
      tf_figure_theme_fill_hatched (cr, &theme, TF_SERIES_NULL, 0.06);
    }

  if (!spike_posterior)
    {
      cairo_new_path (cr);
      for (guint i = 0; i < posterior.n; i++)
        if (isfinite (posterior.y[i]))
          cairo_line_to (cr, posterior.x[i], posterior.y[i]);
      cairo_line_to (cr, posterior.x[posterior.n - 1], area->y + area->height);
      cairo_line_to (cr, posterior.x[0], area->y + area->height);
      cairo_close_path (cr);
      tf_figure_theme_set_source_alpha (cr, &theme.series[TF_SERIES_POSTERIOR], 0.10);
      cairo_fill (cr);
    }

  tf_fig_stroke_series (cr, &theme, TF_SERIES_PRIOR, &prior);
  if (spike_posterior)
    tf_fig_spike (cr, &theme, area, TF_SERIES_POSTERIOR, mode);
  else
    tf_fig_stroke_series (cr, &theme, TF_SERIES_POSTERIOR, &posterior);

  /* the likelihood's dashes on top: with a flat prior it lies on the posterior */
  if (spike_likelihood)
    tf_fig_spike (cr, &theme, area, TF_SERIES_LIKELIHOOD, curves->x[likelihood_at]);
  else
    tf_fig_stroke_series (cr, &theme, TF_SERIES_LIKELIHOOD, &likelihood);
  cairo_restore (cr);

  /* The prior's height in words, on the side away from the posterior's peak. */
  if (prior_note)
    {
      double peak_x = tf_plot_area_map_x (area, spike_posterior ? mode : curves->x[posterior_at]);
      double w = tf_fig_text_width (cr, &theme, theme.text_size, prior_note);
      double h = tf_fig_text_height (cr, &theme, theme.text_size, prior_note);
      double gap = tf_figure_theme_pt (&theme, 3.0);
      double lx = peak_x > area->x + area->width / 2 ? area->x + gap
                                                      : area->x + area->width - w - gap;
      double ly = tf_plot_area_map_y (area, prior_max) - h - tf_figure_theme_pt (&theme, 1.5);

      tf_fig_text_halo (cr, &theme, &theme.series[TF_SERIES_PRIOR], theme.text_size, prior_note,
                        lx, MAX (ly, area->y));
    }

  /* The null: a spike for a point (its probability beside it), labelled above the area. */
  if (curves->null_value >= area->x_lo && curves->null_value <= area->x_hi)
    {
      double x = tf_plot_area_map_x (area, curves->null_value);
      double w, lx;

      if (!interval_null)
        {
          if (mass_label)
            {
              double mw = tf_fig_text_width (cr, &theme, theme.text_size, mass_label);

              tf_fig_spike (cr, &theme, area, TF_SERIES_NULL, curves->null_value);
              if (mass_beside)
                tf_fig_text_halo (cr, &theme, &theme.foreground, theme.text_size, mass_label,
                                  mass_label_x (&theme, area, curves->null_value, mw),
                                  area->y + tf_figure_theme_pt (&theme, 1.0));
              else
                {
                  /* beside the null's name, on its line above the area */
                  char *both = g_strdup_printf ("%s   %s", null_label, mass_label);
                  g_free (null_label);
                  null_label = both;
                }
            }
          else
            {
              tf_figure_theme_set_series_line (cr, &theme, TF_SERIES_NULL);
              cairo_move_to (cr, x, area->y + area->height);
              cairo_line_to (cr, x, area->y);
              cairo_stroke (cr);
            }

          /* Savage–Dickey heights: both densities at the null value, where the models
           * nest (a design that leaves both at 0 has no such ratio). */
          if (curves->prior_at_null > 0.0 || curves->posterior_at_null > 0.0)
            {
              tf_fig_marker (cr, &theme, area, TF_SERIES_PRIOR, curves->null_value,
                             curves->prior_at_null, FALSE);
              if (!spike_posterior)
                tf_fig_marker (cr, &theme, area, TF_SERIES_POSTERIOR, curves->null_value,
                               curves->posterior_at_null, TRUE);
            }
        }
      else
        x = tf_plot_area_map_x (area, (curves->null_low + curves->null_high) / 2);

      /* centred on the null, inside the figure and right of the y axis's labels */
      w = tf_fig_text_width (cr, &theme, theme.text_size, null_label);
      lx = MAX (MIN (x - w / 2, width - w - pad), MIN (area->x, width - w - pad));
      lx = MAX (lx, pad);
      tf_fig_text (cr, &theme, &theme.foreground, theme.text_size, null_label, lx,
                        area->y - null_h - tf_figure_theme_pt (&theme, 1.5));
    }

  tf_axis_draw_bottom (cr, &theme, area, &layout.x_ticks, x_label);
  tf_axis_draw_left (cr, &theme, area, &layout.y_ticks, y_label);
  tf_legend_draw (cr, &theme, entries, n_entries, legend_columns, legend_x, legend_y);

  if (area_out)
    *area_out = *area;

  tf_fig_points_clear (&prior);
  tf_fig_points_clear (&posterior);
  tf_fig_points_clear (&likelihood);
  tf_fig_points_clear (&null_line);
  cairo_restore (cr);
  return TRUE;
}
