/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-one-proportion-bf.c: the closed-form Bayes factor of one proportion for a point
 * null θ = θ0 against a Beta prior, for counts and shapes up to 10^15. The model set,
 * the interval nulls (tf-one-proportion-models.c) and the numbers
 * (tf-one-proportion.c) build on it.
 */
#include "tf-one-proportion.h"
#include "tf-incbeta-private.h"
#include "tf-logspace.h"

#include <math.h>

/* x − (x + y) θ computed without cancellation for whole k, n and real a, b:
 * (k − nθ) + (a − (a + b) θ). */
static double
count_minus_expected (double k, double n, double a, double b, double t, double u)
{
  return tf_incbeta_lambda (k, n - k, t, u) + tf_incbeta_lambda (a, b, t, u);
}

/* x1 y1 − x2 y2 with the rounding errors of both products recovered by fma
 * (Ogita, Rump & Oishi 2005, TwoProduct). */
static double
diff_of_products (double x1, double y1, double x2, double y2)
{
  double p1 = x1 * y1, p2 = x2 * y2;
  return (p1 - p2) + (fma (x1, y1, -p1) - fma (x2, y2, -p2));
}

/* bd0(c + h, (s + n) θ) − bd0(c, s θ) for a prior shape c that outweighs its count h:
 * c ln(1 + e) + h ln((c + h) / (S θ)) − (h − n θ), e = (h s − n c) / (S c), s = c + other,
 * S = s + n,
 * free of the cancellation between two large deviances (Loader 2000, rearranged). */
static double
bd0_change (double c, double other, double h, double n, double theta, double dh, double dch)
{
  double S = c + other + n;
  double e = diff_of_products (h, other, n - h, c) / (S * c);
  double l = fabs (e) < 0.5 ? log1p (e) : log1p (h / c) - log1p (n / (c + other));
  double r = dch / (S * theta);
  double lr = fabs (r) < 0.5 ? log1p (r) : log ((c + h) / (S * theta));
  return c * l + h * lr - dh;
}

/* ln BF01 for a point null against Beta(a, b), every ln Γ written by Stirling's formula
 * with its remainder so that it holds for huge counts and shapes (Loader 2000, deviance
 * form); where the prior outweighs the data (a + b >= n, or a shape >= its count), the
 * two deviances of that side are taken together so that a huge prior far from θ0 loses nothing either. */
double
tf_one_proportion_log_bf01 (double k, double n, double theta0, double a, double b)
{
  double t = theta0, u = 1.0 - theta0;
  double P = k + a, Q = n - k + b, S = n + a + b, s = a + b;
  double dP = count_minus_expected (k, n, a, b, t, u);   /* P − Sθ0 */
  double da = tf_incbeta_lambda (a, b, t, u);             /* a − sθ0 */
  double dk = tf_incbeta_lambda (k, n - k, t, u);         /* k − nθ0 */
  double side_a, side_b;

  if (s >= n || a >= k)
    side_a = -bd0_change (a, b, k, n, t, dk, dP);
  else
    side_a = -tf_bd0_delta (P, S * t, dP) + tf_bd0_delta (a, s * t, da);
  if (s >= n || b >= n - k)
    side_b = -bd0_change (b, a, n - k, n, u, -dk, -dP);
  else
    side_b = -tf_bd0_delta (Q, S * u, -dP) + tf_bd0_delta (b, s * u, -da);

  return side_a + side_b
         + 0.5 * (log (P) + log (Q) + log (s) - log (S) - log (a) - log (b))
         + tf_stirling_remainder (a) + tf_stirling_remainder (b)
         - tf_stirling_remainder (s) - tf_stirling_remainder (P)
         - tf_stirling_remainder (Q) + tf_stirling_remainder (S);
}
