/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-document.h: the analysis a window shows, private to the window's files:
 * recomputing it on every edit, the window's title, and opening a file or the demo.
 * tf-window.c's public functions pass on to these after checking their arguments.
 */
#pragma once

#include "tf-window-fields.h"

G_BEGIN_DECLS

/* tf-window.c's init: a new analysis of the default design, recomputed and titled;
 * every edit of the form from then on recomputes and marks the analysis modified. */
void tf_window_document_init (TfWindow *self);
/* Shows a copy of analysis, not modified; file is where it came from, or NULL. */
void tf_window_document_set (TfWindow *self, const TfAnalysis *analysis, GFile *file);
/* Loads a *.twofold file; on failure says why in a dialog and keeps what was shown. */
gboolean tf_window_document_open (TfWindow *self, GFile *file);
/* The demo analysis bundled with Twofold (or the defaults, should it be missing). */
void tf_window_document_open_demo (TfWindow *self);

/* What the analysis is called: its title, else its file name, else "Untitled Analysis". */
char *tf_window_document_name (TfWindow *self);
/* The title and subtitle: the analysis's title, its design and file, and whether it has
 * unsaved changes. */
void tf_window_document_update_title (TfWindow *self);

G_END_DECLS
