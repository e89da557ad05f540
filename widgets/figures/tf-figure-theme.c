/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-theme.c: the look of Twofold's figures.
 *
 * Series colours come from the colour-blind-safe palette of Okabe & Ito (2008), "Color
 * Universal Design"; every series also has its own dash pattern, so the figure reads
 * the same in grey print and for readers who do not tell the colours apart.
 */
#include "tf-figure-theme.h"

#define OKABE_ITO(hex) { ((hex) >> 16 & 0xff) / 255.0, ((hex) >> 8 & 0xff) / 255.0, ((hex) & 0xff) / 255.0, 1.0 }

/* Okabe & Ito (2008): orange, sky blue, bluish green, blue, vermillion. */
static const TfColour light_series[TF_N_SERIES] = {
  [TF_SERIES_PRIOR] = OKABE_ITO (0xD55E00),       /* vermillion */
  [TF_SERIES_POSTERIOR] = OKABE_ITO (0x0072B2),   /* blue */
  [TF_SERIES_LIKELIHOOD] = OKABE_ITO (0x009E73),  /* bluish green */
  [TF_SERIES_NULL] = { 0.0, 0.0, 0.0, 0.80 },     /* black */
  [TF_SERIES_EVIDENCE] = OKABE_ITO (0x0072B2),    /* blue */
  [TF_SERIES_TAIL] = OKABE_ITO (0xD55E00),        /* vermillion */
};

/* On a dark ground the lighter members of the same palette. */
static const TfColour dark_series[TF_N_SERIES] = {
  [TF_SERIES_PRIOR] = OKABE_ITO (0xE69F00),       /* orange */
  [TF_SERIES_POSTERIOR] = OKABE_ITO (0x56B4E9),   /* sky blue */
  [TF_SERIES_LIKELIHOOD] = OKABE_ITO (0x009E73),  /* bluish green */
  [TF_SERIES_NULL] = { 1.0, 1.0, 1.0, 0.85 },
  [TF_SERIES_EVIDENCE] = OKABE_ITO (0x56B4E9),    /* sky blue */
  [TF_SERIES_TAIL] = OKABE_ITO (0xE69F00),        /* orange */
};

/* Print: greys a photocopier keeps apart, with dash patterns and markers carrying the
 * difference as well. */
static const TfColour print_series[TF_N_SERIES] = {
  [TF_SERIES_PRIOR] = { 0.45, 0.45, 0.45, 1.0 },
  [TF_SERIES_POSTERIOR] = { 0.0, 0.0, 0.0, 1.0 },
  [TF_SERIES_LIKELIHOOD] = { 0.30, 0.30, 0.30, 1.0 },
  [TF_SERIES_NULL] = { 0.0, 0.0, 0.0, 0.85 },
  [TF_SERIES_EVIDENCE] = { 0.0, 0.0, 0.0, 1.0 },
  [TF_SERIES_TAIL] = { 0.25, 0.25, 0.25, 1.0 },
};

void
tf_figure_theme_init (TfFigureTheme *theme, TfFigureStyle style, double scale)
{
  gboolean dark = style == TF_FIGURE_STYLE_DARK;

  theme->style = style;
  theme->scale = scale > 0 ? scale : 1.0;
  if (dark)
    {
      theme->background = (TfColour) { 0x1e / 255.0, 0x1e / 255.0, 0x1e / 255.0, 1.0 };
      theme->foreground = (TfColour) { 0.92, 0.92, 0.92, 1.0 };
      theme->muted = (TfColour) { 0.92, 0.92, 0.92, 0.62 };
    }
  else
    {
      theme->background = (TfColour) { 1.0, 1.0, 1.0, 1.0 };
      theme->foreground = (TfColour) { 0.13, 0.13, 0.13, 1.0 };
      theme->muted = (TfColour) { 0.13, 0.13, 0.13, 0.62 };
    }
  for (guint i = 0; i < TF_N_SERIES; i++)
    theme->series[i] = dark ? dark_series[i]
                       : style == TF_FIGURE_STYLE_PRINT ? print_series[i] : light_series[i];
  theme->reference = theme->foreground;
  theme->reference.a = 0.38;

  theme->font_family = "Sans";
  theme->text_size = 8.0;
  theme->label_size = 9.0;
  theme->axis_width = 0.6;
  theme->tick_length = 3.0;
}

#define SMALL_WIDTH_PT (75.0 * 72.0 / 25.4)
#define SMALL_HEIGHT_PT (55.0 * 72.0 / 25.4)

void
tf_figure_theme_fit (TfFigureTheme *theme, double width, double height)
{
  if (width < SMALL_WIDTH_PT * theme->scale || height < SMALL_HEIGHT_PT * theme->scale)
    {
      theme->text_size = 7.0;
      theme->label_size = 7.5;
    }
}

void
tf_figure_theme_set_source (cairo_t *cr, const TfColour *colour)
{
  cairo_set_source_rgba (cr, colour->r, colour->g, colour->b, colour->a);
}

void
tf_figure_theme_set_source_alpha (cairo_t *cr, const TfColour *colour, double alpha)
{
  cairo_set_source_rgba (cr, colour->r, colour->g, colour->b, colour->a * alpha);
}

void
tf_figure_theme_set_series_line (cairo_t *cr, const TfFigureTheme *theme, TfSeries series)
{
  double s = theme->scale;

  tf_figure_theme_set_source (cr, &theme->series[series]);
  cairo_set_line_join (cr, CAIRO_LINE_JOIN_ROUND);
  switch (series)
    {
    case TF_SERIES_POSTERIOR:
      /* solid, the heaviest line: the answer */
      cairo_set_line_width (cr, 1.6 * s);
      cairo_set_line_cap (cr, CAIRO_LINE_CAP_ROUND);
      cairo_set_dash (cr, NULL, 0, 0);
      break;
    case TF_SERIES_PRIOR:
      {
        /* dotted: round dots 2.4 pt apart */
        double dash[] = { 0.01 * s, 2.4 * s };
        cairo_set_line_width (cr, 1.5 * s);
        cairo_set_line_cap (cr, CAIRO_LINE_CAP_ROUND);
        cairo_set_dash (cr, dash, G_N_ELEMENTS (dash), 0);
      }
      break;
    case TF_SERIES_LIKELIHOOD:
      {
        /* dashed */
        double dash[] = { 4.5 * s, 2.5 * s };
        cairo_set_line_width (cr, 1.3 * s);
        cairo_set_line_cap (cr, CAIRO_LINE_CAP_BUTT);
        cairo_set_dash (cr, dash, G_N_ELEMENTS (dash), 0);
      }
      break;
    case TF_SERIES_EVIDENCE:
      cairo_set_line_width (cr, 1.5 * s);
      cairo_set_line_cap (cr, CAIRO_LINE_CAP_ROUND);
      cairo_set_dash (cr, NULL, 0, 0);
      break;
    case TF_SERIES_NULL:
    case TF_SERIES_TAIL:
    case TF_N_SERIES:
    default:
      cairo_set_line_width (cr, 0.9 * s);
      cairo_set_line_cap (cr, CAIRO_LINE_CAP_BUTT);
      cairo_set_dash (cr, NULL, 0, 0);
      break;
    }
}

TfMarker
tf_figure_theme_series_marker (const TfFigureTheme *theme, TfSeries series)
{
  if (theme->style != TF_FIGURE_STYLE_PRINT)
    return TF_MARKER_NONE;
  switch (series)
    {
    case TF_SERIES_PRIOR:
      return TF_MARKER_SQUARE;
    case TF_SERIES_POSTERIOR:
      return TF_MARKER_CIRCLE;
    case TF_SERIES_LIKELIHOOD:
      return TF_MARKER_TRIANGLE;
    case TF_SERIES_EVIDENCE:
      return TF_MARKER_DIAMOND;
    case TF_SERIES_NULL:
    case TF_SERIES_TAIL:
    case TF_N_SERIES:
    default:
      return TF_MARKER_NONE;
    }
}

void
tf_figure_theme_fill_ringed (cairo_t *cr, const TfFigureTheme *theme, TfSeries series,
                             const TfColour *fill, double line_pt)
{
  tf_figure_theme_set_source (cr, fill);
  cairo_fill_preserve (cr);
  tf_figure_theme_set_source (cr, &theme->series[series]);
  cairo_set_dash (cr, NULL, 0, 0);
  cairo_set_line_width (cr, tf_figure_theme_pt (theme, line_pt));
  cairo_stroke (cr);
}

void
tf_figure_theme_draw_marker (cairo_t *cr, const TfFigureTheme *theme, TfSeries series,
                             double x, double y)
{
  double r = tf_figure_theme_pt (theme, 2.1);

  cairo_save (cr);
  cairo_new_path (cr);
  switch (tf_figure_theme_series_marker (theme, series))
    {
    case TF_MARKER_CIRCLE:
      cairo_arc (cr, x, y, r, 0, 2 * G_PI);
      break;
    case TF_MARKER_SQUARE:
      cairo_rectangle (cr, x - r * 0.85, y - r * 0.85, 1.7 * r, 1.7 * r);
      break;
    case TF_MARKER_TRIANGLE:
      cairo_move_to (cr, x, y - 1.1 * r);
      cairo_line_to (cr, x + r, y + 0.75 * r);
      cairo_line_to (cr, x - r, y + 0.75 * r);
      cairo_close_path (cr);
      break;
    case TF_MARKER_DIAMOND:
      cairo_move_to (cr, x, y - 1.2 * r);
      cairo_line_to (cr, x + r, y);
      cairo_line_to (cr, x, y + 1.2 * r);
      cairo_line_to (cr, x - r, y);
      cairo_close_path (cr);
      break;
    case TF_MARKER_NONE:
    default:
      cairo_restore (cr);
      return;
    }
  tf_figure_theme_fill_ringed (cr, theme, series, &theme->background, 0.9);
  cairo_restore (cr);
}

void
tf_figure_theme_fill_hatched (cairo_t *cr, const TfFigureTheme *theme, TfSeries series,
                              double alpha)
{
  double x0, y0, x1, y1, gap = tf_figure_theme_pt (theme, 3.0);

  cairo_save (cr);
  tf_figure_theme_set_source_alpha (cr, &theme->series[series], alpha);
  cairo_fill_preserve (cr);
  cairo_path_extents (cr, &x0, &y0, &x1, &y1);
  cairo_clip (cr);
  tf_figure_theme_set_source_alpha (cr, &theme->series[series], 0.75);
  cairo_set_line_width (cr, tf_figure_theme_pt (theme, 0.5));
  cairo_set_dash (cr, NULL, 0, 0);
  for (double d = x0 - (y1 - y0); d < x1; d += gap)
    {
      cairo_move_to (cr, d, y1);
      cairo_line_to (cr, d + (y1 - y0), y0);
    }
  cairo_stroke (cr);
  cairo_restore (cr);
  cairo_new_path (cr);
}

PangoLayout *
tf_figure_theme_layout (cairo_t *cr, const TfFigureTheme *theme, double size_pt,
                        const char *markup)
{
  PangoLayout *layout = pango_cairo_create_layout (cr);
  PangoFontDescription *desc = pango_font_description_new ();
  cairo_font_options_t *options = cairo_font_options_create ();

  /* The same glyph advances at every scale and on every surface. */
  cairo_font_options_set_hint_metrics (options, CAIRO_HINT_METRICS_OFF);
  pango_cairo_context_set_font_options (pango_layout_get_context (layout), options);
  pango_layout_context_changed (layout);
  cairo_font_options_destroy (options);

  pango_font_description_set_family (desc, theme->font_family);
  pango_font_description_set_absolute_size (desc, size_pt * theme->scale * PANGO_SCALE);
  pango_layout_set_font_description (layout, desc);
  pango_font_description_free (desc);
  pango_layout_set_markup (layout, markup, -1);
  return layout;
}

void
tf_figure_layout_size (PangoLayout *layout, double *width, double *height)
{
  PangoRectangle logical;

  pango_layout_get_extents (layout, NULL, &logical);
  if (width)
    *width = (double) logical.width / PANGO_SCALE;
  if (height)
    *height = (double) logical.height / PANGO_SCALE;
}
