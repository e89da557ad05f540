/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-figure.h: the window's Export Figure… action (win.export-figure), private to
 * the window's files: a save dialog, then the figure's size, resolution, style and
 * evidence grades in a second dialog. What the tests call is declared in
 * tf-window-private.h and defined in tf-window.c, which passes on to these.
 */
#pragma once

#include "tf-window-fields.h"

G_BEGIN_DECLS

/* tf-window.c calls these from its class_init, init and dispose. */
void tf_window_figure_class_init (GtkWidgetClass *widget_class);
void tf_window_figure_init (TfWindow *self);
void tf_window_figure_dispose (TfWindow *self);
/* Enables Export Figure… when the plot has a figure to export (after each recompute, and
 * when the plot's kind changes). */
void tf_window_figure_update (TfWindow *self);

/* The dialog of the figure's size for file; its responses are "cancel" and "export". */
void tf_window_figure_show_options (TfWindow *self, GFile *file);
/* Writes the plot's figure kind to file (PNG, SVG or PDF by its ending) with
 * tf_figure_export_full(); on failure says why in a dialog naming the file and returns
 * FALSE. */
gboolean tf_window_figure_export (TfWindow *self, GFile *file, double width_mm,
                                  double height_mm, double dpi,
                                  const TfFigureOptions *options);

G_END_DECLS
