/* holent_ball.c: RT balls in planar AdS_{d+1}.  See holent_ball.h and
 * doc/higher_dimensional.md.  SPDX-License-Identifier: GPL-3.0-or-later  */
#include <math.h>
#include <stdlib.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_sf_gamma.h>
#include <gsl/gsl_sf_psi.h>
#include "holent_ball.h"
#include "holent_hd_size.h"
#include "holent_ode.h"

#define QAG_LIMIT 200
#define QAG_EPSREL 1e-12
#define QAG_EPSABS 1e-15
#define ODE_T0 (-12.0)   /* log tan(phi) at the start next to the tip   */
#define ODE_T1 16.0      /* log tan(phi) where the boundary is reached   */
#define HUG_W 1e-2       /* tips within HUG_W zh of a horizon: shot in
                            log(zh - z) along the horizon first        */
#define BALL_WMIN_TAB 1e-100 /* closest tip to a tabulated horizon     */

struct holent_ball_workspace
{
  gsl_integration_workspace *iw;
  holent_ode *ode;
  holent_hd_size_workspace *size;
  const holent_poll *poll;  /* the caller's, or NULL */
};

void
holent_ball_workspace_set_poll (holent_ball_workspace *w,
                                const holent_poll *poll)
{
  if (w)
    w->poll = poll;
}

holent_ball_workspace *
holent_ball_workspace_alloc (void)
{
  holent_ball_workspace *w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  w->iw = gsl_integration_workspace_alloc (QAG_LIMIT);
  w->ode = holent_ode_alloc (3, 1e-15, 1e-12);
  w->size = holent_hd_size_workspace_alloc ();
  if (!w->iw || !w->ode || !w->size)
    {
      holent_ball_workspace_free (w);
      return NULL;
    }
  return w;
}

void
holent_ball_workspace_free (holent_ball_workspace *w)
{
  if (w == NULL)
    return;
  if (w->iw)
    gsl_integration_workspace_free (w->iw);
  holent_ode_free (w->ode);
  holent_hd_size_workspace_free (w->size);
  free (w);
}

/* c_k: coefficients of (1 - y^2)^((d-3)/2) = sum c_k y^(2k).  */
static double
ball_c (int d, int k)
{
  double a = 0.5 * (d - 3), c = 1;
  for (int j = 0; j < k; j++)
    c *= -(a - j) / (j + 1);
  return c;
}

double
holent_ball_vacuum_c (int d)
{
  if (d % 2)
    return 0.5 * gsl_sf_gamma (0.5 * (2 - d)) * gsl_sf_gamma (0.5 * (d - 1))
           / sqrt (M_PI);
  int n = (d - 2) / 2;
  return 0.5 * ball_c (d, n) * (gsl_sf_psi_int (n + 1) - gsl_sf_psi (0.5));
}

static double
omega_sphere (int d)  /* volume of the unit (d-2)-sphere */
{
  return 2 * pow (M_PI, 0.5 * (d - 1)) / gsl_sf_gamma (0.5 * (d - 1));
}

static double
hemi_integrand (double y, void *p)
{
  int d = *(const int *) p;
  return pow (1 + y, 0.5 * (d - 3)) * gsl_pow_int (y, 1 - d);
}

/* integral_delta^1 y^(1-d) (1 - y^2)^((d-3)/2) dy: the hemisphere's area
   above the cutoff per ell^(d-1) Omega_{d-2}.  */
static int
hemisphere (int d, double delta, holent_ball_workspace *w, double *out)
{
  if (delta >= 1)
    {
      *out = 0;
      return HOLENT_SUCCESS;
    }
  if (delta > 0.5)
    {
      gsl_integration_qaws_table *t
          = gsl_integration_qaws_table_alloc (0.0, 0.5 * (d - 3), 0, 0);
      if (t == NULL)
        return HOLENT_ENOMEM;
      gsl_function F = { hemi_integrand, &d };
      double err;
      int st = gsl_integration_qaws (&F, delta, 1.0, t, QAG_EPSABS,
                                     QAG_EPSREL, QAG_LIMIT, w->iw, out, &err);
      gsl_integration_qaws_table_free (t);
      return st ? HOLENT_ENOCONV : HOLENT_SUCCESS;
    }
  double s = holent_ball_vacuum_c (d);
  int k;
  for (k = 0; 2 * k < d - 2; k++)
    s += ball_c (d, k) * pow (delta, 2 * k + 2 - d) / (d - 2 - 2 * k);
  if (d % 2 == 0)
    s += ball_c (d, k++) * log (1 / delta);
  if (d % 2 == 0)
    for (; k < 400; k++)
      {
        double t = ball_c (d, k) * pow (delta, 2 * k + 2 - d) / (2 * k + 2 - d);
        s -= t;
        if (fabs (t) < 1e-17 * fabs (s))
          break;
      }
  *out = s;
  return HOLENT_SUCCESS;
}

/* ------------------------------------------------------------------ */
/* Balls                                                               */

/* State (rho, psi, J) against t = log tan(phi), phi the polar angle in
   the (r, z) half plane seen from the boundary centre: z = rho cos(phi),
   r = rho sin(phi); psi = theta + phi is the tilt of the tangent from the
   hemisphere's; J accumulates the finite area beyond the hemisphere.  */
typedef struct
{
  const holent_hd_bg *bg;
  double sc;   /* psi and J are carried divided by sc = |1 - f(tip)| */
} bpar;

static int
ball_rhs (double t, const double y[], double dydt[], void *p)
{
  const holent_hd_bg *bg = ((const bpar *) p)->bg;
  const double scale = ((const bpar *) p)->sc;
  int d = bg->d;
  double q = exp (-fabs (t)), nq = 1 / sqrt (1 + q * q);
  double sp = t < 0 ? q * nq : nq, cp = t < 0 ? nq : q * nq;
  double rho = y[0], psi = y[1] * scale;
  double z = rho * cp;
  if (!(z >= 0) || z > bg->zmax || !(rho > 0))
    return GSL_EBADFUNC;
  double o = holent_hd_bg_omf (bg, z), f = 1 - o;
  if (!(f > 0))
    return GSL_EBADFUNC;
  double s = sqrt (f), om = o / (1 + s);
  double spsi = sin (psi), cpsi = cos (psi), sth = spsi * cp - cpsi * sp;
  double Dr = cpsi + om * sp * sth;
  if (!(Dr > 0))
    return GSL_EBADFUNC;
  double sc = sp * cp, N = spsi - om * cp * sth;
  double sh = sin (0.5 * psi);
  dydt[0] = rho * N * sc / Dr;
  dydt[1] = ((d - 1) * om * cpsi * sc + om * sp * sth * sc
             - (d - 2) * spsi * cp * cp - (d - 1) * s * spsi * sp * sp)
            / (Dr * scale);
  dydt[2] = gsl_pow_int (sp, d - 1) * gsl_pow_int (cp, 2 - d)
            * (2 * sh * sh - om * sp * sth) / (Dr * scale);
  return GSL_SUCCESS;
}

/* The polar integration from t (state y = rho, psi/sc, J/sc) to the
   boundary: radius R and J.  */
static int
ball_polar (const holent_hd_bg *bg, holent_ball_workspace *ws, double t,
            double y[3], double sc, double *R, double *J)
{
  double h = 1e-2;
  bpar bp = { bg, sc };
  holent_ode_reset (ws->ode);
  for (int k = 0; t < ODE_T1; k++)
    if (k > 100000
        || holent_ode_step (ws->ode, ball_rhs, &bp, &t, ODE_T1, &h, 0, y))
      return HOLENT_ENOCONV;
  *R = y[0];
  *J = y[2] * sc;
  return HOLENT_SUCCESS;
}

/* Along the horizon: state (lambda = log(u/u0), chi = -sin(theta)/sqrt(u),
   J) against r, u = zh - z.  f/u is evaluated from u itself, and chi stays
   O(1) where the profile linearises (u grows like exp(2 k r)), so tips
   exponentially close to the horizon keep every digit.  */
typedef struct
{
  const holent_hd_bg *bg;
  double u0;
} hpar;

static int
hug_rhs (double r, const double y[], double dydt[], void *p)
{
  const hpar *hp = p;
  const holent_hd_bg *bg = hp->bg;
  int d = bg->d;
  double u = hp->u0 * exp (y[0]), z = bg->zh - u, chi = y[1];
  if (!(u > 0) || !(z > 0) || !(r > 0))
    return GSL_EBADFUNC;
  double fu = holent_hd_bg_fval (bg, z, u) / u, c2 = 1 - chi * chi * u;
  if (!(fu > 0) || !(c2 > 0))
    return GSL_EBADFUNC;
  double q = sqrt (fu), ct = sqrt (c2), rho = hypot (r, z);
  double W = gsl_pow_int (r, d - 2) * gsl_pow_int (z, 1 - d);
  dydt[0] = chi * q / ct;
  dydt[1] = -(d - 2) * chi / r + (d - 1) * ct * q / z - 0.5 * chi * chi * q / ct;
  /* area element minus the hemisphere's sin^(d-2) cos^(1-d) dphi */
  dydt[2] = W * (1 - (z * ct + r * chi * u * q) / rho) / ct;
  return GSL_SUCCESS;
}

static int
ball_hug (const holent_hd_bg *bg, holent_ball_workspace *ws, double z0,
          double w0, double *R, double *J)
{
  double zh = bg->zh, r = 1e-6 * zh, h = 1e-6 * zh, rend = 1e6 * zh;
  double fu0 = holent_hd_bg_fval (bg, z0, w0) / w0;
  if (!(fu0 > 0))
    return HOLENT_EDOM;
  hpar hp = { bg, w0 };
  /* series at the tip: theta = -sqrt(f0) r/z0, u = u0 + f0 r^2/(2 z0) */
  double y[3] = { 0.5 * fu0 * r * r / z0, sqrt (fu0) * r / z0, 0 };
  holent_ode_reset (ws->ode);
  for (int k = 0; w0 * exp (y[0]) < HUG_W * zh; k++)
    if (k > 100000 || !(r < rend)
        || holent_ode_step (ws->ode, hug_rhs, &hp, &r, rend, &h, 0, y))
      return HOLENT_ENOCONV;
  /* hand over to the polar variables (u >= HUG_W zh: z has its digits) */
  double u = w0 * exp (y[0]), z = zh - u;
  double th = -asin (y[1] * sqrt (u)), p[3];
  p[0] = hypot (r, z);
  p[1] = th + atan2 (r, z);
  p[2] = y[2];
  return ball_polar (bg, ws, log (r / z), p, 1.0, R, J);
}

/* Shoot from the tip at depth z0 = Z - w0 (series start: psi = (1 - sqrt f0) phi,
   rho = z0 (1 + (1 - f0) phi^2/2)) to the boundary: radius R and J.  */
static int
ball_shoot (const holent_hd_bg *bg, holent_ball_workspace *ws, double z0,
            double w0, double *R, double *J)
{
  double f0, y[3];
  if (isfinite (bg->zh) && w0 > 0 && w0 < HUG_W * bg->zh)
    return ball_hug (bg, ws, z0, w0, R, J);  /* z0 may round to zh */
  if (holent_hd_bg_f (bg, z0, &f0, NULL) || !(f0 > 0))
    return HOLENT_EDOM;
  double ph = atan (exp (ODE_T0));
  double o0 = holent_hd_bg_omf (bg, z0);  /* 1 - f0 with all its digits */
  double sc = fabs (o0) > 1e-300 ? fabs (o0) : 1;
  y[0] = z0 * (1 + 0.5 * o0 * ph * ph);
  y[1] = o0 / (1 + sqrt (f0)) * ph / sc;
  y[2] = 0;
  return ball_polar (bg, ws, ODE_T0, y, sc, R, J);
}

typedef struct
{
  const holent_hd_bg *bg;
  holent_ball_workspace *ws;
} bctx;

static int
ball_size (void *ctx, double zs, double w, double *R)
{
  const bctx *c = ctx;
  double J;
  return ball_shoot (c->bg, c->ws, zs, w, R, &J);
}

static int
ball_eval (void *ctx, double zs, double w, double *fin, double *cut,
           double *extra)
{
  const bctx *c = ctx;
  double R;
  *cut = 0;
  int st = ball_shoot (c->bg, c->ws, zs, w, &R, fin);
  *extra = *fin;
  return st;
}

int
holent_ball_entropy (const holent_hd_bg *bg, holent_ball_workspace *ws,
                     size_t n, const double *R, double *S, double *fin,
                     double *delta, double *ztip, size_t *bad, double *reach)
{
  double rmin, rmax, rch = INFINITY;
  int st;
  bctx ctx = { bg, ws };
  holent_hd_size_problem pb = { ball_size, ball_eval, &ctx, 0, 1 };
  if (bg == NULL || ws == NULL || (n > 0 && (R == NULL || S == NULL)))
    return HOLENT_EINVAL;
  if ((st = holent_ball_check (bg, NULL)))
    return st;
  if ((st = holent_hd_size_check (n, R, bad, &rmin, &rmax)))
    return st;
  if (n == 0)
    return HOLENT_SUCCESS;
  int d = bg->d;
  double pref = pow (bg->ell, d - 1) * omega_sphere (d) / (4 * bg->G);
  double cd = holent_ball_vacuum_c (d);
  if (bg->kind != HOLENT_HD_VACUUM)
    {
      /* tips next to a horizon are shot in log(zh - z): the brane goes
         to its 1e-250 zh, a tabulated horizon to 1e-100 zh */
      double wmin = bg->kind == HOLENT_HD_TABULATED && isfinite (bg->zh)
                        ? BALL_WMIN_TAB * bg->Z : bg->wmin;
      pb.fine = bg->kind == HOLENT_HD_TABULATED;
      st = holent_hd_size_table (bg, ws->size, &pb, rmin, rmax, 1.0, wmin,
                                 &rch);
      if (st)
        return st;
    }
  if (reach)
    *reach = rch;
  for (size_t i = 0; i < n; i++)
    {
      double J = 0, cut, zt = R[i], hemi, extra;
      if (ws->poll && ws->poll->fn
          && ws->poll->fn (ws->poll->ctx, (double) i, (double) n))
        return HOLENT_EINTR;
      if (R[i] > rch)
        {
          if (bad)
            *bad = i;
          return HOLENT_EDOM;
        }
      if (bg->kind != HOLENT_HD_VACUUM
          && (st = holent_hd_size_solve (bg, ws->size, &pb, R[i], &J, &cut,
                                         &extra, &zt)))
        {
          if (bad)
            *bad = i;
          return st;
        }
      if ((st = hemisphere (d, bg->eps / R[i], ws, &hemi)))
        return st;
      S[i] = pref * (hemi + J);
      if (!isfinite (S[i]) || !isfinite (pref * (cd + J)))
        {
          if (bad)
            *bad = i;
          return HOLENT_ERANGE;  /* a tiny radius or cutoff: too large */
        }
      if (fin)
        fin[i] = pref * (cd + J);
      if (delta)
        delta[i] = pref * J;
      if (ztip)
        ztip[i] = zt;
    }
  return HOLENT_SUCCESS;
}

static int
ball_fin (const holent_hd_bg *bg, void *ctx, size_t n, const double *R,
          double *S, double *fin)
{
  return holent_ball_entropy (bg, ctx, n, R, S, fin, NULL, NULL, NULL, NULL);
}

int
holent_ball_check (const holent_hd_bg *bg, holent_err *e)
{
  if (bg == NULL)
    return HOLENT_EINVAL;
  /* d = 2: a ball is an interval, the strip of width 2R (one code for
     it: the strip's, with its log divergence) */
  if (bg->d < 3)
    return holent_err_set (e, HOLENT_EDOM, 0, HOLENT_NOINDEX,
                           "must have d >= 3 for a ball: in d = 2 the ball "
                           "of radius R is the interval of width 2 R "
                           "(strip_entropy (bg, 2*R))");
  holent_err_clear (e);
  return HOLENT_SUCCESS;
}

int
holent_ball_accuracy (const holent_hd_bg *bg, holent_ball_workspace *ws,
                      size_t n, const double *R, const double *fin,
                      double *acc)
{
  if (ws == NULL)
    return HOLENT_EINVAL;
  return holent_hd_size_accuracy (bg, ball_fin, ws, n, R, fin, acc);
}
