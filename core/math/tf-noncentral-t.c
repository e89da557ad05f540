/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-noncentral-t.c: distribution function, density and the inverse in λ of the
 * noncentral t distribution.
 */
#include "tf-noncentral-t.h"

#include <math.h>
#include <gsl/gsl_cdf.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_roots.h>
#include <gsl/gsl_sf_erf.h>
#include <gsl/gsl_sf_gamma.h>

#include "tf-logspace.h"

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

/* ln of g(a) = x^a (1 − x)^b / (a B(a, b)), the step of I_x(a + 1, b) = I_x(a, b) − g(a)
 * (Abramowitz & Stegun 1964, 26.5.16); ln x and ln(1 − x) given. */
static double
log_beta_step (double a, double b, double lx, double l1x)
{
  return a * lx + b * l1x - log (a) - gsl_sf_lnbeta (a, b);
}

/* P(T <= t) for t >= 0 (Lenth 1989, AS 243): Φ(−λ) + ½ Σ_j [p_j I_x(j + ½, ν/2)
 * + q_j I_x(j + 1, ν/2)], x = t²/(t² + ν), p_j and q_j Poisson(λ²/2) weights, summed
 * forward and backward from j = ⌊λ²/2⌋ (Benton & Krishnamoorthy 2003) until the
 * remaining weight bounds the error below 1e-15. The two I_x at the start are GSL's,
 * the others by the recurrence in a: forward it subtracts g(a) from a value that
 * only falls (absolute error a few ulps a step), backward it adds. */
static double
nct_cdf_nonneg (double t, double df, double ncp)
{
  double s = t * t + df, x = t * t / s;
  double lx = log (x), l1x = log (df / s);
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
  double ip_k = beta_inc (k + 0.5, half_b, x), iq_k = beta_inc (k + 1.0, half_b, x);
  double gp_k = exp (log_beta_step (k + 0.5, half_b, lx, l1x));
  double gq_k = exp (log_beta_step (k + 1.0, half_b, lx, l1x));
  double p = pk, q = qk, ip = ip_k, iq = iq_k, gp = gp_k, gq = gq_k;
  double cp_rest = 1.0, wsum = 0.0;

  /* backward: I_x(a − 1, b) = I_x(a, b) + g(a − 1), g(a − 1) = g(a) a / (x (a − 1 + b)) */
  for (double j = k; j >= 0.0; j--)
    {
      sum += p * ip + q * iq;
      wsum += p;
      if (p * ip + fabs (q) * iq < 1e-17 * fabs (sum) && k - j > 3.0)
        break;
      if (j == 0.0)
        break;
      p *= j / lam;
      q *= (j + 0.5) / lam;
      gp *= (j + 0.5) / (x * (j - 0.5 + half_b));
      gq *= (j + 1.0) / (x * (j + half_b));
      ip += gp;
      iq += gq;
    }
  /* forward: I_x(a + 1, b) = I_x(a, b) − g(a), g(a + 1) = g(a) x (a + b) / (a + 1) */
  p = pk;
  q = qk;
  ip = ip_k;
  iq = iq_k;
  gp = gp_k;
  gq = gq_k;
  for (double j = k + 1.0; ; j++)
    {
      p *= lam / j;
      q *= lam / (j + 0.5);
      ip = MAX (ip - gp, 0.0);
      iq = MAX (iq - gq, 0.0);
      gp *= x * (j - 0.5 + half_b) / (j + 0.5);
      gq *= x * (j + half_b) / (j + 1.0);
      double term = p * ip + q * iq;
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

/* ln(1 + e) − e without cancellation: −e²/(2 + e) + 2z Σ_k≥1 z^(2k)/(2k + 1),
 * z = e/(2 + e), for |e| < ½ (from ln(1 + e) = 2 atanh z; |z| ≤ ⅓, ten terms). */
static double
log1p_minus (double e)
{
  if (!(fabs (e) < 0.5))
    return log1p (e) - e;
  double z = e / (2.0 + e), z2 = z * z, p = 0.0;
  for (int k = 10; k >= 1; k--)
    p = 1.0 / (2 * k + 1) + z2 * p;
  return -e * e / (2.0 + e) + 2.0 * z * z2 * p;
}

#define TRAP_STEP 0.6           /* in the softplus variable, where the bulk's sd is ≥ 1 */
#define TRAP_STOP -38.0         /* ln of the last term kept, relative to the mode's */

/* ln of ∫₀^∞ y^ν e^(−(y − a)²/2) dy (the Hermite function times Γ(ν + 1), Johnson,
 * Kotz & Balakrishnan 1995, §31.5) minus ln of its integrand at the mode y0, which the
 * caller adds in closed form. With σ = y0/√(y0² + ν) (the integrand's sd at the mode)
 * and y = σ ln(1 + e^v), the integrand in v is log-like at y = 0 and Gaussian of sd
 * at least 1 at the bulk, analytic in a strip of half-width about π about the real
 * line: the trapezoidal rule with step 0.6 then has an error near e^(−2π·2.5/0.6)
 * (Trefethen & Weideman 2014); measured within 2e-12 of QUADPACK (QAG at 1e-12) for
 * ν from 0.5 to 10^3, and within 1e-13 of mpmath's hypergeometric form at ν = 10^5
 * and 10^8. The exponent is ν (ln(1 + ε) − ε) − (y − y0)²/2 + ln(dy/dv) with
 * ε = (y − y0)/y0, free of the cancellation of its two terms of order ν; e^v is
 * stepped by products along the nodes, so a node costs one log1p and one exp. */
static double
log_hermite_ratio (double nu, double y0, double sigma)
{
  const double h = TRAP_STEP, q = y0 / sigma;
  const gboolean linear = q > 40.0;           /* ln(1 + e^v) = v to double precision */
  double u0 = linear ? q : log (expm1 (q));
  double sum = 0.0;

  for (int dir = -1; dir <= 1; dir += 2)
    {
      double step = linear ? 1.0 : exp (dir * h), ev = linear ? 0.0 : exp (u0);
      for (int k = dir == -1 ? 0 : 1; k < 100000; k++)
        {
          double v = u0 + dir * k * h, dy, ljac;
          if (k > 0)
            ev *= step;
          if (linear && v > 40.0)
            {
              dy = sigma * (v - u0);
              ljac = 0.0;
            }
          else
            {
              double sp = v > 40.0 ? v : log1p (linear ? exp (v) : ev);   /* softplus */
              dy = sigma * (sp - q);
              ljac = v - sp;                  /* ln of dy/dv = σ e^v / (1 + e^v), less ln σ */
            }
          double l = nu * log1p_minus (dy / y0) - 0.5 * dy * dy + ljac;
          sum += exp (l);
          if (!(l >= TRAP_STOP))
            break;
        }
    }
  return log (sigma * h * sum);
}

/* ln ∫₀^∞ y^ν e^(−(y − a)²/2) dy for a whole ν ≤ 30 and a ≥ 0 in closed form: H_0 =
 * √(2π) Φ(a), H_1 = e^(−a²/2) + a H_0 and H_(k+1) = a H_k + k H_(k−1) (integration by
 * parts), every term positive. */
static double
log_hermite_whole (int nu, double a)
{
  double h0 = sqrt (2.0 * G_PI) * 0.5 * erfc (-a / G_SQRT2);
  double h1 = exp (-0.5 * a * a) + a * h0;
  for (int k = 1; k < nu; k++)
    {
      double h2 = a * h1 + k * h0;
      h0 = h1;
      h1 = h2;
    }
  return log (h1);
}

/* The density (Johnson, Kotz & Balakrishnan 1995, eq. 31.15) is
 *   ν^(ν/2) e^(−νλ²/(2s)) / (√π Γ(ν/2) 2^((ν−1)/2) s^((ν+1)/2)) ∫₀^∞ y^ν e^(−(y − a)²/2) dy
 * with s = t² + ν, a = λt/√s. The integrand's mode is y0 = √ν r0, r0 (r0 − α) = 1,
 * α = a/√ν; with Stirling's series for Γ(ν/2) the terms of order ν cancel by hand:
 *   ln f = ½ ln ν − ½ ln 2π − R(ν/2) − ½ ln π − ½ ln s − (ν/2) ln(1 + t²/ν)
 *          + ν (ln r0 + α/(2 r0)) − νλ²/(2s) + ln(integral / integrand at y0),
 * R the Stirling remainder; ν ln y0 − (y0 − a)²/2 became ν ln r0 + να/(2r0) + ν/2
 * through y0 − a = ν/y0 and r0 − 1/r0 = α. For a whole ν ≤ 30 and a ≥ 0 the integral
 * is in closed form (about 0.1 µs), else by the trapezoidal rule (about 1 µs). */
double
tf_nct_log_pdf (double t, double df, double ncp)
{
  if (!(df > 0.0) || !isfinite (t) || !isfinite (ncp))
    return NAN;
  const double nu = df, s = t * t + nu;
  double alpha = ncp * (t / sqrt (s)) / sqrt (nu);
  double u = alpha * alpha / (sqrt (alpha * alpha + 4.0) + 2.0);      /* √(α² + 4) − 2 */
  double r0, lr0;
  if (alpha >= 0.0)
    {
      r0 = 1.0 + 0.5 * (alpha + u);
      lr0 = log1p (0.5 * (alpha + u));
    }
  else
    {
      r0 = 2.0 / (2.0 + u - alpha);
      lr0 = log1p ((alpha - u) / (2.0 + u - alpha));
    }
  double lead = nu < 20.0
                ? 0.5 * nu * log (nu) - gsl_sf_lngamma (0.5 * nu) - 0.5 * (nu - 1.0) * M_LN2 - 0.5 * nu
                : 0.5 * log (nu) - 0.5 * log (2.0 * G_PI) - tf_stirling_remainder (0.5 * nu);
  double y0 = sqrt (nu) * r0, a = alpha * sqrt (nu), ratio;
  if (nu <= 30.0 && nu == floor (nu) && a >= 0.0 && a < 1e8)
    ratio = log_hermite_whole ((int) nu, a) - nu * log (y0) + 0.5 * (nu / y0) * (nu / y0);
  else
    ratio = log_hermite_ratio (nu, y0, r0 / sqrt (r0 * r0 + 1.0));
  return lead - 0.5 * log (G_PI) - 0.5 * log (s) - 0.5 * nu * log1p (t * t / nu)
         + nu * (lr0 + 0.5 * alpha / r0) - 0.5 * nu * (ncp * ncp / s) + ratio;
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
  /* The cdf falls as λ grows. Bracket around the large-ν value λ ≈ t − z_p √(1 + t²/(2ν))
   * (Johnson & Welch 1940), widening by the spread of T, doubling each time. */
  double spread = sqrt (1.0 + t * t / (2.0 * df));
  double guess = t - gsl_cdf_ugaussian_Pinv (p) * spread;
  if (!isfinite (guess))
    guess = t;
  double lo = guess - spread, hi = guess + spread;
  double flo = ncp_root (lo, &par), fhi = ncp_root (hi, &par);
  for (int tries = 0; flo < 0.0 && tries < 80; tries++)
    {
      hi = lo;
      fhi = flo;
      lo -= spread * (1 << MIN (tries + 1, 40));
      flo = ncp_root (lo, &par);
    }
  for (int tries = 0; fhi > 0.0 && tries < 80; tries++)
    {
      lo = hi;
      flo = fhi;
      hi += spread * (1 << MIN (tries + 1, 40));
      fhi = ncp_root (hi, &par);
    }
  if (!(flo >= 0.0 && fhi <= 0.0))
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
