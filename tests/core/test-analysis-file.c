/* SPDX-License-Identifier: GPL-3.0-or-later
 * The analysis file: reading, writing, keeping unknown keys, atomic saves, and a
 * problem naming group and key for every kind of bad value; what the design classes
 * give the widgets (form fields, interval methods).
 */
#include "tf-design.h"
#include "tf-analysis-file.h"
#include "tf-results.h"
#include "tf-check.h"

#include <glib/gstdio.h>
#include <locale.h>
#include <math.h>

static const char demo[] =
  "# a comment at the top\n"
  "[Analysis]\n"
  "Format=1\n"
  "Design=one-proportion\n"
  "Title=Seed lot 7\n"
  "Operator=J. Doe\n"
  "\n"
  "[Data]\n"
  "Successes=9700\n"
  "Trials=12000\n"
  "\n"
  "[Null]\n"
  "Kind=point\n"
  "Value=0.8\n"
  "\n"
  "[Alternative]\n"
  "Direction=two-sided\n"
  "Prior=beta\n"
  "PriorA=1\n"
  "PriorB=1\n"
  "\n"
  "[Models]\n"
  "PriorNull=0.5\n"
  "\n"
  "[Options]\n"
  "Level=0.95\n"
  "\n"
  "[Lab notebook]\n"
  "# kept as written\n"
  "Page=41\n";

static TfAnalysis *
load_string (const char *text, GPtrArray *problems)
{
  return tf_analysis_load_from_data (text, strlen (text), problems);
}

static void
test_load_fields (void)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (TfAnalysis) a = load_string (demo, problems);

  g_assert_nonnull (a);
  g_assert_cmpuint (problems->len, ==, 0);
  g_assert_cmpint (a->design, ==, TF_DESIGN_ONE_PROPORTION);
  g_assert_cmpstr (a->title, ==, "Seed lot 7");
  g_assert_cmpfloat (a->successes, ==, 9700);
  g_assert_cmpfloat (a->trials, ==, 12000);
  g_assert_cmpfloat (a->null_value, ==, 0.8);
  g_assert_cmpfloat (a->prior_a, ==, 1);
  g_assert_cmpfloat (a->prior_null, ==, 0.5);
  g_assert_cmpfloat (a->level, ==, 0.95);
}

/* Saving and loading again gives the same analysis, and the keys Twofold does not
 * know come back as they were (DEVELOPERS.md: "Unknown keys are kept"). */
static void
test_round_trip_keeps_unknown_keys (void)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();
  g_autoptr (TfAnalysis) a = load_string (demo, problems);
  g_autoptr (TfAnalysis) b = NULL;
  g_autofree char *dir = g_dir_make_tmp ("twofold-test-XXXXXX", NULL);
  g_autofree char *path = g_build_filename (dir, "lot 7.twofold", NULL);
  g_autoptr (GError) error = NULL;
  g_autofree char *written = NULL;

  g_assert_nonnull (a);
  a->successes = 9701;
  g_assert_true (tf_analysis_save (a, path, &error));
  g_assert_no_error (error);
  g_assert_true (g_file_get_contents (path, &written, NULL, NULL));
  g_assert_nonnull (strstr (written, "Operator=J. Doe"));
  g_assert_nonnull (strstr (written, "[Lab notebook]"));
  g_assert_nonnull (strstr (written, "# kept as written\nPage=41"));
  g_assert_nonnull (strstr (written, "Successes=9701"));

  b = tf_analysis_load (path, problems);
  g_assert_nonnull (b);
  g_assert_cmpfloat (b->successes, ==, 9701);
  g_assert_cmpfloat (b->trials, ==, a->trials);
  g_assert_cmpfloat (b->null_value, ==, a->null_value);
  g_assert_cmpstr (b->title, ==, a->title);

  /* Only the target is left in the folder: the temporary file was renamed over it. */
  {
    g_autoptr (GDir) d = g_dir_open (dir, 0, NULL);
    const char *name;
    guint count = 0;

    while ((name = g_dir_read_name (d)))
      count++;
    g_assert_cmpuint (count, ==, 1);
  }
  g_unlink (path);
  g_rmdir (dir);
}

static void
test_save_failure_leaves_nothing (void)
{
  g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);
  g_autoptr (GError) error = NULL;

  g_assert_false (tf_analysis_save (a, "/nonexistent-folder-for-twofold/x.twofold", &error));
  g_assert_nonnull (error);
  g_assert_false (g_file_test ("/nonexistent-folder-for-twofold", G_FILE_TEST_EXISTS));
}

/* Numbers are written with '.' and read back bit for bit whatever the locale. */
/* Every data key of every design, and every prior key the design uses, survives a save
 * and a reload: the written file reads back to the same analysis, written the same. */
static void
test_every_design_round_trip (void)
{
  static const char *const files[] = {
    "[Analysis]\nFormat=1\nDesign=one-proportion\n[Data]\nSuccesses=7\nTrials=19\n"
    "[Null]\nValue=0.25\n[Alternative]\nPriorA=2.5\nPriorB=0.5\n",
    "[Analysis]\nFormat=1\nDesign=two-proportions\n[Data]\nSuccessesA=3\nTrialsA=11\n"
    "SuccessesB=0\nTrialsB=9\n[Alternative]\nPriorA=0.5\nPriorB=0.5\nPriorScale=1.75\n",
    "[Analysis]\nFormat=1\nDesign=one-mean\n[Data]\nN=12\nMean=-0.25\nSD=3.5\nKnownSD=3\n"
    "[Null]\nValue=1\n[Alternative]\nPrior=normal\nPriorScale=0.3\n",
    "[Analysis]\nFormat=1\nDesign=one-mean\n[Data]\nValues=1.5;2;-3.25;8\n[Null]\nValue=0\n",
    "[Analysis]\nFormat=1\nDesign=paired-means\n[Data]\nN=30\nMeanDiff=0.75\nSDDiff=1.25\n",
    "[Analysis]\nFormat=1\nDesign=paired-means\n[Data]\nValuesA=1;2;3.5\nValuesB=0.5;2.5;3\n",
    "[Analysis]\nFormat=1\nDesign=two-means\n[Data]\nValuesA=1;2;4\nNB=8\nMeanB=2.5\nSDB=0.75\n"
    "EqualVariances=true\n",
    "[Analysis]\nFormat=1\nDesign=one-rate\n[Data]\nEvents=0\nExposure=120.5\n"
    "[Null]\nValue=0.01\n[Alternative]\nPriorShape=0.5\nPriorRate=20\n",
    "[Analysis]\nFormat=1\nDesign=two-rates\n[Data]\nEventsA=4\nExposureA=10\nEventsB=9\n"
    "ExposureB=12.25\n",
  };

  for (guint i = 0; i < G_N_ELEMENTS (files); i++)
    {
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();
      g_autoptr (TfAnalysis) first = load_string (files[i], problems);
      g_autoptr (TfAnalysis) second = NULL;
      g_autofree char *written = NULL, *rewritten = NULL;

      g_test_message ("%s", files[i]);
      g_assert_cmpuint (problems->len, ==, 0);
      g_assert_nonnull (first);
      written = tf_analysis_to_data (first, NULL);
      second = load_string (written, problems);
      g_assert_cmpuint (problems->len, ==, 0);
      g_assert_nonnull (second);
      rewritten = tf_analysis_to_data (second, NULL);
      g_assert_cmpstr (rewritten, ==, written);
      g_assert_cmpfloat (second->prior_scale, ==, first->prior_scale);
      g_assert_cmpfloat (second->n, ==, first->n);
      g_assert_cmpfloat (second->mean_a, ==, first->mean_a);
      g_assert_cmpfloat (second->sd_b, ==, first->sd_b);
      g_assert_cmpfloat (second->exposure_b, ==, first->exposure_b);
    }
  /* the log odds ratio prior's SD of two proportions is written, though its Prior is beta */
  {
    g_autoptr (GPtrArray) problems = tf_problem_list_new ();
    g_autoptr (TfAnalysis) a = load_string (files[1], problems);
    g_autofree char *written = tf_analysis_to_data (a, NULL);

    g_assert_nonnull (strstr (written, "PriorScale=1.75\n"));
  }
}

static void
test_numbers_round_trip (void)
{
  g_autoptr (GRand) rand = g_rand_new_with_seed (20261201);
  const double specials[] = { 0.1, 1.0 / 3.0, 1e12, 1e-300, 0.9999999999999999,
                              4.9406564584124654e-324, 1.7976931348623157e308, 800000400000 };

  for (guint i = 0; i < G_N_ELEMENTS (specials) + 10000; i++)
    {
      double x = i < G_N_ELEMENTS (specials) ? specials[i]
                 : exp (g_rand_double_range (rand, -700, 700));
      g_autofree char *s = tf_format_double (x);

      g_assert_cmpfloat (g_ascii_strtod (s, NULL), ==, x);
      g_assert_null (strchr (s, ','));
    }
  {
    g_autofree char *s = tf_format_double (0.5);
    g_assert_cmpstr (s, ==, "0.5");
  }
  {
    g_autofree char *s = tf_format_double (1e12);
    g_assert_cmpstr (s, ==, "1000000000000");
  }
}

static void
test_locale_independent (void)
{
  const char *locales[] = { "de_DE.UTF-8", "fr_FR.UTF-8", "de_DE", NULL };
  const char *found = NULL;

  for (guint i = 0; locales[i] && !found; i++)
    if (setlocale (LC_NUMERIC, locales[i]))
      found = locales[i];
  if (!found)
    {
      g_test_skip ("no locale with a decimal comma is installed");
      return;
    }
  {
    g_autoptr (GPtrArray) problems = tf_problem_list_new ();
    g_autoptr (TfAnalysis) a = load_string (demo, problems);
    g_autofree char *data = NULL;

    g_assert_nonnull (a);
    g_assert_cmpfloat (a->null_value, ==, 0.8);
    data = tf_analysis_to_data (a, NULL);
    g_assert_nonnull (strstr (data, "Value=0.8\n"));
  }
  setlocale (LC_NUMERIC, "C");
}

typedef struct {
  const char *old, *new;
  const char *group, *key;
} BadCase;

/* Each bad value gives a problem naming its group and key. */
static void
test_bad_values_named (void)
{
  const BadCase cases[] = {
    { "Trials=12000", "Trials=abc", "Data", "Trials" },
    { "Trials=12000", "Trials=", "Data", "Trials" },
    { "Trials=12000", "Trials=nan", "Data", "Trials" },
    { "Trials=12000", "Trials=-inf", "Data", "Trials" },
    { "Trials=12000", "Trials=1e400", "Data", "Trials" },
    { "Trials=12000", "Trials=0x10", "Data", "Trials" },
    { "Trials=12000", "Trials=12 000", "Data", "Trials" },
    { "Trials=12000\n", "", "Data", "Trials" },
    { "Successes=9700\n", "", "Data", "Successes" },
    { "Value=0.8", "Value=0,8", "Null", "Value" },
    { "Kind=point", "Kind=fuzzy", "Null", "Kind" },
    { "Direction=two-sided", "Direction=up", "Alternative", "Direction" },
    { "Prior=beta", "Prior=lognormal", "Alternative", "Prior" },
    { "PriorA=1", "PriorA=one", "Alternative", "PriorA" },
    { "PriorNull=0.5", "PriorNull=half", "Models", "PriorNull" },
    { "Level=0.95", "Level=95%", "Options", "Level" },
    { "Design=one-proportion", "Design=one-proportions", "Analysis", "Design" },
    { "Format=1", "Format=2", "Analysis", "Format" },
    { "Format=1\n", "", "Analysis", "Format" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();
      g_autoptr (GString) text = g_string_new (demo);
      g_autoptr (TfAnalysis) a = NULL;

      g_assert_cmpuint (g_string_replace (text, cases[i].old, cases[i].new, 1), ==, 1);
      a = load_string (text->str, problems);
      g_assert_null (a);
      if (tf_problem_list_find (problems, cases[i].group, cases[i].key) == NULL)
        g_error ("case %u (%s): no problem names [%s] %s", i, cases[i].new,
                 cases[i].group, cases[i].key);
    }
}

static void
test_not_an_analysis (void)
{
  const char *texts[] = { "", "hello\n", "[Data]\nTrials=3\n", "[Analysis\nFormat=1\n" };

  for (guint i = 0; i < G_N_ELEMENTS (texts); i++)
    {
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();
      g_autoptr (TfAnalysis) a = load_string (texts[i], problems);

      g_assert_null (a);
      g_assert_cmpuint (problems->len, >=, 1);
    }
  {
    g_autoptr (GPtrArray) problems = tf_problem_list_new ();
    g_autoptr (TfAnalysis) a = tf_analysis_load ("/nonexistent/x.twofold", problems);

    g_assert_null (a);
    g_assert_cmpuint (problems->len, ==, 1);
  }
}

/* The shipped demo analyses load and compute. */
static void
test_demos_load (void)
{
  const char *names[] = { "seed-germination.twofold", "workshop-defects.twofold" };
  const char *top = g_getenv ("TF_SOURCE_DIR");

  if (top == NULL)
    {
      g_test_skip ("TF_SOURCE_DIR is not set");
      return;
    }
  for (guint i = 0; i < G_N_ELEMENTS (names); i++)
    {
      g_autofree char *path = g_build_filename (top, "data", "demo", names[i], NULL);
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();
      g_autoptr (TfAnalysis) a = tf_analysis_load (path, problems);
      g_autoptr (TfResults) r = NULL;

      g_assert_nonnull (a);
      r = tf_analysis_compute (a, problems);
      g_assert_nonnull (r);
      g_assert_true (tf_results_get (r, "p_value", NULL));
      g_assert_true (tf_results_get (r, "posterior_null", NULL));
    }
}

static void
test_format_value (void)
{
  struct { double v; TfMeasure m; const char *want; } cases[] = {
    { 0.02247, TF_MEASURE_TAIL_PROBABILITY, "0.02247" },
    { 1e-300, TF_MEASURE_TAIL_PROBABILITY, "1.000 × 10⁻³⁰⁰" },
    { 1 - 1e-12, TF_MEASURE_POSTERIOR_PROBABILITY, "1 − 1.000 × 10⁻¹²" },
    { 7.98772, TF_MEASURE_BAYES_FACTOR, "7.988" },
    { 0.0, TF_MEASURE_TAIL_PROBABILITY, "0" },
    { NAN, TF_MEASURE_BAYES_FACTOR, "not defined" },
    { INFINITY, TF_MEASURE_BAYES_FACTOR, "not defined" },
    { 9.99999e-5, TF_MEASURE_TAIL_PROBABILITY, "1.000 × 10⁻⁴" },
    { 2.5e12, TF_MEASURE_BAYES_FACTOR, "2.500 × 10¹²" },
    { -3.25e-7, TF_MEASURE_STATISTIC, "-3.250 × 10⁻⁷" },
  };

  for (guint i = 0; i < G_N_ELEMENTS (cases); i++)
    {
      g_autofree char *s = tf_format_value (cases[i].v, cases[i].m);
      g_assert_cmpstr (s, ==, cases[i].want);
    }
}

static gboolean
is_limit (const char *id)
{
  return g_str_has_suffix (id, "_low") || g_str_has_suffix (id, "_high");
}

/* One analysis of each design (invented data, for the display only). */
static const char *const design_files[] = {
  "[Analysis]\nFormat=1\nDesign=one-proportion\n[Data]\nSuccesses=7\nTrials=19\n"
  "[Null]\nValue=0.25\n",
  "[Analysis]\nFormat=1\nDesign=two-proportions\n[Data]\nSuccessesA=3\nTrialsA=11\n"
  "SuccessesB=1\nTrialsB=9\n",
  "[Analysis]\nFormat=1\nDesign=one-mean\n[Data]\nN=12\nMean=-0.25\nSD=3.5\n[Null]\nValue=1\n",
  "[Analysis]\nFormat=1\nDesign=paired-means\n[Data]\nN=30\nMeanDiff=0.75\nSDDiff=1.25\n",
  "[Analysis]\nFormat=1\nDesign=two-means\n[Data]\nNA=6\nMeanA=1\nSDA=2\nNB=8\nMeanB=2.5\n"
  "SDB=0.75\n",
  "[Analysis]\nFormat=1\nDesign=one-rate\n[Data]\nEvents=3\nExposure=120.5\n"
  "[Null]\nValue=0.01\n",
  "[Analysis]\nFormat=1\nDesign=two-rates\n[Data]\nEventsA=4\nExposureA=10\nEventsB=9\n"
  "ExposureB=12.25\n",
};

/* Every interval's limits carry a method or what they are of, both limits the same;
 * other numbers carry neither; the JSON carries none of it. */
static void
test_interval_methods (void)
{
  for (guint f = 0; f < G_N_ELEMENTS (design_files); f++)
    {
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();
      g_autoptr (TfAnalysis) analysis = load_string (design_files[f], problems);
      g_autoptr (TfResults) results = tf_analysis_compute (analysis, problems);
      const char *name = tf_design_to_string (analysis->design);
      g_autofree char *json = NULL;

      g_assert_nonnull (results);
      json = tf_results_to_json (name, NULL, results, NULL);
      g_assert_null (strstr (json, "method"));
      for (guint i = 0; i < results->numbers->len; i++)
        {
          const TfNumber *number = g_ptr_array_index (results->numbers, i);

          g_test_message ("%s %s", name, number->id);
          if (!is_limit (number->id))
            {
              g_assert_null (number->method);
              g_assert_null (number->of);
              continue;
            }
          g_assert_true (number->method != NULL || number->of != NULL);
          if (g_str_has_suffix (number->id, "_low"))
            {
              g_autofree char *stem = g_strndup (number->id, strlen (number->id) - 4);
              g_autofree char *high_id = g_strconcat (stem, "_high", NULL);
              const TfNumber *high = tf_results_lookup (results, high_id);

              g_assert_nonnull (high);
              g_assert_cmpstr (high->method, ==, number->method);
              g_assert_cmpstr (high->of, ==, number->of);
            }
        }
    }
  {
    g_autoptr (GPtrArray) problems = tf_problem_list_new ();
    g_autoptr (TfAnalysis) analysis = load_string (design_files[1], problems);
    g_autoptr (TfResults) results = tf_analysis_compute (analysis, problems);

    /* Woolf's interval for the odds ratio (common practice naming) */
    g_assert_cmpstr (tf_results_lookup (results, "or_ci_low")->method, ==, "Woolf");
    g_assert_cmpstr (tf_results_lookup (results, "or_ci_high")->of, ==, "the odds ratio");
    g_assert_cmpstr (tf_results_lookup (results, "cri_low")->method, ==, "equal-tailed");
  }
}

/* Each design's form has a field for each of its [Data] keys, in TfAnalysis. */
static void
test_form_fields_cover_data (void)
{
  for (guint d = 0; d < TF_N_DESIGNS; d++)
    {
      const TfDesignClass *klass = tf_design_class ((TfDesign) d);
      g_autoptr (GPtrArray) keys = g_ptr_array_new ();

      g_assert_nonnull (klass);
      g_assert_cmpuint (klass->n_fields, >, 0);
      for (guint i = 0; i < klass->n_numbers; i++)
        g_ptr_array_add (keys, (gpointer) klass->numbers[i].key);
      for (guint i = 0; i < klass->n_samples; i++)
        {
          g_ptr_array_add (keys, (gpointer) klass->samples[i].values_key);
          for (guint k = 0; k < 3; k++)
            g_ptr_array_add (keys, (gpointer) klass->samples[i].summary_keys[k]);
        }
      for (guint k = 0; k < keys->len; k++)
        {
          gboolean found = FALSE;

          for (guint i = 0; i < klass->n_fields; i++)
            found = found || (g_str_equal (klass->fields[i].group, "Data")
                              && g_str_equal (klass->fields[i].key, g_ptr_array_index (keys, k)));
          g_test_message ("%s %s", klass->name, (const char *) g_ptr_array_index (keys, k));
          g_assert_true (found);
        }
      for (guint i = 0; i < klass->n_fields; i++)
        {
          g_assert_cmpuint (klass->fields[i].offset, <, sizeof (TfAnalysis));
          g_assert_true ((klass->fields[i].kind == TF_FIELD_CHOICE)
                         == (klass->fields[i].choices != NULL));
        }
    }
}

int
main (int argc, char **argv)
{
  setlocale (LC_ALL, "C.UTF-8");
  tf_check_init (&argc, &argv);
  g_test_add_func ("/analysis-file/load-fields", test_load_fields);
  g_test_add_func ("/analysis-file/round-trip-keeps-unknown-keys", test_round_trip_keeps_unknown_keys);
  g_test_add_func ("/analysis-file/save-failure-leaves-nothing", test_save_failure_leaves_nothing);
  g_test_add_func ("/analysis-file/numbers-round-trip", test_numbers_round_trip);
  g_test_add_func ("/analysis-file/every-design-round-trip", test_every_design_round_trip);
  g_test_add_func ("/analysis-file/locale-independent", test_locale_independent);
  g_test_add_func ("/analysis-file/bad-values-named", test_bad_values_named);
  g_test_add_func ("/analysis-file/not-an-analysis", test_not_an_analysis);
  g_test_add_func ("/analysis-file/demos-load", test_demos_load);
  g_test_add_func ("/results/format-value", test_format_value);
  g_test_add_func ("/results/interval-methods", test_interval_methods);
  g_test_add_func ("/designs/form-fields-cover-data", test_form_fields_cover_data);
  return g_test_run ();
}
