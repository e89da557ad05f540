/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-proportion.c: k successes in n trials against θ = θ0, classical and Bayesian.
 */
#include "tf-one-proportion.h"
#include "tf-curves.h"
#include "tf-binomial.h"
#include "tf-incbeta.h"
#include "tf-incbeta-private.h"
#include "tf-logspace.h"

#include <math.h>
#include <float.h>
#include <glib/gi18n-lib.h>
#include <gsl/gsl_cdf.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_sf_erf.h>

#define TF_MAX_TRIALS 1e15
#define TF_MAX_SHAPE 1e15

static gboolean
is_whole (double v)
{
  return isfinite (v) && v == floor (v);
}

void
tf_one_proportion_validate (const TfAnalysis *analysis, GPtrArray *problems)
{
  double n = analysis->trials, k = analysis->successes;
  gboolean n_ok = is_whole (n) && n >= 1.0 && n <= TF_MAX_TRIALS;

  if (!n_ok)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", "Trials",
                                     _("Trials (N) must be a whole number from 1 to 10^15 (it is %g)."),
                                     n));
  if (!is_whole (k) || k < 0.0)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", "Successes",
                                     _("Successes (K) must be a whole number of at least 0 (it is %g)."),
                                     k));
  else if (n_ok && k > n)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", "Successes",
                                     _("Successes (K) cannot exceed Trials (N): K is %.17g and N is %.17g."),
                                     k, n));

  if (analysis->null_kind == TF_NULL_INTERVAL)
    g_ptr_array_add (problems,
                     tf_problem_new ("Null", "Kind",
                                     _("Interval nulls are not available for one proportion yet; use a point null.")));
  else if (!(analysis->null_value > 0.0 && analysis->null_value < 1.0))
    g_ptr_array_add (problems,
                     tf_problem_new ("Null", "Value",
                                     _("The null proportion (Value) must lie strictly between 0 and 1 (it is %g)."),
                                     analysis->null_value));

  if (analysis->prior != TF_PRIOR_BETA)
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "Prior",
                                     _("The prior for one proportion must be beta (it is %s)."),
                                     tf_prior_family_to_string (analysis->prior)));
  if (!(analysis->prior_a > 0.0 && analysis->prior_a <= TF_MAX_SHAPE))
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "PriorA",
                                     _("The beta shape PriorA must be above 0 and at most 10^15 (it is %g)."),
                                     analysis->prior_a));
  if (!(analysis->prior_b > 0.0 && analysis->prior_b <= TF_MAX_SHAPE))
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "PriorB",
                                     _("The beta shape PriorB must be above 0 and at most 10^15 (it is %g)."),
                                     analysis->prior_b));
}

/* x − (x + y) θ computed without cancellation for whole k, n and real a, b:
 * (k − nθ) + (a − (a + b) θ). */
static double
count_minus_expected (double k, double n, double a, double b, double t, double u)
{
  return tf_incbeta_lambda (k, n - k, t, u) + tf_incbeta_lambda (a, b, t, u);
}

/* x1 y1 − x2 y2 with the rounding errors of both products recovered by fma
 * (Ogita, Rump & Oishi 2005, TwoProduct). */
static double
diff_of_products (double x1, double y1, double x2, double y2)
{
  double p1 = x1 * y1, p2 = x2 * y2;
  return (p1 - p2) + (fma (x1, y1, -p1) - fma (x2, y2, -p2));
}

/* bd0(c + h, (s + n) θ) − bd0(c, s θ) for a prior shape c that outweighs its count h:
 * c ln(1 + e) + h ln((c + h) / (S θ)) − (h − n θ), e = (h s − n c) / (S c), s = c + other,
 * S = s + n,
 * free of the cancellation between two large deviances (Loader 2000, rearranged). */
static double
bd0_change (double c, double other, double h, double n, double theta, double dh, double dch)
{
  double S = c + other + n;
  double e = diff_of_products (h, other, n - h, c) / (S * c);
  double l = fabs (e) < 0.5 ? log1p (e) : log1p (h / c) - log1p (n / (c + other));
  double r = dch / (S * theta);
  double lr = fabs (r) < 0.5 ? log1p (r) : log ((c + h) / (S * theta));
  return c * l + h * lr - dh;
}

/* ln BF01 for a point null against Beta(a, b), every ln Γ written by Stirling's formula
 * with its remainder so that it holds for huge counts and shapes (Loader 2000, deviance
 * form); where the prior outweighs the data (a + b >= n, or a shape >= its count), the
 * two deviances of that side are taken together so that a huge prior far from θ0 loses nothing either. */
double
tf_one_proportion_log_bf01 (double k, double n, double theta0, double a, double b)
{
  double t = theta0, u = 1.0 - theta0;
  double P = k + a, Q = n - k + b, S = n + a + b, s = a + b;
  double dP = count_minus_expected (k, n, a, b, t, u);   /* P − Sθ0 */
  double da = tf_incbeta_lambda (a, b, t, u);             /* a − sθ0 */
  double dk = tf_incbeta_lambda (k, n - k, t, u);         /* k − nθ0 */
  double side_a, side_b;

  if (s >= n || a >= k)
    side_a = -bd0_change (a, b, k, n, t, dk, dP);
  else
    side_a = -tf_bd0_delta (P, S * t, dP) + tf_bd0_delta (a, s * t, da);
  if (s >= n || b >= n - k)
    side_b = -bd0_change (b, a, n - k, n, u, -dk, -dP);
  else
    side_b = -tf_bd0_delta (Q, S * u, -dP) + tf_bd0_delta (b, s * u, -da);

  return side_a + side_b
         + 0.5 * (log (P) + log (Q) + log (s) - log (S) - log (a) - log (b))
         + tf_stirling_remainder (a) + tf_stirling_remainder (b)
         - tf_stirling_remainder (s) - tf_stirling_remainder (P)
         - tf_stirling_remainder (Q) + tf_stirling_remainder (S);
}

/* ln P(Z >= z) for the standard normal, ln(½ erfc(z/√2)), finite far into the tail
 * (GSL's log_erfc, Cody 1969 rational approximations). */
static double
log_normal_upper (double z)
{
  gsl_sf_result r;
  if (gsl_sf_log_erfc_e (z / G_SQRT2, &r) != GSL_SUCCESS)
    return NAN;
  return r.val - G_LN2;
}

/* A quantile u of Beta(P, Q) truncated to θ > θ0 (greater), θ < θ0 (less), or not
 * truncated (two-sided), through the log-space inverse. */
static double
posterior_quantile (double u, double P, double Q, double theta0, TfDirection direction)
{
  double l0, u0;

  switch (direction)
    {
    case TF_DIRECTION_GREATER:
      tf_incbeta_log_both (theta0, 1.0 - theta0, P, Q, &l0, &u0);
      return tf_incbeta_inverse_log (log1p (-u) + u0, P, Q, FALSE);
    case TF_DIRECTION_LESS:
      tf_incbeta_log_both (theta0, 1.0 - theta0, P, Q, &l0, &u0);
      return tf_incbeta_inverse_log (log (u) + l0, P, Q, TRUE);
    case TF_DIRECTION_TWO_SIDED:
    default:
      return u <= 0.5 ? tf_incbeta_inverse (u, P, Q, TRUE)
                      : tf_incbeta_inverse (1.0 - u, P, Q, FALSE);
    }
}

/* Mean of Beta(P, Q), truncated as above: P/S · (tail of Beta(P + 1, Q)) / (tail of
 * Beta(P, Q)) at θ0 (Johnson, Kotz & Balakrishnan 1995, §25.7). */
static double
posterior_mean (double P, double Q, double theta0, TfDirection direction)
{
  double mean = P / (P + Q);
  double l1, u1, l0, u0;

  if (direction == TF_DIRECTION_TWO_SIDED)
    return mean;
  tf_incbeta_log_both (theta0, 1.0 - theta0, P + 1.0, Q, &l1, &u1);
  tf_incbeta_log_both (theta0, 1.0 - theta0, P, Q, &l0, &u0);
  if (direction == TF_DIRECTION_GREATER)
    return mean * exp (u1 - u0);
  return mean * exp (l1 - l0);
}

void
tf_one_proportion_compute (const TfAnalysis *analysis, TfResults *results)
{
  const double k = analysis->successes, n = analysis->trials;
  const double t = analysis->null_value, u = 1.0 - t;
  const double a = analysis->prior_a, b = analysis->prior_b;
  const double level = analysis->level, pi0 = analysis->prior_null;
  const TfDirection dir = analysis->direction;
  const double P = k + a, Q = n - k + b;
  double lp_exact, lp_mid, lp_score, lp_lr;

  tf_results_add (results, "estimate", _("Observed proportion"), TF_MEASURE_ESTIMATE, k / n);

  /* Classical tests in the chosen direction. */
  double lpmf = tf_log_dbinom (k, n, t, u);
  double d = tf_incbeta_lambda (k, n - k, t, u);          /* k − nθ0, exactly */
  double dev = tf_bd0_delta (k, n * t, d) + tf_bd0_delta (n - k, n * u, -d); /* G / 2 */
  double z = d / sqrt (n * t * u);
  double r = (d < 0.0 ? -1.0 : 1.0) * sqrt (2.0 * dev);  /* signed root of G */

  switch (dir)
    {
    case TF_DIRECTION_GREATER:
      lp_exact = tf_binom_log_sf (k, n, t, u);
      /* mid-p (Lancaster 1961): P(X > k) + ½ P(X = k) */
      lp_mid = tf_log_add (tf_binom_log_sf (k + 1.0, n, t, u), lpmf - G_LN2);
      lp_score = log_normal_upper (z);
      lp_lr = log_normal_upper (r);
      break;
    case TF_DIRECTION_LESS:
      lp_exact = tf_binom_log_cdf (k, n, t, u);
      lp_mid = tf_log_add (tf_binom_log_cdf (k - 1.0, n, t, u), lpmf - G_LN2);
      lp_score = log_normal_upper (-z);
      lp_lr = log_normal_upper (-r);
      break;
    case TF_DIRECTION_TWO_SIDED:
    default:
      lp_exact = tf_binom_log_exact_two_sided (k, n, t);
      /* two-sided mid-p (Lancaster 1961, with the minimum-likelihood rule):
       * the exact p-value minus half the probability of the observed outcome */
      lp_mid = tf_log_sub (lp_exact, lpmf - G_LN2);
      /* 2 Φ(−|z|), from the upper tail */
      lp_score = G_LN2 + log_normal_upper (fabs (z));
      /* P(χ²₁ >= G) = erfc(√(G/2)) = erfc(√dev) */
      {
        gsl_sf_result er;
        lp_lr = gsl_sf_log_erfc_e (sqrt (dev), &er) == GSL_SUCCESS ? er.val : NAN;
      }
      break;
    }
  double p_value = exp (lp_exact);

  tf_results_add (results, "p_value", _("p-value (exact)"), TF_MEASURE_TAIL_PROBABILITY, p_value);
  tf_results_add (results, "p_value_exact", _("Exact binomial p-value"),
                  TF_MEASURE_TAIL_PROBABILITY, p_value);
  tf_results_add (results, "p_value_midp", _("Mid-p-value"), TF_MEASURE_TAIL_PROBABILITY,
                  MIN (exp (lp_mid), 1.0));
  tf_results_add (results, "p_value_score", _("Score test p-value"),
                  TF_MEASURE_TAIL_PROBABILITY, MIN (exp (lp_score), 1.0));
  tf_results_add (results, "p_value_lr", _("Likelihood-ratio test p-value"),
                  TF_MEASURE_TAIL_PROBABILITY, MIN (exp (lp_lr), 1.0));
  tf_results_add (results, "z", _("Score statistic z"), TF_MEASURE_STATISTIC, z);

  /* Clopper–Pearson, always the two-sided interval at level, whatever the direction
   * of the test: it is the interval people expect beside any of the three tests. */
  double ci_lo, ci_hi;
  tf_binom_clopper_pearson (k, n, level, &ci_lo, &ci_hi);
  tf_results_add (results, "ci_low", _("Confidence interval, lower"),
                  TF_MEASURE_CONFIDENCE_LIMIT, ci_lo);
  tf_results_add (results, "ci_high", _("Confidence interval, upper"),
                  TF_MEASURE_CONFIDENCE_LIMIT, ci_hi);

  /* Bayes factors. For a one-sided alternative the prior is Beta(a, b) truncated to
   * the side: BF10± = BF10 · P(side | data, H1) / P(side | H1). */
  double lbf01 = tf_one_proportion_log_bf01 (k, n, t, a, b);
  double post_l, post_u, prior_l, prior_u;
  tf_incbeta_log_both (t, u, P, Q, &post_l, &post_u);
  tf_incbeta_log_both (t, u, a, b, &prior_l, &prior_u);
  if (dir == TF_DIRECTION_GREATER)
    lbf01 += prior_u - post_u;
  else if (dir == TF_DIRECTION_LESS)
    lbf01 += prior_l - post_l;

  if (isfinite (lbf01))
    {
      tf_results_add (results, "bf10", _("Bayes factor BF10"), TF_MEASURE_BAYES_FACTOR, exp (-lbf01));
      tf_results_add (results, "bf01", _("Bayes factor BF01"), TF_MEASURE_BAYES_FACTOR, exp (lbf01));
    }
  else
    {
      const char *why = _("the posterior mass on the side of the alternative underflows, so the Bayes factor cannot be represented");
      tf_results_add_undefined (results, "bf10", _("Bayes factor BF10"), TF_MEASURE_BAYES_FACTOR, why);
      tf_results_add_undefined (results, "bf01", _("Bayes factor BF01"), TF_MEASURE_BAYES_FACTOR, why);
    }

  /* P(H0 | data) = logistic(logit π0 + ln BF01), each side from its own argument. */
  double lo = log (pi0) - log1p (-pi0) + lbf01;
  tf_results_add (results, "posterior_null", _("Posterior probability of the null"),
                  TF_MEASURE_POSTERIOR_PROBABILITY, tf_logistic (lo));
  tf_results_add (results, "posterior_alt", _("Posterior probability of the alternative"),
                  TF_MEASURE_POSTERIOR_PROBABILITY, tf_logistic (-lo));

  /* The posterior under the alternative. */
  double alpha2 = 0.5 * (1.0 - level);
  tf_results_add (results, "cri_low", _("Credible interval, lower"), TF_MEASURE_CREDIBLE_LIMIT,
                  posterior_quantile (alpha2, P, Q, t, dir));
  tf_results_add (results, "cri_high", _("Credible interval, upper"), TF_MEASURE_CREDIBLE_LIMIT,
                  posterior_quantile (1.0 - alpha2, P, Q, t, dir));
  tf_results_add (results, "posterior_mean", _("Posterior mean"), TF_MEASURE_ESTIMATE,
                  posterior_mean (P, Q, t, dir));
  tf_results_add (results, "posterior_median", _("Posterior median"), TF_MEASURE_ESTIMATE,
                  posterior_quantile (0.5, P, Q, t, dir));
  /* Under the untruncated Beta(k + a, n − k + b) posterior, whatever the direction. */
  tf_results_add (results, "prob_greater", _("Posterior probability that θ > θ0"),
                  TF_MEASURE_POSTERIOR_PROBABILITY, exp (post_u));

  /* Bounds. −e p ln p (Sellke, Bayarri & Berger 2001), from ln p. */
  if (lp_exact >= -1.0)
    tf_results_add (results, "min_bf01", _("Smallest BF01 from the p-value"), TF_MEASURE_BOUND, 1.0);
  else
    {
      double v = exp (1.0 + lp_exact + log (-lp_exact));
      if (v > 0.0)
        tf_results_add (results, "min_bf01", _("Smallest BF01 from the p-value"), TF_MEASURE_BOUND, v);
      else
        tf_results_add_undefined (results, "min_bf01", _("Smallest BF01 from the p-value"),
                                  TF_MEASURE_BOUND,
                                  _("the p-value is so small that the bound underflows to 0"));
    }
  /* L(θ0) / L(k/n) = exp(−G/2) (Edwards, Lindman & Savage 1963); for a one-sided
   * alternative the best θ on the side is θ0 itself when k/n lies on the null side. */
  double lr_bound = exp (-dev);
  if ((dir == TF_DIRECTION_GREATER && d <= 0.0) || (dir == TF_DIRECTION_LESS && d >= 0.0))
    lr_bound = 1.0;
  if (lr_bound > 0.0)
    tf_results_add (results, "min_bf01_lr", _("Smallest BF01 over all priors"), TF_MEASURE_BOUND, lr_bound);
  else
    tf_results_add_undefined (results, "min_bf01_lr", _("Smallest BF01 over all priors"),
                              TF_MEASURE_BOUND,
                              _("the likelihood ratio is so small that it underflows to 0"));

  /* Savage–Dickey density ratio (Dickey 1971), a check of bf01. */
  if (dir == TF_DIRECTION_TWO_SIDED)
    tf_results_add (results, "savage_dickey_bf01", _("Savage–Dickey BF01"), TF_MEASURE_BAYES_FACTOR,
                    exp (tf_log_dbeta (t, u, P, Q) - tf_log_dbeta (t, u, a, b)));
  else
    tf_results_add_undefined (results, "savage_dickey_bf01", _("Savage–Dickey BF01"),
                              TF_MEASURE_BAYES_FACTOR,
                              _("the density ratio is reported for the two-sided alternative only"));
}

static double
finite_exp (double l)
{
  double v = exp (l);
  return isfinite (v) ? v : DBL_MAX;
}

void
tf_one_proportion_densities (const TfAnalysis *analysis, TfDensityCurves *curves)
{
  const double k = analysis->successes, n = analysis->trials;
  const double t = analysis->null_value;
  const double a = analysis->prior_a, b = analysis->prior_b;
  const double P = k + a, Q = n - k + b, S = P + Q;
  const guint np = curves->n;

  /* The posterior's central 1 − 1e-6 and the null value, with a margin. */
  double qlo = tf_incbeta_inverse (0.5e-6, P, Q, TRUE);
  double qhi = tf_incbeta_inverse (0.5e-6, P, Q, FALSE);
  double lo = MIN (qlo, t), hi = MAX (qhi, t);
  double post_sd = sqrt (P * Q / (S * S * (S + 1.0)));
  double margin = 0.05 * (hi - lo);
  lo = MAX (0.0, lo - margin);
  hi = MIN (1.0, hi + margin);
  /* Widen to the prior's central 99% only while the posterior's central 99.9%
   * (about 6.6 sd) still spans a seventh of the range: a posterior drawn as a sliver
   * says less than the prior's shape adds. */
  double plo = MIN (lo, tf_incbeta_inverse (0.005, a, b, TRUE));
  double phi = MAX (hi, tf_incbeta_inverse (0.005, a, b, FALSE));
  if (6.6 * post_sd >= (phi - plo) / 7.0)
    {
      lo = plo;
      hi = phi;
    }
  if (!(hi > lo))
    {
      lo = MAX (0.0, lo - 1e-9);
      hi = MIN (1.0, hi + 1e-9);
    }
  curves->lo = lo;
  curves->hi = hi;
  double step = (hi - lo) / (np - 1);
  curves->posterior_narrow = post_sd < 2.0 * step;
  /* Mode of Beta(P, Q): (P − 1)/(S − 2) inside; at an end when a shape is at most 1;
   * U-shaped posteriors (both below 1) have no single mode: the mean stands in. */
  if (P > 1.0 && Q > 1.0)
    curves->posterior_mode = (k + (a - 1.0)) / (n + (a + b - 2.0));
  else if (P <= 1.0 && Q > 1.0)
    curves->posterior_mode = 0.0;
  else if (P > 1.0 && Q <= 1.0)
    curves->posterior_mode = 1.0;
  else
    curves->posterior_mode = P / S;

  for (guint i = 0; i < np; i++)
    {
      double x = i + 1 == np ? hi : lo + i * step;
      curves->x[i] = x;
      curves->prior[i] = finite_exp (tf_log_dbeta (x, 1.0 - x, a, b));
      curves->posterior[i] = finite_exp (tf_log_dbeta (x, 1.0 - x, P, Q));
      curves->likelihood[i] = finite_exp (tf_log_dbeta (x, 1.0 - x, k + 1.0, n - k + 1.0));
    }
  curves->null_value = t;
  curves->null_low = curves->null_high = t;
  curves->prior_at_null = finite_exp (tf_log_dbeta (t, 1.0 - t, a, b));
  curves->posterior_at_null = finite_exp (tf_log_dbeta (t, 1.0 - t, P, Q));
  curves->parameter_markup = g_strdup ("θ");
}
