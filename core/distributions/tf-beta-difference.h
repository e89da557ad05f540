/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-beta-difference.h: the distribution of Δ = θA − θB for independent
 * θA ~ Beta(pa, qa) and θB ~ Beta(pb, qb), by one-dimensional integration.
 */
#pragma once

#include <glib.h>

G_BEGIN_DECLS

#define TF_BETA_DIFF_N_CUTS 24

typedef struct {
  double pa, qa, pb, qb;
  gboolean over_a;              /* integrate over θA (the narrower) rather than θB */
  double mean, sd;              /* of Δ */
  double epsrel;                /* relative tolerance of the integrals, 1e-10 unless set */
  gboolean pieces_only;         /* TF_BETA_DIFF_PIECES is set: the adaptive rule only */
  /* For the slower, robust integration only, filled on its first use: quantiles of the
   * integration variable at fixed tail levels, and ln of the mass of the integration
   * variable's distribution between successive ones. */
  gboolean have_cuts;
  guint n_cuts;
  double cut[TF_BETA_DIFF_N_CUTS];
  double cut_y[TF_BETA_DIFF_N_CUTS];   /* 1 − cut, accurate near 1 */
  double log_tail[TF_BETA_DIFF_N_CUTS]; /* ln P(V <= cut) or ln P(V >= cut) */
  gboolean cut_lower[TF_BETA_DIFF_N_CUTS];
} TfBetaDiff;

void tf_beta_diff_init (TfBetaDiff *bd, double pa, double qa, double pb, double qb);

/* ln P(Δ <= d) and ln P(Δ >= d); FALSE when the integration failed. */
gboolean tf_beta_diff_log_cdf (TfBetaDiff *bd, double d, double *log_lower,
                               double *log_upper);
/* ln of the density of Δ at d, d in (−1, 1); NAN on failure. */
double tf_beta_diff_log_density (TfBetaDiff *bd, double d);
/* The d with ln P(Δ <= d) = log_p (lower) or ln P(Δ >= d) = log_p; NAN on failure. */
double tf_beta_diff_quantile_log (TfBetaDiff *bd, double log_p, gboolean lower);

/* ln of the density of Δ at the n points d_i = (L + i) / S, S >= 1 (a figure grid),
 * by one discrete convolution (tf-beta-difference-grid.c): out[i] NAN at the points it
 * cannot do (left to tf_beta_diff_log_density), +inf where the density is infinite
 * (d = 0 with both lower or both upper shapes adding up to 1 or less); FALSE when it
 * does none. */
gboolean tf_beta_diff_log_density_grid (const TfBetaDiff *bd, gint64 S, gint64 L, guint n,
                                        double *out);

G_END_DECLS
