/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-private.h: what the GUI tests look at inside a TfWindow.
 */
#pragma once

#include "tf-window.h"
#include "tf-analysis-form.h"
#include "tf-plot-view.h"
#include "tf-result-list.h"
#include "tf-explanation-pane.h"
#include "tf-figure.h"

G_BEGIN_DECLS

TfAnalysisForm *tf_window_get_form (TfWindow *self);
TfPlotView *tf_window_get_plot_view (TfWindow *self);
TfResultList *tf_window_get_result_list (TfWindow *self);
TfExplanationPane *tf_window_get_explanation_pane (TfWindow *self);
/* The analysis as the form last set it (possibly not valid). */
const TfAnalysis *tf_window_get_analysis (TfWindow *self);
/* "analysis" when results are shown, "invalid" when the form needs fixing. */
const char *tf_window_get_visible_page (TfWindow *self);
/* Whether the analysis was edited since it was last loaded or saved. */
gboolean tf_window_get_modified (TfWindow *self);
/* The subtitle under the title in the header bar. */
const char *tf_window_get_subtitle (TfWindow *self);
/* The "Save changes?" dialog while it is shown, else NULL. Its responses are "cancel",
 * "discard" and "save": adw_message_dialog_response() answers it as a click would. */
AdwMessageDialog *tf_window_get_save_changes_dialog (TfWindow *self);

/* Export figure…: after the file chooser, the dialog of the figure's size for file; its
 * responses are "cancel" and "export". NULL unless shown. */
void tf_window_show_export_options (TfWindow *self, GFile *file);
AdwMessageDialog *tf_window_get_export_dialog (TfWindow *self);
/* Whether win.export-figure is enabled (the plot has a figure to export). */
gboolean tf_window_get_export_enabled (TfWindow *self);
/* What the dialog's "export" does: writes the plot's figure kind to file (PNG, SVG or PDF
 * by its ending) with tf_figure_export_full(); on failure says why in a dialog naming
 * the file and returns FALSE. */
gboolean tf_window_export_figure (TfWindow *self, GFile *file, double width_mm,
                                  double height_mm, double dpi, const TfFigureOptions *options);

/* What Export Report…'s save dialog does: writes the report of the analysis shown to file
 * (PDF, HTML or Markdown by its ending; a name with no ending gets ".pdf"), says so in a
 * toast, or on failure says why in a dialog naming the file and returns FALSE. */
gboolean tf_window_export_report (TfWindow *self, GFile *file);
/* Whether win.export-report is enabled (the analysis can be computed). */
gboolean tf_window_get_export_report_enabled (TfWindow *self);

G_END_DECLS
