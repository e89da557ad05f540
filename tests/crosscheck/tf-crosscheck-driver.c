/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-crosscheck-driver.c: reads cases on stdin, one a line, and prints Twofold's values
 * with 17 significant digits, for tf-crosscheck.py to compare with scipy and mpmath.
 *
 *   lbf01 k n theta0 a b      ln BF01 (two-sided)
 *   lbeta a b                 ln B(a, b)
 *   ldbinom k n p             ln P(X = k)
 *   ldbeta x a b              ln Beta(a, b) density at x
 *   ibeta a b x               ln I_x(a, b), ln(1 − I_x(a, b))
 *   binom k n p               ln P(X <= k), ln P(X >= k)
 *   btest k n p               two-sided exact p-value (minimum likelihood)
 *   ppf p a b                 x with I_x(a, b) = p, and x with 1 − I_x(a, b) = p
 *   cp k n level              Clopper–Pearson limits
 *   tests k n theta0 dir      ln p: exact, central, mid-p, score, score cc, LR
 *                             (dir 0 two-sided, 1 greater, 2 less)
 *   wilson k n level          Wilson limits, then with continuity correction
 *   jeffreys k n level        Jeffreys limits
 *   ac k n level              Agresti–Coull limits
 *   hdi P Q level             highest-density interval of Beta(P, Q) ("nan nan" if none)
 *   ibf k n lo hi a b dir     ln BF01 of the interval null [lo, hi]
 */
#include <stdio.h>
#include <math.h>
#include <string.h>
#include <gsl/gsl_errno.h>

#include "tf-design.h"
#include "tf-logspace.h"
#include "tf-incbeta.h"
#include "tf-binomial.h"
#include "tf-one-proportion.h"
#include "tf-one-proportion-private.h"
#include "tf-proportion-intervals.h"

int
main (void)
{
  char line[512], what[32];
  double v[8];

  gsl_set_error_handler_off ();
  while (fgets (line, sizeof line, stdin) != NULL)
    {
      int got = sscanf (line, "%31s %lf %lf %lf %lf %lf %lf %lf", what, &v[0], &v[1], &v[2],
                        &v[3], &v[4], &v[5], &v[6]);
      if (got < 2)
        {
          printf ("nan\n");
          continue;
        }
      if (strcmp (what, "lbf01") == 0)
        printf ("%.17g\n", tf_one_proportion_log_bf01 (v[0], v[1], v[2], v[3], v[4]));
      else if (strcmp (what, "lbeta") == 0)
        printf ("%.17g\n", tf_log_beta (v[0], v[1]));
      else if (strcmp (what, "ldbinom") == 0)
        printf ("%.17g\n", tf_log_dbinom (v[0], v[1], v[2], 1.0 - v[2]));
      else if (strcmp (what, "ldbeta") == 0)
        printf ("%.17g\n", tf_log_dbeta (v[0], 1.0 - v[0], v[1], v[2]));
      else if (strcmp (what, "ibeta") == 0)
        {
          double l, u;
          tf_incbeta_log_both (v[2], 1.0 - v[2], v[0], v[1], &l, &u);
          printf ("%.17g %.17g\n", l, u);
        }
      else if (strcmp (what, "binom") == 0)
        printf ("%.17g %.17g\n", tf_binom_log_cdf (v[0], v[1], v[2], 1.0 - v[2]),
                tf_binom_log_sf (v[0], v[1], v[2], 1.0 - v[2]));
      else if (strcmp (what, "btest") == 0)
        printf ("%.17g\n", tf_binom_exact_two_sided (v[0], v[1], v[2]));
      else if (strcmp (what, "ppf") == 0)
        printf ("%.17g %.17g\n", tf_incbeta_inverse (v[0], v[1], v[2], TRUE),
                tf_incbeta_inverse (v[0], v[1], v[2], FALSE));
      else if (strcmp (what, "cp") == 0)
        {
          double lo, hi;
          tf_binom_clopper_pearson (v[0], v[1], v[2], &lo, &hi);
          printf ("%.17g %.17g\n", lo, hi);
        }
      else if (strcmp (what, "tests") == 0)
        {
          TfOneProportionTests t;
          tf_one_proportion_tests (v[0], v[1], v[2], (TfDirection) (int) v[3], &t);
          printf ("%.17g %.17g %.17g %.17g %.17g %.17g\n", t.lp_exact, t.lp_central, t.lp_mid,
                  t.lp_score, t.lp_score_cc, t.lp_lr);
        }
      else if (strcmp (what, "wilson") == 0)
        {
          double lo, hi, lc, hc;
          tf_proportion_wilson (v[0], v[1], v[2], FALSE, &lo, &hi);
          tf_proportion_wilson (v[0], v[1], v[2], TRUE, &lc, &hc);
          printf ("%.17g %.17g %.17g %.17g\n", lo, hi, lc, hc);
        }
      else if (strcmp (what, "jeffreys") == 0 || strcmp (what, "ac") == 0)
        {
          double lo, hi;
          if (what[0] == 'j')
            tf_proportion_jeffreys (v[0], v[1], v[2], &lo, &hi);
          else
            tf_proportion_agresti_coull (v[0], v[1], v[2], &lo, &hi);
          printf ("%.17g %.17g\n", lo, hi);
        }
      else if (strcmp (what, "hdi") == 0)
        {
          double lo = NAN, hi = NAN;
          tf_beta_hdi (v[0], v[1], v[2], &lo, &hi);
          printf ("%.17g %.17g\n", lo, hi);
        }
      else if (strcmp (what, "ibf") == 0)
        {
          g_autoptr (TfAnalysis) an = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);
          an->null_kind = TF_NULL_INTERVAL;
          an->null_low = v[2];
          an->null_high = v[3];
          an->direction = (TfDirection) (int) v[6];
          printf ("%.17g\n", tf_one_proportion_analysis_log_bf01 (an, v[0], v[1], v[4], v[5]));
        }
      else
        printf ("nan\n");
    }
  return 0;
}
