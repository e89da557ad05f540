/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-results.c: the numbers an analysis reports, their formatting and JSON.
 */
#include "tf-results.h"

#include <glib/gi18n-lib.h>
#include <math.h>

static void
tf_number_free (TfNumber *number)
{
  g_free (number->id);
  g_free (number->label);
  g_free (number->reason);
  g_free (number->method);
  g_free (number->of);
  g_free (number);
}

TfResults *
tf_results_new (TfDesign design)
{
  TfResults *results = g_new (TfResults, 1);

  results->design = design;
  results->numbers = g_ptr_array_new_with_free_func ((GDestroyNotify) tf_number_free);
  return results;
}

void
tf_results_free (TfResults *results)
{
  if (results == NULL)
    return;
  g_ptr_array_unref (results->numbers);
  g_free (results);
}

static TfNumber *
number_new (const char *id, const char *label, TfMeasure measure)
{
  TfNumber *number = g_new0 (TfNumber, 1);

  number->id = g_strdup (id);
  number->label = g_strdup (label);
  number->measure = measure;
  return number;
}

void
tf_results_add (TfResults *results, const char *id, const char *label,
                TfMeasure measure, double value)
{
  if (!isfinite (value))
    {
      tf_results_add_undefined (results, id, label, measure,
                                _("the computation did not give a finite value"));
      return;
    }
  TfNumber *number = number_new (id, label, measure);
  number->value = value;
  number->status = TF_STATUS_OK;
  g_ptr_array_add (results->numbers, number);
}

void
tf_results_add_undefined (TfResults *results, const char *id, const char *label,
                          TfMeasure measure, const char *reason)
{
  TfNumber *number = number_new (id, label, measure);

  number->value = 0.0;
  number->status = TF_STATUS_UNDEFINED;
  number->reason = g_strdup (reason);
  g_ptr_array_add (results->numbers, number);
}

void
tf_number_set_method (TfNumber *number, const char *method, const char *of)
{
  g_free (number->method);
  g_free (number->of);
  number->method = g_strdup (method);
  number->of = g_strdup (of);
}

const TfNumber *
tf_results_lookup (const TfResults *results, const char *id)
{
  for (guint i = 0; i < results->numbers->len; i++)
    {
      const TfNumber *number = g_ptr_array_index (results->numbers, i);

      if (g_strcmp0 (number->id, id) == 0)
        return number;
    }
  return NULL;
}

gboolean
tf_results_get (const TfResults *results, const char *id, double *value)
{
  const TfNumber *number = tf_results_lookup (results, id);

  if (number == NULL || number->status != TF_STATUS_OK)
    return FALSE;
  if (value)
    *value = number->value;
  return TRUE;
}

const char *
tf_measure_to_string (TfMeasure measure)
{
  switch (measure)
    {
    case TF_MEASURE_TAIL_PROBABILITY: return "tail-probability";
    case TF_MEASURE_BAYES_FACTOR: return "bayes-factor";
    case TF_MEASURE_POSTERIOR_PROBABILITY: return "posterior-probability";
    case TF_MEASURE_CONFIDENCE_LIMIT: return "confidence-limit";
    case TF_MEASURE_CREDIBLE_LIMIT: return "credible-limit";
    case TF_MEASURE_BOUND: return "bound";
    case TF_MEASURE_ESTIMATE: return "estimate";
    case TF_MEASURE_STATISTIC: return "statistic";
    }
  g_return_val_if_reached ("unknown");
}

const char *
tf_status_to_string (TfStatus status)
{
  return status == TF_STATUS_OK ? "ok" : "undefined";
}

char *
tf_format_double (double value)
{
  char buffer[G_ASCII_DTOSTR_BUF_SIZE];

  if (!isfinite (value))
    return g_strdup ("null");
  /* The shortest of %.15g, %.16g, %.17g that reads back as the same double. */
  for (int digits = 15; digits <= 17; digits++)
    {
      char format[8];

      g_snprintf (format, sizeof format, "%%.%dg", digits);
      g_ascii_formatd (buffer, sizeof buffer, format, value);
      if (g_ascii_strtod (buffer, NULL) == value)
        break;
    }
  return g_strdup (buffer);
}

/* The exponent in superscript digits: "10⁻³⁰⁰" reads as a number, "10^-300" as code. */
static void
append_superscript (GString *out, int exponent)
{
  static const char *const digits[] = { "⁰", "¹", "²", "³", "⁴", "⁵", "⁶", "⁷", "⁸", "⁹" };
  char plain[16];

  g_snprintf (plain, sizeof plain, "%d", exponent);
  for (const char *p = plain; *p; p++)
    g_string_append (out, *p == '-' ? "⁻" : digits[*p - '0']);
}

/* Probabilities and Bayes factors are shown with 4 significant digits; a probability
 * below 1e-4 (or a Bayes factor beyond 1e±4) in scientific notation so that small
 * values keep their digits rather than turning into 0.0000. Probabilities within 1e-4
 * of 1 are written as 1 − x so that 1 − 1e-12 does not print as 1. */
char *
tf_format_value (double value, TfMeasure measure)
{
  double magnitude = fabs (value);
  gboolean probability = measure == TF_MEASURE_TAIL_PROBABILITY
                         || measure == TF_MEASURE_POSTERIOR_PROBABILITY;

  if (!isfinite (value))
    return g_strdup (_("not defined"));
  if (value == 0.0)
    return g_strdup ("0");
  if (probability && value < 1.0 && value > 0.9999)
    {
      g_autofree char *rest = tf_format_value (1.0 - value, measure);
      return g_strdup_printf ("1 − %s", rest);
    }
  if (magnitude < 1e-4 || magnitude >= 1e6)
    {
      char mantissa[32];
      int exponent = (int) floor (log10 (magnitude));
      double m = value / pow (10.0, exponent);

      /* rounding may give 10.00: renormalise */
      if (fabs (m) >= 9.9995)
        {
          m /= 10.0;
          exponent++;
        }
      GString *out = g_string_new (NULL);

      g_snprintf (mantissa, sizeof mantissa, "%.3f", m);
      g_string_append_printf (out, "%s × 10", mantissa);
      append_superscript (out, exponent);
      return g_string_free (out, FALSE);
    }
  return g_strdup_printf ("%.4g", value);
}

char *
tf_number_format (const TfNumber *number)
{
  if (number->status != TF_STATUS_OK)
    return g_strdup (_("not defined"));
  return tf_format_value (number->value, number->measure);
}

static void
json_string (GString *out, const char *s)
{
  g_string_append_c (out, '"');
  for (const char *p = s ? s : ""; *p; p++)
    {
      unsigned char c = (unsigned char) *p;

      switch (c)
        {
        case '"': g_string_append (out, "\\\""); break;
        case '\\': g_string_append (out, "\\\\"); break;
        case '\n': g_string_append (out, "\\n"); break;
        case '\t': g_string_append (out, "\\t"); break;
        case '\r': g_string_append (out, "\\r"); break;
        default:
          if (c < 0x20)
            g_string_append_printf (out, "\\u%04x", c);
          else
            g_string_append_c (out, (char) c);
        }
    }
  g_string_append_c (out, '"');
}

static void
json_number (GString *out, double value)
{
  g_autofree char *s = tf_format_double (value);

  g_string_append (out, s);
}

char *
tf_results_to_json (const char *design_name, const char *title, const TfResults *results,
                    GPtrArray *problems)
{
  GString *out = g_string_new ("{\"format\": 1, \"design\": ");
  gboolean first = TRUE;

  json_string (out, design_name ? design_name : "");
  if (title)
    {
      g_string_append (out, ", \"title\": ");
      json_string (out, title);
    }

  g_string_append (out, ",\n \"results\": {");
  for (guint i = 0; results && i < results->numbers->len; i++)
    {
      const TfNumber *number = g_ptr_array_index (results->numbers, i);

      if (number->status != TF_STATUS_OK)
        continue;
      g_string_append (out, first ? "\n  " : ",\n  ");
      first = FALSE;
      json_string (out, number->id);
      g_string_append (out, ": ");
      json_number (out, number->value);
    }

  g_string_append (out, "},\n \"numbers\": [");
  for (guint i = 0; results && i < results->numbers->len; i++)
    {
      const TfNumber *number = g_ptr_array_index (results->numbers, i);

      g_string_append (out, i == 0 ? "\n  {\"id\": " : ",\n  {\"id\": ");
      json_string (out, number->id);
      g_string_append (out, ", \"label\": ");
      json_string (out, number->label);
      g_string_append (out, ", \"value\": ");
      if (number->status == TF_STATUS_OK)
        json_number (out, number->value);
      else
        g_string_append (out, "null");
      g_string_append (out, ", \"measure\": ");
      json_string (out, tf_measure_to_string (number->measure));
      g_string_append (out, ", \"status\": ");
      json_string (out, tf_status_to_string (number->status));
      if (number->reason)
        {
          g_string_append (out, ", \"reason\": ");
          json_string (out, number->reason);
        }
      g_string_append_c (out, '}');
    }

  g_string_append (out, "],\n \"problems\": [");
  for (guint i = 0; problems && i < problems->len; i++)
    {
      const TfProblem *problem = g_ptr_array_index (problems, i);

      g_string_append (out, i == 0 ? "\n  {\"group\": " : ",\n  {\"group\": ");
      json_string (out, problem->group);
      g_string_append (out, ", \"key\": ");
      json_string (out, problem->key);
      g_string_append (out, ", \"message\": ");
      json_string (out, problem->message);
      g_string_append_c (out, '}');
    }
  g_string_append (out, "]}\n");
  return g_string_free (out, FALSE);
}
