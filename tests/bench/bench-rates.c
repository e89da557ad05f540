/* SPDX-License-Identifier: GPL-3.0-or-later
 * What one full rates analysis costs: validate + compute every number, for one rate
 * and for two rates, at small and at huge counts. Prints medians over many
 * repetitions. A benchmark, not a test: `meson test -C _build --benchmark`.
 */
#include "tf-design.h"
#include "tf-analysis.h"
#include "tf-results.h"
#include "tf-one-rate.h"
#include "tf-two-rates.h"

#include <gsl/gsl_errno.h>
#include <stdio.h>
#include <stdlib.h>
#include <math.h>

static int
compare_doubles (const void *a, const void *b)
{
  double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

/* Median over repeats of batches of 100 analyses, in microseconds per analysis. */
static double
median_us (const TfAnalysis *analysis, guint repeats)
{
  g_autofree double *t = g_new (double, repeats);

  for (guint i = 0; i < repeats; i++)
    {
      gint64 start = g_get_monotonic_time ();
      for (int j = 0; j < 100; j++)
        {
          g_autoptr (TfResults) r = tf_analysis_compute (analysis, NULL);
          g_assert_nonnull (r);
        }
      t[i] = (double) (g_get_monotonic_time () - start) / 100.0;
    }
  qsort (t, repeats, sizeof *t, compare_doubles);
  return t[repeats / 2];
}

/* Median over 21 batches of 10^5 calls of each closed-form ln BF01, in ns per call. */
static void
bench_log_bf01 (const char *what, double ka, double ea, double kb, double eb)
{
  double t1[21], t2[21], sink = 0.0;

  for (int i = 0; i < 21; i++)
    {
      gint64 start = g_get_monotonic_time ();
      for (int j = 0; j < 100000; j++)
        sink += tf_one_rate_log_bf01 (ka + j % 7, ea, ka / ea, 2.0, 0.5);
      gint64 mid = g_get_monotonic_time ();
      for (int j = 0; j < 100000; j++)
        sink += tf_two_rates_log_bf01 (ka + j % 7, ea, kb, eb, 1.0, 2.0, 0.5);
      t1[i] = (double) (mid - start) / 100.0;         /* µs per 10^5 calls to ns per call */
      t2[i] = (double) (g_get_monotonic_time () - mid) / 100.0;
    }
  qsort (t1, 21, sizeof *t1, compare_doubles);
  qsort (t2, 21, sizeof *t2, compare_doubles);
  printf ("ln BF01, %-22s one rate %6.0f ns, two rates %6.0f ns per call (median)%s\n",
          what, t1[10], t2[10], isfinite (sink) ? "" : " (not finite)");
}

int
main (void)
{
  gsl_set_error_handler_off ();
  g_autoptr (TfAnalysis) one = tf_analysis_new (TF_DESIGN_ONE_RATE);
  one->events = 15;
  one->exposure = 4;
  one->null_value = 2;
  g_autoptr (TfAnalysis) two = tf_analysis_new (TF_DESIGN_TWO_RATES);
  two->events_a = 11;
  two->exposure_a = 800;
  two->events_b = 23;
  two->exposure_b = 3011;
  two->null_value = 1;

  printf ("one rate, k = 15:            %8.1f µs per full analysis (median)\n", median_us (one, 51));
  printf ("two rates, 11 and 23 events: %8.1f µs per full analysis (median)\n", median_us (two, 51));
  one->events = 1000001000000;
  one->exposure = 1e12;
  one->null_value = 1;
  two->events_a = 300000000000;
  two->exposure_a = 3e11;
  two->events_b = 700001000000;
  two->exposure_b = 7e11;
  printf ("one rate, k = 1e12:          %8.1f µs per full analysis (median)\n", median_us (one, 21));
  printf ("two rates, 1e12 events:      %8.1f µs per full analysis (median)\n", median_us (two, 21));
  bench_log_bf01 ("counts ~ 20:", 15, 4, 23, 3011);
  bench_log_bf01 ("counts ~ 1e12:", 1e12, 1e12, 7e11, 7e11);
  return 0;
}
