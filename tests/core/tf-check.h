/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-check.h: the checks the core test suites share.
 */
#pragma once

#include "tf-results.h"

#include <math.h>

/* |got − want| <= tol·|want| (relative), or |got| <= tol when want is 0. */
static inline void
assert_rel (double got, double want, double tol)
{
  double err = want == 0.0 ? fabs (got) : fabs (got - want) / fabs (want);

  if (!(err <= tol))
    g_error ("got %.17g, want %.17g (relative error %.3g > %.3g)", got, want, err, tol);
}

/* The value of a result that must be there and defined. */
static inline double
get (const TfResults *r, const char *id)
{
  double v = NAN;

  if (!tf_results_get (r, id, &v))
    g_error ("result %s is missing or undefined", id);
  return v;
}
