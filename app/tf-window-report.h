/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-report.h: the window's Export Report… action (win.export-report), private to
 * the window's files: a save dialog, then tf_report_export() of the analysis shown, in
 * the format the file name's ending names (.pdf, .html, .md).
 */
#pragma once

#include "tf-window-fields.h"

G_BEGIN_DECLS

/* tf-window.c calls this from its class_init. */
void tf_window_report_class_init (GtkWidgetClass *widget_class);
/* Enables Export Report… when the analysis can be computed (after each recompute). */
void tf_window_report_update (TfWindow *self);

/* What the save dialog's Export does: writes the report of the analysis shown to file
 * (PDF, HTML or Markdown by its ending; a name with no ending gets ".pdf"), says so in a
 * toast, or on failure says why in a dialog naming the file and returns FALSE. */
gboolean tf_window_report_export (TfWindow *self, GFile *file);

G_END_DECLS
