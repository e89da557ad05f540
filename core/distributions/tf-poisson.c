/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-poisson.c: Poisson samples and their deviances, the Poisson tails, the exact
 * two-sided test and the Garwood interval, built on the incomplete gamma function.
 */
#include "tf-poisson.h"
#include "tf-exact-test.h"
#include "tf-incgamma.h"
#include "tf-logspace.h"

#include <math.h>
#include <float.h>
#include <gsl/gsl_errno.h>

/* hi + lo = a + b exactly (Knuth's TwoSum; Dekker 1971). */
static void
two_sum (double a, double b, double *hi, double *lo)
{
  double s = a + b, bb = s - a;
  *hi = s;
  *lo = (a - (s - bb)) + (b - bb);
}

TfPoisSample
tf_pois_sample (double x, double m)
{
  return (TfPoisSample) { x, 0.0, m, 0.0 };
}

void
tf_pois_sample_add (TfPoisSample *s, double k, double e, double c)
{
  double hi, lo, p = e * c;
  two_sum (s->x, k, &hi, &lo);
  s->x = hi;
  s->x_lo += lo;
  two_sum (s->m, p, &hi, &lo);
  s->m = hi;
  s->m_lo += lo + fma (e, c, -p);
}

/* x − λ m with the product's rounding error recovered by fma (Ogita, Rump & Oishi
 * 2005, TwoProduct). */
double
tf_pois_sample_bd0 (const TfPoisSample *s, double lambda)
{
  double mu = s->m * lambda;
  double d = (s->x - mu) + (s->x_lo - fma (s->m, lambda, -mu) - s->m_lo * lambda);
  return tf_bd0_delta (s->x, mu, d);
}

/* The two deviances of H at the pooled rate *r: x − m r = (x e − k m) / (m + e), and
 * k − e r its negative; the cross products by TwoProduct, so that a near-tie keeps
 * its digits. */
static void
pooled_deviances (const TfPoisSample *s, const TfPoisSample *t, double *r, double *first,
                  double *second)
{
  double x = s->x, m = s->m, k = t->x, e = t->m;
  double p1 = x * e, p2 = k * m;
  double e1 = fma (x, e, -p1) + x * t->m_lo + s->x_lo * e;
  double e2 = fma (k, m, -p2) + k * s->m_lo + t->x_lo * m;
  double d = ((p1 - p2) + (e1 - e2)) / (m + e);
  *r = (x + k) / (m + e);
  *first = tf_bd0_delta (x, m * *r, d);
  *second = tf_bd0_delta (k, e * *r, -d);
}

double
tf_pois_log_heterogeneity (const TfPoisSample *s, const TfPoisSample *t)
{
  double r, first, second;
  if (isnan (s->x) || isnan (s->m) || isnan (t->x) || isnan (t->m))
    return NAN;
  if (s->x + t->x == 0.0)
    return 0.0;
  pooled_deviances (s, t, &r, &first, &second);
  return first + second;
}

/* H(p, t) − H(q, t) directly, or with t's two deviances taken together:
 * bd0(k, e rp) − bd0(k, e rq) = k ln(rq / rp) + e (rp − rq), which is small where both
 * are large but the pooled rates are near. The way with the smaller terms is taken;
 * *cost is the largest term of it (its rounding error is ~1e-16 of that). */
double
tf_pois_log_heterogeneity_change (const TfPoisSample *p, const TfPoisSample *q,
                                  const TfPoisSample *t, double *cost)
{
  double hp = tf_pois_log_heterogeneity (p, t), hq = tf_pois_log_heterogeneity (q, t);
  double rp, rq, fp, fq, sp, sq, k = t->x, e = t->m;

  *cost = MAX (hp, hq);
  if (!(p->x > 0.0 && q->x > 0.0))
    return hp - hq;
  pooled_deviances (p, t, &rp, &fp, &sp);
  pooled_deviances (q, t, &rq, &fq, &sq);
  double l = log (rq / rp);
  double c = MAX (MAX (fp, fq), MAX (k * MAX (1.0, fabs (l)), e * MAX (rp, rq)));
  if (!(c < *cost))
    return hp - hq;
  *cost = c;
  return (fp - fq) + (k > 0.0 ? k * l : 0.0) + e * (rp - rq);
}

/* ln P(X <= k) = ln Q(k + 1, μ) (Abramowitz & Stegun 1964, 26.4.21). */
double
tf_pois_log_cdf (double k, double mu)
{
  k = floor (k);
  if (isnan (k) || isnan (mu) || mu < 0.0)
    return NAN;
  if (k < 0.0)
    return -INFINITY;
  if (mu == 0.0)
    return 0.0;
  return tf_gamma_inc_log_upper (k + 1.0, mu);
}

/* ln P(X >= k) = ln P(k, μ) (Abramowitz & Stegun 1964, 26.4.21). */
double
tf_pois_log_sf (double k, double mu)
{
  k = ceil (k);
  if (isnan (k) || isnan (mu) || mu < 0.0)
    return NAN;
  if (k <= 0.0)
    return 0.0;
  if (mu == 0.0)
    return -INFINITY;
  return tf_gamma_inc_log_lower (k, mu);
}

static double
log_dpois (double j, const void *mu)
{
  return tf_log_dpois (j, *(const double *) mu);
}

/* Two-sided exact p-value by the minimum-likelihood rule (Sterne 1954): the outcomes on
 * the far side of the mode by tf_exact_test_far_end(), the unbounded upper side
 * bracketed by steps from √μ. */
double
tf_pois_log_exact_two_sided (double k, double mu)
{
  if (isnan (k) || isnan (mu) || k < 0.0 || !(mu > 0.0))
    return NAN;
  double ld = tf_exact_test_log_threshold (tf_log_dpois (k, mu));

  if (k == mu)
    return 0.0;
  if (k < mu)
    {
      /* the smallest j >= ceil(μ) no more likely than k */
      double j = tf_exact_test_far_end (log_dpois, &mu, ld, ceil (mu), INFINITY, sqrt (mu));
      return MIN (0.0, tf_log_add (tf_pois_log_cdf (k, mu), tf_pois_log_sf (j, mu)));
    }
  else
    {
      /* the largest j in [0, floor(μ)] no more likely than k, −1 when there is none */
      double j = tf_exact_test_far_end (log_dpois, &mu, ld, floor (mu), -1.0, 0.0);
      return MIN (0.0, tf_log_add (tf_pois_log_cdf (j, mu), tf_pois_log_sf (k, mu)));
    }
}

/* Garwood (1936): the α/2 quantile of Gamma(k, 1) and the 1 − α/2 quantile of
 * Gamma(k + 1, 1); lo = 0 when k = 0. */
void
tf_pois_garwood (double k, double level, double *lo, double *hi)
{
  double la2 = log (0.5 * (1.0 - level));

  *lo = k <= 0.0 ? 0.0 : tf_gamma_inc_inverse_log (la2, k, TRUE);
  *hi = tf_gamma_inc_inverse_log (la2, k + 1.0, FALSE);
}
