/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-mean.c: one mean, and paired means (one mean of the differences).
 */
#include "tf-one-mean.h"

#include <math.h>
#include <glib/gi18n-lib.h>

static gboolean
paired (const TfAnalysis *analysis)
{
  return analysis->design == TF_DESIGN_PAIRED_MEANS;
}

void
tf_one_mean_validate (const TfAnalysis *a, GPtrArray *problems)
{
  gboolean is_paired = paired (a);
  gboolean from_values = is_paired ? (a->values_a != NULL && a->values_b != NULL)
                                   : a->values != NULL;
  gboolean known = a->has_known_sd;

  if (is_paired && from_values && a->values_a->len != a->values_b->len)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", "ValuesB",
                                     _("ValuesB must have as many values as ValuesA for paired means (%u and %u)."),
                                     a->values_b->len, a->values_a->len));
  else
    tf_means_validate_sample (problems, "N", is_paired ? "MeanDiff" : "Mean",
                              is_paired ? "SDDiff" : "SD", is_paired ? "ValuesA" : "Values",
                              from_values, a->n, a->mean, a->sd, known ? 1.0 : 2.0, known);
  if (known && !(isfinite (a->known_sd) && a->known_sd > 0.0))
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", "KnownSD",
                                     _("KnownSD must be above 0 (it is %g)."), a->known_sd));
  tf_means_validate_common (a, problems);
}

void
tf_one_mean_summarise (TfAnalysis *a)
{
  if (a->values)
    tf_sample_summarise ((double *) a->values->data, a->values->len, &a->n, &a->mean, &a->sd);
}

/* The differences A − B within pairs, when both lists are there and of one length. */
void
tf_paired_means_summarise (TfAnalysis *a)
{
  if (a->values_a && a->values_b && a->values_a->len == a->values_b->len)
    {
      g_autofree double *d = g_new (double, a->values_a->len);

      for (guint i = 0; i < a->values_a->len; i++)
        d[i] = g_array_index (a->values_a, double, i) - g_array_index (a->values_b, double, i);
      tf_sample_summarise (d, a->values_a->len, &a->n, &a->mean, &a->sd);
    }
}

void
tf_one_mean_stats (const TfAnalysis *a, TfMeansStats *s)
{
  double sigma = a->has_known_sd ? a->known_sd : a->sd;

  *s = (TfMeansStats) { 0 };
  s->known_sd = a->has_known_sd;
  s->estimate = a->mean;
  s->se = sigma / sqrt (a->n);
  /* (x̄ − μ0) √n / s: the difference first, so a mean far from 0 keeps its digits */
  s->t = (a->mean - a->null_value) / s->se;
  s->df = a->has_known_sd ? INFINITY : a->n - 1.0;
  s->t_delta = s->t;
  s->df_delta = s->df;
  s->n_eff = a->n;
  s->n_total = a->n;
  s->n_eff_per_n = 1.0;
  s->df_offset = 1.0;
}
