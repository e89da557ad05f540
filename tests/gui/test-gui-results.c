/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-gui-results.c: the result list's interval rows: titles, values, descriptions and
 * the reasons a limit is not defined.
 */
#include "test-gui.h"

/* Results made by hand so that limits can be undefined (the numbers are placeholders for
 * the display, not check values of any method): a limit's reason reads in its row. */
static void
check_undefined_limits (TfResultList *list, const TfAnalysis *analysis)
{
  g_autoptr (TfResults) results = tf_results_new (TF_DESIGN_ONE_PROPORTION);
  const char *why = "the level leaves no room above the estimate";

  tf_results_add (results, "p_value", "p-value", TF_MEASURE_TAIL_PROBABILITY, 0.04);
  tf_results_add (results, "ci_low", "Confidence interval, lower", TF_MEASURE_CONFIDENCE_LIMIT, 0.25);
  tf_results_add_undefined (results, "ci_high", "Confidence interval, upper",
                            TF_MEASURE_CONFIDENCE_LIMIT, why);
  tf_results_add_undefined (results, "cri_low", "Credible interval, lower",
                            TF_MEASURE_CREDIBLE_LIMIT, why);
  tf_results_add_undefined (results, "cri_high", "Credible interval, upper",
                            TF_MEASURE_CREDIBLE_LIMIT, why);
  tf_results_add (results, "posterior_mean", "Posterior mean", TF_MEASURE_ESTIMATE, 0.3);
  /* the core names each interval's method; results made by hand ask it too */
  tf_analysis_describe_numbers (analysis, results);

  tf_result_list_set_results (list, analysis, results);
  assert_list_shows (list, results);
  /* and the strings themselves, as a reader sees them */
  g_assert_cmpstr (tf_result_list_get_title (list, "ci_high"), ==,
                   "99.9% confidence interval (Clopper–\u2060Pearson)");
  g_assert_cmpstr (tf_result_list_get_value_text (list, "ci_high"), ==, "0.25 – not defined");
  g_assert_cmpstr (tf_result_list_get_subtitle (list, "ci_low"), ==,
                   "Upper limit not defined: the level leaves no room above the estimate");
  g_assert_cmpstr (tf_result_list_get_value_text (list, "cri_low"), ==, "not defined");
  g_assert_cmpstr (tf_result_list_get_subtitle (list, "cri_high"), ==,
                   "Neither limit is defined: the level leaves no room above the estimate");
  g_assert_cmpstr (tf_result_list_get_description (list, "ci_low"), ==,
                   "Lower limit 0.25, upper limit not defined. "
                   "Upper limit not defined: the level leaves no room above the estimate");
  g_assert_null (tf_result_list_get_description (list, "p_value"));
}

/* A lone limit, without its partner, keeps a row of its own. */
static void
check_lone_limit (TfResultList *list, const TfAnalysis *analysis)
{
  g_autoptr (TfResults) lone = tf_results_new (TF_DESIGN_ONE_PROPORTION);

  tf_results_add (lone, "ci_low", "Confidence interval, lower", TF_MEASURE_CONFIDENCE_LIMIT, 0.25);
  tf_result_list_set_results (list, analysis, lone);
  assert_list_shows (list, lone);
  g_assert_cmpstr (tf_result_list_get_value_text (list, "ci_low"), ==, "0.25");
  g_assert_cmpstr (tf_result_list_get_title (list, "ci_low"), ==, "Confidence interval, lower");
}

/* The list shows design_cases' analysis of design at level 0.95, checked against the
 * core; title_id then has title (when set). */
static void
show_design_case (TfResultList *list, TfDesign design, const char *title_id, const char *title)
{
  for (guint c = 0; c < n_design_cases; c++)
    if (design_cases[c].design == design)
      {
        g_autoptr (TfAnalysis) dc = read_case (design_cases[c].file);
        g_autoptr (TfResults) dr = compute_or_fail (dc);

        dc->level = 0.95;
        tf_result_list_set_results (list, dc, dr);
        assert_list_shows (list, dr);
        if (title)
          g_assert_cmpstr (tf_result_list_get_title (list, title_id), ==, title);
      }
}

/* Each design's intervals, one row each, titled with what they are of and their
 * published method; two proportions' diff_ci repeats its ci and shares its row. */
static void
check_design_titles (TfResultList *list)
{
  static const struct { TfDesign design; const char *id; const char *title; } titles[] = {
    { TF_DESIGN_ONE_PROPORTION, "wilson_cc_low", "95% confidence interval (Wilson, continuity-\u2060corrected)" },
    { TF_DESIGN_ONE_PROPORTION, "hdi_high", "95% credible interval (highest density)" },
    { TF_DESIGN_ONE_PROPORTION, "agresti_coull_low", "95% confidence interval (Agresti–\u2060Coull)" },
    { TF_DESIGN_TWO_PROPORTIONS, "ci_low", "95% confidence interval (Newcombe)" },
    { TF_DESIGN_TWO_PROPORTIONS, "diff_ci_high", "95% confidence interval (Newcombe)" },
    { TF_DESIGN_TWO_PROPORTIONS, "or_ci_low", "95% confidence interval of the odds ratio (Woolf)" },
    { TF_DESIGN_TWO_PROPORTIONS, "rr_ci_high", "95% confidence interval of the risk ratio (Katz)" },
    { TF_DESIGN_ONE_MEAN, "ci_low", "95% confidence interval (t)" },
    { TF_DESIGN_ONE_MEAN, "cri_high", "95% credible interval of δ (equal-\u2060tailed)" },
    { TF_DESIGN_ONE_MEAN, "effect_ci_low", "95% confidence interval of Cohen's d (noncentral t)" },
    { TF_DESIGN_PAIRED_MEANS, "hdi_low", "95% credible interval of δ (highest density)" },
    { TF_DESIGN_TWO_MEANS, "ci_high", "95% confidence interval (Student)" },
    { TF_DESIGN_ONE_RATE, "ci_low", "95% confidence interval (Garwood)" },
    { TF_DESIGN_TWO_RATES, "ci_low", "95% confidence interval (conditional Clopper–\u2060Pearson)" },
  };

  for (guint t = 0; t < G_N_ELEMENTS (titles); t++)
    show_design_case (list, titles[t].design, titles[t].id, titles[t].title);
  /* the last case was two rates; two proportions again: the repeated interval reads back
   * the very row of its ci (the same title string), not a second row */
  show_design_case (list, TF_DESIGN_TWO_PROPORTIONS, NULL, NULL);
  g_assert_true (tf_result_list_get_title (list, "ci_low")
                 == tf_result_list_get_title (list, "diff_ci_low"));
}

/* The list on its own: undefined limits, a lone limit, every design's interval titles,
 * and cleared, nothing left to read back. */
static void
test_result_list_intervals (void)
{
  TfResultList *list = TF_RESULT_LIST (g_object_ref_sink (tf_result_list_new ()));
  g_autoptr (TfAnalysis) analysis = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);

  analysis->level = 0.999;
  check_undefined_limits (list, analysis);
  check_lone_limit (list, analysis);
  check_design_titles (list);

  tf_result_list_clear (list, "Fix the Marked Field", "A field needs fixing.");
  g_assert_false (tf_result_list_has_results (list));
  g_assert_null (tf_result_list_get_value_text (list, "ci_low"));
  g_assert_null (tf_result_list_get_title (list, "ci_low"));
  g_assert_null (tf_result_list_get_description (list, "ci_low"));
  g_object_unref (list);
}

void
add_result_list_tests (void)
{
  g_test_add_func ("/gui/result-list/intervals", test_result_list_intervals);
}
