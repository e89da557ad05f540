/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-report-text.c: a report's blocks as Markdown (CommonMark with pipe tables) and as
 * one self-contained HTML5 file. Every string that is not our own markup is escaped.
 */
#include "tf-report.h"

#include <glib/gi18n-lib.h>
#include <string.h>

char *
tf_report_escape_html (const char *text)
{
  GString *out = g_string_sized_new (text ? strlen (text) + 16 : 1);

  for (const char *p = text ? text : ""; *p; p++)
    switch (*p)
      {
      case '&': g_string_append (out, "&amp;"); break;
      case '<': g_string_append (out, "&lt;"); break;
      case '>': g_string_append (out, "&gt;"); break;
      case '"': g_string_append (out, "&quot;"); break;
      case '\'': g_string_append (out, "&#39;"); break;
      default: g_string_append_c (out, *p); break;
      }
  return g_string_free (out, FALSE);
}

/* Backslash before what would start emphasis, code, links, HTML, tables, headings or
 * strike-through; '&' only where it could begin an entity; line breaks as spaces. */
char *
tf_report_escape_markdown (const char *text)
{
  GString *out = g_string_sized_new (text ? strlen (text) + 16 : 1);

  for (const char *p = text ? text : ""; *p; p++)
    {
      if (strchr ("\\`*_[]<>|#~", *p))
        g_string_append_c (out, '\\');
      else if (*p == '&' && (g_ascii_isalnum (p[1]) || p[1] == '#'))
        g_string_append_c (out, '\\');
      else if (*p == '\n' || *p == '\r')
        {
          g_string_append_c (out, ' ');
          continue;
        }
      g_string_append_c (out, *p);
    }
  return g_string_free (out, FALSE);
}

/* Markdown */

static void
md_escaped (GString *out, const char *text)
{
  g_autofree char *escaped = tf_report_escape_markdown (text);

  g_string_append (out, escaped);
}

static void
md_table (GString *out, const TfReportBlock *b)
{
  for (guint i = 0; i < b->cells->len; i++)
    {
      guint column = i % b->n_columns;
      const char *cell = g_ptr_array_index (b->cells, i);

      g_string_append (out, column == 0 ? "| " : " | ");
      if ((int) column == b->code_column && i >= b->n_columns && !strchr (cell, '`'))
        g_string_append_printf (out, "`%s`", cell);
      else
        md_escaped (out, cell);
      if (column + 1 == b->n_columns)
        {
          g_string_append (out, " |\n");
          if (i + 1 == b->n_columns)
            {
              for (guint c = 0; c < b->n_columns; c++)
                g_string_append (out, c == 0 ? "| --- |" : " --- |");
              g_string_append_c (out, '\n');
            }
        }
    }
}

/* A fence longer than any run of backticks in the text, so that the text is verbatim. */
static void
md_code (GString *out, const char *text)
{
  guint run = 0, longest = 0;
  g_autofree char *fence = NULL;

  for (const char *p = text; *p; p++)
    {
      run = *p == '`' ? run + 1 : 0;
      longest = MAX (longest, run);
    }
  fence = g_strnfill (MAX (3, longest + 1), '`');
  g_string_append_printf (out, "%s\n%s%s%s\n", fence, text,
                          g_str_has_suffix (text, "\n") || !*text ? "" : "\n", fence);
}

char *
tf_report_to_markdown (const TfReport *report, const char *figure_stem)
{
  GString *out = g_string_new (NULL);

  for (guint i = 0; i < report->blocks->len; i++)
    {
      const TfReportBlock *b = g_ptr_array_index (report->blocks, i);

      switch (b->kind)
        {
        case TF_REPORT_TITLE: g_string_append (out, "# "); md_escaped (out, b->text); break;
        case TF_REPORT_HEADING: g_string_append (out, "## "); md_escaped (out, b->text); break;
        case TF_REPORT_SUBHEADING: g_string_append (out, "### "); md_escaped (out, b->text); break;
        case TF_REPORT_META: g_string_append_c (out, '*'); md_escaped (out, b->text); g_string_append_c (out, '*'); break;
        case TF_REPORT_CAUTION:
          g_string_append_printf (out, "> **%s** ", _("Caution."));
          md_escaped (out, b->text);
          break;
        case TF_REPORT_PARAGRAPH:
          if (b->lead)
            {
              g_string_append (out, "**");
              md_escaped (out, b->lead);
              g_string_append (out, "** ");
            }
          md_escaped (out, b->text);
          break;
        case TF_REPORT_TABLE: md_table (out, b); break;
        case TF_REPORT_FIGURE:
          if (figure_stem)
            {
              g_autofree char *name = g_strdup_printf ("%s-%s.svg", figure_stem, b->text);
              g_autofree char *link = g_uri_escape_string (name, NULL, FALSE);

              g_string_append (out, "![");
              md_escaped (out, b->lead);
              g_string_append_printf (out, "](%s)", link);
            }
          break;
        case TF_REPORT_CODE: md_code (out, b->text); break;
        }
      if (!g_str_has_suffix (out->str, "\n"))
        g_string_append_c (out, '\n');
      g_string_append_c (out, '\n');
    }
  return g_string_free (out, FALSE);
}

/* HTML */

static const char html_style[] =
  "body{font:11pt/1.45 system-ui,sans-serif;color:#1a1a1a;background:#fff;margin:0}"
  "main{max-width:50em;margin:0 auto;padding:1.5em}"
  "h1{font-size:1.6em;margin:.2em 0}h2{font-size:1.25em;margin-top:1.6em;"
  "border-bottom:1px solid #ccc}h3{font-size:1.05em;margin-top:1.2em}"
  ".meta{color:#555}"
  ".caution{border-left:4px solid #b35900;background:#fff6ec;padding:.6em .9em;margin:1em 0}"
  "table{border-collapse:collapse;width:100%;margin:.5em 0}"
  "th,td{text-align:left;vertical-align:top;padding:.25em .5em;border-bottom:1px solid #ddd}"
  "thead th{border-bottom:2px solid #888}"
  "td.value{font-variant-numeric:tabular-nums}"
  "code,pre{font-family:ui-monospace,monospace;font-size:.95em}"
  "pre{background:#f4f4f4;padding:.8em;overflow-x:auto;white-space:pre-wrap}"
  "figure{margin:1em 0}figure svg{max-width:100%;height:auto}"
  "@media print{main{max-width:none}h2,h3{break-after:avoid}tr,figure{break-inside:avoid}}";

static void
html_escaped (GString *out, const char *text)
{
  g_autofree char *escaped = tf_report_escape_html (text);

  g_string_append (out, escaped);
}

static void
html_element (GString *out, const char *tag, const char *attributes, const char *text)
{
  g_string_append_printf (out, "<%s%s>", tag, attributes);
  html_escaped (out, text);
  g_string_append_printf (out, "</%s>", tag);
}

static void
html_line (GString *out, const char *tag, const char *attributes, const char *text)
{
  html_element (out, tag, attributes, text);
  g_string_append_c (out, '\n');
}

static void
html_table (GString *out, const TfReportBlock *b)
{
  g_string_append (out, "<table>\n<thead>\n");
  for (guint i = 0; i < b->cells->len; i++)
    {
      guint column = i % b->n_columns;
      gboolean header = i < b->n_columns;
      const char *cell = g_ptr_array_index (b->cells, i);

      if (column == 0)
        g_string_append (out, "<tr>");
      if (header)
        html_element (out, "th", " scope=\"col\"", cell);
      else if (column == 0)
        html_element (out, "th", " scope=\"row\"", cell);
      else if ((int) column == b->code_column)
        {
          g_string_append (out, "<td>");
          html_element (out, "code", "", cell);
          g_string_append (out, "</td>");
        }
      else
        html_element (out, "td", " class=\"value\"", cell);
      if (column + 1 == b->n_columns)
        g_string_append (out, header && i + 1 == b->n_columns ? "</tr>\n</thead>\n<tbody>\n" : "</tr>\n");
    }
  g_string_append (out, "</tbody>\n</table>\n");
}

static void
html_code (GString *out, const char *text)
{
  g_autofree char *uri_text = g_uri_escape_string (text, NULL, FALSE);

  /* a newline right after <pre> is dropped by HTML parsers: one of ours, not the text's */
  g_string_append (out, "<pre id=\"analysis-file\">\n");
  html_escaped (out, text);
  g_string_append (out, "</pre>\n");
  g_string_append_printf (out,
                          "<p><a download=\"analysis.twofold\" "
                          "href=\"data:application/x-twofold;charset=utf-8,%s\">", uri_text);
  html_escaped (out, _("Save the analysis file"));
  g_string_append (out, "</a></p>\n");
}

char *
tf_report_to_html (const TfReport *report, GHashTable *svg_by_kind)
{
  GString *out = g_string_new ("<!DOCTYPE html>\n");

  /* TRANSLATORS: the language code of this translation, for the HTML report */
  g_string_append_printf (out, "<html lang=\"%s\">\n<head>\n<meta charset=\"utf-8\">\n", _("en"));
  g_string_append (out, "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n"
                        "<meta name=\"generator\" content=\"Twofold " TF_VERSION "\">\n");
  html_line (out, "title", "", report->title);
  g_string_append_printf (out, "<style>%s</style>\n</head>\n<body>\n<main>\n", html_style);

  for (guint i = 0; i < report->blocks->len; i++)
    {
      const TfReportBlock *b = g_ptr_array_index (report->blocks, i);

      switch (b->kind)
        {
        case TF_REPORT_TITLE: html_line (out, "h1", "", b->text); break;
        case TF_REPORT_META: html_line (out, "p", " class=\"meta\"", b->text); break;
        case TF_REPORT_HEADING: html_line (out, "h2", "", b->text); break;
        case TF_REPORT_SUBHEADING: html_line (out, "h3", "", b->text); break;
        case TF_REPORT_CAUTION:
          g_string_append (out, "<aside class=\"caution\" role=\"note\"><strong>");
          html_escaped (out, _("Caution."));
          g_string_append (out, "</strong> ");
          html_escaped (out, b->text);
          g_string_append (out, "</aside>\n");
          break;
        case TF_REPORT_PARAGRAPH:
          g_string_append (out, "<p>");
          if (b->lead)
            {
              html_element (out, "strong", "", b->lead);
              g_string_append_c (out, ' ');
            }
          html_escaped (out, b->text);
          g_string_append (out, "</p>\n");
          break;
        case TF_REPORT_TABLE: html_table (out, b); break;
        case TF_REPORT_FIGURE:
          {
            const char *svg = svg_by_kind ? g_hash_table_lookup (svg_by_kind, b->text) : NULL;

            if (svg == NULL)
              break;
            g_string_append_printf (out, "<figure id=\"figure-%s\" role=\"img\" aria-label=\"", b->text);
            html_escaped (out, b->lead);
            g_string_append_printf (out, "\">\n%s\n", svg);
            html_line (out, "figcaption", "", b->lead);
            g_string_append (out, "</figure>\n");
          }
          break;
        case TF_REPORT_CODE: html_code (out, b->text); break;
        }
    }
  g_string_append (out, "</main>\n</body>\n</html>\n");
  return g_string_free (out, FALSE);
}
