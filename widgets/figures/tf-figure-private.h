/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-private.h: drawing pieces the figure kinds share, and the table of figure
 * kinds (the figure library only).
 */
#pragma once

#include <pango/pangocairo.h>
#include "tf-figure.h"
#include "tf-axis.h"
#include "tf-figure-theme.h"
#include "tf-legend.h"

G_BEGIN_DECLS

#define TF_FIG_PAD_PT 6.0              /* between the figure's edge and anything drawn */
#define TF_FIG_X_TICK_SPACING_PT 54.0
#define TF_FIG_Y_TICK_SPACING_PT 30.0

/* A polyline in user units. */
typedef struct {
  double *x;
  double *y;
  guint n;
} TfFigPoints;

void tf_fig_points_clear (TfFigPoints *p);
/* Data (x, y) mapped into area; non-finite y become NAN (a gap in the line); values off
 * the top or bottom are held at the edge when clamp is TRUE. */
void tf_fig_points_map (const TfPlotArea *area, const double *x, const double *y, guint n,
                        gboolean clamp, TfFigPoints *out);
/* Strokes a polyline in the series' style, broken at NAN; in print style, markers along
 * it every ~40 pt. */
void tf_fig_stroke_series (cairo_t *cr, const TfFigureTheme *theme, TfSeries series,
                           const TfFigPoints *p);

const TfFigureOptions *tf_fig_options (const TfFigureOptions *options);
void tf_fig_message (cairo_t *cr, const TfFigureTheme *theme, double width, double height,
                     const char *title, const char *reason);
/* Starts a figure: the theme of style at scale, fitted to the size; cairo's state saved
 * (the figure restores it when done); the background filled. */
void tf_fig_start (cairo_t *cr, TfFigureTheme *theme, TfFigureStyle style, double scale,
                   double width, double height);
/* Ends a figure started that has nothing to draw: the reason in its place, cairo's state
 * restored. Returns FALSE (nothing drawn). */
gboolean tf_fig_nothing (cairo_t *cr, const TfFigureTheme *theme, double width,
                         double height, const char *reason);
/* The left edge of a label label_width wide above the area, centred on column x, right
 * of the y axis's labels (the area's left edge) and inside the figure: the null's name,
 * the observed value, the chosen setting. */
double tf_fig_label_x (double x, double label_width, const TfPlotArea *area, double width,
                       double pad);
/* The left edge of a box centred over the plot area, inside the figure (a legend above). */
double tf_fig_centred_over (const TfPlotArea *area, double box_width, double width,
                            double pad);

/* Height of one line of markup at size points, user units. */
double tf_fig_text_height (cairo_t *cr, const TfFigureTheme *theme, double size,
                           const char *markup);
double tf_fig_text_width (cairo_t *cr, const TfFigureTheme *theme, double size,
                          const char *markup);
/* Text, top-left at x, y (outside the plot area, where nothing needs a halo). */
void tf_fig_text (cairo_t *cr, const TfFigureTheme *theme, const TfColour *colour,
                  double size, const char *markup, double x, double y);
/* Text with a halo of the background colour (legible over lines), top-left at x, y. */
void tf_fig_text_halo (cairo_t *cr, const TfFigureTheme *theme, const TfColour *colour,
                       double size, const char *markup, double x, double y);
/* An arrow from (x0, y0) to (x1, y1), head at the end. */
void tf_fig_arrow (cairo_t *cr, const TfFigureTheme *theme, const TfColour *colour,
                   double x0, double y0, double x1, double y1);
/* A round marker at data (x, y); filled (2.2 pt) or open (3.4 pt, background inside,
 * so that it rings a filled one at the same height). */
void tf_fig_marker (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                    TfSeries series, double x_value, double y_value, gboolean filled);
/* A vertical line from the base to the top of the area ending in an arrow head: a point
 * mass, or a curve that goes on up. */
void tf_fig_spike (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                   TfSeries series, double x_value);

/* A number for a figure: digits significant figures, a true minus sign, and
 * a × 10<sup>k</sup> exponent outside 10^-4 .. 10^6. Free with g_free. */
char *tf_fig_number (double value, int digits);
/* Pango markup for 10 to the nearest whole power: "10<sup>563</sup>", "10<sup>−8</sup>". */
char *tf_fig_power_of_ten (double decades);

/* One plot area with a bottom and a left axis: margins first, then ticks that fit. The
 * x axis is tight to [x_lo, x_hi] (log10 when x_log), the y axis loose from y_lo. */
typedef struct {
  TfPlotArea area;
  TfTicks x_ticks;
  TfTicks y_ticks;
} TfFigLayout;

/* Ticks along an x axis tight to [lo, hi] (log10 when log_axis), about target of them. */
void tf_fig_x_ticks (TfTicks *ticks, double lo, double hi, gboolean log_axis, guint target);
void tf_fig_layout_single (cairo_t *cr, const TfFigureTheme *theme, double width, double height,
                           double top_extra, double right_extra, const char *x_label,
                           const char *y_label, double x_lo, double x_hi, gboolean x_log,
                           double y_lo, double y_hi, TfFigLayout *out);

/* The published grades of a Bayes factor on the log10 BF01 axis of area: the lines, the
 * line of 1, their names right of the area; and the width their names take there. */
void tf_fig_grades_draw (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                         TfEvidenceScale scale);
double tf_fig_grades_width (cairo_t *cr, const TfFigureTheme *theme, TfEvidenceScale scale);

/* The sensitivity (sample_size FALSE) or sample-size figure, with both panels' areas. */
gboolean tf_fig_draw_evidence (cairo_t *cr, double width, double height, double scale,
                               const TfEvidenceCurve *curve, const TfFigureOptions *options,
                               gboolean sample_size, TfFigurePanels *panels_out);

/* The crosshair readout's pieces: the index of the grid point nearest x in an increasing
 * grid, and one value read, with where it is drawn in area (y a coordinate of its axis). */
guint tf_fig_nearest (const double *grid, guint n, double x);
void tf_fig_reading_add (TfFigureReading *reading, const TfPlotArea *area, const char *name,
                         double value, double y);

/* One figure kind. tf-figure-kinds.c holds the table of them, in TfFigureKind order;
 * TfFigure and every kind's name and label read it. The curves are the kind's own
 * (compute makes them, free frees them, draw and read take them as they are). */
typedef struct {
  const char *name;             /* as `twofold-cli figure --kind` takes it: "sample-size" */
  const char *label;            /* for people, untranslated (N_()) */
  /* The curves of analysis (results: its results computed already, or NULL); NULL when
   * the kind does not apply, with *reason set or problems filled. */
  gpointer (*compute) (const TfAnalysis *analysis, const TfResults *results,
                       GPtrArray *problems, char **reason);
  GDestroyNotify free;
  /* Draws the curves, each panel's area into panels (one panel: area[0], n left 0). */
  gboolean (*draw) (cairo_t *cr, double width, double height, double scale,
                    gconstpointer curves, const TfFigureOptions *options,
                    TfFigurePanels *panels);
  /* The crosshair readout at x (the data value) in area, with reading->x and ->panel set;
   * NULL for a kind with no x to read. */
  gboolean (*read) (gconstpointer curves, const TfPlotArea *area, double x,
                    TfFigureReading *reading);
} TfFigKind;

const TfFigKind *tf_fig_kind (TfFigureKind kind);

/* Each kind's entries of the table. */
gpointer tf_fig_densities_compute (const TfAnalysis *analysis, const TfResults *results,
                                   GPtrArray *problems, char **reason);
void tf_fig_densities_free (gpointer curves);
gboolean tf_fig_densities_draw (cairo_t *cr, double width, double height, double scale,
                                gconstpointer curves, const TfFigureOptions *options,
                                TfFigurePanels *panels);
gboolean tf_fig_densities_read (gconstpointer curves, const TfPlotArea *area, double x,
                                TfFigureReading *reading);

gpointer tf_fig_sensitivity_compute (const TfAnalysis *analysis, const TfResults *results,
                                     GPtrArray *problems, char **reason);
gpointer tf_fig_sample_size_compute (const TfAnalysis *analysis, const TfResults *results,
                                     GPtrArray *problems, char **reason);
gboolean tf_fig_sensitivity_draw (cairo_t *cr, double width, double height, double scale,
                                  gconstpointer curves, const TfFigureOptions *options,
                                  TfFigurePanels *panels);
gboolean tf_fig_sample_size_draw (cairo_t *cr, double width, double height, double scale,
                                  gconstpointer curves, const TfFigureOptions *options,
                                  TfFigurePanels *panels);
gboolean tf_fig_evidence_read (gconstpointer curves, const TfPlotArea *area, double x,
                               TfFigureReading *reading);

gpointer tf_fig_null_compute (const TfAnalysis *analysis, const TfResults *results,
                              GPtrArray *problems, char **reason);
gboolean tf_fig_null_draw (cairo_t *cr, double width, double height, double scale,
                           gconstpointer curves, const TfFigureOptions *options,
                           TfFigurePanels *panels);
gboolean tf_fig_null_read (gconstpointer curves, const TfPlotArea *area, double x,
                           TfFigureReading *reading);

gpointer tf_fig_models_compute (const TfAnalysis *analysis, const TfResults *results,
                                GPtrArray *problems, char **reason);
gboolean tf_fig_models_draw (cairo_t *cr, double width, double height, double scale,
                             gconstpointer curves, const TfFigureOptions *options,
                             TfFigurePanels *panels);

G_END_DECLS
