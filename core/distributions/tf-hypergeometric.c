/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-hypergeometric.c: the hypergeometric distribution in log space and its exact
 * two-sided tail by the minimum-likelihood rule.
 *
 * The probability of x is dbinom(x; nA, p) dbinom(m − x; nB, p) / dbinom(m; N, p) with
 * p = m / N, each binomial in Loader's saddle-point form (Loader 2000, as R's dhyper),
 * so that it holds for margins of 10^15. Tails are summed outward from their inner end,
 * where the terms are largest, with the ratio recurrence of successive probabilities,
 * and stop when a term falls below 1e-17 of the sum: no outcome far out in a tail, and
 * none at all on the other side of the mode, is visited.
 */
#include "tf-hypergeometric.h"
#include "tf-exact-test.h"
#include "tf-logspace.h"

#include <math.h>

void
tf_hyper_init (TfHyper *h, double n_a, double n_b, double m)
{
  double N = n_a + n_b;

  h->n_a = n_a;
  h->n_b = n_b;
  h->m = m;
  h->lo = MAX (0.0, m - n_b);
  h->hi = MIN (n_a, m);
  h->p = m / N;
  h->q = (N - m) / N;
  /* the mode of the hypergeometric (Johnson, Kemp & Kotz 2005, §6.3) */
  h->mode = CLAMP (floor ((n_a + 1.0) * (m + 1.0) / (N + 2.0)), h->lo, h->hi);
  h->sd = N > 1.0 ? sqrt (n_a * h->p * h->q * (n_b / (N - 1.0))) : 0.0;
}

double
tf_hyper_log_pmf (const TfHyper *h, double x)
{
  if (!(x >= h->lo && x <= h->hi))
    return -INFINITY;
  if (h->lo == h->hi)
    return 0.0;
  return tf_log_dbinom (x, h->n_a, h->p, h->q) + tf_log_dbinom (h->m - x, h->n_b, h->p, h->q)
         - tf_log_dbinom (h->m, h->n_a + h->n_b, h->p, h->q);
}

/* ln Σ P(j) for j = x0, x0 + step, ... to the end of the support, the terms
 * decreasing from x0 outward (x0 on the far side of the mode from the direction of
 * step, or at it): the ratio recurrence P(j ± 1) / P(j), stopped at 1e-17 relative
 * (common practice). */
static double
sum_outward (const TfHyper *h, double x0, int step)
{
  const double na = h->n_a, nb = h->n_b, m = h->m;
  double l0 = tf_hyper_log_pmf (h, x0);
  double t = 1.0, s = 1.0, j = x0;

  if (l0 == -INFINITY)
    return -INFINITY;
  if (step > 0)
    while (j < h->hi)
      {
        t *= (na - j) * (m - j) / ((j + 1.0) * (nb - m + j + 1.0));
        s += t;
        j += 1.0;
        if (t < 1e-17 * s)
          break;
      }
  else
    while (j > h->lo)
      {
        t *= j * (nb - m + j) / ((na - j + 1.0) * (m - j + 1.0));
        s += t;
        j -= 1.0;
        if (t < 1e-17 * s)
          break;
      }
  return l0 + log (s);
}

/* The same rounded into [0, 1] (the sum is computed once: MIN would evaluate it twice). */
static double
sum_outward_clamped (const TfHyper *h, double x0, int step)
{
  double l = sum_outward (h, x0, step);
  return MIN (l, 0.0);
}

double
tf_hyper_log_cdf (const TfHyper *h, double x)
{
  x = floor (x);
  if (x < h->lo)
    return -INFINITY;
  if (x >= h->hi)
    return 0.0;
  if (x < h->mode)
    return sum_outward_clamped (h, x, -1);
  /* the upper tail beyond x is the smaller side */
  return tf_log1mexp (sum_outward_clamped (h, x + 1.0, +1));
}

double
tf_hyper_log_sf (const TfHyper *h, double x)
{
  x = ceil (x);
  if (x > h->hi)
    return -INFINITY;
  if (x <= h->lo)
    return 0.0;
  if (x > h->mode)
    return sum_outward_clamped (h, x, +1);
  return tf_log1mexp (sum_outward_clamped (h, x - 1.0, -1));
}

static double
log_pmf (double x, const void *h)
{
  return tf_hyper_log_pmf (h, x);
}

/* On each side of the mode, the outcome nearest the mode no more likely than k_a
 * (Sterne 1954's rule, by tf_exact_test_far_end()). */
void
tf_hyper_two_sided_bounds (const TfHyper *h, double k_a, double *low, double *high)
{
  double ld = tf_exact_test_log_threshold (tf_hyper_log_pmf (h, k_a));

  /* the largest j in [lo − 1, mode] with ln P(j) <= ld: P increases on [lo, mode] */
  *low = tf_exact_test_far_end (log_pmf, h, ld, h->mode, h->lo - 1.0, 0.0);
  /* the smallest j in [mode, hi + 1] with ln P(j) <= ld */
  *high = tf_exact_test_far_end (log_pmf, h, ld, h->mode, h->hi + 1.0, 0.0);
}

/* The outcomes no more likely than k_a, summed on both sides of the mode. */
double
tf_hyper_log_exact_two_sided (const TfHyper *h, double k_a)
{
  double low, high;

  if (h->lo == h->hi)
    return 0.0;
  tf_hyper_two_sided_bounds (h, k_a, &low, &high);
  if (low >= high)              /* cannot happen: the mode is never counted unless all are */
    return 0.0;
  double l = low >= h->lo ? sum_outward (h, low, -1) : -INFINITY;
  double u = high <= h->hi ? sum_outward (h, high, +1) : -INFINITY;
  if (low >= h->mode || high <= h->mode)
    return 0.0;
  return MIN (tf_log_add (l, u), 0.0);
}
