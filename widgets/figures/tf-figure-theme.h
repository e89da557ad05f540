/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-theme.h: colours, line styles and text sizes shared by Twofold's figures.
 * Cairo + PangoCairo only. All sizes are in points and multiplied by the theme's scale
 * (user units per point) when drawn.
 */
#pragma once

#include <cairo.h>
#include <pango/pangocairo.h>
#include "tf-figure.h"

G_BEGIN_DECLS

typedef struct {
  double r, g, b, a;
} TfColour;

typedef enum {
  TF_SERIES_PRIOR,
  TF_SERIES_POSTERIOR,
  TF_SERIES_LIKELIHOOD,
  TF_SERIES_NULL,
  TF_SERIES_EVIDENCE,           /* BF and P(null | data) curves */
  TF_SERIES_TAIL,               /* the outcomes counted in a p-value */
  TF_N_SERIES
} TfSeries;

/* Marker shapes, drawn along lines in the print style so that series differ by more
 * than their grey and dash. */
typedef enum {
  TF_MARKER_NONE,
  TF_MARKER_CIRCLE,
  TF_MARKER_SQUARE,
  TF_MARKER_TRIANGLE,
  TF_MARKER_DIAMOND
} TfMarker;

typedef struct {
  TfFigureStyle style;
  double scale;                 /* user units per point */
  TfColour background;
  TfColour foreground;          /* text, axes */
  TfColour muted;               /* secondary text */
  TfColour reference;           /* quiet reference lines and their labels */
  TfColour series[TF_N_SERIES];
  const char *font_family;
  double text_size;             /* pt: tick labels, legend */
  double label_size;            /* pt: axis labels */
  double axis_width;            /* pt */
  double tick_length;           /* pt */
} TfFigureTheme;

void tf_figure_theme_init (TfFigureTheme *theme, TfFigureStyle style, double scale);

/* A figure smaller than about 75 × 55 mm (width and height in user units) sets its text
 * at 7 pt and its axis labels at 7.5 pt, the smallest sizes journals usually ask for, so
 * that labels leave the data room. */
void tf_figure_theme_fit (TfFigureTheme *theme, double width, double height);

/* Points to user units. */
static inline double
tf_figure_theme_pt (const TfFigureTheme *theme, double points)
{
  return points * theme->scale;
}

void tf_figure_theme_set_source (cairo_t *cr, const TfColour *colour);
void tf_figure_theme_set_source_alpha (cairo_t *cr, const TfColour *colour, double alpha);

/* Sets colour, width, dash pattern and caps of one series' line. */
void tf_figure_theme_set_series_line (cairo_t *cr, const TfFigureTheme *theme, TfSeries series);

/* Fills the current path with fill and strokes it with a solid line of the series,
 * line_pt wide (a marker); clears the path. */
void tf_figure_theme_fill_ringed (cairo_t *cr, const TfFigureTheme *theme, TfSeries series,
                                  const TfColour *fill, double line_pt);

/* The marker of a series in this style (TF_MARKER_NONE unless the style is print). */
TfMarker tf_figure_theme_series_marker (const TfFigureTheme *theme, TfSeries series);
/* Draws the series' marker centred at x, y (user units), solid line, filled with the
 * background so that it reads over the line. */
void tf_figure_theme_draw_marker (cairo_t *cr, const TfFigureTheme *theme, TfSeries series,
                                  double x, double y);

/* Fills the current path with the series' colour at alpha and diagonal hatching over it
 * (so that a shaded area reads without its colour); clears the path. */
void tf_figure_theme_fill_hatched (cairo_t *cr, const TfFigureTheme *theme, TfSeries series,
                                   double alpha);

/* A layout for Pango markup at size_pt points in the theme's font. */
PangoLayout *tf_figure_theme_layout (cairo_t *cr, const TfFigureTheme *theme,
                                     double size_pt, const char *markup);
/* Logical size of a layout, in user units. */
void tf_figure_layout_size (PangoLayout *layout, double *width, double *height);

G_END_DECLS
