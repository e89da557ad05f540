/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-axis.h: plot areas, tick choice and axis drawing for Twofold's figures.
 * Cairo + PangoCairo only.
 */
#pragma once

#include <cairo.h>
#include "tf-figure-theme.h"

G_BEGIN_DECLS

/* Where the data go on the surface (user units) and which data range they show. On a
 * log axis (x_log, y_log) the range and the values mapped are log10 of the data. */
struct _TfPlotArea {
  double x, y, width, height;
  double x_lo, x_hi;
  double y_lo, y_hi;
  gboolean x_log, y_log;
  guint panel;                  /* which of the figure's panels, 0 the top one */
};

/* Every plot area of one figure, top to bottom: one, or two sharing x (the sensitivity
 * and sample-size figures: the Bayes factor above P(H0 | data)). */
#define TF_FIGURE_PANELS_MAX 2
struct _TfFigurePanels {
  guint n;
  TfPlotArea area[TF_FIGURE_PANELS_MAX];
};

/* The panel at (x, y), user units: the one whose height holds y, the nearer one in a gap
 * between two, the lowest one below them all (over its x axis). NULL above the top one
 * and left or right of the plot areas. */
const TfPlotArea *tf_figure_panels_at (const TfFigurePanels *panels, double x, double y);

/* The data value at user-unit column x (10^coordinate on a log axis). */
double tf_plot_area_unmap_x (const TfPlotArea *area, double x);

double tf_plot_area_map_x (const TfPlotArea *area, double value);
double tf_plot_area_map_y (const TfPlotArea *area, double value);

/* Ticks at first, first + step, ..., n of them, inside [lo, hi]. */
typedef struct {
  double lo, hi;                /* the axis range, extended to ticks when loose */
  double first;
  double step;
  guint n;
  int n_frac;                   /* digits after the decimal mark in labels */
  gboolean log;                 /* decades: lo, hi, first and step are log10 */
  gboolean minor;               /* log: minor ticks at 2..9 times each decade */
} TfTicks;

/* Heckbert (1990), "Nice numbers for graph labels", Graphics Gems I: the nice number
 * (1, 2 or 5 times a power of ten) nearest x (round) or not below x (!round). */
double tf_nice_number (double x, gboolean round);

/* About target ticks over [lo, hi] by Heckbert's loose labelling. loose extends lo and hi
 * outwards to whole ticks; otherwise the range stays and only ticks inside it are kept. */
void tf_ticks_compute (TfTicks *ticks, double lo, double hi, guint target, gboolean loose);
/* Decade ticks over [lo10, hi10] (log10 of the data), about target of them: every
 * decade, or every 2, 5, 10, ... decades (Heckbert's nice numbers on the exponent),
 * with minor ticks when every decade is labelled and the span is short. loose extends
 * the range to whole labelled decades. */
void tf_ticks_compute_log (TfTicks *ticks, double lo10, double hi10, guint target,
                           gboolean loose);
/* The i-th tick's coordinate (log10 of the value on a log axis). */
double tf_ticks_value (const TfTicks *ticks, guint i);
/* Label with the ticks' digits; a true minus sign for negatives; on a log axis plain
 * numbers from 0.001 to 1000 and 10<sup>k</sup> beyond (Pango markup). Free with g_free. */
char *tf_ticks_label (const TfTicks *ticks, guint i);

/* How many ticks fit in length user units at one tick per spacing_pt points (2..10). */
guint tf_ticks_target (const TfFigureTheme *theme, double length, double spacing_pt);

/* The width of the widest of the ticks' labels, user units. */
double tf_axis_widest_tick_label (cairo_t *cr, const TfFigureTheme *theme,
                                  const TfTicks *ticks);

/* Space the axes take outside the plot area, user units. */
double tf_axis_left_extent (cairo_t *cr, const TfFigureTheme *theme, const TfTicks *ticks,
                            const char *label_markup);
double tf_axis_bottom_extent (cairo_t *cr, const TfFigureTheme *theme,
                              const char *label_markup);
/* The same for these ticks (their labels may carry superscripts); ticks may be NULL
 * for an axis with no tick labels. */
double tf_axis_bottom_extent_ticks (cairo_t *cr, const TfFigureTheme *theme,
                                    const TfTicks *ticks, const char *label_markup);

/* Draws a spine along the area's bottom (left) edge, outward ticks, tick labels and the
 * axis label (Pango markup; the left one reads upwards). */
void tf_axis_draw_bottom (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                          const TfTicks *ticks, const char *label_markup);
void tf_axis_draw_left (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                        const TfTicks *ticks, const char *label_markup);
/* A bottom axis with ticks but no labels (the upper panel of two sharing x). */
void tf_axis_draw_bottom_bare (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                               const TfTicks *ticks);

G_END_DECLS
