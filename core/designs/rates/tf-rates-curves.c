/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-rates-curves.c: the sensitivity hook of the rates designs: the shared curve
 * (tf-rates.c) around the analysis's design's Bayes factor. Above both design files,
 * so that nothing they share calls back into them.
 */
#include "tf-rates-curves.h"
#include "tf-one-rate.h"
#include "tf-two-rates.h"

gboolean
tf_rates_sensitivity (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not)
{
  const TfAnalysis *a = analysis;

  if (a->design == TF_DESIGN_TWO_RATES && !tf_two_rates_prior_in_range (a, why_not))
    return FALSE;
  tf_rates_sensitivity_of (a, curve, a->design == TF_DESIGN_ONE_RATE ? tf_one_rate_log_bf01_at
                                                                    : tf_two_rates_log_bf01_at);
  return TRUE;
}
