/* SPDX-License-Identifier: GPL-3.0-or-later
 * What one edit in the form costs, for every design, at an ordinary size and at the
 * extremes: validate + compute every number, then a full redraw of the densities figure
 * at 1600 × 1000 px (scale 2, a HiDPI screen), which computes its density curves (shown
 * apart as "curves"). An edit is compute + redraw. Prints medians; one frame at 60 Hz is
 * 16.7 ms. A benchmark, not a test: run it with
 * `meson test -C _build --benchmark edit` (or directly) and read the figures.
 */
#include "tf-design.h"
#include "tf-analysis-file.h"
#include "tf-curves.h"
#include "tf-figure.h"
#include "tf-results.h"

#include <gsl/gsl_errno.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>
#include <time.h>

static int
compare_doubles (const void *a, const void *b)
{
  double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

static double
now_us (void)
{
  struct timespec ts;

  clock_gettime (CLOCK_MONOTONIC, &ts);
  return ts.tv_sec * 1e6 + ts.tv_nsec * 1e-3;
}

typedef void (*Work) (const TfAnalysis *analysis, gpointer data);

/* The median of up to 101 runs, fewer when one run is slow (about 0.4 s in all). */
static double
median_us (Work work, const TfAnalysis *analysis, gpointer data)
{
  double start = now_us (), first;
  guint repeats;

  work (analysis, data);  /* warm up, and a first measure */
  first = now_us () - start;
  repeats = (guint) CLAMP (4e5 / MAX (first, 1.0), 5, 101);
  g_autofree double *t = g_new (double, repeats);
  for (guint i = 0; i < repeats; i++)
    {
      start = now_us ();
      work (analysis, data);
      t[i] = now_us () - start;
    }
  qsort (t, repeats, sizeof *t, compare_doubles);
  return t[repeats / 2];
}

static void
compute_once (const TfAnalysis *analysis, gpointer data)
{
  g_autoptr (TfResults) r = tf_analysis_compute (analysis, NULL);
  g_assert_nonnull (r);
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
  tf_figure_draw_densities (cr, 1600, 1000, 2.0, analysis, TF_FIGURE_STYLE_LIGHT);
  cairo_destroy (cr);
  cairo_surface_flush (surface);
}

/* Invented inputs, for timing only. */
static const struct { const char *name, *design, *keys; } cases[] = {
  { "one proportion, demo", "one-proportion", "Successes=9700\nTrials=12000\n[Null]\nValue=0.8\n" },
  { "one proportion, n = 10^12", "one-proportion",
    "Successes=800000400000\nTrials=1e12\n[Null]\nValue=0.8\n" },
  { "two proportions", "two-proportions", "SuccessesA=56\nTrialsA=70\nSuccessesB=48\nTrialsB=80\n" },
  { "two proportions, 10^9 a group", "two-proportions",
    "SuccessesA=500030000\nTrialsA=1e9\nSuccessesB=499990000\nTrialsB=1e9\n" },
  { "one mean", "one-mean", "N=25\nMean=10.4\nSD=2\n[Null]\nValue=10\n" },
  { "one mean, n = 10^8, t = 10^3", "one-mean", "N=1e8\nMean=0.1\nSD=1\n[Null]\nValue=0\n" },
  { "paired means", "paired-means", "N=10\nMeanDiff=1.58\nSDDiff=1.23\n" },
  { "two means, Welch", "two-means", "NA=12\nMeanA=5.1\nSDA=1.2\nNB=14\nMeanB=4.2\nSDB=1.4\n" },
  { "one rate", "one-rate", "Events=15\nExposure=4\n[Null]\nValue=2\n" },
  { "one rate, 10^12 events", "one-rate", "Events=1000001000000\nExposure=1e12\n[Null]\nValue=1\n" },
  { "two rates", "two-rates", "EventsA=11\nExposureA=800\nEventsB=23\nExposureB=3011\n" },
};

int
main (int argc, char **argv)
{
  cairo_surface_t *surface = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, 1600, 1000);
  double worst = 0.0;

  gsl_set_error_handler_off ();
  printf ("%-32s %13s %12s %22s %10s\n", "case", "compute (µs)", "curves (µs)",
          "redraw 1600x1000 (µs)", "edit (ms)");
  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *text = g_strdup_printf ("[Analysis]\nFormat=1\nDesign=%s\n[Data]\n%s",
                                               cases[i].design, cases[i].keys);
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();
      g_autoptr (TfAnalysis) a = tf_analysis_load_from_data (text, strlen (text), problems);
      double compute, curves, redraw, edit;

      if (a == NULL)
        g_error ("%s: the benchmark's analysis does not load", cases[i].name);
      compute = median_us (compute_once, a, NULL);
      curves = median_us (curves_once, a, NULL);
      redraw = median_us (redraw_once, a, surface);
      edit = (compute + redraw) / 1000.0;
      worst = MAX (worst, edit);
      printf ("%-32s %13.1f %12.1f %22.0f %10.2f\n", cases[i].name, compute, curves, redraw, edit);
    }
  printf ("slowest edit: %.2f ms (one frame: 16.7 ms)\n", worst);
  cairo_surface_destroy (surface);
  return 0;
}
