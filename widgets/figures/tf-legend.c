/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-legend.c: legends with a sample of each line's colour and dash pattern.
 */
#include <math.h>
#include "tf-legend.h"

#define SWATCH_PT 20.0          /* length of the line sample */
#define PAD_PT 4.0              /* inside the legend box */
#define ROW_GAP_PT 1.5
#define COLUMN_GAP_PT 10.0

#define MAX_ENTRIES 16

/* Column widths and row heights of the grid, user units. */
static void
legend_grid (cairo_t *cr, const TfFigureTheme *theme, const TfLegendEntry *entries,
             guint n_entries, guint columns, double *column_w, double *row_h)
{
  double swatch = tf_figure_theme_pt (theme, SWATCH_PT + 4.0);

  for (guint i = 0; i < n_entries && i < MAX_ENTRIES; i++)
    {
      g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, theme->text_size,
                                                               entries[i].markup);
      double lw, lh;

      tf_figure_layout_size (layout, &lw, &lh);
      column_w[i % columns] = MAX (column_w[i % columns], swatch + lw);
      row_h[i / columns] = MAX (row_h[i / columns], lh);
    }
}

void
tf_legend_measure (cairo_t *cr, const TfFigureTheme *theme, const TfLegendEntry *entries,
                   guint n_entries, guint columns, double *width, double *height)
{
  double column_w[MAX_ENTRIES] = { 0 }, row_h[MAX_ENTRIES] = { 0 };
  double pad = tf_figure_theme_pt (theme, PAD_PT);
  double w = 0, h = 0;
  guint rows;

  columns = CLAMP (columns, 1, MAX (MIN (n_entries, MAX_ENTRIES), 1));
  rows = (MIN (n_entries, MAX_ENTRIES) + columns - 1) / columns;
  legend_grid (cr, theme, entries, n_entries, columns, column_w, row_h);
  for (guint c = 0; c < columns; c++)
    w += column_w[c] + (c > 0 ? tf_figure_theme_pt (theme, COLUMN_GAP_PT) : 0);
  for (guint r = 0; r < rows; r++)
    h += row_h[r] + (r > 0 ? tf_figure_theme_pt (theme, ROW_GAP_PT) : 0);
  *width = w + 2 * pad;
  *height = h + 2 * pad;
}

/* Liang & Barsky (1984) clipping, used as a test: does the segment enter the box? */
static gboolean
segment_hits_box (double x0, double y0, double x1, double y1,
                  double left, double top, double right, double bottom)
{
  double dx = x1 - x0, dy = y1 - y0;
  double p[4] = { -dx, dx, -dy, dy };
  double q[4] = { x0 - left, right - x0, y0 - top, bottom - y0 };
  double t0 = 0, t1 = 1;

  for (int i = 0; i < 4; i++)
    {
      if (p[i] == 0)
        {
          if (q[i] < 0)
            return FALSE;
        }
      else
        {
          double t = q[i] / p[i];
          if (p[i] < 0)
            t0 = MAX (t0, t);
          else
            t1 = MIN (t1, t);
          if (t0 > t1)
            return FALSE;
        }
    }
  return TRUE;
}

static guint
count_hits (const TfPolyline *lines, guint n_lines,
            double left, double top, double right, double bottom)
{
  guint hits = 0;

  for (guint l = 0; l < n_lines; l++)
    for (guint i = 1; i < lines[l].n; i++)
      if (segment_hits_box (lines[l].x[i - 1], lines[l].y[i - 1], lines[l].x[i], lines[l].y[i],
                            left, top, right, bottom))
        hits++;
  return hits;
}

guint
tf_legend_fit_columns (cairo_t *cr, const TfFigureTheme *theme, const TfLegendEntry *entries,
                       guint n_entries, double max_width)
{
  guint columns;
  double w, h;

  for (columns = n_entries; columns > 1; columns--)
    {
      tf_legend_measure (cr, theme, entries, n_entries, columns, &w, &h);
      if (w <= max_width)
        break;
    }
  return columns;
}

gboolean
tf_legend_box_is_clear (const TfPolyline *lines, guint n_lines, double left, double top,
                        double right, double bottom)
{
  return count_hits (lines, n_lines, left, top, right, bottom) == 0;
}

gboolean
tf_legend_place (const TfPlotArea *area, double width, double height, double inset,
                 const TfPolyline *lines, guint n_lines, double *x, double *y)
{
  double left = area->x + inset;
  double right = area->x + area->width - inset - width;
  double top = area->y + inset;
  double bottom = area->y + area->height - inset - height;
  /* Fractions of the free width and height, in order of preference. */
  static const double fx[] = { 1.0, 0.0, 0.5, 0.75, 0.25 };
  static const double fy[] = { 0.0, 0.25, 0.5 };

  if (right < left || bottom < top)
    return FALSE;

  for (guint j = 0; j < G_N_ELEMENTS (fy); j++)
    for (guint i = 0; i < G_N_ELEMENTS (fx); i++)
      {
        double bx = left + fx[i] * (right - left);
        double by = top + fy[j] * (bottom - top);
        /* keep a little air around the box too */
        double air = inset * 0.5;

        if (count_hits (lines, n_lines, bx - air, by - air, bx + width + air,
                        by + height + air) == 0)
          {
            *x = bx;
            *y = by;
            return TRUE;
          }
      }
  return FALSE;
}

void
tf_legend_draw (cairo_t *cr, const TfFigureTheme *theme, const TfLegendEntry *entries,
                guint n_entries, guint columns, double x, double y)
{
  double column_w[MAX_ENTRIES] = { 0 }, row_h[MAX_ENTRIES] = { 0 };
  double pad = tf_figure_theme_pt (theme, PAD_PT);
  double swatch = tf_figure_theme_pt (theme, SWATCH_PT);
  double w, h, cy = y + pad;

  columns = CLAMP (columns, 1, MAX (MIN (n_entries, MAX_ENTRIES), 1));
  legend_grid (cr, theme, entries, n_entries, columns, column_w, row_h);
  tf_legend_measure (cr, theme, entries, n_entries, columns, &w, &h);
  cairo_save (cr);
  /* a quiet ground so the text stays legible should a line pass behind */
  tf_figure_theme_set_source_alpha (cr, &theme->background, 0.85);
  cairo_rectangle (cr, x, y, w, h);
  cairo_fill (cr);

  for (guint i = 0; i < n_entries && i < MAX_ENTRIES; i++)
    {
      g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, theme->text_size,
                                                               entries[i].markup);
      guint column = i % columns;
      double cx = x + pad, lh, line_y;

      for (guint c = 0; c < column; c++)
        cx += column_w[c] + tf_figure_theme_pt (theme, COLUMN_GAP_PT);
      if (column == 0 && i > 0)
        cy += row_h[i / columns - 1] + tf_figure_theme_pt (theme, ROW_GAP_PT);

      /* the sample sits level with the first line of text */
      {
        PangoLayoutIter *iter = pango_layout_get_iter (layout);
        PangoRectangle line;

        pango_layout_iter_get_line_extents (iter, NULL, &line);
        lh = (double) line.height / PANGO_SCALE;
        pango_layout_iter_free (iter);
      }
      line_y = cy + lh / 2;
      switch (entries[i].swatch)
        {
        case TF_SWATCH_FILLED:
        case TF_SWATCH_OUTLINE:
        case TF_SWATCH_HATCHED:
          {
            double bh = lh * 0.62, bw = swatch * 0.7, bx = cx + (swatch - bw) / 2;

            cairo_new_path (cr);
            cairo_rectangle (cr, bx, line_y - bh / 2, bw, bh);
            if (entries[i].swatch == TF_SWATCH_FILLED)
              {
                tf_figure_theme_set_source (cr, &theme->series[entries[i].series]);
                cairo_fill (cr);
              }
            else if (entries[i].swatch == TF_SWATCH_HATCHED)
              tf_figure_theme_fill_hatched (cr, theme, entries[i].series, 0.18);
            else
              {
                tf_figure_theme_set_source (cr, &theme->series[entries[i].series]);
                cairo_set_dash (cr, NULL, 0, 0);
                cairo_set_line_width (cr, tf_figure_theme_pt (theme, 1.2));
                cairo_stroke (cr);
              }
          }
          break;
        case TF_SWATCH_LINE:
        default:
          tf_figure_theme_set_series_line (cr, theme, entries[i].series);
          cairo_move_to (cr, cx, line_y);
          cairo_line_to (cr, cx + swatch, line_y);
          cairo_stroke (cr);
          tf_figure_theme_draw_marker (cr, theme, entries[i].series, cx + swatch / 2, line_y);
          break;
        }

      tf_figure_theme_set_source (cr, &theme->foreground);
      cairo_move_to (cr, cx + swatch + tf_figure_theme_pt (theme, 4.0), cy);
      pango_cairo_show_layout (cr, layout);
    }
  cairo_restore (cr);
}
