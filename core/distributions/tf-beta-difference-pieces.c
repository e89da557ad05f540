/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-beta-difference-pieces.c: the robust, slower integration of tf-beta-difference.c,
 * for inputs where its fixed rule does not reach its tolerance (shapes far below 1,
 * integrands whose mass sits at a representable end).
 *
 * P(Δ <= d) = ∫ f_A(z) P(θB >= z − d) dz, P(Δ >= d) = ∫ f_A(z) P(θB <= z − d) dz and
 * the density ∫ f_A(z) f_B(z − d) dz, or the same over θB, whichever of the two is the
 * narrower, so that the other factor is smooth on the scale of the integrand. The
 * integration variable's support is cut at its own quantiles at tail levels from
 * 1e-300 to ½, each piece is integrated by GSL's QAGS (Piessens et al. 1983) with
 * the integrand scaled by a bound on the piece, and pieces whose bound (the piece's
 * mass times the other factor's largest value on it) is below 1e-18 of the sum so far
 * are skipped.
 */
#include "tf-beta-difference-private.h"
#include "tf-incbeta.h"
#include "tf-logspace.h"

#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_integration.h>

static const double tail_levels[] = { 1e-300, 1e-100, 1e-40, 1e-16, 1e-8, 1e-4, 1e-2, 0.1, 0.3 };

/* The cuts: quantiles of the integration variable at the tail levels, computed on the
 * first call that needs them (each is an inverse incomplete beta). */
static void
ensure_cuts (TfBetaDiff *bd)
{
  const guint nl = G_N_ELEMENTS (tail_levels);
  double p = bd->over_a ? bd->pa : bd->pb, q = bd->over_a ? bd->qa : bd->qb;
  guint j = 0;

  if (bd->have_cuts)
    return;
  bd->have_cuts = TRUE;

  bd->cut[j] = 0.0;
  bd->log_tail[j] = -INFINITY;
  bd->cut_lower[j++] = TRUE;
  for (guint i = 0; i < nl; i++, j++)
    {
      bd->log_tail[j] = log (tail_levels[i]);
      bd->cut[j] = tf_incbeta_inverse_log (bd->log_tail[j], p, q, TRUE);
      bd->cut_lower[j] = TRUE;
    }
  bd->log_tail[j] = -G_LN2;
  bd->cut[j] = tf_incbeta_inverse (0.5, p, q, TRUE);
  bd->cut_lower[j++] = TRUE;
  for (guint i = nl; i-- > 0; j++)
    {
      bd->log_tail[j] = log (tail_levels[i]);
      bd->cut[j] = tf_incbeta_inverse_log (bd->log_tail[j], p, q, FALSE);
      bd->cut_lower[j] = FALSE;
    }
  bd->cut[j] = 1.0;
  bd->log_tail[j] = -INFINITY;
  bd->cut_lower[j++] = FALSE;
  bd->n_cuts = j;
  /* quantiles that did not come out, or out of order, collapse onto their neighbour */
  for (guint i = 1; i < j; i++)
    if (!(bd->cut[i] >= bd->cut[i - 1]) || !(bd->cut[i] <= 1.0))
      bd->cut[i] = MIN (1.0, bd->cut[i - 1]);
  /* 1 − cut, from the mirrored beta where the cut is near 1, so that it keeps its digits */
  for (guint i = 0; i < j; i++)
    {
      bd->cut_y[i] = 1.0 - bd->cut[i];
      if (bd->cut[i] > 0.5 && i > 0 && i + 1 < j)
        {
          double y = tf_incbeta_inverse_log (bd->log_tail[i], q, p, !bd->cut_lower[i]);
          if (isfinite (y) && y >= 0.0 && y <= 0.5)
            bd->cut_y[i] = y;
        }
    }
  for (guint i = 1; i < j; i++)
    if (bd->cut_y[i] > bd->cut_y[i - 1])
      bd->cut_y[i] = bd->cut_y[i - 1];
}

typedef struct {
  const TfBetaDiff *bd;
  double d;
  TfBdKind kind;
  double ref;
  double pv, qv, po, qo;        /* integration variable V and the other, O */
} Integrand;

/* w, the other variable's argument: z − d over θA, x + d over θB; 1 − w beside it. */
static void
other_arg (const Integrand *in, double v, double vy, double *w, double *y)
{
  if (in->bd->over_a)
    {
      *w = v - in->d;
      *y = vy + in->d;
    }
  else
    {
      *w = v + in->d;
      *y = vy - in->d;
    }
}

/* ln of the other factor at v: P(θB >= z − d), P(θB <= z − d) or f_B(z − d) over θA;
 * P(θA <= x + d), P(θA >= x + d) or f_A(x + d) over θB. */
static double
log_factor (const Integrand *in, double v, double vy)
{
  double w, y, l, u;
  gboolean want_lower;

  other_arg (in, v, vy, &w, &y);
  if (in->kind == TF_BD_DENSITY)
    {
      if (w <= 0.0 || y <= 0.0)
        return -INFINITY;
      return tf_log_dbeta (w, y, in->po, in->qo);
    }
  /* over θA the lower tail of Δ is the upper tail of θB, and the other way round */
  want_lower = (in->kind == TF_BD_LOWER) != in->bd->over_a;
  if (w <= 0.0)
    return want_lower ? -INFINITY : 0.0;
  if (y <= 0.0)
    return want_lower ? 0.0 : -INFINITY;
  tf_incbeta_log_both (w, y, in->po, in->qo, &l, &u);
  return want_lower ? l : u;
}

static double
integrand_vy (const Integrand *in, double v, double vy)
{
  if (v <= 0.0 || vy <= 0.0)
    return 0.0;
  double l = tf_log_dbeta (v, vy, in->pv, in->qv) + log_factor (in, v, vy);
  double r = exp (l - in->ref);
  return isfinite (r) ? r : (l == -INFINITY ? 0.0 : GSL_DBL_MAX);
}

static double
integrand (double v, void *data)
{
  return integrand_vy (data, v, 1.0 - v);
}

/* the same in y = 1 − v, for pieces near 1 */
static double
integrand_y (double y, void *data)
{
  return integrand_vy (data, 1.0 - y, y);
}

/* ln of the largest value of the other factor on [v0, v1]: the factor is monotone in v
 * for tails; the density's mode is used when it is inside (+inf when a shape <= 1). */
static double
log_factor_max (const Integrand *in, double v0, double v1)
{
  if (in->kind != TF_BD_DENSITY)
    {
      double a = log_factor (in, v0, 1.0 - v0), b = log_factor (in, v1, 1.0 - v1);
      return MAX (a, b);
    }
  if (in->po <= 1.0 || in->qo <= 1.0)
    return INFINITY;
  double mode = (in->po - 1.0) / (in->po + in->qo - 2.0), w0, w1, y;
  other_arg (in, v0, 1.0 - v0, &w0, &y);
  other_arg (in, v1, 1.0 - v1, &w1, &y);
  if (w0 <= mode && mode <= w1)
    return tf_log_dbeta (mode, 1.0 - mode, in->po, in->qo);
  return MAX (log_factor (in, v0, 1.0 - v0), log_factor (in, v1, 1.0 - v1));
}

typedef struct {
  double v0, v1, y0, y1, log_bound, log_mass;
} Piece;

static int
compare_pieces (const void *a, const void *b)
{
  double x = ((const Piece *) a)->log_bound, y = ((const Piece *) b)->log_bound;
  return (x < y) - (x > y);
}

/* ln mass of the integration variable between cuts i and i + 1 */
static double
piece_log_mass (const TfBetaDiff *bd, guint i)
{
  double f0, s0, f1, s1;
  for (guint k = 0; k < 2; k++)
    {
      guint c = i + k;
      double lt = bd->log_tail[c];
      double lf = bd->cut_lower[c] ? lt : tf_log1mexp (lt);
      double ls = bd->cut_lower[c] ? tf_log1mexp (lt) : lt;
      if (c == 0)
        lf = -INFINITY, ls = 0.0;
      if (c + 1 == bd->n_cuts)
        lf = 0.0, ls = -INFINITY;
      if (k == 0)
        f0 = lf, s0 = ls;
      else
        f1 = lf, s1 = ls;
    }
  if (f1 <= -G_LN2)
    return tf_log_sub (f1, f0);
  return tf_log_sub (s0, s1);
}

/* The piece between cuts i and i + 1, split at the kinks inside it (where the other
 * variable's argument reaches 0 or 1), appended to pieces with its mass and the bound
 * on its integral; FALSE when pieces is full. */
static gboolean
split_piece (const Integrand *in, const double kinks[2], guint i, Piece *pieces, guint *np,
             guint cap)
{
  const TfBetaDiff *bd = in->bd;
  double a = bd->cut[i], b = bd->cut[i + 1];
  double ya = bd->cut_y[i], yb = bd->cut_y[i + 1];
  double lm;
  if (!(b > a) && !(ya > yb))
    return TRUE;
  lm = piece_log_mass (bd, i);
  /* split at the kinks inside */
  double edges[4] = { a, 0, 0, b };
  guint ne = 1;
  for (guint k = 0; k < 2; k++)
    if (kinks[k] > a && kinks[k] < b)
      edges[ne++] = kinks[k];
  if (ne == 3 && edges[1] > edges[2])
    {
      double t = edges[1];
      edges[1] = edges[2];
      edges[2] = t;
    }
  edges[ne] = b;
  for (guint k = 0; k < ne; k++)
    {
      Piece *p = &pieces[(*np)++];
      p->v0 = edges[k];
      p->v1 = edges[k + 1];
      p->y0 = k == 0 ? ya : 1.0 - edges[k];
      p->y1 = k + 1 == ne ? yb : 1.0 - edges[k + 1];
      p->log_mass = lm;       /* a bound when the piece was split */
      p->log_bound = lm + log_factor_max (in, p->v0, p->v1);
      if (*np == cap)
        return FALSE;
    }
  return TRUE;
}

/* The pieces between successive cuts, split at the kinks; returns their number. */
static guint
make_pieces (const Integrand *in, Piece *pieces, guint cap)
{
  const TfBetaDiff *bd = in->bd;
  const double d = in->d;
  double kinks[2];
  guint np = 0;

  /* where the other variable's argument reaches 0 and 1 */
  kinks[0] = bd->over_a ? d : -d;
  kinks[1] = bd->over_a ? 1.0 + d : 1.0 - d;
  for (guint i = 0; i + 1 < bd->n_cuts; i++)
    if (!split_piece (in, kinks, i, pieces, &np, cap))
      break;
  return np;
}

/* One piece by QAGS, in v, or in y = 1 − v where it lies above ½, with the integrand
 * scaled by its bound, added to *total; skipped when the bound is below e^−41 (1e-18)
 * of the sum so far. */
static void
integrate_piece (Integrand *in, const Piece *p, gsl_integration_workspace *ws, double *total,
                 double *log_err)
{
  gsl_function f = { integrand, in };
  double result, abserr;
  int status;

  if (p->log_bound == -INFINITY || p->log_bound < *total - 41.0)
    return;
  gboolean in_y = p->v0 + p->v1 > 1.0;
  double width = in_y ? p->y0 - p->y1 : p->v1 - p->v0;
  if (!(width > 0.0))
    return;
  in->ref = isfinite (p->log_bound) ? p->log_bound - log (width) : 0.0;
  if (in_y)
    {
      f.function = integrand_y;
      status = gsl_integration_qags (&f, p->y1, p->y0, 0.0, in->bd->epsrel, 200, ws, &result,
                                     &abserr);
    }
  else
    status = gsl_integration_qags (&f, p->v0, p->v1, 0.0, in->bd->epsrel, 200, ws, &result,
                                   &abserr);
  /* a piece that stops short of its tolerance (roundoff near a singular end) only
   * matters when its error is not negligible next to the whole */
  if (status != GSL_SUCCESS)
    *log_err = tf_log_add (*log_err, in->ref + log (abserr + 1e-300));
  if (result > 0.0)
    *total = tf_log_add (*total, in->ref + log (result));
}

double
tf_beta_diff_pieces (TfBetaDiff *bd, double d, TfBdKind kind, gboolean *ok)
{
  Piece pieces[TF_BETA_DIFF_N_CUTS + 2];
  Integrand in = { bd, d, kind, 0.0, 0, 0, 0, 0 };
  double total = -INFINITY, log_err = -INFINITY;

  ensure_cuts (bd);
  in.pv = bd->over_a ? bd->pa : bd->pb;
  in.qv = bd->over_a ? bd->qa : bd->qb;
  in.po = bd->over_a ? bd->pb : bd->pa;
  in.qo = bd->over_a ? bd->qb : bd->qa;
  guint np = make_pieces (&in, pieces, G_N_ELEMENTS (pieces));
  /* the largest bounds first, so that the sum so far can skip the negligible */
  qsort (pieces, np, sizeof *pieces, compare_pieces);

  gsl_integration_workspace *ws = gsl_integration_workspace_alloc (200);
  *ok = TRUE;
  for (guint i = 0; i < np; i++)
    integrate_piece (&in, &pieces[i], ws, &total, &log_err);
  gsl_integration_workspace_free (ws);
  if (log_err > total + log (1e-8))
    *ok = FALSE;
  return total;
}
