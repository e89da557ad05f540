/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-pixels.h: reading pixels back, for the figure tests and the window's figure
 * tests.
 */
#pragma once

#include <glib.h>
#include <cairo.h>

/* The pixel at x, y of an RGB24/ARGB32 image surface (native-endian xRGB), as r, g, b in
 * 0..1. */
static inline void
test_pixel_at (cairo_surface_t *surface, int x, int y, double rgb[3])
{
  const unsigned char *data = cairo_image_surface_get_data (surface);
  int stride = cairo_image_surface_get_stride (surface);
  guint32 pixel = *(const guint32 *) (data + y * stride + 4 * x);

  rgb[0] = ((pixel >> 16) & 0xff) / 255.0;
  rgb[1] = ((pixel >> 8) & 0xff) / 255.0;
  rgb[2] = (pixel & 0xff) / 255.0;
}
