/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure.c: a figure kind's curves computed once for an analysis (TfFigure), drawn as
 * often as needed and read under the pointer, each by its entry of the table of kinds.
 */
#include <string.h>
#include <glib/gi18n-lib.h>
#include "tf-design.h"
#include "tf-figure-private.h"

struct _TfFigure {
  TfFigureKind kind;
  gpointer curves;              /* the kind's own (TfFigKind), never NULL */
};

static void
set_reason (char **why_not, char *reason)
{
  if (reason == NULL || *reason == '\0')
    {
      g_free (reason);
      reason = g_strdup (_("This figure does not apply to this analysis."));
    }
  if (why_not)
    *why_not = reason;
  else
    g_free (reason);
}

TfFigure *
tf_figure_new (const TfAnalysis *analysis, TfFigureKind kind, char **why_not)
{
  return tf_figure_new_with_results (analysis, NULL, kind, why_not);
}

TfFigure *
tf_figure_new_with_results (const TfAnalysis *analysis, const TfResults *results,
                            TfFigureKind kind, char **why_not)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  TfFigure *figure;
  gpointer curves;
  char *reason = NULL;

  g_return_val_if_fail (kind < TF_N_FIGURE_KINDS, NULL);
  if (analysis == NULL)
    {
      set_reason (why_not, g_strdup (_("There is no analysis.")));
      return NULL;
    }
  curves = tf_fig_kind (kind)->compute (analysis, results, problems, &reason);
  if (curves)
    {
      g_free (reason);
      figure = g_new0 (TfFigure, 1);
      figure->kind = kind;
      figure->curves = curves;
      return figure;
    }
  if (reason == NULL && problems->len > 0)
    {
      const TfProblem *problem = g_ptr_array_index (problems, 0);
      reason = g_strdup (problem->message);
    }
  set_reason (why_not, reason);
  return NULL;
}

void
tf_figure_free (TfFigure *figure)
{
  if (figure == NULL)
    return;
  tf_fig_kind (figure->kind)->free (figure->curves);
  g_free (figure);
}

TfFigureKind
tf_figure_get_kind (const TfFigure *figure)
{
  return figure->kind;
}

gboolean
tf_figure_draw_panels (const TfFigure *figure, cairo_t *cr, double width, double height,
                       double scale, const TfFigureOptions *options, TfFigurePanels *panels_out)
{
  TfFigurePanels panels = { 0 };
  gboolean ok;

  g_return_val_if_fail (figure != NULL, FALSE);
  ok = tf_fig_kind (figure->kind)->draw (cr, width, height, scale, figure->curves, options,
                                         &panels);
  if (ok && panels.n == 0)
    panels.n = 1;
  if (!ok)
    panels.n = 0;
  if (panels_out)
    *panels_out = panels;
  return ok;
}

gboolean
tf_figure_draw (const TfFigure *figure, cairo_t *cr, double width, double height,
                double scale, const TfFigureOptions *options, TfPlotArea *area_out)
{
  TfFigurePanels panels;
  gboolean ok = tf_figure_draw_panels (figure, cr, width, height, scale, options, &panels);

  if (ok && area_out)
    *area_out = panels.area[0];
  return ok;
}

gboolean
tf_figure_draw_kind (cairo_t *cr, TfFigureKind kind, double width, double height,
                     double scale, const TfAnalysis *analysis, const TfFigureOptions *options,
                     TfPlotArea *area_out, char **why_not)
{
  g_autofree char *reason = NULL;
  g_autoptr (TfFigure) figure = tf_figure_new (analysis, kind, &reason);

  if (figure == NULL)
    {
      tf_figure_draw_message (cr, width, height, scale, tf_fig_options (options)->style,
                              _("Nothing to draw"), reason);
      if (why_not)
        *why_not = g_steal_pointer (&reason);
      return FALSE;
    }
  return tf_figure_draw (figure, cr, width, height, scale, options, area_out);
}

gboolean
tf_figure_read_at (const TfFigure *figure, const TfPlotArea *area, double px,
                   TfFigureReading *reading)
{
  const TfFigKind *kind;

  g_return_val_if_fail (figure != NULL && area != NULL && reading != NULL, FALSE);
  memset (reading, 0, sizeof *reading);
  if (px < area->x || px > area->x + area->width)
    return FALSE;
  reading->x = tf_plot_area_unmap_x (area, px);
  reading->panel = area->panel;
  kind = tf_fig_kind (figure->kind);
  return kind->read && kind->read (figure->curves, area, reading->x, reading);
}

gboolean
tf_figure_read_at_point (const TfFigure *figure, const TfFigurePanels *panels, double px,
                         double py, TfFigureReading *reading)
{
  const TfPlotArea *area = tf_figure_panels_at (panels, px, py);

  g_return_val_if_fail (figure != NULL && reading != NULL, FALSE);
  if (area == NULL)
    {
      memset (reading, 0, sizeof *reading);
      return FALSE;
    }
  return tf_figure_read_at (figure, area, px, reading);
}

char *
tf_figure_reading_markup (const TfFigureReading *reading)
{
  g_autoptr (GString) text = g_string_new (NULL);
  g_autofree char *x = tf_fig_number (reading->x, 4);

  g_string_append_printf (text, "%s = %s", reading->x_markup ? reading->x_markup : "x", x);
  for (guint i = 0; i < reading->n && i < TF_FIGURE_READING_MAX; i++)
    {
      g_autofree char *v = tf_fig_number (reading->values[i], 3);
      g_string_append_printf (text, "   %s %s", reading->names[i], v);
    }
  return g_string_free (g_steal_pointer (&text), FALSE);
}

gboolean
tf_figure_draw_densities (cairo_t *cr, double width, double height, double scale,
                          const TfAnalysis *analysis, TfFigureStyle style)
{
  return tf_figure_draw_densities_full (cr, width, height, scale, analysis, style, NULL);
}

gboolean
tf_figure_draw_densities_full (cairo_t *cr, double width, double height, double scale,
                               const TfAnalysis *analysis, TfFigureStyle style,
                               TfPlotArea *area_out)
{
  TfFigureOptions options = TF_FIGURE_OPTIONS_INIT;

  options.style = style;
  return tf_figure_draw_kind (cr, TF_FIGURE_DENSITIES, width, height, scale, analysis,
                              &options, area_out, NULL);
}
