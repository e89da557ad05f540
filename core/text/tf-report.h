/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-report.h: a report of one analysis, for a collaborator or a reviewer: the design in
 * words, the inputs, every number in the result list's grouping, the explanations, the
 * figures, the caution and the analysis file itself, verbatim, so that every number can
 * be reproduced.
 *
 * The report is a list of blocks (headings, paragraphs, tables, figures, the file text)
 * built once; tf_report_to_markdown() and tf_report_to_html() write it as text here, and
 * widgets/tf-report-render.c draws the same blocks on PDF pages with the figures. No
 * Cairo here: the caller says which figures apply and supplies the SVG of each.
 */
#pragma once

#include <glib.h>
#include "tf-design.h"
#include "tf-results.h"

G_BEGIN_DECLS

typedef enum {
  TF_REPORT_TITLE,              /* text: the title */
  TF_REPORT_META,               /* text: date, version and design on one line */
  TF_REPORT_CAUTION,            /* text: tf_caution_text() */
  TF_REPORT_HEADING,            /* text */
  TF_REPORT_SUBHEADING,         /* text */
  TF_REPORT_PARAGRAPH,          /* lead (bold, may be NULL), then text */
  TF_REPORT_TABLE,              /* n_columns, cells (first row the header), code_column */
  TF_REPORT_FIGURE,             /* text: the figure kind ("densities"); lead: its caption */
  TF_REPORT_CODE                /* text: verbatim (the analysis file) */
} TfReportBlockKind;

typedef struct {
  TfReportBlockKind kind;
  char *lead;
  char *text;
  guint n_columns;
  GPtrArray *cells;             /* char*, row by row; NULL unless a table */
  int code_column;              /* a column of identifiers (set as code), or -1 */
  int digits_column;            /* a column of numbers to every digit (monospace), or -1 */
} TfReportBlock;

/* A figure kind as the caller found it for this analysis: drawn, or left out and why. */
typedef struct {
  const char *kind;             /* the file's word: "densities" */
  const char *label;            /* translated: "Densities" */
  const char *why_not;          /* NULL when the figure is drawn; else the reason */
} TfReportFigure;

typedef struct {
  char *title;                  /* the analysis's Title, or the design's name */
  GPtrArray *blocks;            /* TfReportBlock*, in reading order */
  char *analysis_text;          /* tf_analysis_to_data(), verbatim */
} TfReport;

/* The report of a computed analysis. figures: n_figures kinds in the order to show them.
 * date: as it should be printed ("2024-05-01"); NULL for tf_report_date_now(). */
TfReport *tf_report_new (const TfAnalysis *analysis, const TfResults *results,
                         const TfReportFigure *figures, guint n_figures, const char *date);
void tf_report_free (TfReport *report);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfReport, tf_report_free)

/* Today as YYYY-MM-DD, or the day of $SOURCE_DATE_EPOCH (reproducible builds) when set. */
char *tf_report_date_now (void);

/* Which group of the result list a number belongs to (the window's grouping). */
typedef enum {
  TF_REPORT_SECTION_CLASSICAL,
  TF_REPORT_SECTION_BAYESIAN,
  TF_REPORT_SECTION_BOUNDS,
  TF_REPORT_N_SECTIONS
} TfReportSection;

TfReportSection tf_report_section_of (const TfNumber *number);

/* Markdown (CommonMark with pipe tables). Every user string is escaped; the figures are
 * links to "<figure_stem>-<kind>.svg" (relative: figure_stem is a file name with no
 * folder), or left out when figure_stem is NULL. */
char *tf_report_to_markdown (const TfReport *report, const char *figure_stem);

/* One self-contained HTML5 file: inline CSS, the figures as inline SVG from
 * svg_by_kind (kind -> SVG markup with no XML declaration; NULL or a missing kind: the
 * figure is left out), the analysis file as text and as a download link in a data: URI.
 * Every user string is escaped. */
char *tf_report_to_html (const TfReport *report, GHashTable *svg_by_kind);

/* Escapes for HTML text and attribute values (& < > " '), and for Markdown inline text
 * (CommonMark's punctuation that would start markup, newlines as spaces). */
char *tf_report_escape_html (const char *text);
char *tf_report_escape_markdown (const char *text);

G_END_DECLS
