/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-fisher.h: Fisher's exact test of a 2 × 2 table, for margins up to 10^15.
 */
#pragma once

#include <glib.h>
#include "tf-analysis.h"
#include "tf-hypergeometric.h"

G_BEGIN_DECLS

/* ln of Fisher's exact p-value for kA: two-sided by the minimum-likelihood rule with
 * TF_EXACT_TEST_RELATIVE_TOLERANCE, or one-sided (greater: large kA, that
 * is θA > θB). */
double tf_fisher_log_p (const TfHyper *h, double k_a, TfDirection direction);

G_END_DECLS
