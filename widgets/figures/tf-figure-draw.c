/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-draw.c: drawing pieces the figure kinds share: the options by name,
 * polylines, markers, spikes, text with a halo, arrows, messages, the one-panel layout
 * and the crosshair readout's values.
 */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <glib/gi18n-lib.h>
#include "tf-figure-private.h"

#define MARKER_SPACING_PT 40.0

void
tf_fig_points_clear (TfFigPoints *p)
{
  g_clear_pointer (&p->x, g_free);
  g_clear_pointer (&p->y, g_free);
  p->n = 0;
}

void
tf_fig_points_map (const TfPlotArea *area, const double *x, const double *y, guint n,
                   gboolean clamp, TfFigPoints *out)
{
  out->x = g_new (double, n);
  out->y = g_new (double, n);
  out->n = n;
  for (guint i = 0; i < n; i++)
    {
      out->x[i] = tf_plot_area_map_x (area, x[i]);
      if (!isfinite (y[i]))
        out->y[i] = NAN;
      else if (clamp)
        out->y[i] = CLAMP (tf_plot_area_map_y (area, y[i]), area->y, area->y + area->height);
      else
        out->y[i] = tf_plot_area_map_y (area, y[i]);
    }
}

void
tf_fig_stroke_series (cairo_t *cr, const TfFigureTheme *theme, TfSeries series,
                      const TfFigPoints *p)
{
  gboolean open = FALSE;

  cairo_save (cr);
  tf_figure_theme_set_series_line (cr, theme, series);
  cairo_new_path (cr);
  for (guint i = 0; i < p->n; i++)
    {
      if (!isfinite (p->y[i]) || !isfinite (p->x[i]))
        {
          open = FALSE;
          continue;
        }
      if (open)
        cairo_line_to (cr, p->x[i], p->y[i]);
      else
        cairo_move_to (cr, p->x[i], p->y[i]);
      open = TRUE;
    }
  cairo_stroke (cr);

  if (tf_figure_theme_series_marker (theme, series) != TF_MARKER_NONE && p->n > 1)
    {
      double spacing = tf_figure_theme_pt (theme, MARKER_SPACING_PT);
      double run = spacing * 0.5;

      for (guint i = 1; i < p->n; i++)
        {
          double d;

          if (!isfinite (p->y[i]) || !isfinite (p->y[i - 1]))
            continue;
          d = hypot (p->x[i] - p->x[i - 1], p->y[i] - p->y[i - 1]);
          run += d;
          if (run >= spacing)
            {
              tf_figure_theme_draw_marker (cr, theme, series, p->x[i], p->y[i]);
              run = 0;
            }
        }
    }
  cairo_restore (cr);
}

const TfFigureOptions *
tf_fig_options (const TfFigureOptions *options)
{
  static const TfFigureOptions defaults = TF_FIGURE_OPTIONS_INIT;
  return options ? options : &defaults;
}

/* The index of name in names, as the enum listed in that order. */
static gboolean
index_of_name (const char *const *names, guint n, const char *name, guint *index)
{
  for (guint i = 0; i < n; i++)
    if (g_strcmp0 (name, names[i]) == 0)
      {
        *index = i;
        return TRUE;
      }
  return FALSE;
}

gboolean
tf_figure_style_from_string (const char *name, TfFigureStyle *style)
{
  static const char *const names[] = { "light", "dark", "print" };
  guint i;

  if (!index_of_name (names, G_N_ELEMENTS (names), name, &i))
    return FALSE;
  *style = (TfFigureStyle) i;
  return TRUE;
}

gboolean
tf_evidence_scale_from_string (const char *name, TfEvidenceScale *scale)
{
  static const char *const names[] = { "kass-raftery", "jeffreys", "none" };
  guint i;

  if (!index_of_name (names, G_N_ELEMENTS (names), name, &i))
    return FALSE;
  *scale = (TfEvidenceScale) i;
  return TRUE;
}

void
tf_fig_start (cairo_t *cr, TfFigureTheme *theme, TfFigureStyle style, double scale,
              double width, double height)
{
  tf_figure_theme_init (theme, style, scale);
  cairo_save (cr);
  tf_figure_theme_fit (theme, width, height);
  cairo_new_path (cr);
  tf_figure_theme_set_source (cr, &theme->background);
  cairo_rectangle (cr, 0, 0, width, height);
  cairo_fill (cr);
}

gboolean
tf_fig_nothing (cairo_t *cr, const TfFigureTheme *theme, double width, double height,
                const char *reason)
{
  tf_fig_message (cr, theme, width, height, NULL, reason);
  cairo_restore (cr);
  return FALSE;
}

double
tf_fig_label_x (double x, double label_width, const TfPlotArea *area, double width,
                double pad)
{
  double right = width - pad - label_width;

  return MAX (MAX (MIN (x - label_width / 2, right), MIN (area->x, right)), pad);
}

double
tf_fig_centred_over (const TfPlotArea *area, double box_width, double width, double pad)
{
  return MAX (MIN (area->x + (area->width - box_width) / 2, width - pad - box_width), pad);
}

void
tf_fig_message (cairo_t *cr, const TfFigureTheme *theme, double width, double height,
                const char *title, const char *reason)
{
  g_autoptr (GString) markup = g_string_new (NULL);
  g_autoptr (PangoLayout) layout = NULL;
  g_autofree char *escaped_title = g_markup_escape_text (title ? title : _("Nothing to draw"), -1);
  double w, h;

  g_string_append_printf (markup, "<b>%s</b>", escaped_title);
  if (reason && *reason)
    {
      g_autofree char *escaped = g_markup_escape_text (reason, -1);
      g_string_append_printf (markup, "\n%s", escaped);
    }
  layout = tf_figure_theme_layout (cr, theme, theme->label_size, markup->str);
  pango_layout_set_alignment (layout, PANGO_ALIGN_CENTER);
  pango_layout_set_width (layout, (int) (width * 0.8 * PANGO_SCALE));
  pango_layout_set_wrap (layout, PANGO_WRAP_WORD_CHAR);
  tf_figure_layout_size (layout, &w, &h);
  cairo_save (cr);
  tf_figure_theme_set_source (cr, &theme->muted);
  cairo_move_to (cr, width * 0.1, MAX ((height - h) / 2, 0));
  pango_cairo_show_layout (cr, layout);
  cairo_restore (cr);
}

void
tf_figure_draw_message (cairo_t *cr, double width, double height, double scale,
                        TfFigureStyle style, const char *title, const char *reason)
{
  TfFigureTheme theme;

  tf_fig_start (cr, &theme, style, scale, width, height);
  tf_fig_message (cr, &theme, width, height, title, reason);
  cairo_restore (cr);
}

double
tf_fig_text_height (cairo_t *cr, const TfFigureTheme *theme, double size, const char *markup)
{
  g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, size, markup);
  double h;

  tf_figure_layout_size (layout, NULL, &h);
  return h;
}

double
tf_fig_text_width (cairo_t *cr, const TfFigureTheme *theme, double size, const char *markup)
{
  g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, size, markup);
  double w;

  tf_figure_layout_size (layout, &w, NULL);
  return w;
}

void
tf_fig_text (cairo_t *cr, const TfFigureTheme *theme, const TfColour *colour, double size,
             const char *markup, double x, double y)
{
  g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, size, markup);

  cairo_save (cr);
  cairo_new_path (cr);
  tf_figure_theme_set_source (cr, colour);
  cairo_move_to (cr, x, y);
  pango_cairo_show_layout (cr, layout);
  cairo_restore (cr);
}

/* The halo: the text in the background colour at eight offsets around it, then the text.
 * Glyphs come from cairo's cache, so this costs far less than stroking their outlines. */
void
tf_fig_text_halo (cairo_t *cr, const TfFigureTheme *theme, const TfColour *colour,
                  double size, const char *markup, double x, double y)
{
  g_autoptr (PangoLayout) layout = tf_figure_theme_layout (cr, theme, size, markup);
  double r = tf_figure_theme_pt (theme, 1.1);

  cairo_save (cr);
  cairo_new_path (cr);
  tf_figure_theme_set_source (cr, &theme->background);
  for (int i = 0; i < 8; i++)
    {
      double angle = i * G_PI / 4;
      cairo_move_to (cr, x + r * cos (angle), y + r * sin (angle));
      pango_cairo_show_layout (cr, layout);
    }
  tf_figure_theme_set_source (cr, colour);
  cairo_move_to (cr, x, y);
  pango_cairo_show_layout (cr, layout);
  cairo_restore (cr);
}

void
tf_fig_arrow (cairo_t *cr, const TfFigureTheme *theme, const TfColour *colour,
              double x0, double y0, double x1, double y1)
{
  double head = tf_figure_theme_pt (theme, 3.2);
  double angle = atan2 (y1 - y0, x1 - x0);

  cairo_save (cr);
  tf_figure_theme_set_source (cr, colour);
  cairo_set_dash (cr, NULL, 0, 0);
  cairo_set_line_width (cr, tf_figure_theme_pt (theme, 0.7));
  cairo_move_to (cr, x0, y0);
  cairo_line_to (cr, x1 - cos (angle) * head * 0.8, y1 - sin (angle) * head * 0.8);
  cairo_stroke (cr);
  cairo_move_to (cr, x1, y1);
  cairo_line_to (cr, x1 - head * cos (angle - 0.42), y1 - head * sin (angle - 0.42));
  cairo_line_to (cr, x1 - head * cos (angle + 0.42), y1 - head * sin (angle + 0.42));
  cairo_close_path (cr);
  cairo_fill (cr);
  cairo_restore (cr);
}

void
tf_fig_marker (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
               TfSeries series, double x_value, double y_value, gboolean filled)
{
  double x = tf_plot_area_map_x (area, x_value);
  double y = tf_plot_area_map_y (area, y_value);
  /* an open marker rings a filled one at the same place: both stay seen */
  double r = tf_figure_theme_pt (theme, filled ? 2.2 : 3.4);

  if (!isfinite (y_value) || y_value > area->y_hi || y_value < area->y_lo)
    return;
  cairo_save (cr);
  cairo_new_path (cr);
  cairo_arc (cr, x, y, r, 0, 2 * G_PI);
  tf_figure_theme_fill_ringed (cr, theme, series,
                               filled ? &theme->series[series] : &theme->background, 1.0);
  cairo_restore (cr);
}

void
tf_fig_spike (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
              TfSeries series, double x_value)
{
  double x = tf_plot_area_map_x (area, x_value);
  double base = area->y + area->height;
  double head = tf_figure_theme_pt (theme, 3.0);

  cairo_save (cr);
  tf_figure_theme_set_series_line (cr, theme, series);
  cairo_move_to (cr, x, base);
  cairo_line_to (cr, x, area->y + head);
  cairo_stroke (cr);
  cairo_set_dash (cr, NULL, 0, 0);
  cairo_move_to (cr, x, area->y);
  cairo_line_to (cr, x - head * 0.6, area->y + head * 1.2);
  cairo_line_to (cr, x + head * 0.6, area->y + head * 1.2);
  cairo_close_path (cr);
  cairo_fill (cr);
  cairo_restore (cr);
}

/* Pango markup for 10 to the nearest whole power of decades: "10<sup>563</sup>". */
char *
tf_fig_power_of_ten (double decades)
{
  long k = lround (decades);

  return k < 0 ? g_strdup_printf ("10<sup>\u2212%ld</sup>", -k) : g_strdup_printf ("10<sup>%ld</sup>", k);
}

char *
tf_fig_number (double value, int digits)
{
  g_autofree char *text = NULL;
  double a = fabs (value);
  char *e;

  if (!isfinite (value))
    return g_strdup ("—");
  if (a == 0)
    return g_strdup ("0");
  if (a >= 1e-4 && a < 1e6)
    {
      text = g_strdup_printf ("%.*g", digits, a);
      if (strchr (text, 'e'))
        {
          /* more whole digits than asked: rounded to them, never "1.2e+04" */
          double unit = pow (10.0, floor (log10 (a)) + 1 - MAX (digits, 1));
          g_free (text);
          text = g_strdup_printf ("%.0f", round (a / unit) * unit);
        }
    }
  else
    {
      g_autofree char *mantissa = g_strdup_printf ("%.*e", MAX (digits - 1, 0), a);
      int exponent;

      e = strchr (mantissa, 'e');
      exponent = atoi (e + 1);
      *e = '\0';
      /* drop trailing zeros of the mantissa: 1.00 → 1 */
      if (strchr (mantissa, '.'))
        {
          char *end = mantissa + strlen (mantissa) - 1;
          while (*end == '0')
            *end-- = '\0';
          if (*end == '.')
            *end = '\0';
        }
      if (exponent < 0)
        text = g_strdup_printf ("%s × 10<sup>\u2212%d</sup>", mantissa, -exponent);
      else
        text = g_strdup_printf ("%s × 10<sup>%d</sup>", mantissa, exponent);
    }
  if (value < 0)
    return g_strconcat ("\u2212", text, NULL);
  return g_steal_pointer (&text);
}

void
tf_fig_x_ticks (TfTicks *ticks, double lo, double hi, gboolean log_axis, guint target)
{
  if (log_axis)
    tf_ticks_compute_log (ticks, lo, hi, target, FALSE);
  else
    tf_ticks_compute (ticks, lo, hi, target, FALSE);
}

void
tf_fig_layout_single (cairo_t *cr, const TfFigureTheme *theme, double width, double height,
                      double top_extra, double right_extra, const char *x_label,
                      const char *y_label, double x_lo, double x_hi, gboolean x_log,
                      double y_lo, double y_hi, TfFigLayout *out)
{
  double pad = tf_figure_theme_pt (theme, TF_FIG_PAD_PT);
  double top, bottom, left, right, plot_h, plot_w;

  tf_fig_x_ticks (&out->x_ticks, x_lo, x_hi, x_log, 8);
  top = pad + top_extra;
  bottom = pad + tf_axis_bottom_extent_ticks (cr, theme, &out->x_ticks, x_label);
  plot_h = MAX (height - top - bottom, 1);
  tf_ticks_compute (&out->y_ticks, y_lo, y_hi,
                    tf_ticks_target (theme, plot_h, TF_FIG_Y_TICK_SPACING_PT), TRUE);
  left = pad + tf_axis_left_extent (cr, theme, &out->y_ticks, y_label);

  /* room for half of the widest x label at the right end */
  right = pad + MAX (tf_axis_widest_tick_label (cr, theme, &out->x_ticks) / 2, right_extra);
  plot_w = MAX (width - left - right, 1);
  tf_fig_x_ticks (&out->x_ticks, x_lo, x_hi, x_log,
                  tf_ticks_target (theme, plot_w, TF_FIG_X_TICK_SPACING_PT));
  if (out->x_ticks.n > 0 && !x_log)
    {
      x_lo = MIN (x_lo, tf_ticks_value (&out->x_ticks, 0));
      x_hi = MAX (x_hi, tf_ticks_value (&out->x_ticks, out->x_ticks.n - 1));
    }
  out->area = (TfPlotArea) {
    .x = left, .y = top, .width = plot_w, .height = plot_h,
    .x_lo = x_lo, .x_hi = x_hi,
    .y_lo = out->y_ticks.lo, .y_hi = out->y_ticks.hi,
    .x_log = x_log,
  };
}

/* Bisection. */
guint
tf_fig_nearest (const double *grid, guint n, double x)
{
  guint lo = 0, hi = n - 1;

  if (x <= grid[0])
    return 0;
  if (x >= grid[n - 1])
    return n - 1;
  while (hi - lo > 1)
    {
      guint mid = (lo + hi) / 2;
      if (grid[mid] <= x)
        lo = mid;
      else
        hi = mid;
    }
  return x - grid[lo] <= grid[hi] - x ? lo : hi;
}

void
tf_fig_reading_add (TfFigureReading *reading, const TfPlotArea *area, const char *name,
                    double value, double y)
{
  guint i = reading->n++;
  double lo = MIN (area->y_lo, area->y_hi), hi = MAX (area->y_lo, area->y_hi);

  reading->names[i] = name;
  reading->values[i] = value;
  reading->y[i] = isfinite (y) && y >= lo && y <= hi ? tf_plot_area_map_y (area, y) : NAN;
}
