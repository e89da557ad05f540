/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-actions.h: private to tf-window.c and tf-window-actions.c: the window's
 * fields, and what the two halves call in each other. The window (tf-window.c) shows
 * and recomputes the analysis; the actions (tf-window-actions.c) open, save, export the
 * figure and ask before unsaved changes are lost.
 */
#pragma once

#include "tf-window.h"
#include "tf-window-private.h"
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

/* tf-window.c */
void tf_window_update_title (TfWindow *self);
char *tf_window_document_name (TfWindow *self);
void tf_window_show_error (TfWindow *self, const char *heading, const char *body);
char *tf_window_file_display_name (GFile *file);
/* Keeps file's folder as the one the file choosers open next. */
void tf_window_remember_folder (TfWindow *self, GFile *file);

/* tf-window-actions.c */
void tf_window_actions_class_init (GtkWidgetClass *widget_class);
void tf_window_actions_init (TfWindow *self);
void tf_window_actions_dispose (TfWindow *self);
/* Asks whether to save the modified analysis, then does then unless cancelled. */
void tf_window_ask_save_changes (TfWindow *self, TfPendingAction then);
/* Shows the window's file chooser (FALSE when one is already shown): in the analysis's
 * folder or the last one used, with filter and, when name is set, that suggested name. */
gboolean tf_window_chooser_show (TfWindow *self, GtkFileChooserAction action,
                                 const char *title, const char *accept,
                                 GtkFileFilter *filter, const char *name, GCallback response);
/* Writes the analysis shown to path; FALSE with error set when it cannot. */
typedef gboolean (*TfWindowWriter) (TfWindow *self, const char *path, gconstpointer data,
                                    GError **error);
/* Checks that file is on this computer and the analysis computes, then writes it with
 * write (data passed on), then says so in a toast; on failure, a dialog names the file
 * and says why, and the result is FALSE. */
gboolean tf_window_export_to (TfWindow *self, GFile *file, TfWindowWriter write,
                              gconstpointer data);
/* The analysis's file name without its ending (or the demo's, or "analysis"), then tail. */
char *tf_window_suggested_name (TfWindow *self, const char *tail);
/* file, or when its name has no ending at all, that name with suffix (".png") added. */
GFile *tf_window_file_with_suffix (GFile *file, const char *suffix);
/* Enables Export figure… when the plot has a figure to export. */
void tf_window_actions_update (TfWindow *self);

G_END_DECLS
