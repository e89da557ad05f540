/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-axis.h: plot areas, tick choice and axis drawing for Twofold's figures.
 * Cairo + PangoCairo only.
 */
#pragma once

#include <cairo.h>
#include "tf-figure-theme.h"

G_BEGIN_DECLS

/* Where the data go on the surface (user units) and which data range they show. */
struct _TfPlotArea {
  double x, y, width, height;
  double x_lo, x_hi;
  double y_lo, y_hi;
};

double tf_plot_area_map_x (const TfPlotArea *area, double value);
double tf_plot_area_map_y (const TfPlotArea *area, double value);

/* Ticks at first, first + step, ..., n of them, inside [lo, hi]. */
typedef struct {
  double lo, hi;                /* the axis range, extended to ticks when loose */
  double first;
  double step;
  guint n;
  int n_frac;                   /* digits after the decimal mark in labels */
} TfTicks;

/* Heckbert (1990), "Nice numbers for graph labels", Graphics Gems I: the nice number
 * (1, 2 or 5 times a power of ten) nearest x (round) or not below x (!round). */
double tf_nice_number (double x, gboolean round);

/* About target ticks over [lo, hi] by Heckbert's loose labelling. loose extends lo and hi
 * outwards to whole ticks; otherwise the range stays and only ticks inside it are kept. */
void tf_ticks_compute (TfTicks *ticks, double lo, double hi, guint target, gboolean loose);
double tf_ticks_value (const TfTicks *ticks, guint i);
/* Label with the ticks' digits; a true minus sign for negatives. Free with g_free. */
char *tf_ticks_label (const TfTicks *ticks, guint i);

/* How many ticks fit in length user units at one tick per spacing_pt points (2..10). */
guint tf_ticks_target (const TfFigureTheme *theme, double length, double spacing_pt);

/* Space the axes take outside the plot area, user units. */
double tf_axis_left_extent (cairo_t *cr, const TfFigureTheme *theme, const TfTicks *ticks,
                            const char *label_markup);
double tf_axis_bottom_extent (cairo_t *cr, const TfFigureTheme *theme,
                              const char *label_markup);

/* Draws a spine along the area's bottom (left) edge, outward ticks, tick labels and the
 * axis label (Pango markup; the left one reads upwards). */
void tf_axis_draw_bottom (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                          const TfTicks *ticks, const char *label_markup);
void tf_axis_draw_left (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                        const TfTicks *ticks, const char *label_markup);

G_END_DECLS
