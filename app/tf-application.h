/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-application.h: the Twofold application: one window per analysis.
 */
#pragma once

#include <adwaita.h>

G_BEGIN_DECLS

#define TF_TYPE_APPLICATION (tf_application_get_type ())
G_DECLARE_FINAL_TYPE (TfApplication, tf_application, TF, APPLICATION, AdwApplication)

TfApplication *tf_application_new (void);

G_END_DECLS
