/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-figures-common.c: what the figure tests share: reading colours off pixels, the
 * blank edge, keeping a PNG to look at, and ordinary data for each design.
 */
#include <math.h>
#include "tf-design.h"
#include "test-figures.h"

double
test_colour_distance (const double rgb[3], const TfColour *colour, const TfColour *over)
{
  double a = colour->a;
  double r = colour->r * a + over->r * (1 - a);
  double g = colour->g * a + over->g * (1 - a);
  double b = colour->b * a + over->b * (1 - a);

  return MAX (MAX (fabs (rgb[0] - r), fabs (rgb[1] - g)), fabs (rgb[2] - b));
}

double
test_nearest_colour (cairo_surface_t *surface, int x, int y, int radius,
                     const TfColour *colour, const TfColour *over)
{
  int w = cairo_image_surface_get_width (surface), h = cairo_image_surface_get_height (surface);
  double best = 1, rgb[3];

  cairo_surface_flush (surface);
  for (int dy = -radius; dy <= radius; dy++)
    for (int dx = -radius; dx <= radius; dx++)
      {
        test_pixel_at (surface, CLAMP (x + dx, 0, w - 1), CLAMP (y + dy, 0, h - 1), rgb);
        best = MIN (best, test_colour_distance (rgb, colour, over));
      }
  return best;
}

gboolean
test_edges_blank (cairo_surface_t *surface, int edge, const TfColour *background)
{
  int w = cairo_image_surface_get_width (surface), h = cairo_image_surface_get_height (surface);
  double rgb[3];

  cairo_surface_flush (surface);
  for (int y = 0; y < h; y++)
    for (int x = 0; x < w; x++)
      {
        if (x >= edge && x < w - edge && y >= edge && y < h - edge)
          {
            x = w - edge - 1;
            continue;
          }
        test_pixel_at (surface, x, y, rgb);
        if (test_colour_distance (rgb, background, background) > 0.02)
          {
            g_test_message ("ink at the edge: pixel %d, %d", x, y);
            return FALSE;
          }
      }
  return TRUE;
}

void
test_keep_png (cairo_surface_t *surface, const char *name)
{
  const char *dir = g_getenv ("TF_FIGURE_TEST_DIR");

  if (dir)
    {
      g_autofree char *file = g_strdup_printf ("%s/%s.png", dir, name);
      cairo_surface_write_to_png (surface, file);
    }
}

/* Data for each design, invented for the test (sizes and values of the ordinary kind). */
TfAnalysis *
test_design_analysis (TfDesign design)
{
  TfAnalysis *a = tf_analysis_new (design);

  switch (design)
    {
    case TF_DESIGN_ONE_PROPORTION:
      a->successes = 30, a->trials = 100, a->null_value = 0.5;
      break;
    case TF_DESIGN_TWO_PROPORTIONS:
      a->successes_a = 15, a->trials_a = 50, a->successes_b = 26, a->trials_b = 50;
      break;
    case TF_DESIGN_ONE_MEAN:
      a->n = 20, a->mean = 0.45, a->sd = 1.1, a->null_value = 0;
      break;
    case TF_DESIGN_PAIRED_MEANS:
      a->n = 24, a->mean = 0.3, a->sd = 0.9, a->null_value = 0;
      break;
    case TF_DESIGN_TWO_MEANS:
      a->n_a = 20, a->mean_a = 10.1, a->sd_a = 2.0;
      a->n_b = 22, a->mean_b = 11.4, a->sd_b = 2.2;
      break;
    case TF_DESIGN_ONE_RATE:
      a->events = 18, a->exposure = 10, a->null_value = 1.2;
      break;
    case TF_DESIGN_TWO_RATES:
      a->events_a = 12, a->exposure_a = 10, a->events_b = 25, a->exposure_b = 11;
      break;
    case TF_N_DESIGNS:
    default:
      break;
    }
  return a;
}
