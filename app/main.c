/* SPDX-License-Identifier: GPL-3.0-or-later
 * main.c: twofold, the window.
 */
#include <locale.h>
#include <glib/gi18n.h>
#include "tf-application.h"

int
main (int argc, char *argv[])
{
  g_autoptr (TfApplication) app = NULL;

  setlocale (LC_ALL, "");
  bindtextdomain (GETTEXT_PACKAGE, LOCALEDIR);
  bind_textdomain_codeset (GETTEXT_PACKAGE, "UTF-8");
  textdomain (GETTEXT_PACKAGE);

  app = tf_application_new ();
  return g_application_run (G_APPLICATION (app), argc, argv);
}
