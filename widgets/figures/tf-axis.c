/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-axis.c: plot areas, ticks by Heckbert's nice numbers, and axes.
 */
#include <math.h>
#include "tf-axis.h"

#define GAP_PT 2.5              /* between tick and label, label and axis label */

double
tf_plot_area_map_x (const TfPlotArea *area, double value)
{
  double span = area->x_hi - area->x_lo;
  return area->x + (span > 0 ? (value - area->x_lo) / span : 0.5) * area->width;
}

double
tf_plot_area_map_y (const TfPlotArea *area, double value)
{
  double span = area->y_hi - area->y_lo;
  return area->y + area->height - (span > 0 ? (value - area->y_lo) / span : 0.5) * area->height;
}

double
tf_plot_area_unmap_x (const TfPlotArea *area, double x)
{
  double c = area->width > 0 ? area->x_lo + (x - area->x) / area->width * (area->x_hi - area->x_lo)
                             : area->x_lo;
  return area->x_log ? pow (10.0, c) : c;
}

const TfPlotArea *
tf_figure_panels_at (const TfFigurePanels *panels, double x, double y)
{
  const TfPlotArea *first, *best = NULL;
  double best_d = INFINITY;

  if (panels == NULL || panels->n == 0)
    return NULL;
  first = &panels->area[0];
  if (y < first->y || x < first->x || x > first->x + first->width)
    return NULL;
  for (guint i = 0; i < panels->n && i < TF_FIGURE_PANELS_MAX; i++)
    {
      const TfPlotArea *a = &panels->area[i];
      double d = y < a->y ? a->y - y : y > a->y + a->height ? y - a->y - a->height : 0;

      /* the nearest: below them all, the lowest */
      if (d < best_d)
        best = a, best_d = d;
    }
  return best;
}

/* The nice number below step: 10 → 5 → 2 → 1 → 0.5 ... */
static double
smaller_nice (double step)
{
  double e = pow (10.0, floor (log10 (step) + 1e-9));
  double f = step / e;

  return f >= 4.5 ? 2 * e : f >= 1.5 ? e : 0.5 * e;
}

/* How many multiples of step lie in [lo, hi], with slack share of the range either side. */
static guint
count_ticks (double lo, double hi, double step, double slack, double *first)
{
  double a = ceil (lo / step - 1e-9 - slack * (hi - lo) / step) * step;
  double b = floor (hi / step + 1e-9 + slack * (hi - lo) / step) * step;

  *first = a;
  return b + step * 1e-9 >= a ? (guint) floor ((b - a) / step + 0.5) + 1 : 0;
}

/* Heckbert (1990), "Nice numbers for graph labels", Graphics Gems I, pp. 61-63. */
double
tf_nice_number (double x, gboolean round)
{
  double exponent, fraction, nice;

  if (!(x > 0) || !isfinite (x))
    return 1.0;
  exponent = floor (log10 (x));
  fraction = x / pow (10.0, exponent);
  if (round)
    nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
  else
    nice = fraction <= 1 ? 1 : fraction <= 2 ? 2 : fraction <= 5 ? 5 : 10;
  return nice * pow (10.0, exponent);
}

/* Heckbert (1990) loose labelling. */
void
tf_ticks_compute (TfTicks *ticks, double lo, double hi, guint target, gboolean loose)
{
  double range, step, first;

  if (!isfinite (lo) || !isfinite (hi))
    lo = 0, hi = 1;
  if (hi < lo)
    {
      double t = lo;
      lo = hi;
      hi = t;
    }
  if (hi - lo <= fabs (hi) * 1e-12 || hi == lo)
    {
      double pad = lo != 0 ? fabs (lo) * 0.1 : 1.0;
      lo -= pad;
      hi += pad;
    }
  target = CLAMP (target, 2, 12);

  range = tf_nice_number (hi - lo, FALSE);
  step = tf_nice_number (range / (target - 1), TRUE);
  if (loose)
    {
      lo = floor (lo / step + 1e-9) * step;
      hi = ceil (hi / step - 1e-9) * step;
    }
  /* A tick a hair outside the range (0 when the grid starts at 0.005) still counts. A
   * tight range keeps at least two labelled ticks: finer steps until it has them. */
  ticks->n = count_ticks (lo, hi, step, 0.01, &first);
  while (!loose && ticks->n < 2)
    {
      step = smaller_nice (step);
      ticks->n = count_ticks (lo, hi, step, 0.01, &first);
    }

  ticks->lo = lo;
  ticks->hi = hi;
  ticks->first = first;
  ticks->step = step;
  ticks->n_frac = (int) MAX (-floor (log10 (step) + 1e-9), 0);
  ticks->log = FALSE;
  ticks->minor = FALSE;
}

/* Heckbert (1990) nice numbers applied to the exponent: decade steps of 1, 2, 5, 10... */
void
tf_ticks_compute_log (TfTicks *ticks, double lo10, double hi10, guint target, gboolean loose)
{
  double step, first;

  if (!isfinite (lo10) || !isfinite (hi10))
    lo10 = -1, hi10 = 1;
  if (hi10 < lo10)
    {
      double t = lo10;
      lo10 = hi10;
      hi10 = t;
    }
  if (hi10 - lo10 < 1e-9)
    {
      lo10 -= 0.5;
      hi10 += 0.5;
    }
  target = CLAMP (target, 2, 12);
  step = MAX (1.0, tf_nice_number ((hi10 - lo10) / (target - 1), TRUE));
  if (loose)
    {
      /* out to whole labelled steps, or only to whole decades where a step would add
       * more than a quarter of the span (data over 10^-0.2 .. 10^550 do not need an axis
       * down to 10^-200) */
      double span = hi10 - lo10;
      double a = floor (lo10 / step + 1e-9) * step, b = ceil (hi10 / step - 1e-9) * step;

      lo10 = lo10 - a > 0.25 * span ? floor (lo10 + 1e-9) : a;
      hi10 = b - hi10 > 0.25 * span ? ceil (hi10 - 1e-9) : b;
    }
  /* a tight range keeps two labelled decades where it spans them */
  ticks->n = count_ticks (lo10, hi10, step, 0, &first);
  while (!loose && ticks->n < 2 && step > 1)
    {
      step = MAX (1.0, smaller_nice (step));
      ticks->n = count_ticks (lo10, hi10, step, 0, &first);
    }
  ticks->lo = lo10;
  ticks->hi = hi10;
  ticks->first = first;
  ticks->step = step;
  ticks->n_frac = 0;
  ticks->log = TRUE;
  ticks->minor = step == 1 && hi10 - lo10 <= 6.5;
}

double
tf_ticks_value (const TfTicks *ticks, guint i)
{
  double v = ticks->first + i * ticks->step;
  /* no "-0" and no 0.30000000000000004 */
  if (fabs (v) < ticks->step * 1e-9)
    v = 0;
  return v;
}

char *
tf_ticks_label (const TfTicks *ticks, guint i)
{
  double v = tf_ticks_value (ticks, i);
  g_autofree char *text = NULL;

  if (ticks->log)
    {
      int k = (int) lround (v);

      if (k >= -3 && k <= 3)
        return g_strdup_printf ("%.*f", MAX (-k, 0), pow (10.0, k));
      if (k < 0)
        return g_strdup_printf ("10<sup>\u2212%d</sup>", -k);
      return g_strdup_printf ("10<sup>%d</sup>", k);
    }
  text = g_strdup_printf ("%.*f", ticks->n_frac, fabs (v));

  if (v < 0)
    return g_strconcat ("\u2212", text, NULL);
  return g_steal_pointer (&text);
}

guint
tf_ticks_target (const TfFigureTheme *theme, double length, double spacing_pt)
{
  double n = length / tf_figure_theme_pt (theme, spacing_pt);
  return (guint) CLAMP (floor (n) + 1, 2, 10);
}

/* The widest and the tallest of the ticks' labels (either may be NULL). */
static void
tick_labels_size (cairo_t *cr, const TfFigureTheme *theme, const TfTicks *ticks,
                  double *widest, double *tallest)
{
  double max_w = 0, max_h = 0;

  for (guint i = 0; i < ticks->n; i++)
    {
      g_autofree char *text = tf_ticks_label (ticks, i);
      g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, theme->text_size, text);
      double w, h;

      tf_figure_layout_size (layout, &w, &h);
      max_w = MAX (max_w, w);
      max_h = MAX (max_h, h);
    }
  if (widest)
    *widest = max_w;
  if (tallest)
    *tallest = max_h;
}

double
tf_axis_widest_tick_label (cairo_t *cr, const TfFigureTheme *theme, const TfTicks *ticks)
{
  double w;

  tick_labels_size (cr, theme, ticks, &w, NULL);
  return w;
}

/* The height of an axis's name (0 without one). */
static double
label_height (cairo_t *cr, const TfFigureTheme *theme, const char *label_markup)
{
  g_autoptr (PangoLayout) layout = NULL;
  double h;

  if (label_markup == NULL)
    return 0;
  layout = tf_figure_theme_layout (cr, theme, theme->label_size, label_markup);
  tf_figure_layout_size (layout, NULL, &h);
  return h;
}

double
tf_axis_left_extent (cairo_t *cr, const TfFigureTheme *theme, const TfTicks *ticks,
                     const char *label_markup)
{
  double widest = tf_axis_widest_tick_label (cr, theme, ticks);
  double label_h = label_height (cr, theme, label_markup);

  return tf_figure_theme_pt (theme, theme->tick_length + GAP_PT) + widest
         + (label_h > 0 ? tf_figure_theme_pt (theme, GAP_PT * 1.5) + label_h : 0);
}

double
tf_axis_bottom_extent (cairo_t *cr, const TfFigureTheme *theme, const char *label_markup)
{
  g_autoptr (PangoLayout) digits = tf_figure_theme_layout (cr, theme, theme->text_size, "0.9");
  double tick_h;

  tf_figure_layout_size (digits, NULL, &tick_h);
  return tf_axis_bottom_extent_ticks (cr, theme, NULL, label_markup) + tick_h;
}

double
tf_axis_bottom_extent_ticks (cairo_t *cr, const TfFigureTheme *theme, const TfTicks *ticks,
                             const char *label_markup)
{
  double tick_h = 0, label_h = label_height (cr, theme, label_markup);

  if (ticks)
    tick_labels_size (cr, theme, ticks, NULL, &tick_h);
  return tf_figure_theme_pt (theme, theme->tick_length + GAP_PT) + tick_h
         + (label_h > 0 ? tf_figure_theme_pt (theme, GAP_PT) + label_h : 0);
}

/* An axis label no longer than max_len: smaller type as far as needed, down to 5 pt.
 * (No ellipsis: Pango 1.50 warns on ellipsized markup with sub- or superscripts.) */
static PangoLayout *
fitted_label (cairo_t *cr, const TfFigureTheme *theme, const char *markup, double max_len)
{
  PangoLayout *layout = tf_figure_theme_layout (cr, theme, theme->label_size, markup);
  double w;

  tf_figure_layout_size (layout, &w, NULL);
  if (w <= max_len || max_len <= 0)
    return layout;
  g_object_unref (layout);
  return tf_figure_theme_layout (cr, theme, MAX (theme->label_size * max_len / w * 0.98, 5.0),
                                 markup);
}

static void
draw_layout_at (cairo_t *cr, PangoLayout *layout, double x, double y)
{
  cairo_move_to (cr, x, y);
  pango_cairo_show_layout (cr, layout);
}

/* Minor ticks of a log axis at 2..9 times each decade inside [lo, hi]; calls back with
 * each coordinate. */
static guint
minor_ticks (const TfTicks *ticks, double *out, guint max)
{
  guint n = 0;

  if (!ticks->log || !ticks->minor)
    return 0;
  for (double d = floor (ticks->lo); d < ticks->hi && n < max; d += 1)
    for (int m = 2; m <= 9 && n < max; m++)
      {
        double c = d + log10 (m);
        if (c >= ticks->lo - 1e-9 && c <= ticks->hi + 1e-9)
          out[n++] = c;
      }
  return n;
}

/* The axis's line from (x0, y0) to (x1, y1), square-capped; the ticks after it butt. */
static void
draw_spine (cairo_t *cr, const TfFigureTheme *theme, double x0, double y0, double x1,
            double y1)
{
  tf_figure_theme_set_source (cr, &theme->foreground);
  cairo_set_line_width (cr, tf_figure_theme_pt (theme, theme->axis_width));
  cairo_set_dash (cr, NULL, 0, 0);
  cairo_set_line_cap (cr, CAIRO_LINE_CAP_SQUARE);
  cairo_move_to (cr, x0, y0);
  cairo_line_to (cr, x1, y1);
  cairo_stroke (cr);
  cairo_set_line_cap (cr, CAIRO_LINE_CAP_BUTT);
}

static void
draw_bottom_ticks (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                   const TfTicks *ticks)
{
  double base = area->y + area->height;
  double tick = tf_figure_theme_pt (theme, theme->tick_length);
  double minor[64];
  guint n_minor = minor_ticks (ticks, minor, G_N_ELEMENTS (minor));

  for (guint i = 0; i < ticks->n; i++)
    {
      double x = tf_plot_area_map_x (area, tf_ticks_value (ticks, i));
      cairo_move_to (cr, x, base);
      cairo_line_to (cr, x, base + tick);
    }
  cairo_stroke (cr);
  for (guint i = 0; i < n_minor; i++)
    {
      double x = tf_plot_area_map_x (area, minor[i]);
      cairo_move_to (cr, x, base);
      cairo_line_to (cr, x, base + tick * 0.55);
    }
  cairo_stroke (cr);
}

void
tf_axis_draw_bottom_bare (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                          const TfTicks *ticks)
{
  double base = area->y + area->height;

  cairo_save (cr);
  draw_spine (cr, theme, area->x, base, area->x + area->width, base);
  draw_bottom_ticks (cr, theme, area, ticks);
  cairo_restore (cr);
}

void
tf_axis_draw_bottom (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                     const TfTicks *ticks, const char *label_markup)
{
  double base = area->y + area->height;
  double tick = tf_figure_theme_pt (theme, theme->tick_length);
  double gap = tf_figure_theme_pt (theme, GAP_PT);
  double label_top = base + tick + gap;
  double tick_h = 0;

  tf_axis_draw_bottom_bare (cr, theme, area, ticks);
  cairo_save (cr);
  tf_figure_theme_set_source (cr, &theme->foreground);
  for (guint i = 0; i < ticks->n; i++)
    {
      double v = tf_ticks_value (ticks, i);
      double x = tf_plot_area_map_x (area, v);
      g_autofree char *text = tf_ticks_label (ticks, i);
      g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, theme->text_size, text);
      double w, h;

      tf_figure_layout_size (layout, &w, &h);
      tick_h = MAX (tick_h, h);
      draw_layout_at (cr, layout, x - w / 2, label_top);
    }

  if (label_markup)
    {
      g_autoptr (PangoLayout) layout = fitted_label (cr, theme, label_markup,
                                                     area->width + tf_figure_theme_pt (theme, 8.0));
      double w;

      if (tick_h == 0)
        {
          g_autoptr (PangoLayout) digits = tf_figure_theme_layout (cr, theme, theme->text_size, "0");
          tf_figure_layout_size (digits, NULL, &tick_h);
        }
      tf_figure_layout_size (layout, &w, NULL);
      draw_layout_at (cr, layout, area->x + (area->width - w) / 2, label_top + tick_h + gap);
    }
  cairo_restore (cr);
}

static void
draw_left_minor_ticks (cairo_t *cr, const TfPlotArea *area, const TfTicks *ticks,
                       double length)
{
  double minor[64];
  guint n_minor = minor_ticks (ticks, minor, G_N_ELEMENTS (minor));

  for (guint i = 0; i < n_minor; i++)
    {
      double y = tf_plot_area_map_y (area, minor[i]);
      cairo_move_to (cr, area->x, y);
      cairo_line_to (cr, area->x - length, y);
    }
  cairo_stroke (cr);
}

void
tf_axis_draw_left (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                   const TfTicks *ticks, const char *label_markup)
{
  double tick = tf_figure_theme_pt (theme, theme->tick_length);
  double gap = tf_figure_theme_pt (theme, GAP_PT);
  double widest = 0;

  cairo_save (cr);
  draw_spine (cr, theme, area->x, area->y, area->x, area->y + area->height);
  for (guint i = 0; i < ticks->n; i++)
    {
      double v = tf_ticks_value (ticks, i);
      double y = tf_plot_area_map_y (area, v);
      g_autofree char *text = tf_ticks_label (ticks, i);
      g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, theme->text_size, text);
      double w, h;

      cairo_move_to (cr, area->x, y);
      cairo_line_to (cr, area->x - tick, y);
      cairo_stroke (cr);
      tf_figure_layout_size (layout, &w, &h);
      widest = MAX (widest, w);
      draw_layout_at (cr, layout, area->x - tick - gap - w, y - h / 2);
    }
  draw_left_minor_ticks (cr, area, ticks, tick * 0.55);

  if (label_markup)
    {
      g_autoptr (PangoLayout) layout = fitted_label (cr, theme, label_markup,
                                                     area->height + tf_figure_theme_pt (theme, 8.0));
      double w, h;

      tf_figure_layout_size (layout, &w, &h);
      cairo_save (cr);
      /* reads upwards, centred on the plot area's height */
      cairo_translate (cr, area->x - tick - gap - widest - gap * 1.5 - h,
                       area->y + (area->height + w) / 2);
      cairo_rotate (cr, -G_PI / 2);
      pango_cairo_update_layout (cr, layout);
      draw_layout_at (cr, layout, 0, 0);
      cairo_restore (cr);
    }
  cairo_restore (cr);
}
