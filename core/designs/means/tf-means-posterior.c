/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means-posterior.c: the posterior of the standardised effect δ under the
 * alternative: its masses, quantiles, highest-density interval and density.
 *
 * The likelihood of δ is the noncentral t density of the observed t at λ = √n_eff δ
 * (Rouder et al. 2009: σ integrated out under Jeffreys's prior), or the normal density
 * of z when the SD is known. The density is evaluated once a node on panels laid out
 * from the mode (each a Chebyshev interpolant on 24 Chebyshev–Lobatto points, its
 * width set so that the log density falls by at most 8 across it, halved until the
 * last coefficients are below 1e-13 of the panel's largest value) down to 1e-17 of the
 * mode's density; masses, quantiles (Newton within a panel on the integrated series),
 * the HDI and the density all come from that one table. Masses the table cannot give
 * to 1e-9 are done by quadrature (tf_delta_quadrature_log_mass, tf-means-delta.c).
 */
#include "tf-means-posterior.h"
#include "tf-logspace.h"
#include "tf-chebyshev.h"

#include <math.h>
#include <string.h>

#define CHEB_K TF_CHEB_N         /* Chebyshev–Lobatto nodes a panel */
#define MAX_DROP 8.0            /* largest fall of the log density across a panel */
#define FLOOR -40.0             /* log density, relative to the mode, where the table ends */
#define MAX_PANELS 300
#define TAIL_TOL 1e-13          /* last coefficients, relative to the panel's largest value,
                                 * beyond the rounding of the density itself */
#define SCAN_POINTS 25

typedef struct {
  double a, b;
  double c[CHEB_K];             /* f on [a, b] = Σ c_k T_k(ξ), ξ = (2x − a − b)/(b − a) */
  double ci[CHEB_K + 1];        /* its integral from a, in units of (b − a)/2 */
  double gc[CHEB_K];            /* ln f on [a, b] */
  double mass, fmax;
} Panel;

struct TfDeltaPosterior {
  TfDeltaPrior prior;
  double t, n_eff, df;
  double dom_lo, dom_hi;        /* the posterior is truncated to this domain */
  double mode, width, shift;
  double first_width;           /* of the panels either side of the mode */
  double noise;                 /* rounding error of the log density */
  double total, log_total;      /* ∫ exp(lp − shift) over the domain */
  Panel *panels;
  double *cum;                  /* mass of the panels before each */
  guint n_panels;
  TfDeltaPosterior *sub;        /* a table truncated to [sub_lo, sub_hi], built on demand */
};

/* ln posterior density minus the shift, −∞ where it is not a number */
static double
log_post (const TfDeltaPosterior *p, double delta)
{
  const TfDeltaTarget target = { &p->prior, p->t, p->n_eff, p->df, p->shift };
  return tf_delta_log_target (&target, delta);
}

/* --- one panel --------------------------------------------------------------------- */

/* Fits the interpolant of f through the values v at the nodes, and its integral. */
static void
panel_fit (Panel *pn, const double *v)
{
  tf_cheb_fit (v, pn->c);
  tf_cheb_integral (pn->c, pn->ci);
  pn->mass = 0.5 * (pn->b - pn->a) * tf_cheb_eval (pn->ci, CHEB_K + 1, 1.0);
}

static double
panel_xi (const Panel *pn, double x)
{
  return CLAMP ((2.0 * x - pn->a - pn->b) / (pn->b - pn->a), -1.0, 1.0);
}

/* ∫_a^x f on the panel */
static double
panel_integral (const Panel *pn, double x)
{
  return 0.5 * (pn->b - pn->a) * tf_cheb_eval (pn->ci, CHEB_K + 1, panel_xi (pn, x));
}

static double
panel_density (const Panel *pn, double x)
{
  return tf_cheb_eval (pn->c, CHEB_K, panel_xi (pn, x));
}

/* Fits the panel [a, b] (values at the nodes, g the log values); the end value at
 * `known_end` (0: right, K − 1: left) is given in g[known_end] when it is finite.
 * Returns the size of the interpolant's last two coefficients. */
static double
panel_build (TfDeltaPosterior *p, Panel *pn, double a, double b, double *g, guint known_end)
{
  double v[CHEB_K];

  pn->a = a;
  pn->b = b;
  pn->fmax = 0.0;
  for (guint j = 0; j < CHEB_K; j++)
    {
      if (j != known_end || !isfinite (g[j]))
        g[j] = log_post (p, 0.5 * (a + b) + 0.5 * (b - a) * tf_cheb_node (j));
      v[j] = exp (MIN (g[j], 700.0));
      pn->fmax = MAX (pn->fmax, v[j]);
    }
  panel_fit (pn, v);
  return fabs (pn->c[CHEB_K - 1]) + fabs (pn->c[CHEB_K - 2]);
}

/* --- the table ------------------------------------------------------------------- */

/* The mode on the domain: a scan between the prior's centre (0) and the likelihood's
 * (t/√n_eff), then golden-section refinement (Kiefer 1953) of the best point's
 * neighbourhood. */
static double
find_mode (TfDeltaPosterior *p, double wl)
{
  double d = p->t / sqrt (p->n_eff);
  double lo = MAX (MIN (d, 0.0) - 6.0 * wl, p->dom_lo), hi = MIN (MAX (d, 0.0) + 6.0 * wl, p->dom_hi);
  double best = -INFINITY, best_x = CLAMP (d, lo, hi), step = (hi - lo) / (SCAN_POINTS - 1);
  double extra[] = { 0.0, d, lo, hi };

  for (guint i = 0; i < SCAN_POINTS + G_N_ELEMENTS (extra); i++)
    {
      double x = i < SCAN_POINTS ? lo + i * step : extra[i - SCAN_POINTS];
      if (!(x >= lo && x <= hi))
        continue;
      double v = log_post (p, x);
      if (v > best)
        {
          best = v;
          best_x = x;
        }
    }
  const double g = 0.5 * (sqrt (5.0) - 1.0);
  double x0 = MAX (best_x - step, lo), x1 = MIN (best_x + step, hi);
  double c = x1 - g * (x1 - x0), e = x0 + g * (x1 - x0);
  double fc = log_post (p, c), fe = log_post (p, e);
  for (int it = 0; it < 100 && x1 - x0 > 1e-6 * wl; it++)
    if (fc > fe)
      {
        x1 = e; e = c; fe = fc;
        c = x1 - g * (x1 - x0);
        fc = log_post (p, c);
      }
    else
      {
        x0 = c; c = e; fc = fe;
        e = x0 + g * (x1 - x0);
        fe = log_post (p, e);
      }
  double m = 0.5 * (x0 + x1);
  return log_post (p, m) >= best ? m : best_x;
}

/* Lays panels from the mode toward dir (+1 or −1) to the domain's end or the floor;
 * appends them to out. */
static void
lay_panels (TfDeltaPosterior *p, int dir, GArray *out)
{
  const double end = dir > 0 ? p->dom_hi : p->dom_lo;
  const double feature[2] = { 0.0, p->t / sqrt (p->n_eff) };
  const double feature_g[2] = { log_post (p, feature[0]), log_post (p, feature[1]) };
  const double w0 = p->first_width;
  double x = p->mode, width = w0, g_start = log_post (p, p->mode);
  double g[CHEB_K];
  guint known = dir > 0 ? CHEB_K - 1 : 0;     /* the node at x */

  while (out->len < MAX_PANELS && x != end)
    {
      Panel pn;
      double w = width, before = INFINITY;
      /* halved until the last coefficients are negligible, or stop falling at the level
       * of the density's own rounding (a halving should take them down ~2^23-fold) */
      for (int tries = 0; tries < 40; tries++, w *= 0.5)
        {
          double far = dir > 0 ? MIN (x + w, end) : MAX (x - w, end);
          for (guint j = 0; j < CHEB_K; j++)
            g[j] = NAN;
          g[known] = g_start;
          double tail = dir > 0 ? panel_build (p, &pn, x, far, g, known)
                                : panel_build (p, &pn, far, x, g, known);
          double rel = tail / MAX (pn.fmax, 1e-300);
          if (tail <= (TAIL_TOL + 4.0 * p->noise) * pn.fmax + 1e-19
              || (rel < 1e-10 && rel > 0.01 * before))
            break;
          before = rel;
        }
      g_array_append_val (out, pn);
      x = dir > 0 ? pn.b : pn.a;
      guint far_j = dir > 0 ? 0 : CHEB_K - 1;
      g_start = g[far_j];
      /* slope and curvature at the far end, from the log values' Chebyshev series */
      Panel *last = &g_array_index (out, Panel, out->len - 1);
      for (guint j = 0; j < CHEB_K; j++)
        g[j] = MAX (g[j], -1e4);          /* a density of 0 (never seen) kept finite */
      tf_cheb_fit (g, last->gc);
      double s1, s2, half = 0.5 * (pn.b - pn.a);
      tf_cheb_end_derivatives (last->gc, dir, &s1, &s2);
      double slope = fabs (s1 / half), curv = fabs (s2 / (half * half));
      /* past the prior's centre and the likelihood's, unless the density there is
       * negligible: a second mode can only be near one of them */
      gboolean passed = TRUE;
      for (guint f = 0; f < 2; f++)
        if (feature_g[f] > FLOOR - 5.0 && (dir > 0 ? x < feature[f] : x > feature[f]))
          passed = FALSE;
      if (!isfinite (g_start) || (g_start < FLOOR && passed
                                  && (slope * w0 > 1.0 || g_start < FLOOR - 10.0)))
        break;
      double next = 2.0 * MAX_DROP / (slope + sqrt (slope * slope + 2.0 * curv * MAX_DROP));
      width = MIN (2.0 * (pn.b - pn.a), isfinite (next) ? next : 2.0 * (pn.b - pn.a));
      width = MAX (width, 1e-3 * w0);
    }
}

/* Builds the table on [lo, hi]. */
static TfDeltaPosterior *
posterior_new_on (const TfDeltaPrior *prior, double t, double n_eff, double df, double lo,
                  double hi)
{
  TfDeltaPosterior *p = g_new0 (TfDeltaPosterior, 1);
  /* sd of δ from the likelihood: (1 + t²/(2ν)) / n_eff (Hedges & Olkin 1985, §5.B) */
  double wl = sqrt ((1.0 + (isinf (df) ? 0.0 : t * t / (2.0 * df))) / n_eff);

  p->prior = *prior;
  p->t = t;
  p->n_eff = n_eff;
  p->df = df;
  p->dom_lo = lo;
  p->dom_hi = hi;
  p->mode = find_mode (p, wl);
  p->shift = log_post (p, p->mode);
  if (!isfinite (p->shift))
    p->shift = 0.0;
  /* the log likelihood cancels terms of order t², λ² and ln f itself */
  double lam = sqrt (n_eff) * p->mode;
  p->noise = 2.2e-16 * (8.0 + fabs (p->shift) + t * t + lam * lam);

  /* width from the curvature at the mode */
  double hh = MIN (wl, prior->r) * 1e-3, m = p->mode;
  if (m - hh < lo || m + hh > hi)
    m = CLAMP (m, lo + hh, hi - hh);
  double gp = log_post (p, m + hh), g0 = log_post (p, m), gm = log_post (p, m - hh);
  double c = (gp - 2.0 * g0 + gm) / (hh * hh), slope = fabs (gp - gm) / (2.0 * hh);
  p->width = c < 0.0 && isfinite (c) ? 1.0 / sqrt (-c) : MIN (wl, prior->r);
  /* at an end of the domain the density may fall steeply from the mode */
  if (isfinite (slope) && slope * p->width > 1.0)
    p->width = 1.0 / slope;
  p->first_width = 2.0 * p->width;

  GArray *left = g_array_new (FALSE, FALSE, sizeof (Panel));
  GArray *right = g_array_new (FALSE, FALSE, sizeof (Panel));
  lay_panels (p, -1, left);
  lay_panels (p, 1, right);
  p->n_panels = left->len + right->len;
  p->panels = g_new (Panel, MAX (p->n_panels, 1));
  p->cum = g_new0 (double, p->n_panels + 1);
  for (guint i = 0; i < left->len; i++)
    p->panels[i] = g_array_index (left, Panel, left->len - 1 - i);
  for (guint i = 0; i < right->len; i++)
    p->panels[left->len + i] = g_array_index (right, Panel, i);
  g_array_free (left, TRUE);
  g_array_free (right, TRUE);
  for (guint i = 0; i < p->n_panels; i++)
    p->cum[i + 1] = p->cum[i] + p->panels[i].mass;
  p->total = p->cum[p->n_panels];
  p->log_total = log (p->total);
  return p;
}

TfDeltaPosterior *
tf_delta_posterior_new (const TfDeltaPrior *prior, double t, double n_eff, double df)
{
  return posterior_new_on (prior, t, n_eff, df, -INFINITY, INFINITY);
}

void
tf_delta_posterior_free (TfDeltaPosterior *post)
{
  if (post == NULL)
    return;
  tf_delta_posterior_free (post->sub);
  g_free (post->panels);
  g_free (post->cum);
  g_free (post);
}

/* the panel holding x, or −1 (left of the table) or n_panels (right of it) */
static int
find_panel (const TfDeltaPosterior *p, double x)
{
  if (p->n_panels == 0 || x < p->panels[0].a)
    return -1;
  if (x >= p->panels[p->n_panels - 1].b)
    return p->n_panels;
  guint lo = 0, hi = p->n_panels;
  while (hi - lo > 1)
    {
      guint mid = (lo + hi) / 2;
      if (p->panels[mid].a <= x)
        lo = mid;
      else
        hi = mid;
    }
  return lo;
}

/* the table's mass left of x */
static double
table_cdf (const TfDeltaPosterior *p, double x)
{
  int i = find_panel (p, x);
  if (i < 0)
    return 0.0;
  if (i >= (int) p->n_panels)
    return p->total;
  return p->cum[i] + panel_integral (&p->panels[i], x);
}

/* the table's mass on [a, b], summed panel by panel so that a small mass keeps its
 * relative accuracy */
static double
table_mass (const TfDeltaPosterior *p, double a, double b)
{
  double sum = 0.0;
  for (guint i = 0; i < p->n_panels; i++)
    {
      const Panel *pn = &p->panels[i];
      if (pn->b <= a || pn->a >= b)
        continue;
      double lo = MAX (a, pn->a), hi = MIN (b, pn->b);
      sum += (lo == pn->a ? 0.0 : -panel_integral (pn, lo))
             + (hi == pn->b ? pn->mass : panel_integral (pn, hi));
    }
  return MAX (sum, 0.0);
}

double
tf_delta_posterior_log_mass (TfDeltaPosterior *post, double a, double b)
{
  double m = table_mass (post, a, b);
  if (m >= 1e-9 * post->total)
    return log (m) - post->log_total;
  const TfDeltaTarget target = { &post->prior, post->t, post->n_eff, post->df, post->shift };
  return tf_delta_quadrature_log_mass (&target, post->mode, post->width,
                                       MAX (a, post->dom_lo), MIN (b, post->dom_hi))
         - post->log_total;
}

double
tf_delta_posterior_log_mass_outside (TfDeltaPosterior *post, double a, double b)
{
  double m = table_mass (post, -INFINITY, a) + table_mass (post, b, INFINITY);
  if (m >= 1e-9 * post->total)
    return log (m) - post->log_total;
  return tf_log_add (tf_delta_posterior_log_mass (post, -INFINITY, a),
                     tf_delta_posterior_log_mass (post, b, INFINITY));
}

/* ln of the unnormalised density (the table's interpolant of it inside the table) */
static double
log_density_unnorm (TfDeltaPosterior *post, double delta)
{
  int i = find_panel (post, delta);
  if (i >= 0 && i < (int) post->n_panels)
    {
      const Panel *pn = &post->panels[i];
      return tf_cheb_eval (pn->gc, CHEB_K, panel_xi (pn, delta));
    }
  return log_post (post, delta);
}

double
tf_delta_posterior_log_density (TfDeltaPosterior *post, double delta)
{
  if (delta < post->dom_lo || delta > post->dom_hi)
    return -INFINITY;
  return log_density_unnorm (post, delta) - post->log_total;
}

double
tf_delta_posterior_density (TfDeltaPosterior *post, double delta)
{
  return exp (tf_delta_posterior_log_density (post, delta));
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

/* x with table mass `target` left of it: the panel by bisection of the cumulative
 * masses, then Newton on the panel's integrated series, kept inside a bracket. */
static double
table_quantile (const TfDeltaPosterior *p, double target)
{
  guint lo = 0, hi = p->n_panels;

  if (p->n_panels == 0)
    return p->mode;
  if (target <= 0.0)
    return p->panels[0].a;
  if (target >= p->total)
    return p->panels[p->n_panels - 1].b;
  while (hi - lo > 1)
    {
      guint mid = (lo + hi) / 2;
      if (p->cum[mid] <= target)
        lo = mid;
      else
        hi = mid;
    }
  const Panel *pn = &p->panels[lo];
  double want = target - p->cum[lo];
  double a = pn->a, b = pn->b;
  double x = a + (b - a) * CLAMP (want / pn->mass, 0.0, 1.0);
  for (int it = 0; it < 100; it++)
    {
      double v = panel_integral (pn, x) - want, dens = panel_density (pn, x);
      if (fabs (v) <= 1e-14 * pn->mass)          /* the rounding of the integral */
        return x;
      if (v > 0.0)
        b = x;
      else
        a = x;
      double nx = dens > 0.0 ? x - v / dens : 0.5 * (a + b);
      if (!(nx > a && nx < b))
        nx = 0.5 * (a + b);
      double tol = 4e-16 * fabs (x) + 1e-13 * (pn->b - pn->a);
      if (fabs (nx - x) <= tol || b - a <= 2.0 * tol)
        return nx;
      x = nx;
    }
  return x;
}

/* The table to use for the posterior truncated to [a, b]: this one unless it holds
 * under 1e-3 of its mass there, then one built on [a, b]. */
static TfDeltaPosterior *
truncated (TfDeltaPosterior *post, double a, double b)
{
  a = MAX (a, post->dom_lo);
  b = MIN (b, post->dom_hi);
  if (a == post->dom_lo && b == post->dom_hi)
    return post;
  if (table_mass (post, a, b) >= 1e-3 * post->total)
    return post;
  if (post->sub == NULL || post->sub->dom_lo != a || post->sub->dom_hi != b)
    {
      tf_delta_posterior_free (post->sub);
      post->sub = posterior_new_on (&post->prior, post->t, post->n_eff, post->df, a, b);
    }
  return post->sub;
}

double
tf_delta_posterior_quantile (TfDeltaPosterior *post, double u, double a, double b)
{
  TfDeltaPosterior *p = truncated (post, a, b);
  double ca = table_cdf (p, a), cb = table_cdf (p, b);
  return CLAMP (table_quantile (p, ca + u * (cb - ca)), a, b);
}

/* Shortest interval of the given mass: the lower tail p where the density is the same
 * at both ends, f(Q(p)) = f(Q(p + level)) (Box & Tiao 1973, §2.8), found by Illinois
 * (Dowell & Jarratt 1971) near the shortest of 17 intervals on a grid of p (a
 * bimodal posterior has several such p); p = 0 or 1 − level when the density falls or
 * rises throughout. */
void
tf_delta_posterior_hdi (TfDeltaPosterior *post, double level, double a, double b,
                        double *lo, double *hi)
{
  TfDeltaPosterior *p = truncated (post, a, b);
  double ca = table_cdf (p, a), cb = table_cdf (p, b), span = cb - ca;
  const guint grid = 16;
  const double room = 1.0 - level;
#define Q(q) table_quantile (p, ca + (q) * span)
#define GAP(q) (log_density_unnorm (p, Q (q)) - log_density_unnorm (p, Q ((q) + level)))
  guint best = 0;
  double best_w = INFINITY;
  for (guint i = 0; i <= grid; i++)
    {
      double q = room * i / grid, w = Q (q + level) - Q (q);
      if (w < best_w)
        {
          best_w = w;
          best = i;
        }
    }
  double x0 = room * (best > 0 ? best - 1 : 0) / grid, x1 = room * MIN (best + 1, grid) / grid;
  double g0 = GAP (x0), g1 = GAP (x1), pm;
  if (g0 >= 0.0)
    pm = x0;
  else if (g1 <= 0.0)
    pm = x1;
  else
    {
      int side = 0;
      for (int it = 0; it < 200 && x1 - x0 > 1e-14 * room; it++)
        {
          double xm = (x0 * g1 - x1 * g0) / (g1 - g0);
          if (!(xm > x0 && xm < x1) || it % 8 == 7)
            xm = 0.5 * (x0 + x1);
          double gm = GAP (xm);
          if (gm == 0.0)
            {
              x0 = x1 = xm;
              break;
            }
          if (gm < 0.0)
            {
              x0 = xm; g0 = gm;
              if (side == -1)
                g1 *= 0.5;
              side = -1;
            }
          else
            {
              x1 = xm; g1 = gm;
              if (side == 1)
                g0 *= 0.5;
              side = 1;
            }
        }
      pm = 0.5 * (x0 + x1);
    }
#undef GAP
#undef Q
  *lo = CLAMP (table_quantile (p, ca + pm * span), a, b);
  *hi = CLAMP (table_quantile (p, ca + (pm + level) * span), a, b);
}
