/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-fisher.c: Fisher's exact test of a 2 × 2 table in every direction, on the
 * hypergeometric distribution of its first cell given the margins (Fisher 1935).
 */
#include "tf-fisher.h"

double
tf_fisher_log_p (const TfHyper *h, double k_a, TfDirection direction)
{
  if (h->lo == h->hi)
    return 0.0;
  switch (direction)
    {
    case TF_DIRECTION_GREATER:
      return tf_hyper_log_sf (h, k_a);
    case TF_DIRECTION_LESS:
      return tf_hyper_log_cdf (h, k_a);
    case TF_DIRECTION_TWO_SIDED:
    default:
      return tf_hyper_log_exact_two_sided (h, k_a);
    }
}
