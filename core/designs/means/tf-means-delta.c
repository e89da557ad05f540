/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means-delta.c: the prior of the standardised effect δ, the likelihood of the
 * observed statistic, and masses of their product by adaptive Gauss–Kronrod quadrature
 * (QUADPACK QAG/QAGIU/QAGIL).
 *
 * The likelihood of δ is the noncentral t density of the observed t at λ = √n_eff δ
 * (Rouder et al. 2009: σ integrated out under Jeffreys's prior), or the normal density
 * of z when the SD is known.
 */
#include "tf-means-delta.h"
#include "tf-noncentral-t.h"

#include <math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_integration.h>

void
tf_delta_prior_from_analysis (const TfAnalysis *analysis, TfDeltaPrior *prior)
{
  prior->prior = analysis->prior == TF_PRIOR_NORMAL ? TF_PRIOR_NORMAL : TF_PRIOR_CAUCHY;
  prior->r = analysis->prior_scale;
  prior->direction = analysis->direction;
  prior->interval = analysis->null_kind == TF_NULL_INTERVAL;
  prior->low = analysis->null_low;
  prior->high = analysis->null_high;
}

double
tf_delta_log_prior (const TfDeltaPrior *prior, double delta)
{
  double u = delta / prior->r;
  if (prior->prior == TF_PRIOR_NORMAL)
    return -0.5 * u * u - log (prior->r) - 0.5 * log (2.0 * G_PI);
  return -log (G_PI * prior->r) - log1p (u * u);
}

double
tf_delta_log_likelihood (double t, double n_eff, double df, double delta)
{
  double lambda = sqrt (n_eff) * delta;
  if (isinf (df))
    return -0.5 * (t - lambda) * (t - lambda);
  return tf_nct_log_pdf (t, df, lambda);
}

double
tf_delta_log_target (const TfDeltaTarget *target, double delta)
{
  const TfDeltaTarget *p = target;
  double v = tf_delta_log_likelihood (p->t, p->n_eff, p->df, delta)
             + tf_delta_log_prior (p->prior, delta) - p->shift;
  return isnan (v) ? -INFINITY : v;
}

static double
post_integrand (double delta, void *data)
{
  const TfDeltaTarget *p = data;
  double v = exp (tf_delta_log_target (p, delta));
  return isfinite (v) ? v : 0.0;
}

/* ∫_a^b exp(lp − shift) on one piece, a < b, either end possibly infinite, to the
 * absolute error eps or 1e-11 relative. */
static double
piece (TfDeltaTarget *p, double a, double b, double eps, gsl_integration_workspace *w)
{
  gsl_function f = { post_integrand, p };
  double res = 0.0, err = 0.0;

  if (!(a < b))
    return 0.0;
  if (isinf (b))
    gsl_integration_qagiu (&f, a, eps, 1e-11, 300, w, &res, &err);
  else if (isinf (a))
    gsl_integration_qagil (&f, b, eps, 1e-11, 300, w, &res, &err);
  else
    gsl_integration_qag (&f, a, b, eps, 1e-11, 300, GSL_INTEG_GAUSS21, w, &res, &err);
  return res;
}

static int
compare_doubles (const void *a, const void *b)
{
  double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

/* ln of the mass on [a, b] by adaptive quadrature of the density itself, for masses the
 * table does not hold: the integrand scaled by its value at the end nearer the mode (a
 * mass far in a tail does not underflow), split at the bulk and at 1, 4, 16 and 64
 * decay lengths from that end. */
double
tf_delta_quadrature_log_mass (const TfDeltaTarget *target, double mode, double width,
                              double a, double b)
{
  TfDeltaTarget scaled = *target, *p = &scaled;
  double m = mode, s = width;
  double near = a >= m ? a : (b <= m ? b : m), into = near == a ? 1.0 : -1.0;
  double local = isfinite (near) ? tf_delta_log_target (p, near) : 0.0;
  if (!isfinite (local))
    local = 0.0;
  double hh = 1e-7 * (fabs (near) + s);
  double slope = isfinite (near) ? fabs (tf_delta_log_target (p, near + into * hh) - local) / hh : 0.0;
  double len = slope > 0.0 && isfinite (slope) ? 1.0 / slope : s;
  double cuts[] = { m - 40.0 * s, m - 12.0 * s, m - 4.0 * s, m, m + 4.0 * s, m + 12.0 * s,
                    m + 40.0 * s, near + into * len, near + into * 4.0 * len,
                    near + into * 16.0 * len, near + into * 64.0 * len };
  double sum = 0.0, left = a;
  gsl_integration_workspace *w = gsl_integration_workspace_alloc (300);

  qsort (cuts, G_N_ELEMENTS (cuts), sizeof cuts[0], compare_doubles);
  p->shift += local;
  /* the scaled integrand is 1 at the near end, so its integral is about len or more */
  double eps = 1e-13 * MIN (len, s);
  for (guint i = 0; i < G_N_ELEMENTS (cuts); i++)
    if (cuts[i] > left && cuts[i] < b)
      {
        sum += piece (p, left, cuts[i], eps, w);
        left = cuts[i];
      }
  sum += piece (p, left, b, eps, w);
  gsl_integration_workspace_free (w);
  return log (sum) + local;
}
