/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-exact-test.h: the two-sided exact test by the minimum-likelihood rule (Sterne
 * 1954), for any discrete distribution that rises to its mode and falls after it
 * (binomial, Poisson, hypergeometric): the outcomes counted are those no more likely
 * than the observed one.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* The rule's relative tolerance: an outcome counts as no more likely than the observed
 * one when its probability is at most 1 + 1e-7 times the observed one's, so that ties
 * lost to rounding still count (common practice: R's binom.test, poisson.test and
 * fisher.test, and scipy.stats.binomtest use 1e-7). */
#define TF_EXACT_TEST_RELATIVE_TOLERANCE 1e-7

/* ln P(X = j) for a whole j; data is the distribution's parameters. */
typedef double (*TfExactTestLogPmf) (double j, const void *data);

/* ln of the largest probability counted, for an observed outcome of ln probability
 * log_pmf_observed: log_pmf_observed + ln(1 + TF_EXACT_TEST_RELATIVE_TOLERANCE). */
double tf_exact_test_log_threshold (double log_pmf_observed);

/* The end of the counted tail on the far side of the mode from the observed outcome,
 * by bisection over whole numbers on ln P, which is monotone there; ld is
 * tf_exact_test_log_threshold() of the observed outcome.
 * end > start (the far side is above the mode): the smallest whole j in [start, end]
 * with log_pmf (j) <= ld, ln P decreasing on [start, end); start is the first whole
 * number at or above the mode, end one past the last outcome of the support (returned
 * when none qualifies), or INFINITY for an unbounded support, which is then bracketed
 * from start by steps that begin at MAX (1, floor (spread)) and double.
 * end < start (the far side is below the mode): the largest whole j in [end, start]
 * with log_pmf (j) <= ld, ln P increasing on (end, start]; start is the last whole
 * number at or below the mode, end one before the first outcome (returned when none
 * qualifies).
 * Every loop is bounded (TF_EXACT_TEST_MAX_STEPS), which no bracket of doubles
 * reaches. */
double tf_exact_test_far_end (TfExactTestLogPmf log_pmf, const void *data, double ld,
                              double start, double end, double spread);

G_END_DECLS
