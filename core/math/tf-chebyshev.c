/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-chebyshev.c: Chebyshev interpolation on Chebyshev–Lobatto points (Mason &
 * Handscomb 2003, ch. 2 and 6).
 */
#include "tf-chebyshev.h"

#include <math.h>

/* cos(π m / (N − 1)), m < 2(N − 1): the nodes and the DCT's cosines */
static const double *
cos_table (void)
{
  static double table[2 * (TF_CHEB_N - 1)];
  static gsize done = 0;
  if (g_once_init_enter (&done))
    {
      for (guint m = 0; m < 2 * (TF_CHEB_N - 1); m++)
        table[m] = cos (G_PI * m / (TF_CHEB_N - 1));
      g_once_init_leave (&done, 1);
    }
  return table;
}

double
tf_cheb_node (guint j)
{
  return cos_table ()[j];
}

/* the discrete cosine transform of type I */
void
tf_cheb_fit (const double *v, double *c)
{
  const guint n = TF_CHEB_N - 1;
  const double *cs = cos_table ();
  for (guint k = 0; k <= n; k++)
    {
      double s = 0.5 * (v[0] + (k % 2 ? -v[n] : v[n]));
      for (guint j = 1; j < n; j++)
        s += v[j] * cs[j * k % (2 * n)];
      c[k] = s * 2.0 / n * (k == 0 || k == n ? 0.5 : 1.0);
    }
}

double
tf_cheb_eval (const double *c, guint n, double xi)
{
  double b1 = 0.0, b2 = 0.0;
  for (guint k = n - 1; k >= 1; k--)
    {
      double b0 = c[k] + 2.0 * xi * b1 - b2;
      b2 = b1;
      b1 = b0;
    }
  return c[0] + xi * b1 - b2;
}

/* C_k = (c_(k−1) − c_(k+1)) / (2k) with c_0 doubled (Mason & Handscomb 2003, §2.4.4),
 * C_0 making the integral vanish at −1 */
void
tf_cheb_integral (const double *c, double *ci)
{
  double alt = 0.0;
  for (guint k = 1; k <= TF_CHEB_N; k++)
    {
      double before = k == 1 ? 2.0 * c[0] : c[k - 1];
      double after = k + 1 < TF_CHEB_N ? c[k + 1] : 0.0;
      ci[k] = (before - after) / (2.0 * k);
      alt += k % 2 ? -ci[k] : ci[k];
    }
  ci[0] = -alt;
}

/* T_k'(±1) = (±1)^(k+1) k², T_k''(±1) = (±1)^k k² (k² − 1) / 3 */
void
tf_cheb_end_derivatives (const double *c, int end, double *d1, double *d2)
{
  double s1 = 0.0, s2 = 0.0;
  for (guint k = 1; k < TF_CHEB_N; k++)
    {
      double k2 = (double) k * k;
      s1 += (end > 0 || k % 2 == 1 ? 1.0 : -1.0) * k2 * c[k];
      s2 += (end > 0 || k % 2 == 0 ? 1.0 : -1.0) * k2 * (k2 - 1.0) / 3.0 * c[k];
    }
  *d1 = s1;
  *d2 = s2;
}
