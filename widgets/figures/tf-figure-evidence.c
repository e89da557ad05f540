/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-evidence.c: the sensitivity and sample-size figures: the Bayes factor BF01
 * (log axis, the published evidence grades as quiet reference lines) over P(H0 | data),
 * both against the prior's scale or the sample size, the analysis's own setting marked.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include "tf-figure-private.h"

#define PANEL_GAP_PT 10.0
#define TOP_SHARE 0.58
#define TF_BF_CAP_DECADES 6.0
#define EVIDENCE_POINTS 256

/* A curve that leaves its panel ends at the panel's edge, where the segment crosses it,
 * and is not drawn outside (a curve clamped along the edge would look flat there). */
static void
cut_at_panel (TfFigPoints *p, const TfPlotArea *area)
{
  double top = area->y, bottom = area->y + area->height;
  g_autofree double *y = g_memdup2 (p->y, p->n * sizeof (double));
  g_autofree double *x = g_memdup2 (p->x, p->n * sizeof (double));

  for (guint i = 0; i < p->n; i++)
    {
      gboolean inside = y[i] >= top && y[i] <= bottom;

      if (inside || !isfinite (y[i]))
        continue;
      p->y[i] = NAN;
      /* a neighbour inside: this point moves to where the segment meets the edge */
      for (int side = -1; side <= 1; side += 2)
        {
          int j = (int) i + side;

          if (j < 0 || j >= (int) p->n || !(y[j] >= top && y[j] <= bottom))
            continue;
          double edge = y[i] < top ? top : bottom;
          double f = (edge - y[j]) / (y[i] - y[j]);

          p->x[i] = x[j] + f * (x[i] - x[j]);
          p->y[i] = edge;
          break;
        }
    }
}

typedef struct {
  double log10_bf;              /* grade boundary, log10 of the Bayes factor either way */
  const char *name;             /* the grade above it, up to the next boundary */
} Grade;

/* Kass & Raftery (1995), "Bayes factors", JASA 90, section 3.2: B of 1 to 3 "not worth
 * more than a bare mention", 3 to 20 "positive", 20 to 150 "strong", above 150 "very
 * strong". Jeffreys (1961), Theory of Probability, 3rd ed., Appendix B: K beyond 10^(1/2)
 * "substantial", 10 "strong", 10^(3/2) "very strong", 100 "decisive". */
static guint
grades (TfEvidenceScale scale, Grade *out)
{
  switch (scale)
    {
    case TF_EVIDENCE_SCALE_JEFFREYS:
      out[0] = (Grade) { 0.5, N_("substantial") };
      out[1] = (Grade) { 1.0, N_("strong") };
      out[2] = (Grade) { 1.5, N_("very strong") };
      out[3] = (Grade) { 2.0, N_("decisive") };
      return 4;
    case TF_EVIDENCE_SCALE_KASS_RAFTERY:
      out[0] = (Grade) { log10 (3.0), N_("positive") };
      out[1] = (Grade) { log10 (20.0), N_("strong") };
      out[2] = (Grade) { log10 (150.0), N_("very strong") };
      return 3;
    case TF_EVIDENCE_SCALE_NONE:
    default:
      return 0;
    }
}

static double
coord (double v, gboolean log_axis)
{
  return log_axis ? log10 (v) : v;
}

/* The grades' labels in the right margin, centred in each band that has room. */
static void
draw_grades (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
             TfEvidenceScale scale)
{
  Grade g[8];
  guint n = grades (scale, g);
  double size = theme->text_size * 0.9;
  double gap = tf_figure_theme_pt (theme, 3.0);
  double h = tf_fig_text_height (cr, theme, size, "Hg");
  double x = area->x + area->width + gap;
  static const double dash[] = { 1.0, 2.0 };
  double d[2] = { dash[0] * theme->scale, dash[1] * theme->scale };
  double taken[2][2];           /* the rows of ↑ H0 and ↓ H1: no grade's name over them */
  guint n_taken = 0;

  cairo_save (cr);
  /* the lines, both ways */
  tf_figure_theme_set_source (cr, &theme->reference);
  cairo_set_line_width (cr, tf_figure_theme_pt (theme, 0.5));
  cairo_set_dash (cr, d, 2, 0);
  for (guint i = 0; i < n; i++)
    for (int side = -1; side <= 1; side += 2)
      {
        double c = side * g[i].log10_bf;
        double y;

        if (c <= area->y_lo || c >= area->y_hi)
          continue;
        y = tf_plot_area_map_y (area, c);
        cairo_move_to (cr, area->x, y);
        cairo_line_to (cr, area->x + area->width, y);
      }
  cairo_stroke (cr);

  /* BF = 1, and which way is which */
  if (area->y_lo < 0 && area->y_hi > 0)
    {
      double y = tf_plot_area_map_y (area, 0);

      cairo_set_dash (cr, NULL, 0, 0);
      cairo_set_line_width (cr, tf_figure_theme_pt (theme, 0.6));
      cairo_move_to (cr, area->x, y);
      cairo_line_to (cr, area->x + area->width, y);
      cairo_stroke (cr);
      /* TRANSLATORS: right of the BF01 = 1 line: above it the data favour H0 */
      tf_fig_text (cr, theme, &theme->muted, size, _("↑ H₀"), x, y - h * 1.05);
      /* TRANSLATORS: right of the BF01 = 1 line: below it the data favour H1 */
      tf_fig_text (cr, theme, &theme->muted, size, _("↓ H₁"), x, y + h * 0.05);
      taken[n_taken][0] = y - h * 1.05, taken[n_taken++][1] = y + h * 1.05;
    }

  for (guint i = 0; i < n; i++)
    for (int side = -1; side <= 1; side += 2)
      {
        double a = side * g[i].log10_bf;
        double b = i + 1 < n ? side * g[i + 1].log10_bf : (side > 0 ? area->y_hi : area->y_lo);
        double lo = CLAMP (MIN (a, b), area->y_lo, area->y_hi);
        double hi = CLAMP (MAX (a, b), area->y_lo, area->y_hi);
        double y0 = tf_plot_area_map_y (area, hi), y1 = tf_plot_area_map_y (area, lo);
        double top = (y0 + y1 - h) / 2;
        gboolean free_row = TRUE;

        if (y1 - y0 < h * 1.05)
          continue;
        for (guint t = 0; t < n_taken; t++)
          if (top < taken[t][1] && top + h > taken[t][0])
            free_row = FALSE;
        if (!free_row)
          continue;
        tf_fig_text (cr, theme, &theme->muted, size, _(g[i].name), x, top);
      }
  cairo_restore (cr);
}

/* Writes text beside the point (px, py): above right, above left, below right or below
 * left, the first that stays inside the area and that neither the curve nor the
 * reference line at height ref_y nor the chosen setting's vertical line crosses; failing
 * that, the first the curve alone does not cross. */
static void
label_beside (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
              const TfFigPoints *curve, double px, double py, double ref_y, const char *markup)
{
  double w = tf_fig_text_width (cr, theme, theme->text_size, markup);
  double h = tf_fig_text_height (cr, theme, theme->text_size, markup);
  double off = tf_figure_theme_pt (theme, 4.0);
  double ref_x[2] = { area->x, area->x + area->width }, ref_ys[2] = { ref_y, ref_y };
  double up_x[2] = { px, px }, up_y[2] = { area->y, area->y + area->height };
  TfPolyline lines[] = { { curve->x, curve->y, curve->n }, { up_x, up_y, 2 }, { ref_x, ref_ys, 2 } };
  const double dx[] = { off, -off - w, off, -off - w };
  const double dy[] = { -off - h, -off - h, off, off };
  double x = px + dx[0], y = py + dy[0];
  gboolean found = FALSE;

  for (int pass = 0; pass < 2 && !found; pass++)
    for (guint i = 0; i < G_N_ELEMENTS (dx) && !found; i++)
      {
        double lx = px + dx[i], ly = py + dy[i];
        guint n_lines = pass == 1 ? 1 : isfinite (ref_y) ? 3 : 2;

        if (lx < area->x || lx + w > area->x + area->width || ly < area->y
            || ly + h > area->y + area->height)
          continue;
        if (tf_legend_box_is_clear (lines, n_lines, lx, ly, lx + w, ly + h))
          {
            x = lx, y = ly;
            found = TRUE;
          }
      }
  x = CLAMP (x, area->x, area->x + area->width - w);
  y = CLAMP (y, area->y, area->y + area->height - h);
  tf_fig_text_halo (cr, theme, &theme->foreground, theme->text_size, markup, x, y);
}

gboolean
tf_fig_draw_evidence (cairo_t *cr, double width, double height, double scale,
                      const TfEvidenceCurve *curve, const TfFigureOptions *options,
                      gboolean sample_size, TfFigurePanels *panels_out)
{
  const TfFigureOptions *opt = tf_fig_options (options);
  TfFigureTheme theme;
  g_autofree double *xs = NULL;
  g_autofree double *bf = NULL;
  g_autofree char *chosen_label = NULL;
  g_autofree char *note = NULL;
  g_autofree char *bf_text = NULL;
  g_autofree char *p_text = NULL;
  const char *x_label;
  const char *bf_label = _("BF<sub>01</sub>, log scale");
  const char *p_label = _("P(H₀ | data)");
  double pad, gap, top, bottom, left, right, avail, top_h, low_h, label_h;
  double x_lo = INFINITY, x_hi = -INFINITY, y_lo = 0, y_hi = 0, right_w = 0;
  double beyond_hi = NAN, beyond_lo = NAN;   /* log10 BF01 the curve reaches off the axis */
  double chosen_right = -INFINITY;  /* where the chosen setting's label ends */
  gboolean chosen_ok;
  TfTicks x_ticks, bf_ticks, p_ticks;
  TfPlotArea top_area, low_area;
  TfFigPoints bf_line = { 0 }, p_line = { 0 };
  Grade g[8];
  guint n_grades;

  if (panels_out)
    panels_out->n = 0;
  tf_figure_theme_init (&theme, opt->style, scale);
  pad = tf_figure_theme_pt (&theme, TF_FIG_PAD_PT);
  gap = tf_figure_theme_pt (&theme, 3.0);
  cairo_save (cr);
  tf_fig_begin (cr, &theme, width, height);
  if (curve == NULL || curve->n < 2)
    {
      tf_fig_message (cr, &theme, width, height, NULL, _("There are no curves to draw."));
      cairo_restore (cr);
      return FALSE;
    }

  xs = g_new (double, curve->n);
  bf = g_new (double, curve->n);
  for (guint i = 0; i < curve->n; i++)
    {
      xs[i] = curve->x_log && curve->x[i] > 0 ? log10 (curve->x[i]) : curve->x_log ? NAN : curve->x[i];
      bf[i] = curve->log_bf01[i] / G_LN10;
      if (isfinite (xs[i]))
        x_lo = MIN (x_lo, xs[i]), x_hi = MAX (x_hi, xs[i]);
      if (isfinite (bf[i]))
        y_lo = MIN (y_lo, bf[i]), y_hi = MAX (y_hi, bf[i]);
    }
  chosen_ok = isfinite (curve->chosen_x) && (!curve->x_log || curve->chosen_x > 0);
  if (chosen_ok)
    {
      double cx = coord (curve->chosen_x, curve->x_log);
      x_lo = MIN (x_lo, cx), x_hi = MAX (x_hi, cx);
      if (isfinite (curve->chosen_log_bf01))
        {
          y_lo = MIN (y_lo, curve->chosen_log_bf01 / G_LN10);
          y_hi = MAX (y_hi, curve->chosen_log_bf01 / G_LN10);
        }
    }
  if (!(x_hi > x_lo))
    {
      tf_fig_message (cr, &theme, width, height, NULL, _("The curve has no range to draw."));
      cairo_restore (cr);
      return FALSE;
    }
  {
    guint finite = 0;

    for (guint i = 0; i < curve->n; i++)
      finite += isfinite (bf[i]) && isfinite (xs[i]);
    if (finite < 2)
      {
        tf_fig_message (cr, &theme, width, height, NULL,
                        _("The Bayes factor is not defined along this curve, so there is nothing to draw: the result list says why."));
        cairo_restore (cr);
        return FALSE;
      }
  }
  /* Past 10^±6, or 3 decades past the chosen value, a Bayes factor tells the reader
   * nothing the grades do not, and the range would flatten the curve where it matters:
   * the axis stops there, the curve leaves the panel and a note says how far it goes. */
  {
    double chosen_dec = chosen_ok && isfinite (curve->chosen_log_bf01)
                        ? curve->chosen_log_bf01 / G_LN10 : 0.0;
    double cap_hi = MAX (TF_BF_CAP_DECADES, chosen_dec + 3.0);
    double cap_lo = MIN (-TF_BF_CAP_DECADES, chosen_dec - 3.0);

    if (y_hi > cap_hi)
      beyond_hi = y_hi, y_hi = cap_hi;
    if (y_lo < cap_lo)
      beyond_lo = y_lo, y_lo = cap_lo;
  }
  y_lo -= 0.15, y_hi += 0.15;

  x_label = curve->x_markup ? curve->x_markup
                            : sample_size ? _("sample size <i>n</i>") : _("prior scale");
  if (chosen_ok)
    {
      g_autofree char *v = tf_fig_number (curve->chosen_x, 4);
      chosen_label = sample_size ? g_strdup_printf (_("observed: %s"), v)
                                 : g_strdup_printf (_("chosen prior: %s"), v);
    }
  if (sample_size && isfinite (curve->p_value))
    {
      g_autofree char *p = tf_fig_number (curve->p_value, 3);
      /* TRANSLATORS: the sample-size figure holds the p-value fixed while n changes */
      note = g_strdup_printf (_("<i>p</i> = %s held fixed"), p);
    }

  /* Margins: the right one holds the grades' names. */
  n_grades = grades (opt->evidence_scale, g);
  for (guint i = 0; i < n_grades; i++)
    right_w = MAX (right_w, tf_fig_text_width (cr, &theme, theme.text_size * 0.9, _(g[i].name)));
  right_w = MAX (right_w, tf_fig_text_width (cr, &theme, theme.text_size * 0.9, _("↑ H₀")));
  label_h = tf_fig_text_height (cr, &theme, theme.text_size, chosen_label ? chosen_label : "Hg");

  if (curve->x_log)
    tf_ticks_compute_log (&x_ticks, x_lo, x_hi, 8, FALSE);
  else
    tf_ticks_compute (&x_ticks, x_lo, x_hi, 8, FALSE);
  top = pad + label_h + tf_figure_theme_pt (&theme, 2.0);
  bottom = pad + tf_axis_bottom_extent_ticks (cr, &theme, &x_ticks, x_label);
  avail = MAX (height - top - bottom - tf_figure_theme_pt (&theme, PANEL_GAP_PT), 2);
  top_h = avail * TOP_SHARE;
  low_h = avail - top_h;
  tf_ticks_compute_log (&bf_ticks, y_lo, y_hi,
                        tf_ticks_target (&theme, top_h, TF_FIG_Y_TICK_SPACING_PT * 0.8), TRUE);
  tf_ticks_compute (&p_ticks, 0, 1, tf_ticks_target (&theme, low_h, TF_FIG_Y_TICK_SPACING_PT), TRUE);
  left = pad + MAX (tf_axis_left_extent (cr, &theme, &bf_ticks, bf_label),
                    tf_axis_left_extent (cr, &theme, &p_ticks, p_label));
  right = pad + right_w + gap;
  {
    double last_w = 0;
    for (guint i = 0; i < x_ticks.n; i++)
      {
        g_autofree char *l = tf_ticks_label (&x_ticks, i);
        last_w = MAX (last_w, tf_fig_text_width (cr, &theme, theme.text_size, l));
      }
    right = MAX (right, pad + last_w / 2);
  }
  if (curve->x_log)
    tf_ticks_compute_log (&x_ticks, x_lo, x_hi,
                          tf_ticks_target (&theme, width - left - right, TF_FIG_X_TICK_SPACING_PT), FALSE);
  else
    tf_ticks_compute (&x_ticks, x_lo, x_hi,
                      tf_ticks_target (&theme, width - left - right, TF_FIG_X_TICK_SPACING_PT), FALSE);

  top_area = (TfPlotArea) {
    .x = left, .y = top, .width = MAX (width - left - right, 1), .height = top_h,
    .x_lo = x_lo, .x_hi = x_hi, .y_lo = bf_ticks.lo, .y_hi = bf_ticks.hi,
    .x_log = curve->x_log, .y_log = TRUE,
  };
  low_area = top_area;
  low_area.y = top + top_h + tf_figure_theme_pt (&theme, PANEL_GAP_PT);
  low_area.height = low_h;
  low_area.y_lo = p_ticks.lo;
  low_area.y_hi = p_ticks.hi;
  low_area.y_log = FALSE;
  low_area.panel = 1;

  /* Reference lines under the data. */
  draw_grades (cr, &theme, &top_area, opt->evidence_scale);
  cairo_save (cr);
  tf_figure_theme_set_source (cr, &theme.reference);
  cairo_set_line_width (cr, tf_figure_theme_pt (&theme, 0.5));
  cairo_move_to (cr, low_area.x, tf_plot_area_map_y (&low_area, 0.5));
  cairo_line_to (cr, low_area.x + low_area.width, tf_plot_area_map_y (&low_area, 0.5));
  cairo_stroke (cr);
  cairo_restore (cr);

  /* The analysis's own setting: a line through both panels. */
  if (chosen_ok)
    {
      double x = tf_plot_area_map_x (&top_area, coord (curve->chosen_x, curve->x_log));
      double dash[] = { 3.0 * scale, 2.0 * scale };
      double w = tf_fig_text_width (cr, &theme, theme.text_size, chosen_label);

      cairo_save (cr);
      tf_figure_theme_set_source (cr, &theme.muted);
      cairo_set_line_width (cr, tf_figure_theme_pt (&theme, 0.7));
      cairo_set_dash (cr, dash, 2, 0);
      cairo_move_to (cr, x, top_area.y);
      cairo_line_to (cr, x, low_area.y + low_area.height);
      cairo_stroke (cr);
      cairo_restore (cr);
      /* centred on the line, right of the y axis's labels, inside the figure */
      double lx = MAX (MAX (MIN (x - w / 2, width - pad - w), MIN (top_area.x, width - pad - w)), pad);

      tf_fig_text (cr, &theme, &theme.foreground, theme.text_size, chosen_label, lx,
                   top_area.y - label_h - tf_figure_theme_pt (&theme, 1.5));
      chosen_right = lx + w;
    }

  /* The curves, clipped to their panels. */
  tf_fig_points_map (&top_area, xs, bf, curve->n, FALSE, &bf_line);
  cut_at_panel (&bf_line, &top_area);
  tf_fig_points_map (&low_area, xs, curve->posterior_null, curve->n, TRUE, &p_line);
  for (guint i = 0; i < curve->n; i++)
    if (!isfinite (xs[i]))
      bf_line.y[i] = p_line.y[i] = NAN;
  tf_fig_stroke_series (cr, &theme, TF_SERIES_EVIDENCE, &bf_line);
  tf_fig_stroke_series (cr, &theme, TF_SERIES_EVIDENCE, &p_line);

  /* The chosen values, marked and written beside. */
  if (chosen_ok)
    {
      double cx = coord (curve->chosen_x, curve->x_log);
      double px = tf_plot_area_map_x (&top_area, cx);

      if (isfinite (curve->chosen_log_bf01))
        {
          g_autofree char *v = tf_fig_number (exp (curve->chosen_log_bf01), 3);

          bf_text = g_strdup_printf ("BF<sub>01</sub> = %s", v);
          tf_fig_marker (cr, &theme, &top_area, TF_SERIES_EVIDENCE, cx,
                         curve->chosen_log_bf01 / G_LN10, TRUE);
          label_beside (cr, &theme, &top_area, &bf_line, px,
                        tf_plot_area_map_y (&top_area, curve->chosen_log_bf01 / G_LN10),
                        top_area.y_lo < 0 && top_area.y_hi > 0 ? tf_plot_area_map_y (&top_area, 0) : NAN,
                        bf_text);
        }
      if (isfinite (curve->chosen_posterior_null))
        {
          g_autofree char *v = tf_fig_number (curve->chosen_posterior_null, 3);

          p_text = g_strdup_printf (_("P(H₀ | data) = %s"), v);
          tf_fig_marker (cr, &theme, &low_area, TF_SERIES_EVIDENCE, cx,
                         curve->chosen_posterior_null, TRUE);
          label_beside (cr, &theme, &low_area, &p_line, px,
                        tf_plot_area_map_y (&low_area, curve->chosen_posterior_null),
                        tf_plot_area_map_y (&low_area, 0.5), p_text);
        }
    }

  /* How far the curve goes off the axis. */
  if (isfinite (beyond_hi) || isfinite (beyond_lo))
    {
      g_autofree char *hi_text = isfinite (beyond_hi) ? tf_fig_power_of_ten (beyond_hi) : NULL;
      g_autofree char *lo_text = isfinite (beyond_lo) ? tf_fig_power_of_ten (beyond_lo) : NULL;
      g_autofree char *off = hi_text && lo_text
        /* TRANSLATORS: the BF curve leaves the axis at both ends; %s are powers of ten */
        ? g_strdup_printf (_("off the axis: BF₀₁ from %s to %s"), lo_text, hi_text)
        : hi_text
        /* TRANSLATORS: the BF curve leaves the top of its axis; %s is a power of ten */
        ? g_strdup_printf (_("off the axis: BF₀₁ up to %s"), hi_text)
        /* TRANSLATORS: the BF curve leaves the bottom of its axis; %s is a power of ten */
        : g_strdup_printf (_("off the axis: BF₀₁ down to %s"), lo_text);
      double w = tf_fig_text_width (cr, &theme, theme.text_size * 0.9, off);
      double h = tf_fig_text_height (cr, &theme, theme.text_size * 0.9, off);
      double cx = chosen_ok ? tf_plot_area_map_x (&top_area, coord (curve->chosen_x, curve->x_log))
                            : -1;
      double up_x[2] = { cx, cx }, up_y[2] = { top_area.y, top_area.y + top_area.height };
      TfPolyline lines[] = { { bf_line.x, bf_line.y, bf_line.n }, { up_x, up_y, 2 } };
      double ox = top_area.x + gap, oy = top_area.y + gap;

      gboolean placed = tf_legend_place (&top_area, w, h, gap, lines, 2, &ox, &oy);

      if (!placed && width - pad - w > chosen_right + 2 * gap)
        {
          /* no room in the panel: at the right of the row above it */
          ox = width - pad - w;
          oy = top_area.y - h - tf_figure_theme_pt (&theme, 1.5);
          placed = TRUE;
        }
      /* a figure too small for the note shows the curve leaving the axis only */
      if (placed)
        tf_fig_text_halo (cr, &theme, &theme.muted, theme.text_size * 0.9, off, ox, oy);
    }

  /* The held p-value: a note where it hides no curve. */
  if (note)
    {
      double w = tf_fig_text_width (cr, &theme, theme.text_size, note);
      double h = tf_fig_text_height (cr, &theme, theme.text_size, note);
      double cx = chosen_ok ? tf_plot_area_map_x (&top_area, coord (curve->chosen_x, curve->x_log))
                            : -1;
      double up_x[2] = { cx, cx }, up_y[2] = { top_area.y, low_area.y + low_area.height };
      TfPolyline lines[] = { { bf_line.x, bf_line.y, bf_line.n }, { up_x, up_y, 2 } };
      double nx = top_area.x + gap, ny = top_area.y + gap;

      if (!tf_legend_place (&top_area, w, h, gap, lines, 2, &nx, &ny))
        {
          TfPolyline low[] = { { p_line.x, p_line.y, p_line.n }, { up_x, up_y, 2 } };
          if (!tf_legend_place (&low_area, w, h, gap, low, 2, &nx, &ny))
            {
              /* no room in either panel: at the right of the row above them, clear of
               * the chosen setting's label when it can be */
              nx = width - pad - w;
              ny = top_area.y - h - tf_figure_theme_pt (&theme, 1.5);
              if (nx < chosen_right + 2 * gap)
                nx = top_area.x + gap, ny = top_area.y + gap;
            }
        }
      tf_fig_text_halo (cr, &theme, &theme.muted, theme.text_size, note, nx, ny);
    }

  tf_axis_draw_bottom_bare (cr, &theme, &top_area, &x_ticks);
  tf_axis_draw_left (cr, &theme, &top_area, &bf_ticks, bf_label);
  tf_axis_draw_bottom (cr, &theme, &low_area, &x_ticks, x_label);
  tf_axis_draw_left (cr, &theme, &low_area, &p_ticks, p_label);

  if (panels_out)
    {
      panels_out->n = 2;
      panels_out->area[0] = top_area;
      panels_out->area[1] = low_area;
    }
  tf_fig_points_clear (&bf_line);
  tf_fig_points_clear (&p_line);
  cairo_restore (cr);
  return TRUE;
}

static gboolean
draw_upper (cairo_t *cr, double width, double height, double scale,
            const TfEvidenceCurve *curve, const TfFigureOptions *options,
            gboolean sample_size, TfPlotArea *area_out)
{
  TfFigurePanels panels;
  gboolean ok = tf_fig_draw_evidence (cr, width, height, scale, curve, options, sample_size,
                                      &panels);

  if (ok && area_out)
    *area_out = panels.area[0];
  return ok;
}

gboolean
tf_figure_draw_sensitivity (cairo_t *cr, double width, double height, double scale,
                            const TfEvidenceCurve *curve, const TfFigureOptions *options,
                            TfPlotArea *area_out)
{
  return draw_upper (cr, width, height, scale, curve, options, FALSE, area_out);
}

gboolean
tf_figure_draw_sample_size (cairo_t *cr, double width, double height, double scale,
                            const TfEvidenceCurve *curve, const TfFigureOptions *options,
                            TfPlotArea *area_out)
{
  return draw_upper (cr, width, height, scale, curve, options, TRUE, area_out);
}

gpointer
tf_fig_sensitivity_compute (const TfAnalysis *analysis, const TfResults *results,
                            GPtrArray *problems, char **reason)
{
  return tf_sensitivity_curve_new (analysis, EVIDENCE_POINTS, problems, reason);
}

gpointer
tf_fig_sample_size_compute (const TfAnalysis *analysis, const TfResults *results,
                            GPtrArray *problems, char **reason)
{
  return tf_sample_size_curve_new (analysis, EVIDENCE_POINTS, problems, reason);
}

gboolean
tf_fig_sensitivity_draw (cairo_t *cr, double width, double height, double scale,
                         gconstpointer curves, const TfFigureOptions *options,
                         TfFigurePanels *panels)
{
  return tf_fig_draw_evidence (cr, width, height, scale, curves, options, FALSE, panels);
}

gboolean
tf_fig_sample_size_draw (cairo_t *cr, double width, double height, double scale,
                         gconstpointer curves, const TfFigureOptions *options,
                         TfFigurePanels *panels)
{
  return tf_fig_draw_evidence (cr, width, height, scale, curves, options, TRUE, panels);
}

/* The Bayes factor above (log10 on its axis), P(H0 | data) below. */
gboolean
tf_fig_evidence_read (gconstpointer curves, const TfPlotArea *area, double x,
                      TfFigureReading *reading)
{
  const TfEvidenceCurve *c = curves;
  guint i = tf_fig_nearest (c->x, c->n, x);

  reading->x = c->x[i];
  reading->x_markup = c->x_markup ? c->x_markup : "x";
  if (area->panel == 0)
    tf_fig_reading_add (reading, area, "BF<sub>01</sub>", exp (c->log_bf01[i]),
                        c->log_bf01[i] / G_LN10);
  else
    tf_fig_reading_add (reading, area, _("P(H₀ | data)"), c->posterior_null[i],
                        c->posterior_null[i]);
  return TRUE;
}
