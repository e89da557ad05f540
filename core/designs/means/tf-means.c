/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means.c: validation and numbers shared by the one-mean, paired-means and
 * two-means designs.
 */
#include "tf-means.h"
#include "tf-evidence.h"
#include "tf-jzs.h"
#include "tf-noncentral-t.h"
#include "tf-logspace.h"
#include "tf-incbeta.h"

#include <math.h>
#include <glib/gi18n-lib.h>
#include <gsl/gsl_cdf.h>
#include <gsl/gsl_sf_gamma.h>

#define TF_MAX_N 1e12

void
tf_means_validate_sample (GPtrArray *problems, const char *n_key, const char *mean_key,
                          const char *sd_key, const char *values_key, gboolean from_values,
                          double n, double mean, double sd, double min_n,
                          gboolean sd_may_be_zero)
{
  if (from_values)
    {
      if (!(n >= min_n))
        g_ptr_array_add (problems,
                         tf_problem_new ("Data", values_key,
                                         _("%s needs at least %g values for a t test (it has %g)."),
                                         values_key, min_n, n));
      else if (!(isfinite (sd) && (sd > 0.0 || sd_may_be_zero)))
        g_ptr_array_add (problems,
                         tf_problem_new ("Data", values_key,
                                         _("The values in %s are all equal, so their SD is 0 and the t statistic is not defined."),
                                         values_key));
      else if (!isfinite (mean))
        g_ptr_array_add (problems,
                         tf_problem_new ("Data", values_key,
                                         _("The values in %s are too large to average."), values_key));
      return;
    }
  if (!(isfinite (n) && n == floor (n) && n >= min_n && n <= TF_MAX_N))
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", n_key,
                                     _("%s must be a whole number from %g to 10^12 (it is %g)."),
                                     n_key, min_n, n));
  if (!isfinite (mean))
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", mean_key, _("%s must be a finite number."), mean_key));
  if (!(isfinite (sd) && (sd > 0.0 || (sd_may_be_zero && sd == 0.0))))
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", sd_key,
                                     _("%s must be above 0 (it is %g)."), sd_key, sd));
}

void
tf_means_validate_common (const TfAnalysis *analysis, GPtrArray *problems)
{
  if (analysis->prior != TF_PRIOR_CAUCHY && analysis->prior != TF_PRIOR_NORMAL)
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "Prior",
                                     _("The prior on the effect δ must be cauchy or normal for a means design (it is %s)."),
                                     tf_prior_family_to_string (analysis->prior)));
  if (!(analysis->prior_scale > 0.0 && analysis->prior_scale <= 1e3))
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "PriorScale",
                                     _("PriorScale must be above 0 and at most 1000 (it is %g)."),
                                     analysis->prior_scale));
  if (!isfinite (analysis->null_value))
    g_ptr_array_add (problems,
                     tf_problem_new ("Null", "Value", _("The null value must be a finite number.")));
  if (analysis->null_kind == TF_NULL_INTERVAL)
    {
      if (!(isfinite (analysis->null_low) && isfinite (analysis->null_high)
            && analysis->null_low < analysis->null_high))
        g_ptr_array_add (problems,
                         tf_problem_new ("Null", "High",
                                         _("The interval null on δ needs Low below High (they are %g and %g)."),
                                         analysis->null_low, analysis->null_high));
      else if (analysis->null_low > 0.0 || analysis->null_high < 0.0)
        g_ptr_array_add (problems,
                         tf_problem_new ("Null", "Low",
                                         _("The interval null on δ must contain 0 (it is %g to %g).")
                                         , analysis->null_low, analysis->null_high));
      if (analysis->direction != TF_DIRECTION_TWO_SIDED)
        g_ptr_array_add (problems,
                         tf_problem_new ("Alternative", "Direction",
                                         _("An interval null is tested against the two-sided alternative only.")));
    }
}

/* ln of the prior mass of δ on [a, b]: Cauchy or normal distribution function. */
static double
log_prior_mass (const TfDeltaPrior *prior, double a, double b)
{
  double ua = a / prior->r, ub = b / prior->r;
  if (prior->prior == TF_PRIOR_NORMAL)
    {
      /* on the side where the tails are small */
      if (ua >= 0.0)
        return log (0.5 * erfc (ua / G_SQRT2) - 0.5 * erfc (ub / G_SQRT2));
      if (ub <= 0.0)
        return log (0.5 * erfc (-ub / G_SQRT2) - 0.5 * erfc (-ua / G_SQRT2));
      return log1p (-0.5 * erfc (-ua / G_SQRT2) - 0.5 * erfc (ub / G_SQRT2));
    }
  return log ((atan (ub) - atan (ua)) / G_PI);
}

double
tf_means_log_bf01 (const TfDeltaPrior *prior, double t, double n_eff, double df)
{
  return tf_means_log_bf01_with (prior, t, n_eff, df, NULL);
}

double
tf_means_log_bf01_with (const TfDeltaPrior *prior, double t, double n_eff, double df,
                        TfDeltaPosterior *post)
{
  if (!prior->interval && prior->direction == TF_DIRECTION_TWO_SIDED)
    return prior->prior == TF_PRIOR_NORMAL ? -tf_normal_prior_log_bf10 (t, n_eff, df, prior->r)
                                           : -tf_jzs_log_bf10 (t, n_eff, df, prior->r);
  if (!prior->interval)
    {
      int side = prior->direction == TF_DIRECTION_GREATER ? 1 : -1;
      return prior->prior == TF_PRIOR_NORMAL
             ? -tf_normal_prior_log_bf_one_sided (t, n_eff, df, prior->r, side)
             : -tf_jzs_log_bf_one_sided (t, n_eff, df, prior->r, side);
    }
  /* Interval null (Morey & Rouder 2011): both hypotheses truncate the same prior,
   * BF01 = [P(I | y) / P(I)] / [P(out | y) / P(out)]. */
  g_autoptr (TfDeltaPosterior) own = post == NULL ? tf_delta_posterior_new (prior, t, n_eff, df)
                                                  : NULL;
  if (post == NULL)
    post = own;
  double in = tf_delta_posterior_log_mass (post, prior->low, prior->high);
  double out = tf_delta_posterior_log_mass_outside (post, prior->low, prior->high);
  double pin = log_prior_mass (prior, prior->low, prior->high);
  double pout = tf_log1mexp (pin);
  return in - pin - out + pout;
}

/* P(T >= t) for t >= 0: ½ I_x(ν/2, ½), x = ν/(ν + t²), 1 − x = t²/(ν + t²) given
 * separately (Abramowitz & Stegun 1964, 26.5.27); the normal tail by erfc. */
static double
upper_tail (double t, double df)
{
  if (isinf (df))
    return 0.5 * erfc (t / G_SQRT2);
  if (t < 0.0)
    return 1.0 - upper_tail (-t, df);
  double s = df + t * t;
  return 0.5 * tf_incbeta_lower (df / s, t * t / s, 0.5 * df, 0.5);
}

double
tf_means_p_value (double t, double df, TfDirection direction)
{
  switch (direction)
    {
    case TF_DIRECTION_GREATER:
      return upper_tail (t, df);
    case TF_DIRECTION_LESS:
      return upper_tail (-t, df);
    case TF_DIRECTION_TWO_SIDED:
    default:
      return MIN (1.0, 2.0 * upper_tail (fabs (t), df));
    }
}

static double
quantile_upper (double alpha, double df)
{
  return isinf (df) ? gsl_cdf_ugaussian_Qinv (alpha) : gsl_cdf_tdist_Qinv (alpha, df);
}

static void
add_bf (TfResults *results, const char *id, const char *label, double lbf)
{
  if (isfinite (lbf) && isfinite (exp (lbf)) && exp (lbf) > 0.0)
    tf_results_add (results, id, label, TF_MEASURE_BAYES_FACTOR, exp (lbf));
  else
    tf_results_add_undefined (results, id, label, TF_MEASURE_BAYES_FACTOR,
                              _("the Bayes factor is too large or too small to be represented"));
}

/* Effect size: Cohen's d = t / √n_eff; Hedges's g = J(ν) d with
 * J(ν) = Γ(ν/2) / (√(ν/2) Γ((ν − 1)/2)) (Hedges 1981); the interval of δ at level
 * 1 − 2 alpha2. */
static void
add_effect_size (const TfMeansStats *s, double alpha2, TfResults *results)
{
  double d = s->t_delta / sqrt (s->n_eff);
  tf_results_add (results, "effect_size", _("Cohen's d"), TF_MEASURE_ESTIMATE, d);
  if (s->known_sd)
    tf_results_add (results, "hedges_g", _("Hedges's g"), TF_MEASURE_ESTIMATE, d);
  else if (s->df_delta > 1.0)
    {
      double lj = gsl_sf_lngamma (0.5 * s->df_delta) - gsl_sf_lngamma (0.5 * (s->df_delta - 1.0))
                  - 0.5 * log (0.5 * s->df_delta);
      tf_results_add (results, "hedges_g", _("Hedges's g"), TF_MEASURE_ESTIMATE, exp (lj) * d);
    }
  else
    tf_results_add_undefined (results, "hedges_g", _("Hedges's g"), TF_MEASURE_ESTIMATE,
                              _("the small-sample correction needs more than one degree of freedom"));
  /* CI of δ by inverting the noncentral t in λ (Steiger & Fouladi 1997); for a known SD
   * the normal interval. Past ν = 10^6 or |t| = 300 the Poisson series is too long and
   * the large-ν form λ = t ∓ z √(1 + t²/(2ν)) (Johnson & Welch 1940) is used. */
  double lam_lo, lam_hi;
  if (s->known_sd)
    {
      double z = gsl_cdf_ugaussian_Qinv (alpha2);
      lam_lo = s->t_delta - z;
      lam_hi = s->t_delta + z;
    }
  else if (s->df_delta > 1e6 || fabs (s->t_delta) > 300.0)
    {
      double z = gsl_cdf_ugaussian_Qinv (alpha2);
      double sp = sqrt (1.0 + s->t_delta * s->t_delta / (2.0 * s->df_delta));
      lam_lo = s->t_delta - z * sp;
      lam_hi = s->t_delta + z * sp;
    }
  else
    {
      lam_lo = tf_nct_ncp_for_cdf (s->t_delta, s->df_delta, 1.0 - alpha2);
      lam_hi = tf_nct_ncp_for_cdf (s->t_delta, s->df_delta, alpha2);
    }
  tf_results_add (results, "effect_ci_low", _("Effect size interval, lower"),
                  TF_MEASURE_CONFIDENCE_LIMIT, lam_lo / sqrt (s->n_eff));
  tf_results_add (results, "effect_ci_high", _("Effect size interval, upper"),
                  TF_MEASURE_CONFIDENCE_LIMIT, lam_hi / sqrt (s->n_eff));
}

void
tf_means_compute (const TfAnalysis *analysis, const TfMeansStats *s, TfResults *results)
{
  const double level = analysis->level, alpha2 = 0.5 * (1.0 - level);
  const TfDirection dir = analysis->direction;
  TfDeltaPrior prior;
  double p_value = tf_means_p_value (s->t, s->df, dir);

  tf_delta_prior_from_analysis (analysis, &prior);
  tf_results_add (results, "estimate", s->two_samples || analysis->design == TF_DESIGN_PAIRED_MEANS
                  ? _("Observed difference") : _("Observed mean"),
                  TF_MEASURE_ESTIMATE, s->estimate);
  double q = quantile_upper (alpha2, s->df);
  tf_results_add (results, "ci_low", _("Confidence interval, lower"), TF_MEASURE_CONFIDENCE_LIMIT,
                  s->estimate - q * s->se);
  tf_results_add (results, "ci_high", _("Confidence interval, upper"), TF_MEASURE_CONFIDENCE_LIMIT,
                  s->estimate + q * s->se);
  if (s->known_sd)
    tf_results_add (results, "z", _("z statistic"), TF_MEASURE_STATISTIC, s->t);
  else
    {
      tf_results_add (results, "t", _("t statistic"), TF_MEASURE_STATISTIC, s->t);
      tf_results_add (results, "df", _("Degrees of freedom"), TF_MEASURE_STATISTIC, s->df);
    }
  tf_results_add (results, "p_value", s->known_sd ? _("p-value (z test)") : _("p-value (t test)"),
                  TF_MEASURE_TAIL_PROBABILITY, p_value);
  if (s->two_samples)
    {
      tf_results_add (results, "p_value_student", _("p-value (Student)"),
                      TF_MEASURE_TAIL_PROBABILITY, s->p_student);
      tf_results_add (results, "p_value_welch", _("p-value (Welch)"),
                      TF_MEASURE_TAIL_PROBABILITY, s->p_welch);
    }

  add_effect_size (s, alpha2, results);

  /* Bayes factors on δ; the posterior of δ under the alternative (untruncated prior) */
  g_autoptr (TfDeltaPosterior) post = tf_delta_posterior_new (&prior, s->t_delta, s->n_eff,
                                                              s->df_delta);
  double lbf01 = tf_means_log_bf01_with (&prior, s->t_delta, s->n_eff, s->df_delta, post);
  tf_results_add_bayes_factors (results, lbf01, analysis->prior_null, NULL);
  TfDeltaPrior other = prior;
  other.prior = prior.prior == TF_PRIOR_CAUCHY ? TF_PRIOR_NORMAL : TF_PRIOR_CAUCHY;
  if (other.prior == TF_PRIOR_NORMAL)
    add_bf (results, "bf01_normal", _("BF01 with a normal prior"),
            tf_means_log_bf01 (&other, s->t_delta, s->n_eff, s->df_delta));
  else
    add_bf (results, "bf01_jzs", _("BF01 with the JZS (Cauchy) prior"),
            tf_means_log_bf01 (&other, s->t_delta, s->n_eff, s->df_delta));

  /* its limits truncated to the side when one-sided */
  double a = dir == TF_DIRECTION_GREATER ? 0.0 : -INFINITY;
  double b = dir == TF_DIRECTION_LESS ? 0.0 : INFINITY;
  double cri_lo = tf_delta_posterior_quantile (post, alpha2, a, b);
  double cri_hi = tf_delta_posterior_quantile (post, 1.0 - alpha2, a, b);
  double hdi_lo, hdi_hi;
  tf_delta_posterior_hdi (post, level, a, b, &hdi_lo, &hdi_hi);
  tf_results_add (results, "cri_low", _("Credible interval of δ, lower"), TF_MEASURE_CREDIBLE_LIMIT, cri_lo);
  tf_results_add (results, "cri_high", _("Credible interval of δ, upper"), TF_MEASURE_CREDIBLE_LIMIT, cri_hi);
  tf_results_add (results, "hdi_low", _("Highest-density interval of δ, lower"), TF_MEASURE_CREDIBLE_LIMIT, hdi_lo);
  tf_results_add (results, "hdi_high", _("Highest-density interval of δ, upper"), TF_MEASURE_CREDIBLE_LIMIT, hdi_hi);
  /* untruncated posterior, whatever the direction */
  tf_results_add (results, "prob_greater", _("Posterior probability that δ > 0"),
                  TF_MEASURE_POSTERIOR_PROBABILITY,
                  exp (tf_delta_posterior_log_mass (post, 0.0, INFINITY)));

  /* Bounds: −e p ln p (Sellke, Bayarri & Berger 2001); the likelihood ratio at the
   * maximum (Edwards, Lindman & Savage 1963) in its generalised-likelihood-ratio form
   * (1 + t²/ν)^(−n/2), n the number of observations, or exp(−z²/2) with a known SD. */
  double llr = s->known_sd ? -0.5 * s->t * s->t
               : -0.5 * s->n_total * log1p (s->t * s->t / s->df);
  if ((dir == TF_DIRECTION_GREATER && s->t <= 0.0) || (dir == TF_DIRECTION_LESS && s->t >= 0.0))
    llr = 0.0;
  tf_results_add_bounds (results, log (p_value), llr);
}
