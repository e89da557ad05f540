/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-crosscheck-driver-one-proportion.c: `tf-crosscheck-driver one-proportion`, the
 * one-proportion numerics for tf-crosscheck.py.
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
#include <math.h>

#include "tf-design.h"
#include "tf-crosscheck-driver.h"
#include "tf-logspace.h"
#include "tf-incbeta.h"
#include "tf-binomial.h"
#include "tf-one-proportion.h"
#include "tf-one-proportion-private.h"
#include "tf-proportion-intervals.h"

static void
lbf01 (const double *v)
{
  TF_CROSS_PRINT (tf_one_proportion_log_bf01 (v[0], v[1], v[2], v[3], v[4]));
}

static void
lbeta (const double *v)
{
  TF_CROSS_PRINT (tf_log_beta (v[0], v[1]));
}

static void
ldbinom (const double *v)
{
  TF_CROSS_PRINT (tf_log_dbinom (v[0], v[1], v[2], 1.0 - v[2]));
}

static void
ldbeta (const double *v)
{
  TF_CROSS_PRINT (tf_log_dbeta (v[0], 1.0 - v[0], v[1], v[2]));
}

static void
ibeta (const double *v)
{
  double l, u;

  tf_incbeta_log_both (v[2], 1.0 - v[2], v[0], v[1], &l, &u);
  TF_CROSS_PRINT (l, u);
}

static void
binom (const double *v)
{
  TF_CROSS_PRINT (tf_binom_log_cdf (v[0], v[1], v[2], 1.0 - v[2]),
                  tf_binom_log_sf (v[0], v[1], v[2], 1.0 - v[2]));
}

static void
btest (const double *v)
{
  TF_CROSS_PRINT (tf_binom_exact_two_sided (v[0], v[1], v[2]));
}

static void
ppf (const double *v)
{
  TF_CROSS_PRINT (tf_incbeta_inverse (v[0], v[1], v[2], TRUE),
                  tf_incbeta_inverse (v[0], v[1], v[2], FALSE));
}

static void
cp (const double *v)
{
  double lo, hi;

  tf_binom_clopper_pearson (v[0], v[1], v[2], &lo, &hi);
  TF_CROSS_PRINT (lo, hi);
}

static void
tests (const double *v)
{
  TfOneProportionTests t;

  tf_one_proportion_tests (v[0], v[1], v[2], (TfDirection) (int) v[3], &t);
  TF_CROSS_PRINT (t.lp_exact, t.lp_central, t.lp_mid, t.lp_score, t.lp_score_cc, t.lp_lr);
}

static void
wilson (const double *v)
{
  double lo, hi, lc, hc;

  tf_proportion_wilson (v[0], v[1], v[2], FALSE, &lo, &hi);
  tf_proportion_wilson (v[0], v[1], v[2], TRUE, &lc, &hc);
  TF_CROSS_PRINT (lo, hi, lc, hc);
}

static void
jeffreys (const double *v)
{
  double lo, hi;

  tf_proportion_jeffreys (v[0], v[1], v[2], &lo, &hi);
  TF_CROSS_PRINT (lo, hi);
}

static void
agresti_coull (const double *v)
{
  double lo, hi;

  tf_proportion_agresti_coull (v[0], v[1], v[2], &lo, &hi);
  TF_CROSS_PRINT (lo, hi);
}

static void
hdi (const double *v)
{
  double lo = NAN, hi = NAN;

  tf_beta_hdi (v[0], v[1], v[2], &lo, &hi);
  TF_CROSS_PRINT (lo, hi);
}

static void
interval_bf (const double *v)
{
  g_autoptr (TfAnalysis) an = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);

  an->null_kind = TF_NULL_INTERVAL;
  an->null_low = v[2];
  an->null_high = v[3];
  an->direction = (TfDirection) (int) v[6];
  TF_CROSS_PRINT (tf_one_proportion_analysis_log_bf01 (an, v[0], v[1], v[4], v[5]));
}

static const TfCrossCase cases[] = {
  { "lbf01", 5, lbf01 },
  { "lbeta", 2, lbeta },
  { "ldbinom", 3, ldbinom },
  { "ldbeta", 3, ldbeta },
  { "ibeta", 3, ibeta },
  { "binom", 3, binom },
  { "btest", 3, btest },
  { "ppf", 3, ppf },
  { "cp", 3, cp },
  { "tests", 4, tests },
  { "wilson", 3, wilson },
  { "jeffreys", 3, jeffreys },
  { "ac", 3, agresti_coull },
  { "hdi", 3, hdi },
  { "ibf", 7, interval_bf },
};

const TfCrossArea tf_cross_one_proportion = TF_CROSS_AREA ("one-proportion", cases);
