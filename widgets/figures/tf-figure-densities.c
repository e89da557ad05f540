/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-densities.c: the densities figure: prior and posterior of the parameter
 * under the alternative, the scaled likelihood, and the null as a spike (a point null,
 * its probability beside it) or a band (an interval null), with the Savage–Dickey
 * heights.
 */
#include <math.h>
#include <string.h>
#include <glib/gi18n-lib.h>
#include "tf-design.h"
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

/* One drawing of the figure: what its phases share. */
typedef struct {
  cairo_t *cr;
  TfFigureTheme theme;
  const TfDensityCurves *curves;
  double width, height, pad;
  /* the ranges: the curves drawn as spikes do not set the axis's height */
  double prior_max, y_max, mode;
  guint posterior_at, likelihood_at;
  gboolean spike_posterior, spike_likelihood, interval_null;
  /* the words */
  double null_mass;
  char *x_label, *null_label, *mass_label, *note, *prior_note;
  double null_h;
  gboolean mass_beside;         /* the null's probability fits beside its spike */
  /* the legend, inside the plot area or above it */
  TfLegendEntry entries[3];
  guint n_entries, legend_columns;
  double legend_w, legend_h, legend_x, legend_y;
  /* the plot area, and the curves in it */
  TfFigLayout layout;
  TfFigPoints prior, posterior, likelihood, null_line;
} Draw;

/* A prior that runs off to infinity at an end (Beta with a or b below 1) would flatten
 * everything else: the axis then follows the prior's inside and the ends go off the top. */
static double
prior_height (const Draw *d, double posterior_max, double likelihood_max)
{
  const TfDensityCurves *c = d->curves;
  guint prior_at, edge = MAX (c->n / 33, 1);
  double inside = 0, others = 0;

  array_max (c->prior, c->n, &prior_at);
  for (guint i = edge; i + edge < c->n; i++)
    inside = MAX (inside, c->prior[i]);
  if (!d->spike_posterior)
    others = MAX (others, posterior_max);
  if (!d->spike_likelihood)
    others = MAX (others, likelihood_max);
  if ((prior_at < edge || prior_at + edge >= c->n) && d->prior_max > 1.5 * MAX (inside, others))
    return MAX (inside, 1e-300);
  return d->prior_max;
}

/* What sets the height of the axis, and which curves are drawn as spikes. */
static void
densities_ranges (Draw *d)
{
  const TfDensityCurves *c = d->curves;
  double posterior_max = array_max (c->posterior, c->n, &d->posterior_at);
  double likelihood_max = array_max (c->likelihood, c->n, &d->likelihood_at);

  d->prior_max = array_max (c->prior, c->n, NULL);
  d->spike_posterior = c->posterior_narrow;
  d->spike_likelihood = d->spike_posterior && likelihood_max > 4 * MAX (d->prior_max, 1e-300);
  d->mode = posterior_mode (c, d->posterior_at);
  d->prior_max = prior_height (d, posterior_max, likelihood_max);
  d->y_max = d->prior_max;
  if (!d->spike_posterior)
    d->y_max = MAX (d->y_max, posterior_max);
  if (!d->spike_likelihood)
    d->y_max = MAX (d->y_max, likelihood_max);
  if (!(d->y_max > 0) || !isfinite (d->y_max))
    d->y_max = 1;
}

/* On a range zoomed to the posterior's bulk the prior is a line along the floor: it is
 * kept drawn at its true height, and that height is written beside it. NULL when the
 * prior reads off the axis. */
static char *
low_prior_note (const Draw *d)
{
  g_autofree char *a = NULL;
  g_autofree char *b = NULL;

  if (!(d->prior_max < LOW_PRIOR_SHARE * d->y_max))
    return NULL;
  a = tf_fig_number (array_min (d->curves->prior, d->curves->n), 2);
  b = tf_fig_number (d->prior_max, 2);
  if (g_str_equal (a, b))
    /* TRANSLATORS: beside a prior density too low to read off the axis; %s its height */
    return g_strdup_printf (_("prior: %s"), a);
  /* TRANSLATORS: the prior density's lowest and highest height on the range shown */
  return g_strdup_printf (_("prior: %s to %s"), a, b);
}

/* The null's name above the area: its interval, or "θ₀ = 0.8". */
static char *
null_name (const TfDensityCurves *c, const char *parameter, gboolean interval_null)
{
  g_autofree char *value = NULL;

  if (interval_null)
    {
      g_autofree char *lo = tf_fig_number (c->null_low, 4);
      g_autofree char *hi = tf_fig_number (c->null_high, 4);
      /* TRANSLATORS: the null interval in a figure, e.g. "null: 0.45 to 0.55" */
      return g_strdup_printf (_("null: %s to %s"), lo, hi);
    }
  value = tf_fig_number (c->null_value, 6);
  /* "θ₀ = 0.8" for a single parameter; a compound one (θA − θB, ln(λA/λB)) takes no
   * subscript: "θA − θB = 0" */
  if (strchr (parameter, '<') || strchr (parameter, ' ') || strchr (parameter, '('))
    return g_strdup_printf ("<i>%s</i> = %s", parameter, value);
  return g_strdup_printf ("<i>%s</i>₀ = %s", parameter, value);
}

/* The notes, the axis's and the null's names, and the legend's entries. */
static void
densities_words (Draw *d)
{
  const TfDensityCurves *c = d->curves;
  const char *parameter = c->parameter_markup ? c->parameter_markup : "θ";

  d->prior_note = low_prior_note (d);
  d->x_label = g_strdup_printf ("<i>%s</i>", parameter);
  d->interval_null = c->null_high > c->null_low;
  d->null_label = null_name (c, parameter, d->interval_null);
  if (isfinite (d->null_mass))
    {
      g_autofree char *p = tf_fig_number (d->null_mass, 3);
      /* TRANSLATORS: beside the spike of the null: its probability given the data */
      d->mass_label = g_strdup_printf (_("P(H₀ | data) = %s"), p);
    }
  d->null_h = tf_fig_text_height (d->cr, &d->theme, d->theme.text_size, d->null_label);

  if (d->spike_posterior)
    {
      g_autofree char *m = g_strdup_printf ("%.4g", d->mode);
      /* TRANSLATORS: legend of a posterior drawn as a spike; %s is its mode, e.g. 0.8094 */
      d->note = g_strdup_printf (_("Posterior under H₁, too narrow\nto draw: a spike at its mode, %s"), m);
      d->entries[d->n_entries++] = (TfLegendEntry) { TF_SERIES_POSTERIOR, d->note, TF_SWATCH_LINE };
    }
  else
    d->entries[d->n_entries++] = (TfLegendEntry) { TF_SERIES_POSTERIOR, _("Posterior under H₁"), TF_SWATCH_LINE };
  d->entries[d->n_entries++] = (TfLegendEntry) { TF_SERIES_PRIOR, _("Prior under H₁"), TF_SWATCH_LINE };
  d->entries[d->n_entries++] = (TfLegendEntry) { TF_SERIES_LIKELIHOOD, _("Likelihood, scaled"), TF_SWATCH_LINE };
}

static void
clear_curves (Draw *d)
{
  tf_fig_points_clear (&d->prior);
  tf_fig_points_clear (&d->posterior);
  tf_fig_points_clear (&d->likelihood);
  tf_fig_points_clear (&d->null_line);
}

/* The curves in the plot area of this layout (a spike as a vertical line). */
static void
map_curves (Draw *d)
{
  const TfDensityCurves *c = d->curves;
  const TfPlotArea *area = &d->layout.area;

  tf_fig_points_map (area, c->x, c->prior, c->n, TRUE, &d->prior);
  if (d->spike_posterior)
    map_vertical (area, d->mode, &d->posterior);
  else
    tf_fig_points_map (area, c->x, c->posterior, c->n, TRUE, &d->posterior);
  if (d->spike_likelihood)
    map_vertical (area, c->x[d->likelihood_at], &d->likelihood);
  else
    tf_fig_points_map (area, c->x, c->likelihood, c->n, TRUE, &d->likelihood);
  map_vertical (area, c->null_value, &d->null_line);
}

/* The box of the point null's probability beside its spike, inside the area (TRUE), or
 * not (FALSE: it goes beside the null's name above the area). */
static gboolean
mass_box (const Draw *d, double box_x[5], double box_y[5])
{
  const TfPlotArea *area = &d->layout.area;
  double mw = tf_fig_text_width (d->cr, &d->theme, d->theme.text_size, d->mass_label);
  double mh = tf_fig_text_height (d->cr, &d->theme, d->theme.text_size, d->mass_label);
  double mx = mass_label_x (&d->theme, area, d->curves->null_value, mw);
  double my = area->y + tf_figure_theme_pt (&d->theme, 1.0);

  box_x[0] = box_x[3] = box_x[4] = mx;
  box_x[1] = box_x[2] = mx + mw;
  box_y[0] = box_y[1] = box_y[4] = my;
  box_y[2] = box_y[3] = my + mh;
  return mx >= area->x;
}

/* A place in the plot area for the legend where it hides no curve and not the null's
 * probability (box, or NULL). */
static gboolean
place_legend_inside (Draw *d, const double *box_x, const double *box_y)
{
  TfPolyline lines[5];
  guint n_lines = 0;

  lines[n_lines++] = (TfPolyline) { d->prior.x, d->prior.y, d->prior.n };
  lines[n_lines++] = (TfPolyline) { d->posterior.x, d->posterior.y, d->posterior.n };
  lines[n_lines++] = (TfPolyline) { d->likelihood.x, d->likelihood.y, d->likelihood.n };
  lines[n_lines++] = (TfPolyline) { d->null_line.x, d->null_line.y, d->null_line.n };
  if (box_x)
    lines[n_lines++] = (TfPolyline) { box_x, box_y, 5 };
  return tf_legend_place (&d->layout.area, d->legend_w, d->legend_h,
                          tf_figure_theme_pt (&d->theme, 4.0), lines, n_lines,
                          &d->legend_x, &d->legend_y);
}

/* Above the plot area: as few rows as fit the width; in a narrow figure, shorter names
 * in fewer rows. */
static void
fit_legend_above (Draw *d)
{
  double max_w = d->width - 2 * d->pad;

  d->legend_columns = tf_legend_fit_columns (d->cr, &d->theme, d->entries, d->n_entries, max_w);
  if (d->legend_columns < d->n_entries)
    {
      if (!d->spike_posterior)
        d->entries[0].markup = _("Posterior (H₁)");
      d->entries[1].markup = _("Prior (H₁)");
      d->entries[2].markup = _("Likelihood");
      d->legend_columns = tf_legend_fit_columns (d->cr, &d->theme, d->entries, d->n_entries,
                                                 max_w);
    }
}

/* The margins and the plot area, with the legend inside; if it would hide data, with
 * the legend above the plot area. */
static void
densities_layout (Draw *d)
{
  double top_extra = d->null_h + tf_figure_theme_pt (&d->theme, 2.0);

  d->legend_columns = 1;
  for (int attempt = 0; attempt < 2; attempt++)
    {
      gboolean above = attempt == 1;
      gboolean box = d->mass_label && !d->interval_null;
      double box_x[5], box_y[5];

      clear_curves (d);
      if (above)
        fit_legend_above (d);
      tf_legend_measure (d->cr, &d->theme, d->entries, d->n_entries, d->legend_columns,
                         &d->legend_w, &d->legend_h);
      tf_fig_layout_single (d->cr, &d->theme, d->width, d->height,
                            top_extra + (above ? d->legend_h + tf_figure_theme_pt (&d->theme, 2.0) : 0),
                            0, d->x_label, _("density"), d->curves->lo, d->curves->hi, FALSE,
                            0, d->y_max * 1.04, &d->layout);
      map_curves (d);
      if (box)
        d->mass_beside = mass_box (d, box_x, box_y);
      if (above)
        {
          d->legend_x = tf_fig_centred_over (&d->layout.area, d->legend_w, d->width, d->pad);
          d->legend_y = d->pad;
        }
      else if (place_legend_inside (d, box && d->mass_beside ? box_x : NULL, box_y))
        break;
    }
}

/* The posterior's area, lightly filled. */
static void
fill_under (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
            const TfFigPoints *p, TfSeries series)
{
  cairo_new_path (cr);
  for (guint i = 0; i < p->n; i++)
    if (isfinite (p->y[i]))
      cairo_line_to (cr, p->x[i], p->y[i]);
  cairo_line_to (cr, p->x[p->n - 1], area->y + area->height);
  cairo_line_to (cr, p->x[0], area->y + area->height);
  cairo_close_path (cr);
  tf_figure_theme_set_source_alpha (cr, &theme->series[series], 0.10);
  cairo_fill (cr);
}

/* The interval null's band and the curves, clipped to the plot area. */
static void
densities_curves (Draw *d)
{
  cairo_t *cr = d->cr;
  const TfFigureTheme *theme = &d->theme;
  const TfPlotArea *area = &d->layout.area;

  cairo_save (cr);
  cairo_rectangle (cr, area->x, area->y - tf_figure_theme_pt (theme, 1.0),
                   area->width, area->height + tf_figure_theme_pt (theme, 1.0));
  cairo_clip (cr);
  if (d->interval_null)
    {
      double x0 = tf_plot_area_map_x (area, d->curves->null_low);
      double x1 = tf_plot_area_map_x (area, d->curves->null_high);
      cairo_rectangle (cr, x0, area->y, x1 - x0, area->height);
      tf_figure_theme_fill_hatched (cr, theme, TF_SERIES_NULL, 0.06);
    }
  if (!d->spike_posterior)
    fill_under (cr, theme, area, &d->posterior, TF_SERIES_POSTERIOR);

  tf_fig_stroke_series (cr, theme, TF_SERIES_PRIOR, &d->prior);
  if (d->spike_posterior)
    tf_fig_spike (cr, theme, area, TF_SERIES_POSTERIOR, d->mode);
  else
    tf_fig_stroke_series (cr, theme, TF_SERIES_POSTERIOR, &d->posterior);
  /* the likelihood's dashes on top: with a flat prior it lies on the posterior */
  if (d->spike_likelihood)
    tf_fig_spike (cr, theme, area, TF_SERIES_LIKELIHOOD, d->curves->x[d->likelihood_at]);
  else
    tf_fig_stroke_series (cr, theme, TF_SERIES_LIKELIHOOD, &d->likelihood);
  cairo_restore (cr);
}

/* The prior's height in words, on the side away from the posterior's peak. */
static void
densities_prior_note (Draw *d)
{
  const TfFigureTheme *theme = &d->theme;
  const TfPlotArea *area = &d->layout.area;
  double peak_x, w, h, gap, lx, ly;

  if (d->prior_note == NULL)
    return;
  peak_x = tf_plot_area_map_x (area, d->spike_posterior ? d->mode
                                                         : d->curves->x[d->posterior_at]);
  w = tf_fig_text_width (d->cr, theme, theme->text_size, d->prior_note);
  h = tf_fig_text_height (d->cr, theme, theme->text_size, d->prior_note);
  gap = tf_figure_theme_pt (theme, 3.0);
  lx = peak_x > area->x + area->width / 2 ? area->x + gap : area->x + area->width - w - gap;
  ly = tf_plot_area_map_y (area, d->prior_max) - h - tf_figure_theme_pt (theme, 1.5);
  tf_fig_text_halo (d->cr, theme, &theme->series[TF_SERIES_PRIOR], theme->text_size,
                    d->prior_note, lx, MAX (ly, area->y));
}

/* A point null: a spike with its probability beside it (or beside its name, when it
 * does not fit), or a plain line; and the Savage–Dickey heights. */
static void
densities_point_null (Draw *d)
{
  cairo_t *cr = d->cr;
  const TfFigureTheme *theme = &d->theme;
  const TfPlotArea *area = &d->layout.area;
  const TfDensityCurves *c = d->curves;
  double x = tf_plot_area_map_x (area, c->null_value);

  if (d->mass_label)
    {
      double mw = tf_fig_text_width (cr, theme, theme->text_size, d->mass_label);

      tf_fig_spike (cr, theme, area, TF_SERIES_NULL, c->null_value);
      if (d->mass_beside)
        tf_fig_text_halo (cr, theme, &theme->foreground, theme->text_size, d->mass_label,
                          mass_label_x (theme, area, c->null_value, mw),
                          area->y + tf_figure_theme_pt (theme, 1.0));
      else
        {
          /* beside the null's name, on its line above the area */
          char *both = g_strdup_printf ("%s   %s", d->null_label, d->mass_label);
          g_free (d->null_label);
          d->null_label = both;
        }
    }
  else
    {
      tf_figure_theme_set_series_line (cr, theme, TF_SERIES_NULL);
      cairo_move_to (cr, x, area->y + area->height);
      cairo_line_to (cr, x, area->y);
      cairo_stroke (cr);
    }

  /* Savage–Dickey heights: both densities at the null value, where the models nest (a
   * design that leaves both at 0 has no such ratio). */
  if (c->prior_at_null > 0.0 || c->posterior_at_null > 0.0)
    {
      tf_fig_marker (cr, theme, area, TF_SERIES_PRIOR, c->null_value, c->prior_at_null, FALSE);
      if (!d->spike_posterior)
        tf_fig_marker (cr, theme, area, TF_SERIES_POSTERIOR, c->null_value,
                       c->posterior_at_null, TRUE);
    }
}

/* The null, when it is on the range: a point's spike or an interval's centre, named
 * above the area. */
static void
densities_null (Draw *d)
{
  const TfFigureTheme *theme = &d->theme;
  const TfPlotArea *area = &d->layout.area;
  const TfDensityCurves *c = d->curves;
  double x, w;

  if (!(c->null_value >= area->x_lo && c->null_value <= area->x_hi))
    return;
  if (!d->interval_null)
    {
      densities_point_null (d);
      x = tf_plot_area_map_x (area, c->null_value);
    }
  else
    x = tf_plot_area_map_x (area, (c->null_low + c->null_high) / 2);
  w = tf_fig_text_width (d->cr, theme, theme->text_size, d->null_label);
  tf_fig_text (d->cr, theme, &theme->foreground, theme->text_size, d->null_label,
               tf_fig_label_x (x, w, area, d->width, d->pad),
               area->y - d->null_h - tf_figure_theme_pt (theme, 1.5));
}

gboolean
tf_figure_draw_density_curves (cairo_t *cr, double width, double height, double scale,
                               const TfDensityCurves *curves, double null_mass,
                               const TfFigureOptions *options, TfPlotArea *area_out)
{
  Draw d = { .cr = cr, .curves = curves, .width = width, .height = height,
             .null_mass = null_mass };

  tf_fig_start (cr, &d.theme, tf_fig_options (options)->style, scale, width, height);
  if (curves == NULL || curves->n < 2 || !(curves->hi > curves->lo))
    return tf_fig_nothing (cr, &d.theme, width, height, _("There are no curves to draw."));
  d.pad = tf_figure_theme_pt (&d.theme, TF_FIG_PAD_PT);

  densities_ranges (&d);
  densities_words (&d);
  densities_layout (&d);
  densities_curves (&d);
  densities_prior_note (&d);
  densities_null (&d);
  tf_axis_draw_bottom (cr, &d.theme, &d.layout.area, &d.layout.x_ticks, d.x_label);
  tf_axis_draw_left (cr, &d.theme, &d.layout.area, &d.layout.y_ticks, _("density"));
  tf_legend_draw (cr, &d.theme, d.entries, d.n_entries, d.legend_columns, d.legend_x,
                  d.legend_y);
  if (area_out)
    *area_out = d.layout.area;

  clear_curves (&d);
  g_free (d.x_label);
  g_free (d.null_label);
  g_free (d.mass_label);
  g_free (d.note);
  g_free (d.prior_note);
  cairo_restore (cr);
  return TRUE;
}
