/* SPDX-License-Identifier: GPL-3.0-or-later
 * test-chebyshev.c: Chebyshev interpolation on Lobatto points (core/tf-chebyshev.h):
 * the nodes, the fit, Clenshaw's evaluation, the integral and the end derivatives, on
 * functions whose values, integrals and derivatives are known in closed form: the T_k
 * themselves, a cubic, e^ξ and cos 3ξ.
 *
 * Where the check values come from: the T_k, the cubic's coefficients (ξ³ = (3T₁ + T₃)/4),
 * its integral and derivatives, and e^ξ, cos 3ξ and their integrals and derivatives are
 * closed forms (common practice), evaluated with the C library. The Chebyshev
 * coefficients of e^ξ are 2 I_k(1) (I_0(1) for k = 0) and those of cos 3ξ are
 * 2 (−1)^(k/2) J_k(3) for even k (J_0(3) for k = 0), by the Jacobi–Anger expansions
 * with ξ = cos θ (common practice), valued by mpmath 1.2.1 at mp.dps = 40 (the calls
 * beside each); the interpolant's aliased terms are below 1e-40 there.
 *
 * With 24 nodes the interpolation error of e^ξ or cos 3ξ is at most max|f^(24)| / 24!
 * (3^24 / 24! ≈ 5e-13) times the node polynomial, at most 2^−22 on [−1, 1]: far below
 * double precision, so what is left is rounding.
 */
#include "tf-chebyshev.h"
#include "tf-check.h"

/* The coefficients of the interpolant of f at the nodes. */
static void
fit (double (*f) (double), double *c)
{
  double v[TF_CHEB_N];

  for (guint j = 0; j < TF_CHEB_N; j++)
    v[j] = f (tf_cheb_node (j));
  tf_cheb_fit (v, c);
}

static double
cubic (double x)
{
  return 3.0 * x * x * x - 2.0 * x + 0.5;
}

static double
cos3 (double x)
{
  return cos (3.0 * x);
}

/* The end derivatives weigh coefficient k by k² (first) and k²(k² − 1)/3 (second): the
 * rounding of the coefficients, a few ulps of the largest each, is multiplied by the
 * sum of the weights (about 4e3 and 5e5 at 24 nodes). The absolute tolerance of the
 * first (order 1) or second (order 2) derivative of the interpolant with coefficients c. */
static double
derivative_tolerance (const double *c, int order)
{
  double weights = 0.0, largest = 0.0;

  for (guint k = 1; k < TF_CHEB_N; k++)
    {
      double k2 = (double) k * k;

      weights += order == 1 ? k2 : k2 * (k2 - 1.0) / 3.0;
    }
  for (guint k = 0; k < TF_CHEB_N; k++)
    largest = MAX (largest, fabs (c[k]));
  return weights * largest * TF_TOL_ULPS;
}

/* The value of the interpolant's integral from −1 to xi. */
static double
integral_to (const double *c, double xi)
{
  double ci[TF_CHEB_N + 1];

  tf_cheb_integral (c, ci);
  return tf_cheb_eval (ci, TF_CHEB_N + 1, xi);
}

/* The first and second derivatives at each end against d1 and d2 at ξ = 1, and e1 and
 * e2 at ξ = −1. */
static void
check_end_derivatives (const double *c, double d1, double d2, double e1, double e2)
{
  double got1, got2;

  tf_cheb_end_derivatives (c, 1, &got1, &got2);
  assert_abs (got1, d1, derivative_tolerance (c, 1));
  assert_abs (got2, d2, derivative_tolerance (c, 2));
  tf_cheb_end_derivatives (c, -1, &got1, &got2);
  assert_abs (got1, e1, derivative_tolerance (c, 1));
  assert_abs (got2, e2, derivative_tolerance (c, 2));
}

static void
test_nodes (void)
{
  /* ξ_j = cos(π j / (N − 1)): 1 and −1 at the ends, symmetric about 0 */
  assert_rel (tf_cheb_node (0), 1.0, TF_TOL_EXACT);
  assert_rel (tf_cheb_node (TF_CHEB_N - 1), -1.0, TF_TOL_EXACT);
  for (guint j = 0; j < TF_CHEB_N; j++)
    {
      assert_rel (tf_cheb_node (j), cos (G_PI * j / (TF_CHEB_N - 1)), TF_TOL_EXACT);
      assert_abs (tf_cheb_node (j), -tf_cheb_node (TF_CHEB_N - 1 - j), TF_TOL_ULPS);
      if (j > 0)
        g_assert_cmpfloat (tf_cheb_node (j), <, tf_cheb_node (j - 1));
    }
}

/* The fit of T_k's values is the k-th unit vector: each coefficient a sum of tens of
 * terms, so rounding alone. */
static void
test_fit_basis (void)
{
  for (guint k = 0; k < TF_CHEB_N; k++)
    {
      double v[TF_CHEB_N], c[TF_CHEB_N];

      for (guint j = 0; j < TF_CHEB_N; j++)
        v[j] = cos (G_PI * k * j / (TF_CHEB_N - 1));       /* T_k(ξ_j) */
      tf_cheb_fit (v, c);
      for (guint i = 0; i < TF_CHEB_N; i++)
        assert_abs (c[i], i == k ? 1.0 : 0.0, TF_TOL_ROUNDING);
    }
}

/* Clenshaw's sum of the first n terms: 1 + 2 T₁ + 3 T₂ = 1 + 2ξ + 3 (2ξ² − 1). */
static void
test_clenshaw (void)
{
  const double c[] = { 1.0, 2.0, 3.0 };

  assert_rel (tf_cheb_eval (c, 3, 0.3), 1.0 + 2.0 * 0.3 + 3.0 * (2.0 * 0.09 - 1.0), TF_TOL_ULPS);
  assert_rel (tf_cheb_eval (c, 2, -0.7), 1.0 - 2.0 * 0.7, TF_TOL_ULPS);
  assert_rel (tf_cheb_eval (c, 1, 0.3), 1.0, TF_TOL_EXACT);
  assert_rel (tf_cheb_eval (c, 3, 1.0), 6.0, TF_TOL_EXACT);      /* T_k(1) = 1 */
  assert_rel (tf_cheb_eval (c, 3, -1.0), 2.0, TF_TOL_EXACT);     /* T_k(−1) = (−1)^k */
}

/* p(ξ) = 3ξ³ − 2ξ + ½ = ½ T₀ + ¼ T₁ + ¾ T₃: a cubic is its own interpolant. */
static void
test_cubic (void)
{
  double c[TF_CHEB_N];

  fit (cubic, c);
  assert_abs (c[0], 0.5, TF_TOL_ROUNDING);
  assert_abs (c[1], 0.25, TF_TOL_ROUNDING);
  assert_abs (c[2], 0.0, TF_TOL_ROUNDING);
  assert_abs (c[3], 0.75, TF_TOL_ROUNDING);
  for (guint k = 4; k < TF_CHEB_N; k++)
    assert_abs (c[k], 0.0, TF_TOL_ROUNDING);
  assert_rel (tf_cheb_eval (c, TF_CHEB_N, 0.3), cubic (0.3), TF_TOL_ROUNDING);
  assert_rel (tf_cheb_eval (c, TF_CHEB_N, -0.9), cubic (-0.9), TF_TOL_ROUNDING);
  /* ∫ from −1: F(ξ) − F(−1), F(ξ) = ¾ξ⁴ − ξ² + ½ξ, F(−1) = −¾ */
  assert_abs (integral_to (c, -1.0), 0.0, TF_TOL_ULPS);
  assert_rel (integral_to (c, 0.5), 0.75 * 0.0625 - 0.25 + 0.25 + 0.75, TF_TOL_ROUNDING);
  assert_rel (integral_to (c, 1.0), 1.0, TF_TOL_ROUNDING);
  /* p′(ξ) = 9ξ² − 2, p″(ξ) = 18ξ */
  check_end_derivatives (c, 7.0, 18.0, 7.0, -18.0);
}

static void
test_exp (void)
{
  double c[TF_CHEB_N];

  fit (exp, c);
  /* mpmath 1.2.1: besseli(0, 1), 2*besseli(1, 1), 2*besseli(2, 1), 2*besseli(5, 1) */
  assert_abs (c[0], 1.266065877752008335598244625214717537608, TF_TOL_ROUNDING);
  assert_abs (c[1], 1.130318207984970054415392055219726614658, TF_TOL_ROUNDING);
  assert_abs (c[2], 0.2714953395340765623657051399899818458997, TF_TOL_ROUNDING);
  assert_abs (c[5], 0.0005429263119139437503621478103075546847671, TF_TOL_ROUNDING);
  assert_rel (tf_cheb_eval (c, TF_CHEB_N, 0.5), exp (0.5), TF_TOL_ROUNDING);
  assert_rel (tf_cheb_eval (c, TF_CHEB_N, -0.77), exp (-0.77), TF_TOL_ROUNDING);
  /* ∫ from −1 to ξ of e^t = e^ξ − 1/e; to 1, 2 sinh 1 */
  assert_abs (integral_to (c, -1.0), 0.0, TF_TOL_ULPS);
  assert_rel (integral_to (c, 0.25), exp (0.25) - exp (-1.0), TF_TOL_ROUNDING);
  assert_rel (integral_to (c, 1.0), 2.0 * sinh (1.0), TF_TOL_ROUNDING);
  check_end_derivatives (c, M_E, M_E, exp (-1.0), exp (-1.0));
}

static void
test_cos (void)
{
  double c[TF_CHEB_N];

  fit (cos3, c);
  /* mpmath 1.2.1: besselj(0, 3), -2*besselj(2, 3), 2*besselj(4, 3); odd ones vanish */
  assert_abs (c[0], -0.2600519549019334376241546959773314368196, TF_TOL_ROUNDING);
  assert_abs (c[2], -0.9721825211717821538156621882299680696033, TF_TOL_ROUNDING);
  assert_abs (c[4], 0.2640683678492244206573785915573645281132, TF_TOL_ROUNDING);
  for (guint k = 1; k < TF_CHEB_N; k += 2)
    assert_abs (c[k], 0.0, TF_TOL_ROUNDING);
  assert_rel (tf_cheb_eval (c, TF_CHEB_N, 0.1), cos (0.3), TF_TOL_ROUNDING);
  assert_rel (tf_cheb_eval (c, TF_CHEB_N, -0.6), cos (-1.8), TF_TOL_ROUNDING);
  /* ∫ from −1 to ξ of cos 3t = (sin 3ξ + sin 3) / 3 */
  assert_abs (integral_to (c, -1.0), 0.0, TF_TOL_ULPS);
  assert_rel (integral_to (c, 1.0), 2.0 * sin (3.0) / 3.0, TF_TOL_ROUNDING);
  assert_rel (integral_to (c, 0.4), (sin (1.2) + sin (3.0)) / 3.0, TF_TOL_ROUNDING);
  /* (cos 3ξ)′ = −3 sin 3ξ, (cos 3ξ)″ = −9 cos 3ξ */
  check_end_derivatives (c, -3.0 * sin (3.0), -9.0 * cos (3.0), 3.0 * sin (3.0), -9.0 * cos (3.0));
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/chebyshev/nodes", test_nodes);
  g_test_add_func ("/chebyshev/fit-basis", test_fit_basis);
  g_test_add_func ("/chebyshev/clenshaw", test_clenshaw);
  g_test_add_func ("/chebyshev/cubic", test_cubic);
  g_test_add_func ("/chebyshev/exp", test_exp);
  g_test_add_func ("/chebyshev/cos", test_cos);
  return g_test_run ();
}
