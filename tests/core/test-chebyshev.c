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

/* The functions with known coefficients, antiderivatives (from −1) and derivatives. */
static double
cubic (double x)
{
  return 3.0 * x * x * x - 2.0 * x + 0.5;
}

static double
cubic_from_m1 (double x)
{
  return 0.75 * x * x * x * x - x * x + 0.5 * x + 0.75;
}

static double
cubic_d1 (double x)
{
  return 9.0 * x * x - 2.0;
}

static double
cubic_d2 (double x)
{
  return 18.0 * x;
}

/* T₂ and T₄ onwards are absent from ½ T₀ + ¼ T₁ + ¾ T₃ */
static gboolean
cubic_zero (guint k)
{
  return k == 2 || k >= 4;
}


static double
exp_from_m1 (double x)
{
  return exp (x) - exp (-1.0);
}


static double
cos3 (double x)
{
  return cos (3.0 * x);
}

static double
cos3_from_m1 (double x)
{
  return (sin (3.0 * x) + sin (3.0)) / 3.0;
}

static double
cos3_d1 (double x)
{
  return -3.0 * sin (3.0 * x);
}

static double
cos3_d2 (double x)
{
  return -9.0 * cos (3.0 * x);
}

/* an even function: the odd T_k are absent */
static gboolean
cos3_zero (guint k)
{
  return k % 2 == 1;
}


typedef struct {
  const char *name;
  double (*f) (double);
  double (*from_m1) (double);           /* ∫ of f from −1 */
  double (*d1) (double), (*d2) (double);
  gboolean (*zero) (guint k);           /* the coefficients known to vanish, or NULL */
  guint n_known;
  struct { guint k; double c; } known[4];
} KnownFunction;

static const KnownFunction known_functions[] = {
  /* p(ξ) = 3ξ³ − 2ξ + ½ = ½ T₀ + ¼ T₁ + ¾ T₃ (ξ³ = (3T₁ + T₃)/4): its own interpolant */
  { "cubic", cubic, cubic_from_m1, cubic_d1, cubic_d2, cubic_zero,
    3, { { 0, 0.5 }, { 1, 0.25 }, { 3, 0.75 } } },
  /* mpmath 1.2.1: besseli(0, 1), 2*besseli(1, 1), 2*besseli(2, 1), 2*besseli(5, 1) */
  { "exp", exp, exp_from_m1, exp, exp, NULL,
    4, { { 0, 1.266065877752008335598244625214717537608 },
      { 1, 1.130318207984970054415392055219726614658 },
      { 2, 0.2714953395340765623657051399899818458997 },
      { 5, 0.0005429263119139437503621478103075546847671 } } },
  /* mpmath 1.2.1: besselj(0, 3), -2*besselj(2, 3), 2*besselj(4, 3) */
  { "cos 3x", cos3, cos3_from_m1, cos3_d1, cos3_d2, cos3_zero,
    3, { { 0, -0.2600519549019334376241546959773314368196 },
         { 2, -0.9721825211717821538156621882299680696033 },
         { 4, 0.2640683678492244206573785915573645281132 } } },
};

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

/* Each known function: its coefficients, the interpolant's values, its integral from
 * −1 (0 at −1 itself) and its end derivatives. */
static void
test_known_functions (void)
{
  static const double points[] = { -0.9, -0.77, -0.6, 0.1, 0.3, 0.5 };
  static const double ends[] = { 0.25, 0.4, 0.5, 1.0 };

  for (guint i = 0; i < G_N_ELEMENTS (known_functions); i++)
    {
      const KnownFunction *kf = &known_functions[i];
      double c[TF_CHEB_N];

      g_test_message ("%s", kf->name);
      fit (kf->f, c);
      for (guint j = 0; j < kf->n_known; j++)
        assert_abs (c[kf->known[j].k], kf->known[j].c, TF_TOL_ROUNDING);
      for (guint k = 0; kf->zero && k < TF_CHEB_N; k++)
        if (kf->zero (k))
          assert_abs (c[k], 0.0, TF_TOL_ROUNDING);
      for (guint j = 0; j < G_N_ELEMENTS (points); j++)
        assert_rel (tf_cheb_eval (c, TF_CHEB_N, points[j]), kf->f (points[j]), TF_TOL_ROUNDING);
      assert_abs (integral_to (c, -1.0), 0.0, TF_TOL_ULPS);
      for (guint j = 0; j < G_N_ELEMENTS (ends); j++)
        assert_rel (integral_to (c, ends[j]), kf->from_m1 (ends[j]), TF_TOL_ROUNDING);
      check_end_derivatives (c, kf->d1 (1.0), kf->d2 (1.0), kf->d1 (-1.0), kf->d2 (-1.0));
    }
}

int
main (int argc, char **argv)
{
  tf_check_init (&argc, &argv);
  g_test_add_func ("/chebyshev/nodes", test_nodes);
  g_test_add_func ("/chebyshev/fit-basis", test_fit_basis);
  g_test_add_func ("/chebyshev/clenshaw", test_clenshaw);
  g_test_add_func ("/chebyshev/known-functions", test_known_functions);
  return g_test_run ();
}
