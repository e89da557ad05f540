/* SPDX-License-Identifier: GPL-3.0-or-later
 * bench-means.c: medians of one JZS Bayes factor (t = 2.5, n = 30, r = √2/2, relative
 * accuracy 1e-9 or better: the cross-check measures 1e-12), of a 256-point sensitivity
 * curve against r, and of scipy's quad on the same integrand in the same run (when
 * /usr/bin/python3 has scipy), and of one one-sided JZS Bayes factor at n = 10^8,
 * t = 10^3, and of the posterior of δ (its table, limits, HDI and P(δ > 0)) at the sleep
 * data and at that extreme. Targets: JZS under 1.5 µs, 100× faster than scipy; the curve
 * under 0.5 ms; the one-sided extreme well under 1 ms; the posterior under 1 ms.
 */
#include <stdio.h>
#include <stdlib.h>
#include <math.h>
#include <gsl/gsl_errno.h>

#include "tf-design.h"
#include "tf-analysis.h"
#include "tf-curves.h"
#include "tf-jzs.h"
#include "tf-means.h"

static int
cmp (const void *a, const void *b)
{
  double x = *(const double *) a, y = *(const double *) b;
  return (x > y) - (x < y);
}

static double
median (double *v, guint n)
{
  qsort (v, n, sizeof (double), cmp);
  return v[n / 2];
}

static double
scipy_quad_us (void)
{
  const char *cmd =
    "/usr/bin/python3 -c \""
    "import math,time\n"
    "from scipy.integrate import quad\n"
    "t,n,nu,r=2.5,30.0,29.0,math.sqrt(0.5)\n"
    "f=lambda g:(1+n*g)**-0.5*((1+t*t/((1+n*g)*nu))/(1+t*t/nu))**(-(nu+1)/2)*r/math.sqrt(2*math.pi)*g**-1.5*math.exp(-r*r/(2*g))\n"
    "ts=[]\n"
    "for i in range(200):\n"
    "  s=time.perf_counter(); quad(f,0,math.inf,epsrel=1e-9); ts.append(time.perf_counter()-s)\n"
    "ts.sort(); print(ts[100]*1e6)\" 2>/dev/null";
  FILE *p = popen (cmd, "r");
  double us = NAN;
  if (p == NULL)
    return NAN;
  if (fscanf (p, "%lf", &us) != 1)
    us = NAN;
  pclose (p);
  return us;
}

int
main (void)
{
  enum { REPS = 51, INNER = 2000 };
  double times[REPS];
  volatile double sink = 0.0;

  gsl_set_error_handler_off ();
  for (guint k = 0; k < REPS; k++)
    {
      gint64 t0 = g_get_monotonic_time ();
      for (guint i = 0; i < INNER; i++)
        sink += tf_jzs_log_bf10 (2.5 + 1e-9 * i, 30.0, 29.0, M_SQRT1_2);
      times[k] = (double) (g_get_monotonic_time () - t0) / INNER;
    }
  double jzs_us = median (times, REPS);

  g_autoptr (TfAnalysis) a = tf_analysis_new (TF_DESIGN_ONE_MEAN);
  a->n = 30; a->mean = 2.5 / sqrt (30.0); a->sd = 1.0;
  for (guint k = 0; k < REPS; k++)
    {
      gint64 t0 = g_get_monotonic_time ();
      TfEvidenceCurve *c = tf_sensitivity_curve_new (a, 256, NULL, NULL);
      times[k] = (double) (g_get_monotonic_time () - t0) / 1000.0;
      sink += c ? c->log_bf01[0] : 0.0;
      tf_evidence_curve_free (c);
    }
  double curve_ms = median (times, REPS);
  for (guint k = 0; k < REPS; k++)
    {
      gint64 t0 = g_get_monotonic_time ();
      sink += tf_jzs_log_bf_one_sided (1e3, 1e8, 1e8 - 1.0, M_SQRT1_2, k % 2 ? 1 : -1);
      times[k] = (double) (g_get_monotonic_time () - t0);
    }
  double side_us = median (times, REPS);
  /* the posterior of δ: the table, both limits, the HDI and P(δ > 0), at the sleep data
   * and at n = 10^8, t = 10^3 */
  const double post_cases[2][3] = { { 4.062127683382037, 10.0, 9.0 }, { 1e3, 1e8, 1e8 - 1.0 } };
  double post_us[2];
  for (guint c = 0; c < 2; c++)
    {
      TfDeltaPrior prior = { .prior = TF_PRIOR_CAUCHY, .r = M_SQRT1_2 };
      for (guint k = 0; k < REPS; k++)
        {
          double lo, hi;
          gint64 t0 = g_get_monotonic_time ();
          TfDeltaPosterior *post = tf_delta_posterior_new (&prior, post_cases[c][0],
                                                           post_cases[c][1], post_cases[c][2]);
          sink += tf_delta_posterior_quantile (post, 0.025, -INFINITY, INFINITY)
                  + tf_delta_posterior_quantile (post, 0.975, -INFINITY, INFINITY);
          tf_delta_posterior_hdi (post, 0.95, -INFINITY, INFINITY, &lo, &hi);
          sink += lo + hi + tf_delta_posterior_log_mass (post, 0.0, INFINITY);
          tf_delta_posterior_free (post);
          times[k] = (double) (g_get_monotonic_time () - t0);
        }
      post_us[c] = median (times, REPS);
    }
  double scipy_us = scipy_quad_us ();

  printf ("JZS BF10, one value: median %.3f us (target < 1.5 us)\n", jzs_us);
  printf ("sensitivity curve, 256 points: median %.3f ms (target < 0.5 ms)\n", curve_ms);
  printf ("one-sided JZS BF, n = 1e8, t = 1e3: median %.1f us (target well under 1 ms)\n", side_us);
  printf ("posterior of delta (table, limits, HDI, P(d > 0)), sleep data: median %.0f us; "
          "n = 1e8, t = 1e3: median %.0f us (target < 1 ms)\n", post_us[0], post_us[1]);
  if (isfinite (scipy_us))
    printf ("scipy.integrate.quad, same integrand: median %.1f us; ratio %.0fx (target >= 100x)\n",
            scipy_us, scipy_us / jzs_us);
  else
    printf ("scipy not available: ratio not measured\n");
  (void) sink;
  return 0;
}
