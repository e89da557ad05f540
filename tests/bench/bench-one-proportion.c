/* SPDX-License-Identifier: GPL-3.0-or-later
 * What one full one-proportion analysis costs (validate + every number), at n = 10^3
 * and n = 10^12, and a 256-point sensitivity curve; then the same quantities through
 * scipy (bench-one-proportion-scipy.py, /usr/bin/python3) and the ratio. Prints
 * medians. A benchmark, not a test: `meson test -C _build --benchmark`. Targets: a full
 * analysis under 20 µs, n = 10^12 at most twice n = 10^3, the curve under 1 ms.
 */
#include "tf-design.h"
#include "tf-analysis.h"
#include "tf-results.h"
#include "tf-curves.h"

#include <gsl/gsl_errno.h>
#include <stdio.h>
#include <stdlib.h>
#include <string.h>

static int
compare_doubles (const void *a, const void *b)
{
  double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

/* Median over repeats of batches, in microseconds per call. */
static double
median_us (const TfAnalysis *analysis, gboolean curve, guint repeats, guint batch)
{
  g_autofree double *t = g_new (double, repeats);

  for (guint i = 0; i < repeats; i++)
    {
      gint64 start = g_get_monotonic_time ();
      for (guint j = 0; j < batch; j++)
        if (curve)
          {
            g_autoptr (TfEvidenceCurve) c = tf_sensitivity_curve_new (analysis, 256, NULL, NULL);
            g_assert_nonnull (c);
          }
        else
          {
            g_autoptr (TfResults) r = tf_analysis_compute (analysis, NULL);
            g_assert_nonnull (r);
          }
      t[i] = (double) (g_get_monotonic_time () - start) / batch;
    }
  qsort (t, repeats, sizeof *t, compare_doubles);
  return t[repeats / 2];
}

/* The scipy helper's "name µs" lines; FALSE when it cannot run. */
static gboolean
scipy_times (double *full3, double *full12, double *curve)
{
  const char *src = g_getenv ("TF_SOURCE_DIR");
  g_autofree char *script = g_build_filename (src ? src : ".", "tests", "bench",
                                              "bench-one-proportion-scipy.py", NULL);
  const char *argv[] = { "/usr/bin/python3", script, NULL };
  g_autofree char *out = NULL;
  int status = 0;

  if (!g_spawn_sync (NULL, (char **) argv, NULL, G_SPAWN_STDERR_TO_DEV_NULL, NULL, NULL,
                     &out, NULL, &status, NULL) || !g_spawn_check_wait_status (status, NULL))
    return FALSE;
  return sscanf (out, "full_1e3 %lf full_1e12 %lf curve %lf", full3, full12, curve) == 3;
}

int
main (void)
{
  gsl_set_error_handler_off ();
  g_autoptr (TfAnalysis) an = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);
  an->successes = 412;
  an->trials = 1000;
  an->null_value = 0.4;

  double small = median_us (an, FALSE, 101, 100);
  double curve = median_us (an, TRUE, 51, 10);
  an->successes = 400001000000;
  an->trials = 1e12;
  double huge = median_us (an, FALSE, 51, 100);

  printf ("one proportion, n = 10^3:   %8.2f µs per full analysis (median; target < 20)\n", small);
  printf ("one proportion, n = 10^12:  %8.2f µs per full analysis (median; %.2f× n = 10^3, target <= 2)\n",
          huge, huge / small);
  printf ("sensitivity curve, 256 pts: %8.2f µs (median; target < 1000)\n", curve);

  double s3, s12, sc;
  if (scipy_times (&s3, &s12, &sc))
    {
      printf ("scipy, the same numbers, n = 10^3:  %9.1f µs (Twofold %.1f× faster)\n", s3, s3 / small);
      printf ("scipy, the same numbers, n = 10^12: %9.1f µs (Twofold %.1f× faster)\n", s12, s12 / huge);
      printf ("scipy, the 256-point curve:         %9.1f µs (Twofold %.1f× faster)\n", sc, sc / curve);
    }
  else
    printf ("scipy: not available (/usr/bin/python3 with scipy), no ratio\n");
  return 0;
}
