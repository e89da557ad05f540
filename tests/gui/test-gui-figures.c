/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-gui-figures.c: every figure kind in the window and its export, and the densities
 * figure drawn to image and PDF surfaces, checked pixel by pixel.
 */
#include "test-gui.h"
#include "test-pixels.h"

/* Figure kinds, the crosshair readout and export, in the window */

/* Iterates until the plot has drawn its figure at its current size. */
static gboolean
wait_until_drawn (TfPlotView *view, TfPlotArea *area)
{
  gint64 deadline = g_get_monotonic_time () + 5 * G_USEC_PER_SEC;

  while (!tf_plot_view_get_plot_area_for_test (view, area) && g_get_monotonic_time () < deadline)
    {
      iterate ();
      g_usleep (5000);
    }
  return tf_plot_view_get_plot_area_for_test (view, area);
}

/* Every kind for the window's analysis: the plot shows it, computed once; a kind that
 * does not apply shows tf_figure_new()'s reason, in the plot and as its description. At
 * a few columns the readout is tf_figure_reading_markup() of tf_figure_read_at() there,
 * and the plot's accessible description is its text. Returns how many kinds applied. */
static guint
check_every_kind (TfWindow *window)
{
  TfPlotView *view = tf_window_get_plot_view (window);
  GtkDropDown *chooser = GTK_DROP_DOWN (tf_plot_view_get_kind_chooser_for_test (view));
  guint applied = 0;

  for (guint k = 0; k < TF_N_FIGURE_KINDS; k++)
    {
      TfFigureKind kind = (TfFigureKind) k;
      g_autofree char *why_not = NULL;
      g_autoptr (TfFigure) expected = tf_figure_new (tf_window_get_analysis (window), kind, &why_not);
      guint before = tf_plot_view_get_n_computed_for_test (view);
      TfPlotArea area;

      g_test_message ("kind %s", tf_figure_kind_to_string (kind));
      /* as a user picks it: the chooser's row k, labelled as the engine names the kind */
      g_assert_cmpstr (gtk_string_object_get_string (GTK_STRING_OBJECT (g_list_model_get_item (gtk_drop_down_get_model (chooser), k))),
                       ==, tf_figure_kind_label (kind));
      g_object_unref (g_list_model_get_item (gtk_drop_down_get_model (chooser), k));
      gtk_drop_down_set_selected (chooser, k);
      iterate ();
      g_assert_cmpint (tf_plot_view_get_kind (view), ==, kind);
      g_assert_cmpuint (tf_plot_view_get_n_computed_for_test (view), <=, before + 1);
      g_assert_cmpint (tf_window_get_visible_page (window) != NULL, ==, TRUE);

      if (expected == NULL)
        {
          g_assert_null (tf_plot_view_get_figure (view));
          g_assert_cmpstr (tf_plot_view_get_why_not (view), ==, why_not);
          g_assert_cmpstr (tf_plot_view_get_description (view), ==, why_not);
          /* nothing to read, and nothing to export */
          tf_plot_view_set_pointer_for_test (view, 100, 100);
          g_assert_null (tf_plot_view_get_readout_markup (view));
          g_assert_false (tf_window_get_export_enabled (window));
          continue;
        }
      applied++;
      g_assert_nonnull (tf_plot_view_get_figure (view));
      g_assert_null (tf_plot_view_get_why_not (view));
      g_assert_true (wait_until_drawn (view, &area));
      for (int i = 1; i <= 3; i++)
        {
          double px = area.x + area.width * i / 4.0, py = area.y + area.height / 2;
          TfFigureReading reading;

          tf_plot_view_set_pointer_for_test (view, px, py);
          if (!tf_figure_read_at (expected, &area, px, &reading))
            {
              /* model probabilities: no x to read */
              g_assert_null (tf_plot_view_get_readout_markup (view));
              continue;
            }
          {
            g_autofree char *want = tf_figure_reading_markup (&reading);
            g_autofree char *text = NULL;

            g_assert_cmpstr (tf_plot_view_get_readout_markup (view), ==, want);
            g_assert_true (pango_parse_markup (want, -1, 0, NULL, &text, NULL, NULL));
            g_assert_cmpstr (tf_plot_view_get_description (view), ==, text);
          }
        }
      /* outside the plot area, and once the pointer leaves: gone */
      tf_plot_view_set_pointer_for_test (view, area.x - 5, area.y + area.height / 2);
      g_assert_null (tf_plot_view_get_readout_markup (view));
      tf_plot_view_set_pointer_for_test (view, area.x + area.width / 2, area.y + 1);
      if (tf_figure_get_kind (expected) != TF_FIGURE_MODEL_PROBABILITIES)
        g_assert_nonnull (tf_plot_view_get_readout_markup (view));
      tf_plot_view_set_pointer_for_test (view, NAN, NAN);
      g_assert_null (tf_plot_view_get_readout_markup (view));
      g_assert_null (tf_plot_view_get_description (view));
    }
  return applied;
}

static void
test_window_figure_kinds (void)
{
  TfWindow *window = tf_window_new (NULL);
  TfPlotView *view = tf_window_get_plot_view (window);
  g_autofree char *dir = g_dir_make_tmp ("twofold-gui-XXXXXX", NULL);
  const DesignCase *rate = NULL;
  guint computed;
  TfPlotArea area;

  tf_window_open_demo (window);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  g_assert_cmpint (tf_plot_view_get_kind (view), ==, TF_FIGURE_DENSITIES);
  g_assert_cmpuint (check_every_kind (window), >=, 1);   /* densities at least */

  /* A resize redraws and does not recompute; an edit recomputes the kind shown. */
  tf_plot_view_set_kind (view, TF_FIGURE_DENSITIES);
  iterate ();
  computed = tf_plot_view_get_n_computed_for_test (view);
  gtk_window_set_default_size (GTK_WINDOW (window), 1000, 700);
  iterate ();
  g_assert_true (wait_until_drawn (view, &area));
  g_assert_cmpuint (tf_plot_view_get_n_computed_for_test (view), ==, computed);
  type_into (window, "Data", "Successes", "9650");
  g_assert_cmpuint (tf_plot_view_get_n_computed_for_test (view), ==, computed + 1);
  g_assert_cmpint (tf_plot_view_get_kind (view), ==, TF_FIGURE_DENSITIES);

  /* one rate: the evidence figures and the null distribution apply there */
  for (guint c = 0; c < n_design_cases; c++)
    if (design_cases[c].design == TF_DESIGN_ONE_RATE)
      rate = &design_cases[c];
  g_assert_nonnull (rate);
  {
    g_autofree char *path = write_case (dir, "rate.twofold", rate->file);
    g_autoptr (GFile) file = g_file_new_for_path (path);

    g_assert_true (tf_window_open_file (window, file));
    iterate ();
    g_assert_cmpuint (check_every_kind (window), >=, 2);
    g_unlink (path);
  }
  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
  g_rmdir (dir);
}

/* The width and height a PNG's IHDR chunk gives (PNG specification, section 11.2.2). */
static void
png_size (const char *path, guint32 *width, guint32 *height)
{
  g_autofree guint8 *data = NULL;
  gsize length = 0;

  g_assert_true (g_file_get_contents (path, (char **) &data, &length, NULL));
  g_assert_cmpuint (length, >, 24);
  g_assert_cmpmem (data + 12, 4, "IHDR", 4);
  *width = (guint32) data[16] << 24 | (guint32) data[17] << 16 | (guint32) data[18] << 8 | data[19];
  *height = (guint32) data[20] << 24 | (guint32) data[21] << 16 | (guint32) data[22] << 8 | data[23];
}

/* The message dialog whose heading is heading, among the open windows, or NULL. */
static AdwMessageDialog *
find_dialog (const char *heading)
{
  g_autoptr (GListModel) toplevels = g_object_ref (gtk_window_get_toplevels ());

  for (guint i = 0; i < g_list_model_get_n_items (toplevels); i++)
    {
      g_autoptr (GObject) item = g_list_model_get_item (toplevels, i);

      if (ADW_IS_MESSAGE_DIALOG (item)
          && g_strcmp0 (adw_message_dialog_get_heading (ADW_MESSAGE_DIALOG (item)), heading) == 0)
        return ADW_MESSAGE_DIALOG (item);
    }
  return NULL;
}

/* After an export to path failed: a dialog names the file (it is closed here), and
 * nothing was written. */
static void
assert_export_refused (const char *path)
{
  g_autofree char *name = g_filename_display_name (path);
  g_autofree char *heading = g_strdup_printf ("Could Not Export “%s”", name);
  AdwMessageDialog *dialog;

  iterate ();
  dialog = find_dialog (heading);
  g_assert_nonnull (dialog);
  gtk_window_destroy (GTK_WINDOW (dialog));
  g_assert_false (g_file_test (path, G_FILE_TEST_EXISTS));
}

static void
test_window_export_figure (void)
{
  TfWindow *window = tf_window_new (NULL);
  g_autofree char *dir = g_dir_make_tmp ("twofold-gui-XXXXXX", NULL);
  g_autofree char *png = g_build_filename (dir, "demo-densities.png", NULL);
  g_autofree char *small = g_build_filename (dir, "small.png", NULL);
  g_autofree char *bad = g_build_filename (dir, "no-such-folder", "figure.png", NULL);
  g_autoptr (GFile) png_file = g_file_new_for_path (png);
  g_autoptr (GFile) small_file = g_file_new_for_path (small);
  g_autoptr (GFile) bad_file = g_file_new_for_path (bad);
  TfFigureOptions options = TF_FIGURE_OPTIONS_INIT;
  AdwMessageDialog *dialog;
  guint32 w, h;

  tf_window_open_demo (window);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  g_assert_true (tf_window_get_export_enabled (window));

  /* Through the dialog, at its defaults: 120 × 80 mm at 300 dpi is round(120 / 25.4 ×
   * 300) = 1417 by round(80 / 25.4 × 300) = 945 pixels (1 in = 25.4 mm, common practice). */
  tf_window_show_export_options (window, png_file);
  iterate ();
  dialog = tf_window_get_export_dialog (window);
  g_assert_nonnull (dialog);
  g_assert_cmpstr (adw_message_dialog_get_heading (dialog), ==, "Export “demo-densities.png”");
  adw_message_dialog_response (dialog, "export");
  iterate ();
  g_assert_null (tf_window_get_export_dialog (window));
  png_size (png, &w, &h);
  g_assert_cmpuint (w, ==, 1417);
  g_assert_cmpuint (h, ==, 945);

  /* What the dialog calls, at another size: 50.8 × 25.4 mm at 100 dpi is 200 × 100. */
  options.style = TF_FIGURE_STYLE_PRINT;
  g_assert_true (tf_window_export_figure (window, small_file, 50.8, 25.4, 100, &options));
  png_size (small, &w, &h);
  g_assert_cmpuint (w, ==, 200);
  g_assert_cmpuint (h, ==, 100);

  /* A folder that does not exist: a dialog that names the file, and nothing written. */
  g_assert_false (tf_window_export_figure (window, bad_file, 120, 80, 300, &options));
  assert_export_refused (bad);

  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
  g_unlink (png);
  g_unlink (small);
  g_rmdir (dir);
}

/* Export Report…: the demo's report in each format, as the save dialog's Export writes
 * it; a name without an ending gets ".pdf"; an invalid analysis cannot be exported; a
 * folder that does not exist gets a dialog and nothing is written. */
static void
test_window_export_report (void)
{
  TfWindow *window = tf_window_new (NULL);
  g_autofree char *dir = g_dir_make_tmp ("twofold-gui-XXXXXX", NULL);
  static const char *const names[] = { "lot.html", "lot.md", "plain" };

  tf_window_open_demo (window);
  gtk_window_present (GTK_WINDOW (window));
  wait_until_mapped (GTK_WIDGET (window));
  g_assert_true (tf_window_get_export_report_enabled (window));

  for (guint i = 0; i < G_N_ELEMENTS (names); i++)
    {
      g_autofree char *path = g_build_filename (dir, names[i], NULL);
      g_autofree char *written = g_str_has_suffix (names[i], ".html") || g_str_has_suffix (names[i], ".md")
                                 ? g_strdup (path) : g_strconcat (path, ".pdf", NULL);
      g_autoptr (GFile) file = g_file_new_for_path (path);
      g_autofree char *text = NULL;
      gsize length = 0;

      g_assert_true (tf_window_export_report (window, file));
      g_assert_true (g_file_get_contents (written, &text, &length, NULL));
      if (g_str_has_suffix (written, ".pdf"))
        g_assert_true (g_str_has_prefix (text, "%PDF-"));
      else
        {
          /* the caution, and the demo's own numbers: P(null | data) as the window shows it */
          const char *shown = tf_result_list_get_value_text (tf_window_get_result_list (window),
                                                             "posterior_null");

          g_assert_nonnull (strstr (text, tf_caution_text ()));
          g_assert_nonnull (shown);
          g_assert_nonnull (strstr (text, shown));
          g_assert_nonnull (strstr (text, "Successes=9700"));
        }
    }

  /* an analysis that cannot be computed: the action is off */
  type_into (window, "Data", "Successes", "13000");
  g_assert_false (tf_window_get_export_report_enabled (window));
  type_into (window, "Data", "Successes", "9700");
  g_assert_true (tf_window_get_export_report_enabled (window));

  {
    g_autofree char *bad = g_build_filename (dir, "no-such-folder", "report.pdf", NULL);
    g_autoptr (GFile) bad_file = g_file_new_for_path (bad);

    g_assert_false (tf_window_export_report (window, bad_file));
    assert_export_refused (bad);
  }

  gtk_window_destroy (GTK_WINDOW (window));
  iterate ();
  {
    g_autoptr (GDir) d = g_dir_open (dir, 0, NULL);
    const char *entry;

    while ((entry = g_dir_read_name (d)))
      {
        g_autofree char *path = g_build_filename (dir, entry, NULL);
        g_unlink (path);
      }
  }
  g_rmdir (dir);
}

/* Figure */

static double
colour_distance (const double rgb[3], const TfColour *colour)
{
  return MAX (MAX (fabs (rgb[0] - colour->r), fabs (rgb[1] - colour->g)), fabs (rgb[2] - colour->b));
}

static TfAnalysis *
figure_analysis (void)
{
  TfAnalysis *analysis = tf_analysis_new (TF_DESIGN_ONE_PROPORTION);

  analysis->successes = 30;
  analysis->trials = 100;
  analysis->null_value = 0.5;
  analysis->prior_a = 1;
  analysis->prior_b = 1;
  return analysis;
}

static void
check_figure_pixels (TfFigureStyle style)
{
  const int width = 600, height = 400;
  const double scale = 2.0;     /* 144 pixels per inch */
  g_autoptr (TfAnalysis) analysis = figure_analysis ();
  g_autoptr (TfDensityCurves) curves = tf_density_curves_new (analysis, 401, NULL);
  cairo_surface_t *surface = cairo_image_surface_create (CAIRO_FORMAT_RGB24, width, height);
  cairo_t *cr = cairo_create (surface);
  TfFigureTheme theme;
  TfPlotArea area;
  double rgb[3], best = 1;
  guint peak = 0;
  int px, py;

  tf_figure_theme_init (&theme, style, scale);
  g_assert_nonnull (curves);
  g_assert_true (tf_figure_draw_densities_full (cr, width, height, scale, analysis, style, &area));
  cairo_destroy (cr);
  cairo_surface_flush (surface);
  if (g_getenv ("TF_GUI_TEST_PNG"))
    cairo_surface_write_to_png (surface, g_getenv ("TF_GUI_TEST_PNG"));

  /* The background at a corner. */
  test_pixel_at (surface, 1, 1, rgb);
  g_assert_cmpfloat (colour_distance (rgb, &theme.background), <, 0.01);
  test_pixel_at (surface, width - 2, height - 2, rgb);
  g_assert_cmpfloat (colour_distance (rgb, &theme.background), <, 0.01);

  /* The plot area sits inside the figure. */
  g_assert_cmpfloat (area.x, >, 0);
  g_assert_cmpfloat (area.y, >, 0);
  g_assert_cmpfloat (area.x + area.width, <, width);
  g_assert_cmpfloat (area.y + area.height, <, height);

  /* The posterior's colour within a few pixels of its peak. */
  for (guint i = 0; i < curves->n; i++)
    if (curves->posterior[i] > curves->posterior[peak])
      peak = i;
  g_assert_false (curves->posterior_narrow);
  px = (int) round (tf_plot_area_map_x (&area, curves->x[peak]));
  py = (int) round (tf_plot_area_map_y (&area, curves->posterior[peak]));
  g_assert_cmpint (px, >=, 0);
  g_assert_cmpint (px, <, width);
  g_assert_cmpint (py, >=, 0);
  g_assert_cmpint (py, <, height);
  for (int dy = -4; dy <= 4; dy++)
    for (int dx = -4; dx <= 4; dx++)
      {
        int x = CLAMP (px + dx, 0, width - 1), y = CLAMP (py + dy, 0, height - 1);
        test_pixel_at (surface, x, y, rgb);
        best = MIN (best, colour_distance (rgb, &theme.series[TF_SERIES_POSTERIOR]));
      }
  g_assert_cmpfloat (best, <, 0.12);

  cairo_surface_destroy (surface);
}

static void
test_figure_pixels_light (void)
{
  check_figure_pixels (TF_FIGURE_STYLE_LIGHT);
}

static void
test_figure_pixels_dark (void)
{
  check_figure_pixels (TF_FIGURE_STYLE_DARK);
}

static cairo_status_t
count_bytes (void *closure, const unsigned char *data, unsigned int length)
{
  *(gsize *) closure += length;
  return CAIRO_STATUS_SUCCESS;
}

/* The same drawing on a PDF surface, in points. */
static void
test_figure_pdf (void)
{
  g_autoptr (TfAnalysis) analysis = figure_analysis ();
  gsize written = 0;
  cairo_surface_t *surface = cairo_pdf_surface_create_for_stream (count_bytes, &written, 340, 220);
  cairo_t *cr = cairo_create (surface);

  g_assert_true (tf_figure_draw_densities (cr, 340, 220, 1.0, analysis, TF_FIGURE_STYLE_LIGHT));
  g_assert_cmpint (cairo_status (cr), ==, CAIRO_STATUS_SUCCESS);
  cairo_destroy (cr);
  cairo_surface_finish (surface);
  g_assert_cmpint (cairo_surface_status (surface), ==, CAIRO_STATUS_SUCCESS);
  cairo_surface_destroy (surface);
  g_assert_cmpuint (written, >, 1000);
}

/* An invalid analysis draws a message on the background and says FALSE. */
static void
test_figure_invalid (void)
{
  g_autoptr (TfAnalysis) analysis = figure_analysis ();
  cairo_surface_t *surface = cairo_image_surface_create (CAIRO_FORMAT_RGB24, 300, 200);
  cairo_t *cr = cairo_create (surface);
  TfFigureTheme theme;
  double rgb[3];

  analysis->successes = 130;    /* more than the 100 trials */
  tf_figure_theme_init (&theme, TF_FIGURE_STYLE_LIGHT, 1.0);
  g_assert_false (tf_figure_draw_densities (cr, 300, 200, 1.0, analysis, TF_FIGURE_STYLE_LIGHT));
  cairo_destroy (cr);
  cairo_surface_flush (surface);
  test_pixel_at (surface, 1, 1, rgb);
  g_assert_cmpfloat (colour_distance (rgb, &theme.background), <, 0.01);
  cairo_surface_destroy (surface);
}

/* Heckbert (1990), "Nice numbers for graph labels": 1, 2, 5 times a power of ten. The
 * expected values follow from the rule as stated there (common practice). */
static void
test_nice_numbers (void)
{
  TfTicks ticks;

  g_assert_cmpfloat_with_epsilon (tf_nice_number (0.23, TRUE), 0.2, 1e-12);
  g_assert_cmpfloat_with_epsilon (tf_nice_number (0.23, FALSE), 0.5, 1e-12);
  g_assert_cmpfloat_with_epsilon (tf_nice_number (7.5, TRUE), 10, 1e-12);
  g_assert_cmpfloat_with_epsilon (tf_nice_number (1.4, TRUE), 1, 1e-12);
  g_assert_cmpfloat_with_epsilon (tf_nice_number (3e-5, TRUE), 5e-5, 1e-17);

  /* range nice(10.3) = 20, step nice(20 / 4, round) = 5, extended to 15 */
  tf_ticks_compute (&ticks, 0, 10.3, 5, TRUE);
  g_assert_cmpfloat_with_epsilon (ticks.step, 5, 1e-12);
  g_assert_cmpfloat_with_epsilon (ticks.hi, 15, 1e-12);
  g_assert_cmpuint (ticks.n, ==, 4);

  tf_ticks_compute (&ticks, 0.213, 0.397, 5, FALSE);
  g_assert_cmpfloat_with_epsilon (ticks.step, 0.05, 1e-12);
  g_assert_cmpfloat_with_epsilon (tf_ticks_value (&ticks, 0), 0.25, 1e-12);
  g_assert_cmpuint (ticks.n, ==, 3);
  {
    g_autofree char *label = tf_ticks_label (&ticks, 0);
    g_assert_cmpstr (label, ==, "0.25");
  }
}

void
add_figure_tests (void)
{
  g_test_add_func ("/gui/window/figure-kinds", test_window_figure_kinds);
  g_test_add_func ("/gui/window/export-figure", test_window_export_figure);
  g_test_add_func ("/gui/window/export-report", test_window_export_report);
  g_test_add_func ("/gui/figure/pixels-light", test_figure_pixels_light);
  g_test_add_func ("/gui/figure/pixels-dark", test_figure_pixels_dark);
  g_test_add_func ("/gui/figure/pdf", test_figure_pdf);
  g_test_add_func ("/gui/figure/invalid", test_figure_invalid);
  g_test_add_func ("/gui/figure/nice-numbers", test_nice_numbers);
}
