/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_bcft.c: AdS3/BCFT geometry with end-of-the-world branes, the
 * exact minimiser over non-crossing configurations with brane endings,
 * and the two-sided Page curve.  Derivations: doc/bcft.md.  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <float.h>
#include <stdio.h>
#include <gsl/gsl_math.h>
#include "holent_bcft.h"
#include "holent_geo.h"
#include "holent_bg3.h"

/* ---- geometry ---------------------------------------------------- */

static void
set_bad (int *bad, int v)
{
  if (bad)
    *bad = v;
}

/* The one-sided and two-sided length kernels are those of holent_geo and
   holent_tfd, on the matching bulk.  */
static int
set_lengths (holent_bcft_bg *bg)
{
  int st;
  if (bg->btz)
    st = holent_geo_bg_init (&bg->geo, HOLENT_BULK_PLANAR_BTZ, 0.0, bg->eps,
                             bg->beta, bg->beta, 1.0, bg->c);
  else if (bg->kind == HOLENT_BCFT_INTERVAL)
    st = holent_geo_bg_init (&bg->geo, HOLENT_BULK_GLOBAL_ADS,
                             2.0 * bg->length, bg->eps, INFINITY, INFINITY,
                             1.0, bg->c);
  else
    st = holent_geo_bg_init (&bg->geo, HOLENT_BULK_POINCARE, 0.0, bg->eps,
                             INFINITY, INFINITY, 1.0, bg->c);
  if (!st && bg->kind == HOLENT_BCFT_TFD)
    st = holent_tfd_init (&bg->tfd, 0, 0.0, bg->eps, bg->beta, bg->c, 0.0);
  return st ? HOLENT_EDOM : HOLENT_SUCCESS;
}

int
holent_bcft_bg_init (holent_bcft_bg *bg, holent_bcft_kind kind,
                     double length, double eps, double beta, double T0,
                     double T1, double c, holent_bcft_saddle saddle,
                     int *bad)
{
  set_bad (bad, -1);
  if (bg == NULL)
    return HOLENT_EINVAL;
  if (kind != HOLENT_BCFT_HALF_LINE && kind != HOLENT_BCFT_INTERVAL
      && kind != HOLENT_BCFT_TFD)
    return HOLENT_EINVAL;
  if (saddle != HOLENT_BCFT_DOMINANT && saddle != HOLENT_BCFT_BTZ
      && saddle != HOLENT_BCFT_THERMAL_ADS)
    return (set_bad (bad, 6), HOLENT_EINVAL);
  const double in[6] = { length, eps, beta, T0, T1, c };
  for (int k = 0; k < 6; k++)
    if (isnan (in[k]))
      return (set_bad (bad, k), HOLENT_EINVAL);
  if (kind != HOLENT_BCFT_INTERVAL)
    {
      length = INFINITY;
      T1 = T0;
    }
  else if (!(length > 0.0 && isfinite (length)))
    return (set_bad (bad, 0), HOLENT_EDOM);
  if (!(eps > 0.0 && isfinite (eps)))
    return (set_bad (bad, 1), HOLENT_EDOM);
  if (!(beta > 0.0) || (kind == HOLENT_BCFT_TFD && !isfinite (beta)))
    return (set_bad (bad, 2), HOLENT_EDOM);
  if (!(fabs (T0) < 1.0) || (kind == HOLENT_BCFT_TFD && T0 < 0.0))
    return (set_bad (bad, 3), HOLENT_EDOM);
  if (!(fabs (T1) < 1.0))
    return (set_bad (bad, 4), HOLENT_EDOM);
  if (!(c > 0.0 && isfinite (c)))
    return (set_bad (bad, 5), HOLENT_EDOM);

  memset (bg, 0, sizeof *bg);
  bg->kind = kind;
  bg->length = length;
  bg->eps = eps;
  bg->beta = beta;
  bg->c = c;
  bg->T[0] = T0;
  bg->T[1] = T1;
  for (int k = 0; k < 2; k++)
    {
      bg->rho[k] = atanh (bg->T[k]);
      bg->log_g[k] = c / 6.0 * bg->rho[k];
    }
  bg->ell = 1.0;
  bg->G = 1.5 / c;
  bg->tension[0] = T0;
  bg->tension[1] = T1;
  bg->zh = isfinite (beta) ? beta / (2.0 * M_PI) : INFINITY;
  bg->z0 = INFINITY;
  bg->beta_c = NAN;
  bg->S_H = 0.0;

  if (kind != HOLENT_BCFT_INTERVAL)
    {
      bg->btz = isfinite (beta);
      bg->S_H = bg->btz ? INFINITY : 0.0;
      bg->pure = !bg->btz;
      return set_lengths (bg);
    }

  /* Interval: Hawking-Page with boundary entropy (doc/bcft.md):
     pi c l/(6 beta) + log g0 + log g1 = pi c beta/(24 l).  */
  double rs = bg->rho[0] + bg->rho[1];
  int equal = (T0 == T1);
  if (equal)
    bg->beta_c = 2.0 * length / M_PI * (rs + hypot (rs, M_PI));
  int btz;
  if (!isfinite (beta))
    {
      if (saddle == HOLENT_BCFT_BTZ)
        return (set_bad (bad, 2), HOLENT_EDOM);
      btz = 0;
    }
  else if (saddle == HOLENT_BCFT_DOMINANT)
    btz = equal ? (beta < bg->beta_c) : 1;
  else
    btz = (saddle == HOLENT_BCFT_BTZ);
  if (!btz && !equal)
    return (set_bad (bad, 4), HOLENT_EUNSUP);
  bg->btz = btz;
  if (btz)
    {
      double hl = length / bg->zh + rs;   /* horizon length between branes */
      if (!(hl > 0.0))
        return (set_bad (bad, 3), HOLENT_EDOM);
      bg->S_H = c / 6.0 * hl;
    }
  else
    bg->z0 = length / M_PI;
  bg->pure = !btz && !isfinite (beta);
  return set_lengths (bg);
}

/* ---- the constructor of ads3_background's BCFT states -------------- */

static int
option_scalar (holent_err *err, const char *name, double v, int positive)
{
  if (isnan (v))
    return holent_err_set (err, HOLENT_ENAN, -1, HOLENT_NOINDEX,
                           "'%s' must be a number, not NaN", name);
  if (positive && !(v > 0.0 && isfinite (v)))
    return holent_err_set (err, HOLENT_EDOM, -1, HOLENT_NOINDEX,
                           "'%s' must be finite and positive", name);
  return HOLENT_SUCCESS;
}

int
holent_bcft_bg_make (holent_bcft_bg *bg, const holent_bcft_spec *sp,
                     holent_err *err)
{
  holent_err_clear (err);
  if (bg == NULL || sp == NULL || (sp->nvalues > 0 && sp->values == NULL))
    return holent_err_set (err, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  int interval = sp->kind == HOLENT_BCFT_INTERVAL;
  const char *tname = sp->is_log_g ? "log_g" : "tension";
  if (interval == isnan (sp->length))
    return holent_err_set (err, HOLENT_EOPTION, -1, HOLENT_NOINDEX,
                           "option 'length' is %s", interval
                           ? "required on an interval"
                           : "for an interval only");
  if (sp->has_saddle && !interval)
    return holent_err_set (err, HOLENT_EOPTION, -1, HOLENT_NOINDEX,
                           "option 'saddle' applies to an interval only");
  if (!isnan (sp->beta) && !isnan (sp->T))
    return holent_err_set (err, HOLENT_EOPTION, -1, HOLENT_NOINDEX,
                           "give either 'beta' or 'T', not both");
  if (sp->kind == HOLENT_BCFT_TFD && isnan (sp->beta) && isnan (sp->T))
    return holent_err_set (err, HOLENT_EOPTION, -1, HOLENT_NOINDEX,
                           "the two-sided state needs 'beta' or 'T'");
  /* Brown-Henneaux c = 3 ell/(2G): the one rule, holent_bg3's */
  holent_bg3_spec u;
  memset (&u, 0, sizeof u);
  const double uv[3] = { sp->c, sp->G, sp->ell };
  const int up[3] = { HOLENT_BG3_C, HOLENT_BG3_G, HOLENT_BG3_ELL };
  for (int k = 0; k < 3; k++)
    if (!isnan (uv[k]))
      {
        u.given |= 1u << up[k];
        u.value[up[k]] = uv[k];
      }
  double c, G, ell;
  int st = holent_bg3_units (&u, &c, &G, &ell, err);
  if (st)
    return st;
  double eps = isnan (sp->cutoff) ? 1e-6 : sp->cutoff;
  double beta = INFINITY;   /* zero temperature unless given */
  if (!isnan (sp->beta))
    {
      if ((st = option_scalar (err, "beta", sp->beta, 1)))
        return st;
      beta = sp->beta;
    }
  else if (!isnan (sp->T))
    {
      if ((st = option_scalar (err, "T", sp->T, 1)))
        return st;
      beta = 1.0 / sp->T;
    }
  size_t want = interval ? 2 : 1;
  if (sp->nvalues > want)
    return holent_err_set (err, HOLENT_ESIZE, -1, HOLENT_NOINDEX,
                           "'%s' must be %s", tname, want == 2
                           ? "a scalar or one value per end (1 x 2)"
                           : "a scalar");
  double T[2] = { 0.0, 0.0 };
  for (size_t k = 0; k < 2 && sp->nvalues > 0; k++)
    {
      double v = sp->values[sp->nvalues == 1 ? 0 : k];
      if (isnan (v))
        return holent_err_set (err, HOLENT_ENAN, -1, HOLENT_NOINDEX,
                               "'%s' must not be NaN", tname);
      if (sp->is_log_g)
        {
          if (holent_bcft_tension_of_log_g (v, c, T + k))
            return holent_err_set (err, HOLENT_EDOM, -1, HOLENT_NOINDEX,
                                   "'log_g' = %g is beyond double precision "
                                   "(|T ell| rounds to 1)", v);
        }
      else
        T[k] = v * ell;
    }
  int bad;
  st = holent_bcft_bg_init (bg, sp->kind, interval ? sp->length : INFINITY,
                            eps, beta, T[0], T[1], c,
                            sp->has_saddle ? sp->saddle : HOLENT_BCFT_DOMINANT,
                            &bad);
  if (st == HOLENT_EINVAL && bad >= 0)
    st = HOLENT_ENAN;
  switch (st ? bad : -2)
    {
    case -2:
      break;
    case 0:
      return holent_err_set (err, st, -1, HOLENT_NOINDEX, "'length' must be "
                             "a finite positive interval length");
    case 1:
      return holent_err_set (err, st, -1, HOLENT_NOINDEX,
                             "'cutoff' must be finite and positive");
    case 2:
      if (sp->kind == HOLENT_BCFT_TFD)
        return holent_err_set (err, st, -1, HOLENT_NOINDEX, "the two-sided "
                               "geometry needs a finite positive 'beta' "
                               "(or 'T')");
      return holent_err_set (err, st, -1, HOLENT_NOINDEX, "'beta' must be "
                             "positive (Inf: zero temperature; the BTZ "
                             "saddle needs it finite)");
    case 3:
      if (sp->kind == HOLENT_BCFT_TFD)
        return holent_err_set (err, st, -1, HOLENT_NOINDEX, "'%s' must give "
                               "a tension in [0, 1/ell) for the two-sided "
                               "geometry (a negative-tension brane is "
                               "crossed by the geodesics through the "
                               "Einstein-Rosen bridge)", tname);
      return holent_err_set (err, st, -1, HOLENT_NOINDEX, "'%s' must give "
                             "|T| < 1/ell at each end (and, in a forced BTZ "
                             "saddle, branes that do not meet: length + "
                             "(beta/2pi)(rho0 + rho1) > 0)", tname);
    case 4:
      if (st == HOLENT_EUNSUP)
        return holent_err_set (err, st, -1, HOLENT_NOINDEX, "unequal "
                               "tensions at the two ends need the BTZ "
                               "saddle (finite beta): the thermal AdS "
                               "saddle has one connected brane of one "
                               "tension");
      return holent_err_set (err, st, -1, HOLENT_NOINDEX, "'%s' must give "
                             "|T| < 1/ell at each end", tname);
    case 5:
      return holent_err_set (err, st, -1, HOLENT_NOINDEX,
                             "'c' must be finite and positive");
    default:
      return holent_err_set (err, st, -1, HOLENT_NOINDEX, NULL);
    }
  bg->ell = ell;
  bg->G = G;
  for (int k = 0; k < 2; k++)
    bg->tension[k] = bg->T[k] / ell;
  return HOLENT_SUCCESS;
}

static const char *const kind_state[] = { "bcft", "bcft", "bcft_tfd" };
static const char *const kind_boundary[] = { "half_line", "interval",
                                             "half_line" };

int
holent_bcft_kind_of (const char *state, const char *boundary,
                     holent_bcft_kind *kind, holent_err *err)
{
  holent_err_clear (err);
  if (state == NULL || boundary == NULL || kind == NULL)
    return holent_err_set (err, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  int tfd = strcmp (state, "bcft_tfd") == 0;
  if (!tfd && strcmp (state, "bcft") != 0)
    return holent_err_set (err, HOLENT_EBACKGROUND, -1, HOLENT_NOINDEX,
                           "no BCFT state '%s'", state);
  for (int k = 0; k < 3; k++)
    if (strcmp (state, kind_state[k]) == 0
        && strcmp (boundary, kind_boundary[k]) == 0)
      {
        *kind = (holent_bcft_kind) k;
        return HOLENT_SUCCESS;
      }
  return holent_err_set (err, HOLENT_EBOUNDARY, -1, HOLENT_NOINDEX,
                         "BOUNDARY must be %s for the %s state, got '%s'",
                         tfd ? "'half_line'" : "'half_line' or 'interval'",
                         state, boundary);
}

int
holent_bcft_saddle_of (const char *name, holent_bcft_saddle *s,
                       holent_err *err)
{
  static const char *const names[] = { "dominant", "btz", "thermal_ads" };
  holent_err_clear (err);
  if (name == NULL || s == NULL)
    return holent_err_set (err, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  for (int k = 0; k < 3; k++)
    if (strcmp (name, names[k]) == 0 || (k == 0 && name[0] == '\0'))
      {
        *s = (holent_bcft_saddle) k;
        return HOLENT_SUCCESS;
      }
  return holent_err_set (err, HOLENT_EOPTION, -1, HOLENT_NOINDEX,
                         "'saddle' must be 'dominant', 'btz' or "
                         "'thermal_ads', got '%s'", name);
}

const char *
holent_bcft_state_name (const holent_bcft_bg *bg)
{
  return kind_state[bg->kind];
}

const char *
holent_bcft_boundary_name (const holent_bcft_bg *bg)
{
  return kind_boundary[bg->kind];
}

const char *
holent_bcft_bulk_name (const holent_bcft_bg *bg)
{
  if (bg->kind == HOLENT_BCFT_TFD)
    return "eternal_planar_btz";
  if (bg->btz)
    return "planar_btz";
  return bg->kind == HOLENT_BCFT_INTERVAL ? "thermal_ads" : "poincare";
}

const char *
holent_bcft_saddle_name (const holent_bcft_bg *bg)
{
  if (bg->btz)
    return "btz";
  return bg->kind == HOLENT_BCFT_INTERVAL ? "thermal_ads" : "";
}

const char *
holent_bcft_profile_text (const holent_bcft_bg *bg)
{
  if (bg->btz)
    return "sinh(x/zh) = -sinh(rho) z/zh from each end (x measured away "
           "from the BCFT), zh = beta/(2 pi)";
  if (bg->kind == HOLENT_BCFT_INTERVAL)
    return "sinh(r) sin(pi x/length) = -sinh(rho), cosh(r) = z0/z, "
           "z0 = length/pi: one brane joining both ends";
  return "x = -z sinh(rho)";
}

static int
in_domain (const holent_bcft_bg *bg, double x)
{
  if (isnan (x))
    return HOLENT_EINVAL;
  if (!(x > 0.0 && x < bg->length))
    return HOLENT_EDOM;
  return HOLENT_SUCCESS;
}

/* Unchecked kernel: the one-sided geodesic over a distance d.  */
static double
pair_len (const holent_bcft_bg *bg, double d)
{
  return holent_geo_len_unchecked (&bg->geo, d);
}

static double
brane_len (const holent_bcft_bg *bg, double x, int end, double *xb,
           double *zb)
{
  double rho, d, sh;
  if (bg->kind == HOLENT_BCFT_INTERVAL && !bg->btz)
    {
      /* One brane, sinh r sin(theta) = -sinh rho in the disc of the
         slice, theta = pi x / length (doc/bcft.md).  */
      rho = bg->rho[0];
      double th = M_PI * x / bg->length, ch = cosh (rho);
      sh = sinh (rho);
      double th2 = atan2 (-sh * sin (th), cos (th) * ch);
      if (th > M_PI_2 && th2 < 0.0)
        th2 += 2.0 * M_PI;
      if (xb)
        *xb = bg->z0 * th2;
      if (zb)
        *zb = bg->z0 * sin (th) / ch;
      return log (2.0 * bg->length / (M_PI * bg->eps) * sin (th)) + rho;
    }
  rho = bg->rho[end];
  d = end ? bg->length - x : x;
  sh = sinh (rho);
  if (!bg->btz)
    {
      if (xb)
        *xb = -d * bg->T[0];
      if (zb)
        *zb = d * sqrt (1.0 - bg->T[0] * bg->T[0]);
      return log (2.0 * d / bg->eps) + rho;
    }
  double u = d / bg->zh;
  double r = u < 350.0 ? sh / cosh (u) : 0.0;
  double s = tanh (u) / sqrt (1.0 + r * r);
  double off = bg->zh * asinh (-sh * s);
  if (xb)
    *xb = end ? bg->length - off : off;
  if (zb)
    *zb = bg->zh * s;
  return log (bg->beta / (M_PI * bg->eps))
         + holent_geo_lnsinh (2.0 * M_PI * d / bg->beta) + rho;
}

int
holent_bcft_pair_length (const holent_bcft_bg *bg, double x1, double x2,
                         double *len)
{
  if (bg == NULL || len == NULL)
    return HOLENT_EINVAL;
  int st = in_domain (bg, x1);
  if (!st)
    st = in_domain (bg, x2);
  if (st)
    return st;
  if (x1 == x2)
    return HOLENT_ECOINCIDE;
  *len = pair_len (bg, fabs (x2 - x1));
  return HOLENT_SUCCESS;
}

int
holent_bcft_brane_length (const holent_bcft_bg *bg, double x, int end,
                          double *len, double *xb, double *zb)
{
  if (bg == NULL || len == NULL || (end != 0 && end != 1))
    return HOLENT_EINVAL;
  if (end == 1 && bg->kind != HOLENT_BCFT_INTERVAL)
    return HOLENT_EINVAL;
  int st = in_domain (bg, x);
  if (st)
    return st;
  *len = brane_len (bg, x, end, xb, zb);
  return HOLENT_SUCCESS;
}

int
holent_bcft_tension_of_log_g (double log_g, double c, double *T)
{
  if (T == NULL || isnan (log_g) || isnan (c))
    return HOLENT_EINVAL;
  if (!(c > 0.0 && isfinite (c)))
    return HOLENT_EDOM;
  double v = tanh (6.0 * log_g / c);
  if (!(fabs (v) < 1.0))
    return HOLENT_EDOM;
  *T = v;
  return HOLENT_SUCCESS;
}

static int brane_x_unit (const holent_bcft_bg *bg, int end, double z,
                         double *x);

int
holent_bcft_brane_x (const holent_bcft_bg *bg, int end, double z, double *x)
{
  if (bg == NULL || x == NULL)
    return HOLENT_EINVAL;
  /* depths and the profile in units of ell, as the Octave struct */
  int st = brane_x_unit (bg, end, z / bg->ell, x);
  if (!st)
    *x *= bg->ell;
  return st;
}

static int
brane_x_unit (const holent_bcft_bg *bg, int end, double z, double *x)
{
  if (bg == NULL || x == NULL || isnan (z) || (end != 0 && end != 1))
    return HOLENT_EINVAL;
  if (end == 1 && bg->kind != HOLENT_BCFT_INTERVAL)
    return HOLENT_EINVAL;
  if (!(z > 0.0))
    return HOLENT_EDOM;
  if (bg->kind == HOLENT_BCFT_INTERVAL && !bg->btz)
    {
      /* sinh r sin(theta) = -sinh rho with cosh r = z0/z */
      double sh = sinh (bg->rho[0]), z0 = bg->z0;
      if (!(z <= z0 / cosh (bg->rho[0])))
        return HOLENT_EDOM;
      double s = -sh * z / sqrt ((z0 - z) * (z0 + z));
      s = s > 1.0 ? 1.0 : (s < -1.0 ? -1.0 : s);
      double off = z0 * asin (s);
      *x = end ? bg->length - off : off;
      return HOLENT_SUCCESS;
    }
  double sh = sinh (bg->rho[end]);
  if (!bg->btz)
    {
      if (!isfinite (z))
        return HOLENT_EDOM;
      *x = -z * sh;
      return HOLENT_SUCCESS;
    }
  if (!isfinite (z) || (bg->kind != HOLENT_BCFT_TFD && z > bg->zh))
    return HOLENT_EDOM;
  double off = bg->zh * asinh (-sh * z / bg->zh);
  *x = end ? bg->length - off : off;
  return HOLENT_SUCCESS;
}

double
holent_bcft_brane_side (const holent_bcft_bg *bg, int end, double x,
                        double z)
{
  double xb;
  if (bg->kind == HOLENT_BCFT_INTERVAL && !bg->btz)
    {
      /* sinh r sin(theta) + sinh rho, cosh r = z0/z */
      double c = bg->z0 / z;
      return sqrt ((c - 1.0) * (c + 1.0)) * sin (x / bg->z0)
             + sinh (bg->rho[0]);
    }
  if (brane_x_unit (bg, end, z, &xb))
    return NAN;
  return end ? xb - x : x - xb;
}

double
holent_bcft_mirror (const holent_bcft_bg *bg, int end, double x)
{
  return end && bg->kind == HOLENT_BCFT_INTERVAL && bg->btz
         ? 2.0 * bg->length - x : -x;
}

/* ---- regions ------------------------------------------------------ */

typedef struct
{
  double a, b;
  size_t row;
} row_t;

struct holent_bcft_workspace
{
  size_t nmax, M;          /* rows, endpoints (2 nmax)                   */
  row_t *rows;
  double *start, *end, *pts;
  double *C;               /* M x M pair lengths                          */
  double *lc, *rc;         /* single costs: left/one brane, right/bridge  */
  double *P;               /* (M+1)^2 full pairings of [i, j)              */
  int *Pch;
  double *F;               /* (M+1) x 2 prefix with parity of L singles   */
  int *Fch;
  double *G;               /* (M+1) x (M+1) suffix with k R singles       */
  int *Gch;
  double *A;               /* M+1 page costs A_k                          */
  size_t *nbk;             /* brane endings of the A_k minimiser          */
  size_t *pairs, *brane;
  int *bend;
  double *bx, *bz, *bpt;
  double *ipair;           /* island configuration's pairs (coordinates) */
  size_t n_ipair;
  size_t *bridge;          /* page configuration: bridge endings          */
  double *cbx, *cbz;       /* and its landing points                      */
  /* state of the last call */
  size_t m, n, kmax, pg_m;
  int c0;
  int page_ok;             /* the DP tables are a page_prepare's          */
};

holent_bcft_workspace *
holent_bcft_workspace_alloc (size_t nmax)
{
  if (nmax == 0 || nmax > HOLENT_BCFT_MMAX / 2)
    return NULL;
  holent_bcft_workspace *w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  size_t M = 2 * nmax, M1 = M + 1;
  w->nmax = nmax;
  w->M = M;
  w->rows = malloc (nmax * sizeof *w->rows);
  w->start = malloc (nmax * sizeof (double));
  w->end = malloc (nmax * sizeof (double));
  w->pts = malloc (M * sizeof (double));
  w->C = malloc (M * M * sizeof (double));
  w->lc = malloc (M * sizeof (double));
  w->rc = malloc (M * sizeof (double));
  w->P = malloc (M1 * M1 * sizeof (double));
  w->Pch = malloc (M1 * M1 * sizeof (int));
  w->F = malloc (M1 * 2 * sizeof (double));
  w->Fch = malloc (M1 * 2 * sizeof (int));
  w->G = malloc (M1 * M1 * sizeof (double));
  w->Gch = malloc (M1 * M1 * sizeof (int));
  w->A = malloc (M1 * sizeof (double));
  w->nbk = malloc (M1 * sizeof (size_t));
  w->pairs = malloc (M * sizeof (size_t));
  w->brane = malloc (M * sizeof (size_t));
  w->bend = malloc (M * sizeof (int));
  w->bx = malloc (M * sizeof (double));
  w->bz = malloc (M * sizeof (double));
  w->bpt = malloc (M * sizeof (double));
  w->ipair = malloc (M * sizeof (double));
  w->bridge = malloc (M * sizeof (size_t));
  w->cbx = malloc (M * sizeof (double));
  w->cbz = malloc (M * sizeof (double));
  if (!w->rows || !w->start || !w->end || !w->pts || !w->C || !w->lc
      || !w->rc || !w->P || !w->Pch || !w->F || !w->Fch || !w->G || !w->Gch
      || !w->A || !w->nbk || !w->pairs || !w->brane || !w->bend || !w->bx
      || !w->bz || !w->bpt || !w->ipair || !w->bridge || !w->cbx
      || !w->cbz)
    {
      holent_bcft_workspace_free (w);
      return NULL;
    }
  return w;
}

void
holent_bcft_workspace_free (holent_bcft_workspace *w)
{
  if (w == NULL)
    return;
  free (w->rows); free (w->start); free (w->end); free (w->pts);
  free (w->C); free (w->lc); free (w->rc); free (w->P); free (w->Pch);
  free (w->F); free (w->Fch); free (w->G); free (w->Gch); free (w->A);
  free (w->nbk); free (w->pairs); free (w->brane); free (w->bend);
  free (w->bx); free (w->bz); free (w->bpt); free (w->ipair);
  free (w->bridge); free (w->cbx); free (w->cbz);
  free (w);
}

static int
cmp_rows (const void *p, const void *q)
{
  const row_t *r = p, *s = q;
  if (r->a != s->a)
    return r->a < s->a ? -1 : 1;
  return r->row < s->row ? -1 : (r->row > s->row);
}

/* What a row of a region must be on this background.  */
static const char *
row_domain (const holent_bcft_bg *bg, char *buf, size_t sz)
{
  if (bg->kind == HOLENT_BCFT_TFD)
    return "must lie on x > 0 (a radiation region may not touch the "
           "boundary x = 0 of the BCFT) with start < end";
  if (bg->kind == HOLENT_BCFT_INTERVAL)
    {
      snprintf (buf, sz, "must lie in the BCFT's interval [0, %g] with "
                "start < end", bg->length);
      return buf;
    }
  return "must lie on the half line x >= 0 (not past its boundary) with "
         "start < end";
}

/* Check, sort and merge the rows; set the endpoints that need a surface
   and c0 (the region starts at the BCFT's boundary).  */
static int
normalise (holent_bcft_workspace *w, const holent_bcft_bg *bg, size_t n,
           const double *a, const double *b, int allow_inf, size_t *nshort,
           holent_err *err)
{
  char buf[96];
  if (n == 0)
    return holent_err_set (err, HOLENT_EEMPTY, 0, HOLENT_NOINDEX,
                           "has no intervals");
  if (n > w->nmax)
    return holent_err_set (err, HOLENT_ETOOBIG, 0, HOLENT_NOINDEX,
                           "has more than %zu rows", w->nmax);
  for (size_t i = 0; i < n; i++)
    {
      double ai = a[i], bi = b[i];
      if (isnan (ai) || isnan (bi))
        return holent_err_set (err, HOLENT_ENAN, 0, i,
                               "must be a number, not NaN");
      if (ai == INFINITY || (bi == INFINITY && !allow_inf))
        return holent_err_set (err, HOLENT_EDOM, 0, i, allow_inf
                               ? "must be finite (only an end may be Inf)"
                               : "must be finite");
      /* a radiation region (allow_inf) lies on x > 0: 0 is the boundary */
      if (ai < 0.0 || (allow_inf && ai == 0.0) || bi < ai || bi > bg->length)
        return holent_err_set (err, HOLENT_EDOM, 0, i, "%s",
                               row_domain (bg, buf, sizeof buf));
      if (ai == bi)
        return holent_err_set (err, HOLENT_EEMPTY, 0, i,
                               "is a zero-length interval");
      w->rows[i].a = ai;
      w->rows[i].b = bi;
      w->rows[i].row = i;
    }
  qsort (w->rows, n, sizeof *w->rows, cmp_rows);
  size_t k = 0;
  w->start[0] = w->rows[0].a;
  w->end[0] = w->rows[0].b;
  for (size_t i = 1; i < n; i++)
    {
      if (w->rows[i].a < w->end[k])
        return holent_err_set (err, HOLENT_EOVERLAP, 0, w->rows[i].row,
                               "overlaps another row (intervals of a region "
                               "must be disjoint; touching ones are "
                               "merged)");
      if (w->rows[i].a == w->end[k])   /* touching: merge */
        w->end[k] = w->rows[i].b;
      else
        {
          k++;
          w->start[k] = w->rows[i].a;
          w->end[k] = w->rows[i].b;
        }
    }
  w->n = k + 1;
  size_t m = 0;
  w->c0 = 0;
  for (size_t i = 0; i < w->n; i++)
    {
      if (w->start[i] > 0.0)
        w->pts[m++] = w->start[i];
      else
        w->c0 = 1;
      if (w->end[i] < bg->length)
        w->pts[m++] = w->end[i];
    }
  w->m = m;
  /* segments next to the cutoff: gaps, intervals and distances to an end */
  size_t ns = 0;
  double prev = 0.0;
  for (size_t i = 0; i < m; i++)
    {
      if (w->pts[i] - prev <= 2.0 * bg->eps)
        ns++;
      prev = w->pts[i];
    }
  if (m > 0 && isfinite (bg->length) && bg->length - prev <= 2.0 * bg->eps)
    ns++;
  *nshort = ns;
  return HOLENT_SUCCESS;
}

/* ---- the dynamic programme ---------------------------------------- */

#define IX(i, j) ((i) * (w->M + 1) + (j))

/* Full non-crossing pairings of [i, j) in P; prefix F with L singles
   (parity), suffix G with exactly k R singles, k <= kmax.  Singles are
   never inside a pair (they would cross it).  */
/* Count STEP more elementary steps; ask the poll every ~1e5.  */
static int
poll_step (const holent_poll *poll, double *done, double *next, double step,
           double total)
{
  *done += step;
  if (*done < *next)
    return 0;
  *next = *done + 1e5;
  return poll && poll->fn && poll->fn (poll->ctx, *done, total);
}

/* Least cost of pairing endpoint i with a partner k in (i, j), k - i odd:
   the geodesic i-k, the full pairing inside it, and OUT[(k + 1) (M + 1)]
   after it (a column of P or G); BEST the cost without a partner.  *ARG
   gets the partner, -1 for none.  */
static double
best_partner (const holent_bcft_workspace *w, size_t i, size_t j,
              const double *out, double best, int *arg)
{
  const double *C = w->C;
  size_t M = w->M;
  *arg = -1;
  for (size_t k = i + 1; k < j; k += 2)
    {
      double v = C[i * M + k] + w->P[IX (i + 1, k)] + out[(k + 1) * (M + 1)];
      if (v < best)
        {
          best = v;
          *arg = (int) k;
        }
    }
  return best;
}

static int
run_dp (holent_bcft_workspace *w, size_t kmax, const holent_poll *poll)
{
  size_t m = w->m, M = w->M;
  const double *C = w->C;
  /* progress in elementary steps: m^3/24 for P, m^2 (kmax + 1)/4 for G */
  double md = (double) m, total = md * md * md / 24.0
                                   + md * md * ((double) kmax + 1.0) / 4.0;
  double done = 0.0, next = 1e5;
  for (size_t i = 0; i <= m; i++)
    w->P[IX (i, i)] = 0.0;
  for (size_t len = 2; len <= m; len += 2)
    {
      if (poll_step (poll, &done, &next,
                     (double) (m - len + 1) * (double) len / 2.0, total))
        return HOLENT_EINTR;
    for (size_t i = 0; i + len <= m; i++)
      {
        size_t j = i + len;
        w->P[IX (i, j)] = best_partner (w, i, j, w->P + j, INFINITY,
                                        w->Pch + IX (i, j));
      }
    }
  w->F[0] = 0.0;
  w->F[1] = INFINITY;
  for (size_t i = 1; i <= m; i++)
    {
      size_t q = i - 1;
      for (int par = 0; par < 2; par++)
        {
          double best = w->F[2 * (i - 1) + (par ^ 1)] + w->lc[q];
          int arg = -1;
          for (size_t j = (q % 2) ? 0 : 1; j < q; j += 2)  /* q - j odd */
            {
              double v = w->F[2 * j + par] + C[j * M + q] + w->P[IX (j + 1, q)];
              if (v < best)
                {
                  best = v;
                  arg = (int) j;
                }
            }
          w->F[2 * i + par] = best;
          w->Fch[2 * i + par] = arg;
        }
    }
  for (size_t k = 0; k <= kmax; k++)
    w->G[IX (m, k)] = k ? INFINITY : 0.0;
  for (size_t ii = m; ii-- > 0;)
    {
      if (poll_step (poll, &done, &next,
                     (double) (m - ii) * ((double) kmax + 1.0) / 2.0, total))
        return HOLENT_EINTR;
    for (size_t k = 0; k <= kmax; k++)
      w->G[IX (ii, k)] = best_partner (
          w, ii, m, w->G + k,
          k ? w->G[IX (ii + 1, k - 1)] + w->rc[ii] : INFINITY,
          w->Gch + IX (ii, k));
    }
  return HOLENT_SUCCESS;
}

/* Walk the choices back: pairs and singles (end 0: L, 1: R).  */
static void
add_full (holent_bcft_workspace *w, size_t i, size_t j, size_t *np)
{
  while (i < j)
    {
      size_t k = (size_t) w->Pch[IX (i, j)];
      w->pairs[2 * *np] = i;
      w->pairs[2 * *np + 1] = k;
      (*np)++;
      add_full (w, i + 1, k, np);   /* depth <= m/2 */
      i = k + 1;
    }
}

static void
reconstruct (holent_bcft_workspace *w, size_t isplit, int par, size_t k,
             size_t *np, size_t *nb)
{
  size_t i = isplit;
  *np = *nb = 0;
  while (i > 0)
    {
      int ch = w->Fch[2 * i + par];
      if (ch < 0)
        {
          w->brane[*nb] = i - 1;
          w->bend[(*nb)++] = 0;
          par ^= 1;
          i--;
        }
      else
        {
          size_t j = (size_t) ch;
          w->pairs[2 * *np] = j;
          w->pairs[2 * *np + 1] = i - 1;
          (*np)++;
          add_full (w, j + 1, i - 1, np);
          i = j;
        }
    }
  i = isplit;
  while (i < w->m)
    {
      int ch = w->Gch[IX (i, k)];
      if (ch < 0)
        {
          w->brane[*nb] = i;
          w->bend[(*nb)++] = 1;
          k--;
          i++;
        }
      else
        {
          size_t j = (size_t) ch;
          w->pairs[2 * *np] = i;
          w->pairs[2 * *np + 1] = j;
          (*np)++;
          add_full (w, i + 1, j, np);
          i = j + 1;
        }
    }
}

static void
fill_costs (holent_bcft_workspace *w, const holent_bcft_bg *bg, int right)
{
  size_t m = w->m, M = w->M;
  for (size_t i = 0; i < m; i++)
    {
      for (size_t j = i + 1; j < m; j += 2)  /* only odd j - i is read */
        w->C[i * M + j] = pair_len (bg, w->pts[j] - w->pts[i]);
      w->lc[i] = brane_len (bg, w->pts[i], 0, NULL, NULL);
      w->rc[i] = right ? brane_len (bg, w->pts[i], 1, NULL, NULL) : INFINITY;
    }
}

/* Least F + G over the split i and parity par with exactly k right
   singles; hor >= 0 keeps the splits whose horizon face (c0 ^ par) is in
   the homology region (hor 1) or not (hor 0).  Ties go to the first.  */
static double
best_split (const holent_bcft_workspace *w, size_t k, int hor, size_t *bi,
            int *bp)
{
  double best = INFINITY;
  for (size_t i = 0; i <= w->m; i++)
    for (int par = 0; par < 2; par++)
      {
        if (hor >= 0 && (w->c0 ^ par) != hor)
          continue;
        double v = w->F[2 * i + par] + w->G[IX (i, k)];
        if (v < best)
          {
            best = v;
            *bi = i;
            *bp = par;
          }
      }
  return best;
}

/* Shared start of the region minimisers: check, normalise, run the DP.  */
static int
prepare (holent_bcft_workspace *w, const holent_bcft_bg *bg, size_t n,
         const double *a, const double *b, int tfd, size_t kmax, int right,
         size_t *ns, holent_err *err, const holent_poll *poll)
{
  holent_err_clear (err);
  if (w == NULL || bg == NULL || a == NULL || b == NULL)
    return holent_err_set (err, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  if ((bg->kind == HOLENT_BCFT_TFD) != tfd)
    return holent_err_set (err, HOLENT_EUNSUP, -1, HOLENT_NOINDEX, tfd
                           ? "BG must be a two-sided background, "
                             "ads3_background (\"bcft_tfd\", \"half_line\", "
                             "...)"
                           : "BG is two-sided: use page_curve for its "
                             "radiation regions");
  w->page_ok = 0;
  int st = normalise (w, bg, n, a, b, tfd, ns, err);
  if (st)
    return st;
  fill_costs (w, bg, right);
  for (size_t i = 0; tfd && i < w->m; i++)
    w->rc[i] = 0.0;
  st = run_dp (w, kmax ? w->m : 0, poll);
  return st ? holent_err_set (err, st, -1, HOLENT_NOINDEX, NULL) : st;
}

/* The fields of *res that point into w, the counts and the length; the
   rest zero.  */
static void
fill_result (holent_bcft_result *res, const holent_bcft_workspace *w,
             double length, size_t np, size_t nb, const double *bx,
             const double *bz)
{
  memset (res, 0, sizeof *res);
  res->length = length;
  res->m = w->m;
  res->npairs = np;
  res->nbrane = nb;
  res->pts = w->pts;
  res->pairs = w->pairs;
  res->brane = w->brane;
  res->brane_end = w->bend;
  res->brane_x = bx;
  res->brane_z = bz;
  res->bridge = w->bridge;
  res->start = w->start;
  res->end = w->end;
  res->n = w->n;
}

int
holent_bcft_entropy (holent_bcft_workspace *w, const holent_bcft_bg *bg,
                     size_t n, const double *a, const double *b,
                     holent_bcft_result *res, holent_err *err,
                     const holent_poll *poll)
{
  size_t ns;
  int right = bg != NULL && bg->kind == HOLENT_BCFT_INTERVAL && bg->btz;
  if (res == NULL)
    return holent_err_set (err, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  int st = prepare (w, bg, n, a, b, 0, (size_t) right, right, &ns, err,
                    poll);
  if (st)
    return st;
  size_t kmax = right ? w->m : 0;
  /* The face between the last L and the first R single holds the
     horizon; it lies in the homology region when c0 ^ parity.  */
  double hlen = bg->btz ? bg->S_H * 6.0 / bg->c : 0.0;
  double best = INFINITY;
  size_t bi = 0, bk = 0;
  int bp = 0, bh = 0;
  for (int hor = 0; hor < 2; hor++)      /* ties go to no horizon */
    for (size_t k = 0; k <= kmax; k++)
      {
        size_t i;
        int par;
        double v = best_split (w, k, hor, &i, &par)
                   + (hor && hlen > 0.0 ? hlen : 0.0);
        if (v < best)
          {
            best = v;
            bi = i;
            bp = par;
            bk = k;
            bh = hor;
          }
      }
  if (!(best < INFINITY))   /* unbounded horizon (cannot happen for rows) */
    return holent_err_set (err, HOLENT_EINTERNAL, -1, HOLENT_NOINDEX, NULL);
  size_t np, nb;
  reconstruct (w, bi, bp, bk, &np, &nb);
  for (size_t q = 0; q < nb; q++)
    (void) brane_len (bg, w->pts[w->brane[q]], w->bend[q], w->bx + q,
                      w->bz + q);
  int hor = bh && hlen > 0.0;
  fill_result (res, w, hor ? best - hlen : best, np, nb, w->bx, w->bz);
  res->horizon = hor;
  res->S = bg->c / 6.0 * res->length + (hor ? bg->S_H : 0.0);
  res->n_short = ns;
  return HOLENT_SUCCESS;
}

/* ---- runner-up: brute force over the same candidates ---------------- */

typedef struct
{
  const holent_bcft_workspace *w;
  double hlen;
  int code[HOLENT_BCFT_RUNNER_MMAX];    /* partner, -1 left, -2 right  */
  int cmin[HOLENT_BCFT_RUNNER_MMAX];    /* the minimiser               */
  int cbest[HOLENT_BCFT_RUNNER_MMAX];
  size_t stack[HOLENT_BCFT_RUNNER_MMAX];
  double best;
  int found;
} runner_ctx;

/* Every configuration of the DP (run_dp): pairs without crossings, brane
   singles outside every pair, the left ones before the right ones; the
   horizon where the face after the last left single (parity) is in the
   homology region.  */
static void
runner_walk (runner_ctx *c, size_t i, int phase, size_t depth, size_t nl,
             double cost)
{
  const holent_bcft_workspace *w = c->w;
  size_t m = w->m;
  if (!(cost < INFINITY))
    return;
  if (i == m)
    {
      if (depth)
        return;
      double v = cost + ((w->c0 ^ (int) (nl & 1)) ? c->hlen : 0.0);
      if (!(v < c->best) || memcmp (c->code, c->cmin, m * sizeof (int)) == 0)
        return;
      c->best = v;
      c->found = 1;
      memcpy (c->cbest, c->code, m * sizeof (int));
      return;
    }
  if (depth == 0 && phase == 0)
    {
      c->code[i] = -1;
      runner_walk (c, i + 1, 0, 0, nl + 1, cost + w->lc[i]);
    }
  if (depth == 0)
    {
      c->code[i] = -2;
      runner_walk (c, i + 1, 1, 0, nl, cost + w->rc[i]);
    }
  if (depth > 0 && (i - c->stack[depth - 1]) % 2 == 1)
    {
      size_t j = c->stack[depth - 1];
      c->code[i] = (int) j;
      c->code[j] = (int) i;
      runner_walk (c, i + 1, phase, depth - 1, nl,
                   cost + w->C[j * w->M + i]);
      c->stack[depth - 1] = j;
    }
  if (m - i > depth + 1)
    {
      c->stack[depth] = i;
      runner_walk (c, i + 1, phase, depth + 1, nl, cost);
    }
}

int
holent_bcft_runner_up (holent_bcft_workspace *w, const holent_bcft_bg *bg,
                       holent_bcft_result *res)
{
  if (w == NULL || bg == NULL || res == NULL || res->pts != w->pts)
    return HOLENT_EINVAL;
  size_t m = w->m;
  if (m > HOLENT_BCFT_RUNNER_MMAX)
    return HOLENT_ETOOBIG;
  runner_ctx c;
  memset (&c, 0, sizeof c);
  c.w = w;
  /* an unbounded horizon (half line) is no candidate */
  c.hlen = bg->btz ? bg->S_H * 6.0 / bg->c : 0.0;
  c.best = INFINITY;
  for (size_t q = 0; q < res->npairs; q++)
    {
      c.cmin[res->pairs[2 * q]] = (int) res->pairs[2 * q + 1];
      c.cmin[res->pairs[2 * q + 1]] = (int) res->pairs[2 * q];
    }
  for (size_t q = 0; q < res->nbrane; q++)
    c.cmin[res->brane[q]] = res->brane_end[q] ? -2 : -1;
  runner_walk (&c, 0, 0, 0, 0, 0.0);
  if (!c.found)
    return HOLENT_EDOM;   /* a single candidate */
  size_t np = 0, nb = 0, nl = 0;
  for (size_t i = 0; i < m; i++)
    if (c.cbest[i] < 0)
      {
        w->brane[nb] = i;
        w->bend[nb] = c.cbest[i] == -2;
        nl += c.cbest[i] == -1;
        (void) brane_len (bg, w->pts[i], w->bend[nb], w->bx + nb, w->bz + nb);
        nb++;
      }
    else if ((size_t) c.cbest[i] > i)
      {
        w->pairs[2 * np] = i;
        w->pairs[2 * np + 1] = (size_t) c.cbest[i];
        np++;
      }
  int hor = c.hlen > 0.0 && (w->c0 ^ (int) (nl & 1));
  res->horizon = hor;
  res->length = hor ? c.best - c.hlen : c.best;
  res->S = bg->c / 6.0 * res->length + (hor ? bg->S_H : 0.0);
  res->npairs = np;
  res->nbrane = nb;
  return HOLENT_SUCCESS;
}

/* ---- Page curve ---------------------------------------------------- */

/* Cost of one bridge geodesic per side at time t: half the length of
   holent_tfd's geodesic from (x, t) on the left to (x, t) on the right
   (independent of x).  */
static double
bridge_half (const holent_bcft_bg *bg, double t)
{
  double len;
  if (holent_tfd_cross_length (&bg->tfd, 0.0, t, 0.0, t, &len))
    return INFINITY;
  return 0.5 * len;
}

int
holent_bcft_page_prepare (holent_bcft_workspace *w, const holent_bcft_bg *bg,
                          size_t n, const double *a, const double *b,
                          holent_bcft_page *pg, holent_err *err,
                          const holent_poll *poll)
{
  size_t ns;
  if (pg == NULL)
    return holent_err_set (err, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  /* bridge singles cost 0 here: k h(t) is added at eval */
  int st = prepare (w, bg, n, a, b, 1, 1, 0, &ns, err, poll);
  if (st)
    return st;
  size_t m = w->m;
  /* A_k: best one-sided configuration with k bridge geodesics; the
     two-sided minimum is attained by a left-right symmetric one.  */
  for (size_t k = 0; k <= m; k++)
    {
      size_t bi = 0;
      int bp = 0;
      double best = best_split (w, k, -1, &bi, &bp);
      w->A[k] = best;
      w->nbk[k] = 0;
      if (best < INFINITY)
        {
          size_t np, nb;
          reconstruct (w, bi, bp, k, &np, &nb);
          size_t cnt = 0;
          for (size_t q = 0; q < nb; q++)
            cnt += w->bend[q] == 0;
          w->nbk[k] = cnt;
          if (k == 0)
            {
              for (size_t q = 0; q < nb; q++)
                {
                  w->bpt[q] = w->pts[w->brane[q]];
                  (void) brane_len (bg, w->bpt[q], 0, w->bx + q, w->bz + q);
                }
              for (size_t q = 0; q < 2 * np; q++)
                w->ipair[q] = w->pts[w->pairs[q]];
              w->n_ipair = np;
            }
        }
    }
  w->pg_m = m;
  w->page_ok = 1;
  memset (pg, 0, sizeof *pg);
  pg->m = m;
  pg->h0 = bridge_half (bg, 0.0);
  pg->S_island = bg->c / 3.0 * w->A[0];
  pg->n_island = w->nbk[0];
  pg->island_x = w->bx;
  pg->island_z = w->bz;
  pg->island_pt = w->bpt;
  pg->n_island_pairs = w->n_ipair;
  pg->island_pairs = w->ipair;
  pg->n_short = ns;
  /* A_0 <= A_k + k h  for every k >= 1  iff  h >= max (A_0 - A_k)/k.  */
  double hp = -INFINITY;
  for (size_t k = 1; k <= m; k++)
    if (w->A[k] < INFINITY)
      {
        double v = (w->A[0] - w->A[k]) / (double) k;
        if (v > hp)
          hp = v;
      }
  double y = hp - pg->h0;
  pg->page_time = 0.0;
  if (y > 0.0)   /* h(t) = h0 + log cosh(2 pi t/beta) = hp */
    pg->page_time = bg->beta / (2.0 * M_PI)
                    * (y + log1p (sqrt (-expm1 (-2.0 * y))));
  return HOLENT_SUCCESS;
}

/* Least A_k + k h over k >= 1 (one or more bridge geodesics per side),
   *kb its k (the first on ties); Inf and 0 without endpoints.  */
static double
page_bridged (const holent_bcft_workspace *w, double h, size_t *kb)
{
  double best = INFINITY;
  *kb = 0;
  for (size_t k = 1; k <= w->pg_m; k++)
    {
      double v = w->A[k] + (double) k * h;
      if (v < best)
        {
          best = v;
          *kb = k;
        }
    }
  return best;
}

int
holent_bcft_page_eval (const holent_bcft_workspace *w,
                       const holent_bcft_bg *bg, size_t nt, const double *t,
                       double *S, double *kbridge, double *nbrane,
                       double *S_noisland, holent_err *err)
{
  holent_err_clear (err);
  if (w == NULL || bg == NULL || (nt > 0 && (t == NULL || S == NULL)))
    return holent_err_set (err, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  if (bg->kind != HOLENT_BCFT_TFD)
    return holent_err_set (err, HOLENT_EUNSUP, -1, HOLENT_NOINDEX, NULL);
  for (size_t i = 0; i < nt; i++)
    {
      if (!isfinite (t[i]))
        return holent_err_set (err, isnan (t[i]) ? HOLENT_ENAN : HOLENT_EDOM,
                               0, i, "must be a finite time");
      size_t bk;
      double best = page_bridged (w, bridge_half (bg, t[i]), &bk);
      if (S_noisland)
        S_noisland[i] = bg->c / 3.0 * best;
      if (w->A[0] <= best)
        {
          best = w->A[0];
          bk = 0;
        }
      S[i] = bg->c / 3.0 * best;
      if (kbridge)
        kbridge[i] = (double) bk;
      if (nbrane)
        nbrane[i] = (double) w->nbk[bk];
    }
  return HOLENT_SUCCESS;
}

int
holent_bcft_page_configuration (holent_bcft_workspace *w,
                                const holent_bcft_bg *bg, double t,
                                int runner, holent_bcft_result *res,
                                holent_err *err)
{
  holent_err_clear (err);
  if (w == NULL || bg == NULL || res == NULL || !w->page_ok)
    return holent_err_set (err, HOLENT_EINVAL, -1, HOLENT_NOINDEX, NULL);
  if (bg->kind != HOLENT_BCFT_TFD)
    return holent_err_set (err, HOLENT_EUNSUP, -1, HOLENT_NOINDEX, NULL);
  if (!isfinite (t))
    return holent_err_set (err, isnan (t) ? HOLENT_ENAN : HOLENT_EDOM, 0,
                           HOLENT_NOINDEX, "must be a finite time");
  double h = bridge_half (bg, t);
  size_t kb;
  double vb = page_bridged (w, h, &kb);
  /* the minimiser is the island one iff A_0 <= vb (page_eval); the
     runner-up is the best of the other kind */
  int island = w->A[0] <= vb, bridged = island == (runner != 0);
  size_t k = bridged ? kb : 0;
  double v = bridged ? vb : w->A[0];
  if (!(v < INFINITY))   /* R has endpoints: only h(t) can overflow */
    return holent_err_set (err, HOLENT_ERANGE, 0, HOLENT_NOINDEX,
                           "is too far from 0: a geodesic through the "
                           "bridge is longer than the largest double");
  size_t bi = 0, np, nb, nbr = 0, nbb = 0;
  int bp = 0;
  (void) best_split (w, k, -1, &bi, &bp);
  reconstruct (w, bi, bp, k, &np, &nb);
  /* the right singles of the TFD's programme cross the bridge */
  for (size_t q = 0; q < nb; q++)
    if (w->bend[q])
      w->bridge[nbr++] = w->brane[q];
    else
      {
        w->brane[nbb] = w->brane[q];
        w->bend[nbb] = 0;
        (void) brane_len (bg, w->pts[w->brane[q]], 0, w->cbx + nbb,
                          w->cbz + nbb);
        nbb++;
      }
  fill_result (res, w, 2.0 * v, np, nbb, w->cbx, w->cbz);
  res->S = bg->c / 6.0 * res->length;
  res->nbridge = nbr;
  return HOLENT_SUCCESS;
}
