/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-explanation-pane.h: the side pane saying what each number reports and what it does
 * not say, with the live numbers in the words.
 */
#pragma once

#include <gtk/gtk.h>
#include "tf-analysis.h"
#include "tf-results.h"

G_BEGIN_DECLS

#define TF_TYPE_EXPLANATION_PANE (tf_explanation_pane_get_type ())
G_DECLARE_FINAL_TYPE (TfExplanationPane, tf_explanation_pane, TF, EXPLANATION_PANE, GtkWidget)

GtkWidget *tf_explanation_pane_new (void);

/* Shows tf_explain (analysis, results). */
void tf_explanation_pane_set_results (TfExplanationPane *self, const TfAnalysis *analysis,
                                      const TfResults *results);
/* Removes the explanations and says why (plain text). */
void tf_explanation_pane_clear (TfExplanationPane *self, const char *message);

guint tf_explanation_pane_get_n_explanations (TfExplanationPane *self);

G_END_DECLS
