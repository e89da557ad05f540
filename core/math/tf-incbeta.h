/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-incbeta.h: the regularised incomplete beta function and its inverse, accurate
 * for shape parameters from 1e-3 to 1e13 and tails down to 1e-300.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

/* ln I_x(a, b) (lower) and ln(1 − I_x(a, b)) (upper). x in [0, 1], y = 1 − x given
 * separately. Returns -inf for a probability of exactly 0. */
double tf_incbeta_log_lower (double x, double y, double a, double b);
double tf_incbeta_log_upper (double x, double y, double a, double b);

/* Both of the above in one call. */
void tf_incbeta_log_both (double x, double y, double a, double b, double *log_lower,
                          double *log_upper);

/* I_x(a, b) and its complement, plain. */
double tf_incbeta_lower (double x, double y, double a, double b);
double tf_incbeta_upper (double x, double y, double a, double b);

/* One pair of shapes, prepared once for many evaluations or inversions at (a, b): the
 * Stirling corrections, ln B(a, b) and the coefficients of Temme's expansion are
 * computed once (the last two when first needed). A plain struct on the stack; its
 * fields are private to tf-incbeta*.c. */
#define TF_INCBETA_TEMME_TERMS 20
typedef struct {
  double a, b;
  /* each NAN until first needed */
  double stirling;      /* δ(a) + δ(b) − δ(a + b), δ the Stirling remainder */
  double half_log;      /* ½ ln(ab / 2π(a + b)) */
  double log_beta;      /* ln B(a, b) */
  /* Temme's coefficients for (a, b) [0] and for (b, a) [1], up to term temme_done */
  int temme_done[2];
  double temme_hs[2], temme_hn[2];
  double temme_a[2][TF_INCBETA_TEMME_TERMS + 2], temme_c[2][TF_INCBETA_TEMME_TERMS + 2];
  double temme_d[2][TF_INCBETA_TEMME_TERMS + 2];
} TfIncbetaShape;

void tf_incbeta_shape_init (TfIncbetaShape *shape, double a, double b);

/* ln I_x(a, b), ln(1 − I_x(a, b)) and, when log_prefactor is not NULL,
 * ln[x^a y^b / B(a, b)] (so that the density is that over x y). */
void tf_incbeta_shape_log_both (TfIncbetaShape *shape, double x, double y, double *log_lower,
                                double *log_upper, double *log_prefactor);

/* The x with ln I_x(a, b) = log_p (lower TRUE) or ln(1 − I_x(a, b)) = log_p. */
double tf_incbeta_shape_inverse_log (TfIncbetaShape *shape, double log_p, gboolean lower);

/* The x with I_x(a, b) = p (lower TRUE) or 1 − I_x(a, b) = p (lower FALSE), p in (0, 1). */
double tf_incbeta_inverse (double p, double a, double b, gboolean lower);
/* The same given ln p, so that p below the smallest double still has an inverse. */
double tf_incbeta_inverse_log (double log_p, double a, double b, gboolean lower);

G_END_DECLS
