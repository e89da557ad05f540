/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-logspace.c: log-space helpers that stay exact for huge counts.
 *
 * References:
 *   C. Loader (2000), "Fast and accurate computation of binomial probabilities".
 *   M. Mächler (2012), "Accurately computing log(1 − exp(−|a|))", Rmpfr vignette.
 */
#include "tf-logspace.h"

#include <math.h>
#include <float.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_sf_gamma.h>


/* Bernoulli-number coefficients B_2k / (2k (2k − 1)) of the Stirling series
 * (Abramowitz & Stegun 1964, 6.1.40). */
static const double stirling_coef[] = {
  1.0 / 12.0,
  -1.0 / 360.0,
  1.0 / 1260.0,
  -1.0 / 1680.0,
  1.0 / 1188.0,
  -691.0 / 360360.0,
  1.0 / 156.0,
  -3617.0 / 122400.0,
  43867.0 / 244188.0,
  -174611.0 / 125400.0,
  77683.0 / 5796.0,
};

/* Stirling remainder: ln Γ(x) minus Stirling's formula for x < 10, the asymptotic
 * Stirling series otherwise (Loader 2000, "stirlerr", for real x). */
double
tf_stirling_remainder (double x)
{
  if (!(x > 0.0))
    return NAN;
  if (x < 10.0)
    {
      gsl_sf_result r;
      if (gsl_sf_lngamma_e (x, &r) != GSL_SUCCESS)
        return NAN;
      return r.val - ((x - 0.5) * log (x) - x + TF_LN_SQRT_2PI);
    }
  else
    {
      /* At x >= 10 the 11th term is below 1e-20 of the first. */
      double x2 = 1.0 / (x * x);
      double sum = 0.0;
      int nterms = x > 1e4 ? 2 : (x > 200.0 ? 4 : G_N_ELEMENTS (stirling_coef));
      for (int i = nterms - 1; i >= 0; i--)
        sum = sum * x2 + stirling_coef[i];
      return sum / x;
    }
}

/* Deviance term x ln(x/m) + m − x given d = x − m exactly (Loader 2000, "bd0"), with
 * the series in v = d / (x + m) used for |v| < 1/2. */
double
tf_bd0_delta (double x, double m, double d)
{
  if (x == 0.0)
    return m;
  if (!isfinite (x) || !isfinite (m) || m <= 0.0)
    return NAN;
  double v = d / (x + m);
  if (fabs (v) < 0.5)
    {
      double s = d * v;
      double ej = 2.0 * x * v;
      double v2 = v * v;
      for (int j = 1; j < 200; j++)
        {
          ej *= v2;
          double s1 = s + ej / (2 * j + 1);
          if (s1 == s)
            return s1;
          s = s1;
        }
      return s;
    }
  return x * log (x / m) - d;
}

double
tf_bd0 (double x, double m)
{
  return tf_bd0_delta (x, m, x - m);
}

/* ln of ln p and ln q, each from the smaller of p and q, which is taken as exact. */
static void
log_pq (double p, double q, double *lp, double *lq)
{
  if (p <= q)
    {
      *lp = log (p);
      *lq = log1p (-p);
    }
  else
    {
      *lp = log1p (-q);
      *lq = log (q);
    }
}

/* Loader's saddle-point form given k and n − k separately, so that real k and n − k
 * from beta shapes keep every digit (Loader 2000). d1 = k − np. */
static double
log_dbinom_split (double k, double nk, double p, double q, double d1)
{
  double n = k + nk;
  double lc = tf_stirling_remainder (n) - tf_stirling_remainder (k)
              - tf_stirling_remainder (nk)
              - tf_bd0_delta (k, n * p, d1) - tf_bd0_delta (nk, n * q, -d1);
  double lf = TF_LN_2PI + log (k) + log (nk) - log (n);
  return lc - 0.5 * lf;
}

/* k q − nk p = k − (k + nk) p, exact for the smaller of p and q = 1 − p: the products'
 * rounding errors recovered by fma (Ogita, Rump & Oishi 2005, TwoProduct). */
static double
count_minus_mean (double k, double nk, double p, double q)
{
  double p1, p2;
  if (p <= q)
    {
      p1 = k * p;
      p2 = nk * p;
      return ((k - p1) - p2) - (fma (k, p, -p1) + fma (nk, p, -p2));
    }
  p1 = k * q;
  p2 = nk * q;
  return ((p1 - nk) + p2) + (fma (k, q, -p1) + fma (nk, q, -p2));
}

/* Binomial log probability in saddle-point form (Loader 2000). */
double
tf_log_dbinom (double k, double n, double p, double q)
{
  double lp, lq;

  if (!(n >= 0.0) || !(k >= 0.0) || k > n || p < 0.0 || q < 0.0)
    return NAN;
  log_pq (p, q, &lp, &lq);
  if (k == 0.0)
    return n == 0.0 ? 0.0 : (q == 0.0 ? -INFINITY : n * lq);
  if (k == n)
    return p == 0.0 ? -INFINITY : n * lp;
  if (p == 0.0 || q == 0.0)
    return -INFINITY;
  return log_dbinom_split (k, n - k, p, q, count_minus_mean (k, n - k, p, q));
}

/* ln B(a, b) = ½ ln 2π + ½ ln(s / ab) − a ln(1 + b/a) − b ln(1 + a/b) + δ(a) + δ(b) − δ(s),
 * s = a + b: Stirling's formula with remainders (Loader 2000), no cancellation. */
double
tf_log_beta (double a, double b)
{
  if (!(a > 0.0) || !(b > 0.0))
    return NAN;
  if (a < 10.0 && b < 10.0)
    {
      gsl_sf_result r;
      if (gsl_sf_lnbeta_e (a, b, &r) != GSL_SUCCESS)
        return NAN;
      return r.val;
    }
  double s = a + b;
  return TF_LN_SQRT_2PI + 0.5 * (log (s) - log (a) - log (b))
         - a * log1p (b / a) - b * log1p (a / b)
         + tf_stirling_remainder (a) + tf_stirling_remainder (b)
         - tf_stirling_remainder (s);
}

/* ln Beta(a, b) density: for a, b > 2 as (a + b − 1) times a binomial probability
 * in Loader's form (Loader 2000, as R's dbeta); directly otherwise. */
double
tf_log_dbeta (double x, double y, double a, double b)
{
  double lx, ly;

  if (!(a > 0.0) || !(b > 0.0) || x < 0.0 || y < 0.0)
    return NAN;
  if (x == 0.0)
    return a < 1.0 ? INFINITY : (a == 1.0 ? log (b) : -INFINITY);
  if (y == 0.0)
    return b < 1.0 ? INFINITY : (b == 1.0 ? log (a) : -INFINITY);
  if (a > 2.0 && b > 2.0)
    return log (a + b - 1.0)
           + log_dbinom_split (a - 1.0, b - 1.0, x, y, count_minus_mean (a - 1.0, b - 1.0, x, y));
  log_pq (x, y, &lx, &ly);
  return (a - 1.0) * lx + (b - 1.0) * ly - tf_log_beta (a, b);
}

/* ln(e^a + e^b) (common practice: factor out the larger). */
double
tf_log_add (double a, double b)
{
  if (a < b)
    {
      double t = a;
      a = b;
      b = t;
    }
  if (a == -INFINITY)
    return -INFINITY;
  if (isinf (a))
    return a;
  return a + log1p (exp (b - a));
}

/* ln(e^a − e^b), a >= b (Mächler 2012). */
double
tf_log_sub (double a, double b)
{
  if (b > a)
    return NAN;
  if (b == -INFINITY)
    return a;
  return a + tf_log1mexp (b - a);
}

/* ln(1 − e^a), a <= 0 (Mächler 2012: expm1 above −ln 2, log1p below). */
double
tf_log1mexp (double a)
{
  if (a > 0.0)
    return NAN;
  if (a > -G_LN2)
    return log (-expm1 (a));
  return log1p (-exp (a));
}

/* The logistic function 1 / (1 + e^−x), evaluated on the side where it cannot
 * overflow (common practice). */
double
tf_logistic (double x)
{
  if (x >= 0.0)
    return 1.0 / (1.0 + exp (-x));
  double e = exp (x);
  return e / (1.0 + e);
}

/* ln(x^a e^−x / Γ(a + 1)) = −δ(a) − bd0(a, x) − ½ ln 2πa (Loader 2000). */
double
tf_log_dpois (double a, double x)
{
  if (isnan (a) || isnan (x) || a < 0.0 || x < 0.0)
    return NAN;
  if (a == 0.0)
    return -x;
  if (x == 0.0)
    return -INFINITY;
  if (isinf (x))
    return -INFINITY;
  return -tf_stirling_remainder (a) - tf_bd0_delta (a, x, a - x) - 0.5 * (TF_LN_2PI + log (a));
}

/* Gamma(s, r) density r^s x^{s−1} e^{−rx} / Γ(s) = (s / x) · dpois(s, r x)
 * (Loader 2000, as R's dgamma). */
double
tf_log_dgamma (double x, double shape, double rate)
{
  if (!(x > 0.0) || !(shape > 0.0) || !(rate > 0.0))
    return NAN;
  return log (shape) - log (x) + tf_log_dpois (shape, rate * x);
}

/* NB(k; s, p) = s / (s + k) · Binomial(s; s + k, p) for real s (Loader 2000, as R's
 * dnbinom). */
double
tf_log_dnbinom (double k, double shape, double p, double q)
{
  if (!(k >= 0.0) || !(shape > 0.0) || !(p > 0.0) || !(q >= 0.0))
    return NAN;
  if (k == 0.0)
    return shape * (p <= q ? log (p) : log1p (-q));
  return log (shape) - log (shape + k) + tf_log_dbinom (shape, shape + k, p, q);
}

double
tf_beta_sd (double p, double q)
{
  double s = p + q;
  return sqrt (p / s * (q / s) / (s + 1.0));
}
