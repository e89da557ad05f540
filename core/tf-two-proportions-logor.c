/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-two-proportions-logor.c: a second Bayes factor for two proportions, from a normal
 * prior on the log odds ratio ψ = ln[θA(1 − θB) / (θB(1 − θA))].
 *
 * Model: given the margins, kA has Fisher's noncentral hypergeometric distribution
 * with odds ratio e^ψ (Fisher 1935; the conditional likelihood, free of the nuisance
 * parameter). H0: ψ = 0; H1: ψ ~ N(0, σ²), σ = [Alternative] PriorScale. Then
 * BF10 = ∫ e^{ψ kA} / E0[e^{ψ X}] φ(ψ; 0, σ²) dψ, E0 under the central hypergeometric,
 * by GSL's QAG (Piessens et al. 1983) over pieces around the normal approximation of
 * the posterior of ψ; E0[e^{ψ X}] is summed outward from its largest term with the
 * ratio recurrence, stopped at 1e-17 relative.
 */
#include "tf-two-proportions-private.h"
#include "tf-fisher.h"
#include "tf-logspace.h"

#include <math.h>
#include <glib/gi18n-lib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_integration.h>

/* Beyond this the sums over outcomes get too long for one analysis. */
#define TF_LOGOR_MAX_SD 2e3

typedef struct {
  TfHyper h;
  double ka, sd, ref;
} LogOr;

/* ln E0[e^{ψ X}] */
static double
log_mgf (const TfHyper *h, double psi)
{
  const double na = h->n_a, nb = h->n_b, m = h->m, w = exp (psi);
  double lo = h->lo, hi = h->hi;

  if (h->lo == h->hi)
    return psi * h->lo;
  /* the largest term: the smallest u with ratio(u) = P(u+1)/P(u) · e^ψ < 1 */
  while (lo < hi)
    {
      double mid = floor (lo + (hi - lo) / 2.0);
      double r = (na - mid) * (m - mid) * w / ((mid + 1.0) * (nb - m + mid + 1.0));
      if (r < 1.0)
        hi = mid;
      else
        lo = mid + 1.0;
    }
  double u0 = lo, s = 1.0, t = 1.0;
  for (double j = u0; j < h->hi; j += 1.0)
    {
      t *= (na - j) * (m - j) * w / ((j + 1.0) * (nb - m + j + 1.0));
      s += t;
      if (t < 1e-17 * s)
        break;
    }
  t = 1.0;
  for (double j = u0; j > h->lo; j -= 1.0)
    {
      t *= j * (nb - m + j) / ((na - j + 1.0) * (m - j + 1.0) * w);
      s += t;
      if (t < 1e-17 * s)
        break;
    }
  return tf_hyper_log_pmf (h, u0) + psi * u0 + log (s);
}

static double
log_integrand (const LogOr *lo, double psi)
{
  double z = psi / lo->sd;
  return psi * lo->ka - log_mgf (&lo->h, psi) - 0.5 * z * z - log (lo->sd) - 0.918938533204672741780329736406;
}

static double
integrand (double psi, void *data)
{
  const LogOr *lo = data;
  return exp (log_integrand (lo, psi) - lo->ref);
}

double
tf_two_proportions_log_or_bf01 (double ka, double na, double kb, double nb, double sd,
                                const char **why)
{
  LogOr lo;
  static const double steps[] = { -40, -20, -10, -5, -2, 0, 2, 5, 10, 20, 40 };
  const guint ns = G_N_ELEMENTS (steps);

  if (!(isfinite (sd) && sd > 0.0))
    {
      *why = _("the normal prior on the log odds ratio needs a PriorScale above 0");
      return NAN;
    }
  tf_hyper_init (&lo.h, na, nb, ka + kb);
  if (lo.h.lo == lo.h.hi)
    return 0.0;               /* a margin is 0: the data say nothing about ψ */
  if (lo.h.sd > TF_LOGOR_MAX_SD)
    {
      *why = _("the margins are too large for the conditional likelihood to be summed outcome by outcome");
      return NAN;
    }
  lo.ka = ka;
  lo.sd = sd;
  /* normal approximation: Woolf's estimate with 0.5 in every cell, and the prior */
  double c0 = ka + 0.5, c1 = na - ka + 0.5, c2 = kb + 0.5, c3 = nb - kb + 0.5;
  double est = log (c0) + log (c3) - log (c1) - log (c2);
  double v = 1.0 / c0 + 1.0 / c1 + 1.0 / c2 + 1.0 / c3;
  double tau = sqrt (1.0 / (1.0 / v + 1.0 / (sd * sd)));
  double mu = est * (sd * sd) / (sd * sd + v);

  double edges[G_N_ELEMENTS (steps)];
  lo.ref = -INFINITY;
  for (guint i = 0; i < ns; i++)
    {
      edges[i] = CLAMP (mu + steps[i] * tau, -700.0, 700.0);
      lo.ref = MAX (lo.ref, log_integrand (&lo, edges[i]));
    }
  gsl_integration_workspace *ws = gsl_integration_workspace_alloc (100);
  gsl_function f = { integrand, &lo };
  double total = 0.0;
  gboolean ok = TRUE;
  for (guint i = 0; i + 1 < ns; i++)
    {
      double r, e;
      if (!(edges[i + 1] > edges[i]))
        continue;
      int status = gsl_integration_qag (&f, edges[i], edges[i + 1], 0.0, 1e-10, 100,
                                        GSL_INTEG_GAUSS21, ws, &r, &e);
      if (status != GSL_SUCCESS && !(e <= 1e-8 * (total + fabs (r))))
        ok = FALSE;
      total += r;
    }
  gsl_integration_workspace_free (ws);
  if (!ok || !(total > 0.0))
    {
      *why = _("the integral over the log odds ratio did not converge");
      return NAN;
    }
  return -(lo.ref + log (total));
}

void
tf_two_proportions_add_log_or_bf (const TfAnalysis *analysis, TfResults *results)
{
  const char *why = NULL;
  const char *label = _("BF01, normal prior on the log odds ratio (SD = PriorScale, two-sided)");
  double l = tf_two_proportions_log_or_bf01 (analysis->successes_a, analysis->trials_a,
                                             analysis->successes_b, analysis->trials_b,
                                             analysis->prior_scale, &why);
  if (isfinite (l))
    tf_results_add (results, "bf01_log_or_normal", label, TF_MEASURE_BAYES_FACTOR, exp (l));
  else
    tf_results_add_undefined (results, "bf01_log_or_normal", label, TF_MEASURE_BAYES_FACTOR,
                              why ? why : _("the Bayes factor cannot be represented"));
}
