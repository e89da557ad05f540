/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-proportion-intervals.c: Wilson, Jeffreys and Agresti–Coull intervals for a
 * proportion to n = 10^12, and the highest-density interval of a beta.
 */
#include "tf-proportion-intervals.h"
#include "tf-incbeta.h"
#include "tf-logspace.h"

#include <math.h>
#include <gsl/gsl_cdf.h>

static double
two_sided_z (double level)
{
  return gsl_cdf_ugaussian_Qinv (0.5 * (1.0 - level));
}

/* The larger root of (n + z²) θ² − (2c + z²) θ + c²/n = 0, the θ with
 * (c − nθ)² = z² nθ(1 − θ): [(2c + z²) + z √(z² + 4c(n − c)/n)] / (2(n + z²)). */
static double
root_plus (double c, double n, double z2)
{
  double disc = z2 + 4.0 * c * ((n - c) / n);
  return (2.0 * c + z2 + sqrt (z2 * MAX (disc, 0.0))) / (2.0 * (n + z2));
}

/* The smaller root as the product of the roots over the larger, free of the
 * cancellation of the textbook form when c is small beside n. */
static double
root_minus (double c, double n, double z2)
{
  return c * c / (n * (n + z2) * root_plus (c, n, z2));
}

/* Wilson 1927; Newcombe 1998, methods 3 and 4, with the roots taken as above. */
void
tf_proportion_wilson (double k, double n, double level, gboolean cc, double *lo, double *hi)
{
  double z = two_sided_z (level), z2 = z * z;

  if (!cc)
    {
      *lo = k > 0.0 ? root_minus (k, n, z2) : 0.0;
      *hi = k < n ? root_plus (k, n, z2) : 1.0;
    }
  else
    {
      *lo = k > 0.0 ? root_minus (k - 0.5, n, z2) : 0.0;
      *hi = k < n ? root_plus (k + 0.5, n, z2) : 1.0;
    }
  *lo = CLAMP (*lo, 0.0, 1.0);
  *hi = CLAMP (*hi, 0.0, 1.0);
}

/* Brown, Cai & DasGupta 2001, §4.1.2: equal-tailed Jeffreys prior interval. */
void
tf_proportion_jeffreys (double k, double n, double level, double *lo, double *hi)
{
  double lp = log (0.5 * (1.0 - level));
  TfIncbetaShape sh;

  tf_incbeta_shape_init (&sh, k + 0.5, n - k + 0.5);
  *lo = k > 0.0 ? tf_incbeta_shape_inverse_log (&sh, lp, TRUE) : 0.0;
  *hi = k < n ? tf_incbeta_shape_inverse_log (&sh, lp, FALSE) : 1.0;
}

/* Agresti & Coull 1998: ñ = n + z², p̃ = (k + z²/2)/ñ, p̃ ± z √(p̃(1 − p̃)/ñ). The lower
 * limit as (p̃² − z² p̃(1 − p̃)/ñ) / (p̃ + z √·), its numerator p̃ (n(k − z²/2) + 2kz²)/ñ²,
 * so that no digits cancel; the upper limit likewise from the other side. */
void
tf_proportion_agresti_coull (double k, double n, double level, double *lo, double *hi)
{
  double z = two_sided_z (level), z2 = z * z;
  double nt = n + z2;
  double pt = (k + 0.5 * z2) / nt, qt = (n - k + 0.5 * z2) / nt;
  double h = z * sqrt (pt * qt / nt);
  double num_lo = pt * (n * (k - 0.5 * z2) + 2.0 * k * z2) / (nt * nt);
  double num_hi = qt * (n * ((n - k) - 0.5 * z2) + 2.0 * (n - k) * z2) / (nt * nt);

  *lo = CLAMP (num_lo / (pt + h), 0.0, 1.0);
  *hi = CLAMP (1.0 - num_hi / (qt + h), 0.0, 1.0);
  if (pt + h < 0.5)
    *hi = MIN (pt + h, 1.0);
}

/* ln f(mode) − ln f(θ) for Beta(P, Q), P, Q > 1: bd0(P − 1, (S − 2)θ) +
 * bd0(Q − 1, (S − 2)(1 − θ)), no cancellation at huge shapes (Loader 2000). */
static double
drop (double P, double Q, double t)
{
  double M = P + Q - 2.0;
  return tf_bd0 (P - 1.0, M * t) + tf_bd0 (Q - 1.0, M * (1.0 - t));
}

/* Its derivative, (S − 2)(θ − mode) / (θ(1 − θ)). */
static double
drop_slope (double P, double Q, double t)
{
  return ((P + Q - 2.0) * t - (P - 1.0)) / (t * (1.0 - t));
}

/* The θ on the far side of the mode from t with the same density: safeguarded Newton
 * on the convex drop over the bracket (Press et al. 2007, rtsafe). */
static double
mirror (double P, double Q, double mode, double t)
{
  double target = drop (P, Q, t);
  double a = t < mode ? mode : 0.0, b = t < mode ? 1.0 : mode;
  double x = CLAMP (2.0 * mode - t, a + 0.5 * (b - a) * 1e-3, b - 0.5 * (b - a) * 1e-3);

  for (int i = 0; i < 200; i++)
    {
      double f = drop (P, Q, x) - target;
      double g = drop_slope (P, Q, x);
      /* the drop rises with x above the mode and falls below it */
      if ((f > 0.0) == (t < mode))
        b = x;
      else
        a = x;
      double nx = x - f / g;
      if (!(nx > MIN (a, b) && nx < MAX (a, b)) || !isfinite (nx))
        nx = 0.5 * (a + b);
      if (fabs (nx - x) <= 1e-15 * MIN (nx, 1.0 - nx) || nx == x)
        return nx;
      x = nx;
    }
  return x;
}

/* Highest-density interval of Beta(P, Q), P, Q > 1, with P − 1 <= Q − 1, so that the
 * end that may lie extremely close to its boundary is the lower one: lo solves
 * F(lo) + S(mirror(lo)) = 1 − level, safeguarded Newton in ln lo (so that an end at
 * 1e-40, P near 1, is found as easily as one at 0.3) with slope
 * lo f(lo) (1 − D'(lo)/D'(hi)); the tails from the log-space incomplete beta. The
 * equal-density condition is Box & Tiao's (1973, §2.8). */
static void
hdi_inside (TfIncbetaShape *sh, double level, double *lo, double *hi)
{
  const double P = sh->a, Q = sh->b;
  double mode = (P - 1.0) / (P + Q - 2.0);
  double la = log (1.0 - level);
  double a = log (1e-300), b = log (mode);
  /* start at the normal approximation's lower end, mode − z sd */
  double S = P + Q;
  double x = mode - two_sided_z (level) * sqrt (P * Q / (S * S * (S + 1.0)));
  double v = x > 0.0 && x < mode ? log (x) : log (0.5 * mode);

  /* P so near 1 that the lower end is below 1e-300: take it as 0, the density as
   * falling from there */
  {
    double fl, fu, gl, gu, y = mirror (P, Q, mode, 1e-300);
    tf_incbeta_shape_log_both (sh, 1e-300, 1.0, &fl, &fu, NULL);
    tf_incbeta_shape_log_both (sh, y, 1.0 - y, &gl, &gu, NULL);
    if (tf_log_add (fl, gu) >= la)
      {
        *lo = 0.0;
        *hi = tf_incbeta_shape_inverse_log (sh, log1p (-level), FALSE);
        return;
      }
  }
  for (int i = 0; i < 200; i++)
    {
      double fl, fu, gl, gu;
      x = exp (v);
      double y = mirror (P, Q, mode, x);
      tf_incbeta_shape_log_both (sh, x, 1.0 - x, &fl, &fu, NULL);
      tf_incbeta_shape_log_both (sh, y, 1.0 - y, &gl, &gu, NULL);
      double lout = tf_log_add (fl, gu);
      /* ln out − ln α rises with lo */
      if (lout > la)
        b = v;
      else
        a = v;
      double dens = exp (tf_log_dbeta (x, 1.0 - x, P, Q) - lout);
      double slope = x * dens * (1.0 - drop_slope (P, Q, x) / drop_slope (P, Q, y));
      double nv = v - (lout - la) / slope;
      if (!(nv > a && nv < b) || !isfinite (nv))
        nv = 0.5 * (a + b);
      double step = fabs (nv - v);
      v = nv;
      if (step <= 1e-14 || b - a <= 1e-14)
        break;
    }
  *lo = exp (v);
  *hi = mirror (P, Q, mode, *lo);
}

/* Newton's method on both conditions at once, F(lo) + S(hi) = 1 − level and
 * f(lo) = f(hi) (Box & Tiao 1973, §2.8), in v = ln lo and w = ln(1 − hi), from the
 * equal-tailed interval [lo0, hi0]: there the first condition holds already, so the
 * first step needs the densities only. Stops once a step is below 1e-7 of the
 * posterior sd on the scale of v and w (what is left is then about its square).
 * FALSE when a step leaves (0, mode) × (mode, 1) or it does not settle in 8 steps. */
static gboolean
hdi_newton (TfIncbetaShape *sh, double level, double lo0, double hi0, double *lo, double *hi)
{
  const double P = sh->a, Q = sh->b, S = P + Q;
  const double mode = (P - 1.0) / (S - 2.0), sd = sqrt (P / S * (Q / S) / (S + 1.0));
  const double la = log1p (-level);

  if (!(lo0 > 0.0 && lo0 < mode && hi0 > mode && hi0 < 1.0))
    return FALSE;
  double v = log (lo0), w = log1p (-hi0);
  for (int i = 0; i < 8; i++)
    {
      double l = exp (v), yh = exp (w);
      double h = 1.0 - yh;
      double lout, lfl, lfh;       /* ln(F(lo) + S(hi)), ln f(lo), ln f(hi) */
      if (i == 0)
        {
          lout = la;
          lfl = tf_log_dbeta (l, 1.0 - l, P, Q);
          lfh = tf_log_dbeta (h, yh, P, Q);
        }
      else
        {
          double fl, sl, fh, shi, pl, ph;
          tf_incbeta_shape_log_both (sh, l, 1.0 - l, &fl, &sl, &pl);
          tf_incbeta_shape_log_both (sh, h, yh, &fh, &shi, &ph);
          lout = tf_log_add (fl, shi);
          lfl = pl - v - log1p (-l);
          lfh = ph - log (h) - w;
        }
      double r1 = lout - la;
      double r2 = drop (P, Q, h) - drop (P, Q, l);     /* ln f(lo) − ln f(hi) */
      /* the Jacobian in (v, w); its determinant is negative */
      double j11 = exp (lfl + v - lout), j12 = exp (lfh + w - lout);
      double j21 = (P - 1.0) - (Q - 1.0) * (l / (1.0 - l));
      double j22 = (P - 1.0) * (yh / h) - (Q - 1.0);
      double det = j11 * j22 - j12 * j21;
      double dv = (j12 * r2 - j22 * r1) / det, dw = (j21 * r1 - j11 * r2) / det;
      v += dv;
      w += dw;
      if (!(isfinite (v) && isfinite (w) && exp (v) < mode && -expm1 (w) > mode))
        return FALSE;
      if (fabs (dv) <= 1e-7 * MIN (1.0, sd / l) && fabs (dw) <= 1e-7 * MIN (1.0, sd / yh))
        {
          *lo = exp (v);
          *hi = -expm1 (w);
          return TRUE;
        }
    }
  return FALSE;
}

gboolean
tf_beta_hdi_from (TfIncbetaShape *shape, double level, double lo0, double hi0, double *lo,
                  double *hi)
{
  const double P = shape->a, Q = shape->b;
  double alpha = 1.0 - level;

  if (P <= 1.0 && Q <= 1.0)
    return FALSE;
  if (P <= 1.0)
    {
      *lo = 0.0;
      *hi = tf_incbeta_shape_inverse_log (shape, log (alpha), FALSE);
      return TRUE;
    }
  if (Q <= 1.0)
    {
      *lo = tf_incbeta_shape_inverse_log (shape, log (alpha), TRUE);
      *hi = 1.0;
      return TRUE;
    }
  if (hdi_newton (shape, level, lo0, hi0, lo, hi))
    return TRUE;
  if (P <= Q)
    hdi_inside (shape, level, lo, hi);
  else
    {
      /* the robust search wants the end that may lie extremely near its boundary below */
      TfIncbetaShape swapped;
      double l, h;
      tf_incbeta_shape_init (&swapped, Q, P);
      hdi_inside (&swapped, level, &l, &h);
      *lo = 1.0 - h;
      *hi = 1.0 - l;
    }
  return TRUE;
}

gboolean
tf_beta_hdi (double P, double Q, double level, double *lo, double *hi)
{
  TfIncbetaShape sh;
  double alpha2 = 0.5 * (1.0 - level);

  tf_incbeta_shape_init (&sh, P, Q);
  if (P <= 1.0 || Q <= 1.0)
    return tf_beta_hdi_from (&sh, level, NAN, NAN, lo, hi);
  return tf_beta_hdi_from (&sh, level, tf_incbeta_shape_inverse_log (&sh, log (alpha2), TRUE),
                           tf_incbeta_shape_inverse_log (&sh, log (alpha2), FALSE), lo, hi);
}
