/* SPDX-License-Identifier: GPL-3.0-or-later
 * How long the figures take to draw at 1600 × 1000 px (scale 2, a HiDPI screen): the
 * densities figure redrawn from its curves (target: under 4 ms median), and each other
 * kind with its curve computed (the sensitivity figure's 256 points: under 8 ms). A kind
 * whose curve the design does not provide yet is timed on a known curve built here and
 * says so. Prints medians; a benchmark, not a test: `meson test -C _build --benchmark`.
 */
#include "tf-design.h"
#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-figure.h"

#include <gsl/gsl_errno.h>
#include <math.h>
#include <stdio.h>
#include <stdlib.h>
#include <time.h>

#define W 1600
#define H 1000
#define SCALE 2.0
#define REPEATS 41

static int
compare_doubles (const void *a, const void *b)
{
  double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

typedef void (*Work) (cairo_surface_t *surface, gpointer data);

/* CPU time of this thread, ms: steady when other programs load the machine. */
static double
cpu_ms (void)
{
  struct timespec ts;

  clock_gettime (CLOCK_THREAD_CPUTIME_ID, &ts);
  return ts.tv_sec * 1e3 + ts.tv_nsec / 1e6;
}

static double
median_ms (Work work, cairo_surface_t *surface, gpointer data)
{
  double t[REPEATS];

  work (surface, data);  /* warm up: fonts, caches */
  for (guint i = 0; i < REPEATS; i++)
    {
      double start = cpu_ms ();
      work (surface, data);
      t[i] = cpu_ms () - start;
    }
  qsort (t, REPEATS, sizeof *t, compare_doubles);
  return t[REPEATS / 2];
}

typedef struct {
  const TfAnalysis *analysis;
  TfFigureKind kind;
  const TfFigure *figure;       /* redraw only */
  const TfEvidenceCurve *curve; /* a known curve when the design has none */
} Job;

static void
draw_job (cairo_surface_t *surface, gpointer data)
{
  Job *job = data;
  cairo_t *cr = cairo_create (surface);

  if (job->figure)
    tf_figure_draw (job->figure, cr, W, H, SCALE, NULL, NULL);
  else if (job->curve)
    tf_figure_draw_sensitivity (cr, W, H, SCALE, job->curve, NULL, NULL);
  else
    tf_figure_draw_kind (cr, job->kind, W, H, SCALE, job->analysis, NULL, NULL, NULL);
  cairo_destroy (cr);
  cairo_surface_flush (surface);
}

/* BF01 = r^1.3 on 0.05 .. 20, for timing only. */
static TfEvidenceCurve *
known_curve (void)
{
  TfEvidenceCurve *c = g_new0 (TfEvidenceCurve, 1);

  c->n = 256;
  c->x = g_new (double, c->n);
  c->log_bf01 = g_new (double, c->n);
  c->posterior_null = g_new (double, c->n);
  for (guint i = 0; i < c->n; i++)
    {
      double r = 0.05 * pow (400, (double) i / (c->n - 1));
      c->x[i] = r;
      c->log_bf01[i] = 1.3 * log (r);
      c->posterior_null[i] = 1 / (1 + exp (-c->log_bf01[i]));
    }
  c->x_log = TRUE;
  c->x_markup = g_strdup ("prior scale <i>r</i>");
  c->chosen_x = 0.7071;
  c->chosen_log_bf01 = 1.3 * log (0.7071);
  c->chosen_posterior_null = 1 / (1 + exp (-c->chosen_log_bf01));
  return c;
}

int
main (int argc, char **argv)
{
  cairo_surface_t *surface = cairo_image_surface_create (CAIRO_FORMAT_ARGB32, W, H);
  g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);
  g_autoptr (TfEvidenceCurve) known = known_curve ();

  gsl_set_error_handler_off ();
  a->successes = 9700;
  a->trials = 12000;
  a->null_value = 0.8;

  printf ("figure at %d x %d px, median CPU time of %d (ms)\n", W, H, REPEATS);
  {
    g_autoptr (TfFigure) figure = tf_figure_new (a, TF_FIGURE_DENSITIES, NULL);
    Job redraw = { a, TF_FIGURE_DENSITIES, figure, NULL };
    Job full = { a, TF_FIGURE_DENSITIES, NULL, NULL };

    printf ("%-44s %8.2f  (target < 4)\n", "densities, redraw", median_ms (draw_job, surface, &redraw));
    printf ("%-44s %8.2f\n", "densities, curves computed and drawn", median_ms (draw_job, surface, &full));
  }
  for (guint k = TF_FIGURE_SENSITIVITY; k < TF_N_FIGURE_KINDS; k++)
    {
      g_autofree char *why_not = NULL;
      g_autoptr (TfFigure) figure = tf_figure_new (a, k, &why_not);
      g_autofree char *label = g_strdup_printf ("%s, curve computed and drawn", tf_figure_kind_to_string (k));

      if (figure)
        {
          Job job = { a, k, NULL, NULL };
          printf ("%-44s %8.2f%s\n", label, median_ms (draw_job, surface, &job),
                  k == TF_FIGURE_SENSITIVITY ? "  (target < 8)" : "");
        }
      else if (k == TF_FIGURE_SENSITIVITY)
        {
          Job job = { a, k, NULL, known };
          printf ("%-44s %8.2f  (target < 8; drawing only: %s)\n",
                  "sensitivity, known 256-point curve", median_ms (draw_job, surface, &job), why_not);
        }
      else
        printf ("%-44s %8s  (%s)\n", label, "-", why_not);
    }
  cairo_surface_destroy (surface);
  return 0;
}
