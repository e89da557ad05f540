/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-means.c: two independent means, Student's pooled t and Welch's t. The Bayes
 * factors and δ use the pooled t (the two-sample JZS test of Rouder et al. 2009).
 */
#include "tf-two-means.h"

#include <math.h>
#include <glib/gi18n-lib.h>

void
tf_two_means_validate (const TfAnalysis *a, GPtrArray *problems)
{
  gboolean student = a->equal_variances;
  guint before = problems->len;

  tf_means_validate_sample (problems, "NA", "MeanA", "SDA", "ValuesA", a->values_a != NULL,
                            a->n_a, a->mean_a, a->sd_a, 2.0, student);
  tf_means_validate_sample (problems, "NB", "MeanB", "SDB", "ValuesB", a->values_b != NULL,
                            a->n_b, a->mean_b, a->sd_b, 2.0, student);
  if (problems->len == before && student && a->sd_a == 0.0 && a->sd_b == 0.0)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", a->values_b ? "ValuesB" : "SDB",
                                     _("Both groups have an SD of 0, so the pooled SD is 0 and the t statistic is not defined.")));
  if (a->has_known_sd)
    g_ptr_array_add (problems,
                     tf_problem_new ("Data", "KnownSD",
                                     _("KnownSD is available for one mean and paired means only.")));
  tf_means_validate_common (a, problems);
}

void
tf_two_means_summarise (TfAnalysis *a)
{
  if (a->values_a)
    tf_sample_summarise ((double *) a->values_a->data, a->values_a->len, &a->n_a, &a->mean_a, &a->sd_a);
  if (a->values_b)
    tf_sample_summarise ((double *) a->values_b->data, a->values_b->len, &a->n_b, &a->mean_b, &a->sd_b);
}

double
tf_welch_df (double n_a, double sd_a, double n_b, double sd_b)
{
  double va = sd_a * sd_a / n_a, vb = sd_b * sd_b / n_b;
  double s = va + vb;
  /* (va + vb)² / (va²/(nA − 1) + vb²/(nB − 1)), scaled by s against overflow */
  double ra = va / s, rb = vb / s;
  return 1.0 / (ra * ra / (n_a - 1.0) + rb * rb / (n_b - 1.0));
}

void
tf_two_means_stats (const TfAnalysis *a, TfMeansStats *s)
{
  double na = a->n_a, nb = a->n_b;
  double diff = a->mean_a - a->mean_b;
  double df_s = na + nb - 2.0;
  /* pooled SD, from the larger SD out so that it does not overflow */
  double big = MAX (a->sd_a, a->sd_b);
  double ra = a->sd_a / big, rb = a->sd_b / big;
  double sp = big * sqrt (((na - 1.0) * ra * ra + (nb - 1.0) * rb * rb) / df_s);
  double se_s = sp * sqrt (1.0 / na + 1.0 / nb);
  double se_w = big * sqrt (ra * ra / na + rb * rb / nb);
  double t_s = (diff - a->null_value) / se_s;
  double t_w = (diff - a->null_value) / se_w;
  double df_w = tf_welch_df (na, a->sd_a, nb, a->sd_b);

  *s = (TfMeansStats) { 0 };
  s->two_samples = TRUE;
  s->estimate = diff;
  s->se = a->equal_variances ? se_s : se_w;
  s->t = a->equal_variances ? t_s : t_w;
  s->df = a->equal_variances ? df_s : df_w;
  s->t_delta = t_s;
  s->df_delta = df_s;
  s->n_eff = na * nb / (na + nb);
  s->n_total = na + nb;
  /* both groups grow in the observed proportion: n_eff = n share (1 − share) */
  s->n_eff_per_n = (na / (na + nb)) * (nb / (na + nb));
  s->df_offset = 2.0;
  s->p_student = tf_means_p_value (t_s, df_s, a->direction);
  s->p_welch = a->sd_a > 0.0 && a->sd_b > 0.0 ? tf_means_p_value (t_w, df_w, a->direction) : NAN;
}
