/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-incbeta-inverse.c: the inverse of the regularised incomplete beta function.
 *
 * The quantile is sought for the smaller tail (p <= ½), as a lower-tail quantile w of
 * Beta(p, q) (the upper tail of Beta(a, b) at x being the lower tail of Beta(b, a) at
 * 1 − x), in t = ln w or t = ln(1 − w), whichever side is the smaller, so that a
 * quantile at 1e-300 or at 1 − 1e-300 is found with the same relative accuracy. From
 * a published starting value, Halley's method on ln tail(t) uses the density that the
 * same evaluation gives; a bracket keeps every step safe.
 */
#include "tf-incbeta.h"
#include "tf-incbeta-private.h"
#include "tf-logspace.h"

#include <math.h>
#include <float.h>
#include <gsl/gsl_cdf.h>

/* The lowest t tried: e^−744 is a few times the smallest subnormal (e^−744.44); a
 * quantile below it is returned as 0 (or 1). */
#define T_MIN (-744.0)

/* The standard normal z with ln Φ(z) = lp <= −ln 2: GSL's quantile (Wichura 1988,
 * AS 241) while e^lp is a normal double, else the tail ln Φ(z) ≈ −z²/2 − ½ ln(2π z²)
 * (Abramowitz & Stegun 1964, 26.2.12) solved by fixed-point steps. */
static double
normal_quantile_log (double lp)
{
  if (lp > -700.0)
    return gsl_cdf_ugaussian_Pinv (exp (lp));
  double z2 = -2.0 * lp;
  for (int i = 0; i < 4; i++)
    z2 = -2.0 * lp - log (2.0 * G_PI * z2);
  return -sqrt (z2);
}

/* ln(1 + e^l) without overflow. */
static double
softplus (double l)
{
  return l > 0.0 ? l + log1p (exp (-l)) : log1p (exp (l));
}

/* Given ln v of one side's value (side 0: w, side 1: 1 − w), the smaller side and
 * its ln. */
static void
pick_side (double lv, int v_side, int *side, double *t)
{
  if (lv <= -G_LN2)
    {
      *side = v_side;
      *t = lv;
    }
  else
    {
      *side = 1 - v_side;
      *t = tf_log1mexp (lv);
    }
  *t = MAX (*t, T_MIN);
}

/* A starting value for the lower-tail quantile w of Beta(p, q) at ln P = lp <= −ln 2,
 * as a side and t: Carter's (1947) approximation w = p / (p + q e^{2e}) when both
 * shapes exceed 1, else the power-law tails or the χ² approximation, all in log space
 * (Cran, Martin & Thomas 1977, AS 109; Majumder & Bhattacharjee 1973, AS 64), with
 * the exact normal quantile in place of their rational one. */
static void
initial_guess (TfIncbetaShape *sh, double lp, double p, double q, int *side, double *t)
{
  double y = -normal_quantile_log (lp);   /* upper normal quantile, >= 0 */

  if (p > 1.0 && q > 1.0)
    {
      double r = (y * y - 3.0) / 6.0;
      double s = 1.0 / (p + p - 1.0), u = 1.0 / (q + q - 1.0);
      double h = 2.0 / (s + u);
      double e = y * sqrt (h + r) / h - (u - s) * (r + 5.0 / 6.0 - 2.0 / (3.0 * h));
      double l = 2.0 * e + log (q / p);    /* w = 1 / (1 + e^l) */
      if (l >= 0.0)
        pick_side (-softplus (l), 0, side, t);
      else
        pick_side (-softplus (-l), 1, side, t);
      return;
    }
  double lb = tf_incbeta_shape_log_beta (sh);
  double r = q + q, c = 1.0 / (9.0 * q);
  double chi = r * pow (1.0 - c + y * sqrt (c), 3.0);
  if (chi <= 0.0)
    {
      /* 1 − w = (q B (1 − P))^{1/q} */
      pick_side ((tf_log1mexp (lp) + log (q) + lb) / q, 1, side, t);
      return;
    }
  chi = (4.0 * p + r - 2.0) / chi;
  if (chi <= 1.0)
    pick_side ((lp + log (p) + lb) / p, 0, side, t);   /* w = (p B P)^{1/p} */
  else
    pick_side (G_LN2 - log1p (chi), 1, side, t);       /* 1 − w = 2 / (1 + χ) */
}

/* The frame's quantile w (side 0: e^t, side 1: 1 − e^t) as x of the tail asked. */
static double
answer (int side, double t, gboolean lower)
{
  double v = exp (t);
  /* lower: x = w; upper: x = 1 − w */
  return (side == 0) == lower ? v : 1.0 - v;
}

/* The search in the frame: the lower tail of Beta(p, q) at ln P = lp, the current
 * point t on its side (0: t = ln w, 1: t = ln(1 − w)), and the bracket (lo, hi) in t
 * that holds the root. */
typedef struct {
  TfIncbetaShape *sh;
  double lp;
  gboolean lower;               /* the tail asked, for the answer's x */
  double p, q;
  double sd;                    /* the frame's standard deviation */
  int side;
  double t;
  double lo, hi;
} Search;

/* One evaluation at t: g = ln tail − lp (rising with w), dg/dt, d²g/dt², and the
 * natural scale of t. */
typedef struct {
  double g, g1, g2, scale;
} Eval;

/* The other side is the smaller now: t = ln(1 − e^t), the bracket mapped. */
static void
switch_side (Search *s)
{
  double l0 = s->lo;
  s->side = 1 - s->side;
  s->t = tf_log1mexp (s->t);
  s->lo = tf_log1mexp (s->hi);
  s->hi = tf_log1mexp (l0);
}

/* dg/dt and d²g/dt² from the density w^{p−1} (1 − w)^{q−1} / B = e^lpre / (w (1 − w)),
 * given w, 1 − w, their logs and l = ln tail. */
static void
derivatives (const Search *s, double w, double wc, double lw, double lwc, double l,
             double lpre, Eval *e)
{
  if (s->side == 0)
    {
      e->g1 = exp (lpre - lwc - l);
      e->g2 = e->g1 * (s->p - (s->q - 1.0) * (w / wc) - e->g1);
    }
  else
    {
      e->g1 = -exp (lpre - lw - l);
      e->g2 = e->g1 * (s->q - (s->p - 1.0) * (wc / w) - e->g1);
    }
}

/* The tail and density at t (one incomplete beta evaluation), the bracket narrowed by
 * the sign of g; FALSE with the answer in *x when that ends the search. */
static gboolean
evaluate (Search *s, Eval *e, double *x)
{
  double v = exp (s->t), vc = 1.0 - v;
  /* the natural scale of t, sd / (the side's value), at most 1 */
  e->scale = MIN (1.0, s->sd / v);
  double lv = s->t, lvc = log1p (-v);
  /* w and 1 − w, and x, y = 1 − x of the tail asked */
  double w = s->side ? vc : v, wc = s->side ? v : vc;
  double lw = s->side ? lvc : lv, lwc = s->side ? lv : lvc;
  double l, u, lpre;
  if (s->lower)
    tf_incbeta_shape_log_both (s->sh, w, wc, &l, &u, &lpre);
  else
    tf_incbeta_shape_log_both (s->sh, wc, w, &u, &l, &lpre);
  e->g = l - s->lp;    /* rises with w */
  if (isnan (e->g))
    {
      *x = NAN;
      return FALSE;
    }
  if (e->g == 0.0)
    {
      *x = answer (s->side, s->t, s->lower);
      return FALSE;
    }
  if ((e->g > 0.0) == (s->side == 0))
    s->hi = s->t;
  else
    s->lo = s->t;
  derivatives (s, w, wc, lw, lwc, l, lpre, e);
  return TRUE;
}

/* Halley's step in t where its correction is moderate, else Newton's (*halley says
 * which). */
static double
propose_step (const Search *s, const Eval *e, gboolean *halley)
{
  double newton = -e->g / e->g1;
  double c = 0.5 * newton * e->g2 / e->g1;
  *halley = fabs (c) <= 0.5;
  double step = *halley ? newton / (1.0 + c) : newton;
  /* Far below a quantile near 1 the tail falls like e^{−p(1 − w)} (the gamma limit,
   * ln Q(q, u) ≈ −u + (q − 1) ln u, u = p(1 − w), slope −u + q − 1 in t): there
   * Newton's step in 1 − w itself, not in its log */
  if (s->side == 1 && e->g1 < -2.0 * MAX (s->q, 1.0) && newton < 0.0 && newton > -1.0)
    {
      step = log1p (newton);
      *halley = FALSE;
    }
  return step;
}

/* The step taken, or the bracket halved where it leaves the bracket; FALSE with the
 * answer in *x when the search has converged. */
static gboolean
take_step (Search *s, const Eval *e, double step, gboolean halley, double *x)
{
  double tn = s->t + step;
  /* After a step δ (in units of the scale σ) what is left is about σ(δ/σ)³ for
   * Halley's method and σ(δ/σ)² for Newton's: stop when that is below 1e-15 σ
   * (the σ of the curvature, |g'/g''|, when it is the smaller). */
  double tol = (halley ? 1e-5 : 1e-8) * MIN (e->scale, fabs (e->g1 / e->g2));
  *x = NAN;
  if (tn == s->t || (tn > s->lo && tn < s->hi && isfinite (tn)))
    {
      if (fabs (step) <= tol || tn == s->t)
        {
          *x = answer (s->side, tn, s->lower);
          return FALSE;
        }
    }
  else
    {
      /* outside the bracket: halve it, or walk down while it is open below */
      if (s->hi <= T_MIN)
        {
          *x = answer (s->side, -INFINITY, s->lower);    /* the quantile underflows */
          return FALSE;
        }
      tn = isinf (s->lo) ? MAX (2.0 * s->hi - 1.0, T_MIN) : 0.5 * (s->lo + s->hi);
      if (!(tn > s->lo && tn < s->hi))
        {
          *x = answer (s->side, s->t, s->lower);
          return FALSE;
        }
    }
  if (s->hi - s->lo <= 2.0 * DBL_EPSILON * fabs (tn))
    {
      *x = answer (s->side, tn, s->lower);
      return FALSE;
    }
  s->t = tn;
  return TRUE;
}

double
tf_incbeta_shape_inverse_log (TfIncbetaShape *sh, double lp, gboolean lower)
{
  const double a = sh->a, b = sh->b;

  if (!(a > 0.0) || !(b > 0.0) || isnan (lp) || lp > 0.0)
    return NAN;
  if (lp == 0.0)
    return lower ? 1.0 : 0.0;
  if (lp == -INFINITY)
    return lower ? 0.0 : 1.0;
  if (lp > -G_LN2)
    {
      lp = tf_log1mexp (lp);
      lower = !lower;
    }

  /* the frame: the lower tail of Beta(p, q) */
  Search s = { .sh = sh, .lp = lp, .lower = lower };
  s.p = lower ? a : b;
  s.q = lower ? b : a;
  initial_guess (sh, lp, s.p, s.q, &s.side, &s.t);
  const double n = s.p + s.q;
  s.sd = sqrt (s.p / n * (s.q / n) / (n + 1.0));
  s.lo = -INFINITY;
  s.hi = 0.0;

  for (int iter = 0; iter < 300; iter++)
    {
      Eval e;
      gboolean halley;
      double x;
      if (s.t > -G_LN2)
        switch_side (&s);
      if (!evaluate (&s, &e, &x))
        return x;
      double step = propose_step (&s, &e, &halley);
      if (!take_step (&s, &e, step, halley, &x))
        return x;
    }
  return answer (s.side, s.t, s.lower);
}

double
tf_incbeta_inverse_log (double log_p, double a, double b, gboolean lower)
{
  TfIncbetaShape sh;
  tf_incbeta_shape_init (&sh, a, b);
  return tf_incbeta_shape_inverse_log (&sh, log_p, lower);
}

double
tf_incbeta_inverse (double p, double a, double b, gboolean lower)
{
  if (!(p >= 0.0 && p <= 1.0))
    return NAN;
  /* the smaller tail, 1 − p being exact for p >= ½ */
  if (p > 0.5)
    return tf_incbeta_inverse_log (log1p (-p), a, b, !lower);
  return tf_incbeta_inverse_log (log (p), a, b, lower);
}
