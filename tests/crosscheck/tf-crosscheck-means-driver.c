/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-crosscheck-means-driver.c: reads cases on stdin, one a line, and prints Twofold's
 * means numerics with 17 significant digits, for tf-crosscheck-means.py.
 *
 *   jzs t n_eff df r          ln BF10, Cauchy prior (df may be inf: known SD)
 *   normal t n_eff df r       ln BF10, normal prior
 *   nctcdf t df ncp           P(T <= t), T ~ t(df, ncp)
 *   nctlpdf t df ncp          ln density
 *   ncpinv t df p             ncp with P(T <= t) = p
 *   pval t df dir             p-value, dir 0 two-sided, 1 greater, 2 less
 *   welch na sa nb sb         Welch–Satterthwaite df
 *   side t n_eff df r         ln P(δ > 0 | data) under the Cauchy prior
 *   jzsside t n_eff df r s    ln BF±0, Cauchy prior truncated to the side s = 1 or −1
 *   normalside t n_eff df r s ln BF±0, normal prior truncated to the side
 *   post t n_eff df r k       the posterior of δ under the prior k (0 Cauchy, 1 normal),
 *     dir level                 truncated to the side dir (0 none, 1 δ > 0, 2 δ < 0): the
 *                               equal-tailed and highest-density limits of mass level and
 *                               P(δ > 0) of the untruncated posterior, five numbers
 */
#include <stdio.h>
#include <string.h>
#include <math.h>
#include <gsl/gsl_errno.h>

#include "tf-jzs.h"
#include "tf-noncentral-t.h"
#include "tf-means.h"
#include "tf-two-means.h"

int
main (void)
{
  char line[512], what[32];
  double v[7] = { 0 };

  gsl_set_error_handler_off ();
  while (fgets (line, sizeof line, stdin) != NULL)
    {
      int got = sscanf (line, "%31s %lf %lf %lf %lf %lf %lf %lf", what, &v[0], &v[1], &v[2],
                        &v[3], &v[4], &v[5], &v[6]);
      if (got < 4)
        {
          printf ("nan\n");
          continue;
        }
      if (strcmp (what, "jzs") == 0)
        printf ("%.17g\n", tf_jzs_log_bf10 (v[0], v[1], v[2], v[3]));
      else if (strcmp (what, "normal") == 0)
        printf ("%.17g\n", tf_normal_prior_log_bf10 (v[0], v[1], v[2], v[3]));
      else if (strcmp (what, "nctcdf") == 0)
        printf ("%.17g\n", tf_nct_cdf (v[0], v[1], v[2]));
      else if (strcmp (what, "nctlpdf") == 0)
        printf ("%.17g\n", tf_nct_log_pdf (v[0], v[1], v[2]));
      else if (strcmp (what, "ncpinv") == 0)
        printf ("%.17g\n", tf_nct_ncp_for_cdf (v[0], v[1], v[2]));
      else if (strcmp (what, "pval") == 0)
        printf ("%.17g\n", tf_means_p_value (v[0], v[1], (TfDirection) (int) v[2]));
      else if (strcmp (what, "welch") == 0)
        printf ("%.17g\n", tf_welch_df (v[0], v[1], v[2], v[3]));
      else if (strcmp (what, "jzsside") == 0)
        printf ("%.17g\n", tf_jzs_log_bf_one_sided (v[0], v[1], v[2], v[3], (int) v[4]));
      else if (strcmp (what, "normalside") == 0)
        printf ("%.17g\n", tf_normal_prior_log_bf_one_sided (v[0], v[1], v[2], v[3], (int) v[4]));
      else if (strcmp (what, "side") == 0)
        {
          TfDeltaPrior prior = { .prior = TF_PRIOR_CAUCHY, .r = v[3] };
          g_autoptr (TfDeltaPosterior) post = tf_delta_posterior_new (&prior, v[0], v[1], v[2]);
          printf ("%.17g\n", tf_delta_posterior_log_mass (post, 0.0, INFINITY));
        }
      else if (strcmp (what, "post") == 0)
        {
          TfDeltaPrior prior = { .prior = v[4] == 1.0 ? TF_PRIOR_NORMAL : TF_PRIOR_CAUCHY,
                                 .r = v[3] };
          double a = v[5] == 1.0 ? 0.0 : -INFINITY, b = v[5] == 2.0 ? 0.0 : INFINITY;
          double lo, hi, level = v[6];
          g_autoptr (TfDeltaPosterior) post = tf_delta_posterior_new (&prior, v[0], v[1], v[2]);
          printf ("%.17g %.17g ", tf_delta_posterior_quantile (post, 0.5 * (1.0 - level), a, b),
                  tf_delta_posterior_quantile (post, 0.5 * (1.0 + level), a, b));
          tf_delta_posterior_hdi (post, level, a, b, &lo, &hi);
          printf ("%.17g %.17g %.17g\n", lo, hi, exp (tf_delta_posterior_log_mass (post, 0.0, INFINITY)));
        }
      else
        printf ("nan\n");
    }
  return 0;
}
