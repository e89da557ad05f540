/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-fields.h: the fields of a TfWindow, private to the window's own files. The
 * window is built in layers, each file calling only those below it:
 *
 *   tf-window.c            the GObject: type, template, settings, public and test API
 *   tf-window-actions.c    Open, Save, Save As and the "Save changes?" question
 *   tf-window-document.c   the analysis shown: recomputing, the title, opening a file
 *   tf-window-figure.c     Export Figure…          tf-window-report.c  Export Report…
 *   tf-window-files.c      the file chooser, suggested names, the last folder, the error
 *                          dialog, and the checks and toast every export shares
 *
 * Below tf-window.c nothing uses TF_WINDOW () or TF_IS_WINDOW (): the type is defined,
 * and its arguments checked, in tf-window.c; the parts take the TfWindow it passes on.
 */
#pragma once

#include <adwaita.h>
#include "tf-window.h"
#include "tf-analysis-form.h"
#include "tf-plot-view.h"
#include "tf-result-list.h"
#include "tf-explanation-pane.h"
#include "tf-figure.h"

G_BEGIN_DECLS

/* What waits for the answer to "Save changes?" */
typedef enum {
  TF_PENDING_NONE,
  TF_PENDING_CLOSE,
  TF_PENDING_OPEN
} TfPendingAction;

struct _TfWindow
{
  AdwApplicationWindow parent_instance;

  /* template */
  AdwWindowTitle *window_title;
  AdwToastOverlay *toast_overlay;
  AdwFlap *flap;
  GtkToggleButton *explanations_button;
  TfAnalysisForm *form;
  GtkStack *center_stack;
  GtkPaned *paned;
  TfPlotView *plot_view;
  TfResultList *result_list;
  AdwStatusPage *invalid_page;
  TfExplanationPane *explanation_pane;

  TfAnalysis *analysis;         /* the document, as the form last set it */
  TfResults *results;           /* NULL while the analysis cannot be computed */
  gboolean savable;             /* every field parsed and only the design is missing */
  GFile *file;                  /* NULL for the demo and new analyses */
  gboolean is_demo;
  GSettings *settings;          /* NULL when the schema is not installed */
  GtkFileChooserNative *chooser;

  gboolean modified;            /* edited since the last load or save */
  TfPendingAction pending;      /* what to do once the analysis is saved or discarded */
  AdwMessageDialog *save_changes_dialog;  /* NULL unless shown; not owned */
  gboolean close_confirmed;     /* the next close-request closes, unasked */

  /* Export figure: the options dialog while shown (not owned), the file it is for, and
   * the options last asked for in this window */
  AdwMessageDialog *export_dialog;
  GFile *export_file;
  double export_width_mm, export_height_mm, export_dpi;
  TfFigureOptions export_options;
  gboolean export_enabled;      /* win.export-figure is enabled */
};

G_END_DECLS
