/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-window-document.c: the analysis a window shows. Every edit of the form recomputes at
 * once; an analysis that cannot be computed clears the figure, the numbers and the
 * explanations and says what to fix, so nothing stale is ever shown. An edit after the
 * last load or save marks the analysis modified (the title says so). Opening a file
 * that reads but needs fixing shows it with the fields marked.
 */
#include <glib/gi18n.h>
#include "tf-window-document.h"
#include "tf-window-figure.h"
#include "tf-window-report.h"
#include "tf-window-files.h"
#include "tf-analysis-file.h"
#include "tf-results.h"
#include "tf-design.h"

#define DEMO_RESOURCE "/org/twofold/Twofold/demo/seed-germination.twofold"

static gboolean
has_title (TfWindow *self)
{
  return self->analysis && self->analysis->title && *self->analysis->title;
}

/* What the analysis is called: its title, else its file name, else "Untitled Analysis". */
char *
tf_window_document_name (TfWindow *self)
{
  if (has_title (self))
    return g_strdup (self->analysis->title);
  if (self->file)
    return g_file_get_basename (self->file);
  return g_strdup (_("Untitled Analysis"));
}

void
tf_window_document_update_title (TfWindow *self)
{
  const char *title = has_title (self) ? self->analysis->title : _("Untitled Analysis");
  const char *design = tf_design_label (self->analysis ? self->analysis->design
                                                       : tf_design_default ());
  g_autofree char *subtitle = NULL;
  g_autofree char *shown_title = NULL;

  if (self->file)
    {
      g_autofree char *name = g_file_get_basename (self->file);
      /* TRANSLATORS: window subtitle: design, then file name */
      subtitle = g_strdup_printf (_("%s — %s"), design, name);
    }
  else if (self->is_demo)
    /* TRANSLATORS: window subtitle: the design of the demo analysis */
    subtitle = g_strdup_printf (_("%s — demo"), design);
  else
    subtitle = g_strdup (design);

  if (self->modified)
    {
      char *with_state;

      /* TRANSLATORS: window title of an analysis with unsaved changes; the mark is
       * not the only sign of it: the subtitle says "unsaved changes" */
      shown_title = g_strdup_printf (_("• %s"), title);
      /* TRANSLATORS: window subtitle (design and file), then the words that say the
       * analysis was edited since it was last saved */
      with_state = g_strdup_printf (_("%s — unsaved changes"), subtitle);
      g_free (subtitle);
      subtitle = with_state;
    }
  else
    shown_title = g_strdup (title);

  adw_window_title_set_title (self->window_title, shown_title);
  adw_window_title_set_subtitle (self->window_title, subtitle);
  gtk_window_set_title (GTK_WINDOW (self), shown_title);
}

static char *
problems_to_text (GPtrArray *problems, gboolean with_fields)
{
  GString *text = g_string_new (NULL);

  for (guint i = 0; i < problems->len; i++)
    {
      const TfProblem *problem = g_ptr_array_index (problems, i);

      if (text->len > 0)
        g_string_append_c (text, '\n');
      if (with_fields && problem->group && *problem->group)
        /* TRANSLATORS: a problem in a file: [group] key: message */
        g_string_append_printf (text, _("[%s] %s: %s"), problem->group,
                                problem->key ? problem->key : "", problem->message);
      else
        g_string_append (text, problem->message);
    }
  return g_string_free (text, FALSE);
}

/* Whether problems are only that this version does not compute the design: such an
 * analysis can still be saved, for a version that does. */
static gboolean
only_design_missing (GPtrArray *problems)
{
  for (guint i = 0; i < problems->len; i++)
    {
      const TfProblem *problem = g_ptr_array_index (problems, i);

      if (g_strcmp0 (problem->group, "Analysis") != 0 || g_strcmp0 (problem->key, "Design") != 0)
        return FALSE;
    }
  return TRUE;
}

/* The exports are enabled while there is something to export. */
static void
update_actions (TfWindow *self)
{
  tf_window_figure_update (self);
  tf_window_report_update (self);
}

static void
recompute (TfWindow *self)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autofree char *description = NULL;
  gboolean parsed;

  /* the plot view borrows the results: it lets go of them first */
  tf_plot_view_set_analysis (self->plot_view, NULL, NULL);
  g_clear_pointer (&self->results, tf_results_free);
  parsed = tf_analysis_form_apply (self->form, self->analysis, problems);
  if (parsed)
    self->results = tf_analysis_compute (self->analysis, problems);
  else if (tf_design_class (self->analysis->design) == NULL)
    {
      /* the fields to fix, and that the design is not computed in this version */
      g_autoptr (GPtrArray) checks = tf_problem_list_new ();
      const TfProblem *design;

      tf_analysis_validate (self->analysis, checks);
      design = tf_problem_list_find (checks, "Analysis", "Design");
      if (design)
        g_ptr_array_add (problems, tf_problem_new (design->group, design->key, "%s",
                                                   design->message));
    }
  self->savable = self->results != NULL || (parsed && only_design_missing (problems));
  tf_analysis_form_show_problems (self->form, problems);

  if (self->results)
    {
      tf_result_list_set_results (self->result_list, self->analysis, self->results);
      tf_plot_view_set_analysis (self->plot_view, self->analysis, self->results);
      tf_explanation_pane_set_results (self->explanation_pane, self->analysis, self->results);
      gtk_stack_set_visible_child_name (self->center_stack, "analysis");
      update_actions (self);
      return;
    }

  if (problems->len == 0)
    g_ptr_array_add (problems, tf_problem_new ("", "", "%s",
                                               _("The analysis could not be computed.")));
  description = problems_to_text (problems, FALSE);
  if (parsed && only_design_missing (problems))
    {
      adw_status_page_set_title (self->invalid_page, _("Not Computed in This Version"));
      tf_result_list_clear (self->result_list, _("Not Computed in This Version"), description);
      tf_explanation_pane_clear (self->explanation_pane,
                                 _("This version of Twofold does not compute this design: there is nothing to explain yet."));
    }
  else
    {
      adw_status_page_set_title (self->invalid_page, _("Fix the Marked Field"));
      tf_result_list_clear (self->result_list, _("Fix the Marked Field"), description);
      tf_explanation_pane_clear (self->explanation_pane,
                                 _("Fix the field marked in the form: the explanations come back with the results."));
    }
  adw_status_page_set_description (self->invalid_page, description);
  tf_plot_view_set_analysis (self->plot_view, NULL, NULL);
  gtk_stack_set_visible_child_name (self->center_stack, "invalid");
  update_actions (self);
}

static void
on_form_changed (TfAnalysisForm *form, TfWindow *self)
{
  recompute (self);
  self->modified = TRUE;
  tf_window_document_update_title (self);    /* the design may have changed too */
}

void
tf_window_document_set (TfWindow *self, const TfAnalysis *analysis, GFile *file)
{
  TfAnalysis *copy;

  g_return_if_fail (analysis != NULL);

  /* copied first: analysis may be the window's own */
  copy = tf_analysis_copy (analysis);
  g_clear_pointer (&self->analysis, tf_analysis_free);
  self->analysis = copy;
  g_set_object (&self->file, file);
  self->is_demo = FALSE;
  self->modified = FALSE;
  tf_analysis_form_set_analysis (self->form, self->analysis);
  recompute (self);
  tf_window_document_update_title (self);
}

/* A file that reads well but whose values need fixing (or whose design this version does
 * not compute) opens with the fields marked, so that it can be put right; NULL when it
 * does not read as an analysis at all. */
static TfAnalysis *
load_to_fix (const char *path)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (GKeyFile) key_file = g_key_file_new ();
  g_autofree char *data = NULL;
  gsize length = 0;

  if (!g_file_get_contents (path, &data, &length, NULL)
      || !g_utf8_validate (data, (gssize) length, NULL)
      || !g_key_file_load_from_data (key_file, data, length, G_KEY_FILE_KEEP_COMMENTS, NULL)
      || !g_key_file_has_group (key_file, "Analysis"))
    return NULL;
  return tf_analysis_from_key_file (key_file, problems);
}

gboolean
tf_window_document_open (TfWindow *self, GFile *file)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (TfAnalysis) analysis = NULL;
  g_autofree char *path = g_file_get_path (file);
  g_autofree char *name = tf_window_file_display_name (file);

  if (path == NULL)
    {
      g_autofree char *heading = g_strdup_printf (_("Could Not Open “%s”"), name);
      tf_window_show_error (self, heading, _("Only files on this computer can be opened."));
      return FALSE;
    }
  analysis = tf_analysis_load (path, problems);
  if (analysis == NULL)
    analysis = load_to_fix (path);
  if (analysis == NULL)
    {
      g_autofree char *heading = g_strdup_printf (_("Could Not Open “%s”"), name);
      g_autofree char *body = problems_to_text (problems, TRUE);
      tf_window_show_error (self, heading, body);
      return FALSE;
    }
  tf_window_document_set (self, analysis, file);
  tf_window_remember_folder (self, file);
  return TRUE;
}

void
tf_window_document_open_demo (TfWindow *self)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (GBytes) bytes = NULL;
  g_autoptr (TfAnalysis) analysis = NULL;

  bytes = g_resources_lookup_data (DEMO_RESOURCE, G_RESOURCE_LOOKUP_FLAGS_NONE, NULL);
  if (bytes)
    {
      gsize size;
      const char *data = g_bytes_get_data (bytes, &size);
      analysis = tf_analysis_load_from_data (data, size, problems);
    }
#ifdef TF_DEMO_DIR
  if (analysis == NULL)
    {
      g_autofree char *path = g_build_filename (TF_DEMO_DIR, "seed-germination.twofold", NULL);
      g_ptr_array_set_size (problems, 0);
      analysis = tf_analysis_load (path, problems);
    }
#endif
  if (analysis == NULL)
    {
      g_warning ("The demo analysis could not be read; showing the defaults");
      analysis = tf_analysis_new (tf_design_default ());
    }
  tf_window_document_set (self, analysis, NULL);
  self->is_demo = TRUE;
  tf_window_document_update_title (self);
}

void
tf_window_document_init (TfWindow *self)
{
  g_signal_connect (self->form, "changed", G_CALLBACK (on_form_changed), self);
  self->analysis = tf_analysis_new (tf_design_default ());
  tf_analysis_form_set_analysis (self->form, self->analysis);
  recompute (self);
  tf_window_document_update_title (self);
}
