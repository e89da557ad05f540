/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-figures-marks.c: the figures of real analyses, one per design, drawn to image
 * surfaces; their pixels sampled where the core's numbers say the marks are, through
 * the figure's own mapping of data to the surface (tf_figure_draw_panels()): the
 * posterior's peak and the null's spike, the chosen prior's and the observed n's
 * markers at the reported Bayes factor and P(H0 | data), the observed statistic's line.
 * And the readout of the panel under the pointer, read without GTK.
 */
#include <math.h>
#include <string.h>
#include "tf-design.h"
#include "tf-figure.h"
#include "tf-figure-theme.h"
#include "tf-axis.h"
#include "test-figures.h"

/* As tf-figure-kinds.c draws them: the same grids give the same curves. */
#define DENSITY_POINTS 401
#define EVIDENCE_POINTS 256
#define NULL_POINTS 401

/* A colour this close (largest channel difference) counts as found. */
#define FOUND 0.12

static const struct {
  int width, height;
  double scale;                 /* pixels per point */
  TfFigureStyle style;
} canvases[] = {
  { 1000, 660, 1000 / (120.0 * 72 / 25.4), TF_FIGURE_STYLE_LIGHT },  /* 120 mm, ~212 dpi */
  { 472, 354, 472 / (60.0 * 72 / 25.4), TF_FIGURE_STYLE_DARK },      /* 60 mm at 200 dpi */
};

typedef struct {
  cairo_surface_t *surface;
  TfFigureTheme theme;
  TfFigurePanels panels;
  const char *where;            /* "design kind canvas", for messages */
} Drawn;

static void
drawn_clear (Drawn *d)
{
  g_clear_pointer (&d->surface, cairo_surface_destroy);
}

static void
draw (const TfFigure *figure, guint canvas, Drawn *out)
{
  cairo_t *cr;

  out->surface = cairo_image_surface_create (CAIRO_FORMAT_RGB24, canvases[canvas].width,
                                             canvases[canvas].height);
  cr = cairo_create (out->surface);
  tf_figure_theme_init (&out->theme, canvases[canvas].style, canvases[canvas].scale);
  {
    TfFigureOptions options = TF_FIGURE_OPTIONS_INIT;
    options.style = canvases[canvas].style;
    g_assert_true (tf_figure_draw_panels (figure, cr, canvases[canvas].width,
                                          canvases[canvas].height, canvases[canvas].scale,
                                          &options, &out->panels));
  }
  cairo_destroy (cr);
  cairo_surface_flush (out->surface);
  g_assert_cmpuint (out->panels.n, >=, 1);
}

/* The series' colour within radius pixels of data (x, y) in panel p. */
static void
assert_colour_at (const Drawn *d, guint p, double x, double y, int radius,
                  const TfColour *colour, const char *what)
{
  const TfPlotArea *a = &d->panels.area[p];
  int px = (int) round (tf_plot_area_map_x (a, x));
  int py = (int) round (tf_plot_area_map_y (a, y));
  double dist = test_nearest_colour (d->surface, px, py, radius, colour, &d->theme.background);

  if (dist >= FOUND)
    g_test_message ("%s: %s not found near pixel %d, %d (distance %.3f)", d->where, what, px,
                    py, dist);
  g_assert_cmpfloat (dist, <, FOUND);
}

/* Either of two colours within 2 pixels of data (x, y) in the top panel. */
static void
assert_colour_at2 (const Drawn *d, double x, double y, const TfColour *one, const TfColour *other,
                   const char *what)
{
  const TfPlotArea *a = &d->panels.area[0];
  int px = (int) round (tf_plot_area_map_x (a, x));
  int py = (int) round (tf_plot_area_map_y (a, y));
  double dist = MIN (test_nearest_colour (d->surface, px, py, 2, one, &d->theme.background),
                     test_nearest_colour (d->surface, px, py, 2, other, &d->theme.background));

  if (dist >= FOUND)
    g_test_message ("%s: %s not found near pixel %d, %d (distance %.3f)", d->where, what, px,
                    py, dist);
  g_assert_cmpfloat (dist, <, FOUND);
}

static double
result (const TfResults *results, const char *id)
{
  double v = NAN;

  g_assert_true (tf_results_get (results, id, &v));
  g_assert_true (isfinite (v));
  return v;
}

/* The prior's scale the sensitivity figure moves, as each design defines it. */
static double
prior_scale_of (const TfAnalysis *a)
{
  switch (a->design)
    {
    case TF_DESIGN_ONE_PROPORTION:
    case TF_DESIGN_TWO_PROPORTIONS:
      return a->prior_a + a->prior_b;   /* concentration, the prior mean held */
    case TF_DESIGN_ONE_RATE:
    case TF_DESIGN_TWO_RATES:
      return a->prior_shape;            /* gamma shape, the prior mean held */
    case TF_DESIGN_ONE_MEAN:
    case TF_DESIGN_PAIRED_MEANS:
    case TF_DESIGN_TWO_MEANS:
    case TF_N_DESIGNS:
    default:
      return a->prior_scale;
    }
}

/* The observed size the sample-size figure marks. */
static double
sample_size_of (const TfAnalysis *a)
{
  switch (a->design)
    {
    case TF_DESIGN_ONE_PROPORTION:
      return a->trials;
    case TF_DESIGN_TWO_PROPORTIONS:
      return a->trials_a + a->trials_b;
    case TF_DESIGN_ONE_MEAN:
    case TF_DESIGN_PAIRED_MEANS:
      return a->n;
    case TF_DESIGN_TWO_MEANS:
      return a->n_a + a->n_b;
    case TF_DESIGN_ONE_RATE:
      return a->exposure;
    case TF_DESIGN_TWO_RATES:
      return 1.0;                       /* the exposures times f = 1 */
    case TF_N_DESIGNS:
    default:
      return NAN;
    }
}

/* The observed statistic and the p-value the null-distribution figure shows. */
static void
observed_of (const TfAnalysis *a, const TfResults *r, double *observed, double *p)
{
  switch (a->design)
    {
    case TF_DESIGN_ONE_PROPORTION:
      *observed = a->successes, *p = result (r, "p_value_exact");
      break;
    case TF_DESIGN_TWO_PROPORTIONS:
      *observed = a->successes_a, *p = result (r, "p_value_fisher");
      break;
    case TF_DESIGN_ONE_RATE:
      *observed = a->events, *p = result (r, "p_value_exact");
      break;
    case TF_DESIGN_TWO_RATES:
      *observed = a->events_a, *p = result (r, "p_value_exact");
      break;
    case TF_DESIGN_ONE_MEAN:
    case TF_DESIGN_PAIRED_MEANS:
    case TF_DESIGN_TWO_MEANS:
    case TF_N_DESIGNS:
    default:
      {
        double t;
        *observed = tf_results_get (r, "t", &t) ? t : result (r, "z");
        *p = result (r, "p_value");
      }
      break;
    }
}

/* A height in the area (data units) at least 10 pixels from each of the values, for a
 * vertical mark: the first of a few candidates. */
static double
clear_height (const TfPlotArea *a, const double *values, guint n)
{
  static const double shares[] = { 0.5, 0.4, 0.6, 0.3, 0.7, 0.2 };

  for (guint s = 0; s < G_N_ELEMENTS (shares); s++)
    {
      double y = a->y_lo + shares[s] * (a->y_hi - a->y_lo);
      gboolean clear = TRUE;

      for (guint i = 0; i < n; i++)
        if (isfinite (values[i])
            && fabs (tf_plot_area_map_y (a, y) - tf_plot_area_map_y (a, values[i])) < 10)
          clear = FALSE;
      if (clear)
        return y;
    }
  return a->y_lo + 0.5 * (a->y_hi - a->y_lo);
}

/* Linear interpolation of ys over increasing xs at x. */
static double
interpolate (const double *xs, const double *ys, guint n, double x)
{
  for (guint i = 0; i + 1 < n; i++)
    if (x >= xs[i] && x <= xs[i + 1])
      {
        double t = xs[i + 1] > xs[i] ? (x - xs[i]) / (xs[i + 1] - xs[i]) : 0;
        return ys[i] + t * (ys[i + 1] - ys[i]);
      }
  return NAN;
}

static void
check_densities (const TfAnalysis *analysis, const TfResults *results, const Drawn *d)
{
  g_autoptr (TfDensityCurves) c = tf_density_curves_new (analysis, DENSITY_POINTS, NULL);
  const TfPlotArea *a = &d->panels.area[0];
  const TfColour *post = &d->theme.series[TF_SERIES_POSTERIOR];
  double peak = 0, mode = c->posterior_mode, reported, at_null[3];
  guint at = 0;

  g_assert_nonnull (c);
  for (guint i = 0; i < c->n; i++)
    if (c->posterior[i] > peak)
      peak = c->posterior[i], at = i;
  /* the core's mode is the grid's peak, within a grid step */
  if (tf_results_get (results, "posterior_mode", &reported))
    g_assert_cmpfloat (fabs (reported - mode), <=, 1e-9 * MAX (fabs (mode), 1e-300));
  g_assert_cmpfloat (fabs (c->x[at] - mode), <=, 1.01 * (c->hi - c->lo) / (c->n - 1));
  if (c->posterior_narrow)
    assert_colour_at (d, 0, mode, (a->y_lo + a->y_hi) / 2, 1, post, "the posterior's spike");
  else
    {
      double lik = interpolate (c->x, c->likelihood, c->n, mode);

      g_assert_cmpfloat (a->y_hi, >=, peak);
      /* where the scaled likelihood lies on the posterior (a flat prior), its dashes on
       * top may hide the posterior's line: either colour is the curve there */
      if (fabs (tf_plot_area_map_y (a, lik) - tf_plot_area_map_y (a, peak)) < 2)
        assert_colour_at2 (d, mode, peak, post, &d->theme.series[TF_SERIES_LIKELIHOOD],
                           "the posterior's peak");
      else
        assert_colour_at (d, 0, mode, peak, 2, post, "the posterior's peak");
    }

  /* the null's spike at θ0, at a height clear of the curves */
  if (analysis->null_kind == TF_NULL_POINT)
    {
      if (analysis->design == TF_DESIGN_ONE_PROPORTION || analysis->design == TF_DESIGN_ONE_MEAN
          || analysis->design == TF_DESIGN_PAIRED_MEANS || analysis->design == TF_DESIGN_ONE_RATE)
        g_assert_cmpfloat (c->null_value, ==, analysis->null_value);
      at_null[0] = c->prior_at_null;
      at_null[1] = c->posterior_narrow ? NAN : c->posterior_at_null;
      at_null[2] = interpolate (c->x, c->likelihood, c->n, c->null_value);
      assert_colour_at (d, 0, c->null_value, clear_height (a, at_null, 3), 1,
                        &d->theme.series[TF_SERIES_NULL], "the null's spike");
      /* Savage–Dickey: the prior's open marker at its density at the null */
      if (c->prior_at_null > 0 && c->prior_at_null < a->y_hi)
        assert_colour_at (d, 0, c->null_value, c->prior_at_null,
                          (int) ceil (3.4 * d->theme.scale) + 1,
                          &d->theme.series[TF_SERIES_PRIOR], "the prior's height at the null");
    }
  else
    {
      /* the band: tinted inside, from its low to its high end, half way up */
      const TfColour *bg = &d->theme.background;
      double rgb[3];
      int y = (int) round (a->y + 0.5 * a->height);
      int x0 = (int) ceil (tf_plot_area_map_x (a, c->null_low)) + 1;
      int x1 = (int) floor (tf_plot_area_map_x (a, c->null_high)) - 1;
      guint tinted = 0;

      for (int x = x0; x <= x1; x++)
        {
          test_pixel_at (d->surface, x, y, rgb);
          tinted += test_colour_distance (rgb, bg, bg) > 0.01;
        }
      g_assert_cmpuint (tinted, >, (guint) (x1 - x0 + 1) / 2);
    }
}

/* The evidence figures: the marker at the chosen x and the reported BF01 above, at the
 * reported P(H0 | data) below; the BF curve through the reported value there, and drawn
 * a few pixels either side of the marker where the curve says. */
static void
check_evidence (const TfAnalysis *analysis, const TfResults *results, const Drawn *d,
                gboolean sample_size)
{
  g_autoptr (TfEvidenceCurve) c = sample_size
                                  ? tf_sample_size_curve_new (analysis, EVIDENCE_POINTS, NULL, NULL)
                                  : tf_sensitivity_curve_new (analysis, EVIDENCE_POINTS, NULL, NULL);
  const TfColour *ev = &d->theme.series[TF_SERIES_EVIDENCE];
  const TfPlotArea *top = &d->panels.area[0];
  double chosen = sample_size ? sample_size_of (analysis) : prior_scale_of (analysis);
  double bf01 = result (results, "bf01"), p_null = result (results, "posterior_null");
  double cx, on_curve;
  g_autofree double *lx = NULL;
  g_autofree double *l10 = NULL;

  g_assert_nonnull (c);
  g_assert_cmpuint (d->panels.n, ==, 2);
  g_assert_true (top->x_log && top->y_log);
  g_assert_cmpfloat (fabs (c->chosen_x - chosen), <=, 1e-12 * chosen);
  cx = log10 (chosen);
  /* the marker: the reported BF01 and P(H0 | data), to 1e-9 relative */
  g_assert_cmpfloat (fabs (c->chosen_log_bf01 - log (bf01)), <=, 1e-9 * MAX (1, fabs (log (bf01))));
  g_assert_cmpfloat (fabs (c->chosen_posterior_null - p_null), <=, 1e-9);
  assert_colour_at (d, 0, cx, log10 (bf01), 3, ev, "the BF01 marker");
  assert_colour_at (d, 1, cx, p_null, 3, ev, "the P(H0 | data) marker");

  /* the curve through the reported BF01 at the chosen x: within 1.5 pixels */
  lx = g_new (double, c->n);
  l10 = g_new (double, c->n);
  for (guint i = 0; i < c->n; i++)
    lx[i] = log10 (c->x[i]), l10[i] = c->log_bf01[i] / G_LN10;
  on_curve = interpolate (lx, l10, c->n, cx);
  g_assert_true (isfinite (on_curve));
  /* every design's curves pass through the reported BF01: the sensitivity curve at the
   * chosen prior, the sample-size curve (which holds the observed score or t statistic)
   * at the observed size */
  if (fabs (tf_plot_area_map_y (top, on_curve) - tf_plot_area_map_y (top, log10 (bf01))) >= 1.5)
    g_test_message ("%s: the curve at the chosen x is %g, the reported BF01 %g", d->where,
                    pow (10, on_curve), bf01);
  g_assert_cmpfloat (fabs (tf_plot_area_map_y (top, on_curve) - tf_plot_area_map_y (top, log10 (bf01))),
                     <, 1.5);
  /* and drawn there: 12 pixels left and right of the marker, where inside the area */
  for (int side = -1; side <= 1; side += 2)
    {
      double px = tf_plot_area_map_x (top, cx) + side * 12;
      double x = log10 (tf_plot_area_unmap_x (top, px));
      double y = interpolate (lx, l10, c->n, x);

      if (px > top->x + 2 && px < top->x + top->width - 2 && isfinite (y)
          && y > top->y_lo && y < top->y_hi)
        assert_colour_at (d, 0, x, y, 2, ev, "the BF01 curve beside the marker");
    }
}

static void
check_null_distribution (const TfAnalysis *analysis, const TfResults *results, const Drawn *d)
{
  g_autoptr (TfNullDistribution) n = tf_null_distribution_new (analysis, NULL_POINTS, NULL, NULL);
  const TfPlotArea *a = &d->panels.area[0];
  double observed, p, peak = 0;
  guint at = 0;

  g_assert_nonnull (n);
  observed_of (analysis, results, &observed, &p);
  g_assert_cmpfloat (fabs (n->observed - observed), <=, 1e-12 * MAX (1, fabs (observed)));
  g_assert_cmpfloat (fabs (n->p_value - p), <=, 1e-9 * p);
  /* the observed value's line, a third of the way up */
  assert_colour_at (d, 0, observed, a->y_lo + 0.3 * (a->y_hi - a->y_lo), 1, &d->theme.foreground,
                    "the observed statistic's line");
  /* the distribution's peak: the bar's outline or the curve, at its mass or density */
  for (guint i = 0; i < n->n; i++)
    if (n->mass[i] > peak)
      peak = n->mass[i], at = i;
  if (!n->discrete)
    assert_colour_at (d, 0, n->x[at], peak, 2, &d->theme.series[TF_SERIES_NULL],
                      "the null distribution's peak");
  else
    {
      /* the tallest bar: ink 3 pixels under its top, none 4 pixels over it */
      int px = (int) round (tf_plot_area_map_x (a, n->x[at]));
      int py = (int) round (tf_plot_area_map_y (a, peak));
      const TfColour *bg = &d->theme.background;
      double rgb[3];

      test_pixel_at (d->surface, px, py + 3, rgb);
      g_assert_cmpfloat (test_colour_distance (rgb, bg, bg), >, 0.05);
      test_pixel_at (d->surface, px, py - 4, rgb);
      g_assert_cmpfloat (test_colour_distance (rgb, bg, bg), <, 0.02);
    }
}

static void
check_design (TfAnalysis *analysis, const char *name)
{
  g_autoptr (TfResults) results = tf_analysis_compute (analysis, NULL);
  guint checked = 0;

  g_assert_nonnull (results);
  for (guint k = 0; k < TF_FIGURE_MODEL_PROBABILITIES; k++)
    {
      g_autofree char *why_not = NULL;
      g_autoptr (TfFigure) figure = tf_figure_new (analysis, (TfFigureKind) k, &why_not);

      if (figure == NULL)
        {
          g_test_message ("%s %s: %s", name, tf_figure_kind_to_string (k), why_not);
          g_assert_cmpuint (strlen (why_not), >, 0);
          continue;
        }
      for (guint s = 0; s < G_N_ELEMENTS (canvases); s++)
        {
          g_autofree char *where = g_strdup_printf ("%s %s %u", name, tf_figure_kind_to_string (k), s);
          Drawn d = { 0 };

          d.where = where;
          draw (figure, s, &d);
          {
            g_autofree char *file = g_strdelimit (g_strdup_printf ("marks-%s", where), " ", '-');
            test_keep_png (d.surface, file);
          }
          switch (k)
            {
            case TF_FIGURE_DENSITIES:
              check_densities (analysis, results, &d);
              break;
            case TF_FIGURE_SENSITIVITY:
            case TF_FIGURE_SAMPLE_SIZE:
              check_evidence (analysis, results, &d, k == TF_FIGURE_SAMPLE_SIZE);
              break;
            case TF_FIGURE_NULL_DISTRIBUTION:
              check_null_distribution (analysis, results, &d);
              break;
            default:
              break;
            }
          drawn_clear (&d);
          checked++;
        }
    }
  g_test_message ("%s: %u figures checked", name, checked);
  g_assert_cmpuint (checked, >=, 2);
}

static void
test_marks (gconstpointer data)
{
  TfDesign design = GPOINTER_TO_INT (data);
  g_autoptr (TfAnalysis) analysis = test_design_analysis (design);

  check_design (analysis, tf_design_to_string (design));
}

/* An interval null: the band from its low to its high end. */
static void
test_marks_interval (void)
{
  g_autoptr (TfAnalysis) analysis = test_design_analysis (TF_DESIGN_ONE_PROPORTION);

  analysis->null_kind = TF_NULL_INTERVAL;
  analysis->null_low = 0.25;
  analysis->null_high = 0.4;
  check_design (analysis, "one-proportion-interval");
}

/* The readout of the panel under the pointer: BF01 above, P(H0 | data) below, each on
 * its own axis; the dot it puts on the curve lands on the curve's pixels. */
static void
test_readout_panels (gconstpointer data)
{
  TfFigureKind kind = GPOINTER_TO_INT (data);
  g_autoptr (TfAnalysis) analysis = test_design_analysis (TF_DESIGN_ONE_MEAN);
  g_autoptr (TfFigure) figure = tf_figure_new (analysis, kind, NULL);
  const TfPlotArea *top, *low;
  TfFigureReading r;
  Drawn d = { 0 };
  double px, gap_y;

  d.where = tf_figure_kind_to_string (kind);
  g_assert_nonnull (figure);
  draw (figure, 0, &d);
  top = &d.panels.area[0];
  low = &d.panels.area[1];
  g_assert_cmpuint (d.panels.n, ==, 2);
  g_assert_cmpuint (top->panel, ==, 0);
  g_assert_cmpuint (low->panel, ==, 1);
  g_assert_cmpfloat (low->y, >, top->y + top->height);
  px = top->x + top->width * 0.37;

  /* upper panel: the Bayes factor, its dot where the curve is drawn */
  g_assert_true (tf_figure_read_at_point (figure, &d.panels, px, top->y + top->height / 2, &r));
  g_assert_cmpuint (r.panel, ==, 0);
  g_assert_cmpuint (r.n, ==, 1);
  g_assert_cmpstr (r.names[0], ==, "BF<sub>01</sub>");
  g_assert_true (isfinite (r.y[0]));
  g_assert_cmpfloat (fabs (r.y[0] - tf_plot_area_map_y (top, log10 (r.values[0]))), <, 1e-9);
  g_assert_cmpfloat (test_nearest_colour (d.surface, (int) round (px), (int) round (r.y[0]), 2,
                                          &d.theme.series[TF_SERIES_EVIDENCE],
                                          &d.theme.background), <, FOUND);
  /* lower panel: P(H0 | data) at the same x, on the probability axis */
  {
    TfFigureReading upper = r;
    g_assert_true (tf_figure_read_at_point (figure, &d.panels, px, low->y + low->height / 2, &r));
    g_assert_cmpuint (r.panel, ==, 1);
    g_assert_cmpuint (r.n, ==, 1);
    g_assert_cmpstr (r.names[0], ==, "P(H₀ | data)");
    g_assert_cmpfloat (r.x, ==, upper.x);
    g_assert_cmpfloat (r.values[0], >=, 0);
    g_assert_cmpfloat (r.values[0], <=, 1);
    g_assert_cmpfloat (fabs (r.y[0] - tf_plot_area_map_y (low, r.values[0])), <, 1e-9);
    g_assert_cmpfloat (test_nearest_colour (d.surface, (int) round (px), (int) round (r.y[0]), 2,
                                            &d.theme.series[TF_SERIES_EVIDENCE],
                                            &d.theme.background), <, FOUND);
  }
  /* the gap between the panels: the nearer one; over the x axis below: the lower one */
  gap_y = top->y + top->height + 1;
  g_assert_true (tf_figure_read_at_point (figure, &d.panels, px, gap_y, &r));
  g_assert_cmpuint (r.panel, ==, 0);
  g_assert_true (tf_figure_read_at_point (figure, &d.panels, px, low->y + low->height + 20, &r));
  g_assert_cmpuint (r.panel, ==, 1);
  /* above the top panel, left of the areas: nothing */
  g_assert_false (tf_figure_read_at_point (figure, &d.panels, px, top->y - 2, &r));
  g_assert_false (tf_figure_read_at_point (figure, &d.panels, top->x - 3, low->y + 5, &r));
  /* tf_figure_read_at() on the upper area alone reads the upper panel, as before */
  g_assert_true (tf_figure_read_at (figure, top, px, &r));
  g_assert_cmpuint (r.panel, ==, 0);
  drawn_clear (&d);
}

void
test_add_mark_cases (void)
{
  for (guint d = 0; d < TF_N_DESIGNS; d++)
    {
      g_autofree char *path = g_strdup_printf ("/figures/marks/%s", tf_design_to_string (d));
      g_test_add_data_func (path, GINT_TO_POINTER (d), test_marks);
    }
  g_test_add_func ("/figures/marks/interval-null", test_marks_interval);
  g_test_add_data_func ("/figures/readout/panels-sensitivity",
                        GINT_TO_POINTER (TF_FIGURE_SENSITIVITY), test_readout_panels);
  g_test_add_data_func ("/figures/readout/panels-sample-size",
                        GINT_TO_POINTER (TF_FIGURE_SAMPLE_SIZE), test_readout_panels);
}
