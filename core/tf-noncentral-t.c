/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-noncentral-t.c: distribution function, density and the inverse in λ of the
 * noncentral t distribution.
 */
#include "tf-noncentral-t.h"

#include <math.h>
#include <gsl/gsl_cdf.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_roots.h>
#include <gsl/gsl_sf_erf.h>
#include <gsl/gsl_sf_gamma.h>

/* I_x(a, b) by GSL (continued fraction, Press et al. 1992); 0 or 1 on failure at the
 * ends, where it is the limit. */
static double
beta_inc (double a, double b, double x)
{
  gsl_sf_result r;
  if (x <= 0.0)
    return 0.0;
  if (x >= 1.0)
    return 1.0;
  int status = gsl_sf_beta_inc_e (a, b, x, &r);
  if (status == GSL_EUNDRFLW)
    return 0.0;
  if (status != GSL_SUCCESS && !isfinite (r.val))
    return NAN;
  return r.val;
}

/* P(T <= t) for t >= 0 (Lenth 1989, AS 243): Φ(−λ) + ½ Σ_j [p_j I_x(j + ½, ν/2)
 * + q_j I_x(j + 1, ν/2)], x = t²/(t² + ν), p_j and q_j Poisson(λ²/2) weights, summed
 * forward and backward from j = ⌊λ²/2⌋ (Benton & Krishnamoorthy 2003) until the
 * remaining weight bounds the error below 1e-15. */
static double
nct_cdf_nonneg (double t, double df, double ncp)
{
  double x = t * t / (t * t + df);
  double lam = 0.5 * ncp * ncp;
  double half_b = 0.5 * df;
  double sum = 0.0;

  if (t == 0.0)
    return gsl_cdf_ugaussian_P (-ncp);
  if (lam == 0.0)
    return gsl_cdf_tdist_P (t, df);

  double k = floor (lam);
  double lpk = -lam + k * log (lam) - gsl_sf_lngamma (k + 1.0);
  double pk = exp (lpk);                                   /* Poisson weight at k */
  /* q_k = λ/√2 · e^(−λ²/2) (λ²/2)^k / Γ(k + 3/2), with the sign of λ */
  double qk = copysign (exp (-lam + k * log (lam) + log (fabs (ncp)) - 0.5 * M_LN2
                             - gsl_sf_lngamma (k + 1.5)), ncp);
  double p = pk, q = qk;
  double cp_rest = 1.0, wsum = 0.0;

  /* backward */
  for (double j = k; j >= 0.0; j--)
    {
      double pj = p, qj = q;
      double ipj = beta_inc (j + 0.5, half_b, x), iqj = beta_inc (j + 1.0, half_b, x);
      sum += pj * ipj + qj * iqj;
      wsum += pj;
      if (pj * ipj + fabs (qj) * iqj < 1e-17 * fabs (sum) && k - j > 3.0)
        break;
      p *= j / lam;
      q *= (j + 0.5) / lam;
      if (j == 0.0)
        break;
    }
  /* forward */
  p = pk;
  q = qk;
  for (double j = k + 1.0; ; j++)
    {
      p *= lam / j;
      q *= lam / (j + 0.5);
      double ipj = beta_inc (j + 0.5, half_b, x), iqj = beta_inc (j + 1.0, half_b, x);
      double term = p * ipj + q * iqj;
      sum += term;
      wsum += p;
      cp_rest = 1.0 - wsum;
      if ((cp_rest < 1e-16 || fabs (term) < 1e-18 * fabs (sum)) && j - k > 3.0)
        break;
      if (j - k > 1e7)
        break;
    }
  return gsl_cdf_ugaussian_P (-ncp) + 0.5 * sum;
}

double
tf_nct_cdf (double t, double df, double ncp)
{
  double v;

  if (!(df > 0.0) || isnan (t) || !isfinite (ncp))
    return NAN;
  if (isinf (t))
    return t > 0.0 ? 1.0 : 0.0;
  if (t >= 0.0)
    v = nct_cdf_nonneg (t, df, ncp);
  else
    v = 1.0 - nct_cdf_nonneg (-t, df, -ncp);
  return CLAMP (v, 0.0, 1.0);
}

typedef struct {
  double c, y0;                 /* ν + 1 and the mode */
} HermiteParams;

/* s − (e^s − 1), by its series −Σ_{k≥2} s^k/k! where the difference would cancel. */
static double
s_minus_expm1 (double s)
{
  if (fabs (s) >= 0.5)
    return s - expm1 (s);
  double term = 0.5 * s * s, sum = 0.0;
  for (int k = 3; k < 40 && fabs (term) > 1e-17 * fabs (sum); k++)
    {
      sum += term;
      term *= s / k;
    }
  return -sum;
}

/* ln of y^(ν+1) e^(−(y − a)²/2) at y = y0 e^s minus its value at the mode y0: with
 * y0 (y0 − a) = ν + 1 and e = e^s − 1 it is (ν + 1)(s − e) − (y0 e)²/2, free of the
 * cancellation of the two terms of order ν. */
static double
hermite_log (const HermiteParams *p, double s)
{
  double ye = p->y0 * expm1 (s);
  return p->c * s_minus_expm1 (s) - 0.5 * ye * ye;
}

static double
hermite_integrand (double s, void *data)
{
  return exp (hermite_log (data, s));
}

/* ln ∫₀^∞ y^ν e^(−(y − a)²/2) dy (the Hermite function times Γ(ν + 1), Johnson, Kotz &
 * Balakrishnan 1995, §31.5), by Gauss–Kronrod quadrature (QUADPACK QAG) in ln y around
 * the integrand's mode. */
static double
log_hermite_integral (double df, double a)
{
  HermiteParams p = { .c = df + 1.0 };
  double c = p.c;
  /* mode of y^(ν+1) e^(−(y − a)²/2) in y: y (y − a) = ν + 1, solved without cancellation */
  p.y0 = a >= 0.0 ? 0.5 * (a + sqrt (a * a + 4.0 * c)) : 2.0 * c / (sqrt (a * a + 4.0 * c) - a);
  double sigma = 1.0 / sqrt (p.y0 * (2.0 * p.y0 - a));
  double d = p.y0 - a;
  /* Left of the mode the log integrand rises with slope at least (1 − e^s)(ν + 1), so the
   * tail beyond s = −14σ is below e^(ℓ(−14σ)) / ((1 − e^(−14σ))(ν + 1)); where that is
   * negligible next to the bulk (≈ 2.5 σ), the range stops there, else 45/(ν + 1) on. */
  double hi = 14.0 * sigma, lo = -hi;
  double tail = hermite_log (&p, lo) - log (-expm1 (lo) * c) - log (2.5 * sigma);
  if (!(tail < -40.0))
    lo -= 45.0 / c;
  gsl_integration_workspace *w = gsl_integration_workspace_alloc (200);
  gsl_function f = { hermite_integrand, &p };
  double res = 0.0, err = 0.0;
  int status = gsl_integration_qag (&f, lo, hi, 0.0, 1e-12, 200, GSL_INTEG_GAUSS21, w,
                                    &res, &err);
  gsl_integration_workspace_free (w);
  if (status != GSL_SUCCESS && !(err < 1e-9 * res))
    return NAN;
  return c * log (p.y0) - 0.5 * d * d + log (res);
}

double
tf_nct_log_pdf (double t, double df, double ncp)
{
  if (!(df > 0.0) || !isfinite (t) || !isfinite (ncp))
    return NAN;
  double t2 = t * t, s = t2 + df;
  double a = ncp * t / sqrt (s);
  return 0.5 * df * log (df) - 0.5 * df * ncp * ncp / s - 0.5 * log (G_PI)
         - gsl_sf_lngamma (0.5 * df) - 0.5 * (df - 1.0) * M_LN2 - 0.5 * (df + 1.0) * log (s)
         + log_hermite_integral (df, a);
}

typedef struct {
  double t, df, p;
} NcpParams;

static double
ncp_root (double ncp, void *data)
{
  const NcpParams *p = data;
  return tf_nct_cdf (p->t, p->df, ncp) - p->p;
}

double
tf_nct_ncp_for_cdf (double t, double df, double p)
{
  NcpParams par = { t, df, p };
  gsl_function f = { ncp_root, &par };
  /* The cdf falls as λ grows. Bracket around t, widening by the spread of T. */
  double spread = 1.0 + fabs (t) / sqrt (2.0 * df) + 1.0;
  double lo = t - 10.0 * spread, hi = t + 10.0 * spread;
  int tries = 0;

  while (ncp_root (lo, &par) < 0.0 && tries++ < 60)
    lo -= 10.0 * spread * (1 << MIN (tries, 20));
  tries = 0;
  while (ncp_root (hi, &par) > 0.0 && tries++ < 60)
    hi += 10.0 * spread * (1 << MIN (tries, 20));
  if (!(ncp_root (lo, &par) >= 0.0 && ncp_root (hi, &par) <= 0.0))
    return NAN;

  /* Brent (1973) */
  gsl_root_fsolver *s = gsl_root_fsolver_alloc (gsl_root_fsolver_brent);
  double root = NAN;
  gsl_root_fsolver_set (s, &f, lo, hi);
  for (int i = 0; i < 200; i++)
    {
      if (gsl_root_fsolver_iterate (s) != GSL_SUCCESS)
        break;
      double a = gsl_root_fsolver_x_lower (s), b = gsl_root_fsolver_x_upper (s);
      root = gsl_root_fsolver_root (s);
      if (gsl_root_test_interval (a, b, 1e-13, 1e-12) == GSL_SUCCESS)
        break;
    }
  gsl_root_fsolver_free (s);
  return root;
}
