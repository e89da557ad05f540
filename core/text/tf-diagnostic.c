/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-diagnostic.c: the conditions under which a small p-value and a probable null
 * (or the reverse) go together: Lindley's paradox (Lindley 1957) and its kin.
 */
#include "tf-diagnostic.h"

#include <math.h>
#include <glib/gi18n-lib.h>

/* Thresholds, common practice: a sample is large from 10^4, an effect is small when
 * it is under half the prior's SD, a null is precise when it is a point or narrower
 * than a tenth of the prior's SD, a prior is diffuse when its SD exceeds ten
 * posterior SDs, and prior odds are near 1 for a prior null probability in [0.4, 0.6]. */
#define LARGE_N 1e4
#define SMALL_EFFECT 0.5
#define PRECISE_NULL 0.1
#define DIFFUSE_PRIOR 10.0

static double
beta_sd (double a, double b)
{
  double s = a + b;
  return sqrt (a * b / (s * s * (s + 1.0)));
}

char *
tf_diagnostic_text (const TfAnalysis *an, const TfResults *results)
{
  double p, post;

  if (!tf_results_get (results, "p_value", &p) || !tf_results_get (results, "posterior_null", &post))
    return NULL;
  double alpha = 1.0 - an->level;
  gboolean reject = p < alpha, null_likely = post > 0.5;
  if (reject != null_likely)
    return NULL;

  GString *text = g_string_new (NULL);
  if (reject)
    g_string_append_printf (text,
                            _("The readings disagree: the p-value (%.3g) is below α = %.3g, yet the null is the more probable model after the data (P(null | data) = %.3g)."),
                            p, alpha, post);
  else
    g_string_append_printf (text,
                            _("The readings disagree: the p-value (%.3g) is not below α = %.3g, yet the alternative is the more probable model after the data (P(null | data) = %.3g)."),
                            p, alpha, post);

  guint held = 0;
  if (an->design == TF_DESIGN_ONE_PROPORTION)
    {
      const double k = an->successes, n = an->trials;
      double L = an->null_kind == TF_NULL_POINT ? an->null_value : an->null_low;
      double H = an->null_kind == TF_NULL_POINT ? an->null_value : an->null_high;
      double est = k / n;
      double effect = est < L ? L - est : est > H ? est - H : 0.0;
      double prior_sd = beta_sd (an->prior_a, an->prior_b);
      double post_sd = beta_sd (k + an->prior_a, n - k + an->prior_b);

      if (n >= LARGE_N)
        {
          g_string_append_printf (text,
                                  _(" The sample is large (n = %.0f): at a fixed p-value the Bayes factor for a point null grows like √n."),
                                  n);
          held++;
        }
      if (effect < SMALL_EFFECT * prior_sd)
        {
          g_string_append_printf (text,
                                  _(" The effect is small: the estimate lies %.3g from the null, under half the prior's SD (%.3g), so the alternative spent most of its prior on values the data rule out."),
                                  effect, prior_sd);
          held++;
        }
      if (H - L < PRECISE_NULL * prior_sd)
        {
          g_string_append (text, an->null_kind == TF_NULL_POINT
                           ? _(" The null is precise: a single value, which takes all its prior probability to one point.")
                           : _(" The null is precise: its interval is narrower than a tenth of the prior's SD."));
          held++;
        }
      if (prior_sd > DIFFUSE_PRIOR * post_sd)
        {
          g_string_append_printf (text,
                                  _(" The prior is diffuse: its SD (%.3g) is more than ten times the posterior's (%.3g), which penalises the alternative for its spread."),
                                  prior_sd, post_sd);
          held++;
        }
    }
  double pi0 = an->prior_null;
  if (pi0 >= 0.4 && pi0 <= 0.6)
    g_string_append_printf (text,
                            _(" The prior odds are near 1 (P(null) = %.3g), so the posterior follows the Bayes factor alone: the disagreement is between the p-value and the Bayes factor."),
                            pi0);
  else
    g_string_append_printf (text,
                            _(" The prior odds are far from 1 (P(null) = %.3g before the data), and they weigh on the posterior as much as the Bayes factor does."),
                            pi0);
  if (an->design == TF_DESIGN_ONE_PROPORTION && held == 0)
    g_string_append (text, _(" None of large n, small effect, precise null or diffuse prior holds here."));
  return g_string_free (text, FALSE);
}
