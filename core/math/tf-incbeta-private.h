/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-incbeta-private.h: pieces of the incomplete beta shared with its inverse and tests.
 */
#pragma once

#include "tf-incbeta.h"

#include <glib.h>

G_BEGIN_DECLS

/* λ = a − (a + b) x, exact for the smaller of x and y = 1 − x. */
double tf_incbeta_lambda (double a, double b, double x, double y);

/* ln[x^a y^b / B(a, b)] in deviance form, given λ. */
double tf_incbeta_log_prefactor (double a, double b, double x, double y, double lambda);

/* ln B(a, b) of the shape, computed once. */
double tf_incbeta_shape_log_beta (TfIncbetaShape *shape);

G_END_DECLS
