/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-result-list.c: one row per number: its label, and its value or "not defined" with
 * the reason both visible and as a tooltip. An interval (any "<stem>_low" with its
 * "<stem>_high": ci, cri, hdi, wilson, or_ci...) is one row, titled with what it is of
 * and its method as the core gives them (TfNumber.of, .method): "95% confidence
 * interval (Clopper–Pearson)" with "0.8012 – 0.8153", whose accessible description
 * names each limit with its number.
 */
#include <math.h>
#include <string.h>
#include <glib/gi18n-lib.h>
#include <adwaita.h>
#include "tf-result-list.h"
#include "tf-widget-template.h"

struct _TfResultList
{
  GtkWidget parent_instance;

  GtkStack *stack;
  GtkLabel *placeholder_title;
  GtkLabel *placeholder_description;
  AdwPreferencesGroup *groups[3];

  GPtrArray *rows[3];           /* AdwActionRow*, per section, not owned */
  GHashTable *values;           /* id -> GtkLabel*, not owned; both limits share one */
  GHashTable *titles;           /* id -> AdwPreferencesRow*, not owned */
  GHashTable *subtitles;        /* id -> char* */
  GHashTable *descriptions;     /* id -> char*, the accessible description, if set */
};

G_DEFINE_FINAL_TYPE (TfResultList, tf_result_list, GTK_TYPE_WIDGET)

TfResultSection
tf_result_section_for_number (const TfNumber *number)
{
  switch (number->measure)
    {
    case TF_MEASURE_BAYES_FACTOR:
    case TF_MEASURE_POSTERIOR_PROBABILITY:
    case TF_MEASURE_CREDIBLE_LIMIT:
      return TF_RESULT_SECTION_BAYESIAN;
    case TF_MEASURE_BOUND:
      return TF_RESULT_SECTION_BOUNDS;
    case TF_MEASURE_ESTIMATE:
    case TF_MEASURE_STATISTIC:
      /* posterior mean and median are estimates of the Bayesian reading */
      if (number->id && (g_str_has_prefix (number->id, "posterior_")
                         || g_str_has_prefix (number->id, "cri_")))
        return TF_RESULT_SECTION_BAYESIAN;
      return TF_RESULT_SECTION_CLASSICAL;
    case TF_MEASURE_TAIL_PROBABILITY:
    case TF_MEASURE_CONFIDENCE_LIMIT:
    default:
      return TF_RESULT_SECTION_CLASSICAL;
    }
}

static void
remove_rows (TfResultList *self)
{
  for (guint s = 0; s < G_N_ELEMENTS (self->groups); s++)
    {
      for (guint i = 0; i < self->rows[s]->len; i++)
        adw_preferences_group_remove (self->groups[s], g_ptr_array_index (self->rows[s], i));
      g_ptr_array_set_size (self->rows[s], 0);
    }
  g_hash_table_remove_all (self->values);
  g_hash_table_remove_all (self->titles);
  g_hash_table_remove_all (self->subtitles);
  g_hash_table_remove_all (self->descriptions);
}

static GtkWidget *
value_label_new (const char *text)
{
  GtkWidget *value = gtk_label_new (text);

  gtk_widget_add_css_class (value, "numeric");
  gtk_label_set_selectable (GTK_LABEL (value), TRUE);
  gtk_label_set_xalign (GTK_LABEL (value), 1.0);
  gtk_widget_set_valign (value, GTK_ALIGN_CENTER);
  gtk_widget_set_focusable (value, FALSE);
  return value;
}

static GtkWidget *
number_row_new (const char *title)
{
  GtkWidget *row = adw_action_row_new ();

  adw_preferences_row_set_title (ADW_PREFERENCES_ROW (row), title);
  adw_preferences_row_set_use_markup (ADW_PREFERENCES_ROW (row), FALSE);
  gtk_widget_add_css_class (row, "tf-number");
  return row;
}

static GtkWidget *
row_new (TfResultList *self, const TfNumber *number)
{
  GtkWidget *row = number_row_new (number->label);
  g_autofree char *text = tf_number_format (number);
  GtkWidget *value = value_label_new (text);

  if (number->status != TF_STATUS_OK)
    {
      const char *reason = number->reason ? number->reason : _("not defined for this input");

      adw_action_row_set_subtitle (ADW_ACTION_ROW (row), reason);
      gtk_widget_set_tooltip_text (value, reason);
      gtk_widget_set_tooltip_text (row, reason);
      gtk_widget_add_css_class (value, "dim-label");
      g_hash_table_insert (self->subtitles, g_strdup (number->id), g_strdup (reason));
    }
  adw_action_row_add_suffix (ADW_ACTION_ROW (row), value);
  g_hash_table_insert (self->values, g_strdup (number->id), value);
  g_hash_table_insert (self->titles, g_strdup (number->id), row);
  return row;
}

/* A name joined by dashes ("Clopper–Pearson") that a narrow row wraps before or after,
 * never at the dash itself: a word joiner (U+2060) follows each en dash and hyphen. */
static char *
unbreakable_name (const char *name)
{
  GString *out = g_string_new (NULL);

  for (const char *p = name; *p; p = g_utf8_next_char (p))
    {
      gunichar c = g_utf8_get_char (p);

      g_string_append_unichar (out, c);
      if (c == 0x2013 || c == '-')
        g_string_append_unichar (out, 0x2060);
    }
  return g_string_free (out, FALSE);
}

/* "95% confidence interval (Clopper–Pearson)", "95% credible interval of δ (equal-tailed)",
 * "95% confidence interval of the odds ratio (Woolf)": the kind from the limits' measure,
 * what it is of and the method from the core; for an interval the core gives neither,
 * "95% " and its lower limit's label without ", lower". */
static char *
interval_title (const TfAnalysis *analysis, const TfNumber *low)
{
  /* up to 8 decimals of the percentage, no trailing zeros: 95, 99.9, 99.99999 */
  double percent = round (analysis->level * 100.0 * 1e8) / 1e8;
  g_autofree char *level_text = g_strdup_printf ("%.10g", percent);
  g_autofree char *method = NULL;
  g_autofree char *kind_text = NULL;

  if (!low->method && !low->of)
    {
      g_autofree char *label = g_strdup (low->label ? low->label : low->id);
      char *cut = g_strrstr (label, _(", lower"));

      if (cut)
        *cut = '\0';
      /* TRANSLATORS: result row: %s is the level in percent, then an interval's name */
      return g_strdup_printf (_("%s%% %s"), level_text, label);
    }
  method = low->method ? unbreakable_name (low->method) : NULL;
  kind_text = low->measure == TF_MEASURE_CREDIBLE_LIMIT
    /* TRANSLATORS: result row: %s is the level in percent */
    ? g_strdup_printf (_("%s%% credible interval"), level_text)
    /* TRANSLATORS: result row: %s is the level in percent */
    : g_strdup_printf (_("%s%% confidence interval"), level_text);
  if (low->of && method)
    /* TRANSLATORS: result row: an interval, what it is of, and its method in brackets */
    return g_strdup_printf (_("%s of %s (%s)"), kind_text, low->of, method);
  if (low->of)
    /* TRANSLATORS: result row: an interval and what it is of */
    return g_strdup_printf (_("%s of %s"), kind_text, low->of);
  /* TRANSLATORS: result row: an interval and its method in brackets */
  return g_strdup_printf (_("%s (%s)"), kind_text, method);
}

static const char *
reason_of (const TfNumber *number)
{
  return number->reason ? number->reason : _("not defined for this input");
}

/* One row for both limits: "0.8012 – 0.8153"; a limit that is not defined shows
 * "not defined" and the row's subtitle says why. */
static GtkWidget *
interval_row_new (TfResultList *self, const TfAnalysis *analysis, const TfNumber *low,
                  const TfNumber *high)
{
  g_autofree char *title = interval_title (analysis, low);
  g_autofree char *low_text = tf_number_format (low);
  g_autofree char *high_text = tf_number_format (high);
  gboolean low_ok = low->status == TF_STATUS_OK, high_ok = high->status == TF_STATUS_OK;
  g_autofree char *text = NULL;
  g_autofree char *description = NULL;
  g_autofree char *reason = NULL;
  GtkWidget *row = number_row_new (title);
  GtkWidget *value;

  if (!low_ok && !high_ok)
    text = g_strdup (low_text);       /* "not defined", once */
  else
    /* TRANSLATORS: an interval: lower limit, en dash, upper limit */
    text = g_strdup_printf (_("%s – %s"), low_text, high_text);
  value = value_label_new (text);

  /* TRANSLATORS: accessible description of an interval row: both limits, each named */
  description = g_strdup_printf (_("Lower limit %s, upper limit %s"), low_text, high_text);

  if (!low_ok && !high_ok)
    {
      if (g_strcmp0 (reason_of (low), reason_of (high)) == 0)
        /* TRANSLATORS: both limits of an interval are not defined; %s says why */
        reason = g_strdup_printf (_("Neither limit is defined: %s"), reason_of (low));
      else
        /* TRANSLATORS: both limits of an interval are not defined, each for its reason */
        reason = g_strdup_printf (_("Lower limit not defined: %s\nUpper limit not defined: %s"),
                                  reason_of (low), reason_of (high));
    }
  else if (!low_ok)
    /* TRANSLATORS: the lower limit of an interval is not defined; %s says why */
    reason = g_strdup_printf (_("Lower limit not defined: %s"), reason_of (low));
  else if (!high_ok)
    /* TRANSLATORS: the upper limit of an interval is not defined; %s says why */
    reason = g_strdup_printf (_("Upper limit not defined: %s"), reason_of (high));

  if (reason)
    {
      g_autofree char *full = g_strdup_printf ("%s. %s", description, reason);

      adw_action_row_set_subtitle (ADW_ACTION_ROW (row), reason);
      gtk_widget_set_tooltip_text (value, reason);
      gtk_widget_set_tooltip_text (row, reason);
      if (!low_ok && !high_ok)
        gtk_widget_add_css_class (value, "dim-label");
      g_hash_table_insert (self->subtitles, g_strdup (low->id), g_strdup (reason));
      g_hash_table_insert (self->subtitles, g_strdup (high->id), g_strdup (reason));
      g_free (description);
      description = g_steal_pointer (&full);
    }
  gtk_accessible_update_property (GTK_ACCESSIBLE (row),
                                  GTK_ACCESSIBLE_PROPERTY_DESCRIPTION, description, -1);
  adw_action_row_add_suffix (ADW_ACTION_ROW (row), value);
  g_hash_table_insert (self->values, g_strdup (low->id), value);
  g_hash_table_insert (self->values, g_strdup (high->id), value);
  g_hash_table_insert (self->titles, g_strdup (low->id), row);
  g_hash_table_insert (self->titles, g_strdup (high->id), row);
  g_hash_table_insert (self->descriptions, g_strdup (low->id), g_strdup (description));
  g_hash_table_insert (self->descriptions, g_strdup (high->id), g_strdup (description));
  return row;
}

/* When id is a limit of an interval whose other limit results also hold: its lower and
 * upper limit. */
static gboolean
interval_of (const TfResults *results, const char *id, const TfNumber **low,
             const TfNumber **high)
{
  g_autofree char *stem = NULL;
  g_autofree char *low_id = NULL, *high_id = NULL;

  if (id && g_str_has_suffix (id, "_low"))
    stem = g_strndup (id, strlen (id) - strlen ("_low"));
  else if (id && g_str_has_suffix (id, "_high"))
    stem = g_strndup (id, strlen (id) - strlen ("_high"));
  else
    return FALSE;
  low_id = g_strconcat (stem, "_low", NULL);
  high_id = g_strconcat (stem, "_high", NULL);
  *low = tf_results_lookup (results, low_id);
  *high = tf_results_lookup (results, high_id);
  return *low && *high;
}

static gboolean
same_number (const TfNumber *a, const TfNumber *b)
{
  return a->status == b->status && a->status == TF_STATUS_OK && a->value == b->value;
}

/* An interval that repeats one already shown (two proportions' diff_ci is its ci) is
 * not shown twice: its ids read back the row already there. */
static gboolean
alias_shown_interval (TfResultList *self, const TfResults *results, const TfNumber *low,
                      const TfNumber *high)
{
  for (guint i = 0; i < results->numbers->len; i++)
    {
      const TfNumber *other_low = g_ptr_array_index (results->numbers, i);
      const TfNumber *a, *b;
      GtkLabel *value;

      if (other_low == low || !g_hash_table_contains (self->values, other_low->id)
          || !interval_of (results, other_low->id, &a, &b) || a != other_low
          || !same_number (a, low) || !same_number (b, high))
        continue;
      value = g_hash_table_lookup (self->values, a->id);
      g_hash_table_insert (self->values, g_strdup (low->id), value);
      g_hash_table_insert (self->values, g_strdup (high->id), value);
      g_hash_table_insert (self->titles, g_strdup (low->id), g_hash_table_lookup (self->titles, a->id));
      g_hash_table_insert (self->titles, g_strdup (high->id), g_hash_table_lookup (self->titles, a->id));
      if (g_hash_table_contains (self->descriptions, a->id))
        {
          g_hash_table_insert (self->descriptions, g_strdup (low->id),
                               g_strdup (g_hash_table_lookup (self->descriptions, a->id)));
          g_hash_table_insert (self->descriptions, g_strdup (high->id),
                               g_strdup (g_hash_table_lookup (self->descriptions, a->id)));
        }
      return TRUE;
    }
  return FALSE;
}

void
tf_result_list_set_results (TfResultList *self, const TfAnalysis *analysis,
                            const TfResults *results)
{
  g_return_if_fail (TF_IS_RESULT_LIST (self));
  g_return_if_fail (analysis != NULL);
  g_return_if_fail (results != NULL);

  remove_rows (self);
  for (guint i = 0; i < results->numbers->len; i++)
    {
      const TfNumber *number = g_ptr_array_index (results->numbers, i);
      TfResultSection section = tf_result_section_for_number (number);
      const TfNumber *low, *high;
      GtkWidget *row;

      if (interval_of (results, number->id, &low, &high))
        {
          /* the row goes where the first of its limits is */
          if (g_hash_table_contains (self->values, number->id)
              || alias_shown_interval (self, results, low, high))
            continue;
          row = interval_row_new (self, analysis, low, high);
        }
      else
        row = row_new (self, number);

      adw_preferences_group_add (self->groups[section], row);
      g_ptr_array_add (self->rows[section], row);
    }
  for (guint s = 0; s < G_N_ELEMENTS (self->groups); s++)
    gtk_widget_set_visible (GTK_WIDGET (self->groups[s]), self->rows[s]->len > 0);
  gtk_stack_set_visible_child_name (self->stack, "results");
}

void
tf_result_list_clear (TfResultList *self, const char *title, const char *description)
{
  g_return_if_fail (TF_IS_RESULT_LIST (self));

  remove_rows (self);
  gtk_label_set_text (self->placeholder_title, title ? title : _("No Results"));
  gtk_label_set_text (self->placeholder_description, description ? description : "");
  gtk_widget_set_visible (GTK_WIDGET (self->placeholder_description), description && *description);
  gtk_stack_set_visible_child_name (self->stack, "placeholder");
}

gboolean
tf_result_list_has_results (TfResultList *self)
{
  g_return_val_if_fail (TF_IS_RESULT_LIST (self), FALSE);
  return g_hash_table_size (self->values) > 0;
}

const char *
tf_result_list_get_value_text (TfResultList *self, const char *id)
{
  GtkLabel *label;

  g_return_val_if_fail (TF_IS_RESULT_LIST (self), NULL);
  label = g_hash_table_lookup (self->values, id);
  return label ? gtk_label_get_text (label) : NULL;
}

const char *
tf_result_list_get_subtitle (TfResultList *self, const char *id)
{
  g_return_val_if_fail (TF_IS_RESULT_LIST (self), NULL);
  return g_hash_table_lookup (self->subtitles, id);
}

const char *
tf_result_list_get_title (TfResultList *self, const char *id)
{
  AdwPreferencesRow *row;

  g_return_val_if_fail (TF_IS_RESULT_LIST (self), NULL);
  row = g_hash_table_lookup (self->titles, id);
  return row ? adw_preferences_row_get_title (row) : NULL;
}

const char *
tf_result_list_get_description (TfResultList *self, const char *id)
{
  g_return_val_if_fail (TF_IS_RESULT_LIST (self), NULL);
  return g_hash_table_lookup (self->descriptions, id);
}

static void
tf_result_list_dispose (GObject *object)
{
  tf_widget_dispose_template (GTK_WIDGET (object), TF_TYPE_RESULT_LIST);
  G_OBJECT_CLASS (tf_result_list_parent_class)->dispose (object);
}

static void
tf_result_list_finalize (GObject *object)
{
  TfResultList *self = TF_RESULT_LIST (object);

  for (guint s = 0; s < G_N_ELEMENTS (self->rows); s++)
    g_clear_pointer (&self->rows[s], g_ptr_array_unref);
  g_clear_pointer (&self->values, g_hash_table_unref);
  g_clear_pointer (&self->titles, g_hash_table_unref);
  g_clear_pointer (&self->subtitles, g_hash_table_unref);
  g_clear_pointer (&self->descriptions, g_hash_table_unref);
  G_OBJECT_CLASS (tf_result_list_parent_class)->finalize (object);
}

static void
tf_result_list_class_init (TfResultListClass *klass)
{
  GObjectClass *object_class = G_OBJECT_CLASS (klass);
  GtkWidgetClass *widget_class = GTK_WIDGET_CLASS (klass);

  object_class->dispose = tf_result_list_dispose;
  object_class->finalize = tf_result_list_finalize;

  gtk_widget_class_set_template_from_resource (widget_class,
                                               "/org/twofold/Twofold/ui/tf-result-list.ui");
  gtk_widget_class_bind_template_child (widget_class, TfResultList, stack);
  gtk_widget_class_bind_template_child (widget_class, TfResultList, placeholder_title);
  gtk_widget_class_bind_template_child (widget_class, TfResultList, placeholder_description);
  gtk_widget_class_bind_template_child_full (widget_class, "classical_group", FALSE,
                                             G_STRUCT_OFFSET (TfResultList, groups[TF_RESULT_SECTION_CLASSICAL]));
  gtk_widget_class_bind_template_child_full (widget_class, "bayesian_group", FALSE,
                                             G_STRUCT_OFFSET (TfResultList, groups[TF_RESULT_SECTION_BAYESIAN]));
  gtk_widget_class_bind_template_child_full (widget_class, "bounds_group", FALSE,
                                             G_STRUCT_OFFSET (TfResultList, groups[TF_RESULT_SECTION_BOUNDS]));
  gtk_widget_class_set_layout_manager_type (widget_class, GTK_TYPE_BIN_LAYOUT);
  gtk_widget_class_set_css_name (widget_class, "tf-result-list");
}

static void
tf_result_list_init (TfResultList *self)
{
  gtk_widget_init_template (GTK_WIDGET (self));
  for (guint s = 0; s < G_N_ELEMENTS (self->rows); s++)
    self->rows[s] = g_ptr_array_new ();
  self->values = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL);
  self->titles = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, NULL);
  self->subtitles = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, g_free);
  self->descriptions = g_hash_table_new_full (g_str_hash, g_str_equal, g_free, g_free);
}

GtkWidget *
tf_result_list_new (void)
{
  return g_object_new (TF_TYPE_RESULT_LIST, NULL);
}
