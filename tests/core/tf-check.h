/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-check.h: the checks the core test suites share, and the tolerances they use.
 *
 * A check's tolerance is one of the classes below, chosen by how the number is computed
 * (relative error unless the class says otherwise); a bare literal is left only where
 * the check's comment says why that number.
 */
#pragma once

#include "tf-results.h"

#include <glib.h>
#include <gsl/gsl_errno.h>
#include <math.h>

/* Exact: a special case returned as it is, or arithmetic that rounds nowhere. */
#define TF_TOL_EXACT 0.0
/* A few ulps: a handful of rounded operations (a ratio, a sum, an identity). */
#define TF_TOL_ULPS 1e-15
/* Tens of ulps: rounding alone, in a formula of tens of operations in double (log-space
 * densities, ln B(a, b), Stirling's series far out). */
#define TF_TOL_ROUNDING 1e-14
/* Hundreds of ulps: a series, continued fraction or recurrence summed to convergence in
 * double, or a root of one. */
#define TF_TOL_SERIES 1e-13
/* Thousands of ulps: a chain of special functions, a root solved to the last digits, or
 * a value quoted from a double-precision library (scipy). */
#define TF_TOL_DOUBLE 1e-12
/* Closed forms and exact finite sums, also of special functions (DEVELOPERS.md). */
#define TF_TOL_CLOSED_FORM 1e-9
/* A quadrature, expansion or root that the core carries to closed-form accuracy. */
#define TF_TOL_CONVERGED 1e-9
/* Quadrature and iterative methods in general (DEVELOPERS.md). */
#define TF_TOL_ITERATIVE 1e-7
/* Absolute: half a unit in the 4th decimal, for values a table quotes to 4 decimals. */
#define TF_TOL_PUBLISHED_4DP 5e-5

/* What every core suite does first: GSL's abort-on-error handler off (as the programs
 * do), then GLib's test framework. */
static inline void
tf_check_init (int *argc, char ***argv)
{
  gsl_set_error_handler_off ();
  g_test_init (argc, argv, NULL);
}

/* |got − want| <= tol·|want| (relative), or |got| <= tol when want is 0. */
static inline void
assert_rel (double got, double want, double tol)
{
  double err = want == 0.0 ? fabs (got) : fabs (got - want) / fabs (want);

  if (!(err <= tol))
    g_error ("got %.17g, want %.17g (relative error %.3g > %.3g)", got, want, err, tol);
}

/* |got − want| <= tol (absolute; of logarithms, the relative error of the value). */
static inline void
assert_abs (double got, double want, double tol)
{
  double err = fabs (got - want);

  if (!(err <= tol))
    g_error ("got %.17g, want %.17g (absolute error %.3g > %.3g)", got, want, err, tol);
}

/* A log probability: |got − want| / max(1, |want|) <= tol: the relative error of the
 * probability while its log is above −1, the relative error of the log beyond (as the
 * cross-check scripts' abs_rel). Infinities must match. */
static inline void
assert_log_prob (double got, double want, double tol)
{
  double err = got == want ? 0.0 : fabs (got - want) / MAX (1.0, fabs (want));

  if (!(err <= tol))
    g_error ("ln p: got %.17g, want %.17g (error %.3g > %.3g)", got, want, err, tol);
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

/* Every number of r is finite, and one not defined says why: no NaN or inf leaves the
 * core. */
static inline void
assert_all_finite (const TfResults *r)
{
  for (guint k = 0; k < r->numbers->len; k++)
    {
      const TfNumber *num = g_ptr_array_index (r->numbers, k);

      if (!isfinite (num->value) || (num->status == TF_STATUS_UNDEFINED && num->reason == NULL))
        g_error ("result %s: %g, %s", num->id, num->value,
                 num->reason ? num->reason : "no reason");
    }
}
