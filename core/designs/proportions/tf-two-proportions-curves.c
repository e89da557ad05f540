/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-proportions-curves.c: figures for two proportions: densities of θA − θB, the
 * Bayes factor against the prior's concentration and against the total trials with the
 * pooled z held, the hypergeometric null distribution of kA, and the two models'
 * probabilities.
 */
#include "tf-two-proportions.h"
#include "tf-two-proportions-private.h"
#include "tf-beta-difference.h"
#include "tf-fisher.h"
#include "tf-incbeta.h"
#include "tf-logspace.h"
#include "tf-normal.h"

#include <math.h>
#include <float.h>
#include <string.h>
#include <glib/gi18n-lib.h>

static double
finite_exp (double l)
{
  double v = exp (l);
  return isfinite (v) ? v : (isnan (l) ? 0.0 : DBL_MAX);
}

/* A beta far wider than the figure's range (a prior about a narrow posterior) would
 * need a grid as fine as the figure's over all of its mass. With whole-number shapes
 * at both ends, or shapes that add up to 11 or more there, the density is smooth on
 * each side of 0 (a polynomial in d for whole numbers; |d|^γ terms of γ >= 10 else), so it is computed
 * on a coarse grid of steps below a tenth of the narrower beta's standard deviation
 * and interpolated through the 8 coarse points nearest each point on its side of 0
 * (Lagrange; the coarse points' spacing makes the error of the order of 1e-8). FALSE
 * where that does not apply. */
#define COARSE 8

static gboolean
smooth_end (double s, double t)
{
  return (s == floor (s) && t == floor (t)) || s + t >= 11.0;
}

static gboolean
coarse_curve (TfBetaDiff *bd, const double *x, guint np, double *out)
{
  gboolean whole = smooth_end (bd->pa, bd->pb) && smooth_end (bd->qa, bd->qb);
  double s = bd->pa + bd->qa, sa = sqrt (bd->pa / s * (bd->qa / s) / (s + 1.0));
  double t = bd->pb + bd->qb, sb = sqrt (bd->pb / t * (bd->qb / t) / (t + 1.0));
  double sd = MIN (sa, sb);

  if (!whole || !(sd > 2.0 * (x[np - 1] - x[0]) / np))
    return FALSE;
  gint64 S = (gint64) ceil (10.0 / sd);
  gint64 k0 = MAX (-S + 1, (gint64) floor (x[0] * S) - COARSE);
  gint64 k1 = MIN (S - 1, (gint64) ceil (x[np - 1] * S) + COARSE);
  guint nc = (guint) (k1 - k0 + 1);
  g_autofree double *c = g_new (double, nc);
  if (nc < COARSE || nc > 4 * np || !tf_beta_diff_log_density_grid (bd, S, k0, nc, c))
    return FALSE;
  for (guint k = 0; k < nc; k++)
    c[k] = finite_exp (isnan (c[k]) ? tf_beta_diff_log_density (bd, (double) (k0 + k) / S) : c[k]);
  for (guint i = 0; i < np; i++)
    {
      /* the coarse points on this point's side of 0 (0 itself on both) */
      gint64 lo = x[i] >= 0.0 ? MAX (k0, 0) : k0, hi = x[i] >= 0.0 ? k1 : MIN (k1, 0);
      gint64 first = (gint64) floor (x[i] * S) - COARSE / 2 + 1;
      first = CLAMP (first, lo, hi - COARSE + 1);
      if (hi - lo + 1 < COARSE)
        return FALSE;
      double sum = 0.0;
      for (gint64 j = first; j < first + COARSE; j++)
        {
          double w = 1.0, xj = (double) j / S;
          for (gint64 l = first; l < first + COARSE; l++)
            if (l != j)
              w *= (x[i] - (double) l / S) / (xj - (double) l / S);
          sum += w * c[j - k0];
        }
      out[i] = MAX (sum, 0.0);
    }
  return TRUE;
}

/* The points the grid left out near 0 and ±1 (another factor's end within a few nodes
 * of an end of the integral) once more on a grid 8 times finer, where that end is 8
 * nodes away: a run of them at a time. */
#define FINER 8

static void
refine (TfBetaDiff *bd, gint64 S, gint64 L, guint np, double *out)
{
  for (guint i = 0; i < np; i++)
    {
      guint j = i;
      if (!isnan (out[i]))
        continue;
      while (j + 1 < np && (isnan (out[j + 1]) || (j + 2 < np && isnan (out[j + 2]))))
        j++;
      if (j - i > 40)
        {
          i = j;
          continue;             /* not a few points near an end */
        }
      guint nf = FINER * (j - i) + 1;
      g_autofree double *f = g_new (double, nf);
      if (tf_beta_diff_log_density_grid (bd, FINER * S, FINER * (L + (gint64) i), nf, f))
        for (guint k = i; k <= j; k++)
          if (isnan (out[k]))
            out[k] = f[FINER * (k - i)];
      i = j;
    }
}

/* The density on the grid (L + i) / S: the convolution where it applies (on a finer
 * grid near 0 and ±1 where needed), the point-by-point integral at the points it
 * leaves. */
static void
curve_of (TfBetaDiff *bd, gint64 S, gint64 L, const double *x, guint np, double *out)
{
  gboolean g = tf_beta_diff_log_density_grid (bd, S, L, np, out);
  if (!g && coarse_curve (bd, x, np, out))
    return;
  if (g)
    refine (bd, S, L, np, out);
  for (guint i = 0; i < np; i++)
    if (isnan (out[i]))
      out[i] = tf_beta_diff_log_density (bd, x[i]);
  /* an infinite density (at 0, both shapes at one end adding up to 1 or less) is drawn
   * at the height of the higher of its neighbours */
  for (guint i = 0; i < np; i++)
    if (out[i] == INFINITY)
      out[i] = MAX (i > 0 && isfinite (out[i - 1]) ? out[i - 1] : -INFINITY,
                    i + 1 < np && isfinite (out[i + 1]) ? out[i + 1] : -INFINITY);
  for (guint i = 0; i < np; i++)
    out[i] = finite_exp (out[i]);
}

/* The grid (L + i) / S of n points from lo on. */
static gboolean
aligned_grid (double lo, double hi, guint n, gint64 *S, gint64 *L)
{
  double s = floor ((n - 2) / (hi - lo));
  if (!(s >= 1.0 && s < 1e15))
    return FALSE;
  *S = (gint64) s;
  *L = (gint64) floor (lo * s);
  if (*L + (gint64) n - 1 > *S)
    *L = MAX (-*S, *S - ((gint64) n - 1));
  return TRUE;
}

/* The lower and upper level quantiles of Δ, to a small fraction of the range: the
 * density on a grid over a range that holds them (each beta's 0.1 level quantiles: by
 * the union bound, P(Δ < a_lo − b_hi) <= 0.2 level), summed by the trapezoidal rule;
 * by Newton's method on the tails where the grid cannot be used. */
static void
quantiles (TfBetaDiff *bd, double level, guint np, double *lo, double *hi)
{
  double e = log (0.1 * level);
  double glo = tf_incbeta_inverse_log (e, bd->pa, bd->qa, TRUE)
               - tf_incbeta_inverse_log (e, bd->pb, bd->qb, FALSE);
  double ghi = tf_incbeta_inverse_log (e, bd->pa, bd->qa, FALSE)
               - tf_incbeta_inverse_log (e, bd->pb, bd->qb, TRUE);
  g_autofree double *f = g_new (double, np);
  gint64 S, L;
  guint good = 0;

  glo = MAX (glo, -1.0);
  ghi = MIN (ghi, 1.0);
  if (ghi > glo && aligned_grid (glo, ghi, np, &S, &L)
      && tf_beta_diff_log_density_grid (bd, S, L, np, f))
    {
      double top = -INFINITY;
      for (guint i = 0; i < np; i++)
        if (!isnan (f[i]) && f[i] < INFINITY)
          top = MAX (top, f[i]), good++;
      /* a point left out, or infinite, counts as its left neighbour */
      for (guint i = 0; i < np; i++)
        f[i] = isnan (f[i]) || f[i] == INFINITY ? (i > 0 ? f[i - 1] : 0.0) : exp (f[i] - top);
      double total = 0.0;
      for (guint i = 1; i < np; i++)
        total += 0.5 * (f[i - 1] + f[i]);
      if (good > np / 2 && total > 0.0 && isfinite (total))
        {
          double c = 0.0, step = 1.0 / S;
          *lo = *hi = NAN;
          for (guint i = 1; i < np && isnan (*lo); i++)
            {
              double t = 0.5 * (f[i - 1] + f[i]);
              if (c + t >= level * total)
                *lo = (L + i - 1 + (level * total - c) / t) * step;
              c += t;
            }
          c = 0.0;
          for (guint i = np - 1; i > 0 && isnan (*hi); i--)
            {
              double t = 0.5 * (f[i - 1] + f[i]);
              if (c + t >= level * total)
                *hi = (L + i - (level * total - c) / t) * step;
              c += t;
            }
          if (isfinite (*lo) && isfinite (*hi))
            return;
        }
    }
  *lo = tf_beta_diff_quantile_log (bd, log (level), TRUE);
  *hi = tf_beta_diff_quantile_log (bd, log (level), FALSE);
}

/* x = Δ = θA − θB. Posterior: the density of the difference of the independent beta
 * posteriors, by convolution; prior: that of two independent Beta(a, b); "likelihood":
 * the density of the difference under uniform priors, Beta(k + 1, n − k + 1) in each
 * group, which is the likelihood integrated over the other parameter and normalised
 * (the likelihood of the pair is not a function of Δ alone). No Savage–Dickey heights:
 * the null's common θ ~ Beta(a, b) is not the alternative's prior conditioned on Δ = 0
 * (that would be Beta(2a − 1, 2b − 1)), so the density ratio at 0 is not this Bayes
 * factor; prior_at_null and posterior_at_null are 0. */
void
tf_two_proportions_densities (const TfAnalysis *analysis, TfDensityCurves *curves)
{
  const TfAnalysis *an = analysis;
  const double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
  const double a = an->prior_a, b = an->prior_b;
  const guint np = curves->n;
  TfBetaDiff post, prior, lik;

  tf_beta_diff_init (&post, ka + a, na - ka + b, kb + a, nb - kb + b);
  tf_beta_diff_init (&prior, a, b, a, b);
  tf_beta_diff_init (&lik, ka + 1.0, na - ka + 1.0, kb + 1.0, nb - kb + 1.0);
  post.epsrel = prior.epsrel = lik.epsrel = 1e-6;

  double qlo, qhi, plo, phi;
  quantiles (&post, 0.5e-6, np, &qlo, &qhi);
  if (!isfinite (qlo) || !isfinite (qhi))
    {
      qlo = MAX (-1.0, post.mean - 5.0 * post.sd);
      qhi = MIN (1.0, post.mean + 5.0 * post.sd);
    }
  double lo = MIN (qlo, 0.0), hi = MAX (qhi, 0.0);
  quantiles (&prior, 0.005, np, &plo, &phi);
  plo = MIN (lo, plo);
  phi = MAX (hi, phi);
  if (isfinite (plo) && isfinite (phi) && (qhi - qlo) * (np - 1) / (phi - plo) >= 3.0)
    {
      lo = plo;
      hi = phi;
    }
  lo = MAX (lo, -1.0 + 1e-12);
  hi = MIN (hi, 1.0 - 1e-12);
  if (!(hi > lo))
    {
      lo = MAX (-1.0 + 1e-12, lo - 1e-9);
      hi = MIN (1.0 - 1e-12, hi + 1e-9);
    }
  /* the grid d_i = (L + i) / S, covering [lo, hi], for the convolution of
   * tf_beta_diff_log_density_grid() */
  gint64 S, L;
  if (!aligned_grid (lo, hi, np, &S, &L))
    {
      S = (gint64) ceil ((np - 2) / (hi - lo));
      L = (gint64) floor (lo * S);
    }
  lo = (double) L / S;
  hi = (double) (L + (gint64) np - 1) / S;
  curves->lo = lo;
  curves->hi = hi;
  double step = 1.0 / S;
  curves->posterior_narrow = post.sd < 2.0 * step;

  for (guint i = 0; i < np; i++)
    curves->x[i] = (double) (L + (gint64) i) / S;
  curve_of (&prior, S, L, curves->x, np, curves->prior);
  if (curves->posterior_narrow)
    memset (curves->posterior, 0, np * sizeof (double));
  else
    curve_of (&post, S, L, curves->x, np, curves->posterior);
  curve_of (&lik, S, L, curves->x, np, curves->likelihood);
  guint top = 0;
  for (guint i = 0; i < np; i++)
    if (curves->posterior[i] > curves->posterior[top])
      top = i;
  curves->null_value = curves->null_low = curves->null_high = 0.0;
  curves->prior_at_null = curves->posterior_at_null = 0.0;
  /* the mode: the grid's highest point, refined by the parabola through it and its
   * neighbours; a spike too narrow for the grid stands at the posterior mean */
  curves->posterior_mode = post.mean;
  if (!curves->posterior_narrow && top > 0 && top + 1 < np)
    {
      double l = log (curves->posterior[top - 1]), c = log (curves->posterior[top]);
      double r = log (curves->posterior[top + 1]), curvature = l - 2.0 * c + r;

      curves->posterior_mode = curves->x[top];
      if (isfinite (curvature) && curvature < 0.0)
        curves->posterior_mode += 0.5 * step * (l - r) / curvature;
    }
  else if (!curves->posterior_narrow)
    curves->posterior_mode = curves->x[top];
  curves->parameter_markup = g_strdup ("θ<sub>A</sub> − θ<sub>B</sub>");
}

static double
posterior_null_of (double lbf01, double pi0)
{
  return tf_logistic (log (pi0) - log1p (-pi0) + lbf01);
}

/* x = a + b from 1e-2 to 1e4, log-spaced, with the prior mean a / (a + b) held. */
gboolean
tf_two_proportions_sensitivity (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                                char **why_not G_GNUC_UNUSED)
{
  const TfAnalysis *an = analysis;
  const double mean = an->prior_a / (an->prior_a + an->prior_b);

  for (guint i = 0; i < curve->n; i++)
    {
      double c = tf_sensitivity_grid (i, curve->n);
      double l = tf_two_proportions_log_bf01_directed (an->successes_a, an->trials_a,
                                                       an->successes_b, an->trials_b,
                                                       c * mean, c * (1.0 - mean), an->direction);
      curve->x[i] = c;
      curve->log_bf01[i] = isfinite (l) ? l : 0.0;
      curve->posterior_null[i] = posterior_null_of (curve->log_bf01[i], an->prior_null);
    }
  curve->x_log = TRUE;
  curve->x_markup = g_strdup (_("prior concentration <i>a</i> + <i>b</i> (prior mean held)"));
  curve->chosen_x = an->prior_a + an->prior_b;
  double l = tf_two_proportions_log_bf01_directed (an->successes_a, an->trials_a,
                                                   an->successes_b, an->trials_b,
                                                   an->prior_a, an->prior_b, an->direction);
  curve->chosen_log_bf01 = isfinite (l) ? l : 0.0;
  curve->chosen_posterior_null = posterior_null_of (curve->chosen_log_bf01, an->prior_null);
  return TRUE;
}

/* The table at total T = f N, f = T / N, for the sample-size curve: every cell is
 * scaled by f after the shift t = (f^{−1/2} − 1) D / N, D = kA nB − kB nA, is added to
 * kA and nB − kB and taken from nA − kA and kB. The shift keeps the margins, so the
 * group shares and the pooled proportion stay the observed ones, and turns D into
 * f^{3/2} D, which holds the pooled z statistic D / √(m (N − m) nA nB / N). Where T is
 * too small to reach that z the shift is clipped at the cell it empties. */
static void
held_table (const TfAnalysis *an, double total, double c[4])
{
  const double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
  const double o[4] = { ka, na - ka, kb, nb - kb };
  const double f = total / (na + nb);
  const double g = tf_two_proportions_cross (ka, na, kb, nb) / (na + nb);
  double t = (1.0 / sqrt (f) - 1.0) * g;

  t = CLAMP (t, -MIN (o[0], o[3]), MIN (o[1], o[2]));
  c[0] = f * (o[0] + t);
  c[1] = f * (o[1] - t);
  c[2] = f * (o[2] - t);
  c[3] = f * (o[3] + t);
}

double
tf_two_proportions_held_log_bf01 (const TfAnalysis *an, double total)
{
  double c[4];

  held_table (an, total, c);
  return tf_two_proportions_log_bf01_directed (c[0], c[0] + c[1], c[2], c[2] + c[3],
                                               an->prior_a, an->prior_b, an->direction);
}

/* ln of the pooled z test's p-value in the analysis's direction; 0 when there are no
 * successes or no failures at all. */
static double
log_p_pooled_z (const TfAnalysis *an)
{
  const double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
  const double N = na + nb, m = ka + kb;

  if (m == 0.0 || m == N)
    return 0.0;
  double z = tf_two_proportions_cross (ka, na, kb, nb) / sqrt (m * ((N - m) / N) * na * nb);
  double side = an->direction == TF_DIRECTION_GREATER ? z
                : an->direction == TF_DIRECTION_LESS ? -z : fabs (z);
  double l = tf_log_erfc (side / G_SQRT2);      /* two-sided: ln P(|Z| >= |z|) */
  if (isnan (l))                                /* GSL failed */
    return 0.0;
  return MIN (0.0, l - (an->direction == TF_DIRECTION_TWO_SIDED ? 0.0 : G_LN2));
}

/* x = the total trials T from 2 (or where the observed z can first be reached) to
 * 10^12, log-spaced, with the table of held_table(): the closed-form Bayes factor of
 * the common-Beta model at each T. At fixed z, BF01 grows like √T (Jeffreys 1939,
 * Lindley 1957). */
gboolean
tf_two_proportions_sample_size (const TfAnalysis *analysis, TfEvidenceCurve *curve,
                                char **why_not G_GNUC_UNUSED)
{
  const TfAnalysis *an = analysis;
  const double ka = an->successes_a, na = an->trials_a, kb = an->successes_b, nb = an->trials_b;
  const double N = na + nb;
  const double g = tf_two_proportions_cross (ka, na, kb, nb) / N;
  /* the smallest f with the shift unclipped: (f^{−1/2} − 1)|g| = the cell it empties */
  double room = g > 0.0 ? MIN (na - ka, kb) : MIN (ka, nb - kb);
  double f_min = g == 0.0 ? 0.0 : 1.0 / ((1.0 + room / fabs (g)) * (1.0 + room / fabs (g)));
  double bottom = MAX (2.0, MIN (2.0 * f_min * N, N));
  double top = MAX (1e12, N);

  for (guint i = 0; i < curve->n; i++)
    {
      double T = i + 1 == curve->n ? top : bottom * pow (top / bottom, (double) i / (curve->n - 1));
      double l = tf_two_proportions_held_log_bf01 (an, T);
      curve->x[i] = T;
      curve->log_bf01[i] = l;
      curve->posterior_null[i] = isfinite (l) ? posterior_null_of (l, an->prior_null) : NAN;
    }
  curve->x_log = TRUE;
  curve->x_markup = g_strdup (_("total trials <i>N</i> (shares, pooled proportion and <i>z</i> held)"));
  curve->chosen_x = N;
  curve->chosen_log_bf01 = tf_two_proportions_log_bf01_directed (ka, na, kb, nb, an->prior_a,
                                                                 an->prior_b, an->direction);
  curve->chosen_posterior_null = isfinite (curve->chosen_log_bf01)
                                 ? posterior_null_of (curve->chosen_log_bf01, an->prior_null) : NAN;
  curve->p_value = exp (log_p_pooled_z (an));
  return TRUE;
}

#define TF_MAX_OUTCOMES 100001

/* The hypergeometric masses of kA given the margins, over the outcomes with mass
 * (mode ± 9 SD, and the observed outcome when it is near). */
gboolean
tf_two_proportions_null_distribution (const TfAnalysis *analysis, TfNullDistribution *dist,
                                      char **why_not)
{
  const TfAnalysis *an = analysis;
  const double ka = an->successes_a;
  TfHyper h;
  double low = 0.0, high = 0.0;

  tf_hyper_init (&h, an->trials_a, an->trials_b, an->successes_a + an->successes_b);
  double lo = MAX (h.lo, floor (h.mode - 9.0 * h.sd - 5.0));
  double hi = MIN (h.hi, ceil (h.mode + 9.0 * h.sd + 5.0));
  if (ka >= lo - 0.25 * (hi - lo) && ka < lo)
    lo = ka;
  if (ka <= hi + 0.25 * (hi - lo) && ka > hi)
    hi = ka;
  if (hi - lo + 1.0 > TF_MAX_OUTCOMES)
    {
      *why_not = g_strdup (_("The null distribution has too many likely outcomes to draw one by one."));
      return FALSE;
    }
  if (an->direction == TF_DIRECTION_TWO_SIDED)
    tf_hyper_two_sided_bounds (&h, ka, &low, &high);
  tf_null_distribution_allocate (dist, (guint) (hi - lo + 1.0));
  for (guint i = 0; i < dist->n; i++)
    {
      double j = lo + i;
      dist->x[i] = j;
      dist->mass[i] = exp (tf_hyper_log_pmf (&h, j));
      dist->in_tail[i] = an->direction == TF_DIRECTION_GREATER ? j >= ka
                         : an->direction == TF_DIRECTION_LESS ? j <= ka
                         : (h.lo == h.hi || low >= h.mode || high <= h.mode) ? TRUE
                         : (j <= low || j >= high);
    }
  dist->discrete = TRUE;
  dist->observed = ka;
  dist->p_value = MIN (1.0, exp (tf_fisher_log_p (&h, ka, an->direction)));
  dist->x_markup = g_strdup (_("successes in group A, <i>k</i><sub>A</sub>, given the margins"));
  return TRUE;
}

gboolean
tf_two_proportions_model_probabilities (const TfAnalysis *analysis, TfModelProbabilities *models,
                                        char **why_not)
{
  const TfAnalysis *an = analysis;
  double l = tf_two_proportions_log_bf01_directed (an->successes_a, an->trials_a,
                                                   an->successes_b, an->trials_b,
                                                   an->prior_a, an->prior_b, an->direction);
  if (!isfinite (l))
    {
      *why_not = g_strdup (_("The Bayes factor cannot be represented for these data, so neither can the model probabilities."));
      return FALSE;
    }
  tf_model_probabilities_allocate (models, 2);
  models->names_markup[0] = g_strdup ("H<sub>0</sub>: θ<sub>A</sub> = θ<sub>B</sub>");
  models->names_markup[1] = g_strdup (an->direction == TF_DIRECTION_GREATER
                                      ? "H<sub>1</sub>: θ<sub>A</sub> &gt; θ<sub>B</sub>"
                                      : an->direction == TF_DIRECTION_LESS
                                      ? "H<sub>1</sub>: θ<sub>A</sub> &lt; θ<sub>B</sub>"
                                      : "H<sub>1</sub>: θ<sub>A</sub> ≠ θ<sub>B</sub>");
  models->prior[0] = an->prior_null;
  models->prior[1] = 1.0 - an->prior_null;
  models->posterior[0] = posterior_null_of (l, an->prior_null);
  models->posterior[1] = posterior_null_of (-l, 1.0 - an->prior_null);
  return TRUE;
}
