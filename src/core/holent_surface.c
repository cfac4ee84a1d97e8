/* SPDX-License-Identifier: GPL-3.0-or-later */
/* holent_surface.c: RT surfaces as sampled curves (see holent_surface.h
 * and doc/surfaces.md).  */
#include <math.h>
#include <stdlib.h>
#include <string.h>
#include <gsl/gsl_math.h>
#include <gsl/gsl_errno.h>
#include <gsl/gsl_odeiv2.h>
#include "holent_surface.h"
#include "holent_hrt.h"

holent_surface_workspace *
holent_surface_workspace_alloc (void)
{
  return calloc (1, sizeof (holent_surface_workspace));
}

void
holent_surface_workspace_free (holent_surface_workspace *w)
{
  if (w == NULL)
    return;
  free (w->cur.x);
  free (w->cur.y);
  free (w->cur.t);
  free (w->pairings);
  free (w->stack);
  free (w);
}

static int
push (holent_curve *c, double x, double y, double t)
{
  if (c->n >= ((size_t) 1 << 22))
    return HOLENT_ETOOBIG;   /* a runaway refinement */
  if (c->n == c->cap)
    {
      size_t cap = c->cap ? 2 * c->cap : 256;
      double *nx = realloc (c->x, cap * sizeof *nx);
      if (nx == NULL)
        return HOLENT_ENOMEM;
      c->x = nx;
      double *ny = realloc (c->y, cap * sizeof *ny);
      if (ny == NULL)
        return HOLENT_ENOMEM;
      c->y = ny;
      double *nt = realloc (c->t, cap * sizeof *nt);
      if (nt == NULL)
        return HOLENT_ENOMEM;
      c->t = nt;
      c->cap = cap;
    }
  c->x[c->n] = x;
  c->y[c->n] = y;
  c->t[c->n] = t;
  c->n++;
  return HOLENT_SUCCESS;
}

int
holent_surface_picture (const holent_geo_bg *bg)
{
  return bg->circle ? 1 : 0;
}

/* ---- geodesics: one parametrisation per family, by proper length s ---- */

enum fam { FAM_POINCARE, FAM_DISK, FAM_BTZ, FAM_EMB };

/* Bulk charts of the time-dependent pictures (doc/surfaces.md), each with
   its embedding in R^{2,2}, -X0^2 + X1^2 + X2^2 - X3^2 = -1:
   EM_POINCARE  vacuum line in ingoing Eddington-Finkelstein (x, r, v),
   EM_GLOBAL    vacuum circle (global AdS) in (phi, r, v),
   EM_BTZ       BTZ of horizon radius R in (x or phi, r, v),
   EM_KRUSKAL   the two-sided BTZ in Kruskal (x or phi, u, v).  */
enum emb_chart { EM_POINCARE, EM_GLOBAL, EM_BTZ, EM_KRUSKAL };

/* A piece of geodesic X(s) = ca(s) P + cb(s) Q: between two null rays
   (KIND_FULL, s real), from a bulk point P towards the null ray Q
   (KIND_RAY, s >= 0), between two bulk points (KIND_CHORD, 0 <= s <= d).  */
enum emb_kind { KIND_FULL, KIND_RAY, KIND_CHORD };

typedef struct
{
  enum emb_chart chart;
  int circle;
  double R;      /* horizon radius (bulk units)                       */
  double sc;     /* boundary units per bulk unit: L/(2 pi) or 1        */
  int tglobal;   /* EM_GLOBAL: third column the global time (+ g->tc),
                    not v                                             */
} emb_chart;

typedef struct
{
  enum fam fam;
  int circle;
  double xc;       /* centre: boundary coordinate (line) or angle (disk)  */
  double tc;       /* centre: boundary time                               */
  double rad;      /* Poincare: radius of the (boosted) semicircle        */
  double hx, ht;   /* Poincare: half the separation in x and in t         */
  double ch, sh;   /* disk: cos h, sin h, h half the covering opening     */
  double ct, st;   /* disk: cos tau, sin tau, tau half the covering delay */
  double alpha;    /* disk: defect parameter (angles divided by it)       */
  double N;        /* disk: normalisation sqrt(-2 p.q)                    */
  double rp, rm;   /* BTZ: horizon radii                                  */
  double a1, a2, b1, b2, logN;
  emb_chart chart; /* FAM_EMB: the chart, the piece and its vectors       */
  enum emb_kind kind;
  double P[4], Q[4], d;
} geo_par;

static void emb_eval (const geo_par *g, double s, double *px, double *py,
                      double *pt, double *bd);

static double
logaddexp (double a, double b)
{
  return a > b ? a + log1p (exp (b - a)) : b + log1p (exp (a - b));
}

/* Point at parameter s in picture coordinates; *bd its distance to the
   boundary in the picture.  */
static void
geo_eval (const geo_par *g, double s, double *px, double *py, double *pt,
          double *bd)
{
  switch (g->fam)
    {
    case FAM_EMB:
      emb_eval (g, s, px, py, pt, bd);
      return;
    case FAM_POINCARE:
      *px = g->xc + g->hx * tanh (s);
      *py = g->rad / cosh (s);
      *pt = g->tc + g->ht * tanh (s);
      *bd = *py;
      return;
    case FAM_DISK:
      {
        /* Covering global AdS, endpoints at (t, phi) = -+(tau, h):
           (T1, T2, X1, X2) = (2/N)(cosh s cos tau, sinh s sin tau,
           cosh s cos h, sinh s sin h), N^2 = 4 sin(h + tau) sin(h - tau);
           disk radius tanh(rho/2) = sinh rho/(1 + cosh rho).  */
        double cs = cosh (s), sn = sinh (s);
        double nn = 0.5 * g->N;
        double T1 = cs * g->ct / nn, T2 = sn * g->st / nn;
        double X1 = cs * g->ch / nn, X2 = sn * g->sh / nn;
        double R = hypot (X1, X2) / (1.0 + hypot (T1, T2));
        double ph = g->xc + atan2 (X2, X1) / g->alpha;
        *px = R * cos (ph);
        *py = R * sin (ph);
        *pt = g->tc + atan2 (T2, T1) / g->alpha;
        *bd = 1.0 - R;
        return;
      }
    default:
      {
        /* light-cone components of X = (e^-s p1 + e^s p2)/N in R^{2,2}:
           T1 +- X1 = U+-, X2 +- T2 = V+-, alpha = U+ U-.  */
        double lup = logaddexp (-s + g->a1, s + g->a2) - g->logN;
        double lum = logaddexp (-s - g->a1, s - g->a2) - g->logN;
        double lvp = logaddexp (-s + g->b1, s + g->b2) - g->logN;
        double lvm = logaddexp (-s - g->b1, s - g->b2) - g->logN;
        double al = exp (lup + lum);
        double a = 0.5 * (lup - lum), b = 0.5 * (lvp - lvm);
        double dd = (g->rp - g->rm) * (g->rp + g->rm);
        double r = sqrt (g->rm * g->rm + al * dd);
        double ph = (g->rp * a + g->rm * b) / dd;
        *pt = g->tc + (g->rm * a + g->rp * b) / dd;
        if (g->circle)
          {
            double R = r / (1.0 + sqrt (1.0 + r * r));
            if (!isfinite (R))
              R = 1.0;
            *px = R * cos (g->xc + ph);
            *py = R * sin (g->xc + ph);
            *bd = 1.0 - R;
          }
        else
          {
            *px = g->xc + ph;
            *py = 1.0 / r;
            *bd = *py;
          }
        return;
      }
    }
}

typedef struct
{
  const geo_par *g;
  double tol;
  int rel;       /* Kruskal picture: tol relative to max(1, |X_K|, |T_K|) */
  holent_curve *c;
} refine_ctx;

/* Append the points of (sa, sb], refining while the curve's midpoint is
   farther than tol from the chord's.  Kruskal coordinates grow like
   e^{R |t|} towards late boundary points, so there the deviation allowed
   grows with the point's distance from the bifurcation point: an absolute
   tol would ask for ever more samples where the picture is ever coarser,
   while near the bifurcation point (|X_K|, |T_K| <= 1) it stays tol.  */
static int
refine (const refine_ctx *rc, double sa, const double *pa, double sb,
        const double *pb, int depth)
{
  double sm = 0.5 * (sa + sb), pm[3], bd;
  geo_eval (rc->g, sm, &pm[0], &pm[1], &pm[2], &bd);
  double dev = hypot (pm[0] - 0.5 * (pa[0] + pb[0]),
                      pm[1] - 0.5 * (pa[1] + pb[1]));
  double tol = rc->tol;
  if (rc->rel)
    tol *= fmax (1.0, fmax (fabs (pm[0]), fabs (pm[1])));
  if (dev > tol && depth < 40)
    {
      int st = refine (rc, sa, pa, sm, pm, depth + 1);
      if (st)
        return st;
      return refine (rc, sm, pm, sb, pb, depth + 1);
    }
  return push (rc->c, pb[0], pb[1], pb[2]);
}

/* Parameter beyond which the curve is within tol/16 of the boundary, on
   the side sign (+1 or -1).  */
static double
geo_smax (const geo_par *g, double tol, double sign)
{
  double s = 1.0, x, y, t, bd;
  for (int k = 0; k < 200; k++)
    {
      geo_eval (g, sign * s, &x, &y, &t, &bd);
      if (bd < tol / 16.0 || s > 700.0)
        break;
      s *= 1.25;
    }
  return s;
}

/* Append the samples of the piece from s0 to s1 (the point at s0 unless
   skip), refined to tol.  */
static int
sample_span (holent_curve *c, const geo_par *g, double tol, double s0,
             double s1, int skip)
{
  const int nseg = 32;
  double pa[3], pb[3], bd;
  refine_ctx rc = { g, tol, g->fam == FAM_EMB && g->chart.chart == EM_KRUSKAL,
                    c };
  int st;
  geo_eval (g, s0, &pa[0], &pa[1], &pa[2], &bd);
  if (!skip && (st = push (c, pa[0], pa[1], pa[2])))
    return st;
  for (int k = 1; k <= nseg; k++)
    {
      double sb = s0 + (s1 - s0) * k / nseg;
      geo_eval (g, sb, &pb[0], &pb[1], &pb[2], &bd);
      double sa = s0 + (s1 - s0) * (k - 1) / nseg;
      if ((st = refine (&rc, sa, pa, sb, pb, 0)))
        return st;
      memcpy (pa, pb, sizeof pa);
    }
  return HOLENT_SUCCESS;
}

/* Sample the curve between its boundary endpoints (xb, yb, tb); the times
   of the interior points are multiplied by tsc (rescaled circle -> L).  */
static int
sample_t (holent_curve *c, const geo_par *g, double tol, double xb1,
          double yb1, double tb1, double xb2, double yb2, double tb2,
          double tsc)
{
  double s0 = -geo_smax (g, tol, -1.0), s1 = geo_smax (g, tol, 1.0);
  size_t first = c->n + 1;
  int st = push (c, xb1, yb1, tb1);
  if (st || (st = sample_span (c, g, tol, s0, s1, 0)))
    return st;
  for (size_t i = first; i < c->n; i++)
    c->t[i] *= tsc;
  return push (c, xb2, yb2, tb2);
}

static int
sample (holent_curve *c, const geo_par *g, double tol, double xb1,
        double yb1, double tb1, double xb2, double yb2, double tb2)
{
  return sample_t (c, g, tol, xb1, yb1, tb1, xb2, yb2, tb2, 1.0);
}

static void
btz_radii (const holent_geo_bg *bg, double *rp, double *rm)
{
  double L = bg->circle ? bg->L : 2.0 * M_PI;
  *rp = 0.5 * L * (1.0 / bg->beta_L + 1.0 / bg->beta_R);
  *rm = 0.5 * L * (1.0 / bg->beta_L - 1.0 / bg->beta_R);
}

int
holent_surface_geodesic (holent_surface_workspace *w,
                         const holent_geo_bg *bg, double x1, double x2,
                         double tol)
{
  return holent_surface_geodesic_t (w, bg, x1, 0.0, x2, 0.0, tol);
}

static int apex_legs (holent_curve *c, const holent_geo_bg *bg, double ph1,
                      double t1, double ph2, double t2, double ta,
                      double sc, double tol);

int
holent_surface_geodesic_t (holent_surface_workspace *w,
                           const holent_geo_bg *bg, double x1, double t1,
                           double x2, double t2, double tol)
{
  if (w == NULL || bg == NULL || isnan (x1) || isnan (x2) || isnan (tol)
      || isnan (t1) || isnan (t2))
    return HOLENT_EINVAL;
  if (!isfinite (x1) || !isfinite (x2) || !isfinite (t1) || !isfinite (t2)
      || !(tol >= HOLENT_SURFACE_TOLMIN) || !(tol <= 1.0) || x1 == x2)
    return HOLENT_EDOM;
  if (bg->circle && !(x2 - x1 > 0.0 && x2 - x1 <= bg->L))
    return HOLENT_EDOM;
  w->cur.n = 0;
  geo_par g;
  memset (&g, 0, sizeof g);
  g.circle = bg->circle;
  g.alpha = 1.0;
  g.tc = 0.5 * (t1 + t2);
  double ph1 = 0, ph2 = 0, tau = 0.5 * (t2 - t1);
  if (bg->circle)
    {
      ph1 = 2.0 * M_PI * x1 / bg->L;
      ph2 = 2.0 * M_PI * x2 / bg->L;
      tau *= 2.0 * M_PI / bg->L;  /* time in units of the rescaled circle */
    }
  else if (x2 < x1)
    {
      double tmp = x1;
      x1 = x2;
      x2 = tmp;
      tmp = t1;
      t1 = t2;
      t2 = tmp;
      tau = -tau;
    }
  double tsc = bg->circle ? bg->L / (2.0 * M_PI) : 1.0;
  switch (bg->bulk)
    {
    case HOLENT_BULK_POINCARE:
      if (!(fabs (t2 - t1) < x2 - x1))
        return HOLENT_ETIMELIKE;
      g.fam = FAM_POINCARE;
      g.xc = 0.5 * (x1 + x2);
      g.hx = 0.5 * (x2 - x1);
      g.ht = 0.5 * (t2 - t1);
      g.rad = sqrt ((g.hx - g.ht) * (g.hx + g.ht));
      return sample (&w->cur, &g, tol, x1, 0.0, t1, x2, 0.0, t2);
    case HOLENT_BULK_GLOBAL_ADS:
    case HOLENT_BULK_THERMAL_ADS:
    case HOLENT_BULK_CONICAL_DEFECT:
      {
        double h = 0.5 * bg->alpha * (ph2 - ph1), ta = bg->alpha * tau;
        if (bg->alpha < 1.0 && h >= M_PI_2)
          {
            /* no geodesic on this side of the defect: the two radial
               legs through the apex, reached at the mean covering time
               (doc/hrt_time.md); straight in the picture, sampled for
               their times */
            return apex_legs (&w->cur, bg, ph1, t1, ph2, t2, ta,
                              tsc / bg->alpha, tol);
          }
        if (h >= M_PI)
          return HOLENT_EDOM;  /* the whole circle in global AdS */
        if (!(fabs (ta) < h) || !(fabs (ta) < M_PI - h))
          return HOLENT_ETIMELIKE;
        g.fam = FAM_DISK;
        g.alpha = bg->alpha;
        g.xc = 0.5 * (ph1 + ph2);
        g.tc = 0.5 * (t1 + t2) / tsc;
        g.ch = cos (h);
        g.sh = sin (h);
        g.ct = cos (ta);
        g.st = sin (ta);
        g.N = 2.0 * sqrt (sin (h + ta) * sin (h - ta));
        return sample_t (&w->cur, &g, tol, cos (ph1), sin (ph1), t1,
                         cos (ph2), sin (ph2), t2, tsc);
      }
    case HOLENT_BULK_PLANAR_BTZ:
    case HOLENT_BULK_BTZ:
    case HOLENT_BULK_ROTATING_BTZ:
    case HOLENT_BULK_PLANAR_ROTATING_BTZ:
      {
        double D = bg->circle ? ph2 - ph1 : x2 - x1;
        g.fam = FAM_BTZ;
        btz_radii (bg, &g.rp, &g.rm);
        g.xc = bg->circle ? 0.5 * (ph1 + ph2) : 0.5 * (x1 + x2);
        g.tc = 0.5 * (t1 + t2) / tsc;
        /* endpoints at (phi, t) = -+(D/2, tau) from the centre:
           a = r+ phi - r- t, b = r+ t - r- phi */
        double A = g.rp * D / 2 - g.rm * tau, B = g.rp * tau - g.rm * D / 2;
        if (!(fabs (A) > fabs (B)))
          return HOLENT_ETIMELIKE;
        g.a1 = -A;
        g.a2 = A;
        g.b1 = -B;
        g.b2 = B;
        /* N^2 = -2 p1.p2 = 2 (cosh 2A - cosh 2B) */
        g.logN = 0.5 * (log (4.0) + holent_geo_lnsinh (fabs (A) + fabs (B))
                        + holent_geo_lnsinh (fabs (A) - fabs (B)));
        if (bg->circle)
          return sample_t (&w->cur, &g, tol, cos (ph1), sin (ph1), t1,
                           cos (ph2), sin (ph2), t2, tsc);
        return sample (&w->cur, &g, tol, x1, 0.0, t1, x2, 0.0, t2);
      }
    default:
      return HOLENT_EINVAL;
    }
}

int
holent_surface_horizon (holent_surface_workspace *w,
                        const holent_geo_bg *bg, double xa, double xb,
                        double tol, double *depth)
{
  if (w == NULL || bg == NULL || depth == NULL || isnan (tol)
      || isnan (xa) || isnan (xb))
    return HOLENT_EINVAL;
  if (!(tol >= HOLENT_SURFACE_TOLMIN) || !(tol <= 1.0))
    return HOLENT_EDOM;
  if (!bg->horizon)
    return HOLENT_EUNSUP;
  double rp, rm;
  btz_radii (bg, &rp, &rm);
  w->cur.n = 0;
  if (!bg->circle)
    {
      *depth = 1.0 / rp;
      int st = push (&w->cur, xa, *depth, 0.0);
      return st ? st : push (&w->cur, xb, *depth, 0.0);
    }
  double R = rp / (1.0 + sqrt (1.0 + rp * rp));
  *depth = R;
  /* sagitta R (1 - cos(dphi/2)) <= tol */
  double c = 1.0 - tol / R;
  int n = c > -1.0 ? (int) ceil (M_PI / acos (c)) : 4;
  if (n < 16)
    n = 16;
  if (n > 1 << 20)
    n = 1 << 20;
  for (int k = 0; k <= n; k++)
    {
      double ph = 2.0 * M_PI * (k == n ? 0 : k) / n;
      int st = push (&w->cur, R * cos (ph), R * sin (ph), 0.0);
      if (st)
        return st;
    }
  return HOLENT_SUCCESS;
}

static int
check_tol (double tol)
{
  if (isnan (tol))
    return HOLENT_EINVAL;
  return tol >= HOLENT_SURFACE_TOLMIN && tol <= 1.0 ? HOLENT_SUCCESS
                                                     : HOLENT_EDOM;
}

/* ---- time-dependent pictures: pieces of geodesics in the embedding ---- */

/* In the BTZ and Kruskal charts the first two components are stored as
   X0 + X1, X0 - X1 (= e^{+-R x} times a positive factor): the pieces of
   long geodesics mix e^{R x} with e^{-R x}, whose difference of cosh and
   sinh would cancel.  */
static int
emb_lightcone (const emb_chart *ch)
{
  return ch->chart == EM_BTZ || ch->chart == EM_KRUSKAL;
}

static double
emb_dot (const emb_chart *ch, const double *X, const double *Y)
{
  double a = emb_lightcone (ch) ? -0.5 * (X[0] * Y[1] + X[1] * Y[0])
                                : -X[0] * Y[0] + X[1] * Y[1];
  return a + X[2] * Y[2] - X[3] * Y[3];
}

/* The bulk point of the chart at (x, a, v), x in bulk units centred on the
   piece, a = r (Eddington-Finkelstein charts) or u (Kruskal).  */
static void
emb_bulk (const emb_chart *ch, double x, double a, double v, double *X)
{
  double R = ch->R;
  switch (ch->chart)
    {
    case EM_POINCARE:
      {
        /* t = v + z, z = 1/r */
        double z = 1.0 / a, t = v + z, q = x * x - t * t;
        X[0] = (z * z + 1.0 + q) / (2.0 * z);
        X[1] = x / z;
        X[2] = (z * z - 1.0 + q) / (2.0 * z);
        X[3] = t / z;
        return;
      }
    case EM_GLOBAL:
      {
        /* global time tau = v - r_*(r), r_* = atan(r) - pi/2 */
        double tau = v + atan2 (1.0, a), n = sqrt (1.0 + a * a);
        X[0] = n * cos (tau);
        X[1] = a * cos (x);
        X[2] = a * sin (x);
        X[3] = n * sin (tau);
        return;
      }
    case EM_BTZ:
      {
        double ep = exp (R * v) * (a + R), em = exp (-R * v) * (a - R);
        X[0] = a / R * exp (R * x);
        X[1] = a / R * exp (-R * x);
        X[2] = (ep + em) / (2.0 * R);
        X[3] = (ep - em) / (2.0 * R);
        return;
      }
    default:
      {
        double w = 1.0 + a * v, rho = (1.0 - a * v) / w;
        X[0] = rho * exp (R * x);
        X[1] = rho * exp (-R * x);
        X[2] = (v - a) / w;
        X[3] = (v + a) / w;
        return;
      }
    }
}

/* The null ray of the boundary point (x, t) (bulk units, x centred);
   side 0 is the left boundary of the Kruskal chart (forward time).  */
static void
emb_ray (const emb_chart *ch, double x, double t, int side, double *X)
{
  double R = ch->R;
  switch (ch->chart)
    {
    case EM_POINCARE:
      X[0] = 0.5 * (1.0 + x * x - t * t);
      X[1] = x;
      X[2] = 0.5 * (x * x - t * t - 1.0);
      X[3] = t;
      return;
    case EM_GLOBAL:
      X[0] = cos (t);
      X[1] = cos (x);
      X[2] = sin (x);
      X[3] = sin (t);
      return;
    default:
      X[0] = exp (R * x);
      X[1] = exp (-R * x);
      X[2] = (ch->chart == EM_KRUSKAL && side == 0 ? -1.0 : 1.0) * cosh (R * t);
      X[3] = sinh (R * t);
      return;
    }
}

/* Picture point of the areal radius r at the angle or coordinate x.  */
static void
areal_picture (int circle, double x, double r, double *px, double *py,
               double *bd)
{
  if (circle)
    {
      double R = r / (1.0 + sqrt (1.0 + r * r));
      if (!isfinite (R))
        R = 1.0;
      *px = R * cos (x);
      *py = R * sin (x);
      *bd = 1.0 - R;
    }
  else
    {
      *px = x;
      *py = 1.0 / r;
      *bd = *py;
    }
}

static void
emb_eval (const geo_par *g, double s, double *px, double *py, double *pt,
          double *bd)
{
  double ca, cb, X[4];
  switch (g->kind)
    {
    case KIND_FULL:
      ca = exp (-s) / g->d;
      cb = exp (s) / g->d;
      break;
    case KIND_RAY:
      ca = exp (-s);
      cb = sinh (s) / g->d;
      break;
    default:
      ca = sinh (g->d - s) / sinh (g->d);
      cb = sinh (s) / sinh (g->d);
      break;
    }
  for (int k = 0; k < 4; k++)
    X[k] = ca * g->P[k] + cb * g->Q[k];
  const emb_chart *ch = &g->chart;
  double R = ch->R;
  switch (ch->chart)
    {
    case EM_POINCARE:
      {
        double z = 1.0 / (X[0] - X[2]);
        areal_picture (0, g->xc + X[1] * z, 1.0 / z, px, py, bd);
        *pt = X[3] * z - z;
        return;
      }
    case EM_GLOBAL:
      {
        double r = hypot (X[1], X[2]);
        areal_picture (1, g->xc + atan2 (X[2], X[1]), r, px, py, bd);
        if (ch->tglobal)
          *pt = g->tc + ch->sc * atan2 (X[3], X[0]);
        else
          *pt = ch->sc * (atan2 (X[3], X[0]) - atan2 (1.0, r));
        return;
      }
    case EM_BTZ:
      {
        double r = R * sqrt (X[0] * X[1]);
        double x = 0.5 * log (X[0] / X[1]) / R;
        areal_picture (ch->circle, g->xc + x, r, px, py, bd);
        *pt = ch->sc * log (R * (X[2] + X[3]) / (r + R)) / R;
        return;
      }
    default:
      {
        double rho = sqrt (X[0] * X[1]);
        double x = 0.5 * log (X[0] / X[1]) / R;
        *px = X[2] / (1.0 + rho);
        *py = X[3] / (1.0 + rho);
        *pt = ch->sc * (g->xc + x);
        *bd = 1.0 / (1.0 + rho);
        return;
      }
    }
}

/* Prepare g for the piece of the chart ch between P and Q.  */
static int
emb_piece (geo_par *g, const emb_chart *ch, double xc, enum emb_kind kind,
           const double *P, const double *Q)
{
  memset (g, 0, sizeof *g);
  g->fam = FAM_EMB;
  g->chart = *ch;
  g->xc = xc;
  g->kind = kind;
  memcpy (g->P, P, sizeof g->P);
  memcpy (g->Q, Q, sizeof g->Q);
  double pq = -emb_dot (ch, P, Q);
  if (kind == KIND_FULL)
    g->d = sqrt (2.0 * pq);
  else if (kind == KIND_RAY)
    g->d = pq;
  else
    g->d = acosh (pq);
  return isfinite (g->d) && g->d > 0.0 ? HOLENT_SUCCESS : HOLENT_ERANGE;
}

/* Reverse the points from index i0 to the end.  */
static void
curve_reverse (holent_curve *c, size_t i0)
{
  for (size_t i = i0, j = c->n - 1; i < j; i++, j--)
    {
      double tx = c->x[i], ty = c->y[i], tt = c->t[i];
      c->x[i] = c->x[j];
      c->y[i] = c->y[j];
      c->t[i] = c->t[j];
      c->x[j] = tx;
      c->y[j] = ty;
      c->t[j] = tt;
    }
}

/* No sample may be NaN or infinite (an overflow of the chart).  */
static int
curve_finite (const holent_curve *c, size_t i0)
{
  for (size_t i = i0; i < c->n; i++)
    if (!isfinite (c->x[i]) || !isfinite (c->y[i]) || !isfinite (c->t[i]))
      return HOLENT_ERANGE;
  return HOLENT_SUCCESS;
}

/* Picture point of the boundary point at bulk coordinate x and boundary
   time t (Eddington-Finkelstein pictures).  */
static int
push_boundary (holent_curve *c, const emb_chart *ch, double x, double t)
{
  if (ch->circle)
    return push (c, cos (x), sin (x), t);
  return push (c, x, 0.0, t);
}

/* The Kruskal picture point of the boundary point at bulk coordinate x
   and bulk time t on side s (0 left): X_K = -+cosh(R t), T_K = sinh(R t).  */
static void
kruskal_boundary (const emb_chart *ch, double x, double t, int s, double *b)
{
  b[0] = (s ? 1.0 : -1.0) * cosh (ch->R * t);
  b[1] = sinh (ch->R * t);
  b[2] = ch->sc * x;
}

/* The whole geodesic between the boundary points xm -+ h (bulk units) at
   bulk times t1, t2, in chart ch (sides s1, s2 in Kruskal), pushed from
   the first to the second.  */
static int
emb_full (holent_curve *c, const emb_chart *ch, double xm, double h,
          double t1, int s1, double t2, int s2, double tol)
{
  double P[4], Q[4];
  geo_par g;
  emb_ray (ch, -h, t1, s1, P);
  emb_ray (ch, h, t2, s2, Q);
  int st = emb_piece (&g, ch, xm, KIND_FULL, P, Q);
  if (st)
    return st;
  double s0 = -geo_smax (&g, tol, -1.0), s1b = geo_smax (&g, tol, 1.0);
  double b1[3], b2[3], bd;
  if (ch->chart == EM_KRUSKAL)
    {
      kruskal_boundary (ch, xm - h, t1, s1, b1);
      kruskal_boundary (ch, xm + h, t2, s2, b2);
    }
  else
    {
      areal_picture (ch->circle, xm - h, INFINITY, &b1[0], &b1[1], &bd);
      areal_picture (ch->circle, xm + h, INFINITY, &b2[0], &b2[1], &bd);
      b1[2] = ch->sc * t1;
      b2[2] = ch->sc * t2;
    }
  size_t i0 = c->n;
  if ((st = push (c, b1[0], b1[1], b1[2]))
      || (st = sample_span (c, &g, tol, s0, s1b, 0))
      || (st = push (c, b2[0], b2[1], b2[2])))
    return st;
  return curve_finite (c, i0);
}

/* A bridge geodesic through the shock (doc/tfd_shock.md, section 2;
   doc/surfaces.md): the BTZ piece from the left boundary point to the
   crossing (u = 0, v + alpha) in the left coordinates, a row of NaN (the
   jump along the null shock, of zero length), the BTZ piece from
   (u = 0, v) in the right coordinates to the right boundary point; the
   crossing is holent_tfd_shock_crossing's.  (x1, t1) on side s1 and
   (x2, t2) on the other side, boundary units (x2 already lifted on a
   circle); pushed from the first point to the second.  */
static int
emb_shock (holent_curve *c, const emb_chart *ch, const holent_tfd_bg *b,
           double x1, double t1, int s1, double x2, double t2, double tol)
{
  double sc = ch->sc, xL = s1 ? x2 : x1, tL = s1 ? t2 : t1;
  double xR = s1 ? x1 : x2, tR = s1 ? t1 : t2, xc, v;
  int st = holent_tfd_shock_crossing (b, xL, tL, xR, tR, &xc, &v);
  if (st)
    return st;
  /* bulk units, x centred on the midpoint */
  double xm = 0.5 * (x1 + x2) / sc, y = xc / sc - xm;
  for (int side = 0; side < 2; side++)
    {
      double P[4], Q[4], bp[3], x = side ? xR : xL, t = side ? tR : tL;
      geo_par g;
      emb_bulk (ch, y, 0.0, side ? v : v + b->alpha, P);
      emb_ray (ch, x / sc - xm, t / sc, side, Q);
      kruskal_boundary (ch, x / sc, t / sc, side, bp);
      size_t i0 = c->n;
      if ((st = emb_piece (&g, ch, xm, KIND_RAY, P, Q))
          || (st = sample_span (c, &g, tol, 0.0, geo_smax (&g, tol, 1.0), 0))
          || (st = push (c, bp[0], bp[1], bp[2])))
        return st;
      /* the crossing exactly on u = 0: X_K = T_K = v/2 */
      c->x[i0] = c->y[i0] = 0.5 * (side ? v : v + b->alpha);
      c->t[i0] = xc;
      if ((st = curve_finite (c, i0)))
        return st;
      if (side == 0)
        {
          curve_reverse (c, i0);
          if ((st = push (c, NAN, NAN, NAN)))
            return st;
        }
    }
  if (s1)   /* from the right point to the left one */
    curve_reverse (c, 0);
  return HOLENT_SUCCESS;
}

/* The sorted endpoints xa < xb of a circle region, joined over the arc
   ARC (the forward one xb - xa or its complement): the start and the end
   of the geodesic in the positive direction.  */
static void
circle_direction (const holent_geo_bg *bg, double xa, double ta, double xb,
                  double tb, double arc, double *x1, double *t1, double *x2,
                  double *t2)
{
  double d = xb - xa;
  *x1 = xa;
  *t1 = ta;
  *x2 = xb;
  *t2 = tb;
  if (bg->circle && fabs (arc - d) > fabs (arc - (bg->L - d)))
    {
      *x1 = xb;
      *t1 = tb;
      *x2 = xa + bg->L;
      *t2 = ta;
    }
}

/* The path through the apex of a conical defect from the boundary angle
   ph1 (time t1) to ph2 (t2), ta half the covering delay, sc boundary time
   units per covering time unit.  */
static int
apex_legs (holent_curve *c, const holent_geo_bg *bg, double ph1, double t1,
           double ph2, double t2, double ta, double sc, double tol)
{
  emb_chart ch = { EM_GLOBAL, 1, 0.0, sc, 1 };
  double Q[4] = { 1.0, 0.0, 0.0, 0.0 };   /* the apex at covering time 0 */
  (void) bg;
  for (int leg = 0; leg < 2; leg++)
    {
      double tb = leg ? ta : -ta, ph = leg ? ph2 : ph1;
      double P[4] = { cos (tb), 1.0, 0.0, sin (tb) };
      geo_par g;
      if (emb_piece (&g, &ch, ph, KIND_RAY, Q, P))
        return HOLENT_ETIMELIKE;
      g.tc = 0.5 * (t1 + t2);
      size_t i0 = c->n;
      int st = sample_span (c, &g, tol, 0.0, geo_smax (&g, tol, 1.0), leg);
      if (!st)
        st = push (c, cos (ph), sin (ph), leg ? t2 : t1);
      if (st)
        return st;
      if (leg == 0)
        curve_reverse (c, i0);
    }
  return HOLENT_SUCCESS;
}

int
holent_surface_pair (holent_surface_workspace *w, const holent_geo_bg *bg,
                     double xa, double ta, double xb, double tb, double arc,
                     double tol)
{
  double x1, t1, x2, t2;
  if (bg == NULL || isnan (arc))
    return HOLENT_EINVAL;
  circle_direction (bg, xa, ta, xb, tb, arc, &x1, &t1, &x2, &t2);
  return holent_surface_geodesic_t (w, bg, x1, t1, x2, t2, tol);
}

int
holent_surface_quench (holent_surface_workspace *w,
                       const holent_quench_bg *q, double xa, double xb,
                       double t, double tol)
{
  if (w == NULL || q == NULL || isnan (xa) || isnan (xb) || isnan (t))
    return HOLENT_EINVAL;
  int st = check_tol (tol), circle = q->vac.circle;
  if (st)
    return st;
  if (!isfinite (xa) || !isfinite (xb) || !isfinite (t) || !(xa < xb)
      || (circle && !(xb - xa < q->vac.L)))
    return HOLENT_EDOM;
  /* the geodesic over the shorter arc (doc/quench.md) */
  double x1 = xa, x2 = xb;
  if (circle && xb - xa > 0.5 * q->vac.L)
    {
      x1 = xb;
      x2 = xa + q->vac.L;
    }
  double sc = circle ? q->vac.L / (2.0 * M_PI) : 1.0;
  double eta, xc, rc;
  st = holent_quench_crossing (q, x2 - x1, t, &eta, &xc, &rc);
  if (st)
    return st;
  emb_chart vac = { circle ? EM_GLOBAL : EM_POINCARE, circle, 0.0, sc, 0 };
  emb_chart bh = { EM_BTZ, circle, circle ? q->vac.L / q->beta
                                          : 2.0 * M_PI / q->beta, sc, 0 };
  double xm = 0.5 * (x1 + x2) / sc, h = 0.5 * (x2 - x1) / sc, tb = t / sc;
  holent_curve *c = &w->cur;
  c->n = 0;
  if (eta < 0.0 || !(xc > 0.0))   /* before the quench, or saturated */
    return emb_full (c, eta < 0.0 ? &vac : &bh, xm, h, tb, 1, tb, 1, tol);
  /* the BTZ leg from the first crossing back to the boundary (reversed),
     the vacuum chord inside the shell, the BTZ leg out */
  double C1[4], C2[4], V1[4], V2[4], B1[4], B2[4];
  emb_bulk (&bh, -xc, rc, 0.0, C1);
  emb_bulk (&bh, xc, rc, 0.0, C2);
  emb_bulk (&vac, -xc, rc, 0.0, V1);
  emb_bulk (&vac, xc, rc, 0.0, V2);
  emb_ray (&bh, -h, tb, 1, B1);
  emb_ray (&bh, h, tb, 1, B2);
  geo_par g;
  double px, py, bd;
  if ((st = emb_piece (&g, &bh, xm, KIND_RAY, C1, B1))
      || (st = sample_span (c, &g, tol, 0.0, geo_smax (&g, tol, 1.0), 0))
      || (st = push_boundary (c, &bh, xm - h, t)))
    return st;
  curve_reverse (c, 0);
  /* the crossings exactly on the shell v = 0 */
  areal_picture (circle, xm - xc, rc, &px, &py, &bd);
  c->x[c->n - 1] = px;
  c->y[c->n - 1] = py;
  c->t[c->n - 1] = 0.0;
  if ((st = emb_piece (&g, &vac, xm, KIND_CHORD, V1, V2))
      || (st = sample_span (c, &g, tol, 0.0, g.d, 1)))
    return st;
  areal_picture (circle, xm + xc, rc, &px, &py, &bd);
  c->x[c->n - 1] = px;
  c->y[c->n - 1] = py;
  c->t[c->n - 1] = 0.0;
  if ((st = emb_piece (&g, &bh, xm, KIND_RAY, C2, B2))
      || (st = sample_span (c, &g, tol, 0.0, geo_smax (&g, tol, 1.0), 1))
      || (st = push_boundary (c, &bh, xm + h, t)))
    return st;
  return curve_finite (c, 0);
}

/* holent_surface_tfd (shortest: the shortest winding through the
   bridge) and holent_surface_tfd_winding.  */
static int
tfd_curve (holent_surface_workspace *w, const holent_tfd_bg *b, double xa,
           double ta, int sa, double xb, double tb, int sb, double arc,
           int shortest, long winding, double tol)
{
  if (w == NULL || b == NULL || isnan (xa) || isnan (xb) || isnan (ta)
      || isnan (tb) || (sa != 0 && sa != 1)
      || (sb != 0 && sb != 1))
    return HOLENT_EINVAL;
  int st = check_tol (tol), circle = b->side.circle;
  if (st)
    return st;
  if (!isfinite (xa) || !isfinite (xb) || !isfinite (ta) || !isfinite (tb))
    return HOLENT_EDOM;
  double L = b->side.L, sc = circle ? L / (2.0 * M_PI) : 1.0;
  emb_chart ch = { EM_KRUSKAL, circle, circle ? L / b->beta
                                              : 2.0 * M_PI / b->beta, sc, 0 };
  double x1 = xa, t1 = ta, x2 = xb, t2 = tb;
  if (sa == sb)
    {
      if (xa == xb)
        return HOLENT_ECOINCIDE;
      if (!holent_hrt_spacelike (&b->side, xa, ta, xb, tb))
        return HOLENT_ETIMELIKE;
      if (circle)
        {
          if (isnan (arc))
            return HOLENT_EINVAL;
          if (xb < xa)
            return HOLENT_EDOM;
          circle_direction (&b->side, xa, ta, xb, tb, arc, &x1, &t1, &x2,
                            &t2);
        }
    }
  else
    {
      if (circle && shortest)   /* as holent_tfd_cross_length */
        x2 = x1 + remainder (x2 - x1, L);
      else   /* the image of the second point: xR - xL + winding L */
        x2 += (sb ? 1.0 : -1.0) * (double) winding * L;
    }
  if ((winding != 0 && (sa == sb || !circle)) || !isfinite (x2))
    return HOLENT_EDOM;
  w->cur.n = 0;
  if (sa != sb && b->alpha > 0.0)   /* broken at the shock */
    return emb_shock (&w->cur, &ch, b, x1, t1, sa, x2, t2, tol);
  double xm = 0.5 * (x1 + x2) / sc, h = 0.5 * (x2 - x1) / sc;
  if (sa != sb)
    return emb_full (&w->cur, &ch, xm, h, t1 / sc, sa, t2 / sc, sb, tol);
  /* Within a side: built at the times centred on their mean t0, then
     carried to t0 by the Killing flow, the boost u -> u e^{-+a},
     v -> v e^{+-a}, a = R t0 (right side upper signs; the left side's
     forward time is the flow backwards).  Built at t0 itself, the
     embedding's components would hold e^{2a} and overflow from
     2 pi t0/beta of about 110 on, long before the picture does.  */
  double t0 = 0.5 * (t1 + t2);
  st = emb_full (&w->cur, &ch, xm, h, (t1 - t0) / sc, sa, (t2 - t0) / sc,
                     sb, tol);
  if (st || t0 == 0.0)
    return st;
  double a = (sa ? 1.0 : -1.0) * ch.R * t0 / sc, eu = exp (-a), ev = exp (a);
  holent_curve *c = &w->cur;
  for (size_t i = 0; i < c->n; i++)
    {
      double u = (c->y[i] - c->x[i]) * eu, v = (c->y[i] + c->x[i]) * ev;
      c->x[i] = 0.5 * (v - u);
      c->y[i] = 0.5 * (v + u);
    }
  /* the boundary ends exactly where the boundary points are */
  double bp[3];
  kruskal_boundary (&ch, x1 / sc, t1 / sc, sa, bp);
  c->x[0] = bp[0];
  c->y[0] = bp[1];
  kruskal_boundary (&ch, x2 / sc, t2 / sc, sb, bp);
  c->x[c->n - 1] = bp[0];
  c->y[c->n - 1] = bp[1];
  return curve_finite (c, 0);
}

int
holent_surface_tfd (holent_surface_workspace *w, const holent_tfd_bg *b,
                    double xa, double ta, int sa, double xb, double tb,
                    int sb, double arc, double tol)
{
  return tfd_curve (w, b, xa, ta, sa, xb, tb, sb, arc, 1, 0, tol);
}

int
holent_surface_tfd_winding (holent_surface_workspace *w,
                            const holent_tfd_bg *b, double xa, double ta,
                            int sa, double xb, double tb, int sb,
                            double arc, long winding, double tol)
{
  return tfd_curve (w, b, xa, ta, sa, xb, tb, sb, arc, 0, winding, tol);
}

int
holent_surface_tfd_horizon (holent_surface_workspace *w,
                            const holent_tfd_bg *b, double xa, double xb)
{
  if (w == NULL || b == NULL || isnan (xa) || isnan (xb))
    return HOLENT_EINVAL;
  w->cur.n = 0;
  int st = push (&w->cur, 0.0, 0.0, xa);
  return st ? st : push (&w->cur, 0.0, 0.0, xb);
}

/* ---- runner-up: brute force over the candidates of holent_rt ---- */

static int
pairing_add (holent_surface_workspace *w, const int *match, size_t np)
{
  /* the capacity counts entries, not pairings: a workspace serves
     regions of different sizes one after the other */
  size_t need = (w->npairing + 1) * np;
  if (need > w->cap_pairing)
    {
      size_t cap = 2 * w->cap_pairing > 64 * np ? 2 * w->cap_pairing
                                                 : 64 * np;
      cap = cap > need ? cap : need;
      size_t *p = realloc (w->pairings, cap * sizeof *p);
      if (p == NULL)
        return HOLENT_ENOMEM;
      w->pairings = p;
      w->cap_pairing = cap;
    }
  size_t *dst = w->pairings + w->npairing * np, m = 0;
  for (size_t i = 0; i < np; i++)
    if ((size_t) match[i] > i)
      {
        dst[2 * m] = i;
        dst[2 * m + 1] = (size_t) match[i];
        m++;
      }
  w->npairing++;
  return HOLENT_SUCCESS;
}

/* Every non-crossing pairing of np points: match the first free point
   with every later free one that crosses no pair made so far.  */
static int
pairings (holent_surface_workspace *w, int *match, size_t np)
{
  size_t i = 0;
  while (i < np && match[i] >= 0)
    i++;
  if (i == np)
    return pairing_add (w, match, np);
  for (size_t j = i + 1; j < np; j += 2)
    {
      if (match[j] >= 0)
        continue;
      int ok = 1;
      for (size_t a = 0; a < np && ok; a++)
        if (match[a] >= 0)
          {
            size_t b = (size_t) match[a];
            if ((i < a && a < j) != (i < b && b < j))
              ok = 0;
          }
      if (!ok)
        continue;
      match[i] = (int) j;
      match[j] = (int) i;
      int st = pairings (w, match, np);
      match[i] = match[j] = -1;
      if (st)
        return st;
    }
  return HOLENT_SUCCESS;
}

/* Every non-crossing pairing of np = 2 n points into w (n at most
   RUNNER_NMAX).  */
static int
all_pairings (holent_surface_workspace *w, size_t np)
{
  if (np / 2 > HOLENT_SURFACE_RUNNER_NMAX)
    return HOLENT_ETOOBIG;
  int match[2 * HOLENT_SURFACE_RUNNER_NMAX];
  for (size_t i = 0; i < np; i++)
    match[i] = -1;
  w->npairing = 0;
  return pairings (w, match, np);
}

static int
same_conf (size_t m, const size_t *p, const double *a, int h,
           const size_t *q, const double *b, int k, double tol)
{
  if (h != k)
    return 0;
  for (size_t i = 0; i < m; i++)
    if (p[2 * i] != q[2 * i] || p[2 * i + 1] != q[2 * i + 1]
        || fabs (a[i] - b[i]) > tol)
      return 0;
  return 1;
}

int
holent_surface_runner_up (holent_surface_workspace *w,
                          const holent_geo_bg *bg, const holent_region *r,
                          const size_t *pmin, const double *amin, int hmin,
                          size_t *pairs, double *arcs, int *horizon,
                          double *S)
{
  if (w == NULL || bg == NULL || r == NULL || pmin == NULL || amin == NULL
      || pairs == NULL || arcs == NULL || horizon == NULL || S == NULL
      || r->circle != bg->circle)
    return HOLENT_EINVAL;
  size_t n = r->n, np = 2 * n;
  if (r->whole || n == 0)
    return HOLENT_EDOM;
  int st = all_pairings (w, np);
  if (st)
    return st;
  /* faces: with a horizon, or a defect, the face is named by a boundary
     segment k (pts[k], pts[k+1]); otherwise one pass with no face */
  int faces = bg->circle && (bg->horizon || (bg->bulk == HOLENT_BULK_CONICAL_DEFECT
                                             && bg->alpha < 1.0));
  size_t nk = faces ? np : 1;
  double best = INFINITY, ctol = 1e-12 * (bg->circle ? bg->L : 1.0);
  double arc[HOLENT_SURFACE_RUNNER_NMAX];
  for (size_t q = 0; q < w->npairing; q++)
    {
      const size_t *pq = w->pairings + q * np;
      for (size_t k = 0; k < nk; k++)
        {
          double len = 0.0;
          for (size_t i = 0; i < n; i++)
            {
              size_t a = pq[2 * i], b = pq[2 * i + 1];
              double d = r->pts[b] - r->pts[a];
              if (!bg->circle)
                arc[i] = d;
              else if (!faces)
                arc[i] = d < bg->L - d ? d : bg->L - d;
              else  /* away from the face: segment k inside [a, b) ? */
                arc[i] = (k >= a && k < b) ? bg->L - d : d;
              len += holent_geo_len_unchecked (bg, arc[i]);
            }
          int hz = faces && bg->horizon && ((k % 2 == 0) == (r->start0 != 0));
          double Sq = bg->c / 6.0 * len + (hz ? bg->S_BH : 0.0);
          if (!(Sq < best))
            continue;
          if (same_conf (n, pq, arc, hz, pmin, amin, hmin, ctol))
            continue;
          best = Sq;
          memcpy (pairs, pq, np * sizeof *pairs);
          memcpy (arcs, arc, n * sizeof *arcs);
          *horizon = hz;
        }
    }
  if (!isfinite (best))
    return HOLENT_EDOM;  /* a single candidate: no runner-up */
  *S = best;
  return HOLENT_SUCCESS;
}

/* The length of the pair (a, b) of a runner-up's candidates.  */
typedef int (*pair_len_fn) (const void *ctx, size_t a, size_t b,
                            double *len);

/* The best non-crossing pairing of np points other than pmin (any order
   of its pairs), priced pair by pair: *S = c6 times its length.  */
static int
pairing_runner_up (holent_surface_workspace *w, size_t np,
                   const size_t *pmin, pair_len_fn len_fn, const void *ctx,
                   double c6, size_t *pairs, double *S)
{
  if (np == 0 || np % 2)
    return HOLENT_EDOM;
  size_t n = np / 2;
  int st = all_pairings (w, np);
  if (st)
    return st;
  /* the minimiser as the enumeration writes pairings: each pair (lower,
     upper), sorted by the lower (read before pairs, which may alias it) */
  size_t pm[2 * HOLENT_SURFACE_RUNNER_NMAX];
  for (size_t i = 0; i < n; i++)
    {
      size_t a = pmin[2 * i], b = pmin[2 * i + 1];
      if (a >= np || b >= np)
        return HOLENT_EINVAL;
      size_t k = i;
      for (; k > 0 && pm[2 * (k - 1)] > (a < b ? a : b); k--)
        {
          pm[2 * k] = pm[2 * (k - 1)];
          pm[2 * k + 1] = pm[2 * (k - 1) + 1];
        }
      pm[2 * k] = a < b ? a : b;
      pm[2 * k + 1] = a < b ? b : a;
    }
  double best = INFINITY, zero[HOLENT_SURFACE_RUNNER_NMAX] = { 0 };
  for (size_t q = 0; q < w->npairing; q++)
    {
      const size_t *pq = w->pairings + q * np;
      if (same_conf (n, pq, zero, 0, pm, zero, 0, 0.0))
        continue;
      double len = 0.0;
      for (size_t i = 0; i < n; i++)
        {
          double d;
          if ((st = len_fn (ctx, pq[2 * i], pq[2 * i + 1], &d)))
            return st;
          len += d;
        }
      if (c6 * len < best)
        {
          best = c6 * len;
          memcpy (pairs, pq, np * sizeof *pairs);
        }
    }
  if (!isfinite (best))
    return HOLENT_EDOM;  /* a single candidate: no runner-up */
  *S = best;
  return HOLENT_SUCCESS;
}

typedef struct
{
  const holent_tfd_bg *b;
  const holent_geo_bg *geo;
  const holent_quench_bg *q;
  const double *x, *t;
  const int *side;
  double tq;
} pair_ctx;

static int
tfd_pair_len (const void *vc, size_t a, size_t c, double *len)
{
  const pair_ctx *p = vc;
  const double *x = p->x, *t = p->t;
  if (p->side[a] == p->side[c])
    return holent_tfd_side_length (p->b, x[a], t[a], x[c], t[c],
                                   HOLENT_GEO_SHORTER, len);
  if (p->side[a])   /* a on the right */
    return holent_tfd_cross_length (p->b, x[c], t[c], x[a], t[a], len);
  return holent_tfd_cross_length (p->b, x[a], t[a], x[c], t[c], len);
}

static int
hrt_pair_len (const void *vc, size_t a, size_t c, double *len)
{
  const pair_ctx *p = vc;
  double im;
  return holent_hrt_length (p->geo, p->x[a], p->t[a], p->x[c], p->t[c],
                            HOLENT_GEO_SHORTER, 0, len, &im);
}

static int
quench_pair_len (const void *vc, size_t a, size_t c, double *len)
{
  const pair_ctx *p = vc;
  return holent_quench_points_length (p->q, p->x[a], p->x[c], p->tq, len);
}

int
holent_surface_tfd_runner_up (holent_surface_workspace *w,
                              const holent_tfd_bg *b, size_t np,
                              const double *x, const double *t,
                              const int *side, const size_t *pmin,
                              size_t *pairs, double *S)
{
  if (w == NULL || b == NULL || x == NULL || t == NULL || side == NULL
      || pmin == NULL || pairs == NULL || S == NULL)
    return HOLENT_EINVAL;
  if (b->side.circle)
    return HOLENT_EUNSUP;   /* the annulus: windings and the horizon */
  /* every non-crossing pairing in the bridge order is a candidate on the
     line (holent_tfd_entropy): each pair within a side or through the
     bridge, the horizon never (it is not compact) */
  pair_ctx c = { b, NULL, NULL, x, t, side, 0.0 };
  return pairing_runner_up (w, np, pmin, tfd_pair_len, &c, b->side.c / 6.0,
                            pairs, S);
}

int
holent_surface_hrt_runner_up (holent_surface_workspace *w,
                              const holent_geo_bg *bg, size_t np,
                              const double *x, const double *t,
                              const size_t *pmin, size_t *pairs, double *S)
{
  if (w == NULL || bg == NULL || x == NULL || t == NULL || pmin == NULL
      || pairs == NULL || S == NULL)
    return HOLENT_EINVAL;
  if (bg->circle)
    return HOLENT_EUNSUP;   /* the faces and the horizon of a circle */
  pair_ctx c = { NULL, bg, NULL, x, t, NULL, 0.0 };
  return pairing_runner_up (w, np, pmin, hrt_pair_len, &c, bg->c / 6.0,
                            pairs, S);
}

int
holent_surface_quench_runner_up (holent_surface_workspace *w,
                                 const holent_quench_bg *q, size_t np,
                                 const double *x, double t,
                                 const size_t *pmin, size_t *pairs,
                                 double *S)
{
  if (w == NULL || q == NULL || x == NULL || pmin == NULL || pairs == NULL
      || S == NULL || isnan (t))
    return HOLENT_EINVAL;
  pair_ctx c = { NULL, NULL, q, x, NULL, NULL, t };
  return pairing_runner_up (w, np, pmin, quench_pair_len, &c, q->vac.c / 6.0,
                            pairs, S);
}

/* ---- AdS_{d+1} strip and ball profiles ---- */

typedef struct
{
  const holent_hd_bg *bg;
  int ball;
  int bad;
} prof_par;

static int
prof_rhs (double s, const double y[], double dy[], void *par)
{
  (void) s;
  prof_par *p = par;
  double f, fp, z = y[1];
  if (!(z > 0.0) || holent_hd_bg_f (p->bg, z, &f, &fp))
    {
      p->bad = 1;
      return GSL_EBADFUNC;
    }
  double sf = sqrt (f > 0.0 ? f : 0.0), c = cos (y[2]), sn = sin (y[2]);
  dy[0] = c;
  dy[1] = sf * sn;
  dy[2] = -(p->bg->d - 1) * sf * c / z;
  if (p->ball)
    dy[2] -= (p->bg->d - 2) * sn / y[0];
  return GSL_SUCCESS;
}

int
holent_surface_profile (holent_surface_workspace *w,
                        const holent_hd_bg *bg, int ball, double top,
                        double tol)
{
  if (w == NULL || bg == NULL || isnan (top) || isnan (tol))
    return HOLENT_EINVAL;
  if (!(top > 0.0) || !(top < bg->zh) || !(top <= bg->zmax)
      || !(tol >= HOLENT_SURFACE_TOLMIN * top) || !isfinite (tol))
    return HOLENT_EDOM;
  double f0, fp0;
  if (holent_hd_bg_f (bg, top, &f0, &fp0) || !(f0 > 0.0))
    return HOLENT_EDOM;
  w->cur.n = 0;
  int st = push (&w->cur, 0.0, top, 0.0);
  if (st)
    return st;
  prof_par par = { bg, ball != 0, 0 };
  gsl_odeiv2_system sys = { prof_rhs, NULL, 3, &par };
  gsl_odeiv2_step *step = gsl_odeiv2_step_alloc (gsl_odeiv2_step_rk8pd, 3);
  gsl_odeiv2_control *ctrl = gsl_odeiv2_control_y_new (1e-12 * top, 1e-12);
  gsl_odeiv2_evolve *ev = gsl_odeiv2_evolve_alloc (3);
  if (step == NULL || ctrl == NULL || ev == NULL)
    {
      st = HOLENT_ENOMEM;
      goto done;
    }
  /* start off the turning point with the series th = th'(0) s (the ball's
     r = 0 is a regular singular point of the equation) */
  double sf0 = sqrt (f0), k0 = -sf0 / top * (ball ? 1.0 : bg->d - 1);
  double s = 1e-7 * top;
  double y[3] = { s, top + 0.5 * sf0 * k0 * s * s, k0 * s };
  double zstop = 1e-9 * top, h = 1e-3 * top;
  size_t it = 0;
  while (y[1] > zstop)
    {
      double dy[3];
      if (prof_rhs (s, y, dy, &par) != GSL_SUCCESS || ++it > 2000000)
        {
          st = HOLENT_ENOCONV;
          goto done;
        }
      /* picture tolerance: sagitta h^2 |th'|/8 <= tol; never cross z = 0 */
      double hmax = sqrt (8.0 * tol / (fabs (dy[2]) + 1e-300));
      if (hmax > 0.5 * y[1])
        hmax = 0.5 * y[1];
      if (h > hmax)
        h = hmax;
      double t1 = s + hmax;
      int gs = gsl_odeiv2_evolve_apply (ev, ctrl, step, &sys, &s, t1, &h, y);
      if (gs != GSL_SUCCESS || par.bad || !(y[0] > 0.0))
        {
          st = HOLENT_ENOCONV;
          goto done;
        }
      if (y[1] <= zstop)
        break;
      if ((st = push (&w->cur, y[0], y[1], 0.0)))
        goto done;
    }
  {
    /* the last stretch is straight to O(z^2): extrapolate to z = 0 */
    double f, fp;
    holent_hd_bg_f (bg, y[1] > 0 ? y[1] : 0.0, &f, &fp);
    double sn = sin (y[2]), r0 = y[0];
    if (sn < 0.0 && y[1] > 0.0)
      r0 += y[1] * cos (y[2]) / (sqrt (f) * -sn);
    st = push (&w->cur, r0, 0.0, 0.0);
  }
done:
  gsl_odeiv2_evolve_free (ev);
  gsl_odeiv2_control_free (ctrl);
  gsl_odeiv2_step_free (step);
  return st;
}

/* ---- BCFT ------------------------------------------------------------ */

int
holent_surface_bcft_picture (const holent_bcft_bg *bg)
{
  return bg->kind == HOLENT_BCFT_INTERVAL && !bg->btz;
}

/* Picture point of the bulk point (x, z) of holent_bcft, and back.  */
static void
bcft_to_picture (const holent_bcft_bg *bg, double x, double z, double *px,
                 double *py)
{
  if (!holent_surface_bcft_picture (bg))
    {
      *px = x;
      *py = z;
      return;
    }
  double R = z > 0.0 ? tanh (0.5 * acosh (bg->z0 / z)) : 1.0;
  *px = R * cos (x / bg->z0);
  *py = R * sin (x / bg->z0);
}

static void
bcft_from_picture (const holent_bcft_bg *bg, double px, double py, double *x,
                   double *z)
{
  if (!holent_surface_bcft_picture (bg))
    {
      *x = px;
      *z = py;
      return;
    }
  double R = hypot (px, py);
  *x = bg->z0 * atan2 (py, px);
  *z = R < 1.0 ? bg->z0 / cosh (2.0 * atanh (R)) : 0.0;
}

int
holent_surface_bcft_brane_geodesic (holent_surface_workspace *w,
                                    const holent_bcft_bg *bg, double x,
                                    int end, double tol)
{
  double len, xb, zb;
  if (w == NULL || bg == NULL)
    return HOLENT_EINVAL;
  int st = check_tol (tol);
  if (!st)
    st = holent_bcft_brane_length (bg, x, end, &len, &xb, &zb);
  if (st)
    return st;
  double y = holent_bcft_mirror (bg, end, x);
  /* the geodesic from the smaller point, so that the arc is positive */
  st = holent_surface_geodesic (w, &bg->geo, y < x ? y : x, y < x ? x : y,
                                tol);
  if (st)
    return st;
  holent_curve *c = &w->cur;
  if (y < x)   /* start at x */
    for (size_t i = 0, j = c->n - 1; i < j; i++, j--)
      {
        double tx = c->x[i], ty = c->y[i];
        c->x[i] = c->x[j];
        c->y[i] = c->y[j];
        c->x[j] = tx;
        c->y[j] = ty;
      }
  /* keep the samples on the bulk side of the brane, then land */
  size_t k = 1;
  for (; k < c->n; k++)
    {
      double bx, bz;
      bcft_from_picture (bg, c->x[k], c->y[k], &bx, &bz);
      if (!(bz > 0.0) || !(holent_bcft_brane_side (bg, end, bx, bz) > 0.0))
        break;
    }
  c->n = k;
  double px, py;
  bcft_to_picture (bg, xb, zb, &px, &py);
  return push (c, px, py, 0.0);
}

typedef struct
{
  const holent_bcft_bg *bg;
  int end;
  double zmax;
} brane_par;

/* Picture point of the brane at depth u zmax (u in [0, 1]).  */
static void
brane_eval (const brane_par *b, double u, double *p)
{
  double x = b->end ? b->bg->length : 0.0, z = u * b->zmax;
  if (u > 0.0)
    (void) holent_bcft_brane_x (b->bg, b->end, z * b->bg->ell, &x);
  bcft_to_picture (b->bg, x / (u > 0.0 ? b->bg->ell : 1.0), z, p, p + 1);
}

static int
brane_refine (holent_curve *c, const brane_par *b, double tol, double ua,
              const double *pa, double ub, const double *pb, int depth)
{
  double um = 0.5 * (ua + ub), pm[2];
  brane_eval (b, um, pm);
  if (hypot (pm[0] - 0.5 * (pa[0] + pb[0]), pm[1] - 0.5 * (pa[1] + pb[1]))
      > tol && depth < 40)
    {
      int st = brane_refine (c, b, tol, ua, pa, um, pm, depth + 1);
      return st ? st : brane_refine (c, b, tol, um, pm, ub, pb, depth + 1);
    }
  return push (c, pb[0], pb[1], 0.0);
}

int
holent_surface_bcft_brane (holent_surface_workspace *w,
                           const holent_bcft_bg *bg, int end, double zmax,
                           double tol)
{
  if (w == NULL || bg == NULL || (end != 0 && end != 1) || isnan (zmax))
    return HOLENT_EINVAL;
  if (end == 1 && bg->kind != HOLENT_BCFT_INTERVAL)
    return HOLENT_EINVAL;
  int st = check_tol (tol), disk = holent_surface_bcft_picture (bg);
  if (st)
    return st;
  if (disk)   /* from x = 0 to the tip; the other half by symmetry */
    zmax = bg->z0 / cosh (bg->rho[0]);
  else if (!(zmax > 0.0) || !isfinite (zmax))
    return HOLENT_EDOM;
  else if (bg->btz && zmax > bg->zh)
    zmax = bg->zh;
  brane_par b = { bg, disk ? 0 : end, zmax };
  double pa[2], pb[2];
  const int nseg = 16;
  w->cur.n = 0;
  brane_eval (&b, 0.0, pa);
  if ((st = push (&w->cur, pa[0], pa[1], 0.0)))
    return st;
  for (int k = 1; k <= nseg; k++)
    {
      brane_eval (&b, (double) k / nseg, pb);
      st = brane_refine (&w->cur, &b, tol, (double) (k - 1) / nseg, pa,
                         (double) k / nseg, pb, 0);
      if (st)
        return st;
      memcpy (pa, pb, sizeof pa);
    }
  if (disk)   /* theta -> pi - theta: (X, Y) -> (-X, Y), in reverse */
    for (size_t i = w->cur.n - 1; i-- > 0;)
      if ((st = push (&w->cur, -w->cur.x[i], w->cur.y[i], 0.0)))
        return st;
  return HOLENT_SUCCESS;
}

int
holent_surface_bcft_tfd_brane (holent_surface_workspace *w,
                               const holent_bcft_bg *bg, double x, double t,
                               int side, double tol)
{
  if (w == NULL || bg == NULL || isnan (t) || (side != 0 && side != 1))
    return HOLENT_EINVAL;
  if (bg->kind != HOLENT_BCFT_TFD)
    return HOLENT_EUNSUP;
  if (!isfinite (t))
    return HOLENT_EDOM;
  double zh = bg->zh, ch = cosh (t / zh), sh = sinh (t / zh);
  if (!isfinite (ch))
    return HOLENT_ERANGE;
  int st = holent_surface_bcft_brane_geodesic (w, bg, x, 0, tol);
  if (st)
    return st;
  /* Kruskal u v = (z - zh)/(z + zh) on the exterior (z < zh: the
     landing point lies outside the horizon), v/(-u) = e^{2 t/zh} */
  holent_curve *c = &w->cur;
  for (size_t i = 0; i < c->n; i++)
    {
      double z = c->y[i], q = sqrt ((zh - z) / (zh + z));
      c->t[i] = c->x[i];
      c->x[i] = (side ? q : -q) * ch;
      c->y[i] = q * sh;
    }
  return HOLENT_SUCCESS;
}
