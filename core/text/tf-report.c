/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-report.c: the blocks of a report: title, caution, the design in words and its
 * inputs, every number by group, the explanations, the figures, the analysis file.
 * tf-report-text.c writes them as Markdown and HTML; widgets/tf-report-render.c as PDF.
 */
#include "tf-report.h"
#include "tf-analysis-file.h"
#include "tf-design.h"
#include "tf-diagnostic.h"
#include "tf-explain.h"

#include <glib/gi18n-lib.h>
#include <stdlib.h>

static void
tf_report_block_free (TfReportBlock *block)
{
  g_free (block->lead);
  g_free (block->text);
  g_clear_pointer (&block->cells, g_ptr_array_unref);
  g_free (block);
}

void
tf_report_free (TfReport *report)
{
  if (report == NULL)
    return;
  g_free (report->title);
  g_ptr_array_unref (report->blocks);
  g_free (report->analysis_text);
  g_free (report);
}

static TfReportBlock *
add_block (TfReport *report, TfReportBlockKind kind, const char *lead, char *text)
{
  TfReportBlock *block = g_new0 (TfReportBlock, 1);

  block->kind = kind;
  block->lead = g_strdup (lead);
  block->text = text;
  block->code_column = -1;
  block->digits_column = -1;
  g_ptr_array_add (report->blocks, block);
  return block;
}

static void
add_text (TfReport *report, TfReportBlockKind kind, const char *text)
{
  add_block (report, kind, NULL, g_strdup (text));
}

/* A table with its header row; rows are added with add_row(). */
static TfReportBlock *
add_table (TfReport *report, int code_column, guint n_columns, ...)
{
  TfReportBlock *block = add_block (report, TF_REPORT_TABLE, NULL, NULL);
  va_list args;

  block->n_columns = n_columns;
  block->code_column = code_column;
  block->cells = g_ptr_array_new_with_free_func (g_free);
  va_start (args, n_columns);
  for (guint i = 0; i < n_columns; i++)
    g_ptr_array_add (block->cells, g_strdup (va_arg (args, const char *)));
  va_end (args);
  return block;
}

/* Takes the cells (n_columns newly allocated strings). */
static void
add_row (TfReportBlock *table, ...)
{
  va_list args;

  va_start (args, table);
  for (guint i = 0; i < table->n_columns; i++)
    g_ptr_array_add (table->cells, va_arg (args, char *));
  va_end (args);
}

char *
tf_report_date_now (void)
{
  const char *epoch = g_getenv ("SOURCE_DATE_EPOCH");
  g_autoptr (GDateTime) now = NULL;

  if (epoch && *epoch)
    {
      char *end = NULL;
      gint64 seconds = g_ascii_strtoll (epoch, &end, 10);

      if (end && *end == '\0')
        now = g_date_time_new_from_unix_utc (seconds);
    }
  if (now == NULL)
    now = g_date_time_new_now_local ();
  return g_date_time_format (now, "%Y-%m-%d");
}

/* The result list's groups (widgets/tf-result-list.c): Bayes factors, posterior
 * probabilities, credible limits and posterior summaries are the Bayesian reading;
 * bounds stand apart; the rest (p-values, confidence limits, estimates) is classical. */
TfReportSection
tf_report_section_of (const TfNumber *number)
{
  gboolean posterior_summary = number->id && (g_str_has_prefix (number->id, "posterior_")
                                              || g_str_has_prefix (number->id, "cri_"));

  switch (number->measure)
    {
    case TF_MEASURE_BAYES_FACTOR:
    case TF_MEASURE_POSTERIOR_PROBABILITY:
    case TF_MEASURE_CREDIBLE_LIMIT:
      return TF_REPORT_SECTION_BAYESIAN;
    case TF_MEASURE_BOUND:
      return TF_REPORT_SECTION_BOUNDS;
    case TF_MEASURE_ESTIMATE:
    case TF_MEASURE_STATISTIC:
      return posterior_summary ? TF_REPORT_SECTION_BAYESIAN : TF_REPORT_SECTION_CLASSICAL;
    case TF_MEASURE_TAIL_PROBABILITY:
    case TF_MEASURE_CONFIDENCE_LIMIT:
    default:
      return TF_REPORT_SECTION_CLASSICAL;
    }
}

/* Inputs are shown exactly as the file holds them: shortest round-trip digits. */
#define NUM(x) tf_format_double (x)

static char *
hypotheses_words (const TfAnalysis *a)
{
  g_autofree char *null = NULL, *prior = NULL, *p1 = NULL, *p2 = NULL;
  const char *direction;

  if (a->null_kind == TF_NULL_INTERVAL)
    {
      p1 = NUM (a->null_low), p2 = NUM (a->null_high);
      null = g_strdup_printf (_("The null hypothesis is the interval from %s to %s."), p1, p2);
    }
  else
    {
      p1 = NUM (a->null_value);
      null = g_strdup_printf (_("The null hypothesis is the point %s."), p1);
    }
  g_clear_pointer (&p1, g_free);
  g_clear_pointer (&p2, g_free);
  switch (a->prior)
    {
    case TF_PRIOR_BETA:
      p1 = NUM (a->prior_a), p2 = NUM (a->prior_b);
      prior = g_strdup_printf (_("a beta prior with shapes a = %s and b = %s"), p1, p2);
      break;
    case TF_PRIOR_NORMAL:
      p1 = NUM (a->prior_scale);
      prior = g_strdup_printf (_("a normal prior on the standardised effect with SD %s"), p1);
      break;
    case TF_PRIOR_CAUCHY:
      p1 = NUM (a->prior_scale);
      prior = g_strdup_printf (_("a Cauchy prior on the standardised effect with scale %s"), p1);
      break;
    case TF_PRIOR_GAMMA:
    default:
      p1 = NUM (a->prior_shape), p2 = NUM (a->prior_rate);
      prior = g_strdup_printf (_("a gamma prior with shape %s and rate %s"), p1, p2);
      break;
    }
  switch (a->direction)
    {
    case TF_DIRECTION_GREATER: direction = _("above the null (greater)"); break;
    case TF_DIRECTION_LESS: direction = _("below the null (less)"); break;
    case TF_DIRECTION_TWO_SIDED:
    default: direction = _("on either side of the null (two-sided)"); break;
    }
  /* TRANSLATORS: the null sentence, then where the alternative lies and its prior */
  return g_strdup_printf (_("%s The alternative lies %s, with %s."), null, direction, prior);
}

static char *
models_words (const TfAnalysis *a)
{
  g_autoptr (GString) out = g_string_new (NULL);
  double percent = 100.0 * a->level;

  if (a->n_models == 0)
    {
      g_autofree char *p = NUM (a->prior_null);
      g_string_append_printf (out, _("The null model has prior probability %s, the alternative the rest."), p);
    }
  else
    {
      g_string_append (out, _("The models compared, with their prior probabilities:"));
      for (guint i = 0; i < a->n_models; i++)
        {
          g_autofree char *p = NUM (a->model_priors[i]);
          g_string_append_printf (out, "%s %s %s", i == 0 ? "" : ";",
                                  tf_model_to_string (a->models[i]), p);
        }
      g_string_append_c (out, '.');
    }
  g_string_append_printf (out, _(" Intervals are at the %g%% level; tests at α = %g."),
                          percent, 1.0 - a->level);
  return g_string_free (g_steal_pointer (&out), FALSE);
}

static const char *const input_groups[] = { "Data", "Null", "Alternative", "Models", "Options" };

static void
add_inputs (TfReport *report, const TfAnalysis *analysis)
{
  g_autoptr (GKeyFile) key_file = tf_analysis_to_key_file (analysis);
  TfReportBlock *table = add_table (report, 1, 3, _("Group"), _("Key"), _("Value"));

  for (guint g = 0; g < G_N_ELEMENTS (input_groups); g++)
    {
      g_auto (GStrv) keys = g_key_file_get_keys (key_file, input_groups[g], NULL, NULL);

      for (guint k = 0; keys && keys[k]; k++)
        {
          char *value = g_key_file_get_string (key_file, input_groups[g], keys[k], NULL);

          add_row (table, g_strdup (input_groups[g]), g_strdup (keys[k]),
                   value ? value : g_strdup (""));
        }
    }
}

static const char *
section_title (TfReportSection section)
{
  switch (section)
    {
    case TF_REPORT_SECTION_BAYESIAN: return _("Bayesian");
    case TF_REPORT_SECTION_BOUNDS: return _("Bounds");
    case TF_REPORT_SECTION_CLASSICAL:
    case TF_REPORT_N_SECTIONS:
    default: return _("Classical");
    }
}

/* Every number of a section: its label, its value as the window shows it, all its digits
 * (as twofold-cli analyse --json gives them) and its id; or "not defined" and why. */
static void
add_numbers (TfReport *report, const TfResults *results)
{
  for (int s = 0; s < TF_REPORT_N_SECTIONS; s++)
    {
      TfReportBlock *table = NULL;

      for (guint i = 0; i < results->numbers->len; i++)
        {
          const TfNumber *n = g_ptr_array_index (results->numbers, i);
          char *value, *exact;

          if ((int) tf_report_section_of (n) != s)
            continue;
          if (table == NULL)
            {
              add_text (report, TF_REPORT_SUBHEADING, section_title (s));
              table = add_table (report, 3, 4, _("Number"), _("Value"), _("All digits"), _("Id"));
              table->digits_column = 2;
            }
          if (n->status == TF_STATUS_OK)
            {
              value = tf_number_format (n);
              exact = tf_format_double (n->value);
            }
          else
            {
              /* TRANSLATORS: a number that is not defined, then the reason */
              value = g_strdup_printf (_("not defined: %s"),
                                       n->reason ? n->reason : _("not defined for this input"));
              exact = g_strdup ("—");
            }
          add_row (table, g_strdup (n->label), value, exact, g_strdup (n->id));
        }
    }
}

static void
add_explanations (TfReport *report, const TfAnalysis *analysis, const TfResults *results)
{
  g_autoptr (GPtrArray) list = tf_explain (analysis, results);
  g_autofree char *disagreement = tf_diagnostic_text (analysis, results);

  add_text (report, TF_REPORT_HEADING, _("What the numbers say"));
  for (guint i = 0; i < list->len; i++)
    {
      const TfExplanation *e = g_ptr_array_index (list, i);
      /* the disagreement, when there is one, comes first: its second part is advice */
      gboolean advice = i == 0 && disagreement != NULL;

      add_text (report, TF_REPORT_SUBHEADING, e->title);
      add_text (report, TF_REPORT_PARAGRAPH, e->measures);
      add_block (report, TF_REPORT_PARAGRAPH,
                 advice ? _("What to do:") : _("What it does not say:"), g_strdup (e->does_not));
    }
}

static void
add_figures (TfReport *report, const TfReportFigure *figures, guint n_figures)
{
  if (n_figures == 0)
    return;
  add_text (report, TF_REPORT_HEADING, _("Figures"));
  for (guint i = 0; i < n_figures; i++)
    {
      add_text (report, TF_REPORT_SUBHEADING, figures[i].label);
      if (figures[i].why_not == NULL)
        add_block (report, TF_REPORT_FIGURE, figures[i].label, g_strdup (figures[i].kind));
      else
        add_block (report, TF_REPORT_PARAGRAPH, NULL,
                   /* TRANSLATORS: a figure left out of a report; %s is the reason */
                   g_strdup_printf (_("Left out: %s"), figures[i].why_not));
    }
}

TfReport *
tf_report_new (const TfAnalysis *analysis, const TfResults *results,
               const TfReportFigure *figures, guint n_figures, const char *date)
{
  TfReport *report = g_new0 (TfReport, 1);
  g_autofree char *today = date ? g_strdup (date) : tf_report_date_now ();
  const char *design = tf_design_label (analysis->design);

  report->blocks = g_ptr_array_new_with_free_func ((GDestroyNotify) tf_report_block_free);
  report->title = g_strdup (analysis->title && *analysis->title ? analysis->title : design);
  report->analysis_text = tf_analysis_to_data (analysis, NULL);

  add_text (report, TF_REPORT_TITLE, report->title);
  add_block (report, TF_REPORT_META, NULL,
             /* TRANSLATORS: date, version, then the design ("One proportion") */
             g_strdup_printf (_("Made on %s with Twofold %s. Design: %s."), today, TF_VERSION, design));
  add_text (report, TF_REPORT_CAUTION, tf_caution_text ());

  add_text (report, TF_REPORT_HEADING, _("The design"));
  add_block (report, TF_REPORT_PARAGRAPH, NULL, tf_design_class (analysis->design)->data_words (analysis));
  add_block (report, TF_REPORT_PARAGRAPH, NULL, hypotheses_words (analysis));
  add_block (report, TF_REPORT_PARAGRAPH, NULL, models_words (analysis));
  add_text (report, TF_REPORT_SUBHEADING, _("Inputs, as in the analysis file"));
  add_inputs (report, analysis);

  add_text (report, TF_REPORT_HEADING, _("Results"));
  add_text (report, TF_REPORT_PARAGRAPH,
            _("Values are rounded as in the window; “All digits” gives each as the analysis "
              "computed it, to the last digit that round-trips."));
  add_numbers (report, results);

  add_explanations (report, analysis, results);
  add_figures (report, figures, n_figures);

  add_text (report, TF_REPORT_HEADING, _("The analysis file"));
  add_text (report, TF_REPORT_PARAGRAPH,
            _("Save the text below as a file ending in .twofold, then open it in Twofold or "
              "run “twofold-cli analyse FILE” to reproduce every number in this report."));
  add_text (report, TF_REPORT_CODE, report->analysis_text);
  return report;
}
