/* SPDX-License-Identifier: GPL-3.0-or-later
 * tf-jzs.c: the JZS Bayes factor as one integral over the prior's precision z = 1/g.
 *
 * Rouder et al. (2009) write BF10 = ∫ BF10(g) IG(g; ½, r²/2) dg, where BF10(g) is the
 * normal-prior Bayes factor at δ ~ N(0, g) (Gönen et al. 2005). With z = 1/g,
 *   BF10 = r/√(2π) ∫₀^∞ (z + N)^(−½) R(z)^(−(ν+1)/2) e^(−r² z/2) dz,
 *   R(z)/R(0) = 1 + t² z / ((z + N) ν),
 * an integrand that is finite, decreasing and log-convex on [0, ∞). Substitutions
 * z = S (e^x − 1) make it an O(1)-wide bump or plateau in x whatever t, N and r are:
 *  1. when it decays on about one scale, S is set by r so that a fixed 16-point
 *     Gauss–Legendre rule on x ∈ [0, 2.25] reaches e^(−r² z/2) = e^(−30), with
 *     nodes and weights that do not depend on the data;
 *  2. otherwise S = s, its e-folding length at 0, which makes x = 0 a stationary point,
 *     and panels of at most 4 in x get a 20-point Gauss–Legendre rule each;
 *  3. adaptive GSL quadrature takes over when the error estimate of either rule is
 *     above 1e-10 of the sum.
 * The error estimates extrapolate the decay of the last Legendre coefficients of the
 * sampled integrand to the degree the rule misses.
 */
#include "tf-jzs.h"

#include "tf-incbeta.h"
#include "tf-normal.h"

#include <math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_integration.h>

#define PANEL_WIDTH 4.0         /* in x */
#define CUT 60.0                /* r² z at the upper end: e^(−30) of the tail is left */
#define TOLERANCE 1e-10

typedef struct {
  double n, t2, k;              /* N, t², k = (ν + 1)/2 */
  double t2_df, half_r2;        /* t²/ν, r²/2 */
  gboolean known;               /* ν = ∞: a z statistic */
  double s;                     /* scale of the substitution */
} JzsParams;

static guint64 n_fast, n_fallback;

/* 20-point Gauss–Legendre rule on [−1, 1] (Golub & Welsch 1969), positive half, and
 * gl_p[j][i] = (2k + 1)/2 w_i P_k(x_i) with k = 16 + j: the discrete Legendre
 * coefficients of degrees 16 to 19 of the sampled integrand (numpy 1.24 leggauss). */
static const double gl_x[10] = {
  0.07652652113349734,
  0.2277858511416451,
  0.37370608871541955,
  0.5108670019508271,
  0.636053680726515,
  0.7463319064601508,
  0.8391169718222188,
  0.9122344282513258,
  0.9639719272779138,
  0.9931285991850949
};
static const double gl_w[10] = {
  0.15275338713072578,
  0.14917298647260366,
  0.14209610931838187,
  0.13168863844917653,
  0.11819453196151825,
  0.10193011981724026,
  0.08327674157670467,
  0.06267204833410944,
  0.04060142980038622,
  0.017614007139153273
};
static const double gl_p[4][10] = {
  { 0.1494635666316843, -0.38937970378035636, 0.4776874398402443, -0.3866579559381644, 0.16383732326223818, 0.09104782539673337, -0.2720020552258502, 0.3146210266913538, -0.2245860684955912, 0.0759686016177172 },
  { 0.4970921035606045, -0.38934310208750783, 0.2017527672193675, 0.01761017938518443, -0.21384617490702018, 0.3404239406408488, -0.3720379567623059, 0.3116410596089289, -0.19003594687087363, 0.05969498748322105 },
  { -0.08007550985266373, 0.2300222053129438, -0.3508528512481689, 0.42793355453058735, -0.45308286683915877, 0.4258408592497221, -0.3536811352151884, 0.2512139774242363, -0.13873656589564537, 0.041418332533341 },
  { -0.5373281811555949, 0.518555082523216, -0.4821106367038101, 0.4301504350411745, -0.36579330002083726, 0.2929997149232348, -0.2164418650875274, 0.1414129616200832, -0.0739057843801022, 0.021416031600054643 },
};

/* ln R(z)/R(0) times −(ν+1)/2, with u = z/(z + N); the ν → ∞ limit is −t² u/2. */
static inline double
log_ratio (const JzsParams *p, double u)
{
  return p->known ? -0.5 * p->t2 * u : -p->k * log1p (p->t2_df * u);
}

/* The integrand in z divided by its value at 0: √(N/(z + N)) (R(z)/R(0))^(−(ν+1)/2)
 * e^(−r² z/2). */
static inline double
integrand_z (const JzsParams *p, double z)
{
  double inv = 1.0 / (z + p->n);
  return sqrt (p->n * inv) * exp (log_ratio (p, z * inv) - p->half_r2 * z);
}

/* The same in x given e^x, z = s (e^x − 1), divided by s. */
static inline double
integrand_ex (const JzsParams *p, double ex)
{
  return ex * integrand_z (p, p->s * (ex - 1.0));
}

static inline double
integrand_x (const JzsParams *p, double x)
{
  return integrand_ex (p, exp (x));
}

static double
gsl_integrand_x (double x, void *data)
{
  return integrand_x (data, x);
}

static double
gsl_integrand_z (double z, void *data)
{
  return integrand_z (data, z);
}

/* The rule on [a, a + 2h]. *err: the last two pairs of Legendre coefficients give a
 * decay rate q per degree; their size times q^21 extrapolates the coefficient that the
 * 20-point rule misses (degree 40), in the manner of Berntsen & Espelid (1991); when
 * they do not decay fast (q ≥ 0.7) the coefficients themselves are the estimate. */
static double
panel (const JzsParams *p, double a, double h, double *err)
{
  double c = a + h, ec = exp (c), sum = 0.0, co[4] = { 0.0, 0.0, 0.0, 0.0 };

  for (int i = 0; i < 10; i++)
    {
      double ed = exp (h * gl_x[i]);                  /* e^(c ± dx) = e^c e^(±dx) */
      double fp = integrand_ex (p, ec * ed), fm = integrand_ex (p, ec / ed);
      double even = fp + fm, odd = fp - fm;
      sum += gl_w[i] * even;
      co[0] += gl_p[0][i] * even;
      co[1] += gl_p[1][i] * odd;
      co[2] += gl_p[2][i] * even;
      co[3] += gl_p[3][i] * odd;
    }
  double e1 = fabs (co[2]) + fabs (co[3]), e2 = fabs (co[0]) + fabs (co[1]);
  double q = e2 > 0.0 ? sqrt (e1 / e2) : 1.0, q4 = q * q * q * q;
  *err = (q < 0.7 ? e1 * q4 * q4 * q4 * q4 * q4 * q : e1) * h;     /* e1 q^21 */
  return sum * h;
}

/* The first try, for integrands that decay on one scale: z = S (e^x − 1) on
 * x ∈ [0, 2.25] with r² S (e^2.25 − 1) = CUT, a 16-point Gauss–Legendre rule whose
 * nodes, weights (times e^x) and Legendre rows of degrees 12 to 15 do not depend on
 * the data (numpy 1.24 leggauss, expm1). Used when S is at most 6 e-folding lengths s,
 * so that the start of the decay falls between nodes no wider than it. */
#define FIXED_X 2.25
#define FIXED_EXPM1 8.487735836358526   /* e^2.25 − 1 */
#define FIXED_MAX_SCALES 6.0
static const double fx_zeta[16] = {
  0.01199532180716248,
  0.06433809514798652,
  0.16318844891902984,
  0.3167545575683479,
  0.5370872433499656,
  0.8399366195587169,
  1.2438564283407818,
  1.7679609401341798,
  2.427698598918307,
  3.228316801612047,
  4.156555794097965,
  5.172542175082217,
  6.2053943400655776,
  7.15666270171066,
  7.914212391354219,
  8.375276379159418
};
static const double fx_w[16] = {
  0.030912932137785686,
  0.0745411467207486,
  0.12452319180607718,
  0.18461898664400145,
  0.2586848468245698,
  0.35014193378095465,
  0.4609528275212232,
  0.5899408760522317,
  0.7305520410236886,
  0.868618223849462,
  0.9812981589702138,
  1.0388109939676287,
  1.0102509946044231,
  0.8731978683647461,
  0.6243087763117798,
  0.2863820377789902
};
static const double fx_p[4][16] = {
  { 0.11257238095735726, -0.31681005063193746, 0.3799666464212471, -0.1583102774094511, -0.33714221546676393, 0.8802173551276014, -1.0722611941014517, 0.5502635977465884, 0.6814177670224982, -2.0205660065730333, 2.466872964209717, -1.3538753593672537, -0.8662874719239858, 2.6644519859515983, -2.653397535917483, 1.0428874139957287 },
  { -0.09012762092642475, 0.28588603251073036, -0.45797306538581084, 0.49846151522037596, -0.31398208192688765, -0.1391655926302751, 0.8035569551205408, -1.4780072707621477, 1.8302871900124777, -1.5142204873155907, 0.3900216645445276, 1.2608702930160043, -2.727624339605129, 3.211458834801903, -2.3943978188320973, 0.8349557921596347 },
  { 0.0634576225103714, -0.21812055738352748, 0.4119100324465182, -0.6094529836040198, 0.7650117590978108, -0.8160866144787995, 0.6862463246004139, -0.30182348741216347, -0.3737624797816542, 1.2931606620206444, -2.28714191328271, 3.0720880469827363, -3.3349792133668346, 2.8884495897799454, -1.8268377166063783, 0.5878809284777161 },
  { -0.0331745271650638, 0.1194409921934278, -0.2461289666392475, 0.4173053511173095, -0.6404126085911258, 0.921612016635834, -1.2604776981708303, 1.6431057047551427, -2.0347364879328316, 2.375240662422436, -2.5828845047029954, 2.571730299034904, -2.2835308203318414, 1.7259378425418723, -1.0003610483361087, 0.30733379316912546 },
};

/* S times the fixed rule's sum, or 0 when its error estimate is above TOLERANCE. */
static double
fixed_rule (const JzsParams *p, double S)
{
  double sum = 0.0, co[4] = { 0.0, 0.0, 0.0, 0.0 };

  for (int i = 0; i < 16; i++)
    {
      double f = integrand_z (p, S * fx_zeta[i]);
      sum += fx_w[i] * f;
      for (int j = 0; j < 4; j++)
        co[j] += fx_p[j][i] * f;
    }
  double e1 = fabs (co[2]) + fabs (co[3]), e2 = fabs (co[0]) + fabs (co[1]);
  double q = e2 > 0.0 ? sqrt (e1 / e2) : 1.0, q4 = q * q * q * q;
  double err = (q < 0.7 ? e1 * q4 * q4 * q4 * q4 * q : e1) * 0.5 * FIXED_X;   /* e1 q^17 */
  return err <= TOLERANCE * sum && sum > 0.0 ? S * sum : 0.0;
}

/* Fills p; returns r/√(2π N), and in *lead ln (1 + t²/ν)^((ν+1)/2) (t²/2 when ν = ∞):
 * the product is r/√(2π) times the integrand at z = 0. */
static double
setup (JzsParams *p, double t, double n_eff, double df, double r, double *lead)
{
  *p = (JzsParams) { .n = n_eff, .t2 = t * t, .k = 0.5 * (df + 1.0), .t2_df = t * t / df,
                     .half_r2 = 0.5 * r * r, .known = isinf (df) };
  /* |d/dz ln integrand| at z = 0 */
  double slope = 0.5 / n_eff + p->half_r2 + (p->known ? 0.5 : p->k / df) * p->t2 / n_eff;
  p->s = 1.0 / slope;
  *lead = p->known ? 0.5 * p->t2 : p->k * log1p (p->t2_df);
  return r / sqrt (2.0 * G_PI * n_eff);
}

/* x where e^(−r² z/2) = e^(−CUT/2) with z = s (e^x − 1). */
static double
x_upper (const JzsParams *p)
{
  return log1p (CUT / (2.0 * p->half_r2 * p->s));
}

double
tf_jzs_log_bf10 (double t, double n_eff, double df, double r)
{
  JzsParams p;
  double lead;

  if (!(isfinite (t) && n_eff > 0.0 && df > 0.0 && r > 0.0))
    return NAN;
  double scale = setup (&p, t, n_eff, df, r, &lead);
  double big_s = CUT / (r * r * FIXED_EXPM1);
  if (big_s <= FIXED_MAX_SCALES * p.s)
    {
      double v = fixed_rule (&p, big_s);
      if (v > 0.0)
        {
          n_fast++;
          return lead + log (scale * v);
        }
    }
  double x_max = x_upper (&p);
  guint panels = (guint) ceil (x_max / PANEL_WIDTH);
  double h = 0.5 * x_max / panels, sum = 0.0, err = 0.0;
  for (guint i = 0; i < panels; i++)
    {
      double e;
      sum += panel (&p, 2.0 * h * i, h, &e);
      err += e;
    }
  if (err <= TOLERANCE * sum && sum > 0.0)
    {
      n_fast++;
      return lead + log (scale * p.s * sum);
    }

  /* Fallback: adaptive Gauss–Kronrod (Piessens et al. 1983, QUADPACK QAGS) on the same
   * integrand in x, then QAGIU on z if that fails. */
  n_fallback++;
  gsl_integration_workspace *w = gsl_integration_workspace_alloc (500);
  gsl_function f = { gsl_integrand_x, &p };
  double res = 0.0, abserr = 0.0, out;
  int status = gsl_integration_qags (&f, 0.0, x_max, 0.0, 1e-12, 500, w, &res, &abserr);
  if (status == GSL_SUCCESS && res > 0.0)
    out = lead + log (scale * p.s * res);
  else
    {
      gsl_function fz = { gsl_integrand_z, &p };
      status = gsl_integration_qagiu (&fz, 0.0, 0.0, 1e-10, 500, w, &res, &abserr);
      out = status == GSL_SUCCESS && res > 0.0 ? lead + log (scale * res) : NAN;
    }
  gsl_integration_workspace_free (w);
  return out;
}

double
tf_normal_prior_log_bf10 (double t, double n_eff, double df, double r)
{
  double g = r * r, t2 = t * t;

  if (!(isfinite (t) && n_eff > 0.0 && df > 0.0 && r > 0.0))
    return NAN;
  /* BF10(g) = (1 + N g)^(−½) R^(−(ν+1)/2), R = (ν + t²/(1 + N g)) / (ν + t²)
   * = 1 − c, c = t² q / (ν + t²), q = N g / (1 + N g); the ν → ∞ limit is e^(t² q/2). */
  double q = n_eff * g / (1.0 + n_eff * g), lr;
  if (isinf (df))
    lr = 0.5 * t2 * q;
  else
    {
      double c = t2 * q / (df + t2);
      lr = -0.5 * (df + 1.0) * (c < 0.5 ? log1p (-c) : log ((df + t2 * (1.0 - q)) / (df + t2)));
    }
  return -0.5 * log1p (n_eff * g) + lr;
}


/* ln P(T ≤ x) for T ~ t(ν), ν = ∞ the normal: ½ I_{ν/(ν+x²)}(ν/2, ½) below 0
 * (Abramowitz & Stegun 1964, 26.5.27), erfc in log form for the normal. */
static double
log_t_cdf (double x, double df)
{
  double tail;                  /* ln P(T ≤ −|x|) */
  if (isinf (df))
    tail = tf_log_normal_upper (fabs (x));
  else
    {
      double d = df + x * x;
      tail = tf_incbeta_log_lower (df / d, x * x / d, 0.5 * df, 0.5) - G_LN2;
    }
  return x <= 0.0 ? tail : log1p (-exp (tail));
}

/* ln P(side · δ > 0 | data, g = 1/z): under δ ~ N(0, g) with σ integrated out by
 * Jeffreys's prior, μ has a Student t posterior with ν + 1 degrees of freedom, and
 * P(δ > 0 | g) = T_{ν+1}(t √(N (ν + 1) / ((z + N) ν + t² z))), or Φ(t √(N/(z + N)))
 * for a known SD (the conjugate normal update, e.g. Gelman et al. 2013, §3.3). */
static double
log_side_prob (double t, double n_eff, double df, double z, int side)
{
  double u = isinf (df) ? t * sqrt (n_eff / (z + n_eff))
             : t * sqrt (n_eff * (df + 1.0) / ((z + n_eff) * df + t * t * z));
  return log_t_cdf (side * u, df + 1.0);
}

typedef struct {
  JzsParams p;
  double t, df, shift;
  int side;
} SideParams;

static double
side_log_integrand (const SideParams *sp, double x)
{
  const JzsParams *p = &sp->p;
  double ex = exp (x), z = p->s * (ex - 1.0), inv = 1.0 / (z + p->n);
  return x + 0.5 * log (p->n * inv) + log_ratio (p, z * inv) - p->half_r2 * z
         + log_side_prob (sp->t, p->n, sp->df, z, sp->side);
}

static double
side_integrand (double x, void *data)
{
  const SideParams *sp = data;
  return exp (side_log_integrand (sp, x) - sp->shift);
}

double
tf_jzs_log_bf_one_sided (double t, double n_eff, double df, double r, int side)
{
  SideParams sp = { .t = t, .df = df, .side = side >= 0 ? 1 : -1 };

  if (!(isfinite (t) && n_eff > 0.0 && df > 0.0 && r > 0.0))
    return NAN;
  /* BF±0 = BF10 P(±δ > 0 | data) / ½ (Morey & Wagenmakers 2014), and with the prior a
   * mixture over g, BF10 P(±δ > 0 | data) = ∫ BF10(g) P(±δ > 0 | data, g) IG(g) dg:
   * the integral of tf_jzs_log_bf10 with one more factor. */
  double lead, scale = setup (&sp.p, t, n_eff, df, r, &lead);
  double x_max = x_upper (&sp.p);
  /* the factor moves the bump (far to the right when the data point the other way):
   * find it on a grid, then adaptive Gauss–Kronrod (QUADPACK QAGP) split there */
  double best = -INFINITY, best_x = 0.0;
  for (int j = 0; j <= 32; j++)
    {
      double x = x_max * j / 32.0, v = side_log_integrand (&sp, x);
      if (v > best)
        {
          best = v;
          best_x = x;
        }
    }
  if (!isfinite (best))
    return NAN;
  sp.shift = best;
  double pts[3] = { 0.0, best_x, x_max }, res = 0.0, abserr = 0.0;
  gboolean inner = best_x > 0.0 && best_x < x_max;
  if (!inner)
    pts[1] = x_max;
  gsl_integration_workspace *w = gsl_integration_workspace_alloc (200);
  gsl_function f = { side_integrand, &sp };
  int status = gsl_integration_qagp (&f, pts, inner ? 3 : 2, 0.0, 1e-11, 200, w, &res, &abserr);
  gsl_integration_workspace_free (w);
  if (!(res > 0.0) || (status != GSL_SUCCESS && !(abserr < 1e-9 * res)))
    return NAN;
  return lead + best + log (2.0 * scale * sp.p.s * res);
}

double
tf_normal_prior_log_bf_one_sided (double t, double n_eff, double df, double r, int side)
{
  /* BF±0 = BF10 P(±δ > 0 | data) / ½ at the one g = r² */
  double l10 = tf_normal_prior_log_bf10 (t, n_eff, df, r);
  if (!isfinite (l10))
    return NAN;
  return l10 + G_LN2 + log_side_prob (t, n_eff, df, 1.0 / (r * r), side >= 0 ? 1 : -1);
}

void
tf_jzs_get_counts (guint64 *fast, guint64 *fallback)
{
  if (fast)
    *fast = n_fast;
  if (fallback)
    *fallback = n_fallback;
}
