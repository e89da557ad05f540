/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-key-file.c: reading and writing the keys of an analysis file one by one: numbers
 * in C notation whatever the locale, ';' lists item by item, booleans, and every bad
 * value a problem naming its group and key.
 */
#include "tf-analysis-file-private.h"

#include <errno.h>
#include <glib/gi18n-lib.h>
#include <math.h>
#include <stdlib.h>

gboolean
tf_reader_has (TfReader *r, const char *group, const char *key)
{
  return g_key_file_has_key (r->key_file, group, key, NULL);
}

char *
tf_reader_string (TfReader *r, const char *group, const char *key)
{
  g_autofree char *raw = g_key_file_get_value (r->key_file, group, key, NULL);

  return raw ? g_strstrip (g_strdup (raw)) : NULL;
}

/* A number in C notation; missing keys take the default when optional. */
double
tf_reader_number (TfReader *r, const char *group, const char *key, gboolean required,
               double fallback)
{
  g_autofree char *text = tf_reader_string (r, group, key);
  char *end = NULL;
  double value;

  if (text == NULL)
    {
      if (required)
        g_ptr_array_add (r->problems,
                         tf_problem_new (group, key, _("This key is required and missing.")));
      return fallback;
    }
  if (*text == '\0')
    {
      g_ptr_array_add (r->problems,
                       tf_problem_new (group, key, _("The value is empty; a number is needed.")));
      return fallback;
    }
  errno = 0;
  value = g_ascii_strtod (text, &end);
  if (end == text || *end != '\0' || g_ascii_strncasecmp (text, "0x", 2) == 0
      || g_ascii_strncasecmp (text, "-0x", 3) == 0)
    {
      g_ptr_array_add (r->problems,
                       tf_problem_new (group, key,
                                       _("“%s” is not a number (write numbers like 0.5 or 1e-3, with a point as decimal mark)."),
                                       text));
      return fallback;
    }
  if (!isfinite (value) || (errno == ERANGE && fabs (value) > 1.0))
    {
      g_ptr_array_add (r->problems,
                       tf_problem_new (group, key,
                                       _("“%s” is not a finite number Twofold can use."), text));
      return fallback;
    }
  return value;
}

/* A list of numbers separated by ';' (DEVELOPERS.md), each item checked like a number. */
GArray *
tf_reader_list (TfReader *r, const char *group, const char *key)
{
  g_autofree char *text = tf_reader_string (r, group, key);
  g_auto (GStrv) items = NULL;
  g_autoptr (GArray) values = NULL;
  guint count = 0;

  if (text == NULL)
    return NULL;
  items = g_strsplit (text, ";", -1);
  values = g_array_new (FALSE, FALSE, sizeof (double));
  for (guint i = 0; items[i]; i++)
    {
      char *item = g_strstrip (items[i]);
      char *end = NULL;
      double v;

      if (*item == '\0' && items[i + 1] == NULL && i > 0)
        break;  /* a trailing ';' */
      errno = 0;
      v = g_ascii_strtod (item, &end);
      if (*item == '\0' || end == item || *end != '\0' || !isfinite (v)
          || (errno == ERANGE && fabs (v) > 1.0) || g_ascii_strncasecmp (item, "0x", 2) == 0)
        {
          g_ptr_array_add (r->problems,
                           tf_problem_new (group, key,
                                           _("Item %u of the list, “%s”, is not a finite number (separate values with ';' and write decimals with a point)."),
                                           i + 1, item));
          return NULL;
        }
      g_array_append_val (values, v);
      count++;
    }
  if (count == 0)
    {
      g_ptr_array_add (r->problems,
                       tf_problem_new (group, key, _("The list is empty; give the values separated by ';'.")));
      return NULL;
    }
  return g_steal_pointer (&values);
}

gboolean
tf_reader_boolean (TfReader *r, const char *group, const char *key, gboolean fallback)
{
  g_autofree char *text = tf_reader_string (r, group, key);

  if (text == NULL)
    return fallback;
  if (g_str_equal (text, "true"))
    return TRUE;
  if (g_str_equal (text, "false"))
    return FALSE;
  g_ptr_array_add (r->problems,
                   tf_problem_new (group, key, _("“%s” is not allowed here; use true or false."), text));
  return fallback;
}

void
tf_key_file_set_number (GKeyFile *key_file, const char *group, const char *key, double value)
{
  g_autofree char *text = tf_format_double (value);

  g_key_file_set_value (key_file, group, key, text);
}

void
tf_key_file_set_list (GKeyFile *key_file, const char *group, const char *key, const GArray *values)
{
  g_autoptr (GString) text = g_string_new (NULL);

  for (guint i = 0; i < values->len; i++)
    {
      g_autofree char *item = tf_format_double (g_array_index (values, double, i));

      if (i > 0)
        g_string_append_c (text, ';');
      g_string_append (text, item);
    }
  g_key_file_set_value (key_file, group, key, text->str);
}
