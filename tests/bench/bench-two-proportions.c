/* SPDX-License-Identifier: GPL-3.0-or-later
 * What one full two-proportions analysis costs: validate + compute every number
 * (Fisher's test, intervals, both Bayes factors, the posterior of θA − θB), at small,
 * medium and huge counts, k = n, and tiny prior shapes with a zero cell. Prints medians
 * over repetitions. A benchmark, not a test:
 * `meson test -C _build --benchmark`.
 */
#include "tf-design.h"
#include "tf-analysis.h"
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

/* Median over repeats of batches of `batch` analyses, in microseconds per analysis. */
static double
median_us (const TfAnalysis *analysis, guint repeats, int batch)
{
  g_autofree double *t = g_new (double, repeats);

  for (guint i = 0; i < repeats; i++)
    {
      gint64 start = g_get_monotonic_time ();
      for (int j = 0; j < batch; j++)
        {
          g_autoptr (TfResults) r = tf_analysis_compute (analysis, NULL);
          g_assert_nonnull (r);
        }
      t[i] = (double) (g_get_monotonic_time () - start) / batch;
    }
  qsort (t, repeats, sizeof *t, compare_doubles);
  return t[repeats / 2];
}

static void
run_prior (const char *what, double ka, double na, double kb, double nb, double prior,
           guint repeats, int batch)
{
  g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_TWO_PROPORTIONS);
  a->prior_a = a->prior_b = prior;
  a->successes_a = ka;
  a->trials_a = na;
  a->successes_b = kb;
  a->trials_b = nb;
  printf ("%-34s %10.1f µs per full analysis (median)\n", what, median_us (a, repeats, batch));
}

static void
run (const char *what, double ka, double na, double kb, double nb, guint repeats, int batch)
{
  run_prior (what, ka, na, kb, nb, 1.0, repeats, batch);
}

int
main (void)
{
  gsl_set_error_handler_off ();
  run ("56/70 against 48/80:", 56, 70, 48, 80, 21, 20);
  run ("1200/5000 against 1100/5000:", 1200, 5000, 1100, 5000, 21, 10);
  run ("zero cell, 5/56 against 0/29:", 5, 56, 0, 29, 21, 20);
  run ("1e6 trials a group:", 300500, 1e6, 300000, 1e6, 11, 2);
  run ("1e9 trials a group:", 500030000, 1e9, 500000000, 1e9, 5, 1);
  run ("k = n, 1e9 against 0/1e9:", 1e9, 1e9, 0, 1e9, 5, 1);
  run_prior ("prior shapes 0.01, 0/10 against 3/20:", 0, 10, 3, 20, 0.01, 5, 1);
  return 0;
}
