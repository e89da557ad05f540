/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-crosscheck-two-proportions-driver.c: reads cases on stdin, one a line, and prints
 * Twofold's two-proportions numerics with 17 significant digits, for
 * tf-crosscheck-two-proportions.py to compare with scipy and mpmath.
 *
 *   lbf kA nA kB nB a b            ln BF01, closed form
 *   hyper x nA nB m                ln P(X = x), ln P(X <= x), ln P(X >= x)
 *   fisher kA nA kB nB             ln Fisher p: two-sided, greater, less
 *   newc kA nA kB nB level         Newcombe's hybrid score limits
 *   tests kA nA kB nB              χ², Yates and G p-values (two-sided)
 *   bdcdf pa qa pb qb d            ln P(Δ <= d), ln P(Δ >= d)
 *   bdq pa qa pb qb lp             d with ln P(Δ <= d) = lp, and with ln P(Δ >= d) = lp
 *   logor kA nA kB nB sd           ln BF01, normal prior on the log odds ratio
 */
#include <stdio.h>
#include <string.h>
#include <math.h>
#include <gsl/gsl_errno.h>

#include "tf-design.h"
#include "tf-fisher.h"
#include "tf-beta-difference.h"
#include "tf-two-proportions.h"
#include "tf-two-proportions-private.h"

static double
result (const TfResults *r, const char *id)
{
  double v = NAN;
  tf_results_get (r, id, &v);
  return v;
}

int
main (void)
{
  char line[512], what[32];
  double v[6];

  gsl_set_error_handler_off ();
  while (fgets (line, sizeof line, stdin) != NULL)
    {
      int got = sscanf (line, "%31s %lf %lf %lf %lf %lf %lf", what, &v[0], &v[1], &v[2],
                        &v[3], &v[4], &v[5]);
      if (got < 2)
        printf ("nan\n");
      else if (strcmp (what, "lbf") == 0)
        printf ("%.17g\n", tf_two_proportions_log_bf01 (v[0], v[1], v[2], v[3], v[4], v[5]));
      else if (strcmp (what, "hyper") == 0)
        {
          TfHyper h;
          tf_hyper_init (&h, v[1], v[2], v[3]);
          printf ("%.17g %.17g %.17g\n", tf_hyper_log_pmf (&h, v[0]), tf_hyper_log_cdf (&h, v[0]),
                  tf_hyper_log_sf (&h, v[0]));
        }
      else if (strcmp (what, "fisher") == 0)
        {
          TfHyper h;
          tf_hyper_init (&h, v[1], v[3], v[0] + v[2]);
          printf ("%.17g %.17g %.17g\n", tf_fisher_log_p (&h, v[0], TF_DIRECTION_TWO_SIDED),
                  tf_fisher_log_p (&h, v[0], TF_DIRECTION_GREATER),
                  tf_fisher_log_p (&h, v[0], TF_DIRECTION_LESS));
        }
      else if (strcmp (what, "newc") == 0)
        {
          double lo, hi;
          tf_two_proportions_newcombe (v[0], v[1], v[2], v[3], v[4], &lo, &hi);
          printf ("%.17g %.17g\n", lo, hi);
        }
      else if (strcmp (what, "tests") == 0)
        {
          g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_TWO_PROPORTIONS);
          a->successes_a = v[0];
          a->trials_a = v[1];
          a->successes_b = v[2];
          a->trials_b = v[3];
          g_autoptr (TfResults) r = tf_analysis_compute (a, NULL);
          printf ("%.17g %.17g %.17g\n", result (r, "p_value_chisq"),
                  result (r, "p_value_chisq_yates"), result (r, "p_value_lr"));
        }
      else if (strcmp (what, "bdcdf") == 0)
        {
          TfBetaDiff bd;
          double l = NAN, u = NAN;
          tf_beta_diff_init (&bd, v[0], v[1], v[2], v[3]);
          if (!tf_beta_diff_log_cdf (&bd, v[4], &l, &u))
            l = u = NAN;
          printf ("%.17g %.17g\n", l, u);
        }
      else if (strcmp (what, "bdq") == 0)
        {
          TfBetaDiff bd;
          tf_beta_diff_init (&bd, v[0], v[1], v[2], v[3]);
          printf ("%.17g %.17g\n", tf_beta_diff_quantile_log (&bd, v[4], TRUE),
                  tf_beta_diff_quantile_log (&bd, v[4], FALSE));
        }
      else if (strcmp (what, "logor") == 0)
        {
          const char *why = NULL;
          printf ("%.17g\n", tf_two_proportions_log_or_bf01 (v[0], v[1], v[2], v[3], v[4], &why));
        }
      else
        printf ("nan\n");
    }
  return 0;
}
