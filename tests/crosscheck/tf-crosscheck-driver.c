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
 */
#include <stdio.h>
#include <string.h>
#include <gsl/gsl_errno.h>

#include "tf-logspace.h"
#include "tf-incbeta.h"
#include "tf-binomial.h"
#include "tf-one-proportion.h"

int
main (void)
{
  char line[512], what[32];
  double v[6];

  gsl_set_error_handler_off ();
  while (fgets (line, sizeof line, stdin) != NULL)
    {
      int got = sscanf (line, "%31s %lf %lf %lf %lf %lf", what, &v[0], &v[1], &v[2], &v[3], &v[4]);
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
      else
        printf ("nan\n");
    }
  return 0;
}
