/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-normal-test.c: the normal test's p-value in a direction, from the upper tail.
 */
#include "tf-normal-test.h"
#include "tf-normal.h"

#include <math.h>

double
tf_normal_test_log_p (double z, TfDirection direction)
{
  switch (direction)
    {
    case TF_DIRECTION_GREATER:
      return tf_log_normal_upper (z);
    case TF_DIRECTION_LESS:
      return tf_log_normal_upper (-z);
    case TF_DIRECTION_TWO_SIDED:
    default:
      return G_LN2 + tf_log_normal_upper (fabs (z));
    }
}
