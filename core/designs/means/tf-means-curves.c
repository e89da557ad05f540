/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means-curves.c: the figures' curves for the means designs: densities of δ, the
 * evidence against the prior scale and against n at a fixed p-value, and the null
 * distribution of t (or z).
 */
#include "tf-means.h"
#include "tf-logspace.h"

#include <math.h>
#include <float.h>
#include <glib/gi18n-lib.h>
#include <gsl/gsl_cdf.h>
#include <gsl/gsl_randist.h>

static double
finite_or_max (double v)
{
  return isfinite (v) ? v : DBL_MAX;
}

void
tf_means_densities (const TfAnalysis *analysis, const TfMeansStats *s, TfDensityCurves *curves)
{
  TfDeltaPrior prior;
  const guint np = curves->n;

  tf_delta_prior_from_analysis (analysis, &prior);
  g_autoptr (TfDeltaPosterior) post = tf_delta_posterior_new (&prior, s->t_delta, s->n_eff,
                                                              s->df_delta);
  double m = tf_delta_posterior_mode (post), w = tf_delta_posterior_width (post);
  double nlo = prior.interval ? prior.low : 0.0, nhi = prior.interval ? prior.high : 0.0;
  double lo = MIN (m - 5.0 * w, nlo), hi = MAX (m + 5.0 * w, nhi);
  /* widen to the prior's bulk (±3r) while the posterior keeps at least 12 steps */
  double plo = MIN (lo, -3.0 * prior.r), phi = MAX (hi, 3.0 * prior.r);
  if (10.0 * w * (np - 1) / (phi - plo) >= 12.0)
    {
      lo = plo;
      hi = phi;
    }
  double step = (hi - lo) / (np - 1);
  curves->lo = lo;
  curves->hi = hi;
  curves->posterior_narrow = w < 2.0 * step;

  /* likelihood scaled to integrate to 1: with a flat prior its mass is the posterior's
   * normaliser; on the grid by Simpson's rule over the same range. It is the posterior
   * over the prior, up to a constant. */
  double d = s->t_delta / sqrt (s->n_eff);
  double lmax = tf_delta_posterior_log_density (post, d) - tf_delta_log_prior (&prior, d);
  double lsum = 0.0;
  for (guint i = 0; i < np; i++)
    {
      double x = i + 1 == np ? hi : lo + i * step;
      curves->x[i] = x;
      curves->prior[i] = finite_or_max (exp (tf_delta_log_prior (&prior, x)));
      double ld = tf_delta_posterior_log_density (post, x);
      curves->posterior[i] = finite_or_max (exp (ld));
      double l = exp (ld - tf_delta_log_prior (&prior, x) - lmax);
      curves->likelihood[i] = isfinite (l) ? l : 0.0;
      lsum += curves->likelihood[i] * ((i == 0 || i + 1 == np) ? 0.5 : 1.0);
    }
  /* the likelihood's own width sets its normaliser when it runs past the grid */
  double lw = sqrt ((1.0 + (isinf (s->df_delta) ? 0.0 : s->t_delta * s->t_delta / (2.0 * s->df_delta))) / s->n_eff);
  double lnorm = lsum * step > 0.0 ? lsum * step : lw * sqrt (2.0 * G_PI);
  for (guint i = 0; i < np; i++)
    curves->likelihood[i] /= lnorm;
  curves->null_value = 0.0;
  curves->null_low = nlo;
  curves->null_high = nhi;
  curves->prior_at_null = finite_or_max (exp (tf_delta_log_prior (&prior, 0.0)));
  curves->posterior_at_null = finite_or_max (tf_delta_posterior_density (post, 0.0));
  curves->posterior_mode = m;
  curves->parameter_markup = g_strdup ("δ");
}

static void
fill_point (TfEvidenceCurve *curve, guint i, double lbf01, double pi0)
{
  curve->log_bf01[i] = isfinite (lbf01) ? lbf01 : (lbf01 > 0 ? 700.0 : -700.0);
  curve->posterior_null[i] = tf_logistic (log (pi0) - log1p (-pi0) + curve->log_bf01[i]);
}

gboolean
tf_means_sensitivity (const TfAnalysis *analysis, const TfMeansStats *s,
                      TfEvidenceCurve *curve, char **why_not)
{
  TfDeltaPrior prior;
  const guint np = curve->n;

  (void) why_not;
  tf_delta_prior_from_analysis (analysis, &prior);
  for (guint i = 0; i < np; i++)
    {
      double lx = log (1e-2) + (log (1e2) - log (1e-2)) * i / (np - 1);
      prior.r = exp (lx);
      curve->x[i] = prior.r;
      fill_point (curve, i, tf_means_log_bf01 (&prior, s->t_delta, s->n_eff, s->df_delta),
                  analysis->prior_null);
    }
  curve->x_log = TRUE;
  curve->x_markup = g_strdup (_("prior scale <i>r</i>"));
  curve->chosen_x = analysis->prior_scale;
  prior.r = analysis->prior_scale;
  curve->chosen_log_bf01 = tf_means_log_bf01 (&prior, s->t_delta, s->n_eff, s->df_delta);
  curve->chosen_posterior_null = tf_logistic (log (analysis->prior_null) - log1p (-analysis->prior_null)
                                              + curve->chosen_log_bf01);
  if (!isfinite (curve->chosen_log_bf01))
    curve->chosen_log_bf01 = 0.0;
  return TRUE;
}

/* The statistic with p-value p in the direction, on the observed side. */
static double
t_from_p (double p, double df, TfDirection dir, double sign)
{
  double z = isinf (df);
  switch (dir)
    {
    case TF_DIRECTION_GREATER:
      return z ? gsl_cdf_ugaussian_Qinv (p) : gsl_cdf_tdist_Qinv (p, df);
    case TF_DIRECTION_LESS:
      return z ? gsl_cdf_ugaussian_Pinv (p) : gsl_cdf_tdist_Pinv (p, df);
    case TF_DIRECTION_TWO_SIDED:
    default:
      return sign * (z ? gsl_cdf_ugaussian_Qinv (0.5 * p) : gsl_cdf_tdist_Qinv (0.5 * p, df));
    }
}

gboolean
tf_means_sample_size (const TfAnalysis *analysis, const TfMeansStats *s,
                      TfEvidenceCurve *curve, char **why_not)
{
  const double n_eff_per_n = s->n_eff_per_n, df_offset = s->df_offset;
  TfDeltaPrior prior;
  const guint np = curve->n;
  double p = tf_means_p_value (s->t_delta, s->df_delta, analysis->direction);
  double sign = s->t_delta < 0.0 ? -1.0 : 1.0;
  double n0 = df_offset + 2.0;

  if (!(p > 1e-300 && p < 1.0))
    {
      *why_not = g_strdup (_("The p-value is 0 or 1 to machine precision, so it cannot be held fixed as n grows."));
      return FALSE;
    }
  tf_delta_prior_from_analysis (analysis, &prior);
  for (guint i = 0; i < np; i++)
    {
      double n = exp (log (n0) + (log (1e8) - log (n0)) * i / (np - 1));
      double df = isinf (s->df_delta) ? INFINITY : n - df_offset;
      double t = t_from_p (p, df, analysis->direction, sign);
      curve->x[i] = n;
      fill_point (curve, i, tf_means_log_bf01 (&prior, t, n * n_eff_per_n, df), analysis->prior_null);
    }
  curve->x_log = TRUE;
  curve->x_markup = g_strdup (_("sample size <i>n</i>"));
  curve->chosen_x = s->n_total;
  curve->chosen_log_bf01 = tf_means_log_bf01 (&prior, s->t_delta, s->n_eff, s->df_delta);
  if (!isfinite (curve->chosen_log_bf01))
    curve->chosen_log_bf01 = 0.0;
  curve->chosen_posterior_null = tf_logistic (log (analysis->prior_null) - log1p (-analysis->prior_null)
                                              + curve->chosen_log_bf01);
  curve->p_value = p;
  return TRUE;
}

gboolean
tf_means_null_distribution (const TfAnalysis *analysis, const TfMeansStats *s,
                            TfNullDistribution *dist, char **why_not)
{
  double half = MAX (4.0, 1.2 * fabs (s->t));
  guint np = dist->n;

  (void) why_not;
  tf_null_distribution_allocate (dist, np);
  dist->discrete = FALSE;
  for (guint i = 0; i < np; i++)
    {
      double x = -half + 2.0 * half * i / (np - 1);
      dist->x[i] = x;
      dist->mass[i] = isinf (s->df) ? gsl_ran_ugaussian_pdf (x) : gsl_ran_tdist_pdf (x, s->df);
      switch (analysis->direction)
        {
        case TF_DIRECTION_GREATER: dist->in_tail[i] = x >= s->t; break;
        case TF_DIRECTION_LESS: dist->in_tail[i] = x <= s->t; break;
        case TF_DIRECTION_TWO_SIDED:
        default: dist->in_tail[i] = fabs (x) >= fabs (s->t); break;
        }
    }
  dist->observed = s->t;
  dist->p_value = tf_means_p_value (s->t, s->df, analysis->direction);
  dist->x_markup = g_strdup (s->known_sd ? "<i>z</i>" : "<i>t</i>");
  return TRUE;
}
