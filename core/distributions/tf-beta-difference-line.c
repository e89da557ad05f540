/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-beta-difference-line.c: the fixed rule of tf-beta-difference.c, the trapezoidal
 * rule on the whole line after a logistic map.
 *
 * Over the integration variable V (the other is O, at w = v − c with c = d over θA and
 * c = −d over θB), outside the v where 0 < w < 1 the tail factor is 0 or 1, and that
 * part is V's own tail, one incomplete beta. Inside, v runs over (max(0, c),
 * min(1, 1 + c)) and is mapped to the real line by a logistic, v = max(0, c) +
 * (1 − |c|) σ(u), which turns the algebraic behaviour at both ends (the shapes, and the
 * tail factor at w = 0, 1) into exponential decay; the integrand is then analytic and,
 * for posteriors, close to a Gaussian in u. It is integrated by the trapezoidal rule on
 * the whole line (exponentially convergent for analytic integrands, Trefethen &
 * Weideman 2014), centred on the integrand's peak (found from its log-derivative), with
 * a step from the peak's curvature, walking out until the terms fall below 1e-5 of the
 * tolerance, and halving the step until two successive sums agree to 10 times the
 * tolerance (1e-10).
 */
#include "tf-beta-difference-private.h"
#include "tf-incbeta.h"
#include "tf-logspace.h"

#include <math.h>
#include <float.h>

#define WALK_MAX 400            /* nodes each side of the peak at the first step */
#define LEVELS 4                /* halvings of the step */

/* The integrand on the line: V's shapes, O's shapes, the map and what to integrate. */
typedef struct {
  double pv, qv, po, qo;
  double lbv, lbo;              /* ln B of V's and O's shapes where one is <= 2, else NAN */
  double cp, cm, len, log_len;  /* max(0, c), max(0, −c), 1 − |c| */
  TfBdKind kind;
  gboolean want_lower;          /* the tail factor is P(O <= w) rather than P(O >= w) */
} Line;

/* ln of the beta density at x (y = 1 − x): tf_log_dbeta, with ln B(a, b) given where
 * tf_log_dbeta would compute it on every call (a shape at most 2). */
static double
line_dbeta (double x, double y, double a, double b, double lb)
{
  if (isnan (lb))
    return tf_log_dbeta (x, y, a, b);
  /* each log from the smaller of x and y, which carries the digits */
  double lx = x <= y ? log (x) : log1p (-y), ly = x <= y ? log1p (-x) : log (y);
  return (a - 1.0) * lx + (b - 1.0) * ly - lb;
}

static double
small_shape_log_beta (double a, double b)
{
  return a > 2.0 && b > 2.0 ? NAN : tf_log_beta (a, b);
}

/* ln σ(u), ln σ(−u) for the logistic σ, without overflow (Mächler 2012). */
static void
log_logistic (double u, double *ls, double *lsc)
{
  if (u >= 0.0)
    {
      double t = log1p (exp (-u));
      *ls = -t;
      *lsc = -u - t;
    }
  else
    {
      double t = log1p (exp (u));
      *ls = u - t;
      *lsc = -t;
    }
}

/* ln of the integrand at u, with its derivative in u in *dlog when dlog is not NULL;
 * -inf where v or w is not representable inside (0, 1). */
static double
line_log (const Line *ln, double u, double *dlog)
{
  double ls, lsc;
  log_logistic (u, &ls, &lsc);
  double s = exp (ls), sc = exp (lsc);
  double v = ln->cp + ln->len * s, vy = ln->cm + ln->len * sc;
  double w = ln->cm + ln->len * s, wy = ln->cp + ln->len * sc;
  double lt, lfo = 0.0;

  if (!(v > 0.0 && vy > 0.0 && w > 0.0 && wy > 0.0))
    return -INFINITY;
  if (ln->kind == TF_BD_DENSITY)
    lt = line_dbeta (w, wy, ln->po, ln->qo, ln->lbo);
  else
    {
      lt = ln->want_lower ? tf_incbeta_log_lower (w, wy, ln->po, ln->qo)
                          : tf_incbeta_log_upper (w, wy, ln->po, ln->qo);
      if (dlog != NULL)
        lfo = line_dbeta (w, wy, ln->po, ln->qo, ln->lbo);
    }
  if (dlog != NULL)
    {
      double jac = ln->len * s * sc;         /* dv/du = dw/du */
      double dv = ((ln->pv - 1.0) / v - (ln->qv - 1.0) / vy) * jac;
      double dt;
      if (ln->kind == TF_BD_DENSITY)
        dt = ((ln->po - 1.0) / w - (ln->qo - 1.0) / wy) * jac;
      else
        dt = (ln->want_lower ? 1.0 : -1.0) * exp (MIN (lfo - lt + log (jac), 700.0));
      *dlog = dv + dt + (sc - s);
    }
  return line_dbeta (v, vy, ln->pv, ln->qv, ln->lbv) + lt + ln->log_len + ls + lsc;
}

/* A bracket on the integrand's log-derivative, da >= 0 >= db on [ua, ub] once found,
 * and the latest point um, with its derivative dm. */
typedef struct {
  double ua, da, ub, db;
  double um, dm;
} PeakBracket;

/* From u0, steps doubling from *step towards the rise until the log-derivative changes
 * sign (*step left doubled); the bracket in order. */
static gboolean
bracket_peak (const Line *ln, double u0, double *step, PeakBracket *br)
{
  double ua = u0, da, ub, db, g;

  g = line_log (ln, ua, &da);
  if (!isfinite (g) || !isfinite (da))
    return FALSE;
  ub = ua;
  db = da;
  for (int it = 0; (da > 0.0) == (db > 0.0) && db != 0.0; it++)
    {
      if (it == 80)
        return FALSE;
      ua = ub;
      da = db;
      ub = ua + (da > 0.0 ? *step : -*step);
      *step *= 2.0;
      g = line_log (ln, ub, &db);
      if (!isfinite (g) || !isfinite (db))
        return FALSE;
    }
  if (db == 0.0)
    {
      ua = ub;
      da = db;
    }
  if (ua > ub)
    {
      double t = ua;
      ua = ub;
      ub = t;
      t = da;
      da = db;
      db = t;
    }
  br->ua = ua;
  br->da = da;
  br->ub = ub;
  br->db = db;
  return TRUE;
}

/* The bracket narrowed by Illinois steps, a bisection whenever a step left more than
 * half the bracket, until the last two points put the peak within about a third of the
 * local width; br->um, br->dm the point reached. */
static gboolean
illinois (const Line *ln, PeakBracket *br)
{
  double ua = br->ua, da = br->da, ub = br->ub, db = br->db, g;
  double um = ua, dm = da, wa = 1.0, wb = 1.0, up = NAN, dp = NAN;
  gboolean bisect = FALSE;
  for (int it = 0; it < 100 && da != 0.0 && db != 0.0; it++)
    {
      double span = ub - ua;
      um = bisect ? 0.5 * (ua + ub) : (ua * db * wa - ub * da * wb) / (db * wa - da * wb);
      if (!(um > ua && um < ub))
        um = 0.5 * (ua + ub);
      g = line_log (ln, um, &dm);
      if (!isfinite (g) || !isfinite (dm))
        return FALSE;
      if (dm > 0.0)
        ua = um, da = dm, wa = 1.0, wb *= 0.5;
      else
        ub = um, db = dm, wb = 1.0, wa *= 0.5;
      bisect = ub - ua > 0.5 * span;
      double kl = isfinite (up) ? (dp - dm) / (um - up) : NAN;
      if (kl > 0.0 && fabs (dm) / sqrt (kl) < 0.3)
        break;
      up = um;
      dp = dm;
    }
  br->ua = ua;
  br->da = da;
  br->ub = ub;
  br->db = db;
  br->um = da == 0.0 ? ua : (db == 0.0 ? ub : um);
  br->dm = dm;
  return TRUE;
}

/* Newton steps from br->um with the curvature from the log-derivative a little to each
 * side, until the step and the change of the width are small (step: the width when
 * the bracket gives none). */
static gboolean
newton_peak (const Line *ln, const PeakBracket *br, double step, double *peak, double *width)
{
  double um = br->um, dm = br->dm, g;
  double k0 = (br->da - br->db) / (br->ub - br->ua);
  double wdt = isfinite (k0) && k0 > 0.0 ? 1.0 / sqrt (k0) : step;
  for (int it = 0; it < 12; it++)
    {
      double h = 0.1 * wdt, d1, d2;
      if (!isfinite (line_log (ln, um - h, &d1)) || !isfinite (line_log (ln, um + h, &d2)))
        return FALSE;
      double k = (d1 - d2) / (2.0 * h);
      if (!(k > 0.0) || !isfinite (k))
        return FALSE;
      double w_new = 1.0 / sqrt (k), delta = dm / k;
      gboolean settled = fabs (delta) < 0.1 * w_new && fabs (w_new - wdt) < 0.2 * wdt;
      wdt = w_new;
      if (settled)
        {
          *peak = um;
          *width = wdt;
          return TRUE;
        }
      um = CLAMP (um + delta, br->ua, br->ub);
      g = line_log (ln, um, &dm);
      if (!isfinite (g) || !isfinite (dm))
        return FALSE;
    }
  return FALSE;
}

/* The peak of the integrand on the line and its width (1 / √ −(ln g)''): a bracket on
 * the log-derivative by doubling steps, regula falsi (Illinois variant, Dowell &
 * Jarratt 1971) with bisection until the point is within a fraction of a width of the
 * peak, then Newton steps with the curvature from central differences. */
static gboolean
find_peak (const Line *ln, double u0, double step, double *peak, double *width)
{
  PeakBracket br;

  if (!bracket_peak (ln, u0, &step, &br) || !illinois (ln, &br))
    return FALSE;
  return newton_peak (ln, &br, step, peak, width);
}

/* One walk out from the peak (dir −1 or 1) at step h, until a term is below e^−log_cut
 * of the largest so far (*gmax, raised on the way) and falling: the logs in out[], their
 * number in *count; FALSE when it does not end within WALK_MAX nodes, or runs into where
 * v or w is not representable while the terms still matter. */
static gboolean
walk (const Line *ln, double peak, double h, double log_cut, int dir, double *out,
      int *count, double *gmax)
{
  double last = *gmax;
  for (int j = 1;; j++)
    {
      if (j > WALK_MAX)
        return FALSE;
      double g = line_log (ln, peak + dir * j * h, NULL);
      if (g == -INFINITY && last > *gmax - log_cut)
        return FALSE;       /* the mass goes on where v or w is not representable */
      out[j - 1] = g;
      *gmax = MAX (*gmax, g);
      if (g < *gmax - log_cut && g < last)
        {
          *count = j;
          return TRUE;
        }
      last = g;
    }
}

/* The rule's state: n nodes' logs g[] from u0 at step h (next[] the room for the
 * following level), their largest gmax, and the sum of e^(g − gmax) over them. */
typedef struct {
  const Line *ln;
  double *g, *next;
  int n;
  double u0, h, gmax, sum, log_cut;
} Rule;

/* The walks' nodes in order, from −nl h to nr h, into the rule and its sum; returns the
 * sum over every second node (those at an even distance from the peak). */
static double
first_level (Rule *r, const double *left, int nl, const double *right, int nr, double peak)
{
  double *g = r->g, even = 0.0;
  for (int j = 0; j < nl; j++)
    g[j] = left[nl - 1 - j];
  g[nl] = line_log (r->ln, peak, NULL);
  for (int j = 0; j < nr; j++)
    g[nl + 1 + j] = right[j];
  for (int j = 0; j < r->n; j++)
    {
      double t = exp (g[j] - r->gmax);
      r->sum += t;
      if ((j - nl) % 2 == 0)
        even += t;
    }
  return even;
}

/* One halving of the step: a new node between each two, computed, or interpolated
 * linearly in the log where both neighbours are below epsrel e^−2 of the largest, and
 * added to the sum; FALSE where a node is not a number or overflows. */
static gboolean
halve (Rule *r)
{
  const double *g = r->g;
  double *next = r->next;
  int n = r->n;
  for (int j = 0; j + 1 < n; j++)
    {
      next[2 * j] = g[j];
      double m;
      if (MAX (g[j], g[j + 1]) < r->gmax - (r->log_cut - 10.0))
        m = 0.5 * (g[j] + g[j + 1]);
      else
        {
          m = line_log (r->ln, r->u0 + (j + 0.5) * r->h, NULL);
          if (isnan (m) || m > r->gmax + 700.0)
            return FALSE;
        }
      next[2 * j + 1] = m;
      r->sum += exp (m - r->gmax);
    }
  next[2 * (n - 1)] = g[n - 1];
  r->n = 2 * n - 1;
  r->next = r->g;
  r->g = next;
  r->h *= 0.5;
  return TRUE;
}

/* ln ∫ g(u) du by the trapezoidal rule centred on the peak, FALSE when it did not
 * settle within the budget. The step starts below the peak's width and is halved over
 * the range of the first walk until two successive sums differ by less than 10 epsrel
 * (the rule converges exponentially, Trefethen & Weideman 2014, so the finer sum is
 * then much closer than that; the error is not taken as the square of the difference,
 * which fails where a tail factor falls off more steeply than the peak is wide); the
 * first step is compared with the rule on every second of its nodes. A new node between
 * two that are both below epsrel e^−2 of the largest (e^−25 at 1e-10) is not computed
 * but interpolated, linearly in the log (exact for the exponential tails the map gives;
 * its error is below 1e-12 of the sum at 1e-10). */
static gboolean
trapezoid (const Line *ln, double peak, double width, double epsrel, double *result)
{
  /* terms below epsrel e^−12 of the largest end the walk */
  const double log_cut = 12.0 - log (epsrel);
  double h = (epsrel < 1e-8 ? 0.7 : 0.6) * width, gmax = line_log (ln, peak, NULL);
  double left[WALK_MAX + 1], right[WALK_MAX + 1];
  int nl = 0, nr = 0;

  if (!isfinite (gmax))
    return FALSE;
  if (!walk (ln, peak, h, log_cut, -1, left, &nl, &gmax)
      || !walk (ln, peak, h, log_cut, 1, right, &nr, &gmax))
    return FALSE;

  /* the nodes in order, from −nl h to nr h, with room for the halvings */
  int n = nl + nr + 1, cap = (n - 1) * (1 << LEVELS) + 1;
  g_autofree double *nodes = g_new (double, cap);
  g_autofree double *room = g_new (double, cap);
  Rule r = { ln, nodes, room, n, peak - nl * h, h, gmax, 0.0, log_cut };
  double even = first_level (&r, left, nl, right, nr, peak);
  double total = h * r.sum, prev;
  /* the nodes at every second step make a coarser rule for free: where it already
   * agrees (a loose tolerance, as for figures), no halving is needed */
  /* far in a tail the logs themselves carry a rounding of ε |ln g| */
  const double tol = 10.0 * epsrel + 8.0 * DBL_EPSILON * fabs (gmax);
  if (fabs (total - 2.0 * h * even) <= tol * total)
    {
      *result = gmax + log (total);
      return TRUE;
    }
  for (int level = 0; level < LEVELS; level++)
    {
      if (!halve (&r))
        return FALSE;
      prev = total;
      total = r.h * r.sum;
      if (fabs (total - prev) <= tol * total)
        {
          *result = gmax + log (total);
          return TRUE;
        }
    }
  return FALSE;
}

gboolean
tf_beta_diff_line (const TfBetaDiff *bd, gboolean over_a, double d, TfBdKind kind,
                   double *result)
{
  Line ln;
  double c = over_a ? d : -d;
  double outside = -INFINITY, inside, peak, width;

  ln.pv = over_a ? bd->pa : bd->pb;
  ln.qv = over_a ? bd->qa : bd->qb;
  ln.po = over_a ? bd->pb : bd->pa;
  ln.qo = over_a ? bd->qb : bd->qa;
  ln.lbv = small_shape_log_beta (ln.pv, ln.qv);
  ln.lbo = small_shape_log_beta (ln.po, ln.qo);
  ln.cp = MAX (0.0, c);
  ln.cm = MAX (0.0, -c);
  ln.len = 1.0 - fabs (c);
  ln.log_len = log (ln.len);
  ln.kind = kind;
  /* over θA the lower tail of Δ is the upper tail of θB, and the other way round */
  ln.want_lower = (kind == TF_BD_LOWER) != over_a;
  if (kind != TF_BD_DENSITY)
    {
      /* V's mass where the tail factor is 1: v >= 1 + c for P(O <= w), v <= c for P(O >= w) */
      if (ln.want_lower && c < 0.0)
        outside = tf_incbeta_log_upper (1.0 - ln.cm, ln.cm, ln.pv, ln.qv);
      else if (!ln.want_lower && c > 0.0)
        outside = tf_incbeta_log_lower (ln.cp, 1.0 - ln.cp, ln.pv, ln.qv);
    }

  /* start at V's mean on the line, with V's own width there */
  double mv = ln.pv / (ln.pv + ln.qv), sv = tf_beta_sd (ln.pv, ln.qv);
  double s0 = (mv - ln.cp) / ln.len;
  s0 = CLAMP (s0, 1e-12, 1.0 - 1e-12);
  double u0 = log (s0) - log1p (-s0);
  double step = sv / (ln.len * s0 * (1.0 - s0));
  step = CLAMP (step, 1e-9, 4.0);
  if (!find_peak (&ln, u0, step, &peak, &width)
      || !trapezoid (&ln, peak, width, bd->epsrel, &inside))
    return FALSE;
  *result = tf_log_add (outside, inside);
  return isfinite (*result) || *result == -INFINITY;
}
