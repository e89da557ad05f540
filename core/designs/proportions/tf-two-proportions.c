/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-proportions.c: kA of nA and kB of nB against θA = θB, classical and Bayesian.
 *
 * Classical: Fisher's exact test (the main p-value, in the chosen direction), Pearson's
 * χ² with and without Yates' correction, the pooled z test for the difference and the
 * likelihood-ratio (G) test; Newcombe's hybrid score interval for the difference and
 * log-scale intervals for the odds ratio (Woolf 1955) and the risk ratio (Katz et al.
 * 1978). Bayesian: H0 θA = θB = θ, θ ~ Beta(a, b), against θA, θB independent Beta(a,
 * b), in closed form; the posterior of θA − θB by one-dimensional integration
 * (tf-beta-difference.c); a second Bayes factor from a normal prior on the log odds
 * ratio (tf-two-proportions-logor.c).
 *
 * Zero cells: the odds ratio and its interval add 0.5 to every cell when any cell is 0,
 * the risk ratio when a group has no successes (Haldane 1956, Anscombe 1956; common
 * practice), and their labels say so.
 */
#include "tf-two-proportions.h"
#include "tf-two-proportions-private.h"
#include "tf-beta-difference.h"
#include "tf-fisher.h"
#include "tf-logspace.h"
#include "tf-normal.h"
#include "tf-normal-test.h"

#include <math.h>
#include <glib/gi18n-lib.h>
#include <gsl/gsl_cdf.h>

static gboolean
is_whole (double v)
{
  return isfinite (v) && v == floor (v);
}

static void
check_group (GPtrArray *problems, const char *k_key, const char *n_key, double k, double n,
             const char *group)
{
  gboolean n_ok = is_whole (n) && n >= 1.0 && n <= TF_ANALYSIS_MAX_TRIALS;

  if (!n_ok)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", n_key,
                                     /* TRANSLATORS: %s is the key (TrialsA), %s the group (A) */
                                     _("%s, the trials in group %s, must be a whole number from 1 to 10^15 (it is %g)."),
                                     n_key, group, n));
  if (!is_whole (k) || k < 0.0)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", k_key,
                                     _("%s, the successes in group %s, must be a whole number of at least 0 (it is %g)."),
                                     k_key, group, k));
  else if (n_ok && k > n)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", k_key,
                                     _("%s cannot exceed %s: the successes in group %s are %.17g of %.17g trials."),
                                     k_key, n_key, group, k, n));
}

void
tf_two_proportions_validate (const TfAnalysis *analysis, GPtrArray *problems)
{
  const TfAnalysis *a = analysis;

  check_group (problems, "SuccessesA", "TrialsA", a->successes_a, a->trials_a, "A");
  check_group (problems, "SuccessesB", "TrialsB", a->successes_b, a->trials_b, "B");
  if (a->null_kind == TF_NULL_INTERVAL)
    g_ptr_array_add (problems,
                     tf_problem_new ("Null", "Kind",
                                     _("Interval nulls are not available for two proportions yet; use a point null.")));
  else if (a->null_value != 0.0)
    g_ptr_array_add (problems,
                     tf_problem_new ("Null", "Value",
                                     _("Two proportions are tested against no difference only: the null Value must be 0 (it is %g)."),
                                     a->null_value));
  tf_analysis_validate_beta_prior (a, _("two proportions"), problems);
}

/* x1 y1 − x2 y2 with both products' rounding errors recovered by fma (Ogita, Rump &
 * Oishi 2005, TwoProduct). */
static double
diff_of_products (double x1, double y1, double x2, double y2)
{
  double p1 = x1 * y1, p2 = x2 * y2;
  return (p1 - p2) + (fma (x1, y1, -p1) - fma (x2, y2, -p2));
}

double
tf_two_proportions_cross (double ka, double na, double kb, double nb)
{
  return diff_of_products (ka, nb, kb, na);
}

/* ½ ln(x + y) − ½ ln x − ½ ln y + δ(x) + δ(y) − δ(x + y): the part of ln B(x, y) left
 * beside x ln(x/s) + y ln(y/s) by Stirling's formula (Loader 2000). */
static double
log_beta_rest (double x, double y)
{
  return 0.5 * (log (x + y) - log (x) - log (y)) + tf_stirling_remainder (x)
         + tf_stirling_remainder (y) - tf_stirling_remainder (x + y);
}

/* ln BF01 = ln B(kA + kB + a, nA + nB − kA − kB + b) + ln B(a, b) − ln B(kA + a, nA − kA + b)
 * − ln B(kB + a, nB − kB + b), each ln B by Stirling's formula with its remainder and
 * the large x ln(x/s) parts taken together as Loader's deviances about the pooled
 * posterior mean π = (kA + kB + a) / (N + a + b): their linear parts cancel exactly,
 * and each count's distance from its share of π is formed from the data without
 * cancellation (Loader 2000, deviance form). */
double
tf_two_proportions_log_bf01 (double ka, double na, double kb, double nb, double a, double b)
{
  const double N = na + nb, m = ka + kb, s = a + b, S = N + s;
  const double P = m + a, Q = N - m + b;
  const double pi = P / S, pj = Q / S;
  const double PA = ka + a, QA = na - ka + b, SA = na + s;
  const double PB = kb + a, QB = nb - kb + b, SB = nb + s;
  const double D = tf_two_proportions_cross (ka, na, kb, nb);
  /* S times (count − its expected share): PA − SA π, PB − SB π, a − s π */
  const double dA = D + (a * (nb - kb) - b * kb);
  const double dB = -D + (a * (na - ka) - b * ka);
  const double d0 = a * (N - m) - b * m;

  double dev = tf_bd0_delta (a, s * pi, d0 / S) + tf_bd0_delta (b, s * pj, -d0 / S)
               - tf_bd0_delta (PA, SA * pi, dA / S) - tf_bd0_delta (QA, SA * pj, -dA / S)
               - tf_bd0_delta (PB, SB * pi, dB / S) - tf_bd0_delta (QB, SB * pj, -dB / S);
  return dev + log_beta_rest (P, Q) + log_beta_rest (a, b) - log_beta_rest (PA, QA)
         - log_beta_rest (PB, QB);
}

double
tf_two_proportions_log_bf01_directed (double ka, double na, double kb, double nb,
                                      double a, double b, TfDirection direction)
{
  double l = tf_two_proportions_log_bf01 (ka, na, kb, nb, a, b);
  TfBetaDiff bd;
  double lo, hi;

  if (direction == TF_DIRECTION_TWO_SIDED)
    return l;
  /* BF10± = BF10 · P(side | data, H1) / P(side | H1), and P(side | H1) = ½ for two
   * independent draws from one prior (common practice: truncating the prior). */
  tf_beta_diff_init (&bd, ka + a, na - ka + b, kb + a, nb - kb + b);
  if (!tf_beta_diff_log_cdf (&bd, 0.0, &lo, &hi))
    return NAN;
  return l - G_LN2 - (direction == TF_DIRECTION_GREATER ? hi : lo);
}

/* Wilson's score interval (Wilson 1927) as the distances below and above k/n, each
 * formed without cancellation: p − l = z²(p − ½)/(n + z²) + h, u − p = h − z²(p − ½)/(n + z²). */
static void
wilson_arms (double k, double n, double z, double *below, double *above)
{
  double p = k / n, z2 = z * z;
  double shift = z2 * ((k - (n - k)) / (2.0 * n)) / (n + z2);
  double h = z * sqrt (k * ((n - k) / n) + 0.25 * z2) / (n + z2);
  *below = MIN (p, shift + h);
  *above = MIN (1.0 - p, h - shift);
}

void
tf_two_proportions_newcombe (double ka, double na, double kb, double nb, double level,
                             double *lo, double *hi)
{
  double z = gsl_cdf_ugaussian_Qinv (0.5 * (1.0 - level));
  double ba, aa, bb, ab;
  double d = tf_two_proportions_cross (ka, na, kb, nb) / na / nb;

  wilson_arms (ka, na, z, &ba, &aa);
  wilson_arms (kb, nb, z, &bb, &ab);
  /* Newcombe 1998, method 10: L = d − √(a-below² + b-above²), U = d + √(a-above² + b-below²) */
  *lo = MAX (-1.0, d - hypot (ba, ab));
  *hi = MIN (1.0, d + hypot (aa, bb));
}

static void
add_p (TfResults *results, const char *id, const char *label, double log_p)
{
  tf_results_add (results, id, label, TF_MEASURE_TAIL_PROBABILITY, MIN (exp (log_p), 1.0));
}

static void
add_ratio (TfResults *results, const char *id, const char *lo_id, const char *hi_id,
           const char *label, const char *lo_label, const char *hi_label, double log_est,
           double se, double z)
{
  tf_results_add (results, id, label, TF_MEASURE_ESTIMATE, exp (log_est));
  tf_results_add (results, lo_id, lo_label, TF_MEASURE_CONFIDENCE_LIMIT, exp (log_est - z * se));
  tf_results_add (results, hi_id, hi_label, TF_MEASURE_CONFIDENCE_LIMIT, exp (log_est + z * se));
}

/* Fisher's exact test (Fisher 1935), the main p-value; returns its ln. */
static double
add_fisher (const TfAnalysis *an, TfResults *results)
{
  const double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
  const TfDirection dir = an->direction;
  const double m = ka + kb;
  TfHyper h;

  tf_hyper_init (&h, na, nb, m);
  double lp_fisher = tf_fisher_log_p (&h, ka, dir);
  const char *fisher_label = dir == TF_DIRECTION_TWO_SIDED ? _("Fisher's exact p-value")
                             : _("Fisher's exact p-value (one-sided)");
  /* the main test, named as such, like one proportion's "p-value (exact)" */
  add_p (results, "p_value", _("p-value (Fisher's exact test)"), lp_fisher);
  add_p (results, "p_value_fisher", fisher_label, lp_fisher);

  return lp_fisher;
}

/* Pearson's χ² (Pearson 1900) with and without Yates' correction (Yates 1934), always
 * two-sided; the pooled z and the signed root of G follow the direction. Returns G / 2. */
static double
add_large_sample_tests (const TfAnalysis *an, TfResults *results)
{
  const double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
  const TfDirection dir = an->direction;
  const double N = na + nb, m = ka + kb;
  const double D = tf_two_proportions_cross (ka, na, kb, nb);
  const char *flat = _("no successes, or no failures, in either group: the tests that divide by the pooled variance are not defined");

  double dev = 0.0;             /* G / 2 */
  if (m == 0.0 || m == N)
    {
      tf_results_add_undefined (results, "p_value_chisq", _("Pearson χ² p-value (two-sided)"),
                                TF_MEASURE_TAIL_PROBABILITY, flat);
      tf_results_add_undefined (results, "p_value_chisq_yates",
                                _("Pearson χ² p-value with Yates' correction (two-sided)"),
                                TF_MEASURE_TAIL_PROBABILITY, flat);
      tf_results_add_undefined (results, "p_value_z", _("z test p-value (pooled)"),
                                TF_MEASURE_TAIL_PROBABILITY, flat);
      tf_results_add_undefined (results, "z", _("z statistic (pooled)"), TF_MEASURE_STATISTIC, flat);
      tf_results_add_undefined (results, "chisq", _("Pearson χ² statistic"), TF_MEASURE_STATISTIC, flat);
      add_p (results, "p_value_lr", _("Likelihood-ratio test p-value"), 0.0);
    }
  else
    {
      double vs = sqrt (m * ((N - m) / N) * na * nb);
      double z = D / vs;
      double zy = MAX (0.0, fabs (D) - 0.5 * N) / vs;
      double lp_z;

      add_p (results, "p_value_chisq", _("Pearson χ² p-value (two-sided)"),
             G_LN2 + tf_log_normal_upper (fabs (z)));
      add_p (results, "p_value_chisq_yates",
             _("Pearson χ² p-value with Yates' correction (two-sided)"),
             G_LN2 + tf_log_normal_upper (zy));
      lp_z = tf_normal_test_log_p (z, dir);
      add_p (results, "p_value_z", dir == TF_DIRECTION_TWO_SIDED ? _("z test p-value (pooled)")
                                   : _("z test p-value (pooled, one-sided)"), lp_z);
      tf_results_add (results, "z", _("z statistic (pooled)"), TF_MEASURE_STATISTIC, z);
      tf_results_add (results, "chisq", _("Pearson χ² statistic"), TF_MEASURE_STATISTIC, z * z);

      /* G/2 = Σ bd0(observed, expected), each cell's distance ±D/N exact (Loader 2000). */
      double e = D / N;
      dev = tf_bd0_delta (ka, na * (m / N), e) + tf_bd0_delta (na - ka, na * ((N - m) / N), -e)
            + tf_bd0_delta (kb, nb * (m / N), -e) + tf_bd0_delta (nb - kb, nb * ((N - m) / N), e);
      double r = (D < 0.0 ? -1.0 : 1.0) * sqrt (2.0 * dev);
      /* two-sided: P(χ²₁ >= G) = erfc(√(G/2)) = erfc(√dev) */
      double lp_lr = dir == TF_DIRECTION_TWO_SIDED ? tf_log_erfc (sqrt (dev))
                     : tf_normal_test_log_p (r, dir);
      add_p (results, "p_value_lr", dir == TF_DIRECTION_TWO_SIDED ? _("Likelihood-ratio test p-value")
                                    : _("Likelihood-ratio test p-value (one-sided)"), lp_lr);
    }

  return dev;
}

/* The difference: Newcombe's hybrid score interval, also the main interval. */
static void
add_difference_interval (const TfAnalysis *an, TfResults *results)
{
  const double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
  double dlo, dhi;
  tf_two_proportions_newcombe (ka, na, kb, nb, an->level, &dlo, &dhi);
  tf_results_add (results, "ci_low", _("Confidence interval for θA − θB, lower (Newcombe)"),
                  TF_MEASURE_CONFIDENCE_LIMIT, dlo);
  tf_results_add (results, "ci_high", _("Confidence interval for θA − θB, upper (Newcombe)"),
                  TF_MEASURE_CONFIDENCE_LIMIT, dhi);
  tf_results_add (results, "diff_ci_low", _("Newcombe interval for θA − θB, lower"),
                  TF_MEASURE_CONFIDENCE_LIMIT, dlo);
  tf_results_add (results, "diff_ci_high", _("Newcombe interval for θA − θB, upper"),
                  TF_MEASURE_CONFIDENCE_LIMIT, dhi);

}

/* Odds ratio, Woolf's log interval (Woolf 1955); 0.5 added to every cell when a cell is
 * 0 (Haldane 1956). */
static void
add_ratios (const TfAnalysis *an, TfResults *results)
{
  const double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
  const double z_level = gsl_cdf_ugaussian_Qinv (0.5 * (1.0 - an->level));

  double c[4] = { ka, na - ka, kb, nb - kb };
  gboolean zero = c[0] == 0.0 || c[1] == 0.0 || c[2] == 0.0 || c[3] == 0.0;
  double add = zero ? 0.5 : 0.0;
  for (int i = 0; i < 4; i++)
    c[i] += add;
  double lor = log (c[0]) + log (c[3]) - log (c[1]) - log (c[2]);
  double se = sqrt (1.0 / c[0] + 1.0 / c[1] + 1.0 / c[2] + 1.0 / c[3]);
  if (zero)
    add_ratio (results, "odds_ratio", "or_ci_low", "or_ci_high",
               _("Odds ratio (0.5 added to every cell: a cell is 0)"),
               _("Odds ratio interval, lower (0.5 added to every cell)"),
               _("Odds ratio interval, upper (0.5 added to every cell)"), lor, se, z_level);
  else
    add_ratio (results, "odds_ratio", "or_ci_low", "or_ci_high", _("Odds ratio"),
               _("Odds ratio interval, lower (Woolf)"), _("Odds ratio interval, upper (Woolf)"),
               lor, se, z_level);

  /* Risk ratio θA/θB, the log interval of Katz et al. (1978); 0.5 added to every
   * cell when a group has no successes. */
  gboolean rzero = ka == 0.0 || kb == 0.0;
  double ra = ka + (rzero ? 0.5 : 0.0), rb = kb + (rzero ? 0.5 : 0.0);
  double fa = na - ka + (rzero ? 0.5 : 0.0), fb = nb - kb + (rzero ? 0.5 : 0.0);
  double lrr = log (ra) - log (ra + fa) - log (rb) + log (rb + fb);
  double rse = sqrt (fa / (ra * (ra + fa)) + fb / (rb * (rb + fb)));
  if (rzero)
    add_ratio (results, "risk_ratio", "rr_ci_low", "rr_ci_high",
               _("Risk ratio θA/θB (0.5 added to every cell: a group has no successes)"),
               _("Risk ratio interval, lower (0.5 added to every cell)"),
               _("Risk ratio interval, upper (0.5 added to every cell)"), lrr, rse, z_level);
  else
    add_ratio (results, "risk_ratio", "rr_ci_low", "rr_ci_high", _("Risk ratio θA/θB"),
               _("Risk ratio interval, lower (Katz)"), _("Risk ratio interval, upper (Katz)"),
               lrr, rse, z_level);
}

/* The Bayes factors, from the posterior of the difference under the alternative bd
 * (ln P(θA − θB <= 0) lg0 and ln P(θA − θB >= 0) ls0 when post_ok). */
static void
add_bayes_factors (const TfAnalysis *analysis, gboolean post_ok, double lg0, double ls0,
                   const char *why_int, TfResults *results)
{
  const TfAnalysis *an = analysis;
  const double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
  const double a = an->prior_a, b = an->prior_b, pi0 = an->prior_null;
  const TfDirection dir = an->direction;

  double lbf01 = tf_two_proportions_log_bf01 (ka, na, kb, nb, a, b);
  if (dir != TF_DIRECTION_TWO_SIDED)
    lbf01 = post_ok ? lbf01 - G_LN2 - (dir == TF_DIRECTION_GREATER ? ls0 : lg0) : NAN;
  if (isfinite (lbf01))
    {
      tf_results_add (results, "bf10", _("Bayes factor BF10"), TF_MEASURE_BAYES_FACTOR, exp (-lbf01));
      tf_results_add (results, "bf01", _("Bayes factor BF01"), TF_MEASURE_BAYES_FACTOR, exp (lbf01));
      double lo = log (pi0) - log1p (-pi0) + lbf01;
      tf_results_add (results, "posterior_null", _("Posterior probability of the null"),
                      TF_MEASURE_POSTERIOR_PROBABILITY, tf_logistic (lo));
      tf_results_add (results, "posterior_alt", _("Posterior probability of the alternative"),
                      TF_MEASURE_POSTERIOR_PROBABILITY, tf_logistic (-lo));
    }
  else
    {
      const char *why = post_ok ? _("the posterior mass on the side of the alternative underflows, so the Bayes factor cannot be represented")
                                : why_int;
      tf_results_add_undefined (results, "bf10", _("Bayes factor BF10"), TF_MEASURE_BAYES_FACTOR, why);
      tf_results_add_undefined (results, "bf01", _("Bayes factor BF01"), TF_MEASURE_BAYES_FACTOR, why);
      tf_results_add_undefined (results, "posterior_null", _("Posterior probability of the null"),
                                TF_MEASURE_POSTERIOR_PROBABILITY, why);
      tf_results_add_undefined (results, "posterior_alt", _("Posterior probability of the alternative"),
                                TF_MEASURE_POSTERIOR_PROBABILITY, why);
    }
  tf_two_proportions_add_log_or_bf (analysis, results);
}

/* Equal-tailed credible interval for θA − θB, truncated to the side of a one-sided
 * alternative, and P(θA > θB) under the untruncated posterior. */
static void
add_credible (const TfAnalysis *an, TfBetaDiff *bd, gboolean post_ok, double lg0, double ls0,
              const char *why_int, TfResults *results)
{
  const TfDirection dir = an->direction;
  const double level = an->level;
  double alpha2 = 0.5 * (1.0 - level), clo = NAN, chi = NAN;
  if (post_ok)
    switch (dir)
      {
      case TF_DIRECTION_GREATER:
        clo = tf_beta_diff_quantile_log (bd, log1p (-alpha2) + ls0, FALSE);
        chi = tf_beta_diff_quantile_log (bd, log (alpha2) + ls0, FALSE);
        break;
      case TF_DIRECTION_LESS:
        clo = tf_beta_diff_quantile_log (bd, log (alpha2) + lg0, TRUE);
        chi = tf_beta_diff_quantile_log (bd, log1p (-alpha2) + lg0, TRUE);
        break;
      case TF_DIRECTION_TWO_SIDED:
      default:
        clo = tf_beta_diff_quantile_log (bd, log (alpha2), TRUE);
        chi = tf_beta_diff_quantile_log (bd, log (alpha2), FALSE);
        break;
      }
  if (isfinite (clo) && isfinite (chi))
    {
      tf_results_add (results, "cri_low", _("Credible interval for θA − θB, lower"),
                      TF_MEASURE_CREDIBLE_LIMIT, clo);
      tf_results_add (results, "cri_high", _("Credible interval for θA − θB, upper"),
                      TF_MEASURE_CREDIBLE_LIMIT, chi);
    }
  else
    {
      tf_results_add_undefined (results, "cri_low", _("Credible interval for θA − θB, lower"),
                                TF_MEASURE_CREDIBLE_LIMIT, why_int);
      tf_results_add_undefined (results, "cri_high", _("Credible interval for θA − θB, upper"),
                                TF_MEASURE_CREDIBLE_LIMIT, why_int);
    }
  /* Under the untruncated posteriors, whatever the direction. */
  if (post_ok)
    tf_results_add (results, "prob_greater", _("Posterior probability that θA > θB"),
                    TF_MEASURE_POSTERIOR_PROBABILITY, exp (ls0));
  else
    tf_results_add_undefined (results, "prob_greater", _("Posterior probability that θA > θB"),
                              TF_MEASURE_POSTERIOR_PROBABILITY, why_int);

}

/* Bounds: −e p ln p (Sellke, Bayarri & Berger 2001) from Fisher's p, and the likelihood
 * ratio at its maximum, exp(−G/2) (Edwards, Lindman & Savage 1963). */
static void
add_bounds (const TfAnalysis *an, double lp_fisher, double dev, TfResults *results)
{
  const TfDirection dir = an->direction;
  const double D = tf_two_proportions_cross (an->successes_a, an->trials_a, an->successes_b,
                                             an->trials_b);

  if (lp_fisher >= -1.0)
    tf_results_add (results, "min_bf01", _("Smallest BF01 from the p-value"), TF_MEASURE_BOUND, 1.0);
  else
    {
      double v = exp (1.0 + lp_fisher + log (-lp_fisher));
      if (v > 0.0)
        tf_results_add (results, "min_bf01", _("Smallest BF01 from the p-value"), TF_MEASURE_BOUND, v);
      else
        tf_results_add_undefined (results, "min_bf01", _("Smallest BF01 from the p-value"),
                                  TF_MEASURE_BOUND,
                                  _("the p-value is so small that the bound underflows to 0"));
    }
  double lr_bound = exp (-dev);
  if ((dir == TF_DIRECTION_GREATER && D <= 0.0) || (dir == TF_DIRECTION_LESS && D >= 0.0))
    lr_bound = 1.0;
  if (lr_bound > 0.0)
    tf_results_add (results, "min_bf01_lr", _("Smallest BF01 over all priors"), TF_MEASURE_BOUND, lr_bound);
  else
    tf_results_add_undefined (results, "min_bf01_lr", _("Smallest BF01 over all priors"),
                              TF_MEASURE_BOUND,
                              _("the likelihood ratio is so small that it underflows to 0"));
}

void
tf_two_proportions_compute (const TfAnalysis *analysis, TfResults *results)
{
  const TfAnalysis *an = analysis;
  const double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
  const double a = an->prior_a, b = an->prior_b;
  const double D = tf_two_proportions_cross (ka, na, kb, nb);

  tf_results_add (results, "estimate", _("Difference of proportions θA − θB"), TF_MEASURE_ESTIMATE,
                  D / na / nb);
  double lp_fisher = add_fisher (an, results);
  double dev = add_large_sample_tests (an, results);
  add_difference_interval (an, results);
  add_ratios (an, results);

  /* Bayes factors and the posterior of the difference under the alternative. */
  TfBetaDiff bd;
  double lg0, ls0;
  tf_beta_diff_init (&bd, ka + a, na - ka + b, kb + a, nb - kb + b);
  gboolean post_ok = tf_beta_diff_log_cdf (&bd, 0.0, &lg0, &ls0);
  const char *why_int = _("the integral over the posterior of the difference did not converge");
  add_bayes_factors (an, post_ok, lg0, ls0, why_int, results);
  add_credible (an, &bd, post_ok, lg0, ls0, why_int, results);
  add_bounds (an, lp_fisher, dev, results);
}
