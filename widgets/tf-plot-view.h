/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-plot-view.h: a widget showing the densities figure of an analysis.
 */
#pragma once

#include <gtk/gtk.h>
#include "tf-analysis.h"

G_BEGIN_DECLS

#define TF_TYPE_PLOT_VIEW (tf_plot_view_get_type ())
G_DECLARE_FINAL_TYPE (TfPlotView, tf_plot_view, TF, PLOT_VIEW, GtkWidget)

GtkWidget *tf_plot_view_new (void);

/* Draws this analysis (copied), or nothing when analysis is NULL. */
void tf_plot_view_set_analysis (TfPlotView *self, const TfAnalysis *analysis);
const TfAnalysis *tf_plot_view_get_analysis (TfPlotView *self);

G_END_DECLS
