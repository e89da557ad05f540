/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-crosscheck-driver.c: the cross-check driver. `tf-crosscheck-driver AREA` reads
 * cases of AREA (one-proportion, means, rates, two-proportions) on stdin and prints
 * Twofold's values for them; the cases of each area are listed at the top of its file,
 * tf-crosscheck-driver-AREA.c.
 */
#include <stdio.h>
#include <string.h>
#include <gsl/gsl_errno.h>

#include "tf-crosscheck-driver.h"

static const TfCrossArea *const areas[] = {
  &tf_cross_one_proportion, &tf_cross_means, &tf_cross_rates, &tf_cross_two_proportions,
};

void
tf_cross_print_values (const double *values, gsize n)
{
  for (gsize i = 0; i < n; i++)
    printf (i + 1 < n ? "%.17g " : "%.17g\n", values[i]);
}

static const TfCrossArea *
find_area (const char *name)
{
  for (gsize i = 0; i < G_N_ELEMENTS (areas); i++)
    if (strcmp (areas[i]->name, name) == 0)
      return areas[i];
  return NULL;
}

static const TfCrossCase *
find_case (const TfCrossArea *area, const char *name)
{
  for (gsize i = 0; i < area->n_cases; i++)
    if (strcmp (area->cases[i].name, name) == 0)
      return &area->cases[i];
  return NULL;
}

/* One case line: its values, or "nan" for an unknown kind or too few numbers. */
static void
run_line (const TfCrossArea *area, const char *line)
{
  char what[32];
  double v[TF_CROSS_MAX_ARGS] = { 0 };
  const TfCrossCase *kind;
  int got = sscanf (line, "%31s %lf %lf %lf %lf %lf %lf %lf", what, &v[0], &v[1], &v[2],
                    &v[3], &v[4], &v[5], &v[6]);

  kind = got >= 1 ? find_case (area, what) : NULL;
  if (kind == NULL || got - 1 < kind->n_args)
    printf ("nan\n");
  else
    kind->run (v);
}

int
main (int argc, char *argv[])
{
  const TfCrossArea *area = argc == 2 ? find_area (argv[1]) : NULL;
  char line[512];

  if (area == NULL)
    {
      fprintf (stderr, "usage: %s one-proportion|means|rates|two-proportions < CASES\n",
               argv[0]);
      return 2;
    }
  gsl_set_error_handler_off ();
  while (fgets (line, sizeof line, stdin) != NULL)
    run_line (area, line);
  return 0;
}
