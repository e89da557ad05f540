/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-widget-template.h: what the widgets built from a .ui template share.
 */
#pragma once

#include <gtk/gtk.h>

G_BEGIN_DECLS

/* For a widget's dispose: disposes its template of type, then unparents whatever is
 * left (the template's root is not bound to a field). */
void tf_widget_dispose_template (GtkWidget *widget, GType type);

G_END_DECLS
