/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-figures.c: every figure kind drawn from known curves built here, its pixels
 * checked where the numbers say the curves are; the ticks and numbers of the axes.
 */
#include <gsl/gsl_errno.h>
#include <math.h>
#include "tf-figure.h"
#include "tf-figure-private.h"
#include "test-figures.h"

#define W 1000
#define H 660
#define SCALE (W / (120.0 * 72.0 / 25.4))   /* a 120 mm wide figure, ~212 dpi */

/* Beta(a, b) density (common practice: the closed form with lgamma). */
static double
beta_pdf (double x, double a, double b)
{
  if (x <= 0 || x >= 1)
    return 0;
  return exp ((a - 1) * log (x) + (b - 1) * log1p (-x) + lgamma (a + b) - lgamma (a) - lgamma (b));
}

static TfDensityCurves *
known_densities (void)
{
  TfDensityCurves *c = g_new0 (TfDensityCurves, 1);

  c->n = 401;
  c->lo = 0;
  c->hi = 1;
  c->x = g_new (double, c->n);
  c->prior = g_new (double, c->n);
  c->posterior = g_new (double, c->n);
  c->likelihood = g_new (double, c->n);
  for (guint i = 0; i < c->n; i++)
    {
      double x = (double) i / (c->n - 1);
      c->x[i] = x;
      c->prior[i] = beta_pdf (x, 2, 2);
      c->posterior[i] = beta_pdf (x, 32, 72);
      c->likelihood[i] = beta_pdf (x, 31, 71);
    }
  c->null_value = c->null_low = c->null_high = 0.5;
  c->prior_at_null = 1.5;                       /* 6 x (1 - x) at 1/2 */
  c->posterior_at_null = beta_pdf (0.5, 32, 72);
  c->posterior_mode = 31.0 / 102.0;             /* (a - 1) / (a + b - 2) */
  c->parameter_markup = g_strdup ("θ");
  return c;
}

typedef struct {
  cairo_surface_t *surface;
  cairo_t *cr;
  TfFigureTheme theme;
  TfFigureOptions options;
  TfPlotArea area;
} Canvas;

static void
canvas_init (Canvas *c, TfFigureStyle style)
{
  c->surface = cairo_image_surface_create (CAIRO_FORMAT_RGB24, W, H);
  /* freed when the test ends, after its pixel checks */
  g_test_queue_destroy ((GDestroyNotify) cairo_surface_destroy, c->surface);
  c->cr = cairo_create (c->surface);
  c->options = (TfFigureOptions) TF_FIGURE_OPTIONS_INIT;
  c->options.style = style;
  tf_figure_theme_init (&c->theme, style, SCALE);
}

static void
canvas_finish (Canvas *c, const char *name)
{
  cairo_destroy (c->cr);
  cairo_surface_flush (c->surface);
  test_keep_png (c->surface, name);
  g_assert_true (test_edges_blank (c->surface, 3, &c->theme.background));
  g_assert_cmpfloat (c->area.x, >, 0);
  g_assert_cmpfloat (c->area.y, >, 0);
  g_assert_cmpfloat (c->area.x + c->area.width, <, W);
  g_assert_cmpfloat (c->area.y + c->area.height, <, H);
}

static void
test_densities_known (gconstpointer data)
{
  TfFigureStyle style = GPOINTER_TO_INT (data);
  g_autoptr (TfDensityCurves) curves = known_densities ();
  Canvas c;
  guint peak = 0;
  int px, py;
  static const char *const names[] = { "known-densities-light", "known-densities-dark",
                                       "known-densities-print" };

  canvas_init (&c, style);
  g_assert_true (tf_figure_draw_density_curves (c.cr, W, H, SCALE, curves, 0.23, &c.options, &c.area));
  cairo_surface_flush (c.surface);
  for (guint i = 0; i < curves->n; i++)
    if (curves->posterior[i] > curves->posterior[peak])
      peak = i;
  /* the axis reaches the peak: Beta(32, 72) at its mode 31/102, about 9.1 */
  g_assert_cmpfloat (c.area.y_hi, >=, curves->posterior[peak]);
  px = (int) round (tf_plot_area_map_x (&c.area, curves->x[peak]));
  py = (int) round (tf_plot_area_map_y (&c.area, curves->posterior[peak]));
  g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 3, &c.theme.series[TF_SERIES_POSTERIOR],
                                          &c.theme.background), <, 0.12);
  /* the null's spike at 0.5, half way up where no other curve is */
  px = (int) round (tf_plot_area_map_x (&c.area, 0.5));
  py = (int) round (c.area.y + c.area.height * 0.5);
  g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 2, &c.theme.series[TF_SERIES_NULL],
                                          &c.theme.background), <, 0.12);
  /* the prior's open Savage–Dickey marker: its ring at 1.5 at the null */
  py = (int) round (tf_plot_area_map_y (&c.area, 1.5));
  g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 6, &c.theme.series[TF_SERIES_PRIOR],
                                          &c.theme.background), <, 0.15);
  /* nothing at the middle of an empty stretch: x = 0.9, y = 0.6 of the axis */
  px = (int) round (tf_plot_area_map_x (&c.area, 0.9));
  py = (int) round (tf_plot_area_map_y (&c.area, c.area.y_hi * 0.6));
  g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 0, &c.theme.background,
                                          &c.theme.background), <, 0.02);
  canvas_finish (&c, names[style]);
}

/* A posterior too narrow to draw: a spike at the core's mode, not the grid's argmax. */
static void
test_densities_narrow (void)
{
  g_autoptr (TfDensityCurves) curves = known_densities ();
  Canvas c;
  int px, py;

  curves->posterior_narrow = TRUE;
  curves->posterior_mode = 0.3125;              /* a value off the grid's argmax, 0.3025 */
  canvas_init (&c, TF_FIGURE_STYLE_LIGHT);
  g_assert_true (tf_figure_draw_density_curves (c.cr, W, H, SCALE, curves, NAN, &c.options, &c.area));
  cairo_surface_flush (c.surface);
  px = (int) round (tf_plot_area_map_x (&c.area, 0.3125));
  py = (int) round (c.area.y + c.area.height * 0.5);
  g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 1, &c.theme.series[TF_SERIES_POSTERIOR],
                                          &c.theme.background), <, 0.12);
  canvas_finish (&c, "known-densities-narrow");
}

/* BF01 = x (so log10 BF01 = log10 x) on 0.1 .. 10, and P(H0 | data) = BF / (1 + BF) for
 * prior odds 1 (Bayes' rule, common practice). */
static TfEvidenceCurve *
known_evidence (gboolean sample_size)
{
  TfEvidenceCurve *c = g_new0 (TfEvidenceCurve, 1);

  c->n = 256;
  c->x = g_new (double, c->n);
  c->log_bf01 = g_new (double, c->n);
  c->posterior_null = g_new (double, c->n);
  for (guint i = 0; i < c->n; i++)
    {
      double t = -1 + 2.0 * i / (c->n - 1);
      double x = pow (10, t);
      c->x[i] = sample_size ? x * 1000 : x;
      c->log_bf01[i] = log (x);
      c->posterior_null[i] = x / (1 + x);
    }
  c->x_log = TRUE;
  c->x_markup = g_strdup (sample_size ? "sample size <i>n</i>" : "prior scale <i>r</i>");
  c->chosen_x = sample_size ? 1000 : 1;
  c->chosen_log_bf01 = 0;
  c->chosen_posterior_null = 0.5;
  c->p_value = sample_size ? 0.01 : NAN;
  return c;
}

static void
test_evidence_known (gconstpointer data)
{
  int which = GPOINTER_TO_INT (data);
  gboolean sample_size = which >= 2;
  TfFigureStyle style = which % 2 ? TF_FIGURE_STYLE_PRINT : TF_FIGURE_STYLE_LIGHT;
  g_autoptr (TfEvidenceCurve) curve = known_evidence (sample_size);
  g_autofree char *name = g_strdup_printf ("known-%s-%s", sample_size ? "sample-size" : "sensitivity",
                                           which % 2 ? "print" : "light");
  Canvas c;
  double x_end;
  int px, py;

  canvas_init (&c, style);
  c.options.evidence_scale = which == 1 ? TF_EVIDENCE_SCALE_JEFFREYS : TF_EVIDENCE_SCALE_KASS_RAFTERY;
  g_assert_true ((sample_size ? tf_figure_draw_sample_size : tf_figure_draw_sensitivity)
                 (c.cr, W, H, SCALE, curve, &c.options, &c.area));
  cairo_surface_flush (c.surface);
  g_assert_true (c.area.x_log);
  g_assert_true (c.area.y_log);
  /* the axes span the data: x 10^-1 .. 10^1 (times 1000), BF01 10^-1 .. 10^1 */
  g_assert_cmpfloat (c.area.y_lo, <=, -1);
  g_assert_cmpfloat (c.area.y_hi, >=, 1);
  x_end = sample_size ? 4 : 1;
  g_assert_cmpfloat_with_epsilon (c.area.x_hi, x_end, 1e-9);
  /* the BF curve at its right end: BF01 = 10 */
  px = (int) round (tf_plot_area_map_x (&c.area, x_end)) - 2;
  py = (int) round (tf_plot_area_map_y (&c.area, 1.0));
  g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 3, &c.theme.series[TF_SERIES_EVIDENCE],
                                          &c.theme.background), <, 0.12);
  /* the chosen setting's filled marker at BF01 = 1 */
  px = (int) round (tf_plot_area_map_x (&c.area, x_end - 1));
  py = (int) round (tf_plot_area_map_y (&c.area, 0));
  g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 1, &c.theme.series[TF_SERIES_EVIDENCE],
                                          &c.theme.background), <, 0.12);
  canvas_finish (&c, name);
}

/* Binomial(20, 1/2) masses (common practice: the closed form); observed 15, the tail
 * k <= 5 or k >= 15, p = 2 P(K >= 15) = 0.041389 (scipy 1.10.1:
 * 2 * scipy.stats.binom.sf(14, 20, 0.5)). */
static TfNullDistribution *
known_binomial (void)
{
  TfNullDistribution *d = g_new0 (TfNullDistribution, 1);

  tf_null_distribution_allocate (d, 21);
  d->discrete = TRUE;
  for (guint k = 0; k <= 20; k++)
    {
      d->x[k] = k;
      d->mass[k] = exp (lgamma (21) - lgamma (k + 1) - lgamma (21 - k) - 20 * G_LN2);
      d->in_tail[k] = k <= 5 || k >= 15;
    }
  d->observed = 15;
  d->p_value = 0.041389;
  d->x_markup = g_strdup ("successes <i>k</i>");
  return d;
}

/* The standard normal density on −4 .. 4; observed z = 2.1, two-sided p = 0.035729
 * (scipy 1.10.1: 2 * scipy.stats.norm.sf(2.1)). */
static TfNullDistribution *
known_normal (void)
{
  TfNullDistribution *d = g_new0 (TfNullDistribution, 1);

  tf_null_distribution_allocate (d, 401);
  for (guint i = 0; i < d->n; i++)
    {
      double z = -4 + 8.0 * i / (d->n - 1);
      d->x[i] = z;
      d->mass[i] = exp (-z * z / 2) / sqrt (2 * G_PI);
      d->in_tail[i] = fabs (z) >= 2.1;
    }
  d->observed = 2.1;
  d->p_value = 0.035729;
  d->x_markup = g_strdup ("<i>z</i>");
  return d;
}

static void
test_null_known (gconstpointer data)
{
  gboolean discrete = GPOINTER_TO_INT (data);
  g_autoptr (TfNullDistribution) d = discrete ? known_binomial () : known_normal ();
  Canvas c;
  int px, py;
  double rgb[3];

  canvas_init (&c, TF_FIGURE_STYLE_LIGHT);
  g_assert_true (tf_figure_draw_null_distribution (c.cr, W, H, SCALE, d, &c.options, &c.area));
  cairo_surface_flush (c.surface);
  if (discrete)
    {
      /* the bar at k = 10 (mass 0.176197), half way up: the null's light fill */
      TfColour fill = c.theme.series[TF_SERIES_NULL];
      fill.a *= 0.18;
      px = (int) round (tf_plot_area_map_x (&c.area, 10));
      py = (int) round (tf_plot_area_map_y (&c.area, d->mass[10] / 2));
      g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 0, &fill, &c.theme.background), <, 0.05);
      /* the top of that bar: its outline, at the mass */
      py = (int) round (tf_plot_area_map_y (&c.area, d->mass[10]));
      g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 2, &c.theme.series[TF_SERIES_NULL],
                                              &c.theme.background), <, 0.3);
      /* a tail bar, k = 15 (mass 0.014786): tinted with the tail's colour */
      px = (int) round (tf_plot_area_map_x (&c.area, 15.2));
      py = (int) round (tf_plot_area_map_y (&c.area, d->mass[15] / 2));
      test_pixel_at (c.surface, px, py, rgb);
      g_assert_cmpfloat (rgb[0] - rgb[2], >, 0.1);
    }
  else
    {
      /* the curve's peak at z = 0, 1/sqrt(2π) = 0.398942 */
      px = (int) round (tf_plot_area_map_x (&c.area, 0));
      py = (int) round (tf_plot_area_map_y (&c.area, 1 / sqrt (2 * G_PI)));
      g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 2, &c.theme.series[TF_SERIES_NULL],
                                              &c.theme.background), <, 0.15);
      /* under the curve in the upper tail, z = 2.6: tail colour */
      px = (int) round (tf_plot_area_map_x (&c.area, 2.6));
      py = (int) round (tf_plot_area_map_y (&c.area, 0.004));
      test_pixel_at (c.surface, px, py, rgb);
      g_assert_cmpfloat (rgb[0] - rgb[2], >, 0.1);
    }
  /* the observed value's line, a third of the way up */
  px = (int) round (tf_plot_area_map_x (&c.area, d->observed));
  py = (int) round (c.area.y + c.area.height * 0.3);
  g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 1, &c.theme.foreground,
                                          &c.theme.background), <, 0.15);
  canvas_finish (&c, discrete ? "known-null-binomial" : "known-null-normal");
}

static void
test_models_known (void)
{
  TfModelProbabilities m = { 0 };
  Canvas c;
  int px, py;

  tf_model_probabilities_allocate (&m, 2);
  m.names_markup[0] = g_strdup ("H<sub>0</sub>: <i>θ</i> = 0.5");
  m.names_markup[1] = g_strdup ("H<sub>1</sub>: <i>θ</i> ≠ 0.5");
  m.prior[0] = m.prior[1] = 0.5;
  m.posterior[0] = 0.2;
  m.posterior[1] = 0.8;
  canvas_init (&c, TF_FIGURE_STYLE_LIGHT);
  g_assert_true (tf_figure_draw_model_probabilities (c.cr, W, H, SCALE, &m, &c.options, &c.area));
  cairo_surface_flush (c.surface);
  /* H1's posterior bar (the lower of its row) is filled at 0.7 and empty at 0.9 */
  px = (int) round (tf_plot_area_map_x (&c.area, 0.7));
  py = (int) round (tf_plot_area_map_y (&c.area, 0.5)) + 4;
  g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 0, &c.theme.series[TF_SERIES_POSTERIOR],
                                          &c.theme.background), <, 0.05);
  px = (int) round (tf_plot_area_map_x (&c.area, 0.93));
  g_assert_cmpfloat (test_nearest_colour (c.surface, px, py, 0, &c.theme.series[TF_SERIES_POSTERIOR],
                                          &c.theme.background), >, 0.3);
  canvas_finish (&c, "known-models");
  g_strfreev (m.names_markup);
  g_free (m.prior);
  g_free (m.posterior);
}

/* Decade ticks: Heckbert's nice numbers on the exponent (the rule as stated, common
 * practice); labels plain from 0.001 to 1000, powers of ten beyond. */
static void
test_log_ticks (void)
{
  TfTicks t;
  g_autofree char *a = NULL, *b = NULL;

  tf_ticks_compute_log (&t, -1.2, 1.7, 6, TRUE);
  g_assert_true (t.log);
  g_assert_cmpfloat_with_epsilon (t.step, 1, 1e-12);
  g_assert_cmpfloat_with_epsilon (t.lo, -2, 1e-12);
  g_assert_cmpfloat_with_epsilon (t.hi, 2, 1e-12);
  g_assert_cmpuint (t.n, ==, 5);
  g_assert_true (t.minor);
  a = tf_ticks_label (&t, 0);
  g_assert_cmpstr (a, ==, "0.01");
  tf_ticks_compute_log (&t, -300, 5, 6, TRUE);
  g_assert_cmpfloat_with_epsilon (t.step, 50, 1e-12);   /* nice(305 / 5) = 50 */
  g_assert_false (t.minor);
  b = tf_ticks_label (&t, 0);
  g_assert_cmpstr (b, ==, "10<sup>\u2212300</sup>");
}

static void
test_numbers (void)
{
  g_autofree char *a = tf_fig_number (0.80942, 4);
  g_autofree char *b = tf_fig_number (3.2e-12, 3);
  g_autofree char *c = tf_fig_number (-12000, 6);
  g_autofree char *d = tf_fig_number (NAN, 3);
  g_autofree char *e = tf_fig_number (12000, 4);
  g_autofree char *f = tf_fig_number (9999.6, 4);
  g_autofree char *g = tf_fig_number (123456, 3);

  g_assert_cmpstr (a, ==, "0.8094");
  g_assert_cmpstr (b, ==, "3.2 × 10<sup>\u221212</sup>");
  g_assert_cmpstr (c, ==, "\u221212000");
  g_assert_cmpstr (d, ==, "—");
  /* whole numbers with more digits than asked: rounded, no "e+04" */
  g_assert_cmpstr (e, ==, "12000");
  g_assert_cmpstr (f, ==, "10000");
  g_assert_cmpstr (g, ==, "123000");
}

int
main (int argc, char **argv)
{
  gsl_set_error_handler_off ();
  g_test_init (&argc, &argv, NULL);
  g_test_add_data_func ("/figures/known/densities-light", GINT_TO_POINTER (TF_FIGURE_STYLE_LIGHT), test_densities_known);
  g_test_add_data_func ("/figures/known/densities-dark", GINT_TO_POINTER (TF_FIGURE_STYLE_DARK), test_densities_known);
  g_test_add_data_func ("/figures/known/densities-print", GINT_TO_POINTER (TF_FIGURE_STYLE_PRINT), test_densities_known);
  g_test_add_func ("/figures/known/densities-narrow", test_densities_narrow);
  g_test_add_data_func ("/figures/known/sensitivity", GINT_TO_POINTER (0), test_evidence_known);
  g_test_add_data_func ("/figures/known/sensitivity-print-jeffreys", GINT_TO_POINTER (1), test_evidence_known);
  g_test_add_data_func ("/figures/known/sample-size", GINT_TO_POINTER (2), test_evidence_known);
  g_test_add_data_func ("/figures/known/sample-size-print", GINT_TO_POINTER (3), test_evidence_known);
  g_test_add_data_func ("/figures/known/null-binomial", GINT_TO_POINTER (TRUE), test_null_known);
  g_test_add_data_func ("/figures/known/null-normal", GINT_TO_POINTER (FALSE), test_null_known);
  g_test_add_func ("/figures/known/models", test_models_known);
  g_test_add_func ("/figures/axis/log-ticks", test_log_ticks);
  g_test_add_func ("/figures/numbers", test_numbers);
  test_add_real_cases ();
  test_add_mark_cases ();
  return g_test_run ();
}
