/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-normal.c: the standard normal's tails in log space by GSL's log_erfc, whose
 * rational approximations (Cody 1969) keep every digit far into the tail.
 */
#include "tf-normal.h"

#include <math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_sf_erf.h>

double
tf_log_erfc (double x)
{
  gsl_sf_result r;
  if (gsl_sf_log_erfc_e (x, &r) != GSL_SUCCESS)
    return NAN;
  return r.val;
}

double
tf_log_half_erfc (double z)
{
  return tf_log_erfc (z) - G_LN2;
}

double
tf_log_normal_upper (double z)
{
  return tf_log_half_erfc (z / G_SQRT2);
}
