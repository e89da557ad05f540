/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-rate.c: k events over exposure E against λ = λ0, classical and Bayesian.
 *
 * The count is Poisson(λE). Classical: the exact test (minimum-likelihood rule), mid-p,
 * score, Garwood's interval. Bayesian: λ ~ Gamma(α, β) under the alternative (shape α,
 * rate β), posterior Gamma(α + k, β + E). An interval null [L, H] is tested by the
 * prior's and posterior's mass inside against outside it (on the chosen side).
 */
#include "tf-one-rate.h"
#include "tf-poisson.h"
#include "tf-incgamma.h"
#include "tf-rates.h"
#include "tf-evidence.h"
#include "tf-logspace.h"
#include "tf-normal-test.h"

#include <math.h>
#include <float.h>
#include <glib/gi18n-lib.h>

void
tf_one_rate_validate (const TfAnalysis *analysis, GPtrArray *problems)
{
  const TfAnalysis *a = analysis;

  tf_rates_check_count (problems, "Events", a->events);
  tf_rates_check_exposure (problems, "Exposure", a->exposure);
  if (a->null_kind == TF_NULL_INTERVAL)
    tf_rates_check_interval_null (a, problems, FALSE);
  else if (!(isfinite (a->null_value) && a->null_value > 0.0))
    g_ptr_array_add (problems,
                     tf_problem_new ("Null", "Value",
                                     _("The null rate (Value) must be a finite number above 0, in events per unit of exposure (it is %g)."),
                                     a->null_value));
  if (a->prior != TF_PRIOR_GAMMA)
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "Prior",
                                     _("The prior for a rate must be gamma (it is %s)."),
                                     tf_prior_family_to_string (a->prior)));
  tf_rates_check_prior (a, problems);
}

/* BF01 = Gamma(λ0; α + k, β + E) / Gamma(λ0; α, β), the posterior over the prior
 * density at λ0 (Dickey 1971: the Poisson probability of k over its Poisson–gamma
 * marginal). With Stirling's formula and Loader's deviance terms (Loader 2000),
 * ln BF01 = bd0(α, βλ0) − bd0(α + k, (β + E)λ0) + ½ ln((α + k)/α) + δ(α) − δ(α + k),
 * and by pooling the prior's α over β with the data's k over E the first two terms are
 * also H(α, β; k, E) − bd0(k, Eλ0), H the heterogeneity of the two. Each way cancels
 * where its terms are large, so the one whose largest term is smaller is taken: no
 * term is then much larger than ln BF01 itself, for k, α and E up to 10^12. */
double
tf_one_rate_log_bf01 (double k, double exposure, double lambda0, double shape, double rate)
{
  TfPoisSample prior = tf_pois_sample (shape, rate), data = tf_pois_sample (k, exposure);
  TfPoisSample post = prior;
  tf_pois_sample_add (&post, k, exposure, 1.0);
  double s0 = tf_pois_sample_bd0 (&prior, lambda0), s1 = tf_pois_sample_bd0 (&post, lambda0);
  double h = tf_pois_log_heterogeneity (&prior, &data);
  double d = tf_pois_sample_bd0 (&data, lambda0);
  double core = MAX (s0, s1) <= MAX (h, d) ? s0 - s1 : h - d;
  return core + 0.5 * log1p (k / shape) + tf_stirling_remainder (shape)
         - tf_stirling_remainder (shape + k);
}

/* λ ~ Gamma(param[0], param[1]) (shape, rate): regularised incomplete gammas. */
static void
gamma_log_tails (const double *param, double c, double *log_lower, double *log_upper)
{
  tf_gamma_inc_log_both (param[0], param[1] * c, log_lower, log_upper);
}

static double
gamma_quantile_log (const double *param, double log_p, gboolean lower)
{
  return tf_gamma_inc_inverse_log (log_p, param[0], lower) / param[1];
}

static const TfRatesFamily gamma_family = { gamma_log_tails, gamma_quantile_log };

/* The classical tests of one rate against the Poisson mean m = λ0 E, in log space. */
typedef struct {
  double lp_exact, lp_mid, lp_score, dev, z;
} RateTests;

static void
rate_tests (double k, double m, TfDirection dir, RateTests *t)
{
  double lpmf = tf_log_dpois (k, m);
  double d = k - m;

  t->z = d / sqrt (m);
  t->dev = tf_bd0_delta (k, m, d);                  /* G / 2 (Loader 2000) */
  switch (dir)
    {
    case TF_DIRECTION_GREATER:
      t->lp_exact = tf_pois_log_sf (k, m);
      /* mid-p (Lancaster 1961): P(X > k) + ½ P(X = k) */
      t->lp_mid = tf_log_add (tf_pois_log_sf (k + 1.0, m), lpmf - G_LN2);
      break;
    case TF_DIRECTION_LESS:
      t->lp_exact = tf_pois_log_cdf (k, m);
      t->lp_mid = tf_log_add (tf_pois_log_cdf (k - 1.0, m), lpmf - G_LN2);
      break;
    case TF_DIRECTION_TWO_SIDED:
    default:
      t->lp_exact = tf_pois_log_exact_two_sided (k, m);
      /* the exact p minus half the probability of the observed count (Lancaster 1961) */
      t->lp_mid = tf_log_sub (t->lp_exact, MIN (t->lp_exact, lpmf - G_LN2));
      break;
    }
  t->lp_score = tf_normal_test_log_p (t->z, dir);
}

/* ln BF01 in the analysis's hypotheses: point or interval null, side of the
 * alternative by truncation of the prior (ratios of incomplete gamma masses). */
static double
analysis_log_bf01 (const TfAnalysis *a, double shape, double rate, double k, double exposure)
{
  const double prior[] = { shape, rate }, post[] = { shape + k, rate + exposure };
  double l0 = a->null_value;
  double point = a->null_kind == TF_NULL_POINT
                 ? tf_one_rate_log_bf01 (k, exposure, l0, shape, rate) : NAN;
  return tf_rates_log_bf01 (a, &gamma_family, prior, post, point, l0);
}

void
tf_one_rate_compute (const TfAnalysis *analysis, TfResults *results)
{
  const TfAnalysis *a = analysis;
  const double k = a->events, E = a->exposure;
  const double alpha = a->prior_shape, beta = a->prior_rate;
  const double P = alpha + k, R = beta + E;
  const TfDirection dir = a->direction;
  gboolean inside;
  double lam = tf_rates_boundary (a, a->null_value, k, E, &inside);
  RateTests t;

  tf_results_add (results, "estimate", _("Observed rate"), TF_MEASURE_ESTIMATE, k / E);

  rate_tests (k, lam * E, dir, &t);
  tf_rates_add_p_values (results, inside, t.lp_exact, t.lp_mid, t.lp_score,
                         _("Exact Poisson p-value"));

  /* Garwood (1936), two-sided at level whatever the direction. */
  double lo, hi;
  tf_pois_garwood (k, a->level, &lo, &hi);
  tf_results_add (results, "ci_low", _("Confidence interval, lower"),
                  TF_MEASURE_CONFIDENCE_LIMIT, lo / E);
  tf_results_add (results, "ci_high", _("Confidence interval, upper"),
                  TF_MEASURE_CONFIDENCE_LIMIT, hi / E);

  double lbf01 = analysis_log_bf01 (a, alpha, beta, k, E);
  tf_results_add_bayes_factors (results, lbf01, a->prior_null,
                                _("the prior or posterior mass of a hypothesis underflows, so the Bayes factor cannot be represented"));

  /* The posterior under the alternative, truncated to its side for a one-sided one. */
  const double post[] = { P, R };
  tf_rates_add_posterior (results, a, &gamma_family, post, a->null_value,
                          _("Posterior probability that λ > λ0"),
                          _("Posterior probability that λ lies above the null interval"));

  /* L(λ0) / L(k/E) = exp(−G/2) (Edwards, Lindman & Savage 1963); 1 when the estimate
   * lies in the null or on its side. */
  gboolean null_side = inside || (dir == TF_DIRECTION_GREATER && k <= lam * E)
                       || (dir == TF_DIRECTION_LESS && k >= lam * E);
  tf_results_add_bounds (results, inside ? 0.0 : t.lp_exact, null_side ? 0.0 : -t.dev);
}

static double
gamma_quantile (double u, double s, double r, gboolean lower)
{
  return tf_gamma_inc_inverse_log (log (u), s, lower) / r;
}

void
tf_one_rate_densities (const TfAnalysis *analysis, TfDensityCurves *curves)
{
  const TfAnalysis *a = analysis;
  const double k = a->events, E = a->exposure;
  const double alpha = a->prior_shape, beta = a->prior_rate;
  const double P = alpha + k, R = beta + E;
  const guint np = curves->n;
  double nl = a->null_kind == TF_NULL_POINT ? a->null_value : a->null_low;
  double nh = a->null_kind == TF_NULL_POINT ? a->null_value : a->null_high;

  /* The posterior's central 1 − 1e-6 and the null. */
  double qlo = gamma_quantile (0.5e-6, P, R, TRUE), qhi = gamma_quantile (0.5e-6, P, R, FALSE);
  double lo = MIN (qlo, nl), hi = MAX (qhi, nh);
  /* Widen to the prior's central 99% unless the posterior would span < 3 steps. */
  double plo = MIN (lo, gamma_quantile (0.005, alpha, beta, TRUE));
  double phi = MAX (hi, gamma_quantile (0.005, alpha, beta, FALSE));
  if (isfinite (phi) && (qhi - qlo) * (np - 1) / (phi - plo) >= 3.0)
    {
      lo = plo;
      hi = phi;
    }
  if (!(hi > lo))
    {
      lo = lo * (1.0 - 1e-9);
      hi = hi * (1.0 + 1e-9);
    }
  if (!(lo > 0.0))
    lo = hi * 1e-9;
  curves->lo = lo;
  curves->hi = hi;
  double step = (hi - lo) / (np - 1);
  curves->posterior_narrow = sqrt (P) / R < 2.0 * step;
  for (guint i = 0; i < np; i++)
    {
      double x = i + 1 == np ? hi : lo + i * step;
      curves->x[i] = x;
      curves->prior[i] = tf_finite_exp (tf_log_dgamma (x, alpha, beta));
      curves->posterior[i] = tf_finite_exp (tf_log_dgamma (x, P, R));
      curves->likelihood[i] = tf_finite_exp (tf_log_dgamma (x, k + 1.0, E));
    }
  double mid = 0.5 * (nl + nh);
  curves->null_value = mid;
  curves->null_low = nl;
  curves->null_high = nh;
  curves->prior_at_null = tf_finite_exp (tf_log_dgamma (mid, alpha, beta));
  curves->posterior_at_null = tf_finite_exp (tf_log_dgamma (mid, P, R));
  curves->posterior_mode = P >= 1.0 ? (P - 1.0) / R : lo;
  curves->parameter_markup = g_strdup ("λ");
}

/* The Bayes factor at a curve's point: the count at exposure f E is λ0 f E +
 * z √(λ0 f E) (a real count; the Bayes factor's formula takes one), floored at 0 where
 * the exposure is too small to reach the observed score statistic. */
double
tf_one_rate_log_bf01_at (const TfAnalysis *a, const TfRatesPoint *at)
{
  double e = a->exposure * at->f, m = a->null_value * e;
  double k = isnan (at->z) ? a->events : MAX (0.0, m + at->z * sqrt (m));
  return analysis_log_bf01 (a, at->shape, at->rate, k, e);
}

/* x = exposure from 1e-2 to 1e6 times the observed, the score statistic held. */
gboolean
tf_one_rate_sample_size (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not)
{
  const TfAnalysis *a = analysis;
  RateTests t;

  if (!tf_rates_point_null (a, _("The sample-size curve holds the p-value against a point null; this analysis has an interval null."), why_not))
    return FALSE;
  double m = a->null_value * a->exposure;
  rate_tests (a->events, m, a->direction, &t);
  tf_rates_sample_size (a, curve, tf_one_rate_log_bf01_at, t.z, t.lp_score, a->exposure,
                        _("exposure <i>E</i> (score <i>z</i> held)"));
  return TRUE;
}

static double
log_pmf (double j, const double *mean)
{
  return tf_log_dpois (j, *mean);
}

/* Poisson(λ0 E) masses over its central outcomes. */
gboolean
tf_one_rate_null_distribution (const TfAnalysis *analysis, TfNullDistribution *dist,
                               char **why_not)
{
  const TfAnalysis *a = analysis;
  RateTests t;

  if (!tf_rates_point_null (a, _("The null distribution is drawn for a point null; this analysis has an interval null."), why_not))
    return FALSE;
  double m = a->null_value * a->exposure;
  if (!tf_rates_null_distribution (a, dist, m, sqrt (m), INFINITY, a->events, log_pmf, &m,
                                   _("events <i>k</i>"), why_not))
    return FALSE;
  rate_tests (a->events, m, a->direction, &t);
  dist->p_value = exp (t.lp_exact);
  return TRUE;
}

/* The sensitivity curve around one rate's own Bayes factor. */
gboolean
tf_one_rate_sensitivity (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not)
{
  tf_rates_sensitivity_of (analysis, curve, tf_one_rate_log_bf01_at);
  return TRUE;
}
