/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-proportion-form.c: the one-proportion form. Fields parse with g_ascii_strtod, so
 * the decimal mark is '.' as in the analysis file, whatever the locale.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include <adwaita.h>
#include "tf-proportion-form.h"
#include "tf-analysis-file.h"

enum {
  FIELD_SUCCESSES,
  FIELD_TRIALS,
  FIELD_NULL_VALUE,
  FIELD_PRIOR_A,
  FIELD_PRIOR_B,
  FIELD_PRIOR_NULL,
  FIELD_LEVEL,
  N_FIELDS
};

typedef struct {
  const char *group;
  const char *key;
  const char *name;             /* for messages, translated at use */
  const char *ui_id;            /* prefix of the ids in the .ui file */
} FieldInfo;

static const FieldInfo fields[N_FIELDS] = {
  [FIELD_SUCCESSES] = { "Data", "Successes", N_("Successes"), "successes" },
  [FIELD_TRIALS] = { "Data", "Trials", N_("Trials"), "trials" },
  [FIELD_NULL_VALUE] = { "Null", "Value", N_("Null value"), "null_value" },
  [FIELD_PRIOR_A] = { "Alternative", "PriorA", N_("Prior shape a"), "prior_a" },
  [FIELD_PRIOR_B] = { "Alternative", "PriorB", N_("Prior shape b"), "prior_b" },
  [FIELD_PRIOR_NULL] = { "Models", "PriorNull", N_("Prior probability of the null"), "prior_null" },
  [FIELD_LEVEL] = { "Options", "Level", N_("Level"), "level" },
};

struct _TfProportionForm
{
  GtkWidget parent_instance;

  GtkEntry *entries[N_FIELDS];
  GtkLabel *messages[N_FIELDS];
  GtkLabel *hints[N_FIELDS];
  GtkDropDown *direction;
  GtkLabel *direction_message;

  gboolean updating;
};

G_DEFINE_FINAL_TYPE (TfProportionForm, tf_proportion_form, GTK_TYPE_WIDGET)

enum { SIGNAL_CHANGED, N_SIGNALS };
static guint signals[N_SIGNALS];

static int
field_find (const char *group, const char *key)
{
  for (int i = 0; i < N_FIELDS; i++)
    if (g_strcmp0 (fields[i].group, group) == 0 && g_strcmp0 (fields[i].key, key) == 0)
      return i;
  return -1;
}

static double *
field_value (TfAnalysis *analysis, int field)
{
  switch (field)
    {
    case FIELD_SUCCESSES: return &analysis->successes;
    case FIELD_TRIALS: return &analysis->trials;
    case FIELD_NULL_VALUE: return &analysis->null_value;
    case FIELD_PRIOR_A: return &analysis->prior_a;
    case FIELD_PRIOR_B: return &analysis->prior_b;
    case FIELD_PRIOR_NULL: return &analysis->prior_null;
    case FIELD_LEVEL: return &analysis->level;
    default: g_return_val_if_reached (NULL);
    }
}

static void
emit_changed (TfProportionForm *self)
{
  if (!self->updating)
    g_signal_emit (self, signals[SIGNAL_CHANGED], 0);
}

static void
on_entry_changed (GtkEditable *editable, TfProportionForm *self)
{
  emit_changed (self);
}

static void
on_direction_changed (GtkDropDown *dropdown, GParamSpec *pspec, TfProportionForm *self)
{
  emit_changed (self);
}

void
tf_proportion_form_set_analysis (TfProportionForm *self, const TfAnalysis *analysis)
{
  g_return_if_fail (TF_IS_PROPORTION_FORM (self));
  g_return_if_fail (analysis != NULL);

  self->updating = TRUE;
  for (int i = 0; i < N_FIELDS; i++)
    {
      g_autofree char *text = tf_format_double (*field_value ((TfAnalysis *) analysis, i));
      gtk_editable_set_text (GTK_EDITABLE (self->entries[i]), text);
    }
  gtk_drop_down_set_selected (self->direction, (guint) analysis->direction);
  self->updating = FALSE;
}

gboolean
tf_proportion_form_apply (TfProportionForm *self, TfAnalysis *analysis, GPtrArray *problems)
{
  gboolean ok = TRUE;
  guint direction;

  g_return_val_if_fail (TF_IS_PROPORTION_FORM (self), FALSE);
  g_return_val_if_fail (analysis != NULL, FALSE);

  for (int i = 0; i < N_FIELDS; i++)
    {
      const char *text = gtk_editable_get_text (GTK_EDITABLE (self->entries[i]));
      g_autofree char *stripped = g_strstrip (g_strdup (text));
      char *end = NULL;
      double value;

      if (*stripped == '\0')
        {
          /* TRANSLATORS: %s is a field of the form, e.g. "Trials" */
          g_ptr_array_add (problems, tf_problem_new (fields[i].group, fields[i].key,
                                                     _("%s: enter a number."), _(fields[i].name)));
          ok = FALSE;
          continue;
        }
      value = g_ascii_strtod (stripped, &end);
      if (end == stripped || *end != '\0' || !isfinite (value))
        {
          /* TRANSLATORS: first %s is a field of the form, second what was typed */
          g_ptr_array_add (problems, tf_problem_new (fields[i].group, fields[i].key,
                                                     _("%s: “%s” is not a number; write it with a point as decimal mark, for example 0.5."),
                                                     _(fields[i].name), stripped));
          ok = FALSE;
          continue;
        }
      *field_value (analysis, i) = value;
    }

  direction = gtk_drop_down_get_selected (self->direction);
  if (direction <= TF_DIRECTION_LESS)
    analysis->direction = (TfDirection) direction;
  analysis->design = TF_DESIGN_ONE_PROPORTION;
  analysis->null_kind = TF_NULL_POINT;
  analysis->prior = TF_PRIOR_BETA;
  return ok;
}

static void
mark_field (GtkEntry *entry, GtkLabel *message, GtkLabel *hint, const TfProblem *problem)
{
  /* the message takes the hint's place */
  gtk_widget_set_visible (GTK_WIDGET (hint), problem == NULL);
  if (problem)
    {
      gtk_widget_add_css_class (GTK_WIDGET (entry), "error");
      gtk_entry_set_icon_from_icon_name (entry, GTK_ENTRY_ICON_SECONDARY, "dialog-error-symbolic");
      gtk_entry_set_icon_tooltip_text (entry, GTK_ENTRY_ICON_SECONDARY, problem->message);
      gtk_label_set_text (message, problem->message);
      gtk_widget_set_visible (GTK_WIDGET (message), TRUE);
      gtk_accessible_update_state (GTK_ACCESSIBLE (entry), GTK_ACCESSIBLE_STATE_INVALID,
                                   GTK_ACCESSIBLE_INVALID_TRUE, -1);
    }
  else
    {
      gtk_widget_remove_css_class (GTK_WIDGET (entry), "error");
      gtk_entry_set_icon_from_icon_name (entry, GTK_ENTRY_ICON_SECONDARY, NULL);
      gtk_label_set_text (message, "");
      gtk_widget_set_visible (GTK_WIDGET (message), FALSE);
      gtk_accessible_reset_state (GTK_ACCESSIBLE (entry), GTK_ACCESSIBLE_STATE_INVALID);
    }
}

void
tf_proportion_form_show_problems (TfProportionForm *self, GPtrArray *problems)
{
  const TfProblem *direction_problem = NULL;

  g_return_if_fail (TF_IS_PROPORTION_FORM (self));

  for (int i = 0; i < N_FIELDS; i++)
    {
      const TfProblem *problem = problems ? tf_problem_list_find (problems, fields[i].group,
                                                                  fields[i].key)
                                          : NULL;
      mark_field (self->entries[i], self->messages[i], self->hints[i], problem);
    }
  if (problems)
    direction_problem = tf_problem_list_find (problems, "Alternative", "Direction");
  gtk_label_set_text (self->direction_message, direction_problem ? direction_problem->message : "");
  gtk_widget_set_visible (GTK_WIDGET (self->direction_message), direction_problem != NULL);
  if (direction_problem)
    gtk_widget_add_css_class (GTK_WIDGET (self->direction), "error");
  else
    gtk_widget_remove_css_class (GTK_WIDGET (self->direction), "error");
}

gboolean
tf_proportion_form_has_field (TfProportionForm *self, const char *group, const char *key)
{
  return field_find (group, key) >= 0
         || (g_strcmp0 (group, "Alternative") == 0 && g_strcmp0 (key, "Direction") == 0);
}

GtkEditable *
tf_proportion_form_get_entry (TfProportionForm *self, const char *group, const char *key)
{
  int i = field_find (group, key);

  g_return_val_if_fail (TF_IS_PROPORTION_FORM (self), NULL);
  return i >= 0 ? GTK_EDITABLE (self->entries[i]) : NULL;
}

const char *
tf_proportion_form_get_message (TfProportionForm *self, const char *group, const char *key)
{
  int i = field_find (group, key);

  g_return_val_if_fail (TF_IS_PROPORTION_FORM (self), NULL);
  if (i < 0 || !gtk_widget_get_visible (GTK_WIDGET (self->messages[i])))
    return NULL;
  return gtk_label_get_text (self->messages[i]);
}

/* The template's root is not bound to a field: unparent whatever is left. */
static void
clear_children (GtkWidget *widget)
{
  GtkWidget *child;

  while ((child = gtk_widget_get_first_child (widget)))
    gtk_widget_unparent (child);
}

static void
tf_proportion_form_dispose (GObject *object)
{
  gtk_widget_dispose_template (GTK_WIDGET (object), TF_TYPE_PROPORTION_FORM);
  clear_children (GTK_WIDGET (object));
  G_OBJECT_CLASS (tf_proportion_form_parent_class)->dispose (object);
}

static void
tf_proportion_form_class_init (TfProportionFormClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = tf_proportion_form_dispose;

  /* Emitted when the user edits any field. */
  signals[SIGNAL_CHANGED] = g_signal_new ("changed", G_TYPE_FROM_CLASS (klass),
                                          G_SIGNAL_RUN_LAST, 0, NULL, NULL, NULL,
                                          G_TYPE_NONE, 0);

  gtk_widget_class_set_template_from_resource (widget_class,
                                               "/org/twofold/Twofold/ui/tf-proportion-form.ui");
  for (int i = 0; i < N_FIELDS; i++)
    {
      g_autofree char *entry = g_strconcat (fields[i].ui_id, "_entry", NULL);
      g_autofree char *message = g_strconcat (fields[i].ui_id, "_message", NULL);
      g_autofree char *hint = g_strconcat (fields[i].ui_id, "_hint", NULL);

      /* the builder keeps the names: intern them */
      gtk_widget_class_bind_template_child_full (widget_class, g_intern_string (entry), FALSE,
                                                 G_STRUCT_OFFSET (TfProportionForm, entries)
                                                 + i * sizeof (gpointer));
      gtk_widget_class_bind_template_child_full (widget_class, g_intern_string (message), FALSE,
                                                 G_STRUCT_OFFSET (TfProportionForm, messages)
                                                 + i * sizeof (gpointer));
      gtk_widget_class_bind_template_child_full (widget_class, g_intern_string (hint), FALSE,
                                                 G_STRUCT_OFFSET (TfProportionForm, hints)
                                                 + i * sizeof (gpointer));
    }
  gtk_widget_class_bind_template_child (widget_class, TfProportionForm, direction);
  gtk_widget_class_bind_template_child (widget_class, TfProportionForm, direction_message);
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "tf-proportion-form");
}

static void
tf_proportion_form_init (TfProportionForm *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
  for (int i = 0; i < N_FIELDS; i++)
    g_signal_connect (self->entries[i], "changed", G_CALLBACK (on_entry_changed), self);
  g_signal_connect (self->direction, "notify::selected", G_CALLBACK (on_direction_changed), self);
}

GtkWidget *
tf_proportion_form_new (void)
{
  return g_object_new (TF_TYPE_PROPORTION_FORM, NULL);
}
