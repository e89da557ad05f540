/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-form-page.c: the page of one design in TfAnalysisForm. Every field of the design's
 * class (TfDesignClass.fields) gets the same kind of row: label, input, hint, and the problem's message under
 * it; two fields marked as a pair share a row. Numbers parse with g_ascii_strtod, so the
 * decimal mark is '.' as in the analysis file, whatever the locale.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include "tf-design.h"
#include "tf-form-page.h"
#include "tf-analysis-file.h"

static const char *const section_titles[TF_N_SECTIONS] = {
  N_("Data"), N_("Null Hypothesis"), N_("Alternative Hypothesis"), N_("Models"), N_("Options"),
};

static void *
slot (TfAnalysis *analysis, gsize offset)
{
  return G_STRUCT_MEMBER_P (analysis, offset);
}

gboolean
tf_form_page_get_raw (const TfFormPage *page)
{
  return page->values_button && gtk_toggle_button_get_active (page->values_button);
}

void
tf_form_page_set_raw (TfFormPage *page, gboolean raw)
{
  if (page->values_button)
    gtk_toggle_button_set_active (raw ? page->values_button : page->summaries_button, TRUE);
}

gboolean
tf_form_page_field_shown (const TfFormPage *page, const TfFormFieldWidgets *field)
{
  if (field->info->shown == TF_SHOWN_ALWAYS)
    return TRUE;
  return (field->info->shown == TF_SHOWN_VALUES) == tf_form_page_get_raw (page);
}

TfFormFieldWidgets *
tf_form_page_find (TfFormPage *page, const char *group, const char *key)
{
  for (guint i = 0; i < page->klass->n_fields; i++)
    if (g_strcmp0 (page->fields[i].info->group, group) == 0
        && g_strcmp0 (page->fields[i].info->key, key) == 0)
      return &page->fields[i];
  return NULL;
}

static void
update_visibility (TfFormPage *page)
{
  for (guint i = 0; i < page->klass->n_fields; i++)
    {
      TfFormFieldWidgets *field = &page->fields[i];

      gtk_widget_set_visible (field->row, tf_form_page_field_shown (page, field));
      if (field->toggle)
        gtk_widget_set_sensitive (field->input,
                                  gtk_switch_get_active (GTK_SWITCH (field->toggle)));
    }
}

static void
on_edited (TfFormPage *page)
{
  page->changed (page->data);
}

/* A switch that shows or enables fields. */
static void
on_toggled (TfFormPage *page)
{
  update_visibility (page);
  page->changed (page->data);
}

void
tf_form_page_clear (TfFormPage *page)
{
  g_clear_pointer (&page->fields, g_free);
}

/* Widgets of one field */

static GtkWidget *
caption_new (const char *text, const char *style)
{
  GtkWidget *label = gtk_label_new (text);

  gtk_label_set_xalign (GTK_LABEL (label), 0);
  gtk_label_set_wrap (GTK_LABEL (label), TRUE);
  gtk_label_set_max_width_chars (GTK_LABEL (label), 30);
  gtk_widget_add_css_class (label, "caption");
  gtk_widget_add_css_class (label, style);
  return label;
}

static GtkWidget *
entry_new (const TfFormField *info)
{
  GtkWidget *entry = gtk_entry_new ();

  gtk_entry_set_input_purpose (GTK_ENTRY (entry), info->kind == TF_FIELD_COUNT
                               ? GTK_INPUT_PURPOSE_DIGITS : GTK_INPUT_PURPOSE_NUMBER);
  gtk_editable_set_width_chars (GTK_EDITABLE (entry), 8);
  gtk_widget_set_hexpand (entry, TRUE);
  return entry;
}

static GtkWidget *
choice_new (const TfFormField *info)
{
  g_autoptr (GtkStringList) model = gtk_string_list_new (NULL);

  for (guint i = 0; info->choices[i]; i++)
    gtk_string_list_append (model, _(info->choices[i]));
  return gtk_drop_down_new (G_LIST_MODEL (g_steal_pointer (&model)), NULL);
}

/* A switch at the end of a field's label line. */
static GtkWidget *
head_switch_new (GtkWidget *head)
{
  GtkWidget *toggle = gtk_switch_new ();

  gtk_widget_set_valign (toggle, GTK_ALIGN_CENTER);
  gtk_box_append (GTK_BOX (head), toggle);
  return toggle;
}

/* Raw values: a text view that wraps, in a scrolled frame. */
static void
values_input_new (TfFormPage *page, TfFormFieldWidgets *field)
{
  field->input = gtk_text_view_new ();
  gtk_text_view_set_wrap_mode (GTK_TEXT_VIEW (field->input), GTK_WRAP_WORD_CHAR);
  gtk_text_view_set_accepts_tab (GTK_TEXT_VIEW (field->input), FALSE);
  gtk_text_view_set_input_purpose (GTK_TEXT_VIEW (field->input), GTK_INPUT_PURPOSE_NUMBER);
  gtk_text_view_set_top_margin (GTK_TEXT_VIEW (field->input), 6);
  gtk_text_view_set_bottom_margin (GTK_TEXT_VIEW (field->input), 6);
  gtk_text_view_set_left_margin (GTK_TEXT_VIEW (field->input), 8);
  gtk_text_view_set_right_margin (GTK_TEXT_VIEW (field->input), 8);
  field->frame = gtk_scrolled_window_new ();
  gtk_scrolled_window_set_policy (GTK_SCROLLED_WINDOW (field->frame),
                                  GTK_POLICY_NEVER, GTK_POLICY_AUTOMATIC);
  gtk_scrolled_window_set_min_content_height (GTK_SCROLLED_WINDOW (field->frame), 96);
  gtk_scrolled_window_set_child (GTK_SCROLLED_WINDOW (field->frame), field->input);
  gtk_widget_add_css_class (field->frame, "frame");
  gtk_widget_add_css_class (field->frame, "tf-values");
  gtk_widget_set_hexpand (field->frame, TRUE);
  g_signal_connect_swapped (gtk_text_view_get_buffer (GTK_TEXT_VIEW (field->input)),
                            "changed", G_CALLBACK (on_edited), page);
}

/* The label line, the input, the hint and the message of a field, in column col of
 * grid (a lone field spans both columns); messages go full width below both. */
static void
field_build (TfFormPage *page, TfFormFieldWidgets *field, GtkGrid *grid, int col, int span,
             int message_row)
{
  const TfFormField *info = field->info;
  GtkWidget *head = gtk_box_new (GTK_ORIENTATION_HORIZONTAL, 6);
  GtkWidget *target;

  field->row = GTK_WIDGET (grid);
  field->label = gtk_label_new_with_mnemonic (_(info->label));
  gtk_label_set_xalign (GTK_LABEL (field->label), 0);
  gtk_label_set_wrap (GTK_LABEL (field->label), TRUE);
  gtk_widget_set_hexpand (field->label, TRUE);
  gtk_box_append (GTK_BOX (head), field->label);
  field->hint = caption_new (_(info->hint), "dim-label");
  field->message = caption_new ("", "error");
  gtk_widget_add_css_class (field->message, "tf-field-message");
  gtk_widget_set_visible (field->message, FALSE);
  gtk_accessible_update_property (GTK_ACCESSIBLE (field->message),
                                  GTK_ACCESSIBLE_PROPERTY_LABEL, _("Problem"), -1);

  switch (info->kind)
    {
    case TF_FIELD_LIST:
      values_input_new (page, field);
      break;
    case TF_FIELD_CHOICE:
      field->input = choice_new (info);
      g_signal_connect_swapped (field->input, "notify::selected", G_CALLBACK (on_edited), page);
      break;
    case TF_FIELD_SWITCH:
      field->input = head_switch_new (head);
      g_signal_connect_swapped (field->input, "notify::active", G_CALLBACK (on_edited), page);
      break;
    case TF_FIELD_OPTIONAL_NUMBER:
      field->toggle = head_switch_new (head);
      gtk_accessible_update_relation (GTK_ACCESSIBLE (field->toggle),
                                      GTK_ACCESSIBLE_RELATION_LABELLED_BY, field->label, NULL,
                                      -1);
      g_signal_connect_swapped (field->toggle, "notify::active", G_CALLBACK (on_toggled),
                                page);
      G_GNUC_FALLTHROUGH;
    case TF_FIELD_COUNT:
    case TF_FIELD_NUMBER:
    case TF_FIELD_POSITIVE:
    case TF_FIELD_PROBABILITY:
    default:
      field->input = entry_new (info);
      g_signal_connect_swapped (field->input, "changed", G_CALLBACK (on_edited), page);
      break;
    }

  target = info->kind == TF_FIELD_OPTIONAL_NUMBER ? field->toggle : field->input;
  gtk_label_set_mnemonic_widget (GTK_LABEL (field->label), target);
  gtk_accessible_update_relation (GTK_ACCESSIBLE (field->input),
                                  GTK_ACCESSIBLE_RELATION_LABELLED_BY, field->label, NULL,
                                  GTK_ACCESSIBLE_RELATION_DESCRIBED_BY, field->hint, NULL,
                                  -1);

  gtk_grid_attach (grid, head, col, 0, span, 1);
  if (info->kind != TF_FIELD_SWITCH)
    gtk_grid_attach (grid, field->frame ? field->frame : field->input, col, 1, span, 1);
  gtk_grid_attach (grid, field->hint, col, 2, span, 1);
  gtk_grid_attach (grid, field->message, 0, message_row, 2, 1);
}

static GtkWidget *
heading_new (const char *text, gboolean first)
{
  GtkWidget *label = gtk_label_new (text);

  gtk_label_set_xalign (GTK_LABEL (label), 0);
  gtk_widget_add_css_class (label, "heading");
  gtk_widget_set_margin_top (label, first ? 6 : 12);
  return label;
}

/* The two ways of giving a sample, as two linked buttons. */
static GtkWidget *
modes_new (TfFormPage *page)
{
  GtkWidget *box = gtk_box_new (GTK_ORIENTATION_HORIZONTAL, 0);
  GtkWidget *summaries = gtk_toggle_button_new_with_mnemonic (_("Su_mmaries"));
  GtkWidget *values = gtk_toggle_button_new_with_mnemonic (_("Ra_w values"));

  gtk_widget_add_css_class (box, "linked");
  gtk_widget_set_hexpand (summaries, TRUE);
  gtk_widget_set_hexpand (values, TRUE);
  gtk_widget_set_tooltip_text (summaries, _("Give each sample’s size, mean and SD"));
  gtk_widget_set_tooltip_text (values, _("Give every observation; Twofold summarises them"));
  gtk_toggle_button_set_group (GTK_TOGGLE_BUTTON (values), GTK_TOGGLE_BUTTON (summaries));
  gtk_toggle_button_set_active (GTK_TOGGLE_BUTTON (summaries), TRUE);
  gtk_box_append (GTK_BOX (box), summaries);
  gtk_box_append (GTK_BOX (box), values);
  gtk_accessible_update_property (GTK_ACCESSIBLE (box), GTK_ACCESSIBLE_PROPERTY_LABEL,
                                  _("How the data are given"), -1);
  page->summaries_button = GTK_TOGGLE_BUTTON (summaries);
  page->values_button = GTK_TOGGLE_BUTTON (values);
  g_signal_connect_swapped (values, "notify::active", G_CALLBACK (on_toggled), page);
  return box;
}

void
tf_form_page_build (TfFormPage *page, TfDesign design, void (*changed) (gpointer),
                    gpointer data)
{
  int section = -1;

  page->changed = changed;
  page->data = data;

  page->klass = tf_design_class (design);
  page->fields = g_new0 (TfFormFieldWidgets, page->klass->n_fields);
  page->box = gtk_box_new (GTK_ORIENTATION_VERTICAL, 8);
  for (guint i = 0; i < page->klass->n_fields; i++)
    {
      const TfFormField *info = &page->klass->fields[i];
      GtkGrid *grid = GTK_GRID (gtk_grid_new ());
      gboolean pair = info->pair && i + 1 < page->klass->n_fields;

      if ((int) info->section != section)
        {
          section = (int) info->section;
          gtk_box_append (GTK_BOX (page->box), heading_new (_(section_titles[section]),
                                                            section == 0));
          if (section == TF_SECTION_DATA && page->klass->n_samples > 0)
            gtk_box_append (GTK_BOX (page->box), modes_new (page));
        }
      gtk_grid_set_column_spacing (grid, 12);
      gtk_grid_set_row_spacing (grid, 4);
      gtk_grid_set_column_homogeneous (grid, TRUE);
      page->fields[i].info = info;
      field_build (page, &page->fields[i], grid, 0, pair ? 1 : 2, 3);
      if (pair)
        {
          page->fields[i + 1].info = &page->klass->fields[i + 1];
          field_build (page, &page->fields[i + 1], grid, 1, 1, 4);
          i++;
        }
      gtk_box_append (GTK_BOX (page->box), GTK_WIDGET (grid));
    }
  update_visibility (page);
}

/* Filling and reading */

void
tf_form_field_set_text (TfFormFieldWidgets *field, const char *text)
{
  if (GTK_IS_TEXT_VIEW (field->input))
    gtk_text_buffer_set_text (gtk_text_view_get_buffer (GTK_TEXT_VIEW (field->input)), text, -1);
  else if (GTK_IS_EDITABLE (field->input))
    gtk_editable_set_text (GTK_EDITABLE (field->input), text);
}

char *
tf_form_field_get_text (TfFormFieldWidgets *field)
{
  if (GTK_IS_TEXT_VIEW (field->input))
    {
      GtkTextBuffer *buffer = gtk_text_view_get_buffer (GTK_TEXT_VIEW (field->input));
      GtkTextIter start, end;

      gtk_text_buffer_get_bounds (buffer, &start, &end);
      return gtk_text_buffer_get_text (buffer, &start, &end, FALSE);
    }
  if (GTK_IS_EDITABLE (field->input))
    return g_strdup (gtk_editable_get_text (GTK_EDITABLE (field->input)));
  return NULL;
}

static guint
choice_index (const TfFormField *info, int value)
{
  for (guint i = 0; info->choices[i]; i++)
    if (info->choice_values[i] == value)
      return i;
  return 0;
}

static int
choice_get (const TfAnalysis *analysis, const TfFormField *info)
{
  return g_str_equal (info->key, "Direction") ? (int) analysis->direction : (int) analysis->prior;
}

static void
choice_set (TfAnalysis *analysis, const TfFormField *info, int value)
{
  if (g_str_equal (info->key, "Direction"))
    analysis->direction = (TfDirection) value;
  else
    analysis->prior = (TfPriorFamily) value;
}

void
tf_form_page_fill (TfFormPage *page, const TfAnalysis *analysis)
{
  TfAnalysis *a = (TfAnalysis *) analysis;    /* read only */
  gboolean raw = FALSE;

  for (guint i = 0; i < page->klass->n_fields; i++)
    {
      TfFormFieldWidgets *field = &page->fields[i];
      const TfFormField *info = field->info;

      switch (info->kind)
        {
        case TF_FIELD_LIST:
          {
            GArray *values = *(GArray **) slot (a, info->offset);
            g_autoptr (GString) text = g_string_new (NULL);

            for (guint k = 0; values && k < values->len; k++)
              {
                g_autofree char *item = tf_format_double (g_array_index (values, double, k));
                g_string_append_printf (text, k ? "; %s" : "%s", item);
              }
            raw = raw || values != NULL;
            tf_form_field_set_text (field, text->str);
          }
          break;
        case TF_FIELD_CHOICE:
          gtk_drop_down_set_selected (GTK_DROP_DOWN (field->input),
                                      choice_index (info, choice_get (a, info)));
          break;
        case TF_FIELD_SWITCH:
          gtk_switch_set_active (GTK_SWITCH (field->input), *(gboolean *) slot (a, info->offset));
          break;
        case TF_FIELD_OPTIONAL_NUMBER:
          {
            gboolean on = *(gboolean *) slot (a, info->flag_offset);
            g_autofree char *text = on ? tf_format_double (*(double *) slot (a, info->offset))
                                       : g_strdup ("");
            gtk_switch_set_active (GTK_SWITCH (field->toggle), on);
            tf_form_field_set_text (field, text);
          }
          break;
        case TF_FIELD_COUNT:
        case TF_FIELD_NUMBER:
        case TF_FIELD_POSITIVE:
        case TF_FIELD_PROBABILITY:
        default:
          {
            g_autofree char *text = tf_format_double (*(double *) slot (a, info->offset));
            tf_form_field_set_text (field, text);
          }
          break;
        }
    }
  tf_form_page_set_raw (page, raw);
  update_visibility (page);
}

/* The field's label without its mnemonic mark, translated: "Successes". */
static char *
form_field_name (const TfFormField *field)
{
  const char *label = _(field->label);
  GString *name = g_string_new (NULL);

  for (const char *p = label; *p; p++)
    if (*p != '_')
      g_string_append_c (name, *p);
  return g_string_free (name, FALSE);
}

/* Numbers as the file writes them: the whole text, finite, '.' as decimal mark. */
static gboolean
parse_number (const char *text, double *value)
{
  char *end = NULL;

  if (*text == '\0')
    return FALSE;
  *value = g_ascii_strtod (text, &end);
  return end != text && *end == '\0' && isfinite (*value)
         && g_ascii_strncasecmp (text, "0x", 2) != 0 && g_ascii_strncasecmp (text, "-0x", 3) != 0;
}

static gboolean
parse_field_number (TfFormFieldWidgets *field, double *value, GPtrArray *problems)
{
  g_autofree char *raw = tf_form_field_get_text (field);
  char *text = g_strstrip (raw);
  g_autofree char *name = form_field_name (field->info);

  if (*text == '\0')
    {
      /* TRANSLATORS: %s is a field of the form, e.g. "Trials" */
      g_ptr_array_add (problems, tf_problem_new (field->info->group, field->info->key,
                                                 _("%s: enter a number."), name));
      return FALSE;
    }
  if (!parse_number (text, value))
    {
      /* TRANSLATORS: first %s is a field of the form, second what was typed */
      g_ptr_array_add (problems, tf_problem_new (field->info->group, field->info->key,
                                                 _("%s: “%s” is not a number; write it with a point as decimal mark, for example 0.5."),
                                                 name, text));
      return FALSE;
    }
  return TRUE;
}

/* Raw values: numbers with ';', spaces or new lines between them. */
static GArray *
parse_field_list (TfFormFieldWidgets *field, GPtrArray *problems)
{
  g_autofree char *text = tf_form_field_get_text (field);
  g_auto (GStrv) items = g_strsplit_set (text, "; \t\r\n", -1);
  g_autoptr (GArray) values = g_array_new (FALSE, FALSE, sizeof (double));
  g_autofree char *name = form_field_name (field->info);

  for (guint i = 0; items[i]; i++)
    {
      double v;

      if (*items[i] == '\0')
        continue;
      if (!parse_number (items[i], &v))
        {
          /* TRANSLATORS: %s is a field, %u the item's place in the list, then the item */
          g_ptr_array_add (problems,
                           tf_problem_new (field->info->group, field->info->key,
                                           _("%s: value %u, “%s”, is not a number; write decimals with a point, for example 0.5."),
                                           name, values->len + 1, items[i]));
          return NULL;
        }
      g_array_append_val (values, v);
    }
  if (values->len == 0)
    {
      g_ptr_array_add (problems,
                       tf_problem_new (field->info->group, field->info->key,
                                       _("%s: enter the values, with ‘;’, spaces or new lines between them."),
                                       name));
      return NULL;
    }
  return g_steal_pointer (&values);
}

gboolean
tf_form_page_apply (TfFormPage *page, TfAnalysis *analysis, GPtrArray *problems)
{
  gboolean ok = TRUE, raw = tf_form_page_get_raw (page);
  g_autoptr (TfAnalysis) defaults = tf_analysis_new (page->klass->design);

  analysis->design = page->klass->design;
  analysis->null_kind = TF_NULL_POINT;
  analysis->prior = defaults->prior;    /* the design's family, when no field chooses it */
  /* only the chosen design's lists, and only when its raw values are shown */
  tf_analysis_set_values (&analysis->values, NULL);
  tf_analysis_set_values (&analysis->values_a, NULL);
  tf_analysis_set_values (&analysis->values_b, NULL);

  for (guint i = 0; i < page->klass->n_fields; i++)
    {
      TfFormFieldWidgets *field = &page->fields[i];
      const TfFormField *info = field->info;
      double value;

      if (!tf_form_page_field_shown (page, field))
        continue;
      switch (info->kind)
        {
        case TF_FIELD_LIST:
          {
            GArray *values = parse_field_list (field, problems);

            ok = ok && values != NULL;
            tf_analysis_set_values ((GArray **) slot (analysis, info->offset), values);
          }
          break;
        case TF_FIELD_CHOICE:
          {
            guint selected = gtk_drop_down_get_selected (GTK_DROP_DOWN (field->input));

            if (selected != GTK_INVALID_LIST_POSITION && info->choices[selected])
              choice_set (analysis, info, info->choice_values[selected]);
          }
          break;
        case TF_FIELD_SWITCH:
          *(gboolean *) slot (analysis, info->offset) = gtk_switch_get_active (GTK_SWITCH (field->input));
          break;
        case TF_FIELD_OPTIONAL_NUMBER:
          *(gboolean *) slot (analysis, info->flag_offset) = gtk_switch_get_active (GTK_SWITCH (field->toggle));
          if (!gtk_switch_get_active (GTK_SWITCH (field->toggle)))
            break;
          G_GNUC_FALLTHROUGH;
        case TF_FIELD_COUNT:
        case TF_FIELD_NUMBER:
        case TF_FIELD_POSITIVE:
        case TF_FIELD_PROBABILITY:
        default:
          if (parse_field_number (field, &value, problems))
            *(double *) slot (analysis, info->offset) = value;
          else
            ok = FALSE;
          break;
        }
    }
  if (raw)
    tf_analysis_summarise_values (analysis);
  return ok;
}
