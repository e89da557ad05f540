/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-hypergeometric.h: the hypergeometric distribution of a 2 × 2 table's first cell
 * given its margins, in log space, for margins up to 10^15.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* X = successes in group A given nA, nB trials and m successes in all: X is
 * hypergeometric on [lo, hi] = [max(0, m − nB), min(nA, m)]. */
typedef struct {
  double n_a, n_b, m;
  double lo, hi;
  double p, q;                  /* m / N and (N − m) / N, N = nA + nB */
  double mode;
  double sd;
} TfHyper;

void tf_hyper_init (TfHyper *h, double n_a, double n_b, double m);
/* ln P(X = x), x whole in [lo, hi]; -inf outside. */
double tf_hyper_log_pmf (const TfHyper *h, double x);
/* ln P(X <= x), ln P(X >= x). */
double tf_hyper_log_cdf (const TfHyper *h, double x);
double tf_hyper_log_sf (const TfHyper *h, double x);

/* For the two-sided test: the outcomes counted are those <= *low and >= *high (*low <
 * lo or *high > hi when a side has none). */
void tf_hyper_two_sided_bounds (const TfHyper *h, double k_a, double *low, double *high);

/* ln of the two-sided exact p-value of k_a by the minimum-likelihood rule, with
 * TF_EXACT_TEST_RELATIVE_TOLERANCE. */
double tf_hyper_log_exact_two_sided (const TfHyper *h, double k_a);

G_END_DECLS
