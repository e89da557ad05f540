/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-design-class.h: what a design is. Each design fills one TfDesignClass in its own
 * file (core/designs/<family>/); the registry (tf-design.c) lists them. Everything that
 * differs between designs is here: its names, its words, its [Data] keys, its defaults,
 * its checks, its numbers and its curves. Nothing outside core/designs switches on a
 * design.
 *
 * A NULL hook means "this design does not provide it"; callers say so. New kinds of work
 * on every design (a walk-through's steps, study planning, importing data) add their
 * hooks here, and each class fills them in its own file.
 */
#pragma once

#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-form-field.h"
#include "tf-results.h"

G_BEGIN_DECLS

/* In a class's initialiser: a table and its length, e.g. TF_DESIGN_TABLE (numbers, numbers). */
#define TF_DESIGN_TABLE(member, table) .member = (table), .n_##member = G_N_ELEMENTS (table)

/* A required number of [Data], held in the double at offset in TfAnalysis. */
typedef struct {
  const char *key;
  glong offset;
} TfDataNumber;

/* A sample of [Data] given by its values (values_key), or by its size, mean and SD.
 * Paired lists that belong together name a partner: both or neither. */
typedef struct {
  const char *values_key;
  glong values_offset;
  const char *partner_key;
  glong partner_offset;
  const char *summary_keys[3];
  glong summary_offsets[3];
} TfDataSample;

/* An interval a design reports, as the limits "<stem>_low" and "<stem>_high": its
 * published method and what it is of, when that is not the design's own parameter. */
typedef struct {
  const char *stem;
  const char *method;           /* N_(): "Wilson"; NULL: none, or method_of gives it */
  const char *of;               /* N_(): "the odds ratio"; NULL: the design's parameter */
} TfIntervalMethod;

typedef struct {
  TfDesign design;
  const char *name;             /* the file's word: "one-proportion" */
  const char *label;            /* for people, untranslated (N_): "One proportion" */

  /* Words (core/text reads them; nothing there names a design) */
  /* What the estimate and the confidence interval are about (N_): "the proportion θ". */
  const char *estimand;
  /* What the prior and the credible interval are about when that is not the estimand
   * (N_): "the standardised effect δ"; NULL: the estimand. */
  const char *parameter;
  /* The parameter in the null "%s = 0.5": a symbol ("θ", "μA − μB", "λA/λB") or words
   * marked N_ ("the mean difference"); read through gettext. */
  const char *symbol;
  /* The parameter an interval null is on, when not symbol ("δ"); NULL: symbol. */
  const char *interval_symbol;
  /* The point null 0 ("no difference") in words of its own: "θA = θB"; NULL: "symbol = 0". */
  const char *no_difference;
  /* One prior on each group's parameter, not on their difference or ratio: "θA and θB". */
  const char *group_parameters;
  /* The data in one sentence, translated: "The data: 9700 successes in 12000 trials." */
  char *(*data_words) (const TfAnalysis *analysis);
  /* A sentence added to what the Bayes factor does not say, translated; NULL: none. */
  const char *(*bayes_factor_note) (const TfAnalysis *analysis);
  /* When the readings disagree: appends the design's own conditions that make them (each
   * sentence after a space) and returns how many hold. NULL: the design names none. */
  guint (*disagreement_conditions) (const TfAnalysis *analysis, GString *text);
  /* Said last when none of those conditions holds (N_); NULL: nothing. */
  const char *no_condition_words;

  /* [Data] */
  const TfDataNumber *numbers;
  guint n_numbers;
  const TfDataSample *samples;
  guint n_samples;
  gboolean known_sd;            /* takes [Data] KnownSD */
  gboolean equal_variances;     /* takes [Data] EqualVariances */
  /* [Null] Value is required (one-sample designs); else the default is "no difference" */
  gboolean null_value_required;
  gboolean model_set;           /* takes [Models] Set and Priors */
  gboolean beta_with_scale;     /* a beta prior also writes PriorScale (a second prior) */

  /* The form and the numbers' methods (widgets read them; none names a design) */
  const TfFormField *fields;    /* the form's fields in order; with samples, each field
                                 * shows with the summaries, the raw values or both */
  guint n_fields;
  const TfIntervalMethod *intervals;    /* its own intervals; cri and hdi are everyone's */
  guint n_intervals;
  const char *credible_of;      /* N_(): what cri and hdi are of, when not the parameter */
  /* The translated method of number id when it depends on the analysis ("t" or "z"),
   * else NULL (then the intervals' table says); may be NULL. */
  const char *(*method_of) (const TfAnalysis *analysis, const char *id);

  /* Sets the design's own defaults on an analysis that has the shared ones. */
  void (*defaults) (TfAnalysis *analysis);
  /* When raw values are present, computes the summaries from them; may be NULL. */
  void (*summarise) (TfAnalysis *analysis);
  /* Appends a problem per field that is wrong (design fields only; the fields every
   * design shares are checked by tf_analysis_validate_shared()). */
  void (*validate) (const TfAnalysis *analysis, GPtrArray *problems);
  /* The analysis is valid. Adds every number, in reporting order. */
  void (*compute) (const TfAnalysis *analysis, TfResults *results);
  /* The analysis is valid; the arrays are allocated with curves->n points. */
  void (*densities) (const TfAnalysis *analysis, TfDensityCurves *curves);
  /* The analysis is valid; the arrays are allocated with curve->n points. Return FALSE
   * and set *why_not (translated, one sentence) when the curve does not apply. */
  gboolean (*sensitivity) (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not);
  gboolean (*sample_size) (const TfAnalysis *analysis, TfEvidenceCurve *curve, char **why_not);
  gboolean (*null_distribution) (const TfAnalysis *analysis, TfNullDistribution *dist,
                                 char **why_not);
  gboolean (*model_probabilities) (const TfAnalysis *analysis, TfModelProbabilities *models,
                                   char **why_not);
} TfDesignClass;

G_END_DECLS
