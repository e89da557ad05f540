/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-crosscheck-rates-driver.c: reads cases on stdin, one a line, and prints Twofold's
 * rate numerics with 17 significant digits, for tf-crosscheck-rates.py to compare
 * with scipy and mpmath.
 *
 *   gammainc a x                  ln P(a, x), ln Q(a, x)
 *   gammainv lp a                 x with ln P(a, x) = lp, and x with ln Q(a, x) = lp
 *   ldpois k mu                   ln Poisson probability
 *   ptest k mu                    ln two-sided exact Poisson p-value (minimum likelihood)
 *   garwood k level               Garwood limits for the Poisson mean
 *   lbf1 k E lambda0 a b          one rate, ln BF01, point null, two-sided
 *   lbf2 kA EA kB EB rho0 a b     two rates, ln BF01, point null, two-sided
 *   ratioq lp sa ra sb rb         ρ with ln P(ρ <= x) = lp, and with ln P(ρ >= x) = lp
 */
#include <stdio.h>
#include <string.h>
#include <gsl/gsl_errno.h>

#include "tf-poisson.h"
#include "tf-one-rate.h"
#include "tf-two-rates.h"

int
main (void)
{
  char line[512], what[32];
  double v[7];

  gsl_set_error_handler_off ();
  while (fgets (line, sizeof line, stdin) != NULL)
    {
      int got = sscanf (line, "%31s %lf %lf %lf %lf %lf %lf %lf", what, &v[0], &v[1], &v[2],
                        &v[3], &v[4], &v[5], &v[6]);
      if (got < 2)
        printf ("nan\n");
      else if (strcmp (what, "gammainc") == 0)
        {
          double l, u;
          tf_gamma_inc_log_both (v[0], v[1], &l, &u);
          printf ("%.17g %.17g\n", l, u);
        }
      else if (strcmp (what, "gammainv") == 0)
        printf ("%.17g %.17g\n", tf_gamma_inc_inverse_log (v[0], v[1], TRUE),
                tf_gamma_inc_inverse_log (v[0], v[1], FALSE));
      else if (strcmp (what, "ldpois") == 0)
        printf ("%.17g\n", tf_log_dpois (v[0], v[1]));
      else if (strcmp (what, "ptest") == 0)
        printf ("%.17g\n", tf_pois_log_exact_two_sided (v[0], v[1]));
      else if (strcmp (what, "garwood") == 0)
        {
          double lo, hi;
          tf_pois_garwood (v[0], v[1], &lo, &hi);
          printf ("%.17g %.17g\n", lo, hi);
        }
      else if (strcmp (what, "lbf1") == 0)
        printf ("%.17g\n", tf_one_rate_log_bf01 (v[0], v[1], v[2], v[3], v[4]));
      else if (strcmp (what, "lbf2") == 0)
        printf ("%.17g\n", tf_two_rates_log_bf01 (v[0], v[1], v[2], v[3], v[4], v[5], v[6]));
      else if (strcmp (what, "ratioq") == 0)
        printf ("%.17g %.17g\n",
                tf_two_rates_ratio_quantile_log (v[0], v[1], v[2], v[3], v[4], TRUE),
                tf_two_rates_ratio_quantile_log (v[0], v[1], v[2], v[3], v[4], FALSE));
      else
        printf ("nan\n");
    }
  return 0;
}
