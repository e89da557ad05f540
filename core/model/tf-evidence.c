/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-evidence.c: Bayes factors, posterior model probabilities and bounds, the same for
 * every design.
 */
#include "tf-evidence.h"
#include "tf-logspace.h"

#include <float.h>
#include <glib/gi18n-lib.h>
#include <math.h>

double
tf_posterior_null_from_log_bf01 (double log_bf01, double prior_null)
{
  return tf_logistic (log (prior_null) - log1p (-prior_null) + log_bf01);
}

double
tf_posterior_alt_from_log_bf01 (double log_bf01, double prior_null)
{
  return tf_logistic (-(log (prior_null) - log1p (-prior_null) + log_bf01));
}

void
tf_results_add_bayes_factors (TfResults *results, double log_bf01, double prior_null,
                              const char *why_not)
{
  const char *l10 = _("Bayes factor BF10"), *l01 = _("Bayes factor BF01");

  if (isfinite (log_bf01))
    {
      tf_results_add (results, "bf10", l10, TF_MEASURE_BAYES_FACTOR, exp (-log_bf01));
      tf_results_add (results, "bf01", l01, TF_MEASURE_BAYES_FACTOR, exp (log_bf01));
    }
  else
    {
      const char *why = why_not ? why_not
                        : _("the Bayes factor is beyond the range of numbers that can be represented");
      tf_results_add_undefined (results, "bf10", l10, TF_MEASURE_BAYES_FACTOR, why);
      tf_results_add_undefined (results, "bf01", l01, TF_MEASURE_BAYES_FACTOR, why);
    }
  if (isnan (log_bf01))
    {
      const char *why = _("the Bayes factor is not defined, so neither is the posterior probability");
      tf_results_add_undefined (results, "posterior_null", _("Posterior probability of the null"),
                                TF_MEASURE_POSTERIOR_PROBABILITY, why);
      tf_results_add_undefined (results, "posterior_alt", _("Posterior probability of the alternative"),
                                TF_MEASURE_POSTERIOR_PROBABILITY, why);
      return;
    }
  tf_results_add (results, "posterior_null", _("Posterior probability of the null"),
                  TF_MEASURE_POSTERIOR_PROBABILITY,
                  tf_posterior_null_from_log_bf01 (log_bf01, prior_null));
  tf_results_add (results, "posterior_alt", _("Posterior probability of the alternative"),
                  TF_MEASURE_POSTERIOR_PROBABILITY,
                  tf_posterior_alt_from_log_bf01 (log_bf01, prior_null));
}

void
tf_results_add_bounds (TfResults *results, double log_p, double log_lr)
{
  const char *label = _("Smallest BF01 from the p-value");
  const char *label_lr = _("Smallest BF01 over all priors");

  if (isnan (log_p))
    tf_results_add_undefined (results, "min_bf01", label, TF_MEASURE_BOUND,
                              _("the p-value is not defined"));
  else if (log_p >= -1.0)
    tf_results_add (results, "min_bf01", label, TF_MEASURE_BOUND, 1.0);
  else
    {
      double v = exp (1.0 + log_p + log (-log_p));

      if (v > 0.0)
        tf_results_add (results, "min_bf01", label, TF_MEASURE_BOUND, v);
      else
        tf_results_add_undefined (results, "min_bf01", label, TF_MEASURE_BOUND,
                                  _("the p-value is so small that the bound underflows to 0"));
    }

  if (isnan (log_lr))
    tf_results_add_undefined (results, "min_bf01_lr", label_lr, TF_MEASURE_BOUND,
                              _("the likelihood ratio is not defined"));
  else if (exp (MIN (log_lr, 0.0)) > 0.0)
    tf_results_add (results, "min_bf01_lr", label_lr, TF_MEASURE_BOUND, exp (MIN (log_lr, 0.0)));
  else
    tf_results_add_undefined (results, "min_bf01_lr", label_lr, TF_MEASURE_BOUND,
                              _("the likelihood ratio is so small that it underflows to 0"));
}

double
tf_finite_exp (double x)
{
  double v = exp (x);

  return isfinite (v) ? v : DBL_MAX;
}
