/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-crosscheck-driver-rates.c: `tf-crosscheck-driver rates`, the rate numerics for
 * tf-crosscheck-rates.py.
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
#include "tf-crosscheck-driver.h"
#include "tf-poisson.h"
#include "tf-incgamma.h"
#include "tf-logspace.h"
#include "tf-one-rate.h"
#include "tf-two-rates.h"

static void
gamma_inc (const double *v)
{
  double l, u;

  tf_gamma_inc_log_both (v[0], v[1], &l, &u);
  TF_CROSS_PRINT (l, u);
}

static void
gamma_inverse (const double *v)
{
  TF_CROSS_PRINT (tf_gamma_inc_inverse_log (v[0], v[1], TRUE),
                  tf_gamma_inc_inverse_log (v[0], v[1], FALSE));
}

static void
ldpois (const double *v)
{
  TF_CROSS_PRINT (tf_log_dpois (v[0], v[1]));
}

static void
ptest (const double *v)
{
  TF_CROSS_PRINT (tf_pois_log_exact_two_sided (v[0], v[1]));
}

static void
garwood (const double *v)
{
  double lo, hi;

  tf_pois_garwood (v[0], v[1], &lo, &hi);
  TF_CROSS_PRINT (lo, hi);
}

static void
one_rate_bf (const double *v)
{
  TF_CROSS_PRINT (tf_one_rate_log_bf01 (v[0], v[1], v[2], v[3], v[4]));
}

static void
two_rates_bf (const double *v)
{
  TF_CROSS_PRINT (tf_two_rates_log_bf01 (v[0], v[1], v[2], v[3], v[4], v[5], v[6]));
}

static void
ratio_quantile (const double *v)
{
  TF_CROSS_PRINT (tf_two_rates_ratio_quantile_log (v[0], v[1], v[2], v[3], v[4], TRUE),
                  tf_two_rates_ratio_quantile_log (v[0], v[1], v[2], v[3], v[4], FALSE));
}

static const TfCrossCase cases[] = {
  { "gammainc", 2, gamma_inc },
  { "gammainv", 2, gamma_inverse },
  { "ldpois", 2, ldpois },
  { "ptest", 2, ptest },
  { "garwood", 2, garwood },
  { "lbf1", 5, one_rate_bf },
  { "lbf2", 7, two_rates_bf },
  { "ratioq", 5, ratio_quantile },
};

const TfCrossArea tf_cross_rates = TF_CROSS_AREA ("rates", cases);
