/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-gui-common.c: the helpers the window tests share (see test-gui.h).
 */
#include "test-gui.h"

void
iterate (void)
{
  while (g_main_context_pending (NULL))
    g_main_context_iteration (NULL, FALSE);
}

void
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

void
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
void
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

/* The [Data] field key is marked as wrong, and its message names each of the words
 * that follow (NULL-terminated). */
void
assert_field_says (TfAnalysisForm *form, const char *key, ...)
{
  const char *message = tf_analysis_form_get_message (form, "Data", key);
  va_list words;

  g_assert_true (gtk_widget_has_css_class (tf_analysis_form_get_field (form, "Data", key), "error"));
  g_assert_nonnull (message);
  va_start (words, key);
  for (const char *word = va_arg (words, const char *); word; word = va_arg (words, const char *))
    if (strstr (message, word) == NULL)
      g_error ("[Data] %s: “%s” does not name “%s”", key, message, word);
  va_end (words);
}

/* The window shows expected: the page of results, every number of expected in the
 * list, a figure, and explanations. */
void
assert_window_shows_results (TfWindow *window, const TfResults *expected)
{
  g_assert_cmpstr (tf_window_get_visible_page (window), ==, "analysis");
  assert_list_shows (tf_window_get_result_list (window), expected);
  g_assert_nonnull (tf_plot_view_get_analysis (tf_window_get_plot_view (window)));
  g_assert_cmpuint (tf_explanation_pane_get_n_explanations (tf_window_get_explanation_pane (window)), >, 0);
}

/* Nothing stale is shown: the page that says what to fix, no numbers in the list, no
 * figure, no explanations. */
void
assert_window_shows_nothing (TfWindow *window)
{
  TfResultList *list = tf_window_get_result_list (window);

  g_assert_cmpstr (tf_window_get_visible_page (window), ==, "invalid");
  g_assert_false (tf_result_list_has_results (list));
  g_assert_null (tf_result_list_get_value_text (list, "p_value"));
  g_assert_null (tf_result_list_get_value_text (list, "bf10"));
  g_assert_null (tf_result_list_get_value_text (list, "posterior_null"));
  g_assert_null (tf_plot_view_get_analysis (tf_window_get_plot_view (window)));
  g_assert_cmpuint (tf_explanation_pane_get_n_explanations (tf_window_get_explanation_pane (window)), ==, 0);
}

TfResults *
compute_or_fail (const TfAnalysis *analysis)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  TfResults *results = tf_analysis_compute (analysis, problems);

  g_assert_cmpuint (problems->len, ==, 0);
  g_assert_nonnull (results);
  return results;
}

void
assert_not_modified (TfWindow *window, const char *title)
{
  g_assert_false (tf_window_get_modified (window));
  g_assert_cmpstr (gtk_window_get_title (GTK_WINDOW (window)), ==, title);
  g_assert_null (strstr (tf_window_get_subtitle (window), "unsaved changes"));
}
const DesignCase design_cases[] = {
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

const guint n_design_cases = G_N_ELEMENTS (design_cases);

char *
write_case (const char *dir, const char *name, const char *text)
{
  char *path = g_build_filename (dir, name, NULL);

  g_assert_true (g_file_set_contents (path, text, -1, NULL));
  return path;
}

/* The analysis a file holds, read as the window reads it, before any domain check. */
TfAnalysis *
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
