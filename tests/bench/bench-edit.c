/* SPDX-License-Identifier: GPL-3.0-or-later
 * What one edit in the form costs: validate + compute every number, the density curves,
 * and a full redraw of the densities figure at 1600 × 1000 px. Prints medians over many
 * repetitions; one frame at 60 Hz is 16.7 ms. A benchmark, not a test: run it with
 * `meson test -C _build --benchmark` (or directly) and read the figures.
 */
#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-figure.h"
#include "tf-results.h"

#include <gsl/gsl_errno.h>
#include <stdio.h>
#include <stdlib.h>

static int
compare_doubles (const void *a, const void *b)
{
  double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

typedef void (*Work) (const TfAnalysis *analysis, gpointer data);

static double
median_us (Work work, const TfAnalysis *analysis, gpointer data, guint repeats)
{
  g_autofree double *t = g_new (double, repeats);

  work (analysis, data);  /* warm up */
  for (guint i = 0; i < repeats; i++)
    {
      gint64 start = g_get_monotonic_time ();
      work (analysis, data);
      t[i] = (double) (g_get_monotonic_time () - start);
    }
  qsort (t, repeats, sizeof *t, compare_doubles);
  return t[repeats / 2];
}

/* Timing with a microsecond clock: batches of 100 calls for the fast ones. */
static void
compute_100 (const TfAnalysis *analysis, gpointer data)
{
  for (int i = 0; i < 100; i++)
    {
      g_autoptr (TfResults) r = tf_analysis_compute (analysis, NULL);
      g_assert_nonnull (r);
    }
}

static void
curves_once (const TfAnalysis *analysis, gpointer data)
{
  g_autoptr (TfDensityCurves) c = tf_density_curves_new (analysis, 400, NULL);
  g_assert_nonnull (c);
}

static void
redraw_once (const TfAnalysis *analysis, gpointer data)
{
  cairo_surface_t *surface = data;
  cairo_t *cr = cairo_create (surface);

  cairo_set_source_rgb (cr, 1, 1, 1);
  cairo_paint (cr);
  /* scale 2: a HiDPI screen, two pixels a point */
  tf_figure_draw_densities (cr, 1600, 1000, 2.0, analysis,
                            TF_FIGURE_STYLE_LIGHT);
  cairo_destroy (cr);
  cairo_surface_flush (surface);
}

int
main (int argc, char **argv)
{
  const struct { const char *name; double k, n; } cases[] = {
    { "n = 12 000 (demo)", 9700, 12000 },
    { "n = 10^3", 520, 1000 },
    { "n = 10^12", 800000400000, 1e12 },
  };
  cairo_surface_t *surface = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 1600, 1000);

  gsl_set_error_handler_off ();
  printf ("%-20s %14s %14s %20s %14s\n", "case", "compute (µs)", "curves (µs)",
          "redraw 1600x1000 (µs)", "edit (ms)");
  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);
      double compute, curves, redraw;

      a->successes = cases[i].k;
      a->trials = cases[i].n;
      a->null_value = 0.8;
      compute = median_us (compute_100, a, NULL, 51) / 100.0;
      curves = median_us (curves_once, a, NULL, 51);
      redraw = median_us (redraw_once, a, surface, 21);
      printf ("%-20s %14.2f %14.1f %20.0f %14.2f\n", cases[i].name, compute, curves, redraw,
              (compute + curves + redraw) / 1000.0);
    }
  cairo_surface_destroy (surface);
  return 0;
}
