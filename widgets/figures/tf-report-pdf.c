/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-report-pdf.c: a report's blocks on A4 pages with PangoCairo: 11 pt text, tables
 * whose rows never split across pages (the header row repeats on the next page), the
 * figures as vector graphics, "Page n of N" at the foot, an outline of the headings.
 *
 * The pages are laid out twice with the same code: first only to count them (nothing
 * drawn), then drawn with the count known.
 */
#include "tf-report-render.h"

#include <cairo-pdf.h>
#include <glib/gi18n-lib.h>
#include <pango/pangocairo.h>
#include <string.h>

#define MM (72.0 / 25.4)
#define MARGIN (20.0 * MM)
#define TEXT_WIDTH (TF_REPORT_PAGE_WIDTH - 2.0 * MARGIN)
#define BOTTOM (TF_REPORT_PAGE_HEIGHT - MARGIN)
#define FIGURE_HEIGHT (TEXT_WIDTH * 100.0 / 170.0)
#define CELL_PAD 3.0
#define GAP 6.0                 /* after a paragraph */

typedef struct {
  cairo_t *cr;
  gboolean draw;                /* FALSE: the counting pass */
  int page, n_pages;
  double y;                     /* the top of the free space on this page */
  int outline_h2;               /* the outline item of the last heading */
  const TfReport *report;
  TfFigure *const *figures;
  const TfFigureOptions *options;
} TfPager;

static PangoLayout *
layout_new (TfPager *p, const char *text, const char *font, double width, const char *lead)
{
  PangoLayout *layout = pango_cairo_create_layout (p->cr);
  PangoFontDescription *desc = pango_font_description_from_string (font);
  g_autofree char *full = lead ? g_strconcat (lead, " ", text, NULL) : g_strdup (text);

  pango_layout_set_font_description (layout, desc);
  pango_font_description_free (desc);
  pango_layout_set_width (layout, (int) (width * PANGO_SCALE));
  pango_layout_set_wrap (layout, PANGO_WRAP_WORD_CHAR);
  pango_layout_set_text (layout, full, -1);
  if (lead)
    {
      PangoAttrList *attrs = pango_attr_list_new ();
      PangoAttribute *bold = pango_attr_weight_new (PANGO_WEIGHT_BOLD);

      bold->start_index = 0;
      bold->end_index = (guint) strlen (lead);
      pango_attr_list_insert (attrs, bold);
      pango_layout_set_attributes (layout, attrs);
      pango_attr_list_unref (attrs);
    }
  return layout;
}

static double
layout_height (PangoLayout *layout)
{
  int w, h;

  pango_layout_get_size (layout, &w, &h);
  return (double) h / PANGO_SCALE;
}

static double
layout_width (PangoLayout *layout)
{
  int w, h;

  pango_layout_get_size (layout, &w, &h);
  return (double) w / PANGO_SCALE;
}

static void
show_layout (TfPager *p, PangoLayout *layout, double x, double y, double grey)
{
  if (!p->draw)
    return;
  cairo_set_source_rgb (p->cr, grey, grey, grey);
  cairo_move_to (p->cr, x, y);
  pango_cairo_show_layout (p->cr, layout);
}

static void
draw_footer (TfPager *p)
{
  g_autofree char *text = NULL;
  PangoLayout *layout;

  /* TRANSLATORS: at the foot of each page of a PDF report */
  text = g_strdup_printf (_("Page %d of %d"), p->page, p->n_pages);
  layout = layout_new (p, text, "Sans 9", TEXT_WIDTH, NULL);
  pango_layout_set_alignment (layout, PANGO_ALIGN_CENTER);
  show_layout (p, layout, MARGIN, BOTTOM + 0.4 * MARGIN, 0.35);
  g_object_unref (layout);
}

static void
new_page (TfPager *p)
{
  if (p->draw)
    {
      draw_footer (p);
      cairo_show_page (p->cr);
    }
  p->page++;
  p->y = MARGIN;
}

/* Room for height on this page, or a new page (unless this one is still empty). */
static void
need (TfPager *p, double height)
{
  if (p->y + height > BOTTOM && p->y > MARGIN)
    new_page (p);
}

static void
text_block (TfPager *p, const char *text, const char *font, const char *lead, double before,
            double after, double keep_with_next, double grey)
{
  PangoLayout *layout = layout_new (p, text, font, TEXT_WIDTH, lead);
  double h = layout_height (layout);

  if (p->y > MARGIN)
    p->y += before;
  need (p, h + keep_with_next);
  show_layout (p, layout, MARGIN, p->y, grey);
  p->y += h + after;
  g_object_unref (layout);
}

static double code_height (TfPager *p, const char *text);

/* A heading stays on the page of what follows it: a figure whole, a paragraph with the
 * file text under it whole (when it fits a page), else some lines. */
static void
heading (TfPager *p, const char *text, gboolean top_level, guint index)
{
  GPtrArray *blocks = p->report->blocks;
  const TfReportBlock *next = index + 1 < blocks->len ? g_ptr_array_index (blocks, index + 1) : NULL;
  const TfReportBlock *after = index + 2 < blocks->len ? g_ptr_array_index (blocks, index + 2) : NULL;
  double y0 = p->y;
  double keep = 60.0;

  if (next && next->kind == TF_REPORT_FIGURE)
    keep = FIGURE_HEIGHT;
  else if (next && next->kind == TF_REPORT_PARAGRAPH)
    {
      PangoLayout *layout = layout_new (p, next->text, "Sans 11", TEXT_WIDTH, next->lead);
      double whole = layout_height (layout);

      g_object_unref (layout);
      if (after && after->kind == TF_REPORT_CODE)
        whole += GAP + code_height (p, after->text);
      if (whole < BOTTOM - MARGIN - 40.0)
        keep = MAX (keep, whole);
    }

  text_block (p, text, top_level ? "Sans Bold 14" : "Sans Bold 11.5", NULL,
              top_level ? 14.0 : 8.0, 4.0, keep, 0.0);
  if (p->draw)
    {
      g_autofree char *link = NULL;
      double at = p->y > y0 ? y0 : MARGIN;

      link = g_strdup_printf ("page=%d pos=[%g %g]", p->page, MARGIN, at);
      if (top_level)
        p->outline_h2 = cairo_pdf_surface_add_outline (cairo_get_target (p->cr),
                                                       CAIRO_PDF_OUTLINE_ROOT, text, link, 0);
      else
        cairo_pdf_surface_add_outline (cairo_get_target (p->cr), p->outline_h2, text, link, 0);
    }
}

static void
caution (TfPager *p, const char *text)
{
  PangoLayout *layout = layout_new (p, text, "Sans 11", TEXT_WIDTH - 20.0, _("Caution."));
  double h = layout_height (layout) + 12.0;

  p->y += 4.0;
  need (p, h);
  if (p->draw)
    {
      cairo_set_source_rgb (p->cr, 1.0, 0.965, 0.925);
      cairo_rectangle (p->cr, MARGIN, p->y, TEXT_WIDTH, h);
      cairo_fill (p->cr);
      cairo_set_source_rgb (p->cr, 0.70, 0.35, 0.0);
      cairo_rectangle (p->cr, MARGIN, p->y, 3.0, h);
      cairo_fill (p->cr);
    }
  show_layout (p, layout, MARGIN + 12.0, p->y + 6.0, 0.0);
  p->y += h + 8.0;
  g_object_unref (layout);
}

static double
text_width (TfPager *p, const char *text, const char *font)
{
  PangoLayout *layout = layout_new (p, text, font, -1, NULL);
  double w;

  pango_layout_set_width (layout, -1);
  w = layout_width (layout);
  g_object_unref (layout);
  return w;
}

/* The width of a cell's longest word: it should not be broken. */
static double
word_width (TfPager *p, const char *text, const char *font)
{
  g_auto (GStrv) words = g_strsplit (text, " ", -1);
  double w = 0.0;

  for (guint i = 0; words[i]; i++)
    if (*words[i])
      w = MAX (w, text_width (p, words[i], font));
  return w;
}

static const char *
cell_font (const TfReportBlock *b, guint index)
{
  if (index < b->n_columns)
    return "Sans Bold 10";
  if ((int) (index % b->n_columns) == b->code_column
      || (int) (index % b->n_columns) == b->digits_column)
    return "Monospace 9";
  return "Sans 10";
}

/* Column widths as browsers do it: each column's natural width when the table fits;
 * otherwise each gets its longest word, and what is left goes to the columns in
 * proportion to how much more they would take. Returns the table's width. */
static double
column_widths (TfPager *p, const TfReportBlock *b, double *widths)
{
  double natural[8] = { 0 }, least[8] = { 0 }, total = 0.0, total_least = 0.0, extra = 0.0;
  guint n = MIN (b->n_columns, G_N_ELEMENTS (natural));

  for (guint i = 0; i < b->cells->len; i++)
    {
      guint c = i % b->n_columns;
      const char *text = g_ptr_array_index (b->cells, i);

      if (c >= n)
        continue;
      natural[c] = MAX (natural[c], text_width (p, text, cell_font (b, i)) + 2.0 * CELL_PAD + 1.0);
      least[c] = MAX (least[c], word_width (p, text, cell_font (b, i)) + 2.0 * CELL_PAD + 1.0);
    }
  for (guint c = 0; c < n; c++)
    {
      total += natural[c];
      total_least += least[c];
      extra += natural[c] - least[c];
    }
  for (guint c = 0; c < n; c++)
    {
      if (total <= TEXT_WIDTH)
        widths[c] = natural[c];
      else if (total_least >= TEXT_WIDTH && c == 0
               && least[0] - (total_least - TEXT_WIDTH) >= 0.4 * least[0])
        widths[c] = least[0] - (total_least - TEXT_WIDTH);   /* the labels' words break */
      else if (total_least >= TEXT_WIDTH && least[0] - (total_least - TEXT_WIDTH) >= 0.4 * least[0])
        widths[c] = least[c];
      else if (total_least >= TEXT_WIDTH || extra <= 0.0)
        widths[c] = TEXT_WIDTH * least[c] / total_least;
      else
        widths[c] = least[c] + (TEXT_WIDTH - total_least) * (natural[c] - least[c]) / extra;
    }
  return MIN (total, TEXT_WIDTH);
}

/* One row at p->y: its height, and drawn when draw. */
static double
table_row (TfPager *p, const TfReportBlock *b, guint row, const double *widths,
           double table_width, gboolean draw)
{
  PangoLayout *cells[8] = { NULL };
  guint n = MIN (b->n_columns, G_N_ELEMENTS (cells));
  double h = 0.0, x = MARGIN;
  gboolean header = row == 0;

  for (guint c = 0; c < n; c++)
    {
      const char *text = g_ptr_array_index (b->cells, row * b->n_columns + c);
      cells[c] = layout_new (p, text, cell_font (b, row * b->n_columns + c),
                             widths[c] - 2.0 * CELL_PAD, NULL);
      h = MAX (h, layout_height (cells[c]));
    }
  h += 2.0 * CELL_PAD;
  for (guint c = 0; c < n; c++)
    {
      if (draw)
        show_layout (p, cells[c], x + CELL_PAD, p->y + CELL_PAD, 0.0);
      x += widths[c];
      g_object_unref (cells[c]);
    }
  if (draw && p->draw)
    {
      cairo_set_source_rgb (p->cr, header ? 0.45 : 0.82, header ? 0.45 : 0.82, header ? 0.45 : 0.82);
      cairo_set_line_width (p->cr, header ? 1.0 : 0.5);
      cairo_move_to (p->cr, MARGIN, p->y + h);
      cairo_line_to (p->cr, MARGIN + table_width, p->y + h);
      cairo_stroke (p->cr);
    }
  return h;
}

static void
table (TfPager *p, const TfReportBlock *b)
{
  double widths[8];
  guint n_rows = b->cells->len / b->n_columns;
  double header_h, w;

  w = column_widths (p, b, widths);
  header_h = table_row (p, b, 0, widths, w, FALSE);
  /* the header with at least the first row */
  need (p, header_h + (n_rows > 1 ? table_row (p, b, 1, widths, w, FALSE) : 0.0));
  p->y += table_row (p, b, 0, widths, w, TRUE);
  for (guint r = 1; r < n_rows; r++)
    {
      double h = table_row (p, b, r, widths, w, FALSE);

      if (p->y + h > BOTTOM)
        {
          new_page (p);
          p->y += table_row (p, b, 0, widths, w, TRUE);
        }
      p->y += table_row (p, b, r, widths, w, TRUE);
    }
  p->y += GAP + 2.0;
}

static void
figure (TfPager *p, const TfReportBlock *b)
{
  TfFigureKind kind;

  if (!tf_figure_kind_from_string (b->text, &kind) || p->figures[kind] == NULL)
    return;
  need (p, FIGURE_HEIGHT);
  if (p->draw)
    {
      cairo_save (p->cr);
      cairo_translate (p->cr, MARGIN, p->y);
      cairo_rectangle (p->cr, 0, 0, TEXT_WIDTH, FIGURE_HEIGHT);
      cairo_clip (p->cr);
      tf_figure_draw (p->figures[kind], p->cr, TEXT_WIDTH, FIGURE_HEIGHT, 1.0, p->options, NULL);
      cairo_restore (p->cr);
    }
  p->y += FIGURE_HEIGHT + GAP;
}

static char **
code_lines (const char *text, guint *n)
{
  char **lines = g_strsplit (text, "\n", -1);

  *n = g_strv_length (lines);
  if (*n > 0 && *lines[*n - 1] == '\0')
    (*n)--;
  return lines;
}

static double
code_height (TfPager *p, const char *text)
{
  guint n;
  g_auto (GStrv) lines = code_lines (text, &n);
  double total = 10.0;

  for (guint i = 0; i < n; i++)
    {
      PangoLayout *layout = layout_new (p, lines[i], "Monospace 9", TEXT_WIDTH - 12.0, NULL);
      total += layout_height (layout);
      g_object_unref (layout);
    }
  return total;
}

/* The file text line by line on a grey ground, so that it may run over pages. */
static void
code (TfPager *p, const char *text)
{
  guint n;
  g_auto (GStrv) lines = code_lines (text, &n);
  double total = code_height (p, text);

  p->y += 2.0;
  if (total < BOTTOM - MARGIN)
    need (p, total);            /* whole on one page when it fits on one */
  for (guint i = 0; i < n; i++)
    {
      PangoLayout *layout = layout_new (p, lines[i], "Monospace 9", TEXT_WIDTH - 12.0, NULL);
      double h = layout_height (layout) + (i == 0 || i + 1 == n ? 4.0 : 0.0);
      double top = i == 0 ? 4.0 : 0.0;

      need (p, h);
      if (p->draw)
        {
          cairo_set_source_rgb (p->cr, 0.955, 0.955, 0.955);
          cairo_rectangle (p->cr, MARGIN, p->y, TEXT_WIDTH, h);
          cairo_fill (p->cr);
        }
      show_layout (p, layout, MARGIN + 6.0, p->y + top, 0.1);
      p->y += h;
      g_object_unref (layout);
    }
  p->y += GAP;
}

static void
lay_out (TfPager *p)
{
  p->page = 1;
  p->y = MARGIN;
  for (guint i = 0; i < p->report->blocks->len; i++)
    {
      const TfReportBlock *b = g_ptr_array_index (p->report->blocks, i);

      switch (b->kind)
        {
        case TF_REPORT_TITLE: text_block (p, b->text, "Sans Bold 20", NULL, 0.0, 4.0, 0.0, 0.0); break;
        case TF_REPORT_META: text_block (p, b->text, "Sans 10", NULL, 0.0, GAP, 0.0, 0.35); break;
        case TF_REPORT_CAUTION: caution (p, b->text); break;
        case TF_REPORT_HEADING: heading (p, b->text, TRUE, i); break;
        case TF_REPORT_SUBHEADING: heading (p, b->text, FALSE, i); break;
        case TF_REPORT_PARAGRAPH: text_block (p, b->text, "Sans 11", b->lead, 0.0, GAP, 0.0, 0.0); break;
        case TF_REPORT_TABLE: table (p, b); break;
        case TF_REPORT_FIGURE: figure (p, b); break;
        case TF_REPORT_CODE: code (p, b->text); break;
        }
    }
}

int
tf_report_draw_pdf (cairo_surface_t *surface, const TfReport *report,
                    TfFigure *const figures[TF_N_FIGURE_KINDS], const TfFigureOptions *options)
{
  TfPager p = { 0 };

  p.cr = cairo_create (surface);
  p.report = report;
  p.figures = figures;
  p.options = options;
  p.outline_h2 = CAIRO_PDF_OUTLINE_ROOT;
  lay_out (&p);                 /* count the pages */
  p.n_pages = p.page;
  p.draw = TRUE;
  lay_out (&p);
  draw_footer (&p);
  cairo_show_page (p.cr);
  cairo_destroy (p.cr);
  return p.n_pages;
}
