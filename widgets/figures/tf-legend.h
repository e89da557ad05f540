/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-legend.h: figure legends, placed where they hide no data. Cairo + PangoCairo only.
 */
#pragma once

#include <cairo.h>
#include "tf-axis.h"

G_BEGIN_DECLS

typedef enum {
  TF_SWATCH_LINE,               /* a sample of the series' line (and its print marker) */
  TF_SWATCH_FILLED,             /* a solid box */
  TF_SWATCH_OUTLINE,            /* an empty box */
  TF_SWATCH_HATCHED             /* a light box with hatching: a shaded area */
} TfSwatch;

typedef struct {
  TfSeries series;
  const char *markup;           /* Pango markup */
  TfSwatch swatch;
} TfLegendEntry;

/* A polyline in user units: the data a legend must not cover. */
typedef struct {
  const double *x;
  const double *y;
  guint n;
} TfPolyline;

/* Size of the legend box, user units. The entries are laid out row by row in columns
 * columns: 1 stacks them, n_entries puts them in one row. */
void tf_legend_measure (cairo_t *cr, const TfFigureTheme *theme, const TfLegendEntry *entries,
                        guint n_entries, guint columns, double *width, double *height);

/* The most columns (one row: n_entries) in which the legend is at most max_width wide;
 * 1 when none is. */
guint tf_legend_fit_columns (cairo_t *cr, const TfFigureTheme *theme,
                             const TfLegendEntry *entries, guint n_entries, double max_width);

/* Finds a place for a width × height box inside area, inset from its edges, that no
 * polyline crosses: the top corners first, then along the top, then lower down.
 * Returns FALSE when every place hides some data. */
gboolean tf_legend_place (const TfPlotArea *area, double width, double height, double inset,
                          const TfPolyline *lines, guint n_lines, double *x, double *y);

/* TRUE when no polyline enters the box (user units): a place for a label. */
gboolean tf_legend_box_is_clear (const TfPolyline *lines, guint n_lines, double left,
                                 double top, double right, double bottom);

void tf_legend_draw (cairo_t *cr, const TfFigureTheme *theme, const TfLegendEntry *entries,
                     guint n_entries, guint columns, double x, double y);

G_END_DECLS
