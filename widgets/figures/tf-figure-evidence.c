/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-evidence.c: the sensitivity and sample-size figures: the Bayes factor BF01
 * (log axis, the published evidence grades as quiet reference lines, tf-figure-grades.c)
 * over P(H0 | data), both against the prior's scale or the sample size, the analysis's
 * own setting marked.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include "tf-design.h"
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

static double
coord (double v, gboolean log_axis)
{
  return log_axis ? log10 (v) : v;
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

/* One drawing of the figure: what its phases share. */
typedef struct {
  cairo_t *cr;
  TfFigureTheme theme;
  const TfEvidenceCurve *curve;
  TfEvidenceScale evidence_scale;
  gboolean sample_size;
  double width, height, scale, pad, gap;
  /* the ranges: x (log10 on a log axis) and log10 BF01 at each point */
  double *xs, *bf;
  double x_lo, x_hi, y_lo, y_hi;
  double beyond_hi, beyond_lo;  /* log10 BF01 the curve reaches off the axis, or NAN */
  gboolean chosen_ok;           /* the analysis's own setting is on the x axis */
  /* the words */
  const char *x_label, *bf_label, *p_label;
  char *chosen_label, *note;
  double label_h;
  double chosen_right;          /* where the chosen setting's label ends */
  /* the panels: the Bayes factor above P(H0 | data) */
  TfTicks x_ticks, bf_ticks, p_ticks;
  TfPlotArea top, low;
  TfFigPoints bf_line, p_line;
} Draw;

/* The x and log10 BF01 coordinates and their ranges, the chosen setting's included.
 * Returns why there is nothing to draw, or NULL. */
static const char *
evidence_ranges (Draw *d)
{
  const TfEvidenceCurve *c = d->curve;
  guint finite = 0;

  d->x_lo = INFINITY, d->x_hi = -INFINITY, d->y_lo = 0, d->y_hi = 0;
  d->xs = g_new (double, c->n);
  d->bf = g_new (double, c->n);
  for (guint i = 0; i < c->n; i++)
    {
      d->xs[i] = c->x_log && c->x[i] > 0 ? log10 (c->x[i]) : c->x_log ? NAN : c->x[i];
      d->bf[i] = c->log_bf01[i] / G_LN10;
      if (isfinite (d->xs[i]))
        d->x_lo = MIN (d->x_lo, d->xs[i]), d->x_hi = MAX (d->x_hi, d->xs[i]);
      if (isfinite (d->bf[i]))
        d->y_lo = MIN (d->y_lo, d->bf[i]), d->y_hi = MAX (d->y_hi, d->bf[i]);
    }
  d->chosen_ok = isfinite (c->chosen_x) && (!c->x_log || c->chosen_x > 0);
  if (d->chosen_ok)
    {
      double cx = coord (c->chosen_x, c->x_log);
      d->x_lo = MIN (d->x_lo, cx), d->x_hi = MAX (d->x_hi, cx);
      if (isfinite (c->chosen_log_bf01))
        {
          d->y_lo = MIN (d->y_lo, c->chosen_log_bf01 / G_LN10);
          d->y_hi = MAX (d->y_hi, c->chosen_log_bf01 / G_LN10);
        }
    }
  if (!(d->x_hi > d->x_lo))
    return _("The curve has no range to draw.");
  for (guint i = 0; i < c->n; i++)
    finite += isfinite (d->bf[i]) && isfinite (d->xs[i]);
  if (finite < 2)
    return _("The Bayes factor is not defined along this curve, so there is nothing to draw: the result list says why.");
  return NULL;
}

/* Past 10^±6, or 3 decades past the chosen value, a Bayes factor tells the reader
 * nothing the grades do not, and the range would flatten the curve where it matters:
 * the axis stops there, the curve leaves the panel and a note says how far it goes. */
static void
evidence_cap (Draw *d)
{
  const TfEvidenceCurve *c = d->curve;
  double chosen_dec = d->chosen_ok && isfinite (c->chosen_log_bf01)
                      ? c->chosen_log_bf01 / G_LN10 : 0.0;
  double cap_hi = MAX (TF_BF_CAP_DECADES, chosen_dec + 3.0);
  double cap_lo = MIN (-TF_BF_CAP_DECADES, chosen_dec - 3.0);

  d->beyond_hi = d->beyond_lo = NAN;
  if (d->y_hi > cap_hi)
    d->beyond_hi = d->y_hi, d->y_hi = cap_hi;
  if (d->y_lo < cap_lo)
    d->beyond_lo = d->y_lo, d->y_lo = cap_lo;
  d->y_lo -= 0.15, d->y_hi += 0.15;
}

/* The axes' names, the chosen setting's label and the held p-value's note. */
static void
evidence_words (Draw *d)
{
  const TfEvidenceCurve *c = d->curve;

  d->bf_label = _("BF<sub>01</sub>, log scale");
  d->p_label = _("P(H₀ | data)");
  d->x_label = c->x_markup ? c->x_markup
                           : d->sample_size ? _("sample size <i>n</i>") : _("prior scale");
  if (d->chosen_ok)
    {
      g_autofree char *v = tf_fig_number (c->chosen_x, 4);
      d->chosen_label = d->sample_size ? g_strdup_printf (_("observed: %s"), v)
                                       : g_strdup_printf (_("chosen prior: %s"), v);
    }
  if (d->sample_size && isfinite (c->p_value))
    {
      g_autofree char *p = tf_fig_number (c->p_value, 3);
      /* TRANSLATORS: the sample-size figure holds the p-value fixed while n changes */
      d->note = g_strdup_printf (_("<i>p</i> = %s held fixed"), p);
    }
}

/* The margins, the ticks of the three axes, and the two panels sharing x. */
static void
evidence_panels (Draw *d)
{
  const TfFigureTheme *theme = &d->theme;
  double top, bottom, left, right, avail, top_h, low_h;
  double right_w = tf_fig_grades_width (d->cr, theme, d->evidence_scale);

  d->label_h = tf_fig_text_height (d->cr, theme, theme->text_size,
                                   d->chosen_label ? d->chosen_label : "Hg");
  tf_fig_x_ticks (&d->x_ticks, d->x_lo, d->x_hi, d->curve->x_log, 8);
  top = d->pad + d->label_h + tf_figure_theme_pt (theme, 2.0);
  bottom = d->pad + tf_axis_bottom_extent_ticks (d->cr, theme, &d->x_ticks, d->x_label);
  avail = MAX (d->height - top - bottom - tf_figure_theme_pt (theme, PANEL_GAP_PT), 2);
  top_h = avail * TOP_SHARE;
  low_h = avail - top_h;
  tf_ticks_compute_log (&d->bf_ticks, d->y_lo, d->y_hi,
                        tf_ticks_target (theme, top_h, TF_FIG_Y_TICK_SPACING_PT * 0.8), TRUE);
  tf_ticks_compute (&d->p_ticks, 0, 1, tf_ticks_target (theme, low_h, TF_FIG_Y_TICK_SPACING_PT),
                    TRUE);
  left = d->pad + MAX (tf_axis_left_extent (d->cr, theme, &d->bf_ticks, d->bf_label),
                       tf_axis_left_extent (d->cr, theme, &d->p_ticks, d->p_label));
  right = d->pad + right_w + d->gap;
  right = MAX (right, d->pad + tf_axis_widest_tick_label (d->cr, theme, &d->x_ticks) / 2);
  tf_fig_x_ticks (&d->x_ticks, d->x_lo, d->x_hi, d->curve->x_log,
                  tf_ticks_target (theme, d->width - left - right, TF_FIG_X_TICK_SPACING_PT));

  d->top = (TfPlotArea) {
    .x = left, .y = top, .width = MAX (d->width - left - right, 1), .height = top_h,
    .x_lo = d->x_lo, .x_hi = d->x_hi, .y_lo = d->bf_ticks.lo, .y_hi = d->bf_ticks.hi,
    .x_log = d->curve->x_log, .y_log = TRUE,
  };
  d->low = d->top;
  d->low.y = top + top_h + tf_figure_theme_pt (theme, PANEL_GAP_PT);
  d->low.height = low_h;
  d->low.y_lo = d->p_ticks.lo;
  d->low.y_hi = d->p_ticks.hi;
  d->low.y_log = FALSE;
  d->low.panel = 1;
}

/* Under the data: the grades above, P(H0 | data) = 0.5 below. */
static void
evidence_reference_lines (Draw *d)
{
  cairo_t *cr = d->cr;

  tf_fig_grades_draw (cr, &d->theme, &d->top, d->evidence_scale);
  cairo_save (cr);
  tf_figure_theme_set_source (cr, &d->theme.reference);
  cairo_set_line_width (cr, tf_figure_theme_pt (&d->theme, 0.5));
  cairo_move_to (cr, d->low.x, tf_plot_area_map_y (&d->low, 0.5));
  cairo_line_to (cr, d->low.x + d->low.width, tf_plot_area_map_y (&d->low, 0.5));
  cairo_stroke (cr);
  cairo_restore (cr);
}

/* The column of the analysis's own setting, or -1 when it is not on the axis. */
static double
chosen_column (const Draw *d)
{
  return d->chosen_ok ? tf_plot_area_map_x (&d->top, coord (d->curve->chosen_x, d->curve->x_log))
                      : -1;
}

/* The analysis's own setting: a line through both panels, its label above them. */
static void
evidence_chosen_line (Draw *d)
{
  cairo_t *cr = d->cr;
  const TfFigureTheme *theme = &d->theme;
  double x, w, lx;
  double dash[] = { 3.0 * d->scale, 2.0 * d->scale };

  if (!d->chosen_ok)
    return;
  x = chosen_column (d);
  w = tf_fig_text_width (cr, theme, theme->text_size, d->chosen_label);
  cairo_save (cr);
  tf_figure_theme_set_source (cr, &theme->muted);
  cairo_set_line_width (cr, tf_figure_theme_pt (theme, 0.7));
  cairo_set_dash (cr, dash, 2, 0);
  cairo_move_to (cr, x, d->top.y);
  cairo_line_to (cr, x, d->low.y + d->low.height);
  cairo_stroke (cr);
  cairo_restore (cr);
  lx = tf_fig_label_x (x, w, &d->top, d->width, d->pad);
  tf_fig_text (cr, theme, &theme->foreground, theme->text_size, d->chosen_label, lx,
               d->top.y - d->label_h - tf_figure_theme_pt (theme, 1.5));
  d->chosen_right = lx + w;
}

/* The curves: the Bayes factor leaves its panel at the edge, P(H0 | data) never does. */
static void
evidence_curves (Draw *d)
{
  const TfEvidenceCurve *c = d->curve;

  tf_fig_points_map (&d->top, d->xs, d->bf, c->n, FALSE, &d->bf_line);
  cut_at_panel (&d->bf_line, &d->top);
  tf_fig_points_map (&d->low, d->xs, c->posterior_null, c->n, TRUE, &d->p_line);
  for (guint i = 0; i < c->n; i++)
    if (!isfinite (d->xs[i]))
      d->bf_line.y[i] = d->p_line.y[i] = NAN;
  tf_fig_stroke_series (d->cr, &d->theme, TF_SERIES_EVIDENCE, &d->bf_line);
  tf_fig_stroke_series (d->cr, &d->theme, TF_SERIES_EVIDENCE, &d->p_line);
}

/* One chosen value: marked on its curve at y (on the panel's axis) and written beside
 * it, clear of the reference line at ref_y. */
static void
mark_chosen (Draw *d, const TfPlotArea *area, const TfFigPoints *line, double y,
             double ref_y, const char *text)
{
  double cx = coord (d->curve->chosen_x, d->curve->x_log);

  tf_fig_marker (d->cr, &d->theme, area, TF_SERIES_EVIDENCE, cx, y, TRUE);
  label_beside (d->cr, &d->theme, area, line, tf_plot_area_map_x (&d->top, cx),
                tf_plot_area_map_y (area, y), ref_y, text);
}

/* The chosen values, marked and written beside. */
static void
evidence_marks (Draw *d)
{
  const TfEvidenceCurve *c = d->curve;

  if (!d->chosen_ok)
    return;
  if (isfinite (c->chosen_log_bf01))
    {
      g_autofree char *v = tf_fig_number (exp (c->chosen_log_bf01), 3);
      g_autofree char *text = g_strdup_printf ("BF<sub>01</sub> = %s", v);

      mark_chosen (d, &d->top, &d->bf_line, c->chosen_log_bf01 / G_LN10,
                   d->top.y_lo < 0 && d->top.y_hi > 0 ? tf_plot_area_map_y (&d->top, 0) : NAN,
                   text);
    }
  if (isfinite (c->chosen_posterior_null))
    {
      g_autofree char *v = tf_fig_number (c->chosen_posterior_null, 3);
      g_autofree char *text = g_strdup_printf (_("P(H₀ | data) = %s"), v);

      mark_chosen (d, &d->low, &d->p_line, c->chosen_posterior_null,
                   tf_plot_area_map_y (&d->low, 0.5), text);
    }
}

/* A place in area for a w × h note that hides neither its curve nor the chosen
 * setting's line (from the top panel's top down to line_bottom). */
static gboolean
place_note (const Draw *d, const TfPlotArea *area, const TfFigPoints *curve,
            double line_bottom, double w, double h, double *x, double *y)
{
  double cx = chosen_column (d);
  double up_x[2] = { cx, cx }, up_y[2] = { d->top.y, line_bottom };
  TfPolyline lines[] = { { curve->x, curve->y, curve->n }, { up_x, up_y, 2 } };

  return tf_legend_place (area, w, h, d->gap, lines, 2, x, y);
}

/* How far the curve goes off the axis, in the top panel or the row above it; a figure
 * too small for the note shows the curve leaving the axis only. */
static void
evidence_off_axis_note (Draw *d)
{
  const TfFigureTheme *theme = &d->theme;
  g_autofree char *hi_text = NULL;
  g_autofree char *lo_text = NULL;
  g_autofree char *off = NULL;
  double w, h, ox, oy;
  gboolean placed;

  if (!isfinite (d->beyond_hi) && !isfinite (d->beyond_lo))
    return;
  hi_text = isfinite (d->beyond_hi) ? tf_fig_power_of_ten (d->beyond_hi) : NULL;
  lo_text = isfinite (d->beyond_lo) ? tf_fig_power_of_ten (d->beyond_lo) : NULL;
  off = hi_text && lo_text
    /* TRANSLATORS: the BF curve leaves the axis at both ends; %s are powers of ten */
    ? g_strdup_printf (_("off the axis: BF₀₁ from %s to %s"), lo_text, hi_text)
    : hi_text
    /* TRANSLATORS: the BF curve leaves the top of its axis; %s is a power of ten */
    ? g_strdup_printf (_("off the axis: BF₀₁ up to %s"), hi_text)
    /* TRANSLATORS: the BF curve leaves the bottom of its axis; %s is a power of ten */
    : g_strdup_printf (_("off the axis: BF₀₁ down to %s"), lo_text);
  w = tf_fig_text_width (d->cr, theme, theme->text_size * 0.9, off);
  h = tf_fig_text_height (d->cr, theme, theme->text_size * 0.9, off);
  placed = place_note (d, &d->top, &d->bf_line, d->top.y + d->top.height, w, h, &ox, &oy);
  if (!placed && d->width - d->pad - w > d->chosen_right + 2 * d->gap)
    {
      /* no room in the panel: at the right of the row above it */
      ox = d->width - d->pad - w;
      oy = d->top.y - h - tf_figure_theme_pt (theme, 1.5);
      placed = TRUE;
    }
  if (placed)
    tf_fig_text_halo (d->cr, theme, &theme->muted, theme->text_size * 0.9, off, ox, oy);
}

/* The held p-value: a note where it hides no curve, in either panel, else at the right
 * of the row above them, clear of the chosen setting's label when it can be. */
static void
evidence_held_note (Draw *d)
{
  const TfFigureTheme *theme = &d->theme;
  double w, h, nx, ny, line_bottom = d->low.y + d->low.height;

  if (d->note == NULL)
    return;
  w = tf_fig_text_width (d->cr, theme, theme->text_size, d->note);
  h = tf_fig_text_height (d->cr, theme, theme->text_size, d->note);
  if (!place_note (d, &d->top, &d->bf_line, line_bottom, w, h, &nx, &ny)
      && !place_note (d, &d->low, &d->p_line, line_bottom, w, h, &nx, &ny))
    {
      nx = d->width - d->pad - w;
      ny = d->top.y - h - tf_figure_theme_pt (theme, 1.5);
      if (nx < d->chosen_right + 2 * d->gap)
        nx = d->top.x + d->gap, ny = d->top.y + d->gap;
    }
  tf_fig_text_halo (d->cr, theme, &theme->muted, theme->text_size, d->note, nx, ny);
}

static void
evidence_axes (Draw *d)
{
  tf_axis_draw_bottom_bare (d->cr, &d->theme, &d->top, &d->x_ticks);
  tf_axis_draw_left (d->cr, &d->theme, &d->top, &d->bf_ticks, d->bf_label);
  tf_axis_draw_bottom (d->cr, &d->theme, &d->low, &d->x_ticks, d->x_label);
  tf_axis_draw_left (d->cr, &d->theme, &d->low, &d->p_ticks, d->p_label);
}

static void
draw_clear (Draw *d)
{
  g_free (d->xs);
  g_free (d->bf);
  g_free (d->chosen_label);
  g_free (d->note);
  tf_fig_points_clear (&d->bf_line);
  tf_fig_points_clear (&d->p_line);
}

gboolean
tf_fig_draw_evidence (cairo_t *cr, double width, double height, double scale,
                      const TfEvidenceCurve *curve, const TfFigureOptions *options,
                      gboolean sample_size, TfFigurePanels *panels_out)
{
  const TfFigureOptions *opt = tf_fig_options (options);
  Draw d = { .cr = cr, .curve = curve, .evidence_scale = opt->evidence_scale,
             .sample_size = sample_size, .width = width, .height = height, .scale = scale,
             .chosen_right = -INFINITY };
  const char *nothing;

  if (panels_out)
    panels_out->n = 0;
  tf_fig_start (cr, &d.theme, opt->style, scale, width, height);
  if (curve == NULL || curve->n < 2)
    return tf_fig_nothing (cr, &d.theme, width, height, _("There are no curves to draw."));
  d.pad = tf_figure_theme_pt (&d.theme, TF_FIG_PAD_PT);
  d.gap = tf_figure_theme_pt (&d.theme, 3.0);
  if ((nothing = evidence_ranges (&d)))
    {
      draw_clear (&d);
      return tf_fig_nothing (cr, &d.theme, width, height, nothing);
    }
  evidence_cap (&d);
  evidence_words (&d);
  evidence_panels (&d);
  evidence_reference_lines (&d);
  evidence_chosen_line (&d);
  evidence_curves (&d);
  evidence_marks (&d);
  evidence_off_axis_note (&d);
  evidence_held_note (&d);
  evidence_axes (&d);
  if (panels_out)
    {
      panels_out->n = 2;
      panels_out->area[0] = d.top;
      panels_out->area[1] = d.low;
    }
  draw_clear (&d);
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
