/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-report.h: the window's Export Report… action (win.export-report): a save
 * dialog, then tf_report_export() of the analysis shown, in the format the file name's
 * ending names (.pdf, .html, .md).
 */
#pragma once

#include "tf-window.h"

G_BEGIN_DECLS

/* tf-window-actions.c calls these from its class_init and update. */
void tf_window_report_class_init (GtkWidgetClass *widget_class);
void tf_window_report_update (TfWindow *self);

/* What the save dialog's Export does: writes the report of the analysis shown to file
 * (PDF, HTML or Markdown by its ending; a name with no ending gets ".pdf"), says so in a
 * toast, or on failure says why in a dialog naming the file and returns FALSE. */
gboolean tf_window_export_report (TfWindow *self, GFile *file);
/* Whether win.export-report is enabled (the analysis can be computed). */
gboolean tf_window_get_export_report_enabled (TfWindow *self);

G_END_DECLS
