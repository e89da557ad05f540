/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-crosscheck-driver-means.c: `tf-crosscheck-driver means`, the means numerics for
 * tf-crosscheck-means.py.
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
#include <math.h>

#include "tf-crosscheck-driver.h"
#include "tf-jzs.h"
#include "tf-noncentral-t.h"
#include "tf-means.h"
#include "tf-two-means.h"

static void
jzs (const double *v)
{
  TF_CROSS_PRINT (tf_jzs_log_bf10 (v[0], v[1], v[2], v[3]));
}

static void
normal (const double *v)
{
  TF_CROSS_PRINT (tf_normal_prior_log_bf10 (v[0], v[1], v[2], v[3]));
}

static void
nct_cdf (const double *v)
{
  TF_CROSS_PRINT (tf_nct_cdf (v[0], v[1], v[2]));
}

static void
nct_log_pdf (const double *v)
{
  TF_CROSS_PRINT (tf_nct_log_pdf (v[0], v[1], v[2]));
}

static void
ncp_inverse (const double *v)
{
  TF_CROSS_PRINT (tf_nct_ncp_for_cdf (v[0], v[1], v[2]));
}

static void
p_value (const double *v)
{
  TF_CROSS_PRINT (tf_means_p_value (v[0], v[1], (TfDirection) (int) v[2]));
}

static void
welch (const double *v)
{
  TF_CROSS_PRINT (tf_welch_df (v[0], v[1], v[2], v[3]));
}

static void
jzs_side (const double *v)
{
  TF_CROSS_PRINT (tf_jzs_log_bf_one_sided (v[0], v[1], v[2], v[3], (int) v[4]));
}

static void
normal_side (const double *v)
{
  TF_CROSS_PRINT (tf_normal_prior_log_bf_one_sided (v[0], v[1], v[2], v[3], (int) v[4]));
}

static void
side (const double *v)
{
  TfDeltaPrior prior = { .prior = TF_PRIOR_CAUCHY, .r = v[3] };
  g_autoptr (TfDeltaPosterior) post = tf_delta_posterior_new (&prior, v[0], v[1], v[2]);

  TF_CROSS_PRINT (tf_delta_posterior_log_mass (post, 0.0, INFINITY));
}

static void
posterior (const double *v)
{
  TfDeltaPrior prior = { .prior = v[4] == 1.0 ? TF_PRIOR_NORMAL : TF_PRIOR_CAUCHY,
                         .r = v[3] };
  double a = v[5] == 1.0 ? 0.0 : -INFINITY, b = v[5] == 2.0 ? 0.0 : INFINITY;
  double lo, hi, level = v[6], low, high;
  g_autoptr (TfDeltaPosterior) post = tf_delta_posterior_new (&prior, v[0], v[1], v[2]);

  low = tf_delta_posterior_quantile (post, 0.5 * (1.0 - level), a, b);
  high = tf_delta_posterior_quantile (post, 0.5 * (1.0 + level), a, b);
  tf_delta_posterior_hdi (post, level, a, b, &lo, &hi);
  TF_CROSS_PRINT (low, high, lo, hi, exp (tf_delta_posterior_log_mass (post, 0.0, INFINITY)));
}

static const TfCrossCase cases[] = {
  { "jzs", 4, jzs },
  { "normal", 4, normal },
  { "nctcdf", 3, nct_cdf },
  { "nctlpdf", 3, nct_log_pdf },
  { "ncpinv", 3, ncp_inverse },
  { "pval", 3, p_value },
  { "welch", 4, welch },
  { "jzsside", 5, jzs_side },
  { "normalside", 5, normal_side },
  { "side", 4, side },
  { "post", 7, posterior },
};

const TfCrossArea tf_cross_means = TF_CROSS_AREA ("means", cases);
