/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means-posterior.c: the posterior of the standardised effect δ under the
 * alternative, and the Bayes factors of the means designs built on it.
 *
 * The likelihood of δ is the noncentral t density of the observed t at λ = √n_eff δ
 * (Rouder et al. 2009: σ integrated out under Jeffreys's prior), or the normal density
 * of z when the SD is known. Masses are done by adaptive Gauss–Kronrod quadrature
 * (QUADPACK QAG/QAGIU/QAGIL) split at the posterior's bulk; quantiles and the HDI come
 * from a Simpson table over the bulk with quadratic interpolation inside each step.
 */
#include "tf-means.h"
#include "tf-jzs.h"
#include "tf-noncentral-t.h"
#include "tf-logspace.h"

#include <math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_integration.h>

#define TABLE_N 1200            /* Simpson steps over the bulk */

struct TfDeltaPosterior {
  TfDeltaPrior prior;
  double t, n_eff, df;
  double mode, width, shift;
  double log_total;             /* ln ∫ exp(lp − shift) over ℝ */
  /* table over [lo, hi]: nodes x_i, midpoints, unnormalised densities, cumulative */
  double lo, hi, h;
  double *f, *fm, *cum;
};

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

static double
log_post (const TfDeltaPosterior *p, double delta)
{
  return tf_delta_log_likelihood (p->t, p->n_eff, p->df, delta)
         + tf_delta_log_prior (&p->prior, delta);
}

static double
post_integrand (double delta, void *data)
{
  const TfDeltaPosterior *p = data;
  double v = exp (log_post (p, delta) - p->shift);
  return isfinite (v) ? v : 0.0;
}

/* ∫_a^b exp(lp − shift) on one piece, a < b, either end possibly infinite. */
static double
piece (TfDeltaPosterior *p, double a, double b, gsl_integration_workspace *w)
{
  gsl_function f = { post_integrand, p };
  double res = 0.0, err = 0.0;

  if (!(a < b))
    return 0.0;
  if (isinf (a) && isinf (b))
    gsl_integration_qagi (&f, 0.0, 1e-11, 300, w, &res, &err);
  else if (isinf (b))
    gsl_integration_qagiu (&f, a, 0.0, 1e-11, 300, w, &res, &err);
  else if (isinf (a))
    gsl_integration_qagil (&f, b, 0.0, 1e-11, 300, w, &res, &err);
  else
    gsl_integration_qag (&f, a, b, 0.0, 1e-11, 300, GSL_INTEG_GAUSS21, w, &res, &err);
  return res;
}

static double
raw_mass (TfDeltaPosterior *p, double a, double b)
{
  double m = p->mode, s = p->width;
  double cuts[] = { m - 40.0 * s, m - 12.0 * s, m - 4.0 * s, m, m + 4.0 * s, m + 12.0 * s,
                    m + 40.0 * s };
  double sum = 0.0, left = a;
  gsl_integration_workspace *w = gsl_integration_workspace_alloc (300);

  for (guint i = 0; i < G_N_ELEMENTS (cuts); i++)
    if (cuts[i] > left && cuts[i] < b)
      {
        sum += piece (p, left, cuts[i], w);
        left = cuts[i];
      }
  sum += piece (p, left, b, w);
  gsl_integration_workspace_free (w);
  return sum;
}

double
tf_delta_posterior_log_mass (TfDeltaPosterior *post, double a, double b)
{
  return log (raw_mass (post, a, b)) - post->log_total;
}

TfDeltaPosterior *
tf_delta_posterior_new (const TfDeltaPrior *prior, double t, double n_eff, double df)
{
  TfDeltaPosterior *p = g_new0 (TfDeltaPosterior, 1);
  double d = t / sqrt (n_eff);
  /* sd of δ from the likelihood: (1 + t²/(2ν)) / n_eff (Hedges & Olkin 1985, §5.B) */
  double w = sqrt ((1.0 + (isinf (df) ? 0.0 : t * t / (2.0 * df))) / n_eff);
  double lo, hi, best = -INFINITY, best_x = d;

  p->prior = *prior;
  p->t = t;
  p->n_eff = n_eff;
  p->df = df;
  /* Coarse scan between the prior's centre and the likelihood's, then refine. */
  lo = MIN (d, 0.0) - 6.0 * w;
  hi = MAX (d, 0.0) + 6.0 * w;
  for (int pass = 0; pass < 3; pass++)
    {
      double step = (hi - lo) / 60.0;
      for (int i = 0; i <= 60; i++)
        {
          double x = lo + i * step, v = log_post (p, x);
          if (v > best)
            {
              best = v;
              best_x = x;
            }
        }
      lo = best_x - step;
      hi = best_x + step;
    }
  /* width from the curvature at the mode */
  double hh = MIN (w, prior->r) * 1e-3;
  double c = (log_post (p, best_x + hh) - 2.0 * best + log_post (p, best_x - hh)) / (hh * hh);
  p->width = c < 0.0 && isfinite (c) ? 1.0 / sqrt (-c) : MIN (w, prior->r);
  p->mode = best_x;
  p->shift = best;
  p->log_total = 0.0;
  p->log_total = log (raw_mass (p, -INFINITY, INFINITY));

  /* Simpson table over the bulk */
  p->lo = p->mode - 16.0 * p->width;
  p->hi = p->mode + 16.0 * p->width;
  p->h = (p->hi - p->lo) / TABLE_N;
  p->f = g_new (double, TABLE_N + 1);
  p->fm = g_new (double, TABLE_N);
  p->cum = g_new (double, TABLE_N + 1);
  for (guint i = 0; i <= TABLE_N; i++)
    p->f[i] = post_integrand (p->lo + i * p->h, p);
  p->cum[0] = 0.0;
  for (guint i = 0; i < TABLE_N; i++)
    {
      p->fm[i] = post_integrand (p->lo + (i + 0.5) * p->h, p);
      p->cum[i + 1] = p->cum[i] + p->h / 6.0 * (p->f[i] + 4.0 * p->fm[i] + p->f[i + 1]);
    }
  return p;
}

void
tf_delta_posterior_free (TfDeltaPosterior *post)
{
  if (post == NULL)
    return;
  g_free (post->f);
  g_free (post->fm);
  g_free (post->cum);
  g_free (post);
}

double
tf_delta_posterior_density (TfDeltaPosterior *post, double delta)
{
  return exp (log_post (post, delta) - post->shift - post->log_total);
}

double
tf_delta_posterior_mode (TfDeltaPosterior *post)
{
  return post->mode;
}

double
tf_delta_posterior_width (TfDeltaPosterior *post)
{
  return post->width;
}

/* Table cumulative at x inside [lo, hi]: Simpson steps plus the integral of the
 * quadratic through the step's three values. */
static double
table_cum (const TfDeltaPosterior *p, double x)
{
  double pos = (x - p->lo) / p->h;
  if (pos <= 0.0)
    return 0.0;
  if (pos >= TABLE_N)
    return p->cum[TABLE_N];
  guint i = (guint) pos;
  double u = pos - i;                     /* in [0, 1) */
  double f0 = p->f[i], f1 = p->fm[i], f2 = p->f[i + 1];
  /* quadratic q(u) = f0 + b u + c u² through (0, f0), (½, f1), (1, f2) */
  double b = -3.0 * f0 + 4.0 * f1 - f2, c = 2.0 * f0 - 4.0 * f1 + 2.0 * f2;
  return p->cum[i] + p->h * (f0 * u + 0.5 * b * u * u + c * u * u * u / 3.0);
}

static double
table_quantile (const TfDeltaPosterior *p, double target)
{
  guint lo = 0, hi = TABLE_N;

  if (target <= 0.0)
    return p->lo;
  if (target >= p->cum[TABLE_N])
    return p->hi;
  while (hi - lo > 1)
    {
      guint mid = (lo + hi) / 2;
      if (p->cum[mid] <= target)
        lo = mid;
      else
        hi = mid;
    }
  /* bisection then Newton inside the step */
  double a = p->lo + lo * p->h, b = a + p->h, x = 0.5 * (a + b);
  for (int it = 0; it < 60; it++)
    {
      double v = table_cum (p, x) - target;
      double u = (x - (p->lo + lo * p->h)) / p->h;
      double f0 = p->f[lo], f1 = p->fm[lo], f2 = p->f[lo + 1];
      double dens = f0 + (-3.0 * f0 + 4.0 * f1 - f2) * u + (2.0 * f0 - 4.0 * f1 + 2.0 * f2) * u * u;
      if (v > 0.0)
        b = x;
      else
        a = x;
      double nx = dens > 0.0 ? x - v / dens : 0.5 * (a + b);
      if (!(nx > a && nx < b))
        nx = 0.5 * (a + b);
      if (fabs (nx - x) <= 1e-15 * (fabs (x) + p->h))
        return nx;
      x = nx;
    }
  return x;
}

double
tf_delta_posterior_quantile (TfDeltaPosterior *post, double u, double a, double b)
{
  double ca = table_cum (post, MAX (a, post->lo)), cb = table_cum (post, MIN (b, post->hi));
  return table_quantile (post, ca + u * (cb - ca));
}

/* Shortest interval of the given mass: minimise Q(p + level) − Q(p) over the lower
 * tail p by golden-section search (Kiefer 1953); the posterior is unimodal. */
void
tf_delta_posterior_hdi (TfDeltaPosterior *post, double level, double a, double b,
                        double *lo, double *hi)
{
  const double g = 0.5 * (sqrt (5.0) - 1.0);
  double x0 = 0.0, x1 = 1.0 - level;
  double ca = table_cum (post, MAX (a, post->lo)), cb = table_cum (post, MIN (b, post->hi));
  double span = cb - ca;
#define WIDTH(p) (table_quantile (post, ca + ((p) + level) * span) - table_quantile (post, ca + (p) * span))
  double c = x1 - g * (x1 - x0), d = x0 + g * (x1 - x0);
  double fc = WIDTH (c), fd = WIDTH (d);
  for (int it = 0; it < 80 && x1 - x0 > 1e-13; it++)
    {
      if (fc < fd)
        {
          x1 = d; d = c; fd = fc;
          c = x1 - g * (x1 - x0);
          fc = WIDTH (c);
        }
      else
        {
          x0 = c; c = d; fc = fd;
          d = x0 + g * (x1 - x0);
          fd = WIDTH (d);
        }
    }
#undef WIDTH
  double p = 0.5 * (x0 + x1);
  *lo = table_quantile (post, ca + p * span);
  *hi = table_quantile (post, ca + (p + level) * span);
}

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
  g_autoptr (TfDeltaPosterior) post = tf_delta_posterior_new (prior, t, n_eff, df);
  double in = tf_delta_posterior_log_mass (post, prior->low, prior->high);
  double out = tf_log_add (tf_delta_posterior_log_mass (post, -INFINITY, prior->low),
                           tf_delta_posterior_log_mass (post, prior->high, INFINITY));
  double pin = log_prior_mass (prior, prior->low, prior->high);
  double pout = tf_log1mexp (pin);
  return in - pin - out + pout;
}
