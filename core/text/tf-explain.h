/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-explain.h: plain words on what each number measures and what it does not,
 * with the live numbers in them. Used by the side pane and by reports.
 */
#pragma once

#include <glib.h>
#include "tf-design.h"
#include "tf-results.h"

G_BEGIN_DECLS

typedef struct {
  char *title;                  /* "The p-value" */
  char *measures;               /* what it reports, with the numbers */
  char *does_not;               /* what it does not say */
} TfExplanation;

void tf_explanation_free (TfExplanation *explanation);
G_DEFINE_AUTOPTR_CLEANUP_FUNC (TfExplanation, tf_explanation_free)

/* One explanation per kind of number in results, in reading order. */
GPtrArray *tf_explain (const TfAnalysis *analysis, const TfResults *results);

/* The caution that the About window, README and every report carry. */
const char *tf_caution_text (void);

G_END_DECLS
