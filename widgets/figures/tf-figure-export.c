/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-figure-export.c: figures to PNG, SVG and PDF files.
 */
#include "tf-design.h"
#include "tf-figure-export.h"
#include "tf-figure.h"

#include <cairo-pdf.h>
#include <cairo-svg.h>
#include <cairo.h>
#include <glib/gi18n-lib.h>
#include <math.h>
#include <string.h>

#define POINTS_PER_MM (72.0 / 25.4)

G_DEFINE_QUARK (tf-figure-error-quark, tf_figure_error)

gboolean
tf_figure_kind_is_known (const char *kind)
{
  return tf_figure_kind_from_string (kind, NULL);
}

gboolean
tf_figure_format_from_filename (const char *filename, TfFigureFormat *format)
{
  g_autofree char *lower = g_ascii_strdown (filename, -1);

  if (g_str_has_suffix (lower, ".png"))
    *format = TF_FIGURE_FORMAT_PNG;
  else if (g_str_has_suffix (lower, ".svg"))
    *format = TF_FIGURE_FORMAT_SVG;
  else if (g_str_has_suffix (lower, ".pdf"))
    *format = TF_FIGURE_FORMAT_PDF;
  else
    return FALSE;
  return TRUE;
}

cairo_status_t
tf_figure_append_bytes (void *closure, const unsigned char *data, unsigned int length)
{
  g_byte_array_append (closure, data, length);
  return CAIRO_STATUS_SUCCESS;
}

/* CRC-32 of PNG chunks (ISO 3309, as the PNG specification gives it). */
static guint32
png_crc (const guint8 *data, gsize length)
{
  guint32 crc = 0xffffffffu;

  for (gsize i = 0; i < length; i++)
    {
      crc ^= data[i];
      for (int bit = 0; bit < 8; bit++)
        crc = (crc >> 1) ^ (0xedb88320u & (0u - (crc & 1u)));
    }
  return crc ^ 0xffffffffu;
}

static void
put_be32 (guint8 *p, guint32 v)
{
  p[0] = (guint8) (v >> 24);
  p[1] = (guint8) (v >> 16);
  p[2] = (guint8) (v >> 8);
  p[3] = (guint8) v;
}

/* Cairo writes no resolution into a PNG; without a pHYs chunk, programs take it as 72
 * dpi and print the figure four times too large. Inserts one after the IHDR chunk. */
static void
png_set_resolution (GByteArray *png, double dpi)
{
  const gsize after_ihdr = 8 + 4 + 4 + 13 + 4;
  guint8 chunk[4 + 4 + 9 + 4];
  guint32 per_metre = (guint32) lround (dpi / 0.0254);

  if (png->len < after_ihdr || memcmp (png->data + 12, "IHDR", 4) != 0)
    return;
  put_be32 (chunk, 9);
  memcpy (chunk + 4, "pHYs", 4);
  put_be32 (chunk + 8, per_metre);
  put_be32 (chunk + 12, per_metre);
  chunk[16] = 1;  /* unit: metre */
  put_be32 (chunk + 17, png_crc (chunk + 4, 4 + 9));
  {
    gsize old_length = png->len;

    g_byte_array_set_size (png, (guint) (old_length + sizeof chunk));
    memmove (png->data + after_ihdr + sizeof chunk, png->data + after_ihdr,
             old_length - after_ihdr);
    memcpy (png->data + after_ihdr, chunk, sizeof chunk);
  }
}

/* Draws one figure kind on cr, in a box of width × height user units at scale units a
 * point; a kind that does not apply draws its reason and sets NOT_APPLICABLE with it. */
static gboolean
draw_kind (cairo_t *cr, TfFigureKind kind, double width, double height, double scale,
           const TfAnalysis *analysis, const TfFigureOptions *options, GError **error)
{
  g_autofree char *why_not = NULL;

  if (tf_figure_draw_kind (cr, kind, width, height, scale, analysis, options, NULL, &why_not))
    return TRUE;
  g_set_error (error, TF_FIGURE_ERROR, TF_FIGURE_ERROR_NOT_APPLICABLE,
               /* TRANSLATORS: %s is a figure kind ("sensitivity"), then the reason */
               _("The “%s” figure does not apply: %s"), tf_figure_kind_to_string (kind),
               why_not && *why_not ? why_not : _("no reason given."));
  return FALSE;
}

gboolean
tf_figure_export (const TfAnalysis *analysis, const char *kind, const char *filename,
                  double width_mm, double height_mm, double dpi, GError **error)
{
  return tf_figure_export_full (analysis, kind, filename, width_mm, height_mm, dpi, NULL, error);
}

/* What was asked, checked before anything is drawn: the kind, the file's format, the
 * size and resolution, and the analysis. */
static gboolean
check_request (const TfAnalysis *analysis, const char *kind, const char *filename,
               double width_mm, double height_mm, double dpi, TfFigureKind *kind_out,
               TfFigureFormat *format, GError **error)
{
  g_autoptr (GPtrArray) problems = tf_problem_list_new ();

  if (!tf_figure_kind_from_string (kind, kind_out))
    {
      g_autofree char *names = tf_figure_kind_names ();
      /* TRANSLATORS: %s is what was asked, then the list of figure kinds */
      g_set_error (error, TF_FIGURE_ERROR, TF_FIGURE_ERROR_UNKNOWN_KIND,
                   _("“%s” is not a figure kind; use %s."), kind, names);
      return FALSE;
    }
  if (!tf_figure_format_from_filename (filename, format))
    {
      g_set_error (error, TF_FIGURE_ERROR, TF_FIGURE_ERROR_BAD_FORMAT,
                   _("%s: the file name must end in .png, .svg or .pdf."), filename);
      return FALSE;
    }
  if (!(width_mm >= 10 && width_mm <= 1000 && height_mm >= 10 && height_mm <= 1000))
    {
      g_set_error (error, TF_FIGURE_ERROR, TF_FIGURE_ERROR_BAD_SIZE,
                   _("The width and height must be between 10 and 1000 mm (asked: %g × %g mm)."),
                   width_mm, height_mm);
      return FALSE;
    }
  if (!(dpi >= 50 && dpi <= 2400))
    {
      g_set_error (error, TF_FIGURE_ERROR, TF_FIGURE_ERROR_BAD_SIZE,
                   _("The resolution must be between 50 and 2400 dpi (asked: %g)."), dpi);
      return FALSE;
    }
  if (!tf_analysis_validate (analysis, problems))
    {
      const TfProblem *p = g_ptr_array_index (problems, 0);
      g_set_error (error, TF_FIGURE_ERROR, TF_FIGURE_ERROR_INVALID_ANALYSIS,
                   "[%s] %s: %s", p->group, p->key, p->message);
      return FALSE;
    }
  return TRUE;
}

/* A surface of the format and size asked, its size in user units and the units a
 * point. PNG draws in memory; SVG and PDF stream into bytes. */
static cairo_surface_t *
surface_new (TfFigureFormat format, double width_mm, double height_mm, double dpi,
             GByteArray *bytes, double *w, double *h, double *scale)
{
  cairo_surface_t *surface;

  if (format == TF_FIGURE_FORMAT_PNG)
    {
      *w = round (width_mm / 25.4 * dpi);
      *h = round (height_mm / 25.4 * dpi);
      *scale = dpi / 72.0;
      return cairo_image_surface_create (CAIRO_FORMAT_ARGB32, (int) *w, (int) *h);
    }
  *w = width_mm * POINTS_PER_MM;
  *h = height_mm * POINTS_PER_MM;
  *scale = 1.0;
  if (format == TF_FIGURE_FORMAT_SVG)
    {
      /* The page is given in points (width="240.944882pt" for 85 mm): exact, and the
       * figure is drawn in the same units as PDF. (A page in mm under a cairo_scale()
       * shrinks Pango's subscripts.) */
      surface = cairo_svg_surface_create_for_stream (tf_figure_append_bytes, bytes, *w, *h);
      cairo_svg_surface_set_document_unit (surface, CAIRO_SVG_UNIT_PT);
      return surface;
    }
  surface = cairo_pdf_surface_create_for_stream (tf_figure_append_bytes, bytes, *w, *h);
  cairo_pdf_surface_set_metadata (surface, CAIRO_PDF_METADATA_CREATOR, "Twofold " TF_VERSION);
  return surface;
}

/* The surface's bytes complete: a PNG drawn is encoded with its resolution, SVG and PDF
 * finished. */
static cairo_status_t
surface_finish (cairo_surface_t *surface, TfFigureFormat format, gboolean drawn,
                GByteArray *bytes, double dpi)
{
  cairo_status_t status;

  if (format == TF_FIGURE_FORMAT_PNG && drawn)
    {
      status = cairo_surface_write_to_png_stream (surface, tf_figure_append_bytes, bytes);
      if (status == CAIRO_STATUS_SUCCESS)
        png_set_resolution (bytes, dpi);
      return status;
    }
  cairo_surface_finish (surface);
  return cairo_surface_status (surface);
}

gboolean
tf_figure_export_full (const TfAnalysis *analysis, const char *kind, const char *filename,
                       double width_mm, double height_mm, double dpi,
                       const TfFigureOptions *options, GError **error)
{
  g_autoptr (GByteArray) bytes = g_byte_array_new ();
  TfFigureKind k;
  TfFigureFormat format;
  cairo_surface_t *surface;
  cairo_status_t status;
  cairo_t *cr;
  double w, h, scale;
  gboolean drawn;

  if (!check_request (analysis, kind, filename, width_mm, height_mm, dpi, &k, &format, error))
    return FALSE;
  surface = surface_new (format, width_mm, height_mm, dpi, bytes, &w, &h, &scale);
  cr = cairo_create (surface);
  if (format == TF_FIGURE_FORMAT_PNG)
    {
      /* A white page: PNGs pasted into documents should not come out transparent. */
      cairo_set_source_rgb (cr, 1, 1, 1);
      cairo_paint (cr);
    }
  drawn = draw_kind (cr, k, w, h, scale, analysis, options, error);
  cairo_destroy (cr);
  status = surface_finish (surface, format, drawn, bytes, dpi);
  cairo_surface_destroy (surface);
  if (!drawn)
    return FALSE;
  if (status != CAIRO_STATUS_SUCCESS)
    {
      g_set_error (error, TF_FIGURE_ERROR, TF_FIGURE_ERROR_WRITE,
                   _("%s: the figure could not be drawn: %s."), filename,
                   cairo_status_to_string (status));
      return FALSE;
    }
  if (!g_file_set_contents_full (filename, (const char *) bytes->data, (gssize) bytes->len,
                                 G_FILE_SET_CONTENTS_CONSISTENT, 0666, error))
    {
      if (error && *error)
        {
          (*error)->domain = TF_FIGURE_ERROR;
          (*error)->code = TF_FIGURE_ERROR_WRITE;
        }
      return FALSE;
    }
  return TRUE;
}
