/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-widget-template.c: what the widgets built from a .ui template share.
 */
#include "tf-widget-template.h"

void
tf_widget_dispose_template (GtkWidget *widget, GType type)
{
  GtkWidget *child;

  gtk_widget_dispose_template (widget, type);
  while ((child = gtk_widget_get_first_child (widget)))
    gtk_widget_unparent (child);
}
