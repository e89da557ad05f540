/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-gui.c: the real Twofold window under Xvfb, driven as a user would: typing into the
 * form's entries and reading back what the result list shows; saving, opening, and the
 * unsaved-changes dialog. The designs, figures and result-list tests are in
 * test-gui-designs.c, test-gui-figures.c and test-gui-results.c.
 *
 * Expected values are not recalled numbers: each one is what tf_analysis_compute() and
 * tf_number_format() give for the same analysis, so the test checks that the window
 * shows the core's results, not that the core is right (that is the 'core' suite's job).
 */
#include "test-gui.h"

/* The demo, data/demo/seed-germination.twofold, bundled in the GResource, with its
 * numbers, figure and explanations; its results. */
static TfResults *
check_demo_shown (TfWindow *window)
{
  TfResultList *list = tf_window_get_result_list (window);
  TfResults *demo_results;

  g_assert_cmpfloat (tf_window_get_analysis (window)->trials, ==, 12000);
  g_assert_cmpfloat (tf_window_get_analysis (window)->successes, ==, 9700);
  demo_results = compute_or_fail (tf_window_get_analysis (window));
  assert_window_shows_results (window, demo_results);
  /* the demo's Level is 0.95; one proportion's confidence interval is Clopper–Pearson's.
   * A word joiner (U+2060) after the dash keeps the name whole when the row wraps. */
  g_assert_cmpstr (tf_result_list_get_title (list, "ci_low"), ==,
                   "95% confidence interval (Clopper–\u2060Pearson)");
  g_assert_cmpstr (tf_result_list_get_title (list, "cri_high"), ==,
                   "95% credible interval (equal-\u2060tailed)");
  g_assert_nonnull (tf_result_list_get_value_text (list, "p_value"));
  g_assert_nonnull (tf_result_list_get_value_text (list, "posterior_null"));
  return demo_results;
}

/* Type a new analysis in, field by field: the window's analysis is what was typed, and
 * the list shows its numbers, which moved from the demo's. The analysis typed. */
static TfAnalysis *
check_typed_analysis (TfWindow *window, const TfResults *demo_results)
{
  TfResultList *list = tf_window_get_result_list (window);
  TfAnalysis *expected;
  g_autoptr (TfResults) expected_results = NULL;
  const TfNumber *p, *post;
  g_autofree char *p_text = NULL;
  g_autofree char *post_text = NULL;

  type_into (window, "Data", "Trials", "100");
  type_into (window, "Data", "Successes", "62");
  type_into (window, "Null", "Value", "0.5");
  type_into (window, "Alternative", "PriorA", "2");
  type_into (window, "Alternative", "PriorB", "3");
  type_into (window, "Models", "PriorNull", "0.25");

  expected = tf_analysis_copy (tf_window_get_analysis (window));
  expected->trials = 100;
  expected->successes = 62;
  expected->null_value = 0.5;
  expected->prior_a = 2;
  expected->prior_b = 3;
  expected->prior_null = 0.25;
  g_assert_cmpfloat (tf_window_get_analysis (window)->successes, ==, 62);
  g_assert_cmpfloat (tf_window_get_analysis (window)->prior_null, ==, 0.25);
  expected_results = compute_or_fail (expected);
  g_assert_cmpstr (tf_window_get_visible_page (window), ==, "analysis");
  assert_list_shows (list, expected_results);
  p = tf_results_lookup (expected_results, "p_value");
  post = tf_results_lookup (expected_results, "posterior_null");
  p_text = tf_number_format (p);
  post_text = tf_number_format (post);
  g_assert_cmpstr (tf_result_list_get_value_text (list, "p_value"), ==, p_text);
  g_assert_cmpstr (tf_result_list_get_value_text (list, "posterior_null"), ==, post_text);
  /* and the numbers moved from the demo's */
  g_assert_true (fabs (p->value - tf_results_lookup (demo_results, "p_value")->value) > 1e-9);
  return expected;
}

/* More successes than trials (expected, with Successes 120): the field says what the
 * core says, and nothing stale is shown. */
static void
check_successes_over_trials (TfWindow *window, TfAnalysis *expected)
{
  TfAnalysisForm *form = tf_window_get_form (window);
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  const TfProblem *problem;

  type_into (window, "Data", "Successes", "120");
  g_assert_true (gtk_widget_has_css_class (GTK_WIDGET (tf_analysis_form_get_entry (form, "Data", "Successes")),
                                           "error"));
  expected->successes = 120;
  g_assert_false (tf_analysis_validate (expected, problems));
  problem = tf_problem_list_find (problems, "Data", "Successes");
  if (problem == NULL)
    problem = tf_problem_list_find (problems, "Data", "Trials");
  g_assert_nonnull (problem);
  g_assert_cmpstr (tf_analysis_form_get_message (form, problem->group, problem->key), ==,
                   problem->message);
  assert_window_shows_nothing (window);
}

/* A text that is not a number is a problem of its own field, named after it. */
static void
check_not_a_number (TfWindow *window)
{
  type_into (window, "Data", "Successes", "62");
  type_into (window, "Data", "Trials", "1OO");
  assert_field_says (tf_window_get_form (window), "Trials", "Trials", "1OO", NULL);
  g_assert_false (tf_result_list_has_results (tf_window_get_result_list (window)));
}

static void
test_window_edits (void)
{
  TfWindow *window = tf_window_new (NULL);
  TfAnalysisForm *form = tf_window_get_form (window);
  g_autoptr (TfResults) demo_results = NULL;
  g_autoptr (TfAnalysis) expected = NULL;
  g_autoptr (TfResults) expected_results = NULL;

  tf_window_open_demo (window);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));

  demo_results = check_demo_shown (window);
  expected = check_typed_analysis (window, demo_results);
  expected_results = compute_or_fail (expected);
  check_successes_over_trials (window, expected);
  check_not_a_number (window);

  /* Put it right: the marks go and the results come back. */
  type_into (window, "Data", "Trials", "100");
  g_assert_false (gtk_widget_has_css_class (GTK_WIDGET (tf_analysis_form_get_entry (form, "Data", "Successes")),
                                            "error"));
  g_assert_null (tf_analysis_form_get_message (form, "Data", "Successes"));
  g_assert_null (tf_analysis_form_get_message (form, "Data", "Trials"));
  assert_window_shows_results (window, expected_results);

  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
}

/* A file saved from the window opens again with the same fields. */
static void
test_window_save_and_open (void)
{
  TfWindow *window = tf_window_new (NULL);
  g_autofree char *dir = g_dir_make_tmp ("twofold-gui-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "saved.twofold", NULL);
  g_autoptr (GFile) file = g_file_new_for_path (path);
  g_autoptr (GError) error = NULL;
  g_autoptr (TfAnalysis) analysis = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);
  TfWindow *second;

  analysis->successes = 7;
  analysis->trials = 20;
  tf_analysis_set_title (analysis, "Seven of twenty");
  g_assert_true (tf_analysis_save (analysis, path, &error));
  g_assert_no_error (error);

  g_assert_true (tf_window_open_file (window, file));
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  g_assert_cmpstr (gtk_window_get_title (GTK_WINDOW (window)), ==, "Seven of twenty");
  g_assert_cmpstr (gtk_editable_get_text (tf_analysis_form_get_entry (tf_window_get_form (window),
                                                                        "Data", "Successes")), ==, "7");
  g_assert_cmpstr (tf_window_get_visible_page (window), ==, "analysis");

  type_into (window, "Data", "Successes", "8");
  g_assert_true (gtk_widget_activate_action (GTK_WIDGET (window), "win.save", NULL));
  iterate ();

  second = tf_window_new (NULL);
  g_assert_true (tf_window_open_file (second, file));
  g_assert_cmpfloat (tf_window_get_analysis (second)->successes, ==, 8);
  g_assert_cmpfloat (tf_window_get_analysis (second)->trials, ==, 20);

  gtk_window_destroy (GTK_WINDOW (second));
  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
  g_unlink (path);
  g_rmdir (dir);
}

static void
on_destroyed (GtkWidget *widget, gboolean *destroyed)
{
  *destroyed = TRUE;
}

/* Watches a window: *destroyed turns TRUE when it is destroyed. */
static void
watch_destroy (TfWindow *window, gboolean *destroyed)
{
  *destroyed = FALSE;
  g_signal_connect (window, "destroy", G_CALLBACK (on_destroyed), destroyed);
}

static void
assert_modified (TfWindow *window, const char *title)
{
  g_autofree char *marked = g_strdup_printf ("• %s", title);

  g_assert_true (tf_window_get_modified (window));
  g_assert_cmpstr (gtk_window_get_title (GTK_WINDOW (window)), ==, marked);
  /* in words too, not by the mark alone */
  g_assert_nonnull (strstr (tf_window_get_subtitle (window), "unsaved changes"));
}

/* The "Save changes?" dialog is up, asking about name. */
static AdwMessageDialog *
assert_asks_to_save (TfWindow *window, const char *name)
{
  AdwMessageDialog *dialog = tf_window_get_save_changes_dialog (window);
  g_autofree char *heading = g_strdup_printf ("Save changes to “%s”?", name);

  iterate ();
  g_assert_nonnull (dialog);
  g_assert_true (gtk_widget_get_visible (GTK_WIDGET (dialog)));
  g_assert_cmpstr (adw_message_dialog_get_heading (dialog), ==, heading);
  g_assert_true (adw_message_dialog_has_response (dialog, "cancel"));
  g_assert_true (adw_message_dialog_has_response (dialog, "discard"));
  g_assert_true (adw_message_dialog_has_response (dialog, "save"));
  g_assert_cmpstr (adw_message_dialog_get_default_response (dialog), ==, "cancel");
  g_assert_cmpstr (adw_message_dialog_get_close_response (dialog), ==, "cancel");
  g_assert_cmpint (adw_message_dialog_get_response_appearance (dialog, "save"), ==,
                   ADW_RESPONSE_SUGGESTED);
  g_assert_cmpint (adw_message_dialog_get_response_appearance (dialog, "discard"), ==,
                   ADW_RESPONSE_DESTRUCTIVE);
  return dialog;
}

/* Closes the error dialog over window whose heading starts so; fails when there is none. */
static void
destroy_error_dialog (TfWindow *window, const char *heading)
{
  GListModel *toplevels = gtk_window_get_toplevels ();  /* not owned */
  GtkWindow *found = NULL;

  for (guint i = 0; i < g_list_model_get_n_items (toplevels) && !found; i++)
    {
      g_autoptr (GtkWindow) toplevel = g_list_model_get_item (toplevels, i);

      if (ADW_IS_MESSAGE_DIALOG (toplevel)
          && gtk_window_get_transient_for (toplevel) == GTK_WINDOW (window)
          && g_str_has_prefix (adw_message_dialog_get_heading (ADW_MESSAGE_DIALOG (toplevel)), heading))
        found = toplevel;
    }
  g_assert_nonnull (found);
  gtk_window_destroy (found);
  iterate ();
}

/* Answers the "Save changes?" dialog as a click would; the window may close. */
static void
respond (TfWindow *window, const char *response, const gboolean *destroyed)
{
  adw_message_dialog_response (tf_window_get_save_changes_dialog (window), response);
  iterate ();
  if (!*destroyed)
    g_assert_null (tf_window_get_save_changes_dialog (window));
}

/* An edit marks the analysis modified, saving clears it; closing a modified window
 * asks first: Cancel keeps it open, Save saves and closes. */
/* Shows window, watching whether it is destroyed. */
static void
show_watched (TfWindow *window, gboolean *destroyed)
{
  watch_destroy (window, destroyed);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
}

/* Types text into [Data] key of the analysis titled title, then closes the window: it
 * asks whether to save the analysis it calls name. */
static void
edit_and_close (TfWindow *window, const char *key, const char *text, const char *title,
                const char *name)
{
  type_into (window, "Data", key, text);
  assert_modified (window, title);
  gtk_window_close (GTK_WINDOW (window));
  assert_asks_to_save (window, name);
}

static void
test_window_modified (void)
{
  TfWindow *window = tf_window_new (NULL);
  g_autofree char *dir = g_dir_make_tmp ("twofold-gui-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "modified.twofold", NULL);
  g_autoptr (GFile) file = g_file_new_for_path (path);
  g_autoptr (GError) error = NULL;
  g_autoptr (TfAnalysis) analysis = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);
  gboolean destroyed;
  TfWindow *second;

  analysis->successes = 7;
  analysis->trials = 20;
  tf_analysis_set_title (analysis, "Seven of twenty");
  g_assert_true (tf_analysis_save (analysis, path, &error));
  g_assert_no_error (error);

  g_assert_true (tf_window_open_file (window, file));
  show_watched (window, &destroyed);
  assert_not_modified (window, "Seven of twenty");

  /* An unmodified window would close unasked; an edit marks it. */
  type_into (window, "Data", "Successes", "8");
  assert_modified (window, "Seven of twenty");

  /* Saving clears the mark. */
  g_assert_true (gtk_widget_activate_action (GTK_WIDGET (window), "win.save", NULL));
  iterate ();
  assert_not_modified (window, "Seven of twenty");

  /* Save in the dialog goes on only when saving worked: with a field to fix it says why
   * and the window stays open. */
  edit_and_close (window, "Successes", "30", "Seven of twenty", "Seven of twenty");
  respond (window, "save", &destroyed);
  g_assert_false (destroyed);
  assert_modified (window, "Seven of twenty");
  destroy_error_dialog (window, "Could Not Save “");
  type_into (window, "Data", "Successes", "9");
  assert_modified (window, "Seven of twenty");

  /* Closing asks; Cancel keeps the window and the changes. */
  gtk_window_close (GTK_WINDOW (window));
  assert_asks_to_save (window, "Seven of twenty");
  g_assert_false (destroyed);
  respond (window, "cancel", &destroyed);
  g_assert_false (destroyed);
  g_assert_true (gtk_widget_get_visible (GTK_WIDGET (window)));
  assert_modified (window, "Seven of twenty");
  g_assert_cmpfloat (tf_window_get_analysis (window)->successes, ==, 9);

  /* Open… over it asks too; Cancel leaves the analysis as it was. */
  g_assert_true (gtk_widget_activate_action (GTK_WIDGET (window), "win.open", NULL));
  assert_asks_to_save (window, "Seven of twenty");
  respond (window, "cancel", &destroyed);
  g_assert_false (destroyed);
  assert_modified (window, "Seven of twenty");

  /* Closing again, Save: the file gets the edit and the window closes. */
  gtk_window_close (GTK_WINDOW (window));
  assert_asks_to_save (window, "Seven of twenty");
  respond (window, "save", &destroyed);
  g_assert_true (destroyed);

  second = tf_window_new (NULL);
  g_assert_true (tf_window_open_file (second, file));
  g_assert_cmpfloat (tf_window_get_analysis (second)->successes, ==, 9);
  assert_not_modified (second, "Seven of twenty");
  gtk_window_destroy (GTK_WINDOW (second));
  iterate ();
  g_unlink (path);
  g_rmdir (dir);
}

/* Discard closes a modified window without saving; an unmodified one closes unasked;
 * an analysis without a title is named by its file. */
static void
test_window_close_discard (void)
{
  TfWindow *window = tf_window_new (NULL);
  const char *demo_title = "Seed lot 7: germination against the certified 80 %";
  g_autofree char *dir = g_dir_make_tmp ("twofold-gui-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "untitled.twofold", NULL);
  g_autoptr (GFile) file = g_file_new_for_path (path);
  g_autoptr (GError) error = NULL;
  g_autoptr (TfAnalysis) analysis = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);
  g_autofree char *before = NULL, *after = NULL;
  gboolean destroyed;

  tf_window_open_demo (window);
  show_watched (window, &destroyed);
  assert_not_modified (window, demo_title);

  edit_and_close (window, "Trials", "12001", demo_title, demo_title);
  g_assert_false (destroyed);
  respond (window, "discard", &destroyed);
  g_assert_true (destroyed);

  /* Not modified: no question. */
  window = tf_window_new (NULL);
  tf_window_open_demo (window);
  show_watched (window, &destroyed);
  gtk_window_close (GTK_WINDOW (window));
  iterate ();
  g_assert_true (destroyed);

  /* No title: the dialog names the file; Discard leaves the file as it was. */
  analysis->successes = 3;
  analysis->trials = 10;
  g_assert_true (tf_analysis_save (analysis, path, &error));
  g_assert_no_error (error);
  g_assert_true (g_file_get_contents (path, &before, NULL, NULL));
  window = tf_window_new (NULL);
  g_assert_true (tf_window_open_file (window, file));
  show_watched (window, &destroyed);
  assert_not_modified (window, "Untitled Analysis");
  edit_and_close (window, "Successes", "4", "Untitled Analysis", "untitled.twofold");
  respond (window, "discard", &destroyed);
  g_assert_true (destroyed);
  g_assert_true (g_file_get_contents (path, &after, NULL, NULL));
  g_assert_cmpstr (after, ==, before);

  g_unlink (path);
  g_rmdir (dir);
}

void
add_window_tests (void)
{
  g_test_add_func ("/gui/window/edits", test_window_edits);
  g_test_add_func ("/gui/window/save-and-open", test_window_save_and_open);
  g_test_add_func ("/gui/window/modified", test_window_modified);
  g_test_add_func ("/gui/window/close-discard", test_window_close_discard);
}

int
main (int argc, char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  gsl_set_error_handler_off ();
  adw_init ();
  g_object_set (gtk_settings_get_default (), "gtk-enable-animations", FALSE, NULL);
  add_window_tests ();
  add_design_tests ();
  add_figure_tests ();
  add_result_list_tests ();
  return g_test_run ();
}
