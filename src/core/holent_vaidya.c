/* holent_vaidya.c: strips after a global quench in Vaidya-AdS_{d+1}.
 * See holent_vaidya.h and doc/higher_dimensional.md ("Quench: Vaidya").
 * SPDX-License-Identifier: GPL-3.0-or-later  */
#include <float.h>
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_integration.h>
#include <gsl/gsl_multiroots.h>
#include "holent_vaidya.h"
#include "holent_strip.h"
#include "holent_ode.h"

#define ZEND 1e-7       /* shots stop at z = ZEND z*; asymptotics beyond  */
#define NSTEP 20000     /* ODE steps of one shot                           */
#define ROOT_IT 60      /* iterations of the 2D root solve                 */
#define ROOT_TOL 1e-11  /* residual of the 2D root solve (relative)        */
#define ROOT_FLOOR 1e-8 /* ... or this once the tip is at roundoff         */
#define NEWTON_IT 8     /* iterations of a continuation step's Newton       */
#define HALVE 30        /* continuation: halvings of a time step           */
#define TSTEP 0.05      /* continuation: largest step in t per min(l, zh)  */
#define ODE_ABS 3e-14   /* tolerances of the shots                         */
#define ODE_REL 3e-12
#define TIP_IT 80     /* secant steps of a tip depth at fixed v*          */
#define TIP_TOL 3e-12 /* ... to this relative width (noise: ~1e-12)     */
#define TIP_FLOOR 1e-8 /* ... or this at roundoff of z*                    */
#define TIME_IT 40    /* secant steps in v* onto a boundary time         */
#define TIME_TOL 1e-11 /* ... to this (relative to l; noise ~1e-12)     */
#define TIME_FLOOR 1e-8 /* ... or this after TIME_IT steps                */
#define NCROSS 4      /* shell crossings of one shot (a tangency: more) */
#define ZDEEP 8       /* a shot deeper than ZDEEP z* is not a strip      */

struct holent_vaidya_workspace
{
  holent_ode *ode, *ode4;   /* in x: 5 components; in z: 4 */
  gsl_multiroot_fsolver *root;
  gsl_integration_workspace *iw;
  holent_strip_workspace *strip;
  const holent_poll *poll;  /* the caller's, or NULL */
};

holent_vaidya_workspace *
holent_vaidya_workspace_alloc (void)
{
  holent_vaidya_workspace *w = calloc (1, sizeof *w);
  if (w == NULL)
    return NULL;
  w->ode = holent_ode_alloc (5, ODE_ABS, ODE_REL);
  w->ode4 = holent_ode_alloc (4, ODE_ABS, ODE_REL);
  w->root = gsl_multiroot_fsolver_alloc (gsl_multiroot_fsolver_hybrids, 2);
  w->iw = gsl_integration_workspace_alloc (200);
  w->strip = holent_strip_workspace_alloc ();
  if (!w->ode || !w->ode4 || !w->root || !w->iw || !w->strip)
    {
      holent_vaidya_workspace_free (w);
      return NULL;
    }
  return w;
}

void
holent_vaidya_workspace_free (holent_vaidya_workspace *w)
{
  if (w == NULL)
    return;
  holent_ode_free (w->ode);
  holent_ode_free (w->ode4);
  if (w->root)
    gsl_multiroot_fsolver_free (w->root);
  if (w->iw)
    gsl_integration_workspace_free (w->iw);
  holent_strip_workspace_free (w->strip);
  free (w);
}

void
holent_vaidya_workspace_set_poll (holent_vaidya_workspace *w,
                                  const holent_poll *poll)
{
  if (w)
    w->poll = poll;
}

/* ------------------------------------------------------------------ */
/* The shot                                                            */

typedef struct
{
  const holent_hd_bg *F;
  double w;      /* shell width, 0: thin                               */
  double zs;     /* tip depth                                           */
  int side;      /* thin shell: 0 before (vacuum), 1 after              */
} vpar;

/* s(v) and s'(v) of the shell profile */
static double
shell (const vpar *q, double v, double *sp)
{
  if (q->w <= 0)
    {
      *sp = 0;
      return q->side;
    }
  double th = tanh (v / q->w);
  *sp = (1 - th * th) / (2 * q->w);
  return 0.5 * (1 + th);
}

/* State (z, v, z', v', J) against x; the conserved quantity of the area
   z^(1-d) sqrt(Q), Q = 1 - f v'^2 - 2 v' z', gives sqrt(Q) = (z* / z)^(d-1)
   and the equations of motion
     v'' = (d-1) Q/z + f_z v'^2/2,
     z'' = -f v'' - f_z z' v' - f_v v'^2/2,
   and K for the area (ell = 1, per Lperp^(d-2)).  */
static int
rhs (double x, const double y[], double dy[], void *p)
{
  const vpar *q = p;
  int d = q->F->d;
  double z = y[0], v = y[1], zp = y[2], vp = y[3], F, Fp, sp;
  (void) x;
  if (!(z > 0) || holent_hd_bg_f (q->F, z, &F, &Fp))
    return GSL_EBADFUNC;
  double s = shell (q, v, &sp);
  double f = 1 - s * (1 - F), fz = s * Fp, fv = -sp * (1 - F);
  double Q = 1 - f * vp * vp - 2 * vp * zp;
  double vpp = (d - 1) * Q / z + 0.5 * fz * vp * vp;
  dy[0] = zp;
  dy[1] = vp;
  dy[2] = -f * vpp - fz * zp * vp - 0.5 * fv * vp * vp;
  dy[3] = vpp;
  /* K = J - z^(2-d)/(d-2) (d = 2: J + log z; holent_strip_uv) stays
     finite at the boundary (J' the area element zs^(d-1)/z^(2d-2)): no
     cancellation at the end */
  dy[4] = (gsl_pow_int (q->zs / z, d - 1) + zp) / gsl_pow_int (z, d - 1);
  return GSL_SUCCESS;
}

/* Next to the boundary (once z' < -1) z is the parameter: state (x, v,
   v_z, K).  The conserved quantity fixes x_z algebraically,
   x_z^2 = P/((z* / z)^(2d-2) - 1), P = -(f v_z^2 + 2 v_z) = 1 - (1 + v_z)^2
   + (1 - f) v_z^2, so that the area's divergent part is subtracted
   without cancellation (dK/dz = -z^(1-d) (sqrt(P R) - 1), R = 1/(1 -
   (z/z*)^(2d-2))), and
     dv_z/dz = [(d-1) P R/z + f_z v_z^2/2] (1 + f v_z) + f_z v_z^2
               + f_v v_z^3/2.  */
static int
rhs_z (double z, const double y[], double dy[], void *p)
{
  const vpar *q = p;
  int d = q->F->d;
  double v = y[1], vz = y[2], F, Fp, sp;
  if (!(z > 0) || holent_hd_bg_f (q->F, z, &F, &Fp))
    return GSL_EBADFUNC;
  /* 1 - F from the evaluator, not from F: near the boundary 1 - F ~ z^d
     would keep only the digits 1e-16/z^d, noise that the step control of
     the area then chases with tiny steps */
  double s = shell (q, v, &sp), omF = holent_hd_bg_omf (q->F, z);
  double om = s * omF, fz = s * Fp, fv = -sp * omF;
  double u = 1 + vz, P = 1 - u * u + om * vz * vz;
  double r = gsl_pow_int (z / q->zs, 2 * d - 2);
  if (!(r < 1) || !(P > 0))
    return GSL_EBADFUNC;
  double R = 1 / (1 - r), PR = P * R, sq = sqrt (PR);
  dy[0] = -sq * gsl_pow_int (z / q->zs, d - 1);
  dy[1] = vz;
  dy[2] = ((d - 1) * PR / z + 0.5 * fz * vz * vz) * (u - om * vz)
          + fz * vz * vz + 0.5 * fv * vz * vz * vz;
  dy[3] = -((r - u * u + om * vz * vz) * R / (sq + 1)) / gsl_pow_int (z, d - 1);
  return GSL_SUCCESS;
}

/* Thin shell: from (x0, y0) the step to x1 crossed v = 0; land on the
   crossing by bisection of single rk8pd steps and refract there:
   (z' + f v')' = f_v v'^2/2 integrates to the jump z' -> z' - v' [f]/2,
   [f] = f(after) - f(before) = -(s_after - s_before)(1 - F(z)).  With z
   the parameter (zpar), *zpn is z' after the refraction: when it is no
   longer below -1 the caller goes back to x (the surface turns deeper
   after the shell, where z is no parameter).  */
static int
cross (holent_ode *ode, holent_ode_fn f, vpar *q, int zpar, double x0,
       const double y0[5], double x1, double *xc, double yc[5], double *zpn)
{
  double lo = 0, hi = x1 - x0, yt[5], v0 = y0[1];
  for (int it = 0; it < 80 && fabs (hi - lo) > 1e-15 * (fabs (x0) + fabs (hi)); it++)
    {
      double h = 0.5 * (lo + hi);
      memcpy (yt, y0, sizeof yt);
      if (holent_ode_fixed (ode, f, q, x0, h, yt))
        return HOLENT_ENOCONV;
      if ((yt[1] < 0) == (v0 < 0))
        lo = h;
      else
        hi = h;
    }
  memcpy (yc, y0, 5 * sizeof *yc);
  if (hi != 0 && holent_ode_fixed (ode, f, q, x0, hi, yc))
    return HOLENT_ENOCONV;
  *xc = x0 + hi;
  double z = zpar ? *xc : yc[0];
  if (!(z > 0) || z > q->F->zmax)
    return HOLENT_ENOCONV;
  int after = v0 < 0;  /* crossing upwards in v enters the final state */
  double jump = -((double) after - (double) q->side)
                * holent_hd_bg_omf (q->F, z);
  if (zpar)
    {
      /* z' = 1/x_z and v' = v_z z' before; z' jumps, v' does not */
      double dy[4];
      if (rhs_z (z, yc, dy, q))
        return HOLENT_ENOCONV;
      double zp = 1 / dy[0], vp = yc[2] * zp;
      *zpn = zp - 0.5 * vp * jump;
      yc[2] = vp / *zpn;
    }
  else
    yc[2] -= 0.5 * yc[3] * jump;
  q->side = after;
  return HOLENT_SUCCESS;
}

int
holent_vaidya_shoot (const holent_hd_bg *F, double w,
                     holent_vaidya_workspace *ws, double zs, double vs,
                     double *lh, double *tb, double *jfin)
{
  if (F == NULL || ws == NULL || lh == NULL || tb == NULL || jfin == NULL
      || isnan (zs) || isnan (vs) || isnan (w))
    return HOLENT_EINVAL;
  if (!(zs > 0) || !isfinite (zs) || !isfinite (vs) || !(w >= 0))
    return HOLENT_EDOM;
  int d = F->d;
  vpar q = { F, w, zs, vs >= 0 };
  double y[5] = { zs, vs, 0, 0, -holent_strip_uv (d, zs) }, x = 0;
  double h = 1e-3 * zs, y0[5], yz[5], z = zs;
  double xmax = 50 * zs, zend = ZEND * zs;
  int k = 0, st, ncross = 0;
  for (;;)
    {
      /* in x while z' > -1 (the tip, and where the surface turns) */
      holent_ode_reset (ws->ode);
      for (; y[2] > -1; k++)
        {
          if (k > NSTEP || x > xmax || y[0] > ZDEEP * zs)
            return HOLENT_ENOCONV;  /* does not reach the boundary */
          double x0 = x;
          memcpy (y0, y, sizeof y0);
          if (holent_ode_step (ws->ode, rhs, &q, &x, xmax, &h, 1e-12 * zs, y))
            return HOLENT_ENOCONV;
          if (w <= 0 && ((y[1] < 0) != (y0[1] < 0)))
            {
              double xc;
              if (++ncross > NCROSS
                  || (st = cross (ws->ode, rhs, &q, 0, x0, y0, x, &xc, y,
                                  NULL)))
                return HOLENT_ENOCONV;
              x = xc;
              holent_ode_reset (ws->ode);
            }
        }
      /* z' < -1: on in z down to ZEND z* (state x, v, v_z, K) */
      z = y[0];
      yz[0] = x;
      yz[1] = y[1];
      yz[2] = y[3] / y[2];
      yz[3] = y[4];
      yz[4] = 0;
      double hz = -1e-3 * z, zpn = -INFINITY;
      holent_ode_reset (ws->ode4);
      for (; z > zend && zpn < -1; k++)
        {
          if (k > NSTEP)
            return HOLENT_ENOCONV;
          double z0 = z;
          memcpy (y0, yz, sizeof y0);
          if (holent_ode_step (ws->ode4, rhs_z, &q, &z, zend, &hz, 1e-12 * z,
                               yz))
            return HOLENT_ENOCONV;
          if (w <= 0 && ((yz[1] < 0) != (y0[1] < 0)))
            {
              double zc;
              if (++ncross > NCROSS
                  || (st = cross (ws->ode4, rhs_z, &q, 1, z0, y0, z, &zc, yz,
                                  &zpn)))
                return HOLENT_ENOCONV;
              z = zc;
              holent_ode_reset (ws->ode4);
            }
        }
      if (zpn < -1)
        break;
      /* the refraction turned the surface (z' >= -1): back to x */
      x = yz[0];
      y[0] = z;
      y[1] = yz[1];
      y[2] = zpn;
      y[3] = yz[2] * zpn;
      y[4] = yz[3];
      h = 1e-3 * zs;
    }
  /* beyond ZEND z*: t = v + z + m z^(d+1)/(d+1), the rest of x and of the
     finite area O(z^d), O(m z^2) (m = s(t) m_F) */
  double sp, m = shell (&q, yz[1], &sp) * F->m;
  *lh = yz[0] + gsl_pow_int (z, d) / (d * gsl_pow_int (zs, d - 1));
  *tb = yz[1] + z + m * gsl_pow_int (z, d + 1) / (d + 1);
  *jfin = yz[3] + 0.25 * m * z * z;
  return isfinite (*lh) && isfinite (*tb) && isfinite (*jfin)
             ? HOLENT_SUCCESS : HOLENT_ENOCONV;
}

/* ------------------------------------------------------------------ */
/* Root solve and continuation                                         */

typedef struct
{
  const holent_hd_bg *F;
  double w, l, t;
  holent_vaidya_workspace *ws;
  double jfin;
} rpar;

static int
resid (const gsl_vector *p, void *vp, gsl_vector *r)
{
  rpar *a = vp;
  double zs = exp (gsl_vector_get (p, 0)), vs = gsl_vector_get (p, 1);
  double lh, tb;
  if (holent_vaidya_shoot (a->F, a->w, a->ws, zs, vs, &lh, &tb, &a->jfin))
    return GSL_EBADFUNC;
  gsl_vector_set (r, 0, (2 * lh - a->l) / a->l);
  gsl_vector_set (r, 1, (tb - a->t) / a->l);
  return GSL_SUCCESS;
}

/* Wide strips at late times hug the critical surface inside the horizon
   (Liu and Suh 2014): t at the boundary then depends exponentially on
   the tip (dt/dz* ~ 1e5..1e6), and the residual of t cannot go below
   roundoff of z* times that.  A Newton step at roundoff of the tip (a
   few ulps) with a residual below ROOT_FLOOR (t within ~1e-8 l: S within
   v_E s A times that) is then the root.  */
static int
tip_floor (const double dy[2], const double y[2], double nr)
{
  return nr < ROOT_FLOOR && fabs (dy[0]) < 1e-14
         && fabs (dy[1]) < 1e-14 * (1 + fabs (y[1]));
}

static int
at_floor (const gsl_multiroot_fsolver *s)
{
  double dy[2] = { gsl_vector_get (s->dx, 0), gsl_vector_get (s->dx, 1) };
  double y[2] = { gsl_vector_get (s->x, 0), gsl_vector_get (s->x, 1) };
  double nr = fmax (fabs (gsl_vector_get (s->f, 0)),
                    fabs (gsl_vector_get (s->f, 1)));
  return tip_floor (dy, y, nr);
}

/* the tip (zs, vs) of the surface of width l at time t, from a guess */
static int
solve (rpar *a, double *zs, double *vs)
{
  gsl_multiroot_function fn = { resid, 2, a };
  double p0[2] = { log (*zs), *vs };
  gsl_vector_view pv = gsl_vector_view_array (p0, 2);
  int st = gsl_multiroot_fsolver_set (a->ws->root, &fn, &pv.vector);
  for (int it = 0; !st; it++)
    {
      if (it >= ROOT_IT)
        return HOLENT_ENOCONV;
      if (gsl_multiroot_test_residual (a->ws->root->f, ROOT_TOL) == GSL_SUCCESS
          || (it > 0 && at_floor (a->ws->root)))
        break;
      st = gsl_multiroot_fsolver_iterate (a->ws->root);
    }
  if (st)
    return HOLENT_ENOCONV;
  const gsl_vector *x = gsl_multiroot_fsolver_root (a->ws->root);
  *zs = exp (gsl_vector_get (x, 0));
  *vs = gsl_vector_get (x, 1);
  /* the finite area at the root itself */
  double lh, tb;
  if (holent_vaidya_shoot (a->F, a->w, a->ws, *zs, *vs, &lh, &tb, &a->jfin))
    return HOLENT_ENOCONV;
  return HOLENT_SUCCESS;
}

static double
inv_f (double z, void *p)
{
  double F;
  holent_hd_bg_f (p, z, &F, NULL);
  return 1 / F;
}

typedef struct
{
  double t;
  size_t i;
} tidx;

static int
cmp_t (const void *a, const void *b)
{
  double x = ((const tidx *) a)->t, y = ((const tidx *) b)->t;
  return (x > y) - (x < y);
}

/* residual of the tip y = (log z*, v*) at a->t; a->jfin its area */
static int
res2 (rpar *a, const double y[2], double r[2])
{
  double lh, tb;
  if (holent_vaidya_shoot (a->F, a->w, a->ws, exp (y[0]), y[1], &lh, &tb,
                           &a->jfin))
    return HOLENT_ENOCONV;
  r[0] = (2 * lh - a->l) / a->l;
  r[1] = (tb - a->t) / a->l;
  return isfinite (r[0]) && isfinite (r[1]) ? HOLENT_SUCCESS
                                            : HOLENT_ENOCONV;
}

/* A branch of extremal surfaces followed in t: the tip at tc, the one
   before (for the predictor) and the Jacobian of the residual in
   (log z*, v*), kept from time to time (Broyden updates) so that a step
   of the continuation costs about two shots.  */
typedef struct
{
  double tc, zs, vs, jfin;
  double tp, zp, vp;
  double h;
  double J[4];
  int haveJ, alive;
} branch;

static int
fd_jac (rpar *a, const double y[2], const double r[2], double J[4])
{
  double e[2] = { 1e-6, 1e-6 * a->l }, rt[2];
  for (int k = 0; k < 2; k++)
    {
      double yt[2] = { y[0], y[1] };
      yt[k] += e[k];
      if (res2 (a, yt, rt))
        return HOLENT_ENOCONV;
      J[k] = (rt[0] - r[0]) / e[k];
      J[2 + k] = (rt[1] - r[1]) / e[k];
    }
  return HOLENT_SUCCESS;
}

/* Newton from y with the branch's Jacobian; a stale Jacobian is renewed
   by differences once.  On success y is the root, a->jfin its area.  */
static int
newton (rpar *a, branch *b, double y[2])
{
  double r[2], rn[2], yn[2], jy;
  int fresh = 0;
  if (res2 (a, y, r))
    return HOLENT_ENOCONV;
  jy = a->jfin;
  double nr = fmax (fabs (r[0]), fabs (r[1]));
  for (int it = 0; it < NEWTON_IT; it++)
    {
      if (nr < ROOT_TOL)
        {
          a->jfin = jy;
          return HOLENT_SUCCESS;
        }
      if (!b->haveJ)
        {
          if (fd_jac (a, y, r, b->J))
            return HOLENT_ENOCONV;
          b->haveJ = fresh = 1;
        }
      double *J = b->J, det = J[0] * J[3] - J[1] * J[2];
      if (!(fabs (det) > 0) || !isfinite (det))
        {
          b->haveJ = 0;
          return HOLENT_ENOCONV;
        }
      double dy[2] = { -(J[3] * r[0] - J[1] * r[1]) / det,
                       -(J[0] * r[1] - J[2] * r[0]) / det };
      if (fresh && tip_floor (dy, y, nr))
        {
          a->jfin = jy;
          return HOLENT_SUCCESS;
        }
      yn[0] = y[0] + dy[0];
      yn[1] = y[1] + dy[1];
      double nrn = INFINITY;
      if (fabs (dy[0]) < 0.5 && res2 (a, yn, rn) == HOLENT_SUCCESS)
        nrn = fmax (fabs (rn[0]), fabs (rn[1]));
      if (!(nrn < nr))
        {
          b->haveJ = 0;   /* renew the Jacobian here, or give up */
          if (fresh)
            return HOLENT_ENOCONV;
          continue;
        }
      /* Broyden: J += (dr - J dy) dy^T / |dy|^2 */
      double u0 = rn[0] - r[0] - (J[0] * dy[0] + J[1] * dy[1]);
      double u1 = rn[1] - r[1] - (J[2] * dy[0] + J[3] * dy[1]);
      double dd = dy[0] * dy[0] + dy[1] * dy[1];
      if (dd > 0)
        {
          J[0] += u0 * dy[0] / dd;
          J[1] += u0 * dy[1] / dd;
          J[2] += u1 * dy[0] / dd;
          J[3] += u1 * dy[1] / dd;
        }
      y[0] = yn[0];
      y[1] = yn[1];
      r[0] = rn[0];
      r[1] = rn[1];
      nr = nrn;
      jy = a->jfin;
    }
  return HOLENT_ENOCONV;
}

/* Follow branch b in t to target (dir +1 forward, -1 backward), in steps
   of at most hmax (halved on failure, doubled on success), predicting
   the tip linearly from the last two; a step below 1e-7 of the scale
   means the branch folds back in t: it ends there (b->alive = 0).  */
static void
advance (const rpar *proto, branch *b, double target, int dir, double hmax,
         double scale)
{
  while (b->alive && (dir > 0 ? b->tc < target : b->tc > target))
    {
      double tn = dir > 0 ? fmin (target, b->tc + b->h)
                          : fmax (target, b->tc - b->h);
      double z1 = b->zs, v1 = b->vs + (tn - b->tc);
      if (isfinite (b->tp) && b->tc != b->tp)
        {
          double r = (tn - b->tc) / (b->tc - b->tp);
          z1 = b->zs * pow (b->zs / b->zp, r);
          v1 = b->vs + (b->vs - b->vp) * r;
        }
      rpar a = *proto;
      a.t = tn;
      double y[2] = { log (z1), v1 };
      int st = newton (&a, b, y);
      if (st && b->h <= 0.25 * hmax)
        {
          /* the robust (and costly) solver once the step is small */
          st = solve (&a, &z1, &v1);
          y[0] = log (z1);
          y[1] = v1;
        }
      if (!st && fabs (y[0] - log (b->zs)) < 0.5)
        {
          b->zp = b->zs;
          b->vp = b->vs;
          b->tp = b->tc;
          b->zs = exp (y[0]);
          b->vs = y[1];
          b->tc = tn;
          b->jfin = a.jfin;
          b->h = fmin (hmax, 2 * b->h);
        }
      else
        {
          b->haveJ = 0;
          if ((b->h *= 0.5) < 1e-7 * scale)
            b->alive = 0;
        }
    }
}

static void
branch_start (branch *b, double t, double zs, double vs, double jfin,
              double h)
{
  b->tc = t;
  b->zs = zs;
  b->vs = vs;
  b->jfin = jfin;
  b->tp = b->zp = b->vp = NAN;
  b->h = h;
  b->haveJ = 0;
  b->alive = 1;
}

/* ------------------------------------------------------------------ */
/* Thin shell: the branch traced in the tip's time v*                  */

/* 2 lh/l - 1 at the tip (e^lz, vs), with the boundary time and area; a
   shot that falls into the singularity (or does not come back) is wider
   than any strip: +inf.  */
static int
wshot (rpar *a, double lz, double vs, double *g, double *tb, double *jf)
{
  double lh;
  int st = holent_vaidya_shoot (a->F, 0, a->ws, exp (lz), vs, &lh, tb, jf);
  if (st == HOLENT_ENOCONV)
    {
      *g = INFINITY;
      return HOLENT_SUCCESS;
    }
  *g = 2 * lh / a->l - 1;
  return st;
}

/* g(x) for secant_root; g = +inf marks "beyond" (a shot that fell in) */
typedef int (*groot_fn) (double x, double *g, void *ctx);

/* A root of g from *x: secant steps (slope *sl, carried between calls),
   kept inside the bracket of the points seen with g < 0 (xn) and g > 0
   (xp) (NAN: none yet), regula falsi or bisection when a step leaves it,
   bisection after two shrinks from one side or where g = +inf.
   Converged when |g| < tol, or when the bracket is at roundoff and
   |g| < gfloor at its finite side (the last call of fn is at the root).
   Unbracketed steps are at most smax; a step from g = +inf goes down.  */
static int
secant_root (groot_fn fn, void *ctx, double *x, double *sl, double xn,
             double xp, double tol, double gfloor, double smax, int itmax)
{
  double gn = NAN, gp = NAN, px = NAN, pg = NAN, g, xc = *x;
  double s = isfinite (*sl) && *sl != 0 ? *sl : 1;
  int st, side = 0, same = 0;
  for (int it = 0; it < itmax; it++)
    {
      if ((st = fn (xc, &g, ctx)))
        return st;
      if (isfinite (g) && isfinite (pg) && xc != px)
        {
          double s2 = (g - pg) / (xc - px);
          if (isfinite (s2) && s2 != 0)
            s = s2;
        }
      if (fabs (g) < tol)
        {
          *x = xc;
          *sl = s;
          return HOLENT_SUCCESS;
        }
      int sd = g < 0 ? -1 : 1;
      same = sd == side ? same + 1 : 0;
      side = sd;
      if (g < 0)
        {
          xn = xc;
          gn = g;
        }
      else
        {
          xp = xc;
          gp = g;
        }
      double nx = isfinite (g) ? xc - g / s : xc - smax;
      if (!isnan (xn) && !isnan (xp))
        {
          double lo = fmin (xn, xp), hi = fmax (xn, xp);
          if (hi - lo <= 4 * DBL_EPSILON * fmax (1, fabs (lo)))
            {
              /* at roundoff of x: the finite side, if small enough */
              double xf = isfinite (gp) && fabs (gp) < fabs (gn) ? xp : xn;
              if (!(fabs (xf == xp ? gp : gn) < gfloor))
                return HOLENT_ENOCONV;
              if ((st = fn (xf, &g, ctx)))
                return st;
              *x = xf;
              return HOLENT_SUCCESS;
            }
          if (!(nx > lo && nx < hi) && isfinite (gp))
            nx = xn - gn * (xp - xn) / (gp - gn);
          if (!(nx > lo && nx < hi) || same >= 2 || !isfinite (gp))
            nx = 0.5 * (lo + hi);
        }
      else if (fabs (nx - xc) > smax)
        nx = xc + copysign (smax, nx - xc);
      if (isfinite (g) && fabs (nx - xc) <= 2 * DBL_EPSILON * fmax (1, fabs (xc)))
        {
          /* the step is below roundoff of x: g is at its noise */
          if (!(fabs (g) < gfloor))
            return HOLENT_ENOCONV;
          *x = xc;
          return HOLENT_SUCCESS;
        }
      if (isfinite (g))
        {
          px = xc;
          pg = g;
        }
      xc = nx;
    }
  return HOLENT_ENOCONV;
}

/* the width residual at fixed v* as a function of log z* */
typedef struct
{
  rpar *a;
  double vs, tb, jf;
} tipctx;

static int
tip_g (double lz, double *g, void *c)
{
  tipctx *q = c;
  return wshot (q->a, lz, q->vs, g, &q->tb, &q->jf);
}

/* The tip depth at the tip time vs of the surface of width l: the root
   of g(log z*), from the guess *lz.  g increases with z* up to the depth
   where the shots fall in (there the surface hugs the critical surface
   inside the horizon and the width grows without bound), so one root;
   its accuracy is that of the shots (1e-12), not limited by the
   exponential sensitivity of t to z*.  */
static int
tip_at (rpar *a, double vs, double *lz, double *sl, double *tb, double *jf)
{
  tipctx c = { a, vs, NAN, NAN };
  int st = secant_root (tip_g, &c, lz, sl, NAN, NAN, TIP_TOL, TIP_FLOOR,
                        0.5, TIP_IT);
  *tb = c.tb;
  *jf = c.jf;
  return st;
}

/* a point of the traced branch: tip time, log depth, boundary time, area */
typedef struct
{
  double v, lz, t, jf;
} tpoint;

/* boundary time minus the target along the trace, as a function of v* */
typedef struct
{
  rpar *a;
  const tpoint *p;  /* the piece [p[0], p[1]] */
  double t, dl, *sl;  /* target, d(log z*)/dv on the piece, inner slope */
  tpoint q;           /* the last point solved */
} timectx;

static int
time_g (double v, double *g, void *c)
{
  timectx *k = c;
  double lz = isfinite (k->q.v) ? k->q.lz + k->dl * (v - k->q.v)
                                : k->p[0].lz + k->dl * (v - k->p[0].v);
  k->q.v = v;
  int st = tip_at (k->a, v, &lz, k->sl, &k->q.t, &k->q.jf);
  k->q.lz = lz;
  *g = k->q.t - k->t;
  return st;
}

/* The surface on the traced piece [p0, p1] whose boundary time is t,
   from the guess v (secant in v*, each point a tip_at solve; dtdv the
   slope, carried).  */
static int
time_root (rpar *a, const tpoint *p, double t, double v, double *dtdv,
           double *sl, tpoint *out)
{
  timectx c = { a, p, t, (p[1].lz - p[0].lz) / (p[1].v - p[0].v), sl,
                { NAN, NAN, NAN, NAN } };
  double xn = p[0].t < t ? p[0].v : p[1].v, xp = p[0].t < t ? p[1].v : p[0].v;
  if (!(v > fmin (p[0].v, p[1].v) && v < fmax (p[0].v, p[1].v)))
    v = p[0].v + (t - p[0].t) * (p[1].v - p[0].v) / (p[1].t - p[0].t);
  if (!isfinite (*dtdv) || *dtdv == 0)
    *dtdv = (p[1].t - p[0].t) / (p[1].v - p[0].v);
  int st = secant_root (time_g, &c, &v, dtdv, xn, xp, TIME_TOL * a->l,
                        TIME_FLOOR * a->l, fabs (p[1].v - p[0].v), TIME_IT);
  *out = c.q;
  return st;
}

/* the least area an interval of the trace can hold (its lower end less
   its variation) */
static double
low (const tpoint *p, size_t i)
{
  return fmin (p[i].jf, p[i + 1].jf) - fabs (p[i + 1].jf - p[i].jf);
}

/* Thin shell.  Before the shell reaches the boundary (t <= 0) the surface
   is the vacuum strip, exactly.  The extremal surfaces of width l form
   one curve in the tip's plane, followed in v* (not in t: t(v*) folds,
   and near the critical surface t depends exponentially on z*, while
   v* keeps the solve well conditioned) from the vacuum strip of t = 0
   (v* = -z_vac) to the tip on the shell (v* = 0), where it is the static
   strip of the final state at t = r*(z_bb); beyond, the static strip is
   exact (v* = t - r*).  Every point of the curve with boundary time t is
   an extremal surface at t; the least area is the HRT surface, so
   saturation is where the static strip becomes the least, and after the
   largest t of the curve it is the only one.  */
static int
thin_scan (const holent_hd_bg *F, holent_vaidya_workspace *ws, double l,
           size_t n, const tidx *o, double pref, double div, double fbb,
           double zbb, double rbb, double *S, double *finite, double *zstar,
           double *vstar, unsigned char *jump, size_t *bad)
{
  int d = F->d, st = HOLENT_SUCCESS;
  double scale = fmin (l, F->zh), hmax = TSTEP * scale;
  double zv = l / holent_strip_ratio (d);
  double jv = holent_strip_vacuum_fin (d, zv);
  rpar a = { F, 0, l, 0, ws, 0 };
  size_t cap = 256, np = 1;
  tpoint *p = malloc (cap * sizeof *p);
  if (p == NULL)
    return HOLENT_ENOMEM;
  p[0] = (tpoint) { -zv, log (zv), 0, jv };
  double tmax = o[n - 1].t, sl = NAN, dv = 0.02 * scale;
  /* the trace; not needed when every time is before the quench */
  while (tmax > 0 && p[np - 1].v < 0)
    {
      if (ws->poll && ws->poll->fn
          && ws->poll->fn (ws->poll->ctx, (double) np, (double) (np + n)))
        {
          free (p);
          return HOLENT_EINTR;
        }
      tpoint *q = p + np - 1, nx;
      nx.v = fmin (q->v + dv, 0);
      if (nx.v > -1e-9 * scale && isfinite (fbb))
        nx = (tpoint) { 0, log (zbb), rbb, fbb / pref };  /* the static */
      else
        {
          nx.lz = q->lz;
          if (np > 1)  /* extrapolated from the last two */
            nx.lz += (q->lz - q[-1].lz) * (nx.v - q->v) / (q->v - q[-1].v);
          st = tip_at (&a, nx.v, &nx.lz, &sl, &nx.t, &nx.jf);
        }
      if (!st && fabs (nx.t - q->t) <= 2 * hmax && fabs (nx.lz - q->lz) < 0.1)
        {
          if (np == cap)
            {
              tpoint *r = realloc (p, 2 * cap * sizeof *p);
              if (r == NULL)
                {
                  free (p);
                  return HOLENT_ENOMEM;
                }
              p = r;
              cap *= 2;
            }
          p[np++] = nx;
          /* steps in v* of at most 0.05 scale: the trace resolves the
             folds of t(v*) (where two roots of one interval would hide) */
          if (fabs (nx.t - q->t) < 0.5 * hmax)
            dv = fmin (1.5 * dv, hmax);
          continue;
        }
      st = HOLENT_SUCCESS;
      if ((dv *= 0.25) < 1e-13 * scale)
        {
          /* the curve cannot be followed further: times it might reach
             are not answered */
          break;
        }
    }
  int complete = tmax <= 0 || p[np - 1].v >= 0;
  /* pieces of the curve monotonic in t: the branches (for info.jump) */
  int *piece = malloc (np * sizeof *piece);
  if (piece == NULL)
    {
      free (p);
      return HOLENT_ENOMEM;
    }
  piece[0] = 0;
  for (size_t i = 1; i < np; i++)
    piece[i] = piece[i - 1]
               + (i > 1 && (p[i].t - p[i - 1].t) * (p[i - 1].t - p[i - 2].t) < 0);
  int last = -1;
  double slv = NAN;
  struct
  {
    double t[2], v[2], lz[2];
    branch b;  /* the Jacobian kept along the piece */
    int n;
  } *hist = calloc (piece[np - 1] + 1, sizeof *hist);
  size_t *cand = malloc (np * sizeof *cand);
  if (hist == NULL || cand == NULL)
    {
      free (hist);
      free (cand);
      free (piece);
      free (p);
      return HOLENT_ENOMEM;
    }
  for (size_t k = 0; k < n; k++)
    {
      if (ws->poll && ws->poll->fn
          && ws->poll->fn (ws->poll->ctx, (double) (np + k), (double) (np + n)))
        {
          st = HOLENT_EINTR;
          break;
        }
      double tk = o[k].t, best = INFINITY, zb = NAN, vb = NAN;
      int pb = -1;
      if (tk <= 0)
        {
          best = jv;
          zb = zv;
          vb = tk - zv;
          pb = 0;
        }
      else
        {
          if (isfinite (fbb) && tk >= rbb)
            {
              best = fbb / pref;
              zb = zbb;
              vb = tk - rbb;
              pb = complete ? piece[np - 1] : -2;
            }
          /* the intervals holding roots, the least area first; one
             whose area (allowing twice its variation) stays above the
             least found holds no smaller surface: not refined */
          size_t nc = 0;
          for (size_t i = 0; i + 1 < np; i++)
            if ((p[i].t - tk) * (p[i + 1].t - tk) <= 0)
              cand[nc++] = i;
          for (size_t c = 1; c < nc; c++)
            for (size_t e = c; e > 0 && low (p, cand[e]) < low (p, cand[e - 1]); e--)
              {
                size_t x = cand[e];
                cand[e] = cand[e - 1];
                cand[e - 1] = x;
              }
          for (size_t c = 0; c < nc; c++)
            {
              size_t i = cand[c];
              if (low (p, i) > best)
                continue;
              /* the guess: from the last two surfaces of this piece; a
                 Newton step with the piece's kept Jacobian first (about
                 two shots), the nested solve when it fails or lands
                 outside the piece */
              int pc = piece[i + 1];
              double vg = NAN, dtdv = NAN;
              tpoint r;
              int ok = 0;
              if (hist[pc].n >= 2 && tk - hist[pc].t[1] < 4 * hmax)
                {
                  double u = (tk - hist[pc].t[1])
                             / (hist[pc].t[1] - hist[pc].t[0]);
                  dtdv = (hist[pc].t[1] - hist[pc].t[0])
                         / (hist[pc].v[1] - hist[pc].v[0]);
                  vg = hist[pc].v[1] + u * (hist[pc].v[1] - hist[pc].v[0]);
                  double y[2] = { hist[pc].lz[1] + u * (hist[pc].lz[1]
                                                        - hist[pc].lz[0]), vg };
                  a.t = tk;
                  if (newton (&a, &hist[pc].b, y) == HOLENT_SUCCESS
                      && y[1] >= fmin (p[i].v, p[i + 1].v)
                      && y[1] <= fmax (p[i].v, p[i + 1].v))
                    {
                      r = (tpoint) { y[1], y[0], tk, a.jfin };
                      ok = 1;
                    }
                }
              if (!ok && (st = time_root (&a, p + i, tk, vg, &dtdv, &slv, &r)))
                break;
              hist[pc].t[0] = hist[pc].t[1];
              hist[pc].v[0] = hist[pc].v[1];
              hist[pc].lz[0] = hist[pc].lz[1];
              hist[pc].t[1] = tk;
              hist[pc].v[1] = r.v;
              hist[pc].lz[1] = r.lz;
              hist[pc].n += hist[pc].n < 2;
              if (r.jf < best)
                {
                  best = r.jf;
                  zb = exp (r.lz);
                  vb = r.v;
                  pb = piece[i + 1];
                }
            }
          if (st)
            {
              if (bad)
                *bad = o[k].i;
              break;
            }
          /* an untraced rest of the curve might hold a smaller surface */
          if (!complete && tk >= p[np - 1].t - 2 * hmax)
            {
              st = HOLENT_ENOCONV;
              if (bad)
                *bad = o[k].i;
              break;
            }
          if (!isfinite (best))
            {
              st = HOLENT_ENOCONV;
              if (bad)
                *bad = o[k].i;
              break;
            }
        }
      size_t i = o[k].i;
      S[i] = pref * best + div;
      if (finite)
        finite[i] = pref * best;
      if (zstar)
        zstar[i] = zb;
      if (vstar)
        vstar[i] = vb;
      if (jump)
        jump[i] = last >= 0 && pb != last;
      last = pb;
    }
  free (cand);
  free (hist);
  free (piece);
  free (p);
  return st;
}

int
holent_vaidya_strip (const holent_hd_bg *F, double w,
                     holent_vaidya_workspace *ws, double Lperp, double l,
                     size_t n, const double *t, double *S, double *finite,
                     double *zstar, double *vstar, unsigned char *jump,
                     size_t *bad)
{
  if (F == NULL || ws == NULL || (n > 0 && (t == NULL || S == NULL))
      || isnan (w) || isnan (Lperp) || isnan (l))
    return HOLENT_EINVAL;
  if (!(w >= 0) || !isfinite (w) || !(Lperp > 0) || !isfinite (Lperp)
      || !(l > 0) || !isfinite (l) || !isfinite (F->zh))
    return HOLENT_EDOM;
  for (size_t i = 0; i < n; i++)
    if (!isfinite (t[i]))
      {
        if (bad)
          *bad = i;
        return isnan (t[i]) ? HOLENT_EINVAL : HOLENT_EDOM;
      }
  if (n == 0)
    return HOLENT_SUCCESS;
  int d = F->d, st;
  double pref = 2 * pow (F->ell, d - 1) * pow (Lperp, d - 2) / (4 * F->G);
  double div = holent_strip_divergence (F, Lperp);
  /* the static surface of the final state: extremal in Vaidya too once
     it lies entirely after a thin shell, t >= r*(z_bb) = int_0^z_bb dz/F */
  double Sbb, fbb, zbb, rbb = INFINITY;
  if ((st = holent_strip_entropy (F, ws->strip, Lperp, 1, &l, &Sbb, &fbb,
                                  NULL, &zbb, NULL, NULL)))
    {
      if (st != HOLENT_EDOM)
        return st;
      fbb = INFINITY;  /* wider than the final state's strips reach */
    }
  else
    {
      gsl_function G = { inv_f, (void *) F };
      double err;
      if (gsl_integration_qag (&G, 0, zbb, 0, 1e-12, 200, GSL_INTEG_GAUSS21,
                               ws->iw, &rbb, &err))
        return HOLENT_ENOCONV;
    }
  tidx *o = malloc (n * sizeof *o);
  double *tmp = malloc (6 * n * sizeof *tmp);
  if (o == NULL || tmp == NULL)
    {
      free (o);
      free (tmp);
      return HOLENT_ENOMEM;
    }
  /* per sorted target: the followed (early) branch and the late one */
  double *fA = tmp, *zA = tmp + n, *vA = tmp + 2 * n;
  double *fL = tmp + 3 * n, *zL = tmp + 4 * n, *vL = tmp + 5 * n;
  for (size_t i = 0; i < n; i++)
    {
      o[i].t = t[i];
      o[i].i = i;
      fA[i] = fL[i] = INFINITY;
      zA[i] = vA[i] = zL[i] = vL[i] = NAN;
    }
  qsort (o, n, sizeof *o, cmp_t);
  if (w <= 0)
    {
      st = thin_scan (F, ws, l, n, o, pref, div, fbb, zbb, rbb, S, finite,
                      zstar, vstar, jump, bad);
      free (o);
      free (tmp);
      return st;
    }
  double ratio = holent_strip_ratio (d);
  double scale = fmin (l, F->zh), hmax = TSTEP * scale;
  rpar proto = { F, w, l, 0, ws, 0 };
  branch A;
  /* the early branch starts in the vacuum, before the shell: z* =
     l/ratio, v* = t - z* (exact for a thin shell) */
  double tc = fmin (o[0].t, w > 0 ? -12 * w : -1e-3 * scale), zs = l / ratio;
  branch_start (&A, tc, zs, tc - zs, holent_strip_vacuum_fin (d, zs), hmax);
  if (w > 0)
    {
      rpar a = proto;
      double vs = tc - zs;
      a.t = tc;
      A.alive = solve (&a, &zs, &vs) == HOLENT_SUCCESS;
      branch_start (&A, tc, zs, vs, a.jfin, hmax);
    }
  st = HOLENT_SUCCESS;
  for (size_t k = 0; k < n && A.alive; k++)
    {
      if (ws->poll && ws->poll->fn
          && ws->poll->fn (ws->poll->ctx, (double) k, (double) (2 * n)))
        {
          st = HOLENT_EINTR;
          break;
        }
      advance (&proto, &A, o[k].t, 1, hmax, scale);
      if (A.alive)
        {
          fA[k] = pref * A.jfin;
          zA[k] = A.zs;
          vA[k] = A.vs;
        }
    }
  /* the late branch: the static surface of the final state, exact from
     t = r*(z_bb) on for a thin shell (from 12 w later for a smooth one,
     as a guess), followed back in t until it folds or meets the early
     branch (the swallow tail of saturation) */
  if (!st && isfinite (fbb))
    {
      branch L;
      double t0 = w > 0 ? rbb + 12 * w : rbb;
      branch_start (&L, t0, zbb, t0 - rbb, fbb / pref, hmax);
      if (w > 0)
        {
          rpar a = proto;
          double z0 = zbb, v0 = t0 - rbb;
          a.t = t0;
          L.alive = solve (&a, &z0, &v0) == HOLENT_SUCCESS;
          branch_start (&L, t0, z0, v0, a.jfin, hmax);
        }
      for (size_t k = n; k-- > 0 && L.alive;)
        {
          if (o[k].t >= t0)
            {
              if (w <= 0)
                {
                  fL[k] = fbb;
                  zL[k] = zbb;
                  vL[k] = o[k].t - rbb;
                }
              continue;
            }
          if (ws->poll && ws->poll->fn
              && ws->poll->fn (ws->poll->ctx, (double) (2 * n - k),
                               (double) (2 * n)))
            {
              st = HOLENT_EINTR;
              break;
            }
          advance (&proto, &L, o[k].t, -1, hmax, scale);
          if (!L.alive)
            break;
          fL[k] = pref * L.jfin;
          zL[k] = L.zs;
          vL[k] = L.vs;
          if (isfinite (zA[k]) && fabs (zA[k] - L.zs) < 1e-6 * L.zs)
            break;  /* the same surface: earlier on, the early branch */
        }
    }
  if (st)
    {
      free (o);
      free (tmp);
      return st;
    }
  int last = -1;
  for (size_t k = 0; k < n; k++)
    {
      int same = isfinite (zA[k]) && isfinite (zL[k])
                 && fabs (zA[k] - zL[k]) < 1e-6 * zL[k];
      /* the same surface twice: one candidate */
      int pick = same ? 0 : fL[k] < fA[k];
      if (!isfinite (fA[k]) && !isfinite (fL[k]))
        {
          if (bad)
            *bad = o[k].i;
          free (o);
          free (tmp);
          return HOLENT_ENOCONV;
        }
      size_t i = o[k].i;
      double fv = pick ? fL[k] : fA[k];
      S[i] = fv + div;
      if (finite)
        finite[i] = fv;
      if (zstar)
        zstar[i] = pick ? zL[k] : zA[k];
      if (vstar)
        vstar[i] = pick ? vL[k] : vA[k];
      if (jump)
        jump[i] = last >= 0 && last != pick && !same;
      last = same ? last : pick;
    }
  free (o);
  free (tmp);
  return HOLENT_SUCCESS;
}
