/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-application.c: starts Twofold: `twofold` opens the demo analysis, `twofold FILE`
 * opens each file in a window of its own.
 */
#include <glib/gi18n.h>
#include <gsl/gsl_errno.h>
#include "tf-application.h"
#include "tf-window.h"
#include "tf-explain.h"

struct _TfApplication
{
  AdwApplication parent_instance;
};

G_DEFINE_FINAL_TYPE (TfApplication, tf_application, ADW_TYPE_APPLICATION)

static void
about_activated (GSimpleAction *action, GVariant *parameter, gpointer user_data)
{
  GtkApplication *app = GTK_APPLICATION (user_data);
  GtkWindow *parent = gtk_application_get_active_window (app);
  static const char *developers[] = { "The Twofold developers", NULL };
  GtkWidget *about;
  GtkIconTheme *icons = gtk_icon_theme_get_for_display (gdk_display_get_default ());
  /* uninstalled, the icon theme does not know Twofold's icon: show none rather than a
   * broken image */
  const char *icon = gtk_icon_theme_has_icon (icons, TF_APP_ID) ? TF_APP_ID : "";

  about = g_object_new (ADW_TYPE_ABOUT_WINDOW,
                        "transient-for", parent,
                        "modal", TRUE,
                        "application-name", _("Twofold"),
                        "application-icon", icon,
                        "version", TF_VERSION,
                        "developer-name", _("The Twofold developers"),
                        "developers", developers,
                        "license-type", GTK_LICENSE_GPL_3_0,
                        "comments", tf_caution_text (),
                        "copyright", _("© The Twofold developers"),
                        NULL);
  gtk_window_present (GTK_WINDOW (about));
}

static void
quit_activated (GSimpleAction *action, GVariant *parameter, gpointer user_data)
{
  GApplication *app = G_APPLICATION (user_data);
  GList *windows = gtk_application_get_windows (GTK_APPLICATION (app));

  /* close each window so that it saves its size */
  GList *copy = g_list_copy (windows);

  for (GList *w = copy; w; w = w->next)
    gtk_window_close (GTK_WINDOW (w->data));
  g_list_free (copy);
}

static const GActionEntry app_actions[] = {
  { .name = "about", .activate = about_activated },
  { .name = "quit", .activate = quit_activated },
};

static void
tf_application_startup (GApplication *application)
{
  GtkApplication *app = GTK_APPLICATION (application);

  G_APPLICATION_CLASS (tf_application_parent_class)->startup (application);

  /* Every GSL status is checked where it is returned; never abort the program. */
  gsl_set_error_handler_off ();

  g_action_map_add_action_entries (G_ACTION_MAP (app), app_actions, G_N_ELEMENTS (app_actions), app);
  gtk_application_set_accels_for_action (app, "app.quit", (const char *[]) { "<Control>q", NULL });
  gtk_application_set_accels_for_action (app, "win.open", (const char *[]) { "<Control>o", NULL });
  gtk_application_set_accels_for_action (app, "win.save", (const char *[]) { "<Control>s", NULL });
  gtk_application_set_accels_for_action (app, "win.save-as", (const char *[]) { "<Control><Shift>s", NULL });
  gtk_application_set_accels_for_action (app, "win.show-explanations", (const char *[]) { "F9", NULL });
  gtk_application_set_accels_for_action (app, "window.close", (const char *[]) { "<Control>w", NULL });
}

static void
tf_application_activate (GApplication *application)
{
  TfWindow *window = tf_window_new (GTK_APPLICATION (application));

  tf_window_open_demo (window);
  gtk_window_present (GTK_WINDOW (window));
}

static void
tf_application_open (GApplication *application, GFile **files, int n_files, const char *hint)
{
  for (int i = 0; i < n_files; i++)
    {
      TfWindow *window = tf_window_new (GTK_APPLICATION (application));

      gtk_window_present (GTK_WINDOW (window));
      if (!tf_window_open_file (window, files[i]))
        tf_window_open_demo (window);
    }
}

static void
tf_application_class_init (TfApplicationClass *klass)
{
  GApplicationClass *app_class = G_APPLICATION_CLASS (klass);

  app_class->startup = tf_application_startup;
  app_class->activate = tf_application_activate;
  app_class->open = tf_application_open;
}

static void
tf_application_init (TfApplication *self)
{
}

TfApplication *
tf_application_new (void)
{
  return g_object_new (TF_TYPE_APPLICATION,
                       "application-id", TF_APP_ID,
                       "flags", G_APPLICATION_HANDLES_OPEN,
                       "resource-base-path", "/org/twofold/Twofold",
                       NULL);
}
