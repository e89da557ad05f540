/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-rates.c: two Poisson counts over exposures, the rate ratio ρ = λA/λB.
 *
 * Classical: given the total n = kA + kB, kA is Binomial(n, π) with
 * π = ρ EA / (ρ EA + EB) (Przyborowski & Wilenski 1940), so the exact test, mid-p and
 * score test are binomial ones and the interval is Clopper–Pearson's for π carried to ρ.
 * Bayesian: H0 λA = ρ0 λ, λB = λ with λ ~ Gamma(α, β) (ρ0 = 1: a common rate) against
 * independent λA, λB ~ Gamma(α, β); the Bayes factor is in closed form. Under the
 * alternative, ρ rA / rB is beta-prime, so its intervals and tails are incomplete betas.
 *
 * [Null] Value is the null ratio. Its default, 0, cannot be a ratio: it is read as
 * "no difference", ρ0 = 1 (DEVELOPERS.md: two-sample nulls are A = B unless Value says
 * otherwise).
 */
#include "tf-two-rates.h"
#include "tf-poisson.h"
#include "tf-rates.h"
#include "tf-binomial.h"
#include "tf-incbeta.h"
#include "tf-evidence.h"
#include "tf-logspace.h"
#include "tf-normal-test.h"

#include <math.h>
#include <float.h>
#include <glib/gi18n-lib.h>
double
tf_two_rates_null_ratio (const TfAnalysis *analysis)
{
  return analysis->null_value == 0.0 ? 1.0 : analysis->null_value;
}

void
tf_two_rates_validate (const TfAnalysis *analysis, GPtrArray *problems)
{
  const TfAnalysis *a = analysis;

  tf_rates_check_count (problems, "EventsA", a->events_a);
  tf_rates_check_exposure (problems, "ExposureA", a->exposure_a);
  tf_rates_check_count (problems, "EventsB", a->events_b);
  tf_rates_check_exposure (problems, "ExposureB", a->exposure_b);
  if (a->null_kind == TF_NULL_INTERVAL)
    tf_rates_check_interval_null (a, problems, TRUE);
  else if (!(isfinite (a->null_value) && a->null_value >= 0.0))
    g_ptr_array_add (problems,
                     tf_problem_new ("Null", "Value",
                                     _("The null rate ratio (Value) must be a finite number above 0, or 0 for “no difference” (it is %g)."),
                                     a->null_value));
  if (a->prior != TF_PRIOR_GAMMA)
    g_ptr_array_add (problems,
                     tf_problem_new ("Alternative", "Prior",
                                     _("The prior for rates must be gamma (it is %s)."),
                                     tf_prior_family_to_string (a->prior)));
  tf_rates_check_prior (a, problems);
}

/* π = ρ EA / (ρ EA + EB) and 1 − π, each from its own numerator. */
static void
pi_of_ratio (double rho, double ea, double eb, double *p, double *q)
{
  double s = rho * ea + eb;
  *p = rho * ea / s;
  *q = eb / s;
}

/* The shift of pooling group A's data into the null's prior instead of its own:
 * X = kA ln ρ0 + (α + kA) ln((β + EA) / (β + ρ0 EA)), each log from its small side;
 * *size is the larger of its two terms. */
static double
prior_shift (double ka, double ea, double rho0, double shape, double rate, double *size)
{
  double a = shape + ka, u = log (rho0), t1, t2;
  if (rate <= ea)
    {
      t1 = -shape * u;
      t2 = -a * log1p ((1.0 - rho0) / rho0 * (rate / (rate + ea)));
    }
  else
    {
      t1 = ka * u;
      t2 = -a * log1p ((rho0 - 1.0) * (ea / (rate + ea)));
    }
  *size = MAX (fabs (t1), fabs (t2));
  return t1 + t2;
}

/* BF01 = Γ(α + n) Γ(α) / (Γ(α + kA) Γ(α + kB)) · ρ0^kA β^−α (β + EA)^(α + kA)
 * (β + EB)^(α + kB) / (β + ρ0 EA + EB)^(α + n), n = kA + kB: the common-rate marginal
 * over the product of the two Poisson–gamma ones (Greenwood & Yule 1920). With
 * Stirling's formula its powers are the mixed difference F(P + A + D) − F(P + A) −
 * F(P + D) + F(P) of F(x, m) = x ln(x/m) over samples (x events over exposure m): the
 * prior P = (α, ρ0 β) on group B's scale, A = (kA, ρ0 EA), D = (kB, EB + (1 − ρ0) β).
 * By pooling, in Loader's deviance terms (Loader 2000), it is H(P, A) − H(P + D, A),
 * H the heterogeneity of two samples (tf_pois_log_heterogeneity): how much more group
 * A disagrees with B's posterior than with the prior; or, where D is a sample,
 * H(P, D) − H(P + A, D); or H(α, β; kB, EB) − H(α + kA, β + ρ0 EA; kB, EB) + X
 * (X = prior_shift, 0 when ρ0 = 1). The way whose largest term is smallest is taken,
 * so that no term is much larger than ln BF01. Counts may be real. */
double
tf_two_rates_log_bf01 (double ka, double ea, double kb, double eb, double rho0,
                       double shape, double rate)
{
  double a = shape + ka, b = shape + kb, s = a + kb, size;
  TfPoisSample prior = tf_pois_sample (shape, rate), db = tf_pois_sample (kb, eb);
  TfPoisSample p = tf_pois_sample (shape, 0.0), da = tf_pois_sample (0.0, 0.0);
  tf_pois_sample_add (&p, 0.0, rate, rho0);
  tf_pois_sample_add (&da, ka, ea, rho0);
  TfPoisSample pa = p, pd = prior, d = db;
  tf_pois_sample_add (&pa, ka, ea, rho0);
  tf_pois_sample_add (&pd, kb, eb, 1.0);
  tf_pois_sample_add (&d, 0.0, rate, 1.0 - rho0);
  double cost, c;
  double core = tf_pois_log_heterogeneity_change (&p, &pd, &da, &cost);
  if (d.m + d.m_lo > 0.0)
    {
      double v = tf_pois_log_heterogeneity_change (&p, &pa, &d, &c);
      if (c < cost)
        {
          cost = c;
          core = v;
        }
    }
  TfPoisSample qa = prior;
  tf_pois_sample_add (&qa, ka, ea, rho0);
  double v = tf_pois_log_heterogeneity_change (&prior, &qa, &db, &c);
  double x = rho0 == 1.0 ? (size = 0.0) : prior_shift (ka, ea, rho0, shape, rate, &size);
  if (MAX (c, size) < cost)
    core = v + x;
  /* −½ ln(s α / (a b)) and the Stirling remainders */
  return core + 0.5 * (log1p (ka / shape) - log1p (ka / b))
         + tf_stirling_remainder (shape) + tf_stirling_remainder (s)
         - tf_stirling_remainder (a) - tf_stirling_remainder (b);
}

/* W = ra λA / (ra λA + rb λB) ~ Beta(sa, sb); ρ = (rb / ra) W / (1 − W), with W and
 * 1 − W each inverted on its own side so that neither loses digits. */
double
tf_two_rates_ratio_quantile_log (double log_p, double sa, double ra, double sb, double rb,
                                 gboolean lower)
{
  if (log_p > -G_LN2)
    {
      /* invert the other tail, the one that is small */
      log_p = tf_log1mexp (log_p);
      lower = !lower;
    }
  double w = tf_incbeta_inverse_log (log_p, sa, sb, lower);
  double v = tf_incbeta_inverse_log (log_p, sb, sa, !lower);
  if (v == 0.0)
    return INFINITY;
  return rb / ra * w / v;
}

/* ρ when ra ρ / rb is beta-prime(sa, sb), param = { sa, ra, sb, rb }: incomplete betas
 * at w = ra c / (ra c + rb), w and 1 − w each from its own numerator. */
static void
ratio_log_tails (const double *param, double c, double *log_lower, double *log_upper)
{
  double d = param[1] * c + param[3];
  tf_incbeta_log_both (param[1] * c / d, param[3] / d, param[0], param[2], log_lower, log_upper);
}

static double
ratio_quantile_log (const double *param, double log_p, gboolean lower)
{
  return tf_two_rates_ratio_quantile_log (log_p, param[0], param[1], param[2], param[3], lower);
}

static const TfRatesFamily ratio_family = { ratio_log_tails, ratio_quantile_log };

/* ln BF01 in the analysis's hypotheses, for prior (s, r) and counts (ka, kb) over
 * exposures (ea, eb); an interval null by the independent model's prior and posterior
 * masses, inside against the side(s) of the alternative. */
/* ln BF01 is computed to 1e-9 while the prior's mean rate s / r stays within 10^12, the
 * cross-check's range; beyond it the pooled deviance terms outgrow what a double keeps
 * (errors up to 1e-4 at a prior mean of 10^18), so no factor is given there. */
#define TF_TWO_RATES_MAX_PRIOR_MEAN 1e12
#define TF_TWO_RATES_PRIOR_TOO_LARGE \
  _("the prior's mean rate (PriorShape ÷ PriorRate) is above 10^12, beyond the range where this Bayes factor is computed to full accuracy")

gboolean
tf_two_rates_prior_in_range (const TfAnalysis *analysis, char **why_not)
{
  if (analysis->prior_shape / analysis->prior_rate <= TF_TWO_RATES_MAX_PRIOR_MEAN)
    return TRUE;
  if (why_not)
    *why_not = g_strdup_printf (_("The Bayes factor is not defined: %s."), TF_TWO_RATES_PRIOR_TOO_LARGE);
  return FALSE;
}

static double
analysis_log_bf01 (const TfAnalysis *a, double s, double r, double ka, double ea, double kb,
                   double eb)
{
  if (!(s / r <= TF_TWO_RATES_MAX_PRIOR_MEAN))
    return NAN;
  const double prior[] = { s, r, s, r }, post[] = { s + ka, r + ea, s + kb, r + eb };
  double rho0 = tf_two_rates_null_ratio (a);
  double point = a->null_kind == TF_NULL_POINT
                 ? tf_two_rates_log_bf01 (ka, ea, kb, eb, rho0, s, r) : NAN;
  return tf_rates_log_bf01 (a, &ratio_family, prior, post, point, rho0);
}

typedef struct {
  double lp_exact, lp_mid, lp_score, dev;
} SplitTests;

/* The conditional binomial tests of kA out of n against π0 (q0 = 1 − π0). */
static void
split_tests (double ka, double n, double p0, double q0, TfDirection dir, SplitTests *t)
{
  if (n == 0.0)
    {
      *t = (SplitTests) { 0.0, 0.0, 0.0, 0.0 };
      return;
    }
  double kb = n - ka;
  double lpmf = tf_log_dbinom (ka, n, p0, q0);
  double d = p0 <= q0 ? ka - n * p0 : n * q0 - kb;          /* kA − nπ0 */
  double z = d / sqrt (n * p0 * q0);

  t->dev = tf_bd0_delta (ka, n * p0, d) + tf_bd0_delta (kb, n * q0, -d);
  switch (dir)
    {
    case TF_DIRECTION_GREATER:
      t->lp_exact = tf_binom_log_sf (ka, n, p0, q0);
      /* mid-p (Lancaster 1961) */
      t->lp_mid = tf_log_add (tf_binom_log_sf (ka + 1.0, n, p0, q0), lpmf - G_LN2);
      break;
    case TF_DIRECTION_LESS:
      t->lp_exact = tf_binom_log_cdf (ka, n, p0, q0);
      t->lp_mid = tf_log_add (tf_binom_log_cdf (ka - 1.0, n, p0, q0), lpmf - G_LN2);
      break;
    case TF_DIRECTION_TWO_SIDED:
    default:
      t->lp_exact = tf_binom_log_exact_two_sided (ka, n, p0);
      t->lp_mid = tf_log_sub (t->lp_exact, MIN (t->lp_exact, lpmf - G_LN2));
      break;
    }
  t->lp_score = tf_normal_test_log_p (z, dir);
}

void
tf_two_rates_compute (const TfAnalysis *analysis, TfResults *results)
{
  const TfAnalysis *a = analysis;
  const double ka = a->events_a, ea = a->exposure_a, kb = a->events_b, eb = a->exposure_b;
  const double n = ka + kb, s = a->prior_shape, r = a->prior_rate;
  const double sa = s + ka, sb = s + kb, ra = r + ea, rb = r + eb;
  const double post[] = { sa, ra, sb, rb };
  const TfDirection dir = a->direction;
  gboolean inside;
  /* every p-value is 1 with no events */
  double rho = tf_rates_boundary (a, tf_two_rates_null_ratio (a), ka * eb, kb * ea, &inside);
  double p0, q0;
  inside = inside || n == 0.0;
  SplitTests t;

  if (kb > 0.0)
    tf_results_add (results, "estimate", _("Observed rate ratio"), TF_MEASURE_ESTIMATE,
                    (ka / ea) / (kb / eb));
  else
    tf_results_add_undefined (results, "estimate", _("Observed rate ratio"), TF_MEASURE_ESTIMATE,
                              _("group B has no events, so the observed ratio is not finite"));

  pi_of_ratio (rho, ea, eb, &p0, &q0);
  split_tests (ka, n, p0, q0, dir, &t);
  tf_rates_add_p_values (results, inside, t.lp_exact, t.lp_mid, t.lp_score,
                         _("Exact conditional p-value"));

  /* Clopper–Pearson for π carried to ρ = (EB / EA) π / (1 − π), π and 1 − π each
   * inverted on its own side. */
  double la2 = log (0.5 * (1.0 - a->level));
  if (ka > 0.0)
    tf_results_add (results, "ci_low", _("Confidence interval, lower"), TF_MEASURE_CONFIDENCE_LIMIT,
                    eb / ea * tf_incbeta_inverse_log (la2, ka, kb + 1.0, TRUE)
                    / tf_incbeta_inverse_log (la2, kb + 1.0, ka, FALSE));
  else
    tf_results_add (results, "ci_low", _("Confidence interval, lower"), TF_MEASURE_CONFIDENCE_LIMIT, 0.0);
  if (kb > 0.0)
    tf_results_add (results, "ci_high", _("Confidence interval, upper"), TF_MEASURE_CONFIDENCE_LIMIT,
                    eb / ea * tf_incbeta_inverse_log (la2, ka + 1.0, kb, FALSE)
                    / tf_incbeta_inverse_log (la2, kb, ka + 1.0, TRUE));
  else
    tf_results_add_undefined (results, "ci_high", _("Confidence interval, upper"),
                              TF_MEASURE_CONFIDENCE_LIMIT,
                              _("group B has no events, so the data set no upper limit on the ratio"));

  double lbf01 = analysis_log_bf01 (a, s, r, ka, ea, kb, eb);
  tf_results_add_bayes_factors (results, lbf01, a->prior_null,
                                s / r > TF_TWO_RATES_MAX_PRIOR_MEAN
                                ? TF_TWO_RATES_PRIOR_TOO_LARGE
                                : _("the prior or posterior mass of a hypothesis underflows, so the Bayes factor cannot be represented"));

  tf_rates_add_posterior (results, a, &ratio_family, post, tf_two_rates_null_ratio (a),
                          _("Posterior probability that λA/λB > ρ0"),
                          _("Posterior probability that λA/λB lies above the null interval"));

  /* The conditional likelihood ratio at its maximum, exp(−G/2), equal to the profile
   * likelihood ratio of the two Poisson counts (Edwards, Lindman & Savage 1963); 1 when
   * the estimate lies in the null or on its side. */
  gboolean null_side = inside || (dir == TF_DIRECTION_GREATER && ka <= n * p0)
                       || (dir == TF_DIRECTION_LESS && ka >= n * p0);
  tf_results_add_bounds (results, inside ? 0.0 : t.lp_exact, null_side ? 0.0 : -t.dev);
}

/* ln density of l = ln ρ when c ρ is beta-prime(sa, sb): with w = c ρ / (1 + c ρ),
 * it is ln[w^sa (1 − w)^sb / B(sa, sb)] = ln dbeta(w) + ln w + ln(1 − w). */
static double
log_density_log_ratio (double l, double sa, double sb, double log_c)
{
  double t = l + log_c;
  double w = tf_logistic (t), y = tf_logistic (-t);
  double e = log1p (exp (-fabs (t)));          /* ln(1 + e^−|t|) */
  double lw = t > 0.0 ? -e : t - e, ly = t > 0.0 ? -t - e : -e;
  return tf_log_dbeta (w, y, sa, sb) + lw + ly;
}

static double
log_ratio_quantile (double u, double sa, double ra, double sb, double rb)
{
  return log (tf_two_rates_ratio_quantile_log (log (u), sa, ra, sb, rb, TRUE));
}

/* x = l = ln(λA/λB). Prior: λA, λB ~ Gamma(α, β), so ρ is beta-prime(α, α); posterior
 * beta-prime(α + kA, α + kB) scaled by RB/RA; the likelihood, normalised over l, is
 * that of Beta(kA, kB) carried to l when both counts are positive, and normalised
 * numerically over the range shown otherwise. */
void
tf_two_rates_densities (const TfAnalysis *analysis, TfDensityCurves *curves)
{
  const TfAnalysis *a = analysis;
  const double ka = a->events_a, ea = a->exposure_a, kb = a->events_b, eb = a->exposure_b;
  const double s = a->prior_shape, r = a->prior_rate;
  const double sa = s + ka, sb = s + kb, ra = r + ea, rb = r + eb;
  const guint np = curves->n;
  double rho0 = tf_two_rates_null_ratio (a);
  double nl = log (a->null_kind == TF_NULL_POINT ? rho0 : a->null_low);
  double nh = log (a->null_kind == TF_NULL_POINT ? rho0 : a->null_high);
  double lc_post = log (ra) - log (rb), lc_lik = log (ea) - log (eb);

  double qlo = log_ratio_quantile (0.5e-6, sa, ra, sb, rb);
  double qhi = -log_ratio_quantile (0.5e-6, sb, rb, sa, ra);   /* 1/ρ swaps the groups */
  double lo = MIN (qlo, nl), hi = MAX (qhi, nh);
  double plo = MIN (lo, log_ratio_quantile (0.005, s, r, s, r));
  double phi = MAX (hi, -log_ratio_quantile (0.005, s, r, s, r));
  if (isfinite (plo) && isfinite (phi) && (qhi - qlo) * (np - 1) / (phi - plo) >= 3.0)
    {
      lo = plo;
      hi = phi;
    }
  if (!(hi > lo))
    {
      lo -= 1e-9 * MAX (1.0, fabs (lo));
      hi += 1e-9 * MAX (1.0, fabs (hi));
    }
  curves->lo = lo;
  curves->hi = hi;
  double step = (hi - lo) / (np - 1);
  curves->posterior_narrow = sqrt (1.0 / sa + 1.0 / sb) < 2.0 * step;

  gboolean closed = ka > 0.0 && kb > 0.0;
  double lmax = -INFINITY;
  for (guint i = 0; i < np; i++)
    {
      double x = i + 1 == np ? hi : lo + i * step;
      curves->x[i] = x;
      curves->prior[i] = tf_finite_exp (log_density_log_ratio (x, s, s, 0.0));
      curves->posterior[i] = tf_finite_exp (log_density_log_ratio (x, sa, sb, lc_post));
      if (closed)
        curves->likelihood[i] = tf_finite_exp (log_density_log_ratio (x, ka, kb, lc_lik));
      else
        {
          /* ln of w^kA (1 − w)^kB, one count being 0 */
          double t = x + lc_lik;
          curves->likelihood[i] = ka > 0.0 ? -ka * log1p (exp (-t)) : -kb * log1p (exp (t));
          lmax = MAX (lmax, curves->likelihood[i]);
        }
    }
  if (!closed)
    {
      /* trapezoid rule over the range shown */
      double area = 0.0;
      for (guint i = 0; i < np; i++)
        curves->likelihood[i] = exp (curves->likelihood[i] - lmax);
      for (guint i = 0; i + 1 < np; i++)
        area += 0.5 * (curves->likelihood[i] + curves->likelihood[i + 1]) * (curves->x[i + 1] - curves->x[i]);
      for (guint i = 0; i < np; i++)
        curves->likelihood[i] = area > 0.0 ? curves->likelihood[i] / area : 0.0;
    }
  double mid = 0.5 * (nl + nh);
  curves->null_value = mid;
  curves->null_low = nl;
  curves->null_high = nh;
  curves->prior_at_null = tf_finite_exp (log_density_log_ratio (mid, s, s, 0.0));
  curves->posterior_at_null = tf_finite_exp (log_density_log_ratio (mid, sa, sb, lc_post));
  curves->posterior_mode = log (sa) - log (sb) - lc_post;     /* the mode of w^sa (1 − w)^sb */
  curves->parameter_markup = g_strdup ("ln(λ<sub>A</sub>/λ<sub>B</sub>)");
}

/* The Bayes factor at a curve's point: with the exposures times f the total is n f,
 * split as kA = n f π0 + z √(n f π0 (1 − π0)) (real counts, clipped to [0, n f] where
 * the total is too small to reach the observed score statistic). */
double
tf_two_rates_log_bf01_at (const TfAnalysis *a, const TfRatesPoint *at)
{
  double ka = a->events_a, kb = a->events_b, f = at->f, p0, q0;
  if (!isnan (at->z))
    {
      double nf = (ka + kb) * f;
      pi_of_ratio (tf_two_rates_null_ratio (a), a->exposure_a, a->exposure_b, &p0, &q0);
      ka = CLAMP (nf * p0 + at->z * sqrt (nf * p0 * q0), 0.0, nf);
      kb = nf - ka;
    }
  return analysis_log_bf01 (a, at->shape, at->rate, ka, a->exposure_a * f, kb,
                            a->exposure_b * f);
}

/* x = the factor both exposures are scaled by, 1e-2 to 1e6, the score statistic held. */
gboolean
tf_two_rates_sample_size (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not)
{
  const TfAnalysis *a = analysis;
  const double ka = a->events_a, n = ka + a->events_b;
  double p0, q0;
  SplitTests t;

  if (!tf_rates_point_null (a, _("The sample-size curve holds the p-value against a point null; this analysis has an interval null."), why_not)
      || !tf_two_rates_prior_in_range (a, why_not))
    return FALSE;
  if (n == 0.0)
    {
      *why_not = g_strdup (_("With no events in either group there is no p-value below 1 to hold as the exposures grow."));
      return FALSE;
    }
  pi_of_ratio (tf_two_rates_null_ratio (a), a->exposure_a, a->exposure_b, &p0, &q0);
  split_tests (ka, n, p0, q0, a->direction, &t);
  tf_rates_sample_size (a, curve, tf_two_rates_log_bf01_at, (ka - n * p0) / sqrt (n * p0 * q0),
                        t.lp_score, 1.0, _("exposures × <i>f</i> (both groups; score <i>z</i> held)"));
  return TRUE;
}

/* param: n, π0, 1 − π0 */
static double
log_pmf (double j, const double *param)
{
  return tf_log_dbinom (j, param[0], param[1], param[2]);
}

/* Binomial(n, π0) masses of kA given the total, over its central outcomes. */
gboolean
tf_two_rates_null_distribution (const TfAnalysis *analysis, TfNullDistribution *dist,
                                char **why_not)
{
  const TfAnalysis *a = analysis;
  const double ka = a->events_a, n = ka + a->events_b;
  double param[3];
  SplitTests t;

  if (!tf_rates_point_null (a, _("The null distribution is drawn for a point null; this analysis has an interval null."), why_not))
    return FALSE;
  param[0] = n;
  pi_of_ratio (tf_two_rates_null_ratio (a), a->exposure_a, a->exposure_b, &param[1], &param[2]);
  if (!tf_rates_null_distribution (a, dist, n * param[1], sqrt (n * param[1] * param[2]), n, ka,
                                   log_pmf, param,
                                   _("events in group A, <i>k</i><sub>A</sub>, given the total"),
                                   why_not))
    return FALSE;
  split_tests (ka, n, param[1], param[2], a->direction, &t);
  dist->p_value = exp (t.lp_exact);
  return TRUE;
}

/* The sensitivity curve around two rates' own Bayes factor, where the prior is in range. */
gboolean
tf_two_rates_sensitivity (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not)
{
  if (!tf_two_rates_prior_in_range (analysis, why_not))
    return FALSE;
  tf_rates_sensitivity_of (analysis, curve, tf_two_rates_log_bf01_at);
  return TRUE;
}
