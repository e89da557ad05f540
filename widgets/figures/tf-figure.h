/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure.h: figures drawn with Cairo and PangoCairo on any cairo_t (screen, PNG,
 * SVG, PDF). No GTK here: twofold-cli and the tests draw with no display.
 *
 * Every drawing function draws in a box width × height in cairo user units, where one
 * unit is one point (1/72 in) times scale: pass scale = 1 for PDF/SVG in points, and
 * for a screen or PNG the pixels per point. Text sizes and line widths are in points, so
 * a figure 85 mm wide has 8-9 pt text whatever the resolution.
 */
#pragma once

#include <cairo.h>
#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-results.h"

G_BEGIN_DECLS

typedef enum {
  TF_FIGURE_STYLE_LIGHT,
  TF_FIGURE_STYLE_DARK,
  TF_FIGURE_STYLE_PRINT         /* greyscale; series differ by dash and marker */
} TfFigureStyle;

/* Published grades of a Bayes factor, drawn as quiet reference lines. */
typedef enum {
  TF_EVIDENCE_SCALE_KASS_RAFTERY,   /* Kass & Raftery (1995), section 3.2 */
  TF_EVIDENCE_SCALE_JEFFREYS,       /* Jeffreys (1961), Appendix B */
  TF_EVIDENCE_SCALE_NONE
} TfEvidenceScale;

/* The figure kinds of DEVELOPERS.md, in that order. */
typedef enum {
  TF_FIGURE_DENSITIES,
  TF_FIGURE_SENSITIVITY,
  TF_FIGURE_SAMPLE_SIZE,
  TF_FIGURE_NULL_DISTRIBUTION,
  TF_FIGURE_MODEL_PROBABILITIES,
  TF_N_FIGURE_KINDS
} TfFigureKind;

typedef struct {
  TfFigureStyle style;
  TfEvidenceScale evidence_scale;
} TfFigureOptions;

#define TF_FIGURE_OPTIONS_INIT { TF_FIGURE_STYLE_LIGHT, TF_EVIDENCE_SCALE_KASS_RAFTERY }

/* Where a figure put its data (see tf-axis.h): one plot area, and all of a figure's. */
typedef struct _TfPlotArea TfPlotArea;
typedef struct _TfFigurePanels TfFigurePanels;

const char *tf_figure_kind_to_string (TfFigureKind kind);      /* "sample-size" */
gboolean tf_figure_kind_from_string (const char *name, TfFigureKind *kind);
const char *tf_figure_kind_label (TfFigureKind kind);          /* translated: "Model probabilities" */
/* Every kind's name, for people: "densities, sensitivity, … or model-probabilities". */
char *tf_figure_kind_names (void);
gboolean tf_figure_style_from_string (const char *name, TfFigureStyle *style); /* light|dark|print */
gboolean tf_evidence_scale_from_string (const char *name, TfEvidenceScale *scale); /* kass-raftery|jeffreys|none */

/* One figure kind's curves for one analysis, computed once and drawn as often as the
 * screen needs. NULL when the kind does not apply or the analysis is not valid: then
 * *why_not (when not NULL) is set to a translated, non-empty reason. */
typedef struct _TfFigure TfFigure;

TfFigure *tf_figure_new (const TfAnalysis *analysis, TfFigureKind kind, char **why_not);
/* The same, reusing results already computed for this analysis (NULL: computed where
 * the figure needs them, as tf_figure_new() does). */
TfFigure *tf_figure_new_with_results (const TfAnalysis *analysis, const TfResults *results,
                                      TfFigureKind kind, char **why_not);
void tf_figure_free (TfFigure *figure);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfFigure, tf_figure_free)
TfFigureKind tf_figure_get_kind (const TfFigure *figure);

/* Draws the figure. area_out, when not NULL, receives where its data went: the plot
 * area in user units and the ranges of its axes (for two panels, the upper one; both
 * share x). Returns FALSE when there was nothing to draw (a message is drawn). */
gboolean tf_figure_draw (const TfFigure *figure, cairo_t *cr, double width, double height,
                         double scale, const TfFigureOptions *options, TfPlotArea *area_out);
/* The same, with every panel's plot area and axis ranges, top to bottom (n = 0 when
 * nothing was drawn). */
gboolean tf_figure_draw_panels (const TfFigure *figure, cairo_t *cr, double width,
                                double height, double scale, const TfFigureOptions *options,
                                TfFigurePanels *panels_out);

/* tf_figure_new() and tf_figure_draw() at once; when the kind does not apply, draws the
 * reason in the box and returns FALSE with *why_not set. */
gboolean tf_figure_draw_kind (cairo_t *cr, TfFigureKind kind, double width, double height,
                              double scale, const TfAnalysis *analysis,
                              const TfFigureOptions *options, TfPlotArea *area_out,
                              char **why_not);

/* A message in place of a figure: a bold title and the reason under it. */
void tf_figure_draw_message (cairo_t *cr, double width, double height, double scale,
                             TfFigureStyle style, const char *title, const char *reason);

/* The crosshair readout: what the curves of one panel show at column px (user units).
 * area is one of the panels tf_figure_draw_panels() returned (tf_figure_draw()'s, the
 * top one): the curves drawn in it are read, on its axes. Returns FALSE when px is
 * outside the plot area or the kind has no x to read (model probabilities). names are
 * Pango markup owned by the library; values are the curves' values at the nearest grid
 * point, and y where each is drawn in that panel (user units; NAN off the panel). */
#define TF_FIGURE_READING_MAX 4
typedef struct {
  double x;                                 /* the parameter, scale, n or statistic */
  const char *x_markup;                     /* its name */
  guint panel;                              /* the panel read, 0 the top one */
  guint n;
  const char *names[TF_FIGURE_READING_MAX];
  double values[TF_FIGURE_READING_MAX];
  double y[TF_FIGURE_READING_MAX];
} TfFigureReading;

gboolean tf_figure_read_at (const TfFigure *figure, const TfPlotArea *area, double px,
                            TfFigureReading *reading);
/* The readout under the pointer at (px, py): the curves of the panel there
 * (tf_figure_panels_at()), read by tf_figure_read_at(). FALSE where there is none. */
gboolean tf_figure_read_at_point (const TfFigure *figure, const TfFigurePanels *panels,
                                  double px, double py, TfFigureReading *reading);
/* "θ = 0.412   posterior 3.05   prior 1.00 ...": one line of markup. Free with g_free. */
char *tf_figure_reading_markup (const TfFigureReading *reading);

/* The figures drawn from curves given directly (the tests build known curves). Each
 * returns FALSE and draws a message when the curves cannot be drawn. null_mass: the
 * probability of a point null written beside its spike, or NAN to leave it out. */
gboolean tf_figure_draw_density_curves (cairo_t *cr, double width, double height, double scale,
                                        const TfDensityCurves *curves, double null_mass,
                                        const TfFigureOptions *options, TfPlotArea *area_out);
gboolean tf_figure_draw_sensitivity (cairo_t *cr, double width, double height, double scale,
                                     const TfEvidenceCurve *curve,
                                     const TfFigureOptions *options, TfPlotArea *area_out);
gboolean tf_figure_draw_sample_size (cairo_t *cr, double width, double height, double scale,
                                     const TfEvidenceCurve *curve,
                                     const TfFigureOptions *options, TfPlotArea *area_out);
gboolean tf_figure_draw_null_distribution (cairo_t *cr, double width, double height,
                                           double scale, const TfNullDistribution *dist,
                                           const TfFigureOptions *options,
                                           TfPlotArea *area_out);
gboolean tf_figure_draw_model_probabilities (cairo_t *cr, double width, double height,
                                             double scale, const TfModelProbabilities *models,
                                             const TfFigureOptions *options,
                                             TfPlotArea *area_out);

/* The densities figure of an analysis (kept for the window and its tests). Returns FALSE
 * and draws a message when the analysis is not valid. */
gboolean tf_figure_draw_densities (cairo_t *cr, double width, double height, double scale,
                                   const TfAnalysis *analysis, TfFigureStyle style);
gboolean tf_figure_draw_densities_full (cairo_t *cr, double width, double height, double scale,
                                        const TfAnalysis *analysis, TfFigureStyle style,
                                        TfPlotArea *area);

G_END_DECLS
