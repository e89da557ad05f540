/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure.h: figures drawn with Cairo and PangoCairo on any cairo_t (screen, PNG,
 * SVG, PDF). No GTK here: twofold-cli and the tests draw with no display.
 */
#pragma once

#include <cairo.h>
#include "tf-analysis.h"
#include "tf-results.h"

G_BEGIN_DECLS

typedef enum {
  TF_FIGURE_STYLE_LIGHT,
  TF_FIGURE_STYLE_DARK
} TfFigureStyle;

/* Where a figure put its data (see tf-axis.h). */
typedef struct _TfPlotArea TfPlotArea;

/* Draws the densities figure (prior and posterior under the alternative, the null
 * marked) in a box width × height in cairo user units, where one unit is one point
 * (1/72 in) times scale: pass scale = 1 for PDF/SVG in points, and for a screen or
 * PNG the pixels per point. Returns FALSE and draws a message when the analysis is
 * not valid. */
gboolean tf_figure_draw_densities (cairo_t *cr, double width, double height, double scale,
                                   const TfAnalysis *analysis, TfFigureStyle style);

/* The same, and when area is not NULL and the figure was drawn, where its data went:
 * the plot area in user units and the data ranges of its axes. */
gboolean tf_figure_draw_densities_full (cairo_t *cr, double width, double height, double scale,
                                        const TfAnalysis *analysis, TfFigureStyle style,
                                        TfPlotArea *area);

G_END_DECLS
