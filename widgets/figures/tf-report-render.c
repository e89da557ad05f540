/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-report-render.c: a report with its figures to PDF, HTML or Markdown files.
 */
#include "tf-design.h"
#include "tf-report-render.h"
#include "tf-results.h"
#include "tf-figure-export.h"

#include <cairo-pdf.h>
#include <cairo-svg.h>
#include <glib/gi18n-lib.h>
#include <glib/gstdio.h>
#include <string.h>

/* The figures' size in a report: the width of an A4 page's text, 170 mm. */
#define FIGURE_WIDTH_MM 170.0
#define FIGURE_HEIGHT_MM 100.0
#define POINTS_PER_MM (72.0 / 25.4)

G_DEFINE_QUARK (tf-report-error-quark, tf_report_error)

gboolean
tf_report_format_from_filename (const char *filename, TfReportFormat *format)
{
  g_autofree char *lower = g_ascii_strdown (filename, -1);

  if (g_str_has_suffix (lower, ".pdf"))
    *format = TF_REPORT_FORMAT_PDF;
  else if (g_str_has_suffix (lower, ".html") || g_str_has_suffix (lower, ".htm"))
    *format = TF_REPORT_FORMAT_HTML;
  else if (g_str_has_suffix (lower, ".md"))
    *format = TF_REPORT_FORMAT_MARKDOWN;
  else
    return FALSE;
  return TRUE;
}

/* Every figure kind for this analysis: drawn (figures[k]), or left out with its reason. */
typedef struct {
  TfFigure *figures[TF_N_FIGURE_KINDS];
  char *why_not[TF_N_FIGURE_KINDS];
  TfReportFigure entries[TF_N_FIGURE_KINDS];
} TfReportFigures;

static void
figures_init (TfReportFigures *f, const TfAnalysis *analysis, const TfResults *results)
{
  for (guint k = 0; k < TF_N_FIGURE_KINDS; k++)
    {
      f->figures[k] = tf_figure_new_with_results (analysis, results, (TfFigureKind) k,
                                                 &f->why_not[k]);
      f->entries[k].kind = tf_figure_kind_to_string ((TfFigureKind) k);
      f->entries[k].label = tf_figure_kind_label ((TfFigureKind) k);
      f->entries[k].why_not = f->figures[k] ? NULL : f->why_not[k];
    }
}

static void
figures_clear (TfReportFigures *f)
{
  for (guint k = 0; k < TF_N_FIGURE_KINDS; k++)
    {
      g_clear_pointer (&f->figures[k], tf_figure_free);
      g_clear_pointer (&f->why_not[k], g_free);
    }
}

/* The figure as an SVG document, FIGURE_WIDTH_MM wide, in points like the figure export.
 * NULL when cairo failed. */
static GByteArray *
figure_svg (const TfFigure *figure, const TfFigureOptions *options)
{
  GByteArray *bytes = g_byte_array_new ();
  double w = FIGURE_WIDTH_MM * POINTS_PER_MM, h = FIGURE_HEIGHT_MM * POINTS_PER_MM;
  cairo_surface_t *surface = cairo_svg_surface_create_for_stream (tf_figure_append_bytes, bytes, w, h);
  cairo_status_t status;
  cairo_t *cr;

  cairo_svg_surface_set_document_unit (surface, CAIRO_SVG_UNIT_PT);
  cr = cairo_create (surface);
  tf_figure_draw (figure, cr, w, h, 1.0, options, NULL);
  cairo_destroy (cr);
  cairo_surface_finish (surface);
  status = cairo_surface_status (surface);
  cairo_surface_destroy (surface);
  if (status != CAIRO_STATUS_SUCCESS)
    {
      g_byte_array_unref (bytes);
      return NULL;
    }
  return bytes;
}

/* An SVG for inlining in HTML: no XML declaration, and its ids (cairo names glyphs and
 * clips "glyph0-1", "clip1" in every file) prefixed so that figures do not share them. */
static char *
svg_for_html (GByteArray *bytes, const char *prefix)
{
  g_autofree char *text = g_strndup ((const char *) bytes->data, bytes->len);
  const char *start = strstr (text, "<svg");
  GString *out = g_string_new (NULL);
  static const char *const refs[] = { "id=\"", "href=\"#", "url(#" };

  for (const char *p = start ? start : text; *p;)
    {
      gboolean matched = FALSE;

      for (guint i = 0; i < G_N_ELEMENTS (refs) && !matched; i++)
        if (g_str_has_prefix (p, refs[i]))
          {
            g_string_append_printf (out, "%s%s-", refs[i], prefix);
            p += strlen (refs[i]);
            matched = TRUE;
          }
      if (!matched)
        g_string_append_c (out, *p++);
    }
  while (out->len > 0 && g_ascii_isspace (out->str[out->len - 1]))
    g_string_truncate (out, out->len - 1);
  return g_string_free (out, FALSE);
}

static gboolean
write_file (const char *filename, const void *data, gsize length, GError **error)
{
  g_autoptr (GError) local = NULL;

  if (g_file_set_contents_full (filename, data, (gssize) length,
                                G_FILE_SET_CONTENTS_CONSISTENT, 0666, &local))
    return TRUE;
  g_set_error (error, TF_REPORT_ERROR, TF_REPORT_ERROR_WRITE, "%s", local->message);
  return FALSE;
}

static gboolean
draw_failed (const char *filename, GError **error)
{
  g_set_error (error, TF_REPORT_ERROR, TF_REPORT_ERROR_WRITE,
               _("%s: the figures could not be drawn."), filename);
  return FALSE;
}

static gboolean
export_html (const TfReport *report, TfReportFigures *f, const char *filename,
             const TfFigureOptions *options, GError **error)
{
  g_autoptr (GHashTable) svgs = g_hash_table_new_full (g_str_hash, g_str_equal, NULL, g_free);
  g_autofree char *html = NULL;

  for (guint k = 0; k < TF_N_FIGURE_KINDS; k++)
    {
      g_autoptr (GByteArray) bytes = NULL;
      g_autofree char *prefix = NULL;

      if (f->figures[k] == NULL)
        continue;
      bytes = figure_svg (f->figures[k], options);
      if (bytes == NULL)
        return draw_failed (filename, error);
      prefix = g_strdup_printf ("f%u", k);
      g_hash_table_insert (svgs, (gpointer) f->entries[k].kind, svg_for_html (bytes, prefix));
    }
  html = tf_report_to_html (report, svgs);
  return write_file (filename, html, strlen (html), error);
}

/* OUT.md, and OUT-<kind>.svg beside it. If one file cannot be written, the figures this
 * call wrote are removed again, so that a failed report leaves no part behind. */
static gboolean
export_markdown (const TfReport *report, TfReportFigures *f, const char *filename,
                 const TfFigureOptions *options, GError **error)
{
  g_autofree char *base = g_path_get_basename (filename);
  g_autoptr (GPtrArray) written = g_ptr_array_new_with_free_func (g_free);
  g_autofree char *markdown = NULL;
  gsize stem_length = strlen (filename) - strlen (".md");
  gboolean ok = TRUE;

  base[strlen (base) - strlen (".md")] = '\0';
  for (guint k = 0; k < TF_N_FIGURE_KINDS && ok; k++)
    {
      g_autoptr (GByteArray) bytes = NULL;
      char *name;

      if (f->figures[k] == NULL)
        continue;
      bytes = figure_svg (f->figures[k], options);
      if (bytes == NULL)
        {
          ok = draw_failed (filename, error);
          break;
        }
      name = g_strdup_printf ("%.*s-%s.svg", (int) stem_length, filename, f->entries[k].kind);
      ok = write_file (name, bytes->data, bytes->len, error);
      g_ptr_array_add (written, name);
    }
  if (ok)
    {
      markdown = tf_report_to_markdown (report, base);
      ok = write_file (filename, markdown, strlen (markdown), error);
    }
  for (guint i = 0; !ok && i < written->len; i++)
    g_unlink (g_ptr_array_index (written, i));
  return ok;
}

static gboolean
export_pdf (const TfReport *report, TfReportFigures *f, const char *filename,
            const TfFigureOptions *options, GError **error)
{
  g_autoptr (GByteArray) bytes = g_byte_array_new ();
  cairo_surface_t *surface;
  cairo_status_t status;

  surface = cairo_pdf_surface_create_for_stream (tf_figure_append_bytes, bytes, TF_REPORT_PAGE_WIDTH,
                                                 TF_REPORT_PAGE_HEIGHT);
  cairo_pdf_surface_set_metadata (surface, CAIRO_PDF_METADATA_CREATOR, "Twofold " TF_VERSION);
  cairo_pdf_surface_set_metadata (surface, CAIRO_PDF_METADATA_TITLE, report->title);
  tf_report_draw_pdf (surface, report, f->figures, options);
  cairo_surface_finish (surface);
  status = cairo_surface_status (surface);
  cairo_surface_destroy (surface);
  if (status != CAIRO_STATUS_SUCCESS)
    {
      g_set_error (error, TF_REPORT_ERROR, TF_REPORT_ERROR_WRITE,
                   _("%s: the report could not be drawn: %s."), filename,
                   cairo_status_to_string (status));
      return FALSE;
    }
  return write_file (filename, bytes->data, bytes->len, error);
}

gboolean
tf_report_export (const TfAnalysis *analysis, const char *filename, const char *date,
                  GError **error)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (TfResults) results = NULL;
  g_autoptr (TfReport) report = NULL;
  g_autofree char *folder = NULL;
  const TfFigureOptions options = TF_FIGURE_OPTIONS_INIT;
  TfReportFigures figures = { 0 };
  TfReportFormat format;
  gboolean ok = FALSE;

  if (!tf_report_format_from_filename (filename, &format))
    {
      g_set_error (error, TF_REPORT_ERROR, TF_REPORT_ERROR_BAD_FORMAT,
                   _("%s: the file name must end in .pdf, .html or .md."), filename);
      return FALSE;
    }
  folder = g_path_get_dirname (filename);
  if (!g_file_test (folder, G_FILE_TEST_IS_DIR))
    {
      g_set_error (error, TF_REPORT_ERROR, TF_REPORT_ERROR_NO_FOLDER,
                   _("%s: the folder “%s” does not exist."), filename, folder);
      return FALSE;
    }
  results = tf_analysis_compute (analysis, problems);
  if (results == NULL)
    {
      const TfProblem *p = g_ptr_array_index (problems, 0);
      g_set_error (error, TF_REPORT_ERROR, TF_REPORT_ERROR_INVALID_ANALYSIS,
                   "[%s] %s: %s", p->group, p->key, p->message);
      return FALSE;
    }

  figures_init (&figures, analysis, results);
  report = tf_report_new (analysis, results, figures.entries, TF_N_FIGURE_KINDS, date);
  switch (format)
    {
    case TF_REPORT_FORMAT_HTML: ok = export_html (report, &figures, filename, &options, error); break;
    case TF_REPORT_FORMAT_MARKDOWN: ok = export_markdown (report, &figures, filename, &options, error); break;
    case TF_REPORT_FORMAT_PDF:
    default: ok = export_pdf (report, &figures, filename, &options, error); break;
    }
  figures_clear (&figures);
  return ok;
}
