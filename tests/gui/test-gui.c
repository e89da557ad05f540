/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-gui.c: the real Twofold window under Xvfb, driven as a user would: typing into the
 * form's entries and reading back what the result list shows. And the densities figure
 * drawn to an image surface, checked pixel by pixel.
 *
 * Expected values are not recalled numbers: each one is what tf_analysis_compute() and
 * tf_number_format() give for the same analysis, so the test checks that the window
 * shows the core's results, not that the core is right (that is the 'core' suite's job).
 */
#include <math.h>
#include <glib/gstdio.h>
#include <cairo-pdf.h>
#include <gtk/gtk.h>
#include <adwaita.h>
#include <gsl/gsl_errno.h>
#include "tf-window-private.h"
#include "tf-analysis-file.h"
#include "tf-results.h"
#include "tf-design.h"
#include "tf-curves.h"
#include "tf-figure.h"
#include "tf-figure-theme.h"
#include "tf-axis.h"
#include "tf-figure-export.h"

static void
iterate (void)
{
  while (g_main_context_pending (NULL))
    g_main_context_iteration (NULL, FALSE);
}

static void
wait_until_mapped (GtkWidget *widget)
{
  gint64 deadline = g_get_monotonic_time () + 10 * G_USEC_PER_SEC;

  while (!gtk_widget_get_mapped (widget) && g_get_monotonic_time () < deadline)
    {
      iterate ();
      g_usleep (10000);
    }
  g_assert_true (gtk_widget_get_mapped (widget));
  iterate ();
}

static void
type_into (TfWindow *window, const char *group, const char *key, const char *text)
{
  TfAnalysisForm *form = tf_window_get_form (window);

  g_assert_nonnull (tf_analysis_form_get_field (form, group, key));
  tf_analysis_form_set_text (form, group, key, text);
  iterate ();
}

/* The limits the list shows as one row ("<stem>_low" with "<stem>_high"): the other
 * limit of id, or NULL. */
static char *
other_limit (const char *id, gboolean *is_low)
{
  if (g_str_has_suffix (id, "_low"))
    {
      g_autofree char *stem = g_strndup (id, strlen (id) - 4);

      *is_low = TRUE;
      return g_strconcat (stem, "_high", NULL);
    }
  if (g_str_has_suffix (id, "_high"))
    {
      g_autofree char *stem = g_strndup (id, strlen (id) - 5);

      *is_low = FALSE;
      return g_strconcat (stem, "_low", NULL);
    }
  return NULL;
}

/* An interval's row as the list should show it, built from tf_number_format() of each
 * limit: the value, the accessible description and the subtitle (NULL when both are
 * defined). */
static void
expected_interval (const TfNumber *low, const TfNumber *high, char **value,
                   char **description, char **subtitle)
{
  g_autofree char *low_text = tf_number_format (low);
  g_autofree char *high_text = tf_number_format (high);
  g_autofree char *limits = g_strdup_printf ("Lower limit %s, upper limit %s", low_text, high_text);
  gboolean low_ok = low->status == TF_STATUS_OK, high_ok = high->status == TF_STATUS_OK;

  if (!low_ok && !high_ok)
    *value = g_strdup (low_text);
  else
    *value = g_strdup_printf ("%s – %s", low_text, high_text);

  if (!low_ok && !high_ok && g_strcmp0 (low->reason, high->reason) == 0)
    *subtitle = g_strdup_printf ("Neither limit is defined: %s", low->reason);
  else if (!low_ok && !high_ok)
    *subtitle = g_strdup_printf ("Lower limit not defined: %s\nUpper limit not defined: %s",
                                 low->reason, high->reason);
  else if (!low_ok)
    *subtitle = g_strdup_printf ("Lower limit not defined: %s", low->reason);
  else if (!high_ok)
    *subtitle = g_strdup_printf ("Upper limit not defined: %s", high->reason);
  else
    *subtitle = NULL;
  *description = *subtitle ? g_strdup_printf ("%s. %s", limits, *subtitle) : g_strdup (limits);
}

/* Every number of expected is in the list with the text the core formats for it; the
 * two limits of an interval in one row, "low – high", each limit in its description. */
static void
assert_list_shows (TfResultList *list, const TfResults *expected)
{
  g_assert_true (tf_result_list_has_results (list));
  for (guint i = 0; i < expected->numbers->len; i++)
    {
      const TfNumber *number = g_ptr_array_index (expected->numbers, i);
      gboolean is_low = FALSE;
      g_autofree char *other_id = other_limit (number->id, &is_low);
      const TfNumber *other = other_id ? tf_results_lookup (expected, other_id) : NULL;

      if (other)
        {
          g_autofree char *value = NULL, *description = NULL, *subtitle = NULL;

          expected_interval (is_low ? number : other, is_low ? other : number,
                             &value, &description, &subtitle);
          g_assert_cmpstr (tf_result_list_get_value_text (list, number->id), ==, value);
          g_assert_cmpstr (tf_result_list_get_description (list, number->id), ==, description);
          g_assert_cmpstr (tf_result_list_get_subtitle (list, number->id), ==, subtitle);
          /* one row for both */
          g_assert_cmpstr (tf_result_list_get_title (list, number->id), ==,
                           tf_result_list_get_title (list, other_id));
          continue;
        }

      {
        g_autofree char *want = tf_number_format (number);

        g_assert_cmpstr (tf_result_list_get_value_text (list, number->id), ==, want);
        g_assert_cmpstr (tf_result_list_get_title (list, number->id), ==, number->label);
        if (number->status != TF_STATUS_OK)
          g_assert_cmpstr (tf_result_list_get_subtitle (list, number->id), ==, number->reason);
      }
    }
}

static TfResults *
compute_or_fail (const TfAnalysis *analysis)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  TfResults *results = tf_analysis_compute (analysis, problems);

  g_assert_cmpuint (problems->len, ==, 0);
  g_assert_nonnull (results);
  return results;
}

static void
test_window_edits (void)
{
  TfWindow *window = tf_window_new (NULL);
  TfResultList *list = tf_window_get_result_list (window);
  TfAnalysisForm *form = tf_window_get_form (window);
  g_autoptr (TfAnalysis) expected = NULL;
  g_autoptr (TfResults) expected_results = NULL;
  g_autoptr (TfResults) demo_results = NULL;
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  const TfProblem *problem;
  GtkEditable *successes;

  tf_window_open_demo (window);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));

  /* The demo, data/demo/seed-germination.twofold, bundled in the GResource. */
  g_assert_cmpfloat (tf_window_get_analysis (window)->trials, ==, 12000);
  g_assert_cmpfloat (tf_window_get_analysis (window)->successes, ==, 9700);
  g_assert_cmpstr (tf_window_get_visible_page (window), ==, "analysis");
  demo_results = compute_or_fail (tf_window_get_analysis (window));
  assert_list_shows (list, demo_results);
  /* the demo's Level is 0.95; one proportion's confidence interval is Clopper–Pearson's.
   * A word joiner (U+2060) after the dash keeps the name whole when the row wraps. */
  g_assert_cmpstr (tf_result_list_get_title (list, "ci_low"), ==,
                   "95% confidence interval (Clopper–\u2060Pearson)");
  g_assert_cmpstr (tf_result_list_get_title (list, "cri_high"), ==,
                   "95% credible interval (equal-\u2060tailed)");
  g_assert_nonnull (tf_result_list_get_value_text (list, "p_value"));
  g_assert_nonnull (tf_result_list_get_value_text (list, "posterior_null"));
  g_assert_nonnull (tf_plot_view_get_analysis (tf_window_get_plot_view (window)));
  g_assert_cmpuint (tf_explanation_pane_get_n_explanations (tf_window_get_explanation_pane (window)), >, 0);

  /* Type a new analysis in, field by field. */
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
  {
    const TfNumber *p = tf_results_lookup (expected_results, "p_value");
    const TfNumber *post = tf_results_lookup (expected_results, "posterior_null");
    g_autofree char *p_text = tf_number_format (p);
    g_autofree char *post_text = tf_number_format (post);

    g_assert_cmpstr (tf_result_list_get_value_text (list, "p_value"), ==, p_text);
    g_assert_cmpstr (tf_result_list_get_value_text (list, "posterior_null"), ==, post_text);
    /* and the numbers moved from the demo's */
    g_assert_true (fabs (p->value - tf_results_lookup (demo_results, "p_value")->value) > 1e-9);
  }

  /* More successes than trials: the field says so, and nothing stale is shown. */
  type_into (window, "Data", "Successes", "120");
  successes = tf_analysis_form_get_entry (form, "Data", "Successes");
  g_assert_true (gtk_widget_has_css_class (GTK_WIDGET (successes), "error"));
  expected->successes = 120;
  g_assert_false (tf_analysis_validate (expected, problems));
  problem = tf_problem_list_find (problems, "Data", "Successes");
  if (problem == NULL)
    problem = tf_problem_list_find (problems, "Data", "Trials");
  g_assert_nonnull (problem);
  g_assert_cmpstr (tf_analysis_form_get_message (form, problem->group, problem->key), ==,
                   problem->message);
  g_assert_false (tf_result_list_has_results (list));
  g_assert_null (tf_result_list_get_value_text (list, "p_value"));
  g_assert_null (tf_result_list_get_value_text (list, "posterior_null"));
  g_assert_cmpstr (tf_window_get_visible_page (window), ==, "invalid");
  g_assert_null (tf_plot_view_get_analysis (tf_window_get_plot_view (window)));
  g_assert_cmpuint (tf_explanation_pane_get_n_explanations (tf_window_get_explanation_pane (window)), ==, 0);

  /* A text that is not a number is a problem of its own field, named after it. */
  type_into (window, "Data", "Successes", "62");
  type_into (window, "Data", "Trials", "1OO");
  {
    const char *message = tf_analysis_form_get_message (form, "Data", "Trials");
    g_assert_nonnull (message);
    g_assert_nonnull (strstr (message, "Trials"));
    g_assert_nonnull (strstr (message, "1OO"));
    g_assert_true (gtk_widget_has_css_class (GTK_WIDGET (tf_analysis_form_get_entry (form, "Data", "Trials")),
                                             "error"));
    g_assert_false (tf_result_list_has_results (list));
  }

  /* Put it right: the marks go and the results come back. */
  type_into (window, "Data", "Trials", "100");
  g_assert_false (gtk_widget_has_css_class (GTK_WIDGET (successes), "error"));
  g_assert_null (tf_analysis_form_get_message (form, "Data", "Successes"));
  g_assert_null (tf_analysis_form_get_message (form, "Data", "Trials"));
  g_assert_cmpstr (tf_window_get_visible_page (window), ==, "analysis");
  assert_list_shows (list, expected_results);
  g_assert_nonnull (tf_plot_view_get_analysis (tf_window_get_plot_view (window)));
  g_assert_cmpuint (tf_explanation_pane_get_n_explanations (tf_window_get_explanation_pane (window)), >, 0);

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
assert_not_modified (TfWindow *window, const char *title)
{
  g_assert_false (tf_window_get_modified (window));
  g_assert_cmpstr (gtk_window_get_title (GTK_WINDOW (window)), ==, title);
  g_assert_null (strstr (tf_window_get_subtitle (window), "unsaved changes"));
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
  watch_destroy (window, &destroyed);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
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
  type_into (window, "Data", "Successes", "30");
  assert_modified (window, "Seven of twenty");
  gtk_window_close (GTK_WINDOW (window));
  assert_asks_to_save (window, "Seven of twenty");
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
  watch_destroy (window, &destroyed);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  assert_not_modified (window, demo_title);

  type_into (window, "Data", "Trials", "12001");
  assert_modified (window, demo_title);
  gtk_window_close (GTK_WINDOW (window));
  assert_asks_to_save (window, demo_title);
  g_assert_false (destroyed);
  respond (window, "discard", &destroyed);
  g_assert_true (destroyed);

  /* Not modified: no question. */
  window = tf_window_new (NULL);
  tf_window_open_demo (window);
  watch_destroy (window, &destroyed);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
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
  watch_destroy (window, &destroyed);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  assert_not_modified (window, "Untitled Analysis");
  type_into (window, "Data", "Successes", "4");
  assert_modified (window, "Untitled Analysis");
  gtk_window_close (GTK_WINDOW (window));
  assert_asks_to_save (window, "untitled.twofold");
  respond (window, "discard", &destroyed);
  g_assert_true (destroyed);
  g_assert_true (g_file_get_contents (path, &after, NULL, NULL));
  g_assert_cmpstr (after, ==, before);

  g_unlink (path);
  g_rmdir (dir);
}

/* Every design */

typedef struct {
  const char *key;
  const char *shown;            /* the text the form shows for it */
} ShownField;

typedef struct {
  TfDesign design;
  const char *file;             /* a small analysis of the design (inputs only: the window
                                 * is checked against the core, not against a method) */
  gboolean raw;                 /* given as raw values */
  ShownField data[7];
} DesignCase;

static const DesignCase design_cases[] = {
  { TF_DESIGN_ONE_PROPORTION,
    "[Analysis]\nFormat=1\nDesign=one-proportion\n[Data]\nSuccesses=31\nTrials=40\n"
    "[Null]\nValue=0.6\n[Alternative]\nPriorA=2\nPriorB=2\n",
    FALSE, { { "Successes", "31" }, { "Trials", "40" } } },
  { TF_DESIGN_TWO_PROPORTIONS,
    "[Analysis]\nFormat=1\nDesign=two-proportions\n[Data]\nSuccessesA=18\nTrialsA=40\n"
    "SuccessesB=9\nTrialsB=38\n",
    FALSE, { { "SuccessesA", "18" }, { "TrialsA", "40" }, { "SuccessesB", "9" },
             { "TrialsB", "38" } } },
  { TF_DESIGN_ONE_MEAN,
    "[Analysis]\nFormat=1\nDesign=one-mean\n[Data]\nN=25\nMean=101.5\nSD=14.25\n"
    "[Null]\nValue=100\n[Alternative]\nPrior=normal\nPriorScale=0.5\n",
    FALSE, { { "N", "25" }, { "Mean", "101.5" }, { "SD", "14.25" } } },
  { TF_DESIGN_PAIRED_MEANS,
    "[Analysis]\nFormat=1\nDesign=paired-means\n[Data]\nValuesA=12.5;11;13.25;9\n"
    "ValuesB=11.5;10.5;12;9.5\n",
    TRUE, { { "ValuesA", "12.5; 11; 13.25; 9" }, { "ValuesB", "11.5; 10.5; 12; 9.5" } } },
  { TF_DESIGN_TWO_MEANS,
    "[Analysis]\nFormat=1\nDesign=two-means\n[Data]\nNA=20\nMeanA=5.5\nSDA=1.25\n"
    "NB=22\nMeanB=4.75\nSDB=1.5\nEqualVariances=true\n",
    FALSE, { { "NA", "20" }, { "MeanA", "5.5" }, { "SDA", "1.25" }, { "NB", "22" },
             { "MeanB", "4.75" }, { "SDB", "1.5" } } },
  { TF_DESIGN_ONE_RATE,
    "[Analysis]\nFormat=1\nDesign=one-rate\n[Data]\nEvents=14\nExposure=2500.5\n"
    "[Null]\nValue=0.004\n[Alternative]\nPriorShape=2\nPriorRate=400\n",
    FALSE, { { "Events", "14" }, { "Exposure", "2500.5" } } },
  { TF_DESIGN_TWO_RATES,
    "[Analysis]\nFormat=1\nDesign=two-rates\n[Data]\nEventsA=30\nExposureA=1200\n"
    "EventsB=12\nExposureB=1150\n[Null]\nValue=1\n",
    FALSE, { { "EventsA", "30" }, { "ExposureA", "1200" }, { "EventsB", "12" },
             { "ExposureB", "1150" } } },
};

static char *
write_case (const char *dir, const char *name, const char *text)
{
  char *path = g_build_filename (dir, name, NULL);

  g_assert_true (g_file_set_contents (path, text, -1, NULL));
  return path;
}

/* The analysis a file holds, read as the window reads it, before any domain check. */
static TfAnalysis *
read_case (const char *text)
{
  g_autoptr (GKeyFile) key_file = g_key_file_new ();
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  TfAnalysis *analysis;

  g_assert_true (g_key_file_load_from_data (key_file, text, -1, G_KEY_FILE_KEEP_COMMENTS, NULL));
  analysis = tf_analysis_from_key_file (key_file, problems);
  g_assert_cmpuint (problems->len, ==, 0);
  g_assert_nonnull (analysis);
  return analysis;
}

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
  TfResultList *list = tf_window_get_result_list (window);

  if (tf_design_class (analysis->design))
    {
      g_autoptr (TfResults) expected = compute_or_fail (analysis);

      g_assert_cmpstr (tf_window_get_visible_page (window), ==, "analysis");
      assert_list_shows (list, expected);
      g_assert_nonnull (tf_plot_view_get_analysis (tf_window_get_plot_view (window)));
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
      g_assert_cmpstr (tf_window_get_visible_page (window), ==, "invalid");
      g_assert_false (tf_result_list_has_results (list));
      g_assert_null (tf_result_list_get_value_text (list, "p_value"));
      g_assert_null (tf_result_list_get_value_text (list, "bf10"));
      g_assert_null (tf_plot_view_get_analysis (tf_window_get_plot_view (window)));
      g_assert_cmpuint (tf_explanation_pane_get_n_explanations (tf_window_get_explanation_pane (window)), ==, 0);
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
  for (guint c = 0; c < G_N_ELEMENTS (design_cases); c++)
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
  const char *message;

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
  g_assert_true (gtk_widget_has_css_class (trials_b, "error"));
  message = tf_analysis_form_get_message (form, "Data", "TrialsB");
  g_assert_nonnull (message);
  g_assert_nonnull (strstr (message, "Trials in B"));
  g_assert_nonnull (strstr (message, "3B"));
  g_assert_false (gtk_widget_has_css_class (tf_analysis_form_get_field (form, "Data", "TrialsA"), "error"));
  g_assert_null (tf_analysis_form_get_message (form, "Data", "TrialsA"));
  g_assert_false (tf_result_list_has_results (tf_window_get_result_list (window)));
  g_assert_cmpstr (tf_window_get_visible_page (window), ==, "invalid");
  g_assert_null (tf_plot_view_get_analysis (tf_window_get_plot_view (window)));

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
  message = tf_analysis_form_get_message (form, "Data", "ValuesB");
  g_assert_nonnull (message);
  g_assert_nonnull (strstr (message, "Values of B"));
  g_assert_nonnull (strstr (message, "value 3"));
  g_assert_nonnull (strstr (message, "4,4"));
  g_assert_true (gtk_widget_has_css_class (tf_analysis_form_get_field (form, "Data", "ValuesB"), "error"));
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

  for (guint c = 0; c < G_N_ELEMENTS (design_cases) && !dc; c++)
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

/* Figure kinds, the crosshair readout and export, in the window */

/* Iterates until the plot has drawn its figure at its current size. */
static gboolean
wait_until_drawn (TfPlotView *view, TfPlotArea *area)
{
  gint64 deadline = g_get_monotonic_time () + 5 * G_USEC_PER_SEC;

  while (!tf_plot_view_get_plot_area_for_test (view, area) && g_get_monotonic_time () < deadline)
    {
      iterate ();
      g_usleep (5000);
    }
  return tf_plot_view_get_plot_area_for_test (view, area);
}

/* Every kind for the window's analysis: the plot shows it, computed once; a kind that
 * does not apply shows tf_figure_new()'s reason, in the plot and as its description. At
 * a few columns the readout is tf_figure_reading_markup() of tf_figure_read_at() there,
 * and the plot's accessible description is its text. Returns how many kinds applied. */
static guint
check_every_kind (TfWindow *window)
{
  TfPlotView *view = tf_window_get_plot_view (window);
  GtkDropDown *chooser = GTK_DROP_DOWN (tf_plot_view_get_kind_chooser_for_test (view));
  guint applied = 0;

  for (guint k = 0; k < TF_N_FIGURE_KINDS; k++)
    {
      TfFigureKind kind = (TfFigureKind) k;
      g_autofree char *why_not = NULL;
      g_autoptr (TfFigure) expected = tf_figure_new (tf_window_get_analysis (window), kind, &why_not);
      guint before = tf_plot_view_get_n_computed_for_test (view);
      TfPlotArea area;

      g_test_message ("kind %s", tf_figure_kind_to_string (kind));
      /* as a user picks it: the chooser's row k, labelled as the engine names the kind */
      g_assert_cmpstr (gtk_string_object_get_string (GTK_STRING_OBJECT (g_list_model_get_item (gtk_drop_down_get_model (chooser), k))),
                       ==, tf_figure_kind_label (kind));
      g_object_unref (g_list_model_get_item (gtk_drop_down_get_model (chooser), k));
      gtk_drop_down_set_selected (chooser, k);
      iterate ();
      g_assert_cmpint (tf_plot_view_get_kind (view), ==, kind);
      g_assert_cmpuint (tf_plot_view_get_n_computed_for_test (view), <=, before + 1);
      g_assert_cmpint (tf_window_get_visible_page (window) != NULL, ==, TRUE);

      if (expected == NULL)
        {
          g_assert_null (tf_plot_view_get_figure (view));
          g_assert_cmpstr (tf_plot_view_get_why_not (view), ==, why_not);
          g_assert_cmpstr (tf_plot_view_get_description (view), ==, why_not);
          /* nothing to read, and nothing to export */
          tf_plot_view_set_pointer_for_test (view, 100, 100);
          g_assert_null (tf_plot_view_get_readout_markup (view));
          g_assert_false (tf_window_get_export_enabled (window));
          continue;
        }
      applied++;
      g_assert_nonnull (tf_plot_view_get_figure (view));
      g_assert_null (tf_plot_view_get_why_not (view));
      g_assert_true (wait_until_drawn (view, &area));
      for (int i = 1; i <= 3; i++)
        {
          double px = area.x + area.width * i / 4.0, py = area.y + area.height / 2;
          TfFigureReading reading;

          tf_plot_view_set_pointer_for_test (view, px, py);
          if (!tf_figure_read_at (expected, &area, px, &reading))
            {
              /* model probabilities: no x to read */
              g_assert_null (tf_plot_view_get_readout_markup (view));
              continue;
            }
          {
            g_autofree char *want = tf_figure_reading_markup (&reading);
            g_autofree char *text = NULL;

            g_assert_cmpstr (tf_plot_view_get_readout_markup (view), ==, want);
            g_assert_true (pango_parse_markup (want, -1, 0, NULL, &text, NULL, NULL));
            g_assert_cmpstr (tf_plot_view_get_description (view), ==, text);
          }
        }
      /* outside the plot area, and once the pointer leaves: gone */
      tf_plot_view_set_pointer_for_test (view, area.x - 5, area.y + area.height / 2);
      g_assert_null (tf_plot_view_get_readout_markup (view));
      tf_plot_view_set_pointer_for_test (view, area.x + area.width / 2, area.y + 1);
      if (tf_figure_get_kind (expected) != TF_FIGURE_MODEL_PROBABILITIES)
        g_assert_nonnull (tf_plot_view_get_readout_markup (view));
      tf_plot_view_set_pointer_for_test (view, NAN, NAN);
      g_assert_null (tf_plot_view_get_readout_markup (view));
      g_assert_null (tf_plot_view_get_description (view));
    }
  return applied;
}

static void
test_window_figure_kinds (void)
{
  TfWindow *window = tf_window_new (NULL);
  TfPlotView *view = tf_window_get_plot_view (window);
  g_autofree char *dir = g_dir_make_tmp ("twofold-gui-XXXXXX", NULL);
  const DesignCase *rate = NULL;
  guint computed;
  TfPlotArea area;

  tf_window_open_demo (window);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  g_assert_cmpint (tf_plot_view_get_kind (view), ==, TF_FIGURE_DENSITIES);
  g_assert_cmpuint (check_every_kind (window), >=, 1);   /* densities at least */

  /* A resize redraws and does not recompute; an edit recomputes the kind shown. */
  tf_plot_view_set_kind (view, TF_FIGURE_DENSITIES);
  iterate ();
  computed = tf_plot_view_get_n_computed_for_test (view);
  gtk_window_set_default_size (GTK_WINDOW (window), 1000, 700);
  iterate ();
  g_assert_true (wait_until_drawn (view, &area));
  g_assert_cmpuint (tf_plot_view_get_n_computed_for_test (view), ==, computed);
  type_into (window, "Data", "Successes", "9650");
  g_assert_cmpuint (tf_plot_view_get_n_computed_for_test (view), ==, computed + 1);
  g_assert_cmpint (tf_plot_view_get_kind (view), ==, TF_FIGURE_DENSITIES);

  /* one rate: the evidence figures and the null distribution apply there */
  for (guint c = 0; c < G_N_ELEMENTS (design_cases); c++)
    if (design_cases[c].design == TF_DESIGN_ONE_RATE)
      rate = &design_cases[c];
  g_assert_nonnull (rate);
  {
    g_autofree char *path = write_case (dir, "rate.twofold", rate->file);
    g_autoptr (GFile) file = g_file_new_for_path (path);

    g_assert_true (tf_window_open_file (window, file));
    iterate ();
    g_assert_cmpuint (check_every_kind (window), >=, 2);
    g_unlink (path);
  }
  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
  g_rmdir (dir);
}

/* The width and height a PNG's IHDR chunk gives (PNG specification, section 11.2.2). */
static void
png_size (const char *path, guint32 *width, guint32 *height)
{
  g_autofree guint8 *data = NULL;
  gsize length = 0;

  g_assert_true (g_file_get_contents (path, (char **) &data, &length, NULL));
  g_assert_cmpuint (length, >, 24);
  g_assert_cmpmem (data + 12, 4, "IHDR", 4);
  *width = (guint32) data[16] << 24 | (guint32) data[17] << 16 | (guint32) data[18] << 8 | data[19];
  *height = (guint32) data[20] << 24 | (guint32) data[21] << 16 | (guint32) data[22] << 8 | data[23];
}

/* The message dialog whose heading is heading, among the open windows, or NULL. */
static AdwMessageDialog *
find_dialog (const char *heading)
{
  g_autoptr (GListModel) toplevels = g_object_ref (gtk_window_get_toplevels ());

  for (guint i = 0; i < g_list_model_get_n_items (toplevels); i++)
    {
      g_autoptr (GObject) item = g_list_model_get_item (toplevels, i);

      if (ADW_IS_MESSAGE_DIALOG (item)
          && g_strcmp0 (adw_message_dialog_get_heading (ADW_MESSAGE_DIALOG (item)), heading) == 0)
        return ADW_MESSAGE_DIALOG (item);
    }
  return NULL;
}

static void
test_window_export_figure (void)
{
  TfWindow *window = tf_window_new (NULL);
  g_autofree char *dir = g_dir_make_tmp ("twofold-gui-XXXXXX", NULL);
  g_autofree char *png = g_build_filename (dir, "demo-densities.png", NULL);
  g_autofree char *small = g_build_filename (dir, "small.png", NULL);
  g_autofree char *bad = g_build_filename (dir, "no-such-folder", "figure.png", NULL);
  g_autoptr (GFile) png_file = g_file_new_for_path (png);
  g_autoptr (GFile) small_file = g_file_new_for_path (small);
  g_autoptr (GFile) bad_file = g_file_new_for_path (bad);
  TfFigureOptions options = TF_FIGURE_OPTIONS_INIT;
  AdwMessageDialog *dialog;
  guint32 w, h;

  tf_window_open_demo (window);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  g_assert_true (tf_window_get_export_enabled (window));

  /* Through the dialog, at its defaults: 120 × 80 mm at 300 dpi is round(120 / 25.4 ×
   * 300) = 1417 by round(80 / 25.4 × 300) = 945 pixels (1 in = 25.4 mm, common practice). */
  tf_window_show_export_options (window, png_file);
  iterate ();
  dialog = tf_window_get_export_dialog (window);
  g_assert_nonnull (dialog);
  g_assert_cmpstr (adw_message_dialog_get_heading (dialog), ==, "Export “demo-densities.png”");
  adw_message_dialog_response (dialog, "export");
  iterate ();
  g_assert_null (tf_window_get_export_dialog (window));
  png_size (png, &w, &h);
  g_assert_cmpuint (w, ==, 1417);
  g_assert_cmpuint (h, ==, 945);

  /* What the dialog calls, at another size: 50.8 × 25.4 mm at 100 dpi is 200 × 100. */
  options.style = TF_FIGURE_STYLE_PRINT;
  g_assert_true (tf_window_export_figure (window, small_file, 50.8, 25.4, 100, &options));
  png_size (small, &w, &h);
  g_assert_cmpuint (w, ==, 200);
  g_assert_cmpuint (h, ==, 100);

  /* A folder that does not exist: a dialog that names the file, and nothing written. */
  g_assert_false (tf_window_export_figure (window, bad_file, 120, 80, 300, &options));
  iterate ();
  {
    g_autofree char *name = g_filename_display_name (bad);
    g_autofree char *heading = g_strdup_printf ("Could Not Export “%s”", name);

    dialog = find_dialog (heading);
    g_assert_nonnull (dialog);
    gtk_window_destroy (GTK_WINDOW (dialog));
  }
  g_assert_false (g_file_test (bad, G_FILE_TEST_EXISTS));

  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
  g_unlink (png);
  g_unlink (small);
  g_rmdir (dir);
}

/* The list on its own, fed results made by hand so that limits can be undefined (the
 * numbers are placeholders for the display, not check values of any method). */
static void
test_result_list_intervals (void)
{
  TfResultList *list = TF_RESULT_LIST (g_object_ref_sink (tf_result_list_new ()));
  g_autoptr (TfAnalysis) analysis = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);
  g_autoptr (TfResults) results = tf_results_new (TF_DESIGN_ONE_PROPORTION);
  const char *why = "the level leaves no room above the estimate";

  tf_results_add (results, "p_value", "p-value", TF_MEASURE_TAIL_PROBABILITY, 0.04);
  tf_results_add (results, "ci_low", "Confidence interval, lower", TF_MEASURE_CONFIDENCE_LIMIT, 0.25);
  tf_results_add_undefined (results, "ci_high", "Confidence interval, upper",
                            TF_MEASURE_CONFIDENCE_LIMIT, why);
  tf_results_add_undefined (results, "cri_low", "Credible interval, lower",
                            TF_MEASURE_CREDIBLE_LIMIT, why);
  tf_results_add_undefined (results, "cri_high", "Credible interval, upper",
                            TF_MEASURE_CREDIBLE_LIMIT, why);
  tf_results_add (results, "posterior_mean", "Posterior mean", TF_MEASURE_ESTIMATE, 0.3);
  analysis->level = 0.999;

  tf_result_list_set_results (list, analysis, results);
  assert_list_shows (list, results);
  /* and the strings themselves, as a reader sees them */
  g_assert_cmpstr (tf_result_list_get_title (list, "ci_high"), ==,
                   "99.9% confidence interval (Clopper–\u2060Pearson)");
  g_assert_cmpstr (tf_result_list_get_value_text (list, "ci_high"), ==, "0.25 – not defined");
  g_assert_cmpstr (tf_result_list_get_subtitle (list, "ci_low"), ==,
                   "Upper limit not defined: the level leaves no room above the estimate");
  g_assert_cmpstr (tf_result_list_get_value_text (list, "cri_low"), ==, "not defined");
  g_assert_cmpstr (tf_result_list_get_subtitle (list, "cri_high"), ==,
                   "Neither limit is defined: the level leaves no room above the estimate");
  g_assert_cmpstr (tf_result_list_get_description (list, "ci_low"), ==,
                   "Lower limit 0.25, upper limit not defined. "
                   "Upper limit not defined: the level leaves no room above the estimate");
  g_assert_null (tf_result_list_get_description (list, "p_value"));

  /* A lone limit, without its partner, keeps a row of its own. */
  {
    g_autoptr (TfResults) lone = tf_results_new (TF_DESIGN_ONE_PROPORTION);

    tf_results_add (lone, "ci_low", "Confidence interval, lower", TF_MEASURE_CONFIDENCE_LIMIT, 0.25);
    tf_result_list_set_results (list, analysis, lone);
    assert_list_shows (list, lone);
    g_assert_cmpstr (tf_result_list_get_value_text (list, "ci_low"), ==, "0.25");
    g_assert_cmpstr (tf_result_list_get_title (list, "ci_low"), ==, "Confidence interval, lower");
  }

  /* Each design's intervals, one row each, titled with what they are of and their
   * published method; two proportions' diff_ci repeats its ci and shares its row. */
  {
    static const struct { TfDesign design; const char *id; const char *title; } titles[] = {
      { TF_DESIGN_ONE_PROPORTION, "wilson_cc_low", "95% confidence interval (Wilson, continuity-\u2060corrected)" },
      { TF_DESIGN_ONE_PROPORTION, "hdi_high", "95% credible interval (highest density)" },
      { TF_DESIGN_ONE_PROPORTION, "agresti_coull_low", "95% confidence interval (Agresti–\u2060Coull)" },
      { TF_DESIGN_TWO_PROPORTIONS, "ci_low", "95% confidence interval (Newcombe)" },
      { TF_DESIGN_TWO_PROPORTIONS, "diff_ci_high", "95% confidence interval (Newcombe)" },
      { TF_DESIGN_TWO_PROPORTIONS, "or_ci_low", "95% confidence interval of odds ratio (Woolf)" },
      { TF_DESIGN_TWO_PROPORTIONS, "rr_ci_high", "95% confidence interval of risk ratio (Katz)" },
      { TF_DESIGN_ONE_MEAN, "ci_low", "95% confidence interval (t)" },
      { TF_DESIGN_ONE_MEAN, "cri_high", "95% credible interval of δ (equal-\u2060tailed)" },
      { TF_DESIGN_ONE_MEAN, "effect_ci_low", "95% confidence interval of Cohen's d (noncentral t)" },
      { TF_DESIGN_PAIRED_MEANS, "hdi_low", "95% credible interval of δ (highest density)" },
      { TF_DESIGN_TWO_MEANS, "ci_high", "95% confidence interval (Student)" },
      { TF_DESIGN_ONE_RATE, "ci_low", "95% confidence interval (Garwood)" },
      { TF_DESIGN_TWO_RATES, "ci_low", "95% confidence interval (conditional Clopper–\u2060Pearson)" },
    };

    for (guint t = 0; t < G_N_ELEMENTS (titles); t++)
      for (guint c = 0; c < G_N_ELEMENTS (design_cases); c++)
        if (design_cases[c].design == titles[t].design)
          {
            g_autoptr (TfAnalysis) dc = read_case (design_cases[c].file);
            g_autoptr (TfResults) dr = compute_or_fail (dc);

            dc->level = 0.95;
            tf_result_list_set_results (list, dc, dr);
            assert_list_shows (list, dr);
            g_assert_cmpstr (tf_result_list_get_title (list, titles[t].id), ==, titles[t].title);
          }
    /* the last case was two rates; two proportions again: the repeated interval reads
     * back the very row of its ci (the same title string), not a second row */
    for (guint c = 0; c < G_N_ELEMENTS (design_cases); c++)
      if (design_cases[c].design == TF_DESIGN_TWO_PROPORTIONS)
        {
          g_autoptr (TfAnalysis) dc = read_case (design_cases[c].file);
          g_autoptr (TfResults) dr = compute_or_fail (dc);

          tf_result_list_set_results (list, dc, dr);
          g_assert_true (tf_result_list_get_title (list, "ci_low")
                         == tf_result_list_get_title (list, "diff_ci_low"));
        }
  }

  /* Cleared, nothing is left to read back. */
  tf_result_list_clear (list, "Fix the Marked Field", "A field needs fixing.");
  g_assert_false (tf_result_list_has_results (list));
  g_assert_null (tf_result_list_get_value_text (list, "ci_low"));
  g_assert_null (tf_result_list_get_title (list, "ci_low"));
  g_assert_null (tf_result_list_get_description (list, "ci_low"));
  g_object_unref (list);
}

/* Figure */

static void
pixel_at (cairo_surface_t *surface, int x, int y, double rgb[3])
{
  const unsigned char *data = cairo_image_surface_get_data (surface);
  int stride = cairo_image_surface_get_stride (surface);
  guint32 pixel = *(const guint32 *) (data + y * stride + 4 * x);

  /* CAIRO_FORMAT_RGB24: native-endian xRGB */
  rgb[0] = ((pixel >> 16) & 0xff) / 255.0;
  rgb[1] = ((pixel >> 8) & 0xff) / 255.0;
  rgb[2] = (pixel & 0xff) / 255.0;
}

static double
colour_distance (const double rgb[3], const TfColour *colour)
{
  return MAX (MAX (fabs (rgb[0] - colour->r), fabs (rgb[1] - colour->g)), fabs (rgb[2] - colour->b));
}

static TfAnalysis *
figure_analysis (void)
{
  TfAnalysis *analysis = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);

  analysis->successes = 30;
  analysis->trials = 100;
  analysis->null_value = 0.5;
  analysis->prior_a = 1;
  analysis->prior_b = 1;
  return analysis;
}

static void
check_figure_pixels (TfFigureStyle style)
{
  const int width = 600, height = 400;
  const double scale = 2.0;     /* 144 pixels per inch */
  g_autoptr (TfAnalysis) analysis = figure_analysis ();
  g_autoptr (TfDensityCurves) curves = tf_density_curves_new (analysis, 401, NULL);
  cairo_surface_t *surface = cairo_image_surface_create (CAIRO_FORMAT_RGB24, width, height);
  cairo_t *cr = cairo_create (surface);
  TfFigureTheme theme;
  TfPlotArea area;
  double rgb[3], best = 1;
  guint peak = 0;
  int px, py;

  tf_figure_theme_init (&theme, style, scale);
  g_assert_nonnull (curves);
  g_assert_true (tf_figure_draw_densities_full (cr, width, height, scale, analysis, style, &area));
  cairo_destroy (cr);
  cairo_surface_flush (surface);
  if (g_getenv ("TF_GUI_TEST_PNG"))
    cairo_surface_write_to_png (surface, g_getenv ("TF_GUI_TEST_PNG"));

  /* The background at a corner. */
  pixel_at (surface, 1, 1, rgb);
  g_assert_cmpfloat (colour_distance (rgb, &theme.background), <, 0.01);
  pixel_at (surface, width - 2, height - 2, rgb);
  g_assert_cmpfloat (colour_distance (rgb, &theme.background), <, 0.01);

  /* The plot area sits inside the figure. */
  g_assert_cmpfloat (area.x, >, 0);
  g_assert_cmpfloat (area.y, >, 0);
  g_assert_cmpfloat (area.x + area.width, <, width);
  g_assert_cmpfloat (area.y + area.height, <, height);

  /* The posterior's colour within a few pixels of its peak. */
  for (guint i = 0; i < curves->n; i++)
    if (curves->posterior[i] > curves->posterior[peak])
      peak = i;
  g_assert_false (curves->posterior_narrow);
  px = (int) round (tf_plot_area_map_x (&area, curves->x[peak]));
  py = (int) round (tf_plot_area_map_y (&area, curves->posterior[peak]));
  g_assert_cmpint (px, >=, 0);
  g_assert_cmpint (px, <, width);
  g_assert_cmpint (py, >=, 0);
  g_assert_cmpint (py, <, height);
  for (int dy = -4; dy <= 4; dy++)
    for (int dx = -4; dx <= 4; dx++)
      {
        int x = CLAMP (px + dx, 0, width - 1), y = CLAMP (py + dy, 0, height - 1);
        pixel_at (surface, x, y, rgb);
        best = MIN (best, colour_distance (rgb, &theme.series[TF_SERIES_POSTERIOR]));
      }
  g_assert_cmpfloat (best, <, 0.12);

  cairo_surface_destroy (surface);
}

static void
test_figure_pixels_light (void)
{
  check_figure_pixels (TF_FIGURE_STYLE_LIGHT);
}

static void
test_figure_pixels_dark (void)
{
  check_figure_pixels (TF_FIGURE_STYLE_DARK);
}

static cairo_status_t
count_bytes (void *closure, const unsigned char *data, unsigned int length)
{
  *(gsize *) closure += length;
  return CAIRO_STATUS_SUCCESS;
}

/* The same drawing on a PDF surface, in points. */
static void
test_figure_pdf (void)
{
  g_autoptr (TfAnalysis) analysis = figure_analysis ();
  gsize written = 0;
  cairo_surface_t *surface = cairo_pdf_surface_create_for_stream (count_bytes, &written, 340, 220);
  cairo_t *cr = cairo_create (surface);

  g_assert_true (tf_figure_draw_densities (cr, 340, 220, 1.0, analysis, TF_FIGURE_STYLE_LIGHT));
  g_assert_cmpint (cairo_status (cr), ==, CAIRO_STATUS_SUCCESS);
  cairo_destroy (cr);
  cairo_surface_finish (surface);
  g_assert_cmpint (cairo_surface_status (surface), ==, CAIRO_STATUS_SUCCESS);
  cairo_surface_destroy (surface);
  g_assert_cmpuint (written, >, 1000);
}

/* An invalid analysis draws a message on the background and says FALSE. */
static void
test_figure_invalid (void)
{
  g_autoptr (TfAnalysis) analysis = figure_analysis ();
  cairo_surface_t *surface = cairo_image_surface_create (CAIRO_FORMAT_RGB24, 300, 200);
  cairo_t *cr = cairo_create (surface);
  TfFigureTheme theme;
  double rgb[3];

  analysis->successes = 130;    /* more than the 100 trials */
  tf_figure_theme_init (&theme, TF_FIGURE_STYLE_LIGHT, 1.0);
  g_assert_false (tf_figure_draw_densities (cr, 300, 200, 1.0, analysis, TF_FIGURE_STYLE_LIGHT));
  cairo_destroy (cr);
  cairo_surface_flush (surface);
  pixel_at (surface, 1, 1, rgb);
  g_assert_cmpfloat (colour_distance (rgb, &theme.background), <, 0.01);
  cairo_surface_destroy (surface);
}

/* Heckbert (1990), "Nice numbers for graph labels": 1, 2, 5 times a power of ten. The
 * expected values follow from the rule as stated there (common practice). */
static void
test_nice_numbers (void)
{
  TfTicks ticks;

  g_assert_cmpfloat_with_epsilon (tf_nice_number (0.23, TRUE), 0.2, 1e-12);
  g_assert_cmpfloat_with_epsilon (tf_nice_number (0.23, FALSE), 0.5, 1e-12);
  g_assert_cmpfloat_with_epsilon (tf_nice_number (7.5, TRUE), 10, 1e-12);
  g_assert_cmpfloat_with_epsilon (tf_nice_number (1.4, TRUE), 1, 1e-12);
  g_assert_cmpfloat_with_epsilon (tf_nice_number (3e-5, TRUE), 5e-5, 1e-17);

  /* range nice(10.3) = 20, step nice(20 / 4, round) = 5, extended to 15 */
  tf_ticks_compute (&ticks, 0, 10.3, 5, TRUE);
  g_assert_cmpfloat_with_epsilon (ticks.step, 5, 1e-12);
  g_assert_cmpfloat_with_epsilon (ticks.hi, 15, 1e-12);
  g_assert_cmpuint (ticks.n, ==, 4);

  tf_ticks_compute (&ticks, 0.213, 0.397, 5, FALSE);
  g_assert_cmpfloat_with_epsilon (ticks.step, 0.05, 1e-12);
  g_assert_cmpfloat_with_epsilon (tf_ticks_value (&ticks, 0), 0.25, 1e-12);
  g_assert_cmpuint (ticks.n, ==, 3);
  {
    g_autofree char *label = tf_ticks_label (&ticks, 0);
    g_assert_cmpstr (label, ==, "0.25");
  }
}

int
main (int argc, char *argv[])
{
  g_test_init (&argc, &argv, NULL);
  gsl_set_error_handler_off ();
  adw_init ();
  g_object_set (gtk_settings_get_default (), "gtk-enable-animations", FALSE, NULL);

  g_test_add_func ("/gui/window/edits", test_window_edits);
  g_test_add_func ("/gui/window/save-and-open", test_window_save_and_open);
  g_test_add_func ("/gui/window/modified", test_window_modified);
  g_test_add_func ("/gui/window/close-discard", test_window_close_discard);
  g_test_add_func ("/gui/window/designs", test_window_designs);
  g_test_add_func ("/gui/window/two-sample-invalid", test_window_two_sample_invalid);
  g_test_add_func ("/gui/window/switch-keeps", test_window_switch_keeps);
  g_test_add_func ("/gui/window/save-unavailable", test_window_save_unavailable);
  g_test_add_func ("/gui/window/figure-kinds", test_window_figure_kinds);
  g_test_add_func ("/gui/window/export-figure", test_window_export_figure);
  g_test_add_func ("/gui/result-list/intervals", test_result_list_intervals);
  g_test_add_func ("/gui/figure/pixels-light", test_figure_pixels_light);
  g_test_add_func ("/gui/figure/pixels-dark", test_figure_pixels_dark);
  g_test_add_func ("/gui/figure/pdf", test_figure_pdf);
  g_test_add_func ("/gui/figure/invalid", test_figure_invalid);
  g_test_add_func ("/gui/figure/nice-numbers", test_nice_numbers);
  return g_test_run ();
}
