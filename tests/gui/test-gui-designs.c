/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-gui-designs.c: a file of every design opens in the window with its fields filled and
 * the core's numbers shown; invalid two-sample input is marked; switching designs keeps
 * what can be kept; a file that cannot be written loses nothing.
 */
#include "test-gui.h"

static void
assert_form_text (TfAnalysisForm *form, const char *group, const char *key, const char *want)
{
  g_autofree char *text = tf_analysis_form_get_text (form, group, key);

  g_assert_cmpstr (text, ==, want);
}

/* Where the core computes the design: the list shows the core's numbers. Where it does
 * not: the design's problem under the chooser, and nothing stale anywhere. */
static void
assert_window_shows_core (TfWindow *window, const TfAnalysis *analysis)
{
  TfAnalysisForm *form = tf_window_get_form (window);

  if (tf_design_class (analysis->design))
    {
      g_autoptr (TfResults) expected = compute_or_fail (analysis);

      assert_window_shows_results (window, expected);
      g_assert_null (tf_analysis_form_get_message (form, "Analysis", "Design"));
    }
  else
    {
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();
      const TfProblem *problem;

      g_assert_false (tf_analysis_validate (analysis, problems));
      problem = tf_problem_list_find (problems, "Analysis", "Design");
      g_assert_nonnull (problem);
      g_assert_cmpstr (tf_analysis_form_get_message (form, "Analysis", "Design"), ==,
                       problem->message);
      assert_window_shows_nothing (window);
    }
}

/* A file of each design opens with its design chosen and its fields filled. */
static void
test_window_designs (void)
{
  TfWindow *window = tf_window_new (NULL);
  TfAnalysisForm *form = tf_window_get_form (window);
  g_autofree char *dir = g_dir_make_tmp ("twofold-gui-XXXXXX", NULL);

  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  for (guint c = 0; c < n_design_cases; c++)
    {
      const DesignCase *dc = &design_cases[c];
      g_autofree char *name = g_strdup_printf ("%s.twofold", tf_design_to_string (dc->design));
      g_autofree char *path = write_case (dir, name, dc->file);
      g_autoptr (GFile) file = g_file_new_for_path (path);
      g_autoptr (TfAnalysis) analysis = read_case (dc->file);
      g_autofree char *null_text = tf_format_double (analysis->null_value);
      g_autofree char *level_text = tf_format_double (analysis->level);

      g_test_message ("design %s", tf_design_to_string (dc->design));
      /* tf_analysis_load reads the designs the core computes; the others are read for
       * fixing, with their problems shown */
      if (tf_design_class (dc->design))
        {
          g_autoptr (GPtrArray) problems = tf_problem_list_new ();
          g_autoptr (TfAnalysis) loaded = tf_analysis_load (path, problems);
          g_assert_nonnull (loaded);
        }
      g_assert_true (tf_window_open_file (window, file));
      iterate ();
      g_assert_cmpint (tf_analysis_form_get_design (form), ==, dc->design);
      g_assert_cmpint (tf_window_get_analysis (window)->design, ==, dc->design);
      g_assert_cmpint (tf_analysis_form_get_raw_values (form), ==, dc->raw);
      g_assert_nonnull (strstr (tf_window_get_subtitle (window), tf_design_label (dc->design)));
      assert_not_modified (window, "Untitled Analysis");
      for (guint k = 0; k < G_N_ELEMENTS (dc->data) && dc->data[k].key; k++)
        {
          assert_form_text (form, "Data", dc->data[k].key, dc->data[k].shown);
          g_assert_null (tf_analysis_form_get_message (form, "Data", dc->data[k].key));
        }
      assert_form_text (form, "Null", "Value", null_text);
      assert_form_text (form, "Options", "Level", level_text);
      if (dc->design == TF_DESIGN_TWO_MEANS)
        g_assert_true (gtk_switch_get_active (GTK_SWITCH (tf_analysis_form_get_field (form, "Data", "EqualVariances"))));
      if (dc->design == TF_DESIGN_ONE_MEAN)
        {
          /* Prior=normal chose the second of the effect priors */
          g_assert_cmpuint (gtk_drop_down_get_selected (GTK_DROP_DOWN (tf_analysis_form_get_field (form, "Alternative", "Prior"))), ==, 1);
          g_assert_cmpint (tf_window_get_analysis (window)->prior, ==, TF_PRIOR_NORMAL);
          assert_form_text (form, "Alternative", "PriorScale", "0.5");
        }
      if (dc->design == TF_DESIGN_ONE_RATE)
        {
          assert_form_text (form, "Alternative", "PriorShape", "2");
          assert_form_text (form, "Alternative", "PriorRate", "400");
        }
      /* the window's analysis is the file's, field for field, as the core reads them */
      {
        g_autofree char *want = tf_analysis_to_data (analysis, NULL);
        g_autofree char *got = NULL;
        g_autoptr (TfAnalysis) shown = tf_analysis_copy (tf_window_get_analysis (window));

        g_clear_pointer (&shown->source, g_key_file_unref);
        g_clear_pointer (&analysis->source, g_key_file_unref);
        got = tf_analysis_to_data (shown, NULL);
        g_assert_cmpstr (got, ==, want);
      }
      assert_window_shows_core (window, analysis);
      g_unlink (path);
    }
  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
  g_rmdir (dir);
}

/* A text that is not a number, in a two-sample design: the field is marked and says so;
 * a list item that is not a number names its place in the list. */
static void
test_window_two_sample_invalid (void)
{
  TfWindow *window = tf_window_new (NULL);
  TfAnalysisForm *form = tf_window_get_form (window);
  GtkWidget *trials_b;

  tf_window_open_demo (window);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));

  tf_analysis_form_set_design (form, TF_DESIGN_TWO_PROPORTIONS);
  iterate ();
  g_assert_true (tf_window_get_modified (window));
  g_assert_nonnull (strstr (tf_window_get_subtitle (window), "Two proportions"));
  type_into (window, "Data", "SuccessesA", "18");
  type_into (window, "Data", "TrialsA", "40");
  type_into (window, "Data", "SuccessesB", "9");
  type_into (window, "Data", "TrialsB", "3B");
  trials_b = tf_analysis_form_get_field (form, "Data", "TrialsB");
  assert_field_says (form, "TrialsB", "Trials in B", "3B", NULL);
  g_assert_false (gtk_widget_has_css_class (tf_analysis_form_get_field (form, "Data", "TrialsA"), "error"));
  g_assert_null (tf_analysis_form_get_message (form, "Data", "TrialsA"));
  assert_window_shows_nothing (window);

  /* put right: the mark goes */
  type_into (window, "Data", "TrialsB", "38");
  g_assert_false (gtk_widget_has_css_class (trials_b, "error"));
  g_assert_null (tf_analysis_form_get_message (form, "Data", "TrialsB"));
  g_assert_cmpfloat (tf_window_get_analysis (window)->trials_b, ==, 38);
  assert_window_shows_core (window, tf_window_get_analysis (window));

  /* two means, raw values: the third value of B is not a number */
  tf_analysis_form_set_design (form, TF_DESIGN_TWO_MEANS);
  tf_analysis_form_set_raw_values (form, TRUE);
  iterate ();
  type_into (window, "Data", "ValuesA", "5.1; 4.8\n5.6 5.0");
  type_into (window, "Data", "ValuesB", "4.2;4.6;4,4;4.9");
  assert_field_says (form, "ValuesB", "Values of B", "value 3", "4,4", NULL);
  g_assert_null (tf_analysis_form_get_message (form, "Data", "ValuesA"));
  g_assert_false (tf_result_list_has_results (tf_window_get_result_list (window)));

  /* every separator the hint names: ';', spaces, new lines; summarised by the core */
  type_into (window, "Data", "ValuesB", "4.2;4.6 4.4\n4.9");
  g_assert_null (tf_analysis_form_get_message (form, "Data", "ValuesB"));
  {
    const TfAnalysis *shown = tf_window_get_analysis (window);
    g_autoptr (TfAnalysis) expected = tf_analysis_copy (shown);

    g_assert_nonnull (shown->values_a);
    g_assert_cmpuint (shown->values_a->len, ==, 4);
    g_assert_cmpuint (shown->values_b->len, ==, 4);
    g_assert_cmpfloat (g_array_index (shown->values_b, double, 2), ==, 4.4);
    tf_analysis_summarise_values (expected);
    g_assert_cmpfloat (shown->n_b, ==, 4);
    g_assert_cmpfloat (shown->mean_b, ==, expected->mean_b);
    assert_window_shows_core (window, shown);
  }

  /* the summaries again: the lists are not part of the analysis */
  tf_analysis_form_set_raw_values (form, FALSE);
  iterate ();
  g_assert_null (tf_window_get_analysis (window)->values_a);
  g_assert_null (tf_window_get_analysis (window)->values_b);

  tf_window_set_analysis (window, tf_window_get_analysis (window), NULL);  /* unmodified: closes unasked */
  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
}

/* Each design keeps what was typed in it; switching marks the analysis modified. */
static void
test_window_switch_keeps (void)
{
  TfWindow *window = tf_window_new (NULL);
  TfAnalysisForm *form = tf_window_get_form (window);
  g_autoptr (TfResults) demo_results = NULL;

  tf_window_open_demo (window);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  g_assert_false (tf_window_get_modified (window));

  type_into (window, "Data", "Successes", "9650");
  tf_analysis_form_set_design (form, TF_DESIGN_TWO_RATES);
  iterate ();
  g_assert_true (tf_window_get_modified (window));
  g_assert_cmpint (tf_window_get_analysis (window)->design, ==, TF_DESIGN_TWO_RATES);
  type_into (window, "Data", "EventsA", "17");
  type_into (window, "Data", "ExposureB", "not yet");   /* kept as typed, too */

  tf_analysis_form_set_design (form, TF_DESIGN_ONE_MEAN);
  tf_analysis_form_set_raw_values (form, TRUE);
  iterate ();
  type_into (window, "Data", "Values", "3.5; 4\n4.5");

  tf_analysis_form_set_design (form, TF_DESIGN_ONE_PROPORTION);
  iterate ();
  assert_form_text (form, "Data", "Successes", "9650");
  assert_form_text (form, "Data", "Trials", "12000");
  g_assert_cmpfloat (tf_window_get_analysis (window)->successes, ==, 9650);
  demo_results = compute_or_fail (tf_window_get_analysis (window));
  assert_window_shows_core (window, tf_window_get_analysis (window));
  g_assert_null (tf_analysis_form_get_message (form, "Analysis", "Design"));

  tf_analysis_form_set_design (form, TF_DESIGN_TWO_RATES);
  iterate ();
  assert_form_text (form, "Data", "EventsA", "17");
  assert_form_text (form, "Data", "ExposureB", "not yet");
  g_assert_nonnull (tf_analysis_form_get_message (form, "Data", "ExposureB"));
  g_assert_true (gtk_widget_has_css_class (tf_analysis_form_get_field (form, "Data", "ExposureB"), "error"));

  tf_analysis_form_set_design (form, TF_DESIGN_ONE_MEAN);
  iterate ();
  g_assert_true (tf_analysis_form_get_raw_values (form));
  assert_form_text (form, "Data", "Values", "3.5; 4\n4.5");
  g_assert_cmpuint (tf_window_get_analysis (window)->values->len, ==, 3);

  /* opening a file starts every design afresh */
  tf_window_open_demo (window);
  iterate ();
  tf_analysis_form_set_design (form, TF_DESIGN_TWO_RATES);
  iterate ();
  assert_form_text (form, "Data", "EventsA", "0");
  tf_window_open_demo (window);
  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
}

/* A design this version does not compute still saves, and opens again the same. */
static void
test_window_save_unavailable (void)
{
  TfWindow *window, *second;
  g_autofree char *dir = NULL, *path = NULL;
  g_autoptr (GFile) file = NULL;
  g_autoptr (TfAnalysis) analysis = NULL;
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  const DesignCase *dc = NULL;
  const char *key;

  for (guint c = 0; c < n_design_cases && !dc; c++)
    if (tf_design_class (design_cases[c].design) == NULL)
      dc = &design_cases[c];
  if (dc == NULL)
    {
      g_test_skip ("every design is computed in this version");
      return;
    }
  key = dc->data[0].key;
  dir = g_dir_make_tmp ("twofold-gui-XXXXXX", NULL);
  path = write_case (dir, "unavailable.twofold", dc->file);
  file = g_file_new_for_path (path);
  window = tf_window_new (NULL);
  g_assert_true (tf_window_open_file (window, file));
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  type_into (window, "Data", key, "13");
  g_assert_true (tf_window_get_modified (window));
  g_assert_true (gtk_widget_activate_action (GTK_WIDGET (window), "win.save", NULL));
  iterate ();
  g_assert_false (tf_window_get_modified (window));

  {
    g_autoptr (GKeyFile) key_file = g_key_file_new ();
    g_autofree char *saved = NULL;

    g_assert_true (g_key_file_load_from_file (key_file, path, G_KEY_FILE_NONE, NULL));
    analysis = tf_analysis_from_key_file (key_file, problems);
    g_assert_nonnull (analysis);
    g_assert_cmpint (analysis->design, ==, dc->design);
    saved = g_key_file_get_value (key_file, "Data", key, NULL);
    g_assert_cmpstr (saved, ==, "13");
  }

  second = tf_window_new (NULL);
  g_assert_true (tf_window_open_file (second, file));
  g_assert_cmpint (tf_analysis_form_get_design (tf_window_get_form (second)), ==, dc->design);
  assert_form_text (tf_window_get_form (second), "Data", key, "13");
  gtk_window_destroy (GTK_WINDOW (second));
  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
  g_unlink (path);
  g_rmdir (dir);
}

void
add_design_tests (void)
{
  g_test_add_func ("/gui/window/designs", test_window_designs);
  g_test_add_func ("/gui/window/two-sample-invalid", test_window_two_sample_invalid);
  g_test_add_func ("/gui/window/switch-keeps", test_window_switch_keeps);
  g_test_add_func ("/gui/window/save-unavailable", test_window_save_unavailable);
}
