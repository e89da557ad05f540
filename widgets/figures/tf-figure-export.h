/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-export.h: a figure written to PNG, SVG or PDF at the size a journal asks.
 * Cairo only, so twofold-cli and the window share it.
 */
#pragma once

#include <glib.h>
#include "tf-analysis.h"
#include "tf-figure.h"

G_BEGIN_DECLS

#define TF_FIGURE_ERROR (tf_figure_error_quark ())
GQuark tf_figure_error_quark (void);

typedef enum {
  TF_FIGURE_ERROR_UNKNOWN_KIND,     /* bad usage */
  TF_FIGURE_ERROR_BAD_SIZE,         /* bad usage */
  TF_FIGURE_ERROR_BAD_FORMAT,       /* bad usage: the file name's ending */
  TF_FIGURE_ERROR_NOT_APPLICABLE,   /* the kind does not apply to this analysis */
  TF_FIGURE_ERROR_INVALID_ANALYSIS, /* the analysis has problems */
  TF_FIGURE_ERROR_WRITE             /* the file could not be written */
} TfFigureError;

typedef enum {
  TF_FIGURE_FORMAT_PNG,
  TF_FIGURE_FORMAT_SVG,
  TF_FIGURE_FORMAT_PDF
} TfFigureFormat;

#define TF_FIGURE_DEFAULT_WIDTH_MM 120.0
#define TF_FIGURE_DEFAULT_HEIGHT_MM 80.0
#define TF_FIGURE_DEFAULT_DPI 300.0

/* From the file name's ending: .png, .svg, .pdf (any case). */
gboolean tf_figure_format_from_filename (const char *filename, TfFigureFormat *format);
/* A cairo_write_func_t that appends to the GByteArray given as closure: surfaces drawn in
 * memory, then saved atomically. */
cairo_status_t tf_figure_append_bytes (void *closure, const unsigned char *data,
                                       unsigned int length);

/* The figure kinds of DEVELOPERS.md, and whether this version draws one. */
gboolean tf_figure_kind_is_known (const char *kind);

/* Draws the figure and writes it atomically (a temporary file renamed over the target):
 * PNG of exactly round(mm / 25.4 × dpi) pixels a side, SVG and PDF pages of exactly the
 * millimetres asked. Sizes from 10 to 1000 mm, dpi from 50 to 2400. */
gboolean tf_figure_export (const TfAnalysis *analysis, const char *kind, const char *filename,
                           double width_mm, double height_mm, double dpi, GError **error);
/* The same in a style and with an evidence scale (options NULL: light, Kass & Raftery). */
gboolean tf_figure_export_full (const TfAnalysis *analysis, const char *kind,
                                const char *filename, double width_mm, double height_mm,
                                double dpi, const TfFigureOptions *options, GError **error);

G_END_DECLS
