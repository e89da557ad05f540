/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-form-field.c: the choices that the form fields of several designs share.
 */
#include "tf-form-field-private.h"

const int tf_form_direction_values[] = {
  TF_DIRECTION_TWO_SIDED, TF_DIRECTION_GREATER, TF_DIRECTION_LESS,
};

const char *const tf_form_effect_prior_labels[] = { N_("Cauchy (JZS)"), N_("Normal"), NULL };
const int tf_form_effect_prior_values[] = { TF_PRIOR_CAUCHY, TF_PRIOR_NORMAL };
