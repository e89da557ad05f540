/* SPDX-License-Identifier: GPL-3.0-or-later
 * The explanations: every design's text carries its live numbers, names its own
 * parameter, and never shows "nan" or "inf".
 */
#include "tf-design.h"
#include "tf-analysis-file.h"
#include "tf-explain.h"
#include "tf-results.h"
#include "tf-check.h"

#include <locale.h>

static const struct {
  const char *name, *text, *parameter;
} cases[] = {
  { "one-proportion", "[Data]\nSuccesses=9700\nTrials=12000\n[Null]\nValue=0.8\n", "θ" },
  { "two-proportions", "[Data]\nSuccessesA=20\nTrialsA=40\nSuccessesB=12\nTrialsB=40\n", "θA" },
  { "one-mean", "[Data]\nN=25\nMean=10.4\nSD=2\n[Null]\nValue=10\n", "δ" },
  { "paired-means", "[Data]\nN=10\nMeanDiff=1.58\nSDDiff=1.23\n", "δ" },
  { "two-means", "[Data]\nNA=12\nMeanA=5.1\nSDA=1.2\nNB=14\nMeanB=4.2\nSDB=1.4\n", "δ" },
  { "one-rate", "[Data]\nEvents=15\nExposure=4\n[Null]\nValue=2\n", "λ" },
  { "two-rates", "[Data]\nEventsA=11\nExposureA=800\nEventsB=23\nExposureB=3011\n", "λA/λB" },
};

static void
test_every_design (void)
{
  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *text = g_strdup_printf ("[Analysis]\nFormat=1\nDesign=%s\n%s",
                                               cases[i].name, cases[i].text);
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();
      g_autoptr (TfAnalysis) a = tf_analysis_load_from_data (text, strlen (text), problems);
      g_autoptr (TfResults) r = NULL;
      g_autoptr (GPtrArray) list = NULL;
      g_autoptr (GString) all = g_string_new (NULL);
      const TfNumber *p;
      g_autofree char *p_text = NULL;

      if (a == NULL)
        {
          /* A design whose core is not in this version is refused by name. */
          g_assert_nonnull (tf_problem_list_find (problems, "Analysis", "Design"));
          continue;
        }
      r = tf_analysis_compute (a, problems);
      g_assert_nonnull (r);
      list = tf_explain (a, r);
      g_assert_cmpuint (list->len, >=, 6);
      for (guint j = 0; j < list->len; j++)
        {
          const TfExplanation *e = g_ptr_array_index (list, j);
          g_string_append_printf (all, "%s\n%s\n%s\n", e->title, e->measures, e->does_not);
        }
      p = tf_results_lookup (r, "p_value");
      g_assert_nonnull (p);
      p_text = tf_number_format (p);
      if (strstr (all->str, p_text) == NULL)
        g_error ("%s: the explanations do not quote p = %s:\n%s", cases[i].name, p_text, all->str);
      if (strstr (all->str, cases[i].parameter) == NULL)
        g_error ("%s: the explanations do not name %s:\n%s", cases[i].name, cases[i].parameter, all->str);
      g_assert_null (strstr (all->str, "nan"));
      g_assert_null (strstr (all->str, "inf "));
      /* a NULL string printed with %s shows as "(null)"; "P(null)" is ours */
      for (const char *q = strstr (all->str, "(null)"); q; q = strstr (q + 1, "(null)"))
        g_assert_true (q > all->str && q[-1] == 'P');
      /* two means under Welch's test (the default): the Bayes factor's pooled t is named */
      if (a->design == TF_DESIGN_TWO_MEANS)
        g_assert_nonnull (strstr (all->str, "Student's pooled t"));
      else
        g_assert_null (strstr (all->str, "Student's pooled t"));
    }
}

/* core/text reads every design's words from its class and names no design: each class
 * gives those the text cannot do without, and its data sentence for its defaults. */
static void
test_class_words (void)
{
  for (int d = 0; d < TF_N_DESIGNS; d++)
    {
      const TfDesignClass *klass = tf_design_class (d);
      g_autoptr (TfAnalysis) a = NULL;
      g_autofree char *data = NULL;

      if (klass == NULL)
        continue;
      g_assert_nonnull (klass->estimand);
      g_assert_nonnull (klass->symbol);
      g_assert_nonnull (klass->data_words);
      g_assert_true (klass->no_condition_words == NULL || klass->disagreement_conditions != NULL);
      a = tf_analysis_new (d);
      data = klass->data_words (a);
      g_assert_true (g_str_has_prefix (data, "The data: "));
      g_assert_null (strstr (data, "(null)"));
    }
}

/* The caution every report and the About window carry. */
static void
test_caution (void)
{
  g_assert_nonnull (strstr (tf_caution_text (), "qualified statistician"));
  g_assert_nonnull (strstr (tf_caution_text (), "priors"));
}

int
main (int argc, char **argv)
{
  setlocale (LC_ALL, "C.UTF-8");
  tf_check_init (&argc, &argv);
  g_test_add_func ("/explain/every-design", test_every_design);
  g_test_add_func ("/explain/class-words", test_class_words);
  g_test_add_func ("/explain/caution", test_caution);
  return g_test_run ();
}
