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
  double v[5] = { 0 };

  gsl_set_error_handler_off ();
  while (fgets (line, sizeof line, stdin) != NULL)
    {
      int got = sscanf (line, "%31s %lf %lf %lf %lf %lf", what, &v[0], &v[1], &v[2], &v[3],
                        &v[4]);
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
      else
        printf ("nan\n");
    }
  return 0;
}
