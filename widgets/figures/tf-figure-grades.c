/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-grades.c: the published grades of a Bayes factor, drawn as quiet reference
 * lines on a log10 BF01 axis (both ways of 1), their names in the right margin, and the
 * line BF01 = 1 with which side favours which model.
 */
#include <math.h>
#include <glib/gi18n-lib.h>
#include "tf-figure-private.h"

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

double
tf_fig_grades_width (cairo_t *cr, const TfFigureTheme *theme, TfEvidenceScale scale)
{
  Grade g[8];
  guint n = grades (scale, g);
  double size = theme->text_size * 0.9;
  double right_w = 0;

  for (guint i = 0; i < n; i++)
    right_w = MAX (right_w, tf_fig_text_width (cr, theme, size, _(g[i].name)));
  return MAX (right_w, tf_fig_text_width (cr, theme, size, _("↑ H₀")));
}

/* The grades' lines, both ways of 1, dotted. */
static void
grade_lines (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
             const Grade *g, guint n)
{
  static const double dash[] = { 1.0, 2.0 };
  double d[2] = { dash[0] * theme->scale, dash[1] * theme->scale };

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
}

/* BF = 1, solid, and which way is which in the margin at x (text h high); the rows its
 * words take go into taken. Returns how many (0 when 1 is off the axis). */
static guint
even_line (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area, double x,
           double size, double h, double taken[][2])
{
  double y;

  if (!(area->y_lo < 0 && area->y_hi > 0))
    return 0;
  y = tf_plot_area_map_y (area, 0);
  cairo_set_dash (cr, NULL, 0, 0);
  cairo_set_line_width (cr, tf_figure_theme_pt (theme, 0.6));
  cairo_move_to (cr, area->x, y);
  cairo_line_to (cr, area->x + area->width, y);
  cairo_stroke (cr);
  /* TRANSLATORS: right of the BF01 = 1 line: above it the data favour H0 */
  tf_fig_text (cr, theme, &theme->muted, size, _("↑ H₀"), x, y - h * 1.05);
  /* TRANSLATORS: right of the BF01 = 1 line: below it the data favour H1 */
  tf_fig_text (cr, theme, &theme->muted, size, _("↓ H₁"), x, y + h * 0.05);
  taken[0][0] = y - h * 1.05, taken[0][1] = y + h * 1.05;
  return 1;
}

/* The grades' names in the margin at x, centred in each band that has room and is not
 * taken. */
static void
grade_names (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
             const Grade *g, guint n, double x, double size, double h,
             double taken[][2], guint n_taken)
{
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
        if (free_row)
          tf_fig_text (cr, theme, &theme->muted, size, _(g[i].name), x, top);
      }
}

void
tf_fig_grades_draw (cairo_t *cr, const TfFigureTheme *theme, const TfPlotArea *area,
                    TfEvidenceScale scale)
{
  Grade g[8];
  guint n = grades (scale, g);
  double size = theme->text_size * 0.9;
  double h = tf_fig_text_height (cr, theme, size, "Hg");
  double x = area->x + area->width + tf_figure_theme_pt (theme, 3.0);
  double taken[1][2];           /* the rows of ↑ H0 and ↓ H1: no grade's name over them */
  guint n_taken;

  cairo_save (cr);
  grade_lines (cr, theme, area, g, n);
  n_taken = even_line (cr, theme, area, x, size, h, taken);
  grade_names (cr, theme, area, g, n, x, size, h, taken, n_taken);
  cairo_restore (cr);
}
