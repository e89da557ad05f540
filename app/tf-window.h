/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window.h: the Twofold window: the form, the figure, the numbers and what they mean.
 */
#pragma once

#include <adwaita.h>
#include "tf-analysis.h"

G_BEGIN_DECLS

#define TF_TYPE_WINDOW (tf_window_get_type ())
G_DECLARE_FINAL_TYPE (TfWindow, tf_window, TF, WINDOW, AdwApplicationWindow)

TfWindow *tf_window_new (GtkApplication *application);

/* Shows a copy of analysis; file is where it came from, or NULL. */
void tf_window_set_analysis (TfWindow *self, const TfAnalysis *analysis, GFile *file);
/* Loads a *.twofold file; on failure says why in a dialog and keeps what was shown. */
gboolean tf_window_open_file (TfWindow *self, GFile *file);
/* The demo analysis bundled with Twofold (or the defaults, should it be missing). */
void tf_window_open_demo (TfWindow *self);

G_END_DECLS
