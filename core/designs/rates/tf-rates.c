/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-rates.c: the checks, rows and curves the one-rate and two-rates designs share.
 */
#include "tf-rates.h"
#include "tf-evidence.h"
#include "tf-results.h"
#include "tf-logspace.h"
#include "tf-exact-test.h"

#include <math.h>
#include <glib/gi18n-lib.h>

#define TF_MAX_OUTCOMES 100001

void
tf_rates_defaults (TfAnalysis *analysis)
{
  analysis->null_value = 1.0;
  analysis->prior = TF_PRIOR_GAMMA;
}

void
tf_rates_check_count (GPtrArray *problems, const char *key, double v)
{
  if (!(isfinite (v) && v == floor (v)) || v < 0.0 || v > TF_RATES_MAX_COUNT)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", key,
                                     _("%s must be a whole number from 0 to 10^15 (it is %g)."),
                                     key, v));
}

void
tf_rates_check_exposure (GPtrArray *problems, const char *key, double v)
{
  if (!(isfinite (v) && v > 0.0))
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", key,
                                     _("%s must be a finite number above 0 (it is %g)."),
                                     key, v));
}

void
tf_rates_check_interval_null (const TfAnalysis *analysis, GPtrArray *problems,
                              gboolean ratio)
{
  const TfAnalysis *a = analysis;

  if (!(isfinite (a->null_low) && a->null_low > 0.0))
    g_ptr_array_add (problems,
                     tf_problem_new ("Null", "Low", ratio
                                     ? _("The lower end of the null interval (Low) must be a rate ratio above 0 (it is %g).")
                                     : _("The lower end of the null interval (Low) must be a rate above 0 (it is %g)."),
                                     a->null_low));
  else if (!(isfinite (a->null_high) && a->null_high > a->null_low))
    g_ptr_array_add (problems,
                     tf_problem_new ("Null", "High",
                                     _("The upper end of the null interval (High) must be finite and above Low (it is %g)."),
                                     a->null_high));
}

void
tf_rates_check_prior (const TfAnalysis *analysis, GPtrArray *problems)
{
  const TfAnalysis *a = analysis;

  if (!(a->prior_shape > 0.0 && a->prior_shape <= TF_RATES_MAX_COUNT))
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "PriorShape",
                                     _("The gamma shape PriorShape must be above 0 and at most 10^15 (it is %g)."),
                                     a->prior_shape));
  if (!(isfinite (a->prior_rate) && a->prior_rate > 0.0))
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "PriorRate",
                                     _("The gamma rate PriorRate must be a finite number above 0 (it is %g)."),
                                     a->prior_rate));
}

double
tf_rates_log_tail (const TfRatesFamily *family, const double *param, double c, gboolean upper)
{
  double l, u;
  family->log_tails (param, c, &l, &u);
  return upper ? u : l;
}

/* ln of the mass in (lo, hi), hi may be +inf, from the side where it is small
 * (Mächler 2012 for the differences). */
static double
log_mass (const TfRatesFamily *family, const double *param, double lo, double hi)
{
  double ll, ul, lh, uh;
  family->log_tails (param, lo, &ll, &ul);
  if (isinf (hi))
    return ul;
  family->log_tails (param, hi, &lh, &uh);
  if (ul <= lh)
    return tf_log_sub (ul, uh);
  return tf_log_sub (lh, ll);
}

double
tf_rates_log_bf01 (const TfAnalysis *analysis, const TfRatesFamily *family,
                   const double *prior, const double *post, double log_bf01_point, double c0)
{
  const TfAnalysis *a = analysis;
  const TfRatesFamily *f = family;

  if (a->null_kind == TF_NULL_POINT)
    {
      if (a->direction == TF_DIRECTION_TWO_SIDED)
        return log_bf01_point;
      gboolean up = a->direction == TF_DIRECTION_GREATER;
      return log_bf01_point + tf_rates_log_tail (f, prior, c0, up)
             - tf_rates_log_tail (f, post, c0, up);
    }
  double L = a->null_low, H = a->null_high, out_post, out_prior;
  double in = log_mass (f, post, L, H) - log_mass (f, prior, L, H);
  switch (a->direction)
    {
    case TF_DIRECTION_GREATER:
      out_post = tf_rates_log_tail (f, post, H, TRUE);
      out_prior = tf_rates_log_tail (f, prior, H, TRUE);
      break;
    case TF_DIRECTION_LESS:
      out_post = tf_rates_log_tail (f, post, L, FALSE);
      out_prior = tf_rates_log_tail (f, prior, L, FALSE);
      break;
    case TF_DIRECTION_TWO_SIDED:
    default:
      out_post = tf_log_add (tf_rates_log_tail (f, post, L, FALSE),
                             tf_rates_log_tail (f, post, H, TRUE));
      out_prior = tf_log_add (tf_rates_log_tail (f, prior, L, FALSE),
                              tf_rates_log_tail (f, prior, H, TRUE));
      break;
    }
  return in - (out_post - out_prior);
}

double
tf_rates_posterior_quantile (const TfRatesFamily *family, const double *post, double u,
                             double c, TfDirection dir)
{
  const TfRatesFamily *f = family;

  switch (dir)
    {
    case TF_DIRECTION_GREATER:
      return f->quantile (post, log1p (-u) + tf_rates_log_tail (f, post, c, TRUE), FALSE);
    case TF_DIRECTION_LESS:
      return f->quantile (post, log (u) + tf_rates_log_tail (f, post, c, FALSE), TRUE);
    case TF_DIRECTION_TWO_SIDED:
    default:
      return u <= 0.5 ? f->quantile (post, log (u), TRUE) : f->quantile (post, log1p (-u), FALSE);
    }
}

double
tf_rates_boundary (const TfAnalysis *analysis, double point, double num, double den,
                   gboolean *inside)
{
  const TfAnalysis *a = analysis;
  const double L = a->null_low, H = a->null_high;
  const gboolean below = num < L * den, above = num > H * den;

  *inside = FALSE;
  if (a->null_kind == TF_NULL_POINT)
    return point;
  switch (a->direction)
    {
    case TF_DIRECTION_GREATER:
      *inside = !above;
      return H;
    case TF_DIRECTION_LESS:
      *inside = !below;
      return L;
    case TF_DIRECTION_TWO_SIDED:
    default:
      *inside = !below && !above;
      return below ? L : H;
    }
}

void
tf_rates_add_p_values (TfResults *results, gboolean inside, double lp_exact, double lp_mid,
                       double lp_score, const char *exact_label)
{
  if (inside)
    lp_exact = lp_mid = lp_score = 0.0;
  tf_results_add (results, "p_value", _("p-value (exact)"), TF_MEASURE_TAIL_PROBABILITY,
                  exp (lp_exact));
  tf_results_add (results, "p_value_exact", exact_label, TF_MEASURE_TAIL_PROBABILITY,
                  exp (lp_exact));
  tf_results_add (results, "p_value_midp", _("Mid-p-value"), TF_MEASURE_TAIL_PROBABILITY,
                  MIN (exp (lp_mid), 1.0));
  tf_results_add (results, "p_value_score", _("Score test p-value"),
                  TF_MEASURE_TAIL_PROBABILITY, MIN (exp (lp_score), 1.0));
}

void
tf_rates_add_posterior (TfResults *results, const TfAnalysis *analysis,
                        const TfRatesFamily *family, const double *post, double point,
                        const char *point_label, const char *interval_label)
{
  const TfAnalysis *a = analysis;
  const gboolean is_point = a->null_kind == TF_NULL_POINT;
  double cut = is_point ? point : a->direction == TF_DIRECTION_LESS ? a->null_low : a->null_high;
  double alpha2 = 0.5 * (1.0 - a->level);

  tf_results_add (results, "cri_low", _("Credible interval, lower"), TF_MEASURE_CREDIBLE_LIMIT,
                  tf_rates_posterior_quantile (family, post, alpha2, cut, a->direction));
  tf_results_add (results, "cri_high", _("Credible interval, upper"), TF_MEASURE_CREDIBLE_LIMIT,
                  tf_rates_posterior_quantile (family, post, 1.0 - alpha2, cut, a->direction));
  tf_results_add (results, "prob_greater", is_point ? point_label : interval_label,
                  TF_MEASURE_POSTERIOR_PROBABILITY,
                  exp (tf_rates_log_tail (family, post, is_point ? point : a->null_high, TRUE)));
}

gboolean
tf_rates_point_null (const TfAnalysis *analysis, const char *why, char **why_not)
{
  if (analysis->null_kind == TF_NULL_POINT)
    return TRUE;
  *why_not = g_strdup (why);
  return FALSE;
}

/* The curve's point at the analysis's own prior and data. */
static void
set_chosen (const TfAnalysis *a, TfEvidenceCurve *curve, TfRatesLogBf01 log_bf01, double x)
{
  TfRatesPoint at = { a->prior_shape, a->prior_rate, 1.0, NAN };

  curve->x_log = TRUE;
  curve->chosen_x = x;
  curve->chosen_log_bf01 = log_bf01 (a, &at);
  curve->chosen_posterior_null = tf_posterior_null_from_log_bf01 (curve->chosen_log_bf01,
                                                                  a->prior_null);
}

void
tf_rates_sensitivity_of (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                         TfRatesLogBf01 log_bf01)
{
  const TfAnalysis *a = analysis;
  double mean = a->prior_shape / a->prior_rate;

  for (guint i = 0; i < curve->n; i++)
    {
      double s = tf_sensitivity_grid (i, curve->n);
      TfRatesPoint at = { s, s / mean, 1.0, NAN };
      curve->x[i] = s;
      curve->log_bf01[i] = log_bf01 (a, &at);
      curve->posterior_null[i] = tf_posterior_null_from_log_bf01 (curve->log_bf01[i], a->prior_null);
    }
  curve->x_markup = g_strdup (_("prior shape <i>α</i> (prior mean held)"));
  set_chosen (a, curve, log_bf01, a->prior_shape);
}

/* z holds P(Z >= z) = p, ln p = pz: by GSL's inverse, or below e^−700 by inverting
 * Q(z) ≈ φ(z)/z (common practice). */
void
tf_rates_sample_size (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                      TfRatesLogBf01 log_bf01, double z, double lp_score,
                      double x_scale, const char *x_markup)
{
  const TfAnalysis *a = analysis;

  if (!isfinite (z))
    z = 0.0;
  for (guint i = 0; i < curve->n; i++)
    {
      double f = pow (10.0, -2.0 + 8.0 * i / (curve->n - 1));
      TfRatesPoint at = { a->prior_shape, a->prior_rate, f, z };
      curve->x[i] = x_scale * f;
      curve->log_bf01[i] = log_bf01 (a, &at);
      curve->posterior_null[i] = tf_posterior_null_from_log_bf01 (curve->log_bf01[i], a->prior_null);
    }
  curve->x_markup = g_strdup (x_markup);
  set_chosen (a, curve, log_bf01, x_scale);
  curve->p_value = exp (MIN (lp_score, 0.0));
}

gboolean
tf_rates_null_distribution (const TfAnalysis *analysis, TfNullDistribution *dist,
                            double mean, double sd, double top, double observed,
                            TfRatesLogPmf log_pmf, const double *param,
                            const char *x_markup, char **why_not)
{
  const TfAnalysis *a = analysis;
  const double k = observed;
  double lo = MAX (0.0, floor (mean - 8.0 * sd - 5.0));
  double hi = MIN (top, ceil (mean + 8.0 * sd + 15.0));

  if (k >= lo - 0.25 * (hi - lo) && k < lo)
    lo = k;
  if (k <= hi + 0.25 * (hi - lo) && k > hi)
    hi = k;
  if (hi - lo + 1.0 > TF_MAX_OUTCOMES)
    {
      *why_not = g_strdup (_("The null distribution has too many likely outcomes to draw one by one."));
      return FALSE;
    }
  double ld = tf_exact_test_log_threshold (log_pmf (k, param));
  tf_null_distribution_allocate (dist, (guint) (hi - lo + 1.0));
  for (guint i = 0; i < dist->n; i++)
    {
      double j = lo + i;
      double l = log_pmf (j, param);
      dist->x[i] = j;
      dist->mass[i] = exp (l);
      dist->in_tail[i] = a->direction == TF_DIRECTION_GREATER ? j >= k
                         : a->direction == TF_DIRECTION_LESS ? j <= k : l <= ld;
    }
  dist->discrete = TRUE;
  dist->observed = k;
  dist->x_markup = g_strdup (x_markup);
  return TRUE;
}
