/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-means-class.h: the classes of the three means designs.
 */
#pragma once

#include "tf-design-class.h"

G_BEGIN_DECLS

extern const TfDesignClass tf_one_mean_class;
extern const TfDesignClass tf_paired_means_class;
extern const TfDesignClass tf_two_means_class;

G_END_DECLS
