/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-analysis.h: what the user set: design, data, hypotheses, priors, options.
 *
 * A TfAnalysis is plain data. Forms and files fill it in; tf_analysis_validate()
 * lists what is wrong with it, field by field; tf_analysis_compute() turns a valid
 * one into TfResults (both in core/designs/tf-design.h, the registry, since what is
 * valid and what is computed depend on the design). Nothing downstream writes back
 * into it.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

typedef enum {
  TF_DESIGN_ONE_PROPORTION,
  TF_DESIGN_TWO_PROPORTIONS,
  TF_DESIGN_ONE_MEAN,
  TF_DESIGN_PAIRED_MEANS,
  TF_DESIGN_TWO_MEANS,
  TF_DESIGN_ONE_RATE,
  TF_DESIGN_TWO_RATES,
  TF_N_DESIGNS
} TfDesign;

typedef enum { TF_NULL_POINT, TF_NULL_INTERVAL } TfNullKind;

typedef enum {
  TF_DIRECTION_TWO_SIDED,
  TF_DIRECTION_GREATER,
  TF_DIRECTION_LESS
} TfDirection;

typedef enum {
  TF_PRIOR_BETA,
  TF_PRIOR_NORMAL,
  TF_PRIOR_CAUCHY,
  TF_PRIOR_GAMMA
} TfPriorFamily;

/* [Models] Set: the hypotheses of a model set, each with a prior probability (Priors).
 * null: the [Null] hypothesis (a point or an interval); less, greater: the Beta prior
 * truncated below or above the null (θ0, or Low and High); two-sided: the prior on
 * everything but the null. */
typedef enum {
  TF_MODEL_NULL,
  TF_MODEL_LESS,
  TF_MODEL_GREATER,
  TF_MODEL_TWO_SIDED,
  TF_N_MODELS
} TfModel;

/* The file's word for a model ("null", "less", "greater", "two-sided"). */
static inline const char *
tf_model_to_string (TfModel model)
{
  static const char *const words[TF_N_MODELS] = { "null", "less", "greater", "two-sided" };
  return (guint) model < TF_N_MODELS ? words[model] : "";
}

static inline gboolean
tf_model_from_string (const char *s, TfModel *model)
{
  for (int i = 0; i < TF_N_MODELS; i++)
    if (g_strcmp0 (s, tf_model_to_string ((TfModel) i)) == 0)
      {
        *model = (TfModel) i;
        return TRUE;
      }
  return FALSE;
}

/* Counts are held as doubles with integer values: exact up to 2^53, which covers every
 * limit below (TF_ANALYSIS_MAX_TRIALS) with room to spare. */
typedef struct {
  TfDesign design;
  char *title;                  /* may be NULL */

  /* [Data], one proportion */
  double successes;
  double trials;

  /* [Data], two proportions: groups A and B */
  double successes_a, trials_a;
  double successes_b, trials_b;

  /* [Data], means, from summaries: one mean (N, Mean, SD), paired means (N, MeanDiff,
   * SDDiff, held in n, mean, sd), two means (NA, MeanA, SDA, NB, MeanB, SDB). When raw
   * values are given instead (Values, or ValuesA + ValuesB), they are kept here and the
   * summaries are computed from them by tf_analysis_summarise_values(). */
  double n, mean, sd;
  double n_a, mean_a, sd_a;
  double n_b, mean_b, sd_b;
  GArray *values;               /* of double; NULL when summaries were given */
  GArray *values_a, *values_b;
  gboolean has_known_sd;        /* KnownSD: the SD is known (a z test) */
  double known_sd;
  gboolean equal_variances;     /* two means: Student (TRUE) or Welch (FALSE) */

  /* [Data], rates: events over exposure */
  double events, exposure;
  double events_a, exposure_a;
  double events_b, exposure_b;

  /* [Null] */
  TfNullKind null_kind;
  double null_value;
  double null_low, null_high;

  /* [Alternative] */
  TfDirection direction;
  TfPriorFamily prior;
  double prior_a, prior_b;      /* beta shapes */
  double prior_scale;           /* effect prior scale (means) */
  double prior_shape, prior_rate; /* gamma (rates) */

  /* [Models] */
  double prior_null;            /* prior probability of the null model */
  guint n_models;               /* Set: 0 when absent (the null against the alternative) */
  TfModel models[TF_N_MODELS];  /* distinct, in the order of Set */
  double model_priors[TF_N_MODELS]; /* Priors, as written (never renormalised) */

  /* [Options] */
  double level;                 /* confidence and credible level */

  /* The key file this analysis was read from, so that keys Twofold does not know
   * are written back on save. NULL for an analysis made from scratch. */
  GKeyFile *source;
} TfAnalysis;

/* A problem with one field, named as in the analysis file: group and key. */
typedef struct {
  char *group;
  char *key;
  char *message;                /* translated, one sentence, says what is wrong */
} TfProblem;

TfAnalysis *tf_analysis_copy (const TfAnalysis *analysis);
void tf_analysis_free (TfAnalysis *analysis);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfAnalysis, tf_analysis_free)

/* Sets every field to the defaults that every design shares (the design's own come from
 * its class: tf_analysis_reset() in tf-design.h). Keeps the source key file. */
void tf_analysis_reset_shared (TfAnalysis *analysis, TfDesign design);

void tf_analysis_set_title (TfAnalysis *analysis, const char *title);

/* Replaces a list of raw values (takes ownership of values, which may be NULL). */
void tf_analysis_set_values (GArray **slot, GArray *values);

/* n, mean and SD of x[0..n) (Welford 1962, one pass, stable). */
void tf_sample_summarise (const double *x, guint n, double *count, double *mean, double *sd);

/* Appends a problem for each field every design shares that is wrong: PriorNull, Level. */
void tf_analysis_validate_shared (const TfAnalysis *analysis, GPtrArray *problems);

/* The limit on the number of trials validation accepts: Trials, TrialsA and TrialsB
 * are whole numbers from 1 to 10^15 (the rates' event counts are limited alike,
 * TF_RATES_MAX_COUNT; the means designs' sample sizes to 10^12). */
#define TF_ANALYSIS_MAX_TRIALS 1e15

/* The largest beta shape the proportions designs compute to full accuracy. */
#define TF_ANALYSIS_MAX_BETA_SHAPE 1e15
/* For the proportions designs: Prior is beta and PriorA, PriorB lie in (0, 10^15];
 * design_words names the design in the message ("one proportion"). */
void tf_analysis_validate_beta_prior (const TfAnalysis *analysis, const char *design_words,
                                      GPtrArray *problems);

const char *tf_direction_to_string (TfDirection direction);
gboolean tf_direction_from_string (const char *s, TfDirection *direction);
const char *tf_prior_family_to_string (TfPriorFamily family);
gboolean tf_prior_family_from_string (const char *s, TfPriorFamily *family);
const char *tf_null_kind_to_string (TfNullKind kind);
gboolean tf_null_kind_from_string (const char *s, TfNullKind *kind);

TfProblem *tf_problem_new (const char *group, const char *key, const char *format, ...) G_GNUC_PRINTF (3, 4);
void tf_problem_free (TfProblem *problem);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfProblem, tf_problem_free)
GPtrArray *tf_problem_list_new (void);
/* First problem naming this group and key, or NULL. */
const TfProblem *tf_problem_list_find (GPtrArray *problems, const char *group, const char *key);

G_END_DECLS
