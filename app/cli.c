/* SPDX-License-Identifier: GPL-3.0-or-later
 * twofold-cli: Twofold without a window (DEVELOPERS.md, "Command line").
 *
 * Exit codes: 0 done; 1 the analysis could not be computed; 2 bad usage or a bad file
 * (the message on stderr names the file, group and key; nothing is written to stdout).
 */
#include "tf-design.h"
#include "tf-analysis-file.h"
#include "tf-explain.h"
#include "tf-results.h"
#include "tf-figure-export.h"
#include "tf-report-render.h"

#include <glib/gi18n.h>
#include <gsl/gsl_errno.h>
#include <locale.h>
#include <stdio.h>

enum { EXIT_DONE = 0, EXIT_NOT_COMPUTED = 1, EXIT_USAGE = 2 };

static void
print_problems (const char *filename, GPtrArray *problems)
{
  for (guint i = 0; i < problems->len; i++)
    {
      const TfProblem *p = g_ptr_array_index (problems, i);

      if (*p->group && *p->key)
        g_printerr ("%s: [%s] %s: %s\n", filename, p->group, p->key, p->message);
      else if (*p->group)
        g_printerr ("%s: [%s]: %s\n", filename, p->group, p->message);
      else
        g_printerr ("%s: %s\n", filename, p->message);
    }
}

static int
usage_error (const char *message)
{
  g_printerr ("twofold-cli: %s\n", message);
  g_printerr (_("Usage: twofold-cli analyse FILE [--json]\n"
                "       twofold-cli figure FILE --kind KIND --output OUT.png|OUT.svg|OUT.pdf\n"
                "                   [--width-mm W] [--height-mm H] [--dpi D] [--style light|dark|print]\n"
                "                   [--grades kass-raftery|jeffreys|none]\n"
                "       twofold-cli report FILE --output OUT.pdf|OUT.html|OUT.md\n"
                "       twofold-cli --help\n"));
  return EXIT_USAGE;
}

static void
print_text (const char *filename, const TfAnalysis *analysis, const TfResults *results)
{
  g_autoptr (GString) out = g_string_new (NULL);
  guint width = 0;

  g_string_append_printf (out, "%s\n", filename);
  g_string_append_printf (out, "%s%s%s\n\n", tf_design_label (analysis->design),
                          analysis->title ? ": " : "", analysis->title ? analysis->title : "");
  for (guint i = 0; i < results->numbers->len; i++)
    {
      const TfNumber *n = g_ptr_array_index (results->numbers, i);
      width = MAX (width, (guint) g_utf8_strlen (n->label, -1));
    }
  for (guint i = 0; i < results->numbers->len; i++)
    {
      const TfNumber *n = g_ptr_array_index (results->numbers, i);
      g_autofree char *value = tf_number_format (n);
      guint pad = width - (guint) g_utf8_strlen (n->label, -1);

      g_string_append_printf (out, "  %s%*s  %-22s %s", n->label, (int) pad, "", value, n->id);
      if (n->status != TF_STATUS_OK)
        g_string_append_printf (out, " (%s)", n->reason);
      g_string_append_c (out, '\n');
    }
  g_string_append_printf (out, "\n%s\n", tf_caution_text ());
  fputs (out->str, stdout);
}

/* What every command does first: its options parsed and exactly one file named.
 * FALSE with *status the exit code when not. */
static gboolean
parse_command (GOptionContext *context, int *argc, char ***argv, const char *command,
               int *status)
{
  g_autoptr (GError) error = NULL;

  if (!g_option_context_parse (context, argc, argv, &error))
    {
      *status = usage_error (error->message);
      return FALSE;
    }
  if (*argc != 3)
    {
      g_autofree char *message = *argc < 3
        /* TRANSLATORS: %s is a command: analyse, figure, report */
        ? g_strdup_printf (_("%s needs the analysis file to read"), command)
        /* TRANSLATORS: %s is a command: analyse, figure, report */
        : g_strdup_printf (_("%s reads one file"), command);

      *status = usage_error (message);
      return FALSE;
    }
  return TRUE;
}

/* The analysis file, or NULL with its problems printed (each naming the file, group and
 * key) and *status the exit code. */
static TfAnalysis *
load_file (const char *filename, int *status)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  TfAnalysis *analysis = tf_analysis_load (filename, problems);

  if (analysis == NULL)
    {
      print_problems (filename, problems);
      *status = EXIT_USAGE;
    }
  return analysis;
}

static int
command_analyse (int argc, char **argv)
{
  gboolean json = FALSE;
  GOptionEntry entries[] = {
    { "json", 0, 0, G_OPTION_ARG_NONE, &json, N_("Print one JSON object"), NULL },
    { NULL }
  };
  g_autoptr (GOptionContext) context = g_option_context_new (_("analyse FILE"));
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  int status = EXIT_DONE;
  g_autoptr (TfAnalysis) analysis = NULL;
  g_autoptr (TfResults) results = NULL;

  g_option_context_add_main_entries (context, entries, GETTEXT_PACKAGE);
  g_option_context_set_summary (context, _("Computes every number of an analysis file."));
  if (!parse_command (context, &argc, &argv, "analyse", &status)
      || !(analysis = load_file (argv[2], &status)))
    return status;
  results = tf_analysis_compute (analysis, problems);
  if (results == NULL)
    {
      print_problems (argv[2], problems);
      return EXIT_NOT_COMPUTED;
    }
  if (json)
    {
      g_autofree char *text = tf_results_to_json (tf_design_to_string (analysis->design), analysis->title,
                                                  results, problems);
      fputs (text, stdout);
    }
  else
    print_text (argv[2], analysis, results);
  return fflush (stdout) == 0 ? EXIT_DONE : EXIT_NOT_COMPUTED;
}

static int
command_figure (int argc, char **argv)
{
  g_autofree char *kind = NULL;
  g_autofree char *output = NULL;
  double width_mm = TF_FIGURE_DEFAULT_WIDTH_MM, height_mm = TF_FIGURE_DEFAULT_HEIGHT_MM;
  double dpi = TF_FIGURE_DEFAULT_DPI;
  g_autofree char *style = NULL;
  g_autofree char *grades = NULL;
  TfFigureOptions options = TF_FIGURE_OPTIONS_INIT;
  g_autofree char *kinds = tf_figure_kind_names ();
  GOptionEntry entries[] = {
    { "kind", 0, 0, G_OPTION_ARG_STRING, &kind, kinds, N_("KIND") },
    { "output", 'o', 0, G_OPTION_ARG_FILENAME, &output, N_("The file to write: .png, .svg or .pdf"), N_("OUT") },
    { "width-mm", 0, 0, G_OPTION_ARG_DOUBLE, &width_mm, N_("Width in millimetres (default 120)"), N_("W") },
    { "height-mm", 0, 0, G_OPTION_ARG_DOUBLE, &height_mm, N_("Height in millimetres (default 80)"), N_("H") },
    { "dpi", 0, 0, G_OPTION_ARG_DOUBLE, &dpi, N_("Dots per inch of a PNG (default 300)"), N_("D") },
    { "style", 0, 0, G_OPTION_ARG_STRING, &style, N_("light (default), dark or print (greyscale)"), N_("STYLE") },
    { "grades", 0, 0, G_OPTION_ARG_STRING, &grades,
      N_("evidence grades on Bayes factor axes: kass-raftery (Kass & Raftery 1995, default), jeffreys (Jeffreys 1961) or none"),
      N_("GRADES") },
    { NULL }
  };
  g_autoptr (GOptionContext) context = g_option_context_new (_("figure FILE"));
  g_autoptr (GError) error = NULL;
  int status = EXIT_DONE;
  g_autoptr (TfAnalysis) analysis = NULL;

  g_option_context_add_main_entries (context, entries, GETTEXT_PACKAGE);
  g_option_context_set_summary (context, _("Draws a figure of an analysis to PNG, SVG or PDF."));
  if (!parse_command (context, &argc, &argv, "figure", &status))
    return status;
  if (kind == NULL)
    return usage_error (_("figure needs --kind"));
  if (output == NULL)
    return usage_error (_("figure needs --output"));
  if (style && !tf_figure_style_from_string (style, &options.style))
    return usage_error (_("--style must be light, dark or print"));
  if (grades && !tf_evidence_scale_from_string (grades, &options.evidence_scale))
    return usage_error (_("--grades must be kass-raftery, jeffreys or none"));
  if (!(analysis = load_file (argv[2], &status)))
    return status;
  if (!tf_figure_export_full (analysis, kind, output, width_mm, height_mm, dpi, &options, &error))
    {
      gboolean usage = error->domain == TF_FIGURE_ERROR
                       && (error->code == TF_FIGURE_ERROR_UNKNOWN_KIND
                           || error->code == TF_FIGURE_ERROR_BAD_SIZE
                           || error->code == TF_FIGURE_ERROR_BAD_FORMAT
                           || error->code == TF_FIGURE_ERROR_INVALID_ANALYSIS);

      g_printerr ("%s: %s\n", argv[2], error->message);
      return usage ? EXIT_USAGE : EXIT_NOT_COMPUTED;
    }
  return EXIT_DONE;
}

static int
command_report (int argc, char **argv)
{
  g_autofree char *output = NULL;
  GOptionEntry entries[] = {
    { "output", 'o', 0, G_OPTION_ARG_FILENAME, &output,
      N_("The file to write: .pdf, .html or .md (Markdown also writes OUT-KIND.svg beside it)"),
      N_("OUT") },
    { NULL }
  };
  g_autoptr (GOptionContext) context = g_option_context_new (_("report FILE"));
  g_autoptr (GError) error = NULL;
  int status = EXIT_DONE;
  g_autoptr (TfAnalysis) analysis = NULL;

  g_option_context_add_main_entries (context, entries, GETTEXT_PACKAGE);
  g_option_context_set_summary (context,
                                _("Writes a report of an analysis: the design, the inputs, every number, "
                                  "the explanations, the figures and the analysis file itself.\n\n"
                                  "OUT.pdf: A4 pages with the figures drawn in.\n"
                                  "OUT.html: one self-contained file, the figures as inline SVG.\n"
                                  "OUT.md: Markdown text, and each figure that applies as OUT-KIND.svg\n"
                                  "beside it (KIND: one of the figure kinds of twofold-cli figure),\n"
                                  "linked by relative names."));
  if (!parse_command (context, &argc, &argv, "report", &status))
    return status;
  if (output == NULL)
    return usage_error (_("report needs --output"));
  if (!(analysis = load_file (argv[2], &status)))
    return status;
  if (!tf_report_export (analysis, output, NULL, &error))
    {
      gboolean usage = error->domain == TF_REPORT_ERROR
                       && (error->code == TF_REPORT_ERROR_BAD_FORMAT
                           || error->code == TF_REPORT_ERROR_NO_FOLDER
                           || error->code == TF_REPORT_ERROR_INVALID_ANALYSIS);

      g_printerr ("%s: %s\n", argv[2], error->message);
      return usage ? EXIT_USAGE : EXIT_NOT_COMPUTED;
    }
  return EXIT_DONE;
}

int
main (int argc, char **argv)
{
  setlocale (LC_ALL, "");
  bindtextdomain (GETTEXT_PACKAGE, LOCALEDIR);
  bind_textdomain_codeset (GETTEXT_PACKAGE, "UTF-8");
  textdomain (GETTEXT_PACKAGE);
  gsl_set_error_handler_off ();

  if (argc < 2)
    return usage_error (_("a command is needed"));
  if (g_str_equal (argv[1], "--help") || g_str_equal (argv[1], "-h") || g_str_equal (argv[1], "help"))
    {
      g_print (_("Usage: twofold-cli COMMAND ...\n\n"
                 "Commands:\n"
                 "  analyse FILE [--json]   every number of an analysis, as text or JSON\n"
                 "  figure FILE --kind KIND --output OUT.png|OUT.svg|OUT.pdf\n"
                 "         [--width-mm W] [--height-mm H] [--dpi D] [--style light|dark|print]\n"
                 "         [--grades kass-raftery|jeffreys|none]\n"
                 "                          a figure at the size a journal asks\n"
                 "  report FILE --output OUT.pdf|OUT.html|OUT.md\n"
                 "                          a report: design, inputs, every number, explanations,\n"
                 "                          figures and the analysis file (Markdown writes the\n"
                 "                          figures beside it as OUT-KIND.svg)\n\n"
                 "Exit codes: 0 done; 1 the analysis could not be computed;\n"
                 "2 bad usage or a bad file (the message names file, group and key).\n"));
      return EXIT_DONE;
    }
  if (g_str_equal (argv[1], "--version"))
    {
      g_print ("twofold-cli %s\n", TF_VERSION);
      return EXIT_DONE;
    }
  if (g_str_equal (argv[1], "analyse") || g_str_equal (argv[1], "analyze"))
    return command_analyse (argc, argv);
  if (g_str_equal (argv[1], "figure"))
    return command_figure (argc, argv);
  if (g_str_equal (argv[1], "report"))
    return command_report (argc, argv);
  {
    g_autofree char *message = g_strdup_printf (_("unknown command “%s”"), argv[1]);
    return usage_error (message);
  }
}
