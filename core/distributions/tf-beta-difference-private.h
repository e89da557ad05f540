/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-beta-difference-private.h: the two integrators behind tf-beta-difference.h.
 */
#pragma once

#include "tf-beta-difference.h"

G_BEGIN_DECLS

typedef enum { TF_BD_LOWER, TF_BD_UPPER, TF_BD_DENSITY } TfBdKind;

/* ln P(Δ <= d), ln P(Δ >= d) or ln f_Δ(d), d in (−1, 1), by the adaptive piecewise
 * integration (tf-beta-difference-pieces.c); *ok FALSE when it did not converge. */
double tf_beta_diff_pieces (TfBetaDiff *bd, double d, TfBdKind kind, gboolean *ok);

/* The same by the fixed rule over θA (over_a) or θB (tf-beta-difference-line.c): the
 * trapezoidal rule on the line; FALSE when it does not settle there. */
gboolean tf_beta_diff_line (const TfBetaDiff *bd, gboolean over_a, double d, TfBdKind kind,
                            double *result);

G_END_DECLS
