/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_ewcs.c: entanglement wedge cross section of two intervals.
 * Derivation: doc/wedge_cross_section.md.  GPL-3.0-or-later.  */
#include <float.h>
#include <math.h>
#include <gsl/gsl_math.h>
#include "holent_ewcs.h"

/* 1 for the bulks handled here, 0 for known bulks we do not handle,
   -1 for values that are no bulk at all.  */
static int
supported (holent_bulk b)
{
  switch (b)
    {
    case HOLENT_BULK_POINCARE:
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
    case HOLENT_BULK_PLANAR_BTZ:
    case HOLENT_BULK_PLANAR_ROTATING_BTZ:
      return 1;
    case HOLENT_BULK_BTZ:
    case HOLENT_BULK_ROTATING_BTZ:
    case HOLENT_BULK_CONICAL_DEFECT:
      return 0;
    default:
      return -1;
    }
}

static int
check_bulk (const holent_geo_bg *bg)
{
  int k = supported (bg->bulk);
  if (k < 0)
    return HOLENT_EINVAL;
  return k ? HOLENT_SUCCESS : HOLENT_EUNSUP;
}

static int
is_circle (const holent_geo_bg *bg)
{
  return bg->bulk == HOLENT_BULK_GLOBAL_ADS
         || bg->bulk == HOLENT_BULK_THERMAL_ADS;
}

double
holent_ewcs_asinh_sqrt_exp (double lz)
{
  /* asinh(sqrt z) = log(sqrt z + sqrt(1 + z))
                   = lz/2 + log(1 + sqrt(1 + 1/z)) for large z.  */
  if (lz < 0.0)
    return asinh (exp (0.5 * lz));
  return 0.5 * lz + log (1.0 + sqrt (1.0 + exp (-lz)));
}

/* log of the chord function g(y) of one chiral half with inverse
   temperature beta (ignored in the vacua); y in (0, L) on a circle.  The
   constant factors cancel in every ratio used but are kept so that
   2 log(g/eps) is the regulated length of holent_geo.  */
static double
log_chord (const holent_geo_bg *bg, double beta, double y)
{
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
      return log (y);
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
      /* sin(pi y/L) = sin(pi (L - y)/L): evaluate on the shorter side so
         that arcs close to L keep their digits.  */
      if (y > 0.5 * bg->L)
        y = bg->L - y;
      return log (bg->L / M_PI * sin (M_PI * y / bg->L));
    default:
      return log (beta / M_PI) + holent_geo_lnsinh (M_PI * y / beta);
    }
}

static double
lncosh (double y)
{
  y = fabs (y);
  return y + log1p (exp (-2.0 * y)) - M_LN2;
}

static double
logaddexp (double u, double v)
{
  double hi = u > v ? u : v, lo = u > v ? v : u;
  return hi + log1p (exp (lo - hi));
}

/* The kernel of holent_ewcs_geodesic_point for validated input.  */
static void
geodesic_point (const holent_geo_bg *bg, double xP, double xQ, double s,
                double out[3])
{
  const double c = 0.5 * (xP + xQ), h = 0.5 * (xP - xQ);
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
      /* the semicircle of radius |h| about c at arc length s from its top */
      out[0] = 0.0;
      out[1] = c + h * tanh (s);
      out[2] = cosh (s) / fabs (h);
      return;
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
      {
        /* X(s) = (e^s P + e^-s Q)/|P - Q| on the hyperboloid, P, Q the
           boundary directions at angles phi_P, phi_Q.  */
        const double L = bg->L, d = M_PI * (xP - xQ) / L;
        const double phi = 2.0 * M_PI * c / L
                           + atan2 (tanh (s) * sin (d), cos (d));
        const double sh = sinh (s), cd = cos (d);
        double x = fmod (L * phi / (2.0 * M_PI), L);
        if (x < 0.0)
          x += L;
        if (x >= L)
          x = 0.0;
        out[0] = 0.0;
        out[1] = x;
        out[2] = 2.0 * M_PI / L * sqrt (sh * sh + cd * cd) / fabs (sin (d));
        return;
      }
    default:
      {
        /* BTZ embedding (Banados, Henneaux, Teitelboim and Zanelli 1993):
           T1 = sqrt(A) cosh(alpha), X1 = sqrt(A) sinh(alpha),
           T2 = sqrt(B) sinh(gamma), X2 = sqrt(B) cosh(gamma),
           alpha = r+ x - r- t, gamma = r+ t - r- x,
           A = (r^2 - r-^2)/(r+^2 - r-^2), B = A - 1.  The geodesic of the
           centred t = 0 points x = +-h is X(s) = (e^s P + e^-s Q)/N;
           tanh(alpha) = tanh(s) tanh(a), tanh(gamma) = -tanh(s) tanh(b),
           A = (cosh^2 s + sinh^2 a)/(sinh(a + b) sinh(a - b)),
           a = r+ h, b = r- h.  Written with log-cosh to survive long
           intervals.  */
        const double rp = M_PI * (1.0 / bg->beta_L + 1.0 / bg->beta_R);
        const double rm = M_PI * (1.0 / bg->beta_L - 1.0 / bg->beta_R);
        const double a = rp * h, b = rm * h, det = rp * rp - rm * rm;
        const double al = 0.5 * (lncosh (s + a) - lncosh (s - a));
        const double ga = -0.5 * (lncosh (s + b) - lncosh (s - b));
        const double logA = logaddexp (2.0 * lncosh (s),
                                       2.0 * holent_geo_lnsinh (fabs (a)))
                            - holent_geo_lnsinh (fabs (a + b))
                            - holent_geo_lnsinh (fabs (a - b));
        out[0] = (rm * al + rp * ga) / det;
        out[1] = c + (rp * al + rm * ga) / det;
        out[2] = sqrt (rm * rm + det * exp (logA));
        return;
      }
    }
}

int
holent_ewcs_geodesic_point (const holent_geo_bg *bg, double xP, double xQ,
                            double s, double out[3])
{
  int st;
  if (bg == NULL || out == NULL)
    return HOLENT_EINVAL;
  if ((st = check_bulk (bg)))
    return st;
  if (!isfinite (xP) || !isfinite (xQ) || !isfinite (s)
      || !isfinite (xP - xQ))
    return HOLENT_EINVAL;
  if (xP == xQ || (is_circle (bg) && fmod (xP - xQ, bg->L) == 0.0))
    return HOLENT_ECOINCIDE;
  geodesic_point (bg, xP, xQ, s, out);
  return HOLENT_SUCCESS;
}

/* Length of one interval [s, e]: 0 on success with *len > 0; E (may be
   NULL) gets the reason, argument ARG.  */
static int
interval_length (int circle, double L, double tol, double s, double e,
                 double *len, holent_err *err, int arg)
{
  double raw = e - s;
  if (fabs (raw) <= tol)
    return holent_err_set (err, HOLENT_EEMPTY, arg, HOLENT_NOINDEX,
                           "has zero length");
  if (!circle)
    {
      if (raw < 0.0)
        return holent_err_set (err, HOLENT_EDOM, arg, HOLENT_NOINDEX,
                               "must have start < end on a line");
      *len = raw;
      return HOLENT_SUCCESS;
    }
  if (raw >= L - tol)  /* the whole circle, or more */
    return holent_err_set (err, HOLENT_EDOM, arg, HOLENT_NOINDEX,
                           "must be shorter than the circle (L = %g)", L);
  raw = fmod (raw, L);        /* end before start: wraps through 0 */
  if (raw < 0.0)
    raw += L;
  if (raw <= tol || raw >= L - tol)
    return holent_err_set (err, HOLENT_EEMPTY, arg, HOLENT_NOINDEX,
                           "has zero length (modulo the circumference)");
  *len = raw;
  return HOLENT_SUCCESS;
}

static double
wrap (double x, double L)
{
  double y = fmod (x, L);
  if (y < 0.0)
    y += L;
  return y >= L ? 0.0 : y;
}

/* The pair laid out for the formulas: p = (first length, gap after it,
   second length, gap after that), x0 the start of the first interval,
   swap when B comes first on a line.  */
typedef struct
{
  int circle, swap;
  double L, x0, p[4];
} layout;

static const char *
bulk_word (holent_bulk b)
{
  switch (b)
    {
    case HOLENT_BULK_BTZ:
      return "btz";
    case HOLENT_BULK_ROTATING_BTZ:
      return "rotating_btz";
    case HOLENT_BULK_CONICAL_DEFECT:
      return "conical_defect";
    default:
      return "given";
    }
}

/* Validate A, B (arguments 1, 2 of holent_ewcs_check; bg is 0) and lay
   them out; the returned status is holent_ewcs_pair's, E (may be NULL)
   gets the reason.  */
static int
pair_layout (const holent_geo_bg *bg, const double A[2], const double B[2],
             layout *y, holent_err *e)
{
  int st;
  double tol, m, lA, lB;
  holent_err_clear (e);
  if (bg == NULL || A == NULL || B == NULL)
    return holent_err_set (e, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  if ((st = check_bulk (bg)))
    return holent_err_set (e, st, 0, HOLENT_NOINDEX,
                           "not implemented for the '%s' bulk (supported: "
                           "poincare, global_ads, thermal_ads, planar_btz, "
                           "planar_rotating_btz); see "
                           "doc/wedge_cross_section.md",
                           bulk_word (bg->bulk));
  for (int k = 0; k < 2; k++)
    {
      const double *X = k ? B : A;
      for (int j = 0; j < 2; j++)
        if (!isfinite (X[j]))
          {
            holent_err_set (e, isnan (X[j]) ? HOLENT_ENAN : HOLENT_EDOM,
                            k + 1, HOLENT_NOINDEX, "%s must be %s",
                            j ? "the end" : "the start",
                            isnan (X[j]) ? "a number, not NaN" : "finite");
            return HOLENT_EINVAL;
          }
    }
  y->circle = is_circle (bg);
  y->L = y->circle ? bg->L : 0.0;
  y->swap = 0;
  m = y->L;
  for (int k = 0; k < 2; k++)
    {
      m = fmax (m, fabs (A[k]));
      m = fmax (m, fabs (B[k]));
    }
  tol = 16.0 * DBL_EPSILON * m;
  /* each interval on its own scale first, so that a huge B does not make
     A look empty */
  for (int k = 0; k < 2; k++)
    {
      const double *X = k ? B : A;
      const double sk = fmax (y->L, fmax (fabs (X[0]), fabs (X[1])));
      if (!isfinite (X[1] - X[0]))
        {
          holent_err_set (e, HOLENT_EDOM, k + 1, HOLENT_NOINDEX,
                          "end - start overflows (coordinates too large)");
          return HOLENT_EINVAL;
        }
      if ((st = interval_length (y->circle, y->L, 16.0 * DBL_EPSILON * sk,
                                 X[0], X[1], k ? &lB : &lA, e, k + 1)))
        return st;
    }
  /* Pair errors name B, the second of the pair, and say both.  */
  static const char overlap[] = "A and B overlap (the two intervals must be "
                                "disjoint)";
  static const char touch[] = "A and B touch: E_W of adjacent intervals "
                              "diverges with the cutoff";
  /* On a line the first interval is the left one and p[3] is the total
     span (the chord of the outer geodesic).  */
  if (!y->circle)
    {
      y->swap = B[0] < A[0];
      const double *F = y->swap ? B : A, *S = y->swap ? A : B;
      const double gap = S[0] - F[1];
      if (gap < -tol)
        return holent_err_set (e, HOLENT_EOVERLAP, 2, HOLENT_NOINDEX,
                               overlap);
      if (gap <= tol)
        return holent_err_set (e, HOLENT_ECOINCIDE, 2, HOLENT_NOINDEX, touch);
      y->x0 = F[0];
      y->p[0] = y->swap ? lB : lA;
      y->p[1] = gap;
      y->p[2] = y->swap ? lA : lB;
      y->p[3] = y->p[0] + y->p[1] + y->p[2];
    }
  else
    {
      const double L = y->L;
      double ob = wrap (B[0] - A[0], L);
      if (ob > L - tol)
        ob = 0.0;
      const double d1 = ob - lA, d2 = L - ob - lB;
      if (d1 < -tol || d2 < -tol)
        return holent_err_set (e, HOLENT_EOVERLAP, 2, HOLENT_NOINDEX,
                               overlap);
      if (d1 <= tol || d2 <= tol)
        return holent_err_set (e, HOLENT_ECOINCIDE, 2, HOLENT_NOINDEX, touch);
      y->x0 = A[0];
      y->p[0] = lA;
      y->p[1] = d1;
      y->p[2] = lB;
      y->p[3] = d2;
    }
  return HOLENT_SUCCESS;
}

int
holent_ewcs_check (const holent_geo_bg *bg, const double A[2],
                   const double B[2], holent_err *e)
{
  layout y;
  holent_err tmp;
  if (e == NULL)
    e = &tmp;
  pair_layout (bg, A, B, &y, e);
  return e->status;
}

int
holent_ewcs_pair (const holent_geo_bg *bg, const double A[2],
                  const double B[2], holent_ewcs_result *res)
{
  int st;
  double lz[2], beta[2];
  layout y;
  if (res == NULL)
    return HOLENT_EINVAL;
  if ((st = pair_layout (bg, A, B, &y, NULL)))
    return st;
  const int circle = y.circle, swap = y.swap;
  const double L = y.L, x0 = y.x0, *p = y.p;

  /* Cross-ratios and the two points' arc-length parameters of each
     chiral half: with the boundary points a1 < a2 < b1 < b2,
       z = g(a2-a1) g(b2-b1) / (g(b1-a2) g(b2-a1)),
       s0 = sum/4 log[g(b1-a1) g(b2-b1) / (g(b2-a2) g(a2-a1))],
       s1 = sum/4 log[g(b1-a1) g(a2-a1) / (g(b2-a2) g(b2-b1))].  */
  beta[0] = bg->beta_L;
  beta[1] = bg->beta_R;
  res->s[0] = res->s[1] = 0.0;
  for (int k = 0; k < 2; k++)
    {
      const double g0 = log_chord (bg, beta[k], p[0]);
      const double g1 = log_chord (bg, beta[k], p[1]);
      const double g2 = log_chord (bg, beta[k], p[2]);
      const double g3 = log_chord (bg, beta[k], p[3]);
      const double g01 = log_chord (bg, beta[k], p[0] + p[1]);
      const double g12 = log_chord (bg, beta[k], p[1] + p[2]);
      lz[k] = g0 + g2 - g1 - g3;
      res->s[0] += 0.25 * (g01 + g2 - g12 - g0);
      res->s[1] += 0.25 * (g01 + g0 - g12 - g2);
    }
  res->shortest = fmin (fmin (p[0], p[1]), p[2]);
  if (circle)
    res->shortest = fmin (res->shortest, p[3]);
  res->log_z_L = lz[0];
  res->log_z_R = lz[1];
  res->z_L = exp (lz[0]);
  res->z_R = exp (lz[1]);
  res->length = holent_ewcs_asinh_sqrt_exp (lz[0])
                + holent_ewcs_asinh_sqrt_exp (lz[1]);
  res->E_connected = bg->c / 6.0 * res->length;
  /* The two-interval minimisation: connected when
     S(gaps) < S(A) + S(B), i.e. z_L z_R > 1; ties go to disconnected.  */
  res->connected = lz[0] + lz[1] > 0.0;
  res->E = res->connected ? res->E_connected : 0.0;

  /* The geodesics of the connected surface, in unwrapped coordinates:
     row 0 from x1 (end of the first) to x2 (start of the second), row 1
     from x3 (end of the second) to x0 (+ L on a circle).  */
  {
    const double x1 = x0 + p[0], x2 = x1 + p[1], x3 = x2 + p[2];
    const double xend = circle ? x0 + L : x0;
    double pt[2][3], gp[2][2], ss[2];
    geodesic_point (bg, x1, x2, res->s[0], pt[0]);
    geodesic_point (bg, x3, xend, res->s[1], pt[1]);
    gp[0][0] = x1;
    gp[0][1] = x2;
    gp[1][0] = x3;
    gp[1][1] = xend;
    ss[0] = res->s[0];
    ss[1] = res->s[1];
    for (int i = 0; i < 2; i++)
      {
        /* rows are "after A" then "after B": on a line with B on the
           left the internal order is the other way round */
        const int j = swap ? 1 - i : i;
        for (int k = 0; k < 3; k++)
          res->point[i][k] = pt[j][k];
        for (int k = 0; k < 2; k++)
          res->gap[i][k] = circle ? wrap (gp[j][k], L) : gp[j][k];
        res->s[i] = ss[j];
      }
  }
  return HOLENT_SUCCESS;
}
