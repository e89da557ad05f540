/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-kinds.c: the table of figure kinds: for each its name, its label, how its
 * curves are computed, drawn and read under the pointer. Every list of kinds (the
 * command line's names, the window's chooser, the report's figures) reads it.
 */
#include <glib/gi18n-lib.h>
#include "tf-figure-private.h"

static const TfFigKind kinds[TF_N_FIGURE_KINDS] = {
  [TF_FIGURE_DENSITIES] = {
    "densities", N_("Prior, likelihood and posterior"),
    tf_fig_densities_compute, tf_fig_densities_free,
    tf_fig_densities_draw, tf_fig_densities_read,
  },
  [TF_FIGURE_SENSITIVITY] = {
    "sensitivity", N_("Evidence against the prior’s scale"),
    tf_fig_sensitivity_compute, (GDestroyNotify) tf_evidence_curve_free,
    tf_fig_sensitivity_draw, tf_fig_evidence_read,
  },
  [TF_FIGURE_SAMPLE_SIZE] = {
    "sample-size", N_("Evidence against the sample size"),
    tf_fig_sample_size_compute, (GDestroyNotify) tf_evidence_curve_free,
    tf_fig_sample_size_draw, tf_fig_evidence_read,
  },
  [TF_FIGURE_NULL_DISTRIBUTION] = {
    "null-distribution", N_("Null distribution and p-value"),
    tf_fig_null_compute, (GDestroyNotify) tf_null_distribution_free,
    tf_fig_null_draw, tf_fig_null_read,
  },
  [TF_FIGURE_MODEL_PROBABILITIES] = {
    "model-probabilities", N_("Model probabilities"),
    tf_fig_models_compute, (GDestroyNotify) tf_model_probabilities_free,
    tf_fig_models_draw, NULL,
  },
};

const TfFigKind *
tf_fig_kind (TfFigureKind kind)
{
  g_return_val_if_fail (kind < TF_N_FIGURE_KINDS, NULL);
  return &kinds[kind];
}

const char *
tf_figure_kind_to_string (TfFigureKind kind)
{
  g_return_val_if_fail (kind < TF_N_FIGURE_KINDS, NULL);
  return kinds[kind].name;
}

gboolean
tf_figure_kind_from_string (const char *name, TfFigureKind *kind)
{
  for (guint i = 0; i < TF_N_FIGURE_KINDS; i++)
    if (g_strcmp0 (name, kinds[i].name) == 0)
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
  if (kind >= TF_N_FIGURE_KINDS)
    return "";
  return _(kinds[kind].label);
}

char *
tf_figure_kind_names (void)
{
  g_autoptr (GString) list = g_string_new (kinds[0].name);

  for (guint i = 1; i + 1 < TF_N_FIGURE_KINDS; i++)
    g_string_append_printf (list, ", %s", kinds[i].name);
  /* TRANSLATORS: the last of a list of figure kinds, "…, null-distribution or
   * model-probabilities"; the first %s is the list so far */
  return g_strdup_printf (_("%s or %s"), list->str, kinds[TF_N_FIGURE_KINDS - 1].name);
}
