/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-actions.h: the window's Open, Save and Save As actions and the "Save
 * changes?" question, private to the window's files.
 */
#pragma once

#include "tf-window-fields.h"

G_BEGIN_DECLS

/* tf-window.c calls these from its class_init and dispose. */
void tf_window_actions_class_init (GtkWidgetClass *widget_class);
void tf_window_actions_dispose (TfWindow *self);
/* Asks whether to save the modified analysis, then does then unless cancelled. */
void tf_window_ask_save_changes (TfWindow *self, TfPendingAction then);

G_END_DECLS
