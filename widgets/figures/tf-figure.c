/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure.c: a figure kind's curves computed once for an analysis (TfFigure), drawn as
 * often as needed, and the crosshair readout; the figure kinds by name.
 */
#include <math.h>
#include <string.h>
#include <glib/gi18n-lib.h>
#include "tf-design.h"
#include "tf-figure-private.h"

#define DENSITY_POINTS 401
#define EVIDENCE_POINTS 256
#define NULL_POINTS 401

struct _TfFigure {
  TfFigureKind kind;
  TfDensityCurves *densities;
  double null_mass;             /* P(null | data) beside a point null's spike, or NAN */
  TfEvidenceCurve *evidence;
  TfNullDistribution *null_distribution;
  TfModelProbabilities *models;
  char *x_markup;               /* the x axis's name for the readout */
};

static const char *const kind_names[TF_N_FIGURE_KINDS] = {
  [TF_FIGURE_DENSITIES] = "densities",
  [TF_FIGURE_SENSITIVITY] = "sensitivity",
  [TF_FIGURE_SAMPLE_SIZE] = "sample-size",
  [TF_FIGURE_NULL_DISTRIBUTION] = "null-distribution",
  [TF_FIGURE_MODEL_PROBABILITIES] = "model-probabilities",
};

const char *
tf_figure_kind_to_string (TfFigureKind kind)
{
  g_return_val_if_fail (kind < TF_N_FIGURE_KINDS, NULL);
  return kind_names[kind];
}

gboolean
tf_figure_kind_from_string (const char *name, TfFigureKind *kind)
{
  for (guint i = 0; i < TF_N_FIGURE_KINDS; i++)
    if (g_strcmp0 (name, kind_names[i]) == 0)
      {
        if (kind)
          *kind = (TfFigureKind) i;
        return TRUE;
      }
  return FALSE;
}

const char *
tf_figure_kind_label (TfFigureKind kind)
{
  switch (kind)
    {
    case TF_FIGURE_DENSITIES:
      return _("Prior, likelihood and posterior");
    case TF_FIGURE_SENSITIVITY:
      return _("Evidence against the prior’s scale");
    case TF_FIGURE_SAMPLE_SIZE:
      return _("Evidence against the sample size");
    case TF_FIGURE_NULL_DISTRIBUTION:
      return _("Null distribution and p-value");
    case TF_FIGURE_MODEL_PROBABILITIES:
      return _("Model probabilities");
    case TF_N_FIGURE_KINDS:
    default:
      return "";
    }
}

gboolean
tf_figure_style_from_string (const char *name, TfFigureStyle *style)
{
  static const char *const names[] = { "light", "dark", "print" };

  for (guint i = 0; i < G_N_ELEMENTS (names); i++)
    if (g_strcmp0 (name, names[i]) == 0)
      {
        *style = (TfFigureStyle) i;
        return TRUE;
      }
  return FALSE;
}

gboolean
tf_evidence_scale_from_string (const char *name, TfEvidenceScale *scale)
{
  static const char *const names[] = { "kass-raftery", "jeffreys", "none" };

  for (guint i = 0; i < G_N_ELEMENTS (names); i++)
    if (g_strcmp0 (name, names[i]) == 0)
      {
        *scale = (TfEvidenceScale) i;
        return TRUE;
      }
  return FALSE;
}

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
  g_autoptr (TfFigure) figure = NULL;
  char *reason = NULL;

  g_return_val_if_fail (kind < TF_N_FIGURE_KINDS, NULL);
  if (analysis == NULL)
    {
      set_reason (why_not, g_strdup (_("There is no analysis.")));
      return NULL;
    }
  figure = g_new0 (TfFigure, 1);
  figure->kind = kind;
  figure->null_mass = NAN;
  switch (kind)
    {
    case TF_FIGURE_DENSITIES:
      figure->densities = tf_density_curves_new (analysis, DENSITY_POINTS, problems);
      if (figure->densities && analysis->null_kind == TF_NULL_POINT)
        {
          g_autoptr (TfResults) computed = results ? NULL : tf_analysis_compute (analysis, NULL);
          const TfResults *r = results ? results : computed;
          double p;

          if (r && tf_results_get (r, "posterior_null", &p) && isfinite (p))
            figure->null_mass = p;
        }
      if (figure->densities == NULL && problems->len == 0)
        /* TRANSLATORS: %s is a design, "one proportion" */
        reason = g_strdup_printf (_("The densities figure is not available for the %s design in this version."),
                                  tf_design_label (analysis->design));
      break;
    case TF_FIGURE_SENSITIVITY:
      figure->evidence = tf_sensitivity_curve_new (analysis, EVIDENCE_POINTS, problems, &reason);
      break;
    case TF_FIGURE_SAMPLE_SIZE:
      figure->evidence = tf_sample_size_curve_new (analysis, EVIDENCE_POINTS, problems, &reason);
      break;
    case TF_FIGURE_NULL_DISTRIBUTION:
      figure->null_distribution = tf_null_distribution_new (analysis, NULL_POINTS, problems,
                                                            &reason);
      break;
    case TF_FIGURE_MODEL_PROBABILITIES:
      figure->models = tf_model_probabilities_new (analysis, problems, &reason);
      break;
    case TF_N_FIGURE_KINDS:
    default:
      break;
    }
  if (figure->densities || figure->evidence || figure->null_distribution || figure->models)
    {
      if (figure->densities)
        figure->x_markup = g_strdup_printf ("<i>%s</i>", figure->densities->parameter_markup
                                                         ? figure->densities->parameter_markup : "θ");
      else if (figure->evidence)
        figure->x_markup = g_strdup (figure->evidence->x_markup ? figure->evidence->x_markup : "x");
      else if (figure->null_distribution)
        figure->x_markup = g_strdup (figure->null_distribution->x_markup
                                     ? figure->null_distribution->x_markup : "x");
      g_free (reason);
      return g_steal_pointer (&figure);
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
  tf_density_curves_free (figure->densities);
  tf_evidence_curve_free (figure->evidence);
  tf_null_distribution_free (figure->null_distribution);
  tf_model_probabilities_free (figure->models);
  g_free (figure->x_markup);
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
  TfPlotArea *one = &panels.area[0];
  gboolean ok = FALSE;

  g_return_val_if_fail (figure != NULL, FALSE);
  switch (figure->kind)
    {
    case TF_FIGURE_DENSITIES:
      ok = tf_figure_draw_density_curves (cr, width, height, scale, figure->densities,
                                          figure->null_mass, options, one);
      break;
    case TF_FIGURE_SENSITIVITY:
    case TF_FIGURE_SAMPLE_SIZE:
      ok = tf_fig_draw_evidence (cr, width, height, scale, figure->evidence, options,
                                 figure->kind == TF_FIGURE_SAMPLE_SIZE, &panels);
      break;
    case TF_FIGURE_NULL_DISTRIBUTION:
      ok = tf_figure_draw_null_distribution (cr, width, height, scale,
                                             figure->null_distribution, options, one);
      break;
    case TF_FIGURE_MODEL_PROBABILITIES:
      ok = tf_figure_draw_model_probabilities (cr, width, height, scale, figure->models,
                                               options, one);
      break;
    case TF_N_FIGURE_KINDS:
    default:
      break;
    }
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

/* Index of the grid point nearest x in an increasing grid (bisection). */
static guint
nearest (const double *grid, guint n, double x)
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

/* One value of the reading, and where it is drawn in area (y a coordinate of its axis). */
static void
add_value (TfFigureReading *reading, const TfPlotArea *area, const char *name, double value,
           double y)
{
  guint i = reading->n++;
  double lo = MIN (area->y_lo, area->y_hi), hi = MAX (area->y_lo, area->y_hi);

  reading->names[i] = name;
  reading->values[i] = value;
  reading->y[i] = isfinite (y) && y >= lo && y <= hi ? tf_plot_area_map_y (area, y) : NAN;
}

gboolean
tf_figure_read_at (const TfFigure *figure, const TfPlotArea *area, double px,
                   TfFigureReading *reading)
{
  double x;
  guint i;

  g_return_val_if_fail (figure != NULL && area != NULL && reading != NULL, FALSE);
  memset (reading, 0, sizeof *reading);
  if (px < area->x || px > area->x + area->width)
    return FALSE;
  x = tf_plot_area_unmap_x (area, px);
  reading->x = x;
  reading->x_markup = figure->x_markup;
  reading->panel = area->panel;
  switch (figure->kind)
    {
    case TF_FIGURE_DENSITIES:
      {
        const TfDensityCurves *c = figure->densities;
        i = nearest (c->x, c->n, x);
        add_value (reading, area, _("posterior"), c->posterior[i], c->posterior[i]);
        add_value (reading, area, _("prior"), c->prior[i], c->prior[i]);
        add_value (reading, area, _("likelihood, scaled"), c->likelihood[i], c->likelihood[i]);
      }
      return TRUE;
    case TF_FIGURE_SENSITIVITY:
    case TF_FIGURE_SAMPLE_SIZE:
      {
        /* the Bayes factor above (log10 on its axis), P(H0 | data) below */
        const TfEvidenceCurve *c = figure->evidence;
        i = nearest (c->x, c->n, x);
        reading->x = c->x[i];
        if (area->panel == 0)
          add_value (reading, area, "BF<sub>01</sub>", exp (c->log_bf01[i]),
                     c->log_bf01[i] / G_LN10);
        else
          add_value (reading, area, _("P(H₀ | data)"), c->posterior_null[i],
                     c->posterior_null[i]);
      }
      return TRUE;
    case TF_FIGURE_NULL_DISTRIBUTION:
      {
        const TfNullDistribution *d = figure->null_distribution;
        i = nearest (d->x, d->n, x);
        reading->x = d->x[i];
        add_value (reading, area, d->discrete ? _("probability") : _("density"), d->mass[i],
                   d->mass[i]);
      }
      return TRUE;
    case TF_FIGURE_MODEL_PROBABILITIES:
    case TF_N_FIGURE_KINDS:
    default:
      return FALSE;
    }
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
