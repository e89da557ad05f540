/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-files.h: what opening, saving and both exports share, private to the window's
 * files: the window's one file chooser, suggested names and endings, the folder the
 * choosers open in, the error dialog, and the checks, writing and toast of an export.
 * Calls no other file of the window.
 */
#pragma once

#include "tf-window-fields.h"

G_BEGIN_DECLS

/* A dialog with heading and body and a Close button, over the window. */
void tf_window_show_error (TfWindow *self, const char *heading, const char *body);
/* file's path as people read it (or its URI when it has no path). */
char *tf_window_file_display_name (GFile *file);
/* Keeps file's folder as the one the file choosers open next. */
void tf_window_remember_folder (TfWindow *self, GFile *file);

/* Shows the window's file chooser (FALSE when one is already shown): in the analysis's
 * folder or the last one used, with filter and, when name is set, that suggested name;
 * response gets the window and clears self->chooser. */
gboolean tf_window_chooser_show (TfWindow *self, GtkFileChooserAction action,
                                 const char *title, const char *accept,
                                 GtkFileFilter *filter, const char *name, GCallback response);
/* Destroys the file chooser if one is shown (the window's dispose). */
void tf_window_chooser_dispose (TfWindow *self);

/* The analysis's file name without its ending (or the demo's, or "analysis"), then tail. */
char *tf_window_suggested_name (TfWindow *self, const char *tail);
/* file, or when its name has no ending at all, that name with suffix (".png") added. */
GFile *tf_window_file_with_suffix (GFile *file, const char *suffix);

/* Writes the analysis shown to path; FALSE with error set when it cannot. */
typedef gboolean (*TfWindowWriter) (TfWindow *self, const char *path, gconstpointer data,
                                    GError **error);
/* Checks that file is on this computer and the analysis computes, then writes it with
 * write (data passed on), then says so in a toast; on failure, a dialog names the file
 * and says why, and the result is FALSE. */
gboolean tf_window_export_to (TfWindow *self, GFile *file, TfWindowWriter write,
                              gconstpointer data);

G_END_DECLS
