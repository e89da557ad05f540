/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-report-render.h: a report of an analysis (core/tf-report.h) written to a file with
 * its figures drawn by the figure engine: PDF (A4 pages, the figures as vector graphics),
 * HTML (one self-contained file, the figures as inline SVG) or Markdown (text, with the
 * figures as OUT-<kind>.svg files beside it). Cairo + PangoCairo only, no GTK.
 */
#pragma once

#include <cairo.h>
#include <glib.h>
#include "tf-analysis.h"
#include "tf-figure.h"
#include "tf-report.h"

G_BEGIN_DECLS

#define TF_REPORT_ERROR (tf_report_error_quark ())
GQuark tf_report_error_quark (void);

typedef enum {
  TF_REPORT_ERROR_BAD_FORMAT,       /* bad usage: the file name's ending */
  TF_REPORT_ERROR_NO_FOLDER,        /* bad usage: the folder to write in does not exist */
  TF_REPORT_ERROR_INVALID_ANALYSIS, /* the analysis has problems */
  TF_REPORT_ERROR_WRITE             /* a file could not be written */
} TfReportError;

typedef enum {
  TF_REPORT_FORMAT_PDF,
  TF_REPORT_FORMAT_HTML,
  TF_REPORT_FORMAT_MARKDOWN
} TfReportFormat;

/* From the file name's ending: .pdf, .html or .htm, .md (any case). */
gboolean tf_report_format_from_filename (const char *filename, TfReportFormat *format);

/* The report of analysis written to filename, in the format its ending names, each file
 * atomically (a temporary file renamed over the target). Markdown also writes
 * "<stem>-<kind>.svg" beside it for every figure that applies (stem: the file name
 * without ".md"). Nothing is written when the analysis has problems, the ending is not
 * known or the folder does not exist. date: NULL for today (tf_report_date_now()). */
gboolean tf_report_export (const TfAnalysis *analysis, const char *filename,
                           const char *date, GError **error);

/* The A4 pages of a report on a PDF surface (tf-report-pdf.c): figures are drawn from
 * figures[kind] (NULL where the kind is left out). Returns the number of pages. */
int tf_report_draw_pdf (cairo_surface_t *surface, const TfReport *report,
                        TfFigure *const figures[TF_N_FIGURE_KINDS],
                        const TfFigureOptions *options);

#define TF_REPORT_PAGE_WIDTH (210.0 / 25.4 * 72.0)   /* A4, points */
#define TF_REPORT_PAGE_HEIGHT (297.0 / 25.4 * 72.0)

G_END_DECLS
