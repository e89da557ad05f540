/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-figures.h: helpers shared by the figure tests.
 */
#pragma once

#include <cairo.h>
#include "tf-figure-theme.h"
#include "tf-analysis.h"
#include "test-pixels.h"
/* The largest channel difference between a pixel and a colour over a background (alpha
 * composited). */
double test_colour_distance (const double rgb[3], const TfColour *colour, const TfColour *over);
/* Smallest distance to colour within radius pixels of x, y. */
double test_nearest_colour (cairo_surface_t *surface, int x, int y, int radius,
                            const TfColour *colour, const TfColour *over);
/* TRUE when every pixel within edge pixels of the border is the background: nothing is
 * clipped at the figure's edge. */
gboolean test_edges_blank (cairo_surface_t *surface, int edge, const TfColour *background);
/* Writes the surface to $TF_FIGURE_TEST_DIR/name.png when that is set (to look at). */
void test_keep_png (cairo_surface_t *surface, const char *name);

/* Ordinary data for each design, invented for the tests. */
TfAnalysis *test_design_analysis (TfDesign design);

void test_add_real_cases (void);
void test_add_mark_cases (void);
