/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-gui.h: what the window, design, figure and result-list tests share: driving the
 * main loop, typing into the form, reading the result list back against the core, and
 * a small analysis of every design.
 */
#pragma once

#include <math.h>
#include <glib/gstdio.h>
#include <cairo-pdf.h>
#include <gtk/gtk.h>
#include <adwaita.h>
#include <gsl/gsl_errno.h>
#include "tf-window-private.h"
#include "tf-analysis-file.h"
#include "tf-results.h"
#include "tf-design.h"
#include "tf-curves.h"
#include "tf-figure.h"
#include "tf-figure-theme.h"
#include "tf-axis.h"
#include "tf-figure-export.h"
#include "tf-explain.h"

typedef struct {
  const char *key;
  const char *shown;            /* the text the form shows for it */
} ShownField;

typedef struct {
  TfDesign design;
  const char *file;             /* a small analysis of the design (inputs only: the window
                                 * is checked against the core, not against a method) */
  gboolean raw;                 /* given as raw values */
  ShownField data[7];
} DesignCase;

/* A small analysis of every design (inputs only: the window is checked against the
 * core, not against a method). */
extern const DesignCase design_cases[];
extern const guint n_design_cases;

void iterate (void);
void wait_until_mapped (GtkWidget *widget);
void type_into (TfWindow *window, const char *group, const char *key, const char *text);
/* Every number of expected is in the list with the text the core formats for it; the
 * two limits of an interval in one row. */
void assert_list_shows (TfResultList *list, const TfResults *expected);
/* The [Data] field key is marked, its message naming each word (NULL-terminated). */
void assert_field_says (TfAnalysisForm *form, const char *key, ...) G_GNUC_NULL_TERMINATED;
/* The window shows expected: the page of results, the list, a figure, explanations. */
void assert_window_shows_results (TfWindow *window, const TfResults *expected);
/* Nothing stale is shown: the page that says what to fix, and no numbers, figure or
 * explanations. */
void assert_window_shows_nothing (TfWindow *window);
TfResults *compute_or_fail (const TfAnalysis *analysis);
void assert_not_modified (TfWindow *window, const char *title);
char *write_case (const char *dir, const char *name, const char *text);
TfAnalysis *read_case (const char *text);

void add_window_tests (void);
void add_design_tests (void);
void add_figure_tests (void);
void add_result_list_tests (void);
