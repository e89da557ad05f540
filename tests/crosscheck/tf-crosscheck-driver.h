/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-crosscheck-driver.h: what the cross-check driver's subcommands share. Each area
 * (one proportion, means, rates, two proportions) is a table of case kinds; the driver
 * reads cases on stdin, one a line ("name x1 x2 ..."), and prints each case's values on
 * one line with 17 significant digits, for the area's script to compare with scipy and
 * mpmath. A line of an unknown kind, or with fewer numbers than its kind takes, prints
 * "nan".
 */
#pragma once

#include <glib.h>

/* The most numbers a case line carries after its name. */
#define TF_CROSS_MAX_ARGS 7

/* One kind of case: its name on the line, how many numbers follow it, and what prints
 * its values from them. */
typedef struct {
  const char *name;
  int n_args;
  void (*run) (const double *v);
} TfCrossCase;

/* A subcommand: the kinds of case of one area. */
typedef struct {
  const char *name;
  const TfCrossCase *cases;
  gsize n_cases;
} TfCrossArea;

#define TF_CROSS_AREA(name, cases) { (name), (cases), G_N_ELEMENTS (cases) }

extern const TfCrossArea tf_cross_one_proportion;
extern const TfCrossArea tf_cross_means;
extern const TfCrossArea tf_cross_rates;
extern const TfCrossArea tf_cross_two_proportions;

/* Prints the n values with 17 significant digits, separated by spaces, then a newline. */
void tf_cross_print_values (const double *values, gsize n);
/* tf_cross_print_values of the arguments, each taken as a double. */
#define TF_CROSS_PRINT(...) \
  tf_cross_print_values ((const double[]) { __VA_ARGS__ }, \
                         sizeof ((const double[]) { __VA_ARGS__ }) / sizeof (double))
