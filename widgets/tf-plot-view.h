/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-plot-view.h: a widget showing one figure kind of an analysis, a chooser of the kind
 * above it, and a crosshair readout of the curves under the pointer.
 */
#pragma once

#include <gtk/gtk.h>
#include "tf-analysis.h"
#include "tf-figure.h"

G_BEGIN_DECLS

#define TF_TYPE_PLOT_VIEW (tf_plot_view_get_type ())
G_DECLARE_FINAL_TYPE (TfPlotView, tf_plot_view, TF, PLOT_VIEW, GtkWidget)

GtkWidget *tf_plot_view_new (void);

/* Draws this analysis (copied), or nothing when analysis is NULL. The figure's curves are
 * computed here, once: redraws (a resize, the dark style) reuse them. results, when not
 * NULL, are the analysis's, computed already: the figures read them rather than compute
 * them again. They are borrowed: the caller keeps them until the next call. */
void tf_plot_view_set_analysis (TfPlotView *self, const TfAnalysis *analysis,
                                const TfResults *results);
const TfAnalysis *tf_plot_view_get_analysis (TfPlotView *self);

/* The figure kind shown (the "kind" property, a TfFigureKind); setting it recomputes the
 * curves of that kind only. */
void tf_plot_view_set_kind (TfPlotView *self, TfFigureKind kind);
TfFigureKind tf_plot_view_get_kind (TfPlotView *self);

/* The figure shown, or NULL when there is no analysis or the kind does not apply. */
const TfFigure *tf_plot_view_get_figure (TfPlotView *self);
/* Why the kind does not apply (shown in the plot), or NULL. */
const char *tf_plot_view_get_why_not (TfPlotView *self);

/* The crosshair readout while it is shown (Pango markup of tf_figure_reading_markup()),
 * else NULL; and the plain text the plot's accessible description then carries. */
const char *tf_plot_view_get_readout_markup (TfPlotView *self);
const char *tf_plot_view_get_description (TfPlotView *self);

/* For the tests. The pointer at x, y in the plot's coordinates, as a motion event would
 * put it (NAN: the pointer left). The plot area of the last drawing (the top panel's),
 * and all its panels: FALSE when the figure has not been drawn at the current size yet. How many times curves were
 * computed since the view was made. */
void tf_plot_view_set_pointer_for_test (TfPlotView *self, double x, double y);
gboolean tf_plot_view_get_plot_area_for_test (TfPlotView *self, TfPlotArea *area);
gboolean tf_plot_view_get_panels_for_test (TfPlotView *self, TfFigurePanels *panels);
guint tf_plot_view_get_n_computed_for_test (TfPlotView *self);
GtkWidget *tf_plot_view_get_kind_chooser_for_test (TfPlotView *self);

G_END_DECLS
