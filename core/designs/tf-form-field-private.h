/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-form-field-private.h: shorthands for the field tables of the class files. The rows
 * every design shares (direction, priors, prior probability of the null, level) are
 * written once here; a design gives only its own words.
 */
#pragma once

#include <glib/gi18n-lib.h>
#include "tf-analysis.h"
#include "tf-form-field.h"

G_BEGIN_DECLS

extern const int tf_form_direction_values[];      /* two-sided, greater, less */
extern const char *const tf_form_effect_prior_labels[];
extern const int tf_form_effect_prior_values[];

#define FORM_OFF(member) G_STRUCT_OFFSET (TfAnalysis, member)

#define FORM_FIELD(grp, k, lab, hnt, kd, sec, shw, pr, member) \
  { .group = grp, .key = k, .label = lab, .hint = hnt, .kind = kd, .section = sec, \
    .shown = shw, .pair = pr, .offset = FORM_OFF (member) }
/* A [Data] field; pr: it shares its row with the next field. */
#define FORM_DATA(k, lab, hnt, kd, shw, pr, member) \
  FORM_FIELD ("Data", k, lab, hnt, kd, TF_SECTION_DATA, shw, pr, member)
#define FORM_NULL_VALUE(lab, hnt, kd) \
  FORM_FIELD ("Null", "Value", lab, hnt, kd, TF_SECTION_NULL, TF_SHOWN_ALWAYS, FALSE, \
              null_value)
/* labels: the three directions in words of the design, NULL-terminated. */
#define FORM_DIRECTION(labels) \
  { .group = "Alternative", .key = "Direction", .label = N_("_Direction"), \
    .hint = N_("Where the alternative puts the effect"), .kind = TF_FIELD_CHOICE, \
    .section = TF_SECTION_ALTERNATIVE, .choices = labels, \
    .choice_values = tf_form_direction_values }
#define FORM_ALT(k, lab, hnt, pr, member) \
  FORM_FIELD ("Alternative", k, lab, hnt, TF_FIELD_POSITIVE, TF_SECTION_ALTERNATIVE, \
              TF_SHOWN_ALWAYS, pr, member)
#define FORM_MODELS_AND_OPTIONS \
  FORM_FIELD ("Models", "PriorNull", N_("_Prior probability of the null"), \
              N_("Before the data; 0.5 gives both models equal odds"), TF_FIELD_PROBABILITY, \
              TF_SECTION_MODELS, TF_SHOWN_ALWAYS, FALSE, prior_null), \
  FORM_FIELD ("Options", "Level", N_("_Level"), N_("Of the confidence and credible intervals"), \
              TF_FIELD_PROBABILITY, TF_SECTION_OPTIONS, TF_SHOWN_ALWAYS, FALSE, level)
#define FORM_BETA_PRIOR(hnt) \
  FORM_ALT ("PriorA", N_("Prior shape _a"), hnt, TRUE, prior_a), \
  FORM_ALT ("PriorB", N_("Prior shape _b"), N_("a = b = 1 is uniform"), FALSE, prior_b)
#define FORM_GAMMA_PRIOR(hnt) \
  FORM_ALT ("PriorShape", N_("Prior _shape"), hnt, TRUE, prior_shape), \
  FORM_ALT ("PriorRate", N_("Prior _rate"), N_("Its mean is shape ÷ rate"), FALSE, prior_rate)
#define FORM_EFFECT_PRIOR \
  { .group = "Alternative", .key = "Prior", .label = N_("Effect _prior"), \
    .hint = N_("Of the standardised effect δ under H₁"), .kind = TF_FIELD_CHOICE, \
    .section = TF_SECTION_ALTERNATIVE, .choices = tf_form_effect_prior_labels, \
    .choice_values = tf_form_effect_prior_values }, \
  FORM_ALT ("PriorScale", N_("Prior _scale r"), N_("A larger r expects larger effects"), \
            FALSE, prior_scale)

G_END_DECLS
