/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-proportion-tests.c: the classical tests of θ = θ0 in every direction.
 */
#include "tf-one-proportion-private.h"
#include "tf-binomial.h"
#include "tf-incbeta.h"
#include "tf-incbeta-private.h"
#include "tf-logspace.h"
#include "tf-normal.h"

#include <math.h>

/* ln min(1, 2 e^l): a one-sided p-value doubled for two sides. */
static double
log_double (double l)
{
  return MIN (0.0, G_LN2 + l);
}

void
tf_one_proportion_tests (double k, double n, double theta0, TfDirection direction,
                         TfOneProportionTests *t)
{
  const double p = theta0, q = 1.0 - theta0;
  double lpmf = tf_log_dbinom (k, n, p, q);
  double lcdf = tf_binom_log_cdf (k, n, p, q), lsf = tf_binom_log_sf (k, n, p, q);
  double sd = sqrt (n * p * q);

  t->d = tf_incbeta_lambda (k, n - k, p, q);          /* k − nθ0, exactly */
  t->dev = tf_bd0_delta (k, n * p, t->d) + tf_bd0_delta (n - k, n * q, -t->d); /* G / 2 */
  t->z = t->d / sd;
  double r = (t->d < 0.0 ? -1.0 : 1.0) * sqrt (2.0 * t->dev);  /* signed root of G */

  switch (direction)
    {
    case TF_DIRECTION_GREATER:
      t->lp_exact = t->lp_central = lsf;
      /* mid-p (Lancaster 1961): P(X > k) + ½ P(X = k) */
      t->lp_mid = tf_log_add (tf_binom_log_sf (k + 1.0, n, p, q), lpmf - G_LN2);
      t->lp_score = tf_log_normal_upper (t->z);
      /* P(X >= k) ≈ P(Y >= k − ½), Y normal (continuity correction, common practice) */
      t->z_cc = (t->d - 0.5) / sd;
      t->lp_score_cc = tf_log_normal_upper (t->z_cc);
      t->lp_lr = tf_log_normal_upper (r);
      break;
    case TF_DIRECTION_LESS:
      t->lp_exact = t->lp_central = lcdf;
      t->lp_mid = tf_log_add (tf_binom_log_cdf (k - 1.0, n, p, q), lpmf - G_LN2);
      t->lp_score = tf_log_normal_upper (-t->z);
      t->z_cc = (t->d + 0.5) / sd;
      t->lp_score_cc = tf_log_normal_upper (-t->z_cc);
      t->lp_lr = tf_log_normal_upper (-r);
      break;
    case TF_DIRECTION_TWO_SIDED:
    default:
      t->lp_exact = tf_binom_log_exact_two_sided (k, n, p);
      /* twice the smaller exact tail, at most 1 (the central test) */
      t->lp_central = log_double (MIN (lcdf, lsf));
      /* two-sided mid-p (Lancaster 1961, with the minimum-likelihood rule):
       * the exact p-value minus half the probability of the observed outcome */
      t->lp_mid = tf_log_sub (t->lp_exact, lpmf - G_LN2);
      /* 2 Φ(−|z|), from the upper tail */
      t->lp_score = log_double (tf_log_normal_upper (fabs (t->z)));
      /* Yates's correction: |k − nθ0| less ½, not below 0 (common practice) */
      t->z_cc = copysign (MAX (0.0, fabs (t->d) - 0.5), t->d) / sd;
      t->lp_score_cc = log_double (tf_log_normal_upper (fabs (t->z_cc)));
      /* P(χ²₁ >= G) = erfc(√(G/2)) = erfc(√dev) */
      t->lp_lr = MIN (0.0, tf_log_erfc (sqrt (t->dev)));    /* NaN where GSL fails */
      break;
    }
  t->lp_mid = MIN (0.0, t->lp_mid);
  t->lp_score = MIN (0.0, t->lp_score);
  t->lp_score_cc = MIN (0.0, t->lp_score_cc);
  t->lp_lr = MIN (0.0, t->lp_lr);
}

void
tf_one_proportion_log_masses (double P, double Q, double lo, double hi,
                              double *below, double *inside, double *above)
{
  double l_lo, u_lo, l_hi, u_hi;

  tf_incbeta_log_both (lo, 1.0 - lo, P, Q, &l_lo, &u_lo);
  tf_incbeta_log_both (hi, 1.0 - hi, P, Q, &l_hi, &u_hi);
  *below = l_lo;
  *above = u_hi;
  /* inside = F(hi) − F(lo) when both lower tails are small, S(lo) − S(hi) when both
   * upper tails are, else 1 − F(lo) − S(hi) */
  if (l_hi < -G_LN2)
    *inside = tf_log_sub (l_hi, l_lo);
  else if (u_lo < -G_LN2)
    *inside = tf_log_sub (u_lo, u_hi);
  else
    *inside = log1p (-(exp (l_lo) + exp (u_hi)));
}
