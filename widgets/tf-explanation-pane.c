/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-explanation-pane.c: for each explanation its title, "What it reports" and "What it
 * does not say".
 */
#include <glib/gi18n-lib.h>
#include <adwaita.h>
#include "tf-explanation-pane.h"
#include "tf-widget-template.h"
#include "tf-explain.h"

struct _TfExplanationPane
{
  GtkWidget parent_instance;

  GtkStack *stack;
  GtkBox *items;
  GtkLabel *placeholder_label;
  guint n_explanations;
};

G_DEFINE_FINAL_TYPE (TfExplanationPane, tf_explanation_pane, GTK_TYPE_WIDGET)

static GtkWidget *
text_label_new (const char *text, const char *css_class)
{
  GtkWidget *label = gtk_label_new (text);

  gtk_label_set_wrap (GTK_LABEL (label), TRUE);
  gtk_label_set_wrap_mode (GTK_LABEL (label), PANGO_WRAP_WORD_CHAR);
  gtk_label_set_xalign (GTK_LABEL (label), 0.0);
  gtk_label_set_max_width_chars (GTK_LABEL (label), 40);
  gtk_label_set_width_chars (GTK_LABEL (label), 24);
  gtk_label_set_selectable (GTK_LABEL (label), TRUE);
  gtk_widget_set_focusable (label, FALSE);
  if (css_class)
    gtk_widget_add_css_class (label, css_class);
  return label;
}

static GtkWidget *
explanation_new (const TfExplanation *explanation)
{
  GtkWidget *box = gtk_box_new (GTK_ORIENTATION_VERTICAL, 6);
  GtkWidget *title = text_label_new (explanation->title, "heading");
  GtkWidget *reports_heading = text_label_new (_("What it reports"), "caption-heading");
  GtkWidget *reports = text_label_new (explanation->measures, NULL);
  GtkWidget *not_heading = text_label_new (_("What it does not say"), "caption-heading");
  GtkWidget *not_text = text_label_new (explanation->does_not, NULL);

  gtk_widget_add_css_class (box, "tf-explanation");
  gtk_widget_add_css_class (reports_heading, "dim-label");
  gtk_widget_add_css_class (not_heading, "dim-label");
  gtk_widget_set_margin_top (reports_heading, 4);
  gtk_widget_set_margin_top (not_heading, 4);
  gtk_accessible_update_relation (GTK_ACCESSIBLE (reports),
                                  GTK_ACCESSIBLE_RELATION_LABELLED_BY, reports_heading, NULL, -1);
  gtk_accessible_update_relation (GTK_ACCESSIBLE (not_text),
                                  GTK_ACCESSIBLE_RELATION_LABELLED_BY, not_heading, NULL, -1);
  gtk_box_append (GTK_BOX (box), title);
  gtk_box_append (GTK_BOX (box), reports_heading);
  gtk_box_append (GTK_BOX (box), reports);
  gtk_box_append (GTK_BOX (box), not_heading);
  gtk_box_append (GTK_BOX (box), not_text);
  return box;
}

static void
remove_items (TfExplanationPane *self)
{
  GtkWidget *child;

  while ((child = gtk_widget_get_first_child (GTK_WIDGET (self->items))))
    gtk_box_remove (self->items, child);
  self->n_explanations = 0;
}

void
tf_explanation_pane_set_results (TfExplanationPane *self, const TfAnalysis *analysis,
                                 const TfResults *results)
{
  g_autoptr (GPtrArray) explanations = NULL;

  g_return_if_fail (TF_IS_EXPLANATION_PANE (self));

  remove_items (self);
  explanations = tf_explain (analysis, results);
  for (guint i = 0; explanations && i < explanations->len; i++)
    {
      if (i > 0)
        gtk_box_append (self->items, gtk_separator_new (GTK_ORIENTATION_HORIZONTAL));
      gtk_box_append (self->items, explanation_new (g_ptr_array_index (explanations, i)));
      self->n_explanations++;
    }
  if (self->n_explanations == 0)
    tf_explanation_pane_clear (self, _("There is nothing to explain for this analysis."));
  else
    gtk_stack_set_visible_child_name (self->stack, "explanations");
}

void
tf_explanation_pane_clear (TfExplanationPane *self, const char *message)
{
  g_return_if_fail (TF_IS_EXPLANATION_PANE (self));

  remove_items (self);
  gtk_label_set_text (self->placeholder_label,
                      message ? message : _("Explanations appear once the analysis can be computed."));
  gtk_stack_set_visible_child_name (self->stack, "placeholder");
}

guint
tf_explanation_pane_get_n_explanations (TfExplanationPane *self)
{
  g_return_val_if_fail (TF_IS_EXPLANATION_PANE (self), 0);
  return self->n_explanations;
}

static void
tf_explanation_pane_dispose (GObject *object)
{
  tf_widget_dispose_template (GTK_WIDGET (object), TF_TYPE_EXPLANATION_PANE);
  G_OBJECT_CLASS (tf_explanation_pane_parent_class)->dispose (object);
}

static void
tf_explanation_pane_class_init (TfExplanationPaneClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = tf_explanation_pane_dispose;
  gtk_widget_class_set_template_from_resource (widget_class,
                                               "/org/twofold/Twofold/ui/tf-explanation-pane.ui");
  gtk_widget_class_bind_template_child (widget_class, TfExplanationPane, stack);
  gtk_widget_class_bind_template_child (widget_class, TfExplanationPane, items);
  gtk_widget_class_bind_template_child (widget_class, TfExplanationPane, placeholder_label);
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "tf-explanation-pane");
}

static void
tf_explanation_pane_init (TfExplanationPane *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
}

GtkWidget *
tf_explanation_pane_new (void)
{
  return g_object_new (TF_TYPE_EXPLANATION_PANE, NULL);
}
