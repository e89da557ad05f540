/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-legend.c: legends with a sample of each line's colour and dash pattern.
 */
#include <math.h>
#include "tf-legend.h"

#define SWATCH_PT 20.0          /* length of the line sample */
#define PAD_PT 4.0              /* inside the legend box */
#define ROW_GAP_PT 1.5
#define COLUMN_GAP_PT 10.0

void
tf_legend_measure (cairo_t *cr, const TfFigureTheme *theme, const TfLegendEntry *entries,
                   guint n_entries, gboolean horizontal, double *width, double *height)
{
  double swatch = tf_figure_theme_pt (theme, SWATCH_PT + 4.0);
  double pad = tf_figure_theme_pt (theme, PAD_PT);
  double w = 0, h = 0;

  for (guint i = 0; i < n_entries; i++)
    {
      g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, theme->text_size,
                                                               entries[i].markup);
      double lw, lh;

      tf_figure_layout_size (layout, &lw, &lh);
      if (horizontal)
        {
          w += swatch + lw + (i > 0 ? tf_figure_theme_pt (theme, COLUMN_GAP_PT) : 0);
          h = MAX (h, lh);
        }
      else
        {
          w = MAX (w, swatch + lw);
          h += lh + (i > 0 ? tf_figure_theme_pt (theme, ROW_GAP_PT) : 0);
        }
    }
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
                guint n_entries, gboolean horizontal, double x, double y)
{
  double pad = tf_figure_theme_pt (theme, PAD_PT);
  double swatch = tf_figure_theme_pt (theme, SWATCH_PT);
  double cx = x + pad, cy = y + pad;
  double w, h;

  tf_legend_measure (cr, theme, entries, n_entries, horizontal, &w, &h);
  cairo_save (cr);
  /* a quiet ground so the text stays legible should a line pass behind */
  tf_figure_theme_set_source_alpha (cr, &theme->background, 0.85);
  cairo_rectangle (cr, x, y, w, h);
  cairo_fill (cr);

  for (guint i = 0; i < n_entries; i++)
    {
      g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, theme->text_size,
                                                               entries[i].markup);
      double lw, lh, mid;

      tf_figure_layout_size (layout, &lw, &lh);
      mid = cy + lh / 2;
      tf_figure_theme_set_series_line (cr, theme, entries[i].series);
      cairo_move_to (cr, cx, mid);
      cairo_line_to (cr, cx + swatch, mid);
      cairo_stroke (cr);

      tf_figure_theme_set_source (cr, &theme->foreground);
      cairo_move_to (cr, cx + swatch + tf_figure_theme_pt (theme, 4.0), cy);
      pango_cairo_show_layout (cr, layout);

      if (horizontal)
        cx += swatch + tf_figure_theme_pt (theme, 4.0) + lw + tf_figure_theme_pt (theme, COLUMN_GAP_PT);
      else
        cy += lh + tf_figure_theme_pt (theme, ROW_GAP_PT);
    }
  cairo_restore (cr);
}
