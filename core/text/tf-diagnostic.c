/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-diagnostic.c: the conditions under which a small p-value and a probable null
 * (or the reverse) go together: Lindley's paradox (Lindley 1957) and its kin. The
 * design names its own conditions (TfDesignClass.disagreement_conditions); the prior
 * odds are read here for every design.
 */
#include "tf-diagnostic.h"
#include "tf-design.h"

#include <glib/gi18n-lib.h>

/* Prior odds are near 1 for a prior null probability in [0.4, 0.6] (common practice). */
#define NEAR_EVEN_LOW 0.4
#define NEAR_EVEN_HIGH 0.6

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

  /* the design's own conditions (large n, small effect, ...) */
  const TfDesignClass *klass = tf_design_class (an->design);
  guint held = klass->disagreement_conditions ? klass->disagreement_conditions (an, text) : 0;

  double pi0 = an->prior_null;
  if (pi0 >= NEAR_EVEN_LOW && pi0 <= NEAR_EVEN_HIGH)
    g_string_append_printf (text,
                            _(" The prior odds are near 1 (P(null) = %.3g), so the posterior follows the Bayes factor alone: the disagreement is between the p-value and the Bayes factor."),
                            pi0);
  else
    g_string_append_printf (text,
                            _(" The prior odds are far from 1 (P(null) = %.3g before the data), and they weigh on the posterior as much as the Bayes factor does."),
                            pi0);
  if (held == 0 && klass->no_condition_words)
    g_string_append (text, _(klass->no_condition_words));
  return g_string_free (text, FALSE);
}
