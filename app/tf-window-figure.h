/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-figure.h: the window's Export Figure… action (win.export-figure), private to
 * the window's files. What the tests call (tf_window_export_figure and the options
 * dialog) is declared in tf-window-private.h.
 */
#pragma once

#include "tf-window.h"

G_BEGIN_DECLS

/* tf-window-actions.c calls these from its class_init, init, dispose and update. */
void tf_window_figure_class_init (GtkWidgetClass *widget_class);
void tf_window_figure_init (TfWindow *self);
void tf_window_figure_dispose (TfWindow *self);
/* Enables Export Figure… when the plot has a figure to export. */
void tf_window_figure_update (TfWindow *self);

G_END_DECLS
