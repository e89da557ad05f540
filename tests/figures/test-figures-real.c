/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-figures-real.c: every kind for every design, to PNG, SVG and PDF, on analyses
 * with ordinary data: PNG pixel sizes exact, PDF pages exact (poppler-utils' pdfinfo),
 * SVG well formed (xmllint), no ink at the edge; a kind that does not apply says why.
 */
#include <math.h>
#include <string.h>
#include <stdio.h>
#include <glib/gstdio.h>
#include "tf-design.h"
#include "tf-figure.h"
#include "tf-figure-export.h"
#include "tf-figure-theme.h"
#include "tf-axis.h"
#include "test-figures.h"

static gboolean
run_tool (const char *const *argv, char **out)
{
  g_autoptr (GError) error = NULL;
  int status = 0;

  if (!g_spawn_sync (NULL, (char **) argv, NULL, G_SPAWN_SEARCH_PATH | G_SPAWN_STDERR_TO_DEV_NULL,
                     NULL, NULL, out, NULL, &status, &error))
    {
      g_test_message ("%s: %s", argv[0], error->message);
      return FALSE;
    }
  return g_spawn_check_wait_status (status, NULL);
}

/* "Page size:      340.157 x 226.772 pts" from pdfinfo (poppler-utils). */
static void
check_pdf (const char *file, double width_mm, double height_mm)
{
  const char *argv[] = { "pdfinfo", file, NULL };
  g_autofree char *out = NULL;
  const char *line;
  double w, h;

  g_autofree char *pdfinfo = g_find_program_in_path ("pdfinfo");

  if (pdfinfo == NULL)
    {
      g_test_message ("pdfinfo not found: page size not checked");
      return;
    }
  g_assert_true (run_tool (argv, &out));
  line = strstr (out, "Page size:");
  g_assert_nonnull (line);
  g_assert_cmpint (sscanf (line, "Page size: %lf x %lf", &w, &h), ==, 2);
  /* pdfinfo prints 3 decimals */
  g_assert_cmpfloat (fabs (w - width_mm * 72 / 25.4), <, 2e-3);
  g_assert_cmpfloat (fabs (h - height_mm * 72 / 25.4), <, 2e-3);
}

static void
check_svg (const char *file)
{
  const char *argv[] = { "xmllint", "--noout", file, NULL };
  g_autofree char *xmllint = g_find_program_in_path ("xmllint");

  if (xmllint == NULL)
    {
      g_autofree char *text = NULL;
      g_assert_true (g_file_get_contents (file, &text, NULL, NULL));
      g_assert_nonnull (strstr (text, "<svg"));
      g_assert_nonnull (strstr (text, "</svg>"));
      return;
    }
  g_assert_true (run_tool (argv, NULL));
}

static void
check_png (const char *file, double width_mm, double height_mm, double dpi, TfFigureStyle style)
{
  cairo_surface_t *s = cairo_image_surface_create_from_png (file);
  TfFigureTheme theme;

  tf_figure_theme_init (&theme, style, dpi / 72);
  g_assert_cmpint (cairo_surface_status (s), ==, CAIRO_STATUS_SUCCESS);
  g_assert_cmpint (cairo_image_surface_get_width (s), ==, (int) round (width_mm / 25.4 * dpi));
  g_assert_cmpint (cairo_image_surface_get_height (s), ==, (int) round (height_mm / 25.4 * dpi));
  g_assert_true (test_edges_blank (s, 2, &theme.background));
  cairo_surface_destroy (s);
}

static const struct {
  double width_mm, height_mm, dpi;
  TfFigureStyle style;
} sizes[] = {
  { 120, 80, 150, TF_FIGURE_STYLE_LIGHT },      /* the CLI's default size */
  { 85, 60, 300, TF_FIGURE_STYLE_PRINT },       /* a journal's single column */
  { 60, 45, 200, TF_FIGURE_STYLE_DARK },        /* small: labels fight for room */
};

static void
test_every_design_kind_format (void)
{
  g_autofree char *dir = g_dir_make_tmp ("tf-figures-XXXXXX", NULL);
  const char *keep = g_getenv ("TF_FIGURE_TEST_DIR");
  guint drawn = 0, not_applicable = 0, unavailable = 0;

  g_assert_nonnull (dir);
  for (guint d = 0; d < TF_N_DESIGNS; d++)
    {
      g_autoptr (TfAnalysis) analysis = test_design_analysis ((TfDesign) d);
      g_autoptr (GPtrArray) problems = tf_problem_list_new ();

      if (!tf_analysis_validate (analysis, problems))
        {
          const TfProblem *p = g_ptr_array_index (problems, 0);
          g_test_message ("%s: not validated (%s)", tf_design_to_string (d), p->message);
          g_assert_cmpstr (p->message, !=, "");
          unavailable++;
          continue;
        }
      for (guint k = 0; k < TF_N_FIGURE_KINDS; k++)
        for (guint s = 0; s < G_N_ELEMENTS (sizes); s++)
          {
            static const char *const ext[] = { "png", "svg", "pdf" };
            TfFigureOptions options = TF_FIGURE_OPTIONS_INIT;

            options.style = sizes[s].style;
            for (guint f = 0; f < G_N_ELEMENTS (ext); f++)
              {
                g_autofree char *name = g_strdup_printf ("%s-%s-%u.%s", tf_design_to_string (d),
                                                         tf_figure_kind_to_string (k), s, ext[f]);
                g_autofree char *file = g_build_filename (keep ? keep : dir, name, NULL);
                g_autoptr (GError) error = NULL;

                if (!tf_figure_export_full (analysis, tf_figure_kind_to_string (k), file,
                                            sizes[s].width_mm, sizes[s].height_mm, sizes[s].dpi,
                                            &options, &error))
                  {
                    g_assert_error (error, TF_FIGURE_ERROR, TF_FIGURE_ERROR_NOT_APPLICABLE);
                    g_assert_cmpuint (strlen (error->message), >, 0);
                    g_assert_false (g_file_test (file, G_FILE_TEST_EXISTS));
                    if (s == 0 && f == 0)
                      g_test_message ("%s %s: %s", tf_design_to_string (d),
                                      tf_figure_kind_to_string (k), error->message);
                    not_applicable++;
                    continue;
                  }
                drawn++;
                if (f == 0)
                  check_png (file, sizes[s].width_mm, sizes[s].height_mm, sizes[s].dpi, sizes[s].style);
                else if (f == 1)
                  check_svg (file);
                else
                  check_pdf (file, sizes[s].width_mm, sizes[s].height_mm);
                if (!keep)
                  g_unlink (file);
              }
          }
    }
  g_test_message ("drawn %u, not applicable %u, designs not available %u", drawn,
                  not_applicable, unavailable);
  g_assert_cmpuint (drawn, >, 0);
  g_rmdir (dir);
}

/* The window's readout: the curves' values under the pointer. */
static void
test_readout (void)
{
  g_autoptr (TfAnalysis) analysis = test_design_analysis (TF_DESIGN_ONE_PROPORTION);
  g_autofree char *why_not = NULL;
  g_autoptr (TfFigure) figure = tf_figure_new (analysis, TF_FIGURE_DENSITIES, &why_not);
  g_autoptr (TfDensityCurves) curves = tf_density_curves_new (analysis, 401, NULL);
  cairo_surface_t *s = cairo_image_surface_create (CAIRO_FORMAT_RGB24, 800, 500);
  cairo_t *cr = cairo_create (s);
  TfPlotArea area;
  TfFigureReading reading;
  g_autofree char *markup = NULL;
  guint peak = 0;
  double px;

  g_assert_nonnull (figure);
  g_assert_true (tf_figure_draw (figure, cr, 800, 500, 2.0, NULL, &area));
  for (guint i = 0; i < curves->n; i++)
    if (curves->posterior[i] > curves->posterior[peak])
      peak = i;
  px = tf_plot_area_map_x (&area, curves->x[peak]);
  g_assert_true (tf_figure_read_at (figure, &area, px, &reading));
  g_assert_cmpuint (reading.n, ==, 3);
  /* the same grid as the curves: the value at the peak, to 1e-12 relative */
  g_assert_cmpfloat (fabs (reading.x - curves->x[peak]), <, (curves->hi - curves->lo) / 400);
  g_assert_cmpfloat (fabs (reading.values[0] - curves->posterior[peak]), <=, 1e-12 * curves->posterior[peak]);
  markup = tf_figure_reading_markup (&reading);
  g_assert_true (pango_parse_markup (markup, -1, 0, NULL, NULL, NULL, NULL));
  g_assert_false (tf_figure_read_at (figure, &area, area.x - 5, &reading));
  cairo_destroy (cr);
  cairo_surface_destroy (s);
}

/* A kind that does not apply draws its reason and says it. */
static void
test_not_applicable_message (void)
{
  g_autoptr (TfAnalysis) analysis = test_design_analysis (TF_DESIGN_ONE_PROPORTION);

  for (guint k = 0; k < TF_N_FIGURE_KINDS; k++)
    {
      cairo_surface_t *s = cairo_image_surface_create (CAIRO_FORMAT_RGB24, 400, 300);
      cairo_t *cr = cairo_create (s);
      g_autofree char *why_not = NULL;
      gboolean ok = tf_figure_draw_kind (cr, k, 400, 300, 1.5, analysis, NULL, NULL, &why_not);

      if (!ok)
        {
          g_assert_nonnull (why_not);
          g_assert_cmpuint (strlen (why_not), >, 0);
        }
      else
        g_assert_null (why_not);
      cairo_destroy (cr);
      cairo_surface_destroy (s);
    }
  /* no analysis at all */
  {
    g_autofree char *why_not = NULL;
    g_assert_null (tf_figure_new (NULL, TF_FIGURE_DENSITIES, &why_not));
    g_assert_cmpuint (strlen (why_not), >, 0);
  }
}

void
test_add_real_cases (void)
{
  g_test_add_func ("/figures/real/every-design-kind-format", test_every_design_kind_format);
  g_test_add_func ("/figures/real/readout", test_readout);
  g_test_add_func ("/figures/real/not-applicable", test_not_applicable_message);
}
