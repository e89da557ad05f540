/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-exact-test.c: the far end of the minimum-likelihood rule's two-sided tail (Sterne
 * 1954), found by bisection over whole numbers so that no outcome is visited one by
 * one, for n up to 10^15.
 */
#include "tf-exact-test.h"

#include <math.h>

/* A bound on every loop: doubling a step of at least 1 overflows after 1024 steps, and
 * halving a bracket of doubles reaches width 1 after at most 1024 + 53 steps. */
#define TF_EXACT_TEST_MAX_STEPS 1100

double
tf_exact_test_log_threshold (double log_pmf_observed)
{
  return log_pmf_observed + log1p (TF_EXACT_TEST_RELATIVE_TOLERANCE);
}

/* The smallest j in [lo, hi] with log_pmf (j) <= ld, ln P decreasing. */
static double
first_at_most (TfExactTestLogPmf log_pmf, const void *data, double ld, double lo, double hi)
{
  for (guint i = 0; lo < hi && i < TF_EXACT_TEST_MAX_STEPS; i++)
    {
      double mid = floor (lo + (hi - lo) / 2.0);
      if (log_pmf (mid, data) <= ld)
        hi = mid;
      else
        lo = mid + 1.0;
    }
  return lo;
}

/* The largest j in [lo, hi] with log_pmf (j) <= ld, ln P increasing. */
static double
last_at_most (TfExactTestLogPmf log_pmf, const void *data, double ld, double lo, double hi)
{
  for (guint i = 0; lo < hi && i < TF_EXACT_TEST_MAX_STEPS; i++)
    {
      double mid = ceil (lo + (hi - lo) / 2.0);
      if (log_pmf (mid, data) <= ld)
        lo = mid;
      else
        hi = mid - 1.0;
    }
  return lo;
}

double
tf_exact_test_far_end (TfExactTestLogPmf log_pmf, const void *data, double ld, double start,
                       double end, double spread)
{
  if (end < start)
    return last_at_most (log_pmf, data, ld, end, start);
  if (isfinite (end))
    return first_at_most (log_pmf, data, ld, start, end);
  /* an unbounded support: bracket the answer in [lo, hi] by doubling steps */
  double lo = start, hi = start, step = MAX (1.0, floor (spread));
  for (guint i = 0; i < TF_EXACT_TEST_MAX_STEPS && log_pmf (hi, data) > ld; i++)
    {
      lo = hi + 1.0;
      hi += step;
      step *= 2.0;
    }
  return first_at_most (log_pmf, data, ld, lo, hi);
}
